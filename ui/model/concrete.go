package model

import (
	"errors"
	"fmt"
	"math"
	"sync"

	"upright/concrete"
)

func init() { Register("concrete", 20, buildConcrete) }

// concreteNotPerm is the Governing text when a candidate may not be used.
const concreteNotPerm = "not permitted"

// concreteKey is what the cached catalogue depends on: the diagrams do not
// depend on length, ends, M1/M2, βdns or the EI method.
type concreteKey struct {
	units  Units
	fcMPa  float64
	grade  int
	rhoMax float64
	cover  float64 // least clear cover to the bars for the fire rating, mm (0: none)
}

// concreteEntry is one cached catalogue, split by family.
type concreteEntry struct {
	key    concreteKey
	secs   [4][]*concrete.Section // by concrete.Kind
	static [4][]Static
}

// concreteCache keeps the last few catalogues so that a rebuild with the
// same concrete options (the window rebuilds on every input change) costs
// only a lookup.
var concreteCache struct {
	sync.Mutex
	entries []*concreteEntry // most recent first
}

const concreteCacheSize = 4

// concreteCatalogue returns the cached catalogue for a key, building it on a miss.
func concreteCatalogue(key concreteKey) (*concreteEntry, error) {
	concreteCache.Lock()
	defer concreteCache.Unlock()
	for i, e := range concreteCache.entries {
		if e.key == key {
			copy(concreteCache.entries[1:i+1], concreteCache.entries[:i])
			concreteCache.entries[0] = e
			return e, nil
		}
	}
	series := concrete.SeriesUS
	if key.units == SI {
		series = concrete.SeriesSI
	}
	secs, err := concrete.Catalogue(concrete.CatalogueOptions{Series: series, FcMPa: key.fcMPa, Grade: key.grade, RhoMax: key.rhoMax, BarCoverMM: key.cover})
	if err != nil {
		var ie *concrete.InputError
		if errors.As(err, &ie) {
			return nil, &FieldError{Field: ie.Field, Value: ie.Value, Accepted: ie.Accepted}
		}
		return nil, err
	}
	e := &concreteEntry{key: key}
	for _, s := range secs {
		e.secs[s.Kind] = append(e.secs[s.Kind], s)
		e.static[s.Kind] = append(e.static[s.Kind], concreteStatic(s))
	}
	concreteCache.entries = append([]*concreteEntry{e}, concreteCache.entries...)
	if len(concreteCache.entries) > concreteCacheSize {
		concreteCache.entries = concreteCache.entries[:concreteCacheSize]
	}
	return e, nil
}

// concreteStatic returns the length-independent facts of one section.
func concreteStatic(s *concrete.Section) Static {
	return Static{
		Material:    "concrete",
		Family:      s.Kind.String(),
		Designation: s.Designation,
		MassKgPerM:  s.MassKgPerM,
		FootprintMM: [2]float64{s.WidthMM, s.DepthH()},
		PlanAreaMM2: s.PlanAreaMM2(),
		Constituents: []Constituent{
			{Kind: CarbonConcrete, Amount: s.ConcreteM3PerM},
			{Kind: CarbonRebar, Amount: s.SteelKgPerM},
		},
	}
}

// concreteFamily is one family of concrete candidates at the scheme's options.
// ACI 318-19 is strength design, so each candidate is checked against every
// LRFD combination with that combination's own βdns, under either method;
// under ASD the governing strength is restated on the service-load scale.
type concreteFamily struct {
	kind      concrete.Kind
	secs      []*concrete.Section
	static    []Static
	cond      concrete.Conditions // M1/M2, EI method and the 1.4 limit; lengths, ends and βdns come per setting and combination
	betaFixed float64             // βdns typed in the options for every combination; -1 takes each combination's own
	uncapped  bool                // the 1.4 limit was switched off: its uncapped strength is shown as a note only
	selfW     float64
	ls        LoadSummary
}

func buildConcrete(sc *Scheme, ls LoadSummary) ([]Family, error) {
	o := sc.Concrete
	if err := o.validate(); err != nil {
		return nil, err
	}
	units := sc.Units
	if units != SI {
		units = US
	}
	e, err := concreteCatalogue(concreteKey{units: units, fcMPa: o.FcMPa, grade: o.BarGrade, rhoMax: o.RhoMax, cover: sc.Fire.concreteBarCoverMM()})
	if err != nil {
		return nil, err
	}
	// ACI 318-19 6.2.5.3: the total moment with second-order effects may not
	// exceed 1.4 times the first-order moment, so δ > 1.4 never works.
	cond := concrete.Conditions{M1M2: o.M1M2, Cap14: true}
	betaFixed := -1.0
	if !o.BetaFromLoads {
		betaFixed = o.BetaDns
	}
	cond.EI = concreteEIMethods[o.EIMethod]
	cond.NonswayK1 = o.NonswayK1
	var kinds []concrete.Kind
	switch o.Transverse {
	case "ties":
		kinds = []concrete.Kind{concrete.TiedSquare, concrete.TiedRectangular, concrete.TiedRound}
	case "spiral":
		kinds = []concrete.Kind{concrete.SpiralRound}
	default:
		kinds = []concrete.Kind{concrete.TiedSquare, concrete.TiedRectangular, concrete.SpiralRound, concrete.TiedRound}
	}
	var out []Family
	for _, k := range kinds {
		out = append(out, &concreteFamily{
			kind: k, secs: e.secs[k], static: append([]Static(nil), e.static[k]...),
			cond: cond, betaFixed: betaFixed, uncapped: !o.SecondOrderCap, selfW: selfStoreys(sc), ls: ls,
		})
	}
	return out, nil
}

func (f *concreteFamily) Material() string     { return "concrete" }
func (f *concreteFamily) Name() string         { return f.kind.String() }
func (f *concreteFamily) Len() int             { return len(f.secs) }
func (f *concreteFamily) Static(i int) *Static { return &f.static[i] }

// concreteEnds maps the model's end condition to the package's; an unknown
// one maps to an invalid value that the package rejects.
func concreteEnds(e EndCondition) concrete.Ends {
	switch e {
	case FixedFixed:
		return concrete.FixedFixed
	case FixedPinned:
		return concrete.FixedPinned
	case FixedGuided:
		return concrete.FixedGuided
	case PinnedPinned:
		return concrete.PinnedPinned
	case FixedFree:
		return concrete.FixedFree
	case PinnedGuided:
		return concrete.PinnedGuided
	}
	return concrete.Ends(-1)
}

// conditions turns a setting into the package's conditions: bending about
// x (strong axis, depth h) over LengthMM, about y (weak axis, width b) over WeakMM.
func (f *concreteFamily) conditions(s Setting) concrete.Conditions {
	c := f.cond
	c.LuXMM, c.LuYMM = s.LengthMM, s.WeakMM
	if c.LuYMM == 0 {
		c.LuYMM = s.LengthMM
	}
	c.Ends = concreteEnds(s.Ends)
	c.K = s.K
	return c
}

// quick converts the package result: the design strength φPn.
func (f *concreteFamily) quick(sec *concrete.Section, cq *concrete.Quick) Quick {
	q := Quick{Governing: concreteNotPerm, Mode: int(cq.Mode), Slenderness: cq.KLR, Permitted: cq.Permitted, Reason: cq.Reason}
	if cq.Reason == concrete.ReasonTooSlender {
		q.Limit = LimitConcrete
	}
	if cq.Permitted {
		q.Governing = sec.ModeWords(cq.Mode)
		q.CapacityN = cq.PhiPn
	}
	return q
}

// Cases implements CaseFamily: the LRFD combinations under either method
// (ACI 318-19 is strength design).
func (f *concreteFamily) Cases(m Method) []LoadCase { return f.ls.LRFDCases }

// betaOf is the βdns used for a combination: the combination's factored
// dead over its total (ACI 318-19 6.6.4.4.4), or a typed βdns where it is
// higher. A typed βdns may only make a combination more conservative: it
// never lowers βdns = 1 under 1.4D.
func (f *concreteFamily) betaOf(c *LoadCase, selfN float64) float64 {
	own := c.BetaDns(selfN)
	if f.betaFixed >= 0 {
		return math.Max(f.betaFixed, own)
	}
	return own
}

// CaseQuick implements CaseFamily: φPn with the combination's βdns.
func (f *concreteFamily) CaseQuick(i int, s Setting, c *LoadCase, selfN float64) Quick {
	cond := f.conditions(s)
	cond.BetaDns = f.betaOf(c, selfN)
	sec := f.secs[i]
	cq := sec.Quick(&cond)
	return f.quick(sec, &cq)
}

// CaseFactors implements CaseFamily.
func (f *concreteFamily) CaseFactors(c *LoadCase, selfN float64) map[string]float64 {
	return map[string]float64{"beta_dns": f.betaOf(c, selfN)}
}

// Quick returns the governing check over every LRFD combination, with the
// capacity on the scale of the method's largest combination (under ASD the
// service load); it does not allocate. βdns only lowers the strength of a
// slender column (Eq. 6.6.4.4.4), so the combination with the highest βdns
// has the lowest strength Cmin: when it is held by the axial limit
// φPn,max, every combination has that strength and the largest load
// governs; otherwise a combination whose load over Cmin cannot exceed the
// highest utilization found so far is not evaluated.
func (f *concreteFamily) Quick(i int, s Setting) Quick {
	selfN := selfWeightN(f.selfW, &f.static[i], s.LengthMM)
	demandN := f.ls.DemandFor(s.Method, selfN)
	cases := f.ls.LRFDCases
	if len(cases) == 0 {
		return Quick{Governing: concreteNotPerm, Reason: "no load combination to check"}
	}
	hb, big, maxN := 0, 0, 0.0
	oneBeta := true // every combination has the same βdns, so one strength
	for k := range cases {
		bk := f.betaOf(&cases[k], selfN)
		if bk != f.betaOf(&cases[0], selfN) {
			oneBeta = false
		}
		if bk > f.betaOf(&cases[hb], selfN) {
			hb = k
		}
		if d := cases[k].DemandN(selfN); d > maxN {
			big, maxN = k, d
		}
	}
	gov := f.CaseQuick(i, s, &cases[hb], selfN)
	if !gov.Permitted {
		return gov
	}
	cmin := gov.CapacityN
	if gov.Mode == int(concrete.Crushing) || oneBeta || hb == big {
		if maxN > 0 {
			gov.CapacityN *= demandN / maxN
		}
		return gov
	}
	worst := utilOf(cases[hb].DemandN(selfN), cmin)
	try := func(k int) {
		d := cases[k].DemandN(selfN)
		if k == hb || utilOf(d, cmin) <= worst {
			return // its strength is at least Cmin, so it cannot govern
		}
		q := f.CaseQuick(i, s, &cases[k], selfN)
		if u := utilOf(d, q.CapacityN); u > worst {
			gov, worst = q, u
		}
	}
	try(big)
	for k := range cases {
		if k != big {
			try(k)
		}
	}
	switch {
	case math.IsInf(worst, 1):
		gov.CapacityN = 0
	case worst > 0:
		gov.CapacityN = demandN / worst
	}
	return gov
}

// Detail returns the strength at a setting with the full trace, at the
// βdns of the combination with the highest utilization.
func (f *concreteFamily) Detail(i int, s Setting) Detail {
	c := f.conditions(s)
	sec := f.secs[i]
	selfN := selfWeightN(f.selfW, &f.static[i], s.LengthMM)
	gk, worst := 0, -1.0
	for k := range f.ls.LRFDCases {
		cq := f.CaseQuick(i, s, &f.ls.LRFDCases[k], selfN)
		if u := utilOf(f.ls.LRFDCases[k].DemandN(selfN), cq.CapacityN); u > worst {
			gk, worst = k, u
		}
	}
	var gc LoadCase
	if gk < len(f.ls.LRFDCases) {
		gc = f.ls.LRFDCases[gk]
	}
	c.BetaDns = f.betaOf(&gc, selfN)
	r, err := sec.Evaluate(c)
	if err != nil {
		q := Quick{Governing: concreteNotPerm, Reason: err.Error()}
		return Detail{Quick: q, Warnings: []string{err.Error()}, Plain: "Not evaluated: " + err.Error(), Calc: map[string]any{"error": err.Error()}}
	}
	d := Detail{Quick: f.Quick(i, s), Warnings: r.Warnings}
	d.Steps = make([]Step, 0, len(r.Steps)+4)
	for _, st := range r.Steps {
		d.Steps = append(d.Steps, Step(st))
	}
	d.Plain = r.Summary
	puN := gc.DemandN(selfN)
	betaWords := "factored dead over total factored load of " + gc.Name + " (ACI 318-19 6.6.4.4.4); every LRFD combination is checked with its own"
	if f.betaFixed >= 0 {
		betaWords = fmt.Sprintf("the larger of the typed %.2f and %s's own factored dead over total (ACI 318-19 6.6.4.4.4): a typed βdns only makes a combination more conservative", f.betaFixed, gc.Name)
	}
	d.Steps = append(d.Steps,
		Step{Clause: "ACI 318-19 6.6.4.4.4", Quantity: "βdns", Formula: betaWords, Value: c.BetaDns, Unit: ""},
		Step{Clause: gc.Clause, Quantity: "Pu", Formula: "the combination with the highest utilization: " + gc.Name + ", with self-weight", Value: puN / 1e3, Unit: "kN"},
	)
	if f.uncapped && r.Permitted {
		u := c
		u.Cap14 = false
		if uq := sec.Quick(&u); uq.Permitted && uq.PhiPn > r.PhiPn*(1+1e-9) {
			d.Steps = append(d.Steps, Step{Clause: "ACI 318-19 6.2.5.3", Quantity: "φPn without the 1.4 limit (note only)",
				Formula: "where δ·M2,min meets the diagram with δ above 1.4; the code does not permit it, so it is not used", Value: uq.PhiPn / 1e3, Unit: "kN"})
		}
	}
	if s.Method == ASD {
		d.Steps = append(d.Steps, Step{
			Clause:   "ACI 318-19 (strength design only)",
			Quantity: "allowable axial strength",
			Formula:  "φPn × (largest ASD combination / Pu of the governing LRFD combination), both with self-weight",
			Value:    d.CapacityN / 1e3, Unit: "kN",
		})
		if r.Permitted {
			d.Plain += " ACI 318 is strength design only, so it is checked against the factored (LRFD) combinations and its strength is restated on the service-load scale for comparison with ASD."
		}
	}
	d.Calc = f.calc(sec, &r, &c, s, &d)
	d.Calc["k_source"] = c.Ends.KWords(c.NonswayK1)
	if c.K != 0 {
		d.Calc["k_source"] = "typed"
	}
	d.Calc["combination"] = gc.Name
	d.Calc["combination_demand_kN"] = puN / 1e3
	d.Calc["combination_capacity_kN"] = r.PhiPn / 1e3
	if s.Method == ASD && d.CapacityN > 0 {
		d.Calc["alpha"] = r.PhiPn / d.CapacityN
	}
	return d
}

// calc builds the machine-readable trace with stable keys.
func (f *concreteFamily) calc(sec *concrete.Section, r *concrete.Result, c *concrete.Conditions, s Setting, d *Detail) map[string]any {
	g := &r.Axes[r.Governs]
	m := sec.Magnify(r.Governs, r.PhiPn, g.LuMM, c)
	delta := 1.0
	switch {
	case !r.Permitted:
		delta = 0
	case g.Slender:
		delta = g.Mag.Delta
	}
	xy := make([][2]float64, len(sec.BarsXY))
	copy(xy, sec.BarsXY)
	calc := map[string]any{
		"designation":    sec.Designation,
		"family":         sec.Kind.String(),
		"transverse":     sec.Transverse.String(),
		"fc_MPa":         sec.FcMPa,
		"fy_MPa":         sec.FyMPa,
		"Ec_MPa":         sec.EcMPa,
		"beta1":          sec.Beta1,
		"bars":           sec.NBars,
		"bar":            sec.BarName(sec.Bar),
		"tie":            sec.BarName(sec.Tie),
		"tie_spacing_mm": sec.TieSpaceMM,
		"Ast_mm2":        sec.AstMM2,
		"Ag_mm2":         sec.AgMM2,
		"rho_g":          sec.Rho,
		"bars_xy_mm":     xy,
		"cover_mm":       sec.CoverMM,
		"P0_kN":          sec.P0 / 1e3,
		"Pnmax_kN":       sec.PnMax / 1e3,
		"phi":            sec.PhiC,
		"phiPnmax_kN":    sec.PhiPnMax / 1e3,
		"phiPn_kN":       r.PhiPn / 1e3,
		"capacity_kN":    d.CapacityN / 1e3,
		"method":         string(s.Method),
		"k":              g.K,
		"k_source":       concreteKSource(s),
		"axis":           r.Governs.String(),
		"klu_r":          r.KLR,
		"klu_r_x":        r.Axes[concrete.AxisX].KLR,
		"klu_r_y":        r.Axes[concrete.AxisY].KLR,
		"limit":          g.Limit,
		"slender":        g.Slender,
		"sway":           g.Sway,
		"delta":          delta,
		"beta_dns":       c.BetaDns,
		"beta_source":    map[bool]string{true: "the concrete options", false: "the governing combination"}[f.betaFixed >= 0 && c.BetaDns == f.betaFixed],
		"EI_method":      c.EI.Letter(),
		"EI_used":        map[bool]string{true: g.EI.Letter(), false: ""}[g.Slender],
		"EIeff_kNm2":     m.EIeff * 1e-9,
		"Pc_kN":          m.Pc / 1e3,
		"Mmin_kNm":       m.M2min * 1e-6,
		"Mc_kNm":         g.Mag.Mc * 1e-6,
		"phiMn_kNm":      g.PhiMn * 1e-6,
		"mode":           sec.ModeWords(r.Mode),
		"permitted":      r.Permitted,
	}
	if sec.Shape == concrete.Circular {
		calc["shape"] = "round"
		calc["D_mm"] = sec.WidthMM
	} else {
		calc["shape"] = "rect"
		calc["b_mm"] = sec.WidthMM
		calc["h_mm"] = sec.DepthMM
	}
	for k, v := range calc {
		if x, ok := v.(float64); ok && !finite(x) {
			calc[k] = 0.0 // keep the JSON encodable
		}
	}
	return calc
}

// concreteKSource says where the concrete column's K came from: typed, or the
// recommended value for idealized ends (common practice, recalled from memory).
func concreteKSource(s Setting) string {
	if s.K != 0 {
		return "typed"
	}
	return string(s.Ends) + " (common practice for idealized ends, as AISC 360-22 C-A-7.1, from memory)"
}
