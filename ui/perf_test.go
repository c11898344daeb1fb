package ui

import (
	"bufio"
	"fmt"
	"os"
	"runtime"
	"runtime/pprof"
	"strings"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

// everyFamily is the demo scheme with every registered material and every
// family switched on.
func everyFamily() model.Scheme {
	sc := DemoScheme()
	sc.Materials = nil
	sc.Steel.Families = nil
	sc.Concrete.Transverse = "all"
	sc.Timber.Sawn, sc.Timber.Glulam = true, true
	return sc
}

// sweep returns the i-th length of a back-and-forth sweep over the range,
// in steps of about 10 mm, as a slow drag makes.
func sweep(r model.Range, i int) float64 {
	n := int((r.ToMM - r.FromMM) / 10)
	k := i % (2 * n)
	if k >= n {
		k = 2*n - k
	}
	return r.FromMM + float64(k)*10
}

// BenchmarkSliderStep measures one slider step through the Fyne test
// driver with every family on: the slider moves, the marker moves, the
// engine evaluates the model at the new length and the window shows the
// new table. The chart image, drawn only when the curves shown change, is
// not waited for (see BenchmarkSliderStepWithChart).
func BenchmarkSliderStep(b *testing.B) {
	h := newHarness(b, everyFamily())
	var r model.Range
	var sys units.System
	h.ui(func() { r, sys = h.w.st.Range, h.w.sys() })
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
	var n int
	h.ui(func() {
		for _, f := range h.w.snap.Result.Families {
			n += len(f.Rows)
		}
	})
	b.ReportMetric(float64(n), "candidates")
}

// BenchmarkSliderStepWithChart is BenchmarkSliderStep waiting for the chart
// too, on the steps where the curves shown change and it is redrawn.
func BenchmarkSliderStepWithChart(b *testing.B) {
	h := newHarness(b, everyFamily())
	var r model.Range
	var sys units.System
	h.ui(func() { r, sys = h.w.st.Range, h.w.sys() })
	r0 := h.w.eng.Renders()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		h.ui(func() { h.w.chart.slider.SetValue(toDisplay(sweep(r, i), sys)) })
		h.settle()
	}
	b.StopTimer()
	b.ReportMetric(float64(h.w.eng.Renders()-r0)/float64(b.N), "charts/step")
}

// rssKB reads the resident set size of this process, in kB.
func rssKB(t testing.TB) int {
	f, err := os.Open("/proc/self/status")
	if err != nil {
		t.Skip("no /proc/self/status on this system")
	}
	defer f.Close()
	sc := bufio.NewScanner(f)
	for sc.Scan() {
		if v, ok := strings.CutPrefix(sc.Text(), "VmRSS:"); ok {
			var kb int
			fmt.Sscanf(strings.TrimSpace(v), "%d", &kb)
			return kb
		}
	}
	t.Skip("no VmRSS line")
	return 0
}

// TestLongDragKeepsMemoryFlat drags the slider back and forth for thousands
// of steps with the chart drawn and checks that the resident memory and the
// live heap do not grow: the chart reuses its image buffers.
func TestLongDragKeepsMemoryFlat(t *testing.T) {
	if testing.Short() {
		t.Skip("long drag skipped in -short mode")
	}
	h := newHarness(t, everyFamily())
	var r model.Range
	var sys units.System
	h.ui(func() { r, sys = h.w.st.Range, h.w.sys() })
	steps := 4000
	if s := os.Getenv("UPRIGHT_DRAG_STEPS"); s != "" {
		fmt.Sscanf(s, "%d", &steps)
	}
	heap := func() uint64 {
		runtime.GC()
		var ms runtime.MemStats
		runtime.ReadMemStats(&ms)
		return ms.HeapAlloc
	}
	var rss []int
	var heaps []uint64
	r0 := h.w.eng.Renders()
	start := time.Now()
	for i := 0; i < steps; i++ {
		h.ui(func() { h.w.chart.slider.SetValue(toDisplay(sweep(r, i*3), sys)) })
		h.settle()
		if i == steps/4 || i == steps/2 || i == steps-1 {
			heaps = append(heaps, heap())
			rss = append(rss, rssKB(t))
			if p := os.Getenv("UPRIGHT_HEAPPROFILE"); p != "" {
				if f, err := os.Create(fmt.Sprintf("%s.%d", p, len(heaps))); err == nil {
					pprof.WriteHeapProfile(f)
					f.Close()
				}
			}
		}
	}
	t.Logf("%d steps in %v, %d charts drawn; RSS at 1/4, 1/2, end: %v kB; live heap: %v kB", steps, time.Since(start).Round(time.Millisecond),
		h.w.eng.Renders()-r0, rss, []uint64{heaps[0] >> 10, heaps[1] >> 10, heaps[2] >> 10})
	require.Len(t, rss, 3)
	assert.Less(t, rss[2]-rss[0], 16*1024, "RSS grew by more than 16 MB between a quarter and the end of the drag")
	assert.Less(t, int64(heaps[2])-int64(heaps[0]), int64(4<<20), "live heap grew by more than 4 MB")
}

// TestStartToFirstResult times building the window and showing its first
// result through the test driver (no display: the figure for a real start
// under Xvfb is in the report).
func TestStartToFirstResult(t *testing.T) {
	start := time.Now()
	h := newHarness(t, everyFamily())
	took := time.Since(start)
	h.ui(func() { require.NotNil(t, h.w.snap) })
	t.Logf("window built, model evaluated, table and chart shown, crossovers found: %v", took.Round(time.Millisecond))
	assert.Less(t, took, 2*time.Second)
}
