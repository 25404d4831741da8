package pantograph

import (
	"fmt"
	"math"

	"panto/geom"
)

// This file builds the dial-reading sheet: what a machinist needs at the machine, one row per
// step in the plan's working order, as a plain value the sheet writers print without working
// anything out. Positions are measured from the datum seat: on the copy table the template
// point itself (the table's move), on the work table where the point lies on the stock (the
// table moves the other way; see Position). Readings are counted from a datum that reads a
// whole number of turns, chosen so that no reading is negative, and every position is
// approached with the dial counting up. Each time the tool changes the sheet has a step of its
// own, which carries that tool's speed, feed and depth rule once for all the rows it cuts.

// Sheet is the dial-reading sheet for one plan on one machine.
type Sheet struct {
	Part, Source string
	// Units are the part's drawing units: writers print lengths at the part (positions on the
	// stock, depths, remainders, feeds) in them. The numbers here are all mm.
	Units     Units
	Material  string // as the part names it
	Speeds    string // the speed-table row used: "brass (brass and bronze)"
	Thickness float64
	Ratio     float64
	Machine   string // the machine's name, or "" without a machine file
	Date      string // as given in SheetOptions
	Layout    string // "mirrored", "turned 180°", or ""
	Tools     []string
	Dials     SheetDials
	Rows      []SheetRow
	Warnings  []string
	Notes     []string // the rules used and where they come from
	Cautions  []string
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
	// CountUp says which way the table goes when the dial counts up ("right (+X)"), and
	// Reversed whether that is against the axis (the machine file's count_up).
	CountUp  string
	Reversed bool
}

// DatumInstruction is how the position dials are zeroed before the first step, said the same
// by the plan and the sheet. The depth dial is zeroed with each tool (StepToolChange).
const DatumInstruction = "put the stylus in the datum seat (on the datum itself where the template has no seat) " +
	"and set each table's dials to their datum readings"

// Position is one place on both tables, with the dial readings to reach it.
type Position struct {
	Template geom.Vec // copy table, template mm from the datum seat: the copy table's move
	// Part is where the point lies on the stock, part mm from the datum, +X to the operator's
	// right, +Y away (Plan.StockPoint); the work table moves by −Part to bring it under the
	// cutter.
	Part                       geom.Vec
	CopyX, CopyY, WorkX, WorkY Reading
	// BackOff lists the wind-backs needed before this position, e.g. "copy X: back to 1 t 20
	// div, then up"; empty when every dial comes up to it directly.
	BackOff []string
}

// StepToolChange is the sheet's own kind of step: fit the next tool, set its speed, touch off
// on the top face and zero the depth dial.
const StepToolChange StepKind = "tool change"

// SheetRow is one step at the machine.
type SheetRow struct {
	Step    int    // from 1
	Number  int    // the feature's number on the drawings; 0 for the datum and tool changes
	Feature string // the feature's name; "" for the datum and tool changes
	What    StepKind
	Action  string // in words: "drill hole 2 of 3", "trace the outline from here"
	Tool    string // "drill Ø0.6 mm carbide"; on a tool change, the tool to fit
	Stylus  string // "round stylus Ø5 mm"; "" for the datum
	Where   *Position
	Depth   float64 // mm below the top face at the last pass; 0 for the datum and tool changes
	Through bool    // the cut goes through the stock
	// Passes are the depths of each pass or peck with their depth-dial readings; on a drill
	// row only the first hole's, later holes repeat them (PassNote says so).
	Passes   []Pass
	PassNote string
	// On a tool change: the depth rules for what the tool cuts, its spindle speed, and a feed
	// guide for micro tools (mm/min; 0 when none).
	Rules     []string
	RPM       float64
	SpeedNote string
	Feed      float64
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

// BuildSheet makes the sheet for plan p on machine m. It fails only when the part's stock
// material is missing or not in the speed table (ErrMaterial): speeds are never guessed.
func BuildSheet(p Plan, m Machine, o SheetOptions) (Sheet, error) {
	mat := p.Material
	if mat.Name == "" { // a plan made by hand rather than by PlanPart
		var err error
		if mat, err = MaterialsFor(&m).Resolve(p.Stock.Material); err != nil {
			return Sheet{}, err
		}
	}
	s := Sheet{Part: p.Part, Source: p.Source, Units: p.Units, Material: p.Stock.Material,
		Speeds: mat.Name + " (" + mat.Group + ")", Thickness: p.Stock.Thickness, Ratio: p.Setup.Ratio,
		Machine: m.Name, Date: o.Date, Layout: layoutWords(p), Cautions: Cautions()}
	b := sheetBuilder{p: p, m: m, mat: mat, u: p.Units}
	s.Tools = b.tools()
	s.Rows = b.rows()
	s.Dials = b.readAll(s.Rows)
	for _, w := range p.Warnings {
		s.Warnings = append(s.Warnings, w.String())
	}
	s.Notes = b.notes()
	return s, nil
}

// layoutWords says how the template lies on the copy table when not plainly.
func layoutWords(p Plan) string {
	d := p.Setup.Rotate.Degrees()
	turn := fmt.Sprintf("turned %s° anticlockwise", num(d))
	if d != 0 && p.CopyTurn.Degrees() == d {
		turn += " (the linkage turns the copy back)"
	}
	switch {
	case p.Setup.Mirror && d != 0:
		return "mirrored, then " + turn
	case p.Setup.Mirror:
		return "mirrored left for right"
	case d != 0:
		return turn
	}
	return ""
}

// sheetBuilder holds what every row needs.
type sheetBuilder struct {
	p   Plan
	m   Machine
	mat StockMaterial
	u   Units // the part's units, for lengths in words
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
		t := b.toolText(f) + " with " + b.stylusText(f)
		if !seen[t] {
			seen[t] = true
			out = append(out, t)
		}
	}
	return out
}

// toolOf returns the kind and diameter of the tool that makes a feature.
func toolOf(f PlannedFeature) (ToolKind, float64) {
	switch f.Method {
	case Drilled:
		return ToolDrill, f.Drill
	case Engraved:
		return ToolEngrave, f.Cutter
	}
	return ToolMill, f.Cutter
}

// toolText names a feature's tool: `drill "0.8 carbide" Ø0.8 mm carbide` or `cutter Ø0.5 mm
// hss`, with its name in the machine file when it has one.
func (b sheetBuilder) toolText(f PlannedFeature) string {
	kind, d := toolOf(f)
	word := "cutter"
	if kind == ToolDrill {
		word = "drill"
	}
	name, material := b.ownedTool(kind, d)
	if name != "" && name != num(d) {
		word += fmt.Sprintf(" %q", name)
	}
	return fmt.Sprintf("%s Ø%s %s", word, b.u.Length(d), material)
}

// stylusText names a feature's stylus.
func (b sheetBuilder) stylusText(f PlannedFeature) string {
	if f.Tip == TipPointed {
		return fmt.Sprintf("pointed stylus Ø%s", b.u.Length(f.Stylus))
	}
	return fmt.Sprintf("round stylus Ø%s", b.u.Length(f.Stylus))
}

// ownedTool returns the machine file's name and material for the tool of kind and diameter d;
// the material is "hss" when none is listed: HSS speeds are the slower, so a guess never runs
// a tool too fast.
func (b sheetBuilder) ownedTool(kind ToolKind, d float64) (name, material string) {
	material = "hss"
	if kind == ToolDrill {
		for _, t := range b.m.Drills {
			if math.Abs(t.Diameter-d) <= sizeTol {
				return t.Name, orHSS(t.Material)
			}
		}
		return "", material
	}
	if c, ok := b.cutter(d); ok {
		return c.Name, orHSS(c.Material)
	}
	return "", material
}

func orHSS(m string) string {
	if m == "" {
		return "hss"
	}
	return m
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
