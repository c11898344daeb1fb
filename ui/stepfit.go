package ui

import (
	"upright/ui/model"
	"upright/ui/units"
)

// stepText is the text of one cell of a trace table, in the display units.
func stepText(s model.Step, col int, sys units.System) string {
	switch col {
	case 0:
		return s.Quantity
	case 1:
		v, _ := stepUnit(s, sys)
		return stepValue(v)
	case 2:
		_, u := stepUnit(s, sys)
		return u
	case 3:
		return s.Clause
	case 4:
		return s.Formula
	}
	return ""
}

// fitStepColumns widens each column of a trace table to its widest text
// (never below its starting width), so clauses and formulas are never cut;
// the table scrolls sideways instead.
func fitStepColumns(t *liveTable, least []float32, titles []string, rows []model.Step, sys units.System) {
	for c := range least {
		wd := max(least[c], headerWidth(titles[c]))
		for _, s := range rows {
			wd = max(wd, cellWidth(stepText(s, c, sys)))
		}
		if t.widths == nil {
			t.widths = map[int]float32{}
		}
		if t.widths[c] != wd {
			t.widths[c] = wd
			t.SetColumnWidth(c, wd)
		}
	}
}

// stepUnit converts a trace value to the shown system; an SI force is
// shown in kN, as a designer reads one (1,012.5 kN rather than 1,012,500 N).
func stepUnit(s model.Step, sys units.System) (float64, string) {
	v, u := units.Convert(s.Value, s.Unit, sys)
	if u == "N" {
		return v / 1000, "kN"
	}
	return v, u
}
