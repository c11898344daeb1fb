package plots

import (
	"bytes"
	"errors"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"runtime"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// sampleMap is an invented map: four families in three materials whose
// regions are bounded by smooth curves, with a corner where nothing works.
func sampleMap(nx, ny int) *Map {
	m := &Map{
		Title:   "Lightest family by unbraced length and load",
		XLabel:  "Unbraced length (ft)",
		YLabel:  "Axial load (kip)",
		Heading: "Lightest family",
		Keys: []MapKey{
			{Label: "W", Group: "steel"},
			{Label: "HSS square", Group: "steel"},
			{Label: "Tied square", Group: "concrete"},
			{Label: "Glulam", Group: "timber"},
		},
		Point:   &Point{X: 18, Y: 900},
		Caution: "Preliminary sizing for scheme comparison only. Verify with a licensed structural engineer under the governing local code.",
	}
	for j := 0; j < nx; j++ {
		m.X = append(m.X, 2+38*float64(j)/float64(nx-1))
	}
	for i := 0; i < ny; i++ {
		m.Y = append(m.Y, 100+2900*float64(i)/float64(ny-1))
	}
	for _, y := range m.Y {
		for _, x := range m.X {
			c := 0
			switch {
			case y > 2600-30*x:
				c = -1
			case y < 400+10*x && x < 14:
				c = 3
			case y > 1500+20*math.Sin(x/3)*10:
				c = 2
			case x > 24:
				c = 1
			}
			m.Cells = append(m.Cells, c)
		}
	}
	return m
}

// TestMapGolden renders the sample map and compares it with its reference PNG.
func TestMapGolden(t *testing.T) {
	r, err := NewMapRaster(960, 560)
	require.NoError(t, err)
	require.NoError(t, r.RenderMap(sampleMap(100, 60)))
	path := filepath.Join(goldenDir, "map-sample.png")
	if *update {
		writePNG(t, path, r.Image())
		return
	}
	want := readPNG(t, path)
	diff, share := compareImages(want, r.Image(), pixelTolerance)
	if share > maxDiffShare {
		out := filepath.Join(t.TempDir(), "map-sample.actual.png")
		writePNG(t, out, r.Image())
		t.Fatalf("%d pixels (%.3f%%) differ by more than %d; actual written to %s (run with -update to accept)", diff, 100*share, pixelTolerance, out)
	}
}

// TestMapValidate: bad map data is refused with the error naming the problem.
func TestMapValidate(t *testing.T) {
	cases := []struct {
		name string
		edit func(m *Map)
		want error
	}{
		{"one column", func(m *Map) { m.X = m.X[:1]; m.Cells = m.Cells[:len(m.Y)] }, ErrBadMap},
		{"NaN X", func(m *Map) { m.X[3] = math.NaN() }, ErrNotFinite},
		{"X not increasing", func(m *Map) { m.X[3] = m.X[2] }, ErrNotIncreasing},
		{"cells short", func(m *Map) { m.Cells = m.Cells[1:] }, ErrBadMap},
		{"key out of range", func(m *Map) { m.Cells[5] = 9 }, ErrBadMap},
		{"walls short", func(m *Map) { m.Walls = []uint8{1} }, ErrBadMap},
		{"near-tie marks short", func(m *Map) { m.Ties = []bool{true} }, ErrBadMap},
		{"Inf point", func(m *Map) { m.Point.Y = math.Inf(1) }, ErrNotFinite},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			m := sampleMap(10, 8)
			c.edit(m)
			assert.True(t, errors.Is(m.Validate(), c.want), "%v", m.Validate())
			r, err := NewMapRaster(200, 100)
			require.NoError(t, err)
			assert.Error(t, r.RenderMap(m))
			assert.Error(t, WriteMap(&bytes.Buffer{}, SVG, m, DefaultExportSize))
		})
	}
	r, err := NewMapRaster(200, 100)
	require.NoError(t, err)
	assert.ErrorIs(t, r.RenderMap(nil), ErrNoMap)
}

// TestMapExportFormats writes the map as PNG, SVG and PDF; each file starts
// with its format's signature and the vector ones carry no font references.
func TestMapExportFormats(t *testing.T) {
	dir := t.TempDir()
	m := sampleMap(40, 24)
	for _, c := range []struct{ ext, magic string }{{".png", "\x89PNG"}, {".svg", "<?xml"}, {".pdf", "%PDF"}} {
		path := filepath.Join(dir, "map"+c.ext)
		require.NoError(t, SaveMap(path, m, DefaultExportSize))
		b, err := os.ReadFile(path)
		require.NoError(t, err)
		assert.True(t, bytes.HasPrefix(b, []byte(c.magic)), c.ext)
	}
	assert.ErrorIs(t, SaveMap(filepath.Join(dir, "map.gif"), m, DefaultExportSize), ErrUnknownFormat)
}

// TestMapWallsOverride: explicit walls replace the drawn boundaries (a
// near tie hides one), so a map with no walls has no boundary ink.
func TestMapWallsOverride(t *testing.T) {
	m := sampleMap(40, 24)
	r, err := NewMapRaster(480, 300)
	require.NoError(t, err)
	require.NoError(t, r.RenderMap(m))
	withWalls := dark(r.Image().Pix)
	m.Walls = make([]uint8, len(m.Cells))
	require.NoError(t, r.RenderMap(m))
	assert.Less(t, dark(r.Image().Pix), withWalls)
}

// TestMapTieDots: near-tie marks add dark dots to the map and an entry to
// the legend; marks that are all false draw nothing.
func TestMapTieDots(t *testing.T) {
	m := sampleMap(40, 24)
	r, err := NewMapRaster(480, 300)
	require.NoError(t, err)
	require.NoError(t, r.RenderMap(m))
	plain := dark(r.Image().Pix)
	m.Ties = make([]bool, len(m.Cells))
	require.NoError(t, r.RenderMap(m))
	assert.Equal(t, plain, dark(r.Image().Pix), "no marked cell, no dot")
	assert.False(t, m.hasTies())
	for k := 0; k < len(m.Ties); k += 3 {
		m.Ties[k] = true
	}
	require.NoError(t, r.RenderMap(m))
	assert.Greater(t, dark(r.Image().Pix), plain)
	var texts []string
	legendTexts(m, func(s string, heading bool) { texts = append(texts, s) })
	assert.Contains(t, texts, "Near-tie")
	m.TieLabel = "Near-tie kept (within 5%)"
	texts = texts[:0]
	legendTexts(m, func(s string, heading bool) { texts = append(texts, s) })
	assert.Contains(t, texts, "Near-tie kept (within 5%)")
}

// dark counts near-black pixels.
func dark(pix []byte) int {
	n := 0
	for i := 0; i+3 < len(pix); i += 4 {
		if pix[i] < 40 && pix[i+1] < 40 && pix[i+2] < 40 {
			n++
		}
	}
	return n
}

// TestMapRasterMemoryFlat: redrawing a map many times does not grow the heap.
func TestMapRasterMemoryFlat(t *testing.T) {
	m := sampleMap(100, 60)
	r, err := NewMapRaster(800, 480)
	require.NoError(t, err)
	for i := 0; i < 3; i++ {
		require.NoError(t, r.RenderMap(m))
	}
	var a, b runtime.MemStats
	runtime.GC()
	runtime.ReadMemStats(&a)
	for i := 0; i < 20; i++ {
		require.NoError(t, r.RenderMap(m))
	}
	runtime.GC()
	runtime.ReadMemStats(&b)
	assert.Less(t, int64(b.HeapAlloc)-int64(a.HeapAlloc), int64(2<<20))
}

// BenchmarkMapRender draws a 100×60 map at window size.
func BenchmarkMapRender(b *testing.B) {
	m := sampleMap(100, 60)
	r, err := NewMapRaster(960, 560)
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		if err := r.RenderMap(m); err != nil {
			b.Fatal(err)
		}
	}
}

// TestMapCellsArea: the reported cell area lies inside the image and a
// pixel in it shows a region colour, not the white page.
func TestMapCellsArea(t *testing.T) {
	r, err := NewMapRaster(640, 400)
	require.NoError(t, err)
	require.NoError(t, r.RenderMap(sampleMap(20, 10)))
	a := r.CellsArea()
	assert.True(t, a.In(r.Image().Bounds()), "%v", a)
	assert.Greater(t, a.Dx(), 300)
	assert.Greater(t, a.Dy(), 200)
	c := r.Image().RGBAAt(a.Min.X+3, a.Max.Y-3)
	assert.False(t, c.R == 255 && c.G == 255 && c.B == 255, "bottom-left cell is painted: %v", c)
	o := r.Image().RGBAAt(a.Min.X-12, a.Max.Y-3)
	assert.True(t, o.R == 255 && o.G == 255 && o.B == 255, "left of the cells is the page: %v", o)
}

// TestMapKeysStayApartInGrey: the first keys of a map each get their own
// hatch pattern, none of them the pattern of the cells where nothing works,
// so regions differ without colour.
func TestMapKeysStayApartInGrey(t *testing.T) {
	seen := map[string]bool{fmt.Sprint(noneHatchPattern): true}
	for _, h := range hatches {
		k := fmt.Sprint(h)
		assert.False(t, seen[k], "pattern %v used twice", h)
		seen[k] = true
	}
	assert.GreaterOrEqual(t, len(hatches), 14, "room for every family of one scheme: 6 steel, 4 concrete, 2 timber and more")
}
