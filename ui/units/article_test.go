package units

import (
	"testing"

	"github.com/stretchr/testify/assert"
)

func TestArticleFollowsTheFirstSound(t *testing.T) {
	cases := []struct{ word, want string }{ // English usage (common practice)
		{"area", "an area"},
		{"length", "a length"},
		{"effective-length factor", "an effective-length factor"},
		{"unit", "a unit"},
		{"stress", "a stress"},
		{"Area", "an Area"},
	}
	for _, c := range cases {
		assert.Equal(t, c.want, Article(c.word), c.word)
	}
	_, err := ParseArea("lots")
	assert.Contains(t, err.Error(), "as an area")
	assert.NotContains(t, err.Error(), "a area")
}
