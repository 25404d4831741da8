package pantograph

// Machine is a pantograph mill with the tools and the printer that go with it, as a machine
// file describes it. Every length is in millimetres (readers convert); dial pitches stay in
// their own screw's units because that is what the dial reads.
type Machine struct {
	Name   string
	Source string // where the machine came from (a file name), for messages

	Ratio     RatioRange // the reductions the linkage can be set to
	CopyTable Travel     // how far the copy table moves, in template mm
	WorkTable Travel     // how far the work table moves, in part mm
	Dials     Dials
	Spindle   Spindle

	Styli   []Stylus
	Cutters []Cutter
	Drills  []Drill
	Printer Printer
}

// RatioRange is the set of ratios R (template size : part size) a linkage can be set to: any
// value from Min to Max, or, when Settings is not empty, only those fixed settings.
type RatioRange struct {
	Min, Max float64
	Settings []float64
}

// Travel is how far a table moves along X and Y, in mm; 0 means not stated.
type Travel struct{ X, Y float64 }

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
	// toward −X (or −Y, or up for depth) rather than +X (+Y, down).
	Reversed bool
}

// Spindle is the spindle's speed range in rpm; 0 means not stated.
type Spindle struct{ MinRPM, MaxRPM float64 }
