package plots

import (
	"fmt"
	"strings"
	"unicode/utf8"

	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// rowKind says what a legend row shows.
type rowKind int

const (
	rowHeading rowKind = iota
	rowSeries
	rowDemand
	rowMarker
	rowCrossover
	rowNote
	rowMore // the rest of a series label, wrapped under it
)

// legendRow is one line of the legend.
type legendRow struct {
	kind   rowKind
	text   string
	series int
}

// Legend geometry in points.
const (
	legendThumb = 34
	legendGap   = 6
)

// legend is the key drawn in its own column right of the plot: series grouped
// under their material heading, then the demand, marker and crossover keys,
// then any notes. It keeps its rows between draws.
type legend struct {
	rows    []legendRow
	heading text.Style
	entry   text.Style
	pinned  text.Style
	note    text.Style
	more    text.Style
}

// newLegend returns a legend with its text styles set.
func newLegend() *legend {
	return &legend{
		heading: aligned(textStyle(faceBold, vg.Points(sizeLegend), inkText), draw.XLeft, draw.YCenter),
		entry:   aligned(textStyle(faceRegular, vg.Points(sizeLegend), inkText), draw.XLeft, draw.YCenter),
		pinned:  aligned(textStyle(faceBold, vg.Points(sizeLegend), inkText), draw.XLeft, draw.YCenter),
		note:    aligned(textStyle(faceItalic, vg.Points(sizeNote), inkMuted), draw.XLeft, draw.YCenter),
		more:    aligned(textStyle(faceItalic, vg.Points(sizeLegend), inkMuted), draw.XLeft, draw.YCenter),
	}
}

// groupKey normalises a group name for grouping and style lookup.
func groupKey(g string) string {
	return strings.ToLower(strings.TrimSpace(g))
}

// headingFor returns the legend heading of a group.
func headingFor(group string) string {
	if f, ok := families[groupKey(group)]; ok {
		return f.name
	}
	if g := strings.TrimSpace(group); g != "" {
		return g
	}
	return neutralFamily.name
}

// build fills the legend rows for the chart; labels wider than maxWidth are
// wrapped onto further lines (a single word too wide for a line is shortened
// with an ellipsis), series flagged in offScale are marked as lying above the
// chart, and notes are appended in italics at the end. With pinnedOnly set
// only the pinned series are listed (the others are keyed elsewhere).
func (l *legend) build(ch *Chart, offScale []bool, maxWidth vg.Length, pinnedOnly bool, notes ...string) {
	l.rows = l.rows[:0]
	textRoom := maxWidth - vg.Points(legendThumb+legendGap)
	for i := range ch.Series {
		if pinnedOnly && !ch.Series[i].Pinned {
			continue
		}
		key := groupKey(ch.Series[i].Group)
		seen := false
		for j := 0; j < i; j++ {
			if groupKey(ch.Series[j].Group) == key && (!pinnedOnly || ch.Series[j].Pinned) {
				seen = true
				break
			}
		}
		if seen {
			continue
		}
		l.rows = append(l.rows, legendRow{kind: rowHeading, text: fit(l.heading, headingFor(ch.Series[i].Group), maxWidth)})
		for j := i; j < len(ch.Series); j++ {
			if groupKey(ch.Series[j].Group) != key || (pinnedOnly && !ch.Series[j].Pinned) {
				continue
			}
			sty, label := l.entry, ch.Series[j].Label
			switch pinned, off := ch.Series[j].Pinned, j < len(offScale) && offScale[j]; {
			case pinned && off:
				sty, label = l.pinned, label+" (pinned, above chart)"
			case pinned:
				sty, label = l.pinned, label+" (pinned)"
			case off:
				label += " (above chart)"
			}
			for k, line := range wrapText(sty, label, textRoom) {
				kind := rowSeries
				if k > 0 {
					kind = rowMore
				}
				l.rows = append(l.rows, legendRow{kind: kind, text: line, series: j})
			}
		}
	}
	refs := len(ch.Demand) > 0 || ch.Marker != nil || len(ch.Crossovers) > 0
	if refs {
		l.rows = append(l.rows, legendRow{kind: rowHeading, text: "Reference"})
	}
	if len(ch.Demand) > 0 {
		name := ch.DemandLabel
		if name == "" {
			name = "Demand"
		}
		for k, line := range wrapText(l.entry, name, textRoom) {
			kind := rowDemand
			if k > 0 {
				kind = rowMore
			}
			l.rows = append(l.rows, legendRow{kind: kind, text: line, series: -1})
		}
	}
	if ch.Marker != nil {
		l.rows = append(l.rows, legendRow{kind: rowMarker, text: "Current length"})
	}
	if len(ch.Crossovers) > 0 {
		l.rows = append(l.rows, legendRow{kind: rowCrossover, text: "Crossover"})
	}
	for _, n := range notes {
		for _, line := range wrapText(l.note, n, maxWidth) {
			l.rows = append(l.rows, legendRow{kind: rowNote, text: line})
		}
	}
}

// wrapText breaks s into lines at most width wide in sty, at spaces; a word
// wider than a line on its own is shortened with an ellipsis.
func wrapText(sty text.Style, s string, width vg.Length) []string {
	if sty.Width(s) <= width {
		return []string{s}
	}
	return appendWrapped(nil, sty, s, width)
}

// appendWrapped appends to out the lines of s broken as wrapText breaks
// them, so that a caller can reuse out's storage from one drawing to the next.
func appendWrapped(out []string, sty text.Style, s string, width vg.Length) []string {
	line := ""
	for _, word := range strings.Fields(s) {
		try := word
		if line != "" {
			try = line + " " + word
		}
		if sty.Width(try) <= width {
			line = try
			continue
		}
		if line != "" {
			out = append(out, line)
		}
		line = fit(sty, word, width)
	}
	if line != "" {
		out = append(out, line)
	}
	return out
}

// fit returns s, or s shortened with an ellipsis so it is at most width wide in sty.
func fit(sty text.Style, s string, width vg.Length) string {
	if sty.Width(s) <= width {
		return s
	}
	for cut := len(s); cut > 0; {
		_, size := utf8.DecodeLastRuneInString(s[:cut])
		cut -= size
		if t := strings.TrimSpace(s[:cut]) + "…"; sty.Width(t) <= width {
			return t
		}
	}
	return "…"
}

// styleOf returns the text style of a row.
func (l *legend) styleOf(r legendRow, ch *Chart) text.Style {
	switch r.kind {
	case rowHeading:
		return l.heading
	case rowNote:
		return l.note
	case rowSeries, rowMore:
		if r.series >= 0 && r.series < len(ch.Series) && ch.Series[r.series].Pinned {
			return l.pinned
		}
	}
	return l.entry
}

// indent returns how far right of the column edge a row's text starts.
func indent(k rowKind) vg.Length {
	if k == rowHeading || k == rowNote {
		return 0
	}
	return vg.Points(legendThumb + legendGap)
}

// width returns the width the legend needs.
func (l *legend) width(ch *Chart) vg.Length {
	var w vg.Length
	for _, r := range l.rows {
		if rw := indent(r.kind) + l.styleOf(r, ch).Width(r.text); rw > w {
			w = rw
		}
	}
	return w
}

// rowHeight returns the vertical space of one row.
func (l *legend) rowHeight(k rowKind, first bool) vg.Length {
	switch k {
	case rowHeading:
		if first {
			return vg.Points(sizeLegend * 1.6)
		}
		return vg.Points(sizeLegend * 2.4)
	case rowNote:
		return vg.Points(sizeNote * 1.35)
	}
	return vg.Points(sizeLegend * 1.55)
}

// height returns the height all the rows need.
func (l *legend) height() vg.Length {
	var total vg.Length
	for i, r := range l.rows {
		total += l.rowHeight(r.kind, i == 0)
	}
	return total
}

// draw paints the legend in c, starting at its top edge. When the rows do not
// fit, the last candidate rows give way to a "+N more candidates" line so the
// reference keys and notes always stay visible.
func (l *legend) draw(c draw.Canvas, ch *Chart, styles []seriesStyle) {
	room := c.Max.Y - c.Min.Y
	var total vg.Length
	for i, r := range l.rows {
		total += l.rowHeight(r.kind, i == 0)
	}
	// Rows [0, cut) are shown, rows [cut, resume) hidden, rows [resume, end) shown.
	cut, resume, hidden := len(l.rows), len(l.rows), 0
	if total > room {
		resume = 0
		for resume < len(l.rows) && (l.rows[resume].kind == rowHeading || l.rows[resume].kind == rowSeries || l.rows[resume].kind == rowMore) {
			resume++
		}
		// The reference block starts with its own heading; keep it.
		if resume > 0 && resume < len(l.rows) && l.rows[resume-1].kind == rowHeading {
			resume--
		}
		var tail vg.Length
		for i := resume; i < len(l.rows); i++ {
			tail += l.rowHeight(l.rows[i].kind, false)
		}
		budget := room - tail - l.rowHeight(rowSeries, false)
		var used vg.Length
		cut = 0
		for cut < resume {
			h := l.rowHeight(l.rows[cut].kind, cut == 0)
			if used+h > budget {
				break
			}
			used += h
			cut++
		}
		for cut > 0 && (l.rows[cut-1].kind == rowHeading || (cut < len(l.rows) && l.rows[cut].kind == rowMore)) {
			cut--
		}
		for i := cut; i < resume; i++ {
			if l.rows[i].kind == rowSeries {
				hidden++
			}
		}
	}
	y := c.Max.Y
	for i := 0; i < len(l.rows); i++ {
		if i == cut && hidden > 0 {
			h := l.rowHeight(rowSeries, false)
			c.FillText(l.more, vg.Point{X: c.Min.X, Y: y - h + vg.Points(sizeLegend*0.775)}, fmt.Sprintf("+%d more candidates", hidden))
			y -= h
		}
		if i >= cut && i < resume {
			continue
		}
		r := l.rows[i]
		h := l.rowHeight(r.kind, i == 0)
		mid := y - h + vg.Points(sizeLegend*0.775)
		if r.kind == rowNote {
			mid = y - h/2
		}
		l.drawThumb(c, r, ch, styles, mid)
		c.FillText(l.styleOf(r, ch), vg.Point{X: c.Min.X + indent(r.kind), Y: mid}, r.text)
		y -= h
	}
}

// drawThumb draws the line-and-glyph sample of a row centred on height mid.
func (l *legend) drawThumb(c draw.Canvas, r legendRow, ch *Chart, styles []seriesStyle, mid vg.Length) {
	x0, x1 := c.Min.X, c.Min.X+vg.Points(legendThumb)
	centre := vg.Point{X: (x0 + x1) / 2, Y: mid}
	switch r.kind {
	case rowSeries:
		st := styles[r.series]
		c.StrokeLine2(st.line, x0, mid, x1, mid)
		c.DrawGlyphNoClip(st.glyph, centre)
	case rowDemand:
		c.StrokeLine2(demandStyle(), x0, mid, x1, mid)
	case rowMarker:
		h := vg.Points(sizeLegend * 0.6)
		c.StrokeLine2(markerStyle(), centre.X, mid-h, centre.X, mid+h)
	case rowCrossover:
		crossoverMark(&c, centre)
	}
}
