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
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"

	"upright/ui/model"
	"upright/ui/units"
	"upright/ui/widgets"
)

// Window is Upright's main window: the inputs, the chart with its length
// slider and crossovers, the results table and the calculation view. Its
// fields are touched only on the UI goroutine; the engine reaches it
// through fyne.Do.
type Window struct {
	app fyne.App
	win fyne.Window
	st  *State
	eng *Engine

	reqGen     uint64 // the last request handed to the engine
	appliedGen uint64 // the last snapshot shown
	snap       *Snapshot
	evalErr    error

	picks picks // the candidate shown in the calculation and those pinned to the chart

	do     func(func()) // runs a function on the UI goroutine (fyne.Do)
	doWait func(func()) // the same, waiting for it (fyne.DoAndWait)

	mailMu     sync.Mutex
	mailSnap   *Snapshot
	mailQueued bool

	quiet      int // >0 while the window sets widgets itself: change callbacks ignore it
	closing    atomic.Bool
	storeTimer *time.Timer
	// OnApplied, when set, is called after each snapshot is shown (tests, timing).
	onApplied func(*Snapshot)
	started   time.Time
	submitted [64]time.Time // when each request was made, for UPRIGHT_TRACE
	firstLog  sync.Once

	// inputs
	fields      map[string]*field
	sketches    map[model.EndCondition]*widgets.EndSketch
	weakCheck   *widget.Check
	twistCheck  *widget.Check  // the weak-axis braces also restrain twisting (steel Lcz)
	nameEntry   *commitEntry   // the scheme's name
	tieSelect   *widget.Select // the near-tie tolerance
	loadMode    *widget.RadioGroup
	directBox   *fyne.Container
	takedownBox *fyne.Container
	directHint  *widget.Label
	liveRed     *widget.Check
	kll         *widget.Select
	occupancy   *widget.Select
	selfWeight  *widget.Check
	method      *widget.RadioGroup
	metric      *widget.Select
	unitsRadio  *widget.RadioGroup
	loadSummary *widget.Label
	matChecks   map[string]*widget.Check
	matProblem  *widget.Label
	opts        materialWidgets
	fire        fireWidgets

	// chart and slider
	chartRaster *canvas.Raster
	front       *image.RGBA
	frame       FrameInfo // where the data area lies in front
	frames      int       // frames shown
	markerLine  *canvas.Line
	markerBox   *canvas.Rectangle
	markerText  *canvas.Text
	wantW       int
	wantH       int
	slider      *lengthSlider
	sliderUnit  *widget.Label
	rangeLabel  *widget.Label
	xsp         *crossoversPane // the crossovers beside the chart

	sections     *sectionsView      // the Sections tab beside the chart
	sectionsTabs *container.AppTabs // the chart and Sections tabs

	results *resultsPane // the results table
	calc    *calcPane    // the calculation view

	// frame
	panes      panes           // the draggable splits and the folded inputs
	inSections []*inputSection // the foldable sections of the inputs
	status     *statusPane     // the banner, the status line and the caution

	files fileState // the scheme's file, unsaved changes, recent files, autosave
	ed    edits     // the undo history and the Edit menu

	mapv *mapView // the Map view beside the chart
	fed  []pane   // the panes fed each snapshot shown (see views.go)
}

// processStart is when the package was initialised, close to the start of the process.
var processStart = time.Now()

// traceOn logs the delay of every snapshot when UPRIGHT_TRACE is set.
var traceOn = os.Getenv("UPRIGHT_TRACE") != ""

// field is one text input with its error line.
type field struct {
	spec  *fieldSpec
	entry *commitEntry
	err   *widget.Label
	box   *fyne.Container
}

// NewWindow builds the window on app a showing sc; it does not show it.
func NewWindow(a fyne.App, sc model.Scheme) *Window {
	return newWindow(a, sc, fyne.Do, fyne.DoAndWait)
}

// newWindow builds the window with the functions that carry the engine's
// results onto the UI goroutine (fyne.Do and fyne.DoAndWait, or in tests a
// lock shared with the test's own actions).
func newWindow(a fyne.App, sc model.Scheme, do, doWait func(func())) *Window {
	w := &Window{app: a, st: NewState(sc), started: time.Now(), do: do, doWait: doWait}
	a.Settings().SetTheme(lightTheme{})
	w.win = a.NewWindow("Upright")
	registerWindow(w)
	w.eng = NewEngine()
	w.eng.OnSnapshot = w.postSnapshot
	w.eng.OnCrossovers = func(x *Crossovers) { w.do(func() { w.applyCrossovers(x) }) }
	w.eng.OnFrame = w.takeFrame
	w.win.SetContent(w.build())
	w.initFiles()
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
	w.stopAutosave()
	unregisterWindow(w)
	w.eng.Close()
	w.mapv.close()
	w.sections.close()
	w.win.Close()
}

// build assembles the window's content.
func (w *Window) build() fyne.CanvasObject {
	inputs := w.buildInputs()
	chartArea, xsPanel := w.buildChartArea()
	chartArea = w.withMapView(chartArea)
	w.results = newResultsPane(func() (units.System, model.Method) { return w.sys(), w.st.Valid.Setting.Method }, w.Select)
	w.calc = newCalcPane(w.TogglePin, w.clearPins)
	w.status = newStatusPane()
	w.fed = append(w.fed, w.results, w.calc, w.status)

	split := w.buildPanes(inputs, chartArea, w.results.Object(), xsPanel, w.calc.Object(), w.status.Banner())

	return container.NewBorder(nil, container.NewVBox(widget.NewSeparator(), w.status.Object()), nil, nil, split)
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
		w.submitted[w.reqGen%uint64(len(w.submitted))] = time.Now()
	}
	scale := float32(1)
	if c := w.win.Canvas(); c != nil {
		scale = c.Scale()
	}
	w.eng.Submit(Request{
		Gen: w.reqGen, SchemeGen: w.st.SchemeGen, Scheme: w.st.Valid, Range: w.st.Range,
		Pinned: append([]string(nil), w.picks.pinned...), Selected: w.picks.selected,
		Width: w.wantW, Height: w.wantH, DPI: chartDPI(scale),
	})
	w.mapv.submit()
}

// after handles the outcome of an input change: fields, banner, slider and engine.
func (w *Window) after(out Outcome) {
	w.showFieldErrors()
	w.updateBanner()
	if out.Rebuild {
		w.xsp.searching()
		w.configureSlider()
	}
	if out.Submit {
		w.placeMarker()
		w.submit()
		w.scheduleStore()
		w.autosaveChanged()
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
	w.mailMu.Lock()
	w.mailSnap = s
	queued := w.mailQueued
	w.mailQueued = true
	w.mailMu.Unlock()
	if !queued {
		w.do(func() {
			w.mailMu.Lock()
			s := w.mailSnap
			w.mailSnap, w.mailQueued = nil, false
			w.mailMu.Unlock()
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
	newScheme := w.snap == nil || w.snap.SchemeGen != s.SchemeGen
	w.snap = s
	w.feed(s)
	if newScheme {
		w.updateLoadSummary()
	}
	w.updateBanner()
	n := 0
	for i := range s.Result.Families {
		n += len(s.Result.Families[i].Rows)
	}
	w.firstLog.Do(func() {
		log.Printf("upright: first evaluation shown %.0f ms after the process started, %.0f ms after the window was created (%d candidates)",
			float64(time.Since(processStart).Microseconds())/1000, float64(time.Since(w.started).Microseconds())/1000, n)
	})
	if traceOn {
		log.Printf("trace: snapshot %d applied %.1f ms after submit (evaluated in %.1f ms), renders %d", s.Gen,
			float64(time.Since(w.submitted[s.Gen%uint64(len(w.submitted))]).Microseconds())/1000, float64(s.Took.Microseconds())/1000, w.eng.Renders())
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

// takeFrame copies a rendered chart into the window's image and shows it.
// It runs on the engine's renderer goroutine and waits for the UI goroutine,
// so the engine never draws into pixels the window is reading.
func (w *Window) takeFrame(img *image.RGBA, info FrameInfo) {
	if w.closing.Load() {
		return
	}
	w.doWait(func() {
		b := img.Bounds()
		if w.front == nil || w.front.Bounds() != b {
			w.front = image.NewRGBA(b)
		}
		copy(w.front.Pix, img.Pix)
		w.results.takeKeys(info.Keys)
		w.frame = info
		w.frames++
		if w.frames == 1 {
			log.Printf("upright: first chart shown %.0f ms after the process started", float64(time.Since(processStart).Microseconds())/1000)
		}
		w.chartRaster.Refresh()
		w.placeMarker()
	})
}

// updateTitle names the scheme in the window title, with a trailing " •"
// while it has unsaved changes.
func (w *Window) updateTitle() {
	name := strings.TrimSpace(w.st.Valid.Name)
	if name == "" {
		name = "Untitled scheme"
	}
	t := "Upright — " + name
	if w.Dirty() {
		t += " •"
	}
	if t != w.files.lastTitle {
		w.files.lastTitle = t
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
