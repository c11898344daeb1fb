package ui

import (
	"fyne.io/fyne/v2"

	"upright/ui/model"
)

// OpenHook, when set, lets the user pick a scheme file and calls load with
// the scheme read from it. The scheme-file code sets it from an init
// function; load must be called on the UI goroutine (dialog callbacks are).
// While it is nil the Open menu item says "not available".
var OpenHook func(win fyne.Window, load func(model.Scheme))

// SaveHook, when set, saves the scheme on screen, asking where. While it is
// nil the Save menu item says "not available".
var SaveHook func(win fyne.Window, sc model.Scheme)

// ExportHook, when set, writes a report of what the window shows. While it
// is nil the Export menu item says "not available".
var ExportHook func(win fyne.Window, ex Export)

// Export is what the window hands the report exporter: the valid scheme at
// its current length, its model and result, the crossovers found, and the
// pinned and selected candidates.
type Export struct {
	Scheme     model.Scheme
	Model      *model.Model
	Result     *model.Result
	Crossovers []model.Crossover
	Pinned     []string // designations
	Selected   string   // designation; "" when none
}
