package geom

import (
	"math"
	"sort"
)

// boxGrid is a uniform grid over a set of boxes listing, for each cell, the boxes that reach
// into it.
type boxGrid struct {
	min    Vec
	cell   float64
	nx, ny int
	cells  rows[int32] // the boxes reaching into each cell, row y·nx + x
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
	g.cells = newRows[int32](g.nx * g.ny)
	g.each(boxes, func(c, _ int) { g.cells.count(c) })
	g.cells.allot()
	g.each(boxes, func(c, i int) { g.cells.place(c, int32(i)) })
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
	return g.cells.row(y*g.nx + x)
}
