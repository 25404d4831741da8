package pantograph

import (
	"fmt"
	"math"
)

// This file plans depth: the passes a cutter takes down to a feature's depth, or through the
// stock and a little past it, and the pecks a drill takes. REFERENCES.md gives peck depths; it
// gives no step-down for milling, so the milling rule is a rule of thumb stated from memory
// and the sheet says so. Where the depth dial is stated every pass is set on a whole division
// of it, and no pass goes deeper than the rule: equal passes, rounded to divisions so that the
// deeper ones come first and none exceeds the rule (see passDepths).

// ToolKind is what a tool does to the stock. It decides the depth rule (passes or pecks), the
// break-through allowance and the surface speed.
type ToolKind int

// The tool kinds.
const (
	ToolMill    ToolKind = iota + 1 // an end mill or slot drill tracing an edge
	ToolEngrave                     // an engraver running along a groove
	ToolDrill                       // a drill sunk at a seat
)

// String names the kind: "mill", "engrave" or "drill".
func (k ToolKind) String() string {
	switch k {
	case ToolMill:
		return "mill"
	case ToolEngrave:
		return "engrave"
	case ToolDrill:
		return "drill"
	}
	return "unknown tool"
}

// PassRule is a step-down rule with where it comes from.
type PassRule struct {
	StepDown float64 // mm per pass, at most
	Rule     string  // the rule in words, with its source
}

// engraveStep is the depth per pass of an engraver, mm: a few hundredths, whatever its width,
// because the point is the weakest part (rule of thumb, from memory).
const engraveStep = 0.05

// minStep is the smallest step-down planned, mm: finer passes than this rub rather than cut
// and are below what a depth dial is read to on most bench machines (rule of thumb, from
// memory).
const minStep = 0.01

// millPassRule returns the step-down for milling or engraving the stock mat with a tool of kind
// and diameter d mm, its words giving lengths in units u: the material's share of the diameter
// per pass (StockMaterial.StepShare), halved for a micro cutter, which breaks before it wears.
func millPassRule(kind ToolKind, d float64, mat StockMaterial, u Units) PassRule {
	if kind == ToolEngrave {
		return PassRule{engraveStep, fmt.Sprintf("engraver: at most %s a pass (rule of thumb, from memory)", u.Length(engraveStep))}
	}
	share := mat.StepShare
	rule := fmt.Sprintf("%g × D in %s", share, mat.Name)
	if d < microTool {
		share /= 2
		rule += fmt.Sprintf(", halved for a cutter under %s", u.Length(microTool))
	}
	step := math.Max(share*d, minStep)
	return PassRule{step, fmt.Sprintf("%s: at most %s a pass (rule of thumb, from memory)", rule, u.Length(step))}
}

// breakThroughMill is how far past the stock a through cut goes, mm, so the last pass parts
// the piece cleanly from the stock's underside (rule of thumb, from memory).
const breakThroughMill = 0.05

// drillPointShare is the length of a 118° drill point as a share of the diameter:
// (D/2)/tan(59°) = 0.300·D (derived).
const drillPointShare = 0.3004

// breakThrough returns how far past the stock a through cut with a tool of kind and diameter d
// must go: for a drill its point length plus the milling allowance, so the full diameter
// comes through; for a cutter the allowance alone.
func breakThrough(kind ToolKind, d float64) float64 {
	if kind == ToolDrill {
		return drillPointShare*d + breakThroughMill
	}
	return breakThroughMill
}

// totalDepth returns how deep the tool goes for a feature of depth dep in stock thick mm: the
// depth itself, or through the stock plus the break-through allowance.
func totalDepth(dep Depth, thick float64, kind ToolKind, d float64) float64 {
	if dep.Through {
		return thick + breakThrough(kind, d)
	}
	return dep.MM
}

// passDepths returns the depth, from the top face in mm, at the bottom of each pass down to
// total, none deeper than step. Without a depth dial (division 0) the passes are equal. With
// one of division q mm the passes are counted in divisions: a pass may take at most
// s = ⌊step/q⌋ divisions (one, if the dial is coarser than the rule), n = ⌈total/(q·s)⌉ passes
// are needed, and pass k ends at ⌈k·x⌉ divisions for x = total/(q·n), the last at total itself.
// Each step down, ⌈k·x⌉ − ⌈(k−1)·x⌉, is at most ⌈x⌉ ≤ s divisions, and the last, total less
// ⌈(n−1)·x⌉ divisions, at most x: so the passes differ by at most a division and none is
// deeper than the rule (derived). A blind total between divisions is kept for the last pass.
func passDepths(total, step, q float64) []float64 {
	if !(total > 0) || !(step > 0) {
		return nil
	}
	if !(q > 0) {
		n := int(math.Ceil(total/step - divisionSnap))
		out := make([]float64, n)
		for i := range out {
			out[i] = total * float64(i+1) / float64(n)
		}
		out[n-1] = total
		return out
	}
	most := math.Max(1, math.Floor(step/q+divisionSnap))
	divs := total / q
	n := int(math.Max(1, math.Ceil(divs/most-divisionSnap)))
	x := divs / float64(n)
	var out []float64
	for k := 1; k < n; k++ {
		d := math.Ceil(float64(k)*x-divisionSnap) * q
		if len(out) == 0 || d > out[len(out)-1]+divisionSnap*q {
			out = append(out, d)
		}
	}
	return append(out, total)
}

// Peck shares of the drill diameter: ordinary drills 2–3 D per peck, the low end used; micro
// drills (under 1 mm) 0.5–1 D for the first peck then 0.25–0.5 D, the low ends used (tooling
// tech tips; micro values from memory).
const (
	peckShare       = 2.0
	microFirstShare = 0.5
	microPeckShare  = 0.25
)

// peckRule describes the peck schedule for a drill of d mm, with its source, lengths in u.
func peckRule(d float64, u Units) string {
	if d < microTool {
		return fmt.Sprintf("micro drill: first peck %g × D (%s), then %g × D (%s), clear chips each time, no dwell at the bottom (tooling tech tips; micro values from memory)",
			microFirstShare, u.Length(microFirstShare*d), microPeckShare, u.Length(microPeckShare*d))
	}
	return fmt.Sprintf("peck %g × D (%s), clear chips each time (tooling tech tips: 2–3 D, low end)", peckShare, u.Length(peckShare*d))
}

// pecks returns the depth at the bottom of each peck of a drill of d mm down to total mm. With
// a depth dial of division q mm each peck is taken to a whole number of divisions no larger
// than the rule (at least one), the last to total.
func pecks(total, d, q float64) []float64 {
	if !(total > 0) || !(d > 0) {
		return nil
	}
	first, then := peckShare*d, peckShare*d
	if d < microTool {
		first, then = microFirstShare*d, microPeckShare*d
	}
	if q > 0 {
		first = math.Max(1, math.Floor(first/q+divisionSnap)) * q
		then = math.Max(1, math.Floor(then/q+divisionSnap)) * q
	}
	var out []float64
	at := math.Min(first, total)
	for {
		out = append(out, at)
		if at >= total-divisionSnap*then {
			out[len(out)-1] = total
			return out
		}
		at = math.Min(at+then, total)
	}
}
