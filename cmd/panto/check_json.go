package main

import (
	"encoding/json"
	"io"
	"math"

	"panto/internal/numfmt"
	"panto/pantograph"
)

// checkJSON is the object `panto check --json` prints; see checkUsage for its fields.
type checkJSON struct {
	Name                   string        `json:"name"`
	File                   string        `json:"file"`
	Units                  string        `json:"units"`
	Stock                  stockJSON     `json:"stock"`
	Bounds                 boundsJSON    `json:"bounds"`
	Area                   float64       `json:"area"`
	MinInsideRadius        *float64      `json:"min_inside_radius"`
	MinInsideRadiusFeature string        `json:"min_inside_radius_feature,omitempty"`
	NarrowestGap           *float64      `json:"narrowest_gap"`
	NarrowestGapFeature    string        `json:"narrowest_gap_feature,omitempty"`
	LargestCutter          *float64      `json:"largest_cutter"`
	SharpInsideCorners     bool          `json:"sharp_inside_corners"`
	Features               []featureJSON `json:"features"`
	Problems               []problemJSON `json:"problems"`
}

type stockJSON struct {
	Material  string  `json:"material"`
	Thickness float64 `json:"thickness"`
}

type boundsJSON struct {
	Min [2]float64 `json:"min"`
	Max [2]float64 `json:"max"`
}

type featureJSON struct {
	Name  string `json:"name"`
	Kind  string `json:"kind"`
	Count int    `json:"count"`
}

type problemJSON struct {
	Severity string   `json:"severity"`
	Feature  string   `json:"feature"`
	Message  string   `json:"message"`
	Line     int      `json:"line,omitempty"`
	Amount   *float64 `json:"amount,omitempty"`
}

// round rounds a length for JSON (numfmt.JSON: to a nanometre).
func round(v float64) float64 { return numfmt.JSON(v) }

func roundPtr(v float64) *float64 { r := round(v); return &r }

// writeCheckJSON prints the summary as one indented JSON object.
func writeCheckJSON(w io.Writer, p pantograph.Part, s pantograph.Summary) error {
	out := checkJSON{Name: s.Name, File: p.Source, Units: string(s.Units),
		Stock: stockJSON{s.Stock.Material, round(s.Stock.Thickness)}, Area: round(s.Area),
		Features: []featureJSON{}, Problems: []problemJSON{}}
	if !s.Bounds.IsEmpty() {
		out.Bounds = boundsJSON{[2]float64{round(s.Bounds.Min.X), round(s.Bounds.Min.Y)},
			[2]float64{round(s.Bounds.Max.X), round(s.Bounds.Max.Y)}}
	}
	if m := s.MinInsideRadius; m.Found {
		out.MinInsideRadius, out.MinInsideRadiusFeature = roundPtr(m.MM), m.Feature
	}
	if m := s.NarrowestGap; m.Found {
		out.NarrowestGap, out.NarrowestGapFeature = roundPtr(m.MM), m.Feature
	}
	d, sharp := s.LargestCutter()
	if !math.IsInf(d, 1) {
		out.LargestCutter = roundPtr(d)
	}
	out.SharpInsideCorners = sharp
	for _, f := range s.Features {
		out.Features = append(out.Features, featureJSON{f.Name, string(f.Kind), f.Count})
	}
	for _, pr := range s.Problems {
		pj := problemJSON{Severity: string(pr.Severity), Feature: pr.Label, Message: pr.Message,
			Line: pr.Where.Line}
		if pr.HasAmount {
			pj.Amount = roundPtr(pr.Amount)
		}
		out.Problems = append(out.Problems, pj)
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(out)
}
