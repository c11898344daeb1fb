package model

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/steel"
)

// allFamilies builds every registered material's families for a scheme.
func allFamilies(t *testing.T, sc Scheme) []Family {
	t.Helper()
	m, err := New(sc)
	require.NoError(t, err)
	return m.Families
}

func bodyArea(o Outline) float64 {
	a := 0.0
	for _, r := range o.Body {
		a += RegionArea(r)
	}
	return a
}

// TestEveryFamilyGivesItsOutline checks that every candidate of every
// material has a plan geometry whose bounding size is its footprint and
// whose traced area is its catalogue area within 0.5 %: steel A (derived
// from the published dimensions), concrete Ag and timber b·d.
func TestEveryFamilyGivesItsOutline(t *testing.T) {
	sc := DefaultScheme()
	for _, f := range allFamilies(t, sc) {
		for i := 0; i < f.Len(); i++ {
			o, ok := OutlineOf(f, i, sc.Setting)
			require.True(t, ok, "%s gives no outline", f.Name())
			st := f.Static(i)
			assert.InDelta(t, st.FootprintMM[0], o.WidthMM, 1e-9, st.Designation)
			assert.InDelta(t, st.FootprintMM[1], o.DepthMM, 1e-9, st.Designation)
			want, got, tol := st.PlanAreaMM2, bodyArea(o), 0.005 // concrete Ag, timber b·d
			switch f.Material() {
			case "steel":
				sh, err := steel.Lookup(st.Designation)
				require.NoError(t, err)
				want = sh.A * steelMM2PerIn2
			case "composite":
				// A filled tube: the wall against the tube's area As and the
				// fill against the core area Ac that the I2.2 strength uses.
				sec := Unwrap(f).(*compositeFamily).cols[i].Sec
				fill := 0.0
				for _, r := range o.Fill {
					fill += RegionArea(r)
				}
				assert.InEpsilon(t, sec.Ac*steelMM2PerIn2, fill, 0.01, "fill of %s", st.Designation)
				want = sec.As * steelMM2PerIn2
			}
			assert.InEpsilon(t, want, got, tol, "%s %s", f.Name(), st.Designation)
			minX, maxX, minY, maxY := math.Inf(1), math.Inf(-1), math.Inf(1), math.Inf(-1)
			for _, p := range o.Body[0].Outer {
				minX, maxX = math.Min(minX, p[0]), math.Max(maxX, p[0])
				minY, maxY = math.Min(minY, p[1]), math.Max(maxY, p[1])
			}
			// Round outlines are traced by an equal-area polygon whose
			// vertices sit up to 0.04 % outside the circle.
			assert.InEpsilon(t, o.WidthMM, maxX-minX, 0.001, st.Designation)
			assert.InEpsilon(t, o.DepthMM, maxY-minY, 0.001, st.Designation)
		}
	}
}

// TestSteelOutlinesAgainstPublishedAreas checks a few drawn sections against
// areas published in the AISC Manual Tables 1-1, 1-12 and 1-13
// (from memory): the drawing follows the real shape, fillets included.
func TestSteelOutlinesAgainstPublishedAreas(t *testing.T) {
	for _, c := range []struct {
		name string
		in2  float64
	}{
		{"W14X90", 26.5},        // AISC Manual Table 1-1 (from memory)
		{"W12X65", 19.1},        // AISC Manual Table 1-1 (from memory)
		{"HSS8X8X1/2", 13.5},    // AISC Manual Table 1-12 (from memory)
		{"HSS6.625X0.280", 5.2}, // AISC Manual Table 1-13 (from memory)
	} {
		sh, err := steel.Lookup(c.name)
		require.NoError(t, err)
		got := bodyArea(SteelOutline(sh)) / steelMM2PerIn2
		assert.InEpsilon(t, c.in2, got, 0.02, c.name)
	}
}

// TestConcreteOutlineBarsAndTies checks bars sit where the section placed
// them, inside the tie, with the tie cover + dt/2 in from the faces.
func TestConcreteOutlineBarsAndTies(t *testing.T) {
	sc := DefaultScheme()
	sc.Materials = []string{"concrete"}
	for _, f := range allFamilies(t, sc) {
		o, ok := OutlineOf(f, 0, sc.Setting)
		require.True(t, ok)
		cf := f.(*concreteFamily)
		sec := cf.secs[0]
		require.Len(t, o.Bars, sec.NBars)
		require.Len(t, o.Ties, 1)
		assert.Equal(t, sec.Kind.String() == "Spiral round", o.Spiral)
		// Bar area: n π db²/4 against Ast, within the rounding of the
		// ASTM A615 Table 1 areas (#5: 0.31 in² against π·0.625²/4 = 0.307 in²).
		ast := 0.0
		for _, b := range o.Bars {
			ast += math.Pi * b.DiaMM * b.DiaMM / 4
		}
		assert.InEpsilon(t, sec.AstMM2, ast, 0.015, sec.Designation)
		// The tie's left extreme is cover + dt/2 inside the face.
		minX := math.Inf(1)
		for _, p := range o.Ties[0] {
			minX = math.Min(minX, p[0])
		}
		assert.InDelta(t, -o.WidthMM/2+sec.CoverMM+sec.Tie.DiaMM/2, minX, 0.2, sec.Designation)
	}
}

// TestTimberCharLayer checks the char layer under a 1 h rating on four and
// three faces: 8x8 (7-1/2 in dressed, NDS Supplement Table 1B) with
// aeff = 1.8 in (NDS 2018 Table 16.2.1A, from memory). Hand calculation:
// four faces 7.5² − 3.9² = 41.04 in²; three faces 7.5² − 5.7·3.9 = 34.02 in².
func TestTimberCharLayer(t *testing.T) {
	for _, c := range []struct {
		sides int
		in2   float64
	}{{4, 41.04}, {3, 34.02}} {
		sc := DefaultScheme()
		sc.Materials = []string{"timber"}
		sc.Fire.Rating, sc.Timber.FireSides = "1h", c.sides
		f := allFamilies(t, sc)[0]
		i := timberFind(t, f, "8x8 DF-L No.1")
		o, ok := OutlineOf(f, i, sc.Setting)
		require.True(t, ok)
		require.Len(t, o.Char, 1)
		assert.InDelta(t, c.in2, RegionArea(o.Char[0])/(timberMMPerIn*timberMMPerIn), 1e-6, "%d sides", c.sides)
	}
	sc := DefaultScheme()
	sc.Materials = []string{"timber"}
	f := allFamilies(t, sc)[0]
	o, _ := OutlineOf(f, 0, sc.Setting)
	assert.Empty(t, o.Char, "no fire rating, no char layer")
}

// TestFilledTubeFillsTheWall checks the filled-tube hook: the fill is the
// tube's inside, so wall plus fill is the gross outline.
func TestFilledTubeFillsTheWall(t *testing.T) {
	sh, err := steel.Lookup("HSS8X8X1/2")
	require.NoError(t, err)
	o := FilledTube(SteelOutline(sh))
	require.Len(t, o.Fill, 1)
	total := bodyArea(o) + RegionArea(o.Fill[0])
	// 8 in square with 2t = 0.93 in corner radius: 64 − (4 − π)·0.93² in².
	assert.InEpsilon(t, 64-(4-math.Pi)*0.93*0.93, total/steelMM2PerIn2, 1e-4)
}

// boarded is a steel family with a fire-protection board, as a fire rating gives it.
type boarded struct {
	Family
	mm float64
}

func (b boarded) Outline(i int, s Setting) Outline      { return b.Family.(Outliner).Outline(i, s) }
func (b boarded) ProtectionMM(i int, s Setting) float64 { return b.mm }

// TestOutlineOfAddsProtection checks that a Protected family's board
// thickness reaches the outline, and that a bad one is ignored.
func TestOutlineOfAddsProtection(t *testing.T) {
	sc := DefaultScheme()
	sc.Materials = []string{"steel"}
	f := allFamilies(t, sc)[0]
	bare, ok := OutlineOf(f, 0, sc.Setting)
	require.True(t, ok)
	assert.Zero(t, bare.ProtectionMM)
	// 5/8 in (15.9 mm) Type X board, one layer (common practice).
	o, ok := OutlineOf(boarded{f, 15.9}, 0, sc.Setting)
	require.True(t, ok)
	assert.InDelta(t, 15.9, o.ProtectionMM, 1e-12)
	assert.Equal(t, bare.WidthMM, o.WidthMM, "the bare size is unchanged")
	for _, bad := range []float64{math.NaN(), math.Inf(1), -3} {
		o, _ = OutlineOf(boarded{f, bad}, 0, sc.Setting)
		assert.Zero(t, o.ProtectionMM, "%v", bad)
	}
	_, ok = OutlineOf(f, f.Len(), sc.Setting)
	assert.False(t, ok, "an index past the end gives no outline")
}

// TestFireRatingBoardsTheOutline checks the fire step end to end: with a
// 2 h rating a W10X49 is boxed in two 5/8 in layers of Type X board (IBC
// 2021 722.5.1.2, hand calculation in steel/fire: one layer gives 71.6 min,
// two give 133.7 min), so its outline carries 2 × 15.875 = 31.75 mm.
func TestFireRatingBoardsTheOutline(t *testing.T) {
	sc := DefaultScheme()
	sc.Materials = []string{"steel"}
	sc.Fire.Rating = "2h"
	m, err := New(sc)
	require.NoError(t, err)
	fi, i, ok := m.Find("W10X49")
	require.True(t, ok)
	o, ok := OutlineOf(m.Families[fi], i, sc.Setting)
	require.True(t, ok, "the fire wrapper still gives the steel outline")
	assert.InDelta(t, 31.75, o.ProtectionMM, 1e-9)
	sc.Fire.Rating = "none"
	m, err = New(sc)
	require.NoError(t, err)
	fi, i, _ = m.Find("W10X49")
	o, _ = OutlineOf(m.Families[fi], i, sc.Setting)
	assert.Zero(t, o.ProtectionMM, "no rating, no board")
}
