package main

import (
	"strings"
	"testing"
)

// A stream with two passing tests, one failing test and a package that
// fails to build counts 2 passed and 2 failed, and prints the failing
// test's output.
func TestSummarize(t *testing.T) {
	in := strings.Join([]string{
		`{"Action":"run","Package":"p","Test":"TestA"}`,
		`{"Action":"pass","Package":"p","Test":"TestA"}`,
		`{"Action":"run","Package":"p","Test":"TestB"}`,
		`{"Action":"output","Package":"p","Test":"TestB","Output":"    b_test.go:9: wrong\n"}`,
		`{"Action":"fail","Package":"p","Test":"TestB"}`,
		`{"Action":"pass","Package":"p","Test":"TestC"}`,
		`{"Action":"output","Package":"p","Output":"FAIL\tp\t0.01s\n"}`,
		`{"Action":"fail","Package":"p"}`,
		`{"Action":"output","Package":"q","Output":"q.go:1: syntax error\n"}`,
		`{"Action":"fail","Package":"q"}`,
	}, "\n")
	var w strings.Builder
	passed, failed, err := summarize(strings.NewReader(in), &w)
	if err != nil || passed != 2 || failed != 2 {
		t.Fatalf("got %d passed, %d failed, %v; want 2, 2", passed, failed, err)
	}
	if !strings.Contains(w.String(), "b_test.go:9: wrong") || !strings.Contains(w.String(), "syntax error") {
		t.Errorf("failing output not shown:\n%s", w.String())
	}
}
