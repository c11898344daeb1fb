package ui

import (
	"fmt"
	"image/png"
	"log"
	"os"
	"path/filepath"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"
)

// shotsEnv names the directory the window writes its screenshots into and
// then quits; packaging/screenshots.sh sets it, under Xvfb, once per screen size.
const shotsEnv = "UPRIGHT_SHOTS"

// shotView is one window screenshot: a file name and how to bring the view
// up on the window as it opens (nil for none); show returns what undoes it.
type shotView struct {
	name string
	show func(w *Window) (undo func())
}

// shotViews are the screenshots in testdata/ui, each taken at every screen
// size. A new view is one line here; a tab of the window, wherever it sits,
// is brought up with showTab, e.g. {"sections", showTab("Sections")}.
var shotViews = []shotView{
	{"window", nil},
	{"calculation", showRow(1)},
	{"load-takedown", showTab("Load takedown")},
	{"plan-sections", showTab("Sections")},
	{"map", showTab("Map")},
	{"variants", showVariantsDemo},
	{"building", showBuilding},
	{"file-menu", showFileMenu},
	{"edit-menu", showEditMenu},
	{"refused-input", showRefused},
	{"inputs-folded", func(w *Window) func() { w.FoldInputs(true); return func() { w.FoldInputs(false) } }},
	{"sections-folded", func(w *Window) func() {
		w.inputs.FoldSection("Column", true)
		return func() { w.inputs.FoldSection("Column", false) }
	}},
}

// showTab returns a view that selects the tab of that title.
func showTab(title string) func(w *Window) func() {
	return func(w *Window) func() {
		var undo []func()
		eachTabs(w.win.Content(), func(tabs tabber) {
			for _, it := range tabs.items() {
				if it.Text == title {
					was := tabs.Selected()
					tabs.Select(it)
					undo = append(undo, func() { tabs.Select(was) })
				}
			}
		})
		return func() {
			for _, u := range undo {
				u()
			}
		}
	}
}

// showRow returns a view with the table's row i chosen, its calculation shown.
func showRow(i int) func(w *Window) func() {
	return func(w *Window) func() {
		if rows := w.results.rows; i < len(rows) {
			w.Select(rows[i].Static.Designation)
		}
		return func() {}
	}
}

// showFileMenu opens the File menu under the menu bar.
func showFileMenu(w *Window) func() {
	c := w.win.Canvas()
	top := fyne.CurrentApp().Driver().AbsolutePositionForObject(w.win.Content()).Y
	m := widget.NewPopUpMenu(w.win.MainMenu().Items[0], c)
	m.ShowAtPosition(fyne.NewPos(4, top))
	return m.Hide
}

// showEditMenu changes the length, as typing it would, and opens the Edit
// menu naming the step undo would take.
func showEditMenu(w *Window) func() {
	typeLength(w, "22 ft")
	c := w.win.Canvas()
	top := fyne.CurrentApp().Driver().AbsolutePositionForObject(w.win.Content()).Y
	m := widget.NewPopUpMenu(w.win.MainMenu().Items[1], c)
	m.ShowAtPosition(fyne.NewPos(44, top))
	return func() {
		m.Hide()
		w.Undo()
	}
}

// showRefused types a length the scheme refuses: the banner says why, the
// result on screen stays the last valid one.
func showRefused(w *Window) func() {
	typeLength(w, "-3 m")
	return w.Undo
}

// typeLength types text into the length field and commits it, as Enter does.
func typeLength(w *Window, text string) {
	f := w.chart.fs.byID["length"]
	f.entry.SetText(text)
	f.entry.typed()
	f.entry.commit()
}

// tabber is a tab container: app tabs or document tabs.
type tabber interface {
	Selected() *container.TabItem
	Select(*container.TabItem)
	items() []*container.TabItem
}

type appTabs struct{ *container.AppTabs }

func (t appTabs) items() []*container.TabItem { return t.Items }

type docTabs struct{ *container.DocTabs }

func (t docTabs) items() []*container.TabItem { return t.Items }

// eachTabs calls f for every tab container in the window's layout.
func eachTabs(o fyne.CanvasObject, f func(tabber)) {
	switch x := o.(type) {
	case *container.AppTabs:
		f(appTabs{x})
		for _, it := range x.Items {
			eachTabs(it.Content, f)
		}
	case *container.DocTabs:
		f(docTabs{x})
		for _, it := range x.Items {
			eachTabs(it.Content, f)
		}
	case *fyne.Container:
		for _, c := range x.Objects {
			eachTabs(c, f)
		}
	case *container.Split:
		eachTabs(x.Leading, f)
		eachTabs(x.Trailing, f)
	case *container.Scroll:
		eachTabs(x.Content, f)
	}
}

// shotsDir returns the screenshot directory when the window runs to take
// screenshots, else "".
func shotsDir() string { return os.Getenv(shotsEnv) }

// takeShots fills the screen with the window, writes every view of
// shotViews into dir as <view>-<width>x<height>.png, and quits. It runs on
// its own goroutine once the window is shown.
func (w *Window) takeShots(dir string, screen fyne.Size) {
	fail := func(err error) {
		log.Printf("upright: screenshots: %v", err)
		fyne.Do(w.app.Quit)
	}
	if err := os.MkdirAll(dir, 0o755); err != nil {
		fail(err)
		return
	}
	settle := func() {
		var gen, sg uint64
		fyne.DoAndWait(func() { gen, sg = w.reqGen, w.st.SchemeGen })
		w.eng.Wait(gen, sg, true, 30*time.Second)
		time.Sleep(700 * time.Millisecond) // the chart at its new size, painted
		fyne.DoAndWait(func() { gen, sg = w.reqGen, w.st.SchemeGen })
		w.eng.Wait(gen, sg, true, 30*time.Second)
		time.Sleep(500 * time.Millisecond)
	}
	fyne.DoAndWait(func() { w.win.Resize(screen) })
	settle()
	for _, v := range shotViews {
		undo := func() {}
		if v.show != nil {
			fyne.DoAndWait(func() { undo = v.show(w) })
		}
		settle()
		var err error
		fyne.DoAndWait(func() {
			c := w.win.Canvas()
			sz := c.Size()
			path := filepath.Join(dir, fmt.Sprintf("%s-%dx%d.png", v.name, int(sz.Width+0.5), int(sz.Height+0.5)))
			var f *os.File
			if f, err = os.Create(path); err != nil {
				return
			}
			img, gerr := grabScreen(c.PixelCoordinateForPosition(fyne.NewPos(sz.Width, sz.Height)))
			if gerr != nil {
				img = c.Capture()
			}
			err = png.Encode(f, img)
			if cerr := f.Close(); err == nil {
				err = cerr
			}
			if err == nil {
				log.Printf("upright: wrote %s", path)
			}
			undo()
		})
		if err != nil {
			fail(err)
			return
		}
	}
	fyne.Do(w.app.Quit)
}
