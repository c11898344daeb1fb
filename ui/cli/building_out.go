package cli

import (
	"path/filepath"
	"strings"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/model"
)

// ElevationPath is where the building command writes the elevation beside
// the plan: NAME-elevation.EXT for the plan's NAME.EXT.
func ElevationPath(plan string) string {
	ext := filepath.Ext(plan)
	return strings.TrimSuffix(plan, ext) + "-elevation" + ext
}

// writeBuildingPictures draws the floor plan of the chosen family and
// storey to path and the elevation of its stacks beside it.
func writeBuildingPictures(s *model.Schedule, path string) error {
	if _, err := plots.FormatOf(path); err != nil {
		return usagef("--out %q: %v", path, err)
	}
	fi := chart.PlanFamily(s)
	if fi < 0 {
		return usagef("--out %q: no family to draw", path)
	}
	p := chart.FloorPlan(s, fi, chart.PlanStorey(s))
	if err := plots.SaveFloorPlan(path, &p, plots.DefaultBuildingSize); err != nil {
		return err
	}
	e := chart.Elevation(s, fi)
	return plots.SaveElevation(ElevationPath(path), &e, plots.DefaultBuildingSize)
}

// writeBuildingDXF writes the floor plan of the chosen family and storey as DXF.
func writeBuildingDXF(s *model.Schedule, path string) error {
	if !strings.EqualFold(filepath.Ext(path), ".dxf") {
		return usagef("--dxf %q: give a file name ending in .dxf", path)
	}
	fi := chart.PlanFamily(s)
	if fi < 0 {
		return usagef("--dxf %q: no family to draw", path)
	}
	p := chart.FloorPlan(s, fi, chart.PlanStorey(s))
	return plots.SaveFloorPlanDXF(path, &p)
}
