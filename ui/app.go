// Package ui is Upright's desktop window, built with Fyne. It stays thin:
// every number it shows comes from the Fyne-free model in ui/model.
package ui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/app"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"

	"upright/ui/model"
)

// Run opens the window and returns the exit status when it closes.
func Run(args []string) int {
	a := app.NewWithID("app.upright.columns")
	w := a.NewWindow("Upright")
	w.SetContent(container.NewVBox(
		widget.NewLabel("Upright: column scheme comparison"),
		widget.NewLabel(model.Caution),
	))
	w.Resize(fyne.NewSize(900, 600))
	w.ShowAndRun()
	return 0
}
