package ui

import (
	"context"
	"image"
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
	"upright/ui/units"
)

// markerColumn finds the column where two renders of the same chart, one
// with the plots package's own marker and one without, differ the most
// down the middle of the data area: where plots drew its marker.
func markerColumn(with, without *image.RGBA, area image.Rectangle) int {
	best, bestX := 0, -1
	for x := area.Min.X; x < area.Max.X; x++ {
		d := 0
		for y := area.Min.Y + area.Dy()/4; y < area.Max.Y-area.Dy()/4; y++ {
			o := y*with.Stride + 4*x
			d += int(without.Pix[o]) - int(with.Pix[o])
		}
		if d > best {
			best, bestX = d, x
		}
	}
	return bestX
}

// TestProbeFindsWherePlotsDrawsTheMarker checks the window's own marker
// lands on the column where plots would draw it, for several sizes and lengths.
func TestProbeFindsWherePlotsDrawsTheMarker(t *testing.T) {
	sc := DemoScheme()
	m, err := model.New(sc)
	require.NoError(t, err)
	rng := model.DefaultRange(sc.Setting.LengthMM, sc.Units)
	b := chart.NewBuilder(m)
	for _, size := range [][2]int{{1000, 450}, {700, 380}, {1400, 600}} {
		for _, ft := range []float64{6, 18, 31} {
			L := ft * units.MMPerFoot
			res, err := m.Evaluate(context.Background(), sc.Setting.AtLength(L))
			require.NoError(t, err)
			ch := b.Chart(res, chart.Options{Range: rng})
			r1, _ := plots.NewRaster(size[0], size[1])
			require.NoError(t, r1.Render(&ch))
			noMarker := ch
			noMarker.Marker = nil
			r2, _ := plots.NewRaster(size[0], size[1])
			require.NoError(t, r2.Render(&noMarker))
			area, ok := probeDataArea(r2.Image())
			require.True(t, ok, "size %v", size)
			got := markerPixel(area, ch.XRange.Min, ch.XRange.Max, ch.Marker.X)
			want := markerColumn(r1.Image(), r2.Image(), area)
			t.Logf("size %v at %g ft: area %v got %.2f want %d (column)", size, ft, area, got, want)
			assert.InDelta(t, float64(want)+0.5, got, 1.5, "size %v at %g ft: area %v", size, ft, area)
			require.Less(t, math.Abs(float64(area.Dx())-float64(size[0])*0.6), float64(size[0])*0.4)
		}
	}
}
