// Package ui is Upright's desktop window, built with Fyne. It stays thin:
// every number it shows comes from the Fyne-free model in ui/model.
package ui

import (
	"fmt"
	"os"
	"runtime/pprof"
	"time"

	"fyne.io/fyne/v2/app"

	"upright/ui/cli"
)

// AppID is the application id; Fyne keeps the preferences under it.
const AppID = "app.upright.columns"

// Run opens the window and returns the exit status when it closes. It
// opens on the last scheme and window size, or the demo scheme at the first start.
func Run(args []string) int {
	if len(args) > 0 {
		fmt.Fprintf(os.Stderr, "upright: unexpected argument %q; run \"upright help\" for the commands\n", args[0])
		return 2
	}
	if displayMissing() {
		return 1
	}
	if path := os.Getenv("UPRIGHT_CPUPROFILE"); path != "" {
		if f, err := os.Create(path); err == nil {
			if pprof.StartCPUProfile(f) == nil {
				// Profiles the first 15 s, for looking at a drag by hand.
				time.AfterFunc(15*time.Second, func() { pprof.StopCPUProfile(); f.Close() })
			}
		}
	}
	a := app.NewWithID(AppID)
	// The window changes widgets from other goroutines only through
	// fyne.Do, so Fyne's per-call thread checks (costly: each reads a
	// goroutine id from a stack trace) are switched off. The flag is added
	// to whatever metadata the build carries, before any window exists.
	meta := a.Metadata()
	if meta.Migrations == nil {
		meta.Migrations = map[string]bool{}
	}
	meta.Migrations["fyneDo"] = true
	if meta.Name == "" {
		meta.Name = "Upright"
	}
	if meta.Version == "" || meta.Version == "0.0.1" {
		meta.Version = cli.Version
	}
	app.SetMetadata(meta)
	prefs := a.Preferences()
	area, areaScale, _ := workArea(a)
	auto := autosavePath(a)
	sc, path, clean, msg := startupScheme(prefs, auto)
	w := NewWindow(a, sc)
	w.files.path, w.files.clean = path, normalised(clean)
	w.updateTitle()
	if auto != "" {
		if err := w.files.startAutosave(auto, autosaveEvery); err != nil && msg == "" {
			msg = "Autosave is off: " + err.Error()
		}
	}
	// Quit from the menu ends the app without the close intercept: the
	// autosave still gets the last scheme.
	a.Lifecycle().SetOnStopped(w.files.stopAutosave)
	w.win.Resize(savedSize(prefs, area))
	if shotsDir() == "" {
		w.refitAfterShow(area, areaScale)
	}
	w.win.SetCloseIntercept(func() {
		storeSize(prefs, w.win.Canvas().Size())
		w.storeLayout(prefs)
		if w.st.HaveValid {
			storeScheme(prefs, w.st.Valid)
		}
		w.closing.Store(true)
		w.files.stopAutosave()
		unregisterWindow(w)
		w.win.Close()
	})
	if msg != "" {
		w.notify(msg)
	}
	if dir := shotsDir(); dir != "" {
		go w.takeShots(dir, area)
	}
	w.win.ShowAndRun()
	go w.eng.Close() // never block the exiting UI goroutine on a worker waiting for it
	return 0
}
