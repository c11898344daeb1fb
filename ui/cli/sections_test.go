package cli

import (
	"encoding/json"
	"html"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// bestSizes runs compare --json and returns each family's first row when it works.
func bestSizes(t *testing.T, args ...string) map[string]string {
	t.Helper()
	code, out, errOut := run(append([]string{"compare", "--json"}, args...)...)
	require.Equal(t, 0, code, errOut)
	var cands []Candidate
	require.NoError(t, json.Unmarshal([]byte(out), &cands))
	best := map[string]string{}
	for _, c := range cands {
		if c.OK {
			best[c.Family] = c.Designation
		}
	}
	require.NotEmpty(t, best)
	return best
}

// TestSectionsSVGLabelsEveryBestSize draws the figure of the documented
// example and checks that every family's best working size, as compare
// reports it, is labelled in the SVG, with the caution.
func TestSectionsSVGLabelsEveryBestSize(t *testing.T) {
	args := []string{"--length", "4.2m", "--load", "1500kN"}
	best := bestSizes(t, args...)
	path := filepath.Join(t.TempDir(), "s.svg")
	code, out, errOut := run(append([]string{"sections", "--out", path}, args...)...)
	require.Equal(t, 0, code, errOut)
	assert.Contains(t, out, "Preliminary sizing")
	data, err := os.ReadFile(path)
	require.NoError(t, err)
	svg := string(data)
	desc := svg[strings.Index(svg, "<desc>"):strings.Index(svg, "</desc>")]
	// Long designations are labelled on two lines (the size, then the
	// rest), which the description joins with a comma.
	desc = strings.ReplaceAll(desc, " glulam, ", " glulam ")
	for fam, des := range best {
		assert.Contains(t, desc, des, "%s best size %s is labelled", fam, des)
		assert.Contains(t, out, des)
	}
	assert.Contains(t, desc, "Preliminary sizing for scheme comparison only")
	assert.Greater(t, strings.Count(svg, "<path"), 2*len(best), "sections are drawn")
	assert.Greater(t, strings.Count(svg, "<text"), 3*len(best), "labels are text")
	for _, des := range best {
		// The first line of each label (long ones wrap at a comma or after the size).
		first := strings.Split(des, ",")[0]
		if i := strings.Index(first, " glulam"); i > 0 {
			first = first[:i]
		}
		assert.True(t, strings.Contains(svg, ">"+html.EscapeString(first)), "%s is searchable text", first)
	}
}

// TestSectionsJSONLayout checks the layout: one entry per family's best
// working size, all at the one px_per_mm.
func TestSectionsJSONLayout(t *testing.T) {
	args := []string{"--length", "4.2m", "--load", "1500kN"}
	best := bestSizes(t, args...)
	code, out, errOut := run(append([]string{"sections", "--json"}, args...)...)
	require.Equal(t, 0, code, errOut)
	var got SectionsJSON
	require.NoError(t, json.Unmarshal([]byte(out), &got))
	require.Len(t, got.Sections, len(best))
	require.Greater(t, got.PxPerMM, 0.0)
	for _, s := range got.Sections {
		assert.Equal(t, best[s.Family], s.Designation)
		assert.InDelta(t, (s.WidthMM+2*s.ProtectionMM)*got.PxPerMM, s.WidthPx, 0.02, s.Designation)
		assert.InDelta(t, (s.HeightMM+2*s.ProtectionMM)*got.PxPerMM, s.HeightPx, 0.02, s.Designation)
		assert.GreaterOrEqual(t, s.XPx, 0.0)
		assert.LessOrEqual(t, s.XPx+s.WidthPx, float64(got.WidthPx))
		assert.LessOrEqual(t, s.YPx+s.HeightPx, float64(got.HeightPx))
	}
	assert.Contains(t, errOut, "Preliminary sizing")
}

// TestSectionsBadInput checks the exit status 2 and the message naming the flag.
func TestSectionsBadInput(t *testing.T) {
	for _, c := range []struct {
		args []string
		want string
	}{
		{[]string{"sections", "--length", "4m"}, "--out"},
		{[]string{"sections", "--out", "s.gif"}, ".png, .svg or .pdf"},
		{[]string{"sections", "--out", "s.svg", "--length", "tall"}, "--length"},
	} {
		code, _, errOut := run(append(c.args, "--load", "1000kN")...)
		assert.Equal(t, 2, code, c.args)
		assert.Contains(t, errOut, c.want, c.args)
	}
}
