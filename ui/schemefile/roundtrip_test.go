package schemefile

import (
	"bytes"
	"encoding/json"
	"os"
	"path/filepath"
	"reflect"
	"slices"
	"sort"
	"strings"
	"testing"
	"unicode"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
	"pgregory.net/rapid"

	"upright/timber"
	"upright/ui/model"
)

// subset draws a distinct subset of xs in a random order; nil when empty.
func subset(t *rapid.T, xs []string, label string) []string {
	if len(xs) == 0 {
		return nil
	}
	out := rapid.SliceOfNDistinct(rapid.SampledFrom(xs), 0, len(xs), rapid.ID[string]).Draw(t, label)
	if len(out) == 0 {
		return nil
	}
	return out
}

// maybeZero draws 0 (the model's "default") or a value from the range.
func maybeZero(t *rapid.T, lo, hi float64, label string) float64 {
	if rapid.Bool().Draw(t, label+" default") {
		return 0
	}
	return rapid.Float64Range(lo, hi).Draw(t, label)
}

// genScheme draws a scheme that model.Scheme.Validate accepts, with every
// field of model.Scheme varied.
func genScheme(t *rapid.T) model.Scheme {
	var sc model.Scheme
	sc.Name = rapid.StringOfN(rapid.RuneFrom(nil, unicode.L, unicode.N, unicode.P, unicode.S, unicode.Zs), 0, 80, -1).Draw(t, "name")
	sc.Units = rapid.SampledFrom([]model.Units{model.US, model.SI}).Draw(t, "units")
	sc.Metric = rapid.SampledFrom([]model.Metric{model.ByWeight, model.ByFootprint, model.ByCarbon}).Draw(t, "metric")

	s := &sc.Setting
	s.LengthMM = rapid.Float64Range(model.MinLengthMM, model.MaxLengthMM).Draw(t, "length")
	s.WeakMM = s.LengthMM * rapid.Float64Range(0.001, 1).Draw(t, "weak fraction")
	s.Ends = rapid.SampledFrom(model.EndConditions).Draw(t, "ends")
	s.K = maybeZero(t, 0.5, 10, "K")
	s.Method = rapid.SampledFrom([]model.Method{model.LRFD, model.ASD}).Draw(t, "method")
	s.TwistBraced = rapid.Bool().Draw(t, "twist braced")

	l := &sc.Load
	l.Mode = rapid.SampledFrom([]model.LoadMode{model.LoadDirect, model.LoadTakedown}).Draw(t, "mode")
	l.TributaryM2 = rapid.Float64Range(1, 100).Draw(t, "tributary")
	l.Floors = rapid.IntRange(0, 10).Draw(t, "floors")
	l.FloorDeadKPa = rapid.Float64Range(0, 50).Draw(t, "dead")
	l.FloorLiveKPa = rapid.Float64Range(0, 30).Draw(t, "live")
	l.RoofDeadKPa = rapid.Float64Range(0.5, 50).Draw(t, "roof dead")
	l.RoofLiveKPa = rapid.Float64Range(0, 10).Draw(t, "roof live")
	l.SnowKPa = rapid.Float64Range(0, 25).Draw(t, "snow")
	l.LiveReduction = rapid.Bool().Draw(t, "reduction")
	l.KLL = rapid.SampledFrom([]float64{0, 1, 2, 3, 4}).Draw(t, "kll")
	l.Occupancy = rapid.SampledFrom([]string{"", model.OccGeneral, model.OccAssembly, model.OccStorage, model.OccGarage}).Draw(t, "occupancy")
	l.DeadShare = maybeZero(t, 0.01, 1, "dead share")
	if l.Mode == model.LoadDirect {
		l.DirectN = rapid.Float64Range(1, 200e6).Draw(t, "direct")
	} else {
		l.DirectN = maybeZero(t, 1, 200e6, "direct kept")
	}

	sc.SelfWeight = rapid.Bool().Draw(t, "self-weight")
	sc.ReportMap = rapid.Bool().Draw(t, "report map")
	sc.Materials = subset(t, model.Materials(), "materials")
	sc.Steel.Families = subset(t, model.SteelFamilies, "steel families")
	sc.Steel.FyMPa = maybeZero(t, 200, 700, "Fy")

	c := &sc.Concrete
	c.FcMPa = maybeZero(t, 27.5, 69, "fc")
	c.BarGrade = rapid.SampledFrom([]int{60, 80}).Draw(t, "bar grade")
	c.RhoMax = rapid.Float64Range(0.01, 0.08).Draw(t, "rho max")
	c.Transverse = rapid.SampledFrom([]string{"ties", "spiral", "all"}).Draw(t, "transverse")
	c.M1M2 = rapid.Float64Range(-1, 1).Draw(t, "m1m2")
	c.BetaDns = rapid.Float64Range(0, 1).Draw(t, "beta dns")
	c.BetaFromLoads = rapid.Bool().Draw(t, "beta from loads")
	c.EIMethod = rapid.SampledFrom([]string{"a", "b", "c", "largest"}).Draw(t, "EI method")
	c.NonswayK1 = rapid.Bool().Draw(t, "nonsway k1")
	c.SecondOrderCap = rapid.Bool().Draw(t, "second-order cap")

	tm := &sc.Timber
	tm.Species = rapid.SampledFrom(timber.SawnSpecies()).Draw(t, "species")
	tm.Grade = rapid.SampledFrom(timber.SawnGrades()).Draw(t, "grade")
	tm.Sawn = rapid.Bool().Draw(t, "sawn")
	tm.Glulam = rapid.Bool().Draw(t, "glulam")
	tm.GlulamCombos = subset(t, timber.GlulamCombinations(0), "glulam combinations")
	tm.Wet = rapid.Bool().Draw(t, "wet")
	tm.Incised = rapid.Bool().Draw(t, "incised")
	tm.Hot = rapid.Bool().Draw(t, "hot")
	sc.Fire.Rating = rapid.SampledFrom(model.FireRatings).Draw(t, "fire")
	sc.Fire.Aggregate = rapid.SampledFrom(model.FireAggregates).Draw(t, "aggregate")
	sc.Fire.SteelProtection = rapid.SampledFrom(model.SteelProtections).Draw(t, "steel protection")
	tm.FireSides = rapid.SampledFrom([]int{3, 4}).Draw(t, "fire sides")
	tm.Duration = rapid.SampledFrom([]string{"", "permanent", "ten-years", "two-months", "seven-days", "ten-minutes"}).Draw(t, "duration")

	sc.Composite.Families = subset(t, model.CompositeFamilies, "composite families")
	sc.Composite.FillFcMPa = maybeZero(t, model.MinFillFcMPa, model.MaxFillFcMPa, "fill fc")

	sc.Tie = rapid.Float64Range(0, model.MaxTie).Draw(t, "tie")
	sc.Carbon = model.CarbonFactors{}
	for _, k := range model.CarbonKinds {
		sc.Carbon[k.Key] = rapid.Float64Range(0, 10000).Draw(t, "carbon "+k.Key)
	}
	return sc
}

func TestRandomSchemesRoundTrip(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		sc := genScheme(t)
		if err := sc.Validate(); err != nil {
			t.Fatalf("generator made an invalid scheme: %v", err)
		}
		b, err := Marshal(sc)
		if err != nil {
			t.Fatalf("Marshal: %v", err)
		}
		back, err := Unmarshal(b)
		if err != nil {
			t.Fatalf("Unmarshal of\n%s\n: %v", b, err)
		}
		if !reflect.DeepEqual(sc, back) {
			t.Fatalf("round trip changed the scheme:\n got %#v\nwant %#v\nfile:\n%s", back, sc, b)
		}
		again, err := Marshal(back)
		if err != nil || !bytes.Equal(b, again) {
			t.Fatalf("Marshal is not stable: %v", err)
		}
	})
}

// TestEveryModelFieldIsInTheFormat fails when model.Scheme gains a field,
// so that the file format is extended with it (and the generator above
// varies it).
func TestEveryModelFieldIsInTheFormat(t *testing.T) {
	var got []string
	var walk func(prefix string, ty reflect.Type)
	walk = func(prefix string, ty reflect.Type) {
		for i := 0; i < ty.NumField(); i++ {
			f := ty.Field(i)
			if f.Type.Kind() == reflect.Struct {
				walk(prefix+f.Name+".", f.Type)
				continue
			}
			got = append(got, prefix+f.Name)
		}
	}
	walk("", reflect.TypeOf(model.Scheme{}))
	want := []string{
		"Name", "Units", "Metric", "SelfWeight", "Materials", "Carbon", "ReportMap", "Tie", "Variants",
		"Setting.LengthMM", "Setting.WeakMM", "Setting.Ends", "Setting.K", "Setting.Method", "Setting.TwistBraced",
		"Load.Mode", "Load.DirectN", "Load.DeadShare", "Load.TributaryM2", "Load.Floors", "Load.FloorDeadKPa", "Load.FloorLiveKPa",
		"Load.RoofDeadKPa", "Load.RoofLiveKPa", "Load.SnowKPa", "Load.LiveReduction", "Load.KLL", "Load.Occupancy",
		"Steel.Families", "Steel.FyMPa",
		"Concrete.FcMPa", "Concrete.BarGrade", "Concrete.RhoMax", "Concrete.Transverse", "Concrete.M1M2",
		"Concrete.BetaDns", "Concrete.BetaFromLoads", "Concrete.EIMethod", "Concrete.SecondOrderCap", "Concrete.NonswayK1",
		"Timber.Species", "Timber.Grade", "Timber.Glulam", "Timber.Sawn", "Timber.Wet", "Timber.Incised",
		"Timber.Hot", "Timber.FireSides", "Timber.Duration", "Timber.GlulamCombos",
		"Composite.Families", "Composite.FillFcMPa",
		"Fire.Rating", "Fire.Aggregate", "Fire.SteelProtection",
		"Building", // the "building" object (building.go)
		// Set only by the building's own takedown for each storey, never by a scheme: not in the file.
		"Load.PointDeadN", "Load.SelfStoreys",
	}
	sort.Strings(got)
	sort.Strings(want)
	assert.Equal(t, want, got, "model.Scheme changed: add the new field to the scheme file format (codec.go, doc.go, README) and to genScheme")
}

// TestFileKeysMatchTheReader checks that Marshal writes exactly the keys the
// reader accepts, object by object.
func TestFileKeysMatchTheReader(t *testing.T) {
	b, err := Marshal(model.DefaultScheme())
	require.NoError(t, err)
	var doc map[string]any
	require.NoError(t, json.Unmarshal(b, &doc))
	keysOf := func(m map[string]any) []string {
		var ks []string
		for k := range m {
			ks = append(ks, k)
		}
		sort.Strings(ks)
		return ks
	}
	sorted := func(xs []string) []string { ys := slices.Clone(xs); sort.Strings(ys); return ys }
	// "variants" is written only when the scheme has some (variants.go).
	assert.Equal(t, sorted(slices.DeleteFunc(slices.Clone(topKeys), func(k string) bool { return k == variantsKey })), keysOf(doc))
	assert.Equal(t, sorted(settingKeys), keysOf(doc["setting"].(map[string]any)))
	load := doc["load"].(map[string]any)
	assert.Equal(t, sorted(loadKeys), keysOf(load))
	assert.Equal(t, sorted(takedownKeys), keysOf(load["takedown"].(map[string]any)))
	assert.Equal(t, sorted(steelKeys), keysOf(doc["steel"].(map[string]any)))
	assert.Equal(t, sorted(concreteKeys), keysOf(doc["concrete"].(map[string]any)))
	assert.Equal(t, sorted(timberKeys), keysOf(doc["timber"].(map[string]any)))
	assert.Equal(t, sorted(compositeKeys), keysOf(doc["composite"].(map[string]any)))
	assert.Equal(t, sorted(carbonKeys()), keysOf(doc["carbon"].(map[string]any)))
}

// FuzzUnmarshal checks that the parser never panics, accepts only valid
// JSON, and that whatever it accepts re-marshals and re-parses to the same
// scheme. The seed corpus is testdata/fuzz/FuzzUnmarshal plus the shipped
// scheme files.
func FuzzUnmarshal(f *testing.F) {
	fs, _ := filepath.Glob(filepath.Join("..", "..", "testdata", "schemes", "*.upright.json"))
	for _, p := range fs {
		if b, err := os.ReadFile(p); err == nil {
			f.Add(b)
		}
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		sc, err := Unmarshal(data)
		if err != nil {
			if _, ok := err.(*Error); !ok {
				t.Fatalf("error of type %T, want *Error: %v", err, err)
			}
			if err.Error() == "" {
				t.Fatal("empty error message")
			}
			return
		}
		if !json.Valid(bytes.TrimPrefix(data, []byte("\xef\xbb\xbf"))) {
			t.Fatalf("accepted invalid JSON")
		}
		b, err := Marshal(sc)
		if err != nil {
			t.Fatalf("accepted a scheme Marshal refuses: %v", err)
		}
		back, err := Unmarshal(b)
		if err != nil {
			t.Fatalf("re-parse failed: %v\n%s", err, b)
		}
		if !reflect.DeepEqual(sc, back) {
			t.Fatalf("re-parse differs:\n got %#v\nwant %#v", back, sc)
		}
	})
}

// TestAddedFieldsAreOptional: twist_braced and dead_share came after the
// first release of version 1; a file without them reads with the defaults
// (torsional length over the full height, dead share 2/3).
func TestAddedFieldsAreOptional(t *testing.T) {
	sc := model.DefaultScheme()
	sc.Setting.TwistBraced = true
	sc.Load.DeadShare = 0.5
	b, err := Marshal(sc)
	require.NoError(t, err)
	old := strings.Replace(string(b), ",\n    \"twist_braced\": true", "", 1)
	old = strings.Replace(old, "    \"dead_share\": 0.5,\n", "", 1)
	require.NotContains(t, old, "twist_braced")
	require.NotContains(t, old, "dead_share")
	back, err := Unmarshal([]byte(old))
	require.NoError(t, err)
	assert.False(t, back.Setting.TwistBraced)
	assert.Zero(t, back.Load.DeadShare, "absent means the default dead share")
	back, err = Unmarshal(b)
	require.NoError(t, err)
	assert.True(t, back.Setting.TwistBraced)
	assert.Equal(t, 0.5, back.Load.DeadShare)
	bad := strings.Replace(string(b), `"dead_share": 0.5`, `"dead_share": 1.5`, 1)
	_, err = Unmarshal([]byte(bad))
	require.Error(t, err)
	assert.Contains(t, err.Error(), "dead")
}
