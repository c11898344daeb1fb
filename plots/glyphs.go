package plots

import (
	"math"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// outline is the kind of polygon a glyph traces.
type outline int

const (
	outlineCircle outline = iota
	outlineSquare
	outlineTriangleUp
	outlineTriangleDown
	outlineDiamond
	outlineCross
)

// glyph is a point marker shape, filled or drawn as an outline over a white fill.
type glyph struct {
	shape  outline
	filled bool
}

// glyphShapes is the sequence of marker shapes handed to series; filled and
// open shapes alternate so neighbours differ even when printed small in grey.
var glyphShapes = []draw.GlyphDrawer{
	glyph{shape: outlineCircle, filled: true},
	glyph{shape: outlineSquare},
	glyph{shape: outlineTriangleUp, filled: true},
	glyph{shape: outlineDiamond},
	glyph{shape: outlineSquare, filled: true},
	glyph{shape: outlineCircle},
	glyph{shape: outlineTriangleDown, filled: true},
	glyph{shape: outlineCross},
}

// glyphStroke is the outline width of open glyphs in points.
const glyphStroke = 1.3

// DrawGlyph draws the shape centred on pt with the style's colour and radius.
func (g glyph) DrawGlyph(c *draw.Canvas, sty draw.GlyphStyle, pt vg.Point) {
	r := sty.Radius
	var buf [6]vg.PathComp
	p := vg.Path(buf[:0])
	switch g.shape {
	case outlineCircle:
		p.Move(vg.Point{X: pt.X + r, Y: pt.Y})
		p.Arc(pt, r, 0, 2*math.Pi)
		p.Close()
	case outlineSquare:
		s := r * 0.85
		p.Move(vg.Point{X: pt.X - s, Y: pt.Y - s})
		p.Line(vg.Point{X: pt.X + s, Y: pt.Y - s})
		p.Line(vg.Point{X: pt.X + s, Y: pt.Y + s})
		p.Line(vg.Point{X: pt.X - s, Y: pt.Y + s})
		p.Close()
	case outlineTriangleUp, outlineTriangleDown:
		t := r * 1.2
		d := vg.Length(1)
		if g.shape == outlineTriangleDown {
			d = -1
		}
		p.Move(vg.Point{X: pt.X, Y: pt.Y + d*t})
		p.Line(vg.Point{X: pt.X - t*0.866, Y: pt.Y - d*t*0.5})
		p.Line(vg.Point{X: pt.X + t*0.866, Y: pt.Y - d*t*0.5})
		p.Close()
	case outlineDiamond:
		t := r * 1.2
		p.Move(vg.Point{X: pt.X, Y: pt.Y + t})
		p.Line(vg.Point{X: pt.X + t, Y: pt.Y})
		p.Line(vg.Point{X: pt.X, Y: pt.Y - t})
		p.Line(vg.Point{X: pt.X - t, Y: pt.Y})
		p.Close()
	case outlineCross:
		s := r * 0.9
		c.SetLineStyle(draw.LineStyle{Color: sty.Color, Width: vg.Points(glyphStroke * 1.3)})
		p.Move(vg.Point{X: pt.X - s, Y: pt.Y - s})
		p.Line(vg.Point{X: pt.X + s, Y: pt.Y + s})
		c.Stroke(p)
		p = p[:0]
		p.Move(vg.Point{X: pt.X - s, Y: pt.Y + s})
		p.Line(vg.Point{X: pt.X + s, Y: pt.Y - s})
		c.Stroke(p)
		return
	}
	if g.filled {
		c.SetColor(sty.Color)
		c.Fill(p)
		return
	}
	c.SetColor(paper)
	c.Fill(p)
	c.SetLineStyle(draw.LineStyle{Color: sty.Color, Width: vg.Points(glyphStroke)})
	c.Stroke(p)
}
