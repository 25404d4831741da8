package dxf

import (
	"bytes"
	"math"
	"os"
	"path/filepath"
	"testing"

	"panto/pantograph"
	"panto/pantograph/cad"
	"panto/pantograph/partfile"
)

// FuzzPartDrawingRoundTrip reads random DXF with panto's reader and, when a part comes of it,
// writes the part as panto's own part drawing and reads that back: the profile, the cut-outs,
// the pockets, the holes and the grooves must come back as they went out. Seeds are the test
// drawings and the part drawings of the samples.
func FuzzPartDrawingRoundTrip(f *testing.F) {
	paths, _ := filepath.Glob("../../testdata/drawings/*.dxf")
	for _, p := range paths {
		if src, err := os.ReadFile(p); err == nil {
			f.Add(src)
		}
	}
	samples, _ := filepath.Glob("../../samples/*.toml")
	for _, s := range samples {
		if p, err := partfile.ReadFile(s); err == nil {
			var b bytes.Buffer
			if Encode(&b, PartDrawing(p)) == nil {
				f.Add(b.Bytes())
			}
		}
	}
	f.Fuzz(func(t *testing.T, src []byte) {
		p, _, err := cad.Read("f.dxf", src, cad.Options{})
		if err != nil || p.Profile.Region.Validate() != nil {
			return // the reader's own fuzz test judges its errors
		}
		var b bytes.Buffer
		if err := Encode(&b, PartDrawing(p)); err != nil {
			t.Fatalf("a part read from a drawing does not write: %v", err)
		}
		// Pockets need a depth to be read; holes are drilled whatever their size.
		again, _, err := cad.Read("again.dxf", b.Bytes(), cad.Options{Layers: map[string]cad.LayerRule{
			LayerPockets: {Kind: pantograph.KindPocket, Depth: 0.1}}})
		if err != nil {
			t.Fatalf("the part drawing written does not read back: %v", err)
		}
		sameDrawnPart(t, again, p)
	})
}

// sameDrawnPart compares what a drawing carries of two parts: areas by kind, hole counts and
// sizes, groove count.
func sameDrawnPart(t *testing.T, got, want pantograph.Part) {
	t.Helper()
	g, w := drawnSummary(got), drawnSummary(want)
	// Areas agree to 1e-9 of the largest outline's squared size: the writer keeps a billionth
	// of a millimetre and arcs stay arcs (derived).
	tol := 1e-9 * math.Max(1, w.scale)
	for k, a := range w.area {
		if math.Abs(g.area[k]-a) > tol {
			t.Errorf("%s area: got %v, want %v", k, g.area[k], a)
		}
	}
	if g.holes != w.holes || g.grooves != w.grooves || math.Abs(g.holeArea-w.holeArea) > tol {
		t.Errorf("got %d holes (%v mm²) and %d grooves, want %d (%v mm²) and %d",
			g.holes, g.holeArea, g.grooves, w.holes, w.holeArea, w.grooves)
	}
}

// drawn is what sameDrawnPart compares.
type drawn struct {
	area            map[pantograph.Kind]float64
	holes, grooves  int
	holeArea, scale float64 // scale: the largest outline's size, squared, mm²
}

func drawnSummary(p pantograph.Part) drawn {
	d := drawn{area: map[pantograph.Kind]float64{}}
	for _, f := range p.All() {
		b := f.Region.Bounds()
		if !b.IsEmpty() {
			s := b.Size()
			d.scale = math.Max(d.scale, math.Max(s.X, s.Y)*math.Max(s.X, s.Y))
		}
		switch f.Kind {
		case pantograph.KindHoles:
			d.holes += len(f.Centers)
			d.holeArea += float64(len(f.Centers)) * math.Pi * f.Diameter * f.Diameter / 4
		case pantograph.KindGroove:
			d.grooves++
		default:
			d.area[f.Kind] += f.Region.Area()
		}
	}
	return d
}
