package pantograph

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"panto/geom"
)

// TestOversizeStylus plans profiles with a stylus larger than matched (R 10, cutter Ø0.5,
// so matched Ø5) and checks what the plan says the template cannot hold.
func TestOversizeStylus(t *testing.T) {
	rect := func(w, h float64) geom.Region {
		c, err := geom.Rect(geom.V(0, 0), geom.V(w, h), 0)
		if err != nil {
			t.Fatal(err)
		}
		return geom.NewRegion(c)
	}
	tab := geom.NewRegion(geom.Polygon(geom.V(0, 0), geom.V(20, 0), geom.V(20, 10), geom.V(10.1, 10),
		geom.V(10.1, 13), geom.V(9.9, 13), geom.V(9.9, 10), geom.V(0, 10)))
	tests := []struct {
		name     string
		profile  geom.Region
		stylus   float64
		deviates bool
		lost     float64 // mm² at the part; < 0 means only "more than this"
	}{
		{"matched", rect(20, 10), 5, false, 0},
		{"undersize", rect(20, 10), 4, false, 0},
		// Derived: template corners are sharp, 1.5 mm inside; the stylus path rounds them to
		// r_s = 4 about the inset corner instead of R·r_c = 2.5 about the drawn one, so each
		// corner differs by (4 − π)/4 · (4² − 2.5²) template mm²: four corners, ÷ R² at the part.
		{"oversize, sharp corners", rect(20, 10), 8, true, (4 - math.Pi) * (16 - 6.25) / 100},
		// The 0.2 mm tab is narrower than 2|δ|/R = 0.3 mm: it is not on the template at all,
		// so far more than the corners differ (its 0.6 mm² among them).
		{"oversize, thin tab", tab, 8, true, -0.6},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			part := Part{Name: "tab", Stock: Stock{Material: "brass", Thickness: 1},
				Profile: Feature{Name: "profile", Kind: KindProfile, Region: tc.profile, Depth: Depth{Through: true}}}
			p, err := PlanPart(part, Setup{Ratio: 10, Cutter: 0.5, Stylus: tc.stylus}, nil)
			if err != nil {
				t.Fatal(err)
			}
			f := p.Features[0]
			if got := f.Status == StatusDeviates; got != tc.deviates {
				t.Fatalf("deviates: got %v (%s), want %v; warnings %v", got, f.Status, tc.deviates, p.Warnings)
			}
			if !tc.deviates {
				return
			}
			var w Problem
			for _, x := range p.Warnings {
				if strings.Contains(x.Message, "larger than the matched") {
					w = x
				}
			}
			if w.Message == "" {
				t.Fatalf("no oversize warning in %v", p.Warnings)
			}
			// Derived: corners round to |δ|/R = (4 − 2.5)/10.
			if math.Abs(w.Amount-0.15) > 1e-9 {
				t.Errorf("amount: got %g, want 0.15", w.Amount)
			}
			lost := lostArea(t, w.Message)
			if tc.lost >= 0 && math.Abs(lost-tc.lost) > 1e-3 {
				t.Errorf("area differing: got %g, want %g", lost, tc.lost)
			}
			if tc.lost < 0 && lost < -tc.lost {
				t.Errorf("area differing: got %g, want more than %g", lost, -tc.lost)
			}
		})
	}
}

// lostArea reads the "(N mm² of the part differ)" figure out of a warning.
func lostArea(t *testing.T, msg string) float64 {
	t.Helper()
	i := strings.Index(msg, "(")
	j := strings.Index(msg, " mm² of the part differ")
	if i < 0 || j < i {
		t.Fatalf("no area in %q", msg)
	}
	var v float64
	if _, err := fmt.Sscan(msg[i+1:j], &v); err != nil {
		t.Fatalf("area in %q: %v", msg, err)
	}
	return v
}
