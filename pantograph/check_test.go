package pantograph

import (
	"math"
	"strings"
	"testing"

	"panto/geom"
)

// plate is a 20 × 10 mm rectangular part 1 mm thick, with the given features.
func plate(fs ...Feature) Part {
	outer, err := geom.Rect(geom.V(0, 0), geom.V(20, 10), 0)
	if err != nil {
		panic(err)
	}
	return Part{Name: "plate", Units: MM, Stock: Stock{Material: "brass", Thickness: 1},
		Profile:  Feature{Kind: KindProfile, Region: geom.NewRegion(outer), Depth: Depth{Through: true}},
		Features: fs}
}

func holes(name string, d float64, depth Depth, at ...geom.Vec) Feature {
	return Feature{Name: name, Kind: KindHoles, Diameter: d, Centers: at, Depth: depth}
}

func circleCutout(name string, c geom.Vec, d float64) Feature {
	return Feature{Name: name, Kind: KindCutout, Region: geom.NewRegion(geom.Circle(c, d/2)), Depth: Depth{Through: true}}
}

func slotFeature(name string, a, b geom.Vec, w float64, depth Depth) Feature {
	return Feature{Name: name, Kind: KindSlot, From: a, To: b, Width: w,
		Region: geom.NewRegion(geom.Capsule(a, b, w/2)), Depth: depth}
}

func rectFeature(kind Kind, name string, min, size geom.Vec, corner float64, depth Depth) Feature {
	c, err := geom.Rect(min, size, corner)
	if err != nil {
		panic(err)
	}
	return Feature{Name: name, Kind: kind, Region: geom.NewRegion(c), Depth: depth}
}

var through = Depth{Through: true}

func TestCheck(t *testing.T) {
	tests := []struct {
		name     string
		part     Part
		severity Severity // of the one problem expected; "" for none
		frag     string
		amount   float64 // mm; NaN when the problem has none
	}{
		{"clean plate", plate(holes("a", 1, through, geom.V(5, 5))), "", "", 0},
		// derived: centres 0.6 apart, radii 0.5 + 0.3 = 0.8, overlap 0.2
		{"holes overlap", plate(holes("a", 1, through, geom.V(5, 5)), holes("b", 0.6, through, geom.V(5.6, 5))),
			Error, `hole at (5.6, 5) overlaps hole at (5, 5) of [[holes]] "a" by 0.2 mm`, 0.2},
		// derived: radii 0.5 + 0.5 = centre distance 1
		{"holes touch", plate(holes("a", 1, through, geom.V(5, 5), geom.V(6, 5))),
			Error, "hole at (6, 5) touches hole at (5, 5)", 0},
		// derived: edge at x = 20, hole reaches 25 − 0.5 = 24.5
		{"hole outside", plate(holes("a", 1, through, geom.V(25, 5))),
			Error, "hole at (25, 5) lies outside the profile, 4.5 mm from its edge", 4.5},
		// derived: 19.5 + 1 − 20
		{"hole breaks the edge", plate(holes("a", 2, through, geom.V(19.5, 5))),
			Error, "hole at (19.5, 5) breaks through the profile edge: it reaches 0.5 mm beyond it", 0.5},
		// derived: 20 − 19.45 − 0.5
		{"thin wall to the edge", plate(holes("a", 1, through, geom.V(19.45, 5))),
			Warning, "leaves a wall of only 0.05 mm to the profile edge", 0.05},
		// derived: 6.05 − 5 − 0.5 − 0.5
		{"thin wall between holes", plate(holes("a", 1, through, geom.V(5, 5), geom.V(6.05, 5))),
			Warning, "hole at (6.05, 5) leaves a wall of only 0.05 mm to hole at (5, 5)", 0.05},
		// derived: the slot's tip (6.4, 4) is 0.6 from the window's centre, 1.5 − 0.6 = 0.9 inside it
		{"slot breaks into a cut-out", plate(slotFeature("adjuster", geom.V(3, 4), geom.V(6, 4), 0.8, through),
			circleCutout("window", geom.V(7, 4), 3)),
			Error, `overlaps [[slot]] "adjuster" by 0.9 mm`, 0.9},
		// derived: slot edge at y = 8 + 1.5, profile edge at 10
		{"slot wall to edge", plate(slotFeature("s", geom.V(3, 8), geom.V(6, 8), 3, through)),
			"", "", 0},
		{"slot breaks the edge", plate(slotFeature("s", geom.V(3, 9), geom.V(6, 9), 3, through)),
			Error, "the slot breaks through the profile edge: it reaches 0.5 mm beyond it", 0.5}, // derived: 9 + 1.5 − 10
		{"pocket deeper than stock", plate(rectFeature(KindPocket, "seat", geom.V(2, 2), geom.V(3, 2), 0, Depth{MM: 1.5})),
			Error, "depth 1.5 mm is deeper than the stock (1 mm) by 0.5 mm", 0.5}, // derived: 1.5 − 1
		{"pocket as deep as stock", plate(rectFeature(KindPocket, "seat", geom.V(2, 2), geom.V(3, 2), 0, Depth{MM: 1})),
			Warning, "the whole stock thickness", math.NaN()},
		{"through pocket", plate(rectFeature(KindPocket, "seat", geom.V(2, 2), geom.V(3, 2), 0, through)),
			Error, "make it a [[cutout]]", math.NaN()},
		{"depth missing", plate(holes("a", 1, Depth{}, geom.V(5, 5))), Error, "depth missing", math.NaN()},
		{"negative depth", plate(holes("a", 1, Depth{MM: -1}, geom.V(5, 5))), Error, "depth must be greater than 0, got -1", math.NaN()},
		{"zero diameter", plate(holes("a", 0, through, geom.V(5, 5))), Error, "diameter must be greater than 0, got 0", math.NaN()},
		{"no hole positions", plate(holes("a", 1, through)), Error, "no hole positions", math.NaN()},
		{"zero slot width", plate(Feature{Name: "s", Kind: KindSlot, From: geom.V(1, 1), To: geom.V(2, 1), Depth: through}),
			Error, "width must be greater than 0, got 0", math.NaN()},
		{"hole in a pocket floor", plate(rectFeature(KindPocket, "seat", geom.V(2, 2), geom.V(4, 4), 0, Depth{MM: 0.3}),
			holes("pivot", 0.5, through, geom.V(4, 4))), "", "", 0},
		{"hole in a cut-out", plate(circleCutout("window", geom.V(10, 5), 4), holes("pivot", 0.5, through, geom.V(10, 5))),
			Warning, `hole at (10, 5) lies inside [[cutout]] "window"`, math.NaN()},
		{"blind hole crossing a pocket edge", plate(rectFeature(KindPocket, "seat", geom.V(2, 2), geom.V(4, 4), 0, Depth{MM: 0.3}),
			holes("h", 1, Depth{MM: 0.5}, geom.V(6, 4))),
			Warning, `hole at (6, 4) overlaps [[pocket]] "seat" by 0.5 mm`, 0.5}, // derived: half the hole lies in the pocket
		{"two features named alike", plate(holes("a", 1, through, geom.V(5, 5)), holes("a", 1, through, geom.V(10, 5))),
			Warning, "another [[holes]] has the same name", math.NaN()},
		{"groove off the part", plate(Feature{Name: "mark", Kind: KindGroove, Path: []geom.Vec{geom.V(19, 5), geom.V(21, 5)}, Depth: Depth{MM: 0.05}}),
			Error, "the groove near (19, 5) breaks through the profile edge", math.NaN()},
		{"groove across a window", plate(circleCutout("window", geom.V(10, 5), 2),
			Feature{Name: "mark", Kind: KindGroove, Path: []geom.Vec{geom.V(5, 5), geom.V(15, 5)}, Depth: Depth{MM: 0.05}}),
			Warning, `crosses [[cutout]] "window"`, math.NaN()},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			ps := Check(tc.part, DefaultOptions())
			if tc.severity == "" {
				if len(ps) != 0 {
					t.Fatalf("got %v, want no problems", ps)
				}
				return
			}
			if len(ps) != 1 {
				t.Fatalf("got %d problems %v, want 1", len(ps), ps)
			}
			p := ps[0]
			if p.Severity != tc.severity || !strings.Contains(p.Message, tc.frag) {
				t.Errorf("got %s %q, want %s ...%s...", p.Severity, p.Message, tc.severity, tc.frag)
			}
			if math.IsNaN(tc.amount) {
				return
			}
			if !p.HasAmount || math.Abs(p.Amount-tc.amount) > 1e-6 {
				t.Errorf("amount: got %v (has %v), want %v", p.Amount, p.HasAmount, tc.amount)
			}
		})
	}
}

func TestCheckStockAndOutline(t *testing.T) {
	noStock := plate()
	noStock.Stock.Thickness = 0
	crossing := plate()
	crossing.Profile.Region = geom.Region{Outer: geom.Polygon(geom.V(0, 0), geom.V(10, 10), geom.V(10, 0), geom.V(0, 10))}
	tests := []struct {
		name string
		part Part
		frag string
	}{
		{"stock missing", noStock, "stock thickness missing"},
		{"self-crossing profile", crossing, "outline crosses itself"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			ps := Check(tc.part, DefaultOptions())
			if !HasErrors(ps) || !strings.Contains(ps[0].Message, tc.frag) {
				t.Errorf("got %v, want an error ...%s...", ps, tc.frag)
			}
		})
	}
}

func TestCheckMinWallOption(t *testing.T) {
	p := plate(holes("a", 1, through, geom.V(5, 5), geom.V(6.3, 5))) // derived: wall 0.3
	if ps := Check(p, Options{MinWall: 0.2}); len(ps) != 0 {
		t.Errorf("MinWall 0.2: got %v, want none", ps)
	}
	if ps := Check(p, Options{MinWall: 0.4}); len(ps) != 1 || ps[0].Severity != Warning {
		t.Errorf("MinWall 0.4: got %v, want one warning", ps)
	}
}

func TestProblemError(t *testing.T) {
	p := Problem{Severity: Error, Feature: "pivots", Label: `[[holes]] "pivots"`, Message: "no hole positions given",
		Where: Where{File: "bridge.toml", Line: 14}}
	want := `bridge.toml:14: error: [[holes]] "pivots": no hole positions given`
	if got := p.Diagnostic(); got != want {
		t.Errorf("got %q, want %q", got, want)
	}
}
