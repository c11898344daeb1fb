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

// TestHoldRow: hand-built rows of families' best working sizes (plain
// scores, lower is better; a family's best only worsens with length, as
// fewer sizes work further up) under a 5% tolerance, each expected value
// worked by hand from the rule: the family in front changes only when the
// best other family scores below 0.95 × its own (Better) or it stops
// working, and changes between two columns are taken in length order.
func TestHoldRow(t *testing.T) {
	// Candidate scores: A (family 0) sizes 100, 103 and 120; B (1) sizes
	// 101 and 130; C (2) size 116; D (3) sizes 102 and 108.
	scores := [][]float64{{100, 103, 120}, {101, 130}, {116}, {102, 108}}
	const no = -1
	cases := []struct {
		name   string
		best   [][]int   // per family, per column: best working candidate
		at     []float64 // per family: where its size changes, when two change in one step
		strict []int
		want   []int
	}{
		{"A steps to 103, D at 102 is strictly best but within 5% (102 > 97.85): A kept",
			[][]int{{0, 1, 1}, {no, no, no}, {no, no, no}, {0, 0, 0}}, nil,
			[]int{0, 3, 3}, []int{0, 0, 0}},
		{"then A steps to 120 and D (102 < 114) is better by more than 5%: a change",
			[][]int{{0, 1, 2}, {no, no, no}, {no, no, no}, {0, 0, 0}}, nil,
			[]int{0, 3, 3}, []int{0, 0, 3}},
		{"A stops working: D takes over though within 5%",
			[][]int{{0, 1, no}, {no, no, no}, {no, no, no}, {0, 0, 0}}, nil,
			[]int{0, 3, 3}, []int{0, 0, 3}},
		{"nothing works beyond the first column",
			[][]int{{0, no, no}, {no, no, no}, {no, no, no}, {no, no, no}}, nil,
			[]int{0, no, no}, []int{0, no, no}},
		{"A (to 120) steps before B: B (101 < 114) takes over, then C (116 < 123.5) when B steps to 130",
			[][]int{{0, 2}, {0, 1}, {0, 0}, {no, no}}, []float64{1000, 1010, 0, 0},
			[]int{0, 2}, []int{0, 2}},
		{"B steps before A: A at 120 then faces C (116 > 114), a near-tie: A kept",
			[][]int{{0, 2}, {0, 1}, {0, 0}, {no, no}}, []float64{1010, 1000, 0, 0},
			[]int{0, 2}, []int{0, 0}},
	}
	for _, c := range cases {
		h := holdRow{best: c.best, scores: scores, tie: 0.05,
			reachIn: func(fi, k, j int) float64 { return c.at[fi] },
			name:    func(fi, k int) string { return string(rune('A' + fi)) }}
		got := make([]int, len(c.strict))
		h.run(c.strict, got)
		assert.Equal(t, c.want, got, c.name)
	}
	// With no tolerance the family shown is the strict best.
	h := holdRow{best: [][]int{{0, 1}, {no, no}, {no, no}, {0, 0}}, scores: scores,
		name: func(fi, k int) string { return "" }}
	got := make([]int, 2)
	h.run([]int{0, 3}, got)
	assert.Equal(t, []int{0, 3}, got)
}
