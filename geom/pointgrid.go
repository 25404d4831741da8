package geom

import "math"

// pointGrid files points in square cells, so that the points near a given one are found by
// looking into the few cells about it: O(1) a point rather than a search of them all. The
// points of a cell are a list linked through next, newest first, so a cell costs one map entry
// and no slice of its own.
//
// The grid only finds candidates; what counts as near, and what to do about it, stays with each
// user: the snapper takes the first earlier point within snapTol, the welder joins every point
// within weldTol into one group, and the loose-end graph joins an end to the nearest node within
// the caller's tolerance.
type pointGrid struct {
	cell   float64            // side of a cell
	margin float64            // how near a cell's side a point must be for near to look past it
	heads  map[[2]int64]int32 // cell → its newest point + 1
	pts    []Vec              // every point, in the order filed
	next   []int32            // the point filed before this one in its cell + 1; 0 ends the list
}

// newPointGrid returns an empty grid with cells cell wide, for finding the points within reach
// of a given one, and room for about n points. The cell must be at least reach wide. A point
// looks into a neighbouring cell only when it lies within reach of that side, so with cells
// several times reach wide most points look into their own cell alone, and with cells reach
// wide into all nine about it. The margin of a tenth of reach covers the rounding of the
// division into cells.
func newPointGrid(cell, reach float64, n int) *pointGrid {
	return &pointGrid{cell: cell, margin: 1.1 * reach, heads: make(map[[2]int64]int32, n),
		pts: make([]Vec, 0, n), next: make([]int32, 0, n)}
}

// add files p and returns its number; points are numbered from 0 in the order filed.
func (g *pointGrid) add(p Vec) int {
	c := g.cellOf(p)
	g.pts = append(g.pts, p)
	g.next = append(g.next, g.heads[c])
	g.heads[c] = int32(len(g.pts))
	return len(g.pts) - 1
}

// point returns point i.
func (g *pointGrid) point(i int) Vec { return g.pts[i] }

// near calls visit with the number of every point filed in a cell that may hold points within
// reach of p, until visit returns false. It visits the cells in order of x, then of y, and the
// points of each cell newest first; some users' choices among equally near points rest on that
// order.
func (g *pointGrid) near(p Vec, visit func(i int) bool) {
	fx, fy := math.Floor(p.X/g.cell), math.Floor(p.Y/g.cell)
	cx, cy := cellIndex(fx), cellIndex(fy)
	x0, x1 := g.reach(p.X, fx)
	y0, y1 := g.reach(p.Y, fy)
	for dx := x0; dx <= x1; dx++ {
		for dy := y0; dy <= y1; dy++ {
			for k := g.heads[[2]int64{cx + dx, cy + dy}]; k > 0; k = g.next[k-1] {
				if !visit(int(k - 1)) {
					return
				}
			}
		}
	}
}

// cellOf returns the cell holding p.
func (g *pointGrid) cellOf(p Vec) [2]int64 {
	return [2]int64{cellIndex(math.Floor(p.X / g.cell)), cellIndex(math.Floor(p.Y / g.cell))}
}

// cellIndex returns the index of the cell whose lower side is f cells from the origin.
// Coordinates beyond the int64 range share the end cells.
func cellIndex(f float64) int64 {
	switch {
	case f < -1<<62:
		return -1 << 62
	case f > 1<<62:
		return 1 << 62
	}
	return int64(f)
}

// reach returns which neighbouring cells along one axis (−1, 0, +1) can hold a point near
// coordinate v, whose cell starts at f·cell.
func (g *pointGrid) reach(v, f float64) (lo, hi int64) {
	off := v - f*g.cell
	if off < g.margin {
		lo = -1
	}
	if g.cell-off < g.margin {
		hi = 1
	}
	return lo, hi
}
