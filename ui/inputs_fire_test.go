package ui

import (
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

// The rating selector sets the scheme's one rating; the table then shows
// the protected plan of steel (bare plan plus the board on each side), and
// the aggregate selector sets the concrete aggregate.
func TestFireSelectorProtectsThePlan(t *testing.T) {
	sc := DemoScheme()
	sc.Materials = []string{"steel"}
	h := newHarness(t, sc)
	var bare *model.Static
	h.ui(func() {
		require.NotNil(t, h.w.inputs.fire.rating)
		assert.Equal(t, "None", h.w.inputs.fire.rating.Selected)
		assert.Equal(t, "Siliceous", h.w.inputs.fire.aggregate.Selected)
		bare = h.w.results.rows[0].Static
	})
	barePlan := plan(bare.FootprintMM)
	assert.Equal(t, barePlan, h.cell(0, "plan"))

	h.ui(func() { h.w.inputs.fire.rating.SetSelected("2 hours") })
	h.settle()
	h.ui(func() { h.w.inputs.fire.aggregate.SetSelected("Carbonate") })
	h.settle()
	var st *model.Static
	h.ui(func() {
		assert.Equal(t, "2h", h.w.st.Draft.Fire.Rating)
		assert.Equal(t, "carbonate", h.w.st.Draft.Fire.Aggregate)
		st = h.w.results.rows[0].Static
	})
	require.NotNil(t, st.Fire)
	h.ui(func() { assert.Contains(t, h.w.results.tableFireNote.Text, "2 h fire rating") })
	assert.Equal(t, plan(st.Fire.FootprintMM), h.cell(0, "plan"))
	assert.Greater(t, st.Fire.FootprintMM[0], st.Fire.BareFootprintMM[0]+2*15.875-1e-6, "at least one 5/8 in layer each side")

	// Choosing the rating again from the draft (as opening a file does) shows it.
	h.ui(func() {
		h.w.st.Draft.Fire.Rating = "1.5h"
		h.w.syncInputs()
		assert.Equal(t, "1½ hours", h.w.inputs.fire.rating.Selected)
	})
}

// plan writes a plan size as the table's plan column does, in inches.
func plan(fp [2]float64) string {
	return units.Dim(fp[0], units.US) + " × " + units.Dim(fp[1], units.US)
}
