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

// ErrAmbiguousUnit is what a *ParseError wraps when its unit could be read two ways.
var ErrAmbiguousUnit = errors.New("ambiguous unit")

// ParseError says what could not be read and what is accepted.
type ParseError struct {
	Kind     string // "length", "force", ...
	Value    string
	Accepted string
	// Reason, when not empty, says why the unit is ambiguous and which
	// unambiguous forms to write instead; the error then wraps ErrAmbiguousUnit.
	Reason string
}

func (e *ParseError) Error() string {
	if e.Reason != "" {
		return fmt.Sprintf("%s; accepted: %s", e.Why(), e.Accepted)
	}
	return fmt.Sprintf("cannot read %q as %s; accepted: %s", e.Value, Article(e.Kind), e.Accepted)
}

// Why is the one sentence the window, the commands and scheme files show for
// an ambiguous unit, e.g. `"1800k" is ambiguous: k may mean kip or kN; write 1800kip or 1800kN`;
// it is empty when the unit is not ambiguous.
func (e *ParseError) Why() string {
	if e.Reason == "" {
		return ""
	}
	return fmt.Sprintf("%q is ambiguous: %s", strings.TrimSpace(e.Value), e.Reason)
}

// WhyAmbiguous returns the sentence saying why err refused an ambiguous
// unit ("\"0.5k/ft\" is ambiguous: …"), or "" for any other error.
func WhyAmbiguous(err error) string {
	var pe *ParseError
	if errors.As(err, &pe) {
		return pe.Why()
	}
	return ""
}

// Unwrap gives ErrAmbiguousUnit for an ambiguous unit, else nil.
func (e *ParseError) Unwrap() error {
	if e.Reason != "" {
		return ErrAmbiguousUnit
	}
	return nil
}

// Accepted forms, shown in messages.
const (
	LengthForms   = `a length with a unit, e.g. 4.2m, 4200mm, 14ft, 14'-6", 168in`
	ForceForms    = "a force with a unit, e.g. 1800kN, 400kip, 2.5MN, 90000lb, 180tonne"
	PressureForms = "a pressure with a unit, e.g. 4.0kPa, 80psf, 0.1ksf"
	AreaForms     = "an area with a unit, e.g. 60m2, 650ft2, 650sf"
	StressForms   = "a stress with a unit, e.g. 35MPa, 5000psi, 5ksi"
)

var ftIn = regexp.MustCompile(`^([0-9]*\.?[0-9]+)\s*(?:'|ft|feet|foot)\s*-?\s*([0-9]*\.?[0-9]+)\s*(?:"|in|inch|inches)$`)

// splitNumber separates a leading decimal number from its unit suffix; it
// returns the number, its text as typed, the unit as typed and the unit in
// lower case.
func splitNumber(s string) (v float64, num, raw, unit string, ok bool) {
	s = strings.TrimSpace(s)
	i := 0
	for i < len(s) && (s[i] >= '0' && s[i] <= '9' || s[i] == '.' || s[i] == '-' || s[i] == '+' || s[i] == 'e' && i > 0 && i+1 < len(s) && (s[i+1] >= '0' && s[i+1] <= '9' || s[i+1] == '-')) {
		i++
	}
	if i == 0 {
		return 0, "", "", "", false
	}
	v, err := strconv.ParseFloat(s[:i], 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, "", "", "", false
	}
	raw = strings.TrimSpace(s[i:])
	return v, s[:i], raw, strings.ToLower(raw), true
}

// ambiguity maps a unit suffix that can be read two ways to why, as a
// format with %[1]s standing for the number as typed. A key is first matched
// as typed (so "M" can differ from "m"), then in lower case.
type ambiguity map[string]string

// reason gives why the suffix (as typed, and in lower case) is ambiguous, or "".
func (a ambiguity) reason(num, raw, unit string) string {
	f, ok := a[raw]
	if !ok {
		if _, known := a[unit]; !known {
			return ""
		}
		f = a[unit]
	}
	return fmt.Sprintf(f, num)
}

func parseWith(kind, s, accepted string, table map[string]float64, amb ambiguity) (float64, error) {
	v, num, raw, u, ok := splitNumber(s)
	if !ok {
		return 0, &ParseError{Kind: kind, Value: s, Accepted: accepted}
	}
	if u == "" {
		return 0, &ParseError{Kind: kind, Value: s, Accepted: accepted + " (" + ErrNoUnit.Error() + ")"}
	}
	if _, exact := amb[raw]; !exact {
		if f, ok := table[u]; ok {
			return v * f, nil
		}
	}
	if r := amb.reason(num, raw, u); r != "" {
		return 0, &ParseError{Kind: kind, Value: s, Accepted: accepted, Reason: r}
	}
	return 0, &ParseError{Kind: kind, Value: s, Accepted: accepted}
}

var lengthUnits = map[string]float64{
	"mm": 1, "cm": 10, "m": 1000,
	"in": MMPerInch, "inch": MMPerInch, "inches": MMPerInch, `"`: MMPerInch,
	"ft": MMPerFoot, "feet": MMPerFoot, "foot": MMPerFoot, "'": MMPerFoot,
}

// ftBare matches feet followed by a number with no inch mark (14'6, 14ft 6),
// which could be 14 ft 6 in or a mistyped decimal of a foot.
var ftBare = regexp.MustCompile(`^([0-9]*\.?[0-9]+)\s*(?:'|ft|feet|foot)\s*-?\s*([0-9]*\.?[0-9]+)$`)

// lengthAmbiguous lists the length suffixes refused as ambiguous.
var lengthAmbiguous = ambiguity{
	// Upper-case M: metres, or M for thousand as in US trade shorthand (common practice).
	"M": "M may mean metres or a thousand (US shorthand); write %[1]sm for metres",
}

// ParseLength reads a length such as 4.2m, 4200mm, 14ft, 14'-6" or 168in and returns mm.
func ParseLength(s string) (float64, error) {
	t := strings.TrimSpace(s)
	if m := ftIn.FindStringSubmatch(strings.ToLower(t)); m != nil {
		ft, _ := strconv.ParseFloat(m[1], 64)
		in, _ := strconv.ParseFloat(m[2], 64)
		return ft*MMPerFoot + in*MMPerInch, nil
	}
	if m := ftBare.FindStringSubmatch(strings.ToLower(t)); m != nil {
		return 0, &ParseError{Kind: "length", Value: s, Accepted: LengthForms,
			Reason: fmt.Sprintf(`%[2]s has no unit (inches? a decimal of a foot?); write %[1]s'-%[2]s" or %[1]sft %[2]sin`, m[1], m[2])}
	}
	return parseWith("length", t, LengthForms, lengthUnits, lengthAmbiguous)
}

var forceUnits = map[string]float64{
	"n": 1, "kn": 1e3, "mn": 1e6,
	"kip": NPerKip, "kips": NPerKip,
	"lb": NPerLbf, "lbs": NPerLbf, "lbf": NPerLbf,
	"tonne": NPerTonneF, "tonnes": NPerTonneF, // tonne-force: the metric tonne is never a US ton
}

// NPerTonneF is one tonne-force in N: 1000 kg × standard gravity 9.80665 m/s² (exact by definition, CGPM 1901).
const NPerTonneF = 9806.65

// forceAmbiguous lists the force suffixes refused as ambiguous.
var forceAmbiguous = ambiguity{
	"k":    "k may mean kip or kN; write %[1]skip or %[1]skN",
	"t":    "t may mean a metric tonne-force (9.807 kN) or a US short ton-force (2000 lb, 8.896 kN); write %[1]stonne, or the force in kN or kip",
	"ton":  "a ton may be a metric tonne-force (9.807 kN), a US short ton-force (2000 lb, 8.896 kN) or a long ton (2240 lb); write %[1]stonne, or the force in kN or kip",
	"tons": "a ton may be a metric tonne-force (9.807 kN), a US short ton-force (2000 lb, 8.896 kN) or a long ton (2240 lb); write %[1]stonne, or the force in kN or kip",
	"#":    "# may mean pounds or a count; write %[1]slb",
}

// ParseForce reads a force such as 1800kN, 400kip or 180tonne and returns N.
func ParseForce(s string) (float64, error) {
	return parseWith("force", s, ForceForms, forceUnits, forceAmbiguous)
}

var pressureUnits = map[string]float64{
	"kpa": 1, "pa": 1e-3, "kn/m2": 1, "kn/m²": 1,
	"psf": KPaPerPsf, "lb/ft2": KPaPerPsf, "ksf": 1000 * KPaPerPsf,
}

// perLength is why a load per length is refused where a pressure is asked.
const perLength = "%[2]s is a load per length, not per area (a missing 2?); write %[1]s%[3]s"

// pressureAmbiguous lists the pressure suffixes refused as ambiguous.
var pressureAmbiguous = ambiguity{
	"kn/m":   fmt.Sprintf(perLength, "%[1]s", "kN/m", "kN/m2 or %[1]skPa"),
	"n/m":    fmt.Sprintf(perLength, "%[1]s", "N/m", "N/m2 or %[1]sPa"),
	"kip/ft": fmt.Sprintf(perLength, "%[1]s", "kip/ft", "ksf"),
	"klf":    fmt.Sprintf(perLength, "%[1]s", "klf", "ksf"),
	"lb/ft":  fmt.Sprintf(perLength, "%[1]s", "lb/ft", "psf or %[1]slb/ft2"),
	"plf":    fmt.Sprintf(perLength, "%[1]s", "plf", "psf"),
	"kg/m2":  "kg/m2 is a mass per area, not a pressure (kilogram-force per m2?); write the pressure in kPa or psf, not %[1]skg/m2",
	"kg/m²":  "kg/m² is a mass per area, not a pressure (kilogram-force per m²?); write the pressure in kPa or psf, not %[1]skg/m²",
	"k":      "k may mean kip per square foot or kPa; write %[1]sksf or %[1]skPa",
}

// ParsePressure reads an area load such as 4.0kPa or 80psf and returns kPa.
func ParsePressure(s string) (float64, error) {
	return parseWith("pressure", s, PressureForms, pressureUnits, pressureAmbiguous)
}

var areaUnits = map[string]float64{
	"m2": 1, "m²": 1, "sqm": 1,
	"ft2": M2PerFt2, "ft²": M2PerFt2, "sf": M2PerFt2, "sqft": M2PerFt2,
}

// areaAmbiguous lists the area suffixes refused as ambiguous: a length unit
// where an area is asked (a missing 2).
var areaAmbiguous = ambiguity{
	"m":  "m is a length, not an area (a missing 2?); write %[1]sm2",
	"ft": "ft is a length, not an area (a missing 2?); write %[1]sft2 or %[1]ssf",
}

// ParseArea reads an area such as 60m2 or 650ft2 and returns m².
func ParseArea(s string) (float64, error) {
	return parseWith("area", s, AreaForms, areaUnits, areaAmbiguous)
}

var stressUnits = map[string]float64{
	"mpa": 1, "n/mm2": 1, "ksi": MPaPerKsi, "psi": MPaPerKsi / 1000,
}

// stressAmbiguous lists the stress suffixes refused as ambiguous.
var stressAmbiguous = ambiguity{
	"k": "k names no stress unit (ksi? kPa?); write %[1]sksi",
}

// ParseStress reads a material strength such as 35MPa, 5000psi or 5ksi and returns MPa.
func ParseStress(s string) (float64, error) {
	return parseWith("stress", s, StressForms, stressUnits, stressAmbiguous)
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
