package drawing

import (
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"github.com/tdewolff/canvas"

	"panto/geom"
	"panto/internal/numfmt"
	"panto/pantograph"
)

// This file draws the part at a readable enlargement on one page, with its overall dimensions,
// the datum, each feature's number as on the sheet, and a table of holes and features.

// partScales are the enlargements tried, largest first: round numbers a machinist can read a
// rule against (common practice, no source).
func partScales() []float64 { return []float64{50, 25, 20, 10, 8, 5, 4, 3, 2, 1, 0.5, 0.2, 0.1} }

// Layout of the part page, mm (common practice, no source).
const (
	partTop     = 24  // title block at the top of the page
	dimRoom     = 16  // room for a dimension line left of and below the part
	tableLine   = 5.2 // one line of the hole table
	partShare   = 0.6 // of the page height below the title kept for the picture
	arrowLength = 2.2
)

// EncodePartSVG writes the part drawing as an SVG of paper's size, in mm.
func EncodePartSVG(w io.Writer, part pantograph.Part, p pantograph.Plan, paper Paper) error {
	fonts, err := LoadFonts()
	if err != nil {
		return err
	}
	return writeSVG(w, partPicture(part, p, paper, fonts), fonts)
}

// EncodePartPDF writes the part drawing on one page of paper.
func EncodePartPDF(w io.Writer, part pantograph.Part, p pantograph.Plan, paper Paper) error {
	fonts, err := LoadFonts()
	if err != nil {
		return err
	}
	pic := partPicture(part, p, paper, fonts)
	pic.size = geom.V(paper.W-2*Margin, paper.H-2*Margin) // exactly one page
	return writePDF(w, pic, fonts, paper, true)
}

// partLayout holds the part page's geometry; its frame is the printable area, origin lower left.
type partLayout struct {
	part    pantograph.Part
	numbers map[string]int
	size    geom.Vec
	scale   float64
	t       geom.Transform // part frame → drawing
}

// partPicture lays out the part on the printable area of paper.
func partPicture(part pantograph.Part, p pantograph.Plan, paper Paper, fonts *Fonts) picture {
	l := partLayout{part: part, numbers: map[string]int{}, size: geom.V(paper.W-2*Margin, paper.H-2*Margin)}
	for _, f := range p.Features {
		l.numbers[f.Name] = f.Number
	}
	b := part.Profile.Region.Bounds()
	room := geom.V(l.size.X-dimRoom-4, (l.size.Y-partTop)*partShare-dimRoom)
	l.scale = partScales()[len(partScales())-1]
	for _, s := range partScales() {
		if sz := b.Size().Mul(s); sz.X <= room.X && sz.Y <= room.Y {
			l.scale = s
			break
		}
	}
	// centre the picture in its room, above the table
	sz := b.Size().Mul(l.scale)
	top := l.size.Y - partTop
	at := geom.V(dimRoom+(room.X-sz.X)/2, top-room.Y+(room.Y-sz.Y)/2)
	l.t = geom.Translate(b.Min.Neg()).Then(geom.Scale(l.scale)).Then(geom.Translate(at))
	return picture{size: l.size, title: "Part: " + part.Name, draw: func(pen Pen, off geom.Vec, _ []geom.Vec) {
		l.draw(pen, off)
	}}
}

// draw draws the whole page with its lower left corner at off.
func (l partLayout) draw(pen Pen, off geom.Vec) {
	t := l.t.Then(geom.Translate(off))
	top := off.Y + l.size.Y
	pen.Text(off.X, top-6, 14, true, "Part: "+l.part.Name, canvas.Left)
	pen.Text(off.X, top-12, 8.5, false, fmt.Sprintf("Scale %s:1 (the drawing is %s times the part). Dimensions in %s, measured from the datum.",
		trim(l.scale), trim(l.scale), l.unitWord()), canvas.Left)
	pen.Text(off.X, top-17, 8.5, false, l.stockWords()+"Numbers # match the dial-reading sheet and the template.", canvas.Left)
	for _, c := range l.part.Profile.Region.Contours() {
		pen.Contour(c, t, 0.35)
	}
	for _, f := range l.part.Features {
		l.feature(pen, f, t)
	}
	if n := l.numbers[string(pantograph.KindProfile)]; n > 0 && len(l.part.Profile.Region.Outer) > 0 {
		p := t.Apply(l.part.Profile.Region.Outer[0].A)
		pen.Text(p.X+1, p.Y+1, 9, true, "#"+strconv.Itoa(n), canvas.Left)
	}
	d := t.Apply(l.part.Datum)
	pen.Circle(d, 1.5, markLine)
	pen.Cross(d, 3.5, markLine)
	pen.Text(d.X-4, d.Y+1, 7.5, true, "datum", canvas.Right)
	l.dimensions(pen, t)
	l.table(pen, off)
}

// feature draws one feature and its number.
func (l partLayout) feature(pen Pen, f pantograph.Feature, t geom.Transform) {
	w := 0.25
	if !f.Opening() {
		w = 0.15 // blind: a pocket, a blind slot, a groove
	}
	var label geom.Vec
	switch f.Kind {
	case pantograph.KindHoles:
		for i, c := range f.Centers {
			pen.Contour(f.HoleContour(i), t, w)
			pen.Cross(t.Apply(c), f.Diameter/2*l.scale+1, markLine*0.7)
		}
		if len(f.Centers) > 0 {
			label = t.Apply(f.Centers[0]).Add(geom.V(f.Diameter/2*l.scale, f.Diameter/2*l.scale))
		}
	case pantograph.KindGroove:
		pen.Polyline(f.Path, t, math.Max(f.Width*l.scale, w))
		if len(f.Path) > 0 {
			label = t.Apply(f.Path[0])
		}
	default:
		for _, c := range f.Region.Contours() {
			pen.Contour(c, t, w)
		}
		label = t.Apply(f.Region.Bounds().Max)
	}
	name := f.Name
	if name == "" {
		name = string(f.Kind)
	}
	if n := l.numbers[name]; n > 0 {
		pen.Text(label.X+0.8, label.Y+0.8, 9, true, "#"+strconv.Itoa(n), canvas.Left)
	}
}

// dimensions draws the overall width below the part and the overall height left of it.
func (l partLayout) dimensions(pen Pen, t geom.Transform) {
	b := l.part.Profile.Region.Bounds()
	lo, hi := t.Apply(b.Min), t.Apply(b.Max)
	size := b.Size()
	y := lo.Y - 8
	pen.Line(geom.V(lo.X, lo.Y-1), geom.V(lo.X, y-2), markLine)
	pen.Line(geom.V(hi.X, lo.Y-1), geom.V(hi.X, y-2), markLine)
	pen.Line(geom.V(lo.X, y), geom.V(hi.X, y), markLine)
	pen.Arrow(geom.V(lo.X, y), geom.V(-1, 0))
	pen.Arrow(geom.V(hi.X, y), geom.V(1, 0))
	pen.Text((lo.X+hi.X)/2, y+1.2, 9, false, l.length(size.X), canvas.Center)
	x := lo.X - 8
	pen.Line(geom.V(lo.X-1, lo.Y), geom.V(x-2, lo.Y), markLine)
	pen.Line(geom.V(lo.X-1, hi.Y), geom.V(x-2, hi.Y), markLine)
	pen.Line(geom.V(x, lo.Y), geom.V(x, hi.Y), markLine)
	pen.Arrow(geom.V(x, lo.Y), geom.V(0, -1))
	pen.Arrow(geom.V(x, hi.Y), geom.V(0, 1))
	pen.Ctx.Push()
	pen.Ctx.RotateAbout(90, x-1.2, (lo.Y+hi.Y)/2)
	pen.Text(x-1.2, (lo.Y+hi.Y)/2, 9, false, l.length(size.Y), canvas.Center)
	pen.Ctx.Pop()
}

// table lists every hole with its position from the datum, then the other features.
func (l partLayout) table(pen Pen, off geom.Vec) {
	y := off.Y + (l.size.Y-partTop)*(1-partShare) - 4
	cols := []float64{0, 12, 62, 80, 100, 120}
	head := []string{"#", "feature", "Ø", "X", "Y", "depth"}
	pen.Text(off.X, y, 10, true, "Holes and features ("+l.unitWord()+"; X and Y from the datum)", canvas.Left)
	y -= tableLine + 1
	for i, h := range head {
		pen.Text(off.X+cols[i], y, 8.5, true, h, canvas.Left)
	}
	pen.Line(geom.V(off.X, y-1.5), geom.V(off.X+150, y-1.5), markLine)
	rows := l.rows()
	for i, r := range rows {
		y -= tableLine
		if y < off.Y+4 && i < len(rows)-1 {
			pen.Text(off.X, y, 8.5, false, fmt.Sprintf("… and %d more: see the dial-reading sheet", len(rows)-i), canvas.Left)
			return
		}
		for j, c := range r {
			pen.Text(off.X+cols[j], y, 8.5, false, c, canvas.Left)
		}
	}
}

// rows gives the table's rows: one per hole, one per other feature.
func (l partLayout) rows() [][]string {
	var out [][]string
	for _, f := range l.part.Features {
		name := f.Name
		if name == "" {
			name = string(f.Kind)
		}
		no := ""
		if n := l.numbers[name]; n > 0 {
			no = "#" + strconv.Itoa(n)
		}
		if f.Kind == pantograph.KindHoles {
			for _, c := range f.Centers {
				p := c.Sub(l.part.Datum)
				out = append(out, []string{no, name, l.length(f.Diameter), l.length(p.X), l.length(p.Y), l.depth(f.Depth)})
			}
			continue
		}
		dep := l.depth(f.Depth)
		if f.Kind == pantograph.KindCutout {
			dep = "through"
		}
		out = append(out, []string{no, name + " (" + string(f.Kind) + ")", "", "", "", dep})
	}
	return out
}

// unitWord names the units the part was drawn in, which the drawing's numbers are given in.
func (l partLayout) unitWord() string {
	if l.part.Units == pantograph.Inch {
		return "inches"
	}
	return "mm"
}

// length formats mm in the part's own units: inches to 0.0001, mm to 0.001.
func (l partLayout) length(mm float64) string {
	if l.part.Units == pantograph.Inch {
		return numfmt.Inch(mm / pantograph.MMPerInch)
	}
	return trim(mm)
}

// depth formats a depth in the part's own units.
func (l partLayout) depth(d pantograph.Depth) string {
	if d.Through || d.MM == 0 {
		return d.String()
	}
	return l.length(d.MM) + " " + map[bool]string{true: "in", false: "mm"}[l.part.Units == pantograph.Inch]
}

// stockWords names the stock for the page's heading, or nothing when the part does not say.
func (l partLayout) stockWords() string {
	var w []string
	if m := l.part.Stock.Material; m != "" {
		w = append(w, m)
	}
	if th := l.part.Stock.Thickness; th > 0 {
		w = append(w, l.depth(pantograph.Depth{MM: th})+" thick")
	}
	if len(w) == 0 {
		return ""
	}
	return "Stock: " + strings.Join(w, ", ") + ". "
}
