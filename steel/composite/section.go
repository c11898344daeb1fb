// Package composite sizes concrete-filled hollow structural sections
// (square, rectangular and round HSS filled with plain concrete) in axial
// compression by AISC 360-22 Section I2.2, with the local buckling
// classification of Table I1.1a.
//
// Everything inside the package is US customary: inches, kips, ksi, pounds
// per cubic foot. It reads the steel catalogue's HSS (package steel) for the
// tube's dimensions and properties and knows nothing of any other material
// package. Equation numbers and coefficients that were recalled rather than
// read from the specification are marked "(from memory)" beside them.
package composite

import (
	"fmt"
	"math"

	"upright/steel"
)

// Es is the modulus of elasticity of the steel tube, ksi (AISC 360-22 Symbols).
const Es = steel.E

// DefaultWc is the unit weight of normal-weight concrete used for Ec and for
// the fill's weight, lb/ft³ (145 pcf: common practice for plain normal-weight
// concrete, the value the AISC Manual's composite tables assume (from memory)).
const DefaultWc = 145.0

// Section is the geometry of one filled tube: the steel HSS and the concrete
// core inside it, in inches.
type Section struct {
	Name  string  // the tube's AISC label, e.g. "HSS10X10X1/2"
	Round bool    // round HSS; otherwise square or rectangular
	H, B  float64 // box: outside height (depth for the x axis) and width
	D     float64 // round: outside diameter
	T     float64 // design wall, 0.93 tnom (AISC 360-22 B4.2)

	As, Isx, Isy float64 // steel area and moments of inertia (x: about the axis parallel to B)
	Ac, Icx, Icy float64 // concrete core area and moments of inertia
	WallBT       float64 // rectangular: b/t of the short walls, b = B − 3t (B4.1b(d))
	WallHT       float64 // rectangular: h/t of the long walls, h = H − 3t
	DT           float64 // round: D/t
	SteelLbPerFt float64 // the tube's published nominal weight, lb/ft
}

// Ag returns the gross area of the composite section, in² (As + Ac).
func (s *Section) Ag() float64 { return s.As + s.Ac }

// Lambda returns the width-to-thickness ratio that classifies the section
// (AISC 360-22 Table I1.1a): the larger of b/t and h/t for a box, D/t for a
// round tube.
func (s *Section) Lambda() float64 {
	if s.Round {
		return s.DT
	}
	return math.Max(s.WallBT, s.WallHT)
}

// Spandrel constants: the area between a square of side r and the quarter
// circle of radius r inscribed in it, its centroid from each straight side
// and its own centroidal moment of inertia (multiples of r², r and r⁴).
const (
	spandrelArea = 1 - math.Pi/4
	spandrelBar  = (5.0/6 - math.Pi/4) / spandrelArea
)

var spandrelI = (1 - 5*math.Pi/16) - spandrelArea*spandrelBar*spandrelBar

// roundedRect returns the area and the moment of inertia about the axis
// parallel to b of a b × h rectangle with corners rounded to radius r.
func roundedRect(b, h, r float64) (area, i float64) {
	ac := spandrelArea * r * r
	y := h/2 - spandrelBar*r
	area = b*h - 4*ac
	i = b*h*h*h/12 - 4*(spandrelI*r*r*r*r+ac*y*y)
	return
}

// NewSection builds the filled section of a catalogue HSS (square,
// rectangular or round). The concrete fills the tube's inside: for a box,
// (B − 2t) × (H − 2t) with inside corners of radius t (the catalogue's
// outside corner radius is 2t); for a round tube, a circle of diameter
// D − 2t. It rejects a nil shape and any other family.
func NewSection(s *steel.Shape) (Section, error) {
	if s == nil {
		return Section{}, fmt.Errorf("shape: none given; a square, rectangular or round HSS of the catalogue is required")
	}
	sec := Section{Name: s.Name, T: s.Tdes, As: s.A, Isx: s.Ix, Isy: s.Iy, SteelLbPerFt: s.Weight}
	t := s.Tdes
	switch s.Family {
	case steel.HSSSquare, steel.HSSRect:
		sec.H, sec.B = s.H, s.B
		bi, hi := s.B-2*t, s.H-2*t
		sec.Ac, sec.Icx = roundedRect(bi, hi, t)
		_, sec.Icy = roundedRect(hi, bi, t)
		sec.WallBT, sec.WallHT = s.WallBT, s.WallHT
	case steel.HSSRound:
		sec.Round, sec.D = true, s.OD
		di := s.OD - 2*t
		sec.Ac = math.Pi / 4 * di * di
		sec.Icx = math.Pi / 64 * di * di * di * di
		sec.Icy = sec.Icx
		sec.DT = s.DT
	default:
		return Section{}, fmt.Errorf("shape: %s is a %s; only square, rectangular and round HSS are filled", s.Name, s.Family)
	}
	for _, v := range []float64{sec.As, sec.Isx, sec.Isy, sec.Ac, sec.Icx, sec.Icy, sec.T} {
		if !(v > 0) || math.IsInf(v, 0) {
			return Section{}, fmt.Errorf("shape: %s has no usable core (wall %.3f in)", s.Name, t)
		}
	}
	return sec, nil
}
