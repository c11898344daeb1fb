package plots

import (
	"fmt"
	"math"
)

// sampleChart builds an invented comparison scene: n candidate curves of pts
// points each over 4–40 ft, a slowly rising demand, a marker at 16 ft and the
// first crossings of the curves with the demand (found on the sample data).
func sampleChart(n, pts int) *Chart {
	type cand struct {
		label, group string
		p0, l0, k    float64
	}
	cands := []cand{
		{"Steel HSS 8×8×3/8", "steel", 520, 22, 2.0},
		{"Steel wide flange, 12 in", "steel", 900, 26, 2.0},
		{"Concrete 14 in square", "concrete", 610, 40, 3.0},
		{"Concrete 18 in round", "concrete", 880, 48, 3.0},
		{"Glulam 6¾ × 9", "timber", 260, 15, 1.6},
		{"Glulam 8¾ × 12", "timber", 430, 21, 1.6},
		{"Steel pipe 6 in XS", "steel", 330, 18, 2.0},
		{"Concrete 12 in square", "concrete", 430, 32, 3.0},
		{"Sawn 8×8", "timber", 170, 12, 1.6},
		{"Steel HSS 10×10×1/2", "steel", 1400, 30, 2.0},
	}
	const xmin, xmax = 4.0, 40.0
	c := &Chart{
		Title:  "Design strength against unbraced length",
		XLabel: "Unbraced length (ft)",
		YLabel: "Design strength φPn (kip)",
		Marker: &Marker{X: 16, Label: "L = 16 ft"},
	}
	for i := 0; i < n; i++ {
		cd := cands[i%len(cands)]
		s := Series{Label: cd.label, Group: cd.group, Pinned: i == 1}
		if i >= len(cands) {
			s.Label = fmt.Sprintf("%s #%d", cd.label, i/len(cands)+1)
		}
		for j := 0; j < pts; j++ {
			x := xmin + (xmax-xmin)*float64(j)/float64(pts-1)
			y := cd.p0 / (1 + math.Pow(x/cd.l0, cd.k))
			s.Points = append(s.Points, Point{X: x, Y: y})
		}
		c.Series = append(c.Series, s)
	}
	for j := 0; j < pts; j++ {
		x := xmin + (xmax-xmin)*float64(j)/float64(pts-1)
		c.Demand = append(c.Demand, Point{X: x, Y: 180 + 0.9*x})
	}
	for i := range c.Series {
		if len(c.Crossovers) == 5 {
			break
		}
		if x, y, ok := firstCrossing(c.Series[i].Points, c.Demand); ok {
			c.Crossovers = append(c.Crossovers, Crossover{X: x, Y: y, Label: fmt.Sprintf("%.1f ft", x)})
		}
	}
	return c
}

// firstCrossing finds where curve a first drops below b, both sampled at the same X values.
func firstCrossing(a, b []Point) (x, y float64, ok bool) {
	for j := 1; j < len(a) && j < len(b); j++ {
		d0 := a[j-1].Y - b[j-1].Y
		d1 := a[j].Y - b[j].Y
		if d0 >= 0 && d1 < 0 {
			t := d0 / (d0 - d1)
			x = a[j-1].X + t*(a[j].X-a[j-1].X)
			y = a[j-1].Y + t*(a[j].Y-a[j-1].Y)
			return x, y, true
		}
	}
	return 0, 0, false
}
