package main

import (
	"bytes"
	"fmt"
	"io"

	"github.com/spf13/pflag"

	"panto/export/stl"
	"panto/pantograph"
)

const makeSynopsis = "panto make PART --ratio R --cutter D [--machine FILE] [--seat cone|bore] [--style wall|groove] [--kerf MM] -o DIR [--force]"

// makeFlags are the options of `panto make` beyond those it shares with `panto plan`.
type makeFlags struct {
	outputFlags
	seat, style         string
	fixingSpacing, kerf float64 // kerf in mm, from kerfLength
	kerfLength          lengthFlag
}

// makeJob is everything `panto make` knows when it makes its files.
type makeJob struct {
	planned
	plate pantograph.PlateOptions
	paper string
	date  string
	kerf  float64 // laser kerf for template.dxf, mm
}

// makeWriter returns some of the files `panto make` writes, and writes to report what the
// machinist should know about them. Each writer is independent, so an output is added by
// adding a writer to makeWriters, in its own file.
type makeWriter func(j makeJob, report io.Writer) ([]outputFile, error)

// makeWriters lists what `panto make` writes, in order: the template plate (this file), the
// dial sheet and drawings (make_sheet.go), then the DXF files for cutting (make_dxf.go).
func makeWriters() []makeWriter {
	return []makeWriter{plateWriter, sheetWriter, dxfWriter}
}

// runMake is `panto make PART ...`: plan the part and write the template plate, the sheet and
// the drawings into one folder.
func runMake(args []string, stdout, stderr io.Writer) error {
	var o planFlags
	var mo makeFlags
	fl := pflag.NewFlagSet("make", pflag.ContinueOnError)
	fl.SetOutput(io.Discard)
	addPlanFlags(fl, &o)
	addOutputFlags(fl, &mo.outputFlags, "")
	fl.StringVar(&mo.seat, "seat", "", "seats for drilled holes: cone or bore")
	fl.StringVar(&mo.style, "style", "", "how traced edges are made: wall or groove (default: groove for a pointed stylus, else wall)")
	fl.Float64Var(&mo.fixingSpacing, "fixing-spacing", 0, "distance between fixing slots, mm")
	fl.Var(&mo.kerfLength, "kerf", "width the laser or router cuts (mm, or give in), for template.dxf")
	if done, err := parseOne("make", partOrDrawing, makeSynopsis, fl, args, &o.help, stdout); done {
		return err
	}
	mo.kerf = mo.kerfLength.l.mm(pantograph.MM)
	plate, err := mo.plateOptions()
	if err == nil && mo.out == "" {
		err = fmt.Errorf("-o DIR is required: the folder to write the files into\nUsage: %s", makeSynopsis)
	}
	setup, serr := o.setup(fl)
	if err == nil {
		err = serr
	}
	if err != nil {
		return usagef("make", "%v", err)
	}
	mo.dateToday()
	return makeAll(fl.Arg(0), setup, o, mo, plate, stdout, stderr)
}

// plateOptions checks the plate flags.
func (mo makeFlags) plateOptions() (pantograph.PlateOptions, error) {
	p := pantograph.PlateOptions{Seat: pantograph.SeatKind(mo.seat), Style: pantograph.PlateStyle(mo.style),
		FixingSpacing: mo.fixingSpacing}
	switch {
	case p.Seat != "" && p.Seat != pantograph.SeatCone && p.Seat != pantograph.SeatBore:
		return p, fmt.Errorf("--seat must be cone or bore, got %q", mo.seat)
	case p.Style != "" && p.Style != pantograph.StyleWall && p.Style != pantograph.StyleGroove:
		return p, fmt.Errorf("--style must be wall or groove, got %q", mo.style)
	case !(mo.fixingSpacing >= 0):
		return p, fmt.Errorf("--fixing-spacing must be 0 (a slot at each corner) or more, got %g", mo.fixingSpacing)
	case !(mo.kerf >= 0 && mo.kerf < pantograph.MaxKerf):
		return p, fmt.Errorf("--kerf must be 0 or more and less than %g mm, got %g", pantograph.MaxKerf, mo.kerf)
	}
	return p, nil
}

// makeAll reads, plans, and writes every file; nothing is written unless all could be made.
func makeAll(path string, setup pantograph.Setup, o planFlags, mo makeFlags,
	plate pantograph.PlateOptions, stdout, stderr io.Writer) error {
	pj, err := readAndPlan("make", path, o, setup, stderr)
	if err != nil {
		return err
	}
	p := pj.plan
	if !p.Done() {
		return planOutcome("make", p)
	}
	if err := plate.Check(p); err != nil {
		return usagef("make", "%v", err)
	}
	j := makeJob{planned: pj, plate: plate, paper: mo.paper, date: mo.date, kerf: mo.kerf}
	var files []outputFile
	var report bytes.Buffer
	for _, w := range makeWriters() {
		fs, err := w(j, &report)
		if err != nil {
			return failf("make", "%v", err)
		}
		files = append(files, fs...)
	}
	if err := writeOutputs(mo.out, files, mo.force); err != nil {
		return failf("make", "%v", err)
	}
	stdout.Write(report.Bytes())
	fmt.Fprintf(stdout, "wrote %d files in %s:", len(files), mo.out)
	for _, f := range files {
		fmt.Fprintf(stdout, " %s", f.name)
	}
	fmt.Fprintln(stdout)
	warnPlan(stderr, p)
	return nil
}

// sheetWriter returns the dial sheet and the drawings.
func sheetWriter(j makeJob, _ io.Writer) ([]outputFile, error) {
	return sheetAndDrawingFiles(j.part, j.plan, j.machine, j.paper, j.date)
}

// plateWriter returns template.stl and reports the plate's size, its triangles and how to print
// it.
func plateWriter(j makeJob, report io.Writer) ([]outputFile, error) {
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
	writePlateReport(report, pl, len(m.Triangles))
	return []outputFile{{"template.stl", b.Bytes()}}, nil
}

// writePlateReport tells the machinist what was made and how to print it.
func writePlateReport(w io.Writer, pl pantograph.Plate, triangles int) {
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
	if pl.BedWarning != "" {
		fmt.Fprintf(w, "  warning: %s\n", pl.BedWarning)
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

Plans PART, a part file or a DXF or SVG drawing, as 'panto plan' does (same flags: --ratio,
--cutter, --cutter-for, --stylus, --tip, --machine, --mirror, --rotate, --accept-loss,
--mill-holes, --datum, --thickness, --material, and --units, --hole-max, --layer, --join
for a drawing) and writes into the folder DIR everything needed at the machine:

  template.stl   the template plate to print (binary STL, mm, all coordinates positive)
  sheet.*        the dial-reading sheet (PDF, text, CSV, JSON), as 'panto sheet' writes it
  template.*, part.*   the true-scale drawings (SVG and PDF)
  template.dxf   the template for cutting on a laser or CNC router instead of printing:
                 in mm, outline, openings, seats (circles of the stylus diameter), groove
                 centrelines and numbered labels each on its own layer (OUTLINE, OPENINGS,
                 SEATS, GROOVES, LABELS), arcs kept as arcs
  part.dxf       the part at true size, a layer per kind of feature

The plate is a flat base with a fixing slot at each corner, or pairs of slots at the machine
file's [copy_table] fixing_spacing (--fixing-spacing overrides its X spacing), and a front strip with the title, a check bar and a test square.
With --style wall (the default for a round stylus) the profile stands up as an island the stylus runs round,
and openings and pockets are sunk into it; edges stand one stylus diameter high, and at
least 3 mm, so a round-nosed stylus bears on its straight side and cannot ride over. With
--style groove the stylus runs in channels one stylus diameter plus 0.2 mm wide cut along
its centre path. Drilled holes get a seat: a 90° cone for a pointed stylus, or a bore of the
stylus diameter plus 0.1 mm for a round one (--seat chooses; the default follows the tip).
The datum seat has a ring round it. Each feature's number, as on the sheet, is sunk beside
it. The machine file's printer scale and hole growth are applied.

A laser or router cuts a kerf as wide as its beam or bit, centred on the line. --kerf gives
that width: template.dxf's outline then moves out by kerf/2 and its openings and seats in by
kerf/2, so the pieces come out at the template's size. Leave it at 0 when the cutting program
allows for the kerf itself.

The run prints the plate's size and triangle count, how to print it, and what the DXF files
hold.

Existing files are not overwritten unless --force is given; each file is written under a
temporary name and renamed, so an interrupted run leaves no half file.

Flags (besides the plan flags):
  -o, --out DIR              folder to write into (required)
      --seat cone|bore       seats for drilled holes (default: cone for a pointed stylus)
      --style wall|groove    raised walls or channels for traced edges (default: groove for
                             a pointed stylus, which cannot bear on a wall; else wall)
      --fixing-spacing MM    distance between fixing slots along X (default: the machine
                             file's fixing_spacing, else a slot at each corner)
      --kerf MM              width the laser or router cuts, allowed for in template.dxf
                             (default 0: none)
      --paper a4|letter      paper size of the PDFs (default a4)
      --date TEXT            date printed on the sheet (default: today, UTC)
      --force                overwrite existing files
`
