package schemefile

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
)

// TestCompositeObjectOptional checks a version-1 file without the
// "composite" object (written before the material existed) reads with the
// composite defaults, and that a written one reads back.
func TestCompositeObjectOptional(t *testing.T) {
	b, err := os.ReadFile(filepath.Join("..", "..", "testdata", "schemes", "demo.upright.json"))
	require.NoError(t, err)
	s := string(b)
	i := strings.Index(s, `  "composite": {`)
	require.GreaterOrEqual(t, i, 0)
	j := strings.Index(s[i:], "},\n") + i + 3
	old := s[:i] + s[j:]
	require.NotContains(t, old, "composite")
	sc, err := Unmarshal([]byte(old))
	require.NoError(t, err)
	assert.Equal(t, model.CompositeOptions{}, sc.Composite)

	// Fields inside the object may be left out too.
	partial := s[:i] + `  "composite": {"fill_fc": "6 ksi"},` + "\n" + s[j:]
	sc, err = Unmarshal([]byte(partial))
	require.NoError(t, err)
	assert.InDelta(t, 41.37, sc.Composite.FillFcMPa, 0.01)
	assert.Nil(t, sc.Composite.Families)

	sc.Composite.Families = []string{"Filled HSS round"}
	out, err := Marshal(sc)
	require.NoError(t, err)
	back, err := Unmarshal(out)
	require.NoError(t, err)
	assert.Equal(t, sc.Composite, back.Composite)
}

// TestCompositeBadValuesNamed checks a bad fill strength or family is
// refused with the field's path and what is accepted.
func TestCompositeBadValuesNamed(t *testing.T) {
	b, err := os.ReadFile(filepath.Join("..", "..", "testdata", "schemes", "demo.upright.json"))
	require.NoError(t, err)
	s := string(b)
	for _, c := range []struct{ from, to, field, says string }{
		{`"fill_fc": null`, `"fill_fc": "2 ksi"`, "composite.fill_fc", "3,000 to 10,000 psi"},
		{`"fill_fc": null`, `"fill_fc": 5`, "composite.fill_fc", "expected a string or null"},
		{`"composite": {
    "families": []`, `"composite": {
    "families": ["Filled pipe"]`, "composite.families", "Filled HSS round"},
		{`"fill_fc": null`, `"fill_fc": null, "extra": 1`, "composite.extra", "unknown field"},
	} {
		bad := strings.Replace(s, c.from, c.to, 1)
		require.NotEqual(t, s, bad, c.to)
		_, err := Unmarshal([]byte(bad))
		require.Error(t, err, c.to)
		var e *Error
		require.ErrorAs(t, err, &e)
		assert.Equal(t, c.field, e.Field, c.to)
		assert.Contains(t, err.Error(), c.says, c.to)
	}
}
