package drawing

import (
	"github.com/tdewolff/canvas"

	"panto/geom"
)

// flattenTol is the chord tolerance, in mm on paper, arcs are drawn to: a hundredth of a
// millimetre is finer than any printer's dot (derived: 600 dpi is 0.042 mm a dot).
const flattenTol = 0.01

// Pen draws on a canvas context with the fonts of a drawing; every length is in mm on paper.
type Pen struct {
	Ctx   *canvas.Context
	Fonts *Fonts
}

// Line strokes a straight line of width w.
func (p Pen) Line(a, b geom.Vec, w float64) {
	path := &canvas.Path{}
	path.MoveTo(a.X, a.Y)
	path.LineTo(b.X, b.Y)
	p.stroke(path, w)
}

// Rect strokes the outline of box b, or fills it when w is 0.
func (p Pen) Rect(b geom.Box, w float64) {
	path := canvas.Rectangle(b.Max.X-b.Min.X, b.Max.Y-b.Min.Y).Translate(b.Min.X, b.Min.Y)
	if w == 0 {
		p.fill(path, canvas.Black)
		return
	}
	p.stroke(path, w)
}

// Blank paints box b white, hiding what was drawn under it.
func (p Pen) Blank(b geom.Box) {
	p.fill(canvas.Rectangle(b.Max.X-b.Min.X, b.Max.Y-b.Min.Y).Translate(b.Min.X, b.Min.Y), canvas.White)
}

// Circle strokes a circle of radius r about c.
func (p Pen) Circle(c geom.Vec, r, w float64) {
	p.stroke(canvas.Circle(r).Translate(c.X, c.Y), w)
}

// Dot fills a circle of radius r about c.
func (p Pen) Dot(c geom.Vec, r float64) {
	p.fill(canvas.Circle(r).Translate(c.X, c.Y), canvas.Black)
}

// Contour strokes a closed contour mapped by t.
func (p Pen) Contour(c geom.Contour, t geom.Transform, w float64) {
	pts := c.Transform(t).Flatten(flattenTol)
	if len(pts) < 2 {
		return
	}
	path := &canvas.Path{}
	path.MoveTo(pts[0].X, pts[0].Y)
	for _, q := range pts[1:] {
		path.LineTo(q.X, q.Y)
	}
	path.Close()
	p.stroke(path, w)
}

// Polyline strokes an open path through pts mapped by t.
func (p Pen) Polyline(pts []geom.Vec, t geom.Transform, w float64) {
	if len(pts) < 2 {
		return
	}
	path := &canvas.Path{}
	a := t.Apply(pts[0])
	path.MoveTo(a.X, a.Y)
	for _, q := range pts[1:] {
		b := t.Apply(q)
		path.LineTo(b.X, b.Y)
	}
	p.stroke(path, w)
}

// Cross draws a centre cross of half-length r at c.
func (p Pen) Cross(c geom.Vec, r, w float64) {
	p.Line(c.Add(geom.V(-r, 0)), c.Add(geom.V(r, 0)), w)
	p.Line(c.Add(geom.V(0, -r)), c.Add(geom.V(0, r)), w)
}

// Arrow fills an arrowhead with its point at tip, pointing along the unit vector dir.
func (p Pen) Arrow(tip, dir geom.Vec) {
	back := tip.Sub(dir.Mul(arrowLength))
	side := dir.Perp().Mul(arrowLength / 3.5)
	a, b := back.Add(side), back.Sub(side)
	path := &canvas.Path{}
	path.MoveTo(tip.X, tip.Y)
	path.LineTo(a.X, a.Y)
	path.LineTo(b.X, b.Y)
	path.Close()
	p.fill(path, canvas.Black)
}

// Text sets s with its baseline at (x, y): align is canvas.Left, canvas.Center or canvas.Right.
func (p Pen) Text(x, y, size float64, bold bool, s string, align canvas.TextAlign) {
	p.Ctx.DrawText(x, y, canvas.NewTextLine(p.Fonts.Face(size, bold), s, align))
}

func (p Pen) stroke(path *canvas.Path, w float64) {
	p.Ctx.Push()
	p.Ctx.SetFill(canvas.Transparent)
	p.Ctx.SetStroke(canvas.Black)
	p.Ctx.SetStrokeWidth(w)
	p.Ctx.DrawPath(0, 0, path)
	p.Ctx.Pop()
}

func (p Pen) fill(path *canvas.Path, col interface{}) {
	p.Ctx.Push()
	p.Ctx.SetFill(col)
	p.Ctx.SetStroke(canvas.Transparent)
	p.Ctx.DrawPath(0, 0, path)
	p.Ctx.Pop()
}
