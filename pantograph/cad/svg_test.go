package cad

import (
	"errors"
	"math"
	"strings"
	"testing"

	"panto/pantograph"
)

// svgDoc wraps body in an <svg> element with the given root attributes.
func svgDoc(root, body string) string {
	return `<?xml version="1.0"?>` + "\n" + `<svg xmlns="http://www.w3.org/2000/svg" ` + root + ">\n" + body + "\n</svg>\n"
}

func TestReadSVGSize(t *testing.T) {
	tests := []struct {
		name, root, body string
		side             float64 // the profile's width in mm
		warn             bool    // whether the 96 px per inch warning is given
		units            pantograph.Units
	}{
		// The W3C rule: width 10mm over a viewBox 10 wide makes one user unit 1 mm.
		{"10 mm square", `width="10mm" height="10mm" viewBox="0 0 10 10"`, `<rect x="0" y="0" width="10" height="10"/>`, 10, false, pantograph.MM},
		// Derived: 100 user units over 50 mm: 0.5 mm each.
		{"viewBox scales", `width="50mm" height="50mm" viewBox="0 0 100 100"`, `<rect width="40" height="40"/>`, 20, false, pantograph.MM},
		// Derived: 1 in = 25.4 mm, viewBox 1 unit per inch.
		{"inches", `width="2in" height="2in" viewBox="0 0 2 2"`, `<rect width="1" height="1"/>`, 25.4, false, pantograph.Inch},
		// CSS: 96 px per inch, so 96 px is 25.4 mm.
		{"px only", `width="200" height="200"`, `<rect width="96" height="96"/>`, 25.4, true, pantograph.MM},
		{"no size at all", ``, `<rect width="96" height="96"/>`, 25.4, true, pantograph.MM},
		// Derived: 72 pt per inch, viewBox in pt.
		{"points", `width="72pt" height="72pt" viewBox="0 0 72 72"`, `<rect width="36" height="36"/>`, 12.7, false, pantograph.MM},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			p, rep, err := Read("t.svg", []byte(svgDoc(tc.root, tc.body)), Options{})
			if err != nil {
				t.Fatal(err)
			}
			approx(t, "width", p.Profile.Region.Bounds().Size().X, tc.side, 1e-9)
			warned := strings.Contains(strings.Join(rep.Warnings, "\n"), "96 px per inch")
			if warned != tc.warn {
				t.Errorf("got warning %v (%q), want %v", warned, rep.Warnings, tc.warn)
			}
			if p.Units != tc.units {
				t.Errorf("got units %q, want %q", p.Units, tc.units)
			}
		})
	}
}

func TestReadSVGUnitsFlag(t *testing.T) {
	p, rep, err := Read("t.svg", []byte(svgDoc(`width="200" height="200"`, `<rect width="7" height="7"/>`)), Options{Units: pantograph.MM})
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "width", p.Profile.Region.Bounds().Size().X, 7, 1e-12) // one user unit = 1 mm as asked
	if len(rep.Warnings) != 0 {
		t.Errorf("got warnings %q, want none when --units says what a unit is", rep.Warnings)
	}
}

func TestReadSVGShapes(t *testing.T) {
	const root = `width="100mm" height="100mm" viewBox="0 0 100 100"`
	tests := []struct {
		name, body string
		area       float64 // of the profile
		tol        float64
		arcs       int // true arcs in the profile, -1 for any
	}{
		// Derived: a half disc of radius 5, π·25/2; the arc stays an arc.
		{"path arc", `<path d="M 0 50 A 5 5 0 0 1 10 50 Z"/>`, 12.5 * math.Pi, 1e-9, 1},
		{"relative arc", `<path d="m 0 50 a 5 5 0 0 0 10 0 z"/>`, 12.5 * math.Pi, 1e-9, 1},
		// Derived: an arc whose radius is too small is scaled up to reach: here a half disc.
		{"arc radius too small", `<path d="M 0 50 A 1 1 0 0 1 10 50 Z"/>`, 12.5 * math.Pi, 1e-9, 1},
		// Derived: 10 × 10 square by H, V and relative lines.
		{"H V and relative", `<path d="M10,10 H20 v10 h-10 Z"/>`, 100, 1e-9, 0},
		{"numbers run together", `<path d="M10-10l10.0.0.0 10-10-10z"/>`, 50, 1e-9, 0},
		// Derived: the parabolic segment between (0,0) and (10,0) under control (5,10) is
		// 2/3 · 10 · 5; within chord tolerance × length.
		{"quadratic", `<path d="M0 0 Q5 10 10 0 Z"/>`, 100.0 / 3, 0.02, 0},
		// Derived: T reflects (2.5, 5) to (7.5, 5); the triangle (0,0) (5,5) (10,0) of area 25 plus
		// two parabolic segments of 2/3 · 6.25 each.
		{"smooth quadratic", `<path d="M0 0 Q2.5 5 5 5 T10 0 Z"/>`, 25 + 2*2.0/3*6.25, 0.02, 0},
		// Derived: the cubic from (0,0) to (10,0) with controls (0,10) and (10,10) encloses
		// 3/5 · width · height = 60 with its chord (integrating the Bernstein form).
		{"cubic", `<path d="M0 0 C0 10 10 10 10 0 Z"/>`, 60, 0.02, 0},
		// Derived: S reflects (10, 10) to (10, −10); the lens is the cubic above mirrored below.
		{"smooth cubic", `<path d="M0 0 C0 10 10 10 10 0 S0 -10 0 0 Z"/>`, 120, 0.04, 0},
		// Derived: a 10 × 6 rectangle with corners of radius 2 loses (4 − π)·4.
		{"rect with rx", `<rect x="0" y="0" width="10" height="6" rx="2"/>`, 60 - (4-math.Pi)*4, 1e-9, 4},
		{"circle", `<circle cx="5" cy="5" r="4"/>`, 16 * math.Pi, 1e-9, 1},
		{"ellipse", `<ellipse cx="5" cy="5" rx="4" ry="2"/>`, 8 * math.Pi, 0.02, 0},
		{"polygon", `<polygon points="0,0 10,0 10,10"/>`, 50, 1e-9, 0},
		{"polyline and line", `<polyline points="0,0 10,0 10,10"/><line x1="10" y1="10" x2="0" y2="0"/>`, 50, 1e-9, 0},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			p, _, err := Read("t.svg", []byte(svgDoc(root, tc.body)), Options{HoleMax: -1})
			if err != nil {
				t.Fatal(err)
			}
			if err := p.Profile.Region.Validate(); err != nil {
				t.Errorf("profile does not validate: %v", err)
			}
			if tc.area >= 0 && tc.tol >= 0 {
				approx(t, "area", p.Profile.Region.Area(), tc.area, tc.tol)
			}
			arcs := 0
			for _, s := range p.Profile.Region.Outer {
				if s.IsArc() {
					arcs++
				}
			}
			if tc.arcs >= 0 && arcs != tc.arcs {
				t.Errorf("got %d arcs, want %d", arcs, tc.arcs)
			}
		})
	}
}

// TestReadSVGFlipAndTransforms checks the y flip and nested group transforms by where a small
// circle's centre lands.
func TestReadSVGFlipAndTransforms(t *testing.T) {
	const root = `width="100mm" height="100mm" viewBox="0 0 100 100"`
	plate := `<rect width="100" height="100"/>`
	tests := []struct {
		name, body string
		x, y       float64 // the hole's centre, +Y up
	}{
		// Derived: y = 100 − 10.
		{"flip", `<circle cx="20" cy="10" r="0.5"/>`, 20, 90},
		{"translate", `<g transform="translate(5,5)"><circle cx="20" cy="10" r="0.5"/></g>`, 25, 85},
		// Derived: scale first doubles (10, 10) to (20, 20), then the outer translate.
		{"nested", `<g transform="translate(30 0)"><g transform="scale(2)"><circle cx="10" cy="10" r="0.25"/></g></g>`, 50, 80},
		// Derived: rotate(90) maps (10, 0) to (0, 10), about (50, 50): (50, 60) → (40, 50).
		{"rotate about a point", `<g transform="rotate(90 50 50)"><circle cx="50" cy="60" r="0.5"/></g>`, 40, 50},
		{"matrix", `<g transform="matrix(1 0 0 1 7 3)"><circle cx="10" cy="10" r="0.5"/></g>`, 17, 87},
		{"list right to left", `<g transform="translate(10,0) scale(3)"><circle cx="10" cy="10" r="0.2"/></g>`, 40, 70},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			p, _, err := Read("t.svg", []byte(svgDoc(root, plate+tc.body)), Options{})
			if err != nil {
				t.Fatal(err)
			}
			hs := holeFeatures(p)
			if len(hs) != 1 {
				t.Fatalf("got %d holes features, want 1", len(hs))
			}
			approx(t, "x", hs[0].Centers[0].X, tc.x, 1e-9)
			approx(t, "y", hs[0].Centers[0].Y, tc.y, 1e-9)
		})
	}
}

func TestReadSVGSkewFlattens(t *testing.T) {
	src := svgDoc(`width="100mm" height="100mm" viewBox="0 0 100 100"`,
		`<g transform="scale(2 1)"><circle cx="20" cy="50" r="10"/></g>`)
	p, _, err := Read("t.svg", []byte(src), Options{})
	if err != nil {
		t.Fatal(err)
	}
	// Derived: the circle of radius 10 stretched 2 × 1 is an ellipse of area π·20·10.
	approx(t, "area", p.Profile.Region.Area(), 200*math.Pi, 0.2)
	if len(p.Profile.Region.Outer) < 10 {
		t.Errorf("got %d segments, want chords", len(p.Profile.Region.Outer))
	}
}

func TestReadSVGLayers(t *testing.T) {
	src := svgDoc(`width="100mm" height="100mm" viewBox="0 0 100 100"`, `<rect width="100" height="100"/>
<g id="recess"><rect x="10" y="10" width="20" height="20"/></g>
<g id="notes"><line x1="0" y1="0" x2="5" y2="5"/></g>
<g style="fill:none; display:none"><rect x="40" y="40" width="5" height="5"/></g>
<text x="1" y="1">hello</text>`)
	p, rep, err := Read("t.svg", []byte(src), Options{Layers: map[string]LayerRule{
		"recess": {Kind: pantograph.KindPocket, Depth: 0.5}, "notes": {Ignore: true}}})
	if err != nil {
		t.Fatal(err)
	}
	if k := kinds(p); k[pantograph.KindPocket] != 1 || len(p.Features) != 1 {
		t.Fatalf("got %v, want one pocket", k)
	}
	if p.Features[0].Name != "pocket 1" {
		t.Errorf("got name %q, want the default pocket 1 (the rect has no id)", p.Features[0].Name)
	}
	if !strings.Contains(rep.Skipped, "1 <text>") || !strings.Contains(rep.Skipped, "1 <g hidden>") {
		t.Errorf("got skipped %q, want 1 <text> and 1 <g hidden>", rep.Skipped)
	}
}

func TestReadSVGErrors(t *testing.T) {
	tests := []struct {
		name, src string
		line      int
		msg       string
	}{
		{"not XML", "this is not xml <", 1, "not well-formed XML"},
		{"not SVG", `<html><body/></html>`, 1, "root element is <html>"},
		{"empty", ``, 0, "no <svg> element"},
		{"bad path", svgDoc("", "\n\n<path d=\"M 0 0 L 1 x\"/>"), 5, "expected a number"},
		{"path without M", svgDoc("", `<path d="L 1 1"/>`), 3, "must start with M"},
		{"bad transform", svgDoc("", `<g transform="twist(3)"><rect width="1" height="1"/></g>`), 3, `"twist" is not a transform`},
		{"bad width", `<svg xmlns="http://www.w3.org/2000/svg" width="10furlongs"/>`, 1, "not a length panto knows"},
		{"odd points", svgDoc("", `<polygon points="0,0 1"/>`), 3, "odd count"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			_, _, err := Read("bad.svg", []byte(tc.src), Options{})
			var de *Error
			if !errors.As(err, &de) {
				t.Fatalf("got %v, want a drawing error", err)
			}
			if !strings.Contains(de.Error(), tc.msg) {
				t.Errorf("got %q, want it to contain %q", de.Error(), tc.msg)
			}
			if tc.line > 0 && de.Line != tc.line {
				t.Errorf("got line %d, want %d", de.Line, tc.line)
			}
		})
	}
}

func TestReadSVGIdNamesFeature(t *testing.T) {
	src := svgDoc(`width="100mm" height="100mm" viewBox="0 0 100 100"`,
		`<rect width="100" height="100"/><rect id="window" x="10" y="10" width="20" height="20"/>`)
	p, _, err := Read("t.svg", []byte(src), Options{})
	if err != nil {
		t.Fatal(err)
	}
	if len(p.Features) != 1 || p.Features[0].Name != "window" {
		t.Errorf("got %+v, want one feature named window", p.Features)
	}
}
