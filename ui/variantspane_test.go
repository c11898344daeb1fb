package ui

import (
	"context"
	"strings"
	"sync"
	"testing"
	"time"

	"fyne.io/fyne/v2/test"
	"fyne.io/fyne/v2/widget"

	_ "upright/ui/cli" // the change applier: the compare flags' own parsing
	"upright/ui/model"
)

// fakeEditor applies each edit to its scheme and records what it was.
type fakeEditor struct {
	sc    model.Scheme
	edits []string
}

func (e *fakeEditor) Edit(what string, change func(sc *model.Scheme)) {
	e.edits = append(e.edits, what)
	change(&e.sc)
}

// paneHarness runs a pane with a lock standing in for the UI goroutine.
type paneHarness struct {
	mu sync.Mutex
	p  *variantsPane
	ed *fakeEditor
}

func newPaneHarness(t *testing.T, sc model.Scheme) *paneHarness {
	test.NewTempApp(t)
	h := &paneHarness{ed: &fakeEditor{sc: sc}}
	h.p = newVariantsPane(h.ed, func(f func()) { h.mu.Lock(); defer h.mu.Unlock(); f() })
	w := test.NewTempWindow(t, h.p.Object())
	w.Resize(w.Canvas().Size().Max(h.p.Object().MinSize()).AddWidthHeight(600, 300))
	return h
}

// show evaluates the editor's scheme and hands the pane the snapshot, then
// waits for the variants to be shown.
func (h *paneHarness) show(t *testing.T) {
	t.Helper()
	m, err := model.New(h.ed.sc)
	if err != nil {
		t.Fatal(err)
	}
	res, err := m.Evaluate(context.Background(), h.ed.sc.Setting)
	if err != nil {
		t.Fatal(err)
	}
	h.mu.Lock()
	h.p.Show(&Snapshot{Model: m, Result: res})
	want := len(h.ed.sc.Variants)
	h.mu.Unlock()
	deadline := time.Now().Add(20 * time.Second)
	for time.Now().Before(deadline) {
		h.mu.Lock()
		c := h.p.comp
		h.mu.Unlock()
		if (want == 0 && c == nil) || (c != nil && len(c.Variants) == want) {
			return
		}
		time.Sleep(10 * time.Millisecond)
	}
	t.Fatal("the variants were not shown")
}

func paneScheme() model.Scheme {
	sc := model.DefaultScheme()
	sc.Materials = []string{"steel", "timber"}
	sc.Setting.LengthMM, sc.Setting.WeakMM = 4200, 4200
	sc.Load = model.Load{Mode: model.LoadDirect, DirectN: 1500e3}
	return sc
}

// gridTexts returns the texts of the table's cells.
func (h *paneHarness) gridTexts() []string {
	h.mu.Lock()
	defer h.mu.Unlock()
	var out []string
	for _, row := range h.p.cells {
		out = append(out, row...)
	}
	return out
}

// TestVariantsPaneTable checks the table holds each family's best size in
// each variant, as the model gives it, with its change against the base.
func TestVariantsPaneTable(t *testing.T) {
	sc := paneScheme()
	sc.Variants = []model.Variant{{Name: "tall", Changes: []model.Change{{Name: "length", Value: "5.5m"}}}}
	h := newPaneHarness(t, sc)
	h.show(t)
	c, err := model.CompareVariants(context.Background(), sc)
	if err != nil {
		t.Fatal(err)
	}
	texts := strings.Join(h.gridTexts(), "|")
	for _, fam := range c.Families {
		for _, col := range c.Columns() {
			if b := col.Best(fam); b != nil && !strings.Contains(texts, b.Static.Designation) {
				t.Errorf("%s in %s: %s not in the table", fam, col.Name, b.Static.Designation)
			}
		}
	}
	for _, want := range []string{"tall ▸ show", "Best overall", "Base (shown)", " kg CO2e"} {
		if !strings.Contains(texts, want) {
			t.Errorf("the table lacks %q", want)
		}
	}
}

// TestVariantsPaneEdits checks adding starts from the current inputs, the
// changes are read by the flags (a bad one is shown, not stored), names
// are edited, and showing a variant makes its inputs the scheme's, each
// through the editor.
func TestVariantsPaneEdits(t *testing.T) {
	h := newPaneHarness(t, paneScheme())
	h.show(t)
	h.mu.Lock()
	test.Tap(h.p.add)
	h.mu.Unlock()
	if len(h.ed.sc.Variants) != 1 || len(h.ed.sc.Variants[0].Changes) != 0 {
		t.Fatalf("after add: %+v", h.ed.sc.Variants)
	}
	h.show(t)
	h.mu.Lock()
	r := h.p.rows[0]
	if r.box.Hidden {
		t.Error("the new variant's row is hidden")
	}
	r.changes.SetText("length=abc")
	h.p.applyChanges(0)
	if r.problem.Hidden || !strings.Contains(r.problem.Text, `--length "abc"`) {
		t.Errorf("bad change: problem %q (hidden %v)", r.problem.Text, r.problem.Hidden)
	}
	if len(h.ed.sc.Variants[0].Changes) != 0 {
		t.Error("a bad change was stored")
	}
	r.changes.SetText("length=5.5m, fire=1h")
	h.p.applyChanges(0)
	r.name.SetText("Variant 1 tall")
	h.mu.Unlock()
	v := h.ed.sc.Variants[0]
	if len(v.Changes) != 2 || v.Changes[0] != (model.Change{Name: "length", Value: "5.5m"}) || v.Name != "Variant 1 tall" {
		t.Fatalf("after editing: %+v", v)
	}
	h.show(t)
	h.mu.Lock()
	h.p.tapped(widget.TableCellID{Row: 0, Col: 2}) // the variant's name in the table
	h.mu.Unlock()
	if h.ed.sc.Setting.LengthMM != 5500 || h.ed.sc.Fire.Rating != "1h" || len(h.ed.sc.Variants) != 1 {
		t.Errorf("after show: length %v, fire %q, %d variants", h.ed.sc.Setting.LengthMM, h.ed.sc.Fire.Rating, len(h.ed.sc.Variants))
	}
	last := h.ed.edits[len(h.ed.edits)-1]
	if !strings.Contains(last, "show variant Variant 1 tall") {
		t.Errorf("the edit is described as %q", last)
	}
	h.mu.Lock()
	h.p.removeVariant(0)
	h.mu.Unlock()
	if len(h.ed.sc.Variants) != 0 {
		t.Error("remove left the variant")
	}
}
