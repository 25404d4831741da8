package stl

import (
	"bytes"
	"fmt"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

// gridPart returns an 84 × 84 mm part with n × n features in a grid: holes, round cut-outs and
// square pockets in turn, 4 mm apart.
func gridPart(n int) pantograph.Part {
	c, _ := geom.Rect(geom.V(-2, -2), geom.V(4*float64(n)+4, 4*float64(n)+4), 1)
	p := pantograph.Part{Name: "grid", Units: pantograph.MM, Stock: pantograph.Stock{Material: "brass", Thickness: 1},
		Profile: pantograph.Feature{Name: "outline", Kind: pantograph.KindProfile, Region: geom.NewRegion(c),
			Depth: pantograph.Depth{Through: true}}}
	for i := range n {
		for j := range n {
			at := geom.V(4*float64(i)+2, 4*float64(j)+2)
			f := pantograph.Feature{Name: fmt.Sprintf("f%d-%d", i, j), Depth: pantograph.Depth{Through: true}}
			switch (i + j) % 3 {
			case 0:
				f.Kind, f.Centers, f.Diameter = pantograph.KindHoles, []geom.Vec{at}, 0.8
			case 1:
				f.Kind, f.Region = pantograph.KindCutout, geom.NewRegion(geom.Circle(at, 1))
			case 2:
				sq, _ := geom.Rect(at.Sub(geom.V(1, 1)), geom.V(2, 2), 0.3)
				f.Kind, f.Region, f.Depth = pantograph.KindPocket, geom.NewRegion(sq), pantograph.Depth{MM: 0.3}
			}
			p.Features = append(p.Features, f)
		}
	}
	return p
}

// BenchmarkLargePlate plans a part with 1600 features at 10:1, designs its plate, builds the
// mesh and writes the file, reporting each stage's share through sub-benchmarks.
func BenchmarkLargePlate(b *testing.B) {
	part := gridPart(40)
	plan, err := pantograph.PlanPart(part, pantograph.Setup{Ratio: 10, Cutter: 0.2}, nil)
	if err != nil {
		b.Fatal(err)
	}
	var pl pantograph.Plate
	b.Run("design", func(b *testing.B) {
		for range b.N {
			if pl, err = pantograph.BuildPlate(plan, nil, pantograph.PlateOptions{}); err != nil {
				b.Fatal(err)
			}
		}
	})
	var m geom.Mesh
	b.Run("mesh", func(b *testing.B) {
		for range b.N {
			if m, err = pl.Mesh(); err != nil {
				b.Fatal(err)
			}
		}
		b.ReportMetric(float64(len(m.Triangles)), "triangles")
	})
	b.Run("write", func(b *testing.B) {
		for range b.N {
			var buf bytes.Buffer
			if err := Encode(&buf, m, "grid"); err != nil {
				b.Fatal(err)
			}
			b.SetBytes(int64(buf.Len()))
		}
	})
}
