package plots

import (
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
)

func overlap(a, b vg.Rectangle) bool {
	return a.Min.X < b.Max.X && b.Min.X < a.Max.X && a.Min.Y < b.Max.Y && b.Min.Y < a.Max.Y
}

// Crossover labels crowded within a few feet (as where the best family
// changes three times between 23 and 25 ft) are measured after drawing: no
// label box overlaps another, the legend, a ring, or the band kept for the
// marker label; every label lies inside the data area.
func TestCrossoverLabelsNeverOverlap(t *testing.T) {
	for _, size := range [][2]vg.Length{{720, 432}, {480, 300}, {1000, 450}} {
		ch := sampleChart(6, 80)
		ch.Marker = &Marker{X: 24, Label: `24'-0.0"`}
		ch.Crossovers = []Crossover{
			{X: 23.5, Y: 300, Label: "→ HSS round"},
			{X: 23.9, Y: 296, Label: "→ Glulam"},
			{X: 24.1, Y: 293, Label: "→ HSS square"},
			{X: 24.5, Y: 290, Label: "→ HSS round"},
			{X: 24.6, Y: 289, Label: "none beyond"},
			{X: 6, Y: 520, Label: "→ Glulam"},
		}
		require.NoError(t, ch.Validate())
		k := newComposer()
		cv := vgimg.New(size[0], size[1])
		k.draw(draw.New(cv), ch, false)

		s := k.scene
		labels := s.boxes
		require.GreaterOrEqual(t, len(labels), 1+4, "%v: the marker label and most crossover labels are placed", size)
		band := s.data
		band.Min.Y = s.data.Max.Y - s.markerBand()
		for i, a := range labels {
			assert.True(t, inside(a, s.data), "%v: label %d inside the data area", size, i)
			assert.False(t, overlap(a, k.legendBox), "%v: label %d clear of the legend", size, i)
			for j := i + 1; j < len(labels); j++ {
				assert.False(t, overlap(a, labels[j]), "%v: labels %d and %d overlap: %v %v", size, i, j, a, labels[j])
			}
			if i == 0 {
				continue // the marker's own label sits in its band
			}
			assert.False(t, overlap(a, band), "%v: crossover label %d clear of the marker label's band", size, i)
			for _, r := range s.rings {
				assert.False(t, overlap(a, r), "%v: label %d clear of every ring", size, i)
			}
		}
	}
}
