package ui

import (
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/units"
)

// The user changes the range; the slider and its label follow, in the unit
// shown, and a range that would lose the column's length is refused.
func TestTheUserSetsTheSliderRange(t *testing.T) {
	h := newHarness(t, DemoScheme()) // 18 ft, US
	h.ui(func() {
		assert.Equal(t, "2 ft to 40 ft", h.w.chart.rangeLabel.Text, "round feet by default")
		require.NoError(t, h.w.chart.SetSliderRange("10", "30 ft"))
		assert.Equal(t, "10 ft to 30 ft", h.w.chart.rangeLabel.Text)
		assert.InDelta(t, 10, h.w.chart.slider.Min, 1e-9)
		assert.InDelta(t, 30, h.w.chart.slider.Max, 1e-9)
		for _, bad := range [][2]string{{"20", "30"}, {"0", "30"}, {"10", "200"}, {"12", "12.5"}, {"ten", "30"}} {
			err := h.w.chart.SetSliderRange(bad[0], bad[1])
			require.Error(t, err, "%v", bad)
			assert.Contains(t, err.Error(), "give", "%v: says what is accepted", bad)
		}
		assert.Equal(t, "10 ft to 30 ft", h.w.chart.rangeLabel.Text, "a refused range changes nothing")
	})
	h.settle()
	// The chosen range holds while the length moves inside it.
	h.setSlider(25 * units.MMPerFoot)
	h.ui(func() { assert.Equal(t, "10 ft to 30 ft", h.w.chart.rangeLabel.Text) })
}

// Switching the units rounds the default range again, in the new unit.
func TestUnitSwitchRoundsTheRangeAgain(t *testing.T) {
	h := newHarness(t, DemoScheme())
	h.ui(func() { h.w.inputs.unitsRadio.SetSelected("SI") })
	h.settle()
	h.ui(func() {
		assert.Equal(t, "0.5 m to 12 m", h.w.chart.rangeLabel.Text)
		assert.InDelta(t, 0.5, h.w.chart.slider.Min, 1e-9)
		assert.InDelta(t, 12, h.w.chart.slider.Max, 1e-9)
	})
}
