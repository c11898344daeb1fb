package ui

import (
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
)

// The near-tie tolerance is a setting of the window: choosing it changes the
// scheme, and the table's note lists the families within it of the best.
func TestNearTieToleranceSetting(t *testing.T) {
	h := newHarness(t, DemoScheme())
	h.ui(func() {
		assert.Equal(t, "5%", h.w.inputs.tieSelect.Selected, "the demo uses the default")
		h.w.inputs.tieSelect.SetSelected("20%") // glulam 29.7 lb/ft, round tube 35.1 lb/ft at 18 ft: within 20%
	})
	h.settle()
	h.ui(func() {
		assert.Equal(t, 0.20, h.w.st.Valid.Tie)
		note := h.w.results.tableNote.Text
		assert.True(t, strings.Contains(note, "within 20%: "), note)
		h.w.inputs.tieSelect.SetSelected("none")
	})
	h.settle()
	h.ui(func() {
		assert.Equal(t, 0.0, h.w.st.Valid.Tie)
		assert.NotContains(t, h.w.results.tableNote.Text, "within")
	})
	// A scheme with another tolerance shows it.
	sc := DemoScheme()
	sc.Tie = 0.07
	h.ui(func() { h.w.LoadScheme(sc) })
	h.settle()
	h.ui(func() { assert.Equal(t, "7%", h.w.inputs.tieSelect.Selected) })
}
