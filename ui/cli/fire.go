package cli

import (
	"fmt"
	"io"
	"strconv"

	"upright/ui/model"
)

// fireJSON is the "fire" object of a candidate: the fire check with its
// lengths rounded to 0.1 mm, or, with no rating, the bare plan and a
// rating of zero.
func fireJSON(st *model.Static, at *model.FireCheck) model.FireCheck {
	if st.Fire == nil {
		return model.FireCheck{
			System: "none (no fire rating asked for)", OK: true,
			FootprintMM: roundPair(st.FootprintMM), BareFootprintMM: roundPair(st.FootprintMM),
			BareMassKgPerM: round(st.MassKgPerM, 2), BarePlanAreaMM2: round(st.PlanAreaMM2, 0),
		}
	}
	fc := *st.Fire
	if at != nil {
		fc = *at // the check at this length and load
	}
	fc.ProvidedH = round(fc.ProvidedH, 2)
	fc.LayerMM = round(fc.LayerMM, 2)
	fc.ThicknessMM = round(fc.ThicknessMM, 2)
	fc.HeatedPerimeterMM = round(fc.HeatedPerimeterMM, 1)
	fc.BoardKgPerM = round(fc.BoardKgPerM, 2)
	fc.MinDimensionMM = round(fc.MinDimensionMM, 1)
	fc.CoverMM = round(fc.CoverMM, 1)
	fc.CoverRequiredMM = round(fc.CoverRequiredMM, 1)
	fc.FootprintMM = roundPair(fc.FootprintMM)
	fc.BareFootprintMM = roundPair(fc.BareFootprintMM)
	fc.BareMassKgPerM = round(fc.BareMassKgPerM, 2)
	fc.BarePlanAreaMM2 = round(fc.BarePlanAreaMM2, 0)
	return fc
}

func roundPair(p [2]float64) [2]float64 { return [2]float64{round(p[0], 1), round(p[1], 1)} }

// printFireLine says the scheme's fire rating under the header, when one is set.
func printFireLine(w io.Writer, sc model.Scheme) {
	if !sc.Fire.On() {
		return
	}
	fmt.Fprintf(w, "Fire rating %s h for every material (steel: %s; filled tubes exposed by IBC 722.5.1.5 where it applies, else as steel; concrete: %s aggregate): plan, weight and carbon include the protection; sizes that cannot reach it are not permitted\n",
		strconv.FormatFloat(sc.Fire.Hours(), 'f', -1, 64), map[string]string{"board": "gypsum board", "spray": "sprayed material"}[sc.Fire.SteelProtection], sc.Fire.Aggregate)
}
