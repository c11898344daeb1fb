package schemefile

import (
	"os"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
)

// "tie" may be absent (a file from before it existed): the default, 5%. A
// value given is read as given, 0 included (no tolerance), within 0 to 0.5.
func TestTieFieldMayBeAbsent(t *testing.T) {
	b, err := os.ReadFile("../../testdata/schemes/demo.upright.json")
	require.NoError(t, err)
	s := string(b)
	require.Contains(t, s, ",\n  \"tie\": 0.05\n")
	without := strings.Replace(s, ",\n  \"tie\": 0.05\n", "\n", 1)
	sc, err := Unmarshal([]byte(without))
	require.NoError(t, err)
	assert.Equal(t, model.DefaultTie, sc.Tie)

	sc, err = Unmarshal([]byte(strings.Replace(s, `"tie": 0.05`, `"tie": 0`, 1)))
	require.NoError(t, err)
	assert.Equal(t, 0.0, sc.Tie, "a given 0 is no tolerance, not the default")

	for _, bad := range []string{`"tie": 0.6`, `"tie": -0.1`, `"tie": "5%"`} {
		_, err = Unmarshal([]byte(strings.Replace(s, `"tie": 0.05`, bad, 1)))
		require.Error(t, err, bad)
		assert.Contains(t, err.Error(), "tie", bad)
	}
	out, err := Marshal(sc)
	require.NoError(t, err)
	assert.Contains(t, string(out), `"tie": 0`, "Marshal always writes it")
}
