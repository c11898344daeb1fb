package schemefile

import (
	"errors"
	"fmt"
	"strconv"

	"upright/ui/model"
	"upright/ui/units"
)

// buildingKey is the optional top-level object of a building; a file
// without it (Marshal leaves it out for a scheme without a building) or
// with null has no building and reads as before.
const buildingKey = "building"

// buildingKeys are the fields of the "building" object.
var buildingKeys = []string{"bays_x", "bays_y", "storeys", "floor_dead", "floor_live", "roof_dead", "roof_live", "snow",
	"occupancy", "live_reduction", "facade", "overhang", "change_every", "plan_family", "plan_storey"}

// omittedTopKeys are the top-level keys the reader accepts that Marshal
// leaves out when the scheme has nothing to put there.
var omittedTopKeys = []string{buildingKey}

// wBuilding is the "building" object as written.
type wBuilding struct {
	BaysX         []string `json:"bays_x"`
	BaysY         []string `json:"bays_y"`
	Storeys       []string `json:"storeys"`
	FloorDead     string   `json:"floor_dead"`
	FloorLive     string   `json:"floor_live"`
	RoofDead      string   `json:"roof_dead"`
	RoofLive      string   `json:"roof_live"`
	Snow          string   `json:"snow"`
	Occupancy     string   `json:"occupancy"`
	LiveReduction bool     `json:"live_reduction"`
	Facade        string   `json:"facade"`
	Overhang      string   `json:"overhang"`
	ChangeEvery   int      `json:"change_every"`
	PlanFamily    string   `json:"plan_family"`
	PlanStorey    int      `json:"plan_storey"`
}

// marshalBuilding writes a scheme's building, nil when it has none.
func marshalBuilding(b *model.Building, sys model.Units) *wBuilding {
	if b == nil {
		return nil
	}
	list := func(xs []float64) []string {
		out := make([]string, len(xs))
		for i, x := range xs {
			out[i] = lengthKind.format(x, sys)
		}
		return out
	}
	facade := lineLoadText(b.FacadeKNPerM, sys)
	return &wBuilding{
		BaysX: list(b.BaysXMM), BaysY: list(b.BaysYMM), Storeys: list(b.StoreysMM),
		FloorDead: pressureKind.format(b.FloorDeadKPa, sys), FloorLive: pressureKind.format(b.FloorLiveKPa, sys),
		RoofDead: pressureKind.format(b.RoofDeadKPa, sys), RoofLive: pressureKind.format(b.RoofLiveKPa, sys),
		Snow: pressureKind.format(b.SnowKPa, sys), Occupancy: b.Occupancy, LiveReduction: b.LiveReduction,
		Facade: facade, Overhang: lengthKind.format(b.OverhangMM, sys), ChangeEvery: b.ChangeEvery,
		PlanFamily: b.PlanFamily, PlanStorey: b.PlanStorey,
	}
}

// building reads the optional "building" object; absent, the scheme has none.
func (r *reader) building(root *node, sc *model.Scheme) error {
	sc.Building = nil
	if v := root.get(buildingKey); v == nil || v.kind == kindNull {
		return nil
	}
	n, p, err := r.sub(root, "", buildingKey, buildingKeys, "the building")
	if err != nil {
		return err
	}
	b := model.DefaultBuilding()
	lengths := func(key, give string) ([]float64, error) {
		ss, err := r.strList(n, p, key, give)
		if err != nil {
			return nil, err
		}
		out := make([]float64, 0, len(ss))
		for i, s := range ss {
			v, err := lengthKind.read(s)
			if err != nil {
				return nil, r.errAt(n.get(key), fmt.Sprintf("%s.%s[%d]", p, key, i), err.Error())
			}
			out = append(out, v)
		}
		return out, nil
	}
	if b.BaysXMM, err = lengths("bays_x", `a list of bay spacings along x, e.g. ["9 m", "9 m"]`); err != nil {
		return err
	}
	if b.BaysYMM, err = lengths("bays_y", `a list of bay spacings along y, e.g. ["7.5 m", "7.5 m"]`); err != nil {
		return err
	}
	if b.StoreysMM, err = lengths("storeys", `a list of storey heights from the ground up, e.g. ["4.2 m", "3.6 m"]`); err != nil {
		return err
	}
	for _, q := range []struct {
		key string
		dst *float64
	}{{"floor_dead", &b.FloorDeadKPa}, {"floor_live", &b.FloorLiveKPa}, {"roof_dead", &b.RoofDeadKPa},
		{"roof_live", &b.RoofLiveKPa}, {"snow", &b.SnowKPa}} {
		if *q.dst, err = r.quantity(n, p, q.key, pressureKind); err != nil {
			return err
		}
	}
	if b.Occupancy, err = r.str(n, p, "occupancy", `"general", "assembly", "storage" or "garage"`); err != nil {
		return err
	}
	if b.LiveReduction, err = r.boolean(n, p, "live_reduction", "true to reduce floor live load by ASCE 7-22 4.7"); err != nil {
		return err
	}
	if n.get("facade") != nil {
		s, err := r.str(n, p, "facade", `a load per metre of edge, e.g. "8 kN/m" or "0.5 kip/ft"`)
		if err != nil {
			return err
		}
		if b.FacadeKNPerM, err = units.ParseLineLoad(s); err != nil {
			return r.errAt(n.get("facade"), p+".facade", err.Error())
		}
	}
	if n.get("overhang") != nil {
		if b.OverhangMM, err = r.quantity(n, p, "overhang", lengthKind); err != nil {
			return err
		}
	}
	if n.get("change_every") != nil {
		if b.ChangeEvery, err = r.integer(n, p, "change_every", "a whole number of storeys from 1 to 60 between size changes"); err != nil {
			return err
		}
	}
	if n.get("plan_family") != nil {
		if b.PlanFamily, err = r.str(n, p, "plan_family", `the family the plan draws, e.g. "W", or "" for the best`); err != nil {
			return err
		}
	}
	if n.get("plan_storey") != nil {
		if b.PlanStorey, err = r.integer(n, p, "plan_storey", "the storey the plan shows, 1 the ground, or 0 for the ground"); err != nil {
			return err
		}
	}
	if err := b.Validate(); err != nil {
		var fe *model.FieldError
		if errors.As(err, &fe) {
			key := buildingFields[fe.Field]
			if key == "" {
				key = fe.Field
			}
			at := n.get(key)
			if at == nil {
				at = n
			}
			return r.errAt(at, p+"."+key, fmt.Sprintf("%s is not accepted; give %s", fe.Value, fe.Accepted))
		}
		return err
	}
	sc.Building = &b
	return nil
}

// buildingFields maps the model's building field names to the object's keys.
var buildingFields = map[string]string{
	"bays-x": "bays_x", "bays-y": "bays_y", "storeys": "storeys", "facade": "facade", "overhang": "overhang",
	"change-every": "change_every", "plan-storey": "plan_storey", "dead": "floor_dead", "live": "floor_live",
	"roof-dead": "roof_dead", "roof-live": "roof_live", "snow": "snow", "occupancy": "occupancy",
}

// lineLoadText writes a load per length in kip/ft for a US scheme when some
// decimal reads back to exactly the same value, else in kN/m (always exact).
func lineLoadText(knm float64, sys model.Units) string {
	if sys == model.US {
		x := knm / units.KNPerMPerKlf
		for prec := 1; prec <= 17; prec++ {
			y, err := strconv.ParseFloat(strconv.FormatFloat(x, 'g', prec, 64), 64)
			if err != nil {
				break
			}
			t := number(y) + " kip/ft"
			if got, err := units.ParseLineLoad(t); err == nil && got == knm {
				return t
			}
		}
	}
	return number(knm) + " kN/m"
}
