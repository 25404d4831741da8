package geom

import (
	"fmt"
	"math"
	"math/rand"
	"testing"
)

// benchStar returns a wavy star-shaped polygon of n vertices about c: radius r with a few
// broad lobes, each vertex jittered by about one edge length. Fixed seeds keep it the same
// from run to run.
func benchStar(seed int64, c Vec, n int, r float64) Region {
	rng := rand.New(rand.NewSource(seed))
	lobes, phase := 3+rng.Intn(5), 2*math.Pi*rng.Float64()
	edge := 2 * math.Pi * r / float64(n)
	pts := make([]Vec, n)
	for i := range pts {
		a := 2 * math.Pi * float64(i) / float64(n)
		rr := r*(1+0.15*math.Sin(float64(lobes)*a+phase)) + edge*(rng.Float64()-0.5)
		pts[i] = Polar(c, rr, a)
	}
	return NewRegion(Polygon(pts...))
}

// benchDiscs returns n discs of radius 1 on a square grid 1.3 apart, close enough that
// neighbours overlap and no gap is left between four of them (1.3/√2 < 1).
func benchDiscs(n int) []Region {
	side := int(math.Ceil(math.Sqrt(float64(n))))
	rs := make([]Region, 0, n)
	for i := 0; i < n; i++ {
		rs = append(rs, NewRegion(Circle(V(1.3*float64(i%side), 1.3*float64(i/side)), 1)))
	}
	return rs
}

// benchFeatures returns n small rounded squares (8 segments each) scattered at random over a
// plate large enough that most stand alone and some overlap, as on a busy template plate.
func benchFeatures(n int) []Region {
	rng := rand.New(rand.NewSource(3))
	w := 4 * math.Sqrt(float64(n))
	rs := make([]Region, 0, n)
	for i := 0; i < n; i++ {
		c, err := Rect(V(w*rng.Float64(), w*rng.Float64()), V(2, 2), 0.4)
		if err != nil {
			panic(err)
		}
		rs = append(rs, NewRegion(c))
	}
	return rs
}

func BenchmarkUnion(b *testing.B) {
	for _, n := range []int{1000, 10000, 100000} {
		stars := []Region{benchStar(1, V(0, 0), n/2, 20), benchStar(2, V(6, 2), n/2, 20)}
		b.Run(fmt.Sprintf("two-stars-%dv", n), func(b *testing.B) {
			for b.Loop() {
				Union(stars...)
			}
		})
		discs := benchDiscs(n)
		b.Run(fmt.Sprintf("disc-grid-%dv", n), func(b *testing.B) {
			for b.Loop() {
				Union(discs...)
			}
		})
		feats := benchFeatures(n / 8)
		b.Run(fmt.Sprintf("scattered-features-%dv", n), func(b *testing.B) {
			for b.Loop() {
				Union(feats...)
			}
		})
	}
}

func BenchmarkDifference(b *testing.B) {
	for _, n := range []int{1000, 10000, 100000} {
		plate, err := Rect(V(-10, -10), V(4*math.Sqrt(float64(n/8))+20, 4*math.Sqrt(float64(n/8))+20), 0)
		if err != nil {
			b.Fatal(err)
		}
		a := []Region{NewRegion(plate)}
		feats := benchFeatures(n / 8)
		b.Run(fmt.Sprintf("plate-less-features-%dv", n), func(b *testing.B) {
			for b.Loop() {
				Difference(a, feats)
			}
		})
	}
}
