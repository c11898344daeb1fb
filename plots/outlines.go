package plots

import (
	xfont "golang.org/x/image/font"
	"golang.org/x/image/font/sfnt"
	"golang.org/x/image/math/fixed"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/vg"
)

// outlinedText wraps a vector canvas so text is drawn as filled glyph
// outlines instead of font references. The SVG and PDF then look the same as
// the PNG on any viewer, whatever fonts it has, and characters such as φ and ×
// survive (gonum's PDF writer only handles code page 1252 text and, in
// v0.17.0, cannot select bold or italic faces).
type outlinedText struct {
	vg.CanvasWriterTo
	buf  sfnt.Buffer
	path vg.Path
}

// FillString fills the outlines of s with the current colour, with its baseline starting at pt.
func (c *outlinedText) FillString(f font.Face, pt vg.Point, s string) {
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
