package pantograph_test

import (
	"fmt"
	"math"
	"strconv"
	"strings"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

// fixingSlots returns the bounds of the plate's fixing slots, front row first, left to right.
func fixingSlots(t *testing.T, pl pantograph.Plate) []geom.Box {
	t.Helper()
	var out []geom.Box
	for _, a := range pl.Areas {
		if a.What == "fixing slot" {
			out = append(out, a.Region.Bounds())
		}
	}
	if len(out) != 4 {
		t.Fatalf("fixing slots: got %d, want 4", len(out))
	}
	return out
}

// mm formats a length as messages do: to the thousandth, without trailing zeros.
func mm(v float64) string { return strconv.FormatFloat(math.Round(v*1000)/1000, 'f', -1, 64) }

// hasNote reports whether a note of pl holds every fragment.
func hasNote(pl pantograph.Plate, frags ...string) bool {
	for _, n := range pl.Notes {
		all := true
		for _, f := range frags {
			all = all && strings.Contains(n, f)
		}
		if all {
			return true
		}
	}
	return false
}

func TestPlateFixingFromMachine(t *testing.T) {
	const growth = 0.3 // printer hole growth, added to every slot's width
	machine := func(sx, sy, size float64) *pantograph.Machine {
		return &pantograph.Machine{Fixing: pantograph.Fixing{Spacing: pantograph.Travel{X: sx, Y: sy}, Size: size},
			Printer: pantograph.Printer{HoleGrowth: growth}}
	}
	// freeRows returns the rows' distance with the same bolts and no T-slot pitch, to compare with.
	freeRows := func(t *testing.T, size float64) float64 {
		free, err := pantograph.BuildPlate(squarePlan(5, pantograph.TipRound), machine(0, 0, size), pantograph.PlateOptions{})
		if err != nil {
			t.Fatal(err)
		}
		s := fixingSlots(t, free)
		return s[2].Center().Y - s[0].Center().Y
	}
	tests := []struct {
		name     string
		m        *pantograph.Machine
		flag     float64
		wantX    float64 // centre distance along X; 0 for slots near the corners
		pitch    float64 // T-slot pitch the rows must be a whole number of apart; 0 for none
		width    float64
		override bool // a note must say the flag wins over the machine file
	}{
		// derived: an M6 bolt takes the 6.6 mm hole of ISO 273 medium (from memory), plus growth
		{"spacing and pitch from the file", machine(150, 50, 6), 0, 150, 50, 6.6 + growth, false},
		{"the flag wins", machine(150, 50, 6), 120, 120, 50, 6.6 + growth, true},
		{"the flag agrees with the file", machine(150, 0, 0), 150, 150, 0, 6.6 + growth, false},
		// derived: an M10 bolt takes 1.1 × 10 = 11 mm
		{"bolt size only", machine(0, 0, 10), 0, 0, 0, 11 + growth, false},
		{"pitch larger than the plate", machine(100, 400, 8), 0, 100, 400, 8.8 + growth, false},
		{"inch T-slots", machine(6*25.4, 1.5*25.4, 0.25*25.4), 0, 6 * 25.4, 1.5 * 25.4, 1.1*0.25*25.4 + growth, false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			pl, err := pantograph.BuildPlate(squarePlan(5, pantograph.TipRound), tc.m, pantograph.PlateOptions{FixingSpacing: tc.flag})
			if err != nil {
				t.Fatal(err)
			}
			s := fixingSlots(t, pl)
			gotX := s[1].Center().X - s[0].Center().X
			if tc.wantX > 0 && math.Abs(gotX-tc.wantX) > 1e-9 {
				t.Errorf("slots along X: got %g apart, want %g", gotX, tc.wantX)
			}
			rows := s[2].Center().Y - s[0].Center().Y
			if tc.pitch > 0 {
				k, least := rows/tc.pitch, freeRows(t, tc.m.Fixing.Size)
				if math.Abs(k-math.Round(k)) > 1e-9 || rows < least-1e-9 || rows >= least+tc.pitch {
					t.Errorf("rows: got %g apart, want the least whole number of %g-mm pitches from %g", rows, tc.pitch, least)
				}
			}
			for _, b := range s {
				if got := b.Size().Y; math.Abs(got-tc.width) > 1e-9 {
					t.Errorf("slot width: got %g, want %g", got, tc.width)
				}
				// derived: the M6 slot of the default leaves 8 − 6.6/2 = 4.7 mm to the edge, less
				// half the hole growth; a larger slot moves in to keep it
				wall := 4.7 - growth/2 - 1e-9
				if b.Min.Y < wall || b.Max.Y > pl.Size.Y-wall || b.Min.X < 0 || b.Max.X > pl.Size.X {
					t.Errorf("slot %v too near the edge of the %v plate", b, pl.Size)
				}
			}
			if got := hasNote(pl, "--fixing-spacing", fmt.Sprintf("%g mm as the machine file", tc.m.Fixing.Spacing.X)); got != tc.override {
				t.Errorf("note that the flag wins: got %v, want %v (notes %q)", got, tc.override, pl.Notes)
			}
			checkPlateMesh(t, pl)
		})
	}
}

func TestPlateBedWarning(t *testing.T) {
	plan := squarePlan(5, pantograph.TipRound)
	plain, err := pantograph.BuildPlate(plan, nil, pantograph.PlateOptions{})
	if err != nil {
		t.Fatal(err)
	}
	size := plain.Size // the plate's size does not depend on the bed or the scale correction
	tests := []struct {
		name  string
		bed   pantograph.Travel
		scale float64
		warn  bool
	}{
		{"no bed stated", pantograph.Travel{}, 1, false},
		{"exactly the bed", pantograph.Travel{X: size.X, Y: size.Y}, 1, false},
		{"fits turned", pantograph.Travel{X: size.Y, Y: size.X}, 1, false},
		{"a millimetre short", pantograph.Travel{X: size.X - 1, Y: size.Y}, 1, true},
		// derived: a 1 % scale correction prints the plate 1 % larger than the bed
		{"grown by the scale correction", pantograph.Travel{X: size.X, Y: size.Y}, 1.01, true},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			m := &pantograph.Machine{Printer: pantograph.Printer{Bed: tc.bed, ScaleX: tc.scale, ScaleY: tc.scale}}
			pl, err := pantograph.BuildPlate(plan, m, pantograph.PlateOptions{})
			if err != nil {
				t.Fatal(err)
			}
			if got := pl.BedWarning != ""; got != tc.warn {
				t.Fatalf("warned: got %v (%q), want %v", got, pl.BedWarning, tc.warn)
			}
			if !tc.warn {
				return
			}
			// both sizes, the plate's with its scale correction, to the thousandth of a mm
			want := fmt.Sprintf("the plate is %s x %s mm as printed", mm(size.X*tc.scale), mm(size.Y*tc.scale))
			bed := fmt.Sprintf("larger than the printer bed (%s x %s mm)", mm(tc.bed.X), mm(tc.bed.Y))
			if !strings.HasPrefix(pl.BedWarning, want) || !strings.Contains(pl.BedWarning, bed) {
				t.Errorf("got %q, want %s ... %s", pl.BedWarning, want, bed)
			}
		})
	}
}
