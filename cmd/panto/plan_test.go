package main

import (
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestPlanExitCodes(t *testing.T) {
	narrow := "../../testdata/plans/narrow-slot.toml"
	tests := []struct {
		name string
		args []string
		code int
		frag string // in stderr
	}{
		// derived: a 0.4 mm slot is lost under a 0.5 mm cutter.
		{"lost feature", []string{"plan", narrow, "--ratio", "10", "--cutter", "0.5"}, exitFailed, "--accept-loss"},
		{"loss accepted", []string{"plan", narrow, "--ratio", "10", "--cutter", "0.5", "--accept-loss"}, exitOK, "nothing of it is cut"},
		{"warning said once", []string{"plan", narrow, "--ratio", "10", "--cutter", "0.5", "--accept-loss"}, exitOK, "warning: [[slot]] \"narrow\""},
		{"small enough cutter", []string{"plan", narrow, "--ratio", "10", "--cutter", "0.4"}, exitOK, ""},
		{"no ratio", []string{"plan", narrow, "--cutter", "0.5"}, exitUsage, "--ratio is required"},
		{"no cutter", []string{"plan", narrow, "--ratio", "10"}, exitUsage, "--cutter is required"},
		{"ratio below 1", []string{"plan", narrow, "--ratio", "0.5", "--cutter", "0.5"}, exitUsage, "smaller than the part"},
		{"bad kind", []string{"plan", narrow, "--ratio", "10", "--cutter", "0.5", "--cutter-for", "boss=0.2"}, exitUsage, `no kind of feature "boss"`},
		{"bad stylus", []string{"plan", narrow, "--ratio", "10", "--cutter", "0.5", "--stylus", "0"}, exitUsage, "--stylus must be"},
		{"bad tip", []string{"plan", narrow, "--ratio", "10", "--cutter", "0.5", "--tip", "ball"}, exitUsage, "stylus tip"},
		{"no part", []string{"plan", "--ratio", "10", "--cutter", "0.5"}, exitUsage, "exactly one part file"},
		{"missing part", []string{"plan", "nowhere.toml", "--ratio", "10", "--cutter", "0.5"}, exitUsage, "cannot read"},
		{"bad part", []string{"plan", "../../testdata/parts/bad/pocket-too-deep.toml", "--ratio", "10", "--cutter", "0.5"}, exitUsage, "fix them first"},
		{"missing machine", []string{"plan", narrow, "--ratio", "10", "--cutter", "0.4", "--machine", "nowhere.toml"}, exitUsage, "nowhere.toml"},
		{"help", []string{"plan", "--help"}, exitOK, ""},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			code, _, errOut := runPanto(tc.args...)
			if code != tc.code {
				t.Fatalf("exit code got %d, want %d; stderr:\n%s", code, tc.code, errOut)
			}
			if !strings.Contains(errOut, tc.frag) {
				t.Fatalf("stderr got:\n%s\nwant it to contain %q", errOut, tc.frag)
			}
			if strings.Contains(errOut, "warning: warning") {
				t.Errorf("stderr says warning twice:\n%s", errOut)
			}
		})
	}
}

// TestPlanSamples plans every sample at 10:1 with a 0.3 mm cutter, small enough for every
// opening the samples draw (their narrowest gap is 1 mm and the smallest inside radius
// R0.397 at the part; see panto check), with and without the sample machines.
func TestPlanSamples(t *testing.T) {
	files, _ := filepath.Glob("../../samples/*.toml")
	if len(files) == 0 {
		t.Fatal("no samples")
	}
	for _, file := range files {
		t.Run(filepath.Base(file), func(t *testing.T) {
			code, out, errOut := runPanto("plan", file, "--ratio", "10", "--cutter", "0.3")
			if code != exitOK {
				t.Fatalf("exit code %d: %s", code, errOut)
			}
			for _, want := range []string{"order of work", "cut out    [profile]", "warnings"} {
				if !strings.Contains(out, want) {
					t.Errorf("output lacks %q:\n%s", want, out)
				}
			}
		})
	}
}

// TestPlanGolden compares the plan of one sample with testdata/plans/NAME.txt. Run
// `go test ./cmd/panto -update` to rewrite it after a deliberate change, and read the diff.
// The file's numbers were checked by hand (derived), with δ = 10·0.25 − 2 = 0.5: the Ø3 window
// gives a 29 mm template hole, area π·14.5² = 660.52; the 5 × 3 R0.5 valve seat gives 49 × 29
// R4.5, area 1421 − (4 − π)·4.5² = 1403.617; the 1 mm adjuster slot 3 mm long gives a 39 × 9
// capsule, 270 + π·4.5² = 333.617; the 22 × 14 plate grows to 221 × 141; the screw seats from
// the last port at (110, 40) take the shortest of the six orders, 346.3 mm.
func TestPlanGolden(t *testing.T) {
	code, out, errOut := runPanto("plan", "../../samples/pump-port-plate.toml", "--ratio", "10", "--cutter", "0.5", "--stylus", "4")
	if code != exitOK {
		t.Fatalf("exit code %d: %s", code, errOut)
	}
	checkGolden(t, "../../testdata/plans/pump-port-plate.txt", out)
}

func TestPlanJSON(t *testing.T) {
	code, out, errOut := runPanto("plan", "../../testdata/plans/narrow-slot.toml", "--ratio", "10", "--cutter", "0.5",
		"--stylus", "4", "--mirror", "--rotate", "180", "--accept-loss", "--json")
	if code != exitOK {
		t.Fatalf("exit code %d: %s", code, errOut)
	}
	var got struct {
		Ratio    float64
		Mirror   bool
		Datum    [2]float64
		Template struct{ Bounds struct{ Min, Max [2]float64 } }
		Features []struct {
			Name, Kind, Status string
			Cutter             *float64
			Stylus             float64
			Compensation       float64
			TemplateArea       *float64 `json:"template_area"`
			Seats              [][2]float64
		}
		Order    []string
		Warnings []struct {
			Feature, Message string
			Amount           *float64
		}
	}
	if err := json.Unmarshal([]byte(out), &got); err != nil {
		t.Fatalf("%v\n%s", err, out)
	}
	if got.Ratio != 10 || !got.Mirror || got.Datum != [2]float64{0, 0} {
		t.Errorf("got ratio %v mirror %v datum %v, want 10 true [0 0]", got.Ratio, got.Mirror, got.Datum)
	}
	// derived: the 20 × 10 plate mirrored and turned 180° about (0, 0) lies in x 0..200,
	// y −100..0 at 10:1, grown by δ = 2.5 − 2 = 0.5 all round.
	if got.Template.Bounds.Min != [2]float64{-0.5, -100.5} || got.Template.Bounds.Max != [2]float64{200.5, 0.5} {
		t.Errorf("template bounds got %v, want min [-0.5 -100.5] max [200.5 0.5]", got.Template.Bounds)
	}
	byName := map[string]int{}
	for i, f := range got.Features {
		byName[f.Name] = i
	}
	pin, slot, prof := got.Features[byName["pin"]], got.Features[byName["narrow"]], got.Features[byName["profile"]]
	// derived: hole (15, 5) mirrored → (−15, 5), turned → (15, −5), × 10.
	if len(pin.Seats) != 1 || pin.Seats[0] != [2]float64{150, -50} || pin.Cutter != nil {
		t.Errorf("pin got seats %v cutter %v, want [[150 -50]] and no cutter", pin.Seats, pin.Cutter)
	}
	if slot.Status != "lost" || prof.Status != "ok" || prof.Compensation != 0.5 {
		t.Errorf("got slot %s, profile %s δ %v; want lost, ok, 0.5", slot.Status, prof.Status, prof.Compensation)
	}
	// derived: (200 + 1)(100 + 1) − (4 − π)·0.25.
	if want := 201*101 - (4-math.Pi)*0.25; prof.TemplateArea == nil || math.Abs(*prof.TemplateArea-want) > 1e-6 {
		t.Errorf("profile template area got %v, want %v", prof.TemplateArea, want)
	}
	if strings.Join(got.Order, ",") != "pin,profile" {
		t.Errorf("order got %v, want [pin profile]", got.Order)
	}
	// derived: cutter 0.5 − slot 0.4.
	if len(got.Warnings) != 1 || got.Warnings[0].Feature != "narrow" || got.Warnings[0].Amount == nil || math.Abs(*got.Warnings[0].Amount-0.1) > 1e-9 {
		t.Errorf("warnings got %+v, want one about narrow of 0.1 mm", got.Warnings)
	}
}

// TestInchThroughout plans and sheets the inch coupon on the inch machine: every length the
// machinist reads is in inches, none in millimetres.
func TestInchThroughout(t *testing.T) {
	dir := t.TempDir()
	args := []string{"../../samples/calibration-coupon.toml", "--ratio", "4", "--cutter", "1/32in",
		"--machine", "../../samples/machines/inch-engraver.machine.toml"}
	code, out, errOut := runPanto(append([]string{"plan"}, args...)...)
	if code != exitOK {
		t.Fatalf("plan: exit %d: %s", code, errOut)
	}
	code, _, errOut2 := runPanto(append([]string{"sheet", "-o", dir, "--date", "2026-12-01"}, args...)...)
	if code != exitOK {
		t.Fatalf("sheet: exit %d: %s", code, errOut2)
	}
	txt, err := os.ReadFile(filepath.Join(dir, "sheet.txt"))
	if err != nil {
		t.Fatal(err)
	}
	for name, text := range map[string]string{"plan": out + errOut, "sheet.txt": string(txt)} {
		if i := strings.Index(text, " mm"); i >= 0 {
			t.Errorf("%s speaks mm: ...%s...", name, text[max(0, i-60):min(len(text), i+20)])
		}
		if !strings.Contains(text, "Ø0.03125 in") {
			t.Errorf("%s does not give the 1/32 in cutter as Ø0.03125 in", name)
		}
	}
}
