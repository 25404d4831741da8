package geom

import (
	"cmp"
	"slices"
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
	boxes := make([]Box, len(segs))
	for i, p := range segs {
		boxes[i] = p.seg.Bounds().Expand(snapTol)
	}
	var found []pairCrossing
	eachBoxPair(boxes, func(i, j int) {
		for _, x := range intersect(segs[i].seg, segs[j].seg) {
			found = append(found, pairCrossing{int32(i), int32(j), x})
		}
	})
	cuts := cutsBySegment(len(segs), found)
	snap := newSnapper(len(segs) + len(found))
	out := make([]piece, 0, len(segs)+2*len(found))
	var sub []Segment
	for i, p := range segs {
		sub = cutAt(sub[:0], p.seg, cuts.row(i))
		for _, s := range sub {
			s.A, s.B = snap.point(s.A), snap.point(s.B)
			if s.A.Near(s.B) && !s.IsFullCircle() {
				continue
			}
			out = append(out, piece{s, p.src})
		}
	}
	return out
}

// pairCrossing is a crossing found between segments i and j.
type pairCrossing struct {
	i, j int32
	x    crossing
}

// cutsBySegment sorts the crossings into the cuts of each of n segments: row i holds segment
// i's, in the order the crossings were found.
func cutsBySegment(n int, found []pairCrossing) rows[crossingAt] {
	cuts := newRows[crossingAt](n)
	for _, f := range found {
		cuts.count(int(f.i))
		cuts.count(int(f.j))
	}
	cuts.allot()
	for _, f := range found {
		cuts.place(int(f.i), crossingAt{f.x.ta, f.x.at})
		cuts.place(int(f.j), crossingAt{f.x.tb, f.x.at})
	}
	return cuts
}

// crossingAt is a point where a segment is to be cut, at parameter t.
type crossingAt struct {
	t  float64
	at Vec
}

// cutAt appends to out s cut at the given crossings, in order along s. Cuts at the ends, or
// closer than snapTol to another cut, change nothing.
func cutAt(out []Segment, s Segment, cuts []crossingAt) []Segment {
	slices.SortFunc(cuts, func(a, b crossingAt) int { return cmp.Compare(a.t, b.t) })
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

// eachBoxPair calls f(i, j), i < j, for every pair of boxes that overlap, by sorting on the
// left edge and sweeping: O(n log n + pairs), and no list of pairs to allocate.
func eachBoxPair(boxes []Box, f func(i, j int)) {
	idx := make([]int32, len(boxes))
	for i := range idx {
		idx[i] = int32(i)
	}
	slices.SortFunc(idx, func(a, b int32) int { return cmp.Compare(boxes[a].Min.X, boxes[b].Min.X) })
	var active []int32
	for _, i := range idx {
		keep := active[:0]
		for _, j := range active {
			if boxes[j].Max.X >= boxes[i].Min.X {
				keep = append(keep, j)
			}
		}
		active = keep
		for _, j := range active {
			if boxes[i].Overlaps(boxes[j]) {
				f(int(min(i, j)), int(max(i, j)))
			}
		}
		active = append(active, i)
	}
}

// snapper merges each point closer than snapTol to one seen earlier into that one (the first
// the grid offers), at O(1) a point.
type snapper struct {
	grid *pointGrid
}

// snapCell is the side of a snapper's grid cell. A point needs to look into a neighbouring
// cell only when it lies within snapTol of that side, so at 16 snapTol most points look into
// their own cell alone, where at 4 snapTol they looked into all nine about it.
const snapCell = 16 * snapTol

// newSnapper returns an empty snapper with room for about n points.
func newSnapper(n int) *snapper { return &snapper{grid: newPointGrid(snapCell, snapTol, n)} }

// point returns the representative of p: an earlier point within snapTol, or p itself.
func (s *snapper) point(p Vec) Vec {
	q, found := p, false
	s.grid.near(p, func(i int) bool {
		if c := s.grid.point(i); c.Dist(p) <= snapTol {
			q, found = c, true
		}
		return !found
	})
	if !found {
		s.grid.add(p)
	}
	return q
}
