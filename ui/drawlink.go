package ui

import (
	"sync/atomic"

	"fyne.io/fyne/v2"
)

// drawLink is what a view that draws off the UI goroutine needs of the
// window: a way onto the UI goroutine, whether the window is closing and
// the screen's scale for the image's resolution.
type drawLink struct {
	do      func(func()) // runs a function on the UI goroutine
	doWait  func(func()) // the same, waiting for it
	closing *atomic.Bool // set once the window is closing
	win     fyne.Window  // for the canvas scale
}

// scale is the canvas scale of the window, 1 before it has a canvas.
func (l drawLink) scale() float32 {
	if l.win != nil {
		if c := l.win.Canvas(); c != nil {
			return c.Scale()
		}
	}
	return 1
}

// link returns the window's drawLink.
func (w *Window) link() drawLink {
	return drawLink{do: w.do, doWait: w.doWait, closing: &w.closing, win: w.win}
}
