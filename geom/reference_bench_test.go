//go:build reference

package geom

import (
	"fmt"
	"math"
	"math/rand"
	"testing"

	"panto/internal/geosref"
)

// These benchmarks time geom and GEOS on the same inputs in the same run, so their ratio can
// be read off directly: `go test -tags reference -run '^$' -bench Reference ./geom`. GEOS
// gets its default of 8 chords per quarter circle; geom's joins are exact arcs. GEOS's times
// include copying the polygons in and out through cgo, as a caller of it would pay.

// refBenchQuadSegs is GEOS's default number of chords per quarter circle.
const refBenchQuadSegs = 8

// refBenchStar returns a seeded star-shaped polygon of n vertices about c with mean radius r:
// a few broad lobes, each vertex's radius jittered by up to half an edge length, as a traced
// outline might be. Star-shaped about c, so it never crosses itself.
func refBenchStar(seed int64, c Vec, n int, r float64) Region {
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

func BenchmarkReferenceOffset(b *testing.B) {
	for _, n := range []int{1000, 10000, 100000} {
		r := refBenchStar(1, Vec{}, n, 20)
		p := toGEOS(r, refChordTol)
		for _, d := range []float64{0.5, -0.5} {
			name := fmt.Sprintf("n=%d/d=%g", n, d)
			b.Run(name+"/geom", func(b *testing.B) {
				for b.Loop() {
					if len(r.Offset(d).Regions) == 0 {
						b.Fatal("offset vanished")
					}
				}
			})
			b.Run(name+"/geos", func(b *testing.B) {
				for b.Loop() {
					if _, err := geosref.Buffer(p, d, refBenchQuadSegs); err != nil {
						b.Fatal(err)
					}
				}
			})
		}
	}
}

func BenchmarkReferenceUnion(b *testing.B) {
	for _, n := range []int{1000, 10000, 100000} {
		rs := []Region{refBenchStar(1, Vec{}, n/2, 20), refBenchStar(2, V(6, 2), n/2, 20)}
		ps := toGEOSAll(rs, refChordTol)
		name := fmt.Sprintf("n=%d", n)
		b.Run(name+"/geom", func(b *testing.B) {
			for b.Loop() {
				if len(Union(rs...)) != 1 {
					b.Fatal("the two stars should unite into one region")
				}
			}
		})
		b.Run(name+"/geos", func(b *testing.B) {
			for b.Loop() {
				if _, err := geosref.Union(ps...); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
