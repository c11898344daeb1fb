package model

import "math"

// Loop is one closed polygon in plan, its vertices in mm from the column
// axis: x across the plan width (Static.FootprintMM[0]) and y across the plan
// depth (Static.FootprintMM[1]), y pointing up the page. The last vertex
// joins the first.
type Loop [][2]float64

// Region is an area bounded by an outer loop, less the areas of its holes.
type Region struct {
	Outer Loop
	Holes []Loop
}

// Bar is one longitudinal reinforcing bar in plan.
type Bar struct {
	X, Y  float64 // centre, mm
	DiaMM float64 // nominal diameter, mm
}

// Outline is the true plan geometry of one candidate, in mm, for drawing to scale.
type Outline struct {
	WidthMM, DepthMM float64 // plan size of the bare section (Static.FootprintMM)
	// Body is the structural material: the steel of a rolled shape or tube,
	// the gross concrete outline, the wood. Its area is the section's area
	// (steel A, concrete Ag, timber b·d).
	Body []Region
	// Fill is the concrete infill of a filled tube, drawn inside the wall;
	// empty for every other section.
	Fill []Region
	// Bars are the longitudinal bars of a concrete section.
	Bars []Bar
	// Ties are the centrelines of the ties or of the spiral of a concrete section.
	Ties []Loop
	// TieDiaMM is the tie or spiral bar diameter, mm.
	TieDiaMM float64
	// Spiral reports that Ties is a continuous spiral rather than ties.
	Spiral bool
	// Char is the layer that chars away in the scheme's fire rating (timber,
	// NDS 2018 16.2.1): the outline less the residual section.
	Char []Region
	// ProtectionMM is the thickness of a fire-protection board enclosure
	// around the section's bounding box; 0 when unprotected.
	ProtectionMM float64
}

// Outliner is a Family that can give the plan geometry of each candidate.
type Outliner interface {
	// Outline returns candidate i's plan geometry at the setting.
	Outline(i int, s Setting) Outline
}

// Protected is a Family whose candidates need a fire-protection enclosure
// at the scheme's fire rating (for example gypsum board around steel, IBC
// 722.5.1); OutlineOf draws the board around their outline.
type Protected interface {
	// ProtectionMM returns the enclosure thickness of candidate i, mm; 0 for none.
	ProtectionMM(i int, s Setting) float64
}

// OutlineOf returns the plan geometry of candidate i of family f, with the
// protection thickness the family gives when it is Protected, and false
// when the family gives no geometry.
func OutlineOf(f Family, i int, s Setting) (Outline, bool) {
	o, ok := Unwrap(f).(Outliner)
	if !ok || i < 0 || i >= f.Len() {
		return Outline{}, false
	}
	out := o.Outline(i, s)
	if p, ok := f.(Protected); ok {
		if t := p.ProtectionMM(i, s); finite(t) && t > 0 {
			out.ProtectionMM = t
		}
	}
	return out, true
}

// Segments used to trace curves: whole circles and quarter arcs.
const (
	circleSegments = 64
	arcSegments    = 6
)

// rectLoop returns a w × h rectangle centred on (cx, cy), counter-clockwise.
func rectLoop(cx, cy, w, h float64) Loop {
	return Loop{{cx - w/2, cy - h/2}, {cx + w/2, cy - h/2}, {cx + w/2, cy + h/2}, {cx - w/2, cy + h/2}}
}

// circleLoop returns a circle of diameter d centred on (cx, cy), traced by a
// polygon of circleSegments sides whose area equals the circle's (the
// vertices sit slightly outside the circle), counter-clockwise.
func circleLoop(cx, cy, d float64, n int) Loop {
	// A regular n-gon of circumradius R has area n R² sin(2π/n)/2; choose R so
	// that it equals πr².
	r := d / 2 * math.Sqrt(2*math.Pi/(float64(n)*math.Sin(2*math.Pi/float64(n))))
	out := make(Loop, n)
	for k := range out {
		t := 2 * math.Pi * float64(k) / float64(n)
		out[k] = [2]float64{cx + r*math.Cos(t), cy + r*math.Sin(t)}
	}
	return out
}

// roundedRectLoop returns a w × h rectangle centred on the origin whose
// corners are rounded to radius r, counter-clockwise, each corner arc traced
// by arcSegments chords enclosing the arc's exact area.
func roundedRectLoop(w, h, r float64) Loop {
	r = math.Max(0, math.Min(r, math.Min(w, h)/2))
	if r == 0 {
		return rectLoop(0, 0, w, h)
	}
	out := make(Loop, 0, 4*(arcSegments+1))
	corners := [4][3]float64{ // centre x, centre y, start angle
		{w/2 - r, -h/2 + r, -math.Pi / 2},
		{w/2 - r, h/2 - r, 0},
		{-w/2 + r, h/2 - r, math.Pi / 2},
		{-w/2 + r, -h/2 + r, math.Pi},
	}
	for _, c := range corners {
		out = append(out, arc(c[0], c[1], r, c[2], c[2]+math.Pi/2, arcSegments)...)
	}
	return out
}

// arc returns n+1 points along a circular arc from angle a0 to a1 about
// (cx, cy): the end points on the arc and the inner ones pushed out so that
// the fan of chords from the centre encloses exactly the sector's area.
func arc(cx, cy, r, a0, a1 float64, n int) Loop {
	step := (a1 - a0) / float64(n)
	// Fan area ½ sin(step)·(2·r·ρ + (n−2)·ρ²) equals the sector ½ r²·n·step
	// when ρ solves this quadratic (n ≥ 3).
	m := float64(n - 2)
	rr := r * (math.Sqrt(1+m*float64(n)*step/math.Sin(step)) - 1) / m
	out := make(Loop, n+1)
	for k := 0; k <= n; k++ {
		t := a0 + step*float64(k)
		rk := rr
		if k == 0 || k == n {
			rk = r
		}
		out[k] = [2]float64{cx + rk*math.Cos(t), cy + rk*math.Sin(t)}
	}
	return out
}

// reversed returns the loop's vertices in the opposite order.
func reversed(l Loop) Loop {
	out := make(Loop, len(l))
	for i, p := range l {
		out[len(l)-1-i] = p
	}
	return out
}

// LoopArea returns a loop's signed area by the shoelace formula, mm²:
// positive when counter-clockwise.
func LoopArea(l Loop) float64 {
	a := 0.0
	for i := range l {
		j := (i + 1) % len(l)
		a += l[i][0]*l[j][1] - l[j][0]*l[i][1]
	}
	return a / 2
}

// RegionArea returns a region's area, mm²: its outer loop less its holes.
func RegionArea(r Region) float64 {
	a := math.Abs(LoopArea(r.Outer))
	for _, h := range r.Holes {
		a -= math.Abs(LoopArea(h))
	}
	return a
}
