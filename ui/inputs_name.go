package ui

import (
	"strings"
	"unicode"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"

	"upright/ui/model"
	"upright/ui/schemefile"
)

// buildNameField makes the scheme's name editable: it names the window, the
// suggested file name, the report and exported charts.
func (w *Window) buildNameField() fyne.CanvasObject {
	w.nameEntry = newCommitEntry(w.do, func(s string) {
		name := cleanName(s)
		w.change(func(sc *model.Scheme) { sc.Name = name })
		w.syncName()
	})
	w.nameEntry.SetPlaceHolder("Untitled scheme")
	w.nameEntry.OnChanged = func(string) {
		if w.quiet == 0 {
			w.nameEntry.typed()
		}
	}
	return container.NewVBox(row("Scheme name", w.nameEntry))
}

// syncName shows the scheme's name in its entry, without firing a change.
func (w *Window) syncName() {
	if w.nameEntry != nil && w.nameEntry.Text != w.st.Draft.Name {
		w.quiet++
		w.nameEntry.SetText(w.st.Draft.Name)
		w.quiet--
	}
}

// cleanName keeps one line of at most schemefile.MaxNameLen characters, as
// a scheme file accepts: control characters become spaces.
func cleanName(s string) string {
	s = strings.Map(func(r rune) rune {
		if unicode.IsControl(r) {
			return ' '
		}
		return r
	}, s)
	if r := []rune(s); len(r) > schemefile.MaxNameLen {
		s = string(r[:schemefile.MaxNameLen])
	}
	return s
}
