package ui

import (
	"image"
	"log"
	"os"
	"strings"
	"sync"
	"sync/atomic"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"

	"upright/ui/model"
	"upright/ui/units"
)

// Window is Upright's main window. It lays the panes out (inputs, chart,
// view tabs, results table, crossovers, calculation, status), keeps the
// state and the engine, files every change of the scheme as one undoable
// step and routes each evaluated snapshot to the panes. Its fields are
// touched only on the UI goroutine; the engine reaches it through w.do.
type Window struct {
	app fyne.App
	win fyne.Window
	st  *State
	eng *Engine

	reqGen     uint64 // the last request handed to the engine
	appliedGen uint64 // the last snapshot shown
	snap       *Snapshot
	evalErr    error
	picks      picks // the candidate shown in the calculation and those pinned to the chart

	do     func(func()) // runs a function on the UI goroutine (fyne.Do)
	doWait func(func()) // the same, waiting for it (fyne.DoAndWait)
	mail   mailbox      // the newest snapshot waiting for the UI goroutine

	closing    atomic.Bool
	storeTimer *time.Timer
	// onApplied, when set, is called after each snapshot is shown (tests, timing).
	onApplied func(*Snapshot)
	clock     timing

	// the panes
	inputs   *inputsPane
	chart    *chartPane
	xsp      *crossoversPane    // the crossovers beside the chart
	sections *sectionsView      // the Sections tab beside the chart
	mapv     *mapView           // the Map tab beside the chart
	viewTabs *container.AppTabs // Chart, Sections, Map and the extra views
	results  *resultsPane
	calc     *calcPane
	status   *statusPane // the banner, the status line and the caution
	fed      []pane      // the panes fed each snapshot shown (see views.go)

	panes panes      // the draggable splits and the folded inputs
	files *filesPane // the scheme's file, unsaved changes, recent files, autosave, exports
	ed    edits      // the undo history and the Edit menu
}

// mailbox holds the newest snapshot the engine posted until the UI
// goroutine takes it.
type mailbox struct {
	mu     sync.Mutex
	snap   *Snapshot
	queued bool
}

// timing is when the window was made and when each request was, for the
// start-up log line and UPRIGHT_TRACE.
type timing struct {
	started   time.Time
	submitted [64]time.Time
	firstLog  sync.Once
}

// processStart is when the package was initialised, close to the start of the process.
var processStart = time.Now()

// traceOn logs the delay of every snapshot when UPRIGHT_TRACE is set.
var traceOn = os.Getenv("UPRIGHT_TRACE") != ""

// NewWindow builds the window on app a showing sc; it does not show it.
func NewWindow(a fyne.App, sc model.Scheme) *Window {
	return newWindow(a, sc, fyne.Do, fyne.DoAndWait)
}

// newWindow builds the window with the functions that carry the engine's
// results onto the UI goroutine (fyne.Do and fyne.DoAndWait, or in tests a
// lock shared with the test's own actions).
func newWindow(a fyne.App, sc model.Scheme, do, doWait func(func())) *Window {
	w := &Window{app: a, st: NewState(sc), do: do, doWait: doWait}
	w.clock.started = time.Now()
	a.Settings().SetTheme(lightTheme{})
	w.win = a.NewWindow("Upright")
	registerWindow(w)
	w.eng = NewEngine()
	w.eng.OnSnapshot = w.postSnapshot
	w.eng.OnCrossovers = func(x *Crossovers) { w.do(func() { w.applyCrossovers(x) }) }
	w.eng.OnFrame = w.takeFrame
	w.win.SetContent(w.build())
	w.files = newFilesPane(w.win, a.Preferences(), w.st, w, w.do)
	w.win.SetMainMenu(w.mainMenu())
	w.addShortcuts()
	w.syncInputs()
	w.updateTitle()
	w.updateBanner()
	w.submit()
	return w
}

// Close stops the engine and closes the window.
func (w *Window) Close() {
	w.closing.Store(true)
	w.files.stopAutosave()
	unregisterWindow(w)
	w.eng.Close()
	w.mapv.close()
	w.sections.close()
	w.win.Close()
}

// build makes the panes and lays them out.
func (w *Window) build() fyne.CanvasObject {
	w.inputs = newInputsPane(w.st, w, w.do, w.focused, w.app.Preferences())
	w.chart = newChartPane(w.st, w, w.do, w.win, w.submit)
	w.xsp = newCrossoversPane(w, w.sys, func() model.Range { return w.st.Range })
	w.results = newResultsPane(func() (units.System, model.Method) { return w.sys(), w.st.Valid.Setting.Method }, w.Select)
	w.calc = newCalcPane(w.TogglePin, w.clearPins)
	w.status = newStatusPane()
	w.fed = append(w.fed, w.inputs, w.results, w.calc, w.status) // the chart is fed frames (takeFrame)

	// One row of view tabs over the slider: Chart, Sections, Map, then the extra views.
	views := w.withMapView(w.plotViews(w.chart.Object()))
	// The banner floats over the views under their tab bar: showing or
	// clearing it moves nothing and leaves no band behind.
	chartArea := container.NewStack(container.NewBorder(nil, w.chart.Controls(), nil, nil, views), w.status.BannerUnder(w.viewTabs))
	split := w.buildPanes(w.inputs.Object(), chartArea, w.results.Object(), w.xsp.Object(), w.calc.Object())
	return container.NewBorder(nil, container.NewVBox(widget.NewSeparator(), w.status.Object()), nil, nil, split)
}

// focused returns the widget with the keyboard focus, if any.
func (w *Window) focused() fyne.Focusable {
	if c := w.win.Canvas(); c != nil {
		return c.Focused()
	}
	return nil
}

// syncInputs sets every input widget from the state.
func (w *Window) syncInputs() {
	w.inputs.sync()
	w.chart.sync()
}

// sys is the display system of the inputs.
func (w *Window) sys() units.System { return w.st.Sys() }

// submit hands the engine the valid scheme with the view choices.
func (w *Window) submit() {
	if !w.st.HaveValid {
		return
	}
	w.reqGen++
	if traceOn {
		w.clock.submitted[w.reqGen%uint64(len(w.clock.submitted))] = time.Now()
	}
	scale := float32(1)
	if c := w.win.Canvas(); c != nil {
		scale = c.Scale()
	}
	cw, ch := w.chart.size()
	w.eng.Submit(Request{
		Gen: w.reqGen, SchemeGen: w.st.SchemeGen, Scheme: w.st.Valid, Range: w.st.Range,
		Pinned: append([]string(nil), w.picks.pinned...), Selected: w.picks.selected,
		Width: cw, Height: ch, DPI: chartDPI(scale),
	})
	w.mapv.submit()
}

// after shows the outcome of a change of the state in every pane and
// hands a valid scheme to the engine.
func (w *Window) after(out Outcome) {
	w.inputs.refresh()
	w.chart.refresh(out.Rebuild)
	w.updateBanner()
	if out.Rebuild {
		w.xsp.searching()
	}
	if out.Submit {
		w.chart.placeMarker()
		w.submit()
		w.scheduleStore()
		w.files.autosaveChanged()
	}
	w.updateTitle()
}

// storeDelay is how long the inputs must rest before they are stored in
// the preferences: a drag stores once, when it stops.
const storeDelay = 800 * time.Millisecond

// scheduleStore stores the valid scheme in the preferences once the inputs
// have rested for storeDelay.
func (w *Window) scheduleStore() {
	if w.storeTimer != nil {
		w.storeTimer.Stop()
	}
	w.storeTimer = time.AfterFunc(storeDelay, func() {
		if w.closing.Load() {
			return
		}
		w.do(func() {
			if w.st.HaveValid {
				storeScheme(w.app.Preferences(), w.st.Valid)
			}
		})
	})
}

// postSnapshot hands a snapshot to the UI goroutine. Snapshots are
// coalesced: while one is waiting to be shown a newer one replaces it, so
// the UI goroutine never works through a backlog.
func (w *Window) postSnapshot(s *Snapshot) {
	w.mail.mu.Lock()
	w.mail.snap = s
	queued := w.mail.queued
	w.mail.queued = true
	w.mail.mu.Unlock()
	if !queued {
		w.do(func() {
			w.mail.mu.Lock()
			s := w.mail.snap
			w.mail.snap, w.mail.queued = nil, false
			w.mail.mu.Unlock()
			if s != nil {
				w.applySnapshot(s)
			}
		})
	}
}

// applySnapshot shows an evaluated request; stale ones are dropped: older
// than the one on screen, or of a scheme generation since replaced.
func (w *Window) applySnapshot(s *Snapshot) {
	if s.Gen <= w.appliedGen || s.SchemeGen != w.st.SchemeGen {
		return
	}
	w.appliedGen = s.Gen
	if s.Err != nil {
		w.evalErr = s.Err
		w.updateBanner()
		return
	}
	w.evalErr = nil
	w.snap = s
	w.feed(s)
	w.updateBanner()
	n := 0
	for i := range s.Result.Families {
		n += len(s.Result.Families[i].Rows)
	}
	w.clock.firstLog.Do(func() {
		log.Printf("upright: first evaluation shown %.0f ms after the process started, %.0f ms after the window was created (%d candidates)",
			float64(time.Since(processStart).Microseconds())/1000, float64(time.Since(w.clock.started).Microseconds())/1000, n)
	})
	if traceOn {
		log.Printf("trace: snapshot %d applied %.1f ms after submit (evaluated in %.1f ms), renders %d", s.Gen,
			float64(time.Since(w.clock.submitted[s.Gen%uint64(len(w.clock.submitted))]).Microseconds())/1000, float64(s.Took.Microseconds())/1000, w.eng.Renders())
	}
	if w.onApplied != nil {
		w.onApplied(s)
	}
}

// applyCrossovers lists the crossovers of the current scheme generation.
func (w *Window) applyCrossovers(x *Crossovers) {
	if x.SchemeGen != w.st.SchemeGen {
		return
	}
	w.xsp.setList(x.SchemeGen, x.List, x.Err)
}

// takeFrame hands a rendered chart to the chart pane and its curve keys to
// the results table. It runs on the engine's renderer goroutine and waits
// for the UI goroutine, so the engine never draws into pixels being read.
func (w *Window) takeFrame(img *image.RGBA, info FrameInfo) {
	if w.closing.Load() {
		return
	}
	w.doWait(func() {
		w.chart.takeFrame(img, info)
		w.results.takeKeys(info.Keys)
	})
}

// updateTitle names the scheme in the window title, with a trailing " •"
// while it has unsaved changes.
func (w *Window) updateTitle() {
	if t, changed := w.files.title(); changed {
		w.win.SetTitle(t)
	}
}

// updateBanner shows, while the inputs are invalid, that the result on
// screen is the last valid one and which fields to fix.
func (w *Window) updateBanner() {
	probs := w.st.Problems()
	var msg string
	switch {
	case len(probs) > 0 && w.snap != nil:
		var names []string
		for _, p := range probs {
			names = append(names, p.Label)
		}
		msg = "Showing the last valid result: fix " + strings.Join(names, ", ") + ". " + probs[0].Msg
	case len(probs) > 0:
		msg = "Nothing to show yet: fix " + probs[0].Label + ". " + probs[0].Msg
	case w.evalErr != nil && w.snap != nil:
		msg = "Showing the last valid result: this scheme could not be evaluated: " + w.evalErr.Error()
	case w.evalErr != nil:
		msg = "This scheme could not be evaluated: " + w.evalErr.Error()
	case len(model.Materials()) == 0:
		msg = "No materials are registered in this build, so there is nothing to compare."
	}
	w.status.setBanner(msg)
}

// fixedLayout holds its objects at one size whatever they hold.
type fixedLayout struct{ size fyne.Size }

// Layout gives each object the fixed size.
func (l *fixedLayout) Layout(objs []fyne.CanvasObject, _ fyne.Size) {
	for _, o := range objs {
		o.Move(fyne.NewPos(0, 0))
		o.Resize(l.size)
	}
}

// MinSize is the fixed size.
func (l *fixedLayout) MinSize([]fyne.CanvasObject) fyne.Size { return l.size }
