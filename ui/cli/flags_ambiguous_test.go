package cli

import (
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/units"
)

// A flag given an ambiguous unit is refused with exit status 2, naming the
// flag, with the same reason the window and scheme files give
// (units.ParseError.Why, checked word for word in ui/units) and the
// accepted forms.
func TestAmbiguousUnitFlagsAreRefused(t *testing.T) {
	takedown := []string{"--tributary", "60m2", "--floors", "2", "--dead", "4kPa", "--live", "3kPa"}
	for _, c := range []struct {
		flag, value string
		parse       func(string) (float64, error)
		rest        []string
	}{
		{"load", "1800k", units.ParseForce, nil},
		{"load", "200t", units.ParseForce, nil},
		{"load", "200 tons", units.ParseForce, nil},
		{"load", "90000#", units.ParseForce, nil},
		{"length", "14'6", units.ParseLength, []string{"--load", "1000kN"}},
		{"length", "4.2M", units.ParseLength, []string{"--load", "1000kN"}},
		{"weak-length", "7ft 3", units.ParseLength, []string{"--load", "1000kN", "--length", "4.2m"}},
		{"dead", "4kN/m", units.ParsePressure, []string{"--tributary", "60m2", "--floors", "2", "--live", "3kPa"}},
		{"live", "50lb/ft", units.ParsePressure, []string{"--tributary", "60m2", "--floors", "2", "--dead", "4kPa"}},
		{"snow", "200kg/m2", units.ParsePressure, takedown},
		{"tributary", "60m", units.ParseArea, []string{"--floors", "2", "--dead", "4kPa", "--live", "3kPa"}},
		{"fy", "50k", units.ParseStress, []string{"--load", "1000kN"}},
		{"fc", "5k", units.ParseStress, []string{"--load", "1000kN"}},
	} {
		_, perr := c.parse(c.value)
		var pe *units.ParseError
		require.ErrorAs(t, perr, &pe, c.value)
		require.NotEmpty(t, pe.Why(), "%q is ambiguous in ui/units", c.value)

		args := append([]string{"compare", "--" + c.flag, c.value}, c.rest...)
		code, out, errOut := run(args...)
		assert.Equal(t, 2, code, "%v", args)
		assert.Empty(t, out, "%v", args)
		assert.Contains(t, errOut, "--"+c.flag+" "+pe.Why(), "%v: names the flag and says why", args)
		assert.Contains(t, errOut, pe.Accepted, "%v: lists the accepted forms", args)
	}
	// The unambiguous spellings are read (1 kip, 1 tonne-force: exact definitions in ui/units).
	code, _, errOut := run("compare", "--load", "400kip", "--length", `14'-6"`, "--fy", "50ksi")
	assert.Equal(t, 0, code, errOut)
	code, _, errOut = run("compare", "--load", "180tonne", "--length", "4.2m")
	assert.Equal(t, 0, code, errOut)
}
