package model

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"upright/steel/composite"
)

// AssumptionTopics are the columns of the per-material assumptions table.
var AssumptionTopics = []string{"Effective length K", "Load combinations", "Self-weight", "Bracing", "Slenderness limit"}

// Assumption is one material's row of the assumptions table: one entry per
// AssumptionTopics column.
type Assumption struct {
	Material string
	Entries  []string
}

// kList writes the K of each end condition, e.g. "fixed-fixed 0.65, ...".
func kList(k func(EndCondition) float64) string {
	parts := make([]string, 0, len(EndConditions))
	for _, e := range EndConditions {
		parts = append(parts, fmt.Sprintf("%s %.2f", e, k(e)))
	}
	return strings.Join(parts, ", ")
}

// Assumptions returns the assumptions each material is checked under, so
// that the treatment of every material can be compared side by side. The K
// values are read from the material packages.
func Assumptions() []Assumption {
	steelK := kList(func(e EndCondition) float64 {
		se, _ := steelEnds(e)
		return se.K()
	})
	concreteK := kList(func(e EndCondition) float64 { return concreteEnds(e).K() })
	concreteK1 := kList(func(e EndCondition) float64 { return concreteEnds(e).KSimplified() })
	timberK := kList(func(e EndCondition) float64 {
		return timberGeometry(Setting{LengthMM: 1, WeakMM: 1, Ends: e}).Ends.Ke()
	})
	return []Assumption{
		{"steel", []string{
			steelK + " (AISC 360-22 Commentary Table C-A-7.1 recommended design values), unless K is typed",
			"strength does not depend on the combination: every gravity combination of ASCE 7-22 2.3.1 (LRFD) or 2.4.1 (ASD) is checked against the one strength; the largest governs",
			"nominal weight × height, added as dead load with each combination's dead factor",
			"the weak-axis brace sets Lcy; twisting (Lcz, E4) runs over the full height unless the braces are stated to restrain twist (twist-braced)",
			"Lc/r above 200 is marked (AISC 360-22 E2 User Note); strength is still given",
		}},
		{"concrete", []string{
			concreteK + " (the recommended design values, as steel and timber take: AISC 360-22 C-A-7.1, from memory), unless K is typed; with the nonsway-k1 setting " + concreteK1 + " (nonsway k = 1.0, the simplification ACI 318-19 6.6.4.4.3 permits, from memory)",
			"ACI 318-19 is strength design: every LRFD combination is checked with its own βdns = factored dead / total (6.6.4.4.4), and (EI)eff by whichever of 6.6.4.4.4 (a), (b) and (c) gives the largest strength unless one is chosen; a typed βdns applies only where it is higher than a combination's own; under ASD the governing strength is restated on the service-load scale; δ above 1.4 never works (6.2.5.3)",
			"concrete at 2,320 kg/m³ plus bars, added as dead load with each combination's dead factor",
			"the weak-axis brace sets lu about the weak axis; no torsional mode",
			"k·lu/r above 100 is not permitted (6.2.6) and marked",
		}},
		{"timber", []string{
			timberK + " (NDS 2018 Appendix G Table G1 recommended Ke, from memory), unless K is typed",
			"every combination is checked with its own time effect factor λ (LRFD, NDS 2018 Table N3) or load duration factor CD (ASD, Table 2.3.2), a typed duration only where its CD is lower than the combination's own; with a fire rating the charred section is checked against the governing ASD (service) combination (16.2.2)",
			"wood at its moisture content (19% sawn, 12% glulam), added as dead load with each combination's dead factor",
			"the weak-axis brace sets le about the weak axis (width b); no torsional mode",
			"le/d above 50 is not permitted (NDS 2018 3.7.1.4) and marked, for the charred section too",
		}},
		{"composite", []string{
			steelK + " (AISC 360-22 Commentary Table C-A-7.1 recommended design values, as steel; Lc = KL, I2.1b), unless K is typed",
			"strength does not depend on the combination, as for steel: every gravity combination of ASCE 7-22 2.3.1 (LRFD) or 2.4.1 (ASD) is checked against the one strength (AISC 360-22 I2.2); the largest governs",
			fmt.Sprintf("the tube's nominal weight plus the plain fill at %g lb/ft³ (%s kg/m³, common practice, from memory) × height, added as dead load with each combination's dead factor",
				composite.DefaultWc, thousands(composite.DefaultWc*compositeKgm3PerPcf)),
			"the weak-axis brace sets Lcy, as for steel; a closed filled tube has no torsional mode (I2.2 gives flexural buckling only; a closed section is so stiff in torsion that flexural buckling governs, as for HSS under E4), so twist-braced changes nothing",
			"Lc/r of the steel tube above 200 is marked, the AISC 360-22 E2 (User Note) recommendation applied as for steel (Chapter I states no limit of its own, from memory); strength is still given",
		}},
	}
}

// thousands writes a positive number rounded to a whole, with a comma
// between thousands, e.g. "2,323".
func thousands(v float64) string {
	n := int(math.Round(v))
	if n < 1000 {
		return strconv.Itoa(n)
	}
	return fmt.Sprintf("%s,%03d", thousands(float64(n/1000)), n%1000)
}

// TypedLoadAssumption says how a typed load is split, for the assumptions
// table's note.
const TypedLoadAssumption = "A typed load is split into dead and live load by its dead share (default 2/3 of the service load); under LRFD the typed load is the governing factored load, under ASD the service load; every combination then follows as in a takedown (ASCE 7-22 2.3.1, 2.4.1)."

// AssumptionsText writes the assumptions table as plain text, one block per material.
func AssumptionsText() string {
	var b strings.Builder
	b.WriteString("Assumptions, material by material:\n")
	for _, a := range Assumptions() {
		fmt.Fprintf(&b, "  %s\n", a.Material)
		for i, t := range AssumptionTopics {
			fmt.Fprintf(&b, "    %s: %s\n", t, a.Entries[i])
		}
	}
	b.WriteString("  " + TypedLoadAssumption + "\n")
	return b.String()
}
