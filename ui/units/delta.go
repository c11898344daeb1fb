package units

import "fmt"

// signed writes v with its sign ("+12", "−3", "±0") to the given decimals.
func signed(v float64, decimals int) string {
	s := fmt.Sprintf("%.*f", decimals, v)
	switch {
	case s == fmt.Sprintf("%.*f", decimals, 0.0) || s == fmt.Sprintf("-%.*f", decimals, 0.0):
		return "±" + fmt.Sprintf("%.*f", decimals, 0.0)
	case v > 0:
		return "+" + s
	}
	return "−" + s[1:]
}

// DeltaParts writes a change of column weight (kg), plan area (mm²) and
// embodied carbon (kg CO2e) with signs, in the system's units.
func DeltaParts(massKg, areaMM2, carbonKg float64, sys System) (mass, area, carbon string) {
	if sys == SI {
		mass = signed(massKg, 0) + " kg"
		area = signed(areaMM2/1e6, 3) + " m²"
	} else {
		mass = signed(massKg/KgPerLb, 0) + " lb"
		area = signed(areaMM2/MM2PerIn2, 0) + " in²"
	}
	return mass, area, signed(carbonKg, 0) + " kg CO2e"
}

// Delta writes a change of weight, plan area and carbon on one line.
func Delta(massKg, areaMM2, carbonKg float64, sys System) string {
	m, a, c := DeltaParts(massKg, areaMM2, carbonKg, sys)
	return m + ", " + a + ", " + c
}
