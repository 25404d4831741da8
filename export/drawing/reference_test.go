//go:build reference

package drawing

import (
	"bytes"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"panto/geom"
	"panto/internal/reftool"
	"panto/pantograph"
	"panto/pantograph/partfile"
)

// These tests run the drawings through the file checkers CI installs (qpdf, librsvg2-bin).

func TestDrawingsReference(t *testing.T) {
	dir := t.TempDir()
	part := pantograph.Part{Name: "test plate", Profile: pantograph.Feature{Kind: pantograph.KindProfile,
		Region: geom.NewRegion(geom.Polygon(geom.V(0, 0), geom.V(15, 0), geom.V(15, 5), geom.V(0, 5)))},
		Features: []pantograph.Feature{{Name: "pins", Kind: pantograph.KindHoles, Diameter: 0.8,
			Centers: []geom.Vec{geom.V(2, 2), geom.V(12, 2)}, Depth: pantograph.Depth{Through: true}}}}
	files := map[string]func(*bytes.Buffer) error{
		"small.pdf": func(b *bytes.Buffer) error { return EncodeTemplatePDF(b, seatPlan(150, 50), A4()) },
		"tiled.pdf": func(b *bytes.Buffer) error { return EncodeTemplatePDF(b, seatPlan(600, 400), Letter()) },
		"small.svg": func(b *bytes.Buffer) error { return EncodeTemplateSVG(b, seatPlan(150, 50)) },
		"part.pdf":  func(b *bytes.Buffer) error { return EncodePartPDF(b, part, seatPlan(150, 50), A4()) },
		"part.svg":  func(b *bytes.Buffer) error { return EncodePartSVG(b, part, seatPlan(150, 50), Letter()) },
	}
	for name, enc := range files {
		t.Run(name, func(t *testing.T) {
			var b bytes.Buffer
			if err := enc(&b); err != nil {
				t.Fatal(err)
			}
			path := filepath.Join(dir, name)
			if err := os.WriteFile(path, b.Bytes(), 0o644); err != nil {
				t.Fatal(err)
			}
			var cmd *exec.Cmd
			if filepath.Ext(name) == ".pdf" {
				cmd = exec.Command("qpdf", "--check", path)
			} else {
				cmd = exec.Command("rsvg-convert", "-o", path+".png", path)
			}
			if out, err := cmd.CombinedOutput(); err != nil {
				t.Errorf("%v: %v\n%s", cmd.Args, err, out)
			}
		})
	}
}

// TestPartTableReference runs each sample's part.pdf through pdftotext and looks for the
// dimensions of its features, rows of the feature table as a reader finds them. The values are
// worked by hand from the sample files (derived): positions from the datum, in the part's units.
func TestPartTableReference(t *testing.T) {
	if _, err := exec.LookPath("pdftotext"); err != nil {
		reftool.Missing(t, "pdftotext (poppler-utils) is not installed")
	}
	tests := []struct {
		sample string
		want   []string
	}{
		{"pump-port-plate", []string{ // datum (2.5, 2.5)
			"hole 0 0 Ø1.6", "hole 17 0 Ø1.6", "hole 0 9 Ø1.6", "hole 5.5 1.5 Ø0.8", "hole 8.5 1.5 Ø0.8",
			"centre 3.5 7.5 Ø3", // the window, Ø3 about (6, 10)
			"corner 9.5 3.5 R0.5", "corner 14.5 3.5 R0.5", "corner 14.5 6.5 R0.5", "corner 9.5 6.5 R0.5",
			"end 10.5 0 width 1", "end 13.5 0", "point 7 10", "point 7 11",
			"corner -2.5 -2.5 R1", "corner 19.5 -2.5 R1", "corner 19.5 6.5 R1", "corner 13.5 11.5 R1", "corner -2.5 11.5 R1",
		}},
		{"clock-bridge", []string{ // datum (−3, 0)
			"centre 9 9 Ø2.5", // the jewel seat, Ø2.5 about (6, 9)
			"hole 9 9 Ø0.6", "hole 27 0 Ø0.6", "hole 0 0 Ø1.2", "hole 21 0 Ø1.2", "hole 0 2.5 Ø0.8",
			"corner 11 -2 R1", "corner 17 -2 R1", "corner 17 1 R1", "corner 11 1 R1",
			"arc centre 27 0 R4", "arc centre 18 9 R5", "arc centre 9 9 R4", "arc centre 0 9 R5", "arc centre 0 0 R4",
			"point 0 -4", "point 27 -4", "point 27 4", "point 18 4", "point 13 9", "point 5 9", "point 0 4",
		}},
		{"calibration-coupon", []string{ // inches, datum (0.25, 0.75)
			"hole 0 0 Ø0.0625", "hole 0.5 0 Ø0.125", "hole 0.75 0 Ø0.1875",
			"end 0 -0.4 width 0.0625", "end 0.5 -0.4",
			"corner 1.05 -0.55 R0.0156", "corner 1.55 -0.2 R0.0469", "corner 1.05 -0.2 R0.0625", // 1/64, 3/64, 1/16
			"corner 1.05 -0.05 R0.0625", "corner 1.55 0.15 R0.0625",
			"point 1.65 0.15 width 0.01", "point 1.65 0.05", "point 1.7 0.05",
			"corner -0.25 -0.75", "corner 1.75 0.25",
		}},
	}
	for _, tc := range tests {
		t.Run(tc.sample, func(t *testing.T) {
			part, err := partfile.ReadFile(filepath.Join("..", "..", "samples", tc.sample+".toml"))
			if err != nil {
				t.Fatal(err)
			}
			p, err := pantograph.PlanPart(part, pantograph.Setup{Ratio: 8, Cutter: 0.5}, nil)
			if err != nil {
				t.Fatal(err)
			}
			var b bytes.Buffer
			if err := EncodePartPDF(&b, part, p, A4()); err != nil {
				t.Fatal(err)
			}
			text := pdfText(t, b.Bytes(), "-layout")
			for _, w := range tc.want {
				if !strings.Contains(text, w) {
					t.Errorf("%q not found in the PDF's text", w)
				}
			}
		})
	}
}

// pdfText writes a PDF to a file and returns what pdftotext finds in it, runs of spaces made one.
func pdfText(t *testing.T, pdf []byte, mode string) string {
	t.Helper()
	path := filepath.Join(t.TempDir(), "drawing.pdf")
	if err := os.WriteFile(path, pdf, 0o644); err != nil {
		t.Fatal(err)
	}
	out, err := exec.Command("pdftotext", mode, path, "-").Output()
	if err != nil {
		t.Fatalf("pdftotext: %v", err)
	}
	if mode == "-bbox" {
		return string(out)
	}
	return strings.Join(strings.Fields(string(out)), " ")
}

// TestNumberBoxesReference checks the recorder the label tests measure through against the PDF
// itself: pdftotext -bbox finds each feature number of a part drawing where the recorder saw
// it. pdftotext's box spans the font's ascent and descent, so it must hold the recorder's ink
// box, and agree on the left and right edges.
func TestNumberBoxesReference(t *testing.T) {
	if _, err := exec.LookPath("pdftotext"); err != nil {
		reftool.Missing(t, "pdftotext (poppler-utils) is not installed")
	}
	fonts, err := LoadFonts()
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range sampleCases(t) {
		if !strings.HasSuffix(c.name, "/8/no machine") {
			continue // one case of each sample is enough to check the recorder
		}
		t.Run(c.name, func(t *testing.T) {
			l := newPartLayout(c.part, c.plan, A4(), fonts)
			pages := partPages(l, A4())
			r := record(fonts, A4().W, A4().H, pages[0].draw)
			var b bytes.Buffer
			if err := writePDF(&b, "test", pages[:1], fonts, true); err != nil {
				t.Fatal(err)
			}
			words := wordBoxes(pdfText(t, b.Bytes(), "-bbox"), A4().H)
			top := tableTop(t, r)
			found := 0
			for _, tx := range r.texts {
				if numberText.MatchString(tx.s) && tx.box.Min.Y > top {
					found++
					if !anyHolds(words[tx.s], tx.box) {
						t.Errorf("%s: recorded at %v, pdftotext has %v", tx.s, tx.box, words[tx.s])
					}
				}
			}
			if found == 0 {
				t.Error("no feature numbers recorded")
			}
		})
	}
}

// wordBoxes reads pdftotext -bbox output into boxes in mm, +Y up from the foot of a page h mm
// high, by word.
func wordBoxes(html string, h float64) map[string][]geom.Box {
	out := map[string][]geom.Box{}
	re := regexp.MustCompile(`<word xMin="([0-9.]+)" yMin="([0-9.]+)" xMax="([0-9.]+)" yMax="([0-9.]+)">([^<]*)</word>`)
	const mmPerPt = 25.4 / 72 // derived: 72 points to the inch
	for _, m := range re.FindAllStringSubmatch(html, -1) {
		v := make([]float64, 4)
		for i := range v {
			v[i], _ = strconv.ParseFloat(m[i+1], 64)
			v[i] *= mmPerPt
		}
		out[m[5]] = append(out[m[5]], geom.Box{Min: geom.V(v[0], h-v[3]), Max: geom.V(v[2], h-v[1])})
	}
	return out
}

// anyHolds reports whether one of the word boxes holds ink box b, with the same left and right
// edges to within the side bearing of a glyph.
func anyHolds(words []geom.Box, b geom.Box) bool {
	const bearing = 0.5 // mm: a glyph's ink starts a little inside its advance (DejaVu, 9 pt)
	for _, w := range words {
		if math.Abs(w.Min.X-b.Min.X) < bearing && math.Abs(w.Max.X-b.Max.X) < bearing &&
			w.Min.Y <= b.Min.Y+0.05 && w.Max.Y >= b.Max.Y-0.05 {
			return true
		}
	}
	return false
}
