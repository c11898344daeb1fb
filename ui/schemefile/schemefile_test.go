package schemefile

import (
	"bytes"
	"errors"
	"flag"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
	"go.uber.org/goleak"

	"upright/ui/model"
)

func TestMain(m *testing.M) {
	flag.Parse()
	if f := flag.Lookup("test.fuzz"); f != nil && f.Value.String() != "" {
		// While fuzzing, the fuzzing engine's own goroutines may outlive
		// m.Run; the autosaver tests still check for leaks one by one.
		os.Exit(m.Run())
	}
	goleak.VerifyTestMain(m)
}

// schemeFiles lists the scheme files shipped in testdata/schemes.
func schemeFiles(t testing.TB) []string {
	t.Helper()
	fs, err := filepath.Glob(filepath.Join("..", "..", "testdata", "schemes", "*.upright.json"))
	require.NoError(t, err)
	require.GreaterOrEqual(t, len(fs), 3, "the demo and at least two more schemes ship in testdata/schemes")
	return fs
}

func TestShippedSchemesOpenAndAreCanonical(t *testing.T) {
	for _, f := range schemeFiles(t) {
		t.Run(filepath.Base(f), func(t *testing.T) {
			sc, err := Load(f)
			require.NoError(t, err)
			assert.True(t, strings.HasPrefix(sc.Name, "Demo: "), "shipped schemes are labelled as demos: %q", sc.Name)
			orig, err := os.ReadFile(f)
			require.NoError(t, err)
			out, err := Marshal(sc)
			require.NoError(t, err)
			assert.Equal(t, string(orig), string(out), "the shipped file is exactly what Marshal writes")

			path := filepath.Join(t.TempDir(), "copy"+Extension)
			require.NoError(t, Save(path, sc))
			back, err := Load(path)
			require.NoError(t, err)
			assert.Equal(t, sc, back, "save then open gives back the same scheme")
		})
	}
}

func TestDefaultSchemeRoundTrips(t *testing.T) {
	for _, u := range []model.Units{model.US, model.SI} {
		sc := model.DefaultScheme()
		sc.Units = u
		b, err := Marshal(sc)
		require.NoError(t, err)
		back, err := Unmarshal(b)
		require.NoError(t, err)
		assert.Equal(t, sc, back)
	}
}

func TestMarshalUnits(t *testing.T) {
	sc := model.DefaultScheme()
	sc.Setting.LengthMM, sc.Setting.WeakMM = 4267.2, 4267.2 // 14 ft exactly (1 ft = 304.8 mm)
	sc.Load.DirectN = 1779e3
	b, err := Marshal(sc)
	require.NoError(t, err)
	assert.Contains(t, string(b), `"length": "14 ft"`)
	assert.Contains(t, string(b), `"fy": null`)
	sc.Units = model.SI
	b, err = Marshal(sc)
	require.NoError(t, err)
	assert.Contains(t, string(b), `"length": "4.2672 m"`)
	assert.Contains(t, string(b), `"direct": "1779 kN"`)

	// A value with no exact decimal in the display unit falls back to the model's unit.
	sc.Units = model.US
	sc.Setting.LengthMM = 4000.123456789
	sc.Setting.WeakMM = sc.Setting.LengthMM
	b, err = Marshal(sc)
	require.NoError(t, err)
	back, err := Unmarshal(b)
	require.NoError(t, err)
	assert.Equal(t, sc.Setting.LengthMM, back.Setting.LengthMM)
}

func TestNilCarbonIsWrittenWithDefaults(t *testing.T) {
	sc := model.DefaultScheme()
	sc.Carbon = nil
	b, err := Marshal(sc)
	require.NoError(t, err)
	back, err := Unmarshal(b)
	require.NoError(t, err)
	assert.Equal(t, model.DefaultCarbon(), back.Carbon, "a missing kind is written with the factor the model uses for it")
}

func TestMarshalRefusesWhatUnmarshalRefuses(t *testing.T) {
	cases := []struct {
		name  string
		edit  func(*model.Scheme)
		field string
	}{
		{"length too short", func(s *model.Scheme) { s.Setting.LengthMM = 100 }, "setting.length"},
		{"unknown carbon kind", func(s *model.Scheme) { s.Carbon["aluminium"] = 8 }, "carbon.aluminium"},
		{"name with newline", func(s *model.Scheme) { s.Name = "a\nb" }, "name"},
		{"unknown species", func(s *model.Scheme) { s.Timber.Species = "Oak" }, "timber.species"},
		{"unknown steel family", func(s *model.Scheme) { s.Steel.Families = []string{"Channel"} }, "steel.families"},
		{"inactive takedown NaN", func(s *model.Scheme) { s.Load.SnowKPa = -1 }, "load.takedown.snow"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			sc := model.DefaultScheme()
			c.edit(&sc)
			_, err := Marshal(sc)
			var fe *Error
			require.ErrorAs(t, err, &fe)
			assert.Equal(t, c.field, fe.Field)
		})
	}
}

// demoBytes returns the shipped demo scheme file.
func demoBytes(t testing.TB) []byte {
	b, err := os.ReadFile(filepath.Join("..", "..", "testdata", "schemes", "demo.upright.json"))
	require.NoError(t, err)
	return b
}

func TestBadFiles(t *testing.T) {
	demo := string(demoBytes(t))
	repl := func(old, new string) string {
		require.Contains(t, demo, old)
		return strings.Replace(demo, old, new, 1)
	}
	cases := []struct {
		name    string
		text    string
		field   string // expected Error.Field
		line    int    // expected line; 0 skips the check
		message string // expected substring of the message
	}{
		{"malformed JSON", repl(`"ends": "pinned-pinned",`, `"ends": "pinned-pinned",,`), "", 10, "malformed JSON"},
		{"truncated", demo[:200], "", 0, "ends before the scheme object is complete"},
		{"not an object", `[1, 2]`, "", 1, "holds an array"},
		{"trailing content", demo + "{}", "", strings.Count(demo, "\n") + 1, "unexpected content after the end"},
		{"not a scheme file", repl(`"upright-scheme"`, `"spreadsheet"`), "format", 2, "not an Upright scheme file format"},
		{"no format", repl(`"format": "upright-scheme",`, ``), "format", 1, "missing field"},
		{"newer version", repl(`"version": 2`, `"version": 3`), "version", 3, "format version 3 is newer than this program reads (version 2)"},
		{"version zero", repl(`"version": 2`, `"version": 0`), "version", 3, "0 is not a format version"},
		{"version as text", repl(`"version": 2`, `"version": "2"`), "version", 3, "expected a whole number"},
		{"rating not known", repl(`"rating": "none"`, `"rating": "4h"`), "fire.rating", 0, `"4h" is not accepted; give none, 1h, 1.5h, 2h or 3h`},
		{"aggregate not known", repl(`"aggregate": "siliceous"`, `"aggregate": "basalt"`), "fire.aggregate", 0, "siliceous, carbonate or semi-lightweight"},
		{"rating not a string", repl(`"rating": "none"`, `"rating": 2`), "fire.rating", 0, "expected a string"},
		{"unknown fire field", repl(`"rating": "none"`, `"hours": 2`), "fire.hours", 0, "unknown field; the fields of fire are rating, aggregate"},
		{"timber fire in version 2", repl(`"fire_sides": 4`, `"fire": "1h", "fire_sides": 4`), "timber.fire", 0, "unknown field"},
		{"unknown field", repl(`"length": "18 ft"`, `"lenght": "18 ft"`), "setting.lenght", 8, "unknown field; the fields of setting are length, weak_axis_length"},
		{"unknown top-level field", repl(`"self_weight": true,`, `"self_weight": true, "colour": "red",`), "colour", 0, "unknown field; the fields of the top level are"},
		{"missing field", repl(`"duration": null`, `"fire_sides_again": 4`), "timber.fire_sides_again", 0, "unknown field"},
		{"missing field 2", repl(`,
    "duration": null`, ``), "timber.duration", 0, "missing field (in timber)"},
		{"duplicate key", repl(`"floors": 2,`, `"floors": 2, "floors": 4,`), "", 21, `the key "floors" appears twice`},
		{"wrong type", repl(`"length": "18 ft"`, `"length": 13`), "setting.length", 8, "expected a string; found a number; give a length with its unit"},
		{"no unit", repl(`"length": "18 ft"`, `"length": "13"`), "setting.length", 8, "a unit is required"},
		{"bad unit", repl(`"floor_live": "60 psf"`, `"floor_live": "50 furlongs"`), "load.takedown.floor_live", 23, `cannot read "50 furlongs" as a pressure`},
		{"huge number", repl(`"length": "18 ft"`, `"length": "1e400 ft"`), "setting.length", 8, "cannot read"},
		{"length out of range", repl(`"length": "18 ft"`, `"length": "0.5 ft"`), "setting.length", 8, `"0.5 ft" is not accepted; give a length from 0.3 m (1 ft) to 30 m (98 ft)`},
		{"weak axis longer", repl(`"weak_axis_length": "18 ft"`, `"weak_axis_length": "19 ft"`), "setting.weak_axis_length", 9, "no longer than the unbraced length"},
		{"live out of range", repl(`"floor_live": "60 psf"`, `"floor_live": "900 psf"`), "load.takedown.floor_live", 23, "an unreduced floor live load from 0 to 30 kPa"},
		{"rho out of range", repl(`"rho_max": 0.04`, `"rho_max": 0.2`), "concrete.rho_max", 0, "0.2 is not accepted; give a reinforcement ratio from 0.01 to 0.08"},
		{"bar grade", repl(`"bar_grade": 60`, `"bar_grade": 75`), "concrete.bar_grade", 0, "75 is not accepted; give 60 or 80"},
		{"fractional floors", repl(`"floors": 2,`, `"floors": 2.5,`), "load.takedown.floors", 21, "2.5 is not accepted; give a whole number"},
		{"bad ends", repl(`"pinned-pinned"`, `"hinged"`), "setting.ends", 10, `"hinged" is not accepted`},
		{"unknown material", repl(`"materials": [],`, `"materials": ["aluminium"],`), "materials", 33, `aluminium`},
		{"unknown steel family", repl(`"families": [],`, `"families": ["W", "Channel"],`), "steel.families", 35, `"Channel" is not accepted`},
		{"duplicate steel family", repl(`"families": [],`, `"families": ["W", "W"],`), "steel.families", 35, `"W" is listed twice`},
		{"unknown species", repl(`"DF-L"`, `"Oak"`), "timber.species", 0, `"Oak" is not accepted; give one of DF-L, SP, HF, SPF`},
		{"carbon unit", repl(`"354 kg CO2e/m³"`, `"354 kg CO2e/kg"`), "carbon.concrete", 0, "its unit must be kg CO2e/m³"},
		{"carbon negative", repl(`"354 kg CO2e/m³"`, `"-354 kg CO2e/m³"`), "carbon.concrete", 0, "not accepted"},
		{"unknown carbon kind", repl(`"glulam": "137 kg CO2e/m³"`, `"glulam": "137 kg CO2e/m³", "aluminium": "8 kg CO2e/kg"`), "carbon.aluminium", 0, "unknown field"},
		{"name with tab", repl(`"Demo: Alder Row`, `"Demo:\tAlder Row`), "name", 4, "control character"},
		{"k as text", repl(`"k": null`, `"k": "1.0"`), "setting.k", 11, "expected a number or null"},
		{"k out of range", repl(`"k": null`, `"k": 0.2`), "setting.k", 11, "0.2 is not accepted; give an effective-length factor from 0.5 to 10"},
		{"deep nesting", strings.Repeat("[", 100) + strings.Repeat("]", 100), "", 1, "nesting deeper than"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			_, err := Unmarshal([]byte(c.text))
			var fe *Error
			require.ErrorAs(t, err, &fe)
			assert.Equal(t, c.field, fe.Field, "field; error: %v", err)
			if c.line != 0 {
				assert.Equal(t, c.line, fe.Line, "line; error: %v", err)
				assert.Positive(t, fe.Column)
			}
			assert.Contains(t, err.Error(), c.message)

			// The same file on disk: Load names the file and gives the same problem.
			path := filepath.Join(t.TempDir(), "bad"+Extension)
			require.NoError(t, os.WriteFile(path, []byte(c.text), 0o644))
			_, err = Load(path)
			require.Error(t, err)
			assert.True(t, strings.HasPrefix(err.Error(), path+": "), err.Error())
			assert.Contains(t, err.Error(), c.message)
		})
	}
}

func TestRangeErrorsKeepTheModelFieldError(t *testing.T) {
	demo := string(demoBytes(t))
	_, err := Unmarshal([]byte(strings.Replace(demo, `"snow": "30 psf"`, `"snow": "600 psf"`, 1)))
	var me *model.FieldError
	require.ErrorAs(t, err, &me)
	assert.Equal(t, "snow", me.Field)
	assert.Contains(t, err.Error(), `load.takedown.snow: "600 psf" is not accepted; give a roof snow load from 0 to 25 kPa (0 to 520 psf)`)
}

func TestErrorMessageShape(t *testing.T) {
	demo := string(demoBytes(t))
	_, err := Unmarshal([]byte(strings.Replace(demo, `"length": "18 ft"`, `"length": "0.5 ft"`, 1)))
	require.Error(t, err)
	assert.Equal(t, `line 8, column 15: setting.length: "0.5 ft" is not accepted; give a length from 0.3 m (1 ft) to 30 m (98 ft)`, err.Error())
}

func TestTooLarge(t *testing.T) {
	big := append(demoBytes(t), bytes.Repeat([]byte(" "), MaxSize)...)
	_, err := Unmarshal(big)
	require.Error(t, err)
	assert.Contains(t, err.Error(), "a scheme file is at most 1 MiB (1048576 bytes)")

	path := filepath.Join(t.TempDir(), "big"+Extension)
	require.NoError(t, os.WriteFile(path, big, 0o644))
	_, err = Load(path)
	require.Error(t, err)
	assert.Contains(t, err.Error(), path+": the file is 1.0 MiB")

	// Exactly at the limit is accepted: trailing white space is allowed.
	atLimit := append(demoBytes(t), bytes.Repeat([]byte("\n"), MaxSize-len(demoBytes(t)))...)
	require.Len(t, atLimit, MaxSize)
	_, err = Unmarshal(atLimit)
	assert.NoError(t, err)
}

func TestLoadRefusesDirectoriesAndMissingFiles(t *testing.T) {
	dir := t.TempDir()
	_, err := Load(dir)
	require.Error(t, err)
	assert.Contains(t, err.Error(), "not a regular file")
	_, err = Load(filepath.Join(dir, "none.upright.json"))
	require.Error(t, err)
	assert.Contains(t, err.Error(), "cannot open: no such file or directory")
	assert.True(t, errors.Is(err, os.ErrNotExist))
}

func TestByteOrderMarkIsSkipped(t *testing.T) {
	sc, err := Unmarshal(append([]byte("\xef\xbb\xbf"), demoBytes(t)...))
	require.NoError(t, err)
	assert.Equal(t, "Demo: Alder Row Library, reading-room column", sc.Name)
}

func TestHandWrittenUnitsAreRead(t *testing.T) {
	demo := string(demoBytes(t))
	for _, c := range []struct {
		text string
		mm   float64 // expected length; 1 ft = 304.8 mm, 1 in = 25.4 mm (exact definitions)
	}{
		{`"13'-6\""`, 13*304.8 + 6*25.4},
		{`"162 in"`, 162 * 25.4},
		{`"4200 mm"`, 4200},
		{`"420 cm"`, 4200},
		{`"4.2m"`, 4200},
	} {
		text := strings.Replace(demo, `"weak_axis_length": "18 ft"`, `"weak_axis_length": "3 m"`, 1)
		text = strings.Replace(text, `"length": "18 ft"`, `"length": `+c.text, 1)
		sc, err := Unmarshal([]byte(text))
		require.NoError(t, err, c.text)
		assert.InDelta(t, c.mm, sc.Setting.LengthMM, 1e-9, c.text)
	}
}

// failingScheme returns a scheme whose file differs from the demo's.
func otherScheme(t *testing.T) model.Scheme {
	sc, err := Unmarshal(demoBytes(t))
	require.NoError(t, err)
	sc.Name = "Changed"
	sc.Setting.LengthMM, sc.Setting.WeakMM = 5000, 5000
	return sc
}

func TestFailedSaveLeavesThePreviousFile(t *testing.T) {
	boom := errors.New("disk full (injected)")
	cases := []struct {
		name    string
		inject  func() (restore func())
		message string
	}{
		{"write fails", func() func() {
			old := writeFile
			writeFile = func(f *os.File, b []byte) (int, error) {
				n, _ := f.Write(b[:len(b)/2]) // half the data reaches the temporary file
				return n, boom
			}
			return func() { writeFile = old }
		}, "disk full (injected)"},
		{"short write", func() func() {
			old := writeFile
			writeFile = func(f *os.File, b []byte) (int, error) { return f.Write(b[:10]) }
			return func() { writeFile = old }
		}, "short write"},
		{"sync fails", func() func() {
			old := syncFile
			syncFile = func(*os.File) error { return boom }
			return func() { syncFile = old }
		}, "disk full (injected)"},
		{"rename fails", func() func() {
			old := rename
			rename = func(string, string) error { return boom }
			return func() { rename = old }
		}, "disk full (injected)"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			dir := t.TempDir()
			path := filepath.Join(dir, "scheme"+Extension)
			first, err := Unmarshal(demoBytes(t))
			require.NoError(t, err)
			require.NoError(t, Save(path, first))
			before, err := os.ReadFile(path)
			require.NoError(t, err)

			restore := c.inject()
			err = Save(path, otherScheme(t))
			restore()
			require.Error(t, err)
			assert.Contains(t, err.Error(), c.message)
			assert.Contains(t, err.Error(), "not saved (the previous file, if any, is unchanged)")

			after, err := os.ReadFile(path)
			require.NoError(t, err)
			assert.Equal(t, before, after, "the previous file is intact")
			entries, err := os.ReadDir(dir)
			require.NoError(t, err)
			assert.Len(t, entries, 1, "no temporary file is left behind")
			back, err := Load(path)
			require.NoError(t, err)
			assert.Equal(t, first, back)
		})
	}
}

func TestInvalidSchemeIsNotSaved(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "scheme"+Extension)
	require.NoError(t, os.WriteFile(path, demoBytes(t), 0o600))
	sc := otherScheme(t)
	sc.Setting.LengthMM = -1
	err := Save(path, sc)
	var fe *Error
	require.ErrorAs(t, err, &fe)
	assert.Equal(t, "setting.length", fe.Field)
	after, _ := os.ReadFile(path)
	assert.Equal(t, demoBytes(t), after)
}

func TestSaveIntoReadOnlyDirectory(t *testing.T) {
	if os.Geteuid() == 0 {
		t.Skip("running as root, which may write into read-only directories; the injected failures of TestFailedSaveLeavesThePreviousFile cover this case")
	}
	dir := t.TempDir()
	path := filepath.Join(dir, "scheme"+Extension)
	require.NoError(t, os.WriteFile(path, demoBytes(t), 0o644))
	require.NoError(t, os.Chmod(dir, 0o555))
	t.Cleanup(func() { os.Chmod(dir, 0o755) })
	err := Save(path, otherScheme(t))
	require.Error(t, err)
	after, _ := os.ReadFile(path)
	assert.Equal(t, demoBytes(t), after)
}

func TestSaveKeepsModeAndFollowsLinks(t *testing.T) {
	dir := t.TempDir()
	target := filepath.Join(dir, "real"+Extension)
	require.NoError(t, os.WriteFile(target, demoBytes(t), 0o600))
	link := filepath.Join(dir, "link"+Extension)
	require.NoError(t, os.Symlink(target, link))
	sc := otherScheme(t)
	require.NoError(t, Save(link, sc))
	fi, err := os.Lstat(link)
	require.NoError(t, err)
	assert.Equal(t, os.ModeSymlink, fi.Mode()&os.ModeSymlink, "the link stays a link")
	fi, err = os.Stat(target)
	require.NoError(t, err)
	assert.Equal(t, os.FileMode(0o600), fi.Mode().Perm())
	back, err := Load(target)
	require.NoError(t, err)
	assert.Equal(t, sc, back)
}

func TestSaveNewFileIntoMissingDirectory(t *testing.T) {
	err := Save(filepath.Join(t.TempDir(), "no", "such", "dir", "x"+Extension), model.DefaultScheme())
	require.Error(t, err)
	assert.Contains(t, err.Error(), "not saved")
}
