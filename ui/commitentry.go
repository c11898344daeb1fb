package ui

import (
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/widget"
)

// typingPause is how long typing must rest before the text is taken: long
// enough that a prefix ("5" of "50m") is not evaluated between two keys
// (common practice for search-as-you-type is 300–500 ms; a length or load
// is taken only after a clearly finished pause). Tests that type set it
// longer so a slow machine never commits between two keys.
var typingPause = 1500 * time.Millisecond

// commitEntry is a one-line entry whose text is applied only when committed:
// Enter, leaving the field (Tab or a click elsewhere), or a pause in typing
// of typingPause. Typing alone changes nothing.
type commitEntry struct {
	widget.Entry
	onCommit func(text string) // called on the UI goroutine
	pending  bool              // typed text not yet committed
	timer    *time.Timer
	do       func(func())
	gen      int           // bumped on every key, so a stale timer does nothing
	pause    time.Duration // typingPause when the entry was made
}

// newCommitEntry makes an entry calling commit with its text when committed;
// do runs a function on the UI goroutine (for the pause timer).
func newCommitEntry(do func(func()), commit func(string)) *commitEntry {
	e := &commitEntry{onCommit: commit, do: do, pause: typingPause}
	e.ExtendBaseWidget(e)
	e.OnSubmitted = func(string) { e.commit() }
	return e
}

// typed notes a change of text made by the user and restarts the pause.
func (e *commitEntry) typed() {
	e.pending = true
	e.gen++
	gen := e.gen
	if e.timer != nil {
		e.timer.Stop()
	}
	e.timer = time.AfterFunc(e.pause, func() {
		e.do(func() {
			if gen == e.gen {
				e.commit()
			}
		})
	})
}

// commit applies the typed text, once.
func (e *commitEntry) commit() {
	if e.timer != nil {
		e.timer.Stop()
	}
	if !e.pending {
		return
	}
	e.pending = false
	e.gen++
	if e.onCommit != nil {
		e.onCommit(e.Text)
	}
}

// FocusLost commits the text when the field is left.
func (e *commitEntry) FocusLost() {
	e.Entry.FocusLost()
	e.commit()
}

// Pending reports whether typed text waits to be committed.
func (e *commitEntry) Pending() bool { return e.pending }

// TypedShortcut undoes and redoes typing while there is typed text to
// commit; once the text is committed, Ctrl+Z and Ctrl+Y undo and redo the
// scheme's steps, as they do with any other widget focused.
func (e *commitEntry) TypedShortcut(sc fyne.Shortcut) {
	switch sc.(type) {
	case *fyne.ShortcutUndo, *fyne.ShortcutRedo:
		if !e.pending {
			if c, ok := fyne.CurrentApp().Driver().CanvasForObject(e).(interface{ TypedShortcut(fyne.Shortcut) }); ok {
				c.TypedShortcut(sc)
				return
			}
		}
	}
	e.Entry.TypedShortcut(sc)
}
