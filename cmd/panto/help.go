package main

import (
	"fmt"
	"io"

	"panto/pantograph/cad"
)

const usage = `panto prepares parts for a manual pantograph mill.

Usage:
  panto check PART [--json] [--units mm|in]   check a part file and say what limits the cutter
  panto plan PART --ratio R --cutter D [...]  plan the template: sizes, compensation, order of work
  panto stylus --ratio R --cutter D [...]     the stylus for a cutter, or the cutter for a stylus
  panto ratios PART --cutter D [...]          every ratio the machine can be set to: template and
                                              plate sizes, copy table, printer bed, stylus
  panto import DRAWING [-o PART.toml] [...]   make a part file from a DXF or SVG drawing
  panto sheet PART --ratio R --cutter D [...] write the dial-reading sheet (PDF, text, CSV, JSON)
  panto make PART --ratio R --cutter D -o DIR write the template plate (STL), sheet and drawings
                                              (SVG, PDF, and DXF for a laser or CNC router)
  panto help [COMMAND]                        show this help, or a command's help
  panto help materials [--machine FILE]       the stock materials and their cutting speeds
  panto --version                             show panto's version

A part file is a TOML description of the part in its own drawing units: see the files in
samples/ for whole examples, and 'panto help check' for what check reports. plan, sheet and
make also take a DXF or SVG drawing as PART, with --thickness MM for the stock.

Exit codes: 0 done (warnings may be printed), 1 the job could not be done,
2 bad usage or a bad part file.
`

const checkUsage = `Usage: panto check PART [--json] [--min-wall MM] [--units mm|in]

Reads the part file PART, checks it, and prints a short summary: the part's size and area,
its features, the smallest inside corner radius and the narrowest gap, and from those the
largest cutter that makes the part as drawn. Problems are listed after the summary and
repeated on standard error as FILE:LINE: lines.

Errors (a feature outside the profile, holes overlapping, a pocket deeper than the stock,
a depth missing, an outline that crosses itself) make the file bad: exit code 2.
Warnings (a wall thinner than --min-wall, a feature inside an opening) leave it at 0.

Lengths are printed in the units the part was drawn in, or those --units names. The JSON is
in millimetres whatever the part's units.

Flags:
  --json          print the summary as one JSON object instead:
                    name, file, units ("mm" or "in": the drawing's units)
                    stock {material, thickness}
                    bounds {min: [x, y], max: [x, y]}      the profile's extent
                    area            mm²: the profile less every through opening
                                    (cut-outs, through slots, through holes)
                    min_inside_radius, min_inside_radius_feature
                                    smallest inside corner radius (null if none)
                    narrowest_gap, narrowest_gap_feature
                                    narrowest place a cutter must pass (null if none);
                                    drilled holes and grooves do not count
                    largest_cutter  largest cutter diameter that makes the part as drawn
                                    (null when nothing limits it)
                    sharp_inside_corners  true when some inside corner is sharp
                    features [{name, kind, count}]
                    problems [{severity, feature, message, line, amount}]
  --min-wall MM   warn about walls thinner than MM (default %g)
  --units mm|in   print lengths in millimetres or inches (default: the part's own units)
  -h, --help      show this help
`

const stylusUsage = `Usage: panto stylus --ratio R --cutter D [--stylus D | --machine FILE] [--units mm|in] [--json]
       panto stylus --ratio R --stylus D [--units mm|in] [--json]

The stylus traces the template as the cutter cuts the part, R times larger, so the stylus that
needs no compensation is R times the cutter:

  --ratio 10 --cutter 0.3        the matched stylus, 3.000 mm
  --ratio 10 --stylus 5          the matched cutter, 0.500 mm
  --ratio 10 --cutter 0.5 --stylus 4.3
                                 the compensation that stylus needs: the template's edges
                                 move by δ = R × cutter radius − stylus radius (here +0.350 mm):
                                 positive, the outline grows and openings shrink; negative,
                                 the other way round
  --machine FILE --ratio 10 --cutter 0.5
                                 the nearest stylus the machine file lists (ties go to the
                                 larger), its compensation, and a warning when the machine's
                                 linkage cannot be set to the ratio

A pointed stylus traces with its point, as if its diameter were 0.

Flags:
  --ratio R         ratio the linkage is set to, template size : part size (at least 1)
  --cutter D        cutter diameter
  --stylus D        stylus diameter
  --machine FILE    machine file whose [[stylus]] set to choose from
  --units mm|in     units of --cutter, --stylus and every length printed (default mm);
                    millimetres print with 3 decimals, inches with 4
  --json            print one JSON object instead: units, ratio, cutter,
                    stylus (the diameter traced with: 0 for a pointed one),
                    matched_stylus, matched_cutter, machine (its file), ratio_allowed,
                    chosen_stylus {name, diameter, tip}, compensation (on the template),
                    compensation_at_part, direction ("grow", "shrink", "none" or "");
                    lengths in --units, null when not worked out
  -h, --help        show this help

Exit codes: 0 done, 1 the machine file lists no styli, 2 bad flags or a bad machine file.
`

// runHelp prints the general help or a command's help.
func runHelp(args []string, stdout io.Writer) error {
	var err error
	switch {
	case len(args) == 0, args[0] == "help", args[0] == "-h", args[0] == "--help":
		_, err = fmt.Fprint(stdout, usage)
	case args[0] == "check":
		_, err = fmt.Fprintf(stdout, checkUsage, defaultMinWall)
	case args[0] == "plan":
		_, err = fmt.Fprint(stdout, planUsage)
	case args[0] == "stylus":
		_, err = fmt.Fprint(stdout, stylusUsage)
	case args[0] == "import":
		_, err = fmt.Fprintf(stdout, importUsage, cad.DefaultHoleMaxMM)
	case args[0] == "sheet":
		_, err = fmt.Fprint(stdout, sheetUsage)
	case args[0] == "make":
		_, err = fmt.Fprint(stdout, makeUsage)
	case args[0] == "ratios":
		_, err = fmt.Fprint(stdout, ratiosUsage)
	case args[0] == "materials":
		return runMaterialsHelp(args[1:], stdout)
	default:
		return &exitError{exitUsage, fmt.Sprintf("panto: no help for %q: there is no such command", args[0])}
	}
	return err
}
