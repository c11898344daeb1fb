package ui

import (
	"errors"
	"fmt"
	"image/color"
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/layout"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"

	"upright/ui/model"
	"upright/ui/widgets"
)

// bannerColor is the pale red behind the invalid-input banner.
var bannerColor = color.NRGBA{R: 0xfd, G: 0xe8, B: 0xe6, A: 0xff}

// endSketchSpec is how the window draws one end condition.
type endSketchSpec struct {
	ends        model.EndCondition
	bottom, top widgets.End
	title, note string
}

// endSketchSpecs are the six idealized cases with their theoretical K
// (the elastic buckling values; each material applies its own design value).
var endSketchSpecs = []endSketchSpec{
	{model.FixedFixed, widgets.Fixed, widgets.Fixed, "fixed–fixed", "K 0.5"},
	{model.FixedPinned, widgets.Fixed, widgets.Pinned, "fixed–pinned", "K 0.7"},
	{model.FixedGuided, widgets.Fixed, widgets.Guided, "fixed–guided", "K 1.0 · sways"},
	{model.PinnedPinned, widgets.Pinned, widgets.Pinned, "pinned–pinned", "K 1.0"},
	{model.FixedFree, widgets.Fixed, widgets.Free, "fixed–free", "K 2.0 · sways"},
	{model.PinnedGuided, widgets.Pinned, widgets.Guided, "pinned–guided", "K 2.0 · sways"},
}

// Choice lists of the select widgets: what the user reads and the model value.
var (
	metricChoices = []choice{{"Weight", string(model.ByWeight)}, {"Plan footprint", string(model.ByFootprint)}, {"Embodied carbon", string(model.ByCarbon)}}
	kllChoices    = []choice{{"4: interior or exterior", "4"}, {"3: edge, cantilever slab", "3"}, {"2: corner, cantilever slab", "2"}, {"1: other", "1"}}
	occChoices    = []choice{{"General", model.OccGeneral}, {"Assembly (4.7.5)", model.OccAssembly}, {"Storage (4.7.3)", model.OccStorage}, {"Garage (4.7.4)", model.OccGarage}}
)

// choice pairs a label with the value it stands for.
type choice struct{ label, value string }

func labels(cs []choice) []string {
	out := make([]string, len(cs))
	for i, c := range cs {
		out[i] = c.label
	}
	return out
}

func valueOf(cs []choice, label string) string {
	for _, c := range cs {
		if c.label == label {
			return c.value
		}
	}
	return ""
}

func labelOf(cs []choice, value string) string {
	for _, c := range cs {
		if c.value == value {
			return c.label
		}
	}
	if len(cs) > 0 {
		return cs[0].label
	}
	return ""
}

// heading is a section title in the inputs panel.
func heading(s string) fyne.CanvasObject {
	l := widget.NewLabelWithStyle(s, fyne.TextAlignLeading, fyne.TextStyle{Bold: true})
	l.SizeName = theme.SizeNameSubHeadingText
	return container.NewVBox(widget.NewSeparator(), l)
}

// row puts a label to the left of an input, as the text fields have it.
func row(label string, o fyne.CanvasObject) fyne.CanvasObject {
	l := widget.NewLabel(label)
	l.Wrapping = fyne.TextWrapWord
	return container.NewBorder(nil, nil, fixedWidth(labelWidth, l), nil, container.NewVBox(layout.NewSpacer(), o, layout.NewSpacer()))
}

// small is a wrapping note in small type.
func small(s string) *widget.Label {
	l := widget.NewLabel(s)
	l.Wrapping = fyne.TextWrapWord
	l.SizeName = theme.SizeNameCaptionText
	return l
}

// labelWidth is the width of the label column of the inputs panel.
const labelWidth = 132

// newField makes the text input of a field spec: its label to the left,
// the entry to the right, and its problem (when there is one) below.
func (w *Window) newField(id string) *field {
	spec := specByID(id)
	f := &field{spec: spec}
	f.entry = newCommitEntry(w.do, func(text string) { w.commitField(id, text) })
	// No Validator: the state holds each field's problem and
	// showFieldErrors marks the entry (red border and icon) with it.
	f.entry.AlwaysShowValidationError = true
	if spec.hint != "" {
		f.entry.SetPlaceHolder(spec.hint)
	}
	f.err = widget.NewLabel("")
	f.err.Wrapping = fyne.TextWrapWord
	f.err.Importance = widget.DangerImportance
	f.err.SizeName = theme.SizeNameCaptionText
	f.err.Hide()
	f.entry.OnChanged = func(string) {
		if w.quiet > 0 {
			return
		}
		f.entry.typed()
	}
	lbl := widget.NewLabel(spec.label)
	lbl.Wrapping = fyne.TextWrapWord
	f.box = container.NewVBox(container.NewBorder(nil, nil, fixedWidth(labelWidth, lbl), nil, container.NewVBox(layout.NewSpacer(), f.entry, layout.NewSpacer())), f.err)
	if w.fields == nil {
		w.fields = map[string]*field{}
	}
	w.fields[id] = f
	return f
}

// commitField applies a field's committed text as one undoable step and
// shows the field as the state now reads it (a bare number with its unit).
func (w *Window) commitField(id, text string) {
	w.step("", func() Outcome { return w.st.Commit(id, text) })
	if id == "length" {
		w.syncSlider()
	}
	w.setEntryQuietForce(w.fields[id], w.st.Text(id))
	if id == "length" || id == "weak-axis length" {
		w.setEntryQuiet(w.fields["weak-axis length"], w.st.Text("weak-axis length"))
		w.setEntryQuiet(w.fields["length"], w.st.Text("length"))
	}
}

// setEntryQuiet sets an entry's text without treating it as typing; it
// leaves an entry with the focus alone so typing is not disturbed.
func (w *Window) setEntryQuiet(f *field, text string) {
	if f == nil || f.entry.Text == text {
		return
	}
	if c := w.win.Canvas(); c != nil && c.Focused() == f.entry {
		return
	}
	w.quiet++
	f.entry.SetText(text)
	w.quiet--
}

// showFieldErrors puts each field's problem under it.
func (w *Window) showFieldErrors() {
	for id, f := range w.fields {
		msg := w.st.FieldError(id)
		if msg == "" {
			f.err.Hide()
			f.entry.SetValidationError(nil)
			continue
		}
		f.err.SetText(msg)
		f.err.Show()
		f.entry.SetValidationError(errors.New(msg))
	}
	if msg := w.st.FieldError("materials"); msg != "" {
		w.matProblem.SetText(msg)
		w.matProblem.Show()
	} else {
		w.matProblem.Hide()
	}
	w.opts.showProblems(w)
}

// change applies a choice made by a widget unless the window is setting it.
func (w *Window) change(fn func(sc *model.Scheme)) {
	if w.quiet > 0 {
		return
	}
	w.step("", func() Outcome { return w.st.Update(fn) })
}

// buildInputs makes the inputs panel: column, load, design, materials.
func (w *Window) buildInputs() fyne.CanvasObject {
	// Column: ends, K, weak axis. The length itself sits under the chart.
	w.sketches = map[model.EndCondition]*widgets.EndSketch{}
	var tiles []fyne.CanvasObject
	for _, sp := range endSketchSpecs {
		sp := sp
		s := widgets.NewEndSketch(sp.bottom, sp.top, sp.title, sp.note, func() {
			w.change(func(sc *model.Scheme) { sc.Setting.Ends = sp.ends })
			w.syncSketches()
		})
		w.sketches[sp.ends] = s
		tiles = append(tiles, s)
	}
	sketchGrid := container.NewGridWithColumns(3, tiles...)
	kField := w.newField("K")
	w.weakCheck = widget.NewCheck("Weak axis braced at a shorter length", func(on bool) {
		if w.quiet > 0 {
			return
		}
		w.step("", func() Outcome { return w.st.SetWeakBraced(on) })
		w.syncWeak()
	})
	weak := w.newField("weak-axis length")
	w.twistCheck = widget.NewCheck("Braces also restrain twisting (steel Lcz = weak-axis length)", func(on bool) {
		w.change(func(sc *model.Scheme) { sc.Setting.TwistBraced = on })
	})
	column := container.NewVBox(
		heading("Column"),
		widget.NewLabel("End conditions (bottom–top)"),
		sketchGrid,
		small("K under each sketch is the ideal value; each material applies its own recommended design K. A typed K overrides both."),
		kField.box,
		w.weakCheck,
		weak.box,
		w.twistCheck,
		small("A weak-axis brace keeps its fraction of the height as the length changes. Unless the braces also restrain twisting, steel twists over the full height."),
	)

	// Load.
	w.loadMode = widget.NewRadioGroup([]string{"Typed axial load", "Load takedown"}, func(s string) {
		w.change(func(sc *model.Scheme) {
			if s == "Load takedown" {
				sc.Load.Mode = model.LoadTakedown
			} else {
				sc.Load.Mode = model.LoadDirect
			}
		})
		w.syncLoadMode()
	})
	w.loadMode.Horizontal = true
	w.loadMode.Required = true
	load := w.newField("load")
	share := w.newField("dead-share")
	w.directHint = small("")
	w.directBox = container.NewVBox(load.box, share.box, w.directHint)
	var td []fyne.CanvasObject
	for _, id := range []string{"tributary", "floors", "dead", "live", "roof-dead", "roof-live", "snow"} {
		td = append(td, w.newField(id).box)
	}
	w.liveRed = widget.NewCheck("Reduce floor live load (ASCE 7-22 4.7)", func(on bool) {
		w.change(func(sc *model.Scheme) { sc.Load.LiveReduction = on })
	})
	w.kll = widget.NewSelect(labels(kllChoices), func(s string) {
		w.change(func(sc *model.Scheme) {
			var v float64
			fmt.Sscanf(valueOf(kllChoices, s), "%g", &v)
			sc.Load.KLL = v
		})
	})
	w.occupancy = widget.NewSelect(labels(occChoices), func(s string) {
		w.change(func(sc *model.Scheme) { sc.Load.Occupancy = valueOf(occChoices, s) })
	})
	td = append(td, w.liveRed, row("KLL", w.kll), row("Occupancy", w.occupancy))
	w.takedownBox = container.NewVBox(td...)
	w.selfWeight = widget.NewCheck("Add the column's own weight", func(on bool) {
		w.change(func(sc *model.Scheme) { sc.SelfWeight = on })
	})
	w.loadSummary = widget.NewLabel("")
	w.loadSummary.Wrapping = fyne.TextWrapWord
	loadBox := container.NewVBox(heading("Load"), w.loadMode, w.directBox, w.takedownBox, w.selfWeight, w.loadSummary)

	// Design.
	w.method = widget.NewRadioGroup([]string{"LRFD", "ASD"}, func(s string) {
		w.change(func(sc *model.Scheme) { sc.Setting.Method = model.Method(strings.ToLower(s)) })
		w.syncLoadMode()
	})
	w.method.Horizontal = true
	w.method.Required = true
	w.metric = widget.NewSelect(labels(metricChoices), func(s string) {
		w.change(func(sc *model.Scheme) { sc.Metric = model.Metric(valueOf(metricChoices, s)) })
	})
	w.unitsRadio = widget.NewRadioGroup([]string{"US", "SI"}, func(s string) {
		if w.quiet > 0 {
			return
		}
		w.step("", func() Outcome {
			return w.st.Update(func(sc *model.Scheme) {
				if s == "SI" {
					sc.Units = model.SI
				} else {
					sc.Units = model.US
				}
			})
		})
		w.syncTexts()
		w.configureSlider()
	})
	w.unitsRadio.Horizontal = true
	w.unitsRadio.Required = true
	design := container.NewVBox(heading("Design"),
		row("Method", w.method),
		row("Rank by", w.metric),
		w.buildTieSelect(),
		row("Units", w.unitsRadio),
	)

	// Materials.
	w.matChecks = map[string]*widget.Check{}
	w.matProblem = widget.NewLabel("")
	w.matProblem.Importance = widget.DangerImportance
	w.matProblem.Wrapping = fyne.TextWrapWord
	w.matProblem.Hide()
	mats := container.NewVBox(heading("Materials"), w.matProblem)
	acc := widget.NewAccordion()
	acc.MultiOpen = true
	for _, m := range model.Materials() {
		m := m
		c := widget.NewCheck(materialTitle(m)+" columns", func(on bool) {
			if w.quiet > 0 {
				return
			}
			w.step("", func() Outcome { return w.st.SetMaterial(m, on) })
			w.opts.enable(w)
		})
		w.matChecks[m] = c
		mats.Add(c)
		if panel := w.opts.panel(w, m); panel != nil {
			acc.Append(widget.NewAccordionItem(materialTitle(m)+" options", panel))
		}
	}
	if len(model.Materials()) == 0 {
		mats.Add(small("No materials are registered in this build."))
	}
	mats.Add(acc)
	return container.NewVBox(w.buildNameField(), column, loadBox, design, w.buildFireInputs(), mats, layout.NewSpacer())
}

// materialTitle capitalises a material name.
func materialTitle(m string) string {
	if m == "" {
		return m
	}
	return strings.ToUpper(m[:1]) + m[1:]
}

// syncInputs sets every input widget from the state.
func (w *Window) syncInputs() {
	w.quiet++
	defer func() { w.quiet-- }()
	d := &w.st.Draft
	w.syncName()
	w.syncTie()
	w.syncTexts()
	w.syncSketches()
	w.weakCheck.SetChecked(w.st.WeakBraced)
	w.twistCheck.SetChecked(d.Setting.TwistBraced)
	if d.Load.Mode == model.LoadTakedown {
		w.loadMode.SetSelected("Load takedown")
	} else {
		w.loadMode.SetSelected("Typed axial load")
	}
	w.liveRed.SetChecked(d.Load.LiveReduction)
	kll := d.Load.KLL
	if kll == 0 {
		kll = model.DefaultKLL
	}
	w.kll.SetSelected(labelOf(kllChoices, fmt.Sprintf("%g", kll)))
	occ := d.Load.Occupancy
	if occ == "" {
		occ = model.OccGeneral
	}
	w.occupancy.SetSelected(labelOf(occChoices, occ))
	w.selfWeight.SetChecked(d.SelfWeight)
	w.method.SetSelected(strings.ToUpper(string(d.Setting.Method)))
	w.metric.SetSelected(labelOf(metricChoices, string(d.Metric)))
	if d.Units == model.SI {
		w.unitsRadio.SetSelected("SI")
	} else {
		w.unitsRadio.SetSelected("US")
	}
	for m, c := range w.matChecks {
		c.SetChecked(w.st.MaterialOn(m))
	}
	w.opts.sync(w)
	w.syncFire()
	w.syncWeak()
	w.syncLoadMode()
	w.configureSlider()
	w.showFieldErrors()
}

// syncTexts rewrites every entry from the state's text.
func (w *Window) syncTexts() {
	for id, f := range w.fields {
		w.setEntryQuietForce(f, w.st.Text(id))
	}
}

// setEntryQuietForce sets an entry's text without treating it as typing, even with the focus.
func (w *Window) setEntryQuietForce(f *field, text string) {
	if f.entry.Text == text {
		return
	}
	w.quiet++
	f.entry.SetText(text)
	w.quiet--
}

func (w *Window) syncSketches() {
	for e, s := range w.sketches {
		s.SetSelected(e == w.st.Draft.Setting.Ends)
	}
}

func (w *Window) syncWeak() {
	if w.st.WeakBraced {
		w.fields["weak-axis length"].entry.Enable()
		w.twistCheck.Enable()
	} else {
		w.fields["weak-axis length"].entry.Disable()
		w.twistCheck.Disable()
	}
}

func (w *Window) syncLoadMode() {
	if w.st.Draft.Load.Mode == model.LoadTakedown {
		w.directBox.Hide()
		w.takedownBox.Show()
	} else {
		w.takedownBox.Hide()
		w.directBox.Show()
	}
	if w.st.Draft.Setting.Method == model.ASD {
		w.directHint.SetText("ASD: give the service load (unfactored); a bare number is taken in the unit shown. The dead share splits it into D and L, and every combination follows.")
	} else {
		w.directHint.SetText("LRFD: give the governing factored load; a bare number is taken in the unit shown. The dead share splits it into D and L, and every combination follows.")
	}
	w.showFieldErrors()
	w.updateBanner()
}

// updateLoadSummary says what demand the load gives and where it comes from.
func (w *Window) updateLoadSummary() {
	if w.snap == nil || w.snap.Model == nil {
		w.loadSummary.SetText("")
		return
	}
	m := w.snap.Model
	sys := unitsOf(m)
	ls := &m.Loads
	var b strings.Builder
	fmt.Fprintf(&b, "Demand %s", fmtForce(ls.DemandN, sys))
	if ls.Typed {
		kind := "factored"
		if m.Scheme.Setting.Method == model.ASD {
			kind = "service"
		}
		fmt.Fprintf(&b, " typed (%s); dead share %.2f gives D %s and L %s, and every combination follows (%s governs)",
			kind, ls.DeadN/(ls.DeadN+ls.LiveN), fmtForce(ls.DeadN, sys), fmtForce(ls.LiveN, sys), ls.GoverningName)
	} else if ls.Governing >= 0 && ls.Governing < len(ls.Combos) {
		c := ls.Combos[ls.Governing]
		fmt.Fprintf(&b, " from %s (%s)", c.Name, c.Clause)
		if ls.Reduction < 1 {
			fmt.Fprintf(&b, "; floor live load × %.2f by reduction", ls.Reduction)
		}
	} else if m.Scheme.Setting.Method == model.ASD {
		b.WriteString(", typed service load")
	} else {
		b.WriteString(", typed factored load")
	}
	if m.Scheme.SelfWeight {
		b.WriteString(model.SelfWeightWords(&m.Scheme) + ".")
	} else {
		b.WriteString(".")
	}
	w.loadSummary.SetText(b.String())
}
