package pantograph

import (
	"fmt"
	"math"
	"strings"

	"panto/geom"
)

// Machine is a pantograph mill with the tools and the printer that go with it, as a machine
// file describes it. Every length is in millimetres (readers convert); dial pitches stay in
// their own screw's units because that is what the dial reads.
type Machine struct {
	Name   string
	Source string // where the machine came from (a file name), for messages
	Units  Units  // the units the machine file was written in; lengths here are already mm

	Ratio     RatioRange // the reductions the linkage can be set to
	Pivot     Pivot      // where the linkage's fixed pivot lies; "" means PivotEnd
	CopyTable Travel     // how far the copy table moves, in template mm
	Fixing    Fixing     // how a template plate is bolted to the copy table
	WorkTable Travel     // how far the work table moves, in part mm
	Dials     Dials
	Spindle   Spindle

	Styli   []Stylus
	Cutters []Cutter
	Drills  []Drill
	Printer Printer
	// Materials are the machine file's own rows of the speed table ([[stock_material]]),
	// added to the built-in ones or replacing them by name; see MaterialsFor.
	Materials []StockMaterial
}

// RatioRange is the set of ratios R (template size : part size) a linkage can be set to: any
// value from Min to Max, or, when Settings is not empty, only those fixed settings.
//
// The zero RatioRange means the range was not stated. Settings, when given, are in ascending
// order and Min and Max are the first and last of them.
type RatioRange struct {
	Min, Max float64
	Settings []float64
}

// ratioTol is how near, relatively, a ratio must be to a fixed setting or a range end to count
// as on it: it absorbs the rounding of a ratio worked out from other numbers (25.4 / 2.54), and
// is far finer than any linkage can be set (derived: 1e-9 of 10:1 moves a 100 mm template by
// a ten-millionth of a millimetre at the part).
const ratioTol = 1e-9

// Stated reports whether the range says anything: a continuous range or fixed settings.
func (r RatioRange) Stated() bool { return len(r.Settings) > 0 || r.Max > 0 }

// Allows reports whether the linkage can be set to ratio: one of the fixed settings, or a
// value from Min to Max. A range that was not stated allows every ratio greater than 0, so
// that a machine file without a ratio never rejects a plan on its own.
func (r RatioRange) Allows(ratio float64) bool {
	if !(ratio > 0) {
		return false
	}
	tol := ratioTol * ratio
	if len(r.Settings) > 0 {
		for _, s := range r.Settings {
			if math.Abs(s-ratio) <= tol {
				return true
			}
		}
		return false
	}
	if !r.Stated() {
		return true
	}
	return ratio >= r.Min-tol && ratio <= r.Max+tol
}

// String describes the range for messages: "2:1 to 10:1, any value between",
// "fixed settings 2:1, 5:1, 10:1" or "not stated".
func (r RatioRange) String() string {
	switch {
	case len(r.Settings) > 0:
		parts := make([]string, len(r.Settings))
		for i, s := range r.Settings {
			parts[i] = fmt.Sprintf("%g:1", s)
		}
		return "fixed settings " + strings.Join(parts, ", ")
	case r.Stated():
		return fmt.Sprintf("%g:1 to %g:1, any value between", r.Min, r.Max)
	}
	return "not stated"
}

// Pivot is where a pantograph's fixed pivot lies. It decides how the copy the cutter makes lies
// against the template the stylus traces: with the pivot at the end of the arms, stylus and
// cutter move the same way (the copy is similar and similarly placed); with the pivot between
// them they move opposite ways, so the copy is turned 180° and the template must be turned too
// for the part to come out the right way round.
type Pivot string

// The pivot positions.
const (
	PivotEnd     Pivot = "end"     // fixed pivot at the end: a stylus move +m moves the cutter +m/R
	PivotBetween Pivot = "between" // fixed pivot between stylus and cutter: +m moves it −m/R
)

// CopyTurn returns how far the linkage turns the copy against the template: 180° for a pivot
// between stylus and cutter, none otherwise.
func (p Pivot) CopyTurn() geom.Angle {
	if p == PivotBetween {
		return geom.Degrees(180)
	}
	return 0
}

// Travel is how far a table moves along X and Y, in mm; 0 means not stated.
type Travel struct{ X, Y float64 }

// Fixing is how a template plate is held on the copy table, as the machine file's [copy_table]
// states it. It is a field of Machine of its own, not of CopyTable, so that CopyTable stays a
// plain Travel like WorkTable.
type Fixing struct {
	// Spacing is the distance between the centres of the clamps or T-slots, in mm: X along
	// the table, Y across it (the T-slot pitch); 0 means not stated.
	Spacing Travel
	// Size is the diameter of the clamp bolts, in mm; 0 means not stated.
	Size float64
}

// Tip is the shape of a stylus's end.
type Tip string

// The stylus tips panto plans for. A round (cylindrical) stylus traces edges and fits bore
// seats; a pointed one drops into conical seats and centres itself without clearance.
const (
	TipRound   Tip = "round"
	TipPointed Tip = "pointed"
)

// Stylus is one tracer the machinist owns.
type Stylus struct {
	Name     string
	Diameter float64 // mm
	Tip      Tip
}

// Cutter is one milling cutter or engraver at hand.
type Cutter struct {
	Name     string
	Diameter float64 // mm
	Material string  // tool material, "hss" or "carbide"
	Flutes   int     // 0 when not stated
}

// Drill is one drill at hand.
type Drill struct {
	Name     string
	Diameter float64 // mm
	Material string  // "hss" or "carbide"
}

// Printer is the 3-D printer the template plate is made on, with its corrections.
type Printer struct {
	Bed    Travel  // usable bed size, mm
	Height float64 // usable height, mm; 0 when not stated
	// ScaleX and ScaleY multiply template coordinates to undo the printer's own shrinkage,
	// from measuring a printed check bar; 1 (or 0, meaning not stated) changes nothing.
	ScaleX, ScaleY float64
	// HoleGrowth is added to the diameter of every printed hole and bore, because printed
	// holes come out small.
	HoleGrowth float64
	// Accuracy is how far, in mm, a printed edge may lie from where it is drawn; 0 means not
	// stated (see AccuracyOrDefault).
	Accuracy float64
}

// DefaultPrintAccuracy is the accuracy assumed of a desktop FDM printer, ±0.1 mm (common
// practice, no source: makers and users quote ±0.1 to ±0.2 mm).
const DefaultPrintAccuracy = 0.1

// AccuracyOrDefault returns the printer's stated accuracy, or DefaultPrintAccuracy.
func (p Printer) AccuracyOrDefault() float64 {
	if p.Accuracy > 0 {
		return p.Accuracy
	}
	return DefaultPrintAccuracy
}

// Dials are the five dials of a pantograph mill: the copy table's X and Y, the work table's
// X and Y, and the depth.
type Dials struct {
	CopyX, CopyY, WorkX, WorkY, Depth Dial
}

// Dial is a lead screw with its graduated collar.
type Dial struct {
	Pitch     float64 // advance per turn, in Units
	Divisions int     // graduations per turn
	Units     Units   // what the screw is made in: mm or in
	Backlash  float64 // lost motion on reversing, in Units
	// Reversed is true when turning the dial the way its numbers count up moves the table
	// toward −X (to the operator's left), −Y (toward the operator) or up, rather than +X
	// (right), +Y (away) or down into the work. The machine file says it with count_up.
	Reversed bool
}

// Spindle is the spindle's speed range in rpm; 0 means not stated.
type Spindle struct{ MinRPM, MaxRPM float64 }
