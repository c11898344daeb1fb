package model

import "math"

// CaseFamily is a Family whose strength depends on the load combination:
// timber through its time effect factor λ (LRFD) or load duration factor CD
// (ASD), concrete through βdns. Each candidate is checked against every
// combination with that combination's own factors and the highest
// utilization governs. Families whose strength does not depend on the
// combination (steel) implement only Family: one strength serves every
// combination.
type CaseFamily interface {
	Family
	// Cases returns the combinations the family's candidates are checked
	// against under method m.
	Cases(m Method) []LoadCase
	// CaseQuick returns candidate i's strength at s under combination c,
	// for a column whose service self-weight is selfN; it does not allocate.
	CaseQuick(i int, s Setting, c *LoadCase, selfN float64) Quick
	// CaseFactors names the factors the family takes from combination c,
	// e.g. {"lambda": 0.8} or {"beta_dns": 0.6}.
	CaseFactors(c *LoadCase, selfN float64) map[string]float64
}

// FireFamily is a family with a fire-case strength check of its own against
// the service load (LoadSummary.FireCase).
type FireFamily interface {
	// FireQuick returns candidate i's fire-case strength at s; ok is false
	// when the family has no fire check in this scheme.
	FireQuick(i int, s Setting) (q Quick, ok bool)
}

// FireCaseIndex is the Check.Index of the fire-case check.
const FireCaseIndex = -2

// Check is one combination checked on one candidate.
type Check struct {
	Combination string             // e.g. "LRFD 2: 1.2D + 1.6L"
	Clause      string             // where the combination comes from
	Index       int                // index into the family's cases, or FireCaseIndex
	DemandN     float64            // the combination's load with self-weight, N
	CapacityN   float64            // the strength under this combination's factors, N (0 when not permitted)
	Util        float64            // DemandN / CapacityN (+Inf when not permitted)
	Factors     map[string]float64 // the combination's factors the strength uses (empty when none)
	Governing   bool               // the check with the highest utilization
}

// governCases checks candidate i of f at s against every combination in
// cases (and the fire case, when f has one) and returns the strength of the
// governing check, the one with the highest utilization, with CapacityN
// restated on the scale of demandN (the largest combination's load):
// demandN / utilization. The returned index is into cases, or FireCaseIndex.
// It does not allocate.
func governCases(f CaseFamily, i int, s Setting, cases []LoadCase, fire *LoadCase, selfN, demandN float64) (Quick, int) {
	var gov Quick
	at, worst := -1, -1.0
	for k := range cases {
		c := &cases[k]
		q := f.CaseQuick(i, s, c, selfN)
		if !q.Permitted {
			return q, k
		}
		u := utilOf(c.DemandN(selfN), q.CapacityN)
		if u > worst {
			gov, at, worst = q, k, u
		}
	}
	if ff, ok := f.(FireFamily); ok && fire != nil {
		if q, on := ff.FireQuick(i, s); on {
			if !q.Permitted {
				return q, FireCaseIndex
			}
			if u := utilOf(fire.DemandN(selfN), q.CapacityN); u > worst {
				gov, at, worst = q, FireCaseIndex, u
			}
		}
	}
	if at == -1 {
		return Quick{Governing: "not permitted", Reason: "no load combination to check"}, -1
	}
	switch {
	case math.IsInf(worst, 1):
		gov.CapacityN = 0
	case worst > 0:
		gov.CapacityN = demandN / worst
	}
	return gov, at
}

// utilOf is demand over capacity, +Inf when the capacity is not positive.
func utilOf(demand, capacity float64) float64 {
	if !(capacity > 0) {
		return math.Inf(1)
	}
	return demand / capacity
}

// Checks returns candidate i of family fi checked at s against every load
// combination of the scheme's method, each with its own factors where the
// family's strength depends on them, and the fire case where the family has
// one; the check with the highest utilization is marked governing.
func (m *Model) Checks(fi, i int, s Setting) []Check {
	f := m.Families[fi]
	selfN := m.SelfWeightN(f.Static(i), s.LengthMM)
	var out []Check
	if cf, ok := Unwrap(f).(CaseFamily); ok {
		cases := cf.Cases(s.Method)
		for k := range cases {
			c := &cases[k]
			q := cf.CaseQuick(i, s, c, selfN)
			out = append(out, newCheck(c, k, q, selfN, cf.CaseFactors(c, selfN)))
		}
		if ff, ok := cf.(FireFamily); ok {
			if q, on := ff.FireQuick(i, s); on {
				out = append(out, newCheck(&m.Loads.FireCase, FireCaseIndex, q, selfN, map[string]float64{}))
			}
		}
	} else {
		q := f.Quick(i, s)
		cases := m.Loads.CasesFor(s.Method)
		for k := range cases {
			c := &cases[k]
			out = append(out, newCheck(c, k, q, selfN, map[string]float64{}))
		}
	}
	gov := -1
	for k := range out {
		if gov < 0 || out[k].Util > out[gov].Util {
			gov = k
		}
	}
	if gov >= 0 {
		out[gov].Governing = true
	}
	return out
}

func newCheck(c *LoadCase, k int, q Quick, selfN float64, factors map[string]float64) Check {
	ch := Check{Combination: c.Name, Clause: c.Clause, Index: k, DemandN: c.DemandN(selfN), Factors: factors}
	if q.Permitted {
		ch.CapacityN = q.CapacityN
	}
	ch.Util = utilOf(ch.DemandN, ch.CapacityN)
	return ch
}

// dominantCases drops the combinations that can never govern a strength
// depending only on the time factor returned by timeOf: one with the same
// time factor and dead factor as another but a smaller load (with any
// self-weight its load stays the smaller). The order is kept.
func dominantCases(cs []LoadCase, timeOf func(*LoadCase) float64) []LoadCase {
	out := make([]LoadCase, 0, len(cs))
	for k := range cs {
		c := &cs[k]
		dominated := false
		for j := range cs {
			o := &cs[j]
			if j == k || timeOf(o) != timeOf(c) || o.DeadFactor != c.DeadFactor {
				continue
			}
			if o.ValueN > c.ValueN || (o.ValueN == c.ValueN && j < k) {
				dominated = true
				break
			}
		}
		if !dominated {
			out = append(out, *c)
		}
	}
	return out
}

// Unwrap returns the material's own family under any model-level wrapper
// (such as the fire-rating step), so that callers can find the optional
// interfaces (CaseFamily, FireFamily, Outliner) the material implements.
func Unwrap(f Family) Family {
	for {
		w, ok := f.(interface{ Unwrap() Family })
		if !ok {
			return f
		}
		f = w.Unwrap()
	}
}
