package ui

import (
	"bytes"
	"math"
	"os"
	"path/filepath"
	"reflect"
	"strings"
	"testing"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/report"
	"upright/ui/schemefile"
	"upright/ui/units"
)

// sameValues compares two values field by field, floats within 1e-6
// relative, and reports every difference by its path.
func sameValues(t *testing.T, path string, want, got reflect.Value) {
	t.Helper()
	switch want.Kind() {
	case reflect.Struct:
		for i := 0; i < want.NumField(); i++ {
			sameValues(t, path+"."+want.Type().Field(i).Name, want.Field(i), got.Field(i))
		}
	case reflect.Float32, reflect.Float64:
		a, b := want.Float(), got.Float()
		assert.True(t, a == b || math.Abs(a-b) <= 1e-6*math.Max(math.Abs(a), math.Abs(b)), "%s: DemoScheme %g, file %g", path, a, b)
	case reflect.Slice, reflect.Array:
		// nil and empty both mean "all" in the scheme file (doc.go: [] means all).
		if !assert.Equal(t, want.Len(), got.Len(), "%s: length", path) {
			return
		}
		for i := 0; i < want.Len(); i++ {
			sameValues(t, path+"["+string(rune('0'+i%10))+"]", want.Index(i), got.Index(i))
		}
	case reflect.Map:
		if !assert.Equal(t, want.Len(), got.Len(), "%s: entries", path) {
			return
		}
		for _, k := range want.MapKeys() {
			g := got.MapIndex(k)
			if assert.True(t, g.IsValid(), "%s[%v] missing from the file", path, k) {
				sameValues(t, path+"["+k.String()+"]", want.MapIndex(k), g)
			}
		}
	case reflect.Pointer:
		if want.IsNil() || got.IsNil() {
			assert.Equal(t, want.IsNil(), got.IsNil(), "%s: nil", path)
			return
		}
		sameValues(t, path, want.Elem(), got.Elem())
	default:
		assert.Equal(t, want.Interface(), got.Interface(), path)
	}
}

func TestDemoFileDescribesTheDemoScheme(t *testing.T) {
	file, err := schemefile.Load(filepath.Join("..", "testdata", "schemes", "demo.upright.json"))
	require.NoError(t, err)
	want := DemoScheme()
	sameValues(t, "Scheme", reflect.ValueOf(want), reflect.ValueOf(file))
	// The bay is 30 × 28 ft = 840 ft² (the demo's own numbers).
	assert.InDelta(t, 840, file.Load.TributaryM2/units.M2PerFt2, 1e-6)
}

// fileHarness is a window with a temporary folder for its files.
func fileHarness(t *testing.T) (*harness, string) {
	return newHarness(t, DemoScheme()), t.TempDir()
}

// dialogText returns the markup of the top overlay (a dialog), or "".
func dialogText(h *harness) string {
	var s string
	h.ui(func() {
		if top := h.w.win.Canvas().Overlays().Top(); top != nil {
			s = test.RenderObjectToMarkup(top)
		}
	})
	return s
}

func closeDialogs(h *harness) {
	h.ui(func() {
		o := h.w.win.Canvas().Overlays()
		for o.Top() != nil {
			o.Top().Hide()
			o.Remove(o.Top())
		}
	})
}

func TestSaveThenOpenGivesBackTheScheme(t *testing.T) {
	h, dir := fileHarness(t)
	h.typeInto("length", `21'-4"`)
	h.ui(func() {
		h.w.after(h.w.st.Update(func(sc *model.Scheme) { sc.Name = "Tannery Yard studios, gallery column" }))
	})
	h.settle()
	path := filepath.Join(dir, "gallery"+schemefile.Extension)
	var saved model.Scheme
	h.ui(func() {
		assert.True(t, h.w.files.Dirty(), "typed changes are unsaved")
		assert.True(t, strings.HasSuffix(h.w.win.Title(), " •"), h.w.win.Title())
		saved = h.w.st.Valid
		require.NoError(t, h.w.files.SaveFile(path))
		assert.False(t, h.w.files.Dirty())
		assert.Equal(t, "Upright — Tannery Yard studios, gallery column", h.w.win.Title())
		assert.Equal(t, path, h.w.files.Path())
		assert.Equal(t, []string{path}, h.w.files.RecentPaths())
		assert.Equal(t, `["`+path+`"]`, h.w.app.Preferences().String(prefRecent))
		h.w.LoadScheme(DemoScheme())
		assert.Equal(t, "", h.w.files.Path(), "the demo has no file")
	})
	h.settle()
	h.ui(func() { require.NoError(t, h.w.files.OpenFile(path)) })
	h.settle()
	h.ui(func() {
		assert.True(t, reflect.DeepEqual(saved, h.w.st.Valid), "saved %+v\nopened %+v", saved, h.w.st.Valid)
		assert.Equal(t, `21'-4.0"`, h.w.field("length").entry.Text)
		assert.InDelta(t, 21*units.MMPerFoot+4*units.MMPerInch, h.w.snap.Result.Setting.LengthMM, 1e-9)
		assert.False(t, h.w.files.Dirty())
		assert.Equal(t, "Opened gallery"+schemefile.Extension, h.w.status.Notice())
	})
	// Ctrl+S now saves to the known file without asking: a length change reaches it.
	// 16 ft 6 in, a round inch the slider snaps to (common practice: the
	// slider rounds to 1 in in a US scheme).
	h.setSlider(16.5 * units.MMPerFoot)
	h.ui(func() {
		assert.True(t, h.w.files.Dirty())
		h.w.win.Canvas().(interface{ TypedShortcut(fyne.Shortcut) }).TypedShortcut(shortcutSave)
		assert.Empty(t, h.w.win.Canvas().Overlays().List(), "no dialog when the file is known")
		assert.False(t, h.w.files.Dirty())
	})
	back, err := schemefile.Load(path)
	require.NoError(t, err)
	assert.InDelta(t, 16.5*units.MMPerFoot, back.Setting.LengthMM, 1e-9)
}

func TestOpeningABadFileKeepsTheScheme(t *testing.T) {
	h, dir := fileHarness(t)
	good, err := schemefile.Marshal(DemoScheme())
	require.NoError(t, err)
	big := append(append([]byte(nil), good[:len(good)-2]...), []byte(`,"pad":"`+strings.Repeat("x", schemefile.MaxSize)+`"}`)...)
	for _, tc := range []struct {
		name, data, want string
	}{
		{"malformed.upright.json", strings.Replace(string(good), `"units": "us",`, `"units": "us"`, 1), "line"},
		{"huge.upright.json", string(big), "at most 1 MiB"},
		{"empty.upright.json", "", "bad"},
	} {
		path := filepath.Join(dir, tc.name)
		require.NoError(t, os.WriteFile(path, []byte(tc.data), 0o644))
		var before model.Scheme
		var openErr error
		h.ui(func() {
			before = h.w.st.Valid
			openErr = h.w.files.OpenFile(path)
		})
		require.Error(t, openErr, tc.name)
		msg := dialogText(h)
		assert.Contains(t, msg, "could not be opened", tc.name)
		assert.Contains(t, msg, tc.name, "the dialog names the file")
		if tc.want != "bad" {
			assert.Contains(t, msg, tc.want, tc.name)
		}
		h.ui(func() {
			assert.True(t, reflect.DeepEqual(before, h.w.st.Valid), "%s: the scheme on screen is kept", tc.name)
			assert.Equal(t, "", h.w.files.Path())
			assert.Equal(t, "Upright — "+DemoScheme().Name, h.w.win.Title())
		})
		closeDialogs(h)
	}
	// A recent file that no longer opens leaves the list.
	path := filepath.Join(dir, "kept"+schemefile.Extension)
	h.ui(func() { require.NoError(t, h.w.files.SaveFile(path)) })
	require.NoError(t, os.WriteFile(path, []byte("{"), 0o644))
	h.ui(func() {
		h.w.files.openRecent(path)
		assert.NotContains(t, h.w.files.RecentPaths(), path)
	})
	closeDialogs(h)
}

func TestExportsWriteAPDFACSVAndACharts(t *testing.T) {
	h, dir := fileHarness(t)
	pdf := filepath.Join(dir, "report.pdf")
	csv := filepath.Join(dir, "table.csv")
	png := filepath.Join(dir, "chart.png")
	svg := filepath.Join(dir, "chart.svg")
	h.ui(func() {
		require.NoError(t, h.w.files.ExportReportFile(pdf))
		assert.Equal(t, "Wrote report.pdf", h.w.status.Notice())
		require.NoError(t, h.w.files.ExportCSVFile(csv))
		require.NoError(t, h.w.files.ExportChartFile(png))
		require.NoError(t, h.w.files.ExportChartFile(svg))
	})
	b, err := os.ReadFile(pdf)
	require.NoError(t, err)
	assert.True(t, bytes.HasPrefix(b, []byte("%PDF")), "the report is a PDF")
	b, err = os.ReadFile(csv)
	require.NoError(t, err)
	head := strings.SplitN(string(b), "\r\n", 2)[0]
	assert.Equal(t, strings.Join(report.CSVHeader(units.US), ","), head, "the header row names the units of the US demo")
	assert.Contains(t, head, "_kip", "a column carries its unit")
	assert.Greater(t, strings.Count(string(b), "\r\n"), 2, "rows follow the header")
	b, err = os.ReadFile(png)
	require.NoError(t, err)
	assert.True(t, bytes.HasPrefix(b, []byte("\x89PNG")), "the chart is a PNG")
	b, err = os.ReadFile(svg)
	require.NoError(t, err)
	assert.Contains(t, string(b[:min(len(b), 400)]), "<svg")
	left, err := filepath.Glob(filepath.Join(dir, "*tmp*"))
	require.NoError(t, err)
	assert.Empty(t, left, "no temporary file is left")

	// A failed export says so and leaves the earlier file as it was.
	bad := filepath.Join(dir, "missing-folder", "report.pdf")
	h.ui(func() { assert.Error(t, h.w.files.ExportReportFile(bad)) })
	assert.Contains(t, dialogText(h), "was not written")
	closeDialogs(h)
}

func TestTheMenuListsRecentFilesAndTheExports(t *testing.T) {
	h, dir := fileHarness(t)
	a := filepath.Join(dir, "a"+schemefile.Extension)
	b := filepath.Join(dir, "b"+schemefile.Extension)
	h.ui(func() {
		require.NoError(t, h.w.files.SaveFile(a))
		require.NoError(t, h.w.files.SaveFile(b))
		var labels []string
		var recent *fyne.MenuItem
		for _, it := range h.w.win.MainMenu().Items[0].Items {
			labels = append(labels, it.Label)
			assert.NotContains(t, it.Label, "not available")
			if it.Label == "Open recent" {
				recent = it
			}
		}
		assert.Contains(t, labels, "Export client report (PDF)…")
		assert.Contains(t, labels, "Export candidate table (CSV)…")
		require.NotNil(t, recent)
		items := recent.ChildMenu.Items
		require.GreaterOrEqual(t, len(items), 2)
		assert.True(t, strings.HasPrefix(items[0].Label, "b"+schemefile.Extension), "most recent first: %q", items[0].Label)
		assert.True(t, strings.HasPrefix(items[1].Label, "a"+schemefile.Extension))
	})
}

func TestStartupRestoresANewerAutosave(t *testing.T) {
	a := test.NewTempApp(t)
	p := a.Preferences()
	dir := t.TempDir()
	auto := filepath.Join(dir, autosaveName)

	// No autosave: the stored scheme (here the demo) opens, nothing said.
	sc, path, _, msg := startupScheme(p, auto)
	assert.Equal(t, DemoScheme().Name, sc.Name)
	assert.Equal(t, "", path)
	assert.Equal(t, "", msg)

	stored := DemoScheme()
	stored.Name = "Quay Street market hall"
	storeScheme(p, stored)
	edited := stored
	edited.Setting = edited.Setting.AtLength(6100)

	// An autosave older than the stored scheme is ignored.
	require.NoError(t, schemefile.Save(auto, edited))
	old := time.Now().Add(-time.Hour)
	require.NoError(t, os.Chtimes(auto, old, old))
	sc, _, _, msg = startupScheme(p, auto)
	assert.Equal(t, stored.Setting.LengthMM, sc.Setting.LengthMM)
	assert.Equal(t, "", msg)

	// A newer one holding other inputs is restored, and the status bar says so.
	later := time.Now().Add(time.Minute)
	require.NoError(t, os.Chtimes(auto, later, later))
	sc, _, _, msg = startupScheme(p, auto)
	assert.InDelta(t, 6100, sc.Setting.LengthMM, 1e-9)
	assert.Contains(t, msg, "Restored the autosave")

	// A newer one equal to the stored scheme is not worth a message.
	require.NoError(t, schemefile.Save(auto, stored))
	require.NoError(t, os.Chtimes(auto, later, later))
	_, _, _, msg = startupScheme(p, auto)
	assert.Equal(t, "", msg)
}

func TestTheAutosaverWritesTheSchemeAfterChanges(t *testing.T) {
	h, dir := fileHarness(t)
	auto := filepath.Join(dir, autosaveName)
	h.ui(func() { require.NoError(t, h.w.files.startAutosave(auto, 50*time.Millisecond)) })
	h.typeInto("length", "17 ft")
	require.Eventually(t, func() bool {
		sc, err := schemefile.Load(auto)
		return err == nil && math.Abs(sc.Setting.LengthMM-17*units.MMPerFoot) < 1e-6
	}, 5*time.Second, 20*time.Millisecond, "the typed length reaches the autosave file")
	h.ui(func() { h.w.files.stopAutosave() })
}

func TestFileStem(t *testing.T) {
	for _, c := range []struct{ in, want string }{
		{"Demo: Alder Row Library, reading-room column", "Demo-Alder-Row-Library-reading-room-column"},
		{"   ", "scheme"},
		{"a/b\\c", "a-b-c"},
	} {
		assert.Equal(t, c.want, fileStem(c.in), c.in)
	}
}
