package main

import (
	"bytes"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"

	"github.com/spf13/pflag"

	"panto/pantograph"
	"panto/pantograph/cad"
	"panto/pantograph/partfile"
)

// importFlags are the options of `panto import`.
type importFlags struct {
	out     string
	drawing drawingFlags
	thick   lengthFlag
	stuff   string
	force   bool
	help    bool
}

const importSynopsis = "panto import DRAWING.dxf|DRAWING.svg [-o PART.toml] [--units mm|in] [--hole-max D] [--layer NAME=KIND[:DEPTH]]... [--thickness T] [--force]"

// runImport is `panto import DRAWING`: read a DXF or SVG drawing, say what became what, and
// write a part file.
func runImport(args []string, stdout, stderr io.Writer) error {
	var o importFlags
	fl := pflag.NewFlagSet("import", pflag.ContinueOnError)
	fl.SetOutput(io.Discard)
	fl.StringVarP(&o.out, "output", "o", "", "the part file to write (default: the drawing's name with .toml)")
	addDrawingFlags(fl, &o.drawing)
	fl.Var(&o.thick, "thickness", "stock thickness, in the drawing's units (or give mm or in)")
	fl.StringVar(&o.stuff, "material", "", "stock material, e.g. brass")
	fl.BoolVar(&o.force, "force", false, "overwrite the part file if it exists")
	fl.BoolVarP(&o.help, "help", "h", false, "show help")
	if done, err := parseOne("import", "drawing", importSynopsis, fl, args, &o.help, stdout); done {
		return err
	}
	opts, err := o.options()
	if err != nil {
		return usagef("import", "%v", err)
	}
	return importDrawing(fl.Arg(0), o, opts, stdout)
}

// options turns the flags into drawing options. A plain --thickness is in the drawing's
// units, as it is written into the part file; one given with its unit is put in after reading
// (see stockThickness).
func (o importFlags) options() (cad.Options, error) {
	opts, err := o.drawing.options()
	if err != nil {
		return opts, err
	}
	opts.Material = o.stuff
	if o.thick.l.unit == "" {
		opts.Thickness = o.thick.l.value
	}
	return opts, checkThickness(o.thick.l.mm(pantograph.MM))
}

// stockThickness puts a --thickness given with its unit into the part read, in mm.
func (o importFlags) stockThickness(part *pantograph.Part) {
	if o.thick.l.unit != "" {
		part.Stock.Thickness = o.thick.l.mm(pantograph.MM)
	}
}

// importDrawing reads the drawing, prints the report and writes the part file.
func importDrawing(path string, o importFlags, opts cad.Options, stdout io.Writer) error {
	if !cad.IsDrawing(path) {
		return usagef("import", "%s: give a .dxf or .svg drawing", path)
	}
	out := o.out
	if out == "" {
		out = strings.TrimSuffix(path, filepath.Ext(path)) + ".toml"
	}
	if _, err := os.Stat(out); err == nil && !o.force {
		return usagef("import", "%s already exists; give --force to overwrite it, or -o another name", out)
	}
	part, rep, err := cad.ReadFile(path, opts)
	if err != nil {
		return badFile("import", "drawing", err)
	}
	o.stockThickness(&part)
	rep.WriteTo(stdout)
	var buf bytes.Buffer
	enc := partfile.Encoder{Header: importHeader(path, rep)}
	if err := enc.Encode(&buf, part); err != nil {
		return failf("import", "%v", err)
	}
	if _, err := partfile.Read(out, buf.Bytes()); err != nil {
		// The writer and reader disagree: a bug, not the user's fault. Say so plainly.
		return failf("import", "the part file written does not read back (%v); please report this", err)
	}
	if err := writeFileAtomic(out, buf.Bytes()); err != nil {
		return failf("import", "%v", err)
	}
	fmt.Fprintf(stdout, "wrote %s; check it with: panto check %s\n", out, out)
	return nil
}

// importHeader is the comment at the top of an imported part file.
func importHeader(path string, rep cad.Report) []string {
	h := []string{"Part file made by panto import from " + filepath.Base(path) + ".",
		"Units: " + rep.UnitsNote + ".",
		"Check names, depths and the stock before use; 'panto check' reads this file."}
	for _, w := range rep.Warnings {
		h = append(h, "Warning: "+strings.ReplaceAll(w, "\n", " "))
	}
	return h
}

// writeFileAtomic writes data to a temporary file beside path and renames it into place, so
// an interrupted run leaves either the old file or the whole new one.
func writeFileAtomic(path string, data []byte) error {
	tmp, err := os.CreateTemp(filepath.Dir(path), "."+filepath.Base(path)+".*.tmp")
	if err != nil {
		return err
	}
	_, err = tmp.Write(data)
	if cerr := tmp.Close(); err == nil {
		err = cerr
	}
	if err == nil {
		err = os.Rename(tmp.Name(), path)
	}
	if err != nil {
		os.Remove(tmp.Name())
	}
	return err
}

// readPartOrDrawing reads a part file, or a DXF or SVG drawing with opts (its report going to
// stderr), so that commands taking a part accept a drawing too.
func readPartOrDrawing(path string, opts cad.Options, stderr io.Writer) (pantograph.Part, error) {
	if !cad.IsDrawing(path) {
		return partfile.ReadFile(path)
	}
	part, rep, err := cad.ReadFile(path, opts)
	if err == nil {
		rep.WriteTo(stderr)
	}
	return part, err
}

const importUsage = `Usage: ` + importSynopsis + `

Reads a DXF (ASCII, R12 or later) or SVG drawing of the part, says what became what, and
writes a part file you can read and edit. The largest closed outline is the profile; closed
outlines inside it are cut-outs; circles of --hole-max or less are drilled holes, one [[holes]]
table per diameter. Loose lines and arcs are joined end to end when their ends are within
--join; an outline that still does not close is an error that lists where every loose end is.
Text, dimensions and hatching are not read; the report counts them.

Units: DXF files say theirs in $INSUNITS (inches and millimetres are kept; feet, cm and m
are converted to mm). SVG sizes come from width, height and viewBox; a file sized in px or
not at all is read at 96 px per inch with a warning. --units says what the drawing is in when
the file is silent (for SVG: what one user unit is).

Ellipses, splines and Bézier curves are cut into straight chords within 0.001 mm; circular
arcs stay arcs. SVG's y axis points down; the part file's points up.

Flags:
  -o, --output FILE       the part file (default: the drawing's name with .toml)
  --units mm|in           the drawing's units, overriding the file
  --hole-max D            largest circle that becomes a drilled hole, in the drawing's units
                          (default %g mm); 0 keeps the default
  --layer NAME=KIND[:DEPTH]
                          what the outlines on layer NAME are (a DXF layer, or the id or label
                          of an SVG group): profile, cutout, pocket, holes, groove (open lines
                          to engrave) or ignore; DEPTH in the drawing's units, e.g.
                          --layer RECESS=pocket:0.3  --layer CENTRES=ignore
  --join MM               join ends this close together (default 0.001 mm)
  --thickness T           the stock's thickness, in the drawing's units unless T says mm or in
                          (0.8mm, 1/32in), as the part file
                          keeps it (drawings do not carry it; panto check and plan need it;
                          plan, sheet and make given a drawing take --thickness in mm)
  --material NAME         the stock's material, for the part file
  --force                 overwrite the part file if it exists
  -h, --help              show this help

Exit codes: 0 written, 1 the file could not be written, 2 bad flags or a bad drawing
(the message names the file, the line and what is wrong).
`
