package ui

import (
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
	"fyne.io/fyne/v2/theme"
	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// rowsShown is how many whole result rows the table shows without scrolling.
func rowsShown(h *harness) int {
	var n int
	h.ui(func() {
		var row float32
		for o := range h.w.results.table.bound {
			row = max(row, o.Size().Height)
		}
		row += h.w.results.table.Theme().Size(theme.SizeNamePadding) // the gap the table leaves between rows
		n = int(h.w.results.table.Size().Height/row) - 1             // less the header row
	})
	return n
}

// On 1280×720 and 1366×768 screens the table shows at least 8 rows at the
// window's first-start size (issue: the table is what an architect came
// for), and the status column, which says in words whether a size works, is
// never dropped for width.
func TestTableShowsEightRowsOnALaptop(t *testing.T) {
	for _, screen := range []fyne.Size{{Width: 1280, Height: 720}, {Width: 1366, Height: 768}} {
		size := firstSize(screen)
		h := newHarnessAt(t, DemoScheme(), size)
		h.layOut()
		n := rowsShown(h)
		t.Logf("%v screen, window %v: %d rows", screen, size, n)
		assert.GreaterOrEqual(t, n, 8, "rows at %v", size)
		h.ui(func() { assert.Contains(t, h.w.results.ShownColumns(), "status", "status shown at %v", size) })
	}
}

// The mouse wheel over the table scrolls it.
func TestWheelScrollsTheTable(t *testing.T) {
	h := newHarnessAt(t, DemoScheme(), fyne.NewSize(1366, 768))
	h.ui(func() { h.w.results.showAllChk.SetChecked(true) })
	h.settle()
	h.layOut()
	h.ui(func() {
		c := h.w.win.Canvas()
		pos := fyne.CurrentApp().Driver().AbsolutePositionForObject(h.w.results.table.Table)
		sz := h.w.results.table.Size()
		require.Greater(t, len(h.w.results.rows), 20)
		lastRow := func() int {
			m := -1
			for _, id := range h.w.results.table.bound {
				m = max(m, id.Row)
			}
			return m
		}
		before := lastRow()
		test.Scroll(c, pos.Add(fyne.NewPos(sz.Width/2, sz.Height/2)), 0, -240)
		c.Content().Refresh()
		assert.Greater(t, lastRow(), before, "the wheel scrolled the table to later rows")
	})
}

// The figure views (Map, Variants, Building) take the centre's height while
// they show and give the table its rows back when the chart is chosen again;
// the Sections view, one row of plans, leaves the divider alone.
func TestMapViewTakesTheRoomItNeeds(t *testing.T) {
	h := newHarnessAt(t, DemoScheme(), fyne.NewSize(1366, 768))
	h.layOut()
	h.ui(func() {
		before := h.w.panes.centre.Offset
		for _, tab := range []string{"Map", "Variants", "Building"} {
			for _, it := range h.w.viewTabs.Items {
				if it.Text == tab {
					h.w.viewTabs.Select(it)
				}
			}
			assert.GreaterOrEqual(t, h.w.panes.centre.Offset, viewShare, tab)
		}
		h.w.viewTabs.SelectIndex(1) // Sections
		assert.Equal(t, before, h.w.panes.centre.Offset, "Sections")
		h.w.viewTabs.SelectIndex(2) // Map
		h.w.viewTabs.SelectIndex(0) // Chart
		assert.Equal(t, before, h.w.panes.centre.Offset, "Chart")
	})
}
