package geom

import (
	"math"
	"math/rand"
	"testing"
)

// benchBlob returns a deterministic region with about n vertices: a wavy star-shaped outer
// contour holding nine tenths of them, with jitter of a quarter of the vertex spacing and
// every seventh corner rounded, and two smaller wavy holes sharing the rest.
func benchBlob(tb testing.TB, n int, jitter float64) Region {
	tb.Helper()
	rng := rand.New(rand.NewSource(int64(n)))
	wavy := func(c Vec, m int, r0 float64, ccw bool) Contour {
		pts := make([]Vec, m)
		radii := make([]float64, m)
		step := 2 * math.Pi / float64(m)
		for i := range pts {
			a := float64(i) * step
			r := r0 * (1 + 0.12*math.Sin(5*a) + 0.05*math.Sin(11*a+1))
			r += (rng.Float64() - 0.5) * jitter * r0 * step
			pts[i] = Polar(c, r, a)
			if i%7 == 0 {
				radii[i] = 0.1 * r0 * step
			}
		}
		ct, err := RoundedPolygon(pts, radii)
		if err != nil {
			tb.Fatal(err)
		}
		if !ccw {
			ct = ct.Reverse()
		}
		return ct
	}
	hole := max(4, n/20)
	return NewRegion(wavy(V(0, 0), n-2*hole, 30, true),
		wavy(V(-12, 0), hole, 5, false), wavy(V(12, 0), hole, 5, false))
}

// benchJagged returns a deterministic star-shaped polygon of n vertices about the origin with
// mean radius 20 and a few broad lobes, every vertex's radius jumping at random by up to half
// an edge length: a traced outline at its noisiest. Offset by many edge lengths, every raw
// curve of it overlaps hundreds of others.
func benchJagged(n int) Region {
	rng := rand.New(rand.NewSource(int64(n)))
	const r = 20
	edge := 2 * math.Pi * r / float64(n)
	pts := make([]Vec, n)
	for i := range pts {
		a := 2 * math.Pi * float64(i) / float64(n)
		rr := r*(1+0.15*math.Sin(5*a+1)) + edge*(rng.Float64()-0.5)
		pts[i] = Polar(Vec{}, rr, a)
	}
	return NewRegion(Polygon(pts...))
}

// benchmarkOffset grows and shrinks a wavy region (benchBlob) and a jagged one (benchJagged)
// of about n vertices by half a millimetre, a typical stylus compensation at a 10:1 ratio.
func benchmarkOffset(b *testing.B, n int) {
	for _, in := range []struct {
		name string
		r    Region
	}{{"wavy", benchBlob(b, n, 0.01)}, {"jagged", benchJagged(n)}} {
		b.Run(in.name, func(b *testing.B) { benchmarkOffsetOf(b, in.r) })
	}
}

// benchmarkOffsetOf grows and shrinks r by half a millimetre.
func benchmarkOffsetOf(b *testing.B, r Region) {
	for _, d := range []float64{0.5, -0.5} {
		name := "grow"
		if d < 0 {
			name = "shrink"
		}
		b.Run(name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if res := r.Offset(d); len(res.Regions) == 0 {
					b.Fatal("offset vanished")
				}
			}
		})
	}
}

func BenchmarkOffset1k(b *testing.B)   { benchmarkOffset(b, 1_000) }
func BenchmarkOffset10k(b *testing.B)  { benchmarkOffset(b, 10_000) }
func BenchmarkOffset100k(b *testing.B) { benchmarkOffset(b, 100_000) }
