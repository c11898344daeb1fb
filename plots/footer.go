package plots

import (
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// Footer text sizes in points: the size tried first and the smallest it shrinks to.
const (
	sizeFooter    = 8.5
	sizeFooterMin = 5
	footerGap     = 6
)

// footerStyle returns the footer's text style at the largest size, from
// sizeFooter down to sizeFooterMin, at which text fits in width.
func footerStyle(text string, width vg.Length) (sty draw.TextStyle) {
	for size := sizeFooter; ; size -= 0.5 {
		sty = aligned(textStyle(faceRegular, vg.Points(size), inkText), draw.XLeft, draw.YBottom)
		if size <= sizeFooterMin || sty.Width(text) <= width {
			return sty
		}
	}
}

// drawFooter writes text along the bottom of c and returns the height it
// took, gap included, for the rest of the chart to keep clear of.
func drawFooter(c draw.Canvas, text string) vg.Length {
	sty := footerStyle(text, c.Max.X-c.Min.X)
	c.FillText(sty, vg.Point{X: c.Min.X, Y: c.Min.Y}, text)
	return sty.Height(text) + vg.Points(footerGap)
}
