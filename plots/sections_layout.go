package plots

import (
	"math"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
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

// rowChoices lists the row splits the layout tries: the sheet's own Rows
// when they add up to the n slots, else 1 to planMaxRows rows of nearly
// equal count.
func (p *planDrawer) rowChoices(n int) [][][2]int {
	total := 0
	for _, k := range p.sheet.Rows {
		if k <= 0 {
			total = -1
			break
		}
		total += k
	}
	if total == n && n > 0 {
		rows := make([][2]int, 0, len(p.sheet.Rows))
		lo := 0
		for _, k := range p.sheet.Rows {
			rows = append(rows, [2]int{lo, lo + k})
			lo += k
		}
		return [][][2]int{rows}
	}
	var out [][][2]int
	for r := 1; r <= min(n, planMaxRows); r++ {
		out = append(out, rowsOf(n, r))
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
		for _, rr := range p.rowChoices(n) {
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
		for _, rr := range p.rowChoices(n) {
			if v := p.bestScale(rr, w, h, false); v > bestS*1.03 {
				best, bestS = rr, v
			}
		}
		bestLevel = len(planLevels) - 1
	}
	if bestS == 0 {
		best, bestS = p.rowChoices(n)[0], 1e-3
	}
	p.setLevel(bestLevel)
	p.scale = vg.Length(bestS)
	s := bestS
	// Centre the rows in the height left over.
	used := vg.Length(0)
	for ri, r := range best {
		dh, lh := vg.Length(0), vg.Length(0)
		for k := r[0]; k < r[1]; k++ {
			dh = max(dh, vg.Length(p.slots[k].dMM*s))
			lh = max(lh, p.slots[k].labelH)
		}
		used += dh + vg.Points(planLabelPad) + lh
		if ri > 0 {
			used += vg.Points(planRowGap)
		}
	}
	y := area.Max.Y - max(0, (h-used)/2)
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
	p.cautionLines = appendWrapped(p.cautionLines[:0], p.sty.footBold, s.Caution, w)
	p.noteLines = appendWrapped(p.noteLines[:0], p.sty.foot, s.Note, w)
	area.Min.Y += p.footerHeight() + vg.Points(6)
	p.prepare()
	p.scale = 0
	p.rowLabels = len(s.RowLabels) > 0 && len(s.RowLabels) == len(s.Rows) && len(p.rowChoices(len(p.slots))) == 1 && len(s.Rows) > 0
	if p.rowLabels {
		lw := vg.Length(0)
		for _, l := range s.RowLabels {
			lw = max(lw, p.sty.footBold.Width(l))
		}
		lw = min(lw, (area.Max.X-area.Min.X)/4)
		p.rowLabelX = area.Min.X
		area.Min.X += lw + vg.Points(planGap)
	}
	if len(s.Sections) > 0 {
		p.layout(area)
	}
	return foot, area
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
