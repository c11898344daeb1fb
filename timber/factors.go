package timber

import (
	"fmt"
	"math"
)

// Method selects ASD (allowable stress) or LRFD (load and resistance factor) design.
type Method int

// The two design methods.
const (
	ASD Method = iota + 1
	LRFD
)

// String returns "ASD" or "LRFD".
func (m Method) String() string {
	switch m {
	case ASD:
		return "ASD"
	case LRFD:
		return "LRFD"
	}
	return "unknown method"
}

// EndCondition is one of the six idealized column end conditions of
// NDS 2018 Appendix G Table G1, named bottom–top.
type EndCondition int

// The six idealized end conditions.
const (
	FixedFixed EndCondition = iota + 1
	FixedPinned
	FixedGuided
	PinnedPinned
	FixedFree
	PinnedGuided
)

// String returns the end condition's name, e.g. "pinned-pinned".
func (e EndCondition) String() string {
	switch e {
	case FixedFixed:
		return "fixed-fixed"
	case FixedPinned:
		return "fixed-pinned"
	case FixedGuided:
		return "fixed-guided"
	case PinnedPinned:
		return "pinned-pinned"
	case FixedFree:
		return "fixed-free"
	case PinnedGuided:
		return "pinned-guided"
	}
	return "unknown end condition"
}

// Ke returns the recommended design buckling length coefficient of
// NDS 2018 Appendix G Table G1 (from memory), or 0 for an unknown condition.
func (e EndCondition) Ke() float64 {
	switch e {
	case FixedFixed:
		return 0.65 // NDS 2018 Table G1, case (a) (from memory)
	case FixedPinned:
		return 0.80 // NDS 2018 Table G1, case (b) (from memory)
	case FixedGuided:
		return 1.2 // NDS 2018 Table G1, case (c) (from memory)
	case PinnedPinned:
		return 1.0 // NDS 2018 Table G1, case (d) (from memory)
	case FixedFree:
		return 2.10 // NDS 2018 Table G1, case (e) (from memory)
	case PinnedGuided:
		return 2.40 // NDS 2018 Table G1, case (f) (from memory)
	}
	return 0
}

// Load duration factors CD accepted for ASD (NDS 2018 Table 2.3.2, from memory).
const (
	CDPermanent  = 0.9  // permanent (dead load)
	CDTenYears   = 1.0  // ten years (occupancy live load)
	CDTwoMonths  = 1.15 // two months (snow load)
	CDSevenDays  = 1.25 // seven days (construction load)
	CDTenMinutes = 1.6  // ten minutes (wind, earthquake)
)

// LRFD format conversion, resistance and time effect factors (NDS 2018 Appendix N, from memory).
const (
	KFc    = 2.40 // NDS 2018 Table N1: format conversion factor KF on Fc
	KFEmin = 1.76 // NDS 2018 Table N1: format conversion factor KF on Emin
	PhiC   = 0.90 // NDS 2018 Table N2: resistance factor φc on Fc
	PhiS   = 0.85 // NDS 2018 Table N2: resistance factor φs on Emin
)

// LeDLimit is the largest slenderness ratio le/d permitted for a column
// (NDS 2018 3.7.1.4).
const LeDLimit = 50.0

// Column stability constants (NDS 2018 3.7.1.5).
const (
	CSawn   = 0.8   // c for sawn lumber
	CGlulam = 0.9   // c for structural glued laminated timber
	KcE     = 0.822 // coefficient of the Euler critical stress FcE = 0.822 Emin'/(le/d)²
)

// Conditions are the service and design conditions that fix the adjustment factors.
type Conditions struct {
	Method  Method  // ASD or LRFD
	CD      float64 // ASD load duration factor: 0.9, 1.0, 1.15, 1.25 or 1.6 (NDS 2018 Table 2.3.2); 0 means 1.0
	Lambda  float64 // LRFD time effect factor λ: 0.6, 0.7, 0.8 or 1.0 (NDS 2018 Table N3); 0 means 0.8
	Wet     bool    // wet service: MC above 19% sawn, 16% or more glulam (CM)
	Hot     bool    // sustained temperature over 100 °F up to 125 °F (Ct, Table 2.3.3)
	Incised bool    // incised for preservative treatment (Ci, 4.3.8)
	Fire    Fire    // fire exposure for the Chapter 16 check
}

// Fire is a fire-resistance exposure for the NDS 2018 Chapter 16 check.
type Fire struct {
	Hours float64 // required fire resistance time: 0 (no check), 1, 1.5 or 2 h
	Sides int     // faces exposed: 3 or 4 (ignored when Hours is 0)
}

// On reports whether a fire check is asked for.
func (f Fire) On() bool { return f.Hours > 0 }

// BetaN is the nominal char rate βn, in/h, that Table 16.2.1A is built on.
const BetaN = 1.5 // nominal char rate, in/h (NDS 2018 16.2.1.1, from memory)

// EffectiveCharDepth returns the effective char depth aeff, in, of NDS 2018
// Table 16.2.1A (βn = 1.5 in/h, from memory) for 1, 1.5 or 2 h, and false
// for any other time.
func EffectiveCharDepth(hours float64) (float64, bool) {
	switch hours {
	case 1:
		return 1.8, true // NDS 2018 Table 16.2.1A: 1 h, aeff = 1.8 in (from memory)
	case 1.5:
		return 2.5, true // NDS 2018 Table 16.2.1A: 1.5 h, aeff = 2.5 in (from memory)
	case 2:
		return 3.2, true // NDS 2018 Table 16.2.1A: 2 h, aeff = 3.2 in (from memory)
	}
	return 0, false
}

// CharDepthEq returns the effective char depth, in, by NDS 2018 Eq. 16.2-1
// with the 1.2 allowance for the heated zone: aeff = 1.2 βn t^0.813.
// Table 16.2.1A rounds this to 0.1 in.
func CharDepthEq(hours float64) float64 {
	return 1.2 * BetaN * math.Pow(hours, 0.813) // NDS 2018 Eq. 16.2-1 and 16.2.1.1
}

// Design stress to member strength factors for fire design (NDS 2018 Table
// 16.2.2, from memory). They turn ASD reference values into average ultimate
// strengths: Fc 2.58 = 1.9/(1 − 1.645·0.16) and FcE 2.03 = 1.66/(1 − 1.645·0.11)
// (NDS 2018 Commentary C16.2.2, from memory). The bending and tension factor
// is 2.85 and is not used for columns.
const (
	FireKFc  = 2.58 // NDS 2018 Table 16.2.2: compression parallel to grain Fc (from memory)
	FireKFcE = 2.03 // NDS 2018 Table 16.2.2: column buckling FcE, applied to Emin (from memory)
)

func validCD(v float64) bool {
	switch v {
	case CDPermanent, CDTenYears, CDTwoMonths, CDSevenDays, CDTenMinutes:
		return true
	}
	return false
}

func validLambda(v float64) bool {
	switch v {
	case 0.6, 0.7, 0.8, 1.0:
		return true
	}
	return false
}

// normalized returns the conditions with zero CD and λ replaced by their
// defaults, or an error naming the bad field.
func (c Conditions) normalized() (Conditions, error) {
	if c.Method != ASD && c.Method != LRFD {
		return c, fmt.Errorf("timber: method %d is unknown; use ASD or LRFD", int(c.Method))
	}
	if c.CD == 0 {
		c.CD = CDTenYears
	}
	if !validCD(c.CD) {
		return c, fmt.Errorf("timber: load duration factor CD %v not accepted; use 0.9, 1.0, 1.15, 1.25 or 1.6 (NDS 2018 Table 2.3.2)", c.CD)
	}
	if c.Lambda == 0 {
		c.Lambda = 0.8
	}
	if !validLambda(c.Lambda) {
		return c, fmt.Errorf("timber: time effect factor lambda %v not accepted; use 0.6, 0.7, 0.8 or 1.0 (NDS 2018 Table N3)", c.Lambda)
	}
	if c.Fire.Hours != 0 {
		if _, ok := EffectiveCharDepth(c.Fire.Hours); !ok {
			return c, fmt.Errorf("timber: fire time %v h not accepted; use 0 (none), 1, 1.5 or 2 h", c.Fire.Hours)
		}
		if c.Fire.Sides != 3 && c.Fire.Sides != 4 {
			return c, fmt.Errorf("timber: fire sides %d not accepted; use 3 or 4", c.Fire.Sides)
		}
	}
	return c, nil
}

// Factor is one adjustment factor applied to one reference value.
type Factor struct {
	Name    string  // e.g. "CD", "CM", "KF", "phi", "lambda"
	Applies string  // the reference value it multiplies: "Fc" or "Emin"
	Value   float64 // the factor
	Clause  string  // the table or clause that gives it
	Note    string  // the condition that fixed the value, e.g. "dry service", "ten years"
}

// Key returns the factor's name and the value it applies to, e.g. "CM_Fc".
func (f Factor) Key() string { return f.Name + "_" + f.Applies }

// cdWords names the load duration of a CD value (NDS 2018 Table 2.3.2).
func cdWords(cd float64) string {
	switch cd {
	case CDPermanent:
		return "permanent load"
	case CDTenYears:
		return "ten years (occupancy live load)"
	case CDTwoMonths:
		return "two months (snow load)"
	case CDSevenDays:
		return "seven days (construction load)"
	case CDTenMinutes:
		return "ten minutes (wind or earthquake)"
	}
	return "load duration"
}

// factors returns the adjustment factors on Fc (excluding Cp) and on Emin for
// a material and section in the given conditions, in the order of NDS 2018
// Table 4.3.1 (sawn) or Table 5.3.1 (glulam).
func factors(m Material, s Section, c Conditions) (fc, emin []Factor) {
	glulam := m.Product == Glulam
	if c.Method == ASD {
		fc = append(fc, Factor{"CD", "Fc", c.CD, "NDS 2018 Table 2.3.2", cdWords(c.CD)})
	}

	// Wet service factor CM.
	cmFc, cmE, cmNote := 1.0, 1.0, "dry service"
	cmClause := "NDS Supplement Tables 4A/4B (CM)"
	switch {
	case glulam:
		cmClause = "NDS Supplement Tables 5A/5B (CM)"
	case m.Product == PostsTimbers:
		cmClause = "NDS Supplement Table 4D (CM)"
	}
	if c.Wet {
		cmNote = "wet service"
		switch {
		case m.WetIncluded:
			cmNote = "wet service; the tabulated values already apply wet"
		case glulam:
			cmFc, cmE = 0.73, 0.833 // NDS Supplement Tables 5A/5B wet service factors (from memory)
		case m.Product == PostsTimbers:
			cmFc, cmE = 0.91, 1.0 // NDS Supplement Table 4D wet service factors (from memory)
		default:
			cmFc, cmE = 0.8, 0.9 // NDS Supplement Tables 4A/4B wet service factors (from memory)
			if m.Fc*sizeFactor(m, s) <= 750 {
				cmFc = 1.0 // Tables 4A/4B: CM = 1.0 for Fc when (Fc)(CF) ≤ 750 psi
				cmNote = "wet service; Fc·CF ≤ 750 psi so CM = 1.0 on Fc"
			}
		}
	}
	fc = append(fc, Factor{"CM", "Fc", cmFc, cmClause, cmNote})

	// Temperature factor Ct, Table 2.3.3: 100 °F < T ≤ 125 °F.
	ctFc, ctE, ctNote := 1.0, 1.0, "T ≤ 100 °F"
	if c.Hot {
		ctE = 0.9  // NDS 2018 Table 2.3.3: E, Emin, wet or dry (from memory)
		ctFc = 0.8 // NDS 2018 Table 2.3.3: Fc dry (from memory)
		if c.Wet {
			ctFc = 0.7 // NDS 2018 Table 2.3.3: Fc wet (from memory)
		}
		ctNote = "100 °F < T ≤ 125 °F"
	}
	fc = append(fc, Factor{"Ct", "Fc", ctFc, "NDS 2018 Table 2.3.3", ctNote})

	ci, ciE, ciNote := 1.0, 1.0, "not incised"
	if m.Product.Sawn() {
		cf := sizeFactor(m, s)
		clause, note := "NDS Supplement Table 4A (CF)", fmt.Sprintf("%d in nominal width", s.NominalD)
		switch {
		case m.Product == PostsTimbers:
			clause, note = "NDS Supplement Table 4D (CF)", "no size factor on Fc for timbers"
		case m.Species == SouthernPine:
			clause, note = "NDS Supplement Table 4B (CF)", "size effect already in the tabulated values"
		}
		fc = append(fc, Factor{"CF", "Fc", cf, clause, note})
		if c.Incised {
			ciNote = "incised"
			if m.Product == DimensionLumber {
				ci, ciE = 0.80, 0.95 // NDS 2018 Table 4.3.8 (from memory)
			} else {
				ciNote = "incised; 4.3.8 gives Ci for dimension lumber only, not applied to timbers"
			}
		}
		fc = append(fc, Factor{"Ci", "Fc", ci, "NDS 2018 Table 4.3.8", ciNote})
	}
	if c.Method == LRFD {
		fc = append(fc,
			Factor{"KF", "Fc", KFc, "NDS 2018 Table N1", "LRFD"},
			Factor{"phi", "Fc", PhiC, "NDS 2018 Table N2", "LRFD, compression"},
			Factor{"lambda", "Fc", c.Lambda, "NDS 2018 Table N3", "LRFD, governing combination"},
		)
	}

	emin = append(emin,
		Factor{"CM", "Emin", cmE, cmClause, cmNote},
		Factor{"Ct", "Emin", ctE, "NDS 2018 Table 2.3.3", ctNote},
	)
	if m.Product.Sawn() {
		emin = append(emin, Factor{"Ci", "Emin", ciE, "NDS 2018 Table 4.3.8", ciNote})
	}
	if c.Method == LRFD {
		emin = append(emin,
			Factor{"KF", "Emin", KFEmin, "NDS 2018 Table N1", "LRFD"},
			Factor{"phi", "Emin", PhiS, "NDS 2018 Table N2", "LRFD, stability"},
		)
	}
	return fc, emin
}

// sizeFactor returns CF on Fc: Table 4A for DF-L, HF and SPF 4x posts by
// nominal width; 1.0 for Southern Pine (Table 4B), timbers (Table 4D) and glulam.
func sizeFactor(m Material, s Section) float64 {
	if m.Product != DimensionLumber || m.Species == SouthernPine {
		return 1.0
	}
	switch s.NominalD {
	case 4:
		return 1.15 // NDS Supplement Table 4A, Fc, 4" wide (from memory)
	case 6:
		return 1.1 // NDS Supplement Table 4A, Fc, 5"-6" wide (from memory)
	case 8:
		return 1.05 // NDS Supplement Table 4A, Fc, 8" wide (from memory)
	}
	return 1.0
}

func product(fs []Factor) float64 {
	p := 1.0
	for _, f := range fs {
		p *= f.Value
	}
	return p
}
