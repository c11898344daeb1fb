package plots

import (
	"bufio"
	"fmt"
	"io"
	"math"
	"os"
	"path/filepath"
	"strings"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
	"gonum.org/v1/plot/vg/vgpdf"
	"gonum.org/v1/plot/vg/vgsvg"
)

// Format is an export file format.
type Format string

// The export formats, each written by gonum/plot's own back-end.
const (
	PNG Format = "png"
	SVG Format = "svg"
	PDF Format = "pdf"
)

// Size is an export page size in points (1/72 inch) with the pixel density for PNG.
type Size struct {
	// Width and Height are in points.
	Width, Height float64
	// DPI is the PNG resolution; zero means DefaultDPI. SVG and PDF ignore it.
	DPI int
}

// DefaultExportSize is a 10 × 6 inch page rendered at 192 DPI for PNG.
var DefaultExportSize = Size{Width: 720, Height: 432, DPI: 192}

// Export page limits in points.
const (
	// MinPagePoints and MaxPagePoints bound an export width or height.
	MinPagePoints, MaxPagePoints = 72, 14400
)

// FormatOf returns the format named by the path's extension (.png, .svg, .pdf, any case).
func FormatOf(path string) (Format, error) {
	switch f := Format(strings.ToLower(strings.TrimPrefix(filepath.Ext(path), "."))); f {
	case PNG, SVG, PDF:
		return f, nil
	}
	return "", fmt.Errorf("file %q: %w", path, ErrUnknownFormat)
}

// check reports a size outside the page limits, or a PNG larger than MaxPixels.
func (s Size) check(f Format) error {
	for _, d := range []struct {
		name string
		v    float64
	}{{"width", s.Width}, {"height", s.Height}} {
		if notFinite(d.v) || d.v < MinPagePoints || d.v > MaxPagePoints {
			return fmt.Errorf("export %s %v pt (accepted %d to %d): %w", d.name, d.v, MinPagePoints, MaxPagePoints, ErrBadSize)
		}
	}
	if f == PNG {
		dpi := s.dpi()
		if dpi < MinDPI || dpi > MaxDPI {
			return fmt.Errorf("export dpi %d (accepted %d to %d): %w", dpi, MinDPI, MaxDPI, ErrBadSize)
		}
		w, h := s.pixels()
		if err := checkPixels(w, h); err != nil {
			return fmt.Errorf("export at %d dpi: %w", dpi, err)
		}
	}
	return nil
}

// dpi returns the PNG resolution, defaulting to DefaultDPI.
func (s Size) dpi() int {
	if s.DPI == 0 {
		return DefaultDPI
	}
	return s.DPI
}

// pixels returns the PNG size in pixels.
func (s Size) pixels() (int, int) {
	d := float64(s.dpi()) / 72
	return int(math.Round(s.Width * d)), int(math.Round(s.Height * d))
}

// WriteChart validates c and writes it to w in format f at the given size.
func WriteChart(w io.Writer, f Format, c *Chart, size Size) error {
	if c == nil {
		return ErrNoChart
	}
	if f != PNG && f != SVG && f != PDF {
		return fmt.Errorf("format %q: %w", string(f), ErrUnknownFormat)
	}
	if err := size.check(f); err != nil {
		return err
	}
	if err := c.Validate(); err != nil {
		return err
	}
	cv := newCanvas(f, size)
	newComposer().draw(draw.New(cv), c, f != PNG)
	if _, err := cv.WriteTo(w); err != nil {
		return fmt.Errorf("plots: writing %s: %w", f, err)
	}
	return nil
}

// SaveChart writes c to the file at path, choosing the format from its extension.
func SaveChart(path string, c *Chart, size Size) (err error) {
	f, err := FormatOf(path)
	if err != nil {
		return err
	}
	if c == nil {
		return ErrNoChart
	}
	if err := size.check(f); err != nil {
		return err
	}
	if err := c.Validate(); err != nil {
		return err
	}
	return saveFile(path, func(w io.Writer) error { return WriteChart(w, f, c, size) })
}

// newCanvas returns the canvas of format f at the given size: a PNG raster
// whose pixel count is exactly the size's, or SVG or PDF with text drawn as
// outlines. f must be PNG, SVG or PDF.
func newCanvas(f Format, size Size) vg.CanvasWriterTo {
	wd, ht := vg.Points(size.Width), vg.Points(size.Height)
	var cv vg.CanvasWriterTo
	switch f {
	case PNG:
		pw, ph := size.pixels()
		// Derive the length from the pixel count so vgimg allocates exactly pw × ph.
		d := vg.Length(size.dpi())
		cv = vgimg.PngCanvas{Canvas: vgimg.NewWith(
			vgimg.UseWH(vg.Length(pw)/d*vg.Inch, vg.Length(ph)/d*vg.Inch),
			vgimg.UseDPI(size.dpi()),
		)}
	case SVG:
		// SVG keeps every string as text, with the fonts embedded so it
		// looks the same on any viewer.
		cv = vgsvg.NewWith(vgsvg.UseWH(wd, ht), vgsvg.EmbedFonts(true))
	case PDF:
		cv = &outlinedText{CanvasWriterTo: vgpdf.New(wd, ht), keep: pdfText}
	}
	return cv
}

// saveFile creates the file at path and writes it through a buffer with
// write, reporting the first error of writing, flushing or closing.
func saveFile(path string, write func(w io.Writer) error) (err error) {
	file, err := os.Create(path)
	if err != nil {
		return fmt.Errorf("plots: %w", err)
	}
	defer func() {
		if cerr := file.Close(); cerr != nil && err == nil {
			err = fmt.Errorf("plots: %w", cerr)
		}
	}()
	bw := bufio.NewWriter(file)
	if err := write(bw); err != nil {
		return err
	}
	if err := bw.Flush(); err != nil {
		return fmt.Errorf("plots: writing %q: %w", path, err)
	}
	return nil
}
