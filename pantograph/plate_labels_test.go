package pantograph_test

import (
	"fmt"
	"math"
	"path/filepath"
	"testing"

	"panto/geom"
	"panto/pantograph"
	"panto/pantograph/partfile"
)

// The plate's feature numbers, measured on every sample's plate at ratios 5, 8 and 10, with
// the bench machine where it can do the job and without, in both styles: each number's
// letters keep clear of every edge on the plate and of the other lettering, stand near their
// own feature, and every numbered feature has exactly one.

// Measures the numbers are held to, mm (common practice, no source): the gap keeps a printed
// letter from running into an edge (more than a 0.4 mm nozzle's line); the reach is how far a
// number may stand from its feature beyond the stylus diameter a number off the island must
// keep from its wall, and still be read as its own.
const (
	plateNumberGap   = 0.5
	plateNumberReach = 8.0
)

// plateCase is one sample's plate as built.
type plateCase struct {
	name  string
	plan  pantograph.Plan
	plate pantograph.Plate
}

// plateCases builds the plates the test measures.
func plateCases(t *testing.T) []plateCase {
	t.Helper()
	root := filepath.Join("..", "samples")
	bench, err := partfile.ReadMachineFile(filepath.Join(root, "machines", "bench-pantograph.machine.toml"))
	if err != nil {
		t.Fatal(err)
	}
	var out []plateCase
	for _, s := range []string{"pump-port-plate", "clock-bridge", "calibration-coupon"} {
		part, err := partfile.ReadFile(filepath.Join(root, s+".toml"))
		if err != nil {
			t.Fatal(err)
		}
		for _, r := range []float64{5, 8, 10} {
			for _, m := range []*pantograph.Machine{nil, &bench} {
				p, err := pantograph.PlanPart(part, pantograph.Setup{Ratio: r, Cutter: 0.5}, m)
				if err != nil {
					t.Fatal(err)
				}
				if m != nil && !p.Done() {
					continue // the machine cannot do it; make stops before any plate
				}
				for _, style := range []pantograph.PlateStyle{pantograph.StyleWall, pantograph.StyleGroove} {
					pl, err := pantograph.BuildPlate(p, m, pantograph.PlateOptions{Style: style})
					if err != nil {
						t.Fatal(err)
					}
					name := fmt.Sprintf("%s/%g/%s/%s", s, r, map[bool]string{true: "no machine", false: "bench"}[m == nil], style)
					out = append(out, plateCase{name: name, plan: p, plate: pl})
				}
			}
		}
	}
	return out
}

// TestPlateNumbers measures the numbers of every case.
func TestPlateNumbers(t *testing.T) {
	for _, c := range plateCases(t) {
		t.Run(c.name, func(t *testing.T) {
			edges := plateEdges(c.plate)
			boxes := make([]geom.Box, len(c.plate.Labels))
			for i, l := range c.plate.Labels {
				boxes[i] = inkBox(t, l)
			}
			stylus := 0.0
			for _, f := range c.plan.Features {
				stylus = math.Max(stylus, f.Stylus)
			}
			count := map[int]int{}
			for i, l := range c.plate.Labels {
				if l.Feature == 0 {
					continue
				}
				count[l.Feature]++
				b := boxes[i]
				if d := chainsDist(edges, b); d < plateNumberGap {
					t.Errorf("number %s at %v is %.2f mm from an edge of the plate, want at least %v", l.Text, b, d, plateNumberGap)
				}
				for j, o := range boxes {
					if j != i && gapBetween(o, b) < plateNumberGap {
						t.Errorf("number %s at %v is %.2f mm from the lettering %q", l.Text, b, gapBetween(o, b), c.plate.Labels[j].Text)
					}
				}
				own := featureEdges(c, l.Feature)
				if d := chainsDist(own, b); d > plateNumberReach+stylus {
					t.Errorf("number %s stands %.2f mm from its feature, want at most %v + the stylus %v", l.Text, d, plateNumberReach, stylus)
				}
				if c.plate.Style == pantograph.StyleWall {
					checkWallRule(t, c, l.Text, b, stylus)
				}
			}
			for _, f := range c.plan.Features {
				if f.Number > 0 && !f.TemplateBounds.IsEmpty() && count[f.Number] != 1 {
					t.Errorf("%s (#%d) has %d numbers on the plate, want 1", f.Label, f.Number, count[f.Number])
				}
			}
		})
	}
}

// checkWallRule checks that a number on the wall style's base keeps a stylus diameter from the
// island's wall, so the stylus going round never meets a letter; one on the island is wholly on
// it (the edge check has seen it does not cross the wall).
func checkWallRule(t *testing.T, c plateCase, text string, b geom.Box, stylus float64) {
	t.Helper()
	for _, a := range c.plate.Areas {
		if a.What != "profile" || a.Region.Contains(b.Center()) {
			continue
		}
		if d := chainsDist(regionChains(a.Region), b); d < stylus {
			t.Errorf("number %s off the island is %.2f mm from its wall, want at least the stylus %v", text, d, stylus)
		}
	}
}

// inkBox returns the box of a label's letters as they are sunk.
func inkBox(t *testing.T, l pantograph.PlateLabel) geom.Box {
	t.Helper()
	rs, err := pantograph.TextOutlines(l.Text, l.At, l.Height)
	if err != nil {
		t.Fatal(err)
	}
	b := geom.EmptyBox()
	for _, r := range rs {
		b = b.Union(r.Bounds())
	}
	return b
}

// plateEdges returns every edge on the plate but the base's outline and the lettering's own.
func plateEdges(pl pantograph.Plate) [][]geom.Vec {
	var out [][]geom.Vec
	for _, a := range pl.Areas {
		if a.What != "base" && a.What != "label" {
			out = append(out, regionChains(a.Region)...)
		}
	}
	return out
}

// featureEdges returns numbered feature n's edges, seats and groove path on the plate.
func featureEdges(c plateCase, n int) [][]geom.Vec {
	shift := geom.Translate(c.plate.Shift)
	var out [][]geom.Vec
	for _, f := range c.plan.Features {
		if f.Number != n {
			continue
		}
		for _, r := range f.TemplateRegions {
			out = append(out, regionChains(r.Transform(shift))...)
		}
		var path []geom.Vec
		for _, p := range f.Path {
			path = append(path, shift.Apply(p))
		}
		if len(path) > 0 {
			out = append(out, path)
		}
	}
	for _, s := range c.plate.Seats {
		if s.Feature == n {
			out = append(out, regionChains(geom.NewRegion(geom.Circle(s.At, s.Diameter/2)))...)
		}
	}
	return out
}

// regionChains returns a region's contours as closed chains of points, flattened to 0.01 mm.
func regionChains(r geom.Region) [][]geom.Vec {
	var out [][]geom.Vec
	for _, c := range r.Contours() {
		pts := c.Flatten(0.01)
		if len(pts) > 0 {
			out = append(out, append(pts, pts[0]))
		}
	}
	return out
}

// chainsDist returns the least distance from box b to the chains, 0 when one enters it.
func chainsDist(chains [][]geom.Vec, b geom.Box) float64 {
	best := math.Inf(1)
	for _, c := range chains {
		for i := 1; i < len(c); i++ {
			best = math.Min(best, segmentBoxDist(c[i-1], c[i], b))
		}
		if len(c) == 1 {
			best = math.Min(best, pointBoxGap(c[0], b))
		}
	}
	return best
}

// segmentBoxDist returns the distance from segment p–q to box b: 0 when they meet (sampled
// finely enough for a test: a tenth of the gap asked for), else the least of the end points'
// and the box corners' distances.
func segmentBoxDist(p, q geom.Vec, b geom.Box) float64 {
	n := int(math.Ceil(p.Dist(q)/(plateNumberGap/10))) + 1
	best := math.Inf(1)
	for k := 0; k <= n; k++ {
		best = math.Min(best, pointBoxGap(p.Lerp(q, float64(k)/float64(n)), b))
	}
	for _, c := range []geom.Vec{b.Min, b.Max, geom.V(b.Min.X, b.Max.Y), geom.V(b.Max.X, b.Min.Y)} {
		best = math.Min(best, geom.Line(p, q).DistanceTo(c))
	}
	return best
}

// pointBoxGap returns the distance from p to box b, 0 inside.
func pointBoxGap(p geom.Vec, b geom.Box) float64 {
	dx := math.Max(0, math.Max(b.Min.X-p.X, p.X-b.Max.X))
	dy := math.Max(0, math.Max(b.Min.Y-p.Y, p.Y-b.Max.Y))
	return math.Hypot(dx, dy)
}

// gapBetween returns the gap between two boxes, 0 when they overlap.
func gapBetween(a, b geom.Box) float64 {
	dx := math.Max(0, math.Max(a.Min.X-b.Max.X, b.Min.X-a.Max.X))
	dy := math.Max(0, math.Max(a.Min.Y-b.Max.Y, b.Min.Y-a.Max.Y))
	return math.Hypot(dx, dy)
}
