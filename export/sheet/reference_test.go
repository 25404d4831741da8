//go:build reference

package sheet

import (
	"bytes"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"

	"panto/export/drawing"
)

// These tests run the PDF through the file checkers CI installs (poppler-utils, qpdf).

// TestPDFReference checks that pdftotext finds every feature's name and every copy-table
// reading in sheet.pdf, and that qpdf --check passes, for each sample on A4 and Letter.
func TestPDFReference(t *testing.T) {
	for _, j := range sampleJobs() {
		for _, paper := range []drawing.Paper{drawing.A4(), drawing.Letter()} {
			t.Run(j.name+"/"+paper.Name, func(t *testing.T) {
				s := sampleSheet(t, j)
				var b bytes.Buffer
				if err := EncodePDF(&b, s, paper); err != nil {
					t.Fatal(err)
				}
				path := filepath.Join(t.TempDir(), "sheet.pdf")
				if err := os.WriteFile(path, b.Bytes(), 0o644); err != nil {
					t.Fatal(err)
				}
				if out, err := exec.Command("qpdf", "--check", path).CombinedOutput(); err != nil {
					t.Errorf("qpdf --check: %v\n%s", err, out)
				}
				out, err := exec.Command("pdftotext", "-layout", path, "-").Output()
				if err != nil {
					t.Fatalf("pdftotext: %v", err)
				}
				text := strings.Join(strings.Fields(string(out)), " ")
				for _, r := range s.Rows {
					if r.Feature != "" && !strings.Contains(text, r.Feature) {
						t.Errorf("feature %q not found in the PDF's text", r.Feature)
					}
					if r.Where == nil {
						continue // a tool change
					}
					if rd := "X " + r.Where.CopyX.String(); !strings.Contains(text, rd) {
						t.Errorf("step %d: reading %q not found in the PDF's text", r.Step, rd)
					}
				}
			})
		}
	}
}
