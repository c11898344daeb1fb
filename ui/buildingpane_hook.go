package ui

import (
	"fyne.io/fyne/v2/container"

	"upright/ui/model"
)

// windowEditor lets a pane change the current window's scheme: each edit is
// one change of the window's state, as a widget's own.
type windowEditor struct{ w *Window }

// Edit applies change to the window's scheme; what describes it.
func (e windowEditor) Edit(what string, change func(sc *model.Scheme)) {
	e.w.change(change)
}

// withBuildingView adds the Building view as a tab beside the chart, the
// Sections and the Map views, and returns the pane the window feeds.
func (w *Window) withBuildingView() pane {
	if w.sectionsTabs == nil {
		return nil
	}
	p := newBuildingPane(windowEditor{w})
	w.sectionsTabs.Append(container.NewTabItem("Building", p.Object()))
	return p
}

// showBuilding is the Building view's screenshot: the scheme given the
// default building when it has none, the Building tab selected; the undo
// takes both back.
func showBuilding(w *Window) func() {
	had := w.st.Draft.Building != nil
	if !had {
		windowEditor{w}.Edit("add a building", addBuilding)
	}
	undoTab := showTab("Building")(w)
	return func() {
		undoTab()
		if !had {
			w.change(func(sc *model.Scheme) { sc.Building = nil })
		}
	}
}
