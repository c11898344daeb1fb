package ui

import (
	"fmt"
	"image/png"
	"os"
	"path/filepath"
	"testing"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"
	"github.com/stretchr/testify/require"
)

// shotSizes are the window sizes every screenshot is taken at: a 1920×1080
// laptop at 150% (1280×720), a 1366×768 screen and a 1920×1080 screen.
var shotSizes = []fyne.Size{{Width: 1280, Height: 720}, {Width: 1366, Height: 768}, {Width: 1920, Height: 1080}}

// shotView is one screenshot: a file name and how to bring the view up on
// a freshly opened window (nil for the window as it opens).
type shotView struct {
	name string
	show func(w *Window)
}

// shotViews are the views in testdata/ui. A new view (a tab of the window)
// is one more line here, e.g. {"sections", showTab("Sections")}.
var shotViews = []shotView{
	{"window", nil},
	{"load-takedown", showTab("Load takedown")},
	{"file-menu", showFileMenu},
	{"inputs-folded", func(w *Window) { w.FoldInputs(true) }},
}

// showTab returns a view that selects the tab of that title, wherever it is.
func showTab(title string) func(w *Window) {
	return func(w *Window) {
		walkObjects(w.win.Content(), func(o fyne.CanvasObject) {
			if tabs, ok := o.(*container.AppTabs); ok {
				for _, it := range tabs.Items {
					if it.Text == title {
						tabs.Select(it)
					}
				}
			}
		})
	}
}

// showFileMenu opens the File menu where the menu bar puts it.
func showFileMenu(w *Window) {
	m := w.win.MainMenu().Items[0]
	widget.ShowPopUpMenuAtPosition(m, w.win.Canvas(), fyne.NewPos(4, 0))
}

// TestScreenshots writes every view at every size as PNG files into the
// directory UPRIGHT_SCREENSHOTS names (packaging/screenshots.sh sets it to
// testdata/ui); without it the test is skipped.
func TestScreenshots(t *testing.T) {
	dir := os.Getenv("UPRIGHT_SCREENSHOTS")
	if dir == "" {
		t.Skip("set UPRIGHT_SCREENSHOTS to a directory to write the screenshots (packaging/screenshots.sh)")
	}
	require.NoError(t, os.MkdirAll(dir, 0o755))
	for _, v := range shotViews {
		for _, size := range shotSizes {
			h := newHarnessAt(t, DemoScheme(), size)
			if v.show != nil {
				h.ui(func() { v.show(h.w) })
			}
			h.layOut()
			path := filepath.Join(dir, fmt.Sprintf("%s-%dx%d.png", v.name, int(size.Width), int(size.Height)))
			h.ui(func() {
				img := h.w.win.Canvas().Capture()
				f, err := os.Create(path)
				require.NoError(t, err)
				require.NoError(t, png.Encode(f, img))
				require.NoError(t, f.Close())
			})
			t.Logf("wrote %s", path)
		}
	}
}
