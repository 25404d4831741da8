package pantograph_test

import (
	"fmt"
	"math/rand"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

// randomPlan returns a seeded random plan as the planner would make it, in the template frame:
// a rounded profile with openings, holes and grooves in a jittered grid of cells, so features
// come as close as a millimetre or two, and the datum at a hole, a corner or in open space.
func randomPlan(rng *rand.Rand, cells int) pantograph.Plan {
	return randomPlanSized(rng, 2+rng.Intn(cells), 2+rng.Intn(cells))
}

// randomPlanSized is randomPlan with nx × ny cells.
func randomPlanSized(rng *rand.Rand, nx, ny int) pantograph.Plan {
	const cell = 20.0
	w, h := cell*float64(nx)+20, cell*float64(ny)+20
	outline, _ := geom.Rect(geom.V(-10, -10), geom.V(w, h), 2+8*rng.Float64())
	stylus := 2 + 4*rng.Float64()
	tip := pantograph.TipRound
	if rng.Intn(3) == 0 {
		tip = pantograph.TipPointed
	}
	p := pantograph.Plan{Part: fmt.Sprintf("random %d", rng.Int63()%1000),
		Setup: pantograph.Setup{Ratio: 10, Cutter: stylus / 10, Tip: tip}}
	prof := geom.NewRegion(outline)
	p.Features = append(p.Features, pantograph.PlannedFeature{Name: "profile", Label: "[profile]",
		Kind: pantograph.KindProfile, Number: 1, Stylus: stylus, Tip: tip,
		TemplateRegions: []geom.Region{prof}, TemplateBounds: prof.Bounds()})
	for i := range nx {
		for j := range ny {
			c := geom.V(float64(i)*cell+cell/2, float64(j)*cell+cell/2).Add(geom.V(4*rng.Float64()-2, 4*rng.Float64()-2))
			f := pantograph.PlannedFeature{Number: len(p.Features) + 1, Stylus: stylus, Tip: tip}
			switch rng.Intn(5) {
			case 0:
				continue
			case 1:
				r := geom.NewRegion(geom.Circle(c, 3+4*rng.Float64()))
				f.Kind, f.TemplateRegions = pantograph.KindCutout, []geom.Region{r}
			case 2:
				ct, _ := geom.Rect(c.Sub(geom.V(7, 5)), geom.V(14, 10), 3*rng.Float64())
				f.Kind, f.TemplateRegions = pantograph.KindPocket, []geom.Region{geom.NewRegion(ct)}
			case 3:
				f.Kind, f.Seats, f.Drill = pantograph.KindHoles, []geom.Vec{c}, 0.3+0.5*rng.Float64()
			case 4:
				f.Kind, f.Width = pantograph.KindGroove, stylus
				f.Path = []geom.Vec{c.Sub(geom.V(6, 0)), c.Add(geom.V(0, 4*rng.Float64())), c.Add(geom.V(6, 0))}
			}
			f.Name, f.Label = fmt.Sprint("f", f.Number), fmt.Sprintf("[[%s]] \"f%d\"", f.Kind, f.Number)
			f.TemplateBounds = geom.Box{Min: c, Max: c}.Expand(8)
			p.Features = append(p.Features, f)
			if f.Kind == pantograph.KindGroove && rng.Intn(2) == 0 {
				// A second groove across the first, ending at a hole: channels must join,
				// and keep off the seat.
				g := f
				g.Number, g.Name = len(p.Features)+1, fmt.Sprint("f", len(p.Features)+1)
				g.Path = []geom.Vec{c.Add(geom.V(0, -6)), c.Add(geom.V(0, 6))}
				h := pantograph.PlannedFeature{Kind: pantograph.KindHoles, Number: g.Number + 1, Stylus: stylus, Tip: tip,
					Name: fmt.Sprint("f", g.Number+1), Seats: []geom.Vec{c.Add(geom.V(0, 6))}, Drill: 0.5,
					TemplateBounds: geom.Box{Min: c, Max: c}.Expand(8)}
				p.Features = append(p.Features, g, h)
			}
		}
	}
	// The datum is the template origin: move everything so that it sits where chosen.
	var at geom.Vec
	switch rng.Intn(3) {
	case 0:
		at = geom.V(-10, -10) // a corner of the profile
	case 1:
		for _, f := range p.Features {
			if len(f.Seats) > 0 {
				at = f.Seats[0]
			}
		}
	}
	return shiftPlan(p, at.Neg())
}

// shiftPlan moves everything on the template by d and works out the bounds.
func shiftPlan(p pantograph.Plan, d geom.Vec) pantograph.Plan {
	t := geom.Translate(d)
	p.Bounds = geom.EmptyBox()
	for i, f := range p.Features {
		for k, r := range f.TemplateRegions {
			f.TemplateRegions[k] = r.Transform(t)
		}
		for k, s := range f.Seats {
			f.Seats[k] = t.Apply(s)
		}
		for k, s := range f.Path {
			f.Path[k] = t.Apply(s)
		}
		f.TemplateBounds = geom.Box{Min: t.Apply(f.TemplateBounds.Min), Max: t.Apply(f.TemplateBounds.Max)}
		p.Bounds = p.Bounds.Union(f.TemplateBounds)
		p.Features[i] = f
	}
	return p
}

// TestBuildPlateRandom builds plates of seeded random plans in every style and seat, and checks
// each mesh is closed, oriented, of the right volume, and survives float32.
func TestBuildPlateRandom(t *testing.T) {
	for seed := int64(1); seed <= 80; seed++ {
		rng := rand.New(rand.NewSource(seed))
		p := randomPlan(rng, 4)
		o := pantograph.PlateOptions{}
		if rng.Intn(2) == 0 {
			o.Style = pantograph.StyleGroove
		}
		if rng.Intn(2) == 0 {
			o.Seat = pantograph.SeatCone
		}
		var m *pantograph.Machine
		if rng.Intn(2) == 0 {
			m = &pantograph.Machine{Printer: pantograph.Printer{ScaleX: 1.003, ScaleY: 0.998, HoleGrowth: 0.3}}
		}
		t.Run(fmt.Sprint("seed ", seed), func(t *testing.T) {
			pl, err := pantograph.BuildPlate(p, m, o)
			if err != nil {
				t.Fatalf("seed %d: %v", seed, err)
			}
			mesh := checkPlateMesh(t, pl)
			growth := 0.0
			if m != nil {
				growth = m.Printer.HoleGrowth
			}
			checkPlateEdges(t, p, pl, mesh, growth)
			if t.Failed() {
				t.Logf("seed %d, options %+v", seed, o)
			}
		})
	}
}

// BenchmarkPlateLarge builds the plate of a plan with thousands of features (holes, openings
// and grooves in a 40 × 40 grid) and reports its triangles.
func BenchmarkPlateLarge(b *testing.B) {
	p := randomPlanSized(rand.New(rand.NewSource(7)), 40, 40)
	b.ResetTimer()
	for range b.N {
		pl, err := pantograph.BuildPlate(p, nil, pantograph.PlateOptions{})
		if err != nil {
			b.Fatal(err)
		}
		m, err := pl.Mesh()
		if err != nil {
			b.Fatal(err)
		}
		b.ReportMetric(float64(len(p.Features)), "features")
		b.ReportMetric(float64(len(m.Triangles)), "triangles")
	}
}
