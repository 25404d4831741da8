package main

// This file prints a template plan as JSON for scripts (panto plan --json). The object is a view
// of pantograph.Plan and computes nothing: every number is the plan's own, rounded to a
// nanometre so float noise does not show.
//
// Lengths in the template frame (template bounds, feature bounds, seats, paths, compensation)
// are template mm; datum and warning amounts are part mm; areas are template mm².

import (
	"encoding/json"
	"io"

	"panto/geom"
	"panto/pantograph"
)

type planJSON struct {
	Part     string               `json:"part"`
	File     string               `json:"file"`
	Ratio    float64              `json:"ratio"`
	Mirror   bool                 `json:"mirror"`
	Rotate   float64              `json:"rotate"` // degrees, counter-clockwise
	Datum    [2]float64           `json:"datum"`
	Template templateJSON         `json:"template"`
	Features []plannedFeatureJSON `json:"features"`
	Order    []string             `json:"order"`
	Steps    []stepJSON           `json:"steps"`
	Warnings []warningJSON        `json:"warnings"`
	Plate    *plateJSON           `json:"plate,omitempty"`
	Done     bool                 `json:"done"`
}

type templateJSON struct {
	Bounds boundsJSON `json:"bounds"`
}

type plannedFeatureJSON struct {
	Name           string       `json:"name"`
	Kind           string       `json:"kind"`
	Number         int          `json:"number"`
	Method         string       `json:"method"`
	Cutter         *float64     `json:"cutter"`
	Drill          *float64     `json:"drill,omitempty"`
	Stylus         float64      `json:"stylus"`
	Matched        float64      `json:"matched_stylus"`
	Tip            string       `json:"tip"`
	Compensation   float64      `json:"compensation"`
	Status         string       `json:"status"`
	Through        bool         `json:"through"`
	Depth          *float64     `json:"depth"`
	TemplateArea   *float64     `json:"template_area,omitempty"`
	TemplateBounds *boundsJSON  `json:"template_bounds,omitempty"`
	Seats          [][2]float64 `json:"seats,omitempty"`
	Path           [][2]float64 `json:"path,omitempty"`
	Width          *float64     `json:"width,omitempty"`
}

type stepJSON struct {
	What    string       `json:"what"`
	Feature string       `json:"feature,omitempty"`
	Drill   *float64     `json:"drill,omitempty"`
	Seats   [][2]float64 `json:"seats,omitempty"`
}

type warningJSON struct {
	Feature string   `json:"feature"`
	Message string   `json:"message"`
	Amount  *float64 `json:"amount"`
	Stops   bool     `json:"stops,omitempty"`
}

func vec(v geom.Vec) [2]float64 { return [2]float64{round(v.X), round(v.Y)} }

func vecs(vs []geom.Vec) [][2]float64 {
	var out [][2]float64
	for _, v := range vs {
		out = append(out, vec(v))
	}
	return out
}

func box(b geom.Box) boundsJSON { return boundsJSON{vec(b.Min), vec(b.Max)} }

// plateJSON is how the plan's plate prints: its size as printed (mm), whether it fits the
// printer bed, in how many pieces, and the largest ratio that prints in one piece (when not).
type plateJSON struct {
	Size            [2]float64 `json:"size"`
	FitsBed         bool       `json:"fits_bed"`
	Tiles           int        `json:"tiles"`
	LargestOnePiece *float64   `json:"largest_one_piece,omitempty"`
}

// writePlanJSON writes p to w as one indented JSON object, with its plate when plate is not
// nil.
func writePlanJSON(w io.Writer, p pantograph.Plan, plate *pantograph.PlateReport) error {
	out := planJSON{Part: p.Part, File: p.Source, Ratio: round(p.Setup.Ratio), Mirror: p.Setup.Mirror,
		Rotate: round(p.Setup.Rotate.Degrees()), Datum: vec(p.Datum),
		Template: templateJSON{box(p.Bounds)}, Features: []plannedFeatureJSON{},
		Order: append([]string{}, p.Order...), Steps: []stepJSON{}, Warnings: []warningJSON{},
		Done: p.Done()}
	for _, f := range p.Features {
		out.Features = append(out.Features, plannedFeature(f))
	}
	for _, s := range p.Steps {
		sj := stepJSON{What: string(s.What), Seats: vecs(s.Seats)}
		if s.Feature >= 0 {
			sj.Feature = p.Features[s.Feature].Name
		}
		if s.Drill > 0 {
			sj.Drill = roundPtr(s.Drill)
		}
		out.Steps = append(out.Steps, sj)
	}
	for _, wr := range p.Warnings {
		wj := warningJSON{Feature: wr.Feature, Message: wr.Message, Stops: wr.Stops}
		if wr.HasAmount {
			wj.Amount = roundPtr(wr.Amount)
		}
		out.Warnings = append(out.Warnings, wj)
	}
	if plate != nil {
		out.Plate = &plateJSON{Size: vec(plate.Fit.Size), FitsBed: plate.Fit.FitsBed, Tiles: plate.Fit.Tiles}
		if plate.LargestOnePiece > 0 {
			out.Plate.LargestOnePiece = &plate.LargestOnePiece
		}
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	if err := enc.Encode(out); err != nil {
		return err
	}
	return nil
}

// feature is the JSON view of one planned feature; fields that do not apply to its method
// are left out (cutter is null for drilled holes, depth is null for through features).
func plannedFeature(f pantograph.PlannedFeature) plannedFeatureJSON {
	fj := plannedFeatureJSON{Name: f.Name, Kind: string(f.Kind), Number: f.Number, Method: string(f.Method),
		Stylus: round(f.Stylus), Tip: string(f.Tip), Compensation: round(f.Compensation),
		Status: string(f.Status), Matched: round(f.Matched)}
	switch {
	case f.Depth.Through, f.Kind == pantograph.KindProfile, f.Kind == pantograph.KindCutout:
		fj.Through = true
	default:
		fj.Depth = roundPtr(f.Depth.MM)
	}
	if f.Cutter > 0 {
		fj.Cutter = roundPtr(f.Cutter)
	}
	if !f.TemplateBounds.IsEmpty() {
		b := box(f.TemplateBounds)
		fj.TemplateBounds = &b
	}
	switch f.Method {
	case pantograph.Traced:
		fj.TemplateArea = roundPtr(f.TemplateArea)
	case pantograph.Drilled:
		fj.Drill, fj.Seats = roundPtr(f.Drill), vecs(f.Seats)
	case pantograph.Engraved:
		fj.Path, fj.Width = vecs(f.Path), roundPtr(f.Width)
	}
	return fj
}
