package plots

import (
	"testing"

	"github.com/stretchr/testify/assert"
)

// TestCompositeStyle checks the filled-tube group has its own legend
// heading, its own dash pattern (so it reads apart in grey) and a counter
// slot of its own.
func TestCompositeStyle(t *testing.T) {
	f := familyFor("Composite")
	assert.Equal(t, "Composite", f.name)
	assert.NotSame(t, neutralFamily, f)
	ids := map[int]bool{neutralFamily.id: true}
	for name, g := range families {
		assert.Less(t, g.id, familyCount, name)
		assert.False(t, ids[g.id], "%s shares a counter slot", name)
		ids[g.id] = true
		if name != "composite" {
			assert.NotEqual(t, g.dashes, f.dashes, "composite and %s share a dash pattern", name)
		}
	}
	assert.Less(t, neutralFamily.id, familyCount)
}
