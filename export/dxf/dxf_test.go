package dxf

import (
	"bytes"
	"math"
	"strings"
	"testing"

	"panto/geom"
	"panto/pantograph"
	"panto/pantograph/cad"
	"panto/pantograph/partfile"
)

// readBack reads a written drawing with panto's own DXF reader.
func readBack(t *testing.T, b []byte) *cad.Drawing {
	t.Helper()
	sh, err := cad.ReadDXF("out.dxf", b, cad.Options{})
	if err != nil {
		t.Fatalf("reading back: %v", err)
	}
	return sh
}

func TestBulges(t *testing.T) {
	// A quarter disc, counter-clockwise and clockwise.
	ccw := geom.Contour{geom.Line(geom.V(0, 0), geom.V(10, 0)), geom.ArcFrom(geom.V(10, 0), geom.V(0, 0), math.Pi/2),
		geom.Line(geom.V(0, 10), geom.V(0, 0))}
	tests := []struct {
		name  string
		c     geom.Contour
		bulge string
	}{
		{"counter-clockwise 90°", ccw, "0.414213562"},    // derived: tan(π/8)
		{"clockwise 90°", ccw.Reverse(), "-0.414213562"}, // derived: −tan(π/8)
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			var b bytes.Buffer
			if err := Encode(&b, Drawing{Outlines: []Outline{{Layer: "A", Contour: tc.c}}}); err != nil {
				t.Fatal(err)
			}
			if !strings.Contains(b.String(), " 42\n"+tc.bulge) {
				t.Errorf("no bulge %s in the output", tc.bulge)
			}
			sh := readBack(t, b.Bytes())
			if len(sh.Items) != 3 {
				t.Fatalf("got %d segments back, want 3", len(sh.Items))
			}
			c := geom.Contour{}
			for _, it := range sh.Items {
				c = append(c, it.Seg)
			}
			approx(t, "area", c.Area(), tc.c.Area(), 1e-9)
		})
	}
}

func approx(t *testing.T, what string, got, want, tol float64) {
	t.Helper()
	if math.IsNaN(got) || math.Abs(got-want) > tol {
		t.Errorf("%s: got %.9g, want %.9g (±%g)", what, got, want, tol)
	}
}

// clockBridge is the sample part with lines, arcs, holes, a pocket and a cut-out.
func clockBridge(t *testing.T) pantograph.Part {
	t.Helper()
	p, err := partfile.ReadFile("../../samples/clock-bridge.toml")
	if err != nil {
		t.Fatal(err)
	}
	return p
}

func TestPartDrawingReadsBack(t *testing.T) {
	p := clockBridge(t)
	var b bytes.Buffer
	if err := Encode(&b, PartDrawing(p)); err != nil {
		t.Fatal(err)
	}
	var again bytes.Buffer
	if err := Encode(&again, PartDrawing(p)); err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(b.Bytes(), again.Bytes()) {
		t.Errorf("two writes of the same drawing differ")
	}
	got, rep, err := cad.Read("bridge.dxf", b.Bytes(), cad.Options{Layers: map[string]cad.LayerRule{
		LayerPockets: {Kind: pantograph.KindPocket, Depth: 0.3}, LayerHoles: {Kind: pantograph.KindHoles}}})
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "profile area", got.Profile.Region.Area(), p.Profile.Region.Area(), 1e-6)
	if rep.Skipped != "5 TEXT" { // one label per named feature of the sample
		t.Errorf("got skipped %q, want 5 TEXT", rep.Skipped)
	}
	var wantHoles, gotHoles int
	for _, f := range p.Features {
		wantHoles += len(f.Centers)
	}
	for _, f := range got.Features {
		gotHoles += len(f.Centers)
	}
	if gotHoles != wantHoles {
		t.Errorf("got %d holes, want %d", gotHoles, wantHoles)
	}
	if !strings.Contains(b.String(), "$INSUNITS\n 70\n4\n") {
		t.Errorf("no $INSUNITS 4 in the header")
	}
}

func TestEncodeRejects(t *testing.T) {
	tests := []struct {
		name string
		d    Drawing
	}{
		{"bad layer name", Drawing{Circles: []Circle{{Layer: "a/b", Radius: 1}}}},
		{"zero radius", Drawing{Circles: []Circle{{Layer: "A"}}}},
		{"two-line text", Drawing{Texts: []Text{{Layer: "A", Height: 1, Value: "a\nb"}}}},
		{"not finite", Drawing{Outlines: []Outline{{Layer: "A", Contour: geom.Polygon(geom.V(0, 0), geom.V(math.Inf(1), 0), geom.V(0, 1))}}}},
		{"one-point polyline", Drawing{Polylines: []Polyline{{Layer: "A", Points: []geom.Vec{geom.V(0, 0)}}}}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			var b bytes.Buffer
			if err := Encode(&b, tc.d); err == nil || !strings.HasPrefix(err.Error(), "dxf: ") {
				t.Errorf("got %v, want an error starting dxf:", err)
			}
			if b.Len() != 0 {
				t.Errorf("wrote %d bytes of a bad drawing", b.Len())
			}
		})
	}
}

func TestTemplateDrawing(t *testing.T) {
	p := clockBridge(t)
	plan, err := pantograph.PlanPart(p, pantograph.Setup{Ratio: 10, Cutter: 0.3, Stylus: 3}, nil)
	if err != nil {
		t.Fatal(err)
	}
	ct, err := pantograph.TemplateForCutting(plan, 0.2)
	if err != nil {
		t.Fatal(err)
	}
	d := TemplateDrawing(ct)
	count := func(layer string) (n int, area float64) {
		for _, o := range d.Outlines {
			if o.Layer == layer {
				n++
				area += o.Contour.Area()
			}
		}
		return n, area
	}
	// Every contour the planner gave is written on its layer, with its area (holes negative).
	for _, tc := range []struct {
		layer string
		rs    []geom.Region
	}{{LayerOutline, ct.Outline}, {LayerOpenings, ct.Openings}} {
		var n int
		var area float64
		for _, r := range tc.rs {
			for _, c := range r.Contours() {
				n++
				area += c.Area()
			}
		}
		gotN, gotArea := count(tc.layer)
		if gotN != n {
			t.Errorf("%s: got %d outlines, want %d", tc.layer, gotN, n)
		}
		approx(t, tc.layer+" area", gotArea, area, 1e-9)
	}
	if len(d.Circles) != len(ct.Seats) || len(ct.Seats) != 5 { // the sample's five drilled holes
		t.Errorf("got %d circles for %d seats, want 5", len(d.Circles), len(ct.Seats))
	}
	for i, c := range d.Circles {
		if c.Layer != LayerSeats || c.Center != ct.Seats[i].At || c.Radius != ct.Seats[i].Radius {
			t.Errorf("circle %d: got %+v, want seat %+v", i, c, ct.Seats[i])
		}
	}
	if len(d.Texts) != len(ct.Labels) || len(d.Polylines) != len(ct.Grooves) {
		t.Errorf("got %d texts and %d polylines, want %d labels and %d grooves",
			len(d.Texts), len(d.Polylines), len(ct.Labels), len(ct.Grooves))
	}
}
