package model

import (
	"errors"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// US-customary conversions for the hand calculations (exact definitions:
// 1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N).
const (
	tFt2 = 0.09290304                   // m² per ft²
	tKip = 4448.2216152605              // N per kip
	tPsf = 4.4482216152605 / tFt2 / 1e3 // kPa per psf
)

// usTakedown builds a takedown input from US-customary values.
func usTakedown(floors int, aFt2, deadPsf, livePsf, roofDeadPsf, roofLivePsf, snowPsf float64) Load {
	return Load{
		Mode: LoadTakedown, TributaryM2: aFt2 * tFt2, Floors: floors,
		FloorDeadKPa: deadPsf * tPsf, FloorLiveKPa: livePsf * tPsf,
		RoofDeadKPa: roofDeadPsf * tPsf, RoofLiveKPa: roofLivePsf * tPsf, SnowKPa: snowPsf * tPsf,
		LiveReduction: true,
	}
}

func TestTakedownLiveReduction(t *testing.T) {
	rows := []struct {
		name    string
		floors  int
		aFt2    float64 // per floor
		kll     float64
		livePsf float64
		occ     string
		noRed   bool
		want    float64
		src     string
	}{
		{"below threshold", 1, 90, 0, 50, "", false, 1, "ASCE 7-22 4.7.2: KLL·AT = 4×90 = 360 ft² < 400 ft², not reduced"},
		{"just above threshold", 1, 100.25, 0, 50, "", false, 0.999064, "ASCE 7-22 Eq. 4.7-1: 0.25 + 15/√401 = 0.999064"},
		{"900 ft²", 1, 225, 0, 50, "", false, 0.75, "ASCE 7-22 Eq. 4.7-1: 0.25 + 15/√900 = 0.75"},
		{"3600 ft² one floor", 1, 900, 0, 50, "", false, 0.50, "ASCE 7-22 Eq. 4.7-1: 0.25 + 15/60 = 0.50, equal to the 4.7.2 one-floor limit"},
		{"one-floor limit", 1, 2500, 0, 50, "", false, 0.50, "ASCE 7-22 Eq. 4.7-1 gives 0.40; 4.7.2 limit 0.50 for one floor"},
		{"two floors at 0.40", 2, 1250, 0, 50, "", false, 0.40, "ASCE 7-22 Eq. 4.7-1: AT = 2×1250, KLL·AT = 10,000, 0.25 + 15/100 = 0.40"},
		{"two-floor limit", 4, 2500, 0, 50, "", false, 0.40, "ASCE 7-22 Eq. 4.7-1 gives 0.325; 4.7.2 limit 0.40 for two or more floors"},
		{"KLL 1 override", 3, 300, 1, 50, "", false, 0.75, "ASCE 7-22 Table 4.7-1 KLL = 1: KLL·AT = 900, Eq. 4.7-1 0.75 (0.50 with the default 4)"},
		{"KLL 2", 2, 225, 2, 50, "", false, 0.75, "ASCE 7-22 Table 4.7-1 KLL = 2: KLL·AT = 2×450 = 900, Eq. 4.7-1 0.75"},
		{"KLL 3 edge column", 1, 1200, 3, 50, "", false, 0.50, "ASCE 7-22 Table 4.7-1 KLL = 3: KLL·AT = 3600, Eq. 4.7-1 0.50"},
		{"heavy live one floor", 1, 900, 0, 125, "", false, 1, "ASCE 7-22 4.7.3: live load over 100 psf, one floor, not reduced"},
		{"heavy live three floors", 3, 2500, 0, 125, "", false, 0.80, "ASCE 7-22 4.7.3: two or more floors reduced by at most 20% (Eq. 4.7-1 would give 0.40)"},
		{"heavy live small reduction", 2, 78.125, 0, 125, "", false, 0.85, "ASCE 7-22 Eq. 4.7-1: KLL·AT = 625, 0.25 + 15/25 = 0.85, within the 4.7.3 20% cap"},
		{"storage three floors", 3, 2500, 0, 100, OccStorage, false, 0.80, "ASCE 7-22 4.7.3 applied to storage: at most 20% for two or more floors"},
		{"garage one floor", 1, 900, 0, 40, OccGarage, false, 1, "ASCE 7-22 4.7.4: passenger-vehicle garage, one floor, not reduced"},
		{"garage five floors", 5, 900, 0, 40, OccGarage, false, 0.80, "ASCE 7-22 4.7.4: two or more floors reduced by at most 20%"},
		{"assembly", 5, 900, 0, 100, OccAssembly, false, 1, "ASCE 7-22 4.7.5: assembly at 100 psf or less, not reduced"},
		{"assembly heavy", 5, 900, 0, 150, OccAssembly, false, 0.80, "ASCE 7-22 4.7.5 covers only 100 psf or less; 4.7.3 allows 20% for five floors"},
		{"reduction off", 4, 2500, 0, 50, "", true, 1, "Load.LiveReduction false: Lo carried unreduced"},
	}
	for _, r := range rows {
		t.Run(r.name, func(t *testing.T) {
			l := usTakedown(r.floors, r.aFt2, 0, r.livePsf, 20, 0, 0)
			l.KLL, l.Occupancy, l.LiveReduction = r.kll, r.occ, !r.noRed
			ls, err := Summarize(l, LRFD)
			require.NoError(t, err)
			assert.InDelta(t, r.want, ls.Reduction, 1e-6, r.src)
			rawKip := float64(r.floors) * r.livePsf * r.aFt2 / 1000 // floors × live × area
			assert.InEpsilon(t, rawKip*tKip, ls.LiveRawN, 1e-9, "Lo = floors × live × AT (ASCE 7-22 4.3)")
			assert.InEpsilon(t, r.want*rawKip*tKip, ls.LiveN, 1e-6, "L = Lo × multiplier (ASCE 7-22 4.7)")
		})
	}
}

func TestTakedownCombinations(t *testing.T) {
	rows := []struct {
		name        string
		load        Load
		lrfdGov     string
		lrfdKip     float64
		asdGov      string
		asdKip      float64
		alpha, beta float64
		lambda, cd  float64
		src         string
	}{
		{
			name:    "office four floors",
			load:    usTakedown(4, 400, 100, 50, 20, 20, 0),
			lrfdGov: "LRFD 2: 1.2D + 1.6L + 0.5Lr", lrfdKip: 261.6,
			asdGov: "ASD 2: D + L", asdKip: 203,
			alpha: 261.6 / 203, beta: 201.6 / 261.6, lambda: 0.8, cd: 1.0,
			src: "hand calc: D = (4×100+20)×400 = 168 k, Lo = 80 k × (0.25+15/√6400 = 0.4375) = 35 k (ASCE 7-22 Eq. 4.7-1), Lr = 8 k; " +
				"ASCE 7-22 2.3.1-2 1.2×168+1.6×35+0.5×8 = 261.6 k at NDS 2018 Table N3 λ 0.8 (1.4D = 235.2 k is checked separately at its own λ 0.6, N3.3); " +
				"2.4.1-2 168+35 = 203 k at Table 2.3.2 CD 1.0",
		},
		{
			name: "heavy dead, light live: 1.4D governs",
			load: func() Load {
				l := usTakedown(4, 400, 150, 10, 30, 0, 0)
				l.LiveReduction = false
				return l
			}(),
			lrfdGov: "LRFD 1: 1.4D", lrfdKip: 352.8,
			asdGov: "ASD 2: D + L", asdKip: 268,
			alpha: 352.8 / 268, beta: 1, lambda: 0.6, cd: 1.0,
			src: "hand calc: D = 630×400 = 252 k, L = 16 k; ASCE 7-22 2.3.1-1 1.4×252 = 352.8 k > 1.2×252+1.6×16 = 328 k; " +
				"βdns = 1 (ACI 318-19 6.6.4.4.4, all dead); NDS 2018 Table N3 λ 0.6; D + L = 268 k at CD 1.0 (Table 2.3.2; D alone, 252 k, is checked at its own CD 0.9)",
		},
		{
			name: "same dead, more live: 1.2D + 1.6L governs",
			load: func() Load {
				l := usTakedown(4, 400, 150, 40, 30, 0, 0)
				l.LiveReduction = false
				return l
			}(),
			lrfdGov: "LRFD 2: 1.2D + 1.6L + 0.5Lr", lrfdKip: 404.8,
			asdGov: "ASD 2: D + L", asdKip: 316,
			alpha: 404.8 / 316, beta: 302.4 / 404.8, lambda: 0.8, cd: 1.0,
			src: "hand calc: D = 252 k, L = 64 k > D/8 so ASCE 7-22 2.3.1-2 1.2×252+1.6×64 = 404.8 k > 1.4D = 352.8 k; " +
				"λ 0.8 of 1.2D + 1.6L (NDS 2018 Table N3); 1.4D is checked at its own λ 0.6 (N3.3)",
		},
		{
			name:    "heavy snow: snow combination governs",
			load:    usTakedown(1, 400, 80, 40, 20, 20, 60),
			lrfdGov: "LRFD 3: 1.2D + 1.6S + L", lrfdKip: 96.4,
			asdGov: "ASD 4: D + 0.75L + 0.75S", asdKip: 65.5,
			alpha: 96.4 / 65.5, beta: 48 / 96.4, lambda: 0.8, cd: 1.15,
			src: "hand calc: D = 40 k, L = 16 k × 0.625 = 10 k, Lr = 8 k, S = 24 k; ASCE 7-22 2.3.1-3 48+1.6×24+10 = 96.4 k; " +
				"2.4.1-4 40+7.5+18 = 65.5 k; NDS 2018 Table 2.3.2 CD 1.15 (two-month snow)",
		},
		{
			name:    "light snow: roof live governs",
			load:    usTakedown(1, 400, 80, 40, 20, 20, 10),
			lrfdGov: "LRFD 3: 1.2D + 1.6Lr + L", lrfdKip: 70.8,
			asdGov: "ASD 4: D + 0.75L + 0.75Lr", asdKip: 53.5,
			alpha: 70.8 / 53.5, beta: 48 / 70.8, lambda: 0.8, cd: 1.25,
			src: "hand calc: S = 4 k; ASCE 7-22 2.3.1-3 48+1.6×8+10 = 70.8 k; 2.4.1-4 40+7.5+6 = 53.5 k; " +
				"λ 0.8 of 2.3.1-3 (NDS 2018 Table N3); CD 1.25 of D + 0.75L + 0.75Lr, the shortest load present being roof live (NDS 2018 2.3.2.2, Table 2.3.2)",
		},
		{
			name: "storage: λ 0.7",
			load: func() Load {
				l := usTakedown(2, 400, 100, 125, 20, 0, 0)
				l.Occupancy = OccStorage
				return l
			}(),
			lrfdGov: "LRFD 2: 1.2D + 1.6L + 0.5Lr", lrfdKip: 233.6,
			asdGov: "ASD 2: D + L", asdKip: 168,
			alpha: 233.6 / 168, beta: 105.6 / 233.6, lambda: 0.7, cd: 1.0,
			src: "hand calc: D = 220×400 = 88 k, Lo = 100 k × 0.80 (ASCE 7-22 4.7.3) = 80 k; 1.2×88+1.6×80 = 233.6 k; " +
				"NDS 2018 Table N3 λ 0.7 for storage live load",
		},
		{
			name:    "roof dead only",
			load:    usTakedown(0, 400, 0, 0, 20, 0, 0),
			lrfdGov: "LRFD 1: 1.4D", lrfdKip: 11.2,
			asdGov: "ASD 1: D", asdKip: 8,
			alpha: 1.4, beta: 1, lambda: 0.6, cd: 0.9,
			src: "hand calc: D = 20×400 = 8 k; ASCE 7-22 2.3.1-1 11.2 k, 2.4.1-1 8 k; NDS 2018 Table 2.3.2 CD 0.9 (permanent)",
		},
		{
			name:    "roof dead and roof live",
			load:    usTakedown(0, 400, 0, 0, 15, 20, 0),
			lrfdGov: "LRFD 3: 1.2D + 1.6Lr + L", lrfdKip: 20,
			asdGov: "ASD 3: D + Lr", asdKip: 14,
			alpha: 20.0 / 14, beta: 7.2 / 20, lambda: 0.8, cd: 1.25,
			src: "hand calc: D = 6 k, Lr = 8 k; ASCE 7-22 2.3.1-3 7.2+12.8 = 20 k, 2.4.1-3 6+8 = 14 k",
		},
	}
	for _, r := range rows {
		t.Run(r.name, func(t *testing.T) {
			for _, m := range []Method{LRFD, ASD} {
				ls, err := Summarize(r.load, m)
				require.NoError(t, err)
				assert.True(t, ls.Known)
				assert.Equal(t, m, ls.Method)
				require.Len(t, ls.Duration, len(ls.Combos))
				require.GreaterOrEqual(t, ls.Governing, 0)
				require.GreaterOrEqual(t, ls.OtherGoverning, 0)
				lrfd, asd := ls.Combos, ls.OtherCombos
				lg, ag := ls.Governing, ls.OtherGoverning
				if m == ASD {
					lrfd, asd, lg, ag = asd, lrfd, ag, lg
				}
				assert.Len(t, lrfd, 5, "ASCE 7-22 2.3.1 gravity combinations 1-3 with Lr and S")
				assert.Len(t, asd, 6, "ASCE 7-22 2.4.1 gravity combinations 1-4 with Lr and S")
				assert.Equal(t, r.lrfdGov, lrfd[lg].Name, r.src)
				assert.Equal(t, r.asdGov, asd[ag].Name, r.src)
				assert.InEpsilon(t, r.lrfdKip*tKip, ls.LRFDN, 1e-9, r.src)
				assert.InEpsilon(t, r.asdKip*tKip, ls.ASDN, 1e-9, r.src)
				want := r.lrfdKip
				if m == ASD {
					want = r.asdKip
				}
				assert.InEpsilon(t, want*tKip, ls.DemandN, 1e-9, r.src)
				assert.InEpsilon(t, r.alpha, ls.StrengthPerService, 1e-9, "α = LRFD/ASD: "+r.src)
				assert.InEpsilon(t, r.beta, ls.BetaDns, 1e-9, "βdns: "+r.src)
				assert.Equal(t, r.lambda, ls.Lambda, "λ of the governing LRFD combination: "+r.src)
				assert.Equal(t, r.cd, ls.CD, "CD of the governing ASD combination: "+r.src)
				assert.Equal(t, ls.Combos[ls.Governing].D, ls.DirectDeadFactor)
				assert.NotEmpty(t, ls.Steps)
				for i, c := range ls.Combos {
					assert.LessOrEqual(t, c.ValueN, ls.DemandN, c.Name)
					assert.InDelta(t, c.D*ls.DeadN+c.L*ls.LiveN+c.Lr*ls.RoofLiveN+c.S*ls.SnowN, c.ValueN, 1e-6, c.Name)
					assert.True(t, strings.HasPrefix(c.Clause, "ASCE 7-22 2."), c.Clause)
					assert.Positive(t, ls.Duration[i])
				}
			}
		})
	}
}

func TestTakedownDurationPerCombo(t *testing.T) {
	// Office four floors of TestTakedownCombinations (D, L, Lr all present, S = 0).
	l := usTakedown(4, 400, 100, 50, 20, 20, 0)
	rows := []struct {
		m    Method
		want []float64
		src  string
	}{
		{LRFD, []float64{0.6, 0.8, 0.8, 0.8, 0.8}, "NDS 2018 Table N3 by combination"},
		{ASD, []float64{0.9, 1.0, 1.25, 0.9, 1.25, 1.0}, "NDS 2018 Table 2.3.2, shortest-duration load present (2.3.2.2); D + S with S = 0 is permanent"},
	}
	for _, r := range rows {
		ls, err := Summarize(l, r.m)
		require.NoError(t, err)
		assert.Equal(t, r.want, ls.Duration, r.src)
	}
}

func TestTakedownDemandAddsSelfWeightToEveryCombination(t *testing.T) {
	office := usTakedown(4, 400, 100, 50, 20, 20, 0)
	lightLive := usTakedown(4, 400, 150, 40, 30, 0, 0)
	lightLive.LiveReduction = false
	rows := []struct {
		name    string
		load    Load
		m       Method
		selfKip float64
		want    float64
		src     string
	}{
		{"office LRFD", office, LRFD, 5, 267.6, "1.2D + 1.6L + 0.5Lr with D + 5 k: 261.6 + 1.2×5"},
		{"office ASD", office, ASD, 5, 208, "D + L with D + 5 k: 203 + 5"},
		{"self-weight flips to 1.4D", lightLive, LRFD, 300, 772.8, "1.4×(252+300) = 772.8 k > 1.2×552 + 1.6×64 = 764.8 k"},
		{"no self-weight", office, LRFD, 0, 261.6, "governing combination unchanged"},
	}
	for _, r := range rows {
		t.Run(r.name, func(t *testing.T) {
			ls, err := Summarize(r.load, r.m)
			require.NoError(t, err)
			assert.InEpsilon(t, r.want*tKip, ls.Demand(r.selfKip*tKip), 1e-9, r.src)
		})
	}
}

// A typed load declares its dead share; D and L and every combination
// follow as in a takedown (ASCE 7-22 2.3.1 and 2.4.1). Hand calculations.
func TestLoadDirectSummary(t *testing.T) {
	rows := []struct {
		m               Method
		share           float64
		deadKN, liveKN  float64
		lrfdKN, asdKN   float64
		alpha, beta     float64
		deadFactor      float64
		lrfdGov, asdGov string
		src             string
	}{
		{LRFD, 0, 500, 250, 1000, 750, 1000.0 / 750, 0.6, 1.2, "LRFD 2: 1.2D + 1.6L", "ASD 2: D + L",
			"hand calc, default s = 2/3: P = 1000 kN = max(1.4s, 1.2s + 1.6(1 − s)) × S = 4/3 S (ASCE 7-22 2.3.1-1, -2), S = 750, D = 500, L = 250; " +
				"βdns = 1.2 × 500 / 1000 = 0.6 (ACI 318-19 6.6.4.4.4); α = 1000/750"},
		{ASD, 0, 1000.0 * 2 / 3, 1000.0 / 3, 1000.0 * 4 / 3, 1000, 4.0 / 3, 0.6, 1.0, "LRFD 2: 1.2D + 1.6L", "ASD 2: D + L",
			"hand calc, default s = 2/3: P = 1000 kN service = D + L (ASCE 7-22 2.4.1-2), D = 666.7, L = 333.3; 1.2D + 1.6L = 1333.3 kN (2.3.1-2)"},
		{ASD, 0.5, 500, 500, 1400, 1000, 1.4, 600.0 / 1400, 1.0, "LRFD 2: 1.2D + 1.6L", "ASD 2: D + L",
			"hand calc, s = 0.5: D = L = 500 kN; 1.2×500 + 1.6×500 = 1400 kN > 1.4×500 = 700 kN (ASCE 7-22 2.3.1-2), so α = 1400/1000 = 1.4 for ASD concrete"},
		{LRFD, 0.5, 1000 / 2.8, 1000 / 2.8, 1000, 1000 / 1.4, 1.4, 0.6 / 1.4, 1.2, "LRFD 2: 1.2D + 1.6L", "ASD 2: D + L",
			"hand calc, s = 0.5: P = 1000 kN = (1.2 × 0.5 + 1.6 × 0.5) S = 1.4 S, so D = L = 357.1 kN"},
		{LRFD, 1, 1000 / 1.4, 0, 1000, 1000 / 1.4, 1.4, 1, 1.4, "LRFD 1: 1.4D", "ASD 1: D",
			"hand calc, s = 1: all dead, 1.4D governs (ASCE 7-22 2.3.1-1), βdns = 1"},
	}
	for _, r := range rows {
		ls, err := Summarize(Load{Mode: LoadDirect, DirectN: 1e6, DeadShare: r.share}, r.m)
		require.NoError(t, err)
		assert.True(t, ls.Known, r.src)
		assert.True(t, ls.Typed, r.src)
		assert.InDelta(t, r.deadKN*1e3, ls.DeadN, 1e-3, "D: "+r.src)
		assert.InDelta(t, r.liveKN*1e3, ls.LiveN, 1e-3, "L: "+r.src)
		assert.InDelta(t, r.lrfdKN*1e3, ls.LRFDN, 1e-3, "LRFD: "+r.src)
		assert.InDelta(t, r.asdKN*1e3, ls.ASDN, 1e-3, "ASD: "+r.src)
		assert.Equal(t, 1e6, ls.DemandN, "the typed load is the governing load of its method")
		assert.InDelta(t, r.alpha, ls.StrengthPerService, 1e-12, "α: "+r.src)
		assert.InDelta(t, r.beta, ls.BetaDns, 1e-12, "βdns: "+r.src)
		lg := ls.Combos[ls.Governing].Name
		if r.m == ASD {
			lg = ls.OtherCombos[ls.OtherGoverning].Name
		}
		assert.Equal(t, r.lrfdGov, strings.Replace(strings.Replace(lg, " + 0.5Lr", "", 1), " + 0.5S", "", 1), r.src)
		assert.InEpsilon(t, 1e6+r.deadFactor*1e4, ls.Demand(1e4), 1e-12, "self-weight with the governing dead factor: "+r.src)
		assert.NotEmpty(t, ls.Steps, "the trace shows the derivation")
	}
	_, err := Summarize(Load{Mode: LoadDirect, DirectN: 1e6}, "wsd")
	var fe *FieldError
	require.True(t, errors.As(err, &fe))
	assert.Equal(t, "method", fe.Field)
	for _, bad := range []float64{-0.1, 1.01, math.NaN(), math.Inf(1)} {
		_, err := Summarize(Load{Mode: LoadDirect, DirectN: 1e6, DeadShare: bad}, LRFD)
		require.True(t, errors.As(err, &fe), "dead share %v", bad)
		assert.Equal(t, "dead-share", fe.Field)
	}
}

func TestLoadValidateNamesField(t *testing.T) {
	base := func() Load { return usTakedown(3, 300, 100, 50, 20, 20, 30) }
	nan, inf := math.NaN(), math.Inf(1)
	rows := []struct {
		name  string
		edit  func(*Load)
		field string
		units []string // substrings the accepted range must show (SI and US)
	}{
		{"tributary zero", func(l *Load) { l.TributaryM2 = 0 }, "tributary", []string{"m²", "ft²"}},
		{"tributary negative", func(l *Load) { l.TributaryM2 = -5 }, "tributary", []string{"m²", "ft²"}},
		{"tributary NaN", func(l *Load) { l.TributaryM2 = nan }, "tributary", []string{"m²", "ft²"}},
		{"tributary Inf", func(l *Load) { l.TributaryM2 = inf }, "tributary", []string{"m²", "ft²"}},
		{"tributary huge", func(l *Load) { l.TributaryM2 = 5001 }, "tributary", []string{"5,000 m²", "53,800 ft²"}},
		{"floors negative", func(l *Load) { l.Floors = -1 }, "floors", []string{"0 to 100"}},
		{"floors too many", func(l *Load) { l.Floors = 101 }, "floors", []string{"0 to 100"}},
		{"dead NaN", func(l *Load) { l.FloorDeadKPa = nan }, "dead", []string{"kPa", "psf"}},
		{"dead negative", func(l *Load) { l.FloorDeadKPa = -0.1 }, "dead", []string{"kPa", "psf"}},
		{"dead huge", func(l *Load) { l.FloorDeadKPa = 51 }, "dead", []string{"50 kPa", "1,040 psf"}},
		{"live Inf", func(l *Load) { l.FloorLiveKPa = inf }, "live", []string{"kPa", "psf"}},
		{"live huge", func(l *Load) { l.FloorLiveKPa = 31 }, "live", []string{"30 kPa", "625 psf"}},
		{"roof dead negative", func(l *Load) { l.RoofDeadKPa = -1 }, "roof-dead", []string{"kPa", "psf"}},
		{"roof dead huge", func(l *Load) { l.RoofDeadKPa = 51 }, "roof-dead", []string{"kPa", "psf"}},
		{"roof live huge", func(l *Load) { l.RoofLiveKPa = 11 }, "roof-live", []string{"10 kPa", "210 psf"}},
		{"roof live -Inf", func(l *Load) { l.RoofLiveKPa = math.Inf(-1) }, "roof-live", []string{"kPa", "psf"}},
		{"snow huge", func(l *Load) { l.SnowKPa = 26 }, "snow", []string{"25 kPa", "520 psf"}},
		{"snow NaN", func(l *Load) { l.SnowKPa = nan }, "snow", []string{"kPa", "psf"}},
		{"kll fractional", func(l *Load) { l.KLL = 2.5 }, "kll", []string{"1, 2, 3 or 4"}},
		{"kll negative", func(l *Load) { l.KLL = -1 }, "kll", []string{"Table 4.7-1"}},
		{"kll too large", func(l *Load) { l.KLL = 5 }, "kll", []string{"Table 4.7-1"}},
		{"kll NaN", func(l *Load) { l.KLL = nan }, "kll", []string{"Table 4.7-1"}},
		{"occupancy unknown", func(l *Load) { l.Occupancy = "office" }, "occupancy", []string{"general, assembly, storage or garage"}},
		{"no load at all", func(l *Load) { *l = usTakedown(3, 300, 0, 0, 0, 0, 0) }, "dead", []string{"kPa", "psf"}},
		{"roof-only column without roof load", func(l *Load) { *l = usTakedown(0, 300, 100, 50, 0, 0, 0) }, "roof-dead", []string{"kPa", "psf"}},
		{"total beyond 200 MN", func(l *Load) { l.Floors, l.FloorDeadKPa, l.TributaryM2 = 100, 50, 5000 }, "tributary", []string{"200 MN", "45,000 kip"}},
		{"total below 1 N", func(l *Load) { l.TributaryM2 = 1e-300 }, "tributary", []string{"1 N", "kip"}},
		{"mode unknown", func(l *Load) { l.Mode = "guess" }, "load mode", []string{"direct or takedown"}},
		{"direct zero", func(l *Load) { *l = Load{Mode: LoadDirect} }, "load", []string{"MN", "kip"}},
		{"direct NaN", func(l *Load) { *l = Load{Mode: LoadDirect, DirectN: nan} }, "load", []string{"MN", "kip"}},
		{"direct huge", func(l *Load) { *l = Load{Mode: LoadDirect, DirectN: 201e6} }, "load", []string{"MN", "kip"}},
	}
	for _, r := range rows {
		t.Run(r.name, func(t *testing.T) {
			l := base()
			r.edit(&l)
			err := l.Validate()
			var fe *FieldError
			require.True(t, errors.As(err, &fe), "want a *FieldError, got %v", err)
			assert.Equal(t, r.field, fe.Field)
			assert.True(t, strings.HasPrefix(err.Error(), r.field+":"), err.Error())
			for _, u := range r.units {
				assert.Contains(t, fe.Accepted, u)
			}
			_, serr := Summarize(l, LRFD)
			assert.Equal(t, err, serr, "Summarize reports the same problem")
		})
	}
}

func TestLoadValidateAccepts(t *testing.T) {
	rows := []struct {
		name string
		edit func(*Load)
	}{
		{"defaults", func(l *Load) {}},
		{"KLL 0 default", func(l *Load) { l.KLL = 0 }},
		{"KLL 1", func(l *Load) { l.KLL = 1 }},
		{"KLL 2", func(l *Load) { l.KLL = 2 }},
		{"KLL 3", func(l *Load) { l.KLL = 3 }},
		{"KLL 4", func(l *Load) { l.KLL = 4 }},
		{"general", func(l *Load) { l.Occupancy = OccGeneral }},
		{"assembly", func(l *Load) { l.Occupancy = OccAssembly }},
		{"storage", func(l *Load) { l.Occupancy = OccStorage }},
		{"garage", func(l *Load) { l.Occupancy = OccGarage }},
		{"roof-only snow", func(l *Load) { *l = usTakedown(0, 300, 0, 0, 0, 0, 30) }},
		{"live only", func(l *Load) { *l = usTakedown(2, 300, 0, 50, 0, 0, 0) }},
		{"largest area", func(l *Load) { l.TributaryM2 = 5000; l.Floors = 1 }},
		{"upper limits", func(l *Load) {
			l.Floors, l.TributaryM2 = 100, 1
			l.FloorDeadKPa, l.FloorLiveKPa, l.RoofDeadKPa, l.RoofLiveKPa, l.SnowKPa = 50, 30, 50, 10, 25
		}},
	}
	for _, r := range rows {
		l := usTakedown(3, 300, 100, 50, 20, 20, 30)
		r.edit(&l)
		assert.NoError(t, l.Validate(), r.name)
	}
}

// checkSummaryFinite asserts that every number in a summary is finite and
// within the ranges the standards allow.
func checkSummaryFinite(t *testing.T, l Load, ls LoadSummary) {
	t.Helper()
	nums := []float64{ls.DeadN, ls.LiveN, ls.LiveRawN, ls.RoofLiveN, ls.SnowN, ls.Reduction, ls.DemandN,
		ls.BetaDns, ls.Lambda, ls.CD, ls.StrengthPerService, ls.DirectDeadFactor, ls.LRFDN, ls.ASDN, ls.Demand(1e4)}
	for _, c := range append(append([]Combo{}, ls.Combos...), ls.OtherCombos...) {
		nums = append(nums, c.ValueN)
	}
	nums = append(nums, ls.Duration...)
	for _, s := range ls.Steps {
		nums = append(nums, s.Value)
	}
	for i, x := range nums {
		if !finite(x) {
			t.Fatalf("non-finite value #%d (%v) for %+v", i, x, l)
		}
	}
	if ls.Reduction < 0.4 || ls.Reduction > 1 || ls.BetaDns < 0 || ls.BetaDns > 1 ||
		ls.StrengthPerService < 1 || ls.StrengthPerService > 2 || ls.DemandN <= 0 {
		t.Fatalf("out of range: reduction %v βdns %v α %v demand %v for %+v",
			ls.Reduction, ls.BetaDns, ls.StrengthPerService, ls.DemandN, l)
	}
	if ls.Lambda != 0.6 && ls.Lambda != 0.7 && ls.Lambda != 0.8 {
		t.Fatalf("λ %v not in NDS 2018 Table N3 for %+v", ls.Lambda, l)
	}
	if ls.CD != 0.9 && ls.CD != 1.0 && ls.CD != 1.15 && ls.CD != 1.25 {
		t.Fatalf("CD %v not in NDS 2018 Table 2.3.2 for %+v", ls.CD, l)
	}
}

func TestTakedownNeverNaN(t *testing.T) {
	rng := rand.New(rand.NewPCG(7, 22))
	pick := func(max float64) float64 {
		switch rng.IntN(5) {
		case 0:
			return 0
		case 1:
			return max
		case 2:
			return 1e-9 * max
		}
		return rng.Float64() * max
	}
	occs := []string{"", OccGeneral, OccAssembly, OccStorage, OccGarage}
	checked := 0
	for range 20000 {
		l := Load{
			Mode: LoadTakedown, TributaryM2: math.Max(pick(maxTributaryM2), 1e-6), Floors: rng.IntN(maxFloors + 1),
			FloorDeadKPa: pick(maxFloorDead), FloorLiveKPa: pick(maxFloorLive), RoofDeadKPa: pick(maxRoofDead),
			RoofLiveKPa: pick(maxRoofLive), SnowKPa: pick(maxSnow), LiveReduction: rng.IntN(4) > 0,
			KLL: float64(rng.IntN(5)), Occupancy: occs[rng.IntN(len(occs))],
		}
		if l.Validate() != nil {
			continue // all-zero or beyond 200 MN: rejected, tested above
		}
		for _, m := range []Method{LRFD, ASD} {
			ls, err := Summarize(l, m)
			require.NoError(t, err)
			checkSummaryFinite(t, l, ls)
		}
		checked++
	}
	assert.Greater(t, checked, 5000, "enough valid inputs were exercised")
}

func FuzzTakedown(f *testing.F) {
	f.Add(30.0, 3, 5.0, 2.4, 4.0, 1.0, 0.0, 4.0, uint8(0), true)
	f.Add(1e-9, 100, 50.0, 30.0, 50.0, 10.0, 25.0, 1.0, uint8(3), true)
	f.Add(5000.0, 0, 0.0, 0.0, 0.0, 0.0, 1e-12, 0.0, uint8(1), false)
	f.Fuzz(func(t *testing.T, a float64, n int, qd, ql, rd, rl, s, kll float64, occ uint8, red bool) {
		occs := []string{"", OccGeneral, OccAssembly, OccStorage, OccGarage, "other"}
		l := Load{Mode: LoadTakedown, TributaryM2: a, Floors: n, FloorDeadKPa: qd, FloorLiveKPa: ql,
			RoofDeadKPa: rd, RoofLiveKPa: rl, SnowKPa: s, KLL: kll, Occupancy: occs[int(occ)%len(occs)], LiveReduction: red}
		ls, err := Summarize(l, LRFD)
		if err != nil {
			var fe *FieldError
			require.True(t, errors.As(err, &fe), "errors are *FieldError: %v", err)
			return
		}
		checkSummaryFinite(t, l, ls)
	})
}

// With a takedown, the self-weight reaching the column is its own and that
// of one column of the same size above each floor carried (a first
// estimate): 3 floors below the roof give 4 storeys of column. A typed load
// counts the column alone. W10X49: 49 lb/ft = 72.9 kg/m (AISC Manual Table
// 1-1, from memory); over 4 m, 4 × 72.9 × 9.80665 × 4 = 11.44 kN.
func TestSelfWeightOfTheColumnsAbove(t *testing.T) {
	sc := DefaultScheme()
	sc.Materials = []string{"steel"}
	sc.Load = Load{Mode: LoadTakedown, TributaryM2: 50, Floors: 3, FloorDeadKPa: 4, FloorLiveKPa: 2.4, RoofDeadKPa: 3}
	m, err := New(sc)
	require.NoError(t, err)
	fi, i, ok := m.Find("W10X49")
	require.True(t, ok)
	st := m.Families[fi].Static(i)
	assert.InDelta(t, 4*st.MassKgPerM*Gravity*4, m.SelfWeightN(st, 4000), 1e-9)
	assert.InDelta(t, 11.44e3, m.SelfWeightN(st, 4000), 0.02e3, "4 storeys of W10X49 over 4 m")
	assert.Contains(t, SelfWeightWords(&sc), "3 columns of the same size above")
	sc.Load = Load{Mode: LoadDirect, DirectN: 1000e3}
	m, err = New(sc)
	require.NoError(t, err)
	assert.InDelta(t, st.MassKgPerM*Gravity*4, m.SelfWeightN(st, 4000), 1e-9, "a typed load: the column alone")
	sc.SelfWeight = false
	assert.Empty(t, SelfWeightWords(&sc))
}
