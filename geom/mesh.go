package geom

import (
	"errors"
	"fmt"
	"math"
)

// Vec3 is a point in space; Z is the height above the plane the 2-D shapes lie in.
type Vec3 struct{ X, Y, Z float64 }

func (v Vec3) Sub(w Vec3) Vec3 { return Vec3{v.X - w.X, v.Y - w.Y, v.Z - w.Z} }
func (v Vec3) Dot(w Vec3) float64 {
	return v.X*w.X + v.Y*w.Y + v.Z*w.Z
}

// Cross returns the cross product v × w.
func (v Vec3) Cross(w Vec3) Vec3 {
	return Vec3{v.Y*w.Z - v.Z*w.Y, v.Z*w.X - v.X*w.Z, v.X*w.Y - v.Y*w.X}
}

// Len returns the length of v.
func (v Vec3) Len() float64 { return math.Sqrt(v.Dot(v)) }

// Mesh is a solid's surface as triangles over shared points. Each triangle lists its corners
// counter-clockwise as seen from outside the solid, so its normal (b − a) × (c − a) points out.
type Mesh struct {
	Points    []Vec3
	Triangles [][3]int32
}

// Corners returns the three corners of triangle i.
func (m Mesh) Corners(i int) (a, b, c Vec3) {
	t := m.Triangles[i]
	return m.Points[t[0]], m.Points[t[1]], m.Points[t[2]]
}

// Normal returns the outward unit normal of triangle i (zero for a triangle with no area).
func (m Mesh) Normal(i int) Vec3 {
	a, b, c := m.Corners(i)
	n := b.Sub(a).Cross(c.Sub(a))
	l := n.Len()
	if l == 0 {
		return Vec3{}
	}
	return Vec3{n.X / l, n.Y / l, n.Z / l}
}

// Volume returns the volume the mesh encloses, by the divergence theorem: the sum over
// triangles of a · (b × c) / 6. It is positive for a closed mesh whose normals point out.
func (m Mesh) Volume() float64 {
	var v float64
	for i := range m.Triangles {
		a, b, c := m.Corners(i)
		v += a.Dot(b.Cross(c))
	}
	return v / 6
}

// Bounds returns the lowest and highest corner of the box holding every point.
func (m Mesh) Bounds() (lo, hi Vec3) {
	inf := math.Inf(1)
	lo, hi = Vec3{inf, inf, inf}, Vec3{-inf, -inf, -inf}
	for _, p := range m.Points {
		lo = Vec3{math.Min(lo.X, p.X), math.Min(lo.Y, p.Y), math.Min(lo.Z, p.Z)}
		hi = Vec3{math.Max(hi.X, p.X), math.Max(hi.Y, p.Y), math.Max(hi.Z, p.Z)}
	}
	return lo, hi
}

// Translate returns the mesh moved by d; the points are copied.
func (m Mesh) Translate(d Vec3) Mesh {
	out := Mesh{Points: make([]Vec3, len(m.Points)), Triangles: m.Triangles}
	for i, p := range m.Points {
		out.Points[i] = Vec3{p.X + d.X, p.Y + d.Y, p.Z + d.Z}
	}
	return out
}

// Append adds the triangles of o to m as a separate shell and returns the result.
func (m Mesh) Append(o Mesh) Mesh {
	base := int32(len(m.Points))
	m.Points = append(m.Points, o.Points...)
	for _, t := range o.Triangles {
		m.Triangles = append(m.Triangles, [3]int32{t[0] + base, t[1] + base, t[2] + base})
	}
	return m
}

// minTriangleArea is the smallest area, in mm², a triangle may have and still count as a
// triangle: about the area a float32 STL coordinate can resolve on a part 300 mm across
// (float32 spacing there is 3e-5 mm; 3e-5 × 3e-5 ≈ 1e-9), so that a triangle passing here
// keeps its shape when written.
const minTriangleArea = 1e-9

// Mesh errors, wrapped by Check with the triangle or edge at fault.
var (
	ErrOpenEdge     = errors.New("edge is not shared by exactly two triangles running opposite ways")
	ErrFlatTriangle = errors.New("triangle has no area")
)

// Check reports the first thing that keeps the mesh from being a closed, consistently oriented
// surface: a triangle with no area, or a directed edge that is not used exactly once with its
// reverse used exactly once.
func (m Mesh) Check() error {
	use := make(map[edgeKey]int, 3*len(m.Triangles))
	for i, t := range m.Triangles {
		a, b, c := m.Corners(i)
		if b.Sub(a).Cross(c.Sub(a)).Len()/2 < minTriangleArea {
			return fmt.Errorf("triangle %d %v %v %v: %w", i, a, b, c, ErrFlatTriangle)
		}
		for k := range 3 {
			use[edgeKey{t[k], t[(k+1)%3]}]++
		}
	}
	for e, n := range use {
		if n != 1 || use[edgeKey{e.b, e.a}] != 1 {
			return fmt.Errorf("edge %v-%v used %d times, reversed %d times: %w",
				m.Points[e.a], m.Points[e.b], n, use[edgeKey{e.b, e.a}], ErrOpenEdge)
		}
	}
	return nil
}
