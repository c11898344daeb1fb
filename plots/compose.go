package plots

import (
	"fmt"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// Layout in points.
const (
	outerMargin     = 10
	legendSpacing   = 14
	legendMaxShare  = 0.32
	legendMinWidth  = 90
	titlePadding    = 8
	axisLabelMargin = 6
)

// Notes shown under the legend when curves run off the top of the chart.
var (
	capNoteAuto  = []string{fmt.Sprintf("Axis capped at %g× demand;", DemandCapFactor), "taller curves run off the top."}
	capNoteFixed = []string{"Some curves run off the top."}
)

// composer lays out and draws a chart on any gonum canvas; it owns one gonum
// plot and its buffers, reused from one draw to the next.
type composer struct {
	plot   *plot.Plot
	scene  *scene
	legend *legend

	legendBox vg.Rectangle // where the legend was last drawn (empty when none)
}

// newComposer returns a composer with the chart's fonts and axis styles set.
func newComposer() *composer {
	p := styledPlot()
	k := &composer{plot: p, scene: newScene(), legend: newLegend()}
	p.Add(k.scene)
	return k
}

// draw paints the validated chart ch onto c: title, axes, data and the
// legend column on the right, over a white background when fill is set (a
// raster canvas arrives already cleared, and filling it again is slow).
func (k *composer) draw(c draw.Canvas, ch *Chart, fill bool) {
	ext := k.prepare(ch)
	defer func() { k.scene.chart = nil }()

	if fill {
		c.SetColor(paper)
		c.Fill(c.Rectangle.Path())
	}

	m := vg.Points(outerMargin)
	inner := draw.Crop(c, m, -m, m, -m)
	width := inner.Max.X - inner.Min.X
	if ch.Footer != "" {
		inner.Min.Y += drawFooter(inner, ch.Footer)
	}

	var notes []string
	if ext.capped {
		notes = capNoteFixed
		if ch.YRange == nil {
			notes = capNoteAuto
		}
	}
	maxLegend := width * legendMaxShare
	if maxLegend < vg.Points(legendMinWidth) {
		maxLegend = vg.Points(legendMinWidth)
	}
	k.legend.build(ch, k.scene.offScale, maxLegend, false, notes...)
	if ch.KeyNote != "" && k.legend.height() > k.legendRoom(inner, ch) {
		// The series are keyed elsewhere: list only the pinned ones rather
		// than hide some candidates behind a count.
		k.legend.build(ch, k.scene.offScale, maxLegend, true, append(append([]string(nil), notes...), ch.KeyNote)...)
	}
	lw := k.legend.width(ch)
	if lw > maxLegend {
		lw = maxLegend
	}
	area := inner
	if len(k.legend.rows) > 0 {
		area = draw.Crop(inner, 0, -(lw + vg.Points(legendSpacing)), 0, 0)
	}

	k.plot.Y.Label.Text = yLabelFor(k.plot, ch.YLabel, ch.YShort, area)
	k.plot.Draw(area)

	if len(k.legend.rows) > 0 {
		col := inner
		col.Min.X = inner.Max.X - lw
		col.Max.Y = k.scene.data.Max.Y
		k.legend.draw(col, ch, k.scene.styles)
		k.legendBox = col.Rectangle
	} else {
		k.legendBox = vg.Rectangle{}
	}
}

// yLabelFor returns the y-axis title that fits along the height of area:
// long, or short (when given) where the plot is too short for long. Gonum
// keeps a rotated axis title within the plot's height by shrinking the data
// area, which on a short chart would leave almost nothing to read.
func yLabelFor(p *plot.Plot, long, short string, area draw.Canvas) string {
	if short == "" {
		return long
	}
	x := &p.X
	room := area.Max.Y - area.Min.Y - x.Tick.Length - x.Tick.Label.Height("0") - x.Label.TextStyle.Height(x.Label.Text) - x.Label.Padding
	if p.Y.Label.TextStyle.Width(long) <= room {
		return long
	}
	return short
}

// legendRoom returns the height the legend column has: from the top of the
// data area (below any title) to the bottom of the inner canvas.
func (k *composer) legendRoom(inner draw.Canvas, ch *Chart) vg.Length {
	h := inner.Max.Y - inner.Min.Y
	if ch.Title != "" {
		h -= k.plot.Title.TextStyle.Height(ch.Title) + vg.Points(titlePadding)
	}
	return h
}

// prepare loads the chart into the plot and scene: texts, axis ranges,
// series styles and drawing order. It returns the fitted extent.
func (k *composer) prepare(ch *Chart) extent {
	p := k.plot
	ext := fitExtent(ch)
	p.Title.Text = ch.Title
	p.X.Label.Text = ch.XLabel
	p.Y.Label.Text = ch.YLabel
	p.X.Min, p.X.Max = ext.xmin, ext.xmax
	p.Y.Min, p.Y.Max = ext.ymin, ext.ymax

	s := k.scene
	s.chart = ch
	s.styles = s.styles[:0]
	s.offScale = s.offScale[:0]
	var count [familyCount]int
	for i := range ch.Series {
		f := familyFor(ch.Series[i].Group)
		s.styles = append(s.styles, styleFor(f, count[f.id], i, ch.Series[i].Pinned))
		s.offScale = append(s.offScale, above(ch.Series[i].Points, ext.xmin, ext.xmax, ext.ymax))
		count[f.id]++
	}
	s.order = s.order[:0]
	for pass := 0; pass < 2; pass++ {
		for i := range ch.Series {
			if ch.Series[i].Pinned == (pass == 1) {
				s.order = append(s.order, i)
			}
		}
	}
	return ext
}

// styledPlot returns an empty plot with the chart's fonts, title and axis
// styles, shared by the strength chart and the winner map.
func styledPlot() *plot.Plot {
	p := plot.New()
	p.BackgroundColor = nil
	p.Title.TextStyle = aligned(textStyle(faceBold, vg.Points(sizeTitle), inkText), draw.XCenter, draw.YTop)
	p.Title.Padding = vg.Points(titlePadding)
	for _, a := range []*plot.Axis{&p.X, &p.Y} {
		a.Label.TextStyle.Font = textStyle(faceRegular, vg.Points(sizeAxis), inkText).Font
		a.Label.TextStyle.Color = inkText
		a.Label.Padding = vg.Points(axisLabelMargin)
		a.Tick.Label.Font = textStyle(faceRegular, vg.Points(sizeTick), inkText).Font
		a.Tick.Label.Color = inkText
		a.Tick.Length = vg.Points(5)
		a.Tick.LineStyle = draw.LineStyle{Color: inkText, Width: vg.Points(0.8)}
		a.LineStyle = draw.LineStyle{Color: inkText, Width: vg.Points(0.8)}
		a.Padding = 0
	}
	p.X.Tick.Marker = &ticker{target: xTickTarget}
	p.Y.Tick.Marker = &ticker{target: yTickTarget}
	return p
}
