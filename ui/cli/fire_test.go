package cli

import (
	"encoding/json"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func fireCandidates(t *testing.T, args ...string) []Candidate {
	t.Helper()
	code, out, errOut := run(append([]string{"compare", "--length", "4m", "--load", "1500kN", "--all", "--json"}, args...)...)
	require.Equal(t, 0, code, errOut)
	var arr []Candidate
	require.NoError(t, json.Unmarshal([]byte(out), &arr))
	require.NotEmpty(t, arr)
	return arr
}

// compare --fire 2h --length 4m --load 1500kN lists fewer working sizes
// (or larger ones) than without the rating, and the JSON carries each
// candidate's fire object with the protected and bare plans.
func TestCompareFireListsFewerOrLarger(t *testing.T) {
	bare := fireCandidates(t)
	fire := fireCandidates(t, "--fire", "2h")
	working := func(cs []Candidate) map[string]Candidate {
		out := map[string]Candidate{}
		for _, c := range cs {
			if c.OK {
				out[c.Designation] = c
			}
		}
		return out
	}
	wb, wf := working(bare), working(fire)
	listed := map[string]bool{}
	for _, c := range bare {
		listed[c.Designation] = true
	}
	assert.Less(t, len(wf), len(wb), "fewer working sizes with a 2 h rating")
	for des, c := range wf {
		if !listed[des] {
			continue // a bar layout that only the larger fire cover gives
		}
		b, ok := wb[des]
		assert.True(t, ok, "%s works with the rating but not without", des)
		assert.GreaterOrEqual(t, c.PlanAreaMM2, b.PlanAreaMM2, des)
	}
	for _, c := range fire {
		f := c.Fire
		assert.Equal(t, 2.0, f.RatingH, c.Designation)
		assert.NotEmpty(t, f.System, c.Designation)
		assert.NotEmpty(t, f.Clause, c.Designation)
		assert.Equal(t, c.FootprintMM, f.FootprintMM, "footprint_mm is the protected plan")
		switch c.Material {
		case "steel":
			if f.OK {
				assert.GreaterOrEqual(t, f.ProvidedH, 2.0)
			}
			assert.Positive(t, f.Layers)
			assert.InDelta(t, 15.88, f.LayerMM, 0.01, "5/8 in")
			assert.InDelta(t, float64(f.Layers)*15.875, f.ThicknessMM, 0.01)
			assert.Positive(t, f.HeatedPerimeterMM)
			assert.InDelta(t, f.BareFootprintMM[0]+2*f.ThicknessMM, f.FootprintMM[0], 0.2, c.Designation)
		case "concrete":
			assert.InDelta(t, 254, f.MinDimensionMM, 0.1, "10 in siliceous at 2 h (ACI/TMS 216.1-14, from memory)")
			assert.GreaterOrEqual(t, f.CoverMM, 50.8-0.1, "2 in to the bars at 2 h")
			assert.Equal(t, f.BareFootprintMM, f.FootprintMM)
		case "timber":
			assert.Contains(t, f.Clause, "NDS 2018")
		}
		if !f.OK {
			assert.False(t, c.OK, "%s: a size that does not reach the rating does not work", c.Designation)
			if c.Material != "timber" { // timber's fire case is part of its strength
				assert.False(t, c.Permitted)
			}
			assert.NotEmpty(t, f.Reason)
		}
	}
	for _, c := range bare {
		assert.Zero(t, c.Fire.RatingH)
		assert.Equal(t, c.FootprintMM, c.Fire.BareFootprintMM)
	}
}

func TestCompareFireTextSaysRating(t *testing.T) {
	code, out, errOut := run("compare", "--length", "4m", "--load", "1500kN", "--fire", "1.5h", "--aggregate", "carbonate")
	require.Equal(t, 0, code, errOut)
	assert.Contains(t, out, "Fire rating 1.5 h for every material (steel: gypsum board; filled tubes exposed by IBC 722.5.1.5 where it applies, else as steel; concrete: carbonate aggregate)")
	code, out, _ = run("compare", "--length", "4m", "--load", "1500kN")
	require.Equal(t, 0, code)
	assert.False(t, strings.Contains(out, "Fire rating"))
}
