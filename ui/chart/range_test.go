package chart

import (
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
)

// A chart without a range spans the default one, round in the shown unit:
// 2 ft to 40 ft, or 0.5 m to 12 m, for a 4.5 m column (model.DefaultRange).
func TestChartDefaultRangeIsRoundInTheShownUnit(t *testing.T) {
	for _, c := range []struct {
		u        model.Units
		min, max float64 // in the shown unit
	}{
		{model.US, 2, 40},
		{model.SI, 0.5, 12},
	} {
		m, res := demoModel(t, c.u)
		ch := NewBuilder(m).Chart(res, Options{})
		require.NotNil(t, ch.XRange)
		assert.InDelta(t, c.min, ch.XRange.Min, 1e-9, c.u)
		assert.InDelta(t, c.max, ch.XRange.Max, 1e-9, c.u)
	}
}
