package report

import (
	"bytes"
	"fmt"
	"math"

	"codeberg.org/go-pdf/fpdf"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/units"
)

// sectionsSize is the plan-sections figure in the report: 10 × 4.2 inches.
var sectionsSize = plots.Size{Width: 720, Height: 300}

// sectionsFigure draws each family's best working size in plan, at one
// scale, next to the summary, with the scale it prints at on the page.
func sectionsFigure(d *doc, f *facts) {
	if len(f.m.Families) == 0 {
		return
	}
	sheet, keys := chart.Sections(f.m, f.res, chart.SectionsOptions{Caution: true, AtLength: true})
	if len(keys) == 0 {
		return
	}
	printedPerMM, ok := planFigure(d, &sheet, sectionsSize, f.opt.ChartDPI, "sections", "What the columns look like in plan", 16)
	if !ok {
		return
	}
	caption := fmt.Sprintf("Each family's best working size at %s, drawn in plan at one scale beside a %s. ",
		units.Length(f.res.Setting.LengthMM, f.sys), sheet.ReferenceLabel)
	if printedPerMM > 0 && !math.IsInf(printedPerMM, 0) {
		caption += fmt.Sprintf("On this page the scale is about 1:%.0f. ", 1/printedPerMM)
	}
	caption += "Steel is drawn solid, concrete with its bars and ties or spiral, timber with any charred layer dark."
	d.font("I", sizeSmall)
	d.ink(inkMuted)
	d.pdf.SetX(d.left)
	d.pdf.MultiCell(d.width, lineH(sizeSmall), printable(caption), "", "L", false)
}

// planFigure draws a plan sheet as a full-width PNG figure under a heading
// (pad mm kept with it) and returns its printed scale, paper mm per mm of
// column; false, with a note in the report, when it could not be drawn.
func planFigure(d *doc, sheet *plots.PlanSheet, size plots.Size, dpi int, name, heading string, pad float64) (float64, bool) {
	size.DPI = dpi
	var buf bytes.Buffer
	layout, err := plots.WritePlan(&buf, plots.PNG, sheet, size)
	p := d.pdf
	imgW := d.width
	imgH := imgW * size.Height / size.Width
	d.heading(heading, imgH+pad)
	if err != nil {
		d.para("The plan sections could not be drawn: "+err.Error(), "I", sizeBody)
		return 0, false
	}
	info := p.RegisterImageOptionsReader(name, fpdf.ImageOptions{ImageType: "PNG", ReadDpi: false}, bytes.NewReader(buf.Bytes()))
	if info == nil || p.Error() != nil {
		d.para("The plan sections could not be embedded.", "I", sizeBody)
		return 0, false
	}
	y := p.GetY()
	p.ImageOptions(name, d.left, y, imgW, imgH, false, fpdf.ImageOptions{ImageType: "PNG"}, 0, "")
	p.SetY(y + imgH + 1.5)
	// Printed scale: the figure is layout.PxPerMM pixels per millimetre of
	// column at size.DPI, and size.Width points wide printed d.width mm wide.
	return layout.PxPerMM * 72 / float64(size.DPI) * d.width / size.Width, true
}
