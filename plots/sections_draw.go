package plots

import (
	"image/color"
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
	// rowLabelX is where the row labels start; rowLabels says they are drawn.
	rowLabelX vg.Length
	rowLabels bool
}

// lineHeight is the spacing of text lines of a size in points.
func lineHeight(size float64) vg.Length { return vg.Points(size * planLineFactor) }

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
	p.drawRowLabels(c)
}

// drawRowLabels writes each row's label at its left, level with the
// middle of the row's drawings.
func (p *planDrawer) drawRowLabels(c draw.Canvas) {
	if !p.rowLabels {
		return
	}
	st := aligned(p.sty.footBold, draw.XLeft, draw.YCenter)
	lo := 0
	for r, n := range p.sheet.Rows {
		if lo < len(p.slots) {
			sl := &p.slots[lo]
			c.FillText(st, vg.Point{X: p.rowLabelX, Y: (sl.top + sl.bottom) / 2}, p.sheet.RowLabels[r])
		}
		lo += n
	}
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
