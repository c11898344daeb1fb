package schemefile

import (
	"reflect"
	"strings"
	"testing"

	"upright/ui/model"
)

// TestVariantsRoundTrip checks variants write and read back unchanged, in
// order, and that a scheme without them writes no "variants" field.
func TestVariantsRoundTrip(t *testing.T) {
	sc := model.DefaultScheme()
	data, err := Marshal(sc)
	if err != nil {
		t.Fatal(err)
	}
	if strings.Contains(string(data), `"variants"`) {
		t.Error("a scheme without variants writes a variants field")
	}
	sc.Variants = []model.Variant{
		{Name: "5.5 m ground floor", Changes: []model.Change{{Name: "length", Value: "5.5m"}}},
		{Name: "", Changes: []model.Change{{Name: "length", Value: "18ft"}, {Name: "fire", Value: "2h"}}},
	}
	data, err = Marshal(sc)
	if err != nil {
		t.Fatal(err)
	}
	back, err := Unmarshal(data)
	if err != nil {
		t.Fatalf("%v\n%s", err, data)
	}
	if !reflect.DeepEqual(back.Variants, sc.Variants) {
		t.Errorf("read back %+v; wrote %+v", back.Variants, sc.Variants)
	}
	if i, j := strings.Index(string(data), `"length": "18ft"`), strings.Index(string(data), `"fire": "2h"`); i < 0 || j < i {
		t.Errorf("changes not written in order:\n%s", data)
	}
}

// TestVariantsRefused checks bad variants are refused naming the field.
func TestVariantsRefused(t *testing.T) {
	data, err := Marshal(model.DefaultScheme())
	if err != nil {
		t.Fatal(err)
	}
	base := strings.TrimSuffix(strings.TrimSpace(string(data)), "}")
	for _, c := range []struct{ variants, want string }{
		{`"variants": {}`, "expected an array"},
		{`"variants": [{"name": "a"}]`, "changes"},
		{`"variants": [{"name": "a", "changes": {"length": 5}}]`, "variants[0].changes.length"},
		{`"variants": [{"name": "a", "changes": {}, "x": 1}]`, "unknown field"},
		{`"variants": [{"name":"","changes":{}},{"name":"","changes":{}},{"name":"","changes":{}},{"name":"","changes":{}},{"name":"","changes":{}}]`, "at most 4"},
	} {
		_, err := Unmarshal([]byte(base + ", " + c.variants + "}"))
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%s: %v; want %q", c.variants, err, c.want)
		}
	}
}
