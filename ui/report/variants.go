package report

import (
	"context"
	"fmt"
	"math"
	"strings"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
	"upright/ui/units"
)

// variantsFigureSize is the variants' plan-sections figure: 10 × 5 inches.
var variantsFigureSize = plots.Size{Width: 720, Height: 360}

// gatherVariants evaluates the scheme's variants beside it, when it has some.
func gatherVariants(ctx context.Context, f *facts) error {
	if len(f.m.Scheme.Variants) == 0 || len(f.m.Families) == 0 {
		return nil
	}
	c, err := model.CompareVariantsFrom(ctx, f.m.Scheme, f.m)
	if err != nil {
		return fmt.Errorf("report: evaluating the variants: %w", err)
	}
	f.variants = c
	return nil
}

// variantCell is a family's best size in one column of the comparison.
func variantCell(col *model.VariantResult, family string) string {
	switch {
	case col.Err != nil:
		return "—"
	case col.Family(family) == nil:
		return "off"
	}
	if b := col.Best(family); b != nil {
		return b.Static.Designation
	}
	return "none works"
}

// variantsSection is the variants page: what each variant changes, each
// family's best size side by side with its change against the base, the
// best overall of each, and the plan sections in rows at one scale.
func variantsSection(d *doc, f *facts) {
	c := f.variants
	if c == nil {
		return
	}
	d.pdf.AddPage()
	d.heading("Variants side by side", 40)
	cols := c.Columns()
	var lines []string
	for _, col := range cols[1:] {
		l := col.Name + ": " + model.ChangesText(col.Changes)
		if col.Err != nil {
			l += " (not evaluated: " + col.Err.Error() + ")"
		} else {
			l += fmt.Sprintf(" (length %s, demand %s)", units.Length(col.Result.Setting.LengthMM, f.sys), forceText(col.Model.Loads.DemandN, f.sys))
		}
		lines = append(lines, l)
	}
	d.para("Each variant is this scheme with the inputs listed changed, checked at its own length and load exactly as the scheme is. Below each size, the change of the column's weight, plan area and embodied carbon against the base.", "", sizeBody)
	d.bullets(lines, sizeBody)
	tcols := []column{{title: "Family", share: 1.1, align: "L"}}
	for _, col := range cols {
		tcols = append(tcols, column{title: col.Name, share: 1.5, align: "L"})
	}
	var rows []row
	for _, fam := range c.Families {
		cells := []string{fam, variantCell(&c.Base, fam)}
		for vi := range c.Variants {
			cell := variantCell(&c.Variants[vi], fam)
			if dl := c.Delta(vi, fam); dl.Known {
				m, a, cb := units.DeltaParts(dl.MassKg, dl.PlanAreaMM2, dl.CarbonKg, f.sys)
				cell += "\n" + m + ", " + a + ", " + cb
			}
			cells = append(cells, cell)
		}
		rows = append(rows, row{cells: cells})
	}
	best := []string{"Best overall by " + string(f.m.Scheme.Metric)}
	for _, col := range cols {
		if b := col.BestOverall(); b != nil {
			best = append(best, b.Static.Designation+" ("+col.Model.Families[b.Family].Name()+")")
		} else {
			best = append(best, "none works")
		}
	}
	rows = append(rows, row{cells: best, style: rowBest})
	d.table(tcols, rows)
	variantsFigure(d, f)
}

// variantsFigure draws each variant's best size of each material in plan,
// one row per variant, all at one scale.
func variantsFigure(d *doc, f *facts) {
	sheet := chart.VariantSections(f.variants, f.sys, true)
	printedPerMM, ok := planFigure(d, &sheet, variantsFigureSize, f.opt.ChartDPI, "variants", "The variants in plan", 14)
	if !ok {
		return
	}
	var names []string
	for _, col := range f.variants.Columns() {
		names = append(names, col.Name)
	}
	caption := "One row per variant, top to bottom: " + strings.Join(names, "; ") + ". Each row holds the best working size of each material, every row at one scale beside a " + sheet.ReferenceLabel + ". "
	if printedPerMM > 0 && !math.IsInf(printedPerMM, 0) {
		caption += fmt.Sprintf("On this page the scale is about 1:%.0f.", 1/printedPerMM)
	}
	d.font("I", sizeSmall)
	d.ink(inkMuted)
	d.pdf.SetX(d.left)
	d.pdf.MultiCell(d.width, lineH(sizeSmall), printable(strings.TrimSpace(caption)), "", "L", false)
}
