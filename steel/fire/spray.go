package fire

import (
	"fmt"
	"math"
)

// Sprayed fire-resistive material (SFRM) on a steel column by the
// calculated method of IBC 2021 Section 722.5.1.3 (from memory):
//
//	R = [C1·(W/D) + C2]·h        IBC 2021 Eq. 7-13 (from memory)
//
// with R in hours, W/D in lb/ft/in and h in inches, so h = R/[C1·(W/D) + C2].
// C1 and C2 belong to the listed product; the values here are those of a
// typical listed cementitious product (from memory) and stand for the
// listing, which governs. The equation applies to W/D of at least 0.37 and
// ratings of at least 1 h, with at least 3/8 in of material.
const (
	SprayC1         = 1.05  // product constant C1 (from memory; the listing governs)
	SprayC2         = 0.61  // product constant C2 (from memory; the listing governs)
	SprayMinWD      = 0.37  // least W/D of the equation, lb/ft/in (from memory)
	SprayMinIn      = 0.375 // least thickness, in (from memory)
	SprayMinHours   = 1.0   // least rating of the equation, h (from memory)
	SprayStepIn     = 0.0625
	SprayDensityPcf = 15.0 // density of a typical cementitious SFRM, lb/ft³ (common practice, from memory)
	SprayMaxIn      = 4.0  // thickest application offered: a practical limit, not a code limit
)

// SprayClause cites the equation this file implements.
const SprayClause = "IBC 2021 722.5.1.3 (from memory)"

// ContourPerimeterIn returns the heated perimeter D of a column under
// sprayed material, which follows the section's contour, in: for an
// I-shaped profile 4·bf + 2·d (the web's −2·tw is left out, which lowers
// W/D and errs on the safe side), for a rectangular HSS 2(B + H), for a
// round section π·OD. a and b are the two plan dimensions (d and bf, B and
// H, or OD twice).
func ContourPerimeterIn(o Outline, a, b float64) (float64, error) {
	if !finite(a) || !finite(b) || a <= 0 || b <= 0 || a > 200 || b > 200 {
		return 0, bad("plan dimension", math.Max(a, b), "plan dimensions greater than 0 and at most 200 in")
	}
	switch o {
	case Profile:
		return 4*b + 2*a, nil
	case Box:
		return 2 * (a + b), nil
	case Round:
		return math.Pi * a, nil
	}
	return 0, bad("outline", float64(o), "profile (0), box (1) or round (2)")
}

// Spray is the sprayed thickness that gives a column its rating, or the
// reason the method does not apply.
type Spray struct {
	Hours       float64 // rating asked for, h
	WLbFt       float64 // steel weight W, lb/ft
	PerimeterIn float64 // heated perimeter D (contour), in
	WD          float64 // W/D, lb/ft/in
	ExactIn     float64 // R/[C1·(W/D) + C2], in
	ThicknessIn float64 // applied: at least 3/8 in, rounded up to 1/16 in
	Minutes     float64 // R provided by the applied thickness, min
	OK          bool    // the method applies and the thickness is offered
	Reason      string  // why not, when OK is false
	Steps       []Step  // the trace
}

// SprayThickness returns the SFRM thickness that gives a column of weight w
// (lb/ft) and contour perimeter d (in) a rating of hours. Ratings below
// 1 h are taken at 1 h (the equation's least rating); W/D below 0.37 and a
// thickness above SprayMaxIn are not OK, with the reason.
func SprayThickness(w, d, hours float64) (Spray, error) {
	if err := checkWD(w, d); err != nil {
		return Spray{}, err
	}
	if !finite(hours) || hours <= 0 || hours > MaxHours {
		return Spray{}, bad("rating", hours, "a rating greater than 0 and at most 4 h")
	}
	sp := Spray{Hours: hours, WLbFt: w, PerimeterIn: d, WD: w / d}
	r := math.Max(hours, SprayMinHours)
	sp.ExactIn = r / (SprayC1*sp.WD + SprayC2)
	sp.ThicknessIn = math.Max(SprayMinIn, math.Ceil(sp.ExactIn/SprayStepIn-1e-9)*SprayStepIn)
	sp.Minutes = 60 * (SprayC1*sp.WD + SprayC2) * sp.ThicknessIn
	sp.OK = true
	switch {
	case sp.WD < SprayMinWD:
		sp.OK = false
		sp.Reason = fmt.Sprintf("W/D = %.2f lb/ft/in is below the %.2f the sprayed-material equation applies to (%s)", sp.WD, SprayMinWD, SprayClause)
	case sp.ThicknessIn > SprayMaxIn:
		sp.OK = false
		sp.Reason = fmt.Sprintf("%.2f in of sprayed material would be needed, more than the %.0f in offered (%s)", sp.ThicknessIn, SprayMaxIn, SprayClause)
	}
	sp.Steps = []Step{
		{SprayClause, "W", "steel weight per length", w, "lb/ft"},
		{SprayClause, "D", "heated perimeter along the contour (I-shape 4bf + 2d, box 2(B + H), round π·OD)", d, "in"},
		{SprayClause, "W/D", "steel weight over heated perimeter (at least 0.37)", sp.WD, "lb/ft/in"},
		{SprayClause, "h exact", fmt.Sprintf("R/[C1·(W/D) + C2], R = %.1f h, C1 = %.2f, C2 = %.2f (a typical listed product, from memory; the listing governs)", r, SprayC1, SprayC2), sp.ExactIn, "in"},
		{SprayClause, "h", "at least 3/8 in, rounded up to 1/16 in", sp.ThicknessIn, "in"},
		{SprayClause, "R", "[C1·(W/D) + C2]·h", sp.Minutes, "min"},
	}
	return sp, nil
}
