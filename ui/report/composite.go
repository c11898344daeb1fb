package report

import (
	"strings"

	"upright/ui/model"
	"upright/ui/units"
)

// compositeFill returns the fill f'c the composite families used, MPa, and
// whether any composite family is in the result.
func compositeFill(f *facts) (float64, bool) {
	for fi := range f.res.Families {
		if f.m.Families[f.res.Families[fi].Family].Material() != "composite" {
			continue
		}
		if v, _, ok := calcOf(f, fi, "fc_MPa"); ok {
			return v, true
		}
	}
	return 0, false
}

// compositeWords describes the composite options for the inputs table.
func compositeWords(f *facts) string {
	sc := f.m.Scheme
	fams := "all filled tube families"
	if len(sc.Composite.Families) > 0 {
		fams = strings.Join(sc.Composite.Families, ", ")
	}
	src := "following the concrete f'c"
	if sc.Composite.FillFcMPa > 0 {
		src = "typed for the fill"
	}
	if v, ok := compositeFill(f); ok {
		return fams + "; fill f'c = " + f.both(units.Stress, v) + ", " + src
	}
	return fams + "; fill " + src
}

// compositeAssumption is the method item of the composite material.
func compositeAssumption(f *facts) string {
	sc := f.m.Scheme
	wall := "wall grade each HSS family's default (ASTM A500 Gr. C: 50 ksi box, 46 ksi round)"
	if sc.Steel.FyMPa > 0 {
		wall = "wall Fy = " + f.both(units.Stress, sc.Steel.FyMPa)
	}
	fill := "the concrete f'c"
	if v, ok := compositeFill(f); ok {
		fill = "f'c = " + f.both(units.Stress, v)
		if sc.Composite.FillFcMPa == 0 {
			fill += ", the concrete f'c"
		}
	}
	return "Composite: AISC 360-22, Chapter I, Section I2.2 (filled composite members): square, rectangular and round HSS filled with plain normal-weight concrete, no bars; " +
		"walls classified by Table I1.1a (tubes beyond its largest ratio are left out); Pno by Eq. I2-9 to I2-11 with C2 = 0.85 (rectangular) or 0.95 (round); " +
		"EIeff = Es Is + C3 Ec Ic with C3 = 0.45 + 3 As/Ag ≤ 0.9 and Ec = wc^1.5 √f'c (I2.1b, wc = 145 pcf); Pn by Eq. I2-2 or I2-3 about both axes; φc = 0.75 (LRFD), Ωc = 2.00 (ASD); " +
		wall + ", used up to 80 ksi (I1.3); fill " + fill + ". Weight and carbon count the tube and the fill. Load transfer between tube and fill (I6) is for the engineer. " +
		"Coefficients recalled from the specification are marked (from memory) in each trace."
}

// compositeOn reports whether the composite material is switched on in the scheme.
func compositeOn(sc model.Scheme) bool { return sc.MaterialOn("composite") }
