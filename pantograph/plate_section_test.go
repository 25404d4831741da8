package pantograph_test

import (
	"math"

	"panto/geom"
)

// This file cuts a plate's mesh the way a stylus meets it: a horizontal section at one height
// (the outline of the solid in that plane, as segments), and the height of the top surface
// over a point. The edge tests compare the section with the template's outlines.

// sectionCell is the side, in mm, of the grid that sorts section segments for look-ups: a few
// chord lengths, so that each cell holds a handful (derived from the plate's chord sizes).
const sectionCell = 1.0

// section is the outline of a mesh cut by the plane at one height, in the plate frame before
// the printer's scale correction.
type section struct {
	z    float64
	segs [][2]geom.Vec
	grid map[[2]int][]int32
}

// sectionAt cuts mesh m at height z; sx and sy are the printer's scale corrections, divided out
// so the section is in the plate frame. A plane through a corner of the mesh is moved up by a
// micrometre until it meets none, so every triangle it cuts is cut through two edges.
func sectionAt(m geom.Mesh, z, sx, sy float64) section {
	for onCorner(m, z) {
		z += 1e-6
	}
	s := section{z: z, grid: map[[2]int][]int32{}}
	for i := range m.Triangles {
		a, b, c := m.Corners(i)
		var cut []geom.Vec
		for _, e := range [3][2]geom.Vec3{{a, b}, {b, c}, {c, a}} {
			p, q := e[0], e[1]
			if (p.Z < z) == (q.Z < z) {
				continue
			}
			t := (z - p.Z) / (q.Z - p.Z)
			cut = append(cut, geom.V((p.X+t*(q.X-p.X))/sx, (p.Y+t*(q.Y-p.Y))/sy))
		}
		if len(cut) == 2 {
			s.add(cut[0], cut[1])
		}
	}
	return s
}

// onCorner reports whether some point of m lies within a nanometre of height z.
func onCorner(m geom.Mesh, z float64) bool {
	for _, p := range m.Points {
		if math.Abs(p.Z-z) < 1e-9 {
			return true
		}
	}
	return false
}

// add puts segment a-b in the section and in every grid cell its box meets.
func (s *section) add(a, b geom.Vec) {
	k := int32(len(s.segs))
	s.segs = append(s.segs, [2]geom.Vec{a, b})
	lo, hi := cellOf(geom.V(math.Min(a.X, b.X), math.Min(a.Y, b.Y))), cellOf(geom.V(math.Max(a.X, b.X), math.Max(a.Y, b.Y)))
	for i := lo[0]; i <= hi[0]; i++ {
		for j := lo[1]; j <= hi[1]; j++ {
			s.grid[[2]int{i, j}] = append(s.grid[[2]int{i, j}], k)
		}
	}
}

func cellOf(p geom.Vec) [2]int {
	return [2]int{int(math.Floor(p.X / sectionCell)), int(math.Floor(p.Y / sectionCell))}
}

// distance returns the distance from p to the nearest segment of the section within reach of
// p (reach ≤ sectionCell), or +Inf when none is that near.
func (s section) distance(p geom.Vec, reach float64) float64 {
	best := math.Inf(1)
	lo, hi := cellOf(p.Sub(geom.V(reach, reach))), cellOf(p.Add(geom.V(reach, reach)))
	for i := lo[0]; i <= hi[0]; i++ {
		for j := lo[1]; j <= hi[1]; j++ {
			for _, k := range s.grid[[2]int{i, j}] {
				best = math.Min(best, geom.Line(s.segs[k][0], s.segs[k][1]).DistanceTo(p))
			}
		}
	}
	return best
}

// surface is the top of a mesh as a height field: the triangles facing up, each with its box.
type surface struct {
	tris   [][3]geom.Vec3
	boxes  []geom.Box
	sx, sy float64
}

// topSurface returns the triangles of m facing up, in the plate frame before scaling.
func topSurface(m geom.Mesh, sx, sy float64) surface {
	s := surface{sx: sx, sy: sy}
	for i := range m.Triangles {
		if m.Normal(i).Z <= 0 {
			continue
		}
		a, b, c := m.Corners(i)
		t := [3]geom.Vec3{}
		box := geom.EmptyBox()
		for k, p := range []geom.Vec3{a, b, c} {
			t[k] = geom.Vec3{X: p.X / sx, Y: p.Y / sy, Z: p.Z}
			box = box.AddPoint(geom.V(t[k].X, t[k].Y))
		}
		s.tris, s.boxes = append(s.tris, t), append(s.boxes, box)
	}
	return s
}

// heightAt returns the height of the top surface over p, or NaN when p is off the plate or in
// an opening right through it.
func (s surface) heightAt(p geom.Vec) float64 {
	h := math.NaN()
	for i, b := range s.boxes {
		if !b.ContainsPoint(p) {
			continue
		}
		t := s.tris[i]
		a, b, c := geom.V(t[0].X, t[0].Y), geom.V(t[1].X, t[1].Y), geom.V(t[2].X, t[2].Y)
		area := b.Sub(a).Cross(c.Sub(a))
		wa, wb := c.Sub(b).Cross(p.Sub(b))/area, a.Sub(c).Cross(p.Sub(c))/area
		wc := 1 - wa - wb
		if wa < -1e-12 || wb < -1e-12 || wc < -1e-12 {
			continue
		}
		if z := wa*t[0].Z + wb*t[1].Z + wc*t[2].Z; !(z <= h) {
			h = z
		}
	}
	return h
}
