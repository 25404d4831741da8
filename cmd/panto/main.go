// Command panto prepares parts for a manual pantograph mill. It checks a part file against the
// cutters at hand (check), works out the stylus and its compensation (stylus), plans the
// template and the order of work (plan), writes the dial-reading sheet (sheet) or everything
// the machine needs into one folder (make: the template plate, true-scale drawings, DXF for a
// laser and the sheet), and turns a DXF or SVG drawing into a part file (import). Run
// `panto help` for usage.
//
// run is the whole program behind main, so tests call it in-process. Each command returns an
// error carrying its exit code (exitError) and run prints it once; reports for the terminal
// are written in this package, files are encoded by the export packages.
package main

import (
	"fmt"
	"io"
	"os"
)

// version is panto's release; it is printed by `panto --version`.
const version = "0.1.0-dev"

// Exit codes, as DESIGN.md sets them.
const (
	exitOK     = 0 // done; warnings may have been printed
	exitFailed = 1 // the job could not be done
	exitUsage  = 2 // bad usage or a bad input file
)

func main() { os.Exit(run(os.Args[1:], os.Stdout, os.Stderr)) }

// run is the whole program behind main, so tests can run it in-process.
func run(args []string, stdout, stderr io.Writer) int {
	return exitCode(dispatch(args, stdout, stderr), stderr)
}

// dispatch runs the command args name.
func dispatch(args []string, stdout, stderr io.Writer) error {
	if len(args) == 0 {
		fmt.Fprint(stderr, usage)
		return &exitError{code: exitUsage}
	}
	cmd, rest := args[0], args[1:]
	switch cmd {
	case "help", "-h", "--help":
		return runHelp(rest, stdout)
	case "version", "--version":
		_, err := fmt.Fprintf(stdout, "panto %s\n", version)
		return err
	}
	commands := map[string]func(args []string, stdout, stderr io.Writer) error{
		"check": runCheck, "plan": runPlan, "sheet": runSheet, "make": runMake,
		"stylus": runStylus, "import": runImport, "ratios": runRatios,
	}
	if c, ok := commands[cmd]; ok {
		return c(rest, stdout, stderr)
	}
	return &exitError{exitUsage, fmt.Sprintf("panto: unknown command %q\nRun 'panto help' to see the commands.", cmd)}
}
