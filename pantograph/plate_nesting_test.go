package pantograph_test

import (
	"math"
	"strings"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

// nestedPlan returns squarePlan's 100 × 60 mm profile (stylus 3 mm, round) with a pocket P
// holding a milled hole, a slot, a cut-out, a drilled hole's seat, a groove and a pocket Q,
// which holds a milled hole of its own: areas nested two deep. Everything keeps 1 mm or more
// clear of everything else on the template, so the groove style's channels do not meet.
func nestedPlan() pantograph.Plan {
	const stylus = 3.0
	p := squarePlan(stylus, pantograph.TipRound)
	p.Features = p.Features[:1] // the profile
	rect := func(x, y, w, h float64) geom.Region {
		c, _ := geom.Rect(geom.V(x, y), geom.V(w, h), 0)
		return geom.NewRegion(c)
	}
	add := func(kind pantograph.Kind, name string, r geom.Region) *pantograph.PlannedFeature {
		f := pantograph.PlannedFeature{Name: name, Label: `[[` + string(kind) + `]] "` + name + `"`, Kind: kind,
			Number: len(p.Features) + 1, Stylus: stylus, Tip: pantograph.TipRound}
		if len(r.Outer) > 0 {
			f.TemplateRegions, f.TemplateBounds = []geom.Region{r}, r.Bounds()
		}
		p.Features = append(p.Features, f)
		return &p.Features[len(p.Features)-1]
	}
	add(pantograph.KindPocket, "P", rect(20, -12, 55, 54))
	add(pantograph.KindHoles, "hole in P", geom.NewRegion(geom.Circle(geom.V(28, 3), 3)))
	add(pantograph.KindSlot, "slot in P", geom.NewRegion(geom.Capsule(geom.V(40, 3), geom.V(50, 3), 2)))
	add(pantograph.KindCutout, "cut-out in P", geom.NewRegion(geom.Circle(geom.V(62, 8), 3.5)))
	add(pantograph.KindPocket, "Q", rect(30, 15, 30, 20))
	add(pantograph.KindHoles, "hole in Q", geom.NewRegion(geom.Circle(geom.V(45, 25), 3)))
	seat := add(pantograph.KindHoles, "pin in P", geom.Region{})
	seat.Drill, seat.Seats = 0.6, []geom.Vec{geom.V(25.5, 30)}
	seat.TemplateBounds = geom.Box{Min: seat.Seats[0], Max: seat.Seats[0]}.Expand(stylus / 2)
	g := add(pantograph.KindGroove, "groove in P", geom.Region{})
	g.Path, g.Width = []geom.Vec{geom.V(35, -6), geom.V(55, -6)}, stylus
	g.TemplateBounds = geom.Box{Min: g.Path[0], Max: g.Path[1]}.Expand(stylus)
	return p
}

// TestPlateNestedAreas checks the rule of nested areas on nestedPlan: in the wall style each
// area sinks one wall height below the floor it lies in and the profile rises to keep the
// base under the deepest floor; in the groove style every outline keeps its own channel. In
// both the stylus finds every edge.
func TestPlateNestedAreas(t *testing.T) {
	const base, w = 5.0, 3.0 // the plain plate's base; the wall height for a 3 mm stylus
	// derived: Q's hole lies two deep, so the profile stands 3 wall heights over the base,
	// P's floor 1 below its top, what P holds (Q, its hole, slot, cut-out, the pin's seat
	// and the groove's channel) 2 below, and Q's hole 3 below, on the base's height.
	wall := []struct {
		what string
		at   geom.Vec
		want float64
	}{
		{"base beside the profile", geom.V(-25, 0), base},
		{"profile", geom.V(0, 20), base + 3*w},
		{"P's floor", geom.V(25, 20), base + 2*w},
		{"floor of P's hole", geom.V(28, 3), base + w},
		{"floor of the slot", geom.V(45, 3), base + w},
		{"floor of the cut-out", geom.V(62, 8), base + w},
		{"Q's floor", geom.V(35, 20), base + w},
		{"floor of Q's hole", geom.V(45, 25), base},
		{"bottom of the pin's bore", geom.V(25.5, 30), base + w},
		{"floor of the groove's channel", geom.V(45, -6), base + w},
	}
	for _, style := range []pantograph.PlateStyle{pantograph.StyleWall, pantograph.StyleGroove} {
		t.Run(string(style), func(t *testing.T) {
			p := nestedPlan()
			pl, err := pantograph.BuildPlate(p, nil, pantograph.PlateOptions{Style: style})
			if err != nil {
				t.Fatal(err)
			}
			m := checkPlateMesh(t, pl)
			checkPlateEdges(t, p, pl, m, 0)
			notes := strings.Join(pl.Notes, "\n")
			if strings.Contains(notes, "cut back") || strings.Contains(notes, "meet") {
				t.Errorf("notes: got %q, want no channel cut back or meeting another", pl.Notes)
			}
			if style != pantograph.StyleWall {
				// derived: a base of 5 mm plus one wall height, and the 1 mm check bar on it.
				if want := base + w + 1; pl.Height != want {
					t.Errorf("height: got %g, want %g", pl.Height, want)
				}
				return
			}
			if !strings.Contains(notes, `[[holes]] "hole in Q" lies inside [[pocket]] "Q"`) {
				t.Errorf("notes: got %q, want one saying why the profile stands higher", pl.Notes)
			}
			top := topSurface(m, pl.ScaleX, pl.ScaleY)
			for _, h := range wall {
				if got := top.heightAt(h.at.Add(pl.Shift)); math.Abs(got-h.want) > 1e-9 {
					t.Errorf("%s: height %g, want %g", h.what, got, h.want)
				}
			}
		})
	}
}

// TestPlateNoNestingUnchanged checks that a plate without nested areas keeps the plain
// heights: the profile one wall height over the 5 mm base.
func TestPlateNoNestingUnchanged(t *testing.T) {
	p := nestedPlan()
	p.Features = p.Features[:2] // the profile and P
	pl, err := pantograph.BuildPlate(p, nil, pantograph.PlateOptions{})
	if err != nil {
		t.Fatal(err)
	}
	// derived: 5 mm base + 3 mm wall for a 3 mm stylus.
	if pl.Height != 8 {
		t.Errorf("height: got %g, want 8", pl.Height)
	}
	checkPlateEdges(t, p, pl, checkPlateMesh(t, pl), 0)
}
