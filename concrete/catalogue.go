package concrete

import (
	"math"
	"sort"
)

// Sizes returns the section sizes of a family in a series as (b, h) pairs in
// mm (h = b = D for round): US squares and rectangles 10 to 48 in in 2 in
// steps with h/b up to 2, US rounds 12 to 48 in; SI squares and rectangles
// 250 to 1,200 mm in 50 mm steps, SI rounds 300 to 1,200 mm.
//
// Where each limit comes from: ACI 318-19 sets no least or greatest column
// size (the minimum dimensions of earlier editions were dropped, from
// memory); the least sizes are common practice (room for ties, bars and
// cover; a fire rating asks for more, ACI/TMS 216.1); the greatest, 48 in
// or 1,200 mm, is the practical end of cast-in-place column formwork in
// buildings (common practice). The 4 and 6 bar minimums of 10.7.3.1 apply
// in every size.
func Sizes(series Series, kind Kind) [][2]float64 {
	lo, hi, step, unit := 10.0, 48.0, 2.0, MMPerInch
	if series == SeriesSI {
		lo, hi, step, unit = 250, 1200, 50, 1
	}
	if kind == SpiralRound || kind == TiedRound {
		if series == SeriesSI {
			lo = 300
		} else {
			lo = 12
		}
	}
	var out [][2]float64
	n := int(math.Round((hi-lo)/step)) + 1
	for i := 0; i < n; i++ {
		b := lo + float64(i)*step
		switch kind {
		case TiedSquare, SpiralRound, TiedRound:
			out = append(out, [2]float64{b * unit, b * unit})
		case TiedRectangular:
			for j := i + 1; j < n; j++ {
				h := lo + float64(j)*step
				if h > 2*b+1e-9 {
					break
				}
				out = append(out, [2]float64{b * unit, h * unit})
			}
		}
	}
	return out
}

// layoutCand is one feasible bar arrangement before its diagrams are built.
type layoutCand struct {
	size, n int
	ast     float64
}

// feasible lists every bar size and count that fits a section outline at
// the ACI 318-19 25.2.3 spacing with 1% ≤ ρg ≤ rhoMax.
func feasible(base Spec, rhoMax float64) []layoutCand {
	var ag float64
	if base.Shape == Circular {
		ag = math.Pi * base.WidthMM * base.WidthMM / 4
	} else {
		ag = base.WidthMM * base.DepthMM
	}
	var out []layoutCand
	for _, size := range LongitudinalSizes {
		b, _ := BarBySize(size)
		tr := tieFor(size)
		if base.Transverse == Spiral {
			tr, _ = BarBySize(4) // a typical spiral for the fit check; NewSection sizes the real one
		}
		smin := minClearSpacing(b.DiaMM)
		step, first := 2, 4
		if base.Shape == Circular {
			step, first = 1, 6
		} else if base.WidthMM == base.DepthMM {
			step = 4
		}
		for n := first; ; n += step {
			ast := float64(n) * b.AreaMM2
			if ast > rhoMax*ag*(1+1e-12) {
				break
			}
			var clear float64
			if base.Shape == Circular {
				rb := base.WidthMM/2 - base.CoverMM - tr.DiaMM - b.DiaMM/2
				clear = 2*rb*math.Sin(math.Pi/float64(n)) - b.DiaMM
			} else {
				e := base.CoverMM + tr.DiaMM + b.DiaMM/2
				_, _, sx, sy := rectArrangement(n, base.WidthMM-2*e, base.DepthMM-2*e, base.WidthMM == base.DepthMM)
				clear = math.Min(sx, sy) - b.DiaMM
			}
			if clear < smin {
				break
			}
			if ast >= MinRho*ag*(1-1e-12) {
				out = append(out, layoutCand{size, n, ast})
			}
		}
	}
	return out
}

// Layouts returns the sections for one outline: the lightest layout with
// ρg ≥ 1% and heavier variants with ρg nearest 2%, 3%, … up to rhoMax (0
// means the 4% default), each lightest for its target and with the fewest
// bars among near-equal areas; duplicates are dropped. The base spec gives
// the outline, materials, cover and series; its BarSize and NBars are ignored.
func Layouts(base Spec, rhoMax float64) ([]*Section, error) {
	out, err := layoutsFor(base, rhoMax)
	if err == nil && len(out) == 0 {
		return nil, badInput("rho-max", rhoMax, "a cap that leaves room for at least one layout with ρg ≥ 0.01 in this section")
	}
	return out, err
}

// layoutsFor is Layouts without the error for an outline that no layout
// fits; it returns no sections then.
func layoutsFor(base Spec, rhoMax float64) ([]*Section, error) {
	if rhoMax == 0 {
		rhoMax = DefaultRhoMax
	}
	if !finite(rhoMax) || rhoMax < MinRho || rhoMax > MaxRho {
		return nil, badInput("rho-max", rhoMax, "a practical cap on ρg from 0.01 to 0.08 (ACI 318-19 10.6.1.1)")
	}
	probe := base
	probe.BarSize, probe.NBars = 5, 8
	ps := &Section{Spec: probe}
	if err := ps.check(); err != nil { // outline, f'c, grade and cover
		return nil, err
	}
	base = ps.Spec
	cands := feasible(base, rhoMax)
	ag := base.WidthMM * base.DepthMM
	if base.Shape == Circular {
		ag = math.Pi * base.WidthMM * base.WidthMM / 4
	}
	var picks []layoutCand
	seen := map[[2]int]bool{}
	for t := 1; float64(t)/100 <= rhoMax+1e-9; t++ {
		best := -1
		for i, c := range cands {
			if best < 0 || better(c, cands[best], t, ag) {
				best = i
			}
		}
		if best < 0 {
			break
		}
		key := [2]int{cands[best].size, cands[best].n}
		if !seen[key] {
			seen[key] = true
			picks = append(picks, cands[best])
		}
	}
	if len(picks) == 0 {
		return nil, nil
	}
	sort.Slice(picks, func(i, j int) bool { return picks[i].ast < picks[j].ast })
	out := make([]*Section, 0, len(picks))
	for _, p := range picks {
		sp := base
		sp.BarSize, sp.NBars = p.size, p.n
		s, err := NewSection(sp)
		if err != nil {
			continue // the spiral chosen by NewSection may leave less room than the fit check assumed
		}
		out = append(out, s)
	}
	return out, nil
}

// better reports whether layout c beats layout b for the target ρg of t
// percent. For t = 1 the score is the steel area (the lightest with
// ρg ≥ 1%); for heavier targets it is the distance of ρg from the target.
// Scores within 0.5% of the 1% area, or 0.1% in ρg, tie, and a tie goes to
// fewer bars, then less steel.
func better(c, b layoutCand, t int, ag float64) bool {
	score := func(x layoutCand) float64 {
		if t == 1 {
			return x.ast
		}
		return math.Abs(x.ast/ag - float64(t)/100)
	}
	tol := 0.001
	if t == 1 {
		tol = 0.005 * MinRho * ag
	}
	sc, sb := score(c), score(b)
	if sc < sb-tol {
		return true
	}
	if sc > sb+tol {
		return false
	}
	if c.n != b.n {
		return c.n < b.n
	}
	return c.ast < b.ast
}

// CatalogueOptions choose the sections of a catalogue.
type CatalogueOptions struct {
	Series Series  // US or SI sizes
	FcMPa  float64 // f'c, MPa; 0 means 5,000 psi (US) or 35 MPa (SI)
	Grade  int     // 60 or 80; 0 means 60
	RhoMax float64 // practical cap on ρg; 0 means 0.04
	Kinds  []Kind  // families to build; empty means all four
	// BarCoverMM is the least clear cover to the longitudinal bars, mm (a
	// fire rating's, FireBarCoverMM); 0 keeps the 1.5 in cover to the ties.
	BarCoverMM float64
}

// Catalogue builds every section of the chosen families with all their
// layouts and diagrams, in family order and then by size and ρg. An outline
// that no layout fits under the ρg cap is left out; a catalogue left empty
// is an error.
func Catalogue(o CatalogueOptions) ([]*Section, error) {
	fc := o.FcMPa
	if fc == 0 {
		fc = DefaultFcUSMPa
		if o.Series == SeriesSI {
			fc = DefaultFcSIMPa
		}
	}
	if err := CheckFc(fc); err != nil {
		return nil, err
	}
	grade := o.Grade
	if grade == 0 {
		grade = 60
	}
	if o.Series != SeriesUS && o.Series != SeriesSI {
		return nil, badInput("series", float64(o.Series), "US (0) or SI (1)")
	}
	if !finite(o.BarCoverMM) || o.BarCoverMM < 0 || o.BarCoverMM > MaxCover {
		return nil, badInput("bar cover", o.BarCoverMM, "a clear cover to the bars from 0 to 4 in (102 mm)")
	}
	cover := coverForBarCover(o.BarCoverMM)
	kinds := o.Kinds
	if len(kinds) == 0 {
		kinds = []Kind{TiedSquare, TiedRectangular, SpiralRound, TiedRound}
	}
	var out []*Section
	for _, k := range kinds {
		for _, bh := range Sizes(o.Series, k) {
			base := Spec{WidthMM: bh[0], DepthMM: bh[1], FcMPa: fc, Grade: grade, CoverMM: cover, Series: o.Series}
			switch k {
			case SpiralRound:
				base.Shape, base.Transverse = Circular, Spiral
			case TiedRound:
				base.Shape, base.Transverse = Circular, Tied
			case TiedSquare, TiedRectangular:
				base.Shape, base.Transverse = Rectangular, Tied
			default:
				return nil, badInput("kind", float64(k), "tied square, tied rectangular, spiral round or tied round")
			}
			ls, err := layoutsFor(base, o.RhoMax)
			if err != nil {
				return nil, err
			}
			out = append(out, ls...) // an outline no layout fits under the cap is left out
		}
	}
	if len(out) == 0 {
		return nil, badInput("rho-max", o.RhoMax, "a cap on ρg that leaves room for at least one layout above 0.01")
	}
	return out, nil
}
