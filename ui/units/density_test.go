package units

import (
	"testing"

	"github.com/stretchr/testify/assert"
)

// TestConvertDensityAndStiffness checks the trace units the composite
// columns use read in US units: 1 lb/ft³ = 16.0185 kg/m³ (exact from the
// pound and the foot) and 1 kip·ft² = 0.41325 kN·m² (from memory).
func TestConvertDensityAndStiffness(t *testing.T) {
	v, u := Convert(16.01846337, "kg/m³", US)
	assert.InDelta(t, 1, v, 1e-8)
	assert.Equal(t, "lb/ft³", u)
	v, u = Convert(0.413253, "kN·m²", US)
	assert.InDelta(t, 1, v, 1e-5)
	assert.Equal(t, "kip·ft²", u)
}
