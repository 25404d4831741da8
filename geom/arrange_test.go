package geom

import (
	"math"
	"testing"
)

func TestSplitPiecesAndChain(t *testing.T) {
	// Two overlapping squares: the outline of their union is what a union keeps.
	a := shape(t, "0,0 2,0 2,2 0,2")
	b := shape(t, "1,1 3,1 3,3 1,3")
	ps := splitPieces([][]Segment{a, b})
	// Derived: each square is cut twice where the other crosses it: 4 + 2 pieces each.
	if len(ps) != 12 {
		t.Fatalf("pieces: got %d, want 12", len(ps))
	}
	var keep []piece
	for _, p := range ps {
		other := b
		if p.src == 1 {
			other = a
		}
		m := p.seg.Mid()
		if other.OnBoundary(m) || other.Winding(m) == 0 {
			keep = append(keep, p)
		}
	}
	loops, srcs, open := chainLoops(keep)
	if open != 0 || len(loops) != 1 {
		t.Fatalf("got %d loops, %d open pieces; want 1 loop, 0 open", len(loops), open)
	}
	// Derived: 4 + 4 − 1 overlap.
	approx(t, "union area", loops[0].Area(), 7, 1e-12)
	if len(loops[0]) != 8 || len(srcs[0]) != 8 {
		t.Errorf("union outline: got %d segments, want 8", len(loops[0]))
	}
}

func TestChainKeepsTouchingRegionsApart(t *testing.T) {
	// Two squares meeting at one corner: leftmost turns give two loops, not a figure eight.
	a := shape(t, "0,0 1,0 1,1 0,1")
	b := shape(t, "1,1 2,1 2,2 1,2")
	loops, _, open := chainLoops(splitPieces([][]Segment{a, b}))
	if open != 0 || len(loops) != 2 {
		t.Fatalf("got %d loops, %d open; want 2, 0", len(loops), open)
	}
	for i, l := range loops {
		approx(t, "loop area", math.Abs(l.Area()), 1, 1e-12)
		if err := l.Validate(); err != nil {
			t.Errorf("loop %d: %v", i, err)
		}
	}
}

func TestChainMergesArcPieces(t *testing.T) {
	// A circle cut by a line through it: the pieces of the circle outside the line's reach
	// chain back into arcs about the same centre.
	c := Circle(V(0, 0), 2)
	ps := splitPieces([][]Segment{c, {Line(V(-3, 0), V(3, 0))}})
	var keep []piece
	for _, p := range ps {
		if p.src == 0 {
			keep = append(keep, p)
		}
	}
	loops, _, _ := chainLoops(keep)
	if len(loops) != 1 || len(loops[0]) != 1 {
		t.Fatalf("got %d loops (first with %d segments), want one full arc", len(loops), len(loops[0]))
	}
	approx(t, "sweep", loops[0][0].Sweep, 2*math.Pi, 1e-12)
}

func TestAssembleNestsHoles(t *testing.T) {
	big := shape(t, "0,0 10,0 10,10 0,10")
	hole := Circle(V(5, 5), 3).Reverse()
	island := Circle(V(5, 5), 1)
	islandHole := Circle(V(5, 5), 0.5).Reverse()
	stray := Circle(V(20, 20), 1).Reverse()
	rs := assemble([]Contour{hole, island, big, islandHole, stray})
	if len(rs) != 2 {
		t.Fatalf("got %d regions, want 2", len(rs))
	}
	for _, r := range rs {
		if len(r.Holes) != 1 {
			t.Errorf("region of area %g: got %d holes, want 1", r.Area(), len(r.Holes))
		}
		if err := r.Validate(); err != nil {
			t.Errorf("region: %v", err)
		}
	}
	// Derived: 100 − 9π and π − π/4.
	approx(t, "total area", rs[0].Area()+rs[1].Area(), 100-9*math.Pi+math.Pi*0.75, 1e-9)
}
