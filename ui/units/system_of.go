package units

import "strings"

// siUnits and usUnits are the unit suffixes, lower case, that belong to each system.
var (
	siUnits = []string{"mm", "cm", "m", "n", "kn", "mn", "tonne", "tonnes", "kpa", "pa", "kn/m2", "kn/m²", "m2", "m²", "sqm", "mpa", "n/mm2"}
	usUnits = []string{"in", "inch", "inches", `"`, "ft", "feet", "foot", "'", "kip", "kips", "lb", "lbs", "lbf",
		"psf", "lb/ft2", "ksf", "ft2", "ft²", "sf", "sqft", "ksi", "psi"}
)

// SystemOf tells the unit system of a typed quantity such as 4.2m, 1500kN or
// 14'-6"; ok is false when the text has no unit of either system.
func SystemOf(s string) (sys System, ok bool) {
	t := strings.ToLower(strings.TrimSpace(s))
	if ftIn.MatchString(t) {
		return US, true
	}
	_, _, _, u, ok := splitNumber(t)
	if !ok || u == "" {
		return "", false
	}
	for _, x := range siUnits {
		if u == x {
			return SI, true
		}
	}
	for _, x := range usUnits {
		if u == x {
			return US, true
		}
	}
	return "", false
}
