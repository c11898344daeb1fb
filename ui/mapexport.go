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

// mapWriter returns the export of the map of a valid scheme over the grid
// the Map view uses (taken now, on the UI goroutine), in the format the
// path's extension names (.png, .svg or .pdf), with the caution under it.
func (w *Window) mapWriter() func(path string, in exportInputs) error {
	sp := w.mapv.mapSpecFor(&w.st.Valid, w.st.Range)
	return func(path string, in exportInputs) error {
		if _, err := plots.FormatOf(path); err != nil {
			return err
		}
		g, err := model.ComputeMap(context.Background(), in.sc, sp, nil)
		if err != nil {
			return err
		}
		pm := chart.Map(g, &in.sc, in.sc.Name)
		// plots.SaveMap writes the file itself; it goes to a temporary name
		// first so a failure leaves any earlier file as it was.
		ext := filepath.Ext(path)
		tmp := strings.TrimSuffix(path, ext) + ".upright-tmp" + ext
		if err := plots.SaveMap(tmp, &pm, chartExportSize); err != nil {
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
}

// ExportMapFile writes the map of the valid scheme to path (.png, .svg or .pdf).
func (w *Window) ExportMapFile(path string) error { return w.files.export("map", path, w.mapWriter()) }

// ExportMap asks where to write the map; the extension chosen picks the format.
func (w *Window) ExportMap() {
	write := w.mapWriter()
	w.files.showExportDialog("Export the map (.png, .svg or .pdf)", ".png", "map", func(p string) { w.files.exportBackground("map", p, write) })
}
