package ui

import (
	"fmt"
	"sync"
	"testing"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
	"fyne.io/fyne/v2/widget"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
)

// The window tests run on whatever materials the model has registered. When
// a build has none, a stand-in material is registered so the window still
// has something to show: its strength follows an Euler-like curve
// P = P0 / (1 + (K L / L0)²) with invented numbers, for exercising the
// window only.
func init() {
	// Tests commit typed text themselves (Enter, focus leaving); a loaded
	// machine must not commit a prefix between two typed keys.
	typingPause = time.Hour
	if len(model.Materials()) > 0 {
		return
	}
	model.Register("stand-in", 1, func(sc *model.Scheme, ls model.LoadSummary) ([]model.Family, error) {
		return []model.Family{
			newStandIn("A", []float64{1500e3, 2500e3, 4000e3, 6000e3}, []float64{3000, 4000, 6000, 7000}, []float64{50, 80, 120, 160}),
			newStandIn("B", []float64{1200e3, 3000e3, 5000e3}, []float64{8000, 9000, 9500}, []float64{90, 200, 260}),
		}, nil
	})
}

type standIn struct {
	name     string
	p0, l0   []float64
	statics  []model.Static
	material string
}

func newStandIn(name string, p0, l0, mass []float64) *standIn {
	f := &standIn{name: name, p0: p0, l0: l0, material: "stand-in"}
	for i := range p0 {
		f.statics = append(f.statics, model.Static{Material: f.material, Family: name, Designation: fmt.Sprintf("%s-%d", name, i),
			MassKgPerM: mass[i], FootprintMM: [2]float64{200 + 20*float64(i), 200 + 20*float64(i)}, PlanAreaMM2: 40000 + 9000*float64(i)})
	}
	return f
}

func (f *standIn) Material() string           { return f.material }
func (f *standIn) Name() string               { return f.name }
func (f *standIn) Len() int                   { return len(f.p0) }
func (f *standIn) Static(i int) *model.Static { return &f.statics[i] }
func (f *standIn) Quick(i int, s model.Setting) model.Quick {
	k := s.K
	if k == 0 {
		k = 1
	}
	x := k * s.LengthMM / f.l0[i]
	q := model.Quick{CapacityN: f.p0[i] / (1 + x*x), Governing: "crushing", Slenderness: 50 * x, Permitted: x < 6}
	if x > 1 {
		q.Governing, q.Mode = "buckling", 1
	}
	return q
}
func (f *standIn) Detail(i int, s model.Setting) model.Detail {
	q := f.Quick(i, s)
	return model.Detail{Quick: q, Plain: "An invented stand-in column.", Steps: []model.Step{
		{Clause: "stand-in", Quantity: "L", Formula: "length", Value: s.LengthMM, Unit: "mm"},
		{Clause: "stand-in", Quantity: "P", Formula: "P0/(1+x²)", Value: q.CapacityN / 1000, Unit: "kN"},
	}}
}

// harness drives a window through Fyne's test driver. The engine's results
// reach the window under the same lock the test's own actions take, so the
// two never touch the widgets at once.
type harness struct {
	t  testing.TB
	mu sync.Mutex
	w  *Window
}

// newHarness opens a window on sc in a test app, with a chart size set so
// charts are drawn, and waits until everything (chart and crossovers) is shown.
func newHarness(t testing.TB, sc model.Scheme) *harness {
	return newHarnessAt(t, sc, fyne.NewSize(1400, 900))
}

// newHarnessAt is newHarness with the window at a size; the chart is drawn
// at the size the layout gives it.
func newHarnessAt(t testing.TB, sc model.Scheme, size fyne.Size) *harness {
	a := test.NewTempApp(t)
	h := &harness{t: t}
	do := func(f func()) {
		h.mu.Lock()
		defer h.mu.Unlock()
		f()
	}
	h.ui(func() {
		h.w = newWindow(a, sc, do, do)
		h.w.win.Resize(size)
		if h.w.chart.wantW == 0 {
			h.w.chart.wantW, h.w.chart.wantH = 900, 420
		}
		h.w.submit()
	})
	t.Cleanup(func() {
		h.w.closing.Store(true)
		h.w.eng.Close()
	})
	h.settle()
	return h
}

// layOut paints the window once so every part takes its size (the chart
// asks for an image of its size, wrapped labels find their height), waits
// for the engine, and lays the window out again.
func (h *harness) layOut() {
	h.ui(func() { h.w.win.Canvas().Capture() })
	h.settle()
	h.ui(func() {
		h.w.win.Content().Refresh()
		h.w.win.Canvas().Capture()
	})
	h.settle()
}

// ui runs f as the UI goroutine would, holding the harness lock.
func (h *harness) ui(f func()) {
	h.mu.Lock()
	defer h.mu.Unlock()
	f()
}

// settle waits until the engine has shown the latest request, its chart and
// its crossovers.
func (h *harness) settle() {
	h.t.Helper()
	var gen, sg uint64
	h.ui(func() { gen, sg = h.w.reqGen, h.w.st.SchemeGen })
	require.True(h.t, h.w.eng.Wait(gen, sg, true, 60*time.Second), "engine did not settle")
}

// typeInto replaces a field's text by typing, as a user would.
func (h *harness) typeInto(id, text string) {
	h.ui(func() {
		e := h.w.field(id).entry
		e.SetText("")
		test.Type(e, text)
		e.commit()
	})
	h.settle()
}

// cell returns the text the results table shows in a cell.
func (h *harness) cell(row int, col string) string {
	var s string
	h.ui(func() {
		l := widget.NewLabel("")
		h.w.results.updateCell(widget.TableCellID{Row: row, Col: columnIndex(col)}, l)
		s = l.Text
	})
	return s
}

// rowOf returns the table row showing a family (by name), or -1.
func (h *harness) rowOf(family string) int {
	r := -1
	h.ui(func() {
		for i := range h.w.results.rows {
			if h.w.results.ctx.m.Families[h.w.results.rows[i].Family].Name() == family {
				r = i
				return
			}
		}
	})
	return r
}

// sizeOf returns the size the table shows for a family, or "".
func (h *harness) sizeOf(family string) string {
	r := h.rowOf(family)
	if r < 0 {
		return ""
	}
	return h.cell(r, "size")
}

// setSlider moves the length slider to mm, as a drag or arrow key does.
func (h *harness) setSlider(mm float64) {
	h.ui(func() { h.w.chart.slider.SetValue(toDisplay(mm, h.w.sys())) })
	h.settle()
}

// field returns the text field with the state's field id, from whichever
// pane holds it.
func (w *Window) field(id string) *field {
	if f := w.inputs.fs.byID[id]; f != nil {
		return f
	}
	return w.chart.fs.byID[id]
}
