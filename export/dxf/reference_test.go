//go:build reference

package dxf

import (
	"encoding/json"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"testing"

	"panto/geom"
	"panto/internal/reftool"
	"panto/pantograph"
)

// ezdxfReport is what the Python script says of a file: the audit, entity counts, and the
// geometry of circles, arcs and polylines.
type ezdxfReport struct {
	Errors   int            `json:"errors"`
	Fixes    int            `json:"fixes"`
	Counts   map[string]int `json:"counts"`
	Units    int            `json:"units"`
	Circles  [][3]float64   `json:"circles"` // x, y, r
	Arcs     []float64      `json:"arcs"`    // radii
	Areas    []float64      `json:"areas"`   // closed LWPOLYLINEs, exact
	Layers   []string       `json:"layers"`
	TextSeen []string       `json:"texts"`
}

const auditScript = `
import ezdxf, json, math, sys
from ezdxf.math import bulge_to_arc
doc = ezdxf.readfile(sys.argv[1])
a = doc.audit()
msp = doc.modelspace()
out = {'errors': len(a.errors), 'fixes': len(a.fixes), 'counts': {}, 'circles': [], 'arcs': [],
       'areas': [], 'layers': [l.dxf.name for l in doc.layers], 'texts': [],
       'units': doc.header.get('$INSUNITS', 0)}
for e in msp:
    t = e.dxftype()
    out['counts'][t] = out['counts'].get(t, 0) + 1
    if t == 'CIRCLE':
        out['circles'].append([e.dxf.center.x, e.dxf.center.y, e.dxf.radius])
    elif t == 'ARC':
        out['arcs'].append(e.dxf.radius)
    elif t == 'TEXT':
        out['texts'].append(e.dxf.text)
    elif t == 'LWPOLYLINE' and e.closed:
        # Exact area from ezdxf's own reading of each bulge: the chord's shoelace term plus
        # the circular segment of the arc ezdxf makes of it.
        pts = e.get_points('xyb')
        s = 0.0
        for i in range(len(pts)):
            (x1, y1, b), (x2, y2, _) = pts[i], pts[(i + 1) % len(pts)]
            s += (x1 * y2 - x2 * y1) / 2
            if b:
                c, a0, a1, r = bulge_to_arc((x1, y1), (x2, y2), b)
                sweep = (a1 - a0) % (2 * math.pi)
                seg = r * r / 2 * (sweep - math.sin(sweep))
                s += seg if b > 0 else -seg
        out['areas'].append(abs(s))
print(json.dumps(out))
`

func auditWithEzdxf(t *testing.T, d Drawing) ezdxfReport {
	t.Helper()
	var py string
	for _, c := range []string{"/usr/bin/python3", "python3"} {
		if exec.Command(c, "-c", "import ezdxf").Run() == nil {
			py = c
			break
		}
	}
	if py == "" {
		reftool.Missing(t, "python3 with ezdxf (Debian package python3-ezdxf) is not installed")
	}
	path := filepath.Join(t.TempDir(), "panto.dxf")
	f, err := os.Create(path)
	if err != nil {
		t.Fatal(err)
	}
	if err := Encode(f, d); err != nil {
		t.Fatal(err)
	}
	f.Close()
	b, err := exec.Command(py, "-c", auditScript, path).Output()
	if err != nil {
		t.Fatalf("ezdxf: %v", err)
	}
	var r ezdxfReport
	if err := json.Unmarshal(b, &r); err != nil {
		t.Fatalf("ezdxf said %s: %v", b, err)
	}
	return r
}

func TestReferenceEzdxfOpensPartDrawing(t *testing.T) {
	p := clockBridge(t)
	d := PartDrawing(p)
	d.Segments = []Segment{
		{Layer: "EXTRA", Seg: geom.Line(geom.V(0, -10), geom.V(5, -10))},
		{Layer: "EXTRA", Seg: geom.Arc(geom.V(0, -20), 2.5, 0, -math.Pi/3)},
	}
	r := auditWithEzdxf(t, d)
	if r.Errors != 0 {
		t.Errorf("ezdxf audit: got %d errors, want 0", r.Errors)
	}
	if r.Units != 4 {
		t.Errorf("$INSUNITS: got %d, want 4", r.Units)
	}
	want := map[string]int{"LWPOLYLINE": 2, "CIRCLE": 6, "TEXT": 5, "LINE": 1, "ARC": 1}
	for k, n := range want {
		if r.Counts[k] != n {
			t.Errorf("%s: got %d, want %d (all: %v)", k, r.Counts[k], n, r.Counts)
		}
	}
	// The holes and the jewel seat pocket (Ø2.5 at (6, 9)) are circles: each that ezdxf
	// finds must be one of the part's.
	circles := [][3]float64{{6, 9, 1.25}}
	for _, f := range p.Features {
		for _, c := range f.Centers {
			circles = append(circles, [3]float64{c.X, c.Y, f.Diameter / 2})
		}
	}
	for _, c := range r.Circles {
		found := false
		for _, w := range circles {
			found = found || math.Abs(c[0]-w[0])+math.Abs(c[1]-w[1])+math.Abs(c[2]-w[2]) < 1e-9
		}
		if !found {
			t.Errorf("circle at (%g, %g) radius %g is not in the part", c[0], c[1], c[2])
		}
	}
	if len(r.Arcs) != 1 {
		t.Fatalf("got %d arcs, want 1", len(r.Arcs))
	}
	approx(t, "arc radius", r.Arcs[0], 2.5, 1e-9)
	// ezdxf's arcs from the bulges give the same areas to rounding.
	wantAreas := []float64{p.Profile.Region.Area()}
	for _, f := range p.Features {
		if f.Kind == "cutout" {
			wantAreas = append(wantAreas, f.Region.Area())
		}
	}
	if len(r.Areas) != len(wantAreas) {
		t.Fatalf("got %d closed polylines, want %d", len(r.Areas), len(wantAreas))
	}
	for i := range wantAreas {
		approx(t, "area", r.Areas[i], wantAreas[i], 1e-9)
	}
}

func TestReferenceEzdxfOpensTemplate(t *testing.T) {
	plan, err := pantograph.PlanPart(clockBridge(t), pantograph.Setup{Ratio: 10, Cutter: 0.3, Stylus: 3}, nil)
	if err != nil {
		t.Fatal(err)
	}
	ct, err := pantograph.TemplateForCutting(plan, 0.2)
	if err != nil {
		t.Fatal(err)
	}
	d := TemplateDrawing(ct)
	r := auditWithEzdxf(t, d)
	if r.Errors != 0 || r.Fixes != 0 {
		t.Errorf("ezdxf audit: got %d errors and %d fixes, want none", r.Errors, r.Fixes)
	}
	found := map[string]bool{}
	for _, l := range r.Layers {
		found[l] = true
	}
	for _, l := range []string{LayerOutline, LayerOpenings, LayerSeats, LayerLabels} {
		if !found[l] {
			t.Errorf("layer %s missing from %v", l, r.Layers)
		}
	}
	var seats int
	for _, c := range r.Circles {
		if math.Abs(c[2]-1.4) < 1e-9 { // derived: the 3 mm stylus less half the 0.2 mm kerf
			seats++
		}
	}
	if seats != 5 {
		t.Errorf("got %d seats of radius 1.4, want the sample's 5", seats)
	}
	var want []float64
	for _, o := range d.Outlines {
		if len(o.Contour) > 1 || !o.Contour[0].IsArc() {
			want = append(want, math.Abs(o.Contour.Area()))
		}
	}
	if len(r.Areas) != len(want) {
		t.Fatalf("got %d closed polylines, want %d", len(r.Areas), len(want))
	}
	for i := range want {
		approx(t, "template area", r.Areas[i], want[i], 1e-6)
	}
}
