package plots

import (
	"gonum.org/v1/plot"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// Crossover label placement, in points.
const (
	labelGap      = 2   // between a ring and a label beside it
	leaderSteps   = 10  // how many stacked places are tried above and below a ring
	markerBandPad = 6   // around the marker label in the band kept for it
	markerBandMin = 12  // text height the band allows at least (the window's own marker label)
	leaderWidth   = 0.7 // the leader line from a stacked label back to its ring
)

// markerBand is the height of the strip along the top of the data area kept
// for the marker's label (drawn in the image or over it by the window), which
// crossover labels never enter.
func (s *scene) markerBand() vg.Length {
	h := s.markText.Height("0'-0\"")
	if h < vg.Points(markerBandMin) {
		h = vg.Points(markerBandMin)
	}
	return h + vg.Points(markerBandPad)
}

// drawCrossovers draws every crossover ring, then places each label where
// it overlaps no other label, no ring, the marker's band or the data area's
// edge (the legend lies outside it): first at a corner beside its ring, else
// stacked above or below at growing distance with a leader line back to the
// ring. A label with no free place is left off; its ring stays.
func (s *scene) drawCrossovers(c draw.Canvas, plt *plot.Plot, xs []Crossover) {
	s.rings = s.rings[:0]
	r := vg.Points(crossoverRadius + 1)
	for _, m := range xs {
		pt := at(&c, plt, m.X, m.Y)
		if !c.Contains(pt) {
			continue
		}
		crossoverMark(&c, pt)
		s.rings = append(s.rings, vg.Rectangle{Min: vg.Point{X: pt.X - r, Y: pt.Y - r}, Max: vg.Point{X: pt.X + r, Y: pt.Y + r}})
	}
	free := c.Rectangle
	free.Max.Y -= s.markerBand()
	for _, m := range xs {
		pt := at(&c, plt, m.X, m.Y)
		if m.Label == "" || !c.Contains(pt) {
			continue
		}
		s.placeLabel(c, pt, m.Label, free)
	}
}

// placeLabel puts one crossover label at the first free place and returns
// whether it found one.
func (s *scene) placeLabel(c draw.Canvas, pt vg.Point, txt string, free vg.Rectangle) bool {
	off := vg.Points(crossoverRadius + labelGap)
	fits := func(sty draw.TextStyle, at vg.Point) (vg.Rectangle, bool) {
		box := padBox(sty.Rectangle(txt).Add(at))
		return box, inside(box, free) && !s.overlaps(box) && !s.hitsRing(box)
	}
	left, right := aligned(s.markText, draw.XLeft, draw.YBottom), aligned(s.markText, draw.XRight, draw.YBottom)
	// Beside the ring: upper right, upper left, lower right, lower left.
	for _, k := range [4]struct {
		sty    draw.TextStyle
		dx, dy vg.Length
	}{
		{left, off, off}, {right, -off, off},
		{left, off, -off - s.markText.Height(txt)}, {right, -off, -off - s.markText.Height(txt)},
	} {
		at := vg.Point{X: pt.X + k.dx, Y: pt.Y + k.dy}
		if _, ok := fits(k.sty, at); ok {
			s.boxes = append(s.boxes, s.label(c, k.sty, at, txt))
			return true
		}
	}
	// Stacked above or below, with a leader line.
	step := s.markText.Height(txt) + vg.Points(2*labelGap+2)
	for n := 1; n <= leaderSteps; n++ {
		for _, dir := range [2]vg.Length{1, -1} {
			dy := dir * (off + vg.Length(n)*step)
			if dir < 0 {
				dy -= s.markText.Height(txt)
			}
			for _, k := range [2]struct {
				sty draw.TextStyle
				dx  vg.Length
			}{{left, off}, {right, -off}} {
				at := vg.Point{X: pt.X + k.dx, Y: pt.Y + dy}
				box, ok := fits(k.sty, at)
				if !ok {
					continue
				}
				s.leader(c, pt, box)
				s.boxes = append(s.boxes, s.label(c, k.sty, at, txt))
				return true
			}
		}
	}
	return false
}

// hitsRing reports whether box covers any crossover ring.
func (s *scene) hitsRing(box vg.Rectangle) bool {
	for _, b := range s.rings {
		if box.Min.X < b.Max.X && b.Min.X < box.Max.X && box.Min.Y < b.Max.Y && b.Min.Y < box.Max.Y {
			return true
		}
	}
	return false
}

// leader draws a thin line from the ring at pt to the nearest point of a label box.
func (s *scene) leader(c draw.Canvas, pt vg.Point, box vg.Rectangle) {
	to := vg.Point{X: clampLen(pt.X, box.Min.X, box.Max.X), Y: clampLen(pt.Y, box.Min.Y, box.Max.Y)}
	s.path = s.path[:0]
	s.path.Move(pt)
	s.path.Line(to)
	c.SetLineStyle(draw.LineStyle{Color: inkMuted, Width: vg.Points(leaderWidth)})
	c.Stroke(s.path)
}

func clampLen(v, lo, hi vg.Length) vg.Length {
	if v < lo {
		return lo
	}
	if v > hi {
		return hi
	}
	return v
}
