package ui

import (
	"context"
	"errors"
	"fmt"
	"image"
	"math"
	"os"
	"reflect"
	"strings"
	"sync"
	"sync/atomic"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
)

// mapView is the Map view beside the chart: the winning family over
// unbraced length × load (or tributary area). The map is computed and drawn
// on its own goroutine, into reused buffers; a change of input cancels a
// map being computed. Clicking a cell moves the scheme there.
type mapView struct {
	link     drawLink
	st       *State // read only: changes go through ed
	ed       editor
	onPoint  func(lengthMM, load float64, axis model.MapAxis) // a cell tapped
	quiet    int                                              // >0 while the view sets its own check box
	view     fyne.CanvasObject                                // the map with its footer
	raster   *canvas.Raster
	surface  *mapSurface
	status   *widget.Label
	progress *widget.ProgressBar
	inReport *widget.Check // the scheme's ReportMap
	front    *image.RGBA
	shown    mapGeometry // where the cells of the image on screen lie (UI goroutine)
	visible  bool
	wantW    int
	wantH    int
	spec     model.MapSpec // the grid last asked for
	specAxis model.MapAxis // and its vertical axis
	haveSpec bool

	wk mapWorker // the goroutine that computes the maps

	maps      atomic.Int64 // maps computed to the end
	cancelled atomic.Int64 // maps cancelled by a change of input
	frames    atomic.Int64 // images shown
}

// mapKey is what a map's cells depend on: the scheme without its own
// length and load (or area), and the grid.
type mapKey struct {
	sc   model.Scheme
	spec model.MapSpec
}

// mapJob asks the worker for a map of a scheme at a size.
type mapJob struct {
	key      mapKey
	sc       model.Scheme
	w, h     int
	dpi      int
	schemeGn uint64
}

// mapGeometry maps pixels of a shown image to grid cells.
type mapGeometry struct {
	ok        bool
	area      image.Rectangle // cells, in image pixels
	imgW      int
	imgH      int
	lengthsMM []float64
	loads     []float64
	axis      model.MapAxis
}

// mapSurface shows the map image and reports taps.
type mapSurface struct {
	widget.BaseWidget
	raster *canvas.Raster
	onTap  func(pos fyne.Position, size fyne.Size)
}

func newMapSurface(r *canvas.Raster, onTap func(fyne.Position, fyne.Size)) *mapSurface {
	s := &mapSurface{raster: r, onTap: onTap}
	s.ExtendBaseWidget(s)
	return s
}

// CreateRenderer draws the raster.
func (s *mapSurface) CreateRenderer() fyne.WidgetRenderer { return widget.NewSimpleRenderer(s.raster) }

// Tapped moves the scheme to the cell tapped.
func (s *mapSurface) Tapped(ev *fyne.PointEvent) {
	if s.onTap != nil {
		s.onTap(ev.Position, s.Size())
	}
}

// mapWorker is the map view's worker goroutine and what it is handed.
type mapWorker struct {
	mu      sync.Mutex
	pending *mapJob
	cancel  context.CancelFunc // cancels the map being computed
	running *mapKey            // the key of the map being computed
	latest  *mapKey            // the key of the last map computed to the end
	wake    chan struct{}
	quit    chan struct{}
	done    chan struct{}
	closed  bool
}

// mapViewEnv, set to "map", opens the window on the Map view (for screenshots).
const mapViewEnv = "UPRIGHT_VIEW"

// newMapView builds the Map view reading st: a tapped cell is handed to
// onPoint, the report check box changes the scheme through ed and the
// Export button runs onExport. It starts the map's worker.
func newMapView(link drawLink, st *State, ed editor, onPoint func(lengthMM, load float64, axis model.MapAxis), onExport func()) *mapView {
	mv := &mapView{link: link, st: st, ed: ed, onPoint: onPoint}
	mv.wk = mapWorker{wake: make(chan struct{}, 1), quit: make(chan struct{}), done: make(chan struct{})}
	mv.raster = canvas.NewRaster(func(pw, ph int) image.Image {
		if pw != mv.wantW || ph != mv.wantH {
			mv.wantW, mv.wantH = pw, ph
			mv.submit()
		}
		if mv.front == nil {
			return blankImage
		}
		return mv.front
	})
	mv.raster.SetMinSize(fyne.NewSize(420, plotMinHeight))
	mv.surface = newMapSurface(mv.raster, mv.tapped)
	mv.status = widget.NewLabel("")
	mv.status.Truncation = fyne.TextTruncateEllipsis
	mv.progress = widget.NewProgressBar()
	mv.progress.Hide()
	mv.inReport = widget.NewCheck("Map in the client report", func(on bool) {
		if mv.quiet > 0 || on == st.Draft.ReportMap {
			return
		}
		ed.Edit("map in the report", func(sc *model.Scheme) { sc.ReportMap = on })
	})
	export := widget.NewButton("Export…", onExport)
	foot := container.NewBorder(nil, nil, nil, container.NewHBox(mv.inReport, export, fixedWidth(160, mv.progress)), mv.status)
	mv.view = container.NewBorder(nil, foot, nil, nil, mv.surface)
	go mv.loop()
	return mv
}

// setVisible starts or stops following the scheme.
func (mv *mapView) setVisible(on bool) {
	mv.visible = on
	mv.submit()
}

// withMapView adds the Map view as a tab after Chart and Sections, then the
// extra views.
func (w *Window) withMapView(tabs *container.AppTabs) fyne.CanvasObject {
	mv := newMapView(w.link(), w.st, w, w.moveMapPoint, w.ExportMap)
	w.mapv = mv
	item := container.NewTabItem("Map", mv.view)
	prev := tabs.OnSelected
	tabs.Append(item)
	tabs.OnSelected = func(t *container.TabItem) {
		if prev != nil {
			prev(t)
		}
		mv.setVisible(t == item)
	}
	// UPRIGHT_VIEW=map opens on the Map view (screenshots, demonstrations).
	// The figure views take the centre's height while shown.
	roomy := map[*container.TabItem]bool{item: true}
	for _, it := range w.addViews(tabs) {
		roomy[it] = true
	}
	shown := tabs.OnSelected
	tabs.OnSelected = func(t *container.TabItem) {
		shown(t)
		w.roomForView(roomy[t])
	}
	if os.Getenv(mapViewEnv) == "map" {
		tabs.Select(item)
	}
	return tabs
}

// close stops the worker, cancelling any map being computed.
func (mv *mapView) close() {
	if mv == nil {
		return
	}
	mv.wk.mu.Lock()
	if mv.wk.closed {
		mv.wk.mu.Unlock()
		return
	}
	mv.wk.closed = true
	if mv.wk.cancel != nil {
		mv.wk.cancel()
	}
	mv.wk.mu.Unlock()
	close(mv.wk.quit)
	<-mv.wk.done
}

// mapSpecFor keeps the grid still while the scheme's own point stays in it:
// lengths follow the chart's range, and the load (or area) range is chosen
// afresh only when the point leaves it or the axis changes.
func (mv *mapView) mapSpecFor(sc *model.Scheme, r model.Range) model.MapSpec {
	if r.ToMM <= r.FromMM {
		r = model.DefaultRange(sc.Setting.LengthMM, sc.Units)
	}
	v := sc.Load.DirectN
	if model.MapAxisOf(sc) == model.MapTributary {
		v = sc.Load.TributaryM2
	}
	sp := mv.spec
	sp.Lengths = r
	// A point moved to an edge cell reads back rounded by its field: a
	// hair outside the grid still keeps it.
	lo, hi := sp.LoadFrom*(1-1e-2), sp.LoadTo*(1+1e-2)
	if !mv.haveSpec || mv.specAxis != model.MapAxisOf(sc) || v < lo || v > hi || sp.Validate(sc) != nil {
		sp = model.DefaultMapSpec(sc, r)
	}
	sp.Tie = sc.Tie // near-ties follow the scheme's tolerance, as the crossover list does
	return sp
}

// submit asks the worker for the map of the scheme on screen when the view
// is visible; a change of the map's inputs cancels the map being computed.
func (mv *mapView) submit() {
	if mv == nil {
		return
	}
	w := mv
	if w.st.HaveValid && mv.inReport.Checked != w.st.Valid.ReportMap {
		mv.quiet++
		mv.inReport.SetChecked(w.st.Valid.ReportMap)
		mv.quiet--
	}
	if !mv.visible || !w.st.HaveValid || mv.wantW < 1 || mv.wantH < 1 {
		return
	}
	sc := w.st.Valid
	sp := mv.mapSpecFor(&sc, w.st.Range)
	mv.spec, mv.haveSpec, mv.specAxis = sp, true, model.MapAxisOf(&sc)
	job := &mapJob{key: keyOf(sc, sp), sc: sc, w: mv.wantW, h: mv.wantH, dpi: chartDPI(mv.link.scale()), schemeGn: w.st.SchemeGen}
	mv.wk.mu.Lock()
	if mv.wk.closed {
		mv.wk.mu.Unlock()
		return
	}
	mv.wk.pending = job
	if mv.wk.cancel != nil && mv.wk.running != nil && !reflect.DeepEqual(*mv.wk.running, job.key) {
		mv.wk.cancel()
	}
	mv.wk.mu.Unlock()
	poke(mv.wk.wake)
}

// keyOf returns the map key of a scheme and grid: the scheme's own length
// (keeping the weak-axis fraction) and load or area are left out.
func keyOf(sc model.Scheme, sp model.MapSpec) mapKey {
	if sc.Setting.LengthMM > 0 {
		sc.Setting.WeakMM /= sc.Setting.LengthMM
	}
	sc.Setting.LengthMM = 0
	if model.MapAxisOf(&sc) == model.MapTributary {
		sc.Load.TributaryM2 = 0
	} else {
		sc.Load.DirectN = 0
	}
	sc.Name, sc.ReportMap = "", false
	return mapKey{sc: sc, spec: sp}
}

// loop is the map worker: it takes the latest job, computes the map when
// its key changed (cancellable), and draws it with the scheme's point.
func (mv *mapView) loop() {
	defer close(mv.wk.done)
	var (
		mp     model.Mapper
		ras    *plots.MapRaster
		have   *model.WinMap
		haveK  *mapKey
		failed error
	)
	for {
		select {
		case <-mv.wk.quit:
			return
		case <-mv.wk.wake:
		}
		mv.wk.mu.Lock()
		job := mv.wk.pending
		mv.wk.pending = nil
		var ctx context.Context
		if job != nil && (haveK == nil || !reflect.DeepEqual(*haveK, job.key)) {
			ctx, mv.wk.cancel = context.WithCancel(context.Background())
			k := job.key
			mv.wk.running = &k
		}
		mv.wk.mu.Unlock()
		if job == nil {
			continue
		}
		if ctx != nil {
			have, haveK, failed = nil, nil, nil
			mv.link.do(func() {
				mv.status.SetText("Computing the map…")
				mv.progress.SetValue(0)
				mv.progress.Show()
			})
			g, err := mp.Compute(ctx, job.sc, job.key.spec, func(done, total int) {
				mv.link.do(func() { mv.progress.SetValue(float64(done) / float64(total)) })
			})
			mv.wk.mu.Lock()
			mv.wk.cancel()
			mv.wk.cancel, mv.wk.running = nil, nil
			mv.wk.mu.Unlock()
			if errors.Is(err, context.Canceled) {
				mv.cancelled.Add(1)
				continue // a newer job is pending
			}
			if err != nil {
				failed = err
			} else {
				have = g
				k := job.key
				haveK = &k
				mv.wk.mu.Lock()
				mv.wk.latest = &k
				mv.wk.mu.Unlock()
				mv.maps.Add(1)
			}
		}
		if failed != nil {
			msg := "The map could not be computed: " + failed.Error()
			mv.link.do(func() {
				mv.progress.Hide()
				mv.status.SetText(msg)
			})
			continue
		}
		if have == nil {
			continue
		}
		// The scheme's own point moves without recomputing the cells.
		have.PointLengthMM = job.sc.Setting.LengthMM
		have.PointLoad = job.sc.Load.DirectN
		if have.Axis == model.MapTributary {
			have.PointLoad = job.sc.Load.TributaryM2
		}
		if ras == nil {
			r, err := plots.NewMapRaster(job.w, job.h)
			if err != nil {
				continue
			}
			ras = r
		} else if err := ras.Resize(job.w, job.h); err != nil {
			continue
		}
		if err := ras.SetDPI(job.dpi); err != nil {
			_ = ras.SetDPI(plots.DefaultDPI)
		}
		pm := chart.Map(have, &job.sc, "")
		if err := ras.RenderMap(&pm); err != nil {
			msg := "The map could not be drawn: " + err.Error()
			mv.link.do(func() { mv.status.SetText(msg) })
			continue
		}
		geo := mapGeometry{ok: true, area: ras.CellsArea(), imgW: job.w, imgH: job.h, axis: have.Axis,
			lengthsMM: append([]float64(nil), have.LengthsMM...), loads: append([]float64(nil), have.Loads...)}
		status := mapStatus(have)
		img := ras.Image()
		if mv.link.closing.Load() {
			return
		}
		mv.link.doWait(func() {
			b := img.Bounds()
			if mv.front == nil || mv.front.Bounds() != b {
				mv.front = image.NewRGBA(b)
			}
			copy(mv.front.Pix, img.Pix)
			mv.shown = geo
			mv.progress.Hide()
			mv.status.SetText(status)
			mv.raster.Refresh()
			mv.frames.Add(1)
		})
	}
}

// mapStatus says what the map shows and how to use it.
func mapStatus(g *model.WinMap) string {
	won := 0 // families shown in at least one of the map's cells (the legend explains near-ties)
	for fi := range g.Families {
		for k := range g.Cells {
			if g.Cells[k].Shown == fi {
				won++
				break
			}
		}
	}
	return fmt.Sprintf("%d families win. Click a cell to move there.", won)
}

// tapped moves the scheme to the length and load (or area) of the cell under pos.
func (mv *mapView) tapped(pos fyne.Position, size fyne.Size) {
	g := mv.shown
	if !g.ok || size.Width <= 0 || size.Height <= 0 {
		return
	}
	px := float64(pos.X) / float64(size.Width) * float64(g.imgW)
	py := float64(pos.Y) / float64(size.Height) * float64(g.imgH)
	i, j, ok := g.cellAt(px, py)
	if !ok {
		return
	}
	mv.onPoint(g.lengthsMM[j], g.loads[i], g.axis)
}

// cellAt returns the row and column of the cell at an image pixel.
func (g *mapGeometry) cellAt(px, py float64) (i, j int, ok bool) {
	a := g.area
	if a.Dx() <= 0 || a.Dy() <= 0 || px < float64(a.Min.X) || px > float64(a.Max.X) || py < float64(a.Min.Y) || py > float64(a.Max.Y) {
		return 0, 0, false
	}
	nx, ny := len(g.lengthsMM), len(g.loads)
	j = int(math.Floor((px - float64(a.Min.X)) / float64(a.Dx()) * float64(nx)))
	i = int(math.Floor((float64(a.Max.Y) - py) / float64(a.Dy()) * float64(ny)))
	return min(max(i, 0), ny-1), min(max(j, 0), nx-1), true
}

// moveMapPoint sets the scheme's load (or tributary area) and length, as
// typing them would.
func (w *Window) moveMapPoint(lengthMM, load float64, axis model.MapAxis) {
	id := "load"
	if axis == model.MapTributary {
		id = "tributary"
	}
	f := specByID(id)
	if f == nil {
		return
	}
	before := memoOf(w.st)
	typed := w.st.SetText(id, f.format(load, w.sys()))
	out := w.st.SetLength(lengthMM)
	out.Rebuild = out.Rebuild || typed.Rebuild
	w.after(out)
	what := "map point: " + f.label + " " + w.st.Text(id) + ", length " + w.st.Text("length")
	w.record(what, before)
	w.notify("Map click set " + strings.TrimPrefix(what, "map point: ") + " (Ctrl+Z undoes it)")
}

// viewShare is the share of the centre column a figure view (the Map, the
// Variants, the Building) takes while it shows: a figure needs height to be
// read; the table folds to a few rows below it and comes back when the
// Chart or Sections tab is chosen.
const viewShare = 0.74

// roomForView gives a figure view the centre's height while it shows and
// gives the table its rows back after; a divider the user dragged while
// the view showed is kept.
func (w *Window) roomForView(on bool) {
	c := w.panes.centre
	if c == nil {
		return
	}
	switch {
	case on && !w.panes.viewRoom:
		w.panes.beforeView, w.panes.viewRoom = c.Offset, true
		if c.Offset < viewShare {
			c.SetOffset(viewShare)
		}
	case !on && w.panes.viewRoom:
		w.panes.viewRoom = false
		if c.Offset == viewShare {
			c.SetOffset(w.panes.beforeView)
		}
	}
}
