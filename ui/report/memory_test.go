package report

import (
	"testing"

	"github.com/stretchr/testify/assert"

	"upright/ui/model"
)

// Values recalled from memory are marked so wherever the report shows them:
// K tables, load factors, carbon factors; the caution says both sources.
func TestReportMarksRecalledValues(t *testing.T) {
	m := newModel(t, "demo")
	// At 18 ft the best glulam weighs 29.7 lb/ft and the best round tube
	// 35.1 lb/ft: within a 20% tolerance, so the report names a near-tie.
	m.Scheme.Tie = 0.2
	text := pdfText(t, writePDF(t, m, Options{}))
	for _, want := range []string{
		"Commentary Table C-A-7.1, from memory",                   // steel K
		"Table G1 (from memory)",                                  // timber Ke
		"as AISC 360-22 C-A-7.1, from memory",                     // concrete K
		"combination 3 (factors from memory)",                     // load factors
		"hot-rolled steel sections 1.22 kg CO2e/kg (from memory)", // the carbon line
		"published tables, and some were recalled from memory",
		"near-tie tolerance 20%",                             // the tolerance the crossovers were found with
		"Near-ties, within 20%: HSS round (HSS13.375X0.250)", // beside the best overall
	} {
		assert.Contains(t, text, want)
	}
	assert.Contains(t, model.CautionFull, `"(from memory)"`)
}
