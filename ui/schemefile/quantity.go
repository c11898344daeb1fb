package schemefile

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"upright/ui/model"
	"upright/ui/units"
)

// kind is one physical kind of quantity stored in a scheme file: how it is
// read, which unit it is written in for each unit system, and the SI unit the
// model keeps it in.
type kind struct {
	name    string                        // "length", "force", ...
	example string                        // shown in type errors
	parse   func(string) (float64, error) // ui/units parser returning the model's SI unit
	prefer  map[model.Units]unitChoice    // unit written for each display system
	si      string                        // the model's own unit, factor 1: always exact
}

// unitChoice is a unit name as written and its size in the model's SI unit.
type unitChoice struct {
	name   string
	factor float64
}

var (
	lengthKind = kind{
		name: "length", example: `"14 ft", "4.2 m" or "14'-6\""`, parse: units.ParseLength, si: "mm",
		prefer: map[model.Units]unitChoice{model.US: {"ft", units.MMPerFoot}, model.SI: {"m", 1000}},
	}
	forceKind = kind{
		name: "force", example: `"400 kip" or "1800 kN"`, parse: units.ParseForce, si: "N",
		prefer: map[model.Units]unitChoice{model.US: {"kip", units.NPerKip}, model.SI: {"kN", 1000}},
	}
	pressureKind = kind{
		name: "pressure", example: `"50 psf" or "2.4 kPa"`, parse: units.ParsePressure, si: "kPa",
		prefer: map[model.Units]unitChoice{model.US: {"psf", units.KPaPerPsf}, model.SI: {"kPa", 1}},
	}
	areaKind = kind{
		name: "area", example: `"650 ft2" or "60 m2"`, parse: units.ParseArea, si: "m2",
		prefer: map[model.Units]unitChoice{model.US: {"ft2", units.M2PerFt2}, model.SI: {"m2", 1}},
	}
	stressKind = kind{
		name: "stress", example: `"50 ksi" or "345 MPa"`, parse: units.ParseStress, si: "MPa",
		prefer: map[model.Units]unitChoice{model.US: {"ksi", units.MPaPerKsi}, model.SI: {"MPa", 1}},
	}
)

// number formats v in the shortest plain decimal form that reads back to
// exactly v (never with an exponent, which the unit parser does not take).
func number(v float64) string {
	return strconv.FormatFloat(v, 'f', -1, 64)
}

// format writes v (in the model's SI unit) as "<number> <unit>", in the unit
// of the scheme's display system when some decimal reads back to exactly v
// (the shortest such decimal is used, so 900 ft² stays "900 ft2" although
// 900 ft² is not a whole number of m²), else in the model's own unit, which
// always reads back exactly. Special case: v must be finite.
func (k kind) format(v float64, sys model.Units) string {
	if u, ok := k.prefer[sys]; ok {
		x := v / u.factor
		for prec := 1; prec <= 17; prec++ {
			y, err := strconv.ParseFloat(strconv.FormatFloat(x, 'g', prec, 64), 64)
			if err != nil || math.IsInf(y, 0) {
				break
			}
			s := number(y) + " " + u.name
			if got, err := k.parse(s); err == nil && got == v {
				return s
			}
		}
	}
	return number(v) + " " + k.si
}

// read parses a quantity string; the result is in the model's SI unit and
// finite.
func (k kind) read(s string) (float64, error) {
	v, err := k.parse(s)
	if err != nil {
		if pe, ok := err.(*units.ParseError); ok {
			if pe.Reason != "" {
				return 0, fmt.Errorf("%s; give %s", pe.Why(), pe.Accepted)
			}
			return 0, fmt.Errorf("cannot read %q as %s; give %s", s, units.Article(k.name), pe.Accepted)
		}
		return 0, fmt.Errorf("cannot read %q as %s: %v", s, units.Article(k.name), err)
	}
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, fmt.Errorf("%q is too large to be %s", s, units.Article(k.name))
	}
	return v, nil
}

// carbonUnit normalises a carbon-factor unit for comparison: no spaces, lower
// case, "m³" spelt "m3".
func carbonUnit(u string) string {
	u = strings.ToLower(strings.ReplaceAll(u, " ", ""))
	return strings.ReplaceAll(u, "m³", "m3")
}

// formatCarbon writes a carbon factor as "<number> <unit>" in the unit of its kind.
func formatCarbon(v float64, ck model.CarbonKind) string {
	return number(v) + " " + ck.FactorUnit
}

// readCarbon parses "<number> <unit>" where the unit must be the kind's own
// (kg CO2e/kg or kg CO2e/m³; spaces and "m3" for "m³" are accepted).
func readCarbon(s string, ck model.CarbonKind) (float64, error) {
	t := strings.TrimSpace(s)
	i := strings.IndexFunc(t, func(r rune) bool {
		return !(r >= '0' && r <= '9' || r == '.' || r == '-' || r == '+' || r == 'e' || r == 'E')
	})
	if i <= 0 {
		return 0, fmt.Errorf("cannot read %q as a carbon factor; give a number and the unit %s, e.g. \"%s\"", s, ck.FactorUnit, formatCarbon(1.5, ck))
	}
	v, err := strconv.ParseFloat(t[:i], 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, fmt.Errorf("cannot read %q as a carbon factor; give a finite number and the unit %s", s, ck.FactorUnit)
	}
	if carbonUnit(t[i:]) != carbonUnit(ck.FactorUnit) {
		return 0, fmt.Errorf("cannot read %q as a carbon factor for %s; its unit must be %s", s, ck.Name, ck.FactorUnit)
	}
	return v, nil
}
