package pantograph

import (
	"math"
	"math/rand/v2"
	"slices"
	"testing"

	"panto/geom"
)

// bruteRoute returns the length of the shortest open path from start through every point,
// trying every order; for n ≤ 8 that is at most 40 320 orders.
func bruteRoute(start geom.Vec, pts []geom.Vec) float64 {
	idx := make([]int, len(pts))
	for i := range idx {
		idx[i] = i
	}
	best := math.Inf(1)
	var permute func(k int)
	permute = func(k int) {
		if k == len(idx) {
			best = math.Min(best, routeLength(start, pts, idx))
			return
		}
		for i := k; i < len(idx); i++ {
			idx[k], idx[i] = idx[i], idx[k]
			permute(k + 1)
			idx[k], idx[i] = idx[i], idx[k]
		}
	}
	permute(0)
	return best
}

func grid(nx, ny int, pitch float64) []geom.Vec {
	var pts []geom.Vec
	for j := 0; j < ny; j++ {
		for i := 0; i < nx; i++ {
			pts = append(pts, geom.V(float64(i)*pitch, float64(j)*pitch))
		}
	}
	return pts
}

// shuffled returns pts in an order fixed by seed.
func shuffled(pts []geom.Vec, seed int64) []geom.Vec {
	out := slices.Clone(pts)
	rand.New(rand.NewPCG(uint64(seed), 0)).Shuffle(len(out), func(i, j int) { out[i], out[j] = out[j], out[i] })
	return out
}

func TestRouteKnownOptimum(t *testing.T) {
	circle := make([]geom.Vec, 8)
	for i := range circle {
		circle[i] = geom.Polar(geom.V(0, 0), 10, float64(i)*math.Pi/4)
	}
	tests := []struct {
		name  string
		start geom.Vec
		pts   []geom.Vec
		want  float64
	}{
		// derived: every move between distinct grid points is at least one pitch, and a
		// serpentine makes n − 1 moves of one pitch; starting off the grid adds the first leg.
		{"2x4 grid from a corner", geom.V(0, 0), shuffled(grid(4, 2, 5), 1), 7 * 5},
		{"3x3 grid from a corner", geom.V(0, 0), shuffled(grid(3, 3, 5), 2), 8 * 5},
		{"3x3 grid from beside it", geom.V(-5, 0), shuffled(grid(3, 3, 5), 3), 9 * 5},
		// derived: points on a line from one end cost the span.
		{"line from its end", geom.V(0, 0), shuffled([]geom.Vec{geom.V(7, 0), geom.V(1, 0), geom.V(3, 0), geom.V(12, 0), geom.V(5, 0)}, 4), 12},
		// derived: from the centre out to one point, then round seven chords of 2r·sin(π/8).
		{"circle from its centre", geom.V(0, 0), shuffled(circle, 5), 10 + 7*20*math.Sin(math.Pi/8)},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got := routeLength(tc.start, tc.pts, route(tc.start, tc.pts))
			if !near(got, tc.want, 1e-9) {
				t.Fatalf("got %v, want %v", got, tc.want)
			}
			if len(tc.pts) <= 9 {
				if b := bruteRoute(tc.start, tc.pts); !near(b, tc.want, 1e-9) {
					t.Fatalf("brute force gives %v, the derived optimum is %v", b, tc.want)
				}
			}
		})
	}
}

func TestRouteNeverLongerThanGiven(t *testing.T) {
	for seed := int64(0); seed < 300; seed++ {
		rng := rand.New(rand.NewPCG(uint64(seed), 0))
		n := 1 + rng.IntN(40)
		pts := make([]geom.Vec, n)
		for i := range pts {
			pts[i] = randVec(rng, 100)
			if i > 0 && rng.IntN(8) == 0 {
				pts[i] = pts[i-1] // a repeated seat
			}
		}
		start := randVec(rng, 100)
		given := make([]int, n)
		for i := range given {
			given[i] = i
		}
		order := route(start, pts)
		sorted := slices.Sorted(slices.Values(order))
		if !slices.Equal(sorted, given) {
			t.Fatalf("seed %d: route %v is not a permutation of 0..%d", seed, order, n-1)
		}
		got, was := routeLength(start, pts, order), routeLength(start, pts, given)
		if got > was+1e-9 {
			t.Fatalf("seed %d: route %v long, the given order %v", seed, got, was)
		}
		if n <= 7 {
			if b := bruteRoute(start, pts); got < b-1e-9 {
				t.Fatalf("seed %d: route %v shorter than the brute-force optimum %v", seed, got, b)
			}
		}
	}
}

func TestRouteEmptyAndOne(t *testing.T) {
	if got := route(geom.V(0, 0), nil); len(got) != 0 {
		t.Fatalf("got %v, want no route", got)
	}
	if got := route(geom.V(0, 0), []geom.Vec{geom.V(1, 1)}); !slices.Equal(got, []int{0}) {
		t.Fatalf("got %v, want [0]", got)
	}
}

func BenchmarkRoute200(b *testing.B) {
	rng := rand.New(rand.NewPCG(1, 0))
	pts := make([]geom.Vec, 200)
	for i := range pts {
		pts[i] = randVec(rng, 100)
	}
	for b.Loop() {
		route(geom.V(0, 0), pts)
	}
}
