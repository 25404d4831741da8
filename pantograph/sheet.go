package pantograph

import (
	"fmt"
	"math"

	"panto/geom"
)

// This file builds the dial-reading sheet: what a machinist needs at the machine, one row per
// step in the plan's working order, as a plain value the sheet writers print without working
// anything out. Positions are measured from the datum seat: on the copy table in template mm,
// on the work table in part mm (template ÷ R). Readings are counted from a datum that reads a
// whole number of turns, chosen so that no reading is negative, and every position is
// approached with the dial counting up.

// Sheet is the dial-reading sheet for one plan on one machine.
type Sheet struct {
	Part, Source string
	Material     string
	Thickness    float64 // mm
	Ratio        float64
	Machine      string // the machine's name, or "" without a machine file
	Date         string // as given in SheetOptions
	Layout       string // "mirrored", "turned 180°", or ""
	Tools        []string
	Dials        SheetDials
	Rows         []SheetRow
	Warnings     []string
	Notes        []string // the rules used and where they come from
	Cautions     []string
}

// SheetDials are the five dials as the sheet uses them.
type SheetDials struct {
	CopyX, CopyY, WorkX, WorkY, Depth DialInfo
}

// List returns the dials in the order the sheet lists them: copy X and Y, work X and Y, depth.
func (d SheetDials) List() []DialInfo { return []DialInfo{d.CopyX, d.CopyY, d.WorkX, d.WorkY, d.Depth} }

// DialInfo describes one dial as the sheet uses it.
type DialInfo struct {
	Name       string  // "copy X", "copy Y", "work X", "work Y", "depth"
	Stated     bool    // false when the machine file gives no pitch or divisions
	Pitch      float64 // in Units
	Divisions  int
	Units      Units
	Division   float64 // one division, in Units
	AtPart     float64 // one division's worth at the part, mm
	DatumTurns int     // what the dial is set to at the datum
	BackOff    float64 // wind-back after a reversal, in Units
}

// Position is one place on both tables, with the dial readings to reach it.
type Position struct {
	Template                   geom.Vec // copy table, template mm from the datum seat
	Part                       geom.Vec // work table, part mm from the datum
	CopyX, CopyY, WorkX, WorkY Reading
	// BackOff lists the wind-backs needed before this position, e.g. "copy X: back to 1 t 20
	// div, then up"; empty when every dial comes up to it directly.
	BackOff []string
}

// SheetRow is one step at the machine.
type SheetRow struct {
	Step    int    // from 1
	Number  int    // the feature's number on the drawings; 0 for the datum
	Feature string // the feature's name; "" for the datum
	What    StepKind
	Action  string // in words: "drill hole 2 of 3", "trace the outline from here"
	Tool    string // "drill Ø0.6 mm carbide"
	Stylus  string // "stylus Ø5 mm round" or "" for the datum
	Where   *Position
	Depth   float64 // mm below the top face at the last pass; 0 for the datum
	Through bool    // the cut goes through the stock
	// Passes are the depths of each pass or peck with their depth-dial readings; only on the
	// first row of a feature, later holes repeat them.
	Passes    []Pass
	PassRule  string
	RPM       float64
	SpeedNote string
	Feed      float64 // mm/min feed guide for micro tools; 0 when none
	FeedRule  string
}

// Pass is one depth setting.
type Pass struct {
	Depth   float64 // mm below the top face
	Reading Reading // on the depth dial; zero when the depth dial is not stated
}

// SheetOptions are what the sheet needs beyond the plan and the machine.
type SheetOptions struct {
	Date string // printed as given; "" leaves it out, so golden files stay fixed
}

// Cautions are the safety notes printed on every sheet (REFERENCES.md, Safety; DESIGN.md).
func Cautions() []string {
	return []string{
		"Wear safety glasses with side shields (ANSI Z87.1 / EN 166).",
		"Clamp the template and the stock firmly and lock unused axes before starting the spindle.",
		"Keep hands clear of the cutter; never clear chips with fingers.",
		"Micro tools break without warning and their pieces are nearly invisible: use magnification.",
		"Check a printed template's size against its check bar before use; printed PLA softens near 60 °C and creeps under load, so keep it out of the clamping and cutting load.",
		"Follow the machine's manual and your local workshop rules; they come before this sheet.",
	}
}

// BuildSheet makes the sheet for plan p on machine m.
func BuildSheet(p Plan, m Machine, o SheetOptions) Sheet {
	s := Sheet{Part: p.Part, Source: p.Source, Material: p.Stock.Material, Thickness: p.Stock.Thickness,
		Ratio: p.Setup.Ratio, Machine: m.Name, Date: o.Date, Layout: layoutWords(p), Cautions: Cautions()}
	b := sheetBuilder{p: p, m: m}
	s.Tools = b.tools()
	s.Rows = b.rows()
	s.Dials = b.readAll(s.Rows)
	for _, w := range p.Warnings {
		s.Warnings = append(s.Warnings, w.String())
	}
	s.Notes = b.notes()
	return s
}

// layoutWords says how the template lies on the copy table when not plainly.
func layoutWords(p Plan) string {
	switch d := p.Setup.Rotate.Degrees(); {
	case p.Setup.Mirror && d != 0:
		return fmt.Sprintf("mirrored, then turned %s°", num(d))
	case p.Setup.Mirror:
		return "mirrored left for right"
	case d != 0:
		return fmt.Sprintf("turned %s° anticlockwise", num(d))
	}
	return ""
}

// sheetBuilder holds what every row needs.
type sheetBuilder struct {
	p Plan
	m Machine
}

// tools lists each feature's tool and stylus once, in working order.
func (b sheetBuilder) tools() []string {
	seen := map[string]bool{}
	var out []string
	for _, st := range b.p.Steps {
		if st.Feature < 0 {
			continue
		}
		f := b.p.Features[st.Feature]
		t := b.toolText(f) + " with " + stylusText(f)
		if !seen[t] {
			seen[t] = true
			out = append(out, t)
		}
	}
	return out
}

// toolText names a feature's tool: "drill Ø0.6 mm hss" or "cutter Ø0.5 mm carbide".
func (b sheetBuilder) toolText(f PlannedFeature) string {
	if f.Method == Drilled {
		return fmt.Sprintf("drill Ø%s mm %s", num(f.Drill), b.toolMaterial(f.Drill, ToolDrill))
	}
	return fmt.Sprintf("cutter Ø%s mm %s", num(f.Cutter), b.toolMaterial(f.Cutter, ToolMill))
}

// stylusText names a feature's stylus.
func stylusText(f PlannedFeature) string {
	if f.Tip == TipPointed {
		return fmt.Sprintf("pointed stylus Ø%s mm", num(f.Stylus))
	}
	return fmt.Sprintf("round stylus Ø%s mm", num(f.Stylus))
}

// toolMaterial returns the material of the owned tool of kind and diameter d, "hss" when none
// is listed: HSS speeds are the slower, so a guess never runs a tool too fast.
func (b sheetBuilder) toolMaterial(d float64, kind ToolKind) string {
	if kind == ToolDrill {
		for _, t := range b.m.Drills {
			if math.Abs(t.Diameter-d) <= sizeTol && t.Material != "" {
				return t.Material
			}
		}
		return "hss"
	}
	if c, ok := b.cutter(d); ok && c.Material != "" {
		return c.Material
	}
	return "hss"
}

// cutter returns the owned cutter of diameter d.
func (b sheetBuilder) cutter(d float64) (Cutter, bool) {
	for _, c := range b.m.Cutters {
		if math.Abs(c.Diameter-d) <= sizeTol {
			return c, true
		}
	}
	return Cutter{}, false
}
