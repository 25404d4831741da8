package pantograph_test

import (
	"cmp"
	"fmt"
	"math"
	"slices"
	"strings"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

// withHoles returns squarePlan (stylus 5 mm, bore seats Ø5.1) with its pin's seat replaced by
// holes at the given places on the template, the datum being the origin.
func withHoles(at ...geom.Vec) pantograph.Plan {
	p := squarePlan(5, pantograph.TipRound)
	p.Features[1].Seats = at
	return p
}

// around returns n places at distance d round the origin, the first straight below it.
func around(n int, d float64) []geom.Vec {
	var out []geom.Vec
	for k := range n {
		out = append(out, geom.Polar(geom.Vec{}, d, -math.Pi/2+float64(k)*2*math.Pi/float64(n)))
	}
	return out
}

// TestPlateDatumMark checks that the datum seat's mark gives way to the seats beside it: a
// ring where it has room, an arrow where it has not, none where neither fits, and no datum seat
// of its own where a hole's seat takes its place; never an error.
func TestPlateDatumMark(t *testing.T) {
	// derived: bore seats are 5.1 across (radius 2.55); the ring reaches 2.5 beyond the seat
	// and keeps 1 mm clear, so a seat centred nearer than 2.55 + 2.5 + 1 + 2.55 = 8.6 mm
	// stops it; a seat of its own for the datum needs 2.55 + 2.55 + 1 = 6.1 mm.
	tests := []struct {
		name  string
		holes []geom.Vec
		mark  string // "ring", "arrow", "none", or "no seat"
		note  string
	}{
		{"clear", []geom.Vec{geom.V(30, 30)}, "ring", ""},
		{"a hole 7 mm from the datum", []geom.Vec{geom.V(0, -7)}, "arrow", "marked by an arrow"},
		{"a hole 5 mm from the datum", []geom.Vec{geom.V(0, -5)}, "no seat", "too near for a seat"},
		{"the datum on a hole, one beside it", []geom.Vec{{}, geom.V(7, 0)}, "arrow", "marked by an arrow"},
		// derived: 8 seats 7 mm out are 2·7·sin(22.5°) = 5.36 mm apart, 0.26 mm between
		// their rims: no room for the 3 mm base of an arrow.
		{"the datum on a hole, ringed by holes", append([]geom.Vec{{}}, around(8, 7)...), "none", "not marked"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			p := withHoles(tc.holes...)
			pl, err := pantograph.BuildPlate(p, nil, pantograph.PlateOptions{})
			if err != nil {
				t.Fatal(err)
			}
			checkPlateEdges(t, p, pl, checkPlateMesh(t, pl), 0)
			if got := datumMarkKind(pl); got != tc.mark {
				t.Errorf("mark: got %s, want %s (notes %q)", got, tc.mark, pl.Notes)
			}
			notes := strings.Join(pl.Notes, "\n")
			if tc.note != "" && !strings.Contains(notes, tc.note) {
				t.Errorf("notes: got %q, want one saying %q", pl.Notes, tc.note)
			}
			if tc.note == "" && strings.Contains(notes, "datum") {
				t.Errorf("notes: got %q, want none on the datum", pl.Notes)
			}
			checkDatumMarkClear(t, pl)
		})
	}
}

// datumMarkKind says how the plate marks its datum seat.
func datumMarkKind(pl pantograph.Plate) string {
	seat := false
	for _, s := range pl.Seats {
		seat = seat || s.Datum
	}
	if !seat {
		return "no seat"
	}
	for _, a := range pl.Areas {
		switch {
		case a.What != "datum mark":
		case len(a.Region.Holes) == 1:
			return "ring"
		case len(a.Region.Outer) == 3:
			return "arrow"
		default:
			return fmt.Sprintf("a mark of %d sides", len(a.Region.Outer))
		}
	}
	return "none"
}

// checkDatumMarkClear checks that the datum mark keeps 1 mm clear of every seat, and that an
// arrow points at the datum seat from 1 mm off its rim.
func checkDatumMarkClear(t *testing.T, pl pantograph.Plate) {
	t.Helper()
	for _, a := range pl.Areas {
		if a.What != "datum mark" {
			continue
		}
		near := a.Region.Offset(1 - 1e-6).Regions // 1 mm: the gap kept round marks
		for _, s := range pl.Seats {
			disc := geom.NewRegion(geom.Circle(s.At, s.Diameter/2))
			if in := geom.Intersection(near, []geom.Region{disc}); len(in) > 0 {
				t.Errorf("datum mark within 1 mm of the seat at %v", s.At)
			}
			if !s.Datum || len(a.Region.Outer) != 3 {
				continue
			}
			// derived: the point lies 1 mm off the rim, the base's middle 5 mm beyond it on
			// the same line from the centre.
			vs := []geom.Vec{a.Region.Outer[0].A, a.Region.Outer[1].A, a.Region.Outer[2].A}
			slices.SortFunc(vs, func(p, q geom.Vec) int { return cmp.Compare(p.Dist(s.At), q.Dist(s.At)) })
			tip, base := vs[0], vs[1].Lerp(vs[2], 0.5)
			r := s.Diameter / 2
			if d := tip.Dist(s.At); math.Abs(d-(r+1)) > 1e-9 {
				t.Errorf("arrow's point %.4f mm from the seat's centre, want %.4f", d, r+1)
			}
			if d := base.Dist(s.At); math.Abs(d-(r+6)) > 1e-9 {
				t.Errorf("arrow's base %.4f mm from the seat's centre, want %.4f", d, r+6)
			}
		}
	}
}
