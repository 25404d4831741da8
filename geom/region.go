package geom

import (
	"fmt"
	"math"
)

// Region is an area of the plane bounded by one outer contour, less any holes. After NewRegion
// or Normalize the outer contour runs counter-clockwise and the holes clockwise.
type Region struct {
	Outer Contour
	Holes []Contour
}

// NewRegion returns the region with the given outer contour and holes, oriented as the package
// doc says whatever their orientation on input.
func NewRegion(outer Contour, holes ...Contour) Region {
	return Region{Outer: outer, Holes: holes}.Normalize()
}

// Normalize returns r with its outer contour counter-clockwise and its holes clockwise.
func (r Region) Normalize() Region {
	out := Region{Outer: r.Outer}
	if !r.Outer.IsCCW() {
		out.Outer = r.Outer.Reverse()
	}
	for _, h := range r.Holes {
		if h.IsCCW() {
			h = h.Reverse()
		}
		out.Holes = append(out.Holes, h)
	}
	return out
}

// Contours returns the outer contour followed by the holes.
func (r Region) Contours() []Contour {
	return append([]Contour{r.Outer}, r.Holes...)
}

// Area returns the area of the region: the outer contour's less the holes'.
func (r Region) Area() float64 {
	a := math.Abs(r.Outer.Area())
	for _, h := range r.Holes {
		a -= math.Abs(h.Area())
	}
	return a
}

// Perimeter returns the length of all the region's contours.
func (r Region) Perimeter() float64 {
	l := r.Outer.Perimeter()
	for _, h := range r.Holes {
		l += h.Perimeter()
	}
	return l
}

// Bounds returns the smallest box holding the region.
func (r Region) Bounds() Box { return r.Outer.Bounds() }

// Contains reports whether p is in the region; points on any boundary count as inside.
func (r Region) Contains(p Vec) bool {
	if !r.Outer.Contains(p) {
		return false
	}
	for _, h := range r.Holes {
		if !h.OnBoundary(p) && h.Winding(p) != 0 {
			return false
		}
	}
	return true
}

// Transform returns the region moved by t, re-oriented after a mirror.
func (r Region) Transform(t Transform) Region {
	out := Region{Outer: r.Outer.Transform(t)}
	for _, h := range r.Holes {
		out.Holes = append(out.Holes, h.Transform(t))
	}
	return out.Normalize()
}

// Validate reports the first thing wrong with the region: a bad contour, a hole outside the
// outer contour, or contours that cross or touch.
func (r Region) Validate() error {
	if err := r.Outer.Validate(); err != nil {
		return fmt.Errorf("outer contour: %w", err)
	}
	for i, h := range r.Holes {
		if err := h.Validate(); err != nil {
			return fmt.Errorf("hole %d: %w", i, err)
		}
	}
	cs := r.Contours()
	for i := range cs {
		for j := i + 1; j < len(cs); j++ {
			if x, ok := firstCrossing(cs[i], cs[j]); ok {
				return fmt.Errorf("%s and %s meet at %v: %w",
					contourName(i), contourName(j), x, ErrHoleCrossing)
			}
		}
	}
	for i, h := range r.Holes {
		if !r.Outer.Contains(h[0].Mid()) {
			return fmt.Errorf("hole %d: %w", i, ErrHoleOutside)
		}
		for j, g := range r.Holes {
			if i != j && g.Winding(h[0].Mid()) != 0 {
				return fmt.Errorf("hole %d lies inside hole %d: %w", i, j, ErrHoleOutside)
			}
		}
	}
	return nil
}

// contourName names contour i of Region.Contours in messages.
func contourName(i int) string {
	if i == 0 {
		return "outer contour"
	}
	return fmt.Sprintf("hole %d", i-1)
}
