package pantograph

import (
	"math"

	"panto/geom"
)

// This file turns each feature into what the template carries for it, in the template frame:
// traced edges offset by the compensation δ = R·r_c − r_s (the stylus runs outside the profile
// and inside every opening, so the profile grows by δ and openings shrink by δ), seats for
// drilled holes, and a channel as wide as the stylus for grooves.

// sizeTol is how near, in mm, two tool diameters must be to count as the same size: tool sizes
// are marked to 0.001 mm at best, and inch sizes converted to mm agree far closer than this.
const sizeTol = 5e-4

// planner holds what every feature's plan needs.
type planner struct {
	part    Part
	setup   Setup
	machine *Machine // nil without a machine file
	t       geom.Transform
	u       Units // the part's units, for messages
}

// plan returns the template of one feature with its status and warnings.
func (pl planner) plan(f Feature) (PlannedFeature, []Problem) {
	pf := PlannedFeature{Name: featureName(f), Label: f.Label(), Kind: f.Kind, Depth: f.Depth,
		TemplateBounds: geom.EmptyBox()}
	switch f.Kind {
	case KindProfile:
		return pl.traced(pf, []geom.Region{f.Region}, false)
	case KindCutout, KindPocket, KindSlot:
		return pl.traced(pf, []geom.Region{f.Region}, true)
	case KindHoles:
		return pl.holes(pf, f)
	case KindGroove:
		return pl.groove(pf, f)
	}
	return pf, nil
}

// featureName is a feature's name, or its kind when it has none (the profile usually).
func featureName(f Feature) string {
	if f.Name == "" {
		return string(f.Kind)
	}
	return f.Name
}

// tools fills in the cutter, stylus, tip and compensation of a feature cut with cutter.
func (pl planner) tools(pf PlannedFeature, cutter float64) PlannedFeature {
	pf.Cutter = cutter
	pf.Stylus, pf.Tip = pl.stylusFor(cutter)
	pf.Matched = pl.setup.MatchedStylus(cutter)
	pf.Compensation = compensation(pl.setup.Ratio, cutter, pf.Stylus, pf.Tip)
	return pf
}

// stylusFor returns the stylus used with a cutter: the setup's own when it names one, else
// the owned stylus nearest to matched when the machine lists styli, else a matched one.
func (pl planner) stylusFor(cutter float64) (float64, Tip) {
	tip := pl.setup.Tip
	if tip == "" {
		tip = TipRound
	}
	if pl.setup.Stylus > 0 {
		return pl.setup.Stylus, tip
	}
	if pl.machine != nil {
		if c, ok := ChooseStylus(*pl.machine, pl.setup.Ratio, cutter, pl.setup.Tip); ok {
			if c.Stylus.Tip != "" {
				tip = c.Stylus.Tip
			}
			return c.Stylus.Diameter, tip
		}
	}
	return pl.setup.MatchedStylus(cutter), tip
}

// traced plans a feature whose edges the stylus follows: the profile (inside == false, the
// stylus runs outside it) or openings and recesses (inside, the stylus runs within).
func (pl planner) traced(pf PlannedFeature, rs []geom.Region, inside bool) (PlannedFeature, []Problem) {
	pf = pl.tools(pf, pl.setup.cutterFor(pf.Kind))
	pf.Method = Traced
	var ws []Problem
	if inside {
		pf.Status, ws = openingFit(pf, rs, pf.Cutter, pl.u)
	} else {
		pf.Status, ws = profileFit(pf, rs[0], pf.Cutter, pl.u)
	}
	if pf.Status == StatusLost {
		return pf, ws
	}
	d := pf.Compensation
	if inside {
		d = -d
	}
	pf.TemplateBounds = geom.EmptyBox()
	for _, r := range rs {
		for _, tr := range r.Transform(pl.t).Offset(d).Regions {
			pf.TemplateRegions = append(pf.TemplateRegions, tr)
			pf.TemplateArea += tr.Area()
			pf.TemplateBounds = pf.TemplateBounds.Union(tr.Bounds())
		}
	}
	if len(pf.TemplateRegions) == 0 {
		pf.Status = StatusLost
		if pf.Tip == TipPointed {
			// A pointed stylus traces the cutter's centre path itself; an opening exactly as
			// wide as the cutter leaves a path of no width, which no template can hold.
			ws = append(ws, warnf(pf, "with a pointed stylus the template opening is the cutter's centre path, and here it has no width: no template can hold it; use a round stylus"))
		} else {
			ws = append(ws, warnf(pf, "the stylus Ø%s cannot enter the template opening at all", pl.u.Length(pf.Stylus)))
		}
		return pf, ws
	}
	if w, ok := pl.oversizeLoss(pf, rs, inside); ok {
		pf.Status = StatusDeviates
		ws = append(ws, w)
	}
	return pf, ws
}

// oversizeLoss checks what a stylus larger than the matched one loses. Its template edge lies
// |δ| inside the drawn edge (times R), and the stylus centre runs r_s out from the template:
// every path it can follow is the template grown by r_s, whose outward corners are arcs of at
// least r_s. So each sharp corner of the material comes out rounded to |δ|/R at the part, and
// a detail narrower than 2|δ|/R (a thin tab of the profile, a thin web reaching into an
// opening) is missing from the template altogether: the stylus rides past and the cutter takes
// it away. The stylus path the template gives is compared with the cutter path scaled by R;
// any difference in area is reported, with the corner radius |δ|/R as the amount.
func (pl planner) oversizeLoss(pf PlannedFeature, rs []geom.Region, inside bool) (Problem, bool) {
	if pf.Compensation >= -sizeTol {
		return Problem{}, false
	}
	side := 1.0 // the stylus runs outside a profile
	if inside {
		side = -1
	}
	rc, rs2 := pf.Cutter/2, pf.Stylus/2
	if pf.Tip == TipPointed {
		rs2 = 0
	}
	var want, got float64
	for _, r := range rs {
		want += areaOf(r.Transform(pl.t).Offset(side * pl.setup.Ratio * rc).Regions)
	}
	for _, tr := range pf.TemplateRegions {
		got += areaOf(tr.Offset(side * rs2).Regions)
	}
	r2 := pl.setup.Ratio * pl.setup.Ratio
	lost := math.Abs(want-got) / r2 // mm² at the part
	if lost <= oversizeAreaTol*math.Max(1, want/r2) {
		return Problem{}, false
	}
	radius := -pf.Compensation / pl.setup.Ratio
	return amountWarn(pf, radius, "the stylus Ø%s is larger than the matched Ø%s, so sharp corners of the material come out rounded to R%s at the part and details narrower than %s are cut away (%s of the part differ); use a stylus nearer Ø%s",
		pl.u.Length(pf.Stylus), pl.u.Length(pf.Matched), pl.u.Length(radius), pl.u.Length(2*radius), pl.u.Area(lost), pl.u.Length(pf.Matched)), true
}

// oversizeAreaTol is the area, in mm² at the part per mm² of feature, below which the stylus
// path and the cutter path count as the same: the offsets are exact, so only rounding differs,
// some twelve orders of magnitude below this.
const oversizeAreaTol = 1e-7

// holes plans a holes feature: seats for a drill, or traced openings when the holes are milled.
func (pl planner) holes(pf PlannedFeature, f Feature) (PlannedFeature, []Problem) {
	cutter := pl.setup.cutterFor(KindHoles)
	drill, haveDrill := pl.drillFor(f.Diameter)
	larger := f.Diameter > cutter+sizeTol
	if larger && (pl.setup.MillHoles || !haveDrill) {
		rs := make([]geom.Region, len(f.Centers))
		for i := range f.Centers {
			rs[i] = geom.NewRegion(f.HoleContour(i))
		}
		pf, ws := pl.traced(pf, rs, true)
		if !haveDrill && !pl.setup.MillHoles {
			ws = append(ws, warnf(pf, "no drill of Ø%s at hand: milled with the Ø%s cutter instead", pl.u.Length(f.Diameter), pl.u.Length(cutter)))
		}
		return pf, ws
	}
	// The stylus that traces the rest of the job drops into the seats.
	pf.Stylus, pf.Tip = pl.stylusFor(pl.setup.Cutter)
	pf.Matched = pl.setup.MatchedStylus(pl.setup.Cutter)
	pf.Method, pf.Status = Drilled, StatusOK
	pf.Drill = f.Diameter
	pf.TemplateBounds = geom.EmptyBox()
	for _, c := range f.Centers {
		s := pl.t.Apply(c)
		pf.Seats = append(pf.Seats, s)
		pf.TemplateBounds = pf.TemplateBounds.Union(geom.Box{Min: s, Max: s}.Expand(pf.Stylus / 2))
	}
	var ws []Problem
	if !haveDrill {
		w := warnf(pf, "no drill of Ø%s at hand", pl.u.Length(f.Diameter))
		if drill > 0 {
			w = amountWarn(pf, math.Abs(drill-f.Diameter), "no drill of Ø%s at hand; the nearest is Ø%s", pl.u.Length(f.Diameter), pl.u.Length(drill))
		}
		ws = append(ws, w)
	}
	return pf, ws
}

// drillFor returns the drill at hand nearest to diameter d and whether it is d. Without a
// machine file, or with one that lists no drills, every size counts as at hand.
func (pl planner) drillFor(d float64) (float64, bool) {
	if pl.machine == nil || len(pl.machine.Drills) == 0 {
		return d, true
	}
	best := pl.machine.Drills[0].Diameter
	for _, dr := range pl.machine.Drills {
		if math.Abs(dr.Diameter-d) < math.Abs(best-d) {
			best = dr.Diameter
		}
	}
	return best, math.Abs(best-d) <= sizeTol
}

// groove plans an engraved line: its centreline on the template, in a channel as wide as the
// stylus. A groove drawn wider or narrower than the cutter comes out the cutter's width.
func (pl planner) groove(pf PlannedFeature, f Feature) (PlannedFeature, []Problem) {
	pf = pl.tools(pf, pl.setup.cutterFor(KindGroove))
	pf.Compensation, pf.Method, pf.Status = 0, Engraved, StatusOK
	pf.Width = pf.Stylus
	pf.TemplateBounds = geom.EmptyBox()
	for _, p := range f.Path {
		q := pl.t.Apply(p)
		pf.Path = append(pf.Path, q)
		pf.TemplateBounds = pf.TemplateBounds.AddPoint(q)
	}
	pf.TemplateBounds = pf.TemplateBounds.Expand(pf.Width / 2)
	if f.Width > 0 && math.Abs(f.Width-pf.Cutter) > sizeTol {
		pf.Status = StatusDeviates
		return pf, []Problem{amountWarn(pf, math.Abs(f.Width-pf.Cutter),
			"drawn %s wide, but the Ø%s cutter engraves it %s wide", pl.u.Length(f.Width), pl.u.Length(pf.Cutter), pl.u.Length(pf.Cutter))}
	}
	return pf, nil
}

// compensation is δ = R·r_c − r_s in template mm for a stylus of the given diameter and tip.
func compensation(ratio, cutter, stylus float64, tip Tip) float64 {
	return Compensation(ratio, cutter, Stylus{Diameter: stylus, Tip: tip}.TracingDiameter())
}
