package plots

import (
	"fmt"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
)

// RenderSwatch draws the key of series i of c over the whole buffer, on
// white: a stretch of its line with its glyph in the middle, exactly as the
// chart draws that series, so a key shown outside the chart (beside a table
// row, say) identifies the curve.
func (r *Raster) RenderSwatch(c *Chart, i int) error {
	if c == nil {
		return ErrNoChart
	}
	if i < 0 || i >= len(c.Series) {
		return fmt.Errorf("series %d of %d: %w", i, len(c.Series), ErrBadSize)
	}
	if err := c.Validate(); err != nil {
		return err
	}
	st := r.k.styles(c)[i]
	r.ctx.Identity()
	r.ctx.InvertY()
	r.ctx.ResetClip()
	r.ctx.ClearPath()
	r.ctx.SetDash()
	r.ctx.SetLineCapButt()
	cv := draw.New(vgimg.NewWith(vgimg.UseImageWithContext(r.img, r.ctx), vgimg.UseDPI(r.dpi)))
	cv.SetColor(paper)
	cv.Fill(cv.Rectangle.Path())
	mid := (cv.Min.Y + cv.Max.Y) / 2
	pad := vg.Points(2)
	cv.StrokeLine2(st.line, cv.Min.X+pad, mid, cv.Max.X-pad, mid)
	cv.DrawGlyphNoClip(st.glyph, vg.Point{X: (cv.Min.X + cv.Max.X) / 2, Y: mid})
	return nil
}

// styles returns the look of every series of ch, as a draw gives them.
func (k *composer) styles(ch *Chart) []seriesStyle {
	k.prepare(ch)
	k.scene.chart = nil
	return k.scene.styles
}
