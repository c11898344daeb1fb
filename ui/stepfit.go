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
		v, _ := units.Convert(s.Value, s.Unit, sys)
		return stepValue(v)
	case 2:
		_, u := units.Convert(s.Value, s.Unit, sys)
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
