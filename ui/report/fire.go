package report

import (
	"fmt"
	"strconv"
	"strings"

	"upright/ui/model"
	"upright/ui/units"
)

// fireRatingWords says the scheme's fire rating in words.
func fireRatingWords(sc model.Scheme) string {
	o := sc.Fire
	h := o.Hours()
	if h == 0 {
		return "none"
	}
	return fmt.Sprintf("%s h for every material; concrete with %s aggregate; timber exposed on %d sides",
		strconv.FormatFloat(h, 'f', -1, 64), o.Aggregate, sc.Timber.FireSides)
}

// fireSection explains how each material meets the scheme's fire rating,
// with the methods, their limits, and each family's best protected size.
func fireSection(d *doc, f *facts) {
	sc := f.m.Scheme
	if !sc.Fire.On() || len(f.m.Families) == 0 {
		return
	}
	hours := strconv.FormatFloat(sc.Fire.Hours(), 'f', -1, 64)
	d.heading("Fire resistance", 40)
	d.para(fmt.Sprintf("The scheme asks for a %s h fire-resistance rating. Every material answers to it: a size that cannot reach the rating does not work, whatever its strength, and the plan, weight and carbon in this report include the protection. The chart shows the strength at ordinary temperature and leaves out the sizes that cannot reach the rating.", hours), "", sizeBody)
	d.pdf.Ln(1)
	steelItem := "Steel (W, HP, HSS, pipe): boxed in 5/8 in Type X gypsum board, the fewest layers (one to four) whose calculated resistance R = 130·[h·(W′/D)/2]^0.75 minutes, with W′ = W + 50·h·D/144, reaches the rating (IBC 2021 722.5.1.2, equations from memory). D is the inside perimeter of the box: 2(d + bf) round W and HP shapes, 2(B + H) for rectangular HSS, 4·OD for round HSS and pipe (boxed in a square). Above W/D = 3.65 a column takes the board of a W14X233 (722.5.1.2.2, from memory). The plan grows by the board thickness on every side; the board's weight (50 lb/ft³) is dead load on the column and its embodied carbon is counted. Limits: the equation applies to board fastened as a tested assembly requires; more than four layers are not offered."
	if sc.Fire.SteelProtection == "spray" {
		steelItem = "Steel (W, HP, HSS, pipe): sprayed fire-resistive material, h = R/[C1·(W/D) + C2] with C1 = 1.05 and C2 = 0.61 of a typical listed product (IBC 2021 722.5.1.3, equation and constants from memory; the product's listing governs), at least 3/8 in, rounded up to 1/16 in; D follows the contour (4bf + 2d for W and HP, 2(B + H) for rectangular HSS, π·OD round). The plan grows by the thickness on every side; the material's weight (15 lb/ft³) is dead load and its carbon is counted. Limits: W/D at least 0.37 and ratings of at least 1 h."
	}
	items := []string{
		steelItem,
		"Filled HSS: each tube is offered exposed, where the calculated resistance of an unprotected concrete-filled tube R = a(f′c + 20)/(KL − 1000)·D²·(D/C)^0.5 minutes (f′c MPa, KL and D mm, C the service load in kN; a = 0.07 round, 0.06 square, siliceous; IBC 2021 722.5.1.5, from memory) reaches the rating at the length and load, and protected as steel of the shell's weight for where it falls short. Limits: up to 2 h, f′c 20 to 40 MPa, KL up to 4 m, D 140 to 410 mm round and 140 to 305 mm square.",
		"Concrete: least dimension from ACI/TMS 216.1-14 Table 4.5.1a for " + sc.Fire.Aggregate + " aggregate, and clear cover to the longitudinal bars of 1 in per hour of rating, never more than 2 in (4.5.3; table and rule from memory). The bars are placed with that cover, so the strength is computed with them moved inward. Limits: the reduced size for rectangular columns with two long parallel sides is not taken.",
		"Timber: the rating sets the exposure of the NDS 2018 Chapter 16 char calculation; the residual section must carry the service load. Limits: the calculated method covers up to 2 h (NDS 2018 16.1, from memory), so at 3 h no timber size is accepted.",
		"These are calculated methods for preliminary comparison. Listed (tested) assemblies and the local building code govern the fire design, and the construction type sets the rating each element needs.",
	}
	d.bullets(items, sizeBody-0.5)
	d.pdf.Ln(1)
	cols := []column{
		{"Family", 1.25, "L"}, {"Best working size", 1.8, "L"}, {"Protection for " + hours + " h", 3.2, "L"},
		{"Rating", 0.9, "R"}, {"Bare plan", 1.3, "L"}, {"Protected plan", 1.3, "L"},
	}
	var rows []row
	for fi := range f.res.Families {
		fr := &f.res.Families[fi]
		fam := f.m.Families[fr.Family]
		r := fr.Best()
		if r == nil || r.Static.Fire == nil {
			rows = append(rows, row{cells: []string{familyLabel(fam), "none works", fireFamilyReason(fr), "", "", ""}})
			continue
		}
		fc := r.Static.Fire
		rows = append(rows, row{cells: []string{
			familyLabel(fam), r.Static.Designation, protectionText(fc, f.sys), fmt.Sprintf("%.2g h", fc.ProvidedH),
			units.PlanSize(fc.BareFootprintMM, f.sys), units.PlanSize(fc.FootprintMM, f.sys),
		}})
	}
	d.table(cols, rows)
}

// fireFamilyReason is the fire reason of a family's closest size when none
// works and that size fails the rating, else a plain note.
func fireFamilyReason(fr *model.FamilyResult) string {
	if len(fr.Rows) > 0 {
		if fc := fr.Rows[0].Static.Fire; fc != nil && !fc.OK {
			return fc.Reason
		}
	}
	return "no size carries the demand with the rating"
}

// fireCSVCells are a candidate's fire columns of the CSV table: rating,
// protection, resistance provided and the bare plan (the plan columns
// before them hold the protected plan). dim converts mm to the table's unit.
func fireCSVCells(st *model.Static, dim func(float64) float64) []string {
	fc := st.Fire
	if fc == nil {
		return []string{"0", "none", "", num(dim(st.FootprintMM[0]), 2), num(dim(st.FootprintMM[1]), 2)}
	}
	system := fc.System
	if !fc.OK {
		system += "; does not reach the rating: " + fc.Reason
	}
	return []string{num(fc.RatingH, 1), system, num(fc.ProvidedH, 2), num(dim(fc.BareFootprintMM[0]), 2), num(dim(fc.BareFootprintMM[1]), 2)}
}

// protectionText says a size's protection with its dimensions in the
// report's units.
func protectionText(fc *model.FireCheck, sys units.System) string {
	switch {
	case fc.Layers > 0:
		return fmt.Sprintf("%s, h = %s", fc.System, dimText(fc.ThicknessMM, sys))
	case fc.MinDimensionMM > 0:
		agg, _, _ := strings.Cut(fc.System, " ")
		return fmt.Sprintf("%s aggregate: least side at least %s; cover to the bars %s (at least %s)", agg,
			dimText(fc.MinDimensionMM, sys), dimText(fc.CoverMM, sys), dimText(fc.CoverRequiredMM, sys))
	}
	return fc.System
}

// dimText writes a small dimension with its unit, in or mm.
func dimText(mm float64, sys units.System) string {
	if sys == units.SI {
		return units.Dim(mm, sys) + " mm"
	}
	return units.Dim(mm, sys) + " in"
}
