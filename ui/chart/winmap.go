package chart

import (
	"fmt"

	"upright/plots"
	"upright/ui/model"
	"upright/ui/units"
)

// mapShortY is the map's short y-axis title, for a map too short for the
// long one.
func mapShortY(sc *model.Scheme, axis model.MapAxis) string {
	sys := units.System(sc.Units)
	if axis == model.MapTributary {
		if sys == units.SI {
			return "Area (m²)"
		}
		return "Area (ft²)"
	}
	_, fu := units.ForceValue(0, sys)
	return "Load (" + fu + ")"
}

// MapLabels returns the map's axis labels in the scheme's units: unbraced
// length across, and the typed load (factored or service) or the tributary
// area per floor up.
func MapLabels(sc *model.Scheme, axis model.MapAxis) (x, y string) {
	sys := units.System(sc.Units)
	_, lu := units.LengthValue(0, sys)
	_, fu := units.ForceValue(0, sys)
	x = fmt.Sprintf("Unbraced length (%s)", lu)
	switch {
	case axis == model.MapTributary:
		au := "ft²"
		if sys == units.SI {
			au = "m²"
		}
		y = fmt.Sprintf("Tributary area per floor (%s)", au)
	case sc.Setting.Method == model.ASD:
		y = fmt.Sprintf("Axial load, service (%s)", fu)
	default:
		y = fmt.Sprintf("Axial load, factored (%s)", fu)
	}
	return x, y
}

// MapValue converts a map row's load (N) or area (m²) to display units.
func MapValue(v float64, axis model.MapAxis, sys units.System) float64 {
	if axis == model.MapTributary {
		if sys == units.SI {
			return v
		}
		return v / units.M2PerFt2
	}
	f, _ := units.ForceValue(v, sys)
	return f
}

// MapHeading names what the map ranks by, for the legend.
func MapHeading(metric model.Metric) string {
	switch metric {
	case model.ByFootprint:
		return "Smallest footprint"
	case model.ByCarbon:
		return "Least embodied carbon"
	}
	return "Lightest family"
}

// MapKeyLabel names a family on the map and in its legend.
func MapKeyLabel(f model.MapFamily) string {
	return fmt.Sprintf("%s (%s)", f.Name, f.Material)
}

// Map turns a winner map into the plots package's map in display units:
// each cell coloured by its shown family (the one the crossover list names
// there, near-ties kept as the list keeps them), one key per family shown
// somewhere (in the model's family order), boundaries where the shown
// family changes, a dot where the strict best is another family within the
// tie tolerance, the scheme's own point and the caution.
func Map(g *model.WinMap, sc *model.Scheme, title string) plots.Map {
	sys := units.System(sc.Units)
	xl, yl := MapLabels(sc, g.Axis)
	pm := plots.Map{Title: title, XLabel: xl, YLabel: yl, YShort: mapShortY(sc, g.Axis), Heading: MapHeading(g.Metric), Caution: model.Caution}
	for _, L := range g.LengthsMM {
		v, _ := units.LengthValue(L, sys)
		pm.X = append(pm.X, v)
	}
	for _, v := range g.Loads {
		pm.Y = append(pm.Y, MapValue(v, g.Axis, sys))
	}
	key := make([]int, len(g.Families))
	for i := range key {
		key[i] = -1
	}
	for k := range g.Cells {
		if f := g.Cells[k].Shown; f >= 0 {
			key[f] = 0
		}
	}
	for fi, f := range g.Families {
		if key[fi] == 0 {
			key[fi] = len(pm.Keys)
			pm.Keys = append(pm.Keys, plots.MapKey{Label: MapKeyLabel(f), Group: f.Material})
		}
	}
	nx, ny := len(g.LengthsMM), len(g.Loads)
	pm.Cells = make([]int, len(g.Cells))
	pm.Walls = make([]uint8, len(g.Cells))
	pm.Ties = make([]bool, len(g.Cells))
	pm.TieLabel = MapTieLabel(g.Tie)
	for i := 0; i < ny; i++ {
		for j := 0; j < nx; j++ {
			k := i*nx + j
			c := &g.Cells[k]
			pm.Cells[k] = -1
			if c.Shown >= 0 {
				pm.Cells[k] = key[c.Shown]
			}
			pm.Ties[k] = g.Tied(c)
			if j+1 < nx && g.Boundary(c, &g.Cells[k+1]) {
				pm.Walls[k] |= plots.WallRight
			}
			if i+1 < ny && g.Boundary(c, &g.Cells[k+nx]) {
				pm.Walls[k] |= plots.WallUp
			}
		}
	}
	px, _ := units.LengthValue(g.PointLengthMM, sys)
	pm.Point = &plots.Point{X: px, Y: MapValue(g.PointLoad, g.Axis, sys)}
	return pm
}

// MapTieLabel names the near-tie dots in the map's legend, e.g. "Near-tie
// kept (within 5%)".
func MapTieLabel(tie float64) string {
	return fmt.Sprintf("Near-tie kept (%s)", model.TieText(tie))
}

// MapCellAt returns the load row and length column of the cell nearest a
// point in display units, clamped to the grid.
func MapCellAt(g *model.WinMap, sys units.System, x, y float64) (i, j int) {
	return nearest(func(k int) float64 { return MapValue(g.Loads[k], g.Axis, sys) }, len(g.Loads), y),
		nearest(func(k int) float64 { v, _ := units.LengthValue(g.LengthsMM[k], sys); return v }, len(g.LengthsMM), x)
}

// nearest returns the index of the value nearest v among n increasing values.
func nearest(at func(k int) float64, n int, v float64) int {
	best := 0
	for k := 1; k < n; k++ {
		if d, bd := at(k)-v, at(best)-v; d*d < bd*bd {
			best = k
		}
	}
	return best
}
