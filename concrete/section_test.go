package concrete

import (
	"strings"
	"testing"
)

// In SI sizes the bars take their soft-metric names, the same bars (ASTM
// A615M, from memory): #9 is #29, #6 is #19.
func TestSISectionsNameBarsSoftMetric(t *testing.T) {
	s, err := NewSection(Spec{Shape: Rectangular, WidthMM: 450, DepthMM: 450, Transverse: Tied,
		FcMPa: 35, Grade: 60, BarSize: 9, NBars: 4, CoverMM: DefaultCoverMM, Series: SeriesSI})
	if err != nil {
		t.Fatal(err)
	}
	if want := "450x450 mm tied, 4 #29, 35 MPa"; s.Designation != want {
		t.Errorf("designation %q, want %q", s.Designation, want)
	}
	if got := (Bar{Size: 6}).MetricName(); got != "#19" {
		t.Errorf("#6 soft metric %q, want #19", got)
	}
	us := square16(t)
	if !strings.Contains(us.Designation, "#9") {
		t.Errorf("US designation %q keeps #9", us.Designation)
	}
}
