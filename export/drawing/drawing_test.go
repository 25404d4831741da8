package drawing

import (
	"bytes"
	"math"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

// seatPlan is a template w × h mm with two seats 100 mm apart at (20, 20) and (120, 20).
func seatPlan(w, h float64) pantograph.Plan {
	return pantograph.Plan{Part: "test plate", Setup: pantograph.Setup{Ratio: 10}, Bounds: geom.Box{Max: geom.V(w, h)},
		Features: []pantograph.PlannedFeature{{Name: "pins", Kind: pantograph.KindHoles, Number: 1,
			Stylus: 4, Seats: []geom.Vec{geom.V(20, 20), geom.V(120, 20)}}}}
}

// TestTemplatePDFTrueSize reads the drawing commands of an uncompressed template PDF: the page
// is scaled from mm to points once, and the two seats' crosses, 100 mm apart on the template,
// are 283.46 pt apart (derived: 100 / 25.4 × 72 = 283.4646).
func TestTemplatePDFTrueSize(t *testing.T) {
	var b bytes.Buffer
	if err := encodeTemplatePDF(&b, seatPlan(150, 50), A4(), false); err != nil {
		t.Fatal(err)
	}
	cm := regexp.MustCompile(`([0-9.]+) 0 0 ([0-9.]+) 0 0 cm`).FindSubmatch(b.Bytes())
	if cm == nil {
		t.Fatal("no mm-to-point scale in the page")
	}
	k, _ := strconv.ParseFloat(string(cm[1]), 64)
	// a seat's horizontal cross line: "x0 y m x1 y l S", 2 × (stylus radius + 1.5) = 7 mm long
	lines := regexp.MustCompile(`([0-9.]+) ([0-9.]+) m ([0-9.]+) ([0-9.]+) l S`).FindAllSubmatch(b.Bytes(), -1)
	var starts []float64
	for _, l := range lines {
		x0, _ := strconv.ParseFloat(string(l[1]), 64)
		x1, _ := strconv.ParseFloat(string(l[3]), 64)
		if string(l[2]) == string(l[4]) && math.Abs(x1-x0-7) < 1e-6 {
			starts = append(starts, x0)
		}
	}
	if len(starts) != 2 {
		t.Fatalf("found %d seat crosses, want 2", len(starts))
	}
	if got, want := (starts[1]-starts[0])*k, 283.4646; math.Abs(got-want) > 0.001 {
		t.Errorf("seats 100 mm apart: got %.4f pt, want %.4f pt", got, want)
	}
}

// TestTemplateSVGSize checks that width and height are in mm and match the viewBox, and that
// the width is the template's plus the drawing's side margins.
func TestTemplateSVGSize(t *testing.T) {
	var b bytes.Buffer
	if err := EncodeTemplateSVG(&b, seatPlan(300, 120)); err != nil {
		t.Fatal(err)
	}
	m := regexp.MustCompile(`width="([0-9.]+)mm" height="([0-9.]+)mm" viewBox="0 0 ([0-9.]+) ([0-9.]+)"`).FindSubmatch(b.Bytes())
	if m == nil {
		t.Fatalf("no size in mm with a viewBox: %.200s", b.String())
	}
	if string(m[1]) != string(m[3]) || string(m[2]) != string(m[4]) {
		t.Errorf("size %s × %s mm but viewBox %s × %s", m[1], m[2], m[3], m[4])
	}
	w, _ := strconv.ParseFloat(string(m[1]), 64)
	h, _ := strconv.ParseFloat(string(m[2]), 64)
	// derived: 300 + 16 left + 3 right; 120 + 38 footer + 2 × 3
	if math.Abs(w-319) > 1e-9 || math.Abs(h-164) > 1e-9 {
		t.Errorf("got %v × %v mm, want 319 × 164", w, h)
	}
}

// TestTiling checks page counts against hand-worked tilings on A4 (window 186 × 273 mm upright,
// overlap 15), that every alignment mark is on at least two pages and every pair of
// neighbouring pages shares two.
func TestTiling(t *testing.T) {
	tests := []struct {
		name   string
		size   geom.Vec
		nx, ny int
		turned bool
	}{
		{"fits upright", geom.V(180, 260), 1, 1, false},
		{"fits turned", geom.V(260, 180), 1, 1, true},
		// derived: upright ⌈(619−15)/171⌉ = 4 × ⌈(444−15)/258⌉ = 2 = 8 pages; turned 3 × 3 = 9
		{"large", geom.V(619, 444), 4, 2, false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			tl := tile(tc.size, A4())
			if tl.nx != tc.nx || tl.ny != tc.ny || (tl.paper.W > tl.paper.H) != tc.turned {
				t.Errorf("got %d × %d turned %v, want %d × %d turned %v", tl.nx, tl.ny, tl.paper.W > tl.paper.H, tc.nx, tc.ny, tc.turned)
			}
			if x := float64(tl.nx-1)*tl.step.X + tl.window.X; x < tc.size.X {
				t.Errorf("tiles reach %v of %v mm across", x, tc.size.X)
			}
			fonts, err := LoadFonts()
			if err != nil {
				t.Fatal(err)
			}
			marks := tl.placeMarks(newSketch(fonts), func(geom.Vec) bool { return false })
			for _, m := range marks {
				if n := pagesShowing(tl, m); n < 2 {
					t.Errorf("mark %v is on %d page(s)", m, n)
				}
			}
			// derived: (nx − 1) × ny pairs side by side and nx × (ny − 1) one above the other
			if got, want := len(marks), 2*((tl.nx-1)*tl.ny+tl.nx*(tl.ny-1)); got != want {
				t.Errorf("got %d marks, want %d", got, want)
			}
		})
	}
}

// pagesShowing counts the tiles whose window holds p with room for the mark around it.
func pagesShowing(tl tiling, p geom.Vec) int {
	n := 0
	for i := 0; i < tl.nx; i++ {
		for j := 0; j < tl.ny; j++ {
			lo := geom.V(float64(i)*tl.step.X, float64(j)*tl.step.Y)
			if p.X-5 >= lo.X && p.X+5 <= lo.X+tl.window.X && p.Y-5 >= lo.Y && p.Y+5 <= lo.Y+tl.window.Y {
				n++
			}
		}
	}
	return n
}

// TestTiledPDFPages counts the pages of a large template's PDF.
func TestTiledPDFPages(t *testing.T) {
	var b bytes.Buffer
	// derived: a 600 × 400 template is 619 × 444 mm drawn: 8 upright A4 pages (see TestTiling)
	if err := encodeTemplatePDF(&b, seatPlan(600, 400), A4(), false); err != nil {
		t.Fatal(err)
	}
	if got := len(regexp.MustCompile(`/Type ?/Page[^s]`).FindAll(b.Bytes(), -1)); got != 8 {
		t.Errorf("got %d pages, want 8", got)
	}
}

func TestPaperNamed(t *testing.T) {
	tests := []struct {
		name string
		w, h float64
		ok   bool
	}{
		{"a4", 210, 297, true},         // ISO 216
		{"Letter", 215.9, 279.4, true}, // 8.5 × 11 in
		{"a3", 0, 0, false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			p, err := PaperNamed(tc.name)
			if (err == nil) != tc.ok || math.Abs(p.W-tc.w) > 1e-9 || math.Abs(p.H-tc.h) > 1e-9 {
				t.Errorf("got %v %v, want %v × %v ok %v", p, err, tc.w, tc.h, tc.ok)
			}
		})
	}
}

func TestPartScale(t *testing.T) {
	tests := []struct {
		name string
		w, h float64
		want float64
	}{
		// derived on A4: room 186 − 16 − 2 × 7 = 156 mm across, (273 − 24) × 0.6 − 16 − 7 =
		// 126.4 up (the dimension lines' room and the numbers' reach each side)
		{"22 × 14 plate", 22, 14, 5},  // 8 × 22 = 176 > 156; 5 × 22 = 110
		{"35 × 17 bridge", 35, 17, 4}, // 5 × 35 = 175 > 156; 4 × 35 = 140
		{"3 × 2 pin", 3, 2, 50},       // 150 fits
		{"300 × 100", 300, 100, 0.5},  // 1 × 300 > 156
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			part := pantograph.Part{Name: "x", Profile: pantograph.Feature{Kind: pantograph.KindProfile,
				Region: geom.NewRegion(geom.Polygon(geom.V(0, 0), geom.V(tc.w, 0), geom.V(tc.w, tc.h), geom.V(0, tc.h)))}}
			var b bytes.Buffer
			if err := EncodePartSVG(&b, part, pantograph.Plan{}, A4()); err != nil {
				t.Fatal(err)
			}
			if want := "Scale " + trim(tc.want) + ":1"; !strings.Contains(b.String(), want) {
				t.Errorf("drawing does not say %q", want)
			}
		})
	}
}
