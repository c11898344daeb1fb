package model

import (
	"fmt"
	"math"
)

// Unprotected concrete-filled HSS by the calculated method of IBC 2021
// Section 722.5.1.5 (from memory), in its SI form:
//
//	R = a·(f′c + 20)/(KL − 1000)·D²·(D/C)^0.5        minutes
//
// with f′c in MPa, KL the effective length in mm, D the outside diameter or
// least outside dimension in mm and C the service axial load in kN. a is
// 0.07 (round) or 0.06 (square and rectangular) for siliceous aggregate,
// 0.08 and 0.07 for carbonate, plain concrete fill (from memory). The method
// applies to ratings up to 2 h, f′c from 20 to 40 MPa, KL from 2,000 to
// 4,000 mm (a shorter column is taken at 2,000 mm, which errs on the safe
// side), D from 140 to 410 mm round or 140 to 305 mm square and
// rectangular (limits from memory).
const (
	filledFireClause  = "IBC 2021 722.5.1.5 (from memory)"
	filledMaxHours    = 2.0
	filledMinFcMPa    = 20.0
	filledMaxFcMPa    = 40.0
	filledMinKLMM     = 2000.0
	filledMaxKLMM     = 4000.0
	filledMinDMM      = 140.0
	filledMaxRoundMM  = 410.0
	filledMaxSquareMM = 305.0
)

// filledA returns the coefficient a of the equation, 0 when the aggregate is
// not one the method covers.
func filledA(round bool, aggregate string) float64 {
	switch {
	case aggregate == "siliceous" && round:
		return 0.07
	case aggregate == "siliceous":
		return 0.06
	case aggregate == "carbonate" && round:
		return 0.08
	case aggregate == "carbonate":
		return 0.07
	}
	return 0
}

// filledFire is the unprotected filled tube's check at one length and load.
type filledFire struct {
	R      float64 // resistance, min (0 when the method does not apply)
	KLMM   float64 // effective length used, mm
	CkN    float64 // service load C, kN
	OK     bool    // the method applies and R reaches the rating
	Reason string  // why not
}

// filledShort is the reason Quick gives for an exposed tube that IBC
// 722.5.1.5 does not carry to the rating (the trace gives the figures).
const filledShort = "unprotected, IBC 722.5.1.5 does not give the rating at this length and load (from memory); the protected tube is listed too"

// filledTubeFire applies IBC 2021 722.5.1.5 to a filled tube of least
// outside dimension dMM at the rating hours; with why false it leaves
// Reason empty and does not allocate.
func filledTubeFire(round bool, dMM, fcMPa, klMM, cN, hours float64, aggregate string, why bool) filledFire {
	out := filledFire{KLMM: math.Max(klMM, filledMinKLMM), CkN: cN / 1000}
	maxD := filledMaxSquareMM
	if round {
		maxD = filledMaxRoundMM
	}
	a := filledA(round, aggregate)
	if !why && !filledApplies(round, dMM, fcMPa, klMM, hours, aggregate) {
		return out
	}
	switch {
	case hours > filledMaxHours:
		out.Reason = fmt.Sprintf("the method covers ratings up to 2 h, not %s h (%s)", fireHoursText(hours), filledFireClause)
	case a == 0:
		out.Reason = fmt.Sprintf("the method covers siliceous and carbonate fill, not %s (%s)", aggregate, filledFireClause)
	case fcMPa < filledMinFcMPa || fcMPa > filledMaxFcMPa:
		out.Reason = fmt.Sprintf("fill f′c %.0f MPa is outside the 20 to 40 MPa of the method (%s)", fcMPa, filledFireClause)
	case klMM > filledMaxKLMM:
		out.Reason = fmt.Sprintf("KL %.0f mm is above the 4,000 mm of the method (%s)", klMM, filledFireClause)
	case dMM < filledMinDMM || dMM > maxD:
		out.Reason = fmt.Sprintf("the tube's %.0f mm is outside the %.0f to %.0f mm of the method (%s)", dMM, filledMinDMM, maxD, filledFireClause)
	case !(cN > 0):
		out.Reason = "no service load to check against"
	default:
		out.R = a * (fcMPa + 20) / (out.KLMM - 1000) * dMM * dMM * math.Sqrt(dMM/out.CkN)
		out.OK = out.R >= hours*60
		if !out.OK && why {
			out.Reason = fmt.Sprintf("unprotected R = %.0f min, short of %.0f min (%s)", out.R, hours*60, filledFireClause)
		}
	}
	return out
}

// filledApplies reports, without allocating, whether the method's limits
// other than the load admit a tube.
func filledApplies(round bool, dMM, fcMPa, klMM, hours float64, aggregate string) bool {
	maxD := filledMaxSquareMM
	if round {
		maxD = filledMaxRoundMM
	}
	return hours <= filledMaxHours && filledA(round, aggregate) > 0 && fcMPa >= filledMinFcMPa && fcMPa <= filledMaxFcMPa &&
		klMM <= filledMaxKLMM && dMM >= filledMinDMM && dMM <= maxD
}

// filledFireFamily offers each filled tube twice under a rating: exposed,
// where IBC 722.5.1.5 gives it the rating at the length and load (no
// protection, no plan growth), and protected (board or spray on the shell)
// for where it falls short. The ranking then picks the exposed tube where
// the method applies and the protected one only where it does not.
type filledFireFamily struct {
	Family             // the bare filled-tube family
	static    []Static // exposed tubes, then protected ones
	n         int      // tubes in the bare family
	round     []bool
	dMM       []float64
	fcMPa     float64
	hours     float64
	aggregate string
	selfW     float64
	ls        LoadSummary
}

// newFilledFireFamily wraps a filled-tube family for the scheme's rating.
func newFilledFireFamily(sc *Scheme, ls LoadSummary, f Family, hours float64) (*filledFireFamily, error) {
	n := f.Len()
	w := &filledFireFamily{Family: f, static: make([]Static, 2*n), n: n, round: make([]bool, n), dMM: make([]float64, n),
		fcMPa: compositeFill(sc), hours: hours, aggregate: sc.Fire.Aggregate, selfW: selfStoreys(sc), ls: ls}
	for i := 0; i < n; i++ {
		bare := f.Static(i)
		fp := bare.FootprintMM
		w.round[i] = fp[0] == fp[1] && bare.PlanAreaMM2 < 0.9*fp[0]*fp[1]
		w.dMM[i] = math.Min(fp[0], fp[1])
		ex := *bare
		ex.Designation = bare.Designation + ", exposed"
		fc := fireBare(bare, hours)
		fc.Clause = filledFireClause
		fc.System = "exposed, the concrete fill carrying the load: R by IBC 722.5.1.5 at each length and load"
		fc.OK = true // checked at each length by Quick
		ex.Fire = fc
		w.static[i] = ex
		pr, err := fireOther(bare, f.Material(), hours, sc.Fire.SteelProtection)
		if err != nil {
			return nil, err
		}
		pr.Designation = bare.Designation + ", protected"
		pr.Fire.System += "; for where IBC 722.5.1.5 falls short"
		w.static[n+i] = pr
	}
	return w, nil
}

// Len is twice the bare family's: each tube exposed and protected.
func (f *filledFireFamily) Len() int { return 2 * f.n }

// Static returns candidate i's facts: exposed below n, protected from n.
func (f *filledFireFamily) Static(i int) *Static { return &f.static[i] }

// check is the IBC 722.5.1.5 check of exposed tube k at a setting; with
// why false it gives no reason and does not allocate.
func (f *filledFireFamily) check(k int, s Setting, why bool) filledFire {
	kf := s.K
	if kf == 0 {
		if se, ok := steelEnds(s.Ends); ok {
			kf = se.K()
		}
	}
	l := math.Max(s.LengthMM, s.WeakMM)
	selfN := selfWeightN(f.selfW, &f.static[k], s.LengthMM)
	return filledTubeFire(f.round[k], f.dMM[k], f.fcMPa, kf*l, f.ls.FireCase.DemandN(selfN), f.hours, f.aggregate, why)
}

// Quick is the tube's strength, or not permitted when it does not reach the
// rating: exposed, by IBC 722.5.1.5 at this length; protected, by its
// protection. It does not allocate.
func (f *filledFireFamily) Quick(i int, s Setting) Quick {
	k := i % f.n
	if i < f.n {
		if c := f.check(k, s, false); !c.OK {
			return Quick{Governing: fireNotPerm, Reason: filledShort}
		}
	} else if fc := f.static[i].Fire; !fc.OK {
		return Quick{Governing: fireNotPerm, Reason: fc.Reason}
	}
	return f.Family.Quick(k, s)
}

// Detail is the tube's trace with its fire check at this length.
func (f *filledFireFamily) Detail(i int, s Setting) Detail {
	k := i % f.n
	d := f.Family.Detail(k, s)
	st := &f.static[i]
	fc := *st.Fire
	var steps []Step
	if i < f.n {
		c := f.check(k, s, true)
		fc.OK, fc.Reason = c.OK, c.Reason
		fc.ProvidedH = fireRound(c.R / 60)
		steps = []Step{
			{Clause: filledFireClause, Quantity: "D", Formula: "outside diameter or least outside dimension", Value: f.dMM[k], Unit: "mm"},
			{Clause: filledFireClause, Quantity: "f′c", Formula: "fill strength", Value: f.fcMPa, Unit: "MPa"},
			{Clause: filledFireClause, Quantity: "KL", Formula: "effective length, at least 2,000 mm (shorter is taken at 2,000 mm, on the safe side)", Value: c.KLMM, Unit: "mm"},
			{Clause: filledFireClause, Quantity: "C", Formula: "service load, the governing ASD combination with self-weight", Value: c.CkN, Unit: "kN"},
			{Clause: filledFireClause, Quantity: "a", Formula: "0.07 round, 0.06 square (siliceous); 0.08, 0.07 (carbonate)", Value: filledA(f.round[k], f.aggregate), Unit: ""},
			{Clause: filledFireClause, Quantity: "R", Formula: "a(f′c + 20)/(KL − 1000)·D²·(D/C)^0.5", Value: c.R, Unit: "min"},
		}
		if !c.OK {
			fc.ProvidedH = fireRound(c.R / 60)
			d.Quick = Quick{Governing: fireNotPerm, Reason: c.Reason}
		}
	} else {
		steps = fc.Trace()
		if !fc.OK {
			d.Quick = Quick{Governing: fireNotPerm, Reason: fc.Reason}
		}
	}
	d.Fire = &fc
	verdict := "reached: " + fc.System
	if !fc.OK {
		verdict = "not reached: " + fc.Reason
		d.Warnings = append(d.Warnings, "Fire rating not reached: "+fc.Reason)
		d.Plain = fmt.Sprintf("This size cannot reach the %s h fire rating this way: %s", fireHoursText(fc.RatingH), fc.Reason)
	} else {
		d.Plain += fmt.Sprintf(" For the %s h fire rating: %s.", fireHoursText(fc.RatingH), fc.System)
	}
	d.Steps = append(d.Steps, Step{Clause: fc.Clause, Quantity: "FIRE: rating asked for", Formula: "the scheme's one rating, for every material", Value: fc.RatingH, Unit: "h"})
	d.Steps = append(d.Steps, steps...)
	d.Steps = append(d.Steps, Step{Clause: fc.Clause, Quantity: "FIRE: resistance provided", Formula: verdict, Value: fc.ProvidedH, Unit: "h"})
	if d.Calc == nil {
		d.Calc = map[string]any{}
	}
	d.Calc["fire"] = fc.calc()
	d.Calc["designation"] = st.Designation
	if st.MassKgPerM != f.Family.Static(k).MassKgPerM {
		selfN := selfWeightN(f.selfW, st, s.LengthMM)
		d.Calc["mass_kg_m"] = st.MassKgPerM
		d.Calc["self_weight_kN"] = selfN / 1000
		if dem := f.ls.Demand(selfN); finite(dem) && dem >= 0 {
			d.Calc["demand_kN"] = dem / 1000
		}
	}
	return d
}

// Outline implements Outliner: the tube's plan, either way.
func (f *filledFireFamily) Outline(i int, s Setting) Outline {
	if o, ok := Unwrap(f.Family).(Outliner); ok {
		return o.Outline(i%f.n, s)
	}
	return Outline{}
}

// ProtectionMM implements Protected: the protection of a protected tube.
func (f *filledFireFamily) ProtectionMM(i int, _ Setting) float64 {
	if fc := f.static[i].Fire; i >= f.n && fc != nil && fc.OK {
		return fc.ThicknessMM
	}
	return 0
}
