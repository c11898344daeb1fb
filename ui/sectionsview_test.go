package ui

import (
	"os"
	"path/filepath"
	"runtime"
	"strings"
	"testing"
	"time"

	"fyne.io/fyne/v2"
	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

// openSections shows the Sections tab at a set image size and waits for its first figure.
func openSections(t *testing.T, h *harness) {
	t.Helper()
	h.ui(func() {
		h.w.sections.wantW, h.w.sections.wantH = 1200, 500
		h.w.ShowSections(true)
	})
	waitSections(t, h, func() bool { return h.w.sections.front != nil && len(h.w.sections.shown) > 0 })
}

// waitSections polls, under the UI lock, until ok holds.
func waitSections(t *testing.T, h *harness, ok func() bool) {
	t.Helper()
	deadline := time.Now().Add(20 * time.Second)
	for time.Now().Before(deadline) {
		done := false
		h.ui(func() { done = ok() })
		if done {
			return
		}
		time.Sleep(5 * time.Millisecond)
	}
	t.Fatal("the Sections view did not update")
}

// bestShown returns each family's best working size in the snapshot on screen.
func bestShown(h *harness) []string {
	var out []string
	h.ui(func() {
		for i := range h.w.snap.Result.Families {
			if b := h.w.snap.Result.Families[i].Best(); b != nil {
				out = append(out, b.Static.Designation)
			}
		}
	})
	return out
}

// TestSectionsViewFollowsTheSlider opens the Sections tab and checks it
// draws each family's best working size, and follows the slider.
func TestSectionsViewFollowsTheSlider(t *testing.T) {
	h := newHarness(t, DemoScheme())
	openSections(t, h)
	assert.Equal(t, bestShown(h), h.w.SectionsShown())

	var before []string
	h.ui(func() { before = h.w.SectionsShown() })
	h.setSlider(3000)
	want := bestShown(h)
	require.NotEqual(t, before, want, "the best sizes change between the demo length and 3 m")
	waitSections(t, h, func() bool { return equalStrings(h.w.sections.shown, want) })
}

// TestSectionsViewTapSelects taps a drawn section and checks the candidate is
// selected in the table and the calculation view.
func TestSectionsViewTapSelects(t *testing.T) {
	h := newHarness(t, DemoScheme())
	openSections(t, h)
	var target string
	var pos fyne.Position
	var size fyne.Size
	h.ui(func() {
		v := h.w.sections
		size = fyne.NewSize(600, 250) // half the image: window units are image pixels / 2
		v.area.Resize(size)
		i := len(v.shown) - 1
		b := v.layout.Sections[i]
		target = v.shown[i]
		pos = fyne.NewPos(float32((b.X+b.W/2)/2), float32((b.Y+b.H/2)/2))
		v.area.Tapped(&fyne.PointEvent{Position: pos})
	})
	h.settle()
	h.ui(func() {
		assert.Equal(t, target, h.w.picks.selected)
		assert.Contains(t, h.w.calc.title.Text, target)
	})
	// The highlight follows: the view redraws with the selection.
	waitSections(t, h, func() bool { return h.w.sections.renders.Load() >= 2 })
	h.ui(func() {
		assert.Equal(t, "", h.w.sections.pick(fyne.NewPos(1, 1), size), "a tap on the background selects nothing")
	})
}

// TestSectionsViewIdleWhenHidden checks that nothing is drawn while the chart tab shows.
func TestSectionsViewIdleWhenHidden(t *testing.T) {
	h := newHarness(t, DemoScheme())
	h.setSlider(3000)
	h.setSlider(5000)
	assert.Equal(t, int64(0), h.w.sections.renders.Load())
}

func equalStrings(a, b []string) bool {
	if len(a) != len(b) {
		return false
	}
	for i := range a {
		if a[i] != b[i] {
			return false
		}
	}
	return true
}

// BenchmarkSliderStepWithSections is BenchmarkSliderStep with the Sections
// view showing: each step is evaluated and shown while the view follows,
// redrawing (on its own goroutine) whenever the best sizes change.
func BenchmarkSliderStepWithSections(b *testing.B) {
	h := newHarness(b, everyFamily())
	h.ui(func() {
		h.w.sections.wantW, h.w.sections.wantH = 1200, 500
		h.w.ShowSections(true)
	})
	var r model.Range
	var sys units.System
	h.ui(func() { r, sys = h.w.st.Range, h.w.sys() })
	r0 := h.w.sections.renders.Load()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		var gen uint64
		h.ui(func() {
			h.w.chart.slider.SetValue(toDisplay(sweep(r, i), sys))
			gen = h.w.reqGen
		})
		if !h.w.eng.WaitEvaluated(gen, 10*time.Second) {
			b.Fatal("engine stalled")
		}
	}
	b.StopTimer()
	b.ReportMetric(float64(h.w.sections.renders.Load()-r0)/float64(b.N), "sections/step")
}

// TestExportSectionsFile writes the plan sections from the window in each
// format, with the caution and every shown size.
func TestExportSectionsFile(t *testing.T) {
	h := newHarness(t, DemoScheme())
	dir := t.TempDir()
	for _, ext := range []string{".svg", ".png", ".pdf"} {
		path := filepath.Join(dir, "sections"+ext)
		var err error
		h.ui(func() { err = h.w.files.ExportSectionsFile(path) })
		require.NoError(t, err, ext)
		b, err := os.ReadFile(path)
		require.NoError(t, err)
		require.NotEmpty(t, b)
		if ext == ".svg" {
			s := string(b)
			assert.Contains(t, s, model.Caution)
			for _, d := range bestShown(h) {
				first, _, _ := strings.Cut(d, ", ")
				first, _, _ = strings.Cut(first, " glulam ")
				assert.Contains(t, s, first)
			}
		}
	}
	var err error
	h.ui(func() { err = h.w.files.ExportSectionsFile(filepath.Join(dir, "sections.gif")) })
	assert.Error(t, err)
}

// TestDragWithSectionsKeepsMemoryFlat drags the slider back and forth with
// the Sections view showing and checks that the live heap does not grow: the
// view reuses its raster and its image.
func TestDragWithSectionsKeepsMemoryFlat(t *testing.T) {
	if testing.Short() {
		t.Skip("long drag skipped in -short mode")
	}
	h := newHarness(t, everyFamily())
	openSections(t, h)
	var r model.Range
	var sys units.System
	h.ui(func() { r, sys = h.w.st.Range, h.w.sys() })
	heap := func() uint64 {
		runtime.GC()
		var ms runtime.MemStats
		runtime.ReadMemStats(&ms)
		return ms.HeapAlloc
	}
	const steps = 800
	var heaps []uint64
	r0 := h.w.sections.renders.Load()
	for i := 0; i < steps; i++ {
		h.ui(func() { h.w.chart.slider.SetValue(toDisplay(sweep(r, i*8), sys)) })
		h.settle()
		if i == steps/4 || i == steps-1 {
			heaps = append(heaps, heap())
		}
	}
	drawn := h.w.sections.renders.Load() - r0
	t.Logf("%d steps, %d plan figures drawn; live heap at 1/4 and end: %d kB, %d kB", steps, drawn, heaps[0]>>10, heaps[1]>>10)
	assert.Greater(t, drawn, int64(10), "the view followed the drag")
	assert.Less(t, int64(heaps[1])-int64(heaps[0]), int64(4<<20), "live heap grew by more than 4 MB")
}
