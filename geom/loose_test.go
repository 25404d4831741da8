package geom

import (
	"math"
	"math/rand"
	"testing"
)

func TestJoinLoose(t *testing.T) {
	sq := shape(t, "0,0 10,0 10,10 0,10")
	tests := []struct {
		name             string
		segs             []Segment
		closed, open     int
		dups, degenerate int
		area             float64 // |area| of the first closed chain
	}{
		// Area 100 derived: a 10 × 10 square.
		{"square in order", sq, 1, 0, 0, 0, 100},
		{"square shuffled and reversed", []Segment{sq[2], sq[0].Reverse(), sq[3], sq[1].Reverse()}, 1, 0, 0, 0, 100},
		{"square with a gap within tolerance", []Segment{sq[0], sq[1], sq[2],
			Line(V(0, 10), V(0.0004, 0.0003))}, 1, 0, 0, 0, 100},
		{"square drawn twice", append(append(Contour{}, sq...), sq.Reverse()...), 1, 0, 4, 0, 100},
		{"square missing a side", sq[:3], 0, 1, 0, 0, 0},
		{"zero-length line dropped", append(append(Contour{}, sq...), Line(V(5, 5), V(5, 5.0001))), 1, 0, 0, 1, 100},
		// Area derived: π·2² for a circle of radius 2.
		{"lone circle", Circle(V(3, 3), 2), 1, 0, 0, 0, 4 * math.Pi},
		// Derived: an arc of 359.99999° about (0, 0), radius 1, closes into the unit disc.
		{"nearly full arc", []Segment{Arc(V(0, 0), 1, 0, 2*math.Pi-1e-7)}, 1, 0, 0, 0, math.Pi},
		// Half discs: a 10 mm line and a semicircle of radius 5, area π·25/2.
		{"line and arc", []Segment{ArcFrom(V(10, 0), V(5, 0), math.Pi), Line(V(0, 0), V(10, 0))}, 1, 0, 0, 0, 12.5 * math.Pi},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			r := JoinLoose(tc.segs, 0.001)
			var closed, open int
			var first Contour
			for _, c := range r.Chains {
				if c.Closed {
					if first == nil {
						first = c.Contour()
					}
					closed++
					if err := c.Contour().Validate(); err != nil {
						t.Errorf("closed chain does not validate: %v", err)
					}
				} else {
					open++
				}
			}
			if closed != tc.closed || open != tc.open {
				t.Errorf("got %d closed and %d open, want %d and %d", closed, open, tc.closed, tc.open)
			}
			if len(r.Duplicates) != tc.dups || len(r.Degenerate) != tc.degenerate {
				t.Errorf("got %d duplicates and %d degenerate, want %d and %d",
					len(r.Duplicates), len(r.Degenerate), tc.dups, tc.degenerate)
			}
			if first != nil {
				approx(t, "area", math.Abs(first.Area()), tc.area, 0.01)
			}
		})
	}
}

func TestLooseEnds(t *testing.T) {
	// Two sides of a square with a 0.05 gap at (10, 0) and a wide one across the open corner.
	segs := []Segment{Line(V(0, 0), V(10, 0)), Line(V(10, 0.05), V(10, 10))}
	r := JoinLoose(segs, 0.001)
	ends := r.LooseEnds()
	if len(ends) != 4 {
		t.Fatalf("got %d loose ends, want 4", len(ends))
	}
	found := false
	for _, e := range ends {
		if e.At.Near(V(10, 0)) {
			found = true
			approx(t, "gap width at (10, 0)", e.Width, 0.05, 1e-12) // derived: 0.05 apart
			if !e.Nearest.Near(V(10, 0.05)) {
				t.Errorf("got nearest %v, want (10, 0.05)", e.Nearest)
			}
		}
	}
	if !found {
		t.Errorf("no loose end at (10, 0) in %v", ends)
	}
}

// TestJoinLooseArcsSnapped checks that arcs moved onto a neighbour's end stay true arcs.
func TestJoinLooseArcsSnapped(t *testing.T) {
	// A disc of radius 5 drawn as two half arcs whose ends miss each other by 0.0005.
	a := ArcFrom(V(5, 0), V(0, 0), math.Pi)
	b := ArcFrom(V(-5, 0.0005), V(0, 0.0005), math.Pi)
	r := JoinLoose([]Segment{a, b}, 0.001)
	if len(r.Chains) != 1 || !r.Chains[0].Closed {
		t.Fatalf("got %+v, want one closed chain", r.Chains)
	}
	c := r.Chains[0].Contour()
	if err := c.Validate(); err != nil {
		t.Fatalf("joined contour: %v", err)
	}
	for _, s := range c {
		if !s.IsArc() {
			t.Errorf("got %v, want arcs only", s)
		}
	}
	approx(t, "area", c.Area(), 25*math.Pi, 0.01) // derived: π·5², within the 0.0005 shift
}

// TestJoinLooseProperty takes seeded random outlines apart, shuffles, reverses and jitters the
// pieces within the tolerance, and checks that they come back as one closed contour of the
// same area.
func TestJoinLooseProperty(t *testing.T) {
	const tol = 0.001
	for seed := int64(1); seed <= 200; seed++ {
		rng := rand.New(rand.NewSource(seed))
		c := randomStar(rng, Vec{}, 4+rng.Intn(30), 5, 20)
		segs := make([]Segment, len(c))
		for i, s := range c {
			if !s.IsArc() {
				j := V(rng.Float64()-0.5, rng.Float64()-0.5).Mul(tol * 0.6)
				s = Line(s.A.Add(j), s.B)
			}
			if rng.Intn(2) == 0 {
				s = s.Reverse()
			}
			segs[i] = s
		}
		rng.Shuffle(len(segs), func(i, j int) { segs[i], segs[j] = segs[j], segs[i] })
		r := JoinLoose(segs, tol)
		if len(r.Chains) != 1 || !r.Chains[0].Closed {
			t.Fatalf("seed %d: got %d chains, want one closed", seed, len(r.Chains))
		}
		got := r.Chains[0].Contour()
		if err := got.Validate(); err != nil {
			t.Fatalf("seed %d: %v", seed, err)
		}
		// Each jitter moves one corner by at most 0.3·tol·√2, so the area moves by at most
		// that times the perimeter (derived).
		if d := math.Abs(math.Abs(got.Area()) - math.Abs(c.Area())); d > tol*c.Perimeter() {
			t.Fatalf("seed %d: area differs by %g", seed, d)
		}
	}
}

func BenchmarkJoinLoose(b *testing.B) {
	rng := rand.New(rand.NewSource(1))
	var segs []Segment
	for k := 0; k < 100; k++ {
		segs = append(segs, randomStar(rng, V(float64(k%10)*50, float64(k/10)*50), 40, 5, 20)...)
	}
	rng.Shuffle(len(segs), func(i, j int) { segs[i], segs[j] = segs[j], segs[i] })
	b.ResetTimer()
	for range b.N {
		JoinLoose(segs, 0.001)
	}
}
