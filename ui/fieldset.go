package ui

import (
	"errors"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/layout"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// field is one text input with its error line.
type field struct {
	spec  *fieldSpec
	entry *commitEntry
	err   *widget.Label
	box   *fyne.Container
}

// fieldSet is the text fields of one pane. Each field applies its committed
// text through the pane's edit path, shows the state's text for it and the
// state's problem under it.
type fieldSet struct {
	st      *State                // read only: the pane changes it through its stepper
	ed      stepper               // the edit path of the pane
	do      func(func())          // runs a function on the UI goroutine
	focused func() fyne.Focusable // the widget with the keyboard focus, if any
	quiet   int                   // >0 while the pane sets its entries itself
	byID    map[string]*field     // the fields, by the state's field id
}

// newFieldSet makes an empty set of fields reading st and editing through ed.
func newFieldSet(st *State, ed stepper, do func(func()), focused func() fyne.Focusable) *fieldSet {
	return &fieldSet{st: st, ed: ed, do: do, focused: focused, byID: map[string]*field{}}
}

// add makes the text input of a field spec: its label to the left, the
// entry to the right, and its problem (when there is one) below.
func (fs *fieldSet) add(id string) *field {
	spec := specByID(id)
	f := &field{spec: spec}
	f.entry = newCommitEntry(fs.do, func(text string) { fs.commit(id, text) })
	// No Validator: the state holds each field's problem and showErrors
	// marks the entry (red border and icon) with it.
	f.entry.AlwaysShowValidationError = true
	if spec.hint != "" {
		f.entry.SetPlaceHolder(spec.hint)
	}
	f.err = widget.NewLabel("")
	f.err.Wrapping = fyne.TextWrapWord
	f.err.Importance = widget.DangerImportance
	f.err.SizeName = theme.SizeNameCaptionText
	f.err.Hide()
	f.entry.OnChanged = func(string) {
		if fs.quiet > 0 {
			return
		}
		f.entry.typed()
	}
	lbl := widget.NewLabel(spec.label)
	lbl.Wrapping = fyne.TextWrapWord
	f.box = container.NewVBox(container.NewBorder(nil, nil, fixedWidth(labelWidth, lbl), nil, container.NewVBox(layout.NewSpacer(), f.entry, layout.NewSpacer())), f.err)
	fs.byID[id] = f
	return f
}

// commit applies a field's committed text as one undoable step and shows
// the field as the state now reads it (a bare number with its unit).
func (fs *fieldSet) commit(id, text string) {
	fs.ed.Step("", func(st *State) Outcome { return st.Commit(id, text) })
	fs.setForce(fs.byID[id], fs.st.Text(id))
}

// refresh shows the state's text in every field but the one being typed in.
func (fs *fieldSet) refresh() {
	for id, f := range fs.byID {
		fs.set(f, fs.st.Text(id))
	}
}

// set sets an entry's text without treating it as typing; it leaves an
// entry with the focus alone so typing is not disturbed.
func (fs *fieldSet) set(f *field, text string) {
	if f == nil || f.entry.Text == text {
		return
	}
	if fs.focused != nil && fs.focused() == f.entry {
		return
	}
	fs.setForce(f, text)
}

// setForce sets an entry's text without treating it as typing, even with the focus.
func (fs *fieldSet) setForce(f *field, text string) {
	if f == nil || f.entry.Text == text {
		return
	}
	fs.quiet++
	f.entry.SetText(text)
	fs.quiet--
}

// showErrors puts each field's problem under it.
func (fs *fieldSet) showErrors() {
	for id, f := range fs.byID {
		msg := fs.st.FieldError(id)
		if msg == "" {
			if f.err.Visible() {
				f.err.Hide()
			}
			f.entry.SetValidationError(nil)
			continue
		}
		f.err.SetText(msg)
		f.err.Show()
		f.entry.SetValidationError(errors.New(msg))
	}
}
