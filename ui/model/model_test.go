package model

import (
	"context"
	"fmt"
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
	"go.uber.org/goleak"
)

// fakeFamily is a test family whose strength follows an Euler-like curve
// P = P0 / (1 + (K L / L0)²): invented numbers, only for exercising the model.
type fakeFamily struct {
	name  string
	p0    []float64 // N
	l0    []float64 // mm
	mass  []float64 // kg/m
	stats []Static
}

func newFake(name string, p0, l0, mass []float64) *fakeFamily {
	f := &fakeFamily{name: name, p0: p0, l0: l0, mass: mass}
	for i := range p0 {
		f.stats = append(f.stats, Static{Material: "fake", Family: name, Designation: fmt.Sprintf("%s-%d", name, i),
			MassKgPerM: mass[i], FootprintMM: [2]float64{200, 200}, PlanAreaMM2: 40000 + float64(i),
			Constituents: []Constituent{{Kind: "rolled-steel", Amount: mass[i]}}})
	}
	return f
}

func (f *fakeFamily) Material() string     { return "fake" }
func (f *fakeFamily) Name() string         { return f.name }
func (f *fakeFamily) Len() int             { return len(f.p0) }
func (f *fakeFamily) Static(i int) *Static { return &f.stats[i] }
func (f *fakeFamily) Detail(i int, s Setting) Detail {
	return Detail{Quick: f.Quick(i, s), Calc: map[string]any{"P0": f.p0[i]}}
}
func (f *fakeFamily) Quick(i int, s Setting) Quick {
	k := s.K
	if k == 0 {
		k = 1
	}
	x := k * s.LengthMM / f.l0[i]
	mode := 0
	gov := "crushing"
	if x > 1 {
		mode, gov = 1, "buckling"
	}
	return Quick{CapacityN: f.p0[i] / (1 + x*x), Governing: gov, Mode: mode, Slenderness: x * 50, Permitted: x < 4}
}

// fakeModel builds a model directly from fake families (bypassing the registry).
func fakeModel(t testing.TB, fams ...Family) *Model {
	sc := DefaultScheme()
	sc.Load = Load{Mode: LoadDirect, DirectN: 1000e3}
	ls, err := Summarize(sc.Load, sc.Setting.Method)
	require.NoError(t, err)
	m := &Model{Scheme: sc, Loads: ls, Families: fams}
	for fi, f := range fams {
		m.scores = append(m.scores, make([]float64, f.Len()))
		m.carbon = append(m.carbon, make([]float64, f.Len()))
		for i := 0; i < f.Len(); i++ {
			m.scores[fi][i] = f.Static(i).MassKgPerM
		}
	}
	return m
}

func twoFakes() []Family {
	a := newFake("A", []float64{1500e3, 2500e3, 4000e3}, []float64{3000, 4000, 6000}, []float64{50, 80, 120})
	b := newFake("B", []float64{1200e3, 3000e3}, []float64{8000, 9000}, []float64{90, 200})
	return []Family{a, b}
}

func TestEvaluateRanksWorkingFirst(t *testing.T) {
	m := fakeModel(t, twoFakes()...)
	res, err := m.Evaluate(context.Background(), m.Scheme.Setting.AtLength(3000))
	require.NoError(t, err)
	fa := res.Families[0]
	// At 3 m, A-0 carries 1500/(1+1) = 750 kN < 1000 kN demand; A-1 carries 2500/(1+0.5625) = 1600 kN.
	require.NotNil(t, fa.Best())
	assert.Equal(t, "A-1", fa.Best().Static.Designation)
	for i, r := range fa.Rows {
		if i < fa.Working {
			assert.True(t, r.OK)
		} else {
			assert.False(t, r.OK)
		}
	}
	// Self-weight is added as dead load at 1.2 (LRFD typed load): 80 kg/m × 9.80665 × 3 m × 1.2.
	assert.InDelta(t, 1000e3+1.2*80*Gravity*3, fa.Best().DemandN, 1e-6)
}

func TestCrossoversConfirmedEitherSide(t *testing.T) {
	m := fakeModel(t, twoFakes()...)
	base := m.Scheme.Setting.AtLength(3000)
	r := DefaultRange(base.LengthMM, SI)
	xs, err := m.Crossovers(context.Background(), base, r, nil)
	require.NoError(t, err)
	require.NotEmpty(t, xs)
	kinds := map[string]int{}
	for _, x := range xs {
		kinds[x.Kind]++
		before, err := m.Evaluate(context.Background(), base.AtLength(x.LengthMM-10))
		require.NoError(t, err)
		after, err := m.Evaluate(context.Background(), base.AtLength(x.LengthMM+10))
		require.NoError(t, err)
		switch x.Kind {
		case KindReach, KindSize:
			fi := familyIndex(m, x.Family)
			assert.Equal(t, x.From, bestName(before.Families[fi].Best()), "%+v before", x)
			if x.Kind == KindSize {
				assert.Equal(t, x.To, bestName(after.Families[fi].Best()), "%+v after", x)
			} else {
				r := findRow(after.Families[fi], x.From)
				assert.False(t, r.OK, "%+v: still works 10 mm beyond its reach", x)
			}
		case KindFamily:
			assert.Equal(t, x.FromDesignation, bestName(before.BestOverall()), "%+v before", x)
			assert.Equal(t, x.ToDesignation, bestName(after.BestOverall()), "%+v after", x)
		}
	}
	assert.Positive(t, kinds[KindSize])
	assert.Positive(t, kinds[KindFamily])
}

func familyIndex(m *Model, name string) int {
	for i, f := range m.Families {
		if f.Name() == name {
			return i
		}
	}
	return -1
}

func bestName(r *Row) string {
	if r == nil {
		return ""
	}
	return r.Static.Designation
}

func findRow(fr FamilyResult, des string) Row {
	for _, r := range fr.Rows {
		if r.Static.Designation == des {
			return r
		}
	}
	return Row{}
}

func TestCurveDenserAtModeChange(t *testing.T) {
	m := fakeModel(t, twoFakes()...)
	pts := m.Curve(0, 1, m.Scheme.Setting, Range{500, 12000})
	require.Greater(t, len(pts), 40)
	for k := 1; k < len(pts); k++ {
		assert.Greater(t, pts[k].LengthMM, pts[k-1].LengthMM)
		assert.LessOrEqual(t, pts[k].CapacityN, pts[k-1].CapacityN+1e-9)
	}
	// The mode changes at L = l0 = 4000 mm: the samples either side are within 2 tolerances after refinement... or closer than the coarse grid.
	coarse := (12000.0 - 500) / 40
	for k := 1; k < len(pts); k++ {
		if pts[k].Mode != pts[k-1].Mode {
			assert.Less(t, pts[k].LengthMM-pts[k-1].LengthMM, coarse/8)
		}
	}
}

func TestCancelledEvaluationLeaksNothing(t *testing.T) {
	defer goleak.VerifyNone(t)
	m := fakeModel(t, twoFakes()...)
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	_, err := m.Evaluate(ctx, m.Scheme.Setting)
	assert.ErrorIs(t, err, context.Canceled)
	_, err = m.Crossovers(ctx, m.Scheme.Setting, DefaultRange(4000, SI), nil)
	assert.ErrorIs(t, err, context.Canceled)
}

func TestValidateNamesField(t *testing.T) {
	cases := []struct {
		field string
		mut   func(*Scheme)
	}{
		{"length", func(s *Scheme) { s.Setting.LengthMM = math.NaN() }},
		{"length", func(s *Scheme) { s.Setting.LengthMM = -5 }},
		{"weak-axis length", func(s *Scheme) { s.Setting.WeakMM = 2 * s.Setting.LengthMM }},
		{"ends", func(s *Scheme) { s.Setting.Ends = "glued" }},
		{"K", func(s *Scheme) { s.Setting.K = 0.1 }},
		{"method", func(s *Scheme) { s.Setting.Method = "wsd" }},
		{"load", func(s *Scheme) { s.Load.DirectN = 0 }},
		{"load", func(s *Scheme) { s.Load.DirectN = math.Inf(1) }},
		{"units", func(s *Scheme) { s.Units = "cubits" }},
		{"rank", func(s *Scheme) { s.Metric = "beauty" }},
	}
	for _, c := range cases {
		sc := DefaultScheme()
		c.mut(&sc)
		err := sc.Validate()
		var fe *FieldError
		require.ErrorAs(t, err, &fe, c.field)
		assert.Equal(t, c.field, fe.Field)
		assert.NotEmpty(t, fe.Accepted)
	}
	sc := DefaultScheme()
	assert.NoError(t, sc.Validate())
}
