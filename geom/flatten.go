package geom

import "math"

// chordCount returns how many equal chords replace an arc of radius r sweeping |sweep| radians
// so that no chord strays more than tol from the arc. A chord over angle θ has sagitta
// s = r(1 − cos(θ/2)), so θ ≤ 2·acos(1 − tol/r).
func chordCount(r, sweep, tol float64) int {
	if tol <= 0 || tol >= r {
		return max(1, int(math.Ceil(math.Abs(sweep)/(2*math.Pi/3)-1e-9)))
	}
	step := 2 * math.Acos(1-tol/r)
	return max(1, int(math.Ceil(math.Abs(sweep)/step-1e-9)))
}

// Flatten returns points along s, from A to B inclusive, whose chords stay within tol of it.
func (s Segment) Flatten(tol float64) []Vec {
	if !s.IsArc() {
		return []Vec{s.A, s.B}
	}
	n := chordCount(s.Radius(), s.Sweep, tol)
	pts := make([]Vec, 0, n+1)
	for i := 0; i <= n; i++ {
		pts = append(pts, s.At(float64(i)/float64(n)))
	}
	return pts
}

// Flatten returns the contour as a closed polygon (the first point is not repeated at the end)
// whose edges stay within tol of the contour.
func (c Contour) Flatten(tol float64) []Vec {
	var pts []Vec
	for _, s := range c {
		f := s.Flatten(tol)
		pts = append(pts, f[:len(f)-1]...)
	}
	return pts
}

// FlattenContour returns the contour replaced by straight chords within tol of it.
func (c Contour) FlattenContour(tol float64) Contour { return Polygon(c.Flatten(tol)...) }
