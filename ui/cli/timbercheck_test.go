package cli

import (
	"encoding/json"
	"math"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// TestCompareAllTimberAgreesWithIndependentCalc runs `compare --materials
// timber --all --json` and recomputes every permitted candidate's capacity
// by NDS 2018 3.7.1 from the reported reference values and factors:
// Fc* = Fc × (factors on Fc), Emin' = Emin × (factors on Emin),
// FcE = 0.822 Emin'/(le/d)², Cp by Eq. 3.7-1, capacity = Fc* Cp A.
func TestCompareAllTimberAgreesWithIndependentCalc(t *testing.T) {
	checked := 0
	for _, args := range [][]string{
		{"--length", "3.5m", "--ends", "pinned-pinned", "--method", "lrfd"},
		{"--length", "16ft", "--ends", "fixed-pinned", "--method", "asd", "--wet", "--species", "SP", "--grade", "SS"},
		{"--length", "2.4m", "--ends", "fixed-free", "--method", "lrfd", "--species", "HF", "--grade", "No.2"},
		{"--length", "6m", "--weak-length", "3m", "--method", "asd", "--duration", "two-months", "--species", "SPF"},
	} {
		full := append([]string{"compare", "--materials", "timber", "--all", "--json", "--load", "50kN"}, args...)
		code, out, errOut := run(full...)
		require.Equal(t, 0, code, errOut)
		var arr []Candidate
		require.NoError(t, json.Unmarshal([]byte(out), &arr))
		require.NotEmpty(t, arr)
		for _, c := range arr {
			if !c.Permitted || c.Calc["fire"] != nil {
				continue
			}
			calc := c.Calc
			fcStar, eMin := calc["Fc_MPa"].(float64), calc["Emin_MPa"].(float64)
			for name, v := range calc["factors"].(map[string]any) {
				switch {
				case strings.HasSuffix(name, "_Fc"):
					fcStar *= v.(float64)
				case strings.HasSuffix(name, "_Emin"):
					eMin *= v.(float64)
				}
			}
			led := calc["le_d"].(float64)
			cc := calc["c"].(float64)
			fce := 0.822 * eMin / (led * led) // NDS 2018 3.7.1
			r := fce / fcStar
			cp := (1+r)/(2*cc) - math.Sqrt(math.Pow((1+r)/(2*cc), 2)-r/cc) // NDS 2018 Eq. 3.7-1
			want := fcStar * cp * calc["b_mm"].(float64) * calc["d_mm"].(float64) / 1000
			assert.InEpsilon(t, want, c.CapacityKN, 0.005, "%s %v", c.Designation, args)
			checked++
		}
	}
	assert.Greater(t, checked, 400)
}
