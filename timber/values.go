package timber

import (
	"fmt"
	"strings"
)

// Material is a set of reference design values for one species and grade (or
// glulam combination) in one size class. Stresses are in psi.
type Material struct {
	Name    string  // e.g. "DF-L No.1", "Comb. 2 DF"
	Species string  // e.g. "DF-L", "SP"; glulam: the layup species
	Grade   string  // e.g. "No.1"; glulam: the combination or stress class
	Table   string  // where the values come from, e.g. "NDS Supplement Table 4D (Posts and Timbers)"
	Product Product // the product the values are for
	Series  Series  // glulam width series; 0 for sawn
	Fc      float64 // reference compression design value parallel to grain, psi
	E       float64 // reference modulus of elasticity, psi
	Emin    float64 // reference modulus of elasticity for stability, psi
	G       float64 // specific gravity (oven-dry weight and volume basis)
	// WetIncluded is true when the tabulated values already apply in wet
	// service, so CM = 1.0 (Southern Pine timbers, Supplement Table 4D).
	WetIncluded bool
}

// Species and grade codes accepted by SawnMaterial.
const (
	DouglasFirLarch  = "DF-L"
	SouthernPine     = "SP"
	HemFir           = "HF"
	SprucePineFir    = "SPF"
	SelectStructural = "SS"
	No1              = "No.1"
	No2              = "No.2"
)

// SawnSpecies lists the sawn species codes in display order.
func SawnSpecies() []string {
	return []string{DouglasFirLarch, SouthernPine, HemFir, SprucePineFir}
}

// SawnGrades lists the sawn grade codes in display order.
func SawnGrades() []string { return []string{SelectStructural, No1, No2} }

// speciesName gives a species code's full name.
var speciesName = map[string]string{
	DouglasFirLarch: "Douglas Fir-Larch",
	SouthernPine:    "Southern Pine",
	HemFir:          "Hem-Fir",
	SprucePineFir:   "Spruce-Pine-Fir",
}

// SpeciesName returns the full species name of a code ("DF-L" → "Douglas Fir-Larch"),
// or the code itself when it is not a sawn species code.
func SpeciesName(code string) string {
	if n, ok := speciesName[code]; ok {
		return n
	}
	return code
}

// sawnRow is one row of reference values: Fc, E, Emin in psi.
type sawnRow struct{ fc, e, emin float64 }

// Specific gravity G of each sawn species (NDS 2018 Table 12.3.3A, from memory).
var sawnG = map[string]float64{
	DouglasFirLarch: 0.50, // NDS 2018 Table 12.3.3A (from memory)
	SouthernPine:    0.55, // NDS 2018 Table 12.3.3A (from memory)
	HemFir:          0.43, // NDS 2018 Table 12.3.3A (from memory)
	SprucePineFir:   0.42, // NDS 2018 Table 12.3.3A (from memory)
}

// dimension4A holds NDS Supplement Table 4A values, 2"–4" thick, 2" and
// wider, for DF-L, HF and SPF (before the size factor CF).
var dimension4A = map[string]map[string]sawnRow{
	DouglasFirLarch: {
		SelectStructural: {1700, 1900000, 690000}, // NDS Supplement Table 4A, DF-L SS (from memory)
		No1:              {1500, 1700000, 620000}, // NDS Supplement Table 4A, DF-L No.1 (from memory)
		No2:              {1350, 1600000, 580000}, // NDS Supplement Table 4A, DF-L No.2 (from memory)
	},
	HemFir: {
		SelectStructural: {1500, 1600000, 580000}, // NDS Supplement Table 4A, Hem-Fir SS (from memory)
		No1:              {1350, 1500000, 550000}, // NDS Supplement Table 4A, Hem-Fir No.1 (from memory)
		No2:              {1300, 1300000, 470000}, // NDS Supplement Table 4A, Hem-Fir No.2 (from memory)
	},
	SprucePineFir: {
		SelectStructural: {1400, 1500000, 550000}, // NDS Supplement Table 4A, SPF SS (from memory)
		No1:              {1150, 1400000, 510000}, // NDS Supplement Table 4A, SPF No.1/No.2 (from memory)
		No2:              {1150, 1400000, 510000}, // NDS Supplement Table 4A, SPF No.1/No.2 (from memory)
	},
}

// dimension4B holds NDS Supplement Table 4B Southern Pine values, 2"–4"
// thick, by nominal width (4 → "4 in wide", 6 → "5-6 in wide", 8 → "8 in
// wide"). Size effects are already included in these values.
var dimension4B = map[int]map[string]sawnRow{
	4: {
		SelectStructural: {2000, 1800000, 660000}, // NDS Supplement Table 4B, SP SS 4" wide (from memory)
		No1:              {1650, 1600000, 580000}, // NDS Supplement Table 4B, SP No.1 4" wide (from memory)
		No2:              {1450, 1400000, 510000}, // NDS Supplement Table 4B, SP No.2 4" wide (from memory)
	},
	6: {
		SelectStructural: {1900, 1800000, 660000}, // NDS Supplement Table 4B, SP SS 5"-6" wide (from memory)
		No1:              {1600, 1600000, 580000}, // NDS Supplement Table 4B, SP No.1 5"-6" wide (from memory)
		No2:              {1400, 1400000, 510000}, // NDS Supplement Table 4B, SP No.2 5"-6" wide (from memory)
	},
	8: {
		SelectStructural: {1800, 1800000, 660000}, // NDS Supplement Table 4B, SP SS 8" wide (from memory)
		No1:              {1550, 1600000, 580000}, // NDS Supplement Table 4B, SP No.1 8" wide (from memory)
		No2:              {1350, 1400000, 510000}, // NDS Supplement Table 4B, SP No.2 8" wide (from memory)
	},
}

// timbers4D holds NDS Supplement Table 4D values for timbers 5"x5" and
// larger, Posts and Timbers category (Southern Pine: the single "5x5 and
// larger" class, tabulated for wet service).
var timbers4D = map[string]map[string]sawnRow{
	DouglasFirLarch: {
		SelectStructural: {1150, 1600000, 580000}, // NDS Supplement Table 4D, DF-L P&T SS (from memory)
		No1:              {1000, 1600000, 580000}, // NDS Supplement Table 4D, DF-L P&T No.1 (from memory)
		No2:              {700, 1300000, 470000},  // NDS Supplement Table 4D, DF-L P&T No.2 (from memory)
	},
	SouthernPine: {
		SelectStructural: {950, 1500000, 550000}, // NDS Supplement Table 4D, SP 5x5 and larger SS, wet service (from memory)
		No1:              {825, 1500000, 550000}, // NDS Supplement Table 4D, SP 5x5 and larger No.1, wet service (from memory)
		No2:              {525, 1200000, 440000}, // NDS Supplement Table 4D, SP 5x5 and larger No.2, wet service (from memory)
	},
	HemFir: {
		SelectStructural: {975, 1300000, 470000}, // NDS Supplement Table 4D, Hem-Fir P&T SS (from memory)
		No1:              {850, 1300000, 470000}, // NDS Supplement Table 4D, Hem-Fir P&T No.1 (from memory)
		No2:              {575, 1100000, 400000}, // NDS Supplement Table 4D, Hem-Fir P&T No.2 (from memory)
	},
	SprucePineFir: {
		SelectStructural: {800, 1300000, 470000}, // NDS Supplement Table 4D, SPF P&T SS (from memory)
		No1:              {700, 1300000, 470000}, // NDS Supplement Table 4D, SPF P&T No.1 (from memory)
		No2:              {500, 1000000, 370000}, // NDS Supplement Table 4D, SPF P&T No.2 (from memory)
	},
}

// SawnMaterial returns the reference design values of a sawn species and
// grade for a sawn section: Table 4A (4B for Southern Pine) for 4x posts,
// Table 4D Posts and Timbers for 5x5 and larger.
func SawnMaterial(species, grade string, sec Section) (Material, error) {
	g, ok := sawnG[species]
	if !ok {
		return Material{}, fmt.Errorf("timber: species %q is not offered; use one of %s", species, strings.Join(SawnSpecies(), ", "))
	}
	if grade != SelectStructural && grade != No1 && grade != No2 {
		return Material{}, fmt.Errorf("timber: grade %q is not offered; use one of %s", grade, strings.Join(SawnGrades(), ", "))
	}
	m := Material{
		Name: species + " " + grade, Species: species, Grade: grade,
		Product: sec.Product, G: g,
	}
	var r sawnRow
	switch sec.Product {
	case DimensionLumber:
		if species == SouthernPine {
			w, ok := dimension4B[sec.NominalD]
			if !ok {
				return Material{}, fmt.Errorf("timber: Southern Pine 4x%d is not offered; use 4x4, 4x6 or 4x8", sec.NominalD)
			}
			r = w[grade]
			m.Table = fmt.Sprintf("NDS Supplement Table 4B (%s)", map[int]string{4: "4 in wide", 6: "5-6 in wide", 8: "8 in wide"}[sec.NominalD])
		} else {
			r = dimension4A[species][grade]
			m.Table = "NDS Supplement Table 4A"
		}
	case PostsTimbers:
		r = timbers4D[species][grade]
		if species == SouthernPine {
			m.Table = "NDS Supplement Table 4D (5x5 and larger, wet service)"
			m.WetIncluded = true
		} else {
			m.Table = "NDS Supplement Table 4D (Posts and Timbers)"
		}
	default:
		return Material{}, fmt.Errorf("timber: section %q is %s, not sawn lumber", sec.Name, sec.Product)
	}
	m.Fc, m.E, m.Emin = r.fc, r.e, r.emin
	return m, nil
}

// glulamRow is one glulam combination or stress class.
type glulamRow struct {
	name, species, table string
	series               Series
	fc, e, emin, g       float64
}

// glulamRows are the glulam combinations offered for columns: Table 5B
// axial combinations and one Table 5A stress class (axial values). Fc is the
// value for 4 or more laminations.
var glulamRows = []glulamRow{
	{"Comb. 1 DF", DouglasFirLarch, "NDS Supplement Table 5B", Western, 1550, 1500000, 790000, 0.50},                // Table 5B comb. 1, L3 DF (from memory)
	{"Comb. 2 DF", DouglasFirLarch, "NDS Supplement Table 5B", Western, 1950, 1600000, 850000, 0.50},                // Table 5B comb. 2, L2 DF (from memory)
	{"Comb. 3 DF", DouglasFirLarch, "NDS Supplement Table 5B", Western, 2300, 1900000, 1000000, 0.50},               // Table 5B comb. 3, L2D DF (from memory)
	{"Comb. 5 DF", DouglasFirLarch, "NDS Supplement Table 5B", Western, 2400, 2000000, 1060000, 0.50},               // Table 5B comb. 5, L1 DF (from memory)
	{"24F-1.8E", DouglasFirLarch, "NDS Supplement Table 5A (axially loaded)", Western, 1600, 1700000, 900000, 0.50}, // Table 5A 24F-1.8E, Fc and Eaxial (from memory); G of a DF layup
	{"Comb. 47 SP", SouthernPine, "NDS Supplement Table 5B", Southern, 1900, 1400000, 740000, 0.55},                 // Table 5B comb. 47, N2M14 SP (from memory)
	{"Comb. 48 SP", SouthernPine, "NDS Supplement Table 5B", Southern, 2200, 1700000, 900000, 0.55},                 // Table 5B comb. 48, N2D14 SP (from memory)
	{"Comb. 50 SP", SouthernPine, "NDS Supplement Table 5B", Southern, 2300, 1900000, 1000000, 0.55},                // Table 5B comb. 50, N1D14 SP (from memory)
}

// GlulamCombinations returns the names of the glulam combinations offered
// for a series (all series when s is 0), in display order.
func GlulamCombinations(s Series) []string {
	var out []string
	for _, r := range glulamRows {
		if s == 0 || r.series == s {
			out = append(out, r.name)
		}
	}
	return out
}

// GlulamMaterial returns the reference design values of a glulam combination
// or stress class by name (see GlulamCombinations).
func GlulamMaterial(name string) (Material, error) {
	for _, r := range glulamRows {
		if r.name == name {
			return Material{
				Name: r.name, Species: r.species, Grade: r.name, Table: r.table,
				Product: Glulam, Series: r.series,
				Fc: r.fc, E: r.e, Emin: r.emin, G: r.g,
			}, nil
		}
	}
	return Material{}, fmt.Errorf("timber: glulam combination %q is not offered; use one of %s", name, strings.Join(GlulamCombinations(0), ", "))
}
