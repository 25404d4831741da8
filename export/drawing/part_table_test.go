package drawing

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"panto/geom"
)

// TestOutlineRows checks how outlines are described in the feature table against hand-worked
// descriptions (derived): a rounded corner by the point where its straight edges meet and its
// radius, a circle by its centre and diameter, other arcs by their centres and radii with the
// points where they meet their neighbours.
func TestOutlineRows(t *testing.T) {
	rounded, err := geom.RoundedPolygon([]geom.Vec{geom.V(0, 0), geom.V(10, 0), geom.V(10, 4), geom.V(0, 4)}, []float64{0.5, 0, 1, 0})
	if err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		name string
		c    geom.Contour
		want string
	}{
		{"rectangle with two rounded corners", rounded,
			"corner (0, 0) R0.5; corner (10, 0); corner (10, 4) R1; corner (0, 4)"},
		{"circle", geom.Circle(geom.V(6, 9), 1.25), "centre (6, 9) Ø2.5"},
		// a stadium: two half circles between parallel edges are rounded ends, not corners
		{"stadium", geom.Capsule(geom.V(0, 0), geom.V(4, 0), 1),
			"point (0, -1); point (4, -1); arc centre (4, 0) R1; point (4, 1); point (0, 1); arc centre (0, 0) R1"},
		{"triangle", geom.Polygon(geom.V(0, 0), geom.V(3, 0), geom.V(0, 4)), "corner (0, 0); corner (3, 0); corner (0, 4)"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			var got []string
			for _, r := range outlineRows(tc.c) {
				s := fmt.Sprintf("%s (%s, %s)", r.what, trim(r.at.X), trim(r.at.Y))
				if r.size != "" {
					s += " " + r.size + trim(r.sizeMM)
				}
				got = append(got, s)
			}
			if g := strings.Join(got, "; "); g != tc.want {
				t.Errorf("got  %s\nwant %s", g, tc.want)
			}
		})
	}
}

// TestPlaceFindsTheGap rings a hole with short lines all round but for one gap to its left: the
// search must find the gap, the only place within reach clear of every line.
func TestPlaceFindsTheGap(t *testing.T) {
	fonts, err := LoadFonts()
	if err != nil {
		t.Fatal(err)
	}
	k := newSketch(fonts)
	c := geom.V(50, 50)
	k.circle(c, 1, 0.25)
	for a := 0; a < 360; a += 10 {
		if a > 150 && a < 210 {
			continue // the gap, to the left
		}
		d := geom.V(1, 0).Rotate(float64(a) * math.Pi / 180)
		k.line(c.Add(d.Mul(2)), c.Add(d.Mul(14)), 0.18)
	}
	job := labelJob{text: "#1", size: 9, bold: true, own: [][]geom.Vec{circleChain(c, 1)}, anchors: []anchor{{at: c, r: 1}}}
	boxes := placeLabels(k, geom.Box{Max: geom.V(100, 100)}, []labelJob{job})
	b := boxes[0]
	if b.IsEmpty() {
		t.Fatal("no place found")
	}
	if b.Max.X > c.X {
		t.Errorf("label at %v, want it in the gap left of %v", b, c)
	}
	for _, s := range k.strokes {
		if polyMeetsBox(s.pts, s.closed, b) {
			t.Errorf("label at %v touches a line from %v", b, s.pts[0])
		}
	}
}
