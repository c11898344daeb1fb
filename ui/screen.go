package ui

import (
	"time"

	"fyne.io/fyne/v2"
)

// windowDefaults are the sizes the window may open at on a first start,
// largest first: it opens at the largest that fits the monitor's work area.
// The last is laid out for a 1280×720 screen (a 1920×1080 laptop at 150%)
// with a taskbar.
var windowDefaults = []fyne.Size{
	{Width: 1840, Height: 990},
	{Width: 1480, Height: 920},
	{Width: 1340, Height: 680},
	{Width: 1240, Height: 640},
}

// windowFrame is the room a window manager takes around the content for a
// title bar and borders; a size that fits leaves it free.
var windowFrame = fyne.NewSize(16, 40)

// minWindowSize is the smallest window the layout is made for (and the
// smallest size remembered).
var minWindowSize = fyne.NewSize(1000, 560)

// room is the content size the work area leaves once the window frame is
// taken off; ok is false when the work area is unknown.
func room(area fyne.Size) (fyne.Size, bool) {
	if !(area.Width > 0 && area.Height > 0) {
		return fyne.Size{}, false
	}
	return fyne.NewSize(area.Width-windowFrame.Width, area.Height-windowFrame.Height), true
}

// firstSize returns the size of a first start on a work area (device-
// independent pixels): the largest default that fits, else the work area
// less the frame (never below minWindowSize). With no work area known it
// is the second default, which suits the common 1920×1080 screen.
func firstSize(area fyne.Size) fyne.Size {
	r, ok := room(area)
	if !ok {
		return windowDefaults[1]
	}
	for _, d := range windowDefaults {
		if d.Width <= r.Width && d.Height <= r.Height {
			return d
		}
	}
	return fyne.NewSize(max(r.Width, minWindowSize.Width), max(r.Height, minWindowSize.Height))
}

// clampSize returns a remembered size made to fit the work area, as
// firstSize does: a window saved on a larger monitor comes back no larger
// than this one allows, and never below minWindowSize.
func clampSize(s fyne.Size, area fyne.Size) fyne.Size {
	s = fyne.NewSize(max(s.Width, minWindowSize.Width), max(s.Height, minWindowSize.Height))
	r, ok := room(area)
	if !ok {
		return s
	}
	return fyne.NewSize(max(min(s.Width, r.Width), minWindowSize.Width), max(min(s.Height, r.Height), minWindowSize.Height))
}

// refitDelay is how long after the start the window checks its real scale.
const refitDelay = 600 * time.Millisecond

// refitAfterShow checks, once the window is on screen and its real scale is
// known, that it still fits the work area found before it was shown (at an
// estimated scale), and shrinks it when it does not.
func (w *Window) refitAfterShow(area fyne.Size, assumed float32) {
	if _, ok := room(area); !ok || assumed <= 0 {
		return
	}
	time.AfterFunc(refitDelay, func() {
		if w.closing.Load() {
			return
		}
		w.do(func() {
			c := w.win.Canvas()
			real := c.Scale()
			if real <= 0 {
				return
			}
			a := fyne.NewSize(area.Width*assumed/real, area.Height*assumed/real)
			now := c.Size()
			if fit := clampSize(now, a); fit != now {
				w.win.Resize(fit)
			}
		})
	})
}
