package geom

// This file cuts contours into pieces where they meet and joins chosen pieces back into
// closed contours and regions. Offsets and booleans share it: each makes candidate pieces,
// keeps those that belong to the answer, and hands them here to be chained and assembled.

// piece is part of a segment between two points where it meets other segments, with the
// index of the input group (contour or operand) it came from.
type piece struct {
	seg Segment
	src int
}

// splitPieces cuts every segment of every group at every point where it meets any other
// segment (of its own group or another), and returns the pieces tagged with their group.
// Pieces shorter than pointTol are dropped. Crossing points found from different pairs are
// merged when they lie within snapTol, so pieces that meet share their end points exactly.
func splitPieces(groups [][]Segment) []piece {
	panic("splitPieces: not written yet")
}

// chainLoops joins pieces end to start into closed contours. Where several pieces leave one
// point it takes the one that turns most to the left, so regions that touch at a point come
// out as separate loops. It returns the loops (with, for each loop, the src of its pieces in
// order) and how many pieces could not be closed into a loop.
func chainLoops(ps []piece) (loops []Contour, srcs [][]int, open int) {
	panic("chainLoops: not written yet")
}

// assemble turns closed loops into regions: counter-clockwise loops become outer contours and
// each clockwise loop becomes a hole of the smallest outer loop that contains it. A clockwise
// loop inside no outer loop is dropped (it bounds nothing).
func assemble(loops []Contour) []Region {
	panic("assemble: not written yet")
}
