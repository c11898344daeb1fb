package model

import (
	"math"
	"strings"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"

	"github.com/stretchr/testify/require"
	"upright/concrete"
)

func concreteFamilies(t testing.TB, sc Scheme, ls LoadSummary) []Family {
	t.Helper()
	fams, err := buildConcrete(&sc, ls)
	require.NoError(t, err)
	return fams
}

func typedLoads(t testing.TB, m Method) LoadSummary {
	t.Helper()
	ls, err := Summarize(Load{Mode: LoadDirect, DirectN: 2000e3}, m)
	require.NoError(t, err)
	return ls
}

func TestConcreteRegisteredAndFamilies(t *testing.T) {
	assert.Contains(t, Materials(), "concrete")
	sc := DefaultScheme()
	ls := typedLoads(t, LRFD)
	names := func(fs []Family) []string {
		var out []string
		for _, f := range fs {
			out = append(out, f.Name())
		}
		return out
	}
	assert.Equal(t, []string{"Tied square", "Tied rectangular", "Spiral round", "Tied round"}, names(concreteFamilies(t, sc, ls)))
	sc.Concrete.Transverse = "ties"
	assert.Equal(t, []string{"Tied square", "Tied rectangular", "Tied round"}, names(concreteFamilies(t, sc, ls)))
	sc.Concrete.Transverse = "spiral"
	assert.Equal(t, []string{"Spiral round"}, names(concreteFamilies(t, sc, ls)))
}

func TestConcreteStaticConsistency(t *testing.T) {
	for _, u := range []Units{US, SI} {
		sc := DefaultScheme()
		sc.Units = u
		for _, f := range concreteFamilies(t, sc, typedLoads(t, LRFD)) {
			require.Greater(t, f.Len(), 0)
			assert.Equal(t, "concrete", f.Material())
			for i := 0; i < f.Len(); i++ {
				st := f.Static(i)
				assert.Equal(t, f.Name(), st.Family)
				assert.NotEmpty(t, st.Designation)
				require.Len(t, st.Constituents, 2)
				assert.Equal(t, CarbonConcrete, st.Constituents[0].Kind)
				assert.Equal(t, CarbonRebar, st.Constituents[1].Kind)
				// Mass is the concrete at 2,320 kg/m³ plus the steel (the package's densities).
				assert.InDelta(t, st.Constituents[0].Amount*2320+st.Constituents[1].Amount, st.MassKgPerM, 1e-9)
				w, h := st.FootprintMM[0], st.FootprintMM[1]
				if strings.Contains(st.Designation, "round") {
					assert.InDelta(t, math.Pi*w*w/4, st.PlanAreaMM2, 1e-6)
				} else {
					assert.InDelta(t, w*h, st.PlanAreaMM2, 1e-6)
				}
				if u == SI {
					assert.Contains(t, st.Designation, " mm")
					assert.True(t, strings.HasSuffix(st.Designation, ", 35 MPa"), st.Designation)
				} else {
					assert.True(t, strings.HasSuffix(st.Designation, ", 5 ksi"), st.Designation)
				}
			}
		}
	}
}

func TestConcreteQuickMatchesDetail(t *testing.T) {
	sc := DefaultScheme()
	fams := concreteFamilies(t, sc, typedLoads(t, LRFD))
	settings := []Setting{
		{LengthMM: 3000, WeakMM: 3000, Ends: PinnedPinned, Method: LRFD},
		{LengthMM: 7000, WeakMM: 3500, Ends: FixedPinned, Method: LRFD},
		{LengthMM: 5000, WeakMM: 5000, Ends: FixedFree, Method: ASD},
		{LengthMM: 20000, WeakMM: 20000, Ends: PinnedPinned, Method: LRFD},
	}
	for _, f := range fams {
		for i := 0; i < f.Len(); i += 9 {
			for _, s := range settings {
				q := f.Quick(i, s)
				d := f.Detail(i, s)
				require.Equal(t, q, d.Quick, "%s", f.Static(i).Designation)
				assert.NotEmpty(t, d.Steps)
				assert.NotEmpty(t, d.Plain)
				for _, k := range []string{"shape", "transverse", "fc_MPa", "fy_MPa", "bars", "bar", "Ast_mm2", "bars_xy_mm",
					"cover_mm", "P0_kN", "klu_r", "slender", "delta", "EIeff_kNm2", "Pc_kN", "Mmin_kNm"} {
					assert.Contains(t, d.Calc, k)
				}
				if d.Calc["shape"] == "round" {
					assert.Contains(t, d.Calc, "D_mm")
				} else {
					assert.Contains(t, d.Calc, "b_mm")
					assert.Contains(t, d.Calc, "h_mm")
				}
				assert.Len(t, d.Calc["bars_xy_mm"], d.Calc["bars"].(int))
				if !q.Permitted {
					assert.Zero(t, q.CapacityN)
					assert.NotEmpty(t, q.Reason)
					assert.NotEmpty(t, d.Warnings)
				} else {
					assert.Greater(t, q.CapacityN, 0.0)
				}
			}
		}
	}
}

func TestConcreteSlendernessAxes(t *testing.T) {
	// k·lu/r with r = 0.3h (ACI 318-19 6.2.5.2): x (strong) over LengthMM, y (weak, width b) over WeakMM.
	sc := DefaultScheme()
	fams := concreteFamilies(t, sc, typedLoads(t, LRFD))
	rect := fams[1]
	d := rect.Detail(0, Setting{LengthMM: 6000, WeakMM: 2000, Ends: PinnedPinned, Method: LRFD})
	b, h := d.Calc["b_mm"].(float64), d.Calc["h_mm"].(float64)
	require.Less(t, b, h)
	assert.InDelta(t, 6000/(0.3*h), d.Calc["klu_r_x"].(float64), 1e-9)
	assert.InDelta(t, 2000/(0.3*b), d.Calc["klu_r_y"].(float64), 1e-9)
	q := rect.Quick(0, Setting{LengthMM: 6000, WeakMM: 6000, Ends: PinnedPinned, Method: LRFD})
	assert.InDelta(t, 6000/(0.3*b), q.Slenderness, 1e-9, "equal lengths: the weak axis governs")
	assert.Contains(t, q.Governing, "weak axis")
}

func TestConcreteQuickDoesNotAllocate(t *testing.T) {
	sc := DefaultScheme()
	fams := concreteFamilies(t, sc, typedLoads(t, LRFD))
	s := Setting{LengthMM: 6000, WeakMM: 6000, Ends: PinnedPinned, Method: ASD}
	for _, f := range fams {
		allocs := testing.AllocsPerRun(100, func() {
			for i := 0; i < f.Len(); i++ {
				_ = f.Quick(i, s)
			}
		})
		assert.Zero(t, allocs, f.Name())
	}
}

func TestConcreteASDConversion(t *testing.T) {
	// ACI 318 is strength design: under ASD each candidate is checked against
	// the LRFD combinations of the same loads and its strength restated on
	// the service scale. A typed 2000 kN service load with the default dead
	// share 2/3: D = 1333.3, L = 666.7 kN, 1.2D + 1.6L = 2666.7 kN governs
	// (ASCE 7-22 2.3.1-2), so a short column's allowable strength is
	// φPn,max × 2000/2666.7 = φPn,max / 1.333 (hand calc).
	sc := DefaultScheme()
	sc.SelfWeight = false
	ls := typedLoads(t, ASD)
	require.InDelta(t, 4.0/3, ls.StrengthPerService, 1e-12)
	fams := concreteFamilies(t, sc, ls)
	famsL := concreteFamilies(t, sc, typedLoads(t, LRFD))
	lr := Setting{LengthMM: 1000, WeakMM: 1000, Ends: PinnedPinned, Method: LRFD}
	as := lr
	as.Method = ASD
	for fi, f := range fams {
		for i := 0; i < f.Len(); i += 11 {
			ql, qa := famsL[fi].Quick(i, lr), f.Quick(i, as)
			require.Equal(t, int(concrete.Crushing), ql.Mode, "a 1 m column is short")
			assert.InDelta(t, ql.CapacityN*3/4, qa.CapacityN, 1e-6)
			assert.Equal(t, ql.Mode, qa.Mode)
			d := f.Detail(i, as)
			assert.Contains(t, d.Plain, "restated on the service-load scale")
			last := d.Steps[len(d.Steps)-1]
			assert.Contains(t, last.Formula, "φPn ×")
			assert.InDelta(t, qa.CapacityN/1e3, last.Value, 1e-9)
		}
	}
}

func TestConcreteBetaFromLoads(t *testing.T) {
	// Each LRFD combination is checked with its own βdns = 1.2D (or 1.4D)
	// over its total (ACI 318-19 6.6.4.4.4). Typed 2000 kN, s = 2/3:
	// D = 1000, L = 500 kN; 1.4D: βdns 1; 1.2D + 1.6L: 0.6; 1.2D + L: 1200/1700 (hand calc).
	sc := DefaultScheme()
	sc.SelfWeight = false
	s := Setting{LengthMM: 6000, WeakMM: 6000, Ends: PinnedPinned, Method: LRFD}
	ls := typedLoads(t, LRFD)
	var betas []float64
	for k := range ls.LRFDCases {
		betas = append(betas, ls.LRFDCases[k].BetaDns(0))
	}
	assert.InDeltaSlice(t, []float64{1, 0.6, 1200.0 / 1700}, betas, 1e-12)
	f := concreteFamilies(t, sc, ls)[0].(*concreteFamily)
	for i := 0; i < f.Len(); i += 7 {
		q := f.Quick(i, s)
		if !q.Permitted {
			continue
		}
		worst := 0.0
		for k := range ls.LRFDCases {
			c := &ls.LRFDCases[k]
			worst = math.Max(worst, c.DemandN(0)/f.CaseQuick(i, s, c, 0).CapacityN)
		}
		assert.InEpsilon(t, ls.DemandN/worst, q.CapacityN, 1e-12, "highest utilization governs")
		b := f.Detail(i, s).Calc["beta_dns"].(float64)
		assert.Contains(t, betas, b)
	}
	low := f.Quick(0, s).CapacityN
	sc.Concrete.BetaFromLoads, sc.Concrete.BetaDns = false, 1
	f2 := concreteFamilies(t, sc, ls)[0]
	assert.Equal(t, 1.0, f2.Detail(0, s).Calc["beta_dns"])
	assert.LessOrEqual(t, f2.Quick(0, s).CapacityN, low, "more sustained load, less stiffness (ACI 318-19 6.6.4.4.4)")
	sc.Concrete.EIMethod = "b"
	f2 = concreteFamilies(t, sc, ls)[0]
	assert.Equal(t, "b", f2.Detail(0, s).Calc["EI_method"])
}

func TestConcreteRebuildIsCached(t *testing.T) {
	sc := DefaultScheme()
	sc.Concrete.FcMPa = 41.4 // a key no other test uses
	ls := typedLoads(t, LRFD)
	a := concreteFamilies(t, sc, ls)
	start := time.Now()
	sc.Concrete.M1M2 = 0 // not part of the catalogue key
	b := concreteFamilies(t, sc, ls)
	elapsed := time.Since(start)
	assert.Same(t, a[0].(*concreteFamily).secs[0], b[0].(*concreteFamily).secs[0], "same diagrams reused")
	assert.Less(t, elapsed, 50*time.Millisecond)
	sc.Concrete.FcMPa = 48.3
	c := concreteFamilies(t, sc, ls)
	assert.NotSame(t, a[0].(*concreteFamily).secs[0], c[0].(*concreteFamily).secs[0])
	assert.Contains(t, c[0].Static(0).Designation, "7 ksi")
}

func TestConcreteBadOptions(t *testing.T) {
	sc := DefaultScheme()
	sc.Concrete.FcMPa = 12
	_, err := buildConcrete(&sc, typedLoads(t, LRFD))
	var fe *FieldError
	require.ErrorAs(t, err, &fe)
	assert.Equal(t, "f'c", fe.Field)
	sc = DefaultScheme()
	f := concreteFamilies(t, sc, typedLoads(t, LRFD))[0]
	q := f.Quick(0, Setting{LengthMM: math.NaN(), WeakMM: 3000, Ends: PinnedPinned})
	assert.False(t, q.Permitted)
	assert.Zero(t, q.CapacityN)
	d := f.Detail(0, Setting{LengthMM: 3000, WeakMM: 3000, Ends: "hinged"})
	assert.False(t, d.Permitted)
	assert.NotEmpty(t, d.Warnings)
}

func TestConcreteSecondOrderCap(t *testing.T) {
	// ACI 318-19 6.2.5.3: with the cap on, no slender candidate is given a strength with δ above 1.4.
	sc := DefaultScheme()
	sc.Concrete.SecondOrderCap = true
	s := Setting{LengthMM: 6000, WeakMM: 6000, Ends: PinnedPinned, Method: LRFD}
	offSc := DefaultScheme()
	offSc.Concrete.SecondOrderCap = false
	off := concreteFamilies(t, offSc, typedLoads(t, LRFD))[0]
	for _, f := range concreteFamilies(t, sc, typedLoads(t, LRFD))[:1] {
		for i := 0; i < f.Len(); i++ {
			d := f.Detail(i, s)
			if d.Calc["slender"].(bool) && d.Permitted {
				assert.LessOrEqual(t, d.Calc["delta"].(float64), 1.4+1e-9, f.Static(i).Designation)
			}
			assert.LessOrEqual(t, d.CapacityN, off.Quick(i, s).CapacityN*(1+1e-12))
		}
	}
}

// BenchmarkConcreteFamilyQuick evaluates every candidate of every concrete
// family through the adapter at one slender length; reports ns per candidate.
func BenchmarkConcreteFamilyQuick(b *testing.B) {
	fams := concreteFamilies(b, DefaultScheme(), typedLoads(b, LRFD))
	s := Setting{LengthMM: 6000, WeakMM: 6000, Ends: PinnedPinned, Method: LRFD}
	n := 0
	for _, f := range fams {
		n += f.Len()
	}
	b.ReportAllocs()
	b.ResetTimer()
	var sink float64
	for i := 0; i < b.N; i++ {
		for _, f := range fams {
			for j := 0; j < f.Len(); j++ {
				sink += f.Quick(j, s).CapacityN
			}
		}
	}
	b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N*n), "ns/candidate")
	_ = sink
}

// BenchmarkConcreteBuild builds the concrete families from cold (cache emptied) and warm.
func BenchmarkConcreteBuild(b *testing.B) {
	sc := DefaultScheme()
	ls := typedLoads(b, LRFD)
	b.Run("cold", func(b *testing.B) {
		for i := 0; i < b.N; i++ {
			concreteCache.Lock()
			concreteCache.entries = nil
			concreteCache.Unlock()
			concreteFamilies(b, sc, ls)
		}
	})
	b.Run("warm", func(b *testing.B) {
		for i := 0; i < b.N; i++ {
			concreteFamilies(b, sc, ls)
		}
	})
}

// A typed βdns never lowers a combination's own: under a typed 0.6, 1.4D
// keeps βdns = 1 (all load sustained, ACI 318-19 6.6.4.4.4), while a
// combination whose own is lower takes 0.6.
func TestConcreteTypedBetaPerCombination(t *testing.T) {
	sc := DefaultScheme()
	sc.Concrete.BetaFromLoads, sc.Concrete.BetaDns = false, 0.6
	ls, err := Summarize(sc.Load, LRFD)
	require.NoError(t, err)
	fams, err := buildConcrete(&sc, ls)
	require.NoError(t, err)
	f := fams[0].(*concreteFamily)
	var saw14, sawLow bool
	for _, c := range f.Cases(LRFD) {
		own := c.BetaDns(0)
		got := f.betaOf(&c, 0)
		assert.Equal(t, math.Max(0.6, own), got, c.Name)
		if own == 1 {
			saw14 = true
			assert.Equal(t, 1.0, got, "%s: 1.4D keeps βdns 1 under a typed 0.6", c.Name)
		}
		if own < 0.6 {
			sawLow = true
			assert.Equal(t, 0.6, got, c.Name)
		}
	}
	assert.True(t, saw14, "1.4D is among the combinations")
	assert.True(t, sawLow, "a combination with βdns below 0.6 is among them")
}

// Under a typed βdns lower than some combinations' own, the combinations
// no longer share one strength: Quick still finds the highest utilization
// over every LRFD combination, each at max(typed, own) βdns (ACI 318-19
// 6.6.4.4.4), as Checks lists them. Typed 2000 kN, s = 2/3 (hand calc in
// TestConcreteBetaFromLoads): 1.4D keeps βdns 1 under a typed 0.3.
func TestConcreteTypedBetaQuickGovernsEveryCombination(t *testing.T) {
	sc := DefaultScheme()
	sc.SelfWeight = false
	sc.Concrete.BetaFromLoads, sc.Concrete.BetaDns = false, 0.3
	ls := typedLoads(t, LRFD)
	for _, s := range []Setting{
		{LengthMM: 6000, WeakMM: 6000, Ends: PinnedPinned, Method: LRFD},
		{LengthMM: 9000, WeakMM: 9000, Ends: PinnedPinned, Method: LRFD},
	} {
		for _, fam := range concreteFamilies(t, sc, ls) {
			f := fam.(*concreteFamily)
			for i := 0; i < f.Len(); i += 5 {
				q := f.Quick(i, s)
				if !q.Permitted {
					continue
				}
				worst := 0.0
				for k := range ls.LRFDCases {
					c := &ls.LRFDCases[k]
					worst = math.Max(worst, c.DemandN(0)/f.CaseQuick(i, s, c, 0).CapacityN)
				}
				require.InEpsilon(t, ls.DemandN/worst, q.CapacityN, 1e-12, "%s at %.0f mm: highest utilization governs", f.Static(i).Designation, s.LengthMM)
			}
		}
	}
}
