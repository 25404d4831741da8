package geom

import (
	"fmt"
	"math"
	"math/rand"
	"testing"
)

// boolArea returns the area of all the regions together.
func boolArea(rs []Region) float64 {
	var a float64
	for _, r := range rs {
		a += r.Area()
	}
	return a
}

// boolHoles returns how many holes the regions have together.
func boolHoles(rs []Region) int {
	n := 0
	for _, r := range rs {
		n += len(r.Holes)
	}
	return n
}

// checkBoolRegions fails the test for any region that does not validate or is not oriented as
// the package doc promises.
func checkBoolRegions(t *testing.T, what string, rs []Region) {
	t.Helper()
	for i, r := range rs {
		if err := r.Validate(); err != nil {
			t.Errorf("%s: region %d: %v", what, i, err)
		}
		if !r.Outer.IsCCW() {
			t.Errorf("%s: region %d: outer contour runs clockwise", what, i)
		}
		for k, h := range r.Holes {
			if h.IsCCW() {
				t.Errorf("%s: region %d: hole %d runs counter-clockwise", what, i, k)
			}
		}
	}
}

// lensArea is the area shared by two circles of radius r whose centres are d apart: twice
// the circular segment cut off by their common chord (derived).
func lensArea(r, d float64) float64 {
	return 2*r*r*math.Acos(d/(2*r)) - d/2*math.Sqrt(4*r*r-d*d)
}

func TestBoolean(t *testing.T) {
	reg := func(s string, holes ...Contour) Region { return NewRegion(shape(t, s), holes...) }
	sq := reg("0,0 4,0 4,4 0,4")
	tests := []struct {
		name       string
		op         boolOp
		a, b       []Region
		area       float64
		regions    int
		holes      int
		areaTolRel float64
	}{
		// Derived: the squares [0,4]² and [2,6]×[1,5] overlap in a 2 × 3 rectangle.
		{"overlapping squares, union", opUnion, []Region{sq}, []Region{reg("2,1 6,1 6,5 2,5")},
			16 + 16 - 6, 1, 0, 1e-12},
		{"overlapping squares, intersection", opIntersection, []Region{sq},
			[]Region{reg("2,1 6,1 6,5 2,5")}, 6, 1, 0, 1e-12},
		{"overlapping squares, difference", opDifference, []Region{sq},
			[]Region{reg("2,1 6,1 6,5 2,5")}, 16 - 6, 1, 0, 1e-12},
		// Derived: a² − πr² for a circle wholly inside the square.
		{"square minus circle", opDifference, []Region{reg("0,0 10,0 10,10 0,10")},
			[]Region{NewRegion(Circle(V(5, 5), 3))}, 100 - 9*math.Pi, 1, 1, 1e-12},
		// Derived: the circle pokes out of the square's right side, centre on the edge.
		{"square minus circle on its edge", opDifference, []Region{reg("0,0 10,0 10,10 0,10")},
			[]Region{NewRegion(Circle(V(10, 5), 3))}, 100 - 9*math.Pi/2, 1, 0, 1e-12},
		{"disjoint regions stay apart", opUnion, []Region{sq}, []Region{reg("10,0 12,0 12,2 10,2")},
			16 + 4, 2, 0, 1e-12},
		{"disjoint regions with overlapping boxes stay apart", opUnion,
			[]Region{reg("0,0 4,0 0,4")}, []Region{reg("4,4 1,4 4,1")}, 8 + 4.5, 2, 0, 1e-12},
		{"edge to edge merges", opUnion, []Region{sq}, []Region{reg("4,0 7,0 7,4 4,4")},
			16 + 12, 1, 0, 1e-12},
		{"part of an edge shared merges", opUnion, []Region{sq}, []Region{reg("4,1 5,1 5,3 4,3")},
			16 + 2, 1, 0, 1e-12},
		{"corner to corner stays two", opUnion, []Region{sq}, []Region{reg("4,4 5,4 5,5 4,5")},
			16 + 1, 2, 0, 1e-12},
		{"edge to edge, intersection is empty", opIntersection, []Region{sq},
			[]Region{reg("4,0 7,0 7,4 4,4")}, 0, 0, 0, 0},
		{"edge to edge, difference leaves a", opDifference, []Region{sq},
			[]Region{reg("4,0 7,0 7,4 4,4")}, 16, 1, 0, 1e-12},
		{"difference makes a hole", opDifference, []Region{reg("0,0 10,0 10,10 0,10")},
			[]Region{reg("4,4 6,4 6,6 4,6")}, 100 - 4, 1, 1, 1e-12},
		{"difference cuts in two", opDifference, []Region{reg("0,0 10,0 10,2 0,2")},
			[]Region{reg("4,-1 6,-1 6,3 4,3")}, 20 - 4, 2, 0, 1e-12},
		{"difference along a shared edge", opDifference, []Region{reg("0,0 10,0 10,10 0,10")},
			[]Region{reg("0,0 5,0 5,10 0,10")}, 50, 1, 0, 1e-12},
		{"union fills a hole", opUnion, []Region{reg("0,0 10,0 10,10 0,10", Circle(V(5, 5), 2))},
			[]Region{NewRegion(Circle(V(5, 5), 2))}, 100, 1, 0, 1e-12},
		// Derived: two discs of radius 1 touching at one point.
		{"discs touching at a point stay two", opUnion, []Region{NewRegion(Circle(V(0, 0), 1))},
			[]Region{NewRegion(Circle(V(2, 0), 1))}, 2 * math.Pi, 2, 0, 1e-12},
		{"discs touching at a point share nothing", opIntersection,
			[]Region{NewRegion(Circle(V(0, 0), 1))}, []Region{NewRegion(Circle(V(2, 0), 1))}, 0, 0, 0, 0},
		{"region with itself, union", opUnion, []Region{sq}, []Region{sq}, 16, 1, 0, 1e-12},
		{"region with itself, intersection", opIntersection, []Region{sq}, []Region{sq},
			16, 1, 0, 1e-12},
		{"region less itself", opDifference, []Region{sq}, []Region{sq}, 0, 0, 0, 0},
		// Derived: the lens formula in lensArea, r = 2, d = 1.5.
		{"two circles, intersection", opIntersection, []Region{NewRegion(Circle(V(0, 0), 2))},
			[]Region{NewRegion(Circle(V(1.5, 0), 2))}, lensArea(2, 1.5), 1, 0, 1e-12},
		{"two circles, union", opUnion, []Region{NewRegion(Circle(V(0, 0), 2))},
			[]Region{NewRegion(Circle(V(1.5, 0), 2))}, 8*math.Pi - lensArea(2, 1.5), 1, 0, 1e-12},
		{"circle inside circle, union", opUnion, []Region{NewRegion(Circle(V(0, 0), 2))},
			[]Region{NewRegion(Circle(V(0.5, 0), 1))}, 4 * math.Pi, 1, 0, 1e-12},
		{"nothing minus something", opDifference, nil, []Region{sq}, 0, 0, 0, 0},
		{"something minus nothing", opDifference, []Region{sq}, nil, 16, 1, 0, 1e-12},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			var got []Region
			switch tc.op {
			case opUnion:
				got = Union(append(append([]Region{}, tc.a...), tc.b...)...)
			case opDifference:
				got = Difference(tc.a, tc.b)
			default:
				got = Intersection(tc.a, tc.b)
			}
			checkBoolRegions(t, "result", got)
			approx(t, "area", boolArea(got), tc.area, tc.areaTolRel*math.Max(1, tc.area)+1e-12)
			if len(got) != tc.regions {
				t.Errorf("regions: got %d, want %d", len(got), tc.regions)
			}
			if h := boolHoles(got); h != tc.holes {
				t.Errorf("holes: got %d, want %d", h, tc.holes)
			}
		})
	}
}

func TestDifferenceTouchingInside(t *testing.T) {
	// A disc less a smaller disc touching it from inside at (2, 0): the answer's boundary
	// meets itself there. Chaining keeps the two loops apart, so the answer is an outer circle
	// with a hole touching it, which Validate rejects by design; check area and shape only.
	got := Difference([]Region{NewRegion(Circle(V(0, 0), 2))}, []Region{NewRegion(Circle(V(1, 0), 1))})
	if len(got) != 1 || len(got[0].Holes) != 1 {
		t.Fatalf("got %d regions, want 1 with 1 hole", len(got))
	}
	// Derived: π(R² − r²).
	approx(t, "area", got[0].Area(), 4*math.Pi-math.Pi, 1e-12)
	approx(t, "outer radius", got[0].Outer[0].Radius(), 2, 1e-12)
	approx(t, "hole radius", got[0].Holes[0][0].Radius(), 1, 1e-12)
}

func TestBooleanKeepsArcs(t *testing.T) {
	const r = 2.5
	a := NewRegion(Circle(V(0, 0), r))
	b := NewRegion(Circle(V(3, 1), r))
	for name, got := range map[string][]Region{
		"union":        Union(a, b),
		"intersection": Intersection([]Region{a}, []Region{b}),
		"difference":   Difference([]Region{a}, []Region{b}),
	} {
		t.Run(name, func(t *testing.T) {
			if len(got) != 1 {
				t.Fatalf("regions: got %d, want 1", len(got))
			}
			// Derived: every boundary piece comes from one of the two circles, so it must
			// still be an arc of radius r.
			for i, s := range got[0].Outer {
				if !s.IsArc() {
					t.Errorf("segment %d: got a line %v, want an arc", i, s)
					continue
				}
				approx(t, "radius", s.Radius(), r, 1e-9)
			}
			if n := len(got[0].Outer); n != 2 {
				t.Errorf("segments: got %d, want 2 (one arc from each circle)", n)
			}
		})
	}
}

func TestUnionMany(t *testing.T) {
	// A row of n discs of radius 1 whose centres are 1.5 apart: consecutive discs overlap in
	// a lens, discs two apart do not meet.
	const n = 40
	var rs []Region
	for i := 0; i < n; i++ {
		rs = append(rs, NewRegion(Circle(V(1.5*float64(i), 0), 1)))
	}
	// A second row far away, each disc on its own.
	for i := 0; i < n; i++ {
		rs = append(rs, NewRegion(Circle(V(3*float64(i), 100), 1)))
	}
	got := Union(rs...)
	checkBoolRegions(t, "union", got)
	if len(got) != n+1 {
		t.Fatalf("regions: got %d, want %d", len(got), n+1)
	}
	// Derived: n discs less the n − 1 lenses between neighbours, plus n separate discs.
	want := n*math.Pi - (n-1)*lensArea(1, 1.5) + n*math.Pi
	approx(t, "area", boolArea(got), want, 1e-9)
}

func TestUnionTiles(t *testing.T) {
	// An n × n board of unit squares: all of them merge into one square with four straight
	// sides; the dark squares alone touch only at corners and stay apart.
	const n = 12
	var all, dark []Region
	for i := 0; i < n; i++ {
		for j := 0; j < n; j++ {
			x, y := float64(i), float64(j)
			sq := NewRegion(Polygon(V(x, y), V(x+1, y), V(x+1, y+1), V(x, y+1)))
			all = append(all, sq)
			if (i+j)%2 == 0 {
				dark = append(dark, sq)
			}
		}
	}
	got := Union(all...)
	checkBoolRegions(t, "board", got)
	if len(got) != 1 || len(got[0].Outer) != 4 || len(got[0].Holes) != 0 {
		t.Fatalf("board: got %d regions, want 1 square of 4 sides", len(got))
	}
	approx(t, "board area", got[0].Area(), n*n, 1e-9) // derived: n² unit squares
	got = Union(dark...)
	checkBoolRegions(t, "dark squares", got)
	if len(got) != n*n/2 {
		t.Errorf("dark squares: got %d regions, want %d", len(got), n*n/2)
	}
	// Derived: the light squares are what the board less the dark ones leaves.
	light := Difference([]Region{NewRegion(Polygon(V(0, 0), V(n, 0), V(n, n), V(0, n)))}, dark)
	checkBoolRegions(t, "light squares", light)
	if len(light) != n*n/2 {
		t.Errorf("light squares: got %d regions, want %d", len(light), n*n/2)
	}
	approx(t, "light area", boolArea(light), n*n/2, 1e-9)
}

func TestBooleanResultIsACopy(t *testing.T) {
	sq := NewRegion(shape(t, "0,0 1,0 1,1 0,1"))
	got := Union(sq)
	got[0].Outer[0].A = V(5, 5)
	if sq.Outer[0].A != V(0, 0) {
		t.Errorf("changing the result changed the input: got %v, want (0, 0)", sq.Outer[0].A)
	}
}

func ExampleUnion() {
	// Two 10 × 10 plates overlapping by 5 × 10, and a disc standing apart.
	a, _ := Rect(V(0, 0), V(10, 10), 0)
	b, _ := Rect(V(5, 0), V(10, 10), 0)
	disc := Circle(V(40, 5), 2)
	for _, r := range Union(NewRegion(a), NewRegion(b), NewRegion(disc)) {
		fmt.Printf("area %.4f, %d sides\n", r.Area(), len(r.Outer))
	}
	// Output:
	// area 150.0000, 4 sides
	// area 12.5664, 1 sides
}

func ExampleDifference() {
	// A 20 × 10 plate less a bore of radius 3 leaves the plate with one round hole.
	plate, _ := Rect(V(0, 0), V(20, 10), 0)
	bore := NewRegion(Circle(V(10, 5), 3))
	for _, r := range Difference([]Region{NewRegion(plate)}, []Region{bore}) {
		fmt.Printf("area %.4f, %d hole\n", r.Area(), len(r.Holes))
	}
	// Output:
	// area 171.7257, 1 hole
}

// randomCut returns a seeded random convex polygon, possibly with rounded corners, and the
// two pieces a straight cut between two of its corners makes of it.
func randomCut(rng *rand.Rand) (whole, left, right Region) {
	n := 5 + rng.Intn(12)
	angles := make([]float64, n)
	for k := range angles {
		angles[k] = 2 * math.Pi * (float64(k) + 0.6*rng.Float64()) / float64(n)
	}
	rx, ry := 5+20*rng.Float64(), 5+20*rng.Float64()
	pts := make([]Vec, n)
	for k, a := range angles {
		pts[k] = V(rx*math.Cos(a), ry*math.Sin(a))
	}
	i := rng.Intn(n)
	j := (i + 2 + rng.Intn(n-3)) % n // at least one corner on each side of the cut
	var l, r []Vec
	for k := i; ; k = (k + 1) % n {
		l = append(l, pts[k])
		if k == j {
			break
		}
	}
	for k := j; ; k = (k + 1) % n {
		r = append(r, pts[k])
		if k == i {
			break
		}
	}
	return NewRegion(Polygon(pts...)), NewRegion(Polygon(l...)), NewRegion(Polygon(r...))
}

func TestBooleanCutAndRejoin(t *testing.T) {
	// A convex polygon cut in two along a chord: the pieces share that chord exactly, run
	// opposite ways along it, and must join back into the whole.
	for seed := int64(1); seed <= 200; seed++ {
		rng := rand.New(rand.NewSource(seed))
		whole, left, right := randomCut(rng)
		u := Union(left, right)
		checkBoolRegions(t, fmt.Sprintf("seed %d: union", seed), u)
		if len(u) != 1 || len(u[0].Outer) != len(whole.Outer) {
			t.Errorf("seed %d: union: got %d regions, want 1 with %d sides", seed, len(u), len(whole.Outer))
		}
		// Derived: the pieces tile the whole, so areas add and the pieces share no area.
		approx(t, fmt.Sprintf("seed %d: union area", seed), boolArea(u), whole.Area(), 1e-9*whole.Area())
		if in := Intersection([]Region{left}, []Region{right}); len(in) != 0 {
			t.Errorf("seed %d: intersection: got %d regions of area %g, want none", seed, len(in), boolArea(in))
		}
		d := Difference([]Region{whole}, []Region{left})
		checkBoolRegions(t, fmt.Sprintf("seed %d: difference", seed), d)
		approx(t, fmt.Sprintf("seed %d: whole less left", seed), boolArea(d), right.Area(), 1e-9*whole.Area())
		in := Intersection([]Region{whole}, []Region{right})
		approx(t, fmt.Sprintf("seed %d: whole and right", seed), boolArea(in), right.Area(), 1e-9*whole.Area())
	}
}

func TestUnionHalfDiscs(t *testing.T) {
	// Two half discs cut along a diameter join back into one round disc: the two half-circle
	// arcs continue each other and come out as one full circle.
	top := NewRegion(Contour{Arc(V(0, 0), 2, 0, math.Pi), Line(V(-2, 0), V(2, 0))})
	bottom := NewRegion(Contour{Arc(V(0, 0), 2, math.Pi, math.Pi), Line(V(2, 0), V(-2, 0))})
	got := Union(top, bottom)
	checkBoolRegions(t, "union", got)
	if len(got) != 1 || len(got[0].Outer) != 1 {
		t.Fatalf("got %d regions, want one made of a single full circle", len(got))
	}
	approx(t, "area", got[0].Area(), 4*math.Pi, 1e-12) // derived: πr²
	approx(t, "sweep", got[0].Outer[0].Sweep, 2*math.Pi, 1e-12)
}

// randomPair returns two seeded random regions that overlap in various ways: shifted,
// rotated, the same region twice, or one mirrored onto the other.
func randomPair(rng *rand.Rand) (Region, Region, string) {
	a := randomRegion(rng)
	switch k := rng.Intn(6); k {
	case 0:
		return a, a, "same region twice"
	case 1:
		return a, a.Transform(FlipX()), "mirrored"
	case 2:
		return a, a.Transform(Rotate(Angle(math.Pi / 2))), "quarter turn"
	default:
		b := randomRegion(rng)
		d := Polar(Vec{}, 60*rng.Float64(), 2*math.Pi*rng.Float64())
		return a, b.Transform(Rotate(Angle(2 * math.Pi * rng.Float64())).Then(Translate(d))),
			"shifted"
	}
}

func TestBooleanProperties(t *testing.T) {
	for seed := int64(1); seed <= 300; seed++ {
		rng := rand.New(rand.NewSource(seed))
		a, b, kind := randomPair(rng)
		u := Union(a, b)
		in := Intersection([]Region{a}, []Region{b})
		d := Difference([]Region{a}, []Region{b})
		for name, rs := range map[string][]Region{"union": u, "intersection": in, "difference": d} {
			for i, r := range rs {
				if err := r.Validate(); err != nil {
					t.Errorf("seed %d (%s): %s: region %d: %v", seed, kind, name, i, err)
				}
			}
		}
		aa, ab := a.Area(), b.Area()
		au, ai, ad := boolArea(u), boolArea(in), boolArea(d)
		tol := 1e-6 * (aa + ab) // the relative tolerance the task sets
		// Derived: inclusion–exclusion, and A = (A − B) ∪ (A ∩ B) without overlap.
		if math.Abs(au+ai-(aa+ab)) > tol {
			t.Errorf("seed %d (%s): area(A∪B) + area(A∩B): got %.9g, want %.9g", seed, kind, au+ai, aa+ab)
		}
		if math.Abs(ad-(aa-ai)) > tol {
			t.Errorf("seed %d (%s): area(A−B): got %.9g, want %.9g", seed, kind, ad, aa-ai)
		}
		checkMembership(t, rng, seed, kind, a, b, u, in, d)
	}
}

// checkMembership samples points away from every boundary and checks that each result holds
// exactly the points its definition says.
func checkMembership(t *testing.T, rng *rand.Rand, seed int64, kind string, a, b Region, u, in, d []Region) {
	t.Helper()
	box := a.Bounds().Union(b.Bounds())
	near := func(p Vec) bool {
		for _, r := range []Region{a, b} {
			for _, c := range r.Contours() {
				for _, s := range c {
					if s.DistanceTo(p) < 1e-6 {
						return true
					}
				}
			}
		}
		return false
	}
	in2 := func(rs []Region, p Vec) bool {
		for _, r := range rs {
			if r.Contains(p) {
				return true
			}
		}
		return false
	}
	for k := 0; k < 200; k++ {
		p := V(box.Min.X+rng.Float64()*box.Size().X, box.Min.Y+rng.Float64()*box.Size().Y)
		if near(p) {
			continue
		}
		inA, inB := a.Contains(p), b.Contains(p)
		for _, c := range []struct {
			name string
			rs   []Region
			want bool
		}{{"union", u, inA || inB}, {"intersection", in, inA && inB}, {"difference", d, inA && !inB}} {
			if got := in2(c.rs, p); got != c.want {
				t.Errorf("seed %d (%s): %s holds %v: got %v, want %v", seed, kind, c.name, p, got, c.want)
			}
		}
		n := 0
		for _, r := range u {
			if r.Contains(p) {
				n++
			}
		}
		if n > 1 {
			t.Errorf("seed %d (%s): %v lies in %d regions of the union, want at most 1", seed, kind, p, n)
		}
	}
}

func TestUnionManyRandom(t *testing.T) {
	// Many random regions scattered so that some overlap and some stand alone: the union's
	// area must equal the area covered, measured by inclusion–exclusion against the union of
	// all but one.
	for seed := int64(1); seed <= 20; seed++ {
		rng := rand.New(rand.NewSource(seed))
		var rs []Region
		for i := 0; i < 12; i++ {
			d := V(300*rng.Float64(), 300*rng.Float64())
			rs = append(rs, randomRegion(rng).Transform(Translate(d)))
		}
		all := Union(rs...)
		checkBoolRegions(t, "union", all)
		rest := Union(rs[1:]...)
		meet := Intersection([]Region{rs[0]}, rest)
		// Derived: |A ∪ R| = |A| + |R| − |A ∩ R|.
		want := rs[0].Area() + boolArea(rest) - boolArea(meet)
		if got := boolArea(all); math.Abs(got-want) > 1e-6*want {
			t.Errorf("seed %d: union area: got %.9g, want %.9g", seed, got, want)
		}
	}
}

func TestWindingLocator(t *testing.T) {
	// A square with a round hole and a rounded corner, located by ray casting and compared
	// with the angle-sum winding of Contour, which works quite differently.
	r := NewRegion(shape(t, "0,0 10,0 10,10@3 0,10"), Circle(V(4, 5), 2))
	var segs []Segment
	for _, c := range r.Contours() {
		segs = append(segs, c...)
	}
	l := newWindingLocator(segs, 0)
	tests := []struct {
		name string
		p    Vec
		want int
	}{
		{"inside", V(1, 1), 1},
		{"in the hole", V(4, 5), 0},
		{"level with the hole's top", V(1, 7), 1},
		{"level with the hole's bottom", V(1, 3), 1},
		{"level with a corner", V(-1, 0), 0},
		{"level with the top edge, outside", V(-1, 10), 0},
		{"beyond the rounded corner", V(9.9, 9.9), 0},
		{"inside the rounded corner", V(9, 9), 1},
		{"right of everything", V(20, 5), 0},
		{"level with the arc's end", V(1, 7), 1},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got, _ := l.probe(tc.p, nil); got != tc.want {
				t.Errorf("got %d, want %d", got, tc.want)
			}
		})
	}
	rng := rand.New(rand.NewSource(7))
	for k := 0; k < 2000; k++ {
		p := V(-1+12*rng.Float64(), -1+12*rng.Float64())
		if r.Outer.OnBoundary(p) || r.Holes[0].OnBoundary(p) {
			continue
		}
		want := r.Outer.Winding(p) + r.Holes[0].Winding(p)
		if got, _ := l.probe(p, nil); got != want {
			t.Fatalf("seed 7, point %v: got %d, want %d", p, got, want)
		}
	}
}

func TestBooleanInputOrientation(t *testing.T) {
	// A region built without NewRegion, outer clockwise: the operations must not care.
	cw := Region{Outer: shape(t, "0,0 0,4 4,4 4,0")}
	got := Union(cw, NewRegion(shape(t, "2,2 6,2 6,6 2,6")))
	checkBoolRegions(t, "union", got)
	// Derived: 16 + 16 − 4.
	approx(t, "area", boolArea(got), 28, 1e-12)
}

func TestBooleanNearlyCoincident(t *testing.T) {
	// B is A moved by a tiny amount: shifted by eps in a random direction, or turned about
	// the origin so that points 40 from it move by eps. The boundaries then run within eps of
	// each other all the way round, where cutting and snapping are least sure of themselves.
	for _, eps := range []float64{0, 1e-13, 1e-11, 1e-10, 3e-9, 1e-8, 5e-8, 1e-7, 2e-7, 1e-6} {
		for seed := int64(1); seed <= 60; seed++ {
			rng := rand.New(rand.NewSource(seed))
			a := randomRegion(rng)
			moves := map[string]Transform{
				"shifted": Translate(Polar(Vec{}, eps, 2*math.Pi*rng.Float64())),
				"turned":  Rotate(Angle(eps / 40)),
			}
			for how, tr := range moves {
				b := a.Transform(tr)
				label := fmt.Sprintf("eps %g, seed %d, %s", eps, seed, how)
				u := Union(a, b)
				in := Intersection([]Region{a}, []Region{b})
				d := Difference([]Region{a}, []Region{b})
				for name, rs := range map[string][]Region{"union": u, "intersection": in, "difference": d} {
					for i, r := range rs {
						if err := r.Validate(); err != nil {
							t.Errorf("%s: %s: region %d: %v", label, name, i, err)
						}
					}
				}
				aa, au, ai, ad := a.Area(), boolArea(u), boolArea(in), boolArea(d)
				// Derived: moving a region by eps sweeps at most perimeter·eps of new ground,
				// and the usual identities hold.
				slack := a.Perimeter()*eps + 1e-9*aa
				if math.Abs(au-aa) > slack || math.Abs(ai-aa) > slack || ad > slack {
					t.Errorf("%s: areas of union %.12g, intersection %.12g, difference %.3g; want %.12g, %.12g, 0 (±%.3g)",
						label, au, ai, ad, aa, aa, slack)
				}
			}
		}
	}
}

func TestBooleanNearlyConcentricCircles(t *testing.T) {
	// Two circles of one radius whose centres are 1e-9 apart, as met in a random test.
	ca, cb := V(1.5928619264450405, -2.4859907952464253), V(1.592861926587402, -2.4859907942566104)
	a := NewRegion(Contour{ArcFrom(V(3.6629067510590776, -2.4859907952464253), ca, 2*math.Pi)})
	b := NewRegion(Contour{ArcFrom(V(3.6629067512014393, -2.4859907942566104), cb, 2*math.Pi)})
	u := Union(a, b)
	checkBoolRegions(t, "union", u)
	// Derived: the circles differ by 1e-9, so the union is either circle within 2πr·1e-9.
	approx(t, "area", boolArea(u), a.Area(), 2*math.Pi*2.07*1e-9)
}

func TestWeld(t *testing.T) {
	// Two squares whose shared corner points differ by less than weldTol, and one corner of a
	// third square further off than that.
	a := NewRegion(shape(t, "0,0 1,0 1,1 0,1"))
	b := NewRegion(shape(t, "1.0000003,0 2,0 2,1 1,1.0000004"))
	c := NewRegion(shape(t, "1.00001,1 2,1 2,2 1,2"))
	got := weld([]Region{a, b, c})
	tests := []struct {
		name      string
		got, want Vec
	}{
		{"corner within weldTol moves onto the earlier one", got[1].Outer[0].A, V(1, 0)},
		{"its neighbour's end moves with it", got[1].Outer[3].B, V(1, 0)},
		{"second shared corner", got[1].Outer[3].A, V(1, 1)},
		{"corner beyond weldTol stays", got[2].Outer[0].A, V(1.00001, 1)},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if tc.got != tc.want {
				t.Errorf("got %v, want %v", tc.got, tc.want)
			}
		})
	}
}

func TestMoveEnds(t *testing.T) {
	quarter := Arc(V(0, 0), 1, 0, math.Pi/2)
	s, ok := moveEnds(quarter, V(1+3e-7, 0), V(0, 1-2e-7))
	if !ok {
		t.Fatal("moved arc dropped")
	}
	// Derived: both ends must lie on the new circle, and the sweep is kept.
	approx(t, "radius at A against B", s.A.Dist(s.Center), s.B.Dist(s.Center), 1e-12)
	approx(t, "sweep", s.Sweep, math.Pi/2, 0)
	if d := s.Center.Len(); d > 1e-6 {
		t.Errorf("centre moved by %g, want under 1e-6", d)
	}
	full, _ := moveEnds(Circle(V(2, 3), 1)[0], V(3, 3+1e-7), V(3, 3+1e-7))
	approx(t, "full circle centre y", full.Center.Y, 3+1e-7, 1e-15)
	if _, ok := moveEnds(Line(V(0, 0), V(1, 0)), V(0, 0), V(0, 0)); ok {
		t.Error("line shrunk to a point: got kept, want dropped")
	}
}
