package pantograph

import (
	"math"
	"math/rand/v2"
	"testing"

	"panto/geom"
)

// mustPlan plans p at s without a machine, failing the test on an error.
func mustPlan(t *testing.T, p Part, s Setup) Plan {
	t.Helper()
	pl, err := PlanPart(p, s, nil)
	if err != nil {
		t.Fatalf("PlanPart: %v", err)
	}
	return pl
}

// planned returns the planned feature named name.
func planned(t *testing.T, p Plan, name string) PlannedFeature {
	t.Helper()
	for _, f := range p.Features {
		if f.Name == name {
			return f
		}
	}
	t.Fatalf("no feature %q in the plan", name)
	return PlannedFeature{}
}

func TestMatchedStylusScalesThePart(t *testing.T) {
	part := plate(
		holes("pins", 0.8, through, geom.V(3, 2), geom.V(15, 8)),
		circleCutout("window", geom.V(10, 5), 3),
		rectFeature(KindPocket, "seat", geom.V(4, 4), geom.V(3, 2), 0.5, Depth{MM: 0.3}),
		slotFeature("adjuster", geom.V(12, 2), geom.V(16, 2), 1, through),
	)
	part.Datum = geom.V(2, 1)
	const r = 10
	p := mustPlan(t, part, Setup{Ratio: r, Cutter: 0.5})
	for _, f := range part.All() {
		pf := planned(t, p, featureName(f))
		if pf.Compensation != 0 {
			t.Errorf("%s: compensation got %v, want 0 (derived: matched stylus)", pf.Name, pf.Compensation)
		}
		if f.Kind == KindHoles {
			for i, c := range f.Centers {
				// derived: seats at R × (centre − datum); the route may reorder them.
				want := c.Sub(part.Datum).Mul(r)
				if !containsVec(pf.Seats, want) {
					t.Errorf("%s: seat %d: got %v, want %v among them", pf.Name, i, pf.Seats, want)
				}
			}
			continue
		}
		// derived: areas scale by R².
		if want := f.Region.Area() * r * r; !near(pf.TemplateArea, want, 1e-6*want) {
			t.Errorf("%s: template area got %v, want %v", pf.Name, pf.TemplateArea, want)
		}
		b := f.Region.Bounds()
		want := geom.Box{Min: b.Min.Sub(part.Datum).Mul(r), Max: b.Max.Sub(part.Datum).Mul(r)}
		if pf.TemplateBounds.Min.Dist(want.Min) > 1e-9 || pf.TemplateBounds.Max.Dist(want.Max) > 1e-9 {
			t.Errorf("%s: template bounds got %v, want %v", pf.Name, pf.TemplateBounds, want)
		}
	}
}

func containsVec(vs []geom.Vec, w geom.Vec) bool {
	for _, v := range vs {
		if v.Dist(w) < 1e-9 {
			return true
		}
	}
	return false
}

func TestMismatchedStylus(t *testing.T) {
	// R = 10, cutter 0.5, stylus 4.0: δ = 10·0.25 − 2.0 = 0.5 (derived; REFERENCES.md).
	setup := Setup{Ratio: 10, Cutter: 0.5, Stylus: 4, MillHoles: true}
	boss := Part{Name: "boss", Stock: Stock{Material: "brass", Thickness: 1},
		Profile: Feature{Kind: KindProfile, Region: geom.NewRegion(geom.Circle(geom.V(0, 0), 1))}}
	hole := plate(holes("bore", 2, through, geom.V(10, 5)))
	rect := plate()
	tests := []struct {
		name      string
		part      Part
		feature   string
		wantWidth float64 // template bounds width
		wantArea  float64
	}{
		// derived: a 2.0 mm milled hole needs a 19.0 mm template hole.
		{"milled hole", hole, "bore", 19, math.Pi * 9.5 * 9.5},
		// derived: a 2.0 mm boss needs a 21.0 mm template boss.
		{"boss", boss, "profile", 21, math.Pi * 10.5 * 10.5},
		// derived: rectangle grown by δ with round joins, (w+2δ)(h+2δ) − (4 − π)δ².
		{"rectangle profile", rect, "profile", 201, 201*101 - (4-math.Pi)*0.25},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			pf := planned(t, mustPlan(t, tc.part, setup), tc.feature)
			if !near(pf.Compensation, 0.5, 1e-12) {
				t.Errorf("compensation got %v, want 0.5", pf.Compensation)
			}
			if w := pf.TemplateBounds.Size().X; !near(w, tc.wantWidth, 1e-9) {
				t.Errorf("template width got %v, want %v", w, tc.wantWidth)
			}
			if !near(pf.TemplateArea, tc.wantArea, 1e-9*tc.wantArea) {
				t.Errorf("template area got %v, want %v", pf.TemplateArea, tc.wantArea)
			}
		})
	}
}

func TestLargeStylusGrowsOpenings(t *testing.T) {
	// Stylus 6 at R = 10, cutter 0.5: δ = 2.5 − 3 = −0.5, so a 3 × 2 mm opening (30 × 20 on
	// the template) grows by 0.5 with round corners: 31 × 21 − (4 − π)·0.25 (derived).
	part := plate(rectFeature(KindCutout, "window", geom.V(5, 3), geom.V(3, 2), 0, through))
	pf := planned(t, mustPlan(t, part, Setup{Ratio: 10, Cutter: 0.5, Stylus: 6}), "window")
	want := 31*21 - (4-math.Pi)*0.25
	if !near(pf.TemplateArea, want, 1e-9*want) {
		t.Fatalf("template area got %v, want %v", pf.TemplateArea, want)
	}
}

func TestMirrorAndTurn(t *testing.T) {
	// An L-shaped profile (area 4 × 1 + 1 × 1 = 5 mm², derived) and a hole at (3, 1), datum
	// (1, 0). Seats derived by hand in TestSetupTransform; the template's outer contour runs
	// counter-clockwise (positive signed area) whatever the transform, and its area is R² × 5.
	l := geom.Polygon(geom.V(0, 0), geom.V(4, 0), geom.V(4, 1), geom.V(1, 1), geom.V(1, 2), geom.V(0, 2))
	part := Part{Name: "ell", Datum: geom.V(1, 0), Stock: Stock{Material: "brass", Thickness: 1},
		Profile:  Feature{Kind: KindProfile, Region: geom.NewRegion(l)},
		Features: []Feature{holes("pin", 0.5, through, geom.V(3, 0.5))}}
	tests := []struct {
		name   string
		mirror bool
		turn   float64
		seat   geom.Vec
		corner geom.Vec // where the part's corner (0, 2) lands
	}{
		// derived: (3, 0.5) − datum = (2, 0.5); mirror x → −x; turn 180° negates both; × 10.
		{"plain", false, 0, geom.V(20, 5), geom.V(-10, 20)},
		{"mirror", true, 0, geom.V(-20, 5), geom.V(10, 20)},
		{"turn 180", false, 180, geom.V(-20, -5), geom.V(10, -20)},
		{"mirror and turn 180", true, 180, geom.V(20, -5), geom.V(-10, -20)},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			p := mustPlan(t, part, Setup{Ratio: 10, Cutter: 0.2, Mirror: tc.mirror, Rotate: geom.Degrees(tc.turn)})
			if got := planned(t, p, "pin").Seats; len(got) != 1 || got[0].Dist(tc.seat) > 1e-9 {
				t.Errorf("seats got %v, want [%v]", got, tc.seat)
			}
			prof := planned(t, p, "profile")
			outer := prof.TemplateRegions[0].Outer
			if a := outer.Area(); !near(a, 500, 1e-9) {
				t.Errorf("signed area of the template outline got %v, want +500", a)
			}
			if !prof.TemplateRegions[0].Contains(tc.corner) || !onSomeVertex(outer, tc.corner) {
				t.Errorf("corner (0, 2) of the part should land at %v on the template", tc.corner)
			}
		})
	}
}

func onSomeVertex(c geom.Contour, p geom.Vec) bool {
	for _, s := range c {
		if s.A.Dist(p) < 1e-9 {
			return true
		}
	}
	return false
}

func TestGroove(t *testing.T) {
	g := Feature{Name: "mark", Kind: KindGroove, Path: []geom.Vec{geom.V(2, 2), geom.V(2, 5)}, Depth: Depth{MM: 0.05}}
	wide := g
	wide.Name, wide.Width = "wide mark", 0.3
	p := mustPlan(t, plate(g, wide), Setup{Ratio: 10, Cutter: 0.2, Cutters: map[Kind]float64{KindGroove: 0.1}})
	pf := planned(t, p, "mark")
	// derived: centreline at R × (point − datum); channel as wide as the matched stylus, 10 × 0.1.
	if len(pf.Path) != 2 || pf.Path[1].Dist(geom.V(20, 50)) > 1e-12 || !near(pf.Width, 1, 1e-12) {
		t.Errorf("got path %v width %v, want [(20, 20) (20, 50)] width 1", pf.Path, pf.Width)
	}
	if pf.Status != StatusOK {
		t.Errorf("status got %v, want ok", pf.Status)
	}
	// derived: drawn 0.3 wide, cut 0.1 wide by the engraver: 0.2 mm off.
	wf := planned(t, p, "wide mark")
	if wf.Status != StatusDeviates || !hasWarning(p, "wide mark", 0.2) {
		t.Errorf("got status %v and warnings %v, want deviates by 0.2", wf.Status, p.Warnings)
	}
}

// hasWarning reports whether p warns about feature with the given amount.
func hasWarning(p Plan, feature string, amount float64) bool {
	for _, w := range p.Warnings {
		if w.Feature == feature && w.HasAmount && near(w.Amount, amount, 1e-6) {
			return true
		}
	}
	return false
}

func TestCompensatedOpeningsProperty(t *testing.T) {
	for seed := uint64(0); seed < 200; seed++ {
		rng := rand.New(rand.NewPCG(seed, 1))
		r := 2 + 18*rng.Float64()
		cutter := 0.1 + 0.5*rng.Float64()
		stylus := r * cutter * (0.6 + 0.8*rng.Float64())
		w, h := 2+6*rng.Float64(), 2+4*rng.Float64()
		rho := cutter/2 + rng.Float64()*math.Min(w, h)/4 // corners the cutter makes as drawn
		f := rectFeature(KindPocket, "recess", geom.V(1, 1), geom.V(w, h), rho, Depth{MM: 0.2})
		part := plate(f)
		part.Profile = rectFeature(KindProfile, "", geom.V(0, 0), geom.V(w+2, h+2), 0, Depth{})
		p, err := PlanPart(part, Setup{Ratio: r, Cutter: cutter, Stylus: stylus}, nil)
		if err != nil {
			t.Fatalf("seed %d: %v", seed, err)
		}
		pf := planned(t, p, "recess")
		d := r*cutter/2 - stylus/2
		// derived: a rounded rectangle moved in by δ keeps its centres: sides shrink by 2δ,
		// corner radii by δ.
		rr := r*rho - d
		want := (r*w-2*d)*(r*h-2*d) - (4-math.Pi)*rr*rr
		if pf.Status != StatusOK || !near(pf.TemplateArea, want, 1e-9*want) {
			t.Fatalf("seed %d: status %v, template area got %v, want %v", seed, pf.Status, pf.TemplateArea, want)
		}
	}
}

func BenchmarkPlanHolePlate(b *testing.B) {
	var at []geom.Vec
	for i := 0; i < 15; i++ {
		for j := 0; j < 6; j++ {
			at = append(at, geom.V(1+float64(i)*1.25, 1.5+float64(j)*1.4))
		}
	}
	part := plate(holes("grid", 0.5, through, at...), holes("milled", 0.7, through, geom.V(19.3, 9.3)))
	s := Setup{Ratio: 10, Cutter: 0.3, Stylus: 2.5, MillHoles: true}
	for b.Loop() {
		if _, err := PlanPart(part, s, nil); err != nil {
			b.Fatal(err)
		}
	}
}
