package model

import (
	"fmt"
	"math"
	"strconv"
	"strings"
	"sync"

	"upright/concrete"
)

// FireOptions is the scheme's one fire-resistance rating, which every
// material answers to: steel with a gypsum board enclosure, concrete with a
// least dimension and cover, timber with its char layer.
type FireOptions struct {
	Rating    string // "none", "1h", "1.5h", "2h" or "3h"
	Aggregate string // concrete coarse aggregate: "siliceous", "carbonate" or "semi-lightweight"
	// SteelProtection is how steel, and a filled tube that needs it, is
	// protected: "board" (Type X gypsum board box, IBC 722.5.1.2, the
	// default: a column a client sees is usually boxed) or "spray" (sprayed
	// fire-resistive material, IBC 722.5.1.3, usual where the column is concealed).
	SteelProtection string
}

// SteelProtections lists the steel protections FireOptions.SteelProtection accepts.
var SteelProtections = []string{"board", "spray"}

// SteelProtectionAccepted names the accepted steel protections.
const SteelProtectionAccepted = "board (Type X gypsum board, IBC 722.5.1.2) or spray (sprayed fire-resistive material, IBC 722.5.1.3)"

// FireRatings lists the ratings FireOptions.Rating accepts, in display order.
var FireRatings = []string{"none", "1h", "1.5h", "2h", "3h"}

// FireAggregates lists the aggregates FireOptions.Aggregate accepts, in display order.
var FireAggregates = []string{"siliceous", "carbonate", "semi-lightweight"}

// Accepted-value phrases for fire errors, shared by the model and the edges.
const (
	FireRatingsAccepted    = "none, 1h, 1.5h, 2h or 3h"
	FireAggregatesAccepted = "siliceous, carbonate or semi-lightweight"
)

func defaultFireOptions() FireOptions {
	return FireOptions{Rating: "none", Aggregate: "siliceous", SteelProtection: "board"}
}

func (o FireOptions) validate() error {
	if _, ok := fireHours(o.Rating); !ok {
		return bad("fire", o.Rating, FireRatingsAccepted)
	}
	if _, ok := fireAggregate(o.Aggregate); !ok {
		return bad("aggregate", o.Aggregate, FireAggregatesAccepted)
	}
	if o.SteelProtection != "board" && o.SteelProtection != "spray" {
		return bad("steel protection", o.SteelProtection, SteelProtectionAccepted)
	}
	return nil
}

// Hours returns the rating in hours, 0 for none or an unknown rating.
func (o FireOptions) Hours() float64 {
	h, _ := fireHours(o.Rating)
	return h
}

// On reports whether a rating is asked for.
func (o FireOptions) On() bool { return o.Hours() > 0 }

// fireHours maps a rating to hours.
func fireHours(r string) (float64, bool) {
	switch r {
	case "none":
		return 0, true
	case "1h":
		return 1, true
	case "1.5h":
		return 1.5, true
	case "2h":
		return 2, true
	case "3h":
		return 3, true
	}
	return 0, false
}

// ParseFireRating reads a rating as typed ("2h", "2 h", "2", "1.5hr",
// "none", "0") and returns its canonical spelling, or an error naming field
// and the accepted ratings.
func ParseFireRating(field, s string) (string, error) {
	t := strings.ToLower(strings.TrimSpace(s))
	if t == "none" || t == "0" || t == "0h" {
		return "none", nil
	}
	if m := strings.TrimSpace(strings.TrimSuffix(t, "min")); m != t {
		if v, err := strconv.ParseFloat(m, 64); err == nil {
			t = strconv.FormatFloat(v/60, 'f', -1, 64)
		}
	}
	for _, suf := range []string{"hours", "hour", "hrs", "hr", "h"} {
		if strings.HasSuffix(t, suf) {
			t = strings.TrimSpace(strings.TrimSuffix(t, suf))
			break
		}
	}
	if v, err := strconv.ParseFloat(t, 64); err == nil {
		for _, r := range FireRatings {
			if h, _ := fireHours(r); h == v && h > 0 {
				return r, nil
			}
		}
	}
	return "", bad(field, s, FireRatingsAccepted)
}

// ParseFireAggregate reads an aggregate name (any case) and returns its
// canonical spelling, or an error naming field and the accepted names.
func ParseFireAggregate(field, s string) (string, error) {
	t := strings.ToLower(strings.TrimSpace(s))
	if t == "sand-lightweight" || t == "semi lightweight" || t == "semilightweight" {
		t = "semi-lightweight"
	}
	if _, ok := fireAggregate(t); ok {
		return t, nil
	}
	return "", bad(field, s, FireAggregatesAccepted)
}

func fireAggregate(a string) (concrete.Aggregate, bool) {
	switch a {
	case "siliceous":
		return concrete.Siliceous, true
	case "carbonate":
		return concrete.Carbonate, true
	case "semi-lightweight":
		return concrete.SemiLightweight, true
	}
	return 0, false
}

// timberHours is the exposure time the timber char calculation uses: the
// rating up to the 2 h NDS 2018 Chapter 16 covers, 0 beyond (the fire step
// then marks every timber candidate as not reaching the rating).
func (o FireOptions) timberHours() float64 {
	if h := o.Hours(); h <= timberFireMaxHours {
		return h
	}
	return 0
}

// concreteBarCoverMM is the least clear cover to the longitudinal bars the
// rating asks for, mm (0 with no rating).
func (o FireOptions) concreteBarCoverMM() float64 {
	h := o.Hours()
	if h == 0 {
		return 0
	}
	c, err := concrete.FireBarCoverMM(h)
	if err != nil {
		return 0
	}
	return c
}

// FireCheck is how one candidate meets the scheme's fire rating: the system,
// the clause, what it provides and what it adds to the plan. Lengths are mm.
type FireCheck struct {
	RatingH   float64 `json:"rating_h"`           // rating asked for, h
	System    string  `json:"system"`             // the protection in words
	Clause    string  `json:"clause"`             // the calculated method
	ProvidedH float64 `json:"provided_h"`         // fire resistance provided, h
	OK        bool    `json:"ok"`                 // the rating is reached
	Reason    string  `json:"reason,omitempty"`   // why not, naming the rule
	Layers    int     `json:"layers,omitempty"`   // steel: board layers
	LayerMM   float64 `json:"layer_mm,omitempty"` // steel: one layer's thickness

	ThicknessMM       float64 `json:"thickness_mm,omitempty"`        // steel: total board thickness h
	HeatedPerimeterMM float64 `json:"heated_perimeter_mm,omitempty"` // steel: heated perimeter D
	BoardKgPerM       float64 `json:"board_kg_per_m,omitempty"`      // steel: board mass per metre
	MinDimensionMM    float64 `json:"min_dimension_mm,omitempty"`    // concrete: least dimension required
	CoverMM           float64 `json:"cover_mm,omitempty"`            // concrete: clear cover to the bars provided
	CoverRequiredMM   float64 `json:"cover_required_mm,omitempty"`   // concrete: clear cover to the bars required

	FootprintMM     [2]float64 `json:"footprint_mm"`      // protected plan
	BareFootprintMM [2]float64 `json:"bare_footprint_mm"` // plan without protection
	BareMassKgPerM  float64    `json:"bare_mass_kg_per_m"`
	BarePlanAreaMM2 float64    `json:"bare_plan_area_mm2"`

	trace func() []Step // builds the fire trace on demand (Detail), so the build stays cheap
}

// Trace returns the fire check's lines of the calculation trace.
func (c *FireCheck) Trace() []Step {
	if c.trace == nil {
		return nil
	}
	return c.trace()
}

// calc is the machine-readable form of the check for a Detail's Calc.
func (c *FireCheck) calc() map[string]any {
	out := map[string]any{
		"rating_h": c.RatingH, "system": c.System, "clause": c.Clause, "provided_h": c.ProvidedH, "ok": c.OK,
		"footprint_mm": c.FootprintMM, "bare_footprint_mm": c.BareFootprintMM, "bare_mass_kg_per_m": c.BareMassKgPerM,
	}
	if c.Reason != "" {
		out["reason"] = c.Reason
	}
	if c.Layers > 0 {
		out["layers"], out["layer_mm"] = c.Layers, c.LayerMM
	}
	if c.ThicknessMM > 0 {
		out["thickness_mm"], out["heated_perimeter_mm"], out["board_kg_per_m"] = c.ThicknessMM, c.HeatedPerimeterMM, c.BoardKgPerM
	}
	if c.MinDimensionMM > 0 {
		out["min_dimension_mm"], out["cover_mm"], out["cover_required_mm"] = c.MinDimensionMM, c.CoverMM, c.CoverRequiredMM
	}
	return out
}

// fireNotPerm is the Governing text of a candidate that does not reach the rating.
const fireNotPerm = "not permitted: fire rating"

// fireHoursText writes hours as the ratings spell them: "1", "1.5", "2".
func fireHoursText(h float64) string { return strconv.FormatFloat(h, 'f', -1, 64) }

// fireFamily wraps a family with the scheme's fire rating: its Static holds
// the protected plan, mass and carbon, and a candidate that cannot reach the
// rating is not permitted, whatever its strength.
type fireFamily struct {
	Family
	static []Static
	selfW  float64
	ls     LoadSummary
}

// Unwrap returns the family without the fire step, for callers that look
// for optional methods of a material's own family.
func (f *fireFamily) Unwrap() Family { return f.Family }

// Static returns the protected facts of candidate i.
func (f *fireFamily) Static(i int) *Static { return &f.static[i] }

// Quick is the wrapped family's strength, or not permitted when the
// candidate cannot reach the rating; it does not allocate.
func (f *fireFamily) Quick(i int, s Setting) Quick {
	if fc := f.static[i].Fire; fc != nil && !fc.OK {
		return Quick{Governing: fireNotPerm, Reason: fc.Reason}
	}
	return f.Family.Quick(i, s)
}

// Detail is the wrapped family's trace with the fire check appended.
func (f *fireFamily) Detail(i int, s Setting) Detail {
	d := f.Family.Detail(i, s)
	st := &f.static[i]
	fc := st.Fire
	if fc == nil {
		return d
	}
	fc = fireAtLength(fc, d.Calc)
	d.Fire = fc
	// The fire section of the trace: the rating, the method's lines, the verdict.
	verdict := "reached: " + fc.System
	if !fc.OK {
		verdict = "not reached: " + fc.Reason
	}
	d.Steps = append(d.Steps, Step{Clause: fc.Clause, Quantity: "FIRE: rating asked for", Formula: "the scheme's one rating, for every material", Value: fc.RatingH, Unit: "h"})
	d.Steps = append(d.Steps, fc.Trace()...)
	d.Steps = append(d.Steps, Step{Clause: fc.Clause, Quantity: "FIRE: resistance provided", Formula: verdict, Value: fc.ProvidedH, Unit: "h"})
	if d.Calc == nil {
		d.Calc = map[string]any{}
	}
	fire := fc.calc()
	if own, ok := d.Calc["fire"].(map[string]any); ok {
		// The material's own fire-case details (timber: the char depth and
		// the residual section) stay beside the check.
		for k, v := range own {
			if _, clash := fire[k]; clash {
				k = "char_" + k
			}
			fire[k] = v
		}
	}
	d.Calc["fire"] = fire
	if fc.BoardKgPerM > 0 {
		// The board's weight is dead load on the column: the model's demand
		// uses the protected mass, so the trace shows the same.
		selfN := selfWeightN(f.selfW, st, s.LengthMM)
		if _, ok := d.Calc["mass_kg_m"]; ok {
			d.Calc["mass_kg_m"] = st.MassKgPerM
		}
		if _, ok := d.Calc["self_weight_kN"]; ok {
			d.Calc["self_weight_kN"] = selfN / 1000
		}
		if _, ok := d.Calc["demand_kN"]; ok {
			if dem := f.ls.Demand(selfN); finite(dem) && dem >= 0 {
				d.Calc["demand_kN"] = dem / 1000
			}
		}
	}
	if !st.Fire.OK {
		d.Quick = Quick{Governing: fireNotPerm, Reason: fc.Reason}
	}
	if !fc.OK {
		d.Warnings = append(d.Warnings, "Fire rating not reached: "+fc.Reason)
		d.Plain = fmt.Sprintf("This size cannot reach the %s h fire rating: %s", fireHoursText(fc.RatingH), fc.Reason)
	} else {
		d.Plain += fmt.Sprintf(" For the %s h fire rating: %s.", fireHoursText(fc.RatingH), fc.System)
	}
	return d
}

// applyFire wraps every family with the scheme's fire rating; with no rating
// the families are returned as they are.
func applyFire(sc *Scheme, ls LoadSummary, fams []Family) ([]Family, error) {
	hours := sc.Fire.Hours()
	if hours == 0 {
		return fams, nil
	}
	out := make([]Family, len(fams))
	errs := make([]error, len(fams))
	var wg sync.WaitGroup
	for fi, f := range fams {
		wg.Add(1)
		go func(fi int, f Family) { // one family per goroutine, as the build does
			defer wg.Done()
			if f.Material() == "composite" {
				ff, err := newFilledFireFamily(sc, ls, f, hours)
				if err != nil {
					errs[fi] = fmt.Errorf("%s: %w", f.Material(), err)
					return
				}
				out[fi] = ff
				return
			}
			w := &fireFamily{Family: f, static: make([]Static, f.Len()), selfW: selfStoreys(sc), ls: ls}
			for i := range w.static {
				st, err := fireProtect(sc, f, i, hours)
				if err != nil {
					errs[fi] = fmt.Errorf("%s %s: %w", f.Material(), f.Static(i).Designation, err)
					return
				}
				w.static[i] = st
			}
			out[fi] = w
		}(fi, f)
	}
	wg.Wait()
	for _, err := range errs {
		if err != nil {
			return nil, err
		}
	}
	return out, nil
}

// fireProtect returns candidate i's static facts with the protection the
// rating needs, by material.
func fireProtect(sc *Scheme, f Family, i int, hours float64) (Static, error) {
	bare := f.Static(i)
	switch f.Material() {
	case "steel":
		o, err := BoardOutlineOf(bare.Family)
		if err != nil {
			return Static{}, err
		}
		return protectSteelBy(sc.Fire.SteelProtection, *bare, o, bare.MassKgPerM, hours)
	case "concrete":
		cover := 0.0
		if cf, ok := f.(interface{ barCoverMM(i int) float64 }); ok {
			cover = cf.barCoverMM(i)
		}
		agg, _ := fireAggregate(sc.Fire.Aggregate)
		return concreteFire(*bare, hours, agg, cover)
	case "timber":
		return timberFire(*bare, hours), nil
	}
	return fireOther(bare, f.Material(), hours, sc.Fire.SteelProtection)
}

// fireOther protects a candidate of a material without its own fire rule.
// One with a steel shell (e.g. a concrete-filled HSS) is boxed in board as
// bare steel of the shell's weight alone: the core's heat sink is ignored,
// which errs on the safe side, and the system says so. Anything else cannot
// show that it reaches the rating and is not permitted.
func fireOther(bare *Static, material string, hours float64, protection string) (Static, error) {
	steelKg, core := 0.0, false
	for _, c := range bare.Constituents {
		switch c.Kind {
		case CarbonRolledSteel, CarbonHSSSteel:
			steelKg += c.Amount
		case CarbonConcrete:
			core = true
		}
	}
	if steelKg > 0 {
		o := fireBox
		if fp := bare.FootprintMM; fp[0] == fp[1] && bare.PlanAreaMM2 < 0.9*fp[0]*fp[1] {
			o = fireRoundOutline // round: plan area π·D²/4
		}
		st, err := protectSteelBy(protection, *bare, o, steelKg, hours)
		if err == nil && core {
			st.Fire.System += "; the steel shell alone, concrete core ignored (conservative)"
		}
		return st, err
	}
	st := *bare
	st.Fire = fireBare(bare, hours)
	st.Fire.System = "none: no calculated fire method for this material"
	st.Fire.Reason = "no calculated fire method is implemented for " + material
	return st, nil
}

// fireBare starts a check with the bare plan and mass.
func fireBare(bare *Static, hours float64) *FireCheck {
	return &FireCheck{
		RatingH: hours, FootprintMM: bare.FootprintMM, BareFootprintMM: bare.FootprintMM,
		BareMassKgPerM: bare.MassKgPerM, BarePlanAreaMM2: bare.PlanAreaMM2,
	}
}

// fireRound rounds a reported hour figure to 0.01 h.
func fireRound(h float64) float64 { return math.Round(h*100) / 100 }

// ProtectionMM implements Protected: the board thickness around candidate i,
// mm, or 0 when the fire rule adds no enclosure (concrete, timber, no rating).
func (f *fireFamily) ProtectionMM(i int, _ Setting) float64 {
	if fc := f.static[i].Fire; fc != nil && fc.OK {
		return fc.ThicknessMM
	}
	return 0
}

// fireAtLength returns the fire check as it stands at the length and load
// of a Detail whose material checks its fire case with the strength
// (timber: the charred section against the service combination, NDS 2018
// 16.2.2). When that case fails, the rating is not reached: the check is
// not OK, provides no rating, and says why. Otherwise fc is returned.
func fireAtLength(fc *FireCheck, calc map[string]any) *FireCheck {
	own, ok := calc["fire"].(map[string]any)
	if !ok || !fc.OK {
		return fc
	}
	permitted, _ := own["permitted"].(bool)
	capKN, _ := own["capacity_kN"].(float64)
	demKN, _ := own["demand_kN"].(float64)
	if permitted && capKN >= demKN {
		return fc
	}
	out := *fc
	out.OK, out.ProvidedH = false, 0
	out.System = "exposed wood sized for its char layer: the charred section does not carry the service load at the rating"
	if r, _ := own["reason"].(string); !permitted && r != "" {
		out.Reason = fmt.Sprintf("after %s h of char the residual section is not permitted: %s (NDS 2018 16.2)", fireHoursText(fc.RatingH), r)
	} else {
		out.Reason = fmt.Sprintf("after %s h of char the residual section carries %.0f kN, less than the service demand of %.0f kN (NDS 2018 16.2.2)", fireHoursText(fc.RatingH), capKN, demKN)
	}
	return &out
}
