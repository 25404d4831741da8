package pantograph

import "fmt"

// This file reads every position and depth of the sheet's rows on the machine's dials.

// axis is one dial with how its position is taken from a row and stored back: get gives the
// table's move from the datum, in mm, that brings the cutter over the row's point.
//
// The copy table carries the template with the stylus held in its seat: a move m of the table
// reaches the cutter through the linkage as m/R (−m/R where the linkage turns the copy, which
// the template's own turn makes up for), so the move is the template point itself. The work
// table carries the stock under a cutter that stays put: to bring the point at +x on the stock
// under the cutter the table moves −x.
type axis struct {
	name  string
	dial  Dial
	scale float64
	get   func(*Position) float64
	set   func(*Position, Reading)
	up    [2]string // which way the table goes counting up: along the axis, and reversed
}

// The words for which way a table goes, along each axis and against it: +X is to the
// operator's right, +Y away from the operator, the depth dial down into the work.
var (
	xWays     = [2]string{"right (+X)", "left (−X)"}
	yWays     = [2]string{"away from you (+Y)", "toward you (−Y)"}
	depthWays = [2]string{"down into the work", "up, out of the work"}
)

// axes returns the four positioning dials.
func (b sheetBuilder) axes() []axis {
	ds := b.m.Dials
	r := b.p.Setup.Ratio
	return []axis{
		{"copy X", ds.CopyX, r, func(p *Position) float64 { return p.Template.X }, func(p *Position, v Reading) { p.CopyX = v }, xWays},
		{"copy Y", ds.CopyY, r, func(p *Position) float64 { return p.Template.Y }, func(p *Position, v Reading) { p.CopyY = v }, yWays},
		{"work X", ds.WorkX, 1, func(p *Position) float64 { return -p.Part.X }, func(p *Position, v Reading) { p.WorkX = v }, xWays},
		{"work Y", ds.WorkY, 1, func(p *Position) float64 { return -p.Part.Y }, func(p *Position, v Reading) { p.WorkY = v }, yWays},
	}
}

// readAll fills in every reading and back-off of rows and returns what each dial is set to.
func (b sheetBuilder) readAll(rows []SheetRow) SheetDials {
	ax := b.axes()
	return SheetDials{CopyX: b.readAxis(ax[0], rows), CopyY: b.readAxis(ax[1], rows),
		WorkX: b.readAxis(ax[2], rows), WorkY: b.readAxis(ax[3], rows), Depth: b.readDepth(rows)}
}

// readAxis reads one positioning dial along the rows that have a position, in order, with a
// back-off note on each position that lies behind the one before.
func (b sheetBuilder) readAxis(a axis, rows []SheetRow) DialInfo {
	info := dialInfo(a.name, a.dial, a.scale, a.up)
	if !info.Stated {
		return info
	}
	var at []*Position
	var counts []float64
	for _, r := range rows {
		if r.Where != nil {
			at = append(at, r.Where)
			counts = append(counts, a.dial.Count(a.get(r.Where)))
		}
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
	for i, p := range at {
		a.set(p, a.dial.Read(counts[i], a.scale))
		if moves[i].Reversal {
			p.BackOff = append(p.BackOff, fmt.Sprintf("%s: wind back to %s, then come up",
				a.name, a.dial.Read(moves[i].BackTo, a.scale)))
		}
	}
	return info
}

// readDepth reads every pass on the depth dial; the passes are already whole divisions (see
// passDepths), but for a blind depth between divisions, whose remainder the reading shows.
func (b sheetBuilder) readDepth(rows []SheetRow) DialInfo {
	d := b.m.Dials.Depth
	info := dialInfo("depth", d, 1, depthWays)
	if !info.Stated {
		return info
	}
	for i := range rows {
		for j, p := range rows[i].Passes {
			rows[i].Passes[j].Reading = d.Read(d.Count(p.Depth), 1)
		}
	}
	return info
}

// dialInfo describes a dial for the sheet's header; up says which way its table goes counting
// up, along the axis and reversed.
func dialInfo(name string, d Dial, scale float64, up [2]string) DialInfo {
	info := DialInfo{Name: name, Stated: d.Stated(), Pitch: d.Pitch, Divisions: d.Divisions, Units: d.Units,
		CountUp: up[0], Reversed: d.Reversed}
	if d.Reversed {
		info.CountUp = up[1]
	}
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
