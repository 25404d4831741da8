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
	noteWidth   = 165  // longest line of the footer's notes: within a page less leftMargin
	noteLine    = 3.5  // between the footer's lines of notes
	templLabel  = 9.0  // size of the feature numbers, points
)

// templateLayout is where everything goes on the template drawing, in drawing mm: the drawing's
// own frame has its origin at the lower left corner.
type templateLayout struct {
	p      pantograph.Plan
	size   geom.Vec // the whole drawing
	origin geom.Vec // where the template frame's origin (the datum seat) lands
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

// sketch draws the whole template, its footer and its numbers.
func (l templateLayout) sketch() *sketch {
	k := newSketch(l.fonts)
	t := geom.Translate(l.origin)
	var jobs []labelJob
	for _, f := range l.p.Features {
		own, anchors := l.feature(k, f, t)
		if f.Number > 0 && len(own) > 0 {
			jobs = append(jobs, labelJob{text: "#" + strconv.Itoa(f.Number), size: templLabel, bold: true, own: own, anchors: anchors})
		}
	}
	o := t.Apply(geom.Vec{})
	k.circle(o, 3, edgeLine)
	k.cross(o, 6, markLine)
	jobs = append(jobs, datumJob(o, 3, 8))
	l.footer(k)
	placeLabels(k, geom.Box{Max: l.size}, jobs)
	return k
}

// profile reports whether a drawing point lies on the template's profile.
func (l templateLayout) profile() func(geom.Vec) bool {
	return func(p geom.Vec) bool {
		q := p.Sub(l.origin)
		for _, f := range l.p.Features {
			if f.Kind != pantograph.KindProfile {
				continue
			}
			for _, r := range f.TemplateRegions {
				if r.Contains(q) {
					return true
				}
			}
		}
		return false
	}
}

// feature draws one feature's traced edges, seats or groove, and returns its lines and the
// places round it to try its number.
func (l templateLayout) feature(k *sketch, f pantograph.PlannedFeature, t geom.Transform) ([][]geom.Vec, []anchor) {
	var own [][]geom.Vec
	for _, r := range f.TemplateRegions {
		for _, c := range r.Contours() {
			k.contour(c, t, edgeLine)
			own = append(own, closedChain(c, t))
		}
	}
	anchors := alongChains(own, 0)
	r := f.Stylus / 2
	if f.Tip == pantograph.TipPointed || r < minSeatMark {
		r = minSeatMark
	}
	for i, s := range f.Seats {
		c := t.Apply(s)
		k.circle(c, r, edgeLine)
		k.cross(c, r+1.5, markLine)
		own = append(own, circleChain(c, r))
		if i < maxLabelHole {
			anchors = append(anchors, anchor{at: c, r: r})
		}
	}
	if len(f.Path) > 1 {
		k.path(f.Path, t, edgeLine)
		path := mapPoints(f.Path, t)
		own = append(own, path)
		anchors = append(anchors, alongChains([][]geom.Vec{path}, 0)...)
	}
	return own, anchors
}

// footer draws the title lines, the check bar and the test square below the template.
func (l templateLayout) footer(k *sketch) {
	x, y := leftMargin, sideMargin
	p := l.p
	k.text(geom.V(x, y+34), 11, true, "Template: "+p.Part, canvas.Left)
	notes := wrap(l.fonts, templateScaleNote(p), 8, noteWidth)
	notes = append(notes, wrap(l.fonts, "Print at actual size (100 %, never \"fit to page\"); check the bar and square before use.", 8, noteWidth)...)
	for i, s := range notes {
		k.text(geom.V(x, y+29.5-float64(i)*noteLine), 8, false, s, canvas.Left)
	}
	// check bar with a tick every 10 mm
	by := y + 8
	k.line(geom.V(x, by), geom.V(x+checkBar, by), 0.35)
	for i := 0; i <= 10; i++ {
		tick := 1.5
		if i%5 == 0 {
			tick = 3
		}
		k.line(geom.V(x+float64(i)*10, by), geom.V(x+float64(i)*10, by+tick), markLine)
	}
	k.text(geom.V(x, by-4), 7, false, "0", canvas.Center)
	k.text(geom.V(x+checkBar, by-4), 7, false, "100 mm", canvas.Center)
	k.text(geom.V(x+checkBar/2, by-4), 7, false, "check bar: 100 mm", canvas.Center)
	sx := x + checkBar + 15
	k.rect(geom.Box{Min: geom.V(sx, y+1), Max: geom.V(sx+testSquare, y+1+testSquare)}, 0.3)
	k.text(geom.V(sx+testSquare/2, y+12), 7, false, "test square", canvas.Center)
	k.text(geom.V(sx+testSquare/2, y+8.5), 7, false, "20 × 20 mm", canvas.Center)
}

// wrap breaks s into lines no wider than width mm set in a face of size points.
func wrap(fonts *Fonts, s string, size, width float64) []string {
	var lines []string
	line := ""
	for _, w := range strings.Fields(s) {
		next := w
		if line != "" {
			next = line + " " + w
		}
		if line != "" && fonts.Width(next, size, false) > width {
			lines = append(lines, line)
			next = w
		}
		line = next
	}
	if line != "" {
		lines = append(lines, line)
	}
	return lines
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
