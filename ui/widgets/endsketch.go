// Package widgets holds Upright's own window widgets.
package widgets

import (
	"image/color"
	"math"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/driver/desktop"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// End is the restraint at one end of a column.
type End int

// The restraints a sketch draws.
const (
	Fixed  End = iota // rotation and translation held
	Pinned            // translation held, rotation free
	Guided            // rotation held, translation free
	Free              // neither held
)

// shapePoints is how many straight pieces draw the deflected shape.
const shapePoints = 18

// EndSketch is a small drawing of one idealized end condition: the column
// line, a symbol for each end and the buckled shape. Tapping it, or pressing
// space or return while it has the keyboard focus, calls OnTapped.
type EndSketch struct {
	widget.BaseWidget

	Bottom, Top End
	Title       string // e.g. "fixed – pinned"
	Note        string // second caption line, e.g. "ideal K 0.7"
	Selected    bool
	OnTapped    func()

	focused, hovered bool
}

// NewEndSketch returns a sketch of a column with the given bottom and top restraints.
func NewEndSketch(bottom, top End, title, note string, tapped func()) *EndSketch {
	s := &EndSketch{Bottom: bottom, Top: top, Title: title, Note: note, OnTapped: tapped}
	s.ExtendBaseWidget(s)
	return s
}

// SetSelected marks the sketch as the chosen end condition.
func (s *EndSketch) SetSelected(on bool) {
	if s.Selected == on {
		return
	}
	s.Selected = on
	s.Refresh()
}

// Tapped chooses this end condition.
func (s *EndSketch) Tapped(*fyne.PointEvent) {
	if c := fyne.CurrentApp().Driver().CanvasForObject(s); c != nil {
		c.Focus(s)
	}
	if s.OnTapped != nil {
		s.OnTapped()
	}
}

// FocusGained draws the focus ring.
func (s *EndSketch) FocusGained() { s.focused = true; s.Refresh() }

// FocusLost removes the focus ring.
func (s *EndSketch) FocusLost() { s.focused = false; s.Refresh() }

// TypedRune chooses the sketch on space.
func (s *EndSketch) TypedRune(r rune) {
	if r == ' ' && s.OnTapped != nil {
		s.OnTapped()
	}
}

// TypedKey chooses the sketch on return or enter.
func (s *EndSketch) TypedKey(k *fyne.KeyEvent) {
	if (k.Name == fyne.KeyReturn || k.Name == fyne.KeyEnter) && s.OnTapped != nil {
		s.OnTapped()
	}
}

// MouseIn highlights the sketch under the pointer.
func (s *EndSketch) MouseIn(*desktop.MouseEvent) { s.hovered = true; s.Refresh() }

// MouseMoved does nothing; it completes desktop.Hoverable.
func (s *EndSketch) MouseMoved(*desktop.MouseEvent) {}

// MouseOut removes the highlight.
func (s *EndSketch) MouseOut() { s.hovered = false; s.Refresh() }

// MinSize keeps the sketch legible.
func (s *EndSketch) MinSize() fyne.Size { return fyne.NewSize(96, 128) }

// CreateRenderer draws the sketch with canvas primitives.
func (s *EndSketch) CreateRenderer() fyne.WidgetRenderer {
	r := &sketchRenderer{s: s}
	r.bg = canvas.NewRectangle(color.Transparent)
	r.bg.CornerRadius = 6
	r.axis = canvas.NewLine(color.Gray{Y: 170})
	r.axis.StrokeWidth = 1
	for i := range r.shape {
		r.shape[i] = canvas.NewLine(color.Black)
		r.shape[i].StrokeWidth = 2.5
	}
	for i := range r.sym {
		r.sym[i] = canvas.NewLine(color.Black)
		r.sym[i].StrokeWidth = 1.4
	}
	for i := range r.dots {
		r.dots[i] = canvas.NewCircle(color.Transparent)
		r.dots[i].StrokeWidth = 1.4
	}
	r.title = canvas.NewText(s.Title, color.Black)
	r.title.Alignment = fyne.TextAlignCenter
	r.title.TextStyle = fyne.TextStyle{Bold: true}
	r.note = canvas.NewText(s.Note, color.Black)
	r.note.Alignment = fyne.TextAlignCenter
	r.objects = append(r.objects, r.bg, r.axis)
	for _, l := range r.sym {
		r.objects = append(r.objects, l)
	}
	for _, c := range r.dots {
		r.objects = append(r.objects, c)
	}
	for _, l := range r.shape {
		r.objects = append(r.objects, l)
	}
	r.objects = append(r.objects, r.title, r.note)
	r.Refresh()
	return r
}

type sketchRenderer struct {
	s       *EndSketch
	bg      *canvas.Rectangle
	axis    *canvas.Line
	shape   [shapePoints]*canvas.Line
	sym     [24]*canvas.Line
	dots    [4]*canvas.Circle
	title   *canvas.Text
	note    *canvas.Text
	objects []fyne.CanvasObject

	nsym, ndot int
}

func (r *sketchRenderer) Destroy()                     {}
func (r *sketchRenderer) Objects() []fyne.CanvasObject { return r.objects }
func (r *sketchRenderer) MinSize() fyne.Size           { return r.s.MinSize() }

func (r *sketchRenderer) Refresh() {
	th := r.s.Theme()
	v := fyne.CurrentApp().Settings().ThemeVariant()
	fg := th.Color(theme.ColorNameForeground, v)
	prim := th.Color(theme.ColorNamePrimary, v)
	switch {
	case r.s.Selected:
		r.bg.FillColor = th.Color(theme.ColorNameSelection, v)
		r.bg.StrokeColor = prim
		r.bg.StrokeWidth = 2
	case r.s.hovered:
		r.bg.FillColor = th.Color(theme.ColorNameHover, v)
		r.bg.StrokeColor = th.Color(theme.ColorNameInputBorder, v)
		r.bg.StrokeWidth = 1
	default:
		r.bg.FillColor = color.Transparent
		r.bg.StrokeColor = th.Color(theme.ColorNameInputBorder, v)
		r.bg.StrokeWidth = 1
	}
	if r.s.focused {
		r.bg.StrokeColor = th.Color(theme.ColorNameFocus, v)
		r.bg.StrokeWidth = 3
	}
	for _, l := range r.shape {
		l.StrokeColor = prim
	}
	for _, l := range r.sym {
		l.StrokeColor = fg
	}
	for _, c := range r.dots {
		c.StrokeColor = fg
		c.FillColor = th.Color(theme.ColorNameBackground, v)
	}
	r.title.Text, r.title.Color = r.s.Title, fg
	r.title.TextSize = th.Size(theme.SizeNameText) * 0.92
	r.note.Text, r.note.Color = r.s.Note, th.Color(theme.ColorNamePlaceHolder, v)
	r.note.TextSize = th.Size(theme.SizeNameText) * 0.85
	r.Layout(r.s.Size())
	canvas.Refresh(r.s)
}

// deflection returns the buckled shape at height t (0 bottom, 1 top),
// scaled so that its largest value is 1: the first buckling mode of an
// ideal column with these restraints.
func deflection(bottom, top End, t float64) float64 {
	switch {
	case bottom == Fixed && top == Fixed:
		return (1 - math.Cos(2*math.Pi*t)) / 2
	case bottom == Fixed && top == Pinned:
		// w(s) = sin(k s) − k cos(k) s from the pinned end, tan k = k.
		return fixedPinned(1-t) / fixedPinnedPeak
	case bottom == Fixed && top == Guided:
		return (1 - math.Cos(math.Pi*t)) / 2
	case bottom == Pinned && top == Pinned:
		return math.Sin(math.Pi * t)
	case bottom == Fixed && top == Free:
		return 1 - math.Cos(math.Pi*t/2)
	case bottom == Pinned && top == Guided:
		return math.Sin(math.Pi * t / 2)
	}
	return 0
}

// fixedPinned is the fixed–pinned mode w(s) = sin(k s) − k cos(k) s, s
// measured from the pinned end, with k the first root of tan k = k.
func fixedPinned(s float64) float64 {
	const k = 4.493409457909064
	return math.Sin(k*s) - k*math.Cos(k)*s
}

// fixedPinnedPeak is the largest value of fixedPinned on [0, 1], where
// cos(k s) = cos(k) on its first rise.
var fixedPinnedPeak = fixedPinned(math.Acos(math.Cos(4.493409457909064)) / 4.493409457909064)

func (r *sketchRenderer) line(x1, y1, x2, y2 float32) {
	if r.nsym >= len(r.sym) {
		return
	}
	l := r.sym[r.nsym]
	l.Position1, l.Position2 = fyne.NewPos(x1, y1), fyne.NewPos(x2, y2)
	l.Show()
	r.nsym++
}

func (r *sketchRenderer) dot(x, y, rad float32) {
	if r.ndot >= len(r.dots) {
		return
	}
	c := r.dots[r.ndot]
	c.Position1, c.Position2 = fyne.NewPos(x-rad, y-rad), fyne.NewPos(x+rad, y+rad)
	c.Show()
	r.ndot++
}

// hatch draws a ground line at y from x1 to x2 with short strokes on the
// side away from the column (dir +1 below, -1 above).
func (r *sketchRenderer) hatch(x1, x2, y, dir float32) {
	r.line(x1, y, x2, y)
	const n = 4
	step := (x2 - x1) / n
	for i := 0; i < n; i++ {
		x := x1 + step*(float32(i)+0.5)
		r.line(x, y, x-step*0.8, y+dir*step*0.8)
	}
}

// drawEnd draws the symbol of restraint e at the column end (x, y); dir is
// +1 for the bottom end (symbol below) and -1 for the top (symbol above).
func (r *sketchRenderer) drawEnd(e End, x, y, u, dir, axisX float32) {
	switch e {
	case Fixed:
		// A thick clamp plate with its hatched ground.
		r.line(x-1.1*u, y, x+1.1*u, y)
		r.line(x-1.1*u, y+dir*1.5, x+1.1*u, y+dir*1.5)
		r.hatch(x-1.1*u, x+1.1*u, y+dir*1.5, dir)
	case Pinned:
		// A hinge ring on a triangle standing on hatched ground.
		h := 1.1 * u
		r.line(x, y, x-0.8*u, y+dir*h)
		r.line(x, y, x+0.8*u, y+dir*h)
		r.line(x-0.8*u, y+dir*h, x+0.8*u, y+dir*h)
		r.hatch(x-1.1*u, x+1.1*u, y+dir*h, dir)
		r.dot(x, y, 0.22*u)
	case Guided:
		// A level shoe fixed to the column, on two rollers against a
		// hatched guide that stays put: it slides sideways but cannot turn.
		r.line(x-1.0*u, y, x+1.0*u, y)
		r.line(x-1.0*u, y+dir*1.2, x+1.0*u, y+dir*1.2)
		gap := 0.7 * u
		r.dot(x-0.55*u, y+dir*(1.2+gap/2), gap/2)
		r.dot(x+0.55*u, y+dir*(1.2+gap/2), gap/2)
		r.hatch(axisX-1.4*u, axisX+2.4*u, y+dir*(1.2+gap), dir)
	case Free:
		// Nothing holds the end: a small open tip.
		r.dot(x, y, 0.18*u)
	}
}

func (r *sketchRenderer) Layout(size fyne.Size) {
	r.bg.Resize(size)
	r.bg.Move(fyne.NewPos(0, 0))
	th := r.s.Theme()
	ts := th.Size(theme.SizeNameText)
	capH := ts*2.1 + 6
	tsz := fyne.MeasureText(r.title.Text, r.title.TextSize, r.title.TextStyle)
	r.title.Resize(fyne.NewSize(size.Width, tsz.Height))
	r.title.Move(fyne.NewPos(0, size.Height-capH))
	nsz := fyne.MeasureText(r.note.Text, r.note.TextSize, r.note.TextStyle)
	r.note.Resize(fyne.NewSize(size.Width, nsz.Height))
	r.note.Move(fyne.NewPos(0, size.Height-capH+tsz.Height))

	areaH := size.Height - capH - 4
	u := float32(math.Min(float64(size.Width)*0.11, float64(areaH)*0.1))
	cx := size.Width * 0.42
	yb := areaH - 1.9*u
	yt := 2.0 * u
	if r.s.Top == Free {
		yt = 1.2 * u
	}
	amp := size.Width * 0.2
	r.axis.Position1, r.axis.Position2 = fyne.NewPos(cx, yb), fyne.NewPos(cx, yt)

	var prev fyne.Position
	for i := 0; i <= shapePoints; i++ {
		t := float64(i) / shapePoints
		p := fyne.NewPos(cx+amp*float32(deflection(r.s.Bottom, r.s.Top, t)), yb+(yt-yb)*float32(t))
		if i > 0 {
			l := r.shape[i-1]
			l.Position1, l.Position2 = prev, p
		}
		prev = p
	}
	topX := cx + amp*float32(deflection(r.s.Bottom, r.s.Top, 1))
	botX := cx + amp*float32(deflection(r.s.Bottom, r.s.Top, 0))

	r.nsym, r.ndot = 0, 0
	r.drawEnd(r.s.Bottom, botX, yb, u, 1, cx)
	r.drawEnd(r.s.Top, topX, yt, u, -1, cx)
	for i := r.nsym; i < len(r.sym); i++ {
		r.sym[i].Hide()
	}
	for i := r.ndot; i < len(r.dots); i++ {
		r.dots[i].Hide()
	}
}
