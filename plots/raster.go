package plots

import (
	"fmt"
	"image"

	"git.sr.ht/~sbinet/gg"
	xdraw "golang.org/x/image/draw"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
)

// Raster size and resolution limits.
const (
	// MaxPixels is the largest accepted raster width or height.
	MaxPixels = 16384
	// DefaultDPI is the resolution rasters use unless SetDPI changes it.
	DefaultDPI = 96
	// MinDPI and MaxDPI bound SetDPI.
	MinDPI, MaxDPI = 24, 1200
)

// Renderer is anything that draws a chart, such as a Raster or a test double in window code.
type Renderer interface {
	Render(c *Chart) error
}

// Raster draws charts into one reusable RGBA image, reusing its pixels, rasteriser and layout buffers so memory stays flat across redraws.
//
// A Raster is not safe for concurrent use.
type Raster struct {
	img *image.RGBA
	ctx *gg.Context
	dpi int
	k   *composer
}

// NewRaster returns a Raster with its own width × height pixel buffer.
func NewRaster(width, height int) (*Raster, error) {
	if err := checkPixels(width, height); err != nil {
		return nil, err
	}
	return NewRasterFor(image.NewRGBA(image.Rect(0, 0, width, height)))
}

// NewRasterFor returns a Raster that draws into img, whose bounds must start at (0, 0).
func NewRasterFor(img *image.RGBA) (*Raster, error) {
	if img == nil {
		return nil, fmt.Errorf("image is nil: %w", ErrBadSize)
	}
	b := img.Bounds()
	if b.Min != (image.Point{}) {
		return nil, fmt.Errorf("image bounds %v must start at (0,0): %w", b, ErrBadSize)
	}
	if err := checkPixels(b.Dx(), b.Dy()); err != nil {
		return nil, err
	}
	r := &Raster{dpi: DefaultDPI, k: newComposer()}
	r.use(img)
	return r, nil
}

// checkPixels rejects sizes outside 1..MaxPixels, naming the bad field.
func checkPixels(width, height int) error {
	if width < 1 || width > MaxPixels {
		return fmt.Errorf("width %d px (accepted 1 to %d): %w", width, MaxPixels, ErrBadSize)
	}
	if height < 1 || height > MaxPixels {
		return fmt.Errorf("height %d px (accepted 1 to %d): %w", height, MaxPixels, ErrBadSize)
	}
	return nil
}

// use points the Raster at img with a fresh drawing context.
func (r *Raster) use(img *image.RGBA) {
	r.img = img
	r.ctx = gg.NewContextForRGBA(img)
	// Text is only ever translated by whole pixels or turned a quarter turn,
	// so nearest-neighbour placement is exact and avoids gg's slow bilinear path.
	r.ctx.SetInterpolator(xdraw.NearestNeighbor)
}

// Image returns the buffer the Raster draws into; it is overwritten by every Render.
func (r *Raster) Image() *image.RGBA {
	return r.img
}

// Resize gives the Raster a new width × height buffer; the current one is kept when the size is unchanged.
func (r *Raster) Resize(width, height int) error {
	if err := checkPixels(width, height); err != nil {
		return err
	}
	if b := r.img.Bounds(); b.Dx() == width && b.Dy() == height {
		return nil
	}
	r.use(image.NewRGBA(image.Rect(0, 0, width, height)))
	return nil
}

// SetDPI sets the resolution used to turn point sizes (text, line widths) into pixels.
func (r *Raster) SetDPI(dpi int) error {
	if dpi < MinDPI || dpi > MaxDPI {
		return fmt.Errorf("dpi %d (accepted %d to %d): %w", dpi, MinDPI, MaxDPI, ErrBadSize)
	}
	r.dpi = dpi
	return nil
}

// Render validates c and draws it over the whole buffer; on a validation
// error the buffer is left untouched.
func (r *Raster) Render(c *Chart) error {
	if c == nil {
		return ErrNoChart
	}
	if err := c.Validate(); err != nil {
		return err
	}
	// Restore the context to the state vgimg.NewWith gives a fresh one.
	r.ctx.Identity()
	r.ctx.InvertY()
	r.ctx.ResetClip()
	r.ctx.ClearPath()
	r.ctx.SetDash()
	r.ctx.SetLineCapButt()
	cv := vgimg.NewWith(vgimg.UseImageWithContext(r.img, r.ctx), vgimg.UseDPI(r.dpi))
	r.k.draw(draw.New(cv), c, false)
	return nil
}
