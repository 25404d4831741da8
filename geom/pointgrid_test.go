package geom

import (
	"math"
	"math/rand"
	"slices"
	"testing"
)

// visited returns the numbers near(p) offers, in the order offered.
func visited(g *pointGrid, p Vec) []int {
	var out []int
	g.near(p, func(i int) bool {
		out = append(out, i)
		return true
	})
	return out
}

func TestPointGridNear(t *testing.T) {
	// Cells 1 wide, reach 0.25: a point looks past a side only within 0.275 of it.
	pts := []Vec{V(0.5, 0.5), V(0.6, 0.4), V(1.1, 0.5), V(0.5, 1.1), V(1.1, 1.1), V(3, 3)}
	tests := []struct {
		name string
		p    Vec
		want []int
	}{
		{"middle of a cell: that cell alone, newest first", V(0.5, 0.5), []int{1, 0}},
		{"near the right side: the cell to the right too", V(0.9, 0.5), []int{1, 0, 2}},
		{"near the top right corner: four cells, by x then y", V(0.9, 0.9), []int{1, 0, 3, 2, 4}},
		{"just over the side, looking back", V(1.05, 0.5), []int{1, 0, 2}},
		{"an empty cell", V(2.5, 2.5), nil},
		{"a corner of an empty cell looks back", V(2, 2), []int{4}},
		{"far away", V(-50, 70), nil},
	}
	g := newPointGrid(1, 0.25, 0)
	for i, p := range pts {
		if got := g.add(p); got != i {
			t.Fatalf("add %v: got number %d, want %d", p, got, i)
		}
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got := visited(g, tc.p); !slices.Equal(got, tc.want) {
				t.Errorf("got %v, want %v", got, tc.want)
			}
		})
	}
}

func TestPointGridStops(t *testing.T) {
	g := newPointGrid(1, 1, 0)
	for k := 0; k < 5; k++ {
		g.add(V(0.5, 0.5))
	}
	n := 0
	g.near(V(0.5, 0.5), func(int) bool {
		n++
		return n < 2
	})
	if n != 2 {
		t.Errorf("got %d visits, want 2", n)
	}
}

func TestPointGridFindsAllWithinReach(t *testing.T) {
	// Property: near offers every point within reach, whatever the cells' size, including
	// points on and just across cell sides.
	tests := []struct {
		name        string
		cell, reach float64
	}{
		{"cells as wide as the reach", 1e-6, 1e-6},
		{"cells sixteen times the reach", 16e-7, 1e-7},
		{"a user tolerance", 0.001, 0.001},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			rng := rand.New(rand.NewSource(3))
			g := newPointGrid(tc.cell, tc.reach, 0)
			var pts []Vec
			for k := 0; k < 2000; k++ {
				// Points a few reaches apart near cell corners, where misses would be.
				c := V(float64(rng.Intn(20))*tc.cell, float64(rng.Intn(20))*tc.cell)
				p := c.Add(V(rng.NormFloat64()*tc.reach, rng.NormFloat64()*tc.reach))
				want := map[int]bool{}
				for i, q := range pts {
					if q.Dist(p) <= tc.reach {
						want[i] = true
					}
				}
				for _, i := range visited(g, p) {
					delete(want, i)
				}
				if len(want) > 0 {
					t.Fatalf("seed 3, point %d %v: missed %v", k, p, want)
				}
				pts = append(pts, p)
				g.add(p)
			}
		})
	}
}

func TestPointGridFarCoordinates(t *testing.T) {
	// Coordinates beyond the int64 range of cells share the end cells instead of wrapping.
	g := newPointGrid(1e-7, 1e-7, 0)
	far := []Vec{V(1e300, 0), V(-1e300, 0), V(math.Inf(1), 5)}
	for _, p := range far {
		g.add(p)
	}
	tests := []struct {
		name string
		p    Vec
		want []int
	}{
		{"far right", V(1e300, 0), []int{0}},
		{"far left", V(-1e300, 0), []int{1}},
		{"the origin", V(0, 0), nil},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got := visited(g, tc.p); !slices.Equal(got, tc.want) {
				t.Errorf("got %v, want %v", got, tc.want)
			}
		})
	}
}
