package geom

import (
	"fmt"
	"math"
	"math/rand"
	"testing"
)

// region builds a region from test shapes, checking that it is valid.
func region(t testing.TB, outer Contour, holes ...Contour) Region {
	t.Helper()
	r := NewRegion(outer, holes...)
	if err := r.Validate(); err != nil {
		t.Fatalf("test region: %v", err)
	}
	return r
}

// halfDisc is the region under a radius-3 semicircle about the origin with a V-shaped tooth
// rising from its flat side to a sharp tip at (0, 2), one below the top of the arc.
func halfDisc() Contour {
	return Contour{
		Line(V(-3, 0), V(-1, 0)), Line(V(-1, 0), V(0, 2)), Line(V(0, 2), V(1, 0)),
		Line(V(1, 0), V(3, 0)), ArcFrom(V(3, 0), V(0, 0), math.Pi),
	}
}

// gapCase is one narrow-place check: the width expected and, when ends is set, the two ends
// of the chord in either order.
type gapCase struct {
	name  string
	r     Region
	ok    bool
	width float64
	ends  []Vec
}

func checkGap(t *testing.T, tc gapCase, g Gap, ok bool) {
	t.Helper()
	if ok != tc.ok {
		t.Fatalf("ok: got %v (%+v), want %v", ok, g, tc.ok)
	}
	if !ok {
		return
	}
	approx(t, "width", g.Width, tc.width, 1e-9)
	approx(t, "|A−B|", g.A.Dist(g.B), g.Width, 1e-9)
	if len(tc.ends) == 2 {
		a, b := tc.ends[0], tc.ends[1]
		if !(g.A.Dist(a) < 1e-9 && g.B.Dist(b) < 1e-9) && !(g.A.Dist(b) < 1e-9 && g.B.Dist(a) < 1e-9) {
			t.Errorf("ends: got %v–%v, want %v–%v", g.A, g.B, a, b)
		}
	}
}

func TestNarrowestWidth(t *testing.T) {
	plate := shape(t, "0,0 20,0 20,10 0,10")
	square := shape(t, "0,0 20,0 20,20 0,20")
	tests := []gapCase{
		// Derived: a w×h rectangle admits a cutter of diameter min(w, h).
		{name: "rectangle 10×5", r: region(t, shape(t, "0,0 10,0 10,5 0,5")), ok: true, width: 5},
		{name: "rectangle 3×7", r: region(t, shape(t, "1,1 4,1 4,8 1,8")), ok: true, width: 3},
		{name: "square 8 with corners of radius 2", r: region(t, shape(t, "0,0 8,0@2 8,8@2 0,8@2")), ok: true, width: 8},
		// Derived: a point on a straight edge changes nothing.
		{name: "rectangle with a split edge", r: region(t, shape(t, "0,0 5,0 10,0 10,4 0,4")), ok: true, width: 4},
		// Derived: a circle's narrowest place is its diameter.
		{name: "circle r 2.5", r: region(t, Circle(V(1, 1), 2.5)), ok: true, width: 5},
		// Derived: a slot of radius r is 2r wide.
		{name: "slot r 0.4", r: region(t, Capsule(V(0, 0), V(6, 3), 0.4)), ok: true, width: 0.8},
		// Derived: a ring between radii 5 and 3 is 2 wide along every radius.
		{name: "ring", r: region(t, Circle(V(0, 0), 5), Circle(V(0, 0), 3)), ok: true, width: 2},
		// Derived: a V tooth reaching to 1.3 above the floor of a channel 2 high.
		{name: "tooth over a floor", r: region(t, shape(t, "0,0 10,0 10,2 6,2 5,1.3 4,2 0,2")), ok: true,
			width: 1.3, ends: []Vec{V(5, 1.3), V(5, 0)}},
		// Derived: two teeth with tips at y = 0.5 and 1.5.
		{name: "tip to tip", r: region(t, shape(t, "0,0 4,0 5,0.5 6,0 10,0 10,2 6,2 5,1.5 4,2 0,2")), ok: true,
			width: 1, ends: []Vec{V(5, 0.5), V(5, 1.5)}},
		// Derived: the tip at (0, 2) lies 1 below the arc of radius 3 about the origin.
		{name: "tip to arc", r: region(t, halfDisc()), ok: true, width: 1, ends: []Vec{V(0, 2), V(0, 3)}},
		// Derived: a Ø3 hole at (5, 5) leaves 5 − 1.5 to the plate's left and bottom edges.
		{name: "web beside a hole", r: region(t, plate, Circle(V(5, 5), 1.5), shape(t, "12,4 13,4 13,6 12,6")),
			ok: true, width: 3.5},
		// Derived: holes of radius 1 with centres 4 apart leave a web of 2.
		{name: "web between holes", r: region(t, square, Circle(V(8, 10), 1), Circle(V(12, 10), 1)), ok: true,
			width: 2, ends: []Vec{V(9, 10), V(11, 10)}},
		// Derived: the lens shared by discs of radius 5 about (−3, 0) and 4 about (2, 0) is
		// 5 + 4 − 5 across; its tips are at x = 0.4, y = ±√13.44.
		{name: "lens", r: region(t, Contour{ArcThrough(V(0.4, -math.Sqrt(13.44)), V(2, 0), V(0.4, math.Sqrt(13.44))),
			ArcThrough(V(0.4, math.Sqrt(13.44)), V(-2, 0), V(0.4, -math.Sqrt(13.44)))}),
			ok: true, width: 4, ends: []Vec{V(-2, 0), V(2, 0)}},
		// Derived: the same with equal radii 5 about (±3, 0): 5 + 5 − 6 across, the middle of
		// the narrowest place on the line through the tips.
		{name: "even lens", r: region(t, Contour{ArcThrough(V(0, -4), V(2, 0), V(0, 4)), ArcThrough(V(0, 4), V(-2, 0), V(0, -4))}),
			ok: true, width: 4, ends: []Vec{V(-2, 0), V(2, 0)}},
		// Derived: walls 2e-6 rad off parallel (a corner 1e-5 out over 5) still face each other;
		// the narrowest place is measured at the middle of their common stretch, 4 + 0.5e-5.
		{name: "walls nearly parallel", r: region(t, shape(t, "0,0 5,0 5,4.00001 0,4")), ok: true, width: 4.000005},
		// Derived: a triangle narrows only into its corners.
		{name: "triangle", r: region(t, shape(t, "0,0 4,0 0,3")), ok: false},
		// Derived: nor does one with rounded corners (its altitudes are longer than any disc in it).
		{name: "rounded triangle", r: region(t, shape(t, "0,0@0.5 10,0@0.5 5,8@0.5")), ok: false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			g, ok := tc.r.NarrowestWidth()
			checkGap(t, tc, g, ok)
		})
	}
}

func TestNarrowestGap(t *testing.T) {
	plate := shape(t, "0,0 20,0 20,10 0,10")
	tests := []gapCase{
		// Derived: the notch is 5.4 − 4.6 wide.
		{name: "U with a notch 0.8", r: region(t, shape(t, "0,0 10,0 10,10 5.4,10 5.4,3 4.6,3 4.6,10 0,10")),
			ok: true, width: 0.8},
		// Derived: a Ø3 hole and a 1×2 hole; the narrower hole is 1 across.
		{name: "plate with two holes", r: region(t, plate, Circle(V(5, 5), 1.5), shape(t, "12,4 13,4 13,6 12,6")),
			ok: true, width: 1},
		// Derived: one Ø3 hole.
		{name: "plate with a round hole", r: region(t, plate, Circle(V(5, 5), 1.5)), ok: true, width: 3},
		// Derived: the tooth's tip at x = 5.7 stops 0.3 short of the notch's wall at x = 6.
		{name: "sharp tip at a wall", r: region(t, shape(t, "0,0 10,0 10,10 6,10 6,2 4,2 4,5 5.7,6 4,7 4,10 0,10")),
			ok: true, width: 0.3, ends: []Vec{V(5.7, 6), V(6, 6)}},
		// Derived: a notch 2 wide with a round bottom of radius 1.
		{name: "round-bottomed notch", r: region(t, shape(t, "0,0 10,0 10,10 6,10 6,2@1 4,2@1 4,10 0,10")),
			ok: true, width: 2},
		// Derived: a convex part has nothing facing across empty space.
		{name: "rectangle", r: region(t, plate), ok: false},
		{name: "circle", r: region(t, Circle(V(0, 0), 2)), ok: false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			g, ok := tc.r.NarrowestGap()
			checkGap(t, tc, g, ok)
		})
	}
}

func TestSharpestCorners(t *testing.T) {
	type want struct {
		ok            bool
		radius, angle float64 // angle in degrees, checked for sharp corners only
		at            Vec
	}
	lShape := "0,0 10,0 10,5 5,5 5,10 0,10"
	quarterMid := V(5+1.5-1.5/math.Sqrt2, 5+1.5-1.5/math.Sqrt2) // middle of the radius-1.5 inside corner
	tests := []struct {
		name             string
		r                Region
		concave, convex  want
		checkConvexPlace bool
	}{
		// Derived: an L cut from a 10×10 square has one 270° inside corner at (5, 5).
		{name: "L", r: region(t, shape(t, lShape)),
			concave: want{true, 0, 270, V(5, 5)}, convex: want{ok: true, angle: 90}},
		// Derived: the same corner rounded to 1.5.
		{name: "L rounded inside", r: region(t, shape(t, "0,0 10,0 10,5 5,5@1.5 5,10 0,10")),
			concave: want{true, 1.5, 0, quarterMid}, convex: want{ok: true, angle: 90}},
		// Derived: a dent of 203.5° and an inside corner of 270°: the 270° leaves less room.
		// The dent's slope 0.5/2 sharpens the corner at (0, 10) to 90° − atan(0.25), the one at
		// (5, 10) less, to 90° − atan(1/6).
		{name: "two reflex vertices", r: region(t, shape(t, "0,0 10,0 10,5 5,5 5,10 2,9.5 0,10")),
			concave: want{true, 0, 270, V(5, 5)},
			convex:  want{true, 0, 90 - math.Atan(0.25)*180/math.Pi, V(0, 10)}, checkConvexPlace: true},
		// Derived: a 3-4-5 triangle's sharpest corner is atan(3/4) at (4, 0).
		{name: "triangle", r: region(t, shape(t, "0,0 4,0 0,3")),
			concave: want{}, convex: want{true, 0, math.Atan2(3, 4) * 180 / math.Pi, V(4, 0)}, checkConvexPlace: true},
		// Derived: a joint turning by 4e-9 rad is smooth, not a corner; one turning by 4e-3 rad
		// (a dent of 0.01 over 5) is a corner of 180° + 2·atan(0.002). The slope sharpens the
		// corners at either end of the dented edge to 90° − atan(slope).
		{name: "nearly straight joint", r: region(t, shape(t, "0,0 5,0.00000001 10,0 10,5 0,5")),
			concave: want{}, convex: want{ok: true, angle: 90 - math.Atan(2e-9)*180/math.Pi}},
		{name: "shallow dent", r: region(t, shape(t, "0,0 5,0.01 10,0 10,5 0,5")),
			concave: want{true, 0, 180 + 2*math.Atan(0.002)*180/math.Pi, V(5, 0.01)},
			convex:  want{ok: true, angle: 90 - math.Atan(0.002)*180/math.Pi}},
		// Derived: a slot's ends are its tightest bends.
		{name: "slot", r: region(t, Capsule(V(0, 0), V(5, 0), 0.4)),
			concave: want{}, convex: want{ok: true, radius: 0.4}},
		// Derived: a hole of radius 1.5 bends away from the material; the plate's corners are 90°.
		// A full circle starts at angle 0, so its middle is opposite, at angle π.
		{name: "plate with a hole", r: region(t, shape(t, "0,0 20,0 20,10 0,10"), Circle(V(5, 5), 1.5)),
			concave: want{true, 1.5, 0, V(3.5, 5)}, convex: want{ok: true, angle: 90}},
		// Derived: rounded corners of radius 2 and a hole of radius 1.
		{name: "rounded plate with a hole", r: region(t, shape(t, "0,0@2 20,0@2 20,10@2 0,10@2"), Circle(V(5, 5), 1)),
			concave: want{true, 1, 0, V(4, 5)}, convex: want{ok: true, radius: 2}},
	}
	check := func(t *testing.T, kind string, c Corner, ok bool, w want, place bool) {
		t.Helper()
		if ok != w.ok {
			t.Fatalf("%s: ok: got %v (%+v), want %v", kind, ok, c, w.ok)
		}
		if !ok {
			return
		}
		approx(t, kind+" radius", c.Radius, w.radius, 1e-9)
		if w.radius == 0 {
			approx(t, kind+" angle", Angle(c.Angle).Degrees(), w.angle, 1e-9)
		}
		if place && c.At.Dist(w.at) > 1e-9 {
			t.Errorf("%s at: got %v, want %v", kind, c.At, w.at)
		}
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			c, ok := tc.r.SharpestConcaveCorner()
			check(t, "concave", c, ok, tc.concave, true)
			c, ok = tc.r.SharpestConvexCorner()
			check(t, "convex", c, ok, tc.convex, tc.checkConvexPlace)
		})
	}
}

// TestCornersIgnoreOrientation checks that a region given with its contours the wrong way
// round is measured as if normalized.
func TestCornersIgnoreOrientation(t *testing.T) {
	l := shape(t, "0,0 10,0 10,5 5,5 5,10 0,10")
	r := Region{Outer: l.Reverse()}
	c, ok := r.SharpestConcaveCorner()
	if !ok || !c.At.Near(V(5, 5)) {
		t.Errorf("got %+v %v, want the corner at (5, 5)", c, ok)
	}
	// Derived: the L's narrowest place is either arm, 5 wide.
	if g, ok := r.NarrowestWidth(); !ok || math.Abs(g.Width-5) > 1e-9 {
		t.Errorf("width: got %+v %v, want 5", g, ok)
	}
}

// TestRectangleAnyWayRound checks seeded random rectangles, turned and moved anywhere: the
// width is the shorter side (derived), there is no gap, and the corners are right angles.
func TestRectangleAnyWayRound(t *testing.T) {
	for seed := int64(1); seed <= 200; seed++ {
		rng := rand.New(rand.NewSource(seed))
		w, h := 0.01+50*rng.Float64(), 0.01+50*rng.Float64()
		c, err := Rect(V(0, 0), V(w, h), 0)
		if err != nil {
			t.Fatalf("seed %d: %v", seed, err)
		}
		tr := Rotate(Degrees(360 * rng.Float64())).Then(Translate(V(100*rng.Float64(), -100*rng.Float64())))
		r := NewRegion(c).Transform(tr)
		if g, ok := r.NarrowestWidth(); !ok || math.Abs(g.Width-math.Min(w, h)) > 1e-9 {
			t.Errorf("seed %d: %g×%g: width got %g (%v), want %g", seed, w, h, g.Width, ok, math.Min(w, h))
		}
		if g, ok := r.NarrowestGap(); ok {
			t.Errorf("seed %d: gap got %+v, want none", seed, g)
		}
		if k, ok := r.SharpestConvexCorner(); !ok || math.Abs(k.Angle-math.Pi/2) > 1e-9 {
			t.Errorf("seed %d: convex corner got %+v (%v), want 90°", seed, k, ok)
		}
	}
}

// TestNarrowestWidthProperties checks, over seeded random regions, what holds for every
// region: the narrowest place is a chord between boundary points, its disc lies in the region
// and so fits the bounding box, and it is no wider than the closest approach of two contours.
func TestNarrowestWidthProperties(t *testing.T) {
	for seed := int64(1); seed <= 300; seed++ {
		r := randomRegion(rand.New(rand.NewSource(seed)))
		g, ok := r.NarrowestWidth()
		if len(r.Holes) > 0 && !ok {
			t.Errorf("seed %d: a region with holes always has a narrowest place, got none", seed)
		}
		if !ok {
			continue
		}
		size := r.Bounds().Size()
		if g.Width <= 0 || g.Width > math.Min(size.X, size.Y)+1e-9 {
			t.Errorf("seed %d: width %g outside (0, %g]", seed, g.Width, math.Min(size.X, size.Y))
		}
		checkDisc(t, fmt.Sprintf("seed %d", seed), r, g, true)
		if sep, ok := separation(r); ok && g.Width > sep+1e-9 {
			t.Errorf("seed %d: width %g wider than the %g between two contours", seed, g.Width, sep)
		}
	}
}

// checkDisc checks that g is a chord between boundary points whose disc lies on the measured
// side (inside the region when in is set, else outside) without holding any boundary.
func checkDisc(t *testing.T, what string, r Region, g Gap, in bool) {
	t.Helper()
	approx(t, what+": |A−B|", g.A.Dist(g.B), g.Width, 1e-9)
	m := g.A.Lerp(g.B, 0.5)
	if r.Contains(m) != in {
		t.Errorf("%s: middle %v of the narrowest place: inside got %v, want %v", what, m, !in, in)
	}
	for _, p := range []Vec{g.A, g.B} {
		if d := boundaryDistance(r, p); d > 1e-9 {
			t.Errorf("%s: end %v lies %g off the boundary", what, p, d)
		}
	}
	if d := boundaryDistance(r, m); d < g.Width/2-1e-7 {
		t.Errorf("%s: boundary reaches %g into the disc of diameter %g", what, g.Width/2-d, g.Width)
	}
}

// boundaryDistance returns the distance from p to the nearest point of r's boundary.
func boundaryDistance(r Region, p Vec) float64 {
	d := math.Inf(1)
	for _, c := range r.Contours() {
		for _, s := range c {
			d = math.Min(d, s.DistanceTo(p))
		}
	}
	return d
}

// separation returns an upper bound on the closest approach of two different contours of r,
// from points spread along each contour, and false when r has a single contour.
func separation(r Region) (float64, bool) {
	cs := r.Contours()
	if len(cs) < 2 {
		return 0, false
	}
	best := math.Inf(1)
	for i, a := range cs {
		for _, s := range a {
			for k := 0; k <= 50; k++ {
				p := s.At(float64(k) / 50)
				for j, b := range cs {
					if j == i {
						continue
					}
					for _, u := range b {
						best = math.Min(best, u.DistanceTo(p))
					}
				}
			}
		}
	}
	return best, true
}

// TestNarrowestGapProperties checks over seeded random regions that the gap is a chord through
// empty space, and that it is the narrowest of what the outer contour and each hole give alone:
// nothing can face across material.
func TestNarrowestGapProperties(t *testing.T) {
	for seed := int64(1); seed <= 300; seed++ {
		r := randomRegion(rand.New(rand.NewSource(seed)))
		g, ok := r.NarrowestGap()
		if ok {
			checkDisc(t, fmt.Sprintf("seed %d", seed), r, g, false)
		}
		want, wantOK := NewRegion(r.Outer).NarrowestGap()
		for _, h := range r.Holes {
			if w, ok := NewRegion(h).NarrowestWidth(); ok && (!wantOK || w.Width < want.Width) {
				want, wantOK = w, true
			}
		}
		if ok != wantOK || (ok && math.Abs(g.Width-want.Width) > 1e-9) {
			t.Errorf("seed %d: got %g (%v), want the least of the parts alone %g (%v)",
				seed, g.Width, ok, want.Width, wantOK)
		}
	}
}

// TestMeasuresFollowTransforms checks that widths and gaps scale with the region and do not
// change when it is moved, turned or mirrored.
func TestMeasuresFollowTransforms(t *testing.T) {
	for seed := int64(1); seed <= 100; seed++ {
		rng := rand.New(rand.NewSource(seed))
		r := randomRegion(rng)
		turn := Degrees(360 * rng.Float64())
		tests := []struct {
			name string
			tr   Transform
			k    float64
		}{
			{"scale 2.5", Scale(2.5), 2.5},
			{"scale 0.1", Scale(0.1), 0.1},
			{"turn", Rotate(turn), 1},
			{"mirror", FlipX(), 1},
			{"move, turn, mirror", Translate(V(7, -3)).Then(Rotate(turn)).Then(FlipY()), 1},
		}
		w, wok := r.NarrowestWidth()
		g, gok := r.NarrowestGap()
		for _, tc := range tests {
			moved := r.Transform(tc.tr)
			w2, wok2 := moved.NarrowestWidth()
			g2, gok2 := moved.NarrowestGap()
			if wok2 != wok || math.Abs(w2.Width-tc.k*w.Width) > 1e-7*math.Max(1, tc.k*w.Width) {
				t.Errorf("seed %d, %s: width got %g (%v), want %g (%v)", seed, tc.name, w2.Width, wok2, tc.k*w.Width, wok)
			}
			if gok2 != gok || math.Abs(g2.Width-tc.k*g.Width) > 1e-7*math.Max(1, tc.k*g.Width) {
				t.Errorf("seed %d, %s: gap got %g (%v), want %g (%v)", seed, tc.name, g2.Width, gok2, tc.k*g.Width, gok)
			}
		}
	}
}

func ExampleRegion_NarrowestWidth() {
	slot := NewRegion(Capsule(V(0, 0), V(10, 0), 0.4))
	g, _ := slot.NarrowestWidth()
	c, _ := slot.SharpestConvexCorner()
	fmt.Printf("widest cutter %.2f, tightest bend radius %.2f\n", g.Width, c.Radius)
	// Output: widest cutter 0.80, tightest bend radius 0.40
}

func BenchmarkNarrowestWidth(b *testing.B) {
	for _, n := range []int{20, 200} {
		rng := rand.New(rand.NewSource(1))
		outer := randomStar(rng, V(0, 0), n, 20, 40)
		r := NewRegion(outer, Circle(V(2, 3), 2), randomStar(rng, V(-5, -4), 8, 1, 3))
		b.Run(fmt.Sprintf("%d vertices", n), func(b *testing.B) {
			for b.Loop() {
				r.NarrowestWidth()
			}
		})
	}
}
