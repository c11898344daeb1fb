package plots

import (
	"bytes"
	"flag"
	"fmt"
	"image"
	"image/png"
	"math"
	"os"
	"path/filepath"
	"testing"

	"github.com/stretchr/testify/require"
)

// update regenerates the golden images instead of comparing against them.
var update = flag.Bool("update", false, "rewrite the golden images in ../testdata/plots")

// goldenDir holds the reference renders.
const goldenDir = "../testdata/plots"

// Golden comparison tolerances: a pixel differs when any channel is off by
// more than pixelTolerance, and the test fails when more than maxDiffShare of
// the pixels differ (room for font rasteriser and float rounding drift).
const (
	pixelTolerance = 32
	maxDiffShare   = 0.002
)

// goldenCases are the scenes kept as reference images; all data are invented.
func goldenCases() []struct {
	name  string
	w, h  int
	chart *Chart
} {
	comparison := sampleChart(6, 120)

	empty := &Chart{
		Title:  "Design strength against unbraced length",
		XLabel: "Unbraced length (ft)",
		YLabel: "Design strength φPn (kip)",
		Marker: &Marker{X: 12, Label: "L = 12 ft"},
		XRange: &Range{Min: 4, Max: 30},
	}

	capped := sampleChart(4, 80)
	capped.Series = append(capped.Series, Series{Label: "Steel HSS 16×16×5/8", Group: "steel"})
	for _, p := range capped.Demand {
		capped.Series[len(capped.Series)-1].Points = append(capped.Series[len(capped.Series)-1].Points,
			Point{X: p.X, Y: 4000 / (1 + math.Pow(p.X/45, 2))})
	}

	crowded := sampleChart(14, 60)
	crowded.Title = ""
	crowded.Series[3].Label = "Concrete 18 in round, 6 #8 bars, f′c 6000 psi, tied, extra-long label"

	return []struct {
		name  string
		w, h  int
		chart *Chart
	}{
		{"comparison", 960, 560, comparison},
		{"empty", 800, 480, empty},
		{"capped", 960, 560, capped},
		{"crowded", 720, 420, crowded},
	}
}

// TestGolden renders each case and compares it with its reference PNG.
func TestGolden(t *testing.T) {
	for _, tc := range goldenCases() {
		t.Run(tc.name, func(t *testing.T) {
			r, err := NewRaster(tc.w, tc.h)
			require.NoError(t, err)
			require.NoError(t, r.Render(tc.chart))
			path := filepath.Join(goldenDir, tc.name+".png")
			if *update {
				require.NoError(t, os.MkdirAll(goldenDir, 0o755))
				writePNG(t, path, r.Image())
				return
			}
			want := readPNG(t, path)
			diff, share := compareImages(want, r.Image(), pixelTolerance)
			if share > maxDiffShare {
				out := filepath.Join(t.TempDir(), tc.name+".actual.png")
				writePNG(t, out, r.Image())
				t.Fatalf("%s: %d pixels (%.3f%%) differ by more than %d; actual written to %s (run with -update to accept)",
					tc.name, diff, 100*share, pixelTolerance, out)
			}
		})
	}
}

// decodePNG decodes PNG bytes.
func decodePNG(b []byte) (image.Image, error) {
	return png.Decode(bytes.NewReader(b))
}

// readPNG decodes the PNG at path, failing the test when it is missing.
func readPNG(t *testing.T, path string) image.Image {
	t.Helper()
	f, err := os.Open(path)
	require.NoError(t, err, "missing golden image; run go test ./plots/ -run TestGolden -update")
	defer f.Close()
	img, err := png.Decode(f)
	require.NoError(t, err)
	return img
}

// compareImages counts pixels whose channels differ by more than tol and
// returns the count and its share of all pixels; a size mismatch counts every pixel.
func compareImages(a, b image.Image, tol int) (int, float64) {
	ab, bb := a.Bounds(), b.Bounds()
	total := ab.Dx() * ab.Dy()
	if ab.Size() != bb.Size() || total == 0 {
		return total, 1
	}
	diff := 0
	for y := 0; y < ab.Dy(); y++ {
		for x := 0; x < ab.Dx(); x++ {
			r1, g1, b1, a1 := a.At(ab.Min.X+x, ab.Min.Y+y).RGBA()
			r2, g2, b2, a2 := b.At(bb.Min.X+x, bb.Min.Y+y).RGBA()
			if chanDiff(r1, r2) > tol || chanDiff(g1, g2) > tol || chanDiff(b1, b2) > tol || chanDiff(a1, a2) > tol {
				diff++
			}
		}
	}
	return diff, float64(diff) / float64(total)
}

// chanDiff returns the 8-bit difference of two 16-bit colour channels.
func chanDiff(a, b uint32) int {
	d := int(a>>8) - int(b>>8)
	if d < 0 {
		d = -d
	}
	return d
}

// TestCompareImages checks the comparator itself on a known difference.
func TestCompareImages(t *testing.T) {
	a := image.NewRGBA(image.Rect(0, 0, 10, 10))
	b := image.NewRGBA(image.Rect(0, 0, 10, 10))
	b.Pix[0] = 200 // one pixel, red channel off by 200
	b.Pix[4] = 10  // one pixel within tolerance
	n, share := compareImages(a, b, 32)
	require.Equal(t, 1, n, fmt.Sprintf("share %v", share))
	require.InDelta(t, 0.01, share, 1e-12)
	_, share = compareImages(a, image.NewRGBA(image.Rect(0, 0, 5, 5)), 32)
	require.Equal(t, 1.0, share)
}
