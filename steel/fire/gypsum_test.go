package fire

import (
	"errors"
	"math"
	"testing"
)

// Section properties from the AISC Steel Construction Manual, 16th ed.,
// Tables 1-1, 1-12 and 1-13 (from memory; the same values are in
// ../shared/reference/steel-shapes.csv, AISC Shapes Database v16.0):
//
//	W10X49          W = 49.0 lb/ft, d = 9.98 in, bf = 10.0 in
//	HSS6X6X1/4      W = 19.02 lb/ft, B = H = 6.00 in
//	HSS6.625X0.280  W = 18.99 lb/ft, OD = 6.625 in
//
// Expected R values are hand calculations with the IBC 2021 722.5.1.2
// equations (from memory): W′ = W + 50·h·D/144, R = 130·[h·(W′/D)/2]^0.75.
// For example W10X49, D = 2(9.98 + 10.0) = 39.96 in, h = 0.625 in:
// W′ = 49 + 50·0.625·39.96/144 = 57.672; h·W′/D/2 = 0.45102;
// 0.45102^0.75 = 0.55044; R = 71.6 min.
func TestSizeHandCalculations(t *testing.T) {
	rows := []struct {
		name    string
		outline Outline
		a, b, w float64
		hours   float64
		layers  int     // fewest layers that reach the rating
		r       float64 // R with those layers, min (hand calculation)
		rLess   float64 // R with one layer fewer, min (hand calculation); 0 when layers is 1
	}{
		{"W10X49 1 h", Profile, 9.98, 10.0, 49.0, 1, 1, 71.6, 0},
		{"W10X49 2 h", Profile, 9.98, 10.0, 49.0, 2, 2, 133.7, 71.6},
		{"W10X49 3 h", Profile, 9.98, 10.0, 49.0, 3, 3, 198.6, 133.7},
		{"HSS6X6X1/4 1 h", Box, 6.0, 6.0, 19.02, 1, 2, 106.5, 54.7},
		{"HSS6X6X1/4 2 h", Box, 6.0, 6.0, 19.02, 2, 3, 163.1, 106.5},
		{"HSS6X6X1/4 3 h", Box, 6.0, 6.0, 19.02, 3, 4, 224.8, 163.1},
		// Round: D = 4·OD = 26.5 in, the square box the board forms; W/D = 0.7166.
		{"HSS6.625X0.280 1 h", Round, 6.625, 6.625, 18.99, 1, 2, 101.5, 51.6},
		{"HSS6.625X0.280 2 h", Round, 6.625, 6.625, 18.99, 2, 3, 156.6, 101.5},
		{"HSS6.625X0.280 3 h", Round, 6.625, 6.625, 18.99, 3, 4, 217.1, 156.6},
	}
	for _, r := range rows {
		d, err := HeatedPerimeterIn(r.outline, r.a, r.b)
		if err != nil {
			t.Fatalf("%s: %v", r.name, err)
		}
		e, err := Size(r.w, d, r.hours)
		if err != nil {
			t.Fatalf("%s: %v", r.name, err)
		}
		if !e.OK || e.Layers != r.layers {
			t.Errorf("%s: %d layers (ok %v), want %d", r.name, e.Layers, e.OK, r.layers)
		}
		if math.Abs(e.Minutes-r.r) > 0.1 {
			t.Errorf("%s: R = %.2f min, want %.1f (hand calculation)", r.name, e.Minutes, r.r)
		}
		if e.Minutes < r.hours*60 {
			t.Errorf("%s: R = %.1f min below the rating", r.name, e.Minutes)
		}
		if math.Abs(e.ThicknessIn-float64(r.layers)*0.625) > 1e-12 {
			t.Errorf("%s: h = %v in", r.name, e.ThicknessIn)
		}
		if r.layers > 1 {
			less, err := Minutes(r.w, d, float64(r.layers-1)*LayerIn)
			if err != nil {
				t.Fatal(err)
			}
			if less >= r.hours*60 {
				t.Errorf("%s: one layer fewer gives R = %.1f min, which already reaches %v h", r.name, less, r.hours)
			}
			if math.Abs(less-r.rLess) > 0.1 {
				t.Errorf("%s: one layer fewer R = %.2f min, want %.1f (hand calculation)", r.name, less, r.rLess)
			}
		}
	}
}

// A light section that four layers cannot bring to 4 h is reported as not
// reaching the rating, with the clause in the reason.
func TestSizeShortOfRating(t *testing.T) {
	// HSS3X3X1/8: W = 4.59 lb/ft (AISC Manual Table 1-12, from memory), D = 12 in.
	e, err := Size(4.59, 12, 4)
	if err != nil {
		t.Fatal(err)
	}
	if e.OK || e.Layers != MaxLayers || e.Reason == "" {
		t.Fatalf("got ok %v layers %d reason %q", e.OK, e.Layers, e.Reason)
	}
	// Hand calculation: h = 2.5, W′ = 4.59 + 50·2.5·12/144 = 15.007, h·W′/D/2 = 1.5632, R = 130·1.5632^0.75 = 181.8 min < 240.
	if math.Abs(e.Minutes-181.8) > 0.1 {
		t.Errorf("R = %.2f min, want 181.8 (hand calculation)", e.Minutes)
	}
}

func TestHeatedPerimeter(t *testing.T) {
	rows := []struct {
		name string
		o    Outline
		a, b float64
		want float64 // hand calculation
	}{
		{"W box 2(d + bf)", Profile, 9.98, 10.0, 39.96},
		{"rectangular HSS 2(B + H)", Box, 4, 8, 24},
		{"round in a square box 4·OD", Round, 6.625, 6.625, 26.5},
	}
	for _, r := range rows {
		got, err := HeatedPerimeterIn(r.o, r.a, r.b)
		if err != nil || math.Abs(got-r.want) > 1e-3 {
			t.Errorf("%s: %v, %v; want %v", r.name, got, err, r.want)
		}
	}
}

func TestRejectsBadInput(t *testing.T) {
	for _, c := range []struct{ w, d, h float64 }{
		{math.NaN(), 20, 1}, {10, math.Inf(1), 1}, {10, 20, 0}, {-1, 20, 1}, {10, 0, 1}, {10, 20, 5},
	} {
		if _, err := Size(c.w, c.d, c.h); !errors.Is(err, ErrInput) {
			t.Errorf("Size(%v, %v, %v): err %v, want ErrInput", c.w, c.d, c.h, err)
		}
	}
	if _, err := Minutes(10, 20, math.NaN()); !errors.Is(err, ErrInput) {
		t.Errorf("Minutes with NaN h: %v", err)
	}
	if _, err := HeatedPerimeterIn(Outline(9), 1, 1); !errors.Is(err, ErrInput) {
		t.Errorf("unknown outline: %v", err)
	}
}

// Above W/D = 3.65 lb/ft/in the board equation is not applied to the
// column's own W/D: the column takes the board of a W14X233 (IBC 2021
// 722.5.1.2.2, from memory). W14X233: W = 233 lb/ft, d = 16.04 in,
// bf = 15.89 in (AISC Manual Table 1-1, from memory), D = 63.86 in,
// W/D = 3.649. W14X342: W = 342 lb/ft, d = 17.54 in, bf = 16.36 in,
// D = 67.80 in, W/D = 5.04 (same source). At 3 h, by hand with W/D = 3.65:
// one layer (h = 0.625) R = 130·[0.625·(3.65 + 0.217)/2]^0.75 = 130·1.2084^0.75
// = 149.8 min < 180; two layers R = 130·[1.25·(3.65 + 0.434)/2]^0.75 = 130·2.5525^0.75
// = 262.5 min ≥ 180; so both shapes take two layers, where W14X342's own
// W/D would give one layer R = 130·[0.625·5.261/2]^0.75 = 188.8 min.
func TestSizeHeavyShapeTakesW14X233Board(t *testing.T) {
	d233, d342 := 2*(16.04+15.89), 2*(17.54+16.36)
	e233, err := Size(233, d233, 3)
	if err != nil {
		t.Fatal(err)
	}
	e342, err := Size(342, d342, 3)
	if err != nil {
		t.Fatal(err)
	}
	if e342.Layers != 2 || e233.Layers != 2 {
		t.Errorf("layers at 3 h: W14X342 %d, W14X233 %d; want 2 and 2 (hand calculation)", e342.Layers, e233.Layers)
	}
	if math.Abs(e342.Minutes-262.5) > 0.1 {
		t.Errorf("W14X342 R = %.1f min, want 262.5 (hand calculation at W/D = 3.65)", e342.Minutes)
	}
	if Capped(233, d233) || !Capped(342, d342) {
		t.Errorf("Capped: W14X233 %v, W14X342 %v; want false, true", Capped(233, d233), Capped(342, d342))
	}
	found := false
	for _, s := range e342.Steps {
		if s.Quantity == "W/D used" && s.Value == MaxWD {
			found = true
		}
	}
	if !found {
		t.Error("the trace does not say that W/D was limited to 3.65")
	}
	// R never rises with W/D past the limit.
	r1, _ := Minutes(400, 60, 0.625)
	r2, _ := Minutes(800, 60, 0.625)
	if r1 != r2 {
		t.Errorf("R past the W/D limit: %v and %v min, want equal", r1, r2)
	}
}
