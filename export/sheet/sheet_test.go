package sheet

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"flag"
	"math"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"panto/export/drawing"
	"panto/pantograph"
	"panto/pantograph/partfile"
)

var update = flag.Bool("update", false, "rewrite the golden sheet.txt files")

// sampleJob is one sample part with the setup and machine its golden sheet is made for.
type sampleJob struct {
	name    string
	ratio   float64
	cutter  float64
	machine string
}

// sampleJobs are the samples at setups their machines allow: the bench machine reaches 7:1 for
// the clock bridge; the inch engraver has fixed settings and a 1/32 in (0.79375 mm) cutter.
func sampleJobs() []sampleJob {
	return []sampleJob{
		{"pump-port-plate", 10, 0.5, "bench-pantograph"},
		{"clock-bridge", 7, 0.5, "bench-pantograph"},
		{"calibration-coupon", 4, 0.79375, "inch-engraver"},
	}
}

// sampleSheet plans a sample and builds its sheet, with a fixed date.
func sampleSheet(t *testing.T, j sampleJob) pantograph.Sheet {
	t.Helper()
	root := filepath.Join("..", "..", "samples")
	part, err := partfile.ReadFile(filepath.Join(root, j.name+".toml"))
	if err != nil {
		t.Fatal(err)
	}
	part.Source = j.name + ".toml" // golden files must not depend on where the test runs
	m, err := partfile.ReadMachineFile(filepath.Join(root, "machines", j.machine+".machine.toml"))
	if err != nil {
		t.Fatal(err)
	}
	p, err := pantograph.PlanPart(part, pantograph.Setup{Ratio: j.ratio, Cutter: j.cutter}, &m)
	if err != nil {
		t.Fatal(err)
	}
	s, err := pantograph.BuildSheet(p, m, pantograph.SheetOptions{Date: "2026-12-01"})
	if err != nil {
		t.Fatal(err)
	}
	return s
}

// TestGoldenText compares sheet.txt of each sample with testdata; run with -update after a
// change that is meant, and read the difference before committing it.
func TestGoldenText(t *testing.T) {
	for _, j := range sampleJobs() {
		t.Run(j.name, func(t *testing.T) {
			var b bytes.Buffer
			if err := EncodeText(&b, sampleSheet(t, j)); err != nil {
				t.Fatal(err)
			}
			path := filepath.Join("testdata", j.name+".sheet.txt")
			if *update {
				if err := os.WriteFile(path, b.Bytes(), 0o644); err != nil {
					t.Fatal(err)
				}
			}
			want, err := os.ReadFile(path)
			if err != nil {
				t.Fatal(err)
			}
			if got := b.String(); got != string(want) {
				t.Errorf("sheet.txt differs from %s; got:\n%s", path, got)
			}
		})
	}
}

// TestEveryFormatHasEveryStep checks that CSV, JSON and text carry every row with its readings.
func TestEveryFormatHasEveryStep(t *testing.T) {
	for _, j := range sampleJobs() {
		t.Run(j.name, func(t *testing.T) {
			s := sampleSheet(t, j)
			var c, js, txt bytes.Buffer
			if err := EncodeCSV(&c, s); err != nil {
				t.Fatal(err)
			}
			recs, err := csv.NewReader(&c).ReadAll()
			if err != nil {
				t.Fatal(err)
			}
			if got, want := len(recs), len(s.Rows)+1; got != want {
				t.Errorf("CSV lines: got %v, want %v", got, want)
			}
			if err := EncodeJSON(&js, s); err != nil {
				t.Fatal(err)
			}
			var back struct{ Rows []rowJSON }
			if err := json.Unmarshal(js.Bytes(), &back); err != nil {
				t.Fatal(err)
			}
			if got, want := len(back.Rows), len(s.Rows); got != want {
				t.Errorf("JSON rows: got %v, want %v", got, want)
			}
			if err := EncodeText(&txt, s); err != nil {
				t.Fatal(err)
			}
			for i, r := range s.Rows {
				if recs[i+1][3] != string(r.What) {
					t.Errorf("CSV kind of step %d: got %q, want %q", r.Step, recs[i+1][3], r.What)
				}
				if r.Where == nil {
					continue // a tool change
				}
				if rd := r.Where.CopyX.String(); !strings.Contains(txt.String(), "X "+rd) {
					t.Errorf("text lacks copy X reading %q of step %d", rd, r.Step)
				}
				if got := recs[i+1][9]; got != reading(r.Where.CopyX, s.Units) {
					t.Errorf("CSV copy X of step %d: got %q, want %q", r.Step, got, reading(r.Where.CopyX, s.Units))
				}
			}
		})
	}
}

// TestPDFPage checks the PDF's page size (ISO 32000-1 user units of 1/72 in: A4 595.276 ×
// 841.890, Letter 612 × 792).
func TestPDFPage(t *testing.T) {
	s := sampleSheet(t, sampleJobs()[0])
	for _, tc := range []struct {
		paper drawing.Paper
		w, h  float64
	}{
		{drawing.A4(), 595.276, 841.890},
		{drawing.Letter(), 612, 792},
	} {
		t.Run(tc.paper.Name, func(t *testing.T) {
			// Page sizes: ISO 216 A4 210 × 297 mm and ANSI Letter 8.5 × 11 in, in points
			// (ISO 32000-1 §8.3.2.3: 1/72 in). Byte-for-byte repeatability is TestPDFDeterministic's.
			var a bytes.Buffer
			if err := EncodePDF(&a, s, tc.paper); err != nil {
				t.Fatal(err)
			}
			box := regexp.MustCompile(`/MediaBox ?\[0 0 ([0-9.]+) ([0-9.]+)\]`).FindSubmatch(a.Bytes())
			if box == nil {
				t.Fatalf("no MediaBox found")
			}
			w, _ := strconv.ParseFloat(string(box[1]), 64)
			h, _ := strconv.ParseFloat(string(box[2]), 64)
			if math.Abs(w-tc.w) > 0.001 || math.Abs(h-tc.h) > 0.001 {
				t.Errorf("MediaBox: got %v × %v, want %v × %v", w, h, tc.w, tc.h)
			}
		})
	}
}

func TestWrap(t *testing.T) {
	tests := []struct {
		text  string
		width int
		want  []string
	}{
		{"short line", 20, []string{"short line"}},
		{"one two three four", 9, []string{"one two", "  three", "  four"}},
		{"label      value", 40, []string{"label      value"}}, // inner spaces kept
		{"unbreakable-word here", 5, []string{"unbreakable-word", "  here"}},
	}
	for _, tc := range tests {
		t.Run(tc.text, func(t *testing.T) {
			got := wrap(tc.text, tc.width, 2)
			if strings.Join(got, "|") != strings.Join(tc.want, "|") {
				t.Errorf("got %q, want %q", got, tc.want)
			}
		})
	}
}

func TestRoughly(t *testing.T) {
	tests := []struct {
		v    float64
		want string
	}{
		{24.271, "24"}, {95.25, "95"}, {7.5, "7.5"}, {0.123, "0.12"}, {1234, "1200"}, // derived
	}
	for _, tc := range tests {
		if got := roughly(tc.v); got != tc.want {
			t.Errorf("roughly(%v): got %v, want %v", tc.v, got, tc.want)
		}
	}
}
