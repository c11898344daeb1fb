package model

import (
	"context"
	"math"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func timberFams(t *testing.T, sc Scheme) []Family {
	t.Helper()
	require.NoError(t, sc.Validate())
	ls, err := Summarize(sc.Load, sc.Setting.Method)
	require.NoError(t, err)
	fams, err := buildTimber(&sc, ls)
	require.NoError(t, err)
	return fams
}

func timberFind(t *testing.T, f Family, des string) int {
	t.Helper()
	for i := 0; i < f.Len(); i++ {
		if f.Static(i).Designation == des {
			return i
		}
	}
	t.Fatalf("%s not in family %s", des, f.Name())
	return -1
}

func TestTimberRegisteredAndBuilt(t *testing.T) {
	assert.Contains(t, Materials(), "timber")
	fams := timberFams(t, DefaultScheme())
	require.Len(t, fams, 2)
	assert.Equal(t, "Sawn lumber", fams[0].Name())
	assert.Equal(t, "Glulam", fams[1].Name())
	for _, f := range fams {
		assert.Equal(t, "timber", f.Material())
		require.Greater(t, f.Len(), 10)
		for i := 0; i < f.Len(); i++ {
			st := f.Static(i)
			assert.Equal(t, "timber", st.Material)
			assert.Equal(t, f.Name(), st.Family)
			assert.Greater(t, st.MassKgPerM, 0.0)
			assert.InDelta(t, st.FootprintMM[0]*st.FootprintMM[1], st.PlanAreaMM2, 1e-6)
			require.Len(t, st.Constituents, 1)
			kind := CarbonSawnTimber
			if f.Name() == "Glulam" {
				kind = CarbonGlulam
			}
			assert.Equal(t, kind, st.Constituents[0].Kind)
			assert.InDelta(t, st.PlanAreaMM2*1e-6, st.Constituents[0].Amount, 1e-12, "m³ per metre")
		}
	}
	// Default species and grade (DF-L No.1); NDS Supplement Table 1B 8x8 = 7-1/2 in = 190.5 mm (from memory).
	i := timberFind(t, fams[0], "8x8 DF-L No.1")
	assert.InDelta(t, 190.5, fams[0].Static(i).FootprintMM[0], 1e-9)
	timberFind(t, fams[1], "6-3/4x9 glulam Comb. 2 DF")
	timberFind(t, fams[1], "5x6-7/8 glulam Comb. 48 SP")
}

func timberSettings() []Setting {
	return []Setting{
		{LengthMM: 3000, WeakMM: 3000, Ends: PinnedPinned, Method: LRFD},
		{LengthMM: 4500, WeakMM: 1500, Ends: FixedPinned, Method: ASD},
		{LengthMM: 6000, WeakMM: 6000, Ends: FixedFree, Method: LRFD},
		{LengthMM: 2500, WeakMM: 2500, Ends: PinnedPinned, K: 1.3, Method: ASD},
	}
}

func TestTimberQuickMatchesDetail(t *testing.T) {
	for _, fire := range []string{"none", "1h"} {
		sc := DefaultScheme()
		sc.Fire.Rating, sc.Timber.FireSides = fire, 3
		for _, f := range timberFams(t, sc) {
			for i := 0; i < f.Len(); i++ {
				for _, s := range timberSettings() {
					q := f.Quick(i, s)
					d := f.Detail(i, s)
					require.Equal(t, q, d.Quick, "%s at %+v", f.Static(i).Designation, s)
					assert.NotEmpty(t, d.Plain)
					assert.NotEmpty(t, d.Steps)
					if q.Mode >= timberModeFire {
						assert.Equal(t, q.Slenderness, d.Calc["fire"].(map[string]any)["le_d"], "slenderness is the charred section's le/d when fire governs")
					} else {
						assert.Equal(t, q.Slenderness, d.Calc["le_d"], "slenderness is the governing le/d %+v", q)
					}
					if !q.Permitted {
						assert.Zero(t, q.CapacityN)
						assert.NotEmpty(t, q.Reason)
					}
				}
			}
		}
	}
}

func TestTimberQuickDoesNotAllocate(t *testing.T) {
	sc := DefaultScheme()
	sc.Fire.Rating, sc.Timber.FireSides = "1.5h", 3
	fams := timberFams(t, sc)
	s := Setting{LengthMM: 4000, WeakMM: 2000, Ends: FixedPinned, Method: LRFD}
	var sink Quick
	for _, f := range fams {
		n := testing.AllocsPerRun(20, func() {
			for i := 0; i < f.Len(); i++ {
				sink = f.Quick(i, s)
			}
		})
		assert.Zero(t, n, f.Name())
	}
	_ = sink
}

// The adapter's SI figures for the 6x6 DF-L No.1 worked by hand in the
// timber package (NDS 2018 Eq. 3.7-1: Cp = 0.69151, P = 20,918 lb = 93.05 kN).
func TestTimberHandValueInSI(t *testing.T) {
	sc := DefaultScheme()
	sc.Setting.Method = ASD
	sc.Load = Load{Mode: LoadDirect, DirectN: 50e3}
	fams := timberFams(t, sc)
	i := timberFind(t, fams[0], "6x6 DF-L No.1")
	d := fams[0].Detail(i, Setting{LengthMM: 3048, WeakMM: 3048, Ends: PinnedPinned, Method: ASD})
	assert.InDelta(t, 0.69151, d.Calc["Cp"], 1e-5)
	assert.InDelta(t, 93.05, d.CapacityN/1000, 0.01)
	assert.InDelta(t, 139.7, d.Calc["b_mm"], 1e-9)      // 5-1/2 in
	assert.InDelta(t, 6.894757, d.Calc["Fc_MPa"], 1e-5) // 1000 psi
	assert.InDelta(t, 3999.0, d.Calc["Emin_MPa"], 0.1)  // 580,000 psi
	assert.Equal(t, "Douglas Fir-Larch", d.Calc["species"])
	assert.Equal(t, "No.1", d.Calc["grade"])
	for _, st := range d.Steps {
		assert.NotContains(t, []string{"in", "in2", "psi", "lb"}, st.Unit, "steps are in SI: %s", st.Quantity)
	}
}

// An independent NDS 2018 3.7.1 calculation from the reference values and
// factors the Detail reports (Calc), within 0.5% of the capacity.
func TestTimberIndependentCheck(t *testing.T) {
	sc := DefaultScheme()
	sc.Timber.Wet, sc.Timber.Hot, sc.Timber.Incised = true, true, true
	for _, m := range []Method{LRFD, ASD} {
		sc.Setting.Method = m
		for _, f := range timberFams(t, sc) {
			for i := 0; i < f.Len(); i++ {
				s := Setting{LengthMM: 3600, WeakMM: 1800, Ends: FixedPinned, Method: m}
				d := f.Detail(i, s)
				c := d.Calc
				for _, k := range []string{"b_mm", "d_mm", "species", "grade", "Fc_MPa", "Emin_MPa", "factors", "Fc_star_MPa", "Emin_adj_MPa", "le_d", "FcE_MPa", "c", "Cp"} {
					require.Contains(t, c, k)
				}
				fc, em := c["Fc_MPa"].(float64), c["Emin_MPa"].(float64)
				for k, v := range c["factors"].(map[string]float64) {
					switch {
					case strings.HasSuffix(k, "_Fc"):
						fc *= v
					case strings.HasSuffix(k, "_Emin"):
						em *= v
					default:
						t.Fatalf("factor %q applies to neither Fc nor Emin", k)
					}
				}
				b, dd := c["b_mm"].(float64), c["d_mm"].(float64)
				led := math.Max(0.80*3600/dd, 0.80*1800/b) // NDS 2018 Table G1: fixed-pinned Ke = 0.80
				assert.InDelta(t, led, d.Slenderness, 1e-9)
				if led > 50 { // NDS 2018 3.7.1.4
					assert.False(t, d.Permitted)
					continue
				}
				cc := 0.8 // NDS 2018 3.7.1.5
				if f.Name() == "Glulam" {
					cc = 0.9
				}
				fce := 0.822 * em / (led * led)
				a := fce / fc
				h := (1 + a) / (2 * cc)
				cp := h - math.Sqrt(h*h-a/cc) // NDS 2018 Eq. 3.7-1
				p := fc * cp * b * dd         // MPa × mm² = N
				assert.InEpsilon(t, p, d.CapacityN, 0.005, f.Static(i).Designation)
				assert.InEpsilon(t, fc, c["Fc_star_MPa"].(float64), 0.005)
				assert.InEpsilon(t, em, c["Emin_adj_MPa"].(float64), 0.005)
			}
		}
	}
}

func timberCap(t *testing.T, sc Scheme, fam int, des string, s Setting) Quick {
	t.Helper()
	f := timberFams(t, sc)[fam]
	return f.Quick(timberFind(t, f, des), s)
}

func TestTimberOptionsTakeEffect(t *testing.T) {
	s := Setting{LengthMM: 3000, WeakMM: 3000, Ends: PinnedPinned, Method: ASD}
	base := DefaultScheme()
	base.Setting.Method = ASD
	p0 := timberCap(t, base, 0, "8x8 DF-L No.1", s).CapacityN

	wet := base
	wet.Timber.Wet = true
	assert.Less(t, timberCap(t, wet, 0, "8x8 DF-L No.1", s).CapacityN, p0, "CM lowers capacity")

	hot := base
	hot.Timber.Hot = true
	assert.Less(t, timberCap(t, hot, 0, "8x8 DF-L No.1", s).CapacityN, p0, "Ct lowers capacity")

	inc := base
	inc.Timber.Incised = true
	assert.Less(t, timberCap(t, inc, 0, "4x4 DF-L No.1", s).CapacityN, timberCap(t, base, 0, "4x4 DF-L No.1", s).CapacityN, "Ci lowers 4x capacity")

	// A typed duration only makes a combination more conservative: ten
	// minutes (CD 1.6) never raises a combination's own CD, permanent (0.9)
	// lowers D + L's 1.0 (NDS 2018 Table 2.3.2, from memory).
	short := base
	short.Timber.Duration = "ten-minutes"
	assert.LessOrEqual(t, timberCap(t, short, 0, "8x8 DF-L No.1", s).CapacityN, p0, "CD 1.6 typed does not raise capacity")
	perm := base
	perm.Timber.Duration = "permanent"
	assert.LessOrEqual(t, timberCap(t, perm, 0, "8x8 DF-L No.1", s).CapacityN, p0, "CD 0.9 typed never raises capacity")

	sp := base
	sp.Timber.Species, sp.Timber.Grade = "SP", "SS"
	timberCap(t, sp, 0, "8x8 SP SS", s)

	// CD and λ come from each combination when Duration is empty (NDS 2018
	// 2.3.2, N3.3). An all-dead typed load (dead share 1) has only D under
	// ASD, at CD 0.9 (Table 2.3.2, permanent), and 1.4D governs under LRFD
	// at λ 0.6 (Table N3: 1.4D/0.6 > 1.2D/0.8).
	dead := base
	dead.Load.DeadShare = 1
	ls, err := Summarize(dead.Load, ASD)
	require.NoError(t, err)
	fams, err := buildTimber(&dead, ls)
	require.NoError(t, err)
	d := fams[0].Detail(timberFind(t, fams[0], "8x8 DF-L No.1"), s)
	assert.Equal(t, 0.9, d.Calc["factors"].(map[string]float64)["CD_Fc"])
	ls, err = Summarize(dead.Load, LRFD)
	require.NoError(t, err)
	fams, err = buildTimber(&dead, ls)
	require.NoError(t, err)
	s.Method = LRFD
	d = fams[0].Detail(timberFind(t, fams[0], "8x8 DF-L No.1"), s)
	assert.Equal(t, 0.6, d.Calc["factors"].(map[string]float64)["lambda_Fc"])
	ls, err = Summarize(base.Load, LRFD)
	require.NoError(t, err)
	fams, err = buildTimber(&base, ls)
	require.NoError(t, err)
	d = fams[0].Detail(timberFind(t, fams[0], "8x8 DF-L No.1"), s)
	assert.Equal(t, 0.8, d.Calc["factors"].(map[string]float64)["lambda_Fc"], "1.2D + 1.6L at λ 0.8 governs with the default dead share")

	only := base
	only.Timber.Sawn = false
	fs := timberFams(t, only)
	require.Len(t, fs, 1)
	assert.Equal(t, "Glulam", fs[0].Name())

	filt := base
	filt.Timber.GlulamCombos = []string{"Comb. 5 DF"}
	fs = timberFams(t, filt)
	for i := 0; i < fs[1].Len(); i++ {
		assert.True(t, strings.HasSuffix(fs[1].Static(i).Designation, "Comb. 5 DF"))
	}
}

func TestTimberFire(t *testing.T) {
	s := Setting{LengthMM: 3600, WeakMM: 3600, Ends: PinnedPinned, Method: LRFD}
	base := DefaultScheme()
	fire := base
	fire.Fire.Rating, fire.Timber.FireSides = "1h", 4
	f0, f1 := timberFams(t, base)[0], timberFams(t, fire)[0]
	for i := 0; i < f0.Len(); i++ {
		q0, q1 := f0.Quick(i, s), f1.Quick(i, s)
		assert.LessOrEqual(t, q1.CapacityN, q0.CapacityN, f0.Static(i).Designation)
	}
	// 4x posts char through in 1 h on four sides (3.5 in − 2·1.8 in < 0, NDS 2018 Table 16.2.1A).
	q := f1.Quick(timberFind(t, f1, "4x6 DF-L No.1"), s)
	assert.False(t, q.Permitted)
	assert.Contains(t, q.Reason, "chars through")

	i := timberFind(t, f1, "12x12 DF-L No.1")
	d := f1.Detail(i, s)
	fc, ok := d.Calc["fire"].(map[string]any)
	require.True(t, ok)
	// 11.5 in − 2·1.8 in = 7.9 in = 200.66 mm (NDS 2018 16.2.1, Table 16.2.1A).
	assert.InDelta(t, 200.66, fc["b_mm"], 1e-6)
	assert.InDelta(t, 200.66, fc["d_mm"], 1e-6)
	assert.Less(t, fc["b_mm"], d.Calc["b_mm"])
	capF := fc["capacity_kN"].(float64)
	assert.Greater(t, capF, 0.0)
	assert.Contains(t, fc["meaning"], "service (ASD) load combination")
	// The fire case is compared with the service load: for a typed 2000 kN
	// LRFD load with dead share 2/3, D + L = 2000/(4/3) = 1500 kN plus
	// self-weight (ASCE 7-22 2.4.1-2; hand calc).
	fireKN := 1500 + d.Calc["self_weight_kN"].(float64)
	assert.InDelta(t, fireKN, fc["demand_kN"], 1e-9)
	// The model capacity is the largest load over the highest utilization,
	// the fire check (NDS 2018 16.2.2) being one of the checks.
	uNormal := d.Calc["combination_demand_kN"].(float64) / d.Calc["combination_capacity_kN"].(float64)
	uFire := fireKN / capF
	assert.InDelta(t, d.Calc["demand_kN"].(float64)/math.Max(uNormal, uFire), d.CapacityN/1000, 1e-9)
	var qs []string
	for _, st := range d.Steps {
		qs = append(qs, st.Quantity)
	}
	assert.Subset(t, qs, []string{"aeff", "b_fire", "d_fire", "P_fire", "fire demand"})
}

func TestTimberAxes(t *testing.T) {
	fams := timberFams(t, DefaultScheme())
	g := fams[1]
	i := timberFind(t, g, "6-3/4x13-1/2 glulam Comb. 2 DF")
	// Weak axis braced at a fifth of the height: the strong axis (depth d, LengthMM) governs.
	d := g.Detail(i, Setting{LengthMM: 5000, WeakMM: 1000, Ends: PinnedPinned, Method: LRFD})
	assert.Contains(t, d.Governing, "strong axis")
	assert.InDelta(t, 5000/(13.5*25.4), d.Slenderness, 1e-9)
	d = g.Detail(i, Setting{LengthMM: 5000, WeakMM: 5000, Ends: PinnedPinned, Method: LRFD})
	assert.Contains(t, d.Governing, "weak axis")
	assert.InDelta(t, 5000/(6.75*25.4), d.Slenderness, 1e-9)
	// le/d > 50 is not permitted (NDS 2018 3.7.1.4): 4x4 at 5 m, le/d = 56.2.
	s := fams[0]
	q := s.Quick(timberFind(t, s, "4x4 DF-L No.1"), Setting{LengthMM: 5000, WeakMM: 5000, Ends: PinnedPinned, Method: LRFD})
	assert.False(t, q.Permitted)
	assert.Contains(t, q.Reason, "3.7.1.4")
	assert.InDelta(t, 5000/88.9, q.Slenderness, 1e-9)
}

func TestTimberBadOptions(t *testing.T) {
	for _, c := range []struct {
		mut   func(*TimberOptions)
		field string
	}{
		{func(o *TimberOptions) { o.Species = "Oak" }, "species"},
		{func(o *TimberOptions) { o.Grade = "No.3" }, "grade"},
		{func(o *TimberOptions) { o.GlulamCombos = []string{"Comb. 99"} }, "glulam combination"},
		{func(o *TimberOptions) { o.FireSides = 2 }, "fire sides"},
		{func(o *TimberOptions) { o.Duration = "forever" }, "duration"},
	} {
		sc := DefaultScheme()
		c.mut(&sc.Timber)
		err := sc.Validate()
		var fe *FieldError
		require.ErrorAs(t, err, &fe)
		assert.Equal(t, c.field, fe.Field)
		ls, _ := Summarize(sc.Load, sc.Setting.Method)
		_, err = buildTimber(&sc, ls)
		assert.Error(t, err)
	}
	// Species is not needed when sawn lumber is off.
	sc := DefaultScheme()
	sc.Timber.Sawn, sc.Timber.Species = false, ""
	assert.NoError(t, sc.Validate())
}

func TestTimberThroughModel(t *testing.T) {
	sc := DefaultScheme()
	sc.Materials = []string{"timber"}
	sc.Load = Load{Mode: LoadDirect, DirectN: 300e3}
	m, err := New(sc)
	require.NoError(t, err)
	res, err := m.Evaluate(context.Background(), sc.Setting)
	require.NoError(t, err)
	require.Len(t, res.Families, 2)
	for _, fr := range res.Families {
		b := fr.Best()
		require.NotNil(t, b, "some timber column carries 300 kN at 4 m")
		assert.GreaterOrEqual(t, b.CapacityN, b.DemandN)
	}
}

// BenchmarkTimberQuick evaluates every timber candidate of the default
// scheme (both families, 1 h fire on three sides) through the adapter at one
// length, and reports ns per candidate.
func BenchmarkTimberQuick(b *testing.B) {
	sc := DefaultScheme()
	sc.Fire.Rating, sc.Timber.FireSides = "1h", 3
	ls, err := Summarize(sc.Load, sc.Setting.Method)
	if err != nil {
		b.Fatal(err)
	}
	fams, err := buildTimber(&sc, ls)
	if err != nil {
		b.Fatal(err)
	}
	s := sc.Setting
	n := 0
	for _, f := range fams {
		n += f.Len()
	}
	var sum float64
	b.ReportAllocs()
	for b.Loop() {
		for _, f := range fams {
			for i := 0; i < f.Len(); i++ {
				sum += f.Quick(i, s).CapacityN
			}
		}
	}
	b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N*n), "ns/candidate")
	b.ReportMetric(float64(n), "candidates")
	if sum == 0 {
		b.Fatal("no capacity")
	}
}

// A typed ASD duration caps each combination's own CD and never raises it:
// D alone keeps 0.9 and D + L keeps 1.0 under a typed ten-minute CD 1.6, and
// a typed permanent 0.9 lowers D + L to 0.9 (NDS 2018 2.3.2 and Table 2.3.2,
// from memory).
func TestTimberTypedDurationPerCombination(t *testing.T) {
	for _, row := range []struct {
		duration string
		want     map[string]float64 // CD by combination name prefix
	}{
		{"ten-minutes", map[string]float64{"ASD 1": 0.9, "ASD 2": 1.0}}, // own CD (Table 2.3.2, from memory)
		{"permanent", map[string]float64{"ASD 1": 0.9, "ASD 2": 0.9}},   // typed 0.9 lower than D + L's 1.0
		{"", map[string]float64{"ASD 1": 0.9, "ASD 2": 1.0}},            // own CD
	} {
		sc := DefaultScheme()
		sc.Setting.Method = ASD
		sc.Timber.Duration = row.duration
		ls, err := Summarize(sc.Load, ASD)
		require.NoError(t, err)
		fams, err := buildTimber(&sc, ls)
		require.NoError(t, err)
		cf := fams[0].(CaseFamily)
		seen := 0
		for _, c := range cf.Cases(ASD) {
			for prefix, want := range row.want {
				if strings.HasPrefix(c.Name, prefix+":") {
					assert.Equal(t, want, cf.CaseFactors(&c, 0)["CD"], "%s under typed %q", c.Name, row.duration)
					seen++
				}
			}
		}
		assert.Equal(t, len(row.want), seen, "combinations found for %q", row.duration)
	}
}
