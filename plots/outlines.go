package plots

import (
	xfont "golang.org/x/image/font"
	"golang.org/x/image/font/sfnt"
	"golang.org/x/image/math/fixed"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/vg"
)

// outlinedText wraps a vector canvas so that text the canvas cannot write
// as text is drawn as filled glyph outlines: gonum's PDF writer (v0.17.0)
// only handles code page 1252 text and cannot select bold or italic faces,
// so a string with φ, × or → or a bold or italic face becomes outlines,
// and the rest stays text, selectable and searchable, in the embedded font.
// With keep nil every string becomes outlines.
type outlinedText struct {
	vg.CanvasWriterTo
	keep func(f font.Face, s string) bool // write s as text
	buf  sfnt.Buffer
	path vg.Path
}

// pdfText reports whether gonum's PDF writer can write s in face f as
// text: a regular upright face and plain ASCII (the writer passes the
// string's bytes to a code page 1252 font, so any other character would
// come out garbled).
func pdfText(f font.Face, s string) bool {
	if f.Font.Weight != xfont.WeightNormal || f.Font.Style != xfont.StyleNormal {
		return false
	}
	for i := 0; i < len(s); i++ {
		if s[i] >= 0x80 {
			return false
		}
	}
	return true
}

// FillString writes s as text when the canvas can, else fills its outlines
// with the current colour, with its baseline starting at pt.
func (c *outlinedText) FillString(f font.Face, pt vg.Point, s string) {
	if c.keep != nil && c.keep(f, s) {
		c.CanvasWriterTo.FillString(f, pt, s)
		return
	}
	c.outline(f, pt, s)
}

// outline fills the glyph outlines of s with the current colour.
func (c *outlinedText) outline(f font.Face, pt vg.Point, s string) {
	sf := f.Face
	if sf == nil || f.Font.Size == 0 {
		return
	}
	upem := sf.UnitsPerEm()
	// Loading glyphs at ppem = unitsPerEm (in 26.6) yields raw values where
	// one em is upem units; gonum measures text the same way.
	ppem := fixed.Int26_6(upem)
	scale := f.Font.Size / vg.Length(upem)
	x := pt.X
	at := func(p fixed.Point26_6) vg.Point {
		return vg.Point{X: x + vg.Length(p.X)*scale, Y: pt.Y - vg.Length(p.Y)*scale}
	}
	c.path = c.path[:0]
	var prev sfnt.GlyphIndex
	for i, r := range s {
		idx, err := sf.GlyphIndex(&c.buf, r)
		if err != nil {
			continue
		}
		if i > 0 {
			if k, err := sf.Kern(&c.buf, prev, idx, ppem, xfont.HintingNone); err == nil {
				x += vg.Length(k) * scale
			}
		}
		if segs, err := sf.LoadGlyph(&c.buf, idx, ppem, nil); err == nil {
			open := false
			for _, sg := range segs {
				switch sg.Op {
				case sfnt.SegmentOpMoveTo:
					if open {
						c.path.Close()
					}
					c.path.Move(at(sg.Args[0]))
					open = true
				case sfnt.SegmentOpLineTo:
					c.path.Line(at(sg.Args[0]))
				case sfnt.SegmentOpQuadTo:
					c.path.QuadTo(at(sg.Args[0]), at(sg.Args[1]))
				case sfnt.SegmentOpCubeTo:
					c.path.CubeTo(at(sg.Args[0]), at(sg.Args[1]), at(sg.Args[2]))
				}
			}
			if open {
				c.path.Close()
			}
		}
		if adv, err := sf.GlyphAdvance(&c.buf, idx, ppem, xfont.HintingNone); err == nil {
			x += vg.Length(adv) * scale
		}
		prev = idx
	}
	if len(c.path) > 0 {
		c.Fill(c.path)
	}
}
