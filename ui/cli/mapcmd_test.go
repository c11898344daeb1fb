package cli

import (
	"encoding/json"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// TestMapJSONAgreesWithCompare runs map --json on a small grid and checks
// cells against compare --json at that length and load: the best working
// candidate of compare has the same metric (the map's unit is compare's
// mass_kg_per_m, plan_area_mm2 or carbon_kgCO2e).
func TestMapJSONAgreesWithCompare(t *testing.T) {
	for _, rank := range []string{"weight", "footprint", "carbon"} {
		t.Run(rank, func(t *testing.T) {
			code, out, errOut := run("map", "--length", "4m", "--load", "2000kN", "--rank", rank,
				"--length-range", "2m..9m", "--load-range", "800kN..4800kN", "--steps", "4x3", "--json")
			require.Equal(t, 0, code, errOut)
			assert.Contains(t, errOut, "Preliminary sizing")
			var m MapJSON
			require.NoError(t, json.Unmarshal([]byte(out), &m))
			assert.Equal(t, []float64{2000, 4333.3, 6666.7, 9000}, m.LengthsMM)
			assert.Equal(t, []float64{800, 2800, 4800}, m.LoadsKN)
			assert.Nil(t, m.TributaryM2)
			require.Len(t, m.Cells, 3)
			want := map[string]string{"weight": "mass_kg_per_m", "footprint": "plan_area_mm2", "carbon": "carbon_kgCO2e"}[rank]
			assert.Equal(t, want, m.Metric)
			for i, row := range m.Cells {
				require.Len(t, row, 4)
				for j, c := range row {
					if c == nil {
						continue
					}
					code, cout, cerr := run("compare", "--length", fmt.Sprintf("%gmm", m.LengthsMM[j]), "--load", fmt.Sprintf("%gkN", m.LoadsKN[i]), "--rank", rank, "--json")
					require.Equal(t, 0, code, cerr)
					var cands []Candidate
					require.NoError(t, json.Unmarshal([]byte(cout), &cands))
					best := math.Inf(1)
					for _, k := range cands {
						if !k.OK {
							continue
						}
						v := map[string]float64{"weight": k.MassKgPerM, "footprint": k.PlanAreaMM2, "carbon": k.CarbonKg}[rank]
						best = math.Min(best, v)
					}
					assert.InEpsilon(t, best, c.Metric, 0.005, "cell %d,%d %s", i, j, c.Designation)
				}
			}
		})
	}
}

// TestMapTakedownAxisAndFiles: a takedown scheme maps tributary area, and
// --out writes each picture format.
func TestMapTakedownAxisAndFiles(t *testing.T) {
	dir := t.TempDir()
	demo := filepath.Join("..", "..", "testdata", "schemes", "demo.upright.json")
	code, out, errOut := run("map", "--scheme", demo, "--tributary-range", "20m2..120m2", "--steps", "6x4", "--json")
	require.Equal(t, 0, code, errOut)
	var m MapJSON
	require.NoError(t, json.Unmarshal([]byte(out), &m))
	assert.Equal(t, "tributary", m.Axis)
	assert.Nil(t, m.LoadsKN)
	assert.Equal(t, []float64{20, 53.333, 86.667, 120}, m.TributaryM2)
	require.NotNil(t, m.Point.TributaryM2)
	// The demo's 840 ft² (from its scheme file) is 78.04 m².
	assert.InDelta(t, 78.04, *m.Point.TributaryM2, 0.01)
	for _, ext := range []string{"png", "svg", "pdf"} {
		path := filepath.Join(dir, "map."+ext)
		code, out, errOut := run("map", "--scheme", demo, "--steps", "20x12", "--out", path)
		require.Equal(t, 0, code, errOut)
		assert.Contains(t, out, "Preliminary sizing")
		st, err := os.Stat(path)
		require.NoError(t, err)
		assert.Positive(t, st.Size())
	}
}

// TestMapJSONShownFamily: each cell carries the family the map shows; it
// differs from the strict best only at a near-tie, there are near-ties at the
// scheme's 5% (the demo scheme's tolerance), and none with --tie 0.
func TestMapJSONShownFamily(t *testing.T) {
	demo := filepath.Join("..", "..", "testdata", "schemes", "demo.upright.json")
	for _, c := range []struct {
		tie  []string
		want float64
	}{{nil, 0.05}, {[]string{"--tie", "0"}, 0}} {
		args := append([]string{"map", "--scheme", demo, "--steps", "100x8", "--json"}, c.tie...)
		code, out, errOut := run(args...)
		require.Equal(t, 0, code, errOut)
		var m MapJSON
		require.NoError(t, json.Unmarshal([]byte(out), &m))
		assert.Equal(t, c.want, m.Tie)
		ties, shownTotal, wonTotal := 0, 0, 0
		for _, row := range m.Cells {
			for _, cell := range row {
				if cell == nil {
					continue
				}
				require.NotNil(t, cell.Shown)
				assert.Equal(t, cell.Shown.Family != cell.Family, cell.Shown.NearTie)
				assert.NotEmpty(t, cell.Shown.Designation)
				if cell.Shown.NearTie {
					ties++
				}
			}
		}
		for _, f := range m.Families {
			shownTotal += f.Shown
			wonTotal += f.Cells
		}
		assert.Equal(t, wonTotal, shownTotal, "every working cell shows one family")
		if c.want > 0 {
			assert.Positive(t, ties, "near-ties at %g", c.want)
		} else {
			assert.Zero(t, ties, "no near-ties without a tolerance")
		}
	}
}

// TestMapBadInput: every bad map flag is refused with exit status 2 and a
// message naming the flag.
func TestMapBadInput(t *testing.T) {
	demo := filepath.Join("..", "..", "testdata", "schemes", "demo.upright.json")
	cases := []struct {
		args []string
		flag string
	}{
		{[]string{"--length-range", "12m..1m", "--json"}, "--length-range"},
		{[]string{"--length-range", "0.1m..5m", "--json"}, "--length-range"},
		{[]string{"--length-range", "4m", "--json"}, "--length-range"},
		{[]string{"--length-range", "a..b", "--json"}, "--length-range"},
		{[]string{"--load-range", "0kN..100kN", "--json"}, "--load-range"},
		{[]string{"--load-range", "NaNkN..100kN", "--json"}, "--load-range"},
		{[]string{"--load-range", "100kN..300MN", "--json"}, "--load-range"},
		{[]string{"--tributary-range", "10m2..50m2", "--json"}, "--tributary-range"},
		{[]string{"--scheme", demo, "--load-range", "1kN..2kN", "--json"}, "--load-range"},
		{[]string{"--scheme", demo, "--tributary-range", "10m2..9000m2", "--json"}, "--tributary-range"},
		{[]string{"--steps", "100", "--json"}, "--steps"},
		{[]string{"--steps", "0x5", "--json"}, "--steps"},
		{[]string{"--steps", "1000x60", "--json"}, "--steps"},
		{[]string{"--out", "map.gif"}, "--out"},
		{[]string{}, "--out or --json"},
	}
	for _, c := range cases {
		t.Run(strings.Join(c.args, " "), func(t *testing.T) {
			args := append([]string{"map"}, c.args...)
			if j := strings.Join(c.args, " "); !strings.Contains(j, "load-range") && !strings.Contains(j, "tributary-range") && !strings.Contains(j, "--scheme") {
				args = append(args, "--load", "1000kN") // a map needs its loads
			}
			code, _, errOut := run(args...)
			assert.Equal(t, 2, code)
			assert.Contains(t, errOut, c.flag)
			assert.Contains(t, errOut, "give")
		})
	}
}
