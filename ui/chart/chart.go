// Package chart turns a model's evaluation into the plots package's chart
// description: one strength curve per shown candidate, the demand line, the
// current-length marker and the crossover marks, in display units.
package chart

import (
	"fmt"
	"math"
	"sync"

	"upright/plots"
	"upright/ui/model"
	"upright/ui/units"
)

// Key names one candidate: its family index and index within the family.
type Key struct{ Family, Index int }

// Options choose what the chart shows.
type Options struct {
	Pinned     []Key             // candidates the user pinned, drawn on top
	Crossovers []model.Crossover // crossovers to mark; nil marks none
	Range      model.Range       // length range; zero means model.DefaultRange
	Title      string            // chart title; empty for none
}

// Builder computes and caches candidate curves for one model, so moving the
// length only re-selects curves instead of recomputing them.
type Builder struct {
	m     *model.Model
	mu    sync.Mutex
	cache map[curveKey][]plots.Point
}

type curveKey struct {
	Key
	from, to float64
}

// NewBuilder returns a chart builder for a model.
func NewBuilder(m *model.Model) *Builder {
	return &Builder{m: m, cache: map[curveKey][]plots.Point{}}
}

func (b *Builder) sys() units.System { return units.System(b.m.Scheme.Units) }

// Shown returns the candidates a chart shows at a result: each family's best
// working size, then the pinned ones not already in.
func Shown(res *model.Result, pinned []Key) []Key {
	var out []Key
	seen := map[Key]bool{}
	for fi := range res.Families {
		if r := res.Families[fi].Best(); r != nil {
			k := Key{r.Family, r.Index}
			out = append(out, k)
			seen[k] = true
		}
	}
	for _, k := range pinned {
		if !seen[k] {
			out = append(out, k)
			seen[k] = true
		}
	}
	return out
}

func (b *Builder) curve(k Key, r model.Range) []plots.Point {
	ck := curveKey{k, r.FromMM, r.ToMM}
	b.mu.Lock()
	pts, ok := b.cache[ck]
	b.mu.Unlock()
	if ok {
		return pts
	}
	raw := b.m.Curve(k.Family, k.Index, b.m.Scheme.Setting, r)
	sys := b.sys()
	pts = make([]plots.Point, 0, len(raw))
	for _, p := range raw {
		if !p.Permitted {
			// Where the method no longer applies the curve ends.
			break
		}
		x, _ := units.LengthValue(p.LengthMM, sys)
		y, _ := units.ForceValue(p.CapacityN, sys)
		pts = append(pts, plots.Point{X: x, Y: y})
	}
	b.mu.Lock()
	b.cache[ck] = pts
	b.mu.Unlock()
	return pts
}

// Labels returns the axis labels for the scheme's units and method.
func Labels(m *model.Model) (x, y string) {
	sys := units.System(m.Scheme.Units)
	_, lu := units.LengthValue(0, sys)
	_, fu := units.ForceValue(0, sys)
	if m.Scheme.Setting.Method == model.ASD {
		return fmt.Sprintf("Unbraced length (%s)", lu), fmt.Sprintf("Allowable strength Pn/Ω (%s)", fu)
	}
	return fmt.Sprintf("Unbraced length (%s)", lu), fmt.Sprintf("Design strength φPn (%s)", fu)
}

// shortStrength is the y axis's short title, for a chart too short for
// the long one: the strength's symbol with its unit.
func shortStrength(m *model.Model) string {
	_, fu := units.ForceValue(0, units.System(m.Scheme.Units))
	if m.Scheme.Setting.Method == model.ASD {
		return "Pn/Ω (" + fu + ")"
	}
	return "φPn (" + fu + ")"
}

// Chart builds the chart at a result: curves of the shown candidates, the
// demand line, the marker at the result's length and the crossover marks.
func (b *Builder) Chart(res *model.Result, opt Options) plots.Chart {
	m := b.m
	sys := b.sys()
	r := opt.Range
	if r.ToMM <= r.FromMM {
		r = model.DefaultRange(m.Scheme.Setting.LengthMM, m.Scheme.Units)
	}
	xl, yl := Labels(m)
	ch := plots.Chart{Title: opt.Title, XLabel: xl, YLabel: yl, YShort: shortStrength(m)}
	pinned := map[Key]bool{}
	for _, k := range opt.Pinned {
		pinned[k] = true
	}
	for _, k := range Shown(res, opt.Pinned) {
		f := m.Families[k.Family]
		pts := b.curve(k, r)
		if len(pts) < 2 {
			continue
		}
		label := f.Static(k.Index).Designation
		ch.Series = append(ch.Series, plots.Series{Label: label, Group: f.Material(), Points: pts, Pinned: pinned[k]})
	}
	// The demand line: the governing demand before self-weight, which each
	// candidate's check adds for itself.
	const n = 24
	for i := 0; i <= n; i++ {
		L := r.FromMM + (r.ToMM-r.FromMM)*float64(i)/n
		x, _ := units.LengthValue(L, sys)
		y, _ := units.ForceValue(m.Loads.Demand(0), sys)
		ch.Demand = append(ch.Demand, plots.Point{X: x, Y: y})
	}
	if m.Scheme.SelfWeight {
		ch.DemandLabel = "Demand (+ self-weight)"
	} else {
		ch.DemandLabel = "Demand"
	}
	x, _ := units.LengthValue(res.Setting.LengthMM, sys)
	ch.Marker = &plots.Marker{X: x, Label: units.Length(res.Setting.LengthMM, sys)}
	for _, c := range opt.Crossovers {
		if c.Kind == model.KindSize {
			continue // one mark per family change and per shown reach keeps the chart legible
		}
		L := c.LengthMM
		if L < r.FromMM || L > r.ToMM {
			continue
		}
		fi, i, ok := m.Find(c.From)
		if c.Kind == model.KindFamily {
			fi, i, ok = m.Find(c.FromDesignation)
		}
		if !ok {
			continue
		}
		q := m.Families[fi].Quick(i, m.Scheme.Setting.AtLength(L))
		if !q.Permitted || math.IsNaN(q.CapacityN) {
			continue
		}
		cx, _ := units.LengthValue(L, sys)
		cy, _ := units.ForceValue(q.CapacityN, sys)
		// Reaches stay unlabelled rings (the legend names the curves); a change
		// of best family is labelled with the family taking over.
		label := ""
		if c.Kind == model.KindFamily {
			label = "→ " + c.To
			if c.To == "" {
				label = "none beyond"
			}
		}
		ch.Crossovers = append(ch.Crossovers, plots.Crossover{X: cx, Y: cy, Label: label})
	}
	lo, _ := units.LengthValue(r.FromMM, sys)
	hi, _ := units.LengthValue(r.ToMM, sys)
	ch.XRange = &plots.Range{Min: lo, Max: hi}
	return ch
}
