package fire

import (
	"math"
	"testing"
)

// W8X40: W = 40 lb/ft, d = 8.25 in, bf = 8.07 in (AISC Manual Table 1-1,
// from memory). Contour D = 4·8.07 + 2·8.25 = 48.78 in, W/D = 0.8200.
// At 2 h, by hand with IBC 2021 Eq. 7-13 (from memory), C1 = 1.05,
// C2 = 0.61: h = 2/(1.05·0.8200 + 0.61) = 2/1.4710 = 1.3596 in, applied
// 1-3/8 in (1.375); R = 60·1.4710·1.375 = 121.4 min. At 1 h: h = 0.680 in,
// applied 11/16 in (0.6875).
func TestSprayThicknessByHand(t *testing.T) {
	d, err := ContourPerimeterIn(Profile, 8.25, 8.07)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(d-48.78) > 1e-9 {
		t.Fatalf("D = %v, want 48.78 (hand calculation)", d)
	}
	rows := []struct {
		hours, exact, applied, minutes float64
	}{
		{2, 1.3596, 1.375, 121.4},
		{1, 0.6798, 0.6875, 60.7},
	}
	for _, r := range rows {
		sp, err := SprayThickness(40, d, r.hours)
		if err != nil {
			t.Fatal(err)
		}
		if !sp.OK || math.Abs(sp.ExactIn-r.exact) > 5e-4 || sp.ThicknessIn != r.applied || math.Abs(sp.Minutes-r.minutes) > 0.1 {
			t.Errorf("%v h: %+v; want h exact %.4f, applied %.4f, R %.1f min (hand calculation)", r.hours, sp, r.exact, r.applied, r.minutes)
		}
	}
	// Below W/D 0.37 the equation does not apply; 3/8 in is the least applied.
	if sp, _ := SprayThickness(5, 20, 1); sp.OK || sp.Reason == "" {
		t.Errorf("W/D 0.25: %+v; want not OK with a reason", sp)
	}
	if sp, _ := SprayThickness(400, 60, 1); sp.ThicknessIn != SprayMinIn {
		t.Errorf("heavy shape at 1 h: %.4f in, want the 3/8 in least thickness", sp.ThicknessIn)
	}
	if r, _ := ContourPerimeterIn(Round, 10, 10); math.Abs(r-math.Pi*10) > 1e-9 {
		t.Errorf("round contour %v, want π·OD", r)
	}
}
