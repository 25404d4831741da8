// Package drawing writes true-scale drawings: the template (1:1 at template scale, for
// printing, laser cutting or checking a printed plate) and the part (at a readable
// enlargement, with its overall dimensions and a feature table that gives every hole,
// opening, slot, groove and outline corner from the datum with its diameter, width or
// radius), as SVG and PDF through github.com/tdewolff/canvas.
//
// Conventions: every length is in millimetres, +Y up, as in pantograph's frames. An SVG's
// width and height are in mm with a viewBox of the same numbers, so one user unit is one
// millimetre and no program can misread its size. A PDF page is A4 or Letter; a template
// larger than the printable area is tiled over several pages that overlap by Overlap mm and
// carry alignment marks (a cross in a square, off every line); a text is printed only on the
// pages that hold it whole. A drawing is first held as a sketch of what it draws, so feature
// numbers can be placed by a search clear of every line (place.go). Every drawing states its
// units and scale in words. Text is real text in a font embedded in the PDF (DejaVu Sans,
// fonts/LICENSE-DejaVu.txt), so it can be searched and copied. Output is deterministic: the
// same input gives the same bytes.
package drawing
