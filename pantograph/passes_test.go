package pantograph

import (
	"math"
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

func TestPasses(t *testing.T) {
	tests := []struct {
		name        string
		total, step float64
		want        []float64
	}{
		{"even", 1.2, 0.4, []float64{0.4, 0.8, 1.2}},                   // derived
		{"uneven evens out", 1.0, 0.4, []float64{1.0 / 3, 2.0 / 3, 1}}, // derived: ⌈2.5⌉ = 3 equal
		{"one pass", 0.3, 0.5, []float64{0.3}},                         // derived
		{"nothing", 0, 0.5, nil},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) { approxSlice(t, Passes(tc.total, tc.step), tc.want, 1e-12) })
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
		t.Run(tc.name, func(t *testing.T) { approxSlice(t, pecks(tc.total, tc.d), tc.want, 1e-12) })
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
		{"brass 2 mm", ToolMill, 2, "brass", 1},                // 0.5 D (from memory)
		{"brass 0.5 mm", ToolMill, 0.5, "clock brass", 0.125},  // 0.25 D: halved under 1 mm
		{"mild steel 2 mm", ToolMill, 2, "mild steel", 0.5},    // 0.25 D
		{"tool steel 0.2", ToolMill, 0.2, "gauge plate", 0.01}, // 0.05·0.2 = 0.01, at the floor
		{"engraver", ToolEngrave, 0.3, "brass", 0.05},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			r := millPassRule(tc.kind, tc.d, tc.material)
			if math.Abs(r.StepDown-tc.want) > 1e-12 || r.Rule == "" {
				t.Errorf("got %v (%q), want %v", r.StepDown, r.Rule, tc.want)
			}
		})
	}
}
