package plots

import (
	"testing"

	"github.com/stretchr/testify/assert"
)

// Expected values here are worked by hand from the documented rules in ranges.go and ticks.go.

// TestNiceStep checks the 1–2–2.5–5 step choice.
func TestNiceStep(t *testing.T) {
	cases := []struct {
		span   float64
		target int
		want   float64
	}{
		{700, 7, 100},
		{36, 8, 5},  // 4.5 → 5
		{1, 7, 0.2}, // 0.143 → 0.2
		{1200, 7, 200},
		{2.5, 5, 0.5},
		{17, 7, 2.5}, // 2.43 → 2.5
		{0, 7, 1},
		{-3, 7, 1},
	}
	for _, tc := range cases {
		assert.InDelta(t, tc.want, niceStep(tc.span, tc.target), 1e-12, "span %v", tc.span)
	}
	assert.Equal(t, 0, stepDecimals(100))
	assert.Equal(t, 1, stepDecimals(0.5))
	assert.Equal(t, 2, stepDecimals(0.25))
}

// TestTicker checks labelled ticks fall on whole steps with a minor tick between.
func TestTicker(t *testing.T) {
	tk := &ticker{target: 7}
	ticks := tk.Ticks(0, 700)
	var labels []string
	for _, x := range ticks {
		if x.Label != "" {
			labels = append(labels, x.Label)
		}
	}
	assert.Equal(t, []string{"0", "100", "200", "300", "400", "500", "600", "700"}, labels)
	assert.Len(t, ticks, 15)
	assert.Empty(t, tk.Ticks(5, 5))
	frac := (&ticker{target: 5}).Ticks(0, 1)
	assert.Equal(t, "0.2", frac[2].Label)
}

// TestFitExtentCap checks the y axis is capped at DemandCapFactor × demand
// while crossover marks stay in view.
func TestFitExtentCap(t *testing.T) {
	c := &Chart{
		Series: []Series{
			{Label: "small", Points: []Point{{0, 300}, {10, 150}}},
			{Label: "huge", Points: []Point{{0, 5000}, {10, 4000}}},
		},
		Demand: []Point{{0, 100}, {10, 110}},
	}
	e := fitExtent(c)
	assert.Equal(t, 0.0, e.xmin)
	assert.Equal(t, 10.0, e.xmax)
	// Cap: 3 × 110 = 330, × 1.08 headroom = 356.4, rounded up to the 50-step → 400.
	assert.Equal(t, 0.0, e.ymin)
	assert.Equal(t, 400.0, e.ymax)
	assert.True(t, e.capped)
	assert.True(t, above(c.Series[1].Points, e.xmin, e.xmax, e.ymax))
	assert.False(t, above(c.Series[0].Points, e.xmin, e.xmax, e.ymax))

	// A crossover above the cap is kept: 600 × 1.08 = 648 → 700 (100-step).
	c.Crossovers = []Crossover{{X: 5, Y: 600}}
	assert.Equal(t, 700.0, fitExtent(c).ymax)

	// Without the huge curve no cap applies: 300 × 1.08 = 324 → 350 (50-step).
	c.Series = c.Series[:1]
	c.Crossovers = nil
	e = fitExtent(c)
	assert.Equal(t, 350.0, e.ymax)
	assert.False(t, e.capped)
}

// TestFitExtentSpecialCases checks the documented special cases.
func TestFitExtentSpecialCases(t *testing.T) {
	e := fitExtent(&Chart{})
	assert.Equal(t, extent{xmin: 0, xmax: 1, ymin: 0, ymax: 1}, e)

	e = fitExtent(&Chart{Marker: &Marker{X: 12}})
	assert.Equal(t, 11.0, e.xmin) // widened by max(1, 5 % of 12) = 1 each side
	assert.Equal(t, 13.0, e.xmax)

	e = fitExtent(&Chart{
		Series: []Series{{Points: []Point{{0, 1000}, {10, 900}}}},
		XRange: &Range{Min: 2, Max: 8},
		YRange: &Range{Min: 0, Max: 500},
	})
	assert.Equal(t, extent{xmin: 2, xmax: 8, ymin: 0, ymax: 500, capped: true}, e)

	// Negative data pull the bottom below zero to a whole step: the span
	// -40 … 327.2 (headroom on 340) over 7 intervals is 52.5 a step, so the
	// step is 100 and the bottom -100.
	e = fitExtent(&Chart{Series: []Series{{Points: []Point{{0, -40}, {1, 300}}}}})
	assert.Equal(t, -100.0, e.ymin)
	assert.Equal(t, 400.0, e.ymax)

	// The part of a curve between its points counts: points at 0 and 10
	// outside a 2–8 range still put 1000 … 900 in view, above a 500 top.
	lo, hi, ok := spanY([]Point{{0, 1000}, {10, 900}}, 2, 8)
	assert.True(t, ok)
	assert.InDelta(t, 920, lo, 1e-9)
	assert.InDelta(t, 980, hi, 1e-9)
}
