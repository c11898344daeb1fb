package model

import (
	"strings"

	"upright/timber"
)

// TimberOptions are the timber column choices.
type TimberOptions struct {
	Species   string // sawn species: "DF-L", "SP", "HF" or "SPF"
	Grade     string // sawn grade: "SS", "No.1" or "No.2"
	Glulam    bool   // include glulam columns
	Sawn      bool   // include sawn lumber and timbers
	Wet       bool   // wet service (CM)
	Incised   bool   // incised lumber (Ci)
	Hot       bool   // elevated temperature 100–125 °F (Ct)
	FireSides int    // 3 or 4 sides exposed to the scheme's fire rating
	Duration  string // ASD load duration: "permanent", "ten-years", "two-months", "seven-days", "ten-minutes"; "" derives it from the loads
	// GlulamCombos limits the glulam family to these combinations or stress
	// classes (e.g. "Comb. 2 DF", "Comb. 48 SP", "24F-1.8E"); empty means all
	// that timber.GlulamCombinations offers.
	GlulamCombos []string
}

func defaultTimberOptions() TimberOptions {
	return TimberOptions{Species: "DF-L", Grade: "No.1", Glulam: true, Sawn: true, FireSides: 4}
}

func (t TimberOptions) validate() error {
	if t.FireSides != 3 && t.FireSides != 4 {
		return bad("fire sides", t.FireSides, "3 or 4")
	}
	switch t.Duration {
	case "", "permanent", "ten-years", "two-months", "seven-days", "ten-minutes":
	default:
		return bad("duration", t.Duration, "permanent, ten-years, two-months, seven-days or ten-minutes")
	}
	if t.Sawn {
		if !timberOneOf(t.Species, timber.SawnSpecies()) {
			return bad("species", t.Species, "one of "+strings.Join(timber.SawnSpecies(), ", "))
		}
		if !timberOneOf(t.Grade, timber.SawnGrades()) {
			return bad("grade", t.Grade, "one of "+strings.Join(timber.SawnGrades(), ", "))
		}
	}
	all := timber.GlulamCombinations(0)
	for _, c := range t.GlulamCombos {
		if !timberOneOf(c, all) {
			return bad("glulam combination", c, "one of "+strings.Join(all, ", "))
		}
	}
	return nil
}

// timberDurationCD maps a Duration option to the NDS 2018 Table 2.3.2 load
// duration factor; 0 for "" (derive from the loads).
func timberDurationCD(d string) float64 {
	switch d {
	case "permanent":
		return timber.CDPermanent
	case "ten-years":
		return timber.CDTenYears
	case "two-months":
		return timber.CDTwoMonths
	case "seven-days":
		return timber.CDSevenDays
	case "ten-minutes":
		return timber.CDTenMinutes
	}
	return 0
}

func timberOneOf(v string, xs []string) bool {
	for _, x := range xs {
		if x == v {
			return true
		}
	}
	return false
}
