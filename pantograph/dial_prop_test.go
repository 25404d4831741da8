package pantograph

import (
	"math"
	"math/rand"
	"testing"
)

// TestReadProperty: over random screws and positions, turns, divisions and remainder add back up
// to the count, the divisions stay on the collar and the remainder inside a division.
func TestReadProperty(t *testing.T) {
	seed := int64(20261201)
	rng := rand.New(rand.NewSource(seed))
	pitches := []float64{0.05, 0.1, 1, 1.5, 2, 3}
	for i := 0; i < 2000; i++ {
		d := Dial{Pitch: pitches[rng.Intn(len(pitches))], Divisions: 20 + rng.Intn(181)}
		c := (rng.Float64() - 0.3) * 200
		r := d.Read(c, 1+rng.Float64()*19)
		back := float64(r.Turns)*d.Pitch + (float64(r.Divisions)+r.Remainder)*d.Division()
		if math.Abs(back-c) > 1e-9 || r.Divisions < 0 || r.Divisions >= d.Divisions || r.Remainder < 0 || r.Remainder >= 1 {
			t.Fatalf("seed %d, case %d: %+v reads %v as %+v (adds to %v)", seed, i, d, c, r, back)
		}
	}
}

// TestApproachProperty: over random routes, every reversal winds back at least the back-off
// below its target, on a whole division, and no move that goes up is marked a reversal.
func TestApproachProperty(t *testing.T) {
	seed := int64(7)
	rng := rand.New(rand.NewSource(seed))
	for i := 0; i < 200; i++ {
		d := Dial{Pitch: 2, Divisions: 100, Backlash: rng.Float64()}
		counts := make([]float64, 1+rng.Intn(20))
		for k := range counts {
			counts[k] = math.Round(rng.Float64()*100*50) / 50
		}
		at := 0.0
		for k, m := range d.approach(at, counts) {
			switch {
			case m.Reversal != (m.Target < at):
				t.Fatalf("seed %d, route %d, move %d: reversal %v from %v to %v", seed, i, k, m.Reversal, at, m.Target)
			case m.Reversal && m.Target-m.BackTo < d.BackOff()-1e-9:
				t.Fatalf("seed %d, route %d, move %d: winds back only %v", seed, i, k, m.Target-m.BackTo)
			case m.Reversal && m.Target-m.BackTo <= d.Backlash:
				t.Fatalf("seed %d, route %d, move %d: wind-back %v not more than the backlash %v", seed, i, k, m.Target-m.BackTo, d.Backlash)
			}
			at = m.Target
		}
	}
}

// TestPecksProperty: pecks go deeper each time, the first no deeper than its share of the drill,
// and the last at the full depth.
func TestPecksProperty(t *testing.T) {
	seed := int64(11)
	rng := rand.New(rand.NewSource(seed))
	for i := 0; i < 500; i++ {
		d, total := 0.1+rng.Float64()*3, 0.05+rng.Float64()*10
		ps := pecks(total, d, 0)
		first := peckShare * d
		if d < microTool {
			first = microFirstShare * d
		}
		if ps[0] > first+1e-12 || ps[len(ps)-1] != total {
			t.Fatalf("seed %d, case %d: pecks %v for %v deep with a %v drill", seed, i, ps, total, d)
		}
		for k := 1; k < len(ps); k++ {
			if ps[k] <= ps[k-1] {
				t.Fatalf("seed %d, case %d: pecks %v do not go deeper", seed, i, ps)
			}
		}
	}
}
