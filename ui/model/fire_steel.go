package model

import (
	"fmt"
	"math"

	"upright/steel/fire"
)

// BoardOutline is the plan outline of a steel section as the board
// enclosure sees it (fire.Profile, fire.Box or fire.Round).
type BoardOutline = fire.Outline

// Outlines of steel sections for callers outside this file.
const (
	fireBox          = fire.Box
	fireRoundOutline = fire.Round
)

// BoardOutlineOf maps a steel family name to its outline: W and HP are
// I-shaped profiles, round HSS and pipe are round, the other HSS are boxes.
func BoardOutlineOf(family string) (BoardOutline, error) {
	switch family {
	case "W", "HP":
		return fire.Profile, nil
	case "HSS round", "Pipe":
		return fire.Round, nil
	case "HSS square", "HSS rectangular":
		return fire.Box, nil
	}
	return 0, bad("steel family", family, steelFamiliesAccepted)
}

// Gypsum board quantities for the dead load and carbon of the enclosure.
const (
	fireBoardKgPerM3 = fire.BoardDensityPcf * 16.018463 // 50 lb/ft³, the density of the IBC 2021 722.5.1.2 equation (from memory), in kg/m³
	fireSteelLbftPer = 1 / steelKgmPerLbft              // kg/m to lb/ft
)

// ProtectSteel returns st boxed in the fewest layers of 5/8 in Type X gypsum
// board that give a steel column of steelKgPerM (kg/m, the steel alone) and
// the given outline a fire resistance of hours by IBC 2021 722.5.1.2. The
// protected plan is the bare plan plus the board thickness h on every side
// (a round column gets a square box); the board's mass joins st.MassKgPerM
// and its carbon joins st.Constituents. When even fire.MaxLayers layers fall
// short, st.Fire says so and the candidate is not permitted. Other materials
// with a steel shell (filled HSS) may call it with the shell's mass alone,
// which ignores the core and errs on the safe side.
func ProtectSteel(st Static, o BoardOutline, steelKgPerM, hours float64) (Static, error) {
	fc := fireBare(&st, hours)
	a, b := st.FootprintMM[0]/steelMMPerIn, st.FootprintMM[1]/steelMMPerIn
	d, err := fire.HeatedPerimeterIn(o, a, b)
	if err != nil {
		return Static{}, err
	}
	wLbFt := steelKgPerM * fireSteelLbftPer
	layers, minutes, ok, err := fire.Fewest(wLbFt, d, hours)
	if err != nil {
		return Static{}, err
	}
	h := float64(layers) * fire.LayerIn * steelMMPerIn
	fc.Clause = fire.Clause
	fc.Layers, fc.LayerMM, fc.ThicknessMM = layers, fire.LayerIn*steelMMPerIn, h
	fc.HeatedPerimeterMM = d * steelMMPerIn
	fc.ProvidedH = fireRound(minutes / 60)
	fc.OK = ok
	if !ok {
		fc.Reason = fire.ShortReason(minutes, hours)
	}
	box := "box"
	if o == fire.Round {
		box = "square box"
	}
	fc.System = fmt.Sprintf("%s of %d × 5/8 in Type X gypsum board", box, layers)
	// The enclosure adds h on every side; its board is the protected box
	// less the bare box (the void inside a box round a round column is not board).
	w, dd := st.FootprintMM[0], st.FootprintMM[1]
	pw, pd := w+2*h, dd+2*h
	boardKg := (pw*pd - w*dd) * 1e-6 * fireBoardKgPerM3
	fc.BoardKgPerM = boardKg
	fc.FootprintMM = [2]float64{pw, pd}
	fc.trace = func() []Step {
		e, err := fire.Size(wLbFt, d, hours) // the inputs passed Fewest
		if err != nil {
			return nil
		}
		out := make([]Step, 0, len(e.Steps)+3)
		for _, x := range e.Steps {
			out = append(out, fireSteelStep(x))
		}
		if o == fire.Round {
			out = append(out, Step{Clause: fire.Clause, Quantity: "D of a round section",
				Formula: "4·OD, the inside perimeter of the square box the board forms (not the tube's π·OD)", Value: d * steelMMPerIn, Unit: "mm"})
		}
		return append(out,
			Step{Clause: "protected plan", Quantity: "plan with board", Formula: "bare plan + 2h each way", Value: pw * pd, Unit: "mm2"},
			Step{Clause: "board dead load (from memory: 50 lb/ft³)", Quantity: "board mass", Formula: "(protected box − bare box) × 801 kg/m³", Value: boardKg, Unit: "kg/m"},
		)
	}
	return protected(st, fc, CarbonGypsum, boardKg), nil
}

// fireSteelStep converts one enclosure trace line to SI.
func fireSteelStep(x fire.Step) Step {
	out := Step{Clause: x.Clause, Quantity: x.Quantity, Formula: x.Formula, Value: x.Value, Unit: x.Unit}
	switch x.Unit {
	case "in":
		out.Value, out.Unit = x.Value*steelMMPerIn, "mm"
	case "lb/ft":
		out.Value, out.Unit = x.Value*steelKgmPerLbft, "kg/m"
	case "lb/ft/in":
		// W/D stays in the equation's own units (the ratio the IBC equation uses).
	}
	return out
}

// Sprayed material quantities for the dead load and carbon of SFRM.
const fireSprayKgPerM3 = fire.SprayDensityPcf * 16.018463 // 15 lb/ft³ (common practice, from memory), in kg/m³

// protectSteelBy protects a steel column by the scheme's choice: board
// (ProtectSteel) or sprayed material (ProtectSteelSpray).
func protectSteelBy(protection string, st Static, o BoardOutline, steelKgPerM, hours float64) (Static, error) {
	if protection == "spray" {
		return ProtectSteelSpray(st, o, steelKgPerM, hours)
	}
	return ProtectSteel(st, o, steelKgPerM, hours)
}

// ProtectSteelSpray returns st with sprayed fire-resistive material thick
// enough for a fire resistance of hours by IBC 2021 722.5.1.3 (from
// memory). The material follows the contour: its mass is the contour
// perimeter × thickness × 15 lb/ft³ and joins the dead load and carbon; the
// plan grows by the thickness on every side. When the method does not
// apply, st.Fire says why and the candidate is not permitted.
func ProtectSteelSpray(st Static, o BoardOutline, steelKgPerM, hours float64) (Static, error) {
	fc := fireBare(&st, hours)
	a, b := st.FootprintMM[0]/steelMMPerIn, st.FootprintMM[1]/steelMMPerIn
	d, err := fire.ContourPerimeterIn(o, a, b)
	if err != nil {
		return Static{}, err
	}
	wLbFt := steelKgPerM * fireSteelLbftPer
	sp, err := fire.SprayThickness(wLbFt, d, hours)
	if err != nil {
		return Static{}, err
	}
	h := sp.ThicknessIn * steelMMPerIn
	fc.Clause = fire.SprayClause
	fc.ThicknessMM = h
	fc.HeatedPerimeterMM = d * steelMMPerIn
	fc.ProvidedH = fireRound(sp.Minutes / 60)
	fc.OK, fc.Reason = sp.OK, sp.Reason
	fc.System = fmt.Sprintf("sprayed fire-resistive material, %s in (%.0f mm)", fireInches(sp.ThicknessIn), h)
	sprayKg := d * steelMMPerIn * h * 1e-6 * fireSprayKgPerM3
	fc.BoardKgPerM = sprayKg
	w, dd := st.FootprintMM[0], st.FootprintMM[1]
	pw, pd := w+2*h, dd+2*h
	fc.FootprintMM = [2]float64{pw, pd}
	fc.trace = func() []Step {
		out := make([]Step, 0, len(sp.Steps)+2)
		for _, x := range sp.Steps {
			out = append(out, fireSteelStep(x))
		}
		return append(out,
			Step{Clause: "protected plan", Quantity: "plan with sprayed material", Formula: "bare plan + 2h each way", Value: pw * pd, Unit: "mm2"},
			Step{Clause: "sprayed material dead load (from memory: 15 lb/ft³)", Quantity: "sprayed mass", Formula: "contour perimeter × h × 240 kg/m³", Value: sprayKg, Unit: "kg/m"},
		)
	}
	return protected(st, fc, CarbonSFRM, sprayKg), nil
}

// protected returns st with a protection of kg per metre of the carbon kind
// added: the plan fc gives, the mass, the carbon and the check itself.
func protected(st Static, fc *FireCheck, kind string, kg float64) Static {
	out := st
	out.FootprintMM = fc.FootprintMM
	out.PlanAreaMM2 = fc.FootprintMM[0] * fc.FootprintMM[1]
	out.MassKgPerM = st.MassKgPerM + kg
	out.Constituents = append(append(make([]Constituent, 0, len(st.Constituents)+1), st.Constituents...),
		Constituent{Kind: kind, Amount: kg})
	out.Fire = fc
	return out
}

// fireInches writes a thickness in inches as whole sixteenths, e.g. 1-3/8.
func fireInches(x float64) string {
	n := int(math.Round(x * 16))
	whole, rem := n/16, n%16
	if rem == 0 {
		return fmt.Sprint(whole)
	}
	num, den := rem, 16
	for num%2 == 0 {
		num, den = num/2, den/2
	}
	if whole == 0 {
		return fmt.Sprintf("%d/%d", num, den)
	}
	return fmt.Sprintf("%d-%d/%d", whole, num, den)
}
