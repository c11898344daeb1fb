package plots

import (
	"bytes"
	"errors"
	"image/color"
	"math"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
	"gonum.org/v1/plot/font"
)

// ringLoop returns a circle of diameter d as an n-gon about the origin.
func ringLoop(d float64, n int) []Point {
	out := make([]Point, n)
	for k := range out {
		t := 2 * math.Pi * float64(k) / float64(n)
		out[k] = Point{X: d / 2 * math.Cos(t), Y: d / 2 * math.Sin(t)}
	}
	return out
}

// boxLoop returns a w × h rectangle about the origin.
func boxLoop(w, h float64) []Point {
	return []Point{{-w / 2, -h / 2}, {w / 2, -h / 2}, {w / 2, h / 2}, {-w / 2, h / 2}}
}

// sampleSheet is an invented set of sections: a hollow box, a ring, a solid
// square with bars and a tie, and a rectangle with a char layer.
func sampleSheet() PlanSheet {
	bars := func(w float64) []PlanPart {
		var out []PlanPart
		for _, p := range []Point{{-1, -1}, {1, -1}, {1, 1}, {-1, 1}} {
			l := ringLoop(25, 16)
			for k := range l {
				l[k].X += p.X * (w/2 - 60)
				l[k].Y += p.Y * (w/2 - 60)
			}
			out = append(out, PlanPart{Kind: PartBar, Loops: [][]Point{l}})
		}
		return out
	}
	return PlanSheet{
		Title:       "Invented sections",
		ReferenceMM: 300, ReferenceLabel: "300 mm square",
		ScaleBarMM: 300, ScaleBarDivisions: 3, ScaleBarLabel: "300 mm",
		Note:    "A note under the sections.",
		Caution: "Invented data for a test.",
		Sections: []PlanSection{
			{Group: "steel", Title: "Box 250", Lines: []string{"250 × 250 mm", "60 kg/m"}, WidthMM: 250, DepthMM: 250,
				Parts: []PlanPart{{Kind: PartBody, Loops: [][]Point{boxLoop(250, 250), boxLoop(230, 230)}}}},
			{Group: "steel", Title: "Ring 320", Lines: []string{"320 mm", "70 kg/m"}, WidthMM: 320, DepthMM: 320,
				Parts: []PlanPart{{Kind: PartBody, Loops: [][]Point{ringLoop(320, 96), ringLoop(300, 96)}}}},
			{Group: "concrete", Title: "Square 450", Lines: []string{"450 × 450 mm"}, WidthMM: 450, DepthMM: 450, Selected: true,
				Parts: append([]PlanPart{
					{Kind: PartBody, Loops: [][]Point{boxLoop(450, 450)}},
					{Kind: PartTie, Loops: [][]Point{boxLoop(450-2*40-10, 450-2*40-10)}, LineMM: 10},
				}, bars(450)...)},
			{Group: "timber", Title: "Post 190 × 240", Lines: []string{"190 × 240 mm"}, WidthMM: 190, DepthMM: 240,
				Parts: []PlanPart{
					{Kind: PartBody, Loops: [][]Point{boxLoop(190, 240)}},
					{Kind: PartChar, Loops: [][]Point{boxLoop(190, 240), boxLoop(190-92, 240-92)}},
				}},
		},
	}
}

// TestPlanSheetOneScale checks that every drawn section and the reference
// square share one pixels-per-millimetre, that the drawn outlines enclose the
// areas given (shoelace formula on the drawn pixels), and that no two
// sections overlap.
func TestPlanSheetOneScale(t *testing.T) {
	sh := sampleSheet()
	l, err := LayoutPlan(&sh, Size{Width: 900, Height: 375, DPI: 96})
	require.NoError(t, err)
	require.Greater(t, l.PxPerMM, 0.0)
	assert.InDelta(t, 300*l.PxPerMM, l.Reference.W, 1e-6)
	assert.InDelta(t, 300*l.PxPerMM, l.Reference.H, 1e-6)
	for i, sec := range sh.Sections {
		b := l.Sections[i]
		assert.InDelta(t, sec.WidthMM*l.PxPerMM, b.W, 1e-6, sec.Title)
		assert.InDelta(t, sec.DepthMM*l.PxPerMM, b.H, 1e-6, sec.Title)
		assert.GreaterOrEqual(t, b.X, 0.0)
		assert.LessOrEqual(t, b.X+b.W, 1200.0)
		for j := range i {
			o := l.Sections[j]
			overlap := b.SlotX < o.SlotX+o.SlotW && o.SlotX < b.SlotX+b.SlotW && b.SlotY < o.SlotY+o.SlotH && o.SlotY < b.SlotY+b.SlotH
			assert.False(t, overlap, "%s overlaps %s", sec.Title, sh.Sections[j].Title)
		}
	}
	// Areas as drawn, back in mm²: hollow box 250² − 230² = 9,600 mm²;
	// the 96-gon ring as given; solid square 450² = 202,500 mm².
	k := l.PxPerMM * l.PxPerMM
	assert.InEpsilon(t, 9600, l.Polygons[0][0].Area()/k, 1e-9)
	ring := PolygonArea(ringLoop(320, 96)) - PolygonArea(ringLoop(300, 96))
	assert.InEpsilon(t, ring, l.Polygons[1][0].Area()/k, 1e-9)
	assert.InEpsilon(t, 202500, l.Polygons[2][0].Area()/k, 1e-9)
	assert.InDelta(t, 2, l.Pick(l.Sections[2].X+1, l.Sections[2].Y+1), 0)
	assert.Equal(t, -1, l.Pick(-5, -5))
}

// TestPlanProtectionAdds checks that a board enclosure widens the drawn
// section by twice its thickness at the common scale.
func TestPlanProtectionAdds(t *testing.T) {
	sh := sampleSheet()
	sh.Sections[0].ProtectionMM = 32
	l, err := LayoutPlan(&sh, Size{Width: 900, Height: 375, DPI: 96})
	require.NoError(t, err)
	assert.InDelta(t, (250+2*32)*l.PxPerMM, l.Sections[0].W, 1e-6)
	assert.InDelta(t, (250+2*32)*l.PxPerMM, l.Sections[0].H, 1e-6)
	assert.InDelta(t, 320*l.PxPerMM, l.Sections[1].W, 1e-6, "the others are unchanged")
}

// TestPlanSheetValidates checks that bad numbers are refused with a named error.
func TestPlanSheetValidates(t *testing.T) {
	for name, mutate := range map[string]func(*PlanSheet){
		"zero width":     func(s *PlanSheet) { s.Sections[0].WidthMM = 0 },
		"NaN depth":      func(s *PlanSheet) { s.Sections[1].DepthMM = math.NaN() },
		"negative board": func(s *PlanSheet) { s.Sections[0].ProtectionMM = -1 },
		"Inf point":      func(s *PlanSheet) { s.Sections[0].Parts[0].Loops[0][0].X = math.Inf(1) },
		"divisions":      func(s *PlanSheet) { s.ScaleBarDivisions = 0 },
		"reference":      func(s *PlanSheet) { s.ReferenceMM = -300 },
	} {
		sh := sampleSheet()
		mutate(&sh)
		err := sh.Validate()
		require.Error(t, err, name)
		assert.True(t, errors.Is(err, ErrBadSize) || errors.Is(err, ErrNotFinite), name)
		r, _ := NewRaster(200, 100)
		_, err = r.RenderPlan(&sh)
		assert.Error(t, err, name)
	}
	_, err := LayoutPlan(nil, DefaultPlanSize)
	assert.ErrorIs(t, err, ErrNoChart)
}

// TestPlanExports writes the sheet in all three formats from the one drawing.
func TestPlanExports(t *testing.T) {
	sh := sampleSheet()
	for _, f := range []Format{PNG, SVG, PDF} {
		var buf bytes.Buffer
		l, err := WritePlan(&buf, f, &sh, DefaultPlanSize)
		require.NoError(t, err, f)
		require.Len(t, l.Labels, len(sh.Sections))
		assert.Equal(t, "Square 450", l.Labels[2][0])
		switch f {
		case PNG:
			img, err := decodePNG(buf.Bytes())
			require.NoError(t, err)
			assert.Equal(t, 1200, img.Bounds().Dx())
			assert.Equal(t, 500, img.Bounds().Dy())
		case SVG:
			s := buf.String()
			assert.Contains(t, s, "<desc>")
			for _, sec := range sh.Sections {
				assert.Contains(t, s, sec.Title)
			}
			assert.Contains(t, s, "Invented data for a test.")
		case PDF:
			assert.True(t, bytes.HasPrefix(buf.Bytes(), []byte("%PDF")))
		}
	}
	path := filepath.Join(t.TempDir(), "s.svg")
	_, err := SavePlan(path, &sh, DefaultPlanSize)
	require.NoError(t, err)
	_, err = SavePlan(strings.TrimSuffix(path, ".svg")+".gif", &sh, DefaultPlanSize)
	assert.ErrorIs(t, err, ErrUnknownFormat)
}

// TestPlanEmpty draws the message when there is nothing to show.
func TestPlanEmpty(t *testing.T) {
	sh := PlanSheet{Empty: "Nothing works here.", ReferenceMM: 300, ReferenceLabel: "300 mm square"}
	r, err := NewRaster(600, 250)
	require.NoError(t, err)
	l, err := r.RenderPlan(&sh)
	require.NoError(t, err)
	assert.Empty(t, l.Sections)
}

// BenchmarkRenderPlan1200x500 draws the sample sheet with eight sections at
// 1200 × 500 px into one reused buffer (target: at most 10 ms).
func BenchmarkRenderPlan1200x500(b *testing.B) {
	sh := sampleSheet()
	sh.Sections = append(sh.Sections, sh.Sections...)
	sh.Caution = ""
	r, err := NewRaster(1200, 500)
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		if _, err := r.RenderPlan(&sh); err != nil {
			b.Fatal(err)
		}
	}
	b.StopTimer()
	b.ReportMetric(float64(b.Elapsed().Microseconds())/1000/float64(b.N), "ms/render")
}

// TestPlanFilledTube draws a filled tube (composite): the wall and the fill
// are both drawn, and together make the gross outline.
func TestPlanFilledTube(t *testing.T) {
	sh := PlanSheet{Sections: []PlanSection{{
		Group: "composite", Title: "Filled box 300", WidthMM: 300, DepthMM: 300,
		Parts: []PlanPart{
			{Kind: PartBody, Loops: [][]Point{boxLoop(300, 300), boxLoop(280, 280)}},
			{Kind: PartFill, Loops: [][]Point{boxLoop(280, 280)}},
		},
	}}}
	l, err := LayoutPlan(&sh, DefaultPlanSize)
	require.NoError(t, err)
	require.Len(t, l.Polygons[0], 2)
	k := l.PxPerMM * l.PxPerMM
	assert.Equal(t, PartFill, l.Polygons[0][1].Kind)
	assert.InEpsilon(t, 300*300, (l.Polygons[0][0].Area()+l.Polygons[0][1].Area())/k, 1e-9, "wall 300² − 280², fill 280²")
	r, err := NewRaster(600, 250)
	require.NoError(t, err)
	rl, err := r.RenderPlan(&sh)
	require.NoError(t, err)
	// The centre of the fill is drawn in the concrete tint, the wall in steel blue.
	b := rl.Sections[0]
	px := r.Image().RGBAAt(int(b.X+b.W/2), int(b.Y+b.H/2))
	assert.Equal(t, planConcrete, color.NRGBA(px))
	wall := r.Image().RGBAAt(int(b.X+b.W/2), int(b.Y+1))
	assert.Equal(t, okabeBlue, color.NRGBA(wall))
}

// TestPlanAnySize draws the sample sheet into rasters from tiny to wide and
// with one very large section beside small ones: nothing panics, the one
// scale holds and every box stays finite.
func TestPlanAnySize(t *testing.T) {
	for _, sz := range [][2]int{{1, 1}, {40, 30}, {200, 100}, {420, 260}, {3000, 300}, {300, 3000}} {
		for _, huge := range []bool{false, true} {
			sh := sampleSheet()
			if huge {
				sh.Sections[1].WidthMM, sh.Sections[1].DepthMM = 1524, 1524
			}
			r, err := NewRaster(sz[0], sz[1])
			require.NoError(t, err)
			l, err := r.RenderPlan(&sh)
			require.NoError(t, err, sz)
			require.False(t, math.IsNaN(l.PxPerMM) || math.IsInf(l.PxPerMM, 0), sz)
			for i, b := range l.Sections {
				for _, v := range []float64{b.X, b.Y, b.W, b.H, b.SlotX, b.SlotY, b.SlotW, b.SlotH} {
					require.False(t, math.IsNaN(v) || math.IsInf(v, 0), "%v section %d", sz, i)
				}
				assert.InDelta(t, sh.Sections[i].WidthMM*l.PxPerMM, b.W, 1e-6, "%v", sz)
			}
		}
	}
}

// TestPlanSmallViewShrinksLabels checks that a small view trades label
// lines for scale (the sizes alone are labelled), while the export size
// keeps every label line.
func TestPlanSmallViewShrinksLabels(t *testing.T) {
	sh := sampleSheet()
	sh.Sections = append(append(sh.Sections, sh.Sections...), sh.Sections...)
	var buf bytes.Buffer
	small, err := WritePlan(&buf, PNG, &sh, Size{Width: 400, Height: 200, DPI: 96})
	require.NoError(t, err)
	deepest := 0.0
	for i, b := range small.Sections {
		deepest = math.Max(deepest, b.H)
		assert.Equal(t, []string{sh.Sections[i].Title}, small.Labels[i], "the size alone in a small view")
	}
	assert.Greater(t, deepest, 20.0, "the sections stay readable")

	l, err := WritePlan(&buf, SVG, &sh, DefaultPlanSize)
	require.NoError(t, err)
	for i, sec := range sh.Sections {
		assert.Equal(t, append([]string{sec.Title}, sec.Lines...), l.Labels[i], "full labels at the export size")
	}
}

// TestPlanLabelsAreDrawn checks that every section's labels leave ink under
// it in the raster (they are drawn from cached masks), and that the mask
// cache stays bounded.
func TestPlanLabelsAreDrawn(t *testing.T) {
	sh := sampleSheet()
	r, err := NewRaster(1200, 500)
	require.NoError(t, err)
	for pass := 0; pass < 2; pass++ { // the second pass draws from the cache
		l, err := r.RenderPlan(&sh)
		require.NoError(t, err)
		img := r.Image()
		for i, b := range l.Sections {
			ink := 0
			for y := int(b.Y + b.H + 2); y < int(b.SlotY+b.SlotH); y++ {
				for x := int(b.SlotX); x < int(b.SlotX+b.SlotW); x++ {
					if c := img.RGBAAt(x, y); int(c.R)+int(c.G)+int(c.B) < 3*128 {
						ink++
					}
				}
			}
			assert.Greater(t, ink, 40, "pass %d: labels of %s", pass, sh.Sections[i].Title)
		}
	}
	face := font.DefaultCache.Lookup(planText.foot.Font, planText.foot.Font.Size)
	for i := 0; i < 3*maxTextMasks; i++ {
		planMasks.get(face, 96, strconv.Itoa(i))
	}
	planMasks.mu.Lock()
	n := len(planMasks.m)
	planMasks.mu.Unlock()
	assert.LessOrEqual(t, n, maxTextMasks)
}
