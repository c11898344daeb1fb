package ui

import (
	"testing"

	"github.com/stretchr/testify/assert"

	"upright/ui/model"
)

// The window shows the model's status words, with a mark so a failing row
// reads as failing without its colour.
func TestWindowStatusUsesTheModelWords(t *testing.T) {
	cases := []struct {
		row  model.Row
		want string
	}{
		{model.Row{OK: true, Quick: model.Quick{Permitted: true}}, "✓ " + model.StatusWorks},
		{model.Row{Quick: model.Quick{Permitted: true}}, "✗ " + model.StatusFails},
		{model.Row{}, "✗ " + model.StatusNotPermitted},
	}
	for _, c := range cases {
		assert.Equal(t, c.want, status(&c.row))
	}
	assert.Equal(t, StatusWorks, "✓ works")
}
