package plots

import (
	"image/color"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// Map layout in points.
const (
	mapSwatchW     = 26
	mapSwatchH     = 13
	mapRowGap      = 5
	mapWallWidth   = 1.5
	mapHatchWidth  = 0.55
	mapPointRadius = 6
	mapTieRadius   = 1.1  // largest near-tie dot; smaller in small cells
	mapTintShare   = 0.42 // share of the family colour in a region's fill; the rest is white
)

// Colours of the cells where nothing works.
var (
	noneFill  = color.NRGBA{R: 0xC4, G: 0xC4, B: 0xC4, A: 0xff}
	noneHatch = color.NRGBA{R: 0x6A, G: 0x6A, B: 0x6A, A: 0xff}
)

// hatch is a pattern of parallel lines at one or two angles, so regions
// stay apart in grey as well as in colour.
type hatch struct {
	angles  []float64 // degrees from the x axis
	spacing float64   // points between lines
}

// hatches are the region patterns, taken in legend order.
var hatches = []hatch{
	{[]float64{45}, 5},
	{[]float64{135}, 5},
	{[]float64{0}, 4.5},
	{[]float64{90}, 4.5},
	{[]float64{45, 135}, 7},
	{[]float64{0, 90}, 7},
	{[]float64{22.5}, 6},
	{[]float64{157.5}, 6},
	{[]float64{67.5}, 6},
	{[]float64{112.5}, 6},
	{[]float64{0, 45}, 8},
	{[]float64{90, 135}, 8},
	{[]float64{22.5, 112.5}, 8},
	{[]float64{67.5, 157.5}, 8},
}

// noneHatchPattern marks the cells where nothing works: a dense cross.
var noneHatchPattern = hatch{[]float64{45, 135}, 3.5}

// regionStyle is the look of one key's region.
type regionStyle struct {
	fill, ink color.Color
	hatch     hatch
}

// tint mixes c with white, keeping share of c.
func tint(c color.Color, share float64) color.Color {
	r, g, b, _ := c.RGBA()
	mix := func(v uint32) uint8 {
		return uint8(math.Round(float64(v>>8)*share + 255*(1-share)))
	}
	return color.NRGBA{R: mix(r), G: mix(g), B: mix(b), A: 0xff}
}

// mapComposer lays out and draws a map on any gonum canvas, reusing its
// plot, paths and label buffers from one draw to the next.
type mapComposer struct {
	plot  *plot.Plot
	scene *mapScene

	heading, entry, caution, regionText text.Style
	lines                               []string
}

// newMapComposer returns a composer with the chart's fonts and axis styles.
func newMapComposer() *mapComposer {
	p := styledPlot()
	regionText := aligned(textStyle(faceBold, vg.Points(sizeMark), inkText), draw.XCenter, draw.YCenter)
	s := &mapScene{regionText: regionText}
	p.Add(s)
	return &mapComposer{plot: p, scene: s,
		heading:    aligned(textStyle(faceBold, vg.Points(sizeLegend), inkText), draw.XLeft, draw.YCenter),
		entry:      aligned(textStyle(faceRegular, vg.Points(sizeLegend), inkText), draw.XLeft, draw.YCenter),
		caution:    aligned(textStyle(faceItalic, vg.Points(sizeNote), inkText), draw.XLeft, draw.YTop),
		regionText: regionText,
	}
}

// draw paints the validated map m onto c, over a white background when fill is set.
func (k *mapComposer) draw(c draw.Canvas, m *Map, fill bool) {
	s := k.scene
	s.m = m
	defer func() { s.m = nil }()
	s.styles = s.styles[:0]
	var count [familyCount]int
	for i, key := range m.Keys {
		f := familyFor(key.Group)
		col := f.colors[count[f.id]%len(f.colors)]
		count[f.id]++
		s.styles = append(s.styles, regionStyle{fill: tint(col, mapTintShare), ink: col, hatch: hatches[i%len(hatches)]})
	}
	if fill {
		c.SetColor(paper)
		c.Fill(c.Rectangle.Path())
	}
	mgn := vg.Points(outerMargin)
	inner := draw.Crop(c, mgn, -mgn, mgn, -mgn)
	width := inner.Max.X - inner.Min.X

	// Caution along the bottom, wrapped to the width.
	k.lines = appendWrapped(k.lines[:0], k.caution, m.Caution, width)
	lh := k.caution.Height("Ag") * 1.15
	if len(k.lines) > 0 {
		y := inner.Min.Y + lh*vg.Length(len(k.lines))
		for _, ln := range k.lines {
			c.FillText(k.caution, vg.Point{X: inner.Min.X, Y: y}, ln)
			y -= lh
		}
		inner = draw.Crop(inner, 0, 0, lh*vg.Length(len(k.lines))+vg.Points(6), 0)
	}

	// Legend column on the right.
	maxLegend := width * legendMaxShare
	if maxLegend < vg.Points(legendMinWidth) {
		maxLegend = vg.Points(legendMinWidth)
	}
	lw := k.legendWidth(m, maxLegend)
	area := draw.Crop(inner, 0, -(lw + vg.Points(legendSpacing)), 0, 0)

	p := k.plot
	p.Title.Text = m.Title
	p.X.Label.Text, p.Y.Label.Text = m.XLabel, m.YLabel
	s.edges(m)
	p.X.Min, p.X.Max = s.ex[0], s.ex[len(s.ex)-1]
	p.Y.Min, p.Y.Max = s.ey[0], s.ey[len(s.ey)-1]
	p.Y.Label.Text = yLabelFor(p, m.YLabel, m.YShort, area)
	p.Draw(area)

	col := inner
	col.Min.X = inner.Max.X - lw
	col.Max.Y = s.data.Max.Y
	k.drawLegend(col, m)
}

// noneLabel and pointLabel return the legend texts with their defaults.
func noneLabel(m *Map) string {
	if m.NoneLabel != "" {
		return m.NoneLabel
	}
	return "Nothing works"
}

func tieLabel(m *Map) string {
	if m.TieLabel != "" {
		return m.TieLabel
	}
	return "Near-tie"
}

func pointLabel(m *Map) string {
	if m.PointLabel != "" {
		return m.PointLabel
	}
	return "This scheme"
}

// legendTexts calls f with each legend entry's text and whether it is the heading.
func legendTexts(m *Map, f func(s string, heading bool)) {
	if m.Heading != "" {
		f(m.Heading, true)
	}
	for _, key := range m.Keys {
		f(key.Label, false)
	}
	f(noneLabel(m), false)
	if m.hasTies() {
		f(tieLabel(m), false)
	}
	if m.Point != nil {
		f(pointLabel(m), false)
	}
	f("Change of family", false)
}

// legendWidth is the legend column's width, at most max.
func (k *mapComposer) legendWidth(m *Map, max vg.Length) vg.Length {
	w := vg.Length(0)
	thumb := vg.Points(mapSwatchW + legendGap)
	legendTexts(m, func(s string, heading bool) {
		x := thumb + k.entry.Width(s)
		if heading {
			x = k.heading.Width(s)
		}
		if x > w {
			w = x
		}
	})
	if w > max {
		w = max
	}
	return w
}

// drawLegend draws the key in col from its top down.
func (k *mapComposer) drawLegend(col draw.Canvas, m *Map) {
	y := col.Max.Y
	row := vg.Points(mapSwatchH + mapRowGap)
	swH := vg.Points(mapSwatchH)
	// Rows close up when the legend would run past the bottom of its
	// column (a short map in a small window): swatches shrink to match.
	rows := 0
	legendTexts(m, func(string, bool) { rows++ })
	if avail := col.Max.Y - col.Min.Y; rows > 0 && vg.Length(rows)*row > avail {
		row = avail / vg.Length(rows)
		swH = max(min(swH, row-vg.Points(2)), vg.Points(4))
	}
	thumb := vg.Points(mapSwatchW + legendGap)
	textW := col.Max.X - col.Min.X - thumb
	s := k.scene
	if m.Heading != "" {
		y -= row / 2
		col.FillText(k.heading, vg.Point{X: col.Min.X, Y: y}, fit(k.heading, m.Heading, col.Max.X-col.Min.X))
		y -= row / 2
	}
	swatch := func(st regionStyle, label string) {
		y -= row / 2
		r := vg.Rectangle{Min: vg.Point{X: col.Min.X, Y: y - swH/2}, Max: vg.Point{X: col.Min.X + vg.Points(mapSwatchW), Y: y + swH/2}}
		s.path = s.path[:0]
		s.rect(r)
		col.SetColor(st.fill)
		col.Fill(s.path)
		s.hatchPath = s.hatch(s.hatchPath[:0], r, st.hatch)
		col.SetLineStyle(draw.LineStyle{Color: st.ink, Width: vg.Points(mapHatchWidth)})
		col.Stroke(s.hatchPath)
		col.SetLineStyle(draw.LineStyle{Color: inkMuted, Width: vg.Points(0.6)})
		col.Stroke(s.path)
		col.FillText(k.entry, vg.Point{X: col.Min.X + thumb, Y: y}, fit(k.entry, label, textW))
		y -= row / 2
	}
	for i, key := range m.Keys {
		swatch(s.styles[i], key.Label)
	}
	swatch(regionStyle{fill: noneFill, ink: noneHatch, hatch: noneHatchPattern}, noneLabel(m))
	if m.hasTies() {
		// A few dots on white, spaced as in a run of near-tie cells.
		y -= row / 2
		s.path = s.path[:0]
		r := vg.Points(mapTieRadius)
		for d := 0; d < 4; d++ {
			x := col.Min.X + vg.Points(mapSwatchW)*(vg.Length(d)+0.5)/4
			for _, dy := range [2]vg.Length{-swH / 4, swH / 4} {
				s.path = appendDot(s.path, vg.Point{X: x, Y: y + dy}, r)
			}
		}
		col.SetColor(okabeBlack)
		col.Fill(s.path)
		col.FillText(k.entry, vg.Point{X: col.Min.X + thumb, Y: y}, fit(k.entry, tieLabel(m), textW))
		y -= row / 2
	}
	if m.Point != nil {
		y -= row / 2
		pointMark(&col, vg.Point{X: col.Min.X + vg.Points(mapSwatchW)/2, Y: y})
		col.FillText(k.entry, vg.Point{X: col.Min.X + thumb, Y: y}, fit(k.entry, pointLabel(m), textW))
		y -= row / 2
	}
	y -= row / 2
	s.path = s.path[:0]
	s.path.Move(vg.Point{X: col.Min.X, Y: y})
	s.path.Line(vg.Point{X: col.Min.X + vg.Points(mapSwatchW), Y: y})
	col.SetLineStyle(draw.LineStyle{Color: okabeBlack, Width: vg.Points(mapWallWidth)})
	col.Stroke(s.path)
	col.FillText(k.entry, vg.Point{X: col.Min.X + thumb, Y: y}, fit(k.entry, "Change of family", textW))
}

// pointMark draws the scheme's own point: a white disc with a black ring and cross.
func pointMark(c *draw.Canvas, pt vg.Point) {
	r := vg.Points(mapPointRadius)
	var buf [8]vg.PathComp
	p := vg.Path(buf[:0])
	p.Move(vg.Point{X: pt.X + r, Y: pt.Y})
	p.Arc(pt, r, 0, 2*math.Pi)
	p.Close()
	c.SetColor(paper)
	c.Fill(p)
	c.SetLineStyle(draw.LineStyle{Color: okabeBlack, Width: vg.Points(1.8)})
	c.Stroke(p)
	q := vg.Path(buf[:0])
	h := r * 0.6
	q.Move(vg.Point{X: pt.X - h, Y: pt.Y})
	q.Line(vg.Point{X: pt.X + h, Y: pt.Y})
	q.Move(vg.Point{X: pt.X, Y: pt.Y - h})
	q.Line(vg.Point{X: pt.X, Y: pt.Y + h})
	c.SetLineStyle(draw.LineStyle{Color: okabeBlack, Width: vg.Points(1.4)})
	c.Stroke(q)
}

// mapScene draws the cells, hatching, boundaries, region names and the
// scheme's point inside the data area; it is the map's only gonum plotter.
type mapScene struct {
	m          *Map
	styles     []regionStyle
	regionText text.Style

	ex, ey     []float64 // cell edges in data units
	cx, cy     []vg.Length
	fills      []vg.Path // per key + 1 (index 0: nothing works)
	hatches    []vg.Path
	path       vg.Path
	hatchPath  vg.Path
	left, righ []int32 // same-key run lengths along rows
	down, up   []int32 // and along columns
	boxes      []vg.Rectangle
	data       vg.Rectangle
}

// edges sets the cell edges from the cell centres: midway between centres,
// half a step beyond the first and last.
func (s *mapScene) edges(m *Map) {
	s.ex = cellEdges(s.ex[:0], m.X)
	s.ey = cellEdges(s.ey[:0], m.Y)
}

func cellEdges(out []float64, c []float64) []float64 {
	n := len(c)
	out = append(out, c[0]-(c[1]-c[0])/2)
	for i := 1; i < n; i++ {
		out = append(out, (c[i-1]+c[i])/2)
	}
	return append(out, c[n-1]+(c[n-1]-c[n-2])/2)
}

// rect appends the closed outline of r to the scene's path.
func (s *mapScene) rect(r vg.Rectangle) {
	s.path = appendRect(s.path, r)
}

func appendRect(p vg.Path, r vg.Rectangle) vg.Path {
	p.Move(r.Min)
	p.Line(vg.Point{X: r.Max.X, Y: r.Min.Y})
	p.Line(r.Max)
	p.Line(vg.Point{X: r.Min.X, Y: r.Max.Y})
	p.Close()
	return p
}

// hatch appends to p the pattern's lines inside r. The lines lie on a
// lattice fixed to the canvas origin, so neighbouring rectangles of one
// region join up.
func (s *mapScene) hatch(p vg.Path, r vg.Rectangle, h hatch) vg.Path {
	sp := float64(vg.Points(h.spacing))
	cxr, cyr := float64(r.Min.X+r.Max.X)/2, float64(r.Min.Y+r.Max.Y)/2
	diag := math.Hypot(float64(r.Max.X-r.Min.X), float64(r.Max.Y-r.Min.Y))
	for _, deg := range h.angles {
		th := deg * math.Pi / 180
		dx, dy := math.Cos(th), math.Sin(th)
		nx, ny := -dy, dx
		lo, hi := math.Inf(1), math.Inf(-1)
		for _, q := range [4][2]float64{{float64(r.Min.X), float64(r.Min.Y)}, {float64(r.Max.X), float64(r.Min.Y)}, {float64(r.Min.X), float64(r.Max.Y)}, {float64(r.Max.X), float64(r.Max.Y)}} {
			v := q[0]*nx + q[1]*ny
			lo, hi = math.Min(lo, v), math.Max(hi, v)
		}
		tc := cxr*dx + cyr*dy
		for k := math.Ceil(lo / sp); k*sp <= hi; k++ {
			ox, oy := nx*k*sp, ny*k*sp
			a := vg.Point{X: vg.Length(ox + dx*(tc-diag)), Y: vg.Length(oy + dy*(tc-diag))}
			b := vg.Point{X: vg.Length(ox + dx*(tc+diag)), Y: vg.Length(oy + dy*(tc+diag))}
			if ca, cb, ok := clipSegment(a, b, r); ok && ca != cb {
				p.Move(ca)
				p.Line(cb)
			}
		}
	}
	return p
}

// Plot draws the map's data area, implementing plot.Plotter.
func (s *mapScene) Plot(c draw.Canvas, plt *plot.Plot) {
	s.data = c.Rectangle
	s.boxes = s.boxes[:0]
	m := s.m
	if m == nil {
		return
	}
	nx, ny := len(m.X), len(m.Y)
	s.cx = s.cx[:0]
	for _, v := range s.ex {
		s.cx = append(s.cx, c.X(plt.X.Norm(v)))
	}
	s.cy = s.cy[:0]
	for _, v := range s.ey {
		s.cy = append(s.cy, c.Y(plt.Y.Norm(v)))
	}
	nk := len(m.Keys) + 1
	for len(s.fills) < nk {
		s.fills = append(s.fills, nil)
		s.hatches = append(s.hatches, nil)
	}
	for k := 0; k < nk; k++ {
		s.fills[k] = s.fills[k][:0]
		s.hatches[k] = s.hatches[k][:0]
	}
	// One rectangle per run of equal cells along each row.
	for i := 0; i < ny; i++ {
		row := m.Cells[i*nx : (i+1)*nx]
		for j0 := 0; j0 < nx; {
			j1 := j0
			for j1+1 < nx && row[j1+1] == row[j0] {
				j1++
			}
			key := row[j0] + 1
			r := vg.Rectangle{Min: vg.Point{X: s.cx[j0], Y: s.cy[i]}, Max: vg.Point{X: s.cx[j1+1], Y: s.cy[i+1]}}
			s.fills[key] = appendRect(s.fills[key], r)
			h := noneHatchPattern
			if key > 0 {
				h = s.styles[key-1].hatch
			}
			s.hatches[key] = s.hatch(s.hatches[key], r, h)
			j0 = j1 + 1
		}
	}
	for k := 0; k < nk; k++ {
		if len(s.fills[k]) == 0 {
			continue
		}
		fill, ink := color.Color(noneFill), color.Color(noneHatch)
		if k > 0 {
			fill, ink = s.styles[k-1].fill, s.styles[k-1].ink
		}
		c.SetColor(fill)
		c.Fill(s.fills[k])
		c.SetLineStyle(draw.LineStyle{Color: ink, Width: vg.Points(mapHatchWidth)})
		c.Stroke(s.hatches[k])
	}
	// Near-tie dots, one at the centre of each marked cell.
	if m.Ties != nil {
		cw := (s.cx[nx] - s.cx[0]) / vg.Length(nx)
		ch := (s.cy[ny] - s.cy[0]) / vg.Length(ny)
		r := min(vg.Points(mapTieRadius), 0.2*min(cw, ch))
		s.path = s.path[:0]
		for k, tied := range m.Ties {
			if tied {
				i, j := k/nx, k%nx
				s.path = appendDot(s.path, vg.Point{X: (s.cx[j] + s.cx[j+1]) / 2, Y: (s.cy[i] + s.cy[i+1]) / 2}, r)
			}
		}
		if len(s.path) > 0 {
			c.SetColor(okabeBlack)
			c.Fill(s.path)
		}
	}
	// Boundaries where the winner changes.
	s.path = s.path[:0]
	for i := 0; i < ny; i++ {
		for j := 0; j < nx; j++ {
			k := i*nx + j
			if j+1 < nx && m.wall(k, k+1, WallRight) {
				s.path.Move(vg.Point{X: s.cx[j+1], Y: s.cy[i]})
				s.path.Line(vg.Point{X: s.cx[j+1], Y: s.cy[i+1]})
			}
			if i+1 < ny && m.wall(k, k+nx, WallUp) {
				s.path.Move(vg.Point{X: s.cx[j], Y: s.cy[i+1]})
				s.path.Line(vg.Point{X: s.cx[j+1], Y: s.cy[i+1]})
			}
		}
	}
	if len(s.path) > 0 {
		c.SetLineStyle(draw.LineStyle{Color: okabeBlack, Width: vg.Points(mapWallWidth)})
		c.Stroke(s.path)
	}
	s.drawFrame(c)
	if m.Point != nil {
		pt := vg.Point{X: c.X(plt.X.Norm(m.Point.X)), Y: c.Y(plt.Y.Norm(m.Point.Y))}
		if c.Contains(pt) {
			pointMark(&c, pt)
			r := vg.Points(mapPointRadius + 2)
			s.boxes = append(s.boxes, vg.Rectangle{Min: vg.Point{X: pt.X - r, Y: pt.Y - r}, Max: vg.Point{X: pt.X + r, Y: pt.Y + r}})
		}
	}
	s.drawRegionNames(c)
}

// drawFrame outlines the data area.
func (s *mapScene) drawFrame(c draw.Canvas) {
	s.path = appendRect(s.path[:0], c.Rectangle)
	c.SetLineStyle(draw.LineStyle{Color: inkText, Width: vg.Points(0.8)})
	c.Stroke(s.path)
}

// drawRegionNames writes each key's name (and "nothing works") once, at the
// cell deepest inside its region, when the name fits there.
func (s *mapScene) drawRegionNames(c draw.Canvas) {
	m := s.m
	nx, ny := len(m.X), len(m.Y)
	n := nx * ny
	s.left, s.righ = growInt32(s.left, n), growInt32(s.righ, n)
	s.down, s.up = growInt32(s.down, n), growInt32(s.up, n)
	for i := 0; i < ny; i++ {
		for j := 0; j < nx; j++ {
			k := i*nx + j
			s.left[k], s.down[k] = 1, 1
			if j > 0 && m.Cells[k-1] == m.Cells[k] {
				s.left[k] = s.left[k-1] + 1
			}
			if i > 0 && m.Cells[k-nx] == m.Cells[k] {
				s.down[k] = s.down[k-nx] + 1
			}
		}
	}
	for i := ny - 1; i >= 0; i-- {
		for j := nx - 1; j >= 0; j-- {
			k := i*nx + j
			s.righ[k], s.up[k] = 1, 1
			if j+1 < nx && m.Cells[k+1] == m.Cells[k] {
				s.righ[k] = s.righ[k+1] + 1
			}
			if i+1 < ny && m.Cells[k+nx] == m.Cells[k] {
				s.up[k] = s.up[k+nx] + 1
			}
		}
	}
	cw := (s.cx[nx] - s.cx[0]) / vg.Length(nx)
	ch := (s.cy[ny] - s.cy[0]) / vg.Length(ny)
	for key := -1; key < len(m.Keys); key++ {
		label := noneLabel(m)
		if key >= 0 {
			label = m.Keys[key].Label
		}
		w := s.regionText.Width(label) + vg.Points(6)
		h := s.regionText.Height(label) + vg.Points(4)
		best, at := vg.Length(math.Inf(-1)), -1
		for k := 0; k < n; k++ {
			if m.Cells[k] != key {
				continue
			}
			hx := (vg.Length(min(s.left[k], s.righ[k])) - 0.5) * cw
			hy := (vg.Length(min(s.down[k], s.up[k])) - 0.5) * ch
			fit := min(2*hx-w, 2*hy-h)
			if fit > best && fit >= 0 && !s.overlaps(s.nameBox(label, k)) {
				best, at = fit, k
			}
		}
		if at < 0 {
			continue
		}
		i, j := at/nx, at%nx
		pt := vg.Point{X: (s.cx[j] + s.cx[j+1]) / 2, Y: (s.cy[i] + s.cy[i+1]) / 2}
		box := s.nameBox(label, at)
		s.path = appendRect(s.path[:0], box)
		c.SetColor(paperVeil)
		c.Fill(s.path)
		c.FillText(s.regionText, pt, label)
		s.boxes = append(s.boxes, box)
	}
}

// nameBox is the box of a region name centred on cell k.
func (s *mapScene) nameBox(label string, k int) vg.Rectangle {
	nx := len(s.m.X)
	i, j := k/nx, k%nx
	pt := vg.Point{X: (s.cx[j] + s.cx[j+1]) / 2, Y: (s.cy[i] + s.cy[i+1]) / 2}
	return padBox(s.regionText.Rectangle(label).Add(pt))
}

// overlaps reports whether box intersects a name already placed.
func (s *mapScene) overlaps(box vg.Rectangle) bool {
	for _, b := range s.boxes {
		if box.Min.X < b.Max.X && b.Min.X < box.Max.X && box.Min.Y < b.Max.Y && b.Min.Y < box.Max.Y {
			return true
		}
	}
	return false
}

// appendDot appends a closed disc of radius r at pt to p.
func appendDot(p vg.Path, pt vg.Point, r vg.Length) vg.Path {
	p.Move(vg.Point{X: pt.X + r, Y: pt.Y})
	p.Arc(pt, r, 0, 2*math.Pi)
	p.Close()
	return p
}

// growInt32 returns s resized to n, reusing its storage when large enough.
func growInt32(s []int32, n int) []int32 {
	if cap(s) < n {
		return make([]int32, n)
	}
	return s[:n]
}
