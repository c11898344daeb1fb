package steel

import (
	"fmt"
	"math"
	"strings"
)

// Grade is a steel material specification with its minimum yield stress.
type Grade struct {
	Name string  // e.g. "ASTM A992"
	Fy   float64 // specified minimum yield stress, ksi
}

// The default grades of each family (AISC Manual Table 2-4 preferred
// materials).
var (
	A992         = Grade{"ASTM A992", 50}
	A572Gr50     = Grade{"ASTM A572 Gr. 50", 50}
	A500GrCRect  = Grade{"ASTM A500 Gr. C", 50}
	A500GrCRound = Grade{"ASTM A500 Gr. C", 46}
	A53GrB       = Grade{"ASTM A53 Gr. B", 35}
)

// DefaultGrade returns the preferred grade of a family: A992 for W, A572
// Gr. 50 for HP, A500 Gr. C for HSS (50 ksi rectangular, 46 ksi round) and
// A53 Gr. B for pipe.
func DefaultGrade(f Family) Grade {
	switch f {
	case W:
		return A992
	case HP:
		return A572Gr50
	case HSSSquare, HSSRect:
		return A500GrCRect
	case HSSRound:
		return A500GrCRound
	default:
		return A53GrB
	}
}

// Limits on a yield stress override, ksi.
const (
	MinFy = 25.0
	MaxFy = 110.0
)

// CheckFy returns an error naming the field when fy is not a usable yield
// stress override; 0 means "keep the default grade" and is accepted.
func CheckFy(fy float64) error {
	if fy == 0 {
		return nil
	}
	if math.IsNaN(fy) || math.IsInf(fy, 0) || fy < MinFy || fy > MaxFy {
		return fmt.Errorf("Fy: %v is not accepted; give a yield stress from %g to %g ksi, or 0 for the family's default grade", fy, MinFy, MaxFy)
	}
	return nil
}

// Method selects LRFD design strength or ASD allowable strength.
type Method int

// The two design methods of AISC 360-22 B3.
const (
	LRFD Method = iota
	ASD
)

// Resistance and safety factors for compression, AISC 360-22 E1.
const (
	PhiC   = 0.90
	OmegaC = 1.67
)

// String returns "LRFD" or "ASD".
func (m Method) String() string {
	if m == ASD {
		return "ASD"
	}
	return "LRFD"
}

// Factor returns the multiplier from nominal to available strength: φc
// for LRFD, 1/Ωc for ASD (AISC 360-22 E1).
func (m Method) Factor() float64 {
	if m == ASD {
		return 1 / OmegaC
	}
	return PhiC
}

// EndCondition is one of the six idealized column end conditions
// (bottom–top).
type EndCondition int

// The six idealized cases of AISC 360-22 Commentary Table C-A-7.1.
const (
	FixedFixed EndCondition = iota
	FixedPinned
	FixedGuided
	PinnedPinned
	FixedFree
	PinnedGuided
)

// EndConditions lists the six cases in the order of Table C-A-7.1.
var EndConditions = []EndCondition{FixedFixed, FixedPinned, FixedGuided, PinnedPinned, FixedFree, PinnedGuided}

var endNames = [...]string{"fixed-fixed", "fixed-pinned", "fixed-guided", "pinned-pinned", "fixed-free", "pinned-guided"}

// Recommended design K of AISC 360-22 Commentary Table C-A-7.1, in the
// order of EndConditions.
var endK = [...]float64{0.65, 0.80, 1.2, 1.0, 2.1, 2.0}

// Valid reports whether e is one of the six cases.
func (e EndCondition) Valid() bool { return e >= 0 && int(e) < len(endNames) }

// String returns the case's name, e.g. "pinned-pinned".
func (e EndCondition) String() string {
	if !e.Valid() {
		return fmt.Sprintf("EndCondition(%d)", int(e))
	}
	return endNames[e]
}

// K returns the recommended design effective-length factor of the case
// (AISC 360-22 Commentary Table C-A-7.1); NaN for an invalid case.
func (e EndCondition) K() float64 {
	if !e.Valid() {
		return math.NaN()
	}
	return endK[e]
}

// ParseEndCondition returns the case with the given name, e.g. "fixed-free".
func ParseEndCondition(s string) (EndCondition, error) {
	for i, n := range endNames {
		if strings.EqualFold(n, strings.TrimSpace(s)) {
			return EndCondition(i), nil
		}
	}
	return 0, fmt.Errorf("ends: %q is not accepted; give one of %s", s, strings.Join(endNames[:], ", "))
}
