package pantograph_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

// squarePlan returns a plan for a 10 × 6 mm part at 10:1: a 100 × 60 mm template profile with
// its lower left corner 20 mm left of and 15 mm below the datum, and one 0.6 mm hole whose seat
// is at (30, 30) on the template. The datum lies inside the profile, clear of every edge.
func squarePlan(stylus float64, tip pantograph.Tip) pantograph.Plan {
	c, _ := geom.Rect(geom.V(-20, -15), geom.V(100, 60), 0)
	prof := geom.NewRegion(c)
	p := pantograph.Plan{Part: "test block", Setup: pantograph.Setup{Ratio: 10, Cutter: 0.5, Tip: tip}}
	p.Features = []pantograph.PlannedFeature{
		{Name: "profile", Label: "[profile]", Kind: pantograph.KindProfile, Number: 2, Stylus: stylus, Tip: tip,
			TemplateRegions: []geom.Region{prof}, TemplateBounds: prof.Bounds()},
		{Name: "pin", Label: `[[holes]] "pin"`, Kind: pantograph.KindHoles, Number: 1, Stylus: stylus, Tip: tip,
			Drill: 0.6, Seats: []geom.Vec{geom.V(30, 30)}, TemplateBounds: geom.Box{Min: geom.V(30, 30), Max: geom.V(30, 30)}.Expand(stylus / 2)},
	}
	p.Bounds = prof.Bounds()
	return p
}

// TestPlateRefusesPointedWall: a pointed stylus that traces edges cannot bear on a raised wall.
func TestPlateRefusesPointedWall(t *testing.T) {
	p := squarePlan(5, pantograph.TipPointed)
	p.Features[0].Method = pantograph.Traced
	_, err := pantograph.BuildPlate(p, nil, pantograph.PlateOptions{Style: pantograph.StyleWall})
	if !errors.Is(err, pantograph.ErrPointedWall) || !strings.Contains(err.Error(), "--style groove") {
		t.Errorf("got %v, want the wall refused for a pointed stylus with --style groove suggested", err)
	}
	if _, err := pantograph.BuildPlate(p, nil, pantograph.PlateOptions{}); err != nil {
		t.Errorf("the default style for a pointed stylus: %v", err)
	}
}

func TestPlateRules(t *testing.T) {
	printer := &pantograph.Machine{Printer: pantograph.Printer{ScaleX: 1.004, ScaleY: 0.997, HoleGrowth: 0.3}}
	tests := []struct {
		name      string
		stylus    float64
		tip       pantograph.Tip
		o         pantograph.PlateOptions
		m         *pantograph.Machine
		wall      float64 // the rule: one stylus diameter, at least 3 mm
		seat      pantograph.SeatKind
		seatDia   float64
		seatDepth float64
		height    float64
	}{
		// bore: stylus + 0.1 mm clearance; depth the wall height (derived from the rules).
		{"round stylus, bore", 5, pantograph.TipRound, pantograph.PlateOptions{}, nil, 5, pantograph.SeatBore, 5.1, 5, 10},
		{"small stylus, 3 mm walls", 2, pantograph.TipRound, pantograph.PlateOptions{}, nil, 3, pantograph.SeatBore, 2.1, 3, 8},
		// hole growth adds to the bore (machine file's correction).
		{"bore with hole growth", 5, pantograph.TipRound, pantograph.PlateOptions{}, printer, 5, pantograph.SeatBore, 5.4, 5, 10},
		// cone: rim R × drill = 6 mm (within 2..8), 90° so depth = rim / 2; a pointed stylus gets
		// the groove style, 5 + 5 mm and the 1 mm marks.
		{"pointed stylus, cone", 5, pantograph.TipPointed, pantograph.PlateOptions{}, nil, 5, pantograph.SeatCone, 6, 3, 11},
		{"cone chosen for a round stylus", 4, pantograph.TipRound, pantograph.PlateOptions{Seat: pantograph.SeatCone}, nil, 4, pantograph.SeatCone, 6, 3, 9},
		// groove style: base 5 + wall height, nothing stands above it but the marks (1 mm).
		{"groove style", 5, pantograph.TipRound, pantograph.PlateOptions{Style: pantograph.StyleGroove}, nil, 5, pantograph.SeatBore, 5.1, 5, 11},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			pl, err := pantograph.BuildPlate(squarePlan(tc.stylus, tc.tip), tc.m, tc.o)
			if err != nil {
				t.Fatal(err)
			}
			if pl.WallHeight != tc.wall {
				t.Errorf("wall height: got %g, want %g", pl.WallHeight, tc.wall)
			}
			if pl.Height != tc.height {
				t.Errorf("plate height: got %g, want %g", pl.Height, tc.height)
			}
			var pin, datum *pantograph.PlateSeat
			for i, s := range pl.Seats {
				if s.Feature == 1 {
					pin = &pl.Seats[i]
				}
				if s.Datum {
					datum = &pl.Seats[i]
				}
			}
			if pin == nil || datum == nil {
				t.Fatalf("seats: got %+v, want the pin's and a datum seat", pl.Seats)
			}
			if pin.Kind != tc.seat || math.Abs(pin.Diameter-tc.seatDia) > 1e-12 || math.Abs(pin.Depth-tc.seatDepth) > 1e-12 {
				t.Errorf("pin seat: got %s Ø%g deep %g, want %s Ø%g deep %g", pin.Kind, pin.Diameter, pin.Depth, tc.seat, tc.seatDia, tc.seatDepth)
			}
			// The seats sit where the plan put them, moved into the plate frame.
			if got, want := pin.At, geom.V(30, 30).Add(pl.Shift); !got.Near(want) {
				t.Errorf("pin seat at %v, want %v", got, want)
			}
			if got, want := datum.At, pl.Shift; !got.Near(want) {
				t.Errorf("datum seat at %v, want %v", got, want)
			}
			// derived: R × 0.5 µm at the part, 5 µm at 10:1.
			if pl.ChordTolerance != 0.005 {
				t.Errorf("chord tolerance: got %g, want 0.005", pl.ChordTolerance)
			}
			m := checkPlateMesh(t, pl)
			lo, hi := m.Bounds()
			if got, want := hi.X-lo.X, pl.Size.X*pl.ScaleX; math.Abs(got-want) > 1e-9 {
				t.Errorf("printed width: got %g, want %g", got, want)
			}
			if got, want := hi.Y-lo.Y, pl.Size.Y*pl.ScaleY; math.Abs(got-want) > 1e-9 {
				t.Errorf("printed depth: got %g, want %g", got, want)
			}
		})
	}
}

// TestPlateChannel checks the groove style's channel round the profile against the area of
// the band between the stylus-centre path grown and shrunk by half the channel's width.
func TestPlateChannel(t *testing.T) {
	const stylus = 5.0
	pl, err := pantograph.BuildPlate(squarePlan(stylus, pantograph.TipRound), nil, pantograph.PlateOptions{Style: pantograph.StyleGroove})
	if err != nil {
		t.Fatal(err)
	}
	got := 0.0
	for _, a := range pl.Areas {
		if a.What == "channel" {
			got += a.Region.Area()
			if a.Top != pl.Base-pl.WallHeight {
				t.Errorf("channel floor: got %g, want %g", a.Top, pl.Base-pl.WallHeight)
			}
		}
	}
	// derived: the centre path runs r_s = 2.5 outside the 100 × 60 profile; the channel is
	// 5.2 wide, so it reaches δ = 5.1 outside (rounded corners: (a+2δ)(b+2δ) − (4−π)δ²) and
	// 0.1 inside (sharp corners: (a−0.2)(b−0.2)).
	const a, b, d = 100.0, 60.0, 5.1
	want := (a+2*d)*(b+2*d) - (4-math.Pi)*d*d - (a-0.2)*(b-0.2)
	if math.Abs(got-want) > 1e-6 {
		t.Errorf("channel area: got %.6f, want %.6f", got, want)
	}
}

func TestPlateFixings(t *testing.T) {
	tests := []struct {
		name    string
		spacing float64
	}{
		{"corners", 0},
		{"150 mm apart", 150},
		{"wider than the template", 400}, // the plate grows to take them
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			pl, err := pantograph.BuildPlate(squarePlan(5, pantograph.TipRound), nil, pantograph.PlateOptions{FixingSpacing: tc.spacing})
			if err != nil {
				t.Fatal(err)
			}
			var xs []float64
			for _, a := range pl.Areas {
				if a.What == "fixing slot" {
					if !a.Open {
						t.Errorf("fixing slot is not open through the plate")
					}
					b := a.Region.Bounds()
					if b.Min.X < 0 || b.Min.Y < 0 || b.Max.X > pl.Size.X || b.Max.Y > pl.Size.Y {
						t.Errorf("fixing slot %v off the plate %v", b, pl.Size)
					}
					xs = append(xs, b.Center().X)
				}
			}
			if len(xs) != 4 {
				t.Fatalf("fixing slots: got %d, want 4", len(xs))
			}
			if tc.spacing > 0 && math.Abs(math.Abs(xs[1]-xs[0])-tc.spacing) > 1e-9 {
				t.Errorf("spacing: got %g, want %g", math.Abs(xs[1]-xs[0]), tc.spacing)
			}
			checkPlateMesh(t, pl)
		})
	}
}

func TestPlateNoDatumSeatOnAnEdge(t *testing.T) {
	p := squarePlan(5, pantograph.TipRound)
	// Move the template so the datum (the origin) falls on the profile's corner.
	p = shiftPlan(p, geom.V(20, 15))
	pl, err := pantograph.BuildPlate(p, nil, pantograph.PlateOptions{})
	if err != nil {
		t.Fatal(err)
	}
	for _, s := range pl.Seats {
		if s.Datum {
			t.Errorf("got a datum seat at %v on the profile's edge, want none", s.At)
		}
	}
	if len(pl.Notes) == 0 {
		t.Errorf("no note says the datum seat is missing")
	}
}

func TestPlateRejectsEmptyPlan(t *testing.T) {
	if _, err := pantograph.BuildPlate(pantograph.Plan{Setup: pantograph.Setup{Ratio: 10}, Bounds: geom.EmptyBox()}, nil, pantograph.PlateOptions{}); err == nil {
		t.Errorf("got no error for a plan with nothing on the template")
	}
}
