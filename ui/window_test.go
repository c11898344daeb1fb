package ui

import (
	"context"
	"math"
	"regexp"
	"strings"
	"testing"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/test"
	"fyne.io/fyne/v2/widget"
	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/cli"
	"upright/ui/model"
	"upright/ui/units"
)

// expectedBest evaluates sc at a length with the model directly and returns
// each family's answer as the table should show it: the best working size,
// or the closest failing one when none works.
func expectedBest(t *testing.T, sc model.Scheme, lengthMM float64) map[string]string {
	m, err := model.New(sc)
	require.NoError(t, err)
	res, err := m.Evaluate(context.Background(), m.Scheme.Setting.AtLength(lengthMM))
	require.NoError(t, err)
	out := map[string]string{}
	for _, fr := range res.Families {
		if len(fr.Rows) > 0 {
			out[m.Families[fr.Family].Name()] = fr.Rows[0].Static.Designation
		}
	}
	return out
}

func TestDemoSchemeOpensAndValidates(t *testing.T) {
	sc := DemoScheme()
	require.NoError(t, sc.Validate())
	h := newHarness(t, sc)
	h.ui(func() {
		assert.Equal(t, "Upright — "+sc.Name, h.w.win.Title())
		assert.Equal(t, "", h.w.status.BannerText())
		assert.NotEmpty(t, h.w.results.rows, "the table shows the demo's answers")
		assert.NotNil(t, h.w.chart.front, "a chart was drawn")
	})
}

func TestTypingALengthUpdatesTheTable(t *testing.T) {
	sc := DemoScheme()
	h := newHarness(t, sc)
	for _, tc := range []struct {
		typed string
		mm    float64
	}{
		{`9'-6"`, 9.5 * units.MMPerFoot},
		{"30 ft", 30 * units.MMPerFoot},
		{"22", 22 * units.MMPerFoot}, // a bare number is taken in the unit shown (ft)
	} {
		h.typeInto("length", tc.typed)
		want := expectedBest(t, sc, tc.mm)
		for fam, des := range want {
			assert.Equal(t, des, h.sizeOf(fam), "%s at %s", fam, tc.typed)
		}
		h.ui(func() {
			assert.InDelta(t, tc.mm, h.w.snap.Result.Setting.LengthMM, 1e-6)
			assert.InDelta(t, toDisplay(tc.mm, units.US), h.w.chart.slider.Value, 1e-9, "the slider follows the typed length")
			assert.Contains(t, h.w.results.tableNote.Text, units.Length(tc.mm, units.US))
		})
		// The column weight follows the length: weight per foot times the length.
		r := h.rowOf(h.w.results.ctx.m.Families[0].Name())
		require.GreaterOrEqual(t, r, 0)
		var perM float64
		h.ui(func() { perM = h.w.results.rows[r].Static.MassKgPerM })
		var L float64
		h.ui(func() { L = h.w.results.ctx.length })
		assert.InDelta(t, tc.mm, L, 1e-9)
		assert.Equal(t, num(perM*L/1000/units.KgPerLb, 0), h.cell(r, "column-weight"), "row %d, %g kg/m", r, perM)
	}
}

func TestSliderAcrossACrossoverChangesTheAnswer(t *testing.T) {
	sc := DemoScheme()
	h := newHarness(t, sc)
	m, err := model.New(sc)
	require.NoError(t, err)
	var rng model.Range
	h.ui(func() { rng = h.w.st.Range })
	xs, err := m.Crossovers(context.Background(), m.Scheme.Setting, rng, nil)
	require.NoError(t, err)
	// The first size step within a family that hands over to another size.
	var x *model.Crossover
	for i := range xs {
		if xs[i].Kind == model.KindSize && xs[i].To != "" && xs[i].LengthMM > rng.FromMM+20 {
			x = &xs[i]
			break
		}
	}
	require.NotNil(t, x, "the demo scheme has a size step in range")
	h.setSlider(x.LengthMM - 10)
	assert.Equal(t, x.From, h.sizeOf(x.Family), "10 mm before the crossover at %.0f mm", x.LengthMM)
	h.setSlider(x.LengthMM + 10)
	assert.Equal(t, x.To, h.sizeOf(x.Family), "10 mm after the crossover at %.0f mm", x.LengthMM)

	// The window found the same crossover and choosing it moves the slider there.
	var listed []model.Crossover
	h.ui(func() {
		h.w.xsp.allCheck.SetChecked(true)
		listed = append(listed, h.w.xsp.list...)
	})
	k := -1
	for i, y := range listed {
		if assert.ObjectsAreEqual(y, *x) {
			k = i
		}
	}
	require.GreaterOrEqual(t, k, 0, "the list holds the crossover")
	h.ui(func() { h.w.xsp.view.Select(k) })
	h.settle()
	h.ui(func() {
		assert.InDelta(t, x.LengthMM, h.w.st.Valid.Setting.LengthMM, 1e-6)
		assert.InDelta(t, toDisplay(x.LengthMM, units.US), h.w.chart.slider.Value, 1e-9)
	})
	assert.Equal(t, x.From, h.sizeOf(x.Family), "at the crossover the first answer still holds")
}

func TestDraggingTheSliderMovesMarkerAndTable(t *testing.T) {
	h := newHarness(t, DemoScheme())
	var before float64
	var x0 float32
	h.ui(func() {
		before = h.w.st.Valid.Setting.LengthMM
		x0 = h.w.chart.markerLine.Position1.X
		s := h.w.chart.slider
		s.Resize(fyne.NewSize(600, s.MinSize().Height))
		// Drag to three quarters of the way along.
		s.Dragged(&fyne.DragEvent{PointEvent: fyne.PointEvent{Position: fyne.NewPos(450, 5)}})
		s.DragEnd()
	})
	h.settle()
	h.ui(func() {
		after := h.w.st.Valid.Setting.LengthMM
		assert.Greater(t, after, before, "the drag moved the length")
		assert.InDelta(t, after, h.w.snap.Result.Setting.LengthMM, 1e-9, "the table is at the dragged length")
		assert.Equal(t, units.Length(after, units.US), h.w.field("length").entry.Text)
		assert.True(t, h.w.chart.markerLine.Visible())
		assert.Greater(t, h.w.chart.markerLine.Position1.X, x0, "the marker moved right")
		assert.Equal(t, units.Length(after, units.US), h.w.chart.markerText.Text)
	})
}

func TestArrowKeysStepTheSlider(t *testing.T) {
	h := newHarness(t, DemoScheme())
	var v0 float64
	h.ui(func() {
		v0 = h.w.chart.slider.Value
		h.w.chart.slider.TypedKey(&fyne.KeyEvent{Name: fyne.KeyRight})
		h.w.chart.slider.TypedKey(&fyne.KeyEvent{Name: fyne.KeyRight})
		h.w.chart.slider.TypedKey(&fyne.KeyEvent{Name: fyne.KeyPageUp})
	})
	h.settle()
	h.ui(func() {
		// Two fine steps of 1 in and one coarse step of 1 ft.
		assert.InDelta(t, v0+2.0/12+1, h.w.chart.slider.Value, 1e-9)
		assert.InDelta(t, fromDisplay(v0+2.0/12+1, units.US), h.w.snap.Result.Setting.LengthMM, 1e-6)
	})
}

func TestInvalidInputKeepsTheLastValidResult(t *testing.T) {
	h := newHarness(t, DemoScheme())
	var gen uint64
	var rows []string
	h.ui(func() {
		gen = h.w.appliedGen
		for i := range h.w.results.rows {
			rows = append(rows, h.w.results.rows[i].Static.Designation)
		}
	})
	cases := []struct {
		field, typed, label string
		says                []string
	}{
		{"K", "abc", "Typed K", []string{`"abc" is not read as a number`, "a plain number"}},
		{"K", "0.2", "Typed K", []string{`"0.2" is not accepted`, "from 0.5 to 10"}},
		{"length", "14 furlongs", "Unbraced length", []string{`"14 furlongs" is not read as a length`, units.LengthForms}},
		{"length", "400 ft", "Unbraced length", []string{`"400 ft" is not accepted`, "from 0.3 m (1 ft) to 30 m (98 ft)"}},
		{"dead", "-5 psf", "Floor dead load", []string{`"-5 psf" is not accepted`, "from 0 to 50 kPa"}},
		{"tributary", "lots", "Tributary area per floor", []string{`"lots" is not read as an area`, units.AreaForms}},
	}
	for _, c := range cases {
		// Pasted in one go, so no half-typed text makes a valid scheme on the way.
		h.ui(func() { e := h.w.field(c.field).entry; e.SetText(c.typed); e.commit() })
		h.settle()
		h.ui(func() {
			f := h.w.field(c.field)
			assert.True(t, f.err.Visible(), "%s %q shows its message", c.field, c.typed)
			for _, s := range c.says {
				assert.Contains(t, f.err.Text, s, "%s %q", c.field, c.typed)
			}
			b := h.w.status.BannerText()
			assert.Contains(t, b, "Showing the last valid result: fix "+c.label, "%s %q", c.field, c.typed)
			// The result on screen is the last valid one.
			assert.Equal(t, gen, h.w.appliedGen, "no new result while invalid")
			var now []string
			for i := range h.w.results.rows {
				now = append(now, h.w.results.rows[i].Static.Designation)
			}
			assert.Equal(t, rows, now)
		})
		// Fixing the field clears the message and the banner.
		var good string
		h.ui(func() { good = specByID(c.field).format(specByID(c.field).get(&h.w.st.Valid), units.US) })
		h.typeInto(c.field, good)
		h.ui(func() {
			assert.False(t, h.w.field(c.field).err.Visible(), "%s fixed", c.field)
			assert.Equal(t, "", h.w.status.BannerText())
			gen = h.w.appliedGen
		})
	}
}

func TestTypingKeepsTheLastValidStateOnScreen(t *testing.T) {
	sc := DemoScheme()
	h := newHarness(t, sc)
	// Typed key by key, "12 furlongs" passes through valid lengths (1 ft,
	// 12 ft) before it stops parsing; nothing is applied until the field is
	// committed, and then it does not parse: the result on screen stays the
	// scheme's own.
	h.typeInto("length", "12 furlongs")
	want := expectedBest(t, sc, sc.Setting.LengthMM)
	for fam, des := range want {
		assert.Equal(t, des, h.sizeOf(fam), fam)
	}
	h.ui(func() {
		assert.InDelta(t, sc.Setting.LengthMM, h.w.snap.Result.Setting.LengthMM, 1e-6)
		assert.Contains(t, h.w.status.BannerText(), "Showing the last valid result: fix Unbraced length")
	})
}

func TestSliderStillWorksWhileAFieldIsInvalid(t *testing.T) {
	h := newHarness(t, DemoScheme())
	h.typeInto("K", "abc")
	h.setSlider(10 * units.MMPerFoot)
	h.ui(func() {
		assert.InDelta(t, 10*units.MMPerFoot, h.w.snap.Result.Setting.LengthMM, 1e-6, "the last valid scheme moves with the slider")
		assert.Contains(t, h.w.status.BannerText(), "fix Typed K")
	})
}

// usTokens and siTokens are unit words that must not appear once the other system is chosen.
var (
	usTokens = regexp.MustCompile(`\b(kip|kips|ft|lb|psf|ksi|psi|in)\b|in²|ft²|\d'|lb/ft`)
	siTokens = regexp.MustCompile(`\b(kN|kg|kPa|MPa|mm|m)\b|m²|kg/m`)
)

// shownTexts collects every value the window shows: entries, table headers
// and cells, the notes, the crossover list, the marker, the trace.
func (h *harness) shownTexts() []string {
	var out []string
	h.ui(func() {
		w := h.w
		for _, fs := range []*fieldSet{w.inputs.fs, w.chart.fs} {
			for _, f := range fs.byID {
				if w.st.active(f.spec.id) || f.spec.id == "weak-axis length" {
					out = append(out, f.entry.Text)
				}
			}
		}
		for c := range columns {
			out = append(out, w.results.headerText(c))
		}
		l := widget.NewLabel("")
		for r := range w.results.rows {
			for c := range columns {
				if columns[c].id == "family" || columns[c].id == "size" || columns[c].id == "governs" {
					continue // names, not quantities (designations such as 14x14 in say "in")
				}
				w.results.updateCell(widget.TableCellID{Row: r, Col: c}, l)
				out = append(out, l.Text)
			}
		}
		out = append(out, w.chart.rangeLabel.Text, w.inputs.load.summary.Text, w.chart.markerText.Text)
		note := w.results.tableNote.Text
		if i := strings.Index(note, " · best overall"); i >= 0 {
			note = note[:i] // the rest names a candidate
		}
		out = append(out, note)
		for _, x := range w.xsp.list {
			out = append(out, units.Length(x.LengthMM, w.sys()))
		}
		for _, s := range w.calc.stepRows {
			_, u := units.Convert(s.Value, s.Unit, w.results.ctx.sys)
			out = append(out, u)
		}
	})
	return out
}

func TestUnitSwitchConvertsEveryShownValue(t *testing.T) {
	h := newHarness(t, DemoScheme())
	h.ui(func() { h.w.Select(h.w.results.rows[0].Static.Designation) })
	h.settle()
	var usCap string
	var capN float64
	h.ui(func() { capN = h.w.results.rows[0].CapacityN })
	usCap = h.cell(0, "capacity")
	assert.Equal(t, num(capN/units.NPerKip, 0), usCap)
	for _, s := range h.shownTexts() {
		if strings.Contains(s, "CO₂e") {
			continue // embodied carbon is kg CO₂e in both systems
		}
		assert.False(t, siTokens.MatchString(s) && !usTokens.MatchString(s), "US display shows an SI value: %q", s)
	}

	h.ui(func() { h.w.inputs.unitsRadio.SetSelected("SI") })
	h.settle()
	var length float64
	h.ui(func() {
		length = h.w.st.Valid.Setting.LengthMM
		assert.Equal(t, model.SI, h.w.snap.Model.Scheme.Units)
		assert.Equal(t, trim(length/1000, 3)+" m", h.w.field("length").entry.Text)
		assert.InDelta(t, length/1000, h.w.chart.slider.Value, 1e-9, "the slider is in metres")
		assert.InDelta(t, 18*units.MMPerFoot, length, 1e-6, "switching units does not move the length")
	})
	assert.Equal(t, num(capN/1000, 0), h.cell(0, "capacity"), "capacity in kN")
	for _, s := range h.shownTexts() {
		assert.False(t, usTokens.MatchString(s), "SI display still shows a US value: %q", s)
	}
	// And back again, with the inputs unchanged.
	h.ui(func() { h.w.inputs.unitsRadio.SetSelected("US") })
	h.settle()
	assert.Equal(t, usCap, h.cell(0, "capacity"))
	h.ui(func() { assert.Equal(t, `18'-0.0"`, h.w.field("length").entry.Text) })
}

func TestSortingByAColumn(t *testing.T) {
	h := newHarness(t, DemoScheme())
	col := columnIndex("weight")
	h.ui(func() { h.w.results.SortBy(col) })
	h.ui(func() {
		for i := 1; i < len(h.w.results.rows); i++ {
			assert.LessOrEqual(t, h.w.results.rows[i-1].Static.MassKgPerM, h.w.results.rows[i].Static.MassKgPerM)
		}
		assert.True(t, strings.HasSuffix(h.w.results.headerText(col), "▲"))
		h.w.results.SortBy(col)
		for i := 1; i < len(h.w.results.rows); i++ {
			assert.GreaterOrEqual(t, h.w.results.rows[i-1].Static.MassKgPerM, h.w.results.rows[i].Static.MassKgPerM)
		}
		assert.True(t, strings.HasSuffix(h.w.results.headerText(col), "▼"))
		// Clicking the header sorts too.
		hdr := h.w.results.table.CreateHeader()
		h.w.results.table.UpdateHeader(widget.TableCellID{Row: -1, Col: h.w.results.tableColOf("util")}, hdr)
		test.Tap(hdr.(*container.ThemeOverride).Content.(*widget.Button))
		assert.Equal(t, columnIndex("util"), h.w.results.sortCol)
		for i := 1; i < len(h.w.results.rows); i++ {
			assert.LessOrEqual(t, h.w.results.rows[i-1].Util, h.w.results.rows[i].Util)
		}
	})
}

func TestShowEveryWorkingSize(t *testing.T) {
	h := newHarness(t, DemoScheme())
	var best int
	h.ui(func() {
		best = len(h.w.results.rows)
		h.w.results.showAllChk.SetChecked(true)
		assert.Greater(t, len(h.w.results.rows), best)
		fams := map[int]bool{}
		for _, r := range h.w.results.rows {
			fams[r.Family] = true
			if h.w.snap.Result.Families[r.Family].Working > 0 {
				assert.True(t, r.OK, "%s listed as working", r.Static.Designation)
			}
		}
		assert.Len(t, fams, best, "every family still appears")
	})
}

func TestFailingRowsReadAsFailingWithoutColour(t *testing.T) {
	h := newHarness(t, DemoScheme())
	h.setSlider(h.w.st.Range.ToMM)
	found := false
	h.ui(func() {
		for i, r := range h.w.results.rows {
			l := widget.NewLabel("")
			h.w.results.updateCell(widget.TableCellID{Row: i, Col: columnIndex("status")}, l)
			if r.OK {
				assert.Equal(t, StatusWorks, l.Text)
				continue
			}
			found = true
			assert.True(t, strings.HasPrefix(l.Text, "✗"), "failing row marked by symbol and word: %q", l.Text)
			assert.Equal(t, widget.DangerImportance, l.Importance)
		}
	})
	if !found {
		t.Skip("every family still works at the top of the range; nothing to check")
	}
}

func TestSelectingARowShowsItsTraceAndPinAddsItsCurve(t *testing.T) {
	h := newHarness(t, DemoScheme())
	var des string
	h.ui(func() {
		des = h.w.results.rows[1].Static.Designation
		h.w.results.table.Select(widget.TableCellID{Row: 1, Col: 2})
	})
	h.settle()
	h.ui(func() {
		assert.Equal(t, des, h.w.picks.selected)
		assert.Contains(t, h.w.calc.title.Text, des)
		assert.NotEmpty(t, h.w.calc.plain.Text, "the plain sentence")
		assert.NotEmpty(t, h.w.calc.stepRows, "the trace")
		assert.True(t, h.w.calc.pinButton.Visible() && !h.w.calc.pinButton.Disabled())
	})
	// The trace's values are converted for US display.
	h.ui(func() {
		for _, s := range h.w.calc.stepRows {
			_, u := units.Convert(s.Value, s.Unit, units.US)
			assert.NotContains(t, []string{"mm", "MPa", "kN", "N", "mm2", "mm4"}, u, "step %s left in SI", s.Quantity)
		}
	})
	renders := h.w.eng.Renders()
	h.ui(func() { test.Tap(h.w.calc.pinButton) })
	h.settle()
	h.ui(func() {
		assert.Equal(t, []string{des}, h.w.picks.pinned)
		assert.Equal(t, "Unpin from chart", h.w.calc.pinButton.Text)
	})
	assert.Greater(t, h.w.eng.Renders(), renders, "pinning redraws the chart")
	r := -1
	h.ui(func() {
		for i := range h.w.results.rows {
			if h.w.results.rows[i].Static.Designation == des {
				r = i
			}
		}
	})
	require.GreaterOrEqual(t, r, 0)
	assert.Equal(t, "◆ "+des, h.cell(r, "size"), "the table marks the pinned row")
}

func TestEndConditionSketchesChooseTheEnds(t *testing.T) {
	h := newHarness(t, DemoScheme())
	for _, sp := range endSketchSpecs {
		h.ui(func() { test.Tap(h.w.inputs.sketches[sp.ends]) })
		h.settle()
		h.ui(func() {
			assert.Equal(t, sp.ends, h.w.snap.Model.Scheme.Setting.Ends)
			for e, s := range h.w.inputs.sketches {
				assert.Equal(t, e == sp.ends, s.Selected, "%s shown as chosen", e)
			}
		})
	}
	// The keyboard chooses too.
	h.ui(func() { h.w.inputs.sketches[model.FixedFree].TypedRune(' ') })
	h.settle()
	h.ui(func() { assert.Equal(t, model.FixedFree, h.w.st.Valid.Setting.Ends) })
}

func TestTakedownAndTypedLoad(t *testing.T) {
	h := newHarness(t, DemoScheme())
	var takedown float64
	h.ui(func() {
		takedown = h.w.snap.Model.Loads.DemandN
		assert.Contains(t, h.w.inputs.load.summary.Text, "ASCE 7-22")
		h.w.inputs.load.mode.SetSelected("Typed axial load")
	})
	h.typeInto("load", "250 kip")
	h.ui(func() {
		assert.Equal(t, model.LoadDirect, h.w.snap.Model.Scheme.Load.Mode)
		assert.InDelta(t, 250*units.NPerKip, h.w.snap.Model.Loads.DemandN, 1e-6)
		assert.NotEqual(t, takedown, h.w.snap.Model.Loads.DemandN)
		assert.Contains(t, h.w.inputs.load.summary.Text, "250 kip")
	})
}

func TestMaterialSwitches(t *testing.T) {
	h := newHarness(t, DemoScheme())
	mats := model.Materials()
	if len(mats) < 2 {
		t.Skip("needs two materials to switch one off")
	}
	h.ui(func() { h.w.inputs.matChecks[mats[0]].SetChecked(false) })
	h.settle()
	h.ui(func() {
		for _, r := range h.w.results.rows {
			assert.NotEqual(t, mats[0], h.w.snap.Model.Families[r.Family].Material())
		}
		for _, m := range mats[1:] {
			h.w.inputs.matChecks[m].SetChecked(false)
		}
		assert.Contains(t, h.w.status.BannerText(), "fix Materials")
		assert.True(t, h.w.inputs.matProblem.Visible())
		h.w.inputs.matChecks[mats[0]].SetChecked(true)
		assert.Equal(t, "", h.w.status.BannerText())
	})
}

func TestFileActionsSayNotAvailableUntilHooked(t *testing.T) {
	open, save, export := OpenHook, SaveHook, ExportHook
	OpenHook, SaveHook, ExportHook = nil, nil, nil
	defer func() { OpenHook, SaveHook, ExportHook = open, save, export }()
	h := newHarness(t, DemoScheme())
	h.ui(func() {
		n := 0
		for _, it := range h.w.win.MainMenu().Items[0].Items {
			if it.Shortcut == shortcutOpen || it.Shortcut == shortcutSave || it.Shortcut == shortcutExport {
				assert.Contains(t, it.Label, "not available")
				assert.True(t, it.Disabled)
				n++
			}
		}
		assert.Equal(t, 3, n, "open, save and export are in the File menu")
		c := h.w.win.Canvas()
		c.(interface{ TypedShortcut(fyne.Shortcut) }).TypedShortcut(shortcutSave)
		require.NotEmpty(t, c.Overlays().List(), "Ctrl+S says it is not available")
		c.Overlays().Top().Hide()
		c.Overlays().Remove(c.Overlays().Top())
	})
	var saved model.Scheme
	SaveHook = func(_ fyne.Window, sc model.Scheme) { saved = sc }
	h.ui(func() {
		h.w.win.Canvas().(interface{ TypedShortcut(fyne.Shortcut) }).TypedShortcut(shortcutSave)
		assert.Equal(t, h.w.st.Valid.Name, saved.Name, "with the hook set, Ctrl+S hands it the scheme")
	})
}

func TestSchemeAndSizeComeBackThroughPreferences(t *testing.T) {
	a := test.NewTempApp(t)
	p := a.Preferences()
	sc, err := savedScheme(p)
	require.NoError(t, err)
	assert.Equal(t, DemoScheme().Name, sc.Name, "first start opens the demo")
	sc.Name = "Quay Street market hall"
	sc.Setting = sc.Setting.AtLength(7100)
	sc.Units = model.SI
	storeScheme(p, sc)
	storeSize(p, fyne.NewSize(1200, 800))
	back, err := savedScheme(p)
	require.NoError(t, err)
	assert.Equal(t, sc.Name, back.Name)
	assert.InDelta(t, 7100, back.Setting.LengthMM, 1e-9)
	assert.Equal(t, model.SI, back.Units)
	assert.Equal(t, fyne.NewSize(1200, 800), savedSize(p, fyne.Size{}))
	// A stored scheme that no longer validates falls back to the demo, saying why.
	p.SetString(prefScheme, `{"Setting":{"LengthMM":-4}}`)
	back, err = savedScheme(p)
	assert.Error(t, err)
	assert.Equal(t, DemoScheme().Name, back.Name)
}

func TestTheWindowStoresTheSchemeOnceTheInputsRest(t *testing.T) {
	h := newHarness(t, DemoScheme())
	h.typeInto("length", "23 ft")
	require.Eventually(t, func() bool {
		var got model.Scheme
		var err error
		h.ui(func() { got, err = savedScheme(h.w.app.Preferences()) })
		return err == nil && math.Abs(got.Setting.LengthMM-23*units.MMPerFoot) < 1
	}, 5*time.Second, 50*time.Millisecond, "the typed length reaches the preferences")
}

func TestProblemsNameTheField(t *testing.T) {
	st := NewState(DemoScheme())
	st.SetText("weak-axis length", "30 ft")
	assert.Empty(t, st.Problems(), "the weak-axis length is ignored until braced")
	assert.Equal(t, st.Valid.Setting.LengthMM, st.Valid.Setting.WeakMM)
	out := st.SetWeakBraced(true)
	assert.False(t, out.Submit)
	p := st.Problems()
	require.Len(t, p, 1)
	assert.Equal(t, "weak-axis length", p[0].Field)
	assert.Contains(t, p[0].Msg, "no longer than the unbraced length")
	out = st.SetText("weak-axis length", "9 ft")
	assert.True(t, out.Submit && out.Rebuild)
	assert.InDelta(t, 0.5, st.Valid.Setting.WeakMM/st.Valid.Setting.LengthMM, 1e-3)
	// The slider keeps the brace at its fraction of the height.
	out = st.SetLength(24 * units.MMPerFoot)
	assert.True(t, out.Submit)
	assert.False(t, out.Rebuild)
	assert.InDelta(t, 12*units.MMPerFoot, st.Valid.Setting.WeakMM, 1e-6)
	assert.Equal(t, `12'-0.0"`, st.Text("weak-axis length"))
}

func TestFieldParsing(t *testing.T) {
	for _, c := range []struct {
		id, text string
		sys      units.System
		want     float64 // SI
		ok       bool
	}{
		{"length", `14'-6"`, units.US, 14.5 * units.MMPerFoot, true}, // ft-in form of units.LengthForms
		{"length", "4.2m", units.US, 4200, true},
		{"length", "14", units.US, 14 * units.MMPerFoot, true}, // bare number in the unit shown
		{"length", "4.2", units.SI, 4200, true},
		{"length", "fourteen", units.US, 0, false},
		{"load", "1,800 kN", units.US, 1800e3, true},
		{"load", "400", units.US, 400 * units.NPerKip, true},
		{"dead", "80", units.US, 80 * units.KPaPerPsf, true},
		{"tributary", "650 sf", units.US, 650 * units.M2PerFt2, true},
		{"f'c", "5000", units.US, 5 * units.MPaPerKsi, true}, // bare ≥ 1000 is psi
		{"f'c", "5", units.US, 5 * units.MPaPerKsi, true},    // bare below 1000 is ksi
		{"f'c", "", units.US, 0, true},                       // blank is the default
		{"steel Fy", "50", units.US, 50 * units.MPaPerKsi, true},
		{"rho-max", "4%", units.US, 0.04, true},
		{"rho-max", "3", units.US, 0.03, true},
		{"floors", "2.5", units.US, 0, false},
		{"K", "", units.US, 0, true},
		{"K", "NaN", units.US, 0, false},
		{"length", "Inf m", units.US, 0, false},
	} {
		v, err := specByID(c.id).parse(c.text, c.sys)
		if !c.ok {
			assert.Error(t, err, "%s %q", c.id, c.text)
			continue
		}
		require.NoError(t, err, "%s %q", c.id, c.text)
		assert.InDelta(t, c.want, v, 1e-6*math.Max(1, math.Abs(c.want)), "%s %q", c.id, c.text)
	}
	// What a field writes reads back to the same value within its rounding.
	for _, f := range fieldSpecs {
		for _, sys := range []units.System{units.US, units.SI} {
			v := f.get(&[]model.Scheme{DemoScheme()}[0])
			if f.blank != "" && v == f.blankOK {
				continue
			}
			back, err := f.parse(f.format(v, sys), sys)
			require.NoError(t, err, "%s %s %q", f.id, sys, f.format(v, sys))
			assert.InDelta(t, v, back, 0.005*math.Max(1, math.Abs(v)), "%s %s: within the display rounding", f.id, sys)
		}
	}
}

func TestOpenHookLoadsTheScheme(t *testing.T) {
	h := newHarness(t, DemoScheme())
	other := DemoScheme()
	other.Name = "Tannery Yard studios, gallery column"
	other.Units = model.SI
	other.Setting = other.Setting.AtLength(4200)
	open := OpenHook
	OpenHook = func(_ fyne.Window, load func(model.Scheme)) { load(other) }
	defer func() { OpenHook = open }()
	h.ui(func() { h.w.Open() })
	h.settle()
	h.ui(func() {
		assert.Equal(t, "Upright — "+other.Name, h.w.win.Title())
		assert.Equal(t, "4.2 m", h.w.field("length").entry.Text)
		assert.Equal(t, "SI", h.w.inputs.unitsRadio.Selected)
		assert.InDelta(t, 4200, h.w.snap.Result.Setting.LengthMM, 1e-9)
	})
}

func TestCautionsAndAbout(t *testing.T) {
	h := newHarness(t, DemoScheme())
	h.ui(func() {
		c := h.w.win.Canvas()
		assert.Contains(t, test.RenderObjectToMarkup(c.Content()), model.Caution, "the short caution is always on screen")
		h.w.ShowCautions()
		assert.Contains(t, test.RenderObjectToMarkup(c.Overlays().Top()), "licensed structural engineer")
		c.Overlays().Remove(c.Overlays().Top())
		h.w.ShowAbout()
		assert.Contains(t, test.RenderObjectToMarkup(c.Overlays().Top()), "Upright "+cli.Version)
		c.Overlays().Remove(c.Overlays().Top())
	})
}

func TestTabOrderRunsDownTheInputsThenToTheSlider(t *testing.T) {
	h := newHarness(t, DemoScheme())
	h.ui(func() {
		c := h.w.win.Canvas()
		var order []fyne.Focusable
		seen := map[fyne.Focusable]bool{}
		for i := 0; i < 400; i++ {
			test.FocusNext(c)
			f := c.Focused()
			if f == nil || seen[f] {
				break
			}
			seen[f] = true
			order = append(order, f)
		}
		index := func(o fyne.Focusable) int {
			for i, f := range order {
				if f == o {
					return i
				}
			}
			return -1
		}
		first := index(h.w.inputs.sketches[model.FixedFixed])
		k := index(h.w.field("K").entry)
		slider := index(h.w.chart.slider)
		length := index(h.w.field("length").entry)
		table := index(h.w.results.table.Table)
		require.True(t, first >= 0 && k >= 0 && slider >= 0 && length >= 0, "all reachable by Tab: %d %d %d %d", first, k, slider, length)
		assert.Less(t, first, k, "the end conditions come before K")
		assert.Less(t, k, slider, "the inputs come before the slider")
		assert.Equal(t, slider+1, length, "the length entry follows the slider")
		if table >= 0 {
			assert.Less(t, length, table)
		}
	})
}
