// Package dxf writes two-dimensional drawings as DXF files of release 12
// (AC1009), the plain subset every CAD program reads: layers, lines, closed
// polylines, circles and text, in drawing units declared as millimetres.
//
// The format is group-code/value pairs, one per line; the sections written
// are HEADER, TABLES (line types and layers) and ENTITIES, closed by EOF.
package dxf

import (
	"bufio"
	"errors"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"
)

// ErrNotFinite reports a coordinate that is NaN or infinite.
var ErrNotFinite = errors.New("dxf: coordinate is not a finite number")

// ErrNoLayer reports an entity on a layer that was not added.
var ErrNoLayer = errors.New("dxf: entity on a layer that was not added")

// Layer is one drawing layer.
type Layer struct {
	Name     string // letters, digits, '-' and '_'
	Color    int    // AutoCAD colour index 1 to 255
	Linetype string // "CONTINUOUS" or "DASHDOT"
}

// entity is one drawing element, written by its own function.
type entity struct {
	layer string
	write func(w *pairs)
	pts   []float64 // every coordinate, for the finiteness check and the extents
}

// Drawing is a DXF drawing being assembled; its zero value is not ready:
// use New.
type Drawing struct {
	layers []Layer
	ents   []entity
}

// New returns an empty drawing with layer "0".
func New() *Drawing {
	return &Drawing{layers: []Layer{{Name: "0", Color: 7, Linetype: "CONTINUOUS"}}}
}

// AddLayer adds a layer; a layer of the same name is replaced.
func (d *Drawing) AddLayer(l Layer) {
	for i := range d.layers {
		if d.layers[i].Name == l.Name {
			d.layers[i] = l
			return
		}
	}
	d.layers = append(d.layers, l)
}

// Line adds a straight line from (x1, y1) to (x2, y2).
func (d *Drawing) Line(layer string, x1, y1, x2, y2 float64) {
	d.ents = append(d.ents, entity{layer: layer, pts: []float64{x1, y1, x2, y2}, write: func(w *pairs) {
		w.s(0, "LINE")
		w.s(8, layer)
		w.f(10, x1)
		w.f(20, y1)
		w.f(30, 0)
		w.f(11, x2)
		w.f(21, y2)
		w.f(31, 0)
	}})
}

// Polyline adds a polyline through the points; closed joins the last to the first.
func (d *Drawing) Polyline(layer string, pts [][2]float64, closed bool) {
	flat := make([]float64, 0, 2*len(pts))
	for _, p := range pts {
		flat = append(flat, p[0], p[1])
	}
	d.ents = append(d.ents, entity{layer: layer, pts: flat, write: func(w *pairs) {
		w.s(0, "POLYLINE")
		w.s(8, layer)
		w.i(66, 1) // vertices follow
		w.f(10, 0)
		w.f(20, 0)
		w.f(30, 0)
		flag := 0
		if closed {
			flag = 1
		}
		w.i(70, flag)
		for _, p := range pts {
			w.s(0, "VERTEX")
			w.s(8, layer)
			w.f(10, p[0])
			w.f(20, p[1])
			w.f(30, 0)
		}
		w.s(0, "SEQEND")
		w.s(8, layer)
	}})
}

// Circle adds a circle of radius r about (x, y).
func (d *Drawing) Circle(layer string, x, y, r float64) {
	d.ents = append(d.ents, entity{layer: layer, pts: []float64{x - r, y - r, x + r, y + r}, write: func(w *pairs) {
		w.s(0, "CIRCLE")
		w.s(8, layer)
		w.f(10, x)
		w.f(20, y)
		w.f(30, 0)
		w.f(40, r)
	}})
}

// Align is where a text's insertion point lies on it.
type Align int

// Text alignments.
const (
	Left   Align = iota // baseline, left end
	Center              // middle of the text, both ways
)

// Text adds one line of text of the given height at (x, y).
func (d *Drawing) Text(layer string, x, y, height float64, s string, a Align) {
	s = encode(s)
	d.ents = append(d.ents, entity{layer: layer, pts: []float64{x, y, height}, write: func(w *pairs) {
		w.s(0, "TEXT")
		w.s(8, layer)
		w.f(10, x)
		w.f(20, y)
		w.f(30, 0)
		w.f(40, height)
		w.s(1, s)
		if a == Center {
			w.i(72, 1) // horizontal centre
			w.f(11, x)
			w.f(21, y)
			w.f(31, 0)
			w.i(73, 2) // vertical middle
		}
	}})
}

// encode keeps ASCII text and writes any other character as \U+XXXX, the
// escape CAD programs read in release-12 text; line breaks become spaces.
func encode(s string) string {
	var b strings.Builder
	for _, r := range s {
		switch {
		case r == '\n' || r == '\r':
			b.WriteByte(' ')
		case r < 0x20:
		case r < 0x80:
			b.WriteRune(r)
		case r <= 0xFFFF:
			fmt.Fprintf(&b, "\\U+%04X", r)
		default:
			b.WriteByte('?')
		}
	}
	return b.String()
}

// pairs writes group-code/value pairs and keeps the first error.
type pairs struct {
	w   *bufio.Writer
	err error
}

func (p *pairs) s(code int, v string) {
	if p.err != nil {
		return
	}
	_, p.err = fmt.Fprintf(p.w, "%3d\r\n%s\r\n", code, v)
}

func (p *pairs) i(code, v int) { p.s(code, strconv.Itoa(v)) }

func (p *pairs) f(code int, v float64) {
	p.s(code, strconv.FormatFloat(v, 'f', -1, 64))
}

// Write writes the drawing to w: it checks that every coordinate is finite
// and every entity's layer was added, then writes the header (release 12,
// millimetres), the line-type and layer tables and the entities.
func (d *Drawing) Write(w io.Writer) error {
	known := map[string]bool{}
	for _, l := range d.layers {
		known[l.Name] = true
	}
	minX, minY, maxX, maxY := math.Inf(1), math.Inf(1), math.Inf(-1), math.Inf(-1)
	for _, e := range d.ents {
		if !known[e.layer] {
			return fmt.Errorf("%w: %q", ErrNoLayer, e.layer)
		}
		for k, v := range e.pts {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				return ErrNotFinite
			}
			if k%2 == 0 {
				minX, maxX = math.Min(minX, v), math.Max(maxX, v)
			} else {
				minY, maxY = math.Min(minY, v), math.Max(maxY, v)
			}
		}
	}
	if len(d.ents) == 0 {
		minX, minY, maxX, maxY = 0, 0, 0, 0
	}
	p := &pairs{w: bufio.NewWriter(w)}
	p.s(0, "SECTION")
	p.s(2, "HEADER")
	p.s(9, "$ACADVER")
	p.s(1, "AC1009")
	p.s(9, "$INSBASE")
	p.f(10, 0)
	p.f(20, 0)
	p.f(30, 0)
	p.s(9, "$EXTMIN")
	p.f(10, minX)
	p.f(20, minY)
	p.f(30, 0)
	p.s(9, "$EXTMAX")
	p.f(10, maxX)
	p.f(20, maxY)
	p.f(30, 0)
	p.s(9, "$MEASUREMENT") // metric
	p.i(70, 1)
	p.s(9, "$INSUNITS") // millimetres
	p.i(70, 4)
	p.s(0, "ENDSEC")

	p.s(0, "SECTION")
	p.s(2, "TABLES")
	p.s(0, "TABLE")
	p.s(2, "LTYPE")
	p.i(70, 2)
	ltype := func(name, desc string, dashes []float64) {
		p.s(0, "LTYPE")
		p.s(2, name)
		p.i(70, 0)
		p.s(3, desc)
		p.i(72, 65)
		p.i(73, len(dashes))
		total := 0.0
		for _, x := range dashes {
			total += math.Abs(x)
		}
		p.f(40, total)
		for _, x := range dashes {
			p.f(49, x)
		}
	}
	ltype("CONTINUOUS", "Solid line", nil)
	ltype("DASHDOT", "Dash dot __ . __ . __", []float64{600, -150, 0, -150})
	p.s(0, "ENDTAB")
	p.s(0, "TABLE")
	p.s(2, "LAYER")
	p.i(70, len(d.layers))
	for _, l := range d.layers {
		lt := l.Linetype
		if lt == "" {
			lt = "CONTINUOUS"
		}
		c := l.Color
		if c < 1 || c > 255 {
			c = 7
		}
		p.s(0, "LAYER")
		p.s(2, l.Name)
		p.i(70, 0)
		p.i(62, c)
		p.s(6, lt)
	}
	p.s(0, "ENDTAB")
	p.s(0, "ENDSEC")

	p.s(0, "SECTION")
	p.s(2, "ENTITIES")
	for _, e := range d.ents {
		e.write(p)
	}
	p.s(0, "ENDSEC")
	p.s(0, "EOF")
	if p.err != nil {
		return fmt.Errorf("dxf: %w", p.err)
	}
	if err := p.w.Flush(); err != nil {
		return fmt.Errorf("dxf: %w", err)
	}
	return nil
}
