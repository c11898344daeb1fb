package cli

import (
	"encoding/csv"
	"encoding/json"
	"math"
	"os"
	"strconv"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

// refTube is one HSS row of the reference data with the columns a filled
// section needs.
type refTube struct {
	A, Ix, Iy, B, Ht, OD, tdes, bt, ht, dt float64
}

// loadTubes reads the HSS rows of ../shared/reference/steel-shapes.csv
// (AISC Shapes Database v16.0), or skips when the file is absent.
func loadTubes(t *testing.T) map[string]refTube {
	f, err := os.Open(referenceCSV)
	if err != nil {
		t.Skipf("reference data %s absent (%v): skipping the independent check", referenceCSV, err)
	}
	defer f.Close()
	rows, err := csv.NewReader(f).ReadAll()
	require.NoError(t, err)
	col := map[string]int{}
	for i, h := range rows[0] {
		col[h] = i
	}
	num := func(r []string, name string) float64 {
		v, err := strconv.ParseFloat(strings.TrimSpace(r[col[name]]), 64)
		if err != nil {
			return math.NaN()
		}
		return v
	}
	out := map[string]refTube{}
	for _, r := range rows[1:] {
		if r[col["Type"]] != "HSS" {
			continue
		}
		out[r[col["AISC_Manual_Label"]]] = refTube{A: num(r, "A"), Ix: num(r, "Ix"), Iy: num(r, "Iy"),
			B: num(r, "B"), Ht: num(r, "Ht"), OD: num(r, "OD"), tdes: num(r, "tdes"),
			bt: num(r, "b/tdes"), ht: num(r, "h/tdes"), dt: num(r, "D/t")}
	}
	return out
}

// independentFilled is AISC 360-22 I2.2 worked here from the tabulated
// properties (kip, in, ksi), with the clauses as recalled (from memory):
// Table I1.1a limits, Eq. I2-9 to I2-13 for Pno, C3 and EIeff of I2.2b, Ec
// of I2.1b with wc = 145 pcf, Pe of Eq. I2-5 about both axes, Eq. I2-2 and
// I2-3. The core is the inside of the tube with inside corners of radius t
// in its area and square corners in its moment of inertia.
func independentFilled(s refTube, fy, fc, lc float64) float64 {
	const E = 29000.0
	t := s.tdes
	round := !math.IsNaN(s.OD)
	var ac, icx, icy, lam, lp, lr, c2 float64
	if round {
		di := s.OD - 2*t
		ac, icx = math.Pi/4*di*di, math.Pi/64*math.Pow(di, 4)
		icy = icx
		lam, lp, lr, c2 = s.dt, 0.15*E/fy, 0.19*E/fy, 0.95
	} else {
		bi, hi := s.B-2*t, s.Ht-2*t
		ac = bi*hi - (4-math.Pi)*t*t
		icx, icy = bi*hi*hi*hi/12, hi*bi*bi*bi/12
		lam = math.Max(s.bt, s.ht)
		lp, lr, c2 = 2.26*math.Sqrt(E/fy), 3.00*math.Sqrt(E/fy), 0.85
	}
	pp := fy*s.A + c2*fc*ac // Eq. I2-9
	py := fy*s.A + 0.7*fc*ac
	var pno float64
	switch {
	case lam <= lp:
		pno = pp
	case lam <= lr:
		pno = pp - (pp-py)/((lr-lp)*(lr-lp))*(lam-lp)*(lam-lp) // Eq. I2-10
	default:
		fcr := 9 * E / (lam * lam) // Eq. I2-12
		if round {
			fcr = 0.72 * fy / math.Pow(lam*fy/E, 0.2) // Eq. I2-13
		}
		pno = fcr*s.A + 0.7*fc*ac // Eq. I2-11
	}
	ec := math.Pow(145, 1.5) * math.Sqrt(fc)
	c3 := math.Min(0.9, 0.45+3*s.A/(s.A+ac))
	ei := math.Min(E*s.Ix+c3*ec*icx, E*s.Iy+c3*ec*icy)
	pe := math.Pi * math.Pi * ei / (lc * lc) // Eq. I2-5
	if pno/pe <= 2.25 {
		return pno * math.Pow(0.658, pno/pe) // Eq. I2-2
	}
	return 0.877 * pe // Eq. I2-3
}

// TestCompareAllCompositeAgreesWithIndependentCalc runs `compare
// --materials composite --all --json` at three lengths with both methods
// and recomputes every permitted filled-HSS candidate from the tabulated A,
// Ix, Iy, B, Ht, OD, tdes, b/tdes, h/tdes and D/t of
// ../shared/reference/steel-shapes.csv (AISC Shapes Database v16.0); each
// agrees within 3 %. φc = 0.75 and Ωc = 2.00 (AISC 360-22 I2.1b).
func TestCompareAllCompositeAgreesWithIndependentCalc(t *testing.T) {
	ref := loadTubes(t)
	checked, worst, worstAt := 0, 0.0, ""
	for _, c := range []struct {
		length, ends string
		lmm, k       float64
	}{
		{"3m", "pinned-pinned", 3000, 1.0},
		{"14ft", "fixed-free", 14 * 304.8, 2.1}, // K from Commentary Table C-A-7.1
		{"9m", "fixed-pinned", 9000, 0.8},
	} {
		for _, m := range []struct {
			name   string
			factor float64
		}{{"lrfd", 0.75}, {"asd", 1 / 2.0}} {
			code, out, errOut := run("compare", "--materials", "composite", "--all", "--json", "--length", c.length,
				"--ends", c.ends, "--method", m.name, "--load", "100kN")
			require.Equal(t, 0, code, errOut)
			var arr []Candidate
			require.NoError(t, json.Unmarshal([]byte(out), &arr))
			require.Greater(t, len(arr), 300)
			for _, cand := range arr {
				require.Equal(t, "composite", cand.Material)
				if !cand.Permitted {
					continue
				}
				for _, key := range []string{"steel_designation", "Fy_MPa", "fc_MPa", "As_mm2", "Ac_mm2", "Ec_MPa", "C3",
					"classification", "lambda", "lambda_p", "lambda_r", "Pno_kN", "EIeff_kNm2", "Pe_kN"} {
					require.Contains(t, cand.Calc, key, cand.Designation)
				}
				label := cand.Calc["steel_designation"].(string)
				assert.True(t, strings.HasPrefix(cand.Designation, label+" filled, "), cand.Designation)
				s, ok := ref[label]
				if !ok {
					continue
				}
				if cand.Calc["classification"] == "slender" {
					assert.Contains(t, cand.Calc, "Fcr_MPa", cand.Designation)
				}
				fy := cand.Calc["Fy_MPa"].(float64) / units.MPaPerKsi
				fc := cand.Calc["fc_MPa"].(float64) / units.MPaPerKsi
				lc := c.lmm / units.MMPerInch * c.k
				want := m.factor * independentFilled(s, fy, fc, lc) * units.NPerKip / 1000
				assert.InEpsilon(t, want, cand.CapacityKN, 0.03, "%s at %s %s %s", cand.Designation, c.length, c.ends, m.name)
				if d := math.Abs(cand.CapacityKN/want - 1); d > worst {
					worst, worstAt = d, cand.Designation+" "+c.length+" "+m.name
				}
				checked++
			}
		}
	}
	assert.Greater(t, checked, 6*300, "most filled tubes are checked")
	t.Logf("%d candidates checked; largest difference %.2f %% (%s)", checked, 100*worst, worstAt)
}

// TestDefaultCompareListsComposite checks the default comparison includes
// the three filled-HSS families.
func TestDefaultCompareListsComposite(t *testing.T) {
	code, out, errOut := run("compare", "--length", "4m", "--load", "3000kN")
	require.Equal(t, 0, code, errOut)
	for _, fam := range model.CompositeFamilies {
		assert.Contains(t, out, fam)
	}
	assert.Contains(t, out, " filled, 35 MPa", "SI, as --length was typed; the SI default f'c")
	assert.Contains(t, out, model.Caution)
}

// TestDemoCrossoversIncludeComposite checks the demo scheme's crossovers
// include the filled-HSS families.
func TestDemoCrossoversIncludeComposite(t *testing.T) {
	code, out, errOut := run("crossovers", "--scheme", "../../testdata/schemes/demo.upright.json", "--json", "--changes", "all")
	require.Equal(t, 0, code, errOut)
	var xs []model.Crossover
	require.NoError(t, json.Unmarshal([]byte(out), &xs))
	seen := map[string]bool{}
	for _, x := range xs {
		seen[x.Family] = true
	}
	for _, fam := range model.CompositeFamilies {
		assert.True(t, seen[fam], "no crossover of %s", fam)
	}
}

// TestFillFcFlag checks --fill-fc sets the fill apart from --fc, the fill
// follows --fc without it, and bad values name the flag and the range.
func TestFillFcFlag(t *testing.T) {
	fcOf := func(args ...string) float64 {
		code, out, errOut := run(append([]string{"compare", "--materials", "composite", "--json", "--length", "4m", "--load", "1000kN"}, args...)...)
		require.Equal(t, 0, code, errOut)
		var arr []Candidate
		require.NoError(t, json.Unmarshal([]byte(out), &arr))
		require.NotEmpty(t, arr)
		return arr[0].Calc["fc_MPa"].(float64)
	}
	assert.InDelta(t, 35, fcOf(), 0.01, "default: the concrete default of the units typed (SI: 35 MPa)")
	assert.InDelta(t, 6*units.MPaPerKsi, fcOf("--fc", "6ksi"), 0.01, "the fill follows --fc")
	assert.InDelta(t, 3*units.MPaPerKsi, fcOf("--fc", "6ksi", "--fill-fc", "3000psi"), 0.01, "--fill-fc wins")
	assert.InDelta(t, 40, fcOf("--fill-fc", "40MPa"), 0.01)
	for _, bad := range []string{"2.9ksi", "11ksi", "abc", "0", "-4ksi", "NaN"} {
		code, _, errOut := run("compare", "--fill-fc", bad)
		assert.Equal(t, 2, code, bad)
		assert.Contains(t, errOut, "--fill-fc", bad)
		assert.Contains(t, errOut, "3,000 to 10,000 psi", bad)
	}
	code, _, errOut := run("compare", "--composite-families", "Filled HSS round,Filled pipe")
	assert.Equal(t, 2, code)
	assert.Contains(t, errOut, "Filled pipe")
	code, out, errOut := run("compare", "--materials", "composite", "--composite-families", "filled hss round", "--length", "4m", "--load", "1000kN")
	require.Equal(t, 0, code, errOut)
	assert.Contains(t, out, "Filled HSS round")
	assert.NotContains(t, out, "Filled HSS square")
}
