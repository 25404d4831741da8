package pantograph

import (
	"fmt"
	"math"

	"panto/geom"
)

// This file cuts the channels the stylus runs in: in the groove style round every traced
// outline, and in both styles along every engraved groove. A channel is one wall height deep
// below the surface it is cut into: the plate's surface in the groove style; in the wall style
// the island's top, or the floor of the opening it lies in (see plate_levels.go).

const (
	// channelWeb is the least wall left between a channel and an edge or a seat beside it:
	// one printed line of a 0.4 mm nozzle, the thinnest wall a printer lays whole (common
	// practice, no source).
	channelWeb = 0.4
	// meetArea is the least area, in mm², two channels must share to count as meeting:
	// far under a printed line's square (0.16 mm²), far over the rounding of a boolean
	// (derived).
	meetArea = 1e-6
)

// channel is the channel of one feature: a band round a traced outline of the groove style,
// or the channel along a groove.
type channel struct {
	label   string
	band    bool
	regions []geom.Region
	box     geom.Box
}

// channelPiece is a piece of the joined channels on one surface: on is the opening whose floor
// it is cut into, or −1 for the island's top (wall style) or the plate's surface (groove).
type channelPiece struct {
	region geom.Region
	on     int
	label  string // the first feature whose channel it carries, for notes
}

// channels returns the channel of every traced outline (groove style) and of every groove.
func (d *plateDesign) channels() []channel {
	var out []channel
	add := func(f PlannedFeature, band bool, rs []geom.Region) {
		if len(rs) == 0 {
			return
		}
		b := geom.EmptyBox()
		for _, r := range rs {
			b = b.Union(r.Bounds())
		}
		out = append(out, channel{label: f.Label, band: band, regions: rs, box: b})
	}
	for _, f := range d.plan.Features {
		if d.o.Style == StyleGroove {
			for _, r := range f.TemplateRegions {
				add(f, true, channelBand(f, r))
			}
		}
		add(f, false, geom.Union(grooveCaps(f)...))
	}
	return out
}

// channelBand returns, for the groove style, a band of stylus width plus clearance along the
// path of the stylus's centre round region r of feature f.
func channelBand(f PlannedFeature, r geom.Region) []geom.Region {
	rs := f.Stylus / 2
	if f.Tip == TipPointed {
		rs = 0
	}
	half := (f.Stylus + grooveClearance) / 2
	centre := []geom.Region{r}
	if rs > 0 {
		dir := 1.0
		if f.Kind != KindProfile {
			dir = -1
		}
		centre = r.Offset(dir * rs).Regions
	}
	return geom.Difference(geom.OffsetRegions(centre, half), geom.OffsetRegions(centre, -half))
}

// grooveCaps returns the channel along an engraved groove's path: the groove's width plus
// clearance, round-ended.
func grooveCaps(f PlannedFeature) []geom.Region {
	half := (f.Width + grooveClearance) / 2
	var caps []geom.Region
	for k := 1; k < len(f.Path); k++ {
		caps = append(caps, geom.NewRegion(geom.Capsule(f.Path[k-1], f.Path[k], half)))
	}
	return caps
}

// channelPieces joins the channels where they meet and cuts them into pieces, each on one
// surface and at least channelWeb off every seat and every traced edge it does not belong to,
// so that no two areas of the plate cross.
func (d *plateDesign) channelPieces(chs []channel) []channelPiece {
	var all []geom.Region
	for _, c := range chs {
		all = append(all, c.regions...)
	}
	if len(all) == 0 {
		return nil
	}
	joined := geom.Union(all...)
	keep := d.seatKeep()
	var out []channelPiece
	put := func(rs []geom.Region, on int) {
		for _, r := range geom.Difference(rs, keep) {
			out = append(out, channelPiece{region: r, on: on, label: d.channelAt(chs, r)})
		}
	}
	if d.o.Style != StyleWall {
		put(joined, -1)
		return out
	}
	inner := geom.OffsetRegions(d.openings, channelWeb)
	put(geom.Difference(geom.Intersection(joined, geom.OffsetRegions(d.islands, -channelWeb)), inner), -1)
	for i, o := range d.openings {
		on := overlapping(joined, o.Bounds())
		if len(on) == 0 {
			continue
		}
		var nested []geom.Region
		for j, h := range d.openings {
			if j != i && math.Abs(h.Area()) < math.Abs(o.Area()) && o.Contains(h.Outer[0].A) {
				nested = append(nested, h)
			}
		}
		floor := geom.Intersection(on, o.Offset(-channelWeb).Regions)
		put(geom.Difference(floor, geom.OffsetRegions(nested, channelWeb)), i)
	}
	return out
}

// seatKeep returns the discs the channels keep out of: every seat with channelWeb round it.
func (d *plateDesign) seatKeep() []geom.Region {
	var keep []geom.Region
	for _, f := range d.plan.Features {
		for _, s := range f.Seats {
			keep = append(keep, geom.NewRegion(geom.Circle(s, d.seatDiameter(f.Drill*d.plan.Setup.Ratio)/2+channelWeb)))
		}
	}
	return keep
}

// overlapping returns the regions of rs whose boxes overlap b.
func overlapping(rs []geom.Region, b geom.Box) []geom.Region {
	var out []geom.Region
	for _, r := range rs {
		if r.Bounds().Overlaps(b) {
			out = append(out, r)
		}
	}
	return out
}

// channelAt names the first channel that shares area with r.
func (d *plateDesign) channelAt(chs []channel, r geom.Region) string {
	for _, c := range chs {
		if c.box.Overlaps(r.Bounds()) && areaOf(geom.Intersection(c.regions, []geom.Region{r})) > meetArea {
			return c.label
		}
	}
	return "a groove"
}

// sinkChannels puts the pieces on the plate, each one wall height below its surface, and says
// where a channel could not be cut whole or runs into another.
func (d *plateDesign) sinkChannels(chs []channel, pieces []channelPiece) {
	var kept []geom.Region
	for _, p := range pieces {
		top := d.islandTop
		switch {
		case p.on >= 0:
			top = d.floor(p.on)
		case d.o.Style != StyleWall:
			top = d.pl.Base
		}
		d.add(PlateArea{What: "channel", Region: p.region, Top: top - d.pl.WallHeight})
		d.takeRegion(p.region)
		d.cuts = append(d.cuts, p.region)
		kept = append(kept, p.region)
	}
	d.noteCutBack(chs, kept)
	d.noteMeets(chs)
}

// noteCutBack says which channels lost part of their width or length where they come too near
// an edge or a seat, and where (template frame: as the plan gives places).
func (d *plateDesign) noteCutBack(chs []channel, kept []geom.Region) {
	for _, c := range chs {
		var at geom.Vec
		most := meetArea
		for _, r := range geom.Difference(c.regions, overlapping(kept, c.box)) {
			if a := r.Area(); a > most {
				at, most = r.Bounds().Center(), a
			}
		}
		if most > meetArea {
			d.pl.Notes = append(d.pl.Notes, fmt.Sprintf("the channel of %s is cut back near %s on the template, where it comes within %s mm of an edge or a seat: the stylus cannot follow it all the way there", c.label, pt(at.X, at.Y), num(channelWeb)))
		}
	}
}

// noteMeets says where the channel round a traced outline meets another channel: there the
// stylus has a wall on one side only. Grooves that cross are meant to join and are not noted.
func (d *plateDesign) noteMeets(chs []channel) {
	for i, a := range chs {
		for _, b := range chs[i+1:] {
			if !a.band && !b.band || a.label == b.label || !a.box.Overlaps(b.box) {
				continue
			}
			if areaOf(geom.Intersection(a.regions, b.regions)) > meetArea {
				d.pl.Notes = append(d.pl.Notes, fmt.Sprintf("the channels of %s and %s meet: there the stylus is guided on one side only", a.label, b.label))
			}
		}
	}
}
