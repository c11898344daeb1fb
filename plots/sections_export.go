package plots

import (
	"bytes"
	"encoding/xml"
	"fmt"
	"image/color"
	"io"
	"strings"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
)

// DefaultPlanSize is the exported plan-sections figure: 12.5 × 5.2 inches at
// 96 DPI for PNG, so a PNG is 1200 × 500 pixels.
var DefaultPlanSize = Size{Width: 900, Height: 375, DPI: 96}

// newPlanDrawer returns a drawer for a validated sheet.
func newPlanDrawer(s *PlanSheet) *planDrawer {
	return &planDrawer{sheet: s, sty: planText}
}

// RenderPlan validates the sheet and draws it over the Raster's whole
// buffer, returning where each section lies in the image. On a validation
// error the buffer is left untouched.
func (r *Raster) RenderPlan(s *PlanSheet) (PlanLayout, error) {
	if s == nil {
		return PlanLayout{}, ErrNoChart
	}
	if err := s.Validate(); err != nil {
		return PlanLayout{}, err
	}
	r.ctx.Identity()
	r.ctx.InvertY()
	r.ctx.ResetClip()
	r.ctx.ClearPath()
	r.ctx.SetDash()
	r.ctx.SetLineCapButt()
	cv := vgimg.NewWith(vgimg.UseImageWithContext(r.img, r.ctx), vgimg.UseDPI(r.dpi))
	_, h := cv.Size()
	mt := &maskedText{Canvas: cv, img: r.img, dpi: float64(r.dpi), h: h, keep: planMasks}
	mt.ink.C = color.Black
	p := newPlanDrawer(s)
	c := draw.New(mt)
	p.draw(c, false)
	return p.result(r.dpi, c.Max.Y, false), nil
}

// LayoutPlan returns where the sections of s lie, in pixels, when the sheet
// is drawn at the given size (the PNG's pixels at size.DPI), without drawing
// it; the polygons of each section's body and fill are included.
func LayoutPlan(s *PlanSheet, size Size) (PlanLayout, error) {
	if s == nil {
		return PlanLayout{}, ErrNoChart
	}
	if err := size.check(PNG); err != nil {
		return PlanLayout{}, err
	}
	if err := s.Validate(); err != nil {
		return PlanLayout{}, err
	}
	p := newPlanDrawer(s)
	h := vg.Points(size.Height)
	p.place(vg.Rectangle{Max: vg.Point{X: vg.Points(size.Width), Y: h}})
	return p.result(size.dpi(), h, true), nil
}

// WritePlan validates s and writes it to w in format f at the given size,
// returning the layout in pixels at size.DPI.
func WritePlan(w io.Writer, f Format, s *PlanSheet, size Size) (PlanLayout, error) {
	if s == nil {
		return PlanLayout{}, ErrNoChart
	}
	if f != PNG && f != SVG && f != PDF {
		return PlanLayout{}, fmt.Errorf("format %q: %w", string(f), ErrUnknownFormat)
	}
	if err := size.check(f); err != nil {
		return PlanLayout{}, err
	}
	if err := s.Validate(); err != nil {
		return PlanLayout{}, err
	}
	cv := newCanvas(f, size)
	p := newPlanDrawer(s)
	p.labels = make([][]string, len(s.Sections))
	c := draw.New(cv)
	p.draw(c, f != PNG)
	if f == SVG {
		// Text is drawn as glyph outlines; a <desc> element carries it as
		// words for screen readers, search and tests.
		var buf bytes.Buffer
		if _, err := cv.WriteTo(&buf); err != nil {
			return PlanLayout{}, fmt.Errorf("plots: writing %s: %w", f, err)
		}
		if _, err := w.Write(withDesc(buf.Bytes(), s, p.labels)); err != nil {
			return PlanLayout{}, fmt.Errorf("plots: writing %s: %w", f, err)
		}
	} else if _, err := cv.WriteTo(w); err != nil {
		return PlanLayout{}, fmt.Errorf("plots: writing %s: %w", f, err)
	}
	l := p.result(size.dpi(), c.Max.Y, true)
	l.Labels = p.labels
	return l, nil
}

// withDesc inserts after the opening <svg> tag a <title> (the sheet's
// title) and a <desc> listing every drawn label and the caution.
func withDesc(svg []byte, s *PlanSheet, labels [][]string) []byte {
	i := bytes.Index(svg, []byte("<svg"))
	if i < 0 {
		return svg
	}
	j := bytes.IndexByte(svg[i:], '>')
	if j < 0 {
		return svg
	}
	at := i + j + 1
	var b bytes.Buffer
	esc := func(t string) { _ = xml.EscapeText(&b, []byte(t)) }
	b.WriteString("\n<title>")
	title := s.Title
	if title == "" {
		title = "Plan sections to one scale"
	}
	esc(title)
	b.WriteString("</title>\n<desc>")
	for k, ls := range labels {
		if k > 0 {
			b.WriteString("; ")
		}
		esc(strings.Join(ls, ", "))
	}
	if s.Note != "" {
		b.WriteString(". ")
		esc(s.Note)
	}
	if s.Caution != "" {
		b.WriteString(" ")
		esc(s.Caution)
	}
	b.WriteString("</desc>")
	out := make([]byte, 0, len(svg)+b.Len())
	out = append(out, svg[:at]...)
	out = append(out, b.Bytes()...)
	return append(out, svg[at:]...)
}

// SavePlan writes s to the file at path, choosing the format from its extension.
func SavePlan(path string, s *PlanSheet, size Size) (_ PlanLayout, err error) {
	f, err := FormatOf(path)
	if err != nil {
		return PlanLayout{}, err
	}
	if s == nil {
		return PlanLayout{}, ErrNoChart
	}
	if err := size.check(f); err != nil {
		return PlanLayout{}, err
	}
	if err := s.Validate(); err != nil {
		return PlanLayout{}, err
	}
	var l PlanLayout
	err = saveFile(path, func(w io.Writer) error {
		var werr error
		l, werr = WritePlan(w, f, s, size)
		return werr
	})
	if err != nil {
		return PlanLayout{}, err
	}
	return l, nil
}
