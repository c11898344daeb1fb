package plots

import (
	"math"
	"strconv"

	"gonum.org/v1/plot"
)

// Target numbers of labelled intervals on each axis.
const (
	xTickTarget = 8
	yTickTarget = 7
)

// niceStep returns a step of 1, 2, 2.5 or 5 times a power of ten that splits
// span into about target intervals; a non-positive span or target gives 1.
func niceStep(span float64, target int) float64 {
	if !(span > 0) || target < 1 || math.IsInf(span, 0) {
		return 1
	}
	raw := span / float64(target)
	mag := math.Pow(10, math.Floor(math.Log10(raw)))
	for _, m := range [...]float64{1, 2, 2.5, 5} {
		if m*mag >= raw*(1-1e-9) {
			return m * mag
		}
	}
	return 10 * mag
}

// stepDecimals returns how many decimals a tick label needs for the step.
func stepDecimals(step float64) int {
	d := 0
	for s := step; d < 10 && math.Abs(s-math.Round(s)) > 1e-9*math.Max(1, math.Abs(s)); s *= 10 {
		d++
	}
	return d
}

// ticker marks labelled ticks at a nice step with one unlabelled tick
// between each pair; it reuses its tick buffer from call to call.
type ticker struct {
	target int
	buf    []plot.Tick
}

// Ticks returns the ticks between min and max, implementing plot.Ticker.
func (t *ticker) Ticks(min, max float64) []plot.Tick {
	t.buf = t.buf[:0]
	if !(max > min) {
		return t.buf
	}
	step := niceStep(max-min, t.target)
	dec := stepDecimals(step)
	minor := step / 2
	first := math.Ceil(min/minor-1e-9) * minor
	for i := 0; ; i++ {
		v := first + float64(i)*minor
		if v > max+1e-9*step {
			break
		}
		label := ""
		if q := v / step; math.Abs(q-math.Round(q)) < 1e-6 {
			v = math.Round(q) * step
			label = strconv.FormatFloat(v, 'f', dec, 64)
			if label == "-0" {
				label = "0"
			}
		}
		t.buf = append(t.buf, plot.Tick{Value: v, Label: label})
	}
	return t.buf
}
