package plots

import (
	"bytes"
	"math"
	"os"
	"path/filepath"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
	"gonum.org/v1/plot/vg"
)

// Magic bytes of each format: PNG signature (PNG spec §5.2), PDF header
// "%PDF-" (ISO 32000-1 §7.5.2), and the XML declaration gonum's SVG writer emits.
var magic = map[Format][]byte{
	PNG: []byte("\x89PNG\r\n\x1a\n"),
	PDF: []byte("%PDF-"),
	SVG: []byte("<?xml"),
}

// TestWriteChartFormats checks each format writes a non-empty stream with its magic bytes.
func TestWriteChartFormats(t *testing.T) {
	c := sampleChart(4, 60)
	for _, f := range []Format{PNG, SVG, PDF} {
		t.Run(string(f), func(t *testing.T) {
			var buf bytes.Buffer
			require.NoError(t, WriteChart(&buf, f, c, Size{Width: 540, Height: 324}))
			require.Greater(t, buf.Len(), 1000)
			assert.True(t, bytes.HasPrefix(buf.Bytes(), magic[f]), "%q", buf.Bytes()[:8])
			if f == SVG {
				assert.Contains(t, buf.String(), "<svg")
				// Text stays text, selectable and searchable, in an embedded font.
				assert.Contains(t, buf.String(), "<text")
				assert.Contains(t, buf.String(), "@font-face")
			}
			if f == PDF {
				// Plain ASCII in a regular face is written as PDF text.
				assert.Contains(t, buf.String(), "/Font")
			}
		})
	}
}

// TestSaveChartByExtension checks files are written in the format their extension names.
func TestSaveChartByExtension(t *testing.T) {
	dir := t.TempDir()
	c := sampleChart(3, 40)
	for _, name := range []string{"chart.png", "chart.SVG", "chart.pdf"} {
		path := filepath.Join(dir, name)
		require.NoError(t, SaveChart(path, c, DefaultExportSize))
		data, err := os.ReadFile(path)
		require.NoError(t, err)
		f, err := FormatOf(name)
		require.NoError(t, err)
		assert.True(t, bytes.HasPrefix(data, magic[f]), name)
	}
	err := SaveChart(filepath.Join(dir, "chart.jpg"), c, DefaultExportSize)
	assert.ErrorIs(t, err, ErrUnknownFormat)
	_, err = os.Stat(filepath.Join(dir, "chart.jpg"))
	assert.True(t, os.IsNotExist(err), "no file for a refused format")
}

// TestPNGExportSize checks the PNG pixel size follows points × DPI / 72.
func TestPNGExportSize(t *testing.T) {
	var buf bytes.Buffer
	require.NoError(t, WriteChart(&buf, PNG, sampleChart(2, 20), Size{Width: 360, Height: 216, DPI: 144}))
	img, err := decodePNG(buf.Bytes())
	require.NoError(t, err)
	assert.Equal(t, 720, img.Bounds().Dx())
	assert.Equal(t, 432, img.Bounds().Dy())
}

// TestExportRejects checks bad sizes, formats and data are refused with named errors.
func TestExportRejects(t *testing.T) {
	var buf bytes.Buffer
	c := sampleChart(2, 20)
	assert.ErrorIs(t, WriteChart(&buf, Format("gif"), c, DefaultExportSize), ErrUnknownFormat)
	assert.ErrorIs(t, WriteChart(&buf, PDF, c, Size{Width: 0, Height: 300}), ErrBadSize)
	assert.ErrorIs(t, WriteChart(&buf, SVG, c, Size{Width: math.NaN(), Height: 300}), ErrBadSize)
	assert.ErrorIs(t, WriteChart(&buf, PNG, c, Size{Width: 14400, Height: 14400, DPI: 600}), ErrBadSize)
	assert.ErrorIs(t, WriteChart(&buf, PNG, c, Size{Width: 300, Height: 300, DPI: 5}), ErrBadSize)
	assert.ErrorIs(t, WriteChart(&buf, PNG, nil, DefaultExportSize), ErrNoChart)
	c.Demand[0].Y = math.Inf(1)
	assert.ErrorIs(t, WriteChart(&buf, PNG, c, DefaultExportSize), ErrNotFinite)
	assert.Zero(t, buf.Len(), "nothing written on error")
	_, err := FormatOf("noext")
	assert.ErrorIs(t, err, ErrUnknownFormat)
}

// TestOutlinedTextAdvance checks glyph outlines advance like gonum's own text
// measurement, so outlined labels line up with the boxes measured for them.
func TestOutlinedTextAdvance(t *testing.T) {
	rec := &pathRecorder{}
	oc := &outlinedText{CanvasWriterTo: rec}
	sty := textStyle(faceRegular, 10, inkText)
	face := sty.Handler.Cache().Lookup(sty.Font, sty.Font.Size)
	oc.FillString(face, vg.Point{X: 0, Y: 0}, "φPn ×")
	require.NotEmpty(t, rec.maxX)
	width := float64(sty.Width("φPn ×"))
	// The last glyph's ink ends a little before the advance width.
	assert.InDelta(t, width, rec.maxX[len(rec.maxX)-1], 1.5)
}

// pathRecorder is a vector canvas that records the right-most x of each fill.
type pathRecorder struct {
	vg.CanvasWriterTo
	maxX []float64
}

// Fill records the right-most x of the path.
func (r *pathRecorder) Fill(p vg.Path) {
	m := math.Inf(-1)
	for _, c := range p {
		m = math.Max(m, float64(c.Pos.X))
	}
	r.maxX = append(r.maxX, m)
}
