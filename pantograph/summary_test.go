package pantograph

import (
	"math"
	"testing"

	"panto/geom"
)

func TestSummarizeArea(t *testing.T) {
	tests := []struct {
		name string
		part Part
		want float64
	}{
		{"plain plate", plate(), 200}, // derived: 20 × 10
		// derived: 200 − π·1² (through hole) − 4·2 (cut-out); the pocket and blind hole leave it
		{"through openings only", plate(
			holes("through", 2, through, geom.V(15, 5)),
			holes("blind", 2, Depth{MM: 0.5}, geom.V(15, 2)),
			rectFeature(KindCutout, "window", geom.V(2, 2), geom.V(4, 2), 0, through),
			rectFeature(KindPocket, "seat", geom.V(2, 6), geom.V(4, 2), 0, Depth{MM: 0.2})),
			200 - math.Pi - 8},
		// derived: a through slot is a stadium 2r·L + π r², r = 0.5, L = 4; a blind one leaves it
		{"slots", plate(slotFeature("s", geom.V(2, 5), geom.V(6, 5), 1, through),
			slotFeature("b", geom.V(2, 8), geom.V(6, 8), 1, Depth{MM: 0.2})),
			200 - 4 - math.Pi/4},
		// derived: 200 − π·0.5²; the hole of negative size is left out, not subtracted
		{"bad features left out", plate(holes("good", 1, through, geom.V(5, 5)), holes("bad", -1, through, geom.V(8, 5)),
			Feature{Name: "empty", Kind: KindCutout, Depth: through}),
			200 - math.Pi/4},
		// derived: two unit-diameter holes overlapping by half a radius; the lens they share is
		// 2r²·acos(d/2r) − (d/2)·√(4r² − d²) with r = 0.5, d = 0.75
		{"overlapping holes counted once", plate(holes("a", 1, through, geom.V(5, 5), geom.V(5.75, 5))),
			200 - (2*math.Pi*0.25 - (2*0.25*math.Acos(0.75) - 0.375*math.Sqrt(1-0.5625)))},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			s := Summarize(tc.part, DefaultOptions())
			if math.Abs(s.Area-tc.want) > 1e-6 {
				t.Errorf("got %v, want %v", s.Area, tc.want)
			}
		})
	}
}

func TestSummarizeCutterLimits(t *testing.T) {
	// An L-shaped profile: one sharp inside corner at (10, 5).
	ell := plate()
	ell.Profile.Region = geom.NewRegion(geom.Polygon(geom.V(0, 0), geom.V(20, 0), geom.V(20, 5),
		geom.V(10, 5), geom.V(10, 10), geom.V(0, 10)))
	// A profile with a 2 mm notch cut into its top edge, its inside corners rounded to 0.5.
	notchPts := []geom.Vec{geom.V(0, 0), geom.V(20, 0), geom.V(20, 10), geom.V(11, 10), geom.V(11, 4),
		geom.V(9, 4), geom.V(9, 10), geom.V(0, 10)}
	notch, err := geom.RoundedPolygon(notchPts, []float64{0, 0, 0, 0, 0.5, 0.5, 0, 0})
	if err != nil {
		t.Fatal(err)
	}
	notched := plate()
	notched.Profile.Region = geom.NewRegion(notch)

	tests := []struct {
		name                string
		part                Part
		radius, gap         float64 // NaN: none found
		radiusFrom, gapFrom string
	}{
		{"plain plate", plate(), math.NaN(), math.NaN(), "", ""},
		// derived: the pocket's corners are R0.3, the slot's ends R0.4; the slot is 0.8 wide,
		// the pocket 2 and the window 3
		{"milled features", plate(
			rectFeature(KindPocket, "seat", geom.V(2, 2), geom.V(3, 2), 0.3, Depth{MM: 0.2}),
			slotFeature("adjuster", geom.V(8, 5), geom.V(11, 5), 0.8, through),
			circleCutout("window", geom.V(15, 5), 3),
			holes("ports", 0.4, through, geom.V(18, 1))),
			0.3, 0.8, `[[pocket]] "seat"`, `[[slot]] "adjuster"`},
		{"sharp inside corner", ell, 0, math.NaN(), "[profile]", ""},
		// derived: the notch is 2 wide with R0.5 corners at its bottom
		{"notch", notched, 0.5, 2, "[profile]", "[profile]"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			s := Summarize(tc.part, DefaultOptions())
			checkMeasure(t, "inside radius", s.MinInsideRadius, tc.radius, tc.radiusFrom)
			checkMeasure(t, "narrowest gap", s.NarrowestGap, tc.gap, tc.gapFrom)
		})
	}
}

func checkMeasure(t *testing.T, what string, m Measure, want float64, from string) {
	t.Helper()
	if math.IsNaN(want) {
		if m.Found {
			t.Errorf("%s: got %v from %s, want none", what, m.MM, m.Feature)
		}
		return
	}
	if !m.Found || math.Abs(m.MM-want) > 1e-9 || m.Feature != from {
		t.Errorf("%s: got %v from %s (found %v), want %v from %s", what, m.MM, m.Feature, m.Found, want, from)
	}
}

func TestLargestCutter(t *testing.T) {
	tests := []struct {
		name      string
		s         Summary
		want      float64
		wantSharp bool
	}{
		{"nothing limits", Summary{}, math.Inf(1), false},
		// the gap limits: 0.8 < 2 × 0.5
		{"gap", Summary{MinInsideRadius: Measure{MM: 0.5, Found: true}, NarrowestGap: Measure{MM: 0.8, Found: true}}, 0.8, false},
		// the corner limits: 2 × 0.3 < 0.8
		{"corner", Summary{MinInsideRadius: Measure{MM: 0.3, Found: true}, NarrowestGap: Measure{MM: 0.8, Found: true}}, 0.6, false},
		{"sharp corner", Summary{MinInsideRadius: Measure{MM: 0, Found: true}, NarrowestGap: Measure{MM: 0.8, Found: true}}, 0.8, true},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			d, sharp := tc.s.LargestCutter()
			if d != tc.want || sharp != tc.wantSharp {
				t.Errorf("got %v, %v, want %v, %v", d, sharp, tc.want, tc.wantSharp)
			}
		})
	}
}

func TestCornerLeft(t *testing.T) {
	tests := []struct {
		name string
		m    Measure
		d    float64
		want float64
	}{
		// derived: r(√2 − 1) at a sharp 90° corner, r = 0.25
		{"sharp square", Measure{Angle: math.Pi / 2, Found: true}, 0.5, 0.25 * (math.Sqrt2 - 1)},
		// derived: 60°: r(1/sin 30° − 1) = r
		{"sharp 60°", Measure{Angle: math.Pi / 3, Found: true}, 1, 0.5},
		// derived: a corner rounded R0.1 under an R0.25 cutter: (0.25 − 0.1)(√2 − 1)
		{"rounded smaller", Measure{MM: 0.1, Angle: math.Pi / 2, Found: true}, 0.5, 0.15 * (math.Sqrt2 - 1)},
		{"rounded enough", Measure{MM: 0.3, Angle: math.Pi / 2, Found: true}, 0.5, 0},
		{"no corner", Measure{}, 0.5, 0},
	}
	for _, tc := range tests {
		if got := tc.m.CornerLeft(tc.d); math.Abs(got-tc.want) > 1e-12 {
			t.Errorf("%s: got %v, want %v", tc.name, got, tc.want)
		}
	}
}
