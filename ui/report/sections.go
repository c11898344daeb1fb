package report

import (
	"bytes"
	"fmt"
	"math"
	"strings"

	"codeberg.org/go-pdf/fpdf"

	"upright/ui/model"
	"upright/ui/units"
)

// compose lays out every section of the report.
func compose(f *facts) *doc {
	sc := f.m.Scheme
	name := schemeName(sc)
	paper := "Letter"
	if f.sys == units.SI {
		paper = "A4"
	}
	foot := "Upright"
	if f.opt.Version != "" {
		foot += " " + f.opt.Version
	}
	foot += " · " + name + " · Preliminary: verify with a licensed structural engineer"
	d := newDoc(paper, foot)
	p := d.pdf
	p.SetTitle(printable("Column scheme comparison: "+name), true)
	p.SetSubject("Preliminary column sizes for scheme comparison", true)
	p.SetAuthor("Upright", true)
	p.SetCreator(strings.TrimSpace("Upright "+f.opt.Version), true)
	p.SetCreationDate(f.opt.Date)
	p.SetModificationDate(f.opt.Date)
	p.AddPage()

	titleBlock(d, f, name)
	d.panel("Preliminary sizing, not a design", model.Caution+" The full cautions are at the end of this report.", sizeBody-0.5)
	summary(d, f)
	sectionsFigure(d, f)
	inputs(d, f)
	chartSection(d, f)
	mapSection(d, f)
	variantsSection(d, f)
	workingSizes(d, f)
	fireSection(d, f)
	checksSection(d, f)
	crossoverSection(d, f)
	takedownSection(d, f)
	buildingSection(d, f)
	assumptions(d, f)
	cautions(d)
	return d
}

// schemeName is the scheme's name, or a placeholder for an unnamed scheme.
func schemeName(sc model.Scheme) string {
	if strings.TrimSpace(sc.Name) == "" {
		return "Untitled scheme"
	}
	return sc.Name
}

func titleBlock(d *doc, f *facts, name string) {
	p := d.pdf
	d.font("B", sizeSmall)
	d.ink(inkAccent)
	p.SetX(d.left)
	p.CellFormat(d.width, 4.5, "UPRIGHT  ·  COLUMN SCHEME COMPARISON", "", 1, "L", false, 0, "")
	p.Ln(1)
	d.font("B", sizeTitle)
	d.ink(inkText)
	p.SetX(d.left)
	p.MultiCell(d.width, lineH(sizeTitle), printable(name), "", "L", false)
	p.Ln(1)
	d.font("", sizeBody)
	d.ink(inkMuted)
	meta := "Prepared " + f.opt.Date.Format("2 January 2006")
	if f.opt.Version != "" {
		meta += " with Upright " + f.opt.Version
	}
	meta += " · " + systemName(f.sys) + " units · " + methodName(f.m.Scheme.Setting.Method)
	p.SetX(d.left)
	p.CellFormat(d.width, lineH(sizeBody), printable(meta), "", 1, "L", false, 0, "")
	p.Ln(3)
}

func systemName(s units.System) string {
	if s == units.SI {
		return "SI"
	}
	return "US customary"
}

func methodName(m model.Method) string {
	if m == model.ASD {
		return "ASD (allowable strength design)"
	}
	return "LRFD (load and resistance factor design)"
}

// strengthSymbol is the name of the strength compared with the demand.
func strengthSymbol(m model.Method) string {
	if m == model.ASD {
		return "Pn/Ω"
	}
	return "φPn"
}

// both formats a value in the scheme's units with the other system after it.
func (f *facts) both(format func(float64, units.System) string, v float64) string {
	return format(v, f.sys) + " (" + format(v, f.other) + ")"
}

func (f *facts) force(n float64) string { return f.both(forceText, n) }

// forceText formats a force with three significant figures at least.
func forceText(n float64, sys units.System) string {
	v, u := units.ForceValue(n, sys)
	switch a := math.Abs(v); {
	case a >= 100:
		return fmt.Sprintf("%s %s", thousands(v, 0), u)
	case a >= 10:
		return fmt.Sprintf("%.1f %s", v, u)
	}
	return fmt.Sprintf("%.2f %s", v, u)
}

// thousands formats v with the given decimals and comma thousands separators.
func thousands(v float64, decimals int) string {
	s := fmt.Sprintf("%.*f", decimals, math.Abs(v))
	intPart, frac, _ := strings.Cut(s, ".")
	var b strings.Builder
	if v < 0 && s != strings.Repeat("0", len(s)) {
		b.WriteByte('-')
	}
	for i, c := range intPart {
		if i > 0 && (len(intPart)-i)%3 == 0 {
			b.WriteByte(',')
		}
		b.WriteRune(c)
	}
	if frac != "" {
		b.WriteByte('.')
		b.WriteString(frac)
	}
	return b.String()
}

// familyLabel names a family for the reader, e.g. "Steel · W".
func familyLabel(fam model.Family) string {
	mat := fam.Material()
	if mat != "" {
		mat = strings.ToUpper(mat[:1]) + mat[1:]
	}
	return mat + " · " + fam.Name()
}

// demandWords describes the governing demand.
func demandWords(f *facts) string {
	ls := f.m.Loads
	s := f.force(ls.DemandN)
	if ls.Governing >= 0 && ls.Governing < len(ls.Combos) {
		c := ls.Combos[ls.Governing]
		s += " from the load takedown, governed by " + c.Name + " (" + c.Clause + ")"
	} else if f.m.Scheme.Setting.Method == model.ASD {
		s += " (typed service load)"
	} else {
		s += " (typed factored load)"
	}
	return s
}

func endsWords(s model.Setting) string {
	if s.K > 0 {
		return fmt.Sprintf("%s ends with a typed effective-length factor K = %.2f", s.Ends, s.K)
	}
	return string(s.Ends) + " ends"
}

func metricWords(m model.Metric) string {
	switch m {
	case model.ByFootprint:
		return "plan footprint"
	case model.ByCarbon:
		return "embodied carbon (A1–A3)"
	}
	return "weight"
}

func summary(d *doc, f *facts) {
	sc := f.m.Scheme
	s := sc.Setting
	d.heading("Summary", 30)
	text := fmt.Sprintf("At an unbraced length of %s with %s, the governing axial demand is %s",
		f.both(units.Length, s.LengthMM), endsWords(s), demandWords(f))
	text += model.SelfWeightWords(&sc) + "."
	if len(f.m.Families) == 0 {
		d.para(text+" No material family is available in this build or switched on in the scheme, so there is nothing to compare.", "", sizeBody)
		return
	}
	best := f.res.BestOverall()
	if best != nil {
		fam := f.m.Families[best.Family]
		text += fmt.Sprintf(" Ranked by %s, the best working column overall is %s (%s): %s, %s plan, %s per column.",
			metricWords(sc.Metric), best.Static.Designation, familyLabel(fam),
			units.MassPerLength(best.Static.MassKgPerM, f.sys), units.PlanSize(best.Static.FootprintMM, f.sys), scoreText(f, best))
		if nt := f.m.NearTieNote(f.res); nt != "" {
			text += " Near-ties, " + nt + "."
		}
	} else {
		text += " No candidate of any family carries this demand at this length."
	}
	d.para(text, "", sizeBody)
	d.pdf.Ln(2)
	sym := strengthSymbol(s.Method)
	_, fu := units.ForceValue(0, f.sys)
	cols := []column{
		{"Family", 1.5, "L"}, {"Best working size", 2.4, "L"}, {"Plan", 1.35, "L"},
		{"Weight", 1.05, "R"}, {sym + " (" + fu + ")", 1.0, "R"}, {"Utilization", 0.95, "R"}, {"Sizes that work", 0.95, "R"},
	}
	var rows []row
	for fi := range f.res.Families {
		fr := &f.res.Families[fi]
		fam := f.m.Families[fr.Family]
		r := fr.Best()
		count := fmt.Sprintf("%d of %d", fr.Working, len(fr.Rows))
		if r == nil {
			rows = append(rows, row{cells: []string{familyLabel(fam), "none works at this length", "", "", "", "", count}})
			continue
		}
		style := rowPlain
		if best != nil && r == best {
			style = rowBest
		}
		rows = append(rows, row{style: style, cells: []string{
			familyLabel(fam), r.Static.Designation, units.PlanSize(r.Static.FootprintMM, f.sys),
			units.MassPerLength(r.Static.MassKgPerM, f.sys), capacityText(r.CapacityN, f.sys), utilText(r), count,
		}})
	}
	d.table(cols, rows)
	if best != nil {
		d.font("I", sizeSmall)
		d.ink(inkMuted)
		d.pdf.SetX(d.left)
		d.pdf.MultiCell(d.width, lineH(sizeSmall), printable("The highlighted row is the best overall by "+metricWords(sc.Metric)+". Utilization is the demand (with the column's own weight) over "+sym+"; a size works when it is ≤ 1.00."), "", "L", false)
	}
}

func capacityText(n float64, sys units.System) string {
	v, _ := units.ForceValue(n, sys)
	return thousands(v, 0)
}

func utilText(r *model.Row) string {
	if math.IsInf(r.Util, 0) || math.IsNaN(r.Util) {
		return "—"
	}
	return fmt.Sprintf("%.2f", r.Util)
}

// scoreText formats a row's ranking score per column.
func scoreText(f *facts, r *model.Row) string {
	switch f.m.Scheme.Metric {
	case model.ByFootprint:
		return units.PlanArea(r.Static.PlanAreaMM2, f.sys) + " of plan"
	case model.ByCarbon:
		return thousands(r.CarbonKg, 0) + " kg CO2e"
	}
	return units.Mass(r.Score, f.sys)
}

func inputs(d *doc, f *facts) {
	sc := f.m.Scheme
	s := sc.Setting
	l := sc.Load
	d.heading("Scheme inputs", 40)
	cols := []column{{"Input", 2.2, "L"}, {"Value", 2.6, "L"}, {"In " + systemName(f.other) + " units", 2.2, "L"}}
	var rows []row
	add := func(label, v, alt string) { rows = append(rows, row{cells: []string{label, v, alt}}) }
	addQ := func(label string, format func(float64, units.System) string, v float64) {
		add(label, format(v, f.sys), format(v, f.other))
	}
	addQ("Unbraced length (strong axis)", units.Length, s.LengthMM)
	addQ("Unbraced length (weak axis)", units.Length, s.WeakMM)
	kText := "recommended design value of each material for the end condition (each table recalled from memory)"
	if s.K > 0 {
		kText = fmt.Sprintf("K = %.2f, typed", s.K)
	}
	add("End conditions (bottom–top)", string(s.Ends), "")
	add("Effective-length factor", kText, "")
	add("Design method", methodName(s.Method), "")
	if l.Mode == model.LoadDirect {
		kind := "factored"
		if s.Method == model.ASD {
			kind = "service"
		}
		add("Axial load (typed, "+kind+")", forceText(l.DirectN, f.sys), forceText(l.DirectN, f.other))
	} else {
		add("Axial load", "from a load takedown", "")
		addQ("Tributary area per floor", units.Area, l.TributaryM2)
		add("Floors carried below the roof", fmt.Sprint(l.Floors), "")
		if l.Floors > 0 {
			addQ("Floor dead load (incl. slab)", units.Pressure, l.FloorDeadKPa)
			addQ("Floor live load (unreduced)", units.Pressure, l.FloorLiveKPa)
		}
		addQ("Roof dead load", units.Pressure, l.RoofDeadKPa)
		addQ("Roof live load Lr", units.Pressure, l.RoofLiveKPa)
		addQ("Roof snow load S", units.Pressure, l.SnowKPa)
		red := "not applied"
		if l.LiveReduction {
			kll := l.KLL
			if kll == 0 {
				kll = model.DefaultKLL
			}
			red = fmt.Sprintf("ASCE 7-22 4.7, KLL = %g", kll)
		}
		add("Live-load reduction", red, "")
		occ := l.Occupancy
		if occ == "" {
			occ = model.OccGeneral
		}
		add("Occupancy", occ, "")
	}
	add("Governing demand (before self-weight)", forceText(f.m.Loads.DemandN, f.sys), forceText(f.m.Loads.DemandN, f.other))
	sw := "not added"
	if sc.SelfWeight {
		sw = "added as dead load to every combination"
	}
	add("Column self-weight", sw, "")
	add("Ranked by", metricWords(sc.Metric), "")
	add("Families compared", familiesText(f), "")
	if sc.Steel.FyMPa > 0 {
		addQ("Steel yield stress Fy (all families)", units.Stress, sc.Steel.FyMPa)
	}
	c := sc.Concrete
	if c.FcMPa > 0 {
		addQ("Concrete strength f'c", units.Stress, c.FcMPa)
	}
	add("Concrete reinforcement", fmt.Sprintf("Grade %d bars, ρ up to %.1f%%, %s", c.BarGrade, c.RhoMax*100, transverseWords(c.Transverse)), "")
	t := sc.Timber
	add("Timber", timberWords(t), "")
	if compositeOn(sc) {
		add("Composite (filled HSS)", compositeWords(f), "")
	}
	add("Fire-resistance rating", fireRatingWords(sc), "")
	d.table(cols, rows)
}

func transverseWords(t string) string {
	switch t {
	case "ties":
		return "tied columns"
	case "spiral":
		return "spiral columns"
	}
	return "tied and spiral columns"
}

func timberWords(t model.TimberOptions) string {
	var parts []string
	switch {
	case t.Sawn && t.Glulam:
		parts = append(parts, "sawn "+t.Species+" "+t.Grade+" and glulam")
	case t.Sawn:
		parts = append(parts, "sawn "+t.Species+" "+t.Grade)
	case t.Glulam:
		parts = append(parts, "glulam only")
	default:
		parts = append(parts, "no timber products switched on")
	}
	if t.Wet {
		parts = append(parts, "wet service")
	}
	if t.Incised {
		parts = append(parts, "incised")
	}
	if t.Hot {
		parts = append(parts, "100–125 °F service")
	}
	if t.Duration != "" {
		parts = append(parts, "load duration "+t.Duration)
	}
	return strings.Join(parts, ", ")
}

// familiesText lists the families the model built, grouped by material.
func familiesText(f *facts) string {
	if len(f.m.Families) == 0 {
		return "none available"
	}
	var order []string
	byMat := map[string][]string{}
	for _, fam := range f.m.Families {
		mat := fam.Material()
		if _, ok := byMat[mat]; !ok {
			order = append(order, mat)
		}
		byMat[mat] = append(byMat[mat], fam.Name())
	}
	var parts []string
	for _, mat := range order {
		label := mat
		if label != "" {
			label = strings.ToUpper(label[:1]) + label[1:]
		}
		parts = append(parts, label+": "+strings.Join(byMat[mat], ", "))
	}
	return strings.Join(parts, "; ")
}

func chartSection(d *doc, f *facts) {
	s := f.m.Scheme.Setting
	sym := strengthSymbol(s.Method)
	name := "Design strength"
	if s.Method == model.ASD {
		name = "Allowable strength"
	}
	if f.chartPNG == nil {
		d.heading(name+" against unbraced length", 10)
		d.para(f.chartNote, "I", sizeBody)
		return
	}
	p := d.pdf
	imgW := d.width
	imgH := imgW * 430 / 720
	d.heading(name+" against unbraced length", imgH+14)
	info := p.RegisterImageOptionsReader("chart", fpdf.ImageOptions{ImageType: "PNG", ReadDpi: false}, bytes.NewReader(f.chartPNG))
	if info == nil || p.Error() != nil {
		d.para("The chart could not be embedded.", "I", sizeBody)
		return
	}
	y := p.GetY()
	p.ImageOptions("chart", d.left, y, imgW, imgH, false, fpdf.ImageOptions{ImageType: "PNG"}, 0, "")
	p.SetY(y + imgH + 1.5)
	caption := fmt.Sprintf("%s of each family's best working size from %s to %s. The dashed black line is the demand before each column's own weight, which is added candidate by candidate; the vertical line marks the scheme's length, %s. Rings mark where a size stops working or the best family changes.",
		sym, units.Length(f.opt.Range.FromMM, f.sys), units.Length(f.opt.Range.ToMM, f.sys), units.Length(s.LengthMM, f.sys))
	d.font("I", sizeSmall)
	d.ink(inkMuted)
	p.SetX(d.left)
	p.MultiCell(d.width, lineH(sizeSmall), printable(caption), "", "L", false)
}

func workingSizes(d *doc, f *facts) {
	if len(f.m.Families) == 0 {
		return
	}
	sc := f.m.Scheme
	sym := strengthSymbol(sc.Setting.Method)
	_, fu := units.ForceValue(0, f.sys)
	d.heading("Working sizes by family", 30)
	d.para(fmt.Sprintf("For each family, the %d best sizes that carry the demand at %s, ranked by %s. Weight is per unit length; the column's weight is over its full height.",
		f.opt.TopN, units.Length(sc.Setting.LengthMM, f.sys), metricWords(sc.Metric)), "", sizeBody)
	d.pdf.Ln(1.5)
	scoreTitle := "Column weight (" + massUnit(f.sys) + ")"
	switch sc.Metric {
	case model.ByFootprint:
		scoreTitle = "Plan area (" + areaUnit(f.sys) + ")"
	case model.ByCarbon:
		scoreTitle = "Embodied carbon (kg CO2e)"
	}
	cols := []column{
		{"#", 0.3, "R"}, {"Size", 2.3, "L"}, {"Plan", 1.5, "L"}, {"Weight", 1.1, "R"}, {scoreTitle, 1.05, "R"},
		{sym + " (" + fu + ")", 0.85, "R"}, {"Util.", 0.55, "R"}, {"Governs", 2.6, "L"},
	}
	var rows []row
	for fi := range f.res.Families {
		fr := &f.res.Families[fi]
		fam := f.m.Families[fr.Family]
		rows = append(rows, row{style: rowGroup, cells: []string{fmt.Sprintf("%s: %d of %d sizes work", familyLabel(fam), fr.Working, len(fr.Rows))}})
		if fr.Working == 0 {
			if len(fr.Rows) > 0 {
				r := &fr.Rows[0]
				rows = append(rows, row{cells: []string{"", "none works; closest: " + r.Static.Designation, units.PlanSize(r.Static.FootprintMM, f.sys),
					units.MassPerLength(r.Static.MassKgPerM, f.sys), scoreCell(f, r), capacityText(r.CapacityN, f.sys), utilText(r), governsText(r)}})
			}
			continue
		}
		n := min(fr.Working, f.opt.TopN)
		for i := 0; i < n; i++ {
			r := &fr.Rows[i]
			style := rowPlain
			if i == 0 {
				style = rowBest
			}
			rows = append(rows, row{style: style, cells: []string{fmt.Sprint(i + 1), r.Static.Designation, units.PlanSize(r.Static.FootprintMM, f.sys),
				units.MassPerLength(r.Static.MassKgPerM, f.sys), scoreCell(f, r), capacityText(r.CapacityN, f.sys), utilText(r), governsText(r)}})
		}
	}
	d.table(cols, rows)
}

func governsText(r *model.Row) string {
	if !r.Permitted && r.Reason != "" {
		return r.Reason
	}
	if _, why := model.LimitMark(&r.Quick); why != "" {
		return r.Governing + "; " + model.LimitMarkText + " " + why
	}
	return r.Governing
}

// scoreCell formats the ranking score of a row for the table, as a number
// in the unit the column heading names.
func scoreCell(f *facts, r *model.Row) string {
	switch f.m.Scheme.Metric {
	case model.ByFootprint:
		if f.sys == units.SI {
			return fmt.Sprintf("%.3f", r.Static.PlanAreaMM2/1e6)
		}
		return thousands(r.Static.PlanAreaMM2/units.MM2PerIn2, 0)
	case model.ByCarbon:
		return thousands(r.CarbonKg, 0)
	}
	if f.sys == units.SI {
		return thousands(r.Score, 0)
	}
	return thousands(r.Score/units.KgPerLb, 0)
}

func massUnit(sys units.System) string {
	if sys == units.SI {
		return "kg"
	}
	return "lb"
}

func areaUnit(sys units.System) string {
	if sys == units.SI {
		return "m²"
	}
	return "in²"
}

// describe says in words what changes at a crossover.
func describe(x model.Crossover) string {
	switch x.Kind {
	case model.KindReach:
		return x.From + " (" + x.Family + ") stops carrying the demand beyond this length"
	case model.KindSize:
		if x.To == "" {
			return x.From + " is the last " + x.Family + " size that works; none works beyond"
		}
		return x.Family + ": the best size changes from " + x.From + " to " + x.To
	case model.KindFamily:
		if x.To == "" {
			return "beyond this length no family works (last: " + x.From + ", " + x.FromDesignation + ")"
		}
		s := "the best family changes from " + x.From + " (" + x.FromDesignation + ") to " + x.To + " (" + x.ToDesignation + ")"
		if nt := x.NearTieText(); nt != "" {
			s += "; " + nt
		}
		return s
	}
	return x.From + " → " + x.To
}

func crossoverSection(d *doc, f *facts) {
	if len(f.m.Families) == 0 {
		return
	}
	L := f.m.Scheme.Setting.LengthMM
	d.heading("Crossover lengths", 30)
	d.para(fmt.Sprintf("Lengths between %s and %s at which the answer changes. Each length is the last at which the earlier answer still holds, found to within ±%.0f mm.",
		units.Length(f.opt.Range.FromMM, f.sys), units.Length(f.opt.Range.ToMM, f.sys), model.ToleranceMM), "", sizeBody)
	d.pdf.Ln(1.5)
	var fam, size []model.Crossover
	for _, x := range f.crossovers {
		switch x.Kind {
		case model.KindFamily:
			fam = append(fam, x)
		case model.KindSize:
			size = append(size, x)
		}
	}
	d.subheading("Best family overall")
	if len(fam) == 0 {
		d.para("The best family does not change in this range.", "I", sizeBody)
	} else {
		cols := []column{{"Length", 1.0, "L"}, {systemName(f.other), 1.0, "L"}, {"What changes", 5.0, "L"}}
		var rows []row
		for _, x := range fam {
			rows = append(rows, row{cells: []string{units.Length(x.LengthMM, f.sys), units.Length(x.LengthMM, f.other), describe(x)}})
		}
		d.table(cols, rows)
	}

	d.subheading("How far each family's best size goes")
	d.para(fmt.Sprintf("For each family, the best size at %s, the span of lengths over which it stays the best, and the size that takes over beyond it.",
		units.Length(L, f.sys)), "", sizeBody)
	d.pdf.Ln(1)
	cols := []column{{"Family", 1.6, "L"}, {"Best size", 2.3, "L"}, {"Best from", 0.95, "L"}, {"Best up to", 0.95, "L"}, {"Beyond that", 2.3, "L"}}
	var rows []row
	for fi := range f.res.Families {
		fr := &f.res.Families[fi]
		fm := f.m.Families[fr.Family]
		b := fr.Best()
		if b == nil {
			rows = append(rows, row{cells: []string{familyLabel(fm), "none works at this length", "", "", ""}})
			continue
		}
		from, upTo, next := units.Length(f.opt.Range.FromMM, f.sys)+" or less", "beyond "+units.Length(f.opt.Range.ToMM, f.sys), ""
		for _, x := range size {
			if x.Family != fm.Name() {
				continue
			}
			if x.LengthMM < L && x.To == b.Static.Designation {
				from = units.Length(x.LengthMM, f.sys)
			}
			if x.LengthMM >= L && x.From == b.Static.Designation && upTo[0] == 'b' {
				upTo = units.Length(x.LengthMM, f.sys)
				next = x.To
				if next == "" {
					next = "no size of this family works"
				}
			}
		}
		rows = append(rows, row{cells: []string{familyLabel(fm), b.Static.Designation, from, upTo, next}})
	}
	d.table(cols, rows)
	if !f.opt.FullCrossovers {
		n := len(size)
		if n > 0 {
			d.font("I", sizeSmall)
			d.ink(inkMuted)
			d.pdf.SetX(d.left)
			d.pdf.MultiCell(d.width, lineH(sizeSmall), printable(fmt.Sprintf("The full list of the %d changes of best size within the families over the range is left out of this report; the headless command lists them (upright crossovers).", n)), "", "L", false)
		}
		return
	}
	d.subheading("Every change of best size within a family")
	cols = []column{{"Length", 1.0, "L"}, {systemName(f.other), 1.0, "L"}, {"What changes", 5.0, "L"}}
	rows = nil
	for _, x := range size {
		rows = append(rows, row{cells: []string{units.Length(x.LengthMM, f.sys), units.Length(x.LengthMM, f.other), describe(x)}})
	}
	d.table(cols, rows)
}

func takedownSection(d *doc, f *facts) {
	ls := f.m.Loads
	if !ls.Known || len(ls.Combos) == 0 {
		return
	}
	if ls.Typed {
		d.heading("Load combinations from the typed load", 40)
		d.para(fmt.Sprintf("The typed load is split into service dead and live load by its dead share of %.2f (ASCE 7-22 2.3.1 or 2.4.1 applied backwards), and every combination follows as in a takedown.", ls.DeadN/(ls.DeadN+ls.LiveN)), "", sizeBody)
	} else {
		d.heading("Load takedown", 40)
		d.para(fmt.Sprintf("Service loads on the column from the takedown (ASCE 7-22). Floor live load is %s.", reductionWords(ls)), "", sizeBody)
	}
	d.pdf.Ln(1.5)
	cols := []column{{"Load", 3.0, "L"}, {"Service value", 1.6, "R"}, {systemName(f.other), 1.6, "R"}}
	rows := []row{
		{cells: []string{"Dead D", forceText(ls.DeadN, f.sys), forceText(ls.DeadN, f.other)}},
		{cells: []string{"Floor live Lo, unreduced", forceText(ls.LiveRawN, f.sys), forceText(ls.LiveRawN, f.other)}},
		{cells: []string{fmt.Sprintf("Floor live L, after reduction (× %.3f)", ls.Reduction), forceText(ls.LiveN, f.sys), forceText(ls.LiveN, f.other)}},
		{cells: []string{"Roof live Lr", forceText(ls.RoofLiveN, f.sys), forceText(ls.RoofLiveN, f.other)}},
		{cells: []string{"Snow S", forceText(ls.SnowN, f.sys), forceText(ls.SnowN, f.other)}},
	}
	if ls.Typed {
		rows = []row{
			{cells: []string{"Dead D", forceText(ls.DeadN, f.sys), forceText(ls.DeadN, f.other)}},
			{cells: []string{"Live L", forceText(ls.LiveN, f.sys), forceText(ls.LiveN, f.other)}},
		}
	}
	d.table(cols, rows)
	d.pdf.Ln(1)
	cols = []column{{"Combination", 2.6, "L"}, {"Clause", 2.4, "L"}, {"Axial load", 1.2, "R"}, {systemName(f.other), 1.2, "R"}}
	rows = nil
	for i, c := range ls.Combos {
		style := rowPlain
		name := c.Name
		if i == ls.Governing {
			style = rowBest
			name += " (governs)"
		}
		rows = append(rows, row{style: style, cells: []string{name, c.Clause, forceText(c.ValueN, f.sys), forceText(c.ValueN, f.other)}})
	}
	d.table(cols, rows)
}

func reductionWords(ls model.LoadSummary) string {
	if ls.Reduction >= 1 {
		return "not reduced"
	}
	return fmt.Sprintf("reduced by ASCE 7-22 4.7 to %.0f%% of its unreduced value", ls.Reduction*100)
}

// calcOf returns a number from the calculation trace of a family's best
// (or closest) candidate at the scheme's setting.
func calcOf(f *facts, fi int, keys ...string) (float64, string, bool) {
	fr := &f.res.Families[fi]
	if len(fr.Rows) == 0 {
		return 0, "", false
	}
	r := &fr.Rows[0]
	det := f.m.Detail(r.Family, r.Index, f.m.Scheme.Setting)
	for _, key := range keys {
		if v, ok := det.Calc[key].(float64); ok && v > 0 && !math.IsInf(v, 0) {
			src, _ := det.Calc[key+"_source"].(string)
			return v, src, true
		}
	}
	return 0, "", false
}

// kFactors lists the effective-length factors the families used, one entry
// per material unless its families differ.
func kFactors(f *facts) []string {
	type entry struct {
		mat, text string
		fams      []string
	}
	var out []*entry
	for fi := range f.res.Families {
		fam := f.m.Families[f.res.Families[fi].Family]
		k, src, ok := calcOf(f, fi, "K", "Ke", "k")
		if !ok {
			continue
		}
		text := fmt.Sprintf("K = %.2f", k)
		if src != "" {
			text += " (" + src + ")"
		}
		var e *entry
		for _, x := range out {
			if x.mat == fam.Material() && x.text == text {
				e = x
			}
		}
		if e == nil {
			e = &entry{mat: fam.Material(), text: text}
			out = append(out, e)
		}
		e.fams = append(e.fams, fam.Name())
	}
	count := map[string]int{}
	for _, e := range out {
		count[e.mat]++
	}
	var lines []string
	for _, e := range out {
		label := e.mat
		if label != "" {
			label = strings.ToUpper(label[:1]) + label[1:]
		}
		if count[e.mat] > 1 {
			label += " (" + strings.Join(e.fams, ", ") + ")"
		}
		lines = append(lines, label+" "+e.text)
	}
	return lines
}

func assumptions(d *doc, f *facts) {
	sc := f.m.Scheme
	s := sc.Setting
	ls := f.m.Loads
	d.heading("Method, code editions and assumptions", 30)
	var items []string
	if s.Method == model.ASD {
		items = append(items, fmt.Sprintf("Design method: ASD. Each column's allowable strength Pn/Ω is compared with the service demand. Concrete, designed by strength only, is checked against the factored (LRFD) combinations of the same loads and its strength restated on the service-load scale (the governing LRFD over the governing ASD load is α = %.2f here).", ls.StrengthPerService))
	} else {
		items = append(items, "Design method: LRFD. Each column's design strength φPn is compared with the factored demand.")
	}
	mats := map[string]bool{}
	for _, fam := range f.m.Families {
		mats[fam.Material()] = true
	}
	if mats["steel"] {
		grade := "each family's default grade"
		if sc.Steel.FyMPa > 0 {
			grade = "Fy = " + f.both(units.Stress, sc.Steel.FyMPa) + " for every family"
		}
		items = append(items, "Steel: AISC 360-22, Specification for Structural Steel Buildings, Chapter E (members in compression: flexural, torsional and flexural-torsional buckling, slender elements); "+grade+".")
	}
	if mats["concrete"] {
		fc := "f'c = " + f.both(units.Stress, sc.Concrete.FcMPa)
		if sc.Concrete.FcMPa == 0 {
			fc = "f'c at the default of the unit system"
			for fi := range f.res.Families {
				if f.m.Families[f.res.Families[fi].Family].Material() != "concrete" {
					continue
				}
				if v, _, ok := calcOf(f, fi, "fc_MPa"); ok {
					fc = "f'c = " + f.both(units.Stress, v) + ", the default of the unit system"
					break
				}
			}
		}
		beta := fmt.Sprintf("βdns of each LRFD combination, or the typed %.2f where it is higher (a typed βdns only makes a combination more conservative)", sc.Concrete.BetaDns)
		if sc.Concrete.BetaFromLoads {
			beta = fmt.Sprintf("βdns of each LRFD combination (%.2f for the governing one)", ls.BetaDns)
		}
		cap := "moment magnifier held to 1.4 (ACI 318-19 6.2.5.3): δ above 1.4 never works"
		if !sc.Concrete.SecondOrderCap {
			cap = "moment magnifier held to 1.4 (ACI 318-19 6.2.5.3): δ above 1.4 never works; the strength without the limit is shown in the trace as a note only"
		}
		items = append(items, fmt.Sprintf("Concrete: ACI 318-19, Building Code Requirements for Structural Concrete: axial strength with the interaction diagram at the minimum moment (6.6.4.5.4), slenderness by moment magnification (6.6.4) with (EI)eff %s of 6.6.4.4.4 and %s; %s; %s; grade %d bars, reinforcement ratio up to %.1f%%; %s.",
			eiWords(sc.Concrete.EIMethod), beta, concreteKWords(sc.Concrete.NonswayK1), fc, sc.Concrete.BarGrade, sc.Concrete.RhoMax*100, cap))
	}
	if mats["timber"] {
		dur := " Every combination is checked with its own time effect factor λ (NDS 2018 Table N3, N3.3)."
		if s.Method == model.ASD {
			dur = " Every combination is checked with its own load duration factor CD (NDS 2018 Table 2.3.2, 2.3.2.2)."
			if sc.Timber.Duration != "" {
				dur = " The load duration is typed (" + sc.Timber.Duration + "): each ASD combination takes the lower of its own CD and the typed one, so a typed duration only makes a combination more conservative (NDS 2018 Table 2.3.2)."
			}
		}
		items = append(items, "Timber: NDS 2018, National Design Specification for Wood Construction: column stability factor Cp (3.7) with the adjustment factors for the service conditions; "+timberWords(sc.Timber)+"."+dur)
	}
	if mats["composite"] {
		items = append(items, compositeAssumption(f))
	}
	loadItem := "Loads: ASCE 7-22, Minimum Design Loads and Associated Criteria for Buildings and Other Structures: gravity load combinations 2.3.1 (LRFD) and 2.4.1 (ASD)"
	if ls.Typed {
		loadItem += fmt.Sprintf(". The typed load is split into dead and live load by its dead share of %.2f, and every combination follows; wind, seismic and other special loads are not included.", ls.DeadN/(ls.DeadN+ls.LiveN))
	} else {
		loadItem += "; live-load reduction 4.7; roof live load taken unreduced. Wind, seismic and other special loads are not included."
	}
	items = append(items, loadItem)
	ks := kFactors(f)
	twist := ""
	switch {
	case s.WeakMM < s.LengthMM && !s.TwistBraced:
		twist = " Steel twists over the full height: the weak-axis braces are not taken to restrain twisting."
	case s.WeakMM < s.LengthMM:
		twist = " The braces are stated to restrain twisting too, so steel twists over the weak-axis length."
	}
	kItem := "Effective length: " + endsWords(s) + ", idealized; the weak-axis unbraced length is " + f.both(units.Length, s.WeakMM) + "." + twist
	if len(ks) > 0 {
		kItem += " Factors used: " + strings.Join(ks, "; ") + "."
	}
	items = append(items, kItem)
	if sc.SelfWeight {
		items = append(items, "Self-weight: each column's own weight over its height"+strings.TrimPrefix(model.SelfWeightWords(&sc), ", plus each column's own weight")+" is added to the demand as dead load, with the dead-load factor of every combination.")
	} else {
		items = append(items, "Self-weight: the columns' own weight is not added to the demand.")
	}
	var cf []string
	for _, k := range model.CarbonKinds {
		v, ok := sc.Carbon[k.Key]
		if !ok {
			v = model.DefaultCarbon()[k.Key]
		}
		src := "typed"
		if v == model.DefaultCarbon()[k.Key] {
			src = "from memory"
		}
		cf = append(cf, fmt.Sprintf("%s %s %s (%s)", strings.ToLower(k.Name), trimFloat(v), k.FactorUnit, src))
	}
	items = append(items, "Ranking: working sizes (strength at least the demand, self-weight included) are ranked by "+metricWords(sc.Metric)+". Embodied-carbon factors, cradle to gate (A1–A3): "+strings.Join(cf, "; ")+".")
	items = append(items, fmt.Sprintf("Crossover lengths are searched from %s to %s and found to within ±%.0f mm; near-tie tolerance %s.",
		f.both(units.Length, f.opt.Range.FromMM), f.both(units.Length, f.opt.Range.ToMM), model.ToleranceMM,
		strings.TrimPrefix(model.TieText(sc.Tie), "within ")))
	d.bullets(items, sizeBody-0.5)
	assumptionsTable(d)
}

// trimFloat prints a factor without trailing zeros.
func trimFloat(v float64) string {
	s := fmt.Sprintf("%.3f", v)
	s = strings.TrimRight(s, "0")
	return strings.TrimSuffix(s, ".")
}

func cautions(d *doc) {
	d.heading("Cautions", 40)
	for _, block := range strings.Split(model.CautionFull, "\n\n") {
		lines := strings.Split(strings.TrimSpace(block), "\n")
		var items []string
		for _, l := range lines {
			if it, ok := strings.CutPrefix(strings.TrimSpace(l), "- "); ok {
				items = append(items, it)
			}
		}
		if len(items) == len(lines) {
			d.bullets(items, sizeBody)
			continue
		}
		d.para(strings.Join(lines, " "), "B", sizeBody)
		d.pdf.Ln(1.5)
	}
}

// eiWords names the (EI)eff choice for the method section.
func eiWords(m string) string {
	if m == "largest" {
		return "by whichever of expressions (a), (b) and (c) gives the largest strength (each is permitted)"
	}
	return "expression (" + m + ")"
}

// concreteKWords names the concrete k at nonsway ends for the method section.
func concreteKWords(k1 bool) string {
	if k1 {
		return "k = 1.0 at nonsway ends (the simplification ACI 318-19 6.6.4.4.3 permits, from memory)"
	}
	return "the ends' recommended design K, as for every material (k = 1.0 at nonsway ends, which ACI 318-19 6.6.4.4.3 permits, is a scheme setting)"
}
