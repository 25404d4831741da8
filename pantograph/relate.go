package pantograph

import (
	"errors"
	"math"

	"panto/geom"
)

// This file measures how two outlines lie against each other: apart (and how far), one inside
// the other, or crossing (and how deep). It is built on geom's exact segment distances and
// region validation; the general measures of a region live in geom.

// probeTol is the chord tolerance, in mm, used when sampling an outline to find how deep it
// reaches across another: a tenth of a micrometre, ten times finer than geom's default chord
// tolerance, so reported overlaps are good to well under a micrometre.
const probeTol = 1e-4

// touchTol is the distance, in mm, below which two outlines count as touching: a tenth of a
// micrometre, below anything a pantograph can cut and above float noise on parts under a metre.
const touchTol = 1e-7

// relation is how outline b lies against outline a.
type relation int

const (
	apart    relation = iota // no shared point; amount is the gap between them
	bInsideA                 // b lies inside a
	aInsideB                 // a lies inside b
	crossing                 // they cross or touch; amount is how deep b reaches into a
)

// relate reports how b lies against a, and the matching amount (see relation). Both must be
// valid closed contours.
func relate(a, b geom.Contour) (relation, float64) {
	err := geom.Region{Outer: a, Holes: []geom.Contour{b}}.Validate()
	switch {
	case err == nil:
		return bInsideA, gap(a, b)
	case errors.Is(err, geom.ErrHoleCrossing):
		return crossing, reach(b, a, true)
	case a.Contains(b[0].Mid()):
		return bInsideA, gap(a, b)
	case b.Contains(a[0].Mid()):
		return aInsideB, gap(a, b)
	}
	return apart, gap(a, b)
}

// reach returns how far the points of b lie beyond a's boundary: inside a when inside is true,
// outside it otherwise. It is 0 when b does not cross to that side.
//
// The farthest point is found among points of b sampled within probeTol, and the points of b's
// arcs that face a's segments square on, where the extreme of a smooth stretch lies exactly.
func reach(b, a geom.Contour, inside bool) float64 {
	pts := b.Flatten(probeTol)
	for _, s := range b {
		for _, t := range a {
			pts = append(pts, normalPoints(s, t)...)
		}
	}
	var far float64
	for _, p := range pts {
		if a.Contains(p) != inside {
			continue
		}
		far = math.Max(far, distToContour(a, p))
	}
	return far
}

// distToContour returns the distance from p to the nearest point of c.
func distToContour(c geom.Contour, p geom.Vec) float64 {
	d := math.Inf(1)
	for _, s := range c {
		d = math.Min(d, s.DistanceTo(p))
	}
	return d
}

// gap returns the shortest distance between two contours that do not cross.
func gap(a, b geom.Contour) float64 {
	d := math.Inf(1)
	for _, s := range a {
		for _, t := range b {
			d = math.Min(d, segGap(s, t))
		}
	}
	return d
}

// segGap returns the shortest distance between two segments that do not cross. The nearest
// pair of points has an end point of one segment, or else both points inside their segments on
// a common normal: for an arc that normal passes through its centre, so the candidates are the
// arc's points facing the other segment's line or centre.
func segGap(s, t geom.Segment) float64 {
	d := math.Min(math.Min(t.DistanceTo(s.A), t.DistanceTo(s.B)),
		math.Min(s.DistanceTo(t.A), s.DistanceTo(t.B)))
	for _, p := range normalPoints(s, t) {
		d = math.Min(d, t.DistanceTo(p))
	}
	for _, p := range normalPoints(t, s) {
		d = math.Min(d, s.DistanceTo(p))
	}
	return d
}

// normalPoints returns the points of arc s whose radius is normal to t (t's line, or the line
// of centres when t is an arc), keeping those that lie on s itself.
func normalPoints(s, t geom.Segment) []geom.Vec {
	if !s.IsArc() {
		return nil
	}
	var dir geom.Vec
	if t.IsArc() {
		dir = t.Center.Sub(s.Center).Unit()
	} else {
		dir = t.B.Sub(t.A).Unit().Perp()
	}
	if dir == (geom.Vec{}) {
		return nil
	}
	r := s.Radius()
	var out []geom.Vec
	for _, p := range []geom.Vec{s.Center.Add(dir.Mul(r)), s.Center.Sub(dir.Mul(r))} {
		if s.DistanceTo(p) <= touchTol {
			out = append(out, p)
		}
	}
	return out
}
