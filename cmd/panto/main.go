// Command panto turns a part description into what a manual pantograph mill needs. For now it
// checks part files: `panto check PART` says whether the part is well formed and what limits
// the cutter. Run `panto help` for usage.
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
	if len(args) == 0 {
		fmt.Fprint(stderr, usage)
		return exitUsage
	}
	switch cmd, rest := args[0], args[1:]; cmd {
	case "help", "-h", "--help":
		return runHelp(rest, stdout, stderr)
	case "version", "--version":
		fmt.Fprintf(stdout, "panto %s\n", version)
		return exitOK
	case "check":
		return runCheck(rest, stdout, stderr)
	case "plan":
		return runPlan(rest, stdout, stderr)
	case "sheet":
		return runSheet(rest, stdout, stderr)
	case "make":
		return runMake(rest, stdout, stderr)
	case "stylus":
		return runStylus(rest, stdout, stderr)
	case "import":
		return runImport(rest, stdout, stderr)
	default:
		fmt.Fprintf(stderr, "panto: unknown command %q\nRun 'panto help' to see the commands.\n", cmd)
		return exitUsage
	}
}
