package model

// The one set of status words a row reads as, in the window, the text and
// JSON output, the CSV and the report alike.
const (
	StatusWorks        = "works"
	StatusFails        = "fails"
	StatusNotPermitted = "not permitted"
)

// Status returns the row's status word: works, fails or not permitted.
func (r *Row) Status() string {
	switch {
	case r.OK:
		return StatusWorks
	case !r.Permitted:
		return StatusNotPermitted
	}
	return StatusFails
}

// StatusMark returns a symbol for a status word, so that a failing row reads
// as failing without its colour: ✓ for works, ✗ otherwise.
func StatusMark(status string) string {
	if status == StatusWorks {
		return "✓"
	}
	return "✗"
}
