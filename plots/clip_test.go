package plots

import (
	"testing"

	"github.com/stretchr/testify/assert"
	"gonum.org/v1/plot/vg"
)

// Expected values in these tests are worked by hand from the geometry.

var clipBox = vg.Rectangle{Min: vg.Point{X: 0, Y: 0}, Max: vg.Point{X: 10, Y: 10}}

// TestClipSegment checks Liang–Barsky clipping against hand-worked cases.
func TestClipSegment(t *testing.T) {
	cases := []struct {
		name   string
		a, b   vg.Point
		ok     bool
		ca, cb vg.Point
	}{
		{"inside", vg.Point{X: 1, Y: 1}, vg.Point{X: 9, Y: 9}, true, vg.Point{X: 1, Y: 1}, vg.Point{X: 9, Y: 9}},
		{"exits top", vg.Point{X: 5, Y: 5}, vg.Point{X: 5, Y: 15}, true, vg.Point{X: 5, Y: 5}, vg.Point{X: 5, Y: 10}},
		{"crosses both sides", vg.Point{X: -5, Y: 5}, vg.Point{X: 15, Y: 5}, true, vg.Point{X: 0, Y: 5}, vg.Point{X: 10, Y: 5}},
		{"diagonal through corner region", vg.Point{X: -2, Y: 8}, vg.Point{X: 4, Y: 14}, true, vg.Point{X: 0, Y: 10}, vg.Point{X: 0, Y: 10}},
		{"outside above", vg.Point{X: 1, Y: 11}, vg.Point{X: 9, Y: 12}, false, vg.Point{}, vg.Point{}},
		{"outside parallel left", vg.Point{X: -1, Y: 1}, vg.Point{X: -1, Y: 9}, false, vg.Point{}, vg.Point{}},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			ca, cb, ok := clipSegment(tc.a, tc.b, clipBox)
			assert.Equal(t, tc.ok, ok)
			if tc.ok {
				assert.InDelta(t, float64(tc.ca.X), float64(ca.X), 1e-9)
				assert.InDelta(t, float64(tc.ca.Y), float64(ca.Y), 1e-9)
				assert.InDelta(t, float64(tc.cb.X), float64(cb.X), 1e-9)
				assert.InDelta(t, float64(tc.cb.Y), float64(cb.Y), 1e-9)
			}
		})
	}
}

// TestClipPolylineSplits checks a curve that leaves and re-enters becomes two sub-paths.
func TestClipPolylineSplits(t *testing.T) {
	pts := []vg.Point{{X: 1, Y: 5}, {X: 3, Y: 15}, {X: 5, Y: 15}, {X: 7, Y: 5}, {X: 9, Y: 5}}
	p := clipPolyline(nil, pts, clipBox)
	moves := 0
	for _, c := range p {
		if c.Type == vg.MoveComp {
			moves++
		}
		assert.LessOrEqual(t, float64(c.Pos.Y), 10.0+1e-9)
	}
	assert.Equal(t, 2, moves)
	// First piece: (1,5) up to where x = 2 at y = 10; second from (6,10) down to (7,5) then (9,5).
	assert.Equal(t, vg.Point{X: 1, Y: 5}, p[0].Pos)
	assert.InDelta(t, 2, float64(p[1].Pos.X), 1e-9)
	assert.Equal(t, vg.Point{X: 9, Y: 5}, p[len(p)-1].Pos)

	// Reuse: a buffer with room is filled in place.
	buf := make(vg.Path, 0, 64)
	out := clipPolyline(buf, pts, clipBox)
	assert.Equal(t, &buf[:1][0], &out[:1][0], "clipPolyline must reuse the given buffer")
	assert.Empty(t, clipPolyline(nil, []vg.Point{{X: 20, Y: 20}, {X: 30, Y: 30}}, clipBox))
}
