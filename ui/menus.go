package ui

import (
	"strings"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/dialog"
	"fyne.io/fyne/v2/driver/desktop"
	"fyne.io/fyne/v2/widget"

	"upright/ui/cli"
	"upright/ui/model"
	"upright/ui/units"
)

// Keyboard shortcuts of the file actions.
var (
	shortcutOpen   = &desktop.CustomShortcut{KeyName: fyne.KeyO, Modifier: fyne.KeyModifierShortcutDefault}
	shortcutSave   = &desktop.CustomShortcut{KeyName: fyne.KeyS, Modifier: fyne.KeyModifierShortcutDefault}
	shortcutSaveAs = &desktop.CustomShortcut{KeyName: fyne.KeyS, Modifier: fyne.KeyModifierShortcutDefault | fyne.KeyModifierShift}
	shortcutExport = &desktop.CustomShortcut{KeyName: fyne.KeyE, Modifier: fyne.KeyModifierShortcutDefault}
	shortcutLength = &desktop.CustomShortcut{KeyName: fyne.KeyL, Modifier: fyne.KeyModifierShortcutDefault}
	shortcutUndo   = &desktop.CustomShortcut{KeyName: fyne.KeyZ, Modifier: fyne.KeyModifierShortcutDefault}
	shortcutRedo   = &desktop.CustomShortcut{KeyName: fyne.KeyZ, Modifier: fyne.KeyModifierShortcutDefault | fyne.KeyModifierShift}
	shortcutRedoY  = &desktop.CustomShortcut{KeyName: fyne.KeyY, Modifier: fyne.KeyModifierShortcutDefault}
)

// fileItem makes a file menu item that runs its hook, or says it is not available.
func fileItem(label string, sc fyne.Shortcut, available bool, run func()) *fyne.MenuItem {
	it := fyne.NewMenuItem(label, run)
	it.Shortcut = sc
	if !available {
		it.Label = label + " (not available in this build)"
		it.Disabled = true
	}
	return it
}

// mainMenu builds the File and Help menus.
func (w *Window) mainMenu() *fyne.MainMenu {
	recent := fyne.NewMenuItem("Open recent", nil)
	recent.ChildMenu = w.files.recentMenu()
	saveAs := fyne.NewMenuItem("Save scheme as…", w.files.SaveAs)
	saveAs.Shortcut = shortcutSaveAs
	file := fyne.NewMenu("File",
		fyne.NewMenuItem("New scheme", w.NewScheme),
		fileItem("Open scheme…", shortcutOpen, OpenHook != nil, w.Open),
		recent,
		fileItem("Save scheme", shortcutSave, SaveHook != nil, w.Save),
		saveAs,
		fyne.NewMenuItemSeparator(),
		fileItem("Export client report (PDF)…", shortcutExport, ExportHook != nil, w.Export),
		fyne.NewMenuItem("Export candidate table (CSV)…", w.files.ExportCSV),
		fyne.NewMenuItem("Export chart (PNG, SVG or PDF)…", w.files.ExportChart),
		fyne.NewMenuItem("Export plan sections (PNG, SVG or PDF)…", w.files.ExportSections),
		fyne.NewMenuItemSeparator(),
		fyne.NewMenuItem("Start again from the demo scheme", func() { w.LoadScheme(DemoScheme()) }),
	)
	help := fyne.NewMenu("Help",
		fyne.NewMenuItem("Cautions", w.ShowCautions),
		fyne.NewMenuItem("Keyboard", w.showKeys),
		fyne.NewMenuItem("About Upright", w.ShowAbout),
	)
	edit := w.newEditMenu()
	w.ed.undoItem.Shortcut = shortcutUndo
	w.ed.redoItem.Shortcut = shortcutRedo
	return fyne.NewMainMenu(file, edit, help)
}

// addShortcuts registers the shortcuts on the canvas too, for drivers without a main menu.
func (w *Window) addShortcuts() {
	c := w.win.Canvas()
	c.AddShortcut(shortcutOpen, func(fyne.Shortcut) { w.Open() })
	c.AddShortcut(shortcutSave, func(fyne.Shortcut) { w.Save() })
	c.AddShortcut(shortcutSaveAs, func(fyne.Shortcut) { w.files.SaveAs() })
	c.AddShortcut(shortcutExport, func(fyne.Shortcut) { w.Export() })
	c.AddShortcut(shortcutLength, func(fyne.Shortcut) { c.Focus(w.chart.slider) })
	c.AddShortcut(shortcutUndo, func(fyne.Shortcut) { w.Undo() })
	c.AddShortcut(shortcutRedo, func(fyne.Shortcut) { w.Redo() })
	c.AddShortcut(shortcutRedoY, func(fyne.Shortcut) { w.Redo() })
	// A desktop driver reports Ctrl+Z and Ctrl+Y as the standard undo and
	// redo shortcuts rather than as key combinations.
	c.AddShortcut(&fyne.ShortcutUndo{}, func(fyne.Shortcut) { w.Undo() })
	c.AddShortcut(&fyne.ShortcutRedo{}, func(fyne.Shortcut) { w.Redo() })
}

// notAvailable tells the user a file action is not in this build.
func (w *Window) notAvailable(what string) {
	dialog.ShowInformation("Not available", what+" is not available in this build.", w.win)
}

// Open runs OpenHook, or says it is not available.
func (w *Window) Open() {
	if OpenHook == nil {
		w.notAvailable("Opening scheme files")
		return
	}
	OpenHook(w.win, w.LoadScheme)
}

// Save runs SaveHook with the last valid scheme, or says it is not available.
func (w *Window) Save() {
	if SaveHook == nil {
		w.notAvailable("Saving scheme files")
		return
	}
	SaveHook(w.win, w.st.Valid)
}

// Export runs ExportHook with what the window shows, or says it is not available.
func (w *Window) Export() {
	if ExportHook == nil {
		w.notAvailable("Exporting a report")
		return
	}
	ex := Export{Scheme: w.st.Valid, Pinned: append([]string(nil), w.picks.pinned...), Selected: w.picks.selected}
	if w.snap != nil {
		ex.Model, ex.Result = w.snap.Model, w.snap.Result
	}
	if w.xsp.gen == w.st.SchemeGen {
		ex.Crossovers = append([]model.Crossover(nil), w.xsp.all...)
	}
	ExportHook(w.win, ex)
}

// LoadScheme replaces the inputs with a scheme (a file opened, the demo);
// the scheme has no file until OpenFile or SaveFile gives it one.
func (w *Window) LoadScheme(sc model.Scheme) {
	before := memoOf(w.st)
	out := w.st.Load(sc)
	w.record("load the scheme “"+strings.TrimSpace(sc.Name)+"”", before)
	w.picks = picks{}
	w.syncInputs()
	w.files.setPath("")
	w.after(out)
	if out.Submit {
		w.xsp.searching()
	}
}

// NewScheme starts a blank scheme with every option at its default and no
// name; it is one undoable step.
func (w *Window) NewScheme() {
	sc := model.DefaultScheme()
	sc.Name = ""
	w.LoadScheme(sc)
	w.notify("New scheme: every input at its default")
}

// ShowCautions shows the full caution text.
func (w *Window) ShowCautions() {
	l := widget.NewLabel(model.CautionFull)
	l.Wrapping = fyne.TextWrapWord
	s := container.NewVScroll(l)
	s.SetMinSize(fyne.NewSize(620, 380))
	dialog.ShowCustom("Cautions", "Close", s, w.win)
}

// ShowAbout shows the version.
func (w *Window) ShowAbout() {
	l := widget.NewLabel("Upright " + cli.Version + "\n\nColumn schemes compared side by side: steel (AISC 360-22), reinforced concrete (ACI 318-19) and timber (NDS 2018), with loads by ASCE 7-22.\n\n" + model.Caution)
	l.Wrapping = fyne.TextWrapWord
	box := container.NewGridWrap(fyne.NewSize(460, 200), l)
	dialog.ShowCustom("About Upright", "Close", box, w.win)
}

func (w *Window) showKeys() {
	dialog.ShowCustom("Keyboard", "Close", widget.NewLabel(keyHelp(w.sys())), w.win)
}

// keyHelp says what each key does, with the length steps in the shown unit.
func keyHelp(sys units.System) string {
	fine, coarse := "1 in", "1 ft"
	if sys == units.SI {
		fine, coarse = "50 mm", "250 mm"
	}
	return "Tab / Shift+Tab   move between inputs (leaving a field applies it)\n" +
		"Enter   apply the field being typed\n" +
		"Ctrl+L   go to the length slider\n" +
		"← →   move the length by " + fine + "\n" +
		"Page Up / Page Down   move the length by " + coarse + "\n" +
		"Home / End   to the ends of the range\n" +
		"Dragging the slider snaps to " + fine + "; hold Shift, Ctrl or Alt to move it freely\n" +
		"Space   choose the focused end condition\n" +
		"Ctrl+Z   undo the last change; Ctrl+Shift+Z or Ctrl+Y   redo it\n" +
		"Ctrl+O / Ctrl+S / Ctrl+E   open, save, export the report\n" +
		"Ctrl+Shift+S   save as"
}
