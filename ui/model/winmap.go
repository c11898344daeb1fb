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
	// Tie is the near-tie fraction of the crossover list: along each load
	// row, walking up in length, the shown family changes only when another
	// family is better by more than Tie or the shown family stops working.
	// 0 shows the strict best everywhere.
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
// is more than the load (or the takedown) accepts. Near-ties follow the
// scheme's tolerance, as in the crossover list.
func DefaultMapSpec(sc *Scheme, r Range) MapSpec {
	axis := MapAxisOf(sc)
	v := sc.Load.DirectN
	if axis == MapTributary {
		v = sc.Load.TributaryM2
	}
	sp := MapSpec{Lengths: r, LoadFrom: v / 4, LoadTo: 2 * v, Tie: sc.Tie}
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

// MapCell is the winner at one length and load of a map: the strict best,
// and the family the crossover list names there (the shown family), which
// differs from the strict best only at a near-tie.
type MapCell struct {
	Family int     // the strict best: index into WinMap.Families; -1 when nothing works
	Index  int     // the strict best's candidate index within its family
	Metric float64 // the strict best's ranking value, in the unit of WinMap.MetricUnit
	Shown  int     // the shown family: index into WinMap.Families; -1 when nothing works
	// ShownIndex is the shown family's best working candidate at the cell.
	ShownIndex int
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
	Tie       float64 // the near-tie fraction the shown families follow
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

// ShownDesignation returns the shown family's best working designation at
// the cell, "" when none works.
func (g *WinMap) ShownDesignation(c *MapCell) string {
	if c.Shown < 0 || g.model == nil {
		return ""
	}
	return g.model.Families[c.Shown].Static(c.ShownIndex).Designation
}

// Tied reports whether the cell is a near-tie: its shown family is not the
// strict best, which beats it by no more than the tie fraction.
func (g *WinMap) Tied(c *MapCell) bool {
	return c.Shown != c.Family
}

// Boundary reports whether a boundary separates two neighbouring cells:
// their shown families differ (or only one has a family that works).
func (g *WinMap) Boundary(a, b *MapCell) bool {
	return a.Shown != b.Shown
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
	// strict and shown are per column: the strict best family and the one
	// the crossover list names, -1 for none.
	strict, shown []int
	hold          holdRow // the near-tie rule, with its buffers
	hint          []int   // per candidate: its reach in the worker's previous row (0 before the first)
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
			return Ahead(score[o[a]], f.Static(o[a]).Designation, score[o[b]], f.Static(o[b]).Designation)
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

// growInts returns s resized to n, reusing its storage when large enough.
func growInts(s []int, n int) []int {
	if cap(s) < n {
		return make([]int, n)
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
	wk.strict, wk.shown = growInts(wk.strict, nc), growInts(wk.shown, nc)
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
	// The strict winner at each column is the best family by the metric
	// (ties broken by designation, as the crossover list does).
	for j := 0; j < nc; j++ {
		wk.strict[j] = -1
		var cs float64
		var cd string
		for fi := range m.Families {
			k := wk.best[fi][j]
			if k < 0 {
				continue
			}
			s := m.scores[fi][k]
			d := m.Families[fi].Static(k).Designation
			if wk.strict[j] < 0 || Ahead(s, d, cs, cd) {
				wk.strict[j], cs, cd = fi, s, d
			}
		}
	}
	wk.hold.best, wk.hold.scores, wk.hold.tie = wk.best[:len(m.Families)], m.scores, g.Tie
	wk.hold.reachIn = func(fi, k, j int) float64 {
		return m.Reach(fi, k, sc.Setting, Range{FromMM: g.LengthsMM[j-1], ToMM: g.LengthsMM[j]}).LengthMM
	}
	wk.hold.name = func(fi, k int) string { return m.Families[fi].Static(k).Designation }
	wk.hold.run(wk.strict, wk.shown)
	for j := 0; j < nc; j++ {
		c := MapCell{Family: wk.strict[j], Index: -1, Shown: wk.shown[j], ShownIndex: -1}
		if c.Family >= 0 {
			c.Index = wk.best[c.Family][j]
			c.Metric = m.mapMetric(c.Family, c.Index, g.LengthsMM[j])
		}
		if c.Shown >= 0 {
			c.ShownIndex = wk.best[c.Shown][j]
		}
		*g.At(i, j) = c
	}
	return nil
}

// holdRow applies the crossover list's near-tie rule (familyChanges) along
// one load row, lengths ascending: the family in front keeps its place until
// it stops working or the best other family beats its best working size by
// more than tie (Better). As in the list, the comparison is made only where
// the family in front changes size: every other family's best score only
// worsens with length (fewer sizes work further up), so nothing can overtake
// a family that keeps its size. Where several families change size between
// two columns, their changes are taken in length order, as the list takes
// them, so that the family named at each column is the list's.
type holdRow struct {
	best   [][]int     // per family, per column: best working candidate, -1 for none
	scores [][]float64 // per family, per candidate: ranking score, lower is better
	tie    float64     // the near-tie fraction
	// reachIn returns the last length at which candidate k of family fi
	// works between column j-1 (where it works) and column j (where it fails).
	reachIn func(fi, k, j int) float64
	// name returns a candidate's designation, which breaks equal scores.
	name func(fi, k int) string
	cur  []int       // per family: its size at the change being taken
	ev   []holdEvent // the changes of size between two columns
}

// holdEvent is one family's change of size between two columns: from its
// length at on, candidate k (-1 for none) is its best.
type holdEvent struct {
	at    float64
	fi, k int
}

// run fills shown with the family in front at each column (-1 where nothing
// works), given the strict best family at each column.
func (h *holdRow) run(strict, shown []int) {
	for len(h.cur) < len(h.best) {
		h.cur = append(h.cur, -1)
	}
	front := -1
	for j := range strict {
		switch {
		case j == 0 || front < 0:
			front = strict[j]
		case h.best[front][j] != h.best[front][j-1]:
			front = h.step(front, j)
		}
		shown[j] = front
	}
}

// step returns the family in front at column j, given the one at column
// j-1, whose size changes between the two.
func (h *holdRow) step(front, j int) int {
	h.ev = h.ev[:0]
	for fi := range h.best {
		h.cur[fi] = h.best[fi][j-1]
		if h.best[fi][j] != h.cur[fi] {
			h.ev = append(h.ev, holdEvent{fi: fi, k: h.best[fi][j]})
		}
	}
	if len(h.ev) > 1 {
		for e := range h.ev {
			h.ev[e].at = h.reachIn(h.ev[e].fi, h.cur[h.ev[e].fi], j)
		}
		// Insertion sort by length: a handful of families at most.
		for a := 1; a < len(h.ev); a++ {
			for b := a; b > 0 && h.ev[b].at < h.ev[b-1].at; b-- {
				h.ev[b], h.ev[b-1] = h.ev[b-1], h.ev[b]
			}
		}
	}
	for e := 0; e < len(h.ev); {
		was := h.cur[front]
		for t := h.ev[e].at; e < len(h.ev) && h.ev[e].at == t; e++ {
			h.cur[h.ev[e].fi] = h.ev[e].k
		}
		if h.cur[front] == was {
			continue // the family in front keeps its size: nothing overtakes it here
		}
		g := h.leader()
		if g < 0 {
			return -1 // nothing works from here on
		}
		if h.cur[front] < 0 || (g != front && Better(h.scores[g][h.cur[g]], h.scores[front][h.cur[front]], h.tie)) {
			front = g
		}
	}
	return front
}

// leader returns the family whose current size scores best (equal scores
// go to the first designation), -1 when no family works.
func (h *holdRow) leader() int {
	b := -1
	var bs float64
	var bn string
	for fi, k := range h.cur[:len(h.best)] {
		if k < 0 {
			continue
		}
		s := h.scores[fi][k]
		if b < 0 || s < bs || (s == bs && h.name(fi, k) < bn) {
			b, bs, bn = fi, s, h.name(fi, k)
		}
	}
	return b
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
