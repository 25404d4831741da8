//go:build reference

package geosref

import (
	"math"
	"strings"
	"testing"
)

// square returns the counter-clockwise square with lower-left corner (x, y) and side a.
func square(x, y, a float64) Polygon {
	return Polygon{Outer: [][2]float64{{x, y}, {x + a, y}, {x + a, y + a}, {x, y + a}}}
}

func TestBufferSquare(t *testing.T) {
	for _, tc := range []struct {
		name     string
		d        float64
		quadSegs int
		want     float64
	}{
		// Derived: a 90° corner gets quadSegs chords of π/(2q) each, every chord closing a
		// triangle of area d²/2·sin(π/(2q)) with the corner; the sides add 4ad.
		{"grow q=8", 1, 8, 100 + 40 + 2*8*math.Sin(math.Pi/16)},
		{"grow q=1", 2, 1, 100 + 80 + 2*1*4*math.Sin(math.Pi/2)},
		{"grow q=64", 0.5, 64, 100 + 20 + 2*64*0.25*math.Sin(math.Pi/128)},
		// Derived: eroding a square by r leaves the square of side a − 2r.
		{"shrink", -1, 8, 8 * 8},
		{"vanish", -6, 8, 0},
	} {
		t.Run(tc.name, func(t *testing.T) {
			ps, err := Buffer(square(0, 0, 10), tc.d, tc.quadSegs)
			if err != nil {
				t.Fatal(err)
			}
			if got := Area(ps); math.Abs(got-tc.want) > 1e-9 {
				t.Errorf("area: got %.12g, want %.12g", got, tc.want)
			}
		})
	}
}

func TestBooleans(t *testing.T) {
	a := []Polygon{square(0, 0, 10)}
	b := []Polygon{square(5, 5, 10)}
	far := []Polygon{square(20, 0, 1)}
	framed := Polygon{Outer: square(0, 0, 10).Outer, Holes: [][][2]float64{square(2, 2, 6).Outer}}
	for _, tc := range []struct {
		name      string
		op        func() ([]Polygon, error)
		wantArea  float64
		wantParts int
	}{
		// Derived: two 10 × 10 squares overlapping in a 5 × 5 square.
		{"union", func() ([]Polygon, error) { return Union(append(a, b...)...) }, 175, 1},
		{"union apart", func() ([]Polygon, error) { return Union(append(a, far...)...) }, 101, 2},
		{"difference", func() ([]Polygon, error) { return Difference(a, b) }, 75, 1},
		{"intersection", func() ([]Polygon, error) { return Intersection(a, b) }, 25, 1},
		{"intersection apart", func() ([]Polygon, error) { return Intersection(a, far) }, 0, 0},
		// Derived: a 10 × 10 frame around a 6 × 6 hole.
		{"hole", func() ([]Polygon, error) { return Union(framed) }, 64, 1},
	} {
		t.Run(tc.name, func(t *testing.T) {
			ps, err := tc.op()
			if err != nil {
				t.Fatal(err)
			}
			if got := Area(ps); math.Abs(got-tc.wantArea) > 1e-9 {
				t.Errorf("area: got %.12g, want %.12g", got, tc.wantArea)
			}
			if len(ps) != tc.wantParts {
				t.Errorf("polygons: got %d, want %d", len(ps), tc.wantParts)
			}
		})
	}
}

// TestBufferKeepsShallowDentWithLongEdges pins down the one input simplification GEOS makes
// before buffering that the reference tests' bound relies on: a corner on the far side from the
// growth that lies within |d|/100 of the chord past it is dropped only when it is also that close
// to the corner before it, so a shallow dent between long edges survives.
func TestBufferKeepsShallowDentWithLongEdges(t *testing.T) {
	dented := Polygon{Outer: [][2]float64{{0, 0}, {40, 0}, {40, 40}, {20, 39.95}, {0, 40}}}
	flat := square(0, 0, 40)
	const d = 10 // the dent, 0.05 deep, is within d/100 = 0.1 of the chord past it
	got, err := Buffer(dented, d, 8)
	if err != nil {
		t.Fatal(err)
	}
	want, err := Buffer(flat, d, 8)
	if err != nil {
		t.Fatal(err)
	}
	// Derived: the dent is a triangle of area 40 × 0.05 / 2 = 1; buffered, it leaves a notch
	// of about the same area, and far more than 0.5 less than the undented square's buffer.
	if a, b := Area(got), Area(want); b-a < 0.5 {
		t.Errorf("buffer of dented square: got area %.6g, want at least 0.5 below %.6g", a, b)
	}
}

func TestPerimeter(t *testing.T) {
	framed := Polygon{Outer: square(0, 0, 10).Outer, Holes: [][][2]float64{square(2, 2, 6).Outer}}
	// Derived: 4 × 10 around the outside plus 4 × 6 around the hole.
	if got := Perimeter([]Polygon{framed}); math.Abs(got-64) > 1e-12 {
		t.Errorf("perimeter: got %g, want 64", got)
	}
}

func TestErrors(t *testing.T) {
	bowtie := Polygon{Outer: [][2]float64{{0, 0}, {1, 1}, {1, 0}, {0, 1}}}
	if err := Validate(bowtie); err == nil || !strings.Contains(err.Error(), "invalid polygon") {
		t.Errorf("Validate(bowtie): got %v, want an invalid-polygon error", err)
	}
	if err := Validate(square(0, 0, 1)); err != nil {
		t.Errorf("Validate(square): got %v, want nil", err)
	}
	if _, err := Buffer(Polygon{Outer: [][2]float64{{0, 0}, {1, 0}}}, 1, 8); err == nil {
		t.Error("Buffer of a two-point ring: got no error, want one")
	}
	if _, err := Buffer(square(0, 0, 1), 1, 0); err == nil {
		t.Error("Buffer with quadSegs 0: got no error, want one")
	}
	if v := Version(); !strings.HasPrefix(v, "3.") {
		t.Errorf("Version: got %q, want 3.x", v)
	}
}
