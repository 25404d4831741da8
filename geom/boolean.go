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
// the result is exact to the crossing points.
//
// Inputs whose bounding boxes touch no other input's are settled without cutting anything,
// and the rest are worked in groups of inputs whose boxes overlap, so a plate with thousands
// of separate features costs little more than its largest cluster.

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
				out = append(out, in[i])
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
	parent := make([]int, len(boxes))
	for i := range parent {
		parent[i] = i
	}
	var find func(int) int
	find = func(i int) int {
		for parent[i] != i {
			parent[i] = parent[parent[i]]
			i = parent[i]
		}
		return i
	}
	for _, p := range boxPairs(boxes) {
		ri, rj := find(p[0]), find(p[1])
		if ri != rj {
			parent[max(ri, rj)] = min(ri, rj)
		}
	}
	at := map[int]int{}
	var groups [][]int
	for i := range boxes {
		r := find(i)
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
func solve(op boolOp, rs []Region, na int, boxes []Box) []Region {
	groups := make([][]Segment, len(rs))
	for i, r := range rs {
		for _, c := range r.Contours() {
			groups[i] = append(groups[i], c...)
		}
	}
	ar := newArrangement(splitPieces(groups), na, boxes)
	loops, _, _ := chainLoops(ar.answer(op))
	return assemble(loops)
}

// arrangement is the cut-up boundaries of one cluster of inputs, with what is needed to
// tell which inputs cover each side of a piece.
type arrangement struct {
	pieces []piece
	na     int
	boxes  []Box             // each input's bounds
	grid   boxGrid           // finds the inputs whose bounds hold a point
	byInp  [][]Segment       // each input's pieces
	locs   []*windingLocator // built on first use
	twins  map[[2]Vec][]int  // pieces by their (unordered) end points
}

func newArrangement(ps []piece, na int, boxes []Box) *arrangement {
	ar := &arrangement{
		pieces: ps, na: na, boxes: boxes, grid: newBoxGrid(boxes),
		byInp: make([][]Segment, len(boxes)), locs: make([]*windingLocator, len(boxes)),
		twins: make(map[[2]Vec][]int, len(ps)),
	}
	for i, p := range ps {
		ar.byInp[p.src] = append(ar.byInp[p.src], p.seg)
		k := endKey(p.seg)
		ar.twins[k] = append(ar.twins[k], i)
	}
	return ar
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
// piece i. It reports false when an input listed earlier has the same piece on its boundary:
// that input's piece speaks for both, so a shared edge is kept at most once.
func (ar *arrangement) sides(i int) (left, right [2]int, ok bool) {
	p := ar.pieces[i]
	left[operandOf(p.src, ar.na)]++ // inputs lie to the left of their own boundary
	m, tan := p.seg.Mid(), p.seg.Tangent(0.5)
	var on []int // inputs whose boundary this piece runs along
	for _, j := range ar.twins[endKey(p.seg)] {
		q := ar.pieces[j]
		if q.src == p.src || q.seg.Mid().Dist(m) > coincideTol {
			continue
		}
		if q.src < p.src {
			return left, right, false
		}
		on = append(on, q.src)
		if q.seg.Tangent(0.5).Dot(tan) > 0 {
			left[operandOf(q.src, ar.na)]++
		} else {
			right[operandOf(q.src, ar.na)]++
		}
	}
	for _, j := range ar.grid.at(m) {
		j := int(j)
		if j == p.src || !ar.boxes[j].ContainsPoint(m) || hasInt(on, j) {
			continue
		}
		if ar.locator(j).winding(m) != 0 {
			k := operandOf(j, ar.na)
			left[k]++
			right[k]++
		}
	}
	return left, right, true
}

func hasInt(xs []int, x int) bool {
	for _, y := range xs {
		if y == x {
			return true
		}
	}
	return false
}

// locator returns the winding locator of input j, building it the first time.
func (ar *arrangement) locator(j int) *windingLocator {
	if ar.locs[j] == nil {
		ar.locs[j] = newWindingLocator(ar.byInp[j])
	}
	return ar.locs[j]
}

// windingLocator counts how often closed boundaries wind around a point by casting a ray to
// +x and adding up the signed crossings. The boundaries are kept as pieces that only rise or
// only fall, sorted into horizontal strips so that a ray meets only the pieces of its strip.
type windingLocator struct {
	parts []monotonePart
	y0, h float64
	start []int32 // strip k holds parts items[start[k]:start[k+1]], rightmost first
	items []int32
}

// monotonePart is a line, or an arc within one quarter of its circle between the top and the
// bottom, so that every height between its ends is reached exactly once.
type monotonePart struct {
	a, b   Vec     // ends, as in the piece, so neighbours share them exactly
	lo, hi float64 // heights of the lower and upper end
	xmax   float64 // rightmost x reached
	dir    int     // +1 rising from a to b, −1 falling
	arc    bool
	c      Vec     // centre of an arc
	r2     float64 // squared radius of an arc
	side   float64 // +1 for the right half of the circle, −1 for the left
}

// crossX returns where the part is at height y, which lies between its ends.
func (m *monotonePart) crossX(y float64) float64 {
	if !m.arc {
		return m.a.X + (y-m.a.Y)*(m.b.X-m.a.X)/(m.b.Y-m.a.Y)
	}
	dy := y - m.c.Y
	return m.c.X + m.side*math.Sqrt(math.Max(0, m.r2-dy*dy))
}

func newWindingLocator(segs []Segment) *windingLocator {
	l := &windingLocator{}
	for _, s := range segs {
		for _, part := range monotone(s) {
			if mp, ok := newMonotonePart(part); ok {
				l.parts = append(l.parts, mp)
			}
		}
	}
	l.fillStrips()
	return l
}

// newMonotonePart describes a piece that only rises or only falls; flat pieces are dropped
// because a horizontal ray never crosses them.
func newMonotonePart(s Segment) (monotonePart, bool) {
	m := monotonePart{a: s.A, b: s.B, xmax: s.Bounds().Max.X, arc: s.IsArc()}
	switch {
	case s.B.Y > s.A.Y:
		m.dir, m.lo, m.hi = 1, s.A.Y, s.B.Y
	case s.B.Y < s.A.Y:
		m.dir, m.lo, m.hi = -1, s.B.Y, s.A.Y
	default:
		return m, false
	}
	if m.arc {
		m.c = s.Center
		r := s.Radius()
		m.r2 = r * r
		m.side = math.Copysign(1, s.Mid().X-s.Center.X)
	}
	return m, true
}

// monotone cuts an arc at the top and bottom of its circle, where it turns from rising to
// falling; lines are returned as they are. The cut pieces share their cut points exactly.
func monotone(s Segment) []Segment {
	if !s.IsArc() {
		return []Segment{s}
	}
	var ts []float64
	for _, a := range [2]float64{math.Pi / 2, -math.Pi / 2} {
		if t, ok := s.angleParam(a); ok && t > 0 && t < 1 {
			ts = append(ts, t)
		}
	}
	sort.Float64s(ts)
	out := make([]Segment, 0, len(ts)+1)
	t0 := 0.0
	for _, t := range ts {
		out = append(out, s.Sub(t0, t))
		t0 = t
	}
	return append(out, s.Sub(t0, 1))
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
	if l.h <= 0 {
		l.h = 1
	}
	l.start = make([]int32, k+1)
	for _, p := range l.parts {
		for s := l.strip(p.lo); s <= l.strip(p.hi); s++ {
			l.start[s+1]++
		}
	}
	for s := 1; s <= k; s++ {
		l.start[s] += l.start[s-1]
	}
	l.items = make([]int32, l.start[k])
	fill := append([]int32(nil), l.start[:k]...)
	for i, p := range l.parts {
		for s := l.strip(p.lo); s <= l.strip(p.hi); s++ {
			l.items[fill[s]] = int32(i)
			fill[s]++
		}
	}
	for s := 0; s < k; s++ {
		its := l.items[l.start[s]:l.start[s+1]]
		sort.Slice(its, func(a, b int) bool { return l.parts[its[a]].xmax > l.parts[its[b]].xmax })
	}
}

// strip returns the strip holding height y, clamped to the strips there are.
func (l *windingLocator) strip(y float64) int {
	k := len(l.start) - 1
	s := int((y - l.y0) / l.h)
	return max(0, min(k-1, s))
}

// winding returns how many times the boundaries wind counter-clockwise around p. Each part
// counts from its lower end up to but not including its upper end, so a ray through the point
// where two parts meet counts it once, or not at all where the boundary only touches the ray.
// The answer is meaningless for p on a boundary.
func (l *windingLocator) winding(p Vec) int {
	if len(l.parts) == 0 {
		return 0
	}
	s := l.strip(p.Y)
	w := 0
	for _, i := range l.items[l.start[s]:l.start[s+1]] {
		m := &l.parts[i]
		if m.xmax <= p.X {
			break // the rest lie wholly left of p
		}
		if p.Y < m.lo || p.Y >= m.hi {
			continue
		}
		if m.crossX(p.Y) > p.X {
			w += m.dir
		}
	}
	return w
}

// boxGrid is a uniform grid over a set of boxes listing, for each cell, the boxes that reach
// into it.
type boxGrid struct {
	min    Vec
	cell   float64
	nx, ny int
	start  []int32
	items  []int32
}

// newBoxGrid sizes cells like a typical (median) box, but no smaller than needed to keep the
// cell count within four per box.
func newBoxGrid(boxes []Box) boxGrid {
	all := EmptyBox()
	sizes := make([]float64, len(boxes))
	for i, b := range boxes {
		all = all.Union(b)
		sz := b.Size()
		sizes[i] = math.Max(sz.X, sz.Y)
	}
	sort.Float64s(sizes)
	sz := all.Size()
	cell := math.Max(sizes[len(sizes)/2], math.Sqrt(sz.X*sz.Y/float64(4*len(boxes))))
	cell = math.Max(cell, math.Max(sz.X, sz.Y)/4096)
	g := boxGrid{min: all.Min, cell: cell}
	g.nx, g.ny = int(sz.X/cell)+1, int(sz.Y/cell)+1
	g.start = make([]int32, g.nx*g.ny+1)
	g.each(boxes, func(c, _ int) { g.start[c+1]++ })
	for c := 1; c < len(g.start); c++ {
		g.start[c] += g.start[c-1]
	}
	g.items = make([]int32, g.start[len(g.start)-1])
	fill := append([]int32(nil), g.start...)
	g.each(boxes, func(c, i int) {
		g.items[fill[c]] = int32(i)
		fill[c]++
	})
	return g
}

// each calls f for every cell that every box reaches into.
func (g *boxGrid) each(boxes []Box, f func(cell, box int)) {
	for i, b := range boxes {
		x0, y0 := g.cellOf(b.Min)
		x1, y1 := g.cellOf(b.Max)
		for y := y0; y <= y1; y++ {
			for x := x0; x <= x1; x++ {
				f(y*g.nx+x, i)
			}
		}
	}
}

func (g *boxGrid) cellOf(p Vec) (int, int) {
	x := int((p.X - g.min.X) / g.cell)
	y := int((p.Y - g.min.Y) / g.cell)
	return max(0, min(g.nx-1, x)), max(0, min(g.ny-1, y))
}

// at returns the boxes that may hold p.
func (g *boxGrid) at(p Vec) []int32 {
	x, y := g.cellOf(p)
	c := y*g.nx + x
	return g.items[g.start[c]:g.start[c+1]]
}
