package sheet

import (
	"encoding/csv"
	"fmt"
	"io"
	"strings"

	"panto/pantograph"
)

// csvHeader names the columns of the CSV sheet. Moves are mm from the datum: the copy table's
// (the template point) and the work table's (the stock point with the sign turned); readings
// are "T t D div" as the dial shows them; passes are depths in mm separated by spaces. A tool
// change row carries the speed, the feed guide and the depth rules of its tool.
func csvHeader() []string {
	return []string{"step", "number", "feature", "kind", "action", "tool", "stylus",
		"copy_x_mm", "copy_y_mm", "copy_x", "copy_y", "work_x_mm", "work_y_mm", "work_x", "work_y",
		"wind_back", "depth_mm", "passes_mm", "depth_readings", "rpm", "feed_mm_min", "rules", "done"}
}

// EncodeCSV writes one line per row of s under a header line; the last column is left empty
// for ticking off.
func EncodeCSV(w io.Writer, s pantograph.Sheet) error {
	cw := csv.NewWriter(w)
	if err := cw.Write(csvHeader()); err != nil {
		return err
	}
	for _, r := range s.Rows {
		if err := cw.Write(csvRow(r, s.Dials, s.Units)); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}

// csvRow lays out one row.
func csvRow(r pantograph.SheetRow, dials pantograph.SheetDials, u pantograph.Units) []string {
	rec := []string{fmt.Sprint(r.Step), fmt.Sprint(r.Number), r.Feature, string(r.What), r.Action, r.Tool, r.Stylus}
	rd := func(x pantograph.Reading, d pantograph.DialInfo) string {
		if !d.Stated {
			return ""
		}
		return reading(x, u)
	}
	if p := r.Where; p != nil {
		rec = append(rec, num(p.Template.X), num(p.Template.Y), rd(p.CopyX, dials.CopyX), rd(p.CopyY, dials.CopyY),
			num(-p.Part.X), num(-p.Part.Y), rd(p.WorkX, dials.WorkX), rd(p.WorkY, dials.WorkY),
			strings.Join(p.BackOff, "; "))
	} else {
		rec = append(rec, "", "", "", "", "", "", "", "", "")
	}
	var depths, readings []string
	for _, ps := range r.Passes {
		depths = append(depths, num(ps.Depth))
		readings = append(readings, rd(ps.Reading, dials.Depth))
	}
	depth, rpm, feed := "", "", ""
	if r.What != pantograph.StepDatum && r.What != pantograph.StepToolChange {
		depth = num(r.Depth)
	}
	if r.RPM > 0 {
		rpm = fmt.Sprintf("%.0f", r.RPM)
	}
	if r.Feed > 0 {
		feed = num(r.Feed)
	}
	return append(rec, depth, strings.Join(depths, " "), strings.Join(readings, "; "), rpm, feed,
		strings.Join(r.Rules, "; "), "")
}
