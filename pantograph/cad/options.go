package cad

import (
	"fmt"
	"strconv"
	"strings"

	"panto/geom"
	"panto/pantograph"
)

// Options say how to read a drawing. The zero value reads units from the file and uses the
// defaults below.
type Options struct {
	// Units, when set, overrides what the file says: DXF coordinates, or SVG user units in a
	// file without a physical size, are taken to be in these units.
	Units pantograph.Units

	// HoleMax is the largest diameter of a circle that becomes a drilled hole, in the drawing's
	// units; 0 means DefaultHoleMaxMM millimetres, a negative value makes no circle a hole
	// (except on a layer mapped to holes).
	HoleMax float64

	// Layers maps layer names (DXF layers; the id of an SVG group) to what their outlines are.
	Layers map[string]LayerRule

	// JoinTol is how far apart, in mm, two ends may be and still be joined; 0 means
	// defaultJoinTol.
	JoinTol float64

	// Thickness and Material describe the stock, which drawings do not carry; Thickness is in
	// the drawing's units, 0 when not known.
	Thickness float64
	Material  string

	// ChordTol is how far, in mm, the chords that replace ellipses, splines and Bézier curves
	// may stray from them; 0 means geom.DefaultChordTolerance.
	ChordTol float64
}

// DefaultHoleMaxMM is the default largest drilled hole: a 3 mm drill is about the largest a
// small-parts machinist drills rather than mills on a pantograph (common practice, no source).
const DefaultHoleMaxMM = 3.0

// defaultJoinTol joins ends up to 1 µm apart: CAD programs write 6 to 16 significant digits, so
// ends that were drawn together land within a few nanometres of each other, even in inches
// written to 6 decimals (0.0000005 in ≈ 13 nm); 1 µm is far below what a cutter resolves and
// far above that rounding (common practice, no source).
const defaultJoinTol = 0.001

func (o Options) joinTol() float64 {
	if o.JoinTol > 0 {
		return o.JoinTol
	}
	return defaultJoinTol
}

func (o Options) chordTol() float64 {
	if o.ChordTol > 0 {
		return o.ChordTol
	}
	return geom.DefaultChordTolerance
}

// LayerRule says what the outlines on one layer are.
type LayerRule struct {
	Ignore bool            // leave the layer out altogether
	Kind   pantograph.Kind // profile, cutout, pocket, holes or groove
	Depth  float64         // in the drawing's units; 0 means through for holes, not given for others
}

// ParseLayerRule reads a layer rule as written on the command line: NAME=KIND or
// NAME=KIND:DEPTH, with KIND one of profile, cutout, pocket, holes, groove or ignore and DEPTH
// in the drawing's units.
func ParseLayerRule(s string) (string, LayerRule, error) {
	name, spec, ok := strings.Cut(s, "=")
	if !ok || name == "" {
		return "", LayerRule{}, fmt.Errorf("%q: write NAME=KIND or NAME=KIND:DEPTH, e.g. RECESS=pocket:0.3", s)
	}
	kind, depth, hasDepth := strings.Cut(spec, ":")
	var r LayerRule
	switch k := pantograph.Kind(kind); k {
	case pantograph.KindProfile, pantograph.KindCutout, pantograph.KindPocket, pantograph.KindHoles, pantograph.KindGroove:
		r.Kind = k
	case "ignore":
		r.Ignore = true
	default:
		return "", LayerRule{}, fmt.Errorf("%q: kind must be profile, cutout, pocket, holes, groove or ignore, got %q", s, kind)
	}
	if hasDepth {
		d, err := strconv.ParseFloat(depth, 64)
		if err != nil || !(d > 0) || d > 1e6 {
			return "", LayerRule{}, fmt.Errorf("%q: depth must be a number greater than 0, got %q", s, depth)
		}
		if r.Ignore || r.Kind == pantograph.KindProfile || r.Kind == pantograph.KindCutout {
			return "", LayerRule{}, fmt.Errorf("%q: a %s goes through the stock and takes no depth", s, spec[:len(kind)])
		}
		r.Depth = d
	}
	return name, r, nil
}
