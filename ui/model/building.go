package model

import (
	"fmt"
	"strings"
)

// Building is a whole column scheme: a grid of bays, storeys from the ground
// up and the floor, roof and façade loads; every column position is taken
// down storey by storey and sized in every family switched on. The scheme's
// end conditions, method, fire rating, materials and ranking apply.
type Building struct {
	BaysXMM   []float64 // bay spacings along x, mm, from the first grid line
	BaysYMM   []float64 // bay spacings along y, mm
	StoreysMM []float64 // storey heights from the ground up, mm; storey 1 is the ground storey

	FloorDeadKPa  float64 // floor dead load incl. slab, kPa
	FloorLiveKPa  float64 // unreduced floor live load, kPa
	RoofDeadKPa   float64 // roof dead load, kPa
	RoofLiveKPa   float64 // roof live load Lr, kPa
	SnowKPa       float64 // roof snow load S, kPa
	Occupancy     string  // as Load.Occupancy
	LiveReduction bool    // apply ASCE 7-22 4.7 live-load reduction

	// FacadeKNPerM is the façade dead load per metre of building edge at
	// each level above the ground (every floor and the roof), kN/m, carried
	// by the edge and corner columns.
	FacadeKNPerM float64
	// OverhangMM is how far the slab runs past the outer grid lines, mm;
	// above 0 the edge and corner columns carry cantilever slabs and take
	// KLL 3 and 2 (ASCE 7-22 Table 4.7-1).
	OverhangMM float64
	// ChangeEvery is how many storeys a column keeps its size: sizes may
	// change only at storeys 1 + k·ChangeEvery, counted from the ground.
	ChangeEvery int
	// PlanFamily is the family the floor plan draws ("" for the best
	// overall at the plan's storey); PlanStorey the storey it shows (1, the
	// ground storey, when 0).
	PlanFamily string
	PlanStorey int
}

// DefaultChangeEvery is how often a column may change size going up when
// not given: every 2 storeys (a two-storey column piece, common practice).
const DefaultChangeEvery = 2

// Limits on the building input.
const (
	MaxBays       = 40       // bays in each direction
	MaxStoreys    = 60       // storeys
	MinBayMM      = 1000.0   // 1 m (3.3 ft)
	MaxBayMM      = 30000.0  // 30 m (98 ft)
	MinStoreyMM   = 2000.0   // 2 m (6.6 ft)
	MaxStoreyMM   = 30000.0  // 30 m (98 ft), as MaxLengthMM
	MaxFacadeKNM  = 100.0    // kN/m (6.85 kip/ft)
	MaxOverhangMM = 5000.0   // 5 m (16.4 ft)
	maxBuildingM2 = 250000.0 // one floor plate, m²
)

// DefaultBuilding returns a 3 × 2-bay, four-storey office building, the
// starting point of a new building section.
func DefaultBuilding() Building {
	return Building{
		BaysXMM: []float64{9000, 9000, 9000}, BaysYMM: []float64{7500, 7500},
		StoreysMM:    []float64{4200, 3600, 3600, 3600},
		FloorDeadKPa: 4, FloorLiveKPa: 2.4, RoofDeadKPa: 3, SnowKPa: 1.5,
		LiveReduction: true, ChangeEvery: DefaultChangeEvery,
	}
}

// Validate checks the building and returns the first problem as a *FieldError.
func (b *Building) Validate() error {
	lists := []struct {
		field    string
		v        []float64
		max      int
		lo, hi   float64
		accepted string
	}{
		{"bays-x", b.BaysXMM, MaxBays, MinBayMM, MaxBayMM, "a comma list of 1 to 40 bay spacings, each from 1 m to 30 m (3.3 ft to 98 ft), e.g. 9m,9m,7.5m"},
		{"bays-y", b.BaysYMM, MaxBays, MinBayMM, MaxBayMM, "a comma list of 1 to 40 bay spacings, each from 1 m to 30 m (3.3 ft to 98 ft), e.g. 7.5m,7.5m"},
		{"storeys", b.StoreysMM, MaxStoreys, MinStoreyMM, MaxStoreyMM, "a comma list of 1 to 60 storey heights from the ground up, each from 2 m to 30 m (6.6 ft to 98 ft), e.g. 4.2m,3.6m,3.6m"},
	}
	for _, l := range lists {
		if len(l.v) == 0 || len(l.v) > l.max {
			return bad(l.field, fmt.Sprintf("%d entries", len(l.v)), l.accepted)
		}
		for _, x := range l.v {
			if !finite(x) || x < l.lo || x > l.hi {
				return bad(l.field, fmt.Sprintf("%g mm", x), l.accepted)
			}
		}
	}
	if !finite(b.FacadeKNPerM) || b.FacadeKNPerM < 0 || b.FacadeKNPerM > MaxFacadeKNM {
		return bad("facade", b.FacadeKNPerM, "a façade dead load per metre of edge from 0 to 100 kN/m (0 to 6.85 kip/ft)")
	}
	if !finite(b.OverhangMM) || b.OverhangMM < 0 || b.OverhangMM > MaxOverhangMM {
		return bad("overhang", b.OverhangMM, "a slab overhang past the outer grid lines from 0 to 5 m (0 to 16.4 ft)")
	}
	if b.ChangeEvery < 1 || b.ChangeEvery > MaxStoreys {
		return bad("change-every", b.ChangeEvery, "a whole number of storeys from 1 to 60 between size changes (default 2)")
	}
	if b.PlanStorey < 0 || b.PlanStorey > len(b.StoreysMM) {
		return bad("plan-storey", b.PlanStorey, fmt.Sprintf("a storey from 1 (the ground) to %d, or 0 for the ground", len(b.StoreysMM)))
	}
	if w, d := b.planWidths(); w*d/1e6 > maxBuildingM2 {
		return bad("bays-x", fmt.Sprintf("%.0f m²", w*d/1e6), "a floor plate of at most 250,000 m² (2.7 million ft²)")
	}
	// The loads as the takedown of the most loaded column checks them.
	l := b.load(PosInterior, b.maxTributary(), 1, 0)
	if err := l.Validate(); err != nil {
		return err
	}
	return nil
}

// Position names one kind of column position on the grid.
type Position string

// The four column positions.
const (
	PosInterior Position = "interior" // inside the grid
	PosEdgeX    Position = "edge-x"   // on the first or last grid line of y, along an x edge
	PosEdgeY    Position = "edge-y"   // on the first or last grid line of x, along a y edge
	PosCorner   Position = "corner"   // at a corner of the grid
)

// Positions lists the positions in display order.
var Positions = []Position{PosInterior, PosEdgeX, PosEdgeY, PosCorner}

// PositionOf returns the position of the column at grid lines i (x, 0 to
// nx) and j (y, 0 to ny).
func PositionOf(i, j, nx, ny int) Position {
	ex := i == 0 || i == nx
	ey := j == 0 || j == ny
	switch {
	case ex && ey:
		return PosCorner
	case ey:
		return PosEdgeX
	case ex:
		return PosEdgeY
	}
	return PosInterior
}

// KLL returns the live load element factor of a position: 4 for every
// column without cantilever slabs; with them 3 at an edge and 2 at a corner
// (ASCE 7-22 Table 4.7-1, from memory).
func (b *Building) KLL(p Position) float64 {
	if b.OverhangMM > 0 {
		switch p {
		case PosEdgeX, PosEdgeY:
			return 3
		case PosCorner:
			return 2
		}
	}
	return 4
}

// width returns the tributary width of grid line i of bays: half of each
// bay beside it, and the overhang past an outer line, mm.
func (b *Building) width(bays []float64, i int) float64 {
	w := 0.0
	if i > 0 {
		w += bays[i-1] / 2
	} else {
		w += b.OverhangMM
	}
	if i < len(bays) {
		w += bays[i] / 2
	} else {
		w += b.OverhangMM
	}
	return w
}

// planWidths returns the slab's overall width along x and y, mm.
func (b *Building) planWidths() (float64, float64) {
	return sum(b.BaysXMM) + 2*b.OverhangMM, sum(b.BaysYMM) + 2*b.OverhangMM
}

func sum(xs []float64) float64 {
	s := 0.0
	for _, x := range xs {
		s += x
	}
	return s
}

// GrossFloorAreaM2 returns the floor area of every floor plate the columns
// stand on (the ground floor and each floor above it, not the roof), m².
func (b *Building) GrossFloorAreaM2() float64 {
	w, d := b.planWidths()
	return w * d / 1e6 * float64(len(b.StoreysMM))
}

// PositionTake is the tributary area and façade length of one position: the
// largest of its columns (each position is sized for its worst column).
type PositionTake struct {
	Position     Position
	Count        int     // columns at this position on each floor
	TributaryM2  float64 // tributary floor area per floor, m²
	FacadeM      float64 // length of building edge whose façade it carries, m
	KLL          float64 // ASCE 7-22 Table 4.7-1
	TributarySum float64 // the tributary areas of all its columns added, m² (equals Count × TributaryM2 with equal bays)
	FacadeSum    float64 // the façade lengths of all its columns added, m
}

// Takes returns every position that occurs on the grid, in display order.
func (b *Building) Takes() []PositionTake {
	nx, ny := len(b.BaysXMM), len(b.BaysYMM)
	byPos := map[Position]*PositionTake{}
	for i := 0; i <= nx; i++ {
		for j := 0; j <= ny; j++ {
			p := PositionOf(i, j, nx, ny)
			t := byPos[p]
			if t == nil {
				t = &PositionTake{Position: p, KLL: b.KLL(p)}
				byPos[p] = t
			}
			wx, wy := b.width(b.BaysXMM, i)/1000, b.width(b.BaysYMM, j)/1000
			a := wx * wy
			f := 0.0
			if j == 0 || j == ny {
				f += wx
			}
			if i == 0 || i == nx {
				f += wy
			}
			t.Count++
			t.TributarySum += a
			t.FacadeSum += f
			t.TributaryM2 = max(t.TributaryM2, a)
			t.FacadeM = max(t.FacadeM, f)
		}
	}
	var out []PositionTake
	for _, p := range Positions {
		if t := byPos[p]; t != nil {
			out = append(out, *t)
		}
	}
	return out
}

// maxTributary is the largest tributary area of any column, m².
func (b *Building) maxTributary() float64 {
	m := 0.0
	for _, t := range b.Takes() {
		m = max(m, t.TributaryM2)
	}
	return m
}

// load returns the takedown of a column of position p with tributary area
// a (m²) in storey k (1 the ground) with façade length fm (m): it carries
// the floors above it and the roof, and the façade of every level from its
// top up.
func (b *Building) load(p Position, a float64, k int, fm float64) Load {
	n := len(b.StoreysMM)
	return Load{
		Mode: LoadTakedown, TributaryM2: a, Floors: n - k,
		FloorDeadKPa: b.FloorDeadKPa, FloorLiveKPa: b.FloorLiveKPa,
		RoofDeadKPa: b.RoofDeadKPa, RoofLiveKPa: b.RoofLiveKPa, SnowKPa: b.SnowKPa,
		LiveReduction: b.LiveReduction, KLL: b.KLL(p), Occupancy: b.Occupancy,
		PointDeadN: b.FacadeKNPerM * fm * float64(n-k+1) * 1e3,
	}
}

// groupOf returns the first and last storey (1-based) of the size group
// holding storey k: sizes change only at storeys 1 + m·ChangeEvery.
func (b *Building) groupOf(k int) (int, int) {
	first := (k-1)/b.ChangeEvery*b.ChangeEvery + 1
	last := min(first+b.ChangeEvery-1, len(b.StoreysMM))
	return first, last
}

// String is a one-line description, e.g. "3 × 2 bays, 4 storeys".
func (b *Building) String() string {
	var sb strings.Builder
	fmt.Fprintf(&sb, "%d × %d %s, %d %s", len(b.BaysXMM), len(b.BaysYMM), plural(len(b.BaysYMM), "bay", "bays"),
		len(b.StoreysMM), plural(len(b.StoreysMM), "storey", "storeys"))
	return sb.String()
}
