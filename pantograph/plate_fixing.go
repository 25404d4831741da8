package pantograph

import (
	"fmt"
	"math"

	"panto/geom"
)

// This file places the plate's fixing slots, where the copy table's clamp bolts go: their
// spacing along the table from the plate options or else the machine file, the distance of the
// front and back rows from the machine file's T-slot pitch, their width from its bolt size.
// It also says whether the finished plate fits the printer's bed.

const (
	// fixingClearance is a bolt's clearance hole as a multiple of its diameter, close to the
	// medium series of ISO 273 (from memory: M3 3.4, M6 6.6, M10 11 mm).
	fixingClearance = 1.1
	// plateFitTol is how near, in mm, two lengths must be to count as the same (two fixing spacings,
	// a plate and a bed): far under any clamp's play or printer's step, and it absorbs
	// inch-to-mm rounding (derived).
	plateFitTol = 1e-6
)

// plateFixing is where the fixing slots go and how wide they are.
type plateFixing struct {
	hole    float64 // clearance width of a slot, before the printer's hole growth
	inset   float64 // distance of a row's centreline from the front or back edge
	spacing float64 // centre distance of the slots along X; 0 puts one near each corner
	pitch   float64 // T-slot pitch: the rows are a whole number of it apart; 0 when not stated
}

// newFixing works out the fixing slots from the options and the machine file. The options'
// spacing wins over the file's, and a note says so when the two differ.
func (d *plateDesign) newFixing(m *Machine) {
	f := plateFixing{hole: fixingHole, inset: fixingInset, spacing: math.Max(0, d.o.FixingSpacing)}
	if m != nil {
		if s := m.Fixing.Size; s > 0 {
			f.hole = fixingClearance * s
			// keep the wall between a larger slot and the plate's edge as thick as for M6
			f.inset += math.Max(0, f.hole-fixingHole) / 2
		}
		f.pitch = m.Fixing.Spacing.Y
		file := m.Fixing.Spacing.X
		switch {
		case f.spacing == 0:
			f.spacing = file
		case file > 0 && math.Abs(file-f.spacing) > plateFitTol:
			d.pl.Notes = append(d.pl.Notes, fmt.Sprintf(
				"the fixing slots are %s mm apart as asked (--fixing-spacing), not %s mm as the machine file says",
				num(f.spacing), num(file)))
		}
	}
	d.fix = f
}

// extra is how much deeper than for M6 bolts the front and back margins must be to take the
// slots: the row moves in by half the extra width and the slot is half of it wider.
func (f plateFixing) extra() float64 { return math.Max(0, f.hole-fixingHole) }

// rows grows box b at the back, when the machine file states a T-slot pitch, so that the
// front and back rows of slots are a whole number of pitches apart, and notes the distance.
func (d *plateDesign) rows(b geom.Box) geom.Box {
	p := d.fix.pitch
	if p <= 0 {
		return b
	}
	apart := b.Size().Y - 2*d.fix.inset
	k := math.Max(1, math.Ceil(apart/p-plateFitTol))
	b.Max.Y += k*p - apart
	d.pl.Notes = append(d.pl.Notes, fmt.Sprintf(
		"the front and back rows of fixing slots are %s mm apart: %g T-slot pitches of %s mm", num(k*p), k, num(p)))
	return b
}

// fixingCentres returns the left ends of the fixing slots: one near each corner, or a pair
// spacing apart along the front and back edges.
func (d *plateDesign) fixingCentres() []geom.Vec {
	b := d.box
	lo, hi := b.Min.Y+d.fix.inset, b.Max.Y-d.fix.inset
	if s := d.fix.spacing; s > 0 {
		mid := b.Center().X - fixingTravel/2
		return []geom.Vec{geom.V(mid-s/2, lo), geom.V(mid+s/2, lo), geom.V(mid-s/2, hi), geom.V(mid+s/2, hi)}
	}
	left, right := b.Min.X+d.fix.inset, b.Max.X-d.fix.inset-fixingTravel
	return []geom.Vec{geom.V(left, lo), geom.V(right, lo), geom.V(left, hi), geom.V(right, hi)}
}

// bedWarning says, when the machine file states a printer bed, whether the plate as printed
// (with the printer's scale correction) is larger than the bed either way round; "" when it
// fits or no bed is stated.
func bedWarning(pl Plate, m *Machine) string {
	if m == nil || m.Printer.Bed.X <= 0 || m.Printer.Bed.Y <= 0 {
		return ""
	}
	x, y, bed := pl.Size.X*pl.ScaleX, pl.Size.Y*pl.ScaleY, m.Printer.Bed
	if x <= bed.X+plateFitTol && y <= bed.Y+plateFitTol || y <= bed.X+plateFitTol && x <= bed.Y+plateFitTol {
		return ""
	}
	return fmt.Sprintf("the plate is %s x %s mm as printed (template, margins, fixing slots and front strip), "+
		"larger than the printer bed (%s x %s mm) either way round: print it on a larger printer, "+
		"in pieces, or at a lower ratio", num(x), num(y), num(bed.X), num(bed.Y))
}
