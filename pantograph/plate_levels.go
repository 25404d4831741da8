package pantograph

import (
	"fmt"
	"math"

	"panto/geom"
)

// This file sets the heights of the wall style's island and floors, by the rule of nested
// areas.
//
// The stylus follows an edge by bearing on it, so every traced edge must stand one wall height
// W (one stylus diameter, never under 3 mm: minWallHeight) above the floor the stylus stands on
// beside it. A plain opening or recess of the template (a cut-out, pocket, slot or milled
// hole) is sunk W into the island. An area that lies inside another sunk area (a milled hole,
// cut-out, slot or pocket within a pocket, or within any other opening) is sunk W further,
// below the floor it lies in: on that floor its edge would be no edge at all, and the stylus
// would find nothing there. Nothing of the template is opened through the plate, so every
// floor stays a floor, and the plate keeps its full base (plateBase) under the deepest one:
// with areas nested K deep, the island stands (1 + K)·W above the base, a plain opening's
// floor lies W below the island's top, and an area inside k others (k + 1)·W below it. Plates
// without nested areas are unchanged. A seat, a label or the datum mark is sunk from the
// floor it lies on, so a seat in a pocket is sunk below the pocket's floor.
//
// A groove's channel is an area like the others: on the island it is sunk W below the top, and
// inside an opening W below that opening's floor, and it counts as one level deeper than the
// opening when the island's height is set.
//
// The groove style sinks nothing but channels: each traced outline has its own channel, W deep
// below the plate's surface, whether or not it lies inside another outline, so nested areas
// need no rule there; a seat inside a pocket stands on the surface the pocket's channel goes
// round. Where the channels of two outlines would meet, the plate says so.

// nest works out, in the wall style, how many other openings hold each opening.
func (d *plateDesign) nest() {
	d.depth = make([]int, len(d.openings))
	if d.o.Style != StyleWall {
		return
	}
	areas := make([]float64, len(d.openings))
	boxes := make([]geom.Box, len(d.openings))
	for i, o := range d.openings {
		areas[i], boxes[i] = math.Abs(o.Area()), o.Bounds()
	}
	for i, o := range d.openings {
		for j, h := range d.openings {
			if areas[j] > areas[i] && boxHolds(boxes[j], boxes[i]) && h.Contains(o.Outer[0].A) {
				d.depth[i]++
			}
		}
	}
}

// raise lifts the wall style's island by a wall height for each level of nesting, counting a
// channel on an opening's floor as one level below that floor, and says why.
func (d *plateDesign) raise(pieces []channelPiece) {
	k, what, in := 0, "", ""
	for i, n := range d.depth {
		if n > k {
			k, what, in = n, d.openingLabel[i], d.holderLabel(i)
		}
	}
	for _, p := range pieces {
		if p.on >= 0 && d.depth[p.on]+1 > k {
			k, what, in = d.depth[p.on]+1, "the channel of "+p.label, d.openingLabel[p.on]
		}
	}
	if k == 0 {
		return
	}
	d.islandTop = d.pl.Base + float64(1+k)*d.pl.WallHeight
	d.pl.Notes = append(d.pl.Notes, fmt.Sprintf("%s lies inside %s, so it is sunk %s mm below the floor it lies in, and the profile stands %s mm high rather than %s, to keep the base under the deepest floor",
		what, in, num(d.pl.WallHeight), num(d.islandTop-d.pl.Base), num(d.pl.WallHeight)))
}

// holderLabel names the smallest opening that holds opening i.
func (d *plateDesign) holderLabel(i int) string {
	o := d.openings[i]
	best, label := math.Inf(1), ""
	for j, h := range d.openings {
		a := math.Abs(h.Area())
		if j != i && a > math.Abs(o.Area()) && a < best && h.Contains(o.Outer[0].A) {
			best, label = a, d.openingLabel[j]
		}
	}
	return label
}

// floor returns the height of the floor of opening i: one wall height below the floor it lies
// in.
func (d *plateDesign) floor(i int) float64 {
	return d.islandTop - float64(1+d.depth[i])*d.pl.WallHeight
}

// surfaceAt returns the height of the surface the stylus meets at p: in the wall style the
// floor of the deepest opening holding p, else the island's top on the profile, else the base.
func (d *plateDesign) surfaceAt(p geom.Vec) float64 {
	if d.o.Style != StyleWall {
		return d.pl.Base
	}
	n := 0
	for _, o := range d.openings {
		if o.Bounds().ContainsPoint(p) && o.Contains(p) {
			n++
		}
	}
	if n > 0 {
		return d.islandTop - float64(n)*d.pl.WallHeight
	}
	for _, r := range d.islands {
		if r.Contains(p) {
			return d.islandTop
		}
	}
	return d.pl.Base
}
