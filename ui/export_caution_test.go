package ui

import (
	"bytes"
	"image"
	"image/png"
	"os"
	"path/filepath"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// The chart the window exports carries the caution as a footer line along
// its bottom edge, in the strip where nothing else of the chart is drawn.
func TestExportedChartCarriesTheCaution(t *testing.T) {
	h, dir := fileHarness(t)
	path := filepath.Join(dir, "chart.png")
	h.ui(func() { require.NoError(t, h.w.files.ExportChartFile(path)) })
	b, err := os.ReadFile(path)
	require.NoError(t, err)
	img, err := png.Decode(bytes.NewReader(b))
	require.NoError(t, err)
	r := img.Bounds()
	strip := image.Rect(r.Min.X, r.Max.Y-r.Dy()/25, r.Min.X+r.Dx()/6, r.Max.Y)
	ink := 0
	for y := strip.Min.Y; y < strip.Max.Y; y++ {
		for x := strip.Min.X; x < strip.Max.X; x++ {
			cr, cg, cb, _ := img.At(x, y).RGBA()
			if cr+cg+cb < 3*0x8000 {
				ink++
			}
		}
	}
	assert.Greater(t, ink, 50, "the caution footer is drawn")
}
