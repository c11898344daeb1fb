package steel

import (
	"fmt"
	"math"
)

// element is one group of identical plate elements of a section checked
// for local buckling (AISC 360-22 B4.1 and E7.1), with everything that does
// not depend on the column's length worked out in advance.
type element struct {
	*elementKind
	count   float64 // how many such elements the section has
	b, t    float64 // width and thickness, in
	lambda  float64 // width-to-thickness ratio λ
	lambdaR float64 // limiting ratio λr of Table B4.1a
	c1, c2  float64 // effective width imperfection factors (Table E7.1, Eq. E7-4)
	fel     float64 // elastic local buckling stress Fel, ksi (Eq. E7-5)
	fcrLim  float64 // Fcr above which the element is reduced: Fy (λr/λ)², ksi
	slender bool    // λ > λr: the element is slender (Table B4.1a)
}

// elementKind names a kind of plate element and the table rows that
// govern it; kept apart from element so that the fast path touches only
// numbers.
type elementKind struct {
	name  string // e.g. "flange", "web", "wall b", "wall h"
	ratio string // e.g. "bf/2tf", "h/tw", "b/t"
	b21   string // the Table B4.1a case, e.g. "Table B4.1a case 1"
	e71   string // the Table E7.1 case, e.g. "Table E7.1 case (c)"
}

// The element kinds of the catalogue's sections.
var (
	kindFlange = &elementKind{"flange", "bf/2tf", "Table B4.1a case 1", "Table E7.1 case (c)"}
	kindWeb    = &elementKind{"web", "h/tw", "Table B4.1a case 5", "Table E7.1 case (a)"}
	kindWall   = &elementKind{"wall", "b/t", "Table B4.1a case 6", "Table E7.1 case (b)"}
	kindWallB  = &elementKind{"wall b", "b/t", "Table B4.1a case 6", "Table E7.1 case (b)"}
	kindWallH  = &elementKind{"wall h", "h/t", "Table B4.1a case 6", "Table E7.1 case (b)"}
)

// loss returns the area the element group loses to local buckling at the
// critical stress fcr, in² (AISC 360-22 Eq. E7-2 and E7-3).
func (e *element) loss(fcr float64) float64 {
	if !e.slender || fcr <= e.fcrLim { // Eq. E7-2: λ ≤ λr √(Fy/Fcr), be = b
		return 0
	}
	x := math.Sqrt(e.fel / fcr)
	be := e.b * (1 - e.c1*x) * x // Eq. E7-3
	if be >= e.b {
		return 0
	}
	return e.count * (e.b - be) * e.t
}

// Column is one catalogue shape at one yield stress with every
// length-independent quantity of AISC 360-22 Chapter E computed in advance.
// Build it with NewColumn or Columns.
type Column struct {
	Shape *Shape // the section
	Grade Grade  // the material; Fy is the yield stress used

	ag       float64 // gross area, in²
	fy       float64
	pex, pey float64 // π² E r², so that Fe = p/Lc² (Eq. E3-4)
	ezw, ezg float64 // π² E Cw/(Ix+Iy) and G J/(Ix+Iy) (Eq. E4-2); torsion false for closed sections
	torsion  bool
	sym      bool // rx = ry by symmetry (square, round): the axis is not named
	round    bool // round HSS or pipe: Ae does not depend on Fcr (E7.2)
	elems    [2]element
	nElem    int
	aeRound  float64 // round HSS and pipe: effective area of Eq. E7-6/E7-7, in²
	roundSl  bool    // round section slender in compression
	lim      float64 // 4.71 √(E/Fy) (E3)
	ok       bool    // false when Chapter E does not apply
	notOK    string  // why not
}

// NewColumn prepares a shape at yield stress fy (ksi); fy = 0 keeps the
// family's default grade. It rejects a nil shape and an fy outside
// MinFy..MaxFy, NaN or Inf.
func NewColumn(s *Shape, fy float64) (Column, error) {
	if s == nil {
		return Column{}, fmt.Errorf("shape: none given; a catalogue shape is required")
	}
	if err := CheckFy(fy); err != nil {
		return Column{}, err
	}
	g := DefaultGrade(s.Family)
	if fy != 0 && fy != g.Fy {
		g = Grade{Name: fmt.Sprintf("Fy = %g ksi", fy), Fy: fy}
	}
	c := Column{Shape: s, Grade: g, ag: s.A, fy: g.Fy, ok: true}
	pe := math.Pi * math.Pi * E
	c.pex, c.pey = pe*s.Rx*s.Rx, pe*s.Ry*s.Ry
	c.lim = 4.71 * math.Sqrt(E/c.fy)
	rootEF := math.Sqrt(E / c.fy)
	switch s.Family {
	case W, HP:
		c.torsion = true
		c.ezw = pe * s.Cw / (s.Ix + s.Iy)
		c.ezg = G * s.J / (s.Ix + s.Iy)
		// Table B4.1a case 1: flanges of rolled I-shapes; Table E7.1 case (c).
		c.addElement(element{elementKind: kindFlange, count: 4, b: s.Bf / 2, t: s.Tf, lambda: s.FlangeBT, lambdaR: 0.56 * rootEF, c1: 0.22})
		// Table B4.1a case 5: webs of doubly symmetric I-shapes; Table E7.1 case (a).
		c.addElement(element{elementKind: kindWeb, count: 1, b: s.WebHT * s.Tw, t: s.Tw, lambda: s.WebHT, lambdaR: 1.49 * rootEF, c1: 0.18})
	case HSSSquare:
		c.sym = true
		// Table B4.1a case 6: walls of rectangular HSS; Table E7.1 case (b).
		c.addElement(element{elementKind: kindWall, count: 4, b: s.WallBT * s.Tdes, t: s.Tdes, lambda: s.WallBT, lambdaR: 1.40 * rootEF, c1: 0.20})
	case HSSRect:
		c.addElement(element{elementKind: kindWallB, count: 2, b: s.WallBT * s.Tdes, t: s.Tdes, lambda: s.WallBT, lambdaR: 1.40 * rootEF, c1: 0.20})
		c.addElement(element{elementKind: kindWallH, count: 2, b: s.WallHT * s.Tdes, t: s.Tdes, lambda: s.WallHT, lambdaR: 1.40 * rootEF, c1: 0.20})
	case HSSRound, Pipe:
		c.sym, c.round = true, true
		c.aeRound = s.A
		lr := 0.11 * E / c.fy // Table B4.1a case 9
		switch {
		case s.DT <= lr: // Eq. E7-6: Ae = Ag
		case s.DT < 0.45*E/c.fy: // Eq. E7-7
			c.roundSl = true
			c.aeRound = math.Min(s.A, (0.038*E/(c.fy*s.DT)+2.0/3)*s.A)
		default:
			c.ok = false
			c.notOK = fmt.Sprintf("D/t = %.1f is not less than 0.45E/Fy = %.1f, beyond AISC 360-22 E7.2", s.DT, 0.45*E/c.fy)
		}
	}
	return c, nil
}

// addElement finishes an element's length-independent quantities and adds
// it to the column.
func (c *Column) addElement(e element) {
	e.c2 = (1 - math.Sqrt(1-4*e.c1)) / (2 * e.c1) // Eq. E7-4 (Table E7.1 lists it rounded)
	e.slender = e.lambda > e.lambdaR
	r := e.lambdaR / e.lambda
	e.fel = (e.c2 * r) * (e.c2 * r) * c.fy // Eq. E7-5
	e.fcrLim = c.fy * r * r
	c.elems[c.nElem] = e
	c.nElem++
}

// Fy returns the yield stress used, ksi.
func (c *Column) Fy() float64 { return c.fy }

// Slender reports whether any element of the section is slender for
// uniform compression (AISC 360-22 Table B4.1a), so that E7 applies.
func (c *Column) Slender() bool {
	if c.roundSl {
		return true
	}
	for i := 0; i < c.nElem; i++ {
		if c.elems[i].slender {
			return true
		}
	}
	return false
}

// Regime is the kind of failure that sets the critical stress.
type Regime uint8

// The three regimes named to the user.
const (
	Yielding  Regime = iota // Fcr at least YieldingShare·Fy: the column crushes
	Inelastic               // Eq. E3-2 with a meaningful reduction
	Elastic                 // Eq. E3-3
)

// YieldingShare is the share of Fy above which the critical stress is
// described as yielding (crushing) rather than buckling: a project
// convention for the words shown, not a clause; the strength always comes
// from Eq. E3-2 or E3-3.
const YieldingShare = 0.95

// Axis is the buckling mode that gives the smallest elastic buckling stress.
type Axis uint8

// The three buckling modes of Chapter E for doubly symmetric members.
const (
	AxisX       Axis = iota // flexural buckling about the strong (x) axis, Eq. E3-4 with Lcx/rx
	AxisY                   // flexural buckling about the weak (y) axis, Eq. E3-4 with Lcy/ry
	AxisTorsion             // torsional buckling, Eq. E4-2
)

// Mode is a small code of the governing mode: it changes exactly when the
// regime, the named axis or the presence of local buckling changes. The
// zero Mode means "not computed" (bad input or Chapter E does not apply).
type Mode uint8

func makeMode(r Regime, a Axis, local bool) Mode {
	m := 1 + Mode(r)*6 + Mode(a)*2
	if local {
		m++
	}
	return m
}

// Regime returns the mode's regime.
func (m Mode) Regime() Regime { return Regime((m - 1) / 6) }

// Axis returns the mode's buckling axis.
func (m Mode) Axis() Axis { return Axis((m - 1) % 6 / 2) }

// Local reports whether local buckling reduces the effective area.
func (m Mode) Local() bool { return m > 0 && (m-1)%2 == 1 }

var modeWords [len(familyNames)][19]string

func init() {
	for f := range familyNames {
		fam := Family(f)
		for m := Mode(1); m <= 18; m++ {
			modeWords[f][m] = describe(fam, m)
		}
		modeWords[f][0] = "not computed"
	}
}

// describe puts a mode in plain words for a family.
func describe(f Family, m Mode) string {
	var s string
	switch m.Regime() {
	case Yielding:
		s = "yielding (crushing)"
	case Inelastic:
		s = "inelastic"
	default:
		s = "elastic"
	}
	if m.Regime() != Yielding {
		switch {
		case m.Axis() == AxisTorsion:
			s += " torsional buckling"
		case f == HSSSquare || f.Round():
			s += " buckling"
		case m.Axis() == AxisX:
			s += " buckling about the strong axis"
		default:
			s += " buckling about the weak axis"
		}
	}
	if m.Local() {
		s += ", local buckling reduces the effective area"
	}
	return s
}

// Words returns the mode in plain words for a family, e.g. "inelastic
// buckling about the weak axis". The strings are fixed: no allocation.
func (m Mode) Words(f Family) string {
	if f < 0 || int(f) >= len(familyNames) || m > 18 {
		return "not computed"
	}
	return modeWords[f][m]
}

// Strength is the fast result of one column at one set of effective
// lengths, without a trace.
type Strength struct {
	Pn          float64 // nominal compressive strength, kip (Eq. E3-1 or E7-1)
	Available   float64 // φc Pn (LRFD) or Pn/Ωc (ASD), kip
	Fe          float64 // governing elastic buckling stress, ksi
	Fcr         float64 // critical stress, ksi
	Ae          float64 // effective area, in² (Ag without slender elements)
	Slenderness float64 // governing slenderness π√(E/Fe); equals Lc/r for flexural buckling
	Mode        Mode    // governing mode; 0 when not computed
}

// Strength returns the available strength at effective lengths lcx, lcy
// (flexural) and lcz (torsional), in inches, by AISC 360-22 E3, E4 and E7.
// It does not allocate. Special cases: a zero length means no buckling
// about that axis (Fe = +Inf); lengths that are negative, NaN or Inf, or a
// section outside Chapter E, give a zero Strength with Mode 0.
func (c *Column) Strength(lcx, lcy, lcz float64, m Method) Strength {
	if !c.ok || !(lcx >= 0) || !(lcy >= 0) || !(lcz >= 0) || math.IsInf(lcx, 1) || math.IsInf(lcy, 1) || math.IsInf(lcz, 1) {
		return Strength{}
	}
	// Eq. E3-4 about each axis; Eq. E4-2 for torsional buckling.
	fe, axis := c.pex/(lcx*lcx), AxisX
	if fey := c.pey / (lcy * lcy); fey <= fe {
		fe, axis = fey, AxisY
	}
	if c.torsion {
		if fez := c.ezw/(lcz*lcz) + c.ezg; fez < fe {
			fe, axis = fez, AxisTorsion
		}
	}
	fcr, regime := c.critical(fe)
	ae := c.effectiveArea(fcr)
	local := ae < c.ag
	if c.sym && axis != AxisTorsion {
		axis = AxisX
	}
	if regime == Yielding {
		axis = AxisX
	}
	pn := fcr * ae // Eq. E3-1 / E7-1
	return Strength{
		Pn: pn, Available: pn * m.Factor(), Fe: fe, Fcr: fcr, Ae: ae,
		Slenderness: math.Pi * math.Sqrt(E/fe), Mode: makeMode(regime, axis, local),
	}
}

// critical returns Fcr for an elastic buckling stress fe by Eq. E3-2 or
// E3-3 and the regime it falls in.
func (c *Column) critical(fe float64) (float64, Regime) {
	ratio := c.fy / fe
	// E3 states the limit as Lc/r ≤ 4.71√(E/Fy) or Fy/Fe ≤ 2.25; the second
	// form is used because it also serves E4 (the two differ by 0.1 % in Fe).
	if ratio <= 2.25 {
		fcr := math.Exp(ratio*ln0658) * c.fy // Eq. E3-2: Fcr = 0.658^(Fy/Fe) Fy
		if fcr >= YieldingShare*c.fy {
			return fcr, Yielding
		}
		return fcr, Inelastic
	}
	return 0.877 * fe, Elastic // Eq. E3-3
}

var ln0658 = math.Log(0.658)

// effectiveArea returns Ae at critical stress fcr (AISC 360-22 E7.1 and
// E7.2); Ag when no element is slender.
func (c *Column) effectiveArea(fcr float64) float64 {
	if c.round {
		return c.aeRound
	}
	ae := c.ag
	for i := 0; i < c.nElem; i++ {
		ae -= c.elems[i].loss(fcr)
	}
	return ae
}

// Options choose the columns Columns builds.
type Options struct {
	Fy       float64  // yield stress override for every family, ksi; 0 keeps each family's default grade
	Families []Family // families to include; empty means all
}

// Columns prepares every catalogue shape of the chosen families at the
// chosen yield stress, in catalogue order.
func Columns(o Options) ([]Column, error) {
	if err := CheckFy(o.Fy); err != nil {
		return nil, err
	}
	want := [len(familyNames)]bool{}
	for _, f := range o.Families {
		if f < 0 || int(f) >= len(familyNames) {
			return nil, fmt.Errorf("steel family: %d is not accepted; give one of 0..%d", int(f), len(familyNames)-1)
		}
		want[f] = true
	}
	all := Catalog()
	out := make([]Column, 0, len(all))
	for i := range all {
		if len(o.Families) > 0 && !want[all[i].Family] {
			continue
		}
		c, err := NewColumn(&all[i], o.Fy)
		if err != nil {
			return nil, err
		}
		out = append(out, c)
	}
	return out, nil
}
