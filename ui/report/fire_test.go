package report

import (
	"bytes"
	"strconv"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

// The report of a scheme with a rating has a fire section naming each
// method, its limits, and that listed assemblies and the local code
// govern, and shows each family's protected plan.
func TestReportFireSection(t *testing.T) {
	sc := model.DefaultScheme()
	sc.Name = "Fire section check"
	sc.Load = model.Load{Mode: model.LoadDirect, DirectN: 1500e3}
	sc.Fire.Rating = "2h"
	m, err := model.New(sc)
	require.NoError(t, err)
	text := pdfText(t, writePDF(t, m, Options{}))
	for _, s := range []string{
		"Fire resistance", "Fire-resistance rating", "2 h for every material",
		"IBC 2021 722.5.1.2", "ACI/TMS 216.1-14", "NDS 2018 16.1",
		"calculated methods for preliminary comparison", "Listed (tested) assemblies and the local building code govern",
		"Type X gypsum board",
	} {
		assert.Contains(t, text, s)
	}
	res, err := m.Evaluate(t.Context(), sc.Setting)
	require.NoError(t, err)
	for fi := range res.Families {
		b := res.Families[fi].Best()
		if b == nil || m.Families[fi].Material() != "steel" {
			continue
		}
		assert.Contains(t, text, units.PlanSize(b.Static.Fire.FootprintMM, units.US), m.Families[fi].Name())
		assert.Contains(t, text, units.PlanSize(b.Static.Fire.BareFootprintMM, units.US), m.Families[fi].Name())
	}
	// Without a rating there is no fire section.
	bare := newModel(t, "demo")
	text = pdfText(t, writePDF(t, bare, Options{}))
	assert.NotContains(t, text, "Protection for")
}

// The CSV carries the rating, the protection and the bare plan, with the
// protected plan in the plan columns.
func TestCSVFireColumns(t *testing.T) {
	sc := model.DefaultScheme()
	sc.Units = model.SI
	sc.Load = model.Load{Mode: model.LoadDirect, DirectN: 1500e3}
	sc.Fire.Rating = "1h"
	sc.Materials = []string{"steel"}
	m, err := model.New(sc)
	require.NoError(t, err)
	var buf bytes.Buffer
	require.NoError(t, WriteCSV(&buf, m, CSVOptions{}))
	recs := readCSV(t, buf.Bytes())
	head := recs[0]
	col := map[string]int{}
	for i, h := range head {
		col[h] = i
	}
	for _, h := range []string{"fire_rating_h", "fire_system", "fire_provided_h", "bare_width_mm", "bare_depth_mm"} {
		require.Contains(t, col, h)
	}
	require.Greater(t, len(recs), 1)
	for _, r := range recs[1:] {
		assert.Equal(t, "1.0", r[col["fire_rating_h"]])
		assert.Contains(t, r[col["fire_system"]], "Type X gypsum board")
		w, _ := strconv.ParseFloat(r[col["width_mm"]], 64)
		bw, _ := strconv.ParseFloat(r[col["bare_width_mm"]], 64)
		assert.GreaterOrEqual(t, w-bw, 2*15.875-0.02, "protected plan at least one layer each side")
	}
}
