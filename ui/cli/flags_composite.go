package cli

import (
	"strings"

	"upright/ui/model"
	"upright/ui/units"
)

// buildComposite applies --fill-fc and --composite-families to the scheme.
func (f *schemeFlags) buildComposite(sc *model.Scheme) error {
	if f.fillFc != "" {
		v, err := units.ParseStress(f.fillFc)
		if err != nil {
			return usagef("--fill-fc %q: not accepted; give %s with its unit, e.g. 6ksi, 6000psi or 40MPa", f.fillFc, model.FillFcAccepted)
		}
		if !(v >= model.MinFillFcMPa && v <= model.MaxFillFcMPa) {
			return usagef("--fill-fc %q: not accepted; give %s", f.fillFc, model.FillFcAccepted)
		}
		sc.Composite.FillFcMPa = v
	}
	if f.compositeFamilies != "" {
		sc.Composite.Families = nil
		for _, s := range strings.Split(f.compositeFamilies, ",") {
			name := strings.TrimSpace(s)
			known := ""
			for _, k := range model.CompositeFamilies {
				if strings.EqualFold(k, name) {
					known = k
				}
			}
			if known == "" {
				return usagef("--composite-families %q: %q is not accepted; give a comma list of %s", f.compositeFamilies, name, strings.Join(model.CompositeFamilies, ", "))
			}
			sc.Composite.Families = append(sc.Composite.Families, known)
		}
	}
	return nil
}
