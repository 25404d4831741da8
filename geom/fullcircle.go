package geom

import "math"

// This file holds the one rule for telling a full circle, and the tolerance on sweeps that
// everything comparing a sweep with a whole turn uses.

// fullTurnTol is how far, in radians, a sweep or an angle may differ from a whole turn and still
// count as one. A sweep near 2π carries a rounding of a few units in the last place (8.9e-16
// each) from every step that made it, and merging the pieces of a cut circle back into one arc
// adds one per piece, so 1e-12 allows about a thousand such steps. On a radius of a metre it
// moves an end by 1e-9 mm, pointTol, so on parts up to a metre across a sweep this close to a
// whole turn closes within pointTol.
const fullTurnTol = 1e-12

// IsFullCircle reports whether s is an arc that comes back to where it starts: its ends within
// pointTol of each other and its sweep more than half a turn. An arc whose ends meet either goes
// all the way round or is shorter than pointTol; half a turn tells the two apart with room for
// any rounding. The test is on the ends rather than on the sweep because that is what makes a
// circle close: where crossings are snapped or boundaries welded, a circle's ends are made one
// point while its sweep may stay short of 2π by far more than fullTurnTol, above all on small
// radii.
func (s Segment) IsFullCircle() bool {
	return s.IsArc() && math.Abs(s.Sweep) > math.Pi && s.A.Near(s.B)
}

// isFullTurn reports whether sweep is a whole turn either way, within fullTurnTol.
func isFullTurn(sweep float64) bool {
	return math.Abs(math.Abs(sweep)-2*math.Pi) <= fullTurnTol
}

// coversFullTurn reports whether sweep reaches every direction: a whole turn or more, within
// fullTurnTol.
func coversFullTurn(sweep float64) bool { return math.Abs(sweep) >= 2*math.Pi-fullTurnTol }

// beyondFullTurn reports whether sweep turns further than a whole turn by more than
// fullTurnTol, which no segment may.
func beyondFullTurn(sweep float64) bool { return math.Abs(sweep) > 2*math.Pi+fullTurnTol }
