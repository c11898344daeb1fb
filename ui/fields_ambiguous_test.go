package ui

import (
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/units"
)

// A field typed with an ambiguous unit shows, under the field, the same
// reason the commands and scheme files give (units.ParseError.Why, checked
// word for word in ui/units) and what the field accepts; no display needed.
func TestAmbiguousUnitFieldMessage(t *testing.T) {
	for _, c := range []struct {
		id, text string
		parse    func(string) (float64, error)
	}{
		{"load", "1800k", units.ParseForce},
		{"load", "200t", units.ParseForce},
		{"load", "200 tons", units.ParseForce},
		{"load", "90,000#", units.ParseForce},
		{"length", "14'6", units.ParseLength},
		{"length", "4.2M", units.ParseLength},
		{"weak-axis length", "14ft 6", units.ParseLength},
		{"dead", "4kN/m", units.ParsePressure},
		{"live", "50lb/ft", units.ParsePressure},
		{"snow", "200kg/m2", units.ParsePressure},
		{"tributary", "60m", units.ParseArea},
		{"steel Fy", "50k", units.ParseStress},
		{"f'c", "5k", units.ParseStress},
	} {
		typed := c.text
		if typed == "90,000#" {
			typed = "90000#" // the field drops the thousands separator before reading
		}
		_, perr := c.parse(typed)
		var pe *units.ParseError
		require.ErrorAs(t, perr, &pe, c.text)
		require.NotEmpty(t, pe.Why(), "%q is ambiguous in ui/units", c.text)

		for _, sys := range []units.System{units.US, units.SI} {
			_, err := specByID(c.id).parse(c.text, sys)
			require.Error(t, err, "%s %q", c.id, c.text)
			assert.Contains(t, err.Error(), pe.Why(), "%s %q: the reason", c.id, c.text)
			assert.Contains(t, err.Error(), specByID(c.id).accepted(sys), "%s %q: what the field accepts", c.id, c.text)
		}

		st := NewState(DemoScheme())
		st.SetText(c.id, c.text)
		assert.Contains(t, st.FieldError(c.id), pe.Why(), "%s %q: shown under the field", c.id, c.text)
	}
	// The unambiguous spellings are read: 400 kip = 400 × 4448.2216152605 N (exact definition from lbf).
	v, err := specByID("load").parse("400kip", units.SI)
	require.NoError(t, err)
	assert.InDelta(t, 400*4448.2216152605, v, 1e-6)
}
