package plots

import (
	"runtime"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// TestMemoryFlatOverRedraws renders 2,000 times into one buffer and checks
// that the live heap does not grow and that every render allocates the same
// amount (no per-render retention, no growing caches).
func TestMemoryFlatOverRedraws(t *testing.T) {
	if testing.Short() {
		t.Skip("2,000 renders; skipped with -short")
	}
	const renders = 2000
	// A small buffer and a light scene keep 2,000 renders to a few seconds;
	// BenchmarkRender1200x700 reports the full-size allocation figures.
	r, err := NewRaster(320, 200)
	require.NoError(t, err)
	c := sampleChart(4, 40)
	pix := &r.Image().Pix[0]

	for i := 0; i < 50; i++ { // warm up buffers and font caches
		require.NoError(t, r.Render(c))
	}
	start := heapAfterGC()
	var ms runtime.MemStats
	runtime.ReadMemStats(&ms)
	mallocs0 := ms.Mallocs
	for i := 0; i < renders/2; i++ {
		require.NoError(t, r.Render(c))
	}
	runtime.ReadMemStats(&ms)
	firstHalf := ms.Mallocs - mallocs0
	mid := heapAfterGC()
	runtime.ReadMemStats(&ms)
	mallocs1 := ms.Mallocs
	for i := 0; i < renders/2; i++ {
		require.NoError(t, r.Render(c))
	}
	runtime.ReadMemStats(&ms)
	secondHalf := ms.Mallocs - mallocs1
	end := heapAfterGC()

	t.Logf("live heap: start %d KiB, after %d renders %d KiB, after %d renders %d KiB; mallocs per render %d then %d",
		start>>10, renders/2, mid>>10, renders, end>>10, firstHalf/(renders/2), secondHalf/(renders/2))
	assert.Same(t, pix, &r.Image().Pix[0], "renders must reuse the same pixel buffer")
	// Allow 256 KiB of noise from the runtime and test framework.
	assert.Less(t, int64(end)-int64(start), int64(256<<10), "live heap grew across renders")
	assert.InDelta(t, float64(firstHalf), float64(secondHalf), 0.02*float64(firstHalf), "allocations per render drifted")
}
