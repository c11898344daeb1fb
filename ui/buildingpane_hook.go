package ui

import (
	"upright/ui/model"
)

// showBuilding is the Building view's screenshot: the scheme given the
// default building when it has none, the Building tab selected; the undo
// takes both back.
func showBuilding(w *Window) func() {
	had := w.st.Draft.Building != nil
	if !had {
		w.Edit("add a building", addBuilding)
	}
	undoTab := showTab("Building")(w)
	return func() {
		undoTab()
		if !had {
			w.Edit("remove the building", func(sc *model.Scheme) { sc.Building = nil })
		}
	}
}
