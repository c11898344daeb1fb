package ui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/theme"
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

// setWrappedText sets a label's text, wrapping it at words only when it is
// wider than the label: a one-line text is laid out without the word-by-word
// measuring wrapping costs, which matters for texts changed on every slider step.
func setWrappedText(l *widget.Label, text string) {
	if l.Text == text {
		return
	}
	wrap := fyne.TextWrapWord
	if wd := l.Size().Width; wd > 0 && fyne.MeasureText(text, theme.TextSize(), l.TextStyle).Width+2*theme.InnerPadding() <= wd {
		wrap = fyne.TextWrapOff
	}
	l.Wrapping = wrap
	l.SetText(text)
}
