package plots

import "gonum.org/v1/plot/vg"

// clipPolyline appends to path the parts of the polyline pts that lie inside
// rect, as move/line components, and returns the extended path. A polyline
// that leaves and re-enters the rectangle becomes several sub-paths. Nothing
// is allocated when path has enough capacity.
func clipPolyline(path vg.Path, pts []vg.Point, rect vg.Rectangle) vg.Path {
	penDown := false
	var last vg.Point
	for i := 1; i < len(pts); i++ {
		a, b, ok := clipSegment(pts[i-1], pts[i], rect)
		if !ok {
			penDown = false
			continue
		}
		if !penDown || a != last {
			path.Move(a)
		}
		path.Line(b)
		last = b
		// The pen stays down only if the segment ended at its true end point.
		penDown = b == pts[i]
	}
	if len(pts) == 1 && rect.Min.X <= pts[0].X && pts[0].X <= rect.Max.X &&
		rect.Min.Y <= pts[0].Y && pts[0].Y <= rect.Max.Y {
		path.Move(pts[0])
		path.Line(pts[0])
	}
	return path
}

// clipSegment clips segment a–b to rect with the Liang–Barsky method and
// reports whether any part is left; a degenerate segment inside rect is kept.
func clipSegment(a, b vg.Point, rect vg.Rectangle) (vg.Point, vg.Point, bool) {
	t0, t1 := 0.0, 1.0
	dx := float64(b.X - a.X)
	dy := float64(b.Y - a.Y)
	edges := [4][2]float64{
		{-dx, float64(a.X - rect.Min.X)},
		{dx, float64(rect.Max.X - a.X)},
		{-dy, float64(a.Y - rect.Min.Y)},
		{dy, float64(rect.Max.Y - a.Y)},
	}
	for _, e := range edges {
		p, q := e[0], e[1]
		if p == 0 {
			if q < 0 {
				return a, b, false
			}
			continue
		}
		t := q / p
		if p < 0 {
			if t > t1 {
				return a, b, false
			}
			if t > t0 {
				t0 = t
			}
		} else {
			if t < t0 {
				return a, b, false
			}
			if t < t1 {
				t1 = t
			}
		}
	}
	ca, cb := a, b
	if t0 > 0 {
		ca = vg.Point{X: a.X + vg.Length(t0*dx), Y: a.Y + vg.Length(t0*dy)}
	}
	if t1 < 1 {
		cb = vg.Point{X: a.X + vg.Length(t1*dx), Y: a.Y + vg.Length(t1*dy)}
	}
	return ca, cb, true
}
