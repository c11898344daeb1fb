package model

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// handBuilding is the 3 × 2-bay, four-storey case worked by hand below:
// bays 9 m × 7.5 m, storeys 4.2 m and three of 3.6 m, floor 4 kPa dead and
// 2.4 kPa live, roof 3 kPa dead, 1.5 kPa snow, façade 5 kN/m at every level.
func handBuilding() Building {
	return Building{
		BaysXMM: []float64{9000, 9000, 9000}, BaysYMM: []float64{7500, 7500},
		StoreysMM:    []float64{4200, 3600, 3600, 3600},
		FloorDeadKPa: 4, FloorLiveKPa: 2.4, RoofDeadKPa: 3, SnowKPa: 1.5,
		LiveReduction: true, FacadeKNPerM: 5, ChangeEvery: 2,
	}
}

func handScheme(b Building) Scheme {
	sc := DefaultScheme()
	sc.Units = SI
	sc.Building = &b
	return sc
}

func TestBuildingTributaryByHand(t *testing.T) {
	b := handBuilding()
	// By hand: interior 9 × 7.5 = 67.5 m²; edge-x (on an x edge) 9 × 3.75;
	// edge-y 4.5 × 7.5; corner 4.5 × 3.75. Façade lengths: edge-x 9 m,
	// edge-y 7.5 m, corner 4.5 + 3.75 m. Counts on a 4 × 3 grid of lines.
	want := map[Position]struct {
		count   int
		a, f    float64
		kll     float64
		overall string
	}{
		PosInterior: {2, 67.5, 0, 4, "9 × 7.5"},
		PosEdgeX:    {4, 33.75, 9, 4, "9 × 3.75"},
		PosEdgeY:    {2, 33.75, 7.5, 4, "4.5 × 7.5"},
		PosCorner:   {4, 16.875, 8.25, 4, "4.5 × 3.75"},
	}
	takes := b.Takes()
	if len(takes) != 4 {
		t.Fatalf("%d positions, want 4", len(takes))
	}
	sumA, sumF := 0.0, 0.0
	for _, tk := range takes {
		w := want[tk.Position]
		if tk.Count != w.count || math.Abs(tk.TributaryM2-w.a) > 1e-9 || math.Abs(tk.FacadeM-w.f) > 1e-9 || tk.KLL != w.kll {
			t.Errorf("%s: count %d, area %g m², façade %g m, KLL %g; want %d, %g (%s), %g, %g (ASCE 7-22 Table 4.7-1, from memory)",
				tk.Position, tk.Count, tk.TributaryM2, tk.FacadeM, tk.KLL, w.count, w.a, w.overall, w.f, w.kll)
		}
		sumA += tk.TributarySum
		sumF += tk.FacadeSum
	}
	// The areas tile the plate, 27 m × 15 m; the façade runs round it, 2(27 + 15) m.
	if math.Abs(sumA-405) > 1e-9 || math.Abs(sumF-84) > 1e-9 {
		t.Errorf("areas add to %g m², façade to %g m; want 405 m² and 84 m (by hand)", sumA, sumF)
	}
	if g := b.GrossFloorAreaM2(); math.Abs(g-1620) > 1e-9 {
		t.Errorf("gross floor area %g m², want 4 × 405 = 1620 m² (by hand)", g)
	}
}

func TestBuildingReducedLiveByHand(t *testing.T) {
	s, err := NewSchedule(handScheme(handBuilding()))
	if err != nil {
		t.Fatal(err)
	}
	// ASCE 7-22 Eq. 4.7-1 worked by hand: L = Lo(0.25 + 15/√(KLL·AT)),
	// AT in ft², AT the floors carried × the tributary area, not below
	// 0.40Lo (two or more floors) or 0.50Lo (one floor); the top storey
	// carries the roof only.
	want := map[Position][4]float64{ // kN, storeys 1 to 4
		PosInterior: {199.573, 144.746, 85.575, 0}, // 3 × 2.4 × 67.5 × 0.41064; 2 floors × 0.44675; 1 floor × 0.52824
		PosEdgeX:    {115.956, 85.575, 52.123, 0},  // 243 × 0.47718; 162 × 0.52824; 81 × 0.64350
		PosEdgeY:    {115.956, 85.575, 52.123, 0},  // as edge-x: same area
		PosCorner:   {69.411, 52.123, 32.663, 0},   // 121.5 × 0.57129; 81 × 0.64350; 40.5 × 0.80649
	}
	for _, ps := range s.Positions {
		for k, sl := range ps.Storeys {
			if got := sl.Loads.LiveN / 1e3; math.Abs(got-want[ps.Position][k]) > 0.005 {
				t.Errorf("%s storey %d: L = %.3f kN, want %.3f kN (ASCE 7-22 Eq. 4.7-1 by hand)", ps.Position, k+1, got, want[ps.Position][k])
			}
		}
	}
}

func TestBuildingOverhangKLLByHand(t *testing.T) {
	b := handBuilding()
	b.OverhangMM = 1500
	s, err := NewSchedule(handScheme(b))
	if err != nil {
		t.Fatal(err)
	}
	// With a 1.5 m cantilever slab: edge-x 9 × 5.25 m², KLL 3; edge-y
	// 6 × 7.5 m², KLL 3; corner 6 × 5.25 m², KLL 2 (ASCE 7-22 Table 4.7-1,
	// from memory); ground storey, three floors, Eq. 4.7-1 by hand.
	want := map[Position][2]float64{
		PosEdgeX:  {47.25, 160.476}, // 3 × 2.4 × 47.25 × 0.47171
		PosEdgeY:  {45, 154.608},    // 3 × 2.4 × 45 × 0.47718
		PosCorner: {31.5, 132.126},  // 3 × 2.4 × 31.5 × 0.58256
	}
	for _, ps := range s.Positions {
		w, ok := want[ps.Position]
		if !ok {
			continue
		}
		if math.Abs(ps.TributaryM2-w[0]) > 1e-9 || math.Abs(ps.Storeys[0].Loads.LiveN/1e3-w[1]) > 0.005 {
			t.Errorf("%s: %g m², L %.3f kN; want %g m², %.3f kN (by hand)", ps.Position, ps.TributaryM2, ps.Storeys[0].Loads.LiveN/1e3, w[0], w[1])
		}
	}
}

func TestBuildingEquilibrium(t *testing.T) {
	s, err := NewSchedule(handScheme(handBuilding()))
	if err != nil {
		t.Fatal(err)
	}
	// Loads applied, by hand: three floors of 405 m² at 4 kPa, the roof at
	// 3 kPa, the façade 5 kN/m round 84 m at four levels; live 3 × 2.4 ×
	// 405 unreduced; snow 1.5 × 405.
	const dead = 3*4*405 + 3*405 + 5*84*4.0 // 7755 kN
	const live = 3 * 2.4 * 405              // 2916 kN
	const snow = 1.5 * 405                  // 607.5 kN
	var d, l, sn float64
	for _, ps := range s.Positions {
		c := float64(ps.Count)
		g := &ps.Storeys[0].Loads
		d += c * g.DeadN / 1e3
		l += c * g.LiveRawN / 1e3
		sn += c * g.SnowN / 1e3
	}
	if math.Abs(d-dead) > 1e-6 || math.Abs(l-live) > 1e-6 || math.Abs(sn-snow) > 1e-6 {
		t.Fatalf("at the ground D %.3f, Lo %.3f, S %.3f kN; applied %.3f, %.3f, %.3f kN (by hand)", d, l, sn, dead, live, snow)
	}
	complete := 0
	for fi, tot := range s.Totals {
		if !tot.Complete {
			continue
		}
		complete++
		// Dead load at the ground per family: the storey's load, the columns
		// above the ground group and the ground group's own weight, over
		// every column, equals the applied dead load plus the weight of
		// every column in the building.
		got := 0.0
		for _, ps := range s.Positions {
			e := ps.Best[fi][0]
			m := e.Model
			own := m.SelfWeightN(m.Families[0].Static(e.Index), ps.Storeys[0].LengthMM)
			got += float64(ps.Count) * (ps.Storeys[0].Loads.DeadN + e.AboveN + own)
		}
		wantN := dead*1e3 + s.ColumnWeightN(fi)
		if math.Abs(got-wantN) > 1e-6*wantN {
			t.Errorf("%s: dead load at the ground %.3f kN, applied plus column weight %.3f kN", tot.Name, got/1e3, wantN/1e3)
		}
	}
	if complete < 5 {
		t.Errorf("only %d families complete the 4-storey building", complete)
	}
}

func TestBuildingScheduleRules(t *testing.T) {
	s, err := NewSchedule(handScheme(handBuilding()))
	if err != nil {
		t.Fatal(err)
	}
	for fi, f := range s.Base.Families {
		for _, ps := range s.Positions {
			st := ps.Best[fi]
			for k := 1; k < len(st); k++ {
				lo, up := st[k-1], st[k]
				if up.Index < 0 || lo.Index < 0 {
					continue
				}
				if !noSmaller(f.Static(lo.Index), f.Static(up.Index)) {
					t.Errorf("%s %s: storey %d (%s) grows above storey %d (%s)", f.Name(), ps.Position, k+1, f.Static(up.Index).Designation, k, f.Static(lo.Index).Designation)
				}
				// ChangeEvery 2: storeys 1–2 and 3–4 keep one size.
				if k%2 == 1 && lo.Index != up.Index {
					t.Errorf("%s %s: size changes at storey %d, allowed only at 1, 3", f.Name(), ps.Position, k+1)
				}
				if !up.Row.OK || !lo.Row.OK {
					t.Errorf("%s %s: a scheduled size does not work", f.Name(), ps.Position)
				}
			}
		}
	}
	// The interior column carries more than the corner one: no lighter at the ground.
	var in, co *PositionSchedule
	for i := range s.Positions {
		switch s.Positions[i].Position {
		case PosInterior:
			in = &s.Positions[i]
		case PosCorner:
			co = &s.Positions[i]
		}
	}
	for fi := range s.Base.Families {
		a, c := in.Best[fi][0], co.Best[fi][0]
		if a.Index >= 0 && c.Index >= 0 && s.Base.scores[fi][a.Index] < s.Base.scores[fi][c.Index] {
			t.Errorf("%s: interior ground column lighter than the corner one", s.Base.Families[fi].Name())
		}
	}
}

func TestBuildingBadInput(t *testing.T) {
	rows := []struct {
		name  string
		edit  func(b *Building)
		field string
	}{
		{"empty bays", func(b *Building) { b.BaysXMM = nil }, "bays-x"},
		{"zero span", func(b *Building) { b.BaysYMM = []float64{7500, 0} }, "bays-y"},
		{"negative storey", func(b *Building) { b.StoreysMM = []float64{-3600} }, "storeys"},
		{"61 storeys", func(b *Building) { b.StoreysMM = make([]float64, 61) }, "storeys"},
		{"41 bays", func(b *Building) {
			b.BaysXMM = make([]float64, 41)
			for i := range b.BaysXMM {
				b.BaysXMM[i] = 6000
			}
		}, "bays-x"},
		{"N of 0", func(b *Building) { b.ChangeEvery = 0 }, "change-every"},
		{"NaN façade", func(b *Building) { b.FacadeKNPerM = math.NaN() }, "facade"},
		{"negative dead", func(b *Building) { b.FloorDeadKPa = -1 }, "dead"},
	}
	for _, r := range rows {
		b := handBuilding()
		r.edit(&b)
		err := b.Validate()
		var fe *FieldError
		if !errors.As(err, &fe) || fe.Field != r.field {
			t.Errorf("%s: %v, want a message naming %s", r.name, err, r.field)
			continue
		}
		if !strings.Contains(fe.Accepted, "from") {
			t.Errorf("%s: %q does not state the range", r.name, fe.Accepted)
		}
		if _, err := NewSchedule(handScheme(b)); err == nil {
			t.Errorf("%s: the schedule accepted it", r.name)
		}
	}
}

// BenchmarkBuilding8x6x10 sizes an 8 × 6-bay, ten-storey building with
// every material (target: at most 50 ms).
func BenchmarkBuilding8x6x10(b *testing.B) {
	bl := handBuilding()
	bl.BaysXMM = []float64{8000, 8000, 8000, 8000, 8000, 8000, 8000, 8000}
	bl.BaysYMM = []float64{7000, 7000, 7000, 7000, 7000, 7000}
	bl.StoreysMM = []float64{4500, 3600, 3600, 3600, 3600, 3600, 3600, 3600, 3600, 3600}
	sc := handScheme(bl)
	if _, err := NewSchedule(sc); err != nil {
		b.Fatal(err)
	}
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		if _, err := NewSchedule(sc); err != nil {
			b.Fatal(err)
		}
	}
}
