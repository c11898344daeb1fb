package report

import (
	"fmt"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

func TestBuildingPage(t *testing.T) {
	m := newModel(t, "demo-building")
	require.NotNil(t, m.Scheme.Building)
	text := pdfText(t, writePDF(t, m, Options{}))
	assert.Contains(t, text, "The building: every column taken down and sized")
	assert.Contains(t, text, "Totals per family")
	assert.Contains(t, text, "Schedule: each family's size by storey")
	assert.Contains(t, text, "Floor plan")
	assert.Contains(t, text, "Column stacks")
	s, err := model.NewSchedule(m.Scheme)
	require.NoError(t, err)
	// Every position's tributary area and every complete family's total carbon are in the page.
	for _, ps := range s.Positions {
		assert.Contains(t, text, fmt.Sprintf("%s %d %s", ps.Position, ps.Count, units.Area(ps.TributaryM2, units.US)))
	}
	for _, tot := range s.Totals {
		if tot.Complete {
			assert.Contains(t, text, fmt.Sprintf("%s %s", tot.Name, totalLength(tot.LengthM, units.US)))
		}
	}
}

func TestNoBuildingNoPage(t *testing.T) {
	m := newModel(t, "demo")
	require.Nil(t, m.Scheme.Building)
	text := pdfText(t, writePDF(t, m, Options{}))
	assert.NotContains(t, text, "every column taken down")
}
