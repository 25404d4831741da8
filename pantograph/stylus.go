package pantograph

import "math"

// The stylus arithmetic of the method. The stylus runs along the template as the cutter runs
// along the part, R times larger, so the stylus that needs no correction is R times the
// cutter. When the stylus at hand is another size, the template's edges are moved by
// δ = R·r_c − r_s so that the stylus centre still follows R times the cutter's centre path:
// outward for the profile (the stylus runs outside it), inward for openings (it runs inside).

// MatchedStylus returns the stylus diameter that traces a template for a cutter of diameter
// cutter at ratio R without any compensation: d_s = R·d_c. Both diameters are in the same
// units.
func MatchedStylus(ratio, cutter float64) float64 { return ratio * cutter }

// MatchedCutter returns the cutter diameter that a stylus of diameter stylus matches at ratio
// R: d_c = d_s / R.
func MatchedCutter(ratio, stylus float64) float64 { return stylus / ratio }

// Compensation returns δ = R·r_c − r_s, in template units (mm when the diameters are in mm),
// for a cutter and a stylus given by their diameters. Positive δ: the stylus is smaller than
// matched, so the template's outside profile grows by δ and its openings shrink by δ; negative
// δ the other way round; 0 when the stylus matches. A pointed stylus traces with its point:
// pass 0 for its diameter.
func Compensation(ratio, cutter, stylus float64) float64 { return ratio*cutter/2 - stylus/2 }

// tipOrRound is the stylus's tip, round when the machine file does not say.
func (s Stylus) tipOrRound() Tip {
	if s.Tip == "" {
		return TipRound
	}
	return s.Tip
}

// TracingDiameter is the diameter the stylus traces with: its diameter when round, 0 when
// pointed, because a point follows the template's line itself.
func (s Stylus) TracingDiameter() float64 {
	if s.Tip == TipPointed {
		return 0
	}
	return s.Diameter
}

// matchTol is the largest |δ| (template mm) still called a match: half the 0.001 mm that
// panto prints, so a compensation printed as 0.000 is never described as growing or shrinking
// the template (derived from the print resolution; at 10:1 it is 0.05 µm at the part).
const matchTol = 0.0005

// tieTol is how close, in mm, two styli's distances from the matched size must be to count as a
// tie: it absorbs float rounding of R·d_c (3 × 0.7 is 2.0999999999999996) and is far below
// what a stylus is ground to (derived: rounding of products of numbers near 1..100 is ~1e-14).
const tieTol = 1e-9

// Direction is which way a compensation moves the template's traced edges.
type Direction int

// The directions. The zero value is DirectionNone.
const (
	DirectionNone   Direction = iota // the stylus matches: the template is R × the part
	DirectionGrow                    // δ > 0: the outline grows, openings shrink
	DirectionShrink                  // δ < 0: the outline shrinks, openings grow
)

// String says what the direction means for the template, as a sentence's worth of words.
func (d Direction) String() string {
	switch d {
	case DirectionGrow:
		return "the template's outline grows and its openings shrink"
	case DirectionShrink:
		return "the template's outline shrinks and its openings grow"
	}
	return "none: the stylus matches the cutter, the template is the part at full ratio"
}

// Word names the direction in one word for scripts: "none", "grow" or "shrink".
func (d Direction) Word() string {
	switch d {
	case DirectionGrow:
		return "grow"
	case DirectionShrink:
		return "shrink"
	}
	return "none"
}

// StylusChoice is the owned stylus chosen for a cutter at a ratio, and what using it means for
// the template.
type StylusChoice struct {
	Stylus       Stylus
	Index        int     // the stylus's place in Machine.Styli
	Matched      float64 // R·d_c, the stylus diameter that would need no compensation, mm
	Compensation float64 // δ = R·r_c − r_s in template mm; see Compensation
	Direction    Direction
}

// ChooseStylus picks, from the styli the machine lists with the given tip ("" for any), the one
// whose tracing diameter is nearest to R·d_c, and works out the compensation it needs. Ties go
// to the larger stylus (it is stiffer and less likely to bend against the template), then to
// the one listed first; among pointed styli, which all trace with their point, the first
// listed. It returns false when the machine lists no such stylus, or when ratio or cutter is
// not greater than 0.
func ChooseStylus(m Machine, ratio, cutter float64, tip Tip) (StylusChoice, bool) {
	if !(ratio > 0) || !(cutter > 0) {
		return StylusChoice{}, false
	}
	want := MatchedStylus(ratio, cutter)
	best := -1
	for i, s := range m.Styli {
		if tip != "" && s.tipOrRound() != tip {
			continue
		}
		if best < 0 || better(s, m.Styli[best], want) {
			best = i
		}
	}
	if best < 0 {
		return StylusChoice{}, false
	}
	s := m.Styli[best]
	d := Compensation(ratio, cutter, s.TracingDiameter())
	return StylusChoice{Stylus: s, Index: best, Matched: want, Compensation: d, Direction: DirectionOf(d)}, true
}

// better reports whether stylus a is a better choice than b for the matched size want; on a
// tie the one listed first (b) stays.
func better(a, b Stylus, want float64) bool {
	da, db := math.Abs(a.TracingDiameter()-want), math.Abs(b.TracingDiameter()-want)
	if math.Abs(da-db) > tieTol {
		return da < db
	}
	return a.TracingDiameter() > b.TracingDiameter()+tieTol
}

// DirectionOf says which way a compensation δ (template mm) moves the template:
// DirectionNone when |δ| is within half a thousandth of a millimetre, else DirectionGrow or
// DirectionShrink.
func DirectionOf(delta float64) Direction {
	switch {
	case math.Abs(delta) <= matchTol:
		return DirectionNone
	case delta > 0:
		return DirectionGrow
	}
	return DirectionShrink
}
