//go:build reference

package stl

import (
	"bytes"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"testing"

	"panto/internal/reftool"
	"panto/pantograph"
	"panto/pantograph/partfile"
)

// TestAdmeshSamples writes every sample's plate, in both styles, and has admesh (an
// independent STL checker, a Debian package) read it: it must find every facet connected,
// repair nothing, and measure the volume we do.
func TestAdmeshSamples(t *testing.T) {
	if _, err := exec.LookPath("admesh"); err != nil {
		reftool.Missing(t, "admesh is not installed (apt-get install admesh)")
	}
	samples, err := filepath.Glob(filepath.Join("..", "..", "samples", "*.toml"))
	if err != nil || len(samples) == 0 {
		t.Fatalf("no samples: %v", err)
	}
	for _, path := range samples {
		for _, o := range []pantograph.PlateOptions{{}, {Style: pantograph.StyleGroove, Seat: pantograph.SeatCone}} {
			t.Run(fmt.Sprintf("%s %s", filepath.Base(path), o.Style), func(t *testing.T) {
				part, err := partfile.ReadFile(path)
				if err != nil {
					t.Fatal(err)
				}
				p, err := pantograph.PlanPart(part, pantograph.Setup{Ratio: 10, Cutter: 0.5}, nil)
				if err != nil {
					t.Fatal(err)
				}
				pl, err := pantograph.BuildPlate(p, nil, o)
				if err != nil {
					t.Fatal(err)
				}
				m, err := pl.Mesh()
				if err != nil {
					t.Fatal(err)
				}
				file := filepath.Join(t.TempDir(), "template.stl")
				var b bytes.Buffer
				if err := Encode(&b, m, "admesh check"); err != nil {
					t.Fatal(err)
				}
				if err := os.WriteFile(file, b.Bytes(), 0o644); err != nil {
					t.Fatal(err)
				}
				out, err := exec.Command("admesh", file).CombinedOutput()
				if err != nil {
					t.Fatalf("admesh: %v\n%s", err, out)
				}
				checkAdmesh(t, string(out), len(m.Triangles), m.Volume())
			})
		}
	}
}

// checkAdmesh reads admesh's report: the counts of repairs must all be zero, the facets all
// there, and its volume (computed in float32) ours within float32 rounding.
func checkAdmesh(t *testing.T, out string, facets int, volume float64) {
	t.Helper()
	zero := []string{
		`Facets with 1 disconnected edge\s*:\s*(\d+)`,
		`Facets with 2 disconnected edges\s*:\s*(\d+)`,
		`Facets with 3 disconnected edges\s*:\s*(\d+)`,
		`Total disconnected facets\s*:\s*(\d+)`,
		`Degenerate facets\s*:\s*(\d+)`,
		`Edges fixed\s*:\s*(\d+)`,
		`Facets removed\s*:\s*(\d+)`,
		`Facets added\s*:\s*(\d+)`,
		`Facets reversed\s*:\s*(\d+)`,
		`Backwards edges\s*:\s*(\d+)`,
		`Normals fixed\s*:\s*(\d+)`,
	}
	for _, pat := range zero {
		if got := admeshNumber(t, out, pat); got != 0 {
			t.Errorf("admesh %s: got %g, want 0", pat, got)
		}
	}
	if got := admeshNumber(t, out, `Number of parts\s*:\s*(\d+)`); got != 1 {
		t.Errorf("admesh parts: got %g, want 1", got)
	}
	if got := admeshNumber(t, out, `Number of facets\s*:\s*(\d+)`); int(got) != facets {
		t.Errorf("admesh facets: got %g, want %d", got, facets)
	}
	// float32 corners near 300 mm are good to 3e-5 mm; over a plate's surface (a few 1e5 mm²)
	// that moves the volume by about 10 mm³ at most: 1e-4 of a plate's volume covers it.
	if got := admeshNumber(t, out, `Volume\s*:\s*([0-9.]+)`); abs(got-volume) > 1e-4*volume {
		t.Errorf("admesh volume: got %.3f, want %.3f", got, volume)
	}
}

// admeshNumber returns the number the pattern's group captures in admesh's report.
func admeshNumber(t *testing.T, out, pat string) float64 {
	t.Helper()
	m := regexp.MustCompile(pat).FindStringSubmatch(out)
	if m == nil {
		t.Fatalf("admesh report lacks %s:\n%s", pat, out)
	}
	v, err := strconv.ParseFloat(m[1], 64)
	if err != nil {
		t.Fatal(err)
	}
	return v
}

func abs(v float64) float64 {
	if v < 0 {
		return -v
	}
	return v
}
