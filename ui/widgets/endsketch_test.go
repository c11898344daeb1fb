package widgets

import (
	"math"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
	"github.com/stretchr/testify/assert"
)

// TestDeflectionMeetsTheEndRestraints checks each drawn buckled shape against
// its restraints: no sideways movement at a pinned or fixed end, no slope at
// a fixed or guided end, a peak of 1 (mode shapes of the ideal column, from
// the Euler buckling solutions; common practice).
func TestDeflectionMeetsTheEndRestraints(t *testing.T) {
	const h = 1e-5
	slope := func(b, tp End, x float64) float64 {
		return (deflection(b, tp, math.Min(1, x+h)) - deflection(b, tp, math.Max(0, x-h))) / (math.Min(1, x+h) - math.Max(0, x-h))
	}
	cases := []struct{ bottom, top End }{
		{Fixed, Fixed}, {Fixed, Pinned}, {Fixed, Guided}, {Pinned, Pinned}, {Fixed, Free}, {Pinned, Guided},
	}
	for _, c := range cases {
		assert.InDelta(t, 0, deflection(c.bottom, c.top, 0), 1e-9, "%v-%v: bottom holds", c.bottom, c.top)
		if c.bottom == Fixed {
			assert.InDelta(t, 0, slope(c.bottom, c.top, 0), 1e-3, "%v-%v: fixed bottom keeps its slope", c.bottom, c.top)
		}
		switch c.top {
		case Fixed, Pinned:
			assert.InDelta(t, 0, deflection(c.bottom, c.top, 1), 1e-9, "%v-%v: top held in place", c.bottom, c.top)
		}
		if c.top == Fixed || c.top == Guided {
			assert.InDelta(t, 0, slope(c.bottom, c.top, 1), 1e-3, "%v-%v: top keeps its slope", c.bottom, c.top)
		}
		peak := 0.0
		for i := 0; i <= 1000; i++ {
			peak = math.Max(peak, deflection(c.bottom, c.top, float64(i)/1000))
		}
		assert.InDelta(t, 1, peak, 1e-3, "%v-%v: scaled to a peak of 1", c.bottom, c.top)
	}
}

func TestSketchTapsAndKeys(t *testing.T) {
	test.NewTempApp(t)
	n := 0
	s := NewEndSketch(Pinned, Guided, "pinned–guided", "K 2.0", func() { n++ })
	w := test.NewTempWindow(t, s)
	w.Resize(fyne.NewSize(120, 150))
	test.Tap(s)
	assert.Equal(t, 1, n)
	assert.Equal(t, s, w.Canvas().Focused(), "a tap gives it the focus")
	s.TypedRune(' ')
	s.TypedKey(&fyne.KeyEvent{Name: fyne.KeyReturn})
	s.TypedRune('x')
	assert.Equal(t, 3, n)
	s.SetSelected(true)
	assert.True(t, s.Selected)
	assert.Contains(t, test.RenderObjectToMarkup(s), "pinned–guided")
}
