package schemefile

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"unicode"
	"unicode/utf8"

	"upright/ui/model"
)

// MaxNameLen is the longest scheme name accepted, in characters.
const MaxNameLen = 200

// knownMaterials are the materials Upright has; a file may name one that
// this build lacks, which gets its own message.
var knownMaterials = []string{"steel", "concrete", "timber", "composite"}

// fieldPaths maps the field names of model.FieldError to paths in the file.
var fieldPaths = map[string]string{
	"length":             "setting.length",
	"weak-axis length":   "setting.weak_axis_length",
	"ends":               "setting.ends",
	"K":                  "setting.k",
	"method":             "setting.method",
	"load":               "load.direct",
	"load mode":          "load.mode",
	"tributary":          "load.takedown.tributary_area",
	"floors":             "load.takedown.floors",
	"dead":               "load.takedown.floor_dead",
	"live":               "load.takedown.floor_live",
	"roof-dead":          "load.takedown.roof_dead",
	"roof-live":          "load.takedown.roof_live",
	"snow":               "load.takedown.snow",
	"kll":                "load.takedown.kll",
	"occupancy":          "load.takedown.occupancy",
	"materials":          "materials",
	"units":              "units",
	"rank":               "rank",
	"steel Fy":           "steel.fy",
	"f'c":                "concrete.fc",
	"bar grade":          "concrete.bar_grade",
	"rho-max":            "concrete.rho_max",
	"transverse":         "concrete.transverse",
	"m1m2":               "concrete.m1_m2",
	"beta-dns":           "concrete.beta_dns",
	"EI method":          "concrete.ei_method",
	"fire":               "fire.rating",
	"aggregate":          "fire.aggregate",
	"fire sides":         "timber.fire_sides",
	"duration":           "timber.duration",
	"species":            "timber.species",
	"grade":              "timber.grade",
	"glulam combination": "timber.glulam_combinations",
	"steel families":     "steel.families",
	"fill f'c":           "composite.fill_fc",
	"composite families": "composite.families",
}

// pathOf returns the file path of a model field name.
func pathOf(field string) string {
	if p, ok := fieldPaths[field]; ok {
		return p
	}
	if k, ok := strings.CutPrefix(field, "carbon factor "); ok {
		return "carbon." + k
	}
	return field
}

// problem is a check failure: the field path, the message, and the
// underlying model error when there is one.
type problem struct {
	field, msg string
	err        error
	value      string // the offending list item, for materials and families
	accepted   string // what is accepted, when the message can be rebuilt around the file's own text
}

func (p *problem) Error() string { return p.field + ": " + p.msg }

// check runs model.Scheme.Validate and the file format's own rules, which
// Marshal and Unmarshal share so that whatever one accepts the other does.
func check(sc *model.Scheme) *problem {
	if err := nameProblem(sc.Name); err != "" {
		return &problem{field: "name", msg: err}
	}
	if p := listProblem("materials", sc.Materials, nil); p != nil {
		return p
	}
	for _, m := range sc.Materials {
		if !contains(model.Materials(), m) && contains(knownMaterials, m) {
			avail := strings.Join(model.Materials(), ", ")
			if avail == "" {
				avail = "none"
			}
			return &problem{field: "materials", value: m,
				msg: fmt.Sprintf("%q is not available in this build of Upright (available: %s); remove it or leave the list empty for every available material", m, avail)}
		}
	}
	if err := sc.Validate(); err != nil {
		var fe *model.FieldError
		if errors.As(err, &fe) {
			accepted := fe.Accepted
			switch fe.Field {
			// The model words these for the command line's comma lists.
			case "materials":
				accepted = "a list drawn from " + quoteAll(model.Materials()) + " (an empty list means all)"
			case "steel families":
				accepted = "a list drawn from " + quoteAll(model.SteelFamilies) + " (an empty list means all)"
			case "composite families":
				accepted = "a list drawn from " + quoteAll(model.CompositeFamilies) + " (an empty list means all)"
			}
			p := &problem{field: pathOf(fe.Field), err: err, accepted: accepted,
				msg: fmt.Sprintf("%q is not accepted; give %s", fe.Value, accepted)}
			if fe.Field == "materials" || fe.Field == "glulam combination" || fe.Field == "steel families" || fe.Field == "composite families" {
				p.value = fe.Value
			}
			return p
		}
		return &problem{field: "", msg: err.Error(), err: err}
	}
	if p := listProblem("steel.families", sc.Steel.Families, nil); p != nil {
		return p
	}
	if p := listProblem("timber.glulam_combinations", sc.Timber.GlulamCombos, nil); p != nil {
		return p
	}
	if p := listProblem("composite.families", sc.Composite.Families, nil); p != nil {
		return p
	}
	for k := range sc.Carbon {
		if carbonKind(k) == nil {
			return &problem{field: "carbon." + k, msg: "not a carbon kind; the kinds are " + strings.Join(carbonKeys(), ", ")}
		}
	}
	// Inputs the model ignores in the current load mode are kept in the
	// file; they must still be finite and not negative.
	l := sc.Load
	inactive := []struct {
		field string
		v     float64
	}{
		{"load.direct", l.DirectN},
		{"load.takedown.tributary_area", l.TributaryM2},
		{"load.takedown.floor_dead", l.FloorDeadKPa},
		{"load.takedown.floor_live", l.FloorLiveKPa},
		{"load.takedown.roof_dead", l.RoofDeadKPa},
		{"load.takedown.roof_live", l.RoofLiveKPa},
		{"load.takedown.snow", l.SnowKPa},
	}
	for _, q := range inactive {
		if math.IsNaN(q.v) || math.IsInf(q.v, 0) || q.v < 0 {
			return &problem{field: q.field, accepted: "a finite value of zero or more (kept for the other load mode)",
				msg: fmt.Sprintf("%v is not accepted; give a finite value of zero or more (kept for the other load mode)", q.v)}
		}
	}
	if l.Floors < 0 || l.Floors > 100 {
		return &problem{field: "load.takedown.floors", msg: fmt.Sprintf("%d is not accepted; give a whole number of floors from 0 to 100", l.Floors)}
	}
	if l.Mode == model.LoadDirect {
		// Load.Validate checks these only for a takedown.
		if err := (model.Load{Mode: model.LoadTakedown, TributaryM2: 1, RoofDeadKPa: 1, KLL: l.KLL, Occupancy: l.Occupancy}).Validate(); err != nil {
			var fe *model.FieldError
			if errors.As(err, &fe) {
				return &problem{field: pathOf(fe.Field), err: err, accepted: fe.Accepted,
					msg: fmt.Sprintf("%s is not accepted; give %s", fe.Value, fe.Accepted)}
			}
			return &problem{msg: err.Error(), err: err}
		}
	}
	return nil
}

// nameProblem describes what is wrong with a scheme name, or returns "".
func nameProblem(s string) string {
	if !utf8.ValidString(s) {
		return "the name is not valid UTF-8 text"
	}
	if n := utf8.RuneCountInString(s); n > MaxNameLen {
		return fmt.Sprintf("the name has %d characters; give at most %d", n, MaxNameLen)
	}
	for _, r := range s {
		if unicode.IsControl(r) {
			return fmt.Sprintf("the name contains the control character %U; give one line of text", r)
		}
	}
	return ""
}

// listProblem checks a list of names for duplicates and, when allowed is not
// nil, for names outside it.
func listProblem(field string, xs, allowed []string) *problem {
	for i, x := range xs {
		if allowed != nil && !contains(allowed, x) {
			return &problem{field: field, value: x, msg: fmt.Sprintf("%q is not accepted; give a list drawn from %s (an empty list means all)", x, quoteAll(allowed))}
		}
		if contains(xs[:i], x) {
			return &problem{field: field, value: x, msg: fmt.Sprintf("%q is listed twice", x)}
		}
	}
	return nil
}

func quoteAll(xs []string) string {
	q := make([]string, len(xs))
	for i, x := range xs {
		q[i] = fmt.Sprintf("%q", x)
	}
	return strings.Join(q, ", ")
}

func contains(xs []string, x string) bool {
	for _, y := range xs {
		if y == x {
			return true
		}
	}
	return false
}

func carbonKind(key string) *model.CarbonKind {
	for i := range model.CarbonKinds {
		if model.CarbonKinds[i].Key == key {
			return &model.CarbonKinds[i]
		}
	}
	return nil
}

func carbonKeys() []string {
	out := make([]string, len(model.CarbonKinds))
	for i, k := range model.CarbonKinds {
		out[i] = k.Key
	}
	return out
}
