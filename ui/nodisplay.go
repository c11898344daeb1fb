package ui

import (
	"os"
	"runtime"
)

// noDisplayMessage is the one line printed when the window cannot open.
const noDisplayMessage = "upright: the window needs a display and none was found (DISPLAY and WAYLAND_DISPLAY are not set); " +
	"the headless commands work without one: upright compare, crossovers, curve, report (see \"upright help\")"

// haveDisplay reports whether a window can be opened: on Linux and the BSDs
// an X or Wayland display must be named in the environment; elsewhere the
// system always has one.
func haveDisplay(getenv func(string) string) bool {
	switch runtime.GOOS {
	case "linux", "freebsd", "openbsd", "netbsd", "dragonfly":
		return getenv("DISPLAY") != "" || getenv("WAYLAND_DISPLAY") != ""
	}
	return true
}

// displayMissing prints the one-line message when there is no display and
// reports whether Run must stop (exit status 1).
func displayMissing() bool {
	if haveDisplay(os.Getenv) {
		return false
	}
	os.Stderr.WriteString(noDisplayMessage + "\n")
	return true
}
