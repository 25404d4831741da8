package geom

import (
	"math"
	"sort"
)

// This file trims the raw offset curves before they are cut where they meet. On a dense,
// jagged outline offset by many edge lengths every raw curve overlaps hundreds of others, and
// cutting them all costs O(n · |d|/edge) crossings, nearly all on pieces the distance filter
// then throws away. The prefilter removes from each raw curve the parts that provably lie
// nearer than |d| − prefilterMargin to the original boundary, so that only the thin band near
// the true offset is left to cut.
//
// Why nothing of the true offset is lost. Let ρ = |d| − prefilterMargin. The prefilter only
// removes points shown to lie within ρ of some original segment (the witness), each by an
// exact test against a set that is within ρ of the witness: a disc about a point of it, the
// rectangle beside a line, the ring sector beside an arc. Such points are nearer than |d| to
// the boundary, so none lies on the offset. Removing them also changes no piece that the filter
// keeps:
//   - Every point where a raw curve passes from |d| to nearer than |d| lies |d| from the
//     boundary, so every raw curve through it keeps it: those cuts all remain.
//   - A cut that disappears lay nearer than ρ, so the pieces it separated were both nearer
//     than |d| there, and the merged piece (between remaining cuts, none of which is such a
//     change) lies nearer than |d| too: the filter drops it as it dropped both halves.
//   - Distance to the boundary changes no faster than position, and a kept end point lies
//     within offsetKeepTol of |d|, so every point within snapTol of it lies farther than
//     |d| − offsetKeepTol − snapTol > ρ: no removed point was ever merged with a kept one, and
//     the kept pieces' end points snap to the same points as before.
// Where a curve's end is removed, its new end lies within ρ of the boundary, so the piece
// that starts there is dropped like the rest of what it joins.

// prefilterMargin is how much nearer than |d| to the boundary a point must be shown to lie
// before the prefilter removes it. It must exceed snapTol + offsetKeepTol (see above) plus the
// rounding of the computed range ends, about 1e-13 mm on parts a metre across; ten times
// snapTol leaves a wide margin and is still far below an edge of the densest outline.
const prefilterMargin = 10 * snapTol

// prefilterWindow is how many segments on each side along the contour a long raw curve is
// tried against before any search. On a jagged outline the neighbours a few edges away already
// cover all of a join arc but its crown. On the 10k-vertex star 2, 3 and 5 timed the same
// within the noise of a shared machine; 3 leaves room for a corner whose nearest neighbours
// lie lower than it.
const prefilterWindow = 3

// prefilterShortWindow is prefilterWindow for curves too short to be worth a search (see
// prefilterLongRatio). On the jagged star 1 timed the same as 2 and 3; on the smooth outline
// it took a tenth less time than 3.
const prefilterShortWindow = 1

// prefilterProbes is how many nearest-segment searches one raw curve may spend on what the
// neighbours left: enough to clear a curve that runs deep across a narrow neck, few enough
// that curves wholly on the offset (most of them on a smooth outline) cost one search.
const prefilterProbes = 4

// prefilterLongRatio is how many times longer than the segments about its source a raw curve
// must be before the prefilter spends searches on it (see prefilterProbes); shorter ones are
// only tried against their nearest neighbours (prefilterShortWindow). Short curves overlap
// few others, and on the smooth 100k-vertex outline full trimming of every curve made the
// offset 40% slower than none; this way it costs under a tenth there, and on the jagged star
// every long join arc is still trimmed.
const prefilterLongRatio = 4

// rawOrigin says where a raw curve came from: the segment it offsets (join false) or the
// corner at the end of that segment (join true), by index within its contour.
type rawOrigin struct {
	seg  int
	join bool
}

// prefilter holds what trimming the raw curves of one offset needs, and scratch space.
type prefilter struct {
	idx          *segIndex
	rho          float64
	rem, out     spans
	cover, parts [4]spans // scratch for one witness's cover
	survivors    []float64
}

// prefilterGroups returns the raw curves of every contour with the parts removed that lie
// within |d| − prefilterMargin of a witness, in the same order; origins[g][k] says where
// groups[g][k] came from.
func prefilterGroups(groups [][]Segment, origins [][]rawOrigin, idx *segIndex, d float64) [][]Segment {
	f := &prefilter{idx: idx, rho: math.Abs(d) - prefilterMargin}
	if f.rho <= 0 {
		return groups
	}
	out := make([][]Segment, len(groups))
	for g, raw := range groups {
		kept := make([]Segment, 0, len(raw))
		for k, s := range raw {
			kept = f.trim(kept, s, g, origins[g][k])
		}
		out[g] = kept
	}
	return out
}

// trim appends to out what remains of s, a raw curve of contour g, after removing the parts
// within rho of its neighbours along the contour and then of the nearest segments found.
func (f *prefilter) trim(out []Segment, seg Segment, g int, o rawOrigin) []Segment {
	base, n := f.idx.starts[g], f.idx.starts[g+1]-f.idx.starts[g]
	short := f.short(seg, base, n, o)
	f.rem = append(f.rem[:0], whole)
	s := newCurve(seg)
	box := seg.Bounds().Expand(f.rho)
	win := prefilterWindow
	if short {
		win = prefilterShortWindow
	}
	first, last := o.seg-win, o.seg+win
	if o.join {
		last++
	}
	if last-first+1 >= n {
		first, last = o.seg+1, o.seg+n-1
		if o.join {
			first++
		}
	}
	for k := first; k <= last && len(f.rem) > 0; k++ {
		j := ((k % n) + n) % n
		if j == o.seg || (o.join && j == (o.seg+1)%n) {
			continue // the curve lies |d| from its own sources, never nearer
		}
		f.remove(s, f.idx.segs[base+j], box)
	}
	if !short {
		f.probe(s, box)
	}
	for _, sp := range f.rem {
		out = append(out, seg.Sub(sp.lo, sp.hi))
	}
	return out
}

// short reports whether raw curve s is no longer than prefilterLongRatio times the longest of
// the segments about its source: then it overlaps only a few other raw curves, and a search
// would cost more than it saves.
func (f *prefilter) short(s Segment, base, n int, o rawOrigin) bool {
	scale := 0.0
	for k := o.seg - 1; k <= o.seg+2; k++ {
		scale = math.Max(scale, f.idx.segs[base+((k%n)+n)%n].Length())
	}
	return s.Length() <= prefilterLongRatio*scale
}

// probe spends up to prefilterProbes nearest-segment searches at the middle of spans of s not
// yet known to hold a point farther than rho, removing what each segment found covers.
func (f *prefilter) probe(s curve, box Box) {
	f.survivors = f.survivors[:0]
	for range prefilterProbes {
		t, ok := f.unsettled()
		if !ok {
			return
		}
		p := s.At(t)
		j, ok := f.idx.nearestWithin(p, f.rho)
		if !ok {
			f.survivors = append(f.survivors, t)
			continue
		}
		// The found segment's neighbours along its contour usually cover what it does not.
		g := f.idx.contourOf(j)
		base, n := f.idx.starts[g], f.idx.starts[g+1]-f.idx.starts[g]
		for k := -1; k <= 1 && k < n-1; k++ {
			f.remove(s, f.idx.segs[base+((j-base+k)%n+n)%n], box)
		}
		if f.holds(t) {
			f.survivors = append(f.survivors, t) // rounding kept the probe: do not retry it
		}
	}
}

// unsettled returns the middle of the first remaining span that holds no survivor.
func (f *prefilter) unsettled() (float64, bool) {
	for _, sp := range f.rem {
		settled := false
		for _, t := range f.survivors {
			settled = settled || (t > sp.lo && t < sp.hi)
		}
		if !settled {
			return (sp.lo + sp.hi) / 2, true
		}
	}
	return 0, false
}

// holds reports whether parameter t lies in a remaining span.
func (f *prefilter) holds(t float64) bool {
	for _, sp := range f.rem {
		if t > sp.lo && t < sp.hi {
			return true
		}
	}
	return false
}

// remove takes from the remaining spans of s every point within rho of witness w. box is
// s's bounds grown by rho: a witness apart from it covers nothing.
func (f *prefilter) remove(s curve, w Segment, box Box) {
	if !box.Overlaps(witnessBounds(w)) {
		return
	}
	cov := f.coverOf(s, w)
	if len(cov) == 0 {
		return
	}
	f.out = subtractSpans(f.out[:0], f.rem, cov)
	f.rem, f.out = f.out, f.rem
}

// witnessBounds returns a box holding w: for a line, the box of its ends, which is all
// remove needs and cheaper than Bounds.
func witnessBounds(w Segment) Box {
	if w.IsArc() {
		return w.Bounds()
	}
	return Box{Vec{math.Min(w.A.X, w.B.X), math.Min(w.A.Y, w.B.Y)},
		Vec{math.Max(w.A.X, w.B.X), math.Max(w.A.Y, w.B.Y)}}
}

// coverOf returns the spans of s within rho of w, by sets that lie within rho of w: the discs
// about its ends, and the rectangle beside a line or the ring sector beside an arc.
func (f *prefilter) coverOf(s curve, w Segment) spans {
	c := &f.cover
	if f.outsideSlab(s, w) {
		return c[3][:0]
	}
	c[0] = discSpans(c[0][:0], s, w.A, f.rho)
	c[1] = discSpans(c[1][:0], s, w.B, f.rho)
	c[2] = unionSpans(c[2][:0], c[0], c[1])
	side := f.besideSpans(s, w)
	c[3] = unionSpans(c[3][:0], c[2], side)
	return c[3]
}

// outsideSlab reports whether s lies wholly on one side of line w, at least rho from its
// line: the discs about w's ends and the rectangle beside it all lie within that distance, so
// w covers nothing of s. It is the common case of a smooth outline, and two dot products.
func (f *prefilter) outsideSlab(s curve, w Segment) bool {
	if w.IsArc() {
		return false
	}
	n := w.B.Sub(w.A).Perp()
	l := n.Len()
	if l <= pointTol {
		return false
	}
	lim := f.rho * l
	if s.IsArc() {
		h, r := s.Center.Sub(w.A).Dot(n), s.radius*l
		return h-r >= lim || h+r <= -lim
	}
	ha, hb := s.A.Sub(w.A).Dot(n), s.B.Sub(w.A).Dot(n)
	return (ha >= lim && hb >= lim) || (ha <= -lim && hb <= -lim)
}

// besideSpans returns the spans of s that lie within rho of w measured square to it: in the
// rectangle of half-width rho along a line, or in the ring of half-width rho about an arc and
// within its sweep. An arc of more than half a turn is taken as its two halves.
func (f *prefilter) besideSpans(s curve, w Segment) spans {
	p := &f.parts
	if !w.IsArc() {
		l := w.Length()
		if l <= pointTol {
			return p[0][:0]
		}
		u := w.B.Sub(w.A).Mul(1 / l)
		n := u.Perp()
		// Along w first: on a smooth outline the neighbours' rectangles mostly miss s there.
		p[0] = halfPlaneSpans(p[0][:0], s, w.A, u, l)
		p[1] = halfPlaneSpans(p[1][:0], s, w.A, u.Neg(), 0)
		p[2] = intersectSpans(p[2][:0], p[0], p[1])
		if len(p[2]) == 0 {
			return p[2]
		}
		p[0] = halfPlaneSpans(p[0][:0], s, w.A, n, f.rho)
		p[1] = intersectSpans(p[1][:0], p[2], p[0])
		if len(p[1]) == 0 {
			return p[1]
		}
		p[0] = halfPlaneSpans(p[0][:0], s, w.A, n.Neg(), f.rho)
		p[3] = intersectSpans(p[3][:0], p[1], p[0])
		return p[3]
	}
	if math.Abs(w.Sweep) > math.Pi {
		h1, h2 := w.Sub(0, 0.5), w.Sub(0.5, 1)
		a := append(spans(nil), f.besideSpans(s, h1)...)
		b := f.besideSpans(s, h2)
		return unionSpans(nil, a, b)
	}
	return f.ringSpans(s, w)
}

// ringSpans returns the spans of s within the ring of half-width rho about arc w (|sweep| ≤ π)
// and within its sweep.
func (f *prefilter) ringSpans(s curve, w Segment) spans {
	p := &f.parts
	c, r := w.Center, w.Radius()
	ua, ub := w.A.Sub(c), w.B.Sub(c)
	if w.Sweep < 0 {
		ua, ub = ub, ua
	}
	// Within the sweep: counter-clockwise of ua and clockwise of ub.
	p[0] = halfPlaneSpans(p[0][:0], s, c, ua.Perp().Neg(), 0)
	p[1] = halfPlaneSpans(p[1][:0], s, c, ub.Perp(), 0)
	p[2] = intersectSpans(p[2][:0], p[0], p[1])
	p[0] = discSpans(p[0][:0], s, c, r+f.rho)
	p[1] = intersectSpans(p[1][:0], p[2], p[0])
	if r <= f.rho {
		return p[1]
	}
	p[0] = discSpans(p[0][:0], s, c, r-f.rho)
	p[3] = subtractSpans(p[3][:0], p[1], p[0])
	return p[3]
}

// nearestWithin returns the index of the indexed segment nearest to p, when one passes
// strictly nearer than r.
func (x *segIndex) nearestWithin(p Vec, r float64) (int, bool) { return x.search(p, r, false) }

// search walks the box tree for segments passing strictly nearer than r to p, nearer child
// first, and returns the nearest it finds — or, with first set, the first it finds.
func (x *segIndex) search(p Vec, r float64, first bool) (int, bool) {
	if len(x.segs) == 0 || r <= 0 {
		return 0, false
	}
	best, found := r*r, -1
	type node struct {
		level, i int
		d2       float64
	}
	var buf [64]node
	stack := buf[:0]
	if top := len(x.levels) - 1; boxDist2(x.levels[top][0], p) < best {
		stack = append(stack, node{top, 0, 0})
	}
	for len(stack) > 0 {
		n := stack[len(stack)-1]
		stack = stack[:len(stack)-1]
		if n.d2 >= best {
			continue // a nearer segment was found since this box was queued
		}
		if n.level == 0 {
			for k := n.i * segIndexLeaf; k < min(len(x.segs), (n.i+1)*segIndexLeaf); k++ {
				if d2 := segDist2(x.segs[k], p); d2 < best {
					best, found = d2, k
					if first {
						return k, true
					}
				}
			}
			continue
		}
		lv, a := x.levels[n.level-1], 2*n.i
		da, db := boxDist2(lv[a], p), math.Inf(1)
		if a+1 < len(lv) {
			db = boxDist2(lv[a+1], p)
		}
		near, far, dn, df := a, a+1, da, db
		if db < da {
			near, far, dn, df = a+1, a, db, da
		}
		if df < best {
			stack = append(stack, node{n.level - 1, far, df})
		}
		if dn < best {
			stack = append(stack, node{n.level - 1, near, dn})
		}
	}
	return found, found >= 0
}

// contourOf returns the contour holding indexed segment k.
func (x *segIndex) contourOf(k int) int {
	return sort.SearchInts(x.starts, k+1) - 1
}
