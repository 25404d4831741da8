package geom

import (
	"math"
	"math/rand"
	"testing"
)

func TestBoxSegment(t *testing.T) {
	b := Box{Min: V(0, 0), Max: V(2, 1)}
	tests := []struct {
		name string
		p, q Vec
		meet bool
		dist float64
	}{
		{"through", V(-1, 0.5), V(3, 0.5), true, 0},
		{"inside", V(0.5, 0.5), V(1, 0.5), true, 0},
		{"touches a corner", V(2, 1), V(3, 2), true, 0},
		{"above", V(-1, 3), V(3, 3), false, 2},                 // derived: the top side is at y = 1
		{"past a corner", V(3, 2), V(4, 1), false, math.Sqrt2}, // derived: nearest is (3, 2) to (2, 1)
		{"diagonal past", V(2.5, 0), V(3.5, -1), false, 0.5},   // derived: (2.5, 0) to the side x = 2
		{"a point", V(1, -2), V(1, -2), false, 2},
	}
	for _, tc := range tests {
		if got := b.MeetsSegment(tc.p, tc.q); got != tc.meet {
			t.Errorf("%s: meets got %v, want %v", tc.name, got, tc.meet)
		}
		if got := b.SegmentDistance(tc.p, tc.q); math.Abs(got-tc.dist) > 1e-12 {
			t.Errorf("%s: distance got %v, want %v", tc.name, got, tc.dist)
		}
	}
	if got := b.Gap(Box{Min: V(5, 5), Max: V(6, 6)}); math.Abs(got-5) > 1e-12 { // derived: 3-4-5
		t.Errorf("gap: got %v, want 5", got)
	}
}

// TestPolylineIndexAgainstBruteForce compares the index's box distance with the distance to
// every segment, on seeded random polylines and boxes.
func TestPolylineIndexAgainstBruteForce(t *testing.T) {
	seed := int64(3)
	rng := rand.New(rand.NewSource(seed))
	for i := 0; i < 200; i++ {
		var lines [][]Vec
		for k := rng.Intn(4) + 1; k > 0; k-- {
			var c []Vec
			for n := rng.Intn(40) + 1; n > 0; n-- {
				c = append(c, V(rng.Float64()*100, rng.Float64()*100))
			}
			lines = append(lines, c)
		}
		x := NewPolylineIndex(lines)
		at := V(rng.Float64()*120-10, rng.Float64()*120-10)
		b := Box{Min: at, Max: at.Add(V(rng.Float64()*5, rng.Float64()*5))}
		want := math.Inf(1)
		for _, c := range lines {
			if len(c) == 1 {
				want = min(want, b.DistanceTo(c[0]))
			}
			for k := 1; k < len(c); k++ {
				want = min(want, b.SegmentDistance(c[k-1], c[k]))
			}
		}
		if got := x.BoxDistance(b, math.Inf(1)); math.Abs(got-want) > 1e-9 {
			t.Fatalf("seed %d case %d: got %v, want %v", seed, i, got, want)
		}
		if x.Crosses(b) != (want == 0) {
			t.Fatalf("seed %d case %d: crosses %v at distance %v", seed, i, x.Crosses(b), want)
		}
	}
}

func TestPointsAlong(t *testing.T) {
	l := [][]Vec{{V(0, 0), V(10, 0)}, {V(5, 5)}}
	if got := PointsAlong(l, 2.5, 0); len(got) != 6 || got[4] != V(10, 0) || got[5] != V(5, 5) {
		t.Errorf("got %v, want 0, 2.5, 5, 7.5, 10 along and the lone point", got) // derived
	}
	if got := PointsAlong(l, 1, 3); len(got) != 5 || math.Abs(got[1].X-10.0/3) > 1e-12 { // derived: the step widened to 10/3
		t.Errorf("got %v, want 0, 10/3, 20/3, 10 and the lone point", got)
	}
}
