package model

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func TestBetterAndNearTie(t *testing.T) {
	cases := []struct {
		challenger, incumbent, tie float64
		better, near               bool
	}{ // hand arithmetic: better when challenger < incumbent·(1 − tie)
		{94, 100, 0.05, true, false},   // 6% lighter
		{96, 100, 0.05, false, true},   // 4% lighter: a near-tie
		{100, 96, 0.05, false, true},   // 4% heavier
		{99.9, 100, 0, true, false},    // no tolerance: any gain counts
		{100, 100, 0, false, true},     // equal
		{70, 100, MaxTie, false, true}, // 30% lighter within a 50% tolerance
	}
	for _, c := range cases {
		assert.Equal(t, c.better, Better(c.challenger, c.incumbent, c.tie), "%+v", c)
		assert.Equal(t, c.near, NearTie(c.challenger, c.incumbent, c.tie), "%+v", c)
	}
	assert.Equal(t, "within 5%", TieText(0.05))
	assert.Equal(t, "within 2.5%", TieText(0.025))
}

type nameOnly string

func (nameOnly) Material() string           { return "invented" }
func (n nameOnly) Name() string             { return string(n) }
func (nameOnly) Len() int                   { return 0 }
func (nameOnly) Static(int) *Static         { return nil }
func (nameOnly) Quick(int, Setting) Quick   { return Quick{} }
func (nameOnly) Detail(int, Setting) Detail { return Detail{} }

// steps builds a family's candidates from (score, reach in mm) pairs, a
// reach of +Inf meaning it works to the end of the range.
func steps(fi int, name string, pairs ...[2]float64) []reachEntry {
	var out []reachEntry
	for i, p := range pairs {
		r := Reach{LengthMM: p[1], Works: true}
		if math.IsInf(p[1], 1) {
			r = Reach{LengthMM: 12000, Works: true, Beyond: true}
		}
		out = append(out, reachEntry{fi: fi, i: i, score: p[0], reach: r, name: name + string(rune('1'+i))})
	}
	return out
}

// Two invented families whose best sizes leapfrog each other by 3% to 6%:
// without a tolerance the best family flips four times; with 5% it holds
// until the family in front stops working, and the change then lists the
// family within 5% of the new one.
func TestBestFamilyChangesOnlyBeyondTheTolerance(t *testing.T) {
	inf := math.Inf(1)
	reaches := [][]reachEntry{
		steps(0, "A", [2]float64{100, 3000}, [2]float64{106, 5000}, [2]float64{112, 8000}),
		steps(1, "B", [2]float64{103, 4000}, [2]float64{109, 6000}, [2]float64{115, inf}),
		steps(2, "C", [2]float64{118, inf}),
	}
	m := &Model{Families: []Family{nameOnly("A"), nameOnly("B"), nameOnly("C")}}

	exact := m.familyChanges(reaches, 0)
	var at []float64
	for _, x := range exact {
		at = append(at, x.LengthMM)
	}
	// By hand: A→B at 3000 (103 < 106), B→A at 4000 (106 < 109),
	// A→B at 5000 (109 < 112), B→A at 6000 (112 < 115), A→B at 8000 (A ends).
	assert.Equal(t, []float64{3000, 4000, 5000, 6000, 8000}, at)

	tol := m.familyChanges(reaches, 0.05)
	require.Len(t, tol, 1, "within 5%% the family in front holds: %+v", tol)
	x := tol[0]
	assert.Equal(t, 8000.0, x.LengthMM, "A holds until it stops working")
	assert.Equal(t, "A", x.From)
	assert.Equal(t, "A3", x.FromDesignation)
	assert.Equal(t, "B", x.To)
	assert.Equal(t, "B3", x.ToDesignation)
	assert.Equal(t, []string{"C"}, x.NearTies, "C (118) is within 5% of B (115)")
	assert.Equal(t, "within 5%: C", x.NearTieText())

	// A challenger more than 5% better takes over at once.
	reaches[1] = steps(1, "B", [2]float64{103, 4000}, [2]float64{109, 6000}, [2]float64{115, inf})
	reaches[0] = steps(0, "A", [2]float64{100, 3000}, [2]float64{120, inf})
	tol = m.familyChanges(reaches, 0.05)
	require.NotEmpty(t, tol)
	assert.Equal(t, 3000.0, tol[0].LengthMM, "B at 103 beats A at 120 by 14%")
	assert.Equal(t, "B", tol[0].To)
}

// The scheme field: default 5%, refused outside 0 to 50%.
func TestTieField(t *testing.T) {
	sc := DefaultScheme()
	assert.Equal(t, 0.05, sc.Tie)
	for _, bad := range []float64{-0.01, 0.51, math.NaN(), math.Inf(1)} {
		sc.Tie = bad
		err := sc.Validate()
		require.Error(t, err, "%v", bad)
		assert.Contains(t, err.Error(), "tie")
	}
}

// One rule for exact ties: the lower score, then the designation first in
// byte order, wherever candidates are ranked (common practice: a stable,
// documented tie-break).
func TestAheadBreaksExactTiesByDesignation(t *testing.T) {
	assert.True(t, Ahead(1, "b", 2, "a"), "lower score first")
	assert.True(t, Ahead(2, "a", 2, "b"), "exact tie: designation")
	assert.False(t, Ahead(2, "b", 2, "a"))
	assert.False(t, Ahead(2, "a", 2, "a"), "equal is not ahead")
	r := Result{Families: []FamilyResult{
		{Family: 0, Working: 1, Rows: []Row{{Family: 0, OK: true, Score: 10, Static: &Static{Designation: "W8X10"}}}},
		{Family: 1, Working: 1, Rows: []Row{{Family: 1, OK: true, Score: 10, Static: &Static{Designation: "HSS4X4X1/4"}}}},
	}}
	assert.Equal(t, "HSS4X4X1/4", r.BestOverall().Static.Designation, "the map's rule: designation on an exact tie, whatever the family order")
}

// A family that leads for less than the search tolerance (ToleranceMM, the
// accuracy crossover lengths are found to) is not listed as a reign.
func TestMergeShortReigns(t *testing.T) {
	xs := []Crossover{
		{Kind: KindFamily, LengthMM: 3000, From: "A", To: "B", Family: "B", ToDesignation: "b1"},
		{Kind: KindFamily, LengthMM: 3003, From: "B", To: "C", Family: "C", ToDesignation: "c1"},
		{Kind: KindFamily, LengthMM: 5000, From: "C", To: "A", Family: "A", ToDesignation: "a2"},
		{Kind: KindFamily, LengthMM: 5002, From: "A", To: "C", Family: "C", ToDesignation: "c2"},
		{Kind: KindFamily, LengthMM: 7000, From: "C"},
	}
	got := mergeShortReigns(xs)
	require.Len(t, got, 2)
	assert.Equal(t, Crossover{Kind: KindFamily, LengthMM: 3000, From: "A", To: "C", Family: "C", ToDesignation: "c1"}, got[0])
	assert.Equal(t, 7000.0, got[1].LengthMM, "nothing works beyond: kept")
}
