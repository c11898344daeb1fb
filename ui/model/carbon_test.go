package model

import (
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func TestCarbonDefaults(t *testing.T) {
	rows := []struct {
		kind     string
		want     float64
		min, max float64 // plausible band for an industry-average A1–A3 factor
		src      string
	}{
		{CarbonRolledSteel, 1.22, 0.5, 3, "AISC industry-average EPD, fabricated hot-rolled sections (from memory)"},
		{CarbonHSSSteel, 1.99, 0.5, 3, "AISC industry-average EPD, fabricated HSS (from memory)"},
		{CarbonRebar, 0.854, 0.3, 3, "CRSI industry-average EPD, fabricated rebar (from memory)"},
		{CarbonConcrete, 354, 200, 600, "NRMCA industry-wide EPD v3.2, 4,001–5,000 psi national average (from memory)"},
		{CarbonSawnTimber, 63, 20, 300, "AWC/CWC industry-average EPD, softwood lumber (from memory)"},
		{CarbonGlulam, 137, 50, 400, "AWC/CWC industry-average EPD, glulam (from memory)"},
		{CarbonGypsum, 0.25, 0.1, 1, "Gypsum Association industry-average EPD, 5/8 in Type X board (from memory)"},
		{CarbonSFRM, 0.4, 0.1, 1.5, "cementitious sprayed fire-resistive material, rough figure (from memory)"},
	}
	d := DefaultCarbon()
	require.Len(t, d, len(rows))
	for _, r := range rows {
		v, ok := d[r.kind]
		require.True(t, ok, r.kind)
		assert.Equal(t, r.want, v, r.src)
		assert.True(t, v >= r.min && v <= r.max, "%s %v outside %v..%v (%s)", r.kind, v, r.min, r.max, r.src)
	}
}

func TestCarbonKindsMatchDefaults(t *testing.T) {
	d := DefaultCarbon()
	require.Len(t, CarbonKinds, len(d))
	seen := map[string]bool{}
	for _, k := range CarbonKinds {
		assert.False(t, seen[k.Key], "duplicate %s", k.Key)
		seen[k.Key] = true
		_, ok := d[k.Key]
		assert.True(t, ok, "%s has a default factor", k.Key)
		assert.NotEmpty(t, k.Name)
		assert.Contains(t, []string{"kg", "m³"}, k.Unit)
		assert.Equal(t, "kg CO2e/"+k.Unit, k.FactorUnit)
		assert.True(t, strings.TrimSpace(k.Name) == k.Name)
	}
}

func TestCarbonDefaultIsACopy(t *testing.T) {
	d := DefaultCarbon()
	d[CarbonConcrete] = 1
	delete(d, CarbonGlulam)
	again := DefaultCarbon()
	assert.Equal(t, 354.0, again[CarbonConcrete])
	assert.Contains(t, again, CarbonGlulam)
}

func TestCarbonPerMetre(t *testing.T) {
	rows := []struct {
		name string
		cf   CarbonFactors
		cs   []Constituent
		want float64
		src  string
	}{
		{"steel section", DefaultCarbon(), []Constituent{{CarbonRolledSteel, 100}}, 122,
			"hand calc: 100 kg/m × 1.22 kg CO2e/kg"},
		{"concrete and rebar", DefaultCarbon(), []Constituent{{CarbonConcrete, 0.16}, {CarbonRebar, 30}}, 0.16*354 + 30*0.854,
			"hand calc: 0.16 m³/m × 354 + 30 kg/m × 0.854 = 82.26"},
		{"user override", CarbonFactors{CarbonGlulam: 100}, []Constituent{{CarbonGlulam, 0.09}}, 9,
			"hand calc: 0.09 m³/m × 100 (typed factor)"},
		{"missing kind falls back", CarbonFactors{CarbonConcrete: 300}, []Constituent{{CarbonConcrete, 0.1}, {CarbonRebar, 10}}, 30 + 8.54,
			"hand calc: 0.1 × 300 (typed) + 10 × 0.854 (default)"},
		{"nil factors", nil, []Constituent{{CarbonHSSSteel, 50}}, 99.5,
			"hand calc: 50 kg/m × 1.99 (default)"},
		{"typed zero is kept", CarbonFactors{CarbonSawnTimber: 0}, []Constituent{{CarbonSawnTimber, 0.05}}, 0,
			"a factor typed as 0 is used, not replaced by the default"},
		{"unknown kind", DefaultCarbon(), []Constituent{{"aluminium", 10}, {CarbonSawnTimber, 0.1}}, 6.3,
			"unknown kind contributes nothing; 0.1 × 63"},
		{"empty", DefaultCarbon(), nil, 0, "no material"},
	}
	for _, r := range rows {
		assert.InDelta(t, r.want, r.cf.PerMetre(r.cs), 1e-9, r.name+": "+r.src)
	}
}

func TestCarbonPerMetreDoesNotAllocate(t *testing.T) {
	cf := CarbonFactors{CarbonConcrete: 300}
	cs := []Constituent{{CarbonConcrete, 0.1}, {CarbonRebar, 10}}
	allocs := testing.AllocsPerRun(100, func() { _ = cf.PerMetre(cs) })
	assert.Zero(t, allocs)
}
