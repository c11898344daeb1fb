package model

import "strings"

// SteelOptions are the steel family switches and grades.
type SteelOptions struct {
	Families []string // subset of "W", "HP", "HSS square", "HSS rectangular", "HSS round", "Pipe"; empty means all
	FyMPa    float64  // yield stress override for every steel family, MPa; 0 keeps each family's default grade
}

// SteelFamilies lists the steel family names SteelOptions.Families accepts, in display order.
var SteelFamilies = []string{"W", "HP", "HSS square", "HSS rectangular", "HSS round", "Pipe"}

const steelFamiliesAccepted = "a comma list of W, HP, HSS square, HSS rectangular, HSS round, Pipe"

func defaultSteelOptions() SteelOptions { return SteelOptions{} }

func (o SteelOptions) validate() error {
	if o.FyMPa != 0 && (!finite(o.FyMPa) || o.FyMPa < FyMinMPa || o.FyMPa > FyMaxMPa) {
		return bad("steel Fy", o.FyMPa, FyAccepted)
	}
	for _, n := range o.Families {
		known := false
		for _, k := range SteelFamilies {
			if strings.EqualFold(strings.TrimSpace(n), k) {
				known = true
			}
		}
		if !known {
			return bad("steel families", n, steelFamiliesAccepted)
		}
	}
	return nil
}
