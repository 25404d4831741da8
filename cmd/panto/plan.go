package main

import (
	"fmt"
	"io"
	"sort"
	"strconv"
	"strings"

	"github.com/spf13/pflag"

	"panto/geom"
	"panto/pantograph"
)

// planFlags are the options of `panto plan`; sheet and make share all but --json.
type planFlags struct {
	ratio, cutter, stylus, rotate float64 // cutter and stylus in mm, from lengths
	lengths                       struct{ cutter, stylus, thickness lengthFlag }
	cutterFor                     map[string]string
	tip, machine                  string
	mirror, acceptLoss, millHoles bool
	asJSON, help                  bool
	thickness                     float64 // stock, mm; 0 keeps the part file's
	material                      string
	drawing                       drawingFlags
	drawingGiven                  []string  // the drawing flags given, for a word when PART is not a drawing
	datum                         pointFlag // --datum X,Y; not set keeps the file's
}

// runPlan is `panto plan PART --ratio R --cutter D [...]`.
func runPlan(args []string, stdout, stderr io.Writer) error {
	var o planFlags
	fl := pflag.NewFlagSet("plan", pflag.ContinueOnError)
	fl.SetOutput(io.Discard)
	addPlanFlags(fl, &o)
	fl.BoolVar(&o.asJSON, "json", false, "print the plan as JSON")
	if done, err := parseOne("plan", partOrDrawing, planSynopsis, fl, args, &o.help, stdout); done {
		return err
	}
	setup, err := o.setup(fl)
	if err != nil {
		return usagef("plan", "%v", err)
	}
	j, err := readAndPlan("plan", fl.Arg(0), o, setup, stderr)
	if err != nil {
		return err
	}
	p := j.plan
	var plate *pantograph.PlateReport
	if j.machine != nil && j.machine.Printer.Bed.X > 0 {
		rep, err := pantograph.ReportPlate(j.part, setup, &p, j.machine, pantograph.PlateOptions{})
		if err != nil {
			return failf("plan", "%v", err)
		}
		plate = &rep
	}
	if o.asJSON {
		if err := writePlanJSON(stdout, p, plate); err != nil {
			return err
		}
	} else {
		writePlan(stdout, p, plate)
	}
	warnPlan(stderr, p)
	return planOutcome("plan", p)
}

// warnPlan prints the plan's warnings on standard error.
func warnPlan(stderr io.Writer, p pantograph.Plan) {
	for _, w := range p.Warnings {
		fmt.Fprintf(stderr, "warning: %s\n", w)
	}
}

// planOutcome says why a plan cannot be carried out (exit 1), or nil when it can.
func planOutcome(cmd string, p pantograph.Plan) error {
	if p.Done() {
		return nil
	}
	var why []string
	for _, w := range p.Warnings {
		if w.Stops {
			why = append(why, fmt.Sprintf("panto %s: the job cannot be done as planned: %s", cmd, w))
		}
	}
	if lost := p.Lost(); len(lost) > 0 && !p.Setup.AcceptLoss {
		why = append(why, fmt.Sprintf("panto %s: the cutter cannot make %s; use a smaller cutter, or pass --accept-loss to plan without %s",
			cmd, quoteList(lost), them(len(lost))))
	}
	return &exitError{exitFailed, strings.Join(why, "\n")}
}

// setup turns the flags into a Setup, and notes which drawing flags were given; Validate is
// left to the planner.
func (o *planFlags) setup(fl *pflag.FlagSet) (pantograph.Setup, error) {
	for _, name := range []string{"ratio", "cutter"} {
		if !fl.Changed(name) {
			return pantograph.Setup{}, fmt.Errorf("--%s is required\nUsage: %s", name, planSynopsis)
		}
	}
	o.cutter, o.stylus = o.lengths.cutter.l.mm(pantograph.MM), o.lengths.stylus.l.mm(pantograph.MM)
	o.thickness = o.lengths.thickness.l.mm(pantograph.MM)
	if err := checkThickness(o.thickness); err != nil {
		return pantograph.Setup{}, err
	}
	o.drawingGiven = givenDrawingFlags(fl)
	s := pantograph.Setup{Ratio: o.ratio, Cutter: o.cutter, Stylus: o.stylus,
		Tip: pantograph.Tip(o.tip), Mirror: o.mirror, Rotate: geom.Degrees(o.rotate),
		Rotated: fl.Changed("rotate"), AcceptLoss: o.acceptLoss, MillHoles: o.millHoles}
	if fl.Changed("stylus") && !(o.stylus > 0) {
		return s, fmt.Errorf("--stylus must be greater than 0 mm, got %g", o.stylus)
	}
	kinds := map[string]pantograph.Kind{}
	for _, k := range []pantograph.Kind{pantograph.KindCutout, pantograph.KindPocket,
		pantograph.KindHoles, pantograph.KindSlot, pantograph.KindGroove, pantograph.KindProfile} {
		kinds[string(k)] = k
	}
	for name, v := range o.cutterFor {
		k, ok := kinds[name]
		if !ok {
			return s, fmt.Errorf("--cutter-for: no kind of feature %q; use profile, cutout, pocket, slot, holes or groove", name)
		}
		d, err := strconv.ParseFloat(v, 64)
		if err != nil {
			return s, fmt.Errorf("--cutter-for %s: %q is not a diameter in mm", name, v)
		}
		if s.Cutters == nil {
			s.Cutters = map[pantograph.Kind]float64{}
		}
		s.Cutters[k] = d
	}
	return s, nil
}

// quoteList formats names as "a", "b" and "c".
func quoteList(names []string) string {
	q := make([]string, len(names))
	for i, n := range names {
		q[i] = strconv.Quote(n)
	}
	if len(q) == 1 {
		return q[0]
	}
	return strings.Join(q[:len(q)-1], ", ") + " and " + q[len(q)-1]
}

// them is "it" or "them".
func them(n int) string {
	if n == 1 {
		return "it"
	}
	return "them"
}

// writePlan prints the plan in a machinist's words, every length in the part's own units, and
// how its plate prints when plate is not nil.
func writePlan(w io.Writer, p pantograph.Plan, plate *pantograph.PlateReport) {
	u := p.Units
	fmt.Fprintf(w, "plan for %s  (%s)\n", p.Part, p.Source)
	fmt.Fprintf(w, "  ratio       %s:1, the template %s times the part%s\n", num(p.Setup.Ratio), num(p.Setup.Ratio), layout(p))
	size := p.Bounds.Size()
	fmt.Fprintf(w, "  template    %s x %s, from %s to %s on the copy table\n",
		u.Number(size.X), u.Length(size.Y), at(u, p.Bounds.Min), at(u, p.Bounds.Max))
	fmt.Fprintf(w, "  datum       the template's origin is the datum seat, at %s on the part\n", at(u, p.Datum))
	if plate != nil {
		fmt.Fprintf(w, "  plate       %s x %s as printed, %s on the %s x %s printer bed\n", u.Number(plate.Fit.Size.X),
			u.Length(plate.Fit.Size.Y), bedWords(plate.Fit), u.Number(plate.Fit.Bed.X), u.Length(plate.Fit.Bed.Y))
	}
	if p.Stock.Material != "" {
		fmt.Fprintf(w, "  stock       %s, %s thick; speeds for %s (%s)\n", p.Stock.Material, u.Length(p.Stock.Thickness),
			p.Material.Name, p.Material.Group)
	}
	fmt.Fprintf(w, "\nfeatures (template sizes as on the copy table)\n")
	for _, i := range byNumber(p.Features) {
		writeFeature(w, p.Features[i], u)
	}
	fmt.Fprintf(w, "\norder of work\n")
	for i, st := range p.Steps {
		fmt.Fprintf(w, "  %2d. %s\n", i+1, stepText(p, st))
	}
	fmt.Fprintf(w, "\nwarnings\n")
	if len(p.Warnings) == 0 {
		fmt.Fprintf(w, "  none: every feature comes out as drawn\n")
	}
	for _, wr := range p.Warnings {
		fmt.Fprintf(w, "  %s%s\n", wr, amountText(wr, u))
	}
}

// layout says how the template is laid on the copy table, when not plainly.
func layout(p pantograph.Plan) string {
	var s string
	if p.Setup.Mirror {
		s += ", mirrored left for right"
	}
	if d := p.Setup.Rotate.Degrees(); d != 0 {
		s += fmt.Sprintf(", turned %s° anticlockwise", num(d))
		if p.CopyTurn.Degrees() == d {
			s += " (the linkage turns the copy back)"
		}
	}
	return s
}

// writeFeature prints one feature: number, label, tools, what the template carries, status.
func writeFeature(w io.Writer, f pantograph.PlannedFeature, u pantograph.Units) {
	no := "  -"
	if f.Number > 0 {
		no = fmt.Sprintf("%3d", f.Number)
	}
	fmt.Fprintf(w, "%s  %s\n", no, f.Label)
	switch f.Method {
	case pantograph.Drilled:
		fmt.Fprintf(w, "       drill Ø%s, %s; %d seat%s for the %s stylus Ø%s\n", u.Length(f.Drill), depthText(f, u),
			len(f.Seats), suffix(len(f.Seats)), f.Tip, u.Length(f.Stylus))
	case pantograph.Engraved:
		fmt.Fprintf(w, "       cutter Ø%s, %s; %s stylus Ø%s along a channel %s wide\n",
			u.Length(f.Cutter), depthText(f, u), f.Tip, u.Length(f.Stylus), u.Length(f.Width))
	case pantograph.Traced:
		if f.Status == pantograph.StatusLost {
			fmt.Fprintf(w, "       cutter Ø%s, %s; not on the template\n", u.Length(f.Cutter), depthText(f, u))
			break
		}
		fmt.Fprintf(w, "       cutter Ø%s, %s; %s stylus Ø%s; %s\n", u.Length(f.Cutter), depthText(f, u),
			f.Tip, u.Length(f.Stylus), compensationText(f, u))
		b := f.TemplateBounds.Size()
		fmt.Fprintf(w, "       template %s x %s, area %s\n", u.Number(b.X), u.Length(b.Y), u.Area(f.TemplateArea))
	}
	switch f.Status {
	case pantograph.StatusDeviates:
		fmt.Fprintf(w, "       comes out not quite as drawn: see the warnings\n")
	case pantograph.StatusLost:
		fmt.Fprintf(w, "       LOST: the cutter cannot make it; it is left out of the order of work\n")
	}
}

// depthText is "through" or the depth of a feature.
func depthText(f pantograph.PlannedFeature, u pantograph.Units) string {
	if f.Kind == pantograph.KindProfile || f.Kind == pantograph.KindCutout || f.Depth.Through {
		return "through"
	}
	return u.Length(f.Depth.MM) + " deep"
}

// compensationText says which way the template's edge moves and by how much.
func compensationText(f pantograph.PlannedFeature, u pantograph.Units) string {
	d := f.Compensation
	dir := pantograph.DirectionOf(d)
	if dir == pantograph.DirectionNone {
		return "the stylus matches the cutter: no compensation, the template is the part at full ratio"
	}
	outline := f.Kind == pantograph.KindProfile
	grows := dir == pantograph.DirectionGrow == outline
	edge := "opening"
	if outline {
		edge = "outline"
	}
	verb := "shrunk"
	if grows {
		verb = "grown"
	}
	if f.Tip == pantograph.TipPointed {
		return fmt.Sprintf("a pointed stylus traces with its point, so the template %s is %s by %s all round (R × the cutter's radius)",
			edge, verb, u.Length(abs(d)))
	}
	size := "under"
	if d < 0 {
		size = "over"
	}
	return fmt.Sprintf("the stylus is %s %s the matched Ø%s, so the template %s is %s by %s all round",
		u.Length(abs(f.Stylus-f.Matched)), size, u.Length(f.Matched), edge, verb, u.Length(abs(d)))
}

// stepText says what one step of the order of work is.
func stepText(p pantograph.Plan, st pantograph.Step) string {
	if st.Feature < 0 {
		return pantograph.DatumInstruction
	}
	u := p.Units
	f := p.Features[st.Feature]
	switch st.What {
	case pantograph.StepDrill:
		var seats []string
		for _, s := range st.Seats {
			seats = append(seats, at(u, s))
		}
		return fmt.Sprintf("drill      %s with the Ø%s drill: seat%s %s", f.Label, u.Length(st.Drill), suffix(len(seats)), strings.Join(seats, ", "))
	case pantograph.StepEngrave:
		return fmt.Sprintf("engrave    %s (cutter Ø%s)", f.Label, u.Length(f.Cutter))
	}
	verb := "mill      "
	if f.Kind == pantograph.KindProfile {
		verb = "cut out   "
	}
	return fmt.Sprintf("%s %s (cutter Ø%s, %s)", verb, f.Label, u.Length(f.Cutter), depthText(f, u))
}

// amountText is a warning's amount at the part, in u, when it has one.
func amountText(w pantograph.Problem, u pantograph.Units) string {
	if !w.HasAmount {
		return ""
	}
	return fmt.Sprintf("  [%s at the part]", u.Length(w.Amount))
}

// suffix is the plural ending for n things.
func suffix(n int) string {
	if n == 1 {
		return ""
	}
	return "s"
}

func abs(v float64) float64 {
	if v < 0 {
		return -v
	}
	return v
}

// at formats a point in u.
func at(u pantograph.Units, v geom.Vec) string { return u.Point(v.X, v.Y) }

const planSynopsis = `panto plan PART --ratio R --cutter D [--stylus D] [--machine FILE] [--mirror] [--rotate DEG] [--accept-loss] [--mill-holes] [--datum X,Y] [--thickness MM] [--json]`

const planUsage = `Usage: ` + planSynopsis + `

Plans the template for PART, a part file or a DXF or SVG drawing: the ratio, each feature with its cutter and stylus,
how far the template's edges are moved for a stylus that does not match the cutter, the
template's overall size on the copy table, the order of work, and every warning about what
will not come out as drawn.

The template is R times the part, its origin at the part's datum. With a stylus of exactly
R × the cutter it is R times the part and no more. With another stylus every traced edge moves
by δ = R × cutter radius − stylus radius: the outline grows by δ and openings shrink by δ (the
other way when δ is negative), so the cutter still cuts the part as drawn. Drilled holes are
seats for the stylus at R × their centre; grooves are channels as wide as the stylus.

Order of work: zero the dials in the datum seat; drill the holes, smallest drill first, on a
short route; pockets, blind slots and grooves; through slots and cut-outs; the profile last,
so the part stays held until the end.

Exit codes: 0 planned (warnings go to standard error too); 1 a feature is lost (the cutter
cannot make it at all) and --accept-loss was not given, or the machine cannot do the job (the
ratio cannot be set, the template is larger than the copy table's travel); 2 bad usage, or a
bad part or machine file.

Flags:
  --ratio R            template size : part size, 1 or more (required)
  --cutter D           cutter diameter in mm, for every milled and engraved feature (required)
  --cutter-for KIND=D  another cutter for one kind: profile, cutout, pocket, slot, holes
                       (milled holes) or groove; repeat or separate with commas
  --stylus D           stylus diameter in mm for the whole job; without it, R × the cutter,
                       or the stylus in the machine file nearest to that
  --tip round|pointed  the stylus's tip (default round; a pointed tip traces with its point)
  --machine FILE       machine file: ratio range, copy-table travel, styli, cutters and drills
                       at hand, printer bed. Holes with no drill at hand are milled when they
                       are larger than the cutter
  --mirror             mirror the template left for right about the datum
  --rotate DEG         turn the template DEG degrees anticlockwise about the datum (after
                       any mirror). Default: as the machine file's linkage needs, 180 when its
                       [ratio] pivot = "between" (the copy comes out turned 180°), else 0
  --accept-loss        plan even when the cutter cannot make some feature; it is left out
  --mill-holes         mill every hole larger than its cutter instead of drilling it
` + stockAndDrawingHelp + `  --json               print the plan as one JSON object instead:
                         part, file, ratio, mirror, rotate (degrees), datum [x, y] (part mm)
                         template {bounds {min, max}}             template mm
                         features [{name, kind, number, method, cutter, drill, stylus, tip,
                                    compensation (δ, template mm), status (ok, deviates,
                                    lost), matched_stylus (R × cutter), through,
                                    depth (mm, null when through), template_area (mm²,
                                    traced features),
                                    template_bounds, seats [[x, y]] (drilled holes),
                                    path, width (grooves)}]
                         order [feature names in working order]
                         steps [{what, feature, drill, seats}]
                         warnings [{feature, message, amount (mm at the part, or null),
                                    stops}]
                         done    whether the plan can be carried out
  -h, --help           show this help
`

// stockAndDrawingHelp describes the flags for the stock and for reading a drawing, which plan,
// sheet and make share.
const stockAndDrawingHelp = `  --datum X,Y          move the datum (where the dials are zeroed) to this point of the part,
                       in the part's own units; every reading is measured from it
  --thickness MM       the stock's thickness in mm: needed for a drawing, which does not
                       carry it; for a part file it replaces [stock] thickness (with a note)
  --material NAME      the stock's material; for a part file it replaces [stock] material
  When PART is a .dxf or .svg drawing it is read as 'panto import' reads it, and what became
  what is reported on standard error; these say how (see 'panto help import'):
  --units mm|in        the drawing's units, overriding the file
  --hole-max D         largest circle that becomes a drilled hole, in the drawing's units
  --layer NAME=KIND[:DEPTH]
                       what the outlines on layer NAME are, e.g. --layer RECESS=pocket:0.3
  --join MM            join ends this close together (default 0.001 mm)
`

// byNumber returns the indices of fs in working order, features left out of it last.
func byNumber(fs []pantograph.PlannedFeature) []int {
	idx := make([]int, len(fs))
	for i := range idx {
		idx[i] = i
	}
	key := func(i int) int {
		if fs[i].Number == 0 {
			return len(fs) + 1
		}
		return fs[i].Number
	}
	sort.SliceStable(idx, func(a, b int) bool { return key(idx[a]) < key(idx[b]) })
	return idx
}
