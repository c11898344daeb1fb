package model

import (
	"testing"

	"github.com/stretchr/testify/assert"
)

// TestGridReachAnyHint: whatever the hint, the reach is the last length at
// which the candidate works, as a check of every length finds it.
func TestGridReachAnyHint(t *testing.T) {
	m := fakeModel(t, twoFakes()...)
	var lengths []float64
	for L := 500.0; L <= 14000; L += 250 {
		lengths = append(lengths, L)
	}
	n := len(lengths)
	for fi, f := range m.Families {
		for i := 0; i < f.Len(); i++ {
			want := -1
			for k := range lengths {
				if m.works(fi, i, m.Scheme.Setting, lengths[k]) {
					want = k
				}
			}
			for _, hint := range []int{-7, -1, 0, 1, want - 3, want, want + 1, want + 9, n / 2, n - 1, n + 4} {
				assert.Equal(t, want, m.gridReach(fi, i, m.Scheme.Setting, lengths, hint), "%s hint %d", f.Static(i).Designation, hint)
			}
		}
	}
}
