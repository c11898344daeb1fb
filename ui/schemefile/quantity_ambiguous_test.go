package schemefile

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/units"
)

// A scheme file refuses an ambiguous unit with the same reason the window
// and the commands give (units.ParseError.Why, checked word for word in
// ui/units), naming the field and listing the accepted forms.
func TestAmbiguousUnitsAreRefused(t *testing.T) {
	demo := string(demoBytes(t))
	for _, c := range []struct {
		old, value, field string
		parse             func(string) (float64, error)
	}{
		{`"direct": "900 kip"`, "900k", "load.direct", units.ParseForce},
		{`"direct": "900 kip"`, "90 tons", "load.direct", units.ParseForce},
		{`"direct": "900 kip"`, "900000#", "load.direct", units.ParseForce},
		{`"length": "18 ft"`, "17'6", "setting.length", units.ParseLength},
		{`"length": "18 ft"`, "5.4M", "setting.length", units.ParseLength},
		{`"floor_live": "60 psf"`, "3kN/m", "load.takedown.floor_live", units.ParsePressure},
		{`"floor_live": "60 psf"`, "300kg/m2", "load.takedown.floor_live", units.ParsePressure},
		{`"tributary_area": "840 ft2"`, "840ft", "load.takedown.tributary_area", units.ParseArea},
		{`"fy": null`, `50k`, "steel.fy", units.ParseStress},
	} {
		_, perr := c.parse(c.value)
		var pe *units.ParseError
		require.ErrorAs(t, perr, &pe, c.value)
		require.NotEmpty(t, pe.Why(), "%q is ambiguous in ui/units", c.value)

		require.Contains(t, demo, c.old)
		key := c.old[:strings.Index(c.old, ":")]
		_, err := Unmarshal([]byte(strings.Replace(demo, c.old, key+`: "`+c.value+`"`, 1)))
		var fe *Error
		require.ErrorAs(t, err, &fe, c.value)
		assert.Equal(t, c.field, fe.Field, "%q: %v", c.value, err)
		assert.Contains(t, err.Error(), pe.Why(), "%q: the reason", c.value)
		assert.Contains(t, err.Error(), pe.Accepted, "%q: the accepted forms", c.value)
	}
}

// The façade load of a building refuses a load per area, or k for kip/kN,
// with the same reason.
func TestAmbiguousFacadeLoad(t *testing.T) {
	b, err := os.ReadFile(filepath.Join("..", "..", "testdata", "schemes", "demo-building.upright.json"))
	require.NoError(t, err)
	for _, v := range []string{"2kPa", "0.4k/ft"} {
		_, perr := units.ParseLineLoad(v)
		var pe *units.ParseError
		require.ErrorAs(t, perr, &pe, v)
		require.NotEmpty(t, pe.Why(), v)
		text := strings.Replace(string(b), `"facade": "0.4 kip/ft"`, `"facade": "`+v+`"`, 1)
		require.NotEqual(t, string(b), text)
		_, err = Unmarshal([]byte(text))
		var fe *Error
		require.ErrorAs(t, err, &fe, v)
		assert.True(t, strings.HasSuffix(fe.Field, "facade"), "%q: %v", v, err)
		assert.Contains(t, err.Error(), pe.Why(), v)
	}
}
