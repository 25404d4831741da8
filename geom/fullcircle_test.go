package geom

import (
	"errors"
	"math"
	"testing"
)

func TestIsFullCircle(t *testing.T) {
	o := V(0, 0)
	tests := []struct {
		name string
		s    Segment
		want bool
	}{
		{"circle", Circle(V(2, 3), 1)[0], true},
		{"clockwise circle", Circle(V(2, 3), 1)[0].Reverse(), true},
		// Derived: ArcFrom closes a sweep within fullTurnTol of a turn, so A == B.
		{"1e-13 rad short of a turn", ArcFrom(V(1, 0), o, 2*math.Pi-1e-13), true},
		{"1e-13 rad past a turn", ArcFrom(V(1, 0), o, 2*math.Pi+1e-13), true},
		{"1e-13 rad short, clockwise", ArcFrom(V(1, 0), o, -2*math.Pi+1e-13), true},
		// Derived: on radius 1 a gap of 1e-7 rad leaves the ends 1e-7 apart, over pointTol.
		{"1e-7 rad short of a turn", ArcFrom(V(1, 0), o, 2*math.Pi-1e-7), false},
		{"1e-7 rad past a turn", ArcFrom(V(1, 0), o, 2*math.Pi+1e-7), false},
		// Derived: on radius 1e-4 a gap of 1e-6 rad leaves the ends 1e-10 apart: closed.
		{"small circle 1e-6 rad short", ArcFrom(V(1e-4, 0), o, 2*math.Pi-1e-6), true},
		{"ends made one point, sweep short",
			Segment{A: V(1, 0), B: V(1, 0), Sweep: 2*math.Pi - 1e-7}, true},
		{"half circle", Arc(o, 1, 0, math.Pi), false},
		{"three quarters", Arc(o, 1, 0, 1.5*math.Pi), false},
		// Derived: a sweep of 1e-10 on radius 1 has its ends 1e-10 apart but turns hardly at all.
		{"tiny arc whose ends meet", ArcFrom(V(1, 0), o, 1e-10), false},
		{"line", Line(o, V(1, 0)), false},
		{"line of no length", Line(o, o), false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got := tc.s.IsFullCircle(); got != tc.want {
				t.Errorf("%v: got %v, want %v", tc.s, got, tc.want)
			}
		})
	}
}

func TestFullTurnTolerance(t *testing.T) {
	tests := []struct {
		name    string
		sweep   float64
		closes  bool // ArcFrom ends exactly at its start
		badTurn bool // Validate calls it more than a full turn
	}{
		{"a turn", 2 * math.Pi, true, false},
		{"just under fullTurnTol short", 2*math.Pi - 0.9e-12, true, false},
		{"just under fullTurnTol past", 2*math.Pi + 0.9e-12, true, false},
		{"clockwise, just past", -2*math.Pi - 0.9e-12, true, false},
		{"twice fullTurnTol short", 2*math.Pi - 2e-12, false, false},
		{"twice fullTurnTol past", 2*math.Pi + 2e-12, false, true},
		{"clockwise, twice past", -2*math.Pi - 2e-12, false, true},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			s := ArcFrom(V(1, 0), V(0, 0), tc.sweep)
			if got := s.B == s.A; got != tc.closes {
				t.Errorf("ends equal: got %v, want %v", got, tc.closes)
			}
			err := s.validate()
			if got := errors.Is(err, ErrBadArc); got != tc.badTurn {
				t.Errorf("validate: got %v, want bad arc %v", err, tc.badTurn)
			}
		})
	}
}
