package pantograph

import (
	"fmt"
	"math"

	"panto/geom"
)

// This file lays out the sheet's rows from the plan's steps: the datum, a tool change whenever
// the tool changes, one row per drilled hole and one per traced or engraved feature, each with
// its passes in whole divisions of the depth dial.

// rows returns one row per step, one per hole for drilling, and a tool change before the first
// cut of every tool, in working order.
func (b sheetBuilder) rows() []SheetRow {
	var out []SheetRow
	var current string // the tool in the spindle
	for i, st := range b.p.Steps {
		if st.What == StepDatum {
			out = append(out, SheetRow{What: StepDatum, Where: b.at(geom.Vec{}), Action: DatumInstruction})
			continue
		}
		f := b.p.Features[st.Feature]
		if tool := b.toolKey(f); tool != current {
			current = tool
			out = append(out, b.toolChange(f, i))
		}
		if st.What == StepDrill {
			out = append(out, b.drillRows(st)...)
		} else {
			out = append(out, b.traceRow(st))
		}
	}
	for i := range out {
		out[i].Step = i + 1
	}
	return out
}

// toolKey names the tool and stylus a feature is made with: a change of either is a tool
// change.
func (b sheetBuilder) toolKey(f PlannedFeature) string {
	return b.toolText(f) + " / " + b.stylusText(f)
}

// toolChange is the step that puts f's tool in the spindle before step i: which tool and
// stylus, the speed, the feed guide and the depth rules of every feature it cuts until the
// next change.
func (b sheetBuilder) toolChange(f PlannedFeature, i int) SheetRow {
	kind, d := toolOf(f)
	r := SheetRow{What: StepToolChange, Tool: b.toolText(f), Stylus: b.stylusText(f),
		Action: "fit the tool and set the spindle speed; touch the tool on the top face of the stock and zero the depth dial"}
	_, material := b.ownedTool(kind, d)
	sp := speedFor(b.m.Spindle, b.mat, material, d, kind)
	r.RPM, r.SpeedNote = sp.RPM, sp.Note
	flutes := 0
	if c, ok := b.cutter(d); ok && kind != ToolDrill {
		flutes = c.Flutes
	}
	if feed, rule, ok := feedGuide(d, sp.RPM, flutes, kind, b.u); ok {
		r.Feed, r.FeedRule = feed, rule
	}
	r.Rules = b.rulesFrom(i)
	return r
}

// rulesFrom lists the depth rules of the features cut from step i until the tool changes, each
// once.
func (b sheetBuilder) rulesFrom(i int) []string {
	tool := b.toolKey(b.p.Features[b.p.Steps[i].Feature])
	seen := map[string]bool{}
	var out []string
	for _, st := range b.p.Steps[i:] {
		g := b.p.Features[st.Feature]
		if b.toolKey(g) != tool {
			break
		}
		if rule := b.ruleFor(g); !seen[rule] {
			seen[rule] = true
			out = append(out, rule)
		}
	}
	return out
}

// ruleFor is the depth rule a feature is cut to, in words.
func (b sheetBuilder) ruleFor(f PlannedFeature) string {
	kind, d := toolOf(f)
	if kind == ToolDrill {
		return peckRule(d, b.u)
	}
	return millPassRule(kind, d, b.mat, b.u).Rule
}

// at returns a position at template point t.
func (b sheetBuilder) at(t geom.Vec) *Position {
	return &Position{Template: t, Part: b.p.StockPoint(t)}
}

// drillRows gives a row for each seat of a drill step; the pecks go on the first.
func (b sheetBuilder) drillRows(st Step) []SheetRow {
	f := b.p.Features[st.Feature]
	d := st.Drill
	if d == 0 {
		d = f.Drill
	}
	total := b.settable(totalDepth(f.Depth, b.p.Stock.Thickness, ToolDrill, d), f.Depth.Through)
	seats := st.Seats
	if len(seats) == 0 {
		seats = f.Seats
	}
	var out []SheetRow
	for i, seat := range seats {
		r := SheetRow{Number: f.Number, Feature: f.Name, What: StepDrill, Tool: b.toolText(f),
			Stylus: b.stylusText(f), Where: b.at(seat), Depth: total, Through: f.Depth.Through,
			Action: fmt.Sprintf("drill hole %d of %d", i+1, len(seats))}
		if i == 0 {
			r.Passes = passes(pecks(total, d, b.depthDivision()))
		} else {
			r.PassNote = "pecks as hole 1"
		}
		out = append(out, r)
	}
	return out
}

// traceRow gives the row of a milled or engraved feature, placed at where the stylus starts.
func (b sheetBuilder) traceRow(st Step) SheetRow {
	f := b.p.Features[st.Feature]
	kind, _ := toolOf(f)
	action := "trace the edge all round, starting here"
	switch {
	case f.Kind == KindProfile:
		action = "cut the outline all round, starting here; the part comes free on the last pass"
	case kind == ToolEngrave:
		action = "engrave along the channel, starting here"
	}
	dep := f.Depth
	if f.Kind == KindProfile || f.Kind == KindCutout {
		dep = Depth{Through: true}
	}
	total := b.settable(totalDepth(dep, b.p.Stock.Thickness, kind, f.Cutter), dep.Through)
	rule := millPassRule(kind, f.Cutter, b.mat, b.u)
	return SheetRow{Number: f.Number, Feature: f.Name, What: st.What, Tool: b.toolText(f),
		Stylus: b.stylusText(f), Where: b.at(startOf(f)), Depth: total, Through: dep.Through, Action: action,
		Passes: passes(passDepths(total, rule.StepDown, b.depthDivision()))}
}

// startOf is where the stylus starts on a feature: a groove's first point, else the first
// corner of its first traced outline.
func startOf(f PlannedFeature) geom.Vec {
	switch {
	case len(f.Path) > 0:
		return f.Path[0]
	case len(f.TemplateRegions) > 0 && len(f.TemplateRegions[0].Outer) > 0:
		return f.TemplateRegions[0].Outer[0].A
	}
	return f.TemplateBounds.Min
}

// depthDivision is one division of the depth dial in mm, or 0 when the dial is not stated.
func (b sheetBuilder) depthDivision() float64 {
	d := b.m.Dials.Depth
	if !d.Stated() {
		return 0
	}
	return d.Division() * d.unitMM()
}

// settable returns the depth of a through cut taken down to the next whole division of the
// depth dial, so the last pass can be set: going a fraction of a division deeper through the
// stock does no harm. A blind depth is kept as drawn, and so is any depth without a dial.
func (b sheetBuilder) settable(total float64, through bool) float64 {
	div := b.depthDivision()
	if !through || div == 0 {
		return total
	}
	return math.Ceil(total/div-divisionSnap) * div
}

// passes turns depths into passes; their readings are filled in later.
func passes(depths []float64) []Pass {
	out := make([]Pass, len(depths))
	for i, d := range depths {
		out[i] = Pass{Depth: d}
	}
	return out
}

// notes lists the rules the sheet used and where they come from.
func (b sheetBuilder) notes() []string {
	return []string{
		"Readings count from the datum; each dial is set to its datum reading with the stylus in the datum seat. Come up to every reading with the dial counting up; where a row says wind back, go back past the reading by the amount given and come up again (backlash: machine-shop training notes).",
		"The copy table carries the template: its readings move the template under the stylus, and the linkage takes the cutter 1/R as far. The work table carries the stock under a cutter that stays put: to bring a point that lies to the right of the datum under the cutter it moves left, so its readings count the other way from the copy table's. +X is to your right, +Y away from you.",
		"The remainder after a reading is the part of a division the dial cannot show; what it is worth at the part is given beside it. The figure in [ ] is the table's move from the datum, in the dial's own units.",
		"Speeds for " + b.mat.Name + ": n = 1000·v_c/(π·d); v_c from " + b.mat.Source + ".",
		"Depth passes are rules of thumb (no published source): equal passes in whole divisions of the depth dial, none deeper than the rule given at each tool change.",
		"Through cuts go past the stock by a break-through allowance: " + b.u.Length(breakThroughMill) + " for cutters, plus the point length (0.3 × D, derived from a 118° point) for drills.",
	}
}
