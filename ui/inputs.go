package ui

import (
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

// inputsPane is the inputs: the scheme's name, the column's ends and
// bracing, the load, the design choices, the fire rating and the materials
// with their options. It reads the state and changes it only through its
// stepper, one undoable step per change.
type inputsPane struct {
	st    *State  // read only: changes go through ed
	ed    stepper // the one edit path
	do    func(func())
	prefs fyne.Preferences // where the folded sections are kept
	fs    *fieldSet        // the text fields
	quiet int              // >0 while the pane sets its widgets itself

	sketches   map[model.EndCondition]*widgets.EndSketch
	weakCheck  *widget.Check
	twistCheck *widget.Check  // the weak-axis braces also restrain twisting (steel Lcz)
	nameEntry  *commitEntry   // the scheme's name
	tieSelect  *widget.Select // the near-tie tolerance
	load       loadWidgets
	method     *widget.RadioGroup
	metric     *widget.Select
	unitsRadio *widget.RadioGroup
	matChecks  map[string]*widget.Check
	matProblem *widget.Label
	opts       materialWidgets
	fire       fireWidgets
	inSections []*inputSection // the foldable sections
	box        *fyne.Container
	summaryOf  uint64 // the scheme generation the load summary was written for
}

// loadWidgets are the inputs of the load: typed, or taken down from the
// tributary area and the floor loads.
type loadWidgets struct {
	mode        *widget.RadioGroup
	directBox   *fyne.Container
	takedownBox *fyne.Container
	directHint  *widget.Label
	liveRed     *widget.Check
	kll         *widget.Select
	occupancy   *widget.Select
	selfWeight  *widget.Check
	summary     *widget.Label // the demand the load gives, from the snapshot shown
}

// newInputsPane builds the inputs reading st and changing it through ed;
// focused reports the widget with the keyboard focus; prefs keeps the
// folded sections.
func newInputsPane(st *State, ed stepper, do func(func()), focused func() fyne.Focusable, prefs fyne.Preferences) *inputsPane {
	p := &inputsPane{st: st, ed: ed, do: do, prefs: prefs}
	p.fs = newFieldSet(st, ed, do, focused)
	p.box = p.buildInputs().(*fyne.Container)
	p.foldSections(p.box)
	wrapLongChecks(p.box, inputsWidth-40)
	return p
}

// Object returns the inputs, foldable by section (the window scrolls them).
func (p *inputsPane) Object() fyne.CanvasObject { return p.box }

// Show says what demand the snapshot's load gives, once per scheme: a new
// length alone does not change it.
func (p *inputsPane) Show(s *Snapshot) {
	if s.SchemeGen != 0 && s.SchemeGen == p.summaryOf {
		return
	}
	p.summaryOf = s.SchemeGen
	p.updateLoadSummary(s)
}

// refresh shows the state's texts and problems after a change made anywhere.
func (p *inputsPane) refresh() {
	p.fs.refresh()
	p.showFieldErrors()
}

// showFieldErrors puts each field's problem under it.
func (p *inputsPane) showFieldErrors() {
	p.fs.showErrors()
	if msg := p.st.FieldError("materials"); msg != "" {
		p.matProblem.SetText(msg)
		p.matProblem.Show()
	} else {
		p.matProblem.Hide()
	}
	p.opts.showProblems(p)
}

// newField makes one of the pane's text fields.
func (p *inputsPane) newField(id string) *field { return p.fs.add(id) }

// change applies a choice made by a widget unless the pane is setting it.
func (p *inputsPane) change(fn func(sc *model.Scheme)) {
	if p.quiet > 0 {
		return
	}
	p.ed.Step("", func(st *State) Outcome { return st.Update(fn) })
}

// stepState applies one of the state's own operations as a step unless the
// pane is setting its widgets.
func (p *inputsPane) stepState(apply func(st *State) Outcome) {
	if p.quiet > 0 {
		return
	}
	p.ed.Step("", apply)
}

// buildInputs makes the inputs panel: column, load, design, materials.
func (p *inputsPane) buildInputs() fyne.CanvasObject {
	// Column: ends, K, weak axis. The length itself sits under the chart.
	p.sketches = map[model.EndCondition]*widgets.EndSketch{}
	var tiles []fyne.CanvasObject
	for _, sp := range endSketchSpecs {
		sp := sp
		s := widgets.NewEndSketch(sp.bottom, sp.top, sp.title, sp.note, func() {
			p.change(func(sc *model.Scheme) { sc.Setting.Ends = sp.ends })
			p.syncSketches()
		})
		p.sketches[sp.ends] = s
		tiles = append(tiles, s)
	}
	sketchGrid := container.NewGridWithColumns(3, tiles...)
	kField := p.newField("K")
	p.weakCheck = widget.NewCheck("Weak axis braced at a shorter length", func(on bool) {
		p.stepState(func(st *State) Outcome { return st.SetWeakBraced(on) })
		p.syncWeak()
	})
	weak := p.newField("weak-axis length")
	p.twistCheck = widget.NewCheck("Braces also restrain twisting (steel Lcz = weak-axis length)", func(on bool) {
		p.change(func(sc *model.Scheme) { sc.Setting.TwistBraced = on })
	})
	column := container.NewVBox(
		heading("Column"),
		widget.NewLabel("End conditions (bottom–top)"),
		sketchGrid,
		small("K under each sketch is the ideal value; each material applies its own recommended design K. A typed K overrides both."),
		kField.box,
		p.weakCheck,
		weak.box,
		p.twistCheck,
		small("A weak-axis brace keeps its fraction of the height as the length changes. Unless the braces also restrain twisting, steel twists over the full height."),
	)

	// Load.
	p.load.mode = widget.NewRadioGroup([]string{"Typed axial load", "Load takedown"}, func(s string) {
		p.change(func(sc *model.Scheme) {
			if s == "Load takedown" {
				sc.Load.Mode = model.LoadTakedown
			} else {
				sc.Load.Mode = model.LoadDirect
			}
		})
		p.syncLoadMode()
	})
	p.load.mode.Horizontal = true
	p.load.mode.Required = true
	load := p.newField("load")
	share := p.newField("dead-share")
	p.load.directHint = small("")
	p.load.directBox = container.NewVBox(load.box, share.box, p.load.directHint)
	var td []fyne.CanvasObject
	for _, id := range []string{"tributary", "floors", "dead", "live", "roof-dead", "roof-live", "snow"} {
		td = append(td, p.newField(id).box)
	}
	p.load.liveRed = widget.NewCheck("Reduce floor live load (ASCE 7-22 4.7)", func(on bool) {
		p.change(func(sc *model.Scheme) { sc.Load.LiveReduction = on })
	})
	p.load.kll = widget.NewSelect(labels(kllChoices), func(s string) {
		p.change(func(sc *model.Scheme) {
			var v float64
			fmt.Sscanf(valueOf(kllChoices, s), "%g", &v)
			sc.Load.KLL = v
		})
	})
	p.load.occupancy = widget.NewSelect(labels(occChoices), func(s string) {
		p.change(func(sc *model.Scheme) { sc.Load.Occupancy = valueOf(occChoices, s) })
	})
	td = append(td, p.load.liveRed, row("KLL", p.load.kll), row("Occupancy", p.load.occupancy))
	p.load.takedownBox = container.NewVBox(td...)
	p.load.selfWeight = widget.NewCheck("Add the column's own weight", func(on bool) {
		p.change(func(sc *model.Scheme) { sc.SelfWeight = on })
	})
	p.load.summary = widget.NewLabel("")
	p.load.summary.Wrapping = fyne.TextWrapWord
	loadBox := container.NewVBox(heading("Load"), p.load.mode, p.load.directBox, p.load.takedownBox, p.load.selfWeight, p.load.summary)

	// Design.
	p.method = widget.NewRadioGroup([]string{"LRFD", "ASD"}, func(s string) {
		p.change(func(sc *model.Scheme) { sc.Setting.Method = model.Method(strings.ToLower(s)) })
		p.syncLoadMode()
	})
	p.method.Horizontal = true
	p.method.Required = true
	p.metric = widget.NewSelect(labels(metricChoices), func(s string) {
		p.change(func(sc *model.Scheme) { sc.Metric = model.Metric(valueOf(metricChoices, s)) })
	})
	p.unitsRadio = widget.NewRadioGroup([]string{"US", "SI"}, func(s string) {
		p.change(func(sc *model.Scheme) {
			if s == "SI" {
				sc.Units = model.SI
			} else {
				sc.Units = model.US
			}
		})
	})
	p.unitsRadio.Horizontal = true
	p.unitsRadio.Required = true
	design := container.NewVBox(heading("Design"),
		row("Method", p.method),
		row("Rank by", p.metric),
		p.buildTieSelect(),
		row("Units", p.unitsRadio),
	)

	// Materials.
	p.matChecks = map[string]*widget.Check{}
	p.matProblem = widget.NewLabel("")
	p.matProblem.Importance = widget.DangerImportance
	p.matProblem.Wrapping = fyne.TextWrapWord
	p.matProblem.Hide()
	mats := container.NewVBox(heading("Materials"), p.matProblem)
	acc := widget.NewAccordion()
	acc.MultiOpen = true
	for _, m := range model.Materials() {
		m := m
		c := widget.NewCheck(materialTitle(m)+" columns", func(on bool) {
			p.stepState(func(st *State) Outcome { return st.SetMaterial(m, on) })
			p.opts.enable(p)
		})
		p.matChecks[m] = c
		mats.Add(c)
		if panel := p.opts.panel(p, m); panel != nil {
			acc.Append(widget.NewAccordionItem(materialTitle(m)+" options", panel))
		}
	}
	if len(model.Materials()) == 0 {
		mats.Add(small("No materials are registered in this build."))
	}
	mats.Add(acc)
	return container.NewVBox(p.buildNameField(), column, loadBox, design, p.buildFireInputs(), mats, layout.NewSpacer())
}

// materialTitle capitalises a material name.
func materialTitle(m string) string {
	if m == "" {
		return m
	}
	return strings.ToUpper(m[:1]) + m[1:]
}

// sync sets every input widget from the state.
func (p *inputsPane) sync() {
	p.quiet++
	defer func() { p.quiet-- }()
	d := &p.st.Draft
	p.syncName()
	p.syncTie()
	p.syncTexts()
	p.syncSketches()
	p.weakCheck.SetChecked(p.st.WeakBraced)
	p.twistCheck.SetChecked(d.Setting.TwistBraced)
	if d.Load.Mode == model.LoadTakedown {
		p.load.mode.SetSelected("Load takedown")
	} else {
		p.load.mode.SetSelected("Typed axial load")
	}
	p.load.liveRed.SetChecked(d.Load.LiveReduction)
	kll := d.Load.KLL
	if kll == 0 {
		kll = model.DefaultKLL
	}
	p.load.kll.SetSelected(labelOf(kllChoices, fmt.Sprintf("%g", kll)))
	occ := d.Load.Occupancy
	if occ == "" {
		occ = model.OccGeneral
	}
	p.load.occupancy.SetSelected(labelOf(occChoices, occ))
	p.load.selfWeight.SetChecked(d.SelfWeight)
	p.method.SetSelected(strings.ToUpper(string(d.Setting.Method)))
	p.metric.SetSelected(labelOf(metricChoices, string(d.Metric)))
	if d.Units == model.SI {
		p.unitsRadio.SetSelected("SI")
	} else {
		p.unitsRadio.SetSelected("US")
	}
	for m, c := range p.matChecks {
		c.SetChecked(p.st.MaterialOn(m))
	}
	p.opts.sync(p)
	p.syncFire()
	p.syncWeak()
	p.syncLoadMode()
	p.showFieldErrors()
}

// syncTexts rewrites every entry from the state's text.
func (p *inputsPane) syncTexts() {
	for id, f := range p.fs.byID {
		p.fs.setForce(f, p.st.Text(id))
	}
}

func (p *inputsPane) syncSketches() {
	for e, s := range p.sketches {
		s.SetSelected(e == p.st.Draft.Setting.Ends)
	}
}

func (p *inputsPane) syncWeak() {
	if p.st.WeakBraced {
		p.fs.byID["weak-axis length"].entry.Enable()
		p.twistCheck.Enable()
	} else {
		p.fs.byID["weak-axis length"].entry.Disable()
		p.twistCheck.Disable()
	}
}

func (p *inputsPane) syncLoadMode() {
	if p.st.Draft.Load.Mode == model.LoadTakedown {
		p.load.directBox.Hide()
		p.load.takedownBox.Show()
	} else {
		p.load.takedownBox.Hide()
		p.load.directBox.Show()
	}
	if p.st.Draft.Setting.Method == model.ASD {
		p.load.directHint.SetText("ASD: give the service load (unfactored); a bare number is taken in the unit shown. The dead share splits it into D and L, and every combination follows.")
	} else {
		p.load.directHint.SetText("LRFD: give the governing factored load; a bare number is taken in the unit shown. The dead share splits it into D and L, and every combination follows.")
	}
	p.showFieldErrors()
}

// updateLoadSummary says what demand the load gives and where it comes from.
func (p *inputsPane) updateLoadSummary(s *Snapshot) {
	if s == nil || s.Model == nil {
		p.load.summary.SetText("")
		return
	}
	m := s.Model
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
	p.load.summary.SetText(b.String())
}
