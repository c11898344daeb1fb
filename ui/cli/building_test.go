package cli

import (
	"bytes"
	"encoding/json"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// handArgs is the 3 × 2-bay, four-storey building checked by hand in the model's tests.
var handArgs = []string{"building", "--bays-x", "9m,9m,9m", "--bays-y", "7.5m,7.5m", "--storeys", "4.2m,3.6m,3.6m,3.6m",
	"--dead", "4kPa", "--live", "2.4kPa", "--roof-dead", "3kPa", "--snow", "1.5kPa", "--facade", "5kN/m"}

func TestBuildingJSONShape(t *testing.T) {
	var out, errb bytes.Buffer
	code := Run(append(append([]string{}, handArgs...), "--json"), &out, &errb)
	require.Equal(t, 0, code, errb.String())
	assert.Contains(t, errb.String(), "Preliminary")
	var raw map[string]any
	require.NoError(t, json.Unmarshal(out.Bytes(), &raw))
	assert.Len(t, raw, 2, "only positions and totals")
	var got BuildingJSON
	require.NoError(t, json.Unmarshal(out.Bytes(), &got))
	require.Len(t, got.Positions, 4)
	want := map[string][2]float64{"interior": {2, 67.5}, "edge-x": {4, 33.75}, "edge-y": {2, 33.75}, "corner": {4, 16.875}} // by hand: half bays each side
	for _, p := range got.Positions {
		w := want[p.Position]
		assert.Equal(t, int(w[0]), p.Count, p.Position)
		assert.InDelta(t, w[1], p.TributaryM2, 1e-9, p.Position)
		require.Len(t, p.Storeys, 4)
		for k, s := range p.Storeys {
			assert.Equal(t, k+1, s.Storey)
			assert.NotEmpty(t, s.Best, "%s storey %d", p.Position, k+1)
			for _, c := range s.Best {
				assert.True(t, c.OK, "%s storey %d %s", p.Position, k+1, c.Designation)
				assert.NotEmpty(t, c.Checks)
			}
		}
		// By hand: the top storey carries the roof, 3 kPa over the area, and the façade of one level.
		facade := map[string]float64{"interior": 0, "edge-x": 9, "edge-y": 7.5, "corner": 8.25}[p.Position]
		assert.InDelta(t, 3*w[1]+5*facade, p.Storeys[3].DKN, 1e-3, p.Position)
	}
	require.NotEmpty(t, got.Totals)
	for _, tot := range got.Totals {
		assert.Equal(t, 12, tot.Columns)
		assert.InDelta(t, 12*15.0, tot.LengthM, 1e-6, "12 columns × 15 m") // by hand
		assert.InDelta(t, 4*405.0, tot.GrossFloorAreaM2, 1e-6)
	}
}

// ezdxfPython returns a Python that imports ezdxf (Debian's python3-ezdxf), or "".
func ezdxfPython() string {
	for _, p := range []string{"/usr/bin/python3", "python3"} {
		if exec.Command(p, "-c", "import ezdxf").Run() == nil {
			return p
		}
	}
	return ""
}

// dxfCheck opens a DXF with ezdxf's strict reader, audits it and counts the
// closed outlines on the COLUMNS layer; it prints "version errors fixes closed units".
const dxfCheck = `
import sys, ezdxf
doc = ezdxf.readfile(sys.argv[1])
a = doc.audit()
closed = [e for e in doc.modelspace() if e.dxftype() in ("POLYLINE", "LWPOLYLINE") and e.dxf.layer == "COLUMNS" and e.is_closed]
others = [e for e in doc.modelspace() if e.dxf.layer == "COLUMNS" and not (e.dxftype() in ("POLYLINE", "LWPOLYLINE") and e.is_closed)]
texts = [e.dxf.text for e in doc.modelspace() if e.dxftype() == "TEXT"]
print(doc.dxfversion, len(a.errors), len(closed), len(others), doc.header.get("$INSUNITS"), "|".join(texts))
`

func TestBuildingDXFIndependentReader(t *testing.T) {
	py := ezdxfPython()
	if py == "" {
		t.Skip("python3-ezdxf is not installed (packaging/prereqs.sh installs it)")
	}
	dir := t.TempDir()
	path := filepath.Join(dir, "plan.dxf")
	var out, errb bytes.Buffer
	code := Run(append(append([]string{}, handArgs...), "--dxf", path, "--plan-family", "HSS square"), &out, &errb)
	require.Equal(t, 0, code, errb.String())
	script := filepath.Join(dir, "check.py")
	require.NoError(t, os.WriteFile(script, []byte(dxfCheck), 0o644))
	res, err := exec.Command(py, script, path).CombinedOutput()
	require.NoError(t, err, string(res))
	f := strings.SplitN(strings.TrimSpace(string(res)), " ", 6)
	require.Len(t, f, 6, string(res))
	assert.Equal(t, "AC1009", f[0], "release 12")
	assert.Equal(t, "0", f[1], "audit errors")
	assert.Equal(t, "12", f[2], "one closed outline per column: 4 × 3 grid intersections")
	assert.Equal(t, "0", f[3], "nothing else on the column layer")
	assert.Equal(t, "4", f[4], "millimetres")
	assert.Contains(t, f[5], "HSS")
	assert.Contains(t, f[5], "Preliminary sizing")
	for _, g := range []string{"|1|", "|4|", "|A|", "|C|"} {
		assert.Contains(t, "|"+f[5]+"|", g, "grid label")
	}
}

func TestBuildingPictures(t *testing.T) {
	dir := t.TempDir()
	for _, ext := range []string{"png", "svg", "pdf"} {
		path := filepath.Join(dir, "plan."+ext)
		var out, errb bytes.Buffer
		require.Equal(t, 0, Run(append(append([]string{}, handArgs...), "--out", path), &out, &errb), errb.String())
		for _, p := range []string{path, ElevationPath(path)} {
			st, err := os.Stat(p)
			require.NoError(t, err)
			assert.Greater(t, st.Size(), int64(1000), p)
		}
	}
}

func TestBuildingBadFlags(t *testing.T) {
	rows := []struct {
		args []string
		want string
	}{
		{[]string{"--bays-x", ""}, "--bays-x"},
		{[]string{"--bays-x", "9m,-3m"}, "--bays-x"},
		{[]string{"--bays-y", "0m"}, "--bays-y"},
		{[]string{"--storeys", strings.Repeat("3m,", 60) + "3m"}, "1 to 60"},
		{[]string{"--bays-x", strings.Repeat("6m,", 40) + "6m"}, "1 to 40"},
		{[]string{"--change-every", "0"}, "--change-every"},
		{[]string{"--facade", "-2kN/m"}, "--facade"},
		{[]string{"--facade", "0.5k/ft"}, "k may mean kip or kN"},
		{[]string{"--load", "100kN"}, "--load"},
		{[]string{"--dxf", "plan.dwg"}, "--dxf"},
	}
	for _, r := range rows {
		var out, errb bytes.Buffer
		code := Run(append([]string{"building"}, r.args...), &out, &errb)
		assert.Equal(t, 2, code, "%v: %s", r.args, errb.String())
		assert.Contains(t, errb.String(), r.want, "%v", r.args)
	}
}
