package pantograph

import (
	"fmt"
	"math"
	"math/rand/v2"
	"strings"
	"testing"
)

func TestStylusArithmetic(t *testing.T) {
	tests := []struct {
		name      string
		got, want float64
	}{
		// derived: d_s = R·d_c (REFERENCES.md, matched stylus)
		{"stylus for 0.3 at 10:1", MatchedStylus(10, 0.3), 3.0},
		{"stylus for 0.5 at 10:1", MatchedStylus(10, 0.5), 5.0},
		{"stylus for 1/64 in at 8:1", MatchedStylus(8, 0.015625), 0.125},
		// derived: d_c = d_s / R
		{"cutter for 5 at 10:1", MatchedCutter(10, 5), 0.5},
		{"cutter for 4 at 2.5:1", MatchedCutter(2.5, 4), 1.6},
		// derived: δ = R·r_c − r_s; R = 10, d_c = 0.5, d_s = 4.0 → 2.5 − 2.0 (REFERENCES.md)
		{"δ for the reference case", Compensation(10, 0.5, 4.0), 0.5},
		{"δ matched", Compensation(10, 0.5, 5.0), 0},
		{"δ stylus too big", Compensation(10, 0.3, 4.0), -0.5},                 // derived: 1.5 − 2.0
		{"δ pointed stylus", Compensation(10, 0.5, 0), 2.5},                    // derived: r_s = 0
		{"δ at 2:1", Compensation(2, 1.0, 1.5), 0.25},                          // derived: 1.0 − 0.75
		{"δ of the issue's example", Compensation(10, 0.5, 4.3), 0.35},         // derived: 2.5 − 2.15
		{"19.0 mm template hole", 10*2.0 - 2*Compensation(10, 0.5, 4.0), 19.0}, // REFERENCES.md: 2 mm hole
		{"21.0 mm template boss", 10*2.0 + 2*Compensation(10, 0.5, 4.0), 21.0}, // REFERENCES.md: 2 mm boss
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if math.Abs(tc.got-tc.want) > 1e-12 {
				t.Errorf("got %v, want %v", tc.got, tc.want)
			}
		})
	}
}

// TestStylusRoundTrip checks, over seeded random ratios and cutters, that the matched stylus
// needs no compensation and that the matched cutter of the matched stylus is the cutter.
func TestStylusRoundTrip(t *testing.T) {
	const seed = 20261201
	rng := rand.New(rand.NewPCG(seed, 0))
	for i := 0; i < 1000; i++ {
		ratio, cutter := 1+rng.Float64()*49, 0.05+rng.Float64()*3
		s := MatchedStylus(ratio, cutter)
		if d := Compensation(ratio, cutter, s); math.Abs(d) > 1e-12 {
			t.Fatalf("seed %d, case %d: R %v, cutter %v: matched δ got %v, want 0", seed, i, ratio, cutter, d)
		}
		if c := MatchedCutter(ratio, s); math.Abs(c-cutter) > 1e-12 {
			t.Fatalf("seed %d, case %d: got cutter %v, want %v", seed, i, c, cutter)
		}
	}
}

func TestChooseStylus(t *testing.T) {
	set := Machine{Styli: []Stylus{
		{Name: "a3", Diameter: 3, Tip: TipRound},
		{Name: "a4", Diameter: 4, Tip: TipRound},
		{Name: "b4", Diameter: 4, Tip: TipRound},
		{Name: "point", Diameter: 3, Tip: TipPointed},
		{Name: "a5", Diameter: 5, Tip: TipRound},
	}}
	tests := []struct {
		name          string
		m             Machine
		ratio, cutter float64
		want          string
		delta         float64
		dir           Direction
	}{
		// derived: R·d_c = 3.0, the 3 mm stylus matches
		{"exact match", set, 10, 0.3, "a3", 0, DirectionNone},
		// derived: 10 × 0.35 = 3.5 is as near 3 as 4: the larger wins, δ = 1.75 − 2
		{"tie goes to the larger", set, 10, 0.35, "a4", -0.25, DirectionShrink},
		// derived: 3 × 0.7 = 2.1 is as near 2.0 as 2.2, though in floating point it comes out
		// 2.0999999999999996; the tie still goes to the larger, δ = 1.05 − 1.1
		{"tie through rounding", Machine{Styli: []Stylus{{Name: "2.0", Diameter: 2, Tip: TipRound},
			{Name: "2.2", Diameter: 2.2, Tip: TipRound}}}, 3, 0.7, "2.2", -0.05, DirectionShrink},
		// derived: 4.3 is nearest 4; two 4 mm styli, the first listed wins; δ = 2.15 − 2
		{"equal styli, first listed", set, 10, 0.43, "a4", 0.15, DirectionGrow},
		// derived: R·d_c = 0.2 is nearest the point's 0, not the 3 mm round
		{"pointed for a tiny cutter", set, 2, 0.1, "point", 0.1, DirectionGrow},
		// derived: 8 × 1 = 8 is beyond the largest; δ = 4 − 2.5
		{"beyond the set", set, 8, 1, "a5", 1.5, DirectionGrow},
		// derived: one stylus is always the nearest
		{"only one", Machine{Styli: []Stylus{{Name: "x", Diameter: 2, Tip: TipRound}}}, 10, 0.5, "x", 1.5, DirectionGrow},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			c, ok := ChooseStylus(tc.m, tc.ratio, tc.cutter, "")
			if !ok {
				t.Fatal("got no choice")
			}
			if c.Stylus.Name != tc.want || math.Abs(c.Compensation-tc.delta) > 1e-12 || c.Direction != tc.dir {
				t.Errorf("got %s δ %v (%s), want %s δ %v (%s)", c.Stylus.Name, c.Compensation, c.Direction, tc.want, tc.delta, tc.dir)
			}
			if c.Stylus != tc.m.Styli[c.Index] {
				t.Errorf("index %d is %+v, not the chosen %+v", c.Index, tc.m.Styli[c.Index], c.Stylus)
			}
			if math.Abs(c.Matched-tc.ratio*tc.cutter) > 1e-12 {
				t.Errorf("matched: got %v, want %v", c.Matched, tc.ratio*tc.cutter)
			}
		})
	}
}

func TestChooseStylusNone(t *testing.T) {
	one := Machine{Styli: []Stylus{{Diameter: 2, Tip: TipRound}}}
	tests := []struct {
		name          string
		m             Machine
		ratio, cutter float64
	}{
		{"no styli", Machine{}, 10, 0.5},
		{"zero ratio", one, 0, 0.5},
		{"negative cutter", one, 10, -0.5},
		{"NaN cutter", one, 10, math.NaN()},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if c, ok := ChooseStylus(tc.m, tc.ratio, tc.cutter, ""); ok {
				t.Errorf("got %+v, want no choice", c)
			}
		})
	}
}

// TestChooseStylusNearest checks, over seeded random sets, that no listed stylus is nearer
// the matched size than the one chosen.
func TestChooseStylusNearest(t *testing.T) {
	const seed = 7
	rng := rand.New(rand.NewPCG(seed, 0))
	for i := 0; i < 500; i++ {
		var m Machine
		for range 1 + rng.IntN(8) {
			m.Styli = append(m.Styli, Stylus{Diameter: 0.5 + float64(rng.IntN(20))/4, Tip: TipRound})
		}
		ratio, cutter := 2+float64(rng.IntN(9)), 0.1+float64(rng.IntN(10))/10
		c, _ := ChooseStylus(m, ratio, cutter, "")
		for _, s := range m.Styli {
			if math.Abs(s.Diameter-c.Matched) < math.Abs(c.Stylus.Diameter-c.Matched)-tieTol {
				t.Fatalf("seed %d, case %d: chose %v for %v but %v is nearer", seed, i, c.Stylus.Diameter, c.Matched, s.Diameter)
			}
		}
	}
}

func ExampleChooseStylus() {
	m := Machine{Styli: []Stylus{
		{Name: "3 mm", Diameter: 3, Tip: TipRound},
		{Name: "4 mm", Diameter: 4, Tip: TipRound},
	}}
	c, _ := ChooseStylus(m, 10, 0.43, "") // a 0.43 mm cutter at 10:1 wants a 4.3 mm stylus
	fmt.Printf("%s stylus, δ = %+.3f mm: %s\n", c.Stylus.Name, c.Compensation, c.Direction)
	// Output: 4 mm stylus, δ = +0.150 mm: the template's outline grows and its openings shrink
}

func TestDirectionOf(t *testing.T) {
	tests := []struct {
		delta float64
		want  Direction
	}{
		{0, DirectionNone},
		{Compensation(3, 0.7, 2.1), DirectionNone}, // derived: 0 but for float rounding (2.0999999999999996)
		{0.0004, DirectionNone},                    // prints as 0.000 mm: not called a change
		{-0.0004, DirectionNone},
		{0.0006, DirectionGrow}, // prints as 0.001 mm
		{0.35, DirectionGrow},
		{-0.0006, DirectionShrink},
		{-0.5, DirectionShrink},
	}
	for _, tc := range tests {
		if got := DirectionOf(tc.delta); got != tc.want {
			t.Errorf("δ %v: got %q, want %q", tc.delta, got, tc.want)
		}
	}
}

func TestDirectionWords(t *testing.T) {
	tests := []struct {
		d          Direction
		word, text string
	}{
		{DirectionNone, "none", "none: the stylus matches"},
		{DirectionGrow, "grow", "outline grows and its openings shrink"},
		{DirectionShrink, "shrink", "outline shrinks and its openings grow"},
	}
	for _, tc := range tests {
		if got := tc.d.Word(); got != tc.word {
			t.Errorf("%d.Word() = %q, want %q", tc.d, got, tc.word)
		}
		if got := tc.d.String(); !strings.Contains(got, tc.text) {
			t.Errorf("%d.String() = %q, want it to say %q", tc.d, got, tc.text)
		}
	}
}

// TestChooseStylusByTip: asked for a pointed stylus the machine's pointed one is chosen, even
// where a round one is nearer the matched size, and its δ is R·r_c (derived: 10 × 0.25 = 2.5);
// asked for a round one a pointed stylus is never chosen; asked for a tip the machine lacks,
// there is no choice.
func TestChooseStylusByTip(t *testing.T) {
	m := Machine{Styli: []Stylus{
		{Name: "a5", Diameter: 5, Tip: TipRound},
		{Name: "point", Diameter: 3, Tip: TipPointed},
		{Name: "plain", Diameter: 4}, // no tip stated: round
	}}
	if c, ok := ChooseStylus(m, 10, 0.5, TipPointed); !ok || c.Stylus.Name != "point" || math.Abs(c.Compensation-2.5) > 1e-12 {
		t.Errorf("pointed: got %+v %v, want the point with δ 2.5", c, ok)
	}
	if c, ok := ChooseStylus(m, 2, 0.1, TipRound); !ok || c.Stylus.Tip == TipPointed {
		t.Errorf("round: got %+v, want a round stylus", c)
	}
	if c, ok := ChooseStylus(m, 10, 0.4, TipRound); !ok || c.Stylus.Name != "plain" {
		t.Errorf("round, untipped: got %+v, want the 4 mm stylus whose tip the file leaves unsaid", c)
	}
	if _, ok := ChooseStylus(Machine{Styli: m.Styli[:1]}, 10, 0.5, TipPointed); ok {
		t.Errorf("a machine with no pointed stylus gave a pointed choice")
	}
}
