package pantograph

import (
	"errors"
	"fmt"
	"math"

	"panto/geom"
)

// This file makes the template for cutting from flat stock on a laser or CNC router instead of
// printing it. A beam or bit cuts a kerf as wide as itself, centred on the line it follows, so
// a line drawn on the template's edge leaves the piece kerf/2 small all round. The lines are
// therefore moved by half the kerf: the outline out, openings and seats in, and the pieces
// come out at the template's size. Groove centrelines are marks to engrave and stay where they
// are.

// MaxKerf bounds the kerf: a CO2 laser cuts about 0.1 to 0.3 mm wide and a small router bit a
// few mm, so 10 mm or more is a slip of the keyboard (common practice, no source).
const MaxKerf = 10.0

// CutTemplate is the template of a plan as lines to cut, in the template frame (mm on the copy
// table), the kerf already allowed for.
type CutTemplate struct {
	Kerf     float64       // the kerf allowed for, mm; 0 means the lines are the template's edges
	Outline  []geom.Region // the profile, grown by Kerf/2
	Openings []geom.Region // cut-outs, pockets, slots and milled holes, shrunk by Kerf/2
	Seats    []CutSeat     // a circle of the stylus's diameter at every drilled hole, less Kerf/2
	Grooves  [][]geom.Vec  // groove centrelines, as planned
	Labels   []CutLabel    // each feature's number and name at the middle of what it covers
}

// CutSeat is a round hole the stylus drops into.
type CutSeat struct {
	At      geom.Vec
	Radius  float64 // the line's radius: the stylus's less half the kerf
	Feature int     // the feature's number
}

// CutLabel is a feature's number and name, to mark beside it.
type CutLabel struct {
	At   geom.Vec
	Text string
}

// ErrKerf is wrapped when the kerf is out of range or closes an opening or a seat.
var ErrKerf = errors.New("kerf")

// TemplateForCutting returns the template of p to cut with a kerf of kerf mm (0 to MaxKerf).
// It fails, naming the feature, when the kerf would close an opening or a seat.
func TemplateForCutting(p Plan, kerf float64) (CutTemplate, error) {
	if !(kerf >= 0 && kerf < MaxKerf) {
		return CutTemplate{}, fmt.Errorf("%w must be 0 or more and less than %s mm, got %g", ErrKerf, num(MaxKerf), kerf)
	}
	ct := CutTemplate{Kerf: kerf}
	for _, f := range p.Features {
		if f.Status == StatusLost {
			continue
		}
		if err := ct.add(f, kerf/2); err != nil {
			return CutTemplate{}, fmt.Errorf("%s: %w", f.Label, err)
		}
		if box := f.TemplateBounds; !box.IsEmpty() {
			ct.Labels = append(ct.Labels, CutLabel{At: box.Center(), Text: fmt.Sprintf("%d %s", f.Number, f.Name)})
		}
	}
	return ct, nil
}

// add puts one feature's lines on the template, moved by half the kerf.
func (ct *CutTemplate) add(f PlannedFeature, half float64) error {
	switch {
	case f.Kind == KindProfile:
		rs, err := offsetForKerf(f.TemplateRegions, half)
		ct.Outline = append(ct.Outline, rs...)
		return err
	case len(f.Seats) > 0:
		r := f.Stylus/2 - half
		if !(r > 0) {
			return fmt.Errorf("the %w (%s mm) closes the Ø%s seats", ErrKerf, num(2*half), num(f.Stylus))
		}
		for _, s := range f.Seats {
			ct.Seats = append(ct.Seats, CutSeat{At: s, Radius: r, Feature: f.Number})
		}
	case len(f.Path) > 0:
		ct.Grooves = append(ct.Grooves, f.Path)
	default:
		rs, err := offsetForKerf(f.TemplateRegions, -half)
		ct.Openings = append(ct.Openings, rs...)
		return err
	}
	return nil
}

// offsetForKerf moves every region by by (outward when positive); a region that vanishes or
// loses a hole under the offset is closed by the kerf.
func offsetForKerf(rs []geom.Region, by float64) ([]geom.Region, error) {
	var out []geom.Region
	for _, r := range rs {
		res := r.Offset(by)
		if len(res.Regions) == 0 || len(res.Vanished) > 0 {
			return nil, fmt.Errorf("the %w (%s mm) closes an opening", ErrKerf, num(2*math.Abs(by)))
		}
		out = append(out, res.Regions...)
	}
	return out, nil
}
