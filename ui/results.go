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

// unitsOf is the display system a model's results are in.
func unitsOf(m *model.Model) units.System { return units.System(m.Scheme.Units) }

// fmtForce formats a force with grouping, e.g. "1,234 kip".
func fmtForce(n float64, sys units.System) string {
	v, u := units.ForceValue(n, sys)
	return num(v, 0) + " " + u
}

// buildResults makes the results table with its switch and note.
func (w *Window) buildResults() fyne.CanvasObject {
	w.table = newLiveTable(
		func() (int, int) { return len(w.rows), 1 + len(w.fit.shown) },
		newKeyCell,
		w.fillTableCell)
	w.table.ShowHeaderRow = true
	w.table.CreateHeader = func() fyne.CanvasObject {
		b := widget.NewButton("", nil)
		b.Importance = widget.LowImportance
		b.Alignment = widget.ButtonAlignLeading
		return container.NewThemeOverride(b, compactTheme{})
	}
	w.table.UpdateHeader = func(id widget.TableCellID, o fyne.CanvasObject) {
		b := o.(*container.ThemeOverride).Content.(*widget.Button)
		col := w.tableCol(id.Col)
		switch {
		case col < 0:
			b.SetText("Key")
			b.OnTapped = nil
		case col >= len(columns):
			b.SetText("")
			b.OnTapped = nil
		default:
			b.SetText(w.headerText(col))
			b.OnTapped = func() { w.SortBy(col) }
		}
	}
	w.fit.shown = w.fit.choose()
	w.table.OnSelected = func(id widget.TableCellID) {
		if id.Row >= 0 && id.Row < len(w.rows) {
			w.Select(w.rows[id.Row].Static.Designation)
		}
		w.table.UnselectAll()
	}
	w.allColsChk = widget.NewCheck("All columns", func(on bool) {
		w.fit.all = on
		if w.ctx.m != nil {
			w.fitColumns(true)
		}
	})
	w.showAllChk = widget.NewCheck("Show every working size", func(on bool) {
		w.showAll = on
		w.refreshRows()
	})
	w.tableNote = widget.NewLabel("")
	w.tableNote.Importance = widget.LowImportance
	w.tableNote.Wrapping = fyne.TextWrapWord
	// The fire rating's note has a label of its own: it changes only with
	// the rating, so a slider step does not wrap its text again.
	w.tableFireNote = widget.NewLabel("")
	w.tableFireNote.Importance = widget.LowImportance
	w.tableFireNote.Wrapping = fyne.TextWrapWord
	w.tableFireNote.Hide()
	title := widget.NewLabelWithStyle("Results", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	head := container.NewVBox(container.NewBorder(nil, nil, title, container.NewHBox(w.showAllChk, w.allColsChk)), w.tableNote, w.tableFireNote)
	watch := container.New(&widthWatch{onChange: func(width float32) {
		w.fit.width = width
		refitText(w.tableNote)
		refitText(w.tableFireNote)
		if w.ctx.m != nil {
			w.fitColumns(false)
		}
	}}, w.table)
	return container.NewBorder(head, nil, nil, nil, watch)
}

// headerText is a column's title with the sort arrow.
func (w *Window) headerText(col int) string {
	sys, method := w.sys(), w.st.Valid.Setting.Method
	if w.snap != nil && w.snap.Model != nil {
		sys, method = unitsOf(w.snap.Model), w.snap.Model.Scheme.Setting.Method
	}
	t := columns[col].title(sys, method)
	if col == w.sortCol {
		if w.sortDesc {
			t += " ▼"
		} else {
			t += " ▲"
		}
	}
	return t
}

// updateCell fills one table cell.
func (w *Window) updateCell(id widget.TableCellID, o fyne.CanvasObject) {
	l := o.(*widget.Label)
	if id.Row < 0 || id.Row >= len(w.rows) || id.Col < 0 || id.Col >= len(columns) || w.ctx.m == nil {
		l.SetText("")
		return
	}
	r := &w.rows[id.Row]
	c := &columns[id.Col]
	style := fyne.TextStyle{Bold: r.Static.Designation == w.selected}
	imp := widget.MediumImportance
	if c.id == "status" {
		if r.OK {
			imp = widget.SuccessImportance
		} else {
			imp = widget.DangerImportance
		}
	} else if !r.OK {
		imp = widget.LowImportance
	}
	align := fyne.TextAlignLeading
	if c.right {
		align = fyne.TextAlignTrailing
	}
	txt := c.cell(&w.ctx, r)
	if l.Text == txt && l.Importance == imp && l.TextStyle == style && l.Alignment == align {
		return
	}
	l.Text, l.Importance, l.TextStyle, l.Alignment = txt, imp, style, align
	l.Refresh()
}

// refreshRows picks, sorts and shows the table's rows from the snapshot on screen.
func (w *Window) refreshRows() { w.refreshTable(false) }

// refreshTable is refreshRows; full also redraws the headers (units, sort).
func (w *Window) refreshTable(full bool) {
	if w.snap == nil || w.snap.Result == nil {
		return
	}
	m := w.snap.Model
	w.ctx = cellCtx{m: m, sys: unitsOf(m), length: w.snap.Result.Setting.LengthMM, pinned: map[string]bool{}}
	for _, p := range w.pinned {
		w.ctx.pinned[p] = true
	}
	w.rows = pickRows(w.snap.Result, w.showAll, w.rows)
	sortRows(&w.ctx, w.rows, w.sortCol, w.sortDesc)
	working := 0
	for i := range w.rows {
		if w.rows[i].OK {
			working++
		}
	}
	res := w.snap.Result
	note := fmt.Sprintf("at %s", units.Length(res.Setting.LengthMM, w.ctx.sys))
	if b := res.BestOverall(); b != nil {
		note += fmt.Sprintf(" · best overall: %s (%s) · %s", b.Static.Designation, m.Families[b.Family].Name(), metricWords(m.Scheme.Metric))
		if nt := m.NearTieNote(res); nt != "" {
			note += " · " + nt
		}
	} else {
		note += " · nothing works at this length"
	}
	if w.showAll {
		note += fmt.Sprintf(" · %d working sizes", working)
	}
	setWrappedText(w.tableNote, note)
	if fn := fireNote(m.Scheme); fn == "" {
		w.tableFireNote.Hide()
	} else {
		setWrappedText(w.tableFireNote, fn)
		w.tableFireNote.Show()
	}
	full = full || w.ctx.sys != w.tableSys || w.ctx.m.Scheme.Setting.Method != w.tableMethod
	w.tableSys, w.tableMethod = w.ctx.sys, w.ctx.m.Scheme.Setting.Method
	n := w.fit.refreshes
	w.fitColumns(full)
	if w.fit.refreshes == n {
		w.table.update(false)
	}
}

// metricWords says how the table ranks.
func metricWords(m model.Metric) string {
	switch m {
	case model.ByFootprint:
		return "ranked by plan footprint"
	case model.ByCarbon:
		return "ranked by embodied carbon"
	}
	return "ranked by weight"
}

// SortBy sorts the table by a column; choosing the same column again reverses it.
func (w *Window) SortBy(col int) {
	if col == w.sortCol {
		w.sortDesc = !w.sortDesc
	} else {
		w.sortCol, w.sortDesc = col, false
	}
	w.refreshTable(true)
}

// Select shows the trace of a candidate (by designation) in the calculation view.
func (w *Window) Select(designation string) {
	if designation == w.selected {
		return
	}
	w.selected = designation
	w.table.update(false)
	w.calcTitle.SetText(designation + ": working…")
	w.submit()
}

// TogglePin adds the selected candidate's curve to the chart, or removes it.
func (w *Window) TogglePin() {
	if w.selected == "" {
		return
	}
	if i := slices.Index(w.pinned, w.selected); i >= 0 {
		w.pinned = slices.Delete(w.pinned, i, i+1)
	} else {
		w.pinned = append(w.pinned, w.selected)
	}
	w.updatePinButtons()
	w.refreshRows()
	w.submit()
}

func (w *Window) updatePinButtons() {
	if w.selected == "" {
		w.pinButton.Disable()
	} else {
		w.pinButton.Enable()
	}
	if slices.Contains(w.pinned, w.selected) {
		w.pinButton.SetText("Unpin from chart")
	} else {
		w.pinButton.SetText("Pin to chart")
	}
	if len(w.pinned) == 0 {
		w.clearPins.Disable()
		w.clearPins.SetText("Clear pins")
	} else {
		w.clearPins.Enable()
		w.clearPins.SetText(fmt.Sprintf("Clear %d pinned", len(w.pinned)))
	}
}

// buildCalc makes the calculation view: the selected candidate's verdict,
// the plain explanation, warnings, pin buttons and the trace.
func (w *Window) buildCalc() fyne.CanvasObject {
	w.calcTitle = widget.NewLabelWithStyle("Choose a row to see its calculation.", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	w.calcTitle.Wrapping = fyne.TextWrapWord
	w.calcPlain = widget.NewLabel("")
	w.calcPlain.Wrapping = fyne.TextWrapWord
	w.calcWarn = widget.NewLabel("")
	w.calcWarn.Wrapping = fyne.TextWrapWord
	w.calcWarn.Importance = widget.WarningImportance
	w.calcWarn.Hide()
	w.pinButton = widget.NewButtonWithIcon("Pin to chart", theme.ContentAddIcon(), w.TogglePin)
	w.clearPins = widget.NewButton("Clear pins", func() {
		w.pinned = nil
		w.updatePinButtons()
		w.refreshRows()
		w.submit()
	})
	w.updatePinButtons()
	shown := func() units.System { return w.ctx.sys }
	w.steps = stepTable(&w.stepRows, shown)
	w.loadSteps = stepTable(&w.loadRows, shown)
	top := container.NewVBox(w.calcTitle, w.calcPlain, w.calcWarn, container.NewHBox(w.pinButton, w.clearPins))
	trace := container.NewBorder(top, nil, nil, nil, w.steps)
	tabs := container.NewAppTabs(
		container.NewTabItem("Calculation", trace),
		container.NewTabItem("Load takedown", w.loadSteps),
	)
	return tabs
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
func (w *Window) updateCalc() {
	w.updatePinButtons()
	s := w.snap
	if w.selected == "" || s == nil || s.Model == nil {
		return
	}
	if s.Detail == nil || s.DetailOf != w.selected {
		w.calcTitle.SetText(w.selected + ": not among the candidates of this scheme.")
		w.calcPlain.SetText("")
		w.calcWarn.Hide()
		w.stepRows = w.stepRows[:0]
		w.steps.update(false)
		return
	}
	m := s.Model
	sys := unitsOf(m)
	d := s.Detail
	fi, i, _ := m.Find(w.selected)
	row := m.Row(fi, i, s.Result.Setting)
	f := m.Families[fi]
	verdict := status(&row)
	title := fmt.Sprintf("%s · %s %s at %s: %s", w.selected, materialTitle(f.Material()), f.Name(), units.Length(s.Result.Setting.LengthMM, sys), verdict)
	if row.Permitted {
		title += fmt.Sprintf(", capacity %s for a demand of %s (utilization %.2f)", fmtForce(row.CapacityN, sys), fmtForce(row.DemandN, sys), row.Util)
	}
	w.calcTitle.SetText(title)
	w.calcPlain.SetText(d.Plain)
	var warn []string
	for _, x := range d.Warnings {
		warn = append(warn, "⚠ "+x)
	}
	if !row.Permitted && row.Reason != "" {
		warn = append(warn, "⚠ "+row.Reason)
	}
	if len(warn) > 0 {
		w.calcWarn.SetText(strings.Join(warn, "\n"))
		w.calcWarn.Show()
	} else {
		w.calcWarn.Hide()
	}
	w.stepRows = append(w.stepRows[:0], checkSteps(d.Checks, sys)...)
	w.stepRows = append(w.stepRows, d.Steps...)
	w.steps.update(false)
}

// updateLoadSteps shows the takedown trace of the model on screen.
func (w *Window) updateLoadSteps() {
	if w.snap == nil || w.snap.Model == nil {
		return
	}
	ls := &w.snap.Model.Loads
	w.loadRows = append(w.loadRows[:0], ls.Steps...)
	for i, c := range ls.Combos {
		name := c.Name
		if i == ls.Governing {
			name += " (governs)"
		}
		w.loadRows = append(w.loadRows, model.Step{Clause: c.Clause, Quantity: "P", Formula: name, Value: c.ValueN, Unit: "N"})
	}
	w.loadSteps.update(true)
}
