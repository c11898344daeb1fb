package model

import (
	"math"
	"strconv"
	"strings"
	"sync"

	"upright/concrete"
	"upright/steel"
	"upright/steel/composite"
)

func init() { Register("composite", 40, buildComposite) }

// Conversions for the composite adapter beyond the steel ones.
const (
	compositeKNm2PerKipIn2 = steelNPerKip / 1000 * steelMM2PerIn2 / 1e6 // kip·in² to kN·m²
	compositeKgm3PerPcf    = 16.01846337                                // lb/ft³ to kg/m³
	compositeNotPerm       = "not permitted"
)

// compositeFamily is one family of filled tubes at one wall Fy and fill f'c.
type compositeFamily struct {
	name   string
	cols   []composite.Column
	static []Static
	selfW  float64
	ls     LoadSummary
	si     bool // the scheme shows SI units
}

// compositeFill returns the fill's f'c in MPa: the composite option, else
// the concrete f'c, else the concrete default of the unit system.
func compositeFill(sc *Scheme) float64 {
	switch {
	case sc.Composite.FillFcMPa != 0:
		return sc.Composite.FillFcMPa
	case sc.Concrete.FcMPa != 0:
		return sc.Concrete.FcMPa
	case sc.Units == SI:
		return concrete.DefaultFcSIMPa
	}
	return concrete.DefaultFcUSMPa
}

// buildComposite makes one family per filled HSS family switched on.
func buildComposite(sc *Scheme, ls LoadSummary) ([]Family, error) {
	o := sc.Composite
	if err := o.validate(); err != nil {
		return nil, err
	}
	fcMPa := compositeFill(sc)
	if !finite(fcMPa) || fcMPa < MinFillFcMPa || fcMPa > MaxFillFcMPa {
		return nil, bad("fill f'c", fcMPa, FillFcAccepted)
	}
	on := map[int]bool{}
	for _, n := range o.Families {
		on[compositeFamilyIndex(n)] = true
	}
	var out []Family
	for i, f := range composite.Families {
		if len(on) > 0 && !on[i] {
			continue
		}
		fy := sc.Steel.FyMPa / steelMPaPerKsi
		if fy == 0 {
			fy = steel.DefaultGrade(f).Fy
		}
		p, err := compositePrepared(compositeKey{fam: f, fy: fy, fc: fcMPa / steelMPaPerKsi, si: sc.Units == SI})
		if err != nil {
			return nil, bad("fill f'c", fcMPa, FillFcAccepted)
		}
		out = append(out, &compositeFamily{name: CompositeFamilies[i], cols: p.cols, static: p.static, selfW: selfStoreys(sc), ls: ls, si: sc.Units == SI})
	}
	return out, nil
}

type compositeKey struct {
	fam    steel.Family
	fy, fc float64 // ksi
	si     bool    // the designation states f'c in MPa
}

type compositePrep struct {
	cols   []composite.Column
	static []Static
}

var (
	compositePrepMu    sync.Mutex
	compositePrepCache = map[compositeKey]*compositePrep{}
)

// compositePrepared returns a family's filled columns, building them on
// first use; models share them read-only.
func compositePrepared(key compositeKey) (*compositePrep, error) {
	compositePrepMu.Lock()
	p := compositePrepCache[key]
	compositePrepMu.Unlock()
	if p != nil {
		return p, nil
	}
	cols, err := composite.Prepare(key.fam, composite.Materials{Fy: key.fy, Fc: key.fc})
	if err != nil {
		return nil, err
	}
	fill := compositeFcLabel(key.fc, key.si)
	name := CompositeFamilies[0]
	for i, f := range composite.Families {
		if f == key.fam {
			name = CompositeFamilies[i]
		}
	}
	p = &compositePrep{cols: cols, static: make([]Static, len(cols))}
	for i := range cols {
		sec := &cols[i].Sec
		w, d := sec.B, sec.H
		plan := sec.B * sec.H
		if sec.Round {
			w, d = sec.D, sec.D
			plan = math.Pi / 4 * sec.D * sec.D
		}
		steelKg := sec.SteelLbPerFt * steelKgmPerLbft
		p.static[i] = Static{
			Material: "composite", Family: name,
			Designation: sec.Name + " filled, " + fill,
			MassKgPerM:  cols[i].WeightLbPerFt() * steelKgmPerLbft,
			FootprintMM: [2]float64{w * steelMMPerIn, d * steelMMPerIn},
			PlanAreaMM2: plan * steelMM2PerIn2,
			Constituents: []Constituent{
				{Kind: CarbonHSSSteel, Amount: steelKg},
				{Kind: CarbonConcrete, Amount: sec.Ac * steelMM2PerIn2 / 1e6},
			},
		}
	}
	compositePrepMu.Lock()
	if len(compositePrepCache) >= 24 {
		compositePrepCache = map[compositeKey]*compositePrep{}
	}
	compositePrepCache[key] = p
	compositePrepMu.Unlock()
	return p, nil
}

// compositeFcLabel writes the fill strength for a designation: "5 ksi" in
// US units, "35 MPa" in SI.
func compositeFcLabel(fcKsi float64, si bool) string {
	if si {
		return strconv.FormatFloat(math.Round(fcKsi*steelMPaPerKsi*10)/10, 'f', -1, 64) + " MPa"
	}
	return strconv.FormatFloat(math.Round(fcKsi*100)/100, 'f', -1, 64) + " ksi"
}

// Material, Name, Len and Static implement Family.
func (f *compositeFamily) Material() string     { return "composite" }
func (f *compositeFamily) Name() string         { return f.name }
func (f *compositeFamily) Len() int             { return len(f.cols) }
func (f *compositeFamily) Static(i int) *Static { return &f.static[i] }

// Quick evaluates candidate i at the setting without a trace; it does not
// allocate.
func (f *compositeFamily) Quick(i int, s Setting) Quick {
	lx, ly, _, k, ok := steelGeometry(s)
	if !ok {
		return Quick{Governing: compositeNotPerm, Reason: steelBadSetting}
	}
	c := &f.cols[i]
	st := c.Strength(k*lx, k*ly, steelMethod(s.Method))
	if st.Mode == 0 {
		return Quick{Governing: compositeNotPerm, Reason: steelBadSetting}
	}
	q := Quick{
		CapacityN:   st.Available * steelNPerKip,
		Governing:   st.Mode.Words(c.Symmetric()),
		Mode:        int(st.Mode),
		Slenderness: st.Slenderness,
		Permitted:   true,
	}
	if compositePastLimit(&c.Sec, k*lx, k*ly) {
		q.Limit = LimitComposite
	}
	return q
}

// compositePastLimit reports whether Lc/r about either axis passes 200, r
// being the steel tube's own radius of gyration, √(Is/As), as for a bare
// tube (AISC 360-22 E2 User Note, applied to the filled tube; see
// LimitComposite). It does not allocate.
func compositePastLimit(sec *composite.Section, lcx, lcy float64) bool {
	return lcx > 200*math.Sqrt(sec.Isx/sec.As) || lcy > 200*math.Sqrt(sec.Isy/sec.As)
}

// Detail evaluates candidate i at the setting with the full SI trace.
func (f *compositeFamily) Detail(i int, s Setting) Detail {
	c := &f.cols[i]
	st := &f.static[i]
	r, err := c.Check(steelInput(s)) // Lz is not used: a filled tube does not twist
	if err != nil {
		return uncheckedDetail(compositeNotPerm, err.Error())
	}
	d := Detail{
		Quick: Quick{
			CapacityN: r.Available * steelNPerKip, Governing: r.Governing, Mode: int(r.Mode),
			Slenderness: r.Slenderness, Permitted: true,
		},
		Warnings: r.Warnings,
		Plain:    r.Plain,
	}
	if f.si { // the fill in the scheme's units
		d.Plain = strings.Replace(d.Plain, composite.FillWords(c.Mat.Fc), compositeFcLabel(c.Mat.Fc, true)+" concrete", 1)
	}
	if compositePastLimit(&c.Sec, r.Lcx, r.Lcy) {
		d.Limit = LimitComposite
	}
	d.Steps = make([]Step, 0, len(r.Steps))
	for _, x := range r.Steps {
		d.Steps = append(d.Steps, compositeStep(x))
	}
	selfN := selfWeightN(f.selfW, st, s.LengthMM)
	demandN := f.ls.Demand(selfN)
	if !finite(demandN) || demandN < 0 {
		demandN = 0
	}
	mpa := func(ksi float64) float64 { return ksi * steelMPaPerKsi }
	kN := func(kip float64) float64 { return kip * steelNPerKip / 1000 }
	kSource := "typed"
	if s.K == 0 {
		kSource = string(s.Ends) + " (AISC 360-22 Commentary Table C-A-7.1)"
	}
	var fcr any // only for slender walls
	if r.Fcr > 0 {
		fcr = mpa(r.Fcr)
	}
	axis := "x"
	if r.GoverningAxis == composite.AxisY {
		axis = "y"
	}
	eiGov := r.EIx
	if axis == "y" {
		eiGov = r.EIy
	}
	d.Calc = map[string]any{
		"designation":       st.Designation,
		"steel_designation": c.Sec.Name,
		"family":            f.name,
		"method":            r.Method.String(),
		"Fy_MPa":            mpa(r.Fy),
		"fc_MPa":            mpa(r.Fc),
		"Es_MPa":            mpa(composite.Es),
		"Ec_MPa":            mpa(r.Ec),
		"As_mm2":            r.As * steelMM2PerIn2,
		"Ac_mm2":            r.Ac * steelMM2PerIn2,
		"C3":                r.C3,
		"classification":    r.Class.String(),
		"lambda":            r.Lambda,
		"lambda_p":          r.LambdaP,
		"lambda_r":          r.LambdaR,
		"lambda_max":        r.LambdaMx,
		"Fcr_MPa":           fcr,
		"Pp_kN":             kN(r.Pp),
		"Pno_kN":            kN(r.Pno),
		"EIeff_kNm2":        eiGov * compositeKNm2PerKipIn2,
		"EIeffx_kNm2":       r.EIx * compositeKNm2PerKipIn2,
		"EIeffy_kNm2":       r.EIy * compositeKNm2PerKipIn2,
		"Pe_kN":             kN(r.Pe),
		"Pex_kN":            kN(r.Pex),
		"Pey_kN":            kN(r.Pey),
		"axis":              axis,
		"K":                 r.K,
		"K_source":          kSource,
		"Lcx_mm":            r.Lcx * steelMMPerIn,
		"Lcy_mm":            r.Lcy * steelMMPerIn,
		"Lc_r":              r.Slenderness,
		"Pn_kN":             kN(r.Pn),
		"factor":            r.Factor,
		"capacity_kN":       kN(r.Available),
		"equations":         append([]string(nil), r.Equations...),
		"governing":         r.Governing,
		"mode":              int(r.Mode),
		"notes":             append([]string(nil), r.Notes...),
		"steel_kg_m":        r.SteelLbPerFt * steelKgmPerLbft,
		"fill_kg_m":         r.ConcreteLbPerF * steelKgmPerLbft,
		"mass_kg_m":         st.MassKgPerM,
		"self_weight_kN":    selfN / 1000,
		"demand_kN":         demandN / 1000,
	}
	return d
}

// compositeStep converts one trace line to SI.
func compositeStep(s steel.Step) Step {
	switch s.Unit {
	case "kip-in2":
		return Step{Clause: s.Clause, Quantity: s.Quantity, Formula: s.Formula, Value: s.Value * compositeKNm2PerKipIn2, Unit: "kN·m²"}
	case "pcf":
		return Step{Clause: s.Clause, Quantity: s.Quantity, Formula: s.Formula, Value: s.Value * compositeKgm3PerPcf, Unit: "kg/m³"}
	}
	return steelStep(s)
}
