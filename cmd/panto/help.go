package main

import (
	"fmt"
	"io"
)

const usage = `panto prepares parts for a manual pantograph mill.

Usage:
  panto check PART [--json] [--min-wall MM]   check a part file and say what limits the cutter
  panto plan PART --ratio R --cutter D [...]  plan the template: sizes, compensation, order of work
  panto help [COMMAND]                        show this help, or a command's help
  panto --version                             show panto's version

A part file is a TOML description of the part in its own drawing units: see the files in
samples/ for whole examples, and 'panto help check' for what check reports.

Exit codes: 0 done (warnings may be printed), 1 the job could not be done,
2 bad usage or a bad part file.
`

const checkUsage = `Usage: panto check PART [--json] [--min-wall MM]

Reads the part file PART, checks it, and prints a short summary: the part's size and area,
its features, the smallest inside corner radius and the narrowest gap, and from those the
largest cutter that makes the part as drawn. Problems are listed after the summary and
repeated on standard error as FILE:LINE: lines.

Errors (a feature outside the profile, holes overlapping, a pocket deeper than the stock,
a depth missing, an outline that crosses itself) make the file bad: exit code 2.
Warnings (a wall thinner than --min-wall, a feature inside an opening) leave it at 0.

Every length is in millimetres, whatever units the file was drawn in.

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
  -h, --help      show this help
`

// runHelp prints the general help or a command's help.
func runHelp(args []string, stdout, stderr io.Writer) int {
	switch {
	case len(args) == 0:
		fmt.Fprint(stdout, usage)
	case args[0] == "check":
		fmt.Fprintf(stdout, checkUsage, defaultMinWall)
	case args[0] == "plan":
		fmt.Fprint(stdout, planUsage)
	default:
		fmt.Fprintf(stderr, "panto: no help for %q: there is no such command\n", args[0])
		return exitUsage
	}
	return exitOK
}
