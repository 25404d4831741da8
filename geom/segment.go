package geom

import (
	"fmt"
	"math"
)

// Segment is a straight line or a circular arc; see the package doc for the canonical form.
type Segment struct {
	A, B   Vec     // start and end point
	Center Vec     // centre of an arc; unused for a line
	Sweep  float64 // signed sweep of an arc in radians, counter-clockwise positive; 0 for a line
}

// Line returns the straight segment from a to b.
func Line(a, b Vec) Segment { return Segment{A: a, B: b} }

// ArcFrom returns the arc that starts at a, turns about center by sweep radians
// (counter-clockwise when positive) and ends where that rotation lands; a sweep of a whole
// turn (within fullTurnTol) ends exactly at a, so the circle closes.
func ArcFrom(a, center Vec, sweep float64) Segment {
	b := center.Add(a.Sub(center).Rotate(sweep))
	if isFullTurn(sweep) {
		b = a
	}
	return Segment{A: a, B: b, Center: center, Sweep: sweep}
}

// Arc returns the arc about center with the given radius, starting at angle start (radians)
// and sweeping by sweep radians.
func Arc(center Vec, radius, start, sweep float64) Segment {
	return ArcFrom(Polar(center, radius, start), center, sweep)
}

// ArcThrough returns the arc from a through m to b, or a line when m lies within pointTol of
// the straight line a–b.
func ArcThrough(a, m, b Vec) Segment {
	// Within pointTol of the chord the three points are one line: the circle through them
	// would be astronomically large and its centre meaningless.
	if ab := b.Sub(a); math.Abs(ab.Cross(m.Sub(a))) <= pointTol*ab.Len() {
		return Line(a, b)
	}
	d := 2 * (a.X*(m.Y-b.Y) + m.X*(b.Y-a.Y) + b.X*(a.Y-m.Y))
	a2, m2, b2 := a.Dot(a), m.Dot(m), b.Dot(b)
	c := Vec{(a2*(m.Y-b.Y) + m2*(b.Y-a.Y) + b2*(a.Y-m.Y)) / d,
		(a2*(b.X-m.X) + m2*(a.X-b.X) + b2*(m.X-a.X)) / d}
	sa, sm, sb := a.Sub(c).Angle(), m.Sub(c).Angle(), b.Sub(c).Angle()
	ccw := normAngle(sm-sa) < normAngle(sb-sa)
	sweep := normAngle(sb - sa)
	if !ccw {
		sweep -= 2 * math.Pi
	}
	return Segment{A: a, B: b, Center: c, Sweep: sweep}
}

// IsArc reports whether s is an arc.
func (s Segment) IsArc() bool { return s.Sweep != 0 }

// Radius returns the arc's radius, or +Inf for a line.
func (s Segment) Radius() float64 {
	if !s.IsArc() {
		return math.Inf(1)
	}
	return s.A.Dist(s.Center)
}

// StartAngle returns the direction from the centre to the start of an arc.
func (s Segment) StartAngle() float64 { return s.A.Sub(s.Center).Angle() }

// Length returns the length of the segment.
func (s Segment) Length() float64 {
	if !s.IsArc() {
		return s.A.Dist(s.B)
	}
	return s.Radius() * math.Abs(s.Sweep)
}

// Reverse returns the same segment run the other way.
func (s Segment) Reverse() Segment {
	return Segment{A: s.B, B: s.A, Center: s.Center, Sweep: -s.Sweep}
}

// At returns the point at parameter t: t = 0 is A, t = 1 is B, uniform in length.
func (s Segment) At(t float64) Vec {
	switch {
	case t == 0:
		return s.A
	case t == 1:
		return s.B
	case !s.IsArc():
		return s.A.Lerp(s.B, t)
	}
	return s.Center.Add(s.A.Sub(s.Center).Rotate(s.Sweep * t))
}

// Mid returns the point halfway along the segment.
func (s Segment) Mid() Vec { return s.At(0.5) }

// Tangent returns the unit direction of travel at parameter t.
func (s Segment) Tangent(t float64) Vec {
	if !s.IsArc() {
		return s.B.Sub(s.A).Unit()
	}
	r := s.At(t).Sub(s.Center).Unit()
	if s.Sweep > 0 {
		return r.Perp()
	}
	return r.Perp().Neg()
}

// Sub returns the part of s between parameters t0 and t1 (t0 < t1 keeps the direction).
func (s Segment) Sub(t0, t1 float64) Segment {
	a, b := s.At(t0), s.At(t1)
	if !s.IsArc() {
		return Line(a, b)
	}
	return Segment{A: a, B: b, Center: s.Center, Sweep: s.Sweep * (t1 - t0)}
}

// Bounds returns the smallest box holding the segment.
func (s Segment) Bounds() Box {
	b := EmptyBox().AddPoint(s.A).AddPoint(s.B)
	if !s.IsArc() {
		return b
	}
	r := s.Radius()
	for k := 0; k < 4; k++ {
		a := float64(k) * math.Pi / 2
		if s.sweepContains(a) {
			b = b.AddPoint(Polar(s.Center, r, a))
		}
	}
	return b
}

// sweepContains reports whether direction a (radians) from the centre lies within the arc.
func (s Segment) sweepContains(a float64) bool {
	if coversFullTurn(s.Sweep) {
		return true
	}
	d := normAngle(a - s.StartAngle())
	if s.Sweep > 0 {
		return d <= s.Sweep
	}
	return d == 0 || 2*math.Pi-d <= -s.Sweep
}

// angleParam returns the parameter t in [0, 1] of direction a on the arc, and whether the
// direction lies within the sweep.
func (s Segment) angleParam(a float64) (float64, bool) {
	d := normAngle(a - s.StartAngle())
	if s.Sweep < 0 {
		d = normAngle(-d)
	}
	t := d / math.Abs(s.Sweep)
	if t > 1 {
		// Directions just before the start count as the start.
		if 2*math.Pi-d < fullTurnTol {
			return 0, true
		}
		return t, false
	}
	return t, true
}

// areaTerm returns this segment's share of the signed area of a closed contour: the shoelace
// term of its chord plus, for an arc, the signed circular segment between chord and arc.
func (s Segment) areaTerm() float64 {
	a := s.A.Cross(s.B) / 2
	if s.IsArc() {
		r := s.Radius()
		a += r * r / 2 * (s.Sweep - math.Sin(s.Sweep))
	}
	return a
}

// Closest returns the point of s nearest to p and its parameter.
func (s Segment) Closest(p Vec) (Vec, float64) {
	if !s.IsArc() {
		d := s.B.Sub(s.A)
		l2 := d.Dot(d)
		if l2 == 0 {
			return s.A, 0
		}
		t := math.Max(0, math.Min(1, p.Sub(s.A).Dot(d)/l2))
		return s.At(t), t
	}
	if t, ok := s.angleParam(p.Sub(s.Center).Angle()); ok && !p.Near(s.Center) {
		return s.At(t), t
	}
	if p.Dist(s.A) <= p.Dist(s.B) {
		return s.A, 0
	}
	return s.B, 1
}

// DistanceTo returns the distance from p to the nearest point of s.
func (s Segment) DistanceTo(p Vec) float64 {
	q, _ := s.Closest(p)
	return q.Dist(p)
}

// isFinite reports whether every number of the segment is finite.
func (s Segment) isFinite() bool {
	return s.A.IsFinite() && s.B.IsFinite() && (!s.IsArc() || s.Center.IsFinite()) &&
		!math.IsNaN(s.Sweep) && !math.IsInf(s.Sweep, 0)
}

func (s Segment) String() string {
	if !s.IsArc() {
		return fmt.Sprintf("line %v-%v", s.A, s.B)
	}
	return fmt.Sprintf("arc %v-%v centre %v sweep %.6g°", s.A, s.B, s.Center, s.Sweep*180/math.Pi)
}
