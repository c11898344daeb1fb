package ui

import (
	"context"
	"fmt"
	"image"
	"math"
	"sync"
	"sync/atomic"
	"time"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
)

// Request is one thing the engine is asked to show: a valid scheme at its
// current length, with the view choices the chart and trace need.
type Request struct {
	Gen       uint64       // State.Gen when the request was made
	SchemeGen uint64       // State.SchemeGen: a new value builds a new model
	Scheme    model.Scheme // a scheme that validated; its Setting holds the current length
	Range     model.Range  // the chart's length range
	Pinned    []string     // designations pinned to the chart
	Selected  string       // designation whose trace is wanted; "" for none
	Width     int          // chart size in pixels
	Height    int
	DPI       int // chart resolution; 0 for plots.DefaultDPI
}

// Snapshot is the engine's answer to a request: the model, its result at
// the length, and the trace of the selected candidate.
type Snapshot struct {
	Gen       uint64
	SchemeGen uint64
	Model     *model.Model
	Result    *model.Result
	Err       error         // the model could not be built; Model and Result are nil
	Detail    *model.Detail // trace of Request.Selected at the length; nil when none
	DetailOf  string        // the designation Detail belongs to
	Took      time.Duration // time to evaluate (and build, on a new scheme generation)
}

// Crossovers is the engine's list of crossover points for one scheme generation.
type Crossovers struct {
	SchemeGen uint64
	List      []model.Crossover
	Err       error
}

// Engine evaluates, searches crossovers and renders the chart off the UI
// goroutine. It has two workers, an evaluator and a renderer, each of which
// always takes the latest job and drops any it did not get to, so a slow
// chart never holds back the table. It calls its On* functions from its own
// goroutines; the window wraps them in fyne.Do.
type Engine struct {
	// OnSnapshot receives each evaluated request.
	OnSnapshot func(*Snapshot)
	// OnCrossovers receives the crossovers of a scheme generation once found.
	OnCrossovers func(*Crossovers)
	// OnFrame receives the rendered chart; the image is the engine's own
	// buffer, so OnFrame must finish reading it before it returns.
	OnFrame func(img *image.RGBA, info FrameInfo)

	mu        sync.Mutex
	cond      *sync.Cond
	pending   *Request
	job       *renderJob
	evalDone  uint64 // Gen of the last request evaluated
	frameDone uint64 // Gen of the last request drawn (or dropped for a newer one)
	xsDone    uint64 // SchemeGen of the last crossover search finished
	closed    bool

	swatches swatchSet // the curve keys of the last chart (renderer goroutine only)

	wake     chan struct{}
	wakeDraw chan struct{}
	xsCh     chan *Crossovers
	quit     chan struct{}
	wg       sync.WaitGroup

	// owned by the evaluator goroutine
	model     *model.Model
	builder   *chart.Builder
	schemeGen uint64
	xs        []model.Crossover
	cancelXs  context.CancelFunc
	last      *renderJob

	xsVersion uint64

	// owned by the renderer goroutine
	raster       *plots.Raster
	lastKey      string
	markerInside bool // the data area could not be found: plots draws the marker
	renders      atomic.Int64
	renderErr    error
}

// FrameInfo says where the chart's data area lies in a rendered image, so
// the window can draw the current-length marker over it.
type FrameInfo struct {
	Gen       uint64
	SchemeGen uint64
	Units     model.Units     // the display units of the chart
	Area      image.Rectangle // the data area in pixels (see probeDataArea)
	XMin      float64         // length at the left edge of the data area, display units
	XMax      float64         // length at the right edge
	// MarkerDrawn reports that the image carries the marker itself (the data
	// area could not be found), so the window must not draw one.
	MarkerDrawn bool
	// Keys are the swatches of the curves drawn, by designation (see keys.go);
	// the images are the engine's own buffers, read before OnFrame returns.
	Keys []Swatch
}

// Renders returns how many charts the engine has drawn.
func (e *Engine) Renders() int64 { return e.renders.Load() }

// renderJob is one chart to draw.
type renderJob struct {
	req     Request
	res     *model.Result
	model   *model.Model
	builder *chart.Builder
	xs      []model.Crossover
	xsVer   uint64
}

// NewEngine starts an engine; Close stops it.
func NewEngine() *Engine {
	e := &Engine{
		wake:     make(chan struct{}, 1),
		wakeDraw: make(chan struct{}, 1),
		xsCh:     make(chan *Crossovers, 4),
		quit:     make(chan struct{}),
	}
	e.cond = sync.NewCond(&e.mu)
	e.wg.Add(2)
	go e.evalLoop()
	go e.drawLoop()
	return e
}

// Submit hands the engine a request; any request it has not started is dropped.
func (e *Engine) Submit(r Request) {
	e.mu.Lock()
	if e.closed {
		e.mu.Unlock()
		return
	}
	rc := r
	e.pending = &rc
	e.mu.Unlock()
	poke(e.wake)
}

// poke wakes a worker without blocking.
func poke(c chan struct{}) {
	select {
	case c <- struct{}{}:
	default:
	}
}

// Close stops the engine and waits for its goroutines to end.
func (e *Engine) Close() {
	e.mu.Lock()
	if e.closed {
		e.mu.Unlock()
		return
	}
	e.closed = true
	e.cond.Broadcast()
	e.mu.Unlock()
	close(e.quit)
	e.wg.Wait()
}

// Wait blocks until the engine has evaluated and drawn the request of
// generation gen (or a later one) and, when crossovers is true, finished the
// crossover search of scheme generation schemeGen; it reports false on
// timeout or when the engine is closed.
func (e *Engine) Wait(gen, schemeGen uint64, crossovers bool, timeout time.Duration) bool {
	deadline := time.Now().Add(timeout)
	t := time.AfterFunc(timeout, func() {
		e.mu.Lock()
		e.cond.Broadcast()
		e.mu.Unlock()
	})
	defer t.Stop()
	e.mu.Lock()
	defer e.mu.Unlock()
	for !(e.evalDone >= gen && e.frameDone >= gen && (!crossovers || e.xsDone >= schemeGen)) {
		if e.closed || time.Now().After(deadline) {
			return false
		}
		e.cond.Wait()
	}
	return true
}

// WaitEvaluated blocks until the request of generation gen (or a later one)
// is evaluated and handed to OnSnapshot, without waiting for its chart.
func (e *Engine) WaitEvaluated(gen uint64, timeout time.Duration) bool {
	deadline := time.Now().Add(timeout)
	t := time.AfterFunc(timeout, func() {
		e.mu.Lock()
		e.cond.Broadcast()
		e.mu.Unlock()
	})
	defer t.Stop()
	e.mu.Lock()
	defer e.mu.Unlock()
	for e.evalDone < gen {
		if e.closed || time.Now().After(deadline) {
			return false
		}
		e.cond.Wait()
	}
	return true
}

func (e *Engine) mark(field *uint64, v uint64) {
	e.mu.Lock()
	if v > *field {
		*field = v
	}
	e.cond.Broadcast()
	e.mu.Unlock()
}

func (e *Engine) evalLoop() {
	defer e.wg.Done()
	defer func() {
		if e.cancelXs != nil {
			e.cancelXs()
		}
	}()
	for {
		select {
		case <-e.quit:
			return
		case <-e.wake:
			e.mu.Lock()
			r := e.pending
			e.pending = nil
			e.mu.Unlock()
			if r != nil {
				e.handle(r)
			}
		case xr := <-e.xsCh:
			if xr.SchemeGen != e.schemeGen {
				continue // a search for a scheme since replaced
			}
			e.xs = xr.List
			e.xsVersion++
			e.finishXs(xr)
			if e.last != nil {
				j := *e.last
				j.xs, j.xsVer = e.xs, e.xsVersion
				e.draw(&j)
			}
		}
	}
}

// handle builds (when the scheme generation moved) and evaluates one
// request, then hands its chart to the renderer.
func (e *Engine) handle(r *Request) {
	start := time.Now()
	snap := &Snapshot{Gen: r.Gen, SchemeGen: r.SchemeGen}
	if r.SchemeGen != e.schemeGen || e.model == nil {
		e.rebuild(r, snap)
	}
	if snap.Err == nil && e.model != nil {
		m := e.model
		s := m.Scheme.Setting.AtLength(r.Scheme.Setting.LengthMM)
		res, err := m.Evaluate(context.Background(), s)
		if err != nil {
			snap.Err = err
		} else {
			snap.Model, snap.Result = m, res
			if r.Selected != "" {
				if fi, i, ok := m.Find(r.Selected); ok {
					d := m.Detail(fi, i, s)
					snap.Detail, snap.DetailOf = &d, r.Selected
				}
			}
		}
	}
	snap.Took = time.Since(start)
	if e.OnSnapshot != nil {
		e.OnSnapshot(snap)
	}
	e.mark(&e.evalDone, r.Gen)
	if snap.Result == nil {
		e.mark(&e.frameDone, r.Gen)
		return
	}
	e.last = &renderJob{req: *r, res: snap.Result, model: e.model, builder: e.builder, xs: e.xs, xsVer: e.xsVersion}
	e.draw(e.last)
}

// draw hands a chart to the renderer, replacing any it has not started.
func (e *Engine) draw(j *renderJob) {
	e.mu.Lock()
	e.job = j
	e.mu.Unlock()
	poke(e.wakeDraw)
}

// rebuild makes the model of a new scheme generation and starts its crossover search.
func (e *Engine) rebuild(r *Request, snap *Snapshot) {
	if e.cancelXs != nil {
		e.cancelXs()
		e.cancelXs = nil
	}
	e.schemeGen = r.SchemeGen
	e.xs = nil
	e.last = nil
	m, err := model.New(r.Scheme)
	if err != nil {
		e.model, e.builder = nil, nil
		snap.Err = err
		e.finishXs(&Crossovers{SchemeGen: r.SchemeGen, Err: err})
		return
	}
	e.model = m
	e.builder = chart.NewBuilder(m)
	ctx, cancel := context.WithCancel(context.Background())
	e.cancelXs = cancel
	gen, rng := r.SchemeGen, r.Range
	go func() {
		xs, err := m.Crossovers(ctx, m.Scheme.Setting, rng, nil)
		if ctx.Err() != nil {
			return
		}
		select {
		case e.xsCh <- &Crossovers{SchemeGen: gen, List: xs, Err: err}:
		case <-e.quit:
		}
	}()
}

// finishXs reports a finished crossover search.
func (e *Engine) finishXs(xr *Crossovers) {
	if e.OnCrossovers != nil {
		e.OnCrossovers(xr)
	}
	e.mark(&e.xsDone, xr.SchemeGen)
}

func (e *Engine) drawLoop() {
	defer e.wg.Done()
	for {
		select {
		case <-e.quit:
			return
		case <-e.wakeDraw:
			e.mu.Lock()
			j := e.job
			e.job = nil
			e.mu.Unlock()
			if j != nil {
				e.renderJob(j)
				e.mark(&e.frameDone, j.req.Gen)
			}
		}
	}
}

// renderJob draws one chart into the engine's raster and hands it to
// OnFrame. The chart is drawn without the marker, which the window draws
// over it, and only when what it shows changed: the candidates shown, the
// pins, the crossovers, the size. While the data area cannot be found in
// the image the marker is drawn by plots, on every length.
func (e *Engine) renderJob(j *renderJob) {
	r := &j.req
	if e.OnFrame == nil || r.Width < 1 || r.Height < 1 {
		return
	}
	w, h := min(r.Width, plots.MaxPixels), min(r.Height, plots.MaxPixels)
	dpi := r.DPI
	if dpi == 0 {
		dpi = plots.DefaultDPI
	}
	dpi = max(plots.MinDPI, min(plots.MaxDPI, dpi))
	m := j.model
	var pinned []chart.Key
	for _, d := range r.Pinned {
		if fi, i, ok := m.Find(d); ok {
			pinned = append(pinned, chart.Key{Family: fi, Index: i})
		}
	}
	key := fmt.Sprintf("%d|%d|%dx%d@%d|%v|%v", r.SchemeGen, j.xsVer, w, h, dpi, chart.Shown(j.res, pinned), pinned)
	if e.markerInside {
		key += fmt.Sprintf("|%g", r.Scheme.Setting.LengthMM)
	}
	if key == e.lastKey {
		return
	}
	if e.raster == nil {
		rs, err := plots.NewRaster(w, h)
		if err != nil {
			e.renderErr = err
			return
		}
		e.raster = rs
	} else if err := e.raster.Resize(w, h); err != nil {
		e.renderErr = err
		return
	}
	_ = e.raster.SetDPI(dpi)
	ch := j.builder.Chart(j.res, chart.Options{Pinned: pinned, Crossovers: familyChanges(j.xs), Range: r.Range})
	ch.KeyNote = keyNote
	info := FrameInfo{Gen: r.Gen, SchemeGen: r.SchemeGen, Units: m.Scheme.Units}
	if ch.XRange != nil {
		info.XMin, info.XMax = ch.XRange.Min, ch.XRange.Max
	}
	marker := ch.Marker
	if !e.markerInside {
		ch.Marker = nil
	}
	if err := e.raster.Render(&ch); err != nil {
		e.renderErr = err
		return
	}
	e.renders.Add(1)
	if !e.markerInside {
		area, ok := probeDataArea(e.raster.Image())
		if ok && ch.XRange != nil {
			info.Area = area
		} else {
			e.markerInside = true
			ch.Marker = marker
			if err := e.raster.Render(&ch); err != nil {
				e.renderErr = err
				return
			}
			e.renders.Add(1)
			key += fmt.Sprintf("|%g", r.Scheme.Setting.LengthMM)
		}
	}
	info.MarkerDrawn = e.markerInside
	info.Keys = e.swatches.render(&ch, dpi)
	e.renderErr = nil
	e.lastKey = key
	e.OnFrame(e.raster.Image(), info)
}

// familyChanges picks the crossovers the chart marks: where the best family
// changes. The reach of each family's best size lies where its curve meets
// the demand line, which the chart shows anyway; marking those too crowds
// the chart, so they are listed beside it instead.
func familyChanges(xs []model.Crossover) []model.Crossover {
	var out []model.Crossover
	for _, x := range xs {
		if x.Kind == model.KindFamily {
			out = append(out, x)
		}
	}
	return out
}

// chartDPI returns the chart resolution for a canvas scale.
func chartDPI(scale float32) int {
	if scale <= 0 || math.IsNaN(float64(scale)) {
		return plots.DefaultDPI
	}
	return int(math.Round(float64(plots.DefaultDPI) * float64(scale)))
}
