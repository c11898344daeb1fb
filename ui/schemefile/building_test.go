package schemefile

import (
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
)

func TestBuildingRoundTrip(t *testing.T) {
	for _, u := range []model.Units{model.SI, model.US} {
		sc := model.DefaultScheme()
		sc.Units = u
		b := model.DefaultBuilding()
		b.BaysXMM = []float64{9000, 9000, 7500}
		b.FacadeKNPerM = 6.5
		b.OverhangMM = 1200
		b.ChangeEvery = 3
		b.PlanFamily = "W"
		b.PlanStorey = 2
		sc.Building = &b
		data, err := Marshal(sc)
		require.NoError(t, err)
		back, err := Unmarshal(data)
		require.NoError(t, err, string(data))
		require.NotNil(t, back.Building)
		assert.Equal(t, b, *back.Building, "units %s", u)
	}
}

func TestBuildingAbsentReadsAsBefore(t *testing.T) {
	data, err := Marshal(model.DefaultScheme())
	require.NoError(t, err)
	assert.NotContains(t, string(data), `"building"`)
	sc, err := Unmarshal(data)
	require.NoError(t, err)
	assert.Nil(t, sc.Building)
}

func TestBuildingBadFile(t *testing.T) {
	sc := model.DefaultScheme()
	b := model.DefaultBuilding()
	sc.Building = &b
	data, err := Marshal(sc)
	require.NoError(t, err)
	rows := []struct{ from, to, want string }{
		{`"change_every": 2`, `"change_every": 0`, "building.change_every"},
		{`"bays_x": [`, `"bays_x": ["-3 m", `, "building.bays_x"},
		{`"storeys": [`, `"storeys": ["tall", `, "building.storeys"},
	}
	for _, r := range rows {
		bad := strings.Replace(string(data), r.from, r.to, 1)
		require.NotEqual(t, string(data), bad, r.from)
		_, err := Unmarshal([]byte(bad))
		require.Error(t, err, r.to)
		assert.Contains(t, err.Error(), r.want)
	}
}
