package schemefile

import "upright/ui/model"

// compositeKeys are the fields of the "composite" object.
var compositeKeys = []string{"families", "fill_fc"}

// wFilled is the optional "composite" object: the concrete-filled HSS
// options. Marshal always writes it; a file without it (or without one of
// its fields) reads with the default.
type wFilled struct {
	Families []string `json:"families"`
	FillFc   *string  `json:"fill_fc"`
}

func marshalComposite(o model.CompositeOptions, sys model.Units) wFilled {
	w := wFilled{Families: append([]string{}, o.Families...)}
	if o.FillFcMPa != 0 {
		v := stressKind.format(o.FillFcMPa, sys)
		w.FillFc = &v
	}
	return w
}

// composite reads the optional "composite" object; when it is absent, or
// one of its fields is, the default stays.
func (r *reader) composite(root *node, o *model.CompositeOptions) error {
	if root.get("composite") == nil {
		return nil
	}
	n, p, err := r.sub(root, "", "composite", compositeKeys, "the concrete-filled HSS options")
	if err != nil {
		return err
	}
	if n.get("families") != nil {
		if o.Families, err = r.strList(n, p, "families", "a list drawn from "+quoteAll(model.CompositeFamilies)+"; [] means all"); err != nil {
			return err
		}
	}
	if n.get("fill_fc") != nil {
		if o.FillFcMPa, err = r.optQuantity(n, p, "fill_fc", stressKind, "the concrete f'c"); err != nil {
			return err
		}
	}
	return nil
}
