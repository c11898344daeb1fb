package ui

import (
	"strings"
	"testing"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/test"
	"fyne.io/fyne/v2/widget"
	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
)

// recordingEditor applies each edit to its own scheme and records it.
type recordingEditor struct {
	sc    model.Scheme
	edits []string
}

func (e *recordingEditor) Edit(what string, change func(sc *model.Scheme)) {
	e.edits = append(e.edits, what)
	change(&e.sc)
}

// showScheme hands the pane a snapshot of sc as the window would, and
// waits until any sizing it starts has been applied (the test driver runs
// fyne.Do on the calling goroutine, so the test must not touch the widgets
// meanwhile).
func showScheme(t *testing.T, p *buildingPane, sc model.Scheme) {
	m, err := model.New(sc)
	require.NoError(t, err)
	fyne.DoAndWait(func() { p.Show(&Snapshot{Model: m}) })
	deadline := time.Now().Add(20 * time.Second)
	for time.Now().Before(deadline) {
		p.mu.Lock()
		idle := !p.busy && p.pending == nil
		p.mu.Unlock()
		if idle {
			return
		}
		time.Sleep(10 * time.Millisecond)
	}
	t.Fatal("the building was not sized within 20 s")
}

// waitBuilding polls cond on the UI goroutine until it holds or 20 s pass.
func waitBuilding(t *testing.T, cond func() bool) {
	deadline := time.Now().Add(20 * time.Second)
	for time.Now().Before(deadline) {
		ok := false
		fyne.DoAndWait(func() { ok = cond() })
		if ok {
			return
		}
		time.Sleep(20 * time.Millisecond)
	}
	t.Fatal("timed out")
}

func TestBuildingPaneEditsThroughTheEditor(t *testing.T) {
	test.NewTempApp(t)
	sc := model.DefaultScheme()
	sc.Units = model.SI
	ed := &recordingEditor{sc: sc}
	p := newBuildingPane(ed)
	var _ pane = p
	showScheme(t, p, ed.sc)
	assert.True(t, p.none.Visible(), "no building: the offer to add one")
	test.Tap(findButton(t, p.none, "Add a building"))
	require.NotNil(t, ed.sc.Building)
	showScheme(t, p, ed.sc)
	waitBuilding(t, func() bool { return p.sched != nil && strings.Contains(p.status.Text, "columns on each floor") })
	fyne.DoAndWait(func() {
		assert.Contains(t, p.status.Text, "12 columns on each floor")
		assert.Contains(t, p.totals.Text, "W")
		assert.NotNil(t, p.plan.Image)
		assert.NotNil(t, p.elev.Image)
		assert.Equal(t, "9m,9m,9m", p.baysX.Text)
	})
	// A bad span is refused with a message naming the input; the scheme is not touched.
	before := len(ed.edits)
	fyne.DoAndWait(func() { p.baysX.OnSubmitted("9m,0m") })
	assert.Len(t, ed.edits, before)
	fyne.DoAndWait(func() { assert.Contains(t, p.status.Text, "bays-x") })
	// An ambiguous façade unit is refused with why, as a field, a flag and a file refuse it.
	fyne.DoAndWait(func() { p.facade.OnSubmitted("0.5k/ft") })
	assert.Len(t, ed.edits, before)
	fyne.DoAndWait(func() { assert.Contains(t, p.status.Text, "k may mean kip or kN") })
	// A good one is one edit, on a copy: the shown scheme's building keeps its bays.
	old := ed.sc.Building
	fyne.DoAndWait(func() { p.baysX.OnSubmitted("8m,8m") })
	require.Len(t, ed.edits, before+1)
	assert.True(t, strings.HasPrefix(ed.edits[before], "bays x"))
	assert.Equal(t, []float64{8000, 8000}, ed.sc.Building.BaysXMM)
	assert.Equal(t, []float64{9000, 9000, 9000}, old.BaysXMM)
	// The slider scales the chosen storey's height.
	showScheme(t, p, ed.sc)
	fyne.DoAndWait(func() { p.height.OnChangeEnded(5000) })
	assert.Equal(t, 5000.0, ed.sc.Building.StoreysMM[0])
	assert.Equal(t, 3600.0, ed.sc.Building.StoreysMM[1])
}

// findButton finds a button by its text under o.
func findButton(t *testing.T, o fyne.CanvasObject, text string) fyne.Tappable {
	var found fyne.Tappable
	var walk func(o fyne.CanvasObject)
	walk = func(o fyne.CanvasObject) {
		if b, ok := o.(interface {
			fyne.Tappable
			fyne.CanvasObject
		}); ok && found == nil {
			if bt, ok := o.(*widget.Button); ok && bt.Text == text {
				found = b
				return
			}
		}
		if c, ok := o.(*fyne.Container); ok {
			for _, k := range c.Objects {
				walk(k)
			}
		}
	}
	walk(o)
	require.NotNil(t, found, "button %q", text)
	return found
}
