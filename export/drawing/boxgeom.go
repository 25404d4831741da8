package drawing

import (
	"math"

	"panto/geom"
)

// Distances between the ink boxes of labels and the lines of a drawing, which is all the label
// search and its tests measure.

// chain is a line through points, with the box that holds them, so a measure can pass over
// the chains that are far off.
type chain struct {
	pts []geom.Vec
	box geom.Box
}

// chainPiece is the most points one chain holds: a long outline is cut into pieces this long,
// each with its own box, so a measure near one end passes over the rest (a speed choice).
const chainPiece = 16

// newChains returns the line through pts as chains of at most chainPiece points.
func newChains(pts []geom.Vec) []chain {
	var out []chain
	for i := 0; i == 0 || i < len(pts)-1; i += chainPiece - 1 {
		piece := pts[i:min(len(pts), i+chainPiece)]
		b := geom.EmptyBox()
		for _, p := range piece {
			b = b.AddPoint(p)
		}
		out = append(out, chain{pts: piece, box: b})
	}
	return out
}

// chainsBoxDist returns the least distance from box b to any of the chains, 0 when one crosses
// or lies in it; distances beyond limit come out as +Inf or as some value above limit.
func chainsBoxDist(chains []chain, b geom.Box, limit float64) float64 {
	best := math.Inf(1)
	for _, c := range chains {
		if boxDist(c.box, b) > math.Min(best, limit) {
			continue
		}
		if len(c.pts) == 1 {
			best = math.Min(best, pointBoxDist(c.pts[0], b))
		}
		for i := 1; i < len(c.pts); i++ {
			best = math.Min(best, segBoxDist(c.pts[i-1], c.pts[i], b))
			if best == 0 {
				return 0
			}
		}
	}
	return best
}

// polyMeetsBox reports whether the line through pts (closed when asked) touches box b.
func polyMeetsBox(pts []geom.Vec, closed bool, b geom.Box) bool {
	for i := 1; i < len(pts); i++ {
		if segMeetsBox(pts[i-1], pts[i], b) {
			return true
		}
	}
	return closed && len(pts) > 2 && segMeetsBox(pts[len(pts)-1], pts[0], b)
}

// segBoxDist returns the least distance from the segment a–b to box bx, 0 when they meet.
func segBoxDist(a, b geom.Vec, bx geom.Box) float64 {
	if segMeetsBox(a, b, bx) {
		return 0
	}
	d := min(pointBoxDist(a, bx), pointBoxDist(b, bx))
	for _, c := range boxCorners(bx) {
		d = min(d, pointSegDist(c, a, b))
	}
	return d
}

// segMeetsBox reports whether segment a–b has a point in box bx (Liang–Barsky clipping).
func segMeetsBox(a, b geom.Vec, bx geom.Box) bool {
	if max(a.X, b.X) < bx.Min.X || min(a.X, b.X) > bx.Max.X || max(a.Y, b.Y) < bx.Min.Y || min(a.Y, b.Y) > bx.Max.Y {
		return false
	}
	t0, t1 := 0.0, 1.0
	d := b.Sub(a)
	for _, e := range [4][2]float64{{-d.X, a.X - bx.Min.X}, {d.X, bx.Max.X - a.X}, {-d.Y, a.Y - bx.Min.Y}, {d.Y, bx.Max.Y - a.Y}} {
		p, q := e[0], e[1]
		if p == 0 {
			if q < 0 {
				return false
			}
			continue
		}
		r := q / p
		if p < 0 {
			t0 = math.Max(t0, r)
		} else {
			t1 = math.Min(t1, r)
		}
		if t0 > t1 {
			return false
		}
	}
	return true
}

// pointBoxDist returns the distance from p to box b, 0 inside it.
func pointBoxDist(p geom.Vec, b geom.Box) float64 {
	dx := max(0, b.Min.X-p.X, p.X-b.Max.X)
	dy := max(0, b.Min.Y-p.Y, p.Y-b.Max.Y)
	return math.Sqrt(dx*dx + dy*dy)
}

// pointSegDist returns the distance from p to the segment a–b.
func pointSegDist(p, a, b geom.Vec) float64 {
	d := b.Sub(a)
	l2 := d.Dot(d)
	if l2 == 0 {
		return p.Dist(a)
	}
	t := max(0, min(1, p.Sub(a).Dot(d)/l2))
	q := a.Add(d.Mul(t)).Sub(p)
	return math.Sqrt(q.X*q.X + q.Y*q.Y)
}

// boxCorners returns the four corners of b.
func boxCorners(b geom.Box) [4]geom.Vec {
	return [4]geom.Vec{b.Min, geom.V(b.Max.X, b.Min.Y), b.Max, geom.V(b.Min.X, b.Max.Y)}
}

// boxDist returns the gap between boxes a and b, 0 when they overlap.
func boxDist(a, b geom.Box) float64 {
	dx := max(0, a.Min.X-b.Max.X, b.Min.X-a.Max.X)
	dy := max(0, a.Min.Y-b.Max.Y, b.Min.Y-a.Max.Y)
	return math.Sqrt(dx*dx + dy*dy)
}
