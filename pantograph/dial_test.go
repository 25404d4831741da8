package pantograph

import (
	"math"
	"testing"
)

func TestDialRead(t *testing.T) {
	metric2 := Dial{Pitch: 2, Divisions: 100, Units: MM}  // 0.02 mm/div, common practice
	inch := Dial{Pitch: 0.1, Divisions: 100, Units: Inch} // 10 TPI, 0.001 in/div, common practice
	metric1 := Dial{Pitch: 1, Divisions: 50, Units: MM}   // 0.02 mm/div
	rev := Dial{Pitch: 2, Divisions: 100, Reversed: true} // counts up toward −X
	tests := []struct {
		name       string
		d          Dial
		mm, scale  float64
		turns, div int
		rem, part  float64
	}{
		// derived: part 1.234 mm × 10 = 12.34 mm at the copy table; 12.34 / 2 = 6 turns + 0.34 mm
		// = 17 divisions of 0.02 mm, nothing left over.
		{"2mm/100 at 10:1", metric2, 12.34, 10, 6, 17, 0, 0},
		// derived: 0.2345 in = 2 turns (0.2) + 34 div (0.034) + 0.5 div (0.0005 in = 0.0127 mm
		// on the template, 0.00127 mm at the part at 10:1).
		{"0.100 in/100 at 10:1", inch, 0.2345 * 25.4, 10, 2, 34, 0.5, 0.00127},
		// derived: 0.5 in exactly = 5 turns.
		{"0.100 in/100 whole turns", inch, 12.7, 10, 5, 0, 0, 0},
		// derived: 3.37 mm = 3 turns + 0.37 mm = 18 div (0.36) + 0.5 div worth 0.01 mm at 1:1.
		{"1mm/50 work table", metric1, 3.37, 1, 3, 18, 0.5, 0.01},
		// derived: −1.5 mm on a 2 mm screw = −1 turn + 25 div (−2 + 0.5).
		{"negative", metric2, -1.5, 1, -1, 25, 0, 0},
		// derived: a reversed dial reads +3 mm for a move to −3 mm: 1 turn 50 div.
		{"reversed", rev, -3, 1, 1, 50, 0, 0},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			r := tc.d.Read(tc.d.Count(tc.mm), tc.scale)
			if r.Turns != tc.turns || r.Divisions != tc.div {
				t.Errorf("got %d t %d div, want %d t %d div", r.Turns, r.Divisions, tc.turns, tc.div)
			}
			if math.Abs(r.Remainder-tc.rem) > 1e-9 {
				t.Errorf("remainder: got %v, want %v", r.Remainder, tc.rem)
			}
			if math.Abs(r.AtPart-tc.part) > 1e-9 {
				t.Errorf("worth at the part: got %v, want %v", r.AtPart, tc.part)
			}
		})
	}
}

func TestReadingString(t *testing.T) {
	tests := []struct {
		r    Reading
		want string
	}{
		{Reading{Turns: 6, Divisions: 17}, "6 t 17 div"},
		{Reading{Turns: 2, Divisions: 34, Remainder: 0.5}, "2 t 34 div +0.50 div"},
		{Reading{Turns: 0, Divisions: 3, Remainder: 0.004}, "0 t 3 div"}, // below what is printed
	}
	for _, tc := range tests {
		t.Run(tc.want, func(t *testing.T) {
			if got := tc.r.String(); got != tc.want {
				t.Errorf("got %q, want %q", got, tc.want)
			}
		})
	}
}

func TestDatumTurns(t *testing.T) {
	d := Dial{Pitch: 2, Divisions: 100}
	tests := []struct {
		name   string
		counts []float64
		want   int
	}{
		{"all positive", []float64{0, 3, 7}, 0},
		{"2.5 behind needs 2 turns", []float64{-2.5, 4}, 2}, // derived: ⌈2.5/2⌉
		{"exactly 2 behind needs 1", []float64{-2}, 1},      // derived: reads 0 at −2
		{"just past a turn", []float64{-2.02}, 2},           // derived
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got := d.DatumTurns(tc.counts)
			if got != tc.want {
				t.Errorf("got %v, want %v", got, tc.want)
			}
			for _, c := range tc.counts {
				if r := d.Read(c+float64(got)*d.Pitch, 1); r.Turns < 0 {
					t.Errorf("count %v still reads negative: %v", c, r)
				}
			}
		})
	}
}

func TestBackOff(t *testing.T) {
	tests := []struct {
		name string
		d    Dial
		want float64
	}{
		// derived: a quarter turn of 2 mm is 0.5 mm = 25 div; backlash 0.05 is less.
		{"quarter turn", Dial{Pitch: 2, Divisions: 100, Backlash: 0.05}, 0.5},
		// derived: backlash 0.7 mm = 35 div, so 36 div = 0.72 mm, more than the backlash.
		{"large backlash", Dial{Pitch: 2, Divisions: 100, Backlash: 0.7}, 0.72},
		// derived: 50 div × ¼ = 12.5 → 13 div of 0.02 mm = 0.26 mm.
		{"odd quarter", Dial{Pitch: 1, Divisions: 50}, 0.26},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got := tc.d.BackOff(); math.Abs(got-tc.want) > 1e-12 {
				t.Errorf("got %v, want %v", got, tc.want)
			}
		})
	}
}

// TestApproachReversal walks a route that goes out, comes back, and goes out again: only the
// move that comes back is a reversal, and it winds back a quarter turn below its target.
func TestApproachReversal(t *testing.T) {
	d := Dial{Pitch: 2, Divisions: 100, Backlash: 0.05}
	got := d.approach(0, []float64{5, 3, 8, 8, 1, 0.51})
	want := []Move{ // derived: back-off 0.5 mm (quarter turn), see TestBackOff
		{Target: 5},
		{Target: 3, Reversal: true, BackTo: 2.5},
		{Target: 8},
		{Target: 8},
		{Target: 1, Reversal: true, BackTo: 0.5},
		// derived: 0.51 − 0.5 = 0.01, half a division, taken down to the whole division 0
		{Target: 0.51, Reversal: true, BackTo: 0},
	}
	if len(got) != len(want) {
		t.Fatalf("got %d moves, want %d", len(got), len(want))
	}
	for i := range want {
		g, w := got[i], want[i]
		if g.Reversal != w.Reversal || math.Abs(g.Target-w.Target) > 1e-12 || math.Abs(g.BackTo-w.BackTo) > 1e-12 {
			t.Errorf("move %d: got %+v, want %+v", i, g, w)
		}
	}
}
