package steel

import (
	"math"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// TestStrengthNeverRisesWithLength sweeps every catalogue shape, at its
// default grade and at 70 ksi, over lengths from 1 in to 100 ft with the
// weak axis unbraced and braced at mid-height: the available strength never
// rises with length (AISC 360-22 E3: Fcr falls as Lc/r grows; E7: Fcr·be
// rises with Fcr) and never exceeds φc Fy Ag (Eq. E3-1 with Fcr ≤ Fy).
func TestStrengthNeverRisesWithLength(t *testing.T) {
	for _, fy := range []float64{0, 70} {
		cols, err := Columns(Options{Fy: fy})
		require.NoError(t, err)
		for i := range cols {
			c := &cols[i]
			cap := PhiC * c.Fy() * c.Shape.A
			for _, weak := range []float64{1, 0.5} {
				prev := math.Inf(1)
				for l := 1.0; l <= MaxLength; l += 1.5 {
					s := c.Strength(l, weak*l, weak*l, LRFD)
					if s.Available > prev*(1+1e-12) {
						t.Fatalf("%s Fy=%g: strength rises from %.6g to %.6g kip at L = %g in", c.Shape.Name, c.Fy(), prev, s.Available, l)
					}
					if s.Available > cap*(1+1e-12) {
						t.Fatalf("%s: %.6g kip exceeds φFyAg = %.6g kip", c.Shape.Name, s.Available, cap)
					}
					prev = s.Available
				}
			}
		}
	}
}

// TestContinuousAtE3Switch checks every catalogue shape just below and just
// above the length where AISC 360-22 E3 switches from Eq. E3-2 to Eq. E3-3.
// The package uses the form Fy/Fe ≤ 2.25 of the limit (the one that also
// serves E4), i.e. Lc/r = 1.5π√(E/Fy) = 4.712√(E/Fy); the two equations
// meet there within 0.05 % (0.658^2.25 = 0.38994 against 0.877/2.25 =
// 0.38978).
func TestContinuousAtE3Switch(t *testing.T) {
	cols, err := Columns(Options{})
	require.NoError(t, err)
	for i := range cols {
		c := &cols[i]
		// Weak-axis flexural buckling with the strong axis and twisting short.
		lc := c.Shape.Ry * 1.5 * math.Pi * math.Sqrt(E/c.Fy())
		if lc/c.Shape.Ry > 300 || lc > MaxLength {
			continue
		}
		below := c.Strength(1, lc*(1-1e-9), 1, LRFD)
		above := c.Strength(1, lc*(1+1e-9), 1, LRFD)
		assert.InEpsilon(t, below.Available, above.Available, 5e-4, c.Shape.Name)
		assert.Equal(t, Inelastic, below.Mode.Regime(), c.Shape.Name)
		assert.Equal(t, Elastic, above.Mode.Regime(), c.Shape.Name)
		rb, err := c.Check(Input{Lx: 1, Ly: lc * (1 - 1e-9), Lz: 1, K: 1})
		require.NoError(t, err)
		ra, err := c.Check(Input{Lx: 1, Ly: lc * (1 + 1e-9), Lz: 1, K: 1})
		require.NoError(t, err)
		assert.Contains(t, rb.Equations, "E3-2", c.Shape.Name)
		assert.Contains(t, ra.Equations, "E3-3", c.Shape.Name)
	}
}

// TestContinuousAtLocalBucklingOnset checks that the effective area does
// not jump where a slender element starts to be reduced (AISC 360-22
// E7.1: λ = λr√(Fy/Fcr)); c2 from Eq. E7-4 makes Eq. E7-2 and E7-3 meet.
func TestContinuousAtLocalBucklingOnset(t *testing.T) {
	cols, err := Columns(Options{})
	require.NoError(t, err)
	n := 0
	for i := range cols {
		c := &cols[i]
		for k := 0; k < c.nElem; k++ {
			e := &c.elems[k]
			if !e.slender {
				continue
			}
			lo, hi := e.loss(e.fcrLim*(1-1e-9)), e.loss(e.fcrLim*(1+1e-9))
			assert.Zero(t, lo, c.Shape.Name)
			assert.Less(t, hi, 1e-6*c.Shape.A, "%s %s: area jumps at the onset", c.Shape.Name, e.name)
			n++
		}
	}
	assert.Positive(t, n, "the catalogue has slender elements")
}
