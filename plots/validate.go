package plots

import (
	"fmt"
	"math"
)

// NewSeries returns a checked Series; it rejects NaN/Inf coordinates and unsorted X.
func NewSeries(label, group string, pts []Point, pinned bool) (Series, error) {
	s := Series{Label: label, Group: group, Points: pts, Pinned: pinned}
	if err := s.Validate(); err != nil {
		return Series{}, err
	}
	return s, nil
}

// NewMarker returns a checked current-length Marker; it rejects a NaN/Inf position.
func NewMarker(x float64, label string) (*Marker, error) {
	if err := finite("marker X", x); err != nil {
		return nil, err
	}
	return &Marker{X: x, Label: label}, nil
}

// NewCrossover returns a checked Crossover; it rejects NaN/Inf coordinates.
func NewCrossover(x, y float64, label string) (Crossover, error) {
	c := Crossover{X: x, Y: y, Label: label}
	if err := c.Validate(); err != nil {
		return Crossover{}, err
	}
	return c, nil
}

// NewRange returns a checked Range; it rejects NaN/Inf bounds and min ≥ max.
func NewRange(min, max float64) (*Range, error) {
	r := &Range{Min: min, Max: max}
	if err := r.validate("range"); err != nil {
		return nil, err
	}
	return r, nil
}

// Validate reports the first NaN/Inf coordinate or X-order violation in the series.
func (s Series) Validate() error {
	return validateLine("series", s.Label, s.Points)
}

// Validate reports a NaN/Inf coordinate of the crossover.
func (c Crossover) Validate() error {
	if notFinite(c.X) {
		return notFiniteError(fmt.Sprintf("crossover %q X", c.Label), c.X)
	}
	if notFinite(c.Y) {
		return notFiniteError(fmt.Sprintf("crossover %q Y", c.Label), c.Y)
	}
	return nil
}

// Validate reports the first problem in the chart data: a NaN/Inf number
// (ErrNotFinite), a line out of X order (ErrNotIncreasing) or an inverted
// axis range (ErrBadRange); the message names the offending field.
func (c *Chart) Validate() error {
	for i := range c.Series {
		if err := c.Series[i].Validate(); err != nil {
			return fmt.Errorf("series[%d]: %w", i, err)
		}
	}
	if err := validateLine("demand", "", c.Demand); err != nil {
		return err
	}
	if c.Marker != nil {
		if err := finite("marker X", c.Marker.X); err != nil {
			return err
		}
	}
	for i := range c.Crossovers {
		if err := c.Crossovers[i].Validate(); err != nil {
			return fmt.Errorf("crossovers[%d]: %w", i, err)
		}
	}
	if c.XRange != nil {
		if err := c.XRange.validate("x range"); err != nil {
			return err
		}
	}
	if c.YRange != nil {
		if err := c.YRange.validate("y range"); err != nil {
			return err
		}
	}
	return nil
}

// validate reports NaN/Inf bounds or min ≥ max, naming the field.
func (r *Range) validate(field string) error {
	if err := finite(field+" min", r.Min); err != nil {
		return err
	}
	if err := finite(field+" max", r.Max); err != nil {
		return err
	}
	if !(r.Min < r.Max) {
		return fmt.Errorf("%s: min %g, max %g (need min < max): %w", field, r.Min, r.Max, ErrBadRange)
	}
	return nil
}

// validateLine checks every point is finite and X never decreases; kind and
// label name the line in the error and are formatted only on failure.
func validateLine(kind, label string, pts []Point) error {
	for i, p := range pts {
		if notFinite(p.X) {
			return notFiniteError(lineField(kind, label, i, "X"), p.X)
		}
		if notFinite(p.Y) {
			return notFiniteError(lineField(kind, label, i, "Y"), p.Y)
		}
		if i > 0 && p.X < pts[i-1].X {
			return fmt.Errorf("%s = %g after %g: %w", lineField(kind, label, i, "X"), p.X, pts[i-1].X, ErrNotIncreasing)
		}
	}
	return nil
}

// lineField names coordinate axis of point i of a line, e.g. `series "A" point[3] Y`.
func lineField(kind, label string, i int, axis string) string {
	if label == "" {
		return fmt.Sprintf("%s point[%d] %s", kind, i, axis)
	}
	return fmt.Sprintf("%s %q point[%d] %s", kind, label, i, axis)
}

// finite returns ErrNotFinite, naming the field, when v is NaN or ±Inf.
func finite(field string, v float64) error {
	if notFinite(v) {
		return notFiniteError(field, v)
	}
	return nil
}

// notFinite reports whether v is NaN or ±Inf.
func notFinite(v float64) bool {
	return math.IsNaN(v) || math.IsInf(v, 0)
}

// notFiniteError wraps ErrNotFinite with the field name and value.
func notFiniteError(field string, v float64) error {
	return fmt.Errorf("%s = %v (need a finite number): %w", field, v, ErrNotFinite)
}
