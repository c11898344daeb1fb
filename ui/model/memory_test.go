package model

import (
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
)

// The takedown's load factors and reduction limits were recalled from
// memory, and its trace says so beside each.
func TestTakedownMarksRecalledFactorsAndLimits(t *testing.T) {
	for _, d := range append(append([]comboDef{}, lrfdDefs...), asdDefs...) {
		assert.True(t, strings.HasSuffix(d.clause, "(factors from memory)"), d.clause)
	}
	// 3 floors of 400 m² with KLL 4: Eq. 4.7-1 gives 0.32, below the 0.40
	// floor of ASCE 7-22 4.7.2 for two or more floors, which then governs.
	l := Load{Mode: LoadTakedown, Floors: 3, FloorLiveKPa: 2.4, LiveReduction: true, Occupancy: OccGeneral}
	m, steps := liveMultiplier(l, 4, 1200)
	assert.InDelta(t, 0.40, m, 1e-12)
	last := steps[len(steps)-1]
	assert.Equal(t, "ASCE 7-22 4.7.2 (limit from memory)", last.Clause)
	assert.Contains(t, last.Formula, "3 floors supported")
}
