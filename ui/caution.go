package ui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// setWrappedText sets a label's text, wrapping it at words only when it is
// wider than the label: a one-line text is laid out without the word-by-word
// measuring wrapping costs, which matters for texts changed on every slider
// step. A one-line text is set to shorten rather than hold the pane's width;
// refitText decides again when the label's width changes.
func setWrappedText(l *widget.Label, text string) {
	if l.Text == text {
		return
	}
	wrapOrNot(l, text)
	l.SetText(text)
}

// refitText decides again whether a label's text must wrap, at its new width.
func refitText(l *widget.Label) {
	wrap, trunc := l.Wrapping, l.Truncation
	wrapOrNot(l, l.Text)
	if l.Wrapping != wrap || l.Truncation != trunc {
		l.Refresh()
	}
}

// wrapOrNot sets a label to one line when text fits its width, else to wrap.
func wrapOrNot(l *widget.Label, text string) {
	if wd := l.Size().Width; wd > 0 && fyne.MeasureText(text, theme.TextSize(), l.TextStyle).Width+2*theme.InnerPadding() <= wd {
		l.Wrapping, l.Truncation = fyne.TextWrapOff, fyne.TextTruncateEllipsis
		return
	}
	l.Wrapping, l.Truncation = fyne.TextWrapWord, fyne.TextTruncateOff
}
