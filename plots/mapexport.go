package plots

import (
	"fmt"
	"image"
	"io"
	"math"

	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
)

// MapRaster draws maps into one reusable RGBA image, reusing its pixels,
// rasteriser, paths and layout buffers so memory stays flat across redraws.
// A MapRaster is not safe for concurrent use.
type MapRaster struct {
	*Raster
	k    *mapComposer
	area image.Rectangle
}

// NewMapRaster returns a MapRaster with its own width × height pixel buffer.
func NewMapRaster(width, height int) (*MapRaster, error) {
	r, err := NewRaster(width, height)
	if err != nil {
		return nil, err
	}
	return &MapRaster{Raster: r, k: newMapComposer()}, nil
}

// RenderMap validates m and draws it over the whole buffer; on a validation
// error the buffer is left untouched.
func (r *MapRaster) RenderMap(m *Map) error {
	if m == nil {
		return ErrNoMap
	}
	if err := m.Validate(); err != nil {
		return err
	}
	ctx := r.ctx
	ctx.Identity()
	ctx.InvertY()
	ctx.ResetClip()
	ctx.ClearPath()
	ctx.SetDash()
	ctx.SetLineCapButt()
	cv := vgimg.NewWith(vgimg.UseImageWithContext(r.img, ctx), vgimg.UseDPI(r.dpi))
	dc := draw.New(cv)
	r.k.draw(dc, m, true)
	// Where the cells landed, in pixels from the top left, for pointing.
	d, scale := r.k.scene.data, float64(r.dpi)/72
	h := float64(r.img.Bounds().Dy())
	r.area = image.Rect(int(math.Round(float64(d.Min.X)*scale)), int(math.Round(h-float64(d.Max.Y)*scale)),
		int(math.Round(float64(d.Max.X)*scale)), int(math.Round(h-float64(d.Min.Y)*scale)))
	return nil
}

// CellsArea returns the pixel rectangle the last RenderMap drew the cells
// in; the cells divide it evenly when the map's X and Y are evenly spaced.
func (r *MapRaster) CellsArea() image.Rectangle { return r.area }

// WriteMap validates m and writes it to w in format f at the given size.
func WriteMap(w io.Writer, f Format, m *Map, size Size) error {
	if m == nil {
		return ErrNoMap
	}
	if f != PNG && f != SVG && f != PDF {
		return fmt.Errorf("format %q: %w", string(f), ErrUnknownFormat)
	}
	if err := size.check(f); err != nil {
		return err
	}
	if err := m.Validate(); err != nil {
		return err
	}
	cv := newCanvas(f, size)
	newMapComposer().draw(draw.New(cv), m, true)
	if _, err := cv.WriteTo(w); err != nil {
		return fmt.Errorf("plots: writing %s: %w", f, err)
	}
	return nil
}

// SaveMap writes m to the file at path, choosing the format from its extension.
func SaveMap(path string, m *Map, size Size) (err error) {
	f, err := FormatOf(path)
	if err != nil {
		return err
	}
	if m == nil {
		return ErrNoMap
	}
	if err := size.check(f); err != nil {
		return err
	}
	if err := m.Validate(); err != nil {
		return err
	}
	return saveFile(path, func(w io.Writer) error { return WriteMap(w, f, m, size) })
}
