package timber

import (
	"fmt"
	"math"
)

// MaxLengthIn is the longest unbraced length accepted, in (100 ft).
const MaxLengthIn = 1200.0

// CrushingCp is the column stability factor at or above which the plain
// description calls the column crushing-governed rather than buckling-governed.
// NDS 2018 draws no such line (Cp blends the two); this is a wording choice:
// the column keeps at least 90% of its crushing strength.
const CrushingCp = 0.90

// Reasons a check is not permitted or cannot be made (constant strings, so
// Fast never allocates).
const (
	ReasonSlender     = "le/d exceeds 50, the limit of NDS 2018 3.7.1.4"
	ReasonCharred     = "the section chars through within the fire time (NDS 2018 16.2.1)"
	ReasonFireSlender = "the charred section's le/d exceeds 50 (NDS 2018 3.7.1.4 applied to the residual section)"
	ReasonLength      = "unbraced length must be a finite number above 0 and at most 1200 in"
	ReasonEnds        = "end condition unknown and no K given"
	ReasonK           = "K must be 0 (use the end condition) or from 0.5 to 10"
)

// Mode is the governing behaviour of a column.
type Mode int

// The governing modes.
const (
	NotPermitted   Mode = iota // the check is not permitted or not possible
	Crushing                   // crushing parallel to grain (Cp ≥ CrushingCp)
	Buckling                   // buckling, equally slender about both axes
	BucklingWeak               // buckling about the weak axis (width b)
	BucklingStrong             // buckling about the strong axis (depth d)
)

// String returns the mode in plain words.
func (m Mode) String() string {
	switch m {
	case Crushing:
		return "crushing parallel to grain"
	case Buckling:
		return "buckling (column stability factor Cp)"
	case BucklingWeak:
		return "buckling about the weak axis (column stability factor Cp)"
	case BucklingStrong:
		return "buckling about the strong axis (column stability factor Cp)"
	}
	return "not permitted"
}

// Geometry is the column's unbraced lengths and end restraint.
type Geometry struct {
	LxIn float64      // unbraced length for buckling about the strong axis (across the depth d), in
	LyIn float64      // unbraced length for buckling about the weak axis (across the width b), in
	Ends EndCondition // idealized end condition, for Ke by Table G1
	K    float64      // typed buckling length coefficient Ke; 0 uses Ends
}

// ke returns the buckling length coefficient or the reason it cannot.
func (g Geometry) ke() (float64, string) {
	if !(g.LxIn > 0 && g.LxIn <= MaxLengthIn) || !(g.LyIn > 0 && g.LyIn <= MaxLengthIn) {
		return 0, ReasonLength // also catches NaN
	}
	if g.K != 0 {
		if !(g.K >= 0.5 && g.K <= 10) {
			return 0, ReasonK
		}
		return g.K, ""
	}
	ke := g.Ends.Ke()
	if ke == 0 {
		return 0, ReasonEnds
	}
	return ke, ""
}

// Quick is a column's strength at one geometry, without a trace.
type Quick struct {
	Permitted bool    // false when the check is not permitted (le/d > 50) or the geometry is bad
	Reason    string  // why not permitted
	Mode      Mode    // governing mode of the normal (unburnt) case
	LeD       float64 // governing slenderness le/d
	Cp        float64 // column stability factor (NDS 2018 Eq. 3.7-1)
	FcAdj     float64 // adjusted compression design value Fc' = Fc*·Cp, psi
	Capacity  float64 // ASD allowable load or LRFD adjusted resistance Fc'·A, lb
	Fire      FireQuick
}

// FireQuick is the fire-case strength of the charred section (NDS 2018 16.2).
type FireQuick struct {
	On        bool    // a fire check was asked for
	Permitted bool    // false when the section chars through or its le/d exceeds 50
	Reason    string  // why not permitted
	Mode      Mode    // governing mode of the charred section
	B, D      float64 // charred width and depth, in (of the orientation that governs for 3 sides)
	LeD       float64 // governing le/d of the charred section
	Cp        float64 // column stability factor of the charred section
	FcAdj     float64 // fire-case compression strength Fc,fire·Cp, psi
	Capacity  float64 // fire-case member strength, lb (compare with the fire-case load)
}

// Candidate is a section and material prepared for repeated evaluation in
// fixed conditions.
type Candidate struct {
	sec   Section
	mat   Material
	cond  Conditions
	c     float64
	area  float64
	fcS   float64 // Fc*, psi
	eminA float64 // Emin', psi
	fcF   []Factor
	eminF []Factor

	// Precomputed for Fast: reciprocals and ratios so that the
	// length-dependent part needs one division and one square root per case.
	invB, invD float64 // 1/b, 1/d
	kE         float64 // 0.822·Emin'/Fc*, so FcE/Fc* = kE/(le/d)²
	invC       float64 // 1/c
	inv2C      float64 // 1/(2c)

	fireOn    bool
	aeff      float64
	fireFc    float64 // 2.58·Fc·CF, psi
	fireEmin  float64 // 2.03·Emin, psi
	fireCF    float64
	fireKE    float64 // 0.822·Emin,fire/Fc,fire
	nOrient   int
	orient    [2][2]float64 // charred (b, d) per orientation
	orientInv [2][2]float64 // 1/b_fire, 1/d_fire per orientation (0 when charred through)
	orientTag [2]string
}

// NewCandidate checks the inputs and prepares a candidate: the adjustment
// factors, Fc* and Emin' are fixed here so that Fast only does the
// length-dependent part.
func NewCandidate(sec Section, mat Material, cond Conditions) (*Candidate, error) {
	if !(sec.B > 0 && sec.B <= 60) || !(sec.D > 0 && sec.D <= 120) || sec.D < sec.B {
		return nil, fmt.Errorf("timber: section %q size %vx%v in not accepted; width from above 0 to 60 in, depth from the width to 120 in", sec.Name, sec.B, sec.D)
	}
	for _, v := range []struct {
		name   string
		x, max float64
	}{{"Fc", mat.Fc, 10000}, {"E", mat.E, 5e6}, {"Emin", mat.Emin, 3e6}, {"G", mat.G, 1.2}} {
		if !(v.x > 0 && v.x <= v.max) {
			return nil, fmt.Errorf("timber: material %q %s = %v not accepted; use a value above 0 and at most %v", mat.Name, v.name, v.x, v.max)
		}
	}
	if mat.Product != sec.Product || (mat.Product == Glulam && mat.Series != sec.Series) {
		return nil, fmt.Errorf("timber: material %q (%s %s) does not fit section %q (%s %s)", mat.Name, mat.Series, mat.Product, sec.Name, sec.Series, sec.Product)
	}
	cond, err := cond.normalized()
	if err != nil {
		return nil, err
	}
	k := &Candidate{sec: sec, mat: mat, cond: cond, area: sec.Area(), c: CSawn}
	if mat.Product == Glulam {
		k.c = CGlulam // NDS 2018 3.7.1.5: c = 0.9 for glulam
	}
	k.fcF, k.eminF = factors(mat, sec, cond)
	k.fcS = mat.Fc * product(k.fcF)       // NDS 2018 Table 4.3.1 / 5.3.1: Fc* (all factors except Cp)
	k.eminA = mat.Emin * product(k.eminF) // NDS 2018 Table 4.3.1 / 5.3.1: Emin'
	k.invB, k.invD = 1/sec.B, 1/sec.D
	k.kE = KcE * k.eminA / k.fcS
	k.invC, k.inv2C = 1/k.c, 1/(2*k.c)

	if cond.Fire.On() {
		k.fireOn = true
		k.aeff, _ = EffectiveCharDepth(cond.Fire.Hours)
		k.fireCF = sizeFactor(mat, sec) // Table 16.2.2 note: CF from the initial section
		k.fireFc = FireKFc * mat.Fc * k.fireCF
		k.fireEmin = FireKFcE * mat.Emin
		a := k.aeff
		if cond.Fire.Sides == 4 {
			k.nOrient = 1
			k.orient[0] = [2]float64{sec.B - 2*a, sec.D - 2*a}
			k.orientTag[0] = "all four faces exposed"
		} else {
			k.nOrient = 2
			k.orient[0] = [2]float64{sec.B - a, sec.D - 2*a}
			k.orientTag[0] = "a broad face (d wide) protected"
			k.orient[1] = [2]float64{sec.B - 2*a, sec.D - a}
			k.orientTag[1] = "a narrow face (b wide) protected"
		}
		k.fireKE = KcE * k.fireEmin / k.fireFc
		for i := 0; i < k.nOrient; i++ {
			if o := k.orient[i]; o[0] > 0 && o[1] > 0 {
				k.orientInv[i] = [2]float64{1 / o[0], 1 / o[1]}
			}
		}
	}
	return k, nil
}

// Section returns the candidate's section.
func (k *Candidate) Section() Section { return k.sec }

// Material returns the candidate's reference design values.
func (k *Candidate) Material() Material { return k.mat }

// Conditions returns the candidate's conditions with defaults filled in.
func (k *Candidate) Conditions() Conditions { return k.cond }

// Designation returns the candidate's name, e.g. "8x8 DF-L No.1" or "6-3/4x9 glulam Comb. 2 DF".
func (k *Candidate) Designation() string {
	if k.sec.Product == Glulam {
		return k.sec.Name + " glulam " + k.mat.Name
	}
	return k.sec.Name + " " + k.mat.Name
}

// cp evaluates NDS 2018 Eq. 3.7-1 for the ratio alpha = FcE/Fc* and c, in the
// cancellation-free form Cp = (α/c) / (A + √(A² − α/c)) with A = (1 + α)/(2c),
// which equals A − √(A² − α/c).
func cp(alpha, c float64) float64 {
	a := (1 + alpha) / (2 * c)
	b := alpha / c
	return b / (a + math.Sqrt(a*a-b)) // NDS 2018 Eq. 3.7-1
}

// Cp returns the column stability factor of NDS 2018 Eq. 3.7-1 for FcE, Fc*
// (same units) and c. It returns NaN when an input is not positive.
func Cp(fcE, fcStar, c float64) float64 {
	if !(fcE > 0) || !(fcStar > 0) || !(c > 0 && c <= 1) {
		return math.NaN()
	}
	return cp(fcE/fcStar, c)
}

func govern(rx, ry float64) (float64, Mode) {
	switch {
	case math.Abs(rx-ry) <= 1e-9*math.Max(rx, ry):
		return rx, Buckling
	case rx > ry:
		return rx, BucklingStrong
	}
	return ry, BucklingWeak
}

// Fast returns the candidate's strength at one geometry without a trace and
// without allocating. Bad geometry gives Permitted false with a reason;
// le/d above 50 gives Permitted false with zero capacity.
func (k *Candidate) Fast(g Geometry) (q Quick) {
	ke, why := g.ke()
	if why != "" {
		q.Reason = why
		return q
	}
	leX, leY := ke*g.LxIn, ke*g.LyIn // NDS 2018 3.7.1.2: le = Ke·l
	k.strength(&q, leX, leY)
	if k.fireOn {
		k.fireFast(&q.Fire, leX, leY)
	}
	return q
}

// strength is NDS 2018 3.7.1 for the unburnt section, written into q.
func (k *Candidate) strength(q *Quick, leX, leY float64) {
	k.strengthAt(q, leX, leY, k.fcS, k.kE)
}

// strengthAt is strength with Fc* = fcS and kE = 0.822·Emin'/Fc* given, so
// that another time effect or load duration factor can be used.
func (k *Candidate) strengthAt(q *Quick, leX, leY, fcS, kE float64) {
	var axis Mode
	q.LeD, axis = govern(leX*k.invD, leY*k.invB) // NDS 2018 3.7.1.3: le1/d1, le2/d2
	if q.LeD > LeDLimit {
		q.Reason = ReasonSlender // NDS 2018 3.7.1.4
		return
	}
	q.Permitted = true
	// NDS 2018 3.7.1.5: FcE = 0.822 Emin'/(le/d)², taken here as the ratio FcE/Fc*.
	q.Cp = k.cpOf(kE / (q.LeD * q.LeD)) // NDS 2018 Eq. 3.7-1
	q.FcAdj = fcS * q.Cp                // NDS 2018 Table 4.3.1 / 5.3.1: Fc' = Fc*·Cp
	q.Capacity = q.FcAdj * k.area
	q.Mode = axis
	if k.sec.B == k.sec.D {
		q.Mode = Buckling // a square section has no strong or weak axis
	}
	if q.Cp >= CrushingCp {
		q.Mode = Crushing
	}
}

// cpOf is cp with the candidate's precomputed 1/c and 1/(2c).
func (k *Candidate) cpOf(alpha float64) float64 {
	a := (1 + alpha) * k.inv2C
	b := alpha * k.invC
	return b / (a + math.Sqrt(a*a-b)) // NDS 2018 Eq. 3.7-1
}

// fireFast is NDS 2018 16.2 for the charred section(s), written into f;
// for three sides the weaker orientation governs, and a failing one outright.
func (k *Candidate) fireFast(f *FireQuick, leX, leY float64) {
	k.fireOrient(f, 0, leX, leY)
	if k.nOrient == 2 && f.Permitted {
		var g FireQuick
		k.fireOrient(&g, 1, leX, leY)
		if !g.Permitted || g.Capacity < f.Capacity {
			*f = g
		}
	}
}

func (k *Candidate) fireOrient(f *FireQuick, i int, leX, leY float64) {
	f.On, f.B, f.D = true, k.orient[i][0], k.orient[i][1]
	inv := &k.orientInv[i]
	if inv[0] == 0 {
		f.B, f.D = math.Max(f.B, 0), math.Max(f.D, 0)
		f.Reason = ReasonCharred
		return
	}
	var axis Mode
	f.LeD, axis = govern(leX*inv[1], leY*inv[0])
	if f.LeD > LeDLimit {
		f.Reason = ReasonFireSlender
		return
	}
	f.Permitted = true
	// NDS 2018 16.2.2 with the Table 16.2.2 factors: FcE,fire/Fc,fire = 0.822·2.03·Emin/(le/d)²/(2.58·Fc·CF).
	f.Cp = k.cpOf(k.fireKE / (f.LeD * f.LeD)) // NDS 2018 Eq. 3.7-1 on the reduced section (Table 16.2.2)
	f.FcAdj = k.fireFc * f.Cp
	f.Capacity = f.FcAdj * f.B * f.D
	// Name the axis by the charred shape: with three sides burnt the
	// original depth may have become the smaller dimension.
	switch {
	case f.B == f.D:
		axis = Buckling
	case f.D < f.B && axis == BucklingStrong:
		axis = BucklingWeak
	case f.D < f.B && axis == BucklingWeak:
		axis = BucklingStrong
	}
	f.Mode = axis
	if f.Cp >= CrushingCp {
		f.Mode = Crushing
	}
}

// MoistureContent returns the moisture content, percent, assumed for the
// product's mass: 19% for sawn lumber (the dry-service limit), 12% for glulam
// (common practice for glulam at manufacture).
func MoistureContent(p Product) float64 {
	if p == Glulam {
		return 12
	}
	return 19
}

// DensityLbFt3 returns the density, lb/ft³, of wood of specific gravity G
// (oven-dry basis) at moisture content mc percent, by
// ρ = 62.4·[G/(1 + G·0.009·mc)]·(1 + mc/100) (NDS Supplement 3.1.3, from memory).
func DensityLbFt3(g, mc float64) float64 {
	return 62.4 * g / (1 + g*0.009*mc) * (1 + mc/100)
}

// kgM3PerLbFt3 converts lb/ft³ to kg/m³ (0.45359237 kg / 0.3048³ m³).
const kgM3PerLbFt3 = 0.45359237 / (0.3048 * 0.3048 * 0.3048)

// MassKgPerM returns the candidate's mass per metre of column, kg/m, at the
// product's assumed moisture content.
func (k *Candidate) MassKgPerM() float64 {
	rho := DensityLbFt3(k.mat.G, MoistureContent(k.mat.Product)) * kgM3PerLbFt3
	return rho * k.area * (MMPerIn * MMPerIn * 1e-6)
}
