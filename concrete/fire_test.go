package concrete

import (
	"math"
	"testing"
)

// Least column dimension by aggregate and rating: ACI/TMS 216.1-14 Table
// 4.5.1a, also IBC 2021 Table 722.2.4 (from memory).
func TestFireMinDimension(t *testing.T) {
	rows := []struct {
		agg   Aggregate
		hours float64
		in    float64
	}{
		{Siliceous, 1, 8}, {Siliceous, 1.5, 9}, {Siliceous, 2, 10}, {Siliceous, 3, 12}, {Siliceous, 4, 14},
		{Carbonate, 1, 8}, {Carbonate, 1.5, 9}, {Carbonate, 2, 10}, {Carbonate, 3, 11}, {Carbonate, 4, 12},
		{SemiLightweight, 1, 8}, {SemiLightweight, 1.5, 8.5}, {SemiLightweight, 2, 9}, {SemiLightweight, 3, 10.5}, {SemiLightweight, 4, 12},
	}
	for _, r := range rows {
		got, err := FireMinDimensionMM(r.agg, r.hours)
		if err != nil || math.Abs(got-r.in*25.4) > 1e-9 {
			t.Errorf("%v %v h: %v mm, %v; want %v in", r.agg, r.hours, got, err, r.in)
		}
	}
	if _, err := FireMinDimensionMM(Siliceous, 2.5); err == nil {
		t.Error("2.5 h accepted")
	}
	if _, err := FireMinDimensionMM(Aggregate(7), 1); err == nil {
		t.Error("unknown aggregate accepted")
	}
}

// Cover to the longitudinal bars: 1 in per hour, at most 2 in
// (ACI/TMS 216.1-14 4.5.3, from memory).
func TestFireBarCover(t *testing.T) {
	for _, r := range []struct{ hours, in float64 }{{1, 1}, {1.5, 1.5}, {2, 2}, {3, 2}, {4, 2}} {
		got, err := FireBarCoverMM(r.hours)
		if err != nil || math.Abs(got-r.in*25.4) > 1e-9 {
			t.Errorf("%v h: %v mm, %v; want %v in", r.hours, got, err, r.in)
		}
	}
	for _, h := range []float64{0, -1, math.NaN(), 5} {
		if _, err := FireBarCoverMM(h); err == nil {
			t.Errorf("%v h accepted", h)
		}
	}
}

// A 2 in bar cover moves the bars inward: every section keeps at least 2 in
// to its bars, and a section whose bars moved has the same P0 (ACI 318-19
// Eq. 22.4.2.2 does not depend on bar position) but no more bending strength.
func TestCatalogueBarCoverMovesBars(t *testing.T) {
	base, err := Catalogue(CatalogueOptions{Series: SeriesUS, Kinds: []Kind{TiedSquare}})
	if err != nil {
		t.Fatal(err)
	}
	fire, err := Catalogue(CatalogueOptions{Series: SeriesUS, Kinds: []Kind{TiedSquare}, BarCoverMM: 2 * MMPerInch})
	if err != nil {
		t.Fatal(err)
	}
	byName := map[string]*Section{}
	for _, s := range base {
		byName[s.Designation] = s
	}
	moved := 0
	for _, s := range fire {
		if s.BarCoverMM() < 2*MMPerInch-1e-9 {
			t.Errorf("%s: bar cover %.1f mm below 2 in", s.Designation, s.BarCoverMM())
		}
		b := byName[s.Designation]
		if b == nil || b.Tie.DiaMM != s.Tie.DiaMM {
			continue
		}
		if s.BarCoverMM() > b.BarCoverMM()+1e-9 {
			moved++
			if math.Abs(s.P0-b.P0) > 1e-6*b.P0 {
				t.Errorf("%s: P0 changed with cover", s.Designation)
			}
			if math.Abs(s.BarsXY[0][0]) >= math.Abs(b.BarsXY[0][0]) || math.Abs(s.BarsXY[0][1]) >= math.Abs(b.BarsXY[0][1]) {
				t.Errorf("%s: corner bar did not move inward: %v vs %v", s.Designation, s.BarsXY[0], b.BarsXY[0])
			}
		}
	}
	if moved == 0 {
		t.Fatal("no section had its bars moved by a 2 in bar cover")
	}
	if _, err := Catalogue(CatalogueOptions{Series: SeriesUS, BarCoverMM: math.NaN()}); err == nil {
		t.Error("NaN bar cover accepted")
	}
}
