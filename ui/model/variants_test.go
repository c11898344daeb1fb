package model_test

import (
	"context"
	"errors"
	"testing"

	_ "upright/ui/cli" // registers the change applier: the compare flags' own parsing
	"upright/ui/model"
)

// demoVariants are four variants of the demo scheme: a taller storey, a
// 2 h rating, fixed bases and bigger bays.
var demoVariants = []model.Variant{
	{Name: "22 ft ground floor", Changes: []model.Change{{"length", "22ft"}}},
	{Name: "2 h", Changes: []model.Change{{"fire", "2h"}}},
	{Name: "fixed bases", Changes: []model.Change{{"ends", "fixed-pinned"}}},
	{Name: "bigger bays", Changes: []model.Change{{"tributary", "1200ft2"}, {"floors", "3"}}},
}

func TestParseChanges(t *testing.T) {
	cs, err := model.ParseChanges(" length=5.5m, --fire=2h ,")
	if err != nil || len(cs) != 2 || cs[0] != (model.Change{"length", "5.5m"}) || cs[1] != (model.Change{"fire", "2h"}) {
		t.Fatalf("got %v, %v", cs, err)
	}
	if got := model.ChangesText(cs); got != "length=5.5m, fire=2h" {
		t.Errorf("ChangesText = %q", got)
	}
	for _, bad := range []string{"length", "=5m", "length=", "a=1,b"} {
		if _, err := model.ParseChanges(bad); err == nil {
			t.Errorf("%q: no error", bad)
		}
	}
}

func TestValidateVariants(t *testing.T) {
	sc := model.DefaultScheme()
	sc.Variants = make([]model.Variant, model.MaxVariants+1)
	var fe *model.FieldError
	if err := sc.Validate(); !errors.As(err, &fe) || fe.Field != "variants" {
		t.Errorf("five variants: %v; want a field error on variants", err)
	}
	sc.Variants = []model.Variant{{Name: "a\nb"}}
	if err := sc.Validate(); !errors.As(err, &fe) {
		t.Errorf("two-line name: %v; want a field error", err)
	}
	sc.Variants = []model.Variant{{Name: "ok", Changes: []model.Change{{"length", "5m"}}}}
	if err := sc.Validate(); err != nil {
		t.Errorf("one good variant: %v", err)
	}
}

// TestCompareVariantsFollowsEachScheme checks each column against the
// variant's scheme evaluated on its own, and the deltas against the rows.
func TestCompareVariantsFollowsEachScheme(t *testing.T) {
	sc := demoScheme(t)
	sc.Variants = demoVariants
	c, err := model.CompareVariants(context.Background(), sc)
	if err != nil {
		t.Fatal(err)
	}
	if len(c.Variants) != 4 || len(c.Families) == 0 {
		t.Fatalf("%d variants, %d families", len(c.Variants), len(c.Families))
	}
	for vi, v := range sc.Variants {
		col := &c.Variants[vi]
		if col.Err != nil {
			t.Fatalf("%s: %v", v.Name, col.Err)
		}
		vs, err := sc.ApplyVariant(v)
		if err != nil {
			t.Fatal(err)
		}
		m, err := model.New(vs)
		if err != nil {
			t.Fatal(err)
		}
		res, err := m.Evaluate(context.Background(), vs.Setting)
		if err != nil {
			t.Fatal(err)
		}
		for fi := range res.Families {
			name := m.Families[fi].Name()
			want, got := res.Families[fi].Best(), col.Best(name)
			if (want == nil) != (got == nil) || (want != nil && want.Static.Designation != got.Static.Designation) {
				t.Errorf("%s, %s: comparison gives %v, the scheme alone %v", v.Name, name, got, want)
			}
			d := c.Delta(vi, name)
			b := c.Base.Best(name)
			if want == nil || b == nil {
				if d.Known {
					t.Errorf("%s, %s: a delta without two working sizes", v.Name, name)
				}
				continue
			}
			wantMass := want.Static.MassKgPerM*vs.Setting.LengthMM/1000 - b.Static.MassKgPerM*sc.Setting.LengthMM/1000
			if !d.Known || d.MassKg != wantMass || d.PlanAreaMM2 != want.Static.PlanAreaMM2-b.Static.PlanAreaMM2 || d.CarbonKg != want.CarbonKg-b.CarbonKg {
				t.Errorf("%s, %s: delta %+v; want mass %.1f", v.Name, name, d, wantMass)
			}
		}
		if bo, wo := col.BestOverall(), res.BestOverall(); (bo == nil) != (wo == nil) || (bo != nil && bo.Static.Designation != wo.Static.Designation) {
			t.Errorf("%s: best overall differs", v.Name)
		}
	}
	// The taller storey needs more (common practice: strength falls with length).
	if d := c.Delta(0, "W"); !d.Known || d.MassKg <= 0 {
		t.Errorf("22 ft: W delta %+v; want heavier", d)
	}
}

// TestCompareVariantsKeepsABadVariant checks a variant that cannot be
// applied keeps its error, naming it, without stopping the others.
func TestCompareVariantsKeepsABadVariant(t *testing.T) {
	sc := demoScheme(t)
	sc.Variants = []model.Variant{{Name: "bad", Changes: []model.Change{{"length", "-3m"}}}, demoVariants[1]}
	c, err := model.CompareVariants(context.Background(), sc)
	if err != nil {
		t.Fatal(err)
	}
	var ve *model.VariantError
	if !errors.As(c.Variants[0].Err, &ve) || ve.Variant != "bad" {
		t.Errorf("bad variant: %v", c.Variants[0].Err)
	}
	if c.Variants[1].Err != nil || c.Variants[1].Result == nil {
		t.Errorf("good variant: %v", c.Variants[1].Err)
	}
}

// BenchmarkOneEvaluation builds and evaluates the demo scheme once.
func BenchmarkOneEvaluation(b *testing.B) {
	sc := demoScheme(b)
	for i := 0; i < b.N; i++ {
		m, err := model.New(sc)
		if err != nil {
			b.Fatal(err)
		}
		if _, err := m.Evaluate(context.Background(), sc.Setting); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkFourVariants evaluates four variants of the demo scheme, whose
// own model is built (as the window has it). Target: at most
// 4 × BenchmarkOneEvaluation + 1 ms.
func BenchmarkFourVariants(b *testing.B) {
	sc := demoScheme(b)
	sc.Variants = demoVariants
	bm, err := model.New(sc)
	if err != nil {
		b.Fatal(err)
	}
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		if _, err := model.CompareVariantsFrom(context.Background(), sc, bm); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkFourVariantsAndBase is the same with the base built too.
func BenchmarkFourVariantsAndBase(b *testing.B) {
	sc := demoScheme(b)
	sc.Variants = demoVariants
	for i := 0; i < b.N; i++ {
		if _, err := model.CompareVariants(context.Background(), sc); err != nil {
			b.Fatal(err)
		}
	}
}
