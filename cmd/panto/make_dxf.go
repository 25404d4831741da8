package main

import (
	"bytes"
	"fmt"
	"io"

	"panto/export/dxf"
	"panto/pantograph"
)

// This file is what `panto make` writes for cutting the template on a laser or a CNC router:
// template.dxf and part.dxf.

// dxfWriter returns template.dxf and part.dxf and says what they are for.
func dxfWriter(j makeJob, report io.Writer) ([]outputFile, error) {
	files, err := makeDXFFiles(j.part, j.plan, j.kerf)
	if err != nil {
		return nil, err
	}
	fmt.Fprintf(report, "template.dxf: the template for a laser or CNC router, mm, layers %s, %s, %s, %s, %s\n",
		dxf.LayerOutline, dxf.LayerOpenings, dxf.LayerSeats, dxf.LayerGrooves, dxf.LayerLabels)
	if j.kerf > 0 {
		fmt.Fprintf(report, "  kerf %g mm allowed for: the outline is moved out and openings and seats in by %g mm\n",
			j.kerf, j.kerf/2)
	} else {
		fmt.Fprintf(report, "  no kerf allowed for: the lines are the template's edges; give --kerf unless your cutting program allows for it\n")
	}
	fmt.Fprintf(report, "part.dxf: the part at true size, mm\n")
	return files, nil
}

// makeDXFFiles returns the DXF files `panto make` writes into the output folder beside the
// plate: template.dxf (outline, openings, seats, grooves and labels on their own layers, in
// template mm, the laser kerf compensated when kerf > 0) and part.dxf (the part at true size).
func makeDXFFiles(part pantograph.Part, p pantograph.Plan, kerf float64) ([]outputFile, error) {
	ct, err := pantograph.TemplateForCutting(p, kerf)
	if err != nil {
		return nil, fmt.Errorf("template.dxf: %w", err)
	}
	tmpl := dxf.TemplateDrawing(ct)
	return encodeFiles([]fileEncoder{
		{"template.dxf", func(b *bytes.Buffer) error { return dxf.Encode(b, tmpl) }},
		{"part.dxf", func(b *bytes.Buffer) error { return dxf.Encode(b, dxf.PartDrawing(part)) }},
	})
}
