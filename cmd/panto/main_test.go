package main

import (
	"bytes"
	"encoding/json"
	"flag"
	"math"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata/golden")

// runPanto runs the command in-process and returns its exit code and output.
func runPanto(args ...string) (int, string, string) {
	var out, errOut bytes.Buffer
	code := run(args, &out, &errOut)
	return code, out.String(), errOut.String()
}

func TestExitCodes(t *testing.T) {
	tests := []struct {
		name string
		args []string
		code int
		frag string // expected in stdout or stderr
	}{
		{"no arguments", nil, exitUsage, "Usage:"},
		{"help", []string{"help"}, exitOK, "panto check PART"},
		{"help check", []string{"help", "check"}, exitOK, "--min-wall MM"},
		{"help for nothing", []string{"help", "nosuch"}, exitUsage, "no such command"},
		{"version", []string{"--version"}, exitOK, "panto " + version},
		{"unknown command", []string{"chek"}, exitUsage, `unknown command "chek"`},
		{"check without a file", []string{"check"}, exitUsage, "give exactly one part file, got 0"},
		{"check two files", []string{"check", "a", "b"}, exitUsage, "got 2"},
		{"check bad flag", []string{"check", "--jsn", "x"}, exitUsage, "unknown flag: --jsn"},
		{"check negative min wall", []string{"check", "--min-wall", "-1", "x"}, exitUsage, "--min-wall must be 0 or more"},
		{"check help", []string{"check", "-h"}, exitOK, "Usage: panto check"},
		{"check missing file", []string{"check", "../../testdata/parts/nosuch.toml"}, exitUsage, "cannot read the part file"},
		{"check a sample", []string{"check", "../../samples/pump-port-plate.toml"}, exitOK, "no problems found"},
		{"check a bad file", []string{"check", "../../testdata/parts/bad/typo-key.toml"}, exitUsage,
			"typo-key.toml:14: unknown key `diamter`"},
		{"check a part with errors", []string{"check", "../../testdata/parts/bad/overlapping-holes.toml"}, exitUsage,
			"overlapping-holes.toml:21: error:"},
		{"warnings keep exit 0", []string{"check", "--min-wall", "2", "../../samples/pump-port-plate.toml"}, exitOK,
			"warning:"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			code, out, errOut := runPanto(tc.args...)
			if code != tc.code {
				t.Errorf("exit code: got %d, want %d\nstdout: %s\nstderr: %s", code, tc.code, out, errOut)
			}
			if !strings.Contains(out+errOut, tc.frag) {
				t.Errorf("output lacks %q\nstdout: %s\nstderr: %s", tc.frag, out, errOut)
			}
		})
	}
}

// TestCheckGolden compares the human summary of each sample with testdata/golden/NAME.txt.
// Run `go test ./cmd/panto -update` to rewrite them after a deliberate change, and read the diff.
func TestCheckGolden(t *testing.T) {
	files, _ := filepath.Glob("../../samples/*.toml")
	if len(files) == 0 {
		t.Fatal("no samples")
	}
	for _, file := range files {
		name := strings.TrimSuffix(filepath.Base(file), ".toml")
		t.Run(name, func(t *testing.T) {
			code, out, errOut := runPanto("check", file)
			if code != exitOK {
				t.Fatalf("exit code %d: %s", code, errOut)
			}
			checkGolden(t, filepath.Join("../../testdata/golden", name+".txt"), out)
		})
	}
}

// TestCheckSharpCorners: with a sharp inside corner no cutter makes the part as drawn, and the
// summary says what common cutters leave there: r(√2 − 1) at 90° (derived: Ø1 → 0.207 mm,
// Ø0.5 → 0.104 mm, Ø0.3 → 0.062 mm, Ø0.2 → 0.041 mm).
func TestCheckSharpCorners(t *testing.T) {
	code, out, errOut := runPanto("check", "../../testdata/parts/sharp-window.toml")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	for _, want := range []string{"sharp (90°)", "none as drawn", "Ø1 mm leaves 0.207 mm", "Ø0.5 mm leaves 0.104 mm",
		"Ø0.3 mm leaves 0.062 mm", "Ø0.2 mm leaves 0.041 mm"} {
		if !strings.Contains(out, want) {
			t.Errorf("check says:\n%s\nwant it to say %q", out, want)
		}
	}
	code, out, _ = runPanto("check", "--units", "in", "../../testdata/parts/sharp-window.toml")
	// derived: 4 mm = 0.1575 in; 1/16 in leaves (0.0625/2)(√2 − 1) = 0.0129 in
	if code != exitOK || !strings.Contains(out, "Ø0.0625 in leaves 0.0129 in") || !strings.Contains(out, "(shown here in inches)") {
		t.Errorf("check --units in says:\n%s", out)
	}
}

func TestCheckJSON(t *testing.T) {
	code, out, errOut := runPanto("check", "--json", "../../samples/calibration-coupon.toml")
	if code != exitOK {
		t.Fatalf("exit code %d: %s", code, errOut)
	}
	var got struct {
		Units  string `json:"units"`
		Bounds struct {
			Min, Max [2]float64
		} `json:"bounds"`
		Area            float64  `json:"area"`
		MinInsideRadius *float64 `json:"min_inside_radius"`
		NarrowestGap    *float64 `json:"narrowest_gap"`
		LargestCutter   *float64 `json:"largest_cutter"`
		Features        []struct{ Name, Kind string }
		Problems        []struct{ Severity, Feature, Message string }
	}
	if err := json.Unmarshal([]byte(out), &got); err != nil {
		t.Fatalf("not JSON: %v\n%s", err, out)
	}
	const in = 25.4 // mm per inch, exact
	checks := []struct {
		name      string
		got, want float64
	}{
		{"max x", got.Bounds.Max[0], 2 * in},
		{"max y", got.Bounds.Max[1], 1 * in},
		// derived: 2 × 1 in less four round holes (π d²/4), the through slot (stadium w·L + π w²/4)
		// and the corner-test opening (0.5 × 0.35 less (1 − π/4)·Σr² for its four corner radii)
		{"area", got.Area, in * in * (2 - math.Pi/4*(0.0625*0.0625+0.09375*0.09375+0.125*0.125+0.1875*0.1875) -
			(0.0625*0.5 + math.Pi/4*0.0625*0.0625) -
			(0.5*0.35 - (1-math.Pi/4)*(0.015625*0.015625+0.03125*0.03125+0.046875*0.046875+0.0625*0.0625)))},
		{"min inside radius", *got.MinInsideRadius, 0.015625 * in}, // the corner test's smallest corner
		{"narrowest gap", *got.NarrowestGap, 0.0625 * in},          // the slot's width
		{"largest cutter", *got.LargestCutter, 0.03125 * in},       // twice the smallest corner radius
	}
	for _, c := range checks {
		if math.Abs(c.got-c.want) > 2e-6 { // the JSON keeps a millionth of a millimetre
			t.Errorf("%s: got %v, want %v", c.name, c.got, c.want)
		}
	}
	if got.Units != "in" || len(got.Features) != 10 || got.Features[0].Kind != "profile" || len(got.Problems) != 0 {
		t.Errorf("got units %q, %d features (first %+v), problems %v", got.Units, len(got.Features), got.Features[0], got.Problems)
	}
}

func TestCheckJSONProblems(t *testing.T) {
	code, out, _ := runPanto("check", "--json", "../../testdata/parts/bad/hole-outside.toml")
	if code != exitUsage {
		t.Fatalf("exit code: got %d, want %d", code, exitUsage)
	}
	var got struct {
		Problems []struct {
			Severity, Feature, Message string
			Line                       int
			Amount                     *float64
		}
	}
	if err := json.Unmarshal([]byte(out), &got); err != nil {
		t.Fatalf("not JSON: %v\n%s", err, out)
	}
	if len(got.Problems) != 1 {
		t.Fatalf("got %d problems, want 1", len(got.Problems))
	}
	p := got.Problems[0]
	// derived: the hole at x = 25 with radius 0.5 is 4.5 beyond the edge at x = 20
	if p.Severity != "error" || p.Feature != `[[holes]] "pivots"` || p.Line != 17 || p.Amount == nil || *p.Amount != 4.5 {
		t.Errorf("got %+v", p)
	}
}

// checkGolden compares out with the golden file at path, rewriting it first under -update.
func checkGolden(t *testing.T, path, out string) {
	t.Helper()
	if *update {
		if err := os.WriteFile(path, []byte(out), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run with -update to create it)", err)
	}
	if out != string(want) {
		t.Errorf("got:\n%s\nwant:\n%s", out, want)
	}
}

// TestMaterials: the speed table is listed with its sources, a machine file adds its own
// rows, and a material not in the table stops plan, sheet and make with the known ones named.
func TestMaterials(t *testing.T) {
	code, out, _ := runPanto("help", "materials")
	// shop speed tables: brass drilling ~61 m/min with HSS, carbide about twice
	if code != exitOK || !strings.Contains(out, "brass") || !regexp.MustCompile(`brass +brass and bronze +61 +45 +122`).MatchString(out) ||
		!strings.Contains(out, "shop speed tables") || !strings.Contains(out, "rule of thumb") {
		t.Errorf("help materials: exit %d\n%s", code, out)
	}
	machine := filepath.Join(t.TempDir(), "m.machine.toml")
	src := "[ratio]\nmin = 2\nmax = 10\n[[stock_material]]\nname = \"boxwood\"\nhss_drill = 60\nhss_mill = 50\n"
	if err := os.WriteFile(machine, []byte(src), 0o644); err != nil {
		t.Fatal(err)
	}
	if code, out, _ := runPanto("help", "materials", "--machine", machine); code != exitOK || !strings.Contains(out, "boxwood") {
		t.Errorf("help materials --machine: exit %d\n%s", code, out)
	}
	sample := "../../samples/pump-port-plate.toml"
	for _, cmd := range []string{"plan", "sheet", "make"} {
		args := []string{cmd, sample, "--ratio", "10", "--cutter", "0.5", "--material", "boxwood", "-o", t.TempDir()}
		if cmd == "plan" {
			args = args[:len(args)-2]
		}
		code, _, errOut := runPanto(args...)
		if code != exitUsage || !strings.Contains(errOut, `"boxwood" is not in the speed table`) || !strings.Contains(errOut, "mild steel") {
			t.Errorf("%s with an unknown material: exit %d\n%s", cmd, code, errOut)
		}
		args = append(args, "--machine", machine)
		if code, _, errOut := runPanto(args...); code != exitOK {
			t.Errorf("%s with the machine file's boxwood: exit %d\n%s", cmd, code, errOut)
		}
	}
}
