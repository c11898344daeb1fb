package ui

import (
	"fmt"
	"image"
	"image/color"
	"log"
	"math"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/driver/desktop"
	"fyne.io/fyne/v2/widget"

	"upright/ui/model"
	"upright/ui/units"
)

// lengthSlider is the length slider: continuous while dragged (no step, so
// a crossover chosen from the list lands exactly), with arrow keys moving
// one fine step and Page Up/Down one coarse step.
type lengthSlider struct {
	widget.Slider
	fine, coarse float64 // key steps in display units
}

func newLengthSlider() *lengthSlider {
	s := &lengthSlider{}
	s.Orientation = widget.Horizontal
	s.Max = 1
	s.ExtendBaseWidget(s)
	return s
}

// TypedKey moves the slider from the keyboard.
func (s *lengthSlider) TypedKey(k *fyne.KeyEvent) {
	if s.Disabled() {
		return
	}
	switch k.Name {
	case fyne.KeyLeft, fyne.KeyDown:
		s.SetValue(max(s.Min, s.Value-s.fine))
	case fyne.KeyRight, fyne.KeyUp:
		s.SetValue(min(s.Max, s.Value+s.fine))
	case fyne.KeyPageDown:
		s.SetValue(max(s.Min, s.Value-s.coarse))
	case fyne.KeyPageUp:
		s.SetValue(min(s.Max, s.Value+s.coarse))
	case fyne.KeyHome:
		s.SetValue(s.Min)
	case fyne.KeyEnd:
		s.SetValue(s.Max)
	}
}

// snap rounds a dragged value (ft or m) to a round length of the shown
// unit, 1 in or 50 mm, unless held (a modifier key) asks for it unrounded;
// the ends of the range are kept.
func (s *lengthSlider) snap(v float64, sys units.System, held bool) float64 {
	if held || v <= s.Min || v >= s.Max {
		return v
	}
	step := 1.0 / 12 // 1 in, in ft
	if sys == units.SI {
		step = 0.05 // 50 mm, in m
	}
	r := math.Round(v/step) * step
	return min(max(r, s.Min), s.Max)
}

// snapHeld reports whether a modifier key (Shift, Ctrl, Alt) is held, which
// lets the slider move without rounding.
func snapHeld() bool {
	a := fyne.CurrentApp()
	if a == nil {
		return false
	}
	if d, ok := a.Driver().(desktop.Driver); ok {
		return d.CurrentKeyModifiers()&(fyne.KeyModifierShift|fyne.KeyModifierControl|fyne.KeyModifierAlt) != 0
	}
	return false
}

// toDisplay converts mm to the slider's unit (ft or m).
func toDisplay(mm float64, sys units.System) float64 {
	v, _ := units.LengthValue(mm, sys)
	return v
}

// fromDisplay converts the slider's unit (ft or m) to mm.
func fromDisplay(v float64, sys units.System) float64 {
	if sys == units.SI {
		return v * 1000
	}
	return v * units.MMPerFoot
}

// chartPane is the chart of design strength against unbraced length with
// the current-length marker over it, and under it the length slider with
// the length field and the range. The engine draws the chart off the UI
// goroutine; the pane is fed its frames (takeFrame) rather than the
// snapshots, and asks for the size it has.
type chartPane struct {
	st     *State  // read only: changes go through ed
	ed     stepper // the one edit path
	fs     *fieldSet
	win    fyne.Window  // parent of the range dialog
	resize func()       // asks for a chart of the new size
	quiet  int          // >0 while the pane sets the slider itself
	sys    units.System // the unit the slider was configured in

	raster     *canvas.Raster
	front      *image.RGBA
	frame      FrameInfo // where the data area lies in front
	frames     int       // frames shown
	markerLine *canvas.Line
	markerBox  *canvas.Rectangle
	markerText *canvas.Text
	wantW      int
	wantH      int
	plot       fyne.CanvasObject // the chart with its marker
	slider     *lengthSlider
	sliderUnit *widget.Label
	rangeLabel *widget.Label
	controls   fyne.CanvasObject // the slider row
}

// newChartPane builds the chart and its slider reading st and changing it
// through ed; resize is called when the chart's size changes.
func newChartPane(st *State, ed stepper, do func(func()), win fyne.Window, resize func()) *chartPane {
	p := &chartPane{st: st, ed: ed, win: win, resize: resize}
	var focused func() fyne.Focusable
	if win != nil {
		focused = func() fyne.Focusable {
			if c := win.Canvas(); c != nil {
				return c.Focused()
			}
			return nil
		}
	}
	p.fs = newFieldSet(st, ed, do, focused)
	p.build()
	return p
}

// Object returns the chart with its marker.
func (p *chartPane) Object() fyne.CanvasObject { return p.plot }

// Controls returns the slider row: the slider, the length field and the range.
func (p *chartPane) Controls() fyne.CanvasObject { return p.controls }

// refresh shows the state's length in the field and on the slider after a
// change made anywhere, and configures the slider again when the units or
// the range changed (rebuild).
func (p *chartPane) refresh(rebuild bool) {
	if rebuild || p.sys != p.st.Sys() {
		p.configureSlider()
	}
	p.fs.refresh()
	p.fs.showErrors()
	p.syncSlider()
}

// sync sets the slider and the length field from the state, even a field
// with the focus (an undo, a file opened).
func (p *chartPane) sync() {
	p.configureSlider()
	for id, f := range p.fs.byID {
		p.fs.setForce(f, p.st.Text(id))
	}
	p.fs.showErrors()
}

// size is the chart image size the pane asks the engine for.
func (p *chartPane) size() (int, int) { return p.wantW, p.wantH }

// build makes the chart with the slider and its entry beneath.
func (p *chartPane) build() {
	p.raster = canvas.NewRaster(func(pw, ph int) image.Image {
		if pw != p.wantW || ph != p.wantH {
			p.wantW, p.wantH = pw, ph
			p.resize()
			p.placeMarker()
		}
		if p.front == nil {
			return blankImage
		}
		return p.front
	})
	p.raster.SetMinSize(fyne.NewSize(420, plotMinHeight))
	p.markerLine = canvas.NewLine(markerInk)
	p.markerLine.StrokeWidth = 1.6
	p.markerBox = canvas.NewRectangle(color.NRGBA{R: 255, G: 255, B: 255, A: 0xE6})
	p.markerText = canvas.NewText("", markerInk)
	p.markerText.TextStyle = fyne.TextStyle{Bold: true}
	p.markerText.TextSize = 12
	overlay := container.NewWithoutLayout(p.markerLine, p.markerBox, p.markerText)
	p.markerLine.Hide()
	p.markerBox.Hide()
	p.markerText.Hide()
	p.plot = container.NewStack(p.raster, overlay)

	p.slider = newLengthSlider()
	p.slider.OnChanged = func(v float64) {
		if p.quiet > 0 {
			return
		}
		mm := fromDisplay(p.slider.snap(v, p.st.Sys(), snapHeld()), p.st.Sys())
		p.ed.Drag(func(st *State) Outcome { return st.SetLength(mm) })
	}
	p.slider.OnChangeEnded = func(float64) {
		if p.quiet > 0 {
			return
		}
		p.ed.EndDrag()
	}
	length := p.fs.add("length")
	length.entry.SetPlaceHolder("e.g. 14'-6\" or 4.4 m")
	p.sliderUnit = widget.NewLabelWithStyle("Unbraced length", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	p.rangeLabel = widget.NewLabel("")
	p.rangeLabel.Importance = widget.LowImportance
	entryBox := container.NewGridWrap(fyne.NewSize(150, length.entry.MinSize().Height), length.entry)
	// The length's problem is said by the banner over the chart and the
	// entry's red mark: a line under the slider would push the chart up.
	sliderRow := container.NewBorder(nil, nil, p.sliderUnit, container.NewHBox(entryBox, p.rangeLabel, p.newRangeButton()), p.slider)

	p.controls = container.NewPadded(sliderRow)
}

// takeFrame copies a rendered chart into the pane's image and shows it. UI goroutine.
func (p *chartPane) takeFrame(img *image.RGBA, info FrameInfo) {
	b := img.Bounds()
	if p.front == nil || p.front.Bounds() != b {
		p.front = image.NewRGBA(b)
	}
	copy(p.front.Pix, img.Pix)
	p.frame = info
	p.frames++
	if p.frames == 1 {
		log.Printf("upright: first chart shown %.0f ms after the process started", float64(time.Since(processStart).Microseconds())/1000)
	}
	p.raster.Refresh()
	p.placeMarker()
}

// markerInk is the colour of the current-length marker.
var markerInk = color.NRGBA{R: 0x33, G: 0x33, B: 0x33, A: 0xff}

// placeMarker draws the current-length line over the chart image, at the
// length on screen, using the data area the engine found in the image.
func (p *chartPane) placeMarker() {
	hide := func() {
		p.markerLine.Hide()
		p.markerBox.Hide()
		p.markerText.Hide()
	}
	f := p.frame
	if p.front == nil || f.MarkerDrawn || f.Area.Empty() || !p.st.HaveValid {
		hide()
		return
	}
	sz := p.raster.Size()
	iw := float32(p.front.Bounds().Dx())
	if sz.Width <= 0 || iw <= 0 {
		hide()
		return
	}
	k := sz.Width / iw // window units per image pixel
	sys := units.System(f.Units)
	L := p.st.Valid.Setting.LengthMM
	px := markerPixel(f.Area, f.XMin, f.XMax, toDisplay(L, sys))
	if px < float64(f.Area.Min.X) || px > float64(f.Area.Max.X) {
		hide()
		return
	}
	x := float32(px) * k
	top, bottom := float32(f.Area.Min.Y)*k, float32(f.Area.Max.Y)*k
	p.markerLine.Position1 = fyne.NewPos(x, top)
	p.markerLine.Position2 = fyne.NewPos(x, bottom)
	p.markerText.Text = units.Length(L, sys)
	ts := p.markerText.MinSize()
	tx := x + 5
	if tx+ts.Width+4 > float32(f.Area.Max.X)*k {
		tx = x - 5 - ts.Width
	}
	p.markerText.Move(fyne.NewPos(tx, top+3))
	p.markerText.Resize(ts)
	p.markerBox.Move(fyne.NewPos(tx-2, top+2))
	p.markerBox.Resize(fyne.NewSize(ts.Width+4, ts.Height+2))
	p.markerLine.Show()
	p.markerBox.Show()
	p.markerText.Show()
	p.markerLine.Refresh()
	p.markerBox.Refresh()
	p.markerText.Refresh()
}

// blankImage is shown before the first chart is drawn.
var blankImage = func() *image.RGBA {
	img := image.NewRGBA(image.Rect(0, 0, 1, 1))
	img.Set(0, 0, color.White)
	return img
}()

// kindWords names a crossover kind for the list.
func kindWords(kind string) string {
	switch kind {
	case model.KindReach:
		return "reach ends"
	case model.KindSize:
		return "size step"
	case model.KindFamily:
		return "best family changes"
	}
	return kind
}

// configureSlider sets the slider's range and unit from the state.
func (p *chartPane) configureSlider() {
	sys := p.st.Sys()
	p.sys = sys
	r := p.st.Range
	if r.ToMM <= r.FromMM {
		r = model.DefaultRange(p.st.Draft.Setting.LengthMM, model.Units(sys))
	}
	p.quiet++
	p.slider.Min, p.slider.Max = toDisplay(r.FromMM, sys), toDisplay(r.ToMM, sys)
	if sys == units.SI {
		p.slider.fine, p.slider.coarse = 0.05, 0.25
	} else {
		p.slider.fine, p.slider.coarse = 1.0/12, 1
	}
	p.quiet--
	p.rangeLabel.SetText(fmt.Sprintf("%s to %s", rangeEnd(r.FromMM, sys), rangeEnd(r.ToMM, sys)))
	p.syncSlider()
}

// syncSlider moves the slider to the draft's length without firing it.
func (p *chartPane) syncSlider() {
	mm := p.st.Draft.Setting.LengthMM
	if p.st.FieldError("length") != "" {
		mm = p.st.Valid.Setting.LengthMM // a refused length leaves the slider where the result on screen is
	}
	v := toDisplay(mm, p.st.Sys())
	p.quiet++
	v = min(max(v, p.slider.Min), p.slider.Max)
	if v == p.slider.Value {
		p.quiet--
		return
	}
	p.slider.Value = v
	p.slider.Refresh()
	p.quiet--
}

// fixedWidth holds an object at a width, stretching it vertically.
func fixedWidth(width float32, o fyne.CanvasObject) fyne.CanvasObject {
	return container.New(&widthLayout{width: width}, o)
}

// widthLayout gives its objects a fixed width and the full height.
type widthLayout struct{ width float32 }

// Layout stretches each object over the height at the fixed width.
func (l *widthLayout) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	for _, o := range objs {
		o.Move(fyne.NewPos(0, 0))
		o.Resize(fyne.NewSize(l.width, size.Height))
	}
}

// MinSize is the fixed width and the tallest object's minimum height.
func (l *widthLayout) MinSize(objs []fyne.CanvasObject) fyne.Size {
	h := float32(0)
	for _, o := range objs {
		h = max(h, o.MinSize().Height)
	}
	return fyne.NewSize(l.width, h)
}
