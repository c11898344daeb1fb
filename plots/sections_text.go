package plots

import (
	"image"
	"image/color"
	"image/draw"
	"math"
	"sync"

	xfont "golang.org/x/image/font"
	"golang.org/x/image/math/fixed"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/vgimg"
)

// maskedText is a raster canvas that draws text from a cache of glyph-run
// masks instead of rasterising every glyph on every draw: the plan sheet's
// labels repeat from one frame to the next, and rasterising them was most of
// a frame's cost. Text is placed on whole pixels, as the chart's is.
type maskedText struct {
	*vgimg.Canvas
	img  *image.RGBA
	dpi  float64
	h    vg.Length // canvas height, to turn y up into rows down
	ink  image.Uniform
	keep *textMasks
}

// SetColor remembers the colour for text and passes it on.
func (c *maskedText) SetColor(col color.Color) {
	if col == nil {
		col = color.Black
	}
	c.ink.C = col
	c.Canvas.SetColor(col)
}

// FillString draws s with its baseline starting at pt from the cached mask.
func (c *maskedText) FillString(f font.Face, pt vg.Point, s string) {
	if f.Font.Size == 0 || s == "" {
		return
	}
	m := c.keep.get(f, c.dpi, s)
	if m == nil {
		return
	}
	x := int(math.Round(pt.X.Dots(c.dpi))) - m.origin.X
	y := int(math.Round((c.h - pt.Y).Dots(c.dpi))) - m.origin.Y
	r := m.alpha.Bounds().Add(image.Pt(x, y))
	draw.DrawMask(c.img, r, &c.ink, image.Point{}, m.alpha, image.Point{}, draw.Over)
}

// textMask is one string rasterised: its coverage and where its baseline
// origin lies in it.
type textMask struct {
	alpha  *image.Alpha
	origin image.Point
}

// textKey names a rasterised string.
type textKey struct {
	font font.Font
	dpi  float64
	s    string
}

// textMasks caches rasterised strings; it is emptied when it grows past
// maxTextMasks, so memory stays bounded however many labels pass through.
type textMasks struct {
	mu sync.Mutex
	m  map[textKey]*textMask
}

const maxTextMasks = 1024

// planMasks is the cache the plan rasters share.
var planMasks = &textMasks{m: map[textKey]*textMask{}}

// get returns the mask of s in face f at dpi, rasterising it on a miss.
func (t *textMasks) get(f font.Face, dpi float64, s string) *textMask {
	k := textKey{f.Font, dpi, s}
	t.mu.Lock()
	m, ok := t.m[k]
	t.mu.Unlock()
	if ok {
		return m
	}
	face := f.FontFace(dpi)
	defer face.Close()
	b, _ := xfont.BoundString(face, s)
	if b.Max.X <= b.Min.X || b.Max.Y <= b.Min.Y {
		m = nil
	} else {
		ox, oy := -b.Min.X.Floor(), -b.Min.Y.Floor()
		w, h := b.Max.X.Ceil()+ox, b.Max.Y.Ceil()+oy
		a := image.NewAlpha(image.Rect(0, 0, w, h))
		d := xfont.Drawer{Dst: a, Src: image.Opaque, Face: face, Dot: fixed.P(ox, oy)}
		d.DrawString(s)
		m = &textMask{alpha: a, origin: image.Pt(ox, oy)}
	}
	t.mu.Lock()
	if len(t.m) >= maxTextMasks {
		t.m = map[textKey]*textMask{}
	}
	t.m[k] = m
	t.mu.Unlock()
	return m
}
