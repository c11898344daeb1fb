// Package steel sizes steel columns in axial compression by AISC 360-22
// Chapter E for rolled W and HP shapes, square, rectangular and round HSS
// and pipe.
//
// Everything inside the package is US customary: inches, kips, ksi. The
// catalogue stores only published dimensions; areas, moments of inertia,
// radii of gyration, weights and element slenderness ratios are derived from
// them when the catalogue is first used.
package steel

import (
	"fmt"
	"math"
	"strconv"
	"strings"
	"sync"
)

// Family is a kind of steel section.
type Family int

// The six section families.
const (
	W         Family = iota // rolled wide-flange shape
	HP                      // rolled bearing-pile shape
	HSSSquare               // square hollow structural section
	HSSRect                 // rectangular hollow structural section
	HSSRound                // round hollow structural section
	Pipe                    // standard, extra-strong or double-extra-strong pipe
)

// Families lists the six families in display order.
var Families = []Family{W, HP, HSSSquare, HSSRect, HSSRound, Pipe}

var familyNames = [...]string{"W", "HP", "HSS square", "HSS rectangular", "HSS round", "Pipe"}

// String returns the family's display name, e.g. "HSS rectangular".
func (f Family) String() string {
	if f < 0 || int(f) >= len(familyNames) {
		return "Family(" + strconv.Itoa(int(f)) + ")"
	}
	return familyNames[f]
}

// ParseFamily returns the family with the given display name.
func ParseFamily(name string) (Family, error) {
	for i, n := range familyNames {
		if strings.EqualFold(n, strings.TrimSpace(name)) {
			return Family(i), nil
		}
	}
	return 0, fmt.Errorf("steel family: %q is not accepted; give one of %s", name, strings.Join(familyNames[:], ", "))
}

// IShaped reports whether the family is a rolled I-shape (W or HP).
func (f Family) IShaped() bool { return f == W || f == HP }

// Round reports whether the family is a round tube (round HSS or pipe).
func (f Family) Round() bool { return f == HSSRound || f == Pipe }

// Physical constants used throughout.
const (
	E             = 29000.0               // modulus of elasticity of steel, ksi (AISC 360-22 Symbols)
	G             = 11200.0               // shear modulus of steel, ksi (AISC 360-22 Symbols)
	SteelLbPerFt3 = 490.0                 // density of steel used for nominal weights, lb/ft³
	lbftPerIn2    = SteelLbPerFt3 / 144.0 // lb/ft of length per in² of area
	// HSSDesignWall is the ratio of design to nominal wall of ASTM A500 HSS
	// and of pipe (AISC 360-22 B4.2).
	HSSDesignWall = 0.93
)

// Shape holds a section's published dimensions (inches) and the properties
// derived from them.
type Shape struct {
	Name   string // designation spelled as the AISC Manual labels it, e.g. "W14X90"
	Family Family

	// Published dimensions, in.
	D, Bf, Tw, Tf, Kdes float64 // W and HP: depth, flange width, web and flange thickness, design k
	H, B                float64 // square and rectangular HSS: outside height (strong axis depth) and width
	OD                  float64 // round HSS and pipe: outside diameter
	Tnom                float64 // HSS and pipe: nominal wall
	Tdes                float64 // HSS and pipe: design wall, 0.93 Tnom (AISC 360-22 B4.2)

	// Derived properties.
	A        float64 // gross area, in²
	Ix, Iy   float64 // moments of inertia about the strong and weak axes, in⁴
	Rx, Ry   float64 // radii of gyration, in
	J        float64 // torsional constant, in⁴
	Cw       float64 // warping constant, in⁶ (0 for closed sections)
	Weight   float64 // nominal weight, lb/ft (HSS and pipe from the nominal wall, as published)
	FlangeBT float64 // W, HP: bf/2tf
	WebHT    float64 // W, HP: h/tw with h = d − 2kdes
	WallBT   float64 // rectangular HSS: b/t with b = B − 3t
	WallHT   float64 // rectangular HSS: h/t with h = H − 3t
	DT       float64 // round HSS and pipe: D/t

	// AreaNote says where A comes from when it is not derived from the
	// dimensions (pipe with a published tabulated area); "" otherwise.
	AreaNote string
}

// KgPerMPerLbPerFt converts a weight in lb/ft to a mass in kg/m.
const KgPerMPerLbPerFt = 0.45359237 / 0.3048

// MassKgPerM returns the mass per metre of column, kg/m, from the published
// nominal weight.
func (s *Shape) MassKgPerM() float64 { return s.Weight * KgPerMPerLbPerFt }

// FootprintIn returns the plan dimensions in inches: d × bf for W and HP,
// B × H for square and rectangular HSS, OD × OD for round HSS and pipe.
func (s *Shape) FootprintIn() [2]float64 {
	switch {
	case s.Family.IShaped():
		return [2]float64{s.D, s.Bf}
	case s.Family.Round():
		return [2]float64{s.OD, s.OD}
	default:
		return [2]float64{s.B, s.H}
	}
}

// PlanAreaIn2 returns the plan area the column occupies, in²: the
// bounding rectangle for W, HP and box sections and πD²/4 for round ones.
func (s *Shape) PlanAreaIn2() float64 {
	if s.Family.Round() {
		return math.Pi * s.OD * s.OD / 4
	}
	f := s.FootprintIn()
	return f[0] * f[1]
}

// spandrel constants: the area between a square of side r and the quarter
// circle of radius r inscribed in it, with its centroid offset from both
// straight sides and its own centroidal moment of inertia.
const (
	spandrelArea = 1 - math.Pi/4                      // × r²
	spandrelBar  = (5.0/6 - math.Pi/4) / spandrelArea // × r, centroid from each straight side
)

var spandrelI = (1 - 5*math.Pi/16) - spandrelArea*spandrelBar*spandrelBar // × r⁴, about own centroid

// newIShape derives the properties of a rolled I-shape from its published
// dimensions, counting the four web-to-flange fillets of radius kdes − tf.
func newIShape(fam Family, r wRow) Shape {
	prefix := "W"
	if fam == HP {
		prefix = "HP"
	}
	name := prefix + strconv.Itoa(r.nominal) + "X" + strconv.FormatFloat(r.weight, 'f', -1, 64)
	d, bf, tw, tf := r.d, r.bf, r.tw, r.tf
	rf := r.kdes - tf // fillet radius
	if rf < 0 {
		rf = 0
	}
	af := spandrelArea * rf * rf
	hw := d - 2*tf // clear web between flanges
	A := 2*bf*tf + hw*tw + 4*af
	yf := hw/2 - spandrelBar*rf // fillet centroid from the x axis
	xf := tw/2 + spandrelBar*rf // fillet centroid from the y axis
	ic := spandrelI * rf * rf * rf * rf
	Ix := (bf*d*d*d-(bf-tw)*hw*hw*hw)/12 + 4*(ic+af*yf*yf)
	Iy := (2*tf*bf*bf*bf+hw*tw*tw*tw)/12 + 4*(ic+af*xf*xf)

	// Torsional constant of a rolled I-shape with fillets (El Darwish and
	// Johnston, as used in AISC Design Guide 9 Eq. 3.4 ff).
	t1, t2 := tw, tf
	if tf < tw {
		t1, t2 = tf, tw
	}
	j1 := bf * tf * tf * tf * (1.0/3 - 0.21*(tf/bf)*(1-math.Pow(tf/bf, 4)/12))
	j2 := hw * tw * tw * tw / 3
	alpha := (t1 / t2) * (0.15 + 0.10*rf/t1)
	dd := ((tf+rf)*(tf+rf) + tw*(rf+tw/4)) / (2*rf + tf)
	J := 2*j1 + j2 + 2*alpha*dd*dd*dd*dd
	ho := d - tf
	Cw := tf * bf * bf * bf * ho * ho / 24 // AISC Design Guide 9, doubly symmetric I-shape

	return Shape{
		Name: name, Family: fam,
		D: d, Bf: bf, Tw: tw, Tf: tf, Kdes: r.kdes,
		A: A, Ix: Ix, Iy: Iy, Rx: math.Sqrt(Ix / A), Ry: math.Sqrt(Iy / A),
		J: J, Cw: Cw, Weight: nominalWeight(name, A),
		FlangeBT: bf / (2 * tf), WebHT: (d - 2*r.kdes) / tw,
	}
}

// nominalWeight returns the weight a rolled shape's designation states
// (W14X90 weighs 90 lb/ft), which is the weight the Manual publishes; when the
// designation carries none it falls back to the area times the density.
func nominalWeight(name string, area float64) float64 {
	if i := strings.LastIndexByte(name, 'X'); i >= 0 {
		if w, err := strconv.ParseFloat(name[i+1:], 64); err == nil && w > 0 {
			return w
		}
	}
	return area * lbftPerIn2
}

// roundedRect returns the area and moment of inertia about the axis
// parallel to b of a b × h rectangle whose corners are rounded to radius r.
func roundedRect(b, h, r float64) (area, i float64) {
	ac := spandrelArea * r * r
	y := h/2 - spandrelBar*r
	area = b*h - 4*ac
	i = b*h*h*h/12 - 4*(spandrelI*r*r*r*r+ac*y*y)
	return
}

// boxSection returns the area and the two moments of inertia of a box of
// outside h × b with wall t and outside corner radius 2t (the HSS
// convention of the AISC Manual), and its torsional constant.
func boxSection(h, b, t float64) (a, ix, iy, j float64) {
	ro, ri := 2*t, t
	ao, ixo := roundedRect(b, h, ro)
	ai, ixi := roundedRect(b-2*t, h-2*t, ri)
	_, iyo := roundedRect(h, b, ro)
	_, iyi := roundedRect(h-2*t, b-2*t, ri)
	a, ix, iy = ao-ai, ixo-ixi, iyo-iyi
	// Thin-walled closed section: J = 4 Ap² t / p on the wall midline,
	// midline corner radius 1.5t.
	rm := 1.5 * t
	ap := (b-t)*(h-t) - (4-math.Pi)*rm*rm
	p := 2*((b-t)+(h-t)) - 2*(4-math.Pi)*rm
	j = 4 * ap * ap * t / p
	return
}

// newBox derives a square or rectangular HSS from its outside size and
// nominal wall. Properties use the design wall 0.93 tnom (AISC 360-22
// B4.2); the published weight uses the nominal wall.
func newBox(fam Family, name string, h, b, tnom float64) Shape {
	t := HSSDesignWall * tnom
	a, ix, iy, j := boxSection(h, b, t)
	an, _, _, _ := boxSection(h, b, tnom)
	return Shape{
		Name: name, Family: fam, H: h, B: b, Tnom: tnom, Tdes: t,
		A: a, Ix: ix, Iy: iy, Rx: math.Sqrt(ix / a), Ry: math.Sqrt(iy / a), J: j,
		Weight: an * lbftPerIn2,
		WallBT: (b - 3*t) / t, WallHT: (h - 3*t) / t, // AISC 360-22 B4.1b(d): flat = outside − 3t
	}
}

// newTube derives a round HSS or pipe from its outside diameter and
// nominal wall, with the design wall 0.93 tnom for both (AISC 360-22 B4.2,
// and the AISC Shapes Database treats pipe the same way).
func newTube(fam Family, name string, od, tnom float64) Shape {
	t := HSSDesignWall * tnom
	id := od - 2*t
	a := math.Pi / 4 * (od*od - id*id)
	i := math.Pi / 64 * (od*od*od*od - id*id*id*id)
	idn := od - 2*tnom
	an := math.Pi / 4 * (od*od - idn*idn)
	r := math.Sqrt(i / a)
	return Shape{
		Name: name, Family: fam, OD: od, Tnom: tnom, Tdes: t,
		A: a, Ix: i, Iy: i, Rx: r, Ry: r, J: 2 * i,
		Weight: an * lbftPerIn2, DT: od / t,
	}
}

// dimLabel writes an HSS side the way designations do: 8 → "8",
// 5.5 → "5-1/2", 3.25 → "3-1/4".
func dimLabel(x float64) string {
	whole := math.Floor(x)
	frac := x - whole
	w := strconv.Itoa(int(whole))
	switch {
	case frac < 1e-9:
		return w
	case math.Abs(frac-0.5) < 1e-9:
		return w + "-1/2"
	case math.Abs(frac-0.25) < 1e-9:
		return w + "-1/4"
	case math.Abs(frac-0.75) < 1e-9:
		return w + "-3/4"
	}
	return strconv.FormatFloat(x, 'f', -1, 64)
}

// fraction parses "5/16" into 0.3125 and "1" into 1.
func fraction(s string) float64 {
	i := strings.IndexByte(s, '/')
	if i < 0 {
		n, _ := strconv.Atoi(s)
		return float64(n)
	}
	n, _ := strconv.Atoi(s[:i])
	d, _ := strconv.Atoi(s[i+1:])
	return float64(n) / float64(d)
}

var (
	catOnce   sync.Once
	catShapes []Shape
	catIndex  map[string]int
)

func buildCatalog() {
	var out []Shape
	for _, r := range wRows {
		out = append(out, newIShape(W, r))
	}
	for _, r := range hpRows {
		out = append(out, newIShape(HP, r))
	}
	for _, r := range squareRows {
		for _, w := range r.walls {
			name := "HSS" + dimLabel(r.h) + "X" + dimLabel(r.b) + "X" + w
			out = append(out, newBox(HSSSquare, name, r.h, r.b, fraction(w)))
		}
	}
	for _, r := range rectRows {
		for _, w := range r.walls {
			name := "HSS" + dimLabel(r.h) + "X" + dimLabel(r.b) + "X" + w
			out = append(out, newBox(HSSRect, name, r.h, r.b, fraction(w)))
		}
	}
	for _, r := range roundRows {
		for _, t := range r.walls {
			name := "HSS" + strconv.FormatFloat(r.od, 'f', 3, 64) + "X" + strconv.FormatFloat(t, 'f', 3, 64)
			out = append(out, newTube(HSSRound, name, r.od, t))
		}
	}
	for _, r := range pipeRows {
		for _, c := range []struct {
			suffix string
			t      float64
		}{{"STD", r.std}, {"XS", r.xs}, {"XXS", r.xxs}} {
			if c.t > 0 {
				out = append(out, tabulatedPipe(newTube(Pipe, "Pipe"+r.nps+c.suffix, r.od, c.t)))
			}
		}
	}
	idx := make(map[string]int, len(out))
	for i := range out {
		idx[strings.ToUpper(out[i].Name)] = i
	}
	catShapes, catIndex = out, idx
}

// Catalog returns every shape of the catalogue, grouped by family in
// display order. The slice is shared: callers must not modify it.
func Catalog() []Shape {
	catOnce.Do(buildCatalog)
	return catShapes
}

// Lookup returns the shape with the given designation (case-insensitive),
// or an error naming the field when there is none.
func Lookup(name string) (*Shape, error) {
	catOnce.Do(buildCatalog)
	if i, ok := catIndex[strings.ToUpper(strings.TrimSpace(name))]; ok {
		return &catShapes[i], nil
	}
	return nil, fmt.Errorf("steel shape: %q is not accepted; give a designation from the catalogue such as W14X90, HSS8X8X1/2, HSS6.625X0.280 or Pipe6STD", name)
}

// FamilyShapes returns the shapes of one family in catalogue order.
func FamilyShapes(f Family) []Shape {
	all := Catalog()
	lo, hi := -1, -1
	for i := range all {
		if all[i].Family == f {
			if lo < 0 {
				lo = i
			}
			hi = i + 1
		}
	}
	if lo < 0 {
		return nil
	}
	return all[lo:hi]
}

// tabulatedPipe replaces a pipe's area by the published tabulated one where
// the table differs from OD and design wall (pipeTabulatedA), keeping I and
// r, which the table gives as OD and design wall do.
func tabulatedPipe(s Shape) Shape {
	a, ok := pipeTabulatedA[s.Name]
	if !ok {
		return s
	}
	s.AreaNote = fmt.Sprintf("A = %.3g in² as tabulated (AISC Manual Table 1-14, from memory); OD and design wall give %.3g in²", a, s.A)
	s.A = a
	return s
}
