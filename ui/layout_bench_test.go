package ui

import (
	"testing"
)

// BenchmarkTableRefresh measures the UI goroutine's share of a slider step
// for the results table at 1280×720: picking and sorting the rows, the note,
// choosing the columns by width and refilling the visible cells.
func BenchmarkTableRefresh(b *testing.B) {
	h := newHarnessAt(b, everyFamily(), laptop)
	h.layOut()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		h.ui(func() { h.w.results.refreshRows() })
	}
}
