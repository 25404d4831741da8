package pantograph_test

import (
	"math"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

func TestLetteringOutlines(t *testing.T) {
	const h = 5.0
	at := geom.V(10, 20)
	for _, ch := range "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZ-+=.,:/()#Ø?_" {
		t.Run(string(ch), func(t *testing.T) {
			rs, err := pantograph.TextOutlines(string(ch), at, h)
			if err != nil {
				t.Fatal(err)
			}
			if len(rs) == 0 {
				t.Fatalf("no outline")
			}
			box := geom.EmptyBox()
			for i, r := range rs {
				if err := r.Validate(); err != nil {
					t.Errorf("region %d: %v", i, err)
				}
				box = box.Union(r.Bounds())
			}
			// derived: strokes on a 4 × 6 grid of h/6 units, one unit wide, start at at;
			// ',' reaches a unit below the line on purpose.
			u := h / 6
			lo, hi := at.Sub(geom.V(0, 1.5*u)), at.Add(geom.V(pantograph.TextWidth("x", h), h+u))
			if box.Min.X < lo.X-1e-9 || box.Min.Y < lo.Y-1e-9 || box.Max.X > hi.X+1e-9 || box.Max.Y > hi.Y+1e-9 {
				t.Errorf("outline %v outside %v–%v", box, lo, hi)
			}
		})
	}
}

func TestLetteringWidth(t *testing.T) {
	tests := []struct {
		text string
		h    float64
		want float64
	}{
		// derived: n letters take (6(n − 1) + 4 + 1) units of h/6.
		{"", 6, 0},
		{"1", 6, 5},
		{"12", 6, 11},
		{"PUMP 10:1", 3, 0.5 * (6*8 + 5)},
	}
	for _, tc := range tests {
		if got := pantograph.TextWidth(tc.text, tc.h); math.Abs(got-tc.want) > 1e-12 {
			t.Errorf("TextWidth(%q, %g): got %g, want %g", tc.text, tc.h, got, tc.want)
		}
	}
}

func TestLetteringUnknown(t *testing.T) {
	q, _ := pantograph.TextOutlines("?", geom.V(0, 0), 5)
	x, _ := pantograph.TextOutlines("~", geom.V(0, 0), 5)
	lower, _ := pantograph.TextOutlines("a", geom.V(0, 0), 5)
	upper, _ := pantograph.TextOutlines("A", geom.V(0, 0), 5)
	area := func(rs []geom.Region) float64 {
		a := 0.0
		for _, r := range rs {
			a += r.Area()
		}
		return a
	}
	if got, want := area(x), area(q); math.Abs(got-want) > 1e-9 {
		t.Errorf("a character without a glyph: area %g, want that of ? (%g)", got, want)
	}
	if got, want := area(lower), area(upper); math.Abs(got-want) > 1e-9 {
		t.Errorf("lower case: area %g, want that of the capital (%g)", got, want)
	}
	if rs, err := pantograph.TextOutlines("   ", geom.V(0, 0), 5); err != nil || len(rs) != 0 {
		t.Errorf("spaces: got %d regions, %v; want none", len(rs), err)
	}
}
