package cad

import (
	"errors"
	"math"
	"os"
	"strings"
	"testing"

	"panto/pantograph"
)

// tan(π/8): the bulge of a 90° arc, derived (bulge = tan(sweep/4)).
const bulge90 = 0.41421356237309503

func TestReadDXFShapes(t *testing.T) {
	quarter := ent("LWPOLYLINE", 8, "0", 90, 3, 70, 1, 10, 0, 20, 0, 10, 10, 20, 0, 42, bulge90, 10, 0, 20, 10)
	quarterCW := ent("LWPOLYLINE", 8, "0", 90, 3, 70, 1, 10, 0, 20, 0, 10, 0, 20, 10, 42, -bulge90, 10, 10, 20, 0)
	tests := []struct {
		name  string
		src   string
		area  float64 // of the profile, mm²
		tol   float64
		units pantograph.Units
	}{
		// Derived: a quarter disc of radius 10 has area π·100/4.
		{"LWPOLYLINE 90° bulge", dxfDoc(4, "", quarter), 25 * math.Pi, 1e-9, pantograph.MM},
		{"LWPOLYLINE negative bulge runs clockwise", dxfDoc(4, "", quarterCW), 25 * math.Pi, 1e-9, pantograph.MM},
		// Derived: two vertices with bulge 1 each are two half circles: a disc of radius 5.
		{"LWPOLYLINE bulge 1 twice", dxfDoc(4, "", ent("LWPOLYLINE", 90, 2, 70, 1, 10, 0, 20, 0, 42, 1, 10, 10, 20, 0, 42, 1)), 25 * math.Pi, 1e-9, pantograph.MM},
		// Derived: a 1 in square is 25.4² mm².
		{"inches", dxfDoc(1, "", square("0", 0, 0, 1)...), 25.4 * 25.4, 1e-9, pantograph.Inch},
		{"no units: millimetres", dxfDoc(-1, "", square("0", 0, 0, 3)...), 9, 1e-9, pantograph.MM},
		// Derived: half disc radius 5 from a POLYLINE with VERTEX entities, bulge 1 on the first.
		{"POLYLINE with VERTEX", dxfDoc(4, "", ent("POLYLINE", 8, "0", 66, 1, 70, 1),
			ent("VERTEX", 10, 10, 20, 0, 42, 1), ent("VERTEX", 10, 0, 20, 0), ent("SEQEND")), 12.5 * math.Pi, 1e-9, pantograph.MM},
		// Derived: ellipse area π·a·b = π·4·2; chords within 1 µm lose at most perimeter × 1 µm.
		{"ELLIPSE", dxfDoc(4, "", ent("ELLIPSE", 10, 5, 20, 5, 11, 4, 21, 0, 40, 0.5, 41, 0, 42, 2*math.Pi)), 8 * math.Pi, 0.02, pantograph.MM},
		// Derived: a quadratic spline on knots 0 0 0 1 1 1 is the parabola between (0,0) and
		// (10,0) through control (5,10); the parabolic segment is 2/3 · chord · sagitta(5).
		{"SPLINE with a line", dxfDoc(4, "", ent("SPLINE", 71, 2, 72, 6, 73, 3, 40, 0, 40, 0, 40, 0, 40, 1, 40, 1, 40, 1,
			10, 0, 20, 0, 10, 5, 20, 10, 10, 10, 20, 0), ent("LINE", 10, 10, 20, 0, 11, 0, 21, 0)), 100.0 / 3, 0.02, pantograph.MM},
		// Derived: ARC seen from below (extrusion 0,0,−1): centre (−5, 0) in world x.
		{"ARC and LINE", dxfDoc(4, "", ent("ARC", 10, 5, 20, 0, 40, 5, 50, 0, 51, 180), ent("LINE", 10, 0, 20, 0, 11, 10, 21, 0)), 12.5 * math.Pi, 1e-9, pantograph.MM},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			p, rep, err := Read("t.dxf", []byte(tc.src), Options{})
			if err != nil {
				t.Fatal(err)
			}
			approx(t, "profile area", p.Profile.Region.Area(), tc.area, tc.tol)
			if p.Units != tc.units {
				t.Errorf("got units %q, want %q", p.Units, tc.units)
			}
			if err := p.Profile.Region.Validate(); err != nil {
				t.Errorf("profile does not validate: %v", err)
			}
			if rep.UnitsNote == "" {
				t.Errorf("report says nothing of units")
			}
		})
	}
}

func TestReadDXFComments(t *testing.T) {
	src := "999\nwritten by hand\n" + dxfDoc(4, "", square("0", 0, 0, 2)...)
	p, _, err := Read("c.dxf", []byte(src), Options{})
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "area", p.Profile.Region.Area(), 4, 1e-12) // derived: 2 × 2
}

func TestReadDXFUnitsNote(t *testing.T) {
	_, rep, err := Read("t.dxf", []byte(dxfDoc(-1, "", square("0", 0, 0, 3)...)), Options{})
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(rep.UnitsNote, "assumed millimetres") {
		t.Errorf("got units note %q, want it to say millimetres were assumed", rep.UnitsNote)
	}
	p, rep, err := Read("t.dxf", []byte(dxfDoc(4, "", square("0", 0, 0, 1)...)), Options{Units: pantograph.Inch})
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "area with --units in", p.Profile.Region.Area(), 25.4*25.4, 1e-9) // derived
	if !strings.Contains(rep.UnitsNote, "--units") {
		t.Errorf("got units note %q, want it to name --units", rep.UnitsNote)
	}
}

func TestReadDXFInsert(t *testing.T) {
	unit := ent("BLOCK", 8, "0", 2, "SQ", 70, 0, 10, 0, 20, 0) + strings.Join(square("0", 0, 0, 1), "") + ent("ENDBLK")
	hole := ent("BLOCK", 8, "0", 2, "HOLE", 70, 0, 10, 1, 20, 1) + ent("CIRCLE", 8, "0", 10, 1, 20, 1, 40, 0.25) + ent("ENDBLK")
	blocks := unit + hole
	t.Run("scaled and turned", func(t *testing.T) {
		src := dxfDoc(4, blocks,
			ent("INSERT", 8, "PLATE", 2, "SQ", 10, 10, 20, 10, 41, 20, 42, 20, 50, 90),
			ent("INSERT", 8, "0", 2, "HOLE", 10, 5, 20, 12, 41, 2, 42, 2),
			ent("INSERT", 8, "0", 2, "HOLE", 10, 5, 20, 18, 41, 2, 42, 2, 50, 30))
		p, _, err := Read("t.dxf", []byte(src), Options{})
		if err != nil {
			t.Fatal(err)
		}
		// Derived: the unit square scaled 20 and turned 90° about the insertion point (10, 10)
		// spans x −10..10, y 10..30, area 400.
		approx(t, "profile area", p.Profile.Region.Area(), 400, 1e-9)
		b := p.Profile.Region.Bounds()
		approx(t, "min x", b.Min.X, -10, 1e-9)
		approx(t, "max y", b.Max.Y, 30, 1e-9)
		hs := holeFeatures(p)
		if len(hs) != 1 || len(hs[0].Centers) != 2 {
			t.Fatalf("got %d holes features, want one with two centres", len(hs))
		}
		// Derived: radius 0.25 scaled by 2 is diameter 1; the base point (1, 1) lands on the
		// insertion point, so each centre is the insertion point.
		approx(t, "diameter", hs[0].Diameter, 1, 1e-12)
		approx(t, "centre x", hs[0].Centers[1].X, 5, 1e-12)
		approx(t, "centre y", hs[0].Centers[1].Y, 18, 1e-12)
	})
	t.Run("stretched", func(t *testing.T) {
		src := dxfDoc(4, hole, append(square("0", 0, 0, 20), ent("INSERT", 8, "0", 2, "HOLE", 10, 10, 20, 10, 41, 8, 42, 4))...)
		p, rep, err := Read("t.dxf", []byte(src), Options{})
		if err != nil {
			t.Fatal(err)
		}
		if len(rep.Warnings) == 0 || !strings.Contains(rep.Warnings[0], "stretched unequally") {
			t.Errorf("got warnings %q, want one about the unequal scale", rep.Warnings)
		}
		if kinds(p)[pantograph.KindCutout] != 1 {
			t.Fatalf("got %v, want the stretched circle as one cut-out", kinds(p))
		}
		// Derived: the circle of radius 0.25 stretched 8 × 4 is an ellipse of semi-axes 2 and
		// 1, area 2π; chords lose at most perimeter × chord tolerance.
		approx(t, "ellipse area", p.Features[0].Region.Area(), 2*math.Pi, 0.01)
	})
}

func TestReadDXFClassify(t *testing.T) {
	ents := square("0", 0, 0, 20)
	ents = append(ents, square("RECESS", 2, 2, 4)...)
	ents = append(ents, square("CUT", 10, 2, 4)...)
	ents = append(ents, square("CONSTRUCTION", -50, -50, 200)...)
	ents = append(ents,
		ent("CIRCLE", 8, "0", 10, 5, 20, 15, 40, 0.5),
		ent("CIRCLE", 8, "0", 10, 8, 20, 15, 40, 0.5),
		ent("CIRCLE", 8, "0", 10, 12, 20, 15, 40, 0.3),
		ent("CIRCLE", 8, "0", 10, 16, 20, 15, 40, 2), // Ø4: larger than --hole-max, a cut-out
		ent("LINE", 8, "ENGRAVE", 10, 2, 20, 10, 11, 8, 21, 10),
		ent("TEXT", 8, "0", 10, 1, 20, 1, 1, "label"),
		ent("DIMENSION", 8, "0"),
	)
	opts := Options{HoleMax: 1.5, Layers: map[string]LayerRule{
		"RECESS":       {Kind: pantograph.KindPocket, Depth: 0.3},
		"CONSTRUCTION": {Ignore: true},
		"ENGRAVE":      {Kind: pantograph.KindGroove, Depth: 0.05},
	}}
	p, rep, err := Read("t.dxf", []byte(dxfDoc(4, "", ents...)), opts)
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "profile area", p.Profile.Region.Area(), 400, 1e-9) // derived: 20 × 20
	got := kinds(p)
	want := map[pantograph.Kind]int{pantograph.KindPocket: 1, pantograph.KindCutout: 2, pantograph.KindHoles: 2, pantograph.KindGroove: 1}
	for k, n := range want {
		if got[k] != n {
			t.Errorf("%s: got %d, want %d", k, got[k], n)
		}
	}
	for _, f := range p.Features {
		if f.Kind == pantograph.KindPocket && f.Depth.MM != 0.3 {
			t.Errorf("pocket depth: got %v, want 0.3 mm", f.Depth)
		}
		if f.Kind == pantograph.KindHoles && f.Diameter == 1 && len(f.Centers) != 2 {
			t.Errorf("Ø1 holes: got %d centres, want 2", len(f.Centers))
		}
	}
	if !strings.Contains(rep.Skipped, "1 TEXT") || !strings.Contains(rep.Skipped, "1 DIMENSION") {
		t.Errorf("got skipped %q, want 1 TEXT and 1 DIMENSION", rep.Skipped)
	}
	if !strings.Contains(strings.Join(rep.Made, "\n"), `layer "CONSTRUCTION": 4 segment(s) left out`) {
		t.Errorf("report does not say the ignored layer was left out:\n%s", strings.Join(rep.Made, "\n"))
	}
}

func TestReadDXFOpenOutline(t *testing.T) {
	// A 10 mm square with its last side stopping 0.05 short of the start.
	ents := square("0", 0, 0, 10)
	ents[3] = ent("LINE", 8, "0", 10, 0, 20, 10, 11, 0, 21, 0.05)
	_, _, err := Read("open.dxf", []byte(dxfDoc(4, "", ents...)), Options{})
	var de *Error
	if !errors.As(err, &de) {
		t.Fatalf("got %v, want a drawing error", err)
	}
	for _, want := range []string{"do not close", "(0.0000, 0.0500)", "(0.0000, 0.0000)", "gap of 0.05 mm"} {
		if !strings.Contains(de.Msg, want) {
			t.Errorf("message %q does not contain %q", de.Msg, want)
		}
	}
}

func TestReadDXFDuplicates(t *testing.T) {
	ents := append(square("0", 0, 0, 10), square("0", 0, 0, 10)...)
	p, rep, err := Read("t.dxf", []byte(dxfDoc(4, "", ents...)), Options{})
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "profile area", p.Profile.Region.Area(), 100, 1e-9) // derived: 10 × 10
	if len(rep.Warnings) != 1 || !strings.Contains(rep.Warnings[0], "4 segment(s) drawn twice") {
		t.Errorf("got warnings %q, want one saying 4 segments were drawn twice", rep.Warnings)
	}
}

func TestReadDXFErrors(t *testing.T) {
	good := dxfDoc(4, "", square("0", 0, 0, 10)...)
	tests := []struct {
		name, src string
		line      int
		msg       string
	}{
		{"not DXF", "hello\nworld\n", 1, "expected a group code"},
		{"binary", "AutoCAD Binary DXF\r\n\x1a\x00", 1, "binary DXF"},
		{"code without value", "0\nSECTION\n2", 3, "has no value"},
		{"bad number", strings.Replace(good, "10\n10\n", "10\nten\n", 1), 0, `group 10 should be a number, got "ten"`},
		{"unclosed section", "0\nSECTION\n2\nENTITIES\n0\nLINE\n", 1, "0 ENDSEC is missing"},
		{"zero radius", dxfDoc(4, "", ent("CIRCLE", 10, 0, 20, 0, 40, 0)), 0, "radius (group 40) must be greater than 0"},
		{"unknown block", dxfDoc(4, "", ent("INSERT", 2, "NOPE", 10, 0, 20, 0)), 0, `block "NOPE", which the file does not define`},
		{"block inserting itself", dxfDoc(4, ent("BLOCK", 2, "A", 10, 0, 20, 0)+ent("INSERT", 2, "A")+ent("ENDBLK"), ent("INSERT", 2, "A")), 0, "inserts itself"},
		{"unknown units", dxfDoc(3, "", square("0", 0, 0, 1)...), 8, "$INSUNITS 3 is not a unit"},
		{"nothing closed", dxfDoc(4, ""), 0, "no closed outline"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			_, _, err := Read("bad.dxf", []byte(tc.src), Options{})
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
			if !strings.HasPrefix(de.Error(), "bad.dxf") {
				t.Errorf("got %q, want it to start with the file name", de.Error())
			}
		})
	}
}

// TestReadDXFBadNumberLine checks that a bad value is placed on its own line.
func TestReadDXFBadNumberLine(t *testing.T) {
	src := "0\nSECTION\n2\nENTITIES\n0\nLINE\n10\nx\n20\n0\n11\n1\n21\n1\n0\nENDSEC\n0\nEOF\n"
	_, _, err := Read("bad.dxf", []byte(src), Options{})
	var de *Error
	if !errors.As(err, &de) || de.Line != 8 { // derived: "x" is the 8th line
		t.Fatalf("got %v, want an error on line 8", err)
	}
}

func TestReadDXFFixture(t *testing.T) {
	p, rep, err := ReadFile("../../testdata/drawings/plate-mm.dxf", Options{})
	if err != nil {
		t.Fatal(err)
	}
	// Derived: 40 × 20 plate, less the 6 × 4 window, the 6 × 4 rectangle and two R2 half
	// discs of the rounded opening, and two Ø1 holes.
	want := 800 - 24 - (24 + 4*math.Pi) - 2*math.Pi/4
	area := p.Profile.Region.Area()
	for _, f := range p.Features {
		switch f.Kind {
		case pantograph.KindCutout:
			area -= f.Region.Area()
		case pantograph.KindHoles:
			area -= float64(len(f.Centers)) * math.Pi * f.Diameter * f.Diameter / 4
		}
	}
	approx(t, "area less openings", area, want, 1e-6)
	if rep.Skipped != "1 TEXT" {
		t.Errorf("got skipped %q, want 1 TEXT", rep.Skipped)
	}
	if _, err := os.Stat("../../testdata/drawings/plate-mm.dxf"); err != nil {
		t.Fatal(err)
	}
}
