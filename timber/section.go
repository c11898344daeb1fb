package timber

import (
	"fmt"
	"math"
	"strconv"
)

// MMPerIn is the exact number of millimetres in one inch.
const MMPerIn = 25.4

// Product is the kind of wood product a section is made of.
type Product int

// The three products the package checks.
const (
	// DimensionLumber is sawn lumber 2" to 4" nominal thickness; here the
	// 4x posts (NDS Supplement Table 4A, or 4B for Southern Pine).
	DimensionLumber Product = iota + 1
	// PostsTimbers is sawn timber 5"x5" and larger with width not more than
	// 2" greater than thickness (NDS Supplement Table 4D, Posts and Timbers).
	PostsTimbers
	// Glulam is structural glued laminated timber (NDS Supplement Tables 5A/5B).
	Glulam
)

// String returns the product's plain name.
func (p Product) String() string {
	switch p {
	case DimensionLumber:
		return "dimension lumber"
	case PostsTimbers:
		return "posts and timbers"
	case Glulam:
		return "glulam"
	}
	return "unknown product"
}

// Sawn reports whether the product is sawn lumber (dimension or timbers).
func (p Product) Sawn() bool { return p == DimensionLumber || p == PostsTimbers }

// Series is a glulam width series, which fixes the widths and the lamination
// thickness.
type Series int

// The two glulam width series.
const (
	// Western is western species glulam: 1-1/2 in laminations.
	Western Series = iota + 1
	// Southern is southern pine glulam: 1-3/8 in laminations.
	Southern
)

// String returns the series' plain name.
func (s Series) String() string {
	switch s {
	case Western:
		return "western species"
	case Southern:
		return "southern pine"
	}
	return "unknown series"
}

// LamIn returns the series' lamination thickness in inches (0 for an unknown series).
func (s Series) LamIn() float64 {
	switch s {
	case Western:
		return 1.5 // common practice: 1-1/2 in western species laminations
	case Southern:
		return 1.375 // common practice: 1-3/8 in southern pine laminations
	}
	return 0
}

// Widths returns the series' net finished widths in inches, narrowest first.
func (s Series) Widths() []float64 {
	switch s {
	case Western:
		return []float64{3.125, 5.125, 6.75, 8.75, 10.75, 12.25, 14.25} // common practice (from memory): the western stock widths up to 14-1/4 in
	case Southern:
		return []float64{3, 5, 6.75, 8.5, 10.5} // common practice (from memory)
	}
	return nil
}

// MinLams is the fewest laminations a glulam column may have here: the
// Table 5B compression values used are those for 4 or more laminations.
const MinLams = 4

// MaxLams is the most laminations accepted for a glulam column.
const MaxLams = 60

// Section is one column cross-section with its actual (dressed or finished)
// dimensions. B is the width (the smaller dimension) and D the depth.
type Section struct {
	Name     string  // e.g. "8x8", "4x6", "6-3/4x9"
	Product  Product // dimension lumber, posts and timbers, or glulam
	Series   Series  // glulam width series; 0 for sawn
	NominalB int     // sawn nominal width, in; 0 for glulam
	NominalD int     // sawn nominal depth, in; 0 for glulam
	B        float64 // actual width, in
	D        float64 // actual depth, in (D ≥ B)
	Lams     int     // glulam laminations; 0 for sawn
	LamIn    float64 // glulam lamination thickness, in; 0 for sawn
}

// Area returns the gross cross-section area, in².
func (s Section) Area() float64 { return s.B * s.D }

// BMM returns the actual width in millimetres.
func (s Section) BMM() float64 { return s.B * MMPerIn }

// DMM returns the actual depth in millimetres.
func (s Section) DMM() float64 { return s.D * MMPerIn }

// timberNominals are the nominal sizes of timbers 5" and thicker offered here.
var timberNominals = []int{5, 6, 8, 10, 12, 14, 16, 18, 20, 22, 24}

// SawnSection returns the dressed section of a sawn member by NDS Supplement
// Table 1B (from memory): 4x4, 4x6 and 4x8 at the dry dressed sizes
// 3-1/2 x 3-1/2, 3-1/2 x 5-1/2 and 3-1/2 x 7-1/4 in; timbers 5x5 and larger
// at the green dressed size, nominal less 1/2 in. Timbers must be posts and
// timbers (depth at most 2 in nominal more than width); beams and stringers
// are rejected because their design values differ.
func SawnSection(nomB, nomD int) (Section, error) {
	if nomB == 4 {
		var d float64
		switch nomD {
		case 4:
			d = 3.5 // NDS Supplement Table 1B, dry dressed (from memory)
		case 6:
			d = 5.5 // NDS Supplement Table 1B, dry dressed (from memory)
		case 8:
			d = 7.25 // NDS Supplement Table 1B, dry dressed (from memory)
		default:
			return Section{}, fmt.Errorf("timber: nominal depth %d in for a 4x post is not offered; use 4, 6 or 8", nomD)
		}
		return Section{
			Name: fmt.Sprintf("4x%d", nomD), Product: DimensionLumber,
			NominalB: 4, NominalD: nomD, B: 3.5, D: d,
		}, nil
	}
	if !containsInt(timberNominals, nomB) {
		return Section{}, fmt.Errorf("timber: nominal width %d in is not offered; use 4 (posts 4x4 to 4x8) or one of %v", nomB, timberNominals)
	}
	if !containsInt(timberNominals, nomD) || nomD < nomB || nomD > nomB+2 {
		return Section{}, fmt.Errorf("timber: nominal depth %d in with width %d in is not a posts-and-timbers size; the depth must be one of %v from %d to %d in", nomD, nomB, timberNominals, nomB, nomB+2)
	}
	return Section{
		Name: fmt.Sprintf("%dx%d", nomB, nomD), Product: PostsTimbers,
		NominalB: nomB, NominalD: nomD,
		// NDS Supplement Table 1B: timbers 5" and thicker dressed green to nominal − 1/2" (from memory).
		B: float64(nomB) - 0.5, D: float64(nomD) - 0.5,
	}, nil
}

// GlulamSection returns a glulam section of the series' width (in) and the
// given number of laminations. The width must be one of the series widths,
// the laminations from MinLams to MaxLams, and the depth no less than the width.
func GlulamSection(series Series, width float64, lams int) (Section, error) {
	t := series.LamIn()
	if t == 0 {
		return Section{}, fmt.Errorf("timber: glulam series %d is unknown; use Western or Southern", int(series))
	}
	if math.IsNaN(width) || math.IsInf(width, 0) {
		return Section{}, fmt.Errorf("timber: glulam width %v is not a number; use one of %v in", width, series.Widths())
	}
	ok := false
	for _, w := range series.Widths() {
		if math.Abs(w-width) < 1e-6 {
			width, ok = w, true
		}
	}
	if !ok {
		return Section{}, fmt.Errorf("timber: glulam width %v in is not a %s width; use one of %v in", width, series, series.Widths())
	}
	if lams < MinLams || lams > MaxLams {
		return Section{}, fmt.Errorf("timber: glulam laminations %d not accepted; use %d to %d", lams, MinLams, MaxLams)
	}
	d := float64(lams) * t
	if d < width-1e-9 {
		return Section{}, fmt.Errorf("timber: glulam laminations %d give a depth %s in below the width %s in; use at least %d",
			lams, Inches(d), Inches(width), int(math.Ceil(width/t-1e-9)))
	}
	return Section{
		Name: Inches(width) + "x" + Inches(d), Product: Glulam, Series: series,
		B: width, D: d, Lams: lams, LamIn: t,
	}, nil
}

// SawnSections returns the catalogue of sawn column sections: 4x4, 4x6, 4x8,
// square timbers 5x5 to 16x16 and the rectangular posts and timbers 6x8 to 14x16.
func SawnSections() []Section {
	pairs := [][2]int{
		{4, 4}, {4, 6}, {4, 8},
		{5, 5}, {6, 6}, {6, 8}, {8, 8}, {8, 10}, {10, 10}, {10, 12},
		{12, 12}, {12, 14}, {14, 14}, {14, 16}, {16, 16},
	}
	out := make([]Section, 0, len(pairs))
	for _, p := range pairs {
		s, err := SawnSection(p[0], p[1])
		if err != nil {
			panic(err) // the list above is fixed; a failure is a programming error caught by the tests
		}
		out = append(out, s)
	}
	return out
}

// GlulamSections returns the catalogue of glulam column sections of a series:
// for each width, every whole number of laminations (at least MinLams) whose
// depth is from the width up to twice the width.
func GlulamSections(series Series) []Section {
	t := series.LamIn()
	var out []Section
	for _, w := range series.Widths() {
		n0 := max(MinLams, int(math.Ceil(w/t-1e-9)))
		for n := n0; float64(n)*t <= 2*w+1e-9; n++ {
			s, err := GlulamSection(series, w, n)
			if err != nil {
				panic(err) // fixed catalogue; caught by the tests
			}
			out = append(out, s)
		}
	}
	return out
}

// Inches formats a length in inches as a whole number and eighths, e.g.
// 6.75 → "6-3/4", 9 → "9". Lengths that are not whole eighths get two decimals.
func Inches(x float64) string {
	e := math.Round(x * 8)
	if math.Abs(e-x*8) > 1e-6 || e < 0 {
		return strconv.FormatFloat(x, 'f', 2, 64)
	}
	n := int(e)
	whole, rem := n/8, n%8
	if rem == 0 {
		return strconv.Itoa(whole)
	}
	num, den := rem, 8
	for num%2 == 0 {
		num, den = num/2, den/2
	}
	frac := strconv.Itoa(num) + "/" + strconv.Itoa(den)
	if whole == 0 {
		return frac
	}
	return strconv.Itoa(whole) + "-" + frac
}

func containsInt(xs []int, v int) bool {
	for _, x := range xs {
		if x == v {
			return true
		}
	}
	return false
}
