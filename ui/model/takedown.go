package model

import "math"

// Validate checks the load input and returns the first problem as a *FieldError.
func (l Load) Validate() error {
	switch l.Mode {
	case LoadDirect:
		if !finite(l.DirectN) || l.DirectN <= 0 || l.DirectN > 200e6 {
			return bad("load", l.DirectN, "an axial load greater than zero and at most 200 MN (45,000 kip)")
		}
	case LoadTakedown:
		return bad("load", "takedown", "a typed load (the takedown is not available yet)")
	default:
		return bad("load mode", l.Mode, "direct or takedown")
	}
	return nil
}

// Summarize turns the load input into the demand and the load split the
// families use, for the given method.
func Summarize(l Load, m Method) (LoadSummary, error) {
	if err := l.Validate(); err != nil {
		return LoadSummary{}, err
	}
	ls := LoadSummary{Governing: -1, DemandN: l.DirectN, Reduction: 1, BetaDns: math.NaN(), StrengthPerService: 1.5}
	if m == LRFD {
		ls.DirectDeadFactor = 1.2
		ls.Lambda = 0.8 // NDS 2018 Table N3: D + L with L from occupancy
	} else {
		ls.DirectDeadFactor = 1.0
		ls.CD = 1.0 // NDS 2018 Table 2.3.2: ten-year (occupancy live) load
	}
	return ls, nil
}
