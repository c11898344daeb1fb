package ui

import (
	"fmt"
	"time"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/canvas"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"

	"upright/ui/model"
)

// statusPane is the window's messages: the banner that floats over the
// chart while the inputs cannot be evaluated, the status line under
// everything and the caution beside it. None of them moves another widget.
type statusPane struct {
	banner     *fyne.Container
	holder     *fyne.Container // floats the banner under the view tabs' bar
	bannerText *widget.Label
	status     *widget.Label
	caution    *widget.Label
	bar        fyne.CanvasObject // the status line with the caution

	notice      string    // a message kept in the status line for a while
	noticeUntil time.Time // when the evaluation summary may take the status line back
}

// noticeFor is how long a file action's message stays in the status bar.
const noticeFor = 12 * time.Second

// newStatusPane builds the banner, the status line and the caution.
func newStatusPane() *statusPane {
	p := &statusPane{}
	p.bannerText = widget.NewLabel("")
	p.bannerText.Wrapping = fyne.TextWrapWord
	p.bannerText.Importance = widget.DangerImportance
	p.bannerText.TextStyle = fyne.TextStyle{Bold: true}
	p.banner = container.NewStack(canvas.NewRectangle(bannerColor), p.bannerText)
	p.banner.Hide()

	p.status = widget.NewLabel("")
	p.status.Wrapping = fyne.TextWrapWord
	p.status.Alignment = fyne.TextAlignTrailing
	// The whole short caution, wrapped onto as many lines as the width
	// needs, so "licensed structural engineer" and "local code" are always
	// on screen.
	p.caution = widget.NewLabel("⚠ " + model.Caution + "  (Help ▸ Cautions)")
	p.caution.Importance = widget.WarningImportance
	p.caution.Wrapping = fyne.TextWrapWord
	// The status line always holds two lines, so a message that wraps (at a
	// word) or clears moves nothing above it.
	twoLines := widget.NewLabel("X\nX").MinSize().Height
	p.bar = container.NewBorder(nil, nil, nil, container.New(&fixedLayout{size: fyne.NewSize(300, twoLines)}, p.status), p.caution)
	return p
}

// Object returns the status line with the caution; the banner is placed
// over the views by the window (BannerUnder).
func (p *statusPane) Object() fyne.CanvasObject { return p.bar }

// BannerUnder returns the banner in a holder to be stacked over the view
// tabs: it floats across the top of their content, just under the tab bar,
// so the tabs stay usable and nothing moves when it shows or clears.
func (p *statusPane) BannerUnder(tabs *container.AppTabs) fyne.CanvasObject {
	p.holder = container.New(&underTabBar{tabs: tabs}, p.banner)
	return p.holder
}

// underTabBar lays its objects across the top of a tab container's content,
// each at the height its text needs; it asks for no room of its own.
type underTabBar struct{ tabs *container.AppTabs }

// Layout places each object under the tab bar, across the width.
func (l *underTabBar) Layout(objs []fyne.CanvasObject, size fyne.Size) {
	top := float32(0)
	if it := l.tabs.Selected(); it != nil && it.Content != nil {
		top = it.Content.Position().Y
	}
	for _, o := range objs {
		o.Resize(fyne.NewSize(size.Width, o.Size().Height)) // the width first: wrapped text finds its height
		o.Move(fyne.NewPos(0, top))
		o.Resize(fyne.NewSize(size.Width, o.MinSize().Height))
	}
}

// MinSize is nothing: the banner floats over what is under it.
func (l *underTabBar) MinSize([]fyne.CanvasObject) fyne.Size { return fyne.Size{} }

// Show sums up an evaluated snapshot in the status line, unless a message
// is being kept there.
func (p *statusPane) Show(s *Snapshot) {
	if msg := p.Notice(); msg != "" {
		setWrappedText(p.status, msg)
		return
	}
	n := 0
	for i := range s.Result.Families {
		n += len(s.Result.Families[i].Rows)
	}
	setWrappedText(p.status, fmt.Sprintf("%d candidates in %d families · evaluated in %.1f ms", n, len(s.Result.Families), float64(s.Took.Microseconds())/1000))
}

// say shows a message in the status line and keeps it there for noticeFor,
// over the evaluation summary.
func (p *statusPane) say(msg string) {
	p.notice, p.noticeUntil = msg, time.Now().Add(noticeFor)
	setWrappedText(p.status, msg)
}

// Notice returns the message the status line keeps, or "" when none.
func (p *statusPane) Notice() string {
	if time.Now().After(p.noticeUntil) {
		return ""
	}
	return p.notice
}

// setBanner shows msg in the banner, or hides it when msg is empty.
func (p *statusPane) setBanner(msg string) {
	p.bannerText.SetText(msg)
	if msg == "" {
		p.banner.Hide()
	} else {
		p.banner.Show()
	}
	if p.holder != nil {
		p.holder.Refresh()
	}
}

// BannerText returns the banner's message; empty when hidden.
func (p *statusPane) BannerText() string {
	if !p.banner.Visible() {
		return ""
	}
	return p.bannerText.Text
}

var _ pane = (*statusPane)(nil)
