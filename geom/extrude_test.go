package geom

import (
	"errors"
	"fmt"
	"math"
	"math/rand"
	"testing"
)

// meshTol is the tolerance on mesh volumes compared with their exact flattened value: sums of
// a few thousand products of numbers near 100, so rounding near 1e-9 of the volume (derived).
const meshTol = 1e-9

// flatArea returns the area of region r as StepSolid flattens it.
func flatArea(r Region, tol float64) float64 {
	a := math.Abs(ringArea(ringPoints(r.Outer, tol)))
	for _, h := range r.Holes {
		a -= math.Abs(ringArea(ringPoints(h, tol)))
	}
	return a
}

func TestExtrude(t *testing.T) {
	const tol = 0.01
	rect, _ := Rect(Vec{0, 0}, Vec{40, 20}, 0)
	rounded, _ := Rect(Vec{0, 0}, Vec{40, 20}, 3)
	tests := []struct {
		name   string
		region Region
	}{
		{"rectangle", NewRegion(rect)},
		{"rounded rectangle", NewRegion(rounded)},
		{"disc", NewRegion(Circle(Vec{5, 5}, 10))},
		{"rectangle with holes", NewRegion(rect, Circle(Vec{10, 10}, 4), Circle(Vec{30, 10}, 2))},
		{"capsule", NewRegion(Capsule(Vec{0, 0}, Vec{30, 10}, 2))},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			m, err := tc.region.Extrude(1, 6, tol)
			if err != nil {
				t.Fatal(err)
			}
			if err := m.Check(); err != nil {
				t.Fatal(err)
			}
			v := 0
			for _, c := range tc.region.Contours() {
				v += len(ringPoints(c, tol))
			}
			h := len(tc.region.Holes)
			// derived: caps 2·(V + 2h − 2), walls 2·V.
			if got, want := len(m.Triangles), 4*v+4*h-4; got != want {
				t.Errorf("triangles: got %d, want %d = 4·%d + 4·%d − 4", got, want, v, h)
			}
			// derived: a prism's volume is its base area times its height; the base is the
			// flattened region, within perimeter × tol of the exact one.
			approx(t, "volume of flattened region", m.Volume(), 5*flatArea(tc.region, tol), meshTol*m.Volume())
			approx(t, "volume of exact region", m.Volume(), 5*tc.region.Area(), 5*tc.region.Perimeter()*tol)
			lo, hi := m.Bounds()
			approx(t, "bottom", lo.Z, 1, 0)
			approx(t, "top", hi.Z, 6, 0)
		})
	}
}

// TestStepSolid builds a plate with a raised boss, an opening, a pocket, a conical pit and a sunk
// ring with an island, and checks that it closes and holds the volume added up by hand.
func TestStepSolid(t *testing.T) {
	const tol = 0.005
	plate, _ := Rect(Vec{0, 0}, Vec{100, 60}, 4)
	boss, _ := Rect(Vec{10, 10}, Vec{60, 40}, 0)
	opening, _ := Rect(Vec{20, 20}, Vec{10, 10}, 2)
	pocket := Circle(Vec{50, 30}, 6)
	pit := Circle(Vec{85, 15}, 3)
	ring := NewRegion(Circle(Vec{85, 45}, 6), Circle(Vec{85, 45}, 3))
	root := Terrace{Outline: plate, Top: 5, Children: []Terrace{
		{Outline: boss, Top: 8, Children: []Terrace{
			{Outline: opening, Open: true},
			{Outline: pocket, Top: 6},
		}},
		{Outline: pit, Top: 2, Cone: true},
		RegionTerrace(ring, 4.5, 5),
	}}
	m, err := StepSolid(0, root, tol)
	if err != nil {
		t.Fatal(err)
	}
	if err := m.Check(); err != nil {
		t.Fatal(err)
	}
	fa := func(c Contour) float64 { return flatArea(NewRegion(c), tol) }
	// derived: slab, plus the boss above it, less the opening through both, less the pocket
	// below the boss's top, less the cone (a pyramid on the flattened circle: area × depth / 3)
	// and the sunk ring.
	want := 5*fa(plate) + 3*fa(boss) - 8*fa(opening) - 2*fa(pocket) - fa(pit)*3/3 -
		0.5*flatArea(ring, tol)
	approx(t, "volume", m.Volume(), want, meshTol*want)
}

func TestStepSolidRejects(t *testing.T) {
	sq, _ := Rect(Vec{0, 0}, Vec{10, 10}, 0)
	small, _ := Rect(Vec{2, 2}, Vec{2, 2}, 0)
	tests := []struct {
		name string
		root Terrace
	}{
		{"root below the base", Terrace{Outline: sq, Top: -1}},
		{"root open", Terrace{Outline: sq, Top: 1, Open: true}},
		{"child at the base", Terrace{Outline: sq, Top: 1, Children: []Terrace{{Outline: small, Top: 0}}}},
		{"cone above its rim", Terrace{Outline: sq, Top: 1, Children: []Terrace{{Outline: small, Top: 2, Cone: true}}}},
		{"opening with children", Terrace{Outline: sq, Top: 1, Children: []Terrace{{Outline: small, Open: true, Children: []Terrace{{Outline: small, Top: 1}}}}}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if _, err := StepSolid(0, tc.root, 0.01); !errors.Is(err, ErrBadTerrace) {
				t.Errorf("got %v, want ErrBadTerrace", err)
			}
		})
	}
}

// TestStepSolidRandom extrudes seeded random regions, each with a raised copy of itself shrunk
// inside and the region's holes through that, and checks that every mesh closes and holds its volume.
func TestStepSolidRandom(t *testing.T) {
	const tol = 0.002
	for seed := int64(1); seed <= 200; seed++ {
		t.Run(fmt.Sprint("seed ", seed), func(t *testing.T) {
			r := randomRegion(rand.New(rand.NewSource(seed)))
			outer := NewRegion(r.Outer)
			root := Terrace{Outline: r.Outer, Top: 3}
			want := 3 * flatArea(outer, tol)
			for _, in := range outer.Offset(-1).Regions {
				c := Terrace{Outline: in.Outer, Top: 4}
				want += flatArea(in, tol)
				// The random holes go through the raised part when they fit inside it.
				if cand := (Region{Outer: in.Outer, Holes: r.Holes}); cand.Validate() == nil {
					for _, h := range r.Holes {
						c.Children = append(c.Children, Terrace{Outline: h, Open: true})
						want -= 4 * flatArea(Region{Outer: h}, tol) // as given: dropping close points depends on direction
					}
				}
				root.Children = append(root.Children, c)
			}
			m, err := StepSolid(0, root, tol)
			if err != nil {
				t.Fatalf("seed %d: %v", seed, err)
			}
			if err := m.Check(); err != nil {
				t.Fatalf("seed %d: %v", seed, err)
			}
			approx(t, fmt.Sprintf("seed %d: volume", seed), m.Volume(), want, meshTol*want)
		})
	}
}

func BenchmarkStepSolidHoles(b *testing.B) {
	plate, _ := Rect(Vec{0, 0}, Vec{500, 400}, 5)
	root := Terrace{Outline: plate, Top: 5}
	for i := range 50 {
		for j := range 40 {
			root.Children = append(root.Children, Terrace{Outline: Circle(Vec{float64(5 + 10*i), float64(5 + 10*j)}, 2), Top: 3, Cone: true})
		}
	}
	b.ResetTimer()
	for range b.N {
		m, err := StepSolid(0, root, 0.0025)
		if err != nil {
			b.Fatal(err)
		}
		b.ReportMetric(float64(len(m.Triangles)), "triangles")
	}
}
