package model_test

import (
	"context"
	"errors"
	"math"
	"math/rand"
	"path/filepath"
	"runtime"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/schemefile"
)

// demoScheme is the demo scheme of testdata (a takedown: the map's vertical
// axis is the tributary area per floor).
func demoScheme(t testing.TB) model.Scheme {
	sc, err := schemefile.Load(filepath.Join("..", "..", "testdata", "schemes", "demo.upright.json"))
	require.NoError(t, err)
	return sc
}

// directScheme is the default scheme with a typed load, every material on.
func directScheme() model.Scheme {
	sc := model.DefaultScheme()
	sc.Load = model.Load{Mode: model.LoadDirect, DirectN: 2500e3}
	return sc
}

// directBest evaluates the whole scheme at one length and load, the way
// compare does, and returns the best metric in the map's unit (0, false when
// nothing works).
func directBest(t *testing.T, sc model.Scheme, axis model.MapAxis, load, lengthMM float64) (float64, string, bool) {
	if axis == model.MapTributary {
		sc.Load.TributaryM2 = load
	} else {
		sc.Load.DirectN = load
	}
	m, err := model.New(sc)
	require.NoError(t, err)
	res, err := m.Evaluate(context.Background(), sc.Setting.AtLength(lengthMM))
	require.NoError(t, err)
	b := res.BestOverall()
	if b == nil {
		return 0, "", false
	}
	switch sc.Metric {
	case model.ByFootprint:
		return b.Static.PlanAreaMM2, b.Static.Designation, true
	case model.ByCarbon:
		return b.CarbonKg, b.Static.Designation, true
	}
	return b.Static.MassKgPerM, b.Static.Designation, true
}

// TestMapMatchesDirectEvaluation checks random cells of maps against a
// direct evaluation of the whole scheme at that length and load: the best
// metric agrees within 0.5% and nothing-works agrees exactly. The reference
// is the program's own full evaluation (Evaluate, as compare runs it), not
// an outside source: the map is a faster route to the same answer.
func TestMapMatchesDirectEvaluation(t *testing.T) {
	demo := demoScheme(t)
	siCarbon := directScheme()
	siCarbon.Units, siCarbon.Metric = model.SI, model.ByCarbon
	foot := directScheme()
	foot.Metric = model.ByFootprint
	foot.Setting.Method = model.ASD
	foot.Load.DirectN = 1500e3
	cases := []struct {
		name  string
		sc    model.Scheme
		r     model.Range
		cells int
	}{
		{"demo takedown, by weight", demo, model.Range{FromMM: 1500, ToMM: 12000}, 30},
		{"typed load, by carbon, SI", siCarbon, model.Range{FromMM: 500, ToMM: 14000}, 15},
		{"typed load, ASD, by footprint", foot, model.Range{FromMM: 2000, ToMM: 10000}, 15},
	}
	rng := rand.New(rand.NewSource(15))
	checked := 0
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			sp := model.DefaultMapSpec(&c.sc, c.r)
			if raceOn {
				sp.Columns, sp.Rows = 30, 12
			}
			g, err := model.ComputeMap(context.Background(), c.sc, sp, nil)
			require.NoError(t, err)
			if !raceOn {
				require.Len(t, g.LengthsMM, model.MapDefaultColumns)
				require.Len(t, g.Loads, model.MapDefaultRows)
			}
			assert.InDelta(t, c.r.FromMM, g.LengthsMM[0], 1e-9)
			assert.InDelta(t, c.r.ToMM, g.LengthsMM[len(g.LengthsMM)-1], 1e-9)
			some, none := 0, 0
			for k := 0; k < c.cells; k++ {
				i, j := rng.Intn(len(g.Loads)), rng.Intn(len(g.LengthsMM))
				cell := g.At(i, j)
				want, des, ok := directBest(t, c.sc, g.Axis, g.Loads[i], g.LengthsMM[j])
				if !ok {
					none++
					assert.Equal(t, -1, cell.Family, "load %g, length %g mm: direct evaluation finds nothing, map finds %s", g.Loads[i], g.LengthsMM[j], g.Designation(cell))
					continue
				}
				some++
				require.GreaterOrEqual(t, cell.Family, 0, "load %g, length %g mm: map finds nothing, direct finds %s", g.Loads[i], g.LengthsMM[j], des)
				assert.InEpsilon(t, want, cell.Metric, 0.005, "load %g, length %g mm: map %s, direct %s", g.Loads[i], g.LengthsMM[j], g.Designation(cell), des)
				checked++
			}
			assert.Positive(t, some, "the sampled cells should include working ones")
			checked += none
		})
	}
	assert.GreaterOrEqual(t, checked, 50)
}

// TestMapAxisFollowsLoadMode: a takedown maps tributary area, a typed load maps load.
func TestMapAxisFollowsLoadMode(t *testing.T) {
	demo := demoScheme(t)
	assert.Equal(t, model.MapTributary, model.MapAxisOf(&demo))
	d := directScheme()
	assert.Equal(t, model.MapLoad, model.MapAxisOf(&d))
	sp := model.DefaultMapSpec(&demo, model.Range{FromMM: 1000, ToMM: 9000})
	assert.InDelta(t, demo.Load.TributaryM2/4, sp.LoadFrom, 1e-9)
	assert.InDelta(t, demo.Load.TributaryM2*2, sp.LoadTo, 1e-9)
}

// TestMapWinnerNeverImprovesWithLoad: a heavier load can only keep or worsen
// the best metric at a length (strength is fixed, demand grows), and a
// longer column likewise (common practice: strength falls with length).
func TestMapWinnerNeverImprovesWithLoad(t *testing.T) {
	sc := directScheme()
	sc.SelfWeight = false
	g, err := model.ComputeMap(context.Background(), sc, model.MapSpec{Lengths: model.Range{FromMM: 1000, ToMM: 12000}, LoadFrom: 200e3, LoadTo: 8000e3, Columns: 40, Rows: 20}, nil)
	require.NoError(t, err)
	for i := range g.Loads {
		for j := range g.LengthsMM {
			c := g.At(i, j)
			if i > 0 {
				p := g.At(i-1, j)
				if c.Family >= 0 {
					require.GreaterOrEqual(t, p.Family, 0)
					assert.GreaterOrEqual(t, c.Metric, p.Metric*(1-1e-12))
				}
			}
			if j > 0 && c.Family >= 0 {
				p := g.At(i, j-1)
				require.GreaterOrEqual(t, p.Family, 0)
				assert.GreaterOrEqual(t, c.Metric, p.Metric*(1-1e-12))
			}
		}
	}
}

// TestMapSpecRejectsBadInput: every bad grid names its field.
func TestMapSpecRejectsBadInput(t *testing.T) {
	demo := demoScheme(t)
	d := directScheme()
	r := model.Range{FromMM: 1000, ToMM: 8000}
	cases := []struct {
		name  string
		sc    *model.Scheme
		sp    model.MapSpec
		field string
	}{
		{"lengths reversed", &d, model.MapSpec{Lengths: model.Range{FromMM: 8000, ToMM: 1000}, LoadFrom: 1, LoadTo: 2e6}, "length range"},
		{"length too short", &d, model.MapSpec{Lengths: model.Range{FromMM: 100, ToMM: 1000}, LoadFrom: 1, LoadTo: 2e6}, "length range"},
		{"NaN length", &d, model.MapSpec{Lengths: model.Range{FromMM: math.NaN(), ToMM: 1000}, LoadFrom: 1, LoadTo: 2e6}, "length range"},
		{"zero load", &d, model.MapSpec{Lengths: r, LoadFrom: 0, LoadTo: 2e6}, "load range"},
		{"load above 200 MN", &d, model.MapSpec{Lengths: r, LoadFrom: 1e6, LoadTo: 300e6}, "load range"},
		{"loads reversed", &d, model.MapSpec{Lengths: r, LoadFrom: 3e6, LoadTo: 2e6}, "load range"},
		{"area above 5000 m²", &demo, model.MapSpec{Lengths: r, LoadFrom: 10, LoadTo: 6000}, "tributary range"},
		{"one step", &d, model.MapSpec{Lengths: r, LoadFrom: 1e6, LoadTo: 2e6, Columns: 1}, "steps"},
		{"too many steps", &d, model.MapSpec{Lengths: r, LoadFrom: 1e6, LoadTo: 2e6, Rows: 1000}, "steps"},
		{"negative tie", &d, model.MapSpec{Lengths: r, LoadFrom: 1e6, LoadTo: 2e6, Tie: -0.1}, "tie"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			err := c.sp.Validate(c.sc)
			var fe *model.FieldError
			require.True(t, errors.As(err, &fe), "%v", err)
			assert.Equal(t, c.field, fe.Field)
			_, err = model.ComputeMap(context.Background(), *c.sc, c.sp, nil)
			require.True(t, errors.As(err, &fe), "%v", err)
		})
	}
}

// TestMapCancelAndProgress: progress reaches every row; a cancelled context stops the map.
func TestMapCancelAndProgress(t *testing.T) {
	sc := directScheme()
	sp := model.MapSpec{Lengths: model.Range{FromMM: 1000, ToMM: 8000}, LoadFrom: 500e3, LoadTo: 5000e3, Columns: 20, Rows: 12}
	last, calls := 0, 0
	_, err := model.ComputeMap(context.Background(), sc, sp, func(done, total int) {
		calls++
		assert.Equal(t, 12, total)
		assert.Greater(t, done, last)
		last = done
	})
	require.NoError(t, err)
	assert.Equal(t, 12, calls)
	assert.Equal(t, 12, last)

	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	_, err = model.ComputeMap(ctx, sc, sp, nil)
	assert.ErrorIs(t, err, context.Canceled)
}

// TestMapperReusesBuffers: a second map of the same size reuses the first's cells.
func TestMapperReusesBuffers(t *testing.T) {
	sc := directScheme()
	sp := model.MapSpec{Lengths: model.Range{FromMM: 1000, ToMM: 8000}, LoadFrom: 500e3, LoadTo: 5000e3, Columns: 30, Rows: 10}
	var mp model.Mapper
	g1, err := mp.Compute(context.Background(), sc, sp, nil)
	require.NoError(t, err)
	first := &g1.Cells[0]
	sp.LoadTo = 6000e3
	g2, err := mp.Compute(context.Background(), sc, sp, nil)
	require.NoError(t, err)
	assert.Same(t, first, &g2.Cells[0])
	assert.InDelta(t, 6000e3, g2.Loads[len(g2.Loads)-1], 1e-6)
}

// TestMapBoundaryFollowsShown: boundaries and near-tie marks come from the
// shown family, whatever the strict best.
func TestMapBoundaryFollowsShown(t *testing.T) {
	g := &model.WinMap{Tie: 0.05}
	a := &model.MapCell{Family: 1, Shown: 0} // near-tie: family 1 is lighter, family 0 is kept
	b := &model.MapCell{Family: 0, Shown: 0} // family 0 is strictly best
	c := &model.MapCell{Family: 1, Shown: 1} // family 1 took over
	none := &model.MapCell{Family: -1, Shown: -1}
	assert.False(t, g.Boundary(a, b), "same shown family, different strict best")
	assert.True(t, g.Boundary(b, c))
	assert.True(t, g.Boundary(a, c), "same strict best, different shown family")
	assert.True(t, g.Boundary(c, none))
	assert.False(t, g.Boundary(none, none))
	assert.True(t, g.Tied(a))
	assert.False(t, g.Tied(b))
	assert.False(t, g.Tied(none))
}

// TestMapShownMatchesCrossovers: along load rows of the demo scheme's map,
// the family shown at each length is the one the crossover list
// (Crossovers, family changes) at that load names there, or, next to a
// change in the list, one it names within one length step. Both sides are
// the program's own: this checks that the map and the list apply one
// near-tie rule (the list places its changes by bisection to ToleranceMM,
// the map samples the grid, hence the step of slack).
func TestMapShownMatchesCrossovers(t *testing.T) {
	sc := demoScheme(t)
	require.Greater(t, sc.Tie, 0.0)
	r := model.Range{FromMM: 500, ToMM: 12000}
	sp := model.DefaultMapSpec(&sc, r)
	sp.Rows = 9
	g, err := model.ComputeMap(context.Background(), sc, sp, nil)
	require.NoError(t, err)
	assert.Equal(t, sc.Tie, g.Tie)
	nc := len(g.LengthsMM)
	step := g.LengthsMM[1] - g.LengthsMM[0]
	name := func(fi int) string {
		if fi < 0 {
			return ""
		}
		return g.Families[fi].Name
	}
	exact, near, changes, tied := 0, 0, 0, 0
	for i, load := range g.Loads {
		at := sc
		at.Load.TributaryM2 = load
		m, err := model.New(at)
		require.NoError(t, err)
		xs, err := m.Crossovers(context.Background(), at.Setting, r, nil)
		require.NoError(t, err)
		var list []model.Crossover
		for _, x := range xs {
			if x.Kind == model.KindFamily {
				list = append(list, x)
			}
		}
		require.NotEmpty(t, list, "row %d", i)
		// named returns the families the list names over [lo, hi]: the one
		// in front at lo (each change's length is the last at which its
		// From still holds) and every one a change brings in up to hi.
		named := func(lo, hi float64) []string {
			out := []string{list[0].From}
			for _, x := range list {
				if x.LengthMM < lo {
					out[0] = x.To
				} else if x.LengthMM < hi {
					out = append(out, x.To)
				}
			}
			return out
		}
		for j := 0; j < nc; j++ {
			c := g.At(i, j)
			if g.Tied(c) {
				tied++
			}
			if j > 0 && c.Shown != g.At(i, j-1).Shown {
				changes++
			}
			L := g.LengthsMM[j]
			got := name(c.Shown)
			if got == named(L, L)[0] {
				exact++
				continue
			}
			assert.Contains(t, named(L-step, L+step), got, "row %d (%g m²) at %g mm: list %+v", i, load, L, list)
			near++
		}
	}
	t.Logf("%d cells as the list names them, %d within one step of a change; %d changes, %d near-tie cells", exact, near, changes, tied)
	assert.Greater(t, exact, 20*near, "the map and the list agree away from changes")
	assert.Greater(t, changes, len(g.Loads), "the demo scheme's rows change family")
	assert.Positive(t, tied, "the demo scheme's map has near-tie cells at 5%%")
}

// BenchmarkMap100x60 computes the demo scheme's 100×60 map (target: at most
// 300 ms on a 2-core machine).
func BenchmarkMap100x60(b *testing.B) {
	sc := demoScheme(b)
	sp := model.DefaultMapSpec(&sc, model.Range{FromMM: 500, ToMM: 12000})
	var mp model.Mapper
	ctx := context.Background()
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		if _, err := mp.Compute(ctx, sc, sp, nil); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkMap100x60Direct is the same with a typed load and every material on.
func BenchmarkMap100x60Direct(b *testing.B) {
	sc := directScheme()
	sp := model.DefaultMapSpec(&sc, model.Range{FromMM: 500, ToMM: 12000})
	var mp model.Mapper
	ctx := context.Background()
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		if _, err := mp.Compute(ctx, sc, sp, nil); err != nil {
			b.Fatal(err)
		}
	}
}

// TestWithLoadMatchesNew: the model WithLoad gives (families shared for a
// typed load) ranks every candidate as a model built afresh at that load.
func TestWithLoadMatchesNew(t *testing.T) {
	for _, sc := range []model.Scheme{directScheme(), demoScheme(t)} {
		base, err := model.New(sc)
		require.NoError(t, err)
		l := sc.Load
		l.DirectN *= 2.7
		l.TributaryM2 *= 1.9
		got, err := base.WithLoad(l)
		require.NoError(t, err)
		sc.Load = l
		want, err := model.New(sc)
		require.NoError(t, err)
		require.Equal(t, len(want.Families), len(got.Families))
		for _, L := range []float64{1500, 4000, 9000} {
			s := sc.Setting.AtLength(L)
			for fi := range want.Families {
				for i := 0; i < want.Families[fi].Len(); i += 3 {
					a, b := got.Row(fi, i, s), want.Row(fi, i, s)
					require.Equal(t, b.OK, a.OK, "%s at %g mm", b.Static.Designation, L)
					require.InDelta(t, b.DemandN, a.DemandN, 1e-6*b.DemandN)
					require.InDelta(t, b.CapacityN, a.CapacityN, 1e-6*math.Max(1, b.CapacityN))
				}
			}
		}
	}
}

// TestMapperMemoryFlat: repeated maps with one Mapper keep the live heap flat.
func TestMapperMemoryFlat(t *testing.T) {
	if raceOn {
		t.Skip("the race detector's shadow memory makes heap sizes meaningless")
	}
	for _, sc := range []model.Scheme{directScheme(), demoScheme(t)} {
		sp := model.DefaultMapSpec(&sc, model.Range{FromMM: 500, ToMM: 12000})
		var mp model.Mapper
		var before, after runtime.MemStats
		for i := 0; i < 2; i++ {
			_, err := mp.Compute(context.Background(), sc, sp, nil)
			require.NoError(t, err)
		}
		runtime.GC()
		runtime.ReadMemStats(&before)
		for i := 0; i < 3; i++ {
			_, err := mp.Compute(context.Background(), sc, sp, nil)
			require.NoError(t, err)
		}
		runtime.GC()
		runtime.ReadMemStats(&after)
		assert.Less(t, int64(after.HeapAlloc)-int64(before.HeapAlloc), int64(4<<20), "live heap growth over 3 maps")
	}
}
