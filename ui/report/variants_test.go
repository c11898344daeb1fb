package report

import (
	"bytes"
	"path/filepath"
	"testing"
	"time"

	"upright/ui/model"
	"upright/ui/schemefile"
)

// TestVariantsPage checks a scheme with variants gets the variants page,
// one without them does not, and that the page's comparison follows the
// variants.
func TestVariantsPage(t *testing.T) {
	model.SetChangeApplier(func(base model.Scheme, cs []model.Change) (model.Scheme, error) {
		// A test applier for the one change used here; the program's own
		// reads the compare flags (ui/cli).
		for _, c := range cs {
			if c.Name == "ends" {
				base.Setting.Ends = model.EndCondition(c.Value)
			}
		}
		return base, nil
	})
	t.Cleanup(func() { model.SetChangeApplier(nil) })
	sc, err := schemefile.Load(filepath.Join("..", "..", "testdata", "schemes", "demo.upright.json"))
	if err != nil {
		t.Fatal(err)
	}
	sc.ReportMap = false
	m, err := model.New(sc)
	if err != nil {
		t.Fatal(err)
	}
	opt := Options{Date: time.Date(2026, 1, 2, 0, 0, 0, 0, time.UTC), ChartDPI: 72}
	f := &facts{m: m, opt: opt}
	if err := gatherVariants(t.Context(), f); err != nil || f.variants != nil {
		t.Fatalf("no variants: %v, %v", f.variants, err)
	}
	sc.Variants = []model.Variant{{Name: "fixed bases", Changes: []model.Change{{Name: "ends", Value: "fixed-pinned"}}}}
	m, err = model.New(sc)
	if err != nil {
		t.Fatal(err)
	}
	f = &facts{m: m, opt: opt}
	if err := gatherVariants(t.Context(), f); err != nil || f.variants == nil {
		t.Fatalf("variants: %v", err)
	}
	if got := f.variants.Variants[0].Result.Setting.Ends; got != model.FixedPinned {
		t.Errorf("variant evaluated with %s ends", got)
	}
	var with, without bytes.Buffer
	if err := Write(&with, m, opt); err != nil {
		t.Fatal(err)
	}
	sc.Variants = nil
	m0, _ := model.New(sc)
	if err := Write(&without, m0, opt); err != nil {
		t.Fatal(err)
	}
	if with.Len() <= without.Len() {
		t.Errorf("the report with variants (%d bytes) is no longer than without (%d)", with.Len(), without.Len())
	}
}
