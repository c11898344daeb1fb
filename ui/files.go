package ui

import (
	"bytes"
	"context"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"reflect"
	"strings"
	"sync"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/storage"

	"upright/plots"
	"upright/ui/chart"
	"upright/ui/cli"
	"upright/ui/model"
	"upright/ui/report"
	"upright/ui/schemefile"
)

// Preference keys of the file actions.
const (
	prefRecent     = "recent.schemes" // the recent scheme files, a schemefile.Recent string
	prefSchemePath = "scheme.path"    // the file the scheme on screen was opened from or saved to
	prefStoredAt   = "scheme.stored"  // when prefScheme was last written, Unix nanoseconds
)

// autosaveName is the autosave file's name in the app's storage root.
const autosaveName = "autosave" + schemefile.Extension

// autosaveEvery is the autosaver's interval.
const autosaveEvery = 4 * time.Second

// chartExportSize is the page of an exported chart: 10 × 6 in at 200 dpi for PNG.
var chartExportSize = plots.Size{Width: 720, Height: 432, DPI: 200}

// filesPane is the scheme's file and what is written from it: open, save,
// the recent files, the autosave, the exports and their dialogs. It reads
// the state; a file opened reaches the state through the host's LoadScheme,
// one undoable step.
type filesPane struct {
	win   fyne.Window // parent of the dialogs
	prefs fyne.Preferences
	st    *State // read only
	host  fileHost
	do    func(func()) // runs a function on the UI goroutine

	path      string       // the scheme file; "" when the scheme has none yet
	clean     model.Scheme // the valid scheme as last opened or saved: differences are unsaved changes
	recent    schemefile.Recent
	auto      *schemefile.Autosaver
	lastTitle string
}

// fileHost is what the files pane needs of the window.
type fileHost interface {
	LoadScheme(sc model.Scheme)          // a scheme opened, as one undoable step
	exportInputs() (exportInputs, error) // what an export writes, taken now
	notify(msg string)                   // a message kept in the status line
	updateTitle()                        // the window title follows the file
	menuChanged()                        // the recent list changed
	closed() bool                        // the window is closing
}

// newFilesPane makes the files pane of a window, with the recent list from
// the preferences and the scheme on screen as saved.
func newFilesPane(win fyne.Window, prefs fyne.Preferences, st *State, host fileHost, do func(func())) *filesPane {
	useAtomicFileWriters()
	r, _ := schemefile.ParseRecent(prefs.String(prefRecent))
	return &filesPane{win: win, prefs: prefs, st: st, host: host, do: do, recent: r, clean: st.Valid}
}

// title is the window title: the scheme's name, with a trailing " •" while
// it has unsaved changes; changed reports whether it differs from the last.
func (f *filesPane) title() (t string, changed bool) {
	name := strings.TrimSpace(f.st.Valid.Name)
	if name == "" {
		name = "Untitled scheme"
	}
	t = "Upright — " + name
	if f.Dirty() {
		t += " •"
	}
	changed = t != f.lastTitle
	f.lastTitle = t
	return t, changed
}

// notify shows a file action's message in the status line and keeps it
// there for a while, over the evaluation summary.
func (w *Window) notify(msg string) { w.status.say(msg) }

// menuChanged sets the main menu again (the recent files changed).
func (w *Window) menuChanged() { w.win.SetMainMenu(w.mainMenu()) }

// closed reports whether the window is closing.
func (w *Window) closed() bool { return w.closing.Load() }

// windows maps each open fyne.Window to its Window, so the hooks (which are
// handed the fyne.Window) reach the window's file state.
var (
	windowsMu sync.Mutex
	windows   = map[fyne.Window]*Window{}
)

func registerWindow(w *Window) {
	windowsMu.Lock()
	windows[w.win] = w
	windowsMu.Unlock()
}

func unregisterWindow(w *Window) {
	windowsMu.Lock()
	delete(windows, w.win)
	windowsMu.Unlock()
}

func windowOf(win fyne.Window) *Window {
	windowsMu.Lock()
	defer windowsMu.Unlock()
	return windows[win]
}

// init fills the file hooks with the scheme-file dialogs and the report export.
func init() {
	OpenHook = func(win fyne.Window, load func(model.Scheme)) {
		if w := windowOf(win); w != nil {
			w.files.showOpenDialog()
		}
	}
	SaveHook = func(win fyne.Window, sc model.Scheme) {
		w := windowOf(win)
		if w == nil {
			return
		}
		if w.files.path == "" {
			w.files.SaveAs()
			return
		}
		_ = w.files.SaveFile(w.files.path)
	}
	ExportHook = func(win fyne.Window, ex Export) {
		if w := windowOf(win); w != nil {
			w.files.showExportDialog("Export the client report", ".pdf", "report", w.files.startReport)
		}
	}
}

// normalised returns sc as the window's state holds it once loaded, so it
// compares equal with the window's valid scheme when nothing was changed.
func normalised(sc model.Scheme) model.Scheme { return NewState(sc).Valid }

// Dirty reports whether the scheme on screen differs from the one last opened or saved.
func (f *filesPane) Dirty() bool {
	return !reflect.DeepEqual(f.st.Valid, f.clean)
}

// Path returns the scheme file of the scheme on screen, or "" when it has none.
func (f *filesPane) Path() string { return f.path }

// setPath records the file behind the scheme on screen, and that the scheme
// on screen is what it holds.
func (f *filesPane) setPath(path string) {
	f.path = path
	f.clean = f.st.Valid
	f.prefs.SetString(prefSchemePath, path)
	if path != "" {
		f.addRecent(path)
	}
	f.host.updateTitle()
}

// addRecent puts a path at the top of the recent list and rebuilds the menu.
func (f *filesPane) addRecent(path string) {
	f.recent.Add(path)
	f.storeRecent()
}

func (f *filesPane) storeRecent() {
	f.prefs.SetString(prefRecent, f.recent.String())
	f.host.menuChanged()
}

// RecentPaths returns the recent scheme files, most recent first.
func (f *filesPane) RecentPaths() []string { return f.recent.Paths() }

// OpenFile loads the scheme file at path into the window. On error it shows
// the message in a dialog, keeps the scheme on screen and returns the error.
func (f *filesPane) OpenFile(path string) error {
	sc, err := schemefile.Load(path)
	if err != nil {
		f.showFileError("The scheme could not be opened", err)
		return err
	}
	f.host.LoadScheme(sc)
	f.setPath(path)
	f.host.notify("Opened " + filepath.Base(path))
	return nil
}

// openReader loads a scheme from a file dialog's reader: through its path
// when it is a local file, else by reading at most MaxSize bytes.
func (f *filesPane) openReader(rc fyne.URIReadCloser) error {
	defer rc.Close()
	u := rc.URI()
	if u.Scheme() == "file" {
		return f.OpenFile(u.Path())
	}
	b, err := io.ReadAll(io.LimitReader(rc, schemefile.MaxSize+1))
	if err == nil {
		var sc model.Scheme
		if sc, err = schemefile.Unmarshal(b); err == nil {
			f.host.LoadScheme(sc)
			f.host.notify("Opened " + u.Name())
			return nil
		}
	}
	err = fmt.Errorf("%s: %w", u.Name(), err)
	f.showFileError("The scheme could not be opened", err)
	return err
}

// SaveFile writes the valid scheme to path atomically (schemefile.Save) and
// makes path the scheme's file. On error it shows the message and returns it.
func (f *filesPane) SaveFile(path string) error {
	if !f.st.HaveValid {
		err := errors.New("the inputs do not make a valid scheme yet; fix the fields named in the banner first")
		f.showFileError("The scheme was not saved", err)
		return err
	}
	if err := schemefile.Save(path, f.st.Valid); err != nil {
		f.showFileError("The scheme was not saved", err)
		return err
	}
	f.setPath(path)
	f.host.notify("Saved " + filepath.Base(path))
	return nil
}

// SaveAs asks where to save the scheme.
func (f *filesPane) SaveAs() {
	f.showSaveDialog("Save the scheme", schemefile.Extension, "", func(path string) { _ = f.SaveFile(path) })
}

// showOpenDialog asks for a scheme file to open.
func (f *filesPane) showOpenDialog() {
	d := dialog.NewFileOpen(func(rc fyne.URIReadCloser, err error) {
		if err != nil {
			f.showFileError("The scheme could not be opened", err)
			return
		}
		if rc == nil {
			return // cancelled
		}
		_ = f.openReader(rc)
	}, f.win)
	d.SetFilter(storage.NewExtensionFileFilter([]string{".json"}))
	f.startIn(d)
	d.Resize(fyne.NewSize(820, 560))
	d.Show()
}

// showSaveDialog asks for a file to write, suggesting the scheme's name with
// the extension ext (and suffix before it), and calls write with its path.
// Fyne's dialog hands over a writer on the chosen file; for local files it
// is an atomicFiles writer, which leaves the file untouched when closed
// unused, and the file is then written by path, atomically (a temporary file
// beside it, renamed over it), so a failed save leaves the earlier file.
func (f *filesPane) showSaveDialog(title, ext, suffix string, write func(path string)) {
	d := dialog.NewFileSave(func(wc fyne.URIWriteCloser, err error) {
		if err != nil {
			f.showFileError(title+" failed", err)
			return
		}
		if wc == nil {
			return // cancelled
		}
		u := wc.URI()
		_ = wc.Close()
		if u.Scheme() != "file" {
			f.showFileError(title+" failed", fmt.Errorf("%s is not a local file; choose a file on this computer", u))
			return
		}
		write(u.Path())
	}, f.win)
	d.SetTitleText(title)
	d.SetFileName(fileStem(f.st.Valid.Name) + suffix + ext)
	if i := strings.LastIndex(ext, "."); i >= 0 {
		d.SetFilter(storage.NewExtensionFileFilter([]string{ext[i:]}))
	}
	f.startIn(d)
	d.Resize(fyne.NewSize(820, 560))
	d.Show()
}

// showExportDialog asks where to export and runs export with the path.
func (f *filesPane) showExportDialog(title, ext, suffix string, export func(path string)) {
	f.showSaveDialog(title, ext, "-"+suffix, export)
}

// startIn opens a file dialog in the folder of the scheme's file, or of the
// most recent one.
func (f *filesPane) startIn(d *dialog.FileDialog) {
	p := f.path
	if p == "" && f.recent.Len() > 0 {
		p = f.recent.Paths()[0]
	}
	if p == "" {
		return
	}
	if l, err := storage.ListerForURI(storage.NewFileURI(filepath.Dir(p))); err == nil {
		d.SetLocation(l)
	}
}

// fileStem makes a file name from a scheme name: letters, digits, '-' and
// '_' kept, runs of anything else turned into one '-'; "scheme" when nothing is left.
func fileStem(name string) string {
	var b strings.Builder
	dash := false
	for _, r := range name {
		ok := r == '-' || r == '_' || (r >= '0' && r <= '9') || (r >= 'a' && r <= 'z') || (r >= 'A' && r <= 'Z')
		if ok {
			b.WriteRune(r)
			dash = false
		} else if !dash && b.Len() > 0 {
			b.WriteByte('-')
			dash = true
		}
		if b.Len() >= 60 {
			break
		}
	}
	s := strings.Trim(b.String(), "-")
	if s == "" {
		return "scheme"
	}
	return s
}

// showFileError shows a file action's error in a dialog.
func (f *filesPane) showFileError(title string, err error) {
	dialog.ShowInformation(title, err.Error(), f.win)
	f.host.notify(title)
}

// exportInputs is what an export needs from the window, taken on the UI goroutine.
type exportInputs struct {
	sc     model.Scheme
	rng    model.Range
	pinned []string
	xs     []model.Crossover
	all    bool
}

func (w *Window) exportInputs() (exportInputs, error) {
	if !w.st.HaveValid {
		return exportInputs{}, errors.New("the inputs do not make a valid scheme yet; fix the fields named in the banner first")
	}
	in := exportInputs{sc: w.st.Valid, rng: w.st.Range, pinned: append([]string(nil), w.picks.pinned...), all: true}
	if w.xsp.gen == w.st.SchemeGen {
		in.xs = familyChanges(w.xsp.all)
	}
	return in, nil
}

// writeReport writes the client report of in to path atomically.
func writeReport(path string, in exportInputs) error {
	m, err := model.New(in.sc)
	if err != nil {
		return err
	}
	var buf bytes.Buffer
	if err := report.Write(&buf, m, report.Options{Version: cli.Version, Range: in.rng}); err != nil {
		return err
	}
	return schemefile.WriteFileAtomic(path, buf.Bytes())
}

// writeCSV writes the candidate table of in to path atomically.
func writeCSV(path string, in exportInputs) error {
	m, err := model.New(in.sc)
	if err != nil {
		return err
	}
	var buf bytes.Buffer
	if err := report.WriteCSV(&buf, m, report.CSVOptions{All: in.all}); err != nil {
		return err
	}
	return schemefile.WriteFileAtomic(path, buf.Bytes())
}

// writeChart writes the chart of in at its length to path, in the format its
// extension names (.png, .svg or .pdf).
func writeChart(path string, in exportInputs) error {
	m, err := model.New(in.sc)
	if err != nil {
		return err
	}
	res, err := m.Evaluate(context.Background(), m.Scheme.Setting)
	if err != nil {
		return err
	}
	var pinned []chart.Key
	for _, d := range in.pinned {
		if fi, i, ok := m.Find(d); ok {
			pinned = append(pinned, chart.Key{Family: fi, Index: i})
		}
	}
	ch := chart.NewBuilder(m).Chart(res, chart.Options{Pinned: pinned, Crossovers: in.xs, Range: in.rng, Title: in.sc.Name})
	// chart.Save writes the file itself; it goes to a temporary name
	// first so a failure leaves any earlier file as it was.
	ext := filepath.Ext(path)
	tmp := strings.TrimSuffix(path, ext) + ".upright-tmp" + ext
	if err := chart.Save(tmp, ch, chartExportSize); err != nil {
		os.Remove(tmp)
		return err
	}
	b, err := os.ReadFile(tmp)
	os.Remove(tmp)
	if err != nil {
		return err
	}
	return schemefile.WriteFileAtomic(path, b)
}

// export runs one export synchronously and reports it in the status bar or,
// on error, a dialog.
func (f *filesPane) export(what, path string, write func(string, exportInputs) error) error {
	in, err := f.host.exportInputs()
	if err == nil {
		err = write(path, in)
	}
	f.exportDone(what, path, err)
	return err
}

// exportBackground runs one export off the UI goroutine (a report takes a
// moment) and reports it on the UI goroutine.
func (f *filesPane) exportBackground(what, path string, write func(string, exportInputs) error) {
	in, err := f.host.exportInputs()
	if err != nil {
		f.exportDone(what, path, err)
		return
	}
	f.host.notify("Writing " + filepath.Base(path) + "…")
	go func() {
		err := write(path, in)
		if f.host.closed() {
			return
		}
		f.do(func() { f.exportDone(what, path, err) })
	}()
}

func (f *filesPane) exportDone(what, path string, err error) {
	if err != nil {
		f.showFileError("The "+what+" was not written", err)
		return
	}
	f.host.notify("Wrote " + filepath.Base(path))
}

// ExportReportFile writes the client report (PDF) of the valid scheme to path.
func (f *filesPane) ExportReportFile(path string) error { return f.export("report", path, writeReport) }

// ExportCSVFile writes the candidate table (CSV, every candidate) of the valid scheme to path.
func (f *filesPane) ExportCSVFile(path string) error { return f.export("table", path, writeCSV) }

// ExportChartFile writes the chart of the valid scheme to path (.png, .svg or .pdf).
func (f *filesPane) ExportChartFile(path string) error { return f.export("chart", path, writeChart) }

func (f *filesPane) startReport(path string) { f.exportBackground("report", path, writeReport) }

// ExportCSV asks where to write the candidate table.
func (f *filesPane) ExportCSV() {
	f.showExportDialog("Export the candidate table", ".csv", "table", func(p string) { f.exportBackground("table", p, writeCSV) })
}

// ExportChart asks where to write the chart; the extension chosen picks the format.
func (f *filesPane) ExportChart() {
	f.showSaveDialog("Export the chart (.png, .svg or .pdf)", ".png", "-chart", func(p string) {
		switch strings.ToLower(filepath.Ext(p)) {
		case ".png", ".svg", ".pdf":
		default:
			p += ".png"
		}
		f.exportBackground("chart", p, writeChart)
	})
}

// openRecent opens a file of the recent list, dropping it from the list when it cannot be read.
func (f *filesPane) openRecent(path string) {
	if err := f.OpenFile(path); err != nil {
		f.recent.Remove(path)
		f.storeRecent()
	}
}

// recentMenu lists the recent files, most recent first.
func (f *filesPane) recentMenu() *fyne.Menu {
	var items []*fyne.MenuItem
	for _, p := range f.recent.Paths() {
		p := p
		items = append(items, fyne.NewMenuItem(filepath.Base(p)+"   ("+filepath.Dir(p)+")", func() { f.openRecent(p) }))
	}
	if len(items) == 0 {
		none := fyne.NewMenuItem("No scheme opened or saved yet", nil)
		none.Disabled = true
		return fyne.NewMenu("", none)
	}
	items = append(items, fyne.NewMenuItemSeparator(), fyne.NewMenuItem("Clear this list", func() {
		f.recent = schemefile.Recent{}
		f.storeRecent()
	}))
	return fyne.NewMenu("", items...)
}

// autosavePath returns the autosave file of app a: in its storage root, or
// the user's configuration folder when the storage has no local folder.
func autosavePath(a fyne.App) string {
	if root := a.Storage().RootURI(); root != nil && root.Scheme() == "file" {
		return filepath.Join(root.Path(), autosaveName)
	}
	if dir, err := os.UserConfigDir(); err == nil {
		return filepath.Join(dir, "upright", autosaveName)
	}
	return ""
}

// startAutosave starts autosaving the valid scheme to path; errors go to the status bar.
func (f *filesPane) startAutosave(path string, every time.Duration) error {
	if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
		return err
	}
	a, err := schemefile.NewAutosaver(path, every, func(err error) {
		if f.host.closed() {
			return
		}
		f.do(func() { f.host.notify("Autosave failed: " + err.Error()) })
	})
	if err != nil {
		return err
	}
	f.auto = a
	return nil
}

// stopAutosave writes any pending scheme and stops the autosaver.
func (f *filesPane) stopAutosave() {
	if f.auto != nil {
		_ = f.auto.Stop()
	}
}

// autosaveChanged hands the valid scheme to the autosaver.
func (f *filesPane) autosaveChanged() {
	if f.auto != nil && f.st.HaveValid {
		f.auto.Update(f.st.Valid)
	}
}

// startupScheme picks the scheme to open: the one stored in the preferences
// (or the demo), unless the autosave file is newer than both that and the
// scheme's file and holds a different valid scheme, which is then restored.
// It returns the scheme, its file ("" when none), the scheme of that file,
// and a message for the status bar ("" when there is nothing to say).
func startupScheme(p fyne.Preferences, autoPath string) (sc model.Scheme, path string, clean model.Scheme, msg string) {
	sc, err := savedScheme(p)
	if err != nil {
		msg = err.Error()
	}
	clean = DemoScheme()
	latest := time.Unix(0, int64(p.Int(prefStoredAt)))
	if path = p.String(prefSchemePath); path != "" {
		if fsc, err := schemefile.Load(path); err == nil {
			clean = fsc
			if fi, err := os.Stat(path); err == nil && fi.ModTime().After(latest) {
				latest = fi.ModTime()
			}
		} else {
			path = ""
		}
	}
	if autoPath == "" {
		return sc, path, clean, msg
	}
	fi, err := os.Stat(autoPath)
	if err != nil || !fi.ModTime().After(latest) {
		return sc, path, clean, msg
	}
	asc, err := schemefile.Load(autoPath)
	if err != nil || reflect.DeepEqual(normalised(asc), normalised(sc)) {
		return sc, path, clean, msg
	}
	return asc, path, clean, "Restored the autosave of " + fi.ModTime().Format("2 Jan 15:04")
}
