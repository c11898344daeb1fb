package model

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// DefaultDeadShare is the dead share of a typed load when none is given:
// two thirds of the service load is dead. With it the typed LRFD load splits
// as D = 0.5P, L = 0.25P and βdns of 1.2D + 1.6L is 0.6 (common practice
// for a concrete-framed office floor; a declared assumption, not a code value).
const DefaultDeadShare = 2.0 / 3.0

// LoadCase is one load combination as a candidate is checked against it.
type LoadCase struct {
	Name       string  // the combination with its ASCE 7-22 number, zero-load terms left out, e.g. "LRFD 2: 1.2D + 1.6L"
	Clause     string  // e.g. "ASCE 7-22 2.3.1 combination 2"
	Method     Method  // the method the combination belongs to
	ValueN     float64 // the combined load without the column's self-weight, N
	DeadFactor float64 // load factor on dead load, also applied to self-weight
	DeadN      float64 // factored dead load without self-weight (DeadFactor × D), N
	Time       float64 // NDS 2018 λ (LRFD, Table N3) or CD (ASD, Table 2.3.2) of the combination
}

// DemandN returns the combination's load with the column's service
// self-weight selfN added as dead load, N.
func (c *LoadCase) DemandN(selfN float64) float64 { return c.ValueN + c.DeadFactor*selfN }

// BetaDns returns ACI 318-19 6.6.4.4.4 βdns of the combination with the
// column's self-weight selfN as dead load: factored sustained over total
// factored axial load, held to 0..1; 0 when the combination carries nothing.
func (c *LoadCase) BetaDns(selfN float64) float64 {
	tot := c.DemandN(selfN)
	if !(tot > 0) {
		return 0
	}
	b := (c.DeadN + c.DeadFactor*selfN) / tot
	if b > 1 {
		b = 1
	}
	if b < 0 {
		b = 0
	}
	return b
}

// comboLabel writes a combination's name without the terms whose service
// load is zero, e.g. "LRFD 2: 1.2D + 1.6L" for "LRFD 2: 1.2D + 1.6L + 0.5Lr" with Lr = 0.
func comboLabel(c *Combo, v loads) string {
	head := c.Name
	if i := strings.Index(head, ":"); i >= 0 {
		head = head[:i]
	}
	var terms []string
	add := func(f, load float64, sym string) {
		if f == 0 || load == 0 {
			return
		}
		if f == 1 {
			terms = append(terms, sym)
			return
		}
		terms = append(terms, strconv.FormatFloat(f, 'f', -1, 64)+sym)
	}
	add(c.D, v.D, "D")
	add(c.L, v.L, "L")
	add(c.Lr, v.Lr, "Lr")
	add(c.S, v.S, "S")
	if len(terms) == 0 {
		return c.Name
	}
	return head + ": " + strings.Join(terms, " + ")
}

// loadCases turns evaluated combinations into the cases a candidate is
// checked against, dropping a combination identical to an earlier one once
// its zero-load terms are left out (e.g. the Lr and S variants without roof load).
func loadCases(cs []Combo, factors []float64, v loads, m Method) []LoadCase {
	out := make([]LoadCase, 0, len(cs))
	seen := map[string]bool{}
	for i := range cs {
		c := &cs[i]
		label := comboLabel(c, v)
		key := fmt.Sprintf("%s|%g", label[strings.Index(label, ":")+1:], factors[i])
		if seen[key] {
			continue
		}
		seen[key] = true
		out = append(out, LoadCase{Name: label, Clause: c.Clause, Method: m, ValueN: c.ValueN,
			DeadFactor: c.D, DeadN: c.D * v.D, Time: factors[i]})
	}
	return out
}

// fireCase is the load of a fire-case check: the governing ASD (service)
// combination (NDS 2018 16.2.2 checks the residual section under ASD loads).
func fireCase(c Combo, cd float64, v loads) LoadCase {
	label := comboLabel(&c, v)
	if i := strings.Index(label, ": "); i >= 0 {
		label = label[i+2:]
	}
	return LoadCase{Name: "fire: " + label, Clause: "NDS 2018 16.2.2 with " + c.Clause,
		Method: ASD, ValueN: c.ValueN, DeadFactor: c.D, DeadN: c.D * v.D, Time: cd}
}

// deadShare returns the load's dead share, DefaultDeadShare when none is given.
func (l Load) deadShare() float64 {
	if l.DeadShare == 0 {
		return DefaultDeadShare
	}
	return l.DeadShare
}

// typedSummary splits a typed load into service dead and live load by its
// dead share s and evaluates every combination as a takedown does. Under
// ASD the typed load P is the service load: D = sP, L = (1 − s)P. Under
// LRFD it is the governing factored load: the service load is
// P / max(1.4s, 1.2s + 1.6(1 − s)) (ASCE 7-22 2.3.1 combinations 1 and 2
// with D and L only), then D and L as before.
func typedSummary(l Load, m Method) LoadSummary {
	s := l.deadShare()
	ls := LoadSummary{Known: true, Typed: true, Method: m, Reduction: 1}
	steps := []Step{
		{"typed load", "P", map[Method]string{LRFD: "governing factored axial load, as typed", ASD: "service axial load, as typed"}[m], l.DirectN, "N"},
		{"declared assumption", "dead share s", "part of the service load that is dead (default 2/3)", s, ""},
	}
	service := l.DirectN
	if m == LRFD {
		f1, f2 := 1.4*s, 1.2*s+1.6*(1-s)
		f := f1
		if f2 > f {
			f = f2
		}
		service = l.DirectN / f
		steps = append(steps, Step{"ASCE 7-22 2.3.1 combinations 1 and 2", "P / (D + L)", "max(1.4s, 1.2s + 1.6(1 − s))", f, ""})
	}
	ls.DeadN = s * service
	ls.LiveN = service - ls.DeadN
	ls.LiveRawN = ls.LiveN
	steps = append(steps,
		Step{"ASCE 7-22 3.1", "D", "s × service load", ls.DeadN, "N"},
		Step{"ASCE 7-22 4.3", "L", "(1 − s) × service load (taken as reduced already)", ls.LiveN, "N"},
	)
	combine(&ls, loads{D: ls.DeadN, L: ls.LiveN}, OccGeneral, m, steps)
	// The governing combination of the method reproduces the typed load;
	// state it exactly rather than to the last rounding bit.
	snap := func(v *float64) {
		if math.Abs(*v-l.DirectN) <= 1e-9*l.DirectN {
			*v = l.DirectN
		}
	}
	for k := range ls.Combos {
		snap(&ls.Combos[k].ValueN)
	}
	for k := range ls.Cases {
		snap(&ls.Cases[k].ValueN)
	}
	if m == LRFD {
		snap(&ls.LRFDN)
	} else {
		snap(&ls.ASDN)
		snap(&ls.FireCase.ValueN)
	}
	snap(&ls.DemandN)
	return ls
}
