package model

import (
	"context"
	"fmt"
	"runtime"
	"sort"
	"sync"
)

// MapAxis says what the vertical axis of a winner map varies.
type MapAxis string

// The two vertical axes of a winner map.
const (
	MapLoad      MapAxis = "load"      // the typed axial load, N (factored for LRFD, service for ASD)
	MapTributary MapAxis = "tributary" // the tributary area per floor of a takedown, m²
)

// Default and largest grid sizes of a winner map.
const (
	MapDefaultColumns = 100 // length steps
	MapDefaultRows    = 60  // load (or area) steps
	MapMaxColumns     = 400
	MapMaxRows        = 300
)

// MapSpec is the grid of a winner map: lengths across, load (or tributary
// area, for a takedown scheme) up, each sampled at evenly spaced points
// that include both ends.
type MapSpec struct {
	Lengths  Range   // unbraced lengths, mm
	LoadFrom float64 // first load (N) or tributary area per floor (m²)
	LoadTo   float64 // last load (N) or tributary area per floor (m²)
	Columns  int     // length steps; 0 means MapDefaultColumns
	Rows     int     // load steps; 0 means MapDefaultRows
	// Tie is the near-tie fraction: where the runner-up family's metric is
	// within Tie of the winner's, no boundary is drawn between them. 0 (the
	// default) draws a boundary wherever the winning family changes.
	Tie float64
}

// MapAxisOf returns the vertical axis a scheme's map uses: tributary area
// for a takedown, the typed load otherwise.
func MapAxisOf(sc *Scheme) MapAxis {
	if sc.Load.Mode == LoadTakedown {
		return MapTributary
	}
	return MapLoad
}

// DefaultMapSpec is the map around a scheme: the given length range (the
// chart's) and loads from a quarter to twice the scheme's own load (or
// area), at the default steps; up to the scheme's own load when twice it
// is more than the load (or the takedown) accepts.
func DefaultMapSpec(sc *Scheme, r Range) MapSpec {
	axis := MapAxisOf(sc)
	v := sc.Load.DirectN
	if axis == MapTributary {
		v = sc.Load.TributaryM2
	}
	sp := MapSpec{Lengths: r, LoadFrom: v / 4, LoadTo: 2 * v}
	if atLoad(sc.Load, axis, sp.LoadTo).Validate() != nil {
		sp.LoadTo = v
	}
	return sp
}

// withDefaults fills the zero step counts.
func (sp MapSpec) withDefaults() MapSpec {
	if sp.Columns == 0 {
		sp.Columns = MapDefaultColumns
	}
	if sp.Rows == 0 {
		sp.Rows = MapDefaultRows
	}
	return sp
}

// Validate checks the grid against the scheme and returns the first problem
// as a *FieldError naming "length range", "load range", "tributary range",
// "steps" or "tie".
func (sp MapSpec) Validate(sc *Scheme) error {
	sp = sp.withDefaults()
	r := sp.Lengths
	if !finite(r.FromMM) || !finite(r.ToMM) || r.FromMM < MinLengthMM || r.ToMM > MaxLengthMM || r.ToMM <= r.FromMM {
		return bad("length range", fmt.Sprintf("%g..%g mm", r.FromMM, r.ToMM), "a range within 0.3 m (1 ft) to 30 m (98 ft), first below last")
	}
	field, accepted := "load range", "loads greater than zero and at most 200 MN (45,000 kip), first below last"
	if MapAxisOf(sc) == MapTributary {
		field, accepted = "tributary range", "areas per floor greater than zero and at most 5,000 m² (53,800 ft²), first below last, whose loads the takedown accepts"
	}
	if !finite(sp.LoadFrom) || !finite(sp.LoadTo) || sp.LoadFrom <= 0 || sp.LoadTo <= sp.LoadFrom {
		return bad(field, fmt.Sprintf("%g..%g", sp.LoadFrom, sp.LoadTo), accepted)
	}
	for _, v := range [2]float64{sp.LoadFrom, sp.LoadTo} {
		l := atLoad(sc.Load, MapAxisOf(sc), v)
		if err := l.Validate(); err != nil {
			return bad(field, fmt.Sprintf("%g..%g", sp.LoadFrom, sp.LoadTo), accepted+" ("+err.Error()+")")
		}
	}
	if sp.Columns < 2 || sp.Columns > MapMaxColumns || sp.Rows < 2 || sp.Rows > MapMaxRows {
		return bad("steps", fmt.Sprintf("%dx%d", sp.Columns, sp.Rows), fmt.Sprintf("length steps from 2 to %d by load steps from 2 to %d, e.g. 100x60", MapMaxColumns, MapMaxRows))
	}
	if !finite(sp.Tie) || sp.Tie < 0 || sp.Tie > 0.5 {
		return bad("tie", sp.Tie, "a near-tie fraction from 0 to 0.5")
	}
	return nil
}

// atLoad returns the load input with the map's vertical variable set to v.
func atLoad(l Load, axis MapAxis, v float64) Load {
	if axis == MapTributary {
		l.TributaryM2 = v
	} else {
		l.DirectN = v
	}
	return l
}

// MapFamily is one family a map ranks.
type MapFamily struct {
	Name     string
	Material string
}

// MapCell is the winner at one length and load of a map.
type MapCell struct {
	Family int     // index into WinMap.Families; -1 when nothing works
	Index  int     // candidate index within the family
	Metric float64 // the ranking value, in the unit of WinMap.MetricUnit
	Runner int     // the best other family; -1 when no other family works
	// RunnerMetric is the runner-up family's ranking value, same unit.
	RunnerMetric float64
}

// WinMap is the winning family over a grid of unbraced length × load (or
// tributary area). Cells[i*len(LengthsMM)+j] is load i, length j.
type WinMap struct {
	Axis      MapAxis
	LengthsMM []float64 // the length of each column of cells, mm
	Loads     []float64 // the load (N) or tributary area (m²) of each row of cells
	Metric    Metric
	Families  []MapFamily
	Cells     []MapCell
	Tie       float64 // the near-tie fraction the boundaries use
	// The scheme's own point: its length, mm, and load (N) or area (m²).
	PointLengthMM, PointLoad float64

	model *Model // the scheme at its own load: designations of the cells
}

// MetricUnit names the unit of the cells' Metric the way compare's JSON
// does: mass_kg_per_m, plan_area_mm2 or carbon_kgCO2e (per column).
func (g *WinMap) MetricUnit() string {
	switch g.Metric {
	case ByFootprint:
		return "plan_area_mm2"
	case ByCarbon:
		return "carbon_kgCO2e"
	}
	return "mass_kg_per_m"
}

// At returns the cell at load i and length j.
func (g *WinMap) At(i, j int) *MapCell { return &g.Cells[i*len(g.LengthsMM)+j] }

// Designation returns the winning candidate's designation, "" when none works.
func (g *WinMap) Designation(c *MapCell) string {
	if c.Family < 0 || g.model == nil {
		return ""
	}
	return g.model.Families[c.Family].Static(c.Index).Designation
}

// Tied reports whether the cell's runner-up family is within the near-tie
// fraction of its winner (never when Tie is 0).
func (g *WinMap) Tied(c *MapCell) bool {
	return g.Tie > 0 && c.Family >= 0 && c.Runner >= 0 && c.RunnerMetric <= c.Metric*(1+g.Tie)
}

// Boundary reports whether a boundary separates two neighbouring cells: their
// winning families differ (or one has no winner), unless either cell has the
// other's family as a runner-up within the near-tie fraction.
func (g *WinMap) Boundary(a, b *MapCell) bool {
	if a.Family == b.Family {
		return false
	}
	if a.Family < 0 || b.Family < 0 {
		return true
	}
	if g.Tied(a) && a.Runner == b.Family {
		return false
	}
	if g.Tied(b) && b.Runner == a.Family {
		return false
	}
	return true
}

// Mapper computes winner maps, reusing its buffers from one map to the next
// so that repeated maps keep memory flat. The map a Mapper returns is
// overwritten by its next Compute. A Mapper is not safe for concurrent use.
type Mapper struct {
	out     WinMap
	workers []*mapWorker
}

// mapWorker holds one goroutine's per-row buffers.
type mapWorker struct {
	reach []int   // per candidate (all families, flattened): last working column, -1 for none
	best  [][]int // per family, per column: best working candidate, -1 for none
	hint  []int   // per candidate: its reach in the worker's previous row (0 before the first)
}

// ComputeMap computes a winner map with a fresh Mapper.
func ComputeMap(ctx context.Context, sc Scheme, sp MapSpec, progress func(done, total int)) (*WinMap, error) {
	return new(Mapper).Compute(ctx, sc, sp, progress)
}

// Compute finds, for every load (or area) row, each candidate's reach along
// the length columns by one bisection over the columns (strength never rises
// with length and demand never falls, as Reach uses), then the best working
// candidate of each family and overall at each column by the scheme's
// metric. Rows run concurrently, one scheme model per row so that every
// load-dependent factor follows the row's load. progress, when not nil, is
// called after each row (from any goroutine, one call at a time). ctx
// cancels the work and Compute then returns its error.
func (mp *Mapper) Compute(ctx context.Context, sc Scheme, sp MapSpec, progress func(done, total int)) (*WinMap, error) {
	sp = sp.withDefaults()
	if err := sc.Validate(); err != nil {
		return nil, err
	}
	if err := sp.Validate(&sc); err != nil {
		return nil, err
	}
	base, err := New(sc)
	if err != nil {
		return nil, err
	}
	axis := MapAxisOf(&sc)
	nc, nr := sp.Columns, sp.Rows
	g := &mp.out
	*g = WinMap{Axis: axis, Metric: sc.Metric, Tie: sp.Tie, model: base,
		LengthsMM: grow(g.LengthsMM, nc), Loads: grow(g.Loads, nr), Families: g.Families[:0],
		Cells: growCells(g.Cells, nc*nr), PointLengthMM: sc.Setting.LengthMM}
	g.PointLoad = sc.Load.DirectN
	if axis == MapTributary {
		g.PointLoad = sc.Load.TributaryM2
	}
	for j := range g.LengthsMM {
		g.LengthsMM[j] = lerp(sp.Lengths.FromMM, sp.Lengths.ToMM, j, nc)
	}
	for i := range g.Loads {
		g.Loads[i] = lerp(sp.LoadFrom, sp.LoadTo, i, nr)
	}
	// Each family's candidates in metric order (the order does not depend on
	// length: every score is per metre, or per column for footprint).
	order := make([][]int, len(base.Families))
	total := 0
	for fi, f := range base.Families {
		g.Families = append(g.Families, MapFamily{Name: f.Name(), Material: f.Material()})
		n := f.Len()
		total += n
		o := make([]int, n)
		for k := range o {
			o[k] = k
		}
		score := base.scores[fi]
		sort.SliceStable(o, func(a, b int) bool {
			if score[o[a]] != score[o[b]] {
				return score[o[a]] < score[o[b]]
			}
			return f.Static(o[a]).Designation < f.Static(o[b]).Designation
		})
		order[fi] = o
	}
	nw := runtime.GOMAXPROCS(0)
	if nw > nr {
		nw = nr
	}
	for len(mp.workers) < nw {
		mp.workers = append(mp.workers, &mapWorker{})
	}
	var (
		wg      sync.WaitGroup
		mu      sync.Mutex
		done    int
		failure error
	)
	// Each worker takes a block of neighbouring rows, upwards, so that a
	// candidate's reach in the row below is a good first guess.
	for w := 0; w < nw; w++ {
		wk := mp.workers[w]
		wk.size(base, nc, total)
		from, to := w*nr/nw, (w+1)*nr/nw
		wg.Add(1)
		go func() {
			defer wg.Done()
			for i := from; i < to; i++ {
				if ctx.Err() != nil {
					return
				}
				err := wk.row(ctx, base, sc, axis, g, order, i)
				mu.Lock()
				if err != nil && failure == nil {
					failure = err
				}
				done++
				if progress != nil && err == nil {
					progress(done, nr)
				}
				mu.Unlock()
				if err != nil {
					return
				}
			}
		}()
	}
	wg.Wait()
	if err := ctx.Err(); err != nil {
		return nil, err
	}
	if failure != nil {
		return nil, failure
	}
	return g, nil
}

// lerp returns the k-th of n evenly spaced values from a to b inclusive.
func lerp(a, b float64, k, n int) float64 {
	if k == n-1 {
		return b
	}
	return a + (b-a)*float64(k)/float64(n-1)
}

// grow returns s resized to n, reusing its storage when large enough.
func grow(s []float64, n int) []float64 {
	if cap(s) < n {
		return make([]float64, n)
	}
	return s[:n]
}

// growCells returns s resized to n, reusing its storage when large enough.
func growCells(s []MapCell, n int) []MapCell {
	if cap(s) < n {
		return make([]MapCell, n)
	}
	return s[:n]
}

// size readies the worker's buffers for a model and column count.
func (wk *mapWorker) size(m *Model, nc, total int) {
	if cap(wk.reach) < total {
		wk.reach = make([]int, total)
	}
	wk.reach = wk.reach[:total]
	if cap(wk.hint) < total {
		wk.hint = make([]int, total)
	}
	wk.hint = wk.hint[:total]
	for k := range wk.hint {
		wk.hint[k] = 0
	}
	for len(wk.best) < len(m.Families) {
		wk.best = append(wk.best, nil)
	}
	for fi := range m.Families {
		if cap(wk.best[fi]) < nc {
			wk.best[fi] = make([]int, nc)
		}
		wk.best[fi] = wk.best[fi][:nc]
	}
}

// row computes load row i of the map into g.
func (wk *mapWorker) row(ctx context.Context, base *Model, sc Scheme, axis MapAxis, g *WinMap, order [][]int, i int) error {
	m, err := base.WithLoad(atLoad(sc.Load, axis, g.Loads[i]))
	if err != nil {
		return err
	}
	if len(m.Families) != len(base.Families) {
		return fmt.Errorf("map: the families change with the load (%d at %g, %d at the scheme's own)", len(m.Families), g.Loads[i], len(base.Families))
	}
	nc := len(g.LengthsMM)
	at := 0
	for fi, f := range m.Families {
		if ctx.Err() != nil {
			return ctx.Err()
		}
		if f.Len() != base.Families[fi].Len() {
			return fmt.Errorf("map: family %s changes with the load", f.Name())
		}
		for k := 0; k < f.Len(); k++ {
			r := m.gridReach(fi, k, sc.Setting, g.LengthsMM, wk.hint[at+k])
			wk.reach[at+k], wk.hint[at+k] = r, r
		}
		// The best of the family at a column is the first candidate in
		// metric order whose reach covers it: walk the order once, each
		// candidate taking the columns beyond the frontier up to its reach.
		best := wk.best[fi]
		front := 0
		for _, k := range order[fi] {
			r := wk.reach[at+k]
			for ; front <= r && front < nc; front++ {
				best[front] = k
			}
			if front >= nc {
				break
			}
		}
		for ; front < nc; front++ {
			best[front] = -1
		}
		at += f.Len()
	}
	// The winner at each column is the best family by the metric, with the
	// runner-up (the best other family) kept for near ties.
	for j := 0; j < nc; j++ {
		c := MapCell{Family: -1, Runner: -1}
		var cs, rs float64
		var cd string
		for fi := range m.Families {
			k := wk.best[fi][j]
			if k < 0 {
				continue
			}
			s := m.scores[fi][k]
			d := m.Families[fi].Static(k).Designation
			if c.Family < 0 || s < cs || (s == cs && d < cd) {
				c.Runner, rs = c.Family, cs
				c.Family, c.Index, cs, cd = fi, k, s, d
			} else if c.Runner < 0 || s < rs {
				c.Runner, rs = fi, s
			}
		}
		if c.Family >= 0 {
			c.Metric = m.mapMetric(c.Family, c.Index, g.LengthsMM[j])
		}
		if c.Runner >= 0 {
			c.RunnerMetric = m.mapMetric(c.Runner, wk.best[c.Runner][j], g.LengthsMM[j])
		}
		*g.At(i, j) = c
	}
	return nil
}

// WithLoad returns the model at another load, built afresh: every load
// summary, typed or taken down, carries per-combination factors (λ, CD,
// βdns with the self-weight share) that the families read when they are
// built, so no family can be shared between loads. TestWithLoadMatchesNew
// guards it.
func (m *Model) WithLoad(l Load) (*Model, error) {
	sc := m.Scheme
	sc.Load = l
	return New(sc)
}

// gridReach returns the last of the lengths at which a candidate works, or
// -1 when it does not work at the first. It asks works, the same check as
// Reach, at the grid's own lengths, and relies on the same fact: strength
// never rises with length and demand never falls, so the working lengths
// are the first ones. hint is a guess (the reach in a neighbouring row):
// the search steps out from it in doubling steps until the reach is
// bracketed, then bisects the bracket, so a good guess settles it in two or
// three checks. The hint only saves work: any hint gives the same answer.
func (m *Model) gridReach(fi, i int, base Setting, lengths []float64, hint int) int {
	n := len(lengths)
	works := func(k int) bool { return m.works(fi, i, base, lengths[k]) }
	lo, hi := -1, n // every index up to lo works, every index from hi fails
	h := min(max(hint, 0), n-1)
	if works(h) {
		lo = h
		for step := 1; lo+step < hi; step *= 2 {
			if !works(lo + step) {
				hi = lo + step
				break
			}
			lo += step
		}
	} else {
		hi = h
		for step := 1; hi-step > lo; step *= 2 {
			if works(hi - step) {
				lo = hi - step
				break
			}
			hi -= step
		}
	}
	for hi-lo > 1 {
		mid := lo + (hi-lo)/2
		if works(mid) {
			lo = mid
		} else {
			hi = mid
		}
	}
	return lo
}

// mapMetric is a candidate's ranking value at a length in compare's JSON
// unit: kg per metre, plan area in mm², or kg CO2e for the column.
func (m *Model) mapMetric(fi, i int, lengthMM float64) float64 {
	switch m.Scheme.Metric {
	case ByFootprint:
		return m.scores[fi][i]
	case ByCarbon:
		return m.carbon[fi][i] * lengthMM / 1000
	}
	return m.Families[fi].Static(i).MassKgPerM
}
