package plots

import (
	"image/color"
	"strings"
	"testing"
)

// TestSwatchDrawsTheSeriesColour checks that a swatch carries the colour its
// series is drawn in (the style table in style.go), so a key outside the
// chart matches the curve.
func TestSwatchDrawsTheSeriesColour(t *testing.T) {
	ch := sampleChart(4, 20)
	r, err := NewRaster(44, 16)
	if err != nil {
		t.Fatal(err)
	}
	for i := range ch.Series {
		if err := r.RenderSwatch(ch, i); err != nil {
			t.Fatal(err)
		}
		want := color.NRGBAModel.Convert(r.k.styles(ch)[i].line.Color).(color.NRGBA)
		found := false
		img := r.Image()
		for x := 0; x < 44 && !found; x++ {
			c := color.NRGBAModel.Convert(img.At(x, 8)).(color.NRGBA)
			found = absDiff(c.R, want.R) < 24 && absDiff(c.G, want.G) < 24 && absDiff(c.B, want.B) < 24
		}
		if !found {
			t.Errorf("series %d: swatch has no pixel in its colour %v along its middle", i, want)
		}
	}
	if err := r.RenderSwatch(ch, len(ch.Series)); err == nil {
		t.Error("a series index past the end is refused")
	}
}

func absDiff(a, b uint8) int {
	if a > b {
		return int(a - b)
	}
	return int(b - a)
}

// TestKeyNoteListsPinnedSeriesInsteadOfHiding checks that a chart whose
// series are keyed elsewhere never hides candidates behind a count: when the
// full legend does not fit it lists the pinned series, the reference keys
// and the note; when it fits it lists every series.
func TestKeyNoteListsPinnedSeriesInsteadOfHiding(t *testing.T) {
	ch := sampleChart(14, 30)
	ch.Title = ""
	ch.Series[5].Pinned = true
	ch.KeyNote = "Each curve is keyed beside its table row."
	r, err := NewRaster(640, 260)
	if err != nil {
		t.Fatal(err)
	}
	if err := r.Render(ch); err != nil {
		t.Fatal(err)
	}
	var series []int
	var notes []string
	for _, row := range r.k.legend.rows {
		switch row.kind {
		case rowSeries:
			series = append(series, row.series)
		case rowNote:
			notes = append(notes, row.text)
		}
	}
	note := strings.Contains(strings.Join(notes, " "), ch.KeyNote)
	// sampleChart pins series 1; the test pins 5 too.
	if len(series) != 2 || series[0] != 1 || series[1] != 5 || !note {
		t.Errorf("crowded legend lists series %v (want only the pinned 1 and 5) and the note: %v", series, note)
	}
	big, err := NewRaster(1600, 1200)
	if err != nil {
		t.Fatal(err)
	}
	if err := big.Render(ch); err != nil {
		t.Fatal(err)
	}
	n := 0
	for _, row := range big.k.legend.rows {
		if row.kind == rowSeries {
			n++
		}
	}
	if n != len(ch.Series) {
		t.Errorf("a legend with room lists %d of %d series", n, len(ch.Series))
	}
}
