package model

import "strings"

// CompositeOptions are the concrete-filled HSS choices. The wall's yield
// stress is the steel options' (each HSS family's grade unless overridden).
type CompositeOptions struct {
	Families  []string // subset of CompositeFamilies; empty means all
	FillFcMPa float64  // fill f'c, MPa; 0 follows the concrete f'c (itself 5,000 psi or 35 MPa by default)
}

// CompositeFamilies lists the family names CompositeOptions.Families accepts, in display order.
var CompositeFamilies = []string{"Filled HSS square", "Filled HSS rectangular", "Filled HSS round"}

const compositeFamiliesAccepted = "a comma list of Filled HSS square, Filled HSS rectangular, Filled HSS round"

// Limits on the fill's f'c, MPa: 3 to 10 ksi (AISC 360-22 I1.3), with a
// little room for rounding of typed SI values.
const (
	MinFillFcMPa = 20.6
	MaxFillFcMPa = 69.0
)

// FillFcAccepted says what the fill f'c accepts, for messages.
const FillFcAccepted = "a fill strength from 3,000 to 10,000 psi (20.7 to 69 MPa, AISC 360-22 I1.3)"

func defaultCompositeOptions() CompositeOptions { return CompositeOptions{} }

func (o CompositeOptions) validate() error {
	if o.FillFcMPa != 0 && (!finite(o.FillFcMPa) || o.FillFcMPa < MinFillFcMPa || o.FillFcMPa > MaxFillFcMPa) {
		return bad("fill f'c", o.FillFcMPa, FillFcAccepted)
	}
	for _, n := range o.Families {
		if compositeFamilyIndex(n) < 0 {
			return bad("composite families", n, compositeFamiliesAccepted)
		}
	}
	return nil
}

// compositeFamilyIndex returns the index of a family name in
// CompositeFamilies (case and surrounding space ignored), or -1.
func compositeFamilyIndex(n string) int {
	for i, k := range CompositeFamilies {
		if strings.EqualFold(strings.TrimSpace(n), k) {
			return i
		}
	}
	return -1
}
