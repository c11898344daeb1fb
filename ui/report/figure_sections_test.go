package report

import (
	"os/exec"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// TestSectionsFigureOnPageOneOrTwo checks that the plan-sections figure
// follows the summary on page 1 or 2, with its printed scale.
func TestSectionsFigureOnPageOneOrTwo(t *testing.T) {
	bin, err := exec.LookPath("pdftotext")
	if err != nil {
		t.Skip("pdftotext (poppler-utils) is not installed; cannot read the report back")
	}
	m := newModel(t, "demo")
	path := writePDF(t, m, Options{})
	out, err := exec.Command(bin, "-raw", "-enc", "UTF-8", "-f", "1", "-l", "2", path, "-").Output()
	require.NoError(t, err)
	text := spaces.ReplaceAllString(string(out), " ")
	assert.Contains(t, text, "What the columns look like in plan")
	assert.Regexp(t, `On this page the scale is about 1:\d+\.`, text)
	assert.Less(t, strings.Index(text, "Summary"), strings.Index(text, "What the columns look like in plan"), "the figure follows the summary")
}
