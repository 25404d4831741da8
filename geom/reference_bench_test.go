//go:build reference

package geom

import (
	"fmt"
	"testing"

	"panto/internal/geosref"
)

// These benchmarks time geom and GEOS on the same inputs in the same run, so their ratio can
// be read off directly: `go test -tags reference -run '^$' -bench Reference ./geom`. GEOS
// gets its default of 8 chords per quarter circle; geom's joins are exact arcs. GEOS's times
// include copying the polygons in and out through cgo, as a caller of it would pay.

// refBenchQuadSegs is GEOS's default number of chords per quarter circle.
const refBenchQuadSegs = 8

func BenchmarkReferenceOffset(b *testing.B) {
	for _, n := range []int{1000, 10000, 100000} {
		r := benchStar(1, Vec{}, n, 20)
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
		rs := []Region{benchStar(1, Vec{}, n/2, 20), benchStar(2, V(6, 2), n/2, 20)}
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
