package drawing

import (
	"math"

	"github.com/tdewolff/canvas"

	"panto/geom"
)

// A sketch is a drawing held as a list of what it draws, in drawing mm (+Y up), before
// anything is rendered. Holding it first is what lets a label be placed clear of every line
// actually drawn, and lets a tiled page leave out text its edge would cut.
type sketch struct {
	fonts   *Fonts
	strokes []stroke
	fills   []fill
	texts   []textMark
}

// stroke is a line of a given width through pts, closed back to its start when closed.
type stroke struct {
	pts    []geom.Vec
	closed bool
	width  float64
	box    geom.Box // of pts, grown by half the width
}

// fill is a filled polygon: an arrowhead or a dot.
type fill struct {
	pts []geom.Vec
	box geom.Box
}

// textMark is one line of text with its baseline starting at at (or centred or ending there,
// by align), turned by angle degrees anticlockwise about at. box is where its ink lies.
type textMark struct {
	at    geom.Vec
	size  float64
	bold  bool
	s     string
	align canvas.TextAlign
	angle float64
	box   geom.Box
}

func newSketch(fonts *Fonts) *sketch { return &sketch{fonts: fonts} }

// line draws a straight line of width w.
func (k *sketch) line(a, b geom.Vec, w float64) { k.polyline([]geom.Vec{a, b}, false, w) }

// polyline draws a line through pts, closed when asked.
func (k *sketch) polyline(pts []geom.Vec, closed bool, w float64) {
	if len(pts) < 2 {
		return
	}
	b := geom.EmptyBox()
	for _, p := range pts {
		b = b.AddPoint(p)
	}
	k.strokes = append(k.strokes, stroke{pts: pts, closed: closed, width: w, box: b.Expand(w / 2)})
}

// contour draws a closed contour mapped by t.
func (k *sketch) contour(c geom.Contour, t geom.Transform, w float64) {
	k.polyline(c.Transform(t).Flatten(flattenTol), true, w)
}

// path draws an open path through pts mapped by t.
func (k *sketch) path(pts []geom.Vec, t geom.Transform, w float64) {
	out := make([]geom.Vec, len(pts))
	for i, p := range pts {
		out[i] = t.Apply(p)
	}
	k.polyline(out, false, w)
}

// circle draws a circle of radius r about c.
func (k *sketch) circle(c geom.Vec, r, w float64) {
	k.polyline(geom.Circle(c, r).Flatten(flattenTol), true, w)
}

// cross draws a centre cross of half-length r at c, as two separate lines.
func (k *sketch) cross(c geom.Vec, r, w float64) {
	k.line(c.Add(geom.V(-r, 0)), c.Add(geom.V(r, 0)), w)
	k.line(c.Add(geom.V(0, -r)), c.Add(geom.V(0, r)), w)
}

// rect draws the outline of box b.
func (k *sketch) rect(b geom.Box, w float64) {
	k.polyline([]geom.Vec{b.Min, geom.V(b.Max.X, b.Min.Y), b.Max, geom.V(b.Min.X, b.Max.Y)}, true, w)
}

// arrow fills an arrowhead with its point at tip, pointing along the unit vector dir.
func (k *sketch) arrow(tip, dir geom.Vec) {
	back := tip.Sub(dir.Mul(arrowLength))
	side := dir.Perp().Mul(arrowLength / 3.5)
	pts := []geom.Vec{tip, back.Add(side), back.Sub(side)}
	b := geom.EmptyBox()
	for _, p := range pts {
		b = b.AddPoint(p)
	}
	k.fills = append(k.fills, fill{pts: pts, box: b})
}

// text sets s with its baseline at at and returns where its ink lies.
func (k *sketch) text(at geom.Vec, size float64, bold bool, s string, align canvas.TextAlign) geom.Box {
	return k.turnedText(at, size, bold, s, align, 0)
}

// turnedText sets s turned by angle degrees about at.
func (k *sketch) turnedText(at geom.Vec, size float64, bold bool, s string, align canvas.TextAlign, angle float64) geom.Box {
	m := textMark{at: at, size: size, bold: bold, s: s, align: align, angle: angle}
	m.box = moveBox(turnBox(k.fonts.ink(s, size, bold, align), angle), at)
	k.texts = append(k.texts, m)
	return m.box
}

// turnBox returns the box holding b turned by angle degrees about the origin.
func turnBox(b geom.Box, angle float64) geom.Box {
	if angle == 0 {
		return b
	}
	out := geom.EmptyBox()
	a := angle * math.Pi / 180
	for _, p := range []geom.Vec{b.Min, b.Max, geom.V(b.Min.X, b.Max.Y), geom.V(b.Max.X, b.Min.Y)} {
		out = out.AddPoint(p.Rotate(a))
	}
	return out
}

// render draws the sketch with its origin at off on the page. show says whether a text whose
// ink lies in the given page box is drawn; nil draws every text.
func (k *sketch) render(pen Pen, off geom.Vec, show func(geom.Box) bool) {
	for _, s := range k.strokes {
		pen.stroke(polyPath(s.pts, s.closed, off), s.width)
	}
	for _, f := range k.fills {
		pen.fill(polyPath(f.pts, true, off), canvas.Black)
	}
	for _, t := range k.texts {
		if show != nil && !show(moveBox(t.box, off)) {
			continue
		}
		at := t.at.Add(off)
		if t.angle == 0 {
			pen.Text(at.X, at.Y, t.size, t.bold, t.s, t.align)
			continue
		}
		pen.Ctx.Push()
		pen.Ctx.RotateAbout(t.angle, at.X, at.Y)
		pen.Text(at.X, at.Y, t.size, t.bold, t.s, t.align)
		pen.Ctx.Pop()
	}
}

// polyPath returns the path through pts moved by off.
func polyPath(pts []geom.Vec, closed bool, off geom.Vec) *canvas.Path {
	path := &canvas.Path{}
	path.MoveTo(pts[0].X+off.X, pts[0].Y+off.Y)
	for _, q := range pts[1:] {
		path.LineTo(q.X+off.X, q.Y+off.Y)
	}
	if closed {
		path.Close()
	}
	return path
}

// bounds returns the box of everything drawn.
func (k *sketch) bounds() geom.Box {
	b := geom.EmptyBox()
	for _, s := range k.strokes {
		b = b.Union(s.box)
	}
	for _, f := range k.fills {
		b = b.Union(f.box)
	}
	for _, t := range k.texts {
		b = b.Union(t.box)
	}
	return b
}

// moveBox returns b moved by off.
func moveBox(b geom.Box, off geom.Vec) geom.Box {
	return geom.Box{Min: b.Min.Add(off), Max: b.Max.Add(off)}
}
