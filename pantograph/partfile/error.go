package partfile

import (
	"bytes"
	"errors"
	"fmt"
	"strings"

	"github.com/BurntSushi/toml"
)

// Error is a mistake in a part or machine file, placed as exactly as the reader can: the file,
// the line, the table and the key. Line is 0 when no line can be named (a table missing
// altogether).
type Error struct {
	File  string
	Line  int
	Table string // the table as written with its name, e.g. `[[holes]] "pivots"`; may be empty
	Key   string // the key, dotted for keys inside inline tables, e.g. "circle.diameter"
	Msg   string
}

// Errors is several mistakes of one file, in line order: every unknown key a reading meets.
type Errors []*Error

func (e Errors) Error() string {
	lines := make([]string, len(e))
	for i, x := range e {
		lines[i] = x.Error()
	}
	return strings.Join(lines, "\n")
}

func (e *Error) Error() string {
	var b strings.Builder
	b.WriteString(e.File)
	if e.Line > 0 {
		fmt.Fprintf(&b, ":%d", e.Line)
	}
	b.WriteString(": ")
	if e.Table != "" {
		b.WriteString(e.Table + ": ")
	}
	if e.Key != "" {
		b.WriteString("key " + e.Key + ": ")
	}
	b.WriteString(e.Msg)
	return b.String()
}

// syntaxError words a TOML syntax error. The line is worked out from the byte offset of the
// error rather than taken from the library's line count, which has already moved past the
// newline when a line ends too early (`[spindle` then a newline is reported on the next line).
func syntaxError(name string, src []byte, err error) error {
	var pe toml.ParseError
	if !errors.As(err, &pe) {
		return &Error{File: name, Msg: "not valid TOML: " + err.Error()}
	}
	line := pe.Position.Line
	if at := pe.Position.Start; at > 0 && at <= len(src) {
		line = 1 + bytes.Count(src[:at], []byte("\n"))
	}
	return &Error{File: name, Line: line, Msg: "not valid TOML: " + pe.Message}
}
