//go:build !wasm && !js && !android && !ios

package ui

import (
	"math"
	"os"
	"strconv"

	"fyne.io/fyne/v2"
	"github.com/go-gl/glfw/v3.3/glfw"
)

// workArea returns the primary monitor's work area (the screen less its
// panels and taskbars) in device-independent pixels at the scale Fyne will
// use, the scale it assumed, and false when no monitor can be asked (no display). It must run on
// the main goroutine before the window is shown; the desktop driver starts
// GLFW there itself later, which then finds it started.
func workArea(a fyne.App) (area fyne.Size, scale float32, ok bool) {
	if err := glfw.Init(); err != nil {
		return fyne.Size{}, 1, false
	}
	m := glfw.GetPrimaryMonitor()
	if m == nil {
		return fyne.Size{}, 1, false
	}
	_, _, w, h := m.GetWorkarea()
	if w <= 0 || h <= 0 {
		if mode := m.GetVideoMode(); mode != nil {
			w, h = mode.Width, mode.Height
		}
	}
	if w <= 0 || h <= 0 {
		return fyne.Size{}, 1, false
	}
	s := monitorScale(a, m)
	return fyne.NewSize(float32(w)/s, float32(h)/s), s, true
}

// monitorScale estimates the scale the desktop driver will give a window on
// m the way it works it out: the monitor's density against 120 dpi (never
// below 1) times the user's scale (FYNE_SCALE or the app setting), to a tenth.
// The window checks the real scale once shown (see refit).
func monitorScale(a fyne.App, m *glfw.Monitor) float32 {
	detected := float32(1)
	if wmm, _ := m.GetPhysicalSize(); wmm > 0 {
		if mode := m.GetVideoMode(); mode != nil {
			dpi := float32(mode.Width) / (float32(wmm) / 25.4)
			if dpi <= 1000 && dpi >= 10 {
				detected = max(1, dpi/120)
			}
		}
	}
	user := float32(1)
	if env := os.Getenv("FYNE_SCALE"); env != "" && env != "auto" {
		if v, err := strconv.ParseFloat(env, 32); err == nil && v > 0 {
			user = float32(v)
		}
	} else if env == "" && a != nil && a.Settings().Scale() > 0 {
		user = a.Settings().Scale()
	}
	s := float32(math.Round(float64(detected*user)*10) / 10)
	if s <= 0 {
		return 1
	}
	return s
}
