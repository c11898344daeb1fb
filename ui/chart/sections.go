package chart

import (
	"math"
	"strings"

	"upright/plots"
	"upright/ui/model"
	"upright/ui/units"
)

// SectionsOptions choose what the plan-sections figure shows.
type SectionsOptions struct {
	Selected string // designation drawn highlighted; "" for none
	Title    string // figure title; empty for none
	Caution  bool   // write the caution along the bottom (every exported figure)
	// AtLength names the length in the note (exports); the window leaves it
	// out, as its view is redrawn only when the sizes shown change.
	AtLength bool
}

// Reference square and scale bar of each unit system: 1 ft in 3 in steps, or 300 mm in 100 mm steps.
const (
	refFootMM = 304.8
	refSIMM   = 300
)

// Sections builds the plan-sections figure at a result: the best working
// size of each family, in family order, each labelled with its size, plan
// dimensions and weight per length in the scheme's units, all at one
// scale beside a reference square. It also returns the candidate each
// drawn section shows, in the same order.
func Sections(m *model.Model, res *model.Result, opt SectionsOptions) (plots.PlanSheet, []Key) {
	sys := units.System(m.Scheme.Units)
	sh := plots.PlanSheet{Title: opt.Title}
	if sys == units.SI {
		sh.ReferenceMM, sh.ReferenceLabel = refSIMM, "300 mm square"
		sh.ScaleBarMM, sh.ScaleBarDivisions, sh.ScaleBarLabel = refSIMM, 3, "300 mm (100 mm steps)"
	} else {
		sh.ReferenceMM, sh.ReferenceLabel = refFootMM, "1 ft square"
		sh.ScaleBarMM, sh.ScaleBarDivisions, sh.ScaleBarLabel = refFootMM, 4, "1 ft (3 in steps)"
	}
	if opt.Caution {
		sh.Caution = model.Caution
	}
	var keys []Key
	var none, undrawn []string
	mats := map[string]bool{}
	char, fill, prot := false, false, false
	for fi := range res.Families {
		r := res.Families[fi].Best()
		if r == nil {
			none = append(none, m.Families[res.Families[fi].Family].Name())
			continue
		}
		f := m.Families[r.Family]
		o, ok := model.OutlineOf(f, r.Index, res.Setting)
		if !ok {
			undrawn = append(undrawn, f.Name()+" ("+r.Static.Designation+")")
			continue
		}
		sec := PlanSection(o, f.Material(), r.Static, sys)
		sec.Selected = opt.Selected != "" && r.Static.Designation == opt.Selected
		sh.Sections = append(sh.Sections, sec)
		keys = append(keys, Key{Family: r.Family, Index: r.Index})
		mats[f.Material()] = true
		char = char || len(o.Char) > 0
		fill = fill || len(o.Fill) > 0
		prot = prot || o.ProtectionMM > 0
	}
	note := "Plan sections to one scale: the best working size of each family."
	if opt.AtLength {
		note = "Plan sections to one scale: the best working size of each family at " + units.Length(res.Setting.LengthMM, sys) + "."
	}
	var key []string
	for _, k := range materialKeys {
		if mats[k[0]] {
			key = append(key, k[1])
		}
	}
	if len(key) > 0 {
		k := strings.Join(key, ", ")
		note += " " + strings.ToUpper(k[:1]) + k[1:] + "."
	}
	if char {
		note += " Dark: the layer charred in the fire rating."
	}
	if fill {
		note += " Grey inside a tube: concrete fill."
	}
	if prot {
		note += " Dashed pink: fire-protection board."
	}
	if len(none) > 0 {
		note += " No working size: " + strings.Join(none, ", ") + "."
	}
	if len(undrawn) > 0 {
		note += " Not drawn (no plan geometry yet): " + strings.Join(undrawn, ", ") + "."
	}
	sh.Note = note
	if len(sh.Sections) == 0 {
		sh.Empty = "No family has a working size at " + units.Length(res.Setting.LengthMM, sys) + "."
	}
	return sh, keys
}

// materialKeys say how each material is drawn, for the figure's note.
var materialKeys = [][2]string{
	{"steel", "Blue: steel"},
	{"composite", "blue wall with grey fill: filled tube"},
	{"concrete", "grey with bars: reinforced concrete"},
	{"timber", "tan: timber"},
}

// PlanSection turns one candidate's outline into a drawn section with its labels.
func PlanSection(o model.Outline, material string, st *model.Static, sys units.System) plots.PlanSection {
	title, rest := splitDesignation(st.Designation)
	sec := plots.PlanSection{
		Group: material, Title: title,
		WidthMM: o.WidthMM, DepthMM: o.DepthMM, ProtectionMM: o.ProtectionMM,
	}
	if rest != "" {
		sec.Lines = append(sec.Lines, rest)
	}
	sec.Lines = append(sec.Lines, units.PlanSize(st.FootprintMM, sys), units.MassPerLength(st.MassKgPerM, sys))
	if o.ProtectionMM > 0 {
		sec.Lines = append(sec.Lines, "board "+units.Dim(o.ProtectionMM, sys)+unitWord(sys))
	}
	regions := func(kind plots.PartKind, rs []model.Region) {
		for _, r := range rs {
			p := plots.PlanPart{Kind: kind, Loops: [][]plots.Point{points(r.Outer)}}
			for _, h := range r.Holes {
				p.Loops = append(p.Loops, points(h))
			}
			sec.Parts = append(sec.Parts, p)
		}
	}
	regions(plots.PartBody, o.Body)
	regions(plots.PartFill, o.Fill)
	regions(plots.PartChar, o.Char)
	if len(o.Ties) > 0 {
		p := plots.PlanPart{Kind: plots.PartTie, LineMM: o.TieDiaMM}
		for _, l := range o.Ties {
			p.Loops = append(p.Loops, points(l))
		}
		sec.Parts = append(sec.Parts, p)
	}
	for _, b := range o.Bars {
		sec.Parts = append(sec.Parts, plots.PlanPart{Kind: plots.PartBar, Loops: [][]plots.Point{disc(b.X, b.Y, b.DiaMM)}})
	}
	return sec
}

// points converts a loop to plot points.
func points(l model.Loop) []plots.Point {
	out := make([]plots.Point, len(l))
	for i, p := range l {
		out[i] = plots.Point{X: p[0], Y: p[1]}
	}
	return out
}

// barSegments traces a bar's circle.
const barSegments = 12

// disc returns a polygon of a bar of diameter d centred on (x, y).
func disc(x, y, d float64) []plots.Point {
	out := make([]plots.Point, barSegments)
	for k := range out {
		t := 2 * math.Pi * float64(k) / barSegments
		out[k] = plots.Point{X: x + d/2*math.Cos(t), Y: y + d/2*math.Sin(t)}
	}
	return out
}

// splitDesignation breaks a long designation into a title and a second
// line: at its first comma ("16x16 in tied", "8 #9, 5 ksi"), or before
// "glulam"'s combination, so labels stay narrow.
func splitDesignation(d string) (string, string) {
	if i := strings.Index(d, ", "); i > 0 {
		return d[:i], d[i+2:]
	}
	if i := strings.Index(d, " glulam "); i > 0 {
		return d[:i+len(" glulam")], d[i+len(" glulam "):]
	}
	return d, ""
}

// unitWord is the unit written after a plan dimension.
func unitWord(sys units.System) string {
	if sys == units.SI {
		return " mm"
	}
	return " in"
}
