package ui

import (
	"strings"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
)

// laptop is the logical screen of a 1920×1080 laptop at 150% scaling.
var laptop = fyne.NewSize(1280, 720)

// screenSizes are the screens the layout is made for: 1280×720, a 1366×768
// screen and a 1920×1080 screen (packaging/screenshots.sh takes the same).
var screenSizes = []fyne.Size{laptop, {Width: 1366, Height: 768}, {Width: 1920, Height: 1080}}

// visibleObjects calls f for every object on screen under o: hidden objects
// and everything under them are skipped.
func visibleObjects(o fyne.CanvasObject, f func(fyne.CanvasObject)) {
	if o == nil || !o.Visible() {
		return
	}
	f(o)
	switch x := o.(type) {
	case *fyne.Container:
		for _, c := range x.Objects {
			visibleObjects(c, f)
		}
	case fyne.Widget:
		for _, c := range test.WidgetRenderer(x).Objects() {
			visibleObjects(c, f)
		}
	}
}

// cutLabels returns the texts shown on screen narrower than they need:
// one-line labels, check boxes and buttons given less width than their text.
func cutLabels(c fyne.Canvas) []string {
	cut, _ := checkTexts(c)
	return cut
}

// checkTexts is cutLabels, also returning how many texts it checked.
func checkTexts(c fyne.Canvas) (cut []string, checked int) {
	visibleObjects(c.Content(), func(o fyne.CanvasObject) {
		sz := o.Size()
		if sz.Width <= 0 || sz.Height <= 0 {
			return // not laid out: off screen (a pooled cell, a closed panel)
		}
		switch x := o.(type) {
		case *widget.Label:
			if x.Text == "" {
				return
			}
			if x.Wrapping != fyne.TextWrapOff {
				checked++
				if x.MinSize().Height > sz.Height+1 {
					cut = append(cut, x.Text) // wrapped onto more lines than it has room for
				}
				return
			}
			size := theme.TextSize()
			if x.SizeName != "" {
				size = theme.Size(x.SizeName)
			}
			need := fyne.MeasureText(x.Text, size, x.TextStyle).Width + 2*theme.InnerPadding()
			checked++
			if need > sz.Width+1 {
				cut = append(cut, x.Text)
			}
		case *widget.Check:
			if x.Text != "" && x.MinSize().Width > sz.Width+1 {
				cut = append(cut, x.Text)
			}
		case *widget.Button:
			if x.Text != "" && x.MinSize().Width > sz.Width+1 {
				cut = append(cut, x.Text)
			}
		}
	})
	return cut, checked
}

// onScreen reports whether all of o lies inside the window.
func onScreen(c fyne.Canvas, o fyne.CanvasObject) bool {
	pos := fyne.CurrentApp().Driver().AbsolutePositionForObject(o)
	sz, win := o.Size(), c.Size()
	return o.Visible() && sz.Width > 0 && sz.Height > 0 && pos.X >= 0 && pos.Y >= 0 &&
		pos.X+sz.Width <= win.Width+1 && pos.Y+sz.Height <= win.Height+1
}

func TestLaptopScreenShowsTheComparison(t *testing.T) {
	h := newHarnessAt(t, DemoScheme(), laptop)
	h.layOut()
	// Choose a row so the calculation view shows a trace too.
	h.ui(func() { h.w.Select(h.w.results.rows[0].Static.Designation) })
	h.layOut()
	h.ui(func() {
		w := h.w
		c := w.win.Canvas()
		require.Equal(t, laptop, c.Size())

		// Every shown curve can be identified: each has a key, beside its
		// row in the table (a pinned curve not in the table is listed in the
		// chart's own legend, see plots TestKeyNoteListsPinnedSeriesInsteadOfHiding).
		require.NotEmpty(t, w.results.keys, "the chart's curves have keys")
		inTable := map[string]bool{}
		for _, r := range w.results.rows {
			inTable[r.Static.Designation] = true
		}
		for des := range w.results.keys {
			assert.True(t, inTable[des] || contains(w.picks.pinned, des), "curve %s is keyed beside its table row", des)
		}
		for i, r := range w.results.rows {
			if w.snap.Result.Families[r.Family].Best() != nil && w.snap.Result.Families[r.Family].Best().Index == r.Index {
				assert.NotNil(t, w.results.keys[r.Static.Designation], "row %d (%s) carries its curve's key", i, r.Static.Designation)
			}
		}
		assert.Equal(t, -1, w.results.tableCol(0), "the key is the table's first column")

		// The table shows size, status (works or not, in words), weight,
		// plan and utilization without scrolling sideways; the capacity
		// follows when the width holds it.
		shown := w.results.ShownColumns()
		for _, id := range []string{"size", "status", "weight", "plan", "util"} {
			assert.Contains(t, shown, id)
		}
		total := float32(keyColumnWidth) + theme.Padding()
		for _, col := range w.results.fit.shown {
			total += w.results.fit.natural[col] + theme.Padding()
		}
		assert.LessOrEqual(t, total, w.results.table.Table.Size().Width, "the shown columns fit the table's width (%v)", shown)
		assert.True(t, onScreen(c, w.results.table.Table))

		// The caution and the crossover list are visible.
		assert.True(t, onScreen(c, w.status.caution), "the caution is inside the window")
		assert.GreaterOrEqual(t, w.status.caution.Size().Height, w.status.caution.MinSize().Height-1, "the caution has the height its lines need")
		assert.True(t, onScreen(c, w.xsp.view), "the crossover list is inside the window")
		require.NotEmpty(t, w.xsp.list)
		assert.GreaterOrEqual(t, w.xsp.view.Size().Height, float32(60), "the list shows at least its first crossover")

		// No label is cut off.
		cut, checked := checkTexts(c)
		assert.Empty(t, cut, "texts narrower than they need")
		assert.Greater(t, checked, 60, "the walk reached the inputs, the table cells and the list")
		t.Logf("%d labels checked", checked)
	})
}

func contains(list []string, s string) bool {
	for _, x := range list {
		if x == s {
			return true
		}
	}
	return false
}

func TestWiderScreensShowMore(t *testing.T) {
	var counts []int
	for _, size := range screenSizes {
		h := newHarnessAt(t, DemoScheme(), size)
		h.layOut()
		h.ui(func() {
			counts = append(counts, len(h.w.results.ShownColumns()))
			assert.Empty(t, cutLabels(h.w.win.Canvas()), "at %v", size)
		})
	}
	// A wider window shows more of the table, not just more margin.
	assert.Less(t, counts[0], counts[2], "columns at 1280 and 1920 wide: %v", counts)
	assert.LessOrEqual(t, counts[0], counts[1])
}

func TestTheCautionKeepsItsKeyWordsInANarrowWindow(t *testing.T) {
	h := newHarnessAt(t, DemoScheme(), minWindowSize)
	h.layOut()
	h.ui(func() {
		cw := h.w.status.caution
		for _, must := range []string{"licensed structural engineer", "local code"} {
			assert.Contains(t, cw.Text, must)
		}
		assert.Equal(t, fyne.TextTruncateOff, cw.Truncation, "never cut")
		assert.Equal(t, fyne.TextWrapWord, cw.Wrapping, "wrapped instead")
		assert.True(t, onScreen(h.w.win.Canvas(), cw))
		// In 1000 px beside the status the caution needs two lines.
		line := fyne.MeasureText("M", theme.TextSize(), fyne.TextStyle{}).Height
		assert.Greater(t, cw.Size().Height, 2*line, "wrapped onto a second line")
		assert.True(t, strings.HasPrefix(cw.Text, "⚠ "+model.Caution))
	})
}

func TestFoldingTheInputsGivesTheTableTheRoom(t *testing.T) {
	h := newHarnessAt(t, DemoScheme(), laptop)
	h.layOut()
	var before float32
	var cols int
	h.ui(func() {
		before, cols = h.w.results.table.Table.Size().Width, len(h.w.results.ShownColumns())
		h.w.FoldInputs(true)
	})
	h.layOut()
	h.ui(func() {
		assert.True(t, h.w.InputsFolded())
		assert.Greater(t, h.w.results.table.Table.Size().Width, before+200, "the table takes the inputs' width")
		assert.Greater(t, len(h.w.results.ShownColumns()), cols, "and shows more columns")
		h.w.FoldInputs(false)
	})
	h.layOut()
	h.ui(func() {
		assert.InDelta(t, before, h.w.results.table.Table.Size().Width, 2, "unfolding gives the width back")
	})
}

func TestDividersAndFoldComeBackThroughPreferences(t *testing.T) {
	h := newHarnessAt(t, DemoScheme(), laptop)
	h.layOut()
	p := h.w.app.Preferences()
	h.ui(func() {
		assert.True(t, h.w.panes.auto, "a first start follows the width")
		h.w.panes.main.SetOffset(0.6) // the user drags the right column's divider
		h.w.panes.centre.SetOffset(0.4)
		h.w.FoldInputs(true)
		h.w.storeLayout(p)
	})
	h2 := newHarnessAt(t, DemoScheme(), laptop)
	h2.ui(func() {
		w2 := h2.w
		w2.app = h.w.app // the same preferences
		w2.restoreLayout(p)
		assert.False(t, w2.panes.auto)
		assert.InDelta(t, 0.6, w2.panes.main.Offset, 1e-9)
		assert.InDelta(t, 0.4, w2.panes.centre.Offset, 1e-9)
		assert.True(t, w2.InputsFolded())
	})
}

// Screen sizes below are common laptop and desktop screens (common
// practice), as device-independent pixels with a 40 px taskbar.
func TestFirstStartSizeFitsTheWorkArea(t *testing.T) {
	for _, c := range []struct {
		area, want fyne.Size
	}{
		{fyne.NewSize(1920, 1040), fyne.NewSize(1840, 990)}, // 1920×1080 at 100%
		{fyne.NewSize(1536, 824), fyne.NewSize(1340, 680)},  // 1920×1080 at 125%
		{fyne.NewSize(1366, 728), fyne.NewSize(1340, 680)},  // 1366×768
		{fyne.NewSize(1366, 768), fyne.NewSize(1340, 680)},  // 1366×768, no taskbar
		{fyne.NewSize(1280, 680), fyne.NewSize(1240, 640)},  // 1920×1080 at 150%
		{fyne.NewSize(1280, 720), fyne.NewSize(1240, 640)},  // the same without a taskbar
		{fyne.NewSize(1100, 640), fyne.NewSize(1084, 600)},  // none fits: the work area less the frame
		{fyne.NewSize(800, 560), minWindowSize},             // smaller than the layout: its minimum
		{fyne.Size{}, windowDefaults[1]},                    // no screen known
	} {
		got := firstSize(c.area)
		assert.Equal(t, c.want, got, "work area %v", c.area)
		if c.area.Width >= minWindowSize.Width+windowFrame.Width {
			assert.LessOrEqual(t, got.Width+windowFrame.Width, c.area.Width)
			assert.LessOrEqual(t, got.Height+windowFrame.Height, c.area.Height)
		}
	}
	// A size remembered on a larger monitor is clamped the same way.
	assert.Equal(t, fyne.NewSize(1350, 728), clampSize(fyne.NewSize(1800, 1000), fyne.NewSize(1366, 768)))
	assert.Equal(t, fyne.NewSize(1100, 650), clampSize(fyne.NewSize(1100, 650), fyne.NewSize(1366, 768)), "a size that fits is kept")
	assert.Equal(t, fyne.NewSize(1800, 1000), clampSize(fyne.NewSize(1800, 1000), fyne.Size{}), "kept when the screen is unknown")
	a := test.NewTempApp(t)
	storeSize(a.Preferences(), fyne.NewSize(1800, 1000))
	assert.Equal(t, fyne.NewSize(1350, 728), savedSize(a.Preferences(), fyne.NewSize(1366, 768)))
}

func TestTheWindowContentFitsTheSmallestWindow(t *testing.T) {
	h := newHarnessAt(t, DemoScheme(), laptop)
	h.ui(func() {
		m := h.w.win.Content().MinSize()
		assert.LessOrEqual(t, m.Width, minWindowSize.Width, "content minimum %v", m)
		assert.LessOrEqual(t, m.Height, minWindowSize.Height, "content minimum %v", m)
	})
}

func TestInputSectionsFoldAndComeBack(t *testing.T) {
	h := newHarnessAt(t, DemoScheme(), laptop)
	h.layOut()
	h.ui(func() {
		w := h.w
		var titles []string
		for _, s := range w.inputs.inSections {
			titles = append(titles, s.title)
		}
		assert.Equal(t, []string{"Column", "Load", "Design", "Fire resistance", "Materials"}, titles, "every inputs section folds")
		directHidden := !w.inputs.load.directBox.Visible()
		w.inputs.FoldSection("Load", true)
		assert.True(t, w.inputs.SectionFolded("Load"))
		assert.False(t, isShown(w.field("tributary").entry, w.inputs.inSections[1].body), "the rows are hidden with their section")
		w.inputs.FoldSection("Load", false)
		assert.False(t, w.inputs.SectionFolded("Load"))
		assert.Equal(t, directHidden, !w.inputs.load.directBox.Visible(), "opening a section leaves the rows its choices hide hidden")
		w.inputs.FoldSection("Design", true)
		assert.True(t, w.app.Preferences().Bool(prefSectionShut+"Design"), "remembered")
	})
	// A window opened on the same preferences comes back with Design folded.
	h.ui(func() {
		w2 := newWindow(h.w.app, DemoScheme(), func(f func()) { f() }, func(f func()) { f() })
		defer func() { w2.closing.Store(true); w2.eng.Close() }()
		assert.True(t, w2.inputs.SectionFolded("Design"))
		assert.False(t, w2.inputs.SectionFolded("Load"))
	})
}

// isShown reports whether o would be drawn: it and the body holding it are visible.
func isShown(o fyne.CanvasObject, body fyne.CanvasObject) bool {
	return o.Visible() && body.Visible()
}

func TestScreenshotViewsFindTheirTabs(t *testing.T) {
	h := newHarnessAt(t, DemoScheme(), laptop)
	h.ui(func() {
		var titles []string
		eachTabs(h.w.win.Content(), func(tb tabber) {
			titles = append(titles, tb.Selected().Text)
		})
		require.Equal(t, []string{"Chart", "Calculation"}, titles)
		selected := func() []string {
			var out []string
			eachTabs(h.w.win.Content(), func(tb tabber) { out = append(out, tb.Selected().Text) })
			return out
		}
		undo := showTab("Load takedown")(h.w)
		assert.Equal(t, []string{"Chart", "Load takedown"}, selected())
		undo()
		assert.Equal(t, []string{"Chart", "Calculation"}, selected())
		undo = showTab("Map")(h.w)
		assert.Equal(t, []string{"Map", "Calculation"}, selected())
		undo()
		assert.Equal(t, []string{"Chart", "Calculation"}, selected())
		names := map[string]bool{}
		for _, v := range shotViews {
			assert.False(t, names[v.name], "view names are file names: %s twice", v.name)
			names[v.name] = true
		}
	})
}
