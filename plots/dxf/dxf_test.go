package dxf

import (
	"bytes"
	"errors"
	"math"
	"strings"
	"testing"
)

func TestWriteStructure(t *testing.T) {
	d := New()
	d.AddLayer(Layer{Name: "COLUMNS", Color: 1})
	d.Polyline("COLUMNS", [][2]float64{{0, 0}, {300, 0}, {300, 300}, {0, 300}}, true)
	d.Text("COLUMNS", 0, -200, 100, "W10X45 × 2", Left)
	var b bytes.Buffer
	if err := d.Write(&b); err != nil {
		t.Fatal(err)
	}
	s := b.String()
	// Release 12 (AC1009) structure, common practice for a minimal DXF:
	// the sections in order and EOF last, a closed polyline (flag 1) with
	// its vertices and SEQEND, millimetres ($INSUNITS 4).
	for _, want := range []string{"AC1009", "$INSUNITS\r\n 70\r\n4", "POLYLINE", " 70\r\n1\r\n", "SEQEND", "\\U+00D7"} {
		if !strings.Contains(s, want) {
			t.Errorf("missing %q", want)
		}
	}
	if strings.Count(s, "VERTEX") != 4 {
		t.Errorf("%d vertices, want 4", strings.Count(s, "VERTEX"))
	}
	if !strings.HasSuffix(s, "  0\r\nEOF\r\n") {
		t.Errorf("does not end with EOF")
	}
	if i, j, k := strings.Index(s, "HEADER"), strings.Index(s, "TABLES"), strings.Index(s, "ENTITIES"); !(i < j && j < k) {
		t.Errorf("sections out of order: %d %d %d", i, j, k)
	}
}

func TestWriteRefuses(t *testing.T) {
	d := New()
	d.Line("NOPE", 0, 0, 1, 1)
	if err := d.Write(&bytes.Buffer{}); !errors.Is(err, ErrNoLayer) {
		t.Errorf("unknown layer: %v", err)
	}
	d = New()
	d.Circle("0", math.NaN(), 0, 1)
	if err := d.Write(&bytes.Buffer{}); !errors.Is(err, ErrNotFinite) {
		t.Errorf("NaN: %v", err)
	}
}
