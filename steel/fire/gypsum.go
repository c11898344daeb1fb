// Package fire sizes the Type X gypsum wallboard enclosure of a steel column
// for a fire-resistance rating by the calculated method of IBC 2021 Section
// 722.5.1.2 (gypsum wallboard protection of structural steel columns).
//
// It stands alone: plain numbers in US customary units (in, lb/ft, minutes,
// hours), a result with its trace out. It knows nothing of the column's
// strength, of other materials or of the user interface.
package fire

import (
	"errors"
	"fmt"
	"math"
)

// Board and enclosure constants.
const (
	LayerIn         = 0.625 // one layer of 5/8 in Type X gypsum wallboard, in
	BoardDensityPcf = 50.0  // board density the IBC 2021 722.5.1.2 equation assumes, lb/ft³ (the 50 in W′, from memory)
	MaxLayers       = 4     // most layers this program offers (2 1/2 in): a practical limit of board enclosures, not a code limit
	MaxHours        = 4.0   // ratings above this are outside the calculated methods of IBC 2021 722
	// MaxWD is the largest W/D, lb/ft/in, the board equation applies to;
	// a heavier column takes the board of a W14X233, whose W/D is about
	// this (IBC 2021 722.5.1.2.2, from memory).
	MaxWD = 3.65
)

// Clause cites the equation this package implements.
const Clause = "IBC 2021 722.5.1.2 (from memory)"

// Outline is the plan outline of a steel section, which fixes its heated
// perimeter under a board enclosure.
type Outline int

// The three outlines.
const (
	Profile Outline = iota // W and HP: an I-shaped profile, boxed by the board
	Box                    // square and rectangular HSS
	Round                  // round HSS and pipe
)

// String names the outline in plain words.
func (o Outline) String() string {
	switch o {
	case Profile:
		return "I-shaped profile"
	case Box:
		return "rectangular hollow section"
	case Round:
		return "round hollow section"
	}
	return "unknown outline"
}

// ErrInput is returned (wrapped) for a NaN, infinite, zero or negative input.
var ErrInput = errors.New("fire: input not accepted")

func bad(name string, v float64, accepted string) error {
	return fmt.Errorf("%w: %s = %v; %s", ErrInput, name, v, accepted)
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// HeatedPerimeterIn returns the heated perimeter D of a column under a board
// enclosure, in: the inside perimeter of the box the board forms (IBC 2021
// 722.5.1.2, D for board as the inside perimeter of the protection, from
// memory). For an I-shaped profile the board boxes the section, so D is
// 2(bf + d); for a rectangular HSS it is the outer perimeter, taken as
// 2(B + H) (the sharp-cornered box, slightly larger than the true perimeter,
// which errs on the safe side: a larger D lowers R); a round section is
// boxed in a square of side OD, so D is 4·OD, not the tube's own π·OD (the
// box perimeter is the larger, so this errs on the safe side too). a and b
// are the two plan dimensions (d and bf, B and H, or OD twice).
func HeatedPerimeterIn(o Outline, a, b float64) (float64, error) {
	if !finite(a) || !finite(b) || a <= 0 || b <= 0 || a > 200 || b > 200 {
		return 0, bad("plan dimension", math.Max(a, b), "plan dimensions greater than 0 and at most 200 in")
	}
	switch o {
	case Profile, Box:
		return 2 * (a + b), nil
	case Round:
		return 4 * a, nil // the square box round the tube
	}
	return 0, bad("outline", float64(o), "profile (0), box (1) or round (2)")
}

// Minutes returns the fire resistance R, minutes, of a steel column of weight
// w (lb/ft) and heated perimeter d (in) enclosed in gypsum wallboard of total
// thickness h (in), with the board's weight W′ included:
//
//	W′ = W + 50·h·D/144               IBC 2021 722.5.1.2 (from memory)
//	R  = 130·[h·(W′/D)/2]^0.75        IBC 2021 722.5.1.2 (from memory)
//
// The equation applies up to W/D = MaxWD; a heavier column is credited with
// no more than a column at that limit (the board of a W14X233, IBC 2021
// 722.5.1.2.2, from memory), so R stops rising with W/D there. Since
// W′/D = W/D + 50·h/144, R depends on W and D only through W/D.
func Minutes(w, d, h float64) (float64, error) {
	if err := checkWD(w, d); err != nil {
		return 0, err
	}
	if !finite(h) || h <= 0 || h > 12 {
		return 0, bad("board thickness h", h, "a thickness greater than 0 and at most 12 in")
	}
	wpd := EquationWD(w, d) + BoardDensityPcf*h/144 // W′/D
	return 130 * math.Pow(h*wpd/2, 0.75), nil
}

// EquationWD returns the W/D, lb/ft/in, the board equation is applied with:
// the column's own W/D up to MaxWD, and MaxWD above it (IBC 2021
// 722.5.1.2.2, from memory: a heavier column takes the board of a W14X233).
func EquationWD(w, d float64) float64 { return math.Min(w/d, MaxWD) }

// Capped reports whether a column's W/D exceeds MaxWD, so that its board
// is that of a W14X233 rather than its own equation's.
func Capped(w, d float64) bool { return w/d > MaxWD }

// WPrime returns W′ = W + 50·h·D/144, lb/ft: the steel and the board
// together (IBC 2021 722.5.1.2, from memory).
func WPrime(w, d, h float64) float64 { return w + BoardDensityPcf*h*d/144 }

func checkWD(w, d float64) error {
	if !finite(w) || w <= 0 || w > 2000 {
		return bad("steel weight W", w, "a weight greater than 0 and at most 2,000 lb/ft")
	}
	if !finite(d) || d <= 0 || d > 800 {
		return bad("heated perimeter D", d, "a perimeter greater than 0 and at most 800 in")
	}
	return nil
}

// Step is one line of the enclosure's trace, in the package's units.
type Step struct {
	Clause   string
	Quantity string
	Formula  string
	Value    float64
	Unit     string // "in", "lb/ft", "min", "h" or "" for counts and ratios
}

// Enclosure is the fewest layers of 5/8 in Type X board that give a column
// the rating asked for, or the reason none up to MaxLayers does.
type Enclosure struct {
	Hours       float64 // rating asked for, h
	WLbFt       float64 // steel weight W, lb/ft
	PerimeterIn float64 // heated perimeter D, in
	Layers      int     // layers chosen (MaxLayers when none reaches the rating)
	ThicknessIn float64 // total board thickness h, in
	WPrimeLbFt  float64 // W′ at that thickness, lb/ft
	Minutes     float64 // R provided by that thickness, min
	OK          bool    // R reaches the rating
	Reason      string  // why not, when OK is false
	Steps       []Step  // the trace
}

// ProvidedHours returns the fire resistance the enclosure provides, h.
func (e *Enclosure) ProvidedHours() float64 { return e.Minutes / 60 }

// Fewest returns the fewest layers of 5/8 in Type X board, from one to
// MaxLayers, that reach hours·60 minutes, the R they give and whether they
// reach it (MaxLayers and false when none does). It is Size without the
// trace and does not allocate.
func Fewest(w, d, hours float64) (layers int, minutes float64, ok bool, err error) {
	if err := checkWD(w, d); err != nil {
		return 0, 0, false, err
	}
	if !finite(hours) || hours <= 0 || hours > MaxHours {
		return 0, 0, false, bad("rating", hours, "a rating greater than 0 and at most 4 h")
	}
	for n := 1; n <= MaxLayers; n++ {
		r, _ := Minutes(w, d, float64(n)*LayerIn) // inputs checked above
		layers, minutes = n, r
		if r >= hours*60 {
			return n, r, true, nil
		}
	}
	return layers, minutes, false, nil
}

// Size returns the fewest layers of 5/8 in Type X gypsum wallboard, from one
// to MaxLayers, whose calculated fire resistance R reaches hours·60 minutes
// for a column of weight w (lb/ft) and heated perimeter d (in).
func Size(w, d, hours float64) (Enclosure, error) {
	if err := checkWD(w, d); err != nil {
		return Enclosure{}, err
	}
	if !finite(hours) || hours <= 0 || hours > MaxHours {
		return Enclosure{}, bad("rating", hours, "a rating greater than 0 and at most 4 h")
	}
	e := Enclosure{Hours: hours, WLbFt: w, PerimeterIn: d}
	need := hours * 60
	e.Steps = append(e.Steps,
		Step{Clause, "W", "steel weight per length", w, "lb/ft"},
		Step{Clause, "D", "heated perimeter", d, "in"},
		Step{Clause, "W/D", "steel weight over heated perimeter", w / d, "lb/ft/in"},
		Step{Clause, "R required", "rating × 60", need, "min"},
	)
	if Capped(w, d) {
		e.Steps = append(e.Steps, Step{"IBC 2021 722.5.1.2.2 (from memory)", "W/D used",
			"W/D above 3.65: the board of a W14X233 (W/D taken as 3.65)", MaxWD, "lb/ft/in"})
	}
	e.Layers, e.Minutes, e.OK, _ = Fewest(w, d, hours) // inputs checked above
	e.ThicknessIn = float64(e.Layers) * LayerIn
	e.WPrimeLbFt = WPrime(w, d, e.ThicknessIn)
	e.Steps = append(e.Steps,
		Step{Clause, "layers", "fewest 5/8 in Type X layers with R ≥ R required", float64(e.Layers), ""},
		Step{Clause, "h", "layers × 0.625 in", e.ThicknessIn, "in"},
		Step{Clause, "W′", "W + 50·h·D/144", e.WPrimeLbFt, "lb/ft"},
		Step{Clause, "R", "130·[h·(W′/D)/2]^0.75, W′/D = W/D used + 50·h/144", e.Minutes, "min"},
	)
	if !e.OK {
		e.Reason = ShortReason(e.Minutes, hours)
	}
	return e, nil
}

// ShortReason says why no enclosure reaches a rating: MaxLayers layers give
// only minutes.
func ShortReason(minutes, hours float64) string {
	return fmt.Sprintf("%d layers of 5/8 in Type X gypsum board give R = %.0f min, short of %.0f min (%s)", MaxLayers, minutes, hours*60, Clause)
}
