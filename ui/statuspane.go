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
// over the chart by the window (Banner).
func (p *statusPane) Object() fyne.CanvasObject { return p.bar }

// Banner returns the banner, to float over the top of the chart.
func (p *statusPane) Banner() fyne.CanvasObject { return p.banner }

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
}

// BannerText returns the banner's message; empty when hidden.
func (p *statusPane) BannerText() string {
	if !p.banner.Visible() {
		return ""
	}
	return p.bannerText.Text
}

var _ pane = (*statusPane)(nil)
