package ui

import (
	"fmt"
	"image"
	"slices"
	"unicode/utf8"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// columnPriority orders the results table's columns by how much an
// architect needs them: the table shows as many as its width holds, in this
// order, each as wide as its widest text, so nothing is cut; the rest are
// behind the "All columns" switch (and in the calculation view).
var columnPriority = []string{"size", "status", "weight", "plan", "util", "capacity", "family", "governs", "column-weight", "demand", "area", "carbon", "slenderness"}

// tableFit is the results table's choice of columns.
type tableFit struct {
	all     bool      // every column, scrolling sideways when needed
	width   float32   // the table's width last laid out
	natural []float32 // each column's width for its widest text so far
	runes   []int     // each column's longest text so far, in characters
	// measured holds texts already measured at the longest length.
	measured map[string]uint8
	shown    []int  // columns shown, by index into columns, in table order
	key      string // units, method and sorted column the natural widths belong to
	// refreshes counts full redraws of the table by fitColumns.
	refreshes int
}

// keyColumnWidth is the width of the key column (the curve swatch).
const keyColumnWidth = keyWidth + 8

// tableCol maps a table column to the index of the results column it shows,
// or -1 for the key column.
func (p *resultsPane) tableCol(c int) int {
	if c == 0 {
		return -1
	}
	if c-1 < len(p.fit.shown) {
		return p.fit.shown[c-1]
	}
	return len(columns) // past the end: an empty cell
}

// ShownColumns returns the ids of the result columns the table shows, in order.
func (p *resultsPane) ShownColumns() []string {
	out := make([]string, 0, len(p.fit.shown))
	for _, c := range p.fit.shown {
		out = append(out, columns[c].id)
	}
	return out
}

// newKeyCell makes a table cell: a key swatch under a text label; only the
// key column shows the swatch.
func newKeyCell() fyne.CanvasObject {
	img := canvas.NewImageFromImage(nil)
	img.FillMode = canvas.ImageFillContain
	img.ScaleMode = canvas.ImageScaleFastest
	img.Hide()
	l := widget.NewLabel("")
	l.Truncation = fyne.TextTruncateClip
	// Each cell carries the compact theme itself: the table sizes its rows
	// from a template cell that is in no other container.
	return container.NewThemeOverride(container.NewStack(container.NewPadded(img), l), compactTheme{})
}

// fillTableCell fills a cell of the results table.
func (p *resultsPane) fillTableCell(id widget.TableCellID, o fyne.CanvasObject) {
	box := o.(*container.ThemeOverride).Content.(*fyne.Container)
	img := box.Objects[0].(*fyne.Container).Objects[0].(*canvas.Image)
	l := box.Objects[1].(*widget.Label)
	col := p.tableCol(id.Col)
	if col >= 0 {
		if img.Visible() {
			img.Hide()
		}
		p.updateCell(widget.TableCellID{Row: id.Row, Col: col}, l)
		return
	}
	if l.Text != "" {
		l.SetText("")
	}
	var key *image.RGBA
	if id.Row >= 0 && id.Row < len(p.rows) {
		key = p.keys[p.rows[id.Row].Static.Designation]
	}
	if key == nil {
		img.Hide()
		return
	}
	if img.Image != key {
		img.Image = key
		img.Refresh()
	}
	img.Show()
}

// cellWidth is the width a label needs to show txt uncut.
func cellWidth(txt string) float32 {
	return fyne.MeasureText(txt, theme.TextSize(), fyne.TextStyle{Bold: true}).Width + 2*theme.InnerPadding() + 2
}

// headerWidths caches the widths of header texts (headerWidth).
var headerWidths = map[string]float32{}

// headerWidth is the width a header button needs to show txt uncut.
// UI goroutine.
func headerWidth(txt string) float32 {
	if wd, ok := headerWidths[txt]; ok {
		return wd
	}
	b := widget.NewButton(txt, nil)
	b.Importance = widget.LowImportance
	wd := b.MinSize().Width + 2
	headerWidths[txt] = wd
	return wd
}

// fitColumns measures the columns' texts and chooses the columns the
// table's width holds, redrawing the table when the choice or a width
// changed; full redraws it anyway.
func (p *resultsPane) fitColumns(full bool) {
	f := &p.fit
	key := fmt.Sprintf("%s|%s|%d", p.ctx.sys, p.ctx.m.Scheme.Setting.Method, p.sortCol)
	if key != f.key || len(f.natural) != len(columns) {
		f.key = key
		f.natural = make([]float32, len(columns))
		f.runes = make([]int, len(columns))
		f.measured = map[string]uint8{}
	}
	changed := false
	for c := range columns {
		nat := f.natural[c]
		if nat == 0 {
			nat = headerWidth(p.headerText(c)) // with its sort arrow
			f.runes[c] = 0
		}
		// Only a text longer than any measured so far can need more room:
		// measuring every cell on every slider step would cost milliseconds.
		for r := range p.rows {
			txt := columns[c].cell(&p.ctx, &p.rows[r])
			if n := utf8.RuneCountInString(txt); n > f.runes[c] {
				f.runes[c] = n
				nat = max(nat, cellWidth(txt))
			} else if n == f.runes[c] && !columns[c].right && f.measured[txt] == 0 {
				// A name as long as the longest may still be wider; numbers
				// (right-aligned) use figures of one width.
				nat = max(nat, cellWidth(txt))
			}
			if !columns[c].right && len(f.measured) < 4096 {
				f.measured[txt] = 1
			}
		}
		if nat != f.natural[c] {
			f.natural[c], changed = nat, true
		}
	}
	shown := f.choose()
	if !slices.Equal(shown, f.shown) {
		f.shown, changed = shown, true
	}
	if !changed && !full {
		return
	}
	p.table.SetColumnWidth(0, keyColumnWidth)
	for i, c := range f.shown {
		p.table.SetColumnWidth(i+1, f.natural[c])
	}
	sticky := 1
	for _, c := range f.shown {
		if id := columns[c].id; id != "status" && id != "family" && id != "size" {
			break
		}
		sticky++
	}
	p.table.StickyColumnCount = sticky
	f.refreshes++
	p.table.update(true)
}

// choose returns the columns that fit the width, in priority order until
// one does not fit, then in the table's order; every column with all set.
func (f *tableFit) choose() []int {
	var out []int
	if f.all || f.width <= 0 {
		for c := range columns {
			out = append(out, c)
		}
		return out
	}
	pad := theme.Padding()
	room := f.width - keyColumnWidth - pad - 4
	for _, id := range columnPriority {
		c := columnIndex(id)
		if c < 0 {
			continue
		}
		need := f.natural[c] + pad
		// The size and its status (works or not, in words, readable without
		// colour) are never dropped.
		if need > room && len(out) > 1 {
			continue // a narrower column further down may still fit
		}
		room -= need
		out = append(out, c)
	}
	slices.Sort(out)
	return out
}

// sizeWatch lays out one object over its whole area and reports changes of
// its width (onWidth) and of its size (onSize), each when set.
type sizeWatch struct {
	last    fyne.Size
	onWidth func(width float32)
	onSize  func(size fyne.Size)
}

// Layout fills the area with each object and reports a new width or size.
func (l *sizeWatch) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	for _, o := range objs {
		o.Move(fyne.NewPos(0, 0))
		o.Resize(size)
	}
	if size == l.last {
		return
	}
	widthChanged := size.Width != l.last.Width
	l.last = size
	if widthChanged && l.onWidth != nil {
		l.onWidth(size.Width)
	}
	if l.onSize != nil {
		l.onSize(size)
	}
}

// MinSize is the largest minimum size of the objects.
func (l *sizeWatch) MinSize(objs []fyne.CanvasObject) fyne.Size {
	var s fyne.Size
	for _, o := range objs {
		s = s.Max(o.MinSize())
	}
	return s
}

// tableColOf returns the table column showing a results column (by id), or -1.
func (p *resultsPane) tableColOf(id string) int {
	for i, c := range p.fit.shown {
		if columns[c].id == id {
			return i + 1
		}
	}
	return -1
}
