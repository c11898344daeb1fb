package plots

import (
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// On a chart as short as a laptop window gives it, the y axis takes its
// short title so the data area keeps most of the height; a tall chart keeps
// the long title.
func TestShortChartTakesTheShortYTitle(t *testing.T) {
	for _, c := range []struct {
		h         int
		wantLabel string
		minShare  float64 // least share of the image height the data area keeps
	}{
		{170, "φPn (kip)", 0.45}, // a 170 px chart: the long title would leave about 10 %
		{230, "φPn (kip)", 0.5},
		{560, "Design strength φPn (kip)", 0.6},
	} {
		ch := sampleChart(4, 40)
		ch.Title = ""
		ch.YShort = "φPn (kip)"
		r, err := NewRaster(716, c.h)
		require.NoError(t, err)
		require.NoError(t, r.Render(ch))
		assert.Equal(t, c.wantLabel, r.k.plot.Y.Label.Text, "%d px", c.h)
		d := r.k.scene.data
		share := float64(d.Max.Y-d.Min.Y) / (float64(c.h) * 72 / DefaultDPI)
		assert.GreaterOrEqual(t, share, c.minShare, "%d px: data area share", c.h)
	}
}
