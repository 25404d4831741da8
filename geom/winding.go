package geom

import (
	"math"
	"sort"
)

// windingLocator counts how often closed boundaries wind around a point by casting a ray to
// +x and adding up the signed crossings. The boundaries are kept as parts that only rise or
// only fall, sorted into horizontal strips so that a ray meets only the parts of its strip.
// While it casts, it also looks for a part that runs through the point, which the caller
// judges (see probe).
type windingLocator struct {
	parts  []monotonePart
	y0, h  float64
	strips rows[int32] // the parts reaching into each strip, rightmost first
}

// monotonePart is a line, or an arc within one quarter of its circle between the top and the
// bottom, so that every height between its ends is reached exactly once.
type monotonePart struct {
	a, b       Vec     // ends, as in the piece, so neighbours share them exactly
	lo, hi     float64 // heights of the lower and upper end
	xmin, xmax float64 // leftmost and rightmost x reached
	dir        int     // +1 rising from a to b, −1 falling, 0 level
	arc        bool
	c          Vec     // centre of an arc
	r2         float64 // squared radius of an arc
	side       float64 // +1 for the right half of the circle, −1 for the left
	piece      int     // the piece it is part of
}

// crossX returns where the part is at height y, which lies between its ends.
func (m *monotonePart) crossX(y float64) float64 {
	if !m.arc {
		return m.a.X + (y-m.a.Y)*(m.b.X-m.a.X)/(m.b.Y-m.a.Y)
	}
	dy := y - m.c.Y
	return m.c.X + m.side*math.Sqrt(math.Max(0, m.r2-dy*dy))
}

// newWindingLocator indexes the closed boundaries made of segs, which are pieces numbered
// from first on.
func newWindingLocator(segs []Segment, first int) *windingLocator {
	l := &windingLocator{parts: make([]monotonePart, 0, 2*len(segs))}
	var buf []Segment
	for k, s := range segs {
		buf = appendMonotone(buf[:0], s)
		for _, part := range buf {
			l.parts = append(l.parts, newMonotonePart(part, first+k))
		}
	}
	l.fillStrips()
	return l
}

func newMonotonePart(s Segment, piece int) monotonePart {
	b := s.Bounds()
	m := monotonePart{a: s.A, b: s.B, lo: b.Min.Y, hi: b.Max.Y, xmin: b.Min.X, xmax: b.Max.X,
		arc: s.IsArc(), piece: piece}
	switch {
	case s.B.Y > s.A.Y:
		m.dir, m.lo, m.hi = 1, s.A.Y, s.B.Y
	case s.B.Y < s.A.Y:
		m.dir, m.lo, m.hi = -1, s.B.Y, s.A.Y
	}
	if m.arc {
		m.c = s.Center
		r := s.Radius()
		m.r2 = r * r
		m.side = math.Copysign(1, s.Mid().X-s.Center.X)
	}
	return m
}

// appendMonotone appends s cut at the top and bottom of its circle, where an arc turns from
// rising to falling; a line is appended as it is. The cut parts share their cut points
// exactly.
func appendMonotone(dst []Segment, s Segment) []Segment {
	if !s.IsArc() {
		return append(dst, s)
	}
	var ts [2]float64
	n := 0
	for _, a := range [2]float64{math.Pi / 2, -math.Pi / 2} {
		if t, ok := s.angleParam(a); ok && t > 0 && t < 1 {
			ts[n] = t
			n++
		}
	}
	if n == 2 && ts[1] < ts[0] {
		ts[0], ts[1] = ts[1], ts[0]
	}
	t0 := 0.0
	for _, t := range ts[:n] {
		dst = append(dst, s.Sub(t0, t))
		t0 = t
	}
	return append(dst, s.Sub(t0, 1))
}

// fillStrips sorts the parts into horizontal strips. The strip count is chosen so that parts
// spanning several strips at most about triple the entries, and is never more than the parts.
func (l *windingLocator) fillStrips() {
	n := len(l.parts)
	lo, hi, span := math.Inf(1), math.Inf(-1), 0.0
	for _, p := range l.parts {
		lo, hi, span = math.Min(lo, p.lo), math.Max(hi, p.hi), span+p.hi-p.lo
	}
	k := 1
	if n > 8 && hi > lo && span > 0 {
		k = max(1, min(n, int(2*float64(n)*(hi-lo)/span)))
	}
	l.y0, l.h = lo, (hi-lo)/float64(k)
	if !(l.h > 0) {
		l.h = 1
	}
	l.strips = newRows[int32](k)
	for _, p := range l.parts {
		for s := l.strip(p.lo - coincideTol); s <= l.strip(p.hi+coincideTol); s++ {
			l.strips.count(s)
		}
	}
	l.strips.allot()
	for i, p := range l.parts {
		for s := l.strip(p.lo - coincideTol); s <= l.strip(p.hi+coincideTol); s++ {
			l.strips.place(s, int32(i))
		}
	}
	for s := 0; s < k; s++ {
		its := l.strips.row(s)
		sort.Slice(its, func(a, b int) bool { return l.parts[its[a]].xmax > l.parts[its[b]].xmax })
	}
}

// strip returns the strip holding height y, clamped to the strips there are.
func (l *windingLocator) strip(y float64) int {
	s := int((y - l.y0) / l.h)
	return max(0, min(l.strips.len()-1, s))
}

// probe returns how many times the boundaries wind counter-clockwise around p, and the first
// non-zero answer of along for a part whose box reaches within coincideTol of p (along is
// given the part's piece number; nil asks nothing). Each part counts crossings from its lower
// end up to but not including its upper end, so a ray through the point where two parts meet
// counts it once, or not at all where the boundary only touches the ray. The winding is
// meaningless for p on a boundary.
func (l *windingLocator) probe(p Vec, along func(piece int) int) (w, on int) {
	if len(l.parts) == 0 {
		return 0, 0
	}
	s := l.strip(p.Y)
	for _, i := range l.strips.row(s) {
		m := &l.parts[i]
		if m.xmax < p.X-coincideTol {
			break // the rest lie wholly left of p
		}
		if p.Y < m.lo-coincideTol || p.Y > m.hi+coincideTol {
			continue
		}
		if m.dir != 0 && p.Y >= m.lo && p.Y < m.hi && m.crossX(p.Y) > p.X {
			w += m.dir
		}
		if on == 0 && along != nil && p.X >= m.xmin-coincideTol {
			on = along(m.piece)
		}
	}
	return w, on
}
