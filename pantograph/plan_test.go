package pantograph

import (
	"errors"
	"fmt"
	"slices"
	"strings"
	"testing"

	"panto/geom"
)

func TestOrderOfWork(t *testing.T) {
	part := plate(
		circleCutout("window", geom.V(15, 5), 3),
		holes("big", 1.2, through, geom.V(2, 2), geom.V(18, 8)),
		rectFeature(KindPocket, "seat", geom.V(4, 4), geom.V(3, 2), 0.5, Depth{MM: 0.3}),
		holes("small", 0.6, through, geom.V(8, 8), geom.V(2, 8), geom.V(8, 2)),
		slotFeature("through slot", geom.V(10, 2), geom.V(12, 2), 1, through),
		slotFeature("blind slot", geom.V(10, 8), geom.V(12, 8), 1, Depth{MM: 0.5}),
		Feature{Name: "mark", Kind: KindGroove, Path: []geom.Vec{geom.V(1, 5), geom.V(1, 6)}, Depth: Depth{MM: 0.05}},
	)
	p := mustPlan(t, part, Setup{Ratio: 10, Cutter: 0.5})
	// common practice, no source: datum, drills smallest first, blind work, through work,
	// the profile last.
	want := []string{"small", "big", "seat", "blind slot", "mark", "through slot", "window", "profile"}
	if !slices.Equal(p.Order, want) {
		t.Fatalf("order got %v, want %v", p.Order, want)
	}
	if p.Steps[0].What != StepDatum || p.Steps[len(p.Steps)-1].What != StepMill {
		t.Fatalf("steps got %v, want the datum first and a milling step last", p.Steps)
	}
	for i, name := range want {
		if n := planned(t, p, name).Number; n != i+1 {
			t.Errorf("%s: number got %d, want %d", name, n, i+1)
		}
	}
	// derived: the small seats lie at (80, 80), (20, 80) and (80, 20) on the template; from the
	// datum the shortest open route goes to (80, 20) or (20, 80) first (√(80² + 20²) =
	// 82.462), then 60 and 60 along the sides.
	small := planned(t, p, "small")
	if l := routeLength(geom.V(0, 0), small.Seats, []int{0, 1, 2}); !near(l, 82.46211251235321+120, 1e-9) {
		t.Errorf("small seats %v: route %v long, want 202.462", small.Seats, l)
	}
}

func TestPlanRefusesABadPart(t *testing.T) {
	part := plate(holes("outside", 1, through, geom.V(30, 5)))
	_, err := PlanPart(part, Setup{Ratio: 10, Cutter: 0.5}, nil)
	var pe PartErrors
	if !errors.As(err, &pe) || len(pe) == 0 {
		t.Fatalf("got %v, want PartErrors", err)
	}
	if _, err := PlanPart(plate(), Setup{Ratio: 0, Cutter: 0.5}, nil); err == nil {
		t.Fatal("got no error for ratio 0, want one")
	}
}

func TestPlanAgainstMachine(t *testing.T) {
	part := plate(holes("pins", 0.8, through, geom.V(5, 5)), holes("bores", 2, through, geom.V(12, 5)))
	base := Machine{Ratio: RatioRange{Min: 5, Max: 20}, CopyTable: Travel{X: 300, Y: 200},
		Styli:   []Stylus{{Diameter: 4, Tip: TipRound}, {Diameter: 6, Tip: TipRound}},
		Cutters: []Cutter{{Diameter: 0.5}}, Drills: []Drill{{Diameter: 0.8}},
		Printer: Printer{Bed: Travel{X: 220, Y: 220}}}
	tests := []struct {
		name  string
		edit  func(*Machine, *Setup)
		frag  string // in some warning's message; "" for no warnings
		stops bool
	}{
		{"fits", func(*Machine, *Setup) {}, "no drill of Ø2", false},
		{"ratio outside the range", func(_ *Machine, s *Setup) { s.Ratio = 25 }, "cannot be set to ratio 25", true},
		{"not a fixed setting", func(m *Machine, _ *Setup) { m.Ratio = RatioRange{Min: 5, Max: 20, Settings: []float64{5, 20}} }, "cannot be set to ratio 10", true},
		// derived: the 20 × 10 plate at 10:1 is 200 × 100 mm.
		{"copy table too small", func(m *Machine, _ *Setup) { m.CopyTable = Travel{X: 150, Y: 150} }, "copy table travels only 150 x 150", true},
		{"stylus not owned", func(_ *Machine, s *Setup) { s.Stylus = 5 }, "uses a Ø5 mm stylus", false},
		{"cutter not owned", func(_ *Machine, s *Setup) { s.Cutter = 0.3 }, "uses a Ø0.3 mm cutter", false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			m, s := base, Setup{Ratio: 10, Cutter: 0.5}
			m.Styli = slices.Clone(base.Styli)
			tc.edit(&m, &s)
			p, err := PlanPart(part, s, &m)
			if err != nil {
				t.Fatal(err)
			}
			found := false
			for _, w := range p.Warnings {
				if strings.Contains(w.Message, tc.frag) {
					found = true
				}
			}
			if !found {
				t.Errorf("got warnings %v, want one containing %q", p.Warnings, tc.frag)
			}
			if got := !p.Done(); got != tc.stops {
				t.Errorf("stopped got %v, want %v (warnings %v)", got, tc.stops, p.Warnings)
			}
		})
	}
}

func TestMachineChoices(t *testing.T) {
	part := plate(holes("pins", 0.8, through, geom.V(5, 5)), holes("bores", 2, through, geom.V(12, 5)))
	m := Machine{Styli: []Stylus{{Diameter: 4, Tip: TipRound}, {Diameter: 6, Tip: TipRound}},
		Drills: []Drill{{Diameter: 0.8}}}
	p, err := PlanPart(part, Setup{Ratio: 10, Cutter: 0.5}, &m)
	if err != nil {
		t.Fatal(err)
	}
	// derived: matched would be 5; 4 and 6 tie, and the larger is taken (stylus.go's rule);
	// δ = 2.5 − 3 = −0.5.
	bores := planned(t, p, "bores")
	if bores.Method != Traced || bores.Stylus != 6 || !near(bores.Compensation, -0.5, 1e-12) {
		t.Errorf("bores got %v stylus %v δ %v, want traced, 6, −0.5 (no Ø2 drill at hand)", bores.Method, bores.Stylus, bores.Compensation)
	}
	if pins := planned(t, p, "pins"); pins.Method != Drilled || pins.Drill != 0.8 {
		t.Errorf("pins got %v drill %v, want drilled with 0.8", pins.Method, pins.Drill)
	}
	// A 0.4 mm hole is smaller than the 0.5 mm cutter, so it stays drilled and the plan says
	// which drill is nearest (derived: 0.8 − 0.4 = 0.4).
	p, err = PlanPart(plate(holes("tiny", 0.4, through, geom.V(5, 5))), Setup{Ratio: 10, Cutter: 0.5}, &m)
	if err != nil {
		t.Fatal(err)
	}
	if tiny := planned(t, p, "tiny"); tiny.Method != Drilled || !hasWarning(p, "tiny", 0.4) {
		t.Errorf("tiny got %v with warnings %v, want drilled and a warning of 0.4 mm", tiny.Method, p.Warnings)
	}
}

func ExamplePlanPart() {
	outer, _ := geom.Rect(geom.V(0, 0), geom.V(20, 10), 1)
	part := Part{Name: "plate", Stock: Stock{Material: "brass", Thickness: 1},
		Profile: Feature{Kind: KindProfile, Region: geom.NewRegion(outer)},
		Features: []Feature{
			{Name: "pins", Kind: KindHoles, Diameter: 0.8, Depth: Depth{Through: true},
				Centers: []geom.Vec{geom.V(3, 5), geom.V(17, 5)}},
		}}
	p, err := PlanPart(part, Setup{Ratio: 10, Cutter: 0.5, Stylus: 4}, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, f := range p.Features {
		fmt.Printf("%d %s: %s, stylus Ø%g, δ %+.1f mm, template %.0f x %.0f mm\n", f.Number, f.Name, f.Method,
			f.Stylus, f.Compensation, f.TemplateBounds.Size().X, f.TemplateBounds.Size().Y)
	}
	fmt.Println("order:", p.Order)
	// Output:
	// 2 profile: traced, stylus Ø4, δ +0.5 mm, template 201 x 101 mm
	// 1 pins: drilled, stylus Ø4, δ +0.0 mm, template 144 x 4 mm
	// order: [pins profile]
}

func TestPartWarningsCarryOver(t *testing.T) {
	// A 1 mm hole centred 0.55 mm from the edge leaves a 0.05 mm wall (derived), thinner than
	// DefaultMinWall: Check warns, and the plan carries the warning under the feature's name.
	p := mustPlan(t, plate(holes("edge", 1, through, geom.V(0.55, 5))), Setup{Ratio: 10, Cutter: 0.5})
	for _, w := range p.Warnings {
		if w.Feature == "edge" && w.Label == `[[holes]] "edge"` {
			return
		}
	}
	t.Fatalf("got warnings %v, want the thin wall of \"edge\"", p.Warnings)
}
