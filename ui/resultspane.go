package ui

import (
	"fmt"
	"image"
	"slices"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
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

// resultsPane is the results table: the sizes at the length on screen,
// sorted as the user chose, with each curve's key and whether each works.
type resultsPane struct {
	snap     *Snapshot // the snapshot shown
	selected string    // the row shown in bold: the candidate whose calculation is shown
	pinned   []string  // the candidates pinned to the chart
	// fallback gives the units and method of the headers before the first snapshot.
	fallback func() (units.System, model.Method)
	// onSelect is called with a row's designation when the user picks it.
	onSelect func(designation string)

	rows     []model.Row
	sortCol  int
	sortDesc bool
	showAll  bool
	ctx      cellCtx

	table         *liveTable
	tableSys      units.System // units of the headers shown
	tableMethod   model.Method // method of the headers shown
	tableNote     *widget.Label
	tableFireNote *widget.Label // the fire rating's line under the table note
	showAllChk    *widget.Check
	allColsChk    *widget.Check
	fit           tableFit               // the columns the table's width holds
	keys          map[string]*image.RGBA // each drawn curve's key, by designation
	box           fyne.CanvasObject
}

// newResultsPane builds the results table; onSelect is called with the
// designation of a row the user picks.
func newResultsPane(fallback func() (units.System, model.Method), onSelect func(designation string)) *resultsPane {
	p := &resultsPane{sortCol: -1, fallback: fallback, onSelect: onSelect}
	p.box = p.build()
	return p
}

// Object returns the table with its title, switches and notes.
func (p *resultsPane) Object() fyne.CanvasObject { return p.box }

// Show shows the rows of an evaluated snapshot.
func (p *resultsPane) Show(s *Snapshot) {
	p.snap = s
	p.refreshRows()
}

// setPicks marks the selected row and the pinned ones.
func (p *resultsPane) setPicks(selected string, pinned []string) {
	pinChange := !slices.Equal(p.pinned, pinned)
	p.selected, p.pinned = selected, append(p.pinned[:0], pinned...)
	if pinChange {
		p.refreshRows()
	} else {
		p.table.update(false)
	}
}

// build makes the results table with its switches and notes.
func (p *resultsPane) build() fyne.CanvasObject {
	p.table = newLiveTable(
		func() (int, int) { return len(p.rows), 1 + len(p.fit.shown) },
		newKeyCell,
		p.fillTableCell)
	p.table.ShowHeaderRow = true
	p.table.CreateHeader = func() fyne.CanvasObject {
		b := widget.NewButton("", nil)
		b.Importance = widget.LowImportance
		b.Alignment = widget.ButtonAlignLeading
		return container.NewThemeOverride(b, compactTheme{})
	}
	p.table.UpdateHeader = func(id widget.TableCellID, o fyne.CanvasObject) {
		b := o.(*container.ThemeOverride).Content.(*widget.Button)
		col := p.tableCol(id.Col)
		switch {
		case col < 0:
			b.SetText("Key")
			b.OnTapped = nil
		case col >= len(columns):
			b.SetText("")
			b.OnTapped = nil
		default:
			b.SetText(p.headerText(col))
			b.OnTapped = func() { p.SortBy(col) }
		}
	}
	p.fit.shown = p.fit.choose()
	p.table.OnSelected = func(id widget.TableCellID) {
		if id.Row >= 0 && id.Row < len(p.rows) {
			p.onSelect(p.rows[id.Row].Static.Designation)
		}
		p.table.UnselectAll()
	}
	p.allColsChk = widget.NewCheck("All columns", func(on bool) {
		p.fit.all = on
		if p.ctx.m != nil {
			p.fitColumns(true)
		}
	})
	p.showAllChk = widget.NewCheck("Show every working size", func(on bool) {
		p.showAll = on
		p.refreshRows()
	})
	p.tableNote = widget.NewLabel("")
	p.tableNote.Importance = widget.LowImportance
	p.tableNote.Wrapping = fyne.TextWrapWord
	// The fire rating's note has a label of its own: it changes only with
	// the rating, so a slider step does not wrap its text again.
	p.tableFireNote = widget.NewLabel("")
	p.tableFireNote.Importance = widget.LowImportance
	p.tableFireNote.Wrapping = fyne.TextWrapWord
	p.tableFireNote.Hide()
	title := widget.NewLabelWithStyle("Results", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	head := container.NewVBox(container.NewBorder(nil, nil, title, container.NewHBox(p.showAllChk, p.allColsChk)), p.tableNote, p.tableFireNote)
	watch := container.New(&sizeWatch{onWidth: func(width float32) {
		p.fit.width = width
		refitText(p.tableNote)
		refitText(p.tableFireNote)
		if p.ctx.m != nil {
			p.fitColumns(false)
		}
	}}, container.NewThemeOverride(p.table.Table, compactTheme{})) // rows 1 px apart, not the theme's padding
	return container.NewBorder(head, nil, nil, nil, watch)
}

// headerText is a column's title with the sort arrow.
func (p *resultsPane) headerText(col int) string {
	sys, method := p.fallback()
	if p.snap != nil && p.snap.Model != nil {
		sys, method = unitsOf(p.snap.Model), p.snap.Model.Scheme.Setting.Method
	}
	t := columns[col].title(sys, method)
	if col == p.sortCol {
		if p.sortDesc {
			t += " ▼"
		} else {
			t += " ▲"
		}
	}
	return t
}

// updateCell fills one table cell.
func (p *resultsPane) updateCell(id widget.TableCellID, o fyne.CanvasObject) {
	l := o.(*widget.Label)
	if id.Row < 0 || id.Row >= len(p.rows) || id.Col < 0 || id.Col >= len(columns) || p.ctx.m == nil {
		l.SetText("")
		return
	}
	r := &p.rows[id.Row]
	c := &columns[id.Col]
	style := fyne.TextStyle{Bold: r.Static.Designation == p.selected}
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
	txt := c.cell(&p.ctx, r)
	if l.Text == txt && l.Importance == imp && l.TextStyle == style && l.Alignment == align {
		return
	}
	l.Text, l.Importance, l.TextStyle, l.Alignment = txt, imp, style, align
	l.Refresh()
}

// refreshRows picks, sorts and shows the table's rows from the snapshot on screen.
func (p *resultsPane) refreshRows() { p.refreshTable(false) }

// refreshTable is refreshRows; full also redraws the headers (units, sort).
func (p *resultsPane) refreshTable(full bool) {
	if p.snap == nil || p.snap.Result == nil {
		return
	}
	m := p.snap.Model
	p.ctx = cellCtx{m: m, sys: unitsOf(m), length: p.snap.Result.Setting.LengthMM, pinned: map[string]bool{}}
	for _, d := range p.pinned {
		p.ctx.pinned[d] = true
	}
	p.rows = pickRows(p.snap.Result, p.showAll, p.rows)
	sortRows(&p.ctx, p.rows, p.sortCol, p.sortDesc)
	working := 0
	for i := range p.rows {
		if p.rows[i].OK {
			working++
		}
	}
	res := p.snap.Result
	note := fmt.Sprintf("at %s", units.Length(res.Setting.LengthMM, p.ctx.sys))
	if b := res.BestOverall(); b != nil {
		note += fmt.Sprintf(" · best overall: %s (%s) · %s", b.Static.Designation, m.Families[b.Family].Name(), metricWords(m.Scheme.Metric))
		if nt := m.NearTieNote(res); nt != "" {
			note += " · " + nt
		}
	} else {
		note += " · nothing works at this length"
	}
	if p.showAll {
		note += fmt.Sprintf(" · %d working sizes", working)
	}
	setWrappedText(p.tableNote, note)
	if fn := fireNote(m.Scheme); fn == "" {
		p.tableFireNote.Hide()
	} else {
		setWrappedText(p.tableFireNote, fn)
		p.tableFireNote.Show()
	}
	full = full || p.ctx.sys != p.tableSys || p.ctx.m.Scheme.Setting.Method != p.tableMethod
	p.tableSys, p.tableMethod = p.ctx.sys, p.ctx.m.Scheme.Setting.Method
	n := p.fit.refreshes
	p.fitColumns(full)
	if p.fit.refreshes == n {
		p.table.update(false)
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
func (p *resultsPane) SortBy(col int) {
	if col == p.sortCol {
		p.sortDesc = !p.sortDesc
	} else {
		p.sortCol, p.sortDesc = col, false
	}
	p.refreshTable(true)
}
