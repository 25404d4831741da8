package sheet

import (
	"bytes"
	"fmt"
	"io"
	"strings"

	"github.com/tdewolff/canvas"
	"github.com/tdewolff/canvas/renderers/pdf"

	"panto/export/drawing"
	"panto/export/internal/pdffont"
	"panto/geom"
	"panto/pantograph"
)

// Type sizes in points and spacing in mm for the printed sheet: 9–10 pt reads at arm's length
// at the machine; the readings are set bold so they stand out in black and white (common
// practice, no source).
const (
	sizeTitle   = 15
	sizeHead    = 11
	sizeBody    = 9
	sizeReading = 10
	pageMargin  = 15 // mm
	lineGap     = 1.45
	boxSize     = 4.2 // mm, the tick box
	indent      = 8   // mm, body lines under a step's heading
)

// EncodePDF writes s as a PDF on paper, with real (searchable) text and a tick box per step.
func EncodePDF(w io.Writer, s pantograph.Sheet, paper drawing.Paper) error {
	fonts, err := drawing.LoadFonts()
	if err != nil {
		return err
	}
	dry := &flow{fonts: fonts, paper: paper, dry: true}
	layout(dry, s)
	var buf bytes.Buffer
	r := pdf.New(&buf, paper.W, paper.H, nil)
	r.SetInfo(title(s), "dial readings for a pantograph mill", "", "", "panto")
	f := &flow{fonts: fonts, paper: paper, r: r, pages: dry.page}
	f.start()
	layout(f, s)
	f.footer()
	if err := r.Close(); err != nil {
		return fmt.Errorf("sheet: %w", err)
	}
	b, err := pdffont.Fix(buf.Bytes()) // the embedded fonts carry the clock otherwise
	if err != nil {
		return fmt.Errorf("sheet: %w", err)
	}
	return drawing.WriteFixed(w, b)
}

// flow sets lines down the page and starts a new page when one is full. A dry flow only counts
// pages, so the footer can say "page 1 of 3".
type flow struct {
	fonts *drawing.Fonts
	paper drawing.Paper
	r     *pdf.PDF
	pen   drawing.Pen
	dry   bool
	y     float64
	page  int
	pages int
}

// start begins the first page.
func (f *flow) start() {
	f.page, f.y = 1, f.paper.H-pageMargin
	if !f.dry {
		f.pen = drawing.Pen{Ctx: canvas.NewContext(f.r), Fonts: f.fonts}
	}
}

// need starts a new page unless h mm are left above the bottom margin.
func (f *flow) need(h float64) {
	if f.page == 0 {
		f.start()
	}
	if f.y-h >= pageMargin+6 {
		return
	}
	if !f.dry {
		f.footer()
		f.r.NewPage(f.paper.W, f.paper.H)
	}
	f.page++
	f.y = f.paper.H - pageMargin
}

// footer prints the page number at the bottom of the page.
func (f *flow) footer() {
	if f.dry {
		return
	}
	f.pen.Text(f.paper.W/2, pageMargin/2, 8, false, fmt.Sprintf("page %d of %d", f.page, f.pages), canvas.Center)
}

// text sets one paragraph at x mm from the left margin, wrapped to the text width.
func (f *flow) text(x, size float64, bold bool, s string) {
	width := f.paper.W - 2*pageMargin - x
	for _, l := range f.wrap(s, size, bold, width) {
		h := size * 0.3528 * lineGap // points to mm, times the line gap
		f.need(h)
		f.y -= h
		if !f.dry {
			f.pen.Text(pageMargin+x, f.y, size, bold, l, canvas.Left)
		}
	}
}

// wrap breaks s into lines no wider than width mm.
func (f *flow) wrap(s string, size float64, bold bool, width float64) []string {
	words := strings.Fields(s)
	if len(words) == 0 {
		return []string{""}
	}
	var out []string
	cur := words[0]
	for _, w := range words[1:] {
		if f.fonts.Width(cur+" "+w, size, bold) > width {
			out = append(out, cur)
			cur = w
			continue
		}
		cur += " " + w
	}
	return append(out, cur)
}

// space leaves h mm blank.
func (f *flow) space(h float64) { f.need(h); f.y -= h }

// rule draws a thin line across the page.
func (f *flow) rule() {
	f.space(1.5)
	if !f.dry {
		f.pen.Line(geom.V(pageMargin, f.y), geom.V(f.paper.W-pageMargin, f.y), 0.2)
	}
}

// layout sets the whole sheet.
func layout(f *flow, s pantograph.Sheet) {
	f.text(0, sizeTitle, true, title(s))
	f.space(1)
	for _, h := range header(s) {
		f.labelled(h[0], h[1])
	}
	f.rule()
	f.text(0, sizeHead, true, "Dials")
	for _, d := range s.Dials.List() {
		f.labelled(d.Name, dialLine(d, s.Units))
	}
	f.rule()
	f.list("Warnings", s.Warnings, "None: every feature comes out as drawn.")
	f.list("Safety", s.Cautions, "")
	f.rule()
	f.text(0, sizeHead, true, "Steps: tick each box when done")
	for _, r := range s.Rows {
		f.step(r, s)
	}
	f.rule()
	f.list("Notes", s.Notes, "")
}

// labelled sets a bold label with its value beside it.
func (f *flow) labelled(label, value string) {
	before := f.y
	f.text(28, sizeBody, false, value)
	if !f.dry && label != "" && f.y < before {
		f.pen.Text(pageMargin, before-sizeBody*0.3528*lineGap, sizeBody, true, label, canvas.Left)
	}
}

// step sets one step: a tick box and heading, then its lines and its passes, kept on one page.
func (f *flow) step(r pantograph.SheetRow, s pantograph.Sheet) {
	lines := rowLines(r, s)
	cells := passCells(r, s)
	per := f.cellsPerLine(cells)
	rowsOfCells := (len(cells) + per - 1) / per
	f.need(float64(len(lines)+rowsOfCells+2) * sizeReading * 0.3528 * lineGap)
	f.space(2)
	top := f.y
	f.text(indent, sizeReading+1, true, stepTitle(r))
	if !f.dry {
		f.pen.Rect(geom.Box{Min: geom.V(pageMargin, top-boxSize-0.6), Max: geom.V(pageMargin+boxSize, top-0.6)}, 0.35)
	}
	for _, l := range lines {
		bold := strings.HasPrefix(l, "copy table") || strings.HasPrefix(l, "work table") || strings.HasPrefix(l, "first ")
		size := float64(sizeBody)
		if bold {
			size = sizeReading
		}
		f.text(indent+2, size, bold, l)
	}
	f.passGrid(cells, per)
}

// passCellGap is the room a pass cell keeps beside its text, mm: the tick box and a gap.
const passCellGap = 9

// cellsPerLine is how many pass cells fit across the page in columns of the widest one.
func (f *flow) cellsPerLine(cells []string) int {
	w := 0.0
	for _, c := range cells {
		w = max(w, f.fonts.Width(c, sizeBody, false)+passCellGap)
	}
	if w == 0 {
		return 1
	}
	return max(1, int((f.paper.W-2*pageMargin-indent-4)/w))
}

// passGrid sets the passes in columns, each with a small box to tick.
func (f *flow) passGrid(cells []string, per int) {
	if len(cells) == 0 {
		return
	}
	colW := (f.paper.W - 2*pageMargin - indent - 4) / float64(per)
	h := sizeBody * 0.3528 * lineGap
	for i := 0; i < len(cells); i += per {
		f.need(h)
		f.y -= h
		for j := i; j < min(i+per, len(cells)); j++ {
			if f.dry {
				continue
			}
			x := pageMargin + indent + 4 + float64(j-i)*colW
			b := boxSize * 0.7
			f.pen.Rect(geom.Box{Min: geom.V(x, f.y-0.4), Max: geom.V(x+b, f.y-0.4+b)}, 0.25)
			f.pen.Text(x+b+1.5, f.y, sizeBody, false, cells[j], canvas.Left)
		}
	}
}

// list sets a titled list of items.
func (f *flow) list(name string, items []string, empty string) {
	f.space(1)
	f.text(0, sizeHead, true, name)
	if len(items) == 0 && empty != "" {
		f.text(4, sizeBody, false, empty)
	}
	for _, it := range items {
		before := f.y
		f.text(7, sizeBody, false, it)
		if !f.dry && f.y < before {
			f.pen.Text(pageMargin+3, before-sizeBody*0.3528*lineGap, sizeBody, false, "•", canvas.Left)
		}
	}
}
