package ui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// Preference keys of the layout: the divider of each split (a fraction)
// and whether the inputs are folded away.
const (
	prefSplitSide   = "layout.inputs"     // inputs | everything else
	prefSplitMain   = "layout.main"       // chart and table | crossovers and calculation
	prefSplitCentre = "layout.centre"     // chart | table
	prefSplitRight  = "layout.right"      // crossovers | calculation
	prefInputsShut  = "layout.inputs-off" // the inputs folded to a strip
)

// panes are the window's draggable splits. The user drags their dividers;
// the positions and the folded inputs come back at the next start.
type panes struct {
	side, main, centre, right *container.Split
	inputs                    fyne.CanvasObject // the inputs pane
	rail                      fyne.CanvasObject // the strip shown while the inputs are folded
	folded                    bool
	sideOffset                float64 // the inputs divider before folding
	// auto is set while the side dividers follow the window width (a first
	// start, until the user drags one): the inputs and the right column keep
	// a readable width in pixels and the chart and table take the rest.
	auto     bool
	autoSide float64 // the side divider auto last set
	autoMain float64 // the main divider auto last set
	// viewRoom is set while a figure view (Map, Variants, Building) has
	// taken the centre's height; beforeView is the chart–table divider it
	// will give back.
	viewRoom   bool
	beforeView float64
}

// inputsWidth is the inputs pane's width on a first start.
const inputsWidth = 310

// splitDefaults are the dividers of a first start.
var splitDefaults = map[string]float64{
	prefSplitSide: 0.24, prefSplitMain: 0.70, prefSplitCentre: 0.42, prefSplitRight: 0.46,
}

// buildPanes arranges the window: the inputs (foldable) left of the chart
// over the results, with the crossovers over the calculation on the right.
func (w *Window) buildPanes(inputs, chartArea, results, xsPanel, calc fyne.CanvasObject) fyne.CanvasObject {
	p := &w.panes
	p.centre = container.NewVSplit(chartArea, results)
	p.right = container.NewVSplit(xsPanel, calc)
	p.main = container.NewHSplit(p.centre, p.right)

	fold := widget.NewButtonWithIcon("", theme.NavigateBackIcon(), func() { w.FoldInputs(true) })
	fold.Importance = widget.LowImportance
	title := widget.NewLabelWithStyle("Inputs", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	scroll := container.NewVScroll(inputs)
	p.inputs = container.NewBorder(container.NewBorder(nil, nil, title, fold), nil, nil, nil, scroll)
	unfold := widget.NewButtonWithIcon("", theme.NavigateNextIcon(), func() { w.FoldInputs(false) })
	unfold.Importance = widget.LowImportance
	p.rail = container.NewVBox(unfold)

	p.side = container.NewHSplit(p.inputs, p.main)
	w.restoreLayout(w.app.Preferences())
	return container.New(&sizeWatch{onWidth: w.autoSplits}, p.side)
}

// autoSplits sets the side dividers for a window width while they follow it.
func (w *Window) autoSplits(width float32) {
	p := &w.panes
	if !p.auto || width <= 0 {
		return
	}
	if (!p.folded && p.side.Offset != p.autoSide) || p.main.Offset != p.autoMain {
		p.auto = false // the user moved a divider
		return
	}
	side := float32(inputsWidth)
	if width >= 1700 {
		side = inputsWidth + 40
	}
	rest := width - side
	right := min(max(0.27*rest, 260), 440)
	p.autoSide = float64(side / width)
	p.autoMain = float64(1 - right/rest)
	if p.folded {
		p.sideOffset = p.autoSide
	} else {
		p.side.SetOffset(p.autoSide)
	}
	p.main.SetOffset(p.autoMain)
	if !p.folded {
		p.autoSide = p.side.Offset
	}
	p.autoMain = p.main.Offset
}

// FoldInputs folds the inputs pane to a narrow strip (on) or opens it again.
func (w *Window) FoldInputs(on bool) {
	p := &w.panes
	if on == p.folded {
		return
	}
	p.folded = on
	if on {
		p.sideOffset = p.side.Offset
		p.side.Leading = p.rail
		p.side.Refresh()
		p.side.SetOffset(0)
		return
	}
	p.side.Leading = p.inputs
	p.side.Refresh()
	p.side.SetOffset(p.sideOffset)
}

// InputsFolded reports whether the inputs are folded away.
func (w *Window) InputsFolded() bool { return w.panes.folded }

// restoreLayout sets the dividers and the fold from the preferences.
func (w *Window) restoreLayout(pr fyne.Preferences) {
	p := &w.panes
	get := func(key string) float64 {
		v := pr.FloatWithFallback(key, splitDefaults[key])
		if !(v >= 0.05 && v <= 0.95) {
			v = splitDefaults[key]
		}
		return v
	}
	p.auto = pr.FloatWithFallback(prefSplitSide, -1) < 0 && pr.FloatWithFallback(prefSplitMain, -1) < 0
	p.side.Offset = get(prefSplitSide)
	p.main.Offset = get(prefSplitMain)
	p.autoSide, p.autoMain = p.side.Offset, p.main.Offset
	p.centre.Offset = get(prefSplitCentre)
	p.right.Offset = get(prefSplitRight)
	p.sideOffset = p.side.Offset
	if pr.Bool(prefInputsShut) {
		w.FoldInputs(true)
	}
}

// storeLayout writes the dividers and the fold to the preferences.
func (w *Window) storeLayout(pr fyne.Preferences) {
	p := &w.panes
	side := p.side.Offset
	if p.folded {
		side = p.sideOffset
	}
	if p.auto && ((!p.folded && p.side.Offset != p.autoSide) || p.main.Offset != p.autoMain) {
		p.auto = false
	}
	if !p.auto { // while they follow the width, the next start works them out again
		pr.SetFloat(prefSplitSide, side)
		pr.SetFloat(prefSplitMain, p.main.Offset)
	}
	centre := p.centre.Offset
	if p.viewRoom && centre == viewShare {
		centre = p.beforeView // a view's share is not the user's divider
	}
	pr.SetFloat(prefSplitCentre, centre)
	pr.SetFloat(prefSplitRight, p.right.Offset)
	pr.SetBool(prefInputsShut, p.folded)
}

// plotMinHeight is the least height of the chart, sections and map images:
// small enough that the chart–table divider can be dragged down to give the
// table its rows on a laptop screen.
const plotMinHeight = 120
