//go:build linux && cgo

package ui

import (
	"bytes"
	"os"
	"os/exec"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

// With the Debian default LANG=C.UTF-8 (and the other codeset-only C and
// POSIX forms), Fyne starts without a locale message: this test binary,
// which links Fyne like the program does, is run again under each locale.
func TestCLocaleStartsWithoutAFyneMessage(t *testing.T) {
	for _, env := range [][]string{
		{"LANG=C.UTF-8"},
		{"LC_ALL=C.UTF-8"},
		{"LANG=POSIX.UTF-8"},
		{"LANG=C"},
		{"LANG=en_GB.UTF-8"},
	} {
		cmd := exec.Command(os.Args[0], "-test.run=^$")
		cmd.Env = append(withoutLocale(os.Environ()), env...)
		var stderr bytes.Buffer
		cmd.Stderr = &stderr
		require.NoError(t, cmd.Run(), "%v: %s", env, stderr.String())
		assert.NotContains(t, stderr.String(), "Fyne error", "%v", env)
		assert.NotContains(t, stderr.String(), "locale", "%v", env)
	}
}

// withoutLocale drops the locale variables from an environment.
func withoutLocale(env []string) []string {
	var out []string
	for _, kv := range env {
		name, _, _ := strings.Cut(kv, "=")
		switch name {
		case "LANG", "LANGUAGE", "LC_ALL", "LC_MESSAGES":
			continue
		}
		out = append(out, kv)
	}
	return out
}
