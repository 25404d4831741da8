package pantograph

import (
	"strings"
	"testing"

	"panto/geom"
)

// TestFitPlate counts pieces by hand: the bed less a 5 mm margin all round takes a piece of
// 210 × 210 mm on a 220 × 220 bed (derived).
func TestFitPlate(t *testing.T) {
	bed := &Machine{Printer: Printer{Bed: Travel{X: 220, Y: 220}}}
	narrow := &Machine{Printer: Printer{Bed: Travel{X: 250, Y: 150}}}
	tests := []struct {
		name   string
		size   geom.Vec
		m      *Machine
		fits   bool
		turned bool
		tiles  int
	}{
		{"no bed stated", geom.V(900, 900), nil, true, false, 1},
		{"fits", geom.V(200, 150), bed, true, false, 1},
		{"margin too thin", geom.V(208, 216), bed, false, false, 2}, // 216 > 210
		{"four", geom.V(254, 216), bed, false, false, 4},
		{"fits turned", geom.V(140, 230), narrow, true, true, 1}, // 230 × 140 in 240 × 140
		{"long", geom.V(500, 100), bed, false, false, 3},         // ⌈500/210⌉ = 3
	}
	for _, tc := range tests {
		f := FitPlate(Plate{Size: tc.size, ScaleX: 1, ScaleY: 1}, tc.m)
		if f.FitsBed != tc.fits || f.Turned != tc.turned || f.Tiles != tc.tiles {
			t.Errorf("%s: got %+v, want fits %v turned %v in %d", tc.name, f, tc.fits, tc.turned, tc.tiles)
		}
	}
	// The printer's scale correction counts: 209 mm printed 0.5 % large is 210.045 mm.
	if f := FitPlate(Plate{Size: geom.V(209, 100), ScaleX: 1.005, ScaleY: 1}, bed); f.Tiles != 2 {
		t.Errorf("scaled plate: got %+v, want 2 pieces", f)
	}
}

// TestReportPlate: a plate too large for the bed gets a warning with its pieces and the
// largest ratio that prints whole.
func TestReportPlate(t *testing.T) {
	part := plate() // 20 × 10 mm
	m := &Machine{Printer: Printer{Bed: Travel{X: 200, Y: 200}}}
	s := Setup{Ratio: 10, Cutter: 0.5}
	p, err := PlanPart(part, s, m)
	if err != nil {
		t.Fatal(err)
	}
	r, err := ReportPlate(part, s, &p, m, PlateOptions{})
	if err != nil {
		t.Fatal(err)
	}
	if r.Fit.FitsBed || r.LargestOnePiece == 0 || r.LargestOnePiece >= 10 {
		t.Fatalf("got %+v, want a plate that does not fit at 10:1 and a smaller ratio that does", r)
	}
	last := p.Warnings[len(p.Warnings)-1].Message
	if !strings.Contains(last, "more than the printer bed") || !strings.Contains(last, "is the largest ratio that prints in one piece") {
		t.Errorf("warning: %q", last)
	}
}
