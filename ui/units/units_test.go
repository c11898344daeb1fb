package units

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func TestParseLength(t *testing.T) {
	// Expected values from the exact definitions 1 in = 25.4 mm, 1 ft = 304.8 mm (NIST SP 811).
	cases := []struct {
		in   string
		want float64
	}{
		{"4.2m", 4200},
		{"4200mm", 4200},
		{"14ft", 14 * 304.8},
		{`14'-6"`, 14*304.8 + 6*25.4},
		{`14' 6"`, 14*304.8 + 6*25.4},
		{"14ft6in", 14*304.8 + 6*25.4},
		{"168in", 168 * 25.4},
		{" 3.5 m ", 3500},
		{"420cm", 4200},
	}
	for _, c := range cases {
		got, err := ParseLength(c.in)
		require.NoError(t, err, c.in)
		assert.InDelta(t, c.want, got, 1e-9, c.in)
	}
}

func TestParseRejects(t *testing.T) {
	for _, in := range []string{"", "abc", "4.2", "4.2 parsecs", "NaN m", "Inf m", "m"} {
		_, err := ParseLength(in)
		assert.Error(t, err, in)
		var pe *ParseError
		assert.ErrorAs(t, err, &pe)
	}
	_, err := ParseForce("12 bananas")
	assert.ErrorContains(t, err, "kN")
}

func TestParseOthers(t *testing.T) {
	// 1 kip = 4448.2216152605 N (NIST SP 811); 1 psf = 47.880259 Pa; 1 ft² = 0.09290304 m²; 1 ksi = 6.894757 MPa.
	v, err := ParseForce("400kip")
	require.NoError(t, err)
	assert.InDelta(t, 400*4448.2216152605, v, 1e-6)
	v, err = ParseForce("1800kN")
	require.NoError(t, err)
	assert.Equal(t, 1.8e6, v)
	v, err = ParsePressure("50psf")
	require.NoError(t, err)
	assert.InDelta(t, 2.394, v, 1e-3)
	v, err = ParseArea("650ft2")
	require.NoError(t, err)
	assert.InDelta(t, 60.387, v, 1e-3)
	v, err = ParseStress("5ksi")
	require.NoError(t, err)
	assert.InDelta(t, 34.474, v, 1e-3)
	v, err = ParseStress("5000psi")
	require.NoError(t, err)
	assert.InDelta(t, 34.474, v, 1e-3)
}

func TestFormatRoundTrip(t *testing.T) {
	assert.Equal(t, `14'-6.0"`, Length(14*304.8+6*25.4, US))
	assert.Equal(t, "4.20 m", Length(4200, SI))
	v, u := Convert(25.4, "mm", US)
	assert.InDelta(t, 1, v, 1e-12)
	assert.Equal(t, "in", u)
	v, u = Convert(MPaPerKsi, "MPa", US)
	assert.InDelta(t, 1, v, 1e-12)
	assert.Equal(t, "ksi", u)
	v, _ = Convert(7, "MPa", SI)
	assert.Equal(t, 7.0, v)
	assert.False(t, math.IsNaN(KgmPerPlf))
}

func FuzzParseLength(f *testing.F) {
	for _, s := range []string{"4.2m", `14'-6"`, "168in", "x", ""} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		v, err := ParseLength(s)
		if err == nil && (math.IsNaN(v) || math.IsInf(v, 0)) {
			t.Fatalf("ParseLength(%q) = %v without error", s, v)
		}
	})
}
