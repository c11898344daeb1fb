package concrete

import (
	"math"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func TestMomentMagnifierByHand(t *testing.T) {
	// 16x16 in, 8 #9, f'c = 5 ksi, lu = 20 ft = 240 in, pinned-pinned (k = 1.0), βdns = 0.6, Pu = 400 kip.
	//   k·lu/r = 240/(0.3 × 16) = 50 > 34 + 12(−1) = 22 → slender (ACI 318-19 6.2.5.1)
	//   Ec = 57,000√5,000 = 4,030.5 ksi; Ig = 16⁴/12 = 5,461.33 in⁴
	//   (EI)eff = 0.4(4,030.5)(5,461.33)/1.6 = 5,502,988 kip-in²          (Eq. 6.6.4.4.4a)
	//   Pc = π²(5,502,988)/240² = 942.92 kip                               (Eq. 6.6.4.4.2)
	//   δ = 1.0/(1 − 400/(0.75 × 942.92)) = 1/(1 − 0.56563) = 2.3021      (Eq. 6.6.4.5.2)
	//   M2,min = 400(0.6 + 0.03 × 16) = 432.0 kip-in                       (Eq. 6.6.4.5.4)
	//   Mc = 2.3021 × 432.0 = 994.5 kip-in
	sq := square16(t)
	c := pinned(240 * MMPerInch)
	m := sq.Magnify(AxisX, 400*NPerKip, c.LuXMM, &c)
	assert.InDelta(t, 5502988, m.EIeff/(NPerKip*in2), 5, "(EI)eff by hand")
	assert.InDelta(t, 942.92, m.Pc/NPerKip, 0.01, "Pc by hand")
	assert.InDelta(t, 2.3021, m.Delta, 1e-4, "δ by hand")
	assert.InDelta(t, 432.0, m.M2min/kipIn, 1e-6, "M2,min by hand")
	assert.InDelta(t, 994.5, m.Mc/kipIn, 0.1, "Mc by hand")
	// (b): Ise = 6 bars × 1.00 in² × 5.561² = 185.55 in⁴;
	// (EI)eff = (0.2 × 4,030.5 × 5,461.33 + 29,000 × 185.55)/1.6 = 6,114,557 kip-in²; Pc = 1,047.71 kip.
	c.EI = EIWithSteel
	mb := sq.Magnify(AxisX, 400*NPerKip, c.LuXMM, &c)
	assert.InDelta(t, 6114557, mb.EIeff/(NPerKip*in2), 5, "(EI)eff by Eq. 6.6.4.4.4b by hand")
	assert.InDelta(t, 1047.71, mb.Pc/NPerKip, 0.01)
	// With Cm = 1.0 a small load gives δ close to 1, never below.
	assert.InDelta(t, 1.0, sq.Magnify(AxisX, 1, c.LuXMM, &c).Delta, 1e-6)
}

func TestSlenderStrengthSitsOnTheDiagram(t *testing.T) {
	// At the strength found, the magnified minimum moment equals the diagram's φMn (ACI 318-19 6.6.4.5).
	sq := square16(t)
	c := pinned(240 * MMPerInch)
	q := sq.Quick(&c)
	require.True(t, q.Permitted)
	require.Equal(t, SlenderY, q.Mode)
	m := sq.Magnify(AxisY, q.PhiPn, c.LuYMM, &c)
	assert.InDelta(t, sq.PhiMnAt(AxisY, q.PhiPn), m.Mc, 1e-4*m.Mc)
	assert.Less(t, q.PhiPn, 0.75*m.Pc)
	assert.Less(t, q.PhiPn, sq.PhiPnMax)
	assert.InDelta(t, 50.0, q.KLR, 1e-9)
}

func TestSlendernessLimits(t *testing.T) {
	rows := []struct {
		ends Ends
		m1m2 float64
		want float64
		src  string
	}{
		{PinnedPinned, -1, 22, "ACI 318-19 6.2.5.1(b): 34 + 12(−1)"},
		{PinnedPinned, 0, 34, "ACI 318-19 6.2.5.1(b): 34 + 12(0)"},
		{FixedFixed, 0.5, 40, "ACI 318-19 6.2.5.1(c): at most 40"},
		{FixedPinned, 1, 40, "ACI 318-19 6.2.5.1(c)"},
		{FixedFree, -1, 22, "ACI 318-19 6.2.5.1(a): sway"},
		{FixedGuided, 1, 22, "ACI 318-19 6.2.5.1(a): sway"},
	}
	for _, r := range rows {
		c := Conditions{Ends: r.ends, M1M2: r.m1m2}
		assert.Equal(t, r.want, c.SlendernessLimit(), r.src)
	}
	kRows := []struct {
		ends Ends
		k    float64
	}{
		{FixedFixed, 0.65}, {FixedPinned, 0.80}, {FixedGuided, 1.2}, {PinnedPinned, 1.0}, {FixedFree, 2.1}, {PinnedGuided, 2.0},
	}
	for _, r := range kRows {
		assert.Equal(t, r.k, r.ends.K(), "K for %s: recommended design values (AISC 360-22 Commentary Table C-A-7.1, from memory)", r.ends)
		want := r.k
		if !r.ends.Sway() {
			want = 1.0 // ACI 318-19 6.6.4.4.3 simplification (from memory)
		}
		assert.Equal(t, want, r.ends.KSimplified(), "simplified k for %s", r.ends)
	}
}

func TestTooSlenderIsNotPermitted(t *testing.T) {
	// 16x16 in at 40 ft pinned: k·lu/r = 480/4.8 = 100 exactly is permitted; 41 ft is 102.5 > 100 (ACI 318-19 6.2.6).
	sq := square16(t)
	c := pinned(480 * MMPerInch)
	assert.True(t, sq.Quick(&c).Permitted)
	c = pinned(492 * MMPerInch)
	q := sq.Quick(&c)
	assert.False(t, q.Permitted)
	assert.Zero(t, q.PhiPn)
	assert.Equal(t, NotPermitted, q.Mode)
	assert.Contains(t, q.Reason, "second-order analysis")
	r, err := sq.Evaluate(c)
	require.NoError(t, err)
	require.NotEmpty(t, r.Warnings)
	assert.Contains(t, r.Warnings[0], "6.2.6")
	assert.Contains(t, r.Summary, "second-order analysis")
}

func TestStrengthNeverRisesWithLength(t *testing.T) {
	cat, err := Catalogue(CatalogueOptions{})
	require.NoError(t, err)
	for _, s := range cat {
		for _, ends := range []Ends{FixedFixed, PinnedPinned, FixedFree, FixedGuided} {
			for _, m1m2 := range []float64{-1, 0.5} {
				prev := math.Inf(1)
				for lu := 500.0; lu <= 16000; lu += 250 {
					c := Conditions{LuXMM: lu, LuYMM: lu * 0.7, Ends: ends, M1M2: m1m2, BetaDns: 0.6}
					q := s.Quick(&c)
					if !q.Permitted {
						prev = 0
						continue
					}
					require.LessOrEqual(t, q.PhiPn, s.PhiPnMax, "%s never above φPn,max", s.Designation)
					require.LessOrEqual(t, q.PhiPn, prev*(1+1e-6), "%s %s at %.0f mm rises with length", s.Designation, ends, lu)
					require.Greater(t, q.PhiPn, 0.0)
					prev = q.PhiPn
				}
			}
		}
	}
}

func TestInputsMoveStrengthTheRightWay(t *testing.T) {
	sq := square16(t)
	base := pinned(6000)
	q0 := sq.Quick(&base)
	more := base
	more.BetaDns = 1
	assert.Less(t, sq.Quick(&more).PhiPn, q0.PhiPn, "more sustained load, less stiffness (Eq. 6.6.4.4.4)")
	fixed := base
	fixed.K = 0.65
	assert.Greater(t, sq.Quick(&fixed).PhiPn, q0.PhiPn, "typed k = 0.65 is stronger than k = 1")
	fixed.K, fixed.Ends = 0, FixedFixed
	k065 := fixed
	k065.K = 0.65
	assert.Equal(t, sq.Quick(&k065).PhiPn, sq.Quick(&fixed).PhiPn, "nonsway fixed-fixed takes its recommended design k = 0.65 (AISC 360-22 C-A-7.1, from memory), as steel and timber do")
	fixed.NonswayK1 = true
	assert.Equal(t, q0.PhiPn, sq.Quick(&fixed).PhiPn, "with the simplification, nonsway fixed-fixed takes k = 1.0 like pinned-pinned (ACI 318-19 6.6.4.4.3, from memory)")
	typed := base
	typed.K = 1.0
	assert.Equal(t, q0.PhiPn, sq.Quick(&typed).PhiPn, "typed K = 1 equals pinned-pinned")
	base = pinned(4000)
	q0 = sq.Quick(&base)
	sway := base
	sway.Ends = FixedFree
	qs := sq.Quick(&sway)
	assert.Less(t, qs.PhiPn, q0.PhiPn, "k = 2.1 sway is weaker")
	assert.Equal(t, SwayY, qs.Mode)
	r, err := sq.Evaluate(sway)
	require.NoError(t, err)
	var story bool
	for _, st := range r.Steps {
		if strings.Contains(st.Formula, "treated as its own story") {
			story = true
		}
	}
	assert.True(t, story, "the trace says the sway column is its own story")
}

func TestQuickMatchesEvaluate(t *testing.T) {
	cat, err := Catalogue(CatalogueOptions{Series: SeriesSI})
	require.NoError(t, err)
	for i := 0; i < len(cat); i += 13 {
		s := cat[i]
		for _, ends := range []Ends{FixedPinned, PinnedGuided} {
			c := Conditions{LuXMM: 7000, LuYMM: 3500, Ends: ends, M1M2: 0, BetaDns: 0.5, EI: EIWithSteel}
			q := s.Quick(&c)
			r, err := s.Evaluate(c)
			require.NoError(t, err)
			assert.Equal(t, q, r.Quick)
			assert.NotEmpty(t, r.Steps)
			assert.NotEmpty(t, r.Summary)
			assert.InDelta(t, math.Min(r.Axes[0].PhiPn, r.Axes[1].PhiPn), q.PhiPn, 1e-9)
		}
	}
}

func TestQuickDoesNotAllocate(t *testing.T) {
	sq := square16(t)
	c := pinned(7000)
	allocs := testing.AllocsPerRun(200, func() { _ = sq.Quick(&c) })
	assert.Zero(t, allocs)
	bad := Conditions{LuXMM: math.NaN()}
	allocs = testing.AllocsPerRun(200, func() { _ = sq.Quick(&bad) })
	assert.Zero(t, allocs)
}

func TestBadInputs(t *testing.T) {
	good := Spec{Shape: Rectangular, WidthMM: 400, DepthMM: 400, Transverse: Tied, FcMPa: 35, Grade: 60, BarSize: 8, NBars: 8, CoverMM: 40}
	_, err := NewSection(good)
	require.NoError(t, err)
	rows := []struct {
		name  string
		edit  func(*Spec)
		field string
	}{
		{"zero cover", func(s *Spec) { s.CoverMM = 0 }, "cover"},
		{"NaN cover", func(s *Spec) { s.CoverMM = math.NaN() }, "cover"},
		{"bars that do not fit", func(s *Spec) { s.BarSize, s.NBars = 11, 40 }, "bars"},
		{"f'c too low", func(s *Spec) { s.FcMPa = 20 }, "f'c"},
		{"f'c too high", func(s *Spec) { s.FcMPa = 100 }, "f'c"},
		{"f'c NaN", func(s *Spec) { s.FcMPa = math.NaN() }, "f'c"},
		{"width Inf", func(s *Spec) { s.WidthMM = math.Inf(1) }, "width"},
		{"width absurd", func(s *Spec) { s.WidthMM = 20 }, "width"},
		{"depth below width", func(s *Spec) { s.DepthMM = 300 }, "depth"},
		{"grade", func(s *Spec) { s.Grade = 40 }, "bar grade"},
		{"bar size", func(s *Spec) { s.BarSize = 12 }, "bar size"},
		{"too few bars", func(s *Spec) { s.NBars = 2 }, "bars"},
		{"odd count on a square", func(s *Spec) { s.NBars = 6 }, "bars"},
		{"ρg below 1%", func(s *Spec) { s.BarSize, s.NBars = 5, 4 }, "reinforcement ratio"},
		{"spiral rectangle", func(s *Spec) { s.Transverse = Spiral }, "transverse"},
	}
	for _, r := range rows {
		sp := good
		r.edit(&sp)
		s, err := NewSection(sp)
		assert.Nil(t, s, r.name)
		var ie *InputError
		if assert.ErrorAs(t, err, &ie, r.name) {
			assert.Equal(t, r.field, ie.Field, r.name)
			assert.NotEmpty(t, ie.Accepted, r.name)
		}
	}
	sq := square16(t)
	for _, c := range []Conditions{
		{LuXMM: math.NaN(), LuYMM: 3000, Ends: PinnedPinned},
		{LuXMM: 3000, LuYMM: -1, Ends: PinnedPinned},
		{LuXMM: 3000, LuYMM: 3000, Ends: Ends(9)},
		{LuXMM: 3000, LuYMM: 3000, Ends: PinnedPinned, K: 0.2},
		{LuXMM: 3000, LuYMM: 3000, Ends: PinnedPinned, M1M2: 2},
		{LuXMM: 3000, LuYMM: 3000, Ends: PinnedPinned, BetaDns: math.Inf(1)},
	} {
		_, err := sq.Evaluate(c)
		assert.Error(t, err)
		q := sq.Quick(&c)
		assert.False(t, q.Permitted)
		assert.Equal(t, ReasonBadInput, q.Reason)
	}
	_, err = Catalogue(CatalogueOptions{FcMPa: 5})
	assert.ErrorContains(t, err, "f'c")
	_, err = Catalogue(CatalogueOptions{RhoMax: 0.2})
	assert.ErrorContains(t, err, "rho-max")
}

func TestSecondOrderCap(t *testing.T) {
	// With Cap14 the load is held to δ ≤ 1.4 (ACI 318-19 6.2.5.3): Pu = 0.75Pc(1 − 1/1.4) = 0.2143Pc.
	// 16x16 in at 6 m pinned: Pc = π² × 0.4EcIg/1.6 / 6,000² = 4,330 kN (trace above) → Pu = 927.9 kN.
	sq := square16(t)
	c := pinned(6000)
	free := sq.Quick(&c)
	c.Cap14 = true
	q := sq.Quick(&c)
	assert.Equal(t, SecondOrderY, q.Mode)
	m := sq.Magnify(AxisY, q.PhiPn, c.LuYMM, &c)
	assert.InDelta(t, 0.75*m.Pc*(1-1/1.4), q.PhiPn, 1e-6*q.PhiPn)
	assert.InDelta(t, 927.9, q.PhiPn/1e3, 0.5, "0.75 × 4,330 × (1 − 1/1.4)")
	assert.InDelta(t, 1.4, m.Delta, 1e-9)
	assert.Less(t, q.PhiPn, free.PhiPn)
	r, err := sq.Evaluate(c)
	require.NoError(t, err)
	assert.Equal(t, q, r.Quick)
	assert.Contains(t, r.Summary, "6.2.5.3")
	// A short column is not affected.
	c = pinned(2000)
	c.Cap14 = true
	assert.Equal(t, Crushing, sq.Quick(&c).Mode)
}

// (EI)eff by ACI 318-19 Eq. 6.6.4.4.4c with I from Table 6.6.3.1.1(b)
// (from memory), by hand for the 16 in square, 8 #9 (Ast = 8.00 in²),
// f'c = 5,000 psi, Grade 60, βdns = 0.6:
//
//	P0 = 0.85(5)(256 − 8) + 60(8) = 1,534 kip                     (Eq. 22.4.2.2)
//	e0/h = (0.6 + 0.03·16)/16 = 0.0675                             (Mu = Pu·e0, Eq. 6.6.4.5.4)
//	at Pu = 1,400 kip: I/Ig = (0.80 + 25·8/256)(1 − 0.0675 − 0.5·1,400/1,534)
//	    = 1.58125 × 0.47618 = 0.75295                              (Table 6.6.3.1.1(b))
//	(EI)eff = 4,030.5 × 0.75295 × 5,461.33 / 1.6 = 10,358,746 kip-in²
//	Pc = π²(10,358,746)/240² = 1,774.94 kip                       (Eq. 6.6.4.4.2)
//	at Pu = 400 kip the product is 1.268, held to 0.875 (Table 6.6.3.1.1(b) upper limit).
func TestEIMemberByHand(t *testing.T) {
	sq := square16(t)
	assert.InDelta(t, 0.75295, sq.MemberI(AxisX, 1400*NPerKip), 1e-4, "I/Ig by hand")
	assert.Equal(t, 0.875, sq.MemberI(AxisX, 400*NPerKip), "upper limit 0.875Ig")
	c := pinned(240 * MMPerInch)
	c.EI = EIMember
	m := sq.Magnify(AxisX, 1400*NPerKip, c.LuXMM, &c)
	assert.InDelta(t, 10358746, m.EIeff/(NPerKip*in2), 50, "(EI)eff by Eq. 6.6.4.4.4c by hand")
	assert.InDelta(t, 1774.94, m.Pc/NPerKip, 0.05, "Pc by hand")

	// Each of (a), (b), (c) is permitted: the largest is at least each one.
	var best float64
	for _, ei := range []EIMethod{EIGross, EIWithSteel, EIMember} {
		c.EI = ei
		best = math.Max(best, sq.Quick(&c).PhiPn)
	}
	c.EI = EILargest
	assert.Equal(t, best, sq.Quick(&c).PhiPn, "largest of (a), (b), (c)")
	// (c) gives this lightly reinforced slender column more than (a).
	ca, cc := c, c
	ca.EI, cc.EI = EIGross, EIMember
	assert.Greater(t, sq.Quick(&cc).PhiPn, sq.Quick(&ca).PhiPn)
	// The strength under (c) satisfies the check with I at its own load:
	// δ from Pc at that load keeps δ·M2,min inside the diagram.
	q := sq.Quick(&cc)
	mq := sq.Magnify(AxisX, q.PhiPn, cc.LuXMM, &cc)
	assert.LessOrEqual(t, mq.Mc, sq.PhiMnAt(AxisX, q.PhiPn)*(1+1e-6))
}
