package cli

import (
	"fmt"

	"upright/ui/model"
)

// writeBuildingPictures draws the floor plan and the elevation.
func writeBuildingPictures(s *model.Schedule, path string) error {
	return fmt.Errorf("--out %q: pictures not yet written", path)
}

// writeBuildingDXF writes the floor plan as DXF.
func writeBuildingDXF(s *model.Schedule, path string) error {
	return fmt.Errorf("--dxf %q: DXF not yet written", path)
}
