package cli

import (
	"encoding/json"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

const demoScheme = "../../testdata/schemes/demo.upright.json"

// The default length range of every headless command that searches or draws
// over lengths reads in round numbers of the shown unit: 2 ft to 40 ft for the
// demo (18 ft, US), 0.5 m to 12 m for a 4.2 m column typed in metres. The
// round ends are the rule of model.DefaultRange; 1 ft = 304.8 mm exactly.
func TestDefaultRangesAreRoundInTheShownUnit(t *testing.T) {
	cases := []struct {
		why      string
		args     []string
		from, to float64 // mm
	}{
		{"demo scheme, US", []string{"--scheme", demoScheme}, 2 * units.MMPerFoot, 40 * units.MMPerFoot},
		{"metric input, SI", []string{"--length", "4.2m", "--load", "1500kN"}, 500, 12000},
		{"a 35 ft column steps out to 60 ft", []string{"--length", "35ft", "--load", "300kip"}, 2 * units.MMPerFoot, 60 * units.MMPerFoot},
	}
	for _, c := range cases {
		t.Run(c.why, func(t *testing.T) {
			sys := units.US
			if c.from == 500 {
				sys = units.SI
			}
			want := "Crossovers from " + units.Length(c.from, sys) + " to " + units.Length(c.to, sys) + " "
			code, out, errOut := run(append([]string{"crossovers"}, c.args...)...)
			require.Equal(t, 0, code, errOut)
			assert.Contains(t, out, want, "crossovers")

			code, out, errOut = run(append([]string{"curve", "--designation", "W12X65", "--json"}, c.args...)...)
			require.Equal(t, 0, code, errOut)
			var cv CurveJSON
			require.NoError(t, json.Unmarshal([]byte(out), &cv))
			require.NotEmpty(t, cv.Points)
			assert.InDelta(t, c.from, cv.Points[0].LengthMM, 0.05, "curve's first length")
			assert.InDelta(t, c.to, cv.Points[len(cv.Points)-1].LengthMM, 0.05, "curve's last length")

			code, out, errOut = run(append([]string{"map", "--json", "--steps", "10x5"}, c.args...)...)
			require.Equal(t, 0, code, errOut)
			var mp MapJSON
			require.NoError(t, json.Unmarshal([]byte(out), &mp))
			require.NotEmpty(t, mp.LengthsMM)
			assert.InDelta(t, c.from, mp.LengthsMM[0], 0.05, "map's first length")
			assert.InDelta(t, c.to, mp.LengthsMM[len(mp.LengthsMM)-1], 0.05, "map's last length")
		})
	}
}

// The help of every range flag says the default is round in the shown unit.
func TestRangeFlagHelpNamesTheRoundDefault(t *testing.T) {
	for _, cmd := range []string{"crossovers", "curve", "report", "map"} {
		_, out, errOut := run(cmd, "-h")
		assert.Contains(t, out+errOut, model.DefaultRangeHelp, cmd)
		assert.NotContains(t, out+errOut, "larger of 12 m", cmd)
	}
}
