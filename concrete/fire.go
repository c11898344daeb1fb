package concrete

import "math"

// Aggregate is the kind of coarse aggregate, which sets the minimum column
// size for a fire-resistance rating.
type Aggregate int

// The three aggregate kinds of the column table.
const (
	Siliceous       Aggregate = iota // siliceous aggregate (the most demanding; the default)
	Carbonate                        // carbonate aggregate
	SemiLightweight                  // semi-lightweight (sand-lightweight) concrete
)

// String names the aggregate as the options spell it.
func (a Aggregate) String() string {
	switch a {
	case Siliceous:
		return "siliceous"
	case Carbonate:
		return "carbonate"
	case SemiLightweight:
		return "semi-lightweight"
	}
	return "unknown"
}

// Clauses of ACI/TMS 216.1-14 for concrete columns (numbers from memory).
const (
	FireDimensionClause = "ACI/TMS 216.1-14 4.5.1 and Table 4.5.1a (from memory)"
	FireCoverClause     = "ACI/TMS 216.1-14 4.5.3 (from memory)"
)

// fireRatings are the ratings of the column table, h.
var fireRatings = [...]float64{1, 1.5, 2, 3, 4}

// fireMinDimIn is the minimum column dimension, in, by aggregate and rating
// (ACI/TMS 216.1-14 Table 4.5.1a; the same values are in IBC 2021 Table
// 722.2.4; from memory). The optional reduction for rectangular columns with
// two parallel sides of 36 in or more is not taken.
var fireMinDimIn = [...][len(fireRatings)]float64{
	Siliceous:       {8, 9, 10, 12, 14},
	Carbonate:       {8, 9, 10, 11, 12},
	SemiLightweight: {8, 8.5, 9, 10.5, 12},
}

// FireMinDimensionMM returns the least dimension, mm, that a concrete column
// (side of a rectangle, diameter of a round column) needs for a rating of
// 1, 1.5, 2, 3 or 4 h with the given aggregate.
func FireMinDimensionMM(a Aggregate, hours float64) (float64, error) {
	if a < Siliceous || a > SemiLightweight {
		return 0, badInput("aggregate", float64(a), "siliceous (0), carbonate (1) or semi-lightweight (2)")
	}
	for i, h := range fireRatings {
		if hours == h {
			return fireMinDimIn[a][i] * MMPerInch, nil
		}
	}
	return 0, badInput("fire rating", hours, "1, 1.5, 2, 3 or 4 h")
}

// FireBarCoverMM returns the least clear cover to the longitudinal bars, mm,
// for a rating: 1 in per hour of rating, and never more than 2 in
// (ACI/TMS 216.1-14 4.5.3, from memory).
func FireBarCoverMM(hours float64) (float64, error) {
	if !finite(hours) || hours <= 0 || hours > 4 {
		return 0, badInput("fire rating", hours, "a rating greater than 0 and at most 4 h")
	}
	return math.Min(hours, 2) * MMPerInch, nil
}

// smallestTransverseMM is the diameter of a #3 bar, the smallest tie or
// spiral this package uses (ACI 318-19 25.7.2.2).
const smallestTransverseMM = 0.375 * MMPerInch

// coverForBarCover returns the clear cover to the ties or spiral that gives
// at least barCover to the longitudinal bars whatever transverse bar the
// section gets, and never less than DefaultCoverMM.
func coverForBarCover(barCover float64) float64 {
	return math.Max(DefaultCoverMM, barCover-smallestTransverseMM)
}

// BarCoverMM returns the clear cover from the column face to the longitudinal bars, mm.
func (s *Section) BarCoverMM() float64 { return s.CoverMM + s.Tie.DiaMM }
