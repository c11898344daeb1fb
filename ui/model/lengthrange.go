package model

import "math"

// roundSteps are the default length ranges of one unit system, in its own
// unit: the near end, the near end for a column shorter than that, the far
// ends tried in turn, and the size of the unit in mm.
type roundSteps struct {
	from, low, unitMM float64
	to                []float64
}

// defaultSteps holds the round ranges of each unit system: 0.5 m to 12 m
// stepping out to 30 m, and 2 ft to 40 ft stepping out to 98 ft (the last
// whole foot step within MaxLengthMM).
var defaultSteps = map[Units]roundSteps{
	SI: {from: 0.5, low: 0.3, unitMM: 1000, to: []float64{12, 18, 24, 30}},
	US: {from: 2, low: 1, unitMM: 304.8 /* mm per foot, exact */, to: []float64{40, 60, 80, 98}},
}

// DefaultRange is the length range of charts, crossover searches and maps
// for a column length, in round numbers of the shown unit u: 0.5 m to 12 m
// (2 ft to 40 ft), the far end moved out a step while the length sits in the
// top quarter, and the near end brought down to 0.3 m (1 ft) for a shorter
// column. Only a length beyond the last round step (under 1 ft or over
// 98 ft) takes the accepted limit, MinLengthMM or MaxLengthMM, as its end.
// Steps keep the range still while the length moves; an unknown unit system
// reads as SI.
func DefaultRange(lengthMM float64, u Units) Range {
	st, ok := defaultSteps[u]
	if !ok {
		st = defaultSteps[SI]
	}
	r := Range{FromMM: st.from * st.unitMM}
	for _, to := range st.to {
		r.ToMM = math.Min(to*st.unitMM, MaxLengthMM)
		if lengthMM <= 0.75*r.ToMM {
			break
		}
	}
	if lengthMM > r.ToMM {
		r.ToMM = MaxLengthMM // past the last round step: the longest column accepted
	}
	if lengthMM < r.FromMM {
		r.FromMM = math.Max(st.low*st.unitMM, MinLengthMM)
	}
	if lengthMM < r.FromMM {
		r.FromMM = MinLengthMM // under 1 ft: the shortest column accepted
	}
	return r
}

// DefaultRangeHelp describes DefaultRange for a flag's help text.
const DefaultRangeHelp = "round numbers of the shown unit: 2 ft to 40 ft, or 0.5 m to 12 m, the far end stepping out for a long column"
