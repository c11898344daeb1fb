package ui

import (
	"cmp"
	"fmt"
	"math"
	"slices"
	"strings"

	"upright/ui/model"
	"upright/ui/units"
)

// Status words of a row as the window shows them: the model's one set of
// words with a symbol, so a failing row reads as failing without its colour.
var (
	StatusWorks        = model.StatusMark(model.StatusWorks) + " " + model.StatusWorks
	StatusFails        = model.StatusMark(model.StatusFails) + " " + model.StatusFails
	StatusNotPermitted = model.StatusMark(model.StatusNotPermitted) + " " + model.StatusNotPermitted
)

// column is one column of the results table.
type column struct {
	id    string
	title func(sys units.System, method model.Method) string
	cell  func(c *cellCtx, r *model.Row) string
	key   func(c *cellCtx, r *model.Row) sortKey
	width float32 // at the default text size
	right bool    // numbers, aligned right
}

// sortKey orders rows: numbers when num is true, else text.
type sortKey struct {
	num bool
	n   float64
	s   string
}

// cellCtx is what a cell needs besides its row.
type cellCtx struct {
	m      *model.Model
	sys    units.System
	length float64 // mm
	pinned map[string]bool
}

func unitOf(sys units.System, us, si string) string {
	if sys == units.SI {
		return si
	}
	return us
}

func status(r *model.Row) string {
	switch r.Status() {
	case model.StatusWorks:
		return StatusWorks
	case model.StatusNotPermitted:
		return StatusNotPermitted
	}
	return StatusFails
}

func familyText(c *cellCtx, r *model.Row) string {
	f := c.m.Families[r.Family]
	mat := f.Material()
	if mat == "" {
		return f.Name()
	}
	return strings.ToUpper(mat[:1]) + mat[1:] + " · " + f.Name()
}

func num(v float64, digits int) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return "—"
	}
	return groupThousands(fmt.Sprintf("%.*f", digits, v))
}

// groupThousands puts commas between thousands in a formatted number.
func groupThousands(s string) string {
	neg := strings.HasPrefix(s, "-")
	if neg {
		s = s[1:]
	}
	intPart, frac, hasFrac := strings.Cut(s, ".")
	var b strings.Builder
	for i, ch := range intPart {
		if i > 0 && (len(intPart)-i)%3 == 0 {
			b.WriteByte(',')
		}
		b.WriteRune(ch)
	}
	out := b.String()
	if hasFrac {
		out += "." + frac
	}
	if neg {
		out = "-" + out
	}
	return out
}

func n(v float64) sortKey   { return sortKey{num: true, n: v} }
func text(s string) sortKey { return sortKey{s: s} }
func massPerM(v float64, sys units.System) float64 {
	if sys == units.SI {
		return v
	}
	return v / units.KgmPerPlf
}
func mass(kg float64, sys units.System) float64 {
	if sys == units.SI {
		return kg
	}
	return kg / units.KgPerLb
}
func force(nw float64, sys units.System) float64 { v, _ := units.ForceValue(nw, sys); return v }
func planArea(mm2 float64, sys units.System) float64 {
	if sys == units.SI {
		return mm2 / 1e6
	}
	return mm2 / units.MM2PerIn2
}

// columns are the results table's columns in order.
var columns = []column{
	{id: "status", width: 105,
		title: func(units.System, model.Method) string { return "Status" },
		cell:  func(_ *cellCtx, r *model.Row) string { return status(r) },
		key: func(_ *cellCtx, r *model.Row) sortKey {
			v := 0.0
			if !r.OK {
				v = 1
			}
			if !r.Permitted {
				v = 2
			}
			return n(v)
		}},
	{id: "family", width: 185,
		title: func(units.System, model.Method) string { return "Family" },
		cell:  familyText,
		key:   func(c *cellCtx, r *model.Row) sortKey { return text(familyText(c, r)) }},
	{id: "size", width: 180,
		title: func(units.System, model.Method) string { return "Size" },
		cell: func(c *cellCtx, r *model.Row) string {
			if c.pinned[r.Static.Designation] {
				return "◆ " + r.Static.Designation
			}
			return r.Static.Designation
		},
		key: func(_ *cellCtx, r *model.Row) sortKey { return text(r.Static.Designation) }},
	{id: "util", width: 90, right: true,
		title: func(units.System, model.Method) string { return "Utilization" },
		cell:  func(_ *cellCtx, r *model.Row) string { return num(r.Util, 2) },
		key: func(_ *cellCtx, r *model.Row) sortKey {
			if math.IsInf(r.Util, 0) || math.IsNaN(r.Util) {
				return n(math.MaxFloat64)
			}
			return n(r.Util)
		}},
	{id: "capacity", width: 95, right: true,
		title: func(s units.System, m model.Method) string {
			sym := "φPn"
			if m == model.ASD {
				sym = "Pn/Ω"
			}
			return sym + " (" + unitOf(s, "kip", "kN") + ")"
		},
		cell: func(c *cellCtx, r *model.Row) string {
			if !r.Permitted {
				return "—"
			}
			return num(force(r.CapacityN, c.sys), 0)
		},
		key: func(_ *cellCtx, r *model.Row) sortKey { return n(r.CapacityN) }},
	{id: "demand", width: 110, right: true,
		title: func(s units.System, _ model.Method) string { return "Demand (" + unitOf(s, "kip", "kN") + ")" },
		cell:  func(c *cellCtx, r *model.Row) string { return num(force(r.DemandN, c.sys), 0) },
		key:   func(_ *cellCtx, r *model.Row) sortKey { return n(r.DemandN) }},
	{id: "weight", width: 110, right: true,
		title: func(s units.System, _ model.Method) string { return "Weight (" + unitOf(s, "lb/ft", "kg/m") + ")" },
		cell:  func(c *cellCtx, r *model.Row) string { return num(massPerM(r.Static.MassKgPerM, c.sys), 1) },
		key:   func(_ *cellCtx, r *model.Row) sortKey { return n(r.Static.MassKgPerM) }},
	{id: "column-weight", width: 135, right: true,
		title: func(s units.System, _ model.Method) string { return "Column weight (" + unitOf(s, "lb", "kg") + ")" },
		cell: func(c *cellCtx, r *model.Row) string {
			return num(mass(r.Static.MassKgPerM*c.length/1000, c.sys), 0)
		},
		key: func(_ *cellCtx, r *model.Row) sortKey { return n(r.Static.MassKgPerM) }},
	{id: "plan", width: 110,
		title: func(s units.System, _ model.Method) string { return "Plan (" + unitOf(s, "in", "mm") + ")" },
		cell: func(c *cellCtx, r *model.Row) string {
			return units.Dim(r.Static.FootprintMM[0], c.sys) + " × " + units.Dim(r.Static.FootprintMM[1], c.sys)
		},
		key: func(_ *cellCtx, r *model.Row) sortKey {
			return n(math.Max(r.Static.FootprintMM[0], r.Static.FootprintMM[1]))
		}},
	{id: "area", width: 120, right: true,
		title: func(s units.System, _ model.Method) string { return "Plan area (" + unitOf(s, "in²", "m²") + ")" },
		cell: func(c *cellCtx, r *model.Row) string {
			if c.sys == units.SI {
				return num(planArea(r.Static.PlanAreaMM2, c.sys), 3)
			}
			return num(planArea(r.Static.PlanAreaMM2, c.sys), 0)
		},
		key: func(_ *cellCtx, r *model.Row) sortKey { return n(r.Static.PlanAreaMM2) }},
	{id: "carbon", width: 130, right: true,
		title: func(units.System, model.Method) string { return "Carbon (kg CO₂e)" },
		cell:  func(_ *cellCtx, r *model.Row) string { return num(r.CarbonKg, 0) },
		key:   func(_ *cellCtx, r *model.Row) sortKey { return n(r.CarbonKg) }},
	{id: "governs", width: 220,
		title: func(units.System, model.Method) string { return "Governed by" },
		cell: func(_ *cellCtx, r *model.Row) string {
			if !r.Permitted && r.Reason != "" {
				return r.Reason
			}
			if _, why := model.LimitMark(&r.Quick); why != "" {
				return r.Governing + "; ⚠ " + why
			}
			return r.Governing
		},
		key: func(_ *cellCtx, r *model.Row) sortKey { return text(r.Governing) }},
	{id: "slenderness", width: 105, right: true,
		title: func(units.System, model.Method) string { return "Slenderness" },
		cell: func(_ *cellCtx, r *model.Row) string {
			if mark, _ := model.LimitMark(&r.Quick); mark != "" {
				return num(r.Slenderness, 1) + " ⚠"
			}
			return num(r.Slenderness, 1)
		},
		key: func(_ *cellCtx, r *model.Row) sortKey { return n(r.Slenderness) }},
}

// columnIndex returns the index of a column id, or -1.
func columnIndex(id string) int {
	for i := range columns {
		if columns[i].id == id {
			return i
		}
	}
	return -1
}

// pickRows returns the rows the table shows: each family's best working
// size (or, when nothing in the family works, its closest failing size so
// the family does not vanish), or with all every working size of every
// family (again with the closest failing one of a family where none works).
func pickRows(res *model.Result, all bool, dst []model.Row) []model.Row {
	dst = dst[:0]
	if res == nil {
		return dst
	}
	for fi := range res.Families {
		fr := &res.Families[fi]
		if len(fr.Rows) == 0 {
			continue
		}
		if all && fr.Working > 0 {
			dst = append(dst, fr.Rows[:fr.Working]...)
			continue
		}
		dst = append(dst, fr.Rows[0])
	}
	return dst
}

// sortRows orders rows by a column (stable, so equal keys keep the model's
// ranking); col < 0 keeps the model's order.
func sortRows(c *cellCtx, rows []model.Row, col int, desc bool) {
	if col < 0 || col >= len(columns) {
		return
	}
	key := columns[col].key
	slices.SortStableFunc(rows, func(a, b model.Row) int {
		ka, kb := key(c, &a), key(c, &b)
		var r int
		if ka.num {
			r = cmp.Compare(ka.n, kb.n)
		} else {
			r = strings.Compare(strings.ToLower(ka.s), strings.ToLower(kb.s))
		}
		if desc {
			r = -r
		}
		return r
	})
}
