package ui

import (
	"math"
	"strings"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

// A field change is one step: undo brings the length back, the Edit menu
// names the step, redo makes it again.
func TestUndoRedoOfAFieldChange(t *testing.T) {
	sc := DemoScheme()
	h := newHarness(t, sc)
	h.typeInto("length", "20 ft")
	h.ui(func() {
		assert.InDelta(t, 20*units.MMPerFoot, h.w.st.Valid.Setting.LengthMM, 1e-6)
		assert.Equal(t, `Undo: Unbraced length 20'-0.0"`, h.w.UndoLabel())
		assert.Equal(t, h.w.UndoLabel(), h.w.ed.undoItem.Label, "the Edit menu names the step")
		h.w.win.Canvas().(interface{ TypedShortcut(fyne.Shortcut) }).TypedShortcut(shortcutUndo)
		assert.InDelta(t, sc.Setting.LengthMM, h.w.st.Valid.Setting.LengthMM, 1e-6, "Ctrl+Z undoes it")
		assert.Equal(t, units.Length(sc.Setting.LengthMM, units.US), h.w.field("length").entry.Text)
		assert.Equal(t, `Redo: Unbraced length 20'-0.0"`, h.w.RedoLabel())
		h.w.win.Canvas().(interface{ TypedShortcut(fyne.Shortcut) }).TypedShortcut(shortcutRedoY)
		assert.InDelta(t, 20*units.MMPerFoot, h.w.st.Valid.Setting.LengthMM, 1e-6, "Ctrl+Y redoes it")
	})
	h.settle()
	h.ui(func() {
		assert.InDelta(t, 20*units.MMPerFoot, h.w.snap.Result.Setting.LengthMM, 1e-6, "the redone length is evaluated")
	})
}

// Typing "50m" one key at a time never evaluates 5 m: nothing is applied
// until the field is committed, and 50 m is then refused with its range.
func TestTypingFiftyMetresNeverEvaluatesFive(t *testing.T) {
	h := newHarness(t, DemoScheme())
	var seen []float64
	h.ui(func() { h.w.onApplied = func(s *Snapshot) { seen = append(seen, s.Result.Setting.LengthMM) } })
	for _, k := range "50m" {
		h.ui(func() { test.Type(h.w.field("length").entry, string(k)) })
		h.settle()
	}
	h.ui(func() {
		h.w.field("length").entry.SetText("")
		test.Type(h.w.field("length").entry, "50m")
		h.w.field("length").entry.commit()
	})
	h.settle()
	h.ui(func() {
		for _, mm := range seen {
			assert.False(t, mm > 4999 && mm < 5001, "5 m was evaluated while 50m was typed")
		}
		assert.Contains(t, h.w.status.BannerText(), "is not accepted", "50 m is beyond the accepted range")
	})
	// A length that is accepted is applied once committed, never its prefix.
	seen = nil
	h.typeInto("length", "15m")
	h.ui(func() {
		for _, mm := range seen {
			assert.False(t, mm > 999 && mm < 1001, "1 m was evaluated while 15m was typed")
		}
		assert.InDelta(t, 15000, h.w.st.Valid.Setting.LengthMM, 1e-6)
	})
}

// A bare number takes the field's shown unit and is then shown with it.
func TestBareNumberTakesTheShownUnit(t *testing.T) {
	sc := DemoScheme()
	sc.Units = model.SI
	h := newHarness(t, sc)
	h.typeInto("length", "6")
	h.ui(func() {
		assert.InDelta(t, 6000, h.w.st.Valid.Setting.LengthMM, 1e-6, "6 in an SI length field is 6 m")
		assert.True(t, strings.HasSuffix(h.w.field("length").entry.Text, " m"), h.w.field("length").entry.Text)
	})
}

// A slider drag of many steps is one undo step.
func TestUndoOfASliderDrag(t *testing.T) {
	sc := DemoScheme()
	h := newHarness(t, sc)
	h.layOut()
	var dragged float64
	h.ui(func() {
		w := h.w.chart.slider.Size().Width
		require.Greater(t, w, float32(100), "the slider is laid out")
		for _, f := range []float32{0.3, 0.4, 0.5, 0.6} {
			h.w.chart.slider.Dragged(&fyne.DragEvent{PointEvent: fyne.PointEvent{Position: fyne.NewPos(f*w, 5)}})
		}
		h.w.chart.slider.DragEnd()
		dragged = h.w.st.Valid.Setting.LengthMM
		assert.NotEqual(t, sc.Setting.LengthMM, dragged, "the drag moved the length")
		inches := dragged / units.MMPerInch
		assert.InDelta(t, math.Round(inches), inches, 1e-6, "the drag snaps to a whole inch")
		assert.Len(t, h.w.ed.hist.undo, 1, "the drag is one step")
		h.w.Undo()
		assert.InDelta(t, sc.Setting.LengthMM, h.w.st.Valid.Setting.LengthMM, 1e-6)
		h.w.Redo()
		assert.InDelta(t, dragged, h.w.st.Valid.Setting.LengthMM, 1e-6)
	})
	h.settle()
}

// A map click moves the length and the load as one undoable step, and says
// what it changed.
func TestUndoOfAMapClick(t *testing.T) {
	sc := DemoScheme()
	h := newHarness(t, sc)
	h.ui(func() {
		h.w.moveMapPoint(6000, 1500e3, model.MapLoad)
		assert.InDelta(t, 6000, h.w.st.Valid.Setting.LengthMM, 1e-6)
		assert.Contains(t, h.w.status.Notice(), "Map click set", "the status bar says what the click changed")
		assert.Contains(t, h.w.UndoLabel(), "map point")
		h.w.Undo()
		assert.InDelta(t, sc.Setting.LengthMM, h.w.st.Valid.Setting.LengthMM, 1e-6)
		assert.InDelta(t, sc.Load.DirectN, h.w.st.Valid.Load.DirectN, 1e-6)
		assert.Contains(t, h.w.status.Notice(), "Undone: map point")
	})
	h.settle()
}

// A new scheme carries no demo name, and an edited demo drops its name.
func TestNewSchemeCarriesNoDemoName(t *testing.T) {
	demo := DemoScheme()
	h := newHarness(t, demo)
	h.ui(func() {
		h.w.NewScheme()
		assert.NotContains(t, h.w.st.Draft.Name, "Demo")
		assert.Equal(t, model.DefaultScheme().Setting, h.w.st.Valid.Setting, "every input at its default")
		assert.NotContains(t, h.w.win.Title(), demo.Name)
		h.w.Undo()
		assert.Equal(t, demo.Name, h.w.st.Draft.Name, "a new scheme is one undoable step")
	})
	h.settle()
	h.typeInto("length", "20 ft")
	h.ui(func() {
		assert.Equal(t, "", h.w.st.Valid.Name, "an edited demo no longer carries the demo's name")
		ex, err := h.w.exportInputs()
		require.NoError(t, err)
		assert.NotEqual(t, demo.Name, ex.sc.Name)
	})
}

// The banner floats over the chart: showing and clearing it moves nothing.
func TestBannerLeavesNoBand(t *testing.T) {
	h := newHarnessAt(t, DemoScheme(), fyne.NewSize(1366, 768))
	h.layOut()
	var before fyne.Position
	var size fyne.Size
	h.ui(func() {
		before = fyne.CurrentApp().Driver().AbsolutePositionForObject(h.w.panes.main)
		size = h.w.panes.main.Size()
	})
	h.typeInto("K", "abc")
	h.ui(func() {
		require.NotEmpty(t, h.w.status.BannerText())
		h.w.win.Content().Refresh()
		assert.Equal(t, before, fyne.CurrentApp().Driver().AbsolutePositionForObject(h.w.panes.main), "the banner moves nothing")
	})
	h.typeInto("K", "")
	h.ui(func() {
		require.Empty(t, h.w.status.BannerText())
		h.w.win.Content().Refresh()
		assert.Equal(t, before, fyne.CurrentApp().Driver().AbsolutePositionForObject(h.w.panes.main))
		assert.Equal(t, size, h.w.panes.main.Size(), "no band is left")
	})
}

// An SI force in the load takedown reads in kN (common practice).
func TestSIForcesReadInKilonewtons(t *testing.T) {
	s := model.Step{Quantity: "P", Value: 1013000, Unit: "N"}
	assert.Equal(t, "kN", stepText(s, 2, units.SI))
	assert.Equal(t, "1013", stepText(s, 1, units.SI), "1,013,000 N is 1,013 kN")
}

// The keyboard help gives the length steps in the shown unit.
func TestKeyHelpSaysTheShownUnit(t *testing.T) {
	assert.Contains(t, keyHelp(units.SI), "by 50 mm")
	assert.Contains(t, keyHelp(units.US), "by 1 in")
	assert.Contains(t, keyHelp(units.US), "Ctrl+Z")
}

// A desktop driver sends Ctrl+Z and Ctrl+Y as the standard undo and redo
// shortcuts, to the focused widget when it takes shortcuts: with nothing
// focused, and with a field focused whose text is committed, they undo and
// redo the scheme; while typed text waits, Ctrl+Z undoes the typing.
func TestStandardUndoShortcutsReachTheScheme(t *testing.T) {
	sc := DemoScheme()
	h := newHarness(t, sc)
	h.typeInto("length", "20 ft")
	h.ui(func() {
		c := h.w.win.Canvas()
		c.Unfocus()
		c.(interface{ TypedShortcut(fyne.Shortcut) }).TypedShortcut(&fyne.ShortcutUndo{})
		assert.InDelta(t, sc.Setting.LengthMM, h.w.st.Valid.Setting.LengthMM, 1e-6, "Ctrl+Z with nothing focused")
		c.(interface{ TypedShortcut(fyne.Shortcut) }).TypedShortcut(&fyne.ShortcutRedo{})
		assert.InDelta(t, 20*units.MMPerFoot, h.w.st.Valid.Setting.LengthMM, 1e-6, "Ctrl+Y with nothing focused")

		e := h.w.field("length").entry
		c.Focus(e)
		e.TypedShortcut(&fyne.ShortcutUndo{})
		assert.InDelta(t, sc.Setting.LengthMM, h.w.st.Valid.Setting.LengthMM, 1e-6, "Ctrl+Z in a field whose text is committed undoes the step")
		assert.Equal(t, units.Length(sc.Setting.LengthMM, units.US), e.Text, "the focused field shows the length undone")
		e.TypedShortcut(&fyne.ShortcutRedo{})
		assert.InDelta(t, 20*units.MMPerFoot, h.w.st.Valid.Setting.LengthMM, 1e-6, "Ctrl+Y in it redoes it")

		test.Type(e, "5")
		require.True(t, e.Pending())
		steps := len(h.w.ed.hist.undo)
		e.TypedShortcut(&fyne.ShortcutUndo{})
		assert.Equal(t, steps, len(h.w.ed.hist.undo), "with typing pending, Ctrl+Z is the field's own")
		assert.InDelta(t, 20*units.MMPerFoot, h.w.st.Valid.Setting.LengthMM, 1e-6)
	})
}
