package geom

import "math"

// Transform is a similarity of the plane: p ↦ M·p + T where M is a rotation times a uniform
// scale, possibly with a mirror. Only similarities are offered because they map arcs to arcs.
type Transform struct {
	m [4]float64 // row-major 2×2
	t Vec
}

// Identity returns the transform that changes nothing.
func Identity() Transform { return Transform{m: [4]float64{1, 0, 0, 1}} }

// Translate returns the transform that moves every point by v.
func Translate(v Vec) Transform { return Transform{m: [4]float64{1, 0, 0, 1}, t: v} }

// Scale returns the transform that scales about the origin by k (k > 0).
func Scale(k float64) Transform { return Transform{m: [4]float64{k, 0, 0, k}} }

// Rotate returns the transform that turns about the origin counter-clockwise by a.
func Rotate(a Angle) Transform {
	s, c := math.Sincos(float64(a))
	if math.Abs(s) < 1e-15 {
		s = 0
	}
	if math.Abs(c) < 1e-15 {
		c = 0
	}
	return Transform{m: [4]float64{c, -s, s, c}}
}

// FlipX returns the mirror that maps x to −x (reflection across the Y axis).
func FlipX() Transform { return Transform{m: [4]float64{-1, 0, 0, 1}} }

// FlipY returns the mirror that maps y to −y (reflection across the X axis).
func FlipY() Transform { return Transform{m: [4]float64{1, 0, 0, -1}} }

// Then returns the transform that applies t first and u second.
func (t Transform) Then(u Transform) Transform {
	a, b := u.m, t.m
	return Transform{
		m: [4]float64{a[0]*b[0] + a[1]*b[2], a[0]*b[1] + a[1]*b[3],
			a[2]*b[0] + a[3]*b[2], a[2]*b[1] + a[3]*b[3]},
		t: u.Apply(t.t),
	}
}

// Apply returns p moved by t.
func (t Transform) Apply(p Vec) Vec {
	return Vec{t.m[0]*p.X + t.m[1]*p.Y + t.t.X, t.m[2]*p.X + t.m[3]*p.Y + t.t.Y}
}

// Mirrors reports whether t reverses orientation.
func (t Transform) Mirrors() bool { return t.m[0]*t.m[3]-t.m[1]*t.m[2] < 0 }

// ScaleFactor returns the factor by which t multiplies lengths.
func (t Transform) ScaleFactor() float64 {
	return math.Sqrt(math.Abs(t.m[0]*t.m[3] - t.m[1]*t.m[2]))
}

// Segment returns s moved by t; a mirror reverses an arc's sense of turning.
func (t Transform) Segment(s Segment) Segment {
	out := Segment{A: t.Apply(s.A), B: t.Apply(s.B)}
	if s.IsArc() {
		out.Center = t.Apply(s.Center)
		out.Sweep = s.Sweep
		if t.Mirrors() {
			out.Sweep = -s.Sweep
		}
	}
	return out
}
