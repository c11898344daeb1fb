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

// Version-1 files (kept as written by the version-1 program in
// testdata/v1) read unchanged: their timber fire exposure becomes the
// scheme's rating, the aggregate is siliceous and the gypsum board carbon
// factor, which they lack, is the default. They read to exactly the scheme
// of the same file rewritten as version 2.
func TestVersion1FilesRead(t *testing.T) {
	for _, c := range []struct{ file, rating string }{
		{"pavilion.upright.json", "1h"},
		{"demo.upright.json", "none"},
	} {
		v1, err := os.ReadFile(filepath.Join("testdata", "v1", c.file))
		require.NoError(t, err)
		require.Contains(t, string(v1), `"version": 1`)
		sc, err := Unmarshal(v1)
		require.NoError(t, err, c.file)
		assert.Equal(t, c.rating, sc.Fire.Rating, c.file)
		assert.Equal(t, "siliceous", sc.Fire.Aggregate)
		assert.Equal(t, 0.25, sc.Carbon[model.CarbonGypsum])
		v2, err := os.ReadFile(filepath.Join("..", "..", "testdata", "schemes", c.file))
		require.NoError(t, err)
		want, err := Unmarshal(v2)
		require.NoError(t, err)
		assert.Equal(t, want, sc, c.file)
		out, err := Marshal(sc)
		require.NoError(t, err)
		assert.Equal(t, string(v2), string(out), "a version-1 file is saved as version 2")
	}
}

// A version-1 file still needs its timber "fire", and its value is checked
// against the ratings, naming the field where the file has it.
func TestVersion1FireField(t *testing.T) {
	v1, err := os.ReadFile(filepath.Join("testdata", "v1", "demo.upright.json"))
	require.NoError(t, err)
	s := string(v1)
	_, err = Unmarshal([]byte(strings.Replace(s, `"fire": "none",`, ``, 1)))
	var fe *Error
	require.ErrorAs(t, err, &fe)
	assert.Equal(t, "timber.fire", fe.Field)
	_, err = Unmarshal([]byte(strings.Replace(s, `"fire": "none",`, `"fire": "5h",`, 1)))
	require.ErrorAs(t, err, &fe)
	assert.Equal(t, "fire.rating", fe.Field)
	assert.Positive(t, fe.Line)
}

// In version 2 the fire object and its fields may be absent: no rating,
// siliceous aggregate.
func TestFireObjectOptional(t *testing.T) {
	v2, err := os.ReadFile(filepath.Join("..", "..", "testdata", "schemes", "pavilion.upright.json"))
	require.NoError(t, err)
	s := strings.Replace(string(v2), `  "fire": {
    "rating": "1h",
    "aggregate": "siliceous",
    "steel_protection": "board"
  },
`, "", 1)
	require.NotEqual(t, string(v2), s)
	sc, err := Unmarshal([]byte(s))
	require.NoError(t, err)
	assert.Equal(t, model.DefaultScheme().Fire, sc.Fire)
	s = strings.Replace(string(v2), `"aggregate": "siliceous"`, `"aggregate": "carbonate"`, 1)
	s = strings.Replace(s, `"rating": "1h",`, ``, 1)
	sc, err = Unmarshal([]byte(s))
	require.NoError(t, err)
	s = strings.Replace(s, `"steel_protection": "board"`, `"steel_protection": "spray"`, 1)
	sc, err = Unmarshal([]byte(s))
	require.NoError(t, err)
	assert.Equal(t, model.FireOptions{Rating: "none", Aggregate: "carbonate", SteelProtection: "spray"}, sc.Fire)
	// A file from before the steel protection field reads as board.
	s = strings.Replace(s, `,
    "steel_protection": "spray"`, ``, 1)
	sc, err = Unmarshal([]byte(s))
	require.NoError(t, err)
	assert.Equal(t, "board", sc.Fire.SteelProtection)
}

// The glulam combinations the format document gives as an example are
// names the model accepts.
func TestDocGlulamExampleNamesAreAccepted(t *testing.T) {
	sc := model.DefaultScheme()
	sc.Timber.GlulamCombos = []string{"Comb. 3 DF", "Comb. 5 DF", "24F-1.8E"}
	require.NoError(t, sc.Validate())
}
