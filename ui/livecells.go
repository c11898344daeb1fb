package ui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/widget"
)

// liveTable wraps a widget.Table so that its visible cells can be updated
// in place. Table.Refresh lays the whole table out again and makes new
// template cells and headers each time (their renderers stay in Fyne's cache
// until it is cleaned), which is too much on every slider step; liveTable
// remembers which cell object shows which cell and refills them directly,
// calling Table.Refresh only when the shape of the table changes.
type liveTable struct {
	*widget.Table
	fill  func(id widget.TableCellID, o fyne.CanvasObject)
	bound map[fyne.CanvasObject]widget.TableCellID
	rows  int
	cols  int
	// fit, when set, sets the column widths for the contents before a redraw.
	fit func()
	// widths are the column widths fit last set.
	widths map[int]float32
}

// newLiveTable makes a table whose cells come from create and are filled by fill.
func newLiveTable(length func() (int, int), create func() fyne.CanvasObject, fill func(widget.TableCellID, fyne.CanvasObject)) *liveTable {
	lt := &liveTable{fill: fill, bound: map[fyne.CanvasObject]widget.TableCellID{}}
	lt.Table = widget.NewTable(length, create, func(id widget.TableCellID, o fyne.CanvasObject) {
		lt.bound[o] = id
		fill(id, o)
	})
	return lt
}

// update shows new contents: in place when the row and column counts are
// unchanged and full is false, else through Table.Refresh.
func (lt *liveTable) update(full bool) {
	if lt.fit != nil {
		lt.fit()
	}
	rows, cols := lt.Length()
	if full || rows != lt.rows || cols != lt.cols {
		lt.rows, lt.cols = rows, cols
		lt.Refresh()
		return
	}
	for o, id := range lt.bound {
		if id.Row >= 0 && id.Row < rows && id.Col >= 0 && id.Col < cols {
			lt.fill(id, o)
		}
	}
}
