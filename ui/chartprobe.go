package ui

import (
	"image"
)

// The window draws the current-length marker itself, as a line over the
// chart image, so that a slider step does not have to draw the whole chart
// again: the chart is redrawn only when the curves it shows change. For
// that it needs the pixels of the plot's data area, which the plots package
// does not report; probeDataArea finds them from the axis lines in the
// image. When it cannot, the engine falls back to letting plots draw the
// marker on every step.

// dark reports whether a pixel is dark and grey: the ink of the axis lines
// (coloured curves, light grid lines and white paper are not).
func dark(p []uint8) bool {
	r, g, b := int(p[0]), int(p[1]), int(p[2])
	hi := max(r, g, b)
	lo := min(r, g, b)
	return hi < 0xA8 && hi-lo < 0x20
}

// probeGap is the longest break (curves drawn across an axis) a run of
// axis pixels may have, in pixels.
const probeGap = 10

// probeDataArea finds the plot's data area in a rendered chart: the y axis
// is the longest dark vertical run in the left half, and the x axis the
// longest dark horizontal run leaving its foot to the right. Runs may be
// broken by curves crossing an axis for up to probeGap pixels. It reports
// false when the image does not show such a pair of axes.
func probeDataArea(img *image.RGBA) (image.Rectangle, bool) {
	b := img.Bounds()
	w, h := b.Dx(), b.Dy()
	if w < 40 || h < 40 {
		return image.Rectangle{}, false
	}
	at := func(x, y int) bool {
		o := y*img.Stride + 4*x
		return dark(img.Pix[o : o+4])
	}
	colLen, colX, colY0, colY1 := 0, -1, 0, 0
	for x := 0; x < w/2; x++ {
		start, last := -1, -1
		for y := 0; y < h; y++ {
			if !at(x, y) {
				continue
			}
			if start < 0 || y-last > probeGap+1 {
				start = y
			}
			last = y
			if n := last - start + 1; n > colLen {
				colLen, colX, colY0, colY1 = n, x, start, last
			}
		}
	}
	if colX < 0 || colLen < h*3/10 {
		return image.Rectangle{}, false
	}
	rowLen, rowY := 0, -1
	for y := max(0, colY1-3); y <= min(h-1, colY1+3); y++ {
		last := -1
		for x := colX; x < w; x++ {
			if at(x, y) {
				last = x
			} else if last < 0 || x-last > probeGap {
				break
			}
		}
		if n := last - colX + 1; last >= 0 && n > rowLen {
			rowLen, rowY = n, y
		}
	}
	if rowY < 0 || rowLen < w*3/10 {
		return image.Rectangle{}, false
	}
	return image.Rect(colX, colY0, colX+rowLen, rowY+1), true
}

// markerPixel returns the pixel position (continuous, 0 at the left edge
// of the image) of length x (display units) in a probed data area spanning
// xmin to xmax. The data area starts just right of the y-axis line (which
// plots draws outside it) and ends at the x-axis line's butt end; the two
// offsets are measured against where plots draws its own marker (see
// TestProbeFindsWherePlotsDrawsTheMarker).
func markerPixel(area image.Rectangle, xmin, xmax, x float64) float64 {
	left := float64(area.Min.X) + 1.5
	right := float64(area.Max.X) - 0.5
	if xmax <= xmin || right <= left {
		return left
	}
	return left + (x-xmin)/(xmax-xmin)*(right-left)
}
