package model

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/steel"
)

func compositeFams(t testing.TB, sc Scheme) []Family {
	t.Helper()
	ls, err := Summarize(sc.Load, sc.Setting.Method)
	require.NoError(t, err)
	fams, err := buildComposite(&sc, ls)
	require.NoError(t, err)
	return fams
}

// TestCompositeRegisteredAndFamilies checks the material is registered
// last and builds its three families, each name and material stated.
func TestCompositeRegisteredAndFamilies(t *testing.T) {
	mats := Materials()
	assert.Equal(t, "composite", mats[len(mats)-1])
	fams := compositeFams(t, DefaultScheme())
	require.Len(t, fams, 3)
	for i, f := range fams {
		assert.Equal(t, "composite", f.Material())
		assert.Equal(t, CompositeFamilies[i], f.Name())
		assert.Positive(t, f.Len())
	}
	sc := DefaultScheme()
	sc.Composite.Families = []string{"filled hss round"}
	fams = compositeFams(t, sc)
	require.Len(t, fams, 1)
	assert.Equal(t, "Filled HSS round", fams[0].Name())
}

// TestCompositeStatic checks weight is steel plus fill (145 pcf, common
// practice), the plan is the tube's outline, carbon counts the tube as HSS
// steel and the fill as concrete, and the designation names the fill.
func TestCompositeStatic(t *testing.T) {
	fams := compositeFams(t, DefaultScheme())
	var found bool
	for i := 0; i < fams[0].Len(); i++ {
		st := fams[0].Static(i)
		if st.Designation != "HSS10X10X1/2 filled, 5 ksi" {
			continue
		}
		found = true
		s, err := steel.Lookup("HSS10X10X1/2")
		require.NoError(t, err)
		// Fill: (10 − 2·0.465)² − (4 − π)·0.465² = 82.08 in² at 145 pcf = 82.65 lb/ft.
		fillLbFt := 82.08 / 144 * 145
		assert.InEpsilon(t, (s.Weight+fillLbFt)*steelKgmPerLbft, st.MassKgPerM, 0.002)
		assert.InDelta(t, 254, st.FootprintMM[0], 0.01)
		assert.InDelta(t, 254, st.FootprintMM[1], 0.01)
		assert.InDelta(t, 254*254, st.PlanAreaMM2, 0.1)
		require.Len(t, st.Constituents, 2)
		assert.Equal(t, CarbonHSSSteel, st.Constituents[0].Kind)
		assert.InEpsilon(t, s.MassKgPerM(), st.Constituents[0].Amount, 1e-9)
		assert.Equal(t, CarbonConcrete, st.Constituents[1].Kind)
		assert.InEpsilon(t, 82.08*steelMM2PerIn2/1e6, st.Constituents[1].Amount, 0.002)
	}
	assert.True(t, found)
	round := fams[2].Static(0)
	assert.Equal(t, round.FootprintMM[0], round.FootprintMM[1])
	assert.InEpsilon(t, math.Pi/4*round.FootprintMM[0]*round.FootprintMM[0], round.PlanAreaMM2, 1e-9)
}

// TestCompositeFillFollowsConcrete checks the fill takes the concrete f'c
// unless the composite option sets its own, and SI schemes state it in MPa.
func TestCompositeFillFollowsConcrete(t *testing.T) {
	sc := DefaultScheme()
	sc.Concrete.FcMPa = 41.37
	assert.Contains(t, compositeFams(t, sc)[0].Static(0).Designation, "filled, 6 ksi")
	sc.Composite.FillFcMPa = 3 * steelMPaPerKsi
	assert.Contains(t, compositeFams(t, sc)[0].Static(0).Designation, "filled, 3 ksi")
	sc = DefaultScheme()
	sc.Units = SI
	assert.Contains(t, compositeFams(t, sc)[0].Static(0).Designation, "filled, 35 MPa")
}

// TestCompositeBadOptions checks bad options name the field and the range.
func TestCompositeBadOptions(t *testing.T) {
	for _, o := range []CompositeOptions{{FillFcMPa: 10}, {FillFcMPa: 80}, {FillFcMPa: math.NaN()}, {FillFcMPa: math.Inf(1)}, {Families: []string{"Filled pipe"}}} {
		sc := DefaultScheme()
		sc.Composite = o
		err := sc.Validate()
		require.Error(t, err, "%+v", o)
		var fe *FieldError
		require.ErrorAs(t, err, &fe)
		assert.Contains(t, []string{"fill f'c", "composite families"}, fe.Field)
	}
}

// TestCompositeQuickMatchesDetail checks the fast path and the trace agree
// and that the trace carries the calc keys and cites I2 equations.
func TestCompositeQuickMatchesDetail(t *testing.T) {
	fams := compositeFams(t, DefaultScheme())
	for _, s := range []Setting{
		{LengthMM: 4000, WeakMM: 4000, Ends: PinnedPinned, Method: LRFD},
		{LengthMM: 9000, WeakMM: 4500, Ends: FixedFree, Method: ASD},
		{LengthMM: 3000, WeakMM: 3000, Ends: PinnedPinned, K: 1.3, Method: LRFD},
	} {
		for _, f := range fams {
			for i := 0; i < f.Len(); i += 7 {
				q := f.Quick(i, s)
				d := f.Detail(i, s)
				require.True(t, q.Permitted)
				assert.InEpsilon(t, q.CapacityN, d.CapacityN, 1e-12)
				assert.Equal(t, q.Mode, d.Mode)
				assert.Equal(t, q.Governing, d.Governing)
				assert.InEpsilon(t, d.CapacityN/1000, d.Calc["capacity_kN"].(float64), 1e-9)
				assert.NotEmpty(t, d.Plain)
				cites := false
				for _, st := range d.Steps {
					assert.False(t, math.IsNaN(st.Value) || math.IsInf(st.Value, 0), st.Quantity)
					cites = cites || st.Clause == "AISC 360-22 Eq. I2-2" || st.Clause == "AISC 360-22 Eq. I2-3"
				}
				assert.True(t, cites)
			}
		}
	}
}

// TestCompositeBadSetting checks an unusable setting is not permitted and says why.
func TestCompositeBadSetting(t *testing.T) {
	f := compositeFams(t, DefaultScheme())[1]
	for _, s := range []Setting{
		{LengthMM: math.NaN(), WeakMM: 3000, Ends: PinnedPinned},
		{LengthMM: -3000, WeakMM: 3000, Ends: PinnedPinned},
		{LengthMM: 3000, WeakMM: 3000, Ends: "hinged"},
	} {
		q := f.Quick(0, s)
		assert.False(t, q.Permitted, "%+v", s)
		assert.NotEmpty(t, q.Reason)
		d := f.Detail(0, s)
		assert.False(t, d.Permitted)
		assert.NotEmpty(t, d.Reason)
	}
}

// TestCompositeQuickDoesNotAllocate checks Quick over every filled tube
// allocates nothing.
func TestCompositeQuickDoesNotAllocate(t *testing.T) {
	fams := compositeFams(t, DefaultScheme())
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

// TestSortRowsOrder checks the ranking: working rows by score then
// designation, then failing rows by utilization, ties in their first order.
func TestSortRowsOrder(t *testing.T) {
	st := func(d string) *Static { return &Static{Designation: d} }
	rows := []Row{
		{Static: st("F2"), Util: 1.5},
		{Static: st("B"), OK: true, Score: 10},
		{Static: st("F1"), Util: math.Inf(1)},
		{Static: st("A"), OK: true, Score: 10},
		{Static: st("C"), OK: true, Score: 5},
		{Static: st("F0"), Util: 1.2},
	}
	sortRows(rows)
	var got []string
	for _, r := range rows {
		got = append(got, r.Static.Designation)
	}
	assert.Equal(t, []string{"C", "A", "B", "F0", "F2", "F1"}, got)
}

// BenchmarkCompositeFamilyQuick measures Quick over every filled tube.
func BenchmarkCompositeFamilyQuick(b *testing.B) {
	fams := compositeFams(b, DefaultScheme())
	s := Setting{LengthMM: 4200, WeakMM: 4200, Ends: PinnedPinned, Method: LRFD}
	n := 0
	for _, f := range fams {
		n += f.Len()
	}
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		for _, f := range fams {
			for j := 0; j < f.Len(); j++ {
				_ = f.Quick(j, s)
			}
		}
	}
	b.ReportMetric(float64(n), "candidates")
}

// In SI the plain sentence names the fill in MPa, rounded as the
// designation is (a 35 MPa fill, not 5.0763208205573225 ksi).
func TestCompositePlainFillInSchemeUnits(t *testing.T) {
	sc := DefaultScheme()
	sc.Units = SI
	sc.Materials = []string{"composite"}
	sc.Composite.FillFcMPa = 35
	m, err := New(sc)
	require.NoError(t, err)
	d := m.Detail(0, 0, sc.Setting)
	assert.Contains(t, d.Plain, "35 MPa concrete")
	assert.NotContains(t, d.Plain, "ksi")
}
