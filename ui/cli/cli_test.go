package cli

import (
	"bytes"
	"encoding/json"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

func run(args ...string) (code int, stdout, stderr string) {
	var o, e bytes.Buffer
	code = Run(args, &o, &e)
	return code, o.String(), e.String()
}

func TestVersion(t *testing.T) {
	code, out, _ := run("--version")
	assert.Equal(t, 0, code)
	assert.Equal(t, "upright "+Version+"\n", out)
}

func TestBadInputNamesFlagValueAndAccepted(t *testing.T) {
	cases := []struct {
		args []string
		want []string // substrings of the message
	}{
		{[]string{"compare", "--length", "tall"}, []string{"--length", `"tall"`, "4.2m"}},
		{[]string{"compare", "--length", "4.2"}, []string{"--length", "unit"}},
		{[]string{"compare", "--length", "0m"}, []string{"--length", "0.3 m"}},
		{[]string{"compare", "--length", "-3m"}, []string{"--length"}},
		{[]string{"compare", "--length", "NaNm"}, []string{"--length"}},
		{[]string{"compare", "--length", "500m"}, []string{"--length", "30 m"}},
		{[]string{"compare", "--ends", "welded"}, []string{"--ends", `"welded"`, "pinned-pinned"}},
		{[]string{"compare", "--k", "abc"}, []string{"--k", "0.5 to 10"}},
		{[]string{"compare", "--k", "0"}, []string{"--k"}},
		{[]string{"compare", "--load", "heavy"}, []string{"--load", "kN"}},
		{[]string{"compare", "--load", "-5kN"}, []string{"--load", "greater than zero"}},
		{[]string{"compare", "--load", "0kip"}, []string{"--load"}},
		{[]string{"compare", "--method", "wsd"}, []string{"--method", "lrfd or asd"}},
		{[]string{"compare", "--materials", "steel,adobe"}, []string{"--materials", "adobe"}},
		{[]string{"compare", "--units", "cubits"}, []string{"--units"}},
		{[]string{"compare", "--rank", "beauty"}, []string{"--rank"}},
		{[]string{"compare", "--length", "4m", "--weak-length", "5m"}, []string{"--weak-length"}},
		{[]string{"compare", "--tributary", "lots"}, []string{"--tributary", "m2"}},
		{[]string{"compare", "--tributary", "60m2", "--floors", "2.5", "--dead", "4kPa", "--live", "3kPa"}, []string{"--floors"}},
		{[]string{"compare", "--tributary", "60m2", "--dead", "heavy"}, []string{"--dead", "kPa"}},
		{[]string{"compare", "--load", "1000kN", "--tributary", "60m2"}, []string{"--load", "not both"}},
		{[]string{"compare", "--fc", "strong"}, []string{"--fc"}},
		{[]string{"compare", "--rho-max", "12%"}, []string{"--rho-max", "0.08"}},
		{[]string{"compare", "--m1m2", "3"}, []string{"--m1m2"}},
		{[]string{"compare", "--beta-dns", "-1"}, []string{"--beta-dns"}},
		{[]string{"compare", "--species", "oak"}, []string{"--species", "DF-L"}},
		{[]string{"compare", "--grade", "premium"}, []string{"--grade"}},
		{[]string{"compare", "--fire", "4h"}, []string{"--fire", "none, 1h, 1.5h, 2h or 3h"}},
		{[]string{"compare", "--fire", "two hours"}, []string{"--fire", "1.5h"}},
		{[]string{"compare", "--aggregate", "basalt"}, []string{"--aggregate", "siliceous, carbonate or semi-lightweight"}},
		{[]string{"compare", "--nonsense"}, []string{"nonsense"}},
		{[]string{"compare", "stray"}, []string{"stray"}},
		{[]string{"frobnicate"}, []string{"unknown command"}},
		{[]string{"curve", "--length", "4m"}, []string{"--designation"}},
		{[]string{"crossovers", "--load", "1000kN", "--from", "5m", "--to", "2m"}, []string{"--from"}},
		{[]string{"compare", "--length", "4.2m"}, []string{"no load given", "--load", "--tributary"}},
		{[]string{"sections", "--length", "4.2m", "--out", "s.png"}, []string{"no load given", "--load", "--tributary"}},
		{[]string{"compare", "--lenght", "4m"}, []string{"unknown flag --lenght; did you mean --length?", "usage: upright compare"}},
	}
	for _, c := range cases {
		code, out, errOut := run(c.args...)
		assert.Equal(t, 2, code, "%v: exit status", c.args)
		assert.Empty(t, out, "%v: nothing on stdout", c.args)
		for _, w := range c.want {
			assert.Contains(t, errOut, w, "%v", c.args)
		}
		assert.NotContains(t, errOut, "panic")
	}
}

func TestSchemeFromFlags(t *testing.T) {
	f := newSchemeFlags("compare", &bytes.Buffer{})
	sc, err := schemeFrom(f, []string{"--length", `14'-6"`, "--ends", "fixed-pinned", "--weak-length", "7ft",
		"--load", "400kip", "--method", "asd", "--units", "si", "--rank", "carbon", "--self-weight=false",
		"--fc", "6000psi", "--rho-max", "3%", "--m1m2", "0.5", "--beta-dns", "0.7", "--ei", "b", "--transverse", "spiral",
		"--species", "SP", "--grade", "No.2", "--wet", "--fire", "1h", "--fire-sides", "3", "--fy", "50ksi"})
	require.NoError(t, err)
	s := sc.Setting
	assert.InDelta(t, 14*304.8+6*25.4, s.LengthMM, 1e-9)
	assert.InDelta(t, 7*304.8, s.WeakMM, 1e-9)
	assert.Equal(t, model.FixedPinned, s.Ends)
	assert.Equal(t, model.ASD, s.Method)
	assert.InDelta(t, 400*units.NPerKip, sc.Load.DirectN, 1e-6)
	assert.Equal(t, model.SI, sc.Units)
	assert.Equal(t, model.ByCarbon, sc.Metric)
	assert.False(t, sc.SelfWeight)
	assert.InDelta(t, 6*units.MPaPerKsi, sc.Concrete.FcMPa, 1e-9)
	assert.InDelta(t, 0.03, sc.Concrete.RhoMax, 1e-12)
	assert.Equal(t, 0.5, sc.Concrete.M1M2)
	assert.Equal(t, 0.7, sc.Concrete.BetaDns)
	assert.False(t, sc.Concrete.BetaFromLoads)
	assert.Equal(t, "b", sc.Concrete.EIMethod)
	assert.Equal(t, "spiral", sc.Concrete.Transverse)
	assert.Equal(t, "SP", sc.Timber.Species)
	assert.Equal(t, "No.2", sc.Timber.Grade)
	assert.True(t, sc.Timber.Wet)
	assert.Equal(t, "1h", sc.Fire.Rating)
	assert.Equal(t, 3, sc.Timber.FireSides)
	assert.InDelta(t, 50*units.MPaPerKsi, sc.Steel.FyMPa, 1e-9)
}

func TestTakedownFlags(t *testing.T) {
	f := newSchemeFlags("compare", &bytes.Buffer{})
	sc, err := schemeFrom(f, []string{"--length", "4m", "--tributary", "60m2", "--floors", "3", "--dead", "4.0kPa",
		"--live", "3.0kPa", "--roof-dead", "80psf", "--roof-live", "20psf", "--snow", "1.2kPa"})
	require.NoError(t, err)
	l := sc.Load
	assert.Equal(t, model.LoadTakedown, l.Mode)
	assert.Equal(t, 60.0, l.TributaryM2)
	assert.Equal(t, 3, l.Floors)
	assert.Equal(t, 4.0, l.FloorDeadKPa)
	assert.InDelta(t, 80*units.KPaPerPsf, l.RoofDeadKPa, 1e-12)
	assert.True(t, l.LiveReduction)
}

func TestCompareJSONShape(t *testing.T) {
	if len(model.Materials()) == 0 {
		t.Skip("no material registered")
	}
	code, out, errOut := run("compare", "--length", "4.5m", "--load", "2500kN", "--json")
	require.Equal(t, 0, code, errOut)
	assert.Contains(t, errOut, "licensed")
	var arr []map[string]any
	require.NoError(t, json.Unmarshal([]byte(out), &arr))
	require.NotEmpty(t, arr)
	for _, c := range arr {
		for _, k := range []string{"material", "family", "designation", "ok", "capacity_kN", "demand_kN", "utilization",
			"mass_kg_per_m", "footprint_mm", "governing", "slenderness", "warnings", "calc"} {
			assert.Contains(t, c, k)
		}
		fp, ok := c["footprint_mm"].([]any)
		require.True(t, ok)
		assert.Len(t, fp, 2)
	}
	assert.NotContains(t, out, "NaN")
	assert.NotContains(t, out, "Inf")
}

func TestComparePlainHasCaution(t *testing.T) {
	code, out, errOut := run("compare", "--length", "4.5m", "--load", "2500kN")
	require.Equal(t, 0, code, errOut)
	assert.Contains(t, out, "licensed structural engineer")
}

// The units shown follow those typed: --length first, then the scheme
// file's, then --load or --tributary; --units overrides them all.
func TestShownUnitsFollowTheUnitsTyped(t *testing.T) {
	cases := []struct {
		args     []string
		want     []string
		dontWant string
	}{
		{[]string{"--length", "4.2m", "--load", "1500kN"}, []string{"4.20 m", "kN", "kg/m"}, "kip"},
		{[]string{"--length", "14ft", "--load", "400kip"}, []string{"kip", "lb/ft"}, "kN"},
		{[]string{"--length", `14'-6"`, "--load", "1500kN"}, []string{"kip"}, "(kN)"},
		{[]string{"--load", "1500kN"}, []string{"kN"}, "kip"},
		{[]string{"--length", "4.2m", "--load", "1500kN", "--units", "us"}, []string{"kip", "lb/ft"}, "(kN)"},
		{[]string{"--scheme", "../../testdata/schemes/demo.upright.json"}, []string{"kip"}, "(kN)"},
		{[]string{"--scheme", "../../testdata/schemes/demo.upright.json", "--length", "6m"}, []string{"6.00 m", "kN"}, "kip"},
		{[]string{"--scheme", "../../testdata/schemes/demo.upright.json", "--load", "1500kN"}, []string{"kip"}, "(kN)"},
	}
	for _, c := range cases {
		code, out, errOut := run(append([]string{"compare"}, c.args...)...)
		require.Equal(t, 0, code, "%v: %s", c.args, errOut)
		for _, w := range c.want {
			assert.Contains(t, out, w, "%v", c.args)
		}
		assert.NotContains(t, out, c.dontWant, "%v", c.args)
	}
}

func TestCarbonAndMagnifierFlags(t *testing.T) {
	f := newSchemeFlags("compare", &bytes.Buffer{})
	sc, err := schemeFrom(f, []string{"--load", "1000kN", "--carbon", "concrete=300,rolled-steel=1.1", "--limit-magnifier=false", "--rank", "carbon"})
	require.NoError(t, err)
	assert.Equal(t, 300.0, sc.Carbon["concrete"])
	assert.Equal(t, 1.1, sc.Carbon["rolled-steel"])
	assert.Equal(t, model.DefaultCarbon()["glulam"], sc.Carbon["glulam"], "other factors keep their defaults")
	assert.False(t, sc.Concrete.SecondOrderCap)
	for _, bad := range []string{"adobe=3", "concrete", "concrete=-1", "concrete=lots"} {
		code, _, errOut := run("compare", "--carbon", bad)
		assert.Equal(t, 2, code, bad)
		assert.Contains(t, errOut, "--carbon", bad)
	}
}
