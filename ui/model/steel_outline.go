package model

import (
	"math"

	"upright/steel"
)

// Outline returns candidate i's plan section in mm: a rolled shape with its
// flanges, web and the four web-to-flange fillets of radius kdes − tf; a
// square or rectangular tube with outside corner radius 2t and inside radius
// t; a round tube as a ring. Tubes are drawn with the design wall 0.93 tnom
// (AISC 360-22 B4.2), the wall their published area A is computed from.
func (f *steelFamily) Outline(i int, _ Setting) Outline {
	return SteelOutline(f.cols[i].Shape)
}

// SteelOutline returns the plan section of a steel shape in mm, oriented
// like its footprint (Shape.FootprintIn): a rolled shape's depth d along x
// with the flanges upright, a box's width B along x and height H along y.
func SteelOutline(s *steel.Shape) Outline {
	const mm = steelMMPerIn
	fp := s.FootprintIn()
	o := Outline{WidthMM: fp[0] * mm, DepthMM: fp[1] * mm}
	switch {
	case s.Family.IShaped():
		o.Body = []Region{{Outer: iShapeLoop(s.D*mm, s.Bf*mm, s.Tw*mm, s.Tf*mm, math.Max(0, s.Kdes-s.Tf)*mm)}}
	case s.Family.Round():
		// The wall is drawn with the thickness that gives the catalogue's
		// area A: the design wall for round HSS, and for pipe the published
		// tabulated area where it differs from OD and design wall.
		od, t := s.OD*mm, s.Tdes*mm
		if disc := s.OD*s.OD - 4*s.A/math.Pi; s.A > 0 && disc > 0 {
			t = (s.OD - math.Sqrt(disc)) / 2 * mm
		}
		o.Body = []Region{{Outer: circleLoop(0, 0, od, circleSegments), Holes: []Loop{circleLoop(0, 0, od-2*t, circleSegments)}}}
	default:
		b, h, t := s.B*mm, s.H*mm, s.Tdes*mm
		o.Body = []Region{{Outer: roundedRectLoop(b, h, 2*t), Holes: []Loop{roundedRectLoop(b-2*t, h-2*t, t)}}}
	}
	return o
}

// FilledTube returns a tube's outline with its inside filled: the hole of
// the wall becomes the Fill region (for concrete-filled tubes).
func FilledTube(o Outline) Outline {
	for _, r := range o.Body {
		for _, h := range r.Holes {
			o.Fill = append(o.Fill, Region{Outer: h})
		}
	}
	return o
}

// iShapeLoop traces a rolled I-shape of depth d, flange width bf, web tw,
// flange tf and fillet radius rf, with the depth along x (flanges upright).
func iShapeLoop(d, bf, tw, tf, rf float64) Loop {
	// Traced first with the depth along Y, then turned by swapping the axes.
	hw, hd := tw/2, d/2
	var l Loop
	add := func(pts ...[2]float64) { l = append(l, pts...) }
	add([2]float64{-bf / 2, -hd}, [2]float64{bf / 2, -hd}, [2]float64{bf / 2, -hd + tf})
	if rf > 0 {
		add(arc(hw+rf, -hd+tf+rf, rf, -math.Pi/2, -math.Pi, arcSegments)...)
		add(arc(hw+rf, hd-tf-rf, rf, math.Pi, math.Pi/2, arcSegments)...)
	} else {
		add([2]float64{hw, -hd + tf}, [2]float64{hw, hd - tf})
	}
	add([2]float64{bf / 2, hd - tf}, [2]float64{bf / 2, hd}, [2]float64{-bf / 2, hd}, [2]float64{-bf / 2, hd - tf})
	if rf > 0 {
		add(arc(-hw-rf, hd-tf-rf, rf, math.Pi/2, 0, arcSegments)...)
		add(arc(-hw-rf, -hd+tf+rf, rf, 0, -math.Pi/2, arcSegments)...)
	} else {
		add([2]float64{-hw, hd - tf}, [2]float64{-hw, -hd + tf})
	}
	add([2]float64{-bf / 2, -hd + tf})
	for k := range l {
		l[k][0], l[k][1] = l[k][1], l[k][0]
	}
	return l
}
