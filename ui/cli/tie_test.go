package cli

import (
	"encoding/json"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
)

func familyChanges(t *testing.T, args ...string) []model.Crossover {
	t.Helper()
	code, out, errOut := run(append([]string{"crossovers", "--json", "--scheme", "../../testdata/schemes/demo.upright.json"}, args...)...)
	require.Equal(t, 0, code, errOut)
	var xs []model.Crossover
	require.NoError(t, json.Unmarshal([]byte(out), &xs))
	var fam []model.Crossover
	for _, x := range xs {
		if x.Kind == model.KindFamily {
			fam = append(fam, x)
		}
	}
	return fam
}

// The demo's best family flips between near-equal options without a
// tolerance; the default 5% keeps fewer changes, each one a gain of more
// than 5% or the family in front running out.
func TestTieFlagOnTheDemo(t *testing.T) {
	exact := familyChanges(t, "--tie", "0")
	def := familyChanges(t)
	five := familyChanges(t, "--tie", "5%")
	assert.Equal(t, def, five, "the default is 5%")
	assert.Less(t, len(def), len(exact), "the tolerance removes changes: %d exact, %d within 5%%", len(exact), len(def))
	for _, x := range def {
		assert.Equal(t, 0.05, x.Tie)
	}
	wide := familyChanges(t, "--tie", "0.5")
	assert.LessOrEqual(t, len(wide), len(def))

	for _, bad := range []string{"-1%", "60%", "0.9", "five", "NaN"} {
		code, out, errOut := run("crossovers", "--tie", bad)
		assert.Equal(t, 2, code, bad)
		assert.Empty(t, out)
		assert.Contains(t, errOut, "--tie")
		assert.Contains(t, errOut, "0 to 50%", bad)
	}
	// compare names the best overall and the families within the tolerance.
	code, out, errOut := run("compare", "--scheme", "../../testdata/schemes/demo.upright.json", "--tie", "20%")
	require.Equal(t, 0, code, errOut)
	assert.Contains(t, out, "near-tie tolerance 20%")
	line := ""
	for _, l := range strings.Split(out, "\n") {
		if strings.HasPrefix(l, "Best overall") {
			line = l
		}
	}
	assert.Contains(t, line, "within 20%: ") // glulam 29.7 lb/ft, HSS13.375X0.250 35.1 lb/ft at 18 ft
}
