package pantograph

import (
	"fmt"
	"math"

	"panto/geom"
)

// This file says what a round cutter cannot make of a feature, in mm at the part. A cutter of
// radius r clearing an opening from inside can reach exactly the opening's morphological
// opening: shrink it by r (where the cutter's centre can go) and grow that back by r. Clearing
// round the profile from outside it leaves the closing: grow by r, shrink back. Whatever
// differs between the drawn region and that is material the cutter leaves: at inside corners
// sharper than the cutter, in necks narrower than it, or all of it when nothing is left after
// shrinking.
//
// The stylus on the template needs no check of its own, with one exception. The template
// opening is O' = R·O offset by −δ, δ = R·r_c − r_s, and the stylus can stand in it wherever
// O' shrunk by r_s is not empty. For δ ≥ 0 (matched or undersize stylus) two shrinkings add
// up: O' shrunk by r_s is R·O shrunk by R·r_c, R times where the cutter's centre can go. For
// δ < 0 (oversize) O' is R·O grown by |δ|, and growing by |δ| then shrinking by r_s > |δ|
// keeps at least R·O shrunk by r_s − |δ| = R·r_c: the stylus goes wherever the cutter does.
// (The reverse need not hold: growing by |δ| fills in material standing into the opening
// that is narrower than 2|δ|/R at the part, so the template loses it and the cutter cuts it
// away; the profile, shrunk by |δ|, likewise loses tabs that narrow. No check here sees that
// yet.) As the stylus fits wherever the cutter does, the planner's "stylus cannot enter"
// check (template.go) never fires for a round stylus: the cutter check passes an opening only
// when it is wider than d − 2·fitTol, and then O' is not empty as long as r_s > R·fitTol (a
// nanometre at 10:1). Milled holes are wider than the cutter by sizeTol; δ is never clamped.
// The exception is a pointed stylus (r_s = 0, δ = R·r_c): O' is then R times the room of the
// cutter's centre itself, which for an opening exactly as wide as the cutter is a line or a
// point with no area, so the cutter check passes it and the template check loses it.

// deviationTol is the material, in mm at the part, below which a feature counts as made as
// drawn: a tenth of a micrometre, ten times finer than a micrometer reads (0.001 mm), and far
// above the rounding of geom's exact offsets (about 1e-12 mm).
const deviationTol = 1e-4

// fitTol is how much less than the cutter's radius the shrinking uses, in mm, so that a cutter
// exactly as wide as a slot, or as round as a fillet, counts as fitting: such features are
// drawn to be cut in one pass, and shrinking by the full radius leaves only a line, which is no
// region. A tenth of a micrometre changes the material reported left by less than that.
const fitTol = 1e-7

// openingFit checks openings or recesses rs, all cut from inside with a cutter of diameter d.
// Holes of one milled feature share their fate, so only the first that deviates is described.
func openingFit(pf PlannedFeature, rs []geom.Region, d float64, u Units) (Status, []Problem) {
	st, ws, more := StatusOK, []Problem(nil), 0
	for _, r := range rs {
		s, w := openingFitOne(pf, r, d, u)
		st = worse(st, s)
		switch {
		case len(w) == 0:
		case ws == nil:
			ws = w
		default:
			more++
		}
	}
	if more > 0 {
		ws[len(ws)-1].Message += fmt.Sprintf(" (and the same at %d more)", more)
	}
	return st, ws
}

// openingFitOne checks one region cut from inside.
func openingFitOne(pf PlannedFeature, r geom.Region, d float64, u Units) (Status, []Problem) {
	rc := d/2 - fitTol
	centre := r.Offset(-rc).Regions
	if len(centre) == 0 {
		amount, width := d, "too small"
		if g, ok := r.NarrowestWidth(); ok {
			amount, width = d-g.Width, u.Length(g.Width)+" wide at its narrowest"
		}
		return StatusLost, []Problem{amountWarn(pf, amount,
			"%s, smaller than the Ø%s cutter: the cutter cannot go in, nothing of it is cut", width, u.Length(d))}
	}
	cut := geom.OffsetRegions(centre, rc)
	var ws []Problem
	if len(centre) > 1 {
		ws = append(ws, neckWarning(pf, r, d, len(centre), u))
	}
	if c, ok := r.SharpestConvexCorner(); ok && c.Radius < rc-deviationTol {
		ws = append(ws, cornerWarning(pf, c, d, cut, u)...)
	}
	return areaWarnings(pf, ws, r.Area()-areaOf(cut), r.Perimeter(), u)
}

// profileFit checks the profile, cut round from outside with a cutter of diameter d.
func profileFit(pf PlannedFeature, r geom.Region, d float64, u Units) (Status, []Problem) {
	rc := d/2 - fitTol
	made := geom.OffsetRegions(r.Offset(rc).Regions, -rc)
	var ws []Problem
	if g, ok := r.NarrowestGap(); ok && g.Width < d-deviationTol {
		at := g.A.Lerp(g.B, 0.5)
		ws = append(ws, amountWarn(pf, d-g.Width,
			"the notch at %s is %s wide, narrower than the Ø%s cutter: it is not cut to the bottom",
			u.Point(at.X, at.Y), u.Length(g.Width), u.Length(d)))
	}
	if c, ok := r.SharpestConcaveCorner(); ok && c.Radius < rc-deviationTol {
		ws = append(ws, cornerWarning(pf, c, d, made, u)...)
	}
	return areaWarnings(pf, ws, areaOf(made)-r.Area(), r.Perimeter(), u)
}

// neckWarning describes an opening the cutter can only cut as n separate pieces.
func neckWarning(pf PlannedFeature, r geom.Region, d float64, n int, u Units) Problem {
	g, ok := r.NarrowestWidth()
	if !ok {
		return warnf(pf, "the Ø%s cutter cannot pass its narrowest place: it comes out as %d separate openings", u.Length(d), n)
	}
	at := g.A.Lerp(g.B, 0.5)
	return amountWarn(pf, d-g.Width,
		"it narrows to %s at %s, less than the Ø%s cutter: it comes out as %d separate openings with material left between them",
		u.Length(g.Width), u.Point(at.X, at.Y), u.Length(d), n)
}

// cornerWarning describes the material a cutter of diameter d leaves in corner c, as the
// distance from the drawn corner to the edge the cutter makes (cut). For a sharp corner of
// inside angle θ that is r(1/sin(θ/2) − 1); r(√2 − 1) at 90°.
func cornerWarning(pf PlannedFeature, c geom.Corner, d float64, cut []geom.Region, u Units) []Problem {
	left := math.Inf(1)
	for _, r := range cut {
		for _, k := range r.Contours() {
			left = math.Min(left, distToContour(k, c.At))
		}
	}
	if !(left > deviationTol) || math.IsInf(left, 1) {
		return nil
	}
	drawn := "sharp"
	if c.Radius > 0 {
		drawn = "R" + u.Length(c.Radius)
	}
	return []Problem{amountWarn(pf, left,
		"the inside corner at %s is drawn %s; the Ø%s cutter rounds it to R%s and leaves %s of material in the corner",
		u.Point(c.At.X, c.At.Y), drawn, u.Length(d), u.Length(d/2), u.Length(left))}
}

// areaWarnings adds the area a cutter leaves (uncut, mm²) to the warnings about a feature and
// returns its status. Differences within deviationTol of the outline all round count as none.
func areaWarnings(pf PlannedFeature, ws []Problem, uncut, perimeter float64, u Units) (Status, []Problem) {
	if uncut <= deviationTol*perimeter {
		if len(ws) == 0 {
			return StatusOK, nil
		}
		return StatusDeviates, ws
	}
	a := u.Area(uncut) + " in all stays uncut"
	if len(ws) == 0 {
		return StatusDeviates, []Problem{warnf(pf, "the cutter cannot reach every part of it: %s", a)}
	}
	ws[len(ws)-1].Message += "; " + a
	return StatusDeviates, ws
}

// areaOf sums the areas of rs.
func areaOf(rs []geom.Region) float64 {
	var a float64
	for _, r := range rs {
		a += r.Area()
	}
	return a
}

// worse returns the worse of two statuses.
func worse(a, b Status) Status {
	rank := map[Status]int{StatusOK: 0, StatusDeviates: 1, StatusLost: 2}
	if rank[b] > rank[a] {
		return b
	}
	return a
}

// warnf builds a warning about a planned feature, without an amount.
func warnf(pf PlannedFeature, format string, args ...any) Problem {
	return Problem{Severity: Warning, Feature: pf.Name, Label: pf.Label, Message: fmt.Sprintf(format, args...)}
}

// amountWarn builds a warning about a planned feature with an amount in mm at the part.
func amountWarn(pf PlannedFeature, amount float64, format string, args ...any) Problem {
	w := warnf(pf, format, args...)
	w.Amount, w.HasAmount = amount, true
	return w
}
