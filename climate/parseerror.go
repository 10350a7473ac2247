package climate

import (
	"errors"
	"fmt"
	"strings"
)

// Sentinel errors. A ParseError wraps one of them, so callers can test the
// kind of failure with errors.Is while the message says exactly what was
// wrong.
var (
	ErrHeader     = errors.New("bad header")                                // missing required column, duplicate column, unknown mapping
	ErrFieldCount = errors.New("wrong number of fields")                    // row and header differ in field count
	ErrSyntax     = errors.New("syntax error")                              // unparseable number, bad quoting, line too long
	ErrTimeSyntax = errors.New("unparseable time stamp")                    // not an RFC 3339 / ISO 8601 date and time
	ErrNoOffset   = errors.New("time stamp without UTC offset")             // local stamp and no zone given
	ErrLocalTime  = errors.New("local time does not exist or is ambiguous") // DST gap or repeated hour
	ErrTimeOrder  = errors.New("time not increasing")                       // duplicate or out-of-order stamp
	ErrRange      = errors.New("value out of range")                        // outside the physical or declared range
)

// ParseError is the error for a bad climate record, modelled on
// encoding/csv's ParseError. Line is 1-based and counts every line of the
// file, header and comments included. Column is the 1-based field number
// (the spreadsheet column), 0 when the error concerns the whole line.
type ParseError struct {
	File   string // file name as given to the reader, may be empty
	Line   int    // 1-based line number
	Column int    // 1-based field number, 0 for the whole line
	Field  string // header name of the column as written in the file
	Value  string // the offending cell, as written
	Err    error  // the reason; wraps one of the Err* sentinels
}

// Error formats the error as
//
//	site.csv:123:4 (rh_pct): value "107.5": relative humidity above 103 %
func (e *ParseError) Error() string {
	var b strings.Builder
	if e.File != "" {
		b.WriteString(e.File)
	} else {
		b.WriteString("line")
	}
	fmt.Fprintf(&b, ":%d", e.Line)
	if e.Column > 0 {
		fmt.Fprintf(&b, ":%d", e.Column)
	}
	if e.Field != "" {
		fmt.Fprintf(&b, " (%s)", e.Field)
	}
	if e.Column > 0 {
		fmt.Fprintf(&b, ": value %q", e.Value)
	}
	fmt.Fprintf(&b, ": %v", e.Err)
	return b.String()
}

// Unwrap returns the reason, so errors.Is(err, climate.ErrRange) works.
func (e *ParseError) Unwrap() error { return e.Err }

// reason is an error whose message is a specific explanation and which
// matches a sentinel under errors.Is.
type reason struct {
	kind error
	msg  string
}

func (r *reason) Error() string        { return r.msg }
func (r *reason) Is(target error) bool { return target == r.kind }

// because returns an error with a specific message that is a kind.
func because(kind error, format string, a ...any) error {
	return &reason{kind: kind, msg: fmt.Sprintf(format, a...)}
}
