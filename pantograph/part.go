package pantograph

import (
	"fmt"

	"panto/geom"
)

// Part is a part to be made, as read from a part file or built by a program. It is a plain
// value: every length is in millimetres, in the part frame (+Y up).
type Part struct {
	Name     string
	Units    Units    // the units the drawing was made in; geometry here is already in mm
	Datum    geom.Vec // part-frame point the dials are zeroed on
	Stock    Stock
	Profile  Feature   // the outside edge, Kind == KindProfile
	Features []Feature // openings, recesses, holes and grooves, in file order
	Source   string    // where the part came from (a file name), for messages
}

// Stock is the material the part is cut from.
type Stock struct {
	Material  string  // free text, e.g. "brass"
	Thickness float64 // mm; 0 means not given
}

// Units names the units a drawing was made in.
type Units string

// The units a part file may use.
const (
	MM   Units = "mm"
	Inch Units = "in"
)

// MMPerInch converts inches to millimetres (exact by definition of the inch).
const MMPerInch = 25.4

// Kind is what a feature is, in the trade's words.
type Kind string

// The kinds of feature.
const (
	KindProfile Kind = "profile" // the outside edge, cut through
	KindCutout  Kind = "cutout"  // a through opening
	KindPocket  Kind = "pocket"  // a blind recess
	KindHoles   Kind = "holes"   // drilled holes of one diameter
	KindSlot    Kind = "slot"    // a straight slot, through or blind
	KindGroove  Kind = "groove"  // an engraved line
)

// Milled reports whether the cutter traces the feature's outline from inside it (an opening or
// recess made by milling, not drilling or engraving).
func (k Kind) Milled() bool { return k == KindCutout || k == KindPocket || k == KindSlot }

// Feature is one thing to cut. Which fields are used depends on Kind; see the package doc.
type Feature struct {
	Name string
	Kind Kind

	// Region is the area removed (cutout, pocket, slot) or kept (profile), normalised as
	// geom.NewRegion does.
	Region geom.Region

	// Centers and Diameter describe holes.
	Centers  []geom.Vec
	Diameter float64

	// Path and Width describe a groove; Width 0 means as wide as the cutter.
	Path  []geom.Vec
	Width float64

	// From and To are a slot's centreline ends, Width its width; Region is the matching
	// capsule. They are kept so that checks and plans can speak of the centreline.
	From, To geom.Vec

	Depth Depth
	Where Where // where the feature was written: its table header

	// KeyLines holds the line of each key as written, when read from a file: "depth",
	// "diameter", and for lists each entry, "at[2]" (counted from 0). Checks use it to point at
	// the line that is wrong rather than the table's header. It may be nil.
	KeyLines map[string]int
}

// WhereKey returns where key of the feature was written, or the feature's own place when the
// key's line is not known.
func (f Feature) WhereKey(key string) Where {
	if l, ok := f.KeyLines[key]; ok && l > 0 {
		return Where{File: f.Where.File, Line: l}
	}
	return f.Where
}

// Label names the feature in messages: its table and its name, as the file has them.
func (f Feature) Label() string {
	table := "[[" + string(f.Kind) + "]]"
	if f.Kind == KindProfile {
		table = "[profile]"
	}
	if f.Name == "" {
		return table
	}
	return fmt.Sprintf("%s %q", table, f.Name)
}

// Depth is how deep a feature goes: through the stock, or a depth in millimetres from the top
// face. The zero value means the depth was not given.
type Depth struct {
	Through bool
	MM      float64
}

// Given reports whether a depth was stated.
func (d Depth) Given() bool { return d.Through || d.MM != 0 }

func (d Depth) String() string {
	switch {
	case d.Through:
		return "through"
	case d.MM == 0:
		return "not given"
	}
	return fmt.Sprintf("%g mm", d.MM)
}

// Where is a place in a source file; Line 0 means unknown.
type Where struct {
	File string
	Line int
}

func (w Where) String() string {
	switch {
	case w.File == "":
		return ""
	case w.Line == 0:
		return w.File
	}
	return fmt.Sprintf("%s:%d", w.File, w.Line)
}

// Opening reports whether the feature removes material all the way through the stock: cut-outs,
// through slots and through holes.
func (f Feature) Opening() bool {
	return f.Kind == KindCutout || (f.Kind == KindSlot || f.Kind == KindHoles) && f.Depth.Through
}

// HoleContour returns the outline of hole i of a holes feature.
func (f Feature) HoleContour(i int) geom.Contour {
	return geom.Circle(f.Centers[i], f.Diameter/2)
}
