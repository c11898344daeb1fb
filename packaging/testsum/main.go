// Command testsum reads the JSON stream of `go test -json` on standard
// input, prints what a reader needs (each package's result line, and the
// output of every failing test), and ends with one plain line:
// "N passed, N failed". It exits 1 when any test or package failed.
package main

import (
	"bufio"
	"encoding/json"
	"fmt"
	"io"
	"os"
	"strings"
)

// event is one line of `go test -json` (cmd/test2json).
type event struct {
	Action  string
	Package string
	Test    string
	Output  string
}

func main() {
	passed, failed, err := summarize(os.Stdin, os.Stdout)
	if err != nil {
		fmt.Fprintln(os.Stderr, "testsum:", err)
		os.Exit(2)
	}
	fmt.Printf("%d passed, %d failed\n", passed, failed)
	if failed > 0 {
		os.Exit(1)
	}
}

// summarize copies package results and failing tests' output to w and
// counts the tests that passed and failed. A package that fails without a
// failing test (a build error, a panic at start) counts as one failure.
func summarize(r io.Reader, w io.Writer) (passed, failed int, err error) {
	out := map[string][]string{} // output by package/test, kept until the test ends
	failedTests := map[string]bool{}
	sc := bufio.NewScanner(r)
	sc.Buffer(make([]byte, 1<<20), 1<<24)
	for sc.Scan() {
		line := sc.Bytes()
		var e event
		if json.Unmarshal(line, &e) != nil {
			fmt.Fprintln(w, string(line)) // not JSON: a build error printed by go itself
			continue
		}
		key := e.Package + "/" + e.Test
		switch e.Action {
		case "output":
			if e.Test == "" {
				if t := strings.TrimSpace(e.Output); strings.HasPrefix(t, "ok ") || strings.HasPrefix(t, "FAIL") || strings.HasPrefix(t, "?") || strings.HasPrefix(t, "---") || strings.Contains(t, "[build failed]") {
					fmt.Fprint(w, e.Output)
				} else {
					out[key] = append(out[key], e.Output)
				}
				continue
			}
			out[key] = append(out[key], e.Output)
		case "pass":
			if e.Test != "" {
				passed++
			}
			delete(out, key)
		case "fail":
			if e.Test != "" {
				failed++
				failedTests[e.Package] = true
				fmt.Fprint(w, strings.Join(out[key], ""))
			} else if !failedTests[e.Package] {
				failed++ // the package failed outside any test
				fmt.Fprint(w, strings.Join(out[key], ""))
			}
			delete(out, key)
		case "skip":
			delete(out, key)
		}
	}
	return passed, failed, sc.Err()
}
