package pantograph

import (
	"errors"
	"fmt"
	"math"
	"sort"

	"panto/geom"
)

// Setup is how the machinist means to make a part: the ratio the linkage is set to, the cutters
// and stylus on hand, and how the template is laid on the copy table. It is a plain value; the
// zero value is not usable (Ratio and Cutter must be given), see Validate.
type Setup struct {
	// Ratio R is template size : part size; 10 means the template is ten times the part.
	Ratio float64
	// Cutter is the diameter, in mm, of the cutter used for every milled or engraved feature
	// unless Cutters names another for its kind.
	Cutter float64
	// Cutters overrides Cutter for some kinds of feature (an engraver for grooves, a smaller
	// cutter for slots). KindHoles names the cutter that mills holes too large to drill.
	Cutters map[Kind]float64
	// Stylus is the diameter, in mm, of the one stylus used for the whole job; 0 means a
	// stylus matched to each feature's cutter (R × cutter diameter), or with a machine file the
	// owned stylus nearest to that.
	Stylus float64
	// Tip is the shape of the stylus's end; "" means round. A pointed stylus traces with its
	// point, so it counts as radius 0 when compensating.
	Tip Tip
	// Mirror flips the template left for right (x → −x about the datum) before it is turned,
	// for dies and punches and for linkages that invert the image.
	Mirror bool
	// Rotate turns the template counter-clockwise about the datum, after any mirror. Left at 0
	// with Rotated false, the template is turned as the machine's linkage needs: 180° for a
	// pivot between stylus and cutter, which turns the copy (Pivot.CopyTurn), else not at all.
	// Rotated true keeps a Rotate of 0 as meant.
	Rotate  geom.Angle
	Rotated bool
	// AcceptLoss lets a plan with lost features count as done.
	AcceptLoss bool
	// MillHoles mills every hole larger than its cutter instead of drilling it.
	MillHoles bool
}

// Validate reports the first thing wrong with the setup, in words a machinist can act on.
func (s Setup) Validate() error {
	switch {
	case !finite(s.Ratio) || s.Ratio <= 0:
		return fmt.Errorf("ratio must be a number greater than 0, got %s", num(s.Ratio))
	case s.Ratio < 1:
		return fmt.Errorf("ratio %s would make the template smaller than the part; give template size : part size, 1 or more", num(s.Ratio))
	case !finite(s.Cutter) || s.Cutter <= 0:
		return fmt.Errorf("cutter diameter must be greater than 0 mm, got %s", num(s.Cutter))
	case !finite(s.Stylus) || s.Stylus < 0:
		return fmt.Errorf("stylus diameter must be 0 (matched to the cutter) or more, got %s", num(s.Stylus))
	case s.Tip != "" && s.Tip != TipRound && s.Tip != TipPointed:
		return fmt.Errorf("stylus tip must be %q or %q, got %q", TipRound, TipPointed, s.Tip)
	case !finite(float64(s.Rotate)):
		return errors.New("rotation must be a finite angle")
	}
	for _, k := range sortedKinds(s.Cutters) {
		if d := s.Cutters[k]; !finite(d) || d <= 0 {
			return fmt.Errorf("cutter for %s must be greater than 0 mm, got %s", k, num(d))
		}
	}
	return nil
}

// cutterFor returns the cutter diameter, in mm, used on features of kind k.
func (s Setup) cutterFor(k Kind) float64 {
	if d, ok := s.Cutters[k]; ok {
		return d
	}
	return s.Cutter
}

// MatchedStylus returns the stylus diameter that needs no compensation for a cutter of
// diameter cutter at this setup's ratio: R × cutter.
func (s Setup) MatchedStylus(cutter float64) float64 { return s.Ratio * cutter }

// Compensation returns δ = R·r_c − r_s in template mm: how far the template's traced edges
// move away from R × the part, outward for a profile and inward for an opening, for a cutter
// and stylus of the given diameters. A pointed stylus counts as radius 0. δ > 0 when the
// stylus is smaller than matched.
func (s Setup) Compensation(cutter, stylus float64) float64 {
	return compensation(s.Ratio, cutter, stylus, s.Tip)
}

// Transform returns the map from the part frame to the template frame: move the datum to the
// origin, mirror if asked, turn, then scale by R.
func (s Setup) Transform(datum geom.Vec) geom.Transform {
	t := geom.Translate(datum.Neg())
	if s.Mirror {
		t = t.Then(geom.FlipX())
	}
	return t.Then(geom.Rotate(s.Rotate)).Then(geom.Scale(s.Ratio))
}

// finite reports whether v is a number other than ±Inf.
func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// sortedKinds returns the keys of m in order, so messages do not depend on map order.
func sortedKinds(m map[Kind]float64) []Kind {
	ks := make([]Kind, 0, len(m))
	for k := range m {
		ks = append(ks, k)
	}
	sort.Slice(ks, func(i, j int) bool { return ks[i] < ks[j] })
	return ks
}

// machineWarnings checks the plan against the machine: the ratio the linkage can be set to,
// the tools the machinist owns, and whether the template fits the copy table and the printer.
// Amounts are in mm at the part.
func machineWarnings(p Plan, m *Machine) []Problem {
	if m == nil {
		return nil
	}
	var ws []Problem
	u := p.Units
	if w, ok := ratioWarning(p.Setup.Ratio, m.Ratio); ok {
		ws = append(ws, w)
	}
	ws = append(ws, toolWarnings(p, m)...)
	size := p.Bounds.Size()
	if t := m.CopyTable; t.X > 0 && size.X > t.X+sizeTol || t.Y > 0 && size.Y > t.Y+sizeTol {
		over := math.Max(size.X-t.X, size.Y-t.Y)
		ws = append(ws, Problem{Severity: Warning, Stops: true, Amount: over / p.Setup.Ratio, HasAmount: true,
			Message: fmt.Sprintf("the template is %s x %s but the copy table travels only %s x %s: a ratio of about %s:1 or less fits",
				u.Number(size.X), u.Length(size.Y), u.Number(t.X), u.Length(t.Y), num(fittingRatio(p.Setup.Ratio, size, t)))})
	}
	return ws
}

// ratioWarning reports a ratio the linkage cannot be set to; it stops the job.
func ratioWarning(r float64, rr RatioRange) (Problem, bool) {
	if rr.Allows(r) {
		return Problem{}, false
	}
	return Problem{Severity: Warning, Stops: true, Message: fmt.Sprintf("the linkage cannot be set to ratio %s: it has %s",
		num(r), rr)}, true
}

// toolWarnings reports a stylus or cutter the plan uses that the machine file does not list,
// once for the whole plan. Drills are checked with each holes feature, where a missing drill
// changes the plan.
func toolWarnings(p Plan, m *Machine) []Problem {
	var ws []Problem
	if p.Setup.Tip != "" && len(m.Styli) > 0 {
		if _, ok := ChooseStylus(*m, p.Setup.Ratio, p.Setup.Cutter, p.Setup.Tip); !ok {
			ws = append(ws, Problem{Severity: Warning, Message: fmt.Sprintf(
				"the machine file lists no %s stylus: the plan assumes one", p.Setup.Tip)})
		}
	}
	styli, cutters := map[float64]bool{}, map[float64]bool{}
	for _, f := range p.Features {
		if f.Status == StatusLost {
			continue
		}
		if len(m.Styli) > 0 && !styli[f.Stylus] && !ownsStylus(m.Styli, f.Stylus) {
			styli[f.Stylus] = true
			ws = append(ws, Problem{Severity: Warning, Message: fmt.Sprintf(
				"the plan uses a Ø%s stylus, and the machine file lists none that size", p.Units.Length(f.Stylus))})
		}
		if f.Cutter > 0 && len(m.Cutters) > 0 && !cutters[f.Cutter] && !ownsCutter(m.Cutters, f.Cutter) {
			cutters[f.Cutter] = true
			ws = append(ws, Problem{Severity: Warning, Message: fmt.Sprintf(
				"the plan uses a Ø%s cutter, and the machine file lists none that size", p.Units.Length(f.Cutter))})
		}
	}
	return ws
}

// ownsStylus reports whether ss holds a stylus of diameter d.
func ownsStylus(ss []Stylus, d float64) bool {
	for _, s := range ss {
		if math.Abs(s.Diameter-d) <= sizeTol {
			return true
		}
	}
	return false
}

// ownsCutter reports whether cs holds a cutter of diameter d.
func ownsCutter(cs []Cutter, d float64) bool {
	for _, c := range cs {
		if math.Abs(c.Diameter-d) <= sizeTol {
			return true
		}
	}
	return false
}

// fittingRatio estimates the largest ratio, to a tenth, at which a template of this size at
// ratio r would fit travel t: sizes scale with the ratio, all but the compensation, which is a
// fraction of a millimetre against hundreds.
func fittingRatio(r float64, size geom.Vec, t Travel) float64 {
	k := math.Inf(1)
	if t.X > 0 && size.X > 0 {
		k = t.X / size.X
	}
	if t.Y > 0 && size.Y > 0 {
		k = math.Min(k, t.Y/size.Y)
	}
	return math.Floor(r*k*10) / 10
}
