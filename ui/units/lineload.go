package units

import (
	"fmt"
	"math"
	"strconv"
)

// KNPerMPerKlf is kN/m per kip/ft (4.4482216152605 kN / 0.3048 m).
const KNPerMPerKlf = NPerKip / 1000 / 0.3048

// LineLoadForms is the accepted forms of a load per length, shown in messages.
const LineLoadForms = "a load per length with a unit, e.g. 8kN/m, 0.5kip/ft, 500plf"

var lineLoadUnits = map[string]float64{
	"kn/m": 1, "n/m": 1e-3, "n/mm": 1,
	"kip/ft": KNPerMPerKlf, "klf": KNPerMPerKlf, "lb/ft": KNPerMPerKlf / 1000, "plf": KNPerMPerKlf / 1000,
}

// perArea is why a pressure is refused where a load per length is asked.
const perArea = "%[2]s is a load per area, not per length; write the load per length, e.g. %[1]s%[3]s"

// lineLoadAmbiguous lists the load-per-length suffixes refused as ambiguous.
var lineLoadAmbiguous = ambiguity{
	"k/ft":   "k may mean kip or kN; write %[1]skip/ft",
	"k/m":    "k may mean kip or kN; write %[1]skN/m",
	"kn/m2":  fmt.Sprintf(perArea, "%[1]s", "kN/m2", "kN/m"),
	"kn/m²":  fmt.Sprintf(perArea, "%[1]s", "kN/m²", "kN/m"),
	"kpa":    fmt.Sprintf(perArea, "%[1]s", "kPa", "kN/m"),
	"psf":    fmt.Sprintf(perArea, "%[1]s", "psf", "plf"),
	"ksf":    fmt.Sprintf(perArea, "%[1]s", "ksf", "klf"),
	"lb/ft2": fmt.Sprintf(perArea, "%[1]s", "lb/ft2", "lb/ft"),
}

// ParseLineLoad reads a load per length such as 8kN/m, 0.5kip/ft or 500plf and returns kN/m.
func ParseLineLoad(s string) (float64, error) {
	return parseWith("load per length", s, LineLoadForms, lineLoadUnits, lineLoadAmbiguous)
}

// LineLoad formats a load per length given in kN/m.
func LineLoad(knm float64, sys System) string {
	if sys == US {
		return trimFloat(knm/KNPerMPerKlf, 3) + " kip/ft"
	}
	return trimFloat(knm, 2) + " kN/m"
}

// trimFloat rounds x to digits decimals and writes it without trailing zeros.
func trimFloat(x float64, digits int) string {
	p := math.Pow(10, float64(digits))
	return strconv.FormatFloat(math.Round(x*p)/p, 'f', -1, 64)
}
