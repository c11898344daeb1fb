package plots

import (
	"io"

	"upright/plots/dxf"
)

// DXF layers of the floor plan.
const (
	DXFLayerGrid    = "GRID"    // grid lines and their bubbles
	DXFLayerSlab    = "SLAB"    // the slab edge
	DXFLayerColumns = "COLUMNS" // one closed outline per column
	DXFLayerLabels  = "LABELS"  // grid names, column sizes, note and caution
)

// DXF returns the floor plan as a DXF drawing in millimetres: the grid
// lines with named bubbles, the slab edge, one closed outline per column
// and each column's label beside it, with the note and caution under the plan.
func (p *FloorPlan) DXF() (*dxf.Drawing, error) {
	if err := p.Validate(); err != nil {
		return nil, err
	}
	d := dxf.New()
	d.AddLayer(dxf.Layer{Name: DXFLayerGrid, Color: 8, Linetype: "DASHDOT"})
	d.AddLayer(dxf.Layer{Name: DXFLayerSlab, Color: 7})
	d.AddLayer(dxf.Layer{Name: DXFLayerColumns, Color: 1})
	d.AddLayer(dxf.Layer{Name: DXFLayerLabels, Color: 7})
	x0, y0, x1, y1 := p.SlabMM[0], p.SlabMM[1], p.SlabMM[2], p.SlabMM[3]
	const bubble = 400.0 // mm radius of a grid bubble
	const ext = 1200.0   // grid lines run past the slab
	const textH = 250.0  // mm
	for k, x := range p.XLinesMM {
		d.Line(DXFLayerGrid, x, y0-ext, x, y1+ext)
		if k < len(p.XLabels) {
			d.Circle(DXFLayerGrid, x, y1+ext+bubble, bubble)
			d.Text(DXFLayerLabels, x, y1+ext+bubble, textH*1.2, p.XLabels[k], dxf.Center)
		}
	}
	for k, y := range p.YLinesMM {
		d.Line(DXFLayerGrid, x0-ext, y, x1+ext, y)
		if k < len(p.YLabels) {
			d.Circle(DXFLayerGrid, x0-ext-bubble, y, bubble)
			d.Text(DXFLayerLabels, x0-ext-bubble, y, textH*1.2, p.YLabels[k], dxf.Center)
		}
	}
	d.Polyline(DXFLayerSlab, [][2]float64{{x0, y0}, {x1, y0}, {x1, y1}, {x0, y1}}, true)
	for _, c := range p.Columns {
		pts := make([][2]float64, len(c.Outline))
		maxX := 0.0
		for k, q := range c.Outline {
			pts[k] = [2]float64{c.XMM + q.X, c.YMM + q.Y}
			maxX = max(maxX, q.X)
		}
		d.Polyline(DXFLayerColumns, pts, true)
		if c.Label != "" {
			d.Text(DXFLayerLabels, c.XMM+maxX+100, c.YMM+100, textH*0.6, c.Label, dxf.Left)
		}
	}
	y := y0 - ext - 2*bubble - textH
	if p.Title != "" {
		d.Text(DXFLayerLabels, x0, y1+ext+3*bubble+textH, textH*1.6, p.Title, dxf.Left)
	}
	for _, l := range append(append([]string{}, p.Legend...), p.Note, p.Caution) {
		if l == "" {
			continue
		}
		d.Text(DXFLayerLabels, x0, y, textH, l, dxf.Left)
		y -= textH * 1.6
	}
	return d, nil
}

// WriteFloorPlanDXF validates the plan and writes it to w as DXF.
func WriteFloorPlanDXF(w io.Writer, p *FloorPlan) error {
	if p == nil {
		return ErrNoChart
	}
	d, err := p.DXF()
	if err != nil {
		return err
	}
	return d.Write(w)
}

// SaveFloorPlanDXF writes the plan to path as DXF.
func SaveFloorPlanDXF(path string, p *FloorPlan) error {
	if p == nil {
		return ErrNoChart
	}
	d, err := p.DXF()
	if err != nil {
		return err
	}
	return saveFile(path, d.Write)
}
