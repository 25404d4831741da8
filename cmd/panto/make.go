package main

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"time"

	"github.com/spf13/pflag"

	"panto/export/stl"
	"panto/pantograph"
	"panto/pantograph/drawing"
	"panto/pantograph/partfile"
)

const makeSynopsis = "panto make PART --ratio R --cutter D [--machine FILE] [--seat cone|bore] [--style wall|groove] -o DIR [--force]"

// makeFlags are the options of `panto make` beyond those it shares with `panto plan`.
type makeFlags struct {
	out, paper, date, seat, style string
	fixingSpacing                 float64
	force                         bool
}

// makeJob is everything `panto make` knows when it makes its files.
type makeJob struct {
	part    pantograph.Part
	plan    pantograph.Plan
	machine *pantograph.Machine // nil without a machine file
	plate   pantograph.PlateOptions
	paper   string
	date    string
}

// makeWriter returns some of the files `panto make` writes, and writes to report what the
// machinist should know about them. Each writer is independent, so an output is added by
// adding a writer to makeWriters, in its own file.
type makeWriter func(j makeJob, report io.Writer) ([]sheetFile, error)

// makeWriters lists what `panto make` writes, in order: the template plate (this file), then
// the dial sheet and drawings (make_sheet.go).
func makeWriters() []makeWriter {
	return []makeWriter{plateWriter, sheetWriter}
}

// runMake is `panto make PART ...`: plan the part and write the template plate, the sheet and
// the drawings into one folder.
func runMake(args []string, stdout, stderr io.Writer) int {
	var o planFlags
	var mo makeFlags
	fl := pflag.NewFlagSet("make", pflag.ContinueOnError)
	fl.SetOutput(io.Discard)
	addPlanFlags(fl, &o)
	fl.StringVarP(&mo.out, "out", "o", "", "folder to write into")
	fl.StringVar(&mo.seat, "seat", "", "seats for drilled holes: cone or bore")
	fl.StringVar(&mo.style, "style", "wall", "how traced edges are made: wall or groove")
	fl.Float64Var(&mo.fixingSpacing, "fixing-spacing", 0, "distance between fixing slots, mm")
	fl.StringVar(&mo.paper, "paper", "a4", "paper size: a4 or letter")
	fl.StringVar(&mo.date, "date", "", "date printed on the sheet (default today)")
	fl.BoolVar(&mo.force, "force", false, "overwrite existing files")
	if err := fl.Parse(args); err != nil {
		fmt.Fprintf(stderr, "panto make: %v\nRun 'panto help make' for usage.\n", err)
		return exitUsage
	}
	if o.help {
		return runHelp([]string{"make"}, stdout, stderr)
	}
	if fl.NArg() != 1 {
		fmt.Fprintf(stderr, "panto make: give exactly one part file, got %d\nUsage: %s\n", fl.NArg(), makeSynopsis)
		return exitUsage
	}
	plate, err := mo.plateOptions()
	if err == nil && mo.out == "" {
		err = fmt.Errorf("-o DIR is required: the folder to write the files into\nUsage: %s", makeSynopsis)
	}
	setup, serr := o.setup(fl)
	if err == nil {
		err = serr
	}
	if err != nil {
		fmt.Fprintf(stderr, "panto make: %v\n", err)
		return exitUsage
	}
	if mo.date == "" {
		mo.date = time.Now().UTC().Format("2006-01-02")
	}
	return makeAll(fl.Arg(0), setup, o.machine, mo, plate, stdout, stderr)
}

// plateOptions checks the plate flags.
func (mo makeFlags) plateOptions() (pantograph.PlateOptions, error) {
	p := pantograph.PlateOptions{Seat: pantograph.SeatKind(mo.seat), Style: pantograph.PlateStyle(mo.style),
		FixingSpacing: mo.fixingSpacing}
	switch {
	case p.Seat != "" && p.Seat != pantograph.SeatCone && p.Seat != pantograph.SeatBore:
		return p, fmt.Errorf("--seat must be cone or bore, got %q", mo.seat)
	case p.Style != pantograph.StyleWall && p.Style != pantograph.StyleGroove:
		return p, fmt.Errorf("--style must be wall or groove, got %q", mo.style)
	case !(mo.fixingSpacing >= 0):
		return p, fmt.Errorf("--fixing-spacing must be 0 (a slot at each corner) or more, got %g", mo.fixingSpacing)
	}
	return p, nil
}

// makeAll reads, plans, and writes every file; nothing is written unless all could be made.
func makeAll(path string, setup pantograph.Setup, machinePath string, mo makeFlags,
	plate pantograph.PlateOptions, stdout, stderr io.Writer) int {
	part, err := readPartOrDrawing(path, drawing.Options{}, stderr)
	if err != nil {
		return reportReadError(err, stderr)
	}
	j := makeJob{part: part, plate: plate, paper: mo.paper, date: mo.date}
	if machinePath != "" {
		m, err := partfile.ReadMachineFile(machinePath)
		if err != nil {
			fmt.Fprintf(stderr, "panto make: %v\n", err)
			return exitUsage
		}
		j.machine = &m
	}
	p, err := pantograph.PlanPart(part, setup, j.machine)
	var pe pantograph.PartErrors
	switch {
	case errors.As(err, &pe):
		for _, pr := range pe {
			fmt.Fprintln(stderr, pr.Error())
		}
		fmt.Fprintf(stderr, "panto make: %s has errors; fix them first (panto check shows them all)\n", path)
		return exitUsage
	case err != nil:
		fmt.Fprintf(stderr, "panto make: %v\n", err)
		return exitUsage
	}
	if !p.Done() {
		return planExit(p, stderr)
	}
	j.plan = p
	var files []sheetFile
	var report bytes.Buffer
	for _, w := range makeWriters() {
		fs, err := w(j, &report)
		if err != nil {
			fmt.Fprintf(stderr, "panto make: %v\n", err)
			return exitFailed
		}
		files = append(files, fs...)
	}
	if err := writeSheetFiles(mo.out, files, mo.force); err != nil {
		fmt.Fprintf(stderr, "panto make: %v\n", err)
		return exitFailed
	}
	stdout.Write(report.Bytes())
	for _, w := range p.Warnings {
		fmt.Fprintf(stderr, "warning: %s\n", w)
	}
	return exitOK
}

// sheetWriter returns the dial sheet and the drawings.
func sheetWriter(j makeJob, _ io.Writer) ([]sheetFile, error) {
	return makeSheetFiles(j.part, j.plan, j.machine, j.paper, j.date)
}

// plateWriter returns template.stl and reports the plate's size, its triangles and how to print
// it.
func plateWriter(j makeJob, report io.Writer) ([]sheetFile, error) {
	pl, err := pantograph.BuildPlate(j.plan, j.machine, j.plate)
	if err != nil {
		return nil, err
	}
	m, err := pl.Mesh()
	if err != nil {
		return nil, err
	}
	var b bytes.Buffer
	if err := stl.Encode(&b, m, "panto template plate: "+j.plan.Part); err != nil {
		return nil, err
	}
	writePlateReport(report, pl, len(m.Triangles), j.machine)
	return []sheetFile{{"template.stl", b.Bytes()}}, nil
}

// writePlateReport tells the machinist what was made and how to print it.
func writePlateReport(w io.Writer, pl pantograph.Plate, triangles int, m *pantograph.Machine) {
	x, y := pl.Size.X*pl.ScaleX, pl.Size.Y*pl.ScaleY
	fmt.Fprintf(w, "template.stl: plate %.1f × %.1f × %.1f mm, %d triangles\n", x, y, pl.Height, triangles)
	fmt.Fprintf(w, "  traced edges: %s, %.1f mm high; seats: %s", styleWords(pl.Style), pl.WallHeight, pl.Seat)
	if len(pl.Seats) > 0 {
		fmt.Fprintf(w, " Ø%.2f mm", pl.Seats[0].Diameter)
	}
	fmt.Fprintf(w, "; check bar %g mm, test square %g mm\n", pl.CheckBar, pl.TestSquare)
	if pl.ScaleX != 1 || pl.ScaleY != 1 {
		fmt.Fprintf(w, "  printer scale correction applied: X × %g, Y × %g\n", pl.ScaleX, pl.ScaleY)
	}
	if m != nil && m.Printer.Bed.X > 0 && m.Printer.Bed.Y > 0 {
		fits := x <= m.Printer.Bed.X && y <= m.Printer.Bed.Y || y <= m.Printer.Bed.X && x <= m.Printer.Bed.Y
		if !fits {
			fmt.Fprintf(w, "  note: the plate is larger than the printer's bed (%g × %g mm): print it elsewhere, or use a lower ratio\n",
				m.Printer.Bed.X, m.Printer.Bed.Y)
		}
	}
	for _, n := range pl.Notes {
		fmt.Fprintf(w, "  note: %s\n", n)
	}
	fmt.Fprint(w, plateAdvice)
}

// styleWords names a plate style for the report.
func styleWords(s pantograph.PlateStyle) string {
	if s == pantograph.StyleGroove {
		return "channels along the stylus path"
	}
	return "raised profile, sunk openings"
}

// plateAdvice is how to print and check the plate; the figures are common practice for FDM
// printed fixtures, not from a source.
const plateAdvice = `  print it flat, base down, at 100 % (corrections are already in the file);
  3 or more walls and 30 % infill or more, so the walls take the stylus's side load;
  PLA softens near 60 °C and creeps under steady load: clamp through the fixing slots only,
  keep the plate out of the clamping and cutting load path, and away from heat;
  measure the check bar and the test square along X and Y before use.
`

const makeUsage = `Usage: ` + makeSynopsis + `

Plans the part as 'panto plan' does (same flags: --ratio, --cutter, --cutter-for, --stylus,
--tip, --machine, --mirror, --rotate, --accept-loss, --mill-holes) and writes into the
folder DIR everything needed at the machine:

  template.stl   the template plate to print (binary STL, mm, all coordinates positive)
  sheet.*        the dial-reading sheet (PDF, text, CSV, JSON), as 'panto sheet' writes it
  template.*, part.*   the true-scale drawings (SVG and PDF)

The plate is a flat base with a fixing slot at each corner (or a pair each side
--fixing-spacing apart) and a front strip with the title, a check bar and a test square.
With --style wall (the default) the profile stands up as an island the stylus runs round,
and openings and pockets are sunk into it; edges stand one stylus diameter high, and at
least 3 mm, so a round-nosed stylus bears on its straight side and cannot ride over. With
--style groove the stylus runs in channels one stylus diameter plus 0.2 mm wide cut along
its centre path. Drilled holes get a seat: a 90° cone for a pointed stylus, or a bore of the
stylus diameter plus 0.1 mm for a round one (--seat chooses; the default follows the tip).
The datum seat has a ring round it. Each feature's number, as on the sheet, is sunk beside
it. The machine file's printer scale and hole growth are applied.

The run prints the plate's size and triangle count, and how to print it.

Existing files are not overwritten unless --force is given; each file is written under a
temporary name and renamed, so an interrupted run leaves no half file.

Flags (besides the plan flags):
  -o, --out DIR              folder to write into (required)
      --seat cone|bore       seats for drilled holes (default: cone for a pointed stylus)
      --style wall|groove    raised walls or channels for traced edges (default wall)
      --fixing-spacing MM    distance between fixing slots along X (default: at the corners)
      --paper a4|letter      paper size of the PDFs (default a4)
      --date TEXT            date printed on the sheet (default: today, UTC)
      --force                overwrite existing files
`
