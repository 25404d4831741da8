package geom

import (
	"math"
	"math/rand"
	"testing"
)

// jaggedRegion returns a seeded star-shaped polygon of n vertices about the origin whose radius
// jumps at random by up to jump times an edge length at every vertex, with up to one jagged
// hole: the dense, noisy outlines the prefilter is for.
func jaggedRegion(rng *rand.Rand, n int, jump float64) Region {
	return jaggedRounded(rng, n, jump, 0)
}

// jaggedRounded is jaggedRegion with every third corner rounded with radius round times an
// edge length, so that the raw curves meet arcs of the outline as well as lines.
func jaggedRounded(rng *rand.Rand, n int, jump, round float64) Region {
	star := func(c Vec, m int, r float64) Contour {
		edge := 2 * math.Pi * r / float64(m)
		lobes, phase := 2+rng.Intn(5), 2*math.Pi*rng.Float64()
		pts := make([]Vec, m)
		radii := make([]float64, m)
		for i := range pts {
			a := 2 * math.Pi * float64(i) / float64(m)
			rr := r*(1+0.15*math.Sin(float64(lobes)*a+phase)) + jump*edge*(rng.Float64()-0.5)
			pts[i] = Polar(c, rr, a)
			if i%3 == 0 {
				radii[i] = round * edge
			}
		}
		ct, err := RoundedPolygon(pts, radii)
		if err != nil {
			panic(err) // the radii are far below what any corner allows
		}
		return ct
	}
	if rng.Intn(2) == 0 {
		return NewRegion(star(Vec{}, n, 20))
	}
	return NewRegion(star(Vec{}, n, 20), star(V(4, 1), n/4, 3).Reverse())
}

// holeCount returns how many holes rs have in all.
func holeCount(rs []Region) int {
	n := 0
	for _, r := range rs {
		n += len(r.Holes)
	}
	return n
}

// samePrefiltered fails the test unless offsetting r by d gives the same answer with the
// prefilter as without: same number of regions and holes, same area to 1e-9 relative, every
// piece closed into a loop.
func samePrefiltered(t *testing.T, label string, r Region, d float64) {
	t.Helper()
	got, open := r.offsetWith(d, true)
	want, _ := r.offsetWith(d, false)
	if open != 0 {
		t.Errorf("%s, d %g: %d pieces left out of every loop", label, d, open)
	}
	if len(got.Regions) != len(want.Regions) || holeCount(got.Regions) != holeCount(want.Regions) {
		t.Errorf("%s, d %g: got %d regions with %d holes, want %d with %d", label, d,
			len(got.Regions), holeCount(got.Regions), len(want.Regions), holeCount(want.Regions))
	}
	ga, wa := summedArea(got.Regions), summedArea(want.Regions)
	// Derived: the prefilter removes only points off the offset, so the two answers are the
	// same region; 1e-9 relative allows for the rounding of the areas' sums.
	if math.Abs(ga-wa) > 1e-9*math.Max(math.Abs(wa), 1) {
		t.Errorf("%s, d %g: area with the prefilter %.15g, want %.15g", label, d, ga, wa)
	}
	if !sameRefs(got.Vanished, want.Vanished) || !sameRefs(got.Split, want.Split) ||
		!sameRefs(got.Merged, want.Merged) {
		t.Errorf("%s, d %g: fates %v %v %v, want %v %v %v", label, d, got.Vanished, got.Split,
			got.Merged, want.Vanished, want.Split, want.Merged)
	}
}

func TestPrefilterKeepsOffset(t *testing.T) {
	ds := []float64{-4, -1.5, -0.5, -0.05, 0.05, 0.5, 1.5, 9}
	for seed := int64(1); seed <= 40; seed++ {
		rng := rand.New(rand.NewSource(seed))
		label := "seed " + seedText(seed)
		for _, d := range ds {
			samePrefiltered(t, label+" random", randomRegion(rng), d)
		}
		jr := jaggedRegion(rng, 300+rng.Intn(500), 1+3*rng.Float64())
		for _, d := range ds {
			samePrefiltered(t, label+" jagged", jr, d)
		}
		rr := jaggedRounded(rng, 300+rng.Intn(500), 1+3*rng.Float64(), 0.02+0.1*rng.Float64())
		for _, d := range ds {
			samePrefiltered(t, label+" jagged rounded", rr, d)
		}
	}
}

func TestPrefilterFineOutlines(t *testing.T) {
	// Outlines of a thousand short edges, offset by many edge lengths, and a roughened one
	// whose collinear cuts make many raw curves meet end to end.
	rng := rand.New(rand.NewSource(9))
	rough := randomRegion(rng)
	rough = Region{Outer: roughenContour(rng, rough.Outer)}
	for _, tc := range []struct {
		name string
		r    Region
	}{
		{"wavy", benchBlob(t, 1000, 0.01)},
		{"wavy rough", benchBlob(t, 1000, 0.5)},
		{"jagged", benchJagged(1000)},
		{"jagged 10k", benchJagged(10_000)},
		{"roughened", rough},
	} {
		t.Run(tc.name, func(t *testing.T) {
			for _, d := range []float64{-0.5, -0.01, 0.01, 0.5} {
				samePrefiltered(t, tc.name, tc.r, d)
			}
		})
	}
}

func TestPrefilterRemovesOnlyNearPoints(t *testing.T) {
	// Every point left out of a raw curve lies nearer than |d| − prefilterMargin to the
	// boundary (derived: that is what the prefilter may remove), and of a jagged outline offset
	// by many edge lengths, whose raw curves are four to twenty times as long as the offset,
	// at most twice the offset's length is left (common practice, no source: the bound the
	// prefilter is for; on these inputs it leaves 1.1 to 1.5 times).
	const seed = 21
	rng := rand.New(rand.NewSource(seed))
	for k := 0; k < 6; k++ {
		r := jaggedRegion(rng, 3000, 2).Normalize()
		d := []float64{-0.5, 0.5, -2, 2, -0.05, 0.05}[k]
		cs := r.Contours()
		idx := newSegIndex(cs)
		f := &prefilter{idx: idx, rho: math.Abs(d) - prefilterMargin}
		var before, after float64
		for g, c := range cs {
			raw, from := rawOffsetFrom(c, d)
			for i, s := range raw {
				kept := f.trim(nil, s, g, from[i])
				before += s.Length()
				for _, ks := range kept {
					after += ks.Length()
				}
				for u := 0.0; u <= 1; u += 1.0 / 16 {
					p := s.At(u)
					// nearerThan is checked against a brute-force search in
					// TestSegIndexMatchesBruteForce.
					if !onAny(kept, p) && !idx.nearerThan(p, math.Abs(d)-prefilterMargin) {
						t.Fatalf("seed %d case %d: removed %v, which is not nearer than %g to the boundary",
							seed, k, p, math.Abs(d)-prefilterMargin)
					}
				}
			}
		}
		var perim float64
		for _, g := range r.Offset(d).Regions {
			for _, c := range g.Contours() {
				for _, s := range c {
					perim += s.Length()
				}
			}
		}
		if math.Abs(d) >= 0.5 && after > 2*perim {
			t.Errorf("seed %d case %d: kept %.4g of %.4g raw length, want at most twice the offset's %.4g",
				seed, k, after, before, perim)
		}
	}
}

// onAny reports whether p lies on one of ss, within pointTol.
func onAny(ss []Segment, p Vec) bool {
	for _, s := range ss {
		if s.DistanceTo(p) <= pointTol {
			return true
		}
	}
	return false
}

func TestSpans(t *testing.T) {
	a := spans{{0, 0.3}, {0.5, 0.8}}
	b := spans{{0.2, 0.6}, {0.7, 1}}
	tests := []struct {
		name      string
		got, want spans
	}{
		// Derived by hand from a and b.
		{"intersect", intersectSpans(nil, a, b), spans{{0.2, 0.3}, {0.5, 0.6}, {0.7, 0.8}}},
		{"union", unionSpans(nil, a, b), spans{{0, 1}}},
		{"subtract", subtractSpans(nil, a, b), spans{{0, 0.2}, {0.6, 0.7}}},
		{"subtract all", subtractSpans(nil, b, spans{whole}), nil},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if len(tc.got) != len(tc.want) {
				t.Fatalf("got %v, want %v", tc.got, tc.want)
			}
			for i := range tc.got {
				if math.Abs(tc.got[i].lo-tc.want[i].lo) > 1e-15 || math.Abs(tc.got[i].hi-tc.want[i].hi) > 1e-15 {
					t.Fatalf("got %v, want %v", tc.got, tc.want)
				}
			}
		})
	}
}

func TestSpansMatchSampling(t *testing.T) {
	// halfPlaneSpans and discSpans against testing the condition at many points of random
	// lines and arcs (derived: the spans are exactly where the condition holds).
	const seed = 4
	rng := rand.New(rand.NewSource(seed))
	rnd := func() Vec { return V(10*rng.Float64()-5, 10*rng.Float64()-5) }
	for k := 0; k < 400; k++ {
		s := Line(rnd(), rnd())
		if k%2 == 1 {
			s = Arc(rnd(), 0.5+3*rng.Float64(), 7*rng.Float64(), (4*rng.Float64()-2)*math.Pi)
		}
		o, n, w := rnd(), rnd(), rnd()
		kk, r := 3*rng.Float64()-1, 4*rng.Float64()
		hp := halfPlaneSpans(nil, newCurve(s), o, n, kk)
		dc := discSpans(nil, newCurve(s), w, r)
		for u := 0.0005; u < 1; u += 0.001 {
			p := s.At(u)
			inHP, inDisc := p.Sub(o).Dot(n) < kk, p.Dist(w) < r
			if math.Abs(p.Sub(o).Dot(n)-kk) < 1e-6 || math.Abs(p.Dist(w)-r) < 1e-6 {
				continue // on the edge of the set, within rounding
			}
			if got := inSpans(hp, u); got != inHP {
				t.Fatalf("seed %d case %d: half-plane at t %g of %v: got %v, want %v (%v)", seed, k, u, s, got, inHP, hp)
			}
			if got := inSpans(dc, u); got != inDisc {
				t.Fatalf("seed %d case %d: disc at t %g of %v: got %v, want %v (%v)", seed, k, u, s, got, inDisc, dc)
			}
		}
	}
}

// inSpans reports whether t lies in one of ss.
func inSpans(ss spans, t float64) bool {
	for _, s := range ss {
		if t > s.lo && t < s.hi {
			return true
		}
	}
	return false
}

func TestCoverMatchesDistance(t *testing.T) {
	// The cover of a witness is exactly the part of a curve nearer than rho to it (derived: the
	// points within rho of a line or an arc are the discs about its ends and the rectangle or
	// ring sector beside it), checked at many points of random lines and arcs against random
	// line and arc witnesses, arcs of more than half a turn and full circles among them.
	const seed = 8
	rng := rand.New(rand.NewSource(seed))
	rnd := func() Vec { return V(6*rng.Float64()-3, 6*rng.Float64()-3) }
	seg := func(k int) Segment {
		switch k % 3 {
		case 0:
			return Line(rnd(), rnd())
		case 1:
			return Arc(rnd(), 0.3+2*rng.Float64(), 7*rng.Float64(), (4*rng.Float64()-2)*math.Pi)
		}
		return Circle(rnd(), 0.3+2*rng.Float64())[0]
	}
	for k := 0; k < 600; k++ {
		s, w := seg(k), seg(k/3)
		f := &prefilter{rho: 0.2 + 2*rng.Float64()}
		cov := append(spans(nil), f.coverOf(newCurve(s), w)...)
		for u := 0.0005; u < 1; u += 0.001 {
			dist := w.DistanceTo(s.At(u))
			if math.Abs(dist-f.rho) < 1e-6 {
				continue // on the edge of the cover, within rounding
			}
			if got, want := inSpans(cov, u), dist < f.rho; got != want {
				t.Fatalf("seed %d case %d: %v at t %g is %.9g from %v: covered %v, want %v (rho %g, %v)",
					seed, k, s, u, dist, w, got, want, f.rho, cov)
			}
		}
	}
}
