package pantograph

import (
	"math"
	"testing"

	"panto/geom"
)

func TestCutterLimits(t *testing.T) {
	notched := Part{Name: "notched", Stock: Stock{Material: "brass", Thickness: 1}, Profile: Feature{Kind: KindProfile,
		Region: geom.NewRegion(geom.Polygon(geom.V(0, 0), geom.V(20, 0), geom.V(20, 10), geom.V(10.5, 10),
			geom.V(10.5, 6), geom.V(10.2, 6), geom.V(10.2, 10), geom.V(0, 10)))}}
	ell := Part{Name: "ell", Stock: Stock{Material: "brass", Thickness: 1}, Profile: Feature{Kind: KindProfile,
		Region: geom.NewRegion(geom.Polygon(geom.V(0, 0), geom.V(20, 0), geom.V(20, 5), geom.V(5, 5), geom.V(5, 10), geom.V(0, 10)))}}
	tri := Feature{Name: "three", Kind: KindCutout, Depth: through, Region: geom.NewRegion(geom.Polygon(
		geom.V(5, 2), geom.V(11, 2), geom.V(8, 2+3*math.Sqrt(3))))}
	tests := []struct {
		name    string
		part    Part
		feature string
		cutter  float64
		status  Status
		amount  float64 // of a warning about the feature; NaN for none
	}{
		// derived: a slot of 0.4 mm cannot take a 0.5 mm cutter; amount cutter − width.
		{"slot narrower than the cutter", plate(slotFeature("narrow", geom.V(3, 3), geom.V(8, 3), 0.4, through)), "narrow", 0.5, StatusLost, 0.1},
		{"slot as wide as the cutter", plate(slotFeature("exact", geom.V(3, 3), geom.V(8, 3), 0.5, through)), "exact", 0.5, StatusOK, math.NaN()},
		// derived: sharp 90° corner leaves r(√2 − 1) along the bisector (REFERENCES.md).
		{"sharp rectangle opening", plate(rectFeature(KindCutout, "box", geom.V(3, 3), geom.V(4, 3), 0, through)), "box", 0.5, StatusDeviates, 0.25 * (math.Sqrt2 - 1)},
		{"sharp concave profile corner", ell, "profile", 0.5, StatusDeviates, 0.25 * (math.Sqrt2 - 1)},
		// derived: corner R0.1 under a cutter of r = 0.25: (r − ρ)(1/sin 45° − 1) = 0.15(√2 − 1).
		{"small fillet", plate(rectFeature(KindPocket, "fillet", geom.V(3, 3), geom.V(4, 3), 0.1, Depth{MM: 0.2})), "fillet", 0.5, StatusDeviates, 0.15 * (math.Sqrt2 - 1)},
		{"fillet as large as the cutter", plate(rectFeature(KindPocket, "fillet", geom.V(3, 3), geom.V(4, 3), 0.25, Depth{MM: 0.2})), "fillet", 0.5, StatusOK, math.NaN()},
		// derived: sharp 60° corner leaves r(1/sin 30° − 1) = r.
		{"equilateral opening", plate(tri), "three", 0.5, StatusDeviates, 0.25},
		// derived: a notch 0.3 mm wide in the profile under a 0.5 mm cutter: 0.2 short.
		{"narrow notch", notched, "profile", 0.5, StatusDeviates, 0.2},
		{"small hole milled", plate(holes("bore", 0.4, through, geom.V(5, 5))), "bore", 0.3, StatusOK, math.NaN()},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			p := mustPlan(t, tc.part, Setup{Ratio: 10, Cutter: tc.cutter, MillHoles: true})
			pf := planned(t, p, tc.feature)
			if pf.Status != tc.status {
				t.Errorf("status got %v, want %v (warnings %v)", pf.Status, tc.status, p.Warnings)
			}
			if math.IsNaN(tc.amount) {
				if len(p.Warnings) != 0 {
					t.Errorf("got warnings %v, want none", p.Warnings)
				}
				return
			}
			if !hasWarning(p, tc.feature, tc.amount) {
				t.Errorf("got warnings %v, want one of %v mm about %q", p.Warnings, tc.amount, tc.feature)
			}
		})
	}
}

func TestNeckSplitsAnOpening(t *testing.T) {
	// Two 3 × 3 openings joined by a neck 0.3 mm wide: a 0.5 mm cutter cuts them apart and
	// leaves the neck (derived: cutter − neck = 0.2).
	c := geom.Polygon(geom.V(2, 2), geom.V(5, 2), geom.V(5, 3.35), geom.V(7, 3.35), geom.V(7, 2), geom.V(10, 2),
		geom.V(10, 5), geom.V(7, 5), geom.V(7, 3.65), geom.V(5, 3.65), geom.V(5, 5), geom.V(2, 5))
	f := Feature{Name: "twin", Kind: KindCutout, Region: geom.NewRegion(c), Depth: through}
	p := mustPlan(t, plate(f), Setup{Ratio: 10, Cutter: 0.5})
	pf := planned(t, p, "twin")
	if pf.Status != StatusDeviates || !hasWarning(p, "twin", 0.2) {
		t.Fatalf("got %v with warnings %v, want deviates by 0.2", pf.Status, p.Warnings)
	}
	if len(pf.TemplateRegions) != 1 {
		t.Fatalf("got %d template regions, want 1 (the template keeps the drawn opening)", len(pf.TemplateRegions))
	}
}

func TestLostNeedsAcceptance(t *testing.T) {
	part := plate(slotFeature("narrow", geom.V(3, 3), geom.V(8, 3), 0.4, through))
	for _, accept := range []bool{false, true} {
		p := mustPlan(t, part, Setup{Ratio: 10, Cutter: 0.5, AcceptLoss: accept})
		if got := p.Done(); got != accept {
			t.Errorf("accept %v: Done got %v, want %v", accept, got, accept)
		}
		if got := p.Lost(); len(got) != 1 || got[0] != "narrow" {
			t.Errorf("accept %v: Lost got %v, want [narrow]", accept, got)
		}
		// derived: with a matched stylus the template is the 200 × 100 plate; the lost slot
		// adds nothing to it.
		if !planned(t, p, "narrow").TemplateBounds.IsEmpty() || p.Bounds.Min != geom.V(0, 0) || p.Bounds.Max != geom.V(200, 100) {
			t.Errorf("accept %v: bounds got %v (slot %v), want (0, 0)–(200, 100) and none for the slot",
				accept, p.Bounds, planned(t, p, "narrow").TemplateBounds)
		}
		for _, name := range p.Order {
			if name == "narrow" {
				t.Errorf("accept %v: a lost feature is in the order of work %v", accept, p.Order)
			}
		}
	}
}
