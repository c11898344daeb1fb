package model

// rebind returns a copy of family f whose load-dependent state follows the
// load summary ls and the self-weight multiplier selfW, without rebuilding
// its catalogue; ok is false for a family that does not know how (the
// caller then builds the model afresh).
func rebind(f Family, ls LoadSummary, selfW float64) (Family, bool) {
	switch g := f.(type) {
	case *steelFamily:
		c := *g
		c.ls, c.selfW = ls, selfW
		return &c, true
	case *compositeFamily:
		c := *g
		c.ls, c.selfW = ls, selfW
		return &c, true
	case *concreteFamily:
		c := *g
		c.ls, c.selfW = ls, selfW
		return &c, true
	case *timberFamily:
		c := *g
		c.ls, c.selfW = ls, selfW
		// The combinations that can govern follow the loads (as buildTimber).
		c.fastLRFD = dominantCases(ls.LRFDCases, func(k *LoadCase) float64 { return c.timeOf(k, LRFD) })
		c.fastASD = dominantCases(ls.ASDCases, func(k *LoadCase) float64 { return c.timeOf(k, ASD) })
		return &c, true
	case *fireFamily:
		inner, ok := rebind(g.Family, ls, selfW)
		if !ok {
			return nil, false
		}
		c := *g
		c.Family, c.ls, c.selfW = inner, ls, selfW
		return &c, true
	}
	return nil, false
}
