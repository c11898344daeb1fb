package ui

import (
	"strconv"
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/widget"

	"upright/ui/model"
)

// tieChoices are the near-tie tolerances the window offers, in percent.
var tieChoices = []float64{0, 2, 5, 10, 15, 20}

// tieLabel writes a tolerance (a fraction) as the choice shows it.
func tieLabel(tie float64) string {
	if tie == 0 {
		return "none"
	}
	return strings.TrimPrefix(model.TieText(tie), "within ")
}

// buildTieSelect makes the near-tie tolerance setting: the best family
// changes only when another beats it by more than this share of the metric.
func (p *inputsPane) buildTieSelect() fyne.CanvasObject {
	var opts []string
	for _, pc := range tieChoices {
		opts = append(opts, tieLabel(pc/100))
	}
	p.tieSelect = widget.NewSelect(opts, func(s string) {
		v, ok := parseTieLabel(s)
		if !ok {
			return
		}
		p.change(func(sc *model.Scheme) { sc.Tie = v })
	})
	return row("Near-tie tolerance", p.tieSelect)
}

// parseTieLabel reads a choice back into a fraction.
func parseTieLabel(s string) (float64, bool) {
	if s == "none" {
		return 0, true
	}
	v, err := strconv.ParseFloat(strings.TrimSuffix(s, "%"), 64)
	return v / 100, err == nil
}

// syncTie shows the scheme's tolerance, adding it to the choices when a file
// brought another value.
func (p *inputsPane) syncTie() {
	if p.tieSelect == nil {
		return
	}
	l := tieLabel(p.st.Draft.Tie)
	found := false
	for _, o := range p.tieSelect.Options {
		found = found || o == l
	}
	if !found {
		p.tieSelect.Options = append(p.tieSelect.Options, l)
	}
	p.quiet++
	p.tieSelect.SetSelected(l)
	p.quiet--
}
