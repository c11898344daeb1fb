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

// stepper is the edit path of the panes that work on the state's own
// operations (a typed field, a material switched, a slider dragged): each
// Step is one undoable step; the changes of a drag become one step when it
// ends. apply runs on the state and reports what to do next.
type stepper interface {
	editor
	Step(what string, apply func(st *State) Outcome)
	Drag(apply func(st *State) Outcome)
	EndDrag()
}
