package report

import (
	"context"
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"math"
	"strconv"

	"upright/ui/model"
	"upright/ui/units"
)

// CSVOptions choose what the CSV table holds.
type CSVOptions struct {
	All bool // every candidate, working or not; false lists only the working sizes
}

// CSVHeader returns the header row for a unit system: every column that
// carries a quantity names its unit, e.g. capacity_kip or weight_kg_per_m.
func CSVHeader(sys units.System) []string {
	lu, du, au, fu, wu, mu := "ft", "in", "in2", "kip", "lb_per_ft", "lb"
	if sys == units.SI {
		lu, du, au, fu, wu, mu = "m", "mm", "m2", "kN", "kg_per_m", "kg"
	}
	return []string{
		"material", "family", "designation", "status", "rank",
		"length_" + lu, "width_" + du, "depth_" + du, "plan_area_" + au,
		"weight_" + wu, "column_weight_" + mu, "capacity_" + fu, "demand_" + fu, "utilization",
		"governing", "slenderness", "carbon_kgCO2e", "governing_combination", "slenderness_limit",
		"fire_rating_h", "fire_system", "fire_provided_h", "bare_width_" + du, "bare_depth_" + du,
		"caution",
	}
}

// governingCombination names the load combination with the highest
// utilization for a row ("" when none was checked).
func governingCombination(m *model.Model, r *model.Row, s model.Setting) string {
	for _, c := range m.Checks(r.Family, r.Index, s) {
		if c.Governing {
			return c.Combination
		}
	}
	return ""
}

func num(v float64, decimals int) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return ""
	}
	return strconv.FormatFloat(v, 'f', decimals, 64)
}

// WriteCSV writes the candidate table of m at its scheme's setting as CSV
// (RFC 4180: comma separated, CRLF line ends, fields quoted when they hold
// a comma, quote or line break), in the scheme's unit system: one header row
// (CSVHeader), then each family's candidates in ranked order, working sizes
// first. Rank counts within a family; utilization is empty when the method
// does not permit the candidate; the last column of every row is the
// caution (model.Caution). A model without families writes only the header.
func WriteCSV(w io.Writer, m *model.Model, opt CSVOptions) error {
	if m == nil {
		return errors.New("csv: no model given (nil *model.Model)")
	}
	if w == nil {
		return errors.New("csv: no writer given")
	}
	sc := m.Scheme
	sys := units.System(sc.Units)
	res, err := m.Evaluate(context.Background(), sc.Setting)
	if err != nil {
		return fmt.Errorf("csv: evaluating the scheme: %w", err)
	}
	cw := csv.NewWriter(w)
	cw.UseCRLF = true
	if err := cw.Write(CSVHeader(sys)); err != nil {
		return fmt.Errorf("csv: %w", err)
	}
	lengthV, _ := units.LengthValue(sc.Setting.LengthMM, sys)
	dim := func(mm float64) float64 {
		if sys == units.SI {
			return mm
		}
		return mm / units.MMPerInch
	}
	area := func(mm2 float64) float64 {
		if sys == units.SI {
			return mm2 / 1e6
		}
		return mm2 / units.MM2PerIn2
	}
	wpl := func(kgm float64) float64 {
		if sys == units.SI {
			return kgm
		}
		return kgm / units.KgmPerPlf
	}
	mass := func(kg float64) float64 {
		if sys == units.SI {
			return kg
		}
		return kg / units.KgPerLb
	}
	for fi := range res.Families {
		fr := &res.Families[fi]
		fam := m.Families[fr.Family]
		for i := range fr.Rows {
			r := &fr.Rows[i]
			if !opt.All && !r.OK {
				break // working rows come first
			}
			status := r.Status()
			capV, _ := units.ForceValue(r.CapacityN, sys)
			demV, _ := units.ForceValue(r.DemandN, sys)
			util := ""
			if r.Permitted && !math.IsInf(r.Util, 0) {
				util = num(r.Util, 4)
			}
			governing := r.Governing
			if !r.Permitted && r.Reason != "" {
				governing = r.Reason
			}
			st := r.Static
			rec := []string{
				fam.Material(), fam.Name(), st.Designation, status, strconv.Itoa(i + 1),
				num(lengthV, 3), num(dim(st.FootprintMM[0]), 2), num(dim(st.FootprintMM[1]), 2), num(area(st.PlanAreaMM2), 4),
				num(wpl(st.MassKgPerM), 2), num(mass(st.MassKgPerM*sc.Setting.LengthMM/1000), 1),
				num(capV, 1), num(demV, 1), util, governing, num(r.Slenderness, 1), num(r.CarbonKg, 1),
				governingCombination(m, r, sc.Setting), r.Limit,
			}
			rec = append(rec, fireCSVCells(st, dim)...)
			// Every row carries the caution, so a row copied out of the
			// table still says it is preliminary sizing.
			rec = append(rec, model.Caution)
			if err := cw.Write(rec); err != nil {
				return fmt.Errorf("csv: %w", err)
			}
		}
	}
	cw.Flush()
	if err := cw.Error(); err != nil {
		return fmt.Errorf("csv: %w", err)
	}
	return nil
}
