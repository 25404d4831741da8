package drawing

import (
	"bytes"
	"fmt"
	"io"
	"math"

	"github.com/tdewolff/canvas"
	"github.com/tdewolff/canvas/renderers/pdf"
	"github.com/tdewolff/canvas/renderers/svg"

	"panto/export/internal/pdffont"
	"panto/geom"
	"panto/pantograph"
)

// This file writes drawings out: an SVG as large as the drawing, in mm; a PDF on A4 or Letter,
// tiled over several pages when the drawing is larger than a page's printable area.

// picture is a drawing of a known size that can draw itself with its lower left corner at off,
// with alignment marks at the given drawing points.
type picture struct {
	size  geom.Vec
	title string
	draw  func(pen Pen, off geom.Vec, marks []geom.Vec)
}

// EncodeTemplateSVG writes the template of p at true size as one SVG whose width and height are
// in mm with a matching viewBox.
func EncodeTemplateSVG(w io.Writer, p pantograph.Plan) error {
	fonts, err := LoadFonts()
	if err != nil {
		return err
	}
	return writeSVG(w, templatePicture(p, fonts), fonts)
}

// EncodeTemplatePDF writes the template of p at true size on paper, over as many pages as it
// needs.
func EncodeTemplatePDF(w io.Writer, p pantograph.Plan, paper Paper) error {
	return encodeTemplatePDF(w, p, paper, true)
}

// encodeTemplatePDF is EncodeTemplatePDF with compression of the page contents as asked, so
// tests can read the drawing commands.
func encodeTemplatePDF(w io.Writer, p pantograph.Plan, paper Paper, compress bool) error {
	fonts, err := LoadFonts()
	if err != nil {
		return err
	}
	return writePDF(w, templatePicture(p, fonts), fonts, paper, compress)
}

// templatePicture wraps the template layout as a picture.
func templatePicture(p pantograph.Plan, fonts *Fonts) picture {
	l := newTemplateLayout(p, fonts)
	return picture{size: l.size, title: "Template: " + p.Part, draw: func(pen Pen, off geom.Vec, marks []geom.Vec) {
		l.marks = marks
		l.draw(pen, off)
	}}
}

// writeSVG writes pic as an SVG of its own size, in mm. Fonts are named, not embedded: the
// text is labels, and embedding would make every drawing a megabyte.
func writeSVG(w io.Writer, pic picture, fonts *Fonts) error {
	r := svg.New(w, pic.size.X, pic.size.Y, &svg.Options{SizeUnits: "mm", ImageEncoding: canvas.Lossless})
	pic.draw(Pen{Ctx: canvas.NewContext(r), Fonts: fonts}, geom.Vec{}, nil)
	return r.Close()
}

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

// marks returns the alignment marks of a tiling: in the middle of each overlap band, level with
// the middle of each tile and where bands cross, so neighbouring pages share at least two.
func (t tiling) marks(size geom.Vec) []geom.Vec {
	xs, xBands := t.lines(size.X, t.nx, t.window.X, t.step.X)
	ys, yBands := t.lines(size.Y, t.ny, t.window.Y, t.step.Y)
	var out []geom.Vec
	for _, x := range append(xs, xBands...) {
		for _, y := range append(ys, yBands...) {
			if contains(xBands, x) || contains(yBands, y) {
				out = append(out, geom.V(x, y))
			}
		}
	}
	return out
}

// lines returns the middles of the tiles along one axis and the middles of the overlap bands.
func (t tiling) lines(length float64, n int, win, step float64) (mids, bands []float64) {
	for i := 0; i < n; i++ {
		a := float64(i) * step
		mids = append(mids, (a+math.Min(a+win, length))/2)
		if i < n-1 {
			bands = append(bands, float64(i+1)*step+Overlap/2)
		}
	}
	return mids, bands
}

func contains(s []float64, v float64) bool {
	for _, x := range s {
		if x == v {
			return true
		}
	}
	return false
}

// writePDF writes pic on paper: on one page when it fits inside the margins, else tiled.
func writePDF(w io.Writer, pic picture, fonts *Fonts, paper Paper, compress bool) error {
	t := tile(pic.size, paper)
	var buf bytes.Buffer
	opts := pdf.DefaultOptions
	opts.Compress = compress
	r := pdf.New(&buf, t.paper.W, t.paper.H, &opts)
	r.SetInfo(pic.title, "true-scale drawing", "", "", "panto")
	pen := Pen{Ctx: canvas.NewContext(r), Fonts: fonts}
	var marks []geom.Vec
	if t.nx*t.ny > 1 {
		marks = t.marks(pic.size)
	}
	page := 0
	for j := t.ny - 1; j >= 0; j-- { // top row first, as the pages are read
		for i := 0; i < t.nx; i++ {
			if page > 0 {
				r.NewPage(t.paper.W, t.paper.H)
			}
			page++
			at := geom.V(float64(i)*t.step.X, float64(j)*t.step.Y)
			pic.draw(pen, geom.V(Margin, Margin).Sub(at), marks)
			if t.nx*t.ny > 1 {
				t.frame(pen, pic.title, t.ny-j, i+1, page)
			}
		}
	}
	if err := r.Close(); err != nil {
		return fmt.Errorf("drawing: %w", err)
	}
	b, err := pdffont.Fix(buf.Bytes()) // the embedded fonts carry the clock otherwise
	if err != nil {
		return fmt.Errorf("drawing: %w", err)
	}
	return WriteFixed(w, b)
}

// frame blanks the margins of a tiled page and labels it.
func (t tiling) frame(pen Pen, title string, row, col, page int) {
	W, H := t.paper.W, t.paper.H
	for _, b := range []geom.Box{
		{Min: geom.V(0, 0), Max: geom.V(W, Margin)}, {Min: geom.V(0, H-Margin), Max: geom.V(W, H)},
		{Min: geom.V(0, 0), Max: geom.V(Margin, H)}, {Min: geom.V(W-Margin, 0), Max: geom.V(W, H)},
	} {
		pen.Blank(b)
	}
	for _, c := range []geom.Vec{{X: Margin, Y: Margin}, {X: W - Margin, Y: Margin}, {X: Margin, Y: H - Margin}, {X: W - Margin, Y: H - Margin}} {
		pen.Cross(c, 3, markLine)
	}
	pen.Text(Margin, H-Margin+4, 8, true, fmt.Sprintf("%s: row %d of %d, column %d of %d (page %d of %d)",
		title, row, t.ny, col, t.nx, page, t.nx*t.ny), canvas.Left)
	pen.Text(Margin, Margin-6, 7, false, fmt.Sprintf("Tiles overlap by %d mm: lay the ⊕ marks of neighbouring pages over each other. Print at actual size (100 %%).", Overlap), canvas.Left)
}
