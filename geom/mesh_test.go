package geom

import (
	"errors"
	"fmt"
	"math"
	"testing"
)

// cube returns the closed unit cube from the origin, outward normals.
func cube() Mesh {
	m, err := NewRegion(Polygon(V(0, 0), V(1, 0), V(1, 1), V(0, 1))).Extrude(0, 1, 0.01)
	if err != nil {
		panic(err)
	}
	return m
}

func TestMeshCheck(t *testing.T) {
	drop := cube()
	drop.Triangles = drop.Triangles[1:]
	flip := cube()
	flip.Triangles[0] = [3]int32{flip.Triangles[0][0], flip.Triangles[0][2], flip.Triangles[0][1]}
	flat := cube()
	flat.Points = append(flat.Points, Vec3{0.5, 0, 0})
	flat.Triangles = append(flat.Triangles, [3]int32{0, int32(len(flat.Points) - 1), 1})
	tests := []struct {
		name string
		m    Mesh
		want error
	}{
		{"closed cube", cube(), nil},
		{"a triangle missing", drop, ErrOpenEdge},
		{"a triangle turned over", flip, ErrOpenEdge},
		{"a flat triangle", flat, ErrFlatTriangle},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if err := tc.m.Check(); !errors.Is(err, tc.want) {
				t.Errorf("got %v, want %v", err, tc.want)
			}
		})
	}
}

func TestMeshVolume(t *testing.T) {
	tests := []struct {
		name string
		m    Mesh
		want float64
	}{
		{"unit cube", cube(), 1}, // derived
		{"moved cube", cube().Translate(Vec3{10, -20, 5}), 1},
		{"two cubes", cube().Append(cube().Translate(Vec3{3, 0, 0})), 2},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			approx(t, "volume", tc.m.Volume(), tc.want, 1e-12)
			if err := tc.m.Check(); err != nil {
				t.Error(err)
			}
		})
	}
}

func TestMeshNormals(t *testing.T) {
	m := cube()
	lo, hi := m.Bounds()
	c := Vec3{(lo.X + hi.X) / 2, (lo.Y + hi.Y) / 2, (lo.Z + hi.Z) / 2}
	for i := range m.Triangles {
		a, _, _ := m.Corners(i)
		if n := m.Normal(i); n.Dot(a.Sub(c)) <= 0 {
			t.Errorf("triangle %d: normal %v points into the cube", i, n)
		}
	}
}

// ExampleRegion_Extrude makes a 40 × 20 mm plate with a 10 mm hole, 5 mm thick. The chords
// of the hole cut off a little of it, so the plate holds a little more than the exact shape:
// at most perimeter × tolerance × height = 31.4 × 0.01 × 5 ≈ 1.6 mm³ more.
func ExampleRegion_Extrude() {
	outer, _ := Rect(V(0, 0), V(40, 20), 0)
	m, err := NewRegion(outer, Circle(V(20, 10), 5)).Extrude(0, 5, 0.01)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println("closed:", m.Check() == nil)
	fmt.Printf("volume: %.1f mm³ (exact 4000 − 125π = %.1f)\n", m.Volume(), 4000-125*math.Pi)
	// Output:
	// closed: true
	// volume: 3608.1 mm³ (exact 4000 − 125π = 3607.3)
}
