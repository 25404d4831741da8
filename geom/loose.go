package geom

import "math"

// LooseChain is a run of loose segments joined end to end by JoinLoose. Segs run in the order
// of travel (some reversed from how they were given), each starting exactly where the one
// before it ends; when Closed the last ends exactly where the first starts and Segs is a
// valid Contour. Src holds, for each segment, its index in JoinLoose's input.
type LooseChain struct {
	Segs   []Segment
	Src    []int
	Closed bool
}

// Contour returns the chain as a contour; it is closed only when c.Closed.
func (c LooseChain) Contour() Contour { return Contour(c.Segs) }

// LooseResult is what JoinLoose makes of a heap of segments.
type LooseResult struct {
	Chains     []LooseChain
	Duplicates []int // input indices dropped because an earlier segment is the same curve
	Degenerate []int // input indices dropped because both ends are the same point (not circles)
}

// JoinLoose joins segments given in any order and direction into chains, treating end points
// within tol of each other as one point. Segments that repeat an earlier one (the same ends
// within tol, the same middle within tol) are dropped and listed. Where the ends of two
// segments differ by more than pointTol, the later one is moved onto the earlier one's end
// point: a line simply, an arc by passing it through its own middle and the moved ends, so
// every arc stays a true arc. Where more than two segments meet at a point the chain takes
// them in input order; such drawings are not outlines, and contours made from them should be
// validated. A full circle is a closed chain on its own, and so is an arc of more than half a
// turn whose ends meet within tol (made a full circle); other segments whose ends meet within
// tol are dropped and listed as degenerate. Work is close to linear in the
// number of segments: end points are found through a grid of cells tol wide.
func JoinLoose(segs []Segment, tol float64) LooseResult {
	tol = math.Max(tol, pointTol)
	g := newLooseGraph(tol)
	var res LooseResult
	for i, s := range segs {
		if s.IsFullCircle() {
			res.Chains = append(res.Chains, LooseChain{Segs: []Segment{s}, Src: []int{i}, Closed: true})
			continue
		}
		a, b := g.node(s.A), g.node(s.B)
		if a == b && s.IsArc() && math.Abs(s.Sweep) > math.Pi {
			// An arc whose ends meet within tol is a circle drawn with a slip of the pen: the
			// rule of IsFullCircle, with the join tolerance in place of pointTol.
			c := ArcFrom(s.A, s.Center, math.Copysign(2*math.Pi, s.Sweep))
			res.Chains = append(res.Chains, LooseChain{Segs: []Segment{c}, Src: []int{i}, Closed: true})
			continue
		}
		if a == b {
			res.Degenerate = append(res.Degenerate, i)
			continue
		}
		if g.duplicate(segs, a, b, s) {
			res.Duplicates = append(res.Duplicates, i)
			continue
		}
		g.addEdge(i, a, b)
	}
	res.Chains = append(res.Chains, g.walkAll(segs)...)
	return res
}

// looseGraph has the distinct end points as nodes and the segments as edges.
type looseGraph struct {
	tol   float64
	nodes *pointGrid // node n's point (the first end point seen there) is point n
	at    [][]int    // node → edges meeting it
	edges []looseEdge
}

type looseEdge struct {
	src  int // index of the segment in the input
	a, b int // nodes at its start and end
	used bool
}

func newLooseGraph(tol float64) *looseGraph {
	return &looseGraph{tol: tol, nodes: newPointGrid(tol, tol, 0)}
}

// node returns the node nearest to p within tol, making one when there is none. Of nodes
// exactly as near it makes one fixed choice, so that a drawing always joins the same way: the
// newest of the last cell the grid offers one from.
func (g *looseGraph) node(p Vec) int {
	best, bestD := -1, g.tol
	g.nodes.near(p, func(n int) bool {
		d := g.nodes.point(n).Dist(p)
		if d < bestD || d == bestD && (best < 0 || g.otherCell(n, best)) {
			best, bestD = n, d
		}
		return true
	})
	if best >= 0 {
		return best
	}
	g.at = append(g.at, nil)
	return g.nodes.add(p)
}

// otherCell reports whether nodes m and n lie in different cells of the grid.
func (g *looseGraph) otherCell(m, n int) bool {
	return g.nodes.cellOf(g.nodes.point(m)) != g.nodes.cellOf(g.nodes.point(n))
}

// duplicate reports whether an edge already joins nodes a and b along the same curve as s.
func (g *looseGraph) duplicate(segs []Segment, a, b int, s Segment) bool {
	for _, e := range g.at[a] {
		ed := g.edges[e]
		if !(ed.a == a && ed.b == b || ed.a == b && ed.b == a) {
			continue
		}
		o := segs[ed.src]
		if o.IsArc() == s.IsArc() && o.Mid().Dist(s.Mid()) <= g.tol {
			return true
		}
	}
	return false
}

func (g *looseGraph) addEdge(src, a, b int) {
	g.edges = append(g.edges, looseEdge{src: src, a: a, b: b})
	g.at[a] = append(g.at[a], len(g.edges)-1)
	g.at[b] = append(g.at[b], len(g.edges)-1)
}

// walkAll makes the chains: first the open ones, walked from the loose ends so that each is as
// long as it can be, then the loops that remain.
func (g *looseGraph) walkAll(segs []Segment) []LooseChain {
	var out []LooseChain
	for n := range g.at {
		if len(g.at[n])%2 == 1 {
			for g.free(n) >= 0 {
				out = append(out, g.walk(segs, n))
			}
		}
	}
	for n := range g.at {
		for g.free(n) >= 0 {
			out = append(out, g.walk(segs, n))
		}
	}
	return out
}

// free returns an unused edge at node n, or −1.
func (g *looseGraph) free(n int) int {
	for _, e := range g.at[n] {
		if !g.edges[e].used {
			return e
		}
	}
	return -1
}

// walk follows unused edges from node start until it gets stuck or comes back to start.
func (g *looseGraph) walk(segs []Segment, start int) LooseChain {
	var c LooseChain
	for n := start; ; {
		e := g.free(n)
		if e < 0 {
			break
		}
		ed := &g.edges[e]
		ed.used = true
		s, next := segs[ed.src], ed.b
		if ed.a != n {
			s, next = s.Reverse(), ed.a
		}
		c.Segs = append(c.Segs, snapEnds(s, g.nodes.point(n), g.nodes.point(next)))
		c.Src = append(c.Src, ed.src)
		n = next
		if n == start {
			c.Closed = true
			break
		}
	}
	return c
}

// snapEnds returns s moved to run from a to b, which lie within the join tolerance of its ends.
func snapEnds(s Segment, a, b Vec) Segment {
	if s.A == a && s.B == b {
		return s
	}
	if !s.IsArc() {
		return Line(a, b)
	}
	if s.A.Near(a) && s.B.Near(b) {
		s.A, s.B = a, b
		return s
	}
	return ArcThrough(a, s.Mid(), b)
}

// LooseEnd is an end of an open chain: where it is, and the nearest other loose end, so that a
// message can say where the gap is and how wide.
type LooseEnd struct {
	Chain   int  // index into LooseResult.Chains
	At      Vec  // the end point
	Start   bool // whether it is the chain's start (else its end)
	Nearest Vec  // the nearest other loose end; only meaningful when Width is finite
	Width   float64
}

// LooseEnds returns both ends of every open chain, each with the nearest other loose end (of
// any open chain, its own other end included) and the distance to it; Width is +Inf when
// there is no other loose end. Work grows with the square of the number of open chains,
// which in a drawing meant as outlines is small.
func (r LooseResult) LooseEnds() []LooseEnd {
	var ends []LooseEnd
	for i, c := range r.Chains {
		if c.Closed || len(c.Segs) == 0 {
			continue
		}
		ends = append(ends, LooseEnd{Chain: i, At: c.Segs[0].A, Start: true},
			LooseEnd{Chain: i, At: c.Segs[len(c.Segs)-1].B})
	}
	for i := range ends {
		ends[i].Width = math.Inf(1)
		for j := range ends {
			if j == i {
				continue
			}
			if d := ends[i].At.Dist(ends[j].At); d < ends[i].Width {
				ends[i].Width, ends[i].Nearest = d, ends[j].At
			}
		}
	}
	return ends
}
