package cad

import (
	"math"

	"panto/geom"
)

// affine is a general affine map p ↦ M·p + T of the plane. Drawings need more than geom's
// similarities: SVG allows skew and stretch, DXF blocks may be inserted with unequal scales.
// Arcs survive only similarities; anything else turns them into chords.
type affine struct {
	a, b, c, d, e, f float64 // x' = a·x + c·y + e, y' = b·x + d·y + f (SVG's matrix order)
}

func identity() affine { return affine{a: 1, d: 1} }

func translation(x, y float64) affine { return affine{a: 1, d: 1, e: x, f: y} }

func scaling(sx, sy float64) affine { return affine{a: sx, d: sy} }

func rotation(rad float64) affine {
	s, c := math.Sincos(rad)
	return affine{a: c, b: s, c: -s, d: c}
}

// then returns the map that applies m first and n second.
func (m affine) then(n affine) affine {
	return affine{
		a: n.a*m.a + n.c*m.b, b: n.b*m.a + n.d*m.b,
		c: n.a*m.c + n.c*m.d, d: n.b*m.c + n.d*m.d,
		e: n.a*m.e + n.c*m.f + n.e, f: n.b*m.e + n.d*m.f + n.f,
	}
}

func (m affine) apply(p geom.Vec) geom.Vec {
	return geom.V(m.a*p.X+m.c*p.Y+m.e, m.b*p.X+m.d*p.Y+m.f)
}

// linear applies m without its translation: for directions and sizes.
func (m affine) linear(v geom.Vec) geom.Vec { return geom.V(m.a*v.X+m.c*v.Y, m.b*v.X+m.d*v.Y) }

func (m affine) det() float64 { return m.a*m.d - m.b*m.c }

// similarityTol is how far the two columns of a map may differ in length or squareness,
// relative to their length, for the map still to count as a similarity: numbers in drawings
// carry 6 to 16 digits, and 1e-9 sits above the rounding of the longest of them.
const similarityTol = 1e-9

// similar reports whether m keeps shapes (rotation, uniform scale, maybe a mirror), so that it
// maps circles to circles.
func (m affine) similar() bool {
	l1, l2 := math.Hypot(m.a, m.b), math.Hypot(m.c, m.d)
	s := math.Max(l1, l2)
	return s > 0 && math.Abs(l1-l2) <= similarityTol*s && math.Abs(m.a*m.c+m.b*m.d) <= similarityTol*s*s
}

// stretch returns the largest factor by which m lengthens a vector: the larger singular value.
func (m affine) stretch() float64 {
	p := (m.a*m.a + m.b*m.b + m.c*m.c + m.d*m.d) / 2
	q := math.Sqrt(math.Max(0, p*p-m.det()*m.det()))
	return math.Sqrt(p + q)
}

// isFinite reports whether every number of m is finite.
func (m affine) isFinite() bool {
	for _, x := range []float64{m.a, m.b, m.c, m.d, m.e, m.f} {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return false
		}
	}
	return true
}

// segment maps s through m: exactly when m is a similarity, else as chords within tol (in the
// units after m).
func (m affine) segment(s geom.Segment, tol float64) []geom.Segment {
	if !s.IsArc() {
		return []geom.Segment{geom.Line(m.apply(s.A), m.apply(s.B))}
	}
	if m.similar() {
		out := geom.Segment{A: m.apply(s.A), B: m.apply(s.B), Center: m.apply(s.Center), Sweep: s.Sweep}
		if m.det() < 0 {
			out.Sweep = -s.Sweep
		}
		return []geom.Segment{out}
	}
	r := s.Radius()
	return ellipseArc(m, s.Center, r, r, 0, s.StartAngle(), s.Sweep, tol)
}

// maxCurvePieces bounds the chords one curve is cut into, so that a huge or hostile drawing
// cannot make the reader run without end; 20 000 chords hold a 1 µm tolerance on an ellipse
// about 10 m across, far beyond any pantograph.
const maxCurvePieces = 20000

// ellipseArc returns the arc of the ellipse about center with semi-axes rx, ry, the rx axis
// turned phi from +x, from parameter angle t0 through sweep (counter-clockwise positive), mapped
// through m. When the ellipse is a circle and m a similarity the result is one true arc;
// otherwise chords within tol of the curve, in the units after m.
func ellipseArc(m affine, center geom.Vec, rx, ry, phi, t0, sweep, tol float64) []geom.Segment {
	local := rotation(phi).then(translation(center.X, center.Y)).then(m)
	if math.Abs(rx-ry) <= similarityTol*math.Max(rx, ry) && local.similar() {
		a := geom.Arc(geom.Vec{}, rx, t0, sweep)
		return local.segment(a, tol)
	}
	at := func(t float64) geom.Vec {
		s, c := math.Sincos(t)
		return local.apply(geom.V(rx*c, ry*s))
	}
	// The image is an ellipse with semi-axes at most big and at least small. A chord over
	// parameter step h is at most big·h long on a curve bent at most big/small², so it strays
	// at most big³h²/(8·small²) (derived, sagitta ≈ length²·curvature/8); keeping that below
	// tol gives h ≤ (small/big)·√(8·tol/big) ≈ (small/big)·2·acos(1 − tol/big).
	st := local.stretch()
	big := math.Max(rx, ry) * st
	small := math.Min(rx, ry) * math.Abs(local.det()) / math.Max(st, 1e-300)
	n := maxCurvePieces
	if big > 0 && tol > 0 && tol < big {
		step := 2 * math.Acos(1-tol/big) * small / big
		if step > 0 {
			n = int(math.Min(maxCurvePieces, math.Ceil(math.Abs(sweep)/step)))
		}
	}
	n = max(n, 4)
	out := make([]geom.Segment, 0, n)
	prev := at(t0)
	for i := 1; i <= n; i++ {
		p := at(t0 + sweep*float64(i)/float64(n))
		out = append(out, geom.Line(prev, p))
		prev = p
	}
	return out
}
