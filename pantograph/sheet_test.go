package pantograph

import (
	"math"
	"strings"
	"testing"

	"panto/geom"
)

// sheetPlan is a hand-made plan at 10:1: the datum, two drilled holes of one feature whose
// seats go right then back left (a reversal on copy X), and a pocket traced from (−20, 30), to
// the left of the datum, so the X dials need datum turns.
func sheetPlan() Plan {
	sq := geom.Polygon(geom.V(-20, 30), geom.V(0, 30), geom.V(0, 50), geom.V(-20, 50))
	return Plan{
		Part: "test plate", Stock: Stock{Material: "brass", Thickness: 1.2}, Setup: Setup{Ratio: 10},
		Features: []PlannedFeature{
			{Name: "pins", Kind: KindHoles, Number: 1, Method: Drilled, Drill: 0.6, Stylus: 3, Tip: TipPointed,
				Depth: Depth{Through: true}, Seats: []geom.Vec{geom.V(60, 20), geom.V(40, 20)}},
			{Name: "recess", Kind: KindPocket, Number: 2, Method: Traced, Cutter: 0.5, Stylus: 5, Tip: TipRound,
				Depth: Depth{MM: 0.3}, TemplateRegions: []geom.Region{geom.NewRegion(sq)}},
		},
		Steps: []Step{
			{What: StepDatum, Feature: -1},
			{What: StepDrill, Feature: 0, Drill: 0.6, Seats: []geom.Vec{geom.V(60, 20), geom.V(40, 20)}},
			{What: StepMill, Feature: 1},
		},
	}
}

// buildSheet builds the sheet of p on m, failing the test on an error.
func buildSheet(t *testing.T, p Plan, m Machine, o SheetOptions) Sheet {
	t.Helper()
	s, err := BuildSheet(p, m, o)
	if err != nil {
		t.Fatal(err)
	}
	return s
}

func sheetMachine() Machine {
	metric := Dial{Pitch: 2, Divisions: 100, Units: MM, Backlash: 0.05} // 0.02 mm/div
	return Machine{Name: "bench", Dials: Dials{CopyX: metric, CopyY: metric, WorkX: Dial{Pitch: 1, Divisions: 50},
		WorkY: Dial{Pitch: 1, Divisions: 50}, Depth: Dial{Pitch: 1, Divisions: 100}},
		Spindle: Spindle{MaxRPM: 15000}, Drills: []Drill{{Diameter: 0.6, Material: "carbide"}}}
}

func TestBuildSheetRows(t *testing.T) {
	s := buildSheet(t, sheetPlan(), sheetMachine(), SheetOptions{Date: "2026-12-01"})
	if len(s.Rows) != 6 {
		t.Fatalf("got %d rows, want 6 (datum, tool change, 2 holes, tool change, pocket)", len(s.Rows))
	}
	for _, i := range []int{1, 4} {
		if s.Rows[i].What != StepToolChange || s.Rows[i].Where != nil || s.Rows[i].RPM == 0 || len(s.Rows[i].Rules) != 1 {
			t.Errorf("row %d: got %+v, want a tool change with its speed and one depth rule", i, s.Rows[i])
		}
	}
	// The pocket starts at template X = −20 and may be wound back 0.5 mm (a quarter turn) below
	// that: derived DatumTurns = ⌈20.5/2⌉ = 11, so the datum reads 11 t 0 div and the pocket's
	// start 1 t 0 div. Copy Y: the datum's own wind-back, 0.5 mm below 0: 1 turn.
	// The work table moves the stock under the cutter, so its moves are the points on the stock
	// with the sign turned: holes at (6, 2) and (4, 2) part mm are moves of (−6, −2) and
	// (−4, −2), the pocket's start (−2, 3) a move of (+2, −3). Work X (1 mm screw, wind-back
	// 13 div = 0.26 mm): −6 − 0.26 needs 7 turns; work Y: −3 − 0.26 needs 4 (derived).
	for i, want := range []int{11, 1, 7, 4} {
		if d := s.Dials.List()[i]; d.DatumTurns != want {
			t.Errorf("%s datum turns: got %v, want %v", d.Name, d.DatumTurns, want)
		}
	}
	tests := []struct {
		row        int
		copyX      string
		copyY      string
		workX      string
		backOff    int
		passes     int
		feature    string
		firstDepth float64
	}{
		// derived: 22 + 60 = 82 mm = 41 t; Y 2 + 20 = 22 mm = 11 t; work X 7 − 6 = 1 t, down from
		// the datum's 7 t and work Y down from 4 t to 2 t: a wind-back on each work dial.
		// Pecks (derived): 0.3, then every 0.15 to 1.35 (8), then the full 1.43024 (through 1.2
		// + point 0.18 + 0.05): 9.
		{2, "41 t 0 div", "11 t 0 div", "1 t 0 div", 2, 9, "pins", 0.3},
		// derived: 22 + 40 = 62 mm = 31 t, behind 82: a reversal on copy X; work X 7 − 4 = 3 t,
		// coming up.
		{3, "31 t 0 div", "11 t 0 div", "3 t 0 div", 1, 0, "pins", 0},
		// derived: 22 − 20 = 2 mm = 1 t, behind the hole; 2 + 30 = 32 mm = 16 t; work X 7 + 2 =
		// 9 t, coming up; work Y 4 − 3 = 1 t, behind 2 t: two reversals.
		{5, "1 t 0 div", "16 t 0 div", "9 t 0 div", 2, 3, "recess", 0.1},
	}
	for _, tc := range tests {
		r := s.Rows[tc.row]
		t.Run(r.Action, func(t *testing.T) {
			w := r.Where
			if got := w.CopyX.String(); got != tc.copyX {
				t.Errorf("copy X: got %v, want %v", got, tc.copyX)
			}
			if got := w.CopyY.String(); got != tc.copyY {
				t.Errorf("copy Y: got %v, want %v", got, tc.copyY)
			}
			if got := w.WorkX.String(); got != tc.workX {
				t.Errorf("work X: got %v, want %v", got, tc.workX)
			}
			if len(w.BackOff) != tc.backOff {
				t.Errorf("back-offs: got %v, want %d", w.BackOff, tc.backOff)
			}
			if len(r.Passes) != tc.passes || r.Feature != tc.feature {
				t.Errorf("got %d passes for %q, want %d for %q", len(r.Passes), r.Feature, tc.passes, tc.feature)
			}
			if tc.passes > 0 && math.Abs(r.Passes[0].Depth-tc.firstDepth) > 1e-9 {
				t.Errorf("first pass: got %v, want %v", r.Passes[0].Depth, tc.firstDepth)
			}
		})
	}
}

func TestBuildSheetSpeedsAndDepth(t *testing.T) {
	s := buildSheet(t, sheetPlan(), sheetMachine(), SheetOptions{})
	change, hole := s.Rows[1], s.Rows[2]
	// carbide drill in brass: 61 × 2 = 122 m/min; at 0.6 mm that is 64 723 rpm (derived), capped.
	if change.RPM != 15000 || !strings.Contains(change.SpeedNote, "capped") {
		t.Errorf("drill speed: got %v (%q), want 15000 capped", change.RPM, change.SpeedNote)
	}
	// derived: 1 µm/rev × 15000 rpm = 15 mm/min.
	if math.Abs(change.Feed-15) > 1e-9 {
		t.Errorf("drill feed: got %v, want 15", change.Feed)
	}
	if hole.RPM != 0 || hole.FeedRule != "" {
		t.Errorf("the hole row repeats the tool's speed and feed: %+v", hole)
	}
	// derived: through 1.2 + 0.3004·0.6 + 0.05 = 1.43024 mm, taken to the next whole division
	// of the 0.01 mm depth dial: 1.44 mm, 1 t 44 div.
	last := hole.Passes[len(hole.Passes)-1]
	if math.Abs(last.Depth-1.44) > 1e-9 || last.Reading.String() != "1 t 44 div" {
		t.Errorf("last peck: got %v at %v, want 1.44 at 1 t 44 div", last.Depth, last.Reading)
	}
	for _, p := range hole.Passes {
		if p.Reading.Remainder != 0 {
			t.Errorf("peck at %v is between divisions: %v", p.Depth, p.Reading)
		}
	}
	if len(s.Cautions) == 0 || len(s.Notes) == 0 {
		t.Errorf("the sheet has no cautions or notes")
	}
}

func TestBuildSheetNoDials(t *testing.T) {
	s := buildSheet(t, sheetPlan(), Machine{}, SheetOptions{})
	for _, d := range s.Dials.List() {
		if d.Stated {
			t.Errorf("dial %s stated without a machine", d.Name)
		}
	}
	// positions are still there in mm: the second hole is 40 mm on the template, 4 at the part
	if w := s.Rows[3].Where; w.Template.X != 40 || math.Abs(w.Part.X-4) > 1e-12 {
		t.Errorf("got %v / %v, want 40 / 4", w.Template.X, w.Part.X)
	}
}
