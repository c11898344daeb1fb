package model

import (
	"context"
	"errors"
	"fmt"
	"reflect"
	"strings"
	"sync"
	"unicode/utf8"
)

// MaxVariants is how many variants a scheme holds besides itself.
const MaxVariants = 4

// MaxVariantName is the longest variant name accepted, in characters.
const MaxVariantName = 60

// Change is one input a variant changes: the name of the compare flag that
// sets it, without dashes ("length"), and the value as typed ("5.5m").
type Change struct {
	Name  string
	Value string
}

// Variant is the scheme with a few inputs changed, under a short name.
type Variant struct {
	Name    string
	Changes []Change
}

// ChangeApplier applies changes to a copy of a base scheme (whose Variants
// are nil) and returns the changed scheme, or an error naming the input and
// what it accepts. The headless commands register the one that reads the
// compare flags, so a variant is read exactly as those flags are.
type ChangeApplier func(base Scheme, changes []Change) (Scheme, error)

var (
	applierMu sync.RWMutex
	applier   ChangeApplier
)

// SetChangeApplier registers how changes are applied (ui/cli does, from init).
func SetChangeApplier(a ChangeApplier) {
	applierMu.Lock()
	applier = a
	applierMu.Unlock()
}

func changeApplier() ChangeApplier {
	applierMu.RLock()
	defer applierMu.RUnlock()
	return applier
}

// ParseChanges reads changes written as NAME=VALUE[,NAME=VALUE…]; it checks
// the form only (each pair has a name and a value), not the names.
func ParseChanges(text string) ([]Change, error) {
	var out []Change
	for _, pair := range strings.Split(text, ",") {
		pair = strings.TrimSpace(pair)
		if pair == "" {
			continue
		}
		name, value, ok := strings.Cut(pair, "=")
		name, value = strings.TrimPrefix(strings.TrimSpace(name), "--"), strings.TrimSpace(value)
		if !ok || name == "" || value == "" {
			return nil, fmt.Errorf("%q is not a change; give NAME=VALUE with NAME a compare flag without dashes, e.g. length=5.5m", pair)
		}
		out = append(out, Change{Name: name, Value: value})
	}
	return out, nil
}

// ChangesText writes changes back as NAME=VALUE, NAME=VALUE.
func ChangesText(cs []Change) string {
	parts := make([]string, len(cs))
	for i, c := range cs {
		parts[i] = c.Name + "=" + c.Value
	}
	return strings.Join(parts, ", ")
}

// VariantLabel is a variant's name, or its changes when it has none.
func VariantLabel(v Variant) string {
	if strings.TrimSpace(v.Name) != "" {
		return v.Name
	}
	if len(v.Changes) == 0 {
		return "(no change)"
	}
	return ChangesText(v.Changes)
}

// validateVariants checks the form of the variants: how many, their names
// and that every change has a name and a value. The values are read when a
// variant is applied.
func validateVariants(vs []Variant) error {
	if len(vs) > MaxVariants {
		return bad("variants", len(vs), fmt.Sprintf("at most %d variants besides the scheme itself", MaxVariants))
	}
	for i, v := range vs {
		if utf8.RuneCountInString(v.Name) > MaxVariantName || strings.ContainsAny(v.Name, "\n\r") {
			return bad(fmt.Sprintf("variant %d name", i+1), v.Name, fmt.Sprintf("one line of at most %d characters", MaxVariantName))
		}
		for _, c := range v.Changes {
			if strings.TrimSpace(c.Name) == "" || strings.TrimSpace(c.Value) == "" {
				return bad(fmt.Sprintf("variant %q", VariantLabel(v)), c.Name+"="+c.Value, "NAME=VALUE with NAME a compare flag without dashes, e.g. length=5.5m")
			}
		}
	}
	return nil
}

// VariantError is a variant that cannot be applied; it names the variant.
type VariantError struct {
	Variant string
	Err     error
}

func (e *VariantError) Error() string { return fmt.Sprintf("variant %q: %v", e.Variant, e.Err) }

// Unwrap returns the underlying error (a flag's or the model's message).
func (e *VariantError) Unwrap() error { return e.Err }

// ApplyVariant returns the scheme with the variant's changes applied; the
// result holds no variants. Its name is the variant's label.
func (sc *Scheme) ApplyVariant(v Variant) (Scheme, error) {
	base := *sc
	base.Variants = nil
	a := changeApplier()
	if a == nil {
		return base, &VariantError{Variant: VariantLabel(v), Err: errors.New("no reader of changes is registered in this program")}
	}
	out, err := a(base, v.Changes)
	if err != nil {
		return base, &VariantError{Variant: VariantLabel(v), Err: err}
	}
	out.Variants = nil
	return out, nil
}

// VariantResult is one column of the side-by-side comparison: the base
// (Index −1) or a variant, evaluated at its own setting.
type VariantResult struct {
	Index   int    // −1 for the base, else the variant's index in Scheme.Variants
	Name    string // "Base" or the variant's label
	Changes []Change
	Scheme  Scheme // the scheme evaluated (the variant's, with its setting)
	Model   *Model // may be the base's model when only the setting differs
	Result  *Result
	Err     error // the variant could not be applied or built; Model and Result are nil
}

// Best returns the best working row of the family of that name, or nil.
func (v *VariantResult) Best(family string) *Row {
	fr := v.Family(family)
	if fr == nil {
		return nil
	}
	return fr.Best()
}

// Family returns the result of the family of that name, or nil.
func (v *VariantResult) Family(family string) *FamilyResult {
	if v.Result == nil {
		return nil
	}
	for i := range v.Result.Families {
		fr := &v.Result.Families[i]
		if v.Model.Families[fr.Family].Name() == family {
			return fr
		}
	}
	return nil
}

// BestOverall returns the variant's best working row across families, or nil.
func (v *VariantResult) BestOverall() *Row {
	if v.Result == nil {
		return nil
	}
	return v.Result.BestOverall()
}

// Delta is a variant's best size of a family against the base's: the
// change in column weight (kg over its length), plan area (mm²) and
// embodied carbon (kg CO2e). Known is false when either has no working size.
type Delta struct {
	MassKg, PlanAreaMM2, CarbonKg float64
	Known                         bool
}

// RowDelta is the change from row a (the base) to row b.
func RowDelta(a, b *Row, aLengthMM, bLengthMM float64) Delta {
	if a == nil || b == nil {
		return Delta{}
	}
	return Delta{
		MassKg:      b.Static.MassKgPerM*bLengthMM/1000 - a.Static.MassKgPerM*aLengthMM/1000,
		PlanAreaMM2: b.Static.PlanAreaMM2 - a.Static.PlanAreaMM2,
		CarbonKg:    b.CarbonKg - a.CarbonKg,
		Known:       true,
	}
}

// Comparison is the base and each variant evaluated side by side.
type Comparison struct {
	Base     VariantResult
	Variants []VariantResult
	// Families names every family of the base and the variants, in the
	// order they first appear (base first).
	Families []string
	Material map[string]string // family name → material
}

// Columns returns the base followed by the variants.
func (c *Comparison) Columns() []*VariantResult {
	out := []*VariantResult{&c.Base}
	for i := range c.Variants {
		out = append(out, &c.Variants[i])
	}
	return out
}

// Delta is variant vi's best size of a family against the base's.
func (c *Comparison) Delta(vi int, family string) Delta {
	v := &c.Variants[vi]
	if v.Result == nil || c.Base.Result == nil {
		return Delta{}
	}
	return RowDelta(c.Base.Best(family), v.Best(family), c.Base.Result.Setting.LengthMM, v.Result.Setting.LengthMM)
}

// sameModel reports whether the variant differs from the base only in its
// setting (lengths, ends, K, twist bracing; not the method, which sets the
// load combinations), so the base's model evaluates it at its own setting:
// the families are built from the scheme's options and loads, never from
// its setting.
func sameModel(base, v Scheme) bool {
	method := v.Setting.Method
	v.Setting, v.Name = base.Setting, base.Name
	v.Setting.Method = method
	v.Variants, base.Variants = nil, nil
	return reflect.DeepEqual(base, v)
}

// CompareVariants evaluates the scheme and each of its variants at its own
// setting, the variants concurrently. A variant that cannot be applied or
// built keeps its error in its column; only a failing base is an error. A
// variant that changes only the lengths reuses the base's model.
func CompareVariants(ctx context.Context, sc Scheme) (*Comparison, error) {
	return CompareVariantsFrom(ctx, sc, nil)
}

// CompareVariantsFrom is CompareVariants with the base's model already
// built (nil builds it), as the window has it: a variant then costs no
// more than evaluating its scheme on its own, and less when it changes
// only the setting.
func CompareVariantsFrom(ctx context.Context, sc Scheme, bm *Model) (*Comparison, error) {
	base := sc
	base.Variants = nil
	if bm == nil || !sameModel(base, bm.Scheme) || bm.Scheme.Setting.Method != base.Setting.Method {
		var err error
		if bm, err = New(base); err != nil {
			return nil, err
		}
	}
	c := &Comparison{Base: VariantResult{Index: -1, Name: "Base", Scheme: base, Model: bm}, Variants: make([]VariantResult, len(sc.Variants))}
	var wg sync.WaitGroup
	wg.Add(1)
	go func() {
		defer wg.Done()
		c.Base.Result, c.Base.Err = bm.Evaluate(ctx, base.Setting)
	}()
	for i, v := range sc.Variants {
		wg.Add(1)
		go func(i int, v Variant) {
			defer wg.Done()
			out := &c.Variants[i]
			*out = VariantResult{Index: i, Name: VariantLabel(v), Changes: v.Changes}
			vs, err := sc.ApplyVariant(v)
			if err != nil {
				out.Err = err
				return
			}
			out.Scheme = vs
			m := bm
			if !sameModel(base, vs) {
				if m, err = New(vs); err != nil {
					out.Err = &VariantError{Variant: out.Name, Err: err}
					return
				}
			}
			out.Model = m
			if out.Result, err = m.Evaluate(ctx, vs.Setting); err != nil {
				out.Err, out.Model = err, nil
			}
		}(i, v)
	}
	wg.Wait()
	if err := ctx.Err(); err != nil {
		return nil, err
	}
	if c.Base.Err != nil {
		return nil, c.Base.Err
	}
	c.Material = map[string]string{}
	for _, col := range c.Columns() {
		if col.Model == nil {
			continue
		}
		for _, f := range col.Model.Families {
			if _, ok := c.Material[f.Name()]; !ok {
				c.Material[f.Name()] = f.Material()
				c.Families = append(c.Families, f.Name())
			}
		}
	}
	return c, nil
}
