package plots

import (
	"errors"
	"fmt"
)

// ErrBadMap reports map data whose cells do not match its axes or keys.
var ErrBadMap = errors.New("plots: map cells do not match its axes or keys")

// ErrNoMap reports a nil *Map handed to a drawing function.
var ErrNoMap = errors.New("plots: no map given (nil *Map)")

// MapKey is one family that wins somewhere on a map.
type MapKey struct {
	// Label names the family in the legend and on its region.
	Label string
	// Group chooses the colour family, e.g. "steel", "concrete" or "timber".
	Group string
}

// Map walls: bits of Map.Walls.
const (
	// WallRight marks a boundary between a cell and its right neighbour.
	WallRight uint8 = 1 << iota
	// WallUp marks a boundary between a cell and the neighbour above.
	WallUp
)

// Map is a grid coloured by the winning family at each cell.
type Map struct {
	// Title is drawn above the map; empty draws none.
	Title string
	// XLabel and YLabel name the axes with their units.
	XLabel, YLabel string
	// YShort, when set, names the y axis where the map is too short for
	// YLabel along its height (e.g. "Load (kip)").
	YShort string
	// X and Y are the cell centres in display units, each increasing, at least two.
	X, Y []float64
	// Cells[i*len(X)+j] is the key of row i (Y[i]) and column j (X[j]), or -1 where nothing works.
	Cells []int
	// Walls, when not nil, holds per cell the WallRight and WallUp bits of the
	// boundaries to draw; nil draws one wherever neighbouring cells differ.
	Walls []uint8
	// Ties, when not nil, marks per cell a near-tie: the cell keeps a family
	// that another one beats by no more than the tie tolerance. Each marked
	// cell gets a small dot.
	Ties []bool
	// TieLabel names the dots in the legend; empty means "Near-tie".
	TieLabel string
	// Keys are the families the cells refer to, in legend order.
	Keys []MapKey
	// Heading is the legend heading, e.g. "Lightest family"; empty for none.
	Heading string
	// NoneLabel names the cells where nothing works; empty means "Nothing works".
	NoneLabel string
	// Point marks the scheme's own length and load; nil draws none.
	Point *Point
	// PointLabel names the point in the legend; empty means "This scheme".
	PointLabel string
	// Caution is drawn under the map; empty draws none.
	Caution string
}

// Validate reports the first problem in the map data: a NaN/Inf or
// non-increasing axis, a cell count or key index that does not fit, or a
// NaN/Inf point.
func (m *Map) Validate() error {
	for _, ax := range []struct {
		name string
		v    []float64
	}{{"map X", m.X}, {"map Y", m.Y}} {
		if len(ax.v) < 2 {
			return fmt.Errorf("%s has %d values (need at least 2): %w", ax.name, len(ax.v), ErrBadMap)
		}
		for i, v := range ax.v {
			if err := finite(fmt.Sprintf("%s[%d]", ax.name, i), v); err != nil {
				return err
			}
			if i > 0 && !(v > ax.v[i-1]) {
				return fmt.Errorf("%s[%d] = %g after %g: %w", ax.name, i, v, ax.v[i-1], ErrNotIncreasing)
			}
		}
	}
	n := len(m.X) * len(m.Y)
	if len(m.Cells) != n {
		return fmt.Errorf("map has %d cells for %d × %d: %w", len(m.Cells), len(m.X), len(m.Y), ErrBadMap)
	}
	if m.Walls != nil && len(m.Walls) != n {
		return fmt.Errorf("map has %d walls for %d cells: %w", len(m.Walls), n, ErrBadMap)
	}
	if m.Ties != nil && len(m.Ties) != n {
		return fmt.Errorf("map has %d near-tie marks for %d cells: %w", len(m.Ties), n, ErrBadMap)
	}
	for k, c := range m.Cells {
		if c < -1 || c >= len(m.Keys) {
			return fmt.Errorf("map cell %d refers to key %d of %d: %w", k, c, len(m.Keys), ErrBadMap)
		}
	}
	if m.Point != nil {
		if err := finite("map point X", m.Point.X); err != nil {
			return err
		}
		if err := finite("map point Y", m.Point.Y); err != nil {
			return err
		}
	}
	return nil
}

// wall reports whether a boundary lies between cell k and its neighbour k2
// in direction bit (WallRight or WallUp).
func (m *Map) wall(k, k2 int, bit uint8) bool {
	if m.Walls != nil {
		return m.Walls[k]&bit != 0
	}
	return m.Cells[k] != m.Cells[k2]
}

// hasTies reports whether any cell is marked as a near-tie.
func (m *Map) hasTies() bool {
	for _, t := range m.Ties {
		if t {
			return true
		}
	}
	return false
}
