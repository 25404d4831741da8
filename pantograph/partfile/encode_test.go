package partfile

import (
	"bytes"
	"math"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

// samplePart is a part with every kind of feature a drawing gives: a profile of lines and
// arcs, a rectangular and a circular cut-out, a pocket with and without depth, holes, a groove.
func samplePart(t *testing.T, units pantograph.Units) pantograph.Part {
	t.Helper()
	profile := geom.Contour{
		geom.Line(geom.V(0, 0), geom.V(30, 0)),
		geom.ArcFrom(geom.V(30, 0), geom.V(30, 5), math.Pi),
		geom.Line(geom.V(30, 10), geom.V(0, 10)),
		geom.Line(geom.V(0, 10), geom.V(0, 0)),
	}
	rect, err := geom.Rect(geom.V(3, 3), geom.V(5, 4), 1)
	if err != nil {
		t.Fatal(err)
	}
	return pantograph.Part{
		Name: `bridge "A"`, Units: units, Datum: geom.V(1.5, 2),
		Stock:   pantograph.Stock{Material: "brass", Thickness: 1.2},
		Profile: pantograph.Feature{Kind: pantograph.KindProfile, Region: geom.NewRegion(profile), Depth: pantograph.Depth{Through: true}},
		Features: []pantograph.Feature{
			{Kind: pantograph.KindCutout, Name: "window", Region: geom.NewRegion(rect), Depth: pantograph.Depth{Through: true},
				Where: pantograph.Where{File: "x.dxf", Line: 40}},
			{Kind: pantograph.KindCutout, Name: "round", Region: geom.NewRegion(geom.Circle(geom.V(20, 5), 2)), Depth: pantograph.Depth{Through: true}},
			{Kind: pantograph.KindPocket, Name: "seat", Region: geom.NewRegion(geom.Polygon(geom.V(12, 2), geom.V(15, 2), geom.V(15, 8))), Depth: pantograph.Depth{MM: 0.3}},
			{Kind: pantograph.KindPocket, Name: "no depth", Region: geom.NewRegion(geom.Polygon(geom.V(25, 2), geom.V(27, 2), geom.V(27, 3)))},
			{Kind: pantograph.KindHoles, Name: "pivots", Diameter: 0.6, Depth: pantograph.Depth{Through: true},
				Centers: []geom.Vec{geom.V(1, 1), geom.V(2, 1), geom.V(29, 1), geom.V(29, 9), geom.V(1, 9)}},
			{Kind: pantograph.KindGroove, Name: "mark", Path: []geom.Vec{geom.V(10, 9), geom.V(14, 9)}, Depth: pantograph.Depth{MM: 0.05}},
		},
	}
}

func TestRoundTrip(t *testing.T) {
	for _, u := range []pantograph.Units{pantograph.MM, pantograph.Inch} {
		t.Run(string(u), func(t *testing.T) {
			want := samplePart(t, u)
			var buf bytes.Buffer
			if err := (Encoder{Header: []string{"written by a test"}}).Encode(&buf, want); err != nil {
				t.Fatal(err)
			}
			got, err := Read("round.toml", buf.Bytes())
			if err != nil {
				t.Fatalf("reading back: %v\n%s", err, buf.String())
			}
			samePart(t, got, want)
		})
	}
}

// relTol is how closely geometry must come back, relative to the part's size (at least 1 mm):
// the writer rounds to 1e-9 of a unit, and arcs are rebuilt from three points (derived:
// rounding 1e-9 on points of a part tens of mm across moves a rebuilt centre by well under
// 1e-6).
const relTol = 1e-6

// samePart reports where got differs from want by more than relTol of want's size.
func samePart(t *testing.T, got, want pantograph.Part) {
	t.Helper()
	tol := relTol * extent(want)
	if got.Name != want.Name || got.Units != want.Units || got.Stock.Material != want.Stock.Material ||
		math.Abs(got.Stock.Thickness-want.Stock.Thickness) > tol || got.Datum.Dist(want.Datum) > tol {
		t.Errorf("head: got %q %q %+v %v, want %q %q %+v %v", got.Name, got.Units, got.Stock, got.Datum,
			want.Name, want.Units, want.Stock, want.Datum)
	}
	sameContour(t, "profile", got.Profile.Region.Outer, want.Profile.Region.Outer, tol)
	if len(got.Features) != len(want.Features) {
		t.Fatalf("got %d features, want %d", len(got.Features), len(want.Features))
	}
	for i, g := range got.Features {
		sameFeature(t, i, g, want.Features[i], tol)
	}
}

// extent is the largest size or coordinate magnitude in p, and at least 1 mm.
func extent(p pantograph.Part) float64 {
	e := math.Max(1, math.Max(math.Abs(p.Datum.X), math.Abs(p.Datum.Y)))
	e = math.Max(e, p.Stock.Thickness)
	grow := func(v geom.Vec) { e = math.Max(e, math.Max(math.Abs(v.X), math.Abs(v.Y))) }
	for _, f := range p.All() {
		b := f.Region.Bounds()
		if !b.IsEmpty() {
			grow(b.Min)
			grow(b.Max)
		}
		for _, v := range append(append([]geom.Vec{}, f.Centers...), f.Path...) {
			grow(v)
		}
		e = math.Max(e, math.Max(f.Diameter, math.Max(f.Width, f.Depth.MM)))
	}
	return e
}

// sameFeature compares feature i of two parts.
func sameFeature(t *testing.T, i int, g, w pantograph.Feature, tol float64) {
	t.Helper()
	if g.Kind != w.Kind || g.Name != w.Name || g.Depth.Through != w.Depth.Through || math.Abs(g.Depth.MM-w.Depth.MM) > tol {
		t.Errorf("feature %d: got %s %q depth %v, want %s %q depth %v", i, g.Kind, g.Name, g.Depth, w.Kind, w.Name, w.Depth)
	}
	sameContour(t, w.Name, g.Region.Outer, w.Region.Outer, tol)
	if math.Abs(g.Diameter-w.Diameter) > tol || math.Abs(g.Width-w.Width) > tol ||
		len(g.Centers) != len(w.Centers) || len(g.Path) != len(w.Path) {
		t.Errorf("feature %d: got Ø%g w %g %v %v, want Ø%g w %g %v %v", i, g.Diameter, g.Width, g.Centers, g.Path,
			w.Diameter, w.Width, w.Centers, w.Path)
		return
	}
	for j := range g.Centers {
		if g.Centers[j].Dist(w.Centers[j]) > tol {
			t.Errorf("feature %d centre %d: got %v, want %v", i, j, g.Centers[j], w.Centers[j])
		}
	}
	for j := range g.Path {
		if g.Path[j].Dist(w.Path[j]) > tol {
			t.Errorf("feature %d point %d: got %v, want %v", i, j, g.Path[j], w.Path[j])
		}
	}
}

// sameContour compares two contours segment by segment, after both are normalised.
func sameContour(t *testing.T, what string, got, want geom.Contour, tol float64) {
	t.Helper()
	if len(got) != len(want) {
		t.Errorf("%s: got %d segments, want %d", what, len(got), len(want))
		return
	}
	for i := range got {
		g, w := got[i], want[i]
		if g.A.Dist(w.A) > tol || g.B.Dist(w.B) > tol || g.IsArc() != w.IsArc() ||
			g.IsArc() && (g.Center.Dist(w.Center) > tol || math.Abs(g.Sweep-w.Sweep) > relTol) {
			t.Errorf("%s segment %d: got %v, want %v", what, i, g, w)
		}
	}
}

func TestQuote(t *testing.T) {
	tests := []struct{ in, want string }{
		{"plain", `"plain"`},
		{`a "b" \c`, `"a \"b\" \\c"`},
		{"tab\there", `"tab\u0009here"`},
		{"Ø0.6", `"Ø0.6"`},
	}
	for _, tc := range tests {
		t.Run(tc.in, func(t *testing.T) {
			if got := quote(tc.in); got != tc.want {
				t.Errorf("got %s, want %s", got, tc.want)
			}
		})
	}
}
