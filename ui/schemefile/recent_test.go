package schemefile

import (
	"fmt"
	"path/filepath"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func TestRecentOrderDedupAndCap(t *testing.T) {
	var r Recent
	assert.Equal(t, 0, r.Len())
	assert.Equal(t, "[]", r.String())
	r.Add("/a/one.upright.json")
	r.Add("/a/two.upright.json")
	r.Add("/a/./one.upright.json") // the same file spelt differently moves to the front
	r.Add("")
	assert.Equal(t, []string{"/a/one.upright.json", "/a/two.upright.json"}, r.Paths())

	for i := 0; i < 15; i++ {
		r.Add(fmt.Sprintf("/b/%02d.upright.json", i))
	}
	require.Equal(t, MaxRecent, r.Len())
	assert.Equal(t, "/b/14.upright.json", r.Paths()[0], "most recent first")
	assert.Equal(t, "/b/05.upright.json", r.Paths()[MaxRecent-1], "the oldest beyond the cap are dropped")

	r.Remove("/b/10.upright.json")
	assert.Equal(t, MaxRecent-1, r.Len())
	assert.NotContains(t, r.Paths(), "/b/10.upright.json")

	r.Prune(func(p string) bool { return filepath.Base(p) != "14.upright.json" })
	assert.Equal(t, "/b/13.upright.json", r.Paths()[0])

	// Paths returns a copy.
	ps := r.Paths()
	ps[0] = "changed"
	assert.Equal(t, "/b/13.upright.json", r.Paths()[0])
}

func TestRecentSerialises(t *testing.T) {
	var r Recent
	for _, p := range []string{`C:\Users\ana\Désign "A".upright.json`, "/tmp/x,y.upright.json", "/tmp/new\nline.upright.json"} {
		r.Add(p)
	}
	back, err := ParseRecent(r.String())
	require.NoError(t, err)
	assert.Equal(t, r.Paths(), back.Paths())

	empty, err := ParseRecent("")
	require.NoError(t, err)
	assert.Equal(t, 0, empty.Len())

	bad, err := ParseRecent("not json")
	require.Error(t, err)
	assert.Contains(t, err.Error(), "recent files")
	assert.Equal(t, 0, bad.Len())

	// A hand-edited list is cleaned on reading: duplicates, empties and extras go.
	var long []string
	for i := 0; i < 12; i++ {
		long = append(long, fmt.Sprintf(`"/c/%d"`, i))
	}
	s := `["/c/0", "", "/c/0", ` + fmt.Sprint(long[1]) + `]`
	r2, err := ParseRecent(s)
	require.NoError(t, err)
	assert.Equal(t, []string{"/c/0", "/c/1"}, r2.Paths())
	all := "["
	for i, q := range long {
		if i > 0 {
			all += ","
		}
		all += q
	}
	r3, err := ParseRecent(all + "]")
	require.NoError(t, err)
	assert.Equal(t, MaxRecent, r3.Len())
	assert.Equal(t, "/c/0", r3.Paths()[0])
	assert.Equal(t, "/c/9", r3.Paths()[MaxRecent-1])
}
