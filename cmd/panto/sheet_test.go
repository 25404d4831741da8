package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"panto/pantograph"
	"panto/pantograph/partfile"
)

// sheetArgs runs the pump port plate on the bench machine at 10:1 with a 0.5 mm cutter.
func sheetArgs(out string, extra ...string) []string {
	root := filepath.Join("..", "..", "samples")
	args := []string{"sheet", filepath.Join(root, "pump-port-plate.toml"), "--ratio", "10",
		"--cutter", "0.5", "--machine", filepath.Join(root, "machines", "bench-pantograph.machine.toml"),
		"--out", out, "--date", "2026-12-01"}
	return append(args, extra...)
}

func TestSheetWritesAndKeeps(t *testing.T) {
	dir := t.TempDir()
	code, stdout, stderr := runPanto(sheetArgs(dir, "--print")...)
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	if !strings.Contains(stdout, "Dial-reading sheet: pump port plate") {
		t.Errorf("--print did not print the sheet: %q", stdout)
	}
	names := []string{"sheet.pdf", "sheet.txt", "sheet.csv", "sheet.json"}
	txt, err := os.ReadFile(filepath.Join(dir, "sheet.txt"))
	if err != nil {
		t.Fatal(err)
	}
	if string(txt) != stdout {
		t.Errorf("sheet.txt and the printed sheet differ")
	}
	for _, n := range names {
		if fi, err := os.Stat(filepath.Join(dir, n)); err != nil || fi.Size() == 0 {
			t.Errorf("%s: %v", n, err)
		}
	}
	// A second run without --force must refuse and leave the files as they were.
	os.WriteFile(filepath.Join(dir, "sheet.csv"), []byte("mine"), 0o644)
	code, _, stderr = runPanto(sheetArgs(dir)...)
	if code == exitOK || !strings.Contains(stderr, "--force") {
		t.Errorf("second run: got exit %d %q, want a refusal naming --force", code, stderr)
	}
	if b, _ := os.ReadFile(filepath.Join(dir, "sheet.csv")); string(b) != "mine" {
		t.Errorf("sheet.csv was overwritten without --force")
	}
	if code, _, stderr = runPanto(sheetArgs(dir, "--force")...); code != exitOK {
		t.Errorf("--force: exit %d: %s", code, stderr)
	}
	entries, _ := os.ReadDir(dir)
	for _, e := range entries {
		if strings.HasSuffix(e.Name(), ".tmp") {
			t.Errorf("temporary file left behind: %s", e.Name())
		}
	}
}

func TestSheetUsage(t *testing.T) {
	tests := []struct {
		name string
		args []string
		frag string
	}{
		{"bad paper", sheetArgs(t.TempDir(), "--paper", "a3"), "no paper \"a3\""},
		{"no ratio", []string{"sheet", "x.toml", "--cutter", "1"}, "--ratio is required"},
		{"two parts", []string{"sheet", "a", "b"}, "got 2"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			code, _, stderr := runPanto(tc.args...)
			if code != exitUsage || !strings.Contains(stderr, tc.frag) {
				t.Errorf("got exit %d %q, want %d with %q", code, stderr, exitUsage, tc.frag)
			}
		})
	}
}

// TestMakeSheetFiles checks the hook make calls: every file named once, sheet.txt last.
func TestMakeSheetFiles(t *testing.T) {
	root := filepath.Join("..", "..", "samples")
	part, err := partfile.ReadFile(filepath.Join(root, "clock-bridge.toml"))
	if err != nil {
		t.Fatal(err)
	}
	m, err := partfile.ReadMachineFile(filepath.Join(root, "machines", "bench-pantograph.machine.toml"))
	if err != nil {
		t.Fatal(err)
	}
	p, err := pantograph.PlanPart(part, pantograph.Setup{Ratio: 7, Cutter: 0.5}, &m)
	if err != nil {
		t.Fatal(err)
	}
	files, err := sheetAndDrawingFiles(part, p, &m, "letter", "")
	if err != nil {
		t.Fatal(err)
	}
	var names []string
	for _, f := range files {
		if len(f.data) == 0 {
			t.Errorf("%s is empty", f.name)
		}
		names = append(names, f.name)
	}
	want := "sheet.pdf sheet.csv sheet.json template.svg template.pdf part.svg part.pdf sheet.txt"
	if got := strings.Join(names, " "); got != want {
		t.Errorf("got %v, want %v", got, want)
	}
}
