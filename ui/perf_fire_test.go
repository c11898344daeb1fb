package ui

import (
	"testing"
	"time"

	"upright/ui/model"
	"upright/ui/units"
)

// BenchmarkSliderStepFire is BenchmarkSliderStep with a 2 h fire rating
// set, so every candidate runs through the fire step. Target: at most 4 ms.
func BenchmarkSliderStepFire(b *testing.B) {
	sc := everyFamily()
	sc.Fire.Rating = "2h"
	h := newHarness(b, sc)
	var r model.Range
	var sys units.System
	h.ui(func() { r, sys = h.w.st.Range, h.w.sys() })
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		var gen uint64
		h.ui(func() {
			h.w.chart.slider.SetValue(toDisplay(sweep(r, i), sys))
			gen = h.w.reqGen
		})
		if !h.w.eng.WaitEvaluated(gen, 10*time.Second) {
			b.Fatal("engine stalled")
		}
	}
}
