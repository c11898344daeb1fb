package ui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/theme"
	"fyne.io/fyne/v2/widget"
)

// prefSectionShut prefixes the preference that keeps a folded inputs section.
const prefSectionShut = "layout.folded."

// inputSection is one foldable section of the inputs: its heading's fold
// button and the rows under it.
type inputSection struct {
	title  string
	body   *fyne.Container
	button *widget.Button
}

// foldSections makes every section of the inputs foldable: each box under
// inputs that starts with a heading (see heading) gets a fold button beside
// its title, and the rows after the heading move into a body the button
// hides and shows. Rows added to a section before this runs fold with it, so
// a new input row needs nothing here.
func (p *inputsPane) foldSections(inputs fyne.CanvasObject) {
	box, ok := inputs.(*fyne.Container)
	if !ok {
		return
	}
	for _, o := range box.Objects {
		sec, ok := o.(*fyne.Container)
		if !ok || len(sec.Objects) < 2 {
			continue
		}
		title, ok := headingTitle(sec.Objects[0])
		if !ok {
			continue
		}
		s := &inputSection{title: title, body: container.NewVBox(sec.Objects[1:]...)}
		s.button = widget.NewButtonWithIcon("", theme.MenuDropUpIcon(), func() { p.FoldSection(s.title, s.body.Visible()) })
		s.button.Importance = widget.LowImportance
		head := sec.Objects[0].(*fyne.Container)
		head.Objects[1] = container.NewBorder(nil, nil, nil, s.button, head.Objects[1])
		sec.Objects = []fyne.CanvasObject{head, s.body}
		p.inSections = append(p.inSections, s)
		if p.prefs.Bool(prefSectionShut + title) {
			p.FoldSection(title, true)
		}
	}
}

// headingTitle returns the title of a heading made by heading.
func headingTitle(o fyne.CanvasObject) (string, bool) {
	c, ok := o.(*fyne.Container)
	if !ok || len(c.Objects) != 2 {
		return "", false
	}
	if _, ok := c.Objects[0].(*widget.Separator); !ok {
		return "", false
	}
	l, ok := c.Objects[1].(*widget.Label)
	if !ok || l.SizeName != theme.SizeNameSubHeadingText {
		return "", false
	}
	return l.Text, true
}

// FoldSection folds (on) or opens the inputs section of that title, and
// remembers it in the preferences.
func (p *inputsPane) FoldSection(title string, on bool) {
	for _, s := range p.inSections {
		if s.title != title {
			continue
		}
		if on {
			s.body.Hide()
			s.button.SetIcon(theme.MenuDropDownIcon())
		} else {
			s.body.Show()
			s.button.SetIcon(theme.MenuDropUpIcon())
		}
		p.prefs.SetBool(prefSectionShut+title, on)
	}
}

// SectionFolded reports whether the inputs section of that title is folded.
func (p *inputsPane) SectionFolded(title string) bool {
	for _, s := range p.inSections {
		if s.title == title {
			return !s.body.Visible()
		}
	}
	return false
}
