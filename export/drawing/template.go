package drawing

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"github.com/tdewolff/canvas"

	"panto/geom"
	"panto/internal/numfmt"
	"panto/pantograph"
)

// This file draws the template at true size: what the copy table carries, with each feature's
// number as on the sheet, the datum seat, and a check bar and test square to measure a print by.

// Sizes on the template drawing, mm on paper (common practice, no source): thin enough lines
// to trace or cut along, labels readable at arm's length, a check bar of a round 100 mm.
const (
	edgeLine    = 0.25
	markLine    = 0.18
	checkBar    = 100.0
	testSquare  = 20.0
	footer      = 38.0 // room below the template for the title, check bar and test square
	sideMargin  = 3.0  // around the drawing; a printed page has its own margin besides
	leftMargin  = 16.0 // room for the datum's label left of a datum on the template's edge
	minSeatMark = 1.0  // radius of the mark for a pointed stylus's seat
)

// templateLayout is where everything goes on the template drawing, in drawing mm: the drawing's
// own frame has its origin at the lower left corner.
type templateLayout struct {
	p      pantograph.Plan
	size   geom.Vec   // the whole drawing
	origin geom.Vec   // where the template frame's origin (the datum seat) lands
	marks  []geom.Vec // tiling alignment marks, drawing mm
	fonts  *Fonts
}

// newTemplateLayout places the template above its footer.
func newTemplateLayout(p pantograph.Plan, fonts *Fonts) templateLayout {
	b := p.Bounds
	w := math.Max(b.Max.X-b.Min.X, checkBar+testSquare+25)
	h := b.Max.Y - b.Min.Y
	l := templateLayout{p: p, fonts: fonts, size: geom.V(w+leftMargin+sideMargin, h+footer+2*sideMargin)}
	l.origin = geom.V(leftMargin-b.Min.X, sideMargin+footer-b.Min.Y)
	return l
}

// draw draws the whole template with the drawing's origin at off on the page.
func (l templateLayout) draw(pen Pen, off geom.Vec) {
	t := geom.Translate(l.origin.Add(off))
	for _, f := range l.p.Features {
		l.feature(pen, f, t)
	}
	o := t.Apply(geom.Vec{})
	pen.Circle(o, 3, edgeLine)
	pen.Cross(o, 6, markLine)
	pen.Text(o.X-6.5, o.Y+1, 8, true, "datum", canvas.Right)
	l.footer(pen, off)
	for _, m := range l.marks {
		c := m.Add(off)
		pen.Circle(c, 2.5, markLine)
		pen.Cross(c, 5, markLine)
	}
}

// feature draws one feature's traced edges, seats or groove, and its number.
func (l templateLayout) feature(pen Pen, f pantograph.PlannedFeature, t geom.Transform) {
	for _, r := range f.TemplateRegions {
		for _, c := range r.Contours() {
			pen.Contour(c, t, edgeLine)
		}
	}
	r := f.Stylus / 2
	if f.Tip == pantograph.TipPointed || r < minSeatMark {
		r = minSeatMark
	}
	for _, s := range f.Seats {
		c := t.Apply(s)
		pen.Circle(c, r, edgeLine)
		pen.Cross(c, r+1.5, markLine)
	}
	pen.Polyline(f.Path, t, edgeLine)
	if f.Number > 0 {
		for _, at := range labelPlaces(f) {
			p := t.Apply(at)
			pen.Text(p.X+0.8, p.Y+0.8, 9, true, "#"+strconv.Itoa(f.Number), canvas.Left)
		}
	}
}

// labelPlaces are where a feature's number goes, in the template frame: beside its first seat,
// at the start of a groove, at the start of the profile's outline, and just off the upper right
// of each opening, where it does not sit on a hole inside it.
func labelPlaces(f pantograph.PlannedFeature) []geom.Vec {
	switch {
	case len(f.Seats) > 0:
		return []geom.Vec{f.Seats[0].Add(geom.V(f.Stylus/2, f.Stylus/2))}
	case len(f.Path) > 0:
		return []geom.Vec{f.Path[0]}
	case f.Kind == pantograph.KindProfile && len(f.TemplateRegions) > 0 && len(f.TemplateRegions[0].Outer) > 0:
		return []geom.Vec{f.TemplateRegions[0].Outer[0].A}
	}
	var out []geom.Vec
	for _, r := range f.TemplateRegions {
		out = append(out, r.Bounds().Max)
	}
	return out
}

// footer draws the title lines, the check bar and the test square below the template.
func (l templateLayout) footer(pen Pen, off geom.Vec) {
	x, y := off.X+leftMargin, off.Y+sideMargin
	p := l.p
	pen.Text(x, y+32, 11, true, "Template: "+p.Part, canvas.Left)
	pen.Text(x, y+28, 8, false, templateScaleNote(p), canvas.Left)
	pen.Text(x, y+24, 8, false, "Print at actual size (100 %, never \"fit to page\"); check the bar and square before use.", canvas.Left)
	// check bar with a tick every 10 mm
	by := y + 8
	pen.Line(geom.V(x, by), geom.V(x+checkBar, by), 0.35)
	for i := 0; i <= 10; i++ {
		tick := 1.5
		if i%5 == 0 {
			tick = 3
		}
		pen.Line(geom.V(x+float64(i)*10, by), geom.V(x+float64(i)*10, by+tick), markLine)
	}
	pen.Text(x, by-4, 7, false, "0", canvas.Center)
	pen.Text(x+checkBar, by-4, 7, false, "100 mm", canvas.Center)
	pen.Text(x+checkBar/2, by-4, 7, false, "check bar: 100 mm", canvas.Center)
	sx := x + checkBar + 15
	pen.Rect(geom.Box{Min: geom.V(sx, y+1), Max: geom.V(sx+testSquare, y+1+testSquare)}, 0.3)
	pen.Text(sx+testSquare/2, y+12, 7, false, "test square", canvas.Center)
	pen.Text(sx+testSquare/2, y+8.5, 7, false, "20 × 20 mm", canvas.Center)
}

// templateScaleNote states units and scale in words.
func templateScaleNote(p pantograph.Plan) string {
	s := fmt.Sprintf("Scale 1:1 at template size, units mm. Ratio %s:1: the part is 1/%s of this.",
		trim(p.Setup.Ratio), trim(p.Setup.Ratio))
	var lay []string
	if p.Setup.Mirror {
		lay = append(lay, "mirrored")
	}
	if d := p.Setup.Rotate.Degrees(); d != 0 {
		lay = append(lay, "turned "+trim(d)+"°")
	}
	if len(lay) > 0 {
		s += " Laid " + strings.Join(lay, " and ") + " as the setup asks."
	}
	return s + " Numbers # match the dial-reading sheet."
}

// trim formats a length in mm for people (numfmt.MM).
func trim(v float64) string { return numfmt.MM(v) }
