package geom

import (
	"errors"
	"fmt"
	"math"
)

// This file builds closed meshes of stepped solids: a flat base with areas raised above it or
// sunk into it, level within level, with openings right through and conical pits. Every
// outline is flattened once, and that one ring of points serves the level around it (as a
// hole), its own level (as its border) and the wall between them, so neighbouring faces
// share their points exactly and the surface closes without repairs.

// Terrace is one level of a stepped solid: the area inside Outline, less the areas of its
// children, is flat at height Top. A child's Outline must lie strictly inside its parent's and
// apart from its siblings'. Between a terrace and its parent stands a vertical wall from the
// parent's height to the terrace's, up for a raised terrace and down for a sunk one.
type Terrace struct {
	Outline Contour
	Top     float64
	// Open makes the terrace an opening through the whole solid: no material inside, walls
	// from the solid's base up to the parent's height. Top is ignored; an open terrace has no
	// children.
	Open bool
	// Cone makes the terrace a conical pit: the surface falls in a straight line from the
	// Outline, at the parent's height, to a point at height Top over the middle of the
	// Outline's box. Outline should be a circle (any shape star-shaped about that middle
	// works). A cone has no children.
	Cone     bool
	Children []Terrace
}

// ErrBadTerrace is wrapped by StepSolid for a terrace it cannot build.
var ErrBadTerrace = errors.New("bad terrace")

// RegionTerrace returns a terrace for region r at height top whose holes are children at
// height parentTop: a raised or sunk area with islands left at the surrounding height.
func RegionTerrace(r Region, top, parentTop float64) Terrace {
	t := Terrace{Outline: r.Outer, Top: top}
	for _, h := range r.Holes {
		t.Children = append(t.Children, Terrace{Outline: h, Top: parentTop})
	}
	return t
}

// Extrude returns the closed mesh of region r between heights z0 and z1 (z0 < z1), its arcs
// flattened to chords within tol. With V points in all after flattening and h holes it has
// 4V + 4h − 4 triangles.
func (r Region) Extrude(z0, z1, tol float64) (Mesh, error) {
	root := Terrace{Outline: r.Outer, Top: z1}
	for _, h := range r.Holes {
		root.Children = append(root.Children, Terrace{Outline: h, Open: true})
	}
	return StepSolid(z0, root, tol)
}

// StepSolid returns the closed mesh of the stepped solid that stands on height base and whose
// outermost terrace is root, every outline within tol (tol > 0) of the exact one: see
// ringPoints.
func StepSolid(base float64, root Terrace, tol float64) (Mesh, error) {
	if !(tol > 0) {
		return Mesh{}, fmt.Errorf("%w: chord tolerance must be greater than 0, got %g", ErrBadTerrace, tol)
	}
	if root.Open || root.Cone || !(root.Top > base) {
		return Mesh{}, fmt.Errorf("%w: the outermost terrace must be flat and above the base", ErrBadTerrace)
	}
	b := &solidBuilder{tol: tol, base: base, at: map[pointKey]int32{}}
	ring, err := b.ring(root.Outline)
	if err != nil {
		return Mesh{}, fmt.Errorf("outer terrace: %w", err)
	}
	b.wall(ring, base, root.Top)
	if err := b.terrace(root, ring, "outer terrace"); err != nil {
		return Mesh{}, err
	}
	if err := b.cap(ring, b.openings, base, true); err != nil {
		return Mesh{}, fmt.Errorf("base: %w", err)
	}
	return b.mesh, nil
}

// solidBuilder collects the mesh of a stepped solid.
type solidBuilder struct {
	tol, base float64
	mesh      Mesh
	rings     int32              // rings made so far; each point is named by ring and place
	at        map[pointKey]int32 // mesh point of a ring point at a height
	openings  []flatRing
}

// pointKey names a ring point at a height.
type pointKey struct {
	ring, k int32
	z       float64
}

// flatRing is a flattened outline, counter-clockwise, with its ring number.
type flatRing struct {
	id  int32
	pts []Vec
}

// point returns the mesh point of point k of ring r at height z, adding it the first time.
func (b *solidBuilder) point(r flatRing, k int, z float64) int32 {
	key := pointKey{r.id, int32(k), z}
	if i, ok := b.at[key]; ok {
		return i
	}
	i := int32(len(b.mesh.Points))
	b.mesh.Points = append(b.mesh.Points, Vec3{r.pts[k].X, r.pts[k].Y, z})
	b.at[key] = i
	return i
}

// terrace adds the surface of t (whose outline is ring) and, below it, its children.
func (b *solidBuilder) terrace(t Terrace, ring flatRing, name string) error {
	kids := make([]flatRing, len(t.Children))
	for i, c := range t.Children {
		cname := fmt.Sprintf("%s, terrace %d", name, i)
		r, err := b.ring(c.Outline)
		if err != nil {
			return fmt.Errorf("%s: %w", cname, err)
		}
		kids[i] = r
		switch {
		case c.Open:
			if len(c.Children) > 0 {
				return fmt.Errorf("%s: %w: an opening has nothing inside it", cname, ErrBadTerrace)
			}
			b.wall(r, t.Top, b.base)
			b.openings = append(b.openings, r)
		case c.Cone:
			if len(c.Children) > 0 || !(c.Top < t.Top) || !(c.Top > b.base) {
				return fmt.Errorf("%s: %w: a cone has nothing inside it, and its point lies between the base and its rim", cname, ErrBadTerrace)
			}
			b.cone(r, t.Top, c.Top)
		default:
			if !(c.Top > b.base) {
				return fmt.Errorf("%s: %w: height %g is not above the base %g", cname, ErrBadTerrace, c.Top, b.base)
			}
			b.wall(r, t.Top, c.Top)
			if err := b.terrace(c, r, cname); err != nil {
				return err
			}
		}
	}
	if err := b.cap(ring, kids, t.Top, false); err != nil {
		return fmt.Errorf("%s: %w", name, err)
	}
	return nil
}

// ring flattens c into a counter-clockwise ring of distinct points.
func (b *solidBuilder) ring(c Contour) (flatRing, error) {
	pts := ringPoints(c, b.tol)
	if len(pts) < 3 {
		return flatRing{}, fmt.Errorf("%w: outline has no area at tolerance %g", ErrBadTerrace, b.tol)
	}
	if ringArea(pts) < 0 {
		for i, j := 0, len(pts)-1; i < j; i, j = i+1, j-1 {
			pts[i], pts[j] = pts[j], pts[i]
		}
	}
	r := flatRing{id: b.rings, pts: pts}
	b.rings++
	return r, nil
}

// wall adds the vertical faces along ring from height from (the parent's) to height to. A
// wall rising from its parent faces out of the ring; one falling faces into it.
func (b *solidBuilder) wall(r flatRing, from, to float64) {
	if from == to {
		return
	}
	n := len(r.pts)
	for k := range n {
		j := (k + 1) % n
		if to > from {
			ulo, vlo, vhi, uhi := b.point(r, k, from), b.point(r, j, from), b.point(r, j, to), b.point(r, k, to)
			b.mesh.Triangles = append(b.mesh.Triangles, [3]int32{ulo, vlo, vhi}, [3]int32{ulo, vhi, uhi})
		} else {
			ulo, vlo, vhi, uhi := b.point(r, k, to), b.point(r, j, to), b.point(r, j, from), b.point(r, k, from)
			b.mesh.Triangles = append(b.mesh.Triangles, [3]int32{vlo, ulo, uhi}, [3]int32{vlo, uhi, vhi})
		}
	}
}

// cone adds a pit falling from ring r at height rim to a point at height tip under the middle
// of the ring's box.
func (b *solidBuilder) cone(r flatRing, rim, tip float64) {
	box := EmptyBox()
	for _, p := range r.pts {
		box = box.AddPoint(p)
	}
	c := box.Center()
	apex := int32(len(b.mesh.Points))
	b.mesh.Points = append(b.mesh.Points, Vec3{c.X, c.Y, tip})
	n := len(r.pts)
	for k := range n {
		b.mesh.Triangles = append(b.mesh.Triangles, [3]int32{b.point(r, k, rim), b.point(r, (k+1)%n, rim), apex})
	}
}

// cap adds the flat face at height z inside outer and outside holes, facing up, or down when
// below is set.
func (b *solidBuilder) cap(outer flatRing, holes []flatRing, z float64, below bool) error {
	rings := make([][]Vec, 0, 1+len(holes))
	rings = append(rings, outer.pts)
	type place struct {
		r   flatRing
		k   int
		rev bool
	}
	places := []place{{outer, 0, false}}
	start := len(outer.pts)
	for _, h := range holes {
		rev := make([]Vec, len(h.pts))
		for k, p := range h.pts {
			rev[len(h.pts)-1-k] = p
		}
		rings = append(rings, rev)
		places = append(places, place{h, start, true})
		start += len(h.pts)
	}
	tris, err := Triangulate(rings)
	if err != nil {
		return err
	}
	// local maps a point number of the joined rings back to its ring and place.
	local := func(i int32) int32 {
		lo, hi := 0, len(places)
		for hi-lo > 1 {
			mid := (lo + hi) / 2
			if int(i) >= places[mid].k {
				lo = mid
			} else {
				hi = mid
			}
		}
		p := places[lo]
		k := int(i) - p.k
		if p.rev {
			k = len(p.r.pts) - 1 - k
		}
		return b.point(p.r, k, z)
	}
	for _, t := range tris {
		a, c, d := local(t[0]), local(t[1]), local(t[2])
		if below {
			c, d = d, c
		}
		b.mesh.Triangles = append(b.mesh.Triangles, [3]int32{a, c, d})
	}
	return nil
}

// Shares of the tolerance of an outline's ring: chords take most of it; merging points closer
// than a tenth of it and dropping points less than a tenth of it off the line through their
// neighbours take the rest, so the ring stays within tol of the outline. Dropping such points
// also keeps out slivers so thin that rounding corners to float32 (as STL files do) could
// turn them over.
const (
	chordShare    = 0.8
	mergeShare    = 0.1
	straightShare = 0.1
)

// ringPoints flattens c into a closed polygon within tol of it, without points closer than
// mergeShare·tol to the one before or nearer than straightShare·tol to the line through their
// neighbours.
func ringPoints(c Contour, tol float64) []Vec {
	return cleanRing(c.Flatten(chordShare*tol), mergeShare*tol, straightShare*tol)
}

// cleanRing drops points nearer than minGap to the last point kept, and points within maxDev
// of the straight line between their neighbours, from the closed polygon pts.
func cleanRing(pts []Vec, minGap, maxDev float64) []Vec {
	out := make([]Vec, 0, len(pts))
	for _, p := range pts {
		if len(out) > 0 && p.Dist(out[len(out)-1]) < minGap {
			continue
		}
		out = append(out, p)
	}
	for len(out) > 1 && out[0].Dist(out[len(out)-1]) < minGap {
		out = out[:len(out)-1]
	}
	for changed := true; changed && len(out) > 3; {
		changed = false
		kept := make([]Vec, 0, len(out))
		n := len(out)
		for k, p := range out {
			a := out[n-1]
			if len(kept) > 0 {
				a = kept[len(kept)-1]
			}
			if straight(a, p, out[(k+1)%n], maxDev) {
				changed = true
				continue
			}
			kept = append(kept, p)
		}
		out = kept
	}
	return out
}

// straight reports whether b lies within maxDev of the segment a-c, between its ends.
func straight(a, b, c Vec, maxDev float64) bool {
	d := c.Sub(a)
	l := d.Len()
	return l > 0 && math.Abs(d.Cross(b.Sub(a))) <= maxDev*l && b.Sub(a).Dot(d) > 0 && c.Sub(b).Dot(d) > 0
}

// ringArea returns the signed area of the closed polygon pts.
func ringArea(pts []Vec) float64 {
	var a float64
	for k, p := range pts {
		a += p.Cross(pts[(k+1)%len(pts)])
	}
	return a / 2
}
