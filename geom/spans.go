package geom

import "math"

// This file keeps sets of parameter ranges along one segment, and finds the range of a segment
// that lies in a half-plane or a disc: the arithmetic under the offset prefilter.

// span is the open parameter range (lo, hi) of a segment, 0 ≤ lo < hi ≤ 1.
type span struct{ lo, hi float64 }

// spans is a set of disjoint spans in increasing order.
type spans []span

// whole is the span of the entire segment.
var whole = span{0, 1}

// addSpan appends (lo, hi) clipped to [0, 1] when anything of it remains. Callers append in
// increasing order and merge afterwards.
func addSpan(out spans, lo, hi float64) spans {
	lo, hi = math.Max(lo, 0), math.Min(hi, 1)
	if hi > lo {
		out = append(out, span{lo, hi})
	}
	return out
}

// intersectSpans appends to out the spans common to a and b.
func intersectSpans(out, a, b spans) spans {
	for i, j := 0, 0; i < len(a) && j < len(b); {
		out = addSpan(out, math.Max(a[i].lo, b[j].lo), math.Min(a[i].hi, b[j].hi))
		if a[i].hi < b[j].hi {
			i++
		} else {
			j++
		}
	}
	return out
}

// unionSpans appends to out the spans covered by a or b, merging those that touch.
func unionSpans(out, a, b spans) spans {
	start := len(out)
	for i, j := 0, 0; i < len(a) || j < len(b); {
		var s span
		if j >= len(b) || (i < len(a) && a[i].lo <= b[j].lo) {
			s, i = a[i], i+1
		} else {
			s, j = b[j], j+1
		}
		if n := len(out); n > start && s.lo <= out[n-1].hi {
			out[n-1].hi = math.Max(out[n-1].hi, s.hi)
			continue
		}
		out = append(out, s)
	}
	return out
}

// subtractSpans appends to out what remains of a after removing every span of cut.
func subtractSpans(out, a, cut spans) spans {
	j := 0
	for _, s := range a {
		lo := s.lo
		for j < len(cut) && cut[j].hi <= lo {
			j++
		}
		for k := j; k < len(cut) && cut[k].lo < s.hi; k++ {
			out = addSpan(out, lo, math.Min(cut[k].lo, s.hi))
			lo = math.Max(lo, cut[k].hi)
		}
		out = addSpan(out, lo, s.hi)
	}
	return out
}

// curve is a segment with the numbers the span functions need of an arc worked out once:
// they are asked about one segment many times.
type curve struct {
	Segment
	radius, start float64 // of an arc
}

// newCurve returns s as a curve.
func newCurve(s Segment) curve {
	c := curve{Segment: s}
	if s.IsArc() {
		c.radius, c.start = s.Radius(), s.StartAngle()
	}
	return c
}

// halfPlaneSpans appends the spans of s whose points p satisfy (p − o)·n < k.
func halfPlaneSpans(out spans, s curve, o, n Vec, k float64) spans {
	if !s.IsArc() {
		a := s.B.Sub(s.A).Dot(n)
		b := s.A.Sub(o).Dot(n) - k // the condition is b + a·t < 0
		switch {
		case a == 0 && b < 0:
			return append(out, whole)
		case a == 0:
			return out
		case a > 0:
			return addSpan(out, 0, -b/a)
		}
		return addSpan(out, -b/a, 1)
	}
	// With q = p − centre, |q| = radius, the condition is q·n < k − (centre − o)·n: the cosine of
	// the angle between q and n is below kappa.
	l := n.Len()
	if l == 0 {
		if k > 0 {
			return append(out, whole)
		}
		return out
	}
	kappa := (k - s.Center.Sub(o).Dot(n)) / (s.radius * l)
	switch {
	case kappa > 1:
		return append(out, whole)
	case kappa <= -1:
		return out
	}
	return cosBelowSpans(out, s, n.Angle(), math.Acos(kappa))
}

// cosBelowSpans appends the spans of arc s where the direction from the centre lies more than
// alpha (0 ≤ alpha ≤ π) from direction psi, that is where x = angle − psi lies in
// (alpha, 2π − alpha) modulo 2π.
func cosBelowSpans(out spans, s curve, psi, alpha float64) spans {
	x0 := s.start - psi
	xs, xe := x0, x0+s.Sweep
	if s.Sweep < 0 {
		xs, xe = xe, xs
	}
	start := len(out)
	for m := math.Floor((xs - alpha) / (2 * math.Pi)); alpha+2*math.Pi*m < xe; m++ {
		lo, hi := math.Max(xs, alpha+2*math.Pi*m), math.Min(xe, 2*math.Pi*(m+1)-alpha)
		if hi <= lo {
			continue
		}
		t0, t1 := (lo-x0)/s.Sweep, (hi-x0)/s.Sweep
		out = addSpan(out, math.Min(t0, t1), math.Max(t0, t1))
	}
	if s.Sweep < 0 { // found in decreasing t: put them in order
		for i, j := start, len(out)-1; i < j; i, j = i+1, j-1 {
			out[i], out[j] = out[j], out[i]
		}
	}
	return out
}

// discSpans appends the spans of s that lie strictly within r of w.
func discSpans(out spans, s curve, w Vec, r float64) spans {
	if !s.IsArc() {
		dir, v := s.B.Sub(s.A), s.A.Sub(w)
		qa, qb, qc := dir.Dot(dir), v.Dot(dir), v.Dot(v)-r*r
		disc := qb*qb - qa*qc
		if qa == 0 || disc <= 0 {
			return out
		}
		sq := math.Sqrt(disc)
		return addSpan(out, (-qb-sq)/qa, (-qb+sq)/qa)
	}
	// On the circle |q| = R (q = p − centre), |q − w'|² < r² with w' = w − centre is the
	// half-plane q·(−w') < −(R² + |w'|² − r²)/2.
	c := s.Center
	wc := w.Sub(c)
	return halfPlaneSpans(out, s, c, wc.Neg(), -(s.radius*s.radius+wc.Dot(wc)-r*r)/2)
}
