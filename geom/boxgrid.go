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
