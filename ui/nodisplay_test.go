package ui

import (
	"runtime"
	"strings"
	"testing"
)

// Without a display the window says so in one line instead of failing in the driver.
func TestHaveDisplay(t *testing.T) {
	if runtime.GOOS != "linux" {
		t.Skip("the environment names the display only on Linux and the BSDs")
	}
	cases := []struct {
		name string
		env  map[string]string
		want bool
	}{
		{"no display at all (env -u DISPLAY)", map[string]string{}, false},
		{"an X display", map[string]string{"DISPLAY": ":20"}, true},
		{"a Wayland display", map[string]string{"WAYLAND_DISPLAY": "wayland-0"}, true},
	}
	for _, c := range cases {
		got := haveDisplay(func(k string) string { return c.env[k] })
		if got != c.want {
			t.Errorf("%s: haveDisplay = %v, want %v", c.name, got, c.want)
		}
	}
	if strings.Contains(noDisplayMessage, "\n") {
		t.Errorf("the message is more than one line: %q", noDisplayMessage)
	}
}
