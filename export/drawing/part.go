package drawing

import (
	"fmt"
	"io"
	"math"
	"strconv"

	"github.com/tdewolff/canvas"

	"panto/geom"
	"panto/internal/numfmt"
	"panto/pantograph"
)

// This file draws the part at a readable enlargement, with its overall dimensions, the datum,
// each feature's number as on the sheet, and the feature table (part_table.go) that dimensions
// every feature from the datum, continued on further pages when it is long.

// partScales are the enlargements tried, largest first: round numbers a machinist can read a
// rule against (common practice, no source).
func partScales() []float64 { return []float64{50, 25, 20, 10, 8, 5, 4, 3, 2, 1, 0.5, 0.2, 0.1} }

// Layout of the part page, mm (common practice, no source).
const (
	partTop     = 24  // title block at the top of the page
	dimRoom     = 16  // room for a dimension line left of and below the part
	tableLine   = 4.6 // one line of the feature table
	partShare   = 0.6 // of the page height below the title kept for the picture
	arrowLength = 2.2
	partLabel   = 9.0 // size of the feature numbers, points
	tableGap    = 10  // between the picture and the table
)

// EncodePartSVG writes the part drawing as one SVG in mm, its pages of paper's printable size
// one above the other.
func EncodePartSVG(w io.Writer, part pantograph.Part, p pantograph.Plan, paper Paper) error {
	fonts, err := LoadFonts()
	if err != nil {
		return err
	}
	l := newPartLayout(part, p, paper, fonts)
	pages := l.pages()
	n := float64(len(pages))
	return writeSVG(w, geom.V(l.size.X, l.size.Y*n), fonts, func(pen Pen) {
		for i, k := range pages {
			k.render(pen, geom.V(0, l.size.Y*(n-1-float64(i))), nil)
		}
	})
}

// EncodePartPDF writes the part drawing on pages of paper.
func EncodePartPDF(w io.Writer, part pantograph.Part, p pantograph.Plan, paper Paper) error {
	fonts, err := LoadFonts()
	if err != nil {
		return err
	}
	return writePDF(w, "Part: "+part.Name, partPages(newPartLayout(part, p, paper, fonts), paper), fonts, true)
}

// partPages lays the part's pages on paper, each inside the margins.
func partPages(l partLayout, paper Paper) []docPage {
	var out []docPage
	for _, k := range l.pages() {
		out = append(out, docPage{paper: paper, draw: func(pen Pen) { k.render(pen, geom.V(Margin, Margin), nil) }})
	}
	return out
}

// partLayout holds the part pages' geometry; a page's frame is its printable area, origin
// lower left.
type partLayout struct {
	part    pantograph.Part
	numbers []int // of each of part.All(), 0 when the plan gives none
	size    geom.Vec
	scale   float64
	t       geom.Transform // part frame → page one
	fonts   *Fonts
}

// newPartLayout lays out the part on the printable area of paper.
func newPartLayout(part pantograph.Part, p pantograph.Plan, paper Paper, fonts *Fonts) partLayout {
	l := partLayout{part: part, numbers: featureNumbers(part, p), size: geom.V(paper.W-2*Margin, paper.H-2*Margin), fonts: fonts}
	b := part.Profile.Region.Bounds()
	room := l.pictureRoom()
	l.scale = partScales()[len(partScales())-1]
	for _, s := range partScales() {
		if sz := b.Size().Mul(s); sz.X <= room.Size().X && sz.Y <= room.Size().Y {
			l.scale = s
			break
		}
	}
	sz := b.Size().Mul(l.scale)
	// centred across its room and at the top of it, so the table below starts high
	at := geom.V(room.Min.X+(room.Size().X-sz.X)/2, room.Max.Y-sz.Y)
	l.t = geom.Translate(b.Min.Neg()).Then(geom.Scale(l.scale)).Then(geom.Translate(at))
	return l
}

// pictureRoom is where the part itself goes on page one: below the title, above the table,
// with room for the dimension lines left and below and for numbers all round.
func (l partLayout) pictureRoom() geom.Box {
	top := l.size.Y - partTop
	bottom := top - (l.size.Y-partTop)*partShare
	return geom.Box{Min: geom.V(dimRoom+labelReach, bottom+dimRoom), Max: geom.V(l.size.X-labelReach, top-labelReach)}
}

// labelArea is where numbers may stand on page one.
func (l partLayout) labelArea() geom.Box {
	r := l.pictureRoom()
	return geom.Box{Min: geom.V(0, r.Min.Y-dimRoom), Max: geom.V(l.size.X, l.size.Y-partTop+2)}
}

// featureNumbers returns the number plan p gives each of part.All(): by place when the plan
// was made from this part, else by name.
func featureNumbers(part pantograph.Part, p pantograph.Plan) []int {
	all := part.All()
	out := make([]int, len(all))
	byName := map[string]int{}
	for _, f := range p.Features {
		byName[f.Name] = f.Number
	}
	for i, f := range all {
		name := f.Name
		if name == "" {
			name = string(f.Kind)
		}
		if len(p.Features) == len(all) && p.Features[i].Name == name {
			out[i] = p.Features[i].Number
		} else {
			out[i] = byName[name]
		}
	}
	return out
}

// pages draws page one (title, picture, start of the table) and as many more as the table needs.
func (l partLayout) pages() []*sketch {
	first := newSketch(l.fonts)
	rows := featureRows(l.part, l.numbers)
	l.picture(first)
	top := first.bounds().Min.Y - tableGap
	var pages []*sketch
	k := first
	for {
		n := l.table(k, rows, top)
		pages = append(pages, k)
		rows = rows[n:]
		if len(rows) == 0 {
			break
		}
		if !rows[0].first { // a feature carried over names itself again
			rows[0].first, rows[0].name = true, rows[0].name+", continued"
		}
		k = newSketch(l.fonts)
		top = l.size.Y - partTop
	}
	for i, k := range pages {
		l.heading(k, i+1, len(pages))
	}
	return pages
}

// heading writes the title block of page number of n.
func (l partLayout) heading(k *sketch, page, n int) {
	top := l.size.Y
	title := "Part: " + l.part.Name
	if n > 1 {
		title += fmt.Sprintf(" (page %d of %d)", page, n)
	}
	k.text(geom.V(0, top-6), 14, true, title, canvas.Left)
	k.text(geom.V(0, top-12), 8.5, false, fmt.Sprintf("Scale %s:1 (the drawing is %s times the part). Dimensions in %s, measured from the datum.",
		trim(l.scale), trim(l.scale), l.unitWord()), canvas.Left)
	k.text(geom.V(0, top-17), 8.5, false, l.stockWords()+"Numbers # match the dial-reading sheet and the template.", canvas.Left)
}

// picture draws the part, its datum, its overall dimensions and the feature numbers.
func (l partLayout) picture(k *sketch) {
	var jobs []labelJob
	for i, f := range l.part.All() {
		own, anchors := l.feature(k, f)
		if l.numbers[i] > 0 {
			jobs = append(jobs, labelJob{text: "#" + strconv.Itoa(l.numbers[i]), size: partLabel, bold: true, own: own, anchors: anchors})
		}
	}
	d := l.t.Apply(l.part.Datum)
	k.circle(d, 1.5, markLine)
	k.cross(d, 3.5, markLine)
	jobs = append(jobs, datumJob(d, 1.5, 7.5))
	l.dimensions(k)
	placeLabels(k, l.labelArea(), jobs)
}

// datumJob is the label job for the word "datum" beside a datum mark of radius r at d.
func datumJob(d geom.Vec, r, size float64) labelJob {
	return labelJob{text: "datum", size: size, bold: true, own: [][]geom.Vec{circleChain(d, r)}, anchors: []anchor{{at: d, r: r}}}
}

// feature draws one feature and returns its lines (for measuring how near a number is) and
// the places round it to try its number.
func (l partLayout) feature(k *sketch, f pantograph.Feature) ([][]geom.Vec, []anchor) {
	w := 0.25
	switch {
	case f.Kind == pantograph.KindProfile:
		w = 0.35
	case !f.Opening():
		w = 0.15 // blind: a pocket, a blind slot, a groove
	}
	switch f.Kind {
	case pantograph.KindHoles:
		var own [][]geom.Vec
		var anchors []anchor
		r := f.Diameter / 2 * l.scale
		for i, c := range f.Centers {
			p := l.t.Apply(c)
			k.contour(f.HoleContour(i), l.t, w)
			k.cross(p, r+1, markLine*0.7)
			own = append(own, circleChain(p, r))
			if i < maxLabelHole {
				anchors = append(anchors, anchor{at: p, r: r})
			}
		}
		return own, anchors
	case pantograph.KindGroove:
		k.path(f.Path, l.t, math.Max(f.Width*l.scale, w))
		own := [][]geom.Vec{mapPoints(f.Path, l.t)}
		return own, alongChains(own, math.Max(f.Width*l.scale, w)/2)
	}
	var own [][]geom.Vec
	for _, c := range f.Region.Contours() {
		k.contour(c, l.t, w)
		if ctr, r, ok := circleOf(c); ok {
			k.cross(l.t.Apply(ctr), math.Min(r*l.scale/2, 3), markLine*0.7)
		}
		own = append(own, closedChain(c, l.t))
	}
	return own, alongChains(own, 0)
}

// dimensions draws the overall width below the part and the overall height left of it.
func (l partLayout) dimensions(k *sketch) {
	b := l.part.Profile.Region.Bounds()
	lo, hi := l.t.Apply(b.Min), l.t.Apply(b.Max)
	size := b.Size()
	y := lo.Y - 8
	k.line(geom.V(lo.X, lo.Y-1), geom.V(lo.X, y-2), markLine)
	k.line(geom.V(hi.X, lo.Y-1), geom.V(hi.X, y-2), markLine)
	k.line(geom.V(lo.X, y), geom.V(hi.X, y), markLine)
	k.arrow(geom.V(lo.X, y), geom.V(-1, 0))
	k.arrow(geom.V(hi.X, y), geom.V(1, 0))
	k.text(geom.V((lo.X+hi.X)/2, y+1.2), 9, false, l.length(size.X), canvas.Center)
	x := lo.X - 8
	k.line(geom.V(lo.X-1, lo.Y), geom.V(x-2, lo.Y), markLine)
	k.line(geom.V(lo.X-1, hi.Y), geom.V(x-2, hi.Y), markLine)
	k.line(geom.V(x, lo.Y), geom.V(x, hi.Y), markLine)
	k.arrow(geom.V(x, lo.Y), geom.V(0, -1))
	k.arrow(geom.V(x, hi.Y), geom.V(0, 1))
	k.turnedText(geom.V(x-1.2, (lo.Y+hi.Y)/2), 9, false, l.length(size.Y), canvas.Center, 90)
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
	out := "Stock: "
	for i, s := range w {
		if i > 0 {
			out += ", "
		}
		out += s
	}
	return out + ". "
}
