package plots

// Point is one (X, Y) sample in the caller's display units.
type Point struct {
	X, Y float64
}

// Series is one candidate's strength curve.
type Series struct {
	// Label names the candidate in the legend.
	Label string
	// Group chooses the style family, e.g. "steel", "concrete" or "timber";
	// any other value gets the neutral family.
	Group string
	// Points is the curve, in non-decreasing X order.
	Points []Point
	// Pinned draws the curve thicker, on top of the others, and marks it in the legend.
	Pinned bool
}

// Marker is the vertical line at the current unbraced length.
type Marker struct {
	// X is the current length in display units.
	X float64
	// Label is drawn beside the top of the line; empty draws no text.
	Label string
}

// Crossover is a point where one candidate takes over from another.
type Crossover struct {
	// X and Y locate the mark in display units.
	X, Y float64
	// Label is a short text drawn next to the mark.
	Label string
}

// Range is a fixed axis extent in display units.
type Range struct {
	Min, Max float64
}

// Chart is everything the comparison chart shows.
type Chart struct {
	// Title is drawn above the plot; empty draws none.
	Title string
	// XLabel and YLabel name the axes with their units.
	XLabel, YLabel string
	// YShort, when set, names the y axis where the plot is too short for
	// YLabel along its height (e.g. "φPn (kip)").
	YShort string
	// Series holds the candidates' curves, in legend order within each group.
	Series []Series
	// Demand is the required strength along the length; empty draws no demand line.
	Demand []Point
	// DemandLabel names the demand in the legend; empty means "Demand".
	DemandLabel string
	// Marker is the current-length line; nil draws none.
	Marker *Marker
	// Crossovers are marked with a ring and their label.
	Crossovers []Crossover
	// XRange fixes the x axis; nil fits it to the data.
	XRange *Range
	// YRange fixes the y axis; nil uses zero to a little above the data, capped by DemandCapFactor.
	YRange *Range
	// Footer is one line of text along the bottom edge (the caution on an
	// exported image), shrunk to fit the width; empty draws none.
	Footer string
	// KeyNote, when set, says the series are also keyed outside the chart
	// (beside the rows of a table, say): when the full legend would not fit,
	// the legend then lists only the pinned series, the reference keys and
	// this note, instead of hiding candidates.
	KeyNote string
}
