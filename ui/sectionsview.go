package ui

import (
	"fmt"
	"image"
	"os"
	"strings"
	"sync"
	"sync/atomic"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/driver/desktop"
	"fyne.io/fyne/v2/widget"

	"upright/plots"
	"upright/ui/chart"
)

// sectionsView is the Sections tab beside the chart: the best working size
// of each family drawn in plan at one scale. It follows every snapshot the
// window shows while the tab is open, drawing on its own goroutine into a
// reused image, and only when what it shows changes (the sizes, the
// selection, the units, the image size), so a slider drag that keeps the
// same sizes costs nothing. Tapping a section selects that candidate.
type sectionsView struct {
	link     drawLink
	selected func() string            // the candidate selected in the window
	onSelect func(designation string) // a section tapped
	area     *sectionsArea
	raster   *canvas.Raster
	visible  bool
	wantW    int
	wantH    int
	last     *Snapshot // the snapshot last handed over, for a redraw on resize or when shown

	// shown (UI goroutine)
	front  *image.RGBA
	layout plots.PlanLayout
	shown  []string // designation of each drawn section

	// worker
	mu      sync.Mutex
	job     *sectionsJob
	wake    chan struct{}
	quit    chan struct{}
	closed  atomic.Bool
	rast    *plots.Raster // owned by the worker
	lastKey string        // owned by the worker
	renders atomic.Int64
}

// sectionsJob is one figure to draw.
type sectionsJob struct {
	snap     *Snapshot
	selected string
	w, h     int
	dpi      int
}

// newSectionsView builds the view and starts its drawing goroutine.
func newSectionsView(link drawLink, selected func() string, onSelect func(string)) *sectionsView {
	v := &sectionsView{link: link, selected: selected, onSelect: onSelect, wake: make(chan struct{}, 1), quit: make(chan struct{})}
	v.raster = canvas.NewRaster(func(pw, ph int) image.Image {
		if pw != v.wantW || ph != v.wantH {
			v.wantW, v.wantH = pw, ph
			v.request()
		}
		if v.front == nil {
			return blankImage
		}
		return v.front
	})
	v.raster.SetMinSize(fyne.NewSize(420, plotMinHeight))
	v.area = newSectionsArea(v)
	go v.loop()
	return v
}

// plotViews puts the chart and the Sections view in tabs above the slider.
func (w *Window) plotViews(chartView fyne.CanvasObject) *container.AppTabs {
	w.sections = newSectionsView(w.link(), func() string { return w.picks.selected }, w.Select)
	w.fed = append(w.fed, w.sections)
	tabs := container.NewAppTabs(
		container.NewTabItem("Chart", chartView),
		container.NewTabItem("Sections", w.sections.area),
	)
	tabs.OnSelected = func(t *container.TabItem) {
		w.sections.setVisible(t.Content == w.sections.area)
	}
	w.viewTabs = tabs
	// UPRIGHT_VIEW=sections opens on the Sections tab (screenshots, demonstrations).
	if os.Getenv("UPRIGHT_VIEW") == "sections" {
		tabs.SelectIndex(1)
		w.sections.setVisible(true)
	}
	return tabs
}

// ShowSections opens the Sections tab (true) or the chart (false).
func (w *Window) ShowSections(on bool) {
	if w.viewTabs == nil {
		return
	}
	w.viewTabs.SelectIndex(map[bool]int{false: 0, true: 1}[on])
}

// setVisible starts or stops following the snapshots.
func (v *sectionsView) setVisible(on bool) {
	v.visible = on
	if on {
		v.request()
	}
}

// show hands the view a snapshot the window has just shown.
func (v *sectionsView) show(s *Snapshot) {
	if s == nil || s.Result == nil {
		return
	}
	v.last = s
	v.request()
}

// request asks the worker for the figure of the last snapshot, when the view shows.
func (v *sectionsView) request() {
	if !v.visible || v.last == nil || v.wantW < 1 || v.wantH < 1 {
		return
	}
	v.mu.Lock()
	v.job = &sectionsJob{snap: v.last, selected: v.selected(), w: v.wantW, h: v.wantH, dpi: chartDPI(v.link.scale())}
	v.mu.Unlock()
	poke(v.wake)
}

// close stops the worker. It does not wait: the worker may be waiting for
// the UI goroutine that is closing the window; it ends on its own, and
// hands nothing more to the window once closed.
func (v *sectionsView) close() {
	if v.closed.Swap(true) {
		return
	}
	close(v.quit)
}

func (v *sectionsView) loop() {
	for {
		select {
		case <-v.quit:
			return
		case <-v.wake:
			v.mu.Lock()
			j := v.job
			v.job = nil
			v.mu.Unlock()
			if j != nil {
				v.draw(j)
			}
		}
	}
}

// draw renders a job when what it shows changed and hands the image to the window.
func (v *sectionsView) draw(j *sectionsJob) {
	m, res := j.snap.Model, j.snap.Result
	w, h := min(j.w, plots.MaxPixels), min(j.h, plots.MaxPixels)
	dpi := max(plots.MinDPI, min(plots.MaxDPI, j.dpi))
	// What the figure shows: each family's best working size (the sheet is
	// built only when that, the selection, the units or the size changed).
	var b strings.Builder
	for fi := range res.Families {
		if r := res.Families[fi].Best(); r != nil {
			b.WriteString(r.Static.Designation)
		}
		b.WriteByte('|')
	}
	key := fmt.Sprintf("%s|%s|%s|%dx%d@%d|%d", b.String(), j.selected, m.Scheme.Units, w, h, dpi, j.snap.SchemeGen)
	if key == v.lastKey {
		return
	}
	sheet, keys := chart.Sections(m, res, chart.SectionsOptions{Selected: j.selected})
	names := make([]string, len(keys))
	for i, k := range keys {
		names[i] = m.Families[k.Family].Static(k.Index).Designation
	}
	if v.rast == nil {
		r, err := plots.NewRaster(w, h)
		if err != nil {
			return
		}
		v.rast = r
	} else if err := v.rast.Resize(w, h); err != nil {
		return
	}
	_ = v.rast.SetDPI(dpi)
	layout, err := v.rast.RenderPlan(&sheet)
	if err != nil {
		return
	}
	v.renders.Add(1)
	v.lastKey = key
	if v.link.closing.Load() || v.closed.Load() {
		return
	}
	img := v.rast.Image()
	v.link.doWait(func() {
		b := img.Bounds()
		if v.front == nil || v.front.Bounds() != b {
			v.front = image.NewRGBA(b)
		}
		copy(v.front.Pix, img.Pix)
		v.layout, v.shown = layout, names
		v.raster.Refresh()
	})
}

// pick returns the designation drawn at a position in the view, or "".
func (v *sectionsView) pick(pos fyne.Position, size fyne.Size) string {
	if v.front == nil || size.Width <= 0 || size.Height <= 0 {
		return ""
	}
	b := v.front.Bounds()
	x := float64(pos.X) * float64(b.Dx()) / float64(size.Width)
	y := float64(pos.Y) * float64(b.Dy()) / float64(size.Height)
	if i := v.layout.Pick(x, y); i >= 0 && i < len(v.shown) {
		return v.shown[i]
	}
	return ""
}

// sectionsArea shows the figure and selects the section tapped.
type sectionsArea struct {
	widget.BaseWidget
	v *sectionsView
}

func newSectionsArea(v *sectionsView) *sectionsArea {
	a := &sectionsArea{v: v}
	a.ExtendBaseWidget(a)
	return a
}

// CreateRenderer shows the raster.
func (a *sectionsArea) CreateRenderer() fyne.WidgetRenderer {
	return widget.NewSimpleRenderer(a.v.raster)
}

// Cursor shows a pointing hand: the sections can be tapped.
func (a *sectionsArea) Cursor() desktop.Cursor { return desktop.PointerCursor }

// Tapped selects the candidate whose section (or its labels) was tapped.
func (a *sectionsArea) Tapped(e *fyne.PointEvent) {
	if d := a.v.pick(e.Position, a.Size()); d != "" {
		a.v.onSelect(d)
	}
}

// SectionsShown returns the designations the Sections view draws, left to right.
func (w *Window) SectionsShown() []string {
	if w.sections == nil {
		return nil
	}
	return append([]string(nil), w.sections.shown...)
}
