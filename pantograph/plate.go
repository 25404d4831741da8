package pantograph

import (
	"errors"
	"fmt"
	"math"
	"sort"
	"strings"

	"panto/geom"
)

// This file designs the template plate: the printed solid that is bolted to the copy table and
// traced. It is a plain description (areas of the plate at their heights, seats, labels), made
// from a Plan; geom turns it into a mesh and export writes the file.
//
// The plate is a flat base. In the wall style the template's profile stands on it as a raised
// island, whose edge the stylus follows from outside, and the openings and recesses are sunk
// into the island, so the stylus follows their edges from inside; one that lies inside another
// is sunk below the other's floor (the rule of nested areas, plate_levels.go). In the groove
// style the base is thicker and the stylus runs in channels cut along the path its centre
// takes (plate_channels.go). Seats for drilled holes are conical pits for a pointed stylus or
// bores for a round one (plate_seats.go). A strip along the front carries the title, a check
// bar and a test square.

// SeatKind is the shape of a seat for a drilled hole.
type SeatKind string

// The seat shapes.
const (
	SeatCone SeatKind = "cone" // a conical pit a pointed stylus centres in without clearance
	SeatBore SeatKind = "bore" // a round hole a cylindrical stylus drops into, with clearance
)

// PlateStyle is how the plate guides the stylus along traced edges.
type PlateStyle string

// The plate styles.
const (
	StyleWall   PlateStyle = "wall"   // raised profile, sunk openings: the stylus bears on walls
	StyleGroove PlateStyle = "groove" // channels along the stylus centre path: the stylus is captured
)

// PlateOptions are the choices the machinist makes about the plate.
type PlateOptions struct {
	Seat  SeatKind   // "" means cone for a pointed stylus, bore for a round one
	Style PlateStyle // "" means StyleGroove for a pointed stylus, StyleWall for a round one
	// FixingSpacing is the distance in mm between the centres of the fixing slots along X, to
	// suit the copy table's clamps or T-slots. 0 takes the machine file's fixing_spacing, or,
	// when it states none, puts a slot near each corner. It wins over the machine file.
	FixingSpacing float64
}

// Plate dimensions and rules. Each is common practice for printed fixtures (no source) unless
// its comment says otherwise.
const (
	// plateBase is the thickness of the base: 5 mm of PLA stays flat when bolted down and
	// holds a conical seat below the island.
	plateBase = 5.0
	// minWallHeight is the least height of a traced edge. The rule: an edge at least one stylus
	// diameter high (and never under 3 mm), so that a round-nosed stylus bears on it with its
	// straight side and cannot ride up over the edge.
	minWallHeight = 3.0
	// plateMargin is the least border between the template and the plate's edge, in addition
	// to one stylus diameter, so the stylus running round the profile stays on the plate.
	plateMargin = 12.0
	// plateCorner rounds the plate's corners.
	plateCorner = 4.0
	// fixingHole is the clearance hole for an M6 clamp bolt, the medium series of ISO 273
	// (from memory), for when the machine file gives no bolt size; fixingInset is the distance
	// of a slot's centreline from the plate edge (for M6); fixingTravel is how far a slot lets
	// the plate slide to meet the clamp.
	fixingHole   = 6.6
	fixingInset  = 8.0
	fixingTravel = 8.0
	// boreClearance is added to the stylus diameter for a bore seat: a close sliding fit in a
	// print once the printer's hole growth is added. It divides by R at the part.
	boreClearance = 0.1
	// grooveClearance is added to the stylus diameter for a channel of the groove style.
	grooveClearance = 0.2
	// A conical seat has a 90° included angle (the countersink shape), so its depth is half its
	// rim: a pointed stylus of 60° to 90° touches the cone's wall and centres. The rim is R
	// times the hole (the room the hole has on the template), kept between these sizes.
	coneRimMin, coneRimMax = 2.0, 8.0
	// labelHeight and smallLabel are cap heights of the feature numbers; titleHeight of the
	// title; labelDepth how deep the letters are sunk; markHeight how far the check bar and
	// test square stand up.
	labelHeight = 5.0
	smallLabel  = 3.0
	titleHeight = 5.0
	labelDepth  = 0.6
	markHeight  = 1.0
	// checkBar is the length of the check bar when the plate is wide enough; testSquare the
	// side of the test square; stripHeight the depth of the front strip that carries them.
	checkBar    = 100.0
	testSquare  = 20.0
	barWidth    = 5.0
	stripHeight = 36.0
	// labelGap is the clearance kept around every label and mark.
	labelGap = 1.0
	// datumRing is how far the ring marking the datum seat reaches beyond the seat; the ring
	// is 1.5 mm wide, sunk labelDepth.
	datumRing = 2.5
	// partChordError is the chord error allowed at the part, in mm: half a micrometre, well
	// under what a dial shows. The template's tolerance is R times it (5 µm at 10:1, a
	// hundredth of a printed line), but never over maxPlateChord, a tenth of a typical
	// nozzle's line width; finer would only add triangles no printer can show.
	partChordError = 0.0005
	maxPlateChord  = 0.01
)

// Plate is the template plate, ready to be built into a solid. Every length is in mm, in the
// plate frame: the template frame moved so that the plate's lower left corner is at the origin
// (all coordinates positive), before the printer's scale correction.
type Plate struct {
	Title string
	Size  geom.Vec // footprint of the plate, before the printer's scale correction
	// Base is the height of the base's top face; Height the highest point of the plate.
	Base, Height float64
	// WallHeight is how high the traced edges stand (or how deep the channels are cut).
	WallHeight float64
	Style      PlateStyle
	Seat       SeatKind
	// Shift moves the template frame to the plate frame: plate = template + Shift.
	Shift geom.Vec
	// ScaleX and ScaleY are the printer's corrections, applied by Mesh.
	ScaleX, ScaleY float64
	// ChordTolerance is the flattening tolerance for the mesh, in plate mm.
	ChordTolerance float64

	Areas  []PlateArea
	Seats  []PlateSeat
	Labels []PlateLabel
	// CheckBar is the length of the check bar and TestSquare the side of the test square.
	CheckBar, TestSquare float64
	// Notes are what could not be put on the plate and why, and where its fixing slots go.
	Notes []string
	// BedWarning says the plate as printed is larger than the machine file's printer bed,
	// giving both sizes; "" when it fits or no bed is stated.
	BedWarning string
}

// PlateArea is one area of the plate at its own height. An area's holes are islands left at
// the height around the area.
type PlateArea struct {
	What    string // "base", "fixing slot", "profile", "opening", "channel", "seat", ...
	Feature int    // the feature's number, 0 for the plate's own marks
	Region  geom.Region
	Top     float64 // height of the area's surface; for a cone, of its point
	Open    bool    // an opening right through the plate
	Cone    bool    // a conical pit from the surrounding height down to Top
}

// PlateSeat is where the stylus drops in for a drilled hole, or at the datum.
type PlateSeat struct {
	At       geom.Vec // plate frame
	Kind     SeatKind
	Diameter float64 // rim of a cone, bore of a bore (with clearance and hole growth)
	Depth    float64
	Feature  int
	Datum    bool
}

// PlateLabel is lettering sunk into the plate.
type PlateLabel struct {
	Text    string
	At      geom.Vec // lower left corner, plate frame
	Height  float64
	Feature int // the number of the feature it names, 0 for the title and the check bar's
}

// ErrPlate is wrapped by BuildPlate and Plate.Terrace when the plate cannot be made.
var ErrPlate = errors.New("template plate")

// ErrPointedWall is returned by PlateOptions.Check for a raised-wall plate traced with a
// pointed stylus: a point cannot bear on a wall, it rides up over it.
var ErrPointedWall = errors.New("a pointed stylus cannot bear on a raised wall, it rides up over it: " +
	"use the groove style (--style groove), whose channels hold the point")

// Check reports whether the options suit plan p: a pointed stylus that traces edges needs the
// groove style.
func (o PlateOptions) Check(p Plan) error {
	if o.Style != StyleWall {
		return nil
	}
	for _, f := range p.Features {
		if f.Tip == TipPointed && f.Method == Traced {
			return ErrPointedWall
		}
	}
	return nil
}

// BuildPlate designs the template plate for plan p on machine m (nil when there is no machine
// file: no printer corrections).
func BuildPlate(p Plan, m *Machine, o PlateOptions) (Plate, error) {
	if err := o.Check(p); err != nil {
		return Plate{}, err
	}
	d := newPlateDesign(p, m, o)
	if err := d.layout(); err != nil {
		return Plate{}, err
	}
	d.template()
	d.seats()
	if err := d.strip(); err != nil {
		return Plate{}, err
	}
	if err := d.numbers(); err != nil {
		return Plate{}, err
	}
	pl := d.finish()
	pl.BedWarning = bedWarning(pl, m)
	return pl, nil
}

// plateDesign is the working state of BuildPlate, in the template frame until finish.
type plateDesign struct {
	plan              Plan
	o                 PlateOptions
	pl                Plate
	fix               plateFixing
	stylus            float64 // the largest stylus diameter of the plan
	growth            float64 // printer hole growth
	box               geom.Box
	surface           float64 // height of the surface the template is traced on
	islandTop         float64
	islands, openings []geom.Region
	openingLabel      []string      // the feature each opening belongs to
	depth             []int         // wall style: how many other openings hold each opening
	cuts              []geom.Region // channels and grooves as sunk
	taken             []takenArea   // everything placed, for finding room for labels
}

// newPlateDesign works out the heights and options that do not depend on the layout.
func newPlateDesign(p Plan, m *Machine, o PlateOptions) *plateDesign {
	d := &plateDesign{plan: p, o: o}
	tip := p.Setup.Tip
	for _, f := range p.Features {
		d.stylus = math.Max(d.stylus, f.Stylus)
		if f.Tip != "" {
			tip = f.Tip
		}
	}
	if o.Style == "" {
		d.o.Style = StyleWall
		if tip == TipPointed {
			d.o.Style = StyleGroove
		}
	}
	if o.Seat == "" {
		d.o.Seat = SeatBore
		if tip == TipPointed {
			d.o.Seat = SeatCone
		}
	}
	d.pl = Plate{Style: d.o.Style, Seat: d.o.Seat, ScaleX: 1, ScaleY: 1}
	if m != nil {
		d.growth = m.Printer.HoleGrowth
		if m.Printer.ScaleX > 0 {
			d.pl.ScaleX = m.Printer.ScaleX
		}
		if m.Printer.ScaleY > 0 {
			d.pl.ScaleY = m.Printer.ScaleY
		}
	}
	d.pl.WallHeight = math.Max(minWallHeight, d.stylus)
	d.pl.ChordTolerance = math.Min(maxPlateChord, p.Setup.Ratio*partChordError)
	d.pl.Base = plateBase
	d.surface, d.islandTop = plateBase, plateBase+d.pl.WallHeight
	if d.o.Style == StyleGroove {
		d.pl.Base = plateBase + d.pl.WallHeight
		d.surface, d.islandTop = d.pl.Base, d.pl.Base
	}
	d.pl.Title = fmt.Sprintf("%s %g:1 STYLUS %s CUTTER %s", p.Part, p.Setup.Ratio,
		strings.ToUpper(p.Units.Length(d.stylus)), strings.ToUpper(p.Units.Length(p.Setup.Cutter)))
	d.newFixing(m)
	return d
}

// layout sizes the plate round the template and puts the base and fixing slots in.
func (d *plateDesign) layout() error {
	if d.plan.Bounds.IsEmpty() {
		return fmt.Errorf("%w: the plan puts nothing on the template", ErrPlate)
	}
	margin := plateMargin + d.stylus
	b := d.plan.Bounds.Expand(margin)
	b.Min.Y -= stripHeight + d.fix.extra()
	b.Max.Y += d.fix.extra()
	f := d.fix
	need := checkBar + testSquare + 6*labelGap + 2*(f.inset+fixingTravel+f.hole)
	if w := b.Size().X; w < need {
		b.Min.X -= (need - w) / 2
		b.Max.X += (need - w) / 2
	}
	if s := f.spacing; s > 0 && b.Size().X < s+2*(f.inset+f.hole) {
		grow := (s + 2*(f.inset+f.hole) - b.Size().X) / 2
		b.Min.X, b.Max.X = b.Min.X-grow, b.Max.X+grow
	}
	b = d.rows(b)
	d.box = b
	outline, err := geom.Rect(b.Min, b.Size(), plateCorner)
	if err != nil {
		return fmt.Errorf("%w: %v", ErrPlate, err)
	}
	d.add(PlateArea{What: "base", Region: geom.NewRegion(outline), Top: d.pl.Base})
	for _, c := range d.fixingCentres() {
		r := (d.fix.hole + d.growth) / 2
		slot := geom.Capsule(c, c.Add(geom.V(fixingTravel, 0)), r)
		d.add(PlateArea{What: "fixing slot", Region: geom.NewRegion(slot), Open: true})
		d.takeBox(slot.Bounds().Expand(labelGap))
	}
	return nil
}

// add puts an area on the plate.
func (d *plateDesign) add(a PlateArea) { d.pl.Areas = append(d.pl.Areas, a) }

// template puts the traced features and grooves on the plate: the profile and openings in the
// wall style, the channels of the groove style, and the channels along grooves in both.
func (d *plateDesign) template() {
	for _, f := range d.plan.Features {
		for _, r := range f.TemplateRegions {
			if f.Kind == KindProfile {
				d.islands = append(d.islands, r)
			} else {
				d.openings = append(d.openings, d.grow(r))
				d.openingLabel = append(d.openingLabel, f.Label)
			}
		}
	}
	chs := d.channels()
	d.nest()
	pieces := d.channelPieces(chs)
	d.raise(pieces)
	if d.o.Style == StyleWall {
		k := 0
		for _, f := range d.plan.Features {
			for _, r := range f.TemplateRegions {
				if f.Kind == KindProfile {
					d.add(PlateArea{What: "profile", Feature: f.Number, Region: r, Top: d.islandTop})
				} else {
					d.add(PlateArea{What: "opening", Feature: f.Number, Region: d.openings[k], Top: d.floor(k)})
					k++
				}
			}
		}
	}
	d.sinkChannels(chs, pieces)
	for _, r := range d.openings {
		d.takeRegion(r)
	}
}

// grow widens an opening by half the printer's hole growth on every side, since printed
// openings come out small as holes do.
func (d *plateDesign) grow(r geom.Region) geom.Region {
	if d.growth == 0 {
		return r
	}
	out := r.Offset(d.growth / 2).Regions
	if len(out) != 1 {
		return r
	}
	return out[0]
}

// seatRadius returns the radius of the largest seat with its datum ring.
func (d *plateDesign) seatRadius() float64 {
	if d.o.Seat == SeatCone {
		return coneRimMax / 2
	}
	return (d.stylus + boreClearance + d.growth) / 2
}

// sortAreas orders areas largest first, so each is placed after anything that holds it.
func sortAreas(as []PlateArea) {
	sort.SliceStable(as, func(i, j int) bool {
		return math.Abs(as[i].Region.Outer.Area()) > math.Abs(as[j].Region.Outer.Area())
	})
}
