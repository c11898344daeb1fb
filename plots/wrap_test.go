package plots

import (
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
)

// TestWrapTextKeepsEveryWord checks that a legend label wider than its room
// is wrapped at spaces onto lines that fit, losing no word, and that a label
// that fits stays on one line.
func TestWrapTextKeepsEveryWord(t *testing.T) {
	sty := newLegend().entry
	label := "22 in round spiral, 9 #6, 5 ksi"
	room := sty.Width("22 in round spiral,") + 1
	lines := wrapText(sty, label, room)
	if len(lines) < 2 {
		t.Fatalf("%q in %v pt: %q, want at least two lines", label, room, lines)
	}
	for _, l := range lines {
		if sty.Width(l) > room {
			t.Errorf("line %q is wider than %v", l, room)
		}
	}
	if got := strings.Join(lines, " "); got != label {
		t.Errorf("wrapped lines read %q, want %q", got, label)
	}
	if one := wrapText(sty, label, vg.Points(1000)); len(one) != 1 || one[0] != label {
		t.Errorf("a label with room is one line, got %q", one)
	}
}
