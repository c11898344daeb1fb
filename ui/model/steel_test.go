package model

import (
	"math"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/steel"
)

func steelFamilies(t testing.TB, sc Scheme, m Method) []Family {
	t.Helper()
	ls, err := Summarize(sc.Load, m)
	require.NoError(t, err)
	fams, err := buildSteel(&sc, ls)
	require.NoError(t, err)
	return fams
}

func steelFind(t testing.TB, fams []Family, designation string) (Family, int) {
	t.Helper()
	for _, f := range fams {
		for i := 0; i < f.Len(); i++ {
			if f.Static(i).Designation == designation {
				return f, i
			}
		}
	}
	t.Fatalf("%s not in the steel families", designation)
	return nil, 0
}

// TestSteelRegisteredAndFamilies checks the registration and the six
// families in display order, and the family filter.
func TestSteelRegisteredAndFamilies(t *testing.T) {
	assert.Contains(t, Materials(), "steel")
	assert.Equal(t, "steel", Materials()[0], "steel registers with order 10, ahead of concrete and timber")
	fams := steelFamilies(t, DefaultScheme(), LRFD)
	var names []string
	for _, f := range fams {
		names = append(names, f.Name())
		assert.Equal(t, "steel", f.Material())
		assert.Positive(t, f.Len())
	}
	assert.Equal(t, SteelFamilies, names)

	sc := DefaultScheme()
	sc.Steel.Families = []string{"Pipe", "W"}
	fams = steelFamilies(t, sc, LRFD)
	require.Len(t, fams, 2)
	assert.Equal(t, "W", fams[0].Name())
	assert.Equal(t, "Pipe", fams[1].Name())
}

// TestSteelBadOptions checks that bad steel options are rejected with the
// field named.
func TestSteelBadOptions(t *testing.T) {
	sc := DefaultScheme()
	sc.Steel.Families = []string{"channel"}
	_, err := buildSteel(&sc, LoadSummary{})
	assert.ErrorContains(t, err, "steel families")
	assert.ErrorContains(t, sc.Validate(), "steel families")
	for _, fy := range []float64{math.NaN(), 100, 5000, math.Inf(1)} {
		sc := DefaultScheme()
		sc.Steel.FyMPa = fy
		_, err := buildSteel(&sc, LoadSummary{})
		assert.ErrorContains(t, err, "steel Fy")
	}
}

// TestSteelQuickMatchesPackage checks that Quick converts the setting to
// inches and the steel package's strength to newtons: for W14X90 at 4 m,
// weak axis braced at 2 m, fixed-pinned (K = 0.80, Commentary Table
// C-A-7.1), LRFD.
func TestSteelQuickMatchesPackage(t *testing.T) {
	fams := steelFamilies(t, DefaultScheme(), LRFD)
	f, i := steelFind(t, fams, "W14X90")
	s := Setting{LengthMM: 4000, WeakMM: 2000, Ends: FixedPinned, Method: LRFD, TwistBraced: true}
	q := f.Quick(i, s)
	require.True(t, q.Permitted)

	sh, err := steel.Lookup("W14X90")
	require.NoError(t, err)
	c, err := steel.NewColumn(sh, 0)
	require.NoError(t, err)
	want := c.Strength(0.8*4000/25.4, 0.8*2000/25.4, 0.8*2000/25.4, steel.LRFD)
	assert.InDelta(t, want.Available*4448.2216152605, q.CapacityN, 1e-6)
	assert.Equal(t, int(want.Mode), q.Mode)
	assert.Equal(t, want.Mode.Words(steel.W), q.Governing)

	// A typed K replaces the end condition's value.
	s.K = 2.0
	qk := f.Quick(i, s)
	want = c.Strength(2*4000/25.4, 2*2000/25.4, 2*2000/25.4, steel.LRFD)
	assert.InDelta(t, want.Available*4448.2216152605, qk.CapacityN, 1e-6)

	// ASD divides by Ωc = 1.67 where LRFD multiplies by φc = 0.90.
	s.K, s.Method = 0, ASD
	qa := f.Quick(i, s)
	assert.InEpsilon(t, q.CapacityN/0.90/1.67, qa.CapacityN, 1e-12)

	// Without TwistBraced the torsional length is the full length.
	s.Method, s.TwistBraced = LRFD, false
	want = c.Strength(0.8*4000/25.4, 0.8*2000/25.4, 0.8*4000/25.4, steel.LRFD)
	assert.InDelta(t, want.Available*4448.2216152605, f.Quick(i, s).CapacityN, 1e-6)
}

// TestSteelTwistBracing is W14X90, Lcx = 28 ft, Lcy = 14 ft (pinned ends,
// K = 1), Fy = 50 ksi, worked by hand from the AISC Manual Table 1-1
// properties (from memory): A = 26.5 in², Ix = 999 in⁴, Iy = 362 in⁴,
// rx = 6.14 in, ry = 3.70 in, J = 4.06 in⁴, Cw = 16,000 in⁶; E = 29,000 ksi,
// G = 11,200 ksi; the section is nonslender (bf/2tf = 10.2, h/tw = 25.9).
//
// Twist not braced, Lcz = 28 ft = 336 in: Fez = (π²E·Cw/Lcz² + GJ)/(Ix + Iy)
// = (40,564 + 45,472)/1,361 = 63.2 ksi (Eq. E4-2) < Fex = π²E/(336/6.14)² =
// 95.6 ksi, so Fcr = 0.658^(50/63.2)·50 = 35.9 ksi (Eq. E3-2) and φPn =
// 0.9·35.9·26.5 = 856 kip. Twist braced, Lcz = 14 ft: Fez = 152.6 ksi, Fex
// governs, Fcr = 0.658^(50/95.6)·50 = 40.2 ksi, φPn = 958 kip: about 11 % more.
func TestSteelTwistBracing(t *testing.T) {
	hand := func(lczIn float64) float64 {
		const e, g, fy, a = 29000.0, 11200.0, 50.0, 26.5
		pe := math.Pi * math.Pi * e
		fex := pe / math.Pow(336/6.14, 2)                      // AISC 360-22 Eq. E3-4
		fey := pe / math.Pow(168/3.70, 2)                      // Eq. E3-4
		fez := (pe*16000/(lczIn*lczIn) + g*4.06) / (999 + 362) // Eq. E4-2
		fe := math.Min(fex, math.Min(fey, fez))
		return 0.9 * math.Pow(0.658, fy/fe) * fy * a // Eq. E3-2, E3-1, φc = 0.90
	}
	fams := steelFamilies(t, DefaultScheme(), LRFD)
	f, i := steelFind(t, fams, "W14X90")
	s := Setting{LengthMM: 28 * 304.8, WeakMM: 14 * 304.8, Ends: PinnedPinned, Method: LRFD}
	const nPerKip = 4448.2216152605
	free := f.Quick(i, s).CapacityN / nPerKip
	assert.InEpsilon(t, hand(336), free, 0.02, "W14X90 Lcz = 28 ft: hand calculation from the AISC Manual Table 1-1 J and Cw")
	assert.InDelta(t, 856, hand(336), 1, "the hand figure quoted above")
	s.TwistBraced = true
	braced := f.Quick(i, s).CapacityN / nPerKip
	assert.InEpsilon(t, hand(168), braced, 0.02, "W14X90 Lcz = 14 ft: flexural buckling about x governs")
	assert.InDelta(t, 958, hand(168), 1, "the hand figure quoted above")
	assert.InDelta(t, 0.89, free/braced, 0.02, "twist not braced: about 11 % less")
	d := f.Detail(i, s)
	assert.Equal(t, true, d.Calc["twist_braced"])
	assert.InDelta(t, 14*304.8, d.Calc["Lcz_mm"], 1e-6)
	s.TwistBraced = false
	d = f.Detail(i, s)
	assert.InDelta(t, 28*304.8, d.Calc["Lcz_mm"], 1e-6)
	assert.Contains(t, d.Steps[0].Formula, "not taken to restrain twisting", "the trace names the choice")
}

// TestSteelDetailSI checks the Detail keys and their SI values against
// the package's US result.
func TestSteelDetailSI(t *testing.T) {
	fams := steelFamilies(t, DefaultScheme(), LRFD)
	f, i := steelFind(t, fams, "HSS12X8X3/16")
	s := Setting{LengthMM: 3657.6, WeakMM: 3657.6, Ends: PinnedPinned, Method: LRFD} // 12 ft
	d := f.Detail(i, s)
	require.True(t, d.Permitted, d.Reason)
	q := f.Quick(i, s)
	assert.InEpsilon(t, q.CapacityN, d.CapacityN, 1e-12)
	assert.Equal(t, q.Mode, d.Mode)

	// The package's hand-checked values for this shape and length (see
	// steel.TestHandCalculationSlenderHSS): Ag 6.775 in², Ae 5.065 in²,
	// Fe 154.6 ksi, Fcr 43.67 ksi, φcPn 199.0 kip.
	for _, k := range []string{"Fy_MPa", "A_mm2", "Ae_mm2", "Lcx_mm", "Lcy_mm", "Lcz_mm", "K", "Lcx_rx", "Lcy_ry", "Fe_MPa", "Fcr_MPa", "equations"} {
		assert.Contains(t, d.Calc, k)
	}
	assert.InEpsilon(t, 50*6.894757293168361, d.Calc["Fy_MPa"], 1e-9)
	assert.InEpsilon(t, 6.775*645.16, d.Calc["A_mm2"], 1e-3)
	assert.InEpsilon(t, 5.065*645.16, d.Calc["Ae_mm2"], 1e-3)
	assert.InEpsilon(t, 154.6*6.894757293168361, d.Calc["Fe_MPa"], 1e-3)
	assert.InEpsilon(t, 43.67*6.894757293168361, d.Calc["Fcr_MPa"], 1e-3)
	assert.InEpsilon(t, 3657.6, d.Calc["Lcx_mm"], 1e-12)
	assert.InEpsilon(t, 199.0*4.4482216152605*1000, d.CapacityN, 1e-3)
	assert.Equal(t, 1.0, d.Calc["K"])
	assert.Contains(t, d.Calc["equations"], "E7-1")
	assert.Nil(t, d.Calc["Fez_MPa"], "torsional buckling is not computed for HSS")

	require.NotEmpty(t, d.Steps)
	for _, st := range d.Steps {
		assert.NotContains(t, []string{"in", "in2", "ksi", "kip"}, st.Unit, "step %s is not SI", st.Quantity)
		assert.False(t, math.IsNaN(st.Value) || math.IsInf(st.Value, 0), st.Quantity)
		assert.True(t, strings.HasPrefix(st.Clause, "AISC 360-22"), st.Clause)
	}
	assert.Contains(t, d.Plain, "HSS12X8X3/16")
	assert.Contains(t, d.Plain, "buckling")
}

// TestSteelDetailWarnsAbove200 checks the E2 slenderness warning reaches
// the Detail.
func TestSteelDetailWarnsAbove200(t *testing.T) {
	fams := steelFamilies(t, DefaultScheme(), LRFD)
	f, i := steelFind(t, fams, "Pipe2STD") // r ≈ 20 mm
	d := f.Detail(i, Setting{LengthMM: 6000, WeakMM: 6000, Ends: PinnedPinned, Method: LRFD})
	require.NotEmpty(t, d.Warnings)
	assert.Contains(t, d.Warnings[0], "200")
}

// TestSteelStatic checks mass, footprint, plan area and carbon constituents.
func TestSteelStatic(t *testing.T) {
	fams := steelFamilies(t, DefaultScheme(), LRFD)
	rows := []struct {
		des, kind string
		massKgM   float64 // nominal weight × 1.48816 kg/m per lb/ft
		fp        [2]float64
		area      float64
		source    string
	}{
		{"W14X90", CarbonRolledSteel, 90 * 1.4881639, [2]float64{14.02 * 25.4, 14.52 * 25.4}, 14.02 * 14.52 * 645.16,
			"AISC Manual Table 1-1: 90 lb/ft, d 14.02 in, bf 14.52 in (from memory)"},
		{"HSS8X8X1/2", CarbonHSSSteel, 48.85 * 1.4881639, [2]float64{203.2, 203.2}, 203.2 * 203.2,
			"AISC Manual Table 1-12: 48.85 lb/ft (from memory)"},
		{"Pipe6STD", CarbonHSSSteel, 18.97 * 1.4881639, [2]float64{168.275, 168.275}, math.Pi / 4 * 168.275 * 168.275,
			"AISC Manual Table 1-14: 18.97 lb/ft, OD 6.625 in (from memory)"},
	}
	for _, r := range rows {
		f, i := steelFind(t, fams, r.des)
		st := f.Static(i)
		assert.Equal(t, "steel", st.Material)
		assert.InEpsilon(t, r.massKgM, st.MassKgPerM, 0.005, r.source)
		assert.InEpsilon(t, r.fp[0], st.FootprintMM[0], 1e-9, r.source)
		assert.InEpsilon(t, r.fp[1], st.FootprintMM[1], 1e-9, r.source)
		assert.InEpsilon(t, r.area, st.PlanAreaMM2, 1e-9, r.source)
		require.Len(t, st.Constituents, 1)
		assert.Equal(t, r.kind, st.Constituents[0].Kind)
		assert.InEpsilon(t, st.MassKgPerM, st.Constituents[0].Amount, 1e-12)
	}
}

// TestSteelFyOverride checks that the scheme's Fy reaches every family.
func TestSteelFyOverride(t *testing.T) {
	sc := DefaultScheme()
	sc.Steel.FyMPa = 450
	fams := steelFamilies(t, sc, LRFD)
	for _, des := range []string{"W12X65", "Pipe4XS"} {
		f, i := steelFind(t, fams, des)
		d := f.Detail(i, Setting{LengthMM: 3000, WeakMM: 3000, Ends: PinnedPinned, Method: LRFD})
		assert.InEpsilon(t, 450, d.Calc["Fy_MPa"], 1e-9, des)
	}
}

// TestSteelBadSetting checks that a bad setting gives a not-permitted
// result with a reason instead of a panic.
func TestSteelBadSetting(t *testing.T) {
	fams := steelFamilies(t, DefaultScheme(), LRFD)
	f := fams[0]
	for _, s := range []Setting{
		{LengthMM: math.NaN(), WeakMM: 3000, Ends: PinnedPinned},
		{LengthMM: -3000, WeakMM: 3000, Ends: PinnedPinned},
		{LengthMM: 3000, WeakMM: 3000, Ends: "hinged"},
		{LengthMM: 3000, WeakMM: 3000, Ends: PinnedPinned, K: math.Inf(1)},
	} {
		q := f.Quick(0, s)
		assert.False(t, q.Permitted, "%+v", s)
		assert.NotEmpty(t, q.Reason)
		d := f.Detail(0, s)
		assert.False(t, d.Permitted, "%+v", s)
		assert.NotEmpty(t, d.Reason)
	}
}

// TestSteelQuickDoesNotAllocate checks that Quick over the whole catalogue
// allocates nothing.
func TestSteelQuickDoesNotAllocate(t *testing.T) {
	fams := steelFamilies(t, DefaultScheme(), LRFD)
	s := Setting{LengthMM: 4200, WeakMM: 2100, Ends: FixedPinned, Method: LRFD}
	var sink float64
	allocs := testing.AllocsPerRun(20, func() {
		for _, f := range fams {
			for i := 0; i < f.Len(); i++ {
				sink += f.Quick(i, s).CapacityN
			}
		}
	})
	assert.Zero(t, allocs)
	assert.Positive(t, sink)
}

// BenchmarkSteelFamilyQuick measures Quick over the whole steel catalogue.
func BenchmarkSteelFamilyQuick(b *testing.B) {
	fams := steelFamilies(b, DefaultScheme(), LRFD)
	s := Setting{LengthMM: 4200, WeakMM: 4200, Ends: PinnedPinned, Method: LRFD}
	n := 0
	for _, f := range fams {
		n += f.Len()
	}
	b.ReportAllocs()
	b.ResetTimer()
	var sink float64
	for k := 0; k < b.N; k++ {
		for _, f := range fams {
			for i := 0; i < f.Len(); i++ {
				sink += f.Quick(i, s).CapacityN
			}
		}
	}
	b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N*n), "ns/shape")
	if sink == 0 {
		b.Fatal("no capacity")
	}
}

// TestSteelRebuildIsCached checks that building the steel families again at
// the same yield stress reuses the prepared catalogue.
func TestSteelRebuildIsCached(t *testing.T) {
	a := steelFamilies(t, DefaultScheme(), LRFD)
	b := steelFamilies(t, DefaultScheme(), ASD)
	require.Equal(t, len(a), len(b))
	for k := range a {
		assert.Same(t, a[k].Static(0), b[k].Static(0), a[k].Name())
	}
	sc := DefaultScheme()
	sc.Steel.FyMPa = 380
	c := steelFamilies(t, sc, LRFD)
	assert.NotSame(t, a[0].Static(0), c[0].Static(0))
}
