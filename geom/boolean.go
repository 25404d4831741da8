package geom

import (
	"math"
	"sort"
)

// This file combines regions: union, difference and intersection. All three work the same
// way. The boundaries of every input region are cut where they meet (splitPieces); each piece
// is then judged by which inputs cover the ground just to its left and just to its right. A
// piece with the answer on exactly one side is part of the answer's boundary, turned so that
// the answer lies on its left; the others are dropped. The kept pieces are chained into loops
// and the loops assembled into regions (arrange.go). Pieces stay lines and arcs throughout, so
// the result is exact to the crossing points. Which inputs cover a side is counted by ray
// casting (winding.go); inputs that run within a few snapTol of each other without meeting
// are welded together and tried again (weld.go).
//
// Inputs whose bounding boxes touch no other input's are settled without cutting anything,
// and the rest are worked in groups of inputs whose boxes overlap, so a plate with thousands
// of separate features costs little more than its largest cluster.

// The inputs are expected to be valid regions (see Region.Validate) in any orientation; the
// regions of one operand may overlap one another. Boundaries that coincide, wholly or in
// part, are recognised as shared: regions meeting along an edge merge, and a region less
// itself leaves nothing. A result whose boundary touches itself at a single point (a disc less
// a smaller disc touching it inside) comes out as separate loops meeting there.

// Union returns the regions covering every point of any input region, dissolved into
// non-overlapping regions (outer counter-clockwise, holes clockwise).
func Union(rs ...Region) []Region { return combine(opUnion, rs, nil) }

// Difference returns the points of a that are in none of b.
func Difference(a []Region, b []Region) []Region { return combine(opDifference, a, b) }

// Intersection returns the points in both a and b.
func Intersection(a []Region, b []Region) []Region { return combine(opIntersection, a, b) }

// boolOp names one of the three combinations.
type boolOp int

const (
	opUnion boolOp = iota
	opDifference
	opIntersection
)

// keeps reports whether a point covered by the first operand (inA) and the second (inB)
// belongs to the answer.
func (o boolOp) keeps(inA, inB bool) bool {
	switch o {
	case opUnion:
		return inA || inB
	case opDifference:
		return inA && !inB
	}
	return inA && inB
}

// lonely reports whether an input from operand k (0 or 1) that meets no other input is part
// of the answer as it stands.
func (o boolOp) lonely(k int) bool {
	return o == opUnion || (o == opDifference && k == 0)
}

// coincideTol is how far apart the midpoints of two pieces with the same end points may be
// while still being one piece of boundary. splitPieces snaps end points by up to snapTol, and
// an arc piece's midpoint is turned about its centre from its (snapped) start, so each
// midpoint may stray about snapTol from the true curve; twice that covers both. A line and an
// arc, or two arcs of different radius, sharing end points are much further apart unless they
// are shorter than a few snapTol, where the difference no longer matters.
const coincideTol = 2 * snapTol

// combine normalizes the operands, settles inputs that meet nothing, and works each cluster of
// inputs with overlapping boxes on its own.
func combine(op boolOp, a, b []Region) []Region {
	in := normalized(a)
	na := len(in)
	in = append(in, normalized(b)...)
	boxes := make([]Box, len(in))
	for i, r := range in {
		boxes[i] = r.Bounds().Expand(snapTol)
	}
	var out []Region
	for _, group := range clusters(boxes) {
		if len(group) == 1 {
			if i := group[0]; op.lonely(operandOf(i, na)) {
				out = append(out, cloneRegion(in[i]))
			}
			continue
		}
		rs := make([]Region, len(group))
		ka := 0
		for k, i := range group {
			rs[k] = in[i]
			if i < na {
				ka++
			}
		}
		if op == opIntersection && (ka == 0 || ka == len(group)) {
			continue // only one operand here: nothing is in both
		}
		out = append(out, solve(op, rs, ka, boxesOf(boxes, group))...)
	}
	return out
}

// normalized returns the non-empty regions of rs, outer contours counter-clockwise and holes
// clockwise, so that every boundary has its region on the left.
func normalized(rs []Region) []Region {
	out := make([]Region, 0, len(rs))
	for _, r := range rs {
		if len(r.Outer) > 0 {
			out = append(out, r.Normalize())
		}
	}
	return out
}

// cloneRegion returns a copy of r that shares no contour with it, so that callers may change
// a result without changing an input.
func cloneRegion(r Region) Region {
	out := Region{Outer: append(Contour(nil), r.Outer...)}
	for _, h := range r.Holes {
		out.Holes = append(out.Holes, append(Contour(nil), h...))
	}
	return out
}

// operandOf returns 0 for an input of the first operand and 1 for the second.
func operandOf(i, na int) int {
	if i < na {
		return 0
	}
	return 1
}

func boxesOf(boxes []Box, idx []int) []Box {
	out := make([]Box, len(idx))
	for k, i := range idx {
		out[k] = boxes[i]
	}
	return out
}

// clusters returns the indices of the boxes grouped by chains of overlap, each group in
// increasing order and the groups ordered by their first index, so the output is the same
// from run to run.
func clusters(boxes []Box) [][]int {
	u := newUnionFind(len(boxes))
	for _, p := range boxPairs(boxes) {
		u.union(p[0], p[1])
	}
	at := map[int]int{}
	var groups [][]int
	for i := range boxes {
		r := u.find(i)
		k, ok := at[r]
		if !ok {
			k = len(groups)
			at[r] = k
			groups = append(groups, nil)
		}
		groups[k] = append(groups[k], i)
	}
	return groups
}

// solve combines one cluster of inputs: rs[:na] is the first operand, rs[na:] the second.
// When the kept pieces do not close into loops, which happens where boundaries of different
// inputs run within about snapTol of each other without quite meeting, it welds such near
// points together and tries once more, keeping whichever attempt left fewer pieces open.
func solve(op boolOp, rs []Region, na int, boxes []Box) []Region {
	out, open := solveOnce(op, rs, na, boxes)
	if open == 0 {
		return out
	}
	if again, still := solveOnce(op, weld(rs), na, boxes); still < open {
		return again
	}
	return out
}

// solveOnce cuts, judges, chains and assembles, and reports how many kept pieces could not
// be closed into loops.
func solveOnce(op boolOp, rs []Region, na int, boxes []Box) ([]Region, int) {
	groups := make([][]Segment, len(rs))
	for i, r := range rs {
		for _, c := range r.Contours() {
			groups[i] = append(groups[i], c...)
		}
	}
	ar := newArrangement(splitPieces(groups), na, boxes)
	loops, _, open := chainLoops(ar.answer(op))
	return assemble(dropSlivers(loops)), open
}

// dropSlivers removes loops whose mean width, twice the area over the perimeter, is below
// weldTol. Such slivers arise where inputs run a few snapTol apart; they are far below anything
// a cutter or printer can make, and their two sides are too close for Validate to tell apart.
func dropSlivers(loops []Contour) []Contour {
	out := loops[:0]
	for _, l := range loops {
		if 2*math.Abs(l.Area()) >= weldTol*l.Perimeter() {
			out = append(out, l)
		}
	}
	return out
}

// arrangement is the cut-up boundaries of one cluster of inputs, with what is needed to
// tell which inputs cover each side of a piece.
type arrangement struct {
	pieces []piece           // ordered by src
	inputs rows[piece]       // row j holds input j's pieces, in pieces itself
	na     int               // inputs below na belong to the first operand
	boxes  []Box             // each input's bounds
	grid   boxGrid           // finds the inputs whose bounds may hold a point
	locs   []*windingLocator // each input's, built on first use
}

func newArrangement(ps []piece, na int, boxes []Box) *arrangement {
	bySrc := func(a, b int) bool { return ps[a].src < ps[b].src }
	if !sort.SliceIsSorted(ps, bySrc) {
		sort.SliceStable(ps, bySrc)
	}
	inputs := sortedRows(ps, len(boxes), func(p piece) int { return p.src })
	wide := make([]Box, len(boxes))
	for j, b := range boxes {
		wide[j] = b.Expand(coincideTol)
	}
	return &arrangement{pieces: ps, inputs: inputs, na: na, boxes: wide, grid: newBoxGrid(wide),
		locs: make([]*windingLocator, len(boxes))}
}

// endKey identifies a piece by its end points in either order; splitPieces leaves pieces
// that lie on one another with exactly the same end points.
func endKey(s Segment) [2]Vec {
	a, b := s.A, s.B
	if b.X < a.X || (b.X == a.X && b.Y < a.Y) {
		a, b = b, a
	}
	return [2]Vec{a, b}
}

// answer returns the pieces that bound the answer, each turned to have the answer on its
// left. Their src is 0: they all belong to one result, so pieces from different inputs that
// continue one line or circle may be merged when chained.
func (ar *arrangement) answer(op boolOp) []piece {
	var out []piece
	for i, p := range ar.pieces {
		left, right, ok := ar.sides(i)
		if !ok {
			continue
		}
		inL := op.keeps(left[0] > 0, left[1] > 0)
		inR := op.keeps(right[0] > 0, right[1] > 0)
		switch {
		case inL && !inR:
			out = append(out, piece{seg: p.seg})
		case inR && !inL:
			out = append(out, piece{seg: p.seg.Reverse()})
		}
	}
	return out
}

// sides counts, for each operand, the inputs covering the ground just left and just right of
// piece i. An input whose boundary runs along the piece covers one side only. sides reports
// false when an input listed earlier has the same piece on its boundary: that input's piece
// speaks for both, so a shared edge is kept at most once.
func (ar *arrangement) sides(i int) (left, right [2]int, ok bool) {
	p := ar.pieces[i]
	left[operandOf(p.src, ar.na)]++ // inputs lie to the left of their own boundary
	m := p.seg.Mid()
	key := endKey(p.seg)
	twin := func(q int) int { return ar.twinDir(p.seg, key, m, q) }
	for _, j := range ar.grid.at(m) {
		j := int(j)
		if j == p.src || !ar.boxes[j].ContainsPoint(m) {
			continue
		}
		w, along := ar.locator(j).probe(m, twin)
		k := operandOf(j, ar.na)
		switch {
		case along != 0 && j < p.src:
			return left, right, false
		case along > 0:
			left[k]++
		case along < 0:
			right[k]++
		case w != 0:
			left[k]++
			right[k]++
		}
	}
	return left, right, true
}

// twinDir reports whether piece q lies on s (whose end key and midpoint are given): +1 when
// it runs the same way, −1 the opposite way, 0 when it is another piece.
func (ar *arrangement) twinDir(s Segment, key [2]Vec, m Vec, q int) int {
	t := ar.pieces[q].seg
	if endKey(t) != key || t.Mid().Dist(m) > coincideTol {
		return 0
	}
	if t.Tangent(0.5).Dot(s.Tangent(0.5)) > 0 {
		return 1
	}
	return -1
}

// locator returns the winding locator of input j, building it the first time.
func (ar *arrangement) locator(j int) *windingLocator {
	if ar.locs[j] == nil {
		own := ar.inputs.row(j)
		segs := make([]Segment, 0, len(own))
		for _, p := range own {
			segs = append(segs, p.seg)
		}
		ar.locs[j] = newWindingLocator(segs, ar.inputs.first(j))
	}
	return ar.locs[j]
}
