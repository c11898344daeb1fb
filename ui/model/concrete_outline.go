package model

import "upright/concrete"

// Outline returns candidate i's plan section in mm: the gross outline, each
// longitudinal bar where the concrete package placed it, and the centreline
// of the perimeter tie (wrapping the corner bars) or of the spiral.
// Crossties are not drawn: the package does not lay them out.
func (f *concreteFamily) Outline(i int, _ Setting) Outline {
	return ConcreteOutline(f.secs[i])
}

// ConcreteOutline returns the plan section of a concrete column in mm, b along x and h along y.
func ConcreteOutline(s *concrete.Section) Outline {
	o := Outline{WidthMM: s.WidthMM, DepthMM: s.DepthH(), TieDiaMM: s.Tie.DiaMM, Spiral: s.Transverse == concrete.Spiral}
	c, dt, db := s.CoverMM, s.Tie.DiaMM, s.Bar.DiaMM
	if s.Shape == concrete.Circular {
		o.Body = []Region{{Outer: circleLoop(0, 0, s.WidthMM, circleSegments)}}
		o.Ties = []Loop{circleLoop(0, 0, s.WidthMM-2*c-dt, circleSegments)}
	} else {
		o.Body = []Region{{Outer: rectLoop(0, 0, s.WidthMM, s.DepthMM)}}
		// The tie centreline lies cover + dt/2 inside the faces and bends
		// around the corner bars: radius dt/2 + db/2 about their centres.
		o.Ties = []Loop{roundedRectLoop(s.WidthMM-2*c-dt, s.DepthMM-2*c-dt, (dt+db)/2)}
	}
	o.Bars = make([]Bar, len(s.BarsXY))
	for k, p := range s.BarsXY {
		o.Bars[k] = Bar{X: p[0], Y: p[1], DiaMM: db}
	}
	return o
}
