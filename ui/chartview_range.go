package ui

import (
	"fmt"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// newRangeButton makes the button that lets the user change the slider's range.
func (w *Window) newRangeButton() *widget.Button {
	b := widget.NewButtonWithIcon("", theme.SettingsIcon(), w.showRangeDialog)
	b.Importance = widget.LowImportance
	return b
}

// SetSliderRange sets the slider and chart range from two typed lengths (a
// bare number is in the unit shown); a bad range is refused with what is accepted.
func (w *Window) SetSliderRange(from, to string) error {
	spec := specByID("length")
	sys := w.sys()
	f, err := spec.parse(from, sys)
	if err != nil {
		return fmt.Errorf("range start: %w", err)
	}
	t, err := spec.parse(to, sys)
	if err != nil {
		return fmt.Errorf("range end: %w", err)
	}
	out, err := w.st.SetRange(f, t)
	if err != nil {
		return err
	}
	w.configureSlider()
	w.after(out)
	return nil
}

// showRangeDialog asks for the slider's range, in the unit shown.
func (w *Window) showRangeDialog() {
	spec := specByID("length")
	sys := w.sys()
	from, to := widget.NewEntry(), widget.NewEntry()
	from.SetText(spec.format(w.st.Range.FromMM, sys))
	to.SetText(spec.format(w.st.Range.ToMM, sys))
	items := []*widget.FormItem{
		widget.NewFormItem("From", from),
		widget.NewFormItem("To", to),
	}
	d := dialog.NewForm("Length range of the slider and chart", "Set", "Cancel", items, func(ok bool) {
		if !ok {
			return
		}
		if err := w.SetSliderRange(from.Text, to.Text); err != nil {
			dialog.ShowError(err, w.win)
		}
	}, w.win)
	d.Resize(fyne.NewSize(420, 220))
	d.Show()
}
