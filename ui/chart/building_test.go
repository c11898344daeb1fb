package chart

import (
	"bytes"
	"flag"
	"image"
	"image/draw"
	"image/png"
	"os"
	"path/filepath"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/plots"
	"upright/ui/model"
)

var updateBuilding = flag.Bool("update-building", false, "rewrite testdata/plots/building-plan.png and building-elevation.png")

// handSchedule is the 3 × 2-bay, four-storey building of the model's hand
// checks, in SI units.
func handSchedule(t *testing.T) *model.Schedule {
	sc := model.DefaultScheme()
	sc.Units = model.SI
	b := model.DefaultBuilding()
	b.FacadeKNPerM = 5
	b.PlanFamily = "W"
	sc.Building = &b
	s, err := model.NewSchedule(sc)
	require.NoError(t, err)
	return s
}

// goldenBuilding renders a drawing to PNG and compares it with its
// reference image (a pixel differs when a channel is off by more than 32;
// at most 0.2% may differ, as for the chart's golden images).
func goldenBuilding(t *testing.T, name string, write func(*bytes.Buffer) error) {
	var buf bytes.Buffer
	require.NoError(t, write(&buf))
	got, err := png.Decode(bytes.NewReader(buf.Bytes()))
	require.NoError(t, err)
	rgba := image.NewRGBA(got.Bounds())
	draw.Draw(rgba, rgba.Bounds(), got, got.Bounds().Min, draw.Src)
	path := filepath.Join("..", "..", "testdata", "plots", name)
	if *updateBuilding {
		require.NoError(t, os.WriteFile(path, buf.Bytes(), 0o644))
		return
	}
	f, err := os.Open(path)
	require.NoError(t, err, "missing golden image; run go test ./ui/chart/ -run Building -update-building")
	defer f.Close()
	want, err := png.Decode(f)
	require.NoError(t, err)
	diff := differing(want, rgba)
	total := want.Bounds().Dx() * want.Bounds().Dy()
	assert.LessOrEqual(t, float64(diff)/float64(total), 0.002, "%s: %d pixels differ", name, diff)
}

var buildingGoldenSize = plots.Size{Width: 720, Height: 504, DPI: 96}

func TestBuildingPlanGolden(t *testing.T) {
	s := handSchedule(t)
	fi := PlanFamily(s)
	require.Equal(t, "W", s.Base.Families[fi].Name())
	p := FloorPlan(s, fi, PlanStorey(s))
	// One column at every grid intersection, 4 × 3 lines.
	assert.Len(t, p.Columns, 12)
	goldenBuilding(t, "building-plan.png", func(b *bytes.Buffer) error {
		return plots.WriteFloorPlan(b, plots.PNG, &p, buildingGoldenSize)
	})
}

func TestBuildingElevationGolden(t *testing.T) {
	s := handSchedule(t)
	fi := PlanFamily(s)
	e := Elevation(s, fi)
	require.Len(t, e.Stacks, 4)
	for _, st := range e.Stacks {
		// Sizes change only at storey 3 (every 2 storeys): at most two pieces.
		assert.LessOrEqual(t, len(st.Pieces), 2, st.Name)
		for _, p := range st.Pieces {
			assert.Contains(t, []int{1, 3}, p.From, st.Name)
		}
	}
	goldenBuilding(t, "building-elevation.png", func(b *bytes.Buffer) error {
		return plots.WriteElevation(b, plots.PNG, &e, buildingGoldenSize)
	})
}

func TestBuildingGridNames(t *testing.T) {
	// Common practice: lettered grid lines run A to Z, then AA.
	for k, want := range map[int]string{0: "A", 25: "Z", 26: "AA", 27: "AB"} {
		assert.Equal(t, want, gridName(k))
	}
}
