package steel

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func column(t testing.TB, name string, fy float64) Column {
	t.Helper()
	s, err := Lookup(name)
	require.NoError(t, err)
	c, err := NewColumn(s, fy)
	require.NoError(t, err)
	return c
}

// TestPublishedStrengths checks available strengths against the AISC
// Manual column tables and the AISC Design Examples. Values are from memory
// of those publications; the tolerance of 1 % covers the difference
// between the catalogue's derived properties and the tabulated ones.
func TestPublishedStrengths(t *testing.T) {
	rows := []struct {
		shape  string
		lx, ly float64 // in
		m      Method
		want   float64 // kip
		source string
	}{
		{"W14X132", 360, 360, LRFD, 893, "AISC Design Examples E.1A/E.1B, W14X132 at Lc = 30 ft, φcPn (from memory)"},
		{"W14X132", 360, 360, ASD, 594, "AISC Design Examples E.1A/E.1B, W14X132 at Lc = 30 ft, Pn/Ωc (from memory)"},
		{"W14X90", 360, 180, LRFD, 928, "AISC Design Examples E.1C, W14X90 with Lcx = 30 ft, Lcy = 15 ft, φcPn (from memory)"},
		{"W14X90", 1e-9, 1e-9, LRFD, 1190, "AISC Manual Table 4-1a, W14X90 at Lc = 0, φcPn = φFyAg (from memory)"},
		{"HSS8X8X1/2", 1e-9, 1e-9, LRFD, 608, "AISC Manual Table 4-4, HSS8X8X1/2 at Lc = 0, φcPn (from memory)"},
		{"HSS8X8X1/2", 1e-9, 1e-9, ASD, 404, "AISC Manual Table 4-4, HSS8X8X1/2 at Lc = 0, Pn/Ωc (from memory)"},
		{"HSS12X8X1/2", 1e-9, 1e-9, LRFD, 774, "AISC Manual Table 4-3, HSS12X8X1/2 at Lc = 0, φcPn (from memory)"},
		{"Pipe6STD", 1e-9, 1e-9, LRFD, 164, "AISC Manual Table 4-6, Pipe 6 Std. at Lc = 0, φcPn (from memory)"},
	}
	for _, r := range rows {
		c := column(t, r.shape, 0)
		got := c.Strength(r.lx, r.ly, r.ly, r.m).Available
		assert.InEpsilon(t, r.want, got, 0.01, "%s %s: %s", r.shape, r.m, r.source)
	}
}

// TestHandCalculationSlenderWeb works AISC 360-22 E3, E4 and E7 by hand for
// a W-shape whose web is slender, W14X22 in A992 at Lc = 6 ft, with the
// properties of AISC Manual Table 1-1 (from memory).
func TestHandCalculationSlenderWeb(t *testing.T) {
	// A = 6.49 in², rx = 5.54 in, ry = 1.04 in, Ix = 199 in⁴, Iy = 7.00 in⁴,
	// J = 0.208 in⁴, Cw = 314 in⁶, tw = 0.230 in, h/tw = 53.3, bf/2tf = 7.46.
	// Table B4.1a: web λr = 1.49 √(29000/50) = 35.88 < 53.3, slender;
	//              flange λr = 0.56 √(29000/50) = 13.49 > 7.46, not slender.
	// E2:  Lcy/ry = 72 / 1.04 = 69.23.
	// E3-4: Fey = π² 29000 / 69.23² = 59.72 ksi; Fex = π² 29000 / (72/5.54)² = 1695 ksi.
	// E4-2: Fez = (π² 29000 × 314 / 72² + 11200 × 0.208) / (199 + 7.00)
	//           = (17343 + 2330) / 206 = 95.5 ksi.  Fe = 59.72 ksi (weak axis).
	// E3-2: Fy/Fe = 50 / 59.72 = 0.8373 ≤ 2.25; Fcr = 0.658^0.8373 × 50 = 35.22 ksi.
	// E7.1: λr √(Fy/Fcr) = 35.88 √(50/35.22) = 42.76 < 53.3, so the web is reduced.
	//       c1 = 0.18 (Table E7.1 case a), c2 = (1 − √(1 − 0.72)) / 0.36 = 1.3079 (Eq. E7-4).
	// E7-5: Fel = (1.3079 × 35.88 / 53.3)² × 50 = 38.77 ksi.
	// E7-3: h = 53.3 × 0.230 = 12.26 in; √(Fel/Fcr) = √(38.77/35.22) = 1.0492;
	//       he = 12.26 (1 − 0.18 × 1.0492) × 1.0492 = 10.43 in.
	//       Ae = 6.49 − (12.26 − 10.43) × 0.230 = 6.070 in².
	// E7-1: Pn = 35.22 × 6.070 = 213.8 kip; φcPn = 0.90 × 213.8 = 192.4 kip;
	//       Pn/Ωc = 213.8 / 1.67 = 128.0 kip.
	c := column(t, "W14X22", 0)
	r, err := c.Check(Input{Lx: 72, Ly: 72, Ends: PinnedPinned, Method: LRFD})
	require.NoError(t, err)
	assert.InEpsilon(t, 59.72, r.Fey, 0.01, "Fey, hand calculation Eq. E3-4")
	assert.InEpsilon(t, 95.5, r.Fez, 0.02, "Fez, hand calculation Eq. E4-2 (J, Cw from Table 1-1)")
	assert.InEpsilon(t, 35.22, r.Fcr, 0.01, "Fcr, hand calculation Eq. E3-2")
	assert.InEpsilon(t, 6.070, r.Ae, 0.01, "Ae, hand calculation Eq. E7-3")
	assert.InEpsilon(t, 192.4, r.Available, 0.01, "φcPn, hand calculation Eq. E7-1")
	assert.True(t, r.Mode.Local(), "local buckling of the web reduces the area")
	assert.Equal(t, AxisY, r.Mode.Axis())
	assert.Contains(t, r.Equations, "E7-3 (web)")
	asd := c.Strength(72, 72, 72, ASD).Available
	assert.InEpsilon(t, 128.0, asd, 0.01, "Pn/Ωc, hand calculation")
}

// TestHandCalculationSlenderHSS works AISC 360-22 E3 and E7 by hand for a
// rectangular HSS with slender walls, HSS12X8X3/16 in A500 Gr. C (Fy = 50
// ksi) at Lc = 12 ft, from its nominal dimensions.
func TestHandCalculationSlenderHSS(t *testing.T) {
	// B4.2: t = 0.93 × 0.1875 = 0.1744 in; outside corner radius 2t = 0.3488 in.
	// A = outer rounded rectangle 12 × 8 − 4(1 − π/4)(0.3488)² = 95.896 in²
	//   − inner 11.651 × 7.651 − 4(1 − π/4)(0.1744)² = 89.120 in² = 6.775 in².
	// Iy from the same rounded rectangles = 75.87 in⁴; ry = √(75.87/6.775) = 3.346 in.
	// B4.1b(d): b = 8 − 3t = 7.477 in, b/t = 42.88; h = 12 − 3t = 11.477 in, h/t = 65.82.
	// Table B4.1a case 6: λr = 1.40 √(29000/50) = 33.72: both walls slender.
	// E3-4: Lc/ry = 144 / 3.346 = 43.03; Fe = π² 29000 / 43.03² = 154.6 ksi.
	// E3-2: Fcr = 0.658^(50/154.6) × 50 = 0.658^0.3235 × 50 = 43.67 ksi.
	// E7.1: λr √(Fy/Fcr) = 33.72 √(50/43.67) = 36.08 < 42.88: both walls reduced.
	//       c1 = 0.20 (Table E7.1 case b), c2 = (1 − √0.2)/0.4 = 1.382 (Eq. E7-4).
	// b walls: Fel = (1.382 × 33.72 / 42.88)² × 50 = 59.04 ksi; √(Fel/Fcr) = 1.1628;
	//          be = 7.477 (1 − 0.2 × 1.1628) × 1.1628 = 6.672 in; loss 2 × 0.805 × 0.1744 = 0.281 in².
	// h walls: Fel = (1.382 × 33.72 / 65.82)² × 50 = 25.06 ksi; √(Fel/Fcr) = 0.7575;
	//          he = 11.477 (1 − 0.2 × 0.7575) × 0.7575 = 7.377 in; loss 2 × 4.100 × 0.1744 = 1.430 in².
	// Ae = 6.775 − 0.281 − 1.430 = 5.065 in².
	// E7-1: Pn = 43.67 × 5.065 = 221.2 kip; φcPn = 199.0 kip; Pn/Ωc = 132.4 kip.
	c := column(t, "HSS12X8X3/16", 0)
	r, err := c.Check(Input{Lx: 144, Ly: 144, Ends: PinnedPinned, Method: LRFD})
	require.NoError(t, err)
	assert.InEpsilon(t, 6.775, r.Ag, 0.001, "A, hand calculation")
	assert.InEpsilon(t, 154.6, r.Fe, 0.001, "Fe, hand calculation Eq. E3-4")
	assert.InEpsilon(t, 43.67, r.Fcr, 0.001, "Fcr, hand calculation Eq. E3-2")
	assert.InEpsilon(t, 5.065, r.Ae, 0.001, "Ae, hand calculation Eq. E7-3")
	assert.InEpsilon(t, 199.0, r.Available, 0.001, "φcPn, hand calculation Eq. E7-1")
	assert.InEpsilon(t, 132.4, c.Strength(144, 144, 144, ASD).Available, 0.001, "Pn/Ωc, hand calculation")
	require.Len(t, r.Elements, 2)
	assert.InEpsilon(t, 6.672, r.Elements[0].Effective, 0.001, "be of the b walls")
	assert.InEpsilon(t, 7.377, r.Elements[1].Effective, 0.001, "he of the h walls")
}

// TestHandCalculationThinRound works AISC 360-22 E3 and E7.2 by hand for a
// thin round HSS, HSS20.000X0.250 in A500 Gr. C (Fy = 46 ksi) at Lc = 20 ft.
func TestHandCalculationThinRound(t *testing.T) {
	// B4.2: t = 0.93 × 0.250 = 0.2325 in; D/t = 20 / 0.2325 = 86.02.
	// A = π/4 (20² − 19.535²) = 14.44 in²; I = π/64 (20⁴ − 19.535⁴) = 705.3 in⁴; r = 6.989 in.
	// Table B4.1a case 9: λr = 0.11 × 29000/46 = 69.35 < 86.02 < 0.45 E/Fy = 283.7: slender, E7.2 applies.
	// E7-7: Ae = (0.038 × 29000 / (46 × 86.02) + 2/3) Ag = (0.2785 + 0.6667) × 14.44 = 13.65 in².
	// E3-4: Lc/r = 240 / 6.989 = 34.34; Fe = π² 29000 / 34.34² = 242.7 ksi.
	// E3-2: Fcr = 0.658^(46/242.7) × 46 = 0.658^0.1895 × 46 = 42.49 ksi.
	// E7-1: Pn = 42.49 × 13.65 = 579.9 kip; φcPn = 521.9 kip; Pn/Ωc = 347.2 kip.
	c := column(t, "HSS20.000X0.250", 0)
	r, err := c.Check(Input{Lx: 240, Ly: 240, Ends: PinnedPinned, Method: LRFD})
	require.NoError(t, err)
	assert.InEpsilon(t, 13.65, r.Ae, 0.001, "Ae, hand calculation Eq. E7-7")
	assert.InEpsilon(t, 242.7, r.Fe, 0.001, "Fe, hand calculation Eq. E3-4")
	assert.InEpsilon(t, 42.49, r.Fcr, 0.001, "Fcr, hand calculation Eq. E3-2")
	assert.InEpsilon(t, 521.9, r.Available, 0.001, "φcPn, hand calculation")
	assert.Contains(t, r.Equations, "E7-7")
	assert.True(t, r.Mode.Local())
}

// TestEndConditionK checks the recommended design K of AISC 360-22
// Commentary Table C-A-7.1.
func TestEndConditionK(t *testing.T) {
	rows := []struct {
		e    EndCondition
		name string
		k    float64
	}{
		{FixedFixed, "fixed-fixed", 0.65},    // Table C-A-7.1 case (a)
		{FixedPinned, "fixed-pinned", 0.80},  // case (b)
		{FixedGuided, "fixed-guided", 1.2},   // case (c)
		{PinnedPinned, "pinned-pinned", 1.0}, // case (d)
		{FixedFree, "fixed-free", 2.1},       // case (e)
		{PinnedGuided, "pinned-guided", 2.0}, // case (f)
	}
	for _, r := range rows {
		assert.Equal(t, r.k, r.e.K(), r.name)
		assert.Equal(t, r.name, r.e.String())
		p, err := ParseEndCondition(r.name)
		require.NoError(t, err)
		assert.Equal(t, r.e, p)
	}
	_, err := ParseEndCondition("hinged")
	assert.ErrorContains(t, err, "ends")
	assert.True(t, math.IsNaN(EndCondition(9).K()))
}

// TestKScalesLength checks that K multiplies the unbraced length (AISC
// 360-22 E2: Lc = KL) whether it comes from the end condition or is typed.
func TestKScalesLength(t *testing.T) {
	c := column(t, "W12X65", 0)
	a, err := c.Check(Input{Lx: 200, Ly: 200, Ends: FixedFree, Method: LRFD})
	require.NoError(t, err)
	b, err := c.Check(Input{Lx: 420, Ly: 420, Ends: PinnedPinned, Method: LRFD})
	require.NoError(t, err)
	assert.InDelta(t, b.Available, a.Available, 1e-9)
	k, err := c.Check(Input{Lx: 200, Ly: 200, Ends: PinnedPinned, K: 2.1, Method: LRFD})
	require.NoError(t, err)
	assert.InDelta(t, a.Available, k.Available, 1e-9)
	assert.Equal(t, 2.1, k.K)
}

// TestDefaultGrades checks the default materials: A992 for W, A572 Gr. 50
// for HP, A500 Gr. C for HSS (50 ksi rectangular, 46 ksi round), A53 Gr. B
// for pipe (AISC Manual Table 2-4, common practice).
func TestDefaultGrades(t *testing.T) {
	rows := []struct {
		f  Family
		fy float64
	}{{W, 50}, {HP, 50}, {HSSSquare, 50}, {HSSRect, 50}, {HSSRound, 46}, {Pipe, 35}}
	for _, r := range rows {
		assert.Equal(t, r.fy, DefaultGrade(r.f).Fy, r.f.String())
	}
	c := column(t, "Pipe6STD", 0)
	assert.Equal(t, 35.0, c.Fy())
	c = column(t, "Pipe6STD", 42)
	assert.Equal(t, 42.0, c.Fy())
}

// TestCheckAgreesWithStrength checks that the full and the fast entry
// points give the same numbers for every catalogue shape.
func TestCheckAgreesWithStrength(t *testing.T) {
	cols, err := Columns(Options{})
	require.NoError(t, err)
	for i := range cols {
		c := &cols[i]
		for _, l := range []float64{30, 150, 400} {
			in := Input{Lx: l, Ly: l / 2, Ends: FixedPinned, Method: ASD}
			r, err := c.Check(in)
			require.NoError(t, err, c.Shape.Name)
			q := c.Strength(0.8*l, 0.8*l/2, 0.8*l/2, ASD)
			assert.Equal(t, q.Available, r.Available, c.Shape.Name)
			assert.Equal(t, q.Mode, r.Mode, c.Shape.Name)
			assert.NotEmpty(t, r.Steps)
			assert.NotEmpty(t, r.Plain)
			for _, s := range r.Steps {
				assert.False(t, math.IsNaN(s.Value) || math.IsInf(s.Value, 0), "%s step %s is not finite", c.Shape.Name, s.Quantity)
			}
		}
	}
}

// TestWarningsAndNotes checks the E2 slenderness warning and the E4 note
// for closed sections.
func TestWarningsAndNotes(t *testing.T) {
	c := column(t, "HSS4X4X1/4", 0) // r ≈ 1.5 in
	r, err := c.Check(Input{Lx: 360, Ly: 360, Ends: PinnedPinned})
	require.NoError(t, err)
	require.NotEmpty(t, r.Warnings, "Lc/r about 240 is above the E2 recommendation of 200")
	assert.Contains(t, r.Warnings[0], "200")
	assert.Contains(t, r.Notes[0], "E4")
	// 138 in (11 ft 6 in): Lc/r about 92, well under the E2 recommendation.
	r, err = c.Check(Input{Lx: 138, Ly: 138, Ends: PinnedPinned})
	require.NoError(t, err)
	assert.Empty(t, r.Warnings)
	w := column(t, "W8X31", 0)
	r, err = w.Check(Input{Lx: 138, Ly: 138, Ends: PinnedPinned})
	require.NoError(t, err)
	assert.Empty(t, r.Notes, "E4 is computed for W shapes")
	assert.Contains(t, r.Equations, "E4-2")
}

// TestGoverningWords checks the plain-words modes.
func TestGoverningWords(t *testing.T) {
	c := column(t, "W12X65", 0)
	assert.Equal(t, "yielding (crushing)", c.Strength(12, 12, 12, LRFD).Mode.Words(W))
	assert.Equal(t, "inelastic buckling about the weak axis", c.Strength(150, 150, 150, LRFD).Mode.Words(W))
	assert.Equal(t, "elastic buckling about the weak axis", c.Strength(600, 600, 600, LRFD).Mode.Words(W))
	assert.Equal(t, "inelastic buckling about the strong axis", c.Strength(300, 60, 60, LRFD).Mode.Words(W))
	h := column(t, "HSS12X8X3/16", 0)
	assert.Equal(t, "inelastic buckling about the weak axis, local buckling reduces the effective area",
		h.Strength(144, 144, 144, LRFD).Mode.Words(HSSRect))
}

// TestBadInput checks that bad input gets an error naming the field and
// that the fast path returns a zero result instead of panicking.
func TestBadInput(t *testing.T) {
	c := column(t, "W8X31", 0)
	rows := []struct {
		in    Input
		field string
	}{
		{Input{Lx: math.NaN(), Ly: 100}, "Lx"},
		{Input{Lx: 0, Ly: 100}, "Lx"},
		{Input{Lx: -5, Ly: 100}, "Lx"},
		{Input{Lx: 100, Ly: math.Inf(1)}, "Ly"},
		{Input{Lx: 100, Ly: 5000}, "Ly"},
		{Input{Lx: 100, Ly: 100, Lz: -1}, "Lz"},
		{Input{Lx: 100, Ly: 100, K: 0.2}, "K"},
		{Input{Lx: 100, Ly: 100, K: math.NaN()}, "K"},
		{Input{Lx: 100, Ly: 100, Ends: EndCondition(42)}, "ends"},
		{Input{Lx: 100, Ly: 100, Method: Method(7)}, "method"},
	}
	for _, r := range rows {
		_, err := c.Check(r.in)
		assert.ErrorContains(t, err, r.field, "%+v", r.in)
	}
	for _, fy := range []float64{math.NaN(), math.Inf(1), -50, 10, 500} {
		_, err := NewColumn(c.Shape, fy)
		assert.ErrorContains(t, err, "Fy")
	}
	_, err := NewColumn(nil, 50)
	assert.ErrorContains(t, err, "shape")
	_, err = Lookup("W10X999")
	assert.ErrorContains(t, err, "steel shape")
	_, err = Columns(Options{Fy: math.NaN()})
	assert.ErrorContains(t, err, "Fy")
	for _, l := range []float64{math.NaN(), -1, math.Inf(1)} {
		assert.Equal(t, Strength{}, c.Strength(l, 100, 100, LRFD))
	}
	_, err = ParseFamily("channel")
	assert.ErrorContains(t, err, "steel family")
}

// TestStrengthDoesNotAllocate checks the fast path allocates nothing.
func TestStrengthDoesNotAllocate(t *testing.T) {
	cols, err := Columns(Options{})
	require.NoError(t, err)
	var sink float64
	allocs := testing.AllocsPerRun(20, func() {
		for i := range cols {
			s := cols[i].Strength(150, 150, 150, LRFD)
			sink += s.Available + float64(len(s.Mode.Words(cols[i].Shape.Family)))
		}
	})
	assert.Zero(t, allocs)
	assert.Positive(t, sink)
}

// BenchmarkSteelCatalog evaluates the whole catalogue at one length and
// reports the cost per shape.
func BenchmarkSteelCatalog(b *testing.B) {
	cols, err := Columns(Options{})
	if err != nil {
		b.Fatal(err)
	}
	var sink float64
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		for j := range cols {
			sink += cols[j].Strength(168, 168, 168, LRFD).Available
		}
	}
	b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N*len(cols)), "ns/shape")
	if sink == 0 {
		b.Fatal("no strength computed")
	}
}
