package cli

import (
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"strings"
	"text/tabwriter"

	"upright/ui/model"
	"upright/ui/units"
)

func init() { model.SetChangeApplier(ApplyChanges) }

// ApplyChanges applies a variant's changes to a base scheme by the compare
// flags' own parsing, as `compare --scheme BASE --NAME=VALUE…` would: a bad
// value gets that flag's message, an unknown name is refused. The variant
// keeps the base's units unless it changes them.
func ApplyChanges(base model.Scheme, changes []model.Change) (model.Scheme, error) {
	f := newSchemeFlags("variant", io.Discard)
	var args []string
	for _, c := range changes {
		name := strings.TrimPrefix(c.Name, "--")
		switch name {
		case "scheme", "vary", "json", "all", "chart", "out", "help", "h":
			return base, usagef("%q cannot be varied; give the name of a scheme input as the compare flags name it, e.g. length, fire, load", name)
		}
		if f.fs.Lookup(name) == nil {
			return base, usagef("%q is not a compare flag; give names as the compare flags without dashes, e.g. length, weak-length, ends, load, tributary, fire, method, materials, fy (see upright compare -h)", name)
		}
		args = append(args, "--"+name+"="+c.Value)
	}
	if err := f.fs.Parse(args); err != nil {
		return base, usagef("%v", err)
	}
	out, err := f.build(base)
	if err != nil {
		return base, err
	}
	if !f.set("units") {
		out.Units = base.Units
	}
	return out, nil
}

// varyFlags collects every --vary.
type varyFlags []string

func (v *varyFlags) String() string     { return strings.Join(*v, " ") }
func (v *varyFlags) Set(s string) error { *v = append(*v, s); return nil }

// parseVary reads one --vary: [LABEL:]NAME=VALUE[,NAME=VALUE…].
func parseVary(s string) (model.Variant, error) {
	var v model.Variant
	text := s
	if label, rest, ok := strings.Cut(s, ":"); ok && !strings.Contains(label, "=") {
		v.Name, text = strings.TrimSpace(label), rest
	}
	cs, err := model.ParseChanges(text)
	if err != nil {
		return v, err
	}
	if len(cs) == 0 {
		return v, errors.New("no change given; give NAME=VALUE[,NAME=VALUE…], e.g. length=5.5m,fire=2h")
	}
	v.Changes = cs
	return v, nil
}

// VariantJSON is one column of the variants command's JSON: the base or a variant.
type VariantJSON struct {
	Name    string            `json:"name"`
	Changes map[string]string `json:"changes"`
	// Best holds each family's best size, as a compare --json row.
	Best []Candidate `json:"best"`
	// BestOverall is the best working size across families; nil when none works.
	BestOverall *BestJSON `json:"best_overall"`
	// Deltas are each family's change against the base (variants only).
	Deltas []DeltaJSON `json:"deltas,omitempty"`
}

// BestJSON names the best size overall.
type BestJSON struct {
	Family      string `json:"family"`
	Material    string `json:"material"`
	Designation string `json:"designation"`
}

// DeltaJSON is a family's best size in a variant against the base's.
type DeltaJSON struct {
	Family      string  `json:"family"`
	MassKg      float64 `json:"mass_kg"`
	PlanAreaMM2 float64 `json:"plan_area_mm2"`
	CarbonKg    float64 `json:"carbon_kgCO2e"`
}

// VariantsJSON is the JSON output of the variants command.
type VariantsJSON struct {
	Base     VariantJSON   `json:"base"`
	Variants []VariantJSON `json:"variants"`
	Caution  string        `json:"caution"`
}

func variantJSON(c *model.Comparison, col *model.VariantResult, vi int) VariantJSON {
	out := VariantJSON{Name: col.Name, Changes: map[string]string{}, Best: []Candidate{}}
	for _, ch := range col.Changes {
		out.Changes[ch.Name] = ch.Value
	}
	for _, r := range shownRows(col.Result, false) {
		out.Best = append(out.Best, NewCandidate(col.Model, r, col.Result.Setting))
	}
	if b := col.BestOverall(); b != nil {
		f := col.Model.Families[b.Family]
		out.BestOverall = &BestJSON{Family: f.Name(), Material: f.Material(), Designation: b.Static.Designation}
	}
	if vi >= 0 {
		for _, fam := range c.Families {
			if d := c.Delta(vi, fam); d.Known {
				out.Deltas = append(out.Deltas, DeltaJSON{Family: fam, MassKg: round(d.MassKg, 1),
					PlanAreaMM2: round(d.PlanAreaMM2, 0), CarbonKg: round(d.CarbonKg, 1)})
			}
		}
	}
	return out
}

func runVariants(args []string, stdout, stderr io.Writer) error {
	f := newSchemeFlags("variants", stderr)
	var vary varyFlags
	f.fs.Var(&vary, "vary", "one variant: [NAME:]FLAG=VALUE[,FLAG=VALUE…] with FLAG a compare flag without dashes, e.g. length=5.5m or \"2 h: fire=2h,length=5.5m\"; up to 4, each --vary one variant (default: the variants of --scheme)")
	asJSON := f.fs.Bool("json", false, `write JSON: {"base": {...}, "variants": [{"name", "changes", "best": [compare --json rows]}]}`)
	sc, err := schemeFrom(f, args)
	if err != nil {
		return err
	}
	if len(vary) > 0 {
		if len(vary) > model.MaxVariants {
			return usagef("--vary: %d variants given; give at most %d", len(vary), model.MaxVariants)
		}
		sc.Variants = nil
		for i, s := range vary {
			v, err := parseVary(s)
			if err != nil {
				return usagef("--vary %q (variant %d): %v", s, i+1, err)
			}
			sc.Variants = append(sc.Variants, v)
		}
	}
	if len(sc.Variants) == 0 {
		return usagef("--vary: no variant given; give one --vary per variant, e.g. --vary length=5.5m --vary fire=2h")
	}
	for i, v := range sc.Variants {
		if _, err := sc.ApplyVariant(v); err != nil {
			return usagef("--vary (variant %d): %v", i+1, err)
		}
	}
	c, err := model.CompareVariants(context.Background(), sc)
	if err != nil {
		return err
	}
	for _, col := range c.Variants {
		if col.Err != nil {
			return col.Err
		}
	}
	if *asJSON {
		out := VariantsJSON{Base: variantJSON(c, &c.Base, -1), Variants: []VariantJSON{}, Caution: model.Caution}
		for i := range c.Variants {
			out.Variants = append(out.Variants, variantJSON(c, &c.Variants[i], i))
		}
		fmt.Fprintln(stderr, model.Caution)
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		return enc.Encode(out)
	}
	printHeader(stdout, c.Base.Model)
	printVariants(stdout, c, units.System(sc.Units))
	fmt.Fprintf(stdout, "\n%s\n", model.Caution)
	return nil
}

// VariantCell is what a family's cell in a variant's column says: its best
// size, or why there is none.
func VariantCell(col *model.VariantResult, family string) string {
	switch {
	case col.Err != nil:
		return "error"
	case col.Family(family) == nil:
		return "off"
	}
	if b := col.Best(family); b != nil {
		return b.Static.Designation
	}
	return "none works"
}

func printVariants(w io.Writer, c *model.Comparison, sys units.System) {
	cols := c.Columns()
	fmt.Fprintln(w, "Variants (each is the scheme with the inputs listed changed, checked at its own length and load):")
	for _, col := range cols[1:] {
		if t := model.ChangesText(col.Changes); t != col.Name {
			fmt.Fprintf(w, "  %s: %s", col.Name, t)
		} else {
			fmt.Fprintf(w, "  %s", t)
		}
		if col.Model != nil {
			fmt.Fprintf(w, " (length %s, demand %s)", units.Length(col.Result.Setting.LengthMM, sys), units.Force(col.Model.Loads.DemandN, sys))
		}
		fmt.Fprintln(w)
	}
	fmt.Fprintln(w)
	tw := tabwriter.NewWriter(w, 2, 4, 2, ' ', 0)
	head := []string{"Family"}
	for _, col := range cols {
		head = append(head, col.Name)
	}
	fmt.Fprintln(tw, strings.Join(head, "\t"))
	for _, fam := range c.Families {
		cells := []string{fam}
		for _, col := range cols {
			cells = append(cells, VariantCell(col, fam))
		}
		fmt.Fprintln(tw, strings.Join(cells, "\t"))
	}
	best := []string{"Best overall"}
	for _, col := range cols {
		if b := col.BestOverall(); b != nil {
			best = append(best, b.Static.Designation+" ("+col.Model.Families[b.Family].Name()+")")
		} else {
			best = append(best, "none works")
		}
	}
	fmt.Fprintln(tw, strings.Join(best, "\t"))
	tw.Flush()
	fmt.Fprintln(w, "\nChange of each family's best size against the base (column weight, plan area, embodied carbon):")
	tw = tabwriter.NewWriter(w, 2, 4, 2, ' ', 0)
	fmt.Fprintln(tw, strings.Join(append([]string{"Family"}, head[2:]...), "\t"))
	for _, fam := range c.Families {
		cells := []string{fam}
		for vi := range c.Variants {
			if d := c.Delta(vi, fam); d.Known {
				cells = append(cells, units.Delta(d.MassKg, d.PlanAreaMM2, d.CarbonKg, sys))
			} else {
				cells = append(cells, "—")
			}
		}
		fmt.Fprintln(tw, strings.Join(cells, "\t"))
	}
	tw.Flush()
}
