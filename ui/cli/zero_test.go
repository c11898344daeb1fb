package cli

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// A value given is checked against its range; only a flag left out takes
// its default. Each row is a value that some earlier version took as "the
// default" (zero) or ignored (empty).
func TestGivenZeroOrEmptyIsRefusedWithTheRange(t *testing.T) {
	cases := []struct {
		args []string
		want []string
	}{
		{[]string{"--fc", "0psi"}, []string{"--fc", `"0psi"`, "4,000 to 10,000 psi"}},
		{[]string{"--fc", "0MPa"}, []string{"--fc", "27.6 to 69 MPa"}},
		{[]string{"--fc", "3000psi"}, []string{"--fc", `"3000psi"`, "4,000 to 10,000 psi"}},
		{[]string{"--fy", "0ksi"}, []string{"--fy", "29 to 100 ksi"}},
		{[]string{"--kll", "0"}, []string{"--kll", "1 to 4"}},
		{[]string{"--tributary", "0m2", "--dead", "4kPa"}, []string{"--tributary", `"0m2"`, "greater than zero"}},
		{[]string{"--k", "0"}, []string{"--k", "0.5 to 10"}},
		{[]string{"--materials="}, []string{"--materials", "empty value", "leave the flag out"}},
		{[]string{"--steel-families="}, []string{"--steel-families", "empty value"}},
		{[]string{"--units="}, []string{"--units", "empty value"}},
		{[]string{"--load="}, []string{"--load", "empty value"}},
		{[]string{"--chart="}, []string{"--chart", "empty value"}},
		{[]string{"--occupancy", "zoo", "--tributary", "10m2", "--dead", "3kPa"}, []string{"--occupancy", `"zoo"`, "general"}},
	}
	for _, c := range cases {
		code, out, errOut := run(append([]string{"compare"}, c.args...)...)
		assert.Equal(t, 2, code, "%v", c.args)
		assert.Empty(t, out, "%v", c.args)
		for _, w := range c.want {
			assert.Contains(t, errOut, w, "%v", c.args)
		}
	}
	code, _, errOut := run("scheme", "--name=", "--out", filepath.Join(t.TempDir(), "x.upright.json"))
	assert.Equal(t, 2, code)
	assert.Contains(t, errOut, "--name")
}

// In a scheme file, null means the default; a zero given is refused.
func TestSchemeFileZeroIsNotNull(t *testing.T) {
	demo, err := os.ReadFile("../../testdata/schemes/demo.upright.json")
	require.NoError(t, err)
	for _, c := range []struct{ from, to, field string }{
		{`"fc": null`, `"fc": "0 psi"`, "concrete.fc"},
		{`"fy": null`, `"fy": "0 ksi"`, "steel.fy"},
		{`"k": null`, `"k": 0`, "setting.k"},
		{`"kll": 4`, `"kll": 0`, "load.takedown.kll"},
		{`"duration": null`, `"duration": ""`, "timber.duration"},
	} {
		s := string(demo)
		require.Contains(t, s, c.from, "the demo holds %s", c.from)
		path := filepath.Join(t.TempDir(), "zero.upright.json")
		require.NoError(t, os.WriteFile(path, []byte(strings.Replace(s, c.from, c.to, 1)), 0o644))
		code, out, errOut := run("compare", "--scheme", path)
		assert.Equal(t, 2, code, c.to)
		assert.Empty(t, out)
		assert.Contains(t, errOut, c.field, c.to)
		assert.Contains(t, errOut, "not accepted", c.to)
		assert.Contains(t, errOut, "or null", c.to)
	}
}
