package cad

import (
	"fmt"
	"math"
	"math/rand"
	"strings"
	"testing"

	"panto/geom"
)

// randomOutline returns a seeded star-shaped outline around (50, 50) with some corners rounded:
// star-shaped about its centre, so it never crosses itself.
func randomOutline(rng *rand.Rand) geom.Contour {
	for {
		n := 4 + rng.Intn(12)
		pts := make([]geom.Vec, n)
		radii := make([]float64, n)
		for i := range pts {
			a := (float64(i) + 0.8*rng.Float64()) * 2 * math.Pi / float64(n)
			pts[i] = geom.Polar(geom.V(50, 50), 10+30*rng.Float64(), a)
			if rng.Intn(3) == 0 {
				radii[i] = 2 * rng.Float64()
			}
		}
		if c, err := geom.RoundedPolygon(pts, radii); err == nil && c.Validate() == nil {
			return c
		}
	}
}

// svgPath writes c as path data, each step absolute or relative at random, arcs as A commands.
func svgPath(rng *rand.Rand, c geom.Contour) string {
	var b strings.Builder
	fmt.Fprintf(&b, "M %.17g %.17g", c[0].A.X, c[0].A.Y)
	for _, s := range c {
		rel := rng.Intn(2) == 0
		to := s.B
		if rel {
			to = s.B.Sub(s.A)
		}
		cmd := "L"
		if s.IsArc() {
			large, sweep := 0, 0
			if math.Abs(s.Sweep) > math.Pi {
				large = 1
			}
			if s.Sweep > 0 {
				sweep = 1
			}
			cmd = fmt.Sprintf("A %.17g %.17g 0 %d %d", s.Radius(), s.Radius(), large, sweep)
		}
		if rel {
			cmd = strings.ToLower(cmd)
		}
		fmt.Fprintf(&b, " %s %.17g %.17g", cmd, to.X, to.Y)
	}
	return b.String() + " Z"
}

// TestSVGPathProperty writes seeded random outlines as SVG path data and checks they read back
// with the same area (mirrored by the y flip) and their arcs still arcs.
func TestSVGPathProperty(t *testing.T) {
	for seed := int64(1); seed <= 200; seed++ {
		rng := rand.New(rand.NewSource(seed))
		c := randomOutline(rng)
		src := svgDoc(`width="100mm" height="100mm" viewBox="0 0 100 100"`, `<path d="`+svgPath(rng, c)+`"/>`)
		p, _, err := Read("p.svg", []byte(src), Options{})
		if err != nil {
			t.Fatalf("seed %d: %v", seed, err)
		}
		got := p.Profile.Region.Outer
		if d := math.Abs(got.Area() - math.Abs(c.Area())); d > areaBound(c) {
			t.Fatalf("seed %d: area %g, want %g", seed, got.Area(), math.Abs(c.Area()))
		}
		arcs := func(c geom.Contour) (n int) {
			for _, s := range c {
				if s.IsArc() {
					n++
				}
			}
			return n
		}
		if arcs(got) != arcs(c) && !hasTiny(c) {
			t.Fatalf("seed %d: got %d arcs, want %d", seed, arcs(got), arcs(c))
		}
	}
}

// TestDXFLoosePieceProperty writes seeded random outlines as loose LINE and ARC entities in
// random order and direction, and checks that they chain back to the same area.
func TestDXFLoosePieceProperty(t *testing.T) {
	for seed := int64(1); seed <= 200; seed++ {
		rng := rand.New(rand.NewSource(seed))
		c := randomOutline(rng)
		var ents []string
		for _, i := range rng.Perm(len(c)) {
			s := c[i]
			if rng.Intn(2) == 0 {
				s = s.Reverse()
			}
			ents = append(ents, dxfEntityOf(s))
		}
		p, _, err := Read("p.dxf", []byte(dxfDoc(4, "", ents...)), Options{})
		if err != nil {
			t.Fatalf("seed %d: %v", seed, err)
		}
		if d := math.Abs(p.Profile.Region.Area() - math.Abs(c.Area())); d > areaBound(c) {
			t.Fatalf("seed %d: area %g, want %g", seed, p.Profile.Region.Area(), math.Abs(c.Area()))
		}
	}
}

// areaBound is how far the area read back may differ: pieces shorter than the join tolerance
// are dropped and their neighbours' ends moved by at most that much, so the area moves by at
// most the tolerance times the perimeter (derived); otherwise numbers written to 17 digits
// come back to rounding.
func areaBound(c geom.Contour) float64 {
	if hasTiny(c) {
		return defaultJoinTol * c.Perimeter()
	}
	return 1e-6
}

// hasTiny reports whether c has a piece shorter than the join tolerance.
func hasTiny(c geom.Contour) bool {
	for _, s := range c {
		if s.Length() <= defaultJoinTol {
			return true
		}
	}
	return false
}

// dxfEntityOf writes a segment as a LINE, or an ARC turned counter-clockwise as DXF has them.
func dxfEntityOf(s geom.Segment) string {
	if !s.IsArc() {
		return ent("LINE", 8, "0", 10, g17(s.A.X), 20, g17(s.A.Y), 11, g17(s.B.X), 21, g17(s.B.Y))
	}
	if s.Sweep < 0 {
		s = s.Reverse()
	}
	a0 := s.StartAngle() * 180 / math.Pi
	return ent("ARC", 8, "0", 10, g17(s.Center.X), 20, g17(s.Center.Y), 40, g17(s.Radius()),
		50, g17(a0), 51, g17(a0+s.Sweep*180/math.Pi))
}

func g17(v float64) string { return fmt.Sprintf("%.17g", v) }
