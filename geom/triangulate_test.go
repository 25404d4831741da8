package geom

import (
	"errors"
	"fmt"
	"math"
	"math/rand"
	"testing"
)

// checkTriangulation fails the test unless tris cover rings exactly: every triangle turns left,
// the areas add up to the polygon's, and the free edges are exactly the ring edges.
func checkTriangulation(t *testing.T, rings [][]Vec, tris [][3]int32) {
	t.Helper()
	var pts []Vec
	want := 0.0
	ringEdge := map[edgeKey]bool{}
	for _, r := range rings {
		base := int32(len(pts))
		pts = append(pts, r...)
		want += ringArea(r)
		for k := range r {
			ringEdge[edgeKey{base + int32(k), base + int32((k+1)%len(r))}] = true
		}
	}
	got := 0.0
	use := map[edgeKey]int{}
	for _, tr := range tris {
		a := orient(pts[tr[0]], pts[tr[1]], pts[tr[2]]) / 2
		if a <= 0 {
			t.Errorf("triangle %v has area %g, want > 0", tr, a)
		}
		got += a
		for k := range 3 {
			use[edgeKey{tr[k], tr[(k+1)%3]}]++
		}
	}
	approx(t, "area", got, want, 1e-9*math.Abs(want))
	for e := range ringEdge {
		if use[e] != 1 {
			t.Errorf("ring edge %v used %d times, want 1", e, use[e])
		}
	}
	for e, n := range use {
		if !ringEdge[e] && (n != 1 || use[edgeKey{e.b, e.a}] != 1) {
			t.Errorf("inner edge %v used %d times, reversed %d times, want 1 and 1", e, n, use[edgeKey{e.b, e.a}])
		}
	}
}

func TestTriangulate(t *testing.T) {
	square := func(x, y, s float64) []Vec { return []Vec{{x, y}, {x + s, y}, {x + s, y + s}, {x, y + s}} }
	cw := func(r []Vec) []Vec {
		out := make([]Vec, len(r))
		for i, p := range r {
			out[len(r)-1-i] = p
		}
		return out
	}
	tests := []struct {
		name  string
		rings [][]Vec
		holes int
	}{
		{"triangle", [][]Vec{{{0, 0}, {1, 0}, {0, 1}}}, 0},
		{"square", [][]Vec{square(0, 0, 10)}, 0},
		{"L shape", [][]Vec{{{0, 0}, {10, 0}, {10, 2}, {2, 2}, {2, 10}, {0, 10}}}, 0},
		{"square with a hole", [][]Vec{square(0, 0, 10), cw(square(3, 3, 4))}, 1},
		{"hole level with corners", [][]Vec{square(0, 0, 10), cw(square(2, 2, 2)), cw(square(6, 2, 2)), cw(square(2, 6, 2))}, 3},
		// Points on the straight edges of the outer square, in line with the hole's corners:
		// the cutting leaves three-point remnants on those runs, which must be split in.
		{"collinear runs", [][]Vec{{{0, 0}, {3, 0}, {7, 0}, {10, 0}, {10, 3}, {10, 7}, {10, 10}, {7, 10}, {3, 10}, {0, 10}, {0, 7}, {0, 3}}, cw(square(3, 3, 4))}, 1},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			var rings [][]Vec
			n := 0
			for _, r := range tc.rings {
				if len(r) > 0 {
					rings = append(rings, r)
					n += len(r)
				}
			}
			tris, err := Triangulate(rings)
			if err != nil {
				t.Fatal(err)
			}
			checkTriangulation(t, rings, tris)
			// derived: a triangulation of a polygon with n corners and h holes, without added
			// points, has n + 2h − 2 triangles (Euler's formula).
			if got, want := len(tris), n+2*tc.holes-2; got != want {
				t.Errorf("triangles: got %d, want %d", got, want)
			}
		})
	}
}

func TestTriangulateRejects(t *testing.T) {
	if _, err := Triangulate([][]Vec{{{0, 0}, {1, 1}}}); !errors.Is(err, ErrTriangulate) {
		t.Errorf("two points: got %v, want ErrTriangulate", err)
	}
}

// TestTriangulateGridOfHoles cuts a plate with many round holes, large enough to use the
// Z-order index.
func TestTriangulateGridOfHoles(t *testing.T) {
	rings := [][]Vec{{{0, 0}, {100, 0}, {100, 100}, {0, 100}}}
	for i := range 9 {
		for j := range 9 {
			c := Circle(Vec{float64(10 + 10*i), float64(10 + 10*j)}, 3).Reverse()
			rings = append(rings, c.Flatten(0.01))
		}
	}
	tris, err := Triangulate(rings)
	if err != nil {
		t.Fatal(err)
	}
	checkTriangulation(t, rings, tris)
}

// TestTriangulateRandom cuts seeded random regions with holes, flattened.
func TestTriangulateRandom(t *testing.T) {
	for seed := int64(1); seed <= 300; seed++ {
		t.Run(fmt.Sprint("seed ", seed), func(t *testing.T) {
			r := randomRegion(rand.New(rand.NewSource(seed)))
			rings := [][]Vec{ringPoints(r.Outer, 0.01)}
			for _, h := range r.Holes {
				rings = append(rings, ringPoints(h, 0.01))
			}
			tris, err := Triangulate(rings)
			if err != nil {
				t.Fatalf("seed %d: %v", seed, err)
			}
			checkTriangulation(t, rings, tris)
			if t.Failed() {
				t.Logf("seed %d", seed)
			}
		})
	}
}

// TestTriangulateAligned cuts seeded random plates whose holes line up exactly: rectangles and
// capsules on a grid, so many edges of different holes lie on one line. Ear cutting leaves
// slivers along such lines, which the repair must mend.
func TestTriangulateAligned(t *testing.T) {
	for seed := int64(1); seed <= 150; seed++ {
		t.Run(fmt.Sprint("seed ", seed), func(t *testing.T) {
			rng := rand.New(rand.NewSource(seed))
			n := 2 + rng.Intn(6)
			rings := [][]Vec{{{0, 0}, {float64(10 * n), 0}, {float64(10 * n), float64(10 * n)}, {0, float64(10 * n)}}}
			for i := range n {
				for j := range n {
					x, y := float64(10*i+2), float64(10*j+2)
					var c Contour
					switch rng.Intn(3) {
					case 0:
						c, _ = Rect(V(x, y), V(6, 3+float64(rng.Intn(2))), 0)
					case 1:
						c = Capsule(V(x+1, y+1), V(x+5, y+1), 1)
					default:
						continue
					}
					rings = append(rings, ringPoints(c.Reverse(), 0.01))
				}
			}
			tris, err := Triangulate(rings)
			if err != nil {
				t.Fatalf("seed %d: %v", seed, err)
			}
			checkTriangulation(t, rings, tris)
			if t.Failed() {
				t.Logf("seed %d", seed)
			}
		})
	}
}
