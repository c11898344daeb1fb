package plots

import (
	"image/color"
	"math"
	"strings"

	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// Plan-sheet geometry in points.
const (
	planMargin     = 10
	planGap        = 16  // between slots in a row
	planRowGap     = 12  // between rows
	planLabelPad   = 5   // between a section and its labels
	planMaxRows    = 6   // most rows tried
	planEnough     = 40  // deepest section height that makes a label size good enough
	planTitleSize  = 13  // sheet title
	planNameSize   = 9   // section size
	planLineSize   = 8.5 // further labels
	planFootSize   = 8.5 // scale bar, note and caution
	planBarHeight  = 5   // scale bar thickness
	planOutline    = 0.9 // outline of concrete and timber bodies
	planHairline   = 0.5 // thinnest tie line
	planHighlight  = 4   // highlight margin around a selected slot
	planLineFactor = 1.22
)

// Plan colours.
var (
	planConcrete   = color.NRGBA{R: 0xD8, G: 0xD5, B: 0xCF, A: 0xff}
	planWood       = color.NRGBA{R: 0xEA, G: 0xD4, B: 0xA8, A: 0xff}
	planChar       = color.NRGBA{R: 0x3A, G: 0x34, B: 0x30, A: 0xff}
	planSteelBar   = color.NRGBA{R: 0x26, G: 0x26, B: 0x26, A: 0xff}
	planBoard      = color.NRGBA{R: 0xF4, G: 0xE4, B: 0xEE, A: 0xff}
	planNeutral    = color.NRGBA{R: 0x9A, G: 0x9A, B: 0x9A, A: 0xff}
	planSelectFill = color.NRGBA{R: 0xE8, G: 0xF1, B: 0xFA, A: 0xff}
	planRefFill    = color.NRGBA{R: 0xF4, G: 0xF4, B: 0xF4, A: 0xff}
)

// planSlot is one cell of the sheet: the reference square or a section.
type planSlot struct {
	sec            *PlanSection // nil for the reference square
	index          int          // index in PlanSheet.Sections; −1 for the reference
	wMM, dMM       float64      // drawn size with protection
	title          string
	lines          []string
	labelW, labelH vg.Length
	// placed
	cx, bottom vg.Length // centre x and bottom of the drawing
	slotX, top vg.Length // slot left and top
	slotW      vg.Length
}

// planStyles are the text styles of the sheet.
type planStyles struct {
	title, foot, footBold text.Style
}

func newPlanStyles() planStyles {
	return planStyles{
		title:    aligned(textStyle(faceBold, vg.Points(planTitleSize), inkText), draw.XLeft, draw.YTop),
		foot:     aligned(textStyle(faceRegular, vg.Points(planFootSize), inkMuted), draw.XLeft, draw.YBottom),
		footBold: aligned(textStyle(faceBold, vg.Points(planFootSize), inkText), draw.XLeft, draw.YBottom),
	}
}

var planText = newPlanStyles()

// planDrawer lays out and draws one sheet.
type planDrawer struct {
	sheet *PlanSheet
	sty   planStyles
	slots []planSlot
	scale vg.Length // points per mm
	path  vg.Path
	// labels collects the text drawn for each section, when not nil.
	labels [][]string
	// level indexes planLevels: the label sizes in use.
	level            int
	nameSty, lineSty text.Style
	nameH, lineH     vg.Length
	// noteLines and cautionLines are the footer texts wrapped to the width.
	noteLines, cautionLines []string
}

// lineHeight is the spacing of text lines of a size in points.
func lineHeight(size float64) vg.Length { return vg.Points(size * planLineFactor) }

// planLevels are the label sizes tried, largest first: full labels, then
// smaller type, then the size alone, so that a small view still shows the
// sections at a useful scale.
var planLevels = []struct {
	name, line float64 // font sizes, points
	lines      bool    // draw the lines under the title
}{
	{planNameSize, planLineSize, true},
	{7.5, 7, true},
	{7.5, 7, false},
	{6.5, 6, false},
}

// setLevel chooses the label sizes of level k.
func (p *planDrawer) setLevel(k int) {
	lv := planLevels[k]
	p.level = k
	p.nameSty = aligned(textStyle(faceBold, vg.Points(lv.name), inkText), draw.XCenter, draw.YTop)
	p.lineSty = aligned(textStyle(faceRegular, vg.Points(lv.line), inkMuted), draw.XCenter, draw.YTop)
	p.nameH, p.lineH = lineHeight(lv.name), lineHeight(lv.line)
	for i := range p.slots {
		sl := &p.slots[i]
		sl.labelW = p.nameSty.Width(sl.title)
		sl.labelH = p.nameH
		if lv.lines {
			for _, l := range sl.lines {
				sl.labelW = max(sl.labelW, p.lineSty.Width(l))
				sl.labelH += p.lineH
			}
		}
	}
}

// prepare builds the slots and measures their labels at full size.
func (p *planDrawer) prepare() {
	s := p.sheet
	p.slots = p.slots[:0]
	if s.ReferenceMM > 0 {
		title := s.ReferenceLabel
		if title == "" {
			title = "Reference"
		}
		p.slots = append(p.slots, planSlot{index: -1, wMM: s.ReferenceMM, dMM: s.ReferenceMM, title: title, lines: []string{"for scale"}})
	}
	for i := range s.Sections {
		sec := &s.Sections[i]
		pr := 2 * sec.ProtectionMM
		p.slots = append(p.slots, planSlot{sec: sec, index: i, wMM: sec.WidthMM + pr, dMM: sec.DepthMM + pr, title: sec.Title, lines: trimLines(sec.Lines)})
	}
	p.setLevel(0)
}

// rowsOf splits n slots into r rows of nearly equal count.
func rowsOf(n, r int) [][2]int {
	out := make([][2]int, 0, r)
	per := (n + r - 1) / r
	for lo := 0; lo < n; lo += per {
		out = append(out, [2]int{lo, min(n, lo+per)})
	}
	return out
}

// fits reports whether the slots fit the area at scale s (points per mm) in the given rows.
func (p *planDrawer) fits(rows [][2]int, s float64, w, h vg.Length, labels bool) bool {
	total := vg.Length(0)
	for ri, r := range rows {
		rw, dh, lh := vg.Length(0), vg.Length(0), vg.Length(0)
		for k := r[0]; k < r[1]; k++ {
			sl := &p.slots[k]
			sw := vg.Length(sl.wMM * s)
			if labels {
				sw = max(sw, sl.labelW)
			}
			rw += sw
			dh = max(dh, vg.Length(sl.dMM*s))
			lh = max(lh, sl.labelH)
		}
		rw += vg.Length(r[1]-r[0]-1) * vg.Points(planGap)
		if rw > w {
			return false
		}
		total += dh + vg.Points(planLabelPad) + lh
		if ri > 0 {
			total += vg.Points(planRowGap)
		}
	}
	return total <= h
}

// bestScale finds the largest scale at which the rows fit, by bisection; 0 when none does.
func (p *planDrawer) bestScale(rows [][2]int, w, h vg.Length, labels bool) float64 {
	maxD := 0.0
	for _, sl := range p.slots {
		maxD = math.Max(maxD, sl.dMM)
	}
	hi := float64(h) / maxD
	if !p.fits(rows, 1e-9, w, h, labels) {
		return 0
	}
	lo := 0.0
	for it := 0; it < 40; it++ {
		mid := (lo + hi) / 2
		if p.fits(rows, mid, w, h, labels) {
			lo = mid
		} else {
			hi = mid
		}
	}
	return lo
}

// layout places the slots in the area, choosing the row count that gives the largest scale.
func (p *planDrawer) layout(area vg.Rectangle) {
	n := len(p.slots)
	w, h := area.Max.X-area.Min.X, area.Max.Y-area.Min.Y
	maxD := 0.0
	for _, sl := range p.slots {
		maxD = math.Max(maxD, sl.dMM)
	}
	// A level is good enough when the deepest section is drawn at least
	// this tall; otherwise smaller labels are tried.
	enough := min(vg.Points(planEnough), h*0.3)
	var best [][2]int
	bestS, bestLevel := 0.0, 0
	for k := range planLevels {
		p.setLevel(k)
		var rows [][2]int
		s := 0.0
		for r := 1; r <= min(n, planMaxRows); r++ {
			rr := rowsOf(n, r)
			if v := p.bestScale(rr, w, h, true); v > s*1.03 {
				rows, s = rr, v
			}
		}
		if s > bestS {
			best, bestS, bestLevel = rows, s, k
		}
		if vg.Length(s*maxD) >= enough {
			break
		}
	}
	if bestS == 0 {
		// Even the smallest labels overflow: fit the sections alone.
		for r := 1; r <= min(n, planMaxRows); r++ {
			rr := rowsOf(n, r)
			if v := p.bestScale(rr, w, h, false); v > bestS*1.03 {
				best, bestS = rr, v
			}
		}
		bestLevel = len(planLevels) - 1
	}
	if bestS == 0 {
		best, bestS = rowsOf(n, 1), 1e-3
	}
	p.setLevel(bestLevel)
	p.scale = vg.Length(bestS)
	s := bestS
	y := area.Max.Y
	for _, r := range best {
		rw, dh, lh := vg.Length(0), vg.Length(0), vg.Length(0)
		for k := r[0]; k < r[1]; k++ {
			sl := &p.slots[k]
			sl.slotW = max(vg.Length(sl.wMM*s), sl.labelW)
			rw += sl.slotW
			dh = max(dh, vg.Length(sl.dMM*s))
			lh = max(lh, sl.labelH)
		}
		gap := vg.Points(planGap)
		if k := r[1] - r[0]; k > 1 {
			// Spread the slots over the width, keeping the gaps between
			// planGap and three times it.
			gap = min(max(gap, (w-rw)/vg.Length(k+1)), 3*vg.Points(planGap))
			rw += vg.Length(k-1) * gap
		}
		x := area.Min.X + (w-rw)/2
		for k := r[0]; k < r[1]; k++ {
			sl := &p.slots[k]
			sl.slotX, sl.top = x, y
			sl.cx = x + sl.slotW/2
			sl.bottom = y - dh
			x += sl.slotW + gap
		}
		y -= dh + vg.Points(planLabelPad) + lh + vg.Points(planRowGap)
	}
}

// pt maps a section point in mm about (cx, cy) to the canvas.
func (p *planDrawer) pt(cx, cy vg.Length, q Point) vg.Point {
	return vg.Point{X: cx + vg.Length(q.X)*p.scale, Y: cy + vg.Length(q.Y)*p.scale}
}

// loopPath appends one closed loop to p.path, reversed when its direction
// is not the wanted one (outlines counter-clockwise, holes clockwise, so that
// nonzero filling, the rule of every back-end, leaves the holes empty).
func (p *planDrawer) loopPath(cx, cy vg.Length, l []Point, ccw bool) {
	if len(l) < 2 {
		return
	}
	rev := (signedArea(l) > 0) != ccw
	for k := range l {
		q := l[k]
		if rev {
			q = l[len(l)-1-k]
		}
		if k == 0 {
			p.path.Move(p.pt(cx, cy, q))
		} else {
			p.path.Line(p.pt(cx, cy, q))
		}
	}
	p.path.Close()
}

// region builds the path of a filled part: first loop outline, others holes.
func (p *planDrawer) region(cx, cy vg.Length, loops [][]Point) vg.Path {
	p.path = p.path[:0]
	for k, l := range loops {
		p.loopPath(cx, cy, l, k == 0)
	}
	return p.path
}

// rect returns a closed rectangle path.
func (p *planDrawer) rect(x0, y0, x1, y1 vg.Length) vg.Path {
	p.path = p.path[:0]
	p.path.Move(vg.Point{X: x0, Y: y0})
	p.path.Line(vg.Point{X: x1, Y: y0})
	p.path.Line(vg.Point{X: x1, Y: y1})
	p.path.Line(vg.Point{X: x0, Y: y1})
	p.path.Close()
	return p.path
}

// bodyColours returns the fill of a group's body and the colour of its outline (nil for none).
func bodyColours(group string) (fill, line color.Color) {
	if strings.EqualFold(strings.TrimSpace(group), "composite") {
		return families["steel"].colors[0], nil // a filled tube's steel wall
	}
	switch familyFor(group) {
	case families["steel"]:
		return families["steel"].colors[0], nil
	case families["concrete"]:
		return planConcrete, families["concrete"].colors[0]
	case families["timber"]:
		return planWood, families["timber"].colors[0]
	}
	return planNeutral, inkText
}

// place lays the sheet out in the canvas rectangle r: the title band, the
// footer (scale bar, note, caution) and the slots. It returns the footer's
// lower-left corner and the sections' area.
func (p *planDrawer) place(r vg.Rectangle) (foot vg.Point, area vg.Rectangle) {
	s := p.sheet
	m := vg.Points(planMargin)
	area = vg.Rectangle{Min: vg.Point{X: r.Min.X + m, Y: r.Min.Y + m}, Max: vg.Point{X: r.Max.X - m, Y: r.Max.Y - m}}
	if s.Title != "" {
		area.Max.Y -= lineHeight(planTitleSize) + vg.Points(6)
	}
	foot = area.Min
	w := area.Max.X - area.Min.X
	p.cautionLines = wrapText(p.sty.footBold, s.Caution, w, p.cautionLines[:0])
	p.noteLines = wrapText(p.sty.foot, s.Note, w, p.noteLines[:0])
	area.Min.Y += p.footerHeight() + vg.Points(6)
	p.prepare()
	p.scale = 0
	if len(s.Sections) > 0 {
		p.layout(area)
	}
	return foot, area
}

// draw lays out and paints the whole sheet on c, over a white background
// when fill is set (a raster canvas arrives already cleared).
func (p *planDrawer) draw(c draw.Canvas, fill bool) {
	if fill {
		c.SetColor(paper)
		c.Fill(c.Rectangle.Path())
	}
	s := p.sheet
	foot, area := p.place(c.Rectangle)
	if s.Title != "" {
		c.FillText(p.sty.title, vg.Point{X: area.Min.X, Y: c.Max.Y - vg.Points(planMargin)}, s.Title)
	}
	for k := len(p.cautionLines) - 1; k >= 0; k-- {
		c.FillText(p.sty.footBold, foot, p.cautionLines[k])
		foot.Y += lineHeight(planFootSize)
	}
	if len(p.cautionLines) > 0 {
		foot.Y += vg.Points(3)
	}
	for k := len(p.noteLines) - 1; k >= 0; k-- {
		c.FillText(p.sty.foot, foot, p.noteLines[k])
		foot.Y += lineHeight(planFootSize)
	}
	if len(s.Sections) == 0 {
		msg := s.Empty
		if msg == "" {
			msg = "No section to draw."
		}
		st := aligned(textStyle(faceItalic, vg.Points(sizeEmpty), inkMuted), draw.XCenter, draw.YCenter)
		c.FillText(st, vg.Point{X: (area.Min.X + area.Max.X) / 2, Y: (area.Min.Y + area.Max.Y) / 2}, msg)
		return
	}
	p.drawScaleBar(c, foot.X, foot.Y+vg.Points(3))
	for k := range p.slots {
		p.drawSlot(c, &p.slots[k])
	}
}

// result reports the layout in pixels at dpi, for a canvas heightPt points tall.
func (p *planDrawer) result(dpi int, heightPt vg.Length, polygons bool) PlanLayout {
	k := float64(dpi) / 72 // pixels per point
	px := func(x vg.Length) float64 { return float64(x) * k }
	py := func(y vg.Length) float64 { return float64(heightPt-y) * k }
	out := PlanLayout{PxPerMM: float64(p.scale) * k, Sections: make([]PlanBox, len(p.sheet.Sections))}
	if polygons {
		out.Polygons = make([][]PlanPolygon, len(p.sheet.Sections))
	}
	if p.scale == 0 {
		return out
	}
	s := float64(p.scale)
	for i := range p.slots {
		sl := &p.slots[i]
		w, d := vg.Length(sl.wMM*s), vg.Length(sl.dMM*s)
		labelBottom := sl.bottom - vg.Points(planLabelPad) - sl.labelH
		b := PlanBox{
			X: px(sl.cx - w/2), Y: py(sl.bottom + d), W: float64(w) * k, H: float64(d) * k,
			SlotX: px(sl.slotX), SlotY: py(sl.top), SlotW: float64(sl.slotW) * k, SlotH: float64(sl.top-labelBottom) * k,
		}
		if sl.sec == nil {
			out.Reference = b
			continue
		}
		out.Sections[sl.index] = b
		if !polygons {
			continue
		}
		cx, cy := sl.cx, sl.bottom+d/2
		var polys []PlanPolygon
		for _, part := range sl.sec.Parts {
			if part.Kind != PartBody && part.Kind != PartFill {
				continue
			}
			pp := PlanPolygon{Kind: part.Kind}
			for _, l := range part.Loops {
				q := make([]Point, len(l))
				for j, v := range l {
					c := p.pt(cx, cy, v)
					q[j] = Point{X: px(c.X), Y: py(c.Y)}
				}
				pp.Loops = append(pp.Loops, q)
			}
			polys = append(polys, pp)
		}
		out.Polygons[sl.index] = polys
	}
	return out
}

// footerHeight is the room the footer takes: the scale bar, the note and the caution lines.
func (p *planDrawer) footerHeight() vg.Length {
	h := vg.Length(len(p.noteLines)+len(p.cautionLines)) * lineHeight(planFootSize)
	if p.sheet.ScaleBarMM > 0 {
		h += lineHeight(planFootSize) + vg.Points(3)
	}
	if len(p.cautionLines) > 0 {
		h += vg.Points(3)
	}
	return h
}

// wrapText breaks text into lines no wider than width, at spaces, appending to out.
func wrapText(sty text.Style, t string, width vg.Length, out []string) []string {
	words := strings.Fields(t)
	line := ""
	for _, w := range words {
		try := w
		if line != "" {
			try = line + " " + w
		}
		if line != "" && sty.Width(try) > width {
			out = append(out, line)
			line = w
			continue
		}
		line = try
	}
	if line != "" {
		out = append(out, line)
	}
	return out
}

// drawScaleBar draws the scale bar and its label with the bar's lower edge at y.
func (p *planDrawer) drawScaleBar(c draw.Canvas, x, y vg.Length) {
	s := p.sheet
	if s.ScaleBarMM > 0 {
		n := s.ScaleBarDivisions
		seg := vg.Length(s.ScaleBarMM/float64(n)) * p.scale
		for k := 0; k < n; k++ {
			x0 := x + vg.Length(k)*seg
			if k%2 == 0 {
				c.SetColor(inkText)
			} else {
				c.SetColor(paper)
			}
			c.Fill(p.rect(x0, y, x0+seg, y+vg.Points(planBarHeight)))
		}
		c.SetLineStyle(draw.LineStyle{Color: inkText, Width: vg.Points(0.6)})
		c.Stroke(p.rect(x, y, x+vg.Length(n)*seg, y+vg.Points(planBarHeight)))
		lx := x + vg.Length(n)*seg + vg.Points(5)
		c.FillText(p.sty.footBold, vg.Point{X: lx, Y: y - vg.Points(1)}, s.ScaleBarLabel)
	}
}

// drawSlot draws one slot: highlight, protection, section or reference square, labels.
func (p *planDrawer) drawSlot(c draw.Canvas, sl *planSlot) {
	s := float64(p.scale)
	w, d := vg.Length(sl.wMM*s), vg.Length(sl.dMM*s)
	cx, cy := sl.cx, sl.bottom+d/2
	labelTop := sl.bottom - vg.Points(planLabelPad)
	if sl.sec != nil && sl.sec.Selected {
		hm := vg.Points(planHighlight)
		c.SetColor(planSelectFill)
		r := p.rect(sl.slotX-hm, labelTop-sl.labelH-hm, sl.slotX+sl.slotW+hm, sl.top+hm)
		c.Fill(r)
		c.SetLineStyle(draw.LineStyle{Color: families["steel"].colors[0], Width: vg.Points(1.2)})
		c.Stroke(r)
	}
	if sl.sec == nil {
		c.SetColor(planRefFill)
		r := p.rect(cx-w/2, cy-d/2, cx+w/2, cy+d/2)
		c.Fill(r)
		c.SetLineStyle(draw.LineStyle{Color: inkMuted, Width: vg.Points(0.8), Dashes: []vg.Length{vg.Points(4), vg.Points(2.5)}})
		c.Stroke(r)
	} else {
		p.drawSection(c, sl.sec, cx, cy)
	}
	y := labelTop

	c.FillText(p.nameSty, vg.Point{X: cx, Y: y}, sl.title)
	y -= p.nameH
	if p.labels != nil && sl.index >= 0 {
		p.labels[sl.index] = append(p.labels[sl.index][:0], sl.title)
	}
	if !planLevels[p.level].lines {
		return
	}
	if p.labels != nil && sl.index >= 0 {
		p.labels[sl.index] = append(p.labels[sl.index], sl.lines...)
	}
	for _, l := range sl.lines {
		c.FillText(p.lineSty, vg.Point{X: cx, Y: y}, l)
		y -= p.lineH
	}
}

// drawSection draws one section's protection and parts centred on (cx, cy).
func (p *planDrawer) drawSection(c draw.Canvas, sec *PlanSection, cx, cy vg.Length) {
	s := p.scale
	if pr := sec.ProtectionMM; pr > 0 {
		ow, od := vg.Length(sec.WidthMM/2+pr)*s, vg.Length(sec.DepthMM/2+pr)*s
		iw, id := vg.Length(sec.WidthMM/2)*s, vg.Length(sec.DepthMM/2)*s
		// Outer edge counter-clockwise, inner edge clockwise: a ring.
		p.path = p.path[:0]
		p.path.Move(vg.Point{X: cx - ow, Y: cy - od})
		p.path.Line(vg.Point{X: cx + ow, Y: cy - od})
		p.path.Line(vg.Point{X: cx + ow, Y: cy + od})
		p.path.Line(vg.Point{X: cx - ow, Y: cy + od})
		p.path.Close()
		p.path.Move(vg.Point{X: cx - iw, Y: cy - id})
		p.path.Line(vg.Point{X: cx - iw, Y: cy + id})
		p.path.Line(vg.Point{X: cx + iw, Y: cy + id})
		p.path.Line(vg.Point{X: cx + iw, Y: cy - id})
		p.path.Close()
		c.SetColor(planBoard)
		c.Fill(p.path)
		c.SetLineStyle(draw.LineStyle{Color: okabePurple, Width: vg.Points(0.8), Dashes: []vg.Length{vg.Points(3), vg.Points(2)}})
		c.Stroke(p.path)
	}
	body, line := bodyColours(sec.Group)
	for _, part := range sec.Parts {
		if len(part.Loops) == 0 {
			continue
		}
		switch part.Kind {
		case PartBody:
			path := p.region(cx, cy, part.Loops)
			c.SetColor(body)
			c.Fill(path)
			if line != nil {
				c.SetLineStyle(draw.LineStyle{Color: line, Width: vg.Points(planOutline)})
				c.Stroke(path)
			}
		case PartFill:
			c.SetColor(planConcrete)
			c.Fill(p.region(cx, cy, part.Loops))
		case PartChar:
			c.SetColor(planChar)
			c.Fill(p.region(cx, cy, part.Loops))
		case PartBar:
			c.SetColor(planSteelBar)
			c.Fill(p.region(cx, cy, part.Loops))
		case PartTie:
			lw := max(vg.Length(part.LineMM)*s, vg.Points(planHairline))
			c.SetLineStyle(draw.LineStyle{Color: planSteelBar, Width: lw})
			for _, l := range part.Loops {
				p.path = p.path[:0]
				p.loopPath(cx, cy, l, true)
				c.Stroke(p.path)
			}
		}
	}
}
