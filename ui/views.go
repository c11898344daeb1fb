package ui

import (
	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
)

// shownSetter is a pane that is told when its tab is selected or left, so a
// hidden view does no work. A view pane implements it when it draws.
type shownSetter interface {
	SetShown(on bool)
}

// view is one tab of the view tabs above the slider, after Chart, Sections
// and Map.
type view struct {
	title string
	// room is set for a figure view that takes the centre's height while
	// shown (the table folds to a few rows under it).
	room bool
	// make builds the view's pane; the window is its editor (w satisfies
	// editor) and w.do runs a function on the UI goroutine.
	make func(w *Window) pane
}

// extraViews are the views added as tabs after Chart, Sections and Map, in
// tab order. Adding a view is one line here, e.g.
//
//	{"Variants", true, func(w *Window) pane { return newVariantsPane(w) }},
//
// plus one line in shotViews (ui/shots.go) for its screenshot.
var extraViews = []view{
	{"Variants", true, func(w *Window) pane { return newVariantsPane(w, w.do) }},
	{"Building", true, func(w *Window) pane { return newBuildingPane(w) }},
}

// addViews appends the extra views to the view tabs and feeds them the
// snapshots; selecting a tab tells each view whether it shows. It returns
// the tabs of the views that take the centre's height (view.room).
func (w *Window) addViews(tabs *container.AppTabs) (roomy []*container.TabItem) {
	type shown struct {
		item *container.TabItem
		p    pane
	}
	var views []shown
	for _, v := range extraViews {
		p := v.make(w)
		// A view scrolls inside its tab rather than widen the window: the
		// window's smallest size stays that of the chart and the table.
		item := container.NewTabItem(v.title, container.NewScroll(p.Object()))
		tabs.Append(item)
		w.fed = append(w.fed, p)
		views = append(views, shown{item, p})
		if v.room {
			roomy = append(roomy, item)
		}
	}
	if len(views) == 0 {
		return nil
	}
	prev := tabs.OnSelected
	tabs.OnSelected = func(t *container.TabItem) {
		if prev != nil {
			prev(t)
		}
		for _, v := range views {
			if s, ok := v.p.(shownSetter); ok {
				s.SetShown(t == v.item)
			}
		}
	}
	return roomy
}

// feed hands a snapshot to every pane that follows the snapshots.
func (w *Window) feed(s *Snapshot) {
	for _, p := range w.fed {
		p.Show(s)
	}
}

// Object returns the Sections view's content.
func (v *sectionsView) Object() fyne.CanvasObject { return v.area }

// Show hands the Sections view a snapshot.
func (v *sectionsView) Show(s *Snapshot) { v.show(s) }

// SetShown starts or stops the Sections view following the snapshots.
func (v *sectionsView) SetShown(on bool) { v.setVisible(on) }

var (
	_ pane        = (*sectionsView)(nil)
	_ shownSetter = (*sectionsView)(nil)
)
