package ui

import (
	"context"
	"fmt"
	"image"
	"sync"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
	"upright/ui/units"
)

// variantsPane is the Variants view: the scheme's variants, each family's
// best size in each of them side by side with its change against the
// base, the best overall of each, and their plan sections in rows at one
// scale. It changes the scheme only through its editor, and evaluates the
// variants off the UI goroutine.
type variantsPane struct {
	ed editor
	do func(func()) // runs a function on the UI goroutine (fyne.Do)

	root    fyne.CanvasObject
	add     *widget.Button
	edit    *widget.Accordion // the variants' editors, folded away
	status  *widget.Label
	rows    [model.MaxVariants]*variantRow
	table   *widget.Table // the side-by-side table
	cells   [][]string    // the table's texts, header row first
	raster  *canvas.Raster
	front   *image.RGBA // the drawn sections (UI goroutine)
	quiet   int         // >0 while the pane sets its own entries
	scheme  model.Scheme
	comp    *model.Comparison // the comparison shown (UI goroutine)
	evalGen uint64            // the newest evaluation asked for (UI goroutine)

	mu     sync.Mutex // guards what the workers share below
	cancel context.CancelFunc
	wantW  int
	wantH  int
	drawn  *model.Comparison // the comparison the raster was drawn from
	drawnW int
	drawnH int
	rast   *plots.Raster
}

// variantRow edits one variant: its name and its changes.
type variantRow struct {
	box     *fyne.Container
	name    *widget.Entry
	changes *widget.Entry
	problem *widget.Label
}

// newVariantsPane builds the pane; do runs functions on the UI goroutine.
func newVariantsPane(ed editor, do func(func())) *variantsPane {
	p := &variantsPane{ed: ed, do: do}
	p.add = widget.NewButton("Add variant", p.addVariant)
	p.status = widget.NewLabel("")
	p.status.Truncation = fyne.TextTruncateEllipsis
	editors := container.NewVBox()
	for i := range p.rows {
		editors.Add(p.newRow(i))
	}
	p.table = widget.NewTable(p.tableSize, p.newCell, p.updateCell)
	p.table.StickyRowCount, p.table.StickyColumnCount = 1, 1
	p.table.OnSelected = p.tapped
	p.table.SetColumnWidth(0, 130)
	p.raster = canvas.NewRaster(func(w, h int) image.Image {
		p.mu.Lock()
		changed := w != p.wantW || h != p.wantH
		p.wantW, p.wantH = w, h
		p.mu.Unlock()
		if changed {
			go p.draw()
		}
		if p.front == nil {
			return blankImage
		}
		return p.front
	})
	p.raster.SetMinSize(fyne.NewSize(240, 160))
	table := p.table
	p.edit = widget.NewAccordion(widget.NewAccordionItem("Edit the variants", editors))
	top := container.NewBorder(nil, nil, p.add, nil, p.status)
	left := container.NewBorder(container.NewVBox(top, p.edit), nil, nil, nil, table)
	split := container.NewHSplit(left, p.raster)
	split.Offset = 0.6
	p.root = split
	p.showRows()
	return p
}

// Object returns the pane's content.
func (p *variantsPane) Object() fyne.CanvasObject { return p.root }

func (p *variantsPane) newRow(i int) fyne.CanvasObject {
	r := &variantRow{name: widget.NewEntry(), changes: widget.NewEntry(), problem: widget.NewLabel("")}
	r.name.SetPlaceHolder("name, e.g. 5.5 m ground floor")
	r.changes.SetPlaceHolder("changes, e.g. length=5.5m, fire=2h")
	r.problem.Importance = widget.DangerImportance
	r.problem.Wrapping = fyne.TextWrapWord
	r.problem.Hide()
	r.name.OnChanged = func(s string) {
		if p.quiet > 0 || i >= len(p.scheme.Variants) || s == p.scheme.Variants[i].Name {
			return
		}
		p.ed.Edit(fmt.Sprintf("variant %d name", i+1), func(sc *model.Scheme) {
			if i < len(sc.Variants) {
				sc.Variants[i].Name = s
			}
		})
	}
	r.changes.OnSubmitted = func(string) { p.applyChanges(i) }
	apply := widget.NewButton("Apply", func() { p.applyChanges(i) })
	show := widget.NewButton("Show", func() { p.showVariant(i) })
	remove := widget.NewButton("Remove", func() { p.removeVariant(i) })
	line := container.NewBorder(nil, nil, fixedWidth(170, r.name), container.NewHBox(apply, show, remove), r.changes)
	r.box = container.NewVBox(line, r.problem)
	p.rows[i] = r
	return r.box
}

// addVariant adds a variant that starts from the current inputs.
func (p *variantsPane) addVariant() {
	n := len(p.scheme.Variants)
	if n >= model.MaxVariants {
		return
	}
	p.edit.Open(0)
	p.ed.Edit("add variant", func(sc *model.Scheme) {
		if len(sc.Variants) < model.MaxVariants {
			sc.Variants = append(sc.Variants, model.Variant{Name: fmt.Sprintf("Variant %d", len(sc.Variants)+1)})
		}
	})
}

// removeVariant removes variant i.
func (p *variantsPane) removeVariant(i int) {
	if i >= len(p.scheme.Variants) {
		return
	}
	p.ed.Edit("remove variant "+model.VariantLabel(p.scheme.Variants[i]), func(sc *model.Scheme) {
		if i < len(sc.Variants) {
			sc.Variants = append(sc.Variants[:i:i], sc.Variants[i+1:]...)
		}
	})
}

// applyChanges reads row i's changes and, when the compare flags accept
// them, stores them; otherwise it shows the flag's message under the row.
func (p *variantsPane) applyChanges(i int) {
	if i >= len(p.scheme.Variants) {
		return
	}
	r := p.rows[i]
	cs, err := model.ParseChanges(r.changes.Text)
	if err == nil {
		v := p.scheme.Variants[i]
		v.Changes = cs
		_, err = p.scheme.ApplyVariant(v)
	}
	if err != nil {
		r.problem.SetText(err.Error())
		r.problem.Show()
		return
	}
	r.problem.Hide()
	p.ed.Edit(fmt.Sprintf("variant %d changes %s", i+1, model.ChangesText(cs)), func(sc *model.Scheme) {
		if i < len(sc.Variants) {
			sc.Variants[i].Changes = cs
		}
	})
}

// showVariant makes variant i the scheme shown everywhere: its inputs
// become the scheme's, its variants stay.
func (p *variantsPane) showVariant(i int) {
	if i >= len(p.scheme.Variants) {
		return
	}
	v := p.scheme.Variants[i]
	if _, err := p.scheme.ApplyVariant(v); err != nil {
		p.rows[i].problem.SetText(err.Error())
		p.rows[i].problem.Show()
		return
	}
	p.ed.Edit("show variant "+model.VariantLabel(v), func(sc *model.Scheme) {
		vs, err := sc.ApplyVariant(v)
		if err != nil {
			return
		}
		keep, name := sc.Variants, sc.Name
		*sc = vs
		sc.Variants, sc.Name = keep, name
	})
}

// showRows sets the editors from the scheme's variants.
func (p *variantsPane) showRows() {
	p.quiet++
	defer func() { p.quiet-- }()
	n := len(p.scheme.Variants)
	for i, r := range p.rows {
		if i >= n {
			r.box.Hide()
			continue
		}
		v := p.scheme.Variants[i]
		if r.name.Text != v.Name {
			r.name.SetText(v.Name)
		}
		if t := model.ChangesText(v.Changes); r.changes.Text != t {
			r.changes.SetText(t)
		}
		r.box.Show()
	}
	if n >= model.MaxVariants {
		p.add.Disable()
	} else {
		p.add.Enable()
	}
	if n == 0 {
		p.status.SetText("No variants: add one to compare this scheme with a few inputs changed.")
		p.edit.Hide()
	} else {
		p.edit.Show()
	}
}

// Show takes the snapshot shown by the window and evaluates the variants
// of its scheme beside it, off the UI goroutine.
func (p *variantsPane) Show(s *Snapshot) {
	if s == nil || s.Model == nil || s.Result == nil {
		return
	}
	sc := s.Model.Scheme
	sc.Setting = s.Result.Setting
	had := len(p.scheme.Variants) > 0
	p.scheme = sc
	if len(sc.Variants) == 0 && !had && p.comp == nil && p.status.Text != "" {
		return // nothing to compare, and nothing shown to clear
	}
	p.showRows()
	p.evalGen++
	gen := p.evalGen
	if len(sc.Variants) == 0 {
		p.comp = nil
		p.showTable()
		p.mu.Lock()
		p.drawn = nil
		p.mu.Unlock()
		p.front = nil
		p.raster.Refresh()
		return
	}
	p.status.SetText("Evaluating the variants…")
	ctx, cancel := context.WithCancel(context.Background())
	p.mu.Lock()
	if p.cancel != nil {
		p.cancel()
	}
	p.cancel = cancel
	p.mu.Unlock()
	m := s.Model
	go func() {
		c, err := model.CompareVariantsFrom(ctx, sc, m)
		if ctx.Err() != nil {
			return
		}
		p.do(func() {
			if gen != p.evalGen {
				return
			}
			if err != nil {
				p.status.SetText("The variants could not be evaluated: " + err.Error())
				return
			}
			p.comp = c
			p.showTable()
		})
		p.mu.Lock()
		p.drawn = nil
		p.mu.Unlock()
		p.render(c)
	}()
}

// Variant table geometry: column widths and the height of a size row
// (size, weight and plan area, carbon: three lines).
const (
	variantColW   = 180
	variantRowH   = 72
	variantHeadH  = 40
	variantBaseCW = 150
)

func (p *variantsPane) tableSize() (int, int) {
	if len(p.cells) == 0 {
		return 0, 0
	}
	return len(p.cells), len(p.cells[0])
}

func (p *variantsPane) newCell() fyne.CanvasObject {
	l := widget.NewLabel("")
	l.Wrapping = fyne.TextWrapWord
	return l
}

func (p *variantsPane) updateCell(id widget.TableCellID, o fyne.CanvasObject) {
	l := o.(*widget.Label)
	if id.Row >= len(p.cells) || id.Col >= len(p.cells[id.Row]) {
		l.SetText("")
		return
	}
	l.TextStyle = fyne.TextStyle{Bold: id.Row == 0 || id.Row == len(p.cells)-1}
	l.Importance = widget.MediumImportance
	if id.Row == 0 && id.Col >= 2 {
		l.Importance = widget.HighImportance // a variant's name: tap to show it
	}
	l.SetText(p.cells[id.Row][id.Col])
}

// tapped shows the variant whose name was tapped.
func (p *variantsPane) tapped(id widget.TableCellID) {
	p.table.UnselectAll()
	if id.Row == 0 && id.Col >= 2 && p.comp != nil && id.Col-2 < len(p.comp.Variants) {
		p.showVariant(p.comp.Variants[id.Col-2].Index)
	}
}

// showTable fills the side-by-side table from the comparison shown.
func (p *variantsPane) showTable() {
	p.cells = nil
	c := p.comp
	if c == nil {
		p.table.Refresh()
		return
	}
	sys := units.System(p.scheme.Units)
	cols := c.Columns()
	head := []string{"Family", "Base (shown)"}
	for _, col := range cols[1:] {
		head = append(head, col.Name+" ▸ show")
	}
	p.cells = append(p.cells, head)
	for _, fam := range c.Families {
		row := []string{fam}
		for i, col := range cols {
			text := familyCell(col, fam)
			if i > 0 {
				if d := c.Delta(i-1, fam); d.Known {
					m, a, cb := units.DeltaParts(d.MassKg, d.PlanAreaMM2, d.CarbonKg, sys)
					text += "\n" + m + ", " + a + "\n" + cb
				}
			}
			row = append(row, text)
		}
		p.cells = append(p.cells, row)
	}
	best := []string{"Best overall"}
	for _, col := range cols {
		text := "none works"
		if col.Err != nil {
			text = col.Err.Error()
		} else if b := col.BestOverall(); b != nil {
			text = b.Static.Designation + " (" + col.Model.Families[b.Family].Name() + ")"
		}
		best = append(best, text)
	}
	p.cells = append(p.cells, best)
	p.table.SetColumnWidth(1, variantBaseCW)
	for k := 2; k < len(head); k++ {
		p.table.SetColumnWidth(k, variantColW)
	}
	p.table.SetRowHeight(0, variantHeadH)
	for r := 1; r < len(p.cells); r++ {
		p.table.SetRowHeight(r, variantRowH)
	}
	p.table.Refresh()
	bad := 0
	for _, v := range c.Variants {
		if v.Err != nil {
			bad++
		}
	}
	msg := fmt.Sprintf("%d variant(s) beside the base; under each size its change in weight, plan area and carbon. Tap a variant's name to show it.", len(c.Variants))
	if bad > 0 {
		msg = fmt.Sprintf("%d of %d variants could not be evaluated (see the table).", bad, len(c.Variants))
	}
	p.status.SetText(msg)
}

// familyCell is a family's best size in one column.
func familyCell(col *model.VariantResult, fam string) string {
	switch {
	case col.Err != nil:
		return "—"
	case col.Family(fam) == nil:
		return "off"
	}
	if b := col.Best(fam); b != nil {
		return b.Static.Designation
	}
	return "none works"
}

// draw redraws the last comparison at the raster's size (any goroutine).
func (p *variantsPane) draw() {
	p.mu.Lock()
	c := p.drawn
	p.mu.Unlock()
	if c != nil {
		p.render(c)
	}
}

// render draws the comparison's plan sections at the wanted size and hands
// the image to the UI goroutine. It runs off the UI goroutine.
func (p *variantsPane) render(c *model.Comparison) {
	p.mu.Lock()
	defer p.mu.Unlock()
	w, h := min(p.wantW, plots.MaxPixels), min(p.wantH, plots.MaxPixels)
	if w < 1 || h < 1 || (p.drawn == c && p.drawnW == w && p.drawnH == h) {
		p.drawn = c
		return
	}
	if p.rast == nil {
		r, err := plots.NewRaster(w, h)
		if err != nil {
			return
		}
		p.rast = r
	} else if err := p.rast.Resize(w, h); err != nil {
		return
	}
	sheet := chart.VariantSections(c, units.System(c.Base.Model.Scheme.Units), false)
	if _, err := p.rast.RenderPlan(&sheet); err != nil {
		return
	}
	p.drawn, p.drawnW, p.drawnH = c, w, h
	src := p.rast.Image()
	img := image.NewRGBA(src.Bounds())
	copy(img.Pix, src.Pix)
	p.do(func() {
		p.front = img
		p.raster.Refresh()
	})
}
