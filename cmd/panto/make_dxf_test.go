package main

import (
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
)

// dxfEntity is one entity of a DXF file as the plain test reader below sees it.
type dxfEntity struct {
	kind, layer string
	xs, ys      []float64 // group 10 and 20 values, in order
	radius      float64   // group 40 (a circle's radius, a text's height)
	bulges      int       // group 42 values: arcs in a polyline
}

// readDXFPairs splits an ASCII DXF file into its entities and the value of $INSUNITS; it
// knows only enough of the format (group code line, value line) to count and measure.
func readDXFPairs(t *testing.T, path string) (ents []dxfEntity, insunits string) {
	t.Helper()
	b, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	lines := strings.Split(strings.ReplaceAll(string(b), "\r\n", "\n"), "\n")
	section, lastVar := "", ""
	var cur *dxfEntity
	for i := 0; i+1 < len(lines); i += 2 {
		code, val := strings.TrimSpace(lines[i]), strings.TrimSpace(lines[i+1])
		switch {
		case code == "2" && section == "":
			section = val
		case code == "0" && val == "ENDSEC":
			section, cur = "", nil
		case section == "HEADER" && code == "9":
			lastVar = val
		case section == "HEADER" && lastVar == "$INSUNITS" && code == "70":
			insunits = val
		case section == "ENTITIES" && code == "0":
			ents = append(ents, dxfEntity{kind: val})
			cur = &ents[len(ents)-1]
		case cur != nil && code == "8":
			cur.layer = val
		case cur != nil && code == "42":
			cur.bulges++
		case cur != nil && (code == "10" || code == "20" || code == "40"):
			v, err := strconv.ParseFloat(val, 64)
			if err != nil {
				t.Fatalf("%s line %d: %v", path, i+2, err)
			}
			switch code {
			case "10":
				cur.xs = append(cur.xs, v)
			case "20":
				cur.ys = append(cur.ys, v)
			default:
				cur.radius = v
			}
		}
	}
	return ents, insunits
}

// span is the width and height of the vertices of e.
func (e dxfEntity) span() (float64, float64) {
	lo, hi := func(v []float64) float64 {
		m := math.Inf(1)
		for _, x := range v {
			m = math.Min(m, x)
		}
		return m
	},
		func(v []float64) float64 {
			m := math.Inf(-1)
			for _, x := range v {
				m = math.Max(m, x)
			}
			return m
		}
	return hi(e.xs) - lo(e.xs), hi(e.ys) - lo(e.ys)
}

// plateArgs makes plate-mm.dxf at 10:1 with a 0.5 mm cutter and the matched 5 mm stylus, so
// the template is the part times ten with no compensation.
func plateArgs(out string, extra ...string) []string {
	args := []string{"make", drawings + "plate-mm.dxf", "--thickness", "1", "--material", "brass", "--ratio", "10", "--cutter", "0.5",
		"-o", out, "--date", "2026-12-01"}
	return append(args, extra...)
}

// TestMakeDXF checks what template.dxf and part.dxf hold for plate-mm.dxf. The fixture
// (derived by reading it): a 40 × 20 mm rectangle, a 6 × 4 mm rectangular cut-out at
// (10..16, 8..12), a 10 × 4 mm slot with round ends, and two Ø1 mm circles, which are drilled
// holes (at most the default 3 mm).
func TestMakeDXF(t *testing.T) {
	dir := t.TempDir()
	code, stdout, stderr := runPanto(plateArgs(dir)...)
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	if !strings.Contains(stdout, "template.dxf: the template for a laser or CNC router") {
		t.Errorf("report does not mention template.dxf:\n%s", stdout)
	}
	tests := []struct {
		file  string
		count map[string]int // "KIND LAYER" → entities
	}{
		// One outline, two openings, a seat per hole, a label for each of the four features.
		{"template.dxf", map[string]int{"LWPOLYLINE OUTLINE": 1, "LWPOLYLINE OPENINGS": 2, "CIRCLE SEATS": 2, "TEXT LABELS": 4}},
		// The profile, two cut-outs, two holes, a label for each of the three features.
		{"part.dxf", map[string]int{"LWPOLYLINE PROFILE": 1, "LWPOLYLINE CUTOUTS": 2, "CIRCLE HOLES": 2, "TEXT LABELS": 3}},
	}
	for _, tc := range tests {
		t.Run(tc.file, func(t *testing.T) {
			ents, units := readDXFPairs(t, filepath.Join(dir, tc.file))
			if units != "4" { // 4 is millimetres in the DXF reference's unit table
				t.Errorf("$INSUNITS: got %q, want 4", units)
			}
			got := map[string]int{}
			for _, e := range ents {
				got[e.kind+" "+e.layer]++
			}
			for k, want := range tc.count {
				if got[k] != want {
					t.Errorf("%s: got %d, want %d (all: %v)", k, got[k], want, got)
				}
			}
			if len(ents) != sumCounts(tc.count) {
				t.Errorf("got %d entities, want %d: %v", len(ents), sumCounts(tc.count), got)
			}
		})
	}
}

func sumCounts(m map[string]int) int {
	n := 0
	for _, v := range m {
		n += v
	}
	return n
}

// TestMakeKerf checks that --kerf moves template.dxf's outline out and openings and seats in by
// kerf/2, against the same template made without it.
func TestMakeKerf(t *testing.T) {
	type sizes struct{ outlineW, outlineH, cutoutW, cutoutH, seatR float64 }
	measure := func(kerf string) sizes {
		dir := t.TempDir()
		if code, _, stderr := runPanto(plateArgs(dir, "--kerf", kerf)...); code != exitOK {
			t.Fatalf("--kerf %s: exit %d: %s", kerf, code, stderr)
		}
		ents, _ := readDXFPairs(t, filepath.Join(dir, "template.dxf"))
		var s sizes
		for _, e := range ents {
			switch {
			case e.layer == "OUTLINE":
				s.outlineW, s.outlineH = e.span()
			case e.layer == "OPENINGS" && e.bulges == 0: // the rectangular cut-out; the slot has arcs
				s.cutoutW, s.cutoutH = e.span()
			case e.layer == "SEATS":
				s.seatR = e.radius
			}
		}
		return s
	}
	base, cut := measure("0"), measure("0.2")
	// derived: 10 × the fixture's 40 × 20 plate and 6 × 4 cut-out; seats of the 5 mm stylus.
	if base != (sizes{400, 200, 60, 40, 2.5}) {
		t.Fatalf("without kerf got %+v, want {400 200 60 40 2.5}", base)
	}
	// derived: kerf/2 = 0.1 on each side; the grown outline's corners become arcs whose ends
	// still lie on the sides, so the vertices' span is the outline's.
	tests := []struct {
		name      string
		got, want float64
	}{
		{"outline width", cut.outlineW, base.outlineW + 0.2},
		{"outline height", cut.outlineH, base.outlineH + 0.2},
		{"cut-out width", cut.cutoutW, base.cutoutW - 0.2},
		{"cut-out height", cut.cutoutH, base.cutoutH - 0.2},
		{"seat radius", cut.seatR, base.seatR - 0.1},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if math.Abs(tc.got-tc.want) > 1e-9 {
				t.Errorf("got %v, want %v", tc.got, tc.want)
			}
		})
	}
}

func TestMakeKerfUsage(t *testing.T) {
	tests := []struct {
		name, kerf string
		code       int
		frag       string
	}{
		{"negative", "-0.1", exitUsage, "--kerf must be 0 or more"},
		{"not a number", "wide", exitUsage, "--kerf"},
		{"too wide", "10", exitUsage, "less than 10 mm"},
		// derived: a 6 mm kerf takes 3 mm off the radius of the 2.5 mm seats.
		{"closes the seats", "6", exitFailed, "closes the Ø5 seats"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			dir := t.TempDir()
			code, stdout, stderr := runPanto(plateArgs(dir, "--kerf", tc.kerf)...)
			if code != tc.code || !strings.Contains(stderr, tc.frag) {
				t.Errorf("got exit %d and %q, want %d and %q\n%s", code, stderr, tc.code, tc.frag, stdout)
			}
			if entries, _ := os.ReadDir(dir); len(entries) != 0 {
				t.Errorf("%d files written", len(entries))
			}
		})
	}
}
