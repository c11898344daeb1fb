package model

import "upright/concrete"

// ConcreteOptions are the concrete column choices.
type ConcreteOptions struct {
	FcMPa         float64 // specified compressive strength f'c, MPa; 0 means the default for the unit system (5,000 psi or 35 MPa)
	BarGrade      int     // 60 or 80 (ASTM A615)
	RhoMax        float64 // practical cap on the reinforcement ratio, e.g. 0.04
	Transverse    string  // "ties", "spiral" or "all"
	M1M2          float64 // end-moment ratio M1/M2, -1 (single curvature) to 1
	BetaDns       float64 // sustained-load ratio; used when BetaFromLoads is false or the load has no split
	BetaFromLoads bool    // derive βdns from the takedown's dead/live split
	EIMethod      string  // "a", "b" or "c" of ACI 318-19 6.6.4.4.4, or "largest" (the largest strength of the three, each permitted)
	// NonswayK1 takes k = 1.0 at nonsway ends, the simplification ACI
	// 318-19 6.6.4.4.3 permits, in place of the ends' recommended design K
	// that every material takes by default.
	NonswayK1 bool
	// SecondOrderCap concerns the 1.4 limit of ACI 318-19 6.2.5.3 (total
	// moment with second-order effects at most 1.4 times the first-order
	// moment). The limit always applies: δ above 1.4 never works. Switched
	// off, the trace also shows, as a note only, where the magnified minimum
	// moment alone meets the interaction diagram.
	SecondOrderCap bool
}

func defaultConcreteOptions() ConcreteOptions {
	return ConcreteOptions{
		BarGrade: 60, RhoMax: 0.04, Transverse: "all", M1M2: -1,
		BetaDns: 0.6, BetaFromLoads: true, EIMethod: "largest", SecondOrderCap: true,
	}
}

func (c ConcreteOptions) validate() error {
	if c.FcMPa != 0 && (!finite(c.FcMPa) || c.FcMPa < FcMinMPa || c.FcMPa > FcMaxMPa) {
		return bad("f'c", c.FcMPa, FcAccepted)
	}
	if c.BarGrade != 60 && c.BarGrade != 80 {
		return bad("bar grade", c.BarGrade, "60 or 80")
	}
	if !finite(c.RhoMax) || c.RhoMax < 0.01 || c.RhoMax > 0.08 {
		return bad("rho-max", c.RhoMax, "a reinforcement ratio from 0.01 to 0.08 (ACI 318-19 10.6.1.1)")
	}
	switch c.Transverse {
	case "ties", "spiral", "all":
	default:
		return bad("transverse", c.Transverse, "ties, spiral or all")
	}
	if !finite(c.M1M2) || c.M1M2 < -1 || c.M1M2 > 1 {
		return bad("m1m2", c.M1M2, "an end-moment ratio M1/M2 from -1 (single curvature) to 1")
	}
	if !finite(c.BetaDns) || c.BetaDns < 0 || c.BetaDns > 1 {
		return bad("beta-dns", c.BetaDns, "a sustained-load ratio from 0 to 1")
	}
	if _, ok := concreteEIMethods[c.EIMethod]; !ok {
		return bad("EI method", c.EIMethod, EIAccepted)
	}
	return nil
}

// EIAccepted names the accepted (EI)eff choices.
const EIAccepted = "a, b, c (ACI 318-19 6.6.4.4.4) or largest (the largest strength of the three, each permitted)"

// concreteEIMethods maps an EIMethod option to the concrete package's.
var concreteEIMethods = map[string]concrete.EIMethod{
	"a": concrete.EIGross, "b": concrete.EIWithSteel, "c": concrete.EIMember, "largest": concrete.EILargest,
}
