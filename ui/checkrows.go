package ui

import (
	"fmt"
	"sort"
	"strings"

	"upright/ui/model"
	"upright/ui/units"
)

// checkSteps turns the load combinations checked on a candidate into
// leading rows of the calculation view: one row per combination with its
// demand, capacity, the factors it used and its utilization.
func checkSteps(cs []model.Check, sys units.System) []model.Step {
	out := make([]model.Step, 0, len(cs))
	for _, c := range cs {
		var b strings.Builder
		fmt.Fprintf(&b, "%s: demand %s, capacity %s", c.Combination, fmtForce(c.DemandN, sys), fmtForce(c.CapacityN, sys))
		keys := make([]string, 0, len(c.Factors))
		for k := range c.Factors {
			keys = append(keys, k)
		}
		sort.Strings(keys)
		for _, k := range keys {
			fmt.Fprintf(&b, ", %s %.2f", factorName(k), c.Factors[k])
		}
		if c.Governing {
			b.WriteString(" (governs)")
		}
		// The row names its combination in the first column, which is never
		// scrolled away: three rows of "utilization" alone cannot be told apart.
		out = append(out, model.Step{Clause: c.Clause, Quantity: "utilization, " + c.Combination, Formula: b.String(), Value: c.Util})
	}
	return out
}

// factorName writes a check factor's key as its symbol.
func factorName(k string) string {
	switch k {
	case "lambda":
		return "λ"
	case "beta_dns":
		return "βdns"
	}
	return k
}
