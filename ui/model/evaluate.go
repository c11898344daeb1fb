package model

import (
	"cmp"
	"context"
	"fmt"
	"math"
	"slices"
	"strings"
	"sync"
)

// Gravity is standard gravity, m/s², used for self-weight.
const Gravity = 9.80665

// Model is a scheme ready to evaluate: its loads summarised and its families built.
type Model struct {
	Scheme   Scheme
	Loads    LoadSummary
	Families []Family

	// per family, per candidate: ranking score per metre (or per column for footprint)
	scores [][]float64
	// per family, per candidate: kg CO2e per metre
	carbon [][]float64
}

// New validates the scheme, summarises its load and builds the families of
// every material switched on, the materials concurrently.
func New(sc Scheme) (*Model, error) {
	if err := sc.Validate(); err != nil {
		return nil, err
	}
	ls, err := Summarize(sc.Load, sc.Setting.Method)
	if err != nil {
		return nil, err
	}
	var mats []string
	for _, m := range Materials() {
		if sc.MaterialOn(m) {
			mats = append(mats, m)
		}
	}
	built := make([][]Family, len(mats))
	errs := make([]error, len(mats))
	var wg sync.WaitGroup
	for i, mat := range mats {
		wg.Add(1)
		go func(i int, b Builder) {
			defer wg.Done()
			built[i], errs[i] = b(&sc, ls)
		}(i, builderFor(mat))
	}
	wg.Wait()
	m := &Model{Scheme: sc, Loads: ls}
	for i := range mats {
		if errs[i] != nil {
			return nil, fmt.Errorf("%s: %w", mats[i], errs[i])
		}
		for _, f := range built[i] {
			if f.Len() > 0 {
				m.Families = append(m.Families, f)
			}
		}
	}
	if m.Families, err = applyFire(&sc, ls, m.Families); err != nil {
		return nil, err
	}
	m.scores = make([][]float64, len(m.Families))
	m.carbon = make([][]float64, len(m.Families))
	for fi, f := range m.Families {
		n := f.Len()
		m.scores[fi] = make([]float64, n)
		m.carbon[fi] = make([]float64, n)
		for i := 0; i < n; i++ {
			st := f.Static(i)
			m.carbon[fi][i] = sc.Carbon.PerMetre(st.Constituents)
			switch sc.Metric {
			case ByFootprint:
				m.scores[fi][i] = st.PlanAreaMM2
			case ByCarbon:
				m.scores[fi][i] = m.carbon[fi][i]
			default:
				m.scores[fi][i] = st.MassKgPerM
			}
		}
	}
	return m, nil
}

// Row is one candidate evaluated at one setting.
type Row struct {
	Family   int     // index into Model.Families
	Index    int     // candidate index within its family
	Static   *Static // length-independent facts
	Quick            // strength at the setting
	SelfN    float64 // self-weight over the height, N (0 when self-weight is off)
	DemandN  float64 // governing axial demand with self-weight, N
	Util     float64 // DemandN / CapacityN (+Inf when not permitted)
	OK       bool    // permitted and capacity at least the demand
	Score    float64 // the ranking metric per column: kg, mm² or kg CO2e
	CarbonKg float64 // embodied carbon of the column, kg CO2e
}

// FamilyResult is one family's candidates at a setting, ranked: working
// candidates first by the metric, then failing ones by utilization.
type FamilyResult struct {
	Family  int
	Rows    []Row
	Working int // how many rows at the front work
}

// Best returns the best working row, or nil when none works.
func (fr *FamilyResult) Best() *Row {
	if fr.Working == 0 {
		return nil
	}
	return &fr.Rows[0]
}

// Result is the whole scheme evaluated at one setting.
type Result struct {
	Setting  Setting
	Families []FamilyResult
}

// BestOverall returns the best working row across families by the metric,
// exact ties broken by Ahead, or nil.
func (r *Result) BestOverall() *Row {
	var best *Row
	for i := range r.Families {
		if b := r.Families[i].Best(); b != nil && (best == nil || Ahead(b.Score, b.Static.Designation, best.Score, best.Static.Designation)) {
			best = b
		}
	}
	return best
}

// SelfWeightN returns a candidate's service self-weight over the length, N.
func (m *Model) SelfWeightN(st *Static, lengthMM float64) float64 {
	return selfWeightN(selfStoreys(&m.Scheme), st, lengthMM)
}

// selfStoreys is how many storeys of column weigh on the column checked:
// 0 with self-weight off; with a takedown, the column itself and one above
// each floor it carries (1 + floors), each of the same size and length as a
// first estimate; with a typed load, the column alone (1).
func selfStoreys(sc *Scheme) float64 {
	switch {
	case !sc.SelfWeight:
		return 0
	case sc.Load.Mode == LoadTakedown && sc.Load.SelfStoreys > 0:
		return sc.Load.SelfStoreys
	case sc.Load.Mode == LoadTakedown:
		return float64(1 + sc.Load.Floors)
	}
	return 1
}

// SelfWeightWords says, after a demand, what self-weight is added to it:
// "" with self-weight off.
func SelfWeightWords(sc *Scheme) string {
	switch n := selfStoreys(sc); {
	case n == 0:
		return ""
	case n > 1:
		return fmt.Sprintf(", plus each column's own weight and that of the %d columns of the same size above it (one per floor carried, as a first estimate)", int(n)-1)
	}
	return ", plus each column's own weight"
}

// selfWeightN is the service weight of n storeys of a column of the given
// length, N (0 for n = 0). The model and the adapters' traces share it.
func selfWeightN(n float64, st *Static, lengthMM float64) float64 {
	return n * st.MassKgPerM * Gravity * lengthMM / 1000
}

// row evaluates one candidate.
func (m *Model) row(fi, i int, s Setting) Row {
	f := m.Families[fi]
	st := f.Static(i)
	q := f.Quick(i, s)
	r := Row{Family: fi, Index: i, Static: st, Quick: q}
	r.SelfN = m.SelfWeightN(st, s.LengthMM)
	r.DemandN = m.Loads.Demand(r.SelfN)
	if q.Permitted && q.CapacityN > 0 {
		r.Util = r.DemandN / q.CapacityN
	} else {
		r.Util = math.Inf(1)
	}
	r.OK = q.Permitted && q.CapacityN >= r.DemandN
	r.CarbonKg = m.carbon[fi][i] * s.LengthMM / 1000
	r.Score = m.scores[fi][i]
	if m.Scheme.Metric != ByFootprint {
		r.Score *= s.LengthMM / 1000
	}
	return r
}

// Row evaluates one candidate of one family at a setting.
func (m *Model) Row(fi, i int, s Setting) Row { return m.row(fi, i, s) }

// Evaluate evaluates every family at the setting, one goroutine per family,
// and returns each family's candidates ranked. It stops early, returning the
// context's error, when ctx is cancelled.
func (m *Model) Evaluate(ctx context.Context, s Setting) (*Result, error) {
	res := &Result{Setting: s, Families: make([]FamilyResult, len(m.Families))}
	var wg sync.WaitGroup
	for fi := range m.Families {
		wg.Add(1)
		go func(fi int) {
			defer wg.Done()
			m.evalFamily(ctx, fi, s, &res.Families[fi])
		}(fi)
	}
	wg.Wait()
	if err := ctx.Err(); err != nil {
		return nil, err
	}
	return res, nil
}

func (m *Model) evalFamily(ctx context.Context, fi int, s Setting, out *FamilyResult) {
	n := m.Families[fi].Len()
	rows := make([]Row, n)
	for i := 0; i < n; i++ {
		if i&63 == 0 && ctx.Err() != nil {
			return
		}
		rows[i] = m.row(fi, i, s)
	}
	sortRows(rows)
	w := 0
	for w < n && rows[w].OK {
		w++
	}
	*out = FamilyResult{Family: fi, Rows: rows, Working: w}
}

// sortRows ranks working rows first by score (then designation), then
// failing rows by utilization (then designation); ties keep their order.
// It sorts an index and moves each row once: rows are large, and moving
// them inside the sort cost more than the evaluation itself.
func sortRows(rows []Row) {
	idx := make([]int32, len(rows))
	for i := range idx {
		idx[i] = int32(i)
	}
	slices.SortFunc(idx, func(a, b int32) int {
		ra, rb := &rows[a], &rows[b]
		if ra.OK != rb.OK {
			if ra.OK {
				return -1
			}
			return 1
		}
		ka, kb := ra.Util, rb.Util
		if ra.OK {
			ka, kb = ra.Score, rb.Score
		}
		if ka != kb {
			return cmp.Compare(ka, kb)
		}
		if c := strings.Compare(ra.Static.Designation, rb.Static.Designation); c != 0 {
			return c
		}
		return int(a - b)
	})
	// Apply the permutation in place, cycle by cycle: position j takes the
	// row that was at idx[j].
	for i := range idx {
		if idx[i] == int32(i) {
			continue
		}
		tmp := rows[i]
		j := int32(i)
		for {
			k := idx[j]
			idx[j] = j
			if k == int32(i) {
				rows[j] = tmp
				break
			}
			rows[j] = rows[k]
			j = k
		}
	}
}

// Detail returns a candidate's full trace at a setting, with every load
// combination checked.
func (m *Model) Detail(fi, i int, s Setting) Detail {
	d := m.Families[fi].Detail(i, s)
	d.Checks = m.Checks(fi, i, s)
	return d
}

// Find returns the family and candidate index of a designation, matched
// exactly first and then without regard to case, or ok false.
func (m *Model) Find(designation string) (fi, i int, ok bool) {
	for fi, f := range m.Families {
		for i := 0; i < f.Len(); i++ {
			if f.Static(i).Designation == designation {
				return fi, i, true
			}
		}
	}
	// Then without regard to case or surrounding space (W8x48 is W8X48).
	want := strings.TrimSpace(designation)
	for fi, f := range m.Families {
		for i := 0; i < f.Len(); i++ {
			if strings.EqualFold(f.Static(i).Designation, want) {
				return fi, i, true
			}
		}
	}
	return 0, 0, false
}
