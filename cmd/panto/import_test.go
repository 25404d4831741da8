package main

import (
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"panto/pantograph"
	"panto/pantograph/cad"
	"panto/pantograph/partfile"
)

const drawings = "../../testdata/drawings/"

func TestImportExitCodes(t *testing.T) {
	dir := t.TempDir()
	exists := filepath.Join(dir, "exists.toml")
	if err := os.WriteFile(exists, []byte("keep me"), 0o644); err != nil {
		t.Fatal(err)
	}
	badDXF := filepath.Join(dir, "bad.dxf")
	if err := os.WriteFile(badDXF, []byte("0\nSECTION\n2\nENTITIES\n0\nCIRCLE\n10\n1,5\n0\nENDSEC\n0\nEOF\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		name string
		args []string
		code int
		frag string // expected in stdout or stderr
	}{
		{"help", []string{"help", "import"}, exitOK, "--hole-max D"},
		{"no drawing", []string{"import"}, exitUsage, "give exactly one drawing, got 0"},
		{"not a drawing", []string{"import", "part.toml"}, exitUsage, "give a .dxf or .svg drawing"},
		{"bad units", []string{"import", "--units", "ft", drawings + "plate-mm.dxf"}, exitUsage, "--units must be mm or in"},
		{"bad layer rule", []string{"import", "--layer", "X=drill", drawings + "plate-mm.dxf"}, exitUsage, `kind must be profile, cutout`},
		{"depth on a cut-out", []string{"import", "--layer", "X=cutout:1", drawings + "plate-mm.dxf"}, exitUsage, "takes no depth"},
		{"missing drawing", []string{"import", "-o", filepath.Join(dir, "x.toml"), drawings + "nosuch.dxf"}, exitUsage, "cannot read the drawing"},
		{"would overwrite", []string{"import", "-o", exists, drawings + "plate-mm.dxf"}, exitUsage, "already exists; give --force"},
		// The bad value "1,5" is on line 8 of the file (derived by counting).
		{"bad drawing", []string{"import", "-o", filepath.Join(dir, "b.toml"), badDXF}, exitUsage, "bad.dxf:8: CIRCLE: group 10 should be a number"},
		// plan reads drawings too; a drawing has no stock thickness, so --thickness is asked for.
		{"plan a drawing", []string{"plan", drawings + "pump-port-plate.svg", "--ratio", "10", "--cutter", "0.5"}, exitUsage,
			"pump-port-plate.svg: a drawing does not say how thick the stock is; give it with --thickness MM"},
		{"bad thickness", []string{"import", "--thickness", "-1", drawings + "plate-mm.dxf"}, exitUsage, "--thickness must be 0 or more"},
		// The fixture's second line starts 0.05 from where the first ends (derived: 0.05 − 0).
		{"gap reported", []string{"import", "-o", filepath.Join(dir, "g.toml"), drawings + "triangle-gap.dxf"}, exitUsage,
			"loose end at (10.0000, 0.0000) (gap of 0.05 mm to (10.0000, 0.0500))"},
		{"gap joined", []string{"import", "-o", filepath.Join(dir, "j.toml"), "--join", "0.06", drawings + "triangle-gap.dxf"}, exitOK,
			"profile: LINE at line 5"},
		{"open outline", []string{"import", "-o", filepath.Join(dir, "c.toml"), drawings + "calibration-coupon-in.dxf"}, exitUsage,
			"loose end at (-0.1000, 0.5000)"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			code, out, errOut := runPanto(tc.args...)
			if code != tc.code {
				t.Errorf("got exit %d, want %d\nstdout: %s\nstderr: %s", code, tc.code, out, errOut)
			}
			if !strings.Contains(out+errOut, tc.frag) {
				t.Errorf("output does not contain %q:\n%s%s", tc.frag, out, errOut)
			}
		})
	}
	if b, _ := os.ReadFile(exists); string(b) != "keep me" {
		t.Errorf("an existing file was overwritten without --force")
	}
	for _, n := range []string{"b.toml", "c.toml", "g.toml"} {
		if _, err := os.Stat(filepath.Join(dir, n)); err == nil {
			t.Errorf("%s was written from a bad drawing", n)
		}
	}
}

func TestImportWritesPartFile(t *testing.T) {
	tests := []struct {
		name    string
		drawing string
		flags   []string
		units   pantograph.Units
		area    float64 // profile area, mm²
		holes   int
		report  string
	}{
		// Derived: 30 × 20 less two corners of 3 × 3 squares, plus two quarter discs R3.
		{"SVG in mm", "pump-port-plate.svg", []string{"--thickness", "0.8"}, pantograph.MM, 600 - 2*(9-9*math.Pi/4), 4, "profile: <path id=\"outline\">"},
		// Derived: 1.5 × 1 in less a corner of 0.25 in, plus its quarter disc, in mm². The
		// file's bulge is written to 6 decimals, so the arc differs by about 1e-7 in.
		{"DXF in inches", "calibration-coupon-in.dxf", []string{"--layer", "CENTRE=ignore", "--layer", "RECESS=pocket:0.01"},
			pantograph.Inch, (1.5 - 0.0625 + math.Pi*0.0625/4) * 645.16, 3, "$INSUNITS 1 (inches)"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			out := filepath.Join(t.TempDir(), "part.toml")
			args := append([]string{"import", drawings + tc.drawing, "-o", out}, tc.flags...)
			code, stdout, stderr := runPanto(args...)
			if code != exitOK {
				t.Fatalf("got exit %d, want 0\n%s%s", code, stdout, stderr)
			}
			if !strings.Contains(stdout, tc.report) || !strings.Contains(stdout, "wrote "+out) {
				t.Errorf("report does not contain %q and the file written:\n%s", tc.report, stdout)
			}
			p, err := partfile.ReadFile(out)
			if err != nil {
				t.Fatalf("the part file does not read: %v", err)
			}
			if tc.drawing == "pump-port-plate.svg" && p.Stock.Thickness != 0.8 {
				t.Errorf("got stock thickness %g, want 0.8 as given", p.Stock.Thickness)
			}
			if p.Units != tc.units {
				t.Errorf("got units %q, want %q", p.Units, tc.units)
			}
			if a := p.Profile.Region.Area(); math.Abs(a-tc.area) > 1e-3 {
				t.Errorf("profile area: got %.6f, want %.6f", a, tc.area)
			}
			holes := 0
			for _, f := range p.Features {
				holes += len(f.Centers)
			}
			if holes != tc.holes {
				t.Errorf("got %d holes, want %d", holes, tc.holes)
			}
			code, _, stderr = runPanto(args...)
			if code != exitUsage || !strings.Contains(stderr, "already exists") {
				t.Errorf("second import without --force: got exit %d, %q", code, stderr)
			}
			if code, _, _ := runPanto(append(args, "--force")...); code != exitOK {
				t.Errorf("import with --force: got exit %d, want 0", code)
			}
			left, _ := filepath.Glob(filepath.Join(filepath.Dir(out), ".*.tmp"))
			if len(left) > 0 {
				t.Errorf("temporary files left behind: %v", left)
			}
		})
	}
}

// TestMakeDXFFiles plans a drawing and checks that both DXF files read back: the template's
// outline is the part's profile at the ratio, the part's at true size.
func TestMakeDXFFiles(t *testing.T) {
	part, _, err := cad.ReadFile(drawings+"pump-port-plate.svg", cad.Options{Thickness: 0.8, Material: "brass"})
	if err != nil {
		t.Fatal(err)
	}
	plan, err := pantograph.PlanPart(part, pantograph.Setup{Ratio: 10, Cutter: 0.5}, nil)
	if err != nil {
		t.Fatal(err)
	}
	files, err := makeDXFFiles(part, plan, 0)
	if err != nil {
		t.Fatal(err)
	}
	if len(files) != 2 || files[0].name != "template.dxf" || files[1].name != "part.dxf" {
		t.Fatalf("got %d files, want template.dxf and part.dxf", len(files))
	}
	ratio := map[string]float64{"template.dxf": 10, "part.dxf": 1}
	for _, f := range files {
		got, _, err := cad.Read(f.name, f.data, cad.Options{HoleMax: -1})
		if err != nil {
			t.Fatalf("%s: %v", f.name, err)
		}
		// Derived: areas scale with the square of the ratio; the stylus matches the cutter
		// (10 × 0.5 = 5 mm), so the template needs no compensation.
		want := part.Profile.Region.Area() * ratio[f.name] * ratio[f.name]
		if a := got.Profile.Region.Area(); math.Abs(a-want) > 1e-6*want {
			t.Errorf("%s: profile area %g, want %g", f.name, a, want)
		}
	}
}
