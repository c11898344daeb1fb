package plots

import (
	"image/color"
	"testing"

	"github.com/stretchr/testify/assert"
)

// okabeIto lists the palette's published sRGB values (Okabe & Ito 2008,
// "Color Universal Design"; from memory).
var okabeIto = map[color.NRGBA]string{
	{0xE6, 0x9F, 0x00, 0xff}: "orange",
	{0x56, 0xB4, 0xE9, 0xff}: "sky blue",
	{0x00, 0x9E, 0x73, 0xff}: "bluish green",
	{0xF0, 0xE4, 0x42, 0xff}: "yellow",
	{0x00, 0x72, 0xB2, 0xff}: "blue",
	{0xD5, 0x5E, 0x00, 0xff}: "vermillion",
	{0xCC, 0x79, 0xA7, 0xff}: "reddish purple",
	{0x00, 0x00, 0x00, 0xff}: "black",
}

// TestSeriesStylesDistinct checks every series colour is from the Okabe–Ito
// palette, the first eight series carry eight different glyphs, and each
// material group has its own dash pattern, so curves stay apart in grey.
func TestSeriesStylesDistinct(t *testing.T) {
	c := sampleChart(8, 10)
	k := newComposer()
	k.prepare(c)
	glyphs := map[draw8]bool{}
	for i, st := range k.scene.styles {
		nc, ok := st.line.Color.(color.NRGBA)
		assert.True(t, ok)
		_, known := okabeIto[nc]
		assert.True(t, known, "series %d colour %v is not Okabe–Ito", i, nc)
		g := st.glyph.Shape.(glyph)
		glyphs[draw8{g.shape, g.filled}] = true
	}
	assert.Len(t, glyphs, 8)

	dashes := map[string]string{}
	for name, f := range families {
		key := ""
		for _, d := range f.dashes {
			key += "," + string(rune('a'+int(d)))
		}
		for other, k := range dashes {
			assert.NotEqual(t, k, key, "%s and %s share a dash pattern", name, other)
		}
		dashes[name] = key
	}
	assert.Equal(t, "Steel", familyFor(" STEEL ").name)
	assert.Same(t, neutralFamily, familyFor("masonry"))
	assert.Equal(t, "masonry", headingFor(" masonry"))
	assert.Equal(t, "Other", headingFor(""))
}

// draw8 identifies a glyph shape for the distinctness check.
type draw8 struct {
	shape  outline
	filled bool
}

// TestPinnedDrawnLast checks pinned series are drawn over the others and thicker.
func TestPinnedDrawnLast(t *testing.T) {
	c := sampleChart(4, 10) // series 1 is pinned
	k := newComposer()
	k.prepare(c)
	assert.Equal(t, []int{0, 2, 3, 1}, k.scene.order)
	assert.Greater(t, k.scene.styles[1].line.Width, k.scene.styles[0].line.Width)
}

// TestLegendFit checks long labels are shortened with an ellipsis to fit.
func TestLegendFit(t *testing.T) {
	l := newLegend()
	long := "Concrete 18 in round, 6 #8 bars, tied, a very long description"
	got := fit(l.entry, long, 100)
	assert.LessOrEqual(t, float64(l.entry.Width(got)), 100.0)
	assert.Contains(t, got, "…")
	assert.Equal(t, "short", fit(l.entry, "short", 100))
}
