package cad

import (
	"fmt"
	"io"
	"strings"
)

// Report says what a drawing became: where its units came from, which outline became which
// feature, and what was left out or assumed.
type Report struct {
	File      string
	UnitsNote string   // where the units came from, or what was assumed
	Made      []string // one line per feature: what it is and where in the drawing it came from
	Warnings  []string // things assumed, left out or doubtful
	Skipped   string   // entities or elements not read, with counts; "" when none
}

// WriteTo writes the report as plain text for a person.
func (r Report) WriteTo(w io.Writer) (int64, error) {
	var b strings.Builder
	fmt.Fprintf(&b, "%s\n  units: %s\n", r.File, r.UnitsNote)
	for _, m := range r.Made {
		fmt.Fprintf(&b, "  %s\n", m)
	}
	if r.Skipped != "" {
		fmt.Fprintf(&b, "  not read (not outlines): %s\n", r.Skipped)
	}
	for _, m := range r.Warnings {
		fmt.Fprintf(&b, "  warning: %s\n", m)
	}
	n, err := io.WriteString(w, b.String())
	return int64(n), err
}
