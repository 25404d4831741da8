package main

import (
	"bytes"
	"encoding/binary"
	"os"
	"path/filepath"
	"strings"
	"testing"

	hstl "github.com/hschendel/stl"
)

// makeArgs runs a sample at 10:1 with a 0.5 mm cutter, without a machine file (the bench
// machine's copy table is too small for every sample at 10:1).
func makeArgs(sample, out string, extra ...string) []string {
	args := []string{"make", filepath.Join("..", "..", "samples", sample), "--ratio", "10",
		"--cutter", "0.5", "-o", out, "--date", "2026-12-01"}
	return append(args, extra...)
}

func TestMakeSamples(t *testing.T) {
	for _, sample := range []string{"calibration-coupon.toml", "clock-bridge.toml", "pump-port-plate.toml"} {
		for _, extra := range [][]string{nil, {"--style", "groove", "--seat", "cone"}} {
			t.Run(sample+" "+strings.Join(extra, " "), func(t *testing.T) {
				dir := t.TempDir()
				code, stdout, stderr := runPanto(makeArgs(sample, dir, extra...)...)
				if code != exitOK {
					t.Fatalf("exit code: got %d, want %d\n%s", code, exitOK, stderr)
				}
				b, err := os.ReadFile(filepath.Join(dir, "template.stl"))
				if err != nil {
					t.Fatal(err)
				}
				n := binary.LittleEndian.Uint32(b[80:84])
				// 3D Systems' specification: 84 + 50 bytes per facet.
				if got, want := len(b), 84+50*int(n); got != want {
					t.Errorf("file size: got %d, want %d", got, want)
				}
				s, err := hstl.ReadAll(bytes.NewReader(b))
				if err != nil {
					t.Fatal(err)
				}
				if errs := s.Validate(); len(errs) != 0 {
					for i, e := range errs {
						t.Errorf("triangle %d %v: %+v", i, s.Triangles[i].Vertices, *e)
						break
					}
					t.Errorf("Validate found %d faulty triangles, want 0", len(errs))
				}
				if !s.IsInPositive() {
					t.Errorf("coordinates below zero")
				}
				for _, frag := range []string{"template.stl: plate", "triangles", "print it flat", "PLA softens"} {
					if !strings.Contains(stdout, frag) {
						t.Errorf("report lacks %q:\n%s", frag, stdout)
					}
				}
				// The summary names every file the folder now holds.
				entries, err := os.ReadDir(dir)
				if err != nil {
					t.Fatal(err)
				}
				for _, e := range entries {
					if !strings.Contains(stdout, " "+e.Name()) {
						t.Errorf("the summary does not list %s:\n%s", e.Name(), stdout)
					}
				}
				for _, name := range []string{"sheet.txt", "template.svg", "template.dxf", "part.dxf"} {
					if _, err := os.Stat(filepath.Join(dir, name)); err != nil {
						t.Errorf("%s not written: %v", name, err)
					}
				}
			})
		}
	}
}

func TestMakeKeepsFiles(t *testing.T) {
	dir := t.TempDir()
	if code, _, stderr := runPanto(makeArgs("pump-port-plate.toml", dir)...); code != exitOK {
		t.Fatalf("first run: exit %d: %s", code, stderr)
	}
	stl := filepath.Join(dir, "template.stl")
	if err := os.WriteFile(stl, []byte("kept"), 0o644); err != nil {
		t.Fatal(err)
	}
	code, _, stderr := runPanto(makeArgs("pump-port-plate.toml", dir)...)
	if code != exitFailed || !strings.Contains(stderr, "--force") {
		t.Errorf("second run without --force: got exit %d (%s), want %d and a word about --force", code, stderr, exitFailed)
	}
	if b, _ := os.ReadFile(stl); string(b) != "kept" {
		t.Errorf("template.stl was overwritten without --force")
	}
	if code, _, stderr := runPanto(makeArgs("pump-port-plate.toml", dir, "--force")...); code != exitOK {
		t.Fatalf("with --force: exit %d: %s", code, stderr)
	}
	if b, _ := os.ReadFile(stl); string(b) == "kept" {
		t.Errorf("template.stl was not overwritten with --force")
	}
	left, _ := filepath.Glob(filepath.Join(dir, ".*.tmp"))
	if len(left) > 0 {
		t.Errorf("temporary files left: %v", left)
	}
}

func TestMakeUsage(t *testing.T) {
	dir := t.TempDir()
	tests := []struct {
		name string
		args []string
		code int
		frag string
	}{
		{"help", []string{"make", "-h"}, exitOK, "Usage: panto make"},
		{"help command", []string{"help", "make"}, exitOK, "--style wall|groove"},
		{"help on DXF", []string{"help", "make"}, exitOK, "template.dxf   the template for cutting on a laser or CNC router"},
		{"help on kerf", []string{"make", "--help"}, exitOK, "--kerf MM"},
		{"no part", []string{"make", "-o", dir}, exitUsage, "give exactly one part file"},
		{"no folder", []string{"make", "p.toml", "--ratio", "10", "--cutter", "0.5"}, exitUsage, "-o DIR is required"},
		{"no ratio", []string{"make", "p.toml", "--cutter", "0.5", "-o", dir}, exitUsage, "--ratio is required"},
		{"bad seat", makeArgs("pump-port-plate.toml", dir, "--seat", "ball"), exitUsage, "--seat must be cone or bore"},
		{"bad style", makeArgs("pump-port-plate.toml", dir, "--style", "ridge"), exitUsage, "--style must be wall or groove"},
		{"bad spacing", makeArgs("pump-port-plate.toml", dir, "--fixing-spacing", "-3"), exitUsage, "--fixing-spacing"},
		{"missing part", makeArgs("nosuch.toml", dir), exitUsage, "nosuch.toml"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			code, stdout, stderr := runPanto(tc.args...)
			if code != tc.code {
				t.Errorf("exit code: got %d, want %d\n%s%s", code, tc.code, stdout, stderr)
			}
			if !strings.Contains(stdout+stderr, tc.frag) {
				t.Errorf("output lacks %q:\n%s%s", tc.frag, stdout, stderr)
			}
		})
	}
	if entries, _ := os.ReadDir(dir); len(entries) != 0 {
		t.Errorf("bad usage wrote %d files", len(entries))
	}
}

// TestPointedStylus: --tip pointed with a machine file takes its pointed stylus, the plate is
// grooved for it, and a raised-wall plate is refused with the groove style suggested.
func TestPointedStylus(t *testing.T) {
	base := []string{"../../samples/pump-port-plate.toml", "--ratio", "8", "--cutter", "0.5", "--tip", "pointed",
		"--machine", "../../samples/machines/bench-pantograph.machine.toml"}
	code, out, errOut := runPanto(append([]string{"plan"}, base...)...)
	if code != exitOK || !strings.Contains(out, "pointed stylus Ø3 mm") {
		t.Errorf("plan: exit %d, want the machine's pointed Ø3 stylus:\n%s%s", code, out, errOut)
	}
	code, out, errOut = runPanto(append([]string{"make", "-o", t.TempDir()}, base...)...)
	if code != exitOK || !strings.Contains(out, "channels along the stylus path") {
		t.Errorf("make: exit %d, want a grooved plate:\n%s%s", code, out, errOut)
	}
	code, _, errOut = runPanto(append([]string{"make", "-o", t.TempDir(), "--style", "wall"}, base...)...)
	if code != exitUsage || !strings.Contains(errOut, "--style groove") {
		t.Errorf("make --style wall: exit %d, want 2 suggesting --style groove:\n%s", code, errOut)
	}
}
