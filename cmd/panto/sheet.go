package main

import (
	"fmt"
	"io"
	"os"
	"path/filepath"
	"time"

	"github.com/spf13/pflag"
)

// sheetFlags are the options of `panto sheet` beyond those it shares with `panto plan`.
type sheetFlags struct {
	outputFlags
	print bool
}

// outputFlags are the options of sheet and make for the files they write.
type outputFlags struct {
	out, paper, date string
	force            bool
}

// addOutputFlags declares the flags of outputFlags; out is the folder written into when -o is
// not given ("" when -o is required).
func addOutputFlags(fl *pflag.FlagSet, o *outputFlags, out string) {
	fl.StringVarP(&o.out, "out", "o", out, "folder to write into")
	fl.StringVar(&o.paper, "paper", "a4", "paper size: a4 or letter")
	fl.StringVar(&o.date, "date", "", "date printed on the sheet (default today)")
	fl.BoolVar(&o.force, "force", false, "overwrite existing files")
}

// dateToday puts today's date, UTC, on the sheet when --date was not given.
func (o *outputFlags) dateToday() {
	if o.date == "" {
		o.date = time.Now().UTC().Format("2006-01-02")
	}
}

const sheetSynopsis = "panto sheet PART --ratio R --cutter D [--machine FILE] [--out DIR] [--paper a4|letter] [--print] [--force]"

// runSheet is `panto sheet PART ...`: plan the part and write the dial-reading sheet.
func runSheet(args []string, stdout, stderr io.Writer) error {
	var o planFlags
	var so sheetFlags
	fl := pflag.NewFlagSet("sheet", pflag.ContinueOnError)
	fl.SetOutput(io.Discard)
	addPlanFlags(fl, &o)
	addOutputFlags(fl, &so.outputFlags, ".")
	fl.BoolVar(&so.print, "print", false, "also print the sheet on standard output")
	if done, err := parseOne("sheet", partOrDrawing, sheetSynopsis, fl, args, &o.help, stdout); done {
		return err
	}
	setup, err := o.setup(fl)
	if err != nil {
		return usagef("sheet", "%v", err)
	}
	so.dateToday()
	j, err := readAndPlan("sheet", fl.Arg(0), o, setup, stderr)
	if err != nil {
		return err
	}
	p := j.plan
	if !p.Done() {
		return planOutcome("sheet", p)
	}
	files, err := sheetFiles(p, j.machine, so.paper, so.date)
	if err != nil {
		return usagef("sheet", "%v", err)
	}
	if err := writeOutputs(so.out, files, so.force); err != nil {
		return failf("sheet", "%v", err)
	}
	if so.print {
		stdout.Write(files[len(files)-1].data) // sheet.txt is last
	}
	warnPlan(stderr, p)
	return nil
}

// outputFile is one file to write: its name in the output folder and its bytes.
type outputFile struct {
	name string
	data []byte
}

// writeOutputs writes every file into dir, each to a temporary name first and then renamed, so
// an interrupted run leaves no half file. Without force nothing is written if any file exists.
func writeOutputs(dir string, files []outputFile, force bool) error {
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return fmt.Errorf("cannot make the output folder: %w", err)
	}
	if !force {
		for _, f := range files {
			p := filepath.Join(dir, f.name)
			if _, err := os.Stat(p); err == nil {
				return fmt.Errorf("%s exists; pass --force to overwrite it, or choose another --out folder", p)
			}
		}
	}
	var temps []string
	defer func() {
		for _, t := range temps {
			os.Remove(t)
		}
	}()
	for _, f := range files {
		tmp, err := os.CreateTemp(dir, "."+f.name+".*.tmp")
		if err != nil {
			return fmt.Errorf("cannot write in %s: %w", dir, err)
		}
		temps = append(temps, tmp.Name())
		_, err = tmp.Write(f.data)
		if err == nil {
			err = tmp.Chmod(0o644)
		}
		if cerr := tmp.Close(); err == nil {
			err = cerr
		}
		if err != nil {
			return fmt.Errorf("cannot write %s: %w", f.name, err)
		}
	}
	for i, f := range files {
		if err := os.Rename(temps[i], filepath.Join(dir, f.name)); err != nil {
			return fmt.Errorf("cannot write %s: %w", f.name, err)
		}
	}
	temps = nil
	return nil
}

const sheetUsage = `Usage: ` + sheetSynopsis + `

Plans PART, a part file or a DXF or SVG drawing, as 'panto plan' does (same flags: --ratio,
--cutter, --cutter-for, --stylus, --tip, --machine, --mirror, --rotate, --accept-loss,
--mill-holes, --datum, --thickness, --material, and --units, --hole-max, --layer, --join
for a drawing) and writes the dial-reading sheet for the machine into the folder --out:

  sheet.pdf    to print, A4 or Letter (--paper), one block per step with a box to tick
  sheet.txt    the same as plain text (--print also shows it here)
  sheet.csv    one line per step, for a spreadsheet
  sheet.json   the same for scripts

Each step gives where the feature is from the datum, in template mm on the copy table and part
mm on the work table, as turns and divisions of each dial (with the part of a division the
dial cannot show, and what it is worth at the part); where to wind back first when the dial
must reverse; the depth of each pass or peck on the depth dial; and the spindle speed, with a
feed guide for micro tools. The dials, spindle and tools come from the machine file; without
one, positions are given in mm only. The sheet ends with the plan's warnings, the rules used
and the safety cautions.

Existing files are not overwritten unless --force is given; each file is written under a
temporary name and renamed, so an interrupted run leaves no half file.

Flags (besides the plan flags):
  -o, --out DIR         folder to write into (default: the current folder)
      --paper a4|letter paper size of sheet.pdf (default a4)
      --print           print sheet.txt on standard output too
      --date TEXT       date printed in the header (default: today, UTC)
      --force           overwrite existing files
`
