package main

import (
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"math"
	"strings"

	"github.com/spf13/pflag"

	"panto/internal/numfmt"
	"panto/pantograph"
	"panto/pantograph/partfile"
)

// stylusSynopsis is the usage line printed with a flag mistake.
const stylusSynopsis = "Usage: panto stylus --ratio R (--cutter D | --stylus D | --cutter D --stylus D)\n" +
	"                    [--machine FILE] [--units mm|in] [--json]\n"

// stylusArgs are the flags of `panto stylus`, with lengths already in mm.
type stylusArgs struct {
	ratio, cutter, stylus float64
	hasCutter, hasStylus  bool
	machine               string
	inch, json            bool
}

// runStylus is `panto stylus --ratio R (--cutter D | --stylus D | both) [--machine FILE]`.
func runStylus(args []string, stdout, stderr io.Writer) error {
	a, done, err := parseStylus(args, stdout)
	if done {
		return err
	}
	rep := stylusReport{args: a, units: pantograph.MM}
	if a.inch {
		rep.units = pantograph.Inch
	}
	if a.machine != "" {
		m, err := partfile.ReadMachineFile(a.machine)
		if err != nil {
			return badFile("stylus", "machine file", err)
		}
		rep.machine = &m
	}
	rep.work()
	if a.json {
		err = rep.writeJSON(stdout)
	} else {
		err = rep.writeText(stdout)
	}
	if err != nil {
		return err
	}
	warn(stderr, "panto stylus: warning: ", rep.warnings)
	if rep.failure != "" {
		return failf("stylus", "%s", rep.failure)
	}
	return nil
}

// parseStylus reads and checks the flags; done is true when the command ends here with err.
func parseStylus(args []string, stdout io.Writer) (a stylusArgs, done bool, err error) {
	fl := pflag.NewFlagSet("stylus", pflag.ContinueOnError)
	fl.SetOutput(io.Discard)
	fl.Float64Var(&a.ratio, "ratio", 0, "ratio R, template size : part size")
	fl.Float64Var(&a.cutter, "cutter", 0, "cutter diameter")
	fl.Float64Var(&a.stylus, "stylus", 0, "stylus diameter")
	fl.StringVar(&a.machine, "machine", "", "machine file")
	units := fl.String("units", "mm", `"mm" or "in"`)
	fl.BoolVar(&a.json, "json", false, "print JSON")
	help := fl.BoolP("help", "h", false, "show help")
	err = fl.Parse(args)
	switch {
	case err != nil:
	case *help:
		return a, true, runHelp([]string{"stylus"}, stdout)
	case fl.NArg() > 0:
		err = fmt.Errorf("unexpected argument %q: every value goes with a flag", fl.Arg(0))
	case *units != "mm" && *units != "in":
		err = fmt.Errorf(`--units must be "mm" or "in", got %q`, *units)
	case !fl.Changed("ratio"):
		err = errors.New("--ratio missing: give the ratio the linkage is set to, e.g. --ratio 10")
	default:
		a.hasCutter, a.hasStylus = fl.Changed("cutter"), fl.Changed("stylus")
		err = a.check()
	}
	if err != nil {
		return a, true, usagef("stylus", "%v\n%sRun 'panto help stylus' for more.", err, stylusSynopsis)
	}
	if a.inch = *units == "in"; a.inch {
		a.cutter *= pantograph.MMPerInch
		a.stylus *= pantograph.MMPerInch
	}
	return a, false, nil
}

// check says what is wrong with a combination of flags, or nil.
func (a stylusArgs) check() error {
	switch {
	case !(a.ratio >= 1) || math.IsInf(a.ratio, 0):
		return fmt.Errorf("--ratio is template size : part size and must be at least 1, got %g", a.ratio)
	case !a.hasCutter && !a.hasStylus:
		return errors.New("give --cutter (to find its stylus) or --stylus (to find its cutter), or both")
	case a.hasCutter && !isSize(a.cutter):
		return fmt.Errorf("--cutter must be a diameter greater than 0, got %g", a.cutter)
	case a.hasStylus && !isSize(a.stylus):
		return fmt.Errorf("--stylus must be a diameter greater than 0, got %g", a.stylus)
	case a.machine != "" && !a.hasCutter:
		return errors.New("--machine needs --cutter: panto picks the stylus for that cutter from the machine's set")
	case a.machine != "" && a.hasStylus:
		return errors.New("give --stylus or --machine, not both: with --machine panto picks the stylus from the machine's set")
	}
	return nil
}

func isSize(v float64) bool { return v > 0 && !math.IsInf(v, 1) }

// stylusReport is what `panto stylus` found, ready to print.
type stylusReport struct {
	args    stylusArgs
	units   pantograph.Units
	machine *pantograph.Machine

	matchedStylus, matchedCutter float64 // mm; 0 when not worked out
	stylus                       float64 // the stylus compensated for, mm
	choice                       *pantograph.StylusChoice
	delta                        float64 // δ in template mm
	direction                    pantograph.Direction
	compensated                  bool // a stylus and cutter pair was worked out: delta and direction hold
	warnings                     []string
	failure                      string // why the job could not be done; "" when it was
}

// work does the arithmetic; the library holds the rules, this only picks which ones apply.
func (r *stylusReport) work() {
	a := r.args
	if a.hasCutter {
		r.matchedStylus = pantograph.MatchedStylus(a.ratio, a.cutter)
	} else {
		r.matchedCutter = pantograph.MatchedCutter(a.ratio, a.stylus)
	}
	r.stylus = a.stylus
	if a.hasCutter && a.hasStylus {
		r.delta = pantograph.Compensation(a.ratio, a.cutter, a.stylus)
		r.direction, r.compensated = pantograph.DirectionOf(r.delta), true
	}
	if r.machine == nil {
		return
	}
	if !r.machine.Ratio.Allows(a.ratio) {
		r.warnings = append(r.warnings, fmt.Sprintf("%s cannot be set to %g:1 (its ratio: %s)",
			machineName(*r.machine), a.ratio, r.machine.Ratio))
	}
	c, ok := pantograph.ChooseStylus(*r.machine, a.ratio, a.cutter, "")
	if !ok {
		r.failure = fmt.Sprintf("%s lists no styli: add a [[stylus]] table for each one you own", r.machine.Source)
		return
	}
	r.choice, r.stylus = &c, c.Stylus.TracingDiameter()
	r.delta, r.direction, r.compensated = c.Compensation, c.Direction, true
}

// machineName names the machine in messages: its name, or its file.
func machineName(m pantograph.Machine) string {
	if m.Name != "" {
		return "the " + m.Name
	}
	return m.Source
}

// length formats a length given in mm in the report's units: 3 decimals for mm (a micrometre),
// 4 for inches (a ten-thousandth), as the help says.
func (r *stylusReport) length(mm float64) string {
	if r.units == pantograph.Inch {
		return numfmt.Fixed(mm/pantograph.MMPerInch, 4) + " in"
	}
	return numfmt.Fixed(mm, 3) + " mm"
}

// writeText prints the report as a few labelled lines.
func (r *stylusReport) writeText(w io.Writer) error {
	var b strings.Builder
	line := func(label, text string) { fmt.Fprintf(&b, "%-16s%s\n", label, text) }
	a := r.args
	if m := r.machine; m != nil {
		line("machine", fmt.Sprintf("%s (%s)", nameOr(m.Name, "unnamed"), m.Source))
	}
	line("ratio", fmt.Sprintf("%g:1", a.ratio))
	if a.hasCutter {
		line("cutter", r.length(a.cutter))
		line("matched stylus", r.length(r.matchedStylus)+"   (ratio × cutter; needs no compensation)")
	} else {
		line("stylus", r.length(a.stylus))
		line("matched cutter", r.length(r.matchedCutter)+"   (stylus ÷ ratio)")
	}
	if c := r.choice; c != nil {
		line("nearest owned", fmt.Sprintf("%q, %s", c.Stylus.Name, r.describeStylus(c.Stylus)))
	} else if a.hasCutter && a.hasStylus {
		line("stylus", r.length(a.stylus))
	}
	if r.compensated {
		r.compensationLines(line)
	}
	_, err := io.WriteString(w, b.String())
	return err
}

// describeStylus says a stylus's size and tip; a pointed one traces with its point.
func (r *stylusReport) describeStylus(s pantograph.Stylus) string {
	if s.Tip == pantograph.TipPointed {
		return "pointed (traces with its point, as a 0 diameter)"
	}
	return r.length(s.Diameter) + " round"
}

// compensationLines prints δ and which way the template moves.
func (r *stylusReport) compensationLines(line func(label, text string)) {
	d := math.Abs(r.delta)
	if r.direction == pantograph.DirectionNone {
		line("compensation", fmt.Sprintf("none: the stylus matches; the template is the part enlarged %g times, with no offset", r.args.ratio))
		return
	}
	sign := "+"
	if r.delta < 0 {
		sign = "-"
	}
	line("compensation", fmt.Sprintf("%s%s on the template (δ = ratio × cutter radius − stylus radius)",
		sign, r.length(d)))
	if r.direction == pantograph.DirectionGrow {
		line("", fmt.Sprintf("the template's outline must grow by %s; openings shrink by %s", r.length(d), r.length(d)))
	} else {
		line("", fmt.Sprintf("the template's outline must shrink by %s; openings grow by %s", r.length(d), r.length(d)))
	}
	line("", fmt.Sprintf("left out, every traced edge would be off by %s at the part", r.length(d/r.args.ratio)))
}

func nameOr(s, alt string) string {
	if s == "" {
		return alt
	}
	return s
}

// stylusJSON is what `panto stylus --json` prints; lengths are in Units, null when not
// worked out.
type stylusJSON struct {
	Units         string      `json:"units"`
	Ratio         float64     `json:"ratio"`
	Cutter        *float64    `json:"cutter"`
	Stylus        *float64    `json:"stylus"`
	MatchedStylus *float64    `json:"matched_stylus"`
	MatchedCutter *float64    `json:"matched_cutter"`
	Machine       *string     `json:"machine"`
	RatioAllowed  *bool       `json:"ratio_allowed"`
	Chosen        *chosenJSON `json:"chosen_stylus"`
	Compensation  *float64    `json:"compensation"`
	AtPart        *float64    `json:"compensation_at_part"`
	Direction     string      `json:"direction"`
}

type chosenJSON struct {
	Name     string  `json:"name"`
	Diameter float64 `json:"diameter"`
	Tip      string  `json:"tip"`
}

// writeJSON prints the report as one JSON object.
func (r *stylusReport) writeJSON(w io.Writer) error {
	a := r.args
	conv := func(mm float64) *float64 {
		if r.units == pantograph.Inch {
			mm /= pantograph.MMPerInch
		}
		v := numfmt.JSON(mm)
		return &v
	}
	out := stylusJSON{Units: string(r.units), Ratio: a.ratio}
	if r.compensated {
		out.Direction = r.direction.Word()
	}
	if a.hasCutter {
		out.Cutter, out.MatchedStylus = conv(a.cutter), conv(r.matchedStylus)
	} else {
		out.MatchedCutter = conv(r.matchedCutter)
	}
	if a.hasStylus || r.choice != nil {
		out.Stylus = conv(r.stylus)
	}
	if m := r.machine; m != nil {
		allowed := m.Ratio.Allows(a.ratio)
		out.Machine, out.RatioAllowed = &m.Source, &allowed
	}
	if c := r.choice; c != nil {
		out.Chosen = &chosenJSON{Name: c.Stylus.Name, Diameter: *conv(c.Stylus.Diameter), Tip: string(c.Stylus.Tip)}
	}
	if r.compensated {
		out.Compensation, out.AtPart = conv(r.delta), conv(r.delta/a.ratio)
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(out)
}
