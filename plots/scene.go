package plots

import (
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// glyphsPerCurve is how many shape markers sit along each series curve.
const glyphsPerCurve = 6

// emptyNote is shown in the plot area when there are no series.
const emptyNote = "No candidates to show"

// scene draws everything inside the data area; it is the chart's only
// gonum plotter, and keeps its buffers between draws so redraws reuse memory.
type scene struct {
	chart    *Chart
	styles   []seriesStyle
	offScale []bool
	order    []int

	pts   []vg.Point
	path  vg.Path
	boxes []vg.Rectangle // every label placed, the marker's included
	rings []vg.Rectangle // the crossover rings, which labels keep clear of
	data  vg.Rectangle

	markText  text.Style
	noteText  text.Style
	emptyText text.Style
}

// newScene returns a scene with its text styles set.
func newScene() *scene {
	return &scene{
		markText:  textStyle(faceBold, vg.Points(sizeMark), inkText),
		noteText:  textStyle(faceItalic, vg.Points(sizeNote), inkMuted),
		emptyText: aligned(textStyle(faceItalic, vg.Points(sizeEmpty), inkMuted), draw.XCenter, draw.YCenter),
	}
}

// Plot draws grid, curves, demand, marker and crossovers, implementing plot.Plotter.
func (s *scene) Plot(c draw.Canvas, plt *plot.Plot) {
	s.data = c.Rectangle
	s.boxes = s.boxes[:0]
	ch := s.chart
	if ch == nil {
		return
	}
	s.drawGrid(c, plt)
	for _, i := range s.order {
		st := s.styles[i]
		s.drawLine(c, plt, ch.Series[i].Points, st.line)
		s.drawGlyphs(c, plt, ch.Series[i].Points, st.glyph, i)
	}
	if len(ch.Demand) > 0 {
		s.drawLine(c, plt, ch.Demand, demandStyle())
	}
	if ch.Marker != nil {
		s.drawMarker(c, plt, *ch.Marker)
	}
	s.drawCrossovers(c, plt, ch.Crossovers)
	if len(ch.Series) == 0 {
		s.label(c, s.emptyText, c.Center(), emptyNote)
	}
}

// at maps a data point to canvas coordinates.
func at(c *draw.Canvas, plt *plot.Plot, x, y float64) vg.Point {
	return vg.Point{X: c.X(plt.X.Norm(x)), Y: c.Y(plt.Y.Norm(y))}
}

// gridWidth is the grid line thickness in points.
const gridWidth = 0.6

// drawGrid draws light lines at the labelled ticks of both axes. The lines
// are filled as thin rectangles, which rasterises faster than stroking.
func (s *scene) drawGrid(c draw.Canvas, plt *plot.Plot) {
	h := vg.Points(gridWidth / 2)
	s.path = s.path[:0]
	for _, t := range plt.Y.Tick.Marker.Ticks(plt.Y.Min, plt.Y.Max) {
		if t.IsMinor() || t.Value <= plt.Y.Min || t.Value > plt.Y.Max {
			continue
		}
		y := c.Y(plt.Y.Norm(t.Value))
		s.rect(vg.Rectangle{Min: vg.Point{X: c.Min.X, Y: y - h}, Max: vg.Point{X: c.Max.X, Y: y + h}})
	}
	for _, t := range plt.X.Tick.Marker.Ticks(plt.X.Min, plt.X.Max) {
		if t.IsMinor() || t.Value <= plt.X.Min || t.Value > plt.X.Max {
			continue
		}
		x := c.X(plt.X.Norm(t.Value))
		s.rect(vg.Rectangle{Min: vg.Point{X: x - h, Y: c.Min.Y}, Max: vg.Point{X: x + h, Y: c.Max.Y}})
	}
	if len(s.path) > 0 {
		c.SetColor(inkGrid)
		c.Fill(s.path)
	}
}

// rect appends the closed outline of r to the scene's path.
func (s *scene) rect(r vg.Rectangle) {
	s.path.Move(r.Min)
	s.path.Line(vg.Point{X: r.Max.X, Y: r.Min.Y})
	s.path.Line(r.Max)
	s.path.Line(vg.Point{X: r.Min.X, Y: r.Max.Y})
	s.path.Close()
}

// drawLine strokes a data polyline clipped to the data area.
func (s *scene) drawLine(c draw.Canvas, plt *plot.Plot, pts []Point, ls draw.LineStyle) {
	s.pts = s.pts[:0]
	for _, p := range pts {
		s.pts = append(s.pts, at(&c, plt, p.X, p.Y))
	}
	s.path = clipPolyline(s.path[:0], s.pts, c.Rectangle)
	if len(s.path) == 0 {
		return
	}
	c.SetLineStyle(ls)
	c.Stroke(s.path)
}

// drawGlyphs puts glyphsPerCurve shape markers along a curve at evenly spaced
// x positions, shifted per series index so neighbouring curves' marks do not
// sit on top of each other; marks outside the data area are skipped.
func (s *scene) drawGlyphs(c draw.Canvas, plt *plot.Plot, pts []Point, gs draw.GlyphStyle, index int) {
	if len(pts) < 2 {
		if len(pts) == 1 {
			c.DrawGlyph(gs, at(&c, plt, pts[0].X, pts[0].Y))
		}
		return
	}
	phase := math.Mod(0.5+0.381966*float64(index), 1)
	span := plt.X.Max - plt.X.Min
	for k := 0; k < glyphsPerCurve; k++ {
		x := plt.X.Min + (float64(k)+phase)/glyphsPerCurve*span
		y, ok := interpolate(pts, x)
		if !ok {
			continue
		}
		c.DrawGlyph(gs, at(&c, plt, x, y))
	}
}

// interpolate returns the curve's Y at x by linear interpolation between the
// neighbouring points, and false when x is outside the curve's X span.
func interpolate(pts []Point, x float64) (float64, bool) {
	n := len(pts)
	if n == 0 || x < pts[0].X || x > pts[n-1].X {
		return 0, false
	}
	lo, hi := 0, n-1
	for hi-lo > 1 {
		mid := (lo + hi) / 2
		if pts[mid].X <= x {
			lo = mid
		} else {
			hi = mid
		}
	}
	a, b := pts[lo], pts[hi]
	if b.X == a.X {
		return math.Max(a.Y, b.Y), true
	}
	return a.Y + (b.Y-a.Y)*(x-a.X)/(b.X-a.X), true
}

// drawMarker draws the current-length line across the data area, with its
// label in a box beside the top (to the right, or to the left near the right edge).
func (s *scene) drawMarker(c draw.Canvas, plt *plot.Plot, m Marker) {
	x := c.X(plt.X.Norm(m.X))
	if x < c.Min.X || x > c.Max.X {
		return
	}
	s.path = s.path[:0]
	s.path.Move(vg.Point{X: x, Y: c.Min.Y})
	s.path.Line(vg.Point{X: x, Y: c.Max.Y})
	c.SetLineStyle(markerStyle())
	c.Stroke(s.path)
	if m.Label == "" {
		return
	}
	gap := vg.Points(4)
	sty := aligned(s.markText, draw.XLeft, draw.YTop)
	pt := vg.Point{X: x + gap, Y: c.Max.Y - gap}
	if x+gap+sty.Width(m.Label)+2*gap > c.Max.X {
		sty.XAlign = draw.XRight
		pt.X = x - gap
	}
	s.boxes = append(s.boxes, s.label(c, sty, pt, m.Label))
}

// crossoverRadius is the ring radius of a crossover mark in points.
const crossoverRadius = 5.5

// label draws txt at pt over a translucent white box and returns the box.
func (s *scene) label(c draw.Canvas, sty text.Style, pt vg.Point, txt string) vg.Rectangle {
	box := padBox(sty.Rectangle(txt).Add(pt))
	s.path = s.path[:0]
	s.rect(box)
	c.SetColor(paperVeil)
	c.Fill(s.path)
	c.FillText(sty, pt, txt)
	return box
}

// overlaps reports whether box intersects a label already placed.
func (s *scene) overlaps(box vg.Rectangle) bool {
	for _, b := range s.boxes {
		if box.Min.X < b.Max.X && b.Min.X < box.Max.X && box.Min.Y < b.Max.Y && b.Min.Y < box.Max.Y {
			return true
		}
	}
	return false
}

// padBox grows a text box by a small margin on every side.
func padBox(r vg.Rectangle) vg.Rectangle {
	p := vg.Points(2)
	r.Min.X -= p
	r.Min.Y -= p
	r.Max.X += p
	r.Max.Y += p
	return r
}

// inside reports whether r lies entirely within outer.
func inside(r, outer vg.Rectangle) bool {
	return r.Min.X >= outer.Min.X && r.Max.X <= outer.Max.X && r.Min.Y >= outer.Min.Y && r.Max.Y <= outer.Max.Y
}

// crossoverMark draws the crossover symbol, a black ring with a centre dot over a white disc, at pt.
func crossoverMark(c *draw.Canvas, pt vg.Point) {
	r := vg.Points(crossoverRadius)
	var buf [4]vg.PathComp
	p := vg.Path(buf[:0])
	p.Move(vg.Point{X: pt.X + r, Y: pt.Y})
	p.Arc(pt, r, 0, 2*math.Pi)
	p.Close()
	c.SetColor(paperVeil)
	c.Fill(p)
	c.SetLineStyle(draw.LineStyle{Color: okabeBlack, Width: vg.Points(1.6)})
	c.Stroke(p)
	draw.CircleGlyph{}.DrawGlyph(c, draw.GlyphStyle{Radius: vg.Points(1.6)}, pt)
}
