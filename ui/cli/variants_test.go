package cli

import (
	"bytes"
	"encoding/json"
	"strings"
	"testing"

	"upright/ui/model"
)

func runJSON(t *testing.T, out any, args ...string) {
	t.Helper()
	var so, se bytes.Buffer
	if code := Run(args, &so, &se); code != 0 {
		t.Fatalf("upright %s: exit %d: %s", strings.Join(args, " "), code, se.String())
	}
	if err := json.Unmarshal(so.Bytes(), out); err != nil {
		t.Fatalf("upright %s: %v", strings.Join(args, " "), err)
	}
}

// TestVariantsMatchCompare runs variants with two variants and checks every
// family's best size, and the whole row, against compare run with the same
// flags (the base flags followed by the variant's).
func TestVariantsMatchCompare(t *testing.T) {
	base := []string{"--length", "4.2m", "--load", "1500kN"}
	vary := [][]string{
		{"--length", "5.5m"},
		{"--fire", "2h", "--length", "5.5m", "--ends", "fixed-pinned"},
	}
	args := append([]string{"variants"}, base...)
	args = append(args, "--vary", "length=5.5m", "--vary", "2 h fixed: fire=2h,length=5.5m,ends=fixed-pinned", "--json")
	var got VariantsJSON
	runJSON(t, &got, args...)
	if len(got.Variants) != 2 {
		t.Fatalf("got %d variants, want 2", len(got.Variants))
	}
	if got.Variants[1].Name != "2 h fixed" || got.Variants[1].Changes["fire"] != "2h" {
		t.Errorf("variant 2 is %q with changes %v; want the name and changes given", got.Variants[1].Name, got.Variants[1].Changes)
	}
	cols := []VariantJSON{got.Base, got.Variants[0], got.Variants[1]}
	flags := [][]string{nil, vary[0], vary[1]}
	for k, col := range cols {
		var want []Candidate
		runJSON(t, &want, append(append([]string{"compare"}, base...), append(flags[k], "--json")...)...)
		if len(want) != len(col.Best) || len(want) == 0 {
			t.Fatalf("%s: %d best rows; compare gives %d", col.Name, len(col.Best), len(want))
		}
		for i := range want {
			w, g := want[i], col.Best[i]
			if w.Family != g.Family || w.Designation != g.Designation || w.Status != g.Status ||
				w.CapacityKN != g.CapacityKN || w.DemandKN != g.DemandKN || w.MassKg != g.MassKg {
				t.Errorf("%s, %s: variants gives %s (%s, %.1f kN), compare %s (%s, %.1f kN)", col.Name, w.Family,
					g.Designation, g.Status, g.CapacityKN, w.Designation, w.Status, w.CapacityKN)
			}
		}
	}
	// The fire rating must change something, or the test checks little.
	changed := false
	for i := range got.Base.Best {
		changed = changed || got.Base.Best[i].Designation != got.Variants[1].Best[i].Designation
	}
	if !changed {
		t.Error("the 2 h variant changes no family's best size; pick flags that do")
	}
}

// TestVariantsBadInput checks that a bad value gets its flag's message and
// an unknown name is refused, each naming the variant, with exit status 2.
func TestVariantsBadInput(t *testing.T) {
	for _, c := range []struct {
		vary string
		want []string
	}{
		{"tall: length=abc", []string{`variant "tall"`, `--length "abc"`, "not accepted"}},
		{"lenght=5m", []string{`variant "lenght=5m"`, `"lenght" is not a compare flag`}},
		{"hot: fire=9h", []string{`variant "hot"`, `--fire "9h"`, "1h"}},
		{"x: scheme=a.json", []string{`variant "x"`, "cannot be varied"}},
		{"length", []string{"not a change", "NAME=VALUE"}},
	} {
		var so, se bytes.Buffer
		code := Run([]string{"variants", "--length", "4m", "--load", "1000kN", "--vary", c.vary}, &so, &se)
		if code != 2 {
			t.Errorf("--vary %q: exit %d, want 2", c.vary, code)
		}
		for _, w := range c.want {
			if !strings.Contains(se.String(), w) {
				t.Errorf("--vary %q: message %q lacks %q", c.vary, se.String(), w)
			}
		}
	}
	var so, se bytes.Buffer
	args := []string{"variants", "--length", "4m", "--load", "1000kN"}
	for i := 0; i <= model.MaxVariants; i++ {
		args = append(args, "--vary", "length=5m")
	}
	if code := Run(args, &so, &se); code != 2 || !strings.Contains(se.String(), "at most 4") {
		t.Errorf("five variants: exit %d, %q; want 2 and at most 4", code, se.String())
	}
}

// TestVariantsTable checks the text output names every variant and family.
func TestVariantsTable(t *testing.T) {
	var so, se bytes.Buffer
	if code := Run([]string{"variants", "--length", "4m", "--load", "1000kN", "--materials", "steel,timber", "--vary", "tall: length=6m"}, &so, &se); code != 0 {
		t.Fatalf("exit %d: %s", code, se.String())
	}
	out := so.String()
	for _, w := range []string{"Base", "tall", "W ", "Glulam", "Best overall", "Change of each family", model.Caution} {
		if !strings.Contains(out, w) {
			t.Errorf("output lacks %q:\n%s", w, out)
		}
	}
}
