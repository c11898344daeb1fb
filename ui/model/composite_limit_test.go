package model

import (
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// compositeAt finds a filled tube by its steel designation in the families.
func compositeAt(t *testing.T, fams []Family, tube string) (Family, int) {
	t.Helper()
	for _, f := range fams {
		for i := 0; i < f.Len(); i++ {
			if strings.HasPrefix(f.Static(i).Designation, tube+" filled") {
				return f, i
			}
		}
	}
	t.Fatalf("%s not in the filled families", tube)
	return nil, 0
}

// A filled tube whose Lc/r passes 200 carries the same visible mark and the
// reason as a steel column, from the fast path and the trace alike, and
// keeps its strength. HSS6X6X1/4 has rx = ry = 2.34 in (AISC Shapes
// Database v16.0), so Lc/r = 200 at 468 in = 39 ft: 40 ft pinned gives
// 480 / 2.34 = 205 (marked), 38 ft gives 456 / 2.34 = 195 (not marked),
// and 20 ft fixed-free with K = 2.1 (Commentary Table C-A-7.1) gives
// 504 / 2.34 = 215 (marked).
func TestCompositeSlendernessLimitMark(t *testing.T) {
	fams := compositeFams(t, DefaultScheme())
	f, i := compositeAt(t, fams, "HSS6X6X1/4")
	cases := []struct {
		why    string
		s      Setting
		marked bool
	}{
		{"40 ft pinned: 480 / 2.34 = 205", Setting{LengthMM: 40 * 304.8, WeakMM: 40 * 304.8, Ends: PinnedPinned, Method: LRFD}, true},
		{"38 ft pinned: 456 / 2.34 = 195", Setting{LengthMM: 38 * 304.8, WeakMM: 38 * 304.8, Ends: PinnedPinned, Method: LRFD}, false},
		{"20 ft fixed-free, K 2.1: 504 / 2.34 = 215", Setting{LengthMM: 20 * 304.8, WeakMM: 20 * 304.8, Ends: FixedFree, Method: ASD}, true},
		{"40 ft strong axis, braced at 19 ft about the weak: 205 about x", Setting{LengthMM: 40 * 304.8, WeakMM: 19 * 304.8, Ends: PinnedPinned, Method: LRFD}, true},
	}
	for _, c := range cases {
		q := f.Quick(i, c.s)
		d := f.Detail(i, c.s)
		require.True(t, q.Permitted, c.why)
		assert.Positive(t, q.CapacityN, "%s: the strength is still given", c.why)
		mark, why := LimitMark(&q)
		dmark, dwhy := LimitMark(&d.Quick)
		assert.Equal(t, mark, dmark, "%s: fast path and trace agree", c.why)
		assert.Equal(t, why, dwhy, c.why)
		if c.marked {
			assert.Equal(t, LimitMarkText, mark, c.why)
			assert.Equal(t, LimitComposite, why, c.why)
		} else {
			assert.Empty(t, mark, c.why)
		}
	}
}

// Every material has a slenderness limit and a row of assumptions, composite
// included, each row filling every topic.
func TestEveryMaterialHasAssumptionsAndALimit(t *testing.T) {
	as := Assumptions()
	rows := map[string][]string{}
	for _, a := range as {
		require.Len(t, a.Entries, len(AssumptionTopics), a.Material)
		for i, e := range a.Entries {
			assert.NotEmpty(t, e, "%s %s", a.Material, AssumptionTopics[i])
		}
		rows[a.Material] = a.Entries
	}
	limits := map[string]bool{}
	for _, l := range SlendernessLimits {
		limits[l.Material] = true
	}
	for _, m := range Materials() {
		assert.Contains(t, rows, m, "assumptions of %s", m)
		assert.True(t, limits[m], "slenderness limit of %s", m)
	}
	c := rows["composite"]
	require.NotNil(t, c)
	// K as for steel: pinned-pinned 1.00, fixed-free 2.10 (AISC 360-22
	// Commentary Table C-A-7.1).
	assert.Contains(t, c[0], "pinned-pinned 1.00")
	assert.Contains(t, c[0], "fixed-free 2.10")
	assert.Equal(t, strings.SplitN(rows["steel"][0], " (", 2)[0], strings.SplitN(c[0], " (", 2)[0], "the same K as steel")
	assert.Contains(t, c[1], "one strength")
	// Fill at 145 lb/ft³ (common practice) = 2,323 kg/m³ (1 lb/ft³ = 16.0185 kg/m³).
	assert.Contains(t, c[2], "145 lb/ft³ (2,323 kg/m³")
	assert.Contains(t, c[3], "twist-braced changes nothing")
	assert.Contains(t, c[4], "200")
	assert.Contains(t, c[4], "from memory")
	assert.Contains(t, AssumptionsText(), "  composite\n")
}
