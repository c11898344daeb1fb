package report

import (
	"testing"

	"github.com/stretchr/testify/assert"
)

// TestMapFigureFollowsTheScheme: the demo scheme asks for the map (its
// report_map field), so its report carries the figure and caption; the
// transfer scheme does not, unless the options ask for it.
func TestMapFigureFollowsTheScheme(t *testing.T) {
	demo := newModel(t, "demo")
	assert.True(t, demo.Scheme.ReportMap)
	text := pdfText(t, writePDF(t, demo, Options{}))
	assert.Contains(t, text, "Where each family wins")
	assert.Contains(t, text, "tributary area per floor (ft²) from 210 to 1680")
	assert.Contains(t, text, "Near-ties are treated as in the crossover list", "the demo scheme's 5% tolerance")

	transfer := newModel(t, "transfer")
	assert.False(t, transfer.Scheme.ReportMap)
	text = pdfText(t, writePDF(t, transfer, Options{}))
	assert.NotContains(t, text, "Where each family wins")
	text = pdfText(t, writePDF(t, transfer, Options{Map: true}))
	assert.Contains(t, text, "Where each family wins")
	// The transfer column's typed 950 kip service load (ASD): a quarter to twice it.
	assert.Contains(t, text, "axial load, service (kip) from 237.5 to 1900")
}
