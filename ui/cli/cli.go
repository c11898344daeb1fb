package cli

import (
	"context"
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"math"
	"strings"
	"text/tabwriter"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
	"upright/ui/schemefile"
	"upright/ui/units"
)

// Version is the program's version, shown by --version and the about box.
const Version = "0.1.0"

// IsCommand reports whether args start with a headless subcommand or a top-level flag.
func IsCommand(args []string) bool {
	if len(args) == 0 {
		return false
	}
	switch args[0] {
	case "--version", "-version", "version", "help", "-h", "--help":
		return true
	}
	if lookup(args[0]) != nil {
		return true
	}
	return strings.HasPrefix(args[0], "-")
}

// Run runs a headless command and returns the process exit status: 0 on
// success, 1 on a failure while computing or writing, 2 on bad input (a
// *UsageError or a *model.FieldError, found by type, never by message text).
func Run(args []string, stdout, stderr io.Writer) int {
	if len(args) == 0 {
		usage(stderr)
		return 2
	}
	switch args[0] {
	case "--version", "-version", "version":
		fmt.Fprintf(stdout, "upright %s\n", Version)
		return 0
	case "help", "-h", "--help":
		usage(stdout)
		return 0
	}
	c := lookup(args[0])
	if c == nil {
		fmt.Fprintf(stderr, "upright: unknown command %q; commands are %s\n", args[0], strings.Join(CommandNames(), ", "))
		return 2
	}
	err := c.run(args[1:], stdout, stderr)
	if err == nil || errors.Is(err, flag.ErrHelp) {
		return 0
	}
	fmt.Fprintf(stderr, "upright %s: %v\n", args[0], err)
	return ExitStatus(err)
}

// ExitStatus is the exit status for an error: 2 for bad input (a *UsageError
// or a *model.FieldError anywhere in its chain), 1 for anything else.
func ExitStatus(err error) int {
	var ue *UsageError
	var fe *model.FieldError
	if errors.As(err, &ue) || errors.As(err, &fe) {
		return 2
	}
	return 1
}

// schemeFrom parses flags into a scheme, starting from --scheme or the default.
func schemeFrom(f *schemeFlags, args []string) (model.Scheme, error) {
	if err := f.parse(args); err != nil {
		return model.Scheme{}, err
	}
	if f.fs.NArg() > 0 {
		return model.Scheme{}, usagef("unexpected argument %q; flags start with --", f.fs.Arg(0))
	}

	base := model.DefaultScheme()
	if f.scheme != "" {
		sc, err := schemefile.Load(f.scheme)
		if err != nil {
			return base, usagef("--scheme %q: %v", f.scheme, err)
		}
		base = sc
	}
	sc, err := f.build(base)
	if err != nil {
		return sc, err
	}
	return sc, f.requireLoad()
}

// Candidate is one candidate in the JSON output of compare.
type Candidate struct {
	Material    string         `json:"material"`
	Family      string         `json:"family"`
	Designation string         `json:"designation"`
	Status      string         `json:"status"` // works, fails or not permitted (model.Row.Status)
	OK          bool           `json:"ok"`
	Permitted   bool           `json:"permitted"`
	CapacityKN  float64        `json:"capacity_kN"`
	DemandKN    float64        `json:"demand_kN"`
	Utilization *float64       `json:"utilization"`
	MassKgPerM  float64        `json:"mass_kg_per_m"`
	MassKg      float64        `json:"mass_kg"`
	FootprintMM [2]float64     `json:"footprint_mm"`
	PlanAreaMM2 float64        `json:"plan_area_mm2"`
	CarbonKg    float64        `json:"carbon_kgCO2e"`
	Governing   string         `json:"governing"`
	Slenderness float64        `json:"slenderness"`
	Warnings    []string       `json:"warnings"`
	Explanation string         `json:"explanation"`
	Calc        map[string]any `json:"calc"`
	Steps       []model.Step   `json:"steps"`

	// Fire is how the size meets the scheme's fire rating.
	Fire   model.FireCheck `json:"fire"`
	Checks []CheckJSON     `json:"checks"`
	Limit  string          `json:"limit"`
}

// CheckJSON is one load combination checked on one candidate.
type CheckJSON struct {
	Combination string             `json:"combination"`
	Clause      string             `json:"clause"`
	DemandKN    float64            `json:"demand_kN"`
	CapacityKN  float64            `json:"capacity_kN"`
	Utilization *float64           `json:"utilization"`
	Factors     map[string]float64 `json:"factors"`
	Governing   bool               `json:"governing"`
}

// checksJSON converts the model's checks, rounding as the candidate does.
func checksJSON(cs []model.Check) []CheckJSON {
	out := make([]CheckJSON, 0, len(cs))
	for _, c := range cs {
		j := CheckJSON{Combination: c.Combination, Clause: c.Clause, DemandKN: round(c.DemandN/1e3, 2),
			CapacityKN: round(c.CapacityN/1e3, 2), Factors: map[string]float64{}, Governing: c.Governing}
		if !math.IsInf(c.Util, 0) && !math.IsNaN(c.Util) {
			u := round(c.Util, 4)
			j.Utilization = &u
		}
		for k, v := range c.Factors {
			j.Factors[k] = round(v, 4)
		}
		out = append(out, j)
	}
	return out
}

func round(x float64, digits int) float64 {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return 0
	}
	p := math.Pow(10, float64(digits))
	return math.Round(x*p) / p
}

// sanitize replaces NaN and Inf anywhere in a calc value with nil.
func sanitize(v any) any {
	switch x := v.(type) {
	case float64:
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return nil
		}
		return x
	case float32:
		return sanitize(float64(x))
	case map[string]any:
		out := make(map[string]any, len(x))
		for k, e := range x {
			out[k] = sanitize(e)
		}
		return out
	case map[string]float64:
		out := make(map[string]any, len(x))
		for k, e := range x {
			out[k] = sanitize(e)
		}
		return out
	case []any:
		out := make([]any, len(x))
		for i, e := range x {
			out[i] = sanitize(e)
		}
		return out
	case []float64:
		out := make([]any, len(x))
		for i, e := range x {
			out[i] = sanitize(e)
		}
		return out
	case [][2]float64:
		out := make([]any, len(x))
		for i, e := range x {
			out[i] = []any{sanitize(e[0]), sanitize(e[1])}
		}
		return out
	}
	return v
}

// NewCandidate builds the JSON object of one evaluated row, with its trace.
func NewCandidate(m *model.Model, r *model.Row, s model.Setting) Candidate {
	f := m.Families[r.Family]
	d := m.Detail(r.Family, r.Index, s)
	c := Candidate{
		Material: f.Material(), Family: f.Name(), Designation: r.Static.Designation,
		Status: r.Status(), OK: r.OK, Permitted: r.Permitted,
		CapacityKN: round(r.CapacityN/1e3, 2), DemandKN: round(r.DemandN/1e3, 2),
		MassKgPerM: round(r.Static.MassKgPerM, 2), MassKg: round(r.Static.MassKgPerM*s.LengthMM/1000, 1),
		FootprintMM: [2]float64{round(r.Static.FootprintMM[0], 1), round(r.Static.FootprintMM[1], 1)},
		PlanAreaMM2: round(r.Static.PlanAreaMM2, 0), CarbonKg: round(r.CarbonKg, 1),
		Governing: r.Governing, Slenderness: round(r.Slenderness, 1),
		Warnings: d.Warnings, Explanation: d.Plain, Steps: d.Steps,
		Checks: checksJSON(d.Checks), Limit: r.Limit,
	}
	c.Fire = fireJSON(r.Static, d.Fire)
	if c.Warnings == nil {
		c.Warnings = []string{}
	}
	if !r.Permitted && r.Reason != "" && len(c.Warnings) == 0 {
		c.Warnings = append(c.Warnings, r.Reason)
	}
	if r.Permitted && r.CapacityN > 0 && !math.IsInf(r.Util, 0) {
		u := round(r.Util, 4)
		c.Utilization = &u
	}
	calc, _ := sanitize(d.Calc).(map[string]any)
	if calc == nil {
		calc = map[string]any{}
	}
	c.Calc = calc
	for i := range c.Steps {
		if math.IsNaN(c.Steps[i].Value) || math.IsInf(c.Steps[i].Value, 0) {
			c.Steps[i].Value = 0
		}
	}
	return c
}

// shownRows picks the rows compare reports: every candidate with all, else
// each family's best working size, or its closest failing one when none works.
func shownRows(res *model.Result, all bool) []*model.Row {
	var out []*model.Row
	for fi := range res.Families {
		fr := &res.Families[fi]
		if all {
			for i := range fr.Rows {
				out = append(out, &fr.Rows[i])
			}
			continue
		}
		if len(fr.Rows) > 0 {
			out = append(out, &fr.Rows[0])
		}
	}
	return out
}

func runCompare(args []string, stdout, stderr io.Writer) error {
	f := newSchemeFlags("compare", stderr)
	all := f.fs.Bool("all", false, "list every candidate, not only the lightest working size of each family")
	asJSON := f.fs.Bool("json", false, "write JSON: an array with one object per candidate")
	chart := f.fs.String("chart", "", "also write the chart to this file (.png, .svg or .pdf)")
	sc, err := schemeFrom(f, args)
	if err != nil {
		return err
	}
	m, err := model.New(sc)
	if err != nil {
		return err
	}
	res, err := m.Evaluate(context.Background(), sc.Setting)
	if err != nil {
		return err
	}
	rows := shownRows(res, *all)
	if *chart != "" {
		if err := checkExt("chart", *chart, ".png", ".svg", ".pdf"); err != nil {
			return err
		}
		if err := writeChart(m, res, *chart); err != nil {
			return err
		}
	}
	if *asJSON {
		out := make([]Candidate, len(rows))
		for i, r := range rows {
			out[i] = NewCandidate(m, r, sc.Setting)
		}
		fmt.Fprintln(stderr, model.Caution)
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		return enc.Encode(out)
	}
	printHeader(stdout, m)
	printTable(stdout, m, rows, units.System(sc.Units), sc.Setting)
	if b := res.BestOverall(); b != nil {
		fmt.Fprintf(stdout, "\nBest overall by %s: %s (%s)", sc.Metric, b.Static.Designation, m.Families[b.Family].Name())
		if nt := m.NearTieNote(res); nt != "" {
			fmt.Fprintf(stdout, "; %s", nt)
		}
		fmt.Fprintln(stdout)
	}
	fmt.Fprintf(stdout, "\n%s\n", model.Caution)
	return nil
}

func writeChart(m *model.Model, res *model.Result, path string) error {
	if _, err := plots.FormatOf(path); err != nil {
		return usagef("--chart %q: %v", path, err)
	}
	xs, err := m.Crossovers(context.Background(), res.Setting, model.DefaultRange(res.Setting.LengthMM, m.Scheme.Units), nil)
	if err != nil {
		return err
	}
	ch := chart.NewBuilder(m).Chart(res, chart.Options{Crossovers: xs, Title: m.Scheme.Name})
	return chart.Save(path, ch, plots.DefaultExportSize)
}

func endsText(s model.Setting) string {
	if s.K > 0 {
		return fmt.Sprintf("%s ends, K = %.2f typed", s.Ends, s.K)
	}
	return fmt.Sprintf("%s ends (recommended design K of each material)", s.Ends)
}

func printHeader(w io.Writer, m *model.Model) {
	sc := m.Scheme
	sys := units.System(sc.Units)
	s := sc.Setting
	fmt.Fprintf(w, "Upright %s: %s\n", Version, sc.Name)
	fmt.Fprintf(w, "Unbraced length %s (weak axis %s), %s, %s\n",
		units.Length(s.LengthMM, sys), units.Length(s.WeakMM, sys), endsText(s), strings.ToUpper(string(s.Method)))
	ls := m.Loads
	switch {
	case ls.Typed && ls.Governing >= 0:
		kind := "factored"
		if s.Method == model.ASD {
			kind = "service"
		}
		c := ls.Combos[ls.Governing]
		fmt.Fprintf(w, "Demand %s typed (%s), dead share %.2f: D %s, L %s, governed by %s (%s)", units.Force(ls.DemandN, sys), kind,
			ls.DeadN/(ls.DeadN+ls.LiveN), units.Force(ls.DeadN, sys), units.Force(ls.LiveN, sys), ls.GoverningName, c.Clause)
	case ls.Governing >= 0 && ls.Governing < len(ls.Combos):
		c := ls.Combos[ls.Governing]
		fmt.Fprintf(w, "Demand %s from the takedown, governed by %s (%s)", units.Force(ls.DemandN, sys), c.Name, c.Clause)
	default:
		fmt.Fprintf(w, "Demand %s", units.Force(ls.DemandN, sys))
	}
	fmt.Fprint(w, model.SelfWeightWords(&sc))
	fmt.Fprintf(w, "; ranked by %s; near-tie tolerance %s\n", sc.Metric, strings.TrimPrefix(model.TieText(sc.Tie), "within "))
	printTakedownLine(w, sc)
	printFireLine(w, sc)
	fmt.Fprintln(w, "Every combination is checked with its own factors (timber λ or CD, concrete βdns); the highest utilization governs.")
	fmt.Fprintln(w)
}

func printTable(w io.Writer, m *model.Model, rows []*model.Row, sys units.System, s model.Setting) {
	tw := tabwriter.NewWriter(w, 2, 4, 2, ' ', 0)
	fu := "kip"
	wu := "lb/ft"
	if sys == units.SI {
		fu, wu = "kN", "kg/m"
	}
	fmt.Fprintf(tw, "Status\tFamily\tSize\tPlan\tWeight (%s)\tCapacity (%s)\tDemand (%s)\tUtil\tGoverning\tSlenderness\n", wu, fu, fu)
	seen := map[string]bool{}
	var marks []string
	for _, r := range rows {
		status := r.Status()
		capN, demN := governingPair(m, r, s)
		capV, _ := units.ForceValue(capN, sys)
		demV, _ := units.ForceValue(demN, sys)
		wt := r.Static.MassKgPerM
		if sys == units.US {
			wt /= units.KgmPerPlf
		}
		util := "—"
		if !math.IsInf(r.Util, 0) {
			util = fmt.Sprintf("%.2f", r.Util)
		}
		slender := fmt.Sprintf("%.0f", r.Slenderness)
		if mark, why := model.LimitMark(&r.Quick); mark != "" {
			slender += " " + mark
			if !seen[why] {
				seen[why] = true
				marks = append(marks, why)
			}
		}
		fmt.Fprintf(tw, "%s\t%s\t%s\t%s\t%.1f\t%.0f\t%.0f\t%s\t%s\t%s\n", status, m.Families[r.Family].Name(), r.Static.Designation,
			units.PlanSize(r.Static.FootprintMM, sys), wt, capV, demV, util, r.Governing, slender)
	}
	tw.Flush()
	for _, why := range marks {
		fmt.Fprintf(w, "%s %s\n", model.LimitMarkText, why)
	}
}

func runCrossovers(args []string, stdout, stderr io.Writer) error {
	f := newSchemeFlags("crossovers", stderr)
	asJSON := f.fs.Bool("json", false, "write JSON: an array of crossover objects")
	from := f.fs.String("from", "", "start of the length range (default "+model.DefaultRangeHelp+")")
	to := f.fs.String("to", "", "end of the length range (default "+model.DefaultRangeHelp+")")
	changes := f.fs.String("changes", "family", "which changes to list: family (where the best family changes and where each family's reach ends, with a line for a family that works nowhere) or all (also every size step and the reach of each shown size)")
	sc, err := schemeFrom(f, args)
	if err != nil {
		return err
	}
	if *changes != "family" && *changes != "all" {
		return usagef("--changes %q: not accepted; give family or all", *changes)
	}
	r, err := rangeFlags(*from, *to, sc.Setting.LengthMM, sc.Units)
	if err != nil {
		return err
	}
	m, err := model.New(sc)
	if err != nil {
		return err
	}
	all, err := m.Crossovers(context.Background(), sc.Setting, r, nil)
	if err != nil {
		return err
	}
	xs, err := listedCrossovers(m, all, r, *changes == "all")
	if err != nil {
		return err
	}
	if *asJSON {
		fmt.Fprintln(stderr, model.Caution)
		if xs == nil {
			xs = []model.Crossover{}
		}
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		return enc.Encode(xs)
	}
	sys := units.System(sc.Units)
	printHeader(stdout, m)
	fmt.Fprintf(stdout, "Crossovers from %s to %s (each length is the last at which the first answer still holds, to ±%.0f mm)\n\n",
		units.Length(r.FromMM, sys), units.Length(r.ToMM, sys), model.ToleranceMM)
	tw := tabwriter.NewWriter(stdout, 2, 4, 2, ' ', 0)
	fmt.Fprintln(tw, "Length\tKind\tFamily\tWhat changes")
	for _, x := range xs {
		fmt.Fprintf(tw, "%s\t%s\t%s\t%s\n", units.Length(x.LengthMM, sys), x.Kind, x.Family, DescribeCrossover(x))
	}
	tw.Flush()
	if len(xs) == 0 {
		fmt.Fprintln(stdout, "No crossovers in this range: every answer holds throughout.")
	}
	fmt.Fprintf(stdout, "\n%s\n", model.Caution)
	return nil
}

// DescribeCrossover says in words what changes at a crossover.
func DescribeCrossover(x model.Crossover) string {
	switch x.Kind {
	case model.KindReach:
		return x.From + " stops carrying the demand"
	case model.KindSize:
		if x.To == "" {
			return x.From + " is the last working " + x.Family + " size"
		}
		return x.From + " → " + x.To
	case KindEnd:
		return x.From + " is the last working " + x.Family + " size: the family's reach ends"
	case KindNowhere:
		return "no " + x.Family + " size works anywhere in the range"
	case model.KindFamily:
		if x.To == "" {
			return "best overall " + x.From + " (" + x.FromDesignation + "): nothing works beyond"
		}
		return "best overall " + x.From + " (" + x.FromDesignation + ") → " + x.To + " (" + x.ToDesignation + ")" + nearTieText(x)
	}
	return x.From + " → " + x.To
}

func rangeFlags(from, to string, lengthMM float64, u model.Units) (model.Range, error) {
	r := model.DefaultRange(lengthMM, u)
	if from != "" {
		v, err := units.ParseLength(from)
		if err != nil {
			return r, flagErr("from", from, err)
		}
		r.FromMM = v
	}
	if to != "" {
		v, err := units.ParseLength(to)
		if err != nil {
			return r, flagErr("to", to, err)
		}
		r.ToMM = v
	}
	if r.FromMM < model.MinLengthMM || r.ToMM > model.MaxLengthMM || r.ToMM <= r.FromMM {
		return r, usagef("--from %q --to %q: not accepted; give a range within 0.3 m to 30 m with --from below --to", from, to)
	}
	return r, nil
}

// CurveJSON is the JSON output of the curve command.
type CurveJSON struct {
	Designation string           `json:"designation"`
	Family      string           `json:"family"`
	Material    string           `json:"material"`
	Method      string           `json:"method"`
	Points      []CurvePointJSON `json:"points"`
}

// CurvePointJSON is one sample of a curve.
type CurvePointJSON struct {
	LengthMM   float64 `json:"length_mm"`
	CapacityKN float64 `json:"capacity_kN"`
	DemandKN   float64 `json:"demand_kN"`
	Permitted  bool    `json:"permitted"`
	Mode       int     `json:"mode"`
}

func runCurve(args []string, stdout, stderr io.Writer) error {
	f := newSchemeFlags("curve", stderr)
	asJSON := f.fs.Bool("json", false, "write JSON")
	des := f.fs.String("designation", "", "candidate to trace, e.g. W12X65")
	from := f.fs.String("from", "", "start length (default "+model.DefaultRangeHelp+")")
	to := f.fs.String("to", "", "end length (default "+model.DefaultRangeHelp+")")
	sc, err := schemeFrom(f, args)
	if err != nil {
		return err
	}
	if *des == "" {
		return usagef("--designation: required; give a candidate's designation as compare --all lists it, e.g. W12X65")
	}
	r, err := rangeFlags(*from, *to, sc.Setting.LengthMM, sc.Units)
	if err != nil {
		return err
	}
	m, err := model.New(sc)
	if err != nil {
		return err
	}
	fi, i, ok := m.Find(*des)
	if !ok {
		return usagef("--designation %q: no such candidate among the materials switched on; run compare --all to list them", *des)
	}
	pts := m.Curve(fi, i, sc.Setting, r)
	fam := m.Families[fi]
	if *asJSON {
		out := CurveJSON{Designation: fam.Static(i).Designation, Family: fam.Name(), Material: fam.Material(), Method: string(sc.Setting.Method)}
		for _, p := range pts {
			out.Points = append(out.Points, CurvePointJSON{LengthMM: round(p.LengthMM, 1), CapacityKN: round(p.CapacityN/1e3, 3),
				DemandKN: round(p.DemandN/1e3, 3), Permitted: p.Permitted, Mode: p.Mode})
		}
		fmt.Fprintln(stderr, model.Caution)
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		return enc.Encode(out)
	}
	sys := units.System(sc.Units)
	fmt.Fprintf(stdout, "%s (%s, %s), %s\n", fam.Static(i).Designation, fam.Name(), fam.Material(), strings.ToUpper(string(sc.Setting.Method)))
	tw := tabwriter.NewWriter(stdout, 2, 4, 2, ' ', 0)
	_, fu := units.ForceValue(0, sys)
	fmt.Fprintf(tw, "Length\tCapacity (%s)\tDemand (%s)\n", fu, fu)
	for _, p := range pts {
		c, _ := units.ForceValue(p.CapacityN, sys)
		d, _ := units.ForceValue(p.DemandN, sys)
		cs := fmt.Sprintf("%.1f", c)
		if !p.Permitted {
			cs = "not permitted"
		}
		fmt.Fprintf(tw, "%s\t%s\t%.1f\n", units.Length(p.LengthMM, sys), cs, d)
	}
	tw.Flush()
	fmt.Fprintf(stdout, "\n%s\n", model.Caution)
	return nil
}

// nearTieText appends a family change's near-ties to its description.
func nearTieText(x model.Crossover) string {
	if t := x.NearTieText(); t != "" {
		return "; " + t
	}
	return ""
}

// printTakedownLine states every input of a takedown, zeros and defaults
// included (a roof live load or snow not given is 0), so that nothing that
// shapes the answer is left unsaid.
func printTakedownLine(w io.Writer, sc model.Scheme) {
	l := sc.Load
	if l.Mode != model.LoadTakedown {
		return
	}
	sys := units.System(sc.Units)
	zero := func(kpa float64) string {
		if kpa == 0 {
			return units.Pressure(0, sys) + " (none given)"
		}
		return units.Pressure(kpa, sys)
	}
	red := "no live-load reduction"
	if l.LiveReduction {
		kll := l.KLL
		if kll == 0 {
			kll = 4
		}
		red = fmt.Sprintf("live-load reduction by ASCE 7-22 4.7 with KLL %g, %s occupancy", kll, l.Occupancy)
	}
	fmt.Fprintf(w, "Takedown: %s per floor, %d %s below the roof; floor dead %s, floor live %s; roof dead %s, roof live Lr %s, snow S %s; %s\n",
		units.Area(l.TributaryM2, sys), l.Floors, map[bool]string{true: "floor", false: "floors"}[l.Floors == 1],
		zero(l.FloorDeadKPa), zero(l.FloorLiveKPa), zero(l.RoofDeadKPa), zero(l.RoofLiveKPa), zero(l.SnowKPa), red)
}

// Kinds of crossover the crossovers command adds to the model's.
const (
	KindEnd     = "end"     // a family's last working size stops working: its reach ends
	KindNowhere = "nowhere" // a family works nowhere in the range
)

// listedCrossovers picks what the crossovers command lists. The last
// working size of a family is a reach end (KindEnd), not a size step. By
// default: where the best family changes and where each family's reach
// ends, and a line for each family that works nowhere in the range (no
// size works even at its shortest length); with all, every size step and
// the reach of each shown size too.
func listedCrossovers(m *model.Model, xs []model.Crossover, r model.Range, all bool) ([]model.Crossover, error) {
	res, err := m.Evaluate(context.Background(), m.Scheme.Setting.AtLength(r.FromMM))
	if err != nil {
		return nil, err
	}
	out := make([]model.Crossover, 0, len(xs))
	for _, fr := range res.Families {
		if fr.Working == 0 {
			out = append(out, model.Crossover{Kind: KindNowhere, LengthMM: r.FromMM, Family: m.Families[fr.Family].Name()})
		}
	}
	for _, x := range xs {
		if x.Kind == model.KindSize && x.To == "" {
			x.Kind = KindEnd
		}
		if all || x.Kind == model.KindFamily || x.Kind == KindEnd {
			out = append(out, x)
		}
	}
	return out, nil
}

// governingPair is the capacity and demand of a row's governing load
// combination, the pair its utilization comes from (timber under 1.4D:
// that combination's load and its strength at λ 0.6, not the largest load
// over a restated strength); the row's own pair when none governs.
func governingPair(m *model.Model, r *model.Row, s model.Setting) (capN, demN float64) {
	for _, c := range m.Checks(r.Family, r.Index, s) {
		if c.Governing {
			return c.CapacityN, c.DemandN
		}
	}
	return r.CapacityN, r.DemandN
}
