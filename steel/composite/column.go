package composite

import (
	"fmt"
	"math"

	"upright/steel"
)

// Limits on the fill's specified compressive strength, ksi: normal-weight
// concrete from 3 to 10 ksi (AISC 360-22 I1.3(a) (from memory)).
const (
	MinFc = 3.0
	MaxFc = 10.0
)

// MaxFyStrength is the largest yield stress used in calculating the
// strength of a composite member, ksi (AISC 360-22 I1.3(b): 80 ksi (from
// memory)); a higher grade is taken at this value.
const MaxFyStrength = 80.0

// Resistance and safety factors for composite compression members, AISC
// 360-22 I2.1b (from memory).
const (
	PhiC   = 0.75
	OmegaC = 2.00
)

// Factor returns the multiplier from nominal to available strength of a
// filled composite column: φc = 0.75 for LRFD, 1/Ωc = 1/2.00 for ASD
// (AISC 360-22 I2.1b).
func Factor(m steel.Method) float64 {
	if m == steel.ASD {
		return 1 / OmegaC
	}
	return PhiC
}

// Class is the local buckling classification of a filled section for axial
// compression (AISC 360-22 Table I1.1a).
type Class uint8

// The three classes.
const (
	Compact Class = iota
	Noncompact
	Slender
)

var classNames = [...]string{"compact", "noncompact", "slender"}

// String returns "compact", "noncompact" or "slender".
func (c Class) String() string {
	if int(c) < len(classNames) {
		return classNames[c]
	}
	return "unknown"
}

// Materials are the strengths of the tube and the fill.
type Materials struct {
	Fy float64 // the wall's specified minimum yield stress, ksi (25 to 110)
	Fc float64 // the fill's specified compressive strength f′c, ksi (3 to 10)
	Wc float64 // the fill's unit weight for Ec, lb/ft³ (90 to 160); 0 takes DefaultWc
}

// Validate returns an error naming the first bad field and the accepted range.
func (m Materials) Validate() error {
	if math.IsNaN(m.Fy) || math.IsInf(m.Fy, 0) || m.Fy < steel.MinFy || m.Fy > steel.MaxFy {
		return fmt.Errorf("Fy: %v is not accepted; a yield stress from %g to %g ksi", m.Fy, steel.MinFy, steel.MaxFy)
	}
	if math.IsNaN(m.Fc) || math.IsInf(m.Fc, 0) || m.Fc < MinFc || m.Fc > MaxFc {
		return fmt.Errorf("fill f'c: %v is not accepted; a concrete strength from %g to %g ksi (AISC 360-22 I1.3)", m.Fc, MinFc, MaxFc)
	}
	if m.Wc != 0 && (math.IsNaN(m.Wc) || math.IsInf(m.Wc, 0) || m.Wc < 90 || m.Wc > 160) {
		return fmt.Errorf("wc: %v is not accepted; a concrete unit weight from 90 to 160 lb/ft³, or 0 for %g", m.Wc, DefaultWc)
	}
	return nil
}

// Limits are the width-to-thickness limits of Table I1.1a for one section
// at one yield stress.
type Limits struct {
	LambdaP, LambdaR, LambdaMax float64
}

// TableI11a returns the limits of AISC 360-22 Table I1.1a for walls of
// rectangular HSS (b/t: 2.26, 3.00 and 5.00 √(E/Fy)) or round HSS (D/t:
// 0.15, 0.19 and 0.31 E/Fy), coefficients from memory.
func TableI11a(round bool, fy float64) Limits {
	if round {
		return Limits{0.15 * Es / fy, 0.19 * Es / fy, 0.31 * Es / fy}
	}
	r := math.Sqrt(Es / fy)
	return Limits{2.26 * r, 3.00 * r, 5.00 * r}
}

// Column is one filled section at one pair of material strengths with every
// length-independent quantity of AISC 360-22 I2.2 worked out. Build it with
// NewColumn.
type Column struct {
	Sec  Section   // the filled section
	Mat  Materials // the strengths as given (Fy before the I1.3 limit)
	fy   float64   // the yield stress used, ksi (Fy held to MaxFyStrength)
	wc   float64
	ec   float64 // Ec, ksi
	lim  Limits
	lam  float64
	cls  Class
	c2   float64
	pp   float64 // Eq. I2-9 plastic strength, kip
	py   float64 // Fy As + 0.7 f′c Ac, kip
	fcr  float64 // slender walls: Eq. I2-12 or I2-13, ksi; 0 otherwise
	pno  float64
	c3   float64
	eix  float64 // EIeff about x, kip·in²
	eiy  float64
	pex  float64 // π² EIeff, so that Pe = pex/Lc², kip·in²
	pey  float64
	rx   float64 // the tube's radii of gyration, in, for the reported slenderness
	ry   float64
	sym  bool
	mass float64 // lb/ft, steel plus fill
}

// NewColumn prepares a filled section. It rejects bad materials, a section
// without steel or core, a tube whose walls exceed the largest ratio Table
// I1.1a permits, and one whose steel is less than 1 % of the gross area
// (AISC 360-22 I2.2a).
func NewColumn(sec Section, mat Materials) (Column, error) {
	if err := mat.Validate(); err != nil {
		return Column{}, err
	}
	for _, v := range [...]float64{sec.As, sec.Ac, sec.Isx, sec.Isy, sec.Icx, sec.Icy, sec.T, sec.Lambda()} {
		if !(v > 0) || math.IsInf(v, 0) {
			return Column{}, fmt.Errorf("section %q: areas, moments of inertia, wall and wall ratio must be finite and greater than zero", sec.Name)
		}
	}
	if !(sec.SteelLbPerFt >= 0) || math.IsInf(sec.SteelLbPerFt, 0) {
		return Column{}, fmt.Errorf("section %q: steel weight %v is not accepted; a finite weight of zero or more, lb/ft", sec.Name, sec.SteelLbPerFt)
	}
	c := Column{Sec: sec, Mat: mat, fy: math.Min(mat.Fy, MaxFyStrength), wc: mat.Wc}
	if c.wc == 0 {
		c.wc = DefaultWc
	}
	fy, fc := c.fy, mat.Fc
	c.ec = math.Pow(c.wc, 1.5) * math.Sqrt(fc) // AISC 360-22 I2.1b: Ec = wc^1.5 √f′c, ksi (from memory)
	c.lim = TableI11a(sec.Round, fy)
	c.lam = sec.Lambda()
	if sec.As < 0.01*sec.Ag() {
		return c, fmt.Errorf("%s: As/Ag = %.4f is below 0.01, the least steel AISC 360-22 I2.2a permits", sec.Name, sec.As/sec.Ag())
	}
	if c.lam > c.lim.LambdaMax {
		return c, fmt.Errorf("%s: wall ratio %.1f exceeds %.1f, the largest AISC 360-22 Table I1.1a permits for a filled member", sec.Name, c.lam, c.lim.LambdaMax)
	}
	c.c2 = 0.85 // rectangular sections (AISC 360-22 I2.2b, from memory)
	if sec.Round {
		c.c2 = 0.95 // round sections: confinement (AISC 360-22 I2.2b, from memory)
	}
	c.pp = fy*sec.As + c.c2*fc*sec.Ac // Eq. I2-9 (Asr = 0: no longitudinal bars)
	c.py = fy*sec.As + 0.7*fc*sec.Ac  // Py of Eq. I2-10 (from memory)
	switch {
	case c.lam <= c.lim.LambdaP:
		c.cls = Compact
		c.pno = c.pp // Eq. I2-9
	case c.lam <= c.lim.LambdaR:
		c.cls = Noncompact
		d := (c.lam - c.lim.LambdaP) / (c.lim.LambdaR - c.lim.LambdaP)
		c.pno = c.pp - (c.pp-c.py)*d*d // Eq. I2-10
	default:
		c.cls = Slender
		if sec.Round {
			c.fcr = 0.72 * fy / math.Pow(sec.DT*fy/Es, 0.2) // Eq. I2-13 (from memory)
		} else {
			c.fcr = 9 * Es / (c.lam * c.lam) // Eq. I2-12 (from memory)
		}
		c.pno = c.fcr*sec.As + 0.7*fc*sec.Ac // Eq. I2-11
	}
	c.c3 = math.Min(0.9, 0.45+3*sec.As/sec.Ag()) // C3 of AISC 360-22 I2.2b, Asr = 0 (from memory)
	c.eix = Es*sec.Isx + c.c3*c.ec*sec.Icx       // EIeff, AISC 360-22 I2.2b (Isr = 0)
	c.eiy = Es*sec.Isy + c.c3*c.ec*sec.Icy
	c.pex, c.pey = math.Pi*math.Pi*c.eix, math.Pi*math.Pi*c.eiy
	c.rx, c.ry = math.Sqrt(sec.Isx/sec.As), math.Sqrt(sec.Isy/sec.As)
	c.sym = sec.Round || sec.H == sec.B
	c.mass = sec.SteelLbPerFt + sec.Ac/144*c.wc
	return c, nil
}

// Class returns the section's classification (Table I1.1a).
func (c *Column) Class() Class { return c.cls }

// Pno returns the nominal strength at zero length, kip (Eq. I2-9 to I2-11).
func (c *Column) Pno() float64 { return c.pno }

// Ec returns the fill's modulus of elasticity, ksi (I2.1b).
func (c *Column) Ec() float64 { return c.ec }

// C3 returns the coefficient of the fill's stiffness in EIeff (I2.2b).
func (c *Column) C3() float64 { return c.c3 }

// FyUsed returns the yield stress used in the strength, ksi (Fy, held to
// MaxFyStrength by I1.3).
func (c *Column) FyUsed() float64 { return c.fy }

// WeightLbPerFt returns the weight of the filled column, lb/ft: the tube's
// nominal weight plus the fill at its unit weight.
func (c *Column) WeightLbPerFt() float64 { return c.mass }

// Limits returns the Table I1.1a limits used.
func (c *Column) Limits() Limits { return c.lim }

// Lambda returns the classifying width-to-thickness ratio.
func (c *Column) Lambda() float64 { return c.lam }

// Regime is the part of the column curve the strength falls on.
type Regime uint8

// The three regimes named to the user.
const (
	Crushing  Regime = iota // Pn at least CrushingShare of Pno
	Inelastic               // Eq. I2-2 with a meaningful reduction
	Elastic                 // Eq. I2-3
)

// CrushingShare is the share of Pno above which the strength is described
// as crushing rather than buckling: a project convention for the words
// shown, not a clause; the strength always comes from Eq. I2-2 or I2-3.
const CrushingShare = 0.95

// Axis is the axis about which the governing buckling occurs.
type Axis uint8

// The two flexural axes.
const (
	AxisX Axis = iota // about the axis parallel to B (the strong axis of a rectangular tube)
	AxisY             // about the axis parallel to H (the weak axis)
)

// Mode is a small code of the governing mode: it changes exactly when the
// regime, the named axis or the classification changes. 0 means "not
// computed".
type Mode uint8

func makeMode(r Regime, a Axis, cl Class) Mode { return 1 + Mode(r)*6 + Mode(a)*3 + Mode(cl) }

// Regime returns the mode's regime.
func (m Mode) Regime() Regime { return Regime((m - 1) / 6) }

// Axis returns the mode's axis.
func (m Mode) Axis() Axis { return Axis((m - 1) % 6 / 3) }

// Class returns the classification carried by the mode.
func (m Mode) Class() Class { return Class((m - 1) % 3) }

// modeWords holds the words of every mode for a box (0) and a round tube
// (1), built once so that Words does not allocate.
var modeWords [2][19]string

func init() {
	for k := 0; k < 2; k++ {
		modeWords[k][0] = "not computed"
		for m := Mode(1); m <= 18; m++ {
			modeWords[k][m] = describe(k == 1, m)
		}
	}
}

func describe(symmetric bool, m Mode) string {
	var s string
	switch m.Regime() {
	case Crushing:
		s = "crushing of steel and fill"
	case Inelastic:
		s = "inelastic buckling"
	default:
		s = "elastic buckling"
	}
	if m.Regime() != Crushing && !symmetric {
		if m.Axis() == AxisX {
			s += " about the strong axis"
		} else {
			s += " about the weak axis"
		}
	}
	switch m.Class() {
	case Noncompact:
		s += ", noncompact walls"
	case Slender:
		s += ", slender walls buckle locally"
	}
	return s
}

// Words returns the mode in plain words; symmetric is true for square and
// round sections, whose axis is not named. It does not allocate.
func (m Mode) Words(symmetric bool) string {
	if m > 18 {
		return "not computed"
	}
	k := 0
	if symmetric {
		k = 1
	}
	return modeWords[k][m]
}

// Strength is the fast result of one column at one pair of effective
// lengths.
type Strength struct {
	Pn          float64 // nominal strength, kip (Eq. I2-2 or I2-3)
	Available   float64 // φc Pn or Pn/Ωc, kip
	Pe          float64 // governing elastic buckling load, kip (Eq. I2-5)
	Slenderness float64 // Lc/r of the tube about the governing axis
	Mode        Mode
}

// Symmetric reports whether the section is square or round, so that the
// buckling axis is not named.
func (c *Column) Symmetric() bool { return c.sym }

// Strength returns the available strength at effective lengths lcx and lcy
// (in) by AISC 360-22 I2.2b with I2.1b. It does not allocate. A zero length
// means no buckling about that axis; negative, NaN or infinite lengths give
// a zero Strength with Mode 0.
func (c *Column) Strength(lcx, lcy float64, m steel.Method) Strength {
	if !(lcx >= 0) || !(lcy >= 0) || math.IsInf(lcx, 1) || math.IsInf(lcy, 1) || c.pno <= 0 {
		return Strength{}
	}
	pe, axis, r, lc := c.pex/(lcx*lcx), AxisX, c.rx, lcx // Eq. I2-5 about x
	if pey := c.pey / (lcy * lcy); pey < pe {
		pe, axis, r, lc = pey, AxisY, c.ry, lcy
	}
	if c.sym {
		axis = AxisX
	}
	pn, regime := c.nominal(pe)
	if regime == Crushing {
		axis = AxisX
	}
	return Strength{Pn: pn, Available: pn * Factor(m), Pe: pe, Slenderness: lc / r, Mode: makeMode(regime, axis, c.cls)}
}

// nominal returns Pn for an elastic buckling load pe by Eq. I2-2 or I2-3.
func (c *Column) nominal(pe float64) (float64, Regime) {
	ratio := c.pno / pe
	if ratio <= 2.25 {
		pn := math.Exp(ratio*ln0658) * c.pno // Eq. I2-2: Pn = Pno 0.658^(Pno/Pe)
		if pn >= CrushingShare*c.pno {
			return pn, Crushing
		}
		return pn, Inelastic
	}
	return 0.877 * pe, Elastic // Eq. I2-3
}

var ln0658 = math.Log(0.658)

// Families lists the steel families that are filled, in display order.
var Families = []steel.Family{steel.HSSSquare, steel.HSSRect, steel.HSSRound}

// Prepare builds the filled column of every catalogue tube of one family
// (square, rectangular or round HSS) at the given materials, in catalogue
// order, leaving out the tubes AISC 360-22 does not permit as filled
// members (walls beyond the largest ratio of Table I1.1a, steel below 1 % of
// the gross area). It rejects bad materials and any other family.
func Prepare(f steel.Family, mat Materials) ([]Column, error) {
	if err := mat.Validate(); err != nil {
		return nil, err
	}
	if f != steel.HSSSquare && f != steel.HSSRect && f != steel.HSSRound {
		return nil, fmt.Errorf("family: %s is not accepted; HSS square, HSS rectangular or HSS round", f)
	}
	shapes := steel.FamilyShapes(f)
	out := make([]Column, 0, len(shapes))
	for i := range shapes {
		sec, err := NewSection(&shapes[i])
		if err != nil {
			continue
		}
		c, err := NewColumn(sec, mat)
		if err != nil {
			continue // outside Table I1.1a or I2.2a: not a candidate
		}
		out = append(out, c)
	}
	return out, nil
}
