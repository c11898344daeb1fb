// Package cli implements Upright's headless commands: compare, crossovers,
// curve and report. They drive the same Fyne-free model as the window.
package cli

import (
	"errors"
	"flag"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"upright/ui/model"
	"upright/ui/units"
)

// UsageError is a bad flag value: it names the flag, the value and what is accepted.
type UsageError struct{ Msg string }

func (e *UsageError) Error() string { return e.Msg }

func usagef(format string, a ...any) error { return &UsageError{fmt.Sprintf(format, a...)} }

// schemeFlags holds the raw text of every scheme flag, parsed after flag.Parse.
type schemeFlags struct {
	fs *flag.FlagSet

	scheme, length, ends, k, weak, load, method, materials, units, rank string
	selfWeight                                                          bool
	deadShare                                                           string
	twistBraced                                                         bool

	tributary, floors, dead, live, roofDead, roofLive, snow, kll, occupancy string
	noReduction                                                             bool

	fy, steelFamilies string

	fc, barGrade, rhoMax, m1m2, betaDns, ei, transverse string

	species, grade, timberProducts, fire, fireSides, duration string
	wet, incised, hot                                         bool

	carbon     string
	limitDelta bool
	nonswayK1  bool

	fillFc, compositeFamilies string
	aggregate                 string // concrete aggregate for the fire rating
	steelProtection           string // board or spray
	tie                       string

	name string    // the command, for messages
	out  io.Writer // where -h prints
}

func newSchemeFlags(name string, out io.Writer) *schemeFlags {
	f := &schemeFlags{fs: flag.NewFlagSet(name, flag.ContinueOnError)}
	fs := f.fs
	fs.SetOutput(out)
	fs.StringVar(&f.scheme, "scheme", "", "scheme file to start from (flags given override it)")
	fs.StringVar(&f.length, "length", "", `unbraced length, e.g. 4.2m, 4200mm, 14ft, 14'-6", 168in`)
	fs.StringVar(&f.ends, "ends", "", "end conditions: pinned-pinned, fixed-fixed, fixed-pinned, fixed-guided, pinned-guided, fixed-free")
	fs.StringVar(&f.k, "k", "", "effective-length factor typed in (overrides --ends' recommended value)")
	fs.StringVar(&f.weak, "weak-length", "", "weak-axis unbraced length (a brace); defaults to --length")
	fs.StringVar(&f.load, "load", "", "axial load, e.g. 1800kN, 400kip, 180tonne; never a bare k or t, which could be kip or kN, tonne or US ton (the governing factored load for LRFD, the service load for ASD)")
	fs.StringVar(&f.deadShare, "dead-share", "", "part of a typed load's service load that is dead, as a fraction or percent, e.g. 0.6, 60% or 2/3 (default 2/3); D, L and every combination follow from it")
	fs.BoolVar(&f.twistBraced, "twist-braced", false, "the weak-axis braces also restrain twisting, so the steel torsional length Lcz is the weak-axis length (default: the full length)")
	fs.StringVar(&f.method, "method", "", "lrfd or asd (default lrfd)")
	fs.StringVar(&f.materials, "materials", "", "comma list of "+strings.Join(model.Materials(), ", ")+" (default all)")
	fs.StringVar(&f.units, "units", "", "units shown: us or si (default those of --length, else of the scheme file, else us)")
	fs.StringVar(&f.tie, "tie", "", "near-tie tolerance: the best family changes only when another beats it by more than this share of the ranking metric, e.g. 5% or 0.05 (default 5%)")
	fs.StringVar(&f.rank, "rank", "", "ranking metric: weight, footprint or carbon (default weight)")
	fs.BoolVar(&f.selfWeight, "self-weight", true, "add the column's own weight to the demand")

	fs.StringVar(&f.tributary, "tributary", "", "tributary area per floor for the takedown, e.g. 60m2, 650ft2")
	fs.StringVar(&f.floors, "floors", "", "floors carried below the roof (takedown)")
	fs.StringVar(&f.dead, "dead", "", "floor dead load incl. slab, e.g. 4.0kPa, 85psf")
	fs.StringVar(&f.live, "live", "", "floor live load (unreduced), e.g. 3.0kPa, 50psf")
	fs.StringVar(&f.roofDead, "roof-dead", "", "roof dead load")
	fs.StringVar(&f.roofLive, "roof-live", "", "roof live load Lr")
	fs.StringVar(&f.snow, "snow", "", "roof snow load S")
	fs.StringVar(&f.kll, "kll", "", "live load element factor KLL (ASCE 7-22 Table 4.7-1; default 4, interior column)")
	fs.StringVar(&f.occupancy, "occupancy", "", "general, assembly, storage or garage (live-load reduction limits)")
	fs.BoolVar(&f.noReduction, "no-reduction", false, "do not reduce floor live load")

	fs.StringVar(&f.fy, "fy", "", "steel yield stress for every steel family, e.g. 50ksi, 345MPa (default: each family's grade)")
	fs.StringVar(&f.steelFamilies, "steel-families", "", "comma list of W, HP, HSS square, HSS rectangular, HSS round, Pipe")

	fs.StringVar(&f.fc, "fc", "", "concrete f'c, e.g. 5000psi, 35MPa")
	fs.StringVar(&f.barGrade, "bar-grade", "", "reinforcing bar grade: 60 or 80")
	fs.StringVar(&f.rhoMax, "rho-max", "", "largest reinforcement ratio, e.g. 0.04 or 4%")
	fs.StringVar(&f.m1m2, "m1m2", "", "end-moment ratio M1/M2, -1 (single curvature) to 1")
	fs.StringVar(&f.betaDns, "beta-dns", "", "sustained-load ratio βdns, 0 to 1: each LRFD combination takes the larger of this and its own factored dead over total, so it never lowers a combination's βdns (default: each combination's own)")
	fs.StringVar(&f.ei, "ei", "", "(EI)eff of ACI 318-19 6.6.4.4.4: a, b, c, or largest (default: the largest strength of the three, each permitted)")
	fs.BoolVar(&f.nonswayK1, "nonsway-k1", false, "concrete: k = 1.0 at nonsway ends, the simplification of ACI 318-19 6.6.4.4.3, in place of the ends' recommended design K that every material takes by default")
	fs.StringVar(&f.transverse, "transverse", "", "concrete columns: ties, spiral or all")
	fs.BoolVar(&f.limitDelta, "limit-magnifier", true, "concrete: δ above 1.4 never works (ACI 318-19 6.2.5.3); false only adds the strength without the limit to the trace as a note")
	fs.StringVar(&f.carbon, "carbon", "", "embodied-carbon factors to change, e.g. concrete=300,rolled-steel=1.1 (kinds: "+carbonKindList()+")")

	fs.StringVar(&f.species, "species", "", "sawn timber species: DF-L, SP, HF, SPF")
	fs.StringVar(&f.grade, "grade", "", "sawn timber grade: SS, No.1, No.2")
	fs.StringVar(&f.timberProducts, "timber", "", "timber products: sawn, glulam or sawn,glulam")
	fs.BoolVar(&f.wet, "wet", false, "timber in wet service")
	fs.BoolVar(&f.incised, "incised", false, "incised sawn lumber")
	fs.BoolVar(&f.hot, "hot", false, "timber at sustained temperature 100 to 125 °F")
	fs.StringVar(&f.fire, "fire", "", "fire-resistance rating for every material: none, 1h, 1.5h, 2h, 3h (steel boxed in gypsum board, concrete least size and cover, timber char)")
	fs.StringVar(&f.steelProtection, "steel-protection", "", "fire protection of steel and of filled tubes that need it: board (Type X gypsum board, IBC 722.5.1.2; the default) or spray (sprayed fire-resistive material, IBC 722.5.1.3)")
	fs.StringVar(&f.aggregate, "aggregate", "", "concrete aggregate for the fire rating: siliceous (default), carbonate, semi-lightweight")
	fs.StringVar(&f.fireSides, "fire-sides", "", "timber sides exposed to fire: 3 or 4")
	fs.StringVar(&f.duration, "duration", "", "ASD load duration: permanent, ten-years, two-months, seven-days, ten-minutes; each combination takes the lower of its CD and this one, so it never raises a combination's CD (default: each combination's own)")

	fs.StringVar(&f.fillFc, "fill-fc", "", "f'c of the concrete filling the composite HSS, 3000 to 10000 psi, e.g. 6ksi, 40MPa (default: --fc)")
	fs.StringVar(&f.compositeFamilies, "composite-families", "", "comma list of "+strings.Join(model.CompositeFamilies, ", "))
	f.name, f.out = name, out
	return f
}

// parse reads the flags. -h prints the flags as --name with the
// assumptions; a misspelled flag gets one line naming the nearest flag and
// the command's short usage, not the whole list.
func (f *schemeFlags) parse(args []string) error {
	f.fs.SetOutput(io.Discard)
	f.fs.Usage = func() {}
	err := f.fs.Parse(args)
	f.fs.SetOutput(f.out)
	switch {
	case err == nil:
		return nil
	case errors.Is(err, flag.ErrHelp):
		f.printHelp()
		return err
	}
	msg := err.Error()
	if name, ok := strings.CutPrefix(msg, "flag provided but not defined: "); ok {
		name = strings.TrimLeft(name, "-")
		msg = "unknown flag --" + name
		if near := f.nearest(name); near != "" {
			msg += "; did you mean --" + near + "?"
		}
	} else {
		msg = strings.ReplaceAll(msg, " -", " --")
	}
	if c := lookup(f.name); c != nil {
		msg += fmt.Sprintf("\nusage: upright %s %s (upright %s -h lists every flag)", c.name, c.args, c.name)
	}
	return usagef("%s", msg)
}

// printHelp lists every flag as --name with its usage, then the assumptions.
func (f *schemeFlags) printHelp() {
	w := f.out
	fmt.Fprintf(w, "Usage of %s:\n", f.name)
	f.fs.VisitAll(func(fl *flag.Flag) {
		kind, _ := flag.UnquoteUsage(fl)
		if kind != "" {
			kind = " " + kind
		}
		fmt.Fprintf(w, "  --%s%s\n    \t%s\n", fl.Name, kind, fl.Usage)
	})
	fmt.Fprintf(w, "\n%s", model.AssumptionsText())
}

// nearest returns the defined flag closest to name by edit distance, or ""
// when none is within a third of its length (at least 2 edits).
func (f *schemeFlags) nearest(name string) string {
	best, bestD := "", max(2, len(name)/3)+1
	f.fs.VisitAll(func(fl *flag.Flag) {
		if d := editDistance(name, fl.Name); d < bestD {
			best, bestD = fl.Name, d
		}
	})
	return best
}

// editDistance is the Damerau–Levenshtein distance (adjacent swaps count one).
func editDistance(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	d := make([][]int, len(ra)+1)
	for i := range d {
		d[i] = make([]int, len(rb)+1)
		d[i][0] = i
	}
	for j := range d[0] {
		d[0][j] = j
	}
	for i := 1; i <= len(ra); i++ {
		for j := 1; j <= len(rb); j++ {
			c := 1
			if ra[i-1] == rb[j-1] {
				c = 0
			}
			d[i][j] = min(d[i-1][j]+1, d[i][j-1]+1, d[i-1][j-1]+c)
			if i > 1 && j > 1 && ra[i-1] == rb[j-2] && ra[i-2] == rb[j-1] {
				d[i][j] = min(d[i][j], d[i-2][j-2]+1)
			}
		}
	}
	return d[len(ra)][len(rb)]
}

func (f *schemeFlags) set(name string) bool {
	found := false
	f.fs.Visit(func(fl *flag.Flag) {
		if fl.Name == name {
			found = true
		}
	})
	return found
}

func parseNumber(flagName, s, accepted string, lo, hi float64) (float64, error) {
	v, err := strconv.ParseFloat(strings.TrimSpace(s), 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) || v < lo || v > hi {
		return 0, usagef("--%s %q: not accepted; give %s", flagName, s, accepted)
	}
	return v, nil
}

func flagErr(flagName, value string, err error) error {
	if pe, ok := err.(*units.ParseError); ok {
		if pe.Reason != "" {
			return usagef("--%s %s; give %s", flagName, pe.Why(), pe.Accepted)
		}
		return usagef("--%s %q: not accepted; give %s", flagName, value, pe.Accepted)
	}
	return usagef("--%s %q: %v", flagName, value, err)
}

// build turns the parsed flags into a scheme, starting from base.
func (f *schemeFlags) build(base model.Scheme) (model.Scheme, error) {
	sc := base
	if err := f.refuseEmpty(); err != nil {
		return sc, err
	}
	s := &sc.Setting
	lengthSet := false
	if f.length != "" {
		v, err := units.ParseLength(f.length)
		if err != nil {
			return sc, flagErr("length", f.length, err)
		}
		if v < model.MinLengthMM || v > model.MaxLengthMM {
			return sc, usagef("--length %q: not accepted; give a length from 0.3 m (1 ft) to 30 m (98 ft)", f.length)
		}
		s.LengthMM = v
		s.WeakMM = v
		lengthSet = true
	}
	if f.weak != "" {
		v, err := units.ParseLength(f.weak)
		if err != nil {
			return sc, flagErr("weak-length", f.weak, err)
		}
		if v <= 0 || v > s.LengthMM*1.000001 {
			return sc, usagef("--weak-length %q: not accepted; give a length greater than zero and no longer than --length (%s)", f.weak, units.Length(s.LengthMM, units.SI))
		}
		s.WeakMM = v
	} else if lengthSet {
		s.WeakMM = s.LengthMM
	}
	if f.set("twist-braced") {
		s.TwistBraced = f.twistBraced
	}
	if f.ends != "" {
		e := model.EndCondition(strings.ToLower(f.ends))
		if !e.Valid() {
			return sc, usagef("--ends %q: not accepted; give one of pinned-pinned, fixed-fixed, fixed-pinned, fixed-guided, pinned-guided, fixed-free", f.ends)
		}
		s.Ends = e
		s.K = 0
	}
	if f.k != "" {
		v, err := parseNumber("k", f.k, "an effective-length factor from 0.5 to 10", 0.5, 10)
		if err != nil {
			return sc, err
		}
		s.K = v
	}
	if f.method != "" {
		m := model.Method(strings.ToLower(f.method))
		if m != model.LRFD && m != model.ASD {
			return sc, usagef("--method %q: not accepted; give lrfd or asd", f.method)
		}
		s.Method = m
	}
	if f.materials != "" {
		sc.Materials = nil
		for _, m := range strings.Split(f.materials, ",") {
			m = strings.ToLower(strings.TrimSpace(m))
			ok := false
			for _, known := range model.Materials() {
				ok = ok || known == m
			}
			if !ok {
				return sc, usagef("--materials %q: %q is not accepted; give a comma list of %s", f.materials, m, strings.Join(model.Materials(), ", "))
			}
			sc.Materials = append(sc.Materials, m)
		}
	}
	if f.units != "" {
		u := model.Units(strings.ToLower(f.units))
		if u != model.US && u != model.SI {
			return sc, usagef("--units %q: not accepted; give us or si", f.units)
		}
		sc.Units = u
	} else if u, ok := f.typedUnits(); ok {
		sc.Units = u
	}
	if f.rank != "" {
		r := model.Metric(strings.ToLower(f.rank))
		if r != model.ByWeight && r != model.ByFootprint && r != model.ByCarbon {
			return sc, usagef("--rank %q: not accepted; give weight, footprint or carbon", f.rank)
		}
		sc.Metric = r
	}
	if f.tie != "" {
		v, err := parseTie(f.tie)
		if err != nil {
			return sc, err
		}
		sc.Tie = v
	}
	if f.carbon != "" {
		if err := f.buildCarbon(&sc); err != nil {
			return sc, err
		}
	}
	if f.set("self-weight") {
		sc.SelfWeight = f.selfWeight
	}
	if err := f.buildLoad(&sc); err != nil {
		return sc, err
	}
	if err := f.buildMaterials(&sc); err != nil {
		return sc, err
	}
	if err := sc.Validate(); err != nil {
		if fe, ok := err.(*model.FieldError); ok {
			return sc, f.fieldUsage(fe)
		}
		return sc, err
	}
	return sc, nil
}

func (f *schemeFlags) buildLoad(sc *model.Scheme) error {
	takedown := f.tributary != "" || f.floors != "" || f.dead != "" || f.live != "" ||
		f.roofDead != "" || f.roofLive != "" || f.snow != "" || f.kll != "" || f.occupancy != "" || f.set("no-reduction")
	if f.load != "" && takedown {
		return usagef("--load %q: give either --load or the takedown flags (--tributary, --floors, --dead, ...), not both", f.load)
	}
	share := 0.0
	if f.deadShare != "" {
		if takedown {
			return usagef("--dead-share %q: applies to a typed --load only; a takedown gives its own dead and live loads", f.deadShare)
		}
		v, err := parseShare(f.deadShare)
		if err != nil {
			return err
		}
		share = v
	}
	if f.load != "" {
		v, err := units.ParseForce(f.load)
		if err != nil {
			return flagErr("load", f.load, err)
		}
		if v <= 0 {
			return usagef("--load %q: not accepted; give an axial load greater than zero", f.load)
		}
		keep := 0.0 // a typed load from --scheme keeps its dead share
		if sc.Load.Mode == model.LoadDirect {
			keep = sc.Load.DeadShare
		}
		sc.Load = model.Load{Mode: model.LoadDirect, DirectN: v, DeadShare: keep}
	}
	if f.deadShare != "" {
		if sc.Load.Mode != model.LoadDirect {
			return usagef("--dead-share %q: applies to a typed --load only; the scheme's load is a takedown", f.deadShare)
		}
		sc.Load.DeadShare = share
	}
	if f.load != "" {
		return nil
	}
	if !takedown {
		return nil
	}
	l := sc.Load
	if l.Mode != model.LoadTakedown {
		l = model.Load{Mode: model.LoadTakedown, LiveReduction: true, KLL: 4, Occupancy: "general"}
	}
	l.Mode = model.LoadTakedown
	pressure := func(name, s string, dst *float64) error {
		if s == "" {
			return nil
		}
		v, err := units.ParsePressure(s)
		if err != nil {
			return flagErr(name, s, err)
		}
		*dst = v
		return nil
	}
	if f.tributary != "" {
		v, err := units.ParseArea(f.tributary)
		if err != nil {
			return flagErr("tributary", f.tributary, err)
		}
		l.TributaryM2 = v
	}
	if f.floors != "" {
		v, err := parseNumber("floors", f.floors, "a whole number of floors from 0 to 100", 0, 100)
		if err != nil || v != math.Trunc(v) {
			return usagef("--floors %q: not accepted; give a whole number of floors from 0 to 100", f.floors)
		}
		l.Floors = int(v)
	}
	for _, p := range []struct {
		name, s string
		dst     *float64
	}{{"dead", f.dead, &l.FloorDeadKPa}, {"live", f.live, &l.FloorLiveKPa}, {"roof-dead", f.roofDead, &l.RoofDeadKPa},
		{"roof-live", f.roofLive, &l.RoofLiveKPa}, {"snow", f.snow, &l.SnowKPa}} {
		if err := pressure(p.name, p.s, p.dst); err != nil {
			return err
		}
	}
	if f.kll != "" {
		v, err := parseNumber("kll", f.kll, "a live load element factor KLL from 1 to 4 (ASCE 7-22 Table 4.7-1)", 1, 4)
		if err != nil {
			return err
		}
		l.KLL = v
	}
	if f.occupancy != "" {
		l.Occupancy = strings.ToLower(f.occupancy)
	}
	if f.set("no-reduction") {
		l.LiveReduction = !f.noReduction
	}
	sc.Load = l
	return nil
}

func (f *schemeFlags) buildMaterials(sc *model.Scheme) error {
	if f.fy != "" {
		v, err := units.ParseStress(f.fy)
		if err != nil {
			return flagErr("fy", f.fy, err)
		}
		if !(v >= model.FyMinMPa && v <= model.FyMaxMPa) {
			return usagef("--fy %q: not accepted; give %s", f.fy, model.FyAccepted)
		}
		sc.Steel.FyMPa = v
	}
	if f.steelFamilies != "" {
		sc.Steel.Families = nil
		for _, s := range strings.Split(f.steelFamilies, ",") {
			sc.Steel.Families = append(sc.Steel.Families, strings.TrimSpace(s))
		}
	}
	c := &sc.Concrete
	if f.fc != "" {
		v, err := units.ParseStress(f.fc)
		if err != nil {
			return flagErr("fc", f.fc, err)
		}
		if !(v >= model.FcMinMPa && v <= model.FcMaxMPa) {
			return usagef("--fc %q: not accepted; give %s", f.fc, model.FcAccepted)
		}
		c.FcMPa = v
	}
	if f.barGrade != "" {
		switch f.barGrade {
		case "60", "80":
			c.BarGrade, _ = strconv.Atoi(f.barGrade)
		default:
			return usagef("--bar-grade %q: not accepted; give 60 or 80", f.barGrade)
		}
	}
	if f.rhoMax != "" {
		s := strings.TrimSpace(f.rhoMax)
		scale := 1.0
		if strings.HasSuffix(s, "%") {
			s, scale = strings.TrimSuffix(s, "%"), 0.01
		}
		v, err := parseNumber("rho-max", s, "a reinforcement ratio from 0.01 to 0.08 (1% to 8%)", 0, 100)
		if err != nil {
			return usagef("--rho-max %q: not accepted; give a reinforcement ratio from 0.01 to 0.08 (1%% to 8%%)", f.rhoMax)
		}
		v *= scale
		if v < 0.01 || v > 0.08 {
			return usagef("--rho-max %q: not accepted; give a reinforcement ratio from 0.01 to 0.08 (1%% to 8%%, ACI 318-19 10.6.1.1)", f.rhoMax)
		}
		c.RhoMax = v
	}
	if f.m1m2 != "" {
		v, err := parseNumber("m1m2", f.m1m2, "an end-moment ratio M1/M2 from -1 (single curvature) to 1", -1, 1)
		if err != nil {
			return err
		}
		c.M1M2 = v
	}
	if f.betaDns != "" {
		v, err := parseNumber("beta-dns", f.betaDns, "a sustained-load ratio from 0 to 1", 0, 1)
		if err != nil {
			return err
		}
		c.BetaDns = v
		c.BetaFromLoads = false
	}
	if f.ei != "" {
		e := strings.ToLower(f.ei)
		if e != "a" && e != "b" && e != "c" && e != "largest" {
			return usagef("--ei %q: not accepted; give %s", f.ei, model.EIAccepted)
		}
		c.EIMethod = e
	}
	if f.set("nonsway-k1") {
		c.NonswayK1 = f.nonswayK1
	}
	if f.set("limit-magnifier") {
		c.SecondOrderCap = f.limitDelta
	}
	if f.transverse != "" {
		t := strings.ToLower(f.transverse)
		if t != "ties" && t != "spiral" && t != "all" {
			return usagef("--transverse %q: not accepted; give ties, spiral or all", f.transverse)
		}
		c.Transverse = t
	}
	t := &sc.Timber
	if f.species != "" {
		sp := strings.ToUpper(f.species)
		switch sp {
		case "DF-L", "DFL", "SP", "HF", "SPF":
			if sp == "DFL" {
				sp = "DF-L"
			}
			t.Species = sp
		default:
			return usagef("--species %q: not accepted; give DF-L, SP, HF or SPF", f.species)
		}
	}
	if f.grade != "" {
		g := strings.ToLower(strings.ReplaceAll(f.grade, " ", ""))
		switch g {
		case "ss", "selectstructural":
			t.Grade = "SS"
		case "no.1", "no1", "1":
			t.Grade = "No.1"
		case "no.2", "no2", "2":
			t.Grade = "No.2"
		default:
			return usagef("--grade %q: not accepted; give SS, No.1 or No.2", f.grade)
		}
	}
	if f.timberProducts != "" {
		t.Sawn, t.Glulam = false, false
		for _, p := range strings.Split(f.timberProducts, ",") {
			switch strings.ToLower(strings.TrimSpace(p)) {
			case "sawn":
				t.Sawn = true
			case "glulam":
				t.Glulam = true
			default:
				return usagef("--timber %q: not accepted; give sawn, glulam or sawn,glulam", f.timberProducts)
			}
		}
	}
	if f.set("wet") {
		t.Wet = f.wet
	}
	if f.set("incised") {
		t.Incised = f.incised
	}
	if f.set("hot") {
		t.Hot = f.hot
	}
	if f.fire != "" {
		r, err := model.ParseFireRating("--fire", f.fire)
		if err != nil {
			return usagef("--fire %q: not accepted; give %s", f.fire, model.FireRatingsAccepted)
		}
		sc.Fire.Rating = r
	}
	if f.set("steel-protection") {
		p := strings.ToLower(strings.TrimSpace(f.steelProtection))
		if p != "board" && p != "spray" {
			return usagef("--steel-protection %q: not accepted; give %s", f.steelProtection, model.SteelProtectionAccepted)
		}
		sc.Fire.SteelProtection = p
	}
	if f.aggregate != "" {
		a, err := model.ParseFireAggregate("--aggregate", f.aggregate)
		if err != nil {
			return usagef("--aggregate %q: not accepted; give %s", f.aggregate, model.FireAggregatesAccepted)
		}
		sc.Fire.Aggregate = a
	}
	if f.fireSides != "" {
		switch f.fireSides {
		case "3", "4":
			t.FireSides, _ = strconv.Atoi(f.fireSides)
		default:
			return usagef("--fire-sides %q: not accepted; give 3 or 4", f.fireSides)
		}
	}
	if f.duration != "" {
		t.Duration = strings.ToLower(f.duration)
	}
	return f.buildComposite(sc)
}

func carbonKindList() string {
	var names []string
	for _, k := range model.CarbonKinds {
		names = append(names, k.Key)
	}
	return strings.Join(names, ", ")
}

// buildCarbon applies --carbon kind=value pairs to the scheme's factors.
func (f *schemeFlags) buildCarbon(sc *model.Scheme) error {
	cf := model.CarbonFactors{}
	for k, v := range sc.Carbon {
		cf[k] = v
	}
	for _, pair := range strings.Split(f.carbon, ",") {
		kv := strings.SplitN(strings.TrimSpace(pair), "=", 2)
		known := false
		if len(kv) == 2 {
			for _, k := range model.CarbonKinds {
				known = known || k.Key == kv[0]
			}
		}
		if !known {
			return usagef("--carbon %q: %q is not accepted; give kind=value pairs with kinds %s", f.carbon, pair, carbonKindList())
		}
		v, err := parseNumber("carbon", kv[1], "a non-negative factor below 10,000 (kg CO2e per kg or per m³)", 0, 10000)
		if err != nil {
			return err
		}
		cf[kv[0]] = v
	}
	sc.Carbon = cf
	return nil
}

// parseShare reads --dead-share: a fraction (0.6), a percent (60%) or a
// ratio (2/3), above 0 and at most 1.
func parseShare(s string) (float64, error) {
	bad := usagef("--dead-share %q: not accepted; give the part of the service load that is dead, above 0 and at most 1, as a fraction (0.6), a percent (60%%) or a ratio (2/3)", s)
	t := strings.TrimSpace(s)
	var v float64
	var err error
	switch {
	case strings.HasSuffix(t, "%"):
		v, err = strconv.ParseFloat(strings.TrimSpace(strings.TrimSuffix(t, "%")), 64)
		v /= 100
	case strings.Contains(t, "/"):
		parts := strings.SplitN(t, "/", 2)
		a, e1 := strconv.ParseFloat(strings.TrimSpace(parts[0]), 64)
		b, e2 := strconv.ParseFloat(strings.TrimSpace(parts[1]), 64)
		if e1 != nil || e2 != nil || b == 0 {
			return 0, bad
		}
		v = a / b
	default:
		v, err = strconv.ParseFloat(t, 64)
	}
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) || v <= 0 || v > 1 {
		return 0, bad
	}
	return v, nil
}

// typedUnits is the unit system the user typed in: that of --length, else
// (with no --scheme, whose own units stand) that of --load or --tributary.
func (f *schemeFlags) typedUnits() (model.Units, bool) {
	typed := []string{f.length}
	if f.scheme == "" {
		typed = append(typed, f.load, f.tributary)
	}
	for _, s := range typed {
		if sys, ok := units.SystemOf(s); ok {
			return model.Units(sys), true
		}
	}
	return "", false
}

// parseTie reads --tie as a percentage (5%) or a fraction (0.05), 0 to 50%.
func parseTie(s string) (float64, error) {
	t := strings.TrimSpace(s)
	scale := 1.0
	if p, ok := strings.CutSuffix(t, "%"); ok {
		t, scale = strings.TrimSpace(p), 0.01
	}
	v, err := strconv.ParseFloat(t, 64)
	v *= scale
	if err != nil || !(v >= 0 && v <= model.MaxTie) {
		return 0, usagef("--tie %q: not accepted; give %s", s, model.TieAccepted)
	}
	return v, nil
}

// refuseEmpty refuses a text flag given with an empty value: only a flag
// left out takes its default.
func (f *schemeFlags) refuseEmpty() error {
	var err error
	f.fs.Visit(func(fl *flag.Flag) {
		g, ok := fl.Value.(flag.Getter)
		if !ok || err != nil {
			return
		}
		if s, ok := g.Get().(string); ok && strings.TrimSpace(s) == "" {
			err = usagef("--%s: an empty value is not accepted; give a value (%s), or leave the flag out for its default", fl.Name, fl.Usage)
		}
	})
	return err
}

// fieldFlags maps the model's field names to the flags that set them.
var fieldFlags = map[string]string{
	"length": "length", "weak-axis length": "weak-length", "ends": "ends", "K": "k", "method": "method",
	"load": "load", "tributary": "tributary", "floors": "floors", "dead": "dead", "live": "live",
	"roof-dead": "roof-dead", "roof-live": "roof-live", "snow": "snow", "kll": "kll", "occupancy": "occupancy",
	"materials": "materials", "units": "units", "rank": "rank",
	"steel Fy": "fy", "steel families": "steel-families", "f'c": "fc", "bar grade": "bar-grade",
	"rho-max": "rho-max", "transverse": "transverse", "m1m2": "m1m2", "beta-dns": "beta-dns", "EI method": "ei",
	"tie": "tie", "fire": "fire", "fire sides": "fire-sides", "duration": "duration", "species": "species", "grade": "grade",
	"dead-share": "dead-share", "fill f'c": "fill-fc", "composite families": "composite-families", "aggregate": "aggregate",
}

// fieldUsage turns a model check failure into a usage error naming the flag
// and the text typed, or the scheme field when no flag set it.
func (f *schemeFlags) fieldUsage(fe *model.FieldError) error {
	if name, ok := fieldFlags[fe.Field]; ok && f.set(name) {
		typed := f.fs.Lookup(name).Value.String()
		return usagef("--%s %q: not accepted; give %s", name, typed, fe.Accepted)
	}
	if strings.HasPrefix(fe.Field, "carbon factor") && f.set("carbon") {
		return usagef("--carbon %q: not accepted; give %s", f.carbon, fe.Accepted)
	}
	return usagef("%s %q (from the scheme): not accepted; give %s", fe.Field, fe.Value, fe.Accepted)
}

// loadFree lists the commands whose answer does not depend on the load.
var loadFree = map[string]bool{"curve": true, "scheme": true}

// requireLoad refuses a command whose answer depends on the load when it is
// given none: no --load, no takedown (--tributary) and no scheme file. A map
// over a load range (--load-range or --tributary-range) has its loads.
func (f *schemeFlags) requireLoad() error {
	if loadFree[f.name] || f.scheme != "" || f.set("load") || f.set("tributary") ||
		f.set("load-range") || f.set("tributary-range") {
		return nil
	}
	return usagef("no load given: %s needs the axial load; give --load (e.g. 1800kN or 400kip), a takedown with --tributary (e.g. --tributary 60m2 --floors 3 --dead 4kPa --live 3kPa), or --scheme FILE", f.name)
}

// QuantityFlags lists the flags that take a quantity with a unit. One rule
// holds for all of them: a bare number is refused, naming the accepted
// units, because a number alone cannot say which unit was meant.
var QuantityFlags = []string{
	"length", "weak-length", "load", "tributary", "dead", "live", "roof-dead", "roof-live", "snow",
	"fy", "fc", "fill-fc",
}
