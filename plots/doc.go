// Package plots draws the candidate-comparison chart: design strength against
// unbraced length for each column candidate, with the demand line, a marker at
// the current length and the crossover points where one candidate takes over
// from another.
//
// The package knows nothing about materials or codes. It takes plain numbers
// in the caller's display units (a Chart), checks them (Chart.Validate), and
// draws them with gonum.org/v1/plot, either into a reusable raster buffer
// (Raster) for an interactive window, or to PNG, SVG or PDF (WriteChart,
// SaveChart).
//
// Styling: each material group gets its own colour family from the Okabe–Ito
// palette and its own dash pattern, and every series within a group gets its
// own point-glyph shape, so the chart stays readable for colour-blind readers
// and when printed in grey. The demand is a thick black dashed line. The y axis
// starts at zero and is capped at DemandCapFactor times the largest demand so
// that one very strong candidate does not flatten the others.
//
// It also draws the winner map (Map): a grid over unbraced length and load
// coloured by the family that wins each cell, each family's region hatched
// in its own pattern so the map reads in grey, bold boundaries where the
// winner changes, cross-hatched grey where nothing works, the scheme's own
// point, a legend and the caution line; into a reusable MapRaster or to
// PNG, SVG or PDF (WriteMap, SaveMap).
//
// The package also draws the plan-sections sheet (PlanSheet): candidates'
// plan sections side by side at one scale with a reference square and a
// scale bar, into a Raster (RenderPlan) or to PNG, SVG or PDF (WritePlan,
// SavePlan), reporting where each section lies (PlanLayout).
package plots
