package units

import (
	"errors"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// Each row is a typed value, the parser of the field it is typed in, and
// either the SI value it reads as (with where that value comes from) or
// the refusal it gets: the ambiguity message, word for word.
func TestAmbiguousUnitsTable(t *testing.T) {
	parsers := map[string]func(string) (float64, error){
		"length": ParseLength, "force": ParseForce, "pressure": ParsePressure,
		"area": ParseArea, "stress": ParseStress, "load per length": ParseLineLoad,
	}
	for _, c := range []struct {
		kind, in string
		want     float64 // SI: mm, N, kPa, m², MPa, kN/m
		src      string  // where want comes from
		refused  string  // the Why() of the refusal; "" when read
	}{
		// Forces read.
		{kind: "force", in: "400kip", want: 400 * 4448.2216152605, src: "1 kip = 1000 lbf = 4448.2216152605 N (exact definition from lbf = 0.45359237 kg × 9.80665 m/s², NIST SP 811)"},
		{kind: "force", in: "400 kips", want: 400 * 4448.2216152605, src: "as 400kip"},
		{kind: "force", in: "1800kN", want: 1.8e6, src: "SI prefix k = 1000"},
		{kind: "force", in: "1800KN", want: 1.8e6, src: "upper-case K before N can only be kilo: kN"},
		{kind: "force", in: "2.5MN", want: 2.5e6, src: "SI prefix M = 10⁶"},
		{kind: "force", in: "90000lb", want: 90000 * 4.4482216152605, src: "1 lbf = 4.4482216152605 N (exact definition, NIST SP 811)"},
		{kind: "force", in: "180tonne", want: 180 * 9806.65, src: "1 tonne-force = 1000 kg × 9.80665 m/s² = 9806.65 N (exact: standard gravity, CGPM 1901)"},
		{kind: "force", in: "180 tonnes", want: 180 * 9806.65, src: "as 180tonne"},
		// Forces refused.
		{kind: "force", in: "1800k", refused: `"1800k" is ambiguous: k may mean kip or kN; write 1800kip or 1800kN`},
		{kind: "force", in: "400K", refused: `"400K" is ambiguous: k may mean kip or kN; write 400kip or 400kN`},
		{kind: "force", in: "20t", refused: `"20t" is ambiguous: t may mean a metric tonne-force (9.807 kN) or a US short ton-force (2000 lb, 8.896 kN); write 20tonne, or the force in kN or kip`},
		{kind: "force", in: "20T", refused: `"20T" is ambiguous: t may mean a metric tonne-force (9.807 kN) or a US short ton-force (2000 lb, 8.896 kN); write 20tonne, or the force in kN or kip`},
		{kind: "force", in: "20ton", refused: `"20ton" is ambiguous: a ton may be a metric tonne-force (9.807 kN), a US short ton-force (2000 lb, 8.896 kN) or a long ton (2240 lb); write 20tonne, or the force in kN or kip`},
		{kind: "force", in: "20 tons", refused: `"20 tons" is ambiguous: a ton may be a metric tonne-force (9.807 kN), a US short ton-force (2000 lb, 8.896 kN) or a long ton (2240 lb); write 20tonne, or the force in kN or kip`},
		{kind: "force", in: "90000#", refused: `"90000#" is ambiguous: # may mean pounds or a count; write 90000lb`},
		// Lengths read.
		{kind: "length", in: `14'-6"`, want: 14*304.8 + 6*25.4, src: "1 ft = 304.8 mm, 1 in = 25.4 mm (exact definitions, NIST SP 811)"},
		{kind: "length", in: "14ft 6in", want: 14*304.8 + 6*25.4, src: "as 14'-6\""},
		{kind: "length", in: "4.2m", want: 4200, src: "1 m = 1000 mm"},
		{kind: "length", in: "4200MM", want: 4200, src: "MM can only be millimetres in a length field"},
		// Lengths refused.
		{kind: "length", in: "14'6", refused: `"14'6" is ambiguous: 6 has no unit (inches? a decimal of a foot?); write 14'-6" or 14ft 6in`},
		{kind: "length", in: "14' 6", refused: `"14' 6" is ambiguous: 6 has no unit (inches? a decimal of a foot?); write 14'-6" or 14ft 6in`},
		{kind: "length", in: "14ft-6", refused: `"14ft-6" is ambiguous: 6 has no unit (inches? a decimal of a foot?); write 14'-6" or 14ft 6in`},
		{kind: "length", in: "4.2M", refused: `"4.2M" is ambiguous: M may mean metres or a thousand (US shorthand); write 4.2m for metres`},
		// Pressures read.
		{kind: "pressure", in: "50psf", want: 50 * 0.047880258980335844, src: "1 psf = 1 lbf/ft² = 4.4482216152605 N / 0.09290304 m² = 47.880258980 Pa (exact definitions, NIST SP 811)"},
		{kind: "pressure", in: "50lb/ft2", want: 50 * 0.047880258980335844, src: "lb/ft2 is psf"},
		{kind: "pressure", in: "2.4kN/m2", want: 2.4, src: "1 kN/m² = 1 kPa"},
		{kind: "pressure", in: "0.1ksf", want: 100 * 0.047880258980335844, src: "1 ksf = 1000 psf"},
		// Pressures refused.
		{kind: "pressure", in: "4kN/m", refused: `"4kN/m" is ambiguous: kN/m is a load per length, not per area (a missing 2?); write 4kN/m2 or 4kPa`},
		{kind: "pressure", in: "50lb/ft", refused: `"50lb/ft" is ambiguous: lb/ft is a load per length, not per area (a missing 2?); write 50psf or 50lb/ft2`},
		{kind: "pressure", in: "50plf", refused: `"50plf" is ambiguous: plf is a load per length, not per area (a missing 2?); write 50psf`},
		{kind: "pressure", in: "1klf", refused: `"1klf" is ambiguous: klf is a load per length, not per area (a missing 2?); write 1ksf`},
		{kind: "pressure", in: "400kg/m2", refused: `"400kg/m2" is ambiguous: kg/m2 is a mass per area, not a pressure (kilogram-force per m2?); write the pressure in kPa or psf, not 400kg/m2`},
		{kind: "pressure", in: "4k", refused: `"4k" is ambiguous: k may mean kip per square foot or kPa; write 4ksf or 4kPa`},
		// Areas.
		{kind: "area", in: "650sf", want: 650 * 0.09290304, src: "1 ft² = 0.09290304 m² (exact definition, NIST SP 811)"},
		{kind: "area", in: "60m", refused: `"60m" is ambiguous: m is a length, not an area (a missing 2?); write 60m2`},
		{kind: "area", in: "650ft", refused: `"650ft" is ambiguous: ft is a length, not an area (a missing 2?); write 650ft2 or 650sf`},
		// Stresses.
		{kind: "stress", in: "50ksi", want: 50 * 6.894757293168361, src: "1 ksi = 1000 lbf/in² = 4448.2216152605 N / 645.16 mm² = 6.894757293 MPa (exact definitions, NIST SP 811)"},
		{kind: "stress", in: "35mpa", want: 35, src: "lower-case mpa: a millipascal strength is never meant, so it is read as MPa"},
		{kind: "stress", in: "50k", refused: `"50k" is ambiguous: k names no stress unit (ksi? kPa?); write 50ksi`},
		// Loads per length.
		{kind: "load per length", in: "0.5kip/ft", want: 0.5 * 4.4482216152605 / 0.3048, src: "1 kip/ft = 4.4482216152605 kN / 0.3048 m (exact definitions)"},
		{kind: "load per length", in: "0.5k/ft", refused: `"0.5k/ft" is ambiguous: k may mean kip or kN; write 0.5kip/ft`},
		{kind: "load per length", in: "8kPa", refused: `"8kPa" is ambiguous: kPa is a load per area, not per length; write the load per length, e.g. 8kN/m`},
		{kind: "load per length", in: "50psf", refused: `"50psf" is ambiguous: psf is a load per area, not per length; write the load per length, e.g. 50plf`},
	} {
		got, err := parsers[c.kind](c.in)
		if c.refused == "" {
			require.NoError(t, err, "%s %q", c.kind, c.in)
			assert.InDelta(t, c.want, got, 1e-9*c.want, "%s %q: %s", c.kind, c.in, c.src)
			continue
		}
		require.Error(t, err, "%s %q is refused", c.kind, c.in)
		assert.True(t, errors.Is(err, ErrAmbiguousUnit), "%s %q wraps ErrAmbiguousUnit", c.kind, c.in)
		var pe *ParseError
		require.ErrorAs(t, err, &pe)
		assert.Equal(t, c.refused, pe.Why(), "%s %q", c.kind, c.in)
		assert.Equal(t, c.kind, pe.Kind)
		assert.Contains(t, err.Error(), pe.Accepted, "the message lists the accepted forms")
		assert.NotContains(t, err.Error(), "%!", "no format slip")
	}
}

// A unit that is simply unknown is refused without an ambiguity reason, so
// callers keep their plain "cannot read" message for it.
func TestUnknownUnitIsNotAmbiguous(t *testing.T) {
	for _, in := range []string{"12 bananas", "4.2 parsecs", "abc"} {
		_, err := ParseForce(in)
		var pe *ParseError
		require.ErrorAs(t, err, &pe, in)
		assert.Empty(t, pe.Reason, in)
		assert.Empty(t, pe.Why(), in)
		assert.False(t, errors.Is(err, ErrAmbiguousUnit), in)
	}
}

// SystemOf does not name a system for a suffix that is refused as ambiguous.
func TestSystemOfAmbiguous(t *testing.T) {
	for _, in := range []string{"1800k", "20t"} {
		_, ok := SystemOf(in)
		assert.False(t, ok, in)
	}
	sys, ok := SystemOf("180tonne")
	assert.True(t, ok)
	assert.Equal(t, SI, sys)
}
