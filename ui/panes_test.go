package ui

import (
	"context"
	"os"
	"path/filepath"
	"strings"
	"sync"
	"sync/atomic"
	"testing"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/test"
	"fyne.io/fyne/v2/widget"
	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

// Each pane is built here on its own, with stand-ins for the window: no
// other pane and no Window exist in these tests.

// stubStepper applies every edit to its state and records it.
type stubStepper struct {
	st    *State
	steps []string // the what of each Edit and Step ("" when described later)
	drags int      // changes made during drags
	ends  int      // drags ended
}

func (s *stubStepper) Edit(what string, change func(sc *model.Scheme)) {
	s.steps = append(s.steps, what)
	s.st.Update(change)
}

func (s *stubStepper) Step(what string, apply func(st *State) Outcome) {
	s.steps = append(s.steps, what)
	apply(s.st)
}

func (s *stubStepper) Drag(apply func(st *State) Outcome) {
	s.drags++
	apply(s.st)
}

func (s *stubStepper) EndDrag() { s.ends++ }

// now runs a function at once: the tests are the UI goroutine.
func now(f func()) { f() }

// snapshotOf evaluates a scheme as the engine would, with the trace of
// selected (when not empty).
func snapshotOf(t *testing.T, sc model.Scheme, selected string) *Snapshot {
	t.Helper()
	m, err := model.New(sc)
	require.NoError(t, err)
	res, err := m.Evaluate(context.Background(), sc.Setting)
	require.NoError(t, err)
	s := &Snapshot{Gen: 1, SchemeGen: 1, Model: m, Result: res}
	if selected != "" {
		fi, i, ok := m.Find(selected)
		require.True(t, ok, selected)
		d := m.Detail(fi, i, sc.Setting)
		s.Detail, s.DetailOf = &d, selected
	}
	return s
}

// showAlone puts one pane's content in a test window of its own.
func showAlone(t *testing.T, o fyne.CanvasObject, size fyne.Size) fyne.Window {
	w := test.NewTempWindow(t, o)
	w.Resize(size.Max(o.MinSize()))
	return w
}

func TestInputsPaneAlone(t *testing.T) {
	a := test.NewTempApp(t)
	st := NewState(paneScheme())
	ed := &stubStepper{st: st}
	p := newInputsPane(st, ed, now, nil, a.Preferences())
	p.sync()
	showAlone(t, p.Object(), fyne.NewSize(320, 1200))

	// A typed load, committed, is one step; a bare number takes the unit shown.
	f := p.fs.byID["load"]
	require.NotNil(t, f)
	f.entry.SetText("900")
	f.entry.commit()
	require.Len(t, ed.steps, 1)
	assert.InDelta(t, 900*4448.2216152605, st.Draft.Load.DirectN, 1, "900 kip (1 kip = 4448.2216152605 N, from the definition of the pound-force)")
	assert.Equal(t, "900 kip", f.entry.Text, "the field shows the number with the unit it took")

	// A sketch tapped changes the ends as one step; the pane sets no widget of its own as a change.
	test.Tap(p.sketches[model.FixedFixed])
	require.Len(t, ed.steps, 2)
	assert.Equal(t, model.FixedFixed, st.Draft.Setting.Ends)
	p.sync()
	assert.Len(t, ed.steps, 2, "setting the widgets from the state is no edit")

	// A problem is shown under its field.
	f.entry.SetText("-5 kip")
	f.entry.commit()
	p.refresh()
	assert.True(t, f.err.Visible(), "a negative load is refused under the field")
	assert.NotEmpty(t, f.err.Text)

	// The load summary follows the snapshot it is fed.
	p.Show(snapshotOf(t, paneScheme(), ""))
	assert.Contains(t, p.load.summary.Text, "Demand")
}

func TestChartPaneAlone(t *testing.T) {
	test.NewTempApp(t)
	sc := paneScheme()
	st := NewState(sc)
	ed := &stubStepper{st: st}
	resized := 0
	p := newChartPane(st, ed, now, nil, func() { resized++ })
	p.refresh(true)
	win := showAlone(t, container.NewBorder(nil, p.Controls(), nil, nil, p.Object()), fyne.NewSize(700, 400))
	win.Canvas().Refresh(p.Object())
	test.WidgetRenderer(p.slider) // lays the slider out

	// A drag is changes through Drag, then one EndDrag: one undoable step.
	// What the slider does while dragged: a change per move, one end.
	for _, ft := range []float64{14.0, 15.02, 16.5} {
		p.slider.Value = ft
		p.slider.OnChanged(ft)
	}
	p.slider.OnChangeEnded(16.5)
	assert.Equal(t, 3, ed.drags)
	assert.Equal(t, 1, ed.ends)
	assert.Empty(t, ed.steps, "a drag files no step of its own until it ends")
	assert.InDelta(t, 16.5*304.8, st.Draft.Setting.LengthMM, 0.01, "16'-6\" (1 ft = 304.8 mm, exact)")

	// The slider snaps to whole inches: 15.02 ft is 15'-0.24", taken as 15'-0".
	assert.InDelta(t, 15*304.8, fromDisplay(p.slider.snap(15.02, st.Sys(), false), st.Sys()), 1e-9)

	// The length field commits as one step and shows its unit.
	f := p.fs.byID["length"]
	f.entry.SetText("5.5m")
	f.entry.commit()
	assert.Equal(t, []string{""}, ed.steps)
	assert.InDelta(t, 5500, st.Draft.Setting.LengthMM, 1e-9)
	p.refresh(false)
	assert.InDelta(t, 5500/304.8, p.slider.Value, 1e-9, "the slider follows the typed length")
}

func TestResultsPaneAlone(t *testing.T) {
	test.NewTempApp(t)
	var picked []string
	p := newResultsPane(func() (units.System, model.Method) { return units.US, model.LRFD }, func(d string) { picked = append(picked, d) })
	showAlone(t, p.Object(), fyne.NewSize(900, 500))
	s := snapshotOf(t, paneScheme(), "")
	p.Show(s)
	require.NotEmpty(t, p.rows)

	// Whether a row works is a word or symbol in the Status column, never only a colour.
	col := p.tableColOf("status")
	require.Positive(t, col, "the Status column is shown")
	for i := range p.rows {
		txt := columns[columnIndex("status")].cell(&p.ctx, &p.rows[i])
		assert.Equal(t, status(&p.rows[i]), txt)
		assert.Contains(t, []string{StatusWorks, StatusFails, StatusNotPermitted}, txt, "a word with its mark")
	}

	// A row chosen is handed to the window; the pane does not select it itself.
	p.table.Select(widget.TableCellID{Row: 0, Col: 1})
	require.Len(t, picked, 1)
	assert.Equal(t, p.rows[0].Static.Designation, picked[0])

	// Sorting by weight puts the lightest first; again reverses it.
	wc := columnIndex("weight")
	p.SortBy(wc)
	first := p.rows[0].Static.MassKgPerM
	p.SortBy(wc)
	assert.GreaterOrEqual(t, p.rows[0].Static.MassKgPerM, first)
}

func TestCalcPaneAlone(t *testing.T) {
	test.NewTempApp(t)
	pins, clears := 0, 0
	p := newCalcPane(func() { pins++ }, func() { clears++ })
	showAlone(t, p.Object(), fyne.NewSize(500, 600))
	assert.True(t, p.pinButton.Disabled(), "nothing to pin before a row is chosen")

	s := snapshotOf(t, paneScheme(), "")
	d := s.Result.Families[0].Rows[0].Static.Designation
	p.setPicks(d, nil)
	assert.Contains(t, p.title.Text, "working")
	p.Show(snapshotOf(t, paneScheme(), d))
	assert.True(t, strings.HasPrefix(p.title.Text, d), p.title.Text)
	assert.NotEmpty(t, p.stepRows, "the trace is listed")
	assert.NotEmpty(t, p.loadRows, "the load takedown is listed")
	for _, r := range p.loadRows {
		if r.Unit == "N" {
			assert.Equal(t, "kN", stepText(r, 2, units.SI), "SI forces are shown in kN")
		}
	}
	test.Tap(p.pinButton)
	assert.Equal(t, 1, pins)
	p.setPicks(d, []string{d})
	assert.Equal(t, "Unpin from chart", p.pinButton.Text)
	test.Tap(p.clearPins)
	assert.Equal(t, 1, clears)
}

func TestStatusPaneAlone(t *testing.T) {
	test.NewTempApp(t)
	p := newStatusPane()
	showAlone(t, p.Object(), fyne.NewSize(1000, 80))
	h := p.Object().MinSize().Height

	p.setBanner("Fix the length.")
	assert.Equal(t, "Fix the length.", p.BannerText())
	p.setBanner("")
	assert.Empty(t, p.BannerText(), "a cleared banner is hidden")

	p.say(strings.Repeat("a long message that wraps at words ", 8))
	assert.Equal(t, h, p.Object().MinSize().Height, "a long message moves nothing: the status line keeps its two lines")
	p.Show(snapshotOf(t, paneScheme(), ""))
	assert.Contains(t, p.status.Text, "a long message", "a kept message is not replaced by the evaluation summary")
}

// stubHost stands in for the window behind the files pane.
type stubHost struct {
	st     *State
	loaded []model.Scheme
	said   []string
	titles int
	menus  int
}

func (h *stubHost) LoadScheme(sc model.Scheme) { h.loaded = append(h.loaded, sc); h.st.Load(sc) }
func (h *stubHost) exportInputs() (exportInputs, error) {
	return exportInputs{sc: h.st.Valid, rng: h.st.Range, all: true}, nil
}
func (h *stubHost) notify(msg string) { h.said = append(h.said, msg) }
func (h *stubHost) updateTitle()      { h.titles++ }
func (h *stubHost) menuChanged()      { h.menus++ }
func (h *stubHost) closed() bool      { return false }

func TestFilesPaneAlone(t *testing.T) {
	a := test.NewTempApp(t)
	win := test.NewTempWindow(t, widget.NewLabel(""))
	st := NewState(paneScheme())
	host := &stubHost{st: st}
	p := newFilesPane(win, a.Preferences(), st, host, now)
	dir := t.TempDir()

	path := filepath.Join(dir, "tower.upright.json")
	require.NoError(t, p.SaveFile(path))
	assert.False(t, p.Dirty())
	assert.Equal(t, path, p.Path())
	assert.Equal(t, []string{path}, p.RecentPaths())
	assert.Positive(t, host.menus, "the recent list changed the menu")

	// Opening goes through the host (one undoable step in the window).
	require.NoError(t, p.OpenFile(path))
	require.Len(t, host.loaded, 1)

	// A corrupt file is refused, the scheme on screen stays and nothing is loaded.
	bad := filepath.Join(dir, "bad.upright.json")
	require.NoError(t, os.WriteFile(bad, []byte("{not json"), 0o644))
	assert.Error(t, p.OpenFile(bad))
	assert.Len(t, host.loaded, 1)
	assert.Equal(t, path, p.Path(), "the scheme keeps its file")

	// An export writes through the host's inputs.
	csv := filepath.Join(dir, "table.csv")
	require.NoError(t, p.ExportCSVFile(csv))
	b, err := os.ReadFile(csv)
	require.NoError(t, err)
	assert.True(t, strings.Contains(string(b), model.Caution), "the CSV carries the caution")
}

// A refused length keeps the text as typed (its message quotes it), leaves
// the weak-axis length alone and leaves the slider at the length of the
// result on screen.
func TestARefusedLengthMovesNothing(t *testing.T) {
	test.NewTempApp(t)
	st := NewState(paneScheme())
	ed := &stubStepper{st: st}
	p := newChartPane(st, ed, now, nil, func() {})
	p.refresh(true)
	slider, weak := p.slider.Value, st.Text("weak-axis length")
	f := p.fs.byID["length"]
	f.entry.SetText("-3 m")
	f.entry.commit()
	p.refresh(false)
	assert.Equal(t, "-3 m", f.entry.Text, "the refused text stays as typed")
	assert.Contains(t, st.FieldError("length"), `"-3 m"`)
	assert.Equal(t, slider, p.slider.Value, "the slider stays at the valid length")
	assert.Equal(t, weak, st.Text("weak-axis length"), "the weak-axis length is not moved by a refused length")
	assert.InDelta(t, 4200, st.Valid.Setting.LengthMM, 1e-9)
}

// lockLink is a drawLink for a view shown alone: a lock stands in for the
// UI goroutine, shared with the test's own reads.
type lockLink struct {
	mu      sync.Mutex
	closing atomic.Bool
}

func (l *lockLink) link() drawLink {
	do := func(f func()) { l.mu.Lock(); defer l.mu.Unlock(); f() }
	return drawLink{do: do, doWait: do, closing: &l.closing}
}

// within polls cond under the lock for up to a minute.
func (l *lockLink) within(t *testing.T, what string, cond func() bool) {
	t.Helper()
	for end := time.Now().Add(time.Minute); time.Now().Before(end); time.Sleep(10 * time.Millisecond) {
		l.mu.Lock()
		ok := cond()
		l.mu.Unlock()
		if ok {
			return
		}
	}
	t.Fatalf("timed out: %s", what)
}

func TestSectionsViewAlone(t *testing.T) {
	test.NewTempApp(t)
	l := &lockLink{}
	var picked []string
	v := newSectionsView(l.link(), func() string { return "" }, func(d string) { picked = append(picked, d) })
	t.Cleanup(v.close)
	l.mu.Lock()
	v.wantW, v.wantH = 1200, 500
	v.setVisible(true)
	v.show(snapshotOf(t, paneScheme(), ""))
	l.mu.Unlock()
	l.within(t, "the plan sections drawn", func() bool { return v.front != nil && len(v.shown) > 0 })

	l.mu.Lock()
	size := fyne.NewSize(600, 250) // half the image: window units are image pixels / 2
	v.area.Resize(size)
	b := v.layout.Sections[0]
	v.area.Tapped(&fyne.PointEvent{Position: fyne.NewPos(float32((b.X+b.W/2)/2), float32((b.Y+b.H/2)/2))})
	want := v.shown[0]
	l.mu.Unlock()
	assert.Equal(t, []string{want}, picked, "a section tapped is handed to the window")
}

func TestMapViewAlone(t *testing.T) {
	test.NewTempApp(t)
	l := &lockLink{}
	sc := paneScheme()
	st := NewState(sc)
	ed := &stubStepper{st: st}
	type point struct{ mm, load float64 }
	var points []point
	exports := 0
	mv := newMapView(l.link(), st, ed, func(mm, load float64, _ model.MapAxis) { points = append(points, point{mm, load}) }, func() { exports++ })
	t.Cleanup(mv.close)
	showAlone(t, mv.view, fyne.NewSize(700, 400))
	l.mu.Lock()
	mv.wantW, mv.wantH = 800, 480
	mv.setVisible(true)
	l.mu.Unlock()
	l.within(t, "the map drawn", func() bool { return mv.frames.Load() >= 1 })

	l.mu.Lock()
	geo := mv.shown
	require.True(t, geo.ok)
	a := geo.area
	px, py := float64(a.Min.X)+float64(a.Dx())/2, float64(a.Min.Y)+float64(a.Dy())/2
	mv.tapped(fyne.NewPos(float32(px)/2, float32(py)/2), fyne.NewSize(float32(geo.imgW)/2, float32(geo.imgH)/2))
	test.Tap(mv.inReport)
	l.mu.Unlock()
	require.Len(t, points, 1, "a cell tapped is handed to the window")
	assert.Equal(t, model.MapLoad, geo.axis, "a typed load: the map's rows are loads")
	assert.Equal(t, []string{"map in the report"}, ed.steps, "the report check box edits through the editor")
	assert.True(t, st.Draft.ReportMap)
}
