package model

import (
	"fmt"
	"math"
	"sort"
	"strings"
)

// DefaultTie is the near-tie tolerance of a new scheme: 5% of the ranking metric.
const DefaultTie = 0.05

// MaxTie is the largest near-tie tolerance accepted (50%).
const MaxTie = 0.5

// TieAccepted says what a near-tie tolerance may be, for messages.
const TieAccepted = "a near-tie tolerance from 0 to 50% of the ranking metric, e.g. 5% or 0.05"

// Better reports whether a challenger's score beats the incumbent's by more
// than the near-tie tolerance tie (a fraction of the incumbent's score);
// lower scores are better, as every ranking metric is.
func Better(challenger, incumbent, tie float64) bool {
	return challenger < incumbent*(1-tie)
}

// NearTie reports whether two scores are within the tolerance of each other:
// neither is better than the other by more than tie.
func NearTie(a, b, tie float64) bool {
	return !Better(a, b, tie) && !Better(b, a, tie)
}

// TieText writes a tolerance as the lists show it, e.g. "within 5%".
func TieText(tie float64) string {
	return fmt.Sprintf("within %s%%", trimPercent(tie*100))
}

func trimPercent(p float64) string {
	s := fmt.Sprintf("%.1f", p)
	if len(s) > 2 && s[len(s)-2:] == ".0" {
		s = s[:len(s)-2]
	}
	return s
}

// NearTieText lists a family change's near-ties, e.g. "within 5%: Glulam,
// HSS round"; "" when there are none.
func (x Crossover) NearTieText() string {
	if len(x.NearTies) == 0 {
		return ""
	}
	return TieText(x.Tie) + ": " + strings.Join(x.NearTies, ", ")
}

// NearTies returns the best working rows of the other families whose score
// is within tie of the best overall, in score order; nil when none is.
func (r *Result) NearTies(tie float64) []*Row {
	best := r.BestOverall()
	if best == nil {
		return nil
	}
	var out []*Row
	for i := range r.Families {
		b := r.Families[i].Best()
		if b != nil && b.Family != best.Family && NearTie(b.Score, best.Score, tie) {
			out = append(out, b)
		}
	}
	sort.SliceStable(out, func(a, b int) bool {
		return Ahead(out[a].Score, out[a].Static.Designation, out[b].Score, out[b].Static.Designation)
	})
	return out
}

// famStep is a family's best working size over lengths up to upTo (mm;
// +Inf when it still works at the end of the range).
type famStep struct {
	upTo float64
	e    reachEntry
}

// familySteps turns a family's reaches into its best size against length,
// with the rule of records (successiveBests).
func familySteps(es []reachEntry) []famStep {
	bests := successiveBests(es)
	steps := make([]famStep, 0, len(bests))
	for _, e := range bests {
		up := e.reach.LengthMM
		if e.reach.Beyond {
			up = math.Inf(1)
		}
		steps = append(steps, famStep{upTo: up, e: e})
	}
	return steps
}

// familyChanges walks the lengths upward and records where the best
// family changes. The family in front keeps its place until it stops
// working or another family's best size beats it by more than tie (a
// fraction of the metric); at each change the other families within tie of
// the new one are listed as near-ties.
func (m *Model) familyChanges(reaches [][]reachEntry, tie float64) []Crossover {
	steps := make([][]famStep, len(reaches))
	var events []float64
	for fi := range reaches {
		steps[fi] = familySteps(reaches[fi])
		for _, s := range steps[fi] {
			if !math.IsInf(s.upTo, 1) {
				events = append(events, s.upTo)
			}
		}
	}
	sort.Float64s(events)
	at := make([]int, len(steps)) // each family's current step
	score := func(fi int) (float64, bool) {
		if at[fi] >= len(steps[fi]) {
			return 0, false
		}
		return steps[fi][at[fi]].e.score, true
	}
	best := func() int {
		b := -1
		var bs float64
		var bn string
		for fi := range steps {
			s, ok := score(fi)
			if !ok {
				continue
			}
			n := steps[fi][at[fi]].e.name
			if b < 0 || s < bs || (s == bs && n < bn) {
				b, bs, bn = fi, s, n
			}
		}
		return b
	}
	inc := best()
	if inc < 0 {
		return nil
	}
	var out []Crossover
	for k, t := range events {
		if k > 0 && t == events[k-1] {
			continue
		}
		before := steps[inc][at[inc]].e
		for fi := range steps {
			for at[fi] < len(steps[fi]) && steps[fi][at[fi]].upTo <= t {
				at[fi]++
			}
		}
		incScore, incWorks := score(inc)
		if incWorks && steps[inc][at[inc]].e.fi == before.fi && steps[inc][at[inc]].e.i == before.i {
			continue // the family in front did not change: nothing can overtake it here
		}
		g := best()
		x := Crossover{Kind: KindFamily, LengthMM: t, From: m.Families[inc].Name(), FromDesignation: before.name, Tie: tie}
		if g < 0 {
			return append(out, x) // nothing works beyond, and nothing will at greater lengths
		}
		gs, _ := score(g)
		if incWorks && (g == inc || !Better(gs, incScore, tie)) {
			continue // the family in front keeps its place within the tolerance
		}
		x.Family, x.To, x.ToDesignation = m.Families[g].Name(), m.Families[g].Name(), steps[g][at[g]].e.name
		for fi := range steps {
			if s, ok := score(fi); ok && fi != g && NearTie(s, gs, tie) {
				x.NearTies = append(x.NearTies, m.Families[fi].Name())
			}
		}
		out = append(out, x)
		inc = g
	}
	return mergeShortReigns(out)
}

// mergeShortReigns drops a family's reign shorter than ToleranceMM, the
// accuracy the lengths are found to: A → B at t1 and B → C at t2 < t1 +
// ToleranceMM become A → C at t1 (and vanish when C is A). The end of the
// list (nothing works beyond) is kept.
func mergeShortReigns(xs []Crossover) []Crossover {
	out := xs[:0:0]
	for _, x := range xs {
		n := len(out)
		if n > 0 && x.To != "" && out[n-1].To == x.From && x.LengthMM-out[n-1].LengthMM < ToleranceMM {
			prev := out[n-1]
			if prev.From == x.To {
				out = out[:n-1] // A → B → A: B never held for a measurable length
				continue
			}
			prev.Family, prev.To, prev.ToDesignation, prev.NearTies = x.Family, x.To, x.ToDesignation, x.NearTies
			out[n-1] = prev
			continue
		}
		out = append(out, x)
	}
	return out
}

// NearTieNote lists the families whose best working size is within the
// scheme's near-tie tolerance of the best overall, e.g. "within 5%: HSS
// round (HSS13.375X0.250)"; "" when none is.
func (m *Model) NearTieNote(res *Result) string {
	rows := res.NearTies(m.Scheme.Tie)
	if len(rows) == 0 {
		return ""
	}
	parts := make([]string, len(rows))
	for i, r := range rows {
		parts[i] = m.Families[r.Family].Name() + " (" + r.Static.Designation + ")"
	}
	return TieText(m.Scheme.Tie) + ": " + strings.Join(parts, ", ")
}

// Ahead reports whether a candidate of score sa and designation da ranks
// before one of score sb and designation db: the lower score, and on an
// exact tie the designation first in byte order. It is the one rule for
// exact ties, used by the table, the best overall, the crossovers and the map.
func Ahead(sa float64, da string, sb float64, db string) bool {
	if sa != sb {
		return sa < sb
	}
	return da < db
}
