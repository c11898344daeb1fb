// Package model is the Fyne-free comparison engine that both the window and
// the headless commands drive: a scheme goes in, ranked candidates per family,
// curves and crossover points come out.
//
// All quantities inside the model are SI: lengths in mm, forces in N,
// stresses in MPa, masses in kg. Conversion to US customary happens only at
// the edges (ui/units, the CLI and the window).
package model

import (
	"fmt"
	"sort"
	"sync"
)

// Method selects LRFD design strength or ASD allowable strength.
type Method string

// The two design methods.
const (
	LRFD Method = "lrfd"
	ASD  Method = "asd"
)

// EndCondition names one of the six idealized column end conditions.
type EndCondition string

// The six idealized end conditions (bottom–top).
const (
	FixedFixed   EndCondition = "fixed-fixed"
	FixedPinned  EndCondition = "fixed-pinned"
	FixedGuided  EndCondition = "fixed-guided"
	PinnedPinned EndCondition = "pinned-pinned"
	FixedFree    EndCondition = "fixed-free"
	PinnedGuided EndCondition = "pinned-guided"
)

// EndConditions lists the six idealized cases in display order.
var EndConditions = []EndCondition{FixedFixed, FixedPinned, FixedGuided, PinnedPinned, FixedFree, PinnedGuided}

// Sway reports whether the end condition lets the top translate sideways.
func (e EndCondition) Sway() bool {
	return e == FixedGuided || e == FixedFree || e == PinnedGuided
}

// Valid reports whether e is one of the six idealized cases.
func (e EndCondition) Valid() bool {
	for _, c := range EndConditions {
		if c == e {
			return true
		}
	}
	return false
}

// Setting is the geometry and method at which a family is evaluated.
type Setting struct {
	LengthMM float64      // strong-axis (x) unbraced length, mm
	WeakMM   float64      // weak-axis (y) unbraced length, mm
	Ends     EndCondition // idealized end condition
	K        float64      // typed effective-length factor; 0 means the end condition's recommended value
	Method   Method       // LRFD or ASD
	// TwistBraced says the weak-axis braces also restrain twisting, so the
	// torsional unbraced length is WeakMM; otherwise it is the full length
	// LengthMM (a girt or wall brace rarely restrains twist).
	TwistBraced bool
}

// TwistMM returns the torsional unbraced length, mm: WeakMM when the braces
// restrain twist, else the full length.
func (s Setting) TwistMM() float64 {
	if s.TwistBraced && s.WeakMM > 0 {
		return s.WeakMM
	}
	return s.LengthMM
}

// AtLength returns a copy of s at a new strong-axis length, keeping the
// weak-axis length as the same fraction of it (a weak-axis brace at
// mid-height stays at mid-height).
func (s Setting) AtLength(lengthMM float64) Setting {
	out := s
	if s.LengthMM > 0 {
		out.WeakMM = s.WeakMM / s.LengthMM * lengthMM
	} else {
		out.WeakMM = lengthMM
	}
	out.LengthMM = lengthMM
	return out
}

// Constituent is one material quantity per metre of column, used for
// embodied-carbon ranking.
type Constituent struct {
	Kind   string  // one of the CarbonKinds keys, e.g. "rolled-steel", "concrete"
	Amount float64 // per metre of column, in the kind's unit (kg or m3)
}

// Static holds the length-independent facts of one candidate.
type Static struct {
	Material     string        // "steel", "concrete" or "timber"
	Family       string        // family name shown to the user, e.g. "W", "HSS rectangular"
	Designation  string        // e.g. "W14X90", "16x16 in tied, 8 #9, 5 ksi"
	MassKgPerM   float64       // mass per metre of column, kg/m
	FootprintMM  [2]float64    // plan width and depth, mm
	PlanAreaMM2  float64       // plan area occupied (width × depth, or π D²/4 for round), mm²
	Constituents []Constituent // material quantities per metre for carbon
	Fire         *FireCheck    // how the candidate meets the scheme's fire rating; nil with no rating
}

// Quick is a candidate's strength at one setting, without a trace. It must be
// cheap: no allocation on the hot path.
type Quick struct {
	CapacityN   float64 // LRFD design strength or ASD allowable strength, N; 0 when not permitted
	Governing   string  // governing mode in plain words
	Mode        int     // small code that changes exactly when the governing mode changes
	Slenderness float64 // governing slenderness ratio (KL/r, le/d, k·lu/r)
	Permitted   bool    // false when the method does not apply (e.g. le/d > 50)
	Reason      string  // why not permitted, when Permitted is false
	Limit       string  // the slenderness limit passed, shown as a visible mark (see LimitMark); "" when none
}

// Step is one line of a calculation trace.
type Step struct {
	Clause   string  `json:"clause"`   // the code clause or equation, e.g. "AISC 360-22 Eq. E3-2"
	Quantity string  `json:"quantity"` // what is computed, e.g. "Fcr"
	Formula  string  `json:"formula"`  // the expression in words or symbols
	Value    float64 `json:"value"`    // the result
	Unit     string  `json:"unit"`     // SI unit of Value ("MPa", "mm", "kN", "mm2", "" for ratios)
}

// Detail is a candidate's full result at one setting, with its trace.
type Detail struct {
	Quick
	Warnings []string       // visible warnings (e.g. Lc/r above 200)
	Calc     map[string]any // machine-readable trace, keys stable (see the CLI JSON)
	Steps    []Step         // readable trace in the order the standard gives
	Plain    string         // one sentence a client understands on what governs
	Checks   []Check        // every load combination checked (filled by Model.Detail)
	// Fire is the fire check at this length and load, nil with no rating.
	// It can differ from Static.Fire where the check depends on the length
	// (timber: whether the charred section carries the service load).
	Fire *FireCheck
}

// Family is one group of candidates of one material that the model evaluates
// together, e.g. all W shapes.
type Family interface {
	Material() string
	Name() string
	Len() int
	Static(i int) *Static
	Quick(i int, s Setting) Quick
	Detail(i int, s Setting) Detail
}

// Builder makes a material's families for a scheme and its load summary.
type Builder func(sc *Scheme, loads LoadSummary) ([]Family, error)

type registration struct {
	material string
	order    int
	build    Builder
}

var (
	regMu    sync.Mutex
	registry []registration
)

// Register adds a material's builder; order fixes where it appears in output.
// Material adapters call it from init.
func Register(material string, order int, b Builder) {
	regMu.Lock()
	defer regMu.Unlock()
	for _, r := range registry {
		if r.material == material {
			panic(fmt.Sprintf("model: material %q registered twice", material))
		}
	}
	registry = append(registry, registration{material, order, b})
	sort.Slice(registry, func(i, j int) bool { return registry[i].order < registry[j].order })
}

// Materials lists the registered materials in display order.
func Materials() []string {
	regMu.Lock()
	defer regMu.Unlock()
	out := make([]string, len(registry))
	for i, r := range registry {
		out[i] = r.material
	}
	return out
}

func builderFor(material string) Builder {
	regMu.Lock()
	defer regMu.Unlock()
	for _, r := range registry {
		if r.material == material {
			return r.build
		}
	}
	return nil
}

// uncheckedDetail is the Detail of a candidate its method could not check:
// not permitted, with the method's message as reason, warning and trace.
func uncheckedDetail(governing, msg string) Detail {
	return Detail{
		Quick:    Quick{Governing: governing, Reason: msg},
		Warnings: []string{msg},
		Calc:     map[string]any{"error": msg},
		Plain:    "This column could not be checked: " + msg,
	}
}
