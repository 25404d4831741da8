package geom

import (
	"fmt"
	"math"
	"math/rand"
	"strconv"
	"testing"
)

// offsetRect returns the w × h rectangle at the origin with corners of radius corner.
func offsetRect(t testing.TB, w, h, corner float64) Contour {
	t.Helper()
	c, err := Rect(V(0, 0), V(w, h), corner)
	if err != nil {
		t.Fatal(err)
	}
	return c
}

// sameOffsetSeg reports whether two segments have the same ends, centre and sweep within tol.
func sameOffsetSeg(a, b Segment, tol float64) bool {
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
			if ok && !sameOffsetSeg(got, tc.want, 1e-12) {
				t.Errorf("got %v, want %v", got, tc.want)
			}
		})
	}
}

func TestRawOffsetRectangle(t *testing.T) {
	const w, h = 10.0, 6.0
	rect := offsetRect(t, w, h, 0)
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
	raw := rawOffset(offsetRect(t, 10, 6, 0.5), -1)
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
	idx := newSegIndex([]Contour{offsetRect(t, 10, 10, 0)})
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

// distToBoundary returns the distance from p to the nearest boundary point of r.
func distToBoundary(r Region, p Vec) float64 {
	best := math.Inf(1)
	for _, c := range r.Contours() {
		for _, s := range c {
			best = math.Min(best, s.DistanceTo(p))
		}
	}
	return best
}

// summedArea returns the summed area of rs.
func summedArea(rs []Region) float64 {
	var a float64
	for _, r := range rs {
		a += r.Area()
	}
	return a
}

// checkOffset offsets r by d and checks what must hold of any offset: every piece closed into a
// loop, every result valid (holes inside their outer, nothing crossing), every result boundary
// point exactly |d| from r's boundary on the side d says, and a point lies in the result exactly
// when it is in r and at least −d from its boundary (d < 0) or in r or nearer than d to it
// (d > 0). It returns the result; label names the case (with its seed) in failures.
func checkOffset(t *testing.T, label string, r Region, d float64, rng *rand.Rand) OffsetResult {
	t.Helper()
	res, open := r.offset(d)
	if open != 0 {
		t.Errorf("%s, d %g: %d pieces left out of every loop", label, d, open)
	}
	for i, g := range res.Regions {
		if err := g.Validate(); err != nil {
			t.Errorf("%s, d %g: result %d: %v", label, d, i, err)
		}
		for _, c := range g.Contours() {
			for _, s := range c {
				for _, u := range []float64{0, 0.25, 0.5, 0.75} {
					p := s.At(u)
					if got := distToBoundary(r, p); math.Abs(got-math.Abs(d)) > 1e-7 {
						t.Errorf("%s, d %g: result point %v is %.12g from the boundary, want %g",
							label, d, p, got, math.Abs(d))
					}
					if r.Contains(p) != (d < 0) {
						t.Errorf("%s, d %g: result point %v: inside the input %v, want %v",
							label, d, p, r.Contains(p), d < 0)
					}
				}
			}
		}
	}
	b := r.Bounds().Expand(math.Abs(d) + 1)
	for k := 0; k < 300; k++ {
		p := V(b.Min.X+rng.Float64()*(b.Max.X-b.Min.X), b.Min.Y+rng.Float64()*(b.Max.Y-b.Min.Y))
		dist := distToBoundary(r, p)
		if math.Abs(dist-math.Abs(d)) < 1e-6 {
			continue // on the offset boundary, within rounding: either answer is right
		}
		want := r.Contains(p) && dist > -d
		if d > 0 {
			want = r.Contains(p) || dist < d
		}
		got := false
		for _, g := range res.Regions {
			got = got || g.Contains(p)
		}
		if got != want {
			t.Errorf("%s, d %g: point %v (%.6g from the boundary): in the result %v, want %v",
				label, d, p, dist, got, want)
		}
	}
	return res
}

// sameRefs reports whether two lists of contour references are the same.
func sameRefs(a, b []ContourRef) bool {
	if len(a) != len(b) {
		return false
	}
	for i := range a {
		if a[i] != b[i] {
			return false
		}
	}
	return true
}

func TestOffsetShapes(t *testing.T) {
	rect := NewRegion(offsetRect(t, 10, 6, 0))
	rounded := NewRegion(offsetRect(t, 10, 6, 0.5))
	// Derived: inside a 4 × 4 square shrunk by 0.6 the neck's opening of width 1 leaves a bulge
	// between the two discs of radius 0.6 about the opening's corners:
	// 2·∫₀^½ (0.6 − √(0.36 − m²)) dm = 0.6 − (0.5·√0.11 + 0.36·asin(5/6)).
	bulge := 0.6 - (0.5*math.Sqrt(0.11) + 0.36*math.Asin(5.0/6))
	dumbbell := shape(t, "0,0 4,0 4,1.5 6,1.5 6,0 10,0 10,4 6,4 6,2.5 4,2.5 4,4 0,4")
	// Derived: the part of that grown hole beyond x = 8.8, 0.8 past its right side's corner
	// centres: a 0.4 × 2 strip and two pieces of quarter discs of radius 1.2,
	// ∫_0.8^1.2 √(1.44 − x²) dx = π·1.44/4 − (0.8·√0.8 + 1.44·asin(2/3))/2.
	beyond := 0.8 + 2*(math.Pi*1.44/4-(0.8*math.Sqrt(0.8)+1.44*math.Asin(0.8/1.2))/2)
	tests := []struct {
		name    string
		r       Region
		d       float64
		regions int
		area    float64 // total area of the result
		arcs    int     // arcs in the result, -1 for any number
		radius  float64 // radius of every result arc when arcs > 0
		v, s, m []ContourRef
	}{
		// Derived: (w+2d)(h+2d) − (4−π)d², four corner arcs of radius d.
		{"rectangle grown", rect, 1.5, 1, 13*9 - (4-math.Pi)*2.25, 4, 1.5, nil, nil, nil},
		// Derived: (w−2d) × (h−2d) with sharp corners.
		{"rectangle shrunk", rect, -1.5, 1, 7 * 3, 0, 0, nil, nil, nil},
		// Derived: π(r ± d)².
		{"circle grown", NewRegion(Circle(V(3, 4), 2)), 0.75, 1, math.Pi * 2.75 * 2.75, 1, 2.75, nil, nil, nil},
		{"circle shrunk", NewRegion(Circle(V(3, 4), 2)), -0.75, 1, math.Pi * 1.25 * 1.25, 1, 1.25, nil, nil, nil},
		// Derived: the fillets of radius 0.5 keep their centres and grow to radius 1.5.
		{"fillets grow", rounded, 1, 1, 12*8 - (4-math.Pi)*2.25, 4, 1.5, nil, nil, nil},
		// Derived: shrunk by 1 > 0.5 the fillets become sharp corners of the 8 × 4 rectangle.
		{"fillets sharpen", rounded, -1, 1, 8 * 4, 0, 0, nil, nil, nil},
		// Derived: 0.6 high, so nothing is 0.4 from every edge.
		{"thin strip vanishes", NewRegion(offsetRect(t, 2, 0.6, 0)), -0.4, 0, 0, 0, 0, []ContourRef{0}, nil, nil},
		// Derived: a neck 1 wide vanishes under 0.6; each 4 × 4 end keeps 2.8² plus the bulge.
		{"dumbbell splits", NewRegion(dumbbell),
			-0.6, 2, 2 * (2.8*2.8 + bulge), 4, 0.6, nil, []ContourRef{0}, nil},
		// Derived: a hole of radius 1 is gone once the region grows by more than 1; the square
		// grows as in the rectangle case.
		{"hole fills", NewRegion(offsetRect(t, 10, 10, 0), Circle(V(5, 5), 1).Reverse()),
			1.5, 1, 13*13 - (4-math.Pi)*2.25, 4, 1.5, []ContourRef{1}, nil, nil},
		// Derived: a dumbbell-shaped hole splits in two as the region grows by 0.6, each part
		// as the dumbbell's ends above; the 20 × 10 outside grows as the rectangle does.
		{"hole splits", NewRegion(offsetRect(t, 20, 10, 0), dumbbell.Transform(Translate(V(5, 3)))),
			0.6, 1, 21.2*11.2 - (4-math.Pi)*0.36 - 2*(2.8*2.8+bulge), 8, 0.6, nil, []ContourRef{1}, nil},
		// Derived: a hole whose edge is 1 from the outside breaks through when shrunk by 1.2: the
		// 7.6² square less the grown hole (2 × 2 with a 1.2 band and round corners) left of the
		// shrunk side x = 8.8.
		{"hole breaks out", NewRegion(offsetRect(t, 10, 10, 0), Polygon(V(6, 4), V(6, 6), V(8, 6), V(8, 4))),
			-1.2, 1, 7.6*7.6 - (4 + 4*2*1.2 + math.Pi*1.44 - beyond), 4, 1.2, nil, nil, []ContourRef{0, 1}},
		// Derived: the hole's circle keeps its centre; its radius grows from 2 to 2.5 as the region
		// shrinks by 0.5, the outside shrinks to 9 × 9.
		{"hole arc grows", NewRegion(offsetRect(t, 10, 10, 0), Circle(V(5, 5), 2).Reverse()),
			-0.5, 1, 81 - math.Pi*6.25, 1, 2.5, nil, nil, nil},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			res := checkOffset(t, tc.name, tc.r, tc.d, rand.New(rand.NewSource(1)))
			if len(res.Regions) != tc.regions {
				t.Fatalf("regions: got %d, want %d", len(res.Regions), tc.regions)
			}
			if tc.area >= 0 {
				approx(t, "area", summedArea(res.Regions), tc.area, 1e-9)
			}
			arcs := 0
			for _, g := range res.Regions {
				for _, c := range g.Contours() {
					for _, s := range c {
						if s.IsArc() {
							arcs++
							approx(t, "arc radius", s.Radius(), tc.radius, 1e-9)
						}
					}
				}
			}
			if tc.arcs >= 0 && arcs != tc.arcs {
				t.Errorf("arcs: got %d, want %d", arcs, tc.arcs)
			}
			if !sameRefs(res.Vanished, tc.v) || !sameRefs(res.Split, tc.s) || !sameRefs(res.Merged, tc.m) {
				t.Errorf("vanished, split, merged: got %v %v %v, want %v %v %v",
					res.Vanished, res.Split, res.Merged, tc.v, tc.s, tc.m)
			}
		})
	}
}

func TestOffsetZeroIsIdentity(t *testing.T) {
	r := NewRegion(offsetRect(t, 10, 6, 1), Circle(V(5, 3), 1).Reverse())
	res := r.Offset(0)
	if len(res.Regions) != 1 || len(res.Regions[0].Holes) != 1 {
		t.Fatalf("got %d regions, want the input back", len(res.Regions))
	}
	approx(t, "area", res.Regions[0].Area(), r.Area(), 0)
}

// randomConvexRegion returns a seeded random convex polygon about the origin, some corners rounded:
// points on a circle at sorted random angles, at least one in every half turn.
func randomConvexRegion(rng *rand.Rand) Region {
	for {
		n := 3 + rng.Intn(12)
		pts := make([]Vec, n)
		radii := make([]float64, n)
		for i := range pts {
			pts[i] = Polar(V(0, 0), 10, (float64(i)+0.9*rng.Float64())*2*math.Pi/float64(n))
			if rng.Intn(2) == 0 {
				radii[i] = 2 * rng.Float64()
			}
		}
		if c, err := RoundedPolygon(pts, radii); err == nil && c.Validate() == nil {
			return NewRegion(c)
		}
	}
}

func TestOffsetConvexRoundTrip(t *testing.T) {
	for seed := int64(1); seed <= 40; seed++ {
		rng := rand.New(rand.NewSource(seed))
		r := randomConvexRegion(rng)
		d := 0.2 + 3*rng.Float64()
		grown := r.Offset(d)
		if len(grown.Regions) != 1 {
			t.Fatalf("seed %d: grown by %g: got %d regions, want 1", seed, d, len(grown.Regions))
		}
		back := checkOffset(t, "convex back", grown.Regions[0], -d, rng)
		// Derived: shrinking a convex region's outward offset by the same amount gives it back.
		approx(t, "seed "+seedText(seed)+" area after +d, −d", summedArea(back.Regions), r.Area(), 1e-7)
	}
}

// seedText formats a seed for messages.
func seedText(n int64) string { return strconv.FormatInt(n, 10) }

func TestOffsetRandomRegions(t *testing.T) {
	ds := []float64{-4, -1.5, -0.3, 0.3, 1.5, 4, 9}
	for seed := int64(1); seed <= 60; seed++ {
		rng := rand.New(rand.NewSource(seed))
		r := randomRegion(rng)
		label := "seed " + seedText(seed)
		prev := 0.0
		for _, d := range ds {
			a := summedArea(checkOffset(t, label, r, d, rng).Regions)
			// Derived: a region only gains points as d grows.
			if a < prev-1e-9 {
				t.Errorf("%s: area at d %g is %.9g, less than %.9g at the d before", label, d, a, prev)
			}
			prev = a
		}
	}
}

func TestOffsetNearDegenerate(t *testing.T) {
	tests := []struct {
		name string
		c    string
	}{
		{"collinear points", "0,0 5,0 10,0 10,3 10,6 5,6 0,6 0,3"},
		{"nearly collinear, concave", "0,0 5,0.0000001 10,0 10,6 0,6"},
		{"nearly collinear, convex", "0,0 5,-0.0000001 10,0 10,6 0,6"},
		{"tiny fillets", "0,0@0.000001 10,0@0.00000001 10,6@0.000001 0,6@0.0000001"},
		{"very short edge", "0,0 10,0 10,6 0.000001,6 0,5.999999"},
		{"shorter edge", "0,0 10,0 10,6 0.00000001,6 0,5.99999999"},
		{"short edge in a concave corner", "0,0 10,0 10,6 5,6 5,3.00000001 4.99999999,3 0,3"},
		{"sliver spike", "0,0 10,0 10,6 5.0000001,6 5,9 4.9999999,6 0,6"},
	}
	rng := rand.New(rand.NewSource(3))
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			r := NewRegion(shape(t, tc.c))
			for _, d := range []float64{-2.5, -0.5, -1e-6, 1e-6, 0.5, 2.5} {
				checkOffset(t, tc.name, r, d, rng)
			}
		})
	}
}

// roughenContour returns c with every line cut at a random point (a collinear vertex) and some lines
// given a very short first piece, so that offsets meet near-degenerate joints.
func roughenContour(rng *rand.Rand, c Contour) Contour {
	var out Contour
	for _, s := range c {
		if s.IsArc() {
			out = append(out, s)
			continue
		}
		cuts := []float64{0.2 + 0.6*rng.Float64()}
		if rng.Intn(4) == 0 {
			cuts = append([]float64{1e-7 + 1e-6*rng.Float64()}, cuts...)
		}
		a := s.A
		for _, u := range cuts {
			p := s.At(u)
			out = append(out, Line(a, p))
			a = p
		}
		out = append(out, Line(a, s.B))
	}
	return out
}

func TestOffsetRoughenedRegions(t *testing.T) {
	for seed := int64(1); seed <= 30; seed++ {
		rng := rand.New(rand.NewSource(seed))
		r := randomRegion(rng)
		rough := Region{Outer: roughenContour(rng, r.Outer)}
		for _, h := range r.Holes {
			rough.Holes = append(rough.Holes, roughenContour(rng, h))
		}
		label := "seed " + seedText(seed)
		for _, d := range []float64{-1.5, -0.3, 0.3, 1.5} {
			a := summedArea(checkOffset(t, label, rough, d, rng).Regions)
			// Derived: cutting lines at collinear points changes no point of the region.
			approx(t, label+" area of the roughened offset", a, summedArea(r.Offset(d).Regions), 1e-7)
		}
	}
}

func TestOffsetRegions(t *testing.T) {
	left := NewRegion(shape(t, "0,0 4,0 4,4 0,4"))
	right := NewRegion(shape(t, "5,0 9,0 9,4 5,4"))
	far := NewRegion(shape(t, "20,0 24,0 24,4 20,4"))
	// Derived: each 4 × 4 square grown by 1 has area 6² − (4 − π). Grown, the two 1 apart
	// overlap in the strip 4 ≤ x ≤ 5: 4 × 1 plus, above and below, the part of both corner
	// discs, 2·∫_0.5^1 √(1 − v²) dv each.
	grown := 36 - (4 - math.Pi)
	lens := math.Pi/4 - (0.5*math.Sqrt(0.75)+math.Pi/6)/2
	tests := []struct {
		name    string
		rs      []Region
		d       float64
		regions int
		area    float64
	}{
		{"grow into one", []Region{left, right}, 1, 1, 2*grown - (4 + 4*lens)},
		{"grow apart", []Region{left, far}, 1, 2, 2 * grown},
		// Derived: each square shrinks to 2 × 2 on its own.
		{"shrink", []Region{left, right}, -1, 2, 8},
		{"none", nil, 1, 0, 0},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got := OffsetRegions(tc.rs, tc.d)
			if len(got) != tc.regions {
				t.Fatalf("regions: got %d, want %d", len(got), tc.regions)
			}
			for i, g := range got {
				if err := g.Validate(); err != nil {
					t.Errorf("region %d: %v", i, err)
				}
			}
			approx(t, "area", summedArea(got), tc.area, 1e-9)
		})
	}
}

func TestPruneDangling(t *testing.T) {
	sq := Polygon(V(0, 0), V(1, 0), V(1, 1), V(0, 1))
	var ps []piece
	for _, s := range sq {
		ps = append(ps, piece{seg: s})
	}
	spur := piece{seg: Line(V(1, 1), V(2, 2))} // leaves the square and leads nowhere
	back := piece{seg: Line(V(2, 2), V(3, 2))} // continues the spur, still nowhere
	orphan := piece{seg: Line(V(5, 5), V(6, 5))}
	ring := piece{seg: Circle(V(9, 9), 1)[0]} // a full circle closes on itself
	got := pruneDangling(append(append([]piece{}, ps...), spur, back, orphan, ring))
	// Derived: only the square's four sides and the circle lie on closed loops.
	if len(got) != 5 {
		t.Fatalf("got %d pieces, want 5: %v", len(got), got)
	}
	for _, p := range got {
		onLoop := p.seg == ring.seg
		for _, s := range sq {
			onLoop = onLoop || p.seg == s
		}
		if !onLoop {
			t.Errorf("kept %v, which is on no loop", p.seg)
		}
	}
}

func TestOffsetFineOutline(t *testing.T) {
	// Outlines of thousands of short edges, smooth and jagged, offset by far more than an edge:
	// offsets of neighbouring edges overlap many times over.
	for _, jitter := range []float64{0.01, 0.5} {
		r := benchBlob(t, 1000, jitter)
		rng := rand.New(rand.NewSource(5))
		for _, d := range []float64{-0.5, 0.5} {
			checkOffset(t, "blob jitter "+strconv.FormatFloat(jitter, 'g', -1, 64), r, d, rng)
		}
	}
}

func ExampleRegion_Offset() {
	plate, _ := Rect(V(0, 0), V(10, 6), 0)
	res := NewRegion(plate).Offset(1.5)
	arcs := 0
	for _, s := range res.Regions[0].Outer {
		if s.IsArc() && math.Abs(s.Radius()-1.5) < 1e-9 {
			arcs++
		}
	}
	// (10 + 3)(6 + 3) − (4 − π)·1.5²: the corners are rounded.
	fmt.Printf("%d corner arcs of radius 1.5, area %.4f\n", arcs, res.Regions[0].Area())
	// Output: 4 corner arcs of radius 1.5, area 115.0686
}
