package timber

import (
	"fmt"
	"math"
	"strings"
)

// Step is one line of the calculation trace. Units are US customary ("in",
// "in2", "psi", "lb", "in/h"), except mass ("kg/m3", "kg/m") and time ("h");
// "" marks a ratio.
type Step struct {
	Clause   string  // the NDS clause, equation or table
	Quantity string  // what is computed
	Formula  string  // the expression in symbols or words
	Value    float64 // the result
	Unit     string  // the unit of Value
}

// Demand is the axial load the column is compared with in the trace.
type Demand struct {
	Design float64 // design demand, lb: factored for LRFD, service for ASD; 0 when not given
	Fire   float64 // fire-case demand, lb: the service (ASD) load combination; 0 when not given
}

// Result is the full check of one candidate at one geometry, with its trace.
type Result struct {
	Quick
	Designation string
	Section     Section
	Material    Material
	Conditions  Conditions  // with defaults filled in
	FcFactors   []Factor    // factors on Fc other than Cp, in Table 4.3.1 / 5.3.1 order
	EminFactors []Factor    // factors on Emin
	FcStar      float64     // Fc*: Fc times every factor except Cp, psi
	EminAdj     float64     // Emin', psi
	Area        float64     // gross area, in²
	Ke          float64     // buckling length coefficient used
	KeSource    string      // "Table G1, pinned-pinned" or "typed"
	LeX, LeY    float64     // effective lengths about the strong and weak axes, in
	LeDX, LeDY  float64     // le/d about the strong (le_x/d) and weak (le_y/b) axes
	FcE         float64     // critical buckling design value, psi (0 when not permitted)
	C           float64     // c of Eq. 3.7-1
	MC          float64     // moisture content assumed for the mass, %
	DensityKgM3 float64     // density at MC, kg/m³
	MassKgPerM  float64     // mass per metre, kg/m
	Fire        *FireResult // the fire check; nil without fire exposure
	Demand      Demand      // the demand compared, as given
	Steps       []Step      // the trace in NDS 2018 3.7.1 order, then Chapter 16
	Warnings    []string    // things the user should know
	Plain       string      // one sentence on what governs, without units
}

// FireResult is the NDS 2018 Chapter 16 check of the charred section.
type FireResult struct {
	FireQuick
	Hours     float64 // fire resistance time, h
	Sides     int     // faces exposed
	Aeff      float64 // effective char depth, in (Table 16.2.1A)
	Protected string  // which face is taken as protected (3 sides) or "all four faces exposed"
	Area      float64 // charred area, in²
	KFc, KFcE float64 // Table 16.2.2 design stress to member strength factors
	CF        float64 // size factor of the initial section
	FcStar    float64 // 2.58·Fc·CF, psi
	EminFire  float64 // 2.03·Emin, psi
	LeDX      float64 // le_x/d of the charred section
	LeDY      float64 // le_y/b of the charred section
	FcE       float64 // 0.822·EminFire/(le/d)², psi
	Meaning   string  // what the fire-case capacity is and what to compare it with
}

// FireMeaning explains the fire-case capacity.
const FireMeaning = "The fire-case capacity is the average ultimate strength of the section left after charring " +
	"(NDS 2018 16.2.2: reference values times the Table 16.2.2 design stress to member strength factors, " +
	"no load duration or LRFD factors). It is checked against the loads acting during the fire, taken as the " +
	"service (ASD) load combination, not against the factored design load."

// Full returns the candidate's check at one geometry with its full trace,
// comparing it with the demand when one is given. Bad geometry or demand
// gives an error naming the field.
func (k *Candidate) Full(g Geometry, dem Demand) (Result, error) {
	if !(g.LxIn > 0 && g.LxIn <= MaxLengthIn) {
		return Result{}, fmt.Errorf("timber: strong-axis unbraced length %v in not accepted; %s", g.LxIn, ReasonLength)
	}
	if !(g.LyIn > 0 && g.LyIn <= MaxLengthIn) {
		return Result{}, fmt.Errorf("timber: weak-axis unbraced length %v in not accepted; %s", g.LyIn, ReasonLength)
	}
	if _, why := g.ke(); why != "" {
		return Result{}, fmt.Errorf("timber: end condition %v with K %v not accepted; %s", g.Ends, g.K, why)
	}
	for _, v := range []struct {
		n string
		x float64
	}{{"design demand", dem.Design}, {"fire demand", dem.Fire}} {
		if math.IsNaN(v.x) || math.IsInf(v.x, 0) || v.x < 0 {
			return Result{}, fmt.Errorf("timber: %s %v lb not accepted; use 0 (none) or a positive finite load", v.n, v.x)
		}
	}
	q := k.Fast(g)
	ke, _ := g.ke()
	r := Result{
		Quick: q, Designation: k.Designation(), Section: k.sec, Material: k.mat,
		Conditions: k.cond, FcFactors: k.fcF, EminFactors: k.eminF,
		FcStar: k.fcS, EminAdj: k.eminA, Area: k.area, Ke: ke, C: k.c,
		LeX: ke * g.LxIn, LeY: ke * g.LyIn, Demand: dem,
		MC: MoistureContent(k.mat.Product),
	}
	r.DensityKgM3 = DensityLbFt3(k.mat.G, r.MC) * kgM3PerLbFt3
	r.MassKgPerM = k.MassKgPerM()
	r.LeDX, r.LeDY = r.LeX*k.invD, r.LeY*k.invB // as in Fast, so the figures agree to the last bit
	r.KeSource = "NDS 2018 Appendix G Table G1 (from memory), " + g.Ends.String()
	if g.K != 0 {
		r.KeSource = "typed by the user"
	}
	if q.Permitted {
		r.FcE = KcE * k.eminA / (q.LeD * q.LeD)
	}
	k.trace(&r)
	if k.fireOn {
		k.fireTrace(&r, r.LeX, r.LeY)
	}
	r.Plain = k.plain(&r)
	return r, nil
}

func (r *Result) add(clause, qty, formula string, v float64, unit string) {
	r.Steps = append(r.Steps, Step{clause, qty, formula, v, unit})
}

func (k *Candidate) trace(r *Result) {
	s, m := k.sec, k.mat
	if s.Product == Glulam {
		r.add(m.Table, "b", "finished width ("+s.Series.String()+")", s.B, "in")
		r.add(m.Table, "d", fmt.Sprintf("%d laminations × %s in", s.Lams, Inches(s.LamIn)), s.D, "in")
	} else {
		r.add("NDS Supplement Table 1B", "b", fmt.Sprintf("dressed width of nominal %d in", s.NominalB), s.B, "in")
		r.add("NDS Supplement Table 1B", "d", fmt.Sprintf("dressed depth of nominal %d in", s.NominalD), s.D, "in")
	}
	r.add("NDS 2018 3.7.1", "A", "b·d", k.area, "in2")
	r.add("NDS Supplement 3.1.3", "ρ", fmt.Sprintf("ρwater·G/(1 + 0.009·G·MC)·(1 + MC/100), G = %.2f, MC = %.0f%% assumed", m.G, r.MC), r.DensityKgM3, "kg/m3")
	r.add("NDS Supplement 3.1.3", "mass", "ρ·A per metre of column", r.MassKgPerM, "kg/m")
	r.add(m.Table, "Fc", "reference compression parallel to grain, "+m.Name, m.Fc, "psi")
	r.add(m.Table, "Emin", "reference modulus of elasticity for stability, "+m.Name, m.Emin, "psi")

	names := make([]string, 0, len(k.fcF))
	for _, f := range k.fcF {
		r.add(f.Clause, factorSymbol(f.Name, "Fc")+" (Fc)", factorWords(f.Name)+": "+f.Note, f.Value, "")
		names = append(names, factorSymbol(f.Name, "Fc"))
	}
	tbl := "NDS 2018 Table 4.3.1"
	if s.Product == Glulam {
		tbl = "NDS 2018 Table 5.3.1"
	}
	r.add(tbl, "Fc*", "Fc·"+strings.Join(names, "·")+" (every factor but Cp)", k.fcS, "psi")
	names = names[:0]
	for _, f := range k.eminF {
		r.add(f.Clause, factorSymbol(f.Name, "Emin")+" (Emin)", factorWords(f.Name)+": "+f.Note, f.Value, "")
		names = append(names, factorSymbol(f.Name, "Emin"))
	}
	r.add(tbl, "Emin'", "Emin·"+strings.Join(names, "·"), k.eminA, "psi")

	r.add(r.KeSource, "Ke", "buckling length coefficient", r.Ke, "")
	r.add("NDS 2018 3.7.1.2", "le_x", "Ke·l_x (strong axis)", r.LeX, "in")
	r.add("NDS 2018 3.7.1.2", "le_y", "Ke·l_y (weak axis)", r.LeY, "in")
	r.add("NDS 2018 3.7.1.3", "le_x/d", "strong-axis slenderness", r.LeDX, "")
	r.add("NDS 2018 3.7.1.3", "le_y/b", "weak-axis slenderness", r.LeDY, "")
	r.add("NDS 2018 3.7.1.3", "le/d", "larger of le_x/d and le_y/b", math.Max(r.LeDX, r.LeDY), "")
	if !r.Permitted {
		r.add("NDS 2018 3.7.1.4", "le/d limit", "le/d shall not exceed 50: not permitted", LeDLimit, "")
		r.Warnings = append(r.Warnings, "Not permitted: "+ReasonSlender+"; choose a larger section or add bracing.")
	} else {
		r.add("NDS 2018 3.7.1.4", "le/d limit", "le/d ≤ 50: permitted", LeDLimit, "")
		r.add("NDS 2018 3.7.1.5", "FcE", "0.822·Emin'/(le/d)²", r.FcE, "psi")
		r.add("NDS 2018 3.7.1.5", "c", cWords(s.Product), k.c, "")
		r.add("NDS 2018 Eq. 3.7-1", "FcE/Fc*", "ratio of buckling to crushing stress", r.FcE/k.fcS, "")
		r.add("NDS 2018 Eq. 3.7-1", "Cp", "(1+FcE/Fc*)/(2c) − √([(1+FcE/Fc*)/(2c)]² − (FcE/Fc*)/c)", r.Cp, "")
		r.add(tbl, "Fc'", "Fc*·Cp", r.FcAdj, "psi")
		what := "allowable axial load P (ASD)"
		if k.cond.Method == LRFD {
			what = "adjusted axial resistance P' (LRFD, includes KF·φ·λ)"
		}
		r.add("NDS 2018 3.6.3", "P", "Fc'·A: "+what, r.Capacity, "lb")
		if r.Demand.Design > 0 {
			r.add("NDS 2018 3.6.3", "demand/P", "design demand / P", r.Demand.Design/r.Capacity, "")
		}
	}
	if k.cond.Incised && s.Product == PostsTimbers {
		r.Warnings = append(r.Warnings, "Incised timbers: NDS 2018 4.3.8 gives Ci for dimension lumber only; no incising reduction was applied, so confirm values with the treater.")
	}
	if k.cond.Incised && s.Product == Glulam {
		r.Warnings = append(r.Warnings, "Incising does not apply to glulam (NDS 2018 Table 5.3.1 has no Ci); ignored.")
	}
}

func factorWords(name string) string {
	switch name {
	case "CD":
		return "load duration factor"
	case "CM":
		return "wet service factor"
	case "Ct":
		return "temperature factor"
	case "CF":
		return "size factor"
	case "Ci":
		return "incising factor"
	case "KF":
		return "LRFD format conversion factor"
	case "phi":
		return "LRFD resistance factor"
	case "lambda":
		return "LRFD time effect factor"
	}
	return name
}

// factorSymbol is a factor's printed symbol for the value it applies to.
func factorSymbol(name, applies string) string {
	switch name {
	case "phi":
		if applies == "Emin" {
			return "φs"
		}
		return "φc"
	case "lambda":
		return "λ"
	}
	return name
}

func cWords(p Product) string {
	if p == Glulam {
		return "0.9 for structural glued laminated timber"
	}
	return "0.8 for sawn lumber"
}

func (k *Candidate) fireTrace(r *Result, leX, leY float64) {
	fq := r.Quick.Fire
	f := &FireResult{
		FireQuick: fq, Hours: k.cond.Fire.Hours, Sides: k.cond.Fire.Sides, Aeff: k.aeff,
		KFc: FireKFc, KFcE: FireKFcE, CF: k.fireCF, FcStar: k.fireFc, EminFire: k.fireEmin,
		Meaning: FireMeaning,
	}
	// Which orientation governs (for 3 sides both were checked).
	f.Protected = k.orientTag[0]
	for i := 0; i < k.nOrient; i++ {
		if k.orient[i][0] == fq.B && k.orient[i][1] == fq.D {
			f.Protected = k.orientTag[i]
		}
	}
	f.Area = fq.B * fq.D
	if fq.B > 0 && fq.D > 0 {
		f.LeDX, f.LeDY = leX/fq.D, leY/fq.B // reporting only; Fast's LeD governs
	}
	if fq.Permitted {
		f.FcE = KcE * k.fireEmin / (fq.LeD * fq.LeD)
	}
	r.Fire = f
	const ch = "NDS 2018 16.2.1"
	r.add(ch, "t", fmt.Sprintf("required fire resistance, %d sides exposed (%s)", f.Sides, f.Protected), f.Hours, "h")
	r.add("NDS 2018 16.2.1.1", "βn", "nominal char rate", BetaN, "in/h")
	r.add("NDS 2018 Table 16.2.1A", "aeff", "effective char depth, 1.2·βn·t^0.813 rounded", k.aeff, "in")
	bf, df := "b − 2·aeff", "d − 2·aeff"
	if f.Sides == 3 {
		if f.Protected == k.orientTag[0] {
			bf = "b − aeff"
		} else {
			df = "d − aeff"
		}
	}
	r.add(ch, "b_fire", bf, fq.B, "in")
	r.add(ch, "d_fire", df, fq.D, "in")
	if fq.Reason == ReasonCharred {
		r.add(ch, "A_fire", "nothing left: the section chars through", 0, "in2")
		r.Warnings = append(r.Warnings, fmt.Sprintf("Fire: %s at %s h; the section has no fire resistance.", Inches(k.sec.B)+"x"+Inches(k.sec.D)+" in", fmtHours(f.Hours))+" Choose a larger section or protect it.")
		return
	}
	r.add(ch, "A_fire", "b_fire·d_fire", f.Area, "in2")
	r.add("NDS 2018 Table 16.2.2", "K (Fc)", "design stress to member strength factor, compression parallel to grain", FireKFc, "")
	r.add("NDS 2018 Table 16.2.2", "CF", "size factor of the initial section", k.fireCF, "")
	r.add("NDS 2018 16.2.2", "Fc,fire", "2.58·Fc·CF", k.fireFc, "psi")
	r.add("NDS 2018 Table 16.2.2", "K (FcE)", "design stress to member strength factor, column buckling", FireKFcE, "")
	r.add("NDS 2018 16.2.2", "Emin,fire", "2.03·Emin", k.fireEmin, "psi")
	r.add("NDS 2018 3.7.1.3", "le/d fire", "larger of le_x/d_fire and le_y/b_fire", fq.LeD, "")
	if !fq.Permitted {
		r.add("NDS 2018 3.7.1.4", "le/d limit", "charred section le/d exceeds 50: no fire resistance", LeDLimit, "")
		r.Warnings = append(r.Warnings, "Fire: "+ReasonFireSlender+"; choose a larger section or protect it.")
		return
	}
	r.add("NDS 2018 3.7.1.5", "FcE,fire", "0.822·Emin,fire/(le/d)²", f.FcE, "psi")
	r.add("NDS 2018 Eq. 3.7-1", "Cp,fire", "Eq. 3.7-1 with Fc,fire, FcE,fire and c, reduced section", fq.Cp, "")
	r.add("NDS 2018 16.2.2", "P_fire", "Fc,fire·Cp,fire·A_fire: average ultimate strength of the charred section", fq.Capacity, "lb")
	if r.Demand.Fire > 0 {
		r.add("NDS 2018 16.2.2", "fire demand/P_fire", "service (ASD) load in the fire / P_fire", r.Demand.Fire/fq.Capacity, "")
		if r.Demand.Fire > fq.Capacity {
			r.Warnings = append(r.Warnings, fmt.Sprintf("Fire: the charred section does not carry the fire-case load for %s h (ratio %.2f).", fmtHours(f.Hours), r.Demand.Fire/fq.Capacity))
		}
	}
	if k.cond.Wet || k.cond.Incised || k.cond.Hot {
		r.Warnings = append(r.Warnings, "Fire: Table 16.2.2 lists no wet service, temperature or incising factor, so none is applied in the fire case.")
	}
}

func fmtHours(h float64) string {
	if h == math.Trunc(h) {
		return fmt.Sprintf("%.0f", h)
	}
	return fmt.Sprintf("%.1f", h)
}

func (k *Candidate) plain(r *Result) string {
	var b strings.Builder
	if !r.Permitted {
		fmt.Fprintf(&b, "This %s is too slender: its le/d of %.0f is over the NDS limit of 50, so it may not be used at this height.", r.Designation, r.LeD)
	} else {
		switch r.Mode {
		case Crushing:
			fmt.Fprintf(&b, "This %s is short enough that the wood crushing along the grain governs; buckling trims only %.0f%% off (Cp = %.2f).", r.Designation, 100*(1-r.Cp), r.Cp)
		default:
			fmt.Fprintf(&b, "This %s is limited by %s: it keeps %.0f%% of its crushing strength (Cp = %.2f).", r.Designation, r.Mode, 100*r.Cp, r.Cp)
		}
	}
	if f := r.Fire; f != nil {
		if !f.Permitted {
			fmt.Fprintf(&b, " In a %s-hour fire on %d sides it has no remaining resistance.", fmtHours(f.Hours), f.Sides)
		} else if r.Permitted {
			fmt.Fprintf(&b, " After a %s-hour fire on %d sides the charred core's ultimate strength is %.0f%% of the normal capacity; compare it with the service load.", fmtHours(f.Hours), f.Sides, 100*f.Capacity/r.Capacity)
		}
	}
	return b.String()
}
