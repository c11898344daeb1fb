package report

import (
	"testing"

	"github.com/stretchr/testify/assert"
)

// The report's method section lists the composite assumptions beside steel,
// concrete and timber: the same K as steel (AISC 360-22 Commentary Table
// C-A-7.1), one strength for all combinations, the fill's weight, no
// torsional mode for the closed tube and the Lc/r 200 mark.
func TestReportListsCompositeAssumptions(t *testing.T) {
	text := pdfText(t, writePDF(t, newModel(t, "demo"), Options{}))
	for _, want := range []string{
		"Composite",
		"as steel; Lc = KL, I2.1b",
		"plain fill at 145 lb/ft³ (2,323 kg/m³",
		"twist-braced changes nothing",
		"Lc/r of the steel tube above 200 is marked",
	} {
		assert.Contains(t, text, want)
	}
}
