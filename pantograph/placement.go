package pantograph

import (
	"fmt"
	"math"

	"panto/geom"
)

// grooveProbe is the half-width, in mm, given to a groove of unstated width when it is tested
// against other outlines: a micrometre, so the test follows the groove's centreline.
const grooveProbe = 1e-3

// element is one outline of a feature that checks compare against others: a cut-out, pocket or
// slot is one element, a holes feature one per hole, a groove one per stretch of its path.
type element struct {
	f       Feature
	outline geom.Contour
	box     geom.Box // of the outline
	hole    bool     // a drilled hole: a circle of radius r about at
	at      geom.Vec // hole centre, or start of a groove stretch
	r       float64
	key     string // the key its line is written on ("at[2]", "points[0]"), "" for the table
	u       Units  // the part's units, for messages
}

// problem builds a problem about the element, placed on its own line.
func (e element) problem(sev Severity, amount float64, format string, args ...any) Problem {
	return amountf(sev, e.f, amount, format, args...).on(e.f, e.key)
}

// name says which element is meant in a message about its own feature.
func (e element) name() string {
	switch {
	case e.hole:
		return "hole at " + e.u.Point(e.at.X, e.at.Y)
	case e.f.Kind == KindGroove:
		return "the groove near " + e.u.Point(e.at.X, e.at.Y)
	}
	return "the " + kindWords[e.f.Kind]
}

// fullName says which element is meant in a message about another feature.
func (e element) fullName() string {
	switch {
	case e.hole && e.f.Name != "":
		return fmt.Sprintf("hole at %s of %s", e.u.Point(e.at.X, e.at.Y), e.f.Label())
	case e.f.Kind == KindGroove:
		return fmt.Sprintf("%s near %s", e.f.Label(), e.u.Point(e.at.X, e.at.Y))
	}
	return e.f.Label()
}

// kindWords names each kind in running text.
var kindWords = map[Kind]string{KindProfile: "profile", KindCutout: "cut-out", KindPocket: "pocket",
	KindHoles: "holes", KindSlot: "slot", KindGroove: "groove"}

// elementsOf breaks features into elements, whose messages give lengths in u.
func elementsOf(fs []Feature, u Units) []element {
	es := outlinesOf(fs)
	for i := range es {
		es[i].box = es[i].outline.Bounds()
		es[i].u = u
	}
	return es
}

// outlinesOf makes the elements of each feature.
func outlinesOf(fs []Feature) []element {
	var es []element
	for _, f := range fs {
		switch f.Kind {
		case KindHoles:
			for i, c := range f.Centers {
				es = append(es, element{f: f, outline: f.HoleContour(i), hole: true, at: c, r: f.Diameter / 2,
					key: fmt.Sprintf("at[%d]", i)})
			}
		case KindGroove:
			r := math.Max(f.Width/2, grooveProbe)
			for i := 0; i+1 < len(f.Path); i++ {
				a, b := f.Path[i], f.Path[i+1]
				es = append(es, element{f: f, outline: geom.Capsule(a, b, r), at: a, r: r,
					key: fmt.Sprintf("points[%d]", i)})
			}
		default:
			es = append(es, element{f: f, outline: f.Region.Outer})
		}
	}
	return es
}

// checkPlacement compares every element with the profile: outside it, breaking through its
// edge, or leaving a thin wall to it.
func checkPlacement(profile Feature, es []element, o Options) []Problem {
	var ps []Problem
	edge := profile.Region.Outer
	for _, e := range es {
		rel, amount := relate(edge, e.outline)
		switch rel {
		case apart, aInsideB:
			ps = append(ps, e.problem(Error, amount, "%s lies outside the profile, %s from its edge",
				e.name(), e.u.Length(amount)))
		case crossing:
			out := reach(e.outline, edge, false)
			ps = append(ps, e.problem(Error, out, "%s breaks through the profile edge: it reaches %s beyond it",
				e.name(), e.u.Length(out)))
		case bInsideA:
			if amount < o.MinWall && e.f.Kind != KindGroove {
				ps = append(ps, e.problem(Warning, amount, "%s leaves a wall of only %s to the profile edge (less than %s)",
					e.name(), e.u.Length(amount), e.u.Length(o.MinWall)))
			}
		}
	}
	return ps
}

// checkPairs compares every two elements of different features, and the holes of one feature
// with each other.
func checkPairs(es []element, o Options) []Problem {
	var ps []Problem
	for i := range es {
		for j := i + 1; j < len(es); j++ {
			a, b := es[i], es[j]
			if a.f.Kind == KindGroove && b.f.Kind == KindGroove {
				continue
			}
			if !a.hole && sameFeature(a, b) {
				continue
			}
			if !a.box.Expand(o.MinWall).Overlaps(b.box) {
				continue
			}
			if p, ok := pairProblem(a, b, o); ok {
				ps = append(ps, p)
			}
		}
	}
	return ps
}

// sameFeature reports whether two elements come from one feature (stretches of one groove).
func sameFeature(a, b element) bool {
	return a.f.Kind == b.f.Kind && a.f.Name == b.f.Name && a.f.Where == b.f.Where
}

// pairProblem says what, if anything, is wrong between two elements.
func pairProblem(a, b element, o Options) (Problem, bool) {
	rel, amount := relate(a.outline, b.outline)
	if a.hole && b.hole {
		rel, amount = relateHoles(a, b)
	}
	switch rel {
	case crossing:
		if !a.hole || !b.hole {
			amount = math.Max(amount, reach(a.outline, b.outline, true))
		}
		return crossProblem(a, b, amount), true
	case bInsideA, aInsideB:
		outer, inner := a, b
		if rel == aInsideB {
			outer, inner = b, a
		}
		if outer.f.Opening() {
			p := problemf(Warning, inner.f, "%s lies inside %s, where there is no metal left to cut",
				inner.name(), outer.fullName())
			return p.on(inner.f, inner.key), true
		}
		return Problem{}, false // a hole or slot in a pocket floor, a step in a pocket: fine
	}
	if amount < o.MinWall && a.f.Kind != KindGroove && b.f.Kind != KindGroove {
		return b.problem(Warning, amount, "%s leaves a wall of only %s to %s (less than %s)",
			b.name(), b.u.Length(amount), a.fullName(), b.u.Length(o.MinWall)), true
	}
	return Problem{}, false
}

// relateHoles relates two drilled holes exactly from their centres and radii.
func relateHoles(a, b element) (relation, float64) {
	d := a.at.Dist(b.at)
	over := a.r + b.r - d
	switch {
	case over >= -touchTol && d > math.Abs(a.r-b.r):
		return crossing, math.Max(over, 0)
	case d <= math.Abs(a.r-b.r) && a.r >= b.r:
		return bInsideA, a.r - b.r - d
	case d <= math.Abs(a.r-b.r):
		return aInsideB, b.r - a.r - d
	}
	return apart, -over
}

// crossProblem reports two elements that cross: an error when both go through (they merge into
// one opening the drawing does not show), a warning when one is blind or an engraving.
func crossProblem(a, b element, amount float64) Problem {
	sev := Warning
	if a.f.Opening() && b.f.Opening() || a.hole && b.hole {
		sev = Error
	}
	verb := fmt.Sprintf("overlaps %s by %s", a.fullName(), b.u.Length(amount))
	if amount <= touchTol {
		verb = "touches " + a.fullName()
	}
	if b.f.Kind == KindGroove || a.f.Kind == KindGroove {
		verb = "crosses " + a.fullName()
	}
	return b.problem(sev, amount, "%s %s", b.name(), verb)
}
