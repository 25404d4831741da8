package geom

import (
	"math"
	"slices"
)

// This file measures how large a round tool may be to make a region: the tightest corners of
// its boundary, and the narrowest places between parts of the boundary that face each other.
// The narrowest-place search compares every pair of segments, so it is O(n²) in the number of
// segments: fine for a part of hundreds of segments, but not for a loop that runs it often.

// Corner is the sharpest bend of a region's boundary of one kind.
type Corner struct {
	At     Vec     // the vertex, or the middle of the arc
	Radius float64 // 0 for a sharp vertex, else the arc's radius
	// Angle is, for a sharp vertex, the interior angle in radians (meaningful when Radius == 0).
	// For an arc it is π minus the arc's signed sweep: the interior angle of the sharp corner
	// the arc rounds off.
	Angle float64
}

// Gap is a narrowest place: the chord A–B is perpendicular to the boundary at both ends.
type Gap struct {
	A, B  Vec
	Width float64
}

// tangentTol is the turn, in radians, below which a joint counts as smooth rather than as a
// corner. A cutter of radius ρ leaves at most about ρ·t²/8 of material at a joint that turns
// by t, so at 1e-6 rad that is ρ·1.25e-13: below pointTol for any cutter under a metre, while
// joints meant to be tangent but read from a drawing rounded to 1e-6 mm still count as smooth.
const tangentTol = 1e-6

// parallelTol is how far, in radians, two facing lines may lean towards each other and still
// count as parallel walls. Walls drawn parallel but rounded to 1e-6 mm over a millimetre lean
// by about 2e-6 rad; a lean of 1e-5 rad moves the walls by at most (w/2)·θ²/2 ≈ 2.5e-11·w
// against a disc of diameter w set between them, far inside fitTol below.
const parallelTol = 1e-5

// fitRelTol is the share of a narrow place's width by which the boundary may seem to reach
// into its disc: rounding in the few products that place the disc stays near 1e-15 of the
// coordinates, so 1e-9 of the width (plus pointTol) is safely above it.
const fitRelTol = 1e-9

// sweepTol is the angle, in radians, by which a point may seem to lie beyond the end of an
// arc and still count as on it: the end points of an arc are found through atan2, good to
// about 1e-15 rad.
const sweepTol = 1e-9

// SharpestConcaveCorner returns the tightest place where the boundary bends away from the
// interior (a reflex vertex, interior angle > 180°, or an arc turning right when travelled
// with the interior on the left). A round cutter working OUTSIDE the region (in its
// complement) cannot make such a corner sharper than its own radius. A sharp vertex is tighter
// than any arc; of two sharp vertices the one with the larger interior angle is the tighter
// (the complement's angle is smaller). ok is false when there is none.
func (r Region) SharpestConcaveCorner() (c Corner, ok bool) {
	return r.Normalize().sharpestCorner(-1)
}

// SharpestConvexCorner is the same for corners that bend toward the interior (vertex interior
// angle < 180°, left-turning arcs): what limits a cutter working INSIDE the region (a pocket or
// an opening). Of two sharp vertices the one with the smaller interior angle is the tighter.
func (r Region) SharpestConvexCorner() (c Corner, ok bool) {
	return r.Normalize().sharpestCorner(1)
}

// sharpestCorner returns the tightest joint or arc that turns in direction sense (+1 left,
// −1 right) on a normalized region. Joints that turn less than tangentTol are smooth.
func (r Region) sharpestCorner(sense float64) (best Corner, ok bool) {
	for _, c := range r.Contours() {
		for i, s := range c {
			if s.IsArc() && s.Sweep*sense > 0 {
				arc := Corner{At: s.Mid(), Radius: s.Radius(), Angle: math.Pi - s.Sweep}
				best, ok = tighterCorner(best, ok, arc, sense)
			}
			turn := jointTurn(s, c[(i+1)%len(c)])
			if turn*sense > tangentTol {
				best, ok = tighterCorner(best, ok, Corner{At: s.B, Angle: math.Pi - turn}, sense)
			}
		}
	}
	return best, ok
}

// tighterCorner returns whichever of best (if have) and c limits a cutter more: the smaller
// radius, and between equal radii the angle that leaves a cutter less room.
func tighterCorner(best Corner, have bool, c Corner, sense float64) (Corner, bool) {
	switch {
	case !have, c.Radius < best.Radius:
		return c, true
	case c.Radius == best.Radius && (c.Angle-best.Angle)*sense < 0:
		return c, true
	}
	return best, true
}

// jointTurn returns the signed angle by which the direction of travel turns from the end of s
// to the start of t: positive to the left.
func jointTurn(s, t Segment) float64 {
	a, b := s.Tangent(1), t.Tangent(0)
	return math.Atan2(a.Cross(b), a.Dot(b))
}

// NarrowestWidth returns the narrowest double normal through the region's interior: the
// largest round cutter that can pass everywhere inside it (ignoring corners, which
// SharpestConvexCorner reports). For a w×h rectangle it is min(w, h); for a circle its
// diameter; for a slot its width. ok is false when the region has no narrow place other than
// its corners (a triangle, say).
//
// A double normal here is a chord p–q between boundary points that is perpendicular to the
// boundary at both ends (at a vertex: within the vertex's cone of normals), leaves p into the
// region, and is the diameter of a disc that lies in the region, touching the boundary at p
// and q. Only vertices that jut into the region (inside angle above 180°) can end one: no disc
// inside the region touches a corner whose inside angle is below 180°. The disc condition
// keeps chords that a cutter of that size could never reach (the altitude of a triangle with
// rounded corners, say) from counting as narrow places.
//
// The region should be valid (see Validate).
func (r Region) NarrowestWidth() (g Gap, ok bool) {
	n := r.Normalize()
	size := n.Bounds().Size()
	// A disc inside the region fits in its bounding box.
	return newFacing(n.Contours()).narrowest(math.Min(size.X, size.Y))
}

// NarrowestGap is the same through the complement: the narrowest opening between parts of the
// boundary that face each other across empty space (a hole's narrowest width, a notch or inlet
// in the outer contour; the space between a hole and the outer edge is NOT a gap — that is
// material). For a part (material region), it is the largest cutter that can reach everywhere
// it must cut. It is NarrowestWidth of the contours run backwards, which puts the empty side on
// their left.
func (r Region) NarrowestGap() (g Gap, ok bool) {
	n := r.Normalize()
	var rev []Contour
	for _, c := range n.Contours() {
		rev = append(rev, c.Reverse())
	}
	// A chord between two boundary points is no longer than the bounding box's diagonal.
	return newFacing(rev).narrowest(n.Bounds().Size().Len())
}

// facing is a boundary seen from the side being measured, which lies to the left of every
// segment: the interior for widths, the exterior (the contours reversed) for gaps.
type facing struct {
	segs  []Segment
	boxes []Box
	verts []vertex
}

// vertex is a joint that juts into the measured side; chords may leave it in any direction
// between the normals of the two segments that meet there.
type vertex struct {
	at     Vec
	n1, n2 Vec     // measured-side normals at the end of the incoming and start of the outgoing segment
	turn   float64 // the joint's turn, negative (to the right)
}

// admits reports whether direction d (a unit vector) lies in the vertex's cone of normals,
// which runs clockwise from n1 to n2.
func (v vertex) admits(d Vec) bool {
	psi := math.Atan2(v.n2.Cross(d), v.n2.Dot(d))
	return psi >= -sweepTol && psi <= -v.turn+sweepTol
}

// newFacing gathers the segments and the jutting vertices of the contours.
func newFacing(cs []Contour) facing {
	var f facing
	for _, c := range cs {
		for i, s := range c {
			f.segs = append(f.segs, s)
			f.boxes = append(f.boxes, s.Bounds())
			t := c[(i+1)%len(c)]
			if turn := jointTurn(s, t); turn < -tangentTol {
				f.verts = append(f.verts, vertex{at: s.B, n1: normalAt(s, 1), n2: normalAt(t, 0), turn: turn})
			}
		}
	}
	return f
}

// normalAt returns the unit normal of s at parameter t that points to the measured (left) side.
func normalAt(s Segment, t float64) Vec { return s.Tangent(t).Perp() }

// chord is a candidate narrow place from p to q, l long.
type chord struct {
	p, q Vec
	l    float64
}

// narrowest returns the shortest candidate chord whose disc fits. Testing a disc costs a pass
// over the boundary while making a candidate costs a few products, so all candidates are made
// first and tested shortest first: only those shorter than the answer are ever tested.
func (f facing) narrowest(limit float64) (Gap, bool) {
	limit = limit*(1+fitRelTol) + pointTol
	cs := f.candidates(limit)
	slices.SortStableFunc(cs, func(a, b chord) int {
		switch {
		case a.l < b.l:
			return -1
		case a.l > b.l:
			return 1
		}
		return 0
	})
	for _, c := range cs {
		if f.fits(c) {
			return Gap{A: c.p, B: c.q, Width: c.l}, true
		}
	}
	return Gap{}, false
}

// candidates returns every chord that meets the end conditions and is no longer than limit.
// Pairs of segments whose boxes lie farther apart than limit are skipped.
func (f facing) candidates(limit float64) []chord {
	var out []chord
	for i, s := range f.segs {
		for j := i; j < len(f.segs); j++ {
			if boxDistance(f.boxes[i], f.boxes[j]) <= limit {
				out = segmentChords(out, s, f.segs[j], i == j)
			}
		}
		for _, v := range f.verts {
			if boxDistance(f.boxes[i], EmptyBox().AddPoint(v.at)) <= limit {
				out = vertexSegmentChords(out, v, s)
			}
		}
	}
	for i, v := range f.verts {
		for _, w := range f.verts[i+1:] {
			out = vertexVertexChord(out, v, w)
		}
	}
	return slices.DeleteFunc(out, func(c chord) bool { return c.l <= pointTol || c.l > limit })
}

// boxDistance returns the distance between two boxes, 0 when they overlap.
func boxDistance(a, b Box) float64 {
	dx := math.Max(0, math.Max(a.Min.X-b.Max.X, b.Min.X-a.Max.X))
	dy := math.Max(0, math.Max(a.Min.Y-b.Max.Y, b.Min.Y-a.Max.Y))
	return math.Hypot(dx, dy)
}

// fits reports whether the disc on c as diameter holds no boundary. Every candidate leaves p
// along a normal that points into the measured side, so a disc that holds no boundary lies
// wholly on that side: no test of which side its centre is on is needed.
func (f facing) fits(c chord) bool {
	m, rad := c.p.Lerp(c.q, 0.5), c.l/2
	tol := pointTol + fitRelTol*c.l
	reach := Box{m.Sub(Vec{rad, rad}), m.Add(Vec{rad, rad})}
	for i, s := range f.segs {
		if f.boxes[i].Overlaps(reach) && s.DistanceTo(m) < rad-tol {
			return false
		}
	}
	return true
}

// segmentChords appends the chords between points inside s and t (same: s and t are one
// segment).
func segmentChords(out []chord, s, t Segment, same bool) []chord {
	switch {
	case !s.IsArc() && !t.IsArc():
		if same {
			return out
		}
		return lineLineChords(out, s, t)
	case !s.IsArc():
		return lineArcChord(out, s, t)
	case !t.IsArc():
		return lineArcChord(out, t, s)
	}
	return arcArcChords(out, s, t)
}

// arcSense returns +1 when the arc's measured-side normal points away from its centre (it
// turns right and bulges into the measured side, like a hole seen from the material) and −1
// when it points toward the centre. A point of the arc whose normal is n is Center + σ·r·n.
func arcSense(s Segment) float64 {
	if s.Sweep < 0 {
		return 1
	}
	return -1
}

// onLine reports whether p, a point on the line of s, lies within s.
func onLine(s Segment, p Vec) bool {
	d := s.B.Sub(s.A)
	l := d.Len()
	t := p.Sub(s.A).Dot(d) / (l * l)
	return t >= -pointTol/l && t <= 1+pointTol/l
}

// onArc reports whether p, a point on the circle of arc s, lies within its sweep.
func onArc(s Segment, p Vec) bool {
	lo, ext := arcSpan(s)
	return inSpan(p.Sub(s.Center).Angle(), lo, ext)
}

// arcSpan returns the directions an arc covers from its centre as a counter-clockwise span:
// its first direction and its extent.
func arcSpan(s Segment) (lo, ext float64) {
	if s.Sweep > 0 {
		return s.StartAngle(), s.Sweep
	}
	return s.StartAngle() + s.Sweep, -s.Sweep
}

// inSpan reports whether direction a lies within the counter-clockwise span from lo of extent
// ext, allowing sweepTol at either end.
func inSpan(a, lo, ext float64) bool {
	d := normAngle(a - lo)
	return d <= ext+sweepTol || d >= 2*math.Pi-sweepTol
}

// lineLineChords appends chords across two facing parallel lines. Their common stretch is a
// family of equal chords; three of them are offered in case something blocks the middle one.
func lineLineChords(out []chord, s, t Segment) []chord {
	n := normalAt(s, 0)
	if n.Dot(normalAt(t, 0)) >= 0 || math.Abs(n.Cross(normalAt(t, 0))) > parallelTol {
		return out
	}
	u, v := s.B.Sub(s.A), t.B.Sub(t.A)
	ta, tb := t.A.Sub(s.A).Dot(u)/u.Dot(u), t.B.Sub(s.A).Dot(u)/u.Dot(u)
	lo, hi := math.Max(0, math.Min(ta, tb)), math.Min(1, math.Max(ta, tb))
	if hi <= lo {
		return out
	}
	for _, k := range []float64{0.5, 0.25, 0.75} {
		p := s.At(lo + k*(hi-lo))
		l := t.A.Sub(p).Cross(v) / n.Cross(v) // where p + l·n meets t's line
		out = append(out, chord{p, p.Add(n.Mul(l)), l})
	}
	return out
}

// lineArcChord appends the chord from line s to arc a that is perpendicular to both: it runs
// along s's normal through the arc's centre.
func lineArcChord(out []chord, s, a Segment) []chord {
	n := normalAt(s, 0)
	q := a.Center.Sub(n.Mul(arcSense(a) * a.Radius())) // where a's normal is −n
	l := q.Sub(s.A).Dot(n)
	p := q.Sub(n.Mul(l))
	if !onArc(a, q) || !onLine(s, p) {
		return out
	}
	return append(out, chord{p, q, l})
}

// arcArcChords appends the chords between arcs a and b along their line of centres (or, for
// one circle or two concentric circles, along any radius). With p = Ca + σa·ra·d and
// q = Cb − σb·rb·d, q − p = l·d gives Cb − Ca = (l + σa·ra + σb·rb)·d.
func arcArcChords(out []chord, a, b Segment) []chord {
	k := arcSense(a)*a.Radius() + arcSense(b)*b.Radius()
	dc := b.Center.Sub(a.Center)
	if dc.Len() <= pointTol {
		return concentricChords(out, a, b, -k)
	}
	u := dc.Unit()
	for _, d := range []Vec{u, u.Neg()} {
		p := a.Center.Add(d.Mul(arcSense(a) * a.Radius()))
		q := b.Center.Sub(d.Mul(arcSense(b) * b.Radius()))
		if l := dc.Dot(d) - k; l > 0 && onArc(a, p) && onArc(b, q) {
			out = append(out, chord{p, q, l})
		}
	}
	return out
}

// concentricChords appends chords of length l along radii shared by arcs a and b about one
// centre (a and b may be the same arc: then they are its diameters). Every direction d that
// puts p on a and q on b gives one; the directions form at most two spans, whose ends and
// middles are offered.
func concentricChords(out []chord, a, b Segment, l float64) []chord {
	if l <= 0 {
		return out
	}
	// Direction of d that puts p = C + σa·ra·d on a, and q = C − σb·rb·d on b.
	loA, extA := arcSpan(a)
	loB, extB := arcSpan(b)
	if arcSense(a) < 0 {
		loA += math.Pi
	}
	if arcSense(b) > 0 {
		loB += math.Pi
	}
	ends := []float64{normAngle(loA), normAngle(loA + extA), normAngle(loB), normAngle(loB + extB)}
	slices.Sort(ends)
	tries := slices.Clone(ends)
	for i, e := range ends {
		next := ends[(i+1)%len(ends)]
		tries = append(tries, e+normAngle(next-e)/2)
	}
	for _, th := range tries {
		if !inSpan(th, loA, extA) || !inSpan(th, loB, extB) {
			continue
		}
		d := Polar(Vec{}, 1, th)
		p := a.Center.Add(d.Mul(arcSense(a) * a.Radius()))
		out = append(out, chord{p, p.Add(d.Mul(l)), l})
	}
	return out
}

// vertexSegmentChords appends the chords from vertex v that meet segment s square on.
func vertexSegmentChords(out []chord, v vertex, s Segment) []chord {
	if !s.IsArc() {
		n := normalAt(s, 0)
		l := v.at.Sub(s.A).Dot(n)
		q := v.at.Sub(n.Mul(l))
		if v.admits(n.Neg()) && onLine(s, q) {
			out = append(out, chord{v.at, q, l})
		}
		return out
	}
	sr := arcSense(s) * s.Radius()
	dc := s.Center.Sub(v.at)
	if dc.Len() <= pointTol {
		return out
	}
	u := dc.Unit()
	for _, d := range []Vec{u, u.Neg()} {
		q := s.Center.Sub(d.Mul(sr))
		if l := dc.Dot(d) - sr; l > 0 && v.admits(d) && onArc(s, q) {
			out = append(out, chord{v.at, q, l})
		}
	}
	return out
}

// vertexVertexChord appends the chord between two vertices when it lies in both their cones.
func vertexVertexChord(out []chord, v, w vertex) []chord {
	d := w.at.Sub(v.at)
	u := d.Unit()
	if v.admits(u) && w.admits(u.Neg()) {
		out = append(out, chord{v.at, w.at, d.Len()})
	}
	return out
}
