package main

import (
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

const (
	benchMachine = "../../samples/machines/bench-pantograph.machine.toml"
	inchMachine  = "../../samples/machines/inch-engraver.machine.toml"
)

func TestStylusOutput(t *testing.T) {
	tests := []struct {
		name  string
		args  []string
		code  int
		want  []string // every one in stdout
		isErr string   // in stderr; "" for nothing in particular
	}{
		// derived: d_s = R·d_c = 10 × 0.3
		{"stylus for a cutter", []string{"--ratio", "10", "--cutter", "0.3"}, exitOK,
			[]string{"matched stylus  3.000 mm"}, ""},
		// derived: d_c = d_s / R = 5 / 10
		{"cutter for a stylus", []string{"--stylus", "5", "--ratio", "10"}, exitOK,
			[]string{"matched cutter  0.500 mm"}, ""},
		// derived: δ = 10 × 0.25 − 2.15 = +0.35, 0.035 at the part
		{"a pair", []string{"--ratio", "10", "--cutter", "0.5", "--stylus", "4.3"}, exitOK,
			[]string{"+0.350 mm on the template", "the template's outline must grow by 0.350 mm; openings shrink by 0.350 mm",
				"off by 0.035 mm at the part"}, ""},
		// derived: REFERENCES.md case R = 10, d_c = 0.5, d_s = 4.0 → δ = 0.5
		{"reference pair", []string{"--ratio", "10", "--cutter", "0.5", "--stylus", "4"}, exitOK,
			[]string{"+0.500 mm on the template"}, ""},
		// derived: δ = 10 × 0.075 − 1.0 = −0.25 (radii)
		{"stylus too big", []string{"--ratio", "10", "--cutter", "0.15", "--stylus", "2"}, exitOK,
			[]string{"-0.250 mm on the template", "outline must shrink by 0.250 mm; openings grow by 0.250 mm"}, ""},
		{"matched pair", []string{"--ratio", "10", "--cutter", "0.5", "--stylus", "5"}, exitOK,
			[]string{"compensation    none"}, ""},
		// derived: 4.3 is nearest the 4 mm stylus of the bench set; δ = 2.15 − 2.0
		{"machine, nearest", []string{"--machine", benchMachine, "--ratio", "10", "--cutter", "0.43"}, exitOK,
			[]string{"bench pantograph", `nearest owned   "4 mm", 4.000 mm round`, "+0.150 mm", "grow by 0.150 mm"}, ""},
		// derived: 10 × 0.3 = 3.0, the 3 mm stylus of the set
		{"machine, matched", []string{"--machine", benchMachine, "--ratio", "10", "--cutter", "0.3"}, exitOK,
			[]string{`"3 mm", 3.000 mm round`, "none: the stylus matches"}, ""},
		// derived: 2 × 0.1 = 0.2 is nearest the pointed stylus (0), δ = 0.1
		{"machine, pointed", []string{"--machine", benchMachine, "--ratio", "2", "--cutter", "0.1"}, exitOK,
			[]string{`"point", pointed`, "+0.100 mm"}, ""},
		{"machine, ratio out of range", []string{"--machine", benchMachine, "--ratio", "12", "--cutter", "0.3"}, exitOK,
			[]string{"nearest owned"}, "cannot be set to 12:1"},
		// derived: 8 × 1/64 in = 1/8 in, the "1/8" stylus; inches print with 4 decimals
		{"inch machine", []string{"--machine", inchMachine, "--ratio", "8", "--cutter", "0.015625", "--units", "in"}, exitOK,
			[]string{"cutter          0.0156 in", "matched stylus  0.1250 in", `"1/8", 0.1250 in round`, "none"}, ""},
		// derived: 10 × 0.01 in = 0.1 in; |0.0625 − 0.1| = 0.0375, |0.125 − 0.1| = 0.025, so
		// the 1/8 stylus; δ = 0.05 − 0.0625 = −0.0125 in
		{"inch, compensated", []string{"--machine", inchMachine, "--ratio", "10", "--cutter", "0.01", "--units", "in"}, exitOK,
			[]string{`"1/8"`, "-0.0125 in on the template", "openings grow by 0.0125 in"}, ""},
		// derived: 10 × 0.3 mm, then the same in inches: 3 / 25.4 = 0.1181 in
		{"inch output of a metric size", []string{"--ratio", "10", "--cutter", "0.011811", "--units", "in"}, exitOK,
			[]string{"0.1181 in"}, ""},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			code, out, errOut := runPanto(append([]string{"stylus"}, tc.args...)...)
			if code != tc.code {
				t.Errorf("exit code: got %d, want %d\nstderr: %s", code, tc.code, errOut)
			}
			for _, w := range tc.want {
				if !strings.Contains(out, w) {
					t.Errorf("stdout lacks %q:\n%s", w, out)
				}
			}
			if !strings.Contains(errOut, tc.isErr) {
				t.Errorf("stderr lacks %q:\n%s", tc.isErr, errOut)
			}
		})
	}
}

func TestStylusBadUsage(t *testing.T) {
	noStyli := filepath.Join(t.TempDir(), "bare.machine.toml")
	if err := os.WriteFile(noStyli, []byte("[ratio]\nmin = 2\nmax = 10\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		name string
		args []string
		code int
		frag string // in stderr
	}{
		{"nothing", nil, exitUsage, "--ratio missing"},
		{"no tool", []string{"--ratio", "10"}, exitUsage, "give --cutter"},
		{"no ratio", []string{"--cutter", "0.3"}, exitUsage, "--ratio missing"},
		{"ratio below 1", []string{"--ratio", "0.5", "--cutter", "0.3"}, exitUsage, "at least 1, got 0.5"},
		{"ratio not a number", []string{"--ratio", "ten", "--cutter", "0.3"}, exitUsage, "invalid argument"},
		{"zero cutter", []string{"--ratio", "10", "--cutter", "0"}, exitUsage, "--cutter must be a diameter greater than 0"},
		{"negative stylus", []string{"--ratio", "10", "--stylus", "-4"}, exitUsage, "--stylus must be a diameter greater than 0"},
		{"infinite cutter", []string{"--ratio", "10", "--cutter", "+Inf"}, exitUsage, "greater than 0"},
		{"bad units", []string{"--ratio", "10", "--cutter", "0.3", "--units", "cm"}, exitUsage, `--units must be "mm" or "in"`},
		{"typo flag", []string{"--ratio", "10", "--cuter", "0.3"}, exitUsage, "unknown flag: --cuter"},
		{"stray argument", []string{"--ratio", "10", "--cutter", "0.3", "part.toml"}, exitUsage, `unexpected argument "part.toml"`},
		{"machine without cutter", []string{"--machine", benchMachine, "--ratio", "10", "--stylus", "3"}, exitUsage, "--machine needs --cutter"},
		{"machine and stylus", []string{"--machine", benchMachine, "--ratio", "10", "--cutter", "0.3", "--stylus", "3"},
			exitUsage, "not both"},
		{"missing machine", []string{"--machine", "nosuch.toml", "--ratio", "10", "--cutter", "0.3"}, exitUsage,
			"cannot read the machine file"},
		{"bad machine", []string{"--machine", "../../testdata/machines/bad/typo-key.machine.toml", "--ratio", "10", "--cutter", "0.3"},
			exitUsage, "typo-key.machine.toml:10: unknown key `diamter`"},
		{"machine without styli", []string{"--machine", noStyli, "--ratio", "10", "--cutter", "0.3"}, exitFailed, "lists no styli"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			code, out, errOut := runPanto(append([]string{"stylus"}, tc.args...)...)
			if code != tc.code {
				t.Errorf("exit code: got %d, want %d\nstdout: %s\nstderr: %s", code, tc.code, out, errOut)
			}
			if !strings.Contains(errOut, tc.frag) {
				t.Errorf("stderr lacks %q:\n%s", tc.frag, errOut)
			}
			if tc.code == exitUsage && out != "" {
				t.Errorf("got stdout %q, want nothing on bad usage", out)
			}
		})
	}
}

func TestStylusHelp(t *testing.T) {
	for _, args := range [][]string{{"help", "stylus"}, {"stylus", "-h"}, {"stylus", "--help"}} {
		code, out, _ := runPanto(args...)
		if code != exitOK || !strings.Contains(out, "Usage: panto stylus") || !strings.Contains(out, "inches with 4") {
			t.Errorf("%v: got exit %d:\n%s", args, code, out)
		}
	}
	if _, out, _ := runPanto("help"); !strings.Contains(out, "panto stylus") {
		t.Errorf("general help does not list stylus:\n%s", out)
	}
}

func TestStylusJSON(t *testing.T) {
	type chosen struct {
		Name     string
		Diameter float64
		Tip      string
	}
	var got struct {
		Units         string
		Ratio         float64
		Cutter        *float64
		Stylus        *float64
		MatchedStylus *float64 `json:"matched_stylus"`
		MatchedCutter *float64 `json:"matched_cutter"`
		RatioAllowed  *bool    `json:"ratio_allowed"`
		Chosen        *chosen  `json:"chosen_stylus"`
		Compensation  *float64
		AtPart        *float64 `json:"compensation_at_part"`
		Direction     string
	}
	code, out, errOut := runPanto("stylus", "--json", "--machine", benchMachine, "--ratio", "10", "--cutter", "0.43")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	if err := json.Unmarshal([]byte(out), &got); err != nil {
		t.Fatalf("not JSON: %v\n%s", err, out)
	}
	checks := []struct {
		name      string
		got, want float64
	}{
		{"cutter", *got.Cutter, 0.43},
		{"matched stylus", *got.MatchedStylus, 4.3}, // derived: 10 × 0.43
		{"stylus", *got.Stylus, 4},                  // the nearest of the bench set
		{"compensation", *got.Compensation, 0.15},   // derived: 2.15 − 2.0
		{"at the part", *got.AtPart, 0.015},         // derived: 0.15 / 10
		{"chosen diameter", got.Chosen.Diameter, 4}, // the "4 mm" stylus
	}
	for _, c := range checks {
		if math.Abs(c.got-c.want) > 1e-9 {
			t.Errorf("%s: got %v, want %v", c.name, c.got, c.want)
		}
	}
	if got.Units != "mm" || got.Direction != "grow" || got.Chosen.Name != "4 mm" || got.RatioAllowed == nil ||
		!*got.RatioAllowed || got.MatchedCutter != nil {
		t.Errorf("got %+v", got)
	}

	code, out, _ = runPanto("stylus", "--json", "--units", "in", "--ratio", "10", "--stylus", "0.125")
	got.MatchedCutter, got.Stylus = nil, nil
	if err := json.Unmarshal([]byte(out), &got); err != nil || code != exitOK {
		t.Fatalf("exit %d, %v\n%s", code, err, out)
	}
	// derived: 0.125 in / 10
	if got.Units != "in" || got.MatchedCutter == nil || *got.MatchedCutter != 0.0125 || *got.Stylus != 0.125 {
		t.Errorf("inch JSON: got %s", out)
	}
}
