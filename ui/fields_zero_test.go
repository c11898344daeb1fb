package ui

import (
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/units"
)

// Only a blank field means its default; a zero typed is refused with what
// the field accepts, and every message reads as English ("an area").
func TestTypedZeroIsNotTheDefaultAndMessagesRead(t *testing.T) {
	for _, c := range []struct{ id, text string }{
		{"f'c", "0"}, {"f'c", "0 psi"}, {"steel Fy", "0"}, {"K", "0"},
	} {
		_, err := specByID(c.id).parse(c.text, units.US)
		require.Error(t, err, "%s %q", c.id, c.text)
		assert.Contains(t, err.Error(), "blank", "%s: says how to get the default", c.id)
	}
	_, err := specByID("tributary").parse("lots", units.US)
	require.Error(t, err)
	assert.Contains(t, err.Error(), "an area")
	assert.NotContains(t, err.Error(), "a area")
	_, err = specByID("length").parse("tall", units.US)
	require.Error(t, err)
	assert.Contains(t, err.Error(), "a length")
}
