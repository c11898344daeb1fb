package ui

import (
	"path/filepath"
	"strings"
	"testing"

	"fyne.io/fyne/v2/test"
	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"upright/ui/schemefile"
)

// The scheme's name is edited in the window: the title, the saved file and
// a reloaded scheme all follow it, and the results are not recomputed for it.
func TestSchemeNameIsEditable(t *testing.T) {
	h, dir := fileHarness(t)
	var gen uint64
	h.ui(func() {
		assert.Equal(t, DemoScheme().Name, h.w.inputs.nameEntry.Text, "the entry shows the scheme's name")
		gen = h.w.st.SchemeGen
		h.w.inputs.nameEntry.SetText("")
		test.Type(h.w.inputs.nameEntry, "Quarry Lane depot, bay column")
		h.w.inputs.nameEntry.commit()
	})
	h.settle()
	path := filepath.Join(dir, "depot.upright.json")
	h.ui(func() {
		assert.Equal(t, "Quarry Lane depot, bay column", h.w.st.Valid.Name)
		assert.Equal(t, gen, h.w.st.SchemeGen, "a new name recomputes nothing")
		assert.True(t, strings.HasPrefix(h.w.win.Title(), "Upright — Quarry Lane depot, bay column"), h.w.win.Title())
		require.NoError(t, h.w.files.SaveFile(path))
	})
	sc, err := schemefile.Load(path)
	require.NoError(t, err)
	assert.Equal(t, "Quarry Lane depot, bay column", sc.Name)

	// A pasted line break does not reach the file, and loading a scheme shows its name.
	h.ui(func() { h.w.inputs.nameEntry.SetText("two\nlines"); h.w.inputs.nameEntry.commit() })
	h.settle()
	h.ui(func() {
		assert.Equal(t, "two lines", h.w.st.Valid.Name)
		h.w.LoadScheme(DemoScheme())
		assert.Equal(t, DemoScheme().Name, h.w.inputs.nameEntry.Text)
	})
	h.settle()
}
