package main

import (
	"errors"
	"fmt"
	"io"
	"strings"

	"github.com/spf13/pflag"

	"panto/geom"
	"panto/pantograph"
	"panto/pantograph/cad"
	"panto/pantograph/partfile"
)

// This file is what the commands that take a part share: their flags (declared here once), the
// reading of a part file or a drawing, the stock given on the command line, and the plan.

// drawingFlags say how to read a DXF or SVG drawing; import, plan, sheet and make all take them.
type drawingFlags struct {
	units   string
	holeMax float64
	layers  []string
	join    float64
}

// givenDrawingFlags returns the drawing flags given on the command line, as --NAME.
func givenDrawingFlags(fl *pflag.FlagSet) []string {
	var given []string
	for _, name := range []string{"units", "hole-max", "layer", "join"} {
		if fl.Changed(name) {
			given = append(given, "--"+name)
		}
	}
	return given
}

// addDrawingFlags declares the flags of drawingFlags.
func addDrawingFlags(fl *pflag.FlagSet, d *drawingFlags) {
	fl.StringVar(&d.units, "units", "", "the drawing's units, mm or in, when the file does not say or says wrong")
	fl.Float64Var(&d.holeMax, "hole-max", 0, "circles this diameter or smaller become drilled holes (drawing units)")
	fl.StringArrayVar(&d.layers, "layer", nil, "NAME=KIND[:DEPTH]: what a layer's outlines are")
	fl.Float64Var(&d.join, "join", 0, "join ends this close, in mm (default 0.001)")
}

// options checks the flags and turns them into drawing options, without the stock.
func (d drawingFlags) options() (cad.Options, error) {
	opts := cad.Options{HoleMax: d.holeMax, JoinTol: d.join, Layers: map[string]cad.LayerRule{}}
	switch pantograph.Units(d.units) {
	case "", pantograph.MM, pantograph.Inch:
		opts.Units = pantograph.Units(d.units)
	default:
		return opts, fmt.Errorf("--units must be mm or in, got %q", d.units)
	}
	if !(d.join >= 0 && d.join <= 1) {
		return opts, fmt.Errorf("--join must be between 0 and 1 mm, got %g", d.join)
	}
	if !(d.holeMax >= 0) {
		return opts, fmt.Errorf("--hole-max must be 0 or more, got %g", d.holeMax)
	}
	for _, l := range d.layers {
		name, rule, err := cad.ParseLayerRule(l)
		if err != nil {
			return opts, fmt.Errorf("--layer %v", err)
		}
		opts.Layers[name] = rule
	}
	return opts, nil
}

// maxThickness bounds --thickness: no stock on a pantograph mill is anywhere near a metre thick,
// so a larger number is a slip of the keyboard (common practice, no source).
const maxThickness = 1e6

// checkThickness checks a --thickness value.
func checkThickness(t float64) error {
	if !(t >= 0 && t < maxThickness) {
		return fmt.Errorf("--thickness must be 0 or more, got %g", t)
	}
	return nil
}

// addPlanFlags declares the flags that plan, sheet and make share: the setup, the machine, the
// stock and how to read a drawing.
func addPlanFlags(fl *pflag.FlagSet, o *planFlags) {
	fl.Float64Var(&o.ratio, "ratio", 0, "template size : part size")
	fl.Var(&o.lengths.cutter, "cutter", "cutter diameter (mm, or give in: 1/32in)")
	fl.StringToStringVar(&o.cutterFor, "cutter-for", nil, "cutter for one kind of feature, KIND=MM")
	fl.Var(&o.lengths.stylus, "stylus", "stylus diameter (mm, or give in)")
	fl.StringVar(&o.tip, "tip", "", "stylus tip: round or pointed")
	fl.StringVar(&o.machine, "machine", "", "machine file")
	fl.BoolVar(&o.mirror, "mirror", false, "mirror the template")
	fl.Float64Var(&o.rotate, "rotate", 0, "turn the template, degrees counter-clockwise")
	fl.BoolVar(&o.acceptLoss, "accept-loss", false, "plan even if some features are lost")
	fl.BoolVar(&o.millHoles, "mill-holes", false, "mill holes larger than the cutter")
	fl.Var(&o.lengths.thickness, "thickness", "stock thickness (mm, or give in)")
	fl.StringVar(&o.material, "material", "", "stock material, e.g. brass")
	fl.Var(&o.datum, "datum", "X,Y: move the datum to this point, in the part's own units (or give mm or in)")
	addDrawingFlags(fl, &o.drawing)
	fl.BoolVarP(&o.help, "help", "h", false, "show help")
}

// parseOne parses the flags of command cmd, which takes exactly one file (what names it in
// messages). done is true when the command should stop here, with err nil when help was shown.
func parseOne(cmd, what, synopsis string, fl *pflag.FlagSet, args []string, help *bool,
	stdout io.Writer) (done bool, err error) {
	if err := fl.Parse(args); err != nil {
		return true, usagef(cmd, "%v\nRun 'panto help %s' for usage.", err, cmd)
	}
	if *help {
		return true, runHelp([]string{cmd}, stdout)
	}
	if fl.NArg() != 1 {
		return true, usagef(cmd, "give exactly one %s, got %d\nUsage: %s", what, fl.NArg(), synopsis)
	}
	return false, nil
}

// partOrDrawing is what the commands that plan take as PART.
const partOrDrawing = "part file or drawing"

// planned is a part read and planned, with the machine it was planned for.
type planned struct {
	part    pantograph.Part
	plan    pantograph.Plan
	machine *pantograph.Machine // nil without a machine file
}

// readAndPlan reads the part or drawing at path and the machine file, and plans.
func readAndPlan(cmd, path string, o planFlags, setup pantograph.Setup, stderr io.Writer) (planned, error) {
	var j planned
	part, err := readPart(cmd, path, o, stderr)
	if err != nil {
		return j, err
	}
	j.part = part
	if o.machine != "" {
		m, err := readMachine(cmd, o.machine)
		if err != nil {
			return j, err
		}
		j.machine = &m
	}
	p, err := pantograph.PlanPart(part, setup, j.machine)
	if err != nil {
		return j, planError(cmd, path, err)
	}
	j.plan = p
	return j, nil
}

// readMachine reads the machine file at path.
func readMachine(cmd, path string) (pantograph.Machine, error) {
	m, err := partfile.ReadMachineFile(path)
	if err != nil {
		return m, badFile(cmd, "machine file", err)
	}
	return m, nil
}

// planError words why the part at path could not be planned: its errors, each on its line, or
// what is wrong with the setup.
func planError(cmd, path string, err error) error {
	var pe pantograph.PartErrors
	if !errors.As(err, &pe) {
		return usagef(cmd, "%v", err)
	}
	var b strings.Builder
	for _, pr := range pe {
		b.WriteString(pr.Diagnostic() + "\n")
	}
	fmt.Fprintf(&b, "panto %s: %s has errors; fix them first (panto check shows them all)", cmd, path)
	return &exitError{exitUsage, b.String()}
}

// readPart reads a part file, or a drawing with the drawing flags (its report going to
// stderr), and puts in the stock given by --thickness and --material.
func readPart(cmd, path string, o planFlags, stderr io.Writer) (pantograph.Part, error) {
	isDrawing := cad.IsDrawing(path)
	if !isDrawing && len(o.drawingGiven) > 0 {
		return pantograph.Part{}, usagef(cmd, "%s is for reading a drawing; %s is a part file", o.drawingGiven[0], path)
	}
	opts, err := o.drawing.options()
	if err != nil {
		return pantograph.Part{}, usagef(cmd, "%v", err)
	}
	part, err := readPartOrDrawing(path, opts, stderr)
	if err != nil {
		what := "part file"
		if isDrawing {
			what = "drawing"
		}
		return part, badFile(cmd, what, err)
	}
	overrideStock(&part, o, isDrawing, stderr)
	if err := moveDatum(&part, o.datum); err != nil {
		return part, usagef(cmd, "%v", err)
	}
	if isDrawing && part.Stock.Thickness == 0 {
		return part, usagef(cmd, "%s: a drawing does not say how thick the stock is; give it with --thickness MM (and --material NAME)", path)
	}
	return part, nil
}

// overrideStock puts the stock from the flags into the part. A drawing carries none; a part
// file's [stock] is replaced, with a note, since the flag may be a slip.
func overrideStock(part *pantograph.Part, o planFlags, isDrawing bool, stderr io.Writer) {
	s := &part.Stock
	if o.thickness > 0 {
		if !isDrawing && s.Thickness > 0 && s.Thickness != o.thickness {
			fmt.Fprintf(stderr, "note: --thickness %g mm replaces the part file's stock thickness (%g mm)\n", o.thickness, s.Thickness)
		}
		s.Thickness = o.thickness
	}
	if o.material != "" {
		if !isDrawing && s.Material != "" && s.Material != o.material {
			fmt.Fprintf(stderr, "note: --material %s replaces the part file's stock material (%s)\n", o.material, s.Material)
		}
		s.Material = o.material
	}
}

// moveDatum puts the datum where --datum says: a point of the part frame in the part's own
// drawing units, as the part file's datum key is written, unless a unit is given with it.
// Moving the datum moves every dial reading, so a machinist can put it on a seat that suits
// the machine or keep readings positive.
func moveDatum(part *pantograph.Part, xy pointFlag) error {
	if !xy.set {
		return nil
	}
	u := part.Units
	if u == "" {
		u = pantograph.MM
	}
	part.Datum = geom.V(xy.x.mm(u), xy.y.mm(u))
	return nil
}
