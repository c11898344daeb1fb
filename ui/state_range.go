package ui

import (
	"fmt"
	"math"
	"strconv"

	"upright/ui/model"
	"upright/ui/units"
)

// SetRange sets the slider and chart range chosen by the user. It refuses,
// naming what is accepted, a range outside 0.3 m to 30 m (1 ft to 98 ft),
// shorter than 0.3 m, or not holding the column's length.
func (s *State) SetRange(fromMM, toMM float64) (Outcome, error) {
	sys := s.Sys()
	lim := fmt.Sprintf("from %s to %s", units.Length(model.MinLengthMM, sys), units.Length(model.MaxLengthMM, sys))
	if !(fromMM >= model.MinLengthMM && toMM <= model.MaxLengthMM) {
		return Outcome{}, fmt.Errorf("the range %s to %s is not accepted; give a range within %s", units.Length(fromMM, sys), units.Length(toMM, sys), lim)
	}
	if !(toMM-fromMM >= model.MinLengthMM) {
		return Outcome{}, fmt.Errorf("the range %s to %s is not accepted; give a far end at least %s beyond the near end", units.Length(fromMM, sys), units.Length(toMM, sys), units.Length(model.MinLengthMM, sys))
	}
	if l := s.Draft.Setting.LengthMM; l < fromMM || l > toMM {
		return Outcome{}, fmt.Errorf("the range %s to %s is not accepted; give a range that holds the unbraced length, %s", units.Length(fromMM, sys), units.Length(toMM, sys), units.Length(l, sys))
	}
	s.Range, s.userRange, s.rangeSys = model.Range{FromMM: fromMM, ToMM: toMM}, true, sys
	if !s.HaveValid {
		return Outcome{}, nil
	}
	s.Gen++
	s.SchemeGen++
	s.built = s.Valid
	return Outcome{Submit: true, Rebuild: true}, nil
}

// rangeEnd writes an end of the slider's range: a round number in its unit
// as such ("2 ft", "0.5 m"), any other length as units.Length writes it.
func rangeEnd(mm float64, sys units.System) string {
	unit, per := "m", 1000.0
	if sys == units.US {
		unit, per = "ft", units.MMPerFoot
	}
	v := mm / per
	if r := math.Round(v*10) / 10; math.Abs(v-r) < 1e-9 {
		return strconv.FormatFloat(r, 'f', -1, 64) + " " + unit
	}
	return units.Length(mm, sys)
}
