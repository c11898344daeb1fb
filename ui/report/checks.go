package report

import (
	"fmt"
	"sort"
	"strings"

	"upright/ui/model"
	"upright/ui/units"
)

// checksSection lists, for the best size of each family, every load
// combination it was checked against with the factors that combination
// gives it, so that the treatment of each material can be compared.
func checksSection(d *doc, f *facts) {
	if len(f.res.Families) == 0 {
		return
	}
	_, fu := units.ForceValue(0, f.sys)
	d.heading("Load combinations checked", 30)
	d.para("Each size is checked against every gravity combination with that combination's own factors: timber with its time effect factor λ (LRFD, NDS 2018 Table N3) or load duration factor CD (ASD, Table 2.3.2), concrete with its βdns (ACI 318-19 6.6.4.4.4, always against the factored combinations); steel's strength does not depend on the combination. The highest utilization governs. Shown for the best (or closest) size of each family.", "", sizeBody)
	d.pdf.Ln(1.5)
	cols := []column{{"Combination", 2.6, "L"}, {"Factors", 1.3, "L"}, {"Demand (" + fu + ")", 1.0, "R"}, {"Capacity (" + fu + ")", 1.0, "R"}, {"Util.", 0.6, "R"}}
	var rows []row
	for fi := range f.res.Families {
		fr := &f.res.Families[fi]
		if len(fr.Rows) == 0 {
			continue
		}
		r := &fr.Rows[0]
		rows = append(rows, row{style: rowGroup, cells: []string{familyLabel(f.m.Families[fr.Family]) + ": " + r.Static.Designation}})
		for _, c := range f.m.Checks(r.Family, r.Index, f.m.Scheme.Setting) {
			style := rowPlain
			name := c.Combination
			if c.Governing {
				style = rowBest
				name += " (governs)"
			}
			util := "—"
			if c.CapacityN > 0 {
				util = fmt.Sprintf("%.2f", c.Util)
			}
			rows = append(rows, row{style: style, cells: []string{name, factorsText(c.Factors), capacityText(c.DemandN, f.sys), capacityText(c.CapacityN, f.sys), util}})
		}
	}
	d.table(cols, rows)
}

// factorsText writes a check's factors, e.g. "λ 0.80" or "βdns 0.60"; "—" for none.
func factorsText(fs map[string]float64) string {
	if len(fs) == 0 {
		return "—"
	}
	keys := make([]string, 0, len(fs))
	for k := range fs {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	var parts []string
	for _, k := range keys {
		name := k
		switch k {
		case "lambda":
			name = "λ"
		case "beta_dns":
			name = "βdns"
		}
		parts = append(parts, fmt.Sprintf("%s %.2f", name, fs[k]))
	}
	return strings.Join(parts, ", ")
}

// assumptionsTable draws the per-material assumptions side by side: K for
// each end condition, load combinations and duration, self-weight, bracing
// and the slenderness limit.
func assumptionsTable(d *doc) {
	d.subheading("Assumptions, material by material")
	cols := []column{{"Topic", 1.2, "L"}, {"Assumption", 5.0, "L"}}
	var rows []row
	for _, a := range model.Assumptions() {
		rows = append(rows, row{style: rowGroup, cells: []string{strings.ToUpper(a.Material[:1]) + a.Material[1:]}})
		for i, t := range model.AssumptionTopics {
			rows = append(rows, row{cells: []string{t, a.Entries[i]}})
		}
	}
	d.table(cols, rows)
	d.para(model.TypedLoadAssumption, "", sizeBody-0.5)
}
