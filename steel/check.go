package steel

import (
	"fmt"
	"math"
)

// MaxLength is the longest unbraced length Check accepts, in (100 ft).
const MaxLength = 1200.0

// Input is the geometry and method at which Check evaluates a column.
type Input struct {
	Lx     float64      // unbraced length for buckling about the strong (x) axis, in
	Ly     float64      // unbraced length for buckling about the weak (y) axis, in
	Lz     float64      // unbraced length for twisting, in; 0 takes Ly
	Ends   EndCondition // idealized end condition giving K when K is 0
	K      float64      // typed effective-length factor; 0 uses Ends.K()
	Method Method       // LRFD or ASD
}

// Validate returns an error naming the first bad field and the accepted
// range.
func (in Input) Validate() error {
	length := func(field string, v float64, zeroOK bool) error {
		if math.IsNaN(v) || math.IsInf(v, 0) || v < 0 || (v == 0 && !zeroOK) || v > MaxLength {
			lo := "greater than 0"
			if zeroOK {
				lo = "0 (same as Ly) or more"
			}
			return fmt.Errorf("%s: %v is not accepted; give a length %s and at most %g in (100 ft)", field, v, lo, MaxLength)
		}
		return nil
	}
	if err := length("Lx", in.Lx, false); err != nil {
		return err
	}
	if err := length("Ly", in.Ly, false); err != nil {
		return err
	}
	if err := length("Lz", in.Lz, true); err != nil {
		return err
	}
	if math.IsNaN(in.K) || math.IsInf(in.K, 0) || in.K < 0 || (in.K != 0 && (in.K < 0.5 || in.K > 10)) {
		return fmt.Errorf("K: %v is not accepted; give an effective-length factor from 0.5 to 10, or 0 for the end condition's value", in.K)
	}
	if in.K == 0 && !in.Ends.Valid() {
		return fmt.Errorf("ends: %d is not accepted; give one of the six idealized end conditions", int(in.Ends))
	}
	if in.Method != LRFD && in.Method != ASD {
		return fmt.Errorf("method: %d is not accepted; give LRFD or ASD", int(in.Method))
	}
	return nil
}

// EffectiveK returns the K the input uses: the typed one, or the end
// condition's recommended value (AISC 360-22 Commentary Table C-A-7.1).
func (in Input) EffectiveK() float64 {
	if in.K > 0 {
		return in.K
	}
	return in.Ends.K()
}

// Step is one line of a calculation trace, in US customary units.
type Step struct {
	Clause   string  // e.g. "AISC 360-22 Eq. E3-2"
	Quantity string  // e.g. "Fcr"
	Formula  string  // the expression
	Value    float64 // the result
	Unit     string  // "ksi", "in", "in2", "kip" or "" for ratios
}

// ElementCheck is the local buckling check of one group of plate elements.
type ElementCheck struct {
	Name      string  // "flange", "web", "wall", "wall b", "wall h"
	Ratio     string  // "bf/2tf", "h/tw", "b/t", "h/t", "D/t"
	Lambda    float64 // width-to-thickness ratio
	LambdaR   float64 // limit of Table B4.1a
	Slender   bool    // λ > λr
	Width     float64 // b, in (0 for round sections)
	Effective float64 // be at Fcr, in (b when not reduced)
}

// Result is the full outcome of Check with its trace.
type Result struct {
	Shape  string
	Family Family
	Grade  string
	Fy     float64 // ksi
	Method Method

	K             float64 // effective-length factor used
	Lcx, Lcy, Lcz float64 // effective lengths, in
	LcxRx, LcyRy  float64 // slenderness about each axis (E2)
	Fex, Fey      float64 // elastic flexural buckling stresses, ksi (Eq. E3-4)
	Fez           float64 // elastic torsional buckling stress, ksi (Eq. E4-2); 0 for closed sections, where it is not computed
	Fe            float64 // governing elastic buckling stress, ksi
	Fcr           float64 // critical stress, ksi
	Ag, Ae        float64 // gross and effective area, in²
	Pn            float64 // nominal strength, kip
	Factor        float64 // φc or 1/Ωc
	Available     float64 // φc Pn or Pn/Ωc, kip

	Mode      Mode
	Governing string         // mode in plain words
	Plain     string         // one sentence for a client on what governs
	Equations []string       // equations applied, in order
	Elements  []ElementCheck // local buckling checks
	Steps     []Step         // the trace in the order of the specification
	Notes     []string       // remarks that are not warnings (e.g. why E4 is not checked)
	Warnings  []string       // visible warnings (Lc/r above 200 ...)
}

// Check evaluates the column by AISC 360-22 Chapter E with the full trace.
// It returns an error naming the field for bad input, and an error when the
// section is outside Chapter E (round sections with D/t ≥ 0.45E/Fy).
func (c *Column) Check(in Input) (Result, error) {
	if c == nil || c.Shape == nil {
		return Result{}, fmt.Errorf("column: none given; build one with NewColumn")
	}
	if err := in.Validate(); err != nil {
		return Result{}, err
	}
	if !c.ok {
		return Result{}, fmt.Errorf("%s: %s", c.Shape.Name, c.notOK)
	}
	s := c.Shape
	k := in.EffectiveK()
	lz := in.Lz
	if lz == 0 {
		lz = in.Ly
	}
	r := Result{Shape: s.Name, Family: s.Family, Grade: c.Grade.Name, Fy: c.fy, Method: in.Method,
		K: k, Lcx: k * in.Lx, Lcy: k * in.Ly, Lcz: k * lz, Ag: c.ag}
	fast := c.Strength(r.Lcx, r.Lcy, r.Lcz, in.Method)
	step := func(clause, q, f string, v float64, unit string) {
		r.Steps = append(r.Steps, Step{Clause: clause, Quantity: q, Formula: f, Value: v, Unit: unit})
	}
	eq := func(e string) { r.Equations = append(r.Equations, e) }

	step("AISC 360-22 A3.1", "Fy", c.Grade.Name, c.fy, "ksi")
	step("AISC 360-22 A3.1", "E", "modulus of elasticity", E, "ksi")
	agWords := "gross area"
	if s.AreaNote != "" {
		agWords = "gross area: " + s.AreaNote
		r.Notes = append(r.Notes, s.AreaNote)
	}
	step("AISC 360-22 B3", "Ag", agWords, c.ag, "in2")

	// B4.1: classify the elements for uniform compression.
	for i := 0; i < c.nElem; i++ {
		e := &c.elems[i]
		step("AISC 360-22 "+e.b21, "λ "+e.name, e.ratio, e.lambda, "")
		step("AISC 360-22 "+e.b21, "λr "+e.name, lambdaRFormula(s.Family, e.name), e.lambdaR, "")
	}
	if s.Family.Round() {
		lr := 0.11 * E / c.fy
		step("AISC 360-22 Table B4.1a case 9", "λ wall", "D/t", s.DT, "")
		step("AISC 360-22 Table B4.1a case 9", "λr wall", "0.11 E/Fy", lr, "")
	}

	// E2: effective length and slenderness.
	kSrc := "typed K"
	if in.K == 0 {
		kSrc = "recommended design value for " + in.Ends.String() + " (Commentary Table C-A-7.1, from memory)"
	}
	step("AISC 360-22 E2", "K", kSrc, k, "")
	step("AISC 360-22 E2", "Lcx", "K Lx", r.Lcx, "in")
	step("AISC 360-22 E2", "Lcy", "K Ly", r.Lcy, "in")
	r.LcxRx, r.LcyRy = r.Lcx/s.Rx, r.Lcy/s.Ry
	step("AISC 360-22 E2", "Lcx/rx", "Lcx / rx", r.LcxRx, "")
	step("AISC 360-22 E2", "Lcy/ry", "Lcy / ry", r.LcyRy, "")
	for _, v := range []struct {
		name string
		val  float64
	}{{"Lcx/rx", r.LcxRx}, {"Lcy/ry", r.LcyRy}} {
		if v.val > 200 {
			r.Warnings = append(r.Warnings, fmt.Sprintf("%s = %.0f is above 200, the slenderness AISC 360-22 E2 (User Note) recommends not to exceed", v.name, v.val))
		}
	}

	// E3: flexural buckling about each axis.
	pe := math.Pi * math.Pi * E
	r.Fex = pe / (r.LcxRx * r.LcxRx)
	r.Fey = pe / (r.LcyRy * r.LcyRy)
	step("AISC 360-22 Eq. E3-4", "Fex", "π² E / (Lcx/rx)²", r.Fex, "ksi")
	eq("E3-4 (x)")
	step("AISC 360-22 Eq. E3-4", "Fey", "π² E / (Lcy/ry)²", r.Fey, "ksi")
	eq("E3-4 (y)")

	// E4: torsional buckling of doubly symmetric members.
	if c.torsion {
		step("AISC 360-22 E4", "Lcz", "K Lz", r.Lcz, "in")
		r.Fez = (pe*s.Cw/(r.Lcz*r.Lcz) + G*s.J) / (s.Ix + s.Iy)
		step("AISC 360-22 Eq. E4-2", "Fez", "(π² E Cw / Lcz² + G J) / (Ix + Iy)", r.Fez, "ksi")
		eq("E4-2")
	} else {
		r.Notes = append(r.Notes, "AISC 360-22 E4: torsional buckling is not checked; a closed section (HSS, pipe) is so stiff in torsion that flexural buckling always governs")
	}
	r.Fe = fast.Fe
	feName := map[Axis]string{AxisX: "Fex", AxisY: "Fey", AxisTorsion: "Fez"}[governingAxis(r)]
	step("AISC 360-22 E3, E4", "Fe", "smallest of "+feList(c.torsion)+" ("+feName+" governs)", r.Fe, "ksi")

	// E3: critical stress.
	ratio := c.fy / r.Fe
	step("AISC 360-22 E3", "4.71√(E/Fy)", "Lc/r limit between Eq. E3-2 and E3-3", c.lim, "")
	step("AISC 360-22 E3", "Fy/Fe", "Fy / Fe (Eq. E3-2 up to 2.25, Eq. E3-3 beyond)", ratio, "")
	if ratio <= 2.25 {
		step("AISC 360-22 Eq. E3-2", "Fcr", "0.658^(Fy/Fe) Fy", fast.Fcr, "ksi")
		eq("E3-2")
	} else {
		step("AISC 360-22 Eq. E3-3", "Fcr", "0.877 Fe", fast.Fcr, "ksi")
		eq("E3-3")
	}
	r.Fcr = fast.Fcr

	// E7: slender elements.
	slender := c.Slender()
	for i := 0; i < c.nElem; i++ {
		e := &c.elems[i]
		ec := ElementCheck{Name: e.name, Ratio: e.ratio, Lambda: e.lambda, LambdaR: e.lambdaR, Slender: e.slender, Width: e.b, Effective: e.b}
		if e.slender {
			lim := e.lambdaR * math.Sqrt(c.fy/r.Fcr)
			step("AISC 360-22 E7.1", "λr√(Fy/Fcr) "+e.name, "λr √(Fy/Fcr)", lim, "")
			if e.lambda <= lim {
				step("AISC 360-22 Eq. E7-2", "be "+e.name, "b (λ ≤ λr√(Fy/Fcr))", e.b, "in")
				eq("E7-2 (" + e.name + ")")
			} else {
				step("AISC 360-22 "+e.e71, "c1 "+e.name, "imperfection factor", e.c1, "")
				step("AISC 360-22 Eq. E7-4", "c2 "+e.name, "(1 − √(1 − 4 c1)) / (2 c1)", e.c2, "")
				step("AISC 360-22 Eq. E7-5", "Fel "+e.name, "(c2 λr/λ)² Fy", e.fel, "ksi")
				ec.Effective = e.b - e.loss(r.Fcr)/(e.count*e.t)
				step("AISC 360-22 Eq. E7-3", "be "+e.name, "b (1 − c1 √(Fel/Fcr)) √(Fel/Fcr)", ec.Effective, "in")
				eq("E7-3 (" + e.name + ")")
			}
		}
		r.Elements = append(r.Elements, ec)
	}
	if s.Family.Round() {
		ec := ElementCheck{Name: "wall", Ratio: "D/t", Lambda: s.DT, LambdaR: 0.11 * E / c.fy, Slender: c.roundSl}
		r.Elements = append(r.Elements, ec)
		if c.roundSl {
			step("AISC 360-22 Eq. E7-7", "Ae", "(0.038 E / (Fy D/t) + 2/3) Ag", c.aeRound, "in2")
			eq("E7-7")
		}
	}
	r.Ae = fast.Ae
	if slender {
		if !s.Family.Round() {
			step("AISC 360-22 E7.1", "Ae", "Ag − Σ (b − be) t", r.Ae, "in2")
		}
		r.Pn = fast.Pn
		step("AISC 360-22 Eq. E7-1", "Pn", "Fcr Ae", r.Pn, "kip")
		eq("E7-1")
	} else {
		r.Pn = fast.Pn
		step("AISC 360-22 Eq. E3-1", "Pn", "Fcr Ag", r.Pn, "kip")
		eq("E3-1")
	}

	// E1: available strength.
	r.Factor = in.Method.Factor()
	r.Available = fast.Available
	if in.Method == LRFD {
		step("AISC 360-22 E1", "φc Pn", "0.90 Pn", r.Available, "kip")
	} else {
		step("AISC 360-22 E1", "Pn/Ωc", "Pn / 1.67", r.Available, "kip")
	}
	r.Mode = fast.Mode
	r.Governing = fast.Mode.Words(s.Family)
	r.Plain = plain(s, fast, c.fy*c.ag)
	return r, nil
}

// governingAxis finds which buckling stress is the governing one.
func governingAxis(r Result) Axis {
	switch {
	case r.Fez > 0 && r.Fez < r.Fex && r.Fez < r.Fey:
		return AxisTorsion
	case r.Fey <= r.Fex:
		return AxisY
	}
	return AxisX
}

func feList(torsion bool) string {
	if torsion {
		return "Fex, Fey, Fez"
	}
	return "Fex, Fey"
}

// lambdaRFormula names the Table B4.1a limit of an element.
func lambdaRFormula(f Family, name string) string {
	switch {
	case f.IShaped() && name == "flange":
		return "0.56 √(E/Fy)"
	case f.IShaped():
		return "1.49 √(E/Fy)"
	}
	return "1.40 √(E/Fy)"
}

// plain puts the governing mode in one sentence a client understands.
func plain(s *Shape, st Strength, squash float64) string {
	share := 100 * st.Pn / squash
	var how string
	switch {
	case st.Mode.Regime() == Yielding:
		how = fmt.Sprintf("The %s is governed by crushing: it is stocky enough at this height to carry %.0f %% of the load that would squash its whole cross-section", s.Name, share)
	default:
		motion := "bow sideways"
		switch {
		case st.Mode.Axis() == AxisTorsion:
			motion = "twist about its own length"
		case s.Family == HSSSquare || s.Family.Round():
		case st.Mode.Axis() == AxisX:
			motion = "bow sideways in its stiff direction"
		default:
			motion = "bow sideways in its weak direction"
		}
		when := "after part of the steel has started to yield"
		if st.Mode.Regime() == Elastic {
			when = "before any of the steel yields"
		}
		how = fmt.Sprintf("The %s is governed by buckling: at this height it would %s %s, which limits it to %.0f %% of its crushing load", s.Name, motion, when, share)
	}
	if st.Mode.Local() {
		how += fmt.Sprintf(", and its thin plates ripple locally so only %.0f %% of the steel counts", 100*st.Ae/s.A)
	}
	return how + "."
}
