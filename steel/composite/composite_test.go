package composite

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/steel"
)

func column(t *testing.T, name string, mat Materials) Column {
	t.Helper()
	s, err := steel.Lookup(name)
	require.NoError(t, err)
	sec, err := NewSection(s)
	require.NoError(t, err)
	c, err := NewColumn(sec, mat)
	require.NoError(t, err)
	return c
}

// TestHandCalculationSquare works HSS10X10X1/2 filled with 5 ksi concrete,
// A500 Gr. C (Fy = 50 ksi), 14 ft pinned-pinned, by hand from the clauses:
//
//	t = 0.93 × 0.5 = 0.465 in (B4.2); As = 17.2 in², Is = 256 in⁴ (AISC
//	  Manual Table 1-12 / Shapes Database v16.0)
//	Ec = 145^1.5 √5 = 3,904 ksi (I2.1b)
//	b/t = (10 − 3 × 0.465)/0.465 = 18.5 ≤ λp = 2.26 √(29000/50) = 54.4:
//	  compact (Table I1.1a)
//	Ac = (10 − 0.93)² − (4 − π) 0.465² = 82.08 in² (inside corner radius t)
//	Pno = Pp = 50 × 17.2 + 0.85 × 5 × 82.08 = 1,208.8 kip (Eq. I2-9, C2 = 0.85)
//	C3 = 0.45 + 3 × 17.2/99.28 = 0.97 → 0.9 (I2.2b)
//	Ic ≈ 9.07⁴/12 = 564.0 in⁴ (corners neglected)
//	EIeff = 29000 × 256 + 0.9 × 3,904 × 564.0 = 9.406e6 kip·in² (I2.2b)
//	Pe = π² EIeff/168² = 3,289 kip (Eq. I2-5)
//	Pno/Pe = 0.368 ≤ 2.25: Pn = 1,208.8 × 0.658^0.368 = 1,036.5 kip (Eq. I2-2)
//	φc Pn = 0.75 × 1,036.5 = 777.4 kip (I2.1b); Pn/Ωc = 518.2 kip
func TestHandCalculationSquare(t *testing.T) {
	c := column(t, "HSS10X10X1/2", Materials{Fy: 50, Fc: 5})
	assert.InEpsilon(t, 3904.2, c.Ec(), 0.001, "Ec, I2.1b")
	assert.Equal(t, Compact, c.Class(), "Table I1.1a")
	assert.InDelta(t, 18.5, c.Lambda(), 0.05, "b/t, B4.1b(d)")
	assert.InEpsilon(t, 54.43, c.Limits().LambdaP, 0.001, "λp, Table I1.1a")
	assert.InEpsilon(t, 1208.8, c.Pno(), 0.01, "Eq. I2-9")
	assert.Equal(t, 0.9, c.C3(), "C3 capped at 0.9, I2.2b")
	in := steel.Input{Lx: 168, Ly: 168, Ends: steel.PinnedPinned, Method: steel.LRFD}
	r, err := c.Check(in)
	require.NoError(t, err)
	assert.InEpsilon(t, 9.406e6, r.EIx, 0.01, "EIeff, I2.2b")
	assert.InEpsilon(t, 3289, r.Pe, 0.01, "Eq. I2-5")
	assert.InEpsilon(t, 1036.5, r.Pn, 0.01, "Eq. I2-2")
	assert.InEpsilon(t, 777.4, r.Available, 0.01, "φc = 0.75, I2.1b")
	assert.Contains(t, r.Equations, "I2-9")
	assert.Contains(t, r.Equations, "I2-2")
	in.Method = steel.ASD
	r, err = c.Check(in)
	require.NoError(t, err)
	assert.InEpsilon(t, 518.2, r.Available, 0.01, "Ωc = 2.00, I2.1b")
}

// TestHandCalculationRound works HSS10.000X0.500 filled with 5 ksi
// concrete, A500 Gr. C round (Fy = 46 ksi), by hand from the clauses:
//
//	t = 0.465 in; As = 13.9 in², Is = 159 in⁴ (AISC Manual Table 1-13 /
//	  Shapes Database v16.0)
//	D/t = 21.5 ≤ λp = 0.15 × 29000/46 = 94.6: compact (Table I1.1a)
//	Ac = π/4 × 9.07² = 64.61 in²; Ic = π/64 × 9.07⁴ = 332.2 in⁴
//	Pno = Pp = 46 × 13.9 + 0.95 × 5 × 64.61 = 946.3 kip (Eq. I2-9, C2 = 0.95)
//	C3 = 0.45 + 3 × 13.9/78.51 = 0.98 → 0.9 (I2.2b)
//	EIeff = 29000 × 159 + 0.9 × 3,904 × 332.2 = 5.778e6 kip·in²
//	14 ft, K = 1: Pe = π² EIeff/168² = 2,020.6 kip (Eq. I2-5); Pno/Pe = 0.468;
//	  Pn = 946.3 × 0.658^0.468 = 777.9 kip (Eq. I2-2); φc Pn = 583.4 kip
//	40 ft, K = 1: Pe = π² EIeff/480² = 247.5 kip; Pno/Pe = 3.82 > 2.25;
//	  Pn = 0.877 × 247.5 = 217.1 kip (Eq. I2-3); Pn/Ωc = 108.5 kip
func TestHandCalculationRound(t *testing.T) {
	c := column(t, "HSS10.000X0.500", Materials{Fy: 46, Fc: 5})
	assert.Equal(t, Compact, c.Class(), "Table I1.1a")
	assert.InEpsilon(t, 94.57, c.Limits().LambdaP, 0.001, "λp = 0.15 E/Fy, Table I1.1a")
	assert.InEpsilon(t, 946.3, c.Pno(), 0.01, "Eq. I2-9 with C2 = 0.95")
	r, err := c.Check(steel.Input{Lx: 168, Ly: 168, Ends: steel.PinnedPinned, Method: steel.LRFD})
	require.NoError(t, err)
	assert.InEpsilon(t, 5.778e6, r.EIx, 0.01, "EIeff, I2.2b")
	assert.InEpsilon(t, 2020.6, r.Pe, 0.01, "Eq. I2-5")
	assert.InEpsilon(t, 583.4, r.Available, 0.01, "Eq. I2-2, φc = 0.75")
	r, err = c.Check(steel.Input{Lx: 480, Ly: 480, Ends: steel.PinnedPinned, Method: steel.ASD})
	require.NoError(t, err)
	assert.InEpsilon(t, 247.5, r.Pe, 0.01, "Eq. I2-5")
	assert.InEpsilon(t, 108.5, r.Available, 0.01, "Eq. I2-3, Ωc = 2.00")
	assert.Contains(t, r.Equations, "I2-3")
	assert.Equal(t, Elastic, r.Mode.Regime())
}

// box builds a synthetic square section with a chosen wall ratio, so the
// classification boundaries can be reached exactly.
func box(lambda float64) Section {
	const B, t = 12.0, 0.2
	s := Section{Name: "test box", H: B, B: B, T: t, As: 4 * (B - t) * t, WallBT: lambda, WallHT: lambda, SteelLbPerFt: 10}
	s.Isx = (math.Pow(B, 4) - math.Pow(B-2*t, 4)) / 12
	s.Isy = s.Isx
	s.Ac = (B - 2*t) * (B - 2*t)
	s.Icx = math.Pow(B-2*t, 4) / 12
	s.Icy = s.Icx
	return s
}

// TestPnoContinuousAtLimits checks Eq. I2-9, I2-10 and I2-11 meet at λp and
// λr (the noncompact interpolation runs from Pp to Py, and 9Es/λr² = Fy at
// λr = 3.00√(E/Fy): AISC 360-22 I2.2b as recalled).
func TestPnoContinuousAtLimits(t *testing.T) {
	mat := Materials{Fy: 50, Fc: 6}
	lim := TableI11a(false, 50)
	at := func(l float64) Column {
		c, err := NewColumn(box(l), mat)
		require.NoError(t, err)
		return c
	}
	below, above := at(lim.LambdaP-1e-9), at(lim.LambdaP+1e-9)
	assert.Equal(t, Compact, below.Class())
	assert.Equal(t, Noncompact, above.Class())
	assert.InEpsilon(t, below.Pno(), above.Pno(), 1e-6)
	below, above = at(lim.LambdaR-1e-9), at(lim.LambdaR+1e-9)
	assert.Equal(t, Noncompact, below.Class())
	assert.Equal(t, Slender, above.Class())
	assert.InEpsilon(t, below.Pno(), above.Pno(), 1e-6)
	_, err := NewColumn(box(lim.LambdaMax+0.1), mat)
	assert.ErrorContains(t, err, "Table I1.1a")

	// Round: Fcr of Eq. I2-13 at λr is 0.72/0.19^0.2 = 1.003 Fy, within 0.5 %.
	rl := TableI11a(true, 46)
	assert.InEpsilon(t, 46.0, 0.72*46/math.Pow(rl.LambdaR*46/Es, 0.2), 0.005)
}

// TestStrengthNeverRisesWithLength checks every filled tube of every family
// loses strength as it gets longer, and that Check agrees with Strength.
func TestStrengthNeverRisesWithLength(t *testing.T) {
	for _, f := range Families {
		cols, err := Prepare(f, Materials{Fy: steel.DefaultGrade(f).Fy, Fc: 5})
		require.NoError(t, err)
		require.NotEmpty(t, cols)
		for i := range cols {
			c := &cols[i]
			assert.LessOrEqual(t, c.Lambda(), c.Limits().LambdaMax, c.Sec.Name)
			prev := math.Inf(1)
			for L := 12.0; L <= 600; L += 24 {
				s := c.Strength(L, L, steel.LRFD)
				require.NotZero(t, s.Mode, c.Sec.Name)
				assert.LessOrEqual(t, s.Available, prev*(1+1e-12), c.Sec.Name)
				assert.False(t, math.IsNaN(s.Available) || math.IsInf(s.Available, 0))
				prev = s.Available
			}
			r, err := c.Check(steel.Input{Lx: 200, Ly: 150, Ends: steel.FixedPinned, Method: steel.ASD})
			require.NoError(t, err)
			q := c.Strength(0.8*200, 0.8*150, steel.ASD)
			assert.Equal(t, q.Available, r.Available, c.Sec.Name)
			assert.Equal(t, q.Mode, r.Mode, c.Sec.Name)
		}
	}
}

// TestRectangularBothAxes checks a rectangular tube buckles about its weak
// axis when both lengths are equal and about its strong axis when the weak
// axis is braced at mid-height (I2.1b about each axis).
func TestRectangularBothAxes(t *testing.T) {
	c := column(t, "HSS12X6X1/2", Materials{Fy: 50, Fc: 5})
	s := c.Strength(240, 240, steel.LRFD)
	assert.Equal(t, AxisY, s.Mode.Axis())
	assert.Contains(t, s.Mode.Words(false), "weak axis")
	s2 := c.Strength(240, 60, steel.LRFD)
	assert.Equal(t, AxisX, s2.Mode.Axis())
	assert.Greater(t, s2.Available, s.Available)
}

// TestBadInput checks constructors name the field and the accepted range.
func TestBadInput(t *testing.T) {
	s, _ := steel.Lookup("HSS8X8X1/2")
	sec, err := NewSection(s)
	require.NoError(t, err)
	for _, m := range []Materials{{Fy: 50, Fc: 2.9}, {Fy: 50, Fc: 10.5}, {Fy: 50, Fc: math.NaN()}, {Fy: math.Inf(1), Fc: 5}, {Fy: 50, Fc: 5, Wc: 300}} {
		_, err := NewColumn(sec, m)
		assert.Error(t, err, "%+v", m)
	}
	_, err = NewColumn(sec, Materials{Fy: 50, Fc: 2})
	assert.ErrorContains(t, err, "fill f'c")
	w, _ := steel.Lookup("W14X90")
	_, err = NewSection(w)
	assert.ErrorContains(t, err, "only square, rectangular and round HSS")
	_, err = NewSection(nil)
	assert.Error(t, err)
	for _, bad := range []func(*Section){
		func(s *Section) { s.As = math.Inf(1) },
		func(s *Section) { s.Icx = math.NaN() },
		func(s *Section) { s.WallBT, s.WallHT = 0, 0 },
		func(s *Section) { s.T = -1 },
		func(s *Section) { s.SteelLbPerFt = math.NaN() },
	} {
		s2 := sec
		bad(&s2)
		_, err := NewColumn(s2, Materials{Fy: 50, Fc: 5})
		assert.ErrorContains(t, err, "section")
	}
	_, err = Prepare(steel.W, Materials{Fy: 50, Fc: 5})
	assert.Error(t, err)
	c := column(t, "HSS8X8X1/2", Materials{Fy: 50, Fc: 5})
	assert.Zero(t, c.Strength(math.NaN(), 100, steel.LRFD).Mode)
	assert.Zero(t, c.Strength(-1, 100, steel.LRFD).Mode)
	_, err = c.Check(steel.Input{Lx: 0, Ly: 10, Ends: steel.PinnedPinned})
	assert.ErrorContains(t, err, "Lx")
}

// TestHighGradeHeldTo80 checks a wall grade above 80 ksi is used at 80 ksi
// (AISC 360-22 I1.3(b), from memory).
func TestHighGradeHeldTo80(t *testing.T) {
	a := column(t, "HSS8X8X1/2", Materials{Fy: 100, Fc: 5})
	b := column(t, "HSS8X8X1/2", Materials{Fy: 80, Fc: 5})
	assert.Equal(t, b.Pno(), a.Pno())
	r, err := a.Check(steel.Input{Lx: 120, Ly: 120, Ends: steel.PinnedPinned})
	require.NoError(t, err)
	assert.NotEmpty(t, r.Notes)
	assert.Contains(t, r.Notes[0], "I1.3")
}

// TestStrengthDoesNotAllocate checks the fast path allocates nothing.
func TestStrengthDoesNotAllocate(t *testing.T) {
	cols, err := Prepare(steel.HSSRect, Materials{Fy: 50, Fc: 5})
	require.NoError(t, err)
	n := testing.AllocsPerRun(20, func() {
		for i := range cols {
			s := cols[i].Strength(150, 150, steel.LRFD)
			_ = s.Mode.Words(cols[i].Symmetric())
		}
	})
	assert.Zero(t, n)
}

// TestSlenderRoundUsesI213 checks a thin round tube is classified and its
// Fcr follows Eq. I2-13: HSS20.000X0.250 at Fy = 46 ksi has D/t = 86 < λp,
// so a thinner synthetic wall is used to reach the slender range.
func TestSlenderRoundUsesI213(t *testing.T) {
	const D, tw, fy = 20.0, 0.12, 46.0
	di := D - 2*tw
	sec := Section{Name: "thin tube", Round: true, D: D, T: tw, DT: D / tw, SteelLbPerFt: 25,
		As: math.Pi / 4 * (D*D - di*di), Isx: math.Pi / 64 * (D*D*D*D - di*di*di*di),
		Ac: math.Pi / 4 * di * di, Icx: math.Pi / 64 * di * di * di * di}
	sec.Isy, sec.Icy = sec.Isx, sec.Icx
	c, err := NewColumn(sec, Materials{Fy: fy, Fc: 4})
	require.NoError(t, err)
	require.Equal(t, Slender, c.Class(), "D/t = 166.7 > λr = 0.19 E/Fy = 119.8")
	fcr := 0.72 * fy / math.Pow(D/tw*fy/Es, 0.2) // Eq. I2-13
	assert.InEpsilon(t, fcr*sec.As+0.7*4*sec.Ac, c.Pno(), 1e-9, "Eq. I2-11")
}
