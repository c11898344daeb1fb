// Package report writes the client report of a scheme, a PDF a client can
// read (inputs, the strength-against-length chart, the working sizes of
// each family, the crossover lengths, the assumptions and code editions,
// and the cautions), and the candidate table as CSV.
package report

import (
	"bytes"
	"context"
	"errors"
	"fmt"
	"io"
	"math"
	"time"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
	"upright/ui/units"
)

// Options adjust the report.
type Options struct {
	Date     time.Time   // date shown on the report and stored in the PDF; zero means now
	Version  string      // program version printed in the header and footer, e.g. "0.1.0"; empty prints none
	TopN     int         // working sizes listed per family, 1 to 50; 0 means DefaultTopN
	Range    model.Range // lengths of the chart and the crossover search; zero means model.DefaultRange
	ChartDPI int         // resolution of the embedded chart image, 72 to 600; 0 means DefaultChartDPI
	// FullCrossovers adds every change of best size within each family;
	// without it the report gives each family's best size and its span.
	FullCrossovers bool
	// Map adds the map of the winning family over length and load (or
	// tributary area) even when the scheme does not ask for it (ReportMap).
	Map bool
}

// Defaults for Options.
const (
	DefaultTopN     = 3
	DefaultChartDPI = 220
)

// normalised fills in defaults and checks the options.
func (o Options) normalised(m *model.Model) (Options, error) {
	if o.Date.IsZero() {
		o.Date = time.Now()
	}
	switch {
	case o.TopN == 0:
		o.TopN = DefaultTopN
	case o.TopN < 1 || o.TopN > 50:
		return o, fmt.Errorf("report TopN: %d is not accepted; give 1 to 50 sizes per family", o.TopN)
	}
	switch {
	case o.ChartDPI == 0:
		o.ChartDPI = DefaultChartDPI
	case o.ChartDPI < 72 || o.ChartDPI > 600:
		return o, fmt.Errorf("report chart DPI: %d is not accepted; give 72 to 600", o.ChartDPI)
	}
	r := o.Range
	if r == (model.Range{}) {
		o.Range = model.DefaultRange(m.Scheme.Setting.LengthMM, m.Scheme.Units)
	} else if math.IsNaN(r.FromMM) || math.IsNaN(r.ToMM) || r.FromMM < model.MinLengthMM || r.ToMM > model.MaxLengthMM || r.ToMM <= r.FromMM {
		return o, fmt.Errorf("report range: %v mm to %v mm is not accepted; give a range within 300 mm to 30,000 mm, from below to", r.FromMM, r.ToMM)
	}
	return o, nil
}

// facts is everything computed for a report.
type facts struct {
	m          *model.Model
	opt        Options
	sys, other units.System
	res        *model.Result
	crossovers []model.Crossover
	chartPNG   []byte            // nil when there is no chart
	chartNote  string            // why there is no chart
	mapPNG     []byte            // the map figure; nil when not asked for or not drawn
	mapNote    string            // why an asked-for map is missing
	variants   *model.Comparison // the scheme's variants side by side; nil when it has none
	building   *buildingFacts    // the building page; nil when the scheme has no building
}

// gather evaluates the model at its setting, finds the crossovers over the
// range and renders the chart.
func gather(ctx context.Context, m *model.Model, opt Options) (*facts, error) {
	f := &facts{m: m, opt: opt, sys: units.System(m.Scheme.Units)}
	f.other = units.SI
	if f.sys == units.SI {
		f.other = units.US
	}
	res, err := m.Evaluate(ctx, m.Scheme.Setting)
	if err != nil {
		return nil, fmt.Errorf("report: evaluating the scheme: %w", err)
	}
	f.res = res
	if len(m.Families) == 0 {
		f.chartNote = "No material family is available, so there is no chart."
		return f, nil
	}
	xs, err := m.Crossovers(ctx, m.Scheme.Setting, opt.Range, nil)
	if err != nil {
		return nil, fmt.Errorf("report: finding crossovers: %w", err)
	}
	f.crossovers = xs
	ch := chart.NewBuilder(m).Chart(res, chart.Options{Crossovers: xs, Range: opt.Range})
	if len(ch.Series) == 0 {
		f.chartNote = "No candidate of any family carries the demand at this length, so the chart has no curve to show."
		return f, nil
	}
	var buf bytes.Buffer
	size := plots.Size{Width: 720, Height: 430, DPI: opt.ChartDPI}
	ch = chart.WithCaution(ch) // the figure keeps the caution if lifted out of the report
	if err := plots.WriteChart(&buf, plots.PNG, &ch, size); err != nil {
		return nil, fmt.Errorf("report: drawing the chart: %w", err)
	}
	f.chartPNG = buf.Bytes()
	return f, nil
}

// Write writes the client report of m as a PDF: Letter paper for a US
// scheme, A4 for an SI one, with Liberation Sans embedded. A model without
// families (no material registered or every one switched off) gives a
// report that says so instead of a chart and tables.
func Write(w io.Writer, m *model.Model, opt Options) error {
	if m == nil {
		return errors.New("report: no model given (nil *model.Model)")
	}
	if w == nil {
		return errors.New("report: no writer given")
	}
	opt, err := opt.normalised(m)
	if err != nil {
		return err
	}
	f, err := gather(context.Background(), m, opt)
	if err != nil {
		return err
	}
	if err := gatherMap(context.Background(), f); err != nil {
		return err
	}
	if err := gatherVariants(context.Background(), f); err != nil {
		return err
	}
	if err := gatherBuilding(f); err != nil {
		return err
	}
	d := compose(f)
	if err := d.pdf.Error(); err != nil {
		return fmt.Errorf("report: laying out the PDF: %w", err)
	}
	if err := d.pdf.Output(w); err != nil {
		return fmt.Errorf("report: writing the PDF: %w", err)
	}
	return nil
}
