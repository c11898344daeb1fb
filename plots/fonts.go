package plots

import (
	"image/color"

	xfont "golang.org/x/image/font"
	"gonum.org/v1/plot"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// Type faces used on the chart; Liberation Sans ships with gonum/plot.
var (
	faceRegular = font.Font{Typeface: "Liberation", Variant: "Sans"}
	faceBold    = font.Font{Typeface: "Liberation", Variant: "Sans", Weight: xfont.WeightBold}
	faceItalic  = font.Font{Typeface: "Liberation", Variant: "Sans", Style: xfont.StyleItalic}
)

// Font sizes in points.
const (
	sizeTitle  = 14
	sizeAxis   = 11.5
	sizeTick   = 10
	sizeLegend = 10
	sizeMark   = 9
	sizeNote   = 9
	sizeEmpty  = 15
)

// textStyle returns a left/bottom-aligned plain-text style.
func textStyle(f font.Font, size vg.Length, c color.Color) text.Style {
	return text.Style{
		Color:   c,
		Font:    font.From(f, size),
		XAlign:  draw.XLeft,
		YAlign:  draw.YBottom,
		Handler: plot.DefaultTextHandler,
	}
}

// aligned returns sty with the given alignment.
func aligned(sty text.Style, x draw.XAlignment, y draw.YAlignment) text.Style {
	sty.XAlign, sty.YAlign = x, y
	return sty
}
