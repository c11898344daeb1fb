package model

import (
	"fmt"
	"math"
	"sort"
	"sync"
)

// StoreyLoad is one position's takedown at one storey, without the weight
// of any column: the loads of the floors and roof above and the façade.
type StoreyLoad struct {
	Storey   int         // 1 is the ground storey
	LengthMM float64     // the storey height, the column's unbraced length, mm
	Load     Load        // the takedown input
	Loads    LoadSummary // its summary (combinations without column weight)
}

// StackEntry is one family's size at one storey of one position.
type StackEntry struct {
	Index  int     // candidate index in the family; -1 when no size works
	AboveN float64 // service weight of this family's columns above this storey's group, N
	Row    Row     // the candidate evaluated at this storey (Family 0 of Model)
	Model  *Model  // the storey's model for this family alone, for traces and rows
}

// PositionSchedule is the takedown and the sizes of one position.
type PositionSchedule struct {
	PositionTake
	Storeys []StoreyLoad   // from the ground up
	Best    [][]StackEntry // per family of the base model, per storey from the ground up
}

// FamilyTotals are one family's quantities over the whole building.
type FamilyTotals struct {
	Family   int // index into Schedule.Base.Families
	Name     string
	Material string
	Complete bool // every position and storey has a working size

	Columns    int     // columns on each floor (grid intersections)
	LengthM    float64 // column length of every storey added, m
	SteelKg    float64 // steel: rolled sections, tubes and bars, kg
	ConcreteM3 float64 // concrete, m³
	TimberM3   float64 // sawn timber and glulam, m³
	BoardKg    float64 // gypsum board of a fire enclosure, kg
	CarbonKg   float64 // embodied carbon (A1–A3) with the scheme's factors, kg CO2e

	// ColumnAreaM2 is the floor area the columns take on each storey (with
	// their fire protection under a rating), m², from the ground up.
	ColumnAreaM2     []float64
	ColumnAreaTotal  float64 // over every storey, m²
	GrossFloorAreaM2 float64 // the building's gross floor area, m²
}

// Share returns the columns' floor area as a share of the gross floor area.
func (t *FamilyTotals) Share() float64 {
	if t.GrossFloorAreaM2 <= 0 {
		return 0
	}
	return t.ColumnAreaTotal / t.GrossFloorAreaM2
}

// Schedule is a building taken down and sized: for every position and
// storey the best size of each family, and each family's totals.
type Schedule struct {
	Building  Building
	Base      *Model // the families, at the ground storey of the most loaded column
	Positions []PositionSchedule
	Totals    []FamilyTotals // per family of Base, in its order
}

// NewSchedule validates the scheme and its building and sizes every column.
//
// Each position (interior, edge-x, edge-y, corner) is sized for its largest
// tributary area and façade length. Each storey's column carries the floors
// above it and the roof (ASCE 7-22 4.7 live-load reduction with the
// position's KLL over the sum of the tributary areas of the floors carried),
// the façade of every level from its top up, and the weight of the columns
// above it. Going down from the roof, each group of ChangeEvery storeys
// takes the best working size of each family by the scheme's metric that is
// no smaller than the size above it (metric and both plan dimensions), so a
// size never grows going up; its own weight over the storeys of its group
// above each storey is counted, and then the weight of the whole group
// joins the dead load of the storeys below.
func NewSchedule(sc Scheme) (*Schedule, error) {
	if sc.Building == nil {
		return nil, bad("building", "none", "a scheme with a building section")
	}
	b := *sc.Building
	if err := b.Validate(); err != nil {
		return nil, err
	}
	takes := b.Takes()
	worst := takes[0]
	base := sc
	base.Load = b.load(worst.Position, b.maxTributary(), 1, worst.FacadeM)
	base.Setting = sc.Setting.AtLength(b.StoreysMM[0])
	bm, err := New(base)
	if err != nil {
		return nil, err
	}
	out := &Schedule{Building: b, Base: bm, Positions: make([]PositionSchedule, len(takes))}
	nf := len(bm.Families)
	order := make([][]int, nf)
	for fi, f := range bm.Families {
		o := make([]int, f.Len())
		for k := range o {
			o[k] = k
		}
		score := bm.scores[fi]
		sort.SliceStable(o, func(a, c int) bool {
			if score[o[a]] != score[o[c]] {
				return score[o[a]] < score[o[c]]
			}
			return f.Static(o[a]).Designation < f.Static(o[c]).Designation
		})
		order[fi] = o
	}
	for pi, t := range takes {
		ps := &out.Positions[pi]
		ps.PositionTake = t
		for k := 1; k <= len(b.StoreysMM); k++ {
			l := b.load(t.Position, t.TributaryM2, k, t.FacadeM)
			ls, err := Summarize(l, sc.Setting.Method)
			if err != nil {
				return nil, fmt.Errorf("%s column, storey %d: %w", t.Position, k, err)
			}
			ps.Storeys = append(ps.Storeys, StoreyLoad{Storey: k, LengthMM: b.StoreysMM[k-1], Load: l, Loads: ls})
		}
		ps.Best = make([][]StackEntry, nf)
	}
	var wg sync.WaitGroup
	errs := make([]error, len(takes)*nf)
	for pi := range out.Positions {
		for fi := 0; fi < nf; fi++ {
			wg.Add(1)
			go func(pi, fi int) {
				defer wg.Done()
				ps := &out.Positions[pi]
				ps.Best[fi], errs[pi*nf+fi] = sizeStack(bm, &b, ps, fi, order[fi])
			}(pi, fi)
		}
	}
	wg.Wait()
	for _, err := range errs {
		if err != nil {
			return nil, err
		}
	}
	out.totals()
	return out, nil
}

// sizeStack sizes one family's stack of columns at one position, from the
// roof down, group by group.
func sizeStack(bm *Model, b *Building, ps *PositionSchedule, fi int, order []int) ([]StackEntry, error) {
	n := len(b.StoreysMM)
	f := bm.Families[fi]
	stack := make([]StackEntry, n)
	for k := range stack {
		stack[k].Index = -1
	}
	aboveN := 0.0
	from := 0        // rank in order of the size above: nothing lighter may go below it
	prev := -1       // the size above
	ms := []*Model{} // the group's storey models, top first
	for top := n; top >= 1; {
		first, last := b.groupOf(top)
		ms = ms[:0]
		for k := last; k >= first; k-- {
			sl := &ps.Storeys[k-1]
			l := sl.Load
			l.PointDeadN += aboveN
			// The group's own size weighs on storey k over the storeys from
			// k to the group's top, in units of storey k's height.
			l.SelfStoreys = sum(b.StoreysMM[k-1:last]) / b.StoreysMM[k-1]
			m, err := storeyModel(bm, fi, l, b.StoreysMM[k-1])
			if err != nil {
				return nil, fmt.Errorf("%s column, storey %d: %w", ps.Position, k, err)
			}
			ms = append(ms, m)
		}
		found := -1
		for r := from; r < len(order) && found < 0; r++ {
			i := order[r]
			if prev >= 0 && !noSmaller(f.Static(i), f.Static(prev)) {
				continue
			}
			ok := true
			for _, m := range ms {
				if row := m.row(0, i, m.Scheme.Setting); !row.OK {
					ok = false
					break
				}
			}
			if ok {
				found, from = i, r
			}
		}
		if found < 0 {
			// No size of the family carries this group: it and every
			// storey below stay without a size.
			return stack, nil
		}
		for idx, m := range ms {
			k := last - idx
			stack[k-1] = StackEntry{Index: found, AboveN: aboveN, Row: m.row(0, found, m.Scheme.Setting), Model: m}
		}
		prev = found
		aboveN += f.Static(found).MassKgPerM * Gravity * sum(b.StoreysMM[first-1:last]) / 1000
		top = first - 1
	}
	return stack, nil
}

// noSmaller reports whether a size is at least as large in plan as the one
// above it: each plan dimension (smaller to smaller, larger to larger) no
// smaller, so that a column never grows going up.
func noSmaller(st, above *Static) bool {
	a0, a1 := min(st.FootprintMM[0], st.FootprintMM[1]), max(st.FootprintMM[0], st.FootprintMM[1])
	b0, b1 := min(above.FootprintMM[0], above.FootprintMM[1]), max(above.FootprintMM[0], above.FootprintMM[1])
	const tol = 1e-6
	return a0 >= b0-tol && a1 >= b1-tol
}

// storeyModel is the model of family fi of the base model under load l at
// a storey of the given height: the family re-bound to the storey's load
// summary (cheap), or, for a family that cannot be re-bound, built afresh.
func storeyModel(bm *Model, fi int, l Load, heightMM float64) (*Model, error) {
	sc := bm.Scheme
	sc.Load = l
	sc.Setting = bm.Scheme.Setting.AtLength(heightMM)
	ls, err := Summarize(l, sc.Setting.Method)
	if err != nil {
		return nil, err
	}
	f, ok := rebind(bm.Families[fi], ls, selfStoreys(&sc))
	if !ok {
		full, err := New(sc)
		if err != nil {
			return nil, err
		}
		for _, g := range full.Families {
			if g.Name() == bm.Families[fi].Name() && g.Material() == bm.Families[fi].Material() && g.Len() == bm.Families[fi].Len() {
				f = g
				ok = true
				break
			}
		}
		if !ok {
			return nil, fmt.Errorf("family %s changes with the load", bm.Families[fi].Name())
		}
	}
	return &Model{Scheme: sc, Loads: ls, Families: []Family{f},
		scores: [][]float64{bm.scores[fi]}, carbon: [][]float64{bm.carbon[fi]}}, nil
}

// totals adds up each family's quantities over the schedule.
func (s *Schedule) totals() {
	b := &s.Building
	s.Totals = make([]FamilyTotals, len(s.Base.Families))
	for fi, f := range s.Base.Families {
		t := FamilyTotals{Family: fi, Name: f.Name(), Material: f.Material(), Complete: true,
			ColumnAreaM2: make([]float64, len(b.StoreysMM)), GrossFloorAreaM2: b.GrossFloorAreaM2()}
		for pi := range s.Positions {
			ps := &s.Positions[pi]
			t.Columns += ps.Count
			c := float64(ps.Count)
			for k, e := range ps.Best[fi] {
				if e.Index < 0 {
					t.Complete = false
					continue
				}
				st := f.Static(e.Index)
				lm := b.StoreysMM[k] / 1000 * c
				t.LengthM += lm
				for _, q := range st.Constituents {
					switch q.Kind {
					case CarbonRolledSteel, CarbonHSSSteel, CarbonRebar:
						t.SteelKg += q.Amount * lm
					case CarbonConcrete:
						t.ConcreteM3 += q.Amount * lm
					case CarbonSawnTimber, CarbonGlulam:
						t.TimberM3 += q.Amount * lm
					case CarbonGypsum:
						t.BoardKg += q.Amount * lm
					}
				}
				t.CarbonKg += s.Base.carbon[fi][e.Index] * lm
				t.ColumnAreaM2[k] += st.PlanAreaMM2 / 1e6 * c
			}
		}
		for _, a := range t.ColumnAreaM2 {
			t.ColumnAreaTotal += a
		}
		s.Totals[fi] = t
	}
}

// ColumnWeightN returns the service weight of every column of family fi
// in the building, N (NaN when the family's schedule is incomplete).
func (s *Schedule) ColumnWeightN(fi int) float64 {
	w := 0.0
	for pi := range s.Positions {
		ps := &s.Positions[pi]
		for k, e := range ps.Best[fi] {
			if e.Index < 0 {
				return math.NaN()
			}
			w += float64(ps.Count) * s.Base.Families[fi].Static(e.Index).MassKgPerM * Gravity * s.Building.StoreysMM[k] / 1000
		}
	}
	return w
}

// Best returns the family whose complete schedule is best by the scheme's
// metric over the whole building (mass, column floor area or carbon), or
// -1 when no family completes it.
func (s *Schedule) Best() int {
	best, bv := -1, 0.0
	for fi := range s.Totals {
		t := &s.Totals[fi]
		if !t.Complete {
			continue
		}
		v := s.metricTotal(fi)
		if best < 0 || v < bv {
			best, bv = fi, v
		}
	}
	return best
}

// metricTotal is the ranking metric of family fi summed over the building.
func (s *Schedule) metricTotal(fi int) float64 {
	t := &s.Totals[fi]
	switch s.Base.Scheme.Metric {
	case ByFootprint:
		return t.ColumnAreaTotal
	case ByCarbon:
		return t.CarbonKg
	}
	return s.ColumnWeightN(fi)
}
