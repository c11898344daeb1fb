package ui

import (
	"fmt"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// newRangeButton makes the button that lets the user change the slider's range.
func (p *chartPane) newRangeButton() *widget.Button {
	b := widget.NewButtonWithIcon("", theme.SettingsIcon(), p.showRangeDialog)
	b.Importance = widget.LowImportance
	return b
}

// SetSliderRange sets the slider and chart range from two typed lengths (a
// bare number is in the unit shown); a bad range is refused with what is accepted.
func (p *chartPane) SetSliderRange(from, to string) error {
	spec := specByID("length")
	sys := p.st.Sys()
	f, err := spec.parse(from, sys)
	if err != nil {
		return fmt.Errorf("range start: %w", err)
	}
	t, err := spec.parse(to, sys)
	if err != nil {
		return fmt.Errorf("range end: %w", err)
	}
	var bad error
	p.ed.Step("length range", func(st *State) Outcome {
		out, err := st.SetRange(f, t)
		bad = err
		return out
	})
	if bad != nil {
		return bad
	}
	p.configureSlider()
	return nil
}

// showRangeDialog asks for the slider's range, in the unit shown.
func (p *chartPane) showRangeDialog() {
	spec := specByID("length")
	sys := p.st.Sys()
	from, to := widget.NewEntry(), widget.NewEntry()
	from.SetText(spec.format(p.st.Range.FromMM, sys))
	to.SetText(spec.format(p.st.Range.ToMM, sys))
	items := []*widget.FormItem{
		widget.NewFormItem("From", from),
		widget.NewFormItem("To", to),
	}
	d := dialog.NewForm("Length range of the slider and chart", "Set", "Cancel", items, func(ok bool) {
		if !ok {
			return
		}
		if err := p.SetSliderRange(from.Text, to.Text); err != nil {
			dialog.ShowError(err, p.win)
		}
	}, p.win)
	d.Resize(fyne.NewSize(420, 220))
	d.Show()
}
