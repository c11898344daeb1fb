package ui

import (
	"context"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

// TestTableShowsSlendernessLimit: a row past its material's slenderness
// limit (AISC 360-22 E2 note Lc/r 200, for filled tubes too, ACI 318-19
// 6.2.6 k·lu/r 100, NDS 2018 3.7.1.4 le/d 50) carries a visible mark in the slenderness column and its
// reason in the governing column.
func TestTableShowsSlendernessLimit(t *testing.T) {
	sc := model.DefaultScheme()
	sc.Setting.LengthMM, sc.Setting.WeakMM = 9144, 9144 // 30 ft
	sc.Load = model.Load{Mode: model.LoadDirect, DirectN: 90e3}
	m, err := model.New(sc)
	require.NoError(t, err)
	res, err := m.Evaluate(context.Background(), sc.Setting)
	require.NoError(t, err)
	ctx := &cellCtx{m: m, sys: units.US, length: sc.Setting.LengthMM}
	sl, gov := &columns[columnIndex("slenderness")], &columns[columnIndex("governs")]
	seen := map[string]bool{}
	for fi := range res.Families {
		for k := range res.Families[fi].Rows {
			r := &res.Families[fi].Rows[k]
			if r.Limit == "" {
				assert.NotContains(t, sl.cell(ctx, r), "⚠")
				continue
			}
			seen[r.Static.Material] = true
			assert.True(t, strings.HasSuffix(sl.cell(ctx, r), " ⚠"), r.Static.Designation)
			g := gov.cell(ctx, r)
			assert.True(t, strings.Contains(g, "above 200") || strings.Contains(g, "above 50") || strings.Contains(g, "above 100") ||
				strings.Contains(g, "exceeds 50") || strings.Contains(g, "100"), "%s: %q", r.Static.Designation, g)
		}
	}
	assert.True(t, seen["steel"] && seen["concrete"] && seen["timber"] && seen["composite"], "every material shows its mark at 30 ft: %v", seen)
}
