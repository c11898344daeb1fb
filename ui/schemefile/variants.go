package schemefile

import (
	"bytes"
	"encoding/json"
	"fmt"

	"upright/ui/model"
)

// variantsKey is the optional top-level field holding the scheme's
// variants. Marshal writes it only when the scheme has variants, so a
// scheme without them writes, and a file without it reads, exactly as
// before; it needs no new format version.
//
//	"variants": [                    optional; absent or []: no variants; at most 4
//	  {
//	    "name": "5.5 m ground floor",  one line, at most 60 characters; may be ""
//	    "changes": {                   the inputs changed, as the compare flags
//	      "length": "5.5m",            name them without dashes, each value as
//	      "fire": "2h"                 that flag reads it; in the order applied
//	    }
//	  }
//	]
const variantsKey = "variants"

var variantKeys = []string{"name", "changes"}

func init() { topKeys = append(topKeys, variantsKey) }

// wVariant is one variant as written.
type wVariant struct {
	Name    string   `json:"name"`
	Changes wChanges `json:"changes"`
}

// wChanges writes the changes as an object in their order.
type wChanges []model.Change

func (c wChanges) MarshalJSON() ([]byte, error) {
	var b bytes.Buffer
	b.WriteByte('{')
	for i, ch := range c {
		if i > 0 {
			b.WriteByte(',')
		}
		k, _ := json.Marshal(ch.Name)
		v, _ := json.Marshal(ch.Value)
		b.Write(k)
		b.WriteByte(':')
		b.Write(v)
	}
	b.WriteByte('}')
	return b.Bytes(), nil
}

func marshalVariants(vs []model.Variant) []wVariant {
	var out []wVariant
	for _, v := range vs {
		out = append(out, wVariant{Name: v.Name, Changes: append(wChanges{}, v.Changes...)})
	}
	return out
}

// variants reads the optional variants; absent means none.
func (r *reader) variants(root *node, sc *model.Scheme) error {
	sc.Variants = nil
	n := root.get(variantsKey)
	if n == nil {
		return nil
	}
	r.at[variantsKey] = n
	give := `a list of variants, each {"name": "…", "changes": {"length": "5.5m", …}}`
	if n.kind != kindArray {
		return r.errAt(n, variantsKey, fmt.Sprintf("expected an array; found %s; give %s", n.kind, give))
	}
	if len(n.items) > model.MaxVariants {
		return r.errAt(n, variantsKey, fmt.Sprintf("%d variants; give at most %d", len(n.items), model.MaxVariants))
	}
	for i, it := range n.items {
		p := fmt.Sprintf("%s[%d]", variantsKey, i)
		if err := r.object(it, p, variantKeys, "a variant"); err != nil {
			return err
		}
		var v model.Variant
		var err error
		if v.Name, err = r.str(it, p, "name", "the variant's short name, one line"); err != nil {
			return err
		}
		ch, cp, err := r.field(it, p, "changes", `the inputs changed, e.g. {"length": "5.5m"}`)
		if err != nil {
			return err
		}
		if ch.kind != kindObject {
			return r.errAt(ch, cp, fmt.Sprintf(`expected an object; found %s; give the inputs changed, e.g. {"length": "5.5m"}`, ch.kind))
		}
		for k, name := range ch.keys {
			val := ch.vals[k]
			if val.kind != kindString || val.str == "" {
				return r.errAt(val, join(cp, name), fmt.Sprintf(`expected the value as the compare flag --%s reads it, a non-empty string; found %s`, name, val.kind))
			}
			v.Changes = append(v.Changes, model.Change{Name: name, Value: val.str})
		}
		sc.Variants = append(sc.Variants, v)
	}
	return nil
}
