package chart

import (
	"context"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

func demoModel(t *testing.T, u model.Units) (*model.Model, *model.Result) {
	sc := model.DefaultScheme()
	sc.Units = u
	sc.Setting.LengthMM, sc.Setting.WeakMM = 4500, 4500
	sc.Load = model.Load{Mode: model.LoadDirect, DirectN: 2500e3}
	m, err := model.New(sc)
	require.NoError(t, err)
	res, err := m.Evaluate(context.Background(), sc.Setting)
	require.NoError(t, err)
	return m, res
}

func TestChartShowsBestOfEachFamilyAndPinned(t *testing.T) {
	m, res := demoModel(t, model.US)
	// Pin the heaviest W shape.
	heavy := Key{Family: 0, Index: 0}
	for i := 0; i < m.Families[0].Len(); i++ {
		if m.Families[0].Static(i).MassKgPerM > m.Families[0].Static(heavy.Index).MassKgPerM {
			heavy.Index = i
		}
	}
	b := NewBuilder(m)
	ch := b.Chart(res, Options{Pinned: []Key{heavy}})
	shown := Shown(res, []Key{heavy})
	assert.Len(t, ch.Series, len(shown))
	pinned := 0
	for _, s := range ch.Series {
		if s.Pinned {
			pinned++
			assert.Equal(t, m.Families[0].Static(heavy.Index).Designation, s.Label)
		}
		for k := 1; k < len(s.Points); k++ {
			assert.GreaterOrEqual(t, s.Points[k].X, s.Points[k-1].X)
		}
	}
	assert.Equal(t, 1, pinned)
	require.NoError(t, ch.Validate())
	// The marker sits at the current length in feet (1 ft = 304.8 mm exactly).
	require.NotNil(t, ch.Marker)
	assert.InDelta(t, 4500/304.8, ch.Marker.X, 1e-9)
	assert.Contains(t, ch.XLabel, "ft")
	assert.Contains(t, ch.YLabel, "kip")
	// The demand line is the typed load in kip.
	assert.InDelta(t, 2500e3/units.NPerKip, ch.Demand[0].Y, 1e-6)
}

func TestChartSIAndCrossoverMarks(t *testing.T) {
	m, res := demoModel(t, model.SI)
	xs, err := m.Crossovers(context.Background(), res.Setting, model.DefaultRange(4500, model.SI), nil)
	require.NoError(t, err)
	ch := NewBuilder(m).Chart(res, Options{Crossovers: xs})
	assert.Contains(t, ch.XLabel, "(m)")
	assert.Contains(t, ch.YLabel, "kN")
	assert.InDelta(t, 4.5, ch.Marker.X, 1e-12)
	assert.NotEmpty(t, ch.Crossovers)
	require.NoError(t, ch.Validate())
}

func TestCurvesAreCached(t *testing.T) {
	m, res := demoModel(t, model.US)
	b := NewBuilder(m)
	_ = b.Chart(res, Options{})
	n := len(b.cache)
	res2, err := m.Evaluate(context.Background(), res.Setting.AtLength(4510))
	require.NoError(t, err)
	_ = b.Chart(res2, Options{})
	assert.LessOrEqual(t, len(b.cache), n+len(res.Families), "moving the length recomputes at most the curves of new best sizes")
}
