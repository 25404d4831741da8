package geom

import "math"

// This file measures how polylines (chains of points joined by straight lines, such as
// flattened outlines) and boxes lie against each other, and spaces points along polylines. It
// serves the placing of text, which keeps its boxes clear of lines and near its own.

// Corners returns the box's four corners, counter-clockwise from Min.
func (b Box) Corners() [4]Vec {
	return [4]Vec{b.Min, V(b.Max.X, b.Min.Y), b.Max, V(b.Min.X, b.Max.Y)}
}

// Gap returns the distance between boxes b and c, 0 when they overlap.
func (b Box) Gap(c Box) float64 {
	dx := max(0, b.Min.X-c.Max.X, c.Min.X-b.Max.X)
	dy := max(0, b.Min.Y-c.Max.Y, c.Min.Y-b.Max.Y)
	return math.Hypot(dx, dy)
}

// DistanceTo returns the distance from p to the box, 0 inside it.
func (b Box) DistanceTo(p Vec) float64 {
	dx := max(0, b.Min.X-p.X, p.X-b.Max.X)
	dy := max(0, b.Min.Y-p.Y, p.Y-b.Max.Y)
	return math.Hypot(dx, dy)
}

// MeetsSegment reports whether the straight segment p–q has a point in the box, boundary
// included: the segment clipped to each of the box's four sides in turn (the Liang–Barsky
// method) keeps some length or a point.
func (b Box) MeetsSegment(p, q Vec) bool {
	if max(p.X, q.X) < b.Min.X || min(p.X, q.X) > b.Max.X || max(p.Y, q.Y) < b.Min.Y || min(p.Y, q.Y) > b.Max.Y {
		return false
	}
	t0, t1 := 0.0, 1.0
	d := q.Sub(p)
	for _, e := range [4][2]float64{{-d.X, p.X - b.Min.X}, {d.X, b.Max.X - p.X}, {-d.Y, p.Y - b.Min.Y}, {d.Y, b.Max.Y - p.Y}} {
		if e[0] == 0 {
			if e[1] < 0 {
				return false
			}
			continue
		}
		if r := e[1] / e[0]; e[0] < 0 {
			t0 = max(t0, r)
		} else {
			t1 = min(t1, r)
		}
		if t0 > t1 {
			return false
		}
	}
	return true
}

// SegmentDistance returns the least distance from the straight segment p–q to the box, 0 when
// they meet. Apart, the nearest pair has an end of the segment or a corner of the box in it.
func (b Box) SegmentDistance(p, q Vec) float64 {
	if b.MeetsSegment(p, q) {
		return 0
	}
	d := min(b.DistanceTo(p), b.DistanceTo(q))
	for _, c := range b.Corners() {
		d = min(d, pointSegmentDistance(c, p, q))
	}
	return d
}

// pointSegmentDistance returns the distance from v to the straight segment p–q, which may be a
// single point.
func pointSegmentDistance(v, p, q Vec) float64 {
	d := q.Sub(p)
	t := 0.0
	if l2 := d.Dot(d); l2 > 0 {
		t = max(0, min(1, v.Sub(p).Dot(d)/l2))
	}
	return p.Add(d.Mul(t)).Dist(v)
}

// PolylineIndex holds polylines cut into runs of a few points, each with its box, so that a
// measure against a box passes over the runs that lie far from it.
type PolylineIndex struct {
	runs []polylineRun
}

type polylineRun struct {
	pts []Vec
	box Box
}

// polylineRunLength is the most points one run holds: short enough that a measure near one end
// of a long outline passes over the rest, long enough that the boxes stay few (a speed choice).
const polylineRunLength = 16

// NewPolylineIndex indexes the polylines; a polyline of one point counts as that point.
func NewPolylineIndex(lines [][]Vec) PolylineIndex {
	var x PolylineIndex
	for _, c := range lines {
		for k := 0; k == 0 || k < len(c)-1; k += polylineRunLength - 1 {
			pts := c[k:min(len(c), k+polylineRunLength)]
			if len(pts) == 0 {
				break
			}
			b := EmptyBox()
			for _, p := range pts {
				b = b.AddPoint(p)
			}
			x.runs = append(x.runs, polylineRun{pts: pts, box: b})
		}
	}
	return x
}

// Empty reports whether the index holds no polyline.
func (x PolylineIndex) Empty() bool { return len(x.runs) == 0 }

// Add indexes more polylines.
func (x *PolylineIndex) Add(lines ...[]Vec) { x.runs = append(x.runs, NewPolylineIndex(lines).runs...) }

// BoxDistance returns the least distance from box b to the polylines, 0 when one enters it,
// +Inf when there are none. A distance beyond limit may come out as any value beyond it: runs
// farther than that are not measured.
func (x PolylineIndex) BoxDistance(b Box, limit float64) float64 {
	best := math.Inf(1)
	for _, r := range x.runs {
		if r.box.Gap(b) > min(best, limit) {
			continue
		}
		if len(r.pts) == 1 {
			best = min(best, b.DistanceTo(r.pts[0]))
		}
		for k := 1; k < len(r.pts); k++ {
			if best = min(best, b.SegmentDistance(r.pts[k-1], r.pts[k])); best == 0 {
				return 0
			}
		}
	}
	return best
}

// Crosses reports whether any polyline enters box b.
func (x PolylineIndex) Crosses(b Box) bool {
	for _, r := range x.runs {
		if !r.box.Overlaps(b) {
			continue
		}
		if len(r.pts) == 1 && b.ContainsPoint(r.pts[0]) {
			return true
		}
		for k := 1; k < len(r.pts); k++ {
			if b.MeetsSegment(r.pts[k-1], r.pts[k]) {
				return true
			}
		}
	}
	return false
}

// PointsAlong returns points every step along each polyline, from its first point, the step
// widened where needed to the total length over most, so that about most come back on long
// lines (one more per polyline, counting its first point); a polyline of one point gives that
// point.
func PointsAlong(lines [][]Vec, step float64, most int) []Vec {
	total := 0.0
	for _, c := range lines {
		for i := 1; i < len(c); i++ {
			total += c[i].Dist(c[i-1])
		}
	}
	if most > 0 {
		step = max(step, total/float64(most))
	}
	var out []Vec
	for _, c := range lines {
		if len(c) == 1 {
			out = append(out, c[0])
		}
		left := 0.0 // distance to the next point
		for i := 1; i < len(c); i++ {
			l := c[i].Dist(c[i-1])
			for ; l > 0 && left <= l; left += step {
				out = append(out, c[i-1].Lerp(c[i], left/l))
			}
			left -= l
		}
	}
	return out
}
