package pantograph

import (
	"fmt"
	"math"
	"slices"

	"panto/geom"
)

// This file sinks the seats for drilled holes and the datum, and marks the datum seat.
//
// The datum seat is where the stylus sits while the dials are zeroed: the seat of the hole at
// the datum, or a seat of its own when no hole is there. A sunk ring round it marks it at a
// glance. The ring is only a mark, so it gives way to everything that guides the stylus: where
// it would run into an edge, a channel or another seat, an arrow sunk beside the seat points at
// it instead, on the first side round the seat where the arrow has room; where neither fits,
// the seat is left unmarked. A note says which.

const (
	// datumWeb is the plate left between the datum seat and its mark; the ring is
	// datumRing − datumWeb (1.5 mm) wide.
	datumWeb = 1.0
	// datumArrow and datumArrowWidth are the length and base of the arrow that marks the
	// datum seat when no ring fits, the size of a feature's number so it reads as well;
	// datumArrowSides is how many places round the seat are tried, every 22.5°, starting in
	// front of it (toward the machinist).
	datumArrow      = labelHeight
	datumArrowWidth = 3.0
	datumArrowSides = 16
)

// seats sinks a seat at every drilled hole and, when no hole is at the datum, a seat of its own
// there if there is room, then marks the datum seat.
func (d *plateDesign) seats() {
	datum := -1
	for _, f := range d.plan.Features {
		for _, s := range f.Seats {
			i := d.seat(s, f.Number, f.Drill*d.plan.Setup.Ratio)
			if datum < 0 && (s.Near(geom.Vec{}) || s.Dist(geom.Vec{}) < 1e-6) {
				datum = i
			}
		}
	}
	if datum < 0 {
		datum = d.datumSeat()
	}
	if datum >= 0 {
		d.pl.Seats[datum].Datum = true
		d.datumMark(datum)
	}
}

// datumSeat sinks a seat of its own at the datum and returns its index, or −1, with a note,
// when the datum lies too near a traced edge or another seat for one.
func (d *plateDesign) datumSeat() int {
	const note = "the datum lies %s mm from %s, too near for a seat: the plate has no datum seat; zero the dials on the datum as the part file places it"
	r := math.Max(coneRimMax, d.stylus+boreClearance+d.growth)/2 + datumRing + labelGap
	if edge := d.edgeDistance(geom.Vec{}); edge < r {
		d.pl.Notes = append(d.pl.Notes, fmt.Sprintf(note, num(edge), "a traced edge"))
		return -1
	}
	own := d.seatDiameter(coneRimMax) / 2
	for _, s := range d.pl.Seats {
		if dist := s.At.Len(); dist < own+s.Diameter/2+labelGap {
			d.pl.Notes = append(d.pl.Notes, fmt.Sprintf(note, num(dist), "the seat of "+d.featureLabel(s.Feature)))
			return -1
		}
	}
	return d.seat(geom.Vec{}, 0, coneRimMax)
}

// edgeDistance returns the distance from p to the nearest traced edge.
func (d *plateDesign) edgeDistance(p geom.Vec) float64 {
	best := math.Inf(1)
	for _, r := range slices.Concat(d.islands, d.openings, d.cuts) {
		for _, c := range r.Contours() {
			for _, s := range c {
				best = math.Min(best, s.DistanceTo(p))
			}
		}
	}
	return best
}

// seatDiameter returns the diameter of a seat whose hole takes footprint on the template: a
// cone's rim is the footprint within coneRimMin..coneRimMax, a bore fits the stylus.
func (d *plateDesign) seatDiameter(footprint float64) float64 {
	if d.o.Seat == SeatCone {
		return math.Max(coneRimMin, math.Min(coneRimMax, footprint))
	}
	return d.stylus + boreClearance + d.growth
}

// seat sinks one seat at s, below the surface it lies on, and returns its index in the
// plate's seats; footprint is the hole's size on the template, which a cone's rim keeps
// within.
func (d *plateDesign) seat(s geom.Vec, number int, footprint float64) int {
	top := d.surfaceAt(s)
	ps := PlateSeat{At: s, Kind: d.o.Seat, Feature: number, Diameter: d.seatDiameter(footprint)}
	a := PlateArea{What: "seat", Feature: number, Region: geom.NewRegion(geom.Circle(s, ps.Diameter/2))}
	if ps.Kind == SeatCone {
		ps.Depth = ps.Diameter / 2 // a 90° cone is half as deep as its rim is wide
		a.Cone = true
	} else {
		ps.Depth = math.Min(d.pl.WallHeight, top-1)
	}
	a.Top = top - ps.Depth
	d.add(a)
	d.pl.Seats = append(d.pl.Seats, ps)
	d.takeBox(geom.Box{Min: s, Max: s}.Expand(ps.Diameter/2 + labelGap))
	return len(d.pl.Seats) - 1
}

// featureLabel names feature number n as messages do.
func (d *plateDesign) featureLabel(n int) string {
	for _, f := range d.plan.Features {
		if f.Number == n && f.Label != "" {
			return f.Label
		}
	}
	return fmt.Sprint("feature ", n)
}

// datumMark marks seat i, the datum seat, with a ring round it where the ring has room, else
// with an arrow beside it, else not at all; a note says when it is not the ring.
func (d *plateDesign) datumMark(i int) {
	ps := d.pl.Seats[i]
	r := ps.Diameter / 2
	ring := geom.NewRegion(geom.Circle(ps.At, r+datumRing), geom.Circle(ps.At, r+datumWeb))
	hit := d.markHits(ring, i)
	mark := ring
	if hit != "" {
		ok := false
		for k := range datumArrowSides {
			arrow := datumArrowAt(ps.At, r, -math.Pi/2+float64(k)*2*math.Pi/datumArrowSides)
			if d.markHits(arrow, i) == "" {
				mark, ok = arrow, true
				break
			}
		}
		if !ok {
			d.pl.Notes = append(d.pl.Notes, fmt.Sprintf("the datum seat%s is not marked: a ring round it or an arrow beside it would run into %s", d.datumWords(ps), hit))
			return
		}
		d.pl.Notes = append(d.pl.Notes, fmt.Sprintf("the datum seat%s is marked by an arrow beside it, pointing at it: a ring round it would run into %s", d.datumWords(ps), hit))
	}
	d.add(PlateArea{What: "datum mark", Region: mark, Top: d.surfaceAt(ps.At) - labelDepth})
	d.takeBox(mark.Bounds().Expand(labelGap))
}

// datumWords names the hole whose seat is the datum seat, for notes: "" for a seat of its own.
func (d *plateDesign) datumWords(ps PlateSeat) string {
	if ps.Feature == 0 {
		return ""
	}
	return " (the seat of " + d.featureLabel(ps.Feature) + ")"
}

// datumArrowAt returns the arrow that marks a seat of radius r at c from the side at angle a:
// its point datumWeb off the seat, pointing at the centre, datumArrow long and datumArrowWidth
// wide at its base.
func datumArrowAt(c geom.Vec, r, a float64) geom.Region {
	u := geom.Polar(geom.Vec{}, 1, a)
	tip := c.Add(u.Mul(r + datumWeb))
	base := c.Add(u.Mul(r + datumWeb + datumArrow))
	side := u.Perp().Mul(datumArrowWidth / 2)
	return geom.NewRegion(geom.Polygon(tip, base.Sub(side), base.Add(side)))
}

// markHits returns what mark m, grown by labelGap, would run into, or "" when nothing: an
// edge of the profile or an opening (the mark must lie wholly on one side of each), a channel
// or a seat other than seat own (the mark must keep out of them).
func (d *plateDesign) markHits(m geom.Region, own int) string {
	g := m.Offset(labelGap).Regions
	gb := m.Bounds().Expand(labelGap)
	ga := areaOf(g)
	split := func(x geom.Region) bool {
		if !x.Bounds().Overlaps(gb) {
			return false
		}
		a := areaOf(geom.Intersection(g, []geom.Region{x}))
		return a > meetArea && a < ga-meetArea
	}
	meet := func(x geom.Region) bool {
		return x.Bounds().Overlaps(gb) && areaOf(geom.Intersection(g, []geom.Region{x})) > meetArea
	}
	for _, r := range d.islands {
		if split(r) {
			return "the profile's edge"
		}
	}
	for k, r := range d.openings {
		if split(r) {
			return "the edge of " + d.openingLabel[k]
		}
	}
	for _, r := range d.cuts {
		if meet(r) {
			return "a channel"
		}
	}
	for k, s := range d.pl.Seats {
		if k != own && meet(geom.NewRegion(geom.Circle(s.At, s.Diameter/2))) {
			return "the seat of " + d.featureLabel(s.Feature)
		}
	}
	return ""
}
