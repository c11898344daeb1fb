package chart

import (
	"context"
	"flag"
	"image"
	"image/png"
	"os"
	"path/filepath"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/plots"
	"upright/ui/model"
	"upright/ui/schemefile"
	"upright/ui/units"
)

// updateMap rewrites the demo map's golden image instead of comparing with it.
var updateMap = flag.Bool("update-map", false, "rewrite testdata/plots/demo-map.png")

// demoMapPath is the golden image of the demo scheme's map.
var demoMapPath = filepath.Join("..", "..", "testdata", "plots", "demo-map.png")

func demoMap(t *testing.T) (*model.WinMap, model.Scheme) {
	sc, err := schemefile.Load(filepath.Join("..", "..", "testdata", "schemes", "demo.upright.json"))
	require.NoError(t, err)
	g, err := model.ComputeMap(context.Background(), sc, model.DefaultMapSpec(&sc, model.Range{FromMM: 500, ToMM: 12000}), nil)
	require.NoError(t, err)
	return g, sc
}

// TestDemoMapGolden renders the demo scheme's map and compares it with its
// reference image (a pixel differs when a channel is off by more than 32;
// at most 0.2% may differ, as for the chart's golden images).
func TestDemoMapGolden(t *testing.T) {
	g, sc := demoMap(t)
	pm := Map(g, &sc, sc.Name)
	r, err := plots.NewMapRaster(960, 560)
	require.NoError(t, err)
	require.NoError(t, r.RenderMap(&pm))
	if *updateMap {
		f, err := os.Create(demoMapPath)
		require.NoError(t, err)
		require.NoError(t, png.Encode(f, r.Image()))
		require.NoError(t, f.Close())
		return
	}
	f, err := os.Open(demoMapPath)
	require.NoError(t, err, "missing golden image; run go test ./ui/chart/ -run TestDemoMapGolden -update-map")
	defer f.Close()
	want, err := png.Decode(f)
	require.NoError(t, err)
	diff := differing(want, r.Image())
	total := want.Bounds().Dx() * want.Bounds().Dy()
	assert.LessOrEqual(t, float64(diff)/float64(total), 0.002, "%d pixels differ", diff)
}

// differing counts pixels whose channels differ by more than 32 of 255.
func differing(a image.Image, b *image.RGBA) int {
	if a.Bounds().Size() != b.Bounds().Size() {
		return a.Bounds().Dx() * a.Bounds().Dy()
	}
	n := 0
	for y := 0; y < b.Bounds().Dy(); y++ {
		for x := 0; x < b.Bounds().Dx(); x++ {
			r1, g1, b1, _ := a.At(x, y).RGBA()
			r2, g2, b2, _ := b.At(x, y).RGBA()
			if far(r1, r2) || far(g1, g2) || far(b1, b2) {
				n++
			}
		}
	}
	return n
}

func far(a, b uint32) bool {
	d := int(a>>8) - int(b>>8)
	return d > 32 || d < -32
}

// TestMapPicture: the picture's cells, keys and walls follow the model's map,
// in the scheme's units, with the scheme's point and the caution.
func TestMapPicture(t *testing.T) {
	g, sc := demoMap(t)
	pm := Map(g, &sc, "")
	require.NoError(t, pm.Validate())
	assert.Equal(t, model.Caution, pm.Caution)
	assert.Equal(t, "Tributary area per floor (ft²)", pm.YLabel)
	assert.Equal(t, "Unbraced length (ft)", pm.XLabel)
	// 840 ft² typed in the demo scheme (its own point), 18 ft long.
	assert.InDelta(t, 840, pm.Point.Y, 1e-6)
	assert.InDelta(t, 18, pm.Point.X, 1e-6)
	assert.InDelta(t, 210, pm.Y[0], 1e-6) // a quarter of 840 ft²
	require.Greater(t, g.Tie, 0.0, "the demo map uses the scheme's near-tie tolerance")
	assert.Equal(t, "Near-tie kept (within 5%)", pm.TieLabel)
	nx := len(g.LengthsMM)
	walls, ties, timberSteel := 0, 0, 0
	for k, c := range g.Cells {
		assert.Equal(t, c.Shown != c.Family, pm.Ties[k], "cell %d: dot where the strict best is not shown", k)
		if pm.Ties[k] {
			ties++
		}
		if right := k + 1; k%nx+1 < nx {
			assert.Equal(t, c.Shown != g.Cells[right].Shown, pm.Walls[k]&plots.WallRight != 0, "cell %d: wall right", k)
			if a, b := c.Shown, g.Cells[right].Shown; a >= 0 && b >= 0 && pm.Walls[k]&plots.WallRight != 0 {
				if ma, mb := g.Families[a].Material, g.Families[b].Material; (ma == "timber" && mb == "steel") || (ma == "steel" && mb == "timber") {
					timberSteel++
				}
			}
		}
		if pm.Walls[k] != 0 {
			walls++
		}
		if c.Shown < 0 {
			assert.Equal(t, -1, pm.Cells[k])
			continue
		}
		assert.Equal(t, MapKeyLabel(g.Families[c.Shown]), pm.Keys[pm.Cells[k]].Label)
	}
	assert.Positive(t, walls, "the demo map changes family somewhere")
	assert.Positive(t, ties, "the demo map has near-ties at 5%")
	assert.Positive(t, timberSteel, "boundaries between glulam and steel still show")
	t.Logf("%d walled cells (%d between timber and steel), %d near-tie cells of %d", walls, timberSteel, ties, len(g.Cells))
	// Every cell maps back to itself.
	for _, ij := range [][2]int{{0, 0}, {17, 42}, {len(g.Loads) - 1, len(g.LengthsMM) - 1}} {
		i, j := MapCellAt(g, units.US, pm.X[ij[1]], pm.Y[ij[0]])
		assert.Equal(t, ij, [2]int{i, j})
	}
}
