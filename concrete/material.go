// Package concrete computes the axial design strength of reinforced-concrete
// columns by ACI 318-19: the axial limit of 22.4.2, the P–M interaction
// diagram by strain compatibility (22.2), the slenderness limits of 6.2.5 and
// the moment magnifier of 6.6.4.
//
// Everything inside the package is SI: lengths in mm, forces in N, stresses in
// MPa, moments in N·mm, masses in kg. The code's inch-pound equations are used
// with their constants converted exactly (for example Ec = 57,000√f'c psi is
// about 4,733√f'c MPa), so a US-series and an SI-series column of the same
// size give the same numbers.
package concrete

import (
	"fmt"
	"math"
	"strconv"
)

// Unit conversions used at the edges and to convert the code's inch-pound constants.
const (
	MMPerInch = 25.4                 // mm in one inch
	MPaPerPsi = 0.006894757293168361 // MPa in one psi
	MPaPerKsi = 6.894757293168361    // MPa in one ksi
	NPerKip   = 4448.2216152605      // N in one kip
)

// Material constants and code limits.
const (
	EpsCU           = 0.003             // ACI 318-19 22.2.2.1: maximum usable concrete strain
	EsMPa           = 29000 * MPaPerKsi // ACI 318-19 20.2.2.2: Es = 29,000,000 psi
	ConcreteDensity = 2320.0            // kg/m³: 145 pcf plain normal-weight concrete (common practice; steel counted separately)
	SteelDensity    = 7850.0            // kg/m³: 490 pcf reinforcing steel (common practice)
	MinFcMPa        = 27.5              // lowest f'c accepted: 4,000 psi (27.58 MPa) less rounding
	MaxFcMPa        = 69.0              // highest f'c accepted: 10,000 psi (68.95 MPa) plus rounding
	DefaultFcUSMPa  = 5000 * MPaPerPsi  // US-series default f'c, 5,000 psi
	DefaultFcSIMPa  = 35.0              // SI-series default f'c, 35 MPa
	DefaultCoverMM  = 1.5 * MMPerInch   // ACI 318-19 20.5.1.3.1: 1.5 in clear cover to ties or spirals
	DefaultRhoMax   = 0.04              // practical cap on ρg so lap splices fit (common practice)
	MinRho          = 0.01              // ACI 318-19 10.6.1.1: ρg at least 0.01
	MaxRho          = 0.08              // ACI 318-19 10.6.1.1: ρg at most 0.08
	MaxKLR          = 100.0             // ACI 318-19 6.2.6: upper limit of the moment-magnifier method

	aggregateMM    = 0.75 * MMPerInch // nominal maximum aggregate size assumed, 3/4 in (common practice)
	minClearMM     = 1.5 * MMPerInch  // ACI 318-19 25.2.3: 1.5 in minimum clear spacing of column bars
	minSpiralClear = 1.0 * MMPerInch  // ACI 318-19 25.7.3.1: spiral clear spacing at least 1 in
	maxSpiralClear = 3.0 * MMPerInch  // ACI 318-19 25.7.3.1: spiral clear spacing at most 3 in
	m2minConstMM   = 0.6 * MMPerInch  // ACI 318-19 Eq. 6.6.4.5.4: the 0.6 in of Pu(0.6 + 0.03h)
	m2minSlope     = 0.03             // ACI 318-19 Eq. 6.6.4.5.4: the 0.03 of Pu(0.6 + 0.03h)
	swayLimit      = 22.0             // ACI 318-19 6.2.5.1(a): slenderness neglected in sway frames up to 22
)

// InputError is a bad input: it names the field, the value given and what is accepted.
type InputError struct {
	Field    string // the input, e.g. "f'c"
	Value    string // the value given
	Accepted string // the accepted range in words
}

// Error returns the message naming the field, the value and the accepted range.
func (e *InputError) Error() string {
	return fmt.Sprintf("concrete: %s = %s is not accepted; give %s", e.Field, e.Value, e.Accepted)
}

func badInput(field string, v float64, accepted string) error {
	return &InputError{Field: field, Value: strconv.FormatFloat(v, 'g', 6, 64), Accepted: accepted}
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// CheckFc returns an error unless f'c (MPa) lies from 4,000 to 10,000 psi.
func CheckFc(fcMPa float64) error {
	if !finite(fcMPa) || fcMPa < MinFcMPa || fcMPa > MaxFcMPa {
		return badInput("f'c", fcMPa, "a normal-weight concrete strength from 4,000 to 10,000 psi (27.6 to 69 MPa)")
	}
	return nil
}

// Ec returns the modulus of elasticity of normal-weight concrete, MPa, by
// ACI 318-19 19.2.2.1(b): Ec = 57,000√f'c with f'c and Ec in psi.
func Ec(fcMPa float64) float64 {
	fcPsi := fcMPa / MPaPerPsi
	return 57000 * math.Sqrt(fcPsi) * MPaPerPsi
}

// Beta1 returns the depth factor of the equivalent rectangular stress block
// by ACI 318-19 Table 22.2.2.4.3: 0.85 up to 4,000 psi, falling by 0.05 per
// 1,000 psi, not less than 0.65.
func Beta1(fcMPa float64) float64 {
	fcPsi := fcMPa / MPaPerPsi
	if fcPsi <= 4000 {
		return 0.85
	}
	b := 0.85 - 0.05*(fcPsi-4000)/1000
	if b < 0.65 {
		return 0.65
	}
	return b
}

// FyMPa returns the specified yield strength of an ASTM A615 grade (60 or
// 80), MPa; 0 for any other grade.
func FyMPa(grade int) float64 {
	switch grade {
	case 60:
		return 60 * MPaPerKsi
	case 80:
		return 80 * MPaPerKsi
	}
	return 0
}

// Bar is one ASTM A615 deformed bar size.
type Bar struct {
	Size    int     // bar number, e.g. 9 for #9
	DiaMM   float64 // nominal diameter, mm
	AreaMM2 float64 // nominal area, mm²
}

// Name returns the bar size as written on drawings, e.g. "#9".
func (b Bar) Name() string { return "#" + strconv.Itoa(b.Size) }

// softMetric maps an inch-pound bar number to its soft-metric designation
// of ASTM A615M, the same bar (from memory).
var softMetric = map[int]int{3: 10, 4: 13, 5: 16, 6: 19, 7: 22, 8: 25, 9: 29, 10: 32, 11: 36, 14: 43, 18: 57}

// MetricName returns the bar's soft-metric name, e.g. "#29" for #9 (ASTM
// A615M, from memory); a size without one keeps its inch-pound name.
func (b Bar) MetricName() string {
	if m, ok := softMetric[b.Size]; ok {
		return "#" + strconv.Itoa(m)
	}
	return b.Name()
}

func bar(size int, diaIn, areaIn2 float64) Bar {
	return Bar{Size: size, DiaMM: diaIn * MMPerInch, AreaMM2: areaIn2 * MMPerInch * MMPerInch}
}

// bars holds the ASTM A615 nominal dimensions (Table 1 of the standard, in inches and in², from memory).
var bars = [...]Bar{
	bar(3, 0.375, 0.11),
	bar(4, 0.500, 0.20),
	bar(5, 0.625, 0.31),
	bar(6, 0.750, 0.44),
	bar(7, 0.875, 0.60),
	bar(8, 1.000, 0.79),
	bar(9, 1.128, 1.00),
	bar(10, 1.270, 1.27),
	bar(11, 1.410, 1.56),
	bar(14, 1.693, 2.25),
	bar(18, 2.257, 4.00),
}

// LongitudinalSizes lists the bar numbers the package uses for longitudinal bars.
var LongitudinalSizes = []int{5, 6, 7, 8, 9, 10, 11, 14, 18}

// BarBySize returns the ASTM A615 bar of the given number and whether it exists.
func BarBySize(size int) (Bar, bool) {
	for _, b := range bars {
		if b.Size == size {
			return b, true
		}
	}
	return Bar{}, false
}

// tieFor returns the tie bar for a longitudinal bar by ACI 318-19 25.7.2.2:
// #3 ties enclose bars #10 and smaller, #4 ties enclose #11, #14 and #18.
func tieFor(longSize int) Bar {
	if longSize <= 10 {
		b, _ := BarBySize(3)
		return b
	}
	b, _ := BarBySize(4)
	return b
}

// minClearSpacing returns the minimum clear spacing between longitudinal
// column bars by ACI 318-19 25.2.3: the largest of 1.5 in, 1.5 db and
// (4/3) of the maximum aggregate size.
func minClearSpacing(db float64) float64 {
	return math.Max(minClearMM, math.Max(1.5*db, 4.0/3.0*aggregateMM))
}
