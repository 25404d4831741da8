package geom

import (
	"fmt"
	"math"
)

// Vec is a point or a displacement in the plane.
type Vec struct{ X, Y float64 }

// V is shorthand for Vec{x, y}.
func V(x, y float64) Vec { return Vec{x, y} }

func (v Vec) Add(w Vec) Vec      { return Vec{v.X + w.X, v.Y + w.Y} }
func (v Vec) Sub(w Vec) Vec      { return Vec{v.X - w.X, v.Y - w.Y} }
func (v Vec) Mul(k float64) Vec  { return Vec{v.X * k, v.Y * k} }
func (v Vec) Dot(w Vec) float64  { return v.X*w.X + v.Y*w.Y }
func (v Vec) Len() float64       { return math.Hypot(v.X, v.Y) }
func (v Vec) Dist(w Vec) float64 { return v.Sub(w).Len() }
func (v Vec) Neg() Vec           { return Vec{-v.X, -v.Y} }
func (v Vec) Lerp(w Vec, t float64) Vec {
	return Vec{v.X + (w.X-v.X)*t, v.Y + (w.Y-v.Y)*t}
}

// Cross returns the z component of the cross product v × w: positive when w lies
// counter-clockwise of v.
func (v Vec) Cross(w Vec) float64 { return v.X*w.Y - v.Y*w.X }

// Perp returns v turned a quarter turn counter-clockwise.
func (v Vec) Perp() Vec { return Vec{-v.Y, v.X} }

// Unit returns v scaled to length 1, or the zero vector when v is (near) zero.
func (v Vec) Unit() Vec {
	l := v.Len()
	if l < pointTol*pointTol {
		return Vec{}
	}
	return Vec{v.X / l, v.Y / l}
}

// Angle returns the direction of v in radians, in (−π, π].
func (v Vec) Angle() float64 { return math.Atan2(v.Y, v.X) }

// Rotate turns v counter-clockwise by a radians about the origin.
func (v Vec) Rotate(a float64) Vec {
	s, c := math.Sincos(a)
	return Vec{v.X*c - v.Y*s, v.X*s + v.Y*c}
}

// Polar returns the point at distance r from c in direction a (radians).
func Polar(c Vec, r, a float64) Vec {
	s, co := math.Sincos(a)
	return Vec{c.X + r*co, c.Y + r*s}
}

// Near reports whether v and w are the same point within pointTol.
func (v Vec) Near(w Vec) bool { return v.Dist(w) <= pointTol }

// IsFinite reports whether both coordinates are finite numbers.
func (v Vec) IsFinite() bool {
	return !math.IsNaN(v.X) && !math.IsNaN(v.Y) && !math.IsInf(v.X, 0) && !math.IsInf(v.Y, 0)
}

func (v Vec) String() string { return fmt.Sprintf("(%g, %g)", v.X, v.Y) }

// pointTol is the distance below which two points are the same point (see the package doc).
const pointTol = 1e-9

// DefaultChordTolerance is the default largest distance, in mm, between an arc and the chords
// that replace it when flattening. At a reduction ratio R ≥ 1 the error at the part is at most
// this divided by R, so below a micrometre.
const DefaultChordTolerance = 0.001
