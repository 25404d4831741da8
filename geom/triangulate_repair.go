package geom

import (
	"fmt"
	"slices"
)

// This file mends what ear cutting leaves: slivers along nearly straight runs of a ring, too
// thin for any ear, which would otherwise leave ring edges without a triangle.

// edgeKey is a directed edge between two numbered points.
type edgeKey struct{ a, b int32 }

// repairEdges makes the triangles' free edges exactly the ring edges. Points on a nearly
// straight run of the ring may be left uncut: a remnant sliver too thin for any ear. Each
// remnant is bounded by ring edges no triangle has and by triangle edges with no partner;
// the triangle across one of those edges is replaced by a fan from its far corner to the
// remnant's points, which covers both and shares every edge, as the walls beside the ring
// need. A remnant bounded by ring edges alone means part of the polygon was not covered, and
// is an error.
func (t *earCutter) repairEdges(rings [][]Vec) ([][3]int32, error) {
	var pts []Vec
	ringEdge := map[edgeKey]bool{}
	var order []edgeKey // ring edges in ring order, so repairs do not depend on map order
	for _, r := range rings {
		base := int32(len(pts))
		pts = append(pts, r...)
		for k := range r {
			e := edgeKey{base + int32(k), base + int32((k+1)%len(r))}
			if r[k] != r[(k+1)%len(r)] {
				ringEdge[e] = true
				order = append(order, e)
			}
		}
	}
	for range maxRepairRounds {
		used := t.edgeUse()
		next := map[int32][]int32{}
		var free []edgeKey // free edges in a fixed order: ring edges, then triangles' edges
		for _, e := range order {
			if used[e] == 0 {
				next[e.a] = append(next[e.a], e.b)
				free = append(free, e)
			}
		}
		for _, tr := range t.tris {
			for k := range 3 {
				u, v := tr[k], tr[(k+1)%3]
				if !ringEdge[edgeKey{u, v}] && used[edgeKey{v, u}] == 0 {
					next[v] = append(next[v], u)
					free = append(free, edgeKey{v, u})
				}
			}
		}
		if len(free) == 0 {
			return t.tris, t.checkFree(used, ringEdge)
		}
		if !t.fanRemnants(pts, ringEdge, used, next) && !t.cutRemnants(pts, free, next) {
			break
		}
	}
	return t.tris, fmt.Errorf("%w: some ring edges are not covered", ErrTriangulate)
}

// maxRepairRounds bounds the rounds of repairEdges; one round mends every remnant it can see,
// a second finds nothing left.
const maxRepairRounds = 4

// maxRemnant is the most points a remnant's chain may have: remnants are a few points on a
// nearly straight run.
const maxRemnant = 256

// fanRemnants replaces, for each remnant found through next, the triangle across one of its
// free edges by a fan over the remnant's chain, and reports whether it replaced any.
func (t *earCutter) fanRemnants(pts []Vec, ringEdge map[edgeKey]bool, used map[edgeKey]int, next map[int32][]int32) bool {
	taken := map[edgeKey]bool{}
	var out [][3]int32
	changed := false
	for _, tr := range t.tris {
		fan := t.fanFor(tr, pts, ringEdge, used, next, taken)
		if fan == nil {
			out = append(out, tr)
			continue
		}
		out = append(out, fan...)
		changed = true
	}
	t.tris = out
	return changed
}

// fanFor returns the fan that replaces triangle tr and the remnant across one of its free
// edges, or nil.
func (t *earCutter) fanFor(tr [3]int32, pts []Vec, ringEdge map[edgeKey]bool, used map[edgeKey]int,
	next map[int32][]int32, taken map[edgeKey]bool) [][3]int32 {
	for k := range 3 {
		u, v, x := tr[k], tr[(k+1)%3], tr[(k+2)%3]
		if ringEdge[edgeKey{u, v}] || used[edgeKey{v, u}] > 0 || taken[edgeKey{v, u}] {
			continue
		}
		chain := walkRemnant(u, v, next, taken)
		if chain == nil {
			continue
		}
		fan := make([][3]int32, 0, len(chain)-1)
		for i := 1; i < len(chain); i++ {
			a, b := chain[i-1], chain[i]
			if orient(pts[a], pts[b], pts[x]) <= 0 {
				fan = nil
				break
			}
			fan = append(fan, [3]int32{a, b, x})
		}
		if fan == nil {
			continue
		}
		taken[edgeKey{v, u}] = true
		for i := 1; i < len(chain); i++ {
			taken[edgeKey{chain[i-1], chain[i]}] = true
		}
		return fan
	}
	return nil
}

// cutRemnants mends each remnant that no fan mends: its free edges, walked from the first of
// them, close into a counter-clockwise ring. The ring is cut into ears if it can be; if it is
// too thin for any ear, the triangles across its free edges are taken in with it and the
// whole is cut again. It reports whether it mended any.
func (t *earCutter) cutRemnants(pts []Vec, free []edgeKey, next map[int32][]int32) bool {
	across := map[edgeKey]int{} // triangle holding each directed edge
	for i, tr := range t.tris {
		for k := range 3 {
			across[edgeKey{tr[k], tr[(k+1)%3]}] = i
		}
	}
	taken := map[edgeKey]bool{}
	drop := map[int]bool{}
	var add [][3]int32
	for _, e := range free {
		if taken[e] {
			continue
		}
		chain := walkRemnant(e.b, e.a, next, taken)
		if chain == nil {
			continue
		}
		loop := append([]int32{e.a}, chain[:len(chain)-1]...)
		for i := range loop {
			taken[edgeKey{loop[i], loop[(i+1)%len(loop)]}] = true
		}
		if tris, ok := cutLoop(loop, pts, earMinHeight); ok {
			add = append(add, tris...)
			continue
		}
		if tris, ok := t.widenAndCut(loop, pts, across, drop); ok {
			add = append(add, tris...)
		}
	}
	if len(add) == 0 {
		return false
	}
	out := add
	for i, tr := range t.tris {
		if !drop[i] {
			out = append(out, tr)
		}
	}
	t.tris = out
	return true
}

// widenAndCut cuts a thin remnant after taking in the triangles round it, ring by ring; when
// that fails it cuts the remnant alone with ears of any height, whose corners still turn
// left. The triangles taken in are added to drop.
func (t *earCutter) widenAndCut(loop []int32, pts []Vec, across map[edgeKey]int, drop map[int]bool) ([][3]int32, bool) {
	var gone []int
	wide := loop
	for range maxWiden {
		var more []int
		wide, more = widenLoop(wide, t.tris, across, drop, gone)
		gone = append(gone, more...)
		if tris, ok := cutLoop(wide, pts, earMinHeight); ok {
			for _, g := range gone {
				drop[g] = true
			}
			return tris, true
		}
	}
	return cutLoop(loop, pts, 0)
}

// cutLoop cuts the counter-clockwise ring of numbered points loop into ears at least minHeight
// high, and reports whether it was used up.
func cutLoop(loop []int32, pts []Vec, minHeight float64) ([][3]int32, bool) {
	var start, last *ringNode
	for _, i := range loop {
		n := &ringNode{i: i, p: pts[i]}
		if start == nil {
			start, n.prev, n.next = n, n, n
		} else {
			n.prev, n.next = last, start
			last.next, start.prev = n, n
		}
		last = n
	}
	sub := &earCutter{minHeight: minHeight}
	sub.cut(start)
	return sub.tris, len(sub.tris) == len(loop)-2
}

// maxWiden is how many rings of neighbouring triangles a thin remnant may take in before it
// is given up: each ring takes in the triangles across every edge, so three reach well past
// a sliver between two runs that happen to lie on one line.
const maxWiden = 3

// widenLoop returns loop with the triangle across each of its edges taken in (the edge a→b
// replaced by a→x→b, x the triangle's third corner), and the triangles taken; triangles in
// drop or had are not taken again.
func widenLoop(loop []int32, tris [][3]int32, across map[edgeKey]int, drop map[int]bool, had []int) ([]int32, []int) {
	var wide []int32
	var gone []int
	for i, a := range loop {
		b := loop[(i+1)%len(loop)]
		wide = append(wide, a)
		ti, ok := across[edgeKey{b, a}]
		if !ok || drop[ti] || slices.Contains(gone, ti) || slices.Contains(had, ti) {
			continue
		}
		tr := tris[ti]
		for k := range 3 {
			if tr[k] == b && tr[(k+1)%3] == a {
				wide = append(wide, tr[(k+2)%3])
			}
		}
		gone = append(gone, ti)
	}
	return wide, gone
}

// walkRemnant follows free edges from u until it reaches v, and returns the points passed,
// u and v included; nil when no walk gets there. A point can start two free edges (where a
// hole's bridge leaves and returns), so the walk tries each, shortest first.
func walkRemnant(u, v int32, next map[int32][]int32, taken map[edgeKey]bool) []int32 {
	var best []int32
	var walk func(chain []int32)
	walk = func(chain []int32) {
		at := chain[len(chain)-1]
		if at == v {
			if len(chain) >= 3 && (best == nil || len(chain) < len(best)) {
				best = append([]int32(nil), chain...)
			}
			return
		}
		if len(chain) > maxRemnant || best != nil && len(chain) >= len(best) {
			return
		}
		for _, n := range next[at] {
			if taken[edgeKey{at, n}] || at == u && n == v || slices.Contains(chain[1:], n) {
				continue
			}
			walk(append(chain, n))
		}
	}
	walk([]int32{u})
	return best
}

// edgeUse counts how many triangles use each directed edge.
func (t *earCutter) edgeUse() map[edgeKey]int {
	used := make(map[edgeKey]int, 3*len(t.tris))
	for _, tr := range t.tris {
		for k := range 3 {
			used[edgeKey{tr[k], tr[(k+1)%3]}]++
		}
	}
	return used
}

// checkFree reports an error when a triangle edge other than a ring edge has no partner.
func (t *earCutter) checkFree(used map[edgeKey]int, ringEdge map[edgeKey]bool) error {
	for e, n := range used {
		if n != 1 || !ringEdge[e] && used[edgeKey{e.b, e.a}] != 1 {
			return fmt.Errorf("%w: edge %d-%d is used %d times", ErrTriangulate, e.a, e.b, n)
		}
	}
	return nil
}
