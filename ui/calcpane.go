package ui

import (
	"fmt"
	"math"
	"slices"
	"strconv"
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"upright/ui/model"
	"upright/ui/units"
)

// calcPane is the calculation view: the selected candidate's verdict, the
// plain explanation, its warnings, the pin buttons and the trace, with the
// load takedown's trace on a tab of its own.
type calcPane struct {
	snap     *Snapshot // the snapshot shown
	selected string    // the candidate whose calculation is shown
	pinned   []string  // the candidates pinned to the chart
	schemeOf uint64    // the scheme generation whose takedown is shown
	// onPin pins the selected candidate or unpins it; onClearPins unpins all.
	onPin, onClearPins func()

	title     *widget.Label
	plain     *widget.Label
	warn      *widget.Label
	pinButton *widget.Button
	clearPins *widget.Button
	steps     *liveTable
	stepRows  []model.Step
	loadSteps *liveTable
	loadRows  []model.Step
	tabs      *container.AppTabs
}

// newCalcPane builds the calculation view; onPin toggles the selected
// candidate's pin and onClearPins removes every pin.
func newCalcPane(onPin, onClearPins func()) *calcPane {
	p := &calcPane{onPin: onPin, onClearPins: onClearPins}
	p.title = widget.NewLabelWithStyle("Choose a row to see its calculation.", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	p.title.Wrapping = fyne.TextWrapWord
	p.plain = widget.NewLabel("")
	p.plain.Wrapping = fyne.TextWrapWord
	p.warn = widget.NewLabel("")
	p.warn.Wrapping = fyne.TextWrapWord
	p.warn.Importance = widget.WarningImportance
	p.warn.Hide()
	p.pinButton = widget.NewButtonWithIcon("Pin to chart", theme.ContentAddIcon(), func() { p.onPin() })
	p.clearPins = widget.NewButton("Clear pins", func() { p.onClearPins() })
	p.updatePinButtons()
	shown := func() units.System {
		if p.snap == nil || p.snap.Model == nil {
			return units.US
		}
		return unitsOf(p.snap.Model)
	}
	p.steps = stepTable(&p.stepRows, shown)
	p.loadSteps = stepTable(&p.loadRows, shown)
	top := container.NewVBox(p.title, p.plain, p.warn, container.NewHBox(p.pinButton, p.clearPins))
	trace := container.NewBorder(top, nil, nil, nil, p.steps)
	p.tabs = container.NewAppTabs(
		container.NewTabItem("Calculation", trace),
		container.NewTabItem("Load takedown", p.loadSteps),
	)
	return p
}

// Object returns the Calculation and Load takedown tabs.
func (p *calcPane) Object() fyne.CanvasObject { return p.tabs }

// Show shows the selected candidate's trace in a snapshot and, for a new
// scheme, its load takedown.
func (p *calcPane) Show(s *Snapshot) {
	p.snap = s
	p.updateCalc()
	if s.SchemeGen != p.schemeOf {
		p.schemeOf = s.SchemeGen
		p.updateLoadSteps()
	}
}

// setPicks shows which candidate is selected and which are pinned; a newly
// selected one reads "working…" until its snapshot arrives.
func (p *calcPane) setPicks(selected string, pinned []string) {
	if selected != p.selected && selected != "" {
		p.title.SetText(selected + ": working…")
	}
	p.selected, p.pinned = selected, append(p.pinned[:0], pinned...)
	p.updatePinButtons()
}

// updatePinButtons names what the pin buttons would do.
func (p *calcPane) updatePinButtons() {
	if p.selected == "" {
		p.pinButton.Disable()
	} else {
		p.pinButton.Enable()
	}
	if slices.Contains(p.pinned, p.selected) {
		p.pinButton.SetText("Unpin from chart")
	} else {
		p.pinButton.SetText("Pin to chart")
	}
	if len(p.pinned) == 0 {
		p.clearPins.Disable()
		p.clearPins.SetText("Clear pins")
	} else {
		p.clearPins.Enable()
		p.clearPins.SetText(fmt.Sprintf("Clear %d pinned", len(p.pinned)))
	}
}

// stepTable makes a table of trace steps, converted to the display units.
func stepTable(rows *[]model.Step, sys func() units.System) *liveTable {
	widths := []float32{80, 85, 60, 150, 260}
	titles := []string{"Quantity", "Value", "Unit", "Clause", "Formula"}
	t := newLiveTable(
		func() (int, int) { return len(*rows), len(widths) },
		func() fyne.CanvasObject {
			l := widget.NewLabel("")
			l.Truncation = fyne.TextTruncateClip
			return l
		},
		func(id widget.TableCellID, o fyne.CanvasObject) {
			l := o.(*widget.Label)
			if id.Row < 0 || id.Row >= len(*rows) {
				l.SetText("")
				return
			}
			l.Alignment = fyne.TextAlignLeading
			if id.Col == 1 {
				l.Alignment = fyne.TextAlignTrailing
			}
			l.SetText(stepText((*rows)[id.Row], id.Col, sys()))
		})
	t.ShowHeaderRow = true
	t.CreateHeader = func() fyne.CanvasObject {
		return widget.NewLabelWithStyle("", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	}
	t.UpdateHeader = func(id widget.TableCellID, o fyne.CanvasObject) {
		if id.Col >= 0 && id.Col < len(titles) {
			o.(*widget.Label).SetText(titles[id.Col])
		}
	}
	for i, wd := range widths {
		t.SetColumnWidth(i, wd)
	}
	t.fit = func() { fitStepColumns(t, widths, titles, *rows, sys()) }
	return t
}

// stepValue formats a trace value with four significant figures.
func stepValue(v float64) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return "—"
	}
	a := math.Abs(v)
	switch {
	case a == 0:
		return "0"
	case a >= 10000:
		return num(v, 0)
	case a >= 1:
		return strconv.FormatFloat(v, 'f', max(0, 3-int(math.Floor(math.Log10(a)))), 64)
	}
	return strconv.FormatFloat(v, 'g', 4, 64)
}

// updateCalc shows the trace of the selected candidate at the length on screen.
func (p *calcPane) updateCalc() {
	p.updatePinButtons()
	s := p.snap
	if p.selected == "" || s == nil || s.Model == nil {
		return
	}
	if s.Detail == nil || s.DetailOf != p.selected {
		p.title.SetText(p.selected + ": not among the candidates of this scheme.")
		p.plain.SetText("")
		p.warn.Hide()
		p.stepRows = p.stepRows[:0]
		p.steps.update(false)
		return
	}
	m := s.Model
	sys := unitsOf(m)
	d := s.Detail
	fi, i, _ := m.Find(p.selected)
	row := m.Row(fi, i, s.Result.Setting)
	f := m.Families[fi]
	verdict := status(&row)
	title := fmt.Sprintf("%s · %s %s at %s: %s", p.selected, materialTitle(f.Material()), f.Name(), units.Length(s.Result.Setting.LengthMM, sys), verdict)
	if row.Permitted {
		title += fmt.Sprintf(", capacity %s for a demand of %s (utilization %.2f)", fmtForce(row.CapacityN, sys), fmtForce(row.DemandN, sys), row.Util)
	}
	p.title.SetText(title)
	p.plain.SetText(d.Plain)
	var warn []string
	for _, x := range d.Warnings {
		warn = append(warn, "⚠ "+x)
	}
	if !row.Permitted && row.Reason != "" {
		warn = append(warn, "⚠ "+row.Reason)
	}
	if len(warn) > 0 {
		p.warn.SetText(strings.Join(warn, "\n"))
		p.warn.Show()
	} else {
		p.warn.Hide()
	}
	p.stepRows = append(p.stepRows[:0], checkSteps(d.Checks, sys)...)
	p.stepRows = append(p.stepRows, d.Steps...)
	p.steps.update(false)
}

// updateLoadSteps shows the takedown trace of the model on screen.
func (p *calcPane) updateLoadSteps() {
	if p.snap == nil || p.snap.Model == nil {
		return
	}
	ls := &p.snap.Model.Loads
	p.loadRows = append(p.loadRows[:0], ls.Steps...)
	for i, c := range ls.Combos {
		name := c.Name
		if i == ls.Governing {
			name += " (governs)"
		}
		p.loadRows = append(p.loadRows, model.Step{Clause: c.Clause, Quantity: "P", Formula: name, Value: c.ValueN, Unit: "N"})
	}
	p.loadSteps.update(true)
}
