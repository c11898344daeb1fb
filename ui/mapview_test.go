package ui

import (
	"bytes"
	"os"
	"path/filepath"
	"reflect"
	"testing"
	"time"

	"fyne.io/fyne/v2"
	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/plots"
	"upright/ui/model"
)

// showMap opens the Map view at a fixed image size and waits for n images.
func showMap(h *harness, n int64) *mapView {
	var mv *mapView
	h.ui(func() {
		mv = h.w.mapv
		mv.visible = true
		mv.wantW, mv.wantH = 800, 480
		mv.submit()
	})
	h.t.Cleanup(mv.close)
	waitFor(h, func() bool { return mv.frames.Load() >= n }, "map image %d", n)
	return mv
}

// waitFor polls cond (under the harness lock) for up to a minute.
func waitFor(h *harness, cond func() bool, what string, args ...any) {
	h.t.Helper()
	deadline := time.Now().Add(60 * time.Second)
	for time.Now().Before(deadline) {
		ok := false
		h.ui(func() { ok = cond() })
		if ok {
			return
		}
		time.Sleep(10 * time.Millisecond)
	}
	h.t.Fatalf("timed out waiting for "+what, args...)
}

// TestMapViewShowsTheMapAndClickMovesTheScheme: the Map view computes the
// demo scheme's map off the UI goroutine; clicking a cell sets the tributary
// area and the length to that cell's, and only redraws the point.
func TestMapViewShowsTheMapAndClickMovesTheScheme(t *testing.T) {
	h := newHarness(t, DemoScheme())
	mv := showMap(h, 1)
	var geo mapGeometry
	h.ui(func() {
		assert.Contains(t, mv.status.Text, "Click a cell")
		assert.False(t, mv.progress.Visible())
		require.NotNil(t, mv.front)
		assert.Equal(t, 800, mv.front.Bounds().Dx())
		geo = mv.shown
	})
	require.True(t, geo.ok)
	require.Equal(t, model.MapTributary, geo.axis)
	i, j := len(geo.loads)/3, len(geo.lengthsMM)*2/3
	a := geo.area
	px := float64(a.Min.X) + (float64(j)+0.5)/float64(len(geo.lengthsMM))*float64(a.Dx())
	py := float64(a.Max.Y) - (float64(i)+0.5)/float64(len(geo.loads))*float64(a.Dy())
	gi, gj, ok := geo.cellAt(px, py)
	require.True(t, ok)
	require.Equal(t, [2]int{i, j}, [2]int{gi, gj})
	h.ui(func() {
		mv.tapped(fyne.NewPos(float32(px)/2, float32(py)/2), fyne.NewSize(float32(geo.imgW)/2, float32(geo.imgH)/2))
	})
	h.settle()
	h.ui(func() {
		v := h.w.st.Valid
		// The fields round what they show: ft² to whole units, lengths to 1/16 in.
		assert.InEpsilon(t, geo.loads[i], v.Load.TributaryM2, 0.01)
		assert.InDelta(t, geo.lengthsMM[j], v.Setting.LengthMM, 2)
	})
	waitFor(h, func() bool { return mv.frames.Load() >= 2 }, "the redrawn point")
	assert.Equal(t, int64(1), mv.maps.Load(), "moving the point inside the map does not recompute it")
}

// TestMapViewFollowsAChangeOfInput: a change of input while the map is on
// screen (or being computed) leads to a map of the new scheme; one being
// computed for the old scheme is cancelled or finishes, never shown last.
func TestMapViewFollowsAChangeOfInput(t *testing.T) {
	sc := model.DefaultScheme()
	h := newHarness(t, sc)
	mv := showMap(h, 0)
	h.typeInto("K", "1.5")
	var want mapKey
	h.ui(func() { want = keyOf(h.w.st.Valid, mv.spec) })
	waitFor(h, func() bool {
		mv.wk.mu.Lock()
		defer mv.wk.mu.Unlock()
		return mv.wk.latest != nil && reflect.DeepEqual(*mv.wk.latest, want) && mv.wk.pending == nil && mv.wk.running == nil
	}, "the map of the changed scheme")
	// The first scheme's map was computed, cancelled, or replaced before it started.
	assert.LessOrEqual(t, mv.maps.Load()+mv.cancelled.Load(), int64(2))
	assert.GreaterOrEqual(t, mv.maps.Load(), int64(1))
	assert.Equal(t, 1.5, want.sc.Setting.K)
}

// TestMapViewIdleWhileHidden: the map is not computed while the Chart tab is shown.
func TestMapViewIdleWhileHidden(t *testing.T) {
	h := newHarness(t, DemoScheme())
	h.typeInto("K", "1.2")
	time.Sleep(50 * time.Millisecond)
	assert.Zero(t, h.w.mapv.maps.Load())
	assert.Zero(t, h.w.mapv.frames.Load())
}

// TestMapInReportCheckFollowsTheScheme: the check shows the scheme's
// report_map and sets it, without recomputing the map.
func TestMapInReportCheckFollowsTheScheme(t *testing.T) {
	h := newHarness(t, DemoScheme())
	h.ui(func() {
		assert.True(t, h.w.mapv.inReport.Checked, "the demo scheme asks for the map")
		h.w.mapv.inReport.SetChecked(false)
		assert.False(t, h.w.st.Valid.ReportMap)
		assert.True(t, h.w.files.Dirty(), "a change to save")
	})
	h.settle()
	h.ui(func() {
		a := keyOf(h.w.st.Valid, model.MapSpec{})
		sc := h.w.st.Valid
		sc.ReportMap = true
		assert.True(t, reflect.DeepEqual(a, keyOf(sc, model.MapSpec{})))
	})
}

// TestExportMapFile writes the map in each format; a bad extension is refused.
func TestExportMapFile(t *testing.T) {
	h := newHarness(t, DemoScheme())
	dir := t.TempDir()
	for _, c := range []struct{ ext, magic string }{{".png", "\x89PNG"}, {".svg", "<?xml"}, {".pdf", "%PDF"}} {
		path := filepath.Join(dir, "map"+c.ext)
		var err error
		h.ui(func() { err = h.w.ExportMapFile(path) })
		require.NoError(t, err)
		b, err := os.ReadFile(path)
		require.NoError(t, err)
		assert.True(t, bytes.HasPrefix(b, []byte(c.magic)), c.ext)
	}
	var err error
	h.ui(func() {
		// The error dialog needs a window on screen in the test app.
		h.w.win.Show()
		err = h.w.ExportMapFile(filepath.Join(dir, "map.gif"))
	})
	assert.ErrorIs(t, err, plots.ErrUnknownFormat)
}

// TestMapSpecFollowsTheTieTolerance: the map's near-tie fraction is the
// scheme's, also when the load range on screen is kept.
func TestMapSpecFollowsTheTieTolerance(t *testing.T) {
	sc := DemoScheme()
	mv := &mapView{}
	r := model.Range{FromMM: 500, ToMM: 12000}
	sp := mv.mapSpecFor(&sc, r)
	assert.Equal(t, sc.Tie, sp.Tie)
	mv.spec, mv.haveSpec, mv.specAxis = sp, true, model.MapAxisOf(&sc)
	sc.Tie = 0.1
	kept := mv.mapSpecFor(&sc, r)
	assert.Equal(t, 0.1, kept.Tie)
	assert.Equal(t, sp.LoadFrom, kept.LoadFrom, "the load range is kept")
	assert.NotEqual(t, keyOf(sc, sp), keyOf(sc, kept), "a new tolerance is a new map")
}
