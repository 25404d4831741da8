package pantograph

import (
	"fmt"
	"math"

	"panto/geom"
)

// This file lays out the sheet's rows from the plan's steps and then reads every position and
// depth on the machine's dials.

// rows returns one row per step, one per hole for drilling, in working order.
func (b sheetBuilder) rows() []SheetRow {
	var out []SheetRow
	for _, st := range b.p.Steps {
		switch st.What {
		case StepDatum:
			out = append(out, SheetRow{What: StepDatum, Where: b.at(geom.Vec{}),
				Action: "put the stylus on the datum (in its seat, where the template has one); set each dial to its datum reading; touch the cutter on the top face and zero the depth dial"})
		case StepDrill:
			out = append(out, b.drillRows(st)...)
		default:
			out = append(out, b.traceRow(st))
		}
	}
	for i := range out {
		out[i].Step = i + 1
	}
	return out
}

// at returns a position at template point t.
func (b sheetBuilder) at(t geom.Vec) *Position {
	return &Position{Template: t, Part: t.Mul(1 / b.p.Setup.Ratio)}
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
			Stylus: stylusText(f), Where: b.at(seat), Depth: total, Through: f.Depth.Through,
			Action: fmt.Sprintf("drill hole %d of %d", i+1, len(seats))}
		if i == 0 {
			r.Passes, r.PassRule = passes(pecks(total, d)), peckRule(d)
		} else {
			r.PassRule = "pecks as hole 1"
		}
		b.speed(&r, d, ToolDrill)
		out = append(out, r)
	}
	return out
}

// traceRow gives the row of a milled or engraved feature, placed at where the stylus starts.
func (b sheetBuilder) traceRow(st Step) SheetRow {
	f := b.p.Features[st.Feature]
	kind, action := ToolMill, "trace the edge all round, starting here"
	if f.Kind == KindProfile {
		action = "cut the outline all round, starting here; the part comes free on the last pass"
	}
	if st.What == StepEngrave {
		kind, action = ToolEngrave, "engrave along the channel, starting here"
	}
	dep := f.Depth
	if f.Kind == KindProfile || f.Kind == KindCutout {
		dep = Depth{Through: true}
	}
	total := b.settable(totalDepth(dep, b.p.Stock.Thickness, kind, f.Cutter), dep.Through)
	rule := millPassRule(kind, f.Cutter, b.p.Stock.Material)
	r := SheetRow{Number: f.Number, Feature: f.Name, What: st.What, Tool: b.toolText(f),
		Stylus: stylusText(f), Where: b.at(startOf(f)), Depth: total, Through: dep.Through, Action: action,
		Passes: passes(Passes(total, rule.StepDown)), PassRule: rule.Rule}
	b.speed(&r, f.Cutter, kind)
	return r
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

// settable returns the depth of a through cut taken down to the next whole division of the
// depth dial, so the last pass can be set: going a fraction of a division deeper through the
// stock does no harm. A blind depth is kept as drawn, and so is any depth without a dial.
func (b sheetBuilder) settable(total float64, through bool) float64 {
	d := b.m.Dials.Depth
	if !through || !d.Stated() {
		return total
	}
	div := d.Division() * d.unitMM()
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

// speed fills in the spindle speed and feed guide of a row cut with a tool of kind and d mm.
func (b sheetBuilder) speed(r *SheetRow, d float64, kind ToolKind) {
	if !(d > 0) {
		return
	}
	sp := speedFor(b.m.Spindle, b.p.Stock.Material, b.toolMaterial(d, kind), d, kind)
	r.RPM, r.SpeedNote = sp.RPM, sp.Note
	flutes := 0
	if c, ok := b.cutter(d); ok && kind != ToolDrill {
		flutes = c.Flutes
	}
	if feed, rule, ok := feedGuide(d, sp.RPM, flutes, kind); ok {
		r.Feed, r.FeedRule = feed, rule
	}
}

// axis is one dial with how its position is taken from a row and stored back.
type axis struct {
	name  string
	dial  Dial
	scale float64
	get   func(*Position) float64
	set   func(*Position, Reading)
}

// axes returns the four positioning dials.
func (b sheetBuilder) axes() []axis {
	ds := b.m.Dials
	return []axis{
		{"copy X", ds.CopyX, b.p.Setup.Ratio, func(p *Position) float64 { return p.Template.X }, func(p *Position, r Reading) { p.CopyX = r }},
		{"copy Y", ds.CopyY, b.p.Setup.Ratio, func(p *Position) float64 { return p.Template.Y }, func(p *Position, r Reading) { p.CopyY = r }},
		{"work X", ds.WorkX, 1, func(p *Position) float64 { return p.Part.X }, func(p *Position, r Reading) { p.WorkX = r }},
		{"work Y", ds.WorkY, 1, func(p *Position) float64 { return p.Part.Y }, func(p *Position, r Reading) { p.WorkY = r }},
	}
}

// readAll fills in every reading and back-off of rows and returns what each dial is set to.
func (b sheetBuilder) readAll(rows []SheetRow) SheetDials {
	ax := b.axes()
	return SheetDials{CopyX: b.readAxis(ax[0], rows), CopyY: b.readAxis(ax[1], rows),
		WorkX: b.readAxis(ax[2], rows), WorkY: b.readAxis(ax[3], rows), Depth: b.readDepth(rows)}
}

// readAxis reads one positioning dial along the rows, in order, with a back-off note on each
// position that lies behind the one before.
func (b sheetBuilder) readAxis(a axis, rows []SheetRow) DialInfo {
	info := dialInfo(a.name, a.dial, a.scale)
	if !info.Stated {
		return info
	}
	var counts []float64
	for _, r := range rows {
		counts = append(counts, a.dial.Count(a.get(r.Where)))
	}
	// Every reading, and every wind-back below one (the datum's own included), stays positive.
	lows := []float64{-a.dial.BackOff()}
	for _, c := range counts {
		lows = append(lows, c-a.dial.BackOff())
	}
	info.DatumTurns = a.dial.DatumTurns(lows)
	shift := float64(info.DatumTurns) * a.dial.Pitch
	for i := range counts {
		counts[i] += shift
	}
	moves := a.dial.approach(shift, counts)
	for i, r := range rows {
		a.set(r.Where, a.dial.Read(counts[i], a.scale))
		if moves[i].Reversal {
			r.Where.BackOff = append(r.Where.BackOff, fmt.Sprintf("%s: wind back to %s, then come up",
				a.name, a.dial.Read(moves[i].BackTo, a.scale)))
		}
	}
	return info
}

// readDepth reads every pass on the depth dial.
func (b sheetBuilder) readDepth(rows []SheetRow) DialInfo {
	d := b.m.Dials.Depth
	info := dialInfo("depth", d, 1)
	if !info.Stated {
		return info
	}
	for i := range rows {
		ps := snapPasses(rows[i].Passes, d)
		for j := range ps {
			ps[j].Reading = d.Read(d.Count(ps[j].Depth), 1)
		}
		rows[i].Passes = ps
	}
	return info
}

// snapPasses moves every pass but the last to a whole division of the depth dial, no deeper
// than planned, so each can be set; the last stays at the row's depth (see settable). A pass
// that would then go no deeper than the one before is dropped.
func snapPasses(ps []Pass, d Dial) []Pass {
	div := d.Division() * d.unitMM()
	var out []Pass
	last := 0.0
	for i, p := range ps {
		if i < len(ps)-1 {
			p.Depth = math.Floor(p.Depth/div+divisionSnap) * div
		}
		if p.Depth > last+divisionSnap*div || i == len(ps)-1 {
			out = append(out, p)
			last = p.Depth
		}
	}
	return out
}

// dialInfo describes a dial for the sheet's header.
func dialInfo(name string, d Dial, scale float64) DialInfo {
	info := DialInfo{Name: name, Stated: d.Stated(), Pitch: d.Pitch, Divisions: d.Divisions, Units: d.Units}
	if info.Units == "" {
		info.Units = MM
	}
	if info.Stated {
		info.Division = d.Division()
		info.AtPart = d.Division() * d.unitMM() / scale
		info.BackOff = d.BackOff()
	}
	return info
}

// notes lists the rules the sheet used and where they come from.
func (b sheetBuilder) notes() []string {
	out := []string{
		"Readings count from the datum; each dial is set to its datum reading with the stylus in the datum seat. Come up to every reading with the dial counting up; where a row says wind back, go back past the reading by the amount given and come up again (backlash: machine-shop training notes).",
		"The remainder after a reading is the part of a division the dial cannot show; what it is worth at the part is given beside it. The figure in [ ] is the distance from the datum, in the dial's own units.",
		"Speeds: " + SpeedSource + ".",
		"Through cuts go past the stock by a break-through allowance: 0.05 mm for cutters, plus the point length (0.3 × D, derived from a 118° point) for drills.",
	}
	if g, ok := materialGroup(b.p.Stock.Material); !ok {
		out = append(out, fmt.Sprintf("The material %q is not in the speed table; the slowest row (%s) was used.", b.p.Stock.Material, g))
	}
	return out
}
