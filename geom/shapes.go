package geom

import (
	"fmt"
	"math"
)

// Circle returns the counter-clockwise circle about c with radius r, as one full arc starting
// at angle 0.
func Circle(c Vec, r float64) Contour {
	return Contour{ArcFrom(c.Add(Vec{r, 0}), c, 2*math.Pi)}
}

// Rect returns the counter-clockwise rectangle with lower-left corner min and the given size,
// its four corners rounded to radius corner (0 for sharp corners).
func Rect(min, size Vec, corner float64) (Contour, error) {
	pts := []Vec{min, min.Add(Vec{size.X, 0}), min.Add(size), min.Add(Vec{0, size.Y})}
	return RoundedPolygon(pts, []float64{corner, corner, corner, corner})
}

// Capsule returns the counter-clockwise stadium around the segment a–b: every point within r of
// it. It is the shape a round cutter of radius r leaves when fed from a to b.
func Capsule(a, b Vec, r float64) Contour {
	if a.Near(b) {
		return Circle(a, r)
	}
	n := b.Sub(a).Unit().Perp().Mul(r)
	return Contour{
		Line(a.Sub(n), b.Sub(n)),
		ArcFrom(b.Sub(n), b, math.Pi),
		Line(b.Add(n), a.Add(n)),
		ArcFrom(a.Add(n), a, math.Pi),
	}
}

// RoundedPolygon returns the closed polygon through pts with the corner at pts[i] rounded by a
// tangent arc of radius radii[i] (0 leaves it sharp; radii may be shorter than pts). It fails
// when a rounding does not fit on the edges beside it.
func RoundedPolygon(pts []Vec, radii []float64) (Contour, error) {
	n := len(pts)
	if n < 3 {
		return nil, fmt.Errorf("a polygon needs at least 3 points, got %d", n)
	}
	type corner struct {
		in, out Vec // where the straight edges end and start again
		arc     *Segment
	}
	cs := make([]corner, n)
	for i, p := range pts {
		cs[i] = corner{in: p, out: p}
		r := 0.0
		if i < len(radii) {
			r = radii[i]
		}
		if r <= 0 {
			continue
		}
		d1 := p.Sub(pts[(i+n-1)%n]).Unit()
		d2 := pts[(i+1)%n].Sub(p).Unit()
		turn := math.Atan2(d1.Cross(d2), d1.Dot(d2))
		if math.Abs(turn) < 1e-12 {
			continue // straight through: nothing to round
		}
		l := r * math.Tan(math.Abs(turn)/2)
		in := p.Sub(d1.Mul(l))
		center := in.Add(d1.Perp().Mul(math.Copysign(r, turn)))
		arc := Segment{A: in, B: p.Add(d2.Mul(l)), Center: center, Sweep: turn}
		cs[i] = corner{in: arc.A, out: arc.B, arc: &arc}
	}
	var c Contour
	for i := range cs {
		j := (i + 1) % n
		edge := pts[j].Sub(pts[i]).Len()
		used := cs[i].out.Dist(pts[i]) + cs[j].in.Dist(pts[j])
		if used > edge*(1+1e-12)+pointTol {
			return nil, fmt.Errorf("corner roundings at points %d and %d need %.6g of an edge only %.6g long", i, j, used, edge)
		}
		if cs[i].arc != nil {
			c = append(c, *cs[i].arc)
		}
		if !cs[i].out.Near(cs[j].in) {
			c = append(c, Line(cs[i].out, cs[j].in))
		}
	}
	return c, nil
}
