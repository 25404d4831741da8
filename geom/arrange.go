package geom

import (
	"math"
	"sort"
)

// This file cuts contours into pieces where they meet and joins chosen pieces back into
// closed contours and regions. Offsets and booleans share it: each makes candidate pieces,
// keeps those that belong to the answer, and hands them here to be chained and assembled.

// snapTol is the distance within which crossing points computed from different pairs of
// segments are taken to be one point. Crossings of nearly tangent curves lose about half the
// float64 digits (√ε·r ≈ 1e-8·r), so 1e-7 mm covers parts up to 10 mm radius of curvature at
// full precision and larger ones at a tenth of a nanometre; it is still far below any
// feature a cutter can make.
const snapTol = 1e-7

// piece is part of a segment between two points where it meets other segments, with the
// index of the input group (contour or operand) it came from.
type piece struct {
	seg Segment
	src int
}

// splitPieces cuts every segment of every group at every point where it meets any other
// segment (of its own group or another), and returns the pieces tagged with their group.
// Pieces shorter than pointTol are dropped. Crossing points found from different pairs are
// merged when they lie within snapTol, so pieces that meet share their end points exactly.
func splitPieces(groups [][]Segment) []piece {
	var segs []piece
	for g, ss := range groups {
		for _, s := range ss {
			if s.Length() > pointTol {
				segs = append(segs, piece{s, g})
			}
		}
	}
	cuts := make([][]crossingAt, len(segs))
	boxes := make([]Box, len(segs))
	for i, p := range segs {
		boxes[i] = p.seg.Bounds().Expand(snapTol)
	}
	for _, pr := range boxPairs(boxes) {
		i, j := pr[0], pr[1]
		for _, x := range intersect(segs[i].seg, segs[j].seg) {
			cuts[i] = append(cuts[i], crossingAt{x.ta, x.at})
			cuts[j] = append(cuts[j], crossingAt{x.tb, x.at})
		}
	}
	snap := newSnapper()
	var out []piece
	for i, p := range segs {
		for _, s := range cutAt(p.seg, cuts[i]) {
			s.A, s.B = snap.point(s.A), snap.point(s.B)
			if s.A.Near(s.B) && !(s.IsArc() && math.Abs(s.Sweep) > math.Pi) {
				continue
			}
			out = append(out, piece{s, p.src})
		}
	}
	return out
}

// crossingAt is a point where a segment is to be cut, at parameter t.
type crossingAt struct {
	t  float64
	at Vec
}

// cutAt returns s cut at the given crossings, in order along s. Cuts at the ends, or closer
// than snapTol to another cut, change nothing.
func cutAt(s Segment, cuts []crossingAt) []Segment {
	sort.Slice(cuts, func(a, b int) bool { return cuts[a].t < cuts[b].t })
	var out []Segment
	t0, a := 0.0, s.A
	for _, c := range cuts {
		if c.t <= 0 || c.t >= 1 || c.at.Dist(a) <= snapTol || c.at.Dist(s.B) <= snapTol {
			continue
		}
		sub := s.Sub(t0, c.t)
		sub.A, sub.B = a, c.at
		out = append(out, sub)
		t0, a = c.t, c.at
	}
	last := s.Sub(t0, 1)
	last.A, last.B = a, s.B
	return append(out, last)
}

// snapper merges points closer than snapTol into the first of them seen, using a hash grid
// so that it costs O(1) a point.
type snapper struct {
	cells map[[2]int64][]Vec
}

func newSnapper() *snapper { return &snapper{cells: map[[2]int64][]Vec{}} }

func (s *snapper) cell(p Vec) [2]int64 {
	const size = 4 * snapTol
	return [2]int64{int64(math.Floor(p.X / size)), int64(math.Floor(p.Y / size))}
}

// point returns the representative of p: an earlier point within snapTol, or p itself.
func (s *snapper) point(p Vec) Vec {
	c := s.cell(p)
	for dx := int64(-1); dx <= 1; dx++ {
		for dy := int64(-1); dy <= 1; dy++ {
			for _, q := range s.cells[[2]int64{c[0] + dx, c[1] + dy}] {
				if q.Dist(p) <= snapTol {
					return q
				}
			}
		}
	}
	s.cells[c] = append(s.cells[c], p)
	return p
}
