package drawing

import (
	"math"
	"testing"

	"panto/geom"
)

// minMarkGap is the least gap, mm, between an alignment mark and anything of the template: a
// mark that touches a line could be read as part of it (common practice, no source; the
// tiler keeps markClear, which is more).
const minMarkGap = 1.0

// TestTiledTemplates checks every sample's template that needs more than one page, on A4 and
// Letter, from what the PDF writer is given page by page: no text is cut by a page's edge,
// every text of the whole drawing is printed whole on some page, every pair of neighbouring
// pages shares two alignment marks, and each mark (a cross in a square, never a circle) keeps
// clear of every line and text of the template.
func TestTiledTemplates(t *testing.T) {
	fonts, err := LoadFonts()
	if err != nil {
		t.Fatal(err)
	}
	tiled := 0
	for _, c := range sampleCases(t) {
		for _, paper := range []Paper{A4(), Letter()} {
			l := newTemplateLayout(c.plan, fonts)
			tl := tile(l.size, paper)
			if tl.nx*tl.ny == 1 {
				continue
			}
			tiled++
			t.Run(c.name+"/"+paper.Name, func(t *testing.T) {
				k := l.sketch()
				pages, marks := templatePages(l, k, paper)
				whole := record(fonts, l.size.X, l.size.Y, func(pen Pen) { k.render(pen, geom.Vec{}, nil) })
				shown := make([]bool, len(whole.texts))
				n := 0
				for j := tl.ny - 1; j >= 0; j-- {
					for i := 0; i < tl.nx; i++ {
						off := geom.V(Margin, Margin).Sub(geom.V(float64(i)*tl.step.X, float64(j)*tl.step.Y))
						r := record(fonts, tl.paper.W, tl.paper.H, pages[n].draw)
						n++
						checkPageTexts(t, r, tl, n, off, whole, shown)
					}
				}
				for i, ok := range shown {
					if !ok {
						t.Errorf("%q at %v is printed whole on no page", whole.texts[i].s, whole.texts[i].box)
					}
				}
				checkMarks(t, whole, marks, tl)
			})
		}
	}
	if tiled == 0 {
		t.Fatal("no sample needs tiles: the test measures nothing")
	}
}

// checkPageTexts checks that each text on page n lies wholly inside its printable area or
// wholly in its margin (the page's own heading), and marks the drawing's texts it shows.
func checkPageTexts(t *testing.T, r *recorder, tl tiling, n int, off geom.Vec, whole *recorder, shown []bool) {
	t.Helper()
	win := geom.Box{Min: geom.V(Margin, Margin), Max: geom.V(tl.paper.W-Margin, tl.paper.H-Margin)}
	for _, tx := range r.texts {
		in := tx.box.Min.X >= win.Min.X && tx.box.Min.Y >= win.Min.Y && tx.box.Max.X <= win.Max.X && tx.box.Max.Y <= win.Max.Y
		if !in {
			if tx.box.Overlaps(win) {
				t.Errorf("page %d: %q at %v is cut by the edge of the printable area", n, tx.s, tx.box)
			}
			continue
		}
		b := moveBox(tx.box, off.Neg())
		for i, w := range whole.texts {
			if w.s == tx.s && w.box.Min.Dist(b.Min) < 1e-6 && w.box.Max.Dist(b.Max) < 1e-6 {
				shown[i] = true
			}
		}
	}
}

// checkMarks checks the alignment marks on the whole drawing.
func checkMarks(t *testing.T, whole *recorder, marks []geom.Vec, tl tiling) {
	t.Helper()
	own := func(l recLine) bool {
		for _, m := range marks {
			b := markBox(m).Expand(0.1)
			if l.box.Min.X >= b.Min.X && l.box.Min.Y >= b.Min.Y && l.box.Max.X <= b.Max.X && l.box.Max.Y <= b.Max.Y {
				return true
			}
		}
		return false
	}
	for _, l := range whole.lines {
		if !own(l) {
			continue
		}
		// a seat is a circle; a mark's lines are straight: a cross, and a square of 4 corners
		if len(l.pts) > 5 {
			t.Errorf("a mark has a line of %d points (a curve) at %v", len(l.pts), l.pts[0])
		}
	}
	for _, m := range marks {
		b := markBox(m)
		for _, l := range whole.lines {
			if own(l) {
				continue
			}
			if d := geom.NewPolylineIndex([][]geom.Vec{l.pts}).BoxDistance(b, 10) - l.width/2; d < minMarkGap {
				t.Errorf("mark at %v is %.2f mm from a line of the template, want at least %v", m, d, minMarkGap)
			}
		}
		for _, tx := range whole.texts {
			if d := tx.box.Gap(b); d < minMarkGap {
				t.Errorf("mark at %v is %.2f mm from %q", m, d, tx.s)
			}
		}
	}
	for i := 0; i < tl.nx; i++ {
		for j := 0; j < tl.ny; j++ {
			if i+1 < tl.nx && sharedMarks(tl, marks, i, j, i+1, j) < 2 {
				t.Errorf("tiles (%d, %d) and (%d, %d) share fewer than two marks", i, j, i+1, j)
			}
			if j+1 < tl.ny && sharedMarks(tl, marks, i, j, i, j+1) < 2 {
				t.Errorf("tiles (%d, %d) and (%d, %d) share fewer than two marks", i, j, i, j+1)
			}
		}
	}
}

// sharedMarks counts the marks wholly inside the printable areas of both tiles.
func sharedMarks(tl tiling, marks []geom.Vec, i0, j0, i1, j1 int) int {
	n := 0
	for _, m := range marks {
		b := markBox(m)
		ok := true
		for _, ij := range [][2]int{{i0, j0}, {i1, j1}} {
			lo := geom.V(float64(ij[0])*tl.step.X, float64(ij[1])*tl.step.Y)
			hi := lo.Add(tl.window)
			ok = ok && b.Min.X >= lo.X && b.Min.Y >= lo.Y && b.Max.X <= hi.X && b.Max.Y <= hi.Y
		}
		if ok {
			n++
		}
	}
	return n
}

// TestMarkCentres checks the places tried along a band: from the middle outwards, within it.
func TestMarkCentres(t *testing.T) {
	got := markCentres(0, 4)
	want := []float64{2, 1, 3, 0, 4} // derived: middle 2, then 1 mm either side, then 2
	if len(got) != len(want) {
		t.Fatalf("got %v, want %v", got, want)
	}
	for i := range want {
		if math.Abs(got[i]-want[i]) > 1e-12 {
			t.Errorf("got %v, want %v", got, want)
		}
	}
}
