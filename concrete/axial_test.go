package concrete

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func TestMaterialFormulas(t *testing.T) {
	rows := []struct {
		name   string
		got    float64
		want   float64
		source string
	}{
		{"Ec at 5,000 psi", Ec(5000*MPaPerPsi) / MPaPerPsi, 57000 * math.Sqrt(5000), "ACI 318-19 19.2.2.1(b): 57,000√5,000 = 4,030,509 psi"},
		{"Ec at 4,000 psi", Ec(4000*MPaPerPsi) / MPaPerPsi, 3604997, "ACI 318-19 19.2.2.1(b): 57,000√4,000 = 3,604,997 psi"},
		{"β1 at 4,000 psi", Beta1(4000 * MPaPerPsi), 0.85, "ACI 318-19 Table 22.2.2.4.3"},
		{"β1 at 5,000 psi", Beta1(5000 * MPaPerPsi), 0.80, "ACI 318-19 Table 22.2.2.4.3: 0.85 − 0.05(1,000)/1,000"},
		{"β1 at 6,500 psi", Beta1(6500 * MPaPerPsi), 0.725, "ACI 318-19 Table 22.2.2.4.3: 0.85 − 0.05(2,500)/1,000"},
		{"β1 at 8,000 psi", Beta1(8000 * MPaPerPsi), 0.65, "ACI 318-19 Table 22.2.2.4.3: floor 0.65 from 8,000 psi"},
		{"β1 at 10,000 psi", Beta1(10000 * MPaPerPsi), 0.65, "ACI 318-19 Table 22.2.2.4.3: floor 0.65"},
		{"fy Grade 60", FyMPa(60), 413.685, "ASTM A615 Grade 60: 60,000 psi = 413.7 MPa"},
		{"fy Grade 80", FyMPa(80), 551.581, "ASTM A615 Grade 80: 80,000 psi = 551.6 MPa"},
	}
	for _, r := range rows {
		assert.InDelta(t, r.want, r.got, 1e-4*math.Abs(r.want)+1e-9, "%s (%s)", r.name, r.source)
	}
}

func TestBarTable(t *testing.T) {
	// ASTM A615 Table 1 nominal areas (in²) and diameters (in).
	rows := []struct {
		size       int
		area, diam float64
	}{
		{5, 0.31, 0.625}, {6, 0.44, 0.750}, {7, 0.60, 0.875}, {8, 0.79, 1.000}, {9, 1.00, 1.128},
		{10, 1.27, 1.270}, {11, 1.56, 1.410}, {14, 2.25, 1.693}, {18, 4.00, 2.257},
	}
	for _, r := range rows {
		b, ok := BarBySize(r.size)
		require.True(t, ok)
		assert.InDelta(t, r.area, b.AreaMM2/in2, 1e-9, "#%d area (ASTM A615 Table 1)", r.size)
		assert.InDelta(t, r.diam, b.DiaMM/MMPerInch, 1e-9, "#%d diameter (ASTM A615 Table 1)", r.size)
	}
}

func TestAxialLimitHandCalculations(t *testing.T) {
	// 16x16 in, 8 #9, f'c = 5 ksi, Grade 60, tied (ACI 318-19 22.4.2):
	//   Ag = 256 in², Ast = 8.00 in²
	//   P0 = 0.85(5)(256 − 8) + 60(8) = 1,054 + 480 = 1,534 kip      (Eq. 22.4.2.2)
	//   Pn,max = 0.80(1,534) = 1,227.2 kip                            (Table 22.4.2.1(a))
	//   φPn,max = 0.65(1,227.2) = 797.68 kip                          (Table 21.2.2)
	sq := square16(t)
	assert.InDelta(t, 1534.0, sq.P0/NPerKip, 0.01, "P0, ACI 318-19 Eq. 22.4.2.2 by hand")
	assert.InDelta(t, 1227.2, sq.PnMax/NPerKip, 0.01, "Pn,max, ACI 318-19 Table 22.4.2.1(a) by hand")
	assert.InDelta(t, 797.68, sq.PhiPnMax/NPerKip, 0.01, "φPn,max, ACI 318-19 Table 21.2.2 by hand")
	assert.InDelta(t, 8.0/256, sq.Rho, 1e-9, "ρg = 8/256")

	// 20 in round spiral, 8 #8, f'c = 5 ksi, Grade 60:
	//   Ag = π(20)²/4 = 314.159 in², Ast = 8(0.79) = 6.32 in²
	//   P0 = 0.85(5)(314.159 − 6.32) + 60(6.32) = 1,308.32 + 379.20 = 1,687.52 kip
	//   Pn,max = 0.85(1,687.52) = 1,434.39 kip                        (Table 22.4.2.1(b))
	//   φPn,max = 0.75(1,434.39) = 1,075.79 kip
	rd := round20(t)
	assert.InDelta(t, 1687.52, rd.P0/NPerKip, 0.01, "P0 of the round spiral column by hand")
	assert.InDelta(t, 1434.39, rd.PnMax/NPerKip, 0.01, "Pn,max = 0.85P0, ACI 318-19 Table 22.4.2.1(b)")
	assert.InDelta(t, 1075.79, rd.PhiPnMax/NPerKip, 0.01, "φPn,max with φ = 0.75, ACI 318-19 Table 21.2.2")

	// A short column takes φPn,max: 16x16 in at 8 ft pinned, k·lu/r = 96/4.8 = 20 < 22.
	q := sq.Quick(&Conditions{LuXMM: 96 * MMPerInch, LuYMM: 96 * MMPerInch, Ends: PinnedPinned, M1M2: -1, BetaDns: 0.6})
	assert.Equal(t, Crushing, q.Mode)
	assert.InDelta(t, 20.0, q.KLR, 1e-9, "k·lu/r = 1.0 × 96 / (0.3 × 16), ACI 318-19 6.2.5.2(a)")
	assert.InDelta(t, sq.PhiPnMax, q.PhiPn, 1e-6)
}

func TestLayoutRules(t *testing.T) {
	sq := square16(t)
	assert.Equal(t, 3, sq.NX, "8 bars around a square: three per face, corners included")
	assert.Equal(t, 3, sq.NY)
	tie, _ := BarBySize(3)
	assert.Equal(t, tie, sq.Tie, "#3 ties for #9 bars, ACI 318-19 25.7.2.2")
	// Bar centre 1.5 + 0.375 + 1.128/2 = 2.439 in from each face.
	for _, p := range sq.BarsXY {
		assert.InDelta(t, 8-2.439, math.Max(math.Abs(p[0]), math.Abs(p[1]))/MMPerInch, 1e-9)
	}
	// ACI 318-19 25.7.2.1: s ≤ min(16 × 1.128 = 18.05, 48 × 0.375 = 18, 16) = 16 in.
	assert.InDelta(t, 16.0, sq.TieSpaceMM/MMPerInch, 1e-9)
	// ACI 318-19 25.2.3: clear spacing ≥ max(1.5, 1.5 × 1.128 = 1.692, 1.0) = 1.692 in;
	// provided (16 − 2 × 2.439)/2 − 1.128 = 4.433 in.
	assert.InDelta(t, 1.692, sq.MinClearMM/MMPerInch, 1e-9)
	assert.InDelta(t, 4.433, sq.ClearMM/MMPerInch, 1e-9)

	// Spiral of the 20 in round column, ACI 318-19 Eq. 25.7.3.3:
	//   Dch = 20 − 2(1.5) = 17 in, Ag/Ach = 400/289 = 1.3841
	//   ρs,min = 0.45(0.3841)(5/60) = 0.014403
	//   #3 spiral: s ≤ 4(0.11)/(17 × 0.014403) = 1.797 in, clear 1.797 − 0.375 = 1.42 in ≥ 1 in (25.7.3.1)
	rd := round20(t)
	assert.Equal(t, 3, rd.Tie.Size)
	assert.InDelta(t, 0.014403, rd.RhoSMin, 1e-6)
	assert.InDelta(t, 1.797, rd.TieSpaceMM/MMPerInch, 1e-3)
	assert.GreaterOrEqual(t, rd.RhoS, rd.RhoSMin)
}

func TestCatalogueRules(t *testing.T) {
	for _, series := range []Series{SeriesUS, SeriesSI} {
		cat, err := Catalogue(CatalogueOptions{Series: series})
		require.NoError(t, err)
		require.NotEmpty(t, cat)
		names := map[string]bool{}
		for _, s := range cat {
			assert.False(t, names[s.Designation], "designations are unique: %s", s.Designation)
			names[s.Designation] = true
			// ACI 318-19 10.6.1.1 with the 4% practical cap (common practice).
			assert.GreaterOrEqual(t, s.Rho, MinRho-1e-12, s.Designation)
			assert.LessOrEqual(t, s.Rho, DefaultRhoMax+1e-12, s.Designation)
			// ACI 318-19 10.7.3.1 (6 for round, as briefed).
			if s.Shape == Circular {
				assert.GreaterOrEqual(t, s.NBars, 6, s.Designation)
			} else {
				assert.GreaterOrEqual(t, s.NBars, 4, s.Designation)
			}
			assert.GreaterOrEqual(t, s.ClearMM, s.MinClearMM-1e-9, "ACI 318-19 25.2.3: %s", s.Designation)
			if s.Shape == Rectangular {
				assert.LessOrEqual(t, s.DepthMM, 2*s.WidthMM+1e-9, "rectangles up to 2:1")
			}
			assert.Greater(t, s.MassKgPerM, 0.0)
		}
	}
	cat, err := Catalogue(CatalogueOptions{Series: SeriesUS, Kinds: []Kind{TiedSquare}})
	require.NoError(t, err)
	sizes := map[float64][]float64{}
	for _, s := range cat {
		sizes[s.WidthMM] = append(sizes[s.WidthMM], s.Rho)
	}
	assert.Len(t, sizes, 20, "10 to 48 in in 2 in steps")
	for b, rhos := range sizes {
		assert.Less(t, rhos[0], 0.02, "lightest layout near 1%% for %v mm", b)
		assert.GreaterOrEqual(t, len(rhos), 3, "heavier variants for %v mm", b)
	}
	var found bool
	for _, s := range cat {
		if s.Designation == "16x16 in tied, 8 #9, 5 ksi" {
			found = true
		}
	}
	assert.True(t, found, "the designation reads as a reader says it")
	si, err := Catalogue(CatalogueOptions{Series: SeriesSI, Kinds: []Kind{TiedSquare}})
	require.NoError(t, err)
	assert.Contains(t, si[0].Designation, "250x250 mm tied, ")
	assert.Contains(t, si[0].Designation, ", 35 MPa")
}

func TestMass(t *testing.T) {
	// 16x16 in, 8 #9: concrete (256 − 8) in² = 0.16000 m² per metre; steel 8 in² = 5.1613e-3 m² × 7,850
	// = 40.52 kg/m, plus #3 ties at 16 in: (4 × (16 − 3 − 0.375) + 12 × 0.375) = 55.0 in per tie,
	// 0.11 in² × 55 in / 16 in = 0.378 in³/in = 2.4393e-4 m³/m × 7,850 = 1.91 kg/m.
	sq := square16(t)
	assert.InDelta(t, 248*in2*1e-6, sq.ConcreteM3PerM, 1e-9)
	assert.InDelta(t, 40.52+1.91, sq.SteelKgPerM, 0.02)
	assert.InDelta(t, 248*in2*1e-6*ConcreteDensity+42.43, sq.MassKgPerM, 0.05)
}

func TestCatalogueAtTheLimits(t *testing.T) {
	// Every option at its extreme still gives a full catalogue (f'c 4,000 and 10,000 psi, Grade 80, ρ cap 1% and 8%).
	for _, o := range []CatalogueOptions{
		{Series: SeriesUS, FcMPa: 4000 * MPaPerPsi, Grade: 60, RhoMax: 0.015},
		{Series: SeriesSI, FcMPa: 10000 * MPaPerPsi, Grade: 80, RhoMax: 0.08},
		{Series: SeriesUS, FcMPa: 10000 * MPaPerPsi, Grade: 60, RhoMax: 0.08},
	} {
		cat, err := Catalogue(o)
		require.NoError(t, err, "%+v", o)
		kinds := map[Kind]int{}
		for _, s := range cat {
			kinds[s.Kind]++
			assert.LessOrEqual(t, s.Rho, o.RhoMax+1e-12)
			if s.Transverse == Spiral {
				assert.GreaterOrEqual(t, s.RhoS, s.RhoSMin*(1-1e-12), "ACI 318-19 Eq. 25.7.3.3: %s", s.Designation)
				assert.GreaterOrEqual(t, s.TieSpaceMM-s.Tie.DiaMM, 25.4-1e-9, "ACI 318-19 25.7.3.1: %s", s.Designation)
			}
		}
		assert.Len(t, kinds, 4, "%+v", o)
	}
}

func TestTightCapLeavesOutOutlines(t *testing.T) {
	// A cap of exactly 1% (ACI 318-19 10.6.1.1 minimum) admits only layouts at exactly 1%:
	// outlines that have none are left out, and the rest stay within the cap.
	cat, err := Catalogue(CatalogueOptions{RhoMax: 0.01})
	if err != nil {
		assert.ErrorContains(t, err, "rho-max")
		return
	}
	for _, s := range cat {
		assert.InDelta(t, 0.01, s.Rho, 1e-9, s.Designation)
	}
}
