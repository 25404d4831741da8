package geom

import (
	"math"
	"math/rand"
	"testing"
)

// mustRect returns the w × h rectangle at the origin with corners of radius corner.
func mustRect(t testing.TB, w, h, corner float64) Contour {
	t.Helper()
	c, err := Rect(V(0, 0), V(w, h), corner)
	if err != nil {
		t.Fatal(err)
	}
	return c
}

// sameSeg reports whether two segments have the same ends, centre and sweep within tol.
func sameSeg(a, b Segment, tol float64) bool {
	if a.IsArc() != b.IsArc() || a.A.Dist(b.A) > tol || a.B.Dist(b.B) > tol {
		return false
	}
	return !a.IsArc() || (a.Center.Dist(b.Center) <= tol && math.Abs(a.Sweep-b.Sweep) <= tol)
}

func TestOffsetSegment(t *testing.T) {
	ccw := Arc(V(0, 0), 2, 0, math.Pi/2) // turns left: centre on its left
	cw := ccw.Reverse()                  // turns right: centre on its right
	tests := []struct {
		name string
		s    Segment
		d    float64
		want Segment
		ok   bool
	}{
		// Derived: the right normal of travel along +x is −y.
		{"line right", Line(V(0, 0), V(10, 0)), 1, Line(V(0, -1), V(10, -1)), true},
		{"line left", Line(V(0, 0), V(10, 0)), -2, Line(V(0, 2), V(10, 2)), true},
		{"left arc grows", ccw, 1, Arc(V(0, 0), 3, 0, math.Pi/2), true},
		{"left arc shrinks", ccw, -1.5, Arc(V(0, 0), 0.5, 0, math.Pi/2), true},
		{"left arc vanishes", ccw, -2, Segment{}, false},
		{"right arc shrinks", cw, 1, Arc(V(0, 0), 1, 0, math.Pi/2).Reverse(), true},
		{"right arc vanishes", cw, 2.5, Segment{}, false},
		{"right arc grows", cw, -1, Arc(V(0, 0), 3, 0, math.Pi/2).Reverse(), true},
		{"full circle", Circle(V(1, 1), 2)[0], 0.5, Circle(V(1, 1), 2.5)[0], true},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got, ok := offsetSegment(tc.s, tc.d)
			if ok != tc.ok {
				t.Fatalf("ok: got %v, want %v", ok, tc.ok)
			}
			if ok && !sameSeg(got, tc.want, 1e-12) {
				t.Errorf("got %v, want %v", got, tc.want)
			}
		})
	}
}

func TestRawOffsetRectangle(t *testing.T) {
	const w, h = 10.0, 6.0
	rect := mustRect(t, w, h, 0)
	tests := []struct {
		name       string
		d          float64
		lines      int
		arcs       int
		area, perm float64
	}{
		// Derived: grown by d the rectangle gains a d-wide band with quarter circles at corners.
		{"grow", 1.5, 4, 4, (w+3)*(h+3) - (4-math.Pi)*1.5*1.5, 2*(w+h) + 2*math.Pi*1.5},
		// Derived: shrunk by d each side moves in by d, leaving (w−2d) × (h−2d).
		{"shrink", -1.5, 4, 0, (w - 3) * (h - 3), 2 * (w - 3 + h - 3)},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			raw := Contour(rawOffset(rect, tc.d))
			if err := raw.Validate(); err != nil {
				t.Fatalf("raw offset is not a clean contour: %v\n%v", err, raw)
			}
			lines, arcs := 0, 0
			for _, s := range raw {
				if s.IsArc() {
					arcs++
					approx(t, "join radius", s.Radius(), math.Abs(tc.d), 1e-12)
					approx(t, "join sweep", s.Sweep, math.Pi/2, 1e-12)
				} else {
					lines++
				}
			}
			if lines != tc.lines || arcs != tc.arcs {
				t.Errorf("got %d lines and %d arcs, want %d and %d", lines, arcs, tc.lines, tc.arcs)
			}
			approx(t, "area", raw.Area(), tc.area, 1e-9)
			approx(t, "perimeter", raw.Perimeter(), tc.perm, 1e-9)
		})
	}
}

func TestRawOffsetFilletVanishes(t *testing.T) {
	// A 10 × 6 rectangle with fillets of 0.5 shrunk by 1: the fillets' offsets vanish and only
	// the four sides remain, on the lines of the 8 × 4 rectangle x = 1, x = 9, y = 1, y = 5
	// (derived). They overhang one another; the filter removes the overhangs.
	raw := rawOffset(mustRect(t, 10, 6, 0.5), -1)
	if len(raw) != 4 {
		t.Fatalf("got %d segments, want 4: %v", len(raw), raw)
	}
	for i, s := range raw {
		onSide := false
		for _, v := range []float64{1, 9} {
			onSide = onSide || (math.Abs(s.A.X-v) < 1e-12 && math.Abs(s.B.X-v) < 1e-12)
		}
		for _, v := range []float64{1, 5} {
			onSide = onSide || (math.Abs(s.A.Y-v) < 1e-12 && math.Abs(s.B.Y-v) < 1e-12)
		}
		if s.IsArc() || !onSide {
			t.Errorf("segment %d: got %v, want a line on a side of the 8 × 4 rectangle", i, s)
		}
	}
}

func TestRawOffsetHoleShrinksWhenRegionGrows(t *testing.T) {
	// A clockwise hole of radius 3: growing the region by 1 moves it to its right, into the hole,
	// leaving radius 2 (derived).
	hole := Circle(V(0, 0), 3).Reverse()
	raw := Contour(rawOffset(hole, 1))
	if len(raw) != 1 {
		t.Fatalf("got %d segments, want 1", len(raw))
	}
	approx(t, "radius", raw[0].Radius(), 2, 1e-12)
	approx(t, "area", raw.Area(), -4*math.Pi, 1e-9)
}

func TestRawOffsetNearlyStraightCorners(t *testing.T) {
	// Concave corners that turn by a hair: the neighbouring offsets are trimmed to meet, so the
	// raw offset of this nearly flat zigzag is already one clean contour (no spurs).
	for _, eps := range []float64{1e-3, 1e-6, 1e-9, 1e-11, 1e-13} {
		c := Polygon(V(0, 0), V(10, eps), V(20, 0), V(20, 10), V(0, 10))
		for _, d := range []float64{1, -1} {
			raw := Contour(rawOffset(c, d))
			if err := raw.Validate(); err != nil {
				t.Errorf("eps %g, d %g: raw offset is not clean: %v\n%v", eps, d, err, raw)
			}
		}
	}
}

func TestSegIndexMatchesBruteForce(t *testing.T) {
	const seed = 11
	rng := rand.New(rand.NewSource(seed))
	for k := 0; k < 30; k++ {
		reg := randomRegion(rng)
		cs := reg.Contours()
		idx := newSegIndex(cs)
		for q := 0; q < 200; q++ {
			p := V(100*rng.Float64()-50, 100*rng.Float64()-50)
			r := 10 * rng.Float64()
			want := false
			for _, c := range cs {
				for _, s := range c {
					want = want || s.DistanceTo(p) < r
				}
			}
			if got := idx.nearerThan(p, r); got != want {
				t.Fatalf("seed %d case %d: nearerThan(%v, %g): got %v, want %v", seed, k, p, r, got, want)
			}
		}
	}
}

func TestKeepOffsetPieces(t *testing.T) {
	idx := newSegIndex([]Contour{mustRect(t, 10, 10, 0)})
	tests := []struct {
		name string
		seg  Segment
		keep bool
	}{
		// Derived: distances from the square [0,10]² to each piece's midpoint, against d = 1.
		{"side offset", Line(V(2, -1), V(8, -1)), true},
		{"too near", Line(V(2, -0.5), V(8, -0.5)), false},
		{"inside", Line(V(2, 1), V(8, 1)), true},
		{"corner join", Arc(V(10, 0), 1, -math.Pi/2, math.Pi/2), true},
		{"overhang past a concave corner", Line(V(0.3, 1), V(1.3, 1)), false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got := keepOffsetPieces([]piece{{seg: tc.seg}}, idx, 1)
			if (len(got) == 1) != tc.keep {
				t.Errorf("got kept %v, want %v", len(got) == 1, tc.keep)
			}
		})
	}
}

func TestContourFates(t *testing.T) {
	tests := []struct {
		name                    string
		n                       int
		srcs                    [][]int
		vanished, split, merged []ContourRef
	}{
		{"untouched", 2, [][]int{{0, 0, 0}, {1, 1}}, nil, nil, nil},
		{"hole vanished", 3, [][]int{{0, 0}, {2}}, []ContourRef{1}, nil, nil},
		{"outer split", 1, [][]int{{0, 0}, {0}}, nil, []ContourRef{0}, nil},
		{"hole broke out", 2, [][]int{{0, 1, 0, 1}}, nil, nil, []ContourRef{0, 1}},
		{"everything gone", 2, nil, []ContourRef{0, 1}, nil, nil},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			v, s, m := contourFates(tc.n, tc.srcs)
			for _, c := range []struct {
				what      string
				got, want []ContourRef
			}{{"vanished", v, tc.vanished}, {"split", s, tc.split}, {"merged", m, tc.merged}} {
				if len(c.got) != len(c.want) {
					t.Errorf("%s: got %v, want %v", c.what, c.got, c.want)
					continue
				}
				for i := range c.got {
					if c.got[i] != c.want[i] {
						t.Errorf("%s: got %v, want %v", c.what, c.got, c.want)
					}
				}
			}
		})
	}
}
