package plots

import (
	"bytes"
	"image"
	"image/png"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// inkInBottomLeft counts dark pixels in the bottom-left strip of a PNG: the
// band where the footer sits and nothing else of the chart is drawn.
func inkInBottomLeft(t *testing.T, b []byte) int {
	img, err := png.Decode(bytes.NewReader(b))
	require.NoError(t, err)
	r := img.Bounds()
	strip := image.Rect(r.Min.X, r.Max.Y-r.Dy()/25, r.Min.X+r.Dx()/6, r.Max.Y)
	n := 0
	for y := strip.Min.Y; y < strip.Max.Y; y++ {
		for x := strip.Min.X; x < strip.Max.X; x++ {
			cr, cg, cb, _ := img.At(x, y).RGBA()
			if cr+cg+cb < 3*0x8000 {
				n++
			}
		}
	}
	return n
}

func TestFooterIsDrawnAlongTheBottom(t *testing.T) {
	ch := Chart{Title: "footer", XLabel: "Unbraced length (ft)", YLabel: "Strength (kip)",
		Series: []Series{{Label: "A", Group: "steel", Points: []Point{{X: 2, Y: 500}, {X: 20, Y: 100}}}}}
	var plain, footed bytes.Buffer
	require.NoError(t, WriteChart(&plain, PNG, &ch, DefaultExportSize))
	ch.Footer = "Preliminary sizing for scheme comparison only. Verify with a licensed structural engineer under the governing local code."
	require.NoError(t, WriteChart(&footed, PNG, &ch, DefaultExportSize))
	assert.Zero(t, inkInBottomLeft(t, plain.Bytes()), "without a footer the strip is empty")
	assert.Greater(t, inkInBottomLeft(t, footed.Bytes()), 50, "the footer's text is drawn there")
	// A long footer shrinks to fit the width rather than running off.
	sty := footerStyle(ch.Footer, 700)
	assert.LessOrEqual(t, float64(sty.Width(ch.Footer)), 700.0)
}
