package cli

import (
	"context"
	"encoding/json"
	"fmt"
	"io"
	"math"
	"strings"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
	"upright/ui/units"
)

// init registers the sections command.

// SectionsJSON is the JSON output of the sections command: where each
// family's best working size lies in the figure, at one scale.
type SectionsJSON struct {
	PxPerMM  float64           `json:"px_per_mm"`
	WidthPx  int               `json:"width_px"`  // figure width in pixels (the PNG's)
	HeightPx int               `json:"height_px"` // figure height in pixels
	LengthMM float64           `json:"length_mm"` // unbraced length the sizes work at
	Sections []SectionLayout   `json:"sections"`
	Caution  string            `json:"caution"`
	Legend   map[string]string `json:"legend"` // what the fields mean
}

// SectionLayout is one drawn section. The pixel box includes any
// fire-protection board; width_mm and height_mm are the bare section.
type SectionLayout struct {
	Designation  string  `json:"designation"`
	Family       string  `json:"family"`
	Material     string  `json:"material"`
	XPx          float64 `json:"x_px"`
	YPx          float64 `json:"y_px"`
	WidthPx      float64 `json:"width_px"`
	HeightPx     float64 `json:"height_px"`
	WidthMM      float64 `json:"width_mm"`
	HeightMM     float64 `json:"height_mm"`
	ProtectionMM float64 `json:"protection_mm"`
}

// sectionsLegend explains the JSON fields.
var sectionsLegend = map[string]string{
	"px":                  "pixels of the PNG (width_px × height_px at 96 dpi); in the SVG and PDF the same positions are in points × 96/72",
	"x_px, y_px":          "top-left corner of the drawn section, pixels from the figure's top-left corner",
	"width_px, height_px": "drawn size, fire-protection board included: (width_mm + 2 protection_mm) × px_per_mm",
	"width_mm, height_mm": "plan size of the bare section (the footprint)",
}

// runSections draws the plan sections: upright sections [scheme flags] --out FILE.png|.svg|.pdf [--json].
func runSections(args []string, stdout, stderr io.Writer) error {
	f := newSchemeFlags("sections", stderr)
	out := f.fs.String("out", "", "file to draw the plan sections to (.png, .svg or .pdf); required unless --json")
	asJSON := f.fs.Bool("json", false, "write the figure's layout as JSON (sections with their pixel boxes, and px_per_mm)")
	sc, err := schemeFrom(f, args)
	if err != nil {
		return err
	}
	if *out == "" && !*asJSON {
		return usagef("--out: required; give the file to draw, e.g. --out sections.svg (.png, .svg or .pdf), or use --json")
	}
	if *out != "" {
		if _, err := plots.FormatOf(*out); err != nil {
			return usagef("--out %q: not accepted; give a file ending in .png, .svg or .pdf", *out)
		}
	}
	m, err := model.New(sc)
	if err != nil {
		return err
	}
	res, err := m.Evaluate(context.Background(), sc.Setting)
	if err != nil {
		return err
	}
	sheet, keys := chart.Sections(m, res, chart.SectionsOptions{Title: m.Scheme.Name, Caution: true, AtLength: true})
	size := plots.DefaultPlanSize
	var layout plots.PlanLayout
	if *out != "" {
		layout, err = plots.SavePlan(*out, &sheet, size)
	} else {
		layout, err = plots.LayoutPlan(&sheet, size)
	}
	if err != nil {
		return err
	}
	rows := make([]SectionLayout, len(keys))
	for i, k := range keys {
		fam := m.Families[k.Family]
		st := fam.Static(k.Index)
		b := layout.Sections[i]
		sec := sheet.Sections[i]
		rows[i] = SectionLayout{
			Designation: st.Designation, Family: fam.Name(), Material: fam.Material(),
			XPx: round(b.X, 2), YPx: round(b.Y, 2), WidthPx: round(b.W, 2), HeightPx: round(b.H, 2),
			WidthMM: round(sec.WidthMM, 2), HeightMM: round(sec.DepthMM, 2), ProtectionMM: round(sec.ProtectionMM, 2),
		}
	}
	if *asJSON {
		pw := int(math.Round(size.Width * float64(size.DPI) / 72))
		ph := int(math.Round(size.Height * float64(size.DPI) / 72))
		fmt.Fprintln(stderr, model.Caution)
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		return enc.Encode(SectionsJSON{
			PxPerMM: round(layout.PxPerMM, 6), WidthPx: pw, HeightPx: ph, LengthMM: round(sc.Setting.LengthMM, 1),
			Sections: rows, Caution: model.Caution, Legend: sectionsLegend,
		})
	}
	sys := units.System(sc.Units)
	fmt.Fprintf(stdout, "wrote %s: %d plan sections at one scale (%.3f px/mm at %d dpi), best working size of each family at %s\n",
		*out, len(rows), layout.PxPerMM, size.DPI, units.Length(sc.Setting.LengthMM, sys))
	for _, r := range rows {
		fmt.Fprintf(stdout, "  %-10s %-18s %s\n", r.Material, r.Family, r.Designation)
	}
	if len(rows) == 0 {
		fmt.Fprintln(stdout, "  "+strings.TrimSpace(sheet.Empty))
	}
	fmt.Fprintf(stdout, "%s\n", model.Caution)
	return nil
}
