package pantograph

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"panto/geom"
)

// The template's "stylus cannot enter" check (template.go) against the cutter check
// (deviation.go); the derivation is in deviation.go's file comment.

// stylusEnters reports, independently of the planner, whether a stylus of tracing radius rs
// (template mm) fits anywhere in opening o (part frame) cut with a cutter of radius rc at ratio
// R. It works at part scale, which is the template divided by R: the template opening is o
// offset by −δ/R, and the stylus centre can stand wherever that shrunk by rs/R is not empty.
// A round stylus exactly as wide as what it enters counts as fitting, as the cutter does
// (the shrinking allows fitTol). A pointed stylus enters wherever the opening has any area.
func stylusEnters(o geom.Region, ratio, rc, rs float64) bool {
	delta := ratio*rc - rs
	opening := o.Offset(-delta / ratio).Regions
	if rs == 0 {
		return len(opening) > 0
	}
	return len(geom.OffsetRegions(opening, -(rs/ratio-fitTol))) > 0
}

// TestStylusEntersWhereTheCutterDoes checks, over openings narrower than, as wide as and wider
// than the cutter, and matched, undersize and oversize styli, that the stylus fits into the
// template opening exactly when the cutter fits into the opening, and that the plan loses the
// feature exactly then: the template check never fires on its own for a round stylus.
func TestStylusEntersWhereTheCutterDoes(t *testing.T) {
	const ratio, cutter = 10.0, 0.5
	openings := []Feature{
		slotFeature("narrow slot", geom.V(3, 3), geom.V(8, 3), 0.4, through),
		slotFeature("exact slot", geom.V(3, 3), geom.V(8, 3), cutter, through),
		slotFeature("wide slot", geom.V(3, 3), geom.V(8, 3), 0.6, through),
		rectFeature(KindCutout, "sharp square", geom.V(3, 3), geom.V(1, 1), 0, through),
		rectFeature(KindPocket, "small square", geom.V(3, 3), geom.V(0.45, 0.45), 0, Depth{MM: 0.2}),
		holes("milled hole", 0.8, through, geom.V(5, 5)),
	}
	// Styli in mm: matched (R·d_c = 5), undersize (δ > 0), oversize (δ < 0), and one far
	// smaller, where the opening shrinks by almost R·r_c (derived from δ = R·r_c − r_s).
	styli := []float64{5, 3, 8, 0.5}
	for _, f := range openings {
		for _, s := range styli {
			t.Run(f.Name+" stylus "+num(s), func(t *testing.T) {
				p := mustPlan(t, plate(f), Setup{Ratio: ratio, Cutter: cutter, Stylus: s, MillHoles: true, AcceptLoss: true})
				pf := planned(t, p, f.Name)
				rs := []geom.Region{f.Region}
				if f.Kind == KindHoles {
					rs = []geom.Region{geom.NewRegion(f.HoleContour(0))}
				}
				cutterLost, _ := openingFit(pf, rs, cutter, MM)
				enters := stylusEnters(rs[0], ratio, cutter/2, s/2)
				if enters == (cutterLost == StatusLost) {
					t.Errorf("stylus enters %v, cutter check %v: want them to agree", enters, cutterLost)
				}
				if got, want := pf.Status == StatusLost, cutterLost == StatusLost; got != want {
					t.Errorf("plan lost %v (warnings %v), want %v as the cutter check says", got, p.Warnings, want)
				}
				for _, w := range p.Warnings {
					if strings.Contains(w.Message, "cannot enter the template") {
						t.Errorf("got %q, want the template check silent", w)
					}
				}
			})
		}
	}
}

// TestPointedStylusOnAnOpeningAsWideAsTheCutter is the one case where the template check fires
// on its own. A pointed stylus traces with its point, so δ = R·r_c and the template opening is
// R times where the cutter's centre can go. For a slot exactly as wide as the cutter that is
// a line, with no area: the cutter check passes it (it cuts in one pass) and the template
// check loses it. A slot wider than the cutter by e gives a template opening of R·e wide and
// R·L long with round ends: area R²(L·e + π e²/4) (derived).
func TestPointedStylusOnAnOpeningAsWideAsTheCutter(t *testing.T) {
	const ratio, cutter, length = 10.0, 0.5, 5.0
	tests := []struct {
		name  string
		width float64
		lost  bool
		area  float64 // template area, mm²
	}{
		{"as wide as the cutter", cutter, true, 0},
		{"wider by 0.01", cutter + 0.01, false, ratio * ratio * (length*0.01 + math.Pi*0.01*0.01/4)},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			f := slotFeature("slot", geom.V(3, 3), geom.V(3+length, 3), tc.width, through)
			p := mustPlan(t, plate(f), Setup{Ratio: ratio, Cutter: cutter, Stylus: 3, Tip: TipPointed, AcceptLoss: true})
			pf := planned(t, p, "slot")
			if st, _ := openingFit(pf, []geom.Region{f.Region}, cutter, MM); st == StatusLost {
				t.Fatalf("cutter check got %v, want the slot made", st)
			}
			if got := pf.Status == StatusLost; got != tc.lost {
				t.Errorf("lost: got %v, want %v (warnings %v)", got, tc.lost, p.Warnings)
			}
			if tc.lost && !strings.Contains(fmt.Sprint(p.Warnings), "has no width") {
				t.Errorf("warnings %v: want the pointed stylus's reason", p.Warnings)
			}
			// relative 1e-6: the arcs of the offset are exact, the area sums a few products.
			if math.Abs(pf.TemplateArea-tc.area) > 1e-6*math.Max(tc.area, 1) {
				t.Errorf("template area: got %.9g, want %.9g", pf.TemplateArea, tc.area)
			}
		})
	}
}
