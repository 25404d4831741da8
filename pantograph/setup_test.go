package pantograph

import (
	"strings"
	"testing"

	"panto/geom"
)

func TestSetupValidate(t *testing.T) {
	ok := Setup{Ratio: 10, Cutter: 0.5}
	tests := []struct {
		name string
		edit func(*Setup)
		frag string // "" when valid
	}{
		{"plain", func(*Setup) {}, ""},
		{"stylus and tip", func(s *Setup) { s.Stylus, s.Tip = 4, TipPointed }, ""},
		{"ratio 0", func(s *Setup) { s.Ratio = 0 }, "ratio must be"},
		{"ratio below 1", func(s *Setup) { s.Ratio = 0.5 }, "smaller than the part"},
		{"cutter missing", func(s *Setup) { s.Cutter = 0 }, "cutter diameter"},
		{"negative stylus", func(s *Setup) { s.Stylus = -1 }, "stylus diameter"},
		{"odd tip", func(s *Setup) { s.Tip = "ball" }, "stylus tip"},
		{"bad kind cutter", func(s *Setup) { s.Cutters = map[Kind]float64{KindGroove: -0.1} }, "cutter for groove"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			s := ok
			tc.edit(&s)
			err := s.Validate()
			switch {
			case tc.frag == "" && err != nil:
				t.Fatalf("got %v, want no error", err)
			case tc.frag != "" && (err == nil || !strings.Contains(err.Error(), tc.frag)):
				t.Fatalf("got %v, want an error containing %q", err, tc.frag)
			}
		})
	}
}

func TestSetupCompensation(t *testing.T) {
	tests := []struct {
		name                  string
		ratio, cutter, stylus float64
		tip                   Tip
		want                  float64
	}{
		// derived: δ = R·r_c − r_s.
		{"matched", 10, 0.5, 5, TipRound, 0},
		{"small stylus", 10, 0.5, 4, TipRound, 0.5},
		{"large stylus", 10, 0.5, 6, TipRound, -0.5},
		// derived: a pointed stylus traces with radius 0, so δ = R·r_c.
		{"pointed", 10, 0.5, 4, TipPointed, 2.5},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			s := Setup{Ratio: tc.ratio, Cutter: tc.cutter, Tip: tc.tip}
			if got := s.Compensation(tc.cutter, tc.stylus); !near(got, tc.want, 1e-12) {
				t.Fatalf("got %v, want %v", got, tc.want)
			}
		})
	}
}

func TestSetupTransform(t *testing.T) {
	// Part point (3, 1), datum (1, 0), R = 10; derived by hand: translate → (2, 1); mirror
	// (x → −x) → (−2, 1); turn 180° → (2, −1); scale → (20, −10).
	tests := []struct {
		name   string
		mirror bool
		turn   float64
		want   geom.Vec
	}{
		{"plain", false, 0, geom.V(20, 10)},
		{"mirror", true, 0, geom.V(-20, 10)},
		{"turn 180", false, 180, geom.V(-20, -10)},
		{"turn 90", false, 90, geom.V(-10, 20)},
		{"mirror and turn 180", true, 180, geom.V(20, -10)},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			s := Setup{Ratio: 10, Cutter: 0.5, Mirror: tc.mirror, Rotate: geom.Degrees(tc.turn)}
			got := s.Transform(geom.V(1, 0)).Apply(geom.V(3, 1))
			if got.Dist(tc.want) > 1e-12 {
				t.Fatalf("got %v, want %v", got, tc.want)
			}
		})
	}
}

// near reports whether a and b differ by at most tol.
func near(a, b, tol float64) bool { return a-b <= tol && b-a <= tol }
