package pantograph

import (
	"errors"
	"fmt"
	"math"

	"panto/geom"
)

// This file tries a part at every ratio a machine can be set to, so a machinist can choose one
// before planning: how large the template and its plate come out, whether the template fits the
// copy table's travel, whether the plate prints in one piece on the machine's printer, which
// stylus it takes, and what the print's own error is worth at the part. The template's error
// shrinks R times at the part, the method's whole point, so a larger ratio is more accurate;
// the copy table and the printer bed set how large it may be.

// ratioStep is the step between the ratios tried on a linkage set anywhere in a range: half a
// ratio, as fine as a machinist picks a ratio by hand (common practice, no source).
const ratioStep = 0.5

// Without a machine file the ratios tried run over the usual range of bench pantographs
// (common practice, no source).
const (
	noMachineMinRatio = 2
	noMachineMaxRatio = 10
)

// RatioCandidate is one ratio tried.
type RatioCandidate struct {
	Ratio    float64
	Template geom.Vec // size of everything on the template, template mm
	Plate    PrintFit // the plate as printed and how it fits the bed
	// FitsCopyTable is whether the template lies within the copy table's travel (true when the
	// machine file states none).
	FitsCopyTable bool
	Matched       float64       // R × the cutter, the stylus needing no compensation, mm
	Chosen        *StylusChoice // the owned stylus nearest to matched; nil without one
	Compensation  float64       // δ for the stylus used, template mm
	TemplateError float64       // the printer's accuracy / R, mm at the part
	Done          bool          // the plan at this ratio can be carried out
}

// RatioChoices returns the ratios machine m can be set to: its fixed settings, or its range in
// steps of ratioStep; without a machine file, or a range it does not state, 2 to 10.
func RatioChoices(m *Machine) []float64 {
	lo, hi := float64(noMachineMinRatio), float64(noMachineMaxRatio)
	if m != nil && len(m.Ratio.Settings) > 0 {
		return append([]float64(nil), m.Ratio.Settings...)
	}
	if m != nil && m.Ratio.Stated() {
		lo, hi = m.Ratio.Min, m.Ratio.Max
	}
	var out []float64
	for r := math.Ceil(lo/ratioStep-divisionSnap) * ratioStep; r <= hi+ratioTol*hi; r += ratioStep {
		out = append(out, r)
	}
	if len(out) == 0 || out[len(out)-1] < hi-ratioTol*hi {
		out = append(out, hi) // a range ending between steps keeps its end
	}
	return out
}

// TryRatios plans part at every ratio m can be set to with setup s (its Ratio ignored) and
// designs the plate with o. It fails only where planning itself fails (a part with errors, a
// bad setup); what a ratio cannot do is in its candidate.
func TryRatios(part Part, s Setup, m *Machine, o PlateOptions) ([]RatioCandidate, error) {
	var out []RatioCandidate
	for _, r := range RatioChoices(m) {
		s.Ratio = r
		c, err := tryRatio(part, s, m, o)
		if err != nil {
			return nil, err
		}
		out = append(out, c)
	}
	return out, nil
}

// tryRatio plans and designs the plate at one ratio.
func tryRatio(part Part, s Setup, m *Machine, o PlateOptions) (RatioCandidate, error) {
	p, err := PlanPart(part, s, m)
	if err != nil {
		return RatioCandidate{}, err
	}
	c := RatioCandidate{Ratio: s.Ratio, Template: p.Bounds.Size(), Matched: MatchedStylus(s.Ratio, s.Cutter),
		FitsCopyTable: true, Done: p.Done()}
	var printer Printer
	if m != nil {
		printer = m.Printer
		t := m.CopyTable
		c.FitsCopyTable = !(t.X > 0 && c.Template.X > t.X+sizeTol || t.Y > 0 && c.Template.Y > t.Y+sizeTol)
		if ch, ok := ChooseStylus(*m, s.Ratio, s.Cutter, s.Tip); ok {
			c.Chosen = &ch
		}
	}
	c.Compensation = p.Setup.Compensation(s.Cutter, stylusOf(p))
	c.TemplateError = printer.AccuracyOrDefault() / s.Ratio
	pl, err := BuildPlate(p, m, o)
	if err != nil && !errors.Is(err, ErrPlate) {
		return RatioCandidate{}, err
	}
	if err == nil {
		c.Plate = FitPlate(pl, m)
	}
	return c, nil
}

// stylusOf is the stylus the plan's profile is traced with.
func stylusOf(p Plan) float64 {
	for _, f := range p.Features {
		if f.Kind == KindProfile {
			return f.Stylus
		}
	}
	return 0
}

// LargestOnePiece returns the largest ratio whose plate prints in one piece and whose template
// fits the copy table; ok is false when none does.
func LargestOnePiece(cs []RatioCandidate) (float64, bool) {
	return largest(cs, func(c RatioCandidate) bool { return c.FitsCopyTable && c.Plate.Tiles == 1 })
}

// LargestOnTable returns the largest ratio whose template fits the copy table.
func LargestOnTable(cs []RatioCandidate) (float64, bool) {
	return largest(cs, func(c RatioCandidate) bool { return c.FitsCopyTable })
}

func largest(cs []RatioCandidate, ok func(RatioCandidate) bool) (float64, bool) {
	best, found := 0.0, false
	for _, c := range cs {
		if ok(c) && c.Ratio > best {
			best, found = c.Ratio, true
		}
	}
	return best, found
}

// PlateReport is what a plan says of its plate on the machine's printer.
type PlateReport struct {
	Fit PrintFit
	// LargestOnePiece is the largest ratio whose plate prints in one piece and whose template
	// fits the copy table, worked out only when this plate does not print whole; 0 when none.
	LargestOnePiece float64
}

// ReportPlate designs the plate of plan p (made from part with setup s) on machine m with o,
// says how it prints and, when it does not print in one piece, adds a warning to p naming the
// largest ratio that does.
func ReportPlate(part Part, s Setup, p *Plan, m *Machine, o PlateOptions) (PlateReport, error) {
	pl, err := BuildPlate(*p, m, o)
	if err != nil {
		return PlateReport{}, err
	}
	r := PlateReport{Fit: FitPlate(pl, m)}
	if r.Fit.FitsBed {
		return r, nil
	}
	cs, err := TryRatios(part, s, m, o)
	if err != nil {
		return r, err
	}
	r.LargestOnePiece, _ = LargestOnePiece(cs)
	u := p.Units
	msg := fmt.Sprintf("the plate is %s x %s as printed, more than the printer bed (%s x %s) takes with a %s margin: it prints in %d pieces",
		u.Number(r.Fit.Size.X), u.Length(r.Fit.Size.Y), u.Number(r.Fit.Bed.X), u.Length(r.Fit.Bed.Y), u.Length(bedMargin), r.Fit.Tiles)
	if r.LargestOnePiece > 0 {
		msg += fmt.Sprintf("; %s:1 is the largest ratio that prints in one piece", num(r.LargestOnePiece))
	}
	p.Warnings = append(p.Warnings, Problem{Severity: Warning, Message: msg})
	return r, nil
}
