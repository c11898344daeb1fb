package report

import (
	"bytes"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

// TestReportAndCSVCarryComposite checks the demo report states the
// composite method, its inputs and its best sizes, and the CSV lists the
// filled families like the other materials.
func TestReportAndCSVCarryComposite(t *testing.T) {
	m := newModel(t, "demo")
	if !m.Scheme.MaterialOn("composite") {
		t.Skip("composite is not registered in this build")
	}
	var buf bytes.Buffer
	require.NoError(t, WriteCSV(&buf, m, CSVOptions{}))
	csv := buf.String()
	for _, fam := range model.CompositeFamilies {
		assert.Contains(t, csv, "composite,"+fam+",", "the CSV lists %s", fam)
	}
	assert.Contains(t, csv, " filled, 5 ksi")

	text := pdfText(t, writePDF(t, m, Options{}))
	for _, s := range []string{
		"Composite: AISC 360-22, Chapter I, Section I2.2",
		"C2 = 0.85 (rectangular) or 0.95 (round)",
		"φc = 0.75 (LRFD), Ωc = 2.00 (ASD)",
		"Composite (filled HSS)",
		"fill f'c = " + units.Stress(5*units.MPaPerKsi, units.US),
	} {
		assert.Contains(t, text, s)
	}
	assert.Contains(t, text, "Composite · Filled HSS square", "a composite family's best size")
}
