package ui

import "slices"

// picks are the user's choices of what to look at that are not part of the
// scheme: the candidate whose calculation is shown and the candidates
// pinned to the chart. The window keeps them and hands them to the panes
// that show them and to the engine.
type picks struct {
	selected string
	pinned   []string
}

// Select shows the trace of a candidate (by designation) in the calculation view.
func (w *Window) Select(designation string) {
	if designation == w.picks.selected {
		return
	}
	w.picks.selected = designation
	w.showPicks()
	w.submit()
}

// TogglePin adds the selected candidate's curve to the chart, or removes it.
func (w *Window) TogglePin() {
	p := &w.picks
	if p.selected == "" {
		return
	}
	if i := slices.Index(p.pinned, p.selected); i >= 0 {
		p.pinned = slices.Delete(p.pinned, i, i+1)
	} else {
		p.pinned = append(p.pinned, p.selected)
	}
	w.showPicks()
	w.submit()
}

// clearPins takes every pinned curve off the chart.
func (w *Window) clearPins() {
	w.picks.pinned = nil
	w.showPicks()
	w.submit()
}

// showPicks hands the picks to the panes that show them.
func (w *Window) showPicks() {
	w.results.setPicks(w.picks.selected, w.picks.pinned)
	w.calc.setPicks(w.picks.selected, w.picks.pinned)
}
