package cli

import (
	"errors"
	"fmt"
	"testing"

	"github.com/stretchr/testify/assert"

	"upright/ui/model"
)

func TestOneCommandTableDrivesHelpAndDispatch(t *testing.T) {
	code, help, _ := run("help")
	assert.Equal(t, 0, code)
	for _, name := range CommandNames() {
		assert.True(t, IsCommand([]string{name}), "%s is a command", name)
		assert.Contains(t, help, "upright "+name+" ", "help lists %s", name)
		code, _, _ := run(name, "-h")
		assert.Equal(t, 0, code, "%s -h", name)
	}
	assert.False(t, IsCommand([]string{"frobnicate"}))
	code, _, errOut := run("frobnicate")
	assert.Equal(t, 2, code)
	for _, name := range CommandNames() {
		assert.Contains(t, errOut, name, "the unknown-command message lists %s", name)
	}
}

func TestExitStatusByTypeNotText(t *testing.T) {
	cases := []struct {
		err  error
		want int
	}{
		{errors.New("invalid argument while writing"), 1}, // the word alone decides nothing
		{fmt.Errorf("writing: %w", errors.New("flag provided but not defined")), 1},
		{usagef("--length %q: not accepted", "x"), 2},
		{fmt.Errorf("wrapped: %w", usagef("--fc: not accepted")), 2},
		{&model.FieldError{Field: "f'c", Value: "0", Accepted: "4,000 to 10,000 psi"}, 2},
		{fmt.Errorf("concrete: %w", &model.FieldError{Field: "f'c"}), 2},
	}
	for _, c := range cases {
		assert.Equal(t, c.want, ExitStatus(c.err), "%v", c.err)
	}
	// A flag-package parse error is bad input, typed as such by schemeFrom.
	code, _, errOut := run("compare", "--self-weight=maybe")
	assert.Equal(t, 2, code)
	assert.Contains(t, errOut, "self-weight")
	code, _, _ = run("report", "--top", "many", "--out", t.TempDir()+"/r.pdf")
	assert.Equal(t, 2, code)
}
