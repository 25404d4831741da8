package geom

import (
	"errors"
	"math"
	"math/rand"
	"testing"
)

func TestShapeAreas(t *testing.T) {
	rect := func(w, h, r float64) Contour {
		c, err := Rect(Vec{1, 2}, Vec{w, h}, r)
		if err != nil {
			t.Fatal(err)
		}
		return c
	}
	tests := []struct {
		name       string
		c          Contour
		area, perm float64
	}{
		// Derived: a rectangle w×h with corners of radius r loses (4 − π)r².
		{"sharp rectangle", rect(14, 8, 0), 112, 44},
		{"rounded rectangle", rect(14, 8, 1.5), 112 - (4-math.Pi)*2.25, 44 - 8*1.5 + 2*math.Pi*1.5},
		{"circle", Circle(Vec{3, 4}, 2), 4 * math.Pi, 4 * math.Pi},
		// Derived: a stadium is a 2r × L rectangle plus a disc.
		{"capsule", Capsule(Vec{0, 0}, Vec{3, 4}, 0.5), 5*1 + math.Pi*0.25, 10 + math.Pi},
		{"triangle", shape(t, "0,0 4,0 0,3"), 6, 12},
		{"clockwise square", shape(t, "0,0 0,2 2,2 2,0"), -4, 8},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if err := tc.c.Validate(); err != nil {
				t.Fatalf("Validate: %v", err)
			}
			approx(t, "area", tc.c.Area(), tc.area, 1e-9)
			approx(t, "perimeter", tc.c.Perimeter(), tc.perm, 1e-9)
		})
	}
}

func TestArcThroughAndBounds(t *testing.T) {
	s := ArcThrough(V(1, 0), V(0, 1), V(-1, 0))
	approx(t, "sweep", s.Sweep, math.Pi, 1e-12)
	approx(t, "radius", s.Radius(), 1, 1e-12)
	b := s.Bounds()
	approx(t, "top", b.Max.Y, 1, 1e-12)
	approx(t, "bottom", b.Min.Y, 0, 1e-12)
	// Rounding puts (35.3, 34.7) a hair off the line x + y = 70; it is still a line.
	if l := ArcThrough(V(40, 30), V(35.3, 34.7), V(30, 40)); l.IsArc() {
		t.Errorf("collinear points: got %v, want a line", l)
	}
	cw := ArcThrough(V(1, 0), V(0, -1), V(-1, 0))
	approx(t, "clockwise sweep", cw.Sweep, -math.Pi, 1e-12)
	approx(t, "clockwise bottom", cw.Bounds().Min.Y, -1, 1e-12)
}

func TestContains(t *testing.T) {
	outer := shape(t, "0,0 20,0 20,10@3 0,10")
	r := NewRegion(outer, Circle(V(5, 5), 2))
	tests := []struct {
		p    Vec
		want bool
	}{
		{V(1, 1), true}, {V(5, 5), false}, {V(5, 3), true}, // on the hole's edge
		{V(0, 5), true}, {V(-0.1, 5), false}, {V(19.9, 9.9), false}, // cut off by the rounding
		{V(19, 8), true}, {V(21, 5), false},
	}
	for _, tc := range tests {
		if got := r.Contains(tc.p); got != tc.want {
			t.Errorf("Contains(%v): got %v, want %v", tc.p, got, tc.want)
		}
	}
}

func TestContainsOnArcChord(t *testing.T) {
	// A lens of two radius-5 arcs about (±3, 0): its corners are (0, ±4) and its centre lies
	// on both arcs' chords (derived: 5² − 3² = 4²).
	lens := Contour{ArcFrom(V(0, -4), V(-3, 0), 2*math.Atan2(4, 3)), ArcFrom(V(0, 4), V(3, 0), 2*math.Atan2(4, 3))}
	if err := lens.Validate(); err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct {
		p    Vec
		want bool
	}{{V(0, 0), true}, {V(0, 3.9), true}, {V(1.9, 0), true}, {V(2.1, 0), false}, {V(0, 4.1), false}} {
		if got := lens.Contains(tc.p); got != tc.want {
			t.Errorf("Contains(%v): got %v, want %v", tc.p, got, tc.want)
		}
		if got := lens.Reverse().Contains(tc.p); got != tc.want {
			t.Errorf("reversed Contains(%v): got %v, want %v", tc.p, got, tc.want)
		}
	}
}

func TestWindingMatchesAreaSign(t *testing.T) {
	rng := rand.New(rand.NewSource(7))
	for k := 0; k < 50; k++ {
		c := randomStar(rng, V(0, 0), 4+rng.Intn(10), 5, 10)
		if got := c.Winding(V(0, 0)); got != 1 {
			t.Fatalf("seed 7 case %d: winding about the star's centre: got %d, want 1", k, got)
		}
		if got := c.Reverse().Winding(V(0, 0)); got != -1 {
			t.Fatalf("seed 7 case %d: reversed winding: got %d, want -1", k, got)
		}
		if got := c.Winding(V(50, 0)); got != 0 {
			t.Fatalf("seed 7 case %d: winding outside: got %d, want 0", k, got)
		}
	}
}

func TestTransforms(t *testing.T) {
	c := shape(t, "0,0 4,0 4,2@1 0,2")
	tests := []struct {
		name     string
		tr       Transform
		area     float64
		corner   Vec // where the point (4, 0) lands
		mirrored bool
	}{
		{"translate", Translate(V(1, 2)), c.Area(), V(5, 2), false},
		{"scale 10", Scale(10), 100 * c.Area(), V(40, 0), false},
		{"turn 90°", Rotate(Degrees(90)), c.Area(), V(0, 4), false},
		{"turn 180°", Rotate(Degrees(180)), c.Area(), V(-4, 0), false},
		{"flip x", FlipX(), -c.Area(), V(-4, 0), true},
		{"flip y then scale", FlipY().Then(Scale(2)), -4 * c.Area(), V(8, 0), true},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got := c.Transform(tc.tr)
			approx(t, "area", got.Area(), tc.area, 1e-9)
			p := tc.tr.Apply(V(4, 0))
			if !p.Near(tc.corner) {
				t.Errorf("corner: got %v, want %v", p, tc.corner)
			}
			if tc.tr.Mirrors() != tc.mirrored {
				t.Errorf("Mirrors: got %v, want %v", tc.tr.Mirrors(), tc.mirrored)
			}
			reg := NewRegion(c).Transform(tc.tr)
			if !reg.Outer.IsCCW() {
				t.Errorf("region outer contour not counter-clockwise after transform")
			}
		})
	}
}

func TestChordCount(t *testing.T) {
	// Derived (sagitta): a full circle needs ⌈π / acos(1 − t/r)⌉ chords: 23 for t/r = 0.01 and
	// 71 for t/r = 0.001.
	tests := []struct {
		r, tol float64
		want   int
	}{{1, 0.01, 23}, {1, 0.001, 71}, {10, 0.01, 71}}
	for _, tc := range tests {
		pts := Circle(V(0, 0), tc.r).Flatten(tc.tol)
		if len(pts) != tc.want {
			t.Errorf("r=%g tol=%g: got %d chords, want %d", tc.r, tc.tol, len(pts), tc.want)
		}
		for i := range pts {
			mid := pts[i].Lerp(pts[(i+1)%len(pts)], 0.5)
			if sag := tc.r - mid.Len(); sag > tc.tol+1e-12 {
				t.Errorf("r=%g tol=%g: chord %d strays %g", tc.r, tc.tol, i, sag)
			}
		}
	}
}

func TestValidateErrors(t *testing.T) {
	tests := []struct {
		name string
		r    Region
		want error
	}{
		{"bow tie", NewRegion(Polygon(V(0, 0), V(2, 2), V(2, 0), V(0, 2))), ErrSelfCrossing},
		{"zero length", Region{Outer: Contour{Line(V(0, 0), V(1, 0)), Line(V(1, 0), V(1, 0)),
			Line(V(1, 0), V(0, 1)), Line(V(0, 1), V(0, 0))}}, ErrZeroLength},
		{"gap", Region{Outer: Contour{Line(V(0, 0), V(1, 0)), Line(V(1, 0), V(0, 1)),
			Line(V(0, 1), V(0, 0.1))}}, ErrNotClosed},
		{"NaN", NewRegion(Polygon(V(0, 0), V(math.NaN(), 0), V(0, 1))), ErrNotFinite},
		{"hole outside", NewRegion(shape(t, "0,0 4,0 4,4 0,4"), Circle(V(10, 10), 1)), ErrHoleOutside},
		{"hole crossing", NewRegion(shape(t, "0,0 4,0 4,4 0,4"), Circle(V(4, 2), 1)), ErrHoleCrossing},
		{"holes crossing", NewRegion(shape(t, "0,0 9,0 9,9 0,9"), Circle(V(4, 4), 1), Circle(V(5, 4), 1)), ErrHoleCrossing},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			err := tc.r.Validate()
			if !errors.Is(err, tc.want) {
				t.Errorf("got %v, want %v", err, tc.want)
			}
		})
	}
	if err := NewRegion(shape(t, "0,0 9,0 9,9@2 0,9"), Circle(V(4, 4), 1)).Validate(); err != nil {
		t.Errorf("good region: %v", err)
	}
}

func TestRoundedPolygonTooTight(t *testing.T) {
	if _, err := RoundedPolygon([]Vec{V(0, 0), V(1, 0), V(1, 1), V(0, 1)}, []float64{0, 0.8, 0.8, 0}); err == nil {
		t.Error("two radius-0.8 corners on a 1 mm edge: got no error")
	}
}
