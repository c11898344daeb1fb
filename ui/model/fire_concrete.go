package model

import (
	"fmt"
	"math"

	"upright/concrete"
)

// barCoverMM is the clear cover from the face to the longitudinal bars of
// candidate i, mm; the fire step reads it.
func (f *concreteFamily) barCoverMM(i int) float64 { return f.secs[i].BarCoverMM() }

// concreteFireRatings are the ratings of the ACI/TMS 216.1-14 column table, h.
var concreteFireRatings = []float64{1, 1.5, 2, 3, 4}

// concreteFire checks a concrete column against a rating: its least
// dimension (side of a rectangle, diameter of a round column) against
// ACI/TMS 216.1-14 Table 4.5.1a for the aggregate, and its clear cover to
// the bars against 1 in per hour up to 2 in (4.5.3). The catalogue was built
// with that cover, so the strength already uses the moved bars. The plan,
// mass and carbon do not change.
func concreteFire(st Static, hours float64, agg concrete.Aggregate, coverMM float64) (Static, error) {
	fc := fireBare(&st, hours)
	need, err := concrete.FireMinDimensionMM(agg, hours)
	if err != nil {
		return Static{}, err
	}
	needCover, err := concrete.FireBarCoverMM(hours)
	if err != nil {
		return Static{}, err
	}
	least := math.Min(st.FootprintMM[0], st.FootprintMM[1])
	fc.Clause = concrete.FireDimensionClause + "; " + concrete.FireCoverClause
	fc.MinDimensionMM, fc.CoverMM, fc.CoverRequiredMM = need, coverMM, needCover
	fc.System = agg.String() + " aggregate concrete with its least dimension and cover to the bars"
	for _, h := range concreteFireRatings {
		dim, _ := concrete.FireMinDimensionMM(agg, h)
		cov, _ := concrete.FireBarCoverMM(h)
		if least+1e-6 >= dim && coverMM+1e-6 >= cov {
			fc.ProvidedH = h
		}
	}
	fc.OK = least+1e-6 >= need && coverMM+1e-6 >= needCover
	switch {
	case least+1e-6 < need:
		fc.Reason = fmt.Sprintf("least dimension %.0f mm is under the %.0f mm (%.1f in) that %s h needs with %s aggregate (%s)",
			least, need, need/concrete.MMPerInch, fireHoursText(hours), agg, concrete.FireDimensionClause)
	case coverMM+1e-6 < needCover:
		fc.Reason = fmt.Sprintf("cover to the bars %.0f mm is under the %.0f mm that %s h needs (%s)",
			coverMM, needCover, fireHoursText(hours), concrete.FireCoverClause)
	}
	ratingH, provided := hours, fc.ProvidedH
	fc.trace = func() []Step {
		return []Step{
			{Clause: concrete.FireDimensionClause, Quantity: "least dimension required", Formula: agg.String() + " aggregate, " + fireHoursText(ratingH) + " h", Value: need, Unit: "mm"},
			{Clause: concrete.FireDimensionClause, Quantity: "least dimension provided", Formula: "smaller side, or diameter", Value: least, Unit: "mm"},
			{Clause: concrete.FireCoverClause, Quantity: "cover to bars required", Formula: "1 in per hour, at most 2 in", Value: needCover, Unit: "mm"},
			{Clause: concrete.FireCoverClause, Quantity: "cover to bars provided", Formula: "cover to ties + tie diameter (bars placed with it)", Value: coverMM, Unit: "mm"},
			{Clause: concrete.FireDimensionClause, Quantity: "fire resistance provided", Formula: "highest tabulated rating met by both", Value: provided, Unit: "h"},
		}
	}
	st.Fire = fc
	return st, nil
}

// timberFireMaxHours is the longest exposure the calculated char method of
// NDS 2018 Chapter 16 covers (16.1, from memory).
const timberFireMaxHours = 2.0

// timberFire checks a timber column against a rating. Up to 2 h the char
// calculation of NDS 2018 Chapter 16 runs inside the strength at every
// length, so the section is permitted here and its fire-case strength
// decides; beyond 2 h the method does not apply and the size is not
// permitted. The plan, mass and carbon do not change (the char layer is
// sacrificial wood already counted).
func timberFire(st Static, hours float64) Static {
	fc := fireBare(&st, hours)
	fc.Clause = "NDS 2018 Chapter 16 (16.2 effective char depth)"
	if hours > timberFireMaxHours {
		fc.System = "exposed wood: char calculation not applicable"
		fc.Reason = fmt.Sprintf("NDS 2018 16.1 (from memory): the calculated char method covers exposures up to %s h; a %s h rating needs a tested or listed assembly",
			fireHoursText(timberFireMaxHours), fireHoursText(hours))
		fc.trace = timberFireLimitTrace
	} else {
		fc.OK = true
		fc.ProvidedH = hours
		fc.System = "exposed wood sized for its char layer; the charred section is checked against the service load at each length"
		fc.trace = func() []Step {
			return []Step{{Clause: "NDS 2018 16.2", Quantity: "exposure time", Formula: "the scheme's rating drives the char depth; the fire-case strength is part of the strength above", Value: hours, Unit: "h"}}
		}
	}
	st.Fire = fc
	return st
}

// timberFireLimitTrace is the trace of a timber size beyond the method's limit.
func timberFireLimitTrace() []Step {
	return []Step{{Clause: "NDS 2018 16.1 (from memory)", Quantity: "longest exposure of the method", Formula: "calculated char method limit", Value: timberFireMaxHours, Unit: "h"}}
}
