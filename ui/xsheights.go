package ui

import (
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"upright/ui/cli"
)

// fitCrossoverHeights gives each crossover in the list the height its
// wrapped description needs at the list's width, so no description is cut.
func (w *Window) fitCrossoverHeights() {
	width := w.xsList.Size().Width - 2*theme.InnerPadding() - 2*theme.Padding() - theme.ScrollBarSize()
	if width <= 0 {
		return
	}
	top := widget.NewLabelWithStyle("X", fyne.TextAlignLeading, fyne.TextStyle{Bold: true}).MinSize().Height
	caption := theme.CaptionTextSize()
	line := fyne.MeasureText("X", caption, fyne.TextStyle{}).Height + theme.LineSpacing()
	for i, x := range w.xs {
		n := wrappedLines(cli.DescribeCrossover(x), caption, width)
		w.xsList.SetItemHeight(i, top+float32(n)*line+2*theme.InnerPadding()+theme.Padding())
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
