package plots

import (
	"image"
	"image/color"
	"image/png"
	"os"
	"path/filepath"
	"testing"
)

// TestWriteLook writes a sample chart and its greyscale version for a person
// to look at; it runs only when PLOTS_LOOK names an output directory.
func TestWriteLook(t *testing.T) {
	dir := os.Getenv("PLOTS_LOOK")
	if dir == "" {
		t.Skip("set PLOTS_LOOK=<dir> to write sample images for review")
	}
	r, err := NewRaster(1200, 700)
	if err != nil {
		t.Fatal(err)
	}
	if err := r.Render(sampleChart(8, 200)); err != nil {
		t.Fatal(err)
	}
	writePNG(t, filepath.Join(dir, "look.png"), r.Image())
	writePNG(t, filepath.Join(dir, "look-grey.png"), toGrey(r.Image()))
}

// toGrey converts img to 8-bit luminance, as a mono printer would.
func toGrey(img image.Image) *image.Gray {
	b := img.Bounds()
	g := image.NewGray(b)
	for y := b.Min.Y; y < b.Max.Y; y++ {
		for x := b.Min.X; x < b.Max.X; x++ {
			g.Set(x, y, color.GrayModel.Convert(img.At(x, y)))
		}
	}
	return g
}

// writePNG encodes img to path, failing the test on error.
func writePNG(t *testing.T, path string, img image.Image) {
	t.Helper()
	f, err := os.Create(path)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	if err := png.Encode(f, img); err != nil {
		t.Fatal(err)
	}
}

// TestWriteLookExports writes the sample chart as SVG and PDF for review; it
// runs only when PLOTS_LOOK names an output directory.
func TestWriteLookExports(t *testing.T) {
	dir := os.Getenv("PLOTS_LOOK")
	if dir == "" {
		t.Skip("set PLOTS_LOOK=<dir> to write sample exports for review")
	}
	for _, name := range []string{"look.svg", "look.pdf", "look-export.png"} {
		if err := SaveChart(filepath.Join(dir, name), sampleChart(8, 200), DefaultExportSize); err != nil {
			t.Fatal(err)
		}
	}
}
