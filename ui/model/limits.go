package model

// Slenderness limits of each material's standard, shown as a visible mark
// beside the slenderness wherever a row is shown.
const (
	LimitSteel    = "Lc/r above 200: AISC 360-22 E2 (User Note) recommends not to exceed it; strength still given"
	LimitTimber   = "le/d above 50: not permitted (NDS 2018 3.7.1.4)"
	LimitTimberCh = "le/d of the charred section above 50: not permitted (NDS 2018 3.7.1.4 with 16.2)"
	LimitConcrete = "k·lu/r above 100: not permitted (ACI 318-19 6.2.6; the moment magnifier method does not apply)"
)

// LimitComposite is the filled tube's mark: the steel recommendation
// applied with r of the steel tube alone, since AISC 360-22 Chapter I states
// no slenderness limit of its own for filled members (from memory).
const LimitComposite = "Lc/r of the tube above 200: AISC 360-22 E2 (User Note) recommends not to exceed it, applied as for steel (Chapter I states no limit of its own, from memory); strength still given"

// LimitMarkText is the visible mark put beside a slenderness that passes its limit.
const LimitMarkText = "!"

// SlendernessLimit is one material's slenderness limit, for the
// assumptions table.
type SlendernessLimit struct {
	Material string  // "steel", "concrete", "timber" or "composite"
	Ratio    string  // the ratio limited, e.g. "Lc/r"
	Max      float64 // the limit
	Effect   string  // what passing it means
}

// SlendernessLimits lists every material's limit in display order.
var SlendernessLimits = []SlendernessLimit{
	{"steel", "Lc/r", 200, LimitSteel},
	{"concrete", "k·lu/r", 100, LimitConcrete},
	{"timber", "le/d", 50, LimitTimber},
	{"composite", "Lc/r", 200, LimitComposite},
}

// LimitMark returns the mark and its reason for a row whose slenderness
// passes its material's limit, or two empty strings.
func LimitMark(q *Quick) (mark, why string) {
	if q.Limit == "" {
		return "", ""
	}
	return LimitMarkText, q.Limit
}

// Ranges of the material options that a user may type, shared by the model's
// checks, the command line and the window so each is stated in one place.
const (
	FyMinMPa   = 200.0 // FyMinMPa is the lowest steel yield stress accepted (29 ksi).
	FyMaxMPa   = 700.0 // FyMaxMPa is the highest steel yield stress accepted (100 ksi).
	FyAccepted = "a yield stress from 200 to 700 MPa (29 to 100 ksi)"

	FcMinMPa   = 27.5 // FcMinMPa is the lowest concrete f'c accepted (4,000 psi).
	FcMaxMPa   = 69.0 // FcMaxMPa is the highest concrete f'c accepted (10,000 psi).
	FcAccepted = "a concrete strength from 4,000 to 10,000 psi (27.6 to 69 MPa)"
)
