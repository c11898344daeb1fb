package ui

import (
	"maps"
	"reflect"
	"strconv"
	"strings"
	"unicode"

	"upright/ui/model"
	"upright/ui/units"
)

// historyLimit is how many steps the undo history keeps.
const historyLimit = 200

// memo is one state of the scheme the history can return to.
type memo struct {
	what       string       // the step that led away from this state ("length 5.5 m")
	scheme     model.Scheme // the scheme as the inputs held it
	weakBraced bool         // the weak axis had its own length
}

// History is the window's undo and redo: each entry is the scheme before a
// step (undo) or after an undone one (redo), with what the step changed. It
// is Fyne-free and touched only on the UI goroutine.
type History struct {
	undo, redo []memo
}

// memoOf captures the state's scheme for the history.
func memoOf(s *State) memo {
	return memo{scheme: cloneScheme(s.Draft), weakBraced: s.WeakBraced}
}

// cloneScheme copies a scheme deeply enough that later edits of the draft's
// slices do not reach the copy.
func cloneScheme(sc model.Scheme) model.Scheme {
	c := sc
	if sc.Materials != nil {
		c.Materials = append([]string{}, sc.Materials...)
	}
	if sc.Steel.Families != nil {
		c.Steel.Families = append(sc.Steel.Families[:0:0], sc.Steel.Families...)
	}
	if sc.Composite.Families != nil {
		c.Composite.Families = append(sc.Composite.Families[:0:0], sc.Composite.Families...)
	}
	if sc.Timber.GlulamCombos != nil {
		c.Timber.GlulamCombos = append(sc.Timber.GlulamCombos[:0:0], sc.Timber.GlulamCombos...)
	}
	if sc.Carbon != nil {
		c.Carbon = maps.Clone(sc.Carbon)
	}
	return c
}

// same reports whether two memos hold the same scheme.
func (m memo) same(o memo) bool {
	return m.weakBraced == o.weakBraced && reflect.DeepEqual(m.scheme, o.scheme)
}

// Record files a step: before is the state before it, after the state it
// made, what describes it. A step that changed nothing is not filed; a new
// step clears the redo list. It reports whether the step was filed.
func (h *History) Record(what string, before, after memo) bool {
	if before.same(after) {
		return false
	}
	before.what = what
	h.undo = append(h.undo, before)
	if len(h.undo) > historyLimit {
		h.undo = append(h.undo[:0], h.undo[len(h.undo)-historyLimit:]...)
	}
	h.redo = nil
	return true
}

// Undo returns the state to go back to, filing now for redo; ok is false
// when there is nothing to undo.
func (h *History) Undo(now memo) (memo, bool) {
	if len(h.undo) == 0 {
		return memo{}, false
	}
	m := h.undo[len(h.undo)-1]
	h.undo = h.undo[:len(h.undo)-1]
	now.what = m.what
	h.redo = append(h.redo, now)
	return m, true
}

// Redo returns the state an undo left, filing now for undo; ok is false
// when there is nothing to redo.
func (h *History) Redo(now memo) (memo, bool) {
	if len(h.redo) == 0 {
		return memo{}, false
	}
	m := h.redo[len(h.redo)-1]
	h.redo = h.redo[:len(h.redo)-1]
	now.what = m.what
	h.undo = append(h.undo, now)
	return m, true
}

// UndoLabel is the Edit menu's undo item: "Undo: length 5.5 m", or "Undo"
// when there is nothing to undo.
func (h *History) UndoLabel() string {
	if len(h.undo) == 0 {
		return "Undo"
	}
	return "Undo: " + h.undo[len(h.undo)-1].what
}

// RedoLabel is the Edit menu's redo item.
func (h *History) RedoLabel() string {
	if len(h.redo) == 0 {
		return "Redo"
	}
	return "Redo: " + h.redo[len(h.redo)-1].what
}

// Clear forgets every step.
func (h *History) Clear() { h.undo, h.redo = nil, nil }

// describeChange names what changed between two schemes for the Edit menu:
// the fields whose shown value differs ("Unbraced length 18'-0\""), or the
// part of the scheme that changed ("ends", "materials").
func describeChange(before, after memo) string {
	var parts []string
	sys := units.System(after.scheme.Units)
	for i := range fieldSpecs {
		f := &fieldSpecs[i]
		if f.id == "weak-axis length" && !after.weakBraced && !before.weakBraced {
			continue
		}
		a := f.format(f.get(&after.scheme), sys)
		if f.format(f.get(&before.scheme), sys) != a {
			parts = append(parts, f.label+" "+a)
		}
	}
	if before.weakBraced != after.weakBraced {
		parts = append(parts, "weak-axis bracing")
	}
	if len(parts) == 0 {
		parts = partsChanged(reflect.ValueOf(before.scheme), reflect.ValueOf(after.scheme))
	}
	switch {
	case len(parts) == 0:
		return "change"
	case len(parts) > 2:
		return parts[0] + " and " + plural(len(parts)-1, "more change")
	}
	return strings.Join(parts, ", ")
}

// partsChanged names the parts of a scheme (its struct fields, one level
// into Setting and Load) that differ, in plain words.
func partsChanged(a, b reflect.Value) []string {
	var out []string
	t := a.Type()
	for i := 0; i < t.NumField(); i++ {
		fa, fb := a.Field(i), b.Field(i)
		if reflect.DeepEqual(fa.Interface(), fb.Interface()) {
			continue
		}
		name := t.Field(i).Name
		if (name == "Setting" || name == "Load") && fa.Kind() == reflect.Struct {
			out = append(out, partsChanged(fa, fb)...)
			continue
		}
		out = append(out, words(name))
	}
	return out
}

// words turns a Go field name into lower-case words ("SelfWeight" → "self weight").
func words(name string) string {
	var b strings.Builder
	for i, r := range name {
		if i > 0 && r >= 'A' && r <= 'Z' {
			b.WriteByte(' ')
		}
		b.WriteRune(unicode.ToLower(r))
	}
	return b.String()
}

// plural says "n thing" or "n things".
func plural(n int, thing string) string {
	if n == 1 {
		return "1 " + thing
	}
	return strconv.Itoa(n) + " " + thing + "s"
}
