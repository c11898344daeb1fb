package schemefile

import (
	"encoding/json"
	"fmt"
	"path/filepath"
)

// MaxRecent is how many paths a Recent list keeps.
const MaxRecent = 10

// Recent is the list of recently opened or saved scheme files, most recent
// first, without duplicates and at most MaxRecent long. The zero value is an
// empty list. It is not safe for concurrent use.
type Recent struct {
	paths []string
}

// clean normalises a path so that two spellings of the same path compare equal.
func clean(path string) string {
	if path == "" {
		return ""
	}
	return filepath.Clean(path)
}

// Add puts path at the front, removing an earlier entry for the same path
// and dropping the oldest beyond MaxRecent. An empty path is ignored.
func (r *Recent) Add(path string) {
	p := clean(path)
	if p == "" {
		return
	}
	out := make([]string, 0, MaxRecent)
	out = append(out, p)
	for _, q := range r.paths {
		if q != p && len(out) < MaxRecent {
			out = append(out, q)
		}
	}
	r.paths = out
}

// Remove drops path from the list, if present.
func (r *Recent) Remove(path string) {
	p := clean(path)
	out := r.paths[:0:0]
	for _, q := range r.paths {
		if q != p {
			out = append(out, q)
		}
	}
	r.paths = out
}

// Prune drops every path for which keep returns false, e.g. files that no
// longer exist.
func (r *Recent) Prune(keep func(path string) bool) {
	out := r.paths[:0:0]
	for _, q := range r.paths {
		if keep(q) {
			out = append(out, q)
		}
	}
	r.paths = out
}

// Paths returns a copy of the list, most recent first.
func (r Recent) Paths() []string {
	return append([]string{}, r.paths...)
}

// Len returns the number of paths in the list.
func (r Recent) Len() int { return len(r.paths) }

// String serialises the list as a JSON array of strings, suitable for a
// Fyne string preference; ParseRecent reads it back.
func (r Recent) String() string {
	b, _ := json.Marshal(r.Paths()) // a []string always encodes
	return string(b)
}

// ParseRecent reads a list written by Recent.String. The empty string gives
// an empty list. Duplicates, empty entries and entries beyond MaxRecent are
// dropped; text that is not a JSON array of strings gives an empty list and
// an error saying so.
func ParseRecent(s string) (Recent, error) {
	if s == "" {
		return Recent{}, nil
	}
	var paths []string
	if err := json.Unmarshal([]byte(s), &paths); err != nil {
		return Recent{}, fmt.Errorf("recent files: the stored list is not a JSON array of paths (%v); starting with an empty list", err)
	}
	var r Recent
	for i := len(paths) - 1; i >= 0; i-- {
		r.Add(paths[i])
	}
	return r, nil
}
