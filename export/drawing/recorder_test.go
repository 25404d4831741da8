package drawing

import (
	"image"
	"regexp"

	"github.com/tdewolff/canvas"

	"panto/geom"
)

// recorder is a canvas renderer that keeps what it is given, in page mm: every stroked line,
// every black fill's box and every text's ink box. Drawings are measured through it, from what
// the PDF and SVG writers receive, not from the layout's own notes of where things went.
type recorder struct {
	w, h   float64
	lines  []recLine
	fills  []geom.Box
	texts  []recText
	blanks int
}

type recLine struct {
	pts   []geom.Vec
	width float64
	box   geom.Box
}

type recText struct {
	s   string
	box geom.Box
}

func (r *recorder) Size() (float64, float64) { return r.w, r.h }

func (r *recorder) RenderPath(path *canvas.Path, style canvas.Style, m canvas.Matrix) {
	if !style.HasStroke() {
		if style.HasFill() && style.Fill.Color == canvas.White {
			r.blanks++
			return
		}
		b := geom.EmptyBox()
		for _, p := range path.Transform(m).Coords() {
			b = b.AddPoint(geom.V(p.X, p.Y))
		}
		r.fills = append(r.fills, b)
		return
	}
	for _, sub := range path.Copy().Transform(m).Flatten(0.005).Split() {
		var pts []geom.Vec
		b := geom.EmptyBox()
		for _, p := range sub.Coords() {
			pts = append(pts, geom.V(p.X, p.Y))
			b = b.AddPoint(geom.V(p.X, p.Y))
		}
		if sub.Closed() && len(pts) > 0 && pts[len(pts)-1] != pts[0] {
			pts = append(pts, pts[0])
		}
		r.lines = append(r.lines, recLine{pts: pts, width: style.StrokeWidth, box: b.Expand(style.StrokeWidth / 2)})
	}
}

func (r *recorder) RenderText(text *canvas.Text, m canvas.Matrix) {
	ob := text.OutlineBounds()
	b := geom.EmptyBox()
	for _, p := range []canvas.Point{{X: ob.X0, Y: ob.Y0}, {X: ob.X1, Y: ob.Y0}, {X: ob.X0, Y: ob.Y1}, {X: ob.X1, Y: ob.Y1}} {
		q := m.Dot(p)
		b = b.AddPoint(geom.V(q.X, q.Y))
	}
	r.texts = append(r.texts, recText{s: text.String(), box: b})
}

func (r *recorder) RenderImage(image.Image, canvas.Matrix) {}

// record draws with a pen on a fresh recorder of w × h mm.
func record(fonts *Fonts, w, h float64, draw func(Pen)) *recorder {
	r := &recorder{w: w, h: h}
	draw(Pen{Ctx: canvas.NewContext(r), Fonts: fonts})
	return r
}

// numberText matches a feature number as the drawings letter it.
var numberText = regexp.MustCompile(`^#([0-9]+)$`)

// lineGap returns the least gap between box b and the ink of any recorded line.
func (r *recorder) lineGap(b geom.Box) (float64, recLine) {
	best, at := 1e9, recLine{}
	for _, l := range r.lines {
		if l.box.Gap(b) > best {
			continue
		}
		if d := geom.NewPolylineIndex([][]geom.Vec{l.pts}).BoxDistance(b, best+l.width) - l.width/2; d < best {
			best, at = d, l
		}
	}
	return best, at
}
