package plots

import (
	"image/color"
	"strings"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// family is the style shared by the series of one material group.
type family struct {
	// id indexes per-family counters.
	id int
	// name is the legend heading.
	name string
	// colors alternate between the group's series.
	colors []color.Color
	// dashes is the group's dash pattern (nil is solid), so groups stay apart in grey.
	dashes []vg.Length
}

// Line widths in points.
const (
	seriesWidth = 1.7
	pinnedWidth = 3.0
	demandWidth = 3.0
	glyphRadius = 3.6
)

// families are the known material groups; anything else uses neutralFamily.
var families = map[string]*family{
	"steel": {
		id:     0,
		name:   "Steel",
		colors: []color.Color{okabeBlue, okabeSkyBlue},
		dashes: nil,
	},
	"concrete": {
		id:     1,
		name:   "Concrete",
		colors: []color.Color{okabeVermilion, okabeOrange},
		dashes: []vg.Length{vg.Points(7), vg.Points(3)},
	},
	"timber": {
		id:     2,
		name:   "Timber",
		colors: []color.Color{okabeGreen, okabePurple},
		dashes: []vg.Length{vg.Points(9), vg.Points(2.5), vg.Points(1.5), vg.Points(2.5)},
	},
	// Concrete-filled steel tubes take the first colours of the two
	// materials they join and a dash with two dots, apart from timber's one.
	"composite": {
		id:     3,
		name:   "Composite",
		colors: []color.Color{okabeBlue, okabeVermilion},
		dashes: []vg.Length{vg.Points(7), vg.Points(2), vg.Points(1.5), vg.Points(2), vg.Points(1.5), vg.Points(2)},
	},
}

// neutralFamily styles series whose group is not a known material.
var neutralFamily = &family{
	id:     4,
	name:   "Other",
	colors: []color.Color{okabeBlue, okabeVermilion, okabeGreen, okabePurple, okabeOrange, okabeSkyBlue},
	dashes: []vg.Length{vg.Points(2), vg.Points(2)},
}

// demandDashes is the demand line's pattern: long dashes, wider than any series pattern.
var demandDashes = []vg.Length{vg.Points(11), vg.Points(4.5)}

// familyCount is the number of style families, the neutral one included.
const familyCount = 5

// familyFor returns the style family of a group name, matched without regard to case or surrounding space.
func familyFor(group string) *family {
	if f, ok := families[strings.ToLower(strings.TrimSpace(group))]; ok {
		return f
	}
	return neutralFamily
}

// seriesStyle is the resolved look of one series.
type seriesStyle struct {
	line  draw.LineStyle
	glyph draw.GlyphStyle
}

// styleFor returns the look of a series: colour by its place k (0-based)
// within family f, glyph by its place n in the whole chart, so up to
// len(glyphShapes) series all carry different shapes.
func styleFor(f *family, k, n int, pinned bool) seriesStyle {
	c := f.colors[k%len(f.colors)]
	w := vg.Points(seriesWidth)
	r := vg.Points(glyphRadius)
	if pinned {
		w = vg.Points(pinnedWidth)
		r = vg.Points(glyphRadius * 1.25)
	}
	return seriesStyle{
		line:  draw.LineStyle{Color: c, Width: w, Dashes: f.dashes},
		glyph: draw.GlyphStyle{Color: c, Radius: r, Shape: glyphShapes[n%len(glyphShapes)]},
	}
}

// demandStyle returns the demand line's look.
func demandStyle() draw.LineStyle {
	return draw.LineStyle{Color: okabeBlack, Width: vg.Points(demandWidth), Dashes: demandDashes}
}

// markerStyle returns the current-length line's look.
func markerStyle() draw.LineStyle {
	return draw.LineStyle{Color: inkMarker, Width: vg.Points(1.2)}
}
