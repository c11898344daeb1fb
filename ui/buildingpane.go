package ui

import (
	"bytes"
	"encoding/json"
	"fmt"
	"image"
	"image/png"
	"math"
	"strconv"
	"strings"
	"sync"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
	"upright/ui/units"
)

// buildingPane is the Building view: the scheme's building (grid, storeys,
// façade, how often sizes change), its floor plan and column stacks for a
// chosen family, and every family's totals. The sizing runs on a goroutine
// of its own, only when the building or the scheme's design choices change;
// the result is applied through fyne.Do. The scheme changes only through
// the editor.
type buildingPane struct {
	ed editor

	root   *fyne.Container
	none   fyne.CanvasObject // shown when the scheme has no building
	body   fyne.CanvasObject
	status *widget.Label

	baysX, baysY, storeys, facade, every *widget.Entry
	family                               *widget.Select
	storey                               *widget.Select // the storey the height slider scales and the plan shows
	height                               *widget.Slider
	heightText                           *widget.Label
	plan, elev                           *canvas.Image
	totals                               *widget.Label
	stacks                               *widget.Label

	quiet   int          // > 0 while the pane sets its own widgets
	scheme  model.Scheme // the scheme last shown
	key     string       // what the schedule shown was computed from
	sched   *model.Schedule
	mu      sync.Mutex
	pending *model.Scheme // the next scheme to size; nil when none
	busy    bool          // a sizing goroutine is running
	size    plots.Size    // the drawings' size: the view's, so their text is read at its own size
	sized   model.Scheme  // the scheme last handed to submit, drawn again when the view's size changes
}

// Building view limits of the storey-height slider, mm.
const (
	buildingHeightMin  = 2500.0
	buildingHeightMax  = 9000.0
	buildingHeightStep = 100.0
)

// newBuildingPane builds the Building view; every change goes through ed.
func newBuildingPane(ed editor) *buildingPane {
	p := &buildingPane{ed: ed}
	p.status = widget.NewLabel("")
	p.status.Wrapping = fyne.TextWrapWord
	add := widget.NewButton("Add a building", func() { p.ed.Edit("add a building", addBuilding) })
	about := widget.NewLabel("A building takes down and sizes every column of a grid, storey by storey, in every family switched on, and totals each family's steel, concrete, timber, carbon and floor area.")
	about.Wrapping = fyne.TextWrapWord
	p.none = container.NewVBox(
		widget.NewLabelWithStyle("This scheme has no building.", fyne.TextAlignLeading, fyne.TextStyle{Bold: true}),
		about,
		container.NewHBox(add),
	)
	entry := func(place string, apply func(s string) (string, func(b *model.Building), error)) *widget.Entry {
		e := widget.NewEntry()
		e.SetPlaceHolder(place)
		e.OnSubmitted = func(s string) { p.edit(s, apply) }
		return e
	}
	p.baysX = entry("9m,9m,9m", func(s string) (string, func(b *model.Building), error) {
		v, err := parseLengthList("bays x", s)
		return "bays x " + s, func(b *model.Building) { b.BaysXMM = v }, err
	})
	p.baysY = entry("7.5m,7.5m", func(s string) (string, func(b *model.Building), error) {
		v, err := parseLengthList("bays y", s)
		return "bays y " + s, func(b *model.Building) { b.BaysYMM = v }, err
	})
	p.storeys = entry("4.2m,3.6m,3.6m", func(s string) (string, func(b *model.Building), error) {
		v, err := parseLengthList("storeys", s)
		return "storeys " + s, func(b *model.Building) { b.StoreysMM = v }, err
	})
	p.facade = entry("0kN/m", func(s string) (string, func(b *model.Building), error) {
		v, err := units.ParseLineLoad(s)
		if err != nil {
			why := units.WhyAmbiguous(err)
			if why != "" {
				why += "; "
			}
			err = fmt.Errorf("façade %q: %sgive %s, from 0 to 100 kN/m (6.85 kip/ft)", s, why, units.LineLoadForms)
		}
		return "façade " + s, func(b *model.Building) { b.FacadeKNPerM = v }, err
	})
	p.every = entry("2", func(s string) (string, func(b *model.Building), error) {
		n, err := strconv.Atoi(strings.TrimSpace(s))
		if err != nil {
			err = fmt.Errorf("change every %q: give a whole number of storeys from 1 to 60", s)
		}
		return "sizes change every " + s, func(b *model.Building) { b.ChangeEvery = n }, err
	})
	p.family = widget.NewSelect(nil, func(name string) {
		if p.quiet > 0 {
			return
		}
		p.edit(name, func(string) (string, func(b *model.Building), error) {
			return "plan family " + name, func(b *model.Building) { b.PlanFamily = name }, nil
		})
	})
	p.storey = widget.NewSelect(nil, func(s string) {
		if p.quiet > 0 {
			return
		}
		k, _ := strconv.Atoi(strings.TrimPrefix(s, "storey "))
		p.edit(s, func(string) (string, func(b *model.Building), error) {
			return "plan " + s, func(b *model.Building) { b.PlanStorey = k }, nil
		})
	})
	p.heightText = widget.NewLabel("")
	p.height = widget.NewSlider(buildingHeightMin, buildingHeightMax)
	p.height.Step = buildingHeightStep
	p.height.OnChanged = func(v float64) {
		p.heightText.SetText(units.Length(v, units.System(p.scheme.Units)))
	}
	p.height.OnChangeEnded = func(v float64) {
		if p.quiet > 0 || p.scheme.Building == nil {
			return
		}
		k := chartStorey(p.scheme.Building)
		p.edit("", func(string) (string, func(b *model.Building), error) {
			return fmt.Sprintf("storey %d height %s", k, units.Length(v, units.System(p.scheme.Units))), func(b *model.Building) {
				if k-1 < len(b.StoreysMM) {
					b.StoreysMM[k-1] = v
				}
			}, nil
		})
	}
	remove := widget.NewButton("Remove the building", func() {
		p.ed.Edit("remove the building", func(sc *model.Scheme) { sc.Building = nil })
	})
	form := widget.NewForm(
		widget.NewFormItem("Bays along x", p.baysX),
		widget.NewFormItem("Bays along y", p.baysY),
		widget.NewFormItem("Storeys, ground up", p.storeys),
		widget.NewFormItem("Façade per m of edge", p.facade),
		widget.NewFormItem("Size changes every", p.every),
		widget.NewFormItem("Family drawn", p.family),
		widget.NewFormItem("Storey", p.storey),
		widget.NewFormItem("Its height", container.NewBorder(nil, nil, nil, p.heightText, p.height)),
	)
	p.plan = canvas.NewImageFromImage(nil)
	p.plan.FillMode = canvas.ImageFillContain
	p.elev = canvas.NewImageFromImage(nil)
	p.elev.FillMode = canvas.ImageFillContain
	p.totals = widget.NewLabel("")
	p.totals.TextStyle = fyne.TextStyle{Monospace: true}
	p.stacks = widget.NewLabel("")
	p.stacks.TextStyle = fyne.TextStyle{Monospace: true}
	left := container.NewVScroll(container.NewVBox(form, p.status, container.NewHBox(remove), widget.NewSeparator(), p.stacks))
	// A choice, not tabs: the window's tab rows stay its own.
	totals := container.NewScroll(p.totals)
	views := map[string]fyne.CanvasObject{"Plan": p.plan, "Stacks": p.elev, "Totals": totals}
	choice := widget.NewRadioGroup([]string{"Plan", "Stacks", "Totals"}, func(v string) {
		for k, o := range views {
			if k == v {
				o.Show()
			} else {
				o.Hide()
			}
		}
	})
	choice.Horizontal = true
	choice.Required = true
	choice.SetSelected("Plan")
	p.size = buildingViewSize
	figures := container.New(&sizeWatch{onSize: p.resized}, container.NewStack(p.plan, p.elev, totals))
	drawings := container.NewBorder(choice, nil, nil, nil, figures)
	split := container.NewHSplit(left, drawings)
	split.Offset = 0.34
	p.body = split
	p.root = container.NewStack(p.none, p.body)
	p.body.Hide()
	return p
}

// Object returns the pane's content.
func (p *buildingPane) Object() fyne.CanvasObject { return p.root }

// chartStorey is the storey the plan shows and the slider scales.
func chartStorey(b *model.Building) int {
	if b.PlanStorey >= 1 && b.PlanStorey <= len(b.StoreysMM) {
		return b.PlanStorey
	}
	return 1
}

// parseLengthList reads a comma list of lengths, mm.
func parseLengthList(field, s string) ([]float64, error) {
	var out []float64
	for _, part := range strings.Split(s, ",") {
		v, err := units.ParseLength(strings.TrimSpace(part))
		if err != nil {
			return nil, fmt.Errorf("%s %q: give a comma list of lengths, e.g. 9m,9m,7.5m (%s)", field, s, units.LengthForms)
		}
		out = append(out, v)
	}
	return out, nil
}

// edit applies one change to a copy of the building, after checking the
// whole building, as one step through the editor.
func (p *buildingPane) edit(text string, apply func(s string) (string, func(b *model.Building), error)) {
	if p.scheme.Building == nil {
		return
	}
	what, change, err := apply(text)
	if err != nil {
		p.status.SetText(err.Error())
		return
	}
	b := copyBuilding(p.scheme.Building)
	change(&b)
	if err := b.Validate(); err != nil {
		p.status.SetText(err.Error())
		return
	}
	p.ed.Edit(what, func(sc *model.Scheme) { nb := copyBuilding(&b); sc.Building = &nb })
}

// copyBuilding returns a copy sharing no list with b.
func copyBuilding(b *model.Building) model.Building {
	c := *b
	c.BaysXMM = append([]float64(nil), b.BaysXMM...)
	c.BaysYMM = append([]float64(nil), b.BaysYMM...)
	c.StoreysMM = append([]float64(nil), b.StoreysMM...)
	return c
}

// buildingKey is what a schedule depends on: the building and the design
// choices of the scheme, not the single column's length or load.
func buildingKey(sc model.Scheme) string {
	sc.Setting.LengthMM, sc.Setting.WeakMM = 0, 0
	sc.Load = model.Load{}
	sc.Name = ""
	b, err := json.Marshal(sc)
	if err != nil {
		return fmt.Sprint(sc)
	}
	return string(b)
}

// Show follows the window's scheme: the inputs take the building's values
// and, when the building or the design choices changed, the schedule is
// worked out again off the UI goroutine.
func (p *buildingPane) Show(s *Snapshot) {
	if s == nil || s.Model == nil {
		return
	}
	sc := s.Model.Scheme
	p.scheme = sc
	if sc.Building == nil {
		p.body.Hide()
		p.none.Show()
		p.key = ""
		return
	}
	p.none.Hide()
	p.body.Show()
	b := sc.Building
	sys := units.System(sc.Units)
	p.quiet++
	setIfIdle(p.baysX, lengthList(b.BaysXMM, sys))
	setIfIdle(p.baysY, lengthList(b.BaysYMM, sys))
	setIfIdle(p.storeys, lengthList(b.StoreysMM, sys))
	setIfIdle(p.facade, units.LineLoad(b.FacadeKNPerM, sys))
	setIfIdle(p.every, strconv.Itoa(b.ChangeEvery))
	var opts []string
	for k := range b.StoreysMM {
		opts = append(opts, fmt.Sprintf("storey %d", k+1))
	}
	p.storey.Options = opts
	k := chartStorey(b)
	p.storey.SetSelected(fmt.Sprintf("storey %d", k))
	p.height.SetValue(min(max(b.StoreysMM[k-1], buildingHeightMin), buildingHeightMax))
	p.heightText.SetText(units.Length(b.StoreysMM[k-1], sys))
	p.quiet--
	key := buildingKey(sc)
	if key == p.key {
		return
	}
	p.key = key
	p.status.SetText("Sizing every column…")
	p.submit(sc)
}

// setIfIdle sets an entry's text unless the user is typing in it.
func setIfIdle(e *widget.Entry, text string) {
	if a := fyne.CurrentApp(); a != nil && a.Driver() != nil {
		if c := a.Driver().CanvasForObject(e); c != nil && c.Focused() == e {
			return
		}
	}
	if e.Text != text {
		e.SetText(text)
	}
}

// lengthList writes lengths as a comma list in the display units.
func lengthList(mm []float64, sys units.System) string {
	parts := make([]string, len(mm))
	for i, v := range mm {
		if sys == units.US {
			parts[i] = strconv.FormatFloat(math.Round(v/units.MMPerFoot*100)/100, 'f', -1, 64) + "ft"
		} else {
			parts[i] = strconv.FormatFloat(math.Round(v)/1000, 'f', -1, 64) + "m"
		}
	}
	return strings.Join(parts, ",")
}

// resized draws the figures again at the view's new size (in points, at
// the screen's resolution), once the change is more than a few per cent.
func (p *buildingPane) resized(sz fyne.Size) {
	scale := float32(1)
	if a := fyne.CurrentApp(); a != nil && a.Driver() != nil {
		if c := a.Driver().CanvasForObject(p.plan); c != nil {
			scale = c.Scale()
		}
	}
	want := plots.Size{Width: float64(sz.Width) * 0.75, Height: float64(sz.Height) * 0.75, DPI: int(math.Round(96 * float64(scale)))}
	if want.Width < 240 || want.Height < 160 {
		want = buildingViewSize // too small to lay a plan out: the page, scaled down
	}
	p.mu.Lock()
	old := p.size
	same := math.Abs(want.Width-old.Width) < 0.04*old.Width && math.Abs(want.Height-old.Height) < 0.04*old.Height && want.DPI == old.DPI
	if !same {
		p.size = want
	}
	p.mu.Unlock()
	if !same && p.sched != nil {
		p.submit(p.sized)
	}
}

// submit sizes sc on a goroutine, keeping only the latest scheme asked for.
func (p *buildingPane) submit(sc model.Scheme) {
	p.sized = sc
	p.mu.Lock()
	p.pending = &sc
	start := !p.busy
	p.busy = true
	p.mu.Unlock()
	if start {
		go p.work()
	}
}

// buildingOut is one sized building with its drawings.
type buildingOut struct {
	key        string
	s          *model.Schedule
	plan, elev image.Image
	err        error
}

// work sizes the latest pending scheme until none is left.
func (p *buildingPane) work() {
	for {
		p.mu.Lock()
		sc, size := p.pending, p.size
		p.pending = nil
		if sc == nil {
			p.busy = false
			p.mu.Unlock()
			return
		}
		p.mu.Unlock()
		out := sizeBuilding(*sc, size)
		fyne.Do(func() { p.apply(out) })
	}
}

// buildingViewSize is the drawings' size until the view has one: 10 × 7
// inches at 96 DPI.
var buildingViewSize = plots.Size{Width: 720, Height: 504, DPI: 96}

// sizeBuilding works out the schedule of sc and draws its plan and stacks.
func sizeBuilding(sc model.Scheme, size plots.Size) buildingOut {
	out := buildingOut{key: buildingKey(sc)}
	s, err := model.NewSchedule(sc)
	if err != nil {
		out.err = err
		return out
	}
	out.s = s
	fi := chart.PlanFamily(s)
	if fi < 0 {
		return out
	}
	draw := func(write func(b *bytes.Buffer) error) image.Image {
		var b bytes.Buffer
		if err := write(&b); err != nil {
			out.err = err
			return nil
		}
		img, err := png.Decode(&b)
		if err != nil {
			out.err = err
			return nil
		}
		return img
	}
	pl := chart.FloorPlan(s, fi, chart.PlanStorey(s))
	out.plan = draw(func(b *bytes.Buffer) error { return plots.WriteFloorPlan(b, plots.PNG, &pl, size) })
	el := chart.Elevation(s, fi)
	out.elev = draw(func(b *bytes.Buffer) error { return plots.WriteElevation(b, plots.PNG, &el, size) })
	return out
}

// apply shows a sized building unless a newer scheme has replaced it.
func (p *buildingPane) apply(out buildingOut) {
	if out.key != p.key {
		return
	}
	if out.err != nil {
		p.status.SetText(out.err.Error())
		return
	}
	s := out.s
	p.sched = s
	p.plan.Image = out.plan
	p.plan.Refresh()
	p.elev.Image = out.elev
	p.elev.Refresh()
	sys := units.System(s.Base.Scheme.Units)
	var names []string
	for _, f := range s.Base.Families {
		names = append(names, f.Name())
	}
	fi := chart.PlanFamily(s)
	p.quiet++
	p.family.Options = names
	if fi >= 0 {
		p.family.SetSelected(names[fi])
	}
	p.quiet--
	p.totals.SetText(totalsText(s, sys))
	p.stacks.SetText(stacksText(s, fi))
	msg := fmt.Sprintf("%s: %d columns on each floor, gross floor area %s.", s.Building.String(), s.Totals[0].Columns, units.Area(s.Building.GrossFloorAreaM2(), sys))
	if b := s.Best(); b >= 0 {
		msg += fmt.Sprintf(" Best over the whole building by %s: %s.", s.Base.Scheme.Metric, s.Totals[b].Name)
	}
	p.status.SetText(msg + " " + model.Caution)
}

// totalsText lists each family's totals as a text table.
func totalsText(s *model.Schedule, sys units.System) string {
	var b strings.Builder
	fmt.Fprintf(&b, "%-24s %10s %10s %12s %10s %9s %7s\n", "Family", "Steel", "Concrete", "Timber", "kg CO2e", "Col. area", "Share")
	for _, t := range s.Totals {
		if !t.Complete {
			fmt.Fprintf(&b, "%-24s no size carries every storey\n", t.Name)
			continue
		}
		steel := "—"
		if t.SteelKg > 0 {
			steel = units.Mass(t.SteelKg, sys)
		}
		fmt.Fprintf(&b, "%-24s %10s %10s %12s %10.0f %9s %6.2f%%\n", t.Name, steel, units.Volume(t.ConcreteM3, sys, 1), units.Volume(t.TimberM3, sys, 1),
			t.CarbonKg, units.Area(t.ColumnAreaTotal, sys), 100*t.Share())
	}
	return b.String()
}

// stacksText lists the drawn family's sizes per position from the ground up.
func stacksText(s *model.Schedule, fi int) string {
	if fi < 0 {
		return ""
	}
	var b strings.Builder
	fmt.Fprintf(&b, "%s, storeys from the ground up:\n", s.Base.Families[fi].Name())
	for pi := range s.Positions {
		ps := &s.Positions[pi]
		fmt.Fprintf(&b, "%s (%d):\n", ps.Position, ps.Count)
		st := ps.Best[fi]
		for k := 0; k < len(st); {
			j := k
			for j+1 < len(st) && st[j+1].Index == st[k].Index {
				j++
			}
			name := "no size works"
			if st[k].Index >= 0 {
				name = st[k].Row.Static.Designation
			}
			fmt.Fprintf(&b, "  %d–%d  %s\n", k+1, j+1, name)
			k = j + 1
		}
	}
	return b.String()
}

// addBuilding gives the scheme the default building, in round numbers of
// its units, with the floor and roof loads of its takedown when it has one.
func addBuilding(sc *model.Scheme) {
	b := model.DefaultBuilding()
	if l := sc.Load; l.Mode == model.LoadTakedown {
		b.FloorDeadKPa, b.FloorLiveKPa, b.RoofDeadKPa, b.RoofLiveKPa, b.SnowKPa = l.FloorDeadKPa, l.FloorLiveKPa, l.RoofDeadKPa, l.RoofLiveKPa, l.SnowKPa
		b.Occupancy, b.LiveReduction = l.Occupancy, l.LiveReduction
	}
	if sc.Units == model.US {
		b.BaysXMM = []float64{9144, 9144, 9144} // 30 ft
		b.BaysYMM = []float64{7620, 7620}       // 25 ft
		b.StoreysMM = []float64{4876.8, 3962.4, 3962.4, 3962.4}
	}
	sc.Building = &b
}
