package model

import (
	"fmt"
	"math"

	"upright/timber"
)

func init() { Register("timber", 30, buildTimber) }

// Conversions at the edge between the timber package (in, lb, psi) and the model (mm, N, MPa).
const (
	timberMMPerIn  = 25.4
	timberNPerLb   = 4.4482216152605       // exact: 0.45359237 kg × 9.80665 m/s²
	timberMPaPerPs = timberNPerLb / 645.16 // N per in² to N per mm²
	timberFamSawn  = "Sawn lumber"         // family of 4x posts and posts and timbers
	timberFamGlu   = "Glulam"              // family of glued laminated timber columns
	timberKindSawn = "sawn-timber"         // carbon constituent kind, m³ per metre
	timberKindGlu  = "glulam"              // carbon constituent kind, m³ per metre
	timberModeFire = 10                    // added to the timber.Mode when the fire case governs
	timberNotPerm  = "not permitted"       // Governing text when a candidate may not be used
	timberFireNote = "fire: charred section has no resistance"
)

// timberFireGoverning is the Governing text, by timber.Mode, when the fire case governs.
var timberFireGoverning = [...]string{
	timber.NotPermitted:   timberFireNote,
	timber.Crushing:       "fire: crushing of the charred section",
	timber.Buckling:       "fire: buckling of the charred section",
	timber.BucklingWeak:   "fire: buckling of the charred section about the weak axis",
	timber.BucklingStrong: "fire: buckling of the charred section about the strong axis",
}

// timberFamily is one family of timber candidates, prepared for both design
// methods. Each candidate is checked against every load combination with
// that combination's own λ (LRFD) or CD (ASD), and against the fire case.
type timberFamily struct {
	name      string
	asd, lrfd []*timber.Candidate
	static    []Static
	fire      bool
	cdFixed   float64    // ASD load duration factor typed in the options; 0 takes each combination's own
	fastLRFD  []LoadCase // the LRFD combinations that can govern (dominantCases), for Quick
	fastASD   []LoadCase // the ASD ones
	selfW     float64
	ls        LoadSummary
}

func buildTimber(sc *Scheme, ls LoadSummary) ([]Family, error) {
	o := sc.Timber
	if err := o.validate(); err != nil {
		return nil, err
	}
	cdFixed := timberDurationCD(o.Duration)
	cd := cdFixed
	if cd == 0 {
		cd = timber.CDTenYears // the candidates' own factor; FastTime scales it per combination
	}
	lambda := 0.8 // NDS 2018 Table N3, likewise scaled per combination
	sides := o.FireSides
	if sides == 0 {
		sides = 4
	}
	base := timber.Conditions{
		CD: cd, Lambda: lambda, Wet: o.Wet, Hot: o.Hot, Incised: o.Incised,
		Fire: timber.Fire{Hours: sc.Fire.timberHours(), Sides: sides},
	}
	newFam := func(name string) *timberFamily {
		f := &timberFamily{name: name, fire: base.Fire.On(), cdFixed: cdFixed, selfW: selfStoreys(sc), ls: ls}
		f.fastLRFD = dominantCases(ls.LRFDCases, func(c *LoadCase) float64 { return f.timeOf(c, LRFD) })
		f.fastASD = dominantCases(ls.ASDCases, func(c *LoadCase) float64 { return f.timeOf(c, ASD) })
		return f
	}
	add := func(f *timberFamily, sec timber.Section, mat timber.Material, kind string) error {
		ca, lr := base, base
		ca.Method, lr.Method = timber.ASD, timber.LRFD
		a, err := timber.NewCandidate(sec, mat, ca)
		if err != nil {
			return timberFieldErr(err, cd, lambda)
		}
		l, err := timber.NewCandidate(sec, mat, lr)
		if err != nil {
			return timberFieldErr(err, cd, lambda)
		}
		f.asd, f.lrfd = append(f.asd, a), append(f.lrfd, l)
		areaM2 := sec.Area() * timberMMPerIn * timberMMPerIn * 1e-6
		f.static = append(f.static, Static{
			Material: "timber", Family: f.name, Designation: a.Designation(),
			MassKgPerM:   a.MassKgPerM(),
			FootprintMM:  [2]float64{sec.BMM(), sec.DMM()},
			PlanAreaMM2:  sec.BMM() * sec.DMM(),
			Constituents: []Constituent{{Kind: kind, Amount: areaM2}},
		})
		return nil
	}

	var out []Family
	if o.Sawn {
		f := newFam(timberFamSawn)
		for _, sec := range timber.SawnSections() {
			mat, err := timber.SawnMaterial(o.Species, o.Grade, sec)
			if err != nil {
				return nil, bad("species/grade", o.Species+" "+o.Grade, err.Error())
			}
			if err := add(f, sec, mat, timberKindSawn); err != nil {
				return nil, err
			}
		}
		out = append(out, f)
	}
	if o.Glulam {
		f := newFam(timberFamGlu)
		for _, series := range []timber.Series{timber.Western, timber.Southern} {
			for _, sec := range timber.GlulamSections(series) {
				for _, name := range timber.GlulamCombinations(series) {
					if len(o.GlulamCombos) > 0 && !timberOneOf(name, o.GlulamCombos) {
						continue
					}
					mat, err := timber.GlulamMaterial(name)
					if err != nil {
						return nil, bad("glulam combination", name, err.Error())
					}
					if err := add(f, sec, mat, timberKindGlu); err != nil {
						return nil, err
					}
				}
			}
		}
		if f.Len() > 0 {
			out = append(out, f)
		}
	}
	return out, nil
}

// timberFieldErr names the load-derived factor when the timber package rejects it.
func timberFieldErr(err error, cd, lambda float64) error {
	switch {
	case cd != timber.CDPermanent && cd != timber.CDTenYears && cd != timber.CDTwoMonths && cd != timber.CDSevenDays && cd != timber.CDTenMinutes:
		return bad("load duration CD", cd, "0.9, 1.0, 1.15, 1.25 or 1.6 (NDS 2018 Table 2.3.2)")
	case lambda != 0.6 && lambda != 0.7 && lambda != 0.8 && lambda != 1.0:
		return bad("time effect factor lambda", lambda, "0.6, 0.7, 0.8 or 1.0 (NDS 2018 Table N3)")
	}
	return err
}

func (f *timberFamily) Material() string     { return "timber" }
func (f *timberFamily) Name() string         { return f.name }
func (f *timberFamily) Len() int             { return len(f.asd) }
func (f *timberFamily) Static(i int) *Static { return &f.static[i] }

func (f *timberFamily) cand(i int, m Method) *timber.Candidate {
	if m == ASD {
		return f.asd[i]
	}
	return f.lrfd[i]
}

// timberGeometry turns a model setting into timber geometry: x (strong axis,
// depth d) with LengthMM, y (weak axis, width b) with WeakMM.
func timberGeometry(s Setting) timber.Geometry {
	weak := s.WeakMM
	if weak == 0 {
		weak = s.LengthMM
	}
	g := timber.Geometry{LxIn: s.LengthMM / timberMMPerIn, LyIn: weak / timberMMPerIn, K: s.K}
	switch s.Ends {
	case FixedFixed:
		g.Ends = timber.FixedFixed
	case FixedPinned:
		g.Ends = timber.FixedPinned
	case FixedGuided:
		g.Ends = timber.FixedGuided
	case PinnedPinned:
		g.Ends = timber.PinnedPinned
	case FixedFree:
		g.Ends = timber.FixedFree
	case PinnedGuided:
		g.Ends = timber.PinnedGuided
	}
	return g
}

// timberQuick converts the timber package's strength of the unburnt section to the model's Quick.
func timberQuick(tq *timber.Quick) Quick {
	q := Quick{Slenderness: tq.LeD, Permitted: tq.Permitted, Reason: tq.Reason, Governing: timberNotPerm}
	if !tq.Permitted {
		if tq.Reason == timber.ReasonSlender {
			q.Limit = LimitTimber
		}
		return q
	}
	q.CapacityN = tq.Capacity * timberNPerLb
	q.Governing = tq.Mode.String()
	q.Mode = int(tq.Mode)
	return q
}

// timberFireQuick converts the fire-case strength of the charred section;
// its slenderness is the charred section's.
func timberFireQuick(fq *timber.FireQuick) Quick {
	if !fq.Permitted {
		q := Quick{Governing: timberFireNote, Mode: timberModeFire, Slenderness: fq.LeD, Reason: fq.Reason}
		if fq.Reason == timber.ReasonFireSlender {
			q.Limit = LimitTimberCh
		}
		return q
	}
	return Quick{CapacityN: fq.Capacity * timberNPerLb, Governing: timberFireGoverning[fq.Mode],
		Mode: timberModeFire + int(fq.Mode), Slenderness: fq.LeD, Permitted: true}
}

// Cases implements CaseFamily: every combination of the method.
func (f *timberFamily) Cases(m Method) []LoadCase { return f.ls.CasesFor(m) }

// timeOf is the time factor used for a combination: the combination's own
// (NDS 2018 Table 2.3.2 or N3), or a typed ASD load duration where it is
// lower. A typed duration may only make a combination more conservative: it
// never raises D alone above CD 0.9 (NDS 2018 2.3.2, from memory).
func (f *timberFamily) timeOf(c *LoadCase, m Method) float64 {
	if m == ASD && f.cdFixed > 0 {
		return math.Min(f.cdFixed, c.Time)
	}
	return c.Time
}

// typedWords says how a typed load duration was applied, for the trace.
func (f *timberFamily) typedWords(m Method) string {
	if m != ASD || f.cdFixed == 0 {
		return ""
	}
	return fmt.Sprintf(", or the typed CD %.2f where it is lower (a typed duration only makes a combination more conservative)", f.cdFixed)
}

// CaseQuick implements CaseFamily: the unburnt section with the
// combination's λ (LRFD, NDS 2018 N3.3) or CD (ASD, 2.3.2).
func (f *timberFamily) CaseQuick(i int, s Setting, c *LoadCase, selfN float64) Quick {
	tq := f.cand(i, s.Method).FastTime(timberGeometry(s), f.timeOf(c, s.Method))
	return timberQuick(&tq)
}

// CaseFactors implements CaseFamily.
func (f *timberFamily) CaseFactors(c *LoadCase, selfN float64) map[string]float64 {
	if c.Method == ASD {
		return map[string]float64{"CD": f.timeOf(c, ASD)}
	}
	return map[string]float64{"lambda": c.Time}
}

// FireQuick implements FireFamily: the charred section (NDS 2018 16.2) when
// a fire exposure is set.
func (f *timberFamily) FireQuick(i int, s Setting) (Quick, bool) {
	if !f.fire {
		return Quick{}, false
	}
	fq := f.cand(i, s.Method).FastFire(timberGeometry(s))
	return timberFireQuick(&fq), true
}

// Quick is the governing check over every combination and the fire case,
// with the capacity restated on the scale of the largest combination's load.
func (f *timberFamily) Quick(i int, s Setting) Quick {
	selfN := selfWeightN(f.selfW, &f.static[i], s.LengthMM)
	cases := f.fastLRFD
	if s.Method == ASD {
		cases = f.fastASD
	}
	q, _ := governCases(f, i, s, cases, &f.ls.FireCase, selfN, f.ls.DemandFor(s.Method, selfN))
	return q
}

func (f *timberFamily) Detail(i int, s Setting) Detail {
	k := f.cand(i, s.Method)
	st := &f.static[i]
	selfN := selfWeightN(f.selfW, st, s.LengthMM)
	demandN := f.ls.Demand(selfN)
	if !finite(demandN) || demandN < 0 {
		demandN = 0
	}
	// The trace follows the combination with the highest utilization of
	// the unburnt section, at that combination's own λ or CD.
	gk := 0
	worst := -1.0
	cases := f.ls.CasesFor(s.Method)
	for c := range cases {
		cq := f.CaseQuick(i, s, &cases[c], selfN)
		if u := utilOf(cases[c].DemandN(selfN), cq.CapacityN); u > worst {
			gk, worst = c, u
		}
	}
	gc := &cases[gk]
	if kt, err := k.WithTime(f.timeOf(gc, s.Method)); err == nil {
		k = kt
	}
	caseN := gc.DemandN(selfN)
	// Fire-case load: the governing ASD (service) combination with self-weight (NDS 2018 16.2.2).
	fireN := f.ls.FireCase.DemandN(selfN)
	r, err := k.Full(timberGeometry(s), timber.Demand{Design: caseN / timberNPerLb, Fire: fireN / timberNPerLb})
	if err != nil {
		return uncheckedDetail(timberNotPerm, err.Error())
	}
	d := Detail{Quick: f.Quick(i, s), Warnings: r.Warnings, Plain: r.Plain}

	factors := map[string]float64{}
	for _, x := range r.FcFactors {
		factors[x.Key()] = x.Value
	}
	for _, x := range r.EminFactors {
		factors[x.Key()] = x.Value
	}
	mpa := func(psi float64) float64 { return psi * timberMPaPerPs }
	kn := func(lb float64) float64 { return lb * timberNPerLb / 1000 }
	calc := map[string]any{
		"designation":             r.Designation,
		"product":                 r.Section.Product.String(),
		"method":                  k.Conditions().Method.String(),
		"b_mm":                    r.Section.BMM(),
		"d_mm":                    r.Section.DMM(),
		"area_mm2":                r.Area * timberMMPerIn * timberMMPerIn,
		"species":                 timber.SpeciesName(r.Material.Species),
		"grade":                   r.Material.Grade,
		"table":                   r.Material.Table,
		"Fc_MPa":                  mpa(r.Material.Fc),
		"E_MPa":                   mpa(r.Material.E),
		"Emin_MPa":                mpa(r.Material.Emin),
		"G":                       r.Material.G,
		"factors":                 factors,
		"Fc_star_MPa":             mpa(r.FcStar),
		"Emin_adj_MPa":            mpa(r.EminAdj),
		"Ke":                      r.Ke,
		"Ke_source":               r.KeSource,
		"le_x_mm":                 r.LeX * timberMMPerIn,
		"le_y_mm":                 r.LeY * timberMMPerIn,
		"le_d_x":                  r.LeDX,
		"le_d_y":                  r.LeDY,
		"le_d":                    r.LeD,
		"le_d_limit":              timber.LeDLimit,
		"FcE_MPa":                 mpa(r.FcE),
		"c":                       r.C,
		"Cp":                      r.Cp,
		"Fc_adj_MPa":              mpa(r.FcAdj),
		"capacity_kN":             d.CapacityN / 1000,
		"combination":             gc.Name,
		"combination_demand_kN":   caseN / 1000,
		"combination_capacity_kN": kn(r.Capacity),
		"time_factor":             f.timeOf(gc, s.Method),
		"permitted":               r.Permitted,
		"mode":                    r.Mode.String(),
		"mc_percent":              r.MC,
		"density_kg_m3":           r.DensityKgM3,
		"mass_kg_m":               r.MassKgPerM,
		"self_weight_kN":          selfN / 1000,
		"demand_kN":               demandN / 1000,
	}
	for _, x := range r.Steps {
		d.Steps = append(d.Steps, timberStep(x))
	}
	timeName := "λ"
	if s.Method == ASD {
		timeName = "CD"
	}
	d.Steps = append(d.Steps,
		Step{Clause: "NDS 2018 N3.3 / 2.3.2", Quantity: "combination", Formula: fmt.Sprintf("the trace above is for %s, %s = %.2f, the combination with the highest utilization; every combination is checked with its own %s%s", gc.Name, timeName, f.timeOf(gc, s.Method), timeName, f.typedWords(s.Method)), Value: caseN / 1000, Unit: "kN"},
		Step{Clause: "ASCE 7-22 2.3/2.4 via the load summary", Quantity: "demand",
			Formula: "largest combination including self-weight", Value: demandN / 1000, Unit: "kN"},
		Step{Clause: "NDS 2018 N3.3 / 2.3.2", Quantity: "capacity on the demand scale",
			Formula: "largest combination's load / highest utilization", Value: d.CapacityN / 1000, Unit: "kN"},
	)
	if fr := r.Fire; fr != nil {
		fire := map[string]any{
			"hours":         fr.Hours,
			"sides":         fr.Sides,
			"protected":     fr.Protected,
			"aeff_mm":       fr.Aeff * timberMMPerIn,
			"b_mm":          fr.B * timberMMPerIn,
			"d_mm":          fr.D * timberMMPerIn,
			"area_mm2":      fr.Area * timberMMPerIn * timberMMPerIn,
			"K_Fc":          fr.KFc,
			"K_FcE":         fr.KFcE,
			"CF":            fr.CF,
			"Fc_fire_MPa":   mpa(fr.FcStar),
			"Emin_fire_MPa": mpa(fr.EminFire),
			"le_d":          fr.LeD,
			"FcE_MPa":       mpa(fr.FcE),
			"Cp":            fr.Cp,
			"capacity_kN":   kn(fr.Capacity),
			"permitted":     fr.Permitted,
			"reason":        fr.Reason,
			"demand_kN":     fireN / 1000,
			"combination":   f.ls.FireCase.Name,
			"meaning":       fr.Meaning,
		}
		calc["fire"] = fire
		d.Steps = append(d.Steps,
			Step{Clause: "NDS 2018 16.2.2 (load taken as the service combination)", Quantity: "fire demand",
				Formula: "governing ASD combination plus self-weight: " + f.ls.FireCase.Name, Value: fireN / 1000, Unit: "kN"},
		)
		if d.Mode >= timberModeFire {
			d.Warnings = append(d.Warnings, fmt.Sprintf("The %s h fire case governs the capacity shown: the charred section must carry the service load on its own.", timberHours(fr.Hours)))
		}
	}
	d.Calc = calc
	return d
}

func timberHours(h float64) string {
	if h == math.Trunc(h) {
		return fmt.Sprintf("%.0f", h)
	}
	return fmt.Sprintf("%.1f", h)
}

// timberStep converts one trace line to SI.
func timberStep(s timber.Step) Step {
	out := Step{Clause: s.Clause, Quantity: s.Quantity, Formula: s.Formula, Value: s.Value, Unit: s.Unit}
	switch s.Unit {
	case "in":
		out.Value, out.Unit = s.Value*timberMMPerIn, "mm"
	case "in2":
		out.Value, out.Unit = s.Value*timberMMPerIn*timberMMPerIn, "mm2"
	case "psi":
		out.Value, out.Unit = s.Value*timberMPaPerPs, "MPa"
	case "lb":
		out.Value, out.Unit = s.Value*timberNPerLb/1000, "kN"
	case "in/h":
		out.Value, out.Unit = s.Value*timberMMPerIn, "mm/h"
	}
	return out
}
