package plots

import "math"

// DemandCapFactor limits the automatic y axis to this many times the largest demand shown, so one very strong candidate cannot flatten the rest.
//
// Curves above the cap run off the top, the legend says so, and crossover
// marks and the demand itself are always kept in view.
const DemandCapFactor = 3.0

// headroom is the fraction of space left above the tallest thing shown.
const headroom = 1.08

// extent is the resolved data range of both axes.
type extent struct {
	xmin, xmax float64
	ymin, ymax float64
	// capped reports that at least one series runs above ymax.
	capped bool
}

// fitExtent chooses the axis ranges for a validated chart.
//
// Special cases: a chart with no data at all gets 0–1 on both axes; a zero-width
// x extent is widened by 5 % (at least 1 unit) each side; the y axis starts at
// zero unless data go negative; an explicit XRange or YRange is used as given.
func fitExtent(c *Chart) extent {
	var e extent
	e.xmin, e.xmax = fitX(c)
	if c.YRange != nil {
		e.ymin, e.ymax = c.YRange.Min, c.YRange.Max
	} else {
		e.ymin, e.ymax = fitY(c, e.xmin, e.xmax)
	}
	for i := range c.Series {
		if _, hi, ok := spanY(c.Series[i].Points, e.xmin, e.xmax); ok && hi > e.ymax {
			e.capped = true
			break
		}
	}
	return e
}

// fitX returns the x range: the caller's, or the span of everything drawn.
func fitX(c *Chart) (lo, hi float64) {
	if c.XRange != nil {
		return c.XRange.Min, c.XRange.Max
	}
	lo, hi = math.Inf(1), math.Inf(-1)
	grow := func(x float64) {
		lo = math.Min(lo, x)
		hi = math.Max(hi, x)
	}
	for i := range c.Series {
		for _, p := range c.Series[i].Points {
			grow(p.X)
		}
	}
	for _, p := range c.Demand {
		grow(p.X)
	}
	if c.Marker != nil {
		grow(c.Marker.X)
	}
	for _, m := range c.Crossovers {
		grow(m.X)
	}
	if lo > hi {
		return 0, 1
	}
	if lo == hi {
		pad := math.Max(1, 0.05*math.Abs(lo))
		return lo - pad, hi + pad
	}
	return lo, hi
}

// fitY returns zero (or the lowest value, if negative) to a nice number a
// little above the tallest thing shown between xmin and xmax, capped at
// DemandCapFactor times the largest demand.
func fitY(c *Chart, xmin, xmax float64) (lo, hi float64) {
	var series, keep float64 // tallest series value; tallest value that must stay visible
	lo = 0
	for i := range c.Series {
		if l, h, ok := spanY(c.Series[i].Points, xmin, xmax); ok {
			series = math.Max(series, h)
			lo = math.Min(lo, l)
		}
	}
	demand := math.Inf(-1)
	if l, h, ok := spanY(c.Demand, xmin, xmax); ok {
		demand = h
		lo = math.Min(lo, l)
	}
	keep = math.Max(keep, demand)
	for _, m := range c.Crossovers {
		if m.X >= xmin && m.X <= xmax {
			keep = math.Max(keep, m.Y)
			lo = math.Min(lo, m.Y)
		}
	}
	top := math.Max(series, keep)
	if demand > 0 && top > DemandCapFactor*demand {
		top = math.Max(DemandCapFactor*demand, keep)
	}
	if top <= lo {
		return lo, lo + 1
	}
	return niceBounds(lo, lo+(top-lo)*headroom, yTickTarget)
}

// niceBounds widens [lo, hi] outward to whole steps of the tick spacing, so
// the axis ends on a labelled tick.
func niceBounds(lo, hi float64, target int) (float64, float64) {
	step := niceStep(hi-lo, target)
	return math.Floor(lo/step+1e-9) * step, math.Ceil(hi/step-1e-9) * step
}

// above reports whether the part of pts between xmin and xmax lies wholly
// above ymax (a curve drawn entirely off the top); a curve with nothing in
// that span is not above.
func above(pts []Point, xmin, xmax, ymax float64) bool {
	lo, _, ok := spanY(pts, xmin, xmax)
	return ok && lo > ymax
}

// spanY returns the lowest and highest Y of the polyline pts over [xmin, xmax],
// counting the points inside and the line interpolated at both ends; ok is
// false when the polyline does not reach into the span.
func spanY(pts []Point, xmin, xmax float64) (lo, hi float64, ok bool) {
	lo, hi = math.Inf(1), math.Inf(-1)
	take := func(y float64) {
		lo = math.Min(lo, y)
		hi = math.Max(hi, y)
		ok = true
	}
	for _, p := range pts {
		if p.X >= xmin && p.X <= xmax {
			take(p.Y)
		}
	}
	if y, in := interpolate(pts, xmin); in {
		take(y)
	}
	if y, in := interpolate(pts, xmax); in {
		take(y)
	}
	return lo, hi, ok
}
