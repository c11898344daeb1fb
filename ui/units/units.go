// Package units parses and formats the quantities the user types and reads,
// converting between US customary and SI at the edges of the program.
// Every parsed value is returned in SI: mm, N, kPa, m², MPa.
package units

import (
	"errors"
	"fmt"
	"math"
	"regexp"
	"strconv"
	"strings"
)

// Exact conversion constants.
const (
	MMPerInch  = 25.4                 // mm per inch (exact)
	MMPerFoot  = 304.8                // mm per foot (exact)
	NPerKip    = 4448.2216152605      // N per kip
	NPerLbf    = 4.4482216152605      // N per pound-force
	KPaPerPsf  = 0.047880258980335844 // kPa per psf
	MPaPerKsi  = 6.894757293168361    // MPa per ksi
	M2PerFt2   = 0.09290304           // m² per ft² (exact)
	KgPerLb    = 0.45359237           // kg per lb (exact)
	KgmPerPlf  = 1.4881639435695537   // kg/m per lb/ft
	MM2PerIn2  = 645.16               // mm² per in² (exact)
	KNmPerKipF = 1.3558179483314004   // kN·m per kip·ft
)

// ErrNoUnit is returned when a number is given without a unit.
var ErrNoUnit = errors.New("a unit is required")

// ParseError says what could not be read and what is accepted.
type ParseError struct {
	Kind     string // "length", "force", ...
	Value    string
	Accepted string
}

func (e *ParseError) Error() string {
	return fmt.Sprintf("cannot read %q as %s; accepted: %s", e.Value, Article(e.Kind), e.Accepted)
}

// Accepted forms, shown in messages.
const (
	LengthForms   = `a length with a unit, e.g. 4.2m, 4200mm, 14ft, 14'-6", 168in`
	ForceForms    = "a force with a unit, e.g. 1800kN, 400kip, 2.5MN, 90000lb"
	PressureForms = "a pressure with a unit, e.g. 4.0kPa, 80psf, 0.1ksf"
	AreaForms     = "an area with a unit, e.g. 60m2, 650ft2, 650sf"
	StressForms   = "a stress with a unit, e.g. 35MPa, 5000psi, 5ksi"
)

var ftIn = regexp.MustCompile(`^([0-9]*\.?[0-9]+)\s*(?:'|ft|feet|foot)\s*-?\s*([0-9]*\.?[0-9]+)\s*(?:"|in|inch|inches)$`)

// splitNumber separates a leading decimal number from its unit suffix.
func splitNumber(s string) (float64, string, bool) {
	s = strings.TrimSpace(s)
	i := 0
	for i < len(s) && (s[i] >= '0' && s[i] <= '9' || s[i] == '.' || s[i] == '-' || s[i] == '+' || s[i] == 'e' && i > 0 && i+1 < len(s) && (s[i+1] >= '0' && s[i+1] <= '9' || s[i+1] == '-')) {
		i++
	}
	if i == 0 {
		return 0, "", false
	}
	v, err := strconv.ParseFloat(s[:i], 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, "", false
	}
	return v, strings.ToLower(strings.TrimSpace(s[i:])), true
}

func parseWith(kind, s, accepted string, table map[string]float64) (float64, error) {
	v, u, ok := splitNumber(s)
	if !ok {
		return 0, &ParseError{kind, s, accepted}
	}
	if u == "" {
		return 0, &ParseError{kind, s, accepted + " (" + ErrNoUnit.Error() + ")"}
	}
	f, ok := table[u]
	if !ok {
		return 0, &ParseError{kind, s, accepted}
	}
	return v * f, nil
}

var lengthUnits = map[string]float64{
	"mm": 1, "cm": 10, "m": 1000,
	"in": MMPerInch, "inch": MMPerInch, "inches": MMPerInch, `"`: MMPerInch,
	"ft": MMPerFoot, "feet": MMPerFoot, "foot": MMPerFoot, "'": MMPerFoot,
}

// ParseLength reads a length such as 4.2m, 4200mm, 14ft, 14'-6" or 168in and returns mm.
func ParseLength(s string) (float64, error) {
	t := strings.TrimSpace(s)
	if m := ftIn.FindStringSubmatch(strings.ToLower(t)); m != nil {
		ft, _ := strconv.ParseFloat(m[1], 64)
		in, _ := strconv.ParseFloat(m[2], 64)
		return ft*MMPerFoot + in*MMPerInch, nil
	}
	return parseWith("length", t, LengthForms, lengthUnits)
}

var forceUnits = map[string]float64{
	"n": 1, "kn": 1e3, "mn": 1e6,
	"kip": NPerKip, "kips": NPerKip, "k": NPerKip,
	"lb": NPerLbf, "lbs": NPerLbf, "lbf": NPerLbf,
	"t": 9806.65, "tonne": 9806.65, // tonne-force
}

// ParseForce reads a force such as 1800kN or 400kip and returns N.
func ParseForce(s string) (float64, error) {
	return parseWith("force", s, ForceForms, forceUnits)
}

var pressureUnits = map[string]float64{
	"kpa": 1, "pa": 1e-3, "kn/m2": 1, "kn/m²": 1,
	"psf": KPaPerPsf, "lb/ft2": KPaPerPsf, "ksf": 1000 * KPaPerPsf,
}

// ParsePressure reads an area load such as 4.0kPa or 80psf and returns kPa.
func ParsePressure(s string) (float64, error) {
	return parseWith("pressure", s, PressureForms, pressureUnits)
}

var areaUnits = map[string]float64{
	"m2": 1, "m²": 1, "sqm": 1,
	"ft2": M2PerFt2, "ft²": M2PerFt2, "sf": M2PerFt2, "sqft": M2PerFt2,
}

// ParseArea reads an area such as 60m2 or 650ft2 and returns m².
func ParseArea(s string) (float64, error) {
	return parseWith("area", s, AreaForms, areaUnits)
}

var stressUnits = map[string]float64{
	"mpa": 1, "n/mm2": 1, "ksi": MPaPerKsi, "psi": MPaPerKsi / 1000,
}

// ParseStress reads a material strength such as 35MPa, 5000psi or 5ksi and returns MPa.
func ParseStress(s string) (float64, error) {
	return parseWith("stress", s, StressForms, stressUnits)
}

// System is the unit system used for display.
type System string

// The two display systems.
const (
	US System = "us"
	SI System = "si"
)

// Length formats mm as feet-inches (US) or metres (SI).
func Length(mm float64, sys System) string {
	if sys == SI {
		return fmt.Sprintf("%.2f m", mm/1000)
	}
	totalIn := mm / MMPerInch
	ft := math.Floor(totalIn/12 + 1e-9)
	in := totalIn - 12*ft
	if in >= 11.95 {
		ft++
		in = 0
	}
	return fmt.Sprintf("%.0f'-%.1f\"", ft, math.Max(in, 0))
}

// LengthValue converts mm to the display unit (ft or m) and names it.
func LengthValue(mm float64, sys System) (float64, string) {
	if sys == SI {
		return mm / 1000, "m"
	}
	return mm / MMPerFoot, "ft"
}

// ForceValue converts N to the display unit (kip or kN) and names it.
func ForceValue(n float64, sys System) (float64, string) {
	if sys == SI {
		return n / 1e3, "kN"
	}
	return n / NPerKip, "kip"
}

// Force formats N as kip or kN.
func Force(n float64, sys System) string {
	v, u := ForceValue(n, sys)
	return fmt.Sprintf("%.0f %s", v, u)
}

// MassPerLength formats kg/m as lb/ft or kg/m.
func MassPerLength(kgm float64, sys System) string {
	if sys == SI {
		return fmt.Sprintf("%.1f kg/m", kgm)
	}
	return fmt.Sprintf("%.1f lb/ft", kgm/KgmPerPlf)
}

// Mass formats kg as lb or kg.
func Mass(kg float64, sys System) string {
	if sys == SI {
		return fmt.Sprintf("%.0f kg", kg)
	}
	return fmt.Sprintf("%.0f lb", kg/KgPerLb)
}

// Dim formats a plan dimension in mm as inches or mm.
func Dim(mm float64, sys System) string {
	if sys == SI {
		return fmt.Sprintf("%.0f", mm)
	}
	return strconv.FormatFloat(math.Round(mm/MMPerInch*100)/100, 'f', -1, 64)
}

// PlanSize formats a footprint as "w × d in" or "w × d mm".
func PlanSize(fp [2]float64, sys System) string {
	u := "in"
	if sys == SI {
		u = "mm"
	}
	return fmt.Sprintf("%s × %s %s", Dim(fp[0], sys), Dim(fp[1], sys), u)
}

// PlanArea formats mm² as in² (US) or m² (SI).
func PlanArea(mm2 float64, sys System) string {
	if sys == SI {
		return fmt.Sprintf("%.3f m²", mm2/1e6)
	}
	return fmt.Sprintf("%.0f in²", mm2/MM2PerIn2)
}

// Pressure formats kPa as psf or kPa.
func Pressure(kpa float64, sys System) string {
	if sys == SI {
		return fmt.Sprintf("%.2f kPa", kpa)
	}
	return fmt.Sprintf("%.0f psf", kpa/KPaPerPsf)
}

// Area formats m² as ft² or m².
func Area(m2 float64, sys System) string {
	if sys == SI {
		return fmt.Sprintf("%.1f m²", m2)
	}
	return fmt.Sprintf("%.0f ft²", m2/M2PerFt2)
}

// M3PerYd3 is one cubic yard in cubic metres.
const M3PerYd3 = 0.764554857984

// Volume formats m³ as yd³ (US) or m³ (SI) to prec decimals, a dash for none.
func Volume(m3 float64, sys System, prec int) string {
	if m3 == 0 {
		return "—"
	}
	if sys == US {
		return fmt.Sprintf("%.*f yd³", prec, m3/M3PerYd3)
	}
	return fmt.Sprintf("%.*f m³", prec, m3)
}

// Stress formats MPa as ksi or MPa.
func Stress(mpa float64, sys System) string {
	if sys == SI {
		return fmt.Sprintf("%.1f MPa", mpa)
	}
	return fmt.Sprintf("%.2f ksi", mpa/MPaPerKsi)
}

// Convert converts a value in an SI trace unit to the display system,
// returning the converted value and its unit. Unknown units pass through.
func Convert(v float64, siUnit string, sys System) (float64, string) {
	if sys == SI {
		return v, siUnit
	}
	switch siUnit {
	case "mm":
		return v / MMPerInch, "in"
	case "m":
		return v * 1000 / MMPerFoot, "ft"
	case "mm2", "mm²":
		return v / MM2PerIn2, "in²"
	case "mm4", "mm⁴":
		return v / (MM2PerIn2 * MM2PerIn2), "in⁴"
	case "MPa":
		return v / MPaPerKsi, "ksi"
	case "kPa":
		return v / KPaPerPsf, "psf"
	case "N":
		return v / NPerKip, "kip"
	case "kN":
		return v * 1e3 / NPerKip, "kip"
	case "kN·m", "kNm":
		return v / KNmPerKipF, "kip·ft"
	case "kN·m²", "kNm2":
		return v / (KNmPerKipF * MMPerFoot / 1000), "kip·ft²"
	case "kg/m":
		return v / KgmPerPlf, "lb/ft"
	case "kg":
		return v / KgPerLb, "lb"
	case "kg/m³", "kg/m3":
		return v / (KgPerLb / (M2PerFt2 * MMPerFoot / 1000)), "lb/ft³"
	case "m2", "m²":
		return v / M2PerFt2, "ft²"
	}
	return v, siUnit
}
