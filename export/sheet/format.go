// Package sheet writes the dial-reading sheet (pantograph.Sheet) as text for the terminal and
// a printer, CSV for a spreadsheet, JSON for scripts, and PDF on A4 or Letter. The writers only
// lay out what the sheet holds; every number is the sheet's own. Output is deterministic: the
// same sheet gives the same bytes.
package sheet

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"panto/internal/numfmt"
	"panto/pantograph"
)

// num formats a length in mm for people (numfmt.MM).
func num(v float64) string { return numfmt.MM(v) }

// reading formats a reading with the remainder's worth at the part when there is one:
// "6 t 17 div" or "2 t 34 div +0.50 div (0.0013 mm)".
func reading(r pantograph.Reading) string {
	s := r.String()
	if r.Remainder >= 0.005 {
		s += " (" + numfmt.Fixed(r.AtPart, 4) + " mm)"
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
		stock += ", " + num(s.Thickness) + " mm thick"
	}
	h = append(h, [2]string{"stock", stock})
	ratio := num(s.Ratio) + ":1, the template " + num(s.Ratio) + " times the part"
	if s.Layout != "" {
		ratio += ", " + s.Layout
	}
	h = append(h, [2]string{"ratio", ratio})
	machine := s.Machine
	if machine == "" {
		machine = "no machine file: positions in mm only"
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

// dialLine describes a dial: "copy X  2 mm / 100 div = 0.02 mm per div, 0.002 mm at the part;
// set 3 t 0 div at the datum; wind back 0.5 mm after a reversal".
func dialLine(d pantograph.DialInfo) string {
	if !d.Stated {
		return "not stated in the machine file: set positions in mm"
	}
	return fmt.Sprintf("%s %s / %d div = %s %s per div (%s mm at the part); at the datum set %d t 0 div; wind back %s %s after a reversal",
		num(d.Pitch), d.Units, d.Divisions, fine(d.Division), d.Units, fine(d.AtPart), d.DatumTurns, fine(d.BackOff), d.Units)
}

// fine formats a small quantity to four decimals without trailing zeros (0.0001 in is a
// common inch division).
func fine(v float64) string { return numfmt.Trim(v, 4) }

// stepTitle is a row's heading: "3  #2 pins: drill hole 1 of 2".
func stepTitle(r pantograph.SheetRow) string {
	if r.What == pantograph.StepDatum {
		return fmt.Sprintf("%d. datum", r.Step)
	}
	return fmt.Sprintf("%d. #%d %s: %s", r.Step, r.Number, r.Feature, r.Action)
}

// positionLines gives the copy-table and work-table lines of a position.
func positionLines(p *pantograph.Position, dials pantograph.SheetDials) []string {
	if p == nil {
		return nil
	}
	copyLine := fmt.Sprintf("copy table  X %s  Y %s", axisText(p.CopyX, p.Template.X, dials.CopyX), axisText(p.CopyY, p.Template.Y, dials.CopyY))
	workLine := fmt.Sprintf("work table  X %s  Y %s", axisText(p.WorkX, p.Part.X, dials.WorkX), axisText(p.WorkY, p.Part.Y, dials.WorkY))
	out := []string{copyLine, workLine}
	for _, b := range p.BackOff {
		out = append(out, "first "+b)
	}
	return out
}

// axisText is a reading with its distance from the datum in the dial's own units, or the
// distance in mm alone without a dial.
func axisText(r pantograph.Reading, mm float64, d pantograph.DialInfo) string {
	if !d.Stated {
		return num(mm) + " mm"
	}
	return fmt.Sprintf("%s [%s]", reading(r), length(mm, d.Units))
}

// length formats mm in units: "132.08 mm" or "5.2 in" (inches to 0.0001, a tenth of the
// finest common inch division).
func length(mm float64, u pantograph.Units) string {
	if u == pantograph.Inch {
		return fine(mm/pantograph.MMPerInch) + " in"
	}
	return num(mm) + " mm"
}

// depthLines gives the depth and passes of a row.
func depthLines(r pantograph.SheetRow, depth pantograph.DialInfo) []string {
	if r.What == pantograph.StepDatum {
		return nil
	}
	word := plural(len(r.Passes), "pass", "passes")
	if r.What == pantograph.StepDrill {
		word = plural(len(r.Passes), "peck", "pecks")
	}
	total := num(r.Depth) + " mm"
	if depth.Stated && depth.Units == pantograph.Inch {
		total = length(r.Depth, pantograph.Inch) + " (" + total + ")"
	}
	if len(r.Passes) == 0 {
		return []string{fmt.Sprintf("depth %s: %s", total, r.PassRule)}
	}
	parts := make([]string, len(r.Passes))
	for i, p := range r.Passes {
		parts[i] = num(p.Depth)
		if depth.Stated {
			parts[i] += " (" + reading(p.Reading) + ")"
			if depth.Units == pantograph.Inch {
				parts[i] = fmt.Sprintf("%s (%s)", length(p.Depth, pantograph.Inch), reading(p.Reading))
			}
		}
	}
	return []string{
		fmt.Sprintf("depth %s in %d %s: %s", total, len(r.Passes), word, strings.Join(parts, ", ")),
		"rule: " + r.PassRule,
	}
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

// speedLine gives a row's spindle speed and feed guide.
func speedLine(r pantograph.SheetRow) string {
	if r.RPM == 0 {
		return ""
	}
	s := fmt.Sprintf("spindle %.0f rpm", r.RPM)
	if r.SpeedNote != "" {
		s += " (" + r.SpeedNote + ")"
	}
	if r.Feed > 0 {
		s += fmt.Sprintf("; feed about %s mm/min, %s", roughly(r.Feed), r.FeedRule)
	}
	return s
}

// rowLines gives every line under a row's heading.
func rowLines(r pantograph.SheetRow, dials pantograph.SheetDials) []string {
	var out []string
	if r.Tool != "" {
		out = append(out, r.Tool+", "+r.Stylus)
	} else {
		out = append(out, r.Action)
	}
	out = append(out, positionLines(r.Where, dials)...)
	out = append(out, depthLines(r, dials.Depth)...)
	if s := speedLine(r); s != "" {
		out = append(out, s)
	}
	return out
}
