package sheet

import (
	"encoding/json"
	"io"
	"math"

	"panto/internal/numfmt"
	"panto/pantograph"
)

// The JSON sheet is a view of pantograph.Sheet with snake_case keys; lengths are mm whatever the
// part's units (template mm for copy-table moves, part mm for the stock point, the work-table
// move and depths), readings carry their turns, divisions and remainder, and numbers are
// rounded to a nanometre so float noise does not show. "units" says what the part was drawn
// in, which the text and PDF sheets print.

type sheetJSON struct {
	Part      string     `json:"part"`
	File      string     `json:"file"`
	Units     string     `json:"units"`
	Material  string     `json:"material"`
	Speeds    string     `json:"speeds_for"`
	Thickness float64    `json:"thickness"`
	Ratio     float64    `json:"ratio"`
	Layout    string     `json:"layout,omitempty"`
	Machine   string     `json:"machine"`
	Date      string     `json:"date,omitempty"`
	Tools     []string   `json:"tools"`
	Dials     []dialJSON `json:"dials"`
	Rows      []rowJSON  `json:"rows"`
	Warnings  []string   `json:"warnings"`
	Notes     []string   `json:"notes"`
	Cautions  []string   `json:"cautions"`
}

type dialJSON struct {
	Name       string  `json:"name"`
	Stated     bool    `json:"stated"`
	CountUp    string  `json:"counting_up_moves"`
	Reversed   bool    `json:"reversed"`
	Pitch      float64 `json:"pitch"`
	Divisions  int     `json:"divisions"`
	Units      string  `json:"units"`
	Division   float64 `json:"division"`
	AtPart     float64 `json:"division_at_part_mm"`
	DatumTurns int     `json:"datum_turns"`
	BackOff    float64 `json:"wind_back"`
}

type readingJSON struct {
	Turns     int     `json:"turns"`
	Divisions int     `json:"divisions"`
	Remainder float64 `json:"remainder"`
	AtPart    float64 `json:"remainder_at_part_mm"`
	Text      string  `json:"text"`
}

type positionJSON struct {
	Template [2]float64   `json:"template_mm"`
	Part     [2]float64   `json:"part_mm"`
	WorkMove [2]float64   `json:"work_move_mm"`
	CopyX    *readingJSON `json:"copy_x"`
	CopyY    *readingJSON `json:"copy_y"`
	WorkX    *readingJSON `json:"work_x"`
	WorkY    *readingJSON `json:"work_y"`
	WindBack []string     `json:"wind_back"`
}

type passJSON struct {
	Depth   float64      `json:"depth_mm"`
	Reading *readingJSON `json:"reading"`
}

type rowJSON struct {
	Step      int           `json:"step"`
	Number    int           `json:"number"`
	Feature   string        `json:"feature"`
	Kind      string        `json:"kind"`
	Action    string        `json:"action"`
	Tool      string        `json:"tool"`
	Stylus    string        `json:"stylus"`
	Where     *positionJSON `json:"where"`
	Depth     float64       `json:"depth_mm"`
	Passes    []passJSON    `json:"passes"`
	PassNote  string        `json:"pass_note,omitempty"`
	Rules     []string      `json:"rules,omitempty"`
	RPM       float64       `json:"rpm"`
	SpeedNote string        `json:"speed_note"`
	Feed      float64       `json:"feed_mm_min"`
	FeedRule  string        `json:"feed_rule"`
}

// EncodeJSON writes s as one indented JSON object.
func EncodeJSON(w io.Writer, s pantograph.Sheet) error {
	out := sheetJSON{Part: s.Part, File: s.Source, Units: string(orMM(s.Units)), Material: s.Material,
		Speeds: s.Speeds, Thickness: nm(s.Thickness),
		Ratio: s.Ratio, Layout: s.Layout, Machine: s.Machine, Date: s.Date, Tools: nonNil(s.Tools),
		Warnings: nonNil(s.Warnings), Notes: nonNil(s.Notes), Cautions: nonNil(s.Cautions)}
	for _, d := range s.Dials.List() {
		out.Dials = append(out.Dials, dialJSON{Name: d.Name, Stated: d.Stated, Pitch: d.Pitch,
			Divisions: d.Divisions, Units: string(d.Units), Division: nm(d.Division), AtPart: nm(d.AtPart),
			DatumTurns: d.DatumTurns, BackOff: nm(d.BackOff), CountUp: d.CountUp, Reversed: d.Reversed})
	}
	for _, r := range s.Rows {
		out.Rows = append(out.Rows, rowOf(r, s.Dials))
	}
	e := json.NewEncoder(w)
	e.SetIndent("", "  ")
	return e.Encode(out)
}

// rowOf converts one row.
func rowOf(r pantograph.SheetRow, dials pantograph.SheetDials) rowJSON {
	rj := rowJSON{Step: r.Step, Number: r.Number, Feature: r.Feature, Kind: string(r.What),
		Action: r.Action, Tool: r.Tool, Stylus: r.Stylus, Depth: nm(r.Depth), PassNote: r.PassNote, Rules: r.Rules,
		RPM: math.Round(r.RPM), SpeedNote: r.SpeedNote, Feed: nm(r.Feed), FeedRule: r.FeedRule,
		Passes: []passJSON{}}
	if p := r.Where; p != nil {
		rj.Where = &positionJSON{Template: [2]float64{nm(p.Template.X), nm(p.Template.Y)},
			Part: [2]float64{nm(p.Part.X), nm(p.Part.Y)}, WorkMove: [2]float64{nm(-p.Part.X), nm(-p.Part.Y)},
			CopyX: readingOf(p.CopyX, dials.CopyX),
			CopyY: readingOf(p.CopyY, dials.CopyY), WorkX: readingOf(p.WorkX, dials.WorkX),
			WorkY: readingOf(p.WorkY, dials.WorkY), WindBack: nonNil(p.BackOff)}
	}
	for _, ps := range r.Passes {
		rj.Passes = append(rj.Passes, passJSON{Depth: nm(ps.Depth), Reading: readingOf(ps.Reading, dials.Depth)})
	}
	return rj
}

// readingOf converts a reading, nil when the dial is not stated.
func readingOf(r pantograph.Reading, d pantograph.DialInfo) *readingJSON {
	if !d.Stated {
		return nil
	}
	return &readingJSON{Turns: r.Turns, Divisions: r.Divisions, Remainder: nm(r.Remainder),
		AtPart: nm(r.AtPart), Text: r.String()}
}

// orMM is u, or millimetres when it is not stated.
func orMM(u pantograph.Units) pantograph.Units {
	if u == "" {
		return pantograph.MM
	}
	return u
}

// nm rounds a length for JSON (numfmt.JSON: to a nanometre).
func nm(v float64) float64 { return numfmt.JSON(v) }

// nonNil returns s, or an empty slice for nil so JSON shows [] rather than null.
func nonNil(s []string) []string {
	if s == nil {
		return []string{}
	}
	return s
}
