package ui

import (
	"image"
	"math"

	"upright/plots"
)

// keyNote is the chart's legend note when the legend has no room for every
// curve: each curve is keyed beside its row of the results table instead.
const keyNote = "Each curve's key is beside its row in the results table."

// Key swatch size in device-independent pixels.
const (
	keyWidth  = 40
	keyHeight = 14
)

// Swatch is the key of one curve: its line and glyph as the chart draws
// them, for the curve of the candidate with this designation.
type Swatch struct {
	Designation string
	Img         *image.RGBA
}

// swatchSet draws the keys of a chart's curves into rasters it keeps, so
// redraws reuse their pixels.
type swatchSet struct {
	rasters []*plots.Raster
	out     []Swatch
}

// render draws a key for every series of ch at dpi and returns them; the
// images are overwritten by the next call.
func (s *swatchSet) render(ch *plots.Chart, dpi int) []Swatch {
	s.out = s.out[:0]
	w := int(math.Round(keyWidth * float64(dpi) / plots.DefaultDPI))
	h := int(math.Round(keyHeight * float64(dpi) / plots.DefaultDPI))
	for i := range ch.Series {
		if i == len(s.rasters) {
			r, err := plots.NewRaster(w, h)
			if err != nil {
				return s.out
			}
			s.rasters = append(s.rasters, r)
		}
		r := s.rasters[i]
		if r.Resize(w, h) != nil || r.SetDPI(dpi) != nil || r.RenderSwatch(ch, i) != nil {
			continue
		}
		s.out = append(s.out, Swatch{Designation: ch.Series[i].Label, Img: r.Image()})
	}
	return s.out
}

// takeKeys copies the engine's curve keys into new images of the window's
// own (a chart is redrawn only when the curves shown change, so this is
// rare) and shows them in the table. UI goroutine.
func (p *resultsPane) takeKeys(keys []Swatch) {
	p.keys = make(map[string]*image.RGBA, len(keys))
	for _, k := range keys {
		dst := image.NewRGBA(k.Img.Bounds())
		copy(dst.Pix, k.Img.Pix)
		p.keys[k.Designation] = dst
	}
	if p.table != nil {
		p.table.update(false)
	}
}
