//go:build reference

package cad

import (
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"testing"

	"panto/internal/reftool"
	"panto/pantograph"
)

// ezdxfPython returns a python3 that can import ezdxf (Debian's python3-ezdxf), or skips.
func ezdxfPython(t *testing.T) string {
	t.Helper()
	for _, py := range []string{"/usr/bin/python3", "python3"} {
		if exec.Command(py, "-c", "import ezdxf").Run() == nil {
			return py
		}
	}
	reftool.Missing(t, "python3 with ezdxf (Debian package python3-ezdxf) is not installed")
	return ""
}

// writeWithEzdxf runs script with ezdxf imported and the output path in OUT, and returns OUT.
func writeWithEzdxf(t *testing.T, script string) string {
	t.Helper()
	py := ezdxfPython(t)
	out := filepath.Join(t.TempDir(), "ref.dxf")
	cmd := exec.Command(py, "-c", "import ezdxf, math\nOUT = "+quotePy(out)+"\n"+script)
	if b, err := cmd.CombinedOutput(); err != nil {
		t.Fatalf("ezdxf: %v\n%s", err, b)
	}
	return out
}

func quotePy(s string) string { return "r'" + s + "'" }

// TestReferenceEzdxfPlate reads a plate drawn by ezdxf with every entity kind the reader
// knows, and checks areas, hole centres and diameters against the geometry the script drew.
func TestReferenceEzdxfPlate(t *testing.T) {
	path := writeWithEzdxf(t, `
doc = ezdxf.new('R2010')
doc.header['$INSUNITS'] = 4
msp = doc.modelspace()
b = math.tan(math.pi / 8)  # bulge of a 90° arc
msp.add_lwpolyline([(0, 0, 0), (36, 0, b), (40, 4, 0), (40, 20, 0), (0, 20, 0)], format='xyb', close=True)
for c, r in [((5, 5), 0.5), ((35, 15), 0.5), ((20, 10), 0.75)]:
    msp.add_circle(c, r)
msp.add_arc((10, 14), 3, 0, 180)
msp.add_line((7, 14), (13, 14))
msp.add_ellipse((25, 6), major_axis=(3, 0), ratio=0.5)
msp.add_open_spline([(28, 14), (31, 18), (34, 14)], degree=2, knots=[0, 0, 0, 1, 1, 1])
msp.add_line((34, 14), (28, 14))
pin = doc.blocks.new('PIN')
pin.add_circle((0, 0), 0.3)
msp.add_blockref('PIN', (10, 5), dxfattribs={'xscale': 2, 'yscale': 2, 'rotation': 45})
msp.add_text('PLATE', dxfattribs={'insert': (1, 1), 'height': 2})
doc.saveas(OUT)
`)
	p, rep, err := ReadFile(path, Options{})
	if err != nil {
		t.Fatal(err)
	}
	// Derived: 40 × 20 less the corner square 4 × 4 plus its quarter disc of radius 4.
	approx(t, "profile area", p.Profile.Region.Area(), 784+4*math.Pi, 1e-9)
	if p.Units != pantograph.MM {
		t.Errorf("got units %q, want mm", p.Units)
	}
	var areas []float64
	for _, f := range p.Features {
		if f.Kind == pantograph.KindCutout {
			areas = append(areas, f.Region.Area())
		}
	}
	// Derived: half disc R3, ellipse π·3·1.5, parabolic segment 2/3 · 6 · 2; chords of the
	// ellipse and spline lose at most perimeter × 1 µm.
	want := []float64{4.5 * math.Pi, 4.5 * math.Pi, 8}
	if len(areas) != 3 {
		t.Fatalf("got %d cut-outs, want 3", len(areas))
	}
	for i := range want {
		approx(t, "cut-out area", areas[i], want[i], 0.03)
	}
	holes := map[float64][][2]float64{}
	for _, f := range holeFeatures(p) {
		for _, c := range f.Centers {
			holes[math.Round(f.Diameter*1e6)/1e6] = append(holes[math.Round(f.Diameter*1e6)/1e6], [2]float64{c.X, c.Y})
		}
	}
	// The script's circles; the block's Ø0.6 scaled by 2 is Ø1.2 at the insertion point.
	wantHoles := map[float64][][2]float64{1: {{5, 5}, {35, 15}}, 1.5: {{20, 10}}, 1.2: {{10, 5}}}
	for d, cs := range wantHoles {
		if len(holes[d]) != len(cs) {
			t.Errorf("Ø%g: got %v, want %v", d, holes[d], cs)
			continue
		}
		for i := range cs {
			approx(t, "hole x", holes[d][i][0], cs[i][0], 1e-9)
			approx(t, "hole y", holes[d][i][1], cs[i][1], 1e-9)
		}
	}
	if rep.Skipped != "1 TEXT" {
		t.Errorf("got skipped %q, want 1 TEXT", rep.Skipped)
	}
}

// TestReferenceEzdxfInches checks $INSUNITS 1 and a negative bulge drawn by ezdxf.
func TestReferenceEzdxfInches(t *testing.T) {
	path := writeWithEzdxf(t, `
doc = ezdxf.new('R2000')
doc.header['$INSUNITS'] = 1
msp = doc.modelspace()
b = -math.tan(math.pi / 8)
msp.add_lwpolyline([(0, 0, 0), (0, 0.5, b), (0.5, 0, 0)], format='xyb', close=True)
msp.add_circle((0.1, 0.1), 0.025)
doc.saveas(OUT)
`)
	p, _, err := ReadFile(path, Options{})
	if err != nil {
		t.Fatal(err)
	}
	if p.Units != pantograph.Inch {
		t.Errorf("got units %q, want in", p.Units)
	}
	// Derived: a quarter disc of radius 0.5 in is π·0.25/4 in², × 25.4² mm² per in².
	approx(t, "area", p.Profile.Region.Area(), math.Pi*0.25/4*25.4*25.4, 1e-9)
	hs := holeFeatures(p)
	if len(hs) != 1 {
		t.Fatalf("got %d holes features, want 1", len(hs))
	}
	approx(t, "diameter", hs[0].Diameter, 0.05*25.4, 1e-12) // derived: Ø0.05 in
	approx(t, "centre x", hs[0].Centers[0].X, 2.54, 1e-12)  // derived: 0.1 in
	_ = os.Remove(path)
}
