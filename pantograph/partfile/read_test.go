package partfile

import (
	"errors"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

// head is a part file's first lines, shared by the table tests below; it ends on line 4.
const head = `name = "test"
[stock]
thickness = 1
[profile]
`

func near(a, b, tol float64) bool { return math.Abs(a-b) <= tol }

func read(t *testing.T, src string) pantograph.Part {
	t.Helper()
	p, err := Read("t.toml", []byte(src))
	if err != nil {
		t.Fatalf("Read: %v", err)
	}
	return p
}

func TestReadTop(t *testing.T) {
	p := read(t, `name = "pump port plate"
units = "mm"
datum = [2, 3]
[stock]
material = "brass"
thickness = 1.2
[profile]
rect = { min = [0, 0], size = [14, 8] }
`)
	if p.Name != "pump port plate" || p.Units != pantograph.MM || p.Datum != geom.V(2, 3) ||
		p.Stock.Material != "brass" || p.Stock.Thickness != 1.2 || p.Source != "t.toml" {
		t.Errorf("got %+v", p)
	}
	if got := p.Profile.Region.Area(); !near(got, 14*8, 1e-9) { // derived: 14 × 8
		t.Errorf("profile area: got %v, want %v", got, 14*8)
	}
	if p.Profile.Where.Line != 7 || !p.Profile.Depth.Through || p.Profile.Kind != pantograph.KindProfile {
		t.Errorf("profile: got %+v", p.Profile)
	}
}

func TestReadDefaults(t *testing.T) {
	p := read(t, "[profile]\ncircle = { center = [0, 0], diameter = 2 }\n")
	if p.Units != pantograph.MM {
		t.Errorf("units: got %q, want mm (the default)", p.Units)
	}
	if p.Datum != (geom.Vec{}) {
		t.Errorf("datum: got %v, want (0, 0) (the default)", p.Datum)
	}
	if p.Stock != (pantograph.Stock{}) || p.Name != "" || len(p.Features) != 0 {
		t.Errorf("got %+v, want no stock, name or features", p)
	}
}

func TestReadInches(t *testing.T) {
	p := read(t, `units = "in"
datum = [1, 0]
[stock]
thickness = 0.0625
[profile]
rect = { min = [0, 0], size = [2, 1], corner = 0.1 }
[[holes]]
diameter = 0.125
depth = 0.05
at = [[0.5, 0.5]]
[[groove]]
points = [[0.1, 0.1], [0.2, 0.1]]
width = 0.01
depth = "through"
`)
	// Every value is inches × 25.4, exact by the definition of the inch.
	checks := []struct {
		name      string
		got, want float64
	}{
		{"datum x", p.Datum.X, 25.4},
		{"thickness", p.Stock.Thickness, 1.5875},
		{"profile width", p.Profile.Region.Bounds().Size().X, 50.8},
		{"hole diameter", p.Features[0].Diameter, 3.175},
		{"hole depth", p.Features[0].Depth.MM, 1.27},
		{"hole x", p.Features[0].Centers[0].X, 12.7},
		{"groove width", p.Features[1].Width, 0.254},
		{"groove end", p.Features[1].Path[1].X, 5.08},
		// derived: rounded rectangle w·h − (4 − π)r², in mm
		{"profile area", p.Profile.Region.Area(), 50.8*25.4 - (4-math.Pi)*2.54*2.54},
	}
	for _, c := range checks {
		if !near(c.got, c.want, 1e-9) {
			t.Errorf("%s: got %v, want %v", c.name, c.got, c.want)
		}
	}
	if p.Units != pantograph.Inch {
		t.Errorf("units: got %q, want in", p.Units)
	}
}

func TestReadShapes(t *testing.T) {
	tests := []struct {
		name  string
		shape string
		area  float64
	}{
		// derived: 10 × 5 rectangle
		{"points", "points = [[0, 0], [10, 0], [10, 5], [0, 5]]", 50},
		// derived: one corner rounded by r = 1 removes (1 − π/4)·r²
		{"points with a corner radius", "points = [[0, 0], [10, 0, 1], [10, 5], [0, 5]]", 50 - (1 - math.Pi/4)},
		// derived: π r², r = 2
		{"circle", "circle = { center = [3, 3], diameter = 4 }", 4 * math.Pi},
		// derived: w·h − (4 − π)r²
		{"rect", "rect = { min = [1, 1], size = [6, 4], corner = 0.5 }", 24 - (4-math.Pi)*0.25},
		// derived: 10 × 4 rectangle with a half disc of radius 2 on its right end
		{"path with an arc", "path = [ { at = [0, 0] }, { line = [10, 0] }, { arc = [10, 4], through = [12, 2] }, { line = [0, 4] } ]",
			40 + 2*math.Pi},
		// derived: the same path left open closes with a straight line back to the start
		{"path closed for you", "path = [ { at = [0, 4] }, { line = [0, 0] }, { line = [10, 0] }, { arc = [10, 4], through = [12, 2] } ]",
			40 + 2*math.Pi},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			p := read(t, head+tc.shape+"\n")
			if err := p.Profile.Region.Validate(); err != nil {
				t.Fatalf("profile does not validate: %v", err)
			}
			if got := p.Profile.Region.Area(); !near(got, tc.area, 1e-9) {
				t.Errorf("area: got %v, want %v", got, tc.area)
			}
		})
	}
}

func TestReadFeatures(t *testing.T) {
	p := read(t, head+`rect = { min = [0, 0], size = [20, 10] }
[[slot]]
name = "adjuster"
from = [3, 4]
to = [6, 4]
width = 0.8
depth = "through"
[[cutout]]
circle = { center = [14, 5], diameter = 3 }
[[cutout]]
name = "slotted"
from = [10, 8]
to = [12, 8]
width = 1
[[pocket]]
name = "seat"
rect = { min = [2, 6], size = [3, 2], corner = 0.3 }
depth = 0.4
[[holes]]
name = "ports"
diameter = 0.4
depth = "through"
at = [[1, 1], [19, 1]]
[[groove]]
name = "index mark"
points = [[7, 0.5], [7, 1.5]]
depth = 0.05
`)
	want := []struct {
		kind pantograph.Kind
		name string
		line int
	}{
		{pantograph.KindSlot, "adjuster", 6},
		{pantograph.KindCutout, "cutout 1", 12},
		{pantograph.KindCutout, "slotted", 14},
		{pantograph.KindPocket, "seat", 19},
		{pantograph.KindHoles, "ports", 23},
		{pantograph.KindGroove, "index mark", 28},
	}
	if len(p.Features) != len(want) {
		t.Fatalf("got %d features, want %d", len(p.Features), len(want))
	}
	for i, w := range want {
		f := p.Features[i]
		if f.Kind != w.kind || f.Name != w.name || f.Where.Line != w.line {
			t.Errorf("feature %d: got %s %q line %d, want %s %q line %d", i, f.Kind, f.Name, f.Where.Line, w.kind, w.name, w.line)
		}
	}
	slot := p.Features[0]
	// derived: stadium area = 2r·L + π r², r = 0.4, L = 3
	if got, want := slot.Region.Area(), 0.8*3+math.Pi*0.16; !near(got, want, 1e-9) {
		t.Errorf("slot area: got %v, want %v", got, want)
	}
	if !slot.Depth.Through || slot.Width != 0.8 || slot.From != geom.V(3, 4) || slot.To != geom.V(6, 4) {
		t.Errorf("slot: got %+v", slot)
	}
	if c := p.Features[1]; !c.Depth.Through || !near(c.Region.Area(), 2.25*math.Pi, 1e-9) { // derived: π·1.5²
		t.Errorf("circle cut-out: got depth %v area %v", c.Depth, c.Region.Area())
	}
	if c := p.Features[2]; !near(c.Region.Area(), 2+math.Pi/4, 1e-9) { // derived: 1×2 + π·0.5²
		t.Errorf("slot cut-out area: got %v", c.Region.Area())
	}
	if pk := p.Features[3]; pk.Depth != (pantograph.Depth{MM: 0.4}) {
		t.Errorf("pocket depth: got %v, want 0.4 mm", pk.Depth)
	}
	if h := p.Features[4]; h.Diameter != 0.4 || len(h.Centers) != 2 || h.Centers[1] != geom.V(19, 1) {
		t.Errorf("holes: got %+v", h)
	}
	// Lines counted in the source above: the [[holes]] table starts on line 23.
	for key, want := range map[string]int{"name": 24, "diameter": 25, "depth": 26, "at": 27, "at[1]": 27} {
		if got := p.Features[4].WhereKey(key).Line; got != want {
			t.Errorf("holes key %s: got line %d, want %d", key, got, want)
		}
	}
	if got := p.Features[4].WhereKey("nosuch").Line; got != 23 {
		t.Errorf("unknown key: got line %d, want the table's line 23", got)
	}
	if g := p.Features[5]; len(g.Path) != 2 || g.Width != 0 || g.Depth.MM != 0.05 {
		t.Errorf("groove: got %+v", g)
	}
}

// TestReadBadFiles reads every file in testdata/parts/bad, whose first line says what must go
// wrong: "# want line N: fragment". The mistake is either a reading error or the first error
// pantograph.Check finds.
func TestReadBadFiles(t *testing.T) {
	files, err := filepath.Glob("../../testdata/parts/bad/*.toml")
	if err != nil || len(files) == 0 {
		t.Fatalf("no bad part files found: %v", err)
	}
	for _, file := range files {
		t.Run(filepath.Base(file), func(t *testing.T) {
			src, err := os.ReadFile(file)
			if err != nil {
				t.Fatal(err)
			}
			line, frag := wantOf(t, string(src))
			gotLine, msg := firstMistake(file, src)
			if msg == "" {
				t.Fatalf("no mistake found, want %q", frag)
			}
			if gotLine != line || !strings.Contains(msg, frag) {
				t.Errorf("got line %d: %s\nwant line %d: ...%s...", gotLine, msg, line, frag)
			}
		})
	}
}

// wantOf parses the "# want line N: fragment" first line of a bad file.
func wantOf(t *testing.T, src string) (int, string) {
	first, _, _ := strings.Cut(src, "\n")
	rest, ok := strings.CutPrefix(first, "# want line ")
	n, frag, ok2 := strings.Cut(rest, ": ")
	line, err := strconv.Atoi(n)
	if !ok || !ok2 || err != nil {
		t.Fatalf("first line %q is not # want line N: fragment", first)
	}
	return line, frag
}

// firstMistake returns the line and message of the reading error or first checked error.
func firstMistake(file string, src []byte) (int, string) {
	p, err := Read(file, src)
	var e *Error
	var es Errors
	if errors.As(err, &es) {
		e = es[0]
	}
	if e != nil || errors.As(err, &e) {
		return e.Line, e.Error()
	}
	if err != nil {
		return -1, err.Error()
	}
	for _, pr := range pantograph.Check(p, pantograph.DefaultOptions()) {
		if pr.Severity == pantograph.Error {
			return pr.Where.Line, pr.Diagnostic()
		}
	}
	return 0, ""
}

// TestReadEveryUnknownKey: one reading reports every misspelt key of the file, in line order.
func TestReadEveryUnknownKey(t *testing.T) {
	_, err := ReadFile("../../testdata/parts/bad/three-typos.toml")
	var errs Errors
	if !errors.As(err, &errs) || len(errs) != 3 {
		t.Fatalf("got %v, want three unknown keys", err)
	}
	for i, want := range []string{":8: unknown key `thicknes`", ":15: unknown key `diamter`", ":21: unknown key `centre`"} {
		if !strings.Contains(errs[i].Error(), want) {
			t.Errorf("mistake %d: got %q, want %q", i+1, errs[i].Error(), want)
		}
	}
}

func TestReadErrors(t *testing.T) {
	tests := []struct {
		name string
		src  string
		line int
		frag string
	}{
		{"unknown top key", "nmae = \"x\"\n[profile]\ncircle = { center = [0, 0], diameter = 1 }\n", 1,
			"unknown key `nmae` in the top level of the file — did you mean `name`?"},
		{"unknown key far from any", head + "circle = { center = [0, 0], diameter = 1 }\ncolour = 3\n", 6,
			"unknown key `colour` in [profile] — known keys here: points, circle, rect, path"},
		{"unknown inline key", head + "circle = { centre = [0, 0], diameter = 1 }\n", 5,
			"did you mean `center`?"},
		{"no shape", head + "\n", 4, "[profile]: no shape"},
		{"too few points", head + "points = [[0, 0], [1, 1]]\n", 5, "at least 3 points, got 2"},
		{"point not a pair", head + "points = [[0, 0], [1], [1, 1]]\n", 5, "key points (entry 2): must be a point"},
		{"point on its own line", head + "points = [\n  [0, 0],\n  [1, 0, -1],\n  [1, 1],\n]\n", 7,
			"key points (entry 2): corner radius must be 0 or more, got -1"},
		{"corner too big", head + "rect = { min = [0, 0], size = [4, 2], corner = 1.5 }\n", 5,
			"corner radius 1.5 is more than half"},
		{"zero size rect", head + "rect = { min = [0, 0], size = [4, 0] }\n", 5, "width and height must be greater than 0"},
		{"circle missing diameter", head + "circle = { center = [0, 0] }\n", 5, "key circle: missing diameter"},
		{"nan", head + "circle = { center = [0, 0], diameter = nan }\n", 5, "must be a finite number"},
		{"bad depth word", head + "circle = { center = [0, 0], diameter = 9 }\n[[pocket]]\ncircle = { center = [0, 0], diameter = 1 }\ndepth = \"deep\"\n", 8,
			`key depth: must be "through" or a number, got text "deep"`},
		{"zero depth", head + "circle = { center = [0, 0], diameter = 9 }\n[[holes]]\ndiameter = 1\nat = [[0, 0]]\ndepth = 0\n", 9,
			"key depth: must be greater than 0"},
		{"holes without at", head + "circle = { center = [0, 0], diameter = 9 }\n[[holes]]\ndiameter = 1\n", 6, "at missing"},
		{"path not starting with at", head + "path = [ { line = [1, 0] }, { line = [1, 1] }, { line = [0, 1] } ]\n", 5,
			"a path starts with { at = [x, y] }"},
		{"path step going nowhere", head + "path = [ { at = [0, 0] }, { line = [1, 0] }, { line = [1, 0] }, { line = [0, 1] } ]\n", 5,
			"key path (entry 3): goes nowhere"},
		{"arc through an end", head + "path = [ { at = [0, 0] }, { line = [1, 0] }, { arc = [0, 1], through = [0, 1] } ]\n", 5,
			"must lie between the arc's ends"},
		{"profile twice", "[[profile]]\ncircle = { center = [0, 0], diameter = 1 }\n", 1, "write [profile] once"},
		{"stock not a table", "stock = 3\n[profile]\ncircle = { center = [0, 0], diameter = 1 }\n", 1, "key stock: must be a table"},
		{"cutout with slot and shape", head + "circle = { center = [0, 0], diameter = 9 }\n[[cutout]]\ncircle = { center = [0, 0], diameter = 1 }\nfrom = [0, 0]\n", 8,
			"give only one shape, found both circle and from/to/width"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			_, err := Read("t.toml", []byte(tc.src))
			var e *Error
			if !errors.As(err, &e) {
				t.Fatalf("got %v, want a *partfile.Error", err)
			}
			if e.Line != tc.line || !strings.Contains(e.Error(), tc.frag) {
				t.Errorf("got line %d: %v\nwant line %d: ...%s...", e.Line, e, tc.line, tc.frag)
			}
		})
	}
}

func TestReadSamples(t *testing.T) {
	files, _ := filepath.Glob("../../samples/*.toml")
	if len(files) < 3 {
		t.Fatalf("got %d samples, want at least 3", len(files))
	}
	for _, file := range files {
		t.Run(filepath.Base(file), func(t *testing.T) {
			p, err := ReadFile(file)
			if err != nil {
				t.Fatal(err)
			}
			if ps := pantograph.Check(p, pantograph.DefaultOptions()); len(ps) > 0 {
				t.Errorf("sample has problems: %v", ps)
			}
		})
	}
}
