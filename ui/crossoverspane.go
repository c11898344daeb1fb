package ui

import (
	"fmt"
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"upright/ui/cli"
	"upright/ui/model"
	"upright/ui/units"
)

// crossoversPane lists the lengths where the answer changes; choosing one
// moves the scheme there through the editor, as one undoable step. It is fed
// the crossovers of each scheme generation (they come apart from the
// snapshots, when the engine has found them).
type crossoversPane struct {
	ed       editor
	sys      func() units.System // the shown unit system
	rng      func() model.Range  // the chart's length range
	all      []model.Crossover   // every crossover of the scheme generation
	list     []model.Crossover   // the crossovers listed (filtered)
	gen      uint64              // the scheme generation all belongs to
	err      error
	allSteps bool // list every size step too
	view     *widget.List
	status   *widget.Label
	allCheck *widget.Check
	obj      fyne.CanvasObject
}

var _ pane = (*crossoversPane)(nil)

// newCrossoversPane builds the pane; sys and rng read the shown units and
// the chart's range, ed takes the length chosen.
func newCrossoversPane(ed editor, sys func() units.System, rng func() model.Range) *crossoversPane {
	p := &crossoversPane{ed: ed, sys: sys, rng: rng}
	p.status = widget.NewLabel("Finding crossovers…")
	p.status.Wrapping = fyne.TextWrapWord
	p.status.SizeName = theme.SizeNameCaptionText
	p.allCheck = widget.NewCheck("List every size step", func(on bool) {
		p.allSteps = on
		p.filter()
	})
	p.view = widget.NewList(
		func() int { return len(p.list) },
		func() fyne.CanvasObject {
			top := widget.NewLabelWithStyle("", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
			desc := widget.NewLabel("")
			desc.Wrapping = fyne.TextWrapWord
			desc.SizeName = theme.SizeNameCaptionText
			return container.NewBorder(top, nil, nil, nil, desc)
		},
		func(id widget.ListItemID, o fyne.CanvasObject) {
			if id < 0 || id >= len(p.list) {
				return
			}
			x := p.list[id]
			box := o.(*fyne.Container)
			box.Objects[1].(*widget.Label).SetText(units.Length(x.LengthMM, p.sys()) + "  ·  " + kindWords(x.Kind))
			box.Objects[0].(*widget.Label).SetText(cli.DescribeCrossover(x))
		})
	p.view.OnSelected = func(id widget.ListItemID) {
		if id >= 0 && id < len(p.list) {
			mm := p.list[id].LengthMM
			p.ed.Edit("crossover at "+units.Length(mm, p.sys()), func(sc *model.Scheme) {
				sc.Setting = sc.Setting.AtLength(mm)
			})
		}
		p.view.UnselectAll()
	}
	head := container.NewVBox(
		widget.NewLabelWithStyle("Crossovers", fyne.TextAlignLeading, fyne.TextStyle{Bold: true}),
		p.status, p.allCheck)
	p.obj = container.NewBorder(head, nil, nil, nil, container.New(&sizeWatch{onWidth: func(float32) { p.fitHeights() }}, p.view))
	return p
}

// Object returns the pane's content.
func (p *crossoversPane) Object() fyne.CanvasObject { return p.obj }

// Show does nothing: the crossovers come with their own message (setList).
func (p *crossoversPane) Show(*Snapshot) {}

// searching says the crossovers of a new scheme are being found.
func (p *crossoversPane) searching() { p.status.SetText("Finding crossovers…") }

// setList shows the crossovers of a scheme generation.
func (p *crossoversPane) setList(gen uint64, list []model.Crossover, err error) {
	p.gen, p.all, p.err = gen, list, err
	p.filter()
}

// filter picks the crossovers the list shows and says what it found.
func (p *crossoversPane) filter() {
	p.list = p.list[:0]
	steps := 0
	for _, x := range p.all {
		if x.Kind == model.KindSize {
			steps++
			if !p.allSteps {
				continue
			}
		}
		p.list = append(p.list, x)
	}
	r := p.rng()
	sys := p.sys()
	switch {
	case p.err != nil:
		p.status.SetText("Crossovers not found: " + p.err.Error())
	case len(p.list) == 0 && steps > 0 && !p.allSteps:
		p.status.SetText(fmt.Sprintf("The best family holds from %s to %s; %d size steps within families.", units.Length(r.FromMM, sys), units.Length(r.ToMM, sys), steps))
	case len(p.list) == 0:
		p.status.SetText(fmt.Sprintf("No crossovers from %s to %s: every answer holds throughout.", units.Length(r.FromMM, sys), units.Length(r.ToMM, sys)))
	default:
		p.status.SetText(fmt.Sprintf("%d lengths where the answer changes (each the last length at which the first answer holds). Choose one to move there.", len(p.list)))
	}
	p.fitHeights()
	p.view.Refresh()
}

// fitHeights gives each crossover in the list the height its wrapped
// description needs at the list's width, so no description is cut.
func (p *crossoversPane) fitHeights() {
	width := p.view.Size().Width - 2*theme.InnerPadding() - 2*theme.Padding() - theme.ScrollBarSize()
	if width <= 0 {
		return
	}
	top := widget.NewLabelWithStyle("X", fyne.TextAlignLeading, fyne.TextStyle{Bold: true}).MinSize().Height
	caption := theme.CaptionTextSize()
	line := fyne.MeasureText("X", caption, fyne.TextStyle{}).Height + theme.LineSpacing()
	for i, x := range p.list {
		n := wrappedLines(cli.DescribeCrossover(x), caption, width)
		p.view.SetItemHeight(i, top+float32(n)*line+2*theme.InnerPadding()+theme.Padding())
	}
}

// wrappedLines counts the lines text takes when wrapped at spaces to width.
func wrappedLines(text string, size, width float32) int {
	lines, cur := 0, ""
	for _, word := range strings.Fields(text) {
		try := word
		if cur != "" {
			try = cur + " " + word
		}
		if cur == "" || fyne.MeasureText(try, size, fyne.TextStyle{}).Width <= width {
			cur = try
			continue
		}
		lines++
		cur = word
	}
	if cur != "" {
		lines++
	}
	return max(lines, 1)
}
