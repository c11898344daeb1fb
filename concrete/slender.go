package concrete

import (
	"fmt"
	"math"
)

// Ends is one of the six idealized end conditions (bottom–top).
type Ends int

// The six idealized end conditions.
const (
	FixedFixed Ends = iota
	FixedPinned
	FixedGuided
	PinnedPinned
	FixedFree
	PinnedGuided
)

// K returns the effective-length factor used for idealized ends when none
// is typed: 1.0 for the nonsway ends (fixed-fixed, fixed-pinned,
// pinned-pinned), which ACI 318-19 6.6.4.4.3 permits (from memory) and which
// does not count on fixity that cast-in-place ends rarely give; for the sway
// ends the idealized values 1.2 (fixed-guided), 2.1 (fixed-free) and 2.0
// (pinned-guided), common practice for idealized ends, the same values as
// AISC 360-22 Commentary Table C-A-7.1, since a sway column's k is above 1.0
// and the code gives no single value. 0 for an invalid value.
func (e Ends) K() float64 {
	switch e {
	case FixedFixed:
		return 0.65
	case FixedPinned:
		return 0.80
	case FixedGuided:
		return 1.2
	case PinnedPinned:
		return 1.0
	case FixedFree:
		return 2.1
	case PinnedGuided:
		return 2.0
	}
	return 0
}

// KSimplified returns k with the simplification ACI 318-19 6.6.4.4.3
// permits for nonsway members, k = 1.0 (from memory); sway ends keep K.
func (e Ends) KSimplified() float64 {
	if e.Sway() || e.K() == 0 {
		return e.K()
	}
	return 1.0
}

// KWords says where the end condition's k comes from, for the trace;
// simplified says the nonsway k = 1.0 of ACI 318-19 6.6.4.4.3 was chosen.
func (e Ends) KWords(simplified bool) string {
	switch {
	case e.Sway():
		return fmt.Sprintf("%s ends: sway, k above 1.0; recommended design value (common practice, as AISC 360-22 C-A-7.1, from memory)", e)
	case simplified:
		return fmt.Sprintf("%s ends: nonsway, k = 1.0 (ACI 318-19 6.6.4.4.3 permits it, from memory; chosen in the scheme)", e)
	}
	return fmt.Sprintf("%s ends: nonsway, the recommended design k of these ends, as for every material (common practice, as AISC 360-22 C-A-7.1, from memory; ACI 318-19 6.6.4.4.3 permits it, and k = 1.0 in its place)", e)
}

// Sway reports whether the top of the column can translate sideways.
func (e Ends) Sway() bool { return e == FixedGuided || e == FixedFree || e == PinnedGuided }

// String returns the end condition as written, e.g. "pinned-pinned".
func (e Ends) String() string {
	switch e {
	case FixedFixed:
		return "fixed-fixed"
	case FixedPinned:
		return "fixed-pinned"
	case FixedGuided:
		return "fixed-guided"
	case PinnedPinned:
		return "pinned-pinned"
	case FixedFree:
		return "fixed-free"
	case PinnedGuided:
		return "pinned-guided"
	}
	return "invalid"
}

// EIMethod selects the effective stiffness of ACI 318-19 6.6.4.4.4.
type EIMethod int

// The stiffness expressions offered; ACI 318-19 6.6.4.4.4 permits each.
const (
	EIGross     EIMethod = iota // (a): 0.4EcIg/(1+βdns)
	EIWithSteel                 // (b): (0.2EcIg + EsIse)/(1+βdns)
	EIMember                    // (c): EcI/(1+βdns), I from Table 6.6.3.1.1(b) at Pu (from memory)
	EILargest                   // the largest strength of (a), (b) and (c)
)

// Letter returns "a", "b", "c" or "largest".
func (m EIMethod) Letter() string {
	switch m {
	case EIGross:
		return "a"
	case EIWithSteel:
		return "b"
	case EIMember:
		return "c"
	case EILargest:
		return "largest"
	}
	return "invalid"
}

// Conditions are the length, ends and slenderness inputs at which a section is evaluated.
type Conditions struct {
	LuXMM float64 // unbraced length for bending about x (strong axis), mm
	LuYMM float64 // unbraced length for bending about y (weak axis), mm
	Ends  Ends    // idealized end condition
	K     float64 // typed effective-length factor; 0 takes Ends.K() (or Ends.KSimplified() with NonswayK1)
	// NonswayK1 takes k = 1.0 at nonsway ends, the simplification of ACI
	// 318-19 6.6.4.4.3, in place of the ends' recommended design k.
	NonswayK1 bool
	M1M2      float64  // end-moment ratio M1/M2, −1 (single curvature) to 1 (double curvature), ACI 318-19 6.2.5.1
	BetaDns   float64  // sustained-load ratio βdns, 0 to 1
	EI        EIMethod // ACI 318-19 6.6.4.4.4 (a), (b), (c) or the largest
	Cap14     bool     // also hold δ to 1.4, the second-order limit of ACI 318-19 6.2.5.3 (off: the strength is where δ·M2,min meets the diagram)
}

// Limits on the conditions.
const (
	MaxLengthMM = 30000.0 // 30 m
	MinK        = 0.5
	MaxK        = 10.0
)

// Validate returns a named error for a length, K, M1/M2, βdns or EI method outside its range.
func (c *Conditions) Validate() error {
	if !finite(c.LuXMM) || c.LuXMM <= 0 || c.LuXMM > MaxLengthMM {
		return badInput("strong-axis length", c.LuXMM, "an unbraced length greater than zero and at most 30 m")
	}
	if !finite(c.LuYMM) || c.LuYMM <= 0 || c.LuYMM > MaxLengthMM {
		return badInput("weak-axis length", c.LuYMM, "an unbraced length greater than zero and at most 30 m")
	}
	if c.Ends.K() == 0 {
		return badInput("ends", float64(c.Ends), "one of the six idealized end conditions")
	}
	if !finite(c.K) || (c.K != 0 && (c.K < MinK || c.K > MaxK)) {
		return badInput("K", c.K, "0 (use the end condition's value) or an effective-length factor from 0.5 to 10")
	}
	if !finite(c.M1M2) || c.M1M2 < -1 || c.M1M2 > 1 {
		return badInput("M1/M2", c.M1M2, "an end-moment ratio from -1 (single curvature) to 1 (double curvature)")
	}
	if !finite(c.BetaDns) || c.BetaDns < 0 || c.BetaDns > 1 {
		return badInput("βdns", c.BetaDns, "a sustained-load ratio from 0 to 1")
	}
	if c.EI < EIGross || c.EI > EILargest {
		return badInput("EI method", float64(c.EI), "(a) 0, (b) 1, (c) 2 of ACI 318-19 6.6.4.4.4 or 3 for the largest")
	}
	return nil
}

// ok is the allocation-free form of Validate for the fast path.
func (c *Conditions) ok() bool {
	return c.LuXMM > 0 && c.LuXMM <= MaxLengthMM && c.LuYMM > 0 && c.LuYMM <= MaxLengthMM &&
		c.Ends.K() != 0 && (c.K == 0 || (c.K >= MinK && c.K <= MaxK)) &&
		c.M1M2 >= -1 && c.M1M2 <= 1 && c.BetaDns >= 0 && c.BetaDns <= 1 &&
		c.EI >= EIGross && c.EI <= EILargest
}

// KFactor returns the typed K, or the end condition's recommended K when
// none is typed (k = 1.0 at nonsway ends with NonswayK1).
func (c *Conditions) KFactor() float64 {
	if c.K != 0 {
		return c.K
	}
	if c.NonswayK1 {
		return c.Ends.KSimplified()
	}
	return c.Ends.K()
}

// SlendernessLimit returns the k·lu/r up to which slenderness may be
// neglected, ACI 318-19 6.2.5.1: 22 for sway ends (a); otherwise
// 34 + 12(M1/M2) (b), not more than 40 (c).
func (c *Conditions) SlendernessLimit() float64 {
	if c.Ends.Sway() {
		return swayLimit
	}
	return math.Min(34+12*c.M1M2, 40)
}

// Mode is the governing limit state, a small code that changes exactly when the governing mode changes.
type Mode int

// The governing modes.
const (
	NotPermitted Mode = iota // k·lu/r above 100 (6.2.6): no strength given
	Crushing                 // the axial limit φPn,max of 22.4.2 governs
	SlenderX                 // nonsway magnified minimum moment about the strong axis
	SlenderY                 // nonsway magnified minimum moment about the weak axis
	SwayX                    // sway magnified minimum moment about the strong axis
	SwayY                    // sway magnified minimum moment about the weak axis
	SecondOrderX             // the 1.4 second-order limit of 6.2.5.3 about the strong axis (Cap14 only)
	SecondOrderY             // the 1.4 second-order limit of 6.2.5.3 about the weak axis (Cap14 only)
)

// limitBy says what sets an axis's strength.
type limitBy int

const (
	byAxial       limitBy = iota // φPn,max of 22.4.2
	byMoment                     // δ·M2,min meets the φ-reduced diagram
	bySecondOrder                // δ reaches 1.4 (6.2.5.3, Cap14 only)
	byTooSlender                 // k·lu/r above 100 (6.2.6)
)

// Words returns the governing mode in plain words.
func (m Mode) Words() string {
	switch m {
	case Crushing:
		return "crushing (axial limit φPn,max)"
	case SlenderX:
		return "slenderness: magnified minimum moment, strong axis"
	case SlenderY:
		return "slenderness: magnified minimum moment, weak axis"
	case SwayX:
		return "slenderness: sway-magnified minimum moment, strong axis"
	case SwayY:
		return "slenderness: sway-magnified minimum moment, weak axis"
	case SecondOrderX:
		return "slenderness: second-order moment limit 1.4 (6.2.5.3), strong axis"
	case SecondOrderY:
		return "slenderness: second-order moment limit 1.4 (6.2.5.3), weak axis"
	}
	return "not permitted"
}

// Reasons a strength is not given.
const (
	ReasonTooSlender = "k·lu/r above 100: the moment magnifier method does not apply (ACI 318-19 6.2.6); a second-order analysis is needed"
	ReasonBadInput   = "the length, K, M1/M2, βdns or EI method is outside its accepted range"
)

// Quick is the fast result: the design strength at one set of conditions.
type Quick struct {
	PhiPn     float64 // design axial strength φPn, N; 0 when not permitted
	Mode      Mode    // governing mode
	KLR       float64 // governing slenderness k·lu/r (the axis that governs, or the larger)
	Permitted bool    // false when the simplified method does not apply
	Reason    string  // why not permitted
}

// Magnification is the moment magnifier about one axis at one factored axial load.
type Magnification struct {
	EIeff float64 // ACI 318-19 Eq. 6.6.4.4.4a or b, N·mm²
	Pc    float64 // ACI 318-19 Eq. 6.6.4.4.2, N
	Cm    float64 // 1.0 (ACI 318-19 6.6.4.5.4 with the minimum moment)
	Delta float64 // ACI 318-19 Eq. 6.6.4.5.2 (nonsway) or 6.6.4.6.2b (sway, the column as its own story), at least 1
	M2min float64 // ACI 318-19 Eq. 6.6.4.5.4, N·mm
	Mc    float64 // δ·M2,min, N·mm
}

// MemberI returns I/Ig of a column by ACI 318-19 Table 6.6.3.1.1(b) (from
// memory): (0.80 + 25Ast/Ag)(1 − Mu/(Pu·h) − 0.5Pu/P0), at least 0.35 and
// at most 0.875, with Mu the minimum moment Pu·e0 of Eq. 6.6.4.5.4, so
// Mu/(Pu·h) = e0/h.
func (s *Section) MemberI(ax Axis, pu float64) float64 {
	r := (0.80 + 25*s.AstMM2/s.AgMM2) * (1 - s.e0(ax)/s.Depth[ax] - 0.5*pu/s.P0)
	return math.Max(0.35, math.Min(0.875, r))
}

// eiEff returns (EI)eff about an axis by ACI 318-19 6.6.4.4.4 with method m
// (not EILargest) at a factored load pu (used by (c) only).
func (s *Section) eiEff(ax Axis, m EIMethod, c *Conditions, pu float64) float64 {
	switch m {
	case EIWithSteel:
		return (0.2*s.EcMPa*s.Ig[ax] + EsMPa*s.Ise[ax]) / (1 + c.BetaDns) // Eq. 6.6.4.4.4b
	case EIMember:
		return s.EcMPa * s.MemberI(ax, pu) * s.Ig[ax] / (1 + c.BetaDns) // Eq. 6.6.4.4.4c
	}
	return 0.4 * s.EcMPa * s.Ig[ax] / (1 + c.BetaDns) // Eq. 6.6.4.4.4a
}

// pc returns the critical buckling load about an axis, ACI 318-19 Eq. 6.6.4.4.2.
func (s *Section) pc(ax Axis, klu float64, m EIMethod, c *Conditions, pu float64) float64 {
	return math.Pi * math.Pi * s.eiEff(ax, m, c, pu) / (klu * klu)
}

// e0 returns the minimum eccentricity 0.6 in + 0.03h of ACI 318-19 Eq. 6.6.4.5.4, mm.
func (s *Section) e0(ax Axis) float64 { return m2minConstMM + m2minSlope*s.Depth[ax] }

// delta returns δ = Cm/(1 − Pu/(0.75Pc)) ≥ 1 with Cm = 1 (ACI 318-19 Eq.
// 6.6.4.5.2; the same form as Eq. 6.6.4.6.2b for one column), or +Inf at
// and beyond Pu = 0.75Pc.
func delta(pu, pc float64) float64 {
	den := 1 - pu/(0.75*pc)
	if den <= 0 {
		return math.Inf(1)
	}
	d := 1 / den
	if d < 1 {
		return 1
	}
	return d
}

// Magnify returns the magnifier about an axis at a factored load pu, N,
// for an unbraced length lu, mm, and the conditions' K, βdns and EI method
// (EILargest takes the method that gives this axis the largest strength).
// An unknown axis gives the zero Magnification.
func (s *Section) Magnify(ax Axis, pu, lu float64, c *Conditions) Magnification {
	if ax != AxisX && ax != AxisY {
		return Magnification{}
	}
	k := c.KFactor()
	m := c.EI
	if m == EILargest {
		_, _, m = s.slenderBest(ax, k*lu, c)
	}
	pc := s.pc(ax, k*lu, m, c, pu)
	d := delta(pu, pc)
	m2 := pu * s.e0(ax)
	return Magnification{EIeff: s.eiEff(ax, m, c, pu), Pc: pc, Cm: 1, Delta: d, M2min: m2, Mc: d * m2}
}

// slenderWith returns the slender strength about an axis with one EI
// method. Under (c) I falls as Pu rises, so the strength is found by
// successive substitution from I at φPn,max: the odd iterates lie below
// the fixed point and each satisfies the check with I at its own load. The
// iteration stops when two successive iterates agree to 1e-7 of φPn,max
// (or after 24), returning the lower of the last two.
// Special case: under (a) and (b) Pc does not depend on Pu and one solve suffices.
func (s *Section) slenderWith(ax Axis, klu float64, m EIMethod, c *Conditions) (float64, limitBy) {
	if m != EIMember {
		return s.slenderStrength(ax, s.pc(ax, klu, m, c, 0), c.Cap14)
	}
	prev := s.PhiPnMax
	p, by := s.slenderStrength(ax, s.pc(ax, klu, EIMember, c, prev), c.Cap14)
	for i := 0; i < 24 && math.Abs(p-prev) > 1e-7*s.PhiPnMax; i++ {
		q, qby := s.slenderStrength(ax, s.pc(ax, klu, EIMember, c, p), c.Cap14)
		prev, p, by = p, q, qby
	}
	// The fixed point lies between the last two iterates; any load at or
	// below it satisfies the check with I at that load.
	return math.Min(p, prev), by
}

// slenderBest returns, under EILargest, the method of (a), (b) and (c)
// that gives the largest strength about an axis (the first on a tie); for
// another method, that method.
func (s *Section) slenderBest(ax Axis, klu float64, c *Conditions) (float64, limitBy, EIMethod) {
	if c.EI != EILargest {
		p, by := s.slenderWith(ax, klu, c.EI, c)
		return p, by, c.EI
	}
	// The strength rises with (EI)eff, so of (a) and (b), whose EI does not
	// depend on the load, only the stiffer is solved. (c)'s EI falls as the
	// load rises, between its value at φPn,max and at no load; it is solved
	// only when it can win, and alone when it wins at every load.
	ab := EIGross
	if s.eiEff(ax, EIWithSteel, c, 0) > s.eiEff(ax, EIGross, c, 0) {
		ab = EIWithSteel
	}
	eiAB := s.eiEff(ax, ab, c, 0)
	if s.eiEff(ax, EIMember, c, s.PhiPnMax) >= eiAB {
		p, by := s.slenderWith(ax, klu, EIMember, c)
		return p, by, EIMember
	}
	p, by := s.slenderWith(ax, klu, ab, c)
	if s.eiEff(ax, EIMember, c, 0) <= eiAB {
		return p, by, ab
	}
	if pc, byc := s.slenderWith(ax, klu, EIMember, c); pc > p {
		return pc, byc, EIMember
	}
	return p, by, ab
}

// EIUsed returns the EI method that sets the strength about an axis at
// length lu: the conditions' own, or under EILargest the one of (a), (b)
// and (c) that gives the largest strength.
func (s *Section) EIUsed(ax Axis, lu float64, c *Conditions) EIMethod {
	_, _, m := s.slenderBest(ax, c.KFactor()*lu, c)
	return m
}

// slenderStrength returns the largest Pu ≤ φPn,max, below 0.75Pc, for which
// (Pu, δ·M2,min) lies inside the φ-reduced diagram about an axis, and
// what limits it: φPn,max, the magnified moment or the 1.4 cap. The margin
// φMn − δ·M2,min is positive at Pu = 0 and negative at the top of the
// bracket; a binary search over the diagram's table brackets the crossing
// within one table interval; over that interval φMn is the table's straight
// line, so the crossing is the root of a quadratic, solved exactly (with
// bisection as a fallback against rounding). With cap14 the load is also held to δ ≤ 1.4, that is
// Pu ≤ 0.75Pc(1 − 1/1.4) (ACI 318-19 6.2.5.3).
func (s *Section) slenderStrength(ax Axis, pc float64, cap14 bool) (float64, limitBy) {
	d := &s.diag[ax]
	top, topBy := s.PhiPnMax, byAxial
	if p14 := 0.75 * pc * (1 - 1/1.4); cap14 && p14 < top {
		top, topBy = p14, bySecondOrder
	}
	e0 := s.e0(ax)
	lim := 0.75 * pc // at 0.75Pc the magnifier is infinite
	hi := top
	if lim <= top {
		hi = lim
	} else if d.mcap(top)-delta(top, pc)*top*e0 >= 0 {
		return top, topBy
	}
	top = s.PhiPnMax
	dp := top / gridN
	lo := 0 // the margin at Pu = 0 is φMn(0) > 0
	up := int(math.Ceil(hi / dp))
	if up > gridN {
		up = gridN
	}
	if up < 1 {
		up = 1
	}
	for up-lo > 1 {
		mid := (lo + up) >> 1
		p := float64(mid) * dp
		if p < lim && d.grid[mid]-delta(p, pc)*p*e0 >= 0 {
			lo = mid
		} else {
			up = mid
		}
	}
	p0 := float64(lo) * dp
	pa, pb := p0, math.Min(float64(up)*dp, hi)
	ma := d.grid[lo]
	slope := (d.grid[up] - ma) / dp
	// Over [pa, pb] φMn = A + slope·Pu, so φMn(1 − Pu/L) − e0·Pu = 0 (L = 0.75Pc)
	// is the quadratic −slope·Pu² + (slope·L − A − e0·L)·Pu + A·L = 0.
	A := ma - slope*p0
	a2, a1, a0 := -slope, slope*lim-A-e0*lim, A*lim
	if r, ok := rootIn(a2, a1, a0, pa, pb); ok {
		return r, byMoment
	}
	tol := 1e-9 * top // rounding left no root in the bracket: bisect the same function
	for i := 0; i < 64 && pb-pa > tol; i++ {
		p := 0.5 * (pa + pb)
		if (a2*p+a1)*p+a0 >= 0 {
			pa = p
		} else {
			pb = p
		}
	}
	return pa, byMoment
}

// axisStrength evaluates one axis: its k·lu/r, whether it is slender, its
// strength, and whether slenderness limits it.
func (s *Section) axisStrength(ax Axis, lu float64, c *Conditions) (klr float64, slender bool, cap float64, by limitBy) {
	k := c.KFactor()
	klr = k * lu / s.R[ax] // ACI 318-19 6.2.5.1 with r of 6.2.5.2
	if tooSlender(klr) {
		return klr, true, 0, byTooSlender
	}
	if klr <= c.SlendernessLimit()*(1+1e-12) {
		return klr, false, s.PhiPnMax, byAxial
	}
	cap, by, _ = s.slenderBest(ax, k*lu, c)
	return klr, true, cap, by
}

// Quick returns the design strength at the conditions without a trace. It
// does not allocate. Invalid conditions or k·lu/r above 100 give
// Permitted false with a reason and no strength.
func (s *Section) Quick(c *Conditions) Quick {
	if !c.ok() {
		return Quick{Reason: ReasonBadInput}
	}
	klrX, _, capX, byX := s.axisStrength(AxisX, c.LuXMM, c)
	klrY, _, capY, byY := s.axisStrength(AxisY, c.LuYMM, c)
	q := Quick{KLR: math.Max(klrX, klrY), Permitted: true}
	if tooSlender(klrX) || tooSlender(klrY) {
		q.Permitted, q.Reason, q.Mode = false, ReasonTooSlender, NotPermitted
		return q
	}
	q.PhiPn, q.Mode = s.govern(capX, capY, byX, byY, klrX, klrY, c, &q.KLR)
	return q
}

// govern picks the smaller axis strength and names the mode.
func (s *Section) govern(capX, capY float64, byX, byY limitBy, klrX, klrY float64, c *Conditions, klr *float64) (float64, Mode) {
	ax, cap, by := AxisX, capX, byX
	if capY < capX || (capY == capX && byY != byAxial) {
		ax, cap, by = AxisY, capY, byY
	}
	switch by {
	case byAxial:
		return cap, Crushing
	case bySecondOrder:
		*klr = [2]float64{klrX, klrY}[ax]
		return cap, SecondOrderX + Mode(ax)
	}
	*klr = [2]float64{klrX, klrY}[ax]
	if c.Ends.Sway() {
		return cap, SwayX + Mode(ax)
	}
	return cap, SlenderX + Mode(ax)
}

// rootIn returns the root of a2·x² + a1·x + a0 that lies in [lo, hi]
// (within a rounding tolerance), using the cancellation-free form of the
// quadratic formula; ok is false when there is none.
func rootIn(a2, a1, a0, lo, hi float64) (float64, bool) {
	tol := 1e-12 * math.Max(math.Abs(lo), math.Abs(hi))
	in := func(x float64) bool { return x >= lo-tol && x <= hi+tol }
	clamp := func(x float64) float64 { return math.Max(lo, math.Min(hi, x)) }
	if math.Abs(a2)*hi*hi <= 1e-14*(math.Abs(a1)*hi+math.Abs(a0)) {
		if a1 == 0 {
			return 0, false
		}
		x := -a0 / a1
		return clamp(x), in(x)
	}
	disc := a1*a1 - 4*a2*a0
	if disc < 0 {
		return 0, false
	}
	q := -0.5 * (a1 + math.Copysign(math.Sqrt(disc), a1))
	if q == 0 {
		return 0, false
	}
	if x := q / a2; in(x) {
		return clamp(x), true
	}
	if x := a0 / q; in(x) {
		return clamp(x), true
	}
	return 0, false
}

// tooSlender reports k·lu/r above 100 (ACI 318-19 6.2.6), allowing for rounding at exactly 100.
func tooSlender(klr float64) bool { return klr > MaxKLR*(1+1e-12) }

// ModeWords returns the governing mode in plain words for this section:
// the same as Mode.Words, except that a round section, which has no strong
// or weak axis, names the axis x or y.
func (s *Section) ModeWords(m Mode) string {
	if s.Shape != Circular {
		return m.Words()
	}
	switch m {
	case SlenderX:
		return "slenderness: magnified minimum moment about x"
	case SlenderY:
		return "slenderness: magnified minimum moment about y"
	case SwayX:
		return "slenderness: sway-magnified minimum moment about x"
	case SwayY:
		return "slenderness: sway-magnified minimum moment about y"
	case SecondOrderX:
		return "slenderness: second-order moment limit 1.4 (6.2.5.3) about x"
	case SecondOrderY:
		return "slenderness: second-order moment limit 1.4 (6.2.5.3) about y"
	}
	return m.Words()
}
