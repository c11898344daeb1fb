package report

import (
	"testing"

	"github.com/stretchr/testify/assert"

	"upright/ui/units"
)

// The report's chart caption and crossover section read the default length
// range in round numbers of the scheme's unit: 2 ft to 40 ft for the demo
// (18 ft, US), 0.5 m to 12 m for the hut (3.6 m, SI), by the rule of
// model.DefaultRange (1 ft = 304.8 mm exactly).
func TestReportDefaultRangeIsRoundInTheShownUnit(t *testing.T) {
	cases := []struct {
		scheme   string
		sys      units.System
		from, to float64 // mm
	}{
		{"demo", units.US, 2 * units.MMPerFoot, 40 * units.MMPerFoot},
		{"hut", units.SI, 500, 12000},
	}
	for _, c := range cases {
		m := newModel(t, c.scheme)
		text := pdfText(t, writePDF(t, m, Options{}))
		from, to := units.Length(c.from, c.sys), units.Length(c.to, c.sys)
		assert.Contains(t, text, "Lengths between "+from+" and "+to, c.scheme)
		assert.Contains(t, text, "from "+from+" to "+to, c.scheme)
	}
}
