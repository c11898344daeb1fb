package report_test

import (
	"bytes"
	"encoding/csv"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/cli"
	"upright/ui/schemefile"
)

// The headless commands that ui/cli/files.go registers, run as main runs them.

func run(args ...string) (code int, stdout, stderr string) {
	var o, e bytes.Buffer
	code = cli.Run(args, &o, &e)
	return code, o.String(), e.String()
}

var demo = filepath.Join("..", "..", "testdata", "schemes", "demo.upright.json")

func TestCommandsAreHeadless(t *testing.T) {
	for _, c := range []string{"report", "table", "scheme"} {
		assert.True(t, cli.IsCommand([]string{c}), c)
	}
}

func TestReportCommand(t *testing.T) {
	out := filepath.Join(t.TempDir(), "client.pdf")
	code, stdout, stderr := run("report", "--scheme", demo, "--length", "15ft", "--out", out)
	require.Equal(t, 0, code, stderr)
	assert.Contains(t, stdout, "wrote "+out)
	b, err := os.ReadFile(out)
	require.NoError(t, err)
	assert.True(t, bytes.HasPrefix(b, []byte("%PDF-")))

	code, _, stderr = run("report", "--scheme", demo)
	assert.Equal(t, 2, code)
	assert.Contains(t, stderr, "--out: required")

	code, _, stderr = run("report", "--scheme", demo, "--out", out, "--top", "99")
	assert.Equal(t, 2, code)
	assert.Contains(t, stderr, "--top 99: not accepted")
}

func TestSchemeFlagReportsBadFiles(t *testing.T) {
	bad := filepath.Join(t.TempDir(), "bad.upright.json")
	text, err := os.ReadFile(demo)
	require.NoError(t, err)
	require.NoError(t, os.WriteFile(bad, []byte(strings.Replace(string(text), `"version": 2`, `"version": 9`, 1)), 0o644))
	code, _, stderr := run("compare", "--scheme", bad)
	assert.Equal(t, 2, code)
	assert.Contains(t, stderr, "format version 9 is newer than this program reads")
}

func TestTableCommand(t *testing.T) {
	code, stdout, stderr := run("table", "--scheme", demo, "--units", "si")
	require.Equal(t, 0, code, stderr)
	recs, err := csv.NewReader(strings.NewReader(stdout)).ReadAll()
	require.NoError(t, err)
	require.Greater(t, len(recs), 1)
	assert.Contains(t, recs[0], "capacity_kN")

	out := filepath.Join(t.TempDir(), "table.csv")
	code, stdout, stderr = run("table", "--scheme", demo, "--all", "--csv", out)
	require.Equal(t, 0, code, stderr)
	assert.Contains(t, stdout, "wrote "+out)
	b, err := os.ReadFile(out)
	require.NoError(t, err)
	all, err := csv.NewReader(bytes.NewReader(b)).ReadAll()
	require.NoError(t, err)
	assert.Greater(t, len(all), len(recs), "--all lists failing candidates too")
	assert.Contains(t, all[0], "capacity_kip")
}

func TestSchemeCommandWritesWhatFlagsSay(t *testing.T) {
	out := filepath.Join(t.TempDir(), "new"+schemefile.Extension)
	code, _, stderr := run("scheme", "--length", "4.5m", "--load", "2500kN", "--units", "si", "--name", "Flags only", "--out", out)
	require.Equal(t, 0, code, stderr)
	sc, err := schemefile.Load(out)
	require.NoError(t, err)
	assert.Equal(t, "Flags only", sc.Name)
	assert.Equal(t, 4500.0, sc.Setting.LengthMM)
	assert.Equal(t, 2500e3, sc.Load.DirectN)

	code, _, stderr = run("scheme", "--length", "4.5m")
	assert.Equal(t, 2, code)
	assert.Contains(t, stderr, "--out: required")
}
