package chart

import (
	"context"
	"encoding/csv"
	"flag"
	"image"
	"image/png"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/plots"
	"upright/steel"
	"upright/ui/model"
	"upright/ui/schemefile"
	"upright/ui/units"
)

// update regenerates the golden image instead of comparing against it.
var update = flag.Bool("update", false, "rewrite the golden image in ../../testdata/plots")

// planModel loads a scheme from testdata and evaluates it at its length.
func planModel(t testing.TB, name string) (*model.Model, *model.Result) {
	t.Helper()
	sc, err := schemefile.Load(filepath.Join("..", "..", "testdata", "schemes", name+".upright.json"))
	require.NoError(t, err)
	return planEval(t, sc)
}

// planEval builds and evaluates a scheme.
func planEval(t testing.TB, sc model.Scheme) (*model.Model, *model.Result) {
	t.Helper()
	m, err := model.New(sc)
	require.NoError(t, err)
	res, err := m.Evaluate(context.Background(), sc.Setting)
	require.NoError(t, err)
	return m, res
}

// refAreas reads gross areas A (in²) from the AISC Shapes Database v16.0
// extract beside the repository, or returns nil when it is absent. For the
// few pipes whose tabulated A disagrees by more than 0.5 % with π(OD − tdes)
// tdes from the database's own OD and tdes columns, the latter is used (as
// the steel package's reference test does).
func refAreas(t *testing.T) map[string]float64 {
	f, err := os.Open(filepath.Join("..", "..", "..", "shared", "reference", "steel-shapes.csv"))
	if err != nil {
		t.Logf("reference data not found (%v): steel areas are checked against the catalogue only", err)
		return nil
	}
	defer f.Close()
	rows, err := csv.NewReader(f).ReadAll()
	require.NoError(t, err)
	col := map[string]int{}
	for i, h := range rows[0] {
		col[h] = i
	}
	out := map[string]float64{}
	for _, r := range rows[1:] {
		a, err := strconv.ParseFloat(r[col["A"]], 64)
		if err != nil {
			continue
		}
		od, e1 := strconv.ParseFloat(r[col["OD"]], 64)
		td, e2 := strconv.ParseFloat(r[col["tdes"]], 64)
		out[r[col["AISC_Manual_Label"]]] = a
		if r[col["Type"]] == "PIPE" && e1 == nil && e2 == nil {
			// A pipe whose catalogue area is not the tabulated one (the
			// steel package notes which) is drawn from OD and design wall.
			out[r[col["AISC_Manual_Label"]]+" from OD and wall"] = math.Pi * (od - td) * td
		}
	}
	return out
}

// TestDrawnAreasMatchTheCatalogue draws every candidate of every family in
// sheets of twelve and checks that each drawn outline's area, from the drawn
// pixel polygon (shoelace formula) at the sheet's px-per-mm, is within 2 % of
// its catalogue area: steel A (and the AISC Shapes Database v16.0 A when the
// reference data are present), concrete gross area b·h or πD²/4, timber b·d,
// and a filled tube's wall (its steel A).
func TestDrawnAreasMatchTheCatalogue(t *testing.T) {
	ref := refAreas(t)
	sc := model.DefaultScheme()
	m, err := model.New(sc)
	require.NoError(t, err)
	checked, refChecked := 0, 0
	for fi, f := range m.Families {
		for lo := 0; lo < f.Len(); lo += 12 {
			var sheet plots.PlanSheet
			var idx []int
			for i := lo; i < min(lo+12, f.Len()); i++ {
				o, ok := model.OutlineOf(f, i, sc.Setting)
				require.True(t, ok)
				sheet.Sections = append(sheet.Sections, PlanSection(o, f.Material(), f.Static(i), units.US))
				idx = append(idx, i)
			}
			l, err := plots.LayoutPlan(&sheet, plots.DefaultPlanSize)
			require.NoError(t, err)
			k := l.PxPerMM * l.PxPerMM
			for j, i := range idx {
				st := m.Families[fi].Static(i)
				drawn := 0.0
				for _, g := range l.Polygons[j] {
					if g.Kind == plots.PartBody { // a filled tube's wall; its fill is checked in ui/model
						drawn += g.Area() / k
					}
				}
				var want float64
				switch f.Material() {
				case "steel":
					sh, err := steel.Lookup(st.Designation)
					require.NoError(t, err)
					want = sh.A * 25.4 * 25.4
					key := st.Designation
					if sh.Family == steel.Pipe && sh.AreaNote == "" {
						key += " from OD and wall"
					}
					if a, ok := ref[key]; ok {
						assert.InEpsilon(t, a*25.4*25.4, drawn, 0.02, "%s against the AISC Shapes Database", st.Designation)
						refChecked++
					}
				case "concrete":
					b, h := st.FootprintMM[0], st.FootprintMM[1]
					want = b * h
					if strings.Contains(st.Family, "round") {
						want = math.Pi * b * b / 4 // gross area of a round section, ACI 318-19 symbols
					}
				case "composite":
					// The tube's wall against the catalogue tube's area A.
					sh, err := steel.Lookup(strings.SplitN(st.Designation, " filled", 2)[0])
					require.NoError(t, err)
					want = sh.A * 25.4 * 25.4
				default:
					want = st.FootprintMM[0] * st.FootprintMM[1]
				}
				assert.InEpsilon(t, want, drawn, 0.02, "%s %s", f.Name(), st.Designation)
				checked++
			}
		}
	}
	t.Logf("%d outlines checked, %d steel shapes against the AISC Shapes Database", checked, refChecked)
	assert.Greater(t, checked, 300)
	if ref != nil {
		assert.Greater(t, refChecked, 100, "most steel shapes are in the reference data")
	}
}

// TestSectionsFigureFollowsTheResult checks that the figure draws each
// family's best working size, labelled with its size, plan and weight, and
// highlights the selected one.
func TestSectionsFigureFollowsTheResult(t *testing.T) {
	m, res := planModel(t, "demo")
	sel := res.Families[0].Best().Static.Designation
	sh, keys := Sections(m, res, SectionsOptions{Selected: sel})
	require.Len(t, keys, len(sh.Sections))
	n := 0
	for fi := range res.Families {
		if b := res.Families[fi].Best(); b != nil {
			sec := sh.Sections[n]
			assert.Equal(t, Key{b.Family, b.Index}, keys[n])
			assert.Contains(t, b.Static.Designation, sec.Title)
			assert.Contains(t, sec.Lines, units.PlanSize(b.Static.FootprintMM, units.US))
			assert.Contains(t, sec.Lines, units.MassPerLength(b.Static.MassKgPerM, units.US))
			assert.Equal(t, b.Static.Designation == sel, sec.Selected)
			n++
		}
	}
	assert.Equal(t, n, len(sh.Sections))
	assert.InDelta(t, 304.8, sh.ReferenceMM, 1e-9, "1 ft reference square in US units")
	assert.Empty(t, sh.Caution, "the window shows the caution in its status bar")
	sh, _ = Sections(m, res, SectionsOptions{Caution: true})
	assert.Equal(t, model.Caution, sh.Caution, "exports carry the caution")

	sc := m.Scheme
	sc.Units = model.SI
	m2, res2 := planEval(t, sc)
	sh2, _ := Sections(m2, res2, SectionsOptions{})
	assert.InDelta(t, 300, sh2.ReferenceMM, 1e-9, "300 mm reference square in SI units")
}

// TestSectionsCharUnderFire checks that a timber fire rating draws the char
// layer: 1 h, aeff = 1.8 in (NDS 2018 Table 16.2.1A, from memory) on four faces.
func TestSectionsCharUnderFire(t *testing.T) {
	sc := model.DefaultScheme()
	sc.Materials = []string{"timber"}
	sc.Fire.Rating = "1h"
	m, res := planEval(t, sc)
	sh, _ := Sections(m, res, SectionsOptions{})
	require.NotEmpty(t, sh.Sections)
	for _, sec := range sh.Sections {
		var char *plots.PlanPart
		for i := range sec.Parts {
			if sec.Parts[i].Kind == plots.PartChar {
				char = &sec.Parts[i]
			}
		}
		require.NotNil(t, char, sec.Title)
		b, d := sec.WidthMM, sec.DepthMM
		a := 1.8 * 25.4
		want := b*d - (b-2*a)*(d-2*a)
		got := plots.PolygonArea(char.Loops[0]) - plots.PolygonArea(char.Loops[1])
		assert.InEpsilon(t, want, got, 1e-9, sec.Title)
	}
	assert.Contains(t, sh.Note, "charred")
}

// boarded wraps a family so that its candidates carry a fire-protection
// board, as a fire rating gives steel (IBC 722.5.1).
type boarded struct {
	model.Family
	mm float64
}

func (b boarded) Outline(i int, s model.Setting) model.Outline {
	return b.Family.(model.Outliner).Outline(i, s)
}
func (b boarded) ProtectionMM(int, model.Setting) float64 { return b.mm }

// TestSectionsProtectionAdds checks that a protection thickness given by a
// family (a fire rating) widens the drawn section by twice the board at the
// figure's one scale, and is labelled.
func TestSectionsProtectionAdds(t *testing.T) {
	sc := model.DefaultScheme()
	sc.Materials = []string{"steel"}
	m, err := model.New(sc)
	require.NoError(t, err)
	const board = 15.9 // 5/8 in Type X gypsum board, one layer (common practice)
	m.Families[0] = boarded{m.Families[0], board}
	res, err := m.Evaluate(context.Background(), sc.Setting)
	require.NoError(t, err)
	sheet, keys := Sections(m, res, SectionsOptions{})
	require.NotEmpty(t, keys)
	require.Equal(t, 0, keys[0].Family)
	l, err := plots.LayoutPlan(&sheet, plots.DefaultPlanSize)
	require.NoError(t, err)
	for i, sec := range sheet.Sections {
		want := 0.0
		if keys[i].Family == 0 {
			want = board
		}
		assert.InDelta(t, want, sec.ProtectionMM, 1e-12, sec.Title)
		assert.InDelta(t, (sec.WidthMM+2*want)*l.PxPerMM, l.Sections[i].W, 1e-6, sec.Title)
		assert.InDelta(t, (sec.DepthMM+2*want)*l.PxPerMM, l.Sections[i].H, 1e-6, sec.Title)
	}
	assert.Contains(t, sheet.Sections[0].Lines, "board 0.63 in")
	assert.Contains(t, sheet.Note, "fire-protection board")
}

// Golden comparison tolerances, as in the plots package's golden test.
const (
	pixelTolerance = 32
	maxDiffShare   = 0.002
)

// TestSectionsGolden renders the demo scheme's figure at 1200 × 500 and
// compares it with testdata/plots/sections-demo.png.
func TestSectionsGolden(t *testing.T) {
	m, res := planModel(t, "demo")
	sh, _ := Sections(m, res, SectionsOptions{Title: m.Scheme.Name, Caution: true, AtLength: true})
	r, err := plots.NewRaster(1200, 500)
	require.NoError(t, err)
	_, err = r.RenderPlan(&sh)
	require.NoError(t, err)
	path := filepath.Join("..", "..", "testdata", "plots", "sections-demo.png")
	if *update {
		writeImage(t, path, r.Image())
		return
	}
	f, err := os.Open(path)
	require.NoError(t, err, "missing golden image; run go test ./ui/chart/ -run TestSectionsGolden -update")
	defer f.Close()
	want, err := png.Decode(f)
	require.NoError(t, err)
	got := r.Image()
	require.Equal(t, want.Bounds().Size(), got.Bounds().Size())
	diff := 0
	for y := 0; y < got.Bounds().Dy(); y++ {
		for x := 0; x < got.Bounds().Dx(); x++ {
			r1, g1, b1, _ := want.At(x, y).RGBA()
			r2, g2, b2, _ := got.At(x, y).RGBA()
			if chanOff(r1, r2) || chanOff(g1, g2) || chanOff(b1, b2) {
				diff++
			}
		}
	}
	if share := float64(diff) / float64(got.Bounds().Dx()*got.Bounds().Dy()); share > maxDiffShare {
		out := filepath.Join(t.TempDir(), "sections-demo.actual.png")
		writeImage(t, out, got)
		t.Fatalf("%d pixels (%.3f%%) differ; actual written to %s (run with -update to accept)", diff, 100*share, out)
	}
}

// chanOff reports an 8-bit channel difference above the tolerance.
func chanOff(a, b uint32) bool {
	d := int(a>>8) - int(b>>8)
	return d > pixelTolerance || -d > pixelTolerance
}

func writeImage(t *testing.T, path string, img image.Image) {
	t.Helper()
	f, err := os.Create(path)
	require.NoError(t, err)
	require.NoError(t, png.Encode(f, img))
	require.NoError(t, f.Close())
}

// BenchmarkSectionsDemo1200x500 builds and draws the demo scheme's figure
// (eleven sections) at 1200 × 500 into one reused buffer: the work of one
// slider step with the Sections view showing (target: at most 10 ms).
func BenchmarkSectionsDemo1200x500(b *testing.B) {
	m, res := planModel(b, "demo")
	r, err := plots.NewRaster(1200, 500)
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		sh, _ := Sections(m, res, SectionsOptions{})
		if _, err := r.RenderPlan(&sh); err != nil {
			b.Fatal(err)
		}
	}
	b.StopTimer()
	b.ReportMetric(float64(b.Elapsed().Microseconds())/1000/float64(b.N), "ms/render")
}

// plain hides a family's outline, as a material without plan geometry would.
type plain struct{ model.Family }

// TestSectionsNameWhatIsNotDrawn checks that a family without plan geometry
// is named in the note instead of silently left out.
func TestSectionsNameWhatIsNotDrawn(t *testing.T) {
	sc := model.DefaultScheme()
	sc.Materials = []string{"timber"}
	m, err := model.New(sc)
	require.NoError(t, err)
	last := len(m.Families) - 1 // glulam: works at the default length and load
	m.Families[last] = plain{m.Families[last]}
	res, err := m.Evaluate(context.Background(), sc.Setting)
	require.NoError(t, err)
	require.NotNil(t, res.Families[last].Best())
	sheet, keys := Sections(m, res, SectionsOptions{})
	for _, k := range keys {
		assert.NotEqual(t, last, k.Family)
	}
	assert.Contains(t, sheet.Note, "Not drawn (no plan geometry yet): "+m.Families[last].Name()+" ("+res.Families[last].Best().Static.Designation+")")
}
