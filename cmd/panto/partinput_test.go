package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestDrawingAsPart runs plan, sheet and make on the drawings in testdata/drawings and on a
// sample part file with the stock and drawing flags.
func TestDrawingAsPart(t *testing.T) {
	setup := []string{"--ratio", "10", "--cutter", "0.5"}
	sample := filepath.Join("..", "..", "samples", "pump-port-plate.toml")
	tests := []struct {
		name   string
		args   []string
		code   int
		stdout string // expected in standard output ("" for nothing)
		stderr string // expected in standard error
	}{
		{"plan a DXF with --thickness", []string{"plan", drawings + "plate-mm.dxf", "--thickness", "1", "--material", "brass"},
			exitOK, "stock       brass, 1 mm thick", "profile: LINE at line 15"},
		{"no thickness", []string{"plan", drawings + "plate-mm.dxf"}, exitUsage, "",
			"plate-mm.dxf: a drawing does not say how thick the stock is; give it with --thickness MM"},
		{"bad thickness", []string{"plan", drawings + "plate-mm.dxf", "--thickness", "-1"}, exitUsage, "", "--thickness must be 0 or more"},
		{"bad units", []string{"plan", drawings + "plate-mm.dxf", "--thickness", "1", "--units", "ft"}, exitUsage, "", "--units must be mm or in"},
		// The fixture's second line starts 0.05 mm from where the first ends (derived).
		{"gap left open", []string{"plan", drawings + "triangle-gap.dxf", "--thickness", "1", "--material", "brass"}, exitUsage, "", "gap of 0.05 mm"},
		{"gap joined by --join", []string{"plan", drawings + "triangle-gap.dxf", "--thickness", "1", "--material", "brass", "--join", "0.06"}, exitOK,
			"[profile]", "profile: LINE at line 5"},
		// --hole-max 0.5 is below the fixture's Ø1 circles, so they are cut-outs, not seats.
		{"--hole-max", []string{"plan", drawings + "plate-mm.dxf", "--thickness", "1", "--material", "brass", "--hole-max", "0.5"}, exitOK,
			"[[cutout]]", ""},
		// --thickness is in mm whatever the drawing's units: the inch drawing's stock is 1 mm.
		{"inch drawing, layers", []string{"plan", drawings + "calibration-coupon-in.dxf", "--thickness", "1", "--material", "brass",
			"--layer", "CENTRE=ignore", "--layer", "RECESS=pocket:0.01"}, exitOK, "brass, 0.0394 in thick", "$INSUNITS 1 (inches)"},
		// The fixture's recess is a group of its own; mapped, it is a pocket 0.3 mm deep.
		{"SVG layer mapped", []string{"plan", drawings + "pump-port-plate.svg", "--thickness", "0.8", "--material", "brass", "--layer", "recess=pocket:0.3"},
			exitOK, "0.3 mm deep", "[[pocket]]"},
		{"part file, stock replaced", []string{"plan", sample, "--thickness", "1", "--material", "steel"}, exitOK,
			"stock       steel, 1 mm thick", "note: --thickness 1 mm replaces the part file's stock thickness (1.2 mm)"},
		{"missing part file", []string{"plan", "nosuch.toml"}, exitUsage, "", "panto plan: cannot read the part file"},
		{"missing drawing", []string{"make", "nosuch.svg", "-o", "OUT", "--thickness", "1", "--material", "brass"}, exitUsage, "",
			"panto make: cannot read the drawing"},
		{"part file, drawing flag", []string{"plan", sample, "--layer", "X=ignore"}, exitUsage, "",
			"--layer is for reading a drawing"},
		{"sheet of an SVG", []string{"sheet", drawings + "pump-port-plate.svg", "--thickness", "0.8", "--material", "brass", "--print",
			"--out", "OUT", "--date", "2026-12-01"}, exitOK, "Dial-reading sheet: pump-port-plate", "<path id=\"outline\">"},
		{"sheet without thickness", []string{"sheet", drawings + "pump-port-plate.svg", "--out", "OUT"}, exitUsage, "",
			"give it with --thickness MM"},
		{"make without thickness", []string{"make", drawings + "pump-port-plate.svg", "-o", "OUT"}, exitUsage, "",
			"give it with --thickness MM"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			dir := t.TempDir()
			args := append([]string{}, tc.args...)
			for i, a := range args {
				if a == "OUT" {
					args[i] = dir
				}
			}
			code, stdout, stderr := runPanto(append(args, setup...)...)
			if code != tc.code {
				t.Errorf("exit code: got %d, want %d\nstdout: %s\nstderr: %s", code, tc.code, stdout, stderr)
			}
			if !strings.Contains(stdout, tc.stdout) || !strings.Contains(stderr, tc.stderr) {
				t.Errorf("got stdout %q and stderr %q, want them to hold %q and %q", stdout, stderr, tc.stdout, tc.stderr)
			}
			if entries, _ := os.ReadDir(dir); tc.code != exitOK && len(entries) != 0 {
				t.Errorf("a failed run wrote %d files", len(entries))
			}
		})
	}
}
