package concrete

import (
	"testing"

	"github.com/stretchr/testify/require"
)

// Unit helpers for hand calculations written in kips and inches.
const (
	kipIn = NPerKip * MMPerInch // N·mm in one kip-in
	in2   = MMPerInch * MMPerInch
)

// square16 is the worked section of the hand calculations: 16x16 in, 8 #9
// (three bars on each face), f'c = 5,000 psi, Grade 60, #3 ties, 1.5 in cover.
func square16(t testing.TB) *Section {
	t.Helper()
	s, err := NewSection(Spec{Shape: Rectangular, WidthMM: 16 * MMPerInch, DepthMM: 16 * MMPerInch,
		Transverse: Tied, FcMPa: 5000 * MPaPerPsi, Grade: 60, BarSize: 9, NBars: 8, CoverMM: DefaultCoverMM})
	require.NoError(t, err)
	return s
}

// round20 is a 20 in round spiral column with 8 #8, f'c = 5,000 psi, Grade 60.
func round20(t testing.TB) *Section {
	t.Helper()
	s, err := NewSection(Spec{Shape: Circular, WidthMM: 20 * MMPerInch, Transverse: Spiral,
		FcMPa: 5000 * MPaPerPsi, Grade: 60, BarSize: 8, NBars: 8, CoverMM: DefaultCoverMM})
	require.NoError(t, err)
	return s
}

func pinned(luMM float64) Conditions {
	return Conditions{LuXMM: luMM, LuYMM: luMM, Ends: PinnedPinned, M1M2: -1, BetaDns: 0.6}
}
