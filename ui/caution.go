package ui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/widget"

	"upright/ui/model"
)

// buildCaution makes the status bar's caution: the whole short caution,
// wrapped onto as many lines as the width needs, so "licensed structural
// engineer" and "local code" are always on screen.
func (w *Window) buildCaution() fyne.CanvasObject {
	w.caution = widget.NewLabel("⚠ " + model.Caution + "  (Help ▸ Cautions)")
	w.caution.Importance = widget.WarningImportance
	w.caution.Wrapping = fyne.TextWrapWord
	return w.caution
}
