package pantograph

import (
	"math"
	"math/rand"
	"strings"
	"testing"
)

func approxSlice(t *testing.T, got, want []float64, tol float64) {
	t.Helper()
	if len(got) != len(want) {
		t.Fatalf("got %v, want %v", got, want)
	}
	for i := range want {
		if math.Abs(got[i]-want[i]) > tol {
			t.Fatalf("got %v, want %v", got, want)
		}
	}
}

func TestPassDepths(t *testing.T) {
	tests := []struct {
		name           string
		total, step, q float64
		want           []float64
	}{
		{"even, no dial", 1.2, 0.4, 0, []float64{0.4, 0.8, 1.2}},                   // derived
		{"uneven evens out, no dial", 1.0, 0.4, 0, []float64{1.0 / 3, 2.0 / 3, 1}}, // derived: ⌈2.5⌉ = 3 equal
		{"one pass", 0.3, 0.5, 0, []float64{0.3}},                                  // derived
		{"nothing", 0, 0.5, 0, nil},
		// derived: a 0.075 mm rule on a 0.02 mm dial allows 3 divisions (0.06) a pass; 1.26 mm
		// is 63 divisions, 21 passes of exactly 3.
		{"rule between divisions", 1.26, 0.075, 0.02, stepsOf(0.06, 21)},
		// derived: 0.15 allows 7 divisions; 20 divisions take ⌈20/7⌉ = 3 passes, ending at
		// ⌈6.67⌉ = 7, ⌈13.3⌉ = 14 and 20 divisions: 0.14, 0.28, 0.40.
		{"deeper passes first", 0.4, 0.15, 0.02, []float64{0.14, 0.28, 0.4}},
		// derived: a blind 0.41 (20.5 divisions) in passes of at most 7: ends at 7, 14 and the
		// depth itself, the last 6.5 divisions.
		{"blind depth between divisions", 0.41, 0.15, 0.02, []float64{0.14, 0.28, 0.41}},
		// derived: a dial coarser than the rule: one division (0.02) a pass is the least it sets.
		{"dial coarser than the rule", 0.05, 0.01, 0.02, []float64{0.02, 0.04, 0.05}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) { approxSlice(t, passDepths(tc.total, tc.step, tc.q), tc.want, 1e-12) })
	}
}

// stepsOf returns n depths step apart, the first at step.
func stepsOf(step float64, n int) []float64 {
	out := make([]float64, n)
	for i := range out {
		out[i] = step * float64(i+1)
	}
	return out
}

// TestPassDepthsProperty checks the rule on random depths, steps and dials: every pass but a
// blind last one ends on a whole division, no pass is deeper than the rule (or one division,
// where the dial is coarser), the passes go deeper each time, end at the total, and are no
// more than the rule needs: ⌈total / (q·⌊step/q⌋)⌉ (derived).
func TestPassDepthsProperty(t *testing.T) {
	seed := int64(7)
	rng := rand.New(rand.NewSource(seed))
	for i := 0; i < 2000; i++ {
		q := []float64{0.01, 0.02, 0.0254, 0.00254}[rng.Intn(4)]
		total, step := 0.01+rng.Float64()*3, 0.005+rng.Float64()*0.5
		if rng.Intn(2) == 0 {
			total = math.Ceil(total/q) * q // a through cut, taken to a whole division
		}
		ps := passDepths(total, step, q)
		most := math.Max(1, math.Floor(step/q+1e-6)) * q
		if want := int(math.Ceil(total/most - 1e-6)); len(ps) != want || ps[len(ps)-1] != total {
			t.Fatalf("seed %d case %d: %v for %v by %v on %v: want %d passes ending at the total", seed, i, ps, total, step, q, want)
		}
		prev := 0.0
		for k, p := range ps {
			if p-prev > most+1e-9 || p <= prev {
				t.Fatalf("seed %d case %d: pass %d of %v goes %v deeper, rule %v", seed, i, k, ps, p-prev, most)
			}
			if k < len(ps)-1 && math.Abs(p/q-math.Round(p/q)) > 1e-6 {
				t.Fatalf("seed %d case %d: pass %d at %v is not on a division of %v", seed, i, k, p, q)
			}
			prev = p
		}
	}
}

func TestPecks(t *testing.T) {
	tests := []struct {
		name     string
		total, d float64
		want     []float64
	}{
		// micro drill 0.6: first 0.3 (0.5 D), then 0.15 (0.25 D) — low ends of the tech-tip ranges
		{"micro", 0.9, 0.6, []float64{0.3, 0.45, 0.6, 0.75, 0.9}},
		// ordinary 1.6: 2 D = 3.2 per peck, so 2 mm stock is one peck (derived)
		{"ordinary shallow", 2, 1.6, []float64{2}},
		{"ordinary deep", 7, 1.6, []float64{3.2, 6.4, 7}}, // derived
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) { approxSlice(t, pecks(tc.total, tc.d, 0), tc.want, 1e-12) })
	}
}

func TestTotalDepth(t *testing.T) {
	tests := []struct {
		name string
		dep  Depth
		kind ToolKind
		d    float64
		want float64
	}{
		{"blind", Depth{MM: 0.4}, ToolMill, 2, 0.4},
		{"through mill", Depth{Through: true}, ToolMill, 2, 1.25}, // 1.2 stock + 0.05 allowance
		// derived: point of a 118° drill (0.5/tan 59°)·1 = 0.3004 mm, + 0.05 + 1.2 stock
		{"through drill", Depth{Through: true}, ToolDrill, 1, 1.2 + 0.5/math.Tan(59*math.Pi/180) + 0.05},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got := totalDepth(tc.dep, 1.2, tc.kind, tc.d); math.Abs(got-tc.want) > 1e-4 {
				t.Errorf("got %v, want %v", got, tc.want)
			}
		})
	}
}

func TestMillPassRule(t *testing.T) {
	tests := []struct {
		name     string
		kind     ToolKind
		d        float64
		material string
		want     float64
	}{
		{"brass 2 mm", ToolMill, 2, "brass", 1},                // 0.5 D (rule of thumb, from memory)
		{"brass 0.5 mm", ToolMill, 0.5, "clock brass", 0.125},  // 0.25 D: halved under 1 mm
		{"mild steel 2 mm", ToolMill, 2, "mild steel", 0.5},    // 0.25 D
		{"tool steel 0.2", ToolMill, 0.2, "gauge plate", 0.01}, // 0.05·0.2 = 0.01, at the floor
		{"engraver", ToolEngrave, 0.3, "brass", 0.05},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			mat, err := DefaultMaterials().Resolve(tc.material)
			if err != nil {
				t.Fatal(err)
			}
			r := millPassRule(tc.kind, tc.d, mat, MM)
			if math.Abs(r.StepDown-tc.want) > 1e-12 || !strings.Contains(r.Rule, "at most "+MM.Length(tc.want)) {
				t.Errorf("got %v (%q), want %v", r.StepDown, r.Rule, tc.want)
			}
		})
	}
}
