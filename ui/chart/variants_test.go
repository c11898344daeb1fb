package chart

import (
	"context"
	"math"
	"testing"

	"upright/plots"
	"upright/ui/model"
	"upright/ui/units"
)

// TestVariantSectionsRows checks the figure has one row per column of the
// comparison, each with the best size of each material, all at one scale:
// every section's drawn width is its plan width times the one scale.
func TestVariantSectionsRows(t *testing.T) {
	model.SetChangeApplier(func(base model.Scheme, cs []model.Change) (model.Scheme, error) {
		base.Setting.LengthMM, base.Setting.WeakMM = 7000, 7000 // a test applier: a taller storey
		return base, nil
	})
	t.Cleanup(func() { model.SetChangeApplier(nil) })
	sc := model.DefaultScheme()
	sc.Materials = []string{"steel", "timber"}
	sc.Load = model.Load{Mode: model.LoadDirect, DirectN: 1200e3}
	sc.Variants = []model.Variant{{Name: "tall", Changes: []model.Change{{Name: "length", Value: "7m"}}}}
	c, err := model.CompareVariants(context.Background(), sc)
	if err != nil {
		t.Fatal(err)
	}
	sh := VariantSections(c, units.US, true)
	if len(sh.Rows) != 2 || len(sh.RowLabels) != 2 || sh.RowLabels[1] != "tall" {
		t.Fatalf("rows %v, labels %v", sh.Rows, sh.RowLabels)
	}
	base, tall := BestPerMaterial(&c.Base), BestPerMaterial(&c.Variants[0])
	if sh.Rows[0] != len(base)+1 || sh.Rows[1] != len(tall) || len(sh.Sections) != len(base)+len(tall) {
		t.Fatalf("rows %v for %d and %d sizes", sh.Rows, len(base), len(tall))
	}
	lay, err := plots.LayoutPlan(&sh, plots.Size{Width: 720, Height: 360, DPI: 96})
	if err != nil {
		t.Fatal(err)
	}
	for i, b := range lay.Sections {
		want := sh.Sections[i].WidthMM * lay.PxPerMM
		if math.Abs(b.W-want) > 0.5 {
			t.Errorf("section %d drawn %.1f px wide; at the one scale %.1f", i, b.W, want)
		}
	}
	// The second row lies below the first.
	if y0, y1 := lay.Sections[0].SlotY, lay.Sections[len(base)].SlotY; y1 <= y0 {
		t.Errorf("row 2 at %.0f px, not below row 1 at %.0f", y1, y0)
	}
}
