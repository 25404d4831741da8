package cad_test

import (
	"bytes"
	"fmt"
	"math"
	"path/filepath"
	"sort"
	"testing"

	"panto/export/dxf"
	"panto/geom"
	"panto/pantograph"
	"panto/pantograph/cad"
	"panto/pantograph/partfile"
)

// roundTripTol is how far, in mm, a length may move on its way through panto's own DXF and
// back (derived): the writer puts every number down with the shortest digits that read back
// to the same float64, so points come back exactly; an arc travels as a bulge, and rebuilding
// its centre and radius from the bulge costs a few float64 roundings (about 1e-16 relative)
// on parts under 100 mm, some 1e-14 mm. 1e-9 mm leaves a wide margin and is still a thousand
// times finer than anything a cutter makes.
const roundTripTol = 1e-9

// TestOwnPartDrawingReadsBack writes every sample part as panto's part DXF and reads it back
// with no layer rules: the layer names alone must say what each outline is.
func TestOwnPartDrawingReadsBack(t *testing.T) {
	paths, err := filepath.Glob("../../samples/*.toml")
	if err != nil || len(paths) == 0 {
		t.Fatalf("no sample parts found: %v", err)
	}
	for _, path := range paths {
		t.Run(filepath.Base(path), func(t *testing.T) {
			want, err := partfile.ReadFile(path)
			if err != nil {
				t.Fatal(err)
			}
			var buf bytes.Buffer
			if err := dxf.Encode(&buf, dxf.PartDrawing(want)); err != nil {
				t.Fatal(err)
			}
			got, rep, err := cad.Read("part.dxf", buf.Bytes(), cad.Options{})
			if err != nil {
				t.Fatalf("got error %v, want the part back", err)
			}
			if len(rep.Warnings) > 0 {
				t.Errorf("got warnings %q, want none", rep.Warnings)
			}
			compareReadBack(t, got, want)
		})
	}
}

// compareReadBack compares what a part drawing gives back with the part it was drawn from:
// profile area, openings by kind, holes and grooves. Depths are not compared: a drawing
// carries none.
func compareReadBack(t *testing.T, got, want pantograph.Part) {
	t.Helper()
	perim := want.Profile.Region.Perimeter()
	if g, w := got.Profile.Region.Area(), want.Profile.Region.Area(); math.Abs(g-w) > roundTripTol*perim {
		t.Errorf("profile area: got %.12g, want %.12g", g, w)
	}
	gk, wk := countKinds(got), countKinds(want)
	// Slots are drawn with the cut-outs and come back as cut-outs.
	wk[pantograph.KindCutout] += wk[pantograph.KindSlot]
	for _, k := range []pantograph.Kind{pantograph.KindCutout, pantograph.KindPocket, pantograph.KindGroove} {
		if gk[k] != wk[k] {
			t.Errorf("%s count: got %d, want %d", k, gk[k], wk[k])
		}
	}
	if g, w := openingArea(got), openingArea(want); math.Abs(g-w) > roundTripTol*perim*10 {
		t.Errorf("area of openings: got %.12g, want %.12g", g, w)
	}
	gh, wh := holeList(got), holeList(want)
	if len(gh) != len(wh) {
		t.Fatalf("holes: got %d, want %d", len(gh), len(wh))
	}
	for i := range gh {
		if gh[i].at.Dist(wh[i].at) > roundTripTol || math.Abs(gh[i].d-wh[i].d) > roundTripTol {
			t.Errorf("hole %d: got Ø%.12g at %v, want Ø%.12g at %v", i, gh[i].d, gh[i].at, wh[i].d, wh[i].at)
		}
	}
	gg, wg := groovePaths(got), groovePaths(want)
	for i := range min(len(gg), len(wg)) {
		if len(gg[i]) != len(wg[i]) {
			t.Errorf("groove %d: got %d points, want %d", i, len(gg[i]), len(wg[i]))
			continue
		}
		for j := range gg[i] {
			if gg[i][j].Dist(wg[i][j]) > roundTripTol {
				t.Errorf("groove %d point %d: got %v, want %v", i, j, gg[i][j], wg[i][j])
			}
		}
	}
}

func countKinds(p pantograph.Part) map[pantograph.Kind]int {
	m := map[pantograph.Kind]int{}
	for _, f := range p.Features {
		m[f.Kind]++
	}
	return m
}

// openingArea sums the areas of the cut-outs, slots and pockets.
func openingArea(p pantograph.Part) float64 {
	var a float64
	for _, f := range p.Features {
		if f.Kind.Milled() {
			a += f.Region.Area()
		}
	}
	return a
}

type hole struct {
	at geom.Vec
	d  float64
}

// holeList lists every hole of p, sorted by place, whatever feature it belongs to: a drawing
// does not keep holes of one size but different depths apart.
func holeList(p pantograph.Part) []hole {
	var out []hole
	for _, f := range p.Features {
		if f.Kind == pantograph.KindHoles {
			for _, c := range f.Centers {
				out = append(out, hole{c, f.Diameter})
			}
		}
	}
	sort.Slice(out, func(i, j int) bool {
		a, b := out[i].at, out[j].at
		if a.X != b.X {
			return a.X < b.X
		}
		return a.Y < b.Y
	})
	return out
}

// groovePaths lists the grooves' paths in file order.
func groovePaths(p pantograph.Part) [][]geom.Vec {
	var out [][]geom.Vec
	for _, f := range p.Features {
		if f.Kind == pantograph.KindGroove {
			out = append(out, f.Path)
		}
	}
	return out
}

// TestOwnLayerRules checks that panto's layer names act as rules of their own, and that a
// --layer rule for the same name wins over them.
func TestOwnLayerRules(t *testing.T) {
	// A 20 mm square profile; a 4 × 4 mm square on the pockets layer; a Ø5 circle on the holes
	// layer (above the 3 mm hole limit, so only the layer makes it a hole); an open line on the
	// grooves layer and one on the labels layer, which would not close on any other layer.
	d := dxf.Drawing{
		Outlines: []dxf.Outline{{Layer: dxf.LayerProfile, Contour: squareAt(0, 0, 20)},
			{Layer: dxf.LayerPockets, Contour: squareAt(2, 2, 4)}},
		Circles: []dxf.Circle{{Layer: dxf.LayerHoles, Center: geom.V(14, 14), Radius: 2.5}},
		Polylines: []dxf.Polyline{{Layer: dxf.LayerGrooves, Points: []geom.Vec{geom.V(2, 15), geom.V(8, 15)}},
			{Layer: dxf.LayerLabels, Points: []geom.Vec{geom.V(2, 18), geom.V(8, 18)}}},
	}
	var buf bytes.Buffer
	if err := dxf.Encode(&buf, d); err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		name   string
		layers map[string]cad.LayerRule
		want   map[pantograph.Kind]int
		depth  float64 // of the pocket, mm; 0 for none given
	}{
		// derived: one feature per layer, as drawn
		{"defaults", nil, map[pantograph.Kind]int{pantograph.KindPocket: 1, pantograph.KindHoles: 1, pantograph.KindGroove: 1}, 0},
		{"pocket depth from a rule", map[string]cad.LayerRule{"POCKETS": {Kind: pantograph.KindPocket, Depth: 0.3}},
			map[pantograph.Kind]int{pantograph.KindPocket: 1, pantograph.KindHoles: 1, pantograph.KindGroove: 1}, 0.3},
		{"rules override", map[string]cad.LayerRule{"POCKETS": {Kind: pantograph.KindCutout}, "GROOVES": {Ignore: true}},
			map[pantograph.Kind]int{pantograph.KindCutout: 1, pantograph.KindHoles: 1}, 0},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			p, _, err := cad.Read("part.dxf", buf.Bytes(), cad.Options{Layers: tc.layers})
			if err != nil {
				t.Fatalf("got error %v", err)
			}
			if got := countKinds(p); fmt.Sprint(got) != fmt.Sprint(tc.want) {
				t.Errorf("kinds: got %v, want %v", got, tc.want)
			}
			for _, f := range p.Features {
				if f.Kind == pantograph.KindPocket && f.Depth.MM != tc.depth {
					t.Errorf("pocket depth: got %v, want %v", f.Depth.MM, tc.depth)
				}
			}
		})
	}
}

// squareAt is a square contour of side s with its lower left corner at (x, y).
func squareAt(x, y, s float64) geom.Contour {
	p := []geom.Vec{geom.V(x, y), geom.V(x+s, y), geom.V(x+s, y+s), geom.V(x, y+s)}
	c := make(geom.Contour, 4)
	for i := range p {
		c[i] = geom.Line(p[i], p[(i+1)%4])
	}
	return c
}
