package model

import (
	"context"
	"math"
	"sort"
)

// ToleranceMM is the accuracy to which crossover lengths are found.
const ToleranceMM = 5.0

// Range is a span of unbraced lengths, mm.
type Range struct{ FromMM, ToMM float64 }

// CurvePoint is one sample of a capacity curve.
type CurvePoint struct {
	LengthMM  float64
	CapacityN float64 // 0 where not permitted
	DemandN   float64 // the demand on this candidate at this length
	Mode      int
	Permitted bool
}

// Curve samples a candidate's capacity against unbraced length over r,
// adaptively: a coarse even grid, refined where the governing mode changes
// or the curve bends away from a straight chord.
func (m *Model) Curve(fi, i int, base Setting, r Range) []CurvePoint {
	const coarse = 40
	const maxDepth = 5
	f := m.Families[fi]
	st := f.Static(i)
	at := func(L float64) CurvePoint {
		q := f.Quick(i, base.AtLength(L))
		c := q.CapacityN
		if !q.Permitted {
			c = 0
		}
		return CurvePoint{LengthMM: L, CapacityN: c, Mode: q.Mode, Permitted: q.Permitted,
			DemandN: m.Loads.Demand(m.SelfWeightN(st, L))}
	}
	pts := make([]CurvePoint, 0, 4*coarse)
	var refine func(a, b CurvePoint, depth int)
	refine = func(a, b CurvePoint, depth int) {
		if depth >= maxDepth || b.LengthMM-a.LengthMM < 2*ToleranceMM {
			pts = append(pts, b)
			return
		}
		mid := at((a.LengthMM + b.LengthMM) / 2)
		chord := (a.CapacityN + b.CapacityN) / 2
		scale := math.Max(math.Max(a.CapacityN, b.CapacityN), 1)
		if a.Mode != b.Mode || a.Permitted != b.Permitted || math.Abs(mid.CapacityN-chord) > 0.004*scale {
			refine(a, mid, depth+1)
			refine(mid, b, depth+1)
			return
		}
		pts = append(pts, b)
	}
	prev := at(r.FromMM)
	pts = append(pts, prev)
	for k := 1; k <= coarse; k++ {
		next := at(r.FromMM + (r.ToMM-r.FromMM)*float64(k)/coarse)
		refine(prev, next, 0)
		prev = next
	}
	return pts
}

// Reach is how far a candidate carries the demand.
type Reach struct {
	LengthMM float64 // longest length at which it still works (valid when Works)
	Works    bool    // it works at the start of the range
	Beyond   bool    // it still works at the end of the range
}

// works reports whether a candidate carries its demand at length L.
func (m *Model) works(fi, i int, base Setting, L float64) bool {
	return m.row(fi, i, base.AtLength(L)).OK
}

// Reach finds, by bisection to ToleranceMM, the longest length in r at
// which a candidate still carries the demand. Strength never rises with
// length and demand never falls, so the working lengths form one interval
// starting at r.FromMM.
func (m *Model) Reach(fi, i int, base Setting, r Range) Reach {
	if !m.works(fi, i, base, r.FromMM) {
		return Reach{}
	}
	if m.works(fi, i, base, r.ToMM) {
		return Reach{LengthMM: r.ToMM, Works: true, Beyond: true}
	}
	lo, hi := r.FromMM, r.ToMM
	for hi-lo > ToleranceMM {
		mid := (lo + hi) / 2
		if m.works(fi, i, base, mid) {
			lo = mid
		} else {
			hi = mid
		}
	}
	return Reach{LengthMM: lo, Works: true}
}

// Crossover kinds.
const (
	KindReach  = "reach"  // a candidate stops carrying the demand
	KindSize   = "size"   // the lightest working size of a family changes
	KindFamily = "family" // the best family by the metric changes
)

// Crossover is a length at which the answer changes.
type Crossover struct {
	Kind            string  `json:"kind"`
	LengthMM        float64 `json:"length_mm"` // last length (to ToleranceMM) at which From still holds
	Family          string  `json:"family"`    // family concerned (for KindFamily, the family taking over; "" when none does)
	From            string  `json:"from"`      // designation (reach, size) or family (family) before
	To              string  `json:"to"`        // designation or family after; "" when nothing works beyond
	FromDesignation string  `json:"from_designation,omitempty"`
	ToDesignation   string  `json:"to_designation,omitempty"`
	// NearTies names, for a change of best family, the other families whose
	// best size is within the scheme's near-tie tolerance of the new one.
	NearTies []string `json:"near_ties,omitempty"`
	// Tie is the near-tie tolerance the change was found with (family changes only).
	Tie float64 `json:"tie,omitempty"`
}

type reachEntry struct {
	fi, i int
	score float64
	reach Reach
	name  string
}

// Crossovers finds every crossover in r: the reach of each candidate in
// show (or of each family's best at the base length when show is nil), the
// lengths where each family's lightest working size changes, and the lengths
// where the best family by the metric changes. Families are searched
// concurrently; ctx cancels the search.
func (m *Model) Crossovers(ctx context.Context, base Setting, r Range, show [][2]int) ([]Crossover, error) {
	// Reach of every candidate, family by family, concurrently.
	reaches := make([][]reachEntry, len(m.Families))
	done := make(chan struct{}, len(m.Families))
	for fi := range m.Families {
		go func(fi int) {
			defer func() { done <- struct{}{} }()
			f := m.Families[fi]
			n := f.Len()
			out := make([]reachEntry, 0, n)
			for i := 0; i < n; i++ {
				if ctx.Err() != nil {
					return
				}
				out = append(out, reachEntry{fi: fi, i: i, score: m.scores[fi][i],
					reach: m.Reach(fi, i, base, r), name: f.Static(i).Designation})
			}
			reaches[fi] = out
		}(fi)
	}
	for range m.Families {
		<-done
	}
	if err := ctx.Err(); err != nil {
		return nil, err
	}
	var out []Crossover
	// (a) reach of the shown candidates.
	if show == nil {
		res, err := m.Evaluate(ctx, base)
		if err != nil {
			return nil, err
		}
		for fi := range res.Families {
			if b := res.Families[fi].Best(); b != nil {
				show = append(show, [2]int{b.Family, b.Index})
			}
		}
	}
	for _, p := range show {
		e := reaches[p[0]][p[1]]
		if e.reach.Works && !e.reach.Beyond {
			out = append(out, Crossover{Kind: KindReach, LengthMM: e.reach.LengthMM,
				Family: m.Families[e.fi].Name(), From: e.name})
		}
	}
	// (b) per family, where the best working size changes.
	for fi := range m.Families {
		for _, t := range records(reaches[fi], r) {
			out = append(out, Crossover{Kind: KindSize, LengthMM: t.at, Family: m.Families[fi].Name(),
				From: t.from.name, To: t.toName()})
		}
	}
	// (c) where the best family changes, beyond the near-tie tolerance.
	out = append(out, m.familyChanges(reaches, m.Scheme.Tie)...)
	sort.SliceStable(out, func(a, b int) bool { return out[a].LengthMM < out[b].LengthMM })
	return out, nil
}

type transition struct {
	at   float64
	from reachEntry
	to   *reachEntry
}

func (t transition) toName() string {
	if t.to == nil {
		return ""
	}
	return t.to.name
}

// records walks candidates in metric order: the best at a length is the
// first one whose reach covers it, so the best changes exactly at the reach
// of the current best, to the next candidate that reaches further.
func records(es []reachEntry, r Range) []transition {
	bests := successiveBests(es)
	var out []transition
	for k := range bests {
		e := &bests[k]
		switch {
		case k+1 < len(bests):
			out = append(out, transition{at: e.reach.LengthMM, from: *e, to: &bests[k+1]})
		case !e.reach.Beyond:
			out = append(out, transition{at: e.reach.LengthMM, from: *e})
		}
	}
	return out
}

// successiveBests returns the working candidates that are in turn the best
// as the length grows: in metric order, each next one is the first that
// reaches further than the current best, and the walk stops at a best that
// works beyond the range. A candidate that outlasts the current best by
// less than two tolerances is skipped: within the search accuracy it never
// holds.
func successiveBests(es []reachEntry) []reachEntry {
	sorted := make([]reachEntry, 0, len(es))
	for _, e := range es {
		if e.reach.Works {
			sorted = append(sorted, e)
		}
	}
	sort.SliceStable(sorted, func(a, b int) bool {
		return Ahead(sorted[a].score, sorted[a].name, sorted[b].score, sorted[b].name)
	})
	var bests []reachEntry
	for k := range sorted {
		e := &sorted[k]
		if len(bests) == 0 {
			bests = append(bests, *e)
			continue
		}
		cur := &bests[len(bests)-1]
		if cur.reach.Beyond {
			break
		}
		if e.reach.LengthMM > cur.reach.LengthMM+2*ToleranceMM {
			bests = append(bests, *e)
		}
	}
	return bests
}
