package chart

import (
	"strings"

	"upright/plots"
	"upright/ui/model"
	"upright/ui/units"
)

// BestPerMaterial returns, for one column of a comparison, the best working
// row of each material (the lowest ranking metric among its families), in
// the order the materials first appear.
func BestPerMaterial(col *model.VariantResult) []*model.Row {
	if col.Result == nil {
		return nil
	}
	var order []string
	best := map[string]*model.Row{}
	for fi := range col.Result.Families {
		r := col.Result.Families[fi].Best()
		if r == nil {
			continue
		}
		mat := col.Model.Families[r.Family].Material()
		if b, ok := best[mat]; !ok || r.Score < b.Score {
			if !ok {
				order = append(order, mat)
			}
			best[mat] = r
		}
	}
	out := make([]*model.Row, len(order))
	for i, m := range order {
		out[i] = best[m]
	}
	return out
}

// VariantSections builds the plan-sections figure of a comparison: one row
// per column (the base, then each variant), each holding the best working
// size of each material, every row at one common scale beside one
// reference square. Each section is labelled with its size and the
// column's name.
func VariantSections(c *model.Comparison, sys units.System, caution bool) plots.PlanSheet {
	sh := plots.PlanSheet{}
	if sys == units.SI {
		sh.ReferenceMM, sh.ReferenceLabel = refSIMM, "300 mm square"
		sh.ScaleBarMM, sh.ScaleBarDivisions, sh.ScaleBarLabel = refSIMM, 3, "300 mm (100 mm steps)"
	} else {
		sh.ReferenceMM, sh.ReferenceLabel = refFootMM, "1 ft square"
		sh.ScaleBarMM, sh.ScaleBarDivisions, sh.ScaleBarLabel = refFootMM, 4, "1 ft (3 in steps)"
	}
	if caution {
		sh.Caution = model.Caution
	}
	var skipped []string
	first := true
	for _, col := range c.Columns() {
		n := 0
		for _, r := range BestPerMaterial(col) {
			f := col.Model.Families[r.Family]
			o, ok := model.OutlineOf(f, r.Index, col.Result.Setting)
			if !ok {
				continue
			}
			title, _ := splitDesignation(r.Static.Designation)
			sec := plots.PlanSection{Group: f.Material(), Title: title, WidthMM: o.WidthMM, DepthMM: o.DepthMM, ProtectionMM: o.ProtectionMM}
			full := PlanSection(o, f.Material(), r.Static, sys)
			sec.Parts = full.Parts
			sec.Lines = []string{units.PlanSize(r.Static.FootprintMM, sys)}
			sh.Sections = append(sh.Sections, sec)
			n++
		}
		if n > 0 {
			sh.RowLabels = append(sh.RowLabels, col.Name)
		}
		switch {
		case n == 0:
			skipped = append(skipped, col.Name)
		case first && sh.ReferenceMM > 0:
			sh.Rows = append(sh.Rows, n+1)
		default:
			sh.Rows = append(sh.Rows, n)
		}
		if n > 0 {
			first = false
		}
	}
	sh.Note = "One row per variant, named at its left (the base first): the best working size of each material, every row at one scale."
	if len(skipped) > 0 {
		sh.Note += " Nothing works or could be drawn in: " + strings.Join(skipped, ", ") + "."
	}
	if len(sh.Sections) == 0 {
		sh.Empty = "No variant has a working size."
	}
	return sh
}
