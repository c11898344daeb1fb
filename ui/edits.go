package ui

import (
	"reflect"

	"fyne.io/fyne/v2"

	"upright/ui/model"
)

// edits is the window's one path for changing the scheme: every change
// passes through step, which files it in the undo history and hands the
// outcome to the window.
type edits struct {
	hist     History
	drag     *memo // the state when a slider drag began; nil when none
	undoItem *fyne.MenuItem
	redoItem *fyne.MenuItem
	editMenu *fyne.Menu
}

var _ stepper = (*Window)(nil)

// Edit changes the scheme as one undoable step described by what (empty:
// described from the change itself). It is the editor every pane is given.
func (w *Window) Edit(what string, change func(sc *model.Scheme)) {
	w.step(what, func() Outcome { return w.st.Update(change) })
	w.syncInputs()
}

// Step applies one of the state's own operations as one undoable step
// described by what (empty: described from the change itself).
func (w *Window) Step(what string, apply func(st *State) Outcome) {
	w.step(what, func() Outcome { return apply(w.st) })
}

// Drag applies a change that is part of a slider drag; the whole drag
// becomes one step when EndDrag is called.
func (w *Window) Drag(apply func(st *State) Outcome) {
	w.beginDrag()
	w.after(apply(w.st))
}

// EndDrag files a finished slider drag as one step.
func (w *Window) EndDrag() { w.endDrag() }

// step applies a change of the state as one undoable step and shows it.
func (w *Window) step(what string, apply func() Outcome) Outcome {
	before := memoOf(w.st)
	out := apply()
	w.record(what, before)
	w.after(out)
	return out
}

// record files the step from before to the state as it now stands.
func (w *Window) record(what string, before memo) {
	w.dropDemoName(before)
	after := memoOf(w.st)
	if what == "" {
		what = describeChange(before, after)
	}
	if w.ed.hist.Record(what, before, after) {
		w.updateEditMenu()
	}
}

// beginDrag notes the state when a slider drag starts, so the drag is one step.
func (w *Window) beginDrag() {
	if w.ed.drag == nil {
		m := memoOf(w.st)
		w.ed.drag = &m
	}
}

// endDrag files a finished slider drag as one step.
func (w *Window) endDrag() {
	if w.ed.drag == nil {
		return
	}
	before := *w.ed.drag
	w.ed.drag = nil
	w.record("", before)
}

// Undo returns the scheme to before the last step.
func (w *Window) Undo() {
	w.endDrag()
	if m, ok := w.ed.hist.Undo(memoOf(w.st)); ok {
		w.restore(m, "Undone: ")
	}
}

// Redo makes the last undone step again.
func (w *Window) Redo() {
	w.endDrag()
	if m, ok := w.ed.hist.Redo(memoOf(w.st)); ok {
		w.restore(m, "Redone: ")
	}
}

// UndoLabel returns the Edit menu's undo item text ("Undo: Unbraced length 5.50 m").
func (w *Window) UndoLabel() string { return w.ed.hist.UndoLabel() }

// RedoLabel returns the Edit menu's redo item text.
func (w *Window) RedoLabel() string { return w.ed.hist.RedoLabel() }

// restore loads a state from the history and says so in the status bar.
func (w *Window) restore(m memo, verb string) {
	what := m.what
	if what == "" {
		what = "change"
	}
	out := w.st.Restore(cloneScheme(m.scheme), m.weakBraced)
	w.syncInputs()
	w.after(out)
	w.updateEditMenu()
	w.notify(verb + what)
}

// editMenu makes the Edit menu with undo and redo.
func (w *Window) newEditMenu() *fyne.Menu {
	w.ed.undoItem = fyne.NewMenuItem("Undo", w.Undo)
	w.ed.redoItem = fyne.NewMenuItem("Redo", w.Redo)
	w.ed.editMenu = fyne.NewMenu("Edit", w.ed.undoItem, w.ed.redoItem)
	w.updateEditMenu()
	return w.ed.editMenu
}

// updateEditMenu names the step that undo and redo would take.
func (w *Window) updateEditMenu() {
	if w.ed.undoItem == nil {
		return
	}
	w.ed.undoItem.Label = w.ed.hist.UndoLabel()
	w.ed.undoItem.Disabled = len(w.ed.hist.undo) == 0
	w.ed.redoItem.Label = w.ed.hist.RedoLabel()
	w.ed.redoItem.Disabled = len(w.ed.hist.redo) == 0
	w.ed.editMenu.Refresh()
}

// dropDemoName takes the demo's name off a scheme once it is edited into
// something else, in the same step, so the demo's project name never reaches
// a save or a client report unless the user types it again.
func (w *Window) dropDemoName(before memo) {
	demo := DemoScheme()
	if w.st.Draft.Name != demo.Name || before.scheme.Name != demo.Name || sameButName(w.st.Draft, demo) {
		return
	}
	w.st.Draft.Name = ""
	if w.st.Valid.Name == demo.Name {
		w.st.Valid.Name = ""
	}
	w.inputs.syncName()
	w.updateTitle()
	w.notify("Edited, so the demo's name is removed: name the scheme under Scheme name")
}

// sameButName reports whether two schemes differ at most in their name.
func sameButName(a, b model.Scheme) bool {
	a.Name, b.Name = "", ""
	return reflect.DeepEqual(a, b)
}
