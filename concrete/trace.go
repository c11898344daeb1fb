package concrete

import (
	"fmt"
	"math"
)

// Step is one line of the calculation trace, in SI units.
type Step struct {
	Clause   string  // code clause or equation, e.g. "ACI 318-19 Eq. 22.4.2.2"
	Quantity string  // what is computed, e.g. "P0"
	Formula  string  // the expression
	Value    float64 // the result
	Unit     string  // "MPa", "mm", "mm2", "kN", "kN·m", "kN·m2" or "" for ratios
}

// AxisResult is the slenderness calculation about one axis.
type AxisResult struct {
	Axis    Axis
	LuMM    float64       // unbraced length, mm
	K       float64       // effective-length factor
	RMM     float64       // radius of gyration by 6.2.5.2, mm
	KLR     float64       // k·lu/r
	Limit   float64       // 6.2.5.1 limit below which slenderness is neglected
	Slender bool          // k·lu/r above the limit
	Sway    bool          // sway ends: the sway magnifier of 6.6.4.6 applies
	Limited bool          // slenderness (not φPn,max) sets the strength
	By14    bool          // the 1.4 second-order limit of 6.2.5.3 sets it (Conditions.Cap14)
	PhiPn   float64       // strength for this axis, N (0 above k·lu/r = 100)
	Mag     Magnification // magnifier at PhiPn (zero when not slender)
	PhiMn   float64       // φMn of the diagram at PhiPn, N·mm
	EI      EIMethod      // the EI method that set the strength (slender axes only)
}

// Result is the full evaluation with its trace.
type Result struct {
	Quick
	Axes     [2]AxisResult
	Governs  Axis     // axis whose strength governs
	Steps    []Step   // readable trace in the order the standard gives
	Warnings []string // visible warnings
	Summary  string   // one plain sentence on what governs
}

func (s *Section) axisName(ax Axis) string {
	if s.Shape == Circular {
		return "about " + ax.String()
	}
	if ax == AxisX {
		return "strong axis"
	}
	return "weak axis"
}

// Evaluate returns the strength at the conditions with the full trace. It
// gives the same strength and mode as Quick. Invalid conditions return a
// named error.
func (s *Section) Evaluate(c Conditions) (Result, error) {
	if err := c.Validate(); err != nil {
		return Result{}, err
	}
	r := Result{Quick: s.Quick(&c)}
	st := make([]Step, 0, 48)
	add := func(clause, q, f string, v float64, unit string) {
		st = append(st, Step{Clause: clause, Quantity: q, Formula: f, Value: v, Unit: unit})
	}
	kN, kNm := 1e-3, 1e-6

	// Materials.
	add("ACI 318-19 19.2.2.1(b)", "Ec", "57,000√f'c (psi), normal-weight concrete", s.EcMPa, "MPa")
	add("ACI 318-19 20.2.2.2", "Es", "29,000 ksi", EsMPa, "MPa")
	add("ACI 318-19 Table 22.2.2.4.3", "β1", "0.85 − 0.05(f'c − 4,000 psi)/1,000 psi, 0.65 to 0.85", s.Beta1, "")
	add("ACI 318-19 21.2.2.1", "εty", "fy/Es", s.EpsTy, "")

	// Section and reinforcement.
	if s.Shape == Circular {
		add("Section", "Ag", "πD²/4", s.AgMM2, "mm2")
	} else {
		add("Section", "Ag", "b·h", s.AgMM2, "mm2")
	}
	minBars := "at least 4 bars within rectangular ties"
	if s.Shape == Circular {
		minBars = "at least 6 bars around a round section"
	}
	barStd, soft := "ASTM A615 (bar dimensions from memory)", ""
	if s.Series == SeriesSI {
		barStd = "ASTM A615M (bar dimensions from memory)"
		soft = fmt.Sprintf("; soft-metric name of the inch-pound %s (ASTM A615M, from memory)", s.Bar.Name())
	}
	add("ACI 318-19 10.7.3.1", "bars", fmt.Sprintf("%d %s, %s%s", s.NBars, s.BarName(s.Bar), minBars, soft), float64(s.NBars), "")
	add(barStd, "Ast", fmt.Sprintf("%d × %.0f mm²", s.NBars, s.Bar.AreaMM2), s.AstMM2, "mm2")
	add("ACI 318-19 10.6.1.1", "ρg", "Ast/Ag, from 0.01 to 0.08", s.Rho, "")
	add("ACI 318-19 20.5.1.3.1", "cover", "clear cover to the ties or spiral", s.CoverMM, "mm")
	add("ACI 318-19 25.2.3", "clear spacing", fmt.Sprintf("at least max(1.5 in, 1.5db, 4/3 × 3/4 in aggregate) = %.1f mm", s.MinClearMM), s.ClearMM, "mm")
	if s.Transverse == Tied {
		add("ACI 318-19 25.7.2.2", "tie", s.BarName(s.Tie)+" ties ("+s.tieRuleWords()+")", s.Tie.DiaMM, "mm")
		add("ACI 318-19 25.7.2.1", "tie spacing", "min(16db, 48dtie, least dimension)", s.TieSpaceMM, "mm")
	} else {
		add("ACI 318-19 Eq. 25.7.3.3", "ρs,min", "0.45(Ag/Ach − 1)f'c/fyt", s.RhoSMin, "")
		add("ACI 318-19 25.7.3.1", "spiral pitch", s.BarName(s.Tie)+" spiral, clear spacing 1 in to 3 in", s.TieSpaceMM, "mm")
		add("ACI 318-19 25.7.3.3", "ρs", "4Asp/(Dch·s)", s.RhoS, "")
	}

	// Axial limit.
	add("ACI 318-19 Eq. 22.4.2.2", "P0", "0.85f'c(Ag − Ast) + fy·Ast", s.P0*kN, "kN")
	if s.Transverse == Spiral {
		add("ACI 318-19 Table 22.4.2.1(b)", "Pn,max", "0.85P0 (spiral)", s.PnMax*kN, "kN")
		add("ACI 318-19 Table 21.2.2", "φ", "0.75 compression-controlled with a spiral, to 0.90 tension-controlled", s.PhiC, "")
	} else {
		add("ACI 318-19 Table 22.4.2.1(a)", "Pn,max", "0.80P0 (ties)", s.PnMax*kN, "kN")
		add("ACI 318-19 Table 21.2.2", "φ", "0.65 compression-controlled with ties, to 0.90 tension-controlled", s.PhiC, "")
	}
	add("ACI 318-19 22.4.2.1", "φPn,max", "φ·Pn,max", s.PhiPnMax*kN, "kN")
	for ax := AxisX; ax <= AxisY; ax++ {
		cb := EpsCU * s.dt(ax) / (EpsCU + s.EpsTy)
		b := s.PointAt(ax, cb)
		add("ACI 318-19 22.2", "Pn,b ("+ax.String()+")", "balanced point by strain compatibility: εcu = 0.003, εt = εty, Whitney block", b.Pn*kN, "kN")
		add("ACI 318-19 22.2", "Mn,b ("+ax.String()+")", "moment at the balanced point about the centroid", b.Mn*kNm, "kN·m")
	}

	// Slenderness about each axis in turn.
	k := c.KFactor()
	kWords := c.Ends.KWords(c.NonswayK1)
	if c.K != 0 {
		kWords = "typed"
	}
	limit := c.SlendernessLimit()
	limWords := "34 + 12(M1/M2), at most 40, nonsway"
	limClause := "ACI 318-19 6.2.5.1(b),(c)"
	if c.Ends.Sway() {
		limWords, limClause = "22, sway ends", "ACI 318-19 6.2.5.1(a)"
	}
	lus := [2]float64{c.LuXMM, c.LuYMM}
	for ax := AxisX; ax <= AxisY; ax++ {
		a := &r.Axes[ax]
		n := " (" + ax.String() + ")"
		a.Axis, a.LuMM, a.K, a.RMM, a.Limit, a.Sway = ax, lus[ax], k, s.R[ax], limit, c.Ends.Sway()
		var by limitBy
		a.KLR, a.Slender, a.PhiPn, by = s.axisStrength(ax, lus[ax], &c)
		a.Limited, a.By14 = by != byAxial, by == bySecondOrder
		if s.Shape == Circular {
			add("ACI 318-19 6.2.5.2(b)", "r"+n, "0.25D", s.R[ax], "mm")
		} else if ax == AxisX {
			add("ACI 318-19 6.2.5.2(a)", "r"+n, "0.3h", s.R[ax], "mm")
		} else {
			add("ACI 318-19 6.2.5.2(a)", "r"+n, "0.3b", s.R[ax], "mm")
		}
		add("Effective length", "k"+n, kWords, k, "")
		add("ACI 318-19 6.2.5.1", "k·lu/r"+n, fmt.Sprintf("%.2f × %.0f mm / %.1f mm", k, lus[ax], s.R[ax]), a.KLR, "")
		add(limClause, "limit"+n, limWords, limit, "")
		if tooSlender(a.KLR) {
			add("ACI 318-19 6.2.6", "method"+n, "k·lu/r above 100: moment magnification not permitted; second-order analysis required", a.KLR, "")
			r.Warnings = append(r.Warnings, fmt.Sprintf("k·lu/r = %.0f %s exceeds 100: the moment magnifier method does not apply (ACI 318-19 6.2.6); a second-order analysis is needed and no strength is given.", a.KLR, s.axisName(ax)))
			continue
		}
		if !a.Slender {
			add("ACI 318-19 6.2.5.1", "φPn"+n, "slenderness neglected: φPn,max", a.PhiPn*kN, "kN")
			continue
		}
		a.Mag = s.Magnify(ax, a.PhiPn, lus[ax], &c)
		a.PhiMn = s.PhiMnAt(ax, a.PhiPn)
		a.EI = s.EIUsed(ax, lus[ax], &c)
		chosen := ""
		if c.EI == EILargest {
			chosen = fmt.Sprintf("; (%s) gives the largest strength of (a), (b) and (c), each of which 6.6.4.4.4 permits", a.EI.Letter())
		}
		switch a.EI {
		case EIWithSteel:
			add("ACI 318-19 Eq. 6.6.4.4.4b", "(EI)eff"+n, fmt.Sprintf("(0.2EcIg + EsIse)/(1 + βdns), βdns = %.2f%s", c.BetaDns, chosen), a.Mag.EIeff*1e-9, "kN·m2")
		case EIMember:
			add("ACI 318-19 Table 6.6.3.1.1(b)", "I/Ig"+n, fmt.Sprintf("(0.80 + 25Ast/Ag)(1 − Mu/(Pu·h) − 0.5Pu/P0), 0.35 to 0.875, Mu = Pu·e0, at Pu = %.0f kN (from memory)", a.PhiPn*kN), s.MemberI(ax, a.PhiPn), "")
			add("ACI 318-19 Eq. 6.6.4.4.4c", "(EI)eff"+n, fmt.Sprintf("EcI/(1 + βdns), βdns = %.2f%s", c.BetaDns, chosen), a.Mag.EIeff*1e-9, "kN·m2")
		default:
			add("ACI 318-19 Eq. 6.6.4.4.4a", "(EI)eff"+n, fmt.Sprintf("0.4EcIg/(1 + βdns), βdns = %.2f%s", c.BetaDns, chosen), a.Mag.EIeff*1e-9, "kN·m2")
		}
		add("ACI 318-19 Eq. 6.6.4.4.2", "Pc"+n, "π²(EI)eff/(k·lu)²", a.Mag.Pc*kN, "kN")
		if a.Sway {
			add("ACI 318-19 6.6.4.6.2(b)", "story"+n, "sway ends: the column is treated as its own story, ΣPu = Pu and ΣPc = Pc; βdns used in (EI)eff in place of βds (conservative for its sustained gravity load)", 1, "")
		} else {
			add("ACI 318-19 6.6.4.5.4", "Cm"+n, "1.0 with the minimum moment", 1, "")
		}
		add("ACI 318-19 Eq. 6.6.4.5.4", "M2,min"+n, fmt.Sprintf("Pu(0.6 in + 0.03h), h = %.0f mm, at Pu = %.0f kN", s.Depth[ax], a.PhiPn*kN), a.Mag.M2min*kNm, "kN·m")
		if a.Sway {
			add("ACI 318-19 Eq. 6.6.4.6.2b", "δs"+n, "1/(1 − ΣPu/(0.75ΣPc)) ≥ 1", a.Mag.Delta, "")
		} else {
			add("ACI 318-19 Eq. 6.6.4.5.2", "δ"+n, "Cm/(1 − Pu/(0.75Pc)) ≥ 1", a.Mag.Delta, "")
		}
		add("ACI 318-19 6.6.4.5.1", "Mc"+n, "δ·M2,min", a.Mag.Mc*kNm, "kN·m")
		add("ACI 318-19 22.2, Table 21.2.2", "φMn"+n, "φ-reduced interaction diagram at Pu", a.PhiMn*kNm, "kN·m")
		switch {
		case a.By14:
			add("ACI 318-19 6.2.5.3", "φPn"+n, "δ held to 1.4: Pu = 0.75Pc(1 − 1/1.4), with δ·M2,min inside the diagram", a.PhiPn*kN, "kN")
		case a.Limited:
			add("ACI 318-19 6.6.4", "φPn"+n, "largest Pu < 0.75Pc with (Pu, δ·M2,min) inside the φ-reduced diagram", a.PhiPn*kN, "kN")
		default:
			add("ACI 318-19 6.6.4", "φPn"+n, "δ·M2,min fits inside the diagram at φPn,max", a.PhiPn*kN, "kN")
		}
	}
	r.Governs = AxisX
	if r.Axes[AxisY].PhiPn < r.Axes[AxisX].PhiPn || r.Mode == SlenderY || r.Mode == SwayY || r.Mode == SecondOrderY {
		r.Governs = AxisY
	}
	if g := &r.Axes[r.Governs]; r.Permitted && g.Slender && g.Mag.Delta > 1.4*(1+1e-9) {
		r.Warnings = append(r.Warnings, fmt.Sprintf("%s: the second-order moment is %.2f times the first-order one, more than the 1.4 of ACI 318-19 6.2.5.3; the bracing and stiffness of the frame need checking.", s.axisName(r.Governs), g.Mag.Delta))
	}
	if r.Permitted {
		add("Governing", "φPn", s.ModeWords(r.Mode), r.PhiPn*kN, "kN")
	} else {
		add("ACI 318-19 6.2.6", "φPn", "not permitted", 0, "kN")
	}
	r.Steps = st
	r.Summary = s.summary(&r)
	return r, nil
}

// dt returns the depth of the extreme tension bar for bending about an axis, mm.
func (s *Section) dt(ax Axis) float64 {
	k := 1 - int(ax)
	d := 0.0
	for _, p := range s.BarsXY {
		d = math.Max(d, s.Depth[ax]/2-p[k])
	}
	return d
}

// summary writes one plain sentence on what governs.
func (s *Section) summary(r *Result) string {
	g := &r.Axes[r.Governs]
	switch r.Mode {
	case NotPermitted:
		return fmt.Sprintf("Not permitted: at k·lu/r = %.0f the column is too slender for the simplified moment magnifier method (above 100, ACI 318-19 6.2.6); it needs a second-order analysis.", r.KLR)
	case Crushing:
		x, y := &r.Axes[AxisX], &r.Axes[AxisY]
		if !x.Slender && !y.Slender {
			return fmt.Sprintf("Crushing governs: the column is short (k·lu/r = %.0f, limit %.0f), so slenderness is neglected and its strength is the ACI 318-19 axial limit φPn,max.", r.KLR, x.Limit)
		}
		d := math.Max(x.Mag.Delta, y.Mag.Delta)
		return fmt.Sprintf("Crushing governs: the column is slender (k·lu/r = %.0f, limit %.0f) but its minimum moment magnified by δ = %.2f still fits inside the interaction diagram at the axial limit φPn,max.", r.KLR, x.Limit, d)
	case SecondOrderX, SecondOrderY:
		return fmt.Sprintf("Slenderness governs (%s, k·lu/r = %.0f): the load is held where the magnifier reaches 1.4, the most ACI 318-19 6.2.5.3 allows, at %.0f%% of the axial limit.", s.axisName(r.Governs), g.KLR, 100*r.PhiPn/s.PhiPnMax)
	case SwayX, SwayY:
		return fmt.Sprintf("Slenderness governs (%s, k·lu/r = %.0f): with the top free to sway the column acts as its own story, and the minimum moment magnified by δs = %.2f meets the interaction diagram at %.0f%% of the axial limit.", s.axisName(r.Governs), g.KLR, g.Mag.Delta, 100*r.PhiPn/s.PhiPnMax)
	}
	return fmt.Sprintf("Slenderness governs (%s, k·lu/r = %.0f): the minimum moment magnified by δ = %.2f meets the interaction diagram at %.0f%% of the axial limit.", s.axisName(r.Governs), g.KLR, g.Mag.Delta, 100*r.PhiPn/s.PhiPnMax)
}

// tieRuleWords states the tie size rule of ACI 318-19 25.7.2.2 in the
// section's bar names: inch-pound, or soft metric for SI sizes.
func (s *Section) tieRuleWords() string {
	n := func(size int) string { return s.BarName(Bar{Size: size}) }
	return n(3) + " for bars " + n(10) + " and smaller, " + n(4) + " for " + n(11) + ", " + n(14) + ", " + n(18)
}
