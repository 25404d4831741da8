package pantograph

import (
	"fmt"
	"strings"

	"panto/geom"
)

// Plan is what goes on the copy table for one part at one setup: the template's geometry per
// feature in the template frame, the tools, the order of work and every warning. It is a plain
// value holding everything the writers need (template plate, drawings, dial sheet); they
// compute nothing about machining themselves.
//
// Frames: Datum and every Warning amount are in the part frame and part mm. Everything named
// Template…, Seats, Path and Bounds is in the template frame: mm on the copy table, R times the
// part, origin at the datum seat, mirrored and turned as the setup asks (see Transform).
type Plan struct {
	Part   string // the part's name
	Source string // the part file, for messages
	Units  Units  // the part's drawing units: what lengths at the part are said in
	Stock  Stock
	// Material is the speed-table row of the stock, which speeds and passes are worked from.
	Material StockMaterial
	Setup    Setup    // as given, after validation, with the template's turn settled (Rotated)
	Datum    geom.Vec // part frame: the point the dials are zeroed on, template origin
	// CopyTurn is how the machine's linkage turns the copy against the template: 180° for a
	// pivot between stylus and cutter, else 0. It decides where a template point lies on the
	// stock (see StockPoint); without a machine file it is 0.
	CopyTurn geom.Angle

	// Transform maps the part frame to the template frame: translate(−Datum), then FlipX when
	// Setup.Mirror, then Setup.Rotate, then Scale(Setup.Ratio).
	Transform geom.Transform

	// Bounds holds everything on the template: traced regions, seats (with room for the
	// stylus) and groove channels. The datum seat, at the origin, is inside it only when the
	// datum lies on the part; writers that cut a seat there must allow for it.
	Bounds geom.Box

	Features []PlannedFeature // the profile first, then the part's features in file order
	Steps    []Step           // the order of work, datum first, profile last
	Order    []string         // feature names in working order, each once

	Warnings []Problem // warnings: what will not come out as drawn, what the machine cannot do
}

// Method is how a feature is made.
type Method string

// The methods.
const (
	Traced   Method = "traced"   // the stylus follows the template's edge
	Drilled  Method = "drilled"  // the stylus drops into a seat, a drill makes the hole
	Engraved Method = "engraved" // the stylus runs along a channel of its own width
)

// Status says how a feature will come out.
type Status string

// The statuses of a planned feature.
const (
	StatusOK       Status = "ok"       // as drawn
	StatusDeviates Status = "deviates" // made, but not exactly as drawn (see the warnings)
	StatusLost     Status = "lost"     // the cutter cannot make it at all
)

// PlannedFeature is one feature of the part as the template carries it.
type PlannedFeature struct {
	Name   string // the feature's name, or its kind when unnamed ("profile")
	Label  string // as Feature.Label: the table and the name
	Kind   Kind
	Number int // its place in the order of work, from 1; the number sheets and labels show
	Method Method

	Cutter float64 // mm; 0 for drilled holes
	Drill  float64 // mm; the drill for drilled holes, else 0
	Stylus float64 // mm
	Tip    Tip
	// Matched is the stylus diameter that would need no compensation, R × the cutter, mm;
	// for drilled holes, R × the setup's cutter.
	Matched float64
	// Compensation is δ = R·r_c − r_s in template mm; traced edges move by it away from
	// R × the part (out for the profile, in for openings). 0 for seats and grooves.
	Compensation float64
	Status       Status

	// TemplateRegions are the areas whose edges the stylus traces: for the profile the
	// template outline, for openings each opening as a region (the template plate has them
	// as holes). Empty for drilled holes and grooves, and for a lost feature.
	TemplateRegions []geom.Region
	TemplateArea    float64  // mm², sum over TemplateRegions
	TemplateBounds  geom.Box // of what the feature puts on the template

	Seats []geom.Vec // drilled holes: where the stylus drops in, in working order

	Path  []geom.Vec // grooves: the centreline on the template
	Width float64    // grooves: the channel's width on the template (the stylus diameter)

	Depth Depth
}

// Step is one thing done at the machine, in order.
type Step struct {
	What    StepKind
	Feature int        // index into Plan.Features; −1 for the datum
	Drill   float64    // for a drill step, the drill's diameter in mm
	Seats   []geom.Vec // for a drill step, the seats in the order to visit them (template frame)
}

// StepKind says what a step does.
type StepKind string

// The kinds of step.
const (
	StepDatum   StepKind = "datum"   // zero the dials with the stylus in the datum seat
	StepDrill   StepKind = "drill"   // drill the holes of one feature at their seats
	StepMill    StepKind = "mill"    // trace an opening, recess or the profile
	StepEngrave StepKind = "engrave" // run along a groove
)

// StockPoint returns where template point t (template frame) lies on the stock, in part mm
// from the datum, +X to the operator's right and +Y away: t scaled down by R and turned back
// by the linkage's own turn of the copy. A template turn that only makes up for the linkage
// (180° on a pivot between stylus and cutter) leaves the part lying on the stock as drawn; a
// turn beyond it, or a mirror, turns or mirrors the part on the stock too.
func (p Plan) StockPoint(t geom.Vec) geom.Vec {
	return geom.Rotate(-p.CopyTurn).Apply(t.Mul(1 / p.Setup.Ratio))
}

// Lost returns the names of the features the cutter cannot make.
func (p Plan) Lost() []string {
	var out []string
	for _, f := range p.Features {
		if f.Status == StatusLost {
			out = append(out, f.Name)
		}
	}
	return out
}

// Done reports whether the plan can be carried out: nothing stops it, and nothing is lost
// unless the setup accepts losses.
func (p Plan) Done() bool {
	for _, w := range p.Warnings {
		if w.Stops {
			return false
		}
	}
	return p.Setup.AcceptLoss || len(p.Lost()) == 0
}

// PartErrors is the error PlanPart returns for a part that fails its checks: a part with
// errors cannot be planned.
type PartErrors []Problem

func (e PartErrors) Error() string {
	var b strings.Builder
	fmt.Fprintf(&b, "the part has %d error(s); run panto check on it", len(e))
	for _, p := range e {
		b.WriteString("\n" + p.Diagnostic())
	}
	return b.String()
}

// PlanPart plans the template for part p at setup s. m is the machine, or nil without a
// machine file: then every tool size counts as at hand and nothing limits the template's size.
// The part must pass Check without errors (PartErrors otherwise); a bad setup is an error too.
// What the cutter cannot make is not an error: it is in the plan's warnings and statuses.
func PlanPart(p Part, s Setup, m *Machine) (Plan, error) {
	if err := s.Validate(); err != nil {
		return Plan{}, err
	}
	mat, err := MaterialsFor(m).Resolve(p.Stock.Material)
	if err != nil {
		return Plan{}, err
	}
	probs := Check(p, DefaultOptions())
	if HasErrors(probs) {
		var errs PartErrors
		for _, pr := range probs {
			if pr.Severity == Error {
				errs = append(errs, pr)
			}
		}
		return Plan{}, errs
	}
	var copyTurn geom.Angle
	if m != nil {
		copyTurn = m.Pivot.CopyTurn()
	}
	if !s.Rotated && s.Rotate == 0 {
		s.Rotate = copyTurn
	}
	s.Rotated = true
	pl := planner{part: p, setup: s, machine: m, t: s.Transform(p.Datum), u: p.Units}
	out := Plan{Part: p.Name, Source: p.Source, Units: p.Units, Stock: p.Stock, Material: mat,
		Setup: s, Datum: p.Datum, CopyTurn: copyTurn, Transform: pl.t}
	out.Warnings = partWarnings(probs)
	for _, f := range p.All() {
		pf, ws := pl.plan(f)
		out.Features = append(out.Features, pf)
		out.Warnings = append(out.Warnings, ws...)
	}
	out.Bounds = geom.EmptyBox()
	for _, f := range out.Features {
		if !f.TemplateBounds.IsEmpty() {
			out.Bounds = out.Bounds.Union(f.TemplateBounds)
		}
	}
	out.order()
	out.Warnings = append(out.Warnings, machineWarnings(out, m)...)
	return out, nil
}

// partWarnings carries the part's own warnings (thin walls, say) into the plan.
func partWarnings(probs []Problem) []Problem {
	var ws []Problem
	for _, pr := range probs {
		if pr.Severity == Warning {
			ws = append(ws, pr)
		}
	}
	return ws
}
