package plots

import (
	"errors"
	"fmt"
	"image/color"
	"io"
	"math"

	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// FloorPlan is a building's floor plan: the grid, the slab edge and every
// column drawn to one scale, plain numbers in mm with x to the right and y up.
type FloorPlan struct {
	Title string
	// XLinesMM and YLinesMM are the grid lines' positions; XLabels and
	// YLabels name them (e.g. "1", "2" and "A", "B").
	XLinesMM, YLinesMM []float64
	XLabels, YLabels   []string
	// SlabMM is the slab outline: min x, min y, max x, max y.
	SlabMM [4]float64
	// Columns are drawn at their places, filled in their group's colour.
	Columns []PlanColumn
	// Legend lines are written under the plan (what each position holds).
	Legend []string
	// Note and Caution are written along the bottom; empty draws none.
	Note, Caution string
}

// PlanColumn is one column in a floor plan.
type PlanColumn struct {
	XMM, YMM float64 // the column's centre, mm
	// Outline is the column's plan outline (with any protection) as a
	// closed loop of points in mm about its centre, counter-clockwise.
	Outline []Point
	Group   string // chooses the fill, e.g. "steel", "concrete", "timber", "composite"
	Label   string // e.g. the size; the DXF writes it beside the column
}

// Elevation is each position's stack of columns from the ground up, heights
// to scale, each piece drawn as wide as its column (widths exaggerated by
// one factor so the changes show).
type Elevation struct {
	Title     string
	StoreysMM []float64 // storey heights from the ground up
	Stacks    []ElevationStack
	Note      string
	Caution   string
}

// ElevationStack is one position's column from the ground up.
type ElevationStack struct {
	Name   string // e.g. "interior (2)"
	Group  string
	Pieces []ElevationPiece
}

// ElevationPiece is a run of storeys of one size.
type ElevationPiece struct {
	From, To int     // first and last storey, 1 the ground
	WidthMM  float64 // the column's plan width; 0 draws a dashed gap (no size works)
	Label    string
}

// ErrInvalid reports building drawing data that cannot be drawn.
var ErrInvalid = errors.New("drawing data not accepted")

// DefaultBuildingSize is the exported size of the plan and the elevation:
// 10 × 7 inches, 192 DPI for PNG.
var DefaultBuildingSize = Size{Width: 720, Height: 504, DPI: 192}

func finiteAll(xs ...float64) bool {
	for _, x := range xs {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return false
		}
	}
	return true
}

// Validate checks the plan: at least one grid line each way, finite
// numbers, a slab of positive size and closed outlines of three points or more.
func (p *FloorPlan) Validate() error {
	if len(p.XLinesMM) == 0 || len(p.YLinesMM) == 0 {
		return fmt.Errorf("plots: floor plan: %w: no grid lines", ErrInvalid)
	}
	if !finiteAll(p.XLinesMM...) || !finiteAll(p.YLinesMM...) || !finiteAll(p.SlabMM[:]...) {
		return fmt.Errorf("plots: floor plan: %w: a grid position is not a number", ErrInvalid)
	}
	if p.SlabMM[2] <= p.SlabMM[0] || p.SlabMM[3] <= p.SlabMM[1] {
		return fmt.Errorf("plots: floor plan: %w: the slab has no area", ErrInvalid)
	}
	for _, c := range p.Columns {
		if len(c.Outline) < 3 || !finiteAll(c.XMM, c.YMM) {
			return fmt.Errorf("plots: floor plan: %w: column %q has no closed outline", ErrInvalid, c.Label)
		}
		for _, q := range c.Outline {
			if !finiteAll(q.X, q.Y) {
				return fmt.Errorf("plots: floor plan: %w: column %q outline is not a number", ErrInvalid, c.Label)
			}
		}
	}
	return nil
}

// Validate checks the elevation: storeys of positive height and pieces
// within them.
func (e *Elevation) Validate() error {
	if len(e.StoreysMM) == 0 {
		return fmt.Errorf("plots: elevation: %w: no storeys", ErrInvalid)
	}
	for _, h := range e.StoreysMM {
		if !finiteAll(h) || h <= 0 {
			return fmt.Errorf("plots: elevation: %w: storey height %g", ErrInvalid, h)
		}
	}
	for _, s := range e.Stacks {
		for _, p := range s.Pieces {
			if p.From < 1 || p.To < p.From || p.To > len(e.StoreysMM) || !finiteAll(p.WidthMM) || p.WidthMM < 0 {
				return fmt.Errorf("plots: elevation: %w: piece %q of %s", ErrInvalid, p.Label, s.Name)
			}
		}
	}
	return nil
}

// Building drawing sizes in points.
const (
	bldMargin   = 14
	bldTitle    = 13
	bldLabel    = 8
	bldSmall    = 7.5
	bldBubble   = 7 // grid bubble radius
	bldFootLine = 10.5
)

var (
	bldGrid = color.NRGBA{R: 0x8A, G: 0x8A, B: 0x8A, A: 0xff}
	bldSlab = color.NRGBA{R: 0xF3, G: 0xF1, B: 0xEC, A: 0xff}
)

// footer writes the note and caution lines up from the bottom and returns
// the height they take.
func footer(c draw.Canvas, w vg.Length, note, caution string) vg.Length {
	sty := aligned(textStyle(faceRegular, vg.Points(bldSmall), inkMuted), draw.XLeft, draw.YBottom)
	bold := aligned(textStyle(faceBold, vg.Points(bldSmall), inkText), draw.XLeft, draw.YBottom)
	y := c.Min.Y + vg.Points(bldMargin)/2
	var lines []string
	var styles []text.Style
	if caution != "" {
		cl := wrapText(bold, caution, w) // drawn upwards: the last line first
		for k := len(cl) - 1; k >= 0; k-- {
			lines, styles = append(lines, cl[k]), append(styles, bold)
		}
	}
	if note != "" {
		nl := wrapText(sty, note, w)
		for k := len(nl) - 1; k >= 0; k-- {
			lines, styles = append(lines, nl[k]), append(styles, sty)
		}
	}
	for k := range lines {
		c.FillText(styles[k], vg.Point{X: c.Min.X + vg.Points(bldMargin), Y: y}, lines[k])
		y += vg.Points(bldFootLine)
	}
	return y - c.Min.Y
}

// drawTitle writes a title from top down, wrapped at words to width, and
// returns the top left for what follows it; an empty title takes no room.
func drawTitle(c draw.Canvas, sty text.Style, title string, x, top, width vg.Length) vg.Length {
	if title == "" {
		return top
	}
	for _, l := range wrapText(sty, title, width) {
		c.FillText(sty, vg.Point{X: x, Y: top}, l)
		top -= vg.Points(bldTitle * 1.3)
	}
	return top - vg.Points(bldTitle*0.3)
}

// drawPlan paints the floor plan on c.
func (p *FloorPlan) draw(c draw.Canvas, fill bool) {
	if fill {
		c.SetColor(paper)
		c.Fill(c.Rectangle.Path())
	}
	m := vg.Points(bldMargin)
	titleSty := aligned(textStyle(faceBold, vg.Points(bldTitle), inkText), draw.XLeft, draw.YTop)
	top := c.Max.Y - m
	w := c.Max.X - c.Min.X - 2*m
	top = drawTitle(c, titleSty, p.Title, c.Min.X+m, top, w)
	bottom := c.Min.Y + footer(c, w, p.Note, p.Caution)
	labSty := aligned(textStyle(faceRegular, vg.Points(bldLabel), inkText), draw.XLeft, draw.YBottom)
	bottom += vg.Points(bldLabel*1.3) * vg.Length(len(p.Legend))
	for k, l := range p.Legend {
		c.FillText(labSty, vg.Point{X: c.Min.X + m, Y: bottom - vg.Points(bldLabel*1.3)*vg.Length(k+1)}, l)
	}
	bottom += vg.Points(4)
	// Room for the grid bubbles on every side.
	pad := vg.Points(3*bldBubble + 4)
	area := vg.Rectangle{Min: vg.Point{X: c.Min.X + m + pad, Y: bottom + pad}, Max: vg.Point{X: c.Max.X - m - pad, Y: top - pad}}
	sw, sh := p.SlabMM[2]-p.SlabMM[0], p.SlabMM[3]-p.SlabMM[1]
	scale := math.Min(float64(area.Max.X-area.Min.X)/sw, float64(area.Max.Y-area.Min.Y)/sh)
	if scale <= 0 {
		return
	}
	ox := area.Min.X + (area.Max.X-area.Min.X-vg.Length(sw*scale))/2 - vg.Length(p.SlabMM[0]*scale)
	oy := area.Min.Y + (area.Max.Y-area.Min.Y-vg.Length(sh*scale))/2 - vg.Length(p.SlabMM[1]*scale)
	at := func(x, y float64) vg.Point { return vg.Point{X: ox + vg.Length(x*scale), Y: oy + vg.Length(y*scale)} }
	// Slab.
	var slab vg.Path
	a, b := at(p.SlabMM[0], p.SlabMM[1]), at(p.SlabMM[2], p.SlabMM[3])
	slab.Move(a)
	slab.Line(vg.Point{X: b.X, Y: a.Y})
	slab.Line(b)
	slab.Line(vg.Point{X: a.X, Y: b.Y})
	slab.Close()
	c.SetColor(bldSlab)
	c.Fill(slab)
	c.SetLineStyle(draw.LineStyle{Color: inkMuted, Width: vg.Points(0.8)})
	c.Stroke(slab)
	// Grid lines with bubbles past the slab.
	ext := vg.Points(2 * bldBubble)
	gl := draw.LineStyle{Color: bldGrid, Width: vg.Points(0.5), Dashes: []vg.Length{vg.Points(6), vg.Points(2), vg.Points(1), vg.Points(2)}}
	bub := aligned(textStyle(faceRegular, vg.Points(bldLabel), inkText), draw.XCenter, draw.YCenter)
	circle := func(ctr vg.Point, label string) {
		var cp vg.Path
		cp.Move(vg.Point{X: ctr.X + vg.Points(bldBubble), Y: ctr.Y})
		cp.Arc(ctr, vg.Points(bldBubble), 0, 2*math.Pi)
		cp.Close()
		c.SetColor(paper)
		c.Fill(cp)
		c.SetLineStyle(draw.LineStyle{Color: bldGrid, Width: vg.Points(0.6)})
		c.Stroke(cp)
		c.FillText(bub, ctr, label)
	}
	for k, x := range p.XLinesMM {
		lo, hi := at(x, p.SlabMM[1]), at(x, p.SlabMM[3])
		lo.Y -= ext
		hi.Y += ext
		c.StrokeLine2(gl, lo.X, lo.Y, hi.X, hi.Y)
		if k < len(p.XLabels) {
			circle(vg.Point{X: hi.X, Y: hi.Y + vg.Points(bldBubble)}, p.XLabels[k])
		}
	}
	for k, y := range p.YLinesMM {
		lo, hi := at(p.SlabMM[0], y), at(p.SlabMM[2], y)
		lo.X -= ext
		hi.X += ext
		c.StrokeLine2(gl, lo.X, lo.Y, hi.X, hi.Y)
		if k < len(p.YLabels) {
			circle(vg.Point{X: lo.X - vg.Points(bldBubble), Y: lo.Y}, p.YLabels[k])
		}
	}
	// Columns, to scale, outlined so the smallest still shows.
	for _, col := range p.Columns {
		var cp vg.Path
		for k, q := range col.Outline {
			pt := at(col.XMM+q.X, col.YMM+q.Y)
			if k == 0 {
				cp.Move(pt)
			} else {
				cp.Line(pt)
			}
		}
		cp.Close()
		fillC, _ := bodyColours(col.Group)
		c.SetColor(fillC)
		c.Fill(cp)
		c.SetLineStyle(draw.LineStyle{Color: inkText, Width: vg.Points(0.5)})
		c.Stroke(cp)
	}
}

// draw paints the elevation on c.
func (e *Elevation) draw(c draw.Canvas, fill bool) {
	if fill {
		c.SetColor(paper)
		c.Fill(c.Rectangle.Path())
	}
	m := vg.Points(bldMargin)
	titleSty := aligned(textStyle(faceBold, vg.Points(bldTitle), inkText), draw.XLeft, draw.YTop)
	top := c.Max.Y - m
	w := c.Max.X - c.Min.X - 2*m
	top = drawTitle(c, titleSty, e.Title, c.Min.X+m, top, w)
	bottom := c.Min.Y + footer(c, w, e.Note, e.Caution) + vg.Points(bldLabel*1.5)
	levelSty := aligned(textStyle(faceRegular, vg.Points(bldSmall), inkMuted), draw.XLeft, draw.YCenter)
	nameSty := aligned(textStyle(faceBold, vg.Points(bldLabel), inkText), draw.XCenter, draw.YTop)
	labSty := aligned(textStyle(faceRegular, vg.Points(bldSmall), inkText), draw.XLeft, draw.YCenter)
	total := 0.0
	for _, h := range e.StoreysMM {
		total += h
	}
	left := c.Min.X + m + vg.Points(40)
	y0 := bottom
	hAvail := top - vg.Points(bldLabel*1.8) - y0
	vs := float64(hAvail) / total
	// Level lines and names.
	lv := draw.LineStyle{Color: bldGrid, Width: vg.Points(0.5), Dashes: []vg.Length{vg.Points(3), vg.Points(2)}}
	level := 0.0
	for k := 0; k <= len(e.StoreysMM); k++ {
		y := y0 + vg.Length(level*vs)
		c.StrokeLine2(lv, left-vg.Points(4), y, c.Max.X-m, y)
		name := "Ground"
		if k == len(e.StoreysMM) {
			name = "Roof"
		} else if k > 0 {
			name = fmt.Sprintf("Level %d", k)
		}
		c.FillText(levelSty, vg.Point{X: c.Min.X + m, Y: y}, name)
		if k < len(e.StoreysMM) {
			level += e.StoreysMM[k]
		}
	}
	n := len(e.Stacks)
	if n == 0 {
		return
	}
	slot := (c.Max.X - m - left) / vg.Length(n)
	// One width scale for every stack: the widest column takes a quarter slot.
	widest := 0.0
	for _, s := range e.Stacks {
		for _, p := range s.Pieces {
			widest = math.Max(widest, p.WidthMM)
		}
	}
	ws := 0.0
	if widest > 0 {
		ws = float64(slot) / 4 / widest
	}
	base := make([]float64, len(e.StoreysMM)+1)
	for k, h := range e.StoreysMM {
		base[k+1] = base[k] + h
	}
	for si, s := range e.Stacks {
		cx := left + slot*vg.Length(si) + slot*0.18
		c.FillText(nameSty, vg.Point{X: cx, Y: top}, s.Name)
		fillC, _ := bodyColours(s.Group)
		for _, p := range s.Pieces {
			ya, yb := y0+vg.Length(base[p.From-1]*vs), y0+vg.Length(base[p.To]*vs)
			hw := vg.Length(p.WidthMM * ws / 2)
			if p.WidthMM == 0 {
				c.StrokeLine2(draw.LineStyle{Color: inkMuted, Width: vg.Points(0.7), Dashes: []vg.Length{vg.Points(2), vg.Points(2)}}, cx, ya, cx, yb)
			} else {
				var r vg.Path
				r.Move(vg.Point{X: cx - hw, Y: ya})
				r.Line(vg.Point{X: cx + hw, Y: ya})
				r.Line(vg.Point{X: cx + hw, Y: yb})
				r.Line(vg.Point{X: cx - hw, Y: yb})
				r.Close()
				c.SetColor(fillC)
				c.Fill(r)
				c.SetLineStyle(draw.LineStyle{Color: inkText, Width: vg.Points(0.5)})
				c.Stroke(r)
				// The splice: a tick at the top of each piece below the roof.
				if p.To < len(e.StoreysMM) {
					c.StrokeLine2(draw.LineStyle{Color: inkText, Width: vg.Points(1.2)}, cx-hw-vg.Points(3), yb, cx+hw+vg.Points(3), yb)
				}
			}
			// The size just under the piece's top (clear of the level lines).
			c.FillText(labSty, vg.Point{X: cx + vg.Length(widest*ws/2) + vg.Points(4), Y: yb - vg.Points(bldSmall*1.4)}, p.Label)
		}
	}
}

// buildingWriter is one of the two building drawings.
type buildingWriter interface {
	draw(c draw.Canvas, fill bool)
}

func writeBuilding(w io.Writer, f Format, d buildingWriter, size Size) error {
	if f != PNG && f != SVG && f != PDF {
		return fmt.Errorf("format %q: %w", string(f), ErrUnknownFormat)
	}
	if err := size.check(f); err != nil {
		return err
	}
	cv := newCanvas(f, size)
	d.draw(draw.New(cv), true)
	if _, err := cv.WriteTo(w); err != nil {
		return fmt.Errorf("plots: writing %s: %w", f, err)
	}
	return nil
}

// WriteFloorPlan validates the plan and writes it to w in format f.
func WriteFloorPlan(w io.Writer, f Format, p *FloorPlan, size Size) error {
	if p == nil {
		return ErrNoChart
	}
	if err := p.Validate(); err != nil {
		return err
	}
	return writeBuilding(w, f, p, size)
}

// WriteElevation validates the elevation and writes it to w in format f.
func WriteElevation(w io.Writer, f Format, e *Elevation, size Size) error {
	if e == nil {
		return ErrNoChart
	}
	if err := e.Validate(); err != nil {
		return err
	}
	return writeBuilding(w, f, e, size)
}

// SaveFloorPlan writes the plan to path, the format from its extension.
func SaveFloorPlan(path string, p *FloorPlan, size Size) error {
	f, err := FormatOf(path)
	if err != nil {
		return err
	}
	if p == nil {
		return ErrNoChart
	}
	if err := p.Validate(); err != nil {
		return err
	}
	return saveFile(path, func(w io.Writer) error { return writeBuilding(w, f, p, size) })
}

// SaveElevation writes the elevation to path, the format from its extension.
func SaveElevation(path string, e *Elevation, size Size) error {
	f, err := FormatOf(path)
	if err != nil {
		return err
	}
	if e == nil {
		return ErrNoChart
	}
	if err := e.Validate(); err != nil {
		return err
	}
	return saveFile(path, func(w io.Writer) error { return writeBuilding(w, f, e, size) })
}
