package cli

import (
	"bytes"
	"image"
	"image/png"
	"os"
	"path/filepath"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
)

// Every export carries the caution: the CSV in its last column (a row copied
// out of the file keeps it) and on stderr, the chart image as a footer line
// along its bottom edge.
func TestExportsCarryTheCaution(t *testing.T) {
	code, out, errOut := run("table", "--length", "4m", "--load", "1800kN")
	require.Equal(t, 0, code, errOut)
	assert.Contains(t, errOut, model.Caution)
	assert.Contains(t, out, ",caution\r\n", "the header names the caution column")
	assert.Contains(t, out, ","+model.Caution+"\r\n", "each row ends with the caution")

	dir := t.TempDir()
	code, _, errOut = run("table", "--length", "4m", "--load", "1800kN", "--csv", filepath.Join(dir, "t.csv"))
	require.Equal(t, 0, code, errOut)
	assert.Contains(t, errOut, model.Caution)

	path := filepath.Join(dir, "c.png")
	code, _, errOut = run("compare", "--length", "4m", "--load", "1800kN", "--chart", path)
	require.Equal(t, 0, code, errOut)
	b, err := os.ReadFile(path)
	require.NoError(t, err)
	img, err := png.Decode(bytes.NewReader(b))
	require.NoError(t, err)
	r := img.Bounds()
	strip := image.Rect(r.Min.X, r.Max.Y-r.Dy()/25, r.Min.X+r.Dx()/6, r.Max.Y)
	ink := 0
	for y := strip.Min.Y; y < strip.Max.Y; y++ {
		for x := strip.Min.X; x < strip.Max.X; x++ {
			cr, cg, cb, _ := img.At(x, y).RGBA()
			if cr+cg+cb < 3*0x8000 {
				ink++
			}
		}
	}
	assert.Greater(t, ink, 50, "the caution footer is drawn in the bottom-left strip")
	for _, ext := range []string{".svg", ".pdf"} {
		p := filepath.Join(dir, "c"+ext)
		code, _, errOut = run("compare", "--length", "4m", "--load", "1800kN", "--chart", p)
		require.Equal(t, 0, code, errOut)
	}
}
