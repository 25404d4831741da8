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

// WriteFixed writes a finished PDF with its clock-stamped creation date replaced by a fixed
// one of the same length, so the same drawing gives the same bytes and no offset moves.
func WriteFixed(w io.Writer, b []byte) error {
	creationDate := regexp.MustCompile(`(/CreationDate ?\(D:)[0-9]{14}`)
	b = creationDate.ReplaceAll(b, []byte("${1}20000101000000"))
	_, err := io.Copy(w, bytes.NewReader(b))
	return err
}
