package drawing

import (
	"bytes"
	"fmt"
	"io"

	"github.com/tdewolff/canvas"
	"github.com/tdewolff/canvas/renderers/pdf"
	"github.com/tdewolff/canvas/renderers/svg"

	"panto/export/internal/pdffont"
	"panto/geom"
	"panto/pantograph"
)

// This file writes drawings out: an SVG as large as the drawing, in mm; a PDF of pages on A4
// or Letter, the template tiled over several when it is larger than a page's printable area.

// docPage is one page of a PDF: its paper (turned or not) and what is drawn on it, in mm from
// the paper's lower left corner.
type docPage struct {
	paper Paper
	draw  func(pen Pen)
}

// EncodeTemplateSVG writes the template of p at true size as one SVG whose width and height are
// in mm with a matching viewBox.
func EncodeTemplateSVG(w io.Writer, p pantograph.Plan) error {
	fonts, err := LoadFonts()
	if err != nil {
		return err
	}
	l := newTemplateLayout(p, fonts)
	k := l.sketch()
	return writeSVG(w, l.size, fonts, func(pen Pen) { k.render(pen, geom.Vec{}, nil) })
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
	l := newTemplateLayout(p, fonts)
	pages, _ := templatePages(l, l.sketch(), paper)
	return writePDF(w, "Template: "+p.Part, pages, fonts, compress)
}

// templatePages lays the template sketch k over pages of paper: one when it fits inside the
// margins, else tiles with alignment marks, whose places it returns (drawing mm).
func templatePages(l templateLayout, k *sketch, paper Paper) ([]docPage, []geom.Vec) {
	t := tile(l.size, paper)
	if t.nx*t.ny == 1 {
		return []docPage{{paper: t.paper, draw: func(pen Pen) { k.render(pen, geom.V(Margin, Margin), nil) }}}, nil
	}
	marks := t.placeMarks(k, l.profile())
	var pages []docPage
	for j := t.ny - 1; j >= 0; j-- { // top row first, as the pages are read
		for i := 0; i < t.nx; i++ {
			row, col, n := t.ny-j, i+1, len(pages)+1
			off := geom.V(Margin, Margin).Sub(geom.V(float64(i)*t.step.X, float64(j)*t.step.Y))
			pages = append(pages, docPage{paper: t.paper, draw: func(pen Pen) {
				k.render(pen, off, t.whole)
				t.frame(pen, "Template: "+l.p.Part, row, col, n)
			}})
		}
	}
	return pages, marks
}

// writeSVG writes an SVG of size mm, drawn by draw. Fonts are named, not embedded: the text is
// labels, and embedding would make every drawing a megabyte.
func writeSVG(w io.Writer, size geom.Vec, fonts *Fonts, draw func(Pen)) error {
	r := svg.New(w, size.X, size.Y, &svg.Options{SizeUnits: "mm", ImageEncoding: canvas.Lossless})
	draw(Pen{Ctx: canvas.NewContext(r), Fonts: fonts})
	return r.Close()
}

// writePDF writes the pages as one PDF titled title.
func writePDF(w io.Writer, title string, pages []docPage, fonts *Fonts, compress bool) error {
	var buf bytes.Buffer
	opts := pdf.DefaultOptions
	opts.Compress = compress
	first := pages[0].paper
	r := pdf.New(&buf, first.W, first.H, &opts)
	r.SetInfo(title, "true-scale drawing", "", "", "panto")
	pen := Pen{Ctx: canvas.NewContext(r), Fonts: fonts}
	for i, pg := range pages {
		if i > 0 {
			r.NewPage(pg.paper.W, pg.paper.H)
		}
		pg.draw(pen)
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
