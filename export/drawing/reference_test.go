//go:build reference

package drawing

import (
	"bytes"
	"os"
	"os/exec"
	"path/filepath"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

// These tests run the drawings through the file checkers CI installs (qpdf, librsvg2-bin).

func TestDrawingsReference(t *testing.T) {
	dir := t.TempDir()
	part := pantograph.Part{Name: "test plate", Profile: pantograph.Feature{Kind: pantograph.KindProfile,
		Region: geom.NewRegion(geom.Polygon(geom.V(0, 0), geom.V(15, 0), geom.V(15, 5), geom.V(0, 5)))},
		Features: []pantograph.Feature{{Name: "pins", Kind: pantograph.KindHoles, Diameter: 0.8,
			Centers: []geom.Vec{geom.V(2, 2), geom.V(12, 2)}, Depth: pantograph.Depth{Through: true}}}}
	files := map[string]func(*bytes.Buffer) error{
		"small.pdf": func(b *bytes.Buffer) error { return EncodeTemplatePDF(b, seatPlan(150, 50), A4()) },
		"tiled.pdf": func(b *bytes.Buffer) error { return EncodeTemplatePDF(b, seatPlan(600, 400), Letter()) },
		"small.svg": func(b *bytes.Buffer) error { return EncodeTemplateSVG(b, seatPlan(150, 50)) },
		"part.pdf":  func(b *bytes.Buffer) error { return EncodePartPDF(b, part, seatPlan(150, 50), A4()) },
		"part.svg":  func(b *bytes.Buffer) error { return EncodePartSVG(b, part, seatPlan(150, 50), Letter()) },
	}
	for name, enc := range files {
		t.Run(name, func(t *testing.T) {
			var b bytes.Buffer
			if err := enc(&b); err != nil {
				t.Fatal(err)
			}
			path := filepath.Join(dir, name)
			if err := os.WriteFile(path, b.Bytes(), 0o644); err != nil {
				t.Fatal(err)
			}
			var cmd *exec.Cmd
			if filepath.Ext(name) == ".pdf" {
				cmd = exec.Command("qpdf", "--check", path)
			} else {
				cmd = exec.Command("rsvg-convert", "-o", path+".png", path)
			}
			if out, err := cmd.CombinedOutput(); err != nil {
				t.Errorf("%v: %v\n%s", cmd.Args, err, out)
			}
		})
	}
}
