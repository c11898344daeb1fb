package model

// LoadMode says whether the axial load is typed in or taken down.
type LoadMode string

// The two ways of giving the load.
const (
	LoadDirect   LoadMode = "direct"   // a typed axial load: factored for LRFD, service for ASD
	LoadTakedown LoadMode = "takedown" // from tributary area and floor loads
)

// Load is the axial load input.
type Load struct {
	Mode    LoadMode
	DirectN float64 // typed axial load, N (governing factored load for LRFD, service load for ASD)

	// DeadShare is the part of a typed load's service load that is dead
	// load, above 0 and at most 1; 0 means DefaultDeadShare. From it the
	// typed load is split into D and L and every combination follows, as in
	// a takedown.
	DeadShare float64

	// Takedown inputs (Mode == LoadTakedown).
	TributaryM2   float64 // tributary area per floor, m²
	Floors        int     // floors carried below the roof (0 for a roof-only column)
	FloorDeadKPa  float64 // superimposed dead load per floor incl. slab, kPa
	FloorLiveKPa  float64 // unreduced floor live load, kPa
	RoofDeadKPa   float64 // roof dead load, kPa
	RoofLiveKPa   float64 // roof live load Lr, kPa
	SnowKPa       float64 // roof snow load S, kPa
	LiveReduction bool    // apply ASCE 7-22 4.7 live-load reduction
	KLL           float64 // live load element factor of ASCE 7-22 Table 4.7-1 (4 for interior and exterior columns without cantilever slabs)
	Occupancy     string  // "general", "assembly" (no reduction, 4.7.5), "storage" (heavy live load > 4.79 kPa, 4.7.3), "garage" (4.7.4)

	// Building takedown additions (zero for a single column).
	PointDeadN float64 // service dead load applied as point loads (façade, columns above), N
	// SelfStoreys, when above 0, is how many times its own length of the
	// column's own size weighs on it (a building stack of equal sizes above
	// it, in units of its length) instead of 1 + Floors.
	SelfStoreys float64
}

// Combo is one load combination evaluated in the takedown.
type Combo struct {
	Name   string  // e.g. "1.2D + 1.6L + 0.5(Lr or S)" with its ASCE 7-22 number
	Clause string  // e.g. "ASCE 7-22 2.3.1 combination 2"
	D      float64 // factor on dead load
	L      float64 // factor on floor live load
	Lr     float64 // factor on roof live load
	S      float64 // factor on snow
	ValueN float64 // the combined axial load without column self-weight, N
}

// LoadSummary is the result of the takedown (or the typed load) that the
// families and the demand calculation use.
type LoadSummary struct {
	Known bool // true when the dead/live split is known (always, since a typed load declares its dead share)
	Typed bool // true when the load was typed (D and L derived from the dead share)

	DeadN     float64 // service dead load, N
	LiveN     float64 // service floor live load after reduction, N
	LiveRawN  float64 // service floor live load before reduction, N
	RoofLiveN float64 // service roof live load, N
	SnowN     float64 // service snow load, N
	Reduction float64 // live-load reduction multiplier applied (1 when none)

	Combos        []Combo // every combination checked
	Governing     int     // index into Combos of the governing one
	GoverningName string  // the governing combination's name without its zero-load terms
	DemandN       float64 // governing axial demand without self-weight, N

	BetaDns float64 // ACI 318-19 βdns of the governing LRFD combination: factored sustained (dead) over total factored axial
	Lambda  float64 // NDS 2018 time effect factor λ of the governing (largest) LRFD combination; timber checks every combination with its own
	CD      float64 // NDS 2018 load duration factor CD of the governing (largest) ASD combination; timber checks every combination with its own

	// Cases are the combinations of Method, without exact duplicates, that
	// every candidate is checked against; LRFDCases are the LRFD ones
	// (strength design, ACI 318-19, checks these under either method);
	// FireCase is the governing ASD (service) combination, the load of a
	// fire-case check (NDS 2018 16.2.2).
	Cases     []LoadCase
	LRFDCases []LoadCase
	ASDCases  []LoadCase
	FireCase  LoadCase

	// StrengthPerService is α = (governing LRFD demand)/(governing ASD
	// demand), from the takedown or from the typed load's dead share.
	StrengthPerService float64

	DirectDeadFactor float64 // dead-load factor of the governing combination

	Steps []Step // readable trace of the takedown

	// Added with the takedown (all zero or nil for a typed load).
	Method         Method    // the method Combos, Governing and DemandN belong to
	Duration       []float64 // NDS 2018 λ (LRFD, Table N3) or CD (ASD, Table 2.3.2) of each entry of Combos
	OtherCombos    []Combo   // the other method's combinations, evaluated for α, λ and CD
	OtherGoverning int       // index into OtherCombos of the governing one; -1 when there are none
	LRFDN          float64   // governing LRFD combination without self-weight, N
	ASDN           float64   // governing ASD combination without self-weight, N
}

// Demand returns the governing axial demand, N, with selfN (service weight of
// the column over its height) added as dead load to every combination.
func (ls *LoadSummary) Demand(selfN float64) float64 {
	if ls.Governing < 0 || len(ls.Combos) == 0 {
		return ls.DemandN + ls.DirectDeadFactor*selfN
	}
	best := 0.0
	for i := range ls.Combos {
		c := &ls.Combos[i]
		v := c.ValueN + c.D*selfN
		if v > best {
			best = v
		}
	}
	return best
}

// CasesFor returns the combinations of method m that candidates are checked against.
func (ls *LoadSummary) CasesFor(m Method) []LoadCase {
	if m == ASD {
		return ls.ASDCases
	}
	return ls.LRFDCases
}

// DemandFor returns the largest combination of method m with the column's
// service self-weight selfN added as dead load, N.
func (ls *LoadSummary) DemandFor(m Method, selfN float64) float64 {
	best := 0.0
	cs := ls.CasesFor(m)
	for k := range cs {
		if v := cs[k].DemandN(selfN); v > best {
			best = v
		}
	}
	return best
}
