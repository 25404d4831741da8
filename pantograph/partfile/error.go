package partfile

import (
	"fmt"
	"strings"
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
