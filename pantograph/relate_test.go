package pantograph

import (
	"math"
	"math/rand/v2"
	"testing"

	"panto/geom"
)

// TestGapCircles checks gap against the distance between two circles apart, d − r1 − r2
// (derived), over seeded random circles.
func TestGapCircles(t *testing.T) {
	for seed := uint64(1); seed <= 200; seed++ {
		rng := rand.New(rand.NewPCG(seed, 0))
		c1, c2 := randVec(rng, 10), randVec(rng, 10)
		r1, r2 := 0.05+rng.Float64()*2, 0.05+rng.Float64()*2
		d := c1.Dist(c2)
		if d <= r1+r2+1e-6 {
			continue
		}
		got := gap(geom.Circle(c1, r1), geom.Circle(c2, r2))
		if want := d - r1 - r2; math.Abs(got-want) > 1e-9 {
			t.Errorf("seed %d: got %v, want %v", seed, got, want)
		}
	}
}

// TestGapAgainstSampling checks gap between random capsules and rounded rectangles against the
// nearest distance from finely sampled points of one to the other: never more, and no more
// than the sampling can miss below it.
func TestGapAgainstSampling(t *testing.T) {
	for seed := uint64(1); seed <= 100; seed++ {
		rng := rand.New(rand.NewPCG(seed, 1))
		a := geom.Capsule(randVec(rng, 10), randVec(rng, 10), 0.1+rng.Float64())
		b, err := geom.Rect(randVec(rng, 10), geom.V(0.5+rng.Float64()*4, 0.5+rng.Float64()*4), rng.Float64()*0.25)
		if err != nil {
			t.Fatalf("seed %d: %v", seed, err)
		}
		if rel, _ := relate(a, b); rel == crossing {
			continue
		}
		got := gap(a, b)
		sampled := math.Inf(1)
		for _, s := range b {
			for i := 0; i <= 2000; i++ {
				sampled = math.Min(sampled, distToContour(a, s.At(float64(i)/2000)))
			}
		}
		// The samples lie at most 2.5 µm apart along b, so they miss the true nearest
		// point by at most that much (derived: the distance function is 1-Lipschitz).
		if got > sampled+1e-12 || sampled-got > 2.5e-3 {
			t.Errorf("seed %d: got %v, sampled %v", seed, got, sampled)
		}
	}
}

// TestHolesAgainstDistance checks Check's verdict on two random holes against the plain test
// of their centre distance (derived): overlap when d < r1 + r2, else a wall of d − r1 − r2.
func TestHolesAgainstDistance(t *testing.T) {
	for seed := uint64(1); seed <= 200; seed++ {
		rng := rand.New(rand.NewPCG(seed, 2))
		c1, c2 := geom.V(5+rng.Float64()*10, 3+rng.Float64()*4), geom.V(5+rng.Float64()*10, 3+rng.Float64()*4)
		d1, d2 := 0.2+rng.Float64()*2, 0.2+rng.Float64()*2
		p := plate(holes("a", d1, through, c1), holes("b", d2, through, c2))
		ps := Check(p, Options{MinWall: 0})
		over := (d1+d2)/2 - c1.Dist(c2)
		nested := c1.Dist(c2) <= math.Abs(d1-d2)/2
		switch {
		case nested:
			continue // one hole inside the other: reported as inside an opening
		case over > 1e-9:
			if len(ps) != 1 || ps[0].Severity != Error || math.Abs(ps[0].Amount-over) > 1e-9 {
				t.Errorf("seed %d: got %v, want one error with amount %v", seed, ps, over)
			}
		case over < -1e-9:
			if len(ps) != 0 {
				t.Errorf("seed %d: got %v, want none (wall %v)", seed, ps, -over)
			}
		}
	}
}

func randVec(rng *rand.Rand, size float64) geom.Vec {
	return geom.V(rng.Float64()*size, rng.Float64()*size)
}
