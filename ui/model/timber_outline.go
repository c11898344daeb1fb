package model

import (
	"math"

	"upright/timber"
)

// Outline returns candidate i's plan section in mm: the rectangle b × d and,
// under the scheme's fire rating, the char layer of NDS 2018 16.2.1 (the
// effective char depth aeff of Table 16.2.1A on each exposed face). With
// three faces exposed, one broad face (d wide) is drawn protected, the first
// case the timber package checks.
func (f *timberFamily) Outline(i int, _ Setting) Outline {
	k := f.asd[i]
	return TimberOutline(k.Section(), k.Conditions().Fire)
}

// TimberOutline returns the plan section of a timber column in mm, b along x
// and d along y, with its char layer when the fire rating is set.
func TimberOutline(sec timber.Section, fire timber.Fire) Outline {
	b, d := sec.BMM(), sec.DMM()
	o := Outline{WidthMM: b, DepthMM: d, Body: []Region{{Outer: rectLoop(0, 0, b, d)}}}
	if !fire.On() {
		return o
	}
	a, ok := timber.EffectiveCharDepth(fire.Hours)
	if !ok {
		return o
	}
	a *= timberMMPerIn
	// Residual section: 4 sides lose aeff on every face; 3 sides keep the
	// +x broad face (NDS 2018 16.2.1: b − aeff, d − 2 aeff).
	x0, x1, y0, y1 := -b/2+a, b/2-a, -d/2+a, d/2-a
	if fire.Sides == 3 {
		x1 = b / 2
	}
	char := Region{Outer: rectLoop(0, 0, b, d)}
	if x1 > x0 && y1 > y0 {
		char.Holes = []Loop{rectLoop((x0+x1)/2, (y0+y1)/2, x1-x0, math.Max(0, y1-y0))}
	}
	o.Char = []Region{char}
	return o
}
