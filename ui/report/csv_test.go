package report

import (
	"bytes"
	"encoding/csv"
	"strconv"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/model"
	"upright/ui/units"
)

func TestCSVHeaderCarriesUnits(t *testing.T) {
	us := strings.Join(CSVHeader(units.US), ",")
	si := strings.Join(CSVHeader(units.SI), ",")
	for _, col := range []string{"length_ft", "width_in", "plan_area_in2", "weight_lb_per_ft", "column_weight_lb", "capacity_kip", "demand_kip"} {
		assert.Contains(t, us, col)
	}
	for _, col := range []string{"length_m", "width_mm", "plan_area_m2", "weight_kg_per_m", "column_weight_kg", "capacity_kN", "demand_kN"} {
		assert.Contains(t, si, col)
	}
}

// readCSV parses CSV text strictly (every record as wide as the header).
func readCSV(t *testing.T, b []byte) [][]string {
	t.Helper()
	r := csv.NewReader(bytes.NewReader(b))
	recs, err := r.ReadAll()
	require.NoError(t, err)
	require.NotEmpty(t, recs)
	return recs
}

func TestCSVTableMatchesTheModel(t *testing.T) {
	for _, name := range []string{"demo", "pavilion"} {
		t.Run(name, func(t *testing.T) {
			m := newModel(t, name)
			sys := units.System(m.Scheme.Units)
			res, err := m.Evaluate(t.Context(), m.Scheme.Setting)
			require.NoError(t, err)
			working, total := 0, 0
			for fi := range res.Families {
				working += res.Families[fi].Working
				total += len(res.Families[fi].Rows)
			}

			var buf bytes.Buffer
			require.NoError(t, WriteCSV(&buf, m, CSVOptions{}))
			raw := buf.Bytes()
			assert.True(t, bytes.HasSuffix(raw, []byte("\r\n")), "RFC 4180 line ends are CRLF")
			assert.Equal(t, bytes.Count(raw, []byte("\n")), bytes.Count(raw, []byte("\r\n")), "every line ends in CRLF")
			recs := readCSV(t, raw)
			assert.Equal(t, CSVHeader(sys), recs[0])
			assert.Len(t, recs, 1+working, "the working sizes only")
			col := map[string]int{}
			for i, h := range recs[0] {
				col[h] = i
			}
			for _, rec := range recs[1:] {
				assert.Equal(t, model.StatusWorks, rec[col["status"]])
				assert.Equal(t, model.Caution, rec[col["caution"]], "every row says it is preliminary sizing")
				u, err := strconv.ParseFloat(rec[col["utilization"]], 64)
				require.NoError(t, err)
				assert.LessOrEqual(t, u, 1.0)
			}

			// The first row is the first family's best size, with its numbers in the display units.
			b := res.Families[0].Best()
			require.NotNil(t, b)
			first := recs[1]
			assert.Equal(t, b.Static.Designation, first[col["designation"]])
			assert.Equal(t, "1", first[col["rank"]])
			capV, fu := units.ForceValue(b.CapacityN, sys)
			got, err := strconv.ParseFloat(first[col["capacity_"+fu]], 64)
			require.NoError(t, err)
			assert.InDelta(t, capV, got, 0.05)

			buf.Reset()
			require.NoError(t, WriteCSV(&buf, m, CSVOptions{All: true}))
			all := readCSV(t, buf.Bytes())
			assert.Len(t, all, 1+total, "every candidate")
			statuses := map[string]bool{}
			for _, rec := range all[1:] {
				statuses[rec[col["status"]]] = true
			}
			assert.True(t, statuses["fails"] || statuses["not permitted"], "failing candidates are listed with --all")
		})
	}
}

func TestCSVQuotesFieldsWithCommas(t *testing.T) {
	m := newModel(t, "demo")
	var buf bytes.Buffer
	require.NoError(t, WriteCSV(&buf, m, CSVOptions{All: true}))
	// Concrete designations hold commas ("16x16 in tied, 4 #8, 5 ksi"): RFC 4180 quotes them.
	found := false
	for _, line := range strings.Split(buf.String(), "\r\n") {
		if strings.HasPrefix(line, "concrete,") {
			assert.Contains(t, line, `,"`, "a field with a comma is quoted: %s", line)
			found = true
			break
		}
	}
	assert.True(t, found, "the demo lists concrete candidates")
	recs := readCSV(t, buf.Bytes())
	for _, rec := range recs[1:] {
		if rec[0] == "concrete" {
			assert.Contains(t, rec[2], ",", "the quoted designation reads back whole")
			break
		}
	}
	assert.ErrorContains(t, WriteCSV(nil, m, CSVOptions{}), "no writer")
	assert.ErrorContains(t, WriteCSV(&buf, nil, CSVOptions{}), "no model")
}
