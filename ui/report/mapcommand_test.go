package report_test

import (
	"os"
	"path/filepath"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// TestReportCommandMapFlag: report --map adds the map figure (an embedded
// image, so a larger file) to a scheme whose report_map is false.
func TestReportCommandMapFlag(t *testing.T) {
	transfer := filepath.Join("..", "..", "testdata", "schemes", "transfer.upright.json")
	dir := t.TempDir()
	size := func(extra ...string) int64 {
		out := filepath.Join(dir, "client.pdf")
		code, _, stderr := run(append([]string{"report", "--scheme", transfer, "--out", out}, extra...)...)
		require.Equal(t, 0, code, stderr)
		st, err := os.Stat(out)
		require.NoError(t, err)
		return st.Size()
	}
	plain, withMap := size(), size("--map")
	assert.Greater(t, withMap, plain+20000, "the map figure is embedded")
}
