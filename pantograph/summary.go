package pantograph

import (
	"math"

	"panto/geom"
)

// Summary is what a machinist wants to know about a part before cutting it: its size, its area,
// what is in it, what limits the cutter, and what is wrong.
type Summary struct {
	Name   string
	Units  Units    // the units the drawing was made in; every number here is in mm
	Bounds geom.Box // of the profile, in mm
	// Area is the area of the part region in mm²: the profile less every through opening
	// (cut-outs, through slots and through holes). Pockets and grooves do not change it.
	Area  float64
	Stock Stock
	// MinInsideRadius is the smallest radius of a corner the cutter must make from inside
	// material-free space: the sharpest concave corner of the profile and the sharpest convex
	// corner of each cut-out, pocket and slot. 0 means a sharp inside corner, which any cutter
	// leaves rounded to its own radius.
	MinInsideRadius Measure
	// NarrowestGap is the narrowest place the cutter must pass: the narrowest notch in the
	// profile and the narrowest width of each cut-out, pocket and slot. Its value is the largest
	// cutter diameter that can make the whole part. Drilled holes are not milled and do not
	// count, nor do grooves, which are cut as wide as the cutter.
	NarrowestGap Measure
	Features     []FeatureInfo // the profile first, then the features in file order
	Problems     []Problem     // as Check returns them
}

// Measure is one measured limit and where it comes from. When Found is false nothing in the
// part limits the cutter this way (a part with no inside corners, say).
type Measure struct {
	MM      float64
	Feature string   // the label of the feature it comes from
	At      geom.Vec // where on the part, in mm
	// Angle is, for a corner, the angle of the free space the cutter works in there, in
	// radians: the opening's own angle at an inside corner of an opening, 2π less the part's at
	// a notch in the profile.
	Angle float64
	Found bool
}

// CornerLeft returns what a cutter of diameter d leaves in a corner measured by m: a round
// cutter in a corner of free-space angle θ cannot come closer to the vertex than r/sin(θ/2),
// its centre on the bisector touching both sides, and cuts r of that, so it leaves
// r(1/sin(θ/2) − 1) along the bisector (r(√2 − 1) at 90°) less what the corner's own radius
// already rounds: where the corner's radius is r or more nothing is left (derived).
func (m Measure) CornerLeft(d float64) float64 {
	r := d / 2
	if !m.Found || m.MM >= r || !(m.Angle > 0 && m.Angle < math.Pi) {
		return 0
	}
	k := 1/math.Sin(m.Angle/2) - 1
	return (r - m.MM) * k
}

// FeatureInfo names one feature for listings.
type FeatureInfo struct {
	Name  string
	Kind  Kind
	Label string
	Count int // holes in a holes feature, 1 otherwise
}

// Summarize checks p and measures it. Measures are taken from features that passed their own
// checks; when the part has errors they describe only what could be measured.
func Summarize(p Part, o Options) Summary {
	s := Summary{Name: p.Name, Units: p.Units, Stock: p.Stock, Problems: Check(p, o)}
	for _, f := range p.All() {
		n := 1
		if f.Kind == KindHoles {
			n = len(f.Centers)
		}
		s.Features = append(s.Features, FeatureInfo{Name: f.Name, Kind: f.Kind, Label: f.Label(), Count: n})
	}
	good := sound(p)
	if len(good) == 0 || good[0].Kind != KindProfile {
		return s
	}
	// Measure only what passed its own checks: a hole of negative size has no area to take.
	q := p
	q.Features = good[1:]
	s.Bounds = q.Profile.Region.Bounds()
	s.Area = partArea(q)
	s.MinInsideRadius, s.NarrowestGap = cutterLimits(q)
	return s
}

// openings returns the through openings of p as regions, one per hole.
func openings(p Part) []geom.Region {
	var rs []geom.Region
	for _, f := range p.Features {
		switch {
		case !f.Opening():
		case f.Kind == KindHoles:
			for i := range f.Centers {
				rs = append(rs, geom.NewRegion(f.HoleContour(i)))
			}
		default:
			rs = append(rs, f.Region)
		}
	}
	return rs
}

// partArea returns the profile's area less the through openings'. An opening that lies inside
// the profile with no other opening near it (their boxes apart) simply subtracts its area; the
// rest are taken from the profile in full with geom.Difference. Settling the lone openings first
// keeps a plate of hundreds of holes from costing a pairwise comparison of all of them.
func partArea(p Part) float64 {
	ops := openings(p)
	boxes := make([]geom.Box, len(ops))
	for i, r := range ops {
		boxes[i] = r.Bounds()
	}
	area := p.Profile.Region.Area()
	var rest []geom.Region
	for i, r := range ops {
		if lone(i, boxes) {
			if rel, _ := relate(p.Profile.Region.Outer, r.Outer); rel == bInsideA {
				area -= r.Area()
				continue
			}
		}
		rest = append(rest, r)
	}
	if len(rest) == 0 {
		return area
	}
	cut := p.Profile.Region.Area()
	for _, r := range geom.Difference([]geom.Region{p.Profile.Region}, rest) {
		cut -= r.Area()
	}
	return area - cut
}

// lone reports whether box i overlaps none of the others.
func lone(i int, boxes []geom.Box) bool {
	for j, b := range boxes {
		if j != i && b.Overlaps(boxes[i]) {
			return false
		}
	}
	return true
}

// cutterLimits measures the smallest inside corner radius and the narrowest gap, feature by
// feature: the profile seen from outside, each milled feature from inside. For features that lie
// apart inside the profile this is the same as measuring the profile less the milled openings
// as one region, and it says which feature each limit comes from. Where openings overlap, a
// corner that one opening swallows of another is still counted, so the measure errs tight.
func cutterLimits(p Part) (radius, gap Measure) {
	if c, ok := p.Profile.Region.SharpestConcaveCorner(); ok {
		radius = Measure{MM: c.Radius, Feature: p.Profile.Label(), At: c.At, Angle: 2*math.Pi - c.Angle, Found: true}
	}
	if g, ok := p.Profile.Region.NarrowestGap(); ok {
		gap = Measure{MM: g.Width, Feature: p.Profile.Label(), At: g.A.Lerp(g.B, 0.5), Found: true}
	}
	for _, f := range p.Features {
		if !f.Kind.Milled() || f.Region.Validate() != nil {
			continue
		}
		if c, ok := f.Region.SharpestConvexCorner(); ok {
			radius = smaller(radius, Measure{MM: c.Radius, Feature: f.Label(), At: c.At, Angle: c.Angle, Found: true})
		}
		if g, ok := f.Region.NarrowestWidth(); ok {
			gap = smaller(gap, Measure{MM: g.Width, Feature: f.Label(), At: g.A.Lerp(g.B, 0.5), Found: true})
		}
	}
	return radius, gap
}

// smaller returns whichever measure is found and smaller, preferring the earlier on a tie.
func smaller(a, b Measure) Measure {
	if !a.Found || b.Found && b.MM < a.MM-touchTol {
		return b
	}
	return a
}

// LargestCutter returns the largest cutter diameter, in mm, that makes the whole part as drawn:
// no wider than the narrowest gap, and no wider than twice the smallest inside corner radius.
// Sharp inside corners (radius 0) are left out of the diameter and reported by sharp: no cutter
// makes them, every cutter leaves its own radius there. The diameter is +Inf when nothing in
// the part limits the cutter.
func (s Summary) LargestCutter() (diameter float64, sharp bool) {
	diameter = math.Inf(1)
	if s.NarrowestGap.Found {
		diameter = s.NarrowestGap.MM
	}
	if r := s.MinInsideRadius; r.Found {
		if r.MM <= touchTol {
			return diameter, true
		}
		diameter = math.Min(diameter, 2*r.MM)
	}
	return diameter, false
}
