package geom

import (
	"math"
	"testing"
)

func TestIntersect(t *testing.T) {
	quarter := Arc(V(0, 0), 1, 0, math.Pi/2) // (1,0) to (0,1) counter-clockwise
	tests := []struct {
		name string
		s, u Segment
		want []Vec
	}{
		{"lines cross", Line(V(0, 0), V(2, 2)), Line(V(0, 2), V(2, 0)), []Vec{V(1, 1)}},
		{"lines apart", Line(V(0, 0), V(1, 0)), Line(V(0, 1), V(1, 1)), nil},
		{"lines meet at an end", Line(V(0, 0), V(1, 0)), Line(V(1, 0), V(1, 1)), []Vec{V(1, 0)}},
		{"lines overlap", Line(V(0, 0), V(3, 0)), Line(V(2, 0), V(5, 0)), []Vec{V(3, 0), V(2, 0)}},
		{"T junction", Line(V(0, 0), V(2, 0)), Line(V(1, 0), V(1, 1)), []Vec{V(1, 0)}},
		// Derived: the line y = x meets the unit circle at (√½, √½).
		{"line through arc", Line(V(0, 0), V(2, 2)), quarter, []Vec{V(math.Sqrt(0.5), math.Sqrt(0.5))}},
		{"line misses arc's sweep", Line(V(0, 0), V(-2, -2)), quarter, nil},
		{"line tangent to arc", Line(V(-1, 1), V(1, 1)), quarter, []Vec{V(0, 1)}},
		// Derived: unit circles about (0,0) and (1,0) meet at (½, ±√¾).
		{"two circles", Circle(V(0, 0), 1)[0], Circle(V(1, 0), 1)[0],
			[]Vec{V(0.5, math.Sqrt(0.75)), V(0.5, -math.Sqrt(0.75))}},
		{"circles touching", Circle(V(0, 0), 1)[0], Circle(V(2, 0), 1)[0], []Vec{V(1, 0)}},
		{"arcs on one circle overlapping", Arc(V(0, 0), 1, 0, math.Pi), Arc(V(0, 0), 1, math.Pi/2, math.Pi),
			[]Vec{V(-1, 0), V(0, 1)}},
		{"concentric apart", Circle(V(0, 0), 1)[0], Circle(V(0, 0), 2)[0], nil},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got := intersect(tc.s, tc.u)
			if len(got) != len(tc.want) {
				t.Fatalf("got %d points %v, want %v", len(got), got, tc.want)
			}
			for _, w := range tc.want {
				found := false
				for _, g := range got {
					if g.at.Dist(w) < 1e-12 {
						found = true
						if !tc.s.At(g.ta).Near(w) || !tc.u.At(g.tb).Near(w) {
							t.Errorf("parameters %g, %g do not lead to %v", g.ta, g.tb, w)
						}
					}
				}
				if !found {
					t.Errorf("got %v, want a point at %v", got, w)
				}
			}
		})
	}
}

func TestBoxPairs(t *testing.T) {
	boxes := []Box{{V(0, 0), V(1, 1)}, {V(2, 2), V(3, 3)}, {V(0.5, 0.5), V(2.5, 2.5)}, {V(5, 0), V(6, 1)}}
	got := boxPairs(boxes)
	// By hand: box 2 overlaps boxes 0 and 1; the others are apart.
	want := map[[2]int]bool{{0, 2}: true, {1, 2}: true}
	if len(got) != len(want) {
		t.Fatalf("got %v, want %v", got, want)
	}
	for _, p := range got {
		if !want[p] {
			t.Errorf("unexpected pair %v", p)
		}
	}
}
