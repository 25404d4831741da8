package sheet

import (
	"bytes"
	"testing"

	"panto/export/drawing"
	"panto/export/internal/pdffont"
)

// TestPDFDeterministic encodes each sample sheet twice: the embedded fonts must be dated as
// created (not from the clock) with valid checksums and offsets, and the two runs byte-equal.
func TestPDFDeterministic(t *testing.T) {
	for _, j := range sampleJobs() {
		for _, paper := range []drawing.Paper{drawing.A4(), drawing.Letter()} {
			t.Run(j.name+"/"+paper.Name, func(t *testing.T) {
				s := sampleSheet(t, j)
				var a, b bytes.Buffer
				if err := EncodePDF(&a, s, paper); err != nil {
					t.Fatal(err)
				}
				if err := EncodePDF(&b, s, paper); err != nil {
					t.Fatal(err)
				}
				if err := pdffont.Check(a.Bytes()); err != nil {
					t.Error(err)
				}
				if !bytes.Equal(a.Bytes(), b.Bytes()) {
					t.Errorf("two encodings differ: got %d and %d bytes, want equal", a.Len(), b.Len())
				}
			})
		}
	}
}
