// Package cad reads CAD drawings — DXF and SVG files — and makes a pantograph.Part of them,
// so that a machinist can start from the drawing they already have.
//
// Reading is in three steps. A reader (ReadDXF, ReadSVG) turns the file into loose segments in
// millimetres, +Y up, each with the layer it was drawn on and the place in the file it came
// from; curves that are not circular arcs (ellipses, splines, Bézier curves) become chords
// within Options.ChordTol. geom.JoinLoose then joins the segments of each layer into chains,
// treating ends within Options.JoinTol as one point. Classify finally decides what each closed
// chain is: the largest closed outline is the profile, closed outlines inside it are cut-outs,
// circles no larger than Options.HoleMax are drilled holes (grouped by diameter), and
// Options.Layers maps whole layers to a kind and a depth. The layer names panto's own part
// drawings use (LayerProfile and the rest) are rules of their own unless Options.Layers
// names them too, so a part drawing panto wrote reads back as written, except that pockets
// come back without a depth and slots as cut-outs. The Report says what became what and
// what was left out; nothing is dropped without a line in it.
//
// Chains that do not close are an error, listing where each loose end is and how far it is
// from the nearest other loose end, in the drawing's units, unless their layer is mapped to
// grooves (engraved lines) or ignored.
//
// Bad files are *Error values naming the file, the line (a DXF group's line, an SVG element's
// line) and what is wrong. The readers bound their work: counts in a file are never trusted
// for allocation, curves are cut into at most maxCurvePieces chords, and block insertion stops
// at maxSegments segments and maxBlockDepth levels.
package cad
