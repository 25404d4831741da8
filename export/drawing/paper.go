package drawing

import (
	"bytes"
	"fmt"
	"io"
	"regexp"
	"strings"
)

// Paper is a sheet size in mm.
type Paper struct {
	Name string
	W, H float64
}

// A4 is 210 × 297 mm (ISO 216).
func A4() Paper { return Paper{Name: "A4", W: 210, H: 297} }

// Letter is 8.5 × 11 in (ANSI).
func Letter() Paper { return Paper{Name: "Letter", W: 8.5 * 25.4, H: 11 * 25.4} }

// PaperNamed returns the paper called name ("a4" or "letter", any case).
func PaperNamed(name string) (Paper, error) {
	switch strings.ToLower(name) {
	case "a4":
		return A4(), nil
	case "letter":
		return Letter(), nil
	}
	return Paper{}, fmt.Errorf("no paper %q: use a4 or letter", name)
}

// Margin is the blank border kept on every printed page, mm: most office printers cannot
// print the outer 4–6 mm (common practice, no source), and the tiling marks sit in it.
const Margin = 12

// Overlap is how much neighbouring tiles of a template share, mm: room for the alignment
// marks and for trimming one sheet to lay it over the next (common practice, no source).
const Overlap = 15

// creationDate matches a PDF date with its optional time zone: D:YYYYMMDDHHmmSS then Z, or
// +HH'mm' / -HH'mm' (ISO 32000-1 §7.9.4).
var creationDate = regexp.MustCompile(`/CreationDate ?\(D:[0-9]{14}(Z|[+-][0-9]{2}'[0-9]{2}'?)?`)

// WriteFixed writes a finished PDF with its clock-stamped creation date replaced by a fixed
// one of the same length (1 January 2000, in UTC), so the same drawing gives the same bytes on
// any machine, whatever its clock and time zone, and no offset moves.
func WriteFixed(w io.Writer, b []byte) error {
	b = creationDate.ReplaceAllFunc(b, fixedDate)
	_, err := io.Copy(w, bytes.NewReader(b))
	return err
}

// fixedDate returns m with its date and time set to 2000-01-01 00:00:00 and any zone offset set
// to +00'00', keeping every character's place.
func fixedDate(m []byte) []byte {
	out := append([]byte(nil), m...)
	i := bytes.Index(out, []byte("D:")) + 2
	copy(out[i:], "20000101000000")
	for k := i + 14; k < len(out); k++ {
		switch {
		case out[k] == '-':
			out[k] = '+'
		case out[k] >= '0' && out[k] <= '9':
			out[k] = '0'
		}
	}
	return out
}
