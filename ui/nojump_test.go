package ui

import (
	"strings"
	"testing"

	"fyne.io/fyne/v2"
	"github.com/stretchr/testify/assert"

	"upright/ui/model"
)

// The window never changes its own size: whatever it shows (a problem
// under a field, the banner, each view tab, the inputs folded, a long
// scheme name, SI units), its content asks for no more than the first-start
// window of a 1280×720 screen, so the window has no reason to grow.
func TestTheWindowNeverGrowsItself(t *testing.T) {
	size := firstSize(laptop)
	h := newHarnessAt(t, DemoScheme(), size)
	h.layOut()
	check := func(state string) {
		t.Helper()
		h.layOut()
		h.ui(func() {
			c := h.w.win.Canvas()
			m := h.w.win.Content().MinSize()
			assert.LessOrEqual(t, m.Width, size.Width, "%s: content width %v", state, m)
			assert.LessOrEqual(t, m.Height, size.Height, "%s: content height %v", state, m)
			assert.Equal(t, size, c.Size(), "%s: the window kept its size", state)
		})
	}
	check("first start")
	var chart, table fyne.Size
	h.ui(func() { chart, table = h.w.chart.raster.Size(), h.w.results.table.Table.Size() })

	h.typeInto("length", "-3 m")
	check("a problem under the length field and the banner")
	h.ui(func() {
		assert.Equal(t, chart, h.w.chart.raster.Size(), "a refused length does not move the chart")
		assert.Equal(t, table, h.w.results.table.Table.Size(), "nor the table")
	})
	h.ui(func() { assert.NotEmpty(t, h.w.status.BannerText()) })
	h.typeInto("load", "lots")
	check("two problems")
	h.typeInto("length", "18 ft")
	h.typeInto("load", "400 kip")
	check("problems fixed")

	for _, tab := range []string{"Sections", "Map", "Variants", "Building", "Chart"} {
		h.ui(func() {
			for _, it := range h.w.viewTabs.Items {
				if it.Text == tab {
					h.w.viewTabs.Select(it)
				}
			}
		})
		check("the " + tab + " tab")
	}

	h.ui(func() { h.w.FoldInputs(true) })
	check("inputs folded")
	h.ui(func() { h.w.FoldInputs(false) })
	check("inputs open")

	h.ui(func() {
		h.w.Edit("", func(sc *model.Scheme) {
			sc.Name = strings.Repeat("A long project name for the riverside library extension ", 3)
			sc.Units = model.SI
		})
	})
	check("a long name in SI")
	h.ui(func() { h.w.notify(strings.Repeat("a long status message that wraps at words ", 6)) })
	check("a long status message")
}
