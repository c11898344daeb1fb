package ui

import (
	"errors"
	"fmt"
	"math"
	"regexp"
	"strconv"
	"strings"

	"upright/ui/model"
	"upright/ui/units"
)

// quantity is the kind of value a text field reads.
type quantity int

const (
	qLength   quantity = iota // mm
	qForce                    // N
	qPressure                 // kPa
	qArea                     // m²
	qStress                   // MPa
	qNumber                   // a plain decimal number
	qCount                    // a whole number
	qRatio                    // a ratio, typed as 0.04 or 4%
)

// fieldSpec describes one text input: what it reads and where the value goes
// in the scheme. Its id is the field name model.FieldError uses, so a
// validation problem finds its way back to the field that caused it.
type fieldSpec struct {
	id      string
	label   string
	q       quantity
	psi     bool    // a stress shown in psi rather than ksi (f'c)
	blank   string  // when non-empty, blank text is accepted and means the default; this says what it means
	hint    string  // placeholder shown in a blank entry
	blankOK float64 // the value blank text stands for
	get     func(sc *model.Scheme) float64
	set     func(sc *model.Scheme, v float64)
}

// fieldSpecs lists every text input of the window, in tab order.
var fieldSpecs = []fieldSpec{
	{id: "length", label: "Unbraced length", q: qLength,
		get: func(sc *model.Scheme) float64 { return sc.Setting.LengthMM },
		set: func(sc *model.Scheme, v float64) { sc.Setting = sc.Setting.AtLength(v) }},
	{id: "weak-axis length", label: "Weak-axis unbraced length", q: qLength,
		get: func(sc *model.Scheme) float64 { return sc.Setting.WeakMM },
		set: func(sc *model.Scheme, v float64) { sc.Setting.WeakMM = v }},
	{id: "K", label: "Typed K", q: qNumber, blank: "blank uses the end condition's recommended K", hint: "recommended", blankOK: 0,
		get: func(sc *model.Scheme) float64 { return sc.Setting.K },
		set: func(sc *model.Scheme, v float64) { sc.Setting.K = v }},
	{id: "load", label: "Axial load", q: qForce,
		get: func(sc *model.Scheme) float64 { return sc.Load.DirectN },
		set: func(sc *model.Scheme, v float64) { sc.Load.DirectN = v }},
	{id: "dead-share", label: "Dead share of the service load", q: qRatio, blank: "blank uses 2/3 (67%) of the service load as dead", hint: "2/3", blankOK: 0,
		get: func(sc *model.Scheme) float64 { return sc.Load.DeadShare },
		set: func(sc *model.Scheme, v float64) { sc.Load.DeadShare = v }},
	{id: "tributary", label: "Tributary area per floor", q: qArea,
		get: func(sc *model.Scheme) float64 { return sc.Load.TributaryM2 },
		set: func(sc *model.Scheme, v float64) { sc.Load.TributaryM2 = v }},
	{id: "floors", label: "Floors carried below the roof", q: qCount,
		get: func(sc *model.Scheme) float64 { return float64(sc.Load.Floors) },
		set: func(sc *model.Scheme, v float64) { sc.Load.Floors = int(v) }},
	{id: "dead", label: "Floor dead load", q: qPressure,
		get: func(sc *model.Scheme) float64 { return sc.Load.FloorDeadKPa },
		set: func(sc *model.Scheme, v float64) { sc.Load.FloorDeadKPa = v }},
	{id: "live", label: "Floor live load (unreduced)", q: qPressure,
		get: func(sc *model.Scheme) float64 { return sc.Load.FloorLiveKPa },
		set: func(sc *model.Scheme, v float64) { sc.Load.FloorLiveKPa = v }},
	{id: "roof-dead", label: "Roof dead load", q: qPressure,
		get: func(sc *model.Scheme) float64 { return sc.Load.RoofDeadKPa },
		set: func(sc *model.Scheme, v float64) { sc.Load.RoofDeadKPa = v }},
	{id: "roof-live", label: "Roof live load Lr", q: qPressure,
		get: func(sc *model.Scheme) float64 { return sc.Load.RoofLiveKPa },
		set: func(sc *model.Scheme, v float64) { sc.Load.RoofLiveKPa = v }},
	{id: "snow", label: "Roof snow load S", q: qPressure,
		get: func(sc *model.Scheme) float64 { return sc.Load.SnowKPa },
		set: func(sc *model.Scheme, v float64) { sc.Load.SnowKPa = v }},
	{id: "steel Fy", label: "Steel Fy", q: qStress, blank: "blank keeps each family's own grade", hint: "family grade",
		get: func(sc *model.Scheme) float64 { return sc.Steel.FyMPa },
		set: func(sc *model.Scheme, v float64) { sc.Steel.FyMPa = v }},
	{id: "f'c", label: "Concrete f'c", q: qStress, psi: true, blank: "blank uses 5,000 psi (US) or 35 MPa (SI)", hint: "5,000 psi / 35 MPa",
		get: func(sc *model.Scheme) float64 { return sc.Concrete.FcMPa },
		set: func(sc *model.Scheme, v float64) { sc.Concrete.FcMPa = v }},
	{id: "rho-max", label: "Largest ρg", q: qRatio,
		get: func(sc *model.Scheme) float64 { return sc.Concrete.RhoMax },
		set: func(sc *model.Scheme, v float64) { sc.Concrete.RhoMax = v }},
	{id: "m1m2", label: "End moments M1/M2", q: qNumber,
		get: func(sc *model.Scheme) float64 { return sc.Concrete.M1M2 },
		set: func(sc *model.Scheme, v float64) { sc.Concrete.M1M2 = v }},
	{id: "beta-dns", label: "Sustained-load ratio βdns", q: qNumber,
		get: func(sc *model.Scheme) float64 { return sc.Concrete.BetaDns },
		set: func(sc *model.Scheme, v float64) { sc.Concrete.BetaDns = v }},
}

// specByID returns the field spec with the given id, or nil.
func specByID(id string) *fieldSpec {
	for i := range fieldSpecs {
		if fieldSpecs[i].id == id {
			return &fieldSpecs[i]
		}
	}
	return nil
}

// displayUnit names the unit a bare number is taken in for the field and system.
func (f *fieldSpec) displayUnit(sys units.System) string {
	us := sys == units.US
	switch f.q {
	case qLength:
		if us {
			return "ft"
		}
		return "m"
	case qForce:
		if us {
			return "kip"
		}
		return "kN"
	case qPressure:
		if us {
			return "psf"
		}
		return "kPa"
	case qArea:
		if us {
			return "ft²"
		}
		return "m²"
	case qStress:
		if !us {
			return "MPa"
		}
		if f.psi {
			return "psi"
		}
		return "ksi"
	}
	return ""
}

// bareFactor converts a bare number in the display unit to the SI unit.
func (f *fieldSpec) bareFactor(sys units.System, v float64) float64 {
	us := sys == units.US
	switch f.q {
	case qLength:
		if us {
			return units.MMPerFoot
		}
		return 1000
	case qForce:
		if us {
			return units.NPerKip
		}
		return 1000
	case qPressure:
		if us {
			return units.KPaPerPsf
		}
		return 1
	case qArea:
		if us {
			return units.M2PerFt2
		}
		return 1
	case qStress:
		if !us {
			return 1
		}
		// A bare US stress of 1,000 or more is psi, below it ksi (5000 or 5 for f'c, 50 for Fy).
		if math.Abs(v) >= 1000 {
			return units.MPaPerKsi / 1000
		}
		return units.MPaPerKsi
	}
	return 1
}

// accepted says what the field accepts, for its error message.
func (f *fieldSpec) accepted(sys units.System) string {
	var s string
	switch f.q {
	case qLength:
		s = units.LengthForms
	case qForce:
		s = units.ForceForms
	case qPressure:
		s = units.PressureForms
	case qArea:
		s = units.AreaForms
	case qStress:
		s = units.StressForms
	case qNumber:
		s = "a plain number, e.g. 0.8"
	case qCount:
		s = "a whole number, e.g. 3"
	case qRatio:
		s = "a ratio such as 0.04 or a percentage such as 4%"
	}
	if u := f.displayUnit(sys); u != "" {
		s += "; a bare number is taken as " + u
	}
	if f.blank != "" {
		s += "; " + f.blank
	}
	return s
}

// parse reads the text of a field and returns the value in the model's SI
// unit. Only blank text means the default: a value typed that equals the
// default's stand-in (0) is refused with what the field accepts.
func (f *fieldSpec) parse(text string, sys units.System) (float64, error) {
	v, err := f.parseText(text, sys)
	if err == nil && f.blank != "" && v == f.blankOK && strings.TrimSpace(text) != "" {
		return 0, fmt.Errorf("%q is not accepted for %s; give %s", text, f.label, f.accepted(sys))
	}
	return v, err
}

// parseText reads the text of a field; blank text gives blankOK where allowed.
func (f *fieldSpec) parseText(text string, sys units.System) (float64, error) {
	t := thousands.ReplaceAllString(strings.TrimSpace(text), "$1$2")
	if t == "" {
		if f.blank != "" {
			return f.blankOK, nil
		}
		return 0, fmt.Errorf("%s is empty; give %s", f.label, f.accepted(sys))
	}
	bad := func() error {
		return fmt.Errorf("%q is not read as %s; give %s", text, units.Article(kindWord(f.q)), f.accepted(sys))
	}
	if n, err := strconv.ParseFloat(t, 64); err == nil {
		if math.IsNaN(n) || math.IsInf(n, 0) {
			return 0, bad()
		}
		switch f.q {
		case qCount:
			if n != math.Trunc(n) {
				return 0, bad()
			}
			return n, nil
		case qRatio:
			if n >= 1 {
				return n / 100, nil // a bare 4 is 4 %
			}
			return n, nil
		case qNumber:
			return n, nil
		}
		return n * f.bareFactor(sys, n), nil
	}
	var v float64
	var err error
	switch f.q {
	case qLength:
		v, err = units.ParseLength(t)
	case qForce:
		v, err = units.ParseForce(t)
	case qPressure:
		v, err = units.ParsePressure(t)
	case qArea:
		v, err = units.ParseArea(t)
	case qStress:
		v, err = units.ParseStress(t)
	case qRatio:
		if p, ok := strings.CutSuffix(t, "%"); ok {
			if n, e := strconv.ParseFloat(strings.TrimSpace(p), 64); e == nil && !math.IsNaN(n) && !math.IsInf(n, 0) {
				return n / 100, nil
			}
		}
		return 0, bad()
	default:
		return 0, bad()
	}
	if err != nil {
		var pe *units.ParseError
		if errors.As(err, &pe) {
			if pe.Reason != "" {
				return 0, fmt.Errorf("%s; give %s", pe.Why(), f.accepted(sys))
			}
			return 0, bad()
		}
		return 0, err
	}
	return v, nil
}

// thousands matches a thousands separator (1,800), which parse drops.
var thousands = regexp.MustCompile(`(\d),(\d{3})`)

// kindWord names a quantity in messages.
func kindWord(q quantity) string {
	switch q {
	case qLength:
		return "length"
	case qForce:
		return "force"
	case qPressure:
		return "pressure"
	case qArea:
		return "area"
	case qStress:
		return "stress"
	case qCount:
		return "whole number"
	case qRatio:
		return "ratio"
	}
	return "number"
}

// format writes a value (SI) as the field shows it in the display system.
// What it writes parses back (parse) to the same value within its rounding.
func (f *fieldSpec) format(v float64, sys units.System) string {
	if f.blank != "" && v == f.blankOK {
		return ""
	}
	us := sys == units.US
	switch f.q {
	case qLength:
		if us {
			return units.Length(v, units.US)
		}
		return trim(v/1000, 3) + " m"
	case qForce:
		if us {
			return trim(v/units.NPerKip, 1) + " kip"
		}
		return trim(v/1000, 1) + " kN"
	case qPressure:
		if us {
			return trim(v/units.KPaPerPsf, 1) + " psf"
		}
		return trim(v, 2) + " kPa"
	case qArea:
		if us {
			return trim(v/units.M2PerFt2, 0) + " ft²"
		}
		return trim(v, 1) + " m²"
	case qStress:
		if !us {
			return trim(v, 1) + " MPa"
		}
		if f.psi {
			return trim(v/units.MPaPerKsi*1000, 0) + " psi"
		}
		return trim(v/units.MPaPerKsi, 1) + " ksi"
	case qCount:
		return strconv.Itoa(int(math.Round(v)))
	case qRatio:
		return trim(v*100, 2) + "%"
	}
	return trim(v, 3)
}

// trim formats v with at most digits decimals and no trailing zeros.
func trim(v float64, digits int) string {
	s := strconv.FormatFloat(v, 'f', digits, 64)
	if strings.Contains(s, ".") {
		s = strings.TrimRight(strings.TrimRight(s, "0"), ".")
	}
	if s == "-0" {
		s = "0"
	}
	return s
}
