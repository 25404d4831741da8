package geom

import (
	"math"
	"math/rand"
	"strconv"
	"strings"
	"testing"
)

// approx fails the test when got and want differ by more than tol.
func approx(t *testing.T, what string, got, want, tol float64) {
	t.Helper()
	if math.IsNaN(got) || math.Abs(got-want) > tol {
		t.Errorf("%s: got %.12g, want %.12g (±%g)", what, got, want, tol)
	}
}

// shape parses the compact text form used by the tests: points "x,y" separated by spaces, each
// optionally followed by "@r" to round that corner with radius r. "0,0 10,0 10,5@1 0,5" is a
// 10 × 5 rectangle with one rounded corner.
func shape(t testing.TB, s string) Contour {
	t.Helper()
	var pts []Vec
	var radii []float64
	for _, f := range strings.Fields(s) {
		r := 0.0
		if at := strings.IndexByte(f, '@'); at >= 0 {
			v, err := strconv.ParseFloat(f[at+1:], 64)
			if err != nil {
				t.Fatalf("shape %q: %v", s, err)
			}
			r, f = v, f[:at]
		}
		xy := strings.Split(f, ",")
		if len(xy) != 2 {
			t.Fatalf("shape %q: bad point %q", s, f)
		}
		x, err1 := strconv.ParseFloat(xy[0], 64)
		y, err2 := strconv.ParseFloat(xy[1], 64)
		if err1 != nil || err2 != nil {
			t.Fatalf("shape %q: bad point %q", s, f)
		}
		pts = append(pts, Vec{x, y})
		radii = append(radii, r)
	}
	c, err := RoundedPolygon(pts, radii)
	if err != nil {
		t.Fatalf("shape %q: %v", s, err)
	}
	return c
}

// randomStar returns a simple star-shaped polygon around c: n vertices at increasing angles and
// radii between rmin and rmax, some corners rounded; n ≥ 4 keeps every angular gap under 180°.
// Star-shaped about c means it never crosses
// itself, so it is always a valid contour.
func randomStar(rng *rand.Rand, c Vec, n int, rmin, rmax float64) Contour {
	for {
		pts := make([]Vec, n)
		radii := make([]float64, n)
		for i := range pts {
			a := (float64(i) + 0.8*rng.Float64()) * 2 * math.Pi / float64(n)
			pts[i] = Polar(c, rmin+(rmax-rmin)*rng.Float64(), a)
			if rng.Intn(3) == 0 {
				radii[i] = 0.05 * rmin * rng.Float64()
			}
		}
		if ct, err := RoundedPolygon(pts, radii); err == nil && ct.Validate() == nil {
			return ct
		}
	}
}

// randomRegion returns a seeded random region: a star-shaped outer contour, and up to two
// small circular or polygonal holes that sit well inside it.
func randomRegion(rng *rand.Rand) Region {
	n := 5 + rng.Intn(20)
	outer := randomStar(rng, Vec{}, n, 20, 40)
	r := NewRegion(outer)
	for k := rng.Intn(3); k > 0; k-- {
		c := Polar(Vec{}, 12*rng.Float64(), 2*math.Pi*rng.Float64())
		var h Contour
		if rng.Intn(2) == 0 {
			h = Circle(c, 1+2*rng.Float64())
		} else {
			h = randomStar(rng, c, 4+rng.Intn(5), 1, 3)
		}
		cand := NewRegion(r.Outer, append(append([]Contour{}, r.Holes...), h)...)
		if cand.Validate() == nil {
			r = cand
		}
	}
	return r
}
