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
	parent := make([]int, len(boxes))
	for i := range parent {
		parent[i] = i
	}
	find := func(i int) int {
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

// weldTol is how close end points of segments must be for weld to merge them: ten times
// snapTol, so that points splitPieces might or might not merge (one snapTol apart, or a
// chain of such steps) are merged for certain, while still a hundred times below a
// micrometre.
const weldTol = 10 * snapTol

// weld returns the regions with every segment end point moved onto the first end point
// (in input order) within weldTol of it, merging chains of near points. Arcs keep their
// sweep and get the centre that fits their new end points; segments that shrink to nothing
// are dropped.
func weld(rs []Region) []Region {
	w := newWelder()
	for _, r := range rs {
		for _, c := range r.Contours() {
			for _, s := range c {
				w.add(s.A)
			}
		}
	}
	out := make([]Region, len(rs))
	for i, r := range rs {
		out[i].Outer = w.contour(r.Outer)
		for _, h := range r.Holes {
			if h = w.contour(h); len(h) > 0 {
				out[i].Holes = append(out[i].Holes, h)
			}
		}
	}
	return out
}

// welder merges points within weldTol of each other, transitively, through a hash grid and
// union–find; the earliest point added represents its group.
type welder struct {
	pts    []Vec
	parent []int
	cells  map[[2]int64][]int
	index  map[Vec]int
}

func newWelder() *welder {
	return &welder{cells: map[[2]int64][]int{}, index: map[Vec]int{}}
}

func (w *welder) cell(p Vec) [2]int64 {
	return [2]int64{int64(math.Floor(p.X / weldTol)), int64(math.Floor(p.Y / weldTol))}
}

func (w *welder) find(i int) int {
	for w.parent[i] != i {
		w.parent[i] = w.parent[w.parent[i]]
		i = w.parent[i]
	}
	return i
}

// add records p and joins it to every earlier point within weldTol.
func (w *welder) add(p Vec) {
	if _, ok := w.index[p]; ok {
		return
	}
	i := len(w.pts)
	w.pts, w.parent, w.index[p] = append(w.pts, p), append(w.parent, i), i
	c := w.cell(p)
	for dx := int64(-1); dx <= 1; dx++ {
		for dy := int64(-1); dy <= 1; dy++ {
			for _, j := range w.cells[[2]int64{c[0] + dx, c[1] + dy}] {
				if w.pts[j].Dist(p) <= weldTol {
					ri, rj := w.find(i), w.find(j)
					w.parent[max(ri, rj)] = min(ri, rj)
				}
			}
		}
	}
	w.cells[c] = append(w.cells[c], i)
}

// at returns the point that represents p's group, or p when it was never added.
func (w *welder) at(p Vec) Vec {
	i, ok := w.index[p]
	if !ok {
		return p
	}
	return w.pts[w.find(i)]
}

// contour returns c with its end points welded; each segment ends where the next starts.
func (w *welder) contour(c Contour) Contour {
	out := make(Contour, 0, len(c))
	for k, s := range c {
		a, b := w.at(s.A), w.at(c[(k+1)%len(c)].A)
		if t, ok := moveEnds(s, a, b); ok {
			out = append(out, t)
		}
	}
	return out
}

// moveEnds returns s with end points a and b. An arc keeps its sweep and takes the centre
// that puts both ends on one circle; a full circle moves as a whole. It reports false when
// the segment has shrunk to nothing.
func moveEnds(s Segment, a, b Vec) (Segment, bool) {
	if !s.IsArc() {
		return Line(a, b), !a.Near(b)
	}
	if a == s.A && b == s.B {
		return s, true
	}
	if math.Abs(s.Sweep) > 1.9*math.Pi {
		// Nearly or fully round: the chord says little about the centre, so shift it with
		// the ends instead.
		d := a.Sub(s.A).Add(b.Sub(s.B)).Mul(0.5)
		return Segment{A: a, B: b, Center: s.Center.Add(d), Sweep: s.Sweep}, true
	}
	chord := b.Sub(a)
	l := chord.Len()
	if l <= pointTol {
		return s, false
	}
	c := a.Lerp(b, 0.5).Add(chord.Perp().Mul(0.5 / math.Tan(s.Sweep/2)))
	return Segment{A: a, B: b, Center: c, Sweep: s.Sweep}, true
}

// arrangement is the cut-up boundaries of one cluster of inputs, with what is needed to
// tell which inputs cover each side of a piece.
type arrangement struct {
	pieces []piece           // ordered by src
	first  []int             // input j's pieces are pieces[first[j]:first[j+1]]
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
	first := make([]int, len(boxes)+1)
	for _, p := range ps {
		first[p.src+1]++
	}
	for j := 1; j < len(first); j++ {
		first[j] += first[j-1]
	}
	wide := make([]Box, len(boxes))
	for j, b := range boxes {
		wide[j] = b.Expand(coincideTol)
	}
	return &arrangement{pieces: ps, first: first, na: na, boxes: wide, grid: newBoxGrid(wide),
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
		segs := make([]Segment, 0, ar.first[j+1]-ar.first[j])
		for _, p := range ar.pieces[ar.first[j]:ar.first[j+1]] {
			segs = append(segs, p.seg)
		}
		ar.locs[j] = newWindingLocator(segs, ar.first[j])
	}
	return ar.locs[j]
}

// windingLocator counts how often closed boundaries wind around a point by casting a ray to
// +x and adding up the signed crossings. The boundaries are kept as parts that only rise or
// only fall, sorted into horizontal strips so that a ray meets only the parts of its strip.
// While it casts, it also looks for a part that runs through the point, which the caller
// judges (see probe).
type windingLocator struct {
	parts []monotonePart
	y0, h float64
	start []int32 // strip k holds parts items[start[k]:start[k+1]], rightmost first
	items []int32
}

// monotonePart is a line, or an arc within one quarter of its circle between the top and the
// bottom, so that every height between its ends is reached exactly once.
type monotonePart struct {
	a, b       Vec     // ends, as in the piece, so neighbours share them exactly
	lo, hi     float64 // heights of the lower and upper end
	xmin, xmax float64 // leftmost and rightmost x reached
	dir        int     // +1 rising from a to b, −1 falling, 0 level
	arc        bool
	c          Vec     // centre of an arc
	r2         float64 // squared radius of an arc
	side       float64 // +1 for the right half of the circle, −1 for the left
	piece      int     // the piece it is part of
}

// crossX returns where the part is at height y, which lies between its ends.
func (m *monotonePart) crossX(y float64) float64 {
	if !m.arc {
		return m.a.X + (y-m.a.Y)*(m.b.X-m.a.X)/(m.b.Y-m.a.Y)
	}
	dy := y - m.c.Y
	return m.c.X + m.side*math.Sqrt(math.Max(0, m.r2-dy*dy))
}

// newWindingLocator indexes the closed boundaries made of segs, which are pieces numbered
// from first on.
func newWindingLocator(segs []Segment, first int) *windingLocator {
	l := &windingLocator{parts: make([]monotonePart, 0, 2*len(segs))}
	var buf []Segment
	for k, s := range segs {
		buf = appendMonotone(buf[:0], s)
		for _, part := range buf {
			l.parts = append(l.parts, newMonotonePart(part, first+k))
		}
	}
	l.fillStrips()
	return l
}

func newMonotonePart(s Segment, piece int) monotonePart {
	b := s.Bounds()
	m := monotonePart{a: s.A, b: s.B, lo: b.Min.Y, hi: b.Max.Y, xmin: b.Min.X, xmax: b.Max.X,
		arc: s.IsArc(), piece: piece}
	switch {
	case s.B.Y > s.A.Y:
		m.dir, m.lo, m.hi = 1, s.A.Y, s.B.Y
	case s.B.Y < s.A.Y:
		m.dir, m.lo, m.hi = -1, s.B.Y, s.A.Y
	}
	if m.arc {
		m.c = s.Center
		r := s.Radius()
		m.r2 = r * r
		m.side = math.Copysign(1, s.Mid().X-s.Center.X)
	}
	return m
}

// appendMonotone appends s cut at the top and bottom of its circle, where an arc turns from
// rising to falling; a line is appended as it is. The cut parts share their cut points
// exactly.
func appendMonotone(dst []Segment, s Segment) []Segment {
	if !s.IsArc() {
		return append(dst, s)
	}
	var ts [2]float64
	n := 0
	for _, a := range [2]float64{math.Pi / 2, -math.Pi / 2} {
		if t, ok := s.angleParam(a); ok && t > 0 && t < 1 {
			ts[n] = t
			n++
		}
	}
	if n == 2 && ts[1] < ts[0] {
		ts[0], ts[1] = ts[1], ts[0]
	}
	t0 := 0.0
	for _, t := range ts[:n] {
		dst = append(dst, s.Sub(t0, t))
		t0 = t
	}
	return append(dst, s.Sub(t0, 1))
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
	if !(l.h > 0) {
		l.h = 1
	}
	l.start = make([]int32, k+1)
	for _, p := range l.parts {
		for s := l.strip(p.lo - coincideTol); s <= l.strip(p.hi+coincideTol); s++ {
			l.start[s+1]++
		}
	}
	for s := 1; s <= k; s++ {
		l.start[s] += l.start[s-1]
	}
	l.items = make([]int32, l.start[k])
	fill := append([]int32(nil), l.start[:k]...)
	for i, p := range l.parts {
		for s := l.strip(p.lo - coincideTol); s <= l.strip(p.hi+coincideTol); s++ {
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

// probe returns how many times the boundaries wind counter-clockwise around p, and the first
// non-zero answer of along for a part whose box reaches within coincideTol of p (along is
// given the part's piece number; nil asks nothing). Each part counts crossings from its lower
// end up to but not including its upper end, so a ray through the point where two parts meet
// counts it once, or not at all where the boundary only touches the ray. The winding is
// meaningless for p on a boundary.
func (l *windingLocator) probe(p Vec, along func(piece int) int) (w, on int) {
	if len(l.parts) == 0 {
		return 0, 0
	}
	s := l.strip(p.Y)
	for _, i := range l.items[l.start[s]:l.start[s+1]] {
		m := &l.parts[i]
		if m.xmax < p.X-coincideTol {
			break // the rest lie wholly left of p
		}
		if p.Y < m.lo-coincideTol || p.Y > m.hi+coincideTol {
			continue
		}
		if m.dir != 0 && p.Y >= m.lo && p.Y < m.hi && m.crossX(p.Y) > p.X {
			w += m.dir
		}
		if on == 0 && along != nil && p.X >= m.xmin-coincideTol {
			on = along(m.piece)
		}
	}
	return w, on
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
