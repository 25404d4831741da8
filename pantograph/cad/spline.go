package cad

import (
	"math"

	"panto/geom"
)

// maxSplineDegree bounds a spline's degree; drawing programs write 2 or 3, and evaluation
// costs grow with the square of it.
const maxSplineDegree = 15

// spline reads a SPLINE: a B-spline (rational when weights are given) by its degree, knots and
// control points, flattened to chords within the chord tolerance. A spline given only by fit
// points is drawn through them with straight lines, and the report says so.
func (r *dxfReader) spline(em emitter, m affine) error {
	s, fit, err := r.splineGroups(em)
	if err != nil {
		return err
	}
	if len(s.ctrl) == 0 {
		if len(fit) < 2 {
			return em.errf("has neither control points (group 10) nor fit points (group 11)")
		}
		r.found.warnf("line %d: SPLINE has fit points only: drawn through them with straight lines", em.e.line)
		vs := make([]vertex, len(fit))
		for i, p := range fit {
			vs[i] = vertex{p: p}
		}
		return em.polySegments(m, vs, false)
	}
	if msg := s.check(); msg != "" {
		return em.errf("%s", msg)
	}
	for i := range s.ctrl {
		s.ctrl[i] = m.apply(s.ctrl[i]) // B-splines are affine invariant: map the control points
	}
	for _, seg := range s.flatten(r.tol) {
		if err := em.addMapped(seg); err != nil {
			return err
		}
	}
	return nil
}

// splineGroups reads a SPLINE's degree, knots, control points, weights and fit points.
func (r *dxfReader) splineGroups(em emitter) (bspline, []geom.Vec, error) {
	var s bspline
	var fit []geom.Vec
	deg, err := em.e.num(r.file, 71, 3)
	if err != nil {
		return s, nil, err
	}
	s.deg = int(math.Max(-1, math.Min(deg, maxSplineDegree+1)))
	for _, g := range em.e.groups {
		if g.code != 10 && g.code != 20 && g.code != 11 && g.code != 21 && g.code != 40 && g.code != 41 {
			continue
		}
		v, err := parseNum(r.file, em.e.kind, g)
		if err != nil {
			return s, nil, err
		}
		switch g.code {
		case 10:
			s.ctrl = append(s.ctrl, geom.V(v, 0))
		case 20:
			setY(s.ctrl, v)
		case 11:
			fit = append(fit, geom.V(v, 0))
		case 21:
			setY(fit, v)
		case 40:
			s.knots = append(s.knots, v)
		case 41:
			s.weights = append(s.weights, v)
		}
	}
	return s, fit, nil
}

// setY sets the y of the last point, when there is one.
func setY(ps []geom.Vec, y float64) {
	if len(ps) > 0 {
		ps[len(ps)-1].Y = y
	}
}

// bspline is a (possibly rational) B-spline curve.
type bspline struct {
	deg     int
	knots   []float64
	ctrl    []geom.Vec
	weights []float64 // empty, or one per control point
}

// check returns what is wrong with the spline's numbers, or "".
func (s bspline) check() string {
	switch {
	case s.deg < 1 || s.deg > maxSplineDegree:
		return "degree (group 71) must be between 1 and 15"
	case len(s.ctrl) < s.deg+1:
		return "has fewer control points than its degree needs"
	case len(s.knots) != len(s.ctrl)+s.deg+1:
		return "the number of knots (group 40) must be the number of control points + degree + 1"
	case len(s.weights) != 0 && len(s.weights) != len(s.ctrl):
		return "has weights (group 41), but not one for each control point"
	}
	for i := 1; i < len(s.knots); i++ {
		if s.knots[i] < s.knots[i-1] {
			return "knots (group 40) must not decrease"
		}
	}
	for _, w := range s.weights {
		if !(w > 0) {
			return "weights (group 41) must be greater than 0"
		}
	}
	if s.knots[s.deg] >= s.knots[len(s.ctrl)] {
		return "the knots leave no span to draw"
	}
	return ""
}

// at evaluates the curve at parameter t by de Boor's algorithm in homogeneous coordinates.
func (s bspline) at(t float64) geom.Vec {
	n := len(s.ctrl)
	k := s.deg
	for k < n-1 && t >= s.knots[k+1] {
		k++
	}
	type hp struct{ x, y, w float64 }
	d := make([]hp, s.deg+1)
	for j := range d {
		i := k - s.deg + j
		w := 1.0
		if len(s.weights) > 0 {
			w = s.weights[i]
		}
		d[j] = hp{s.ctrl[i].X * w, s.ctrl[i].Y * w, w}
	}
	for r := 1; r <= s.deg; r++ {
		for j := s.deg; j >= r; j-- {
			i := k - s.deg + j
			den := s.knots[i+s.deg-r+1] - s.knots[i]
			a := 0.0
			if den > 0 {
				a = (t - s.knots[i]) / den
			}
			d[j] = hp{(1-a)*d[j-1].x + a*d[j].x, (1-a)*d[j-1].y + a*d[j].y, (1-a)*d[j-1].w + a*d[j].w}
		}
	}
	return geom.V(d[s.deg].x/d[s.deg].w, d[s.deg].y/d[s.deg].w)
}

// splineDepth bounds how often one span is halved while flattening: 2^12 chords per sample
// interval is more than any tolerance needs on a drawing of a part.
const splineDepth = 12

// flatten returns chords within tol of the curve: 8 samples per knot span, each interval halved
// until its middle and first quarter lie within tol of the chord. Past maxCurvePieces chords
// the intervals are no longer halved, so the work stays bounded on hostile input.
func (s bspline) flatten(tol float64) []geom.Segment {
	var ts []float64
	for i := s.deg; i < len(s.ctrl); i++ {
		a, b := s.knots[i], s.knots[i+1]
		if b <= a {
			continue
		}
		for j := 0; j < 8; j++ {
			ts = append(ts, a+(b-a)*float64(j)/8)
		}
	}
	ts = append(ts, s.knots[len(s.ctrl)])
	var out []geom.Segment
	for i := 1; i < len(ts); i++ {
		out = s.refine(out, ts[i-1], ts[i], s.at(ts[i-1]), s.at(ts[i]), tol, 0)
	}
	return out
}

func (s bspline) refine(out []geom.Segment, t0, t1 float64, a, b geom.Vec, tol float64, depth int) []geom.Segment {
	tm := (t0 + t1) / 2
	m := s.at(tm)
	chord := geom.Line(a, b)
	if depth >= splineDepth || len(out) >= maxCurvePieces ||
		chord.DistanceTo(m) <= tol && chord.DistanceTo(s.at(t0+(t1-t0)/4)) <= tol {
		return append(out, chord)
	}
	out = s.refine(out, t0, tm, a, m, tol, depth+1)
	return s.refine(out, tm, t1, m, b, tol, depth+1)
}
