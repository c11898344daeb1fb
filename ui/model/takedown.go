package model

import (
	"fmt"
	"math"
)

// Unit conversions used only to state US-customary limits of ASCE 7-22 4.7.
const (
	m2PerFt2  = 0.09290304   // exact: 1 ft = 0.3048 m
	kPaPerPsf = 0.0478802590 // 1 psf = 47.8802590 Pa
)

// Limits on the takedown input (SI), with their US equivalents in the messages.
const (
	maxTributaryM2 = 5000.0 // 53,800 ft² per floor
	maxFloors      = 100
	maxFloorDead   = 50.0  // kPa (1,040 psf): a heavy transfer floor
	maxFloorLive   = 30.0  // kPa (625 psf): beyond heavy storage
	maxRoofDead    = 50.0  // kPa (1,040 psf): deep planted roof
	maxRoofLive    = 10.0  // kPa (210 psf)
	maxSnow        = 25.0  // kPa (520 psf)
	maxServiceN    = 200e6 // N: the same 200 MN cap as a typed load
	reductionMinFt = 400.0 // ASCE 7-22 4.7.2: KLL·AT ≥ 400 ft² (37.16 m²)
	heavyLivePsf   = 100.0 // ASCE 7-22 4.7.3: live loads above 100 psf (4.79 kPa)
)

// DefaultKLL is the live load element factor used when Load.KLL is 0: an
// interior column in ASCE 7-22 Table 4.7-1.
const DefaultKLL = 4.0

// Occupancy names accepted in Load.Occupancy ("" is taken as general).
const (
	OccGeneral  = "general"  // OccGeneral is an ordinary reducible occupancy.
	OccAssembly = "assembly" // OccAssembly is assembly use, not reduced at 100 psf or less (ASCE 7-22 4.7.5).
	OccStorage  = "storage"  // OccStorage is storage, a heavy live load (ASCE 7-22 4.7.3) with λ 0.7 (NDS 2018 Table N3).
	OccGarage   = "garage"   // OccGarage is a passenger-vehicle garage (ASCE 7-22 4.7.4).
)

// Validate checks the load input and returns the first problem as a *FieldError.
// A typed load needs only DirectN; a takedown checks every takedown field
// (floor loads are checked for range even when Floors is 0, where they are
// ignored) and needs at least one load that actually reaches the column.
func (l Load) Validate() error {
	switch l.Mode {
	case LoadDirect:
		if !finite(l.DirectN) || l.DirectN <= 0 || l.DirectN > 200e6 {
			return bad("load", l.DirectN, "an axial load greater than zero and at most 200 MN (45,000 kip)")
		}
		if !finite(l.DeadShare) || l.DeadShare < 0 || l.DeadShare > 1 {
			return bad("dead-share", l.DeadShare, "a dead share of the service load above 0 and at most 1 (e.g. 0.6, 60% or 2/3; default 2/3)")
		}
		return nil
	case LoadTakedown:
	default:
		return bad("load mode", l.Mode, "direct or takedown")
	}
	if !finite(l.TributaryM2) || l.TributaryM2 <= 0 || l.TributaryM2 > maxTributaryM2 {
		return bad("tributary", l.TributaryM2, "a tributary area per floor greater than zero and at most 5,000 m² (53,800 ft²)")
	}
	if l.Floors < 0 || l.Floors > maxFloors {
		return bad("floors", l.Floors, "a whole number of floors carried below the roof from 0 to 100")
	}
	kpa := []struct {
		field string
		v     float64
		max   float64
		what  string
	}{
		{"dead", l.FloorDeadKPa, maxFloorDead, "a floor dead load from 0 to 50 kPa (0 to 1,040 psf)"},
		{"live", l.FloorLiveKPa, maxFloorLive, "an unreduced floor live load from 0 to 30 kPa (0 to 625 psf)"},
		{"roof-dead", l.RoofDeadKPa, maxRoofDead, "a roof dead load from 0 to 50 kPa (0 to 1,040 psf)"},
		{"roof-live", l.RoofLiveKPa, maxRoofLive, "a roof live load from 0 to 10 kPa (0 to 210 psf)"},
		{"snow", l.SnowKPa, maxSnow, "a roof snow load from 0 to 25 kPa (0 to 520 psf)"},
	}
	for _, q := range kpa {
		if !finite(q.v) || q.v < 0 || q.v > q.max {
			return bad(q.field, q.v, q.what)
		}
	}
	if !finite(l.PointDeadN) || l.PointDeadN < 0 || l.PointDeadN > maxServiceN {
		return bad("point dead load", l.PointDeadN, "a point dead load from 0 to 200 MN (45,000 kip)")
	}
	if !finite(l.SelfStoreys) || l.SelfStoreys < 0 || l.SelfStoreys > 1000 {
		return bad("self-weight storeys", l.SelfStoreys, "0 (one per floor carried) or a multiple of the column's length from 0 to 1000")
	}
	if !finite(l.KLL) || (l.KLL != 0 && l.KLL != 1 && l.KLL != 2 && l.KLL != 3 && l.KLL != 4) {
		return bad("kll", l.KLL, "0 for the interior-column default of 4, or a live load element factor 1, 2, 3 or 4 (ASCE 7-22 Table 4.7-1; dimensionless, same in SI and US)")
	}
	switch l.Occupancy {
	case "", OccGeneral, OccAssembly, OccStorage, OccGarage:
	default:
		return bad("occupancy", l.Occupancy, "general, assembly, storage or garage")
	}
	n := float64(l.Floors)
	perM2 := n*(l.FloorDeadKPa+l.FloorLiveKPa) + l.RoofDeadKPa + l.RoofLiveKPa + l.SnowKPa
	if perM2 <= 0 {
		if l.Floors == 0 {
			return bad("roof-dead", l.RoofDeadKPa, "at least one of roof-dead, roof-live or snow above 0 kPa (0 psf) for a roof-only column, or floors of 1 or more with a floor load")
		}
		return bad("dead", l.FloorDeadKPa, "at least one of dead, live, roof-dead, roof-live or snow above 0 kPa (0 psf)")
	}
	total := perM2 * l.TributaryM2 * 1e3
	if total > maxServiceN {
		return bad("tributary", l.TributaryM2, fmt.Sprintf("an area whose total service load is at most 200 MN (45,000 kip); these loads give %.0f MN", total/1e6))
	}
	if total < 1 {
		// Also keeps the ratios below clear of underflow to 0/0.
		return bad("tributary", l.TributaryM2, fmt.Sprintf("an area whose total service load is at least 1 N (0.00022 kip); these loads give %.3g N", total))
	}
	return nil
}

// liveMultiplier returns the ASCE 7-22 4.7 reduction multiplier L/Lo and a
// trace of how it was reached. atM2 is the total tributary area carried (sum
// over the floors) and kll the element factor; l.Floors is the number of
// floors supported. Special cases: no floors, no floor live load or no
// reduction requested gives 1.
func liveMultiplier(l Load, kll, atM2 float64) (float64, []Step) {
	var st []Step
	if l.Floors == 0 || l.FloorLiveKPa == 0 {
		return 1, []Step{{"ASCE 7-22 4.7", "L/Lo", "no floor live load carried", 1, ""}}
	}
	if !l.LiveReduction {
		return 1, []Step{{"ASCE 7-22 4.7", "L/Lo", "reduction not requested", 1, ""}}
	}
	heavy := l.FloorLiveKPa > heavyLivePsf*kPaPerPsf || l.Occupancy == OccStorage
	if l.Occupancy == OccAssembly && !heavy {
		// ASCE 7-22 4.7.5: live loads of 100 psf or less in assembly uses are
		// not reduced (above 100 psf, 4.7.3 below governs).
		return 1, []Step{{"ASCE 7-22 4.7.5 (limit from memory)", "L/Lo", "assembly occupancy, 4.79 kPa (100 psf) or less: not reduced", 1, ""}}
	}
	kllAT := kll * atM2
	st = append(st, Step{"ASCE 7-22 4.7.2", "KLL·AT", "KLL × AT", kllAT, "m2"})
	m := 1.0
	if kllAT/m2PerFt2 >= reductionMinFt {
		// ASCE 7-22 Eq. 4.7-1: L = Lo (0.25 + 15/√(KLL·AT)), AT in ft²;
		// SI form 0.25 + 4.57/√(KLL·AT), AT in m² (4.572 = 15·√0.09290304).
		m = 0.25 + 15/math.Sqrt(kllAT/m2PerFt2)
		m = math.Min(m, 1)
		st = append(st, Step{"ASCE 7-22 Eq. 4.7-1", "L/Lo", "0.25 + 4.57/√(KLL·AT)", m, ""})
		// ASCE 7-22 4.7.2: not less than 0.50Lo for one floor, 0.40Lo for two or more.
		floor := 0.40
		if l.Floors == 1 {
			floor = 0.50
		}
		if m < floor {
			m = floor
			st = append(st, Step{"ASCE 7-22 4.7.2 (limit from memory)", "L/Lo", fmt.Sprintf("not less than %.2f for %d %s supported", floor, l.Floors, plural(l.Floors, "floor", "floors")), m, ""})
		}
	} else {
		st = append(st, Step{"ASCE 7-22 4.7.2 (limit from memory)", "L/Lo", "KLL·AT below 37.16 m² (400 ft²): not reduced", 1, ""})
	}
	if heavy || l.Occupancy == OccGarage {
		clause, why := "ASCE 7-22 4.7.3 (limit from memory)", "live load above 4.79 kPa (100 psf)"
		if !heavy {
			clause, why = "ASCE 7-22 4.7.4 (limit from memory)", "passenger-vehicle garage"
		}
		if l.Floors >= 2 {
			// Two or more floors: reduction permitted up to 20%.
			if m < 0.80 {
				m = 0.80
			}
			st = append(st, Step{clause, "L/Lo", why + ", two or more floors: reduced by at most 20%", m, ""})
		} else {
			m = 1
			st = append(st, Step{clause, "L/Lo", why + ", one floor: not reduced", m, ""})
		}
	}
	return m, st
}

// loads holds the service loads of one takedown, N.
type loads struct{ D, L, Lr, S float64 }

// comboDef is one ASCE 7-22 gravity combination with its NDS 2018 factors.
type comboDef struct {
	name, clause string
	d, l, lr, s  float64
	lambda       float64 // NDS 2018 Table N3 (LRFD only)
}

// Gravity combinations of ASCE 7-22 2.3.1 (LRFD), with the NDS 2018 Table N3
// time effect factor λ beside each. Combinations with W or E are out of
// scope for a gravity column. The load factor on L in combination 3 is kept
// at 1.0 (the 0.5 of exception 1 is not taken).
var lrfdDefs = []comboDef{
	{"LRFD 1: 1.4D", "ASCE 7-22 2.3.1 combination 1 (factors from memory)", 1.4, 0, 0, 0, 0.6},
	{"LRFD 2: 1.2D + 1.6L + 0.5Lr", "ASCE 7-22 2.3.1 combination 2 (factors from memory)", 1.2, 1.6, 0.5, 0, 0.8},
	{"LRFD 2: 1.2D + 1.6L + 0.5S", "ASCE 7-22 2.3.1 combination 2 (factors from memory)", 1.2, 1.6, 0, 0.5, 0.8},
	{"LRFD 3: 1.2D + 1.6Lr + L", "ASCE 7-22 2.3.1 combination 3 (factors from memory)", 1.2, 1.0, 1.6, 0, 0.8},
	{"LRFD 3: 1.2D + 1.6S + L", "ASCE 7-22 2.3.1 combination 3 (factors from memory)", 1.2, 1.0, 0, 1.6, 0.8},
}

// Gravity combinations of ASCE 7-22 2.4.1 (ASD); W and E out of scope.
var asdDefs = []comboDef{
	{"ASD 1: D", "ASCE 7-22 2.4.1 combination 1 (factors from memory)", 1, 0, 0, 0, 0},
	{"ASD 2: D + L", "ASCE 7-22 2.4.1 combination 2 (factors from memory)", 1, 1, 0, 0, 0},
	{"ASD 3: D + Lr", "ASCE 7-22 2.4.1 combination 3 (factors from memory)", 1, 0, 1, 0, 0},
	{"ASD 3: D + S", "ASCE 7-22 2.4.1 combination 3 (factors from memory)", 1, 0, 0, 1, 0},
	{"ASD 4: D + 0.75L + 0.75Lr", "ASCE 7-22 2.4.1 combination 4 (factors from memory)", 1, 0.75, 0.75, 0, 0},
	{"ASD 4: D + 0.75L + 0.75S", "ASCE 7-22 2.4.1 combination 4 (factors from memory)", 1, 0.75, 0, 0.75, 0},
}

// lambdaOf returns the NDS 2018 Table N3 λ of an LRFD combination: 0.7
// instead of 0.8 for 1.2D + 1.6L + 0.5(Lr or S) when L is from storage.
func lambdaOf(d comboDef, occ string) float64 {
	if d.l == 1.6 && occ == OccStorage {
		return 0.7
	}
	return d.lambda
}

// cdOf returns the NDS 2018 Table 2.3.2 CD of an ASD combination: the factor
// of the shortest-duration load present (NDS 2018 2.3.2.2) — permanent dead
// 0.9, occupancy live 1.0, snow 1.15, roof live (construction) 1.25. A load
// whose value is zero does not count as present.
func cdOf(d comboDef, v loads) float64 {
	cd := 0.9
	if d.l > 0 && v.L > 0 {
		cd = math.Max(cd, 1.0)
	}
	if d.s > 0 && v.S > 0 {
		cd = math.Max(cd, 1.15)
	}
	if d.lr > 0 && v.Lr > 0 {
		cd = math.Max(cd, 1.25)
	}
	return cd
}

// evaluate returns the combinations, their NDS factors and the index of the
// largest (the first one wins a tie).
func evaluate(defs []comboDef, v loads, lrfd bool, occ string) ([]Combo, []float64, int) {
	cs := make([]Combo, len(defs))
	fs := make([]float64, len(defs))
	gov := 0
	for i, d := range defs {
		cs[i] = Combo{Name: d.name, Clause: d.clause, D: d.d, L: d.l, Lr: d.lr, S: d.s,
			ValueN: d.d*v.D + d.l*v.L + d.lr*v.Lr + d.s*v.S}
		if lrfd {
			fs[i] = lambdaOf(d, occ)
		} else {
			fs[i] = cdOf(d, v)
		}
		if cs[i].ValueN > cs[gov].ValueN {
			gov = i
		}
	}
	return cs, fs, gov
}

// Summarize turns the load input into the demand and the load split the
// families use, for the given method.
//
// A typed load (LoadDirect) is split into service dead and live load by its
// dead share (see typedSummary): under LRFD the typed load is the governing
// factored load, under ASD the service load.
//
// A takedown (LoadTakedown) computes D = (floors × dead + roof dead) × AT and
// Lo = floors × live × AT, reduces Lo by ASCE 7-22 4.7 when LiveReduction is
// set (AT for the reduction is the sum of the tributary areas of the floors
// carried, KLL defaulting to 4), and takes Lr and S unreduced (the optional
// roof reduction of ASCE 7-22 4.8 is not applied).
//
// Either way every gravity combination of ASCE 7-22 2.3.1 and 2.4.1 is
// evaluated (wind and seismic combinations are out of scope for a gravity
// column). Combos, Governing, DemandN and Duration are those of method m;
// OtherCombos holds the other method's; Cases, LRFDCases and FireCase are
// the combinations each candidate is checked against. α and βdns come from
// the governing LRFD combination, all without self-weight.
// LoadSummary.Demand(selfN) then adds self-weight as dead load to every
// combination of Combos, with that combination's dead factor, and takes the largest.
func Summarize(l Load, m Method) (LoadSummary, error) {
	if m != LRFD && m != ASD {
		return LoadSummary{}, bad("method", m, "lrfd or asd")
	}
	if err := l.Validate(); err != nil {
		return LoadSummary{}, err
	}
	if l.Mode == LoadDirect {
		return typedSummary(l, m), nil
	}
	return takedown(l, m), nil
}

// takedown computes the summary of a validated takedown input.
func takedown(l Load, m Method) LoadSummary {
	const kN = 1e3 // kPa × m² = kN
	a := l.TributaryM2
	n := float64(l.Floors)
	kll := l.KLL
	if kll == 0 {
		kll = DefaultKLL // ASCE 7-22 Table 4.7-1: interior column
	}
	ls := LoadSummary{Known: true, Method: m}
	ls.DeadN = (n*l.FloorDeadKPa+l.RoofDeadKPa)*a*kN + l.PointDeadN
	ls.LiveRawN = n * l.FloorLiveKPa * a * kN
	ls.RoofLiveN = l.RoofLiveKPa * a * kN
	ls.SnowN = l.SnowKPa * a * kN
	at := n * a // sum of the tributary areas of the floors carried
	steps := []Step{
		{"ASCE 7-22 3.1", "D", "(floors × floor dead + roof dead) × tributary area" + pointWords(l), ls.DeadN, "N"},
		{"ASCE 7-22 4.3", "Lo", "floors × floor live × tributary area", ls.LiveRawN, "N"},
		{"ASCE 7-22 4.7.2", "AT", "floors × tributary area (floors carried)", at, "m2"},
		{"ASCE 7-22 Table 4.7-1", "KLL", "live load element factor (4 for an interior column unless given)", kll, ""},
	}
	red, rs := liveMultiplier(l, kll, at)
	steps = append(steps, rs...)
	ls.Reduction = red
	ls.LiveN = red * ls.LiveRawN
	steps = append(steps,
		Step{"ASCE 7-22 4.7", "L", "Lo × L/Lo", ls.LiveN, "N"},
		Step{"ASCE 7-22 4.8", "Lr", "roof live × tributary area (4.8 reduction not applied)", ls.RoofLiveN, "N"},
		Step{"ASCE 7-22 7.3", "S", "roof snow × tributary area", ls.SnowN, "N"},
	)
	combine(&ls, loads{ls.DeadN, ls.LiveN, ls.RoofLiveN, ls.SnowN}, l.Occupancy, m, steps)
	return ls
}

// combine evaluates every combination of the service loads v for both
// methods and fills the summary's combinations, governing demands, α, βdns,
// the duration factors of the governing combinations and the cases each
// candidate is checked against; steps is the trace so far.
func combine(ls *LoadSummary, v loads, occ string, m Method, steps []Step) {
	lc, lf, lg := evaluate(lrfdDefs, v, true, occ)
	ac, af, ag := evaluate(asdDefs, v, false, occ)
	for _, c := range lc {
		steps = append(steps, Step{c.Clause, "Pu", c.Name, c.ValueN, "N"})
	}
	for _, c := range ac {
		steps = append(steps, Step{c.Clause, "Pa", c.Name, c.ValueN, "N"})
	}
	ls.LRFDN, ls.ASDN = lc[lg].ValueN, ac[ag].ValueN
	// ACI 318-19 6.6.4.4.4: βdns = factored sustained (dead) / total factored axial.
	ls.BetaDns = lc[lg].D * ls.DeadN / ls.LRFDN
	ls.StrengthPerService = ls.LRFDN / ls.ASDN
	ls.Lambda = lf[lg]
	ls.CD = af[ag]
	steps = append(steps,
		Step{lc[lg].Clause, "Pu", "governing LRFD: " + lc[lg].Name, ls.LRFDN, "N"},
		Step{ac[ag].Clause, "Pa", "governing ASD: " + ac[ag].Name, ls.ASDN, "N"},
		Step{"ASCE 7-22 2.3.1 / 2.4.1", "α", "governing LRFD / governing ASD", ls.StrengthPerService, ""},
		Step{"ACI 318-19 6.6.4.4.4", "βdns", "factored dead / Pu of the governing LRFD combination (each combination is checked with its own)", ls.BetaDns, ""},
		Step{"NDS 2018 N3.3, 2.3.2", "λ, CD", "timber is checked for every combination with its own time effect factor λ (LRFD, Table N3) or load duration factor CD (ASD, Table 2.3.2)", 1, ""},
	)
	ls.LRFDCases = loadCases(lc, lf, v, LRFD)
	ls.ASDCases = loadCases(ac, af, v, ASD)
	if m == LRFD {
		ls.Combos, ls.Duration, ls.Governing = lc, lf, lg
		ls.OtherCombos, ls.OtherGoverning = ac, ag
		ls.Cases = ls.LRFDCases
	} else {
		ls.Combos, ls.Duration, ls.Governing = ac, af, ag
		ls.OtherCombos, ls.OtherGoverning = lc, lg
		ls.Cases = ls.ASDCases
	}
	ls.FireCase = fireCase(ac[ag], af[ag], v)
	ls.DemandN = ls.Combos[ls.Governing].ValueN
	ls.GoverningName = comboLabel(&ls.Combos[ls.Governing], v)
	ls.DirectDeadFactor = ls.Combos[ls.Governing].D
	ls.Steps = steps
}

// plural picks the singular or plural noun for a count.
func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}

// pointWords says, after the dead-load formula, that point dead loads are added.
func pointWords(l Load) string {
	if l.PointDeadN > 0 {
		return " + point dead loads (façade, columns above)"
	}
	return ""
}
