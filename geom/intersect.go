package geom

import (
	"math"
)

// crossing is one point shared by two segments, with its parameter on each.
type crossing struct {
	at     Vec
	ta, tb float64
}

// intersect returns the points shared by s and t, tangent touches and shared end points
// included. Where the two overlap along a common line or circle, the ends of the overlap are
// returned. Points within pointTol of an end point are snapped to it (parameter 0 or 1).
func intersect(s, t Segment) []crossing {
	if !s.Bounds().Expand(pointTol).Overlaps(t.Bounds()) {
		return nil
	}
	var pts []Vec
	switch {
	case !s.IsArc() && !t.IsArc():
		pts = lineLine(s, t)
	case !s.IsArc():
		pts = lineCircle(s, t.Center, t.Radius())
	case !t.IsArc():
		pts = lineCircle(t, s.Center, s.Radius())
	default:
		pts = circleCircle(s, t)
	}
	var out []crossing
	for _, p := range pts {
		if s.offCurve(p) > snapTol || t.offCurve(p) > snapTol {
			continue
		}
		ta, oka := s.paramOf(p)
		tb, okb := t.paramOf(p)
		if !oka || !okb {
			continue
		}
		p = snapEnd(s, ta, snapEnd(t, tb, p))
		out = append(out, crossing{at: p, ta: ta, tb: tb})
	}
	return dedupCrossings(out)
}

// offCurve returns how far p lies from the line or circle that s runs on.
func (s Segment) offCurve(p Vec) float64 {
	if !s.IsArc() {
		return math.Abs(s.B.Sub(s.A).Unit().Cross(p.Sub(s.A)))
	}
	return math.Abs(p.Dist(s.Center) - s.Radius())
}

// snapEnd returns the end point of s when parameter t is an end, else p.
func snapEnd(s Segment, t float64, p Vec) Vec {
	switch t {
	case 0:
		return s.A
	case 1:
		return s.B
	}
	return p
}

// paramOf returns the parameter of p, a point known to lie on s's line or circle, and whether
// it lies within the segment. Points within pointTol of an end get exactly 0 or 1.
func (s Segment) paramOf(p Vec) (float64, bool) {
	if p.Near(s.A) {
		return 0, true
	}
	if p.Near(s.B) {
		return 1, true
	}
	if !s.IsArc() {
		d := s.B.Sub(s.A)
		t := p.Sub(s.A).Dot(d) / d.Dot(d)
		return t, t > 0 && t < 1
	}
	t, ok := s.angleParam(p.Sub(s.Center).Angle())
	return t, ok && t > 0 && t < 1
}

// lineLine returns the points where two straight segments' lines meet, or the four end points
// when they lie on one line (paramOf then keeps those within both).
func lineLine(s, t Segment) []Vec {
	d1, d2 := s.B.Sub(s.A), t.B.Sub(t.A)
	den := d1.Cross(d2)
	if math.Abs(den) <= 1e-12*d1.Len()*d2.Len() {
		if math.Abs(d1.Unit().Cross(t.A.Sub(s.A))) > pointTol {
			return nil // parallel, apart
		}
		return []Vec{s.A, s.B, t.A, t.B}
	}
	u := t.A.Sub(s.A).Cross(d2) / den
	return []Vec{s.A.Add(d1.Mul(u))}
}

// lineCircle returns the points where the segment's line meets the circle (c, r).
func lineCircle(s Segment, c Vec, r float64) []Vec {
	d := s.B.Sub(s.A).Unit()
	foot := s.A.Add(d.Mul(c.Sub(s.A).Dot(d)))
	h := foot.Dist(c)
	switch {
	case h > r+pointTol:
		return nil
	case h >= r-pointTol:
		return []Vec{foot}
	}
	w := math.Sqrt(r*r - h*h)
	return []Vec{foot.Sub(d.Mul(w)), foot.Add(d.Mul(w))}
}

// circleCircle returns the points where the two arcs' circles meet, or the arcs' end points
// when the circles are one.
func circleCircle(s, t Segment) []Vec {
	r1, r2 := s.Radius(), t.Radius()
	v := t.Center.Sub(s.Center)
	d := v.Len()
	if d <= snapTol && math.Abs(r1-r2) <= snapTol {
		// One circle, as far as crossings can tell: the overlap's ends are the end points.
		return []Vec{s.A, s.B, t.A, t.B}
	}
	if d <= pointTol || d > r1+r2+pointTol || d < math.Abs(r1-r2)-pointTol {
		return nil
	}
	u := v.Mul(1 / d)
	a := (r1*r1 - r2*r2 + d*d) / (2 * d)
	h2 := r1*r1 - a*a
	if h2 <= 0 {
		// Tangent, or missing by less than pointTol: the touching point on the first circle.
		return []Vec{s.Center.Add(u.Mul(math.Copysign(r1, a)))}
	}
	base := s.Center.Add(u.Mul(a))
	h := math.Sqrt(h2)
	return []Vec{base.Add(u.Perp().Mul(h)), base.Sub(u.Perp().Mul(h))}
}

// dedupCrossings drops crossings that repeat a point already listed.
func dedupCrossings(xs []crossing) []crossing {
	out := xs[:0]
outer:
	for _, x := range xs {
		for _, y := range out {
			if x.at.Near(y.at) {
				continue outer
			}
		}
		out = append(out, x)
	}
	return out
}

// boxPairs returns every pair (i, j), i < j, of boxes that overlap (see eachBoxPair).
func boxPairs(boxes []Box) [][2]int {
	var pairs [][2]int
	eachBoxPair(boxes, func(i, j int) { pairs = append(pairs, [2]int{i, j}) })
	return pairs
}

// selfCrossing is where two segments of one contour meet other than at their shared joint.
type selfCrossing struct {
	i, j int
	at   Vec
}

// firstSelfCrossing finds two segments of c that meet anywhere except the joint between
// neighbours, which marks a contour that crosses or touches itself.
func (c Contour) firstSelfCrossing() (selfCrossing, bool) {
	n := len(c)
	boxes := make([]Box, n)
	for i, s := range c {
		boxes[i] = s.Bounds().Expand(pointTol)
	}
	for _, p := range boxPairs(boxes) {
		i, j := p[0], p[1]
		for _, x := range intersect(c[i], c[j]) {
			if j == i+1 && x.ta == 1 && x.tb == 0 {
				continue
			}
			if i == 0 && j == n-1 && x.ta == 0 && x.tb == 1 {
				continue
			}
			return selfCrossing{i, j, x.at}, true
		}
	}
	return selfCrossing{}, false
}

// firstCrossing returns a point shared by two contours, if any.
func firstCrossing(a, b Contour) (Vec, bool) {
	boxes := make([]Box, 0, len(a)+len(b))
	for _, s := range a {
		boxes = append(boxes, s.Bounds().Expand(pointTol))
	}
	for _, s := range b {
		boxes = append(boxes, s.Bounds().Expand(pointTol))
	}
	for _, p := range boxPairs(boxes) {
		i, j := p[0], p[1]
		if i >= len(a) || j < len(a) {
			continue
		}
		if xs := intersect(a[i], b[j-len(a)]); len(xs) > 0 {
			return xs[0].at, true
		}
	}
	return Vec{}, false
}
