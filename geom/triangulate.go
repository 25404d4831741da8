package geom

import (
	"errors"
	"fmt"
	"math"
	"sort"
)

// This file cuts a polygon with holes into triangles by ear clipping. Each hole is first joined
// to the outer ring by a bridge (a zero-width slit from the hole's leftmost point to a vertex
// it can see), which leaves one ring; ears are then cut from it. Ear tests look only at
// reflex points, found through a Z-order index once the ring is large, so that plates with
// thousands of holes stay fast. When no ear can be found (rounding on nearly straight runs), the
// ring is split along a diagonal and each half is cut on its own. Every triangle's corners are
// input points: no point is added, so a triangulation of n points in all and h holes has
// exactly n + 2h − 2 triangles when every point is used, and the ring edges are the edges
// of the result that have no neighbour.

// ErrTriangulate is wrapped by Triangulate when the rings could not be covered completely.
var ErrTriangulate = errors.New("polygon could not be cut into triangles")

// zOrderMin is the ring size above which ear tests use the Z-order index; below it a plain
// walk round the ring is faster (the crossover of the classic method, from measurement of the
// same technique elsewhere, common practice).
const zOrderMin = 80

// Triangulate cuts the polygon whose outer ring is rings[0] and whose holes are rings[1:] into
// triangles. Points are numbered in order through all rings; each triangle lists three such
// numbers counter-clockwise. The outer ring must run counter-clockwise and the holes clockwise,
// none may cross another, and holes must lie inside the outer ring.
func Triangulate(rings [][]Vec) ([][3]int32, error) {
	if len(rings) == 0 || len(rings[0]) < 3 {
		return nil, fmt.Errorf("%w: the outer ring has fewer than 3 points", ErrTriangulate)
	}
	t := &earCutter{minHeight: earMinHeight}
	start := 0
	var outer *ringNode
	var holes []*ringNode
	for k, r := range rings {
		n := t.link(r, start)
		start += len(r)
		if n == nil {
			continue
		}
		if k == 0 {
			outer = n
		} else {
			holes = append(holes, leftmostNode(n))
		}
	}
	if outer == nil {
		return nil, fmt.Errorf("%w: the outer ring has fewer than 3 points", ErrTriangulate)
	}
	sort.Slice(holes, func(i, j int) bool {
		if holes[i].p.X != holes[j].p.X {
			return holes[i].p.X < holes[j].p.X
		}
		return holes[i].p.Y < holes[j].p.Y
	})
	if len(holes) > 0 {
		box := EmptyBox()
		for _, r := range rings {
			for _, p := range r {
				box = box.AddPoint(p)
			}
		}
		idx := newBandIndex(outer, box, start)
		for _, h := range holes {
			outer = t.bridgeHole(h, outer, idx)
		}
	}
	if start > zOrderMin {
		t.indexZ(outer)
	}
	t.cut(outer)
	// derived: a complete triangulation of n points with h holes has n + 2h − 2 triangles;
	// with nothing left over the repair pass (which builds maps of every edge) is not needed.
	if !t.leftover && len(t.tris) == t.points+2*t.bridged-2 && t.points == start {
		return t.tris, nil
	}
	return t.repairEdges(rings)
}

// ringNode is one point of the working ring: a doubly linked list, plus a second list in
// Z-order for the ear tests of large rings.
type ringNode struct {
	i            int32
	p            Vec
	prev, next   *ringNode
	z            uint32
	prevZ, nextZ *ringNode
	visit        uint32 // the last bandIndex visit that met this point
}

// earCutter holds the triangles made so far and the Z-order frame.
type earCutter struct {
	tris       [][3]int32
	minHeight  float64 // least height of an ear: earMinHeight, or 0 for a last resort
	points     int     // points linked into rings
	bridged    int     // holes joined to the outer ring
	leftover   bool    // some ring or hole could not be cut and was left
	minX, minY float64
	invSize    float64 // 0 when the Z-order index is not used
}

// link makes a circular list from ring r whose first point has number start, dropping points
// equal to the one before. It returns nil for a ring of fewer than three points.
func (t *earCutter) link(r []Vec, start int) *ringNode {
	var last *ringNode
	for k, p := range r {
		if last != nil && last.p == p {
			continue
		}
		n := &ringNode{i: int32(start + k), p: p}
		t.points++
		if last == nil {
			n.prev, n.next = n, n
		} else {
			n.next, n.prev = last.next, last
			last.next.prev = n
			last.next = n
		}
		last = n
	}
	if last == nil {
		return nil
	}
	if last.p == last.next.p && last != last.next {
		removeNode(last)
		last = last.prev
	}
	if last.next == last || last.next.next == last {
		return nil
	}
	return last.next
}

// orient returns twice the signed area of triangle a, b, c: positive when it turns left.
func orient(a, b, c Vec) float64 { return b.Sub(a).Cross(c.Sub(a)) }

// earMinArea is the least area, in mm², of a triangle cut as an ear: four times the area Mesh
// counts as none, so that rounding of the corners (to float32 in a file, too) cannot flatten
// an ear that passed. A corner turning less than that is treated as straight.
const earMinArea = 4 * minTriangleArea

// earMinHeight is the least height, in mm, of a triangle cut as an ear, over its longest side:
// twice the spacing of float32 numbers near 1000 (6.1e-5 mm), so that the corners of a plate up
// to a metre across, rounded to float32 in an STL file, cannot turn the triangle over.
const earMinHeight = 1e-4

// convex reports whether the ring turns left at b by more than a straight run's rounding: the
// triangle a, b, c has at least earMinArea and is at least t.minHeight high over every side.
func (t *earCutter) convex(a, b, c Vec) bool {
	o := orient(a, b, c)
	long := math.Max(a.Dist(b), math.Max(b.Dist(c), c.Dist(a)))
	return o > 2*earMinArea && o > t.minHeight*long
}

// isEar reports whether the corner at e can be cut off: it turns left and no reflex point of the
// ring lies in the triangle.
func (t *earCutter) isEar(e *ringNode) bool {
	a, b, c := e.prev, e, e.next
	if !t.convex(a.p, b.p, c.p) {
		return false
	}
	if t.invSize > 0 {
		return t.isEarZ(e)
	}
	for p := c.next; p != a; p = p.next {
		if t.blocks(a, b, c, p) {
			return false
		}
	}
	return true
}

// blocks reports whether point p stops the ear a-b-c: it lies in the triangle (edges count),
// is not one of its corners, and is a reflex or straight point of the ring.
func (t *earCutter) blocks(a, b, c, p *ringNode) bool {
	if p == a || p == b || p == c || p.p == a.p {
		return false
	}
	return inTriangle(a.p, b.p, c.p, p.p) && !t.convex(p.prev.p, p.p, p.next.p)
}

// inTriangle reports whether p lies in the counter-clockwise triangle a, b, c or on its edges.
func inTriangle(a, b, c, p Vec) bool {
	return orient(a, b, p) >= 0 && orient(b, c, p) >= 0 && orient(c, a, p) >= 0
}

// isEarZ is isEar's search through the Z-order index: only points whose Z code lies within the
// triangle's box can be inside it.
func (t *earCutter) isEarZ(e *ringNode) bool {
	a, b, c := e.prev, e, e.next
	lo := Vec{math.Min(a.p.X, math.Min(b.p.X, c.p.X)), math.Min(a.p.Y, math.Min(b.p.Y, c.p.Y))}
	hi := Vec{math.Max(a.p.X, math.Max(b.p.X, c.p.X)), math.Max(a.p.Y, math.Max(b.p.Y, c.p.Y))}
	minZ, maxZ := t.zCode(lo), t.zCode(hi)
	for p := e.prevZ; p != nil && p.z >= minZ; p = p.prevZ {
		if t.blocks(a, b, c, p) {
			return false
		}
	}
	for p := e.nextZ; p != nil && p.z <= maxZ; p = p.nextZ {
		if t.blocks(a, b, c, p) {
			return false
		}
	}
	return true
}

// cut clips ears from the ring at e until it is used up; when a full round finds no ear it
// splits the ring along a diagonal and cuts each half the same way (each half is smaller, so
// this ends).
func (t *earCutter) cut(e *ringNode) {
	stop := e
	for e.prev != e.next {
		prev, next := e.prev, e.next
		if t.isEar(e) {
			t.tris = append(t.tris, [3]int32{prev.i, e.i, next.i})
			removeNode(e)
			e, stop = next.next, next.next
			continue
		}
		e = next
		if e == stop {
			t.splitCut(e)
			return
		}
	}
}

// splitCut looks for a diagonal that cuts the ring at start in two, and cuts each half.
func (t *earCutter) splitCut(start *ringNode) {
	a := start
	for {
		for b := a.next.next; b != a.prev; b = b.next {
			if a.i != b.i && t.validDiagonal(a, b) {
				c := splitRing(a, b)
				if t.invSize > 0 {
					t.indexZ(a)
					t.indexZ(c)
				}
				t.cut(a)
				t.cut(c)
				return
			}
		}
		a = a.next
		if a == start {
			t.leftover = true
			return
		}
	}
}

// validDiagonal reports whether a-b runs inside the ring without crossing it.
func (t *earCutter) validDiagonal(a, b *ringNode) bool {
	return a.next.i != b.i && a.prev.i != b.i && a.p != b.p && !crossesRing(a, b) &&
		locallyInside(a, b) && locallyInside(b, a) && middleInside(a, b)
}

// removeNode takes n out of both lists.
func removeNode(n *ringNode) {
	n.next.prev = n.prev
	n.prev.next = n.next
	if n.prevZ != nil {
		n.prevZ.nextZ = n.nextZ
	}
	if n.nextZ != nil {
		n.nextZ.prevZ = n.prevZ
	}
}

// splitRing joins a and b by a two-way diagonal, making two rings: a's, and the one returned.
func splitRing(a, b *ringNode) *ringNode {
	a2 := &ringNode{i: a.i, p: a.p}
	b2 := &ringNode{i: b.i, p: b.p}
	an, bp := a.next, b.prev
	a.next, b.prev = b, a
	a2.next, an.prev = an, a2
	b2.next, a2.prev = a2, b2
	bp.next, b2.prev = b2, bp
	return b2
}

// locallyInside reports whether the direction from a to b lies within the ring's interior
// angle at a.
func locallyInside(a, b *ringNode) bool {
	if orient(a.prev.p, a.p, a.next.p) > 0 {
		return orient(a.p, a.next.p, b.p) >= 0 && orient(a.p, b.p, a.prev.p) >= 0
	}
	return orient(a.p, a.next.p, b.p) >= 0 || orient(a.p, b.p, a.prev.p) >= 0
}

// middleInside reports whether the midpoint of a-b lies inside the ring, by the crossing rule.
func middleInside(a, b *ringNode) bool {
	m := a.p.Lerp(b.p, 0.5)
	inside := false
	p := a
	for {
		q := p.next
		if (p.p.Y > m.Y) != (q.p.Y > m.Y) && q.p.Y != p.p.Y &&
			m.X < (q.p.X-p.p.X)*(m.Y-p.p.Y)/(q.p.Y-p.p.Y)+p.p.X {
			inside = !inside
		}
		p = q
		if p == a {
			return inside
		}
	}
}

// crossesRing reports whether segment a-b crosses an edge of the ring not ending at a or b.
func crossesRing(a, b *ringNode) bool {
	p := a
	for {
		q := p.next
		if p.i != a.i && q.i != a.i && p.i != b.i && q.i != b.i && segmentsMeet(p.p, q.p, a.p, b.p) {
			return true
		}
		p = q
		if p == a {
			return false
		}
	}
}

// segmentsMeet reports whether segments p1-q1 and p2-q2 share a point.
func segmentsMeet(p1, q1, p2, q2 Vec) bool {
	o1, o2 := sign(orient(p1, q1, p2)), sign(orient(p1, q1, q2))
	o3, o4 := sign(orient(p2, q2, p1)), sign(orient(p2, q2, q1))
	if o1 != o2 && o3 != o4 {
		return true
	}
	return o1 == 0 && onSegment(p1, p2, q1) || o2 == 0 && onSegment(p1, q2, q1) ||
		o3 == 0 && onSegment(p2, p1, q2) || o4 == 0 && onSegment(p2, q1, q2)
}

// onSegment reports whether q, known to be on the line p-r, lies within its box.
func onSegment(p, q, r Vec) bool {
	return q.X <= math.Max(p.X, r.X) && q.X >= math.Min(p.X, r.X) &&
		q.Y <= math.Max(p.Y, r.Y) && q.Y >= math.Min(p.Y, r.Y)
}

func sign(v float64) int {
	switch {
	case v > 0:
		return 1
	case v < 0:
		return -1
	}
	return 0
}

// leftmostNode returns the ring's point with the smallest X (then smallest Y).
func leftmostNode(start *ringNode) *ringNode {
	best := start
	for p := start.next; p != start; p = p.next {
		if p.p.X < best.p.X || p.p.X == best.p.X && p.p.Y < best.p.Y {
			best = p
		}
	}
	return best
}

// bridgeHole joins the hole whose leftmost point is h to the ring at outer, and returns the
// ring to go on with.
func (t *earCutter) bridgeHole(h *ringNode, outer *ringNode, idx *bandIndex) *ringNode {
	m := findBridge(h, idx)
	if m == nil {
		t.leftover = true
		return outer
	}
	t.bridged++
	for p := h; ; {
		idx.add(p, p.p.Y, p.next.p.Y)
		if p = p.next; p == h {
			break
		}
	}
	b2 := splitRing(m, h)
	a2 := b2.next
	idx.add(a2, a2.p.Y, a2.next.p.Y)
	idx.add(m, m.p.Y, h.p.Y)
	idx.add(b2, h.p.Y, m.p.Y)
	return m
}

// findBridge returns a ring point that hole point h can see to its left: the nearer end of the
// first edge a ray from h to −X meets, or a reflex point in the triangle between h, the ray's
// hit and that end, with the smallest angle to the ray.
func findBridge(h *ringNode, idx *bandIndex) *ringNode {
	hx, hy := h.p.X, h.p.Y
	qx := math.Inf(-1)
	var m *ringNode
	idx.each(hy, hy, func(p *ringNode) bool {
		q := p.next
		// Edges running down have the interior on their right (+X side) in a ring whose
		// outer part runs counter-clockwise, so only they can be the first one hit.
		if hy <= p.p.Y && hy >= q.p.Y && q.p.Y != p.p.Y {
			x := p.p.X + (hy-p.p.Y)*(q.p.X-p.p.X)/(q.p.Y-p.p.Y)
			if x <= hx && x > qx {
				qx = x
				m = p
				if q.p.X < p.p.X {
					m = q
				}
				if x == hx {
					return false
				}
			}
		}
		return true
	})
	if m == nil || qx == hx {
		return m
	}
	return visibleFrom(h, m, qx, idx)
}

// visibleFrom refines findBridge's candidate m: any ring point inside the triangle h, (qx, hy),
// m would hide m, and the one nearest the ray in angle is seen instead.
func visibleFrom(h, m *ringNode, qx float64, idx *bandIndex) *ringNode {
	hx, hy := h.p.X, h.p.Y
	mp := m.p
	a, c := Vec{hx, hy}, Vec{qx, hy}
	if hy >= mp.Y {
		a, c = c, a
	}
	tanMin := math.Inf(1)
	idx.each(math.Min(hy, mp.Y), math.Max(hy, mp.Y), func(p *ringNode) bool {
		if hx >= p.p.X && p.p.X >= mp.X && hx != p.p.X && inTriangle(a, mp, c, p.p) {
			tan := math.Abs(hy-p.p.Y) / (hx - p.p.X)
			if locallyInside(p, h) && (tan < tanMin || tan == tanMin &&
				(p.p.X > m.p.X || p.p.X == m.p.X && sectorContainsSector(m, p))) {
				m, tanMin = p, tan
			}
		}
		return true
	})
	return m
}

// bandIndex finds the ring's points and edges near a height quickly while holes are bridged:
// the plane is cut into horizontal bands and each edge, named by its first point, is listed
// in every band it spans. Bridging only adds edges, and an edge whose end moved keeps its
// listing because the test always reads the current next point.
type bandIndex struct {
	minY, invH float64
	bands      [][]*ringNode
	visit      uint32 // counts calls of each, so each point is met once per call
}

// newBandIndex returns an index over the ring at outer, with about one band per eight points
// of all n points.
func newBandIndex(outer *ringNode, box Box, n int) *bandIndex {
	nb := max(1, n/8)
	h := box.Size().Y
	idx := &bandIndex{minY: box.Min.Y, bands: make([][]*ringNode, nb)}
	if h > 0 {
		idx.invH = float64(nb) / h
	}
	for p := outer; ; {
		idx.add(p, p.p.Y, p.next.p.Y)
		if p = p.next; p == outer {
			break
		}
	}
	return idx
}

// band returns the band holding height y.
func (x *bandIndex) band(y float64) int {
	return max(0, min(len(x.bands)-1, int((y-x.minY)*x.invH)))
}

// add lists p in the bands from height y0 to y1.
func (x *bandIndex) add(p *ringNode, y0, y1 float64) {
	for b := x.band(math.Min(y0, y1)); b <= x.band(math.Max(y0, y1)); b++ {
		x.bands[b] = append(x.bands[b], p)
	}
}

// each calls fn once for every point listed in the bands from y0 to y1, until fn returns false.
func (x *bandIndex) each(y0, y1 float64, fn func(*ringNode) bool) {
	x.visit++
	for b := x.band(y0); b <= x.band(y1); b++ {
		for _, p := range x.bands[b] {
			if p.visit == x.visit {
				continue
			}
			p.visit = x.visit
			if !fn(p) {
				return
			}
		}
	}
}

// sectorContainsSector reports whether the interior angle at p lies within that at m, for two
// ring points at the same place.
func sectorContainsSector(m, p *ringNode) bool {
	return orient(m.prev.p, m.p, p.prev.p) > 0 && orient(p.next.p, m.p, m.next.p) > 0
}

// indexZ gives every point of the ring at start its Z-order code and links them in that order.
func (t *earCutter) indexZ(start *ringNode) {
	if t.invSize == 0 {
		b := EmptyBox()
		for p := start; ; {
			b = b.AddPoint(p.p)
			if p = p.next; p == start {
				break
			}
		}
		size := math.Max(b.Size().X, b.Size().Y)
		if size == 0 {
			return
		}
		t.minX, t.minY, t.invSize = b.Min.X, b.Min.Y, zGrid/size
	}
	var nodes []*ringNode
	for p := start; ; {
		p.z = t.zCode(p.p)
		nodes = append(nodes, p)
		if p = p.next; p == start {
			break
		}
	}
	sort.Slice(nodes, func(i, j int) bool { return nodes[i].z < nodes[j].z })
	for k, n := range nodes {
		n.prevZ, n.nextZ = nil, nil
		if k > 0 {
			n.prevZ = nodes[k-1]
			nodes[k-1].nextZ = n
		}
	}
}

// zGrid is the number of cells per side of the Z-order grid: 15 bits per axis interleave into
// a 30-bit code, ample for a locality index.
const zGrid = 32767

// zCode returns the Z-order (Morton) code of p's grid cell: the bits of x and y interleaved.
func (t *earCutter) zCode(p Vec) uint32 {
	x := uint32(math.Max(0, math.Min(zGrid, (p.X-t.minX)*t.invSize)))
	y := uint32(math.Max(0, math.Min(zGrid, (p.Y-t.minY)*t.invSize)))
	return spreadBits(x) | spreadBits(y)<<1
}

// spreadBits puts a zero bit between each of the low 16 bits of v.
func spreadBits(v uint32) uint32 {
	v = (v | v<<8) & 0x00FF00FF
	v = (v | v<<4) & 0x0F0F0F0F
	v = (v | v<<2) & 0x33333333
	v = (v | v<<1) & 0x55555555
	return v
}
