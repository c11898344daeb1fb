package concrete

import (
	"math"
	"strconv"
)

// Shape is the outline of a column section.
type Shape int

// The two outlines.
const (
	Rectangular Shape = iota // square or rectangular, b along x, h along y, h ≥ b
	Circular                 // round, diameter D
)

// Transverse is the kind of transverse reinforcement.
type Transverse int

// The two kinds of transverse reinforcement.
const (
	Tied   Transverse = iota // ties or circular hoops (ACI 318-19 25.7.2)
	Spiral                   // a continuous spiral (ACI 318-19 25.7.3)
)

// String returns "ties" or "spiral".
func (t Transverse) String() string {
	if t == Spiral {
		return "spiral"
	}
	return "ties"
}

// Series is the size series a section belongs to, which also fixes how its designation is written.
type Series int

// The two size series.
const (
	SeriesUS Series = iota // inch sizes, f'c in ksi
	SeriesSI               // millimetre sizes, f'c in MPa
)

// Axis selects a principal axis of bending.
type Axis int

// The two principal axes. Bending about x uses the depth h (the larger
// dimension); bending about y uses the width b.
const (
	AxisX Axis = 0 // strong axis
	AxisY Axis = 1 // weak axis
)

// String returns "x" or "y".
func (a Axis) String() string {
	if a == AxisY {
		return "y"
	}
	return "x"
}

// Kind is the family a section belongs to.
type Kind int

// The four families.
const (
	TiedSquare Kind = iota
	TiedRectangular
	SpiralRound
	TiedRound
)

// String returns the family name shown to a reader, e.g. "Tied square".
func (k Kind) String() string {
	switch k {
	case TiedSquare:
		return "Tied square"
	case TiedRectangular:
		return "Tied rectangular"
	case SpiralRound:
		return "Spiral round"
	case TiedRound:
		return "Tied round"
	}
	return "unknown"
}

// Spec is what defines a section: outline, materials and bars. The package
// places the bars evenly around the perimeter.
type Spec struct {
	Shape      Shape
	WidthMM    float64 // b (along x) of a rectangle, or the diameter D of a round section, mm
	DepthMM    float64 // h (along y) of a rectangle, h ≥ b; ignored for a round section, mm
	Transverse Transverse
	FcMPa      float64 // specified compressive strength f'c, MPa
	Grade      int     // ASTM A615 grade of all bars, 60 or 80
	BarSize    int     // longitudinal bar number, one of LongitudinalSizes
	NBars      int     // number of longitudinal bars
	CoverMM    float64 // clear cover to the ties or spiral, mm
	Series     Series  // size series, for the designation
}

// Limits on section size accepted by NewSection.
const (
	MinSizeMM = 8 * MMPerInch  // 8 in (203 mm)
	MaxSizeMM = 60 * MMPerInch // 60 in (1,524 mm)
	MaxAspect = 4.0            // h/b at most 4 (beyond it the member is a wall)
	MaxCover  = 4 * MMPerInch  // 4 in (102 mm)
)

// Section is one column section with its bars, properties, axial limit and
// cached interaction diagrams. It is read-only after NewSection.
type Section struct {
	Spec
	Kind        Kind
	Designation string // e.g. "16x16 in tied, 8 #9, 5 ksi"

	Bar        Bar          // longitudinal bar
	Tie        Bar          // tie or spiral bar
	TieSpaceMM float64      // tie spacing or spiral pitch, mm
	RhoS       float64      // spiral volumetric ratio provided (0 for ties)
	RhoSMin    float64      // ACI 318-19 Eq. 25.7.3.3 minimum ρs (0 for ties)
	BarsXY     [][2]float64 // bar centres from the centroid, mm
	NX, NY     int          // bars along each b face and each h face, corners included (rectangles)
	ClearMM    float64      // smallest clear spacing between bars, mm
	MinClearMM float64      // ACI 318-19 25.2.3 minimum clear spacing, mm

	FyMPa    float64    // specified yield strength, MPa
	EcMPa    float64    // ACI 318-19 19.2.2.1(b)
	Beta1    float64    // ACI 318-19 Table 22.2.2.4.3
	EpsTy    float64    // fy/Es, ACI 318-19 21.2.2.1
	PhiC     float64    // φ for compression-controlled sections, ACI 318-19 Table 21.2.2
	AgMM2    float64    // gross area, mm²
	AstMM2   float64    // longitudinal steel area, mm²
	Rho      float64    // ρg = Ast/Ag
	Ig       [2]float64 // gross moment of inertia about x and y, mm⁴
	Ise      [2]float64 // moment of inertia of the bars about x and y, mm⁴
	Depth    [2]float64 // section dimension in the direction of bending about x (h) and y (b), mm
	R        [2]float64 // radius of gyration by ACI 318-19 6.2.5.2, mm
	P0       float64    // ACI 318-19 Eq. 22.4.2.2, N
	PnMax    float64    // ACI 318-19 Table 22.4.2.1, N
	PhiPnMax float64    // φPn,max, N

	ConcreteM3PerM float64 // concrete volume per metre of column, m³/m
	SteelKgPerM    float64 // longitudinal and transverse steel per metre, kg/m
	MassKgPerM     float64 // total mass per metre, kg/m

	diag [2]diagram
}

// Width returns b (or D), mm.
func (s *Section) Width() float64 { return s.WidthMM }

// DepthH returns h (or D), mm.
func (s *Section) DepthH() float64 {
	if s.Shape == Circular {
		return s.WidthMM
	}
	return s.DepthMM
}

// PlanAreaMM2 returns the plan area occupied, mm² (b·h, or πD²/4).
func (s *Section) PlanAreaMM2() float64 { return s.AgMM2 }

// NewSection checks a spec, places the bars and ties, computes the
// properties and builds both interaction diagrams. Each special case is a
// named error: an outline, strength, grade, bar, cover or count outside the
// accepted range, bars that do not fit at the ACI 318-19 25.2.3 clear
// spacing, or ρg outside 1% to 8% (10.6.1.1).
func NewSection(sp Spec) (*Section, error) {
	s := &Section{Spec: sp}
	if err := s.check(); err != nil {
		return nil, err
	}
	if err := s.layout(); err != nil {
		return nil, err
	}
	s.properties()
	s.buildDiagrams()
	return s, nil
}

func (s *Section) check() error {
	sp := &s.Spec
	if sp.Shape != Rectangular && sp.Shape != Circular {
		return badInput("shape", float64(sp.Shape), "rectangular (0) or circular (1)")
	}
	if sp.Transverse != Tied && sp.Transverse != Spiral {
		return badInput("transverse", float64(sp.Transverse), "ties (0) or spiral (1)")
	}
	if sp.Transverse == Spiral && sp.Shape != Circular {
		return &InputError{Field: "transverse", Value: "spiral", Accepted: "ties for a rectangular section (spirals are for round sections here)"}
	}
	if !finite(sp.WidthMM) || sp.WidthMM < MinSizeMM || sp.WidthMM > MaxSizeMM {
		return badInput("width", sp.WidthMM, "a section width or diameter from 8 in to 60 in (203 to 1,524 mm)")
	}
	if sp.Shape == Circular {
		sp.DepthMM = sp.WidthMM
	} else {
		if !finite(sp.DepthMM) || sp.DepthMM < sp.WidthMM || sp.DepthMM > MaxAspect*sp.WidthMM || sp.DepthMM > MaxSizeMM {
			return badInput("depth", sp.DepthMM, "a depth h from the width b up to 4b and 60 in (1,524 mm)")
		}
	}
	if err := CheckFc(sp.FcMPa); err != nil {
		return err
	}
	if sp.Grade != 60 && sp.Grade != 80 {
		return badInput("bar grade", float64(sp.Grade), "ASTM A615 grade 60 or 80")
	}
	b, ok := BarBySize(sp.BarSize)
	if !ok || sp.BarSize < 5 {
		return badInput("bar size", float64(sp.BarSize), "a longitudinal bar #5 to #11, #14 or #18")
	}
	s.Bar = b
	if !finite(sp.CoverMM) || sp.CoverMM < DefaultCoverMM-0.05 || sp.CoverMM > MaxCover {
		return badInput("cover", sp.CoverMM, "a clear cover to the ties from 1.5 in (38 mm, ACI 318-19 20.5.1.3.1) to 4 in (102 mm)")
	}
	minBars := 4 // ACI 318-19 10.7.3.1: at least 4 bars within rectangular ties
	if sp.Shape == Circular {
		minBars = 6 // at least 6 within spirals (10.7.3.1); also used for round ties
	}
	if sp.NBars < minBars || sp.NBars > 400 {
		return badInput("bars", float64(sp.NBars), "at least "+strconv.Itoa(minBars)+" longitudinal bars (ACI 318-19 10.7.3.1)")
	}
	if sp.Shape == Rectangular && sp.NBars%2 != 0 {
		return badInput("bars", float64(sp.NBars), "an even number of bars placed symmetrically around a rectangle")
	}
	if sp.Shape == Rectangular && sp.WidthMM == sp.DepthMM && sp.NBars%4 != 0 {
		return badInput("bars", float64(sp.NBars), "4, 8, 12, ... bars around a square (the same number on each face)")
	}
	switch sp.Series {
	case SeriesUS, SeriesSI:
	default:
		return badInput("series", float64(sp.Series), "US (0) or SI (1)")
	}
	return nil
}

// rectArrangement returns the bars per b face and per h face (corners
// included) that spread n bars most evenly: the pair with the largest
// smaller centre-to-centre spacing. bc and hc are the distances between
// corner-bar centres.
func rectArrangement(n int, bc, hc float64, square bool) (nx, ny int, sx, sy float64) {
	if square {
		nx = (n + 4) / 4
		s := bc / float64(nx-1)
		return nx, nx, s, s
	}
	best := -1.0
	for x := 2; ; x++ {
		y := (n+4)/2 - x
		if y < 2 {
			break
		}
		a, b := bc/float64(x-1), hc/float64(y-1)
		if m := math.Min(a, b); m > best {
			best, nx, ny, sx, sy = m, x, y, a, b
		}
	}
	return nx, ny, sx, sy
}

// layout places the bars and the transverse reinforcement.
func (s *Section) layout() error {
	db := s.Bar.DiaMM
	s.MinClearMM = minClearSpacing(db) // ACI 318-19 25.2.3
	if s.Transverse == Tied {
		s.Tie = tieFor(s.BarSize) // ACI 318-19 25.7.2.2
	}
	if s.Shape == Rectangular {
		e := s.CoverMM + s.Tie.DiaMM + db/2 // face to bar centre
		bc, hc := s.WidthMM-2*e, s.DepthMM-2*e
		if bc <= db || hc <= db {
			return badInput("bars", float64(s.NBars), "bars that fit inside the ties: this section is too small for "+s.BarName(s.Bar)+" bars")
		}
		nx, ny, sx, sy := rectArrangement(s.NBars, bc, hc, s.WidthMM == s.DepthMM)
		s.NX, s.NY = nx, ny
		s.ClearMM = math.Min(sx, sy) - db
		if s.ClearMM < s.MinClearMM-1e-9 {
			return badInput("bars", float64(s.NBars), "bars that fit at the ACI 318-19 25.2.3 clear spacing of "+
				strconv.FormatFloat(s.MinClearMM, 'f', 1, 64)+" mm: "+strconv.Itoa(s.NBars)+" "+s.BarName(s.Bar)+" bars leave "+
				strconv.FormatFloat(s.ClearMM, 'f', 1, 64)+" mm")
		}
		xs := make([][2]float64, 0, s.NBars)
		for i := 0; i < nx; i++ { // the two b faces, corners included
			x := -bc/2 + float64(i)*sx
			xs = append(xs, [2]float64{x, -hc / 2}, [2]float64{x, hc / 2})
		}
		for j := 1; j < ny-1; j++ { // the two h faces between the corners
			y := -hc/2 + float64(j)*sy
			xs = append(xs, [2]float64{-bc / 2, y}, [2]float64{bc / 2, y})
		}
		s.BarsXY = xs
	} else {
		if s.Transverse == Spiral {
			if err := s.spiral(); err != nil {
				return err
			}
		}
		rb := s.WidthMM/2 - s.CoverMM - s.Tie.DiaMM - db/2 // radius to bar centres
		if rb <= db {
			return badInput("bars", float64(s.NBars), "bars that fit inside the ties or spiral: this section is too small for "+s.BarName(s.Bar)+" bars")
		}
		chord := 2 * rb * math.Sin(math.Pi/float64(s.NBars))
		s.ClearMM = chord - db
		if s.ClearMM < s.MinClearMM-1e-9 {
			return badInput("bars", float64(s.NBars), "bars that fit at the ACI 318-19 25.2.3 clear spacing of "+
				strconv.FormatFloat(s.MinClearMM, 'f', 1, 64)+" mm: "+strconv.Itoa(s.NBars)+" "+s.BarName(s.Bar)+" bars leave "+
				strconv.FormatFloat(s.ClearMM, 'f', 1, 64)+" mm")
		}
		xs := make([][2]float64, s.NBars)
		for i := range xs {
			t := math.Pi/2 + 2*math.Pi*float64(i)/float64(s.NBars) // one bar on the +y axis
			xs[i] = [2]float64{rb * math.Cos(t), rb * math.Sin(t)}
		}
		s.BarsXY = xs
	}
	s.AgMM2 = s.WidthMM * s.DepthMM
	if s.Shape == Circular {
		s.AgMM2 = math.Pi * s.WidthMM * s.WidthMM / 4
	}
	s.AstMM2 = float64(s.NBars) * s.Bar.AreaMM2
	s.Rho = s.AstMM2 / s.AgMM2
	if s.Rho < MinRho-1e-12 || s.Rho > MaxRho+1e-12 { // ACI 318-19 10.6.1.1
		return badInput("reinforcement ratio", s.Rho, "ρg from 0.01 to 0.08 (ACI 318-19 10.6.1.1)")
	}
	if s.Transverse == Tied {
		// ACI 318-19 25.7.2.1: spacing at most 16 db, 48 dtie and the least dimension.
		s.TieSpaceMM = math.Min(16*db, math.Min(48*s.Tie.DiaMM, s.WidthMM))
	}
	return nil
}

// spiral chooses the lightest spiral bar (#3, #4 or #5) and the largest
// pitch that meet ACI 318-19 Eq. 25.7.3.3 and the 1 in to 3 in clear spacing
// of 25.7.3.1.
func (s *Section) spiral() error {
	dch := s.WidthMM - 2*s.CoverMM // core diameter to the outside of the spiral
	if dch <= 0 {
		return badInput("cover", s.CoverMM, "a cover smaller than half the diameter")
	}
	ag := math.Pi * s.WidthMM * s.WidthMM / 4
	ach := math.Pi * dch * dch / 4
	fyt := FyMPa(s.Grade)
	s.RhoSMin = 0.45 * (ag/ach - 1) * s.FcMPa / fyt // ACI 318-19 Eq. 25.7.3.3
	for _, size := range []int{3, 4, 5} {
		sp, _ := BarBySize(size) // ACI 318-19 25.7.3.2: at least 3/8 in diameter
		pitch := math.Min(4*sp.AreaMM2/(dch*s.RhoSMin), maxSpiralClear+sp.DiaMM)
		if pitch-sp.DiaMM >= minSpiralClear {
			s.Tie, s.TieSpaceMM = sp, pitch
			s.RhoS = 4 * sp.AreaMM2 / (dch * pitch)
			return nil
		}
	}
	return badInput("f'c", s.FcMPa, "a strength whose ACI 318-19 Eq. 25.7.3.3 spiral fits with #5 or smaller at 1 in clear")
}

// properties computes the section constants, the axial limit and the mass.
func (s *Section) properties() {
	s.FyMPa = FyMPa(s.Grade)
	s.EcMPa = Ec(s.FcMPa)       // ACI 318-19 19.2.2.1(b)
	s.Beta1 = Beta1(s.FcMPa)    // ACI 318-19 Table 22.2.2.4.3
	s.EpsTy = s.FyMPa / EsMPa   // ACI 318-19 21.2.2.1
	s.PhiC = 0.65               // ACI 318-19 Table 21.2.2: compression-controlled, other
	if s.Transverse == Spiral { // ... with spirals conforming to 25.7.3
		s.PhiC = 0.75
	}
	b, h := s.WidthMM, s.DepthMM
	if s.Shape == Rectangular {
		s.Ig = [2]float64{b * h * h * h / 12, h * b * b * b / 12}
		s.R = [2]float64{0.3 * h, 0.3 * b} // ACI 318-19 6.2.5.2(a)
	} else {
		i := math.Pi * math.Pow(b, 4) / 64
		s.Ig = [2]float64{i, i}
		s.R = [2]float64{0.25 * b, 0.25 * b} // ACI 318-19 6.2.5.2(b)
	}
	s.Depth = [2]float64{h, b}
	for _, p := range s.BarsXY {
		s.Ise[AxisX] += s.Bar.AreaMM2 * p[1] * p[1]
		s.Ise[AxisY] += s.Bar.AreaMM2 * p[0] * p[0]
	}
	s.P0 = 0.85*s.FcMPa*(s.AgMM2-s.AstMM2) + s.FyMPa*s.AstMM2 // ACI 318-19 Eq. 22.4.2.2
	if s.Transverse == Spiral {
		s.PnMax = 0.85 * s.P0 // ACI 318-19 Table 22.4.2.1(b)
	} else {
		s.PnMax = 0.80 * s.P0 // ACI 318-19 Table 22.4.2.1(a)
	}
	s.PhiPnMax = s.PhiC * s.PnMax

	// Transverse steel per metre: perimeter ties (with two 6dtie hook
	// extensions, ACI 318-19 25.3.2) or the spiral helix; crossties not counted.
	var transMM3 float64
	t := s.Tie
	switch {
	case s.Transverse == Spiral:
		dc := s.WidthMM - 2*s.CoverMM - t.DiaMM
		turn := math.Hypot(math.Pi*dc, s.TieSpaceMM)
		transMM3 = t.AreaMM2 * turn * 1000 / s.TieSpaceMM
	case s.Shape == Circular:
		dc := s.WidthMM - 2*s.CoverMM - t.DiaMM
		transMM3 = t.AreaMM2 * (math.Pi*dc + 12*t.DiaMM) * 1000 / s.TieSpaceMM
	default:
		per := 2*(b-2*s.CoverMM-t.DiaMM) + 2*(h-2*s.CoverMM-t.DiaMM)
		transMM3 = t.AreaMM2 * (per + 12*t.DiaMM) * 1000 / s.TieSpaceMM
	}
	steelM3 := (s.AstMM2*1000 + transMM3) * 1e-9
	s.ConcreteM3PerM = (s.AgMM2 - s.AstMM2) * 1e-6
	s.SteelKgPerM = steelM3 * SteelDensity
	s.MassKgPerM = s.ConcreteM3PerM*ConcreteDensity + s.SteelKgPerM

	switch {
	case s.Shape == Circular && s.Transverse == Spiral:
		s.Kind = SpiralRound
	case s.Shape == Circular:
		s.Kind = TiedRound
	case s.WidthMM == s.DepthMM:
		s.Kind = TiedSquare
	default:
		s.Kind = TiedRectangular
	}
	s.Designation = s.designation()
}

func trimNum(v float64) string { return strconv.FormatFloat(v, 'f', -1, 64) }

// designation writes the section as a reader says it, e.g. "16x16 in tied, 8 #9, 5 ksi".
func (s *Section) designation() string {
	var size, fc string
	if s.Series == SeriesUS {
		b := trimNum(math.Round(s.WidthMM/MMPerInch*10) / 10)
		h := trimNum(math.Round(s.DepthMM/MMPerInch*10) / 10)
		if s.Shape == Circular {
			size = b + " in round"
		} else {
			size = b + "x" + h + " in"
		}
		fc = trimNum(math.Round(s.FcMPa/MPaPerKsi*10)/10) + " ksi"
	} else {
		b := trimNum(math.Round(s.WidthMM))
		h := trimNum(math.Round(s.DepthMM))
		if s.Shape == Circular {
			size = b + " mm round"
		} else {
			size = b + "x" + h + " mm"
		}
		fc = trimNum(math.Round(s.FcMPa*10)/10) + " MPa"
	}
	tr := "tied"
	if s.Transverse == Spiral {
		tr = "spiral"
	}
	g := ""
	if s.Grade == 80 {
		g = " Gr 80"
	}
	return size + " " + tr + ", " + strconv.Itoa(s.NBars) + " " + s.BarName(s.Bar) + g + ", " + fc
}

// BarName names a bar in the section's series: inch-pound (#9) for US
// sizes, soft metric (#29) for SI sizes.
func (s *Section) BarName(b Bar) string {
	if s.Series == SeriesSI {
		return b.MetricName()
	}
	return b.Name()
}
