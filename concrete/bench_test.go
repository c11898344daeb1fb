package concrete

import (
	"testing"
)

// BenchmarkQuick evaluates every US catalogue candidate at one slender
// length and reports the time per candidate.
func BenchmarkQuick(b *testing.B) {
	cat, err := Catalogue(CatalogueOptions{})
	if err != nil {
		b.Fatal(err)
	}
	c := Conditions{LuXMM: 6000, LuYMM: 6000, Ends: PinnedPinned, M1M2: -1, BetaDns: 0.6}
	b.ReportAllocs()
	b.ResetTimer()
	var sink float64
	for i := 0; i < b.N; i++ {
		for _, s := range cat {
			sink += s.Quick(&c).PhiPn
		}
	}
	b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N*len(cat)), "ns/candidate")
	_ = sink
}

// BenchmarkCatalogue builds every US section with all its diagrams, as at start-up.
func BenchmarkCatalogue(b *testing.B) {
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		if _, err := Catalogue(CatalogueOptions{}); err != nil {
			b.Fatal(err)
		}
	}
}
