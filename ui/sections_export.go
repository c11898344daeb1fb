package ui

import (
	"context"
	"os"
	"path/filepath"
	"strings"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
	"upright/ui/schemefile"
)

// writeSections writes the plan-sections figure of in at its length to
// path, in the format its extension names (.png, .svg or .pdf), with the caution.
func writeSections(path string, in exportInputs) error {
	m, err := model.New(in.sc)
	if err != nil {
		return err
	}
	res, err := m.Evaluate(context.Background(), m.Scheme.Setting)
	if err != nil {
		return err
	}
	sheet, _ := chart.Sections(m, res, chart.SectionsOptions{Title: in.sc.Name, Caution: true, AtLength: true})
	// plots.SavePlan writes the file itself; it goes to a temporary name
	// first so a failure leaves any earlier file as it was.
	ext := filepath.Ext(path)
	tmp := strings.TrimSuffix(path, ext) + ".upright-tmp" + ext
	if _, err := plots.SavePlan(tmp, &sheet, plots.DefaultPlanSize); err != nil {
		os.Remove(tmp)
		return err
	}
	b, err := os.ReadFile(tmp)
	os.Remove(tmp)
	if err != nil {
		return err
	}
	return schemefile.WriteFileAtomic(path, b)
}

// ExportSectionsFile writes the plan sections of the valid scheme to path (.png, .svg or .pdf).
func (f *filesPane) ExportSectionsFile(path string) error {
	return f.export("plan sections", path, writeSections)
}

// ExportSections asks where to write the plan sections; the extension chosen picks the format.
func (f *filesPane) ExportSections() {
	f.showSaveDialog("Export the plan sections (.png, .svg or .pdf)", ".png", "-sections", func(p string) {
		switch strings.ToLower(filepath.Ext(p)) {
		case ".png", ".svg", ".pdf":
		default:
			p += ".png"
		}
		f.exportBackground("plan sections", p, writeSections)
	})
}
