package pantograph

import (
	"fmt"
	"math"
)

// This file turns positions into dial readings. A position is a table move from the datum in
// mm; the dial reads it in its own screw's units as whole turns, whole divisions and what is
// left over, a fraction of a division the machinist cannot set and should know the worth of at
// the part. Every position is approached from the same side (the dial counting up), so the
// screw's backlash is always taken up the same way; when the next position lies behind the
// current one the table is first backed off past it by more than the backlash, then brought up.

// divisionSnap is how near, as a fraction of a division, a reading must be to a whole division
// to count as on it: it absorbs rounding in mm → inch and template → part conversions (derived:
// float rounding of a few products of numbers below 1000 is ~1e-13 of a division), far below
// anything a dial shows.
const divisionSnap = 1e-6

// quarterTurn is the least back-off after a reversal: "back off more than the backlash (about
// a quarter turn) and come in again" (machine-shop training notes on backlash, REFERENCES.md).
const quarterTurn = 0.25

// Stated reports whether the dial has what a reading needs: a pitch and divisions.
func (d Dial) Stated() bool { return d.Pitch > 0 && d.Divisions > 0 }

// Division returns what one division is worth, in the screw's units.
func (d Dial) Division() float64 { return d.Pitch / float64(d.Divisions) }

// unitMM is how many mm one of the screw's units is.
func (d Dial) unitMM() float64 {
	if d.Units == Inch {
		return MMPerInch
	}
	return 1
}

// Count returns the dial count, in the screw's units, for a table move of mm from the datum:
// positive when the dial counts up. A dial that is not Reversed counts up toward +X (+Y, down
// for depth).
func (d Dial) Count(mm float64) float64 {
	c := mm / d.unitMM()
	if d.Reversed {
		c = -c
	}
	return c
}

// Reading is a dial reading: Turns whole turns and Divisions whole divisions from the zero,
// plus Remainder (0 ≤ Remainder < 1) of a division that the dial cannot show. Count is the whole
// reading in the screw's units; AtPart is the remainder's worth at the part, in mm.
type Reading struct {
	Count     float64
	Turns     int
	Divisions int
	Remainder float64
	AtPart    float64
}

// Read returns the reading of count (screw units) on the dial. scale is how much the table's
// motion is reduced at the cutter: the ratio R for the copy table, 1 for the work table and
// depth. A negative count reads as negative turns and divisions (see DatumTurns for keeping
// readings positive).
func (d Dial) Read(count, scale float64) Reading {
	divs := count / d.Division()
	whole := math.Floor(divs)
	if near := math.Round(divs); math.Abs(divs-near) <= divisionSnap {
		whole, divs = near, near
	}
	rem := divs - whole
	n := int(whole)
	turns, div := n/d.Divisions, n%d.Divisions
	if div < 0 {
		turns, div = turns-1, div+d.Divisions
	}
	return Reading{
		Count: count, Turns: turns, Divisions: div, Remainder: rem,
		AtPart: rem * d.Division() * d.unitMM() / scale,
	}
}

// String gives the reading as "6 t 17 div" with the remainder as "+0.40 div" when there is one.
func (r Reading) String() string {
	s := fmt.Sprintf("%d t %d div", r.Turns, r.Divisions)
	if r.Remainder >= 0.005 {
		s += fmt.Sprintf(" +%.2f div", r.Remainder)
	}
	return s
}

// DatumTurns returns how many whole turns the dial should be set to at the datum so that every
// count in counts, read from there, is 0 or more: the datum stays where the stylus is zeroed,
// only the number it reads changes. It is 0 when no count is negative.
func (d Dial) DatumTurns(counts []float64) int {
	least := 0.0
	for _, c := range counts {
		least = math.Min(least, c)
	}
	if least >= 0 {
		return 0
	}
	return int(math.Ceil(-least/d.Pitch - divisionSnap))
}

// BackOff returns how far, in the screw's units, to wind back past a position that lies behind
// the current one before coming up to it: more than the backlash, and at least a quarter turn,
// in whole divisions.
func (d Dial) BackOff() float64 {
	divs := math.Ceil(quarterTurn*float64(d.Divisions) - divisionSnap)
	if past := math.Floor(d.Backlash/d.Division()+divisionSnap) + 1; past > divs {
		divs = past
	}
	return divs * d.Division()
}

// Move is how to bring the dial to one position: straight up to Target, or, when Reversal,
// first back to BackTo (below Target by at least BackOff, on a whole division) and then up.
type Move struct {
	Target   float64 // count to stop at, screw units
	Reversal bool
	BackTo   float64 // where to wind back to first, when Reversal
}

// approach returns the moves that bring the dial to each count in turn, starting at from, every
// one ending on a forward (counting-up) motion so that backlash is taken up the same way.
func (d Dial) approach(from float64, counts []float64) []Move {
	out := make([]Move, len(counts))
	at := from
	tol := divisionSnap * d.Division()
	for i, c := range counts {
		out[i] = Move{Target: c}
		if c < at-tol {
			out[i].Reversal = true
			// a whole division, so the wind-back is easy to set; it only needs to be far enough
			out[i].BackTo = math.Floor((c-d.BackOff())/d.Division()+divisionSnap) * d.Division()
		}
		at = c
	}
	return out
}
