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
func (p *inputsPane) buildNameField() fyne.CanvasObject {
	p.nameEntry = newCommitEntry(p.do, func(s string) {
		name := cleanName(s)
		p.change(func(sc *model.Scheme) { sc.Name = name })
		p.syncName()
	})
	p.nameEntry.SetPlaceHolder("Untitled scheme")
	p.nameEntry.OnChanged = func(string) {
		if p.quiet == 0 {
			p.nameEntry.typed()
		}
	}
	return container.NewVBox(row("Scheme name", p.nameEntry))
}

// syncName shows the scheme's name in its entry, without firing a change.
func (p *inputsPane) syncName() {
	if p.nameEntry != nil && p.nameEntry.Text != p.st.Draft.Name {
		p.quiet++
		p.nameEntry.SetText(p.st.Draft.Name)
		p.quiet--
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
