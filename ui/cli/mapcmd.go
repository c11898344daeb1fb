package cli

import (
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"strconv"
	"strings"
	"text/tabwriter"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
	"upright/ui/units"
)

// init registers the map command.

// MapJSON is the JSON output of the map command. Cells[i][j] is load (or
// tributary area) i and length j; null where nothing works. Tie is the
// near-tie fraction the cells' shown families follow.
type MapJSON struct {
	Scheme      string           `json:"scheme"`
	Axis        string           `json:"axis"`
	Rank        string           `json:"rank"`
	LengthsMM   []float64        `json:"lengths_mm"`
	LoadsKN     []float64        `json:"loads_kN,omitempty"`
	TributaryM2 []float64        `json:"tributary_m2,omitempty"`
	Metric      string           `json:"metric"`
	Tie         float64          `json:"tie"`
	Families    []MapFamilyJSON  `json:"families"`
	Cells       [][]*MapCellJSON `json:"cells"`
	Point       MapPointJSON     `json:"point"`
	Caution     string           `json:"caution"`
}

// MapFamilyJSON is one family the map ranks, with the number of cells it
// wins strictly and the number the map shows it in.
type MapFamilyJSON struct {
	Family   string `json:"family"`
	Material string `json:"material"`
	Cells    int    `json:"cells"`
	Shown    int    `json:"shown_cells"`
}

// MapCellJSON is the winner of one cell; metric is in the unit MapJSON.Metric names.
type MapCellJSON struct {
	Family      string  `json:"family"`
	Material    string  `json:"material"`
	Designation string  `json:"designation"`
	Metric      float64 `json:"metric"`
	// Shown is the family the map shows (and the crossover list names) at
	// the cell: the strict best's family, except at a near-tie, where an
	// earlier family within the tie fraction keeps its place.
	Shown *MapShownJSON `json:"shown"`
}

// MapShownJSON is the family a map cell shows, with its best working size there.
type MapShownJSON struct {
	Family      string `json:"family"`
	Designation string `json:"designation"`
	NearTie     bool   `json:"near_tie"`
}

// MapPointJSON is the scheme's own length and load (or area).
type MapPointJSON struct {
	LengthMM    float64  `json:"length_mm"`
	LoadKN      *float64 `json:"load_kN,omitempty"`
	TributaryM2 *float64 `json:"tributary_m2,omitempty"`
}

// splitRange splits "A..B" into its two ends.
func splitRange(flagName, s, example string) (string, string, error) {
	a, b, ok := strings.Cut(s, "..")
	if !ok || strings.TrimSpace(a) == "" || strings.TrimSpace(b) == "" {
		return "", "", usagef("--%s %q: not accepted; give two values joined by .., e.g. %s", flagName, s, example)
	}
	return strings.TrimSpace(a), strings.TrimSpace(b), nil
}

// parseRange parses "A..B" with parse, naming the flag in any error.
func parseRange(flagName, s, example string, parse func(string) (float64, error)) (float64, float64, error) {
	a, b, err := splitRange(flagName, s, example)
	if err != nil {
		return 0, 0, err
	}
	lo, err := parse(a)
	if err != nil {
		return 0, 0, flagErr(flagName, s, err)
	}
	hi, err := parse(b)
	if err != nil {
		return 0, 0, flagErr(flagName, s, err)
	}
	return lo, hi, nil
}

// parseSteps parses "NxM": length steps by load steps.
func parseSteps(s string) (int, int, error) {
	a, b, ok := strings.Cut(strings.ToLower(strings.TrimSpace(s)), "x")
	n, err1 := strconv.Atoi(strings.TrimSpace(a))
	m, err2 := strconv.Atoi(strings.TrimSpace(b))
	if !ok || err1 != nil || err2 != nil || n < 2 || n > model.MapMaxColumns || m < 2 || m > model.MapMaxRows {
		return 0, 0, usagef("--steps %q: not accepted; give length steps (2 to %d) x load steps (2 to %d), e.g. 100x60", s, model.MapMaxColumns, model.MapMaxRows)
	}
	return n, m, nil
}

// runMap writes the map of the winning family over length × load (or
// tributary area): upright map --length-range A..B --load-range P1..P2
// [--steps NxM] [scheme flags] --out FILE or --json.
func runMap(args []string, stdout, stderr io.Writer) error {
	f := newSchemeFlags("map", stderr)
	lengthRange := f.fs.String("length-range", "", "unbraced lengths across the map, e.g. 1m..12m or 4ft..40ft (default "+model.DefaultRangeHelp+")")
	loadRange := f.fs.String("load-range", "", "typed axial loads up the map, e.g. 500kN..5000kN or 100kip..1200kip (default a quarter to twice --load)")
	tribRange := f.fs.String("tributary-range", "", "with a takedown, tributary areas per floor up the map, e.g. 20m2..120m2 (default a quarter to twice --tributary)")
	steps := f.fs.String("steps", "", "length steps x load steps, e.g. 100x60 (the default)")
	out := f.fs.String("out", "", "write the map picture to this file (.png, .svg or .pdf)")
	asJSON := f.fs.Bool("json", false, "write the map as JSON")
	sc, err := schemeFrom(f, args)
	if err != nil {
		return err
	}
	if *out == "" && !*asJSON {
		return usagef("--out or --json: one is required; give --out map.png (or .svg, .pdf) or --json")
	}
	if *out != "" {
		if _, err := plots.FormatOf(*out); err != nil {
			return usagef("--out %q: not accepted; give a file ending in .png, .svg or .pdf", *out)
		}
	}
	axis := model.MapAxisOf(&sc)
	sp := model.DefaultMapSpec(&sc, model.DefaultRange(sc.Setting.LengthMM, sc.Units))
	if *lengthRange != "" {
		lo, hi, err := parseRange("length-range", *lengthRange, "1m..12m", units.ParseLength)
		if err != nil {
			return err
		}
		sp.Lengths = model.Range{FromMM: lo, ToMM: hi}
	}
	switch {
	case axis == model.MapTributary && *loadRange != "":
		return usagef("--load-range %q: not accepted for a takedown scheme, whose load follows the tributary area; give --tributary-range, e.g. 20m2..120m2", *loadRange)
	case axis == model.MapLoad && *tribRange != "":
		return usagef("--tributary-range %q: not accepted with a typed load; give --load-range, or take the load down (--tributary with --floors and the floor loads)", *tribRange)
	case *loadRange != "":
		if sp.LoadFrom, sp.LoadTo, err = parseRange("load-range", *loadRange, "500kN..5000kN", units.ParseForce); err != nil {
			return err
		}
	case *tribRange != "":
		if sp.LoadFrom, sp.LoadTo, err = parseRange("tributary-range", *tribRange, "20m2..120m2", units.ParseArea); err != nil {
			return err
		}
	}
	if *steps != "" {
		if sp.Columns, sp.Rows, err = parseSteps(*steps); err != nil {
			return err
		}
	}
	if err := sp.Validate(&sc); err != nil {
		return mapFlagError(err, *lengthRange, *loadRange, *tribRange, *steps)
	}
	g, err := model.ComputeMap(context.Background(), sc, sp, nil)
	if err != nil {
		return mapFlagError(err, *lengthRange, *loadRange, *tribRange, *steps)
	}
	if *out != "" {
		pm := chart.Map(g, &sc, sc.Name)
		if err := plots.SaveMap(*out, &pm, plots.DefaultExportSize); err != nil {
			return err
		}
	}
	if *asJSON {
		fmt.Fprintln(stderr, model.Caution)
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", " ")
		return enc.Encode(NewMapJSON(g, &sc))
	}
	printMapSummary(stdout, g, &sc, *out)
	return nil
}

// mapFlagError turns a map grid's field error into one naming its flag.
func mapFlagError(err error, lengthRange, loadRange, tribRange, steps string) error {
	var fe *model.FieldError
	if !errors.As(err, &fe) {
		return err
	}
	flags := map[string][2]string{
		"length range":    {"length-range", lengthRange},
		"load range":      {"load-range", loadRange},
		"tributary range": {"tributary-range", tribRange},
		"steps":           {"steps", steps},
	}
	fl, ok := flags[fe.Field]
	if !ok {
		return err
	}
	v := fl[1]
	if v == "" {
		v = "(default from the scheme)"
	}
	return usagef("--%s %q: not accepted; give %s", fl[0], v, fe.Accepted)
}

// NewMapJSON builds the JSON object of a map.
func NewMapJSON(g *model.WinMap, sc *model.Scheme) MapJSON {
	out := MapJSON{Scheme: sc.Name, Axis: string(g.Axis), Rank: string(g.Metric), Metric: g.MetricUnit(), Tie: g.Tie, Caution: model.Caution}
	for _, L := range g.LengthsMM {
		out.LengthsMM = append(out.LengthsMM, round(L, 1))
	}
	digits := 4
	if g.Metric == model.ByFootprint {
		digits = 0
	}
	won, shown := make([]int, len(g.Families)), make([]int, len(g.Families))
	for i := range g.Loads {
		row := make([]*MapCellJSON, len(g.LengthsMM))
		for j := range g.LengthsMM {
			c := g.At(i, j)
			if c.Family < 0 {
				continue
			}
			won[c.Family]++
			f := g.Families[c.Family]
			row[j] = &MapCellJSON{Family: f.Name, Material: f.Material, Designation: g.Designation(c), Metric: round(c.Metric, digits)}
			if c.Shown >= 0 {
				shown[c.Shown]++
				row[j].Shown = &MapShownJSON{Family: g.Families[c.Shown].Name, Designation: g.ShownDesignation(c), NearTie: g.Tied(c)}
			}
		}
		out.Cells = append(out.Cells, row)
	}
	for fi, f := range g.Families {
		out.Families = append(out.Families, MapFamilyJSON{Family: f.Name, Material: f.Material, Cells: won[fi], Shown: shown[fi]})
	}
	out.Point.LengthMM = round(g.PointLengthMM, 1)
	if g.Axis == model.MapTributary {
		for _, a := range g.Loads {
			out.TributaryM2 = append(out.TributaryM2, round(a, 3))
		}
		v := round(g.PointLoad, 3)
		out.Point.TributaryM2 = &v
	} else {
		for _, p := range g.Loads {
			out.LoadsKN = append(out.LoadsKN, round(p/1e3, 3))
		}
		v := round(g.PointLoad/1e3, 3)
		out.Point.LoadKN = &v
	}
	return out
}

// printMapSummary says what was written and which families win how much of the map.
func printMapSummary(w io.Writer, g *model.WinMap, sc *model.Scheme, path string) {
	sys := units.System(sc.Units)
	_, yl := chart.MapLabels(sc, g.Axis)
	fmt.Fprintf(w, "Upright %s: %s\n", Version, sc.Name)
	fmt.Fprintf(w, "Map of the best family by %s: unbraced length %s to %s (%d steps), %s %.4g to %.4g (%d steps)\n\n",
		sc.Metric, units.Length(g.LengthsMM[0], sys), units.Length(g.LengthsMM[len(g.LengthsMM)-1], sys), len(g.LengthsMM),
		strings.ToLower(yl[:1])+yl[1:], chart.MapValue(g.Loads[0], g.Axis, sys), chart.MapValue(g.Loads[len(g.Loads)-1], g.Axis, sys), len(g.Loads))
	won := make([]int, len(g.Families)) // cells shown, as the picture colours them
	none, tied := 0, 0
	for k := range g.Cells {
		if f := g.Cells[k].Shown; f >= 0 {
			won[f]++
		} else {
			none++
		}
		if g.Tied(&g.Cells[k]) {
			tied++
		}
	}
	tw := tabwriter.NewWriter(w, 2, 4, 2, ' ', 0)
	fmt.Fprintln(tw, "Family\tMaterial\tShare of the map")
	total := float64(len(g.Cells))
	for fi, f := range g.Families {
		if won[fi] > 0 {
			fmt.Fprintf(tw, "%s\t%s\t%.1f%%\n", f.Name, f.Material, 100*float64(won[fi])/total)
		}
	}
	if none > 0 {
		fmt.Fprintf(tw, "nothing works\t\t%.1f%%\n", 100*float64(none)/total)
	}
	tw.Flush()
	if tied > 0 {
		fmt.Fprintf(w, "\nNear-ties: %.1f%% of the map keeps a family that another beats by no more than %s, as the crossover list does.\n",
			100*float64(tied)/float64(len(g.Cells)), strings.TrimPrefix(model.TieText(g.Tie), "within "))
	}
	if path != "" {
		fmt.Fprintf(w, "\nwrote %s\n", path)
	}
	fmt.Fprintf(w, "\n%s\n", model.Caution)
}
