package ui

import (
	"slices"
	"strings"
	"testing"

	"fyne.io/fyne/v2/widget"
	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

// TestCompositeSwitchAndOptions checks the window's composite switch and
// options: the filled families appear in the table, a typed fill f'c
// reaches the scheme, an absurd one is named with its range, and choosing
// no family is refused with a message.
func TestCompositeSwitchAndOptions(t *testing.T) {
	if !slices.Contains(model.Materials(), "composite") {
		t.Skip("composite is not registered in this build")
	}
	h := newHarness(t, DemoScheme())
	h.settle()
	h.ui(func() {
		require.NotNil(t, h.w.inputs.matChecks["composite"])
		found := false
		for _, r := range h.w.results.rows {
			found = found || h.w.snap.Model.Families[r.Family].Material() == "composite"
		}
		assert.True(t, found, "the demo shows the filled families")
	})
	h.typeInto("fill f'c", "6 ksi")
	h.settle()
	h.ui(func() {
		assert.InDelta(t, 41.37, h.w.st.Valid.Composite.FillFcMPa, 0.01)
		for _, r := range h.w.results.rows {
			if h.w.snap.Model.Families[r.Family].Material() == "composite" {
				assert.Contains(t, r.Static.Designation, "filled, 6 ksi")
			}
		}
	})
	h.typeInto("fill f'c", "12 ksi")
	h.settle()
	h.ui(func() {
		assert.Contains(t, h.w.st.FieldError("fill f'c"), "3,000 to 10,000 psi")
		h.w.inputs.opts.composite.families.SetSelected([]string{"Filled HSS round"})
	})
	h.typeInto("fill f'c", "")
	h.settle()
	h.ui(func() {
		assert.Equal(t, []string{"Filled HSS round"}, h.w.st.Valid.Composite.Families)
		h.w.inputs.opts.composite.families.SetSelected(nil)
		assert.True(t, h.w.inputs.opts.composite.problem.Visible())
		h.w.inputs.matChecks["composite"].SetChecked(false)
		assert.Equal(t, "", h.w.status.BannerText())
	})
	h.settle()
	h.ui(func() {
		for _, r := range h.w.results.rows {
			assert.NotEqual(t, "composite", h.w.snap.Model.Families[r.Family].Material())
		}
	})
}

// TestCompositeRowShowsItsCalculation checks selecting a filled tube shows
// its plain "why" and an I2 trace read in US units.
func TestCompositeRowShowsItsCalculation(t *testing.T) {
	if !slices.Contains(model.Materials(), "composite") {
		t.Skip("composite is not registered in this build")
	}
	h := newHarness(t, DemoScheme())
	h.settle()
	var des string
	h.ui(func() {
		for i, r := range h.w.results.rows {
			if h.w.snap.Model.Families[r.Family].Material() == "composite" {
				des = r.Static.Designation
				h.w.results.table.Select(widget.TableCellID{Row: i, Col: 2})
				break
			}
		}
	})
	require.NotEmpty(t, des)
	h.settle()
	h.ui(func() {
		assert.Contains(t, h.w.calc.title.Text, des)
		assert.Contains(t, h.w.calc.plain.Text, "filled with 5 ksi concrete")
		cites := false
		for _, s := range h.w.calc.stepRows {
			_, u := units.Convert(s.Value, s.Unit, units.US)
			assert.NotContains(t, []string{"mm", "MPa", "kN", "N", "mm2", "kN·m²", "kg/m³"}, u, "step %s left in SI", s.Quantity)
			cites = cites || strings.HasPrefix(s.Clause, "AISC 360-22 Eq. I2-")
		}
		assert.True(t, cites, "the trace cites I2 equations")
	})
}
