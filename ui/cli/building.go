package cli

import (
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"math"
	"strings"
	"text/tabwriter"

	"upright/ui/model"
	"upright/ui/schemefile"
	"upright/ui/units"
)

// BuildingJSON is the JSON output of the building command.
type BuildingJSON struct {
	Positions []PositionJSON `json:"positions"`
	Totals    []TotalJSON    `json:"totals"`
}

// PositionJSON is one column position's takedown and sizes.
type PositionJSON struct {
	Position    string       `json:"position"` // interior, edge-x, edge-y or corner
	Count       int          `json:"count"`
	TributaryM2 float64      `json:"tributary_m2"`
	Storeys     []StoreyJSON `json:"storeys"`
}

// StoreyJSON is one storey of a position: its loads without column weight
// and the best size of each family there (compare's rows).
type StoreyJSON struct {
	Storey   int         `json:"storey"` // 1 is the ground storey
	LengthMM float64     `json:"length_mm"`
	DKN      float64     `json:"D_kN"`
	LKN      float64     `json:"L_kN"`
	LrKN     float64     `json:"Lr_kN"`
	SKN      float64     `json:"S_kN"`
	DemandKN float64     `json:"demand_kN"`
	Best     []Candidate `json:"best"`
}

// TotalJSON is one family's quantities over the building.
type TotalJSON struct {
	Family           string  `json:"family"`
	Material         string  `json:"material"`
	Columns          int     `json:"columns"`
	LengthM          float64 `json:"length_m"`
	MassKg           float64 `json:"mass_kg"`
	ConcreteM3       float64 `json:"concrete_m3"`
	TimberM3         float64 `json:"timber_m3"`
	CarbonKg         float64 `json:"carbon_kgCO2e"`
	ColumnAreaM2     float64 `json:"column_area_m2"`
	GrossFloorAreaM2 float64 `json:"gross_floor_area_m2"`
}

// NewBuildingJSON encodes a schedule: every position and storey with each
// family's size there, and the totals of each family whose schedule is
// complete (a family that cannot carry some storey has no totals).
func NewBuildingJSON(s *model.Schedule) BuildingJSON {
	out := BuildingJSON{Positions: []PositionJSON{}, Totals: []TotalJSON{}}
	for pi := range s.Positions {
		ps := &s.Positions[pi]
		pj := PositionJSON{Position: string(ps.Position), Count: ps.Count, TributaryM2: round(ps.TributaryM2, 3)}
		for k, sl := range ps.Storeys {
			sj := StoreyJSON{Storey: sl.Storey, LengthMM: round(sl.LengthMM, 1),
				DKN: round(sl.Loads.DeadN/1e3, 3), LKN: round(sl.Loads.LiveN/1e3, 3),
				LrKN: round(sl.Loads.RoofLiveN/1e3, 3), SKN: round(sl.Loads.SnowN/1e3, 3),
				DemandKN: round(sl.Loads.DemandN/1e3, 3), Best: []Candidate{}}
			for fi := range ps.Best {
				e := &ps.Best[fi][k]
				if e.Index < 0 {
					continue
				}
				sj.Best = append(sj.Best, NewCandidate(e.Model, &e.Row, e.Model.Scheme.Setting))
			}
			pj.Storeys = append(pj.Storeys, sj)
		}
		out.Positions = append(out.Positions, pj)
	}
	for _, t := range s.Totals {
		if !t.Complete {
			continue
		}
		out.Totals = append(out.Totals, TotalJSON{Family: t.Name, Material: t.Material, Columns: t.Columns,
			LengthM: round(t.LengthM, 2), MassKg: round(t.SteelKg, 1), ConcreteM3: round(t.ConcreteM3, 3),
			TimberM3: round(t.TimberM3, 3), CarbonKg: round(t.CarbonKg, 1),
			ColumnAreaM2: round(t.ColumnAreaTotal, 4), GrossFloorAreaM2: round(t.GrossFloorAreaM2, 2)})
	}
	return out
}

// buildingFlags are the building command's own flags.
type buildingFlags struct {
	baysX, baysY, storeys, facade, overhang, changeEvery, planFamily, planStorey string
}

// parseLengths parses a comma list of lengths, mm.
func parseLengths(name, s, accepted string) ([]float64, error) {
	var out []float64
	for _, p := range strings.Split(s, ",") {
		p = strings.TrimSpace(p)
		if p == "" {
			return nil, usagef("--%s %q: an empty entry is not accepted; give %s", name, s, accepted)
		}
		v, err := units.ParseLength(p)
		if err != nil {
			return nil, usagef("--%s %q: %q is not accepted; give %s", name, s, p, accepted)
		}
		out = append(out, v)
	}
	return out, nil
}

var buildingFieldFlags = map[string]string{
	"bays-x": "bays-x", "bays-y": "bays-y", "storeys": "storeys", "facade": "facade", "overhang": "overhang",
	"change-every": "change-every", "plan-storey": "plan-storey", "dead": "dead", "live": "live",
	"roof-dead": "roof-dead", "roof-live": "roof-live", "snow": "snow", "occupancy": "occupancy",
}

// buildingScheme parses the building command's flags into a scheme with a
// building: --scheme's building (or the default one) with the flags given
// over it.
func buildingScheme(f *schemeFlags, bf *buildingFlags, args []string) (model.Scheme, error) {
	if err := f.fs.Parse(args); err != nil {
		if errors.Is(err, flag.ErrHelp) {
			return model.Scheme{}, err
		}
		return model.Scheme{}, usagef("%v", err)
	}
	if f.fs.NArg() > 0 {
		return model.Scheme{}, usagef("unexpected argument %q; flags start with --", f.fs.Arg(0))
	}
	for _, n := range []string{"load", "dead-share", "tributary", "floors", "kll", "length", "weak-length"} {
		if f.set(n) {
			return model.Scheme{}, usagef("--%s: the building takes the storey heights, tributary areas, floors carried and KLL from its grid; leave --%s out", n, n)
		}
	}
	base := model.DefaultScheme()
	if f.scheme != "" {
		sc, err := schemefile.Load(f.scheme)
		if err != nil {
			return base, usagef("--scheme %q: %v", f.scheme, err)
		}
		base = sc
	}
	b := model.DefaultBuilding()
	if base.Building != nil {
		b = *base.Building
		b.BaysXMM = append([]float64(nil), b.BaysXMM...)
		b.BaysYMM = append([]float64(nil), b.BaysYMM...)
		b.StoreysMM = append([]float64(nil), b.StoreysMM...)
	}
	// The floor and roof load flags are the takedown's; read them through
	// a takedown load carrying the building's values (the area is a
	// stand-in: the grid gives each position its own).
	base.Load = model.Load{Mode: model.LoadTakedown, TributaryM2: 1, Floors: 1,
		FloorDeadKPa: b.FloorDeadKPa, FloorLiveKPa: b.FloorLiveKPa, RoofDeadKPa: b.RoofDeadKPa,
		RoofLiveKPa: b.RoofLiveKPa, SnowKPa: b.SnowKPa, Occupancy: b.Occupancy, LiveReduction: b.LiveReduction, KLL: 4}
	lists := []struct {
		name, s, accepted string
		dst               *[]float64
	}{
		{"bays-x", bf.baysX, "a comma list of bay spacings along x, e.g. 9m,9m,7.5m", &b.BaysXMM},
		{"bays-y", bf.baysY, "a comma list of bay spacings along y, e.g. 7.5m,7.5m", &b.BaysYMM},
		{"storeys", bf.storeys, "a comma list of storey heights from the ground up, e.g. 4.2m,3.6m,3.6m", &b.StoreysMM},
	}
	for _, l := range lists {
		if !f.set(l.name) {
			continue
		}
		v, err := parseLengths(l.name, l.s, l.accepted)
		if err != nil {
			return base, err
		}
		*l.dst = v
	}
	if f.set("storeys") {
		base.Setting = base.Setting.AtLength(b.StoreysMM[0])
	}
	if f.set("facade") {
		v, err := units.ParseLineLoad(bf.facade)
		if err != nil || v < 0 || v > model.MaxFacadeKNM {
			why := units.WhyAmbiguous(err)
			if why != "" {
				why += "; "
			}
			return base, usagef("--facade %q: not accepted; %sgive a façade dead load per metre of edge from 0 to 100 kN/m (0 to 6.85 kip/ft), e.g. 8kN/m or 0.5kip/ft", bf.facade, why)
		}
		b.FacadeKNPerM = v
	}
	if f.set("overhang") {
		v, err := units.ParseLength(bf.overhang)
		if err != nil && strings.TrimSpace(bf.overhang) != "0" {
			return base, flagErr("overhang", bf.overhang, err)
		}
		b.OverhangMM = v
	}
	if f.set("change-every") {
		v, err := parseNumber("change-every", bf.changeEvery, "a whole number of storeys from 1 to 60 between size changes (default 2)", 1, 60)
		if err != nil || v != math.Trunc(v) {
			return base, usagef("--change-every %q: not accepted; give a whole number of storeys from 1 to 60 between size changes (default 2)", bf.changeEvery)
		}
		b.ChangeEvery = int(v)
	}
	if f.set("plan-storey") {
		v, err := parseNumber("plan-storey", bf.planStorey, fmt.Sprintf("a storey from 1 (the ground) to %d", len(b.StoreysMM)), 1, float64(len(b.StoreysMM)))
		if err != nil || v != math.Trunc(v) {
			return base, usagef("--plan-storey %q: not accepted; give a whole storey from 1 (the ground) to %d", bf.planStorey, len(b.StoreysMM))
		}
		b.PlanStorey = int(v)
	}
	if f.set("plan-family") {
		b.PlanFamily = bf.planFamily
	}
	// Storey heights beyond the single column's length range are the
	// building's to judge; keep the scheme's own length valid meanwhile.
	if s := base.Setting; s.LengthMM < model.MinLengthMM || s.LengthMM > model.MaxLengthMM {
		base.Setting = base.Setting.AtLength(4000)
	}
	if !f.set("units") && f.scheme == "" {
		// Results in the units the grid was typed in (--length is not a building flag).
		for _, t := range []string{bf.storeys, bf.baysX, bf.baysY} {
			if sys, ok := units.SystemOf(strings.Split(t, ",")[0]); ok {
				base.Units = model.Units(sys)
				break
			}
		}
	}
	sc, err := f.build(base)
	if err != nil {
		return sc, err
	}
	l := sc.Load
	b.FloorDeadKPa, b.FloorLiveKPa, b.RoofDeadKPa, b.RoofLiveKPa, b.SnowKPa = l.FloorDeadKPa, l.FloorLiveKPa, l.RoofDeadKPa, l.RoofLiveKPa, l.SnowKPa
	b.Occupancy, b.LiveReduction = l.Occupancy, l.LiveReduction
	if err := b.Validate(); err != nil {
		var fe *model.FieldError
		if errors.As(err, &fe) {
			if name, ok := buildingFieldFlags[fe.Field]; ok && f.set(name) {
				return sc, usagef("--%s %q: not accepted; give %s", name, f.fs.Lookup(name).Value.String(), fe.Accepted)
			}
			return sc, usagef("%s %q: not accepted; give %s", fe.Field, fe.Value, fe.Accepted)
		}
		return sc, err
	}
	sc.Building = &b
	return sc, nil
}

func runBuilding(args []string, stdout, stderr io.Writer) error {
	f := newSchemeFlags("building", stderr)
	bf := &buildingFlags{}
	fs := f.fs
	fs.StringVar(&bf.baysX, "bays-x", "", "bay spacings along x, a comma list, e.g. 9m,9m,7.5m (default 9m,9m,9m)")
	fs.StringVar(&bf.baysY, "bays-y", "", "bay spacings along y, e.g. 7.5m,7.5m (default)")
	fs.StringVar(&bf.storeys, "storeys", "", "storey heights from the ground up, e.g. 4.2m,3.6m,3.6m,3.6m (default)")
	fs.StringVar(&bf.facade, "facade", "", "façade dead load per metre of building edge at every level, carried by edge and corner columns, e.g. 8kN/m, 0.5kip/ft (default 0)")
	fs.StringVar(&bf.overhang, "overhang", "", "slab overhang past the outer grid lines (cantilever slabs: edge KLL 3, corner KLL 2), e.g. 1.5m (default 0)")
	fs.StringVar(&bf.changeEvery, "change-every", "", "storeys a column keeps its size: sizes change only at storeys 1 + k·N (default 2)")
	fs.StringVar(&bf.planFamily, "plan-family", "", "family the floor plan draws, e.g. W (default: the best over the whole building)")
	fs.StringVar(&bf.planStorey, "plan-storey", "", "storey the floor plan shows, 1 the ground (default 1)")
	asJSON := fs.Bool("json", false, "write JSON: positions with each storey's loads and best sizes, and each family's totals")
	out := fs.String("out", "", "also draw the floor plan and the elevation to this file (.png, .svg or .pdf; the elevation beside it as NAME-elevation.EXT)")
	dxf := fs.String("dxf", "", "also write the floor plan as a DXF drawing in millimetres")
	sc, err := buildingScheme(f, bf, args)
	if err != nil {
		return err
	}
	s, err := model.NewSchedule(sc)
	if err != nil {
		var fe *model.FieldError
		if errors.As(err, &fe) {
			return f.fieldUsage(fe)
		}
		return err
	}
	if *out != "" {
		if err := writeBuildingPictures(s, *out); err != nil {
			return err
		}
	}
	if *dxf != "" {
		if err := writeBuildingDXF(s, *dxf); err != nil {
			return err
		}
	}
	if *asJSON {
		fmt.Fprintln(stderr, model.Caution)
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		return enc.Encode(NewBuildingJSON(s))
	}
	printBuilding(stdout, s)
	return nil
}

// printBuilding writes the schedule as text: the takedown of each position,
// the sizes of each family, and the totals.
func printBuilding(w io.Writer, s *model.Schedule) {
	sc := s.Base.Scheme
	b := &s.Building
	sys := units.System(sc.Units)
	fmt.Fprintf(w, "Upright %s: %s, building of %s\n", Version, sc.Name, b.String())
	fmt.Fprintf(w, "%s, %s; ranked by %s over the whole building; sizes change every %d %s at most, never growing going up\n",
		endsText(sc.Setting), strings.ToUpper(string(sc.Setting.Method)), sc.Metric, b.ChangeEvery, plural(b.ChangeEvery, "storey", "storeys"))
	printFireLine(w, sc)
	fmt.Fprintln(w, "Each storey's column carries the floors above, the roof, the façade of the levels above and the columns above (ASCE 7-22 4.7 live-load reduction with each position's KLL).")
	for pi := range s.Positions {
		ps := &s.Positions[pi]
		fmt.Fprintf(w, "\n%s columns: %d, tributary area %s per floor, KLL %g", ps.Position, ps.Count, units.Area(ps.TributaryM2, sys), ps.KLL)
		if ps.FacadeM > 0 && b.FacadeKNPerM > 0 {
			fmt.Fprintf(w, ", façade %s of edge", units.Length(ps.FacadeM*1000, sys))
		}
		fmt.Fprintln(w)
		tw := tabwriter.NewWriter(w, 2, 4, 2, ' ', 0)
		fmt.Fprintln(tw, "Storey\tHeight\tD\tL (reduced)\tLr\tS\tDemand (no column weight)")
		for k := len(ps.Storeys) - 1; k >= 0; k-- {
			sl := &ps.Storeys[k]
			fmt.Fprintf(tw, "%d\t%s\t%s\t%s\t%s\t%s\t%s\n", sl.Storey, units.Length(sl.LengthMM, sys), units.Force(sl.Loads.DeadN, sys),
				units.Force(sl.Loads.LiveN, sys), units.Force(sl.Loads.RoofLiveN, sys), units.Force(sl.Loads.SnowN, sys), units.Force(sl.Loads.DemandN, sys))
		}
		tw.Flush()
		tw = tabwriter.NewWriter(w, 2, 4, 2, ' ', 0)
		for fi, f := range s.Base.Families {
			fmt.Fprintf(tw, "  %s\t%s\n", f.Name(), StackText(ps.Best[fi]))
		}
		tw.Flush()
	}
	fmt.Fprintf(w, "\nTotals (gross floor area %s):\n", units.Area(b.GrossFloorAreaM2(), sys))
	tw := tabwriter.NewWriter(w, 2, 4, 2, ' ', 0)
	fmt.Fprintln(tw, "Family\tMaterial\tColumns\tLength\tSteel\tConcrete\tTimber\tCarbon (kg CO2e)\tColumn area\tShare")
	var missing []string
	for _, t := range s.Totals {
		if !t.Complete {
			missing = append(missing, t.Name)
			continue
		}
		fmt.Fprintf(tw, "%s\t%s\t%d\t%s\t%s\t%s\t%s\t%.0f\t%s\t%.2f%%\n", t.Name, t.Material, t.Columns, totalLength(t.LengthM, sys),
			orDash(t.SteelKg, units.Mass(t.SteelKg, sys)), units.Volume(t.ConcreteM3, sys, 2), units.Volume(t.TimberM3, sys, 2), t.CarbonKg, units.Area(t.ColumnAreaTotal, sys), 100*t.Share())
	}
	tw.Flush()
	if len(missing) > 0 {
		fmt.Fprintf(w, "No size carries every storey in: %s.\n", strings.Join(missing, ", "))
	}
	if bi := s.Best(); bi >= 0 {
		fmt.Fprintf(w, "\nBest over the whole building by %s: %s\n", sc.Metric, s.Totals[bi].Name)
	}
	fmt.Fprintf(w, "\n%s\n", model.Caution)
}

// plural picks the singular or plural noun for a count.
func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}

// orDash is text, or a dash when v is 0.
func orDash(v float64, text string) string {
	if v == 0 {
		return "—"
	}
	return text
}

// StackText describes one family's stack at a position from the ground up,
// one entry per size: "storeys 1–2 W10X45; 3–4 W8X28", or where no size
// carries a storey, "storeys 1–2 none".
func StackText(stack []model.StackEntry) string {
	var parts []string
	for k := 0; k < len(stack); {
		j := k
		for j+1 < len(stack) && stack[j+1].Index == stack[k].Index {
			j++
		}
		name := "none"
		if stack[k].Index >= 0 {
			name = stack[k].Row.Static.Designation
		}
		span := fmt.Sprintf("%d", k+1)
		if j > k {
			span = fmt.Sprintf("%d–%d", k+1, j+1)
		}
		parts = append(parts, span+" "+name)
		k = j + 1
	}
	return "storeys " + strings.Join(parts, "; ")
}

// totalLength formats a total column length, whole feet or metres to 0.1 m.
func totalLength(m float64, sys units.System) string {
	if sys == units.US {
		return fmt.Sprintf("%.0f ft", m*1000/units.MMPerFoot)
	}
	return fmt.Sprintf("%.1f m", m)
}
