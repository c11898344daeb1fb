package ui

import (
	"fmt"
	"image"
	"image/color"
	"math"

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

// buildChartArea makes the chart with the slider and its entry beneath, and
// (second) the crossovers panel.
func (w *Window) buildChartArea() (fyne.CanvasObject, fyne.CanvasObject) {
	w.chartRaster = canvas.NewRaster(func(pw, ph int) image.Image {
		if pw != w.wantW || ph != w.wantH {
			w.wantW, w.wantH = pw, ph
			w.submit()
			w.placeMarker()
		}
		if w.front == nil {
			return blankImage
		}
		return w.front
	})
	w.chartRaster.SetMinSize(fyne.NewSize(420, plotMinHeight))
	w.markerLine = canvas.NewLine(markerInk)
	w.markerLine.StrokeWidth = 1.6
	w.markerBox = canvas.NewRectangle(color.NRGBA{R: 255, G: 255, B: 255, A: 0xE6})
	w.markerText = canvas.NewText("", markerInk)
	w.markerText.TextStyle = fyne.TextStyle{Bold: true}
	w.markerText.TextSize = 12
	overlay := container.NewWithoutLayout(w.markerLine, w.markerBox, w.markerText)
	w.markerLine.Hide()
	w.markerBox.Hide()
	w.markerText.Hide()
	chartStack := container.NewStack(w.chartRaster, overlay)

	w.slider = newLengthSlider()
	w.slider.OnChanged = func(v float64) {
		if w.quiet > 0 {
			return
		}
		w.beginDrag()
		w.moveTo(fromDisplay(w.slider.snap(v, w.sys(), snapHeld()), w.sys()), true)
	}
	w.slider.OnChangeEnded = func(float64) {
		if w.quiet > 0 {
			return
		}
		w.endDrag()
	}
	length := w.newField("length")
	length.entry.SetPlaceHolder("e.g. 14'-6\" or 4.4 m")
	w.sliderUnit = widget.NewLabelWithStyle("Unbraced length", fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	w.rangeLabel = widget.NewLabel("")
	w.rangeLabel.Importance = widget.LowImportance
	entryBox := container.NewGridWrap(fyne.NewSize(150, length.entry.MinSize().Height), length.entry)
	sliderRow := container.NewBorder(nil, length.err, w.sliderUnit, container.NewHBox(entryBox, w.rangeLabel, w.newRangeButton()), w.slider)

	w.xsp = newCrossoversPane(w, w.sys, func() model.Range { return w.st.Range })
	xsPanel := w.xsp.Object()
	return container.NewBorder(nil, container.NewPadded(sliderRow), nil, nil, w.plotViews(chartStack)), xsPanel
}

// markerInk is the colour of the current-length marker.
var markerInk = color.NRGBA{R: 0x33, G: 0x33, B: 0x33, A: 0xff}

// placeMarker draws the current-length line over the chart image, at the
// length on screen, using the data area the engine found in the image.
func (w *Window) placeMarker() {
	hide := func() {
		w.markerLine.Hide()
		w.markerBox.Hide()
		w.markerText.Hide()
	}
	f := w.frame
	if w.front == nil || f.MarkerDrawn || f.Area.Empty() || !w.st.HaveValid {
		hide()
		return
	}
	sz := w.chartRaster.Size()
	iw := float32(w.front.Bounds().Dx())
	if sz.Width <= 0 || iw <= 0 {
		hide()
		return
	}
	k := sz.Width / iw // window units per image pixel
	sys := units.System(f.Units)
	L := w.st.Valid.Setting.LengthMM
	px := markerPixel(f.Area, f.XMin, f.XMax, toDisplay(L, sys))
	if px < float64(f.Area.Min.X) || px > float64(f.Area.Max.X) {
		hide()
		return
	}
	x := float32(px) * k
	top, bottom := float32(f.Area.Min.Y)*k, float32(f.Area.Max.Y)*k
	w.markerLine.Position1 = fyne.NewPos(x, top)
	w.markerLine.Position2 = fyne.NewPos(x, bottom)
	w.markerText.Text = units.Length(L, sys)
	ts := w.markerText.MinSize()
	tx := x + 5
	if tx+ts.Width+4 > float32(f.Area.Max.X)*k {
		tx = x - 5 - ts.Width
	}
	w.markerText.Move(fyne.NewPos(tx, top+3))
	w.markerText.Resize(ts)
	w.markerBox.Move(fyne.NewPos(tx-2, top+2))
	w.markerBox.Resize(fyne.NewSize(ts.Width+4, ts.Height+2))
	w.markerLine.Show()
	w.markerBox.Show()
	w.markerText.Show()
	w.markerLine.Refresh()
	w.markerBox.Refresh()
	w.markerText.Refresh()
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

// moveTo sets the length (slider drag, crossover chosen, typed elsewhere).
// It is not itself an undo step: the caller files it (a drag when it ends).
func (w *Window) moveTo(mm float64, moveSlider bool) Outcome {
	out := w.st.SetLength(mm)
	if moveSlider {
		w.syncSlider()
	}
	w.setEntryQuietForce(w.fields["length"], w.st.Text("length"))
	w.setEntryQuietForce(w.fields["weak-axis length"], w.st.Text("weak-axis length"))
	w.after(out)
	return Outcome{}
}

// configureSlider sets the slider's range and unit from the state.
func (w *Window) configureSlider() {
	sys := w.sys()
	r := w.st.Range
	if r.ToMM <= r.FromMM {
		r = model.DefaultRange(w.st.Draft.Setting.LengthMM, model.Units(sys))
	}
	w.quiet++
	w.slider.Min, w.slider.Max = toDisplay(r.FromMM, sys), toDisplay(r.ToMM, sys)
	if sys == units.SI {
		w.slider.fine, w.slider.coarse = 0.05, 0.25
	} else {
		w.slider.fine, w.slider.coarse = 1.0/12, 1
	}
	w.quiet--
	w.rangeLabel.SetText(fmt.Sprintf("%s to %s", rangeEnd(r.FromMM, sys), rangeEnd(r.ToMM, sys)))
	w.syncSlider()
}

// syncSlider moves the slider to the draft's length without firing it.
func (w *Window) syncSlider() {
	v := toDisplay(w.st.Draft.Setting.LengthMM, w.sys())
	w.quiet++
	w.slider.Value = min(max(v, w.slider.Min), w.slider.Max)
	w.slider.Refresh()
	w.quiet--
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
