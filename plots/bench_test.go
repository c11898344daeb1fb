package plots

import (
	"runtime"
	"testing"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
)

// BenchmarkRender1200x700 renders the brief's reference load: a 1200 × 700 px
// chart with eight 200-point curves, the demand line, a marker and five
// crossover marks, into one reused buffer.
func BenchmarkRender1200x700(b *testing.B) {
	r, err := NewRaster(1200, 700)
	if err != nil {
		b.Fatal(err)
	}
	c := sampleChart(8, 200)
	if len(c.Crossovers) != 5 {
		b.Fatalf("sample has %d crossovers, want 5", len(c.Crossovers))
	}
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		if err := r.Render(c); err != nil {
			b.Fatal(err)
		}
	}
	b.StopTimer()
	b.ReportMetric(float64(b.Elapsed().Microseconds())/1000/float64(b.N), "ms/render")
}

// BenchmarkPlainGonum1200x700 is the yardstick: a default gonum/plot chart of
// the same size with eight 200-point lines, drawn on a new vgimg canvas each time.
func BenchmarkPlainGonum1200x700(b *testing.B) {
	c := sampleChart(8, 200)
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		p := plot.New()
		p.Title.Text = c.Title
		p.X.Label.Text = c.XLabel
		p.Y.Label.Text = c.YLabel
		for _, s := range c.Series {
			xys := make(plotter.XYs, len(s.Points))
			for j, pt := range s.Points {
				xys[j].X, xys[j].Y = pt.X, pt.Y
			}
			l, err := plotter.NewLine(xys)
			if err != nil {
				b.Fatal(err)
			}
			p.Add(l)
			p.Legend.Add(s.Label, l)
		}
		cv := vgimg.NewWith(vgimg.UseWH(1200*vg.Inch/96, 700*vg.Inch/96), vgimg.UseDPI(96))
		p.Draw(draw.New(cv))
	}
	b.StopTimer()
	b.ReportMetric(float64(b.Elapsed().Microseconds())/1000/float64(b.N), "ms/render")
}

// heapAfterGC returns the live heap after a full collection.
func heapAfterGC() uint64 {
	runtime.GC()
	runtime.GC()
	var m runtime.MemStats
	runtime.ReadMemStats(&m)
	return m.HeapAlloc
}
