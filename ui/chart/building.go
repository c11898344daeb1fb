package chart

import (
	"fmt"
	"strings"

	"upright/plots"
	"upright/ui/model"
	"upright/ui/units"
)

// PlanFamily returns the family a building's floor plan draws: the one
// named by the building's PlanFamily, else the best over the whole
// building, else the first family; -1 when the schedule has none.
func PlanFamily(s *model.Schedule) int {
	if len(s.Base.Families) == 0 {
		return -1
	}
	if name := s.Building.PlanFamily; name != "" {
		for fi, f := range s.Base.Families {
			if strings.EqualFold(f.Name(), name) {
				return fi
			}
		}
	}
	if b := s.Best(); b >= 0 {
		return b
	}
	return 0
}

// PlanStorey returns the storey a building's floor plan shows, 1 the ground.
func PlanStorey(s *model.Schedule) int {
	if k := s.Building.PlanStorey; k >= 1 && k <= len(s.Building.StoreysMM) {
		return k
	}
	return 1
}

// gridName names grid line k along y: A to Z, then AA, AB and so on.
func gridName(k int) string {
	name := ""
	for k >= 0 {
		name = string(rune('A'+k%26)) + name
		k = k/26 - 1
	}
	return name
}

// columnOutline is a column's plan outline about its centre, mm: the
// enclosure's box when it is boarded, the body's outer loop otherwise, the
// footprint's rectangle when the family gives no geometry.
func columnOutline(f model.Family, i int, s model.Setting) []plots.Point {
	st := f.Static(i)
	rect := func(w, d float64) []plots.Point {
		return []plots.Point{{X: -w / 2, Y: -d / 2}, {X: w / 2, Y: -d / 2}, {X: w / 2, Y: d / 2}, {X: -w / 2, Y: d / 2}}
	}
	o, ok := model.OutlineOf(f, i, s)
	switch {
	case ok && o.ProtectionMM > 0:
		return rect(o.WidthMM+2*o.ProtectionMM, o.DepthMM+2*o.ProtectionMM)
	case ok && len(o.Body) > 0 && len(o.Body[0].Outer) >= 3:
		return points(o.Body[0].Outer)
	}
	return rect(st.FootprintMM[0], st.FootprintMM[1])
}

// FloorPlan draws storey k (1 the ground) of a building with family fi's
// columns to scale, each labelled with its size.
func FloorPlan(s *model.Schedule, fi, k int) plots.FloorPlan {
	b := &s.Building
	sys := units.System(s.Base.Scheme.Units)
	f := s.Base.Families[fi]
	p := plots.FloorPlan{Caution: model.Caution}
	x := 0.0
	for i := 0; i <= len(b.BaysXMM); i++ {
		p.XLinesMM = append(p.XLinesMM, x)
		p.XLabels = append(p.XLabels, fmt.Sprint(i+1))
		if i < len(b.BaysXMM) {
			x += b.BaysXMM[i]
		}
	}
	y := 0.0
	for j := 0; j <= len(b.BaysYMM); j++ {
		p.YLinesMM = append(p.YLinesMM, y)
		p.YLabels = append(p.YLabels, gridName(j))
		if j < len(b.BaysYMM) {
			y += b.BaysYMM[j]
		}
	}
	p.SlabMM = [4]float64{-b.OverhangMM, -b.OverhangMM, x + b.OverhangMM, y + b.OverhangMM}
	storey := "ground storey"
	if k > 1 {
		storey = fmt.Sprintf("storey %d", k)
	}
	p.Title = fmt.Sprintf("Floor plan, %s: %s %s columns (%s)", storey, f.Name(), f.Material(), b.String())
	byPos := map[model.Position]*model.StackEntry{}
	for pi := range s.Positions {
		ps := &s.Positions[pi]
		e := &ps.Best[fi][k-1]
		byPos[ps.Position] = e
		what := "no size works"
		if e.Index >= 0 {
			st := f.Static(e.Index)
			what = fmt.Sprintf("%s, %s", st.Designation, units.PlanSize(st.FootprintMM, sys))
		}
		p.Legend = append(p.Legend, fmt.Sprintf("%s (%d): %s", ps.Position, ps.Count, what))
	}
	nx, ny := len(b.BaysXMM), len(b.BaysYMM)
	for i := 0; i <= nx; i++ {
		for j := 0; j <= ny; j++ {
			e := byPos[model.PositionOf(i, j, nx, ny)]
			if e == nil || e.Index < 0 {
				continue
			}
			p.Columns = append(p.Columns, plots.PlanColumn{
				XMM: p.XLinesMM[i], YMM: p.YLinesMM[j], Group: f.Material(),
				Outline: columnOutline(f, e.Index, e.Model.Scheme.Setting),
				Label:   f.Static(e.Index).Designation,
			})
		}
	}
	p.Note = "Columns drawn to scale at the grid intersections" + protectionWords(s) + "; each position sized for its largest tributary area."
	return p
}

// protectionWords says whether the outlines include fire protection.
func protectionWords(s *model.Schedule) string {
	if h := s.Base.Scheme.Fire.Hours(); h > 0 {
		return fmt.Sprintf(", with their protection for the %g h rating", h)
	}
	return ""
}

// Elevation draws each position's stack of family fi from the ground up,
// each run of one size as wide as the column, with its size beside it.
func Elevation(s *model.Schedule, fi int) plots.Elevation {
	b := &s.Building
	f := s.Base.Families[fi]
	e := plots.Elevation{StoreysMM: append([]float64(nil), b.StoreysMM...), Caution: model.Caution,
		Title: fmt.Sprintf("Column stacks: %s %s, sizes changing every %d storeys at most", f.Name(), f.Material(), b.ChangeEvery)}
	for pi := range s.Positions {
		ps := &s.Positions[pi]
		st := plots.ElevationStack{Name: fmt.Sprintf("%s (%d)", ps.Position, ps.Count), Group: f.Material()}
		stack := ps.Best[fi]
		for k := 0; k < len(stack); {
			j := k
			for j+1 < len(stack) && stack[j+1].Index == stack[k].Index {
				j++
			}
			piece := plots.ElevationPiece{From: k + 1, To: j + 1, Label: "no size works"}
			if i := stack[k].Index; i >= 0 {
				sa := f.Static(i)
				piece.WidthMM = sa.FootprintMM[0]
				piece.Label = sa.Designation
			}
			st.Pieces = append(st.Pieces, piece)
			k = j + 1
		}
		e.Stacks = append(e.Stacks, st)
	}
	e.Note = "Heights to scale; column widths to one larger scale of their own so the size changes show. A bar marks each splice."
	return e
}
