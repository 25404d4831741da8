package drawing

import (
	"math"
	"sort"

	"github.com/tdewolff/canvas"

	"panto/geom"
)

// This file places labels (feature numbers, the datum's word) on a sketch by a search: each
// label has candidate places all round its feature, each candidate is refused if its text
// would touch a line, arrowhead or text already drawn or leave the drawing's room, and the
// rest are scored by how near they are to their own feature and how far from every other.
// The labels with fewest places to go are placed first; one that finds every place taken by
// labels already placed may move one of them to another of its places. A label with no place
// within labelReach is looked for again out to wideReach, on a drawing too crowded for it.

// Placement rules, mm on paper (common practice, no source): the clearance keeps a number
// legible beside a line; the reach is the farthest a number may stand from its feature and
// still be read as its own; the rings and directions are how finely places are tried.
const (
	labelClear   = 0.6
	labelReach   = 7.0
	wideReach    = 3 * labelReach
	ringStep     = 0.9
	directions   = 16
	anchorStep   = 2.5 // along an outline, between points a number is tried beside
	maxAnchors   = 120 // along one outline: enough for any part, few enough to stay quick
	ownWeight    = 1.0 // score per mm from the own feature
	rivalWeight  = 3.0 // score per mm a rival feature is nearer than the own one plus rivalSlack
	rivalSlack   = 1.5
	turnWeight   = 0.15 // small preference for places right of and above the feature
	maxLabelHole = 8    // holes of one feature tried as places: enough round a crowded first hole
)

// anchor is a place a label may stand beside: a point, or a circle of radius r about it.
type anchor struct {
	at geom.Vec
	r  float64
}

// labelJob is one label to place: its text and face, the feature it names (drawn lines, for
// distances) and where round it to try.
type labelJob struct {
	text    string
	size    float64
	bold    bool
	own     [][]geom.Vec // the feature's drawn lines, each a chain of points
	anchors []anchor
	chains  geom.PolylineIndex // own, indexed
}

// candidate is one place for a label: its ink box and score (lower is better).
type candidate struct {
	box   geom.Box
	score float64
}

// placer finds room for labels inside area on sketch k.
type placer struct {
	k      *sketch
	area   geom.Box
	jobs   []labelJob
	placed []geom.Box // the box of each job once placed; empty while not
}

// placeLabels places every job on k inside area and draws them; it returns each label's box,
// empty for one that found no place even out to wideReach.
func placeLabels(k *sketch, area geom.Box, jobs []labelJob) []geom.Box {
	p := placer{k: k, area: area, jobs: jobs, placed: make([]geom.Box, len(jobs))}
	for i := range p.placed {
		p.placed[i] = geom.EmptyBox()
	}
	cands := make([][]candidate, len(jobs))
	order := make([]int, len(jobs))
	for i := range jobs {
		jobs[i].chains = geom.NewPolylineIndex(jobs[i].own)
	}
	for i, j := range jobs {
		cands[i] = p.candidates(i, j, labelReach)
		order[i] = i
	}
	sort.SliceStable(order, func(a, b int) bool { return len(cands[order[a]]) < len(cands[order[b]]) })
	for _, i := range order {
		if !p.take(i, cands[i]) {
			p.moveAside(i, cands)
		}
	}
	for i, j := range jobs {
		if p.placed[i].IsEmpty() {
			p.take(i, p.candidates(i, j, wideReach))
		}
	}
	for i, j := range jobs {
		b := p.placed[i]
		if b.IsEmpty() {
			continue
		}
		ink := k.fonts.ink(j.text, j.size, j.bold, canvas.Left)
		k.text(b.Min.Sub(ink.Min), j.size, j.bold, j.text, canvas.Left)
	}
	return p.placed
}

// take places job i at its best candidate clear of the labels already placed.
func (p *placer) take(i int, cs []candidate) bool {
	for _, c := range cs {
		if p.clearOfPlaced(c.box, -1) {
			p.placed[i] = c.box
			return true
		}
	}
	return false
}

// moveAside places job i by moving one placed label that blocks its candidate to another of
// that label's candidates, trying i's candidates best first.
func (p *placer) moveAside(i int, cands [][]candidate) {
	for _, c := range cands[i] {
		blocker := -1
		for j, b := range p.placed {
			if !b.IsEmpty() && b.Expand(labelClear).Overlaps(c.box) {
				if blocker >= 0 {
					blocker = -2
					break
				}
				blocker = j
			}
		}
		if blocker < 0 {
			continue
		}
		old := p.placed[blocker]
		p.placed[blocker] = geom.EmptyBox()
		p.placed[i] = c.box
		for _, alt := range cands[blocker] {
			if p.clearOfPlaced(alt.box, blocker) {
				p.placed[blocker] = alt.box
				return
			}
		}
		p.placed[blocker], p.placed[i] = old, geom.EmptyBox()
	}
}

// clearOfPlaced reports whether box b keeps clear of every placed label but skip's.
func (p *placer) clearOfPlaced(b geom.Box, skip int) bool {
	for j, q := range p.placed {
		if j != skip && !q.IsEmpty() && q.Expand(labelClear).Overlaps(b) {
			return false
		}
	}
	return true
}

// candidates returns job i's places clear of everything drawn within reach, best first.
func (p *placer) candidates(i int, j labelJob, reach float64) []candidate {
	ink := p.k.fonts.ink(j.text, j.size, j.bold, canvas.Left)
	size := ink.Size()
	var out []candidate
	for _, a := range j.anchors {
		for ring := 0.0; ring*ringStep <= reach; ring++ {
			for n := 0; n < directions; n++ {
				d := geom.V(1, 0).Rotate(2 * math.Pi * float64(n) / directions)
				far := a.r + labelClear + ring*ringStep + math.Abs(d.X)*size.X/2 + math.Abs(d.Y)*size.Y/2
				c := a.at.Add(d.Mul(far))
				box := geom.Box{Min: c.Sub(size.Mul(0.5)), Max: c.Add(size.Mul(0.5))}
				if !p.free(box) {
					continue
				}
				own := j.chains.BoxDistance(box, reach)
				if own > reach {
					continue
				}
				rival := p.rivalDist(i, box, own+rivalSlack)
				score := ownWeight*own + rivalWeight*math.Max(0, own+rivalSlack-rival) + turnWeight*(2-d.X-d.Y)
				out = append(out, candidate{box: box, score: score})
			}
		}
	}
	sort.SliceStable(out, func(a, b int) bool { return out[a].score < out[b].score })
	return out
}

// rivalDist returns the distance from box b to the nearest feature other than job i's, or
// something beyond limit when none is within it.
func (p *placer) rivalDist(i int, b geom.Box, limit float64) float64 {
	best := math.Inf(1)
	for k, j := range p.jobs {
		if k != i {
			best = math.Min(best, j.chains.BoxDistance(b, limit))
		}
	}
	return best
}

// free reports whether box b lies in the placer's area, clear of every line, arrowhead and
// text of the sketch.
func (p *placer) free(b geom.Box) bool {
	if b.Min.X < p.area.Min.X || b.Min.Y < p.area.Min.Y || b.Max.X > p.area.Max.X || b.Max.Y > p.area.Max.Y {
		return false
	}
	return clearOf(p.k, b, labelClear)
}

// clearOf reports whether box b, grown by gap, touches nothing drawn on k.
func clearOf(k *sketch, b geom.Box, gap float64) bool {
	g := b.Expand(gap)
	for _, t := range k.texts {
		if t.box.Overlaps(g) {
			return false
		}
	}
	for _, f := range k.fills {
		if f.box.Overlaps(g) {
			return false
		}
	}
	for _, s := range k.strokes {
		if s.box.Overlaps(g) && polyMeetsBox(s.pts, s.closed, b.Expand(gap+s.width/2)) {
			return false
		}
	}
	return true
}

// circleChain returns a circle of radius r about c as a closed chain of points.
func circleChain(c geom.Vec, r float64) []geom.Vec {
	return closedChain(geom.Circle(c, r), geom.Identity())
}

// closedChain returns contour c mapped by t as a chain of points ending where it starts.
func closedChain(c geom.Contour, t geom.Transform) []geom.Vec {
	pts := c.Transform(t).Flatten(flattenTol)
	if len(pts) == 0 {
		return nil
	}
	return append(pts, pts[0])
}

// mapPoints returns pts mapped by t.
func mapPoints(pts []geom.Vec, t geom.Transform) []geom.Vec {
	out := make([]geom.Vec, len(pts))
	for i, p := range pts {
		out[i] = t.Apply(p)
	}
	return out
}

// alongChains returns anchors of radius r every anchorStep along the chains, spaced wider on
// long outlines so there are about maxAnchors.
func alongChains(chains [][]geom.Vec, r float64) []anchor {
	var out []anchor
	for _, p := range geom.PointsAlong(chains, anchorStep, maxAnchors) {
		out = append(out, anchor{at: p, r: r})
	}
	return out
}
