package schemefile

import (
	"fmt"
	"strings"
)

// Error is a scheme file that cannot be read or written: it names the file,
// the place (line and column, when known), the field and the problem.
type Error struct {
	File   string // the file's path; empty for Marshal and Unmarshal
	Field  string // the field's path in the file, e.g. "setting.length"; empty for problems of the whole file
	Line   int    // 1-based line of the offending value; 0 when not known
	Column int    // 1-based column (in characters) of the offending value; 0 when not known
	Msg    string // what is wrong and what is accepted
	Err    error  // the underlying error (e.g. a *model.FieldError or an *os.PathError), if any
}

// Error formats the problem as "file: line L, column C: field: message".
func (e *Error) Error() string {
	var b strings.Builder
	if e.File != "" {
		b.WriteString(e.File)
		b.WriteString(": ")
	}
	if e.Line > 0 {
		fmt.Fprintf(&b, "line %d, column %d: ", e.Line, e.Column)
	}
	if e.Field != "" {
		b.WriteString(e.Field)
		b.WriteString(": ")
	}
	b.WriteString(e.Msg)
	return b.String()
}

// Unwrap returns the underlying error.
func (e *Error) Unwrap() error { return e.Err }
