package geom

import "math"

// This file computes the signed offset of a region exactly. Each contour yields its raw offset
// curves (every segment moved sideways by d, arcs about the convex corners, neighbours trimmed
// at the concave ones). The parts of them shown to lie nearer than |d| to the boundary are
// removed (prefilter.go), which on dense outlines is nearly all of them, and what is left is
// cut where it meets. A piece belongs to the answer exactly when it lies |d| from the original
// boundary and no nearer, since every point of an offset boundary is |d| from the nearest
// boundary point. The kept pieces are chained into loops and assembled into regions.

// ContourRef names one contour of a region: 0 is the outer contour, k the hole k−1.
type ContourRef int

// OffsetResult is the outcome of Region.Offset.
type OffsetResult struct {
	Regions  []Region     // the offset region(s); none when everything vanished
	Vanished []ContourRef // input contours that left no piece in the result
	Split    []ContourRef // input contours whose pieces ended up in more than one result contour
	// Merged lists input contours whose pieces share a result contour with another input
	// contour: a hole broke through to the outside or into another hole.
	Merged []ContourRef
}

// offsetKeepTol is how much nearer than |d| to the original boundary a piece's midpoint may be
// and still count as part of the offset. A true offset piece sits exactly |d| away up to
// rounding, about 1e-13 mm on parts a metre across; pointTol leaves four orders of margin and
// is the package's smallest meaningful distance.
const offsetKeepTol = pointTol

// tangentTurn is the turn in radians below which two segments count as meeting tangentially,
// so a corner needs neither a join arc nor trimming. It is the 1e-12 that RoundedPolygon uses
// to call a corner straight; a join over it at d = 1 m is 1e-9 mm long, below pointTol.
const tangentTurn = 1e-12

// Offset returns r grown by d (d > 0) or shrunk by −d (d < 0), exactly: lines stay lines, arcs
// stay arcs about the same centre, convex corners get arcs of radius |d| about the corner,
// concave corners are trimmed and loops removed. It also says which input contours vanished,
// split or merged. d == 0 returns r unchanged. r should be valid (see Validate).
func (r Region) Offset(d float64) OffsetResult {
	if d == 0 {
		return OffsetResult{Regions: []Region{r}}
	}
	res, _ := r.offset(d)
	return res
}

// offset does the work of Offset and also returns how many kept pieces chainLoops could not
// close into a loop, which is zero unless rounding defeated the method; tests check it.
func (r Region) offset(d float64) (OffsetResult, int) { return r.offsetWith(d, true) }

// offsetWith is offset with the prefilter (see prefilter.go) on or off; tests compare the two.
func (r Region) offsetWith(d float64, trim bool) (OffsetResult, int) {
	r = r.Normalize()
	cs := r.Contours()
	groups := make([][]Segment, len(cs))
	origins := make([][]rawOrigin, len(cs))
	for i, c := range cs {
		groups[i], origins[i] = rawOffsetFrom(c, d)
	}
	idx := newSegIndex(cs)
	if trim {
		groups = prefilterGroups(groups, origins, idx, d)
	}
	kept := keepOffsetPieces(splitPieces(groups), idx, math.Abs(d))
	loops, srcs, open := chainLoops(pruneDangling(kept))
	res := OffsetResult{Regions: assemble(loops)}
	res.Vanished, res.Split, res.Merged = contourFates(len(cs), srcs)
	return res, open
}

// OffsetRegions offsets every region by d and unites the results that overlap, as separate
// regions do when they grow into one another. Regions are offset one at a time, so a shrink
// never joins anything; the union only matters when d > 0.
func OffsetRegions(rs []Region, d float64) []Region {
	var all []Region
	for _, r := range rs {
		all = append(all, r.Offset(d).Regions...)
	}
	if len(all) < 2 {
		return all
	}
	return Union(all...)
}

// contourFates reads, from the source contour of each piece of each result loop, which of n
// input contours vanished, split into several loops, or share a loop with another contour.
func contourFates(n int, srcs [][]int) (vanished, split, merged []ContourRef) {
	loopsOf := make([]int, n)
	mixed := make([]bool, n)
	mark := make([]int, n) // loop index + 1 that last counted contour k
	var distinct []int
	for li, s := range srcs {
		distinct = distinct[:0]
		for _, k := range s {
			if mark[k] != li+1 {
				mark[k] = li + 1
				distinct = append(distinct, k)
			}
		}
		for _, k := range distinct {
			loopsOf[k]++
			mixed[k] = mixed[k] || len(distinct) > 1
		}
	}
	for k := 0; k < n; k++ {
		switch {
		case loopsOf[k] == 0:
			vanished = append(vanished, ContourRef(k))
		case loopsOf[k] > 1:
			split = append(split, ContourRef(k))
		}
		if mixed[k] {
			merged = append(merged, ContourRef(k))
		}
	}
	return vanished, split, merged
}

// rightOf returns p moved by d along the right-hand normal of the unit direction t.
func rightOf(p, t Vec, d float64) Vec { return p.Add(Vec{t.Y, -t.X}.Mul(d)) }

// offsetSegment returns s moved by d to its right: a line moves along its normal; an arc keeps
// its centre and its radius grows by d when it turns left (the centre is on its left) or
// shrinks by d when it turns right. It reports false when the result is shorter than pointTol
// or an arc's radius falls to pointTol or below: that offset has vanished.
func offsetSegment(s Segment, d float64) (Segment, bool) {
	if !s.IsArc() {
		t := s.B.Sub(s.A).Unit()
		o := Line(rightOf(s.A, t, d), rightOf(s.B, t, d))
		return o, o.Length() > pointTol
	}
	r := s.Radius()
	nr := r - d
	if s.Sweep > 0 {
		nr = r + d
	}
	if nr <= pointTol {
		return Segment{}, false
	}
	k := nr / r
	o := Segment{
		A:      s.Center.Add(s.A.Sub(s.Center).Mul(k)),
		B:      s.Center.Add(s.B.Sub(s.Center).Mul(k)),
		Center: s.Center,
		Sweep:  s.Sweep,
	}
	if s.IsFullCircle() {
		o.B = o.A // stays exactly closed
	}
	return o, o.Length() > pointTol
}

// turnAt returns the signed angle (counter-clockwise positive) by which the direction of travel
// turns from the end of s to the start of t.
func turnAt(s, t Segment) float64 {
	a, b := s.Tangent(1), t.Tangent(0)
	return math.Atan2(a.Cross(b), a.Dot(b))
}

// rawOffset returns the raw offset curves of contour c at distance d, in order along the
// contour: each segment's offset, and a join arc of radius |d| about every corner where the
// offsets move apart (the contour turns the same way as the offset side: left for d > 0,
// right for d < 0). Where neighbouring offsets overlap instead, at concave corners and across
// arcs whose offset vanished, both are trimmed to their crossing nearest the gap. Anything
// else that overlaps is left for the filter.
func rawOffset(c Contour, d float64) []Segment {
	out, _ := rawOffsetFrom(c, d)
	return out
}

// rawOffsetFrom is rawOffset that also says where each curve came from.
func rawOffsetFrom(c Contour, d float64) ([]Segment, []rawOrigin) {
	n := len(c)
	offs := make([]Segment, n)
	ok := make([]bool, n)
	for i, s := range c {
		offs[i], ok[i] = offsetSegment(s, d)
	}
	joins := make([]Segment, n)
	hasJoin := make([]bool, n)
	for i := range c {
		j := (i + 1) % n
		turn := turnAt(c[i], c[j])
		switch {
		case math.Abs(turn) <= tangentTurn+dirTol(c[i])+dirTol(c[j]) || math.Abs(turn*d) <= pointTol:
			snapJoint(c[i], c[j], offs, ok, i, j, d)
		case turn*d > 0:
			joins[i], hasJoin[i] = cornerJoin(c[i], c[j], offs, ok, i, j, d, turn)
		}
	}
	out := make([]Segment, 0, 2*n)
	from := make([]rawOrigin, 0, 2*n)
	for i := range c {
		if ok[i] {
			out, from = append(out, offs[i]), append(from, rawOrigin{i, false})
		}
		if hasJoin[i] {
			out, from = append(out, joins[i]), append(from, rawOrigin{i, true})
		}
	}
	for k := range out {
		if next := (k + 1) % len(out); next != k && out[k].B != out[next].A {
			trimCorner(&out[k], &out[next])
		}
	}
	return out, from
}

// snapJoint makes the offsets of two segments s (index i) and t (index j) that meet
// tangentially start and end at exactly one point: the joint carried out along the normal of
// whichever of the two gives the surer direction. They differ only by rounding, which a large
// offset of a tiny arc magnifies (see dirTol).
func snapJoint(s, t Segment, offs []Segment, ok []bool, i, j int, d float64) {
	p := rightOf(s.B, s.Tangent(1), d)
	if dirTol(t) < dirTol(s) {
		p = rightOf(s.B, t.Tangent(0), d)
	}
	if ok[i] {
		offs[i].B = p
	}
	if ok[j] {
		offs[j].A = p
	}
}

// dirTol returns how far, in radians, the direction of s at its ends may be wrong because its
// points are rounded to float64: a relative error of a few ε (2.2e-16) on coordinates of the
// size of the segment's farthest point from the origin, over its length (line) or radius (arc).
// A fillet of radius 1e-8 at 10 mm from the origin points its ends only to about 1e-7 radians.
func dirTol(s Segment) float64 {
	const eps = 4 * 2.2e-16
	scale := math.Max(1, math.Max(math.Max(math.Abs(s.A.X), math.Abs(s.A.Y)),
		math.Max(math.Abs(s.B.X), math.Abs(s.B.Y))))
	size := s.Length()
	if s.IsArc() {
		size = s.Radius()
	}
	return eps * scale / size
}

// cornerJoin returns the arc about the corner between segments s (index i) and t (index j) that
// carries the offset around it, from where s's offset ends to where t's begins. Where an offset
// has vanished its end point is still where it would have been. It reports false for a join
// shorter than pointTol.
func cornerJoin(s, t Segment, offs []Segment, ok []bool, i, j int, d, turn float64) (Segment, bool) {
	v := s.B
	a := rightOf(v, s.Tangent(1), d)
	if ok[i] {
		a = offs[i].B
	}
	b := rightOf(v, t.Tangent(0), d)
	if ok[j] {
		b = offs[j].A
	}
	join := Segment{A: a, B: b, Center: v, Sweep: turn}
	return join, join.Length() > pointTol
}

// trimCorner cuts the raw offsets a and b, which follow one another along the contour but do
// not meet, back to their crossing nearest the gap, when they cross within both. The overhangs
// lie nearer than |d| to the boundary between their sources, so the filter would drop them
// anyway; trimming here keeps nearly straight concave corners, where an overhang's distance
// is within rounding of |d|, from leaving spurs the filter cannot see.
func trimCorner(a, b *Segment) {
	best, found := crossing{}, false
	bestGap := math.Inf(1)
	for _, x := range intersect(*a, *b) {
		gap := (1-x.ta)*a.Length() + x.tb*b.Length()
		if gap < bestGap {
			best, bestGap, found = x, gap, true
		}
	}
	if !found || best.ta <= 0 || best.tb >= 1 || (best.ta == 1 && best.tb == 0) {
		return
	}
	if best.ta < 1 {
		*a = a.Sub(0, best.ta)
	}
	if best.tb > 0 {
		*b = b.Sub(best.tb, 1)
	}
	a.B, b.A = best.at, best.at
}

// keepOffsetPieces returns the pieces whose midpoint is no nearer than dist − offsetKeepTol to
// the original boundary. A kept piece also lies on the right side: it was carried out from the
// boundary along a normal (or about a convex corner) by dist, and the straight path back to
// where it came from cannot cross the boundary without bringing it nearer than dist.
// It filters ps in place.
func keepOffsetPieces(ps []piece, idx *segIndex, dist float64) []piece {
	kept := ps[:0]
	for _, p := range ps {
		if !idx.nearerThan(p.seg.Mid(), dist-offsetKeepTol) {
			kept = append(kept, p)
		}
	}
	return kept
}

// pruneDangling returns ps less every piece that cannot lie on a closed loop: one that ends
// where no piece starts, or starts where none ends, repeatedly. Every piece of an exact offset
// lies on a loop. A piece that does not is the overhang of a nearly straight concave joint
// that no trimming reached, whose distance to the boundary is within rounding of |d| so the
// filter kept it; left in, it could lead chainLoops into a dead end. It filters ps in place.
func pruneDangling(ps []piece) []piece {
	ids := map[Vec]int32{}
	id := func(p Vec) int32 {
		k, ok := ids[p]
		if !ok {
			k = int32(len(ids))
			ids[p] = k
		}
		return k
	}
	from, to := make([]int32, len(ps)), make([]int32, len(ps))
	for i, p := range ps {
		from[i], to[i] = id(p.seg.A), id(p.seg.B)
	}
	outs, ins := make([]int32, len(ids)), make([]int32, len(ids))
	for i := range ps {
		outs[from[i]]++
		ins[to[i]]++
	}
	leaving, arriving := indexRows(from, len(ids)), indexRows(to, len(ids))
	var queue []int32
	for i := range ps {
		if outs[to[i]] == 0 || ins[from[i]] == 0 {
			queue = append(queue, int32(i))
		}
	}
	gone := make([]bool, len(ps))
	for len(queue) > 0 {
		i := queue[len(queue)-1]
		queue = queue[:len(queue)-1]
		if gone[i] {
			continue
		}
		gone[i] = true
		if outs[from[i]]--; outs[from[i]] == 0 {
			queue = append(queue, arriving.row(int(from[i]))...)
		}
		if ins[to[i]]--; ins[to[i]] == 0 {
			queue = append(queue, leaving.row(int(to[i]))...)
		}
	}
	kept := ps[:0] // in place: kept never passes i
	for i, p := range ps {
		if !gone[i] {
			kept = append(kept, p)
		}
	}
	return kept
}

// segIndexLeaf is how many consecutive segments share one leaf box of a segIndex: enough to
// make the tree shallow, few enough that a leaf is cheap to scan. Chosen by benchmark: on
// the 100k-vertex outline 4 took a fifth less time in the filter than 8, and half of 16.
const segIndexLeaf = 4

// segIndex answers "is any boundary segment nearer than r to p?" in about logarithmic time.
// Contours are continuous, so consecutive segments lie together: the tree groups runs of
// segIndexLeaf segments into leaf boxes and pairs of boxes into parents, level by level.
type segIndex struct {
	segs   []Segment
	starts []int   // contour k's segments are segs[starts[k]:starts[k+1]]
	levels [][]Box // levels[0] holds the leaf boxes; the last level holds one box
}

// newSegIndex indexes every segment of the given contours.
func newSegIndex(cs []Contour) *segIndex {
	x := &segIndex{starts: make([]int, 0, len(cs)+1)}
	for _, c := range cs {
		x.starts = append(x.starts, len(x.segs))
		x.segs = append(x.segs, c...)
	}
	x.starts = append(x.starts, len(x.segs))
	leaves := make([]Box, (len(x.segs)+segIndexLeaf-1)/segIndexLeaf)
	for i := range leaves {
		b := EmptyBox()
		for _, s := range x.segs[i*segIndexLeaf : min(len(x.segs), (i+1)*segIndexLeaf)] {
			b = b.Union(s.Bounds())
		}
		leaves[i] = b
	}
	x.levels = append(x.levels, leaves)
	for lv := leaves; len(lv) > 1; {
		up := make([]Box, (len(lv)+1)/2)
		for i := range up {
			up[i] = lv[2*i]
			if 2*i+1 < len(lv) {
				up[i] = up[i].Union(lv[2*i+1])
			}
		}
		x.levels = append(x.levels, up)
		lv = up
	}
	return x
}

// boxDist2 returns the squared distance from p to the nearest point of box b (0 inside it).
func boxDist2(b Box, p Vec) float64 {
	var dx, dy float64
	if p.X < b.Min.X {
		dx = b.Min.X - p.X
	} else if p.X > b.Max.X {
		dx = p.X - b.Max.X
	}
	if p.Y < b.Min.Y {
		dy = b.Min.Y - p.Y
	} else if p.Y > b.Max.Y {
		dy = p.Y - b.Max.Y
	}
	return dx*dx + dy*dy
}

// segDist2 returns the squared distance from p to s; lines, the common case, skip the square
// root and the general Closest.
func segDist2(s Segment, p Vec) float64 {
	if s.IsArc() {
		d := s.DistanceTo(p)
		return d * d
	}
	d, w := s.B.Sub(s.A), p.Sub(s.A)
	t := w.Dot(d)
	if l2 := d.Dot(d); t > 0 && l2 > 0 {
		if t >= l2 {
			w = p.Sub(s.B)
		} else {
			w = w.Sub(d.Mul(t / l2))
		}
	}
	return w.Dot(w)
}

// nearerThan reports whether some indexed segment passes strictly nearer than r to p. It
// stops at the first such segment; the search descends into the nearer child first, so a
// piece that is too near is usually found out at the first leaf it reaches.
func (x *segIndex) nearerThan(p Vec, r float64) bool {
	_, ok := x.search(p, r, true)
	return ok
}
