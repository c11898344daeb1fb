package model

// SteelOptions are the steel family switches and grades.
type SteelOptions struct {
	Families []string // subset of "W", "HP", "HSS square", "HSS rectangular", "HSS round", "Pipe"; empty means all
	FyMPa    float64  // yield stress override for every steel family, MPa; 0 keeps each family's default grade
}

func defaultSteelOptions() SteelOptions { return SteelOptions{} }

func (o SteelOptions) validate() error {
	if o.FyMPa != 0 && (!finite(o.FyMPa) || o.FyMPa < 200 || o.FyMPa > 700) {
		return bad("steel Fy", o.FyMPa, "a yield stress from 200 to 700 MPa (29 to 100 ksi)")
	}
	return nil
}
