package plots

import (
	"fmt"
	"math"
	"strings"
)

// PartKind says what a part of a plan section is, which fixes how it is drawn.
type PartKind int

// The parts of a plan section.
const (
	// PartBody is the structural material (steel, gross concrete, wood), filled.
	PartBody PartKind = iota
	// PartFill is the infill of a filled tube, filled in a concrete tint.
	PartFill
	// PartChar is the layer a fire chars away, filled dark over the body.
	PartChar
	// PartBar is a reinforcing bar, filled dark.
	PartBar
	// PartTie is a tie or spiral centreline, each loop stroked as a closed line.
	PartTie
)

// PlanPart is one drawn part of a plan section: loops of points in mm from
// the section's centre, y up. A filled part's first loop is its outline and
// any further loops are holes.
type PlanPart struct {
	Kind  PartKind
	Loops [][]Point
	// LineMM is the drawn line width of a PartTie, mm at scale (never thinner than a hairline).
	LineMM float64
}

// PlanSection is one candidate drawn in plan.
type PlanSection struct {
	// Group chooses the colours, e.g. "steel", "concrete", "timber"; others get the neutral colours.
	Group string
	// Title is the size, drawn in bold under the section.
	Title string
	// Lines are further labels under the title (plan dimensions, weight).
	Lines []string
	// WidthMM and DepthMM are the bare section's plan size.
	WidthMM, DepthMM float64
	// ProtectionMM is the thickness of a board enclosure drawn around the
	// section's bounding box; 0 draws none.
	ProtectionMM float64
	// Parts are drawn in order: body, fill, char, ties, bars.
	Parts []PlanPart
	// Selected draws a highlight behind the section and its labels.
	Selected bool
}

// PlanSheet is the plan-sections figure: sections side by side at one scale.
type PlanSheet struct {
	// Title is drawn above the sections; empty draws none.
	Title string
	// Sections are drawn left to right, wrapping onto more rows when that allows a larger scale.
	Sections []PlanSection
	// ReferenceMM is the side of the reference square drawn first, e.g. 300
	// (or 304.8 for one foot); 0 draws none.
	ReferenceMM float64
	// ReferenceLabel names the reference square, e.g. "300 mm square".
	ReferenceLabel string
	// ScaleBarMM is the length of the scale bar; 0 draws none.
	ScaleBarMM float64
	// ScaleBarDivisions splits the bar into alternating dark and light parts (1 to 12).
	ScaleBarDivisions int
	// ScaleBarLabel is written at the bar's end, e.g. "300 mm" or "1 ft".
	ScaleBarLabel string
	// Note is a line of small text under the sections (what the drawing shows); empty draws none.
	Note string
	// Caution is drawn along the bottom edge; empty draws none.
	Caution string
	// Empty is shown instead of the sections when there are none.
	Empty string
	// Rows, when set, fixes the rows: how many slots each row holds, in
	// order (the reference square, when drawn, is the first slot), all at
	// the one scale. Nil, or counts that do not add up to the slots, lets
	// the layout choose.
	Rows []int
	// RowLabels, with Rows, names each row; they are drawn at the left of
	// the rows, which move right to make room.
	RowLabels []string
}

// Validate checks the sheet's numbers: every size positive and finite,
// every point finite, protection not negative.
func (s *PlanSheet) Validate() error {
	if s == nil {
		return ErrNoChart
	}
	chk := func(name string, v float64, zeroOK bool) error {
		if notFinite(v) || v < 0 || (!zeroOK && v == 0) {
			return fmt.Errorf("%s %v mm (accepted a finite size above 0): %w", name, v, ErrBadSize)
		}
		return nil
	}
	if err := chk("reference square", s.ReferenceMM, true); err != nil {
		return err
	}
	if err := chk("scale bar", s.ScaleBarMM, true); err != nil {
		return err
	}
	if s.ScaleBarMM > 0 && (s.ScaleBarDivisions < 1 || s.ScaleBarDivisions > 12) {
		return fmt.Errorf("scale bar divisions %d (accepted 1 to 12): %w", s.ScaleBarDivisions, ErrBadSize)
	}
	for i := range s.Sections {
		sec := &s.Sections[i]
		name := fmt.Sprintf("section %d (%s)", i+1, sec.Title)
		if err := chk(name+" width", sec.WidthMM, false); err != nil {
			return err
		}
		if err := chk(name+" depth", sec.DepthMM, false); err != nil {
			return err
		}
		if err := chk(name+" protection", sec.ProtectionMM, true); err != nil {
			return err
		}
		for _, p := range sec.Parts {
			if notFinite(p.LineMM) || p.LineMM < 0 {
				return fmt.Errorf("%s line width %v mm: %w", name, p.LineMM, ErrNotFinite)
			}
			for _, l := range p.Loops {
				for _, pt := range l {
					if notFinite(pt.X) || notFinite(pt.Y) {
						return fmt.Errorf("%s point (%v, %v): %w", name, pt.X, pt.Y, ErrNotFinite)
					}
				}
			}
		}
	}
	return nil
}

// PlanBox is where one section lies in a drawn sheet, in pixels from the
// image's top-left corner.
type PlanBox struct {
	// X, Y, W and H bound the drawn section, its protection included.
	X, Y, W, H float64
	// Slot bounds the section with its labels (for picking by pointer).
	SlotX, SlotY, SlotW, SlotH float64
}

// Contains reports whether the pixel (x, y) lies in the box's slot.
func (b PlanBox) Contains(x, y float64) bool {
	return x >= b.SlotX && x <= b.SlotX+b.SlotW && y >= b.SlotY && y <= b.SlotY+b.SlotH
}

// PlanLayout is where a sheet's sections were drawn.
type PlanLayout struct {
	// PxPerMM is the common scale, pixels per millimetre.
	PxPerMM float64
	// Sections holds one box per PlanSheet section, in order.
	Sections []PlanBox
	// Reference is the reference square's box (zero when none).
	Reference PlanBox
	// Labels holds, per section, the lines of text drawn under it (size
	// first); filled by WritePlan and SavePlan.
	Labels [][]string
	// Polygons holds, per section, its body and fill parts in pixels
	// (top-left origin) exactly as drawn; filled only when asked for.
	Polygons [][]PlanPolygon
}

// PlanPolygon is one filled part as drawn, in pixels: its outline first, then its holes.
type PlanPolygon struct {
	Kind  PartKind
	Loops [][]Point
}

// Area returns the part's drawn area in square pixels: the outline less the holes.
func (g PlanPolygon) Area() float64 {
	a := 0.0
	for k, l := range g.Loops {
		if k == 0 {
			a += PolygonArea(l)
		} else {
			a -= PolygonArea(l)
		}
	}
	return a
}

// Pick returns the index of the section whose slot holds the pixel (x, y), or −1.
func (l *PlanLayout) Pick(x, y float64) int {
	for i, b := range l.Sections {
		if b.Contains(x, y) {
			return i
		}
	}
	return -1
}

// PolygonArea returns the area enclosed by a loop (shoelace formula), in the
// square of its units, whatever its direction.
func PolygonArea(l []Point) float64 {
	a := 0.0
	for i := range l {
		j := (i + 1) % len(l)
		a += l[i].X*l[j].Y - l[j].X*l[i].Y
	}
	return math.Abs(a / 2)
}

// signedArea is twice the signed shoelace area: positive counter-clockwise (y up).
func signedArea(l []Point) float64 {
	a := 0.0
	for i := range l {
		j := (i + 1) % len(l)
		a += l[i].X*l[j].Y - l[j].X*l[i].Y
	}
	return a
}

// trimLines drops empty label lines.
func trimLines(ls []string) []string {
	out := ls[:0:0]
	for _, l := range ls {
		if strings.TrimSpace(l) != "" {
			out = append(out, l)
		}
	}
	return out
}
