// Package sheet writes the dial-reading sheet (pantograph.Sheet) as text for the terminal and
// a printer, CSV for a spreadsheet, JSON for scripts, and PDF on A4 or Letter. The writers only
// lay out what the sheet holds; every number is the sheet's own, and lengths at the part are
// said in the part's own units (Sheet.Units). Output is deterministic: the same sheet gives the
// same bytes.
package sheet

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"panto/internal/numfmt"
	"panto/pantograph"
)

// This file words what the text and PDF sheets share: the header, the dials, the heading and
// lines of each step, and the cells of the passes table.

// num formats a length in mm for people (numfmt.MM).
func num(v float64) string { return numfmt.MM(v) }

// reading formats a reading with the remainder's worth at the part, in u, when there is one:
// "6 t 17 div" or "2 t 34 div +0.50 div (0.0013 mm)".
func reading(r pantograph.Reading, u pantograph.Units) string {
	s := r.String()
	if r.Remainder >= 0.005 {
		s += " (" + numfmt.Fixed(u.FromMM(r.AtPart), 4) + " " + u.Word() + ")"
	}
	return s
}

// title is the sheet's heading.
func title(s pantograph.Sheet) string { return "Dial-reading sheet: " + s.Part }

// header returns the header lines as label and value.
func header(s pantograph.Sheet) [][2]string {
	h := [][2]string{{"part file", s.Source}}
	stock := s.Material
	if s.Thickness > 0 {
		stock += ", " + s.Units.Length(s.Thickness) + " thick"
	}
	h = append(h, [2]string{"stock", stock + "; speeds for " + s.Speeds})
	ratio := num(s.Ratio) + ":1, the template " + num(s.Ratio) + " times the part"
	if s.Layout != "" {
		ratio += ", " + s.Layout
	}
	h = append(h, [2]string{"ratio", ratio})
	machine := s.Machine
	if machine == "" {
		machine = "no machine file: positions as lengths only"
	}
	h = append(h, [2]string{"machine", machine})
	if s.Date != "" {
		h = append(h, [2]string{"date", s.Date})
	}
	for i, t := range s.Tools {
		label := ""
		if i == 0 {
			label = "tools"
		}
		h = append(h, [2]string{label, t})
	}
	return h
}

// dialLine describes a dial: its screw and division, which way it moves its table, what it is
// set to at the datum and how far to wind back after a reversal.
func dialLine(d pantograph.DialInfo, u pantograph.Units) string {
	if !d.Stated {
		return "not stated in the machine file: set positions by measuring"
	}
	way := "counting up moves the table " + d.CountUp
	if d.Name == "depth" {
		way = "counting up moves the cutter " + d.CountUp
	}
	if d.Reversed {
		way += " (reversed)"
	}
	return fmt.Sprintf("%s %s / %d div = %s %s per div (%s %s at the part); %s; at the datum set %d t 0 div; wind back %s %s after a reversal",
		num(d.Pitch), d.Units, d.Divisions, fine(d.Division), d.Units, numfmt.Trim(u.FromMM(d.AtPart), 5), u.Word(), way,
		d.DatumTurns, fine(d.BackOff), d.Units)
}

// fine formats a small quantity to four decimals without trailing zeros (0.0001 in is a
// common inch division).
func fine(v float64) string { return numfmt.Trim(v, 4) }

// stepTitle is a row's heading: "3. #2 pins: drill hole 1 of 2", "2. tool change: ...".
func stepTitle(r pantograph.SheetRow) string {
	switch r.What {
	case pantograph.StepDatum:
		return fmt.Sprintf("%d. datum", r.Step)
	case pantograph.StepToolChange:
		return fmt.Sprintf("%d. tool change: %s, %s", r.Step, r.Tool, r.Stylus)
	}
	return fmt.Sprintf("%d. #%d %s: %s", r.Step, r.Number, r.Feature, r.Action)
}

// positionLines gives the copy-table and work-table lines of a position.
func positionLines(p *pantograph.Position, s pantograph.Sheet) []string {
	if p == nil {
		return nil
	}
	ds := s.Dials
	copyLine := fmt.Sprintf("copy table  X %s  Y %s", axisText(p.CopyX, p.Template.X, ds.CopyX, s.Units),
		axisText(p.CopyY, p.Template.Y, ds.CopyY, s.Units))
	workLine := fmt.Sprintf("work table  X %s  Y %s", axisText(p.WorkX, -p.Part.X, ds.WorkX, s.Units),
		axisText(p.WorkY, -p.Part.Y, ds.WorkY, s.Units))
	out := []string{copyLine, workLine}
	for _, b := range p.BackOff {
		out = append(out, "first "+b)
	}
	return out
}

// axisText is a reading with the table's move from the datum in the dial's own units, or the
// move alone, in the part's units, without a dial.
func axisText(r pantograph.Reading, move float64, d pantograph.DialInfo, u pantograph.Units) string {
	if !d.Stated {
		return "move " + signed(move, u)
	}
	return fmt.Sprintf("%s [%s]", reading(r, u), signed(move, d.Units))
}

// signed formats a move with its sign: "+44 mm", "−5.5 mm", "0 mm".
func signed(mm float64, u pantograph.Units) string {
	s := u.Length(mm)
	if !strings.HasPrefix(s, "-") && !strings.HasPrefix(s, "0 ") {
		return "+" + s
	}
	return strings.Replace(s, "-", "−", 1)
}

// depthLine gives the depth of a row and how many passes or pecks reach it.
func depthLine(r pantograph.SheetRow, s pantograph.Sheet) string {
	word := plural(len(r.Passes), "pass", "passes")
	if r.What == pantograph.StepDrill {
		word = plural(len(r.Passes), "peck", "pecks")
	}
	depth := s.Units.Length(r.Depth)
	if r.Through {
		depth += " (through)"
	}
	switch {
	case r.PassNote != "":
		return fmt.Sprintf("depth %s, %s", depth, r.PassNote)
	case len(r.Passes) == 0:
		return "depth " + depth
	}
	return fmt.Sprintf("depth %s: %d %s, each ticked when cut", depth, len(r.Passes), word)
}

// passCells gives one cell of the passes table per pass: the depth in the part's units and,
// with a depth dial, its reading.
func passCells(r pantograph.SheetRow, s pantograph.Sheet) []string {
	out := make([]string, len(r.Passes))
	for i, p := range r.Passes {
		out[i] = s.Units.Number(p.Depth)
		if s.Dials.Depth.Stated {
			out[i] += "  " + reading(p.Reading, s.Units)
		}
	}
	return out
}

// roughly formats a guide figure to two significant digits: a feed guide is not exact.
func roughly(v float64) string {
	if v <= 0 {
		return "0"
	}
	p := math.Pow(10, math.Floor(math.Log10(v))-1)
	return strconv.FormatFloat(math.Round(v/p)*p, 'f', max(0, int(-math.Log10(p)+0.5)), 64)
}

// plural picks the word for n things.
func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}

// speedLine gives a tool change's spindle speed and feed guide.
func speedLine(r pantograph.SheetRow, u pantograph.Units) string {
	if r.RPM == 0 {
		return ""
	}
	s := fmt.Sprintf("spindle %.0f rpm", r.RPM)
	if r.SpeedNote != "" {
		s += " (" + r.SpeedNote + ")"
	}
	if r.Feed > 0 {
		s += fmt.Sprintf("; feed about %s %s/min, %s", roughly(u.FromMM(r.Feed)), u.Word(), r.FeedRule)
	}
	return s
}

// rowLines gives every line under a row's heading; the passes table follows them.
func rowLines(r pantograph.SheetRow, s pantograph.Sheet) []string {
	var out []string
	switch r.What {
	case pantograph.StepDatum, pantograph.StepToolChange:
		out = append(out, r.Action)
	}
	out = append(out, positionLines(r.Where, s)...)
	if r.What == pantograph.StepToolChange {
		if l := speedLine(r, s.Units); l != "" {
			out = append(out, l)
		}
		for _, rule := range r.Rules {
			out = append(out, "depth rule: "+rule)
		}
	} else if r.What != pantograph.StepDatum {
		out = append(out, depthLine(r, s))
	}
	return out
}
