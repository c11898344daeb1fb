package ui

import (
	"fyne.io/fyne/v2"

	"upright/ui/model"
)

// pane is one part of the window: it owns its widgets and is fed each
// evaluated snapshot; it never reaches into another pane.
type pane interface {
	// Object returns the pane's content for the window's layout.
	Object() fyne.CanvasObject
	// Show shows an evaluated snapshot; it runs on the UI goroutine.
	Show(s *Snapshot)
}

// editor is the one path by which a pane changes the scheme; every edit is
// one undoable step, described for the Edit menu ("length 5.5 m").
type editor interface {
	Edit(what string, change func(sc *model.Scheme))
}
