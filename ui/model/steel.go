package model

import (
	"math"
	"sync"

	"upright/steel"
)

func init() { Register("steel", 10, buildSteel) }

// Conversions at the edge between the steel package (in, kip, ksi, lb/ft)
// and the model (mm, N, MPa, kg/m).
const (
	steelMMPerIn    = 25.4
	steelMM2PerIn2  = steelMMPerIn * steelMMPerIn
	steelNPerKip    = 4448.2216152605                                        // exact: 1000 × 0.45359237 kg × 9.80665 m/s²
	steelMPaPerKsi  = steelNPerKip / steelMM2PerIn2                          // kip/in² to N/mm²
	steelKgmPerLbft = 0.45359237 / 0.3048                                    // lb/ft to kg/m
	steelNotPerm    = "not permitted"                                        // Governing text when a candidate is not evaluated
	steelBadSetting = "the setting has no usable length, end condition or K" // Quick.Reason for a bad setting
)

// steelFamily is one family of steel candidates at one yield stress.
type steelFamily struct {
	name   string
	fam    steel.Family
	cols   []steel.Column
	static []Static
	selfW  float64
	ls     LoadSummary
}

// buildSteel makes one family per steel family switched on in the scheme,
// at the scheme's yield stress override (0: each family's default grade).
func buildSteel(sc *Scheme, ls LoadSummary) ([]Family, error) {
	o := sc.Steel
	if err := o.validate(); err != nil {
		return nil, err
	}
	on := map[steel.Family]bool{}
	for _, n := range o.Families {
		f, err := steel.ParseFamily(n)
		if err != nil {
			return nil, bad("steel families", n, steelFamiliesAccepted)
		}
		on[f] = true
	}
	fy := o.FyMPa / steelMPaPerKsi
	var out []Family
	for _, f := range steel.Families {
		if len(on) > 0 && !on[f] {
			continue
		}
		p, err := steelPrepared(f, fy)
		if err != nil {
			return nil, bad("steel Fy", o.FyMPa, "a yield stress from 200 to 700 MPa (29 to 100 ksi)")
		}
		out = append(out, &steelFamily{name: f.String(), fam: f, cols: p.cols, static: p.static, selfW: selfStoreys(sc), ls: ls})
	}
	return out, nil
}

// steelPrep is one family's columns and static facts at one yield stress.
// Both are read-only once built, so models share them.
type steelPrep struct {
	cols   []steel.Column
	static []Static
}

type steelPrepKey struct {
	fam steel.Family
	fy  float64
}

var (
	steelPrepMu    sync.Mutex
	steelPrepCache = map[steelPrepKey]*steelPrep{}
)

// steelPrepared returns the family's columns at yield stress fy (ksi; 0 for
// the default grade), building them on first use. The cache holds a few
// yield stresses at most.
func steelPrepared(f steel.Family, fy float64) (*steelPrep, error) {
	key := steelPrepKey{f, fy}
	steelPrepMu.Lock()
	p := steelPrepCache[key]
	steelPrepMu.Unlock()
	if p != nil {
		return p, nil
	}
	cols, err := steel.Columns(steel.Options{Fy: fy, Families: []steel.Family{f}})
	if err != nil {
		return nil, err
	}
	p = &steelPrep{cols: cols, static: make([]Static, len(cols))}
	kind := CarbonHSSSteel
	if f.IShaped() {
		kind = CarbonRolledSteel
	}
	for i := range cols {
		s := cols[i].Shape
		mass := s.MassKgPerM()
		fp := s.FootprintIn()
		p.static[i] = Static{
			Material: "steel", Family: f.String(), Designation: s.Name,
			MassKgPerM:   mass,
			FootprintMM:  [2]float64{fp[0] * steelMMPerIn, fp[1] * steelMMPerIn},
			PlanAreaMM2:  s.PlanAreaIn2() * steelMM2PerIn2,
			Constituents: []Constituent{{Kind: kind, Amount: mass}},
		}
	}
	steelPrepMu.Lock()
	if len(steelPrepCache) >= 6*len(steel.Families) {
		steelPrepCache = map[steelPrepKey]*steelPrep{}
	}
	steelPrepCache[key] = p
	steelPrepMu.Unlock()
	return p, nil
}

// Material, Name, Len and Static implement Family.
func (f *steelFamily) Material() string     { return "steel" }
func (f *steelFamily) Name() string         { return f.name }
func (f *steelFamily) Len() int             { return len(f.cols) }
func (f *steelFamily) Static(i int) *Static { return &f.static[i] }

// steelEnds maps the model's end condition to the steel package's.
func steelEnds(e EndCondition) (steel.EndCondition, bool) {
	switch e {
	case FixedFixed:
		return steel.FixedFixed, true
	case FixedPinned:
		return steel.FixedPinned, true
	case FixedGuided:
		return steel.FixedGuided, true
	case PinnedPinned:
		return steel.PinnedPinned, true
	case FixedFree:
		return steel.FixedFree, true
	case PinnedGuided:
		return steel.PinnedGuided, true
	}
	return 0, false
}

// steelMethod maps the model's method to the steel package's.
func steelMethod(m Method) steel.Method {
	if m == ASD {
		return steel.ASD
	}
	return steel.LRFD
}

// steelGeometry turns a setting into unbraced lengths in inches (x: strong
// axis with LengthMM; y and twisting with WeakMM, LengthMM when WeakMM is 0)
// and the K to use (Setting.K when > 0, else the end condition's
// recommended value). ok is false when any of them is unusable.
func steelGeometry(s Setting) (lx, ly, lz, k float64, ok bool) {
	weak := s.WeakMM
	if weak == 0 {
		weak = s.LengthMM
	}
	lx, ly, lz = s.LengthMM/steelMMPerIn, weak/steelMMPerIn, s.TwistMM()/steelMMPerIn
	k = s.K
	if k == 0 {
		e, valid := steelEnds(s.Ends)
		if !valid {
			return 0, 0, 0, 0, false
		}
		k = e.K()
	}
	ok = finite(lx) && finite(ly) && finite(lz) && finite(k) && lx > 0 && ly > 0 && lz > 0 && k > 0
	return
}

// Quick evaluates candidate i at the setting without a trace; it does not
// allocate.
func (f *steelFamily) Quick(i int, s Setting) Quick {
	lx, ly, lz, k, ok := steelGeometry(s)
	if !ok {
		return Quick{Governing: steelNotPerm, Reason: steelBadSetting}
	}
	st := f.cols[i].Strength(k*lx, k*ly, k*lz, steelMethod(s.Method))
	if st.Mode == 0 {
		return Quick{Governing: steelNotPerm, Reason: steelOutside}
	}
	q := Quick{
		CapacityN:   st.Available * steelNPerKip,
		Governing:   st.Mode.Words(f.fam),
		Mode:        int(st.Mode),
		Slenderness: st.Slenderness,
		Permitted:   true,
	}
	if sh := f.cols[i].Shape; k*lx/sh.Rx > 200 || k*ly/sh.Ry > 200 {
		q.Limit = LimitSteel // AISC 360-22 E2 User Note
	}
	return q
}

// steelOutside is the reason given when the steel package declines a
// candidate (a round section too thin for AISC 360-22 E7.2).
const steelOutside = "outside AISC 360-22 Chapter E (D/t at or above 0.45E/Fy)"

// steelInput is the steel package's input for a setting: lengths in
// inches, the twisting length the full length unless the braces restrain
// twist, the typed K, the method and the end condition (one the steel
// package does not know is rejected by Check unless K is typed).
func steelInput(s Setting) steel.Input {
	weak := s.WeakMM
	if weak == 0 {
		weak = s.LengthMM
	}
	in := steel.Input{Lx: s.LengthMM / steelMMPerIn, Ly: weak / steelMMPerIn, K: s.K, Method: steelMethod(s.Method)}
	in.Lz = s.TwistMM() / steelMMPerIn
	ends, valid := steelEnds(s.Ends)
	if !valid {
		ends = steel.EndCondition(-1)
	}
	in.Ends = ends
	return in
}

// Detail evaluates candidate i at the setting with the full SI trace.
func (f *steelFamily) Detail(i int, s Setting) Detail {
	c := &f.cols[i]
	st := &f.static[i]
	r, err := c.Check(steelInput(s))
	if err != nil {
		return uncheckedDetail(steelNotPerm, err.Error())
	}
	d := Detail{
		Quick: Quick{
			CapacityN: r.Available * steelNPerKip, Governing: r.Governing, Mode: int(r.Mode),
			Slenderness: math.Pi * math.Sqrt(steel.E/r.Fe), Permitted: true,
		},
		Warnings: r.Warnings,
		Plain:    r.Plain,
	}
	if r.LcxRx > 200 || r.LcyRy > 200 {
		d.Limit = LimitSteel // AISC 360-22 E2 User Note
	}
	d.Steps = make([]Step, 0, len(r.Steps)+1)
	d.Steps = append(d.Steps, Step{Clause: "AISC 360-22 E4", Quantity: "Lz", Formula: steelTwistWords(s), Value: s.TwistMM(), Unit: "mm"})
	for _, x := range r.Steps {
		d.Steps = append(d.Steps, steelStep(x))
	}
	selfN := selfWeightN(f.selfW, st, s.LengthMM)
	demandN := f.ls.Demand(selfN)
	if !finite(demandN) || demandN < 0 {
		demandN = 0
	}
	mpa := func(ksi float64) float64 { return ksi * steelMPaPerKsi }
	elements := make([]map[string]any, 0, len(r.Elements))
	for _, e := range r.Elements {
		elements = append(elements, map[string]any{
			"name": e.Name, "ratio": e.Ratio, "lambda": e.Lambda, "lambda_r": e.LambdaR, "slender": e.Slender,
			"b_mm": e.Width * steelMMPerIn, "be_mm": e.Effective * steelMMPerIn,
		})
	}
	kSource := "typed"
	if s.K == 0 {
		kSource = string(s.Ends) + " (AISC 360-22 Commentary Table C-A-7.1, from memory)"
	}
	var fez any // not computed for closed sections
	if r.Fez > 0 {
		fez = mpa(r.Fez)
	}
	sh := c.Shape
	d.Calc = map[string]any{
		"designation":    sh.Name,
		"family":         f.name,
		"grade":          r.Grade,
		"method":         r.Method.String(),
		"Fy_MPa":         mpa(r.Fy),
		"E_MPa":          mpa(steel.E),
		"A_mm2":          r.Ag * steelMM2PerIn2,
		"Ae_mm2":         r.Ae * steelMM2PerIn2,
		"rx_mm":          sh.Rx * steelMMPerIn,
		"ry_mm":          sh.Ry * steelMMPerIn,
		"K":              r.K,
		"K_source":       kSource,
		"Lcx_mm":         r.Lcx * steelMMPerIn,
		"Lcy_mm":         r.Lcy * steelMMPerIn,
		"Lcz_mm":         r.Lcz * steelMMPerIn,
		"twist_braced":   s.TwistBraced,
		"Lcx_rx":         r.LcxRx,
		"Lcy_ry":         r.LcyRy,
		"Fex_MPa":        mpa(r.Fex),
		"Fey_MPa":        mpa(r.Fey),
		"Fez_MPa":        fez,
		"Fe_MPa":         mpa(r.Fe),
		"Fcr_MPa":        mpa(r.Fcr),
		"Pn_kN":          r.Pn * steelNPerKip / 1000,
		"factor":         r.Factor,
		"capacity_kN":    r.Available * steelNPerKip / 1000,
		"equations":      append([]string(nil), r.Equations...),
		"governing":      r.Governing,
		"mode":           int(r.Mode),
		"slender":        r.Ae < r.Ag,
		"elements":       elements,
		"notes":          append([]string(nil), r.Notes...),
		"mass_kg_m":      st.MassKgPerM,
		"self_weight_kN": selfN / 1000,
		"demand_kN":      demandN / 1000,
	}
	return d
}

// steelStep converts one trace line to SI.
func steelStep(s steel.Step) Step {
	out := Step{Clause: s.Clause, Quantity: s.Quantity, Formula: s.Formula, Value: s.Value, Unit: s.Unit}
	switch s.Unit {
	case "in":
		out.Value, out.Unit = s.Value*steelMMPerIn, "mm"
	case "in2":
		out.Value, out.Unit = s.Value*steelMM2PerIn2, "mm2"
	case "ksi":
		out.Value, out.Unit = s.Value*steelMPaPerKsi, "MPa"
	case "kip":
		out.Value, out.Unit = s.Value*steelNPerKip/1000, "kN"
	}
	return out
}

// steelTwistWords says which torsional unbraced length is used and why.
func steelTwistWords(s Setting) string {
	if s.TwistBraced {
		return "torsional unbraced length = weak-axis length: the braces are stated to restrain twisting"
	}
	if s.WeakMM > 0 && s.WeakMM < s.LengthMM {
		return "torsional unbraced length = full length: the weak-axis braces are not taken to restrain twisting (state it with twist-braced)"
	}
	return "torsional unbraced length = full length"
}
