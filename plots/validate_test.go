package plots

import (
	"errors"
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// TestValidateRejects checks each field that carries a number is checked at
// the boundary with a named error (project rule: constructors reject NaN/Inf).
func TestValidateRejects(t *testing.T) {
	nan, inf := math.NaN(), math.Inf(1)
	good := func() *Chart { return sampleChart(2, 10) }
	cases := []struct {
		name   string
		mutate func(c *Chart)
		want   error
		field  string
	}{
		{"series Y NaN", func(c *Chart) { c.Series[1].Points[3].Y = nan }, ErrNotFinite, `series[1]: series "Steel wide flange, 12 in" point[3] Y`},
		{"series X +Inf", func(c *Chart) { c.Series[0].Points[0].X = inf }, ErrNotFinite, "point[0] X"},
		{"series X -Inf", func(c *Chart) { c.Series[0].Points[9].X = -inf }, ErrNotFinite, "point[9] X"},
		{"series out of order", func(c *Chart) { c.Series[0].Points[4].X = 0 }, ErrNotIncreasing, "point[4] X"},
		{"demand Y NaN", func(c *Chart) { c.Demand[2].Y = nan }, ErrNotFinite, "demand point[2] Y"},
		{"demand out of order", func(c *Chart) { c.Demand[5].X = -1 }, ErrNotIncreasing, "demand point[5] X"},
		{"marker NaN", func(c *Chart) { c.Marker.X = nan }, ErrNotFinite, "marker X"},
		{"crossover Y Inf", func(c *Chart) { c.Crossovers = []Crossover{{X: 3, Y: inf, Label: "a"}} }, ErrNotFinite, `crossover "a" Y`},
		{"x range NaN", func(c *Chart) { c.XRange = &Range{Min: nan, Max: 3} }, ErrNotFinite, "x range min"},
		{"y range Inf", func(c *Chart) { c.YRange = &Range{Min: 0, Max: inf} }, ErrNotFinite, "y range max"},
		{"x range inverted", func(c *Chart) { c.XRange = &Range{Min: 5, Max: 5} }, ErrBadRange, "x range"},
		{"y range inverted", func(c *Chart) { c.YRange = &Range{Min: 9, Max: 1} }, ErrBadRange, "y range"},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			c := good()
			require.NoError(t, c.Validate())
			tc.mutate(c)
			err := c.Validate()
			require.Error(t, err)
			assert.True(t, errors.Is(err, tc.want), "got %v, want %v", err, tc.want)
			assert.Contains(t, err.Error(), tc.field)
		})
	}
}

// TestConstructors checks the constructors accept good input and reject NaN/Inf.
func TestConstructors(t *testing.T) {
	s, err := NewSeries("A", "steel", []Point{{1, 2}, {2, 1}}, true)
	require.NoError(t, err)
	assert.True(t, s.Pinned)
	_, err = NewSeries("A", "steel", []Point{{1, math.NaN()}}, false)
	assert.ErrorIs(t, err, ErrNotFinite)
	_, err = NewSeries("A", "steel", []Point{{2, 1}, {1, 1}}, false)
	assert.ErrorIs(t, err, ErrNotIncreasing)

	m, err := NewMarker(12, "L = 12 ft")
	require.NoError(t, err)
	assert.Equal(t, 12.0, m.X)
	_, err = NewMarker(math.Inf(-1), "")
	assert.ErrorIs(t, err, ErrNotFinite)

	x, err := NewCrossover(8, 200, "8 ft")
	require.NoError(t, err)
	assert.Equal(t, "8 ft", x.Label)
	_, err = NewCrossover(math.NaN(), 1, "")
	assert.ErrorIs(t, err, ErrNotFinite)

	r, err := NewRange(0, 10)
	require.NoError(t, err)
	assert.Equal(t, Range{0, 10}, *r)
	_, err = NewRange(10, 0)
	assert.ErrorIs(t, err, ErrBadRange)
	_, err = NewRange(0, math.NaN())
	assert.ErrorIs(t, err, ErrNotFinite)
}

// TestRenderRejectsBadChart checks a bad chart leaves the buffer untouched and nil is refused.
func TestRenderRejectsBadChart(t *testing.T) {
	r, err := NewRaster(200, 120)
	require.NoError(t, err)
	require.NoError(t, r.Render(sampleChart(2, 20)))
	before := append([]byte(nil), r.Image().Pix...)
	bad := sampleChart(2, 20)
	bad.Series[0].Points[1].Y = math.NaN()
	assert.ErrorIs(t, r.Render(bad), ErrNotFinite)
	assert.Equal(t, before, r.Image().Pix, "buffer changed by a rejected render")
	assert.ErrorIs(t, r.Render(nil), ErrNoChart)
}
