package geom

import "math"

// chainLoops joins pieces end to start into closed contours. Where several pieces leave one
// point it takes the one that turns most to the left, so regions that touch at a point come
// out as separate loops. It returns the loops (with, for each loop, the src of its pieces in
// order) and how many pieces could not be closed into a loop. Pieces must share end points
// exactly, as splitPieces leaves them.
func chainLoops(ps []piece) (loops []Contour, srcs [][]int, open int) {
	startID, endID, nodes := nodeIDs(ps)
	from := indexRows(startID, nodes) // pieces leaving each point, in index order
	// at maps a point to the position in chain of the piece that leaves it, or −1.
	at := make([]int32, nodes)
	for k := range at {
		at[k] = -1
	}
	used := make([]bool, len(ps))
	var chain []int
	for start := range ps {
		if used[start] {
			continue
		}
		chain = chain[:0]
		for cur := start; cur >= 0; {
			used[cur] = true
			at[startID[cur]] = int32(len(chain))
			chain = append(chain, cur)
			end := endID[cur]
			if end >= 0 && at[end] >= 0 {
				// Back at a point already passed: the pieces since then close a loop.
				k := int(at[end])
				loops, srcs = appendLoop(loops, srcs, ps, chain[k:])
				for _, i := range chain[k:] {
					at[startID[i]] = -1
				}
				chain = chain[:k]
				if k == 0 {
					break
				}
			}
			cur = -1
			if end >= 0 {
				cur = leftmost(ps, from.row(int(end)), used, ps[chain[len(chain)-1]].seg)
			}
			if cur < 0 {
				open += len(chain)
			}
		}
		for _, i := range chain {
			at[startID[i]] = -1
		}
	}
	return loops, srcs, open
}

// nodeIDs numbers the distinct start points of ps: startID[i] is piece i's start, endID[i] its
// end, or −1 when no piece starts there.
func nodeIDs(ps []piece) (startID, endID []int32, nodes int) {
	ids := make(map[Vec]int32, len(ps))
	startID, endID = make([]int32, len(ps)), make([]int32, len(ps))
	for i, p := range ps {
		k, ok := ids[p.seg.A]
		if !ok {
			k = int32(len(ids))
			ids[p.seg.A] = k
		}
		startID[i] = k
	}
	for i, p := range ps {
		k, ok := ids[p.seg.B]
		if !ok {
			k = -1
		}
		endID[i] = k
	}
	return startID, endID, len(ids)
}

// appendLoop adds the pieces chain as one closed contour, merging pieces that continue one
// another, unless it encloses no area.
func appendLoop(loops []Contour, srcs [][]int, ps []piece, chain []int) ([]Contour, [][]int) {
	c := make(Contour, len(chain))
	src := make([]int, len(chain))
	for k, i := range chain {
		c[k], src[k] = ps[i].seg, ps[i].src
	}
	c, src = mergeContinuations(c, src)
	if math.Abs(c.Area()) <= snapTol*snapTol {
		return loops, srcs
	}
	return append(loops, c), append(srcs, src)
}

// leftmost returns the unused piece among cands that turns most to the left after in, or -1.
// Pieces leaving in the same direction are told apart by curvature: the one curving more to
// the left wins.
func leftmost(ps []piece, cands []int32, used []bool, in Segment) int {
	best, bestTurn, bestCurv := -1, math.Inf(-1), math.Inf(-1)
	tin := in.Tangent(1)
	for _, c := range cands {
		i := int(c)
		if used[i] {
			continue
		}
		tout := ps[i].seg.Tangent(0)
		turn := math.Atan2(tin.Cross(tout), tin.Dot(tout))
		if turn > math.Pi-1e-9 {
			turn = -math.Pi // straight back the way we came: least preferred
		}
		curv := signedCurvature(ps[i].seg)
		if turn > bestTurn+1e-9 || (math.Abs(turn-bestTurn) <= 1e-9 && curv > bestCurv) {
			best, bestTurn, bestCurv = i, turn, curv
		}
	}
	return best
}

// signedCurvature returns 1/r for a counter-clockwise arc, −1/r for a clockwise one, 0 for a
// line.
func signedCurvature(s Segment) float64 {
	if !s.IsArc() {
		return 0
	}
	return math.Copysign(1/s.Radius(), s.Sweep)
}

// mergeContinuations joins neighbouring pieces of a closed contour that lie on one line or
// one circle and run the same way, undoing cuts that did not become corners.
func mergeContinuations(c Contour, src []int) (Contour, []int) {
	if len(c) < 2 {
		return c, src
	}
	out, osrc := make(Contour, 1, len(c)), make([]int, 1, len(c))
	out[0], osrc[0] = c[0], src[0]
	for k := 1; k < len(c); k++ {
		if m, ok := continues(out[len(out)-1], c[k]); ok && osrc[len(osrc)-1] == src[k] {
			out[len(out)-1] = m
			continue
		}
		out, osrc = append(out, c[k]), append(osrc, src[k])
	}
	for len(out) > 1 {
		m, ok := continues(out[len(out)-1], out[0])
		if !ok || osrc[len(osrc)-1] != osrc[0] {
			break
		}
		out[0], osrc[0] = m, osrc[len(osrc)-1]
		out, osrc = out[:len(out)-1], osrc[:len(osrc)-1]
	}
	return out, osrc
}

// continues reports whether t carries on s along the same line or circle in the same
// direction, and returns the joined segment.
func continues(s, t Segment) (Segment, bool) {
	switch {
	case !s.IsArc() && !t.IsArc():
		d1, d2 := s.B.Sub(s.A).Unit(), t.B.Sub(t.A).Unit()
		if d1.Dot(d2) > 0 && math.Abs(d1.Cross(t.B.Sub(s.A))) <= snapTol {
			return Line(s.A, t.B), true
		}
	case s.IsArc() && t.IsArc():
		if s.Center.Dist(t.Center) <= snapTol && math.Abs(s.Radius()-t.Radius()) <= snapTol &&
			s.Sweep*t.Sweep > 0 && !beyondFullTurn(s.Sweep+t.Sweep) {
			return Segment{A: s.A, B: t.B, Center: s.Center, Sweep: s.Sweep + t.Sweep}, true
		}
	}
	return Segment{}, false
}

// assemble turns closed loops into regions: counter-clockwise loops become outer contours and
// each clockwise loop becomes a hole of the smallest outer loop that contains it. A clockwise
// loop inside no outer loop is dropped (it bounds nothing).
func assemble(loops []Contour) []Region {
	type outer struct {
		c    Contour
		area float64
		box  Box
	}
	var outers []outer
	var holes []Contour
	for _, l := range loops {
		if a := l.Area(); a > 0 {
			outers = append(outers, outer{l, a, l.Bounds()})
		} else {
			holes = append(holes, l)
		}
	}
	regions := make([]Region, len(outers))
	for i, o := range outers {
		regions[i].Outer = o.c
	}
	for _, h := range holes {
		p := interiorProbe(h)
		best := -1
		for i, o := range outers {
			if !o.box.ContainsPoint(p) || (best >= 0 && o.area >= outers[best].area) {
				continue
			}
			if o.c.Winding(p) != 0 {
				best = i
			}
		}
		if best >= 0 {
			regions[best].Holes = append(regions[best].Holes, h)
		}
	}
	return regions
}

// interiorProbe returns a point just to the right of a clockwise hole's boundary, which is
// inside the hole's outer region: a point that locates the hole without lying on a boundary
// that it may touch.
func interiorProbe(h Contour) Vec {
	best := 0
	for i, s := range h {
		if s.Length() > h[best].Length() {
			best = i
		}
	}
	s := h[best]
	m := s.Mid()
	n := s.Tangent(0.5).Perp().Neg() // right of travel
	step := math.Min(s.Length()*1e-3, 1e-4)
	return m.Add(n.Mul(step))
}
