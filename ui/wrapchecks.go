package ui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/layout"
	"fyne.io/fyne/v2/widget"
)

// wrapLongChecks replaces, under o, every check box whose text is wider than
// limit with the box and its text as a wrapping label beside it, so a narrow
// inputs pane wraps the text instead of cutting it or widening the pane.
// It walks containers and accordion items, so check boxes added later to
// the inputs are handled too.
func wrapLongChecks(o fyne.CanvasObject, limit float32) {
	switch x := o.(type) {
	case *fyne.Container:
		for i, c := range x.Objects {
			if ch, ok := c.(*widget.Check); ok && ch.MinSize().Width > limit {
				x.Objects[i] = wrapCheck(ch)
				continue
			}
			wrapLongChecks(c, limit)
		}
	case *widget.Accordion:
		for _, it := range x.Items {
			if ch, ok := it.Detail.(*widget.Check); ok && ch.MinSize().Width > limit {
				it.Detail = wrapCheck(ch)
				continue
			}
			wrapLongChecks(it.Detail, limit)
		}
	case *container.Scroll:
		wrapLongChecks(x.Content, limit)
	}
}

// wrapCheck puts a check box's text in a wrapping label beside the box;
// tapping the label toggles the box, as tapping its text did.
func wrapCheck(ch *widget.Check) fyne.CanvasObject {
	l := &checkText{check: ch}
	l.Text = ch.Text
	l.Wrapping = fyne.TextWrapWord
	l.ExtendBaseWidget(l)
	ch.Text = ""
	ch.Refresh()
	return container.NewBorder(nil, nil, container.NewVBox(ch, layout.NewSpacer()), nil, l)
}

// checkText is a check box's text as a label that toggles the box when tapped.
type checkText struct {
	widget.Label
	check *widget.Check
}

// Tapped toggles the check box unless it is disabled.
func (t *checkText) Tapped(*fyne.PointEvent) {
	if !t.check.Disabled() {
		t.check.SetChecked(!t.check.Checked)
	}
}
