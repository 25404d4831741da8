package main

import (
	"encoding/json"
	"fmt"
	"math"
	"strings"
	"testing"
)

// TestRatiosAgreeWithPlan runs panto ratios on the pump port plate on the bench machine and
// plans it at every ratio the table fits: the plate's size, fit and pieces that plan reports
// are the ones ratios gave, and the largest one-piece ratio is the largest candidate that fits
// both the bed and the copy table.
func TestRatiosAgreeWithPlan(t *testing.T) {
	args := []string{"../../samples/pump-port-plate.toml", "--cutter", "0.5",
		"--machine", "../../samples/machines/bench-pantograph.machine.toml"}
	code, out, errOut := runPanto(append([]string{"ratios", "--json"}, args...)...)
	if code != exitOK {
		t.Fatalf("ratios: exit %d: %s", code, errOut)
	}
	var got ratiosJSON
	if err := json.Unmarshal([]byte(out), &got); err != nil {
		t.Fatal(err)
	}
	// the bench machine's range 2:1 to 10:1 in steps of 0.5: 17 ratios
	if len(got.Candidates) != 17 || got.Candidates[0].Ratio != 2 || got.Candidates[16].Ratio != 10 {
		t.Fatalf("got %d candidates from %v, want 17 from 2:1 to 10:1", len(got.Candidates), got.Candidates)
	}
	want := 0.0
	for _, c := range got.Candidates {
		if c.FitsCopyTable && c.FitsBed && c.Ratio > want {
			want = c.Ratio
		}
		// derived: matched = R × 0.5; the print's ±0.1 mm (the default accuracy) over R
		if math.Abs(c.MatchedStylus-c.Ratio*0.5) > 1e-6 || c.ChosenStylus == nil || math.Abs(c.TemplateError-0.1/c.Ratio) > 1e-6 {
			t.Errorf("%v:1: matched %v, chosen %v, error %v", c.Ratio, c.MatchedStylus, c.ChosenStylus, c.TemplateError)
		}
		if !c.FitsCopyTable || int(c.Ratio*2)%2 != 0 {
			continue // whole ratios are enough to compare with plan
		}
		code, pout, perr := runPanto(append([]string{"plan", "--json", "--ratio", fmt.Sprint(c.Ratio)}, args...)...)
		if code != exitOK {
			t.Fatalf("plan at %v:1: exit %d: %s", c.Ratio, code, perr)
		}
		var p struct{ Plate plateJSON }
		if err := json.Unmarshal([]byte(pout), &p); err != nil {
			t.Fatal(err)
		}
		if p.Plate.Size != c.PlateSize || p.Plate.FitsBed != c.FitsBed || p.Plate.Tiles != c.Tiles {
			t.Errorf("%v:1: plan says plate %+v, ratios said %v fits %v in %d", c.Ratio, p.Plate, c.PlateSize, c.FitsBed, c.Tiles)
		}
		if !c.FitsBed && (p.Plate.LargestOnePiece == nil || *p.Plate.LargestOnePiece != *got.LargestOnePiece) {
			t.Errorf("%v:1: plan's largest one-piece ratio %v, ratios said %v", c.Ratio, p.Plate.LargestOnePiece, *got.LargestOnePiece)
		}
	}
	if got.LargestOnePiece == nil || *got.LargestOnePiece != want {
		t.Errorf("largest one piece: got %v, want %v", got.LargestOnePiece, want)
	}
	code, text, _ := runPanto(append([]string{"ratios"}, args...)...)
	if code != exitOK || !strings.Contains(text, fmt.Sprintf("largest ratio that prints in one piece and fits the copy table: %g:1", want)) {
		t.Errorf("ratios text:\n%s", text)
	}
	if code, _, errOut := runPanto(append([]string{"ratios", "--ratio", "5"}, args...)...); code != exitUsage || !strings.Contains(errOut, "leave out --ratio") {
		t.Errorf("ratios --ratio: exit %d %s", code, errOut)
	}
}
