package cli

import (
	"encoding/csv"
	"encoding/json"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
)

// The text output, the JSON and the CSV use the model's one set of status words.
func TestOneSetOfStatusWords(t *testing.T) {
	words := map[string]bool{model.StatusWorks: true, model.StatusFails: true, model.StatusNotPermitted: true}
	args := []string{"--length", "30ft", "--load", "400kip", "--all"}

	code, out, errOut := run(append([]string{"compare"}, args...)...)
	require.Equal(t, 0, code, errOut)
	seen := map[string]bool{}
	for _, line := range strings.Split(out, "\n")[4:] {
		for w := range words {
			if strings.HasPrefix(line, w+" ") {
				seen[w] = true
			}
		}
	}
	assert.True(t, seen[model.StatusWorks] && seen[model.StatusFails], "text uses works and fails: %v", seen)
	for _, old := range []string{"OK ", "FAILS", "NOT PERMITTED"} {
		assert.NotContains(t, out, old)
	}

	code, out, errOut = run(append([]string{"compare", "--json"}, args...)...)
	require.Equal(t, 0, code, errOut)
	var cs []Candidate
	require.NoError(t, json.Unmarshal([]byte(out), &cs))
	for _, c := range cs {
		assert.True(t, words[c.Status], "json status %q", c.Status)
		assert.Equal(t, c.OK, c.Status == model.StatusWorks)
	}

	code, out, errOut = run(append([]string{"table"}, args...)...)
	require.Equal(t, 0, code, errOut)
	recs, err := csv.NewReader(strings.NewReader(out)).ReadAll()
	require.NoError(t, err)
	col := -1
	for i, h := range recs[0] {
		if h == "status" {
			col = i
		}
	}
	require.GreaterOrEqual(t, col, 0, "the CSV has a status column: %v", recs[0])
	for _, r := range recs[1:] {
		assert.True(t, words[r[col]], "csv status %q", r[col])
	}
}
