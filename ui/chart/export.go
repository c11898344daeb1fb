package chart

import (
	"upright/plots"
	"upright/ui/model"
)

// WithCaution returns the chart with the one-line caution as its footer, as
// every exported image carries it.
func WithCaution(ch plots.Chart) plots.Chart {
	ch.Footer = model.Caution
	return ch
}

// Save writes the chart, with the caution footer, to path (.png, .svg or
// .pdf): the one way the window and the command line export a chart image.
func Save(path string, ch plots.Chart, size plots.Size) error {
	ch = WithCaution(ch)
	return plots.SaveChart(path, &ch, size)
}
