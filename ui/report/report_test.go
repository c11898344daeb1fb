package report

import (
	"bytes"
	"errors"
	"flag"
	"image/png"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
	"go.uber.org/goleak"

	"upright/ui/model"
	"upright/ui/schemefile"
	"upright/ui/units"
)

var update = flag.Bool("update", false, "rewrite testdata/report/page1.png from the demo scheme")

func TestMain(m *testing.M) {
	goleak.VerifyTestMain(m)
}

// reportDate is the fixed date printed on test reports.
var reportDate = time.Date(2026, time.March, 2, 10, 0, 0, 0, time.UTC)

func schemePath(name string) string {
	return filepath.Join("..", "..", "testdata", "schemes", name+".upright.json")
}

// newModel opens a shipped scheme file and builds its model.
func newModel(t testing.TB, name string) *model.Model {
	t.Helper()
	sc, err := schemefile.Load(schemePath(name))
	require.NoError(t, err)
	m, err := model.New(sc)
	require.NoError(t, err)
	return m
}

// writePDF writes the report of m to a temporary file and returns its path.
func writePDF(t testing.TB, m *model.Model, opt Options) string {
	t.Helper()
	if opt.Date.IsZero() {
		opt.Date = reportDate
	}
	if opt.Version == "" {
		opt.Version = "test"
	}
	var buf bytes.Buffer
	require.NoError(t, Write(&buf, m, opt))
	require.True(t, bytes.HasPrefix(buf.Bytes(), []byte("%PDF-")), "a PDF")
	path := filepath.Join(t.TempDir(), "report.pdf")
	require.NoError(t, os.WriteFile(path, buf.Bytes(), 0o644))
	return path
}

var spaces = regexp.MustCompile(`\s+`)

// pdfText extracts a PDF's text in drawing order, white space collapsed, so
// that a table cell wrapped over two lines reads as one phrase. It skips the
// test when poppler's pdftotext is not installed.
func pdfText(t testing.TB, path string) string {
	t.Helper()
	bin, err := exec.LookPath("pdftotext")
	if err != nil {
		t.Skip("pdftotext (poppler-utils) is not installed; cannot read the report back")
	}
	out, err := exec.Command(bin, "-raw", "-enc", "UTF-8", path, "-").Output()
	require.NoError(t, err)
	return spaces.ReplaceAllString(string(out), " ")
}

func TestReportContainsInputsBestSizesAndCautions(t *testing.T) {
	for _, name := range []string{"demo", "pavilion", "transfer", "hut"} {
		t.Run(name, func(t *testing.T) {
			m := newModel(t, name)
			text := pdfText(t, writePDF(t, m, Options{}))
			sc := m.Scheme
			s := sc.Setting

			// Title block and inputs, in both unit systems.
			assert.Contains(t, text, sc.Name)
			assert.Contains(t, text, "2 March 2026")
			assert.Contains(t, text, units.Length(s.LengthMM, units.US))
			assert.Contains(t, text, units.Length(s.LengthMM, units.SI))
			assert.Contains(t, text, forceText(m.Loads.DemandN, units.US))
			assert.Contains(t, text, forceText(m.Loads.DemandN, units.SI))
			assert.Contains(t, text, string(s.Ends))
			if sc.Load.Mode == model.LoadTakedown {
				assert.Contains(t, text, units.Area(sc.Load.TributaryM2, units.US))
				assert.Contains(t, text, units.Area(sc.Load.TributaryM2, units.SI))
				assert.Contains(t, text, units.Pressure(sc.Load.SnowKPa, units.System(sc.Units)))
				gov := m.Loads.Combos[m.Loads.Governing]
				assert.Contains(t, text, gov.Name+" (governs)")
			}

			// The best working size of every family, and the best overall.
			res, err := m.Evaluate(t.Context(), s)
			require.NoError(t, err)
			require.NotEmpty(t, res.Families, "the materials are registered")
			for fi := range res.Families {
				if b := res.Families[fi].Best(); b != nil {
					assert.Contains(t, text, b.Static.Designation, "best size of %s", m.Families[fi].Name())
				}
			}
			if b := res.BestOverall(); b != nil {
				assert.Contains(t, text, "the best working column overall is "+b.Static.Designation)
			}

			// Code editions, method and self-weight assumptions.
			for _, code := range []string{"AISC 360-22", "ACI 318-19", "NDS 2018", "ASCE 7-22"} {
				assert.Contains(t, text, code)
			}
			if s.Method == model.ASD {
				assert.Contains(t, text, "Pn/Ω")
			} else {
				assert.Contains(t, text, "φPn")
			}
			assert.Contains(t, text, "K = ")
			assert.Contains(t, text, "Self-weight:")

			// The cautions, short and full, are printed.
			assert.Contains(t, text, model.Caution)
			for _, para := range strings.Split(model.CautionFull, "\n") {
				para = strings.TrimSpace(strings.TrimPrefix(strings.TrimSpace(para), "- "))
				if para != "" {
					assert.Contains(t, text, spaces.ReplaceAllString(para, " "))
				}
			}
			// The special characters survive in the embedded font.
			for _, r := range []string{"×", "≤", "²"} {
				assert.Contains(t, text, r)
			}
		})
	}
}

func TestPaperFollowsTheUnitSystemAndFontsAreEmbedded(t *testing.T) {
	for _, c := range []struct {
		name     string
		mediaBox string // fpdf's page size in points: Letter 8.5 × 11 in, A4 210 × 297 mm
	}{
		{"demo", "/MediaBox [0 0 612.00 792.00]"},
		{"pavilion", "/MediaBox [0 0 595.28 841.89]"},
	} {
		m := newModel(t, c.name)
		var buf bytes.Buffer
		require.NoError(t, Write(&buf, m, Options{Date: reportDate}))
		pdf := buf.String()
		assert.Contains(t, pdf, c.mediaBox, c.name)
		assert.Contains(t, pdf, "/FontFile2", "TrueType font program embedded")
		assert.NotContains(t, pdf, "/BaseFont /Helvetica", "no unembedded core font")
		assert.Contains(t, pdf, "/Subtype /Image", "the chart is embedded as an image")
	}
}

func TestFontCoversTheSymbols(t *testing.T) {
	for _, r := range "φΩ×≤≥²³βλα→·–—°" {
		assert.True(t, covered(r), "Liberation Sans draws %c", r)
	}
	assert.Equal(t, "Tower ? A ? B", printable("Tower \U0001F3D7 A \u0007 B"), "runes the font lacks become ?")
	assert.Equal(t, "φPn ≤ 1.00", printable("φPn ≤ 1.00"))
}

func TestReportWithoutFamilies(t *testing.T) {
	// As in a build with no material registered: a model with no families.
	sc := model.DefaultScheme()
	sc.Name = "Empty build"
	ls, err := model.Summarize(sc.Load, sc.Setting.Method)
	require.NoError(t, err)
	m := &model.Model{Scheme: sc, Loads: ls}
	path := writePDF(t, m, Options{})
	text := pdfText(t, path)
	assert.Contains(t, text, "Empty build")
	assert.Contains(t, text, "nothing to compare")
	assert.Contains(t, text, "No material family is available, so there is no chart.")
	assert.Contains(t, text, model.Caution)

	var buf bytes.Buffer
	require.NoError(t, WriteCSV(&buf, m, CSVOptions{All: true}))
	assert.Equal(t, strings.Join(CSVHeader(units.US), ",")+"\r\n", buf.String(), "only the header")
}

func TestFullCrossoversOption(t *testing.T) {
	m := newModel(t, "hut")
	short := pdfText(t, writePDF(t, m, Options{}))
	full := pdfText(t, writePDF(t, m, Options{FullCrossovers: true}))
	assert.NotContains(t, short, "Every change of best size within a family")
	assert.Contains(t, full, "Every change of best size within a family")
	assert.Contains(t, full, ": the best size changes from ")
}

func TestOptionsAreChecked(t *testing.T) {
	m := newModel(t, "demo")
	for _, c := range []struct {
		opt  Options
		want string
	}{
		{Options{TopN: 51}, "report TopN: 51 is not accepted"},
		{Options{TopN: -1}, "report TopN: -1 is not accepted"},
		{Options{ChartDPI: 5000}, "report chart DPI: 5000 is not accepted"},
		{Options{Range: model.Range{FromMM: 5000, ToMM: 4000}}, "report range"},
		{Options{Range: model.Range{FromMM: 100, ToMM: 4000}}, "report range"},
	} {
		err := Write(&bytes.Buffer{}, m, c.opt)
		assert.ErrorContains(t, err, c.want)
	}
	assert.ErrorContains(t, Write(&bytes.Buffer{}, nil, Options{}), "no model")
	assert.ErrorContains(t, Write(nil, m, Options{}), "no writer")
}

type failingWriter struct{}

func (failingWriter) Write([]byte) (int, error) { return 0, errors.New("disk full (injected)") }

func TestWriteErrorsAreReturned(t *testing.T) {
	m := newModel(t, "pavilion")
	err := Write(failingWriter{}, m, Options{Date: reportDate})
	assert.ErrorContains(t, err, "disk full (injected)")
	err = WriteCSV(failingWriter{}, m, CSVOptions{})
	assert.ErrorContains(t, err, "disk full (injected)")
}

// TestPageOne renders page 1 of the demo report to an image and checks it
// looks like a printed page; with -update it also stores the image as
// testdata/report/page1.png.
func TestPageOne(t *testing.T) {
	bin, err := exec.LookPath("pdftoppm")
	if err != nil {
		t.Skip("pdftoppm (poppler-utils) is not installed; cannot render the report")
	}
	m := newModel(t, "demo")
	path := writePDF(t, m, Options{Version: "0.1.0"})
	prefix := filepath.Join(t.TempDir(), "page")
	out, err := exec.Command(bin, "-png", "-r", "80", "-f", "1", "-l", "1", "-singlefile", path, prefix).CombinedOutput()
	require.NoError(t, err, string(out))
	data, err := os.ReadFile(prefix + ".png")
	require.NoError(t, err)
	img, err := png.Decode(bytes.NewReader(data))
	require.NoError(t, err)
	b := img.Bounds()
	assert.InDelta(t, 11.0/8.5, float64(b.Dy())/float64(b.Dx()), 0.01, "a Letter page")
	dark := 0
	for y := b.Min.Y; y < b.Min.Y+b.Dy()/5; y++ {
		for x := b.Min.X; x < b.Max.X; x++ {
			r, g, bl, _ := img.At(x, y).RGBA()
			if r+g+bl < 3*0x4000 {
				dark++
			}
		}
	}
	assert.Greater(t, dark, 2000, "the title block is printed")
	if *update {
		dst := filepath.Join("..", "..", "testdata", "report", "page1.png")
		require.NoError(t, os.MkdirAll(filepath.Dir(dst), 0o755))
		require.NoError(t, os.WriteFile(dst, data, 0o644))
	}
}
