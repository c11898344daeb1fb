package report

import (
	"bytes"
	"fmt"
	"strings"

	"codeberg.org/go-pdf/fpdf"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
	"upright/ui/units"
)

// Building figure size in points.
const bldW, bldH = 720.0, 504.0

// buildingFacts is the building page's content: the schedule and its two
// drawings.
type buildingFacts struct {
	s                *model.Schedule
	fi               int // the family drawn
	planPNG, elevPNG []byte
	err              string // why the building could not be sized
}

// gatherBuilding sizes the scheme's building and draws its plan and
// elevation, when the scheme has a building.
func gatherBuilding(f *facts) error {
	sc := f.m.Scheme
	if sc.Building == nil {
		return nil
	}
	bf := &buildingFacts{fi: -1}
	f.building = bf
	s, err := model.NewSchedule(sc)
	if err != nil {
		bf.err = "The building could not be sized: " + err.Error()
		return nil
	}
	bf.s = s
	bf.fi = chart.PlanFamily(s)
	if bf.fi < 0 {
		return nil
	}
	size := plots.Size{Width: bldW, Height: bldH, DPI: f.opt.ChartDPI}
	p := chart.FloorPlan(s, bf.fi, chart.PlanStorey(s))
	p.Caution = "" // the page carries the caution panel and footer
	var buf bytes.Buffer
	if err := plots.WriteFloorPlan(&buf, plots.PNG, &p, size); err != nil {
		return fmt.Errorf("report: drawing the floor plan: %w", err)
	}
	bf.planPNG = append([]byte(nil), buf.Bytes()...)
	buf.Reset()
	e := chart.Elevation(s, bf.fi)
	e.Caution = ""
	if err := plots.WriteElevation(&buf, plots.PNG, &e, size); err != nil {
		return fmt.Errorf("report: drawing the elevation: %w", err)
	}
	bf.elevPNG = buf.Bytes()
	return nil
}

// stackWords describes one family's stack from the ground up: "1–2 W10X45;
// 3–4 W8X28".
func stackWords(stack []model.StackEntry) string {
	var parts []string
	for k := 0; k < len(stack); {
		j := k
		for j+1 < len(stack) && stack[j+1].Index == stack[k].Index {
			j++
		}
		name := "none works"
		if stack[k].Index >= 0 {
			name = stack[k].Row.Static.Designation
		}
		span := fmt.Sprint(k + 1)
		if j > k {
			span = fmt.Sprintf("%d–%d", k+1, j+1)
		}
		parts = append(parts, span+": "+name)
		k = j + 1
	}
	return strings.Join(parts, "; ")
}

// buildingSection is the building page: what was taken down, each family's
// totals, the schedule of sizes per position and storey, the plan and the
// elevation.
func buildingSection(d *doc, f *facts) {
	bf := f.building
	if bf == nil {
		return
	}
	d.pdf.AddPage()
	d.heading("The building: every column taken down and sized", 20)
	if bf.s == nil {
		d.para(bf.err, "I", sizeBody)
		return
	}
	s := bf.s
	b := &s.Building
	sys := f.sys
	sc := s.Base.Scheme
	var bays []string
	for _, x := range b.BaysXMM {
		bays = append(bays, units.Length(x, sys))
	}
	var baysY []string
	for _, y := range b.BaysYMM {
		baysY = append(baysY, units.Length(y, sys))
	}
	var storeys []string
	for _, h := range b.StoreysMM {
		storeys = append(storeys, units.Length(h, sys))
	}
	text := fmt.Sprintf("A grid of %s: bays of %s along x and %s along y; storeys of %s from the ground up; gross floor area %s. Floors carry %s dead and %s live (%s), the roof %s dead, %s roof live and %s snow",
		b.String(), strings.Join(bays, ", "), strings.Join(baysY, ", "), strings.Join(storeys, ", "), units.Area(b.GrossFloorAreaM2(), sys),
		units.Pressure(b.FloorDeadKPa, sys), units.Pressure(b.FloorLiveKPa, sys), liveReductionWords(b),
		units.Pressure(b.RoofDeadKPa, sys), units.Pressure(b.RoofLiveKPa, sys), units.Pressure(b.SnowKPa, sys))
	if b.FacadeKNPerM > 0 {
		text += fmt.Sprintf("; the façade adds %s per metre of edge at every level, on the edge and corner columns", units.LineLoad(b.FacadeKNPerM, sys))
	}
	text += fmt.Sprintf(". Each storey's column carries the floors above it, the roof, the façade of the levels above and the weight of the columns above; it is checked as a %s column of the storey's height against every load combination, as the single column is. Going down from the roof a size is kept for %d %s at a time and never gets smaller going down (nor larger going up). Each position is sized for its largest tributary area.",
		sc.Setting.Ends, b.ChangeEvery, plural(b.ChangeEvery, "storey", "storeys"))
	d.para(text, "", sizeBody)
	d.pdf.Ln(1.5)
	// Positions.
	cols := []column{{"Position", 1.3, "L"}, {"Columns", 0.8, "R"}, {"Tributary area per floor", 1.4, "R"}, {"KLL", 0.6, "R"},
		{"Ground storey D", 1.2, "R"}, {"L (reduced)", 1.1, "R"}, {"Demand without column weight", 1.6, "R"}}
	var rows []row
	for pi := range s.Positions {
		ps := &s.Positions[pi]
		g := &ps.Storeys[0].Loads
		rows = append(rows, row{cells: []string{string(ps.Position), fmt.Sprint(ps.Count), units.Area(ps.TributaryM2, sys),
			fmt.Sprintf("%g", ps.KLL), forceText(g.DeadN, sys), forceText(g.LiveN, sys), forceText(g.DemandN, sys)}})
	}
	d.table(cols, rows)
	d.pdf.Ln(2)
	// Totals.
	d.subheading("Totals per family (columns with their fire protection under a rating)")
	cols = []column{{"Family", 1.7, "L"}, {"Length", 1, "R"}, {"Steel", 1, "R"}, {"Concrete", 1, "R"}, {"Timber", 1, "R"},
		{"Carbon, kg CO2e", 1.1, "R"}, {"Column floor area", 1.1, "R"}, {"Share of floor", 0.9, "R"}}
	rows = nil
	best := s.Best()
	var missing []string
	for fi, t := range s.Totals {
		if !t.Complete {
			missing = append(missing, t.Name)
			continue
		}
		steel := "—"
		if t.SteelKg > 0 {
			steel = units.Mass(t.SteelKg, sys)
		}
		r := row{cells: []string{t.Name, totalLength(t.LengthM, sys), steel, units.Volume(t.ConcreteM3, sys, 1), units.Volume(t.TimberM3, sys, 1),
			fmt.Sprintf("%.0f", t.CarbonKg), units.Area(t.ColumnAreaTotal, sys), fmt.Sprintf("%.2f%%", 100*t.Share())}}
		if fi == best {
			r.style = rowBest
		}
		rows = append(rows, r)
	}
	d.table(cols, rows)
	note := fmt.Sprintf("%d columns on each floor. The highlighted family is the best over the whole building by %s.", s.Totals[0].Columns, metricWords(sc.Metric))
	if len(missing) > 0 {
		note += " No size carries every storey in: " + strings.Join(missing, ", ") + "."
	}
	d.para(note, "I", sizeSmall)
	d.pdf.Ln(2)
	// Schedule.
	d.subheading("Schedule: each family's size by storey, from the ground up")
	cols = []column{{"Family", 1.5, "L"}, {"Storeys: size", 5.5, "L"}}
	rows = nil
	for pi := range s.Positions {
		ps := &s.Positions[pi]
		rows = append(rows, row{cells: []string{fmt.Sprintf("%s columns (%d)", ps.Position, ps.Count), ""}, style: rowGroup})
		for fi, fam := range s.Base.Families {
			rows = append(rows, row{cells: []string{fam.Name(), stackWords(ps.Best[fi])}})
		}
	}
	d.table(cols, rows)
	// Drawings.
	if bf.planPNG != nil {
		buildingImage(d, "bldplan", "Floor plan", bf.planPNG)
		buildingImage(d, "bldelev", "Column stacks", bf.elevPNG)
	}
}

// buildingImage places one of the building's drawings at the page width.
func buildingImage(d *doc, name, title string, png []byte) {
	p := d.pdf
	imgW := d.width
	imgH := imgW * bldH / bldW
	d.heading(title, imgH+6)
	info := p.RegisterImageOptionsReader(name, fpdf.ImageOptions{ImageType: "PNG", ReadDpi: false}, bytes.NewReader(png))
	if info == nil || p.Error() != nil {
		d.para("The drawing could not be embedded.", "I", sizeBody)
		return
	}
	y := p.GetY()
	p.ImageOptions(name, d.left, y, imgW, imgH, false, fpdf.ImageOptions{ImageType: "PNG"}, 0, "")
	p.SetY(y + imgH + 1.5)
}

// liveReductionWords says how the floor live load is reduced.
func liveReductionWords(b *model.Building) string {
	if !b.LiveReduction {
		return "not reduced"
	}
	return "reduced by ASCE 7-22 4.7 with each position's KLL"
}

// plural picks the singular or plural noun for a count.
func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}

// totalLength formats a total column length, whole feet or metres to 0.1 m.
func totalLength(m float64, sys units.System) string {
	if sys == units.US {
		return fmt.Sprintf("%.0f ft", m*1000/units.MMPerFoot)
	}
	return fmt.Sprintf("%.1f m", m)
}
