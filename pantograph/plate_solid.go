package pantograph

import (
	"errors"
	"fmt"
	"math"

	"panto/geom"
)

// This file turns a Plate into a solid: the areas nested by containment into geom terraces,
// then a mesh with the printer's scale correction.

// finish moves the design into the plate frame and returns the plate.
func (d *plateDesign) finish() Plate {
	pl := d.pl
	pl.Shift = d.box.Min.Neg()
	t := geom.Translate(pl.Shift)
	pl.Size = d.box.Size()
	pl.Height = pl.Base
	for i, a := range pl.Areas {
		pl.Areas[i].Region = a.Region.Transform(t)
		pl.Height = math.Max(pl.Height, a.Top)
	}
	for i := range pl.Seats {
		pl.Seats[i].At = t.Apply(pl.Seats[i].At)
	}
	for i := range pl.Labels {
		pl.Labels[i].At = t.Apply(pl.Labels[i].At)
	}
	return pl
}

// plateNode is an area placed in the nesting, with the areas inside it.
type plateNode struct {
	area   PlateArea
	island bool // a hole of its parent's area, left at the grandparent's height
	box    geom.Box
	kids   []*plateNode
}

// Terrace returns the plate as nested terraces: each area inside the smallest area that holds
// it. It fails when two areas cross, or an area falls inside an opening or a seat.
func (p Plate) Terrace() (geom.Terrace, error) {
	if len(p.Areas) == 0 || p.Areas[0].What != "base" {
		return geom.Terrace{}, fmt.Errorf("%w: the plate has no base", ErrPlate)
	}
	as := append([]PlateArea(nil), p.Areas[1:]...)
	sortAreas(as)
	root := &plateNode{area: p.Areas[0], box: p.Areas[0].Region.Bounds()}
	for _, a := range as {
		n := &plateNode{area: a, box: a.Region.Bounds()}
		if err := root.place(n); err != nil {
			return geom.Terrace{}, err
		}
		for _, h := range a.Region.Holes {
			n.kids = append(n.kids, &plateNode{area: PlateArea{What: a.What, Region: geom.Region{Outer: h}},
				island: true, box: h.Bounds()})
		}
	}
	return root.terrace(root.area.Top, 0), nil
}

// place puts n under the deepest node holding it.
func (t *plateNode) place(n *plateNode) error {
	at := n.area.Region.Outer[0].A
	for _, k := range t.kids {
		if boxHolds(k.box, n.box) && k.area.Region.Outer.Contains(at) {
			if k.area.Open || k.area.Cone {
				return fmt.Errorf("%w: %s %s lies inside %s", ErrPlate, n.area.What, n.where(), k.area.What)
			}
			return k.place(n)
		}
	}
	for _, k := range t.kids {
		if k.box.Overlaps(n.box) && crosses(k.area.Region.Outer, n.area.Region.Outer) {
			return fmt.Errorf("%w: %s %s runs into %s %s", ErrPlate, n.area.What, n.where(), k.area.What, k.where())
		}
	}
	t.kids = append(t.kids, n)
	return nil
}

// where names a node's place in messages: its box in plate mm.
func (t *plateNode) where() string {
	return fmt.Sprintf("at (%.1f, %.1f)", t.box.Center().X, t.box.Center().Y)
}

// boxHolds reports whether box a holds box b.
func boxHolds(a, b geom.Box) bool {
	return a.ContainsPoint(b.Min) && a.ContainsPoint(b.Max)
}

// crosses reports whether two outlines cross or touch.
func crosses(a, b geom.Contour) bool {
	err := geom.Region{Outer: a, Holes: []geom.Contour{b}}.Validate()
	return errors.Is(err, geom.ErrHoleCrossing)
}

// terrace returns the node as a geom terrace at height top, in an area at height around; an
// island of the node's area stands at around.
func (t *plateNode) terrace(top, around float64) geom.Terrace {
	out := geom.Terrace{Outline: t.area.Region.Outer, Top: top, Open: t.area.Open, Cone: t.area.Cone}
	for _, k := range t.kids {
		kt := k.area.Top
		if k.island {
			kt = around
		}
		out.Children = append(out.Children, k.terrace(kt, top))
	}
	return out
}

// Mesh returns the plate as a closed triangle mesh, standing on z = 0, with the printer's scale
// corrections applied along X and Y.
func (p Plate) Mesh() (geom.Mesh, error) {
	root, err := p.Terrace()
	if err != nil {
		return geom.Mesh{}, err
	}
	m, err := geom.StepSolid(0, root, p.ChordTolerance)
	if err != nil {
		return geom.Mesh{}, fmt.Errorf("%w: %v", ErrPlate, err)
	}
	if p.ScaleX != 1 || p.ScaleY != 1 {
		for i, q := range m.Points {
			m.Points[i] = geom.Vec3{X: q.X * p.ScaleX, Y: q.Y * p.ScaleY, Z: q.Z}
		}
	}
	return m, nil
}
