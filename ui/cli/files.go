package cli

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"path/filepath"
	"strings"

	"upright/ui/model"
	"upright/ui/report"
	"upright/ui/schemefile"
)

// buildModel parses the scheme flags (starting from --scheme) and builds the model.
func buildModel(f *schemeFlags, args []string) (*model.Model, error) {
	sc, err := schemeFrom(f, args)
	if err != nil {
		return nil, err
	}
	return model.New(sc)
}

// runReport writes the client report: upright report [scheme flags] --out report.pdf.
func runReport(args []string, stdout, stderr io.Writer) error {
	f := newSchemeFlags("report", stderr)
	out := f.fs.String("out", "", "PDF file to write (required), e.g. report.pdf")
	top := f.fs.Int("top", report.DefaultTopN, "working sizes listed per family, 1 to 50")
	from := f.fs.String("from", "", "start of the chart and crossover range (default "+model.DefaultRangeHelp+")")
	to := f.fs.String("to", "", "end of the chart and crossover range (default "+model.DefaultRangeHelp+")")
	withMap := f.fs.Bool("map", false, "add the map of the winning family over length and load (always added when the scheme's report_map is true)")
	m, err := buildModel(f, args)
	if err != nil {
		return err
	}
	if *out == "" {
		return usagef("--out: required; give the PDF file to write, e.g. --out report.pdf")
	}
	if err := checkExt("out", *out, ".pdf"); err != nil {
		return err
	}
	if *top < 1 || *top > 50 {
		return usagef("--top %d: not accepted; give 1 to 50 sizes per family", *top)
	}
	r, err := rangeFlags(*from, *to, m.Scheme.Setting.LengthMM, m.Scheme.Units)
	if err != nil {
		return err
	}
	var buf bytes.Buffer
	if err := report.Write(&buf, m, report.Options{Version: Version, TopN: *top, Range: r, Map: *withMap}); err != nil {
		return err
	}
	if err := schemefile.WriteFileAtomic(*out, buf.Bytes()); err != nil {
		return err
	}
	fmt.Fprintf(stdout, "wrote %s (%d bytes)\n%s\n", *out, buf.Len(), model.Caution)
	return nil
}

// runTable writes the candidate table as CSV: upright table [scheme flags] [--csv out.csv] [--all].
func runTable(args []string, stdout, stderr io.Writer) error {
	f := newSchemeFlags("table", stderr)
	out := f.fs.String("csv", "", "CSV file to write; absent or - writes to standard output")
	all := f.fs.Bool("all", false, "every candidate, not only the sizes that work")
	m, err := buildModel(f, args)
	if err != nil {
		return err
	}
	if *out != "" && *out != "-" {
		if err := checkExt("csv", *out, ".csv"); err != nil {
			return err
		}
	}
	var buf bytes.Buffer
	if err := report.WriteCSV(&buf, m, report.CSVOptions{All: *all}); err != nil {
		return err
	}
	fmt.Fprintln(stderr, model.Caution)
	if *out == "" || *out == "-" {
		_, err := stdout.Write(buf.Bytes())
		return err
	}
	if err := schemefile.WriteFileAtomic(*out, buf.Bytes()); err != nil {
		return err
	}
	fmt.Fprintf(stdout, "wrote %s\n", *out)
	return nil
}

// runScheme writes the scheme the flags describe: upright scheme [scheme flags] --out file.upright.json.
func runScheme(args []string, stdout, stderr io.Writer) error {
	f := newSchemeFlags("scheme", stderr)
	out := f.fs.String("out", "", "scheme file to write (required), e.g. tower"+schemefile.Extension)
	name := f.fs.String("name", "", "the scheme's name")
	sc, err := schemeFrom(f, args)
	if err != nil {
		return err
	}
	if *out == "" {
		return usagef("--out: required; give the scheme file to write, e.g. --out tower%s", schemefile.Extension)
	}
	if err := checkExt("out", *out, ".json"); err != nil {
		return err
	}
	if *name != "" {
		sc.Name = *name
	}
	if err := schemefile.Save(*out, sc); err != nil {
		var fe *schemefile.Error
		if errors.As(err, &fe) && fe.Field != "" {
			return usagef("%v", err)
		}
		return err
	}
	fmt.Fprintf(stdout, "wrote %s\n", *out)
	return nil
}

// checkExt refuses an output file whose extension the command cannot
// write, naming the flag and the extensions it writes.
func checkExt(flagName, path string, exts ...string) error {
	got := strings.ToLower(filepath.Ext(path))
	for _, e := range exts {
		if got == e {
			return nil
		}
	}
	return usagef("--%s %q: this command writes %s files; give a file name ending in %s", flagName, path, strings.Join(exts, ", "), strings.Join(exts, " or "))
}
