package pantograph

import (
	"fmt"
	"math"
	"sort"

	"panto/geom"
)

// This file letters the plate and lays out its front strip: the title, the check bar and the
// test square, and each feature's number beside it.

// strip puts the title, the check bar and the test square along the front of the plate.
func (d *plateDesign) strip() error {
	b := d.box
	left, right := b.Min.X+d.fix.inset, b.Max.X-d.fix.inset
	// Everything stands above the row of front fixing slots.
	row := b.Min.Y + d.fix.inset + (d.fix.hole+d.growth)/2 + 2*labelGap
	y := row + barWidth + 2*labelGap
	title := d.pl.Title
	h := titleHeight
	room := right - left - testSquare - 2*labelGap
	if w := TextWidth(title, h); w > room {
		h = math.Max(smallLabel, h*room/w)
	}
	for TextWidth(title, h) > room && len(title) > 1 {
		title = title[:len(title)-1]
	}
	if title != d.pl.Title {
		d.pl.Notes = append(d.pl.Notes, fmt.Sprintf("the title is cut to %q to fit the plate", title))
	}
	if err := d.label(title, geom.V(left, y), h); err != nil {
		return err
	}
	bar := math.Min(checkBar, math.Floor((right-left-testSquare-4*labelGap-TextWidth("100", smallLabel))/10)*10)
	if bar < 10 {
		return fmt.Errorf("%w: no room for the check bar", ErrPlate)
	}
	by := row
	d.mark("check bar", geom.V(left, by), geom.V(bar, barWidth))
	d.pl.CheckBar = bar
	if err := d.label(fmt.Sprintf("%g", bar), geom.V(left+bar+2*labelGap, by), smallLabel); err != nil {
		return err
	}
	sq := geom.V(right-testSquare, row)
	d.mark("test square", sq, geom.V(testSquare, testSquare))
	d.pl.TestSquare = testSquare
	return nil
}

// mark adds a raised rectangle of the front strip.
func (d *plateDesign) mark(what string, at, size geom.Vec) {
	c, _ := geom.Rect(at, size, 0)
	d.add(PlateArea{What: what, Region: geom.NewRegion(c), Top: d.pl.Base + markHeight})
}

// label sinks text with its lower left corner at at.
func (d *plateDesign) label(text string, at geom.Vec, h float64) error {
	rs, err := TextOutlines(text, at, h)
	if err != nil {
		return fmt.Errorf("%w: %v", ErrPlate, err)
	}
	top := d.surfaceAt(at) - labelDepth
	for _, r := range rs {
		d.add(PlateArea{What: "label", Region: r, Top: top})
	}
	d.pl.Labels = append(d.pl.Labels, PlateLabel{Text: text, At: at, Height: h})
	d.takeBox(textBox(text, at, h).Expand(labelGap))
	return nil
}

// textBox returns the box the strokes of text at at take.
func textBox(text string, at geom.Vec, h float64) geom.Box {
	return geom.Box{Min: at, Max: at.Add(geom.V(TextWidth(text, h), h*(1+strokeUnits/glyphHeight)))}
}

// The numbers are placed by a search: each has candidate places all round its feature (beside
// each of its first seats, along its outline or groove), at full and then small height; a
// candidate is refused when free says no, and the rest are scored by how near they are to
// their own feature and how far from every other, small letters costing a little. The
// numbers with fewest places go first. Rules of the search (common practice, no source):
const (
	// maxLabelTries is how many of a feature's seats are tried as places for its number:
	// enough to get round a crowded first seat, few enough to stay quick on plates with
	// thousands of holes.
	maxLabelTries = 8
	// numberReach is how far beyond the clearance a rule demands a number may stand from its
	// feature and still be read as its own; numberRing how finely distances out to it are
	// tried, numberTurns how many directions, numberStep how far apart places along an
	// outline are, and maxNumberAnchors the most places along one outline.
	numberReach      = 8.0
	numberRing       = 1.0
	numberTurns      = 16
	numberStep       = 4.0
	maxNumberAnchors = 80
	// rivalSlack: a number within this much as near to another feature as to its own costs
	// rivalCost a mm; smallCost is what setting a number small costs, in mm of distance.
	rivalSlack = 2.0
	rivalCost  = 3.0
	smallCost  = 2.0
	// numberChord is the chord tolerance edges are flattened to for the search's measures;
	// every clearance it checks is a millimetre or more.
	numberChord = 0.02
)

// numberJob is one feature's number to place: its text, the feature's edges (flattened) and
// the places round it to try.
type numberJob struct {
	f       PlannedFeature
	text    string
	edges   geom.PolylineIndex
	anchors []numberAnchor
}

// numberAnchor is a point a number may stand beside, or a circle of radius r about it.
type numberAnchor struct {
	at geom.Vec
	r  float64
}

// numberPlace is a candidate place: lower left corner, height, box and score.
type numberPlace struct {
	at    geom.Vec
	h     float64
	box   geom.Box
	score float64
}

// numbers puts each feature's number beside it, where there is room: on the island, clear of
// everything else, or on the base clear of the stylus's path round the island.
func (d *plateDesign) numbers() error {
	n := numberer{d: d}
	for _, r := range d.islands {
		n.islands = append(n.islands, takenArea{box: r.Bounds(), region: &r, edges: flatEdges(r)})
	}
	jobs := d.numberJobs()
	places := make([][]numberPlace, len(jobs))
	order := make([]int, len(jobs))
	for i := range jobs {
		places[i] = n.places(jobs, i)
		order[i] = i
	}
	sort.SliceStable(order, func(a, b int) bool { return len(places[order[a]]) < len(places[order[b]]) })
	for _, i := range order {
		ok := false
		for _, c := range places[i] {
			if n.free(c.box) { // again: numbers placed since may have taken it
				if err := d.label(jobs[i].text, c.at, c.h); err != nil {
					return err
				}
				d.pl.Labels[len(d.pl.Labels)-1].Feature = jobs[i].f.Number
				ok = true
				break
			}
		}
		if !ok {
			d.pl.Notes = append(d.pl.Notes, fmt.Sprintf("no room for the number of %s", jobs[i].f.Label))
		}
	}
	return nil
}

// numberJobs lists the numbers to place, with each feature's edges and places to try.
func (d *plateDesign) numberJobs() []numberJob {
	var jobs []numberJob
	for _, f := range d.plan.Features {
		if f.Number == 0 || f.TemplateBounds.IsEmpty() {
			continue
		}
		j := numberJob{f: f, text: fmt.Sprint(f.Number)}
		var edges [][]geom.Vec
		for _, r := range f.TemplateRegions {
			edges = append(edges, flatEdges(r)...)
		}
		j.anchors = alongEdges(edges, 0)
		for k, s := range f.Seats {
			edges = append(edges, flatEdges(geom.NewRegion(geom.Circle(s, d.seatRadius())))...)
			if k < maxLabelTries {
				j.anchors = append(j.anchors, numberAnchor{at: s, r: d.seatRadius()})
			}
		}
		if len(f.Path) > 1 {
			edges = append(edges, f.Path)
			j.anchors = append(j.anchors, alongEdges([][]geom.Vec{f.Path}, f.Width/2)...)
		}
		j.edges = geom.NewPolylineIndex(edges)
		jobs = append(jobs, j)
	}
	return jobs
}

// numberer searches for room for the numbers, with the islands' edges flattened once.
type numberer struct {
	d       *plateDesign
	islands []takenArea
}

// places returns job i's free places, best first.
func (n numberer) places(jobs []numberJob, i int) []numberPlace {
	d, j := n.d, jobs[i]
	reach := numberReach + d.stylus // off the island a number keeps a stylus diameter away
	var out []numberPlace
	for _, h := range []float64{labelHeight, smallLabel} {
		size := textBox(j.text, geom.Vec{}, h).Size()
		for _, a := range j.anchors {
			for ring := 0.0; ring*numberRing <= reach; ring++ {
				for turn := 0; turn < numberTurns; turn++ {
					dir := geom.V(1, 0).Rotate(2 * math.Pi * float64(turn) / numberTurns)
					far := a.r + 2*labelGap + ring*numberRing + math.Abs(dir.X)*size.X/2 + math.Abs(dir.Y)*size.Y/2
					at := a.at.Add(dir.Mul(far)).Sub(size.Mul(0.5))
					box := geom.Box{Min: at, Max: at.Add(size)}
					if !n.free(box) {
						continue
					}
					own := j.edges.BoxDistance(box, reach)
					if own > reach {
						continue
					}
					rival := math.Inf(1)
					for k := range jobs {
						if k != i {
							rival = min(rival, jobs[k].edges.BoxDistance(box, own+rivalSlack))
						}
					}
					score := own + rivalCost*math.Max(0, own+rivalSlack-rival) + 0.1*(2-dir.X-dir.Y)
					if h != labelHeight {
						score += smallCost
					}
					out = append(out, numberPlace{at: at, h: h, box: box, score: score})
				}
			}
		}
	}
	sort.SliceStable(out, func(a, b int) bool { return out[a].score < out[b].score })
	return out
}

// alongEdges returns places of radius r every numberStep along the chains, spaced wider on
// long outlines so there are about maxNumberAnchors.
func alongEdges(chains [][]geom.Vec, r float64) []numberAnchor {
	var out []numberAnchor
	for _, p := range geom.PointsAlong(chains, numberStep, maxNumberAnchors) {
		out = append(out, numberAnchor{at: p, r: r})
	}
	return out
}

// free reports whether box b can take a label: on the plate above the front strip, clear of
// everything placed, and in the wall style wholly on the island or clear of it by a stylus
// diameter, so the stylus running round the island never meets a letter.
func (n numberer) free(b geom.Box) bool {
	d := n.d
	g := b.Expand(labelGap)
	inner := d.box.Expand(-d.fix.inset)
	if !inner.ContainsPoint(g.Min) || !inner.ContainsPoint(g.Max) || g.Min.Y < d.box.Min.Y+stripHeight+d.fix.extra() {
		return false
	}
	for _, t := range d.taken {
		if t.box.Overlaps(g) && (t.region == nil || boxMeets(g, *t.region, t.edges)) {
			return false
		}
	}
	if d.o.Style != StyleWall {
		return true
	}
	for _, r := range n.islands {
		if r.box.Overlaps(g) && !boxCrossed(g, r.edges) && r.region.Contains(g.Center()) {
			return true // wholly on the island
		}
	}
	wide := g.Expand(d.stylus)
	for _, r := range n.islands {
		if r.box.Overlaps(wide) && boxMeets(wide, *r.region, r.edges) {
			return false
		}
	}
	return true
}

// takenArea is something on the plate that labels keep clear of: a box, or a region within it
// with its edges flattened for the search.
type takenArea struct {
	box    geom.Box
	region *geom.Region
	edges  [][]geom.Vec
}

// takeBox marks a box as taken.
func (d *plateDesign) takeBox(b geom.Box) { d.taken = append(d.taken, takenArea{box: b}) }

// takeRegion marks a region as taken.
func (d *plateDesign) takeRegion(r geom.Region) {
	d.taken = append(d.taken, takenArea{box: r.Bounds(), region: &r, edges: flatEdges(r)})
}

// flatEdges returns the contours of r as closed chains of points within numberChord of them.
func flatEdges(r geom.Region) [][]geom.Vec {
	var out [][]geom.Vec
	for _, c := range r.Contours() {
		if pts := c.Flatten(numberChord); len(pts) > 0 {
			out = append(out, append(pts, pts[0]))
		}
	}
	return out
}

// boxMeets reports whether box b and region r, whose edges are given, share any area: an
// edge enters the box, or one holds the other.
func boxMeets(b geom.Box, r geom.Region, edges [][]geom.Vec) bool {
	if boxCrossed(b, edges) || r.Contains(b.Center()) {
		return true
	}
	return len(edges) > 0 && len(edges[0]) > 0 && b.ContainsPoint(edges[0][0])
}

// boxCrossed reports whether any of the chains enters box b.
func boxCrossed(b geom.Box, chains [][]geom.Vec) bool {
	for _, c := range chains {
		for k := 1; k < len(c); k++ {
			if b.MeetsSegment(c[k-1], c[k]) {
				return true
			}
		}
	}
	return false
}
