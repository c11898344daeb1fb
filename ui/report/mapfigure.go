package report

import (
	"bytes"
	"context"
	"fmt"
	"strings"

	"codeberg.org/go-pdf/fpdf"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
	"upright/ui/units"
)

// Map figure size in points (the same page width as the chart).
const mapW, mapH = 720.0, 430.0

// gatherMap computes and draws the map of the winning family when the
// scheme or the options ask for it.
func gatherMap(ctx context.Context, f *facts) error {
	sc := f.m.Scheme
	if !f.opt.Map && !sc.ReportMap {
		return nil
	}
	if len(f.m.Families) == 0 {
		f.mapNote = "No material family is available, so there is no map."
		return nil
	}
	sp := model.DefaultMapSpec(&sc, f.opt.Range)
	g, err := model.ComputeMap(ctx, sc, sp, nil)
	if err != nil {
		return fmt.Errorf("report: computing the map: %w", err)
	}
	pm := chart.Map(g, &sc, "")
	pm.Caution = "" // the page carries the caution panel and footer
	var buf bytes.Buffer
	if err := plots.WriteMap(&buf, plots.PNG, &pm, plots.Size{Width: mapW, Height: mapH, DPI: f.opt.ChartDPI}); err != nil {
		return fmt.Errorf("report: drawing the map: %w", err)
	}
	f.mapPNG = buf.Bytes()
	f.mapNote = mapCaption(f, g)
	return nil
}

// mapCaption says what the map shows, in the report's units.
func mapCaption(f *facts, g *model.WinMap) string {
	sys := f.sys
	_, yl := chart.MapLabels(&f.m.Scheme, g.Axis)
	lo, hi := chart.MapValue(g.Loads[0], g.Axis, sys), chart.MapValue(g.Loads[len(g.Loads)-1], g.Axis, sys)
	text := fmt.Sprintf("The best family by %s at each of %d unbraced lengths from %s to %s and %d values of %s from %.4g to %.4g, each the lightest working size of its family checked as in the table. Hatched regions are the families, bold lines mark where the best family changes, grey cross-hatching marks where nothing works, and the ringed cross marks this scheme.",
		metricWords(g.Metric), len(g.LengthsMM), units.Length(g.LengthsMM[0], sys), units.Length(g.LengthsMM[len(g.LengthsMM)-1], sys),
		len(g.Loads), lowerFirst(yl), lo, hi)
	if g.Tie > 0 {
		text += fmt.Sprintf(" Near-ties are treated as in the crossover list: going up in length at each %s, the family in front keeps its place until another is better by more than %s or it stops working; dots mark the cells where it is kept although another family is slightly better.",
			mapRowWord(g.Axis), strings.TrimPrefix(model.TieText(g.Tie), "within "))
	}
	return text
}

// mapRowWord names what a row of the map holds fixed.
func mapRowWord(axis model.MapAxis) string {
	if axis == model.MapTributary {
		return "tributary area"
	}
	return "load"
}

// lowerFirst lowers the first letter of an ASCII label.
func lowerFirst(s string) string {
	if s == "" || s[0] < 'A' || s[0] > 'Z' {
		return s
	}
	return string(s[0]+'a'-'A') + s[1:]
}

// mapSection places the map figure with its caption, when there is one.
func mapSection(d *doc, f *facts) {
	if f.mapPNG == nil {
		if f.mapNote != "" {
			d.heading("Where each family wins", 10)
			d.para(f.mapNote, "I", sizeBody)
		}
		return
	}
	p := d.pdf
	imgW := d.width
	imgH := imgW * mapH / mapW
	d.heading("Where each family wins", imgH+14)
	info := p.RegisterImageOptionsReader("winmap", fpdf.ImageOptions{ImageType: "PNG", ReadDpi: false}, bytes.NewReader(f.mapPNG))
	if info == nil || p.Error() != nil {
		d.para("The map could not be embedded.", "I", sizeBody)
		return
	}
	y := p.GetY()
	p.ImageOptions("winmap", d.left, y, imgW, imgH, false, fpdf.ImageOptions{ImageType: "PNG"}, 0, "")
	p.SetY(y + imgH + 1.5)
	d.font("I", sizeSmall)
	d.ink(inkMuted)
	p.SetX(d.left)
	p.MultiCell(d.width, lineH(sizeSmall), printable(f.mapNote), "", "L", false)
}
