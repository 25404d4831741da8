package main

import (
	"encoding/json"
	"fmt"
	"io"

	"github.com/spf13/pflag"

	"panto/geom"
	"panto/internal/numfmt"
	"panto/pantograph"
)

const ratiosSynopsis = "panto ratios PART --cutter D [--machine FILE] [--stylus D] [--tip round|pointed] [--style wall|groove] [--json]"

// runRatios is `panto ratios PART --cutter D [--machine FILE] [--json]`: the part at every ratio
// the machine can be set to, so a ratio can be chosen before planning.
func runRatios(args []string, stdout, stderr io.Writer) error {
	var o planFlags
	var style string
	fl := pflag.NewFlagSet("ratios", pflag.ContinueOnError)
	fl.SetOutput(io.Discard)
	addPlanFlags(fl, &o)
	fl.StringVar(&style, "style", "", "plate style: wall or groove")
	fl.BoolVar(&o.asJSON, "json", false, "print the table as JSON")
	if done, err := parseOne("ratios", partOrDrawing, ratiosSynopsis, fl, args, &o.help, stdout); done {
		return err
	}
	if fl.Changed("ratio") {
		return usagef("ratios", "ratios tries every ratio the machine can be set to: leave out --ratio")
	}
	// Any ratio will do for checking the setup; TryRatios sets each one in turn.
	if err := fl.Set("ratio", "1"); err != nil {
		return err
	}
	setup, err := o.setup(fl)
	if err != nil {
		return usagef("ratios", "%v", err)
	}
	plate := pantograph.PlateOptions{Style: pantograph.PlateStyle(style)}
	if plate.Style != "" && plate.Style != pantograph.StyleWall && plate.Style != pantograph.StyleGroove {
		return usagef("ratios", "--style must be wall or groove, got %q", style)
	}
	part, err := readPart("ratios", fl.Arg(0), o, stderr)
	if err != nil {
		return err
	}
	var m *pantograph.Machine
	if o.machine != "" {
		mc, err := readMachine("ratios", o.machine)
		if err != nil {
			return err
		}
		m = &mc
	}
	cs, err := pantograph.TryRatios(part, setup, m, plate)
	if err != nil {
		return planError("ratios", fl.Arg(0), err)
	}
	if o.asJSON {
		return writeRatiosJSON(stdout, cs, part.Units)
	}
	writeRatios(stdout, part, m, setup, cs)
	return nil
}

// writeRatios prints one row per ratio and the largest ratios that print whole and fit.
func writeRatios(w io.Writer, part pantograph.Part, m *pantograph.Machine, s pantograph.Setup, cs []pantograph.RatioCandidate) {
	u := part.Units
	on := "no machine file: no copy-table or bed check"
	if m != nil {
		on = "on " + machineName(*m)
	}
	fmt.Fprintf(w, "ratios for %s with a Ø%s cutter, %s\n\n", part.Name, u.Length(s.Cutter), on)
	fmt.Fprintf(w, "%6s  %-21s  %-21s  %-10s  %-16s  %-30s  %s\n", "ratio", "template (mm)", "plate (mm)", "copy table",
		"printer bed", "stylus: matched, owned, δ", "print error at the part")
	for _, c := range cs {
		table := "fits"
		if !c.FitsCopyTable {
			table = "too large"
		}
		fmt.Fprintf(w, "%6s  %-21s  %-21s  %-10s  %-16s  %-30s  ±%s\n", num(c.Ratio)+":1", size(c.Template),
			size(c.Plate.Size), table, bedWords(c.Plate), stylusWords(c, u), u.Length(c.TemplateError))
	}
	fmt.Fprintln(w)
	if r, ok := pantograph.LargestOnePiece(cs); ok {
		fmt.Fprintf(w, "largest ratio that prints in one piece and fits the copy table: %s:1\n", num(r))
	} else {
		fmt.Fprintf(w, "no ratio prints in one piece and fits the copy table\n")
	}
	if r, ok := pantograph.LargestOnTable(cs); ok {
		fmt.Fprintf(w, "largest ratio that fits the copy table: %s:1\n", num(r))
	} else {
		fmt.Fprintf(w, "no ratio fits the copy table\n")
	}
}

// size formats a footprint in mm: "208 x 216".
func size(v geom.Vec) string { return numfmt.Trim(v.X, 1) + " x " + numfmt.Trim(v.Y, 1) }

// bedWords says how the plate prints: "one piece", "one piece, turned", "4 pieces".
func bedWords(f pantograph.PrintFit) string {
	switch {
	case f.Tiles == 0:
		return "no plate"
	case f.Bed.X == 0:
		return "(no bed stated)"
	case f.Tiles == 1 && f.Turned:
		return "one piece, turned"
	case f.Tiles == 1:
		return "one piece"
	}
	return fmt.Sprintf("%d pieces", f.Tiles)
}

// stylusWords gives the matched stylus, the owned one and its compensation.
func stylusWords(c pantograph.RatioCandidate, u pantograph.Units) string {
	s := "Ø" + u.Number(c.Matched)
	if c.Chosen != nil {
		s += fmt.Sprintf(", %q", c.Chosen.Stylus.Name)
	}
	return s + ", δ " + u.Length(c.Compensation)
}

// ratiosJSON is what `panto ratios --json` prints; lengths are mm.
type ratiosJSON struct {
	Units           string          `json:"units"`
	Candidates      []candidateJSON `json:"candidates"`
	LargestOnePiece *float64        `json:"largest_one_piece"`
	LargestOnTable  *float64        `json:"largest_on_table"`
}

type candidateJSON struct {
	Ratio         float64     `json:"ratio"`
	TemplateSize  [2]float64  `json:"template_size"`
	PlateSize     [2]float64  `json:"plate_size"`
	FitsCopyTable bool        `json:"fits_copy_table"`
	FitsBed       bool        `json:"fits_bed"`
	Turned        bool        `json:"turned_on_bed"`
	Tiles         int         `json:"tiles"`
	MatchedStylus float64     `json:"matched_stylus"`
	ChosenStylus  *chosenJSON `json:"chosen_stylus"`
	Compensation  float64     `json:"compensation"`
	TemplateError float64     `json:"template_error_at_part"`
	Done          bool        `json:"done"`
}

// writeRatiosJSON prints the candidates as one JSON object.
func writeRatiosJSON(w io.Writer, cs []pantograph.RatioCandidate, u pantograph.Units) error {
	out := ratiosJSON{Units: string(u), Candidates: []candidateJSON{}}
	if out.Units == "" {
		out.Units = string(pantograph.MM)
	}
	for _, c := range cs {
		cj := candidateJSON{Ratio: c.Ratio, TemplateSize: [2]float64{round(c.Template.X), round(c.Template.Y)},
			PlateSize: [2]float64{round(c.Plate.Size.X), round(c.Plate.Size.Y)}, FitsCopyTable: c.FitsCopyTable,
			FitsBed: c.Plate.FitsBed, Turned: c.Plate.Turned, Tiles: c.Plate.Tiles, MatchedStylus: round(c.Matched),
			Compensation: round(c.Compensation), TemplateError: round(c.TemplateError), Done: c.Done}
		if ch := c.Chosen; ch != nil {
			cj.ChosenStylus = &chosenJSON{Name: ch.Stylus.Name, Diameter: round(ch.Stylus.Diameter), Tip: string(ch.Stylus.Tip)}
		}
		out.Candidates = append(out.Candidates, cj)
	}
	if r, ok := pantograph.LargestOnePiece(cs); ok {
		out.LargestOnePiece = &r
	}
	if r, ok := pantograph.LargestOnTable(cs); ok {
		out.LargestOnTable = &r
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(out)
}

const ratiosUsage = `Usage: ` + ratiosSynopsis + `

Plans PART, a part file or a DXF or SVG drawing, at every ratio the machine can be set to (its
fixed settings, or its range in steps of 0.5; without --machine, 2:1 to 10:1 with no copy-table
or bed check) and gives one row for each: the template's size, the plate's size as printed,
whether the template fits the copy table's travel, whether the plate prints in one piece on the
machine file's printer bed (turned a quarter turn when that helps) or in how many pieces, the
matched stylus (ratio × cutter), the nearest stylus owned and the compensation δ it needs, and
what the printer's own error comes to at the part: [printer] accuracy (default 0.1 mm) ÷ ratio.
It ends with the largest ratio that prints in one piece and the largest that fits the copy
table. The larger the ratio the smaller the print's error at the part.

Flags: --cutter D (required), --machine FILE, --stylus D, --tip round|pointed, --style
wall|groove (the plate's), and for a drawing --thickness, --material and the reading flags
of 'panto help import'.
  --json   print one object instead: units, candidates [{ratio, template_size [x, y],
           plate_size [x, y], fits_copy_table, fits_bed, turned_on_bed, tiles,
           matched_stylus, chosen_stylus {name, diameter, tip} (null without a machine file),
           compensation, template_error_at_part, done}], largest_one_piece, largest_on_table
           (null when none); lengths in mm
`
