package composite

import (
	"fmt"
	"math"
	"strconv"

	"upright/steel"
)

// Result is the full outcome of Check with its trace, in US customary units.
type Result struct {
	Section string       // the tube's AISC label
	Method  steel.Method // LRFD or ASD
	Fy      float64      // the yield stress used, ksi
	Fc      float64      // the fill's f′c, ksi
	Ec      float64      // the fill's modulus, ksi (I2.1b)
	As, Ac  float64      // steel and fill areas, in²
	C3      float64      // the fill's stiffness coefficient (I2.2b)

	Class                      Class   // Table I1.1a classification
	Lambda                     float64 // classifying wall ratio
	LambdaP, LambdaR, LambdaMx float64 // Table I1.1a limits
	Fcr                        float64 // slender walls: Eq. I2-12 or I2-13, ksi; 0 otherwise
	Pp, Py, Pno                float64 // plastic, yield and nominal zero-length strengths, kip

	K              float64      // effective-length factor used
	Lcx, Lcy       float64      // effective lengths, in
	EIx, EIy       float64      // EIeff about each axis, kip·in²
	Pex, Pey       float64      // elastic buckling loads, kip
	Pe             float64      // governing, kip
	GoverningAxis  Axis         // the axis of the smaller Pe
	Pn             float64      // nominal strength, kip
	Factor         float64      // φc or 1/Ωc
	Available      float64      // φc Pn or Pn/Ωc, kip
	Slenderness    float64      // Lc/r of the tube about the governing axis
	Mode           Mode         // governing mode code
	Governing      string       // the mode in plain words
	Plain          string       // one sentence for a client on what governs
	Equations      []string     // equations applied, in order
	Steps          []steel.Step // the trace in the order of the specification
	Notes          []string     // remarks that are not warnings
	Warnings       []string     // visible warnings (Lc/r above 200)
	WeightLbPerFt  float64      // tube plus fill, lb/ft
	SteelLbPerFt   float64      // the tube's nominal weight, lb/ft
	ConcreteLbPerF float64      // the fill's weight, lb/ft
}

// Check evaluates the column by AISC 360-22 I2.2 with the full trace. The
// input's Lz is not used (a closed filled section does not twist). It
// returns an error naming the field for bad input.
func (c *Column) Check(in steel.Input) (Result, error) {
	if c == nil || c.pno <= 0 {
		return Result{}, fmt.Errorf("column: none given; build one with NewColumn")
	}
	if err := in.Validate(); err != nil {
		return Result{}, err
	}
	s := &c.Sec
	k := in.EffectiveK()
	r := Result{Section: s.Name, Method: in.Method, Fy: c.fy, Fc: c.Mat.Fc, Ec: c.ec, As: s.As, Ac: s.Ac, C3: c.c3,
		Class: c.cls, Lambda: c.lam, LambdaP: c.lim.LambdaP, LambdaR: c.lim.LambdaR, LambdaMx: c.lim.LambdaMax,
		Fcr: c.fcr, Pp: c.pp, Py: c.py, Pno: c.pno, K: k, Lcx: k * in.Lx, Lcy: k * in.Ly,
		EIx: c.eix, EIy: c.eiy, WeightLbPerFt: c.mass, SteelLbPerFt: s.SteelLbPerFt, ConcreteLbPerF: c.mass - s.SteelLbPerFt}
	step := func(clause, q, f string, v float64, unit string) {
		r.Steps = append(r.Steps, steel.Step{Clause: clause, Quantity: q, Formula: f, Value: v, Unit: unit})
	}
	eq := func(e string) { r.Equations = append(r.Equations, e) }

	// Materials (I1.3, I2.1b).
	fyNote := "specified minimum yield stress of the wall"
	if c.Mat.Fy > MaxFyStrength {
		fyNote = fmt.Sprintf("wall grade %g ksi held to %g ksi for strength", c.Mat.Fy, MaxFyStrength)
		r.Notes = append(r.Notes, fmt.Sprintf("AISC 360-22 I1.3(b): a yield stress above %g ksi is not used in the strength of a composite member (from memory); the wall's %g ksi is taken as %g ksi", MaxFyStrength, c.Mat.Fy, MaxFyStrength))
	}
	step("AISC 360-22 I1.3", "Fy", fyNote, c.fy, "ksi")
	step("AISC 360-22 I1.3", "f'c", "fill, normal-weight concrete, 3 to 10 ksi", c.Mat.Fc, "ksi")
	step("AISC 360-22 I2.1b", "wc", "unit weight of the fill", c.wc, "pcf")
	step("AISC 360-22 I2.1b", "Ec", "wc^1.5 √f'c (from memory)", c.ec, "ksi")
	step("AISC 360-22 I2.2", "As", "area of the steel tube (design wall 0.93 tnom, B4.2)", s.As, "in2")
	step("AISC 360-22 I2.2", "Ac", "area of the concrete fill", s.Ac, "in2")
	step("AISC 360-22 I2.2a", "As/Ag", "steel share of the gross area (at least 0.01)", s.As/s.Ag(), "")

	// Table I1.1a: classification for local buckling.
	ratio, lp, lr, lmax := "b/t (the larger of b/t and h/t, b = B − 3t)", "2.26 √(E/Fy)", "3.00 √(E/Fy)", "5.00 √(E/Fy)"
	if s.Round {
		ratio, lp, lr, lmax = "D/t", "0.15 E/Fy", "0.19 E/Fy", "0.31 E/Fy"
	}
	step("AISC 360-22 Table I1.1a", "λ", ratio, c.lam, "")
	step("AISC 360-22 Table I1.1a", "λp", lp+" (from memory)", c.lim.LambdaP, "")
	step("AISC 360-22 Table I1.1a", "λr", lr+" (from memory)", c.lim.LambdaR, "")
	step("AISC 360-22 Table I1.1a", "λmax", lmax+" (largest permitted; from memory)", c.lim.LambdaMax, "")

	// I2.2b: nominal strength at zero length.
	c2 := "0.85 (rectangular; from memory)"
	if s.Round {
		c2 = "0.95 (round; from memory)"
	}
	step("AISC 360-22 I2.2b", "C2", c2, c.c2, "")
	step("AISC 360-22 Eq. I2-9", "Pp", "Fy As + C2 f'c Ac (equation numbers of I2.2b from memory)", c.pp, "kip")
	switch c.cls {
	case Compact:
		step("AISC 360-22 Eq. I2-9", "Pno", "Pp (compact: λ ≤ λp)", c.pno, "kip")
		eq("I2-9")
	case Noncompact:
		step("AISC 360-22 Eq. I2-10", "Py", "Fy As + 0.7 f'c Ac", c.py, "kip")
		step("AISC 360-22 Eq. I2-10", "Pno", "Pp − (Pp − Py)(λ − λp)²/(λr − λp)² (noncompact)", c.pno, "kip")
		eq("I2-10")
	default:
		if s.Round {
			step("AISC 360-22 Eq. I2-13", "Fcr", "0.72 Fy / ((D/t) Fy/Es)^0.2 (from memory)", c.fcr, "ksi")
			eq("I2-13")
		} else {
			step("AISC 360-22 Eq. I2-12", "Fcr", "9 Es / (b/t)² (from memory)", c.fcr, "ksi")
			eq("I2-12")
		}
		step("AISC 360-22 Eq. I2-11", "Pno", "Fcr As + 0.7 f'c Ac (slender)", c.pno, "kip")
		eq("I2-11")
	}

	// I2.2b: effective stiffness.
	step("AISC 360-22 I2.2b", "C3", "0.45 + 3 As/Ag ≤ 0.9 (from memory)", c.c3, "")
	step("AISC 360-22 I2.2b", "EIeff x", "Es Isx + C3 Ec Icx", c.eix, "kip-in2")
	if !c.sym {
		step("AISC 360-22 I2.2b", "EIeff y", "Es Isy + C3 Ec Icy", c.eiy, "kip-in2")
	}

	// Effective length (Chapter C with Appendix 7 idealized K) and Pe.
	kSrc := "typed K"
	if in.K == 0 {
		kSrc = "recommended design value for " + in.Ends.String() + " (Commentary Table C-A-7.1)"
	}
	step("AISC 360-22 I2.1b", "K", kSrc, k, "")
	step("AISC 360-22 I2.1b", "Lcx", "K Lx", r.Lcx, "in")
	r.Pex = c.pex / (r.Lcx * r.Lcx)
	step("AISC 360-22 Eq. I2-5", "Pe x", "π² EIeff x / Lcx²", r.Pex, "kip")
	r.Pe, r.GoverningAxis = r.Pex, AxisX
	if !c.sym {
		step("AISC 360-22 I2.1b", "Lcy", "K Ly", r.Lcy, "in")
		r.Pey = c.pey / (r.Lcy * r.Lcy)
		step("AISC 360-22 Eq. I2-5", "Pe y", "π² EIeff y / Lcy²", r.Pey, "kip")
		if r.Pey < r.Pex {
			r.Pe, r.GoverningAxis = r.Pey, AxisY
		}
		eq("I2-5 (x)")
		eq("I2-5 (y)")
	} else {
		r.Pey = r.Pex
		eq("I2-5")
	}
	fast := c.Strength(r.Lcx, r.Lcy, in.Method)
	ratioPe := c.pno / r.Pe
	step("AISC 360-22 I2.1b", "Pno/Pe", "Eq. I2-2 up to 2.25, Eq. I2-3 beyond", ratioPe, "")
	if ratioPe <= 2.25 {
		step("AISC 360-22 Eq. I2-2", "Pn", "Pno 0.658^(Pno/Pe)", fast.Pn, "kip")
		eq("I2-2")
	} else {
		step("AISC 360-22 Eq. I2-3", "Pn", "0.877 Pe", fast.Pn, "kip")
		eq("I2-3")
	}
	r.Pn = fast.Pn
	r.Factor = Factor(in.Method)
	r.Available = fast.Available
	if in.Method == steel.LRFD {
		step("AISC 360-22 I2.1b", "φc Pn", "0.75 Pn (from memory)", r.Available, "kip")
	} else {
		step("AISC 360-22 I2.1b", "Pn/Ωc", "Pn / 2.00 (from memory)", r.Available, "kip")
	}
	r.Slenderness = fast.Slenderness
	r.Mode = fast.Mode
	r.Governing = fast.Mode.Words(c.sym)
	r.Notes = append(r.Notes,
		"AISC 360-22 I2.2b permits taking at least the bare tube's Chapter E strength (from memory); it is not used here, which is conservative",
		"The fill is plain concrete: no longitudinal bars (Asr = 0) and no steel anchors; load is assumed to reach both steel and fill (I6 force transfer is for the engineer)")
	if r.Slenderness > 200 {
		r.Warnings = append(r.Warnings, fmt.Sprintf("Lc/r = %.0f of the tube is above 200, the slenderness AISC 360-22 E2 (User Note) recommends not to exceed", r.Slenderness))
	}
	r.Plain = plain(c, fast)
	return r, nil
}

// plain puts the governing mode in one sentence a client understands.
func plain(c *Column, st Strength) string {
	share := 100 * st.Pn / c.pno
	fill := fmt.Sprintf("the %s filled with %s", c.Sec.Name, FillWords(c.Mat.Fc))
	var how string
	switch st.Mode.Regime() {
	case Crushing:
		how = fmt.Sprintf("At this height %s is governed by crushing: steel tube and concrete core squash together, and it keeps %.0f %% of its full squash load", fill, share)
	default:
		motion := "bow sideways"
		if !c.sym {
			if st.Mode.Axis() == AxisX {
				motion = "bow sideways in its stiff direction"
			} else {
				motion = "bow sideways in its weak direction"
			}
		}
		when := "after the steel has started to yield and the concrete to soften"
		if st.Mode.Regime() == Elastic {
			when = "before either material reaches its strength"
		}
		how = fmt.Sprintf("At this height %s is governed by buckling: it would %s %s, which limits it to %.0f %% of its squash load", fill, motion, when, share)
	}
	switch c.cls {
	case Noncompact:
		how += "; its walls are thin enough that they cannot fully confine the concrete, so less of the concrete strength counts"
	case Slender:
		how += "; its walls are so thin that they ripple locally before yielding, so the steel counts only at its local buckling stress"
	default:
		how += "; the concrete stops the walls rippling, so steel and concrete both reach their strength"
	}
	if math.IsNaN(share) {
		return "This column could not be checked."
	}
	return how + "."
}

// FillWords names the fill in the plain sentence, "5 ksi concrete", with
// f'c rounded to 0.01 ksi; callers that show other units replace it.
func FillWords(fcKsi float64) string {
	return strconv.FormatFloat(math.Round(fcKsi*100)/100, 'f', -1, 64) + " ksi concrete"
}
