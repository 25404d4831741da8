package pantograph_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

// cutPlate is a 20 × 10 mm plate with a Ø4 window and two Ø0.8 drilled pins, planned at 10:1
// for a Ø0.5 cutter with the matched Ø5 stylus: the template is the part × 10 exactly.
func cutPlate(t *testing.T) pantograph.Plan {
	t.Helper()
	outer, _ := geom.Rect(geom.V(0, 0), geom.V(20, 10), 0)
	part := pantograph.Part{Name: "cut plate", Stock: pantograph.Stock{Material: "brass", Thickness: 1},
		Profile: pantograph.Feature{Kind: pantograph.KindProfile, Region: geom.NewRegion(outer), Depth: pantograph.Depth{Through: true}},
		Features: []pantograph.Feature{
			{Name: "window", Kind: pantograph.KindCutout, Region: geom.NewRegion(geom.Circle(geom.V(10, 5), 2)),
				Depth: pantograph.Depth{Through: true}},
			{Name: "pins", Kind: pantograph.KindHoles, Diameter: 0.8, Depth: pantograph.Depth{Through: true},
				Centers: []geom.Vec{geom.V(3, 5), geom.V(17, 5)}},
		}}
	p, err := pantograph.PlanPart(part, pantograph.Setup{Ratio: 10, Cutter: 0.5}, nil)
	if err != nil {
		t.Fatal(err)
	}
	return p
}

func regionsArea(rs []geom.Region) float64 {
	var a float64
	for _, r := range rs {
		a += r.Area()
	}
	return a
}

// TestTemplateForCuttingAreas checks the kerf against exact areas. The template outline is
// 200 × 100 mm; grown by k/2 it is (200 + k)(100 + k) less the four square corners that the
// offset rounds to radius k/2: (4 − π)(k/2)² (derived). The Ø40 window shrinks to radius
// 20 − k/2, and the Ø5 seats to 2.5 − k/2.
func TestTemplateForCuttingAreas(t *testing.T) {
	p := cutPlate(t)
	for _, k := range []float64{0, 0.2, 1.5} {
		ct, err := pantograph.TemplateForCutting(p, k)
		if err != nil {
			t.Fatalf("kerf %g: %v", k, err)
		}
		h := k / 2
		want := (200+k)*(100+k) - (4-math.Pi)*h*h
		if got := regionsArea(ct.Outline); math.Abs(got-want) > 1e-9*want {
			t.Errorf("kerf %g: outline area %v, want %v", k, got, want)
		}
		want = math.Pi * (20 - h) * (20 - h)
		if got := regionsArea(ct.Openings); math.Abs(got-want) > 1e-9*want {
			t.Errorf("kerf %g: window area %v, want %v", k, got, want)
		}
		if len(ct.Seats) != 2 {
			t.Fatalf("kerf %g: got %d seats, want 2", k, len(ct.Seats))
		}
		for _, s := range ct.Seats {
			if math.Abs(s.Radius-(2.5-h)) > 1e-12 {
				t.Errorf("kerf %g: seat radius %v, want %v", k, s.Radius, 2.5-h)
			}
		}
		if len(ct.Labels) != 3 {
			t.Errorf("kerf %g: got %d labels, want one per feature (3)", k, len(ct.Labels))
		}
	}
}

func TestTemplateForCuttingRefuses(t *testing.T) {
	p := cutPlate(t)
	tests := []struct {
		name string
		kerf float64
		want string
	}{
		{"negative", -0.1, "0 or more"},
		{"not a number", math.NaN(), "0 or more"},
		{"too wide for anything", pantograph.MaxKerf, "less than 10 mm"},
		{"closes the seats", 5, `[[holes]] "pins": the kerf (5 mm) closes the Ø5 seats`},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			_, err := pantograph.TemplateForCutting(p, tc.kerf)
			if !errors.Is(err, pantograph.ErrKerf) || !strings.Contains(err.Error(), tc.want) {
				t.Errorf("got %v, want an ErrKerf saying %q", err, tc.want)
			}
		})
	}
}
