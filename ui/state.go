package ui

import (
	"errors"
	"fmt"
	"math"
	"reflect"
	"strings"

	"upright/ui/model"
	"upright/ui/units"
)

// Problem is one input that keeps the inputs from making a valid scheme.
type Problem struct {
	Field string // the field id (the model's field name)
	Label string // the field's label as the window shows it
	Msg   string // what is wrong and what is accepted
}

// Outcome says what a change of input asks of the engine.
type Outcome struct {
	Submit  bool // the inputs are valid: evaluate them
	Rebuild bool // something other than the length changed: build a new model
}

// State is the window's inputs apart from any widget: the text of every
// field as typed, the scheme the valid ones make (Draft), the last scheme
// that validated (Valid, which the results on screen belong to), the field
// problems, and the generation counters the engine uses to discard stale
// work. It is not safe for concurrent use; the window touches it only on the
// UI goroutine.
type State struct {
	Draft      model.Scheme // every input that parses, whether or not the whole validates
	Valid      model.Scheme // the last scheme that validated
	HaveValid  bool         // Valid holds a scheme that validated
	WeakBraced bool         // the weak axis has its own (shorter) unbraced length
	Range      model.Range  // the length range of the chart and the slider
	Gen        uint64       // bumped on every valid change
	SchemeGen  uint64       // bumped on every valid change other than the length

	built    model.Scheme // Valid at the last SchemeGen bump
	text     map[string]string
	parseErr map[string]string
	check    *Problem

	userRange bool         // Range was chosen by the user (SetRange)
	rangeSys  units.System // the unit system Range was rounded in
}

// NewState returns the state of a window showing sc.
func NewState(sc model.Scheme) *State {
	s := &State{}
	s.Load(sc)
	return s
}

// Load replaces every input with the scheme's values.
func (s *State) Load(sc model.Scheme) Outcome {
	s.Draft = sc
	s.text = map[string]string{}
	s.parseErr = map[string]string{}
	s.WeakBraced = sc.Setting.WeakMM < sc.Setting.LengthMM*(1-1e-9)
	s.Range, s.userRange = model.Range{}, false
	s.reformatAll()
	return s.revalidate(true)
}

// Sys returns the display unit system of the inputs.
func (s *State) Sys() units.System { return units.System(s.Draft.Units) }

// Text returns the text of a field as it stands.
func (s *State) Text(id string) string { return s.text[id] }

// reformatAll rewrites the text of every field that has no parse error from
// the draft, in the draft's units.
func (s *State) reformatAll() {
	for i := range fieldSpecs {
		f := &fieldSpecs[i]
		if _, bad := s.parseErr[f.id]; bad {
			continue
		}
		s.text[f.id] = f.format(f.get(&s.Draft), s.Sys())
	}
}

// reformat rewrites one field's text from the draft unless it has a parse error.
func (s *State) reformat(id string) {
	if _, bad := s.parseErr[id]; bad {
		return
	}
	f := specByID(id)
	s.text[id] = f.format(f.get(&s.Draft), s.Sys())
}

// SetText takes a field's new text: it parses it into the draft and
// revalidates. An unknown id changes nothing.
func (s *State) SetText(id, text string) Outcome {
	f := specByID(id)
	if f == nil {
		return Outcome{}
	}
	s.text[id] = text
	v, err := f.parse(text, s.Sys())
	if err != nil {
		s.parseErr[id] = err.Error()
		return s.revalidate(false)
	}
	delete(s.parseErr, id)
	f.set(&s.Draft, v)
	if id == "length" && v >= model.MinLengthMM && v <= model.MaxLengthMM {
		if !s.WeakBraced {
			s.Draft.Setting.WeakMM = s.Draft.Setting.LengthMM
		}
		s.reformat("weak-axis length")
	}
	return s.revalidate(false)
}

// SetLength moves the length alone (the slider): the weak-axis length keeps
// its fraction of it. When the inputs are invalid the last valid scheme
// moves with it, so the slider keeps working on the result on screen.
func (s *State) SetLength(mm float64) Outcome {
	if !(mm >= model.MinLengthMM && mm <= model.MaxLengthMM) {
		return Outcome{}
	}
	delete(s.parseErr, "length")
	s.Draft.Setting = s.Draft.Setting.AtLength(mm)
	s.reformat("length")
	s.reformat("weak-axis length")
	if out := s.revalidate(false); out.Submit || !s.HaveValid {
		return out
	}
	s.Valid.Setting = s.Valid.Setting.AtLength(mm)
	s.Gen++
	out := Outcome{Submit: true}
	if !s.inRange(mm) {
		s.rebuilt()
		out.Rebuild = true
	}
	return out
}

// SetWeakBraced switches the weak-axis bracing on or off; off makes the weak
// axis as long as the strong one.
func (s *State) SetWeakBraced(on bool) Outcome {
	s.WeakBraced = on
	if !on {
		delete(s.parseErr, "weak-axis length")
		s.Draft.Setting.WeakMM = s.Draft.Setting.LengthMM
		s.reformat("weak-axis length")
	} else if t := s.text["weak-axis length"]; t != "" {
		return s.SetText("weak-axis length", t)
	}
	return s.revalidate(false)
}

// Update applies a change made by a choice widget (radio, select, check,
// sketch) to the draft and revalidates.
func (s *State) Update(change func(sc *model.Scheme)) Outcome {
	before := s.Draft.Units
	change(&s.Draft)
	if s.Draft.Units != before {
		s.reformatAll()
	}
	return s.revalidate(false)
}

// SetMaterial switches one material on or off, keeping Materials nil (all)
// when every registered material is on.
func (s *State) SetMaterial(material string, on bool) Outcome {
	return s.Update(func(sc *model.Scheme) {
		var out []string
		all := true
		for _, m := range model.Materials() {
			if m == material {
				if on {
					out = append(out, m)
				} else {
					all = false
				}
				continue
			}
			if sc.MaterialOn(m) {
				out = append(out, m)
			} else {
				all = false
			}
		}
		if all {
			out = nil
		} else if out == nil {
			out = []string{} // none on: caught by check as a problem
		}
		sc.Materials = out
	})
}

// MaterialOn reports whether a material is switched on in the draft.
func (s *State) MaterialOn(material string) bool {
	if s.Draft.Materials != nil && len(s.Draft.Materials) == 0 {
		return false
	}
	return s.Draft.MaterialOn(material)
}

// active reports whether a field takes part in the scheme as it stands: the
// typed load only in direct mode, the takedown only in takedown mode, the
// weak-axis length only when braced, material options only when the
// material is registered and on.
func (s *State) active(id string) bool {
	switch id {
	case "load":
		return s.Draft.Load.Mode == model.LoadDirect
	case "tributary", "floors", "dead", "live", "roof-dead", "roof-live", "snow":
		return s.Draft.Load.Mode == model.LoadTakedown
	case "weak-axis length":
		return s.WeakBraced
	case "steel Fy":
		return s.registeredOn("steel")
	case "f'c", "rho-max", "m1m2", "beta-dns":
		return s.registeredOn("concrete")
	case "fill f'c":
		return s.registeredOn("composite")
	}
	return true
}

func (s *State) registeredOn(material string) bool {
	for _, m := range model.Materials() {
		if m == material {
			return s.MaterialOn(m)
		}
	}
	return false
}

// revalidate checks the draft; when it is valid it becomes the valid scheme
// and the generation moves on.
func (s *State) revalidate(forceRebuild bool) Outcome {
	s.check = nil
	for id := range s.parseErr {
		if s.active(id) {
			return Outcome{}
		}
	}
	if s.Draft.Materials != nil && len(s.Draft.Materials) == 0 {
		s.check = &Problem{Field: "materials", Label: "Materials", Msg: "no material is switched on; switch on at least one"}
		return Outcome{}
	}
	if s.registeredOn("steel") && s.Draft.Steel.Families != nil && len(s.Draft.Steel.Families) == 0 {
		s.check = &Problem{Field: "steel families", Label: "Steel families", Msg: "no steel shape family is chosen; choose at least one, or switch steel off"}
		return Outcome{}
	}
	if s.registeredOn("timber") && !s.Draft.Timber.Sawn && !s.Draft.Timber.Glulam {
		s.check = &Problem{Field: "timber products", Label: "Timber products", Msg: "neither sawn timber nor glulam is chosen; choose one or both, or switch timber off"}
		return Outcome{}
	}
	if s.registeredOn("timber") && s.Draft.Timber.Glulam && s.Draft.Timber.GlulamCombos != nil && len(s.Draft.Timber.GlulamCombos) == 0 {
		s.check = &Problem{Field: "timber products", Label: "Glulam combinations", Msg: "no glulam combination is chosen; choose at least one, or switch glulam off"}
		return Outcome{}
	}
	if s.registeredOn("composite") && s.Draft.Composite.Families != nil && len(s.Draft.Composite.Families) == 0 {
		s.check = &Problem{Field: "composite families", Label: "Composite families", Msg: "no filled tube family is chosen; choose at least one, or switch composite off"}
		return Outcome{}
	}
	d := s.Draft
	if !s.WeakBraced {
		d.Setting.WeakMM = d.Setting.LengthMM
	}
	if err := d.Validate(); err != nil {
		s.check = s.problemOf(err)
		return Outcome{}
	}
	s.Draft = d
	s.Valid = d
	s.HaveValid = true
	s.Gen++
	rebuild := forceRebuild || s.SchemeGen == 0 || !sameButLength(s.built, d) || !s.inRange(d.Setting.LengthMM)
	if rebuild {
		s.rebuilt()
	}
	return Outcome{Submit: true, Rebuild: rebuild}
}

// rebuilt records a new scheme generation: the built scheme and the length
// range, kept when the length is still inside it.
func (s *State) rebuilt() {
	s.SchemeGen++
	s.built = s.Valid
	if !s.inRange(s.Valid.Setting.LengthMM) || (!s.userRange && s.rangeSys != s.Sys()) {
		s.Range, s.rangeSys, s.userRange = model.DefaultRange(s.Valid.Setting.LengthMM, model.Units(s.Sys())), s.Sys(), false
	}
}

// inRange reports whether a length lies inside the current range.
func (s *State) inRange(mm float64) bool {
	return s.Range.ToMM > s.Range.FromMM && mm >= s.Range.FromMM && mm <= s.Range.ToMM
}

// sameButLength reports whether two schemes differ at most in their length
// (with the weak-axis length at the same fraction of it).
func sameButLength(a, b model.Scheme) bool {
	fa, fb := a.Setting.WeakMM/a.Setting.LengthMM, b.Setting.WeakMM/b.Setting.LengthMM
	if math.Abs(fa-fb) > 1e-9 {
		return false
	}
	a.Setting.LengthMM, a.Setting.WeakMM = 0, 0
	b.Setting.LengthMM, b.Setting.WeakMM = 0, 0
	a.Name, b.Name = "", "" // the name changes no result
	return reflect.DeepEqual(a, b)
}

// problemOf turns a validation error into a field problem, quoting the text
// the user typed rather than the model's SI number.
func (s *State) problemOf(err error) *Problem {
	var fe *model.FieldError
	if !errors.As(err, &fe) {
		return &Problem{Field: "", Label: "Scheme", Msg: err.Error()}
	}
	p := &Problem{Field: fe.Field, Label: fieldLabel(fe.Field)}
	if t, ok := s.text[fe.Field]; ok && specByID(fe.Field) != nil {
		p.Msg = fmt.Sprintf("%q is not accepted; give %s", t, fe.Accepted)
	} else {
		p.Msg = fmt.Sprintf("%s is not accepted; give %s", fe.Value, fe.Accepted)
	}
	return p
}

// fieldLabel names a field for the banner.
func fieldLabel(id string) string {
	if f := specByID(id); f != nil {
		return f.label
	}
	switch id {
	case "ends":
		return "End conditions"
	case "method":
		return "Method"
	case "materials":
		return "Materials"
	case "kll":
		return "KLL"
	case "occupancy":
		return "Occupancy"
	}
	if id == "" {
		return "Scheme"
	}
	return strings.ToUpper(id[:1]) + id[1:]
}

// FieldError returns what is wrong with a field, or "".
func (s *State) FieldError(id string) string {
	if m, ok := s.parseErr[id]; ok {
		return m
	}
	if s.check != nil && s.check.Field == id {
		return s.check.Msg
	}
	return ""
}

// Problems lists the inputs to fix, in the order of the fields; empty when
// the inputs make a valid scheme.
func (s *State) Problems() []Problem {
	var out []Problem
	for i := range fieldSpecs {
		f := &fieldSpecs[i]
		if m, ok := s.parseErr[f.id]; ok && s.active(f.id) {
			out = append(out, Problem{Field: f.id, Label: f.label, Msg: m})
		}
	}
	if s.check != nil {
		out = append(out, *s.check)
	}
	return out
}

// Restore returns the inputs to a scheme from the undo history: every
// field is rewritten from it and the length range the user chose is kept.
func (s *State) Restore(sc model.Scheme, weakBraced bool) Outcome {
	s.Draft = sc
	s.WeakBraced = weakBraced
	s.parseErr = map[string]string{}
	s.reformatAll()
	return s.revalidate(false)
}

// Commit takes a field's text as committed (Enter, Tab, leaving the field
// or a pause in typing) and, when its value is accepted, rewrites it from
// the value in the field's shown unit, so a bare number then shows the unit
// it took. A refused value keeps the text as typed, as its message quotes it.
func (s *State) Commit(id, text string) Outcome {
	out := s.SetText(id, text)
	if _, bad := s.parseErr[id]; !bad && specByID(id) != nil && s.FieldError(id) == "" {
		s.reformat(id)
	}
	return out
}
