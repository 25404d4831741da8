package main

import (
	"bytes"
	"fmt"

	"panto/export/drawing"
	"panto/export/sheet"
	"panto/pantograph"
)

// This file is what `panto make` and `panto sheet` write besides the template plate: the
// dial-reading sheet in four forms and the true-scale drawings. make calls sheetAndDrawingFiles.

// sheetAndDrawingFiles returns the sheet and drawing files for a plan, to be written into the
// output folder with the plate: sheet.pdf, sheet.csv, sheet.json, template.svg, template.pdf,
// part.svg, part.pdf and sheet.txt. m may be nil (no machine file: positions in mm only).
func sheetAndDrawingFiles(part pantograph.Part, p pantograph.Plan, m *pantograph.Machine, paperName, date string) ([]outputFile, error) {
	sheets, err := sheetFiles(p, m, paperName, date)
	if err != nil {
		return nil, err
	}
	drawings, err := drawingFiles(part, p, paperName)
	if err != nil {
		return nil, err
	}
	// sheet.txt stays last, where --print finds it.
	n := len(sheets)
	return append(append(sheets[:n-1:n-1], drawings...), sheets[n-1]), nil
}

// sheetFiles returns sheet.pdf, sheet.csv, sheet.json and, last, sheet.txt.
func sheetFiles(p pantograph.Plan, m *pantograph.Machine, paperName, date string) ([]outputFile, error) {
	paper, err := drawing.PaperNamed(paperName)
	if err != nil {
		return nil, fmt.Errorf("--paper: %v", err)
	}
	var mc pantograph.Machine
	if m != nil {
		mc = *m
	}
	s, err := pantograph.BuildSheet(p, mc, pantograph.SheetOptions{Date: date})
	if err != nil {
		return nil, err
	}
	return encodeFiles([]fileEncoder{
		{"sheet.pdf", func(b *bytes.Buffer) error { return sheet.EncodePDF(b, s, paper) }},
		{"sheet.csv", func(b *bytes.Buffer) error { return sheet.EncodeCSV(b, s) }},
		{"sheet.json", func(b *bytes.Buffer) error { return sheet.EncodeJSON(b, s) }},
		{"sheet.txt", func(b *bytes.Buffer) error { return sheet.EncodeText(b, s) }},
	})
}

// drawingFiles returns template.svg, template.pdf, part.svg and part.pdf.
func drawingFiles(part pantograph.Part, p pantograph.Plan, paperName string) ([]outputFile, error) {
	paper, err := drawing.PaperNamed(paperName)
	if err != nil {
		return nil, fmt.Errorf("--paper: %v", err)
	}
	return encodeFiles([]fileEncoder{
		{"template.svg", func(b *bytes.Buffer) error { return drawing.EncodeTemplateSVG(b, p) }},
		{"template.pdf", func(b *bytes.Buffer) error { return drawing.EncodeTemplatePDF(b, p, paper) }},
		{"part.svg", func(b *bytes.Buffer) error { return drawing.EncodePartSVG(b, part, p, paper) }},
		{"part.pdf", func(b *bytes.Buffer) error { return drawing.EncodePartPDF(b, part, p, paper) }},
	})
}

// fileEncoder is one file to make: its name and what writes its bytes.
type fileEncoder struct {
	name string
	enc  func(*bytes.Buffer) error
}

// encodeFiles makes each file in order; an error names the file.
func encodeFiles(fs []fileEncoder) ([]outputFile, error) {
	out := make([]outputFile, 0, len(fs))
	for _, f := range fs {
		var b bytes.Buffer
		if err := f.enc(&b); err != nil {
			return nil, fmt.Errorf("%s: %w", f.name, err)
		}
		out = append(out, outputFile{f.name, b.Bytes()})
	}
	return out, nil
}
