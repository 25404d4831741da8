package pantograph_test

import (
	"fmt"
	"math"
	"path/filepath"
	"testing"

	hstl "github.com/hschendel/stl"

	"panto/geom"
	"panto/pantograph"
	"panto/pantograph/partfile"
)

// samplePlan plans a sample part at 10:1 with a 0.5 mm cutter.
func samplePlan(t testing.TB, name string, tip pantograph.Tip) pantograph.Plan {
	t.Helper()
	part, err := partfile.ReadFile(filepath.Join("..", "samples", name))
	if err != nil {
		t.Fatal(err)
	}
	p, err := pantograph.PlanPart(part, pantograph.Setup{Ratio: 10, Cutter: 0.5, Tip: tip}, nil)
	if err != nil {
		t.Fatal(err)
	}
	return p
}

// terraceVolume returns the volume of the solid the terraces describe, from the exact areas of
// their outlines (arcs integrated exactly), and the most that flattening can change it: each
// wall's outline moves by at most tol, so its area by at most perimeter × tol.
func terraceVolume(t geom.Terrace, around, base, tol float64) (v, bound float64) {
	a := math.Abs(t.Outline.Area())
	dh := t.Top - around
	switch {
	case t.Open:
		dh = base - around
	case t.Cone:
		dh = (t.Top - around) / 3 // derived: a cone holds a third of its cylinder
	}
	v, bound = a*dh, t.Outline.Perimeter()*tol*math.Abs(dh)
	for _, c := range t.Children {
		cv, cb := terraceVolume(c, t.Top, base, tol)
		v, bound = v+cv, bound+cb
	}
	return v, bound
}

// checkPlateMesh builds the plate's mesh and checks it is closed, oriented and of the volume
// its areas and heights give.
func checkPlateMesh(t *testing.T, pl pantograph.Plate) geom.Mesh {
	t.Helper()
	m, err := pl.Mesh()
	if err != nil {
		t.Fatal(err)
	}
	if err := m.Check(); err != nil {
		t.Fatal(err)
	}
	root, err := pl.Terrace()
	if err != nil {
		t.Fatal(err)
	}
	want, bound := terraceVolume(root, 0, 0, pl.ChordTolerance)
	got := m.Volume() / (pl.ScaleX * pl.ScaleY)
	if math.Abs(got-want) > bound {
		t.Errorf("volume: got %.6f, want %.6f ± %.6f", got, want, bound)
	}
	lo, hi := m.Bounds()
	if lo.X < 0 || lo.Y < 0 || lo.Z != 0 {
		t.Errorf("lowest corner: got %v, want x, y ≥ 0 and z = 0", lo)
	}
	if got, want := hi.Z, pl.Height; got != want {
		t.Errorf("height: got %g, want %g", got, want)
	}
	// Written to a file the corners become float32: the STL library's own check must still
	// find every edge paired and every normal matching its corners. (export/stl makes the
	// same solid; the test builds it here because pantograph does not import export.)
	s := &hstl.Solid{}
	f32 := func(p geom.Vec3) hstl.Vec3 { return hstl.Vec3{float32(p.X), float32(p.Y), float32(p.Z)} }
	for i := range m.Triangles {
		a, b, c := m.Corners(i)
		s.Triangles = append(s.Triangles, hstl.Triangle{Normal: f32(m.Normal(i)), Vertices: [3]hstl.Vec3{f32(a), f32(b), f32(c)}})
	}
	if errs := s.Validate(); len(errs) != 0 {
		for i, e := range errs {
			t.Errorf("written triangle %d %v: %+v", i, s.Triangles[i].Vertices, *e)
			break
		}
	}
	return m
}

func TestBuildPlateSamples(t *testing.T) {
	for _, name := range []string{"calibration-coupon.toml", "clock-bridge.toml", "pump-port-plate.toml"} {
		for _, o := range []pantograph.PlateOptions{
			{},
			{Seat: pantograph.SeatCone},
			{Style: pantograph.StyleGroove},
			{FixingSpacing: 150},
		} {
			t.Run(fmt.Sprintf("%s %+v", name, o), func(t *testing.T) {
				pl, err := pantograph.BuildPlate(samplePlan(t, name, ""), nil, o)
				if err != nil {
					t.Fatal(err)
				}
				m := checkPlateMesh(t, pl)
				t.Logf("%s: %.1f × %.1f × %.1f mm, %d triangles, notes %v", name, pl.Size.X, pl.Size.Y, pl.Height, len(m.Triangles), pl.Notes)
			})
		}
	}
}
