//go:build !linux || android || !cgo

package ui

import (
	"errors"
	"image"
)

// grabScreen is only available on Linux with X11; elsewhere the window's
// own capture is used.
func grabScreen(w, h int) (image.Image, error) {
	return nil, errors.New("no X screen grab in this build")
}
