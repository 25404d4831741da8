package drawing

import (
	"fmt"
	"path/filepath"
	"strconv"
	"testing"

	"panto/geom"
	"panto/pantograph"
	"panto/pantograph/partfile"
)

// These tests measure the feature numbers of every sample's drawings at ratios 5, 8 and 10,
// with each machine file that can do the job and without one, from what the writers draw (a
// recorder in place of the PDF renderer): each number's ink keeps clear of every line, arrow
// and other text, stands within labelPromise of its own feature, and every numbered feature has
// exactly one.

// labelPromise is the farthest, mm on paper, a number may stand from its own feature: near
// enough to be read as its own at a glance (common practice, no source).
const labelPromise = 7.0

// minLabelGap is the least gap, mm on paper, a number keeps from a line's ink or another
// text: a visible gap at arm's length (common practice, no source; the placer keeps
// labelClear, which is more).
const minLabelGap = 0.3

// sampleCase is one sample planned at one ratio, with or without a machine file.
type sampleCase struct {
	name string
	part pantograph.Part
	plan pantograph.Plan
}

// sampleCases plans every sample at ratios 5, 8 and 10 with a 0.5 mm cutter, without a
// machine and with each machine file that can do the job as planned.
func sampleCases(t *testing.T) []sampleCase {
	t.Helper()
	root := filepath.Join("..", "..", "samples")
	var out []sampleCase
	for _, s := range []string{"pump-port-plate", "clock-bridge", "calibration-coupon"} {
		part, err := partfile.ReadFile(filepath.Join(root, s+".toml"))
		if err != nil {
			t.Fatal(err)
		}
		for _, r := range []float64{5, 8, 10} {
			for _, mname := range []string{"", "bench-pantograph", "inch-engraver"} {
				var m *pantograph.Machine
				if mname != "" {
					mm, err := partfile.ReadMachineFile(filepath.Join(root, "machines", mname+".machine.toml"))
					if err != nil {
						t.Fatal(err)
					}
					m = &mm
				}
				p, err := pantograph.PlanPart(part, pantograph.Setup{Ratio: r, Cutter: 0.5}, m)
				if err != nil {
					t.Fatal(err)
				}
				if m != nil && !p.Done() {
					continue // the machine cannot do it; make stops before any drawing
				}
				out = append(out, sampleCase{name: fmt.Sprintf("%s/%g/%s", s, r, orNone(mname)), part: part, plan: p})
			}
		}
	}
	return out
}

func orNone(s string) string {
	if s == "" {
		return "no machine"
	}
	return s
}

// featureShape is a feature's drawn geometry in page mm and the number it should carry.
type featureShape struct {
	number int
	chains geom.PolylineIndex
}

// checkNumbers checks the numbers lettered on one recorded picture: the texts "#n" whose ink
// lies in area.
func checkNumbers(t *testing.T, r *recorder, area geom.Box, shapes []featureShape) {
	t.Helper()
	seen := map[int][]geom.Box{}
	for i, tx := range r.texts {
		m := numberText.FindStringSubmatch(tx.s)
		if m == nil || !tx.box.Overlaps(area) {
			continue
		}
		n, _ := strconv.Atoi(m[1])
		seen[n] = append(seen[n], tx.box)
		if gap, l := r.lineGap(tx.box); gap < minLabelGap {
			t.Errorf("%s at %v is %.2f mm from a line (%d points from %v), want at least %v", tx.s, tx.box, gap, len(l.pts), l.pts[0], minLabelGap)
		}
		for _, f := range r.fills {
			if f.Gap(tx.box) < minLabelGap {
				t.Errorf("%s at %v touches an arrowhead at %v", tx.s, tx.box, f)
			}
		}
		for j, other := range r.texts {
			if j != i && other.box.Gap(tx.box) < minLabelGap {
				t.Errorf("%s at %v touches the text %q at %v", tx.s, tx.box, other.s, other.box)
			}
		}
	}
	for _, f := range shapes {
		boxes := seen[f.number]
		if len(boxes) != 1 {
			t.Errorf("#%d is lettered %d times, want once", f.number, len(boxes))
			continue
		}
		if d := f.chains.BoxDistance(boxes[0], 1e9); d > labelPromise {
			t.Errorf("#%d stands %.2f mm from its feature, want at most %v", f.number, d, labelPromise)
		}
		delete(seen, f.number)
	}
	for n := range seen {
		t.Errorf("#%d is lettered but no feature has that number", n)
	}
}

// TestPartNumbers measures the numbers on page one of every sample's part drawing.
func TestPartNumbers(t *testing.T) {
	fonts, err := LoadFonts()
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range sampleCases(t) {
		for _, paper := range []Paper{A4(), Letter()} {
			t.Run(c.name+"/"+paper.Name, func(t *testing.T) {
				l := newPartLayout(c.part, c.plan, paper, fonts)
				pages := partPages(l, paper)
				r := record(fonts, paper.W, paper.H, pages[0].draw)
				// the picture is everything above the feature table's heading
				area := geom.Box{Min: geom.V(0, tableTop(t, r)), Max: geom.V(paper.W, paper.H)}
				off := geom.Translate(geom.V(Margin, Margin))
				var shapes []featureShape
				for i, f := range c.part.All() {
					if n := l.numbers[i]; n > 0 {
						shapes = append(shapes, featureShape{number: n, chains: partShape(f, l.t.Then(off))})
					}
				}
				checkNumbers(t, r, area, shapes)
			})
		}
	}
}

// tableTop returns the top of the ink of the feature table's heading.
func tableTop(t *testing.T, r *recorder) float64 {
	for _, tx := range r.texts {
		if tx.s == "Features" {
			return tx.box.Max.Y
		}
	}
	t.Fatal("no feature table on page one")
	return 0
}

// partShape returns a part feature's exact outline mapped by tr, finely flattened.
func partShape(f pantograph.Feature, tr geom.Transform) geom.PolylineIndex {
	var out geom.PolylineIndex
	add := func(c geom.Contour) {
		pts := c.Transform(tr).Flatten(0.005)
		out.Add(append(pts, pts[0]))
	}
	switch f.Kind {
	case pantograph.KindHoles:
		for i := range f.Centers {
			add(f.HoleContour(i))
		}
	case pantograph.KindGroove:
		out.Add(mapPoints(f.Path, tr))
	default:
		for _, c := range f.Region.Contours() {
			add(c)
		}
	}
	return out
}

// templateShapes returns each numbered planned feature's traced edges, seats and groove path in
// the drawing frame of l mapped by tr.
func templateShapes(l templateLayout, tr geom.Transform) []featureShape {
	t := geom.Translate(l.origin).Then(tr)
	var out []featureShape
	for _, f := range l.p.Features {
		if f.Number == 0 {
			continue
		}
		s := featureShape{number: f.Number}
		for _, r := range f.TemplateRegions {
			for _, c := range r.Contours() {
				pts := c.Transform(t).Flatten(0.005)
				s.chains.Add(append(pts, pts[0]))
			}
		}
		r := f.Stylus / 2 // the seat's mark as drawn: the stylus's circle, or a small one for a point
		if f.Tip == pantograph.TipPointed || r < minSeatMark {
			r = minSeatMark
		}
		for _, p := range f.Seats {
			s.chains.Add(circleChain(t.Apply(p), r))
		}
		if len(f.Path) > 1 {
			s.chains.Add(mapPoints(f.Path, t))
		}
		if !s.chains.Empty() {
			out = append(out, s)
		}
	}
	return out
}

// TestTemplateNumbers measures the numbers on every sample's template drawing, whole as the
// SVG has it.
func TestTemplateNumbers(t *testing.T) {
	fonts, err := LoadFonts()
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range sampleCases(t) {
		t.Run(c.name, func(t *testing.T) {
			l := newTemplateLayout(c.plan, fonts)
			k := l.sketch()
			r := record(fonts, l.size.X, l.size.Y, func(pen Pen) { k.render(pen, geom.Vec{}, nil) })
			shapes := templateShapes(l, geom.Identity())
			checkNumbers(t, r, geom.Box{Max: l.size}, shapes)
		})
	}
}
