package drawing

import (
	"fmt"
	"math"

	"github.com/tdewolff/canvas"

	"panto/geom"
)

// This file tiles a drawing larger than a page over several pages that overlap by Overlap mm.
// Neighbouring pages share alignment marks in their overlap: a cross in a square, so no mark
// can be taken for a seat (a circle), each put where it touches no line or text of the
// template, outside the part where there is room. Text a page's edge would cut is left to
// the pages that hold it whole.

// Alignment marks, mm (common practice, no source): big enough to lay one over another by eye,
// kept this far from the edges of the pages that share them and from everything drawn.
const (
	markHalf  = 3.0
	markEdge  = 5.0
	markClear = 2.0
	markStep  = 1.0 // between places tried along an overlap
)

// tiling is how a drawing is laid over pages: the paper turned as chosen, and nx × ny tiles
// that advance by step and overlap by Overlap.
type tiling struct {
	paper  Paper
	window geom.Vec // printable area of a page
	step   geom.Vec
	nx, ny int
}

// tile works out the tiling of a drawing of size on paper, upright or turned, whichever needs
// fewer pages (upright on a tie).
func tile(size geom.Vec, paper Paper) tiling {
	best := tiling{}
	for _, pp := range []Paper{paper, {Name: paper.Name, W: paper.H, H: paper.W}} {
		t := tiling{paper: pp, window: geom.V(pp.W-2*Margin, pp.H-2*Margin)}
		t.step = t.window.Sub(geom.V(Overlap, Overlap))
		t.nx, t.ny = tilesAlong(size.X, t.window.X, t.step.X), tilesAlong(size.Y, t.window.Y, t.step.Y)
		if best.nx == 0 || t.nx*t.ny < best.nx*best.ny {
			best = t
		}
	}
	return best
}

// tilesAlong returns how many tiles of length win advancing by step cover length.
func tilesAlong(length, win, step float64) int {
	if length <= win {
		return 1
	}
	return int(math.Ceil((length - Overlap) / step))
}

// whole reports whether a page box lies wholly in the printable area, where nothing is cut.
func (t tiling) whole(b geom.Box) bool {
	return b.Min.X >= Margin && b.Min.Y >= Margin && b.Max.X <= t.paper.W-Margin && b.Max.Y <= t.paper.H-Margin
}

// shared is what two neighbouring tiles both show, where their marks go: the overlap band
// between tile (i, j) and the next along X (alongX) or along Y, less markEdge all round. It
// may reach past the drawing's edge, onto paper the last tiles print blank.
func (t tiling) shared(i, j int, alongX bool) geom.Box {
	lo := geom.V(float64(i)*t.step.X, float64(j)*t.step.Y)
	b := geom.Box{Min: lo, Max: lo.Add(t.window)}
	if alongX {
		b.Min.X = lo.X + t.step.X
	} else {
		b.Min.Y = lo.Y + t.step.Y
	}
	return b.Expand(-markEdge)
}

// placeMarks puts two alignment marks in the overlap of every pair of neighbouring tiles of
// sketch k, drawing them into it, and returns their centres. inside reports whether a point
// lies on the part, which a mark keeps off when it can.
func (t tiling) placeMarks(k *sketch, inside func(geom.Vec) bool) []geom.Vec {
	var out []geom.Vec
	for i := 0; i < t.nx; i++ {
		for j := 0; j < t.ny; j++ {
			for _, alongX := range []bool{true, false} {
				if alongX && i == t.nx-1 || !alongX && j == t.ny-1 {
					continue
				}
				for _, m := range markPair(k, t.shared(i, j, alongX), alongX, inside) {
					drawMark(k, m)
					out = append(out, m)
				}
			}
		}
	}
	return out
}

// markPair finds two places for marks in band b, as far apart along it as the clear places
// allow: each the clear place nearest a quarter of the way from either end, off the part
// before on it.
func markPair(k *sketch, b geom.Box, alongX bool, inside func(geom.Vec) bool) []geom.Vec {
	var clear []geom.Vec
	across, along := markCentres(b.Min.X, b.Max.X), markCentres(b.Min.Y, b.Max.Y)
	if !alongX {
		across, along = along, across
	}
	for _, a := range along {
		for _, c := range across {
			p := geom.V(c, a)
			if !alongX {
				p = geom.V(a, c)
			}
			if clearOf(k, markBox(p), markClear) {
				clear = append(clear, p)
				break
			}
		}
	}
	var out []geom.Vec
	for _, q := range []float64{0.25, 0.75} {
		want := b.Min.Lerp(b.Max, q)
		best, score := geom.Vec{}, math.Inf(1)
		for _, p := range clear {
			s := p.Dist(want)
			if inside(p) {
				s += 1000 // on the part: only when nothing off it is clear
			}
			if len(out) > 0 && p.Dist(out[0]) < 4*markHalf {
				continue
			}
			if s < score {
				best, score = p, s
			}
		}
		if !math.IsInf(score, 1) {
			out = append(out, best)
		}
	}
	return out
}

// markCentres returns the places a mark's centre may take between lo and hi, mm apart from
// the middle outwards.
func markCentres(lo, hi float64) []float64 {
	mid := (lo + hi) / 2
	var out []float64
	for d := 0.0; mid-d >= lo; d += markStep {
		out = append(out, mid-d)
		if d > 0 {
			out = append(out, mid+d)
		}
	}
	return out
}

// markBox is the square a mark takes.
func markBox(c geom.Vec) geom.Box { return geom.Box{Min: c, Max: c}.Expand(markHalf) }

// drawMark draws an alignment mark: a square with a cross through it.
func drawMark(k *sketch, c geom.Vec) {
	k.rect(markBox(c), markLine)
	k.cross(c, markHalf, markLine)
}

// frame blanks the margins of a tiled page, ticks the corners of its printable area (in the
// margin, where they touch nothing drawn) and labels it.
func (t tiling) frame(pen Pen, title string, row, col, page int) {
	W, H := t.paper.W, t.paper.H
	o := float64(Margin) // the blanks reach past the paper's edge, where a renderer may still show a pixel
	for _, b := range []geom.Box{
		{Min: geom.V(-o, -o), Max: geom.V(W+o, Margin)}, {Min: geom.V(-o, H-Margin), Max: geom.V(W+o, H+o)},
		{Min: geom.V(-o, -o), Max: geom.V(Margin, H+o)}, {Min: geom.V(W-Margin, -o), Max: geom.V(W+o, H+o)},
	} {
		pen.Blank(b)
	}
	for _, c := range []geom.Vec{{X: Margin, Y: Margin}, {X: W - Margin, Y: Margin}, {X: Margin, Y: H - Margin}, {X: W - Margin, Y: H - Margin}} {
		sx, sy := math.Copysign(1, c.X-W/2), math.Copysign(1, c.Y-H/2)
		pen.Line(c.Add(geom.V(sx, 0)), c.Add(geom.V(sx*5, 0)), markLine)
		pen.Line(c.Add(geom.V(0, sy)), c.Add(geom.V(0, sy*5)), markLine)
	}
	pen.Text(Margin+2, H-Margin+4, 8, true, fmt.Sprintf("%s: row %d of %d, column %d of %d (page %d of %d)",
		title, row, t.ny, col, t.nx, page, t.nx*t.ny), canvas.Left)
	pen.Text(Margin+2, Margin-6, 7, false, fmt.Sprintf("Tiles overlap by %d mm: lay the squared crosses of neighbouring pages over each other. Print at actual size (100 %%).", Overlap), canvas.Left)
}
