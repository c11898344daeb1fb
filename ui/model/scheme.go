package model

import (
	"fmt"
	"math"
)

// Units selects the unit system shown to the user and the concrete size series.
type Units string

// The two unit systems.
const (
	US Units = "us"
	SI Units = "si"
)

// Metric names the ranking metric.
type Metric string

// The ranking metrics.
const (
	ByWeight    Metric = "weight"
	ByFootprint Metric = "footprint"
	ByCarbon    Metric = "carbon"
)

// Scheme is everything the user chose: geometry, method, load, materials and
// their options, units and ranking metric.
type Scheme struct {
	Name       string
	Setting    Setting
	Load       Load
	SelfWeight bool     // add the column's own weight over its height to the demand
	Materials  []string // materials switched on; empty means all registered
	Steel      SteelOptions
	Concrete   ConcreteOptions
	Timber     TimberOptions
	Composite  CompositeOptions // concrete-filled HSS; the wall takes Steel's Fy
	Fire       FireOptions      // one fire-resistance rating for every material
	Units      Units
	Metric     Metric
	Carbon     CarbonFactors
	ReportMap  bool // put the map of the winning family in the client report
	// Tie is the near-tie tolerance, a fraction of the ranking metric: the
	// best family changes only when another beats it by more than this.
	Tie float64
	// Variants are the scheme with a few inputs changed, compared side by
	// side (at most MaxVariants; see variants.go).
	Variants []Variant
	// Building is a whole building to take down and size column by column
	// (NewSchedule); nil for a scheme without one.
	Building *Building
}

// CarbonFactors are cradle-to-gate (A1–A3) embodied-carbon factors per kind
// of material, in kg CO2e per kg or per m³ as the kind says.
type CarbonFactors map[string]float64

// DefaultScheme returns a complete scheme with every option at its default.
func DefaultScheme() Scheme {
	return Scheme{
		Name: "Untitled scheme",
		Setting: Setting{
			LengthMM: 4000, WeakMM: 4000, Ends: PinnedPinned, Method: LRFD,
		},
		Load:       Load{Mode: LoadDirect, DirectN: 2000e3},
		SelfWeight: true,
		Steel:      defaultSteelOptions(),
		Concrete:   defaultConcreteOptions(),
		Timber:     defaultTimberOptions(),
		Composite:  defaultCompositeOptions(),
		Fire:       defaultFireOptions(),
		Units:      US,
		Metric:     ByWeight,
		Carbon:     DefaultCarbon(),
		Tie:        DefaultTie,
	}
}

// FieldError is a bad input: it names the field, the value given and what is accepted.
type FieldError struct {
	Field    string
	Value    string
	Accepted string
}

func (e *FieldError) Error() string {
	return fmt.Sprintf("%s: %q is not accepted; give %s", e.Field, e.Value, e.Accepted)
}

func bad(field string, v any, accepted string) error {
	return &FieldError{Field: field, Value: fmt.Sprint(v), Accepted: accepted}
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// Limits on geometry the model accepts.
const (
	MinLengthMM = 300.0   // shorter than this is a pedestal, not a column
	MaxLengthMM = 30000.0 // 30 m
)

// Validate checks every field and returns the first problem as a *FieldError.
func (sc *Scheme) Validate() error {
	s := sc.Setting
	if !finite(s.LengthMM) || s.LengthMM < MinLengthMM || s.LengthMM > MaxLengthMM {
		return bad("length", s.LengthMM, "a length from 0.3 m (1 ft) to 30 m (98 ft)")
	}
	if !finite(s.WeakMM) || s.WeakMM <= 0 || s.WeakMM > s.LengthMM*1.000001 {
		return bad("weak-axis length", s.WeakMM, "a length greater than zero and no longer than the unbraced length")
	}
	if !s.Ends.Valid() {
		return bad("ends", s.Ends, "one of fixed-fixed, fixed-pinned, fixed-guided, pinned-pinned, fixed-free, pinned-guided")
	}
	if !finite(s.K) || s.K < 0 || (s.K != 0 && (s.K < 0.5 || s.K > 10)) {
		return bad("K", s.K, "an effective-length factor from 0.5 to 10")
	}
	if s.Method != LRFD && s.Method != ASD {
		return bad("method", s.Method, "lrfd or asd")
	}
	if err := sc.Load.Validate(); err != nil {
		return err
	}
	for _, m := range sc.Materials {
		if builderFor(m) == nil {
			return bad("materials", m, fmt.Sprintf("a comma list of %v", Materials()))
		}
	}
	if sc.Units != US && sc.Units != SI {
		return bad("units", sc.Units, "us or si")
	}
	switch sc.Metric {
	case ByWeight, ByFootprint, ByCarbon:
	default:
		return bad("rank", sc.Metric, "weight, footprint or carbon")
	}
	if err := sc.Steel.validate(); err != nil {
		return err
	}
	if err := sc.Concrete.validate(); err != nil {
		return err
	}
	if err := sc.Timber.validate(); err != nil {
		return err
	}
	if err := sc.Composite.validate(); err != nil {
		return err
	}
	if err := sc.Fire.validate(); err != nil {
		return err
	}
	if err := validateVariants(sc.Variants); err != nil {
		return err
	}
	if !finite(sc.Tie) || sc.Tie < 0 || sc.Tie > MaxTie {
		return bad("tie", sc.Tie, TieAccepted)
	}
	if sc.Building != nil {
		if err := sc.Building.Validate(); err != nil {
			return err
		}
	}
	for k, v := range sc.Carbon {
		if !finite(v) || v < 0 || v > 10000 {
			return bad("carbon factor "+k, v, "a non-negative factor below 10,000")
		}
	}
	return nil
}

// MaterialOn reports whether a material is switched on in the scheme.
func (sc *Scheme) MaterialOn(m string) bool {
	if len(sc.Materials) == 0 {
		return builderFor(m) != nil
	}
	for _, x := range sc.Materials {
		if x == m {
			return true
		}
	}
	return false
}
