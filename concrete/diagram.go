package concrete

import (
	"math"
	"sort"
)

// Point is one point of a P–M interaction diagram.
type Point struct {
	C    float64 // neutral-axis depth c from the compression face, mm (+Inf: uniform compression; 0: uniform tension)
	EpsT float64 // net tensile strain in the extreme tension bar, tension positive
	Pn   float64 // nominal axial strength, N, compression positive
	Mn   float64 // nominal moment about the centroid, N·mm
	Phi  float64 // strength reduction factor, ACI 318-19 Table 21.2.2
}

// gridN is the number of intervals of the cached moment-capacity table.
const gridN = 256

// diagram is the cached interaction diagram about one axis.
type diagram struct {
	points []Point            // nominal diagram from uniform tension to uniform compression
	grid   [gridN + 1]float64 // φMn of the φ-reduced diagram at φPn = j·φPn,max/gridN
	invDP  float64            // gridN/φPn,max
}

// phi returns the strength reduction factor for a net tensile strain by
// ACI 318-19 Table 21.2.2: φc when compression-controlled (εt ≤ εty), 0.90
// when tension-controlled (εt ≥ εty + 0.003), linear between.
func (s *Section) phi(epsT float64) float64 {
	switch {
	case epsT <= s.EpsTy:
		return s.PhiC
	case epsT >= s.EpsTy+0.003:
		return 0.90
	}
	return s.PhiC + (0.90-s.PhiC)*(epsT-s.EpsTy)/0.003
}

// PointAt returns the interaction-diagram point about an axis for a
// neutral-axis depth c, mm, by strain compatibility (ACI 318-19 22.2): a
// linear strain with εcu = 0.003 at the compression face (22.2.2.1), the
// Whitney block of 0.85f'c over a = β1c (22.2.2.4), elastic–perfectly
// plastic bars at their real positions (20.2.2.1) and the concrete displaced
// by bars inside the block subtracted. c ≤ 0 gives uniform tension
// (−fy·Ast) and c = +Inf uniform compression (P0 of Eq. 22.4.2.2). An axis
// other than AxisX or AxisY gives the zero Point.
func (s *Section) PointAt(ax Axis, c float64) Point {
	if ax != AxisX && ax != AxisY {
		return Point{}
	}
	if math.IsNaN(c) || c <= 0 {
		return Point{C: 0, EpsT: math.Inf(1), Pn: -s.FyMPa * s.AstMM2, Phi: 0.90}
	}
	if math.IsInf(c, 1) {
		return Point{C: c, EpsT: -EpsCU, Pn: s.P0, Phi: s.PhiC}
	}
	depth := s.Depth[ax]
	half := depth / 2
	a := math.Min(s.Beta1*c, depth)
	fc := 0.85 * s.FcMPa
	var cc, lever float64
	if s.Shape == Rectangular {
		width := s.Depth[1-ax]
		cc = fc * width * a
		lever = half - a/2
	} else {
		cc, lever = circleSegment(half, a)
		cc *= fc
	}
	pn, mn := cc, cc*lever
	k := 1 - int(ax) // bending about x uses the y coordinate
	dt := 0.0
	ab := s.Bar.AreaMM2
	for _, p := range s.BarsXY {
		u := p[k]
		d := half - u
		eps := EpsCU * (c - d) / c
		fs := EsMPa * eps
		if fs > s.FyMPa {
			fs = s.FyMPa
		} else if fs < -s.FyMPa {
			fs = -s.FyMPa
		}
		if d < a {
			fs -= fc // displaced concrete
		}
		pn += fs * ab
		mn += fs * ab * u
		if d > dt {
			dt = d
		}
	}
	et := EpsCU * (dt - c) / c
	return Point{C: c, EpsT: et, Pn: pn, Mn: mn, Phi: s.phi(et)}
}

// circleSegment returns the area of the segment of depth a of a circle of
// radius r and the distance of its centroid from the centre, toward the
// segment.
func circleSegment(r, a float64) (area, ybar float64) {
	if a <= 0 {
		return 0, 0
	}
	if a >= 2*r {
		return math.Pi * r * r, 0
	}
	th := math.Acos((r - a) / r) // half angle
	sn, cs := math.Sincos(th)
	area = r * r * (th - sn*cs)
	ybar = 2 * r * sn * sn * sn / (3 * (th - sn*cs))
	return area, ybar
}

// buildDiagrams samples both diagrams and fills the moment-capacity tables.
// Round sections take the smaller of the two tables for both axes, since a
// round column may bend in any direction relative to its bars.
func (s *Section) buildDiagrams() {
	for ax := AxisX; ax <= AxisY; ax++ {
		s.diag[ax].points = s.sample(ax)
		s.diag[ax].fill(s.PhiPnMax)
	}
	if s.Shape == Circular {
		for j := range s.diag[0].grid {
			m := math.Min(s.diag[0].grid[j], s.diag[1].grid[j])
			s.diag[0].grid[j], s.diag[1].grid[j] = m, m
		}
	}
}

// sample returns the nominal diagram points about an axis, ordered from
// uniform tension to uniform compression.
func (s *Section) sample(ax Axis) []Point {
	depth := s.Depth[ax]
	k := 1 - int(ax)
	dt := 0.0
	for _, p := range s.BarsXY {
		dt = math.Max(dt, depth/2-p[k])
	}
	cFull := depth / s.Beta1 // the block reaches the far face
	cs := make([]float64, 0, 180)
	const nLin = 140
	for i := 1; i <= nLin; i++ {
		cs = append(cs, cFull*(0.015+0.985*float64(i)/nLin))
	}
	// Beyond cFull only the bars change, until the extreme bar yields in compression.
	epsFull := EpsCU * (dt - cFull) / cFull
	if epsFull > -s.EpsTy && s.EpsTy < EpsCU {
		const nEps = 24
		for i := 1; i <= nEps; i++ {
			e := epsFull + (-s.EpsTy-epsFull)*float64(i)/nEps
			cs = append(cs, EpsCU*dt/(EpsCU+e))
		}
	}
	cs = append(cs, EpsCU*dt/(EpsCU+s.EpsTy), EpsCU*dt/(EpsCU+s.EpsTy+0.003)) // balanced and tension-controlled limits
	sort.Float64s(cs)
	pts := make([]Point, 0, len(cs)+2)
	pts = append(pts, s.PointAt(ax, 0))
	for _, c := range cs {
		pts = append(pts, s.PointAt(ax, c))
	}
	pts = append(pts, s.PointAt(ax, math.Inf(1)))
	return pts
}

// fill builds the upper envelope of φMn over φPn on a uniform grid from 0 to
// φPn,max (the design diagram truncated by Table 22.4.2.1).
func (d *diagram) fill(top float64) {
	for j := range d.grid {
		d.grid[j] = math.Inf(-1)
	}
	d.invDP = gridN / top
	dp := top / gridN
	for i := 0; i+1 < len(d.points); i++ {
		a, b := d.points[i], d.points[i+1]
		p1, m1 := a.Phi*a.Pn, a.Phi*a.Mn
		p2, m2 := b.Phi*b.Pn, b.Phi*b.Mn
		lo, hi := math.Min(p1, p2), math.Max(p1, p2)
		if hi < 0 || lo > top {
			continue
		}
		jlo := int(math.Ceil(lo / dp))
		jhi := int(math.Floor(hi / dp))
		if jlo < 0 {
			jlo = 0
		}
		if jhi > gridN {
			jhi = gridN
		}
		for j := jlo; j <= jhi; j++ {
			p := float64(j) * dp
			if j == gridN {
				p = top
			}
			m := math.Max(m1, m2)
			if p2 != p1 {
				t := (p - p1) / (p2 - p1)
				m = m1 + t*(m2-m1)
			}
			if m > d.grid[j] {
				d.grid[j] = m
			}
		}
	}
	// A grid point no segment reached (a rounding gap) takes its neighbour.
	for j := range d.grid {
		if math.IsInf(d.grid[j], -1) {
			if j > 0 {
				d.grid[j] = d.grid[j-1]
			} else {
				d.grid[j] = 0
			}
		}
	}
}

// mcap returns φMn of the φ-reduced diagram at φPn = p, 0 ≤ p ≤ φPn,max.
func (d *diagram) mcap(p float64) float64 {
	t := p * d.invDP
	if t <= 0 {
		return d.grid[0]
	}
	j := int(t)
	if j >= gridN {
		return d.grid[gridN]
	}
	f := t - float64(j)
	return d.grid[j] + f*(d.grid[j+1]-d.grid[j])
}

// PhiMnAt returns the moment capacity φMn, N·mm, of the φ-reduced
// interaction diagram about an axis at a factored axial load pu, N. It is
// 0 above φPn,max, below zero axial load (the table covers compression
// only) or for an unknown axis.
func (s *Section) PhiMnAt(ax Axis, pu float64) float64 {
	if (ax != AxisX && ax != AxisY) || !(pu >= 0) || pu > s.PhiPnMax*(1+1e-12) {
		return 0
	}
	return s.diag[ax].mcap(pu)
}

// Diagram returns a copy of the nominal interaction-diagram points about an
// axis, from uniform tension to uniform compression; multiply by Phi for
// the design diagram. An unknown axis gives nil.
func (s *Section) Diagram(ax Axis) []Point {
	if ax != AxisX && ax != AxisY {
		return nil
	}
	return append([]Point(nil), s.diag[ax].points...)
}
