package main

import (
	"fmt"
	"io"

	"github.com/spf13/pflag"

	"panto/pantograph"
	"panto/pantograph/partfile"
)

// defaultMinWall is shown in the help; the value lives in pantograph.
const defaultMinWall = pantograph.DefaultMinWall

// runCheck is `panto check PART [--json] [--min-wall MM]`.
func runCheck(args []string, stdout, stderr io.Writer) error {
	fl := pflag.NewFlagSet("check", pflag.ContinueOnError)
	fl.SetOutput(io.Discard)
	asJSON := fl.Bool("json", false, "print the summary as JSON")
	minWall := fl.Float64("min-wall", defaultMinWall, "warn about walls thinner than this, in mm")
	units := fl.String("units", "", "units to print lengths in: mm or in (default: the part's)")
	help := fl.BoolP("help", "h", false, "show help")
	if done, err := parseOne("check", "part file", checkSynopsis, fl, args, help, stdout); done {
		return err
	}
	if !(*minWall >= 0) {
		return usagef("check", "--min-wall must be 0 or more, got %g", *minWall)
	}
	if u := pantograph.Units(*units); u != "" && u != pantograph.MM && u != pantograph.Inch {
		return usagef("check", "--units must be mm or in, got %q", *units)
	}
	part, err := partfile.ReadFile(fl.Arg(0))
	if err != nil {
		return badFile("check", "part file", err)
	}
	u := pantograph.Units(*units)
	if u == "" {
		u = part.Units
	}
	s := pantograph.Summarize(part, pantograph.Options{MinWall: *minWall, Units: u})
	if *asJSON {
		if err := writeCheckJSON(stdout, part, s); err != nil {
			return err
		}
	} else {
		writeSummary(stdout, part, s, u)
	}
	for _, p := range s.Problems {
		fmt.Fprintln(stderr, p.Diagnostic())
	}
	if pantograph.HasErrors(s.Problems) {
		return &exitError{code: exitUsage}
	}
	return nil
}

const checkSynopsis = "panto check PART [--json] [--min-wall MM] [--units mm|in]"
