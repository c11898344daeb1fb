package plots

import (
	"image"
	"image/color"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// A Raster is a Renderer.
var _ Renderer = (*Raster)(nil)

// TestRasterSizes checks size limits and buffer reuse.
func TestRasterSizes(t *testing.T) {
	for _, wh := range [][2]int{{0, 10}, {10, 0}, {-5, 10}, {MaxPixels + 1, 10}, {10, MaxPixels + 1}} {
		_, err := NewRaster(wh[0], wh[1])
		assert.ErrorIs(t, err, ErrBadSize, "%v", wh)
	}
	_, err := NewRasterFor(nil)
	assert.ErrorIs(t, err, ErrBadSize)
	off := image.NewRGBA(image.Rect(5, 5, 100, 100))
	_, err = NewRasterFor(off)
	assert.ErrorIs(t, err, ErrBadSize)

	r, err := NewRaster(300, 200)
	require.NoError(t, err)
	img := r.Image()
	require.NoError(t, r.Resize(300, 200))
	assert.Same(t, img, r.Image(), "same size must keep the buffer")
	require.NoError(t, r.Resize(320, 240))
	assert.Equal(t, image.Pt(320, 240), r.Image().Bounds().Size())
	assert.ErrorIs(t, r.Resize(0, 1), ErrBadSize)
	assert.ErrorIs(t, r.SetDPI(10), ErrBadSize)
	require.NoError(t, r.SetDPI(192))
	require.NoError(t, r.Render(sampleChart(3, 30)))
}

// TestRenderIntoCallerImage checks NewRasterFor draws into the caller's own pixels.
func TestRenderIntoCallerImage(t *testing.T) {
	img := image.NewRGBA(image.Rect(0, 0, 400, 260))
	r, err := NewRasterFor(img)
	require.NoError(t, err)
	require.NoError(t, r.Render(sampleChart(3, 50)))
	assert.Same(t, img, r.Image())
	assert.Equal(t, color.RGBA{255, 255, 255, 255}, img.RGBAAt(1, 1), "background is white")
	assert.Greater(t, inkShare(img, img.Bounds()), 0.01, "chart drawn into the caller's image")
}

// TestEmptyChartDrawsAxesAndNote checks a chart with no series still shows
// both axes and the "no candidates" note in the middle of the plot.
func TestEmptyChartDrawsAxesAndNote(t *testing.T) {
	r, err := NewRaster(600, 400)
	require.NoError(t, err)
	c := &Chart{XLabel: "Unbraced length (ft)", YLabel: "Design strength φPn (kip)"}
	require.NoError(t, r.Render(c))
	img := r.Image()
	data := r.k.scene.data // data area in points, origin bottom-left
	px := func(l float64) int { return int(l * DefaultDPI / 72) }
	x0, x1 := px(float64(data.Min.X)), px(float64(data.Max.X))
	yb := img.Bounds().Dy() - px(float64(data.Min.Y)) // bottom edge in image rows
	yt := img.Bounds().Dy() - px(float64(data.Max.Y))
	// The x axis: a dark row along the bottom of the data area.
	assert.Greater(t, inkShare(img, image.Rect(x0, yb-1, x1, yb+2)), 0.3, "x axis line")
	// The y axis: a dark column along the left of the data area.
	assert.Greater(t, inkShare(img, image.Rect(x0-2, yt, x0+1, yb)), 0.3, "y axis line")
	// The note: ink in the central band of the data area.
	cx, cy := (x0+x1)/2, (yt+yb)/2
	assert.Greater(t, inkShare(img, image.Rect(cx-100, cy-10, cx+100, cy+10)), 0.03, "no-candidates note")
	assert.Equal(t, emptyNote, "No candidates to show")
	// Tick labels left of the y axis.
	assert.Greater(t, inkShare(img, image.Rect(0, yt, x0-6, yb)), 0.01, "y labels")
}

// inkShare returns the share of pixels in r that are clearly darker than white.
func inkShare(img *image.RGBA, r image.Rectangle) float64 {
	r = r.Intersect(img.Bounds())
	if r.Empty() {
		return 0
	}
	n := 0
	for y := r.Min.Y; y < r.Max.Y; y++ {
		for x := r.Min.X; x < r.Max.X; x++ {
			c := img.RGBAAt(x, y)
			if int(c.R)+int(c.G)+int(c.B) < 3*170 {
				n++
			}
		}
	}
	return float64(n) / float64(r.Dx()*r.Dy())
}
