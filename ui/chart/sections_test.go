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
)

// update regenerates the golden image instead of comparing against it.
var update = flag.Bool("update", false, "rewrite the golden image in ../../testdata/plots")

// planModel loads the demo scheme and evaluates it at its length.
func planModel(t testing.TB, name string) (*model.Model, *model.Result) {
	t.Helper()
	sc, err := schemefile.Load(filepath.Join("..", "..", "testdata", "schemes", name+".upright.json"))
	require.NoError(t, err)
	m, err := model.New(sc)
	require.NoError(t, err)
	res, err := m.Evaluate(context.Background(), sc.Setting)
	require.NoError(t, err)
	return m, res
}

func TestScratchRender(t *testing.T) {
	m, res := planModel(t, "demo")
	sh, _ := Sections(m, res, SectionsOptions{Caution: true, Title: m.Scheme.Name})
	r, err := plots.NewRaster(1200, 500)
	require.NoError(t, err)
	_, err = r.RenderPlan(&sh)
	require.NoError(t, err)
	f, _ := os.Create("/tmp/i14-sections.png")
	png.Encode(f, r.Image())
	f.Close()
	_ = image.Point{}
	assert.True(t, true)
}
