package pantograph

import (
	"errors"
	"math"

	"panto/geom"
)

// Options are the limits Check works to.
type Options struct {
	// MinWall is the thinnest wall, in mm, between two features or between a feature and the
	// profile edge, that Check accepts without a warning.
	MinWall float64
	// Units are what the problems' messages give lengths in; "" means the part's own units.
	Units Units
}

// units returns the units messages about p are given in.
func (o Options) units(p Part) Units {
	if o.Units != "" {
		return o.Units
	}
	return p.Units
}

// DefaultMinWall is the wall thickness below which Check warns: 0.1 mm, about where a wall in
// brass or steel a millimetre or so thick starts to bend or tear under a small cutter (common
// practice, no source). Pass another value in Options to suit the material.
const DefaultMinWall = 0.1

// DefaultOptions returns the options Check uses when the caller has no opinion.
func DefaultOptions() Options { return Options{MinWall: DefaultMinWall} }

// Check returns every problem it finds in p, errors first in file order, then warnings.
// A part with any error should not be cut; see HasErrors.
func Check(p Part, o Options) []Problem {
	var ps []Problem
	ps = append(ps, checkStock(p, o.units(p))...)
	ps = append(ps, checkNames(p)...)
	good := []Feature{}
	for _, f := range p.All() {
		fs := checkFeature(f, p.Stock, o.units(p))
		ps = append(ps, fs...)
		if !HasErrors(fs) {
			good = append(good, f)
		}
	}
	if len(good) > 0 && good[0].Kind == KindProfile {
		es := elementsOf(good[1:], o.units(p))
		ps = append(ps, checkPlacement(good[0], es, o)...)
		ps = append(ps, checkPairs(es, o)...)
	}
	return sortProblems(ps)
}

// sound returns the features (the profile first, when it is sound) that pass their own checks,
// the only ones whose geometry the later checks and measures may trust.
func sound(p Part) []Feature {
	var good []Feature
	for _, f := range p.All() {
		if !HasErrors(checkFeature(f, p.Stock, p.Units)) {
			good = append(good, f)
		}
	}
	return good
}

// All returns the profile followed by the other features.
func (p Part) All() []Feature { return append([]Feature{p.Profile}, p.Features...) }

// sortProblems puts errors before warnings, keeping the order within each.
func sortProblems(ps []Problem) []Problem {
	var out []Problem
	for _, sev := range []Severity{Error, Warning} {
		for _, p := range ps {
			if p.Severity == sev {
				out = append(out, p)
			}
		}
	}
	return out
}

// checkStock looks at the stock on its own.
func checkStock(p Part, u Units) []Problem {
	t := p.Stock.Thickness
	where := p.Profile.Where
	switch {
	case t == 0:
		return []Problem{{Severity: Error, Label: "[stock]", Where: where,
			Message: "stock thickness missing: give [stock] thickness so depths can be checked"}}
	case !(t > 0) || math.IsInf(t, 0):
		return []Problem{{Severity: Error, Label: "[stock]", Where: where,
			Message: "stock thickness must be greater than 0, got " + u.Length(t)}}
	}
	return nil
}

// checkNames warns when two features of one kind share a name: messages and plans name
// features, and two alike leave the reader guessing which is meant.
func checkNames(p Part) []Problem {
	var ps []Problem
	seen := map[string]bool{}
	for _, f := range p.Features {
		l := f.Label()
		if seen[l] && f.Name != "" {
			ps = append(ps, problemf(Warning, f, "another %s has the same name; give each its own", "[["+string(f.Kind)+"]]"))
		}
		seen[l] = true
	}
	return ps
}

// checkFeature looks at one feature on its own: sizes, depth and outline; lengths in its
// messages are in u.
func checkFeature(f Feature, s Stock, u Units) []Problem {
	var ps []Problem
	switch f.Kind {
	case KindHoles:
		if !(f.Diameter > 0) || math.IsInf(f.Diameter, 0) {
			ps = append(ps, problemf(Error, f, "diameter must be greater than 0, got %s", u.Length(f.Diameter)).on(f, "diameter"))
		}
		if len(f.Centers) == 0 {
			ps = append(ps, problemf(Error, f, "no hole positions given").on(f, "at"))
		}
	case KindSlot:
		if !(f.Width > 0) || math.IsInf(f.Width, 0) {
			ps = append(ps, problemf(Error, f, "width must be greater than 0, got %s", u.Length(f.Width)).on(f, "width"))
		}
	case KindGroove:
		if f.Width < 0 || math.IsNaN(f.Width) || math.IsInf(f.Width, 0) {
			ps = append(ps, problemf(Error, f, "width must be 0 (as wide as the cutter) or more, got %s", u.Length(f.Width)).on(f, "width"))
		}
		if len(f.Path) < 2 {
			ps = append(ps, problemf(Error, f, "a groove needs at least 2 points, got %d", len(f.Path)).on(f, "points"))
		}
	}
	ps = append(ps, checkDepth(f, s, u)...)
	if HasErrors(ps) {
		return ps
	}
	return append(ps, checkOutline(f)...)
}

// checkDepth looks at a feature's depth against the stock.
func checkDepth(f Feature, s Stock, u Units) []Problem {
	d := f.Depth
	switch {
	case f.Kind == KindProfile || f.Kind == KindCutout:
		return nil // always through
	case !d.Given():
		return []Problem{problemf(Error, f, `depth missing: give depth = "through" or a depth`)}
	case d.Through:
		if f.Kind == KindPocket {
			return []Problem{problemf(Error, f, "a pocket cannot go through; make it a [[cutout]]").on(f, "depth")}
		}
		return nil
	case !(d.MM > 0) || math.IsInf(d.MM, 0):
		return []Problem{problemf(Error, f, "depth must be greater than 0, got %s", u.Length(d.MM)).on(f, "depth")}
	case s.Thickness <= 0:
		return nil // reported with the stock
	case d.MM > s.Thickness:
		return []Problem{amountf(Error, f, d.MM-s.Thickness,
			"depth %s is deeper than the stock (%s) by %s", u.Length(d.MM), u.Length(s.Thickness), u.Length(d.MM-s.Thickness)).on(f, "depth")}
	case d.MM == s.Thickness:
		return []Problem{problemf(Warning, f,
			`depth %s is the whole stock thickness: it breaks through; write depth = "through" if that is meant`, u.Length(d.MM)).on(f, "depth")}
	}
	return nil
}

// checkOutline validates the geometry of a feature's outline.
func checkOutline(f Feature) []Problem {
	var err error
	switch f.Kind {
	case KindProfile, KindCutout, KindPocket, KindSlot:
		err = f.Region.Validate()
	case KindHoles, KindGroove:
		for _, v := range append(append([]geom.Vec{}, f.Centers...), f.Path...) {
			if !v.IsFinite() {
				err = geom.ErrNotFinite
			}
		}
	}
	switch {
	case err == nil:
		return nil
	case errors.Is(err, geom.ErrSelfCrossing):
		return []Problem{problemf(Error, f, "outline crosses itself (%v)", err)}
	}
	return []Problem{problemf(Error, f, "outline is not a proper closed shape (%v)", err)}
}
