package ui

import (
	"os"
	"path/filepath"
	"testing"

	"fyne.io/fyne/v2/storage"
	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// Save As on an existing local file: the dialog's writer no longer
// truncates it, so a save that then fails leaves the earlier file whole,
// and a save that works replaces it by a rename, with no temporary file left.
func TestSaveAsNeverLeavesAnEmptyFile(t *testing.T) {
	h, dir := fileHarness(t)
	path := filepath.Join(dir, "tower.upright.json")
	const earlier = `{"an": "earlier file"}`
	require.NoError(t, os.WriteFile(path, []byte(earlier), 0o644))

	// What Fyne's save dialog does with the chosen file, then a failed save.
	wc, err := storage.Writer(storage.NewFileURI(path))
	require.NoError(t, err)
	require.NoError(t, wc.Close())
	h.ui(func() {
		h.w.st.HaveValid = false // inputs that do not make a scheme: the save fails
		assert.Error(t, h.w.files.SaveFile(path))
		h.w.st.HaveValid = true
	})
	closeDialogs(h)
	b, err := os.ReadFile(path)
	require.NoError(t, err)
	assert.Equal(t, earlier, string(b), "the failed save left the earlier file as it was")

	// A save that works replaces the file.
	wc, err = storage.Writer(storage.NewFileURI(path))
	require.NoError(t, err)
	require.NoError(t, wc.Close())
	h.ui(func() { require.NoError(t, h.w.files.SaveFile(path)) })
	b, err = os.ReadFile(path)
	require.NoError(t, err)
	assert.Contains(t, string(b), `"format": "upright-scheme"`)

	// Anything written through the repository's writer lands by rename.
	wc, err = storage.Writer(storage.NewFileURI(path))
	require.NoError(t, err)
	_, err = wc.Write([]byte("new"))
	require.NoError(t, err)
	b, _ = os.ReadFile(path)
	assert.Contains(t, string(b), "upright-scheme", "nothing changes before Close")
	require.NoError(t, wc.Close())
	b, _ = os.ReadFile(path)
	assert.Equal(t, "new", string(b))
	left, err := filepath.Glob(filepath.Join(dir, ".*tmp*"))
	require.NoError(t, err)
	assert.Empty(t, left, "no temporary file is left")
}
