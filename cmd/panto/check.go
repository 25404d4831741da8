package main

import (
	"errors"
	"fmt"
	"io"
	"io/fs"

	"github.com/spf13/pflag"

	"panto/pantograph"
	"panto/pantograph/partfile"
)

// defaultMinWall is shown in the help; the value lives in pantograph.
const defaultMinWall = pantograph.DefaultMinWall

// runCheck is `panto check PART [--json] [--min-wall MM]`.
func runCheck(args []string, stdout, stderr io.Writer) int {
	fl := pflag.NewFlagSet("check", pflag.ContinueOnError)
	fl.SetOutput(io.Discard)
	asJSON := fl.Bool("json", false, "print the summary as JSON")
	minWall := fl.Float64("min-wall", defaultMinWall, "warn about walls thinner than this, in mm")
	help := fl.BoolP("help", "h", false, "show help")
	if err := fl.Parse(args); err != nil {
		fmt.Fprintf(stderr, "panto check: %v\nRun 'panto help check' for usage.\n", err)
		return exitUsage
	}
	if *help {
		return runHelp([]string{"check"}, stdout, stderr)
	}
	if fl.NArg() != 1 {
		fmt.Fprintf(stderr, "panto check: give exactly one part file, got %d\nUsage: panto check PART [--json]\n", fl.NArg())
		return exitUsage
	}
	if !(*minWall >= 0) {
		fmt.Fprintf(stderr, "panto check: --min-wall must be 0 or more, got %g\n", *minWall)
		return exitUsage
	}
	part, err := partfile.ReadFile(fl.Arg(0))
	if err != nil {
		return reportReadError(err, stderr)
	}
	s := pantograph.Summarize(part, pantograph.Options{MinWall: *minWall})
	if *asJSON {
		if err := writeJSON(stdout, part, s); err != nil {
			fmt.Fprintf(stderr, "panto check: %v\n", err)
			return exitFailed
		}
	} else {
		writeSummary(stdout, part, s)
	}
	for _, p := range s.Problems {
		fmt.Fprintln(stderr, p.Error())
	}
	if pantograph.HasErrors(s.Problems) {
		return exitUsage
	}
	return exitOK
}

// reportReadError explains why the part file could not be read.
func reportReadError(err error, stderr io.Writer) int {
	var pe *fs.PathError
	if errors.As(err, &pe) {
		fmt.Fprintf(stderr, "panto check: cannot read the part file: %v\n", err)
		return exitUsage
	}
	fmt.Fprintln(stderr, err)
	return exitUsage
}
