package ui

import (
	"upright/ui/model"
	"upright/ui/units"
)

// DemoScheme returns the scheme the window opens on at its first start: an
// invented one, a column of the double-height reading room of the fictional
// three-storey Alder Row Library, 18 ft from the slab to the mezzanine
// beam, carrying two upper floors and a planted roof from a 30 × 28 ft bay.
func DemoScheme() model.Scheme {
	sc := model.DefaultScheme()
	sc.Name = "Demo: Alder Row Library, reading-room column"
	sc.Units = model.US
	sc.Setting.LengthMM = 18 * units.MMPerFoot
	sc.Setting.WeakMM = sc.Setting.LengthMM
	sc.Setting.Ends = model.PinnedPinned
	sc.Setting.Method = model.LRFD
	sc.Load = model.Load{
		Mode:          model.LoadTakedown,
		TributaryM2:   30 * 28 * units.M2PerFt2,
		Floors:        2,
		FloorDeadKPa:  95 * units.KPaPerPsf,
		FloorLiveKPa:  60 * units.KPaPerPsf,
		RoofDeadKPa:   55 * units.KPaPerPsf,
		RoofLiveKPa:   20 * units.KPaPerPsf,
		SnowKPa:       30 * units.KPaPerPsf,
		LiveReduction: true,
		KLL:           4,
		Occupancy:     model.OccGeneral,
		DirectN:       900 * units.NPerKip,
	}
	sc.SelfWeight = true
	sc.Metric = model.ByWeight
	sc.ReportMap = true // the client report shows where each family wins
	return sc
}
