package cli

import (
	"encoding/json"
	"fmt"
	"os"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// One rule for a number without a unit: every quantity flag refuses it
// with exit status 2, naming the flag and that a unit is needed (a bare
// "35" could be MPa or ksi, "6" ksi or MPa, "4.2" metres or feet).
func TestEveryQuantityFlagRefusesABareNumber(t *testing.T) {
	f := newSchemeFlags("compare", &strings.Builder{})
	for _, name := range QuantityFlags {
		require.NotNil(t, f.fs.Lookup(name), "--%s is a flag", name)
	}
	for _, name := range QuantityFlags {
		for _, bare := range []string{"35", "6", "6000", "4.2"} {
			args := []string{"compare", "--" + name, bare}
			if name != "load" {
				args = append(args, "--load", "1000kN")
			}
			if name == "tributary" || name == "dead" || name == "live" || name == "roof-dead" || name == "roof-live" || name == "snow" {
				args = []string{"compare", "--tributary", "60m2", "--floors", "2", "--dead", "4kPa", "--live", "3kPa", "--" + name, bare}
			}
			code, out, errOut := run(args...)
			assert.Equal(t, 2, code, "%v", args)
			assert.Empty(t, out, "%v", args)
			assert.Contains(t, errOut, "--"+name+` "`+bare+`"`, "%v names the flag and value", args)
			assert.Contains(t, errOut, "unit", "%v says a unit is needed", args)
		}
	}
	// With their units they are read (common practice: 35 MPa ≈ 5 ksi).
	code, _, errOut := run("compare", "--load", "1000kN", "--fc", "35MPa", "--fill-fc", "6ksi", "--fy", "50ksi")
	assert.Equal(t, 0, code, errOut)
}

// Designations are matched without regard to case: W8x48 is W8X48.
func TestDesignationIgnoresCase(t *testing.T) {
	code, out, errOut := run("curve", "--designation", "w8x48", "--from", "1m", "--to", "3m", "--json")
	require.Equal(t, 0, code, errOut)
	assert.Contains(t, out, `"designation": "W8X48"`, "the catalogue's spelling")
	code, _, errOut = run("curve", "--designation", "W8x4800", "--from", "1m", "--to", "3m", "--json")
	assert.Equal(t, 2, code)
	assert.Contains(t, errOut, "W8x4800")
}

// An output file whose extension a command cannot write is refused by
// every command that writes one, naming the flag and what it writes.
func TestOutputExtensionRefused(t *testing.T) {
	dir := t.TempDir()
	for _, c := range []struct {
		args []string
		flag string
	}{
		{[]string{"report", "--load", "1000kN", "--out", dir + "/r.docx"}, "--out"},
		{[]string{"table", "--load", "1000kN", "--csv", dir + "/t.xlsx"}, "--csv"},
		{[]string{"scheme", "--load", "1000kN", "--out", dir + "/s.yaml"}, "--out"},
		{[]string{"compare", "--load", "1000kN", "--chart", dir + "/c.gif"}, "--chart"},
		{[]string{"map", "--load", "1000kN", "--out", dir + "/m.bmp"}, "--out"},
		{[]string{"sections", "--load", "1000kN", "--out", dir + "/s.jpg"}, "--out"},
	} {
		code, _, errOut := run(c.args...)
		assert.Equal(t, 2, code, "%v", c.args)
		assert.Contains(t, errOut, c.flag, "%v", c.args)
	}
	entries, _ := os.ReadDir(dir)
	assert.Empty(t, entries, "nothing is written")
}

// The header states the defaults that shape a takedown's answer: a roof
// live load or snow not given is 0, and the reduction's KLL and occupancy.
func TestHeaderStatesTakedownDefaults(t *testing.T) {
	code, out, errOut := run("compare", "--length", "4.2m", "--tributary", "60m2", "--floors", "3", "--dead", "4kPa", "--live", "3kPa", "--roof-dead", "3kPa")
	require.Equal(t, 0, code, errOut)
	assert.Contains(t, out, "roof live Lr 0.00 kPa (none given)")
	assert.Contains(t, out, "snow S 0.00 kPa (none given)")
	assert.Contains(t, out, "KLL 4, general occupancy")
}

// crossovers lists by default where the best family changes and where each
// family's reach ends (its last working size, never a size step), a line
// for a family that works nowhere in the range, and with --changes all
// every size step too.
func TestCrossoverKinds(t *testing.T) {
	type x struct {
		Kind   string `json:"kind"`
		Family string `json:"family"`
		To     string `json:"to"`
	}
	get := func(args ...string) []x {
		code, out, errOut := run(append([]string{"crossovers", "--json"}, args...)...)
		require.Equal(t, 0, code, errOut)
		var xs []x
		require.NoError(t, json.Unmarshal([]byte(out), &xs))
		return xs
	}
	def := get("--length", "4m", "--load", "3000kN", "--from", "1m", "--to", "12m")
	kinds := map[string]int{}
	for _, c := range def {
		kinds[c.Kind]++
		assert.Contains(t, []string{"family", KindEnd, KindNowhere}, c.Kind)
	}
	assert.Positive(t, kinds[KindEnd], "reach ends are listed")
	assert.Positive(t, kinds["family"], "family changes are listed")
	assert.Positive(t, kinds[KindNowhere], "sawn lumber carries 3,000 kN nowhere")
	all := get("--length", "4m", "--load", "3000kN", "--from", "1m", "--to", "12m", "--changes", "all")
	sizes := 0
	for _, c := range all {
		if c.Kind == "size" {
			sizes++
			assert.NotEmpty(t, c.To, "a size step always has a next size; the last working size is an end")
		}
	}
	assert.Positive(t, sizes)
	assert.Greater(t, len(all), len(def))
	code, _, errOut := run("crossovers", "--load", "1000kN", "--changes", "some")
	assert.Equal(t, 2, code)
	assert.Contains(t, errOut, "--changes")
}

// The text table's Capacity and Demand are the governing combination's
// pair, the ones its utilization divides (NDS 2018: timber's strength
// depends on the combination's λ, so the largest load need not govern).
func TestTextTableShowsGoverningPair(t *testing.T) {
	args := []string{"compare", "--materials", "timber", "--length", "3m", "--load", "1500kN", "--units", "si"}
	code, out, errOut := run(append(args, "--json")...)
	require.Equal(t, 0, code, errOut)
	var cs []Candidate
	require.NoError(t, json.Unmarshal([]byte(out), &cs))
	code, text, errOut := run(args...)
	require.Equal(t, 0, code, errOut)
	checked := 0
	for _, c := range cs {
		for _, ch := range c.Checks {
			if !ch.Governing || ch.CapacityKN == 0 {
				continue
			}
			line := ""
			for _, l := range strings.Split(text, "\n") {
				if strings.Contains(l, c.Designation+" ") && line == "" {
					line = l
				}
			}
			require.NotEmpty(t, line, c.Designation)
			assert.Contains(t, line, fmt.Sprintf("%.0f", ch.CapacityKN), "%s: governing capacity", c.Designation)
			assert.Contains(t, line, fmt.Sprintf("%.0f", ch.DemandKN), "%s: governing demand", c.Designation)
			checked++
		}
	}
	assert.Positive(t, checked)
}
