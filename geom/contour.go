package geom

import (
	"errors"
	"fmt"
	"math"
)

// Contour is a closed chain of segments: each segment starts where the one before it ends, and
// the first starts where the last ends.
type Contour []Segment

// Polygon returns the contour of straight lines through pts, closed back to the first point.
func Polygon(pts ...Vec) Contour {
	c := make(Contour, 0, len(pts))
	for i, p := range pts {
		c = append(c, Line(p, pts[(i+1)%len(pts)]))
	}
	return c
}

// Area returns the signed area enclosed: positive when the contour runs counter-clockwise.
// Arcs are integrated exactly.
func (c Contour) Area() float64 {
	var a float64
	for _, s := range c {
		a += s.areaTerm()
	}
	return a
}

// IsCCW reports whether the contour runs counter-clockwise (encloses positive area).
func (c Contour) IsCCW() bool { return c.Area() > 0 }

// Perimeter returns the length of the contour.
func (c Contour) Perimeter() float64 {
	var l float64
	for _, s := range c {
		l += s.Length()
	}
	return l
}

// Bounds returns the smallest box holding the contour.
func (c Contour) Bounds() Box {
	b := EmptyBox()
	for _, s := range c {
		b = b.Union(s.Bounds())
	}
	return b
}

// Reverse returns the contour run the other way.
func (c Contour) Reverse() Contour {
	r := make(Contour, len(c))
	for i, s := range c {
		r[len(c)-1-i] = s.Reverse()
	}
	return r
}

// Winding returns how many times the contour winds counter-clockwise around p (negative for
// clockwise). The result is meaningless for p on the contour; use OnBoundary first.
func (c Contour) Winding(p Vec) int {
	var turn float64
	for _, s := range c {
		a, b := s.A.Sub(p), s.B.Sub(p)
		cross, dot := a.Cross(b), a.Dot(b)
		if s.IsArc() && dot < 0 && math.Abs(cross) <= pointTol*a.Sub(b).Len() {
			// p sits on an arc's chord: seen from p the arc turns exactly half a turn, the
			// way the arc runs. atan2 would pick ±π from the sign of a zero.
			turn += math.Copysign(math.Pi, s.Sweep)
			continue
		}
		turn += math.Atan2(cross, dot)
		if s.IsArc() && s.inCircularSegment(p) {
			turn += math.Copysign(2*math.Pi, s.Sweep)
		}
	}
	return int(math.Round(turn / (2 * math.Pi)))
}

// inCircularSegment reports whether p lies strictly between the arc and its chord, where the
// chord-plus-arc loop winds once around it.
func (s Segment) inCircularSegment(p Vec) bool {
	r := s.Radius()
	if p.Dist(s.Center) >= r {
		return false
	}
	if s.IsFullCircle() {
		return true // the whole disc; the chord is a point and has no side
	}
	side := s.B.Sub(s.A).Cross(p.Sub(s.A))
	return side*s.Sweep < 0
}

// OnBoundary reports whether p is within pointTol of the contour.
func (c Contour) OnBoundary(p Vec) bool {
	for _, s := range c {
		if s.DistanceTo(p) <= pointTol {
			return true
		}
	}
	return false
}

// Contains reports whether p is inside the contour or on it, whatever its orientation.
func (c Contour) Contains(p Vec) bool {
	return c.OnBoundary(p) || c.Winding(p) != 0
}

// Transform returns the contour moved by t. A mirroring transform reverses the orientation.
func (c Contour) Transform(t Transform) Contour {
	r := make(Contour, len(c))
	for i, s := range c {
		r[i] = t.Segment(s)
	}
	return r
}

// ErrNotClosed and the other errors below are wrapped by Validate with the segment's index.
var (
	ErrEmpty         = errors.New("contour has no segments")
	ErrNotFinite     = errors.New("coordinate is not a finite number")
	ErrNotClosed     = errors.New("segment does not start where the previous one ends")
	ErrZeroLength    = errors.New("segment has zero length")
	ErrBadArc        = errors.New("arc end point is not on its circle")
	ErrSelfCrossing  = errors.New("contour crosses itself")
	ErrHoleOutside   = errors.New("hole lies outside the outer contour")
	ErrHoleCrossing  = errors.New("hole crosses another contour")
	ErrZeroAreaShape = errors.New("contour encloses no area")
)

// Validate reports the first thing wrong with the contour as an error naming the segment.
func (c Contour) Validate() error {
	if len(c) == 0 {
		return ErrEmpty
	}
	for i, s := range c {
		if err := s.validate(); err != nil {
			return fmt.Errorf("segment %d: %w", i, err)
		}
		prev := c[(i+len(c)-1)%len(c)]
		if !prev.B.Near(s.A) {
			return fmt.Errorf("segment %d starts at %v, %g away from where segment %d ends: %w",
				i, s.A, prev.B.Dist(s.A), (i+len(c)-1)%len(c), ErrNotClosed)
		}
	}
	if x, ok := c.firstSelfCrossing(); ok {
		return fmt.Errorf("segments %d and %d meet at %v: %w", x.i, x.j, x.at, ErrSelfCrossing)
	}
	if math.Abs(c.Area()) <= pointTol*pointTol {
		return ErrZeroAreaShape
	}
	return nil
}

// validate checks one segment on its own.
func (s Segment) validate() error {
	switch {
	case !s.isFinite():
		return ErrNotFinite
	case s.Length() <= pointTol:
		return ErrZeroLength
	case beyondFullTurn(s.Sweep):
		return fmt.Errorf("arc sweeps %.6g°, more than a full turn: %w", s.Sweep*180/math.Pi, ErrBadArc)
	case s.IsArc() && math.Abs(s.B.Dist(s.Center)-s.Radius()) > 1e-7*math.Max(1, s.Radius()):
		return ErrBadArc
	}
	return nil
}
