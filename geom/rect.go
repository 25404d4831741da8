package geom

import "math"

// Box is an axis-aligned rectangle, Min at the lower left. The empty box has Min > Max.
type Box struct{ Min, Max Vec }

// EmptyBox returns a box that contains nothing; extending it by a point gives that point.
func EmptyBox() Box {
	inf := math.Inf(1)
	return Box{Vec{inf, inf}, Vec{-inf, -inf}}
}

// IsEmpty reports whether the box contains no point.
func (b Box) IsEmpty() bool { return b.Min.X > b.Max.X || b.Min.Y > b.Max.Y }

// AddPoint returns the smallest box holding b and p.
func (b Box) AddPoint(p Vec) Box {
	return Box{Vec{math.Min(b.Min.X, p.X), math.Min(b.Min.Y, p.Y)},
		Vec{math.Max(b.Max.X, p.X), math.Max(b.Max.Y, p.Y)}}
}

// Union returns the smallest box holding b and c.
func (b Box) Union(c Box) Box {
	if c.IsEmpty() {
		return b
	}
	return b.AddPoint(c.Min).AddPoint(c.Max)
}

// Size returns the width and height of the box.
func (b Box) Size() Vec { return b.Max.Sub(b.Min) }

// Center returns the middle of the box.
func (b Box) Center() Vec { return b.Min.Lerp(b.Max, 0.5) }

// Expand returns the box grown by d on every side.
func (b Box) Expand(d float64) Box {
	return Box{b.Min.Sub(Vec{d, d}), b.Max.Add(Vec{d, d})}
}

// Overlaps reports whether b and c share at least one point.
func (b Box) Overlaps(c Box) bool {
	return b.Min.X <= c.Max.X && c.Min.X <= b.Max.X && b.Min.Y <= c.Max.Y && c.Min.Y <= b.Max.Y
}

// ContainsPoint reports whether p lies in the box, edges included.
func (b Box) ContainsPoint(p Vec) bool {
	return p.X >= b.Min.X && p.X <= b.Max.X && p.Y >= b.Min.Y && p.Y <= b.Max.Y
}
