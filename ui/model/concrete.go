package model

import (
	"errors"
	"fmt"
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
	secs, err := concrete.Catalogue(concrete.CatalogueOptions{Series: series, FcMPa: key.fcMPa, Grade: key.grade, RhoMax: key.rhoMax})
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
type concreteFamily struct {
	kind    concrete.Kind
	secs    []*concrete.Section
	static  []Static
	cond    concrete.Conditions // M1/M2, βdns and EI method; lengths and ends come per setting
	alpha   float64             // ls.StrengthPerService, for ASD
	betaSrc string              // where βdns came from, for the trace
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
	e, err := concreteCatalogue(concreteKey{units: units, fcMPa: o.FcMPa, grade: o.BarGrade, rhoMax: o.RhoMax})
	if err != nil {
		return nil, err
	}
	cond := concrete.Conditions{M1M2: o.M1M2, BetaDns: o.BetaDns, Cap14: o.SecondOrderCap}
	betaSrc := "the concrete options"
	if o.BetaFromLoads && ls.Known && finite(ls.BetaDns) && ls.BetaDns >= 0 && ls.BetaDns <= 1 {
		cond.BetaDns = ls.BetaDns
		betaSrc = "the load takedown (factored dead over total factored load)"
	}
	if o.EIMethod == "b" {
		cond.EI = concrete.EIWithSteel
	}
	alpha := ls.StrengthPerService
	if !finite(alpha) || alpha <= 0 {
		alpha = 1.5 // common practice: D + L factored over service is about 1.5
	}
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
			cond: cond, alpha: alpha, betaSrc: betaSrc,
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

// quick converts the package result; ASD divides φPn by the strength-per-service ratio.
func (f *concreteFamily) quick(sec *concrete.Section, cq *concrete.Quick, m Method) Quick {
	q := Quick{Governing: concreteNotPerm, Mode: int(cq.Mode), Slenderness: cq.KLR, Permitted: cq.Permitted, Reason: cq.Reason}
	if cq.Permitted {
		q.Governing = sec.ModeWords(cq.Mode)
		q.CapacityN = cq.PhiPn
		if m == ASD {
			q.CapacityN = cq.PhiPn / f.alpha
		}
	}
	return q
}

// Quick returns the strength at a setting without a trace; it does not allocate.
func (f *concreteFamily) Quick(i int, s Setting) Quick {
	c := f.conditions(s)
	sec := f.secs[i]
	cq := sec.Quick(&c)
	return f.quick(sec, &cq, s.Method)
}

// Detail returns the strength at a setting with the full trace.
func (f *concreteFamily) Detail(i int, s Setting) Detail {
	c := f.conditions(s)
	sec := f.secs[i]
	r, err := sec.Evaluate(c)
	if err != nil {
		q := Quick{Governing: concreteNotPerm, Reason: err.Error()}
		return Detail{Quick: q, Warnings: []string{err.Error()}, Plain: "Not evaluated: " + err.Error(), Calc: map[string]any{"error": err.Error()}}
	}
	d := Detail{Quick: f.quick(sec, &r.Quick, s.Method), Warnings: r.Warnings}
	d.Steps = make([]Step, 0, len(r.Steps)+2)
	for _, st := range r.Steps {
		d.Steps = append(d.Steps, Step(st))
	}
	d.Plain = r.Summary
	if s.Method == ASD {
		d.Steps = append(d.Steps, Step{
			Clause:   "ACI 318-19 (strength design only)",
			Quantity: "allowable axial strength",
			Formula:  fmt.Sprintf("φPn / α, α = %.3f = governing LRFD demand / governing ASD demand", f.alpha),
			Value:    d.CapacityN / 1e3, Unit: "kN",
		})
		if r.Permitted {
			d.Plain += fmt.Sprintf(" ACI 318 is strength design only, so for comparison with ASD service loads its design strength is divided by %.2f, the ratio of factored to service load.", f.alpha)
		}
	}
	d.Calc = f.calc(sec, &r, &c, s, &d)
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
		"bar":            sec.Bar.Name(),
		"tie":            sec.Tie.Name(),
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
		"beta_source":    f.betaSrc,
		"EI_method":      map[concrete.EIMethod]string{concrete.EIGross: "a", concrete.EIWithSteel: "b"}[c.EI],
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
	if s.Method == ASD {
		calc["alpha"] = f.alpha
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
