package model

import (
	"context"
	"testing"
)

// benchModel is the default scheme with every registered material on: the
// full catalogues of every family.
func benchModel(b *testing.B) *Model {
	sc := DefaultScheme()
	sc.Setting.LengthMM, sc.Setting.WeakMM = 4500, 4500
	sc.Load = Load{Mode: LoadDirect, DirectN: 2500e3}
	m, err := New(sc)
	if err != nil {
		b.Fatal(err)
	}
	return m
}

func candidates(m *Model) int {
	n := 0
	for _, f := range m.Families {
		n += f.Len()
	}
	return n
}

// BenchmarkScheme evaluates the whole scheme (all families, full catalogues)
// at one length and ranks it, composite included. Target: at most 1 ms.
func BenchmarkScheme(b *testing.B) {
	m := benchModel(b)
	ctx := context.Background()
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		L := 3000 + float64(i%100)*30
		if _, err := m.Evaluate(ctx, m.Scheme.Setting.AtLength(L)); err != nil {
			b.Fatal(err)
		}
	}
	b.ReportMetric(float64(candidates(m)), "candidates")
}

// BenchmarkCrossovers finds every crossover over the default range. Target:
// at most 50 ms.
func BenchmarkCrossovers(b *testing.B) {
	m := benchModel(b)
	ctx := context.Background()
	r := DefaultRange(m.Scheme.Setting.LengthMM, m.Scheme.Units)
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		if _, err := m.Crossovers(ctx, m.Scheme.Setting, r, nil); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkNew builds the model from a scheme (diagram caches warm after the
// first build).
func BenchmarkNew(b *testing.B) {
	sc := DefaultScheme()
	for i := 0; i < b.N; i++ {
		if _, err := New(sc); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkSchemeFire is BenchmarkScheme with a 2 h fire rating: every
// candidate goes through the fire step. Target: at most 2 ms.
func BenchmarkSchemeFire(b *testing.B) {
	sc := DefaultScheme()
	sc.Setting.LengthMM, sc.Setting.WeakMM = 4500, 4500
	sc.Load = Load{Mode: LoadDirect, DirectN: 2500e3}
	sc.Fire.Rating = "2h"
	m, err := New(sc)
	if err != nil {
		b.Fatal(err)
	}
	ctx := context.Background()
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		L := 3000 + float64(i%100)*30
		if _, err := m.Evaluate(ctx, m.Scheme.Setting.AtLength(L)); err != nil {
			b.Fatal(err)
		}
	}
	b.ReportMetric(float64(candidates(m)), "candidates")
}

// BenchmarkNewFire builds the model with a 2 h rating (catalogue caches
// warm after the first build): the fire step runs for every candidate.
func BenchmarkNewFire(b *testing.B) {
	sc := DefaultScheme()
	sc.Fire.Rating = "2h"
	for i := 0; i < b.N; i++ {
		if _, err := New(sc); err != nil {
			b.Fatal(err)
		}
	}
}
