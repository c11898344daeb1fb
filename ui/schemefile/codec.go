package schemefile

import (
	"bytes"
	"encoding/json"
	"fmt"
	"math"
	"strconv"
	"strings"

	"upright/ui/model"
	"upright/ui/units"
)

// FormatName is the value of every scheme file's "format" field.
const FormatName = "upright-scheme"

// Version is the format version this package writes and the newest it
// reads. Version 2 moved the fire rating from the timber options to the
// top-level "fire" object, where it applies to every material; version-1
// files still read, their timber "fire" becoming the rating.
const Version = 2

// MaxSize is the largest scheme file accepted, in bytes (1 MiB).
const MaxSize = 1 << 20

// The file's objects and their fields, in the order Marshal writes them.
var (
	topKeys      = []string{"format", "version", "name", "units", "rank", "setting", "load", "self_weight", "materials", "steel", "concrete", "timber", "composite", "fire", "carbon", "tie"}
	settingKeys  = []string{"length", "weak_axis_length", "ends", "k", "method", "twist_braced"}
	loadKeys     = []string{"mode", "direct", "dead_share", "takedown"}
	takedownKeys = []string{"tributary_area", "floors", "floor_dead", "floor_live", "roof_dead", "roof_live", "snow", "live_reduction", "kll", "occupancy"}
	steelKeys    = []string{"families", "fy"}
	concreteKeys = []string{"fc", "bar_grade", "rho_max", "transverse", "m1_m2", "beta_dns", "beta_from_loads", "ei_method", "second_order_cap", "nonsway_k1"}
	timberKeys   = []string{"species", "grade", "sawn", "glulam", "glulam_combinations", "wet", "incised", "hot", "fire_sides", "duration"}
	fireKeys     = []string{"rating", "aggregate", "steel_protection"}
	// timberKeysV1 are the timber fields a version-1 file may hold: those of
	// version 2 and "fire", the timber fire exposure (now the scheme's rating).
	timberKeysV1 = append(append([]string(nil), timberKeys...), "fire")
)

type wFile struct {
	Format     string     `json:"format"`
	Version    int        `json:"version"`
	Name       string     `json:"name"`
	Units      string     `json:"units"`
	Rank       string     `json:"rank"`
	Setting    wSetting   `json:"setting"`
	Load       wLoad      `json:"load"`
	SelfWeight bool       `json:"self_weight"`
	Materials  []string   `json:"materials"`
	Steel      wSteel     `json:"steel"`
	Concrete   wConcrete  `json:"concrete"`
	Timber     wTimber    `json:"timber"`
	Composite  wFilled    `json:"composite"`
	Fire       wFire      `json:"fire"`
	Carbon     wCarbon    `json:"carbon"`
	ReportMap  bool       `json:"report_map"`
	Tie        float64    `json:"tie"`
	Variants   []wVariant `json:"variants,omitempty"`
	Building   *wBuilding `json:"building,omitempty"`
}

type wFire struct {
	Rating          string `json:"rating"`
	Aggregate       string `json:"aggregate"`
	SteelProtection string `json:"steel_protection"`
}

type wSetting struct {
	Length         string   `json:"length"`
	WeakAxisLength string   `json:"weak_axis_length"`
	Ends           string   `json:"ends"`
	K              *float64 `json:"k"`
	Method         string   `json:"method"`
	TwistBraced    bool     `json:"twist_braced"`
}

type wLoad struct {
	Mode      string    `json:"mode"`
	Direct    string    `json:"direct"`
	DeadShare *float64  `json:"dead_share"`
	Takedown  wTakedown `json:"takedown"`
}

type wTakedown struct {
	TributaryArea string   `json:"tributary_area"`
	Floors        int      `json:"floors"`
	FloorDead     string   `json:"floor_dead"`
	FloorLive     string   `json:"floor_live"`
	RoofDead      string   `json:"roof_dead"`
	RoofLive      string   `json:"roof_live"`
	Snow          string   `json:"snow"`
	LiveReduction bool     `json:"live_reduction"`
	KLL           *float64 `json:"kll"`
	Occupancy     string   `json:"occupancy"`
}

type wSteel struct {
	Families []string `json:"families"`
	Fy       *string  `json:"fy"`
}

type wConcrete struct {
	Fc            *string `json:"fc"`
	BarGrade      int     `json:"bar_grade"`
	RhoMax        float64 `json:"rho_max"`
	Transverse    string  `json:"transverse"`
	M1M2          float64 `json:"m1_m2"`
	BetaDns       float64 `json:"beta_dns"`
	BetaFromLoads bool    `json:"beta_from_loads"`
	EIMethod      string  `json:"ei_method"`
	SecondOrder   bool    `json:"second_order_cap"`
	NonswayK1     bool    `json:"nonsway_k1"`
}

type wTimber struct {
	Species      string   `json:"species"`
	Grade        string   `json:"grade"`
	Sawn         bool     `json:"sawn"`
	Glulam       bool     `json:"glulam"`
	GlulamCombos []string `json:"glulam_combinations"`
	Wet          bool     `json:"wet"`
	Incised      bool     `json:"incised"`
	Hot          bool     `json:"hot"`
	FireSides    int      `json:"fire_sides"`
	Duration     *string  `json:"duration"`
}

// wCarbon writes the carbon factors in model.CarbonKinds order.
type wCarbon [][2]string

func (c wCarbon) MarshalJSON() ([]byte, error) {
	var b bytes.Buffer
	b.WriteByte('{')
	for i, kv := range c {
		if i > 0 {
			b.WriteByte(',')
		}
		k, _ := json.Marshal(kv[0])
		v, _ := json.Marshal(kv[1])
		b.Write(k)
		b.WriteByte(':')
		b.Write(v)
	}
	b.WriteByte('}')
	return b.Bytes(), nil
}

func optNumber(v float64) *float64 {
	if v == 0 {
		return nil
	}
	return &v
}

func optString(s string) *string {
	if s == "" {
		return nil
	}
	return &s
}

// Marshal writes a scheme as a scheme file of format Version. It refuses, with an
// *Error naming the field, a scheme that Unmarshal would refuse: one that
// fails model.Scheme.Validate or the format's own rules. A carbon kind
// missing from sc.Carbon is written with the model's default factor, which
// is the one the model uses for it.
func Marshal(sc model.Scheme) ([]byte, error) {
	if p := check(&sc); p != nil {
		return nil, &Error{Field: p.field, Msg: p.msg, Err: p.err}
	}
	sys := sc.Units
	s, l, c, t := sc.Setting, sc.Load, sc.Concrete, sc.Timber
	w := wFile{
		Format: FormatName, Version: Version, Name: sc.Name,
		Units: string(sc.Units), Rank: string(sc.Metric),
		Setting: wSetting{
			Length: lengthKind.format(s.LengthMM, sys), WeakAxisLength: lengthKind.format(s.WeakMM, sys),
			Ends: string(s.Ends), K: optNumber(s.K), Method: string(s.Method), TwistBraced: s.TwistBraced,
		},
		Load: wLoad{
			Mode: string(l.Mode), Direct: forceKind.format(l.DirectN, sys), DeadShare: optNumber(l.DeadShare),
			Takedown: wTakedown{
				TributaryArea: areaKind.format(l.TributaryM2, sys), Floors: l.Floors,
				FloorDead: pressureKind.format(l.FloorDeadKPa, sys), FloorLive: pressureKind.format(l.FloorLiveKPa, sys),
				RoofDead: pressureKind.format(l.RoofDeadKPa, sys), RoofLive: pressureKind.format(l.RoofLiveKPa, sys),
				Snow: pressureKind.format(l.SnowKPa, sys), LiveReduction: l.LiveReduction,
				KLL: optNumber(l.KLL), Occupancy: l.Occupancy,
			},
		},
		SelfWeight: sc.SelfWeight,
		Tie:        sc.Tie,
		Materials:  append([]string{}, sc.Materials...),
		Steel:      wSteel{Families: append([]string{}, sc.Steel.Families...)},
		Concrete: wConcrete{
			BarGrade: c.BarGrade, RhoMax: c.RhoMax, Transverse: c.Transverse, M1M2: c.M1M2,
			BetaDns: c.BetaDns, BetaFromLoads: c.BetaFromLoads, EIMethod: c.EIMethod,
			SecondOrder: c.SecondOrderCap, NonswayK1: c.NonswayK1,
		},
		Timber: wTimber{
			Species: t.Species, Grade: t.Grade, Sawn: t.Sawn, Glulam: t.Glulam,
			GlulamCombos: append([]string{}, t.GlulamCombos...), Wet: t.Wet,
			Incised: t.Incised, Hot: t.Hot, FireSides: t.FireSides, Duration: optString(t.Duration),
		},
		Fire: wFire{Rating: sc.Fire.Rating, Aggregate: sc.Fire.Aggregate, SteelProtection: sc.Fire.SteelProtection},
	}
	if sc.Steel.FyMPa != 0 {
		v := stressKind.format(sc.Steel.FyMPa, sys)
		w.Steel.Fy = &v
	}
	if c.FcMPa != 0 {
		v := stressKind.format(c.FcMPa, sys)
		w.Concrete.Fc = &v
	}
	w.Composite = marshalComposite(sc.Composite, sys)
	w.ReportMap = sc.ReportMap
	w.Variants = marshalVariants(sc.Variants)
	w.Building = marshalBuilding(sc.Building, sys)
	defaults := model.DefaultCarbon()
	for _, ck := range model.CarbonKinds {
		v, ok := sc.Carbon[ck.Key]
		if !ok {
			v = defaults[ck.Key]
		}
		w.Carbon = append(w.Carbon, [2]string{ck.Key, formatCarbon(v, ck)})
	}
	var b bytes.Buffer
	enc := json.NewEncoder(&b)
	enc.SetEscapeHTML(false)
	enc.SetIndent("", "  ")
	if err := enc.Encode(&w); err != nil {
		return nil, &Error{Msg: "cannot encode the scheme: " + err.Error(), Err: err}
	}
	return b.Bytes(), nil
}

// Unmarshal reads a scheme file. Every problem is an *Error that names the
// field and, where it has one, the line and column: a file over MaxSize,
// malformed JSON, a missing or foreign "format", a format version other than
// 1 or 2, an unknown, duplicated or missing field, a value of the wrong JSON type
// or unit, and any value model.Scheme.Validate or the format's own rules
// refuse. A UTF-8 byte-order mark at the start is skipped.
func Unmarshal(data []byte) (model.Scheme, error) {
	if len(data) > MaxSize {
		return model.Scheme{}, &Error{Msg: fmt.Sprintf("the file is %s; a scheme file is at most 1 MiB (%d bytes)", sizeText(int64(len(data))), MaxSize)}
	}
	data = bytes.TrimPrefix(data, []byte("\xef\xbb\xbf"))
	root, err := parseTree(data)
	if err != nil {
		return model.Scheme{}, err
	}
	r := &reader{data: data, at: map[string]*node{}}
	sc, err := r.scheme(root)
	if err != nil {
		return model.Scheme{}, err
	}
	if p := check(&sc); p != nil {
		return model.Scheme{}, r.problem(p)
	}
	return sc, nil
}

// sizeText writes a byte count for messages.
func sizeText(n int64) string {
	if n >= 1<<20 {
		return fmt.Sprintf("%.1f MiB (%d bytes)", float64(n)/(1<<20), n)
	}
	return fmt.Sprintf("%d bytes", n)
}

// reader turns a node tree into a scheme, remembering each field's node so
// that a later validation failure can point at it.
type reader struct {
	data    []byte
	at      map[string]*node
	version int // the file's format version, 1 or 2
}

func (r *reader) errAt(n *node, field, msg string) *Error {
	e := &Error{Field: field, Msg: msg}
	if n != nil {
		e.Line, e.Column = lineCol(r.data, n.off)
	}
	return e
}

// problem turns a check failure into an *Error at the offending value.
func (r *reader) problem(p *problem) error {
	n := r.at[p.field]
	if n != nil && n.kind == kindArray && p.value != "" {
		for _, it := range n.items {
			if it.kind == kindString && it.str == p.value {
				n = it
				break
			}
		}
	}
	msg := p.msg
	if p.accepted != "" && n != nil && n.kind != kindArray && n.kind != kindObject {
		msg = fmt.Sprintf("%s is not accepted; give %s", n.text(), p.accepted)
	}
	e := r.errAt(n, p.field, msg)
	e.Err = p.err
	return e
}

func join(path, key string) string {
	if path == "" {
		return key
	}
	return path + "." + key
}

// object checks that n is an object holding only the given keys.
func (r *reader) object(n *node, path string, keys []string, what string) error {
	if n.kind != kindObject {
		return r.errAt(n, path, fmt.Sprintf("expected %s (an object); found %s", what, n.kind))
	}
	for i, k := range n.keys {
		if !contains(keys, k) {
			where := path
			if where == "" {
				where = "the top level"
			}
			return &Error{Field: join(path, k), Line: lineOf(r.data, n.koffs[i]), Column: colOf(r.data, n.koffs[i]),
				Msg: fmt.Sprintf("unknown field; the fields of %s are %s", where, strings.Join(keys, ", "))}
		}
	}
	return nil
}

func lineOf(data []byte, off int64) int { l, _ := lineCol(data, off); return l }
func colOf(data []byte, off int64) int  { _, c := lineCol(data, off); return c }

// field returns the value of key in the object n, or an error saying it is
// missing and what to give.
func (r *reader) field(n *node, path, key, give string) (*node, string, error) {
	fp := join(path, key)
	v := n.get(key)
	if v == nil {
		where := path
		if where == "" {
			where = "the scheme"
		}
		return nil, fp, r.errAt(n, fp, fmt.Sprintf("missing field (in %s); give %s", where, give))
	}
	r.at[fp] = v
	return v, fp, nil
}

func (r *reader) str(n *node, path, key, give string) (string, error) {
	v, fp, err := r.field(n, path, key, give)
	if err != nil {
		return "", err
	}
	if v.kind != kindString {
		return "", r.errAt(v, fp, fmt.Sprintf("expected a string; found %s; give %s", v.kind, give))
	}
	return v.str, nil
}

// optStr reads a string where null means "" (the model's default); an
// empty string given is refused, since only null means the default.
func (r *reader) optStr(n *node, path, key, give string) (string, error) {
	v, fp, err := r.field(n, path, key, give)
	if err != nil {
		return "", err
	}
	switch v.kind {
	case kindNull:
		return "", nil
	case kindString:
		if v.str == "" {
			return "", r.errAt(v, fp, fmt.Sprintf(`"" is not accepted; give %s`, give))
		}
		return v.str, nil
	}
	return "", r.errAt(v, fp, fmt.Sprintf("expected a string or null; found %s; give %s", v.kind, give))
}

func (r *reader) boolean(n *node, path, key, give string) (bool, error) {
	v, fp, err := r.field(n, path, key, give)
	if err != nil {
		return false, err
	}
	if v.kind != kindBool {
		return false, r.errAt(v, fp, fmt.Sprintf("expected true or false; found %s; give %s", v.kind, give))
	}
	return v.b, nil
}

// numberOf converts a number node to a finite float64.
func (r *reader) numberOf(v *node, fp, give string) (float64, error) {
	if v.kind != kindNumber {
		return 0, r.errAt(v, fp, fmt.Sprintf("expected a number; found %s; give %s", v.kind, give))
	}
	x, err := strconv.ParseFloat(v.num, 64)
	if err != nil || math.IsNaN(x) || math.IsInf(x, 0) {
		return 0, r.errAt(v, fp, fmt.Sprintf("%s is too large a number; give %s", v.num, give))
	}
	return x, nil
}

func (r *reader) num(n *node, path, key, give string) (float64, error) {
	v, fp, err := r.field(n, path, key, give)
	if err != nil {
		return 0, err
	}
	return r.numberOf(v, fp, give)
}

// optNum reads a number where null means 0 (the model's default); a number
// given as 0 is refused, since only null (or, for new fields, absence) means
// the default.
func (r *reader) optNum(n *node, path, key, give string) (float64, error) {
	v, fp, err := r.field(n, path, key, give)
	if err != nil {
		return 0, err
	}
	if v.kind == kindNull {
		return 0, nil
	}
	if v.kind != kindNumber {
		return 0, r.errAt(v, fp, fmt.Sprintf("expected a number or null; found %s; give %s", v.kind, give))
	}
	x, err := r.numberOf(v, fp, give)
	if err == nil && x == 0 {
		return 0, r.errAt(v, fp, fmt.Sprintf("%s is not accepted; give %s", v.num, give))
	}
	return x, err
}

// integer reads a whole number.
func (r *reader) integer(n *node, path, key, give string) (int, error) {
	v, fp, err := r.field(n, path, key, give)
	if err != nil {
		return 0, err
	}
	x, err := r.numberOf(v, fp, give)
	if err != nil {
		return 0, err
	}
	if x != math.Trunc(x) || math.Abs(x) > 1e9 {
		return 0, r.errAt(v, fp, fmt.Sprintf("%s is not accepted; give %s", v.num, give))
	}
	return int(x), nil
}

func (r *reader) quantity(n *node, path, key string, k kind) (float64, error) {
	give := fmt.Sprintf("%s with its unit, e.g. %s", units.Article(k.name), k.example)
	v, fp, err := r.field(n, path, key, give)
	if err != nil {
		return 0, err
	}
	if v.kind != kindString {
		return 0, r.errAt(v, fp, fmt.Sprintf("expected a string; found %s; give %s", v.kind, give))
	}
	x, err := k.read(v.str)
	if err != nil {
		return 0, r.errAt(v, fp, err.Error())
	}
	return x, nil
}

// optQuantity reads a quantity where null means 0 (the model's default); a
// quantity given as zero is refused, since only null means the default.
func (r *reader) optQuantity(n *node, path, key string, k kind, null string) (float64, error) {
	give := fmt.Sprintf("%s with its unit, e.g. %s, or null for %s", units.Article(k.name), k.example, null)
	v, fp, err := r.field(n, path, key, give)
	if err != nil {
		return 0, err
	}
	switch v.kind {
	case kindNull:
		return 0, nil
	case kindString:
		x, err := k.read(v.str)
		if err != nil {
			return 0, r.errAt(v, fp, err.Error())
		}
		if x == 0 {
			return 0, r.errAt(v, fp, fmt.Sprintf("%q is not accepted; give %s", v.str, give))
		}
		return x, nil
	}
	return 0, r.errAt(v, fp, fmt.Sprintf("expected a string or null; found %s; give %s", v.kind, give))
}

// strList reads an array of strings; an empty array gives nil.
func (r *reader) strList(n *node, path, key, give string) ([]string, error) {
	v, fp, err := r.field(n, path, key, give)
	if err != nil {
		return nil, err
	}
	if v.kind != kindArray {
		return nil, r.errAt(v, fp, fmt.Sprintf("expected an array; found %s; give %s", v.kind, give))
	}
	var out []string
	for i, it := range v.items {
		if it.kind != kindString {
			return nil, r.errAt(it, fmt.Sprintf("%s[%d]", fp, i), fmt.Sprintf("expected a string; found %s; give %s", it.kind, give))
		}
		out = append(out, it.str)
	}
	return out, nil
}

// sub reads a nested object field.
func (r *reader) sub(n *node, path, key string, keys []string, what string) (*node, string, error) {
	v, fp, err := r.field(n, path, key, what+" (an object with "+strings.Join(keys, ", ")+")")
	if err != nil {
		return nil, fp, err
	}
	if err := r.object(v, fp, keys, what); err != nil {
		return nil, fp, err
	}
	return v, fp, nil
}

// header checks the format name and version before anything else, so that
// a file from a newer program says so instead of listing unknown fields.
func (r *reader) header(root *node) error {
	if root.kind != kindObject {
		return r.errAt(root, "", fmt.Sprintf("the file holds %s; a scheme file holds one JSON object", root.kind))
	}
	f := root.get("format")
	if f == nil {
		return r.errAt(root, "format", fmt.Sprintf("missing field; this is not an Upright scheme file (it must contain \"format\": %q)", FormatName))
	}
	if f.kind != kindString || f.str != FormatName {
		return r.errAt(f, "format", fmt.Sprintf("%s is not an Upright scheme file format; expected %q", f.text(), FormatName))
	}
	v := root.get("version")
	if v == nil {
		return r.errAt(root, "version", fmt.Sprintf("missing field; give the format version, %d", Version))
	}
	if v.kind != kindNumber {
		return r.errAt(v, "version", fmt.Sprintf("expected a whole number; found %s; this program reads format version %d", v.kind, Version))
	}
	x, err := strconv.ParseFloat(v.num, 64)
	switch {
	case err == nil && (x == Version || x == 1):
		r.version = int(x)
		return nil
	case (err == nil || math.IsInf(x, 1)) && x > Version && x == math.Trunc(x):
		return r.errAt(v, "version", fmt.Sprintf("format version %s is newer than this program reads (version %d); open the file with a newer Upright", v.num, Version))
	}
	return r.errAt(v, "version", fmt.Sprintf("%s is not a format version; this program reads format version %d", v.num, Version))
}

// scheme reads every field of the file.
func (r *reader) scheme(root *node) (model.Scheme, error) {
	var sc model.Scheme
	if err := r.header(root); err != nil {
		return sc, err
	}
	if err := r.object(root, "", append(append([]string(nil), topKeys...), omittedTopKeys...), "a scheme"); err != nil {
		return sc, err
	}
	name, err := r.str(root, "", "name", "the scheme's name")
	if err != nil {
		return sc, err
	}
	unitsS, err := r.str(root, "", "units", `"us" or "si"`)
	if err != nil {
		return sc, err
	}
	rank, err := r.str(root, "", "rank", `"weight", "footprint" or "carbon"`)
	if err != nil {
		return sc, err
	}
	sc.Name, sc.Units, sc.Metric = name, model.Units(unitsS), model.Metric(rank)

	if e := r.setting(root, &sc.Setting); e != nil {
		return sc, e
	}
	if e := r.load(root, &sc.Load); e != nil {
		return sc, e
	}
	if sc.SelfWeight, err = r.boolean(root, "", "self_weight", "true to add each column's own weight to the demand"); err != nil {
		return sc, err
	}
	if sc.Materials, err = r.strList(root, "", "materials", `a list of materials, e.g. ["steel", "timber"]; [] means all`); err != nil {
		return sc, err
	}
	if e := r.steel(root, &sc.Steel); e != nil {
		return sc, e
	}
	if e := r.concrete(root, &sc.Concrete); e != nil {
		return sc, e
	}
	v1Fire, e := r.timber(root, &sc.Timber)
	if e != nil {
		return sc, e
	}
	if e := r.fire(root, &sc.Fire, v1Fire); e != nil {
		return sc, e
	}
	if e := r.composite(root, &sc.Composite); e != nil {
		return sc, e
	}
	if e := r.carbon(root, &sc); e != nil {
		return sc, e
	}
	if e := r.reportMap(root, &sc); e != nil {
		return sc, e
	}
	if e := r.variants(root, &sc); e != nil {
		return sc, e
	}
	if e := r.building(root, &sc); e != nil {
		return sc, e
	}
	return sc, r.tie(root, &sc)
}

// tie reads the near-tie tolerance, a fraction; a file without it (written
// before the field existed) takes model.DefaultTie.
func (r *reader) tie(root *node, sc *model.Scheme) error {
	sc.Tie = model.DefaultTie
	if root.get("tie") == nil {
		return nil
	}
	v, err := r.num(root, "", "tie", "the near-tie tolerance as a fraction from 0 to 0.5, e.g. 0.05")
	sc.Tie = v
	return err
}

func (r *reader) setting(root *node, s *model.Setting) error {
	n, p, err := r.sub(root, "", "setting", settingKeys, "the column's setting")
	if err != nil {
		return err
	}
	if s.LengthMM, err = r.quantity(n, p, "length", lengthKind); err != nil {
		return err
	}
	if s.WeakMM, err = r.quantity(n, p, "weak_axis_length", lengthKind); err != nil {
		return err
	}
	ends, err := r.str(n, p, "ends", "one of "+quoteAll(endNames()))
	if err != nil {
		return err
	}
	s.Ends = model.EndCondition(ends)
	if s.K, err = r.optNum(n, p, "k", "an effective-length factor from 0.5 to 10, or null for the end condition's recommended value"); err != nil {
		return err
	}
	method, err := r.str(n, p, "method", `"lrfd" or "asd"`)
	s.Method = model.Method(method)
	if err != nil {
		return err
	}
	s.TwistBraced, err = r.absentBool(n, p, "twist_braced", false, "true when the weak-axis braces also restrain twisting (steel Lcz = weak-axis length), false for the full length")
	return err
}

func endNames() []string {
	out := make([]string, len(model.EndConditions))
	for i, e := range model.EndConditions {
		out[i] = string(e)
	}
	return out
}

func (r *reader) load(root *node, l *model.Load) error {
	n, p, err := r.sub(root, "", "load", loadKeys, "the axial load")
	if err != nil {
		return err
	}
	mode, err := r.str(n, p, "mode", `"direct" (the load typed in) or "takedown" (from tributary area and floor loads)`)
	if err != nil {
		return err
	}
	l.Mode = model.LoadMode(mode)
	if l.DirectN, err = r.quantity(n, p, "direct", forceKind); err != nil {
		return err
	}
	if l.DeadShare, err = r.absentNum(n, p, "dead_share", "the part of the typed load's service load that is dead, above 0 and at most 1, or null for the default 2/3"); err != nil {
		return err
	}
	t, tp, err := r.sub(n, p, "takedown", takedownKeys, "the takedown inputs")
	if err != nil {
		return err
	}
	if l.TributaryM2, err = r.quantity(t, tp, "tributary_area", areaKind); err != nil {
		return err
	}
	if l.Floors, err = r.integer(t, tp, "floors", "a whole number of floors carried below the roof, 0 to 100"); err != nil {
		return err
	}
	for _, q := range []struct {
		key string
		dst *float64
	}{{"floor_dead", &l.FloorDeadKPa}, {"floor_live", &l.FloorLiveKPa}, {"roof_dead", &l.RoofDeadKPa}, {"roof_live", &l.RoofLiveKPa}, {"snow", &l.SnowKPa}} {
		if *q.dst, err = r.quantity(t, tp, q.key, pressureKind); err != nil {
			return err
		}
	}
	if l.LiveReduction, err = r.boolean(t, tp, "live_reduction", "true to reduce floor live load by ASCE 7-22 4.7"); err != nil {
		return err
	}
	if l.KLL, err = r.optNum(t, tp, "kll", "a live load element factor 1, 2, 3 or 4 (ASCE 7-22 Table 4.7-1), or null for 4 (interior column)"); err != nil {
		return err
	}
	l.Occupancy, err = r.str(t, tp, "occupancy", `"general", "assembly", "storage" or "garage"`)
	return err
}

func (r *reader) steel(root *node, s *model.SteelOptions) error {
	n, p, err := r.sub(root, "", "steel", steelKeys, "the steel options")
	if err != nil {
		return err
	}
	if s.Families, err = r.strList(n, p, "families", "a list drawn from "+quoteAll(model.SteelFamilies)+"; [] means all"); err != nil {
		return err
	}
	s.FyMPa, err = r.optQuantity(n, p, "fy", stressKind, "each family's default grade")
	return err
}

func (r *reader) concrete(root *node, c *model.ConcreteOptions) error {
	n, p, err := r.sub(root, "", "concrete", concreteKeys, "the concrete options")
	if err != nil {
		return err
	}
	if c.FcMPa, err = r.optQuantity(n, p, "fc", stressKind, "the default of the unit system (5,000 psi or 35 MPa)"); err != nil {
		return err
	}
	if c.BarGrade, err = r.integer(n, p, "bar_grade", "60 or 80 (ASTM A615)"); err != nil {
		return err
	}
	if c.RhoMax, err = r.num(n, p, "rho_max", "a reinforcement ratio from 0.01 to 0.08, e.g. 0.04"); err != nil {
		return err
	}
	if c.Transverse, err = r.str(n, p, "transverse", `"ties", "spiral" or "all"`); err != nil {
		return err
	}
	if c.M1M2, err = r.num(n, p, "m1_m2", "an end-moment ratio M1/M2 from -1 (single curvature) to 1"); err != nil {
		return err
	}
	if c.BetaDns, err = r.num(n, p, "beta_dns", "a sustained-load ratio from 0 to 1"); err != nil {
		return err
	}
	if c.BetaFromLoads, err = r.boolean(n, p, "beta_from_loads", "true to derive βdns from the takedown's dead and live loads"); err != nil {
		return err
	}
	if c.EIMethod, err = r.str(n, p, "ei_method", `"a", "b", "c" (ACI 318-19 6.6.4.4.4) or "largest"`); err != nil {
		return err
	}
	if c.NonswayK1, err = r.absentBool(n, p, "nonsway_k1", false, "true for k = 1.0 at nonsway ends (ACI 318-19 6.6.4.4.3), false for the ends' recommended design K"); err != nil {
		return err
	}
	c.SecondOrderCap, err = r.boolean(n, p, "second_order_cap", "true to hold the moment magnifier to 1.4 (ACI 318-19 6.2.5.3), as the code requires")
	return err
}

// timber reads the timber options; for a version-1 file it also returns
// the timber "fire" field, which becomes the scheme's rating.
func (r *reader) timber(root *node, t *model.TimberOptions) (string, error) {
	keys := timberKeys
	if r.version == 1 {
		keys = timberKeysV1
	}
	n, p, err := r.sub(root, "", "timber", keys, "the timber options")
	if err != nil {
		return "", err
	}
	v1Fire := ""
	if r.version == 1 {
		if v1Fire, err = r.str(n, p, "fire", `"none", "1h", "1.5h" or "2h"`); err != nil {
			return "", err
		}
		r.at["fire.rating"] = r.at[join(p, "fire")]
	}
	err = r.timberRest(n, p, t)
	return v1Fire, err
}

// timberRest reads the timber fields common to every version.
func (r *reader) timberRest(n *node, p string, t *model.TimberOptions) error {
	var err error
	if t.Species, err = r.str(n, p, "species", `a sawn species code, e.g. "DF-L"`); err != nil {
		return err
	}
	if t.Grade, err = r.str(n, p, "grade", `a sawn grade code, e.g. "No.1"`); err != nil {
		return err
	}
	for _, b := range []struct {
		key, give string
		dst       *bool
	}{
		{"sawn", "true to include sawn lumber and timbers", &t.Sawn},
		{"glulam", "true to include glulam", &t.Glulam},
		{"wet", "true for wet service", &t.Wet},
		{"incised", "true for incised lumber", &t.Incised},
		{"hot", "true for sustained temperatures of 100 to 125 °F", &t.Hot},
	} {
		if *b.dst, err = r.boolean(n, p, b.key, b.give); err != nil {
			return err
		}
	}
	if t.GlulamCombos, err = r.strList(n, p, "glulam_combinations", `a list of glulam combinations or stress classes, e.g. ["24F-1.8E"]; [] means all`); err != nil {
		return err
	}
	if t.FireSides, err = r.integer(n, p, "fire_sides", "3 or 4"); err != nil {
		return err
	}
	t.Duration, err = r.optStr(n, p, "duration", `"permanent", "ten-years", "two-months", "seven-days" or "ten-minutes", or null to derive it from the loads`)
	return err
}

// carbonOptional are the carbon kinds added after version 1, which a file
// may leave out (the default factor applies).
var carbonOptional = map[string]bool{model.CarbonGypsum: true, model.CarbonSFRM: true}

func (r *reader) carbon(root *node, sc *model.Scheme) error {
	keys := carbonKeys()
	n, p, err := r.sub(root, "", "carbon", keys, "the embodied-carbon factors")
	if err != nil {
		return err
	}
	sc.Carbon = make(model.CarbonFactors, len(keys))
	defaults := model.DefaultCarbon()
	for _, ck := range model.CarbonKinds {
		if carbonOptional[ck.Key] && n.get(ck.Key) == nil {
			sc.Carbon[ck.Key] = defaults[ck.Key] // a kind added after version 1: absent means the default
			continue
		}
		give := fmt.Sprintf("the factor for %s with its unit, e.g. \"%s\"", strings.ToLower(ck.Name), formatCarbon(1.5, ck))
		v, fp, err := r.field(n, p, ck.Key, give)
		if err != nil {
			return err
		}
		if v.kind != kindString {
			return r.errAt(v, fp, fmt.Sprintf("expected a string; found %s; give %s", v.kind, give))
		}
		x, err := readCarbon(v.str, ck)
		if err != nil {
			return r.errAt(v, fp, err.Error())
		}
		sc.Carbon[ck.Key] = x
	}
	return nil
}

// fire reads the scheme's fire rating. The "fire" object and each of its
// fields may be absent, meaning no rating and siliceous aggregate; a
// version-1 file has no "fire" object and its timber fire exposure (v1Fire)
// becomes the rating.
func (r *reader) fire(root *node, f *model.FireOptions, v1Fire string) error {
	*f = model.DefaultScheme().Fire
	if r.version == 1 && v1Fire != "" {
		f.Rating = v1Fire
	}
	if root.get("fire") == nil {
		return nil
	}
	n, p, err := r.sub(root, "", "fire", fireKeys, "the fire rating")
	if err != nil {
		return err
	}
	if n.get("rating") != nil {
		if f.Rating, err = r.str(n, p, "rating", quoteAll(model.FireRatings)); err != nil {
			return err
		}
	}
	if n.get("aggregate") != nil {
		if f.Aggregate, err = r.str(n, p, "aggregate", quoteAll(model.FireAggregates)); err != nil {
			return err
		}
	}
	if n.get("steel_protection") != nil {
		if f.SteelProtection, err = r.str(n, p, "steel_protection", quoteAll(model.SteelProtections)); err != nil {
			return err
		}
	}
	return nil
}
