package timber

import "fmt"

// ReasonTime is the reason given when FastTime is asked for a factor that
// NDS 2018 does not list.
const ReasonTime = "the time effect factor λ (0.6, 0.7, 0.8 or 1.0, NDS 2018 Table N3) or load duration factor CD (0.9, 1.0, 1.15, 1.25 or 1.6, Table 2.3.2) is not one NDS 2018 lists"

// TimeFactor returns the candidate's own time factor: CD for ASD, λ for LRFD.
func (k *Candidate) TimeFactor() float64 {
	if k.cond.Method == ASD {
		return k.cond.CD
	}
	return k.cond.Lambda
}

// validTime reports whether t is a factor of the candidate's method.
func (k *Candidate) validTime(t float64) bool {
	if k.cond.Method == ASD {
		return validCD(t)
	}
	return validLambda(t)
}

// FastTime is Fast with the time factor t (CD for ASD, λ for LRFD) in place
// of the candidate's own, so that each load combination is checked with its
// own factor (NDS 2018 2.3.2 and N3.3). Only Fc* carries the factor (Tables
// 4.3.1 and 5.3.1: CD and λ apply to Fc, not to Emin), so Fc* scales by
// t/(own factor) and FcE/Fc* by the inverse. The fire case, which takes no
// load duration or time effect factor (16.2.2), is left to FastFire. It does
// not allocate; a factor NDS 2018 does not list gives Permitted false.
func (k *Candidate) FastTime(g Geometry, t float64) (q Quick) {
	if !k.validTime(t) {
		q.Reason = ReasonTime
		return q
	}
	ke, why := g.ke()
	if why != "" {
		q.Reason = why
		return q
	}
	leX, leY := ke*g.LxIn, ke*g.LyIn // NDS 2018 3.7.1.2: le = Ke·l
	scale := t / k.TimeFactor()
	k.strengthAt(&q, leX, leY, k.fcS*scale, k.kE/scale)
	return q
}

// FastFire returns only the fire-case strength of the charred section at one
// geometry (NDS 2018 16.2), On false when the candidate has no fire
// exposure. It does not allocate.
func (k *Candidate) FastFire(g Geometry) (f FireQuick) {
	if !k.fireOn {
		return f
	}
	ke, why := g.ke()
	if why != "" {
		f.On, f.Reason = true, why
		return f
	}
	k.fireFast(&f, ke*g.LxIn, ke*g.LyIn)
	return f
}

// WithTime returns a copy of the candidate prepared with the time factor t
// (CD for ASD, λ for LRFD), for a full trace at one combination's factor.
func (k *Candidate) WithTime(t float64) (*Candidate, error) {
	if !k.validTime(t) {
		return nil, fmt.Errorf("timber: %s", ReasonTime)
	}
	c := k.cond
	if c.Method == ASD {
		c.CD = t
	} else {
		c.Lambda = t
	}
	return NewCandidate(k.sec, k.mat, c)
}
