package model

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
)

const mmPerFoot = 304.8 // exact, by the definition of the foot

// The default range's ends are round numbers of the shown unit, stepping the
// far end out while the length sits in the top quarter of the range.
func TestDefaultRangeIsRoundInTheShownUnit(t *testing.T) {
	cases := []struct {
		why      string
		mm       float64
		u        Units
		from, to float64 // in the shown unit: ft for US, m for SI
	}{
		{"an 18 ft column: 2 ft to 40 ft", 18 * mmPerFoot, US, 2, 40},
		{"30 ft is the top quarter of 40 ft: still 40 ft", 30 * mmPerFoot, US, 2, 40},
		{"35 ft is past 30 ft, three quarters of 40 ft: out to 60 ft", 35 * mmPerFoot, US, 2, 60},
		{"70 ft is past 60 ft, three quarters of 80 ft: out to 98 ft", 70 * mmPerFoot, US, 2, 98},
		{"98.3 ft is past 98 ft: out to the 30 m limit", 98.3 * mmPerFoot, US, 2, MaxLengthMM / mmPerFoot},
		{"a 1.5 ft pedestal-like column: the near end comes down to 1 ft", 1.5 * mmPerFoot, US, 1, 40},
		{"a 4 m column: 0.5 m to 12 m", 4000, SI, 0.5, 12},
		{"9 m is three quarters of 12 m: still 12 m", 9000, SI, 0.5, 12},
		{"9.1 m: out to 18 m", 9100, SI, 0.5, 18},
		{"13.6 m is past 13.5 m: out to 24 m", 13600, SI, 0.5, 24},
		{"25 m: out to 30 m, the longest column accepted", 25000, SI, 0.5, 30},
		{"a 0.4 m column: the near end comes down to 0.3 m", 400, SI, 0.3, 12},
		{"an unknown unit system reads as SI", 4000, Units("xx"), 0.5, 12},
	}
	for _, c := range cases {
		per := 1000.0
		if c.u == US {
			per = mmPerFoot
		}
		r := DefaultRange(c.mm, c.u)
		assert.InDelta(t, c.from, r.FromMM/per, 1e-9, c.why)
		assert.InDelta(t, c.to, r.ToMM/per, 1e-9, c.why)
	}
}

// Every accepted column length gets a range that holds it, lies within the
// accepted lengths and ends on a round number (whole tenths) of the unit of the shown system.
func TestDefaultRangeHoldsEveryAcceptedLength(t *testing.T) {
	for _, u := range []Units{US, SI} {
		per := 1000.0
		if u == US {
			per = mmPerFoot
		}
		for mm := MinLengthMM; mm <= MaxLengthMM; mm += 37 {
			r := DefaultRange(mm, u)
			assert.True(t, r.FromMM >= MinLengthMM && r.ToMM <= MaxLengthMM, "%s %g mm: %v inside the accepted lengths", u, mm, r)
			assert.True(t, r.FromMM <= mm && mm <= r.ToMM, "%s %g mm: %v holds the length", u, mm, r)
			var ends []float64
			if !(u == US && mm < mmPerFoot) {
				ends = append(ends, r.FromMM) // under 1 ft the near end is the 0.3 m limit itself
			}
			if !(u == US && mm > 98*mmPerFoot) {
				ends = append(ends, r.ToMM) // past 98 ft the far end is the 30 m limit itself
			}
			for _, end := range ends {
				v := end / per * 10
				assert.InDelta(t, math.Round(v), v, 1e-9, "%s %g mm: end %g mm is a round number of the unit", u, mm, end)
			}
		}
	}
}
