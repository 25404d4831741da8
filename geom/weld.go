package geom

import "math"

// This file welds the inputs of a boolean operation whose boundaries run so close together
// that cutting them at their crossings left pieces that do not close into loops.

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

// welder merges points within weldTol of each other, transitively: the grid finds the points
// near each new one and union–find keeps the groups, which the earliest point added
// represents. Points are numbered alike in both, in the order added.
type welder struct {
	grid   *pointGrid
	groups *unionFind
	index  map[Vec]int
}

func newWelder() *welder {
	return &welder{grid: newPointGrid(weldTol, weldTol, 0), groups: newUnionFind(0),
		index: map[Vec]int{}}
}

// add records p and joins it to every earlier point within weldTol.
func (w *welder) add(p Vec) {
	if _, ok := w.index[p]; ok {
		return
	}
	i := w.groups.add()
	w.index[p] = i
	w.grid.near(p, func(j int) bool {
		if w.grid.point(j).Dist(p) <= weldTol {
			w.groups.union(i, j)
		}
		return true
	})
	w.grid.add(p)
}

// at returns the point that represents p's group, or p when it was never added.
func (w *welder) at(p Vec) Vec {
	i, ok := w.index[p]
	if !ok {
		return p
	}
	return w.grid.point(w.groups.find(i))
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
