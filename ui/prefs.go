package ui

import (
	"fmt"
	"time"

	"fyne.io/fyne/v2"

	"upright/ui/model"
	"upright/ui/schemefile"
)

// Preference keys.
const (
	prefScheme = "scheme.json"   // the last valid scheme, JSON
	prefWidth  = "window.width"  // window width, device-independent pixels
	prefHeight = "window.height" // window height
)

// encodeScheme and decodeScheme store a scheme in the preferences, in the
// scheme file format.
var (
	encodeScheme = schemefile.Marshal
	decodeScheme = schemefile.Unmarshal
)

// savedScheme returns the scheme stored by the last run, or the demo scheme
// when there is none or it no longer validates; the error says why the
// stored one was not used (nil when there was none).
func savedScheme(p fyne.Preferences) (model.Scheme, error) {
	s := p.String(prefScheme)
	if s == "" {
		return DemoScheme(), nil
	}
	sc, err := decodeScheme([]byte(s))
	if err != nil {
		return DemoScheme(), fmt.Errorf("the saved scheme could not be read (%v); opened the demo scheme", err)
	}
	if err := sc.Validate(); err != nil {
		return DemoScheme(), fmt.Errorf("the saved scheme is no longer valid (%v); opened the demo scheme", err)
	}
	return sc, nil
}

// storeScheme writes the scheme to the preferences.
func storeScheme(p fyne.Preferences, sc model.Scheme) {
	b, err := encodeScheme(sc)
	if err != nil {
		return
	}
	p.SetString(prefScheme, string(b))
	p.SetInt(prefStoredAt, int(time.Now().UnixNano()))
}

// savedSize returns the stored window size clamped to the work area, or at
// a first start (or when the stored size is unreadable) the largest default
// that fits it (see firstSize); area is zero when unknown.
func savedSize(p fyne.Preferences, area fyne.Size) fyne.Size {
	w := float32(p.FloatWithFallback(prefWidth, 0))
	h := float32(p.FloatWithFallback(prefHeight, 0))
	if !(w >= minWindowSize.Width && w < 20000) || !(h >= minWindowSize.Height && h < 20000) {
		return firstSize(area)
	}
	return clampSize(fyne.NewSize(w, h), area)
}

// storeSize writes the window size to the preferences.
func storeSize(p fyne.Preferences, s fyne.Size) {
	if s.Width < minWindowSize.Width || s.Height < minWindowSize.Height {
		return
	}
	p.SetFloat(prefWidth, float64(s.Width))
	p.SetFloat(prefHeight, float64(s.Height))
}
